package main

import (
	"bytes"
	"context"
	"strings"
	"testing"
)

func TestRun(t *testing.T) {
	var out, errOut bytes.Buffer
	if code := run(context.Background(), []string{"-h"}, &out, &errOut); code != 0 || !strings.Contains(out.String(), "usage: designsearch") {
		t.Errorf("-h: exit %d, stdout %q", code, out.String())
	}
	if testing.Short() {
		t.Skip("searches some 13 000 designs")
	}
	out.Reset()
	if code := run(context.Background(), []string{"../../testdata/level.json", "-workers", "2"}, &out, &errOut); code != 0 {
		t.Fatalf("exit %d, stderr %s", code, errOut.String())
	}
	if !strings.Contains(out.String(), "Level test span") || !strings.Contains(out.String(), "candidates") {
		t.Errorf("the search does not name the bridge of the file:\n%s", out.String())
	}
}
