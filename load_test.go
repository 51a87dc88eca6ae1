package sagspan

import (
	"encoding/json"
	"errors"
	"strings"
	"testing"
)

// mutate returns the demo description with one change applied to its JSON
// tree.
func mutate(t *testing.T, change func(m map[string]any)) []byte {
	t.Helper()
	var m map[string]any
	if err := json.Unmarshal(DemoJSON(), &m); err != nil {
		t.Fatal(err)
	}
	change(m)
	b, err := json.Marshal(m)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

func obj(m map[string]any, path ...string) map[string]any {
	for _, p := range path {
		m = m[p].(map[string]any)
	}
	return m
}

func TestBadDescriptions(t *testing.T) {
	tests := []struct {
		name   string
		change func(m map[string]any)
		field  string // the path the error must name
		says   string // and a word of the reason
	}{
		{"missing span", func(m map[string]any) { delete(obj(m, "site"), "span") }, "site.span", "missing"},
		{"negative span", func(m map[string]any) { obj(m, "site")["span"] = "-48 m" }, "site.span", "positive"},
		{"span in the wrong unit", func(m map[string]any) { obj(m, "site")["span"] = "48 kN" }, "site.span", "not a unit of length"},
		{"span not a quantity", func(m map[string]any) { obj(m, "site")["span"] = true }, "site.span", "number"},
		{"unknown field", func(m map[string]any) { obj(m, "site")["spam"] = 1 }, "site.spam", "unknown field"},
		{"unknown rope type", func(m map[string]any) {
			obj(m["ropes"].([]any)[0].(map[string]any), "rope")["construction"] = "7x7-XYZ"
		}, "ropes[0].rope.construction", "unknown rope type"},
		{"anchor above the saddle", func(m map[string]any) {
			obj(m, "banks", "left", "backstay")["drop"] = "-1.5 m"
		}, "banks.left.backstay.drop", "below the saddle"},
		{"sag larger than is physical", func(m map[string]any) {
			m["ropes"].([]any)[0].(map[string]any)["sag"] = "30 m"
		}, "ropes[0].sag", "not a physical"},
		{"no walkway ropes", func(m map[string]any) {
			m["ropes"] = m["ropes"].([]any)[1:]
		}, "ropes", "walkway"},
		{"temperatures out of order", func(m map[string]any) { obj(m, "climate")["coldest"] = "50 C" }, "climate", "coldest <= reference"},
		{"unknown saddle kind", func(m map[string]any) { obj(m, "banks", "right", "tower", "saddle")["kind"] = "hinged" }, "banks.right.tower.saddle.kind", "unknown saddle kind"},
		{"unknown soil", func(m map[string]any) { obj(m, "banks", "right", "soil")["preset"] = "moon dust" }, "banks.right.soil.preset", "moon dust"},
		{"zero rope count", func(m map[string]any) { m["ropes"].([]any)[0].(map[string]any)["count"] = 0 }, "ropes[0].count", "at least 1"},
		{"unknown anchor", func(m map[string]any) { obj(m, "banks", "left", "anchor")["type"] = "tree" }, "banks.left.anchor.type", "unknown anchor type"},
		{"span beyond a footbridge", func(m map[string]any) { obj(m, "site")["span"] = "5 km" }, "site.span", "beyond"},
		{"temperature out of this world", func(m map[string]any) { obj(m, "climate")["hottest"] = "1e6 C" }, "climate.hottest", "outside"},
		{"unknown design approach", func(m map[string]any) { obj(m, "basis")["approach"] = "DA9" }, "basis.approach", "unknown design approach"},
		{"bad basis", func(m map[string]any) { obj(m, "basis")["method"] = "vibes" }, "basis.method", "unknown method"},
		{"not JSON", nil, "", "JSON syntax"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			data := []byte("[1, 2")
			if tt.change != nil {
				data = mutate(t, tt.change)
			}
			_, err := Parse(data)
			if err == nil {
				t.Fatal("no error")
			}
			if !errors.Is(err, ErrInvalid) {
				t.Errorf("error %v does not wrap ErrInvalid", err)
			}
			var fe *FieldError
			if !errors.As(err, &fe) {
				t.Fatalf("error %T is not a *FieldError: %v", err, err)
			}
			if fe.Field != tt.field {
				t.Errorf("field %q, want %q (error: %v)", fe.Field, tt.field, err)
			}
			if !strings.Contains(err.Error(), tt.says) {
				t.Errorf("error %q does not say %q", err, tt.says)
			}
		})
	}
}

func TestDemoRoundTrip(t *testing.T) {
	b := Demo()
	data, err := json.Marshal(b)
	if err != nil {
		t.Fatal(err)
	}
	back, err := Parse(data)
	if err != nil {
		t.Fatalf("the demo written as JSON does not load back: %v", err)
	}
	if back.Site.Span != b.Site.Span || len(back.Ropes) != len(b.Ropes) || back.Banks.Right.Anchor != b.Banks.Right.Anchor {
		t.Errorf("round trip changed the description")
	}
}

// FuzzParse feeds arbitrary bytes and mutated demo descriptions to Parse
// and, when they load, to Check: nothing may panic, and a checked bridge
// must never report NaN.
func FuzzParse(f *testing.F) {
	f.Add(DemoJSON())
	f.Add([]byte(`{"site": {"span": "-1 m"}}`))
	f.Add([]byte(`{}`))
	f.Fuzz(func(t *testing.T, data []byte) {
		b, err := Parse(data)
		if err != nil {
			return
		}
		a, err := Check(b, nil)
		if err != nil {
			return
		}
		for _, r := range a.Report.Results {
			if r.Demand != r.Demand || r.Capacity != r.Capacity || r.Ratio != r.Ratio {
				t.Fatalf("NaN in %s %s %s", r.ID, r.Element, r.Case)
			}
		}
	})
}

// FuzzDecode feeds arbitrary bytes and edited demo descriptions to Parse
// alone: nothing may panic; every error is a *FieldError wrapping
// ErrInvalid whose place, when given, lies in the text; and a description
// that loads writes itself (MarshalJSON) as JSON that loads back to the
// same description (the same digest).
func FuzzDecode(f *testing.F) {
	f.Add(DemoJSON())
	for _, s := range []string{`{"site": {"span": "72,5 m"}}`, `{"site": {"span": 1, "span": 2}}`, `{"ropes": [{"count": 2.5}]}`,
		`{"climate": {"coldest": -10}}`, `{"site": {"flood_elevation": "none"}}`, `[1, 2`, `"\u00e9"`, `{"a":}`} {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		b, err := Parse(data)
		if err != nil {
			var fe *FieldError
			if !errors.As(err, &fe) || !errors.Is(err, ErrInvalid) {
				t.Fatalf("error %T is not a *FieldError wrapping ErrInvalid: %v", err, err)
			}
			if fe.Line < 0 || fe.Line > strings.Count(string(data), "\n")+1 || fe.Column < 0 {
				t.Fatalf("error placed at line %d, column %d of a %d-line text: %v", fe.Line, fe.Column, strings.Count(string(data), "\n")+1, err)
			}
			return
		}
		again, err := json.Marshal(b)
		if err != nil {
			t.Fatalf("a loaded description does not write itself: %v", err)
		}
		back, err := Parse(again)
		if err != nil {
			t.Fatalf("a loaded description, written back, does not load: %v\n%s", err, again)
		}
		if back.Digest() != b.Digest() {
			t.Fatalf("the round trip changed the description:\n%s", again)
		}
	})
}
