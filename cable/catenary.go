package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// Catenary is an inextensible cable under its own weight w uniform along
// the arc: a bare rope. Build it with NewCatenary, CatenaryWithTension or
// CatenaryWithLength. With a = H/w, k = L/(2a) and x₀ the abscissa of the
// vertex:
//
//	z(x) = a[cosh((x − x₀)/a) − cosh(x₀/a)]
//	sinh u = h/(2a sinh k),  x₀ = L/2 − a u
//	T(x) = H cosh((x − x₀)/a) = H + w (z − z_low)
//	S    = √(h² + (2a sinh k)²)
//	f    = a cosh u (cosh k − 1)        (sag below the chord at midspan)
//
// Source: the catenary of standard statics texts (e.g. Irvine, Cable
// Structures, 1981, ch. 1, from memory); the closed forms for u, S and f
// follow from z(L) = h by the identities for cosh A − cosh B.
// Invariants: T_B − T_A = w h and V_A + V_B = w S.
type Catenary struct {
	span  Span
	w, h  float64 // load per arc metre, horizontal tension
	a, x0 float64 // catenary parameter H/w and vertex abscissa
}

// NewCatenary returns the catenary over s under w per metre of arc hanging
// with sag below the chord at midspan. It solves, for k = w L/(2H),
//
//	f/L = (sinh²(k/2)/k) √(1 + (h k/(L sinh k))²)
//
// by a bracketed Newton iteration on ln k.
func NewCatenary(s Span, w units.LoadPerLength, sag units.Length) (Catenary, error) {
	if err := s.Validate(); err != nil {
		return Catenary{}, err
	}
	if err := positive("load", float64(w)); err != nil {
		return Catenary{}, err
	}
	if err := positive("sag", float64(sag)); err != nil {
		return Catenary{}, err
	}
	l := float64(s.Length)
	n := float64(sag) / l
	rho := float64(s.Rise) / l
	if !finite(n) || n == 0 || !finite(rho) {
		return Catenary{}, errOutOfRange
	}
	lnN := math.Log(n)
	g := func(t float64) (float64, float64) {
		k := math.Exp(t)
		q := rho * k / math.Sinh(k)
		if math.IsNaN(q) {
			q = 0
		}
		lnPhi := 2*lnSinh(k/2) - t + math.Log(math.Hypot(1, q))
		q2 := q * q
		var mix float64
		if q2 > 0 {
			mix = -q2 / (1 + q2) * cothMinusInv(k)
		}
		// d ln φ/dk = coth(k/2) − 1/k − q²(coth k − 1/k)/(1+q²)
		dk := 1/math.Tanh(k/2) - 1/k + mix
		return lnPhi - lnN, k * dk
	}
	// φ(k) ≥ k/4, so k ≤ 4n; for small k, φ ≈ k√(1+ρ²)/4.
	hi := math.Log(4 * n)
	lo := hi - math.Log(math.Hypot(1, rho)) - 1
	for i := 0; i < 64; i++ {
		if v, _ := g(lo); v < 0 {
			break
		}
		lo -= 2 + math.Abs(lo)
	}
	start := math.Max(lo, math.Min(hi, math.Log(4*n/math.Hypot(1, rho))))
	t, ok := newtonBracket(g, lo, hi, start, 1e-14, 200)
	if !ok {
		return Catenary{}, errNoConv("catenary for a given sag")
	}
	k := math.Exp(t)
	if k > 700 || k < 1e-300 {
		return Catenary{}, errOutOfRange
	}
	return newCatenary(s, float64(w), float64(w)*l/(2*k))
}

// CatenaryWithTension returns the catenary over s under w per metre of arc
// with horizontal tension h.
func CatenaryWithTension(s Span, w units.LoadPerLength, h units.Force) (Catenary, error) {
	if err := s.Validate(); err != nil {
		return Catenary{}, err
	}
	if err := positive("load", float64(w)); err != nil {
		return Catenary{}, err
	}
	if err := positive("horizontal tension", float64(h)); err != nil {
		return Catenary{}, err
	}
	return newCatenary(s, float64(w), float64(h))
}

// CatenaryWithLength returns the catenary over s under w per metre of arc
// with arc length length, which must exceed the chord. It solves
//
//	sinh k / k = √(S² − h²)/L,  k = w L/(2H)
//
// by Newton's method on ln(sinh k/k), which is convex, from an upper bound
// of the root, so the iterates descend monotonically.
func CatenaryWithLength(s Span, w units.LoadPerLength, length units.Length) (Catenary, error) {
	if err := s.Validate(); err != nil {
		return Catenary{}, err
	}
	if err := positive("load", float64(w)); err != nil {
		return Catenary{}, err
	}
	if err := positive("rope length", float64(length)); err != nil {
		return Catenary{}, err
	}
	c := float64(s.Chord())
	S := float64(length)
	if S <= c {
		return Catenary{}, invalidf("rope length %g m must exceed the chord %g m", S, c)
	}
	k, ok := kForLength(float64(s.Length), float64(s.Rise), S, 0)
	if !ok {
		return Catenary{}, errNoConv("catenary for a given length")
	}
	if k > 700 || k <= 0 {
		return Catenary{}, errOutOfRange
	}
	return newCatenary(s, float64(w), float64(w)*float64(s.Length)/(2*k))
}

