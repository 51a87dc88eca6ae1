package main

import (
	"bytes"
	"strings"
	"testing"
)

func TestRun(t *testing.T) {
	var out, errOut bytes.Buffer
	if code := run(nil, &out, &errOut); code != 0 {
		t.Fatalf("defaults: exit %d: %s", code, errOut.String())
	}
	for _, want := range []string{"Closed form (Irvine & Caughey)", "vertical, antisymmetric", "lateral, symmetric"} {
		if !strings.Contains(out.String(), want) {
			t.Errorf("output lacks %q", want)
		}
	}
	for _, args := range [][]string{{"-sag", "-5 m"}, {"-span", "12 kN"}, {"-nonsense"}, {"-mass", "0 kg/m"}} {
		errOut.Reset()
		if code := run(args, &out, &errOut); code != 1 {
			t.Errorf("%v: exit %d, want 1", args, code)
		}
		if errOut.Len() == 0 {
			t.Errorf("%v: no message", args)
		}
	}
}

func TestDescriptionFile(t *testing.T) {
	var out, errOut bytes.Buffer
	if code := run([]string{"-h"}, &out, &errOut); code != 0 || !strings.Contains(out.String(), "usage: ropemodes") {
		t.Errorf("-h: exit %d, stdout %q", code, out.String())
	}
	out.Reset()
	// A file, with a flag after it that overrides the description.
	if code := run([]string{"../../testdata/level.json", "-fmax", "1.5 Hz"}, &out, &errOut); code != 0 {
		t.Fatalf("exit %d: %s", code, errOut.String())
	}
	// level.json: 50 m span, 2.5 m sag, 4 × 26 mm 6x36-IWRC ropes.
	for _, want := range []string{"Level test span", "span 50.00 m, sag 2.500 m (1/20)", "modes up to 1.500 Hz"} {
		if !strings.Contains(out.String(), want) {
			t.Errorf("output lacks %q:\n%s", want, out.String())
		}
	}
}
