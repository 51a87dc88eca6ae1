package sagspan

import (
	"bytes"
	"encoding/json"
	"reflect"
	"strconv"
)

// MarshalJSON writes the description as JSON that Parse reads back to the
// same Bridge: quantities as bare SI numbers, except those whose bare
// number Parse refuses (temperatures, angles and the fields tagged
// `unit:"mm"`), which are written with their SI unit, such as "0.032 m".
// Fields tagged omitempty are left out when zero.
func (b Bridge) MarshalJSON() ([]byte, error) {
	var buf bytes.Buffer
	if err := encodeValue(&buf, reflect.ValueOf(b), ""); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

// encodeValue writes v; unit is its field's `unit` tag.
func encodeValue(buf *bytes.Buffer, v reflect.Value, unit string) error {
	if unit != "" && v.Type().Implements(quantityType) {
		k := v.Interface().(kinded).Kind()
		s, err := json.Marshal(strconv.FormatFloat(v.Float(), 'g', -1, 64) + " " + k.SI())
		buf.Write(s)
		return err
	}
	if v.Type() != reflect.TypeFor[Bridge]() && v.Type().Implements(reflect.TypeFor[json.Marshaler]()) {
		s, err := json.Marshal(v.Interface())
		buf.Write(s)
		return err
	}
	switch v.Kind() {
	case reflect.Pointer: // an optional field given: its value, zero too
		if v.IsNil() {
			buf.WriteString("null")
			return nil
		}
		return encodeValue(buf, v.Elem(), unit)
	case reflect.Struct:
		buf.WriteByte('{')
		first := true
		t := v.Type()
		for i := range t.NumField() {
			f := t.Field(i)
			name, optional := jsonName(f)
			if name == "" || (optional && v.Field(i).IsZero()) {
				continue
			}
			if !first {
				buf.WriteByte(',')
			}
			first = false
			key, _ := json.Marshal(name)
			buf.Write(key)
			buf.WriteByte(':')
			if err := encodeValue(buf, v.Field(i), f.Tag.Get("unit")); err != nil {
				return err
			}
		}
		buf.WriteByte('}')
		return nil
	case reflect.Slice:
		if v.IsNil() {
			buf.WriteString("null")
			return nil
		}
		buf.WriteByte('[')
		for i := range v.Len() {
			if i > 0 {
				buf.WriteByte(',')
			}
			if err := encodeValue(buf, v.Index(i), unit); err != nil {
				return err
			}
		}
		buf.WriteByte(']')
		return nil
	}
	s, err := json.Marshal(v.Interface())
	buf.Write(s)
	return err
}
