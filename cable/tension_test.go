package cable_test

import (
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
		capacity float64
	}{
		// EN 1993-1-11 cl. 6.2 [D], the same formula by hand: k_e 1 → 186.7 kN
		{"partial factor, k_e 1", cable.PartialFactor{GammaR: 0.9, Ke: 1}, 1, 186.7e3},
		{"partial factor defaults", cable.PartialFactor{}, 2, 2 * 0.9 * mbf / (1.5 * 0.9)},
		{"global factor 2.5", cable.GlobalFactor{Factor: 2.5}, 4, 4 * mbf / 2.5},
		{"global default", cable.GlobalFactor{}, 3, 3 * mbf / cable.DefaultGlobalFactor},
		{"nil basis", nil, 1, mbf / cable.DefaultGlobalFactor},
	} {
		res, err := cable.TensionCheck(150e3, r20, c.n, c.basis)
		if err != nil {
			t.Fatal(err)
		}
		tol := 1e-12
		if c.what == "partial factor, k_e 1" {
			tol = 3e-4 // given to 4 figures
		}
		approx(t, c.what+" capacity", res.Capacity, c.capacity, tol)
		approx(t, c.what+" ratio", res.Ratio, 150e3/res.Capacity, 1e-12)
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
	// ratio scales linearly with the load
	a, _ := cable.TensionCheck(100e3, r20, 2, cable.GlobalFactor{Factor: 3})
	b, _ := cable.TensionCheck(200e3, r20, 2, cable.GlobalFactor{Factor: 3})
	approx(t, "linear ratio", b.Ratio, 2*a.Ratio, 1e-14)
	over, _ := cable.TensionCheck(units.Force(mbf), r20, 1, cable.GlobalFactor{Factor: 3})
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
	} {
		_, err := cable.TensionCheck(c.t, r20, c.n, c.basis)
		wantInvalid(t, c.what, err)
	}
	_, err := cable.TensionCheck(1, cable.Rope{}, 1, nil)
	wantInvalid(t, "empty rope", err)
}
