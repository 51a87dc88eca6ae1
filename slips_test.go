package sagspan

import (
	"bytes"
	"errors"
	"fmt"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/cable"
)

// TestSlips feeds the demo description with one slip each, written as a
// person would mistype it in the file, and checks the exact error: the
// field's path, what is wrong, what to write instead and, where the text
// is known, its line and column. Each of these slips used to pass silently
// or fail without naming its field.
func TestSlips(t *testing.T) {
	tests := []struct {
		name     string
		old, new string   // the first old in the demo description becomes new
		more     []string // further pairs old, new
		analyse  bool     // the slip shows only in the analysis (Check)
		want     string
	}{
		// Read as 0.35 mm, this passed.
		{"unit written twice", `"depth": "0.35 m"`, `"depth": "0.35 m m"`, nil, false,
			`sagspan: bridge description: walkway.depth: units: "0.35 m m": "m m" is not one unit; write a single unit symbol, such as "0.35 m" (line {line}, column 14)`},
		{"decimal comma", `"span": "72 m"`, `"span": "72,5 m"`, nil, false,
			`sagspan: bridge description: site.span: units: "72,5 m": "72,5 m" has a comma in the number; write it with a decimal point and no thousands separator, such as "72.5 m" (line {line}, column 13)`},
		// Taken as 0 m, clearance passed at 47 m.
		{"flood level left out", `    "flood_elevation": "103.5 m",` + "\n", ``, nil, false,
			`sagspan: bridge description: site.flood_elevation: is missing; give the level, such as "100 m", or "none" when there is none (line 3, column 11)`},
		// 20 m, MBF 2.5e8 kN: this passed.
		{"bare rope diameter", `"diameter": "32 mm"`, `"diameter": 20`, nil, false,
			`sagspan: bridge description: ropes[0].rope.diameter: units: a bare 20 is ambiguous for a length; write it with its unit, such as "20 mm" (line {line}, column 57)`},
		{"tower of 200 m", `"height": "2.4 m"`, `"height": "200 m"`, nil, false,
			`sagspan: bridge description: banks.left.tower.height: 200.0 m is outside the plausible range 0.5000 m to 60.00 m (line {line}, column 19)`},
		{"ten million ropes", `"count": 6`, `"count": 10000000`, nil, false,
			`sagspan: bridge description: ropes[0].count: 1e+07 is outside the plausible range 1 to 50 (line {line}, column 16)`},
		{"backstay of 1 mm", `"horizontal": "16 m"`, `"horizontal": "1 mm"`, nil, false,
			`sagspan: bridge description: banks.left.backstay.horizontal: 1.000 mm is outside the plausible range 0.5000 m to 300.0 m (line {line}, column 34)`},
		// The last one won.
		{"key given twice", `"coldest": "-10 C",`, `"coldest": "-10 C", "coldest": "-20 C",`, nil, false,
			`sagspan: bridge description: climate.coldest: given twice (first at line 24, column 5); keep one (line {line}, column 36)`},
		// "must be positive, got -283.15 °C"
		{"bare temperature", `"coldest": "-10 C"`, `"coldest": -10`, nil, false,
			`sagspan: bridge description: climate.coldest: units: a bare -10 is ambiguous for a temperature; write it with its unit, such as "-10 C" (line {line}, column 16)`},
		// "friction angle 1719 deg is not a soil's"
		{"bare friction angle", `"preset": "dense sand"}`, `"preset": "dense sand", "friction": 30}`, nil, false,
			`sagspan: bridge description: banks.left.soil.friction: units: a bare 30 is ambiguous for an angle; write it with its unit, such as "30 deg" (line {line}, column 52)`},
		{"syntax error", `"width": "1.2 m",`, `"width": "1.2 m",,`, nil, false,
			`sagspan: bridge description: JSON syntax: invalid character ',' looking for beginning of object key string (line {line}, column 22)`},
		{"trailing comma", `"basis": {"method": "allowable"}`, `"basis": {"method": "allowable",}`, nil, false,
			`sagspan: bridge description: JSON syntax: invalid character '}' looking for beginning of object key string (a comma before a closing bracket: remove it) (line {line}, column 35)`},
		// "cannot unmarshal number 2.5 into Go value of type int"
		{"fraction where a whole number goes", `"passive": 0.5}`, `"passive": 0.5, "bars": 2.5}`, nil, false,
			`sagspan: bridge description: banks.left.anchor.bars: want a whole number, got 2.5 (line {line}, column 133)`},
		{"misspelt field", `"freeboard"`, `"freebord"`, nil, false,
			`sagspan: bridge description: site.freebord: unknown field; did you mean "freeboard"? (line {line}, column 5)`},
		// "the result overflows float64"
		{"sag of 1 mm", `"sag": "3.6 m"`, `"sag": "1 mm"`, nil, false,
			`sagspan: bridge description: ropes[0].sag: sag 1.000 mm is less than 1/100 of the span 72.00 m: a rope that tight carries many times its load in tension; footbridge sag ratios lie between about 1/25 and 1/8 (line {line}, column 14)`},
		// Passed validation, then refused by package cable.
		{"rope factor below 1", `"method": "allowable"}`, `"method": "allowable", "rope_factor": 0.5}`, nil, false,
			`sagspan: bridge description: basis.rope_factor: 0.5 is outside the plausible range 1 to 10 (line {line}, column 51)`},
		// "strains the rope by 31.9 %", naming no field.
		{"walkway too heavy for its ropes", `"load": "0.45 kN/m"`, `"load": "25 kN/m"`, []string{`"count": 6`, `"count": 1`}, true,
			`sagspan: bridge description: walkway.parts: walkway ropes, case "permanent": cable: the new state strains the rope by 9.8 %, beyond the small-strain model (5 %): invalid input; the walkway's own weight strains the walkway ropes beyond what the rope model covers: lighten the walkway (walkway.parts) or use larger or more ropes (ropes[0].rope.diameter, ropes[0].count)`},
		// q_p copied in kN/m² without its unit: read as 0.756 Pa, the wind
		// cases passed with next to no wind.
		{"wind pressure in kPa written bare", `"wind_speed": "22 m/s"`, `"wind_pressure": 0.756`, nil, false,
			`sagspan: bridge description: climate.wind_pressure: 0.7560 Pa is outside the plausible range 0.05000 kPa to 10.00 kPa (line {line}, column 22)`},
		// The flood's height above the river bed, not its elevation: the
		// clearance passed by 100 m.
		{"flood on the river's own datum", `"flood_elevation": "103.5 m"`, `"flood_elevation": "3.5 m"`, nil, false,
			`sagspan: bridge description: site.flood_elevation: the design flood at 3.500 m lies at or below the ground line everywhere under the span (lowest 96.50 m at x = 44.00 m, site.ground[5]): no flood can stand there; give its elevation on the datum of the saddles and the ground line (site.left_saddle_elevation 112.0 m), or "none" where no flood reaches the bridge (line {line}, column 24)`},
		{"flood below the river bed", `"flood_elevation": "103.5 m"`, `"flood_elevation": "95.0 m"`, nil, false,
			`sagspan: bridge description: site.flood_elevation: the design flood at 95.00 m lies at or below the ground line everywhere under the span (lowest 96.50 m at x = 44.00 m, site.ground[5]): no flood can stand there; give its elevation on the datum of the saddles and the ground line (site.left_saddle_elevation 112.0 m), or "none" where no flood reaches the bridge (line {line}, column 24)`},
		// A footing 3.5 m below ground under a 2.4 m column on a 0.7 m
		// slab buries the saddle: this passed.
		{"footing deeper than its tower is high", `"depth": "1.2 m", "column_offset": "-0.2 m"`, `"depth": "3.5 m", "column_offset": "-0.2 m"`, nil, false,
			`sagspan: bridge description: banks.left.tower.footing.depth: 3.500 m below ground puts the ground at the footing at 112.4 m, at or above the saddle at 112.0 m (a 2.400 m column on a 700.0 mm footing): the saddle would be buried; the depth is that of the footing's underside below the ground, and the tower's height that of the saddle above the footing's top (line {line}, column 89)`},
		// The walkway group pasted twice: twice the ropes, and this passed
		// for a lighter walkway.
		{"rope group listed twice", `"ropes": [`, `"ropes": [
    {"name": "walkway ropes", "role": "walkway", "count": 6, "sag": "3.6 m",
      "rope": {"construction": "6x36-IWRC", "diameter": "32 mm", "grade": "1770 MPa"}},`, nil, false,
			`sagspan: bridge description: ropes[1].name: "walkway ropes" also names ropes[0]: a group listed twice counts its ropes twice; give each group once, with all its ropes in its count, and name each group apart (line 41, column 15)`},
		// The depth to the water in the borehole, not its elevation: taken
		// as water 107 m below the footing, the bank was checked dry.
		{"groundwater as a depth below ground", `"preset": "dense sand"}`, `"preset": "dense sand", "groundwater_elevation": "2.0 m"}`, nil, false,
			`sagspan: bridge description: banks.left.soil.groundwater_elevation: 2.000 m lies 105.7 m below the lowest base of this bank (the anchor's at 107.7 m), out of reach of every check: it is an elevation on the datum of the saddles (site.left_saddle_elevation 112.0 m), not a depth below ground; leave it out where the groundwater lies out of reach (line {line}, column 65)`},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			demo := DemoJSON()
			if !bytes.Contains(demo, []byte(tt.old)) {
				t.Fatalf("the demo description has no %q", tt.old)
			}
			data := bytes.Replace(demo, []byte(tt.old), []byte(tt.new), 1)
			for i := 0; i+1 < len(tt.more); i += 2 {
				data = bytes.Replace(data, []byte(tt.more[i]), []byte(tt.more[i+1]), 1)
			}
			b, err := Parse(data)
			if tt.analyse {
				if err != nil {
					t.Fatalf("Parse: %v", err)
				}
				_, err = Check(b, nil)
			}
			if err == nil {
				t.Fatal("no error: the slip passes silently")
			}
			// {line} stands for the line of the demo description the slip
			// was written on, so that the demo can change around it.
			line := bytes.Count(demo[:bytes.Index(demo, []byte(tt.old))], []byte("\n")) + 1
			want := strings.ReplaceAll(tt.want, "{line}", fmt.Sprint(line))
			if got := err.Error(); got != want {
				t.Errorf("error\n got %s\nwant %s", got, want)
			}
			var fe *FieldError
			if !errors.As(err, &fe) || !errors.Is(err, ErrInvalid) {
				t.Errorf("error %T is not a *FieldError wrapping ErrInvalid", err)
			}
		})
	}
}

