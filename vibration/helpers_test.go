package vibration

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"github.com/sagspan/sagspan/units"
)

// parabola is the static shape of a rope under a load uniform per
// horizontal metre (the general cable theorem): z = (h/L)x − 4f x(L−x)/L²,
// f the sag at midspan below the chord.
type parabola struct{ l, rise, sag float64 }

func (p parabola) Z(x units.Length) units.Length {
	xx := float64(x)
	return units.Length(p.rise*xx/p.l - 4*p.sag*xx*(p.l-xx)/(p.l*p.l))
}

// horizontal returns H = w L²/(8f) for mass m per horizontal metre.
func horizontal(m, l, sag float64) float64 {
	return m * units.StandardGravity * l * l / (8 * sag)
}

// singleRope returns a level rope of span l, sag ratio eps, mass m per
// horizontal metre and axial stiffness ea.
func singleRope(l, eps, m, ea float64) Model {
	sag := eps * l
	return Model{Span: units.Length(l), Ropes: []Rope{{
		Name: "rope", Shape: parabola{l, 0, sag}, H: units.Force(horizontal(m, l, sag)),
		Mass: units.MassPerLength(m), EA: units.AxialStiffness(ea),
	}}}
}

// demoLike returns a walkway bridge like the package's demo: span 72 m,
// rise 0.8 m, sag 3.6 m, six 32 mm walkway ropes and two 20 mm handrail
// ropes 1.1 m higher, each group split between planes at ±0.6 m, a
// walkway of 102 kg/m and 1.2 m width (an invented bridge).
func demoLike() Model {
	const l, rise, sag = 72.0, 0.8, 3.6
	walk, hand, deck := 6*4.188, 2*1.636, 102.0
	ea := 6 * 100e9 * 0.46 * 0.032 * 0.032
	eaH := 2 * 100e9 * 0.46 * 0.020 * 0.020
	m := Model{Span: l, Rise: rise, Walkway: Walkway{Mass: units.MassPerLength(deck), Width: 1.2}}
	for _, g := range []struct {
		name  string
		mass  float64
		share float64
		z, ea float64
	}{{"walkway", walk, 1, 0, ea}, {"handrail", hand, 0, 1.1, eaH}} {
		h := horizontal(g.mass+g.share*deck, l, sag)
		for _, y := range []float64{0.6, -0.6} {
			m.Ropes = append(m.Ropes, Rope{
				Name: g.name, Y: units.Length(y), Z: units.Length(g.z), Shape: parabola{l, rise, sag},
				H: units.Force(h / 2), Mass: units.MassPerLength(g.mass / 2), EA: units.AxialStiffness(g.ea / 2), Tied: true,
			})
		}
	}
	return m
}

// firstOf returns the lowest mode of the kind (and symmetry, for vertical
// modes).
func firstOf(t *testing.T, md Modal, kind Kind, symmetric bool) Mode {
	t.Helper()
	for _, m := range md.Modes {
		if m.Kind == kind && (kind != Vertical || m.Symmetric == symmetric) {
			return m
		}
	}
	t.Fatalf("no %s mode (symmetric %v) among %d", kind, symmetric, len(md.Modes))
	return Mode{}
}

// ofKind returns the frequencies of the modes of a kind, lowest first.
func ofKind(md Modal, kind Kind) []float64 {
	var out []float64
	for _, m := range md.Modes {
		if m.Kind == kind {
			out = append(out, float64(m.Frequency))
		}
	}
	return out
}

func near(t *testing.T, what string, got, want, rel float64) {
	t.Helper()
	if !scalar.EqualWithinAbsOrRel(got, want, 0, rel) {
		t.Errorf("%s = %.9g, want %.9g (relative %.2g, tolerance %.2g)", what, got, want, got/want-1, rel)
	}
}

// symmetricRoot returns the first root ω̄ ∈ (π, 3π) of the frequency
// equation of the symmetric in-plane modes of Irvine & Caughey (1974),
// tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³, by bisection of the pole-free form
// λ² sin x − x cos x (λ² − 4x²) = 0, x = ω̄/2 ∈ (π/2, 3π/2).
func symmetricRoot(l2 float64) float64 {
	g := func(x float64) float64 { return l2*math.Sin(x) - x*math.Cos(x)*(l2-4*x*x) }
	lo, hi := math.Pi/2, 3*math.Pi/2
	for range 200 {
		mid := (lo + hi) / 2
		if (g(mid) > 0) == (g(lo) > 0) {
			lo = mid
		} else {
			hi = mid
		}
	}
	return lo + hi // 2x
}
