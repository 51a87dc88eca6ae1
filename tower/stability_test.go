package tower_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// byID returns the result with the given ID.
func byID(t *testing.T, rs []check.Result, id string) check.Result {
	t.Helper()
	for _, r := range rs {
		if r.ID == id {
			return r
		}
	}
	t.Fatalf("no result %s in %v", id, rs)
	return check.Result{}
}

func TestStabilityHand(t *testing.T) {
	// Hand calculation (statics): column 0.6 × 0.6 × 3.0 m at 24 kN/m³ =
	// 25.92 kN; footing 2.0 × 1.5 × 0.6 m = 43.2 kN; rope V 100 kN, H 20 kN at
	// 3.0 m. Underside: V = 169.12 kN, M = 20·(3.0 + 0.6) = 72 kN·m.
	// Span-side toe: resisting 169.12 × 1.0, overturning 72 → FoS 2.3489.
	// Sliding: 0.5 × 169.12 / 20 = 4.228. e_b = 0.42573 m > L/6: triangle,
	// q_max = 2V/(3B(L/2 − e)) = 130.9 kPa.
	col := tower.Column{Depth: 0.6, Width: 0.6, Height: 3.0}
	ft := tower.Footing{Length: 2.0, Width: 1.5, Thickness: 0.6, Depth: 0.6}
	r, err := tower.Combine([]tower.LevelForce{{Height: 3.0, Vertical: kN(100), Horizontal: kN(20)}}, col.Weight())
	if err != nil {
		t.Fatal(err)
	}
	rs, err := tower.Stability(r, col, ft, &tower.StabilityFactors{AllowablePressure: 150 * units.Kilopascal})
	if err != nil {
		t.Fatal(err)
	}
	v := 100 + 25.92 + 43.2
	ot := byID(t, rs, "tower.overturning")
	if !near(ot.Provided, v*1.0/72, 1e-12) || ot.Required != 2 || ot.Status != check.Pass || !strings.Contains(ot.Basis, "span-side toe") {
		t.Errorf("overturning %+v", ot)
	}
	sl := byID(t, rs, "tower.sliding")
	if !near(sl.Provided, 0.5*v/20, 1e-12) || sl.Required != 1.5 {
		t.Errorf("sliding %+v", sl)
	}
	e := 72 / v
	bp := byID(t, rs, "tower.base_pressure")
	if !near(bp.Demand, 2*v*1e3/(3*1.5*(1-e)), 1e-12) || bp.Capacity != 150e3 || bp.Status != check.Pass {
		t.Errorf("pressure %+v", bp)
	}
	if !near(bp.Demand, 130.9e3, 5e-4) {
		t.Errorf("pressure %g against the hand value 130.9 kPa", bp.Demand)
	}
	br := byID(t, rs, "tower.base_resultant")
	if !near(br.Demand, e, 1e-12) || br.Capacity != 1.0 {
		t.Errorf("base resultant %+v", br)
	}
	a := ft.Actions(r, col)
	if !near(float64(a.Vertical), v*1e3, 1e-12) || !near(float64(a.Moment), 72e3, 1e-12) || a.Horizontal != kN(20) {
		t.Errorf("actions %+v", a)
	}
}

