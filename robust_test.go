package sagspan

import (
	"encoding/json"
	"maps"
	"math"
	"math/rand"
	"slices"
	"testing"
)

// perturb scales one numeric value in 25 of the JSON tree by a random
// factor between 1/100 and 100.
func perturb(v any, r *rand.Rand) any {
	switch x := v.(type) {
	case map[string]any:
		// Keys in order, so that the seed repeats the perturbations.
		for _, k := range slices.Sorted(maps.Keys(x)) {
			x[k] = perturb(x[k], r)
		}
	case []any:
		for i, e := range x {
			x[i] = perturb(e, r)
		}
	case float64:
		if r.Intn(25) == 0 {
			return x * math.Pow(10, r.Float64()*4-2)
		}
	}
	return v
}

// TestPerturbedDescriptions feeds randomly perturbed copies of the demo
// bridge (seeded, so repeatable) through Parse and Check. Whatever the
// numbers, a description is either refused with a field error or checked
// with finite demands, capacities and ratios (an unbounded ratio or factor
// of safety is +Inf by design, never NaN).
func TestPerturbedDescriptions(t *testing.T) {
	if testing.Short() {
		t.Skip("checks 400 perturbed descriptions")
	}
	r := rand.New(rand.NewSource(7))
	raw, err := json.Marshal(Demo()) // bare SI numbers, so they can be scaled
	if err != nil {
		t.Fatal(err)
	}
	checked := 0
	for i := 0; i < 400; i++ {
		var m map[string]any
		if err := json.Unmarshal(raw, &m); err != nil {
			t.Fatal(err)
		}
		var orig map[string]any
		if err := json.Unmarshal(raw, &orig); err != nil {
			t.Fatal(err)
		}
		p := perturb(m, r).(map[string]any)
		// The ground line keeps its order (a line out of order is refused
		// at validation, which a third of the perturbations would meet):
		// its elevations are perturbed, its x kept.
		was, pert := orig["site"].(map[string]any)["ground"].([]any), p["site"].(map[string]any)["ground"].([]any)
		for i := range pert {
			pert[i].(map[string]any)["x"] = was[i].(map[string]any)["x"]
		}
		data, err := json.Marshal(p)
		if err != nil {
			t.Fatal(err)
		}
		b, err := Parse(data)
		if err != nil {
			continue
		}
		a, err := Check(b, nil)
		if err != nil {
			continue // refused during analysis, with an error naming why
		}
		checked++
		for _, res := range a.Report.Results {
			if math.IsNaN(res.Demand) || math.IsNaN(res.Capacity) || math.IsNaN(res.Ratio) ||
				math.IsInf(res.Demand, 0) || math.IsInf(res.Capacity, 0) {
				t.Fatalf("perturbation %d: %s %s %s: demand %v capacity %v ratio %v", i, res.ID, res.Element, res.Case, res.Demand, res.Capacity, res.Ratio)
			}
		}
	}
	t.Logf("%d of 400 perturbed descriptions checked", checked)
	if checked < 100 {
		t.Errorf("only %d of 400 perturbed bridges were checked; the test is not exercising the chain", checked)
	}
}
