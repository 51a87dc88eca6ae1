package foundation_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

func testDeadman() foundation.Deadman {
	return foundation.Deadman{Length: 3, Height: 1, Thickness: 0.3, Depth: 1.5}
}

func TestDeadmanHand(t *testing.T) {
	// Teng's method near the surface (from memory), hand calculation, kN
	// and m, φ 30°, γ 18: Kp 3, Ka 1/3; Pp − Pa = ½·18·1.5²·(3 − 1/3) = 54 kN/m;
	// T = 3·54 = 162 kN. End effects ⅓·0.4·18·(√3 + √⅓)·1.5³·tan30° = 10.8 kN.
	r, how, err := testDeadman().Resistance(sand30(), foundation.Drained)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Teng", float64(r)/1e3, 162, 1e-9)
	if how == "" {
		t.Error("no method text")
	}
	d := testDeadman()
	d.EndEffects = true
	r, _, _ = d.Resistance(sand30(), foundation.Drained)
	near(t, "Teng with ends", float64(r)/1e3, 172.8, 1e-9)
	// Deep deadman, face from 1.5 to 2.0 m: (3 − 1/3)·18·(2² − 1.5²)/2 =
	// 42 kN/m, ×3 m = 126 kN, more than Teng's value at depth 1 m,
	// ½·18·1·(8/3)·3 = 72 kN.
	deep := foundation.Deadman{Length: 3, Height: 0.5, Thickness: 0.3, Depth: 2}
	r, _, _ = deep.Resistance(sand30(), foundation.Drained)
	near(t, "deep face", float64(r)/1e3, 126, 1e-9)
	// Just past the near-surface limit, Height 0.5, Depth 1.01 m: the face
	// gives (8/3)·9·(1.01² − 0.51²)·3 = 54.6 kN, less than Teng's value at
	// depth 2·Height = 1 m (72 kN), which governs.
	deep.Depth = 1.01
	r, _, _ = deep.Resistance(sand30(), foundation.Drained)
	near(t, "deep, Teng at 2h", float64(r)/1e3, 72, 1e-9)

	// Pull 60 kN at 20°: pull-out 162/(60 cos20) = 2.873; uplift resisted by
	// the deadman 24·3·0.3·1 = 21.6 and soil 18·3·0.3·0.5 = 8.1 kN.
	p := foundation.AnchorPull{Force: 60 * units.Kilonewton, Angle: deg(20)}
	rs, err := testDeadman().Check([]foundation.AnchorPull{p}, sand30(), nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	po := byID(t, rs, "anchor.deadman.pullout")
	near(t, "pullout", po.Provided, 162/(60*math.Cos(20*math.Pi/180)), 1e-9)
	if po.Required != 2 || po.Status != check.Pass {
		t.Errorf("pullout required %v status %v", po.Required, po.Status)
	}
	up := byID(t, rs, "anchor.deadman.uplift")
	near(t, "uplift", up.Provided, 29.7/(60*math.Sin(20*math.Pi/180)), 1e-9)
	if up.Status != check.Fail { // 1.447 < 1.5
		t.Errorf("uplift %v", up.Status)
	}
	// Partial (DA2): A1 1.35 on a permanent pull, R2 γR,e 1.4.
	rs, err = testDeadman().Check([]foundation.AnchorPull{p}, sand30(), &foundation.Basis{PartialFactors: true})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "DA2 pullout", byID(t, rs, "anchor.deadman.pullout").Provided, 162/1.4/(1.35*60*math.Cos(20*math.Pi/180)), 1e-9)
	near(t, "EQU uplift", byID(t, rs, "anchor.deadman.uplift").Provided, 0.9*29.7/(1.1*60*math.Sin(20*math.Pi/180)), 1e-9)
}

