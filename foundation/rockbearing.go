package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Bounds of the K_sp method of RockPressure (Canadian Foundation
// Engineering Manual, 4th ed., 2006, §9.2, from memory; the same bounds are
// quoted with the formula in secondary sources): discontinuities at least
// 0.3 m apart, open at most 10 mm, a base at least 0.3 m wide; beyond
// c/B = 2 the coefficient is held at its value there.
const (
	minJointSpacing = 0.3 * units.Metre
	maxJointOpening = 10 * units.Millimetre
	minRockWidth    = 0.3 * units.Metre
	maxSpacingRatio = 2.0
)

// RockBearing is the allowable bearing pressure of a base on rock and
// where it comes from.
type RockBearing struct {
	// Allowable is the allowable bearing pressure q_a: it already holds the
	// method's margin and is compared with the peak contact pressure under
	// characteristic (unfactored) actions.
	Allowable units.Pressure
	// Ksp is the K_sp coefficient when the rock-mass method was used
	// (zero when the site's allowable pressure was), and Strength,
	// Spacing, Aperture and Width the q_u, joint spacing c, opening δ and
	// base width B it came from.
	Ksp               float64
	Strength          units.Pressure
	Spacing, Aperture units.Length
	Width             units.Length
	// Method names the source of Allowable.
	Method string
}

// Values returns the numbers behind the allowable pressure as check values.
func (r RockBearing) Values() []check.Value {
	if r.Ksp == 0 {
		return []check.Value{check.Of("q_a", "allowable bearing pressure on rock given by the site report", r.Allowable)}
	}
	return []check.Value{
		check.Of("q_u", "uniaxial compressive strength of intact rock cores", r.Strength),
		check.Of("c_j", "spacing of the rock's discontinuities", r.Spacing),
		check.Of("δ_j", "opening of the rock's discontinuities", r.Aperture),
		check.Of("B_r", "width of the base for the K_sp method", r.Width),
		check.Of("K_sp", "rock-mass coefficient of the K_sp method", units.Ratio(r.Ksp)),
		check.Of("q_a", "allowable bearing pressure on rock, K_sp q_u", r.Allowable),
	}
}

// RockPressure returns the allowable bearing pressure of a base of width b
// (its shorter side) on rock s: the site investigation's Allowable when
// given, otherwise the K_sp method of the Canadian Foundation Engineering
// Manual (4th ed., 2006, §9.2, from memory; the formula is also given in
// Wyllie, Foundations on Rock, and, as N_j, in IS 12070):
//
//	q_a = K_sp q_u,  K_sp = (3 + c/B) / (10 √(1 + 300 δ/c))
//
// with q_u the uniaxial compressive strength of intact rock cores
// (RockStrength), c the spacing (JointSpacing) and δ the opening
// (JointAperture) of the discontinuities. K_sp includes a factor of safety
// of about 3 against bearing failure of the rock mass, so q_a is an
// allowable pressure; c/B is held at 2 beyond its validity (cautious).
// Soil N-factors are never used on rock (common practice).
//
// Special cases: a soil that is not rock, rock with neither an allowable
// pressure nor q_u, a joint spacing under 0.3 m, an opening over 10 mm or a
// base narrower than 0.3 m (outside the method's range) give an error
// wrapping ErrInvalid.
func RockPressure(s Soil, b units.Length) (RockBearing, error) {
	if err := s.Validate(); err != nil {
		return RockBearing{}, err
	}
	if !s.IsRock {
		return RockBearing{}, invalid("Soil.IsRock", "is false: RockPressure is for rock")
	}
	if s.Allowable > 0 {
		return RockBearing{Allowable: s.Allowable, Method: "allowable bearing pressure on rock given by the site report"}, nil
	}
	if !(s.RockStrength > 0) {
		return RockBearing{}, invalid("Soil.Allowable", "is needed for a base on rock, or RockStrength with the joint spacing and aperture for the K_sp method")
	}
	if !(s.JointSpacing >= minJointSpacing) {
		return RockBearing{}, invalid("Soil.JointSpacing", "must be at least 0.3 m for the K_sp method; give an allowable pressure for closely jointed rock")
	}
	if !(s.JointAperture <= maxJointOpening) {
		return RockBearing{}, invalid("Soil.JointAperture", "must be at most 10 mm for the K_sp method")
	}
	if err := positive("width", float64(b)); err != nil {
		return RockBearing{}, err
	}
	if b < minRockWidth {
		return RockBearing{}, invalid("width", "must be at least 0.3 m for the K_sp method")
	}
	c, d := float64(s.JointSpacing), float64(s.JointAperture)
	ratio := math.Min(c/float64(b), maxSpacingRatio)
	ksp := (3 + ratio) / (10 * math.Sqrt(1+300*d/c))
	return RockBearing{
		Allowable: units.Pressure(ksp) * s.RockStrength, Ksp: ksp,
		Strength: s.RockStrength, Spacing: s.JointSpacing, Aperture: s.JointAperture, Width: b,
		Method: fmt.Sprintf("K_sp method of the Canadian Foundation Engineering Manual (2006) §9.2 (from memory): "+
			"q_a = K_sp q_u, K_sp %.3f from joint spacing %v, opening %v; includes a factor of safety of about 3", ksp, s.JointSpacing, s.JointAperture),
	}, nil
}
