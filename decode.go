package sagspan

import (
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"reflect"
	"strconv"
	"strings"
	"unicode/utf8"

	"github.com/sagspan/sagspan/units"
)

// decodeStrict decodes the JSON description in data into the value v
// points to, more strictly than encoding/json and with every error naming
// its field by path ("banks.left.anchor.length") and its place in the
// text (line and column):
//
//   - a syntax error gives its line and column;
//   - an unknown field is refused (with the nearest known name), and so is
//     a field given twice;
//   - a field whose JSON tag lacks omitempty is required;
//   - a type error is said in plain words ("want a whole number, got 2.5");
//   - a quantity field tagged `unit:"mm"` refuses a bare number, whose unit
//     a reader could not tell (a diameter of 20: mm or m?), and suggests
//     writing it with that unit.
//
// It returns the place of every field it met, for later errors.
func decodeStrict(data []byte, v any) (positions, error) {
	rv := reflect.ValueOf(v)
	if rv.Kind() != reflect.Pointer || rv.IsNil() {
		panic("sagspan: decodeStrict needs a non-nil pointer")
	}
	if err := syntaxCheck(data); err != nil {
		return nil, err
	}
	p := &treeParser{data: data}
	root := p.value()
	d := &decoder{data: data, at: positions{}}
	if err := d.value(root, rv.Elem(), "", fieldTag{}); err != nil {
		return d.at, err
	}
	return d.at, nil
}

// positions maps a field's path to the byte offset of its value.
type positions map[string]int

// place returns the line and column (both from 1, columns in characters)
// of byte offset off in data.
func place(data []byte, off int) (line, col int) {
	off = max(0, min(off, len(data)))
	line = 1 + strings.Count(string(data[:off]), "\n")
	start := strings.LastIndexByte(string(data[:off]), '\n') + 1
	return line, 1 + utf8.RuneCount(data[start:off])
}

// syntaxCheck returns nil for well-formed JSON, else an error giving the
// line and column where reading stopped, with a hint for the usual slips.
func syntaxCheck(data []byte) error {
	if json.Valid(data) {
		return nil
	}
	var x any
	err := json.Unmarshal(data, &x)
	var se *json.SyntaxError
	if !errors.As(err, &se) {
		return &FieldError{Err: fmt.Errorf("not JSON: %w", err)}
	}
	off := int(se.Offset) - 1 // the offending byte
	if se.Offset == 0 || off >= len(data) {
		off = len(data)
	}
	msg := strings.TrimPrefix(se.Error(), "json: ")
	if msg == "unexpected end of JSON input" {
		msg = "the text ends too early: a closing } or ] or a quote is missing"
	}
	prev := strings.TrimRight(string(data[:max(0, off)]), " \t\r\n")
	switch {
	case off < len(data) && (data[off] == '}' || data[off] == ']') && strings.HasSuffix(prev, ","):
		msg += " (a comma before a closing bracket: remove it)"
	case strings.Contains(msg, "after object key:value pair"), strings.Contains(msg, "after array element"):
		msg += " (a comma missing between two entries?)"
	case strings.Contains(msg, "looking for beginning of object key string") && off < len(data) && data[off] == '\'':
		msg += " (JSON quotes names with \", not ')"
	}
	line, col := place(data, off)
	return &FieldError{Line: line, Column: col, Err: errors.New("JSON syntax: " + msg)}
}

// jnode is one value of a well-formed JSON text, with its place.
type jnode struct {
	off, end int      // the value's bytes are data[off:end]
	kind     byte     // '{', '[', '"', '0' (number), 't', 'f', 'n' (null)
	members  []member // of an object, in the order written
	items    []*jnode // of an array
}

type member struct {
	key string
	off int // of the key
	val *jnode
}

// treeParser builds the jnode tree of JSON already known to be well formed.
type treeParser struct {
	data []byte
	i    int
}