func TestBasePressure(t *testing.T) {
	// [D] values by the middle-third rule (Das, eccentrically loaded
	// foundations; formula values, checked here also by equilibrium
	// through quadrature of the returned distribution): strip N 300 kN/m,
	// B 2 m: e 0.2 → 240/60 kPa; e 0.5 → 400 kPa over 1.5 m.
	// A 1 m wide footing 2 m long carries 300 kN in total: footing
	// 2·1·0.5·24 = 24 kN, column 0.4·0.4·2·24 = 7.68 kN, rope 268.32 kN.
	col := tower.Column{Depth: 0.4, Width: 0.4, Height: 2}
	ft := tower.Footing{Length: 2, Width: 1, Thickness: 0.5}
	for _, tc := range []struct {
		e, qmax, contact float64
	}{{0.2, 240e3, 2}, {0.5, 400e3, 1.5}} {
		r := tower.Resultant{Vertical: kN(268.32), BaseMoment: units.Moment(300e3 * tc.e)}
		rs, err := tower.Stability(r, col, ft, nil)
		if err != nil {
			t.Fatal(err)
		}
		bp := byID(t, rs, "tower.base_pressure")
		if !near(bp.Demand, tc.qmax, 1e-9) || bp.Status != check.Info {
			t.Errorf("e %g: q_max %g, want %g (%v)", tc.e, bp.Demand, tc.qmax, bp.Status)
		}
		// Equilibrium of a linear, tension-free distribution with peak
		// q_max at the span-side edge x = +1: force fixes the other end
		// (q_min for the trapezoid, the contact length for the triangle).
		q := func(x float64) float64 { return 0 }
		if tc.contact == 2 {
			qmin := 2*300e3/2 - bp.Demand
			q = func(x float64) float64 { return qmin + (bp.Demand-qmin)*(x+1)/2 }
		} else {
			c := 2 * 300e3 / bp.Demand
			q = func(x float64) float64 { return math.Max(0, bp.Demand*(x-(1-c))/c) }
			if !near(c, tc.contact, 1e-9) {
				t.Errorf("contact length %g", c)
			}
		}
		f := quad.Fixed(q, -1, 1, 2000, nil, 0)
		m := quad.Fixed(func(x float64) float64 { return q(x) * x }, -1, 1, 2000, nil, 0)
		if !near(f, 300e3, 1e-6) || !near(m, 300e3*tc.e, 1e-5) {
			t.Errorf("e %g: quadrature gives V %g M %g", tc.e, f, m)
		}
	}
}

func TestStabilityConsistency(t *testing.T) {
	// The overturning factor falls below 1 exactly when the resultant leaves
	// the base, and then the base-pressure check fails, and the column-base
	// eccentricity, the base eccentricity and the critical toe all lie on the
	// same side. Mirrored forces give the same factors about the other toe.
	col := tower.Column{Depth: 0.6, Width: 0.8, Height: 3.0}
	ft := tower.Footing{Length: 2.2, Width: 1.6, Thickness: 0.6, Depth: 1.2, SoilUnitWeight: 18 * units.KilonewtonPerCubicMetre, ColumnOffset: -0.3}
	for _, h := range []float64{0, 10, 40, 80, 120, 200, -10, -80, -200} {
		r, err := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(60), Horizontal: kN(h)}}, col.Weight())
		if err != nil {
			t.Fatal(err)
		}
		rs, err := tower.Stability(r, col, ft, nil)
		if err != nil {
			t.Fatal(err)
		}
		ot, bp, br := byID(t, rs, "tower.overturning"), byID(t, rs, "tower.base_pressure"), byID(t, rs, "tower.base_resultant")
		outside := ot.Provided < 1
		if outside != (br.Status == check.Fail) || outside != (bp.Status == check.Fail) {
			t.Errorf("H %g: overturning factor %g, base resultant %v, base pressure %v", h, ot.Provided, br.Status, bp.Status)
		}
		a := ft.Actions(r, col)
		// About the toe on the side the rope moment turns toward, statics gives
		// resisting − overturning = V·L/2 − s·M (s = ±1 for that side), and the
		// overturning moment is the rope moment |H|·(3.0 + 0.6).
		if h != 0 {
			drv := math.Abs(h) * 3.6e3
			s := math.Copysign(1, h)
			want := (float64(a.Vertical)*1.1 - s*float64(a.Moment) + drv) / drv
			if !near(ot.Provided, want, 1e-9) {
				t.Errorf("H %g: overturning factor %g, want %g", h, ot.Provided, want)
			}
		}
		if outside {
			ec, _ := tower.EccentricityCheck(r, col, nil)
			side := "toward the span"
			toe := "span-side toe"
			if h < 0 {
				side, toe = "toward the backstay", "backstay-side toe"
			}
			eb, _ := bp.Value("e_b")
			if !strings.Contains(strings.Join(ec.Notes, " "), side) || !strings.Contains(ot.Basis, toe) ||
				math.Copysign(1, eb.Value) != math.Copysign(1, h) || ec.Status != check.Fail {
				t.Errorf("H %g: directions disagree: %q / %q / e_b %v", h, ec.Notes, ot.Basis, eb)
			}
		}
	}
	// Mirror: a centred column, forces reversed.
	ft.ColumnOffset = 0
	r1, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(60), Horizontal: kN(35)}}, 0)
	r2, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(60), Horizontal: kN(-35)}}, 0)
	a, _ := tower.Stability(r1, col, ft, nil)
	b, _ := tower.Stability(r2, col, ft, nil)
	for i := range a {
		if !near(a[i].Ratio, b[i].Ratio, 1e-12) || a[i].ID != b[i].ID {
			t.Errorf("mirror %s: %g vs %g", a[i].ID, a[i].Ratio, b[i].Ratio)
		}
	}
}

