package tower_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// value returns the value of r under symbol, failing the test without it.
func value(t *testing.T, r check.Result, symbol string) float64 {
	t.Helper()
	v, ok := r.Value(symbol)
	if !ok {
		t.Fatalf("%s carries no value %q (values %v)", r.ID, symbol, r.Values)
	}
	return v.Value
}

// TestEccentricityRopeLineByHand checks the rope-line form (the form
// practice uses) against a hand calculation, and the statics form beside it.
//
// Column 0.9 m deep, 1.0 m wide, 3.5 m high with 0.15 m facing: effective
// depth 0.9 − 2·0.15 = 0.6 m, kern 0.6/6 = 0.100 m (middle-third rule,
// common practice). One saddle at 3.2 m carries V = 150 kN, H = 4 kN. The
// checked section is 0.5 m above the column base (where the column is
// tied into its base):
//
//	h = 3.2 − 0.5 = 2.7 m,  tan δ = H/V = 4/150
//	e = h tan δ = 2.7 · 4/150 = 0.072 m              (ratio 0.72 to the kern)
//
// Statics form: weight of the column above the section
// W = 24 kN/m³ · 0.9 · 1.0 · (3.5 − 0.5) = 64.8 kN, so
//
//	e_s = H h/(V + W) = 4 · 2.7/(150 + 64.8) = 10.8/214.8 = 0.050279 m
//
// The column weight pulls the line back toward the axis: e_s < e.
func TestEccentricityRopeLineByHand(t *testing.T) {
	col := tower.Column{Depth: 0.9, Width: 1.0, Height: 3.5, Facing: 0.15}
	r, err := tower.Combine([]tower.LevelForce{{Height: 3.2, Vertical: kN(150), Horizontal: kN(4)}}, col.Weight())
	if err != nil {
		t.Fatal(err)
	}
	const e, es = 0.072, 10.8 / 214.8
	for _, tc := range []struct {
		form tower.EccentricityForm
		want float64
	}{{tower.RopeLine, e}, {tower.Statics, es}} {
		res, err := tower.EccentricityCheck(r, col, &tower.Eccentricity{Form: tc.form, Section: 0.5})
		if err != nil {
			t.Fatal(err)
		}
		if res.ID != "tower.eccentricity" || res.Kind != units.KindLength {
			t.Errorf("header %+v", res)
		}
		if !near(res.Demand, tc.want, 1e-12) || !near(res.Capacity, 0.1, 1e-12) || !near(res.Ratio, tc.want/0.1, 1e-12) {
			t.Errorf("%v: demand %g capacity %g, want %g against 0.1", tc.form, res.Demand, res.Capacity, tc.want)
		}
		// Both forms are always reported, whichever is checked.
		for sym, want := range map[string]float64{"e": e, "e_s": es, "h": 2.7, "y_c": 0.5, "W": 64.8e3,
			"ΣV": 150e3, "ΣH": 4e3, "δ": math.Atan(4.0 / 150), "R": math.Hypot(4e3, 150e3), "e_lim": 0.1, "d_eff": 0.6} {
			if got := value(t, res, sym); !near(got, want, 1e-12) {
				t.Errorf("%v: value %s = %g, want %g", tc.form, sym, got, want)
			}
		}
		if !strings.Contains(res.Basis, "500.0 mm above the column base") {
			t.Errorf("basis %q does not name the checked section", res.Basis)
		}
	}
}

// TestEccentricityFormsAgreeWithoutWeight: with the column weight gone
// (a unit weight of 1e-9 N/m³), the statics form equals the rope-line
// form, on one level and on two.
func TestEccentricityFormsAgreeWithoutWeight(t *testing.T) {
	col := tower.Column{Depth: 0.8, Width: 0.8, Height: 5, UnitWeight: 1e-9}
	for _, levels := range [][]tower.LevelForce{
		{{Height: 3, Vertical: kN(90), Horizontal: kN(-6)}},
		{{Height: 3.0, Vertical: kN(180), Horizontal: kN(12)}, {Height: 4.1, Offset: 0.1, Vertical: kN(40), Horizontal: kN(-5)}},
	} {
		r, _ := tower.Combine(levels, col.Weight())
		for _, yc := range []units.Length{0, 1.2} {
			a, err1 := tower.EccentricityCheck(r, col, &tower.Eccentricity{Section: yc})
			b, err2 := tower.EccentricityCheck(r, col, &tower.Eccentricity{Section: yc, Form: tower.Statics})
			if err1 != nil || err2 != nil {
				t.Fatal(err1, err2)
			}
			if !near(a.Demand, b.Demand, 1e-12) || !near(value(t, a, "e"), value(t, a, "e_s"), 1e-12) {
				t.Errorf("y_c %v: rope line %g, statics %g", yc, a.Demand, b.Demand)
			}
		}
	}
}

