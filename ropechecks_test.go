package sagspan

import (
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// TestGrooveFlagCarriesItsNumbers: a saddle whose groove diameter the
// description leaves out gets a flag asking for it, with the least groove
// the rope needs, (D/d)_min · d = 25 × 26 mm = 650 mm on testdata/level.json
// (the least D/d of 25 for six-strand ropes, common practice, from
// memory), and the numbers that make it among its values: d and (D/d)_min.
// With the groove given (700 mm), the check compares it: ratio 650/700.
func TestGrooveFlagCarriesItsNumbers(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	r := find(t, a.Report, "cable.saddle_ratio", "left saddle, walkway ropes", grooveCase)
	if r.Status != check.Flag {
		t.Errorf("status %v, want a flag", r.Status)
	}
	near(t, "least groove", r.Demand, 25*0.026, 1e-12)
	for sym, want := range map[string]float64{"d": 0.026, "(D/d)_min": 25, "D_min": 0.65} {
		v, ok := r.Value(sym)
		if !ok {
			t.Errorf("value %s missing", sym)
			continue
		}
		near(t, sym, v.Value, want, 1e-12)
	}
	b.Banks.Left.Tower.Saddle.GrooveDiameter = 0.7
	a, err = Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	r = find(t, a.Report, "cable.saddle_ratio", "left saddle, walkway ropes", grooveCase)
	near(t, "D/d utilisation", r.Ratio, 0.65/0.7, 1e-12)
}

// TestClearanceWithoutFloodCarriesItsNumbers: with no design flood the
// clearance is a record of the lowest walkway underside, its elevation and
// where it lies among the values (not only in a note): on
// testdata/level.json under the permanent load, 100 − 2.5 − 0.3 = 97.2 m at
// midspan (a level span sags lowest at its middle).
func TestClearanceWithoutFloodCarriesItsNumbers(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	b.Site.Flood = Level{None: true}
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	r := find(t, a.Report, "bridge.clearance", "walkway", casePermanent)
	for sym, want := range map[string]float64{"z_w": 97.2, "x_w": 25} {
		v, ok := r.Value(sym)
		if !ok {
			t.Errorf("value %s missing", sym)
			continue
		}
		near(t, sym, v.Value, want, 1e-9)
	}
}

// TestTerminationDefaultIsGrips: with no termination given, the ropes are
// checked with the efficiency of wire rope grips, k_e 0.80 (the least of
// the usual terminations: EN 13411-5 grips, from memory), and "grips", the
// name the anchor attachments use, is accepted for basis.termination as
// well as "clips". testdata/level.json: four 26 mm ropes, MBF 0.356·26²·1770
// N (rope makers' factor, package cable's References), factor 3.
func TestTerminationDefaultIsGrips(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	mbf := 0.356 * 26 * 26 * 1770
	for _, term := range []string{"", "grips", "clips"} {
		b.Basis.Termination = term
		a, err := Check(b, &Options{SkipComfort: true})
		if err != nil {
			t.Fatalf("termination %q: %v", term, err)
		}
		r := find(t, a.Report, "cable.tension", "walkway ropes", casePermanent)
		near(t, "rope capacity, termination "+term, r.Capacity, 0.8*mbf/3, 1e-9)
	}
}

// TestGradeFlag: a catalogue rope with a grade none of the usual ones
// (1570, 1770, 1960, 2160 MPa: EN 12385-4, from memory) is flagged, as a
// mistyped 1970 for 1770 would give the rope 11 % more strength; the
// demo's grades raise no flag.
func TestGradeFlag(t *testing.T) {
	b := Demo()
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range a.Report.Results {
		if r.ID == "cable.grade" {
			t.Errorf("demo: %s", r)
		}
	}
	b.Ropes = append([]RopeGroup(nil), b.Ropes...)
	b.Ropes[0].Rope.Grade = 1970 * units.Megapascal
	a, err = Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	r := find(t, a.Report, "cable.grade", b.Ropes[0].Name, grooveCase)
	if r.Status != check.Flag || !strings.Contains(strings.Join(r.Notes, " "), "none of the usual grades") {
		t.Errorf("grade 1970 MPa: %s", r)
	}
}
