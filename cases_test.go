package sagspan

import (
	"errors"
	"strings"
	"testing"
)

// TestBadCaseDescriptions checks that a slip in the load cases and rope
// checks a description adds is refused with the field path and a reason.
func TestBadCaseDescriptions(t *testing.T) {
	loads := func(m map[string]any) map[string]any { return obj(m, "loads") }
	rope0 := func(m map[string]any) map[string]any { return m["ropes"].([]any)[0].(map[string]any) }
	tests := []struct {
		name   string
		change func(m map[string]any)
		field  string
		says   string
	}{
		{"a case with an unknown action", func(m map[string]any) {
			loads(m)["cases"] = []any{map[string]any{"name": "snow day", "actions": map[string]any{"snow": 1.0}}}
		}, "loads.cases[0].actions.snow", "unknown action"},
		{"a case without a name", func(m map[string]any) {
			loads(m)["cases"] = []any{map[string]any{"actions": map[string]any{"crowd": 1.0}}}
		}, "loads.cases[0].name", "missing"},
		{"a case named as a default", func(m map[string]any) {
			loads(m)["cases"] = []any{map[string]any{"name": "wind with crowd", "actions": map[string]any{"crowd": 1.0}}}
		}, "loads.cases[0].name", "already"},
		{"wind and lift together", func(m map[string]any) {
			loads(m)["cases"] = []any{map[string]any{"name": "gale", "actions": map[string]any{"wind": 1.0, "lift": 1.0}}}
		}, "loads.cases[0].actions", "not both"},
		{"a crowd beyond the span", func(m map[string]any) {
			loads(m)["cases"] = []any{map[string]any{"name": "crowd off the end", "actions": map[string]any{"crowd": 1.0},
				"crowd": map[string]any{"from": "60 m", "to": "80 m"}}}
		}, "loads.cases[0].crowd", "within the span"},
		{"a negative combination factor", func(m map[string]any) {
			loads(m)["cases"] = []any{map[string]any{"name": "odd", "actions": map[string]any{"crowd": -1.0}}}
		}, "loads.cases[0].actions.crowd", "between 0 and 10"},
		{"an unknown default left out", func(m map[string]any) { loads(m)["omit"] = []any{"earthquake"} }, "loads.omit[0]", "no default case"},
		{"a gradient limit of zero", func(m map[string]any) { obj(m, "walkway")["gradient_limit"] = 0.0 }, "walkway.gradient_limit", "outside the plausible range 0.02 to 2"},
		{"a sharing factor below 1", func(m map[string]any) { rope0(m)["sharing"] = 0.9 }, "ropes[0].sharing", "outside the plausible range 1 to 50"},
		{"a sharing factor above the rope count", func(m map[string]any) { rope0(m)["sharing"] = 7.0 }, "ropes[0].sharing", "rope count 6"},
		{"a negative constructional stretch", func(m map[string]any) { rope0(m)["constructional_stretch"] = -0.001 }, "ropes[0].constructional_stretch", "outside the plausible range 0 to 0.02"},
		{"an unknown termination", func(m map[string]any) { obj(m, "basis")["termination"] = "knot" }, "basis.termination", "unknown termination"},
		{"termination and efficiency both", func(m map[string]any) {
			obj(m, "basis")["termination"] = "clips"
			obj(m, "basis")["rope_efficiency"] = 0.85
		}, "basis.termination", "not both"},
		{"an unknown bank to place the deck from", func(m map[string]any) { loads(m)["deck_from"] = "middle" }, "loads.deck_from", "unknown bank"},
		{"a negative groove", func(m map[string]any) { obj(m, "banks", "left", "tower", "saddle")["groove_diameter"] = "-900 mm" }, "banks.left.tower.saddle.groove_diameter", "outside the plausible range"},
		{"a dynamic factor below 1", func(m map[string]any) { loads(m)["break_dynamic"] = 0.5 }, "loads.break_dynamic", "outside the plausible range"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := Parse(mutate(t, tt.change))
			if err == nil {
				t.Fatal("no error")
			}
			var fe *FieldError
			if !errors.Is(err, ErrInvalid) || !errors.As(err, &fe) {
				t.Fatalf("error %v is not a *FieldError wrapping ErrInvalid", err)
			}
			if fe.Field != tt.field || !strings.Contains(err.Error(), tt.says) {
				t.Errorf("error %q, want field %q saying %q", err, tt.field, tt.says)
			}
		})
	}
}

// TestOwnCasesAndOmitted checks that a case of the description's own is
// checked and named in the report, and that a default left out is not.
func TestOwnCasesAndOmitted(t *testing.T) {
	data := mutate(t, func(m map[string]any) {
		l := obj(m, "loads")
		l["omit"] = []any{"wind, hottest rope", "deck placed"}
		l["cases"] = []any{map[string]any{
			"name":        "storm with a crowd on the left third",
			"actions":     map[string]any{"crowd": 1.0, "wind": 0.6},
			"crowd":       map[string]any{"from": "0 m", "to": "24 m"},
			"temperature": "-10 C",
		}}
	})
	b, err := Parse(data)
	if err != nil {
		t.Fatal(err)
	}
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	seen := map[string]int{}
	for _, r := range a.Report.Results {
		seen[r.Case]++
	}
	if seen["storm with a crowd on the left third"] == 0 {
		t.Error("the description's own case has no results")
	}
	if seen["wind, hottest rope"] != 0 {
		t.Error("an omitted default case was checked")
	}
	for c := range seen {
		if strings.Contains(c, "construction") || strings.HasPrefix(c, "bare ropes") {
			t.Errorf("the omitted construction stage was checked: %q", c)
		}
	}
	// The case's crowd is a patch on the left third, at the coldest rope,
	// with 0.6 of the wind: its state carries the patch and the swing.
	for _, cs := range a.Service {
		if cs.Case.Name != "storm with a crowd on the left third" {
			continue
		}
		g := cs.Groups[0]
		if len(g.Load.Patches) != 1 || g.Load.Patches[0].To != 24 || !(g.Swing > 0) || cs.Case.Temperature != b.Climate.Coldest {
			t.Errorf("case state %+v", cs.Case)
		}
	}
}
