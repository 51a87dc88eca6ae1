package sagspan

import (
	"errors"
	"math"
	"strings"

	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// maxSoilUnitWeight bounds a soil's or rock's unit weight: the densest
// rocks weigh about 30 kN/m³ (common practice); beyond is a unit slip.
const maxSoilUnitWeight = 35 * units.KilonewtonPerCubicMetre

// soil returns the ground the spec describes: its preset with every field
// given replacing the preset's value (a zero counts), or the site's own
// parameters. Errors are *FieldError values whose Field is relative to the
// spec ("cohesion").
func (s SoilSpec) soil() (foundation.Soil, error) {
	var soil foundation.Soil
	var given []string
	if s.Preset != "" {
		p, err := foundation.LookupSoil(s.Preset)
		if err != nil {
			return foundation.Soil{}, &FieldError{Field: "preset", Err: err}
		}
		soil = p
	} else {
		soil = foundation.Soil{Name: "site soil", Source: "the site investigation, as given in the bridge description"}
		rock := s.IsRock != nil && *s.IsRock
		if s.UnitWeight == nil {
			return foundation.Soil{}, fieldErr("unit_weight", "is missing: without a preset give unit_weight, friction (φ') and, for a clay, undrained_strength (c_u); or name a preset")
		}
		if s.Friction == nil && !rock {
			return foundation.Soil{}, fieldErr("friction", "is missing: without a preset give the drained friction angle φ' (and undrained_strength for a clay); or name a preset")
		}
	}
	if s.IsRock != nil {
		soil.IsRock = *s.IsRock
		given = append(given, "rock")
		if !soil.IsRock {
			soil.GroutBond = 0
		}
	}
	if s.UnitWeight != nil {
		soil.UnitWeight, soil.Submerged = *s.UnitWeight, 0
		given = append(given, "unit_weight")
	}
	if s.Submerged != nil && s.Saturated != nil {
		return foundation.Soil{}, fieldErr("saturated_unit_weight", "give either submerged_unit_weight (γ') or saturated_unit_weight (γsat), not both")
	}
	if s.Submerged != nil {
		soil.Submerged = *s.Submerged
		given = append(given, "submerged_unit_weight")
	}
	if s.Saturated != nil {
		soil.Submerged = *s.Saturated - foundation.WaterUnitWeight
		given = append(given, "saturated_unit_weight")
	}
	override(&soil.Friction, s.Friction, "friction", &given)
	override(&soil.Cohesion, s.Cohesion, "cohesion", &given)
	override(&soil.Undrained, s.Undrained, "undrained_strength", &given)
	override(&soil.Interface, s.Interface, "interface", &given)
	override(&soil.Allowable, s.Allowable, "allowable_bearing", &given)
	override(&soil.RockStrength, s.RockStrength, "rock_strength", &given)
	override(&soil.JointSpacing, s.JointSpacing, "joint_spacing", &given)
	override(&soil.JointAperture, s.JointAperture, "joint_aperture", &given)
	if s.Preset != "" && len(given) > 0 {
		soil.Source += "; overridden in the bridge description: " + strings.Join(given, ", ")
	}
	if err := s.check(soil); err != nil {
		return foundation.Soil{}, err
	}
	return soil, nil
}

// check returns a *FieldError naming the first field of the resolved soil
// that is out of range, in the spec's own terms.
func (s SoilSpec) check(soil foundation.Soil) error {
	switch g := soil.UnitWeight; {
	case !(g > 0) || math.IsInf(float64(g), 0):
		return fieldErr("unit_weight", "must be a positive unit weight such as \"19 kN/m3\", got %s", g)
	case g > maxSoilUnitWeight:
		return fieldErr("unit_weight", "%s is heavier than any soil or rock (at most %s): a unit slip?", g, maxSoilUnitWeight)
	case g <= foundation.WaterUnitWeight && soil.Submerged == 0:
		return fieldErr("unit_weight", "%s is not more than water's 9.81 kN/m³: give submerged_unit_weight, or check the unit", g)
	}
	if s.Saturated != nil && !(*s.Saturated > foundation.WaterUnitWeight) {
		return fieldErr("saturated_unit_weight", "%s must exceed water's 9.81 kN/m³", *s.Saturated)
	}
	if soil.Submerged < 0 || math.IsNaN(float64(soil.Submerged)) {
		return fieldErr("submerged_unit_weight", "must be positive, got %s", soil.Submerged)
	}
	if soil.Submerged >= soil.UnitWeight {
		f := "submerged_unit_weight"
		if s.Saturated != nil {
			f = "saturated_unit_weight"
		}
		return fieldErr(f, "γ' = %s is not less than the unit weight γ = %s: the effective weight below the water is γsat − 9.81 kN/m³",
			soil.Submerged, soil.UnitWeight)
	}
	if !(soil.Friction >= 0 && soil.Friction <= 50*units.Degree) {
		return fieldErr("friction", "must be between 0 and 50 deg, got %s", soil.Friction)
	}
	if !soil.IsRock && soil.Friction == 0 {
		return fieldErr("friction", "%s is not a drained friction angle: every footing and anchor is checked in the long-term (drained) condition with φ'; "+
			"for a clay's short-term strength give undrained_strength (c_u) as well, which is checked besides", soil.Friction)
	}
	for _, x := range []struct {
		f string
		v units.Pressure
	}{{"cohesion", soil.Cohesion}, {"undrained_strength", soil.Undrained}, {"allowable_bearing", soil.Allowable}, {"rock_strength", soil.RockStrength}} {
		if x.v < 0 || math.IsNaN(float64(x.v)) || math.IsInf(float64(x.v), 0) {
			return fieldErr(x.f, "must not be negative, got %s", x.v)
		}
	}
	for _, x := range []struct {
		f string
		v units.Length
	}{{"joint_spacing", soil.JointSpacing}, {"joint_aperture", soil.JointAperture}} {
		if x.v < 0 || math.IsNaN(float64(x.v)) || math.IsInf(float64(x.v), 0) {
			return fieldErr(x.f, "must not be negative, got %s", x.v)
		}
	}
	if !(soil.Interface >= 0 && soil.Interface <= 1) {
		return fieldErr("interface", "must be the ratio δ/φ' between 0 and 1, got %v", soil.Interface)
	}
	if soil.IsRock && soil.Undrained > 0 {
		return fieldErr("undrained_strength", "rock has no undrained strength; remove it or set rock to false")
	}
	if !soil.IsRock {
		for _, x := range []struct {
			f     string
			given bool
		}{{"rock_strength", soil.RockStrength > 0}, {"joint_spacing", soil.JointSpacing > 0}, {"joint_aperture", soil.JointAperture > 0}} {
			if x.given {
				return fieldErr(x.f, "applies to rock only; set rock to true or remove it")
			}
		}
	}
	if soil.IsRock && soil.Allowable == 0 {
		if soil.RockStrength == 0 {
			return fieldErr("allowable_bearing", "is missing: the footing on rock needs an allowable bearing pressure from the site investigation, "+
				"or rock_strength, joint_spacing and joint_aperture for the K_sp method (soil bearing theory is never used on rock)")
		}
		if soil.JointSpacing < 0.3*units.Metre {
			return fieldErr("joint_spacing", "must be at least 0.3 m for the K_sp method, got %s; give allowable_bearing for closely jointed rock", soil.JointSpacing)
		}
		if soil.JointAperture > 10*units.Millimetre {
			return fieldErr("joint_aperture", "must be at most 10 mm for the K_sp method, got %s", soil.JointAperture)
		}
	}
	if _, err := s.method(); err != nil {
		return err
	}
	if err := soil.Validate(); err != nil { // a backstop: every case is named above
		return fieldErr("", "%v", err)
	}
	return nil
}

// bearingMethods maps the names a description may give to the methods.
var bearingMethods = map[string]foundation.Method{
	"":                  foundation.EC7,
	"en 1997-1 annex d": foundation.EC7,
	"annex d":           foundation.EC7,
	"ec7":               foundation.EC7,
	"vesic":             foundation.Vesic,
	"vesić":             foundation.Vesic,
	"hansen":            foundation.Hansen,
}

// method returns the bank's bearing-capacity method.
func (s SoilSpec) method() (foundation.Method, error) {
	m, ok := bearingMethods[strings.ToLower(strings.TrimSpace(s.BearingMethod))]
	if !ok {
		return 0, fieldErr("bearing_method", "unknown method %q; want \"EN 1997-1 Annex D\" (default), \"Vesic\" or \"Hansen\"", s.BearingMethod)
	}
	return m, nil
}

// soilField prefixes a soil spec's field error with the bank's soil path.
func soilField(bank string, err error) error {
	var fe *FieldError
	if errors.As(err, &fe) {
		f := bank + ".soil"
		if fe.Field != "" {
			f += "." + fe.Field
		}
		return &FieldError{Field: f, Err: fe.Err}
	}
	return fieldErr(bank+".soil", "%v", err)
}

// terminations are the rope terminations a description may name, with
// their efficiency k_e (EN 13411 family, from memory; common practice).
var terminations = map[string]float64{"grips": 0.80, "ferrule": 0.90, "socket": 1.0}

// efficiency returns the rope termination's efficiency.
func (a AttachmentSpec) efficiency() (float64, error) {
	if a.Efficiency != 0 {
		if a.Termination != "" {
			return 0, fieldErr("efficiency", "give either termination or efficiency, not both")
		}
		if !(a.Efficiency > 0 && a.Efficiency <= 1) {
			return 0, fieldErr("efficiency", "must lie in (0, 1], got %v", a.Efficiency)
		}
		return a.Efficiency, nil
	}
	k, ok := terminations[strings.ToLower(strings.TrimSpace(a.Termination))]
	if !ok {
		return 0, fieldErr("termination", "unknown termination %q; want grips, ferrule or socket, or give efficiency", a.Termination)
	}
	return k, nil
}

// groutBond returns the grout–rock bond of a rock anchor: the anchor's
// own, or its rock preset's.
func (a AnchorSpec) groutBond(soil foundation.Soil) units.Pressure {
	if a.GroutBond != nil {
		return *a.GroutBond
	}
	return soil.GroutBond
}

// override sets *dst to *src when the description gives the field (src not
// nil, whatever its value: a given zero counts) and records its name.
func override[T any](dst *T, src *T, name string, given *[]string) {
	if src != nil {
		*dst = *src
		*given = append(*given, name)
	}
}
