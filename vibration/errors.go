package vibration

import (
	"errors"
	"fmt"
	"math"
)

// ErrInvalid is wrapped by every error caused by bad input: a NaN or
// infinite value, a non-positive span, tension, stiffness, mass or damping,
// a rope whose static state does not carry its weight, a mesh too coarse
// for the modes asked for, or a mode index out of range.
var ErrInvalid = errors.New("invalid input")

func invalidf(format string, args ...any) error {
	return fmt.Errorf("vibration: "+format+": %w", append(args, ErrInvalid)...)
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// positive checks that x is finite and > 0.
func positive(name string, x float64) error {
	if !finite(x) || x <= 0 {
		return invalidf("%s must be positive and finite, got %g", name, x)
	}
	return nil
}

// nonNegative checks that x is finite and >= 0.
func nonNegative(name string, x float64) error {
	if !finite(x) || x < 0 {
		return invalidf("%s must be finite and not negative, got %g", name, x)
	}
	return nil
}
