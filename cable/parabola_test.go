package cable_test

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

func TestParabolaReferences(t *testing.T) {
	// [D] (computed by hand from the same closed forms, so here only the
	// length is checked by a different route: quadrature in checkShape and
	// the values below are a regression on the formulas).
	p, err := cable.NewParabola(cable.Span{Length: 100, Rise: 10}, 2*units.KilonewtonPerMetre, 8)
	if err != nil {
		t.Fatal(err)
	}
	va, vb := p.Reactions()
	ta, tb := p.SupportTensions()
	x0, _, within := p.Vertex()
	for _, c := range []struct {
		what      string
		got, want float64
	}{
		{"H", float64(p.Horizontal()), 312.5e3},
		{"V_A", float64(va), 68.75e3},
		{"V_B", float64(vb), 131.25e3},
		{"T_A", float64(ta), 319.973e3},
		{"T_B", float64(tb), 338.944e3},
		{"x_low", float64(x0), 34.375},
		{"S", float64(p.Length()), 102.1566},
	} {
		approx(t, c.what, c.got, c.want, 5e-6)
	}
	if !within {
		t.Error("low point should be within the span")
	}

	// General cable theorem H = w l²/(8 f) (Hicks, Civil Engineering
	// Formulas, ch. 10, [M] for the attribution): w 2 N/m, l 100 m, sag 5 m → H = 500 N.
	q, err := cable.NewParabola(cable.Span{Length: 100}, 2, 5)
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "H (w 2 N/m, sag 5 m)", float64(q.Horizontal()), 500, 1e-12)

	// Hicks, Civil Engineering Formulas, ch. 10 [R]: level length series
	// L(1 + 8n²/3 − 32n⁴/5 + 256n⁶/7); the next term, of order 228 n⁸ (from
	// the series of the closed form), is 4e-7 L at n = 0.08.
	lv, _ := cable.NewParabola(cable.Span{Length: 100}, 2000, 8)
	n := 0.08
	series := 100 * (1 + 8*n*n/3 - 32*math.Pow(n, 4)/5 + 256*math.Pow(n, 6)/7)
	approx(t, "level length vs series", float64(lv.Length()), series, 1e-6)
	approx(t, "level length [D]", float64(lv.Length()), 101.68137, 1e-7)
}

func TestParabolaConsistency(t *testing.T) {
	for _, c := range []struct {
		span    cable.Span
		w       units.LoadPerLength
		sag     units.Length
		outside bool
	}{
		{cable.Span{Length: 100, Rise: 10}, 2000, 8, false},
		{cable.Span{Length: 100, Rise: -10}, 2000, 8, false},
		{cable.Span{Length: 48}, 3500, 2.4, false},
		{cable.Span{Length: 120, Rise: 40}, 1500, 4, true}, // steep, shallow: vertex before A
		{cable.Span{Length: 250, Rise: -30}, 5000, 25, false},
	} {
		p, err := cable.NewParabola(c.span, c.w, c.sag)
		if err != nil {
			t.Fatal(err)
		}
		L := float64(c.span.Length)
		checkShape(t, "parabola", p, float64(c.w)*L, float64(c.w)*L*L/2)
		approx(t, "midspan sag", float64(p.Sag(c.span.Length/2)), float64(c.sag), 1e-12)
		if _, _, within := p.Vertex(); within == c.outside {
			t.Errorf("low point within = %v for %+v", within, c.span)
		}
		m, err := cable.NewParabola(c.span.Mirror(), c.w, c.sag)
		if err != nil {
			t.Fatal(err)
		}
		checkMirror(t, "parabola", p, m)
		q, err := cable.ParabolaWithTension(c.span, c.w, p.Horizontal())
		if err != nil {
			t.Fatal(err)
		}
		approx(t, "with tension: sag", float64(q.Sag(c.span.Length/2)), float64(c.sag), 1e-12)
	}
}

func TestParabolaInvalid(t *testing.T) {
	nan := units.Length(math.NaN())
	ok := cable.Span{Length: 100}
	for _, c := range []struct {
		what string
		span cable.Span
		w    units.LoadPerLength
		sag  units.Length
	}{
		{"zero span", cable.Span{}, 1, 1},
		{"negative span", cable.Span{Length: -5}, 1, 1},
		{"NaN span", cable.Span{Length: nan}, 1, 1},
		{"Inf rise", cable.Span{Length: 10, Rise: units.Length(math.Inf(1))}, 1, 1},
		{"zero sag", ok, 1, 0},
		{"negative sag", ok, 1, -1},
		{"NaN sag", ok, 1, nan},
		{"zero load", ok, 0, 1},
		{"Inf load", ok, units.LoadPerLength(math.Inf(1)), 1},
	} {
		_, err := cable.NewParabola(c.span, c.w, c.sag)
		wantInvalid(t, c.what, err)
	}
	_, err := cable.ParabolaWithTension(ok, 1, 0)
	wantInvalid(t, "zero H", err)
	_, err = cable.ParabolaWithTension(ok, 1, units.Force(math.NaN()))
	wantInvalid(t, "NaN H", err)
}