// kForLength solves sinh k/k = √(S² − h²)/L for k > 0, starting from
// kUp when it is positive (it must then be an upper bound of the root).
func kForLength(l, h, S, kUp float64) (float64, bool) {
	c := math.Hypot(l, h)
	// m − 1 = (√(S²−h²) − L)/L, written without cancellation.
	root := math.Sqrt((S - h) * (S + h))
	mm1 := (S - c) * (S + c) / (l * (root + l))
	target := math.Log1p(mm1)
	if !finite(target) || target <= 0 {
		return 0, false
	}
	// sinh k/k ≥ 1 + k²/6 gives k ≤ √(6(m−1)); also sinh k/k ≥ e^k/(4k) for k ≥ 1.
	k := math.Sqrt(6 * mm1)
	if k > 2 {
		k = math.Min(k, target+math.Log(4)+2*math.Log(target+math.Log(4)+1)+1)
	}
	if kUp > 0 {
		k = math.Min(k, kUp)
	}
	// Below m − 1 = 0.8 (k < 2) Newton runs on sinh k/k − m directly, which
	// is convex too and needs no logarithm; above, on its logarithm.
	direct := mm1 < 0.8
	for i := 0; i < 200; i++ {
		var F, dF float64
		x := sinhcm1(k)
		if direct {
			F = x - mm1
			dF = (1 + x) * cothMinusInv(k)
		} else {
			if k > 700 {
				F = k - math.Ln2 - math.Log(k) - target
			} else {
				F = math.Log(1+x) - target // x ≥ 0.8 here: no precision lost
			}
			dF = cothMinusInv(k)
		}
		if dF <= 0 {
			return k, false
		}
		kn := k - F/dF
		if kn <= 0 {
			kn = k / 2
		}
		if kn >= k || k-kn <= 1e-15*k {
			// the iterates descend monotonically; a step that does not
			// descend means rounding has been reached
			return math.Min(k, kn), true
		}
		k = kn
	}
	return k, false
}

func newCatenary(s Span, w, h float64) (Catenary, error) {
	l := float64(s.Length)
	a := h / w
	k := l / (2 * a)
	if !finite(a) || !(k < 700) {
		return Catenary{}, errOutOfRange
	}
	u := asinh(float64(s.Rise) / (2 * a * math.Sinh(k)))
	c := Catenary{span: s, w: w, h: h, a: a, x0: l/2 - a*u}
	va, vb := c.Reactions()
	ta, tb := c.SupportTensions()
	xl, zl, _ := c.Vertex()
	if !allFinite(c.x0, float64(va), float64(vb), float64(ta), float64(tb), float64(c.Length()),
		float64(c.Sag(s.Length/2)), float64(xl), float64(zl)) {
		return Catenary{}, errOutOfRange
	}
	return c, nil
}

// Span returns the span.
func (c Catenary) Span() Span { return c.span }

// Load returns the load per metre of arc.
func (c Catenary) Load() units.LoadPerLength { return units.LoadPerLength(c.w) }

// Horizontal returns H.
func (c Catenary) Horizontal() units.Force { return units.Force(c.h) }

// Reactions returns V_A = H sinh(x₀/a) and V_B = H sinh((L − x₀)/a).
func (c Catenary) Reactions() (va, vb units.Force) {
	l := float64(c.span.Length)
	return units.Force(c.h * math.Sinh(c.x0/c.a)), units.Force(c.h * math.Sinh((l-c.x0)/c.a))
}

// Tension returns T(x) = H cosh((x − x₀)/a).
func (c Catenary) Tension(x units.Length) units.Force {
	xx := clampX(float64(x), float64(c.span.Length))
	return units.Force(c.h * math.Cosh((xx-c.x0)/c.a))
}

// SupportTensions returns the tensions at A and B.
func (c Catenary) SupportTensions() (ta, tb units.Force) {
	return c.Tension(0), c.Tension(c.span.Length)
}

// SupportAngles returns atan(V_A/H) and atan(V_B/H).
func (c Catenary) SupportAngles() (a, b units.Angle) {
	va, vb := c.Reactions()
	return units.Angle(math.Atan2(float64(va), c.h)), units.Angle(math.Atan2(float64(vb), c.h))
}

// z returns 2a sinh((x − 2x₀)/(2a)) sinh(x/(2a)), the cancellation-free
// form of a[cosh((x − x₀)/a) − cosh(x₀/a)].
func (c Catenary) z(x float64) float64 {
	return 2 * c.a * math.Sinh((x-2*c.x0)/(2*c.a)) * math.Sinh(x/(2*c.a))
}

// Z returns z(x).
func (c Catenary) Z(x units.Length) units.Length {
	return units.Length(c.z(clampX(float64(x), float64(c.span.Length))))
}

// Sag returns the vertical distance below the chord at x.
func (c Catenary) Sag(x units.Length) units.Length {
	xx := clampX(float64(x), float64(c.span.Length))
	return units.Length(c.span.chordSag(xx, c.z(xx)))
}

// Length returns S = √(h² + (2a sinh(L/(2a)))²).
func (c Catenary) Length() units.Length {
	l := float64(c.span.Length)
	return units.Length(math.Hypot(float64(c.span.Rise), 2*c.a*math.Sinh(l/(2*c.a))))
}

// Vertex returns the vertex (x₀, −2a sinh²(x₀/(2a))), on the curve
// extended beyond a support when it lies outside the span.
func (c Catenary) Vertex() (x, z units.Length, within bool) {
	sh := math.Sinh(c.x0 / (2 * c.a))
	return units.Length(c.x0), units.Length(-2 * c.a * sh * sh), c.x0 >= 0 && c.x0 <= float64(c.span.Length)
}

// LowPoint returns the lowest point of the rope within the span.
func (c Catenary) LowPoint() (x, z units.Length) { return lowPoint(c) }

// MaxTension returns the largest tension in the span, at the higher-tension
// support.
func (c Catenary) MaxTension() units.Force { return maxTension(c) }
