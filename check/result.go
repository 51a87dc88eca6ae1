package check

import (
	"encoding/json"
	"fmt"
	"math"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// Result is the outcome of one check, for one element, under one load case.
type Result struct {
	// ID is a stable identifier of the check, such as "tower.eccentricity".
	ID string
	// Title is a short human description, such as "Resultant eccentricity at column base".
	Title string
	// Element names what was checked, such as "left tower" or "walkway ropes".
	Element string
	// Case is the load case or combination that produced the result.
	Case string
	// Demand and Capacity are in SI, of kind Kind. For a stability check
	// (Required > 0) they are the driving and the resisting action.
	Demand, Capacity float64
	Kind             units.Kind
	// Ratio is the utilisation; at most 1 passes. It is Demand/Capacity,
	// and Required/Provided for a stability check.
	Ratio float64
	// Status is the verdict.
	Status Status
	// NoLimit marks a result that reports a value with no limit to meet
	// (see Record): it has no capacity and no ratio, and JSON writes both
	// as null.
	NoLimit bool
	// Required and Provided are the factors of safety of a stability check
	// (zero for other checks): Provided = resisting/driving, +Inf when
	// nothing drives failure.
	Required, Provided float64
	// Basis names the method and its published source, or "common practice".
	Basis string
	// Values are the check's named intermediate quantities, in the order
	// the method meets them.
	Values []Value
	// Notes carry what a reader needs to trust or act on the result and
	// that is not a number: assumptions, simplifications, advice.
	Notes []string
}

// Compare returns the result of a check that passes when demand <= capacity.
//
// Special cases: a positive demand on a capacity of zero or less gives
// ratio +Inf and Fail; a demand of zero or less gives ratio 0 and Pass;
// a NaN demand or capacity gives ratio +Inf, Fail and a note saying so, so
// that a broken calculation can never read as a pass.
func Compare(id, title string, kind units.Kind, demand, capacity float64) Result {
	r := Result{ID: id, Title: title, Kind: kind, Demand: demand, Capacity: capacity}
	r.Ratio, r.Status = ratio(demand, capacity)
	if math.IsNaN(demand) || math.IsNaN(capacity) {
		r.Notes = append(r.Notes, "demand or capacity is not a number: the calculation behind this check is broken")
	}
	return r
}

// Stability returns the result of a stability check (overturning, sliding,
// uplift) in its own terms, with a required factor of safety:
//
//	demand   = driving action
//	capacity = resisting action
//	provided = resisting / driving   (+Inf when driving <= 0)
//	ratio    = required / provided   (utilisation; at most 1 passes)
//
// Special cases as Compare: a NaN action fails with a note.
func Stability(id, title string, kind units.Kind, driving, resisting, required float64) Result {
	r := Result{ID: id, Title: title, Kind: kind, Demand: driving, Capacity: resisting, Required: required}
	r.Ratio, r.Status = ratio(required*driving, resisting)
	if math.IsNaN(driving) || math.IsNaN(resisting) || math.IsNaN(required) {
		r.Notes = append(r.Notes, "driving or resisting action is not a number: the calculation behind this check is broken")
	}
	r.Provided = math.Inf(1)
	if driving > 0 {
		r.Provided = resisting / driving
	}
	return r
}

// Advisory returns a result that is flagged, never failed, when demand
// exceeds capacity: guidance rather than a limit.
func Advisory(id, title string, kind units.Kind, demand, capacity float64) Result {
	r := Compare(id, title, kind, demand, capacity)
	if r.Status == Fail {
		r.Status = Flag
	}
	return r
}

// Record returns an Info result reporting a value with no limit: it has no
// capacity and no ratio (NoLimit).
func Record(id, title string, kind units.Kind, value float64) Result {
	return Result{ID: id, Title: title, Kind: kind, Demand: value, Status: Info, NoLimit: true}
}

func ratio(demand, capacity float64) (float64, Status) {
	switch {
	case math.IsNaN(demand) || math.IsNaN(capacity):
		return math.Inf(1), Fail
	case demand <= 0:
		return 0, Pass
	case capacity <= 0:
		return math.Inf(1), Fail
	}
	q := demand / capacity
	if q <= 1 {
		return q, Pass
	}
	return q, Fail
}

// For returns a copy of r for the given element and load case.
func (r Result) For(element, loadCase string) Result {
	r.Element, r.Case = element, loadCase
	return r
}

// WithBasis returns a copy of r with its basis set.
func (r Result) WithBasis(basis string) Result {
	r.Basis = basis
	return r
}

// WithNote returns a copy of r with a note appended.
func (r Result) WithNote(note string) Result {
	r.Notes = append(r.Notes[:len(r.Notes):len(r.Notes)], note)
	return r
}

// Passed reports whether the result is not a failure.
func (r Result) Passed() bool { return r.Status != Fail }

// DemandString and CapacityString format the demand and capacity in
// engineering units.
func (r Result) DemandString() string { return units.Format(r.Demand, r.Kind) }

// CapacityString formats the capacity in engineering units; a result with
// no limit has none and gives "".
func (r Result) CapacityString() string {
	if r.NoLimit {
		return ""
	}
	return units.Format(r.Capacity, r.Kind)
}

// String formats the result on one line for people:
//
//	tower.eccentricity, left tower, crowd, left half: 77.21 mm against 116.7 mm, ratio 0.662, pass
//
// A stability check shows its driving and resisting actions and factors;
// a result with no limit shows its value.
func (r Result) String() string {
	var b strings.Builder
	b.WriteString(r.ID)
	for _, s := range []string{r.Element, r.Case} {
		if s != "" {
			b.WriteString(", ")
			b.WriteString(s)
		}
	}
	b.WriteString(": ")
	switch {
	case r.NoLimit:
		fmt.Fprintf(&b, "%s, %s", r.DemandString(), r.Status)
	case r.Required != 0:
		fmt.Fprintf(&b, "driving %s, resisting %s, factor of safety %s, ratio %s, %s",
			r.DemandString(), r.CapacityString(), factorString(r), ratioString(r.Ratio), r.Status)
	default:
		fmt.Fprintf(&b, "%s against %s, ratio %s, %s", r.DemandString(), r.CapacityString(), ratioString(r.Ratio), r.Status)
	}
	return b.String()
}

// resultJSON is the stable JSON form of a Result: SI values with their unit,
// and null for a factor or ratio that is unbounded.
type resultJSON struct {
	ID       string   `json:"id"`
	Title    string   `json:"title"`
	Element  string   `json:"element,omitempty"`
	Case     string   `json:"case,omitempty"`
	Demand   *float64 `json:"demand"`
	Capacity *float64 `json:"capacity"`
	Unit     string   `json:"unit"`
	Ratio    *float64 `json:"ratio"`
	Status   Status   `json:"status"`
	Required *float64 `json:"required_factor,omitempty"`
	Provided *float64 `json:"provided_factor,omitempty"`
	Basis    string   `json:"basis,omitempty"`
	Values   []Value  `json:"values,omitempty"`
	Notes    []string `json:"notes,omitempty"`
}

// finite returns &x, or nil when x is NaN or infinite (JSON has no such numbers).
func finite(x float64) *float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return nil
	}
	return &x
}

// MarshalJSON writes r with SI values; an unbounded ratio or provided
// factor, and the capacity and ratio of a result with no limit, are
// written as null.
func (r Result) MarshalJSON() ([]byte, error) {
	j := resultJSON{
		ID: r.ID, Title: r.Title, Element: r.Element, Case: r.Case,
		Demand: finite(r.Demand), Capacity: finite(r.Capacity), Unit: r.Kind.SI(),
		Ratio: finite(r.Ratio), Status: r.Status, Basis: r.Basis, Values: r.Values, Notes: r.Notes,
	}
	if r.NoLimit {
		j.Capacity, j.Ratio = nil, nil
	}
	if r.Required != 0 {
		j.Required = finite(r.Required)
		j.Provided = finite(r.Provided)
	}
	return json.Marshal(j)
}
