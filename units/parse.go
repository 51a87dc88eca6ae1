package units

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
)

// Sentinel errors wrapped by *ParseError, for use with errors.Is.
var (
	ErrSyntax      = errors.New("units: malformed quantity")
	ErrUnknownUnit = errors.New("units: unknown unit")
	ErrDimension   = errors.New("units: wrong kind of unit")
	ErrRange       = errors.New("units: value out of range")
	// ErrNoUnit reports a bare number where the unit cannot be guessed:
	// a temperature (°C or K?), an angle (degrees or radians?), or a
	// quantity a caller marks as needing its unit.
	ErrNoUnit = errors.New("units: number without its unit")
)

// ParseError reports a quantity string that could not be parsed. Part is
// the offending piece of Input.
type ParseError struct {
	Input string // the whole string given
	Part  string // the piece that is wrong
	Want  Kind   // the kind that was expected
	Err   error  // one of the sentinel errors
	// Hint, when set, says how to write the quantity instead, such as
	// `write 72.5 with a decimal point` or, with ErrNoUnit, the example
	// `"20 mm"`.
	Hint string
}

func (e *ParseError) Error() string {
	switch {
	case errors.Is(e.Err, ErrNoUnit):
		return fmt.Sprintf("units: a bare %s is ambiguous for %s; write it with its unit, such as %s",
			e.Input, article(e.Want.String()), e.Hint)
	case e.Hint != "":
		return fmt.Sprintf("units: %q: %s", e.Input, e.Hint)
	case errors.Is(e.Err, ErrUnknownUnit):
		return fmt.Sprintf("units: %q: unknown unit %q for a %s", e.Input, e.Part, e.Want)
	case errors.Is(e.Err, ErrDimension):
		return fmt.Sprintf("units: %q: unit %q is not a unit of %s", e.Input, e.Part, e.Want)
	case errors.Is(e.Err, ErrRange):
		return fmt.Sprintf("units: %q: number %q is not finite", e.Input, e.Part)
	default:
		return fmt.Sprintf("units: %q: cannot read %q as a number with a unit of %s", e.Input, e.Part, e.Want)
	}
}

func (e *ParseError) Unwrap() error { return e.Err }

// article returns the noun with "a" or "an" before it.
func article(noun string) string {
	if noun != "" && strings.ContainsRune("aeiou", rune(noun[0])) {
		return "an " + noun
	}
	return "a " + noun
}

// symbol is one unit symbol: SI value = number·scale + offset.
type symbol struct {
	dim    dim
	scale  float64
	offset float64
}

// symbols maps normalised unit symbols (see normalise) to their meaning.
var symbols = map[string]symbol{
	"m": {dimLength, 1, 0}, "mm": {dimLength, 1e-3, 0}, "cm": {dimLength, 1e-2, 0}, "km": {dimLength, 1e3, 0},

	"N": {dimForce, 1, 0}, "kN": {dimForce, 1e3, 0}, "MN": {dimForce, 1e6, 0},

	"Pa": {dimPressure, 1, 0}, "kPa": {dimPressure, 1e3, 0}, "MPa": {dimPressure, 1e6, 0}, "GPa": {dimPressure, 1e9, 0},
	"N/m2": {dimPressure, 1, 0}, "kN/m2": {dimPressure, 1e3, 0}, "N/mm2": {dimPressure, 1e6, 0}, "kN/mm2": {dimPressure, 1e9, 0},

	"rad": {dimAngle, 1, 0}, "deg": {dimAngle, math.Pi / 180, 0},

	"kg": {dimMass, 1, 0}, "g": {dimMass, 1e-3, 0}, "t": {dimMass, 1e3, 0},

	"K": {dimTemperature, 1, 0}, "C": {dimTemperature, 1, celsiusOffset}, "degC": {dimTemperature, 1, celsiusOffset},

	"m2": {dimArea, 1, 0}, "mm2": {dimArea, 1e-6, 0}, "cm2": {dimArea, 1e-4, 0},
	"m3": {dimVolume, 1, 0},

	"N/m": {dimLineLoad, 1, 0}, "kN/m": {dimLineLoad, 1e3, 0},

	"N/m3": {dimUnitWeight, 1, 0}, "kN/m3": {dimUnitWeight, 1e3, 0},

	"Nm": {dimMoment, 1, 0}, "kNm": {dimMoment, 1e3, 0}, "MNm": {dimMoment, 1e6, 0},

	"1/K": {dimInvTemp, 1, 0}, "/K": {dimInvTemp, 1, 0}, "1/C": {dimInvTemp, 1, 0}, "/C": {dimInvTemp, 1, 0},
	"µ/K": {dimInvTemp, 1e-6, 0},

	"kg/m": {dimMassPerLen, 1, 0},
	"m/s":  {dimVelocity, 1, 0}, "km/h": {dimVelocity, 1 / 3.6, 0},
	"Hz":   {dimFrequency, 1, 0},
	"m/s2": {dimAccel, 1, 0},

	"%": {dimNone, 1e-2, 0},
}

