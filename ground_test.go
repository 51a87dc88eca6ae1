package sagspan

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// TestSoilPresenceDecides: a field given in the description counts even
// when it is zero; a field left out keeps the preset's value.
func TestSoilPresenceDecides(t *testing.T) {
	stiff, _ := foundation.LookupSoil("stiff clay")
	data := mutate(t, func(m map[string]any) {
		obj(m, "banks", "left")["soil"] = map[string]any{"preset": "stiff clay", "cohesion": "0 kPa"}
		obj(m, "banks", "right")["soil"] = map[string]any{"preset": "stiff clay", "undrained_strength": "0 kPa", "unit_weight": "20 kN/m3"}
	})
	b, err := Parse(data)
	if err != nil {
		t.Fatal(err)
	}
	left, err := b.Banks.Left.Soil.soil()
	if err != nil {
		t.Fatal(err)
	}
	if left.Cohesion != 0 || left.Friction != stiff.Friction || left.Undrained != stiff.Undrained {
		t.Errorf("\"cohesion\": \"0 kPa\" over stiff clay gave %+v", left)
	}
	if !strings.Contains(left.Source, "overridden in the bridge description: cohesion") {
		t.Errorf("source %q does not say what was overridden", left.Source)
	}
	right, err := b.Banks.Right.Soil.soil()
	if err != nil {
		t.Fatal(err)
	}
	if right.Undrained != 0 || right.Cohesion != stiff.Cohesion || right.UnitWeight != 20e3 {
		t.Errorf("overrides gave %+v", right)
	}
	// Written back as JSON, a zero given stays given.
	data, err = b.MarshalJSON()
	if err != nil {
		t.Fatal(err)
	}
	back, err := Parse(data)
	if err != nil {
		t.Fatal(err)
	}
	if c := back.Banks.Left.Soil.Cohesion; c == nil || *c != 0 {
		t.Errorf("round trip lost the given zero cohesion: %v", c)
	}
	// The whole chain then checks the right bank drained only.
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range a.Report.Results {
		if strings.HasPrefix(r.Element, "right") && strings.Contains(r.Basis, "undrained") &&
			!strings.Contains(r.Basis, "no undrained strength given") {
			t.Fatalf("%s %s checked undrained with c_u removed: %s", r.ID, r.Element, r.Basis)
		}
	}
}

// TestSiteSoil: a soil from the site's own parameters alone, with a
// saturated unit weight, in Go with Given.
func TestSiteSoil(t *testing.T) {
	kNm3, kPa := units.KilonewtonPerCubicMetre, units.Kilopascal
	s := SoilSpec{UnitWeight: Given(18 * kNm3), Saturated: Given(19.5 * kNm3), Friction: Given(units.FromDegrees(27)),
		Cohesion: Given(3 * kPa), Undrained: Given(45 * kPa), BearingMethod: "Vesic"}
	soil, err := s.soil()
	if err != nil {
		t.Fatal(err)
	}
	// γ' = γsat − γw = 19.5 − 9.81 kN/m³ [R: definition].
	near(t, "γ'", float64(soil.Submerged), 19.5e3-9.81e3, 1e-12)
	if soil.Undrained != 45e3 || soil.Cohesion != 3e3 || soil.IsRock {
		t.Errorf("site soil %+v", soil)
	}
	if m, _ := s.method(); m != foundation.Vesic {
		t.Errorf("method %v", m)
	}
}

// TestGroundwaterAboveFlood: a bank's groundwater above the river's design
// flood is a real condition (water draining from the hillside), not a slip:
// it is accepted, and every case takes it, the flood case too, where it is
// the higher water. Refusing it would invite a lower, unconservative level.
func TestGroundwaterAboveFlood(t *testing.T) {
	data := mutate(t, func(m map[string]any) {
		obj(m, "banks", "left")["soil"] = map[string]any{"preset": "dense sand", "groundwater_elevation": "110 m"}
	})
	b, err := Parse(data)
	if err != nil {
		t.Fatalf("groundwater above the flood refused: %v", err)
	}
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, r := range a.Report.Results {
		if !strings.HasPrefix(r.Element, "left") || !(strings.HasPrefix(r.ID, "anchor.") || strings.HasPrefix(r.ID, "footing.")) ||
			r.ID == "anchor.attachment" || strings.HasPrefix(r.ID, "anchor.rod") || r.ID == "anchor.loop" {
			continue
		}
		n++
		if !strings.Contains(r.Basis, "water level used: groundwater at 110.0 m") {
			t.Fatalf("%s %s in %q: basis %q", r.ID, r.Element, r.Case, r.Basis)
		}
	}
	if n == 0 {
		t.Fatal("no ground results on the left bank")
	}
}

