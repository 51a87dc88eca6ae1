package foundation

import (
	"math"
	"slices"
)

// coneGeometry is the rock mass a row of grouted bars lifts: for each bar a
// right circular cone of half-angle psi about the bar's axis, its apex at
// distance length from the bar's head along the axis (the middle of the
// bond length), the axis inclined at alpha below horizontal into the rock,
// and count bars side by side at spacing across the pull (their heads on a
// horizontal line at the rock surface, their axes parallel).
//
// The mass counted is the union of the cones, cut off by the plane through
// the heads perpendicular to the axes (the cones' bases) and by the rock
// surface: the rock in front of the heads and beyond the bases is ignored,
// a cautious simplification (common practice takes the cone to the
// surface; for an inclined bar that cone reaches far up the slope of the
// pull, and for a bar flatter than psi it never closes).
type coneGeometry struct {
	length  float64 // apex to head along the axis
	alpha   float64 // axis inclination below horizontal, (0, π/2]
	psi     float64 // cone half-angle
	count   int
	spacing float64
}

// volume returns the volume of the cones' union below a horizontal plane
// at depth cut below the rock surface at the heads (cut ≤ 0: below the
// surface itself), and cut ≥ the apex depth gives zero.
//
// Slices perpendicular to the axis at distance t from the apex are circles
// of radius r = t tan ψ whose centres lie (length − t) sin α below the
// surface; the slice's points below the plane are those less than
// c = ((length − t) sin α − cut)/cos α from the centre towards the surface.
// For equal circles in a row the union is one circle plus, for each next
// circle, its area outside its neighbour (the neighbour covers all that any
// earlier circle covers), all cut by the same line parallel to the row.
// The slice areas are integrated by Gauss–Legendre quadrature between the
// points where the integrand's form changes.
func (g coneGeometry) volume(cut float64) float64 {
	tp := math.Tan(g.psi)
	sa, ca := math.Sin(g.alpha), math.Cos(g.alpha)
	l := g.length
	cutAt := func(t float64) float64 {
		if ca < 1e-12 {
			if (l-t)*sa > cut {
				return math.Inf(1)
			}
			return math.Inf(-1)
		}
		return ((l-t)*sa - cut) / ca
	}
	area := func(t float64) float64 {
		r := t * tp
		c := cutAt(t)
		a1 := segmentBelow(r, c)
		if g.count <= 1 || a1 == 0 {
			return a1
		}
		lens := lensBelow(r, g.spacing, c)
		return a1 + float64(g.count-1)*(a1-lens)
	}
	// Breakpoints: where the cutting line is tangent to a circle (c = ±r),
	// where neighbouring circles begin to overlap (2r = s) and where the
	// line is tangent to the lens (c = ±√(r² − s²/4)).
	pts := []float64{0, l}
	add := func(t float64) {
		if t > 0 && t < l && !math.IsNaN(t) {
			pts = append(pts, t)
		}
	}
	if ca >= 1e-12 {
		// c = k(l − t) − c0 with k = tan α, c0 = cut/cos α; c = ±r·… solved for t.
		k, c0 := sa/ca, cut/ca
		add((k*l - c0) / (k + tp))
		add((k*l - c0) / (k - tp))
		if g.count > 1 && g.spacing > 0 {
			h := g.spacing / 2
			add(h / tp)
			// (k(l − t) − c0)² = t² tp² − h²: a quadratic in t.
			a := k*k - tp*tp
			b := -2 * k * (k*l - c0)
			cc := (k*l-c0)*(k*l-c0) + h*h
			if math.Abs(a) < 1e-12 {
				add(-cc / b)
			} else if disc := b*b - 4*a*cc; disc >= 0 {
				add((-b + math.Sqrt(disc)) / (2 * a))
				add((-b - math.Sqrt(disc)) / (2 * a))
			}
		}
	} else {
		add(l - cut/sa)
		if g.count > 1 && g.spacing > 0 {
			add(g.spacing / 2 / tp)
		}
	}
	slices.Sort(pts)
	var v float64
	for i := 1; i < len(pts); i++ {
		v += gaussLegendre(area, pts[i-1], pts[i])
	}
	return v
}

// segmentBelow returns the area of the part of a circle of radius r lying
// less than c from its centre in one direction (c ≥ r: the whole circle):
//
//	A = r²(π − acos(c/r)) + c√(r² − c²)
func segmentBelow(r, c float64) float64 {
	switch {
	case r <= 0 || c <= -r:
		return 0
	case c >= r:
		return math.Pi * r * r
	}
	return r*r*(math.Pi-math.Acos(c/r)) + c*math.Sqrt(r*r-c*c)
}

// lensBelow returns the area of the lens common to two circles of radius r
// whose centres are s apart, on the part less than c from the line of
// centres in one direction:
//
//	A = ∫ from −h to min(c, h) of (2√(r² − w²) − s) dw,  h = √(r² − s²/4)
func lensBelow(r, s, c float64) float64 {
	if 2*r <= s {
		return 0
	}
	h := math.Sqrt(r*r - s*s/4)
	if c <= -h {
		return 0
	}
	w1 := math.Min(c, h)
	f := func(w float64) float64 {
		x := math.Max(r*r-w*w, 0)
		return w*math.Sqrt(x) + r*r*math.Asin(math.Max(-1, math.Min(1, w/r))) - s*w
	}
	return f(w1) - f(-h)
}

// gaussLegendre integrates f over [a, b] with a 20-point Gauss–Legendre
// rule (nodes and weights from Abramowitz and Stegun, Table 25.4).
func gaussLegendre(f func(float64) float64, a, b float64) float64 {
	if !(b > a) {
		return 0
	}
	m, h := (a+b)/2, (b-a)/2
	var s float64
	for i, x := range glNodes {
		s += glWeights[i] * (f(m-h*x) + f(m+h*x))
	}
	return s * h
}

var glNodes = [...]float64{
	0.0765265211334973, 0.2277858511416451, 0.3737060887154195, 0.5108670019508271, 0.6360536807265150,
	0.7463319064601508, 0.8391169718222188, 0.9122344282513259, 0.9639719272779138, 0.9931285991850949,
}

var glWeights = [...]float64{
	0.1527533871307258, 0.1491729864726037, 0.1420961093183820, 0.1316886384491766, 0.1181945319615184,
	0.1019301198172404, 0.0832767415767048, 0.0626720483341091, 0.0406014298003869, 0.0176140071391521,
}
