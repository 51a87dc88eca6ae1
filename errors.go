package sagspan

import (
	"errors"
	"fmt"
	"strings"
)

// ErrInvalid is wrapped by every error about a bridge description that
// cannot be checked as given.
var ErrInvalid = errors.New("sagspan: invalid bridge description")

var errUnknownField = errors.New("unknown field")

// FieldError names the field of a bridge description that is wrong, by its
// JSON path, such as "banks.left.anchor.length" or "ropes[1].rope", and,
// when the description was read from JSON text, its place there.
type FieldError struct {
	Field string
	// Line and Column place the field's value in the JSON text, both from
	// 1; zero when not known (a description built in Go).
	Line, Column int
	Err          error
}

// Error returns the message, such as
//
//	sagspan: bridge description: banks.left.anchor.bars: want a whole number, got 2.5 (line 72, column 18)
func (e *FieldError) Error() string {
	var b strings.Builder
	b.WriteString("sagspan: bridge description: ")
	if e.Field != "" {
		b.WriteString(e.Field)
		b.WriteString(": ")
	}
	fmt.Fprint(&b, e.Err)
	if e.Line > 0 {
		fmt.Fprintf(&b, " (line %d, column %d)", e.Line, e.Column)
	}
	return b.String()
}

// Unwrap returns both the cause and ErrInvalid, so errors.Is works with
// either.
func (e *FieldError) Unwrap() []error { return []error{e.Err, ErrInvalid} }

func fieldErr(field, format string, args ...any) error {
	return &FieldError{Field: field, Err: fmt.Errorf(format, args...)}
}

// locate sets the place of a *FieldError inside err from the positions
// the decoder recorded: the field's own, or the nearest enclosing one.
func locate(err error, data []byte, at positions) {
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Line > 0 || at == nil {
		return
	}
	for p := fe.Field; p != ""; p = parent(p) {
		if off, ok := at[p]; ok {
			fe.Line, fe.Column = place(data, off)
			return
		}
	}
}

// parent returns the path of the field enclosing path p: "a.b[2]" → "a.b",
// "a.b" → "a", "a" → "".
func parent(p string) string {
	if strings.HasSuffix(p, "]") {
		if i := strings.LastIndexByte(p, '['); i >= 0 {
			return p[:i]
		}
	}
	if i := strings.LastIndexByte(p, '.'); i >= 0 {
		return p[:i]
	}
	return ""
}
