package cable

import "math"

// This file holds the numerically careful building blocks shared by the
// shapes: differences of nearly equal transcendental values computed
// without cancellation, and a bracketed Newton solver.

// sqrt1p returns √(1+s²), without overflow for huge s.
func sqrt1p(s float64) float64 {
	if math.Abs(s) < 1e150 {
		return math.Sqrt(1 + s*s)
	}
	return math.Hypot(1, s)
}

// asinh returns the inverse hyperbolic sine of x: a series below 0.01 in
// magnitude (error < 1e-19 relative), ln(x + √(1+x²)) above (math.Log is
// much faster than the math.Log1p that math.Asinh uses for |x| < 2, and
// for |x| ≥ 0.01 the argument is at least 1.01, so no precision is lost
// beyond a few ulps).
func asinh(x float64) float64 {
	ax := math.Abs(x)
	var r float64
	switch {
	case ax < 0.01:
		x2 := ax * ax
		r = ax * (1 + x2*(-1.0/6+x2*(3.0/40+x2*(-15.0/336+x2*105.0/3456))))
	case ax < 1e150:
		r = math.Log(ax + math.Sqrt(1+ax*ax))
	default:
		r = math.Asinh(ax)
	}
	if x < 0 {
		return -r
	}
	return r
}

// asinhDiff returns asinh(s1) − asinh(s0) without cancellation, where
// d = s1 − s0 is passed separately because callers know it more exactly
// than the difference of the rounded s1 and s0 (s0, s1 may be huge and d
// small):
//
//	asinh s1 − asinh s0 = asinh(s1√(1+s0²) − s0√(1+s1²))
//	s1√(1+s0²) − s0√(1+s1²) = d (s1+s0)/(s1√(1+s0²) + s0√(1+s1²))  (same signs)
func asinhDiff(s1, s0, d float64) float64 {
	a0, a1 := sqrt1p(s0), sqrt1p(s1)
	if s0*s1 <= 0 {
		return asinh(s1*a0 - s0*a1)
	}
	return asinh(d * (s1 + s0) / (s1*a0 + s0*a1))
}

// arcMean returns the mean of √(1+s²) over s in [s0, s1], d = s1 − s0
// (see asinhDiff for why d is passed):
//
//	(1/d) ∫ √(1+s²) ds = ½[(a1+a0)/2 + (s1+s0)²/(2(a1+a0))] + ½ (asinh s1 − asinh s0)/d
//
// with a = √(1+s²), written so that it stays accurate as d → 0, where it
// tends to √(1+s0²).
func arcMean(s0, s1, d float64) float64 {
	a0, a1 := sqrt1p(s0), sqrt1p(s1)
	sum := s1 + s0
	first := (a1+a0)/2 + sum*sum/(2*(a1+a0))
	return (first + asinhSlope(s0, s1, a0, a1, d)) / 2
}

// asinhSlope returns (asinh s1 − asinh s0)/d, d = s1 − s0, a = √(1+s²),
// without cancellation: the difference taken by the asinh addition
// formula, its small-argument series near d = 0, and 1/a0 at d = 0 (the
// derivative).
func asinhSlope(s0, s1, a0, a1, d float64) float64 {
	switch {
	case d == 0:
		return 1 / a0
	case s0*s1 <= 0:
		return asinh(s1*a0-s0*a1) / d
	}
	sum := s0 + s1
	x := d * sum / (s1*a0 + s0*a1)
	if math.Abs(x) < 1e-8 {
		return sum / (s1*a0 + s0*a1) * (1 - x*x/6)
	}
	return asinh(x) / d
}

// lnSinh returns ln(sinh x) for x > 0 without overflow.
func lnSinh(x float64) float64 {
	if x > 20 {
		return x - math.Ln2 + math.Log1p(-math.Exp(-2*x))
	}
	return math.Log(math.Sinh(x))
}

