package sagspan

import (
	"context"
	"errors"
	"fmt"
	"math"
	"runtime"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"
	"github.com/google/go-cmp/cmp/cmpopts"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

func smallSpace() SearchSpace {
	m := units.Metre
	return SearchSpace{
		SagRatios: []float64{1.0 / 22, 1.0 / 18},
		Diameters: []units.Length{28 * units.Millimetre, 32 * units.Millimetre},
		Counts:    []int{4, 6},
		Anchors: []BlockSize{
			{Length: 3.5 * m, Width: 4 * m, Height: 2.2 * m, Depth: 2.8 * m},
			{Length: 4.5 * m, Width: 5.8 * m, Height: 2.6 * m, Depth: 3 * m},
		},
		Footings: []FootingSize{
			{Length: 2.0 * m, Width: 2.6 * m, Thickness: 0.6 * m},
			{Length: 2.4 * m, Width: 3.0 * m, Thickness: 0.7 * m},
		},
	}
}

// bruteForce runs the full whole-bridge check on one candidate and scores
// it as the search does: feasible when no check fails (comfort flags
// aside), utilisation the highest ratio.
func bruteForce(t *testing.T, b Bridge, d Design) (feasible bool, utilisation, price float64) {
	price, err := cost(d.Apply(b), DemoPrices)
	if err != nil {
		t.Fatal(err)
	}
	a, err := Check(d.Apply(b), nil)
	if err != nil {
		return false, math.Inf(1), price // a description that cannot be checked is no design
	}
	feasible = true
	for _, r := range a.Report.Results {
		if r.Status == check.Info || r.Status == check.Flag {
			continue
		}
		utilisation = math.Max(utilisation, r.Ratio)
		feasible = feasible && r.Status != check.Fail
	}
	return feasible, utilisation, price
}

func TestSearchAgreesWithBruteForce(t *testing.T) {
	b := Demo()
	space := smallSpace()
	res, err := Search(context.Background(), b, space, &SearchSettings{KeepAll: true})
	if err != nil {
		t.Fatal(err)
	}
	if res.Evaluated != 32 || len(res.All) != 32 {
		t.Fatalf("evaluated %d, want 2·2·2·2·2 = 32", res.Evaluated)
	}
	var cheapest *Design
	feasible := 0
	for i, d := range allCandidates(b, space) {
		ok, u, c := bruteForce(t, b, d)
		got := res.All[i]
		if got.SagRatio != d.SagRatio || got.Anchor != d.Anchor || got.Footing != d.Footing || got.Count != d.Count || got.Diameter != d.Diameter {
			t.Fatalf("candidate %d is %+v, want %+v", i, got, d)
		}
		if ok != got.Feasible || !sameRatio(u, got.Utilisation, 1e-12) || c != got.Cost {
			t.Errorf("candidate %d: search %v/%.6g/%.6g, brute force %v/%.6g/%.6g", i, got.Feasible, got.Utilisation, got.Cost, ok, u, c)
		}
		if ok {
			feasible++
			if cheapest == nil || c < cheapest.Cost {
				d.Cost = c
				cheapest = &d
			}
		}
	}
	if feasible != res.Feasible {
		t.Errorf("search found %d feasible, brute force %d", res.Feasible, feasible)
	}
	if feasible == 0 || feasible == len(res.All) {
		t.Errorf("the test grid should mix feasible and infeasible candidates, has %d of %d feasible", feasible, len(res.All))
	}
	if cheapest == nil {
		if res.Best != nil {
			t.Fatal("search found a design brute force did not")
		}
		return
	}
	if res.Best == nil {
		t.Fatal("search found no feasible design")
	}
	if res.Best.Cost != cheapest.Cost || res.Best.Anchor != cheapest.Anchor || res.Best.Footing != cheapest.Footing || res.Best.Count != cheapest.Count {
		t.Errorf("search best %+v, brute force %+v", *res.Best, *cheapest)
	}
	if res.Analysis == nil || res.Analysis.Report.Status() == check.Fail {
		t.Error("the best design does not pass its full check")
	}
	// Every design on the front and every near miss scores as brute force does.
	for _, d := range append(append([]Design{}, res.Front...), res.NearMisses...) {
		ok, u, c := bruteForce(t, b, d)
		if ok != d.Feasible || !sameRatio(u, d.Utilisation, 1e-12) || c != d.Cost {
			t.Errorf("candidate %+v: search %v/%v/%v, brute force %v/%v/%v", d, d.Feasible, d.Utilisation, d.Cost, ok, u, c)
		}
	}
	for i := 1; i < len(res.Front); i++ {
		if !(res.Front[i].Cost >= res.Front[i-1].Cost && res.Front[i].Utilisation < res.Front[i-1].Utilisation) {
			t.Errorf("front not ordered: %v then %v", res.Front[i-1], res.Front[i])
		}
	}
}

// allCandidates lists the candidates of a space in the search's order.
func allCandidates(b Bridge, s SearchSpace) []Design {
	var out []Design
	for _, rc := range s.ropeChoices() {
		for _, a := range s.Anchors {
			for _, f := range s.Footings {
				out = append(out, Design{SagRatio: rc.sag, Diameter: rc.diameter, Count: rc.count, Anchor: a, Footing: f})
			}
		}
	}
	return out
}

// TestSearchEdgeCases compares the search with brute force where parts of
// the space cannot be built: an anchor size too short for the backstay's
// attachment, a footing narrower than its column, an empty size (keep the
// bridge's own), and no sag ratios (keep every group's own sag).
func TestSearchEdgeCases(t *testing.T) {
	b := Demo()
	b.Banks.Left.Anchor.AttachX = 3 * units.Metre
	b.Ropes[1].Sag = 2.5 * units.Metre // handrail sag of its own
	m := units.Metre
	space := SearchSpace{
		Counts: []int{6},
		Anchors: []BlockSize{
			{Length: 2.5 * m, Width: 5 * m, Height: 2.6 * m, Depth: 3 * m}, // attachment outside the block
			{},
			{Length: 4.5 * m, Width: 5 * m, Height: 2.6 * m, Depth: 3 * m},
		},
		Footings: []FootingSize{
			{Length: 0.5 * m, Width: 3 * m, Thickness: 0.7 * m}, // smaller than the column
			{Length: 2.4 * m, Width: 3 * m, Thickness: 0.7 * m},
			{},
		},
	}
	res, err := Search(context.Background(), b, space, &SearchSettings{KeepAll: true})
	if err != nil {
		t.Fatal(err)
	}
	if len(res.All) != 9 {
		t.Fatalf("%d candidates, want 9", len(res.All))
	}
	for i, d := range res.All {
		ok, u, c := bruteForce(t, b, d)
		if ok != d.Feasible || (ok && math.Abs(u-d.Utilisation) > 1e-12*u) || c != d.Cost {
			t.Errorf("candidate %d %+v: search %v/%.6g/%.6g (%s), brute force %v/%.6g/%.6g",
				i, d.Anchor, d.Feasible, d.Utilisation, d.Cost, d.Governing.ID, ok, u, c)
		}
	}
	if res.Best == nil {
		t.Fatal("no feasible design; the valid sizes should pass")
	}
	if got := res.Analysis.Bridge.Ropes[1].Sag; got != 2.5*units.Metre {
		t.Errorf("the best design's handrail sag is %v, want the bridge's own 2.5 m", got)
	}
}

func TestSearchNilContext(t *testing.T) {
	//lint:ignore SA1012 a nil context is what this test is about
	_, err := Search(nil, Demo(), SearchSpace{Counts: []int{6}}, nil) //nolint:staticcheck
	if err == nil || !strings.Contains(err.Error(), "nil context") {
		t.Fatalf("nil context: got %v, want an error naming it", err)
	}
}

func TestSearchSameAnswerAnyWorkers(t *testing.T) {
	b := Demo()
	one, err := Search(context.Background(), b, smallSpace(), &SearchSettings{Workers: 1})
	if err != nil {
		t.Fatal(err)
	}
	many, err := Search(context.Background(), b, smallSpace(), &SearchSettings{Workers: 2 * runtime.GOMAXPROCS(0)})
	if err != nil {
		t.Fatal(err)
	}
	opts := cmp.Options{cmpopts.IgnoreFields(SearchResult{}, "Analysis"), cmp.AllowUnexported(Design{}), cmpopts.EquateNaNs()}
	if diff := cmp.Diff(one, many, opts); diff != "" {
		t.Errorf("answers differ with the number of workers (-1 +many):\n%s", diff)
	}
}

func TestSearchNothingFeasible(t *testing.T) {
	b := Demo()
	space := smallSpace()
	m := units.Metre
	space.Anchors = []BlockSize{{Length: 1 * m, Width: 1 * m, Height: 1 * m, Depth: 1 * m}} // far too small
	res, err := Search(context.Background(), b, space, nil)
	if err != nil {
		t.Fatalf("an infeasible site is an answer, not an error: %v", err)
	}
	if res.Best != nil || res.Feasible != 0 {
		t.Fatalf("found %d feasible", res.Feasible)
	}
	if len(res.NearMisses) == 0 || res.NearMisses[0].Governing.Status != check.Fail {
		t.Fatal("no explanation of why nothing passes")
	}
	if g := res.NearMisses[0].Governing; g.Element == "" || g.Case == "" {
		t.Errorf("near miss does not name element and case: %+v", g)
	}
}

func TestSearchCancelAndProgress(t *testing.T) {
	ctx, cancel := context.WithCancel(context.Background())
	calls := 0
	_, err := Search(ctx, Demo(), smallSpace(), &SearchSettings{Workers: 1, Progress: func(done, total int) {
		calls++
		if done > total {
			t.Errorf("progress %d of %d", done, total)
		}
		cancel()
	}})
	if !errors.Is(err, context.Canceled) {
		t.Errorf("cancelled search returned %v", err)
	}
	if calls == 0 {
		t.Error("no progress reported")
	}
}

var sinkSearch *SearchResult

// benchSpace is the grid of BenchmarkSearch: 4 sag ratios × 3 rope
// diameters × 2 rope counts, 4 × 3 × 2 anchor block sizes and 4 × 3 × 2
// footing sizes: 24 × 24 × 24 = 13 824 candidates.
func benchSpace() SearchSpace {
	m := units.Metre
	space := SearchSpace{
		SagRatios: []float64{1.0 / 24, 1.0 / 21, 1.0 / 18, 1.0 / 15},
		Diameters: []units.Length{28 * units.Millimetre, 32 * units.Millimetre, 36 * units.Millimetre},
		Counts:    []int{4, 6},
	}
	for _, l := range []units.Length{3.5, 4.0, 4.5, 5.0} {
		for _, w := range []units.Length{4, 4.5, 5} {
			for _, h := range []units.Length{2.2, 2.6} {
				space.Anchors = append(space.Anchors, BlockSize{Length: l * m, Width: w * m, Height: h * m, Depth: (h + 0.4) * m})
			}
		}
	}
	for _, l := range []units.Length{2.0, 2.2, 2.4, 2.6} {
		for _, w := range []units.Length{2.6, 2.8, 3.0} {
			for _, t := range []units.Length{0.6, 0.7} {
				space.Footings = append(space.Footings, FootingSize{Length: l * m, Width: w * m, Thickness: t * m})
			}
		}
	}
	return space
}

// BenchmarkSearch reports candidates evaluated per second on the demo
// bridge over benchSpace. Run with -cpu 1,2.
func BenchmarkSearch(b *testing.B) {
	br := Demo()
	space := benchSpace()
	b.ReportAllocs()
	n := 0
	for b.Loop() {
		res, err := Search(context.Background(), br, space, nil)
		if err != nil {
			b.Fatal(err)
		}
		n += res.Evaluated
		sinkSearch = res
	}
	b.ReportMetric(float64(n)/b.Elapsed().Seconds(), "candidates/s")
}

// TestSearchRespectsGradient checks that the walkway gradient limits the
// sag a design search may choose: on the demo bridge with six ropes, the
// deeper sags steepen the walkway under a crowd on a short stretch beyond
// the limit, so the search does not settle on the deepest sag it may try,
// and says why the deep ones fail.
func TestSearchRespectsGradient(t *testing.T) {
	space := SearchSpace{SagRatios: []float64{1.0 / 24, 1.0 / 22, 1.0 / 20, 1.0 / 18, 1.0 / 16}}
	res, err := Search(context.Background(), Demo(), space, &SearchSettings{KeepAll: true})
	if err != nil {
		t.Fatal(err)
	}
	if res.Best == nil {
		t.Fatal("no feasible sag")
	}
	deepest := space.SagRatios[len(space.SagRatios)-1]
	if res.Best.SagRatio == deepest {
		t.Errorf("the search settled on the deepest sag 1/%.0f", 1/deepest)
	}
	for _, d := range res.All {
		if d.SagRatio == deepest && (d.Feasible || d.Governing.ID != "walkway.gradient") {
			t.Errorf("sag 1/%.0f: feasible %v, governed by %s", 1/d.SagRatio, d.Feasible, d.Governing.ID)
		}
	}
}

// TestSearchSizesAsChecked checks each part of a candidate on its own, so
// that a part whose ratios are too low to govern a candidate is still held
// to the full check: for each footing and anchor size, the highest ratio of
// every footing and anchor check the search's stage finds equals the one
// Check finds for the bridge built with that size, to 1e-12. (Utilisation
// alone is governed by the columns and ropes on the demo, so a footing
// checked at the wrong size would pass TestSearchAgreesWithBruteForce.)
func TestSearchSizesAsChecked(t *testing.T) {
	b := Demo()
	m := units.Metre
	footings := []FootingSize{{Length: 1.8 * m, Width: 2.4 * m, Thickness: 0.5 * m}, {Length: 3.2 * m, Width: 3.6 * m, Thickness: 0.9 * m}}
	anchors := []BlockSize{{Length: 3 * m, Width: 3.5 * m, Height: 2 * m, Depth: 2.6 * m}, {Length: 5 * m, Width: 5.5 * m, Height: 2.8 * m, Depth: 3.2 * m}}
	var sink scorer
	model, stages, err := ropeStage(b, &sink)
	if err != nil {
		t.Fatal(err)
	}
	worst := func(results []check.Result, keep func(check.Result) bool) map[checkKey]float64 {
		out := map[checkKey]float64{}
		for _, r := range results {
			// site.ground_level is an advisory on the description's levels,
			// which never decides a size.
			if r.Status == check.Info || r.Status == check.Flag || !keep(r) || r.ID == "site.ground_level" {
				continue
			}
			k := checkKey{r.ID, r.Element}
			if x, ok := out[k]; !ok || r.Ratio > x {
				out[k] = r.Ratio
			}
		}
		return out
	}
	compare := func(what string, got, want map[checkKey]float64) {
		t.Helper()
		if len(got) == 0 || len(got) != len(want) {
			t.Errorf("%s: search has %d checks, Check %d", what, len(got), len(want))
		}
		for k, w := range want {
			if g, ok := got[k]; !ok || !sameRatio(g, w, 1e-12) {
				t.Errorf("%s: %s %s: search %.9g, Check %.9g", what, k.id, k.element, g, w)
			}
		}
	}
	isFooting := func(r check.Result) bool { return strings.Contains(r.Element, "footing") }
	isAnchor := func(r check.Result) bool { return strings.Contains(r.Element, "anchor") }
	for _, size := range footings {
		var got collected
		for _, st := range stages {
			if err := st.footingChecks(model, &got, size, 0); err != nil {
				t.Fatal(err)
			}
		}
		a, err := Check(b.withSizes(BlockSize{}, size), &Options{SkipComfort: true})
		if err != nil {
			t.Fatal(err)
		}
		compare(fmt.Sprintf("footing %v", size), worst(got, isFooting), worst(a.Report.Results, isFooting))
	}
	for _, size := range anchors {
		var got collected
		for _, st := range stages {
			if err := st.anchorChecks(model, &got, size); err != nil {
				t.Fatal(err)
			}
		}
		a, err := Check(b.withSizes(size, FootingSize{}), &Options{SkipComfort: true})
		if err != nil {
			t.Fatal(err)
		}
		compare(fmt.Sprintf("anchor %v", size), worst(got, isAnchor), worst(a.Report.Results, isAnchor))
	}
}