func (p *treeParser) space() {
	for p.i < len(p.data) && strings.IndexByte(" \t\r\n", p.data[p.i]) >= 0 {
		p.i++
	}
}

func (p *treeParser) value() *jnode {
	p.space()
	n := &jnode{off: p.i}
	switch c := p.data[p.i]; c {
	case '{':
		n.kind = '{'
		p.i++
		for p.space(); p.data[p.i] != '}'; p.space() {
			koff := p.i
			k := p.str()
			var key string
			_ = json.Unmarshal(p.data[k.off:k.end], &key) // well formed
			p.space()
			p.i++ // ':'
			n.members = append(n.members, member{key: key, off: koff, val: p.value()})
			p.space()
			if p.data[p.i] == ',' {
				p.i++
			}
		}
		p.i++
	case '[':
		n.kind = '['
		p.i++
		for p.space(); p.data[p.i] != ']'; p.space() {
			n.items = append(n.items, p.value())
			p.space()
			if p.data[p.i] == ',' {
				p.i++
			}
		}
		p.i++
	case '"':
		return p.str()
	default:
		n.kind = c
		if c == '-' || (c >= '0' && c <= '9') {
			n.kind = '0'
		}
		for p.i < len(p.data) && strings.IndexByte(" \t\r\n,]}", p.data[p.i]) < 0 {
			p.i++
		}
	}
	n.end = p.i
	return n
}

func (p *treeParser) str() *jnode {
	n := &jnode{off: p.i, kind: '"'}
	p.i++
	for p.data[p.i] != '"' {
		if p.data[p.i] == '\\' {
			p.i++
		}
		p.i++
	}
	p.i++
	n.end = p.i
	return n
}

// fieldTag is what a struct field's tags say about decoding it.
type fieldTag struct {
	unit string // from `unit:"mm"`: a bare number is refused; write it in this unit
}

// decoder fills Go values from a jnode tree.
type decoder struct {
	data []byte
	at   positions
}

// fail returns a *FieldError at node n's place.
func (d *decoder) fail(n *jnode, path string, err error) error {
	fe := &FieldError{Field: path, Err: err}
	fe.Line, fe.Column = place(d.data, n.off)
	return fe
}

func (d *decoder) failf(n *jnode, path, format string, args ...any) error {
	return d.fail(n, path, fmt.Errorf(format, args...))
}

// describe says in words what node n holds, for "got ..." in errors.
func (d *decoder) describe(n *jnode) string {
	raw := string(d.data[n.off:n.end])
	switch n.kind {
	case '{':
		return "an object { … }"
	case '[':
		return "a list [ … ]"
	case 'n':
		return "null"
	}
	if utf8.RuneCountInString(raw) > 40 {
		raw = string([]rune(raw)[:37]) + "…"
	}
	return raw
}

var (
	unmarshalerType = reflect.TypeFor[json.Unmarshaler]()
	quantityType    = reflect.TypeFor[kinded]()
)

// kinded is a typed quantity of package units, outside type constraints.
type kinded interface{ Kind() units.Kind }

func join(path, name string) string {
	if path == "" {
		return name
	}
	return path + "." + name
}