// sinhcm1 returns sinh(x)/x − 1 accurately for small x.
func sinhcm1(x float64) float64 {
	if math.Abs(x) < 0.5 {
		x2 := x * x
		// Σ x^(2j)/(2j+1)!, j = 1..8, in Horner form
		return x2 * (1.0/6 + x2*(1.0/120+x2*(1.0/5040+x2*(1.0/362880+x2*(1.0/39916800+
			x2*(1.0/6227020800+x2*(1.0/1307674368000+x2*(1.0/355687428096000))))))))
	}
	return math.Sinh(x)/x - 1
}

// cothMinusInv returns coth(x) − 1/x accurately for small x.
func cothMinusInv(x float64) float64 {
	if math.Abs(x) < 0.5 {
		x2 := x * x
		// x/3 − x³/45 + 2x⁵/945 − x⁷/4725 + 2x⁹/93555
		return x * (1.0/3 + x2*(-1.0/45+x2*(2.0/945+x2*(-1.0/4725+x2*2.0/93555))))
	}
	return 1/math.Tanh(x) - 1/x
}

// newtonBracket finds a root of the increasing function g on [lo, hi],
// where g(lo) < 0 < g(hi) (not checked; either bound may be infinite),
// starting from x, taking Newton steps and bisecting whenever a step leaves
// the bracket. While a side of the bracket is open, steps are limited to 1
// (a factor e when x is a logarithm). It stops when a step or the bracket
// is smaller than tol (absolute, in x). ok is false after maxIter steps
// without convergence or on a NaN.
func newtonBracket(g func(x float64) (v, dv float64), lo, hi, x, tol float64, maxIter int) (root float64, ok bool) {
	for i := 0; i < maxIter; i++ {
		v, dv := g(x)
		if v == 0 {
			return x, true
		}
		if math.IsNaN(v) {
			return x, false
		}
		if v < 0 {
			lo = x
		} else {
			hi = x
		}
		xn := x - v/dv
		if math.IsInf(lo, -1) || math.IsInf(hi, 1) {
			if !(xn > lo && xn < hi) || math.Abs(xn-x) > 1 {
				if v > 0 {
					xn = x - 1
				} else {
					xn = x + 1
				}
			}
		} else if !(xn > lo && xn < hi) {
			xn = lo + (hi-lo)/2
		}
		if math.Abs(xn-x) <= tol || hi-lo <= tol {
			return xn, true
		}
		x = xn
	}
	return x, false
}

// newtonPositive finds the root x > 0 of the increasing function g by
// Newton's method from x, safeguarded by the bracket the iterates build:
// a step leaving it bisects the bracket, or halves or doubles x while the
// bracket is still open on that side. It stops when a step is below tol
// relative to x. ok is false after maxIter steps or on a NaN.
func newtonPositive(g func(x float64) (v, dv float64), x, tol float64, maxIter int) (root float64, ok bool) {
	lo, hi := 0.0, math.Inf(1)
	for i := 0; i < maxIter; i++ {
		v, dv := g(x)
		if v == 0 {
			return x, true
		}
		if math.IsNaN(v) {
			return x, false
		}
		if v < 0 {
			lo = x
		} else {
			hi = x
		}
		xn := x - v/dv
		if !(xn > lo && xn < hi) {
			switch {
			case math.IsInf(hi, 1):
				xn = 2 * x
			case lo == 0:
				xn = x / 2
			default:
				xn = lo + (hi-lo)/2
			}
		}
		if math.Abs(xn-x) <= tol*xn || hi-lo <= tol*xn {
			return xn, finite(xn)
		}
		x = xn
	}
	return x, false
}

// cubicRoot returns the positive root of H³ + b H² − k = 0 (k > 0), the
// form of the classical change-of-state equation, by Newton's method from
// the upper bound max(0, −b) + ∛k, where the cubic is increasing and convex
// so the iteration descends monotonically onto the root.
func cubicRoot(b, k float64) float64 {
	h := math.Max(0, -b) + math.Cbrt(k)
	for i := 0; i < 200; i++ {
		f := h*h*(h+b) - k
		df := h * (3*h + 2*b)
		if df <= 0 {
			break
		}
		hn := h - f/df
		if !(hn < h) {
			break
		}
		if h-hn <= 1e-15*h {
			return hn
		}
		h = hn
	}
	return h
}
