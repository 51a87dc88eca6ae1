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
