package sagspan

import (
	"math"
	"testing"
)

// TestBrokenRopeByHand checks the accidental case of one walkway rope
// broken on the symmetric level bridge (testdata/level.json: four 26 mm
// ropes over fixed saddles, one temperature), by hand:
//
//   - the three ropes left keep the unstretched length each had in the
//     reference state, L_ref = levelLength(H₀, w₀) with the four ropes'
//     stiffness; now three ropes stretch under the group's tension, so
//     H_b solves levelLength(H_b, w, ¾EA) = L_ref by bisection;
//   - the load is the permanent load (the broken rope's weight left on the
//     walkway) and ψ1 = 0.4 of the EN 1991-2 crowd (EN 1990 Table A2.2,
//     read in the final draft of prAnnex A2, 2003), 0.4 · 3.5 kPa · 1.0 m,
//     walkway and crowd per metre of walkway times S/l per horizontal metre;
//   - intact under the same load, H_i solves levelLength(H_i, w, EA) = L_ref;
//   - each rope left carries T_i/4 + 2 (T_b/3 − T_i/4), T = √(H² + (w l/2)²):
//     its intact share plus twice the static change (a suddenly applied
//     load on an undamped elastic system, standard dynamics), and the most
//     loaded of them 1.1 times that (default sharing factor).
func TestBrokenRopeByHand(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	const g, l, f = 9.80665, 50.0, 2.5
	ropeWeight := 4 * 0.409 * 26 * 26 / 100 * g
	n := f / l
	ratio := 1 + 8*n*n/3 - 32*math.Pow(n, 4)/5 + 256*math.Pow(n, 6)/7 // S/l, Hicks ch. 10
	w0 := (1000 + ropeWeight) * ratio
	h0 := w0 * l * l / (8 * f)
	ref := levelLengthEA(h0, w0, levelEA)
	w := w0 + 0.4*3.5e3*1.0*ratio
	solve := func(ea float64) float64 {
		lo, hi := h0/10, 100*h0
		for range 200 {
			mid := (lo + hi) / 2
			if levelLengthEA(mid, w, ea) > ref {
				lo = mid
			} else {
				hi = mid
			}
		}
		return (lo + hi) / 2
	}
	hb, hi := solve(0.75*levelEA), solve(levelEA)
	tb, ti := math.Hypot(hb, w*l/2), math.Hypot(hi, w*l/2)
	perRope := ti/4 + 2*(tb/3-ti/4)

	name := brokenCaseName("walkway ropes")
	r := find(t, a.Report, "cable.tension", "walkway ropes", name)
	near(t, "most loaded rope left", r.Demand, 1.1*perRope, 1e-7)
	if v, ok := r.Value("n"); !ok || v.Value != 3 {
		t.Errorf("ropes left %v, want 3", v.Value)
	}
	for _, cs := range a.Service {
		if cs.Case.Name == name {
			near(t, "static H with a rope broken", float64(cs.Groups[0].H), hb, 1e-7)
			if cs.Case.Situation != Accidental {
				t.Errorf("situation %v", cs.Case.Situation)
			}
		}
	}
	// Fewer ropes stretch more: the group hangs lower and pulls less.
	if !(hb < hi) || !(tb/3 > ti/4) {
		t.Errorf("H broken %v, intact %v; per rope broken %v, intact %v", hb, hi, tb/3, ti/4)
	}
}

// TestBrokenRopeOfTwoWithSharing checks the accidental case of a group of
// two ropes whose description gives the sharing factor (1.1): with one
// rope broken a single rope is left, which carries the whole group alone,
// so no sharing factor applies to it (k_s = 1, a single rope cannot carry
// more than all of the tension). The bridge is testdata/level.json with two
// of its four 26 mm ropes; by hand as in TestBrokenRopeByHand, with half
// the stiffness and half the ropes' weight:
//
//	per rope left = T_i/2 + 2 (T_b/1 − T_i/2)
func TestBrokenRopeOfTwoWithSharing(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	b.Ropes = append([]RopeGroup(nil), b.Ropes...)
	ks := 1.1
	b.Ropes[0].Count, b.Ropes[0].Sharing = 2, &ks
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatalf("a group of two ropes with its sharing factor given cannot be checked: %v", err)
	}
	const g, l, f = 9.80665, 50.0, 2.5
	ropeWeight := 2 * 0.409 * 26 * 26 / 100 * g
	n := f / l
	ratio := 1 + 8*n*n/3 - 32*math.Pow(n, 4)/5 + 256*math.Pow(n, 6)/7 // S/l, Hicks ch. 10
	w0 := (1000 + ropeWeight) * ratio
	h0 := w0 * l * l / (8 * f)
	ea := levelEA / 2
	ref := levelLengthEA(h0, w0, ea)
	w := w0 + 0.4*3.5e3*1.0*ratio
	solve := func(ea float64) float64 {
		lo, hi := h0/10, 100*h0
		for range 200 {
			mid := (lo + hi) / 2
			if levelLengthEA(mid, w, ea) > ref {
				lo = mid
			} else {
				hi = mid
			}
		}
		return (lo + hi) / 2
	}
	hb, hi := solve(ea/2), solve(ea)
	tb, ti := math.Hypot(hb, w*l/2), math.Hypot(hi, w*l/2)
	perRope := ti/2 + 2*(tb-ti/2)
	r := find(t, a.Report, "cable.tension", "walkway ropes", brokenCaseName("walkway ropes"))
	near(t, "the rope left", r.Demand, perRope, 1e-7)
	if v, ok := r.Value("k_s"); !ok || v.Value != 1 {
		t.Errorf("sharing factor of the one rope left %v, want 1", v.Value)
	}
}

// TestBrokenRopeWithThermalAction: the accidental combination of EN 1990
// eq. (6.11b) carries the accompanying actions at their quasi-permanent
// values, ψ2 T with ψ2 = 0.5 for thermal actions on footbridges (EN 1990
// Annex A2 Table A2.2, read in the final PT draft of prAnnex A2, 2003),
// taken toward the cold that tightens the ropes: on the demo (reference
// 15 °C, coldest −10 °C) the broken-rope case's ropes are at 15 − 0.5·25 =
// 2.5 °C. It was at the reference temperature, without the thermal action.
func TestBrokenRopeWithThermalAction(t *testing.T) {
	b := Demo()
	found := false
	for _, lc := range b.Cases() {
		if lc.Broken > 0 {
			found = true
			near(t, lc.Name+": rope temperature, °C", lc.Temperature.Celsius(), 2.5, 1e-12)
		}
	}
	if !found {
		t.Fatal("the demo has no broken-rope case")
	}
}
