package check

import (
	"bytes"
	"encoding/json"
	"flag"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/stretchr/testify/assert"
	"github.com/stretchr/testify/require"

	"github.com/sagspan/sagspan/units"
)

var update = flag.Bool("update", false, "rewrite golden files")

func TestCompare(t *testing.T) {
	tests := []struct {
		name             string
		demand, capacity float64
		ratio            float64
		status           Status
	}{
		{"within", 80, 100, 0.8, Pass},
		{"exactly at capacity passes", 100, 100, 1, Pass},
		{"over", 120, 100, 1.2, Fail},
		{"zero demand", 0, 100, 0, Pass},
		{"zero capacity", 10, 0, math.Inf(1), Fail},
		{"NaN demand never passes", math.NaN(), 100, math.Inf(1), Fail},
		{"NaN capacity never passes", 10, math.NaN(), math.Inf(1), Fail},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			r := Compare("x", "x", units.KindForce, tt.demand, tt.capacity)
			assert.Equal(t, tt.status, r.Status)
			assert.InDelta(t, tt.ratio, r.Ratio, 1e-12)
			if math.IsInf(tt.ratio, 1) {
				assert.True(t, math.IsInf(r.Ratio, 1))
			}
		})
	}
}

func TestStability(t *testing.T) {
	// Overturning: resisting 300 kN·m, driving 100 kN·m, required 2 →
	// provided 3, ratio 2·100/300 = 0.667.
	r := Stability("anchor.overturning", "Overturning", units.KindMoment, 100e3, 300e3, 2)
	assert.Equal(t, Pass, r.Status)
	assert.InDelta(t, 3.0, r.Provided, 1e-12)
	assert.InDelta(t, 2.0/3, r.Ratio, 1e-12)
	assert.InDelta(t, r.Required/r.Provided, r.Ratio, 1e-12, "ratio = required/provided")

	zero := Stability("anchor.sliding", "Sliding", units.KindForce, 0, 50e3, 1.5)
	assert.Equal(t, Pass, zero.Status)
	assert.True(t, math.IsInf(zero.Provided, 1), "no driving force gives an unbounded factor")
	b, err := json.Marshal(zero)
	require.NoError(t, err)
	assert.Contains(t, string(b), `"required_factor":1.5`)
	assert.NotContains(t, string(b), "provided_factor", "an unbounded factor is omitted from JSON")
}

func TestAdvisoryNeverFails(t *testing.T) {
	r := Advisory("comfort", "Frequency", units.KindFrequency, 3, 2)
	assert.Equal(t, Flag, r.Status)
	assert.False(t, Compare("a", "a", units.KindForce, 1, 2).Status.Worse(Pass))
	assert.True(t, Fail.Worse(Flag))
	assert.True(t, Flag.Worse(Pass))
	assert.True(t, Pass.Worse(Info))
}

func TestWithNoteDoesNotAlias(t *testing.T) {
	base := Compare("a", "a", units.KindForce, 1, 2).WithNote("one")
	x := base.WithNote("two")
	y := base.WithNote("three")
	assert.Equal(t, []string{"one"}, base.Notes)
	assert.Equal(t, []string{"one", "two"}, x.Notes)
	assert.Equal(t, []string{"one", "three"}, y.Notes)
}

func sampleReport() Report {
	var r Report
	r.Title = "Demo footbridge"
	for _, c := range []struct {
		name string
		t    float64
		ecc  float64
	}{{"permanent", 180e3, 0.05}, {"crowd full", 260e3, 0.12}, {"crowd half", 240e3, 0.16}} {
		r.Add(
			Compare("cable.tension", "Rope tension", units.KindForce, c.t, 300e3).
				For("walkway ropes", c.name).WithBasis("global factor 3.0 on minimum breaking force (common practice)"),
			Compare("tower.eccentricity", "Resultant eccentricity at column base", units.KindLength, c.ecc, 0.15).
				For("left tower", c.name).WithBasis("kern of the effective section (common practice)"),
			Stability("anchor.sliding", "Anchor sliding", units.KindForce, c.t*0.9, 500e3, 1.5).
				For("left anchor", c.name).WithBasis("base friction, tan δ (EN 1997-1 6.5.3)"),
		)
	}
	r.Add(Advisory("cable.frequency.vertical", "First vertical frequency", units.KindFrequency, 2.0, 1.25).
		For("span", "permanent").WithNote("in the range walkers excite vertically"))
	r.Add(Record("cable.sag", "Dead-load sag", units.KindLength, 2.4).For("walkway ropes", "permanent"))
	return r
}

