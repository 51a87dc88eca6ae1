package foundation_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
	"gonum.org/v1/gonum/integrate/quad"
)

func TestContactPressure(t *testing.T) {
	kN, m := units.Kilonewton, units.Metre
	cases := []struct {
		n                   units.Force
		e, b, l             units.Length
		qmax, qmin, contact float64 // kPa, kPa, m
		src                 string
	}{
		// [D] from the kern formulas (Das §3.11, from memory); re-derived below by
		// quadrature of the pressure block: strip N 300 kN/m, B 2 m.
		{300 * kN, 0.2 * m, 2 * m, 1 * m, 240, 60, 2, "[D] inside kern"},
		{300 * kN, 0.5 * m, 2 * m, 1 * m, 400, 0, 1.5, "[D] outside kern"},
		{300 * kN, -0.5 * m, 2 * m, 1 * m, 400, 0, 1.5, "mirrored"},
		{300 * kN, 0, 2 * m, 1 * m, 150, 150, 2, "centric"},
		{600 * kN, 2.0 / 6 * m, 2 * m, 2 * m, 300, 0, 2, "kern edge"},
	}
	for _, c := range cases {
		qmax, qmin, contact, err := foundation.ContactPressure(c.n, c.e, c.b, c.l)
		if err != nil {
			t.Fatalf("%s: %v", c.src, err)
		}
		near(t, c.src+" qmax", float64(qmax)/1e3, c.qmax, 1e-9)
		near(t, c.src+" qmin", float64(qmin)/1e3, c.qmin, 1e-9)
		near(t, c.src+" contact", float64(contact), c.contact, 1e-9)
	}
}

func TestContactPressureEquilibrium(t *testing.T) {
	// The pressure block must carry N and its moment about the centre must
	// be N·e: integrated with gonum quad, independent of the closed forms.
	b, l := 2.5, 1.8
	for _, e := range []float64{0, 0.1, 0.3, 0.41, 0.6, 0.9, 1.2} {
		n := 500e3
		qmax, qmin, contact, err := foundation.ContactPressure(units.Force(n), units.Length(e), units.Length(b), units.Length(l))
		if err != nil {
			t.Fatal(err)
		}
		// Pressure falls linearly from qmax at x = b/2 to qmin at b/2 − contact.
		x0 := b/2 - float64(contact)
		p := func(x float64) float64 {
			if x < x0 {
				return 0
			}
			return float64(qmin) + (float64(qmax)-float64(qmin))*(x-x0)/float64(contact)
		}
		force := l * quad.Fixed(p, x0, b/2, 200, nil, 0)
		mom := l * quad.Fixed(func(x float64) float64 { return p(x) * x }, x0, b/2, 200, nil, 0)
		near(t, "ΣV", force, n, 1e-9)
		near(t, "ΣM/(N b)", mom/(n*b), e/b, 1e-9)
		if qmin < 0 || math.IsNaN(float64(qmax)) {
			t.Errorf("e %v: qmin %v qmax %v", e, qmin, qmax)
		}
	}
}

func TestContactPressureRejects(t *testing.T) {
	m := units.Metre
	if _, _, _, err := foundation.ContactPressure(100e3, 1*m, 2*m, 1*m); !errors.Is(err, foundation.ErrOutsideBase) {
		t.Errorf("e = b/2: %v", err)
	}
	if _, _, _, err := foundation.ContactPressure(-1, 0, 2*m, 1*m); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("tension: %v", err)
	}
	if _, _, _, err := foundation.ContactPressure(100e3, units.Length(math.NaN()), 2*m, 1*m); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("NaN e: %v", err)
	}
	if _, _, _, err := foundation.ContactPressure(100e3, 0, 0, 1*m); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("b 0: %v", err)
	}
}