// TestEccentricityTwoLevelsGraphically checks the rope-force line of two
// saddle levels at the checked section by graphical statics, a different
// route from the moment sum: the resultant of two forces passes through
// the intersection of their lines of action.
//
// Walkway saddle at 3.0 m on the axis: V 180 kN, H 12 kN; handrail saddle
// at 4.1 m, 0.1 m toward the span: V 40 kN, H −5 kN. Checked section 0.4 m.
// By moments: M = 12·3.0 − 5·4.1 + 40·0.1 = 19.5 kN·m, ΣH = 7, ΣV = 220,
// e = (19.5 − 7·0.4)/220 = 16.7/220 = 0.0759091 m.
func TestEccentricityTwoLevelsGraphically(t *testing.T) {
	levels := []tower.LevelForce{
		{Height: 3.0, Vertical: kN(180), Horizontal: kN(12)},
		{Height: 4.1, Offset: 0.1, Vertical: kN(40), Horizontal: kN(-5)},
	}
	// Line i: x = o_i + (y_i − y) H_i/V_i. Intersection of the two lines.
	line := func(l tower.LevelForce, y float64) float64 {
		return float64(l.Offset) + (float64(l.Height)-y)*float64(l.Horizontal)/float64(l.Vertical)
	}
	// x1(y) = x2(y) is linear in y: solve from two points.
	d0 := line(levels[0], 0) - line(levels[1], 0)
	d1 := line(levels[0], 1) - line(levels[1], 1)
	yi := -d0 / (d1 - d0)
	xi := line(levels[0], yi)
	const yc = 0.4
	graphical := xi + (yi-yc)*7.0/220
	if !near(graphical, 16.7/220, 1e-12) {
		t.Fatalf("graphical statics %g disagrees with the moment sum %g", graphical, 16.7/220)
	}
	col := tower.Column{Depth: 1.2, Width: 1, Height: 4.5}
	r, _ := tower.Combine(levels, col.Weight())
	res, err := tower.EccentricityCheck(r, col, &tower.Eccentricity{Section: yc})
	if err != nil {
		t.Fatal(err)
	}
	if !near(res.Demand, graphical, 1e-12) || !near(value(t, res, "h")*math.Tan(value(t, res, "δ")), graphical, 1e-12) {
		t.Errorf("e %g, h·tan δ %g, want %g", res.Demand, value(t, res, "h")*math.Tan(value(t, res, "δ")), graphical)
	}
}

// TestEccentricityAcross checks across the bridge: the lateral forces of
// two swung rope groups and wind on the column face, against the effective
// width b_eff/6.
//
// Levels: 2.4 m lateral 6 kN, 3.5 m lateral 1.5 kN, wind on the column
// 2.0 kN at 1.4 m (it adds no vertical force); ΣV = 300 kN; base section:
// M_L = 6·2.4 + 1.5·3.5 + 2·1.4 = 14.4 + 5.25 + 2.8 = 22.45 kN·m,
// e = 22.45/300 = 0.0748333 m; b_eff = 1.0 − 2·0.05 = 0.9 m, kern 0.15 m.
func TestEccentricityAcross(t *testing.T) {
	col := tower.Column{Depth: 0.8, Width: 1.0, Height: 2.8, Facing: 0.05}
	levels := []tower.LevelForce{
		{Height: 2.4, Vertical: kN(250), Lateral: kN(6)},
		{Height: 3.5, Vertical: kN(50), Lateral: kN(1.5)},
		{Height: 1.4, Lateral: kN(2)},
	}
	r, _ := tower.Combine(levels, col.Weight())
	if r.Lowest != 2.4 {
		t.Errorf("lowest saddle %v, want 2.4 m (wind on the column is not a saddle)", r.Lowest)
	}
	res, err := tower.EccentricityCheck(r, col, &tower.Eccentricity{Direction: tower.Across})
	if err != nil {
		t.Fatal(err)
	}
	if !near(res.Demand, 22.45/300, 1e-12) || !near(res.Capacity, 0.15, 1e-12) || !near(value(t, res, "b_eff"), 0.9, 1e-12) {
		t.Errorf("across: e %g against %g", res.Demand, res.Capacity)
	}
	if !strings.Contains(strings.Join(res.Notes, " "), "downwind") {
		t.Errorf("notes %q lack the side", res.Notes)
	}
	// No lateral force: nothing to check, said in words.
	r0, _ := tower.Combine(levels[:2:2][:1], col.Weight())
	r0.Lateral, r0.LateralMoment = 0, 0
	res, _ = tower.EccentricityCheck(r0, col, &tower.Eccentricity{Direction: tower.Across})
	if res.Demand != 0 || res.Status != check.Pass || !strings.Contains(strings.Join(res.Notes, " "), "no lateral force") {
		t.Errorf("no lateral force: %v %q", res, res.Notes)
	}
}