// normalise folds superscripts and the degree sign, so "kN/m³" reads
// "kN/m3" and "°C" reads "degC". Spaces and multiplication dots are dealt
// with by lookup.
var normalise = strings.NewReplacer(
	"²", "2", "³", "3", "°", "deg", "μ", "µ",
).Replace

// products are the units written as a product of two symbols: "kN·m",
// "kN m" and "kNm" all read "kNm". No other unit may be split, so that a
// slip such as "0.35 m m" is an error rather than 0.35 mm.
var products = map[string]bool{"Nm": true, "kNm": true, "MNm": true}

// unitTokens splits a unit at spaces and multiplication dots, after
// closing up spaces around a slash ("kN / m" is "kN/m").
func unitTokens(u string) []string {
	u = strings.NewReplacer("·", " ", "⋅", " ", "*", " ", "\t", " ").Replace(u)
	for strings.Contains(u, " /") || strings.Contains(u, "/ ") {
		u = strings.ReplaceAll(strings.ReplaceAll(u, " /", "/"), "/ ", "/")
	}
	return strings.Fields(u)
}

// lookup finds the unit symbol u: one symbol, or one of the products
// written in two parts.
func lookup(u string) (symbol, bool) {
	tokens := unitTokens(u)
	joined := normalise(strings.Join(tokens, ""))
	if len(tokens) > 1 && !products[joined] {
		return symbol{}, false
	}
	sym, ok := symbols[joined]
	return sym, ok
}

// numberSlip returns a hint when the text after a number shows the number
// was mistyped: a decimal comma ("72,5 m"), a thousands separator
// ("1,200 m") or a space inside the number ("1 200 m"); "" otherwise.
func numberSlip(number, rest string) string {
	switch {
	case strings.HasPrefix(rest, ","):
		return fmt.Sprintf("%q has a comma in the number; write it with a decimal point and no thousands separator, such as %q",
			number+rest, number+"."+strings.TrimLeft(rest, ","))
	case rest[0] >= '0' && rest[0] <= '9':
		return fmt.Sprintf("a space inside the number %q; write the number without spaces", number+" "+rest)
	}
	return ""
}

// Example returns x written with the unit a person would use for a
// quantity of kind k, as a quoted JSON string: "12 m" for a length, "-10 C"
// for a temperature, "30 deg" for an angle. It is the suggestion an error
// about a missing unit gives.
func Example(x float64, k Kind) string {
	switch k {
	case KindTemperature:
		return strconv.Quote(strconv.FormatFloat(x, 'g', -1, 64) + " C")
	case KindAngle:
		return strconv.Quote(strconv.FormatFloat(x, 'g', -1, 64) + " deg")
	}
	u, ok := exampleUnits[k]
	if !ok {
		return strconv.Quote(strconv.FormatFloat(x, 'g', -1, 64))
	}
	return strconv.Quote(strconv.FormatFloat(x, 'g', -1, 64) + " " + u)
}

// exampleUnits are the units Example writes each kind in.
var exampleUnits = map[Kind]string{
	KindLength: "m", KindForce: "kN", KindPressure: "kPa", KindMass: "kg", KindArea: "mm2",
	KindVolume: "m3", KindLoadPerLength: "kN/m", KindUnitWeight: "kN/m3", KindMoment: "kN m",
	KindAxialStiffness: "MN", KindThermalExpansion: "/K", KindMassPerLength: "kg/m",
	KindVelocity: "m/s", KindFrequency: "Hz",
}

