package foundation_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

const kNm3 = units.KilonewtonPerCubicMetre

func testBlock() foundation.AnchorBlock {
	return foundation.AnchorBlock{Length: 3, Width: 2.5, Height: 1.5, Depth: 1.5}
}

func testSand() foundation.Soil {
	return foundation.Soil{Name: "invented dense sand", UnitWeight: 19 * kNm3, Friction: deg(36)}
}

func testPull() foundation.AnchorPull {
	return foundation.AnchorPull{Force: 80 * units.Kilonewton, Angle: deg(25), X: 2.5, Z: 1.2}
}

func TestAnchorBlockHand(t *testing.T) {
	// Hand calculation by statics (common-practice model stated in the doc
	// comment), kN and m: W = 24·3·2.5·1.5 = 270; Fx = 80 cos25 = 72.5046,
	// Fz = 80 sin25 = 33.8095; δ = ⅔·36° = 24°.
	fx, fz := 80*math.Cos(25*math.Pi/180), 80*math.Sin(25*math.Pi/180)
	w := 24.0 * 3 * 2.5 * 1.5
	n := w - fz
	tanD := math.Tan(24 * math.Pi / 180)
	rs, err := testBlock().Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	slide := byID(t, rs, "anchor.sliding")
	near(t, "sliding provided", slide.Provided, n*tanD/fx, 1e-9) // 1.4504: fails 1.5
	if slide.Status != check.Fail || slide.Required != 1.5 {
		t.Errorf("sliding %v required %v, want FAIL at 1.5", slide.Status, slide.Required)
	}
	over := byID(t, rs, "anchor.overturning")
	near(t, "overturning provided", over.Provided, w*1.5/(fx*1.2+fz*0.5), 1e-9) // 3.898
	if over.Required != 1.5 {
		t.Errorf("overturning required %v, want 1.5 for anchors", over.Required)
	}
	lift := byID(t, rs, "anchor.uplift")
	near(t, "uplift provided", lift.Provided, w/fz, 1e-9)
	// Bearing: e = (Fx·1.2 + Fz·(1.5 − 2.5))/N from the base centre; the
	// effective base is (3 − 2e) × 2.5.
	e := (fx*1.2 - fz) / n
	bear := byID(t, rs, "anchor.bearing")
	near(t, "bearing demand", bear.Demand/1e3, n/((3-2*e)*2.5), 1e-9)
	br, err := foundation.BearingCapacity(foundation.BearingInput{AlongLoad: 3, AcrossLoad: 2.5, Depth: 1.5,
		Vertical: units.Force(n * 1e3), Horizontal: units.Force(fx * 1e3), EccAlong: units.Length(e)}, testSand(), foundation.EC7, foundation.Drained)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "bearing capacity", bear.Capacity, float64(br.Qult)/3, 1e-9)

	// With half the passive resistance mobilised: Kp = tan²63°, Ka =
	// tan²27°, Pp = ½Kp·19·1.5²·2.5, Pa likewise; the active thrust is
	// added to the driving force.
	blk := testBlock()
	blk.PassiveMobilisation = 0.5
	kp, ka := math.Pow(math.Tan(63*math.Pi/180), 2), math.Pow(math.Tan(27*math.Pi/180), 2)
	pp, pa := 0.5*kp*19*2.25*2.5, 0.5*ka*19*2.25*2.5
	rs, err = blk.Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "sliding with passive", byID(t, rs, "anchor.sliding").Provided, (n*tanD+0.5*pp)/(fx+pa), 1e-9) // 2.409
	// Overturning ignores earth pressures on both faces.
	near(t, "overturning unchanged", byID(t, rs, "anchor.overturning").Provided, w*1.5/(fx*1.2+fz*0.5), 1e-9)
}