func TestGoverning(t *testing.T) {
	r := sampleReport()
	gov := r.Governing()
	require.Len(t, gov, 5)
	byID := map[string]Result{}
	for _, g := range gov {
		byID[g.ID] = g
	}
	assert.Equal(t, "crowd full", byID["cable.tension"].Case, "highest tension governs")
	assert.Equal(t, "crowd half", byID["tower.eccentricity"].Case, "the only failing case governs")
	assert.Equal(t, Fail, byID["tower.eccentricity"].Status)
	assert.Equal(t, "crowd full", byID["anchor.sliding"].Case)
	assert.Equal(t, Fail, r.Status())
	require.Len(t, r.Failures(), 1)

	// Ties go to the first result added.
	var tie Report
	tie.Add(Compare("a", "a", units.KindForce, 1, 2).For("e", "first"), Compare("a", "a", units.KindForce, 1, 2).For("e", "second"))
	assert.Equal(t, "first", tie.Governing()[0].Case)

	// The same check on two elements governs separately.
	var two Report
	two.Add(Compare("a", "a", units.KindForce, 1, 2).For("left", "c"), Compare("a", "a", units.KindForce, 3, 2).For("right", "c"))
	assert.Len(t, two.Governing(), 2)

	passing := r.Filter(func(res Result) bool { return res.ID != "tower.eccentricity" })
	assert.Equal(t, Flag, passing.Status())
	assert.Equal(t, Info, Report{}.Status())
}

func golden(t *testing.T, name string, got []byte) {
	t.Helper()
	path := filepath.Join("testdata", name)
	if *update {
		require.NoError(t, os.WriteFile(path, got, 0o644))
	}
	want, err := os.ReadFile(path)
	require.NoError(t, err, "run go test ./check -update to create golden files")
	assert.Equal(t, string(want), string(got))
}

func TestRender(t *testing.T) {
	r := sampleReport()
	var text, md, js bytes.Buffer
	require.NoError(t, r.WriteText(&text, &RenderOptions{All: true}))
	require.NoError(t, r.WriteMarkdown(&md, nil))
	require.NoError(t, r.WriteJSON(&js))
	golden(t, "report.txt", text.Bytes())
	golden(t, "report.md", md.Bytes())
	golden(t, "report.json", js.Bytes())
	for _, out := range []string{text.String(), md.String(), js.String()} {
		assert.Contains(t, out, "never replace")
	}

	// JSON values are SI and round-trip.
	var back struct {
		Status    Status `json:"status"`
		Governing []struct {
			ID     string  `json:"id"`
			Demand float64 `json:"demand"`
			Unit   string  `json:"unit"`
			Status Status  `json:"status"`
		} `json:"governing"`
	}
	require.NoError(t, json.Unmarshal(js.Bytes(), &back))
	assert.Equal(t, Fail, back.Status)
	assert.Equal(t, "cable.tension", back.Governing[0].ID)
	assert.Equal(t, 260e3, back.Governing[0].Demand)
	assert.Equal(t, "N", back.Governing[0].Unit)
}

func TestRenderEmpty(t *testing.T) {
	var buf bytes.Buffer
	require.NoError(t, Report{}.WriteJSON(&buf))
	assert.Contains(t, buf.String(), `"governing": []`)
	buf.Reset()
	require.NoError(t, Report{}.WriteText(&buf, nil))
	assert.Contains(t, buf.String(), "Overall: info")
}

func TestStabilityTerms(t *testing.T) {
	// Driving 894 kN against resisting 1435 kN with required factor 1.5:
	// provided 1435/894 = 1.6051, ratio 1.5/1.6051 = 0.9345 (arithmetic
	// of the definitions in check.Stability).
	r := Stability("anchor.sliding", "Sliding", units.KindForce, 894e3, 1435e3, 1.5)
	assert.Equal(t, 894e3, r.Demand, "demand is the driving action, not the factored one")
	assert.Equal(t, 1435e3, r.Capacity)
	assert.InDelta(t, 1435.0/894, r.Provided, 1e-12)
	assert.InDelta(t, 1.5*894/1435, r.Ratio, 1e-12)
	assert.Equal(t, Pass, r.Status)
	assert.Equal(t, Fail, Stability("x", "x", units.KindForce, 1000e3, 1435e3, 1.5).Status)
	assert.Equal(t, Fail, Stability("x", "x", units.KindForce, math.NaN(), 1435e3, 1.5).Status)
}

