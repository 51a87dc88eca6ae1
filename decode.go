package sagspan

import (
	"bytes"
	"encoding/json"
	"fmt"
	"reflect"
	"sort"
	"strings"
)

// decodeStrict decodes JSON data into the value v points to, rejecting
// unknown fields, and wraps every error with the path of the offending
// field ("banks.left.anchor.length"), which encoding/json alone does not
// give for errors from a field's own UnmarshalJSON.
func decodeStrict(data []byte, v any) error {
	rv := reflect.ValueOf(v)
	if rv.Kind() != reflect.Pointer || rv.IsNil() {
		panic("sagspan: decodeStrict needs a non-nil pointer")
	}
	return decodeValue(bytes.TrimSpace(data), rv.Elem(), "")
}

var unmarshalerType = reflect.TypeFor[json.Unmarshaler]()

func join(path, name string) string {
	if path == "" {
		return name
	}
	return path + "." + name
}

func decodeValue(raw []byte, v reflect.Value, path string) error {
	if bytes.Equal(raw, []byte("null")) {
		return nil // leave the zero value, as encoding/json does
	}
	if reflect.PointerTo(v.Type()).Implements(unmarshalerType) {
		if err := json.Unmarshal(raw, v.Addr().Interface()); err != nil {
			return &FieldError{Field: path, Err: err}
		}
		return nil
	}
	switch v.Kind() {
	case reflect.Pointer:
		if v.IsNil() {
			v.Set(reflect.New(v.Type().Elem()))
		}
		return decodeValue(raw, v.Elem(), path)
	case reflect.Struct:
		var fields map[string]json.RawMessage
		if err := json.Unmarshal(raw, &fields); err != nil {
			return &FieldError{Field: path, Err: fmt.Errorf("want an object: %w", err)}
		}
		known := make(map[string]int)
		t := v.Type()
		for i := range t.NumField() {
			f := t.Field(i)
			if !f.IsExported() {
				continue
			}
			name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
			if name == "-" {
				continue
			}
			if name == "" {
				name = f.Name
			}
			known[name] = i
		}
		keys := make([]string, 0, len(fields))
		for k := range fields {
			keys = append(keys, k)
		}
		sort.Strings(keys)
		for _, k := range keys {
			i, ok := known[k]
			if !ok {
				return &FieldError{Field: join(path, k), Err: errUnknownField}
			}
			if err := decodeValue(bytes.TrimSpace(fields[k]), v.Field(i), join(path, k)); err != nil {
				return err
			}
		}
		return nil
	case reflect.Slice:
		var items []json.RawMessage
		if err := json.Unmarshal(raw, &items); err != nil {
			return &FieldError{Field: path, Err: fmt.Errorf("want a list: %w", err)}
		}
		s := reflect.MakeSlice(v.Type(), len(items), len(items))
		for i, item := range items {
			if err := decodeValue(bytes.TrimSpace(item), s.Index(i), fmt.Sprintf("%s[%d]", path, i)); err != nil {
				return err
			}
		}
		v.Set(s)
		return nil
	default:
		if err := json.Unmarshal(raw, v.Addr().Interface()); err != nil {
			return &FieldError{Field: path, Err: err}
		}
		return nil
	}
}
