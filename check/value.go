package check

import (
	"encoding/json"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// Value is a named intermediate quantity of a check: what a program or a
// checker needs to follow the result, such as the normal force on a base
// or the inclination exponent of a bearing formula. Values are held in SI
// of their Kind, like the result's demand and capacity.
type Value struct {
	// Symbol is the quantity's symbol as the method writes it, such as
	// "N", "e", "q_min" or "i_q". Within one result a symbol is unique.
	Symbol string
	// Meaning says in words what the quantity is, such as "normal force on
	// the base".
	Meaning string
	// Value is the quantity in SI units of Kind.
	Value float64
	// Kind is the physical quantity; units.KindRatio for pure numbers.
	Kind units.Kind
}

// Of returns the Value of the typed quantity x, its kind taken from its
// type:
//
//	check.Of("N", "normal force on the base", units.Force(1.2e6))
//	check.Of("m", "inclination exponent", units.Ratio(1.6))
func Of[T units.Quantity](symbol, meaning string, x T) Value {
	return Value{Symbol: symbol, Meaning: meaning, Value: float64(x), Kind: x.Kind()}
}

// String formats the value as "symbol = value unit (meaning)".
func (v Value) String() string {
	s := v.Symbol + " = " + strings.TrimSpace(units.Format(v.Value, v.Kind))
	if v.Meaning != "" {
		s += " (" + v.Meaning + ")"
	}
	return s
}

// valueJSON is the JSON form of a Value: SI value with its unit; null for a
// value that is not finite.
type valueJSON struct {
	Symbol  string   `json:"symbol"`
	Meaning string   `json:"meaning"`
	Value   *float64 `json:"value"`
	Unit    string   `json:"unit"`
	Kind    string   `json:"kind"`
}

// MarshalJSON writes the value in SI with its unit and kind name.
func (v Value) MarshalJSON() ([]byte, error) {
	return json.Marshal(valueJSON{Symbol: v.Symbol, Meaning: v.Meaning, Value: finite(v.Value), Unit: v.Kind.SI(), Kind: v.Kind.String()})
}

// WithValues returns a copy of r with the values appended; a value whose
// symbol r already carries replaces it, so a symbol stays unique.
func (r Result) WithValues(values ...Value) Result {
	out := make([]Value, len(r.Values), len(r.Values)+len(values))
	copy(out, r.Values)
	// seen has a bit set for every symbol out holds (by length and first
	// byte): a value whose bit is clear has a symbol out does not hold, and
	// is appended without a search.
	var seen uint64
	for i := range out {
		seen |= symbolBit(out[i].Symbol)
	}
	for _, v := range values {
		bit := symbolBit(v.Symbol)
		replaced := false
		if seen&bit != 0 {
			for i := range out {
				if out[i].Symbol == v.Symbol {
					out[i], replaced = v, true
					break
				}
			}
		}
		if !replaced {
			out = append(out, v)
			seen |= bit
		}
	}
	r.Values = out
	return r
}

// symbolBit returns the bit of WithValues' filter for a symbol: equal
// symbols have the same bit.
func symbolBit(s string) uint64 {
	h := uint(len(s))
	if len(s) > 0 {
		h = h*31 + uint(s[0])
	}
	return 1 << (h % 64)
}

// Value returns the value r carries under symbol, and false when it carries
// none.
func (r Result) Value(symbol string) (Value, bool) {
	for _, v := range r.Values {
		if v.Symbol == symbol {
			return v, true
		}
	}
	return Value{}, false
}
