package foundation

import (
	"errors"
	"math"
)

// Sentinel errors. Every error returned by this package wraps one of them,
// so callers can test with errors.Is.
var (
	// ErrInvalid reports input that is out of range or not a number.
	ErrInvalid = errors.New("foundation: invalid input")
	// ErrOutsideBase reports a resultant whose eccentricity reaches or
	// passes the edge of the base: the base would tip, no pressure
	// distribution exists.
	ErrOutsideBase = errors.New("foundation: resultant outside the base")
	// ErrUnknownSoil reports a soil name that no preset has.
	ErrUnknownSoil = errors.New("foundation: unknown soil")
)

// InputError names the input field that is wrong and why. It wraps
// ErrInvalid.
type InputError struct {
	Field   string // such as "AnchorBlock.Length"
	Problem string // such as "must be positive"
}

// Error returns "foundation: Field Problem".
func (e *InputError) Error() string { return "foundation: " + e.Field + " " + e.Problem }

// Unwrap returns ErrInvalid.
func (e *InputError) Unwrap() error { return ErrInvalid }

func invalid(field, problem string) error { return &InputError{Field: field, Problem: problem} }

// positive returns an error unless x is finite and > 0.
func positive(field string, x float64) error {
	if !(x > 0) || math.IsInf(x, 0) {
		return invalid(field, "must be a positive finite number")
	}
	return nil
}

// nonNegative returns an error unless x is finite and >= 0.
func nonNegative(field string, x float64) error {
	if !(x >= 0) || math.IsInf(x, 0) {
		return invalid(field, "must be a finite number, zero or more")
	}
	return nil
}

// finite returns an error unless x is a finite number.
func finite(field string, x float64) error {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return invalid(field, "must be a finite number")
	}
	return nil
}

// fraction returns an error unless 0 <= x <= 1.
func fraction(field string, x float64) error {
	if !(x >= 0 && x <= 1) {
		return invalid(field, "must be between 0 and 1")
	}
	return nil
}