// TestBadGround: every soil and anchor combination the analysis cannot
// take is refused at validation with its field path, never by a panic, a
// NaN or an error during the analysis.
func TestBadGround(t *testing.T) {
	soil := func(side string, s map[string]any) func(map[string]any) {
		return func(m map[string]any) { obj(m, "banks", side)["soil"] = s }
	}
	rockAnchor := map[string]any{"type": "rock", "bars": 4, "bar_diameter": "32 mm", "bar_strength": "500 MPa",
		"hole_diameter": "90 mm", "bond_length": "4 m", "free_length": "2 m"}
	tests := []struct {
		name   string
		change func(m map[string]any)
		field  string
		says   string
	}{
		{"negative undrained strength", soil("left", map[string]any{"preset": "soft clay", "undrained_strength": "-20 kPa"}),
			"banks.left.soil.undrained_strength", "-20.00 kPa is outside"},
		{"γ' greater than γ", soil("right", map[string]any{"preset": "dense sand", "submerged_unit_weight": "21 kN/m3"}),
			"banks.right.soil.submerged_unit_weight", "not less than the unit weight"},
		{"γsat light as water", soil("right", map[string]any{"preset": "dense sand", "saturated_unit_weight": "9 kN/m3"}),
			"banks.right.soil.saturated_unit_weight", "outside the plausible range"},
		{"γ' and γsat both", soil("right", map[string]any{"preset": "dense sand", "saturated_unit_weight": "20 kN/m3", "submerged_unit_weight": "10 kN/m3"}),
			"banks.right.soil.saturated_unit_weight", "not both"},
		{"preset typo", soil("right", map[string]any{"preset": "sofft clay"}), "banks.right.soil.preset", `did you mean "soft clay"`},
		{"friction zero for undrained", soil("left", map[string]any{"preset": "soft clay", "friction": "0 deg", "cohesion": "20 kPa"}),
			"banks.left.soil.friction", "undrained_strength"},
		{"site soil without friction", soil("left", map[string]any{"unit_weight": "18 kN/m3", "undrained_strength": "30 kPa"}),
			"banks.left.soil.friction", "missing"},
		{"site soil without weight", soil("left", map[string]any{"friction": "30 deg"}), "banks.left.soil.unit_weight", "missing"},
		{"unit weight in the wrong unit", soil("left", map[string]any{"preset": "gravel", "unit_weight": 1900}),
			"banks.left.soil.unit_weight", "outside the plausible range"},
		{"rock with undrained strength", soil("left", map[string]any{"preset": "sound rock", "allowable_bearing": "2 MPa", "undrained_strength": "50 kPa"}),
			"banks.left.soil.undrained_strength", "rock"},
		{"rock without bearing data", soil("left", map[string]any{"preset": "sound rock"}), "banks.left.soil.allowable_bearing", "K_sp"},
		{"joints too close for K_sp", soil("left", map[string]any{"preset": "sound rock", "rock_strength": "40 MPa", "joint_spacing": "0.1 m"}),
			"banks.left.soil.joint_spacing", "0.3 m"},
		{"rock data on soil", soil("left", map[string]any{"preset": "gravel", "rock_strength": "40 MPa"}), "banks.left.soil.rock_strength", "rock only"},
		{"unknown bearing method", soil("left", map[string]any{"preset": "gravel", "bearing_method": "Terzagi"}), "banks.left.soil.bearing_method", "Vesic"},
		{"rock anchor in sand", func(m map[string]any) { obj(m, "banks", "right")["anchor"] = rockAnchor }, "banks.right.anchor.type", "needs rock"},
		{"rock anchor without grout bond", func(m map[string]any) {
			obj(m, "banks", "right")["anchor"] = rockAnchor
			obj(m, "banks", "right")["soil"] = map[string]any{"unit_weight": "25 kN/m3", "friction": "45 deg", "rock": true, "allowable_bearing": "2 MPa"}
		}, "banks.right.anchor.grout_bond", "missing"},
		{"deadman taller than its depth", func(m map[string]any) {
			obj(m, "banks", "left")["anchor"] = map[string]any{"type": "deadman", "length": "1 m", "width": "5 m", "height": "2 m", "depth": "1.5 m"}
		}, "banks.left.anchor.height", "above the ground"},
		{"deadman in rock", func(m map[string]any) {
			obj(m, "banks", "left")["anchor"] = map[string]any{"type": "deadman", "length": "1 m", "width": "5 m", "height": "1 m", "depth": "1.5 m"}
			obj(m, "banks", "left")["soil"] = map[string]any{"preset": "sound rock", "allowable_bearing": "2 MPa"}
		}, "banks.left.anchor.type", "deadman"},
		{"attachment outside the block", func(m map[string]any) { obj(m, "banks", "left", "anchor")["attach_x"] = "6 m" },
			"banks.left.anchor.attach_x", "beyond the front"},
		{"unknown termination", func(m map[string]any) {
			obj(m, "banks", "left", "anchor")["attachment"] = map[string]any{"kind": "loop", "termination": "knot", "pin_diameter": "200 mm"}
		}, "banks.left.anchor.attachment.termination", "grips"},
		{"pin thinner than the rope", func(m map[string]any) {
			obj(m, "banks", "left", "anchor")["attachment"] = map[string]any{"kind": "loop", "termination": "grips", "pin_diameter": "20 mm"}
		}, "banks.left.anchor.attachment.pin_diameter", "thinner"},
		{"rods missing", func(m map[string]any) {
			obj(m, "banks", "left", "anchor")["attachment"] = map[string]any{"kind": "rod", "termination": "ferrule"}
		}, "banks.left.anchor.attachment.rods", "missing"},
		{"plate on a block", func(m map[string]any) {
			obj(m, "banks", "left", "anchor")["plate"] = map[string]any{"side": "0.2 m", "thickness": "20 mm", "steel": "275 MPa"}
		}, "banks.left.anchor.type", "rock anchor"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			b, err := Parse(mutate(t, tt.change))
			if err == nil {
				a, err2 := Check(b, nil)
				t.Fatalf("no error at validation (analysis: %v, %d results)", err2, len(resultsOf(a)))
			}
			if !errors.Is(err, ErrInvalid) {
				t.Errorf("error %v does not wrap ErrInvalid", err)
			}
			var fe *FieldError
			if !errors.As(err, &fe) {
				t.Fatalf("error %T is not a *FieldError: %v", err, err)
			}
			if fe.Field != tt.field {
				t.Errorf("field %q, want %q (error: %v)", fe.Field, tt.field, err)
			}
			if !strings.Contains(err.Error(), tt.says) {
				t.Errorf("error %q does not say %q", err, tt.says)
			}
		})
	}
}