func TestRecordHasNoLimit(t *testing.T) {
	r := Record("bridge.frequency", "Frequency", units.KindFrequency, 0.29)
	assert.True(t, r.NoLimit)
	assert.Equal(t, "", r.CapacityString())
	b, err := json.Marshal(r)
	require.NoError(t, err)
	assert.Contains(t, string(b), `"capacity":null`)
	assert.Contains(t, string(b), `"ratio":null`)
	_, found := (&Report{Results: []Result{r}}).Worst()
	assert.False(t, found, "a value with no limit is never the worst check")
}

func TestValues(t *testing.T) {
	r := Compare("anchor.bearing", "Bearing", units.KindPressure, 80e3, 335e3).
		WithValues(Of("N", "normal force on the base", units.Force(1.408e6)), Of("e", "eccentricity", units.Length(0.48)))
	r2 := r.WithValues(Of("e", "eccentricity", units.Length(0.5)), Of("m", "inclination exponent", units.Ratio(1.6)))
	require.Len(t, r.Values, 2, "WithValues does not change its receiver")
	require.Len(t, r2.Values, 3, "a repeated symbol replaces the value")
	e, ok := r2.Value("e")
	require.True(t, ok)
	assert.Equal(t, 0.5, e.Value)
	assert.Equal(t, units.KindLength, e.Kind)
	_, ok = r2.Value("nothing")
	assert.False(t, ok)
	b, err := json.Marshal(r2)
	require.NoError(t, err)
	var back struct {
		Values []struct {
			Symbol, Meaning, Unit, Kind string
			Value                       float64
		}
	}
	require.NoError(t, json.Unmarshal(b, &back))
	require.Len(t, back.Values, 3)
	assert.Equal(t, "N", back.Values[0].Symbol)
	assert.Equal(t, 1.408e6, back.Values[0].Value)
	assert.Equal(t, "N", back.Values[0].Unit)
	assert.Equal(t, "inclination exponent", back.Values[2].Meaning)
	assert.Equal(t, "N = 1408 kN (normal force on the base)", r2.Values[0].String())
}

func TestResultString(t *testing.T) {
	r := Compare("tower.eccentricity", "Eccentricity", units.KindLength, 0.07721, 0.1167).For("left tower", "crowd, left half")
	assert.Equal(t, "tower.eccentricity, left tower, crowd, left half: 77.21 mm against 116.7 mm, ratio 0.662, pass", r.String())
	s := Stability("anchor.sliding", "Sliding", units.KindForce, 894e3, 1435e3, 1.5).For("left anchor", "")
	assert.Equal(t, "anchor.sliding, left anchor: driving 894.0 kN, resisting 1435 kN, factor of safety 1.61 / 1.50, ratio 0.934, pass", s.String())
	assert.Equal(t, "f, span: 0.2900 Hz, info", Record("f", "f", units.KindFrequency, 0.29).For("span", "").String())
}

func TestFailuresFirst(t *testing.T) {
	r := sampleReport()
	var text bytes.Buffer
	require.NoError(t, r.WriteText(&text, nil))
	out := text.String()
	fails, gov := strings.Index(out, "\nFailures\n"), strings.Index(out, "\nGoverning cases\n")
	require.True(t, fails > 0 && gov > fails, "the failures come before the governing cases:\n%s", out)
	assert.Contains(t, out, "Overall: FAIL: 1 of 11 results fails, in 1 check (listed first)")
	assert.Equal(t, "crowd half", r.AllFailures()[0].Case)

	// Every failing result is listed, the worst first, not only the governing one.
	var two Report
	two.Add(Compare("a", "a", units.KindForce, 3, 2).For("e", "one"), Compare("a", "a", units.KindForce, 5, 2).For("e", "two"))
	f := two.AllFailures()
	require.Len(t, f, 2)
	assert.Equal(t, "two", f[0].Case)
}

func TestBasisStatedOnce(t *testing.T) {
	var r Report
	for _, id := range []string{"f.one", "f.two", "f.three"} {
		r.Add(Record(id, id, units.KindFrequency, 1).For("span", "permanent").WithBasis("one method for all three"))
	}
	var md bytes.Buffer
	require.NoError(t, r.WriteMarkdown(&md, nil))
	assert.Equal(t, 1, strings.Count(md.String(), "one method for all three"), md.String())
	assert.Contains(t, md.String(), "`f.one, f.two, f.three`: one method for all three")
}

func TestRowsInOneUnitAndIdleRowsSayWhy(t *testing.T) {
	idle := Stability("footing.sliding", "Sliding", units.KindForce, 0, 140.4e3, 1.5).For("right footing", "permanent")
	row := Row(idle, &RenderOptions{Explain: func(Result) string { return "roller saddle: no horizontal force on the column" }})
	assert.Equal(t, []string{"footing.sliding", "right footing", "permanent", "0 kN", "140.4 kN", "–", "inf / 1.50",
		"pass: roller saddle: no horizontal force on the column"}, row)
	assert.Equal(t, "pass: nothing acts in this case", Row(idle, nil)[7])
	mixed := Compare("tower.eccentricity", "e", units.KindLength, 0.9, 1.2)
	assert.Equal(t, []string{"0.9000 m", "1.200 m"}, Row(mixed, nil)[3:5])
}