func TestDeadmanConsistency(t *testing.T) {
	// No pull: infinite factors. Deeper or longer: never worse.
	rs, err := testDeadman().Check(nil, sand30(), nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rs {
		if r.NoLimit {
			continue // the beam's moment and shear, recorded
		}
		if !math.IsInf(r.Provided, 1) || r.Status != check.Pass {
			t.Errorf("%s: %v", r.ID, r.Provided)
		}
	}
	p := []foundation.AnchorPull{{Force: 60e3, Angle: deg(20)}}
	prev := map[string]float64{}
	for depth := 1.0; depth <= 3; depth += 0.1 {
		d := testDeadman()
		d.Depth = units.Length(depth)
		rs, err := d.Check(p, sand30(), nil)
		if err != nil {
			t.Fatal(err)
		}
		noNaN(t, rs)
		for _, r := range rs {
			if old, ok := prev[r.ID]; ok && r.Provided < old*(1-1e-12) {
				t.Errorf("depth %.1f lowered %s from %v to %v", depth, r.ID, old, r.Provided)
			}
			prev[r.ID] = r.Provided
		}
	}
	// Cohesion adds resistance.
	c := sand30()
	c.Cohesion = 10 * units.Kilopascal
	r0, _, _ := testDeadman().Resistance(sand30(), foundation.Drained)
	r1, _, _ := testDeadman().Resistance(c, foundation.Drained)
	if r1 <= r0 {
		t.Errorf("cohesion: %v ≤ %v", r1, r0)
	}
}

func TestDeadmanRejects(t *testing.T) {
	for i, d := range []foundation.Deadman{
		{Length: 0, Height: 1, Thickness: 0.3, Depth: 1.5},
		{Length: 3, Height: 2, Thickness: 0.3, Depth: 1.5},
		{Length: 3, Height: 1, Thickness: units.Length(math.NaN()), Depth: 1.5},
		{Length: 3, Height: 1, Thickness: 0.3, Depth: 1.5, UnitWeight: -1},
	} {
		if _, err := d.Check(nil, sand30(), nil); !errors.Is(err, foundation.ErrInvalid) {
			t.Errorf("case %d: %v", i, err)
		}
	}
	if _, err := testDeadman().Check([]foundation.AnchorPull{{Force: -5}}, sand30(), nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("negative pull: %v", err)
	}
}

// TestDeadmanValuesRoundTrip: every number behind a deadman's pull-out is
// among its values, and agrees with Teng's near-surface form by hand
// (as TestDeadmanHand, kN, m, φ 30°, γ 18, water 1 m down, γ' 8.19):
//
//	K_p = 3, K_a = 1/3 (Rankine, level ground)
//	σ'v: 18 kPa at 1 m, 18 + 8.19·0.5 = 22.095 kPa at 1.5 m
//	∫σ'v dz = ½·18·1 + (18 + 22.095)/2·0.5 = 19.02375 kN/m
//	P_p = 3·3·19.02375 = 171.214 kN, P_a = 3·(1/3)·19.02375 = 19.024 kN
//	T_e = ⅓·0.4·8.19·(√3 + √⅓)·1.5³·tan 30° (γ' for the wedge below the water, cautious)
//	T_u = P_p − P_a + T_e
func TestDeadmanValuesRoundTrip(t *testing.T) {
	d := testDeadman()
	d.EndEffects = true
	d.Water = foundation.WaterAt(1)
	rs, err := d.Check([]foundation.AnchorPull{{Force: 60 * units.Kilonewton, Angle: deg(20)}}, sand30(), nil)
	if err != nil {
		t.Fatal(err)
	}
	integral := 0.5*18*1 + (18+22.095)/2*0.5
	pp, pa := 3*3*integral, 3*integral/3
	te := 0.4 * 8.19 * (math.Sqrt(3) + math.Sqrt(1.0/3)) * 1.5 * 1.5 * 1.5 * math.Tan(math.Pi/6) / 3
	want := map[string]float64{"T_u": (pp - pa + te) * 1e3, "K_p": 3, "K_a": 1.0 / 3, "z_t": 0, "z_b": 1.5,
		"P_p": pp * 1e3, "P_a": pa * 1e3, "T_e": te * 1e3, "d_w": 1}
	po := byID(t, rs, "anchor.deadman.pullout")
	if len(po.Values) != len(want) {
		t.Errorf("%d values, want %d", len(po.Values), len(want))
	}
	for _, v := range po.Values {
		w, ok := want[v.Symbol]
		if !ok {
			t.Errorf("unexpected value %s", v.Symbol)
			continue
		}
		near(t, v.Symbol, v.Value, w, 1e-9)
	}
	near(t, "capacity", po.Capacity, (pp-pa+te)*1e3, 1e-9)
}

// TestDeadmanFallingGround: ground falling at 20° in front of the deadman
// of TestDeadmanHand (φ 30°, γ 18, face 0–1.5 m, 3 m long). Kp is
// Coulomb's for a smooth face and ground falling in front (Murthy eq.
// 11.51 form, δ = 0, β = −20°; by hand: sin30·sin10/cos20 = 0.092396, √ =
// 0.303968, Kp = cos²30/(1 − 0.303968)² = 0.75/0.484460 = 1.548112), so
// T = ½·18·1.5²·(1.548112 − 1/3)·3 = 73.798 kN, against 162 kN on level
// ground; at 30° (φ) none is counted and the active thrust alone remains.
func TestDeadmanFallingGround(t *testing.T) {
	d := testDeadman()
	d.GroundSlope = deg(20)
	r, _, err := d.Resistance(sand30(), foundation.Drained)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "Teng on falling ground", float64(r)/1e3, 73.798, 1e-4)
	d.GroundSlope = deg(30)
	if r, _, err = d.Resistance(sand30(), foundation.Drained); err != nil || r > 0 {
		t.Errorf("ground falling at φ: resistance %v, %v; want none", r, err)
	}
	d.GroundSlope = deg(95)
	if _, _, err := d.Resistance(sand30(), foundation.Drained); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("ground slope 95°: %v, want ErrInvalid", err)
	}
}

// TestDeadmanEndEffectsOnSteepGround: where the ground falls at or beyond
// φ' in front no passive wedge forms, so Teng's end-effect term (the
// friction on the sides of that wedge) has nothing to act on either. A
// short, deep deadman (0.6 m long, face 1–3 m, φ 30°, γ 18, end effects
// asked for), by hand: the active thrust alone, ½·(1/3)·18·3²·0.6 =
// 16.2 kN, against the pull; counting the end term with Kp = 0,
// ⅓·0.4·18·√(1/3)·3³·tan30° = 21.6 kN, would leave 5.4 kN of resistance
// on ground that carries none.
func TestDeadmanEndEffectsOnSteepGround(t *testing.T) {
	d := foundation.Deadman{Length: 0.6, Height: 2, Thickness: 0.3, Depth: 3, EndEffects: true}
	for _, slope := range []float64{30, 35} {
		d.GroundSlope = deg(slope)
		r, _, err := d.Resistance(sand30(), foundation.Drained)
		if err != nil {
			t.Fatal(err)
		}
		near(t, "resistance on ground falling at or beyond φ", float64(r)/1e3, -16.2, 1e-9)
	}
	rs, err := d.Check([]foundation.AnchorPull{{Force: 2 * units.Kilonewton}}, sand30(), nil)
	if err != nil {
		t.Fatal(err)
	}
	if po := byID(t, rs, "anchor.deadman.pullout"); po.Status != check.Fail {
		t.Errorf("pull-out of 2 kN on ground falling beyond φ: %s, capacity %v; want a failure", po.Status, po.Capacity)
	}
}