func TestAnchorBlockPartialHand(t *testing.T) {
	// EN 1997-1:2004 Annex A Table A.1 [R]: EQU γG,dst 1.1, γG,stb 0.9,
	// γQ,dst 1.5. A permanent and a variable part of the pull.
	perm, vari := testPull(), testPull()
	perm.Force, vari.Force = 60*units.Kilonewton, 20*units.Kilonewton
	vari.Variable = true
	rs, err := testBlock().Check([]foundation.AnchorPull{perm, vari}, testSand(), foundation.EC7, &foundation.Basis{PartialFactors: true})
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	s := math.Sin(25 * math.Pi / 180)
	c := math.Cos(25 * math.Pi / 180)
	lift := byID(t, rs, "anchor.uplift")
	near(t, "EQU uplift", lift.Provided, 0.9*270/((1.1*60+1.5*20)*s), 1e-9)
	if lift.Required != 1 {
		t.Errorf("partial required %v, want 1", lift.Required)
	}
	over := byID(t, rs, "anchor.overturning")
	near(t, "EQU overturning", over.Provided, 0.9*270*1.5/((1.1*60+1.5*20)*(c*1.2+s*0.5)), 1e-9)
	// DA2 sliding: A1 γG 1.35, γQ 1.5 on the pull, weight 1.0, M1, R2 γR,h 1.1.
	slide := byID(t, rs, "anchor.sliding")
	fxd := (1.35*60 + 1.5*20) * c
	nd := 270 - (1.35*60+1.5*20)*s
	near(t, "DA2 sliding", slide.Provided, nd*math.Tan(24*math.Pi/180)/1.1/fxd, 1e-9)
	if !strings.Contains(slide.Basis, "DA2") {
		t.Errorf("basis %q", slide.Basis)
	}
	// DA1: combination 2 (M2 on tan φ') governs sliding here.
	rs1, err := testBlock().Check([]foundation.AnchorPull{perm, vari}, testSand(), foundation.EC7, &foundation.Basis{PartialFactors: true, Approach: foundation.DesignApproach1})
	if err != nil {
		t.Fatal(err)
	}
	s1 := byID(t, rs1, "anchor.sliding")
	phid := math.Atan(math.Tan(36*math.Pi/180) / 1.25)
	c1 := (270 - (1.35*60+1.5*20)*s) * math.Tan(24*math.Pi/180) / ((1.35*60 + 1.5*20) * c)
	c2 := (270 - (60+1.3*20)*s) * math.Tan(2.0/3*phid) / ((60 + 1.3*20) * c)
	near(t, "DA1 sliding", s1.Provided, math.Min(c1, c2), 1e-9)
}

func TestAnchorBlockZeroPull(t *testing.T) {
	for _, b := range []*foundation.Basis{nil, {PartialFactors: true}, {PartialFactors: true, Approach: foundation.DesignApproach1}} {
		for _, pulls := range [][]foundation.AnchorPull{nil, {{Angle: deg(30), X: 1, Z: 1}}} {
			rs, err := testBlock().Check(pulls, testSand(), foundation.EC7, b)
			if err != nil {
				t.Fatal(err)
			}
			noNaN(t, rs)
			for _, r := range rs {
				if r.Status != check.Pass {
					t.Errorf("%s: %v with no pull", r.ID, r.Status)
				}
				if r.ID != "anchor.bearing" && !math.IsInf(r.Provided, 1) {
					t.Errorf("%s: provided %v with no pull, want +Inf", r.ID, r.Provided)
				}
			}
		}
	}
}