// TestEccentricityTravel: a roller saddle passes no horizontal force, but
// its travel puts the rope forces off the axis: e equals the travel, not 0.
func TestEccentricityTravel(t *testing.T) {
	col := tower.Column{Depth: 0.8, Width: 0.8, Height: 2.6}
	s := tower.Saddle{Kind: tower.Roller, Height: 2.4, Offset: 0.031}
	lf, err := s.Force(tower.RopePull{Tension: kN(300), Angle: deg(11)}, tower.RopePull{Tension: kN(310), Angle: deg(13)})
	if err != nil {
		t.Fatal(err)
	}
	r, _ := tower.Combine([]tower.LevelForce{lf}, col.Weight())
	res, err := tower.EccentricityCheck(r, col, nil)
	if err != nil {
		t.Fatal(err)
	}
	if !near(res.Demand, 0.031, 1e-12) || !strings.Contains(strings.Join(res.Notes, " "), "off the column axis") {
		t.Errorf("roller travelled 31 mm: e %g, notes %q", res.Demand, res.Notes)
	}
}

func TestEccentricityLimits(t *testing.T) {
	col := tower.Column{Depth: 0.9, Width: 1.0, Height: 3.5, Facing: 0.15}
	r, _ := tower.Combine([]tower.LevelForce{{Height: 3.2, Vertical: kN(150), Horizontal: kN(4)}}, 0)
	for _, tc := range []struct {
		name  string
		limit *tower.EccentricityLimit
		allow float64
		rule  string
	}{
		{"kern", nil, 0.1, "kern"},
		{"kern by zero fraction", &tower.EccentricityLimit{}, 0.1, "kern"},
		{"within the section", &tower.EccentricityLimit{Fraction: 1}, 0.3, "within the effective section"},
		{"within the section and a projecting base", &tower.EccentricityLimit{Fraction: 1, Offset: 0.1}, 0.4, "projecting base"},
		{"user fraction", &tower.EccentricityLimit{Fraction: 0.5, Offset: 0.1}, 0.5*0.3 + 0.1, "user limit"},
	} {
		res, err := tower.EccentricityCheck(r, col, &tower.Eccentricity{Limit: tc.limit})
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		if !near(res.Capacity, tc.allow, 1e-12) || !strings.Contains(res.Basis, tc.rule) {
			t.Errorf("%s: capacity %g, basis %q", tc.name, res.Capacity, res.Basis)
		}
	}
	// The kern is where the edge stress N/A − M/W reaches zero
	// (σ = N/(bd) · (1 − 6e/d), elementary bending theory).
	res, _ := tower.EccentricityCheck(r, col, nil)
	if edge := 1 - 6*res.Capacity/float64(col.EffectiveDepth()); math.Abs(edge) > 1e-12 {
		t.Errorf("kern edge stress factor %g", edge)
	}
}

func TestEccentricityMirrorAndZero(t *testing.T) {
	col := tower.Column{Depth: 0.8, Width: 0.8, Height: 3}
	for _, h := range []float64{0, 6, -6, 40} {
		ra, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(h)}}, 0)
		rb, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(-h)}}, 0)
		a, err1 := tower.EccentricityCheck(ra, col, nil)
		b, err2 := tower.EccentricityCheck(rb, col, nil)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if !near(a.Ratio, b.Ratio, 1e-12) || a.Status != b.Status {
			t.Errorf("H %g: mirror ratios %g %g", h, a.Ratio, b.Ratio)
		}
		if h == 0 && (a.Demand != 0 || a.Status != check.Pass || !strings.Contains(strings.Join(a.Notes, " "), "e = 0")) {
			t.Errorf("zero unbalanced force gives e %g, notes %q", a.Demand, a.Notes)
		}
		// Utilisation scales linearly with the horizontal force at fixed V.
		if h == 6 {
			r2, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(2 * h)}}, 0)
			c2, _ := tower.EccentricityCheck(r2, col, nil)
			if !near(c2.Ratio, 2*a.Ratio, 1e-12) {
				t.Errorf("not linear: %g vs %g", c2.Ratio, a.Ratio)
			}
		}
	}
}

