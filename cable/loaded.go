package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// Loaded is an inextensible cable (a funicular polygon in the limit) under
// a general Load per horizontal metre with horizontal tension H:
//
//	z(x) = (h/L) x − M(x)/H,   z'(x) = h/L − Q(x)/H
//	V_A  = Q(0) − H h/L,       V_B = H h/L − Q(L)
//
// where M and Q are the moment and shear of a simply-supported beam of span
// L under the same load (the general cable theorem; standard
// structural-analysis texts). Under a uniform load it coincides with
// Parabola.
type Loaded struct {
	span Span
	load Load
	h    float64
	b    beam
}

// NewLoaded returns the cable over s under load l with horizontal tension
// h. The patches are copied.
func NewLoaded(s Span, l Load, h units.Force) (Loaded, error) {
	if err := l.Validate(s); err != nil {
		return Loaded{}, err
	}
	if err := positive("horizontal tension", float64(h)); err != nil {
		return Loaded{}, err
	}
	l.Patches = append([]Patch(nil), l.Patches...)
	return newLoaded(s, l, float64(h))
}

// LoadedWithSag returns the cable over s under load l hanging with sag
// below the chord at midspan: H = M(L/2)/f.
func LoadedWithSag(s Span, l Load, sag units.Length) (Loaded, error) {
	if err := l.Validate(s); err != nil {
		return Loaded{}, err
	}
	if err := positive("sag", float64(sag)); err != nil {
		return Loaded{}, err
	}
	l.Patches = append([]Patch(nil), l.Patches...)
	b := newBeam(s, l)
	h := b.moment(float64(s.Length)/2) / float64(sag)
	if !(h > 0) || !finite(h) {
		return Loaded{}, invalidf("load gives no positive moment at midspan, so no sag there")
	}
	return newLoaded(s, l, h)
}

func newLoaded(s Span, l Load, h float64) (Loaded, error) {
	c := Loaded{span: s, load: l, h: h, b: newBeam(s, l)}
	va, vb := c.Reactions()
	ta, tb := c.SupportTensions()
	xl, zl, _ := c.Vertex()
	if !allFinite(float64(va), float64(vb), float64(ta), float64(tb), float64(c.Length()),
		float64(c.Sag(s.Length/2)), float64(xl), float64(zl)) {
		return Loaded{}, errOutOfRange
	}
	return c, nil
}

// Span returns the span.
func (c Loaded) Span() Span { return c.span }

// Load returns the load (sharing the patches: do not modify them).
func (c Loaded) Load() Load { return c.load }

// Horizontal returns H.
func (c Loaded) Horizontal() units.Force { return units.Force(c.h) }

func (c Loaded) chordSlope() float64 { return float64(c.span.Rise) / float64(c.span.Length) }

// Reactions returns V_A = Q(0) − H h/L and V_B = H h/L − Q(L).
func (c Loaded) Reactions() (va, vb units.Force) {
	hv := c.h * c.chordSlope()
	return units.Force(c.b.shear(0) - hv), units.Force(hv - c.b.shear(c.b.l))
}

// Tension returns T(x) = √(H² + (H h/L − Q(x))²).
func (c Loaded) Tension(x units.Length) units.Force {
	xx := clampX(float64(x), c.b.l)
	return units.Force(math.Hypot(c.h, c.h*c.chordSlope()-c.b.shear(xx)))
}

// SupportTensions returns the tensions at A and B.
func (c Loaded) SupportTensions() (ta, tb units.Force) {
	va, vb := c.Reactions()
	return units.Force(math.Hypot(c.h, float64(va))), units.Force(math.Hypot(c.h, float64(vb)))
}

// SupportAngles returns atan(V_A/H) and atan(V_B/H).
func (c Loaded) SupportAngles() (a, b units.Angle) {
	va, vb := c.Reactions()
	return units.Angle(math.Atan2(float64(va), c.h)), units.Angle(math.Atan2(float64(vb), c.h))
}

// Z returns z(x) = (h/L) x − M(x)/H.
func (c Loaded) Z(x units.Length) units.Length {
	xx := clampX(float64(x), c.b.l)
	return units.Length(c.chordSlope()*xx - c.b.moment(xx)/c.h)
}

// Sag returns M(x)/H.
func (c Loaded) Sag(x units.Length) units.Length {
	return units.Length(c.b.moment(clampX(float64(x), c.b.l)) / c.h)
}

// Length returns the arc length, exact on each piece of uniform load.
func (c Loaded) Length() units.Length { return units.Length(c.b.arcLength(c.chordSlope(), c.h)) }

// Vertex returns the point where z' = 0, that is Q(x) = H h/L. Outside
// the span the curve is extended with the load intensity at the nearer
// support; when that intensity is zero the extended rope is straight and
// has no vertex, and the lower support is returned with within false.
func (c Loaded) Vertex() (x, z units.Length, within bool) {
	target := c.h * c.chordSlope()
	L := c.b.l
	q0, qL := c.b.shear(0), c.b.shear(L)
	switch {
	case target > q0: // rope rises from A: vertex before A
		w := c.b.u + c.patchIntensity(0)
		if w <= 0 {
			return 0, 0, false
		}
		xv := (q0 - target) / w // negative
		return units.Length(xv), units.Length(c.chordSlope()*xv - (q0*xv-w*xv*xv/2)/c.h), false
	case target < qL: // rope falls into B: vertex beyond B
		w := c.b.u + c.patchIntensity(L)
		if w <= 0 {
			return units.Length(L), c.span.Rise, false
		}
		d := (qL - target) / w
		xv := L + d
		m := c.b.moment(L) + qL*d - w*d*d/2
		return units.Length(xv), units.Length(c.chordSlope()*xv - m/c.h), false
	}
	var buf [16]float64
	xs := c.b.breaks(buf[:])
	for i := 1; i < len(xs); i++ {
		a, b := xs[i-1], xs[i]
		qa, qb := c.b.shear(a), c.b.shear(b)
		if qa >= target && target >= qb {
			xv := a
			if qa > qb {
				xv = a + (b-a)*(qa-target)/(qa-qb)
			}
			return units.Length(xv), units.Length(c.chordSlope()*xv - c.b.moment(xv)/c.h), true
		}
	}
	return 0, 0, true // unreachable: Q is continuous and non-increasing
}

// patchIntensity returns the patch load intensity at an end x ∈ {0, L},
// from the patch touching it.
func (c Loaded) patchIntensity(x float64) float64 {
	w := 0.0
	for _, p := range c.load.Patches {
		a, b := clampX(float64(p.From), c.b.l), clampX(float64(p.To), c.b.l)
		if (x == 0 && a == 0 && b > 0) || (x == c.b.l && b == c.b.l && a < b) {
			w += float64(p.Load)
		}
	}
	return w
}

// LowPoint returns the lowest point of the rope within the span.
func (c Loaded) LowPoint() (x, z units.Length) { return lowPoint(c) }

// MaxTension returns the largest tension in the span, at the higher-tension
// support.
func (c Loaded) MaxTension() units.Force { return maxTension(c) }
