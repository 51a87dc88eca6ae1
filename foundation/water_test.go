package foundation_test

import (
	"math"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// halfSubmerged is the test block with the water table 0.75 m below the
// ground: its lower half (0.75 m of its 1.5 m) under water.
func halfSubmerged() foundation.AnchorBlock {
	blk := testBlock()
	blk.Water = foundation.WaterAt(0.75)
	return blk
}

// TestAnchorBlockHalfSubmerged: buoyancy of a block half under water, by
// hand (kN and m; γw 9.81 kN/m³, common practice). The 3 × 2.5 × 1.5 m
// concrete block (24 kN/m³) has its top at the ground and the water 0.75 m
// down: W = 24·11.25 = 270, U = 9.81·3·2.5·0.75 = 55.181, so the block
// weighs 214.819 effective. Pull 80 kN at 25°: Fx 72.5046, Fz 33.8095.
//
//	uplift:      214.819/33.8095 = 6.3538
//	sliding:     N = 214.819 − 33.8095 = 181.009, R = N tan 24° = 80.590; 80.590/72.5046 = 1.1115
//	overturning: stabilising 270·1.5 = 405; destabilising 72.5046·1.2 + 33.8095·0.5
//	             + 55.181·1.5 = 186.682; 405/186.682 = 2.1695
func TestAnchorBlockHalfSubmerged(t *testing.T) {
	rs, err := halfSubmerged().Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	u := 9.81 * 3 * 2.5 * 0.75
	fx, fz := 80*math.Cos(25*math.Pi/180), 80*math.Sin(25*math.Pi/180)
	near(t, "uplift", byID(t, rs, "anchor.uplift").Provided, (270-u)/fz, 1e-9)
	near(t, "sliding", byID(t, rs, "anchor.sliding").Provided, (270-u-fz)*math.Tan(24*math.Pi/180)/fx, 1e-9)
	near(t, "overturning", byID(t, rs, "anchor.overturning").Provided, 405/(fx*1.2+fz*0.5+u*1.5), 1e-9)
	up, _ := byID(t, rs, "anchor.uplift").Value("U")
	near(t, "U", up.Value, u*1e3, 1e-12)
	if !strings.Contains(strings.Join(byID(t, rs, "anchor.sliding").Notes, " "), "water 750.0 mm below the ground") {
		t.Errorf("sliding notes %q do not say which water level was used", byID(t, rs, "anchor.sliding").Notes)
	}
}

// TestAnchorBlockValuesRoundTrip: every value of the anchor block's
// results agrees with the same number computed here from the published
// formulas: statics for the base resultant, Rankine's coefficients with
// effective stresses (Das ch. 7), the contact pressures of a rigid base
// (Das §3.11) and EN 1997-1:2004 D.4 for bearing. Block half under water,
// half the passive resistance mobilised, allowable basis.
func TestAnchorBlockValuesRoundTrip(t *testing.T) {
	blk := halfSubmerged()
	blk.PassiveMobilisation = 0.5
	rs, err := blk.Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	const kN = 1e3
	w, u := 270*kN, 9.81*3*2.5*0.75*kN
	fx, fz := 80*kN*math.Cos(25*math.Pi/180), 80*kN*math.Sin(25*math.Pi/180)
	n := w - u - fz
	// Moment about the base centre: pulls at X 2.5, Z 1.2; weight and
	// uplift at the centre.
	e := (fx*1.2 + fz*(1.5-2.5)) / n
	phi := 36 * math.Pi / 180
	kp, ka := math.Pow(math.Tan(math.Pi/4+phi/2), 2), math.Pow(math.Tan(math.Pi/4-phi/2), 2)
	g, gs := 19e3, 19e3-9.81e3
	sv1, sv2 := g*0.75, g*0.75+gs*0.75 // σ'v at the water and at the base
	area := 0.5*sv1*0.75 + (sv1+sv2)/2*0.75
	pp, pa := kp*area*2.5, ka*area*2.5
	mean := n / (3 * 2.5)
	bEff, lEff := 3-2*e, 2.5
	if bEff > lEff {
		t.Fatalf("test geometry: B' %v > L' %v", bEff, lEff)
	}
	_ = bEff
	// Here 3 − 2e < 2.5, so B' = 3 − 2e lies along the load.
	bp := 3 - 2*e
	ratio := bp / lEff
	nq := math.Exp(math.Pi*math.Tan(phi)) * math.Pow(math.Tan(math.Pi/4+phi/2), 2)
	nc := (nq - 1) / math.Tan(phi)
	ng := 2 * (nq - 1) * math.Tan(phi)
	sq, sg := 1+ratio*math.Sin(phi), 1-0.3*ratio
	sc := (sq*nq - 1) / (nq - 1)
	mExp := (2 + ratio) / (1 + ratio)
	br := 1 - fx/n
	iq, ig := math.Pow(br, mExp), math.Pow(br, mExp+1)
	ic := iq - (1-iq)/(nc*math.Tan(phi))
	q := sv2
	want := map[string]map[string]float64{
		"anchor.sliding":     {"N": n, "δ": 24 * math.Pi / 180, "R_b": n * math.Tan(24*math.Pi/180), "e": e, "μ": 0.5, "P_p": pp, "P_a": pa, "d_w": 0.75},
		"anchor.overturning": {"W": w, "x_W": 1.5, "U": u, "x_U": 1.5, "d_w": 0.75},
		"anchor.uplift":      {"F_z": fz, "W": w, "U": u, "d_w": 0.75},
		"anchor.bearing": {"N": n, "H": fx, "e": e, "q_max": mean * (1 + 6*e/3), "q_min": mean * (1 - 6*e/3), "l_c": 3,
			"A'": bp * lEff, "x_R": 1.5 + e, "φ": phi, "c": 0, "q": q, "γ_b": gs, "B'": bp, "L'": lEff,
			"N_c": nc, "N_q": nq, "N_γ": ng, "s_c": sc, "s_q": sq, "s_γ": sg, "d_c": 1, "d_q": 1, "d_γ": 1,
			"i_c": ic, "i_q": iq, "i_γ": ig, "θ": math.Pi / 2, "m": mExp, "q_c": 0, "q_q": q * nq * sq * iq, "q_γ": 0.5 * gs * bp * ng * sg * ig,
			"q_ult": q*nq*sq*iq + 0.5*gs*bp*ng*sg*ig, "d_w": 0.75},
	}
	if e > 0.5 {
		t.Fatalf("test geometry: e %v outside the kern", e)
	}
	for _, r := range rs {
		ws := want[r.ID]
		if len(r.Values) != len(ws) {
			t.Errorf("%s: %d values, want %d", r.ID, len(r.Values), len(ws))
		}
		for _, v := range r.Values {
			x, ok := ws[v.Symbol]
			if !ok {
				t.Errorf("%s: unexpected value %s", r.ID, v.Symbol)
				continue
			}
			near(t, r.ID+" "+v.Symbol, v.Value, x, 1e-12)
		}
	}
	// The checks' own numbers follow from the values.
	near(t, "sliding resisting", byID(t, rs, "anchor.sliding").Capacity, n*math.Tan(24*math.Pi/180)+0.5*pp, 1e-12)
	near(t, "bearing demand", byID(t, rs, "anchor.bearing").Demand, n/(bp*lEff), 1e-12)
}

// TestAnchorBlockUndrained: a block on soft clay is checked drained and
// undrained; undrained sliding resists by A'c_u (EN 1997-1:2004 6.5.3(11)
// [M]) on the effective base, capped at 0.4 N (6.5.3(12) [M]) because the
// pull opens a gap behind the block through which water or air reach its
// base: always, whatever the water level.
func TestAnchorBlockUndrained(t *testing.T) {
	clay := foundation.Soil{UnitWeight: 17 * kNm3, Friction: deg(26), Undrained: 20 * units.Kilopascal}
	blk := testBlock()
	rs, err := blk.Check([]foundation.AnchorPull{testPull()}, clay, foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	slide := byID(t, rs, "anchor.sliding")
	// Hand calculation, kN and m: N = 270 − 33.8095 = 236.19; e as in
	// TestAnchorBlockHand, (72.5046·1.2 − 33.8095)/236.19 = 0.22523 < 3/6,
	// A' = (3 − 2e)·2.5 = 6.3738 m², 20·A' = 127.48 kN, more than
	// 0.4 N = 94.48 kN, which holds: utilisation 1.5·72.5046/94.48 = 1.1511
	// (without the cap 0.8531, a pass). Drained: 236.19 tan(⅔·26°) =
	// 72.39 kN, utilisation 1.5023, which governs.
	fx, fz := 80*math.Cos(25*math.Pi/180), 80*math.Sin(25*math.Pi/180)
	n := 270 - fz
	e := (fx*1.2 - fz) / n
	ru := math.Min(20*(3-2*e)*2.5, 0.4*n)
	rd := n * math.Tan(2.0/3*26*math.Pi/180)
	ud, _ := slide.Value("U_dr")
	uu, _ := slide.Value("U_un")
	near(t, "drained utilisation", ud.Value, 1.5*fx/rd, 1e-9)
	near(t, "undrained utilisation", uu.Value, 1.5*fx/ru, 1e-9)
	if uu.Value <= 1 {
		t.Errorf("undrained utilisation %.4f passes: the cap was not applied", uu.Value)
	}
	if !strings.HasPrefix(slide.Basis, "drained (long-term) condition governs") || slide.Status != check.Fail {
		t.Errorf("sliding %v, basis %q", slide.Status, slide.Basis)
	}
	// A pull high on the block opens a gap under its back: the undrained
	// resistance is capped at 0.4 N.
	high := foundation.AnchorPull{Force: 150 * units.Kilonewton, Angle: deg(10), X: 2.5, Z: 1.5}
	rs, err = blk.Check([]foundation.AnchorPull{high}, clay, foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	fx, fz = 150*math.Cos(10*math.Pi/180), 150*math.Sin(10*math.Pi/180)
	n = 270 - fz
	e = (fx*1.5 - fz) / n
	if e <= 0.5 {
		t.Fatalf("test geometry: e %v inside the kern", e)
	}
	uu, _ = byID(t, rs, "anchor.sliding").Value("U_un")
	near(t, "capped undrained", uu.Value, 1.5*fx/math.Min(0.4*n, 20*(3-2*e)*2.5), 1e-9)
	// Undrained passive: K = 1, p = σ'v ± 2c_u (Bell); with the face from
	// 0 to 1.5 m: Pp = (½·17·1.5² + 2·20·1.5)·2.5 = 197.81 kN; the active
	// side is in tension above z = 2c_u/γ = 2.353 m: Pa = 0.
	blk.PassiveMobilisation = 0.5
	fullPP := (0.5*17*2.25 + 2*20*1.5) * 2.5
	clayU := clay
	clayU.Friction = 0 // undrained only
	rs, err = blk.Check([]foundation.AnchorPull{testPull()}, clayU, foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	pp, _ := byID(t, rs, "anchor.sliding").Value("P_p")
	pa, _ := byID(t, rs, "anchor.sliding").Value("P_a")
	near(t, "undrained Pp", pp.Value, fullPP*1e3, 1e-12)
	near(t, "undrained Pa", pa.Value, 0, 1e-12)
}

// TestLayeredEarth: without water the layered earth pressure is the
// single-layer one (EarthPressureForce); with water the passive force on a
// 2 m face, water 1 m down, Kp 3, γ 18, γ' 8.19, c 0, is by hand
// 3·(½·18·1 + (18 + 26.19)/2·1) = 93.285 kN/m.
func TestLayeredEarth(t *testing.T) {
	s := foundation.Soil{UnitWeight: 18 * kNm3, Friction: deg(30), Cohesion: 5 * units.Kilopascal}
	d := foundation.Deadman{Length: 1, Height: 2, Thickness: 0.3, Depth: 2}
	dry, _, err := d.Resistance(s, foundation.Drained)
	if err != nil {
		t.Fatal(err)
	}
	pp, _ := foundation.EarthPressureForce(3, s.UnitWeight, s.Cohesion, 0, 2, 1)
	pa, _ := foundation.EarthPressureForce(1.0/3, s.UnitWeight, s.Cohesion, 0, 2, -1)
	near(t, "dry deadman = single layer", float64(dry), float64(pp.Force-pa.Force), 1e-12)
	s.Cohesion = 0
	d.Water = foundation.WaterAt(1)
	wet, _, err := d.Resistance(s, foundation.Drained)
	if err != nil {
		t.Fatal(err)
	}
	wantPP := 3 * (0.5*18*1 + (18+26.19)/2*1) * 1e3
	wantPA := wantPP / 9
	near(t, "wet deadman", float64(wet), wantPP-wantPA, 1e-12)
}
