package main

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/sagspan/sagspan"
)

func TestRun(t *testing.T) {
	var out, errOut bytes.Buffer
	if code := run(nil, &out, &errOut); code != 0 {
		t.Fatalf("demo: exit %d, stderr %s", code, errOut.String())
	}
	if !strings.Contains(out.String(), "never replace") || !strings.Contains(out.String(), "Erection table") {
		t.Error("the text report lacks the caution or the erection table")
	}

	out.Reset()
	if code := run([]string{"-format", "json"}, &out, &errOut); code != 0 {
		t.Fatalf("json: exit %d", code)
	}
	var doc map[string]any
	if err := json.Unmarshal(out.Bytes(), &doc); err != nil {
		t.Fatalf("json output does not parse: %v", err)
	}

	dir := t.TempDir()
	bad := filepath.Join(dir, "bad.json")
	if err := os.WriteFile(bad, bytes.Replace(sagspan.DemoJSON(), []byte(`"72 m"`), []byte(`"-3 m"`), 1), 0o644); err != nil {
		t.Fatal(err)
	}
	errOut.Reset()
	if code := run([]string{bad}, &out, &errOut); code != 1 || !strings.Contains(errOut.String(), "site.span") {
		t.Errorf("bad description: exit %d, stderr %q", code, errOut.String())
	}
	if code := run([]string{"-format", "pdf"}, &out, &errOut); code != 1 {
		t.Errorf("unknown format: exit %d", code)
	}

	// A bridge that fails a check exits 2.
	out.Reset()
	if code := run([]string{"-demo-json"}, &out, &errOut); code != 0 {
		t.Fatal("demo-json failed")
	}
	failing := strings.Replace(out.String(), `"count": 6`, `"count": 1`, 1)
	path := filepath.Join(dir, "thin.json")
	if err := os.WriteFile(path, []byte(failing), 0o644); err != nil {
		t.Fatal(err)
	}
	if code := run([]string{path}, &out, &errOut); code != 2 {
		t.Errorf("a bridge with one walkway rope: exit %d, want 2", code)
	}

	svg := filepath.Join(dir, "b.svg")
	if code := run([]string{"-svg", svg}, &out, &errOut); code != 0 {
		t.Fatalf("svg: exit %d", code)
	}
	if b, err := os.ReadFile(svg); err != nil || !bytes.Contains(b, []byte("<svg")) {
		t.Errorf("no SVG written: %v", err)
	}

	modes := filepath.Join(dir, "modes.svg")
	if code := run([]string{"-modes-svg", modes}, &out, &errOut); code != 0 {
		t.Fatalf("modes-svg: exit %d", code)
	}
	if b, err := os.ReadFile(modes); err != nil || !bytes.Contains(b, []byte("Mode 1:")) {
		t.Errorf("no mode drawing written: %v", err)
	}
	if code := run([]string{"-no-comfort", "-modes-svg", modes}, &out, &errOut); code != 1 {
		t.Errorf("mode drawing with the modal analysis off: exit %d, want 1", code)
	}
	out.Reset()
	if code := run(nil, &out, &errOut); code != 0 {
		t.Fatalf("demo: exit %d", code)
	}
	for _, want := range []string{"Natural modes (permanent load)", "Closed form", "Acceleration", "Lateral lock-in"} {
		if !strings.Contains(out.String(), want) {
			t.Errorf("the demo report lacks %q", want)
		}
	}
}

func TestCommandLine(t *testing.T) {
	dir := t.TempDir()
	demo := filepath.Join(dir, "mine.json")
	if err := os.WriteFile(demo, sagspan.DemoJSON(), 0o644); err != nil {
		t.Fatal(err)
	}
	var out, errOut bytes.Buffer
	// -h exits 0 and prints the usage on standard output.
	if code := run([]string{"-h"}, &out, &errOut); code != 0 || !strings.Contains(out.String(), "usage: checkbridge") {
		t.Errorf("-h: exit %d, stdout %q", code, out.String())
	}
	// Flags after the file.
	out.Reset()
	if code := run([]string{demo, "-all", "-format", "markdown"}, &out, &errOut); code != 0 ||
		!strings.Contains(out.String(), "## All results") || !strings.Contains(out.String(), "description "+demo) {
		t.Errorf("flags after the file: exit %d, stderr %q", code, errOut.String())
	}
	// -o writes the report to a file, here the HTML one.
	report := filepath.Join(dir, "report.html")
	out.Reset()
	if code := run([]string{"-o", report, demo, "-format", "html"}, &out, &errOut); code != 0 || out.Len() != 0 {
		t.Errorf("-o: exit %d, %d bytes on stdout", code, out.Len())
	}
	if b, err := os.ReadFile(report); err != nil || !bytes.Contains(b, []byte(`<section class="part" id="design-basis">`)) {
		t.Errorf("no HTML report written: %v", err)
	}
	// An unknown flag after the file gives the usage and exit 1; two files too.
	errOut.Reset()
	if code := run([]string{demo, "-colour"}, &out, &errOut); code != 1 || !strings.Contains(errOut.String(), "usage: checkbridge") {
		t.Errorf("unknown flag: exit %d, stderr %q", code, errOut.String())
	}
	if code := run([]string{demo, demo}, &out, &errOut); code != 1 {
		t.Errorf("two files: exit %d", code)
	}
}
