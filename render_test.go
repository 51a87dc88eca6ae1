package sagspan

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

var update = flag.Bool("update", false, "rewrite golden files")

func golden(t *testing.T, name string, got []byte) {
	t.Helper()
	path := filepath.Join("testdata", name)
	if *update {
		if err := os.WriteFile(path, got, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test . -update to create it)", err)
	}
	if !bytes.Equal(got, want) {
		t.Errorf("%s differs from the golden file; run go test . -update and read the diff", name)
	}
}

func TestRenderDemo(t *testing.T) {
	a, err := Check(Demo(), nil)
	if err != nil {
		t.Fatal(err)
	}
	var text, md, js, svg bytes.Buffer
	if err := a.WriteText(&text, nil); err != nil {
		t.Fatal(err)
	}
	if err := a.WriteMarkdown(&md, &check.RenderOptions{All: true}); err != nil {
		t.Fatal(err)
	}
	if err := a.WriteJSON(&js); err != nil {
		t.Fatal(err)
	}
	golden(t, "demo_report.txt", text.Bytes())
	golden(t, "demo_report.md", md.Bytes())
	golden(t, "demo_report.json", js.Bytes())
	for _, out := range []string{text.String(), md.String(), js.String()} {
		if !strings.Contains(out, "never replace") {
			t.Error("a rendering lacks the safety caution")
		}
	}
	var back struct {
		Caution string `json:"caution"`
		Report  struct {
			Status    check.Status      `json:"status"`
			Governing []json.RawMessage `json:"governing"`
		} `json:"report"`
		Cases []struct {
			Name string `json:"name"`
		} `json:"cases"`
	}
	if err := json.Unmarshal(js.Bytes(), &back); err != nil {
		t.Fatal(err)
	}
	if back.Report.Status != a.Report.Status() || len(back.Cases) != len(a.Service) || len(back.Report.Governing) == 0 {
		t.Errorf("JSON does not carry the analysis: %+v", back.Report.Status)
	}
	// A program reads a check's terms by symbol, without parsing notes.
	type value struct {
		Symbol string   `json:"symbol"`
		Value  *float64 `json:"value"`
		Unit   string   `json:"unit"`
	}
	var gov []struct {
		ID     string  `json:"id"`
		Values []value `json:"values"`
	}
	for _, raw := range back.Report.Governing {
		gov = append(gov, struct {
			ID     string  `json:"id"`
			Values []value `json:"values"`
		}{})
		if err := json.Unmarshal(raw, &gov[len(gov)-1]); err != nil {
			t.Fatal(err)
		}
	}
	clearance := false
	for _, r := range gov {
		if r.ID != "bridge.clearance" {
			continue
		}
		for _, v := range r.Values {
			if v.Symbol == "c" && v.Value != nil && v.Unit == "m" && *v.Value > 0 {
				clearance = true
			}
		}
	}
	if !clearance {
		t.Error("the JSON report does not carry the clearance as a structured value")
	}
	if err := a.WriteSVG(&svg); err != nil {
		t.Fatal(err)
	}
	if !bytes.HasPrefix(bytes.TrimSpace(svg.Bytes()), []byte("<?xml")) || !bytes.Contains(svg.Bytes(), []byte("<svg")) {
		t.Error("the drawing is not SVG")
	}
}

var sinkAnalysis *Analysis

// BenchmarkCheckDemo measures the full check of the demo bridge, without
// rendering.
func BenchmarkCheckDemo(b *testing.B) {
	br := Demo()
	b.ReportAllocs()
	for b.Loop() {
		a, err := Check(br, nil)
		if err != nil {
			b.Fatal(err)
		}
		sinkAnalysis = a
	}
}

// designBasisText renders only the design-basis section of b's report.
func designBasisText(t *testing.T, b Bridge) string {
	t.Helper()
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	var buf bytes.Buffer
	if err := check.WriteSection(&buf, check.Text, a.designBasisSection(), 2); err != nil {
		t.Fatal(err)
	}
	return buf.String()
}

// TestDesignBasis checks the design basis of the demo report against its
// golden file, and that it follows the description: the inputs as the
// demo's JSON gives them, and a changed input changed in it, with the loads
// derived from it.
func TestDesignBasis(t *testing.T) {
	got := designBasisText(t, Demo())
	golden(t, "demo_design_basis.txt", []byte(got))
	for _, want := range []string{
		"site.span                   72.00 m", "climate.coldest        -10.00 °C", "rope.diameter           32.00 mm",
		`walkway.parts[1]        name "timber deck planks", load 450.0 N/m`,
		"crowd pressure, crowd on the full span", "3.176 kPa", // 2.0 + 120/(72 + 30), EN 1991-2 cl. 5.3.2.1(2)
		"peak wind pressure q_p", "756.2 Pa", // 2.5 × ½ × 1.25 × 22², EN 1991-1-4 cl. 4.5
		"walkway dead load g_w, without the ropes", "1.000 kN/m", // 0.30 + 0.45 + 0.25
		"left bank, dense sand: friction", "SHA-256 " + Demo().Digest(),
	} {
		if !strings.Contains(got, want) {
			t.Errorf("the design basis lacks %q", want)
		}
	}
	b := Demo()
	b.Site.Span = 60 * units.Metre
	b.Ropes = append([]RopeGroup(nil), b.Ropes...)
	b.Ropes[0].Sag, b.Ropes[1].Sag = 3*units.Metre, 3*units.Metre
	changed := designBasisText(t, b)
	for _, want := range []string{
		"site.span                   60.00 m",
		"3.333 kPa", // 2.0 + 120/(60 + 30)
		"SHA-256 " + b.Digest(),
	} {
		if !strings.Contains(changed, want) {
			t.Errorf("after changing the span, the design basis lacks %q", want)
		}
	}
	if strings.Contains(changed, "72.00 m") || b.Digest() == Demo().Digest() {
		t.Error("the design basis still shows the old span, or the digest did not change")
	}
}

