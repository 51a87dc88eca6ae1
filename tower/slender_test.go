package tower_test

import (
	"errors"
	"math"
	"reflect"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// slenderColumn is the 7 m × 0.35 m column of the tower issue: 350 × 350 mm
// effective section, C25/30, B500, 4 Ø16 (two on each face across the
// bending direction, centres 50 mm in), EN 1992-1-1 defaults (γc 1.5,
// γs 1.15, αcc 1), on a base taken rigid (k 1e-12) as in the hand
// calculations below; the default base flexibility is tested apart.
func slenderColumn(top tower.Restraint) tower.RCColumn {
	bar := units.Area(math.Pi * 0.008 * 0.008)
	return tower.RCColumn{
		Section: tower.RCSection{B: 0.35, H: 0.35, Fc: 25 * mpa, Fy: 500 * mpa, Code: tower.EN1992,
			Bars: tower.RectangularBars(0.35, 0.35, 0.05, 2, 0, bar)},
		Length: 7, Along: top, Across: tower.FreeTop, BaseFlexibility: 1e-12,
	}
}

// TestSlenderCantileverBuckles: the 7 m × 0.35 m column under a roller
// saddle is a cantilever (l0 = 2 l = 14 m) and buckles under 568 kN. Hand
// calculation by EN 1992-1-1:2004 5.8.3.1 and 5.8.7 (nominal stiffness):
//
//	f_cd = 25/1.5 = 16.667 MPa,  A_c = 0.1225 m²,  n = 568/(0.1225·16 667) = 0.27820
//	i = 0.35/√12 = 0.101036 m,   λ = 14/0.101036 = 138.56
//	A_s = 4·π·8² = 804.25 mm²,   ω = 804.25·434.78/(0.1225e6·16.667) = 0.17126
//	φ_ef = 2.0 (DefaultCreep, quasi-permanent = design): A = 1/1.4, B = √(1 + 2ω) = 1.15867, C = 0.7
//	λ_lim = 20·0.714286·1.15867·0.7/√0.27820 = 21.967 < λ: slender
//	k1 = √(25/20) = 1.11803,  k2 = min(0.20, 0.27820·138.56/170) = 0.20
//	K_c = 1.11803·0.20/(1 + 2) = 0.074536
//	E_cm = 22·(33/10)^0.3 = 31.476 GPa (Table 3.1),  E_cd = E_cm/1.2 = 26.230 GPa
//	I_c = 0.35⁴/12 = 1.25052e-3 m⁴,  I_s = 804.25e-6·0.125² = 1.25664e-5 m⁴
//	EI = 0.074536·26.230e9·1.25052e-3 + 200e9·1.25664e-5 = 2.4449e6 + 2.5133e6 = 4.9582e6 N·m²
//	N_B = π²·4.9582e6/14² = 249.7 kN < 568 kN: the column buckles
//
// With no creep (φ_ef → 0, a quasi-permanent load of 1 N): A = 1,
// K_c = 0.22361, EI = 7.3347e6 + 2.5133e6 = 9.8480e6, N_B = 495.9 kN, still
// below 568 kN. The issue put this column's buckling load at about
// 250–490 kN by the same method.
func TestSlenderCantileverBuckles(t *testing.T) {
	n := kN(568)
	fcd := 25e6 / 1.5
	ac := 0.35 * 0.35
	nrel := 568e3 / (ac * fcd)
	lam := 14 / (0.35 / math.Sqrt(12))
	as := 4 * math.Pi * 0.008 * 0.008
	omega := as * 500e6 / 1.15 / (ac * fcd)
	lamLim := 20 * (1 / 1.4) * math.Sqrt(1+2*omega) * 0.7 / math.Sqrt(nrel)
	k1 := math.Sqrt(25.0 / 20)
	ecd := 22e9 * math.Pow(3.3, 0.3) / 1.2
	ic := math.Pow(0.35, 4) / 12
	esIs := 200e9 * as * 0.125 * 0.125
	nb := func(phi float64) float64 {
		return math.Pi * math.Pi * (k1*0.2/(1+phi)*ecd*ic + esIs) / (14 * 14)
	}
	lim := func(phi float64) float64 {
		return 20 * (1 / (1 + 0.2*phi)) * math.Sqrt(1+2*omega) * 0.7 / math.Sqrt(nrel)
	}
	if !near(nrel, 0.27820, 1e-4) || !near(lam, 138.56, 1e-4) || !near(lamLim, 21.967, 1e-4) ||
		!near(nb(2), 249.7e3, 2e-4) || !near(nb(0), 495.9e3, 2e-4) {
		t.Fatalf("hand calculation: n %g λ %g λ_lim %g N_B %g / %g", nrel, lam, lamLim, nb(2), nb(0))
	}
	for _, tc := range []struct {
		name string
		a    tower.ColumnActions
		phi  float64
	}{
		{"creep φ_ef 2", tower.ColumnActions{N: n, Along: kNm(12)}, 2},
		{"no creep", tower.ColumnActions{N: n, Along: kNm(12), NQP: 1}, 0},
	} {
		res, err := slenderColumn(tower.FreeTop).Check(tc.a)
		if err != nil {
			t.Fatal(err)
		}
		r := res.Along
		// φ_ef = φ(∞,t0) M_0Eqp/M_0Ed (5.19): 2, or a few millionths for
		// a quasi-permanent load of 1 N; the hand values use the reported one.
		phi := value(t, r, "φ_ef")
		if math.Abs(phi-tc.phi) > 1e-5 {
			t.Fatalf("%s: φ_ef %g", tc.name, phi)
		}
		tc := struct {
			name   string
			nb, ll float64
		}{tc.name, nb(phi), lim(phi)}
		if r.Status != check.Fail || r.Kind != units.KindForce || !near(r.Capacity, tc.nb, 1e-9) || !near(r.Demand, 568e3, 1e-12) ||
			!strings.Contains(strings.Join(r.Notes, " "), "buckles") {
			t.Errorf("%s: %v, notes %q; want buckling against N_B %g", tc.name, r, r.Notes, tc.nb)
		}
		for sym, want := range map[string]float64{"λ": lam, "λ_lim": tc.ll, "n": nrel, "l0": 14, "k1": k1, "k2": 0.2, "N_B": tc.nb} {
			if got := value(t, r, sym); !near(got, want, 1e-9) {
				t.Errorf("%s: %s = %g, want %g", tc.name, sym, got, want)
			}
		}
		if res.Both.Status != check.Fail {
			t.Errorf("%s: biaxial row passes a buckled column: %v", tc.name, res.Both)
		}
	}
	// The same column with its top held rigidly (l0 = l π/4.4934 = 4.894 m,
	// the root of tan u = u, Timoshenko & Gere ch. 2) does not buckle
	// under this load.
	res, err := slenderColumn(tower.HeldTop).Check(tower.ColumnActions{N: n, Along: kNm(12)})
	if err != nil {
		t.Fatal(err)
	}
	if res.Along.Kind != units.KindMoment || !near(value(t, res.Along, "l0"), 7*math.Pi/4.493409458, 1e-9) {
		t.Errorf("held top: %v", res.Along)
	}
}

// eulerCantilever returns the critical load of a cantilever of length l and
// stiffness EI by finite differences and gonum's symmetric eigensolver, a
// route independent of the closed form π²EI/(2l)²: with u = δ − w the
// deflection measured from the top, −d²u/dx² = (N/EI) u, du/dx = 0 at the fixed
// base and u(l) = 0 at the free top; on a cell-centred grid the operator is
// a symmetric tridiagonal matrix whose least eigenvalue is N_cr/EI.
func eulerCantilever(t *testing.T, ei, l float64) float64 {
	t.Helper()
	const n = 300 // discretisation error (π/2n)²/12 ≈ 2e-6 relative
	h := l / n
	a := mat.NewSymDense(n, nil)
	for i := range n {
		d := 2.0
		if i == 0 {
			d = 1 // u'(0) = 0: ghost value equal to u_0
		}
		if i == n-1 {
			d = 3 // u(l) = 0: ghost value −u_{n−1}
		}
		a.SetSym(i, i, d/(h*h))
		if i+1 < n {
			a.SetSym(i, i+1, -1/(h*h))
		}
	}
	var eig mat.EigenSym
	if !eig.Factorize(a, false) {
		t.Fatal("eigen factorisation failed")
	}
	return eig.Values(nil)[0] * ei
}

// TestSlenderEulerLimit: the buckling load the column check reports is the
// Euler load of a cantilever of its nominal stiffness (checked by finite
// differences), and the moment it magnifies grows without bound as N_Ed
// approaches it: the utilisation passes 1 before N_Ed reaches N_B.
func TestSlenderEulerLimit(t *testing.T) {
	col := slenderColumn(tower.FreeTop)
	// N_B grows with N_Ed through k2 = nλ/170: find the load N* at which
	// N_Ed = N_B by bisection, then approach it from below.
	below := func(n float64) bool {
		res, err := col.Check(tower.ColumnActions{N: units.Force(n), Along: kNm(5)})
		if err != nil {
			t.Fatal(err)
		}
		return res.Along.Kind == units.KindMoment
	}
	lo, hi := 1e3, 568e3
	if !below(lo) || below(hi) {
		t.Fatal("no buckling load between 1 and 568 kN")
	}
	for range 60 {
		if mid := (lo + hi) / 2; below(mid) {
			lo = mid
		} else {
			hi = mid
		}
	}
	prev := 0.0
	for _, f := range []float64{0.5, 0.8, 0.95, 0.999} {
		n := f * lo / 1e3
		res, err := col.Check(tower.ColumnActions{N: kN(n), Along: kNm(5)})
		if err != nil {
			t.Fatal(err)
		}
		r := res.Along
		nb := value(t, r, "N_B")
		ei := nb * 14 * 14 / (math.Pi * math.Pi)
		if fd := eulerCantilever(t, ei, 7); !near(nb, fd, 2e-5) {
			t.Errorf("N %g kN: N_B %g, finite differences %g", n, nb, fd)
		}
		if n*1e3 >= nb {
			t.Fatalf("N %g kN is not below N_B %g: the test needs loads below the buckling load", n, nb)
		}
		// M_Ed = M_0Ed [1 + β/(N_B/N − 1)], β = π²/8 (5.28).
		want := value(t, r, "M_0Ed") * (1 + math.Pi*math.Pi/8/(nb/(n*1e3)-1))
		if !near(value(t, r, "M_Ed"), want, 1e-12) || !(r.Ratio > prev) {
			t.Errorf("N %g kN: M_Ed %g, want %g; ratio %g after %g", n, value(t, r, "M_Ed"), want, r.Ratio, prev)
		}
		prev = r.Ratio
	}
	if prev <= 1 {
		t.Errorf("close to the buckling load the utilisation is %g, not above 1", prev)
	}
}

// TestEcmTable31: the modulus used for the nominal stiffness reproduces
// EN 1992-1-1:2004 Table 3.1 (E_cm in GPa, rounded to whole GPa in the
// table; from memory): C20/25 30, C25/30 31, C30/37 33, C35/45 34,
// C40/50 35, C45/55 36, C50/60 37.
func TestEcmTable31(t *testing.T) {
	for fck, want := range map[float64]float64{20: 30, 25: 31, 30: 33, 35: 34, 40: 35, 45: 36, 50: 37} {
		got := float64(tower.ModulusEN1992(units.Pressure(fck*1e6))) / 1e9
		if math.Round(got) != want {
			t.Errorf("C%g: E_cm %g GPa, table %g", fck, got, want)
		}
	}
}

// TestStockyColumn: a stocky column (λ ≤ λ_lim) takes no second-order
// moment; the first-order moment carries the imperfection (5.2) and is at
// least N e_0 (6.1(4)); the biaxial rule (5.39) combines the two
// directions with the exponent its N_Ed/N_Rd gives.
//
// Section 600 × 400 mm (600 along the bridge), C30/37, B500, 6 Ø20 (three
// on each face across the bending direction, centres 55 mm in), length
// 1 m on a base taken rigid, top held along (l0 = π/4.4934 = 0.69916 m,
// Timoshenko & Gere ch. 2), free across (l0 2 m).
// Imperfection: α_h = 2/√1 = 2 → 1, θ_i = 1/200,
// e_i = θ_i l0/2 = 1.7479 mm along, 5 mm across.
// Minimum eccentricity e_0 = max(h/30, 20 mm) = 20 mm along (600/30),
// 20 mm across (400/30 = 13.3).
func TestStockyColumn(t *testing.T) {
	bar := units.Area(math.Pi * 0.01 * 0.01)
	col := tower.RCColumn{
		Section: tower.RCSection{B: 0.4, H: 0.6, Fc: 30 * mpa, Fy: 500 * mpa, Code: tower.EN1992,
			Bars: tower.RectangularBars(0.4, 0.6, 0.055, 3, 0, bar)},
		Length: 1, Along: tower.HeldTop, Across: tower.FreeTop, BaseFlexibility: 1e-12,
	}
	const n = 1500e3
	eiAlong := 0.005 * math.Pi / 4.493409458 / 2
	res, err := col.Check(tower.ColumnActions{N: n, Along: kNm(60), Across: 0})
	if err != nil {
		t.Fatal(err)
	}
	along, across := res.Along, res.Across
	if !near(value(t, along, "e_i"), eiAlong, 1e-9) || !near(value(t, across, "e_i"), 0.005, 1e-12) ||
		!near(value(t, along, "e_0"), 0.020, 1e-12) || !near(value(t, across, "e_0"), 0.020, 1e-12) {
		t.Errorf("imperfections: %v / %v", along.Values, across.Values)
	}
	// Along: M_0Ed = 60 + 1500·0.0017479 = 62.622 kN·m (> N e_0 = 30);
	// across: no applied moment, M_0Ed = max(1500·0.005, 1500·0.020) = 30 kN·m.
	if !near(value(t, along, "M_0Ed"), 60e3+n*eiAlong, 1e-9) || !near(value(t, across, "M_0Ed"), 30e3, 1e-12) {
		t.Errorf("M_0Ed %g along, %g across", value(t, along, "M_0Ed"), value(t, across, "M_0Ed"))
	}
	for _, r := range []check.Result{along, across} {
		if value(t, r, "λ") > value(t, r, "λ_lim") || !near(value(t, r, "M_Ed"), value(t, r, "M_0Ed"), 1e-12) {
			t.Errorf("stocky column gets a second-order moment: %v", r.Values)
		}
		if _, ok := r.Value("N_B"); ok {
			t.Error("stocky column reports a buckling load")
		}
	}
	// Biaxial: N_Rd = A_c f_cd + A_s f_yd; a linear in N_Ed/N_Rd between
	// 0.1 (1.0), 0.7 (1.5) and 1.0 (2.0) (EN 1992-1-1:2004 5.8.9(4), the
	// table under eq. 5.39 [R, as quoted in published renderings of the
	// clause]).
	nrd := 0.24*30e6/1.5 + 6*float64(bar)*500e6/1.15
	r := n / nrd
	a := 1 + (r-0.1)/0.6*0.5
	u := math.Pow(value(t, along, "M_Ed")/value(t, along, "M_Rd"), a) + math.Pow(value(t, across, "M_Ed")/value(t, across, "M_Rd"), a)
	if !near(value(t, res.Both, "a"), a, 1e-12) || !near(res.Both.Demand, u, 1e-12) || res.Both.ID != "tower.column_biaxial" {
		t.Errorf("biaxial: a %g, u %g; want %g, %g", value(t, res.Both, "a"), res.Both.Demand, a, u)
	}
}

// TestPlainColumn: a plain concrete column (no bars, base taken rigid) is checked by
// EN 1992-1-1:2004 12.6.5.2 (from memory): N_Rd = b h f_cd,pl Φ,
// Φ = 1.14(1 − 2e_tot/h) − 0.02 l0/h ≤ 1 − 2e_tot/h.
//
// 500 × 500 mm, C25/30: f_cd,pl = 0.8·25/1.5 = 13.333 MPa; l 2.5 m
// cantilever, l0 5 m; α_h = 2/√2.5 = 1.2649 → 1, e_i = 5/400 = 12.5 mm;
// N 600 kN with 12 kN·m along: e_0 = max(12/600 = 20 mm, 500/30 = 16.7 mm)
// = 20 mm, e_tot = 32.5 mm;
// Φ = min(1.14·(1 − 0.13) − 0.02·10, 1 − 0.13) = min(0.7918, 0.87) = 0.7918;
// N_Rd = 0.25·13.333e6·0.7918 = 2639.3 kN.
func TestPlainColumn(t *testing.T) {
	col := tower.RCColumn{Section: tower.RCSection{B: 0.5, H: 0.5, Fc: 25 * mpa, Code: tower.EN1992}, Length: 2.5, BaseFlexibility: 1e-12}
	res, err := col.Check(tower.ColumnActions{N: kN(600), Along: kNm(12)})
	if err != nil {
		t.Fatal(err)
	}
	r := res.Along
	if r.Kind != units.KindForce || !near(r.Capacity, 0.25*0.8*25e6/1.5*0.7918, 1e-9) || !strings.Contains(r.Basis, "12.6.5.2") {
		t.Errorf("plain column: %v, basis %q", r, r.Basis)
	}
	// A plain column beyond l0/h = 25 is not allowed.
	col.Length = 7
	res, _ = col.Check(tower.ColumnActions{N: kN(100)})
	if res.Along.Status != check.Fail {
		t.Errorf("plain column l0/h 28: %v", res.Along)
	}
}

func TestRCColumnErrors(t *testing.T) {
	good := slenderColumn(tower.FreeTop)
	for _, tc := range []struct {
		name  string
		c     func(*tower.RCColumn)
		a     tower.ColumnActions
		field string
	}{
		{"ACI section", func(c *tower.RCColumn) { c.Section.Code = tower.ACI318 }, tower.ColumnActions{N: kN(100)}, "RCColumn.Section.Code"},
		{"no length", func(c *tower.RCColumn) { c.Length = 0 }, tower.ColumnActions{N: kN(100)}, "RCColumn.Length"},
		{"negative creep", func(c *tower.RCColumn) { c.Creep = -1 }, tower.ColumnActions{N: kN(100)}, "RCColumn.Creep"},
		{"bad restraint", func(c *tower.RCColumn) { c.Along = 5 }, tower.ColumnActions{N: kN(100)}, "RCColumn.Along"},
		{"NaN force", func(*tower.RCColumn) {}, tower.ColumnActions{N: units.Force(math.NaN())}, "ColumnActions.N"},
		{"Inf moment", func(*tower.RCColumn) {}, tower.ColumnActions{N: kN(1), Across: units.Moment(math.Inf(1))}, "ColumnActions.Across"},
	} {
		c := good
		tc.c(&c)
		if _, err := c.Check(tc.a); !errors.Is(err, tower.ErrInvalid) || !strings.Contains(err.Error(), tc.field) {
			t.Errorf("%s: %v", tc.name, err)
		}
	}
	// Tension: the section alone, no NaN.
	res, err := good.Check(tower.ColumnActions{N: kN(-50), Along: kNm(3)})
	if err != nil || math.IsNaN(res.Along.Ratio) || math.IsNaN(res.Both.Demand) {
		t.Errorf("tension: %v %v", res, err)
	}
}

func FuzzRCColumn(f *testing.F) {
	f.Add(568e3, 12e3, 4e3, 7.0, 0.35, uint8(0), 0.0, 0.0, 0.0, 0.0)
	f.Add(-50e3, 1e3, 0.0, 3.0, 0.6, uint8(1), 0.1, 0.0, 0.0, 0.0)
	f.Add(300e3, 40e3, 2e3, 4.0, 0.5, uint8(2), 0.5, 1e7, 100e3, 10e3)
	f.Fuzz(func(t *testing.T, n, ma, mc, l, h float64, top uint8, k, spring, nqp, mqp float64) {
		c := slenderColumn(tower.Restraint(top % 4))
		c.BaseFlexibility, c.AlongSpring = k, spring
		c.Length, c.Section.H = units.Length(l), units.Length(h)
		res, err := c.Check(tower.ColumnActions{N: units.Force(n), Along: units.Moment(ma), Across: units.Moment(mc),
			NQP: units.Force(nqp), AlongQP: units.Moment(mqp)})
		if err != nil {
			if !errors.Is(err, tower.ErrInvalid) && !errors.Is(err, tower.ErrUnsupported) {
				t.Fatalf("unexpected error %v", err)
			}
			return
		}
		for _, r := range []check.Result{res.Along, res.Across, res.Both} {
			if math.IsNaN(r.Ratio) || math.IsNaN(r.Demand) || math.IsNaN(r.Capacity) || math.IsInf(r.Demand, 0) {
				t.Fatalf("bad result %v", r)
			}
			for _, v := range r.Values {
				if math.IsNaN(v.Value) || (math.IsInf(v.Value, 0) && v.Symbol != "λ_lim") {
					t.Fatalf("NaN value %v in %v", v, r)
				}
			}
		}
	})
}

// TestCreepRatioNotCapped: φ_ef = φ(∞,t0)·M_0Eqp/M_0Ed (EN 1992-1-1:2004
// eq. 5.19) has no cap: where the permanent actions bend the column more
// than the design case does (a crowd that eases the unbalance), the creep
// the permanent moment locks in is larger than φ(∞,t0) times the design
// moment. Capping the ratio at 1 lowered φ_ef there: unconservative.
//
// By hand (base taken rigid, free top, l0 = 14 m, e_i = θ_i l0/2 with
// α_h = 2/√7 = 0.75593, θ_i = 0.0037796, e_i = 0.026458 m; e_0 = 20 mm):
//
//	M_0Ed  = max(10 + 300·0.026458, 300·0.020) = 17.937 kN·m
//	M_0Eqp = max(30 + 200·0.026458, 200·0.020) = 35.292 kN·m
//	φ_ef   = 2 · 35.292/17.937 = 3.9350
func TestCreepRatioNotCapped(t *testing.T) {
	res, err := slenderColumn(tower.FreeTop).Check(tower.ColumnActions{N: kN(300), Along: kNm(10), NQP: kN(200), AlongQP: kNm(30)})
	if err != nil {
		t.Fatal(err)
	}
	ei := 14 * (2 / math.Sqrt(7)) / 200 / 2
	want := 2 * (30e3 + 200e3*ei) / (10e3 + 300e3*ei)
	if !near(want, 3.9350, 1e-4) {
		t.Fatalf("hand value %g", want)
	}
	if got := value(t, res.Along, "φ_ef"); !near(got, want, 1e-9) {
		t.Errorf("φ_ef %g, want %g (eq. 5.19, no cap)", got, want)
	}
}

// TestWithLengthsSameResults checks that a column whose effective lengths
// were worked out beforehand (WithLengths) gives every result of Check bit
// for bit as the column that solves for them each time: every restraint,
// a spring and no base flexibility given, moments of either sign and
// tension, a plain section; and that WithLengths refuses what Check does.
func TestWithLengthsSameResults(t *testing.T) {
	plain := slenderColumn(tower.FreeTop)
	plain.Section.Bars = nil
	spring := slenderColumn(tower.SpringTop)
	spring.AlongSpring, spring.BaseFlexibility = 4e5, 0
	held := slenderColumn(tower.HeldTop)
	held.Across, held.AcrossSpring = tower.SpringTop, 1e4
	for _, c := range []tower.RCColumn{slenderColumn(tower.FreeTop), held, spring, plain} {
		pre, err := c.WithLengths()
		if err != nil {
			t.Fatal(err)
		}
		for _, a := range []tower.ColumnActions{
			{N: kN(120), Along: kNm(30), Across: kNm(4)},
			{N: kN(300), Along: -kNm(45), Across: -kNm(9), NQP: kN(200), AlongQP: -kNm(20)},
			{N: kN(900), Along: kNm(5)},
			{N: -kN(40), Along: kNm(10)},
		} {
			want, errWant := c.Check(a)
			got, errGot := pre.Check(a)
			if (errWant == nil) != (errGot == nil) {
				t.Fatalf("%v: errors %v and %v", a, errWant, errGot)
			}
			if !reflect.DeepEqual(got, want) {
				t.Errorf("%+v, %v: WithLengths changes the results:\n%+v\n%+v", c.Along, a, got, want)
			}
		}
	}
	bad := slenderColumn(tower.FreeTop)
	bad.Length = 0
	if _, err := bad.WithLengths(); !errors.Is(err, tower.ErrInvalid) {
		t.Errorf("zero length: %v", err)
	}
}

// TestRCColumnTerseSameNumbers checks that a terse column leaves out only
// the text and values: in every branch of the check (stocky, slender,
// buckling, axial force beyond the section, tension, plain concrete short
// and too slender) each result equals the full one but for Basis, Values
// and Notes, which it does not carry.
func TestRCColumnTerseSameNumbers(t *testing.T) {
	plain := slenderColumn(tower.FreeTop)
	plain.Section.Bars = nil
	plainLong := plain
	plainLong.Length = 12
	held := slenderColumn(tower.HeldTop)
	held.Across, held.AcrossSpring = tower.SpringTop, 1e4
	stocky := slenderColumn(tower.HeldTop)
	stocky.Length = 2
	plainShort := plain
	plainShort.Length = 2
	strip := func(r check.Result) check.Result {
		r.Basis, r.Values, r.Notes = "", nil, nil
		return r
	}
	for _, c := range []tower.RCColumn{slenderColumn(tower.FreeTop), held, stocky, plain, plainShort, plainLong} {
		for _, a := range []tower.ColumnActions{
			{N: kN(120), Along: kNm(30), Across: kNm(4)},
			{N: kN(568), Along: kNm(10)},
			{N: kN(4000), Along: kNm(10)},
			{N: -kN(40), Along: -kNm(10)},
			{N: kN(60), Along: kNm(2), Across: kNm(1)},
		} {
			full, errFull := c.Check(a)
			terse := c
			terse.Terse = true
			got, errTerse := terse.Check(a)
			if (errFull == nil) != (errTerse == nil) {
				t.Fatalf("%v: errors %v and %v", a, errFull, errTerse)
			}
			for _, r := range []check.Result{got.Along, got.Across, got.Both} {
				if r.Basis != "" || r.Values != nil || r.Notes != nil {
					t.Errorf("%v: terse result %s carries text or values", a, r.ID)
				}
			}
			want := tower.ColumnResults{Along: strip(full.Along), Across: strip(full.Across), Both: strip(full.Both)}
			if !reflect.DeepEqual(got, want) {
				t.Errorf("%v: terse\n%+v\nfull\n%+v", a, got, want)
			}
		}
	}
}

// TestUtilisationGrowsThroughBuckling: on the slender cantilever, the
// column check's ratio never falls as the axial force rises through the
// buckling load N_B (it was N_Ed/N_B beyond it, 1.3 against 16 just short of
// it), and at and beyond N_B it is unbounded.
func TestUtilisationGrowsThroughBuckling(t *testing.T) {
	col := slenderColumn(tower.FreeTop)
	prev := 0.0
	buckled := false
	for n := 50.0; n <= 900; n += 10 {
		res, err := col.Check(tower.ColumnActions{N: units.Force(n * 1e3), Along: kNm(12)})
		if err != nil {
			t.Fatal(err)
		}
		r := res.Along
		if r.Ratio < prev {
			t.Fatalf("N_Ed %v kN: ratio %v fell below %v", n, r.Ratio, prev)
		}
		prev = r.Ratio
		if _, ok := r.Value("N_B"); ok && strings.Contains(strings.Join(r.Notes, " "), "buckles") {
			buckled = true
			if !math.IsInf(r.Ratio, 1) || r.Status != check.Fail {
				t.Fatalf("N_Ed %v kN beyond N_B: ratio %v, %v; want +Inf, FAIL", n, r.Ratio, r.Status)
			}
		}
	}
	if !buckled {
		t.Fatal("the sweep never reached the buckling load: the test does not reach its case")
	}
}