func TestGoverningRecordIsTheLargest(t *testing.T) {
	// A value with no limit governs where it is largest, not where it was
	// first reported.
	var r Report
	r.Add(
		Record("anchor.rod.force", "Rod force", units.KindForce, 100e3).For("left anchor", "permanent"),
		Record("anchor.rod.force", "Rod force", units.KindForce, 310e3).For("left anchor", "crowd"),
		Record("anchor.rod.force", "Rod force", units.KindForce, 250e3).For("left anchor", "wind"),
	)
	gov := r.Governing()
	require.Len(t, gov, 1)
	assert.Equal(t, "crowd", gov[0].Case)
}

// TestValuesFilter checks WithValues, whose search for a repeated symbol is
// skipped where a filter says the symbol is new, against its definition
// (each value in turn replaces the first of its symbol, or is appended) on
// symbols that share the filter's bits: same length and first letter.
func TestValuesFilter(t *testing.T) {
	syms := []string{"q", "q_c", "q_q", "q_γ", "q_max", "q_min", "N", "N_c", "N_q", "e", "e_y", "H", "H_y", "z_w", "", "A'", "A_c"}
	plain := func(have, add []Value) []Value {
		out := append(make([]Value, 0, len(have)+len(add)), have...)
		for _, v := range add {
			i := 0
			for i < len(out) && out[i].Symbol != v.Symbol {
				i++
			}
			if i < len(out) {
				out[i] = v
			} else {
				out = append(out, v)
			}
		}
		return out
	}
	seq := 0
	next := func(k int) Value {
		seq++
		return Of(syms[(k*7+seq)%len(syms)], "", units.Ratio(seq))
	}
	r := Record("x", "x", units.KindRatio, 0)
	for round := range 40 {
		var add []Value
		for k := range round % 9 {
			add = append(add, next(k+round))
		}
		want := plain(r.Values, add)
		r = r.WithValues(add...)
		require.Equal(t, want, r.Values, "round %d", round)
	}
}

func BenchmarkWithValues(b *testing.B) {
	var vs []Value
	for _, s := range []string{"N", "H", "e", "q_max", "q_min", "l_c", "A'", "φ", "c", "q", "γ_b", "B'", "L'", "N_c", "N_q", "N_γ",
		"s_c", "s_q", "s_γ", "d_c", "d_q", "d_γ", "i_c", "i_q", "i_γ", "θ", "m", "q_c", "q_q", "q_γ", "q_ult"} {
		vs = append(vs, Of(s, "meaning", units.Ratio(1)))
	}
	r := Compare("id", "title", units.KindPressure, 1, 2)
	b.ReportAllocs()
	for b.Loop() {
		x := r.WithValues(vs...)
		x = x.WithValues(Of("U_dr", "drained", units.Ratio(0.5)), Of("U_un", "undrained", units.Ratio(0.4)))
		sinkResult = x.WithValues(Of("z_w", "water", units.Length(1)))
	}
}

var sinkResult Result

// TestSummaryCountsFlags: a verdict of flag says that nothing fails and how
// many results are flagged, and a failing verdict counts the flags beside
// the failures, so that neither hides an advisory limit exceeded.
func TestSummaryCountsFlags(t *testing.T) {
	var r Report
	r.Add(Compare("a", "a", units.KindForce, 1, 2).For("e", "one"),
		Advisory("b", "b", units.KindForce, 3, 2).For("e", "one"),
		Advisory("b", "b", units.KindForce, 5, 2).For("e", "two"))
	assert.Equal(t, "Overall: flag: none fails; 2 of 3 results flagged, in 1 check "+
		"(see the governing cases; a flag never fails, but each needs the engineer's judgement)", r.Summary())

	r.Add(Compare("c", "c", units.KindForce, 3, 2).For("e", "one"))
	assert.Equal(t, "Overall: FAIL: 1 of 4 results fails, in 1 check (listed first); besides, 2 of 4 results flagged, in 1 check "+
		"(see the governing cases; a flag never fails, but each needs the engineer's judgement)", r.Summary())

	var clean Report
	clean.Add(Compare("a", "a", units.KindForce, 1, 2))
	assert.Equal(t, "Overall: pass (1 results)", clean.Summary())
}
