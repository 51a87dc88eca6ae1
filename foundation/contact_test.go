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
