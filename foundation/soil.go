package foundation

import (
	"fmt"
	"math"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// WaterUnitWeight is the unit weight of water used for buoyancy and for the
// default submerged unit weight, γw = 9.81 kN/m³ (common practice).
const WaterUnitWeight = 9.81 * units.KilonewtonPerCubicMetre

// DefaultInterface is the ratio δ/φ' of base friction between concrete and
// soil to the soil's friction angle used when Soil.Interface is zero: 2/3.
// EN 1997-1:2004 6.5.3(10) allows δ = φ'cv for concrete cast against the
// soil and 2/3 φ' for smooth precast concrete (from memory); the lower value
// is taken by default as a cautious choice (common practice). Set Interface
// to 1 for a block cast in situ on undisturbed ground.
const DefaultInterface = 2.0 / 3.0

// maxFriction bounds φ': bearing-capacity and earth-pressure formulas are
// tabulated only up to about 50°.
const maxFriction = 50 * units.Degree

// Soil describes the ground under and around a foundation. A soil carries
// its drained (long-term, effective-stress) strength φ', c'; a fine soil
// also carries its undrained (short-term, total-stress) shear strength c_u,
// and the checks then verify both conditions and report the one that
// governs. Rock (IsRock) carries a friction angle for base sliding, and its
// bearing comes from an allowable pressure or a rock-mass method
// (RockPressure), never from soil bearing-capacity theory.
type Soil struct {
	Name string
	// UnitWeight is the bulk unit weight γ above the water table.
	UnitWeight units.UnitWeight
	// Submerged is the effective unit weight γ' = γsat − γw below the water
	// table; zero → UnitWeight − WaterUnitWeight (cautious when γsat > γ).
	Submerged units.UnitWeight
	// Friction is the effective (drained) angle of shearing resistance φ';
	// zero means no drained strength is given (the drained condition is
	// then not checked).
	Friction units.Angle
	// Cohesion is the effective (drained) cohesion c'.
	Cohesion units.Pressure
	// Undrained is the undrained shear strength c_u of a fine soil; zero
	// means none (coarse soil or rock: the undrained condition is not
	// checked).
	Undrained units.Pressure
	// Interface is δ/φ' for concrete on this soil; zero → DefaultInterface (2/3).
	Interface float64
	// Allowable is an allowable bearing pressure from a site report; zero →
	// none given. On rock it is the bearing limit on any basis; on soil the
	// allowable basis compares the peak contact pressure with it beside the
	// bearing-capacity equation, the worse governing (a site's allowable
	// pressure presumes a vertical load; an anchor's base carries an
	// inclined one).
	Allowable units.Pressure
	// IsRock marks rock: rock anchors may be grouted in it, and its bearing
	// is never computed from soil N-factors.
	IsRock bool
	// RockStrength is the uniaxial compressive strength q_u of intact rock
	// cores, and JointSpacing and JointAperture the spacing and opening of
	// the rock mass's discontinuities, for the K_sp method of RockPressure
	// when no Allowable is given.
	RockStrength  units.Pressure
	JointSpacing  units.Length
	JointAperture units.Length
	// GroutBond is the ultimate bond stress between grout and rock, for
	// rock anchors; zero → none known.
	GroutBond units.Pressure
	// Source says where the values come from.
	Source string
}

// Validate returns an error wrapping ErrInvalid naming the first field of s
// that is out of range, or a combination that cannot be analysed.
func (s Soil) Validate() error {
	if err := positive("Soil.UnitWeight", float64(s.UnitWeight)); err != nil {
		return err
	}
	if err := nonNegative("Soil.Submerged", float64(s.Submerged)); err != nil {
		return err
	}
	if s.Submerged > s.UnitWeight {
		return invalid("Soil.Submerged", "must not exceed UnitWeight (γ' > γ is not a soil)")
	}
	if s.Submerged == 0 && s.UnitWeight <= WaterUnitWeight {
		return invalid("Soil.Submerged", "is needed: UnitWeight is not more than that of water")
	}
	if !(s.Friction >= 0 && s.Friction <= maxFriction) {
		return invalid("Soil.Friction", "must be between 0 and 50 deg")
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"Soil.Cohesion", float64(s.Cohesion)}, {"Soil.Undrained", float64(s.Undrained)}, {"Soil.Allowable", float64(s.Allowable)},
		{"Soil.RockStrength", float64(s.RockStrength)}, {"Soil.JointSpacing", float64(s.JointSpacing)},
		{"Soil.JointAperture", float64(s.JointAperture)}, {"Soil.GroutBond", float64(s.GroutBond)}} {
		if err := nonNegative(f.name, f.v); err != nil {
			return err
		}
	}
	if !(s.Interface >= 0 && s.Interface <= 1) {
		return invalid("Soil.Interface", "must be between 0 and 1 (zero for the default)")
	}
	if s.IsRock && s.Undrained > 0 {
		return invalid("Soil.Undrained", "must be zero for rock: rock has no undrained strength")
	}
	if !s.IsRock && (s.RockStrength > 0 || s.JointSpacing > 0 || s.JointAperture > 0) {
		return invalid("Soil.RockStrength", "and the joint spacing and aperture apply to rock only (IsRock)")
	}
	if s.Friction == 0 && s.Undrained == 0 {
		return invalid("Soil.Friction", "or Soil.Undrained must be given: the soil has no strength")
	}
	return nil
}

// Conditions returns the ground conditions in which s has a strength, in
// the order they are checked: Drained when Friction is given, Undrained
// when Undrained is given.
func (s Soil) Conditions() []Condition {
	switch {
	case s.Friction > 0 && s.Undrained > 0:
		return bothConditions
	case s.Undrained > 0:
		return undrainedOnly
	}
	return drainedOnly
}

