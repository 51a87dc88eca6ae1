package sagspan

import (
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"github.com/sagspan/sagspan/check"
)

// byHand is a checked test bridge and the lookups its hand-check test
// makes (TestSteepFrameByHand, TestLongPartialByHand,
// TestHillsideTubeByHand).
type byHand struct {
	t *testing.T
	a *Analysis
}

// checkByHand checks the test bridge in testdata/name without comfort.
func checkByHand(t *testing.T, name string) byHand {
	t.Helper()
	a, err := Check(loadTestdata(t, name), &Options{SkipComfort: true})
	if err != nil {
		t.Fatal(err)
	}
	return byHand{t, a}
}

// state returns the state of case name among states.
func (h byHand) state(states []CaseState, name string) CaseState {
	h.t.Helper()
	for _, s := range states {
		if s.Case.Name == name {
			return s
		}
	}
	h.t.Fatalf("no case %q", name)
	return CaseState{}
}

// design returns the design state of case name.
func (h byHand) design(name string) CaseState { h.t.Helper(); return h.state(h.a.Design, name) }

// governing returns the governing result of a check on an element.
func (h byHand) governing(id, element string) check.Result {
	h.t.Helper()
	return governingOf(h.t, h.a, id, element)
}

// result returns the result of a check on an element in case lc.
func (h byHand) result(id, element, lc string) check.Result {
	h.t.Helper()
	return find(h.t, h.a.Report, id, element, lc)
}

// value returns a result's value of symbol sym.
func (h byHand) value(r check.Result, sym string) float64 {
	h.t.Helper()
	v, ok := r.Value(sym)
	if !ok {
		h.t.Fatalf("%s (%s, %s): no value %s", r.ID, r.Element, r.Case, sym)
	}
	return v.Value
}

// near compares the library's number with the hand route's, within the
// relative tolerance tol, and logs the difference.
func (h byHand) near(what string, got, want, tol float64) {
	h.t.Helper()
	if !scalar.EqualWithinRel(got, want, tol) {
		h.t.Errorf("%s: library %.6g, by hand %.6g (%.3f %%, tolerance %.2g %%)", what, got, want, 100*(got/want-1), 100*tol)
	} else {
		h.t.Logf("%s: library %.6g, by hand %.6g (%.3f %%)", what, got, want, 100*(got/want-1))
	}
}

// bisect returns the root of f between lo and hi, where f changes sign,
// by 200 halvings.
func bisect(f func(float64) float64, lo, hi float64) float64 {
	flo := f(lo)
	for range 200 {
		mid := (lo + hi) / 2
		if fm := f(mid); (fm > 0) == (flo > 0) {
			lo, flo = mid, fm
		} else {
			hi = mid
		}
	}
	return (lo + hi) / 2
}
