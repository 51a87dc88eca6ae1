package sagspan

import (
	"errors"
	"fmt"
)

// ErrInvalid is wrapped by every error about a bridge description that
// cannot be checked as given.
var ErrInvalid = errors.New("sagspan: invalid bridge description")

var errUnknownField = errors.New("unknown field")

// FieldError names the field of a bridge description that is wrong, by its
// JSON path, such as "banks.left.anchor.length" or "ropes[1].rope".
type FieldError struct {
	Field string
	Err   error
}

func (e *FieldError) Error() string {
	if e.Field == "" {
		return fmt.Sprintf("sagspan: bridge description: %v", e.Err)
	}
	return fmt.Sprintf("sagspan: bridge description: %s: %v", e.Field, e.Err)
}

// Unwrap returns both the cause and ErrInvalid, so errors.Is works with
// either.
func (e *FieldError) Unwrap() []error { return []error{e.Err, ErrInvalid} }

func fieldErr(field, format string, args ...any) error {
	return &FieldError{Field: field, Err: fmt.Errorf(format, args...)}
}
