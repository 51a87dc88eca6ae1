package tower

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// EccentricityLimit sets the allowed eccentricity of the resultant at the
// column base section. A nil *EccentricityLimit means the kern.
//
//	e_allowed = Fraction · d_eff/2 + Offset
//
// The kern of a rectangle (no tension anywhere on the section) is
// Fraction = 1/3, Offset = 0, i.e. d_eff/6.
type EccentricityLimit struct {
	// Fraction of the half effective depth d_eff/2; zero means 1/3 (the kern).
	Fraction float64
	// Offset added to the limit, for instance a base plinth projecting
	// beyond the column face; may be negative to tighten the limit.
	Offset units.Length
}

// allowed returns the allowed eccentricity and a description of the rule.
func (l *EccentricityLimit) allowed(deff units.Length) (units.Length, string, error) {
	if l == nil {
		return deff / 6, "kern of the effective rectangle, d_eff/6 (no tension on the section)", nil
	}
	f := l.Fraction
	if f == 0 {
		f = 1.0 / 3
	}
	if !finite(f) || f < 0 || f > 1 {
		return 0, "", invalid("EccentricityLimit.Fraction", l.Fraction, "must lie between 0 and 1")
	}
	if err := isFinite("EccentricityLimit.Offset", l.Offset); err != nil {
		return 0, "", err
	}
	a := units.Length(f)*deff/2 + l.Offset
	if a <= 0 {
		return 0, "", invalid("EccentricityLimit", *l, "gives an allowed eccentricity of zero or less")
	}
	return a, fmt.Sprintf("user limit %.3g × d_eff/2 + %v", f, l.Offset), nil
}

// EccentricityCheck checks the eccentricity of the resultant at the column
// base section against an allowed limit, with no factor of safety:
//
//	e = M / V       (Combine; for one level e = y·tan θ)
//	|e| ≤ e_allowed (kern d_eff/6 by default, see EccentricityLimit)
//
// The column's own weight (Column.Weight, on the axis) replaces whatever
// self-weight r carries, so the check does not depend on what was passed to
// Combine. The effective depth excludes the facing on both faces along the
// bridge (d_eff = Depth − 2·Facing). The kern d/6 of a rectangle is the
// middle-third rule of elementary bending theory (σ = N/A ± M/W with
// W = b d²/6 stays compressive for e ≤ d/6; common practice for masonry and
// plain-concrete piers). The eccentricity may lie toward the span or toward
// the backstay; the check compares its magnitude and the note says which.
//
// The result has ID "tower.eccentricity", kind length, demand |e|,
// capacity e_allowed. Special cases: a net vertical force ≤ 0 gives
// ErrLiftOff; invalid column or limit gives ErrInvalid.
func EccentricityCheck(r Resultant, c Column, limit *EccentricityLimit) (check.Result, error) {
	if err := r.validate(); err != nil {
		return check.Result{}, err
	}
	if err := c.validate(); err != nil {
		return check.Result{}, err
	}
	rc, err := r.withSelfWeight(c.Weight())
	if err != nil {
		return check.Result{}, err
	}
	deff := c.EffectiveDepth()
	allowed, rule, err := limit.allowed(deff)
	if err != nil {
		return check.Result{}, err
	}
	e := float64(rc.BaseOffset)
	res := check.Compare("tower.eccentricity", "Resultant eccentricity at column base",
		units.KindLength, math.Abs(e), float64(allowed)).
		WithBasis("e = ΣM/ΣV at the base section by statics; limit: " + rule +
			"; middle-third rule of elementary bending theory (common practice); no factor of safety").
		WithNote(fmt.Sprintf("e = %v %s; resultant %.2f deg from vertical (rope forces alone %.2f deg); V = %v incl. column weight %v",
			units.Length(math.Abs(e)), sideOf(e), rc.Angle.Degrees(), rc.RopeAngle.Degrees(), rc.Vertical, rc.SelfWeight))
	if c.Facing > 0 {
		res = res.WithNote(fmt.Sprintf("effective depth %v = %v − 2 × %v facing", deff, c.Depth, c.Facing))
	}
	return res, nil
}

// sideOf names the side of the column axis a signed offset lies on.
func sideOf(x float64) string {
	switch {
	case x > 0:
		return "toward the span"
	case x < 0:
		return "toward the backstay"
	}
	return "on the axis"
}