func TestFootingActionsBackfill(t *testing.T) {
	// Backfill 18 kN/m³ over 0.4 m on a 2.0 × 1.5 m footing less a
	// 0.6 × 0.6 m column: 18·0.4·(3.0 − 0.36) = 19.008 kN. With the column
	// 0.3 m toward the span, the backfill's moment about the footing centre
	// is −18·0.4·0.36·0.3 (the hole it lacks is on the span side).
	col := tower.Column{Depth: 0.6, Width: 0.6, Height: 3.0}
	ft := tower.Footing{Length: 2.0, Width: 1.5, Thickness: 0.6, Depth: 1.0, SoilUnitWeight: 18 * units.KilonewtonPerCubicMetre, ColumnOffset: 0.3}
	r := tower.Resultant{Vertical: kN(100), Horizontal: kN(20), BaseMoment: kNm(60)}
	a := ft.Actions(r, col)
	wantV := 100 + 25.92 + 43.2 + 19.008
	wantM := 60 + 20*0.6 + (100+25.92)*0.3 - 18*0.4*0.36*0.3
	if !near(float64(a.Vertical), wantV*1e3, 1e-12) || !near(float64(a.Moment), wantM*1e3, 1e-12) {
		t.Errorf("actions %+v, want V %g M %g", a, wantV, wantM)
	}
	if !near(float64(a.Eccentricity()), wantM/wantV, 1e-12) {
		t.Errorf("eccentricity %v", a.Eccentricity())
	}
}

func kNm(x float64) units.Moment { return units.Moment(x) * units.KilonewtonMetre }

func TestStabilityFailures(t *testing.T) {
	col := tower.Column{Depth: 0.6, Width: 0.6, Height: 3.0}
	ft := tower.Footing{Length: 1.2, Width: 1.2, Thickness: 0.5}
	// H 150 kN at 3 m on 100 kN: the resultant leaves the base.
	r, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(100), Horizontal: kN(150)}}, 0)
	rs, err := tower.Stability(r, col, ft, &tower.StabilityFactors{Overturning: 1.5, Sliding: 1.2, Friction: 0.6})
	if err != nil {
		t.Fatal(err)
	}
	for _, res := range rs {
		if res.Status != check.Fail {
			t.Errorf("%s: %v, want FAIL", res.ID, res.Status)
		}
	}
	bp := byID(t, rs, "tower.base_pressure")
	if !strings.Contains(strings.Join(bp.Notes, " "), "outside the footing base") || math.IsNaN(bp.Demand) {
		t.Errorf("base pressure note %q", bp.Notes)
	}
	if ot := byID(t, rs, "tower.overturning"); ot.Required != 1.5 {
		t.Errorf("required factor %g", ot.Required)
	}
	tests := []struct {
		name     string
		r        tower.Resultant
		f        tower.Footing
		sf       *tower.StabilityFactors
		sentinel error
	}{
		{"column wider than footing", r, tower.Footing{Length: 0.5, Width: 1.2, Thickness: 0.5}, nil, tower.ErrInvalid},
		{"column off the footing", r, tower.Footing{Length: 1.2, Width: 1.2, Thickness: 0.5, ColumnOffset: 0.4}, nil, tower.ErrInvalid},
		{"no thickness", r, tower.Footing{Length: 1.2, Width: 1.2}, nil, tower.ErrInvalid},
		{"factor below 1", r, ft, &tower.StabilityFactors{Overturning: 0.5}, tower.ErrInvalid},
		{"negative friction", r, ft, &tower.StabilityFactors{Friction: -0.5}, tower.ErrInvalid},
		{"NaN pressure", r, ft, &tower.StabilityFactors{AllowablePressure: units.Pressure(math.NaN())}, tower.ErrInvalid},
		{"footing lifts", tower.Resultant{Vertical: kN(-300)}, ft, nil, tower.ErrLiftOff},
	}
	for _, tc := range tests {
		if _, err := tower.Stability(tc.r, col, tc.f, tc.sf); !errors.Is(err, tc.sentinel) {
			t.Errorf("%s: got %v, want %v", tc.name, err, tc.sentinel)
		}
	}
}

