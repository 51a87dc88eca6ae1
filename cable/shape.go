package cable

import "github.com/sagspan/sagspan/units"

// Shape is what every cable shape answers. x is measured horizontally from
// support A. Z, Sag and Tension are defined on the span [0, L]; an x
// outside it is clamped to the nearer support, and a NaN x gives NaN.
type Shape interface {
	Span() Span
	// Horizontal returns H, the horizontal component of the rope tension,
	// constant along the span.
	Horizontal() units.Force
	// Reactions returns the vertical components of the rope pull at A and
	// B, positive upward on the cable (the support pulls up).
	Reactions() (va, vb units.Force)
	// Tension returns the rope tension at x.
	Tension(x units.Length) units.Force
	// SupportTensions returns the rope tension at A and at B.
	SupportTensions() (ta, tb units.Force)
	// MaxTension returns the largest tension in the span. T = H√(1+z'²)
	// grows with the slope, which is steepest at a support for a rope under
	// downward load, so it is the larger support tension.
	MaxTension() units.Force
	// SupportAngles returns the inclination of the rope below horizontal at
	// A and at B, measured going from the support into the span: positive
	// when the rope descends from the support into the span.
	SupportAngles() (a, b units.Angle)
	// Z returns the elevation of the rope at x relative to support A, z up.
	Z(x units.Length) units.Length
	// Sag returns the vertical distance of the rope below the chord at x.
	Sag(x units.Length) units.Length
	// Length returns the arc length (stretched, for elastic shapes).
	Length() units.Length
	// LowPoint returns the lowest point of the rope within the span: the
	// vertex when it lies in [0, L], else the lower support.
	LowPoint() (x, z units.Length)
	// Vertex returns the point where the rope is horizontal; within is
	// false when it falls outside [0, L], in which case the position is
	// that of the vertex of the curve extended beyond the support.
	Vertex() (x, z units.Length, within bool)
}

// lowPoint returns the vertex of s when it lies within the span, else the
// lower support (A on a tie).
func lowPoint(s Shape) (x, z units.Length) {
	if x, z, within := s.Vertex(); within {
		return x, z
	}
	if sp := s.Span(); sp.Rise < 0 {
		return sp.Length, sp.Rise
	}
	return 0, 0
}

// maxTension returns the larger of the support tensions of s.
func maxTension(s Shape) units.Force {
	ta, tb := s.SupportTensions()
	return max(ta, tb)
}

// clampX limits x to [0, l]; NaN stays NaN.
func clampX(x, l float64) float64 {
	if x < 0 {
		return 0
	}
	if x > l {
		return l
	}
	return x
}

// The shapes of this package.
var (
	_ Shape = Parabola{}
	_ Shape = Catenary{}
	_ Shape = ElasticCatenary{}
	_ Shape = Loaded{}
)