// TestBiaxialContactPressure checks the pressure under a rigid 3 × 2 m
// base carrying 600 kN eccentric about both axes against three forms found
// outside the solver:
//
//   - inside the kern, the classical q = N/A (1 ± 6ex/b ± 6ey/l) (Das §3.11,
//     from memory): ex 0.2, ey 0.1 → 100·(1 ± 0.4 ± 0.3) = 170 / 30 kPa;
//   - one axis only, ContactPressure's trapezoid or triangle;
//   - the corner triangle [D]: with ex ≥ b/4 and ey ≥ l/4 the compressed
//     area is the triangle of legs s = 4(b/2 − ex), t = 4(l/2 − ey) under a
//     pyramid of volume qmax·s·t/6 whose centroid lies s/4, t/4 from the
//     corner: ex 1.0, ey 0.6 → s 2.0, t 1.6, qmax 6·600/(2·1.6) = 1125 kPa.
func TestBiaxialContactPressure(t *testing.T) {
	n, b, l := units.Force(600e3), units.Length(3), units.Length(2)
	got, err := foundation.BiaxialContactPressure(n, 0.2, -0.1, b, l)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "kern qmax", float64(got.Max), 170e3, 1e-12)
	near(t, "kern qmin", float64(got.Min), 30e3, 1e-12)
	near(t, "kern area", float64(got.Area), 6, 1e-12)
	for _, e := range []float64{0.3, 0.7, 1.2} {
		qmax, qmin, c, _ := foundation.ContactPressure(n, units.Length(e), b, l)
		got, err := foundation.BiaxialContactPressure(n, units.Length(e), 0, b, l)
		if err != nil {
			t.Fatal(err)
		}
		near(t, "one axis qmax", float64(got.Max), float64(qmax), 1e-12)
		near(t, "one axis qmin", float64(got.Min), float64(qmin), 1e-12)
		near(t, "one axis area", float64(got.Area), float64(c)*2, 1e-12)
		got, _ = foundation.BiaxialContactPressure(n, 0, units.Length(e), l, b) // turned: e along the 3 m side
		near(t, "turned qmax", float64(got.Max), float64(qmax), 1e-12)
	}
	for _, c := range []struct{ ex, ey float64 }{{1.0, 0.6}, {0.75, 0.5}, {1.3, 0.9}, {-1.0, 0.6}} {
		got, err := foundation.BiaxialContactPressure(n, units.Length(c.ex), units.Length(c.ey), b, l)
		if err != nil {
			t.Fatalf("%+v: %v", c, err)
		}
		s, u := 4*(1.5-math.Abs(c.ex)), 4*(1-math.Abs(c.ey))
		near(t, "corner qmax", float64(got.Max), 6*600e3/(s*u), 1e-9)
		near(t, "corner area", float64(got.Area), s*u/2, 1e-9)
		if got.Min != 0 {
			t.Errorf("%+v: qmin %v, want 0", c, got.Min)
		}
	}
	// Between the kern and the corner triangle the peak grows steadily
	// with the eccentricity and always exceeds the full-contact formula's.
	prev := 0.0
	for _, ex := range []float64{0.3, 0.4, 0.5, 0.6, 0.7, 0.8} {
		got, err := foundation.BiaxialContactPressure(n, units.Length(ex), 0.25, b, l)
		if err != nil {
			t.Fatal(err)
		}
		linear := 100e3 * (1 + 6*ex/3 + 6*0.25/2)
		if !(float64(got.Max) >= linear*(1-1e-12) && float64(got.Max) > prev) {
			t.Errorf("ex %v: qmax %v (linear %v, previous %v)", ex, got.Max, linear, prev)
		}
		prev = float64(got.Max)
	}
	if _, err := foundation.BiaxialContactPressure(n, 1.5, 0.1, b, l); !errors.Is(err, foundation.ErrOutsideBase) {
		t.Errorf("ex = b/2: %v", err)
	}
	if _, err := foundation.BiaxialContactPressure(n, 0.1, units.Length(math.NaN()), b, l); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("NaN ey: %v", err)
	}
}