// TestAnalysisErrorsNameTheirField checks that an error found only during
// the analysis is traced to the field that caused it, with advice: the
// walkway's own weight straining the ropes (the dead load), the crowd
// straining them (the ropes), rope statics that find no state (the sag).
func TestAnalysisErrorsNameTheirField(t *testing.T) {
	tests := []struct {
		name   string
		edits  []string // pairs old, new in the demo description
		field  string
		advice string
	}{
		{"crowd strains thin ropes", []string{`"count": 6`, `"count": 1`, `"loads": {}`, `"loads": {"crowd": "10 kPa"}`, `"diameter": "32 mm"`, `"diameter": "14 mm"`},
			"ropes[0].rope", "use larger or more ropes (ropes[0].rope.diameter, ropes[0].count) or a larger sag (ropes[0].sag)"},
		{"walkway strains its ropes", []string{`"count": 6`, `"count": 1`, `"load": "0.45 kN/m"`, `"load": "25 kN/m"`},
			"walkway.parts", "lighten the walkway (walkway.parts) or use larger or more ropes"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			data := DemoJSON()
			for i := 0; i+1 < len(tt.edits); i += 2 {
				data = bytes.Replace(data, []byte(tt.edits[i]), []byte(tt.edits[i+1]), 1)
			}
			b, err := Parse(data)
			if err != nil {
				t.Fatalf("Parse: %v", err)
			}
			_, err = Check(b, nil)
			var fe *FieldError
			if !errors.As(err, &fe) || fe.Field != tt.field || !strings.Contains(err.Error(), tt.advice) {
				t.Errorf("error %v; want field %s and advice %q", err, tt.field, tt.advice)
			}
		})
	}
	// Rope statics that overflow or do not settle point at the sag.
	m, err := newModel(Demo())
	if err != nil {
		t.Fatal(err)
	}
	for _, cause := range []error{
		fmt.Errorf("cable: input out of range: the result overflows float64: %w", cable.ErrInvalid),
		fmt.Errorf("rope rendered over the saddles does not settle after 60 iterations"),
	} {
		err := m.groupErr(1, LoadCase{Name: "wind"}, cause)
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != "ropes[1].sag" || !errors.Is(err, cause) || !strings.Contains(err.Error(), "give a sag near 1/12 to 1/20 of the span") {
			t.Errorf("%v: traced as %v", cause, err)
		}
	}
}
