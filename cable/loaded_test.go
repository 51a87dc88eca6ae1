package cable_test

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// loadMomentA returns ∫ x q(x) dx of l over s by quadrature on each piece.
func loadMomentA(s cable.Span, l cable.Load) float64 {
	L := float64(s.Length)
	m := float64(l.Uniform) * L * L / 2
	for _, p := range l.Patches {
		m += integrate(func(x float64) float64 { return x * float64(p.Load) }, float64(p.From), float64(p.To))
	}
	return m
}

func TestLoadedMatchesParabola(t *testing.T) {
	// Under a uniform load the funicular is the parabola (general cable theorem).
	sp := cable.Span{Length: 80, Rise: -6}
	p, _ := cable.NewParabola(sp, 2500, 6)
	l, err := cable.NewLoaded(sp, cable.Load{Uniform: 2500}, p.Horizontal())
	if err != nil {
		t.Fatal(err)
	}
	for _, x := range []units.Length{0, 13, 40, 71, 80} {
		approxAbs(t, "z", float64(l.Z(x)), float64(p.Z(x)), 1e-12*80)
		approx(t, "T", float64(l.Tension(x)), float64(p.Tension(x)), 1e-12)
	}
	approx(t, "length", float64(l.Length()), float64(p.Length()), 1e-13)
	lx, lz, lw := l.Vertex()
	px, pz, pw := p.Vertex()
	approx(t, "low x", float64(lx), float64(px), 1e-12)
	approx(t, "low z", float64(lz), float64(pz), 1e-12)
	if lw != pw {
		t.Error("low point within differs")
	}
}

func TestLoadedConsistency(t *testing.T) {
	half := func(L units.Length, q units.LoadPerLength) []cable.Patch {
		return []cable.Patch{{From: 0, To: L / 2, Load: q}}
	}
	for _, c := range []struct {
		span cable.Span
		load cable.Load
		h    units.Force
	}{
		{cable.Span{Length: 100}, cable.Load{Uniform: 2000, Patches: half(100, 3000)}, 400e3},
		{cable.Span{Length: 100, Rise: 12}, cable.Load{Uniform: 2000, Patches: half(100, 3000)}, 400e3},
		{cable.Span{Length: 100, Rise: -12}, cable.Load{Uniform: 2000, Patches: []cable.Patch{{From: 50, To: 100, Load: 3000}}}, 400e3},
		{cable.Span{Length: 60}, cable.Load{Patches: []cable.Patch{{From: 10, To: 25, Load: 5000}, {From: 20, To: 60, Load: 1000}}}, 150e3},
		{cable.Span{Length: 60, Rise: 30}, cable.Load{Uniform: 500, Patches: []cable.Patch{{From: 0, To: 5, Load: 5000}}}, 150e3}, // vertex before A
		{cable.Span{Length: 60, Rise: 30}, cable.Load{Patches: []cable.Patch{{From: 30, To: 60, Load: 1000}}}, 150e3},             // unloaded end: no vertex
	} {
		l, err := cable.NewLoaded(c.span, c.load, c.h)
		if err != nil {
			t.Fatalf("%+v: %v", c, err)
		}
		checkShape(t, "loaded", l, float64(c.load.Total(c.span)), loadMomentA(c.span, c.load))
		mirrored := cable.Load{Uniform: c.load.Uniform}
		for _, p := range c.load.Patches {
			mirrored.Patches = append(mirrored.Patches, cable.Patch{From: c.span.Length - p.To, To: c.span.Length - p.From, Load: p.Load})
		}
		m, err := cable.NewLoaded(c.span.Mirror(), mirrored, c.h)
		if err != nil {
			t.Fatal(err)
		}
		checkMirror(t, "loaded", l, m)
		// sag is M/H: the midspan moment by quadrature of the shear
		byQuad, _ := cable.LoadedWithSag(c.span, c.load, l.Sag(c.span.Length/2))
		approx(t, "H from sag", float64(byQuad.Horizontal()), float64(c.h), 1e-12)
	}
}

func TestLoadInvalid(t *testing.T) {
	sp := cable.Span{Length: 50}
	for _, c := range []struct {
		what string
		load cable.Load
	}{
		{"no load", cable.Load{}},
		{"negative uniform", cable.Load{Uniform: -1}},
		{"patch beyond span", cable.Load{Uniform: 1, Patches: []cable.Patch{{From: 40, To: 60, Load: 1}}}},
		{"patch before A", cable.Load{Uniform: 1, Patches: []cable.Patch{{From: -1, To: 10, Load: 1}}}},
		{"reversed patch", cable.Load{Uniform: 1, Patches: []cable.Patch{{From: 20, To: 10, Load: 1}}}},
		{"NaN patch load", cable.Load{Uniform: 1, Patches: []cable.Patch{{From: 0, To: 10, Load: units.LoadPerLength(math.NaN())}}}},
	} {
		_, err := cable.NewLoaded(sp, c.load, 1000)
		wantInvalid(t, c.what, err)
	}
	_, err := cable.NewLoaded(sp, cable.Load{Uniform: 1}, 0)
	wantInvalid(t, "zero H", err)
}

func TestLoadTotal(t *testing.T) {
	sp := cable.Span{Length: 40}
	l := cable.Load{Uniform: 1000, Patches: []cable.Patch{{From: 0, To: 20, Load: 500}, {From: 30, To: 50, Load: 100}}}
	// hand sum: 1000·40 + 500·20 + 100·10 (the second patch clipped at the span)
	approx(t, "total", float64(l.Total(sp)), 40000+10000+1000, 1e-15)
}