func BenchmarkStability(b *testing.B) {
	col := tower.Column{Depth: 0.6, Width: 0.8, Height: 3.0}
	ft := tower.Footing{Length: 2.2, Width: 1.6, Thickness: 0.6, Depth: 1.2}
	r, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(60), Horizontal: kN(30)}}, col.Weight())
	b.ReportAllocs()
	var sink []check.Result
	for b.Loop() {
		sink, _ = tower.Stability(r, col, ft, nil)
	}
	_ = sink
}

func FuzzTowerChain(f *testing.F) {
	f.Add(180e3, 0.2, 185e3, 0.6, 3.2, 0.0, 0.9, 3.5, 2.4, 0.7, 0.0, uint8(0))
	f.Add(40e3, -0.3, 40e3, 0.7, 4.3, 0.05, 0.5, 2.0, 1.0, 0.4, -0.2, uint8(1))
	f.Add(1e9, 1.5, 0.0, 0.0, 0.0, 0.0, 0.3, 1.0, 0.3, 0.1, 0.0, uint8(2))
	f.Fuzz(func(t *testing.T, ts, as, tb, ab, y, off, d, hc, l, th, xc float64, kind uint8) {
		s := tower.Saddle{Kind: tower.SaddleKind(kind % 4), Height: units.Length(y), Offset: units.Length(off)}
		lf, err := s.Force(tower.RopePull{Tension: units.Force(ts), Angle: units.Angle(as)}, tower.RopePull{Tension: units.Force(tb), Angle: units.Angle(ab)})
		if err != nil {
			if !errors.Is(err, tower.ErrInvalid) && !errors.Is(err, tower.ErrLiftOff) {
				t.Fatal(err)
			}
			return
		}
		col := tower.Column{Depth: units.Length(d), Width: units.Length(d), Height: units.Length(hc)}
		r, err := tower.Combine([]tower.LevelForce{lf}, 0)
		if err != nil {
			return
		}
		bad := func(rs ...check.Result) {
			for _, res := range rs {
				if math.IsNaN(res.Demand) || math.IsNaN(res.Ratio) || math.IsNaN(res.Capacity) || math.IsNaN(res.Provided) {
					t.Fatalf("NaN in %+v", res)
				}
			}
		}
		if res, err := tower.EccentricityCheck(r, col, nil); err == nil {
			bad(res)
		}
		ft := tower.Footing{Length: units.Length(l), Width: units.Length(l), Thickness: units.Length(th), ColumnOffset: units.Length(xc)}
		if rs, err := tower.Stability(r, col, ft, nil); err == nil {
			bad(rs...)
		} else if !errors.Is(err, tower.ErrInvalid) && !errors.Is(err, tower.ErrLiftOff) {
			t.Fatal(err)
		}
	})
}

func TestStabilityHuge(t *testing.T) {
	// Sizes that overflow the weights are refused, never turned into Inf or NaN.
	col := tower.Column{Depth: 1e200, Width: 1e200, Height: 1e200}
	r := tower.Resultant{Vertical: kN(100)}
	if _, err := tower.EccentricityCheck(r, col, nil); !errors.Is(err, tower.ErrInvalid) {
		t.Errorf("eccentricity: %v", err)
	}
	ft := tower.Footing{Length: 1e200, Width: 1e200, Thickness: 1e200}
	if _, err := tower.Stability(r, tower.Column{Depth: 1, Width: 1, Height: 1}, ft, nil); !errors.Is(err, tower.ErrInvalid) {
		t.Errorf("stability: %v", err)
	}
}
