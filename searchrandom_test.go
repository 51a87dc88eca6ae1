package sagspan

import (
	"context"
	"fmt"
	"math"
	"math/rand/v2"
	"path/filepath"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// randomSpace draws a small search space around bridge b: sag ratios,
// walkway rope diameters and counts, anchor block sizes (both banks block
// anchors only) and footing sizes, each a random scaling of the bridge's
// own, rounded to what a drawing would give.
func randomSpace(rng *rand.Rand, b Bridge) SearchSpace {
	m := units.Metre
	cm := func(x float64) units.Length { return units.Length(math.Round(x*100)) / 100 * m }
	mm := func(x float64) units.Length { return units.Length(math.Round(x*1000)) * units.Millimetre }
	between := func(lo, hi float64) float64 { return lo + (hi-lo)*rng.Float64() }
	g := b.Ropes[firstWalkway(b)]
	own := float64(g.Sag / b.Site.Span)
	var s SearchSpace
	for range 2 {
		s.SagRatios = append(s.SagRatios, math.Min(maxSagRatio, math.Max(minSagRatio, own*between(0.8, 1.25))))
	}
	for range 2 {
		s.Diameters = append(s.Diameters, mm(float64(g.Rope.Diameter)*between(0.8, 1.2)))
	}
	s.Counts = []int{max(1, g.Count+rng.IntN(3)-1)}
	if b.Banks.Left.Anchor.Type == "block" && b.Banks.Right.Anchor.Type == "block" {
		a := b.Banks.Left.Anchor
		for range 2 {
			h := float64(a.Height) * between(0.7, 1.3)
			s.Anchors = append(s.Anchors, BlockSize{
				Length: cm(float64(a.Length) * between(0.7, 1.3)),
				Width:  cm(float64(a.Width) * between(0.7, 1.3)),
				Height: cm(h),
				Depth:  cm(h + float64(a.Depth-a.Height)*between(0.5, 1.5)),
			})
		}
	}
	f := b.Banks.Left.Tower.Footing
	for range 3 {
		s.Footings = append(s.Footings, FootingSize{
			Length:    cm(float64(f.Length) * between(0.75, 1.3)),
			Width:     cm(float64(f.Width) * between(0.75, 1.3)),
			Thickness: cm(float64(f.Thickness) * between(0.6, 1.5)),
		})
	}
	return s
}

// testBridges returns the bridge descriptions of testdata, by file name.
func testBridges(t *testing.T) map[string]Bridge {
	t.Helper()
	files, err := filepath.Glob("testdata/*.json")
	if err != nil {
		t.Fatal(err)
	}
	out := map[string]Bridge{}
	for _, file := range files {
		if b, err := LoadFile(file); err == nil {
			out[filepath.Base(file)] = b
		}
	}
	if len(out) < 5 {
		t.Fatalf("%d bridge descriptions in testdata, want at least 5", len(out))
	}
	return out
}

// searchBridges returns the bridges of testdata and, for each, the same
// bridge with groundwater at its footings' undersides, so that a footing
// size a search tries stands in water or not by its thickness.
func searchBridges(t *testing.T) map[string]Bridge {
	t.Helper()
	out := testBridges(t)
	for name, b := range testBridges(t) {
		for side := Left; side <= Right; side++ {
			bank := &b.Banks.Left
			if side == Right {
				bank = &b.Banks.Right
			}
			gw := b.saddleElevation(side) - bank.Tower.Height - bank.Tower.Footing.Thickness
			bank.Soil.Groundwater = &gw
		}
		if err := b.Validate(); err != nil {
			t.Fatalf("%s with groundwater at the footings: %v", name, err)
		}
		out["wet "+name] = b
	}
	return out
}

// TestSearchAgreesWithCheckOnTestBridges draws a random small space around
// each testdata bridge (seeded, so that it repeats) and holds every
// candidate's verdict and utilisation to a full Check of Design.Apply of
// that candidate (bruteForce). A search that calls feasible what Check
// fails, or ranks by a utilisation Check does not find, fails here. Of the
// testdata bridges only the demo passes its own checks (the others fail
// their towers whatever the sizes), so the verdicts are tested on the
// demo and the utilisations on all; TestSearchPartsAgreeWithCheckOnTestBridges
// holds the footing and anchor checks to Check where they do not govern.
func TestSearchAgreesWithCheckOnTestBridges(t *testing.T) {
	if testing.Short() {
		t.Skip("a full Check of every candidate of five spaces: seconds; run without -short")
	}
	for name, b := range searchBridges(t) {
		for seed := range uint64(2) {
			t.Run(fmt.Sprintf("%s/seed%d", strings.TrimSuffix(name, ".json"), seed), func(t *testing.T) {
				rng := rand.New(rand.NewPCG(seed, 0x5a65))
				space := randomSpace(rng, b)
				res, err := Search(context.Background(), b, space, &SearchSettings{KeepAll: true})
				if err != nil {
					t.Fatal(err)
				}
				for i, want := range allCandidatesOf(b, space) {
					d := res.All[i]
					if d.SagRatio != want.SagRatio || d.Diameter != want.Diameter || d.Count != want.Count || d.Anchor != want.Anchor || d.Footing != want.Footing {
						t.Fatalf("candidate %d is %+v, want %+v", i, d, want)
					}
					ok, u, c := bruteForce(t, b, d)
					if ok != d.Feasible || !sameRatio(u, d.Utilisation, 1e-9) || c != d.Cost {
						t.Errorf("candidate %d (sag 1/%.1f, %d × %v, anchor %v, footing %v): search %v/%.6g/%.6g (%s, %s, %s), Check %v/%.6g/%.6g",
							i, 1/d.SagRatio, d.Count, d.Diameter, d.Anchor, d.Footing, d.Feasible, d.Utilisation, d.Cost,
							d.Governing.ID, d.Governing.Element, d.Governing.Case, ok, u, c)
					}
				}
				if res.Best != nil && res.Analysis.Report.Status() == check.Fail {
					t.Errorf("the best design fails its full check")
				}
			})
		}
	}
}

// allCandidatesOf is allCandidates with an empty list of sizes keeping the
// bridge's own.
func allCandidatesOf(b Bridge, s SearchSpace) []Design {
	if len(s.Anchors) == 0 {
		s.Anchors = []BlockSize{{}}
	}
	if len(s.Footings) == 0 {
		s.Footings = []FootingSize{{}}
	}
	return allCandidates(b, s)
}

// TestSearchPartsAgreeWithCheckOnTestBridges holds each part of the
// search's score to the full check, check by check, where the part's
// ratios are too low to govern a candidate: for a random rope
// configuration and random anchor and footing sizes of each testdata
// bridge, the highest ratio of every footing and anchor check the search's
// stages find equals the one Check finds for the bridge built with them.
func TestSearchPartsAgreeWithCheckOnTestBridges(t *testing.T) {
	if testing.Short() {
		t.Skip("a full Check of every size of five bridges: seconds; run without -short")
	}
	worst := func(results []check.Result, keep func(check.Result) bool) map[checkKey]check.Result {
		out := map[checkKey]check.Result{}
		for _, r := range results {
			if r.Status == check.Info || r.Status == check.Flag || !keep(r) || r.ID == "site.ground_level" {
				continue
			}
			k := checkKey{r.ID, r.Element}
			if x, ok := out[k]; !ok || r.Ratio > x.Ratio {
				out[k] = r
			}
		}
		return out
	}
	compare := func(t *testing.T, what string, got, want map[checkKey]check.Result) {
		t.Helper()
		if len(got) == 0 || len(got) != len(want) {
			t.Errorf("%s: search has %d checks, Check %d", what, len(got), len(want))
		}
		for k, w := range want {
			if g, ok := got[k]; !ok || !sameRatio(g.Ratio, w.Ratio, 1e-9) {
				t.Errorf("%s: %s %s: search %.9g (%s), Check %.9g (%s)", what, k.id, k.element, g.Ratio, g.Case, w.Ratio, w.Case)
			}
		}
	}
	isFooting := func(r check.Result) bool { return strings.Contains(r.Element, "footing") }
	isAnchor := func(r check.Result) bool { return strings.Contains(r.Element, "anchor") }
	for name, b := range searchBridges(t) {
		for seed := range uint64(3) {
			t.Run(fmt.Sprintf("%s/seed%d", strings.TrimSuffix(name, ".json"), seed), func(t *testing.T) {
				rng := rand.New(rand.NewPCG(seed, 0x9a27))
				space := randomSpace(rng, b)
				rc := space.ropeChoices()[rng.IntN(len(space.ropeChoices()))]
				bb := Design{SagRatio: rc.sag, Diameter: rc.diameter, Count: rc.count}.Apply(b)
				var sink scorer
				model, stages, err := ropeStage(bb, &sink)
				if err != nil {
					t.Fatal(err)
				}
				for _, size := range space.Footings {
					var got collected
					for _, st := range stages {
						if err := st.footingChecks(model, &got, size, 0); err != nil {
							t.Fatal(err)
						}
					}
					a, err := Check(bb.withSizes(BlockSize{}, size), &Options{SkipComfort: true})
					if err != nil {
						t.Fatal(err)
					}
					compare(t, fmt.Sprintf("footing %v", size), worst(got, isFooting), worst(a.Report.Results, isFooting))
				}
				for _, size := range space.Anchors {
					var got collected
					for _, st := range stages {
						if err := st.anchorChecks(model, &got, size); err != nil {
							t.Fatal(err)
						}
					}
					a, err := Check(bb.withSizes(size, FootingSize{}), &Options{SkipComfort: true})
					if err != nil {
						t.Fatal(err)
					}
					compare(t, fmt.Sprintf("anchor %v", size), worst(got, isAnchor), worst(a.Report.Results, isAnchor))
				}
			})
		}
	}
}

// TestSearchRefusesWhatCheckRefuses tries an anchor size that raises the
// lowest base of the demo's banks so that a groundwater level just within
// reach of the bridge's own bases (maxWaterBelowBase) falls out of reach:
// Check refuses that design (validateGroundwater), so the search must not
// call it feasible.
func TestSearchRefusesWhatCheckRefuses(t *testing.T) {
	b := Demo()
	own := b.Banks.Left.Anchor
	for side := Left; side <= Right; side++ {
		k := b.bankOf(side)
		g := b.groundOf(side, foundationSoil(t, k))
		gw := min(g.footingTop-k.Tower.Footing.Thickness, g.anchorGround(k.Anchor)-k.Anchor.Depth) - maxWaterBelowBase + 0.05*units.Metre
		if side == Left {
			b.Banks.Left.Soil.Groundwater = &gw
		} else {
			b.Banks.Right.Soil.Groundwater = &gw
		}
	}
	if err := b.Validate(); err != nil {
		t.Fatalf("the bridge itself: %v", err)
	}
	space := SearchSpace{Anchors: []BlockSize{
		{Length: own.Length, Width: 6.5 * units.Metre, Height: own.Height, Depth: own.Depth},
		{Length: own.Length, Width: 6.5 * units.Metre, Height: own.Height - 0.6*units.Metre, Depth: own.Depth},
	}}
	res, err := Search(context.Background(), b, space, &SearchSettings{KeepAll: true})
	if err != nil {
		t.Fatal(err)
	}
	for i, d := range res.All {
		ok, u, _ := bruteForce(t, b, d)
		if ok != d.Feasible || !sameRatio(u, d.Utilisation, 1e-9) {
			t.Errorf("anchor %d %v: search %v/%.6g (%s), Check %v/%.6g", i, d.Anchor, d.Feasible, d.Utilisation, d.Governing.ID, ok, u)
		}
	}
	if _, err := Check(Design{Anchor: space.Anchors[1]}.Apply(b), nil); err == nil {
		t.Error("Check accepts the raised anchor: the test no longer tries what it means to")
	}
}

func foundationSoil(t *testing.T, k Bank) foundation.Soil {
	t.Helper()
	s, err := k.Soil.soil()
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// sameRatio reports whether two ratios agree to tol relative (both
// infinite alike, or both finite and close): |Inf − x| ≤ tol·Inf would
// hold for any x.
func sameRatio(a, b, tol float64) bool {
	if math.IsInf(a, 0) || math.IsInf(b, 0) {
		return a == b
	}
	return math.Abs(a-b) <= tol*math.Max(1, math.Abs(a))
}
