package cable_test

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// unstretchedAlong returns ∫ ds/(1 + T/EA) over any shape by gonum
// quadrature in x, ds = (T/H) dx, split into pieces at the given abscissae.
func unstretchedAlong(s cable.Shape, ea float64, breaks ...float64) float64 {
	L := float64(s.Span().Length)
	xs := append([]float64{0}, breaks...)
	xs = append(xs, L)
	h := float64(s.Horizontal())
	var l0 float64
	for i := 1; i < len(xs); i++ {
		l0 += integrate(func(x float64) float64 {
			t := float64(s.Tension(units.Length(x)))
			return t / h / (1 + t/ea)
		}, xs[i-1], xs[i])
	}
	return l0
}

// TestOneConstitutiveLaw checks that the change of state (Loaded shapes),
// the elastic catenary and a straight backstay follow one law, Hooke's law
// on the unstretched length, ds = (1 + T/EA) dp (see the package doc).
func TestOneConstitutiveLaw(t *testing.T) {
	// A taut inclined rope so light that it is straight to 1e-12: the three
	// models must give one unstretched length for one H. The earlier
	// first-order rule, L₀ = S − ∫T ds/EA, differed from the backstay's
	// c/(1 + T/EA) by ε² c, 1.2e-6 here, and would fail this test.
	sp := cable.Span{Length: 50, Rise: 20}
	ea := 1e8
	h := 1e5
	w := units.LoadPerLength(1e-3)
	loaded, err := cable.NewLoaded(sp, cable.Load{Uniform: w}, units.Force(h))
	if err != nil {
		t.Fatal(err)
	}
	l0, err := cable.UnstretchedLength(sp, units.AxialStiffness(ea), cable.Load{Uniform: w}, units.Force(h))
	if err != nil {
		t.Fatal(err)
	}
	c := float64(sp.Chord())
	tChord := h * c / float64(sp.Length) // tension along a straight rope of horizontal component H
	approx(t, "Loaded vs straight backstay c/(1+T/EA)", float64(l0), c/(1+tChord/ea), 1e-9)
	el, err := cable.NewElasticCatenary(sp, cable.ElasticRope{Unstretched: l0, EA: units.AxialStiffness(ea), Weight: w})
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "elastic catenary H on the same unstretched length", float64(el.Horizontal()), h, 1e-9)
	approx(t, "Loaded L₀ by quadrature", unstretchedAlong(loaded, ea), float64(l0), 1e-12)

	// Sagging ropes: each model's unstretched length is ∫ ds/(1 + T/EA)
	// along its own shape, by quadrature.
	for _, c := range []struct {
		name string
		span cable.Span
		ea   float64
	}{
		{"level, 1/12 sag", cable.Span{Length: 100}, 5e7},
		{"inclined, stiff", cable.Span{Length: 80, Rise: 12}, 4e8},
		{"SSNL114", cable.Span{Length: 325}, 5.70e10 * 2.2783e-4},
	} {
		rope := cable.ElasticRope{Unstretched: c.span.Chord() * 1.02, EA: units.AxialStiffness(c.ea), Weight: 4e3}
		if c.name == "SSNL114" {
			rope = cable.ElasticRope{Unstretched: 325, EA: units.AxialStiffness(c.ea), Weight: units.LoadPerLength(2844.23 * 9.81 * 2.2783e-4)}
		}
		el, err := cable.NewElasticCatenary(c.span, rope)
		if err != nil {
			t.Fatal(err)
		}
		approx(t, c.name+": elastic catenary L₀ by quadrature", unstretchedAlong(el, c.ea), float64(rope.Unstretched), 1e-10)
		ld := cable.Load{Uniform: 3e3, Patches: []cable.Patch{{From: c.span.Length / 4, To: c.span.Length / 2, Load: 6e3}}}
		lh := units.Force(20 * c.ea * 1e-3)
		loaded, err := cable.NewLoaded(c.span, ld, lh)
		if err != nil {
			t.Fatal(err)
		}
		got, err := cable.UnstretchedLength(c.span, units.AxialStiffness(c.ea), ld, lh)
		if err != nil {
			t.Fatal(err)
		}
		approx(t, c.name+": Loaded L₀ by quadrature", unstretchedAlong(loaded, c.ea, float64(c.span.Length/4), float64(c.span.Length/2)), float64(got), 1e-12)
		// a change of state from a state to itself returns it
		st := cable.State{Load: ld, H: lh, Temperature: units.FromCelsius(10)}
		same, err := cable.ChangeOfState(c.span, cable.Elastic{EA: units.AxialStiffness(c.ea), Alpha: 12e-6}, st, ld, st.Temperature)
		if err != nil {
			t.Fatal(err)
		}
		approx(t, c.name+": change of state to itself", float64(same.H), float64(lh), 1e-12)
		// and StateForLength inverts UnstretchedLength
		back, err := cable.StateForLength(c.span, units.AxialStiffness(c.ea), ld, got, st.Temperature)
		if err != nil {
			t.Fatal(err)
		}
		approx(t, c.name+": StateForLength", float64(back.H), float64(lh), 1e-12)
	}
	if _, err := cable.StateForLength(sp, units.AxialStiffness(ea), cable.Load{Uniform: w}, units.Length(math.NaN()), units.FromCelsius(10)); err == nil {
		t.Error("NaN unstretched length accepted")
	}
	if _, err := cable.UnstretchedLength(sp, 0, cable.Load{Uniform: w}, 1e5); err == nil {
		t.Error("zero EA accepted")
	}
}
