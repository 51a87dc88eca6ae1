package cable_test

import (
	"fmt"
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

func TestTensionCheck(t *testing.T) {
	r20, _ := cable.Strand6x36IWRC.Rope(20*units.Millimetre, 1770*units.Megapascal)
	mbf := float64(r20.MBF)
	for _, c := range []struct {
		what     string
		basis    cable.TensionBasis
		n        int
		capacity float64 // of one rope
	}{
		// EN 1993-1-11 cl. 6.2 [D], the same formula by hand: k_e 1, γ_R 0.9
		// → 252.0/(1.5·0.9) = 186.7 kN
		{"partial factor, k_e 1", cable.PartialFactor{GammaR: 0.9, Ke: 1}, 1, 186.7e3},
		// Default k_e 0.80, wire rope grips (EN 13411-5, from memory): the
		// least of the usual terminations.
		{"partial factor defaults", cable.PartialFactor{}, 2, 0.8 * mbf / (1.5 * 0.9)},
		// The proof-force criterion F_k/γ_R (EN 1993-1-11 cl. 6.2, from
		// memory): F_k 0.5 MBF → 0.5·252.0/0.9 = 140.0 kN governs the
		// 0.8·252.0/1.35 = 149.3 kN of the breaking force [D, by hand];
		// F_k 0.8 MBF leaves the breaking force governing.
		{"partial factor, proof force governs", cable.PartialFactor{GammaR: 0.9, Proof: 0.5}, 1, 0.5 * mbf / 0.9},
		{"partial factor, proof force given", cable.PartialFactor{GammaR: 0.9, Proof: 0.8}, 1, 0.8 * mbf / (1.5 * 0.9)},
		// Allowable basis: k_e MBF/γ, k_e 0.8 by default on this basis too.
		{"global factor 2.5", cable.GlobalFactor{Factor: 2.5}, 4, 0.8 * mbf / 2.5},
		{"global factor 2.5, socket", cable.GlobalFactor{Factor: 2.5, Ke: 1}, 4, mbf / 2.5},
		{"global default", cable.GlobalFactor{}, 3, 0.8 * mbf / cable.DefaultGlobalFactor},
		{"nil basis", nil, 1, 0.8 * mbf / cable.DefaultGlobalFactor},
	} {
		res, err := cable.TensionCheck(150e3, r20, c.n, c.basis)
		if err != nil {
			t.Fatal(err)
		}
		// Terse: the same numbers, no text or values.
		terse, err := cable.Group{Rope: r20, Count: c.n, Sharing: 1, Terse: true}.TensionCheck(150e3, c.basis)
		if err != nil {
			t.Fatal(err)
		}
		if terse.ID != res.ID || terse.Demand != res.Demand || terse.Capacity != res.Capacity || terse.Ratio != res.Ratio ||
			terse.Status != res.Status || terse.Basis != "" || len(terse.Values)+len(terse.Notes) != 0 {
			t.Errorf("%s: terse %+v against full %+v", c.what, terse, res)
		}
		tol := 1e-12
		if c.what == "partial factor, k_e 1" {
			tol = 3e-4 // given to 4 figures
		}
		approx(t, c.what+" capacity", res.Capacity, c.capacity, tol)
		approx(t, c.what+" demand (equal shares)", res.Demand, 150e3/float64(c.n), 1e-12)
		approx(t, c.what+" ratio", res.Ratio, res.Demand/res.Capacity, 1e-12)
		if res.ID != "cable.tension" || res.Kind != units.KindForce || res.Basis == "" {
			t.Errorf("%s: result %+v", c.what, res)
		}
		want := check.Pass
		if res.Ratio > 1 {
			want = check.Fail
		}
		if res.Status != want {
			t.Errorf("%s: status %v, want %v", c.what, res.Status, want)
		}
	}
	// The partial basis carries its terms among the values: F_uk always,
	// F_k when given.
	p, _ := cable.TensionCheck(150e3, r20, 1, cable.PartialFactor{GammaR: 0.9, Ke: 0.8, Proof: 0.5})
	for sym, want := range map[string]float64{"F_uk": 0.8 * mbf, "F_k": 0.5 * mbf, "R": 0.5 * mbf / 0.9} {
		v, ok := p.Value(sym)
		if !ok {
			t.Errorf("partial basis: value %s missing", sym)
			continue
		}
		approx(t, "partial basis value "+sym, v.Value, want, 1e-12)
	}
	// ratio scales linearly with the load
	a, _ := cable.TensionCheck(100e3, r20, 2, cable.GlobalFactor{Factor: 3})
	b, _ := cable.TensionCheck(200e3, r20, 2, cable.GlobalFactor{Factor: 3})
	approx(t, "linear ratio", b.Ratio, 2*a.Ratio, 1e-14)
	over, _ := cable.TensionCheck(units.Force(mbf), r20, 1, cable.GlobalFactor{Factor: 3, Ke: 1})
	if over.Status != check.Fail {
		t.Error("MBF on one rope at factor 3 must fail")
	}

	for _, c := range []struct {
		what  string
		t     units.Force
		n     int
		basis cable.TensionBasis
	}{
		{"NaN tension", units.Force(math.NaN()), 1, nil},
		{"negative tension", -1, 1, nil},
		{"no ropes", 1, 0, nil},
		{"factor below 1", 1, 1, cable.GlobalFactor{Factor: 0.5}},
		{"negative gamma", 1, 1, cable.PartialFactor{GammaR: -1}},
		{"k_e above 1", 1, 1, cable.PartialFactor{Ke: 1.2}},
		{"k_e above 1, allowable", 1, 1, cable.GlobalFactor{Ke: 1.2}},
		{"proof force above MBF", 1, 1, cable.PartialFactor{Proof: 1.5}},
		{"NaN proof force", 1, 1, cable.PartialFactor{Proof: math.NaN()}},
	} {
		_, err := cable.TensionCheck(c.t, r20, c.n, c.basis)
		wantInvalid(t, c.what, err)
	}
	_, err := cable.TensionCheck(1, cable.Rope{}, 1, nil)
	wantInvalid(t, "empty rope", err)
}

// TestGroupSharing checks unequal sharing between parallel ropes: the most
// loaded of n ropes carries k_s T/n (statics of the assumed split), k_s 1.1
// by default for two ropes or more and 1 for one rope (common practice).
func TestGroupSharing(t *testing.T) {
	r20, _ := cable.Strand6x36IWRC.Rope(20*units.Millimetre, 1770*units.Megapascal)
	for _, c := range []struct {
		what    string
		n       int
		sharing float64
		want    float64
	}{
		{"given", 4, 1.2, 1.2 * 400e3 / 4},
		{"default, four ropes", 4, 0, cable.DefaultSharing * 400e3 / 4},
		{"default, one rope", 1, 0, 400e3},
		{"all on one rope", 4, 4, 400e3},
	} {
		res, err := cable.Group{Rope: r20, Count: c.n, Sharing: c.sharing}.TensionCheck(400e3, cable.GlobalFactor{Ke: 1})
		if err != nil {
			t.Fatal(err)
		}
		approx(t, c.what, res.Demand, c.want, 1e-12)
		if v, ok := res.Value("k_s"); !ok || v.Value < 1 {
			t.Errorf("%s: sharing factor value %v", c.what, v)
		}
	}
	for _, ks := range []float64{0.95, 5, math.NaN()} {
		_, err := cable.Group{Rope: r20, Count: 4, Sharing: ks}.TensionCheck(1, nil)
		wantInvalid(t, "sharing factor "+fmt.Sprint(ks), err)
	}
}

// TestTerminations checks the named terminations' efficiencies (EN 13411
// family and rope makers' data, from memory; common practice).
func TestTerminations(t *testing.T) {
	for name, want := range map[string]float64{"clips": 0.80, "ferrule": 0.90, "socket": 1.00, " Socket ": 1.00} {
		got, ok := cable.TerminationEfficiency(name)
		if !ok || got != want {
			t.Errorf("%q: %v, %v; want %v", name, got, ok, want)
		}
	}
	if _, ok := cable.TerminationEfficiency("knot"); ok {
		t.Error("an unknown termination has an efficiency")
	}
}

// TestSaddleRatioCheck checks the groove diameter against the least D/d:
// a 32 mm rope on an 800 mm groove has D/d = 25 exactly, the default least
// ratio (common practice, from memory); a 640 mm groove gives 20.
func TestSaddleRatioCheck(t *testing.T) {
	r32, _ := cable.Strand6x36IWRC.Rope(32*units.Millimetre, 1770*units.Megapascal)
	res, err := cable.SaddleRatioCheck(800*units.Millimetre, r32, 0)
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "ratio at D/d 25", res.Ratio, 1, 1e-12)
	approx(t, "groove required", res.Demand, 0.8, 1e-12)
	res, err = cable.SaddleRatioCheck(640*units.Millimetre, r32, 0)
	if err != nil {
		t.Fatal(err)
	}
	if res.Status != check.Fail {
		t.Errorf("D/d 20 against 25 passes: %v", res)
	}
	if v, _ := res.Value("D/d"); math.Abs(v.Value-20) > 1e-12 {
		t.Errorf("D/d = %v, want 20", v.Value)
	}
	res, err = cable.SaddleRatioCheck(640*units.Millimetre, r32, 18)
	if err != nil || res.Status != check.Pass {
		t.Errorf("D/d 20 against a given 18: %v, %v", res, err)
	}
	for _, c := range []struct {
		what   string
		groove units.Length
		min    float64
	}{{"no groove", 0, 0}, {"negative groove", -1, 0}, {"least ratio below 1", 1, 0.5}} {
		_, err := cable.SaddleRatioCheck(c.groove, r32, c.min)
		wantInvalid(t, c.what, err)
	}
}