func TestAnchorBlockLargerNeverWorse(t *testing.T) {
	pulls := []foundation.AnchorPull{testPull(), {Force: 30 * units.Kilonewton, Angle: deg(35), X: 1, Z: 0.5, Variable: true}}
	grow := []struct {
		name string
		f    func(*foundation.AnchorBlock, float64)
	}{
		{"length", func(a *foundation.AnchorBlock, x float64) { a.Length += units.Length(x) }},
		{"width", func(a *foundation.AnchorBlock, x float64) { a.Width += units.Length(x) }},
		{"height", func(a *foundation.AnchorBlock, x float64) { a.Height += units.Length(x); a.Depth += units.Length(x) }},
		{"cover", func(a *foundation.AnchorBlock, x float64) { a.Depth += units.Length(x) }},
	}
	for _, mu := range []float64{0, 0.5} {
		for _, b := range []*foundation.Basis{nil, {PartialFactors: true}} {
			for _, g := range grow {
				prev := map[string]float64{}
				for step := 0.0; step <= 2; step += 0.25 {
					blk := testBlock()
					blk.PassiveMobilisation = mu
					g.f(&blk, step)
					rs, err := blk.Check(pulls, testSand(), foundation.EC7, b)
					if err != nil {
						t.Fatal(err)
					}
					noNaN(t, rs)
					for _, id := range []string{"anchor.sliding", "anchor.overturning", "anchor.uplift"} {
						p := byID(t, rs, id).Provided
						if old, ok := prev[id]; ok && p < old*(1-1e-12) {
							t.Errorf("μ %v basis %v: larger %s (+%v m) lowered %s from %v to %v", mu, b, g.name, step, id, old, p)
						}
						prev[id] = p
					}
					// A larger plan never raises the bearing ratio (a taller
					// block is heavier and may).
					if g.name == "length" || g.name == "width" {
						r := byID(t, rs, "anchor.bearing").Ratio
						if old, ok := prev["bearing"]; ok && r > old*(1+1e-12) {
							t.Errorf("μ %v basis %v: larger %s (+%v m) raised the bearing ratio from %v to %v", mu, b, g.name, step, old, r)
						}
						prev["bearing"] = r
					}
				}
			}
		}
	}
}

func TestAnchorBlockLinearity(t *testing.T) {
	// Horizontal pull, no passive: sliding and overturning factors scale
	// as 1/F; splitting a pull into two at the same point changes nothing.
	one := foundation.AnchorPull{Force: 50 * units.Kilonewton, X: 2, Z: 1}
	rs1, _ := testBlock().Check([]foundation.AnchorPull{one}, testSand(), foundation.EC7, nil)
	two := one
	two.Force *= 2
	rs2, _ := testBlock().Check([]foundation.AnchorPull{two}, testSand(), foundation.EC7, nil)
	rsSplit, _ := testBlock().Check([]foundation.AnchorPull{one, one}, testSand(), foundation.EC7, nil)
	for _, id := range []string{"anchor.sliding", "anchor.overturning"} {
		near(t, id+" scaling", byID(t, rs2, id).Provided, byID(t, rs1, id).Provided/2, 1e-12)
		near(t, id+" split", byID(t, rsSplit, id).Provided, byID(t, rs2, id).Provided, 1e-12)
	}
	near(t, "bearing split", byID(t, rsSplit, "anchor.bearing").Ratio, byID(t, rs2, "anchor.bearing").Ratio, 1e-12)
}

