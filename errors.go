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

// Errors raised during the analysis are traced back to the field of the
// description that caused them, with advice where there is an obvious one.
// Each names where in the analysis it arose (a rope group, a bank, a load
// case) and wraps the checking package's error.

// deadLoadField returns the field that sets the walkway dead load.
func (b Bridge) deadLoadField() string {
	if len(b.Walkway.Parts) > 0 {
		return "walkway.parts"
	}
	return "walkway.dead_load"
}

// groupErr traces an error from the statics of rope group i under case lc.
func (m *model) groupErr(i int, lc LoadCase, err error) error {
	g := fmt.Sprintf("ropes[%d]", i)
	name := m.b.Ropes[i].Name
	where := fmt.Sprintf("%s, case %q", name, lc.Name)
	msg := err.Error()
	switch {
	case strings.Contains(msg, "strains the rope") && !lc.crowded() && !lc.windy() && lc.Temperature == m.b.Climate.Reference:
		return fieldErr(m.b.deadLoadField(), "%s: %w; the walkway's own weight strains the %s beyond what the rope model covers: lighten the walkway (%s) or use larger or more ropes (%s.rope.diameter, %s.count)",
			where, err, name, m.b.deadLoadField(), g, g)
	case strings.Contains(msg, "strains the rope"):
		return fieldErr(g+".rope", "%s: %w; the ropes strain beyond what the rope model covers: use larger or more ropes (%s.rope.diameter, %s.count) or a larger sag (%s.sag)",
			where, err, g, g, g)
	case strings.Contains(msg, "overflows"), strings.Contains(msg, "does not settle"), strings.Contains(msg, "converge"):
		return fieldErr(g+".sag", "%s: %w; the rope statics find no state: the sag %s is too small or too large for the span %s and the load; give a sag near 1/12 to 1/20 of the span",
			where, err, m.b.Ropes[i].Sag, m.b.Site.Span)
	}
	return fieldErr(g, "%s: %w", where, err)
}

// bankErr traces an error from part of one bank ("tower.saddle",
// "tower.section", "tower.footing", "anchor") under the named case.
func (m *model) bankErr(side Side, part, caseName string, err error) error {
	field := "banks." + side.String() + "." + part
	advice := ""
	switch part {
	case "tower.footing":
		advice = "; check the footing's size and depth (" + field + ") and the soil (banks." + side.String() + ".soil)"
	case "anchor":
		advice = "; check the anchor's size and depth (" + field + ") and the soil (banks." + side.String() + ".soil)"
	case "tower.section":
		advice = "; check the column size (banks." + side.String() + ".tower.depth, width), its concrete and bars"
	}
	return fieldErr(field, "%s side, case %q: %w%s", side, caseName, err, advice)
}
