package main

import (
	"bytes"
	"strings"
	"testing"
)

func TestRun(t *testing.T) {
	var out, errOut bytes.Buffer
	if code := run([]string{"-h"}, &out, &errOut); code != 0 || !strings.Contains(out.String(), "usage: anchorsweep") {
		t.Errorf("-h: exit %d, stdout %q", code, out.String())
	}
	// A description file, with flags after it.
	out.Reset()
	if code := run([]string{"../../testdata/level.json", "-step", "4"}, &out, &errOut); code != 0 {
		t.Fatalf("exit %d, stderr %s", code, errOut.String())
	}
	if !strings.Contains(out.String(), "Level test span") || !strings.Contains(out.String(), "never replace") {
		t.Errorf("the sweep does not name the bridge of the file or lacks the caution:\n%s", out.String())
	}
	if code := run([]string{"missing.json"}, &out, &errOut); code != 1 {
		t.Errorf("a missing file: exit %d", code)
	}
}
