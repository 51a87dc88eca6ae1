package cable_test

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

func TestCatenaryReferences(t *testing.T) {
	// [D] computed by hand from y = a(cosh(x/a) − 1); here the
	// values come from the closed forms in u and k and from the length
	// and sag solvers, a different route.
	lv, err := cable.CatenaryWithTension(cable.Span{Length: 100}, units.KilonewtonPerMetre, 100*units.Kilonewton)
	if err != nil {
		t.Fatal(err)
	}
	_, tb := lv.SupportTensions()
	approx(t, "level sag", float64(lv.Sag(50)), 12.76260, 1e-6)
	approx(t, "level S", float64(lv.Length()), 104.21906, 1e-7)
	approx(t, "level T_max", float64(tb), 112.76260e3, 1e-6)

	in, err := cable.CatenaryWithTension(cable.Span{Length: 100, Rise: 10}, units.KilonewtonPerMetre, 100*units.Kilonewton)
	if err != nil {
		t.Fatal(err)
	}
	va, vb := in.Reactions()
	ta, tb := in.SupportTensions()
	for _, c := range []struct {
		what      string
		got, want float64
	}{
		{"S", float64(in.Length()), 104.69772},
		{"T_A", float64(ta), 108.28049e3},
		{"T_B", float64(tb), 118.28049e3},
		{"V_A", float64(va), 41.52909e3},
		{"V_B", float64(vb), 63.16863e3},
		{"sag", float64(in.Sag(50)), 12.82121},
	} {
		approx(t, c.what, c.got, c.want, 5e-7) // values given to 5 decimals
	}
	// invariant T_B − T_A = w h (standard catenary property)
	approx(t, "T_B − T_A", float64(tb-ta), 10e3, 1e-9)

	// the sag and length solvers recover H
	bySag, err := cable.NewCatenary(in.Span(), in.Load(), in.Sag(50))
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "H from sag", float64(bySag.Horizontal()), 100e3, 1e-11)
	byLen, err := cable.CatenaryWithLength(in.Span(), in.Load(), in.Length())
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "H from length", float64(byLen.Horizontal()), 100e3, 1e-10)
}

func TestCatenaryConsistency(t *testing.T) {
	for _, c := range []struct {
		span cable.Span
		w    units.LoadPerLength
		sag  units.Length
	}{
		{cable.Span{Length: 100, Rise: 10}, 1000, 12},
		{cable.Span{Length: 100, Rise: -10}, 1000, 12},
		{cable.Span{Length: 60}, 250, 30},              // deep: sag half the span
		{cable.Span{Length: 120, Rise: 60}, 800, 3},    // steep and shallow: vertex before A
		{cable.Span{Length: 200, Rise: -5}, 40, 0.02},  // very taut
		{cable.Span{Length: 20, Rise: 3}, 100, 40},     // sag twice the span
		{cable.Span{Length: 150, Rise: -150}, 300, 10}, // 45° chord
	} {
		cat, err := cable.NewCatenary(c.span, c.w, c.sag)
		if err != nil {
			t.Fatalf("%+v: %v", c, err)
		}
		approx(t, "midspan sag", float64(cat.Sag(c.span.Length/2)), float64(c.sag), 1e-10)
		// load along the arc: total w S; moment about A by quadrature of x w ds
		L := float64(c.span.Length)
		moment := integrate(func(x float64) float64 {
			return x * float64(c.w) * math.Hypot(1, slopeOf(cat, x))
		}, 0, L)
		checkShape(t, "catenary", cat, float64(c.w)*float64(cat.Length()), moment)
		ta, tb := cat.SupportTensions()
		approxAbs(t, "T_B − T_A − w h", float64(tb-ta), float64(c.w)*float64(c.span.Rise), 1e-9*float64(tb))
		m, err := cable.NewCatenary(c.span.Mirror(), c.w, c.sag)
		if err != nil {
			t.Fatal(err)
		}
		checkMirror(t, "catenary", cat, m)
		byLen, err := cable.CatenaryWithLength(c.span, c.w, cat.Length())
		if err != nil {
			t.Fatal(err)
		}
		approx(t, "H from length", float64(byLen.Horizontal()), float64(cat.Horizontal()), 1e-8)
	}
}

// TestCatenaryTendsToParabola: as the sag ratio shrinks, the catenary
// (w per arc metre) and the parabola (w S/L per horizontal metre) agree to
// within O(n²) (standard result: the catenary's load per horizontal metre
// differs from uniform by the factor √(1+z'²) = 1 + O(n²)).
//
// On an inclined span (chord slope c) the load per horizontal metre also
// varies linearly by a fraction about 2 c n, so the shapes there differ by
// O(n (n + c)).
func TestCatenaryTendsToParabola(t *testing.T) {
	for _, rise := range []units.Length{0, 8} {
		testCatenaryTendsToParabola(t, cable.Span{Length: 100, Rise: rise})
	}
}

func testCatenaryTendsToParabola(t *testing.T, sp cable.Span) {
	c := math.Abs(float64(sp.Rise / sp.Length))
	prev := math.Inf(1)
	for _, n := range []float64{0.1, 0.03, 0.01, 0.003, 0.001} {
		sag := units.Length(n * 100)
		cat, err := cable.NewCatenary(sp, 1000, sag)
		if err != nil {
			t.Fatal(err)
		}
		wh := 1000 * float64(cat.Length()) / 100
		par, err := cable.NewParabola(sp, units.LoadPerLength(wh), sag)
		if err != nil {
			t.Fatal(err)
		}
		diff := math.Abs(float64(cat.Horizontal()-par.Horizontal())) / float64(par.Horizontal())
		if diff > 2*n*n || diff >= prev {
			t.Errorf("n = %g: relative H difference %g, want below 2n² and shrinking", n, diff)
		}
		prev = diff
		approxAbs(t, "quarter-span sag", float64(cat.Sag(25)), float64(par.Sag(25)), 2*n*(n+c)*float64(sag))
	}
}

func TestCatenaryInvalid(t *testing.T) {
	sp := cable.Span{Length: 100, Rise: 10}
	_, err := cable.CatenaryWithLength(sp, 1000, sp.Chord())
	wantInvalid(t, "length = chord", err)
	_, err = cable.CatenaryWithLength(sp, 1000, 90)
	wantInvalid(t, "length < chord", err)
	_, err = cable.CatenaryWithLength(sp, 1000, units.Length(math.NaN()))
	wantInvalid(t, "NaN length", err)
	_, err = cable.NewCatenary(sp, 1000, 0)
	wantInvalid(t, "zero sag", err)
	_, err = cable.NewCatenary(sp, -1, 3)
	wantInvalid(t, "negative load", err)
	_, err = cable.NewCatenary(cable.Span{Length: units.Length(math.Inf(1))}, 1, 3)
	wantInvalid(t, "infinite span", err)
	_, err = cable.CatenaryWithTension(sp, 1000, -5)
	wantInvalid(t, "negative H", err)
	// so slack that cosh overflows: an error, not Inf
	_, err = cable.CatenaryWithTension(sp, 1e6, 1e-3)
	wantInvalid(t, "overflowing catenary", err)
}
