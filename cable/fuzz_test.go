package cable_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// fuzzErr fails t unless err is nil or wraps one of the sentinels.
func fuzzErr(t *testing.T, err error) bool {
	t.Helper()
	if err == nil {
		return true
	}
	if !errors.Is(err, cable.ErrInvalid) && !errors.Is(err, cable.ErrNoConvergence) {
		t.Fatalf("error %v wraps no sentinel", err)
	}
	return false
}

func fuzzShape(t *testing.T, what string, s cable.Shape) {
	t.Helper()
	if !shapeFinite(s) {
		t.Fatalf("%s: non-finite answer for %+v", what, s.Span())
	}
	if s.Horizontal() <= 0 {
		t.Fatalf("%s: H %v", what, s.Horizontal())
	}
	va, vb := s.Reactions()
	ta, tb := s.SupportTensions()
	if ta < s.Horizontal() || tb < s.Horizontal() || math.Abs(float64(va)) > float64(ta)*(1+1e-12) || math.Abs(float64(vb)) > float64(tb)*(1+1e-12) {
		t.Fatalf("%s: tensions %v %v below H %v or V", what, ta, tb, s.Horizontal())
	}
}

func FuzzParabola(f *testing.F) {
	f.Add(100.0, 10.0, 2000.0, 8.0)
	f.Add(1e-3, -5.0, 1e9, 1e-9)
	f.Fuzz(func(t *testing.T, l, rise, w, sag float64) {
		sp := cable.Span{Length: units.Length(l), Rise: units.Length(rise)}
		p, err := cable.NewParabola(sp, units.LoadPerLength(w), units.Length(sag))
		if fuzzErr(t, err) {
			fuzzShape(t, "parabola", p)
			q, err := cable.ParabolaWithTension(sp, units.LoadPerLength(w), p.Horizontal())
			if fuzzErr(t, err) {
				fuzzShape(t, "parabola with tension", q)
			}
		}
	})
}

func FuzzCatenary(f *testing.F) {
	f.Add(100.0, 10.0, 1000.0, 12.0, 104.0, 1e5)
	f.Add(20.0, 3.0, 100.0, 40.0, 25.0, 1.0)
	f.Add(200.0, -5.0, 40.0, 0.02, 200.1, 1e9)
	f.Fuzz(func(t *testing.T, l, rise, w, sag, length, h float64) {
		sp := cable.Span{Length: units.Length(l), Rise: units.Length(rise)}
		c, err := cable.NewCatenary(sp, units.LoadPerLength(w), units.Length(sag))
		if fuzzErr(t, err) {
			fuzzShape(t, "catenary by sag", c)
			if got := float64(c.Sag(sp.Length / 2)); math.Abs(got-sag) > 1e-8*(sag+math.Abs(rise)+l) {
				t.Fatalf("sag %g, want %g", got, sag)
			}
		}
		c, err = cable.CatenaryWithLength(sp, units.LoadPerLength(w), units.Length(length))
		if fuzzErr(t, err) {
			fuzzShape(t, "catenary by length", c)
			if got := float64(c.Length()); math.Abs(got-length) > 1e-8*length {
				t.Fatalf("length %g, want %g", got, length)
			}
		}
		c, err = cable.CatenaryWithTension(sp, units.LoadPerLength(w), units.Force(h))
		if fuzzErr(t, err) {
			fuzzShape(t, "catenary by tension", c)
		}
	})
}