func resultsOf(a *Analysis) []check.Result {
	if a == nil {
		return nil
	}
	return a.Report.Results
}

// loadTestdata loads a bridge description from testdata.
func loadTestdata(t *testing.T, name string) Bridge {
	t.Helper()
	b, err := LoadFile("testdata/" + name)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

// governingOf returns the governing result of a check on an element.
func governingOf(t *testing.T, a *Analysis, id, element string) check.Result {
	t.Helper()
	for _, r := range a.Report.Governing() {
		if r.ID == id && r.Element == element {
			return r
		}
	}
	t.Fatalf("no %s for %s", id, element)
	return check.Result{}
}

// noNaNIn fails t if any number of the report is NaN.
func noNaNIn(t *testing.T, a *Analysis) {
	t.Helper()
	for _, r := range a.Report.Results {
		for _, x := range []float64{r.Demand, r.Capacity, r.Ratio} {
			if math.IsNaN(x) {
				t.Fatalf("NaN in %s %s %s", r.ID, r.Element, r.Case)
			}
		}
		for _, v := range r.Values {
			if math.IsNaN(v.Value) {
				t.Fatalf("NaN value %s in %s %s %s", v.Symbol, r.ID, r.Element, r.Case)
			}
		}
	}
}

// TestSoftClayBridge checks testdata/soft_clay.json end to end: an invented
// river flat of soft clay (γ 17, γsat 18 kN/m³, φ' 26°, c' 2 kPa,
// c_u 18 kPa). Its footings and anchor blocks are sized for the long-term
// (drained) strength and fail in the short-term (undrained) condition,
// which the report names; the same soil checked drained only passes.
func TestSoftClayBridge(t *testing.T) {
	b := loadTestdata(t, "soft_clay.json")
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaNIn(t, a)
	if len(groundFailures(a)) == 0 {
		t.Fatal("no ground check of the soft-clay bridge fails; want the undrained condition to fail")
	}
	for _, el := range []string{"left footing", "right footing", "left anchor", "right anchor"} {
		id := "footing.bearing"
		if strings.Contains(el, "anchor") {
			id = "anchor.bearing"
		}
		r := governingOf(t, a, id, el)
		uu, _ := r.Value("U_un")
		ud, _ := r.Value("U_dr")
		if r.Status != check.Fail || !strings.HasPrefix(r.Basis, "undrained (short-term) condition governs") || !(uu.Value > 1 && ud.Value < 1) {
			t.Errorf("%s %s: %v, U_un %.3f, U_dr %.3f, basis %q", el, id, r.Status, uu.Value, ud.Value, r.Basis)
		}
	}
	// The left footing's undrained capacity by hand from EN 1997-1 D.3:
	// qult = (π + 2) c_u s_c i_c + q, s_c = 1 + 0.2 B'/L',
	// i_c = ½(1 + √(1 − H/(A'c_u))), H the resultant of the forces along
	// and across the bridge, q = γ·1.0 m (the water lies deep); the
	// allowable basis divides by 3. B', L', H and H_y are the result's own.
	r := governingOf(t, a, "footing.bearing", "left footing")
	val := func(s string) float64 { v, _ := r.Value(s); return v.Value }
	bp, lp, h := val("B'"), val("L'"), math.Hypot(val("H"), val("H_y"))
	qult := (math.Pi+2)*18e3*(1+0.2*bp/lp)*0.5*(1+math.Sqrt(1-h/(bp*lp*18e3))) + 17e3*1.0
	near(t, "undrained footing capacity by hand", r.Capacity, qult/3, 1e-9)

	// The same soil, drained only: every ground check passes.
	for _, k := range []*Bank{&b.Banks.Left, &b.Banks.Right} {
		k.Soil.Undrained = Given(units.Pressure(0))
	}
	a, err = Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range groundFailures(a) {
		t.Errorf("drained only: %s %s %s ratio %.3f", r.ID, r.Element, r.Case, r.Ratio)
	}
	r = governingOf(t, a, "footing.bearing", "left footing")
	if !strings.HasPrefix(r.Basis, "drained (long-term) condition only") {
		t.Errorf("drained-only basis %q", r.Basis)
	}
}

// TestRiverBankBridge checks testdata/river_bank.json end to end: the right
// bank's anchor block stands 0.4 m below the design flood (102.0 m), its
// base at 98.6 m under groundwater at 99.0 m. The flood case governs the
// block, whose basis names the design flood; its uplift by hand: the
// 9 × 8 × 3 m block is wholly under water, so it loses γw/γc =
// 9.81/24 = 40.9 % of its weight; in the other cases 0.4 m of it lies in
// the groundwater: U = 9.81·9·8·0.4 = 282.5 kN. With the flood over its
// ground the passive resistance in front of it is not counted (the flow
// may scour that soil, EN 1997-1 6.5.3(7)); in the other cases half of it
// is, as the description asks.
func TestRiverBankBridge(t *testing.T) {
	a, err := Check(loadTestdata(t, "river_bank.json"), nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaNIn(t, a)
	for _, r := range groundFailures(a) {
		t.Errorf("%s %s %s ratio %.3f", r.ID, r.Element, r.Case, r.Ratio)
	}
	for _, id := range []string{"anchor.sliding", "anchor.overturning", "anchor.uplift", "anchor.bearing"} {
		r := governingOf(t, a, id, "right anchor")
		if r.Case != "flood with crowd" || !strings.Contains(r.Basis, "design flood at 102.0 m") {
			t.Errorf("%s: governing case %q, basis %q; want the flood", id, r.Case, r.Basis)
		}
	}
	up := find(t, a.Report, "anchor.uplift", "right anchor", "flood with crowd")
	w, _ := up.Value("W")
	u, _ := up.Value("U")
	near(t, "flooded block's lost weight", u.Value/w.Value, 9.81/24, 1e-12)
	perm := find(t, a.Report, "anchor.uplift", "right anchor", "permanent")
	u, _ = perm.Value("U")
	near(t, "uplift in the groundwater", u.Value, 9.81e3*9*8*0.4, 1e-9)
	flooded := find(t, a.Report, "anchor.sliding", "right anchor", "flood with crowd")
	if _, ok := flooded.Value("P_p"); ok || !strings.Contains(flooded.Basis, "passive resistance in front of it is not counted") {
		t.Errorf("flooded block counts passive resistance: basis %q", flooded.Basis)
	}
	// By hand: N tan δ alone, δ = ⅔·38° (gravel preset, cast block default).
	n, _ := flooded.Value("N")
	near(t, "flooded sliding resistance", flooded.Capacity, n.Value*math.Tan(2.0/3*38*math.Pi/180), 1e-12)
	dry := find(t, a.Report, "anchor.sliding", "right anchor", "wind with crowd")
	if mu, ok := dry.Value("μ"); !ok || mu.Value != 0.5 {
		t.Errorf("out of the flood the block counts no passive resistance: %v", dry.Values)
	}
	if !strings.Contains(perm.Basis, "groundwater at 99.00 m") {
		t.Errorf("permanent basis %q does not name the groundwater", perm.Basis)
	}
}

// TestRockGorgeBridge checks testdata/rock_gorge.json end to end: the left
// bank is rock described by the site (q_u 35 MPa, joints 0.5 m apart and
// 1 mm open) with six grouted bars; the right bank weathered rock with an
// allowable pressure of 1.2 MPa and a block. Footings bear by the K_sp
// method and the allowable pressure, never by soil N-factors. By hand:
// K_sp = (3 + 0.5/2)/(10 √(1 + 300·0.001/0.5)) = 0.25693 for the 2 m wide
// left footing, q_a = 8.993 MPa.
func TestRockGorgeBridge(t *testing.T) {
	a, err := Check(loadTestdata(t, "rock_gorge.json"), nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaNIn(t, a)
	for _, r := range groundFailures(a) {
		t.Errorf("%s %s %s ratio %.3f", r.ID, r.Element, r.Case, r.Ratio)
	}
	left := governingOf(t, a, "footing.bearing", "left footing")
	near(t, "K_sp footing capacity", left.Capacity, 35e6*3.25/(10*math.Sqrt(1.6)), 1e-12)
	right := governingOf(t, a, "footing.bearing", "right footing")
	near(t, "allowable on rock", right.Capacity, 1.2e6, 1e-12)
	for _, r := range []check.Result{left, right, governingOf(t, a, "anchor.bearing", "right anchor")} {
		if _, ok := r.Value("N_q"); ok || !strings.HasPrefix(r.Basis, "rock:") {
			t.Errorf("%s %s: soil theory on rock, basis %q", r.ID, r.Element, r.Basis)
		}
	}
	cone := governingOf(t, a, "anchor.rock.cone", "left anchor")
	if n, _ := cone.Value("n"); n.Value != 6 {
		t.Errorf("cone of %v bars", n.Value)
	}
	for _, id := range []string{"anchor.rock.thread", "anchor.rock.plate", "anchor.rock.platebearing", "anchor.rod.thread", "anchor.attachment"} {
		found := false
		for _, r := range a.Report.Governing() {
			found = found || r.ID == id
		}
		if !found {
			t.Errorf("no %s in the report", id)
		}
	}
}

// groundFailures returns the failing results of the footing and anchor
// checks (the test bridges' own subject; the superstructure is checked by
// the tests of its packages).
func groundFailures(a *Analysis) []check.Result {
	var out []check.Result
	for _, r := range a.Report.Failures() {
		if strings.HasPrefix(r.ID, "footing.") || strings.HasPrefix(r.ID, "anchor.") {
			out = append(out, r)
		}
	}
	return out
}

// TestDemoOnSoftClay: the demo bridge set on soft clay with c_u 20 kPa
// (the case the first version passed) fails in undrained terms: the footing
// bears about 45 kPa allowed against about 95 kPa acting, and the anchor
// block slides (undrained factor of safety about 1.0 against 1.5; drained,
// φ' 22°, it fails too, as it did before).
func TestDemoOnSoftClay(t *testing.T) {
	b := Demo()
	for _, k := range []*Bank{&b.Banks.Left, &b.Banks.Right} {
		k.Soil = SoilSpec{Preset: "soft clay", Undrained: Given(20 * units.Kilopascal)}
	}
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaNIn(t, a)
	bear := governingOf(t, a, "footing.bearing", "left footing")
	if uu, _ := bear.Value("U_un"); bear.Status != check.Fail || !(uu.Value > 1) || !strings.HasPrefix(bear.Basis, "undrained") {
		t.Errorf("footing on soft clay: %v, U_un %v, basis %q", bear.Status, uu.Value, bear.Basis)
	}
	slide := governingOf(t, a, "anchor.sliding", "left anchor")
	if uu, _ := slide.Value("U_un"); slide.Status != check.Fail || !(uu.Value > 1) {
		t.Errorf("anchor sliding on soft clay: %v, U_un %v", slide.Status, uu.Value)
	}
}

// TestFootingBothDirections: in a wind case a tower footing carries the
// rope forces along the bridge and the wind across it at once, and its
// bearing and sliding are checked under both (EN 1997-1:2004 D.1:
// A' = B'L' from both eccentricities; the resultant horizontal force).
// By hand from the case's own column-base forces: e_y = (M_lat + H_lat·t)/N,
// the sliding force √(H² + H_lat²).
func TestFootingBothDirections(t *testing.T) {
	a, err := Check(Demo(), nil)
	if err != nil {
		t.Fatal(err)
	}
	var svc CaseState
	for _, s := range a.Service {
		if s.Case.Name == "wind with crowd" {
			svc = s
		}
	}
	if svc.Lateral[Left] == 0 {
		t.Fatal("no lateral force on the left tower in the wind case")
	}
	spec := a.Bridge.Banks.Left.Tower.Footing
	bear := find(t, a.Report, "footing.bearing", "left footing", "wind with crowd")
	val := func(r check.Result, s string) float64 { v, _ := r.Value(s); return v.Value }
	n := val(bear, "N")
	near(t, "e_y", val(bear, "e_y"), float64(svc.LateralMoment[Left]+units.MomentOf(svc.Lateral[Left], spec.Thickness))/n, 1e-12)
	near(t, "H_y", val(bear, "H_y"), float64(svc.Lateral[Left]), 1e-12)
	near(t, "A'", val(bear, "A'"), (float64(spec.Length)-2*math.Abs(val(bear, "e")))*(float64(spec.Width)-2*math.Abs(val(bear, "e_y"))), 1e-12)
	slide := find(t, a.Report, "footing.sliding", "left footing", "wind with crowd")
	near(t, "sliding force", slide.Demand, math.Hypot(float64(svc.Tower[Left].Horizontal), float64(svc.Lateral[Left])), 1e-12)
	// The turned footing's bearing is the same check.
	across := find(t, a.Report, "footing.bearing", "left footing, across", "wind with crowd")
	near(t, "turned", across.Ratio, bear.Ratio, 1e-12)
}

// TestAttachmentValues: the rope termination's result names the group it
// was checked on among its values (the soft-clay bridge's walkway ropes,
// four of 28 mm, carry the most per rope).
func TestAttachmentValues(t *testing.T) {
	a, err := Check(loadTestdata(t, "soft_clay.json"), nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, id := range []string{"anchor.attachment", "anchor.loop"} {
		r := governingOf(t, a, id, "left anchor")
		n, _ := r.Value("n_r")
		d, _ := r.Value("d_r")
		if n.Value != 4 || math.Abs(d.Value-0.028) > 1e-12 {
			t.Errorf("%s: n_r %v, d_r %v", id, n.Value, d.Value)
		}
	}
}

// TestFloodedDeadman: where the design flood stands over a deadman's
// ground, its pull-out result says that the soil in front of it must be
// kept from scour (EN 1997-1 6.5.3(7)); in the dry cases it does not.
func TestFloodedDeadman(t *testing.T) {
	b := loadTestdata(t, "river_bank.json")
	b.Banks.Right.Anchor = AnchorSpec{Type: "deadman", Length: 0.8, Width: 8, Height: 1.5, Depth: 2.5}
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	flooded := find(t, a.Report, "anchor.deadman.pullout", "right anchor", "flood with crowd")
	dry := find(t, a.Report, "anchor.deadman.pullout", "right anchor", "wind with crowd")
	has := func(r check.Result) bool { return strings.Contains(strings.Join(r.Notes, " "), "scour") }
	if !has(flooded) || has(dry) {
		t.Errorf("scour note: flooded %v, dry %v", flooded.Notes, dry.Notes)
	}
}

// TestGroundLineSlope checks that the footing and anchor checks read the
// ground's fall from the ground line (site.ground):
//   - a bank falling at 20° from 0.8 m in front of the left footing's edge
//     gives its bearing Hansen's ground factor, the smaller of Hansen's and
//     Vesić's that EN 1997-1 Annex D (which has none) takes:
//     gq = (1 − 0.5 tan 20°)⁵ = 0.366274 (Bowles, Table 4-5, by hand);
//   - the right bank, level, gives none;
//   - the demo's earlier ground line, a 39.3° bank 0.3 m from the footing
//     in dense sand (φ' 36°), fails the footing's bearing outright: a
//     cohesionless bank steeper than φ' carries nothing at its crest, which
//     the check on level ground passed at 0.17.
func TestGroundLineSlope(t *testing.T) {
	b := Demo()
	tan20 := math.Tan(20 * math.Pi / 180)
	b.Site.Ground = []Point{{X: -30, Z: 110.1}, {X: 2, Z: 110.1}, {X: 12, Z: units.Length(110.1 - 10*tan20)},
		{X: 60, Z: 100}, {X: 65, Z: 110.9}, {X: 100, Z: 110.9}}
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	left := find(t, a.Report, "footing.bearing", "left footing", "permanent")
	if v, ok := left.Value("β_g"); !ok || math.Abs(float64(v.Value)-20*math.Pi/180) > 1e-9 {
		t.Errorf("left footing: β_g %v (%v), want 20°", v.Value, ok)
	}
	if v, ok := left.Value("g_q"); !ok || math.Abs(float64(v.Value)-0.366274) > 1e-6 {
		t.Errorf("left footing: g_q %v (%v), want 0.366274", v.Value, ok)
	}
	if !strings.Contains(left.Basis, "steepest fall within 4.800 m of the base's edges 20.0°") {
		t.Errorf("left footing basis: %q", left.Basis)
	}
	right := find(t, a.Report, "footing.bearing", "right footing", "permanent")
	if _, ok := right.Value("β_g"); ok || !strings.Contains(right.Basis, "edges 0.0°") {
		t.Errorf("right footing on level ground: basis %q", right.Basis)
	}

	b.Site.Ground = []Point{{X: -26, Z: 110.8}, {X: -8, Z: 110.6}, {X: 1.5, Z: 110.1}, {X: 12, Z: 101.5},
		{X: 30, Z: 97}, {X: 44, Z: 96.5}, {X: 62, Z: 102}, {X: 70.5, Z: 110.9}, {X: 80, Z: 111.8}, {X: 96, Z: 112.2}}
	a, err = Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	left = find(t, a.Report, "footing.bearing", "left footing", "permanent")
	if left.Status != check.Fail || left.Capacity != 0 || !strings.Contains(strings.Join(left.Notes, " "), "no bearing resistance counted") {
		t.Errorf("footing at the crest of a 39° bank in dense sand: %s, capacity %v, notes %q; want a failure with no bearing counted",
			left.Status, left.Capacity, left.Notes)
	}

	// Without a ground line the ground is taken level, and the basis says so.
	b.Site.Ground = nil
	a, err = Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	if r := find(t, a.Report, "footing.bearing", "left footing", "permanent"); !strings.Contains(r.Basis, "no ground line given") {
		t.Errorf("no ground line: basis %q", r.Basis)
	}
}

// TestFallAt checks the reading of a ground line's fall by hand.
func TestFallAt(t *testing.T) {
	line := []Point{{X: -10, Z: 5}, {X: -4, Z: 8}, {X: 0, Z: 8}, {X: 3, Z: 6}, {X: 20, Z: 0}}
	deg := func(rise, run float64) float64 { return math.Atan2(rise, run) * 180 / math.Pi }
	for _, c := range []struct {
		name          string
		x0, x1, reach float64
		want          float64
		covered       bool
	}{
		// Base −1…1: under it, 0…1 falls at atan(2/3); beyond it 1…3 the
		// same; before it −4…−1 level; −10…−4 is beyond reach 2.
		{"crest under the base", -1, 1, 2, deg(2, 3), true},
		// Base −3…−2, reach 1: before it −4…−3 level; −10…−4 is out of reach.
		{"level plateau", -3, -2, 1, 0, true},
		// Base −3…−2, reach 7: −10…−4 rises toward +x, so it falls toward
		// −x, away from the base: atan(3/6); 0…3 falls toward +x: atan(2/3).
		{"both sides", -3, -2, 7, math.Max(deg(3, 6), deg(2, 3)), true},
		// Base 18…19, reach 4: the line ends at 20, so it is not covered.
		{"past the end", 18, 19, 4, deg(6, 17), false},
	} {
		s := fallAt(line, c.x0, c.x1, c.reach)
		if math.Abs(s.beta.Degrees()-c.want) > 1e-9 || s.covered != c.covered || !s.line {
			t.Errorf("%s: β %.6f° covered %v, want %.6f° %v", c.name, s.beta.Degrees(), s.covered, c.want, c.covered)
		}
	}
	if s := fallAt(nil, 0, 1, 2); s.line || s.beta != 0 {
		t.Errorf("no line: %+v", s)
	}
}

// TestBasePositionsOnGroundLine places a short 30° fall on the ground line
// just inside and just outside each base's reach, on both banks, and
// checks that the footing and the anchor see it only inside: the footing
// centred ColumnOffset from the column (the column 0.5 m toward the span
// from it, bridge.go), reach twice its length from its edges on either
// side; the anchor's attachment Backstay.Horizontal behind the saddle,
// AttachX (default half the length) from its back edge, reach from its
// front edge toward the span.
func TestBasePositionsOnGroundLine(t *testing.T) {
	b := Demo()
	tan30 := math.Tan(30 * math.Pi / 180)
	// fall returns a line level but for a 0.1 m run from x in direction dir
	// that falls at 30° that way.
	fall := func(x, dir float64) []Point {
		z := units.Length(-0.1 * tan30)
		if dir < 0 {
			return []Point{{X: -200, Z: z}, {X: units.Length(x - 0.1), Z: z}, {X: units.Length(x), Z: 0}, {X: 300, Z: 0}}
		}
		return []Point{{X: -200, Z: 0}, {X: units.Length(x), Z: 0}, {X: units.Length(x + 0.1), Z: z}, {X: 300, Z: z}}
	}
	for _, s := range []Side{Left, Right} {
		// Toward the span: +x from the left bank, −x from the right.
		g := bankGround{bank: b.bankOf(s), dir: 1, soil: foundation.Soil{Friction: units.FromDegrees(30)}}
		x0 := 0.0
		if s == Right {
			g.xs, g.dir, x0 = float64(b.Site.Span), -1, float64(b.Site.Span)
		}
		toSpan := g.dir
		ft := g.bank.Tower.Footing
		ft.ColumnOffset = 0.5
		centre := x0 - toSpan*0.5
		half, reach := float64(ft.Length)/2, 2*float64(ft.Length)
		a := g.bank.Anchor
		front := x0 - toSpan*float64(g.bank.Backstay.Horizontal) + toSpan*float64(a.Length)/2
		areach := 2 * math.Max(float64(a.Length), float64(a.Depth))
		for _, c := range []struct {
			name string
			x    float64 // where the fall starts
			dir  float64
			seen func() units.Angle
		}{
			{"footing, toward the span", centre + toSpan*(half+reach), toSpan, func() units.Angle { return g.footingSlope(ft).beta }},
			{"footing, behind it", centre - toSpan*(half+reach), -toSpan, func() units.Angle { return g.footingSlope(ft).beta }},
			{"anchor, in front", front + toSpan*areach, toSpan, func() units.Angle { return g.anchorSlope(a).beta }},
		} {
			g.line = fall(c.x-c.dir*0.05, c.dir)
			if got := c.seen().Degrees(); math.Abs(got-30) > 1e-9 {
				t.Errorf("%v %s: a fall starting 0.05 m inside the reach seen at %.3f°, want 30°", s, c.name, got)
			}
			g.line = fall(c.x+c.dir*0.05, c.dir)
			if got := c.seen().Degrees(); got != 0 {
				t.Errorf("%v %s: a fall starting 0.05 m beyond the reach seen at %.3f°, want 0°", s, c.name, got)
			}
		}
	}
}

// TestAnchorReachCoversPassiveWedge: a deadman's passive wedge on level
// ground reaches Depth·tan(45° + φ'/2) in front of it (Rankine's passive
// plane at 45° − φ'/2 to the horizontal: Das, Principles of Foundation
// Engineering, ch. 7, in package foundation's references [M]), beyond
// 2·Depth once φ' > 36.9°: in φ' 45° (2.414·Depth) a fall starting
// 2.2·Depth in front cuts the wedge and must be seen.
func TestAnchorReachCoversPassiveWedge(t *testing.T) {
	b := Demo()
	g := bankGround{bank: b.bankOf(Left), dir: 1, soil: foundation.Soil{Friction: units.FromDegrees(45)}}
	a := AnchorSpec{Type: "deadman", Length: 0.3, Width: 3, Height: 0.8, Depth: 2}
	front := -float64(g.bank.Backstay.Horizontal) + float64(a.Length)/2
	x := front + 2.2*float64(a.Depth)
	g.line = []Point{{X: -200, Z: 0}, {X: units.Length(x), Z: 0}, {X: units.Length(x + 1), Z: -0.5}, {X: 300, Z: -0.5}}
	want := math.Atan(0.5) * 180 / math.Pi
	if got := g.anchorSlope(a).beta.Degrees(); math.Abs(got-want) > 1e-9 {
		t.Errorf("fall 2.2·Depth in front of a deadman in φ' 45°: seen at %.3f°, want %.3f°", got, want)
	}
}

// TestBaseSlopeWords: each result's basis says what the ground's fall did
// to it — nothing to a footing's sliding (it counts no passive
// resistance), nothing to bearing on rock (but a check by hand), the
// passive coefficient of a block or deadman, none undrained or at φ' —
// and that a fall across the bridge is not known to the check.
func TestBaseSlopeWords(t *testing.T) {
	s := baseSlope{beta: units.FromDegrees(20), reach: 4.8, line: true, covered: true}
	rock := s
	rock.rock = true
	for _, c := range []struct {
		slope    baseSlope
		id, want string
		not      string
	}{
		{s, "footing.sliding", "not used", "Coulomb"},
		{s, "footing.bearing", "ground-inclination factors", "not used"},
		{rock, "anchor.sliding", "Coulomb", "bearing pressure"},
		{rock, "footing.bearing", "on rock the bearing pressure is not reduced", "ground-inclination"},
		{s, "anchor.deadman.pullout", "undrained, a plane wedge in total stress", "bearing"},
		{s, "anchor.bearing", "across the bridge", ""},
	} {
		got := c.slope.text(c.id)
		if !strings.Contains(got, c.want) || (c.not != "" && strings.Contains(got, c.not)) {
			t.Errorf("%s (rock %v): %q; want %q and not %q", c.id, c.slope.rock, got, c.want, c.not)
		}
	}
}

// TestRiseBehind checks the reading of the ground rising behind an anchor
// (away from the span) by hand: a bank rising 4 m in 12 m, atan(1/3) =
// 18.435°, behind either bank's anchor within reach, and nothing out of
// reach.
func TestRiseBehind(t *testing.T) {
	want := math.Atan(1.0/3) * 180 / math.Pi
	left := []Point{{X: -20, Z: 12}, {X: -8, Z: 8}, {X: 0, Z: 8}}
	right := []Point{{X: 0, Z: 8}, {X: 8, Z: 8}, {X: 20, Z: 12}}
	for _, c := range []struct {
		name             string
		line             []Point
		back, dir, reach float64
		want             float64
	}{
		{"left bank, in reach", left, -6, 1, 3, want},
		{"left bank, out of reach", left, -3, 1, 3, 0},
		{"right bank, in reach", right, 6, -1, 3, want},
		{"right bank, out of reach", right, 3, -1, 3, 0},
		{"right bank reading a left bank's line", left, -6, -1, 3, 0},
	} {
		if got := riseBehind(c.line, c.back, c.dir, c.reach).Degrees(); math.Abs(got-c.want) > 1e-9 {
			t.Errorf("%s: %.6f°, want %.6f°", c.name, got, c.want)
		}
	}
}

// TestGroundLevelFlag: a tower height transposed (4.2 m for 2.4 m) moves
// the left footing's ground 1.8 m below the ground line, which the report
// flags (site.ground_level, 0.5 m our judgement); the demo's own levels
// agree with its line within 40 mm at every base.
func TestGroundLevelFlag(t *testing.T) {
	b := Demo()
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	for _, el := range []string{"left footing", "left anchor", "right footing", "right anchor"} {
		if r := find(t, a.Report, "site.ground_level", el, grooveCase); r.Status != check.Info || r.Demand > 0.04 {
			t.Errorf("demo %s: %s, %.3f m apart", el, r.Status, r.Demand)
		}
	}
	b.Banks.Left.Tower.Height = 4.2 // the saddle where it was: the footing 1.8 m lower
	a, err = Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	r := find(t, a.Report, "site.ground_level", "left footing", grooveCase)
	if r.Status != check.Flag || math.Abs(r.Demand-1.8-0.03) > 1e-9 {
		t.Errorf("transposed tower height: %s, %.4f m apart; want a flag at 1.83 m", r.Status, r.Demand)
	}
}

// TestHansenChosen: a bank may choose Hansen's bearing method. On the
// hillside bridge's left anchor block (dense sand, a strongly inclined
// pull) Hansen's inclination factors give less capacity than EN 1997-1
// Annex D's, so the block's bearing utilisation rises with it (the hand
// review found 3516 against 4226 kPa, Bowles' Hansen by hand).
func TestHansenChosen(t *testing.T) {
	b := loadTestdata(t, "hillside_tube.json")
	util := func(b Bridge) check.Result {
		t.Helper()
		a, err := Check(b, &Options{SkipComfort: true})
		if err != nil {
			t.Fatal(err)
		}
		return governingOf(t, a, "anchor.bearing", "left anchor")
	}
	annexD := util(b)
	b.Banks.Left.Soil.BearingMethod = "Hansen"
	hansen := util(b)
	if !(hansen.Ratio > annexD.Ratio) || !strings.Contains(strings.Join(hansen.Notes, " "), "Hansen") {
		t.Errorf("Hansen: %.4f (notes %q), Annex D %.4f", hansen.Ratio, hansen.Notes, annexD.Ratio)
	}
	b.Banks.Left.Soil.BearingMethod = "Hanson"
	if err := b.Validate(); err == nil || !strings.Contains(err.Error(), `"Hansen"`) {
		t.Errorf("a method misspelt: %v", err)
	}
}
