package units

import (
	"encoding/json"
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
)

func TestParse(t *testing.T) {
	// Conversion factors are SI definitions (BIPM, The International System
	// of Units, 9th ed., 2019): 1 kN = 1e3 N, 1 deg = π/180 rad,
	// 0 °C = 273.15 K, 1 N/mm² = 1 MPa.
	tests := []struct {
		in   string
		kind Kind
		want float64
	}{
		{"12.5 kN", KindForce, 12500},
		{"12.5kN", KindForce, 12500},
		{"-3e2 N", KindForce, -300},
		{"1.2 m", KindLength, 1.2},
		{"450 mm", KindLength, 0.45},
		{"30 deg", KindAngle, math.Pi / 6},
		{"30°", KindAngle, math.Pi / 6},
		{"0.5 rad", KindAngle, 0.5},
		{"3.5 kN/m", KindLoadPerLength, 3500},
		{"24 kN/m3", KindUnitWeight, 24000},
		{"24 kN/m³", KindUnitWeight, 24000},
		{"-10 C", KindTemperature, 263.15},
		{"-10 °C", KindTemperature, 263.15},
		{"293.15 K", KindTemperature, 293.15},
		{"1:12", KindRatio, 1.0 / 12},
		{"8 %", KindRatio, 0.08},
		{"0.09", KindRatio, 0.09},
		{"1770 N/mm2", KindPressure, 1.77e9},
		{"1770 N/mm²", KindPressure, 1.77e9},
		{"150 kPa", KindPressure, 150e3},
		{"100 GPa", KindPressure, 100e9},
		{"184 mm2", KindArea, 184e-6},
		{"12 kN·m", KindMoment, 12000},
		{"12 kN m", KindMoment, 12000},
		{"12 kNm", KindMoment, 12000},
		{"18.4 MN", KindAxialStiffness, 18.4e6},
		{"12e-6 /K", KindThermalExpansion, 12e-6},
		{"1.636 kg/m", KindMassPerLength, 1.636},
		{"2.5 t", KindMass, 2500},
		{"26 m/s", KindVelocity, 26},
		{"36 km/h", KindVelocity, 10},
		{"1.8 Hz", KindFrequency, 1.8},
		{"0.7 m/s²", KindAcceleration, 0.7},
		{"0.2 m/s2", KindAcceleration, 0.2},
		{"  48 m  ", KindLength, 48},
		{"48", KindLength, 48},
	}
	for _, tt := range tests {
		got, err := parseKind(tt.in, tt.kind)
		if err != nil {
			t.Errorf("parse %q as %s: %v", tt.in, tt.kind, err)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(got, tt.want, 1e-12, 1e-12) {
			t.Errorf("parse %q as %s = %v, want %v", tt.in, tt.kind, got, tt.want)
		}
	}
}

func TestParseErrors(t *testing.T) {
	tests := []struct {
		in   string
		kind Kind
		want error
		part string
	}{
		{"", KindForce, ErrSyntax, ""},
		{"kN", KindForce, ErrSyntax, ""},
		{"12.5 kQ", KindForce, ErrUnknownUnit, "kQ"},
		{"12.5 m", KindForce, ErrDimension, "m"},
		{"30", KindLength, nil, ""},
		{"NaN m", KindLength, ErrSyntax, ""},
		{"Inf kN", KindForce, ErrSyntax, ""},
		{"1e999 m", KindLength, ErrRange, "1e999"},
		{"1:0", KindRatio, ErrRange, "0"},
		{"1:x", KindRatio, ErrSyntax, "x"},
		{"1.2.3 m", KindLength, ErrSyntax, "1.2.3"},
		{"1_000 m", KindLength, ErrUnknownUnit, "_000 m"},
		{"0x10 m", KindLength, ErrUnknownUnit, "x10 m"},
	}
	for _, tt := range tests {
		_, err := parseKind(tt.in, tt.kind)
		if tt.want == nil {
			if err != nil {
				t.Errorf("parse %q: unexpected error %v", tt.in, err)
			}
			continue
		}
		if !errors.Is(err, tt.want) {
			t.Errorf("parse %q: error %v, want %v", tt.in, err, tt.want)
			continue
		}
		var pe *ParseError
		if !errors.As(err, &pe) {
			t.Errorf("parse %q: error %T is not a *ParseError", tt.in, err)
			continue
		}
		if tt.part != "" && pe.Part != tt.part {
			t.Errorf("parse %q: part %q, want %q (error %v)", tt.in, pe.Part, tt.part, err)
		}
	}
}

// TestSlips checks the exact error of each slip a person makes writing a
// quantity by hand.
func TestSlips(t *testing.T) {
	tests := []struct {
		in   string
		kind Kind
		want error
		msg  string
	}{
		{"0.35 m m", KindLength, ErrUnknownUnit,
			`units: "0.35 m m": "m m" is not one unit; write a single unit symbol, such as "0.35 m"`},
		{"72,5 m", KindLength, ErrSyntax,
			`units: "72,5 m": "72,5 m" has a comma in the number; write it with a decimal point and no thousands separator, such as "72.5 m"`},
		{"1 200 m", KindLength, ErrSyntax,
			`units: "1 200 m": a space inside the number "1 200 m"; write the number without spaces`},
		{"-10", KindTemperature, ErrNoUnit,
			`units: a bare -10 is ambiguous for a temperature; write it with its unit, such as "-10 C"`},
		{"30", KindAngle, ErrNoUnit,
			`units: a bare 30 is ambiguous for an angle; write it with its unit, such as "30 deg"`},
		{"12 kN m m", KindMoment, ErrUnknownUnit,
			`units: "12 kN m m": "kN m m" is not one unit; write a single unit symbol, such as "12 kN"`},
	}
	for _, tt := range tests {
		_, err := parseKind(tt.in, tt.kind)
		if !errors.Is(err, tt.want) {
			t.Errorf("parse %q: error %v, want %v", tt.in, err, tt.want)
			continue
		}
		if err.Error() != tt.msg {
			t.Errorf("parse %q:\n got %s\nwant %s", tt.in, err, tt.msg)
		}
	}
	// What must still read: a moment in two parts, spaces around a slash.
	for _, ok := range []struct {
		in   string
		kind Kind
		want float64
	}{{"12 kN m", KindMoment, 12e3}, {"12 kN · m", KindMoment, 12e3}, {"3.2 kN / m", KindLoadPerLength, 3200}, {"15 C", KindTemperature, 288.15}} {
		got, err := parseKind(ok.in, ok.kind)
		if err != nil || !scalar.EqualWithinAbsOrRel(got, ok.want, 1e-12, 1e-12) {
			t.Errorf("parse %q = %v, %v; want %v", ok.in, got, err, ok.want)
		}
	}
}

func TestFormat(t *testing.T) {
	tests := []struct {
		x    float64
		kind Kind
		want string
	}{
		{12500, KindForce, "12.50 kN"},
		{450, KindForce, "450.0 N"},
		{0.45, KindLength, "450.0 mm"},
		{48, KindLength, "48.00 m"},
		{3200, KindLoadPerLength, "3.200 kN/m"},
		{450e3, KindPressure, "450.0 kPa"},
		{1.77e9, KindPressure, "1.770 GPa"},
		{math.Pi / 6, KindAngle, "30.00 deg"},
		{263.15, KindTemperature, "-10.00 °C"},
		{24000, KindUnitWeight, "24.00 kN/m³"},
		{12000, KindMoment, "12.00 kN·m"},
		{0, KindForce, "0 N"},
		{1.0 / 12, KindRatio, "0.08333"},
		{12e-6, KindThermalExpansion, "12.00 µ/K"},
		{0.7, KindAcceleration, "0.7000 m/s²"},
	}
	for _, tt := range tests {
		if got := Format(tt.x, tt.kind); got != tt.want {
			t.Errorf("Format(%v, %s) = %q, want %q", tt.x, tt.kind, got, tt.want)
		}
	}
}

func TestFormatPair(t *testing.T) {
	tests := []struct {
		a, b   float64
		kind   Kind
		wa, wb string
	}{
		{0, 140.4e3, KindForce, "0 kN", "140.4 kN"},
		{0.9, 1.2, KindLength, "0.9000 m", "1.200 m"},
		{0.0772, 0.1167, KindLength, "77.20 mm", "116.7 mm"},
		{263.15, 303.15, KindTemperature, "-10.00 °C", "30.00 °C"},
		{0, 0, KindMoment, "0 N·m", "0 N·m"},
	}
	for _, tt := range tests {
		a, b := FormatPair(tt.a, tt.b, tt.kind)
		if a != tt.wa || b != tt.wb {
			t.Errorf("FormatPair(%v, %v, %s) = %q, %q; want %q, %q", tt.a, tt.b, tt.kind, a, b, tt.wa, tt.wb)
		}
	}
}

// TestRoundTrip checks that every formatted value parses back to itself
// within the four significant figures Format keeps.
func TestRoundTrip(t *testing.T) {
	values := []float64{1e-4, 0.0123, 0.45, 1, 7.5, 48, 312.5e3, 2.2e6, -3.3, -1234.5}
	for k := KindLength; k <= KindAcceleration; k++ {
		for _, x := range values {
			if k == KindTemperature && x < 0 {
				continue
			}
			abs := 1e-9
			if k == KindTemperature {
				abs = 0.005 // two decimals of a degree
			}
			s := Format(x, k)
			got, err := parseKind(s, k)
			if err != nil {
				t.Errorf("%s %v: Format gave %q, which does not parse: %v", k, x, s, err)
				continue
			}
			if !scalar.EqualWithinAbsOrRel(got, x, abs, 5e-4) {
				t.Errorf("%s %v: %q parses back to %v", k, x, s, got)
			}
		}
	}
}

func TestJSON(t *testing.T) {
	var in struct {
		Span Length        `json:"span"`
		Load LoadPerLength `json:"load"`
		Cold Temperature   `json:"cold"`
	}
	if err := json.Unmarshal([]byte(`{"span": "48 m", "load": 3200, "cold": "-10 C"}`), &in); err != nil {
		t.Fatal(err)
	}
	if in.Span != 48 || in.Load != 3200 || !scalar.EqualWithinAbsOrRel(float64(in.Cold), 263.15, 1e-12, 1e-12) {
		t.Errorf("got %+v", in)
	}
	out, err := json.Marshal(in)
	if err != nil {
		t.Fatal(err)
	}
	// A temperature is written with its unit: a bare number is refused.
	if want := `{"span":48,"load":3200,"cold":"263.15 K"}`; string(out) != want {
		t.Errorf("marshal = %s, want %s", out, want)
	}
	in.Cold = 0
	if err := json.Unmarshal(out, &in); err != nil || !scalar.EqualWithinAbsOrRel(float64(in.Cold), 263.15, 1e-12, 1e-12) {
		t.Errorf("the marshalled form does not read back: %v, %v", err, in.Cold)
	}
	for _, bad := range []string{`{"span": "48 kN"}`, `{"span": true}`, `{"span": "x"}`, `{"cold": -10}`, `{"span": "0.35 m m"}`} {
		if err := json.Unmarshal([]byte(bad), &in); err == nil {
			t.Errorf("unmarshal %s: no error", bad)
		}
	}
}

func TestHelpers(t *testing.T) {
	if got := MomentOf(10*Kilonewton, 2*Metre); got != 20*KilonewtonMetre {
		t.Errorf("MomentOf = %v", got)
	}
	if got := (20 * KilonewtonMetre).Arm(10 * Kilonewton); got != 2 {
		t.Errorf("Arm = %v", got)
	}
	if got := FromCelsius(20).Celsius(); !scalar.EqualWithinAbsOrRel(got, 20, 1e-12, 1e-12) {
		t.Errorf("Celsius round trip = %v", got)
	}
	// Standard gravity 9.80665 m/s² (CGPM 1901): 1 kg/m weighs 9.80665 N/m.
	if got := (1 * KilogramPerMetre).Weight(); got != 9.80665 {
		t.Errorf("Weight = %v", got)
	}
	if u := (3 * Kilonewton).Unit(); u.Value() != 3000 {
		t.Errorf("Unit value = %v", u.Value())
	}
}

func FuzzParse(f *testing.F) {
	for _, s := range []string{"12.5 kN", "1:12", "-10 C", "24 kN/m³", "3 e", "1e999 m", "°", ":", "-", "1e"} {
		f.Add(s, 0)
	}
	f.Fuzz(func(t *testing.T, s string, k int) {
		kind := Kind(uint(k) % uint(len(kinds)))
		v, err := parseKind(s, kind)
		if err != nil {
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("parse %q: error %T is not a *ParseError", s, err)
			}
			_ = pe.Error()
			return
		}
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("parse %q as %s = %v without error", s, kind, v)
		}
	})
}
