package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// Parabola is an inextensible cable under a load w uniform per horizontal
// metre: the shape of a rope carrying a walkway much heavier than itself.
// Build it with NewParabola or ParabolaWithTension.
//
//	z(x)  = (h/L) x − w x (L − x)/(2H)
//	H     = w L²/(8 f)                  (general cable theorem)
//	V_A   = w L/2 − H h/L,  V_B = w L/2 + H h/L
//	T(x)  = √(H² + V(x)²)
//	x_low = L/2 − H h/(w L)
//	S     = (H/w)[F(s₁) − F(s₀)],  F(s) = (s√(1+s²) + asinh s)/2,  s₀ = −V_A/H,  s₁ = V_B/H
//
// Source: standard structural-analysis texts; length by direct integration
// (Hicks, Civil Engineering Formulas, ch. 10, gives the level series).
type Parabola struct {
	span Span
	w, h float64
}

// NewParabola returns the parabolic cable over s under w per horizontal
// metre hanging with sag below the chord at midspan.
func NewParabola(s Span, w units.LoadPerLength, sag units.Length) (Parabola, error) {
	if err := s.Validate(); err != nil {
		return Parabola{}, err
	}
	if err := positive("load", float64(w)); err != nil {
		return Parabola{}, err
	}
	if err := positive("sag", float64(sag)); err != nil {
		return Parabola{}, err
	}
	l := float64(s.Length)
	h := float64(w) * l / 8 * (l / float64(sag))
	return newParabola(s, float64(w), h)
}

// ParabolaWithTension returns the parabolic cable over s under w per
// horizontal metre with horizontal tension h.
func ParabolaWithTension(s Span, w units.LoadPerLength, h units.Force) (Parabola, error) {
	if err := s.Validate(); err != nil {
		return Parabola{}, err
	}
	if err := positive("load", float64(w)); err != nil {
		return Parabola{}, err
	}
	if err := positive("horizontal tension", float64(h)); err != nil {
		return Parabola{}, err
	}
	return newParabola(s, float64(w), float64(h))
}

func newParabola(s Span, w, h float64) (Parabola, error) {
	p := Parabola{span: s, w: w, h: h}
	va, vb := p.Reactions()
	x0, z0, _ := p.Vertex()
	l := float64(s.Length)
	// finite reactions bound the tensions; finite slopes bound the length
	bound := h + math.Abs(float64(va)) + math.Abs(float64(vb))
	slopes := l * (1 + (math.Abs(float64(va))+math.Abs(float64(vb)))/h)
	if !allFinite(h, bound, slopes, float64(p.Sag(s.Length/2)), float64(x0), float64(z0)) {
		return Parabola{}, errOutOfRange
	}
	return p, nil
}

// Span returns the span.
func (p Parabola) Span() Span { return p.span }

// Load returns the load per horizontal metre.
func (p Parabola) Load() units.LoadPerLength { return units.LoadPerLength(p.w) }

// Horizontal returns H.
func (p Parabola) Horizontal() units.Force { return units.Force(p.h) }

// slope returns dz/dx at x.
func (p Parabola) slope(x float64) float64 {
	l := float64(p.span.Length)
	return float64(p.span.Rise)/l - p.w*(l-2*x)/(2*p.h)
}

// Reactions returns V_A = w L/2 − H h/L and V_B = w L/2 + H h/L.
func (p Parabola) Reactions() (va, vb units.Force) {
	l := float64(p.span.Length)
	half := p.w * l / 2
	hv := p.h * float64(p.span.Rise) / l
	return units.Force(half - hv), units.Force(half + hv)
}

// Tension returns T(x) = H √(1 + z'(x)²).
func (p Parabola) Tension(x units.Length) units.Force {
	xx := clampX(float64(x), float64(p.span.Length))
	return units.Force(math.Hypot(p.h, p.h*p.slope(xx)))
}

// SupportTensions returns √(H² + V_A²) and √(H² + V_B²).
func (p Parabola) SupportTensions() (ta, tb units.Force) {
	va, vb := p.Reactions()
	return units.Force(math.Hypot(p.h, float64(va))), units.Force(math.Hypot(p.h, float64(vb)))
}

// SupportAngles returns atan(V_A/H) and atan(V_B/H).
func (p Parabola) SupportAngles() (a, b units.Angle) {
	va, vb := p.Reactions()
	return units.Angle(math.Atan2(float64(va), p.h)), units.Angle(math.Atan2(float64(vb), p.h))
}

// Z returns z(x) = (h/L) x − w x (L − x)/(2H).
func (p Parabola) Z(x units.Length) units.Length {
	l := float64(p.span.Length)
	xx := clampX(float64(x), l)
	return units.Length(float64(p.span.Rise)*xx/l - p.w*xx*(l-xx)/(2*p.h))
}

// Sag returns w x (L − x)/(2H).
func (p Parabola) Sag(x units.Length) units.Length {
	l := float64(p.span.Length)
	xx := clampX(float64(x), l)
	return units.Length(p.w * xx * (l - xx) / (2 * p.h))
}

// Length returns the exact arc length of the parabola.
func (p Parabola) Length() units.Length {
	l := float64(p.span.Length)
	return units.Length(l * arcMean(p.slope(0), p.slope(l), p.w*l/p.h))
}

// Vertex returns x = L/2 − H h/(w L) and its elevation; the vertex of the
// parabola extended beyond the supports when it is outside the span.
func (p Parabola) Vertex() (x, z units.Length, within bool) {
	l := float64(p.span.Length)
	x0 := l/2 - p.h*float64(p.span.Rise)/(p.w*l)
	z0 := float64(p.span.Rise)*x0/l - p.w*x0*(l-x0)/(2*p.h)
	return units.Length(x0), units.Length(z0), x0 >= 0 && x0 <= l
}

// LowPoint returns the lowest point of the rope within the span.
func (p Parabola) LowPoint() (x, z units.Length) { return lowPoint(p) }

// MaxTension returns the largest tension in the span, at the higher-tension
// support.
func (p Parabola) MaxTension() units.Force { return maxTension(p) }