// Parse reads a quantity of type T from s: a number followed by a unit
// symbol, such as "12.5 kN", "3.5 kN/m", "24 kN/m3", "30 deg", "-10 C" or,
// for ratios, "1:12" or "8 %". A bare number is taken as SI (for a Ratio,
// as the ratio itself), except for a temperature or an angle, whose bare
// number is ambiguous (°C or K, degrees or radians) and refused with
// ErrNoUnit. The unit must be one of kind T and one symbol (a moment may
// be written "kN m" or "kN·m"; "0.35 m m" is refused); a decimal comma is
// refused with a hint. Errors are *ParseError values naming the offending
// part.
//
// Special cases: NaN and infinite numbers are rejected with ErrRange.
func Parse[T Quantity](s string) (T, error) {
	var zero T
	v, err := parseKind(s, zero.Kind())
	return T(v), err
}

// MustParse is like Parse but panics on error. It is for literals in
// programs and tests, never for user data.
func MustParse[T Quantity](s string) T {
	v, err := Parse[T](s)
	if err != nil {
		panic(err)
	}
	return v
}

func parseKind(s string, want Kind) (float64, error) {
	in := strings.TrimSpace(s)
	fail := func(part string, err error) (float64, error) {
		return 0, &ParseError{Input: s, Part: part, Want: want, Err: err}
	}
	if in == "" {
		return fail(s, ErrSyntax)
	}
	if want == KindRatio {
		if a, b, ok := strings.Cut(in, ":"); ok {
			x, err := parseNumber(a)
			if err != nil {
				return fail(a, err)
			}
			y, err := parseNumber(b)
			if err != nil {
				return fail(b, err)
			}
			if y == 0 {
				return fail(b, ErrRange)
			}
			return x / y, nil
		}
	}
	n := numberPrefix(in)
	x, err := parseNumber(in[:n])
	if err != nil {
		return fail(in[:n], err)
	}
	rest := strings.TrimSpace(in[n:])
	if rest == "" {
		if kinds[want].needsUnit {
			return 0, &ParseError{Input: in, Part: in, Want: want, Err: ErrNoUnit, Hint: Example(x, want)}
		}
		return x, nil
	}
	if hint := numberSlip(in[:n], rest); hint != "" {
		return 0, &ParseError{Input: s, Part: rest, Want: want, Err: ErrSyntax, Hint: hint}
	}
	sym, ok := lookup(rest)
	if !ok {
		pe := &ParseError{Input: s, Part: rest, Want: want, Err: ErrUnknownUnit}
		if tokens := unitTokens(rest); len(tokens) > 1 {
			pe.Hint = fmt.Sprintf("%q is not one unit; write a single unit symbol, such as %q", rest, in[:n]+" "+tokens[0])
		}
		return 0, pe
	}
	if sym.dim != kinds[want].dim {
		return fail(rest, ErrDimension)
	}
	v := x*sym.scale + sym.offset
	if math.IsInf(v, 0) {
		return fail(in[:n], ErrRange)
	}
	return v, nil
}

func parseNumber(s string) (float64, error) {
	s = strings.TrimSpace(s)
	if s == "" {
		return 0, ErrSyntax
	}
	// Refuse the spellings strconv accepts but an engineer never means.
	for _, r := range s {
		if !strings.ContainsRune("0123456789+-.eE_", r) || r == '_' {
			return 0, ErrSyntax
		}
	}
	x, err := strconv.ParseFloat(s, 64)
	if err != nil {
		var ne *strconv.NumError
		if errors.As(err, &ne) && errors.Is(ne.Err, strconv.ErrRange) {
			return 0, ErrRange
		}
		return 0, ErrSyntax
	}
	return x, nil
}

// numberPrefix returns the length of the leading number in s: an optional
// sign, digits with at most one decimal point, and an exponent only where
// the 'e' is followed by a digit (so "3 e" is not eaten).
func numberPrefix(s string) int {
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	for i < len(s) && (isDigit(s[i]) || s[i] == '.') {
		i++
	}
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		if j < len(s) && isDigit(s[j]) {
			for j < len(s) && isDigit(s[j]) {
				j++
			}
			i = j
		}
	}
	return i
}

func isDigit(c byte) bool { return '0' <= c && c <= '9' }