var (
	bothConditions = []Condition{Drained, Undrained}
	drainedOnly    = []Condition{Drained}
	undrainedOnly  = []Condition{Undrained}
)

// SubmergedWeight returns the effective unit weight below the water table:
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

// strength is the shear strength of a soil in one condition, after any
// partial factors: friction angle phi (zero when undrained) and cohesion c
// (c' drained, c_u undrained).
type strength struct {
	cond  Condition
	phi   float64 // rad
	c     float64 // Pa
	tanD  float64 // tan δ of the base interface (drained)
	delta float64 // δ, rad
}

// strengthIn returns the strength of s in condition cond divided by the
// set's partial factors:
//
//	drained:   tan φ'd = tan φ' / γφ,  c'd = c' / γc
//	undrained: cu,d = cu / γcu,  φ = 0
//
// (EN 1997-1:2004 2.4.6.2; set M2 values in Annex A Table A.4: γφ' 1.25,
// γc' 1.25, γcu 1.4.) δ follows φ'd with the soil's Interface ratio.
func (s Soil) strengthIn(cond Condition, set actionSet) strength {
	if cond == Undrained {
		return strength{cond: Undrained, c: float64(s.Undrained) / set.gCu}
	}
	phi := math.Atan(math.Tan(float64(s.Friction)) / set.gPhi)
	k := s.Interface
	if k == 0 {
		k = DefaultInterface
	}
	d := k * phi
	return strength{cond: Drained, phi: phi, c: float64(s.Cohesion) / set.gC, tanD: math.Tan(d), delta: d}
}

// withStrength returns s with its strength in condition cond as given by
// st: the form BearingCapacity and the earth-pressure functions read.
func (s Soil) withStrength(st strength) Soil {
	if st.cond == Undrained {
		s.Friction, s.Cohesion, s.Undrained = 0, 0, units.Pressure(st.c)
		return s
	}
	s.Friction, s.Cohesion, s.Undrained = units.Angle(st.phi), units.Pressure(st.c), 0
	return s
}

const kNm3 = units.KilonewtonPerCubicMetre

// presetSource is the provenance of every preset value.
const presetSource = "from memory: mid-range typical values of the kind tabulated in geotechnical handbooks " +
	"(undrained strengths from the consistency classes of BS 5930 and EN ISO 14688-2); replace with site-investigation values"

// Presets returns a small set of typical soils and rocks. Every value is
// from memory (typical mid-range values of the kind tabulated in
// geotechnical handbooks, the undrained strengths of the clays taken in the
// lower half of the consistency classes of BS 5930 and EN ISO 14688-2:
// soft 20–40 kPa, stiff 75–150 kPa), to be replaced by site-investigation
// values. Allowable is zero in every preset because an allowable pressure
// belongs to a site report: a footing or block on a rock preset needs one,
// or the rock strength and joints for RockPressure.
//
//	name            γ kN/m³  φ' deg  c' kPa  c_u kPa  grout-rock bond
//	loose sand        17       29      0        –
//	medium sand       18       32      0        –
//	dense sand        19       36      0        –
//	gravel            20       38      0        –
//	soft clay         17       22      0       25
//	stiff clay        19       25      5      100
//	weathered rock    22       35     20        –      0.35 MPa
//	sound rock        25       45    100        –      1.0 MPa
func Presets() []Soil {
	mk := func(name string, g, phi, c, cu float64, rock bool, bond units.Pressure) Soil {
		return Soil{
			Name: name, UnitWeight: units.UnitWeight(g) * kNm3,
			Friction: units.FromDegrees(phi), Cohesion: units.Pressure(c) * units.Kilopascal,
			Undrained: units.Pressure(cu) * units.Kilopascal,
			IsRock:    rock, GroutBond: bond, Source: presetSource,
		}
	}
	return []Soil{
		mk("loose sand", 17, 29, 0, 0, false, 0),
		mk("medium sand", 18, 32, 0, 0, false, 0),
		mk("dense sand", 19, 36, 0, 0, false, 0),
		mk("gravel", 20, 38, 0, 0, false, 0),
		mk("soft clay", 17, 22, 0, 25, false, 0),
		mk("stiff clay", 19, 25, 5, 100, false, 0),
		mk("weathered rock", 22, 35, 20, 0, true, 0.35*units.Megapascal),
		mk("sound rock", 25, 45, 100, 0, true, 1.0*units.Megapascal),
	}
}

// LookupSoil returns the preset with the given name, ignoring case and
// surrounding space. An unknown name gives an error wrapping ErrUnknownSoil
// that suggests the nearest name (a typo of up to three letters) and lists
// the known names.
func LookupSoil(name string) (Soil, error) {
	key := strings.ToLower(strings.TrimSpace(name))
	ps := Presets()
	names := make([]string, len(ps))
	best, bestDist := "", 4
	for i, p := range ps {
		if p.Name == key {
			return p, nil
		}
		names[i] = fmt.Sprintf("%q", p.Name)
		if d := editDistance(key, p.Name); d < bestDist {
			best, bestDist = p.Name, d
		}
	}
	hint := ""
	if best != "" {
		hint = fmt.Sprintf("; did you mean %q?", best)
	}
	return Soil{}, fmt.Errorf("%w %q%s (known: %s)", ErrUnknownSoil, name, hint, strings.Join(names, ", "))
}

// editDistance returns the Levenshtein distance between a and b, in bytes
// (the preset names are ASCII).
func editDistance(a, b string) int {
	prev := make([]int, len(b)+1)
	cur := make([]int, len(b)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		for j := 1; j <= len(b); j++ {
			cost := 1
			if a[i-1] == b[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(b)]
}
