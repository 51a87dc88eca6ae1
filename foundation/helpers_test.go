package foundation_test

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/check"
	"gonum.org/v1/gonum/floats/scalar"
)

// near fails t unless got is within relative tolerance rel of want.
func near(t *testing.T, label string, got, want, rel float64) {
	t.Helper()
	if !scalar.EqualWithinAbsOrRel(got, want, 1e-12, rel) {
		t.Errorf("%s = %.6g, want %.6g (rel tol %g)", label, got, want, rel)
	}
}

// noNaN fails t if any number in rs is NaN, or a ratio or factor is -Inf.
func noNaN(t *testing.T, rs []check.Result) {
	t.Helper()
	for _, r := range rs {
		for _, x := range []float64{r.Demand, r.Capacity, r.Ratio, r.Required, r.Provided} {
			if math.IsNaN(x) || math.IsInf(x, -1) {
				t.Errorf("%s: number %v in %+v", r.ID, x, r)
			}
		}
	}
}

// byID returns the result with the given ID.
func byID(t *testing.T, rs []check.Result, id string) check.Result {
	t.Helper()
	for _, r := range rs {
		if r.ID == id {
			return r
		}
	}
	t.Fatalf("no result %s in %d results", id, len(rs))
	return check.Result{}
}

// valueOf returns the named value of r, failing t when r has none.
func valueOf(t *testing.T, r check.Result, symbol string) float64 {
	t.Helper()
	v, ok := r.Value(symbol)
	if !ok {
		t.Fatalf("%s has no value %s", r.ID, symbol)
	}
	return v.Value
}
