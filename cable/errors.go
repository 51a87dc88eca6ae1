package cable

import (
	"errors"
	"fmt"
	"math"
)

// ErrInvalid is wrapped by every error caused by bad input: a NaN or
// infinite value, a non-positive span, sag, length, stiffness or weight, a
// rope shorter than the chord, or a load patch outside the span.
var ErrInvalid = errors.New("invalid input")

// ErrNoConvergence is wrapped by the error of an iterative solver that did
// not reach its tolerance.
var ErrNoConvergence = errors.New("no convergence")

func invalidf(format string, args ...any) error {
	return fmt.Errorf("cable: "+format+": %w", append(args, ErrInvalid)...)
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

// allFinite reports whether every value is finite.
func allFinite(xs ...float64) bool {
	for _, x := range xs {
		if !finite(x) {
			return false
		}
	}
	return true
}

var errOutOfRange = fmt.Errorf("cable: input out of range: the result overflows float64: %w", ErrInvalid)

func errNoConv(what string) error {
	return fmt.Errorf("cable: %s: solver did not converge: %w", what, ErrNoConvergence)
}
