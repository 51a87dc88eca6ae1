package sagspan

//go:generate go test -run ^(TestFieldDocs|TestFieldReference|TestREADMEUsingItFromGo)$ -update .

import (
	"fmt"
	"reflect"
	"strconv"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// The description documents itself: fieldDocs (fields_gen.go, generated
// from the doc comments of the description's types by TestFieldDocs) gives
// each field's meaning, limits its plausible range, and its Go type and
// JSON tag the rest. The README's field reference and the design-basis
// section of every report are built from these, so a field added to the
// description appears in both without further work.

// fieldInfo describes one field of a description.
type fieldInfo struct {
	Path     string // JSON path, such as "banks.left.tower.height" or "ropes[0].sag"
	Key      string // Go type and field, such as "TowerSpec.Height"
	Doc      string // the field's doc comment, on one line
	Optional bool   // omitempty: may be left out (zero then means its default)
	Unit     string // the `unit` tag: a bare number is refused
	Type     reflect.Type
	Limit    *limit
}

// fieldOf returns what is known of field f of struct type t at path p.
func fieldOf(t reflect.Type, f reflect.StructField, p string) fieldInfo {
	_, optional := jsonName(f)
	key := t.Name() + "." + f.Name
	fi := fieldInfo{Path: p, Key: key, Doc: fieldDocs[key], Optional: optional, Unit: f.Tag.Get("unit"), Type: f.Type}
	if l, ok := limits[key]; ok {
		fi.Limit = &l
	}
	return fi
}

// isLeaf reports whether a field of type t is a value rather than a
// struct or list of structs to walk into.
func isLeaf(t reflect.Type) bool {
	if t.Kind() == reflect.Pointer {
		t = t.Elem() // an optional field whose presence counts
	}
	if t == reflect.TypeFor[Level]() {
		return true
	}
	if t.Kind() == reflect.Slice {
		t = t.Elem()
	}
	return t.Kind() != reflect.Struct
}

// walkValues calls leaf for every leaf field of the struct value v, whose
// path is p, with its value, in the order of the types.
func walkValues(v reflect.Value, p string, leaf func(fieldInfo, reflect.Value)) {
	t := v.Type()
	for i := range t.NumField() {
		f := t.Field(i)
		name, _ := jsonName(f)
		if name == "" {
			continue
		}
		fp := join(p, name)
		fv := v.Field(i)
		if f.Type.Kind() == reflect.Pointer { // presence decides: nil is not given, a value given counts, zero too
			fi := fieldOf(t, f, fp)
			switch {
			case fv.IsNil() && isLeaf(f.Type):
				leaf(fi, reflect.Zero(f.Type.Elem()))
			case fv.IsNil():
			case isLeaf(f.Type):
				fi.Optional = false
				leaf(fi, fv.Elem())
			default:
				walkValues(fv.Elem(), fp, leaf)
			}
			continue
		}
		switch {
		case isLeaf(f.Type):
			leaf(fieldOf(t, f, fp), fv)
		case f.Type.Kind() == reflect.Slice:
			for j := range fv.Len() {
				walkValues(fv.Index(j), fp+"["+strconv.Itoa(j)+"]", leaf)
			}
		default:
			walkValues(fv, fp, leaf)
		}
	}
}

// meaning returns the first sentence of a field's doc comment without the
// field's own name as its subject: "Span is the horizontal distance
// between the walkway-rope saddles." gives "the horizontal distance between
// the walkway-rope saddles".
func meaning(doc, goName string) string {
	s := firstSentence(doc)
	for _, verb := range []string{" is ", " are ", " sets ", " says ", " names ", " holds ", " picks "} {
		if rest, ok := strings.CutPrefix(s, goName+verb); ok {
			if verb == " is " || verb == " are " {
				return rest
			}
			return strings.TrimPrefix(verb, " ") + rest
		}
	}
	return s
}

// firstSentence returns s up to its first full stop that ends a sentence:
// one followed by a space and a capital letter ("cl. 4.5" does not end one).
func firstSentence(s string) string {
	for i := 0; i+2 < len(s); i++ {
		if s[i] == '.' && s[i+1] == ' ' && s[i+2] >= 'A' && s[i+2] <= 'Z' {
			return s[:i]
		}
	}
	return strings.TrimSuffix(s, ".")
}

// words turns a Go name into words: "UnitWeight" gives "unit weight".
func words(name string) string {
	var b strings.Builder
	for i, r := range name {
		if i > 0 && r >= 'A' && r <= 'Z' {
			b.WriteByte(' ')
		}
		b.WriteString(strings.ToLower(string(r)))
	}
	return b.String()
}

// formatLeaf writes the value of a leaf field for people: a quantity in
// engineering units, a level or "none", a number, text in quotes.
func formatLeaf(v reflect.Value) string {
	switch x := v.Interface().(type) {
	case Level:
		return x.String()
	case kinded:
		return units.Format(v.Float(), x.Kind())
	case string:
		return `"` + x + `"`
	}
	switch v.Kind() {
	case reflect.Float32, reflect.Float64:
		return units.Format(v.Float(), units.KindRatio)
	case reflect.Slice:
		parts := make([]string, v.Len())
		for i := range parts {
			parts[i] = formatLeaf(v.Index(i))
		}
		return strings.Join(parts, ", ")
	}
	return fmt.Sprint(v.Interface())
}

// describeType says what a field holds, for the field reference: the
// quantity and its SI unit, whether a bare number is refused.
func describeType(fi fieldInfo) string {
	t := fi.Type
	list := ""
	if t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	if t.Kind() == reflect.Slice {
		t, list = t.Elem(), "list of "
	}
	if t.Kind() == reflect.Pointer {
		t = t.Elem() // given or absent; zero counts when given
	}
	if t.Kind() == reflect.Map {
		return list + "object of " + describeType(fieldInfo{Type: t.Elem()}) + " by name"
	}
	if t == reflect.TypeFor[Level]() {
		return list + "elevation (m) or \"none\""
	}
	if t.Implements(quantityType) {
		k := reflect.Zero(t).Interface().(kinded).Kind()
		switch {
		case fi.Unit != "":
			return list + k.String() + ", with its unit (such as \"20 " + fi.Unit + "\")"
		case k == units.KindTemperature:
			return list + k.String() + ", with its unit (such as " + units.Example(-10, k) + ")"
		case k.NeedsUnit():
			return list + k.String() + ", with its unit (such as " + units.Example(30, k) + ")"
		}
		return list + k.String() + " (" + k.SI() + " if bare)"
	}
	switch t.Kind() {
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		return list + "whole number"
	case reflect.Float32, reflect.Float64:
		return list + "number"
	case reflect.String:
		return list + "text"
	case reflect.Bool:
		return list + "true or false"
	}
	return list + t.Kind().String()
}
