package foundation

import (
	"fmt"
	"math"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// WaterUnitWeight is the unit weight of water used for buoyancy and for the
// default submerged unit weight, 9.81 kN/m³ (common practice).
const WaterUnitWeight = 9.81 * units.KilonewtonPerCubicMetre

// DefaultInterface is the ratio δ/φ' of base friction between concrete and
// soil to the soil's friction angle used when Soil.Interface is zero: 2/3.
// EN 1997-1 cl. 6.5.3(10) (from memory) allows δ = φ'cv for concrete cast
// against the soil and 2/3 φ' for smooth precast concrete; the lower value
// is taken by default as a cautious choice (common practice). Set
// Interface to 1 for a block cast in situ on undisturbed ground.
const DefaultInterface = 2.0 / 3.0

// maxFriction bounds φ': bearing-capacity and earth-pressure formulas are
// tabulated only up to about 50°.
const maxFriction = 50 * units.Degree

// Soil describes the ground under and around a foundation, in effective
// (drained) terms, or in total-stress terms when Friction is zero and
// Cohesion holds the undrained shear strength.
type Soil struct {
	Name string
	// UnitWeight is the moist (bulk) unit weight above the water table.
	UnitWeight units.UnitWeight
	// Submerged is the unit weight below the water table; zero → UnitWeight
	// − 9.81 kN/m³ (WaterUnitWeight).
	Submerged units.UnitWeight
	// Friction is the effective angle of shearing resistance φ'.
	Friction units.Angle
	// Cohesion is the effective cohesion c' (or cu when Friction is zero).
	Cohesion units.Pressure
	// Interface is δ/φ' for concrete on this soil; zero → DefaultInterface (2/3).
	Interface float64
	// Allowable is an allowable bearing pressure from a site report; zero →
	// none given, and bearing is checked from the bearing-capacity equation.
	Allowable units.Pressure
	// IsRock marks rock, in which rock anchors may be grouted.
	IsRock bool
	// GroutBond is the ultimate bond stress between grout and rock, for
	// rock anchors; zero → none known.
	GroutBond units.Pressure
	// Source says where the values come from.
	Source string
}

// Validate returns an error wrapping ErrInvalid naming the first field of s
// that is out of range.
func (s Soil) Validate() error {
	if err := positive("Soil.UnitWeight", float64(s.UnitWeight)); err != nil {
		return err
	}
	if err := nonNegative("Soil.Submerged", float64(s.Submerged)); err != nil {
		return err
	}
	if s.Submerged > s.UnitWeight {
		return invalid("Soil.Submerged", "must not exceed UnitWeight")
	}
	if s.Submerged == 0 && s.UnitWeight <= WaterUnitWeight {
		return invalid("Soil.Submerged", "is needed: UnitWeight is not more than that of water")
	}
	if !(s.Friction >= 0 && s.Friction <= maxFriction) {
		return invalid("Soil.Friction", "must be between 0 and 50 deg")
	}
	if err := nonNegative("Soil.Cohesion", float64(s.Cohesion)); err != nil {
		return err
	}
	if !(s.Interface >= 0 && s.Interface <= 1) {
		return invalid("Soil.Interface", "must be between 0 and 1 (zero for the default)")
	}
	if err := nonNegative("Soil.Allowable", float64(s.Allowable)); err != nil {
		return err
	}
	return nonNegative("Soil.GroutBond", float64(s.GroutBond))
}

// SubmergedWeight returns the unit weight below the water table:
// Submerged, or UnitWeight − WaterUnitWeight when Submerged is zero.
func (s Soil) SubmergedWeight() units.UnitWeight {
	if s.Submerged > 0 {
		return s.Submerged
	}
	return s.UnitWeight - WaterUnitWeight
}

// InterfaceFriction returns the angle of friction δ between concrete and
// the soil:
//
//	δ = k·φ',  k = Interface, or DefaultInterface when zero
func (s Soil) InterfaceFriction() units.Angle {
	k := s.Interface
	if k == 0 {
		k = DefaultInterface
	}
	return units.Angle(k) * s.Friction
}

// factored returns s with its strength divided by the set's partial
// factors:
//
//	tan φ'd = tan φ' / γφ,   c'd = c' / γc,   cu,d = cu / γcu (Friction zero)
//
// (EN 1997-1 cl. 2.4.6.2, set M2 values in Annex A: γφ' 1.25, γc' 1.25,
// γcu 1.4.)
func (s Soil) factored(set actionSet) Soil {
	if s.Friction == 0 {
		s.Cohesion /= units.Pressure(set.gCu)
		return s
	}
	s.Friction = units.Angle(math.Atan(math.Tan(float64(s.Friction)) / set.gPhi))
	s.Cohesion /= units.Pressure(set.gC)
	return s
}

const kNm3 = units.KilonewtonPerCubicMetre

// presetSource is the provenance of every preset value.
const presetSource = "from memory: mid-range typical values of the kind tabulated in geotechnical handbooks; " +
	"replace with site-investigation values"

// Presets returns a small set of typical soils and rocks. Every value is
// from memory (typical mid-range values of the kind tabulated in
// geotechnical handbooks), to be replaced by site-investigation values.
// Strengths are drained (effective-stress) values; Allowable is zero in
// every preset because an allowable pressure belongs to a site report.
//
//	name            γ kN/m³  φ' deg  c' kPa  grout-rock bond
//	loose sand        17       29      0
//	medium sand       18       32      0
//	dense sand        19       36      0
//	gravel            20       38      0
//	soft clay         17       22      0
//	stiff clay        19       25      5
//	weathered rock    22       35     20      0.35 MPa
//	sound rock        25       45    100      1.0 MPa
func Presets() []Soil {
	mk := func(name string, g, phi, c float64, rock bool, bond units.Pressure) Soil {
		return Soil{
			Name: name, UnitWeight: units.UnitWeight(g) * kNm3,
			Friction: units.FromDegrees(phi), Cohesion: units.Pressure(c) * units.Kilopascal,
			IsRock: rock, GroutBond: bond, Source: presetSource,
		}
	}
	return []Soil{
		mk("loose sand", 17, 29, 0, false, 0),
		mk("medium sand", 18, 32, 0, false, 0),
		mk("dense sand", 19, 36, 0, false, 0),
		mk("gravel", 20, 38, 0, false, 0),
		mk("soft clay", 17, 22, 0, false, 0),
		mk("stiff clay", 19, 25, 5, false, 0),
		mk("weathered rock", 22, 35, 20, true, 0.35*units.Megapascal),
		mk("sound rock", 25, 45, 100, true, 1.0*units.Megapascal),
	}
}

// LookupSoil returns the preset with the given name, ignoring case and
// surrounding space. An unknown name gives an error wrapping ErrUnknownSoil
// that lists the known names.
func LookupSoil(name string) (Soil, error) {
	key := strings.ToLower(strings.TrimSpace(name))
	ps := Presets()
	names := make([]string, len(ps))
	for i, p := range ps {
		if p.Name == key {
			return p, nil
		}
		names[i] = p.Name
	}
	return Soil{}, fmt.Errorf("%w %q (known: %s)", ErrUnknownSoil, name, strings.Join(names, ", "))
}