func FuzzElasticCatenary(f *testing.F) {
	f.Add(325.0, 0.0, 325.0, 12.986e6, 6.357)
	f.Add(100.0, 10.0, 104.0, 50e6, 1000.0)
	f.Add(80.0, 20.0, 90.0, 2e4, 100.0)
	f.Add(100.0, 90.0, 60.0, 1e9, 10.0)
	f.Fuzz(func(t *testing.T, l, rise, l0, ea, w float64) {
		sp := cable.Span{Length: units.Length(l), Rise: units.Length(rise)}
		e, err := cable.NewElasticCatenary(sp, cable.ElasticRope{Unstretched: units.Length(l0), EA: units.AxialStiffness(ea), Weight: units.LoadPerLength(w)})
		if fuzzErr(t, err) {
			fuzzShape(t, "elastic", e)
			if !allFinite(e.Strain(), float64(e.StretchedLength())) {
				t.Fatal("non-finite strain")
			}
			x, z := e.At(units.Length(l0))
			c := float64(sp.Chord())
			if math.Abs(float64(x)-l) > 1e-8*c || math.Abs(float64(z)-rise) > 1e-8*c {
				t.Fatalf("end at (%v, %v), want (%g, %g)", x, z, l, rise)
			}
		}
	})
}

func FuzzLoaded(f *testing.F) {
	f.Add(60.0, 5.0, 2000.0, 0.0, 30.0, 4000.0, 3e5)
	f.Add(60.0, 30.0, 0.0, 30.0, 60.0, 1000.0, 1.5e5)
	f.Fuzz(func(t *testing.T, l, rise, u, a, b, p, h float64) {
		sp := cable.Span{Length: units.Length(l), Rise: units.Length(rise)}
		ld := cable.Load{Uniform: units.LoadPerLength(u), Patches: []cable.Patch{{From: units.Length(a), To: units.Length(b), Load: units.LoadPerLength(p)}}}
		c, err := cable.NewLoaded(sp, ld, units.Force(h))
		if fuzzErr(t, err) {
			fuzzShape(t, "loaded", c)
		}
	})
}

func FuzzChangeOfState(f *testing.F) {
	f.Add(80.0, 6.0, 36.8e6, 12e-6, 1200.0, 1.5e5, 293.15, 1200.0, 4000.0, 263.15)
	f.Add(325.0, 0.0, 12.986e6, 2.3e-5, 6.357, 13206.0, 273.15, 6.357, 0.0, 312.41)
	f.Fuzz(func(t *testing.T, l, rise, ea, alpha, w1, h1, t1, w2, crowd, t2 float64) {
		sp := cable.Span{Length: units.Length(l), Rise: units.Length(rise)}
		e := cable.Elastic{EA: units.AxialStiffness(ea), Alpha: units.ThermalExpansion(alpha)}
		from := cable.State{Load: cable.Load{Uniform: units.LoadPerLength(w1)}, H: units.Force(h1), Temperature: units.Temperature(t1)}
		to := cable.Load{Uniform: units.LoadPerLength(w2), Patches: []cable.Patch{{From: 0, To: units.Length(l / 2), Load: units.LoadPerLength(crowd)}}}
		if crowd == 0 {
			to.Patches = nil
		}
		s, err := cable.ChangeOfState(sp, e, from, to, units.Temperature(t2))
		if fuzzErr(t, err) && !(s.H > 0 && allFinite(float64(s.H))) {
			t.Fatalf("H %v", s.H)
		}
		c, err := cable.ChangeOfStateCubic(sp, e, from, units.LoadPerLength(w2), units.Temperature(t2))
		if fuzzErr(t, err) && !(c.H > 0 && allFinite(float64(c.H))) {
			t.Fatalf("cubic H %v", c.H)
		}
	})
}

func FuzzFrequencies(f *testing.F) {
	f.Add(100.0, 0.0, 245.25e3, 100.0, 1e9)
	f.Fuzz(func(t *testing.T, l, rise, h, m, ea float64) {
		md, err := cable.Frequencies(cable.Span{Length: units.Length(l), Rise: units.Length(rise)}, units.Force(h), units.MassPerLength(m), units.AxialStiffness(ea))
		if fuzzErr(t, err) {
			if !allFinite(float64(md.Swing), float64(md.Antisymmetric), float64(md.Symmetric), md.LambdaSq) {
				t.Fatalf("non-finite modes %+v", md)
			}
			r := float64(md.Symmetric / md.Swing)
			if r < 1-1e-12 || r > 2.8606*(1+1e-4) {
				t.Fatalf("symmetric/f₀ = %g outside [1, 2.8606]", r)
			}
		}
	})
}