func (d *decoder) value(n *jnode, v reflect.Value, path string, tag fieldTag) error {
	d.at[path] = n.off
	if n.kind == 'n' {
		return nil // null leaves the zero value, as encoding/json does
	}
	if reflect.PointerTo(v.Type()).Implements(unmarshalerType) {
		return d.unmarshaler(n, v, path, tag)
	}
	switch v.Kind() {
	case reflect.Pointer:
		if v.IsNil() {
			v.Set(reflect.New(v.Type().Elem()))
		}
		return d.value(n, v.Elem(), path, tag)
	case reflect.Struct:
		return d.object(n, v, path)
	case reflect.Slice:
		if n.kind != '[' {
			return d.failf(n, path, "want a list [ … ], got %s", d.describe(n))
		}
		s := reflect.MakeSlice(v.Type(), len(n.items), len(n.items))
		for i, item := range n.items {
			if err := d.value(item, s.Index(i), fmt.Sprintf("%s[%d]", path, i), tag); err != nil {
				return err
			}
		}
		v.Set(s)
		return nil
	case reflect.Int, reflect.Int8, reflect.Int16, reflect.Int32, reflect.Int64:
		raw := string(d.data[n.off:n.end])
		if n.kind != '0' {
			return d.failf(n, path, "want a whole number, got %s", d.describe(n))
		}
		i, err := strconv.ParseInt(raw, 10, 64)
		if err != nil {
			if x, ferr := strconv.ParseFloat(raw, 64); ferr == nil && x == math.Trunc(x) && math.Abs(x) < 1<<53 {
				i, err = int64(x), nil // 4e0 and 4.0 are whole
			}
		}
		if err != nil || v.OverflowInt(i) {
			return d.failf(n, path, "want a whole number, got %s", raw)
		}
		v.SetInt(i)
		return nil
	case reflect.Float32, reflect.Float64:
		switch n.kind {
		case '0':
			x, err := strconv.ParseFloat(string(d.data[n.off:n.end]), 64)
			if err != nil || math.IsInf(x, 0) {
				return d.failf(n, path, "want a finite number, got %s", d.describe(n))
			}
			v.SetFloat(x)
			return nil
		case '"':
			// A plain number may be written "50 %" or "1:2".
			var s string
			_ = json.Unmarshal(d.data[n.off:n.end], &s)
			r, err := units.Parse[units.Ratio](s)
			if err != nil {
				return d.failf(n, path, "want a plain number such as 0.5 (or \"50 %%\"), got %s", d.describe(n))
			}
			v.SetFloat(float64(r))
			return nil
		}
		return d.failf(n, path, "want a plain number such as 0.5, got %s", d.describe(n))
	case reflect.String:
		if n.kind != '"' {
			return d.failf(n, path, "want text in quotes, got %s", d.describe(n))
		}
		var s string
		_ = json.Unmarshal(d.data[n.off:n.end], &s)
		v.SetString(s)
		return nil
	case reflect.Bool:
		if n.kind != 't' && n.kind != 'f' {
			return d.failf(n, path, "want true or false, got %s", d.describe(n))
		}
		v.SetBool(n.kind == 't')
		return nil
	}
	if err := json.Unmarshal(d.data[n.off:n.end], v.Addr().Interface()); err != nil {
		return d.fail(n, path, err)
	}
	return nil
}

// unmarshaler decodes a value whose type reads itself: a quantity or a
// Level.
func (d *decoder) unmarshaler(n *jnode, v reflect.Value, path string, tag fieldTag) error {
	raw := d.data[n.off:n.end]
	if n.kind == '0' && tag.unit != "" && v.Type().Implements(quantityType) {
		x, _ := strconv.ParseFloat(string(raw), 64)
		k := v.Interface().(kinded).Kind()
		// A bare number below 1 was most likely meant in metres.
		hint := strconv.Quote(strconv.FormatFloat(x, 'g', -1, 64) + " " + tag.unit)
		if math.Abs(x) < 1 {
			hint = strconv.Quote(strconv.FormatFloat(x, 'g', -1, 64) + " " + k.SI())
		}
		return d.fail(n, path, &units.ParseError{Input: string(raw), Part: string(raw), Want: k, Err: units.ErrNoUnit, Hint: hint})
	}
	switch n.kind {
	case '{', '[', 't', 'f':
		kind := "a quantity"
		if q, ok := v.Interface().(kinded); ok {
			kind = "a " + q.Kind().String()
		}
		return d.failf(n, path, "want %s, a number or a string with its unit, got %s", kind, d.describe(n))
	}
	if err := v.Addr().Interface().(json.Unmarshaler).UnmarshalJSON(raw); err != nil {
		return d.fail(n, path, err)
	}
	return nil
}

