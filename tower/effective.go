package tower

import (
	"fmt"
	"math"
)

// DefaultBaseFlexibility is the relative flexibility k of a tower column's
// base restraint used when none is given: 0.1, the minimum EN 1992-1-1:2004
// 5.8.3.2(3) recommends for any end restraint ("rigid fixity is rare in
// practice"). A column cast into a footing that rests on the ground turns
// with it; the ground's own rotation is not computed (on soft ground the
// flexibility is larger: give it).
const DefaultBaseFlexibility = 0.1

// EffectiveLengthFactor returns l0/l, the ratio of the effective (buckling)
// length to the length l of a column whose base is held by a rotational
// spring of relative flexibility k and whose top is free to rotate and held
// sideways by a lateral spring of relative stiffness s:
//
//	k = (θ/M)·(EI/l)      at the base (EN 1992-1-1:2004 5.8.3.2(3)): 0 rigid
//	s = K·l³/EI            at the top: 0 free (a cantilever), +Inf held rigidly
//
// With u = l·√(N/EI) and r = 1/k, the critical load is the least u > 0 at
// which the equations of the elastic column (EI y”” + N y” = 0;
// y(0) = 0, EI y”(0) = (EI/(k l)) y'(0), y”(l) = 0,
// EI y”'(l) + N y'(l) = K y(l)) have a non-zero solution:
//
//	s sin u + u cos u (u² − s) − k u² sin u (u² − s) = 0      (finite s)
//	sin u − u cos u + k u² sin u = 0                          (s = +Inf)
//
// and l0/l = π/u (Timoshenko & Gere ch. 2 for the column on elastic
// supports). Limits: k = 0, s = 0 gives 2 (the cantilever); k = 0,
// s = +Inf gives 0.699 (fixed base, pinned top held); k = 0.1 gives 2.20
// and 0.76, which EN 1992-1-1 eq. 5.16 and 5.15 approximate by 2.18 and
// 0.77. Special cases: k and s must be ≥ 0 (k finite, at most 100); otherwise
// ErrInvalid.
func EffectiveLengthFactor(k, s float64) (float64, error) {
	if !finite(k) || k < 0 || k > 100 {
		return 0, invalid("base flexibility k", k, "must lie between 0 and 100")
	}
	if math.IsNaN(s) || s < 0 {
		return 0, invalid("top spring s", s, "must be zero, positive or +Inf")
	}
	f := func(u float64) float64 {
		su, cu := math.Sincos(u)
		if math.IsInf(s, 1) {
			return su - u*cu + k*u*u*su
		}
		return s*su + u*cu*(u*u-s) - k*u*u*su*(u*u-s)
	}
	// f > 0 just above u = 0 (f ≈ u³(1 + s/3 + k s) for finite s); the least
	// root lies below 4.4934, the root for a rigid base and a held top.
	const steps, top = 450, 4.5 // a step of 0.01: the roots lie about π apart
	lo, flo := 1e-6, f(1e-6)
	for i := 1; i <= steps; i++ {
		hi := top * float64(i) / steps
		fhi := f(hi)
		if (flo > 0) != (fhi > 0) || fhi == 0 {
			for range 60 {
				mid := (lo + hi) / 2
				if fm := f(mid); (fm > 0) == (flo > 0) && fm != 0 {
					lo, flo = mid, fm
				} else {
					hi = mid
				}
			}
			return math.Pi / ((lo + hi) / 2), nil
		}
		lo, flo = hi, fhi
	}
	return 0, fmt.Errorf("tower: no buckling load found for base flexibility %g and top spring %g: %w", k, s, ErrUnsupported)
}
