package tower

import (
	"errors"
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// Sentinel errors wrapped by every error this package returns, for use with
// errors.Is.
var (
	// ErrInvalid reports input data that is out of range, not finite or
	// inconsistent (a negative tension, a facing thicker than the column).
	ErrInvalid = errors.New("tower: invalid input")
	// ErrLiftOff reports forces that do not press down: a rope lifting off
	// a sliding or roller saddle, or a net upward force at a base, where
	// no eccentricity or contact pressure exists.
	ErrLiftOff = errors.New("tower: no downward force")
	// ErrUnsupported reports a case outside the scope of the method used,
	// such as a steel tube wall too slender for the clauses implemented.
	ErrUnsupported = errors.New("tower: outside the scope of the method")
)

// invalid returns an error naming the offending field and value.
func invalid(field string, value any, why string) error {
	return fmt.Errorf("tower: %s = %v %s: %w", field, value, why, ErrInvalid)
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// The checks below are generic so that a valid value is never boxed into an
// interface: validation on the hot path does not allocate.

// positive checks that x is finite and > 0.
func positive[T units.Quantity](field string, x T) error {
	if v := float64(x); !finite(v) || v <= 0 {
		return invalid(field, x, "must be a positive finite number")
	}
	return nil
}

// nonNegative checks that x is finite and >= 0.
func nonNegative[T units.Quantity](field string, x T) error {
	if v := float64(x); !finite(v) || v < 0 {
		return invalid(field, x, "must be zero or a positive finite number")
	}
	return nil
}

// isFinite checks that x is finite.
func isFinite[T units.Quantity](field string, x T) error {
	if !finite(float64(x)) {
		return invalid(field, x, "must be finite")
	}
	return nil
}
