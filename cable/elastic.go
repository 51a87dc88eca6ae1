package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// ElasticRope is a rope of given unstretched length, axial stiffness and
// weight per unstretched metre, to be hung by NewElasticCatenary.
type ElasticRope struct {
	Unstretched units.Length
	EA          units.AxialStiffness
	Weight      units.LoadPerLength // per unstretched metre
}

// Validate returns an error wrapping ErrInvalid unless every field is
// positive and finite.
func (r ElasticRope) Validate() error {
	if err := positive("unstretched length", float64(r.Unstretched)); err != nil {
		return err
	}
	if err := positive("EA", float64(r.EA)); err != nil {
		return err
	}
	return positive("weight", float64(r.Weight))
}

// ElasticCatenary is a rope hanging under its own weight that stretches
// elastically (Irvine's elastic catenary). With origin at A, s the
// unstretched coordinate from A, V the vertical reaction at B, W = w L₀ and
// V(s) = V − W + w s:
//
//	x(s) = H s/EA + (H/w)[asinh(V(s)/H) − asinh((V−W)/H)]
//	z(s) = (w s²/2 + (V−W) s)/EA + (1/w)[√(H²+V(s)²) − √(H²+(V−W)²)]
//
// and H, V solve x(L₀) = L, z(L₀) = h:
//
//	L = H L₀/EA + (H/w)[asinh(V/H) − asinh((V−W)/H)]
//	h = (W L₀/EA)(V/W − ½) + (H/w)[√(1+(V/H)²) − √(1+((V−W)/H)²)]
//
// Source: Irvine, Cable Structures, 1981, ch. 2 (attribution from memory).
// Strains are small (Hooke's law on the unstretched length).
type ElasticCatenary struct {
	span Span
	rope ElasticRope
	h, v float64 // horizontal tension, vertical reaction at B
}

// NewElasticCatenary hangs r over s. It solves the two compatibility
// equations for H and V by Newton's method with a backtracking line
// search on the squared residual; the Jacobian is the flexibility matrix,
// symmetric and positive definite, so the Newton direction always reduces
// the residual. The start is, for a rope much longer than the chord, the
// inextensible catenary of its length stretched by the mean tension;
// otherwise the taut parabolic estimate from the classical cubic
//
//	L₀(1 + H/(EA cos β)) = c + W² cos⁴β c/(24 H²),  tan β = h/L.
//
// It returns an error wrapping ErrNoConvergence when the residual does not
// fall below 1e-10 of the chord within 100 iterations.
func NewElasticCatenary(s Span, r ElasticRope) (ElasticCatenary, error) {
	if err := s.Validate(); err != nil {
		return ElasticCatenary{}, err
	}
	if err := r.Validate(); err != nil {
		return ElasticCatenary{}, err
	}
	e := ElasticCatenary{span: s, rope: r}
	h, v, ok := e.solve()
	if !ok {
		return ElasticCatenary{}, errNoConv("elastic catenary")
	}
	e.h, e.v = h, v
	va, vb := e.Reactions()
	ta, tb := e.SupportTensions()
	xl, zl, _ := e.Vertex()
	// the stretch ∫T ds/EA is at most L₀ T_max/EA
	stretch := float64(r.Unstretched) * math.Max(float64(ta), float64(tb)) / float64(r.EA)
	if !allFinite(h, float64(va), float64(vb), float64(ta), float64(tb), stretch, float64(xl), float64(zl)) {
		return ElasticCatenary{}, errOutOfRange
	}
	return e, nil
}

// residual returns x(L₀) − L, z(L₀) − h and, when jac, the Jacobian (the
// flexibility matrix, symmetric).
func (e ElasticCatenary) residual(H, V float64, jac bool) (r1, r2, j11, j12, j22 float64) {
	L0, EA, w := float64(e.rope.Unstretched), float64(e.rope.EA), float64(e.rope.Weight)
	W := w * L0
	s1, s0 := V/H, (V-W)/H
	a0, a1 := sqrt1p(s0), sqrt1p(s1)
	ta, tb := H*a0, H*a1
	sameSign := s0*s1 > 0
	// asinh s1 − asinh s0, as in asinhDiff
	var ad float64
	d := W / H // s1 − s0, exactly
	if sameSign {
		ad = asinh(d * (s1 + s0) / (s1*a0 + s0*a1))
	} else {
		ad = asinh(s1*a0 - s0*a1)
	}
	r1 = H*L0/EA + H/w*ad - float64(e.span.Length)
	r2 = L0*(V-W/2)/EA + L0*(2*V-W)/(ta+tb) - float64(e.span.Rise)
	if jac {
		// s1/a1 − s0/a0 without cancellation
		var sd float64
		if sameSign {
			sd = d * (s1 + s0) / ((s1*a0 + s0*a1) * a0 * a1)
		} else {
			sd = s1/a1 - s0/a0
		}
		j11 = L0/EA + (ad-sd)/w
		j12 = -H * L0 * (2*V - W) / ((ta + tb) * ta * tb)
		j22 = L0/EA + sd/w
	}
	return
}

