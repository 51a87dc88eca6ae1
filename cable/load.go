package cable

import (
	"github.com/sagspan/sagspan/units"
)

// Patch is a load uniform per horizontal metre over [From, To], measured
// from support A, on top of the uniform load: a crowd on part of the span.
type Patch struct {
	From, To units.Length
	Load     units.LoadPerLength
}

// Load is a vertical load per horizontal metre: a uniform part over the
// whole span plus patches.
type Load struct {
	Uniform units.LoadPerLength
	Patches []Patch
}

// Total returns the resultant of l over the span s: U·L + Σ pᵢ (bᵢ − aᵢ),
// each patch clipped to the span.
func (l Load) Total(s Span) units.Force {
	L := float64(s.Length)
	t := float64(l.Uniform) * L
	for _, p := range l.Patches {
		a, b := clampX(float64(p.From), L), clampX(float64(p.To), L)
		if b > a {
			t += float64(p.Load) * (b - a)
		}
	}
	return units.Force(t)
}

// Validate returns an error wrapping ErrInvalid unless the uniform load
// and every patch load are finite and not negative, every patch lies within
// [0, L] with From < To, and the total is positive.
func (l Load) Validate(s Span) error {
	if err := s.Validate(); err != nil {
		return err
	}
	if err := nonNegative("uniform load", float64(l.Uniform)); err != nil {
		return err
	}
	L := float64(s.Length)
	for i, p := range l.Patches {
		if err := nonNegative("patch load", float64(p.Load)); err != nil {
			return err
		}
		a, b := float64(p.From), float64(p.To)
		if !finite(a) || !finite(b) || a < 0 || b > L*(1+1e-12) || !(a < b) {
			return invalidf("load patch %d spans [%g, %g] m, which is not a positive stretch within the span [0, %g] m", i, a, b, L)
		}
	}
	if t := float64(l.Total(s)); !(t > 0) || !finite(t) {
		return invalidf("total load must be positive and finite, got %g N", t)
	}
	return nil
}

// beam holds the simply-supported beam quantities of a load on a span.
type beam struct {
	l, u, ra float64
	patches  []Patch
}

func newBeam(s Span, ld Load) beam {
	L := float64(s.Length)
	b := beam{l: L, u: float64(ld.Uniform), patches: ld.Patches}
	b.ra = b.u * L / 2
	for _, p := range ld.Patches {
		a, e := clampX(float64(p.From), L), clampX(float64(p.To), L)
		P := float64(p.Load) * (e - a)
		b.ra += P * (L - (a+e)/2) / L
	}
	return b
}

// shear returns the beam shear Q(x) = R_A − ∫₀ˣ q.
func (b beam) shear(x float64) float64 {
	q := b.ra - b.u*x
	for _, p := range b.patches {
		a, e := clampX(float64(p.From), b.l), clampX(float64(p.To), b.l)
		q -= float64(p.Load) * (clampX(x, e) - clampX(x, a))
	}
	return q
}

// moment returns the beam moment M(x) = R_A x − ∫₀ˣ q(ξ)(x − ξ) dξ.
func (b beam) moment(x float64) float64 {
	m := b.ra*x - b.u*x*x/2
	for _, p := range b.patches {
		a, e := clampX(float64(p.From), b.l), clampX(float64(p.To), b.l)
		switch {
		case x <= a:
		case x < e:
			m -= float64(p.Load) * (x - a) * (x - a) / 2
		default:
			m -= float64(p.Load) * (e - a) * (x - (a+e)/2)
		}
	}
	return m
}

// breaks returns the sorted abscissae where the load intensity may change,
// including 0 and L, in buf when it is large enough.
func (b beam) breaks(buf []float64) []float64 {
	xs := append(buf[:0], 0, b.l)
	for _, p := range b.patches {
		xs = append(xs, clampX(float64(p.From), b.l), clampX(float64(p.To), b.l))
	}
	// insertion sort: few points
	for i := 1; i < len(xs); i++ {
		for j := i; j > 0 && xs[j] < xs[j-1]; j-- {
			xs[j], xs[j-1] = xs[j-1], xs[j]
		}
	}
	return xs
}

// shearSquared returns D = ∫₀ᴸ Q² dx, exact for piecewise-linear Q.
func (b beam) shearSquared() float64 {
	var buf [16]float64
	xs := b.breaks(buf[:])
	d := 0.0
	for i := 1; i < len(xs); i++ {
		dx := xs[i] - xs[i-1]
		if dx <= 0 {
			continue
		}
		q0, q1 := b.shear(xs[i-1]), b.shear(xs[i])
		d += dx * (q0*q0 + q0*q1 + q1*q1) / 3
	}
	return d
}

// arcLength returns ∫₀ᴸ √(1 + z'²) dx with z' = c₀ − Q/H, exact on each
// piece where the load is uniform.
func (b beam) arcLength(c0, h float64) float64 {
	var buf [16]float64
	xs := b.breaks(buf[:])
	s := 0.0
	for i := 1; i < len(xs); i++ {
		dx := xs[i] - xs[i-1]
		if dx <= 0 {
			continue
		}
		q0, q1 := b.shear(xs[i-1]), b.shear(xs[i])
		s += dx * arcMean(c0-q0/h, c0-q1/h, (q0-q1)/h)
	}
	return s
}

// sections returns the break points of the load (see breaks) and the shear
// at each, in the buffers when they are large enough.
func (b beam) sections(xbuf, qbuf []float64) (xs, qs []float64) {
	xs = b.breaks(xbuf)
	qs = qbuf[:0]
	for _, x := range xs {
		qs = append(qs, b.shear(x))
	}
	return xs, qs
}

// arcLengthDH returns, for the load of sections xs, qs, the arc length
// arcLength(c0, H) and its derivative in H:
//
//	dS/dH = (1/H) ∫ p (c₀ − p)/√(1+p²) dx,  p = c₀ − Q/H
//
// both integrated exactly on each piece with the cancellation-free
// differences (one asinh per piece serves both).
func arcLengthDH(xs, qs []float64, c0, h float64) (length, deriv float64) {
	for i := 1; i < len(xs); i++ {
		dx := xs[i] - xs[i-1]
		if dx <= 0 {
			continue
		}
		p0, p1 := c0-qs[i-1]/h, c0-qs[i]/h
		a0, a1 := sqrt1p(p0), sqrt1p(p1)
		sum := p0 + p1
		// means over [p0, p1] of √(1+p²), p/√(1+p²) and p²/√(1+p²)
		first := (a1+a0)/2 + sum*sum/(2*(a1+a0))
		asm := asinhSlope(p0, p1, a0, a1, p1-p0)
		meanP := sum / (a0 + a1)
		length += dx * (first + asm) / 2
		deriv += dx * (c0*meanP - (first-asm)/2)
	}
	return length, deriv / h
}
