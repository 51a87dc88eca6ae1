package sagspan

import (
	"math"
	"path/filepath"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// collect is a sink keeping the highest ratio of each check.
type collect map[checkKey]check.Result

func (c collect) add(r check.Result) {
	if r.Status == check.Info || r.Status == check.Flag {
		return
	}
	k := checkKey{r.ID, r.Element}
	if old, ok := c[k]; !ok || r.Ratio > old.Ratio {
		c[k] = r
	}
}

// denseGrid checks family fam of bridge b on n loaded lengths per
// placement, k/n of the span for k = 1..n, and returns each check's
// highest ratio.
func denseGrid(t *testing.T, b Bridge, fam LoadedLength, n int) collect {
	t.Helper()
	m, perm := permanentOf(t, b)
	out := collect{}
	l := b.Site.Span
	for _, p := range fam.Placements {
		for k := 1; k <= n; k++ {
			lc := fam.at(p, units.Length(float64(k)/float64(n))*l, l)
			svc, des, err := m.pair(lc, nil)
			if err != nil {
				t.Fatal(err)
			}
			if err := m.ropeChecks(out, svc, des, false); err != nil {
				t.Fatal(err)
			}
			if err := m.structureChecks(out, perm, svc, des); err != nil {
				t.Fatal(err)
			}
			if err := m.groundChecks(out, perm, svc); err != nil {
				t.Fatal(err)
			}
		}
	}
	return out
}

// TestLoadedLengthAgainstDenseGrid checks the loaded-length search by
// brute force: on a grid of 200 loaded lengths per placement (EN 1991-2
// 5.3.2.1 pressure for each), no check's highest ratio exceeds the one the
// search reports by more than 0.5 % (of 0.05 for a check used less: its
// maximum is not refined below minRefined).
func TestLoadedLengthAgainstDenseGrid(t *testing.T) {
	// The demo and the level span always; every other test bridge too
	// unless short.
	bridges := map[string]Bridge{"demo": Demo(), "level": loadTestBridge(t, "level.json")}
	if !testing.Short() {
		files, err := filepath.Glob("testdata/*.json")
		if err != nil {
			t.Fatal(err)
		}
		for _, f := range files {
			name := strings.TrimSuffix(filepath.Base(f), ".json")
			if _, ok := bridges[name]; ok {
				continue
			}
			if b, err := LoadFile(f); err == nil {
				bridges[name] = b
			}
		}
	}
	for name, b := range bridges {
		m, perm := permanentOf(t, b)
		for _, fam := range b.LoadedLengths() {
			got := collect{}
			sr, _, err := m.searchLength(got, perm, fam, true)
			if err != nil {
				t.Fatal(err)
			}
			tried := sr.points
			dense := denseGrid(t, b, fam, 200)
			worst := 0.0
			for k, d := range dense {
				s, ok := got[k]
				if !ok {
					t.Errorf("%s, %s %s: %s %s missing from the search", name, fam.Name, fam.Label, k.id, k.element)
					continue
				}
				if d.Ratio <= 0 || math.IsInf(d.Ratio, 1) && math.IsInf(s.Ratio, 1) {
					continue
				}
				// 0.5 % of the ratio, of 0.05 for checks used less.
				short := (d.Ratio - s.Ratio) / math.Max(d.Ratio, 0.05)
				worst = math.Max(worst, short)
				if short > 0.005 {
					t.Errorf("%s, %s %s: %s %s: search %.5f under %q, dense grid %.5f under %q",
						name, fam.Name, fam.Label, k.id, k.element, s.Ratio, s.Case, d.Ratio, d.Case)
				}
			}
			t.Logf("%s, %s %s: %d checks, %d stretches tried, search at most %.3f %% under the dense grid", name, fam.Name, fam.Label, len(dense), len(tried), 100*worst)
		}
	}
}

// permanentOf returns a model of bridge b and its permanent case's
// characteristic state.
func permanentOf(t *testing.T, b Bridge) (*model, CaseState) {
	t.Helper()
	m, err := newModel(b)
	if err != nil {
		t.Fatal(err)
	}
	perm, _, err := m.pair(b.Cases()[0], nil)
	if err != nil {
		t.Fatal(err)
	}
	return m, perm
}