// start returns the first estimate of H and V: for a rope whose slack
// L₀ − c is more than ten times its estimated stretch, the inextensible
// catenary of its length stretched by the mean tension of that catenary,
// T̄ ≈ H S/L (to first order in k); otherwise the taut parabolic cubic (see
// NewElasticCatenary).
func (e ElasticCatenary) start() (h, v float64) {
	L, rise := float64(e.span.Length), float64(e.span.Rise)
	L0, EA, w := float64(e.rope.Unstretched), float64(e.rope.EA), float64(e.rope.Weight)
	W := w * L0
	c := math.Hypot(L, rise)
	if L0 > c {
		if kk, ok := kForLength(L, rise, L0, 0); ok && kk < 700 {
			hc := w * L / (2 * kk)
			// stretch by the mean tension ≈ H S/L, and move k to first
			// order: m = √(S² − h²)/L = sinh k/k, dm/dk = (sinh k/k)(coth k − 1/k)
			dS := L0 * hc * L0 / (L * EA)
			root := math.Sqrt((L0 - rise) * (L0 + rise))
			dm := L0 * dS / (L * root)
			slope := (1 + sinhcm1(kk)) * cothMinusInv(kk)
			k2 := kk + dm/slope // longer rope: larger k, smaller H
			// trust this start only when the stretch is small against the
			// slack; otherwise the parabolic cubic below is the better one
			if dS < 0.1*(L0-c) && k2 > kk && k2 < 2*kk {
				kk, hc = k2, w*L/(2*k2)
				a := hc / w
				u := asinh(rise / (2 * a * math.Sinh(kk)))
				vc := hc * math.Sinh((L-(L/2-a*u))/a)
				if hc > 0 && finite(hc) && finite(vc) {
					return hc, vc
				}
			}
		}
	}
	cb := L / c
	// taut parabolic estimate: H³ + b H² − k = 0
	b := (L0 - c) * EA * cb / L0
	k := W * W * cb * cb * cb * cb * c / 24 * EA * cb / L0
	h = cubicRoot(b, k)
	return h, h*rise/L + W/2
}

func (e ElasticCatenary) solve() (h, v float64, ok bool) {
	c := float64(e.span.Chord())
	h, v = e.start()
	if !(h > 0) || !finite(h) || !finite(v) {
		return 0, 0, false
	}
	tol := 1e-10 * c
	r1, r2, j11, j12, j22 := e.residual(h, v, true)
	n2 := r1*r1 + r2*r2
	for it := 0; it < 100; it++ {
		det := j11*j22 - j12*j12
		dh := -(j22*r1 - j12*r2) / det
		dv := -(j11*r2 - j12*r1) / det
		if !finite(dh) || !finite(dv) {
			return h, v, false
		}
		t := 1.0
		var hn, vn, m2 float64
		var q1, q2, k11, k12, k22 float64
		accepted := false
		for ls := 0; ls < 60; ls++ {
			hn, vn = h+t*dh, v+t*dv
			if hn <= 0 {
				t *= 0.5 * h / (h - hn) // step to halfway towards H = 0
				if t == 0 {
					break
				}
				continue
			}
			q1, q2, k11, k12, k22 = e.residual(hn, vn, true)
			m2 = q1*q1 + q2*q2
			if m2 < n2 || (m2 <= n2 && math.Sqrt(m2) <= tol) {
				accepted = true
				break
			}
			t /= 2
		}
		if !accepted {
			// no decrease possible: converged to rounding if small enough
			return h, v, math.Sqrt(n2) <= tol
		}
		small := math.Abs(hn-h) <= 1e-15*hn && math.Abs(vn-v) <= 1e-15*(math.Abs(vn)+hn)
		h, v = hn, vn
		r1, r2, j11, j12, j22, n2 = q1, q2, k11, k12, k22, m2
		if math.Sqrt(n2) <= 1e-14*c || small {
			return h, v, math.Sqrt(n2) <= tol
		}
	}
	return h, v, math.Sqrt(n2) <= tol
}

// Span returns the span.
func (e ElasticCatenary) Span() Span { return e.span }

// Rope returns the rope hung.
func (e ElasticCatenary) Rope() ElasticRope { return e.rope }

// Horizontal returns H.
func (e ElasticCatenary) Horizontal() units.Force { return units.Force(e.h) }

// Reactions returns V_A = W − V and V_B = V.
func (e ElasticCatenary) Reactions() (va, vb units.Force) {
	W := float64(e.rope.Weight) * float64(e.rope.Unstretched)
	return units.Force(W - e.v), units.Force(e.v)
}

// SupportTensions returns √(H² + V_A²) and √(H² + V_B²).
func (e ElasticCatenary) SupportTensions() (ta, tb units.Force) {
	va, vb := e.Reactions()
	return units.Force(math.Hypot(e.h, float64(va))), units.Force(math.Hypot(e.h, float64(vb)))
}

// SupportAngles returns atan(V_A/H) and atan(V_B/H).
func (e ElasticCatenary) SupportAngles() (a, b units.Angle) {
	va, vb := e.Reactions()
	return units.Angle(math.Atan2(float64(va), e.h)), units.Angle(math.Atan2(float64(vb), e.h))
}