func TestAnchorBlockEdgeCases(t *testing.T) {
	// A pull that lifts the block: uplift fails, bearing passes with a note.
	big := foundation.AnchorPull{Force: 1000 * units.Kilonewton, Angle: deg(80), X: 1.5, Z: 1.5}
	rs, err := testBlock().Check([]foundation.AnchorPull{big}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	if byID(t, rs, "anchor.uplift").Status != check.Fail {
		t.Error("uplift should fail")
	}
	if b := byID(t, rs, "anchor.bearing"); b.Status != check.Pass || len(b.Notes) == 0 {
		t.Errorf("bearing on lift-off: %v %v", b.Status, b.Notes)
	}
	// A horizontal pull high on a light slab: resultant outside the base.
	slab := foundation.AnchorBlock{Length: 1, Width: 1, Height: 3, Depth: 0}
	rs, err = slab.Check([]foundation.AnchorPull{{Force: 60 * units.Kilonewton, X: 1, Z: 3}}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	if b := byID(t, rs, "anchor.bearing"); b.Status != check.Fail || !strings.Contains(strings.Join(b.Notes, " "), "outside") {
		t.Errorf("outside base: %v %v", b.Status, b.Notes)
	} else {
		// The capacity of 0 and the unbounded ratio are explained, with the
		// eccentricity beside the half-length it exceeds (1 m block: 500 mm).
		notes := strings.Join(b.Notes, " ")
		for _, want := range []string{"against half its side, 500.0 mm", "bearing capacity is taken as 0", "(inf): a failure",
			"mean pressure N/A on the whole base area"} {
			if !strings.Contains(notes, want) {
				t.Errorf("outside base: the note lacks %q: %s", want, notes)
			}
		}
	}
	// Groundwater at the surface lowers the uplift factor.
	wet := testBlock()
	wet.Water = foundation.WaterAt(0)
	dry, _ := testBlock().Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	wt, err := wet.Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	// Buoyancy 9.81·3·2.5·1.5 kN off 270 kN.
	near(t, "buoyant uplift", byID(t, wt, "anchor.uplift").Provided,
		byID(t, dry, "anchor.uplift").Provided*(270-9.81*11.25)/270, 1e-9)
	// A site allowable pressure is checked beside the bearing-capacity
	// equation; here it governs.
	s := testSand()
	s.Allowable = 150 * units.Kilopascal
	rs, err = testBlock().Check([]foundation.AnchorPull{testPull()}, s, foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	if b := byID(t, rs, "anchor.bearing"); b.Capacity != 150e3 {
		t.Errorf("capacity %v, want the allowable 150 kPa", b.Capacity)
	}
}

func TestAnchorBlockRejects(t *testing.T) {
	good := testBlock()
	cases := []struct {
		name  string
		blk   func(*foundation.AnchorBlock)
		pull  func(*foundation.AnchorPull)
		basis *foundation.Basis
	}{
		{"zero length", func(a *foundation.AnchorBlock) { a.Length = 0 }, nil, nil},
		{"NaN width", func(a *foundation.AnchorBlock) { a.Width = units.Length(math.NaN()) }, nil, nil},
		{"negative depth", func(a *foundation.AnchorBlock) { a.Depth = -1 }, nil, nil},
		{"mobilisation 2", func(a *foundation.AnchorBlock) { a.PassiveMobilisation = 2 }, nil, nil},
		{"negative pull", nil, func(p *foundation.AnchorPull) { p.Force = -1 }, nil},
		{"angle 100", nil, func(p *foundation.AnchorPull) { p.Angle = deg(100) }, nil},
		{"point outside", nil, func(p *foundation.AnchorPull) { p.X = 4 }, nil},
		{"Inf Z", nil, func(p *foundation.AnchorPull) { p.Z = units.Length(math.Inf(1)) }, nil},
		{"factor below 1", nil, nil, &foundation.Basis{Sliding: 0.8}},
		{"negative partial", nil, nil, &foundation.Basis{PartialFactors: true, GammaRh: -1}},
		{"bad approach", nil, nil, &foundation.Basis{PartialFactors: true, Approach: 7}},
	}
	for _, c := range cases {
		blk, p := good, testPull()
		if c.blk != nil {
			c.blk(&blk)
		}
		if c.pull != nil {
			c.pull(&p)
		}
		rs, err := blk.Check([]foundation.AnchorPull{p}, testSand(), foundation.EC7, c.basis)
		if !errors.Is(err, foundation.ErrInvalid) || rs != nil {
			t.Errorf("%s: err %v, results %d", c.name, err, len(rs))
		}
		if err != nil && !strings.HasPrefix(err.Error(), "foundation: ") {
			t.Errorf("%s: message %q lacks the package prefix", c.name, err)
		}
	}
	if _, err := good.Check(nil, foundation.Soil{UnitWeight: 18 * kNm3, Friction: deg(70)}, foundation.EC7, nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("φ 70: %v", err)
	}
}

func TestAnchorBlockSteps(t *testing.T) {
	// A step covering the whole plan is the same as a taller block; with
	// passive resistance counted only while the ground is at the block's
	// top (the step's front face is not counted as a passive face).
	pulls := []foundation.AnchorPull{testPull(), {Force: 20e3, Angle: deg(40), X: 0.5, Z: 0.3, Variable: true}}
	for _, c := range []struct {
		depth units.Length
		mu    float64
	}{{1.5, 0.5}, {1.5, 0}, {2.5, 0}, {3.5, 0}} {
		for _, water := range []bool{false, true} {
			stepped := testBlock()
			stepped.Depth, stepped.PassiveMobilisation = c.depth, c.mu
			if water {
				stepped.Water = foundation.WaterAt(0.4)
			}
			stepped.Steps = []foundation.Step{{X0: 0, X1: 3, Z0: 1.5, Z1: 2.3, Width: 2.5}}
			tall := stepped
			tall.Steps = nil
			tall.Height = 2.3
			for _, b := range []*foundation.Basis{nil, {PartialFactors: true}} {
				rs, err1 := stepped.Check(pulls, testSand(), foundation.EC7, b)
				rt, err2 := tall.Check(pulls, testSand(), foundation.EC7, b)
				if err1 != nil || err2 != nil {
					t.Fatal(err1, err2)
				}
				for i := range rs {
					near(t, rs[i].ID+" stepped = tall", rs[i].Ratio, rt[i].Ratio, 1e-12)
				}
			}
		}
	}
	// The same step at the back of the block resists overturning better
	// than at its front, by statics: W·(L − x) about the toe.
	back, front := testBlock(), testBlock()
	back.Steps = []foundation.Step{{X0: 0, X1: 1, Z0: 1.5, Z1: 2.5, Width: 2.5}}
	front.Steps = []foundation.Step{{X0: 2, X1: 3, Z0: 1.5, Z1: 2.5, Width: 2.5}}
	rb, _ := back.Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	rf, _ := front.Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	fx, fz := 80*math.Cos(25*math.Pi/180), 80*math.Sin(25*math.Pi/180)
	dst := fx*1.2 + fz*0.5
	near(t, "back step", byID(t, rb, "anchor.overturning").Provided, (270*1.5+60*2.5)/dst, 1e-9)
	near(t, "front step", byID(t, rf, "anchor.overturning").Provided, (270*1.5+60*0.5)/dst, 1e-9)
	// A pull may attach on a step, not in the air beside it.
	on := foundation.AnchorPull{Force: 50e3, Angle: deg(20), X: 0.5, Z: 2.4}
	if _, err := back.Check([]foundation.AnchorPull{on}, testSand(), foundation.EC7, nil); err != nil {
		t.Errorf("pull on the step: %v", err)
	}
	if _, err := front.Check([]foundation.AnchorPull{on}, testSand(), foundation.EC7, nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("pull beside the step: %v", err)
	}
	for i, st := range []foundation.Step{
		{X0: 1, X1: 0.5, Z0: 1.5, Z1: 2, Width: 1},
		{X0: 0, X1: 1, Z0: 1, Z1: 2, Width: 1},
		{X0: 0, X1: 1, Z0: 1.5, Z1: 2, Width: 3},
		{X0: 0, X1: 4, Z0: 1.5, Z1: 2, Width: 1},
	} {
		blk := testBlock()
		blk.Steps = []foundation.Step{st}
		if _, err := blk.Check(nil, testSand(), foundation.EC7, nil); !errors.Is(err, foundation.ErrInvalid) {
			t.Errorf("bad step %d: %v", i, err)
		}
	}
}

// TestAnchorBlockAllowableAndEquation: a site's allowable pressure presumes
// a vertical load; an anchor block's base carries a strongly inclined one,
// so the bearing equation is checked besides and the worse governs. The
// 3 × 2.5 × 1.5 m block (270 kN) in sand (γ 18 kN/m³, φ' 30°) with an
// allowable pressure of 200 kPa, pulled by 200 kN at 10° at mid-length,
// 0.5 m up. By hand, kN and m:
//
//	F_x = 196.96, F_z = 34.73, N = 235.27, e = 196.96·0.5/235.27 = 0.4186 m
//	peak pressure 235.27/7.5·(1 + 6·0.4186/3) = 57.63 kPa → 0.288 of 200: passes
//	EN 1997-1 D.4: B' = 3 − 2e = 2.163 (along the load), L' = 2.5, q = 27 kPa,
//	m_B = (2 + B'/L')/(1 + B'/L'), i_q = (1 − H/N)^m, i_γ = (1 − H/N)^(m+1)
//	N/A' against qult/3: fails
//
// With the allowable pressure alone (as before) the block passed.
func TestAnchorBlockAllowableAndEquation(t *testing.T) {
	s := foundation.Soil{UnitWeight: 18 * kNm3, Friction: deg(30), Allowable: 200 * units.Kilopascal}
	pull := foundation.AnchorPull{Force: 200 * units.Kilonewton, Angle: deg(10), X: 1.5, Z: 0.5}
	rs, err := testBlock().Check([]foundation.AnchorPull{pull}, s, foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	fx, fz := 200*math.Cos(10*math.Pi/180), 200*math.Sin(10*math.Pi/180)
	n := 270 - fz
	e := fx * 0.5 / n
	qmax := n / 7.5 * (1 + 6*e/3)
	phi := math.Pi / 6
	nq := math.Exp(math.Pi*math.Tan(phi)) * math.Pow(math.Tan(math.Pi/4+phi/2), 2)
	ng := 2 * (nq - 1) * math.Tan(phi)
	bp, lp := 3-2*e, 2.5
	r := bp / lp
	mB := (2 + r) / (1 + r)
	iq, ig := math.Pow(1-fx/n, mB), math.Pow(1-fx/n, mB+1)
	qult := 27*nq*(1+r*math.Sin(phi))*iq + 0.5*18*bp*ng*(1-0.3*r)*ig
	uEq := n / (bp * lp) / (qult / 3)
	b := byID(t, rs, "anchor.bearing")
	near(t, "U_qa", valueOf(t, b, "U_qa"), qmax/200, 1e-9)
	near(t, "U_qult", valueOf(t, b, "U_qult"), uEq, 1e-9)
	if !(qmax/200 < 1 && uEq > 1) {
		t.Fatalf("test geometry: allowable %.3f, equation %.3f", qmax/200, uEq)
	}
	if b.Status != check.Fail || !strings.HasPrefix(b.Basis, "drained (long-term) condition only") || !strings.Contains(b.Basis, "the bearing equation") {
		t.Errorf("bearing %v (ratio %.3f), basis %q", b.Status, b.Ratio, b.Basis)
	}
}

// TestAnchorBlockFallingGround checks the block on ground falling away at
// 20°: the passive coefficient is Coulomb's for a smooth vertical face and
// ground falling in front (Murthy eq. 11.51 form, δ = 0, β = −20°; by
// hand: sin36·sin16/cos20 = 0.587785·0.275637/0.939693 = 0.172413, √ =
// 0.415226, Kp = cos²36/(1 − 0.415226)² = 0.654508/0.341961 = 1.91399,
// 1.913994 unrounded, against Rankine's 3.851840 on level ground), the
// bearing takes the ground factors (see TestBearingGroundSlope), and at
// or beyond φ' no passive resistance is counted.
func TestAnchorBlockFallingGround(t *testing.T) {
	fx := 80 * math.Cos(25*math.Pi/180)
	at := func(slope float64) []check.Result {
		return passiveBlock(t, func(b *foundation.AnchorBlock) { b.GroundSlope = deg(slope) })
	}
	level, falling, steep := at(0), at(20), at(40)
	pa := 0.5 * math.Pow(math.Tan(27*math.Pi/180), 2) * 19 * 2.25 * 2.5
	pp := func(kp float64) float64 { return 0.5 * kp * 19 * 2.25 * 2.5 }
	base := func(rs []check.Result) float64 { // the base's shear resistance, from the level case
		s := byID(t, rs, "anchor.sliding")
		return s.Capacity
	}
	near(t, "level passive", base(level), base(steep)+0.5e3*pp(3.851840), 1e-6)
	near(t, "falling passive", base(falling), base(steep)+0.5e3*pp(1.913994), 1e-6)
	near(t, "steep: base shear only, the active thrust still driving", byID(t, steep, "anchor.sliding").Demand/1e3, fx+pa, 1e-9)
	for _, c := range []struct {
		rs   []check.Result
		want float64
	}{{falling, 1.913994}, {steep, 0}} {
		v, ok := byID(t, c.rs, "anchor.sliding").Value("K_p")
		if !ok {
			t.Fatal("no K_p value on falling ground")
		}
		near(t, "K_p value", float64(v.Value)+1e-12, c.want+1e-12, 1e-6)
	}
	if bl, bf := byID(t, level, "anchor.bearing"), byID(t, falling, "anchor.bearing"); !(bf.Ratio > bl.Ratio) {
		t.Errorf("bearing on falling ground %.3f, on level ground %.3f: want higher", bf.Ratio, bl.Ratio)
	}
	if _, ok := byID(t, falling, "anchor.bearing").Value("g_q"); !ok {
		t.Error("bearing on falling ground carries no ground factor")
	}
}

// TestAnchorBlockRisingGroundBehind: with the passive resistance counted,
// the active thrust on the back face takes Coulomb's Ka for ground rising
// behind at 20° (Murthy eq. 11.51 form, δ = 0, vertical face; by hand for
// φ 36°: sin36·sin16/cos20 = 0.172413, √ = 0.415227, Ka = cos²36/(1 +
// 0.415227)² = 0.654508/2.002867 = 0.326786, against Rankine's 0.259616 on
// level ground), and at a backslope steeper than φ the slope of φ.
func TestAnchorBlockRisingGroundBehind(t *testing.T) {
	at := func(back float64) check.Result {
		return byID(t, passiveBlock(t, func(b *foundation.AnchorBlock) { b.BackSlope = deg(back) }), "anchor.sliding")
	}
	fx := 80 * math.Cos(25*math.Pi/180)
	pa := func(ka float64) float64 { return 0.5 * ka * 19 * 2.25 * 2.5 }
	near(t, "level", at(0).Demand/1e3, fx+pa(0.259616), 1e-6)
	near(t, "rising 20°", at(20).Demand/1e3, fx+pa(0.326786), 1e-6)
	// Ka at β = φ = 36°: cos²36/(1 + √(sin36·sin0/cos36))² = cos²36 = 0.654508.
	near(t, "rising 50°, taken at φ", at(50).Demand/1e3, fx+pa(0.654508), 1e-6)
}

// passiveBlock checks the test block with half its passive resistance
// counted, as set changes it, under the test pull on the test sand.
func passiveBlock(t *testing.T, set func(*foundation.AnchorBlock)) []check.Result {
	t.Helper()
	blk := testBlock()
	blk.PassiveMobilisation = 0.5
	set(&blk)
	rs, err := blk.Check([]foundation.AnchorPull{testPull()}, testSand(), foundation.EC7, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	return rs
}

// TestAnchorBlockUndrainedFallingGround: in clay, undrained, the passive
// thrust on ground falling 10° in front is the level ground's scaled by the
// least thrust of a plane wedge (found here by scanning the failure
// plane's angle: the wedge's statics, P = ½γhx tanθ + c_u x (1 + tan²θ),
// x = h/(tanθ + tanβ)), against Rankine's ½γh² + 2c_u h on level ground;
// a slope of 1° takes off under 2 %, not the whole thrust.
func TestAnchorBlockUndrainedFallingGround(t *testing.T) {
	clay := foundation.Soil{Name: "invented soft clay", UnitWeight: 18 * kNm3, Undrained: 40 * units.Kilopascal}
	slide := func(beta float64) check.Result {
		t.Helper()
		blk := testBlock()
		blk.PassiveMobilisation = 0.5
		blk.GroundSlope = deg(beta)
		rs, err := blk.Check([]foundation.AnchorPull{testPull()}, clay, foundation.EC7, nil)
		if err != nil {
			t.Fatal(err)
		}
		noNaN(t, rs)
		return byID(t, rs, "anchor.sliding")
	}
	const g, h, cu, width = 18e3, 1.5, 40e3, 2.5
	wedge := func(beta float64) float64 {
		b, least := math.Tan(beta*math.Pi/180), math.Inf(1)
		for k := 1; k < 90000; k++ {
			tt := math.Tan(float64(k) / 1000 * math.Pi / 180)
			x := h / (tt + b)
			least = math.Min(least, 0.5*g*h*x*tt+cu*x*(1+tt*tt))
		}
		return least
	}
	level := slide(0)
	near(t, "level: Rankine's", wedge(0), 0.5*g*h*h+2*cu*h, 1e-6)
	for _, beta := range []float64{1, 10} {
		got := slide(beta)
		near(t, "passive lost", level.Capacity-got.Capacity, 0.5*width*(wedge(0)-wedge(beta)), 1e-4)
		if beta == 1 && !(got.Capacity > 0.98*level.Capacity) {
			t.Errorf("1° of fall: resistance %v of %v", got.Capacity, level.Capacity)
		}
	}
}