func TestEccentricityErrors(t *testing.T) {
	r, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(5)}}, 0)
	good := tower.Column{Depth: 0.8, Width: 0.8, Height: 3.2}
	tests := []struct {
		name     string
		r        tower.Resultant
		c        tower.Column
		o        *tower.Eccentricity
		sentinel error
		field    string
	}{
		{"zero depth", r, tower.Column{Width: 1, Height: 3}, nil, tower.ErrInvalid, "Column.Depth"},
		{"facing eats section", r, tower.Column{Depth: 0.8, Width: 0.8, Height: 3, Facing: 0.4}, nil, tower.ErrInvalid, "Column.Facing"},
		{"fraction above 1", r, good, &tower.Eccentricity{Limit: &tower.EccentricityLimit{Fraction: 1.5}}, tower.ErrInvalid, "Fraction"},
		{"negative limit", r, good, &tower.Eccentricity{Limit: &tower.EccentricityLimit{Fraction: 0.2, Offset: -1}}, tower.ErrInvalid, "EccentricityLimit"},
		{"section above the saddle", r, good, &tower.Eccentricity{Section: 3.1}, tower.ErrInvalid, "Eccentricity.Section"},
		{"section at the saddle", r, good, &tower.Eccentricity{Section: 3}, tower.ErrInvalid, "Eccentricity.Section"},
		{"negative section", r, good, &tower.Eccentricity{Section: -0.2}, tower.ErrInvalid, "Eccentricity.Section"},
		{"NaN section", r, good, &tower.Eccentricity{Section: units.Length(math.NaN())}, tower.ErrInvalid, "Eccentricity.Section"},
		{"bad form", r, good, &tower.Eccentricity{Form: 5}, tower.ErrInvalid, "Eccentricity.Form"},
		{"NaN resultant", tower.Resultant{Vertical: units.Force(math.NaN())}, good, nil, tower.ErrInvalid, "Resultant.Vertical"},
		{"uplift", tower.Resultant{Vertical: kN(-500)}, good, nil, tower.ErrLiftOff, "do not press down"},
	}
	for _, tc := range tests {
		_, err := tower.EccentricityCheck(tc.r, tc.c, tc.o)
		if !errors.Is(err, tc.sentinel) || !strings.Contains(err.Error(), tc.field) || !strings.HasPrefix(err.Error(), "tower: ") {
			t.Errorf("%s: got %v, want %v naming %s", tc.name, err, tc.sentinel, tc.field)
		}
	}
}

// TestEccentricityBothKernRhombus: the resultant inside both one-direction
// kerns can still leave the kern of the rectangle, a rhombus. On a
// 0.9 × 1.5 m section under N at e_d = 0.1 m (kern 0.15 m) and e_b = 0.15 m
// (kern 0.25 m) each check passes (0.667, 0.6) but the corner stress by
// σ = N/A − N e_d/(b d²/6) − N e_b/(d b²/6) (elementary bending theory,
// common practice) is tensile: u = 1.267 fails. The utilisation is 1
// exactly where the corner stress is zero.
func TestEccentricityBothKernRhombus(t *testing.T) {
	const d, b, n = 0.9, 1.5, 400e3
	corner := func(ed, eb float64) float64 { return n/(b*d) - n*ed/(b*d*d/6) - n*eb/(d*b*b/6) }
	r, err := tower.EccentricityBoth(0.1, d/6, -0.15, b/6)
	if err != nil {
		t.Fatal(err)
	}
	if r.Status != check.Fail || !near(r.Demand, 0.1/0.15+0.15/0.25, 1e-12) || !(corner(0.1, 0.15) < 0) {
		t.Errorf("inside both kerns, outside the rhombus: %v (corner stress %g)", r, corner(0.1, 0.15))
	}
	// On the rhombus' edge the corner stress vanishes and u = 1.
	ed := 0.06
	eb := (1 - ed/(d/6)) * b / 6
	r, _ = tower.EccentricityBoth(units.Length(ed), d/6, units.Length(eb), b/6)
	if !near(r.Demand, 1, 1e-12) || math.Abs(corner(ed, eb)) > 1e-9*n {
		t.Errorf("on the edge: u %g, corner stress %g", r.Demand, corner(ed, eb))
	}
	for _, bad := range [][4]float64{{math.NaN(), 0.1, 0, 0.1}, {0, 0, 0, 0.1}, {0, 0.1, math.Inf(1), 0.1}, {0, 0.1, 0, -1}} {
		if _, err := tower.EccentricityBoth(units.Length(bad[0]), units.Length(bad[1]), units.Length(bad[2]), units.Length(bad[3])); !errors.Is(err, tower.ErrInvalid) {
			t.Errorf("%v: %v", bad, err)
		}
	}
}
