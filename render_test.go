package sagspan

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
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
