package tower

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// StabilityFactors are the settings of Stability. A nil *StabilityFactors
// means all defaults.
type StabilityFactors struct {
	// Overturning is the required factor of safety against overturning;
	// zero means 2.0 (conventional global factor, common practice).
	Overturning float64
	// Sliding is the required factor of safety against sliding; zero means
	// 1.5 (conventional global factor, common practice).
	Sliding float64
	// Friction is the coefficient of friction tan δ at the footing base;
	// zero means 0.5 (concrete cast on granular soil, common practice,
	// from memory). Use tan φ' for concrete cast in place on the soil.
	Friction float64
	// AllowablePressure is the allowable contact pressure of the ground;
	// zero means none is checked and the peak pressure is reported as
	// information.
	AllowablePressure units.Pressure
}

func (sf *StabilityFactors) values() (fo, fs, mu float64, qa units.Pressure, err error) {
	fo, fs, mu = 2.0, 1.5, 0.5
	if sf == nil {
		return fo, fs, mu, 0, nil
	}
	if sf.Overturning != 0 {
		fo = sf.Overturning
	}
	if sf.Sliding != 0 {
		fs = sf.Sliding
	}
	if sf.Friction != 0 {
		mu = sf.Friction
	}
	if !finite(fo) || fo < 1 {
		return 0, 0, 0, 0, invalid("StabilityFactors.Overturning", sf.Overturning, "must be at least 1")
	}
	if !finite(fs) || fs < 1 {
		return 0, 0, 0, 0, invalid("StabilityFactors.Sliding", sf.Sliding, "must be at least 1")
	}
	if err := positive("StabilityFactors.Friction", units.Ratio(mu)); err != nil {
		return 0, 0, 0, 0, err
	}
	if err := nonNegative("StabilityFactors.AllowablePressure", sf.AllowablePressure); err != nil {
		return 0, 0, 0, 0, err
	}
	return fo, fs, mu, sf.AllowablePressure, nil
}