// at returns x(s) and z(s) for the unstretched coordinate s, valid also
// beyond [0, L₀] as the analytic extension of the curve.
func (e ElasticCatenary) at(s float64) (x, z float64) {
	EA, w := float64(e.rope.EA), float64(e.rope.Weight)
	u0 := e.v - w*float64(e.rope.Unstretched)
	u := u0 + w*s
	x = e.h*s/EA + e.h/w*asinhDiff(u/e.h, u0/e.h, w*s/e.h)
	t0, t := math.Hypot(e.h, u0), math.Hypot(e.h, u)
	var dt float64
	if t+t0 > 0 {
		dt = w * s * (u + u0) / (t + t0) // T(s) − T(0); u − u0 = w s exactly
	}
	// (w s²/2 + (V−W) s)/EA written as s (V − w (L₀ − s/2))/EA, which at
	// s = L₀ is exactly the L₀(V − W/2)/EA of the compatibility equation
	z = s*(e.v-w*(float64(e.rope.Unstretched)-s/2))/EA + dt/w
	return x, z
}

// At returns the position of the point at unstretched coordinate s from
// A; s outside [0, L₀] gives the analytic extension of the curve.
func (e ElasticCatenary) At(s units.Length) (x, z units.Length) {
	xx, zz := e.at(float64(s))
	return units.Length(xx), units.Length(zz)
}

// material returns the unstretched coordinate s of the point at abscissa
// x ∈ [0, L] by a bracketed Newton iteration (x(s) is increasing).
func (e ElasticCatenary) material(x float64) float64 {
	L, L0 := float64(e.span.Length), float64(e.rope.Unstretched)
	if x <= 0 {
		return 0
	}
	if x >= L {
		return L0
	}
	EA, w := float64(e.rope.EA), float64(e.rope.Weight)
	u0 := e.v - w*L0
	g := func(s float64) (float64, float64) {
		xs, _ := e.at(s)
		return xs - x, e.h/EA + e.h/math.Hypot(e.h, u0+w*s)
	}
	s, _ := newtonBracket(g, 0, L0, x/L*L0, 1e-13*L0, 200)
	return s
}

// Tension returns the tension √(H² + V(s)²) at the point at abscissa x.
func (e ElasticCatenary) Tension(x units.Length) units.Force {
	xx := clampX(float64(x), float64(e.span.Length))
	if math.IsNaN(xx) {
		return units.Force(xx)
	}
	s := e.material(xx)
	w := float64(e.rope.Weight)
	return units.Force(math.Hypot(e.h, e.v-w*float64(e.rope.Unstretched)+w*s))
}

// Z returns the elevation at abscissa x.
func (e ElasticCatenary) Z(x units.Length) units.Length {
	xx := clampX(float64(x), float64(e.span.Length))
	if math.IsNaN(xx) {
		return units.Length(xx)
	}
	_, z := e.at(e.material(xx))
	return units.Length(z)
}

// Sag returns the vertical distance below the chord at abscissa x.
func (e ElasticCatenary) Sag(x units.Length) units.Length {
	xx := clampX(float64(x), float64(e.span.Length))
	return units.Length(e.span.chordSag(xx, float64(e.Z(units.Length(xx)))))
}

// Length returns the stretched length (StretchedLength).
func (e ElasticCatenary) Length() units.Length { return e.StretchedLength() }

// StretchedLength returns
//
//	S = L₀ + (1/EA) ∫₀^L₀ T ds = L₀ + (H²/(w EA)) ∫ √(1+σ²) dσ over σ ∈ [(V−W)/H, V/H]
func (e ElasticCatenary) StretchedLength() units.Length {
	L0, EA, w := float64(e.rope.Unstretched), float64(e.rope.EA), float64(e.rope.Weight)
	W := w * L0
	s0, s1 := (e.v-W)/e.h, e.v/e.h
	// H²/w · (s1 − s0) · mean = H L₀ · mean
	return units.Length(L0 + e.h*L0*arcMean(s0, s1, W/e.h)/EA)
}

// Strain returns the mean strain (S − L₀)/L₀.
func (e ElasticCatenary) Strain() float64 {
	L0 := float64(e.rope.Unstretched)
	EA, w := float64(e.rope.EA), float64(e.rope.Weight)
	W := w * L0
	return e.h * arcMean((e.v-W)/e.h, e.v/e.h, W/e.h) / EA
}

// Vertex returns the point where V(s) = 0, s = L₀ − V/w, on the curve
// or on its analytic extension beyond a support.
func (e ElasticCatenary) Vertex() (x, z units.Length, within bool) {
	L0, w := float64(e.rope.Unstretched), float64(e.rope.Weight)
	s := L0 - e.v/w
	xv, zv := e.at(s)
	return units.Length(xv), units.Length(zv), s >= 0 && s <= L0
}

// LowPoint returns the lowest point of the rope within the span.
func (e ElasticCatenary) LowPoint() (x, z units.Length) { return lowPoint(e) }

// MaxTension returns the largest tension in the span, at the higher-tension
// support.
func (e ElasticCatenary) MaxTension() units.Force { return maxTension(e) }