// TestOneUnitPerCheck requires every check of every element to report in
// one kind of quantity across its load cases, so that a table's column
// never switches between kN and kN·m down one check.
func TestOneUnitPerCheck(t *testing.T) {
	level, err := LoadFile("testdata/level.json")
	if err != nil {
		t.Fatal(err)
	}
	for _, b := range []Bridge{Demo(), level} {
		a, err := Check(b, nil)
		if err != nil {
			t.Fatal(err)
		}
		kinds := map[string]units.Kind{}
		for _, r := range a.Report.Results {
			key := r.ID + ", " + r.Element
			if k, ok := kinds[key]; ok && k != r.Kind {
				t.Errorf("%s: %s in one case, %s in %q", key, k, r.Kind, r.Case)
			}
			kinds[key] = r.Kind
		}
	}
}

// TestNotChecked: every report says what it does not check, beside the
// verdict, following the description's own choices (common practice for
// the scope of a design check).
func TestNotChecked(t *testing.T) {
	b := Demo()
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	has := func(list []string, s string) bool {
		for _, x := range list {
			if strings.Contains(x, s) {
				return true
			}
		}
		return false
	}
	base := a.NotChecked()
	for _, s := range []string{"walkway's own members", "structural design of the footings", "terminations' hardware",
		"Fatigue", "earthquake", "take the ground line's fall"} {
		if !has(base, s) {
			t.Errorf("demo: %q missing from %q", s, base)
		}
	}
	var text, js bytes.Buffer
	if err := a.WriteText(&text, nil); err != nil {
		t.Fatal(err)
	}
	if i, j := strings.Index(text.String(), "Not checked by this report"), strings.Index(text.String(), "Design basis"); i < 0 || j < i {
		t.Error("the text report does not open with what it does not check")
	}
	if err := a.WriteJSON(&js); err != nil {
		t.Fatal(err)
	}
	var doc struct {
		NotChecked []string `json:"not_checked"`
	}
	if err := json.Unmarshal(js.Bytes(), &doc); err != nil || len(doc.NotChecked) != len(base) {
		t.Errorf("JSON not_checked: %d items (%v), want %d", len(doc.NotChecked), err, len(base))
	}

	// A frame tower, no ground line, no attachment described, rock, no
	// wind, a case left out.
	b.Site.Ground = nil
	b.Banks.Left.Tower.Section.Type = "frame"
	b.Banks.Right.Anchor.Attachment = nil
	yes := true
	b.Banks.Right.Soil.IsRock = &yes
	b.Climate.WindSpeed, b.Climate.WindPressure = 0, 0
	b.Loads.Omit = []string{"flood with crowd", "wind, hottest rope"}
	a.Bridge = b
	got := a.NotChecked()
	for _, s := range []string{"left tower's frame bracing", "taken level", "attachment at the right anchor", "rock mass's own stability at the right",
		"no wind case is checked",
		`(loads.omit): "flood with crowd"; "wind, hottest rope".`} { // each name quoted: one may hold a comma
		if !has(got, s) {
			t.Errorf("%q missing from %q", s, got)
		}
	}
}

// TestLiftedCaseNotChecked: where the wind lifts the walkway (a storm of
// 50 m/s on a walkway of lift coefficient 2), the case has no rope state, its
// rope, tower and foundation checks are missing, and the report says so:
// the uplift check fails with a note, and the not-checked list names the
// case.
func TestLiftedCaseNotChecked(t *testing.T) {
	b := Demo()
	b.Loads.WalkwayLift, b.Climate.WindSpeed = 2, 50
	if err := b.Validate(); err != nil {
		t.Fatal(err)
	}
	a, err := Check(b, &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	var lifted string
	for _, r := range a.Report.Results {
		if r.ID == "walkway.uplift" && strings.Contains(strings.Join(r.Notes, " "), "lifts the walkway in this case") {
			if r.Status != check.Fail {
				t.Errorf("%s: %s", r.Case, r.Status)
			}
			lifted = r.Case
		}
	}
	if lifted == "" {
		t.Fatal("no case lifts the walkway in a 50 m/s storm")
	}
	for _, r := range a.Report.Results {
		if r.Case == lifted && strings.HasPrefix(r.ID, "tower.") {
			t.Errorf("%s %s under the lifted case %q", r.ID, r.Element, lifted)
		}
	}
	found := false
	for _, s := range a.NotChecked() {
		found = found || strings.Contains(s, strconv.Quote(lifted)) && strings.Contains(s, "wind lifts the walkway")
	}
	if !found {
		t.Errorf("the not-checked list does not name %q: %q", lifted, a.NotChecked())
	}
}