// jsonName returns the JSON name of a struct field and whether it may be
// left out (omitempty); "" for a field JSON ignores.
func jsonName(f reflect.StructField) (name string, optional bool) {
	if !f.IsExported() {
		return "", false
	}
	tag := f.Tag.Get("json")
	name, opts, _ := strings.Cut(tag, ",")
	if name == "-" && opts == "" {
		return "", false
	}
	if name == "" {
		name = f.Name
	}
	return name, strings.Contains(","+opts+",", ",omitempty,")
}

func (d *decoder) object(n *jnode, v reflect.Value, path string) error {
	if n.kind != '{' {
		return d.failf(n, path, "want an object { … }, got %s", d.describe(n))
	}
	t := v.Type()
	type field struct {
		index    int
		optional bool
	}
	known := make(map[string]field, t.NumField())
	var names []string
	for i := range t.NumField() {
		if name, optional := jsonName(t.Field(i)); name != "" {
			known[name] = field{i, optional}
			names = append(names, name)
		}
	}
	seen := make(map[string]member, len(n.members))
	for _, m := range n.members {
		p := join(path, m.key)
		if first, dup := seen[m.key]; dup {
			l, c := place(d.data, first.off)
			return d.fail(m.val, p, fmt.Errorf("given twice (first at line %d, column %d); keep one", l, c))
		}
		seen[m.key] = m
		f, ok := known[m.key]
		if !ok {
			fe := d.fail(&jnode{off: m.off}, p, errUnknownField).(*FieldError)
			if near := nearest(m.key, names); near != "" {
				fe.Err = fmt.Errorf("%w; did you mean %q?", errUnknownField, near)
			}
			return fe
		}
		sf := t.Field(f.index)
		if err := d.value(m.val, v.Field(f.index), p, fieldTag{unit: sf.Tag.Get("unit")}); err != nil {
			return err
		}
	}
	for _, name := range names {
		f := known[name]
		if m, ok := seen[name]; f.optional || (ok && m.val.kind != 'n') {
			continue
		}
		fe := d.fail(n, join(path, name), errors.New(missing(t.Field(f.index)))).(*FieldError)
		if m, ok := seen[name]; ok {
			fe.Line, fe.Column = place(d.data, m.val.off)
		}
		return fe
	}
	return nil
}

// missing says that a required field is missing and what to give.
func missing(f reflect.StructField) string {
	t := f.Type
	switch {
	case t == reflect.TypeFor[Level]():
		return `is missing; give the level, such as "100 m", or "none" when there is none`
	case t.Implements(quantityType):
		k := reflect.Zero(t).Interface().(kinded).Kind()
		ex := units.Example(1, k)
		if u := f.Tag.Get("unit"); u != "" {
			ex = strconv.Quote("1 " + u)
		}
		return fmt.Sprintf("is missing; give %s with its unit, such as %s", article(k.String()), ex)
	case t.Kind() == reflect.Struct:
		return "is missing; give it as an object { … }"
	case t.Kind() == reflect.Slice:
		return "is missing; give it as a list [ … ]"
	case t.Kind() == reflect.String:
		return "is missing; give it as text in quotes"
	}
	return "is missing; it is required"
}

func article(noun string) string {
	if noun != "" && strings.ContainsRune("aeiou", rune(noun[0])) {
		return "an " + noun
	}
	return "a " + noun
}

// nearest returns the name among names closest to s by edit distance,
// when it is close enough to be the one meant; "" otherwise.
func nearest(s string, names []string) string {
	best, dist := "", math.MaxInt
	for _, n := range names {
		if d := editDistance(strings.ToLower(s), n); d < dist {
			best, dist = n, d
		}
	}
	if dist <= max(2, len(s)/3) {
		return best
	}
	return ""
}

// editDistance is the Levenshtein distance between a and b.
func editDistance(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			c := 1
			if ra[i-1] == rb[j-1] {
				c = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+c)
		}
		prev, cur = cur, prev
	}
	return prev[len(rb)]
}