// Stability checks the tower on its footing and returns, in this order:
//
//	tower.overturning    resisting vs overturning moment about the critical toe
//	tower.sliding        base friction vs horizontal force
//	tower.base_pressure  peak contact pressure vs AllowablePressure
//	                     (information only when AllowablePressure is zero)
//	tower.base_resultant |e_b| vs L/2: the resultant stays inside the base
//
// Overturning is taken about each bottom edge (toe) of the footing in turn
// and the smaller factor governs. About the span-side toe (x = +L/2):
//
//	M_ovt = M_r + H_r·t                     (rope moment at the underside, when it turns toward the span)
//	M_res = Σ W_j (L/2 − x_j) + V_rope (L/2 − x_c)
//
// with the weights W_j (column, footing, backfill) at x_j and the rope
// vertical force V_rope = V_r − W_r on the column axis; mirrored about the
// other toe. Saddle offsets are inside M_r and so count as overturning
// (conservative). The rope vertical force is counted as resisting: it is a
// downward force from the same rope tension. Since M_res − M_ovt =
// V·L/2 − |M_b|, a provided factor below 1 means the resultant has left the
// base.
//
// Sliding: H_r against μ·V at the base, passive earth resistance on the
// footing ignored (conservative).
//
// Base pressure under V at eccentricity e_b = M_b/V on the footing L × B
// (rigid footing, no tension at the contact):
//
//	|e_b| ≤ L/6:         q_max,min = V/(B L) · (1 ± 6|e_b|/L)     (trapezoid)
//	L/6 < |e_b| < L/2:   q_max = 2V / (3 B (L/2 − |e_b|))          (triangle over 3(L/2 − |e_b|))
//	|e_b| ≥ L/2:         failure: the resultant lies outside the base
//
// (middle-third rule; standard foundation texts, e.g. Das, Principles of
// Foundation Engineering, eccentrically loaded foundations — from memory).
// Factors of safety are global, on the demand side (check.Stability).
//
// Special cases: a net vertical force ≤ 0 at the base gives ErrLiftOff;
// invalid geometry or factors give ErrInvalid.
func Stability(r Resultant, c Column, f Footing, sf *StabilityFactors) ([]check.Result, error) {
	if err := r.validate(); err != nil {
		return nil, err
	}
	if err := c.validate(); err != nil {
		return nil, err
	}
	if err := f.validate(c); err != nil {
		return nil, err
	}
	fo, fs, mu, qa, err := sf.values()
	if err != nil {
		return nil, err
	}
	l := f.loads(r, c)
	a := l.actions()
	v := float64(a.Vertical)
	if !finite(v) || !finite(float64(a.Moment)) || !finite(float64(a.Horizontal)) {
		return nil, invalid("Footing", f.Length, "gives base actions that are not finite (sizes or unit weights too large)")
	}
	if !(v > 0) {
		return nil, fmt.Errorf("tower: net vertical force at the footing base is %v (upward): the footing lifts: %w",
			a.Vertical, ErrLiftOff)
	}
	half := float64(f.Length) / 2
	out := make([]check.Result, 0, 4)

	// Overturning about each toe.
	type toe struct {
		name     string
		drv, res float64
	}
	toes := [2]toe{{name: "span-side toe"}, {name: "backstay-side toe"}}
	for k, sgn := range [2]float64{1, -1} {
		t := &toes[k]
		if m := sgn * l.ropeM; m > 0 {
			t.drv += m
		} else {
			t.res -= m
		}
		if arm := half - sgn*l.xc; l.ropeV >= 0 {
			t.res += l.ropeV * arm
		} else {
			t.drv -= l.ropeV * arm
		}
		for j, w := range l.weights {
			t.res += w * (half - sgn*l.weightArms[j])
		}
	}
	gov := toes[0]
	if toes[1].drv*toes[0].res > toes[0].drv*toes[1].res { // smaller res/drv governs
		gov = toes[1]
	}
	ot := check.Stability("tower.overturning", "Tower overturning on footing", units.KindMoment, gov.drv, gov.res, fo).
		WithBasis(fmt.Sprintf("moments about the %s: column, footing and backfill weights and rope vertical force resist, "+
			"rope horizontal forces overturn (statics); required factor %.2g (conventional global factor, common practice)", gov.name, fo)).
		WithValues(
			check.Of("M_ovt", "overturning moment about the "+gov.name, units.Moment(gov.drv)),
			check.Of("M_res", "resisting moment about the "+gov.name, units.Moment(gov.res)),
			check.Of("V", "vertical force at the footing base", a.Vertical),
			check.Of("H", "horizontal force at the footing base, toward the span", a.Horizontal),
			check.Of("M_b", "moment about the centre of the footing base", a.Moment),
		)
	out = append(out, ot)

	// Sliding.
	hAbs := math.Abs(l.h)
	sl := check.Stability("tower.sliding", "Tower sliding on footing base", units.KindForce, hAbs, mu*v, fs).
		WithBasis(fmt.Sprintf("base friction μV, μ = %.3g; passive resistance ignored (conservative); "+
			"required factor %.2g (conventional global factor, common practice)", mu, fs)).
		WithValues(
			check.Of("H", "horizontal force at the footing base, toward the span", units.Force(l.h)),
			check.Of("V", "vertical force at the footing base", a.Vertical),
			check.Of("μ", "base friction coefficient", units.Ratio(mu)),
		)
	out = append(out, sl)

	// Contact pressure.
	e := float64(a.Eccentricity())
	ae := math.Abs(e)
	bw, ll := float64(f.Width), float64(f.Length)
	const pbasis = "rigid footing, linear contact pressure with no tension (middle-third rule; " +
		"standard foundation texts, e.g. Das, Principles of Foundation Engineering, from memory)"
	var bp check.Result
	switch {
	case ae >= half:
		bp = check.Result{ID: "tower.base_pressure", Title: "Footing contact pressure", Kind: units.KindPressure,
			Capacity: float64(qa), Ratio: math.Inf(1), Status: check.Fail, Basis: pbasis}.
			WithValues(check.Of("e_b", "eccentricity of the base resultant, toward the span", units.Length(e))).
			WithNote("the resultant lies outside the footing base: no contact pressure can balance it; the tower overturns")
	default:
		var qmax, qmin, contact float64
		var shape string
		if ae <= ll/6 {
			qmax = v / (bw * ll) * (1 + 6*ae/ll)
			qmin = v / (bw * ll) * (1 - 6*ae/ll)
			contact = ll
			shape = "trapezoidal contact pressure"
		} else {
			qmax = 2 * v / (3 * bw * (half - ae))
			contact = 3 * (half - ae)
			shape = "triangular contact pressure over part of the base (resultant outside the kern)"
		}
		if qa > 0 {
			bp = check.Compare("tower.base_pressure", "Footing contact pressure", units.KindPressure, qmax, float64(qa))
		} else {
			bp = check.Record("tower.base_pressure", "Footing contact pressure", units.KindPressure, qmax)
		}
		bp = bp.WithBasis(pbasis).WithNote(shape).WithValues(
			check.Of("V", "vertical force at the footing base", a.Vertical),
			check.Of("e_b", "eccentricity of the base resultant, toward the span", units.Length(e)),
			check.Of("q_max", "largest contact pressure", units.Pressure(qmax)),
			check.Of("q_min", "least contact pressure", units.Pressure(qmin)),
			check.Of("L_c", "length of the base in contact", units.Length(contact)),
		)
	}
	out = append(out, bp)

	br := check.Compare("tower.base_resultant", "Resultant within footing base", units.KindLength, ae, half).
		WithBasis("eccentricity of the base resultant against half the footing length (statics)").
		WithValues(
			check.Of("e_b", "eccentricity of the base resultant, toward the span", units.Length(e)),
			check.Of("L/6", "kern of the footing base", units.Length(ll/6)),
		).WithNote(fmt.Sprintf("e_b = %v %s", units.Length(ae), sideOf(e)))
	out = append(out, br)
	return out, nil
}
