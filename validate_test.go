package sagspan

import (
	"errors"
	"math"
	"reflect"
	"sort"
	"strings"
	"testing"
)

// numericLeaves calls leaf for every number field reachable from type t,
// with its "Type.Field" key.
func numericLeaves(t reflect.Type, seen map[reflect.Type]bool, leaf func(key string)) {
	if seen[t] {
		return
	}
	seen[t] = true
	for i := range t.NumField() {
		f := t.Field(i)
		if name, _ := jsonName(f); name == "" {
			continue
		}
		ft := f.Type
		if ft.Kind() == reflect.Pointer {
			ft = ft.Elem()
		}
		if ft.Kind() == reflect.Slice {
			ft = ft.Elem()
		}
		switch {
		case ft == reflect.TypeFor[Level]():
			leaf(t.Name() + "." + f.Name)
		case ft.Kind() == reflect.Struct:
			numericLeaves(ft, seen, leaf)
		case ft.Kind() >= reflect.Int && ft.Kind() <= reflect.Float64:
			leaf(t.Name() + "." + f.Name)
		}
	}
}

// TestEveryFieldHasALimit requires a plausible range in limits for every
// number a description holds, and no range for a field that is gone.
func TestEveryFieldHasALimit(t *testing.T) {
	have := map[string]bool{}
	numericLeaves(reflect.TypeFor[Bridge](), map[reflect.Type]bool{}, func(key string) {
		have[key] = true
		if _, ok := limits[key]; !ok {
			t.Errorf("%s has no plausible range: add one to limits in validate.go", key)
		}
	})
	var stale []string
	for key := range limits {
		if !have[key] {
			stale = append(stale, key)
		}
	}
	sort.Strings(stale)
	for _, key := range stale {
		t.Errorf("limits has %s, which is no field of a description", key)
	}
	for key, l := range limits {
		if !(l.lo < l.hi) {
			t.Errorf("%s: empty range %v", key, l)
		}
	}
}

// setLeaves calls set for every number field with a range in the value v
// (addressable), with its path and a setter.
func setLeaves(v reflect.Value, path string, set func(path string, key string, f reflect.Value)) {
	t := v.Type()
	for i := range t.NumField() {
		f := t.Field(i)
		name, _ := jsonName(f)
		if name == "" {
			continue
		}
		fv := v.Field(i)
		p := join(path, name)
		if fv.Kind() == reflect.Pointer { // an optional field whose presence counts: give it
			if fv.Type().Elem().Kind() == reflect.Struct {
				continue
			}
			if _, ok := limits[t.Name()+"."+f.Name]; ok {
				// Set a copy; the field is given only if set changed it.
				tmp := reflect.New(fv.Type().Elem())
				if !fv.IsNil() {
					tmp.Elem().Set(fv.Elem())
				}
				before := tmp.Elem().Interface()
				set(p, t.Name()+"."+f.Name, tmp.Elem())
				if tmp.Elem().Interface() != before || !fv.IsNil() {
					fv.Set(tmp)
				}
			}
			continue
		}
		switch {
		case f.Type == reflect.TypeFor[Level]():
			set(p, t.Name()+"."+f.Name, fv.Field(0))
		case f.Type.Kind() == reflect.Struct:
			setLeaves(fv, p, set)
		case f.Type.Kind() == reflect.Slice && f.Type.Elem().Kind() == reflect.Struct:
			for j := range fv.Len() {
				setLeaves(fv.Index(j), p+"["+string(rune('0'+j))+"]", set)
			}
		default:
			if _, ok := limits[t.Name()+"."+f.Name]; ok {
				set(p, t.Name()+"."+f.Name, fv)
			}
		}
	}
}

// TestLimitsAgreeWithPackages sets each number of the demo bridge, one at a
// time, to each end of its range: Validate must accept the value unless
// another field limits it (then naming a field), and the whole check must
// either run or refuse with a *FieldError naming a field, never with a bare
// error of a checking package. Just outside each end, Validate must refuse
// naming the field itself.
func TestLimitsAgreeWithPackages(t *testing.T) {
	if testing.Short() {
		t.Skip("checks the demo bridge some 600 times")
	}
	base := Demo()
	base.Banks.Left.Anchor.Bars = 0 // keep the block a block
	var paths []string
	setLeaves(reflect.ValueOf(&base).Elem(), "", func(p, key string, _ reflect.Value) { paths = append(paths, p+" "+key) })
	checked := 0
	for _, pk := range paths {
		p, key, _ := strings.Cut(pk, " ")
		l := limits[key]
		below, above := l.lo-1e-9*math.Abs(l.lo)-1e-12, l.hi*(1+1e-9)
		if strings.HasSuffix(key, ".Count") || strings.HasSuffix(key, ".Bars") {
			below, above = l.lo-1, l.hi+1
		}
		for _, end := range []float64{l.lo, l.hi, below, above} {
			outside := end < l.lo || end > l.hi
			b := Demo()
			b.Ropes = append([]RopeGroup(nil), b.Ropes...)
			b.Walkway.Parts = append([]Part(nil), b.Walkway.Parts...)
			b.Site.Ground = append([]Point(nil), b.Site.Ground...)
			setLeaves(reflect.ValueOf(&b).Elem(), "", func(q, _ string, f reflect.Value) {
				if q != p {
					return
				}
				if f.CanInt() {
					f.SetInt(int64(math.Round(end)))
				} else {
					f.SetFloat(end)
				}
			})
			if outside && end == 0 {
				continue // zero is "not given" for an optional field
			}
			err := b.Validate()
			var fe *FieldError
			if outside {
				if err == nil {
					t.Errorf("%s = %v, outside %v: Validate accepts it", p, end, l)
				} else if errors.As(err, &fe) && fe.Field != p && !strings.HasPrefix(p, fe.Field) {
					// Another bound fired first; fine as long as it names a field.
					if fe.Field == "" {
						t.Errorf("%s = %v: refused naming no field: %v", p, end, err)
					}
				}
				continue
			}
			if err != nil {
				if !errors.As(err, &fe) || fe.Field == "" {
					t.Errorf("%s = %v: refused naming no field: %v", p, end, err)
				}
				continue
			}
			checked++
			if _, err := Check(b, nil); err != nil && (!errors.As(err, &fe) || fe.Field == "") {
				t.Errorf("%s = %v, within %v: the check fails naming no field: %v", p, end, l, err)
			}
		}
	}
	if checked < 100 {
		t.Errorf("only %d bridges at the ends of their ranges were checked", checked)
	}
}

// TestGroundLineOrder: the ground line now decides the footing and
// anchor checks' ground slope, so a point out of order (a slip in a
// survey transcription) is refused, naming the point.
func TestGroundLineOrder(t *testing.T) {
	b := Demo()
	b.Site.Ground = append([]Point(nil), b.Site.Ground...)
	b.Site.Ground[3].X = b.Site.Ground[1].X
	err := b.Validate()
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Field != "site.ground[3].x" || !strings.Contains(err.Error(), "left to right") {
		t.Fatalf("ground line out of order: %v", err)
	}
}
