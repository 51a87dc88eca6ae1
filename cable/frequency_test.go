package cable_test

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

func TestFrequenciesReference(t *testing.T) {
	// SOURCES §1 [D]: l 100, m 100 kg/m, sag 5, EA 1e9 N, H = m g l²/(8 f)
	// with g 9.81 → f₀ 0.247614 Hz, λ² 639.603, antisymmetric 0.495227 Hz,
	// symmetric 0.703335 Hz. Computed there from the same formulas: the
	// independent checks are the limits and the equation residual below.
	m, err := cable.Frequencies(cable.Span{Length: 100}, 245.25e3, 100, 5, 1e9)
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "swing", float64(m.Swing), 0.247614, 2e-6)
	approx(t, "λ²", m.LambdaSq, 639.603, 1e-6)
	approx(t, "antisymmetric", float64(m.Antisymmetric), 0.495227, 2e-6)
	approx(t, "symmetric", float64(m.Symmetric), 0.703335, 2e-6)
}

func TestSymmetricModeCurve(t *testing.T) {
	// ω̄/π against λ² (SOURCES §1 [D]); each root is also checked against
	// the frequency equation tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³ (Irvine &
	// Caughey 1974, from memory) directly, and the limits against published
	// facts: taut string ω̄ = π; inextensible ω̄/2 = 4.4934, the first
	// positive root of tan x = x (standard tables); crossover ω̄ = 2π at
	// λ² = 4π² (Irvine, Cable Structures, ch. 4, from memory).
	l := 100.0
	for _, c := range []struct{ l2, ratio float64 }{
		{0.01, 1.000411}, {1, 1.040200}, {10, 1.345125}, {4 * math.Pi * math.Pi, 2.000000},
		{100, 2.597185}, {1000, 2.848264}, {1e12, 2.860593},
	} {
		// choose EA so that λ² = c.l2 with H 100 kN, sag 2 m: λ² = 64 r² EA/(H(1+8r²))
		r := 0.02
		ea := c.l2 * 100e3 * (1 + 8*r*r) / (64 * r * r)
		m, err := cable.Frequencies(cable.Span{Length: 100}, 100e3, 80, 2, units.AxialStiffness(ea))
		if err != nil {
			t.Fatal(err)
		}
		f0 := math.Sqrt(100e3/80) / (2 * l)
		ratio := float64(m.Symmetric) / f0
		approx(t, "ω̄/π", ratio, c.ratio, 1e-6)
		approx(t, "λ²", m.LambdaSq, c.l2, 1e-12)
		x := ratio * math.Pi / 2
		approxAbs(t, "frequency equation residual", math.Tan(x)-(x-4/c.l2*x*x*x), 0, 1e-8*(1+4/c.l2*x*x*x))
		approx(t, "antisymmetric = 2 f₀", float64(m.Antisymmetric), 2*f0, 1e-14)
		approx(t, "swing = f₀", float64(m.Swing), f0, 1e-14)
	}
	approx(t, "inextensible limit", 2.860593*math.Pi/2, 4.493409, 1e-6)
}

func TestFrequenciesInvalid(t *testing.T) {
	sp := cable.Span{Length: 100}
	for _, c := range []struct {
		what    string
		h, m, f float64
		ea      float64
	}{
		{"zero H", 0, 1, 1, 1}, {"zero mass", 1, 0, 1, 1}, {"zero sag", 1, 1, 0, 1}, {"zero EA", 1, 1, 1, 0},
		{"NaN H", math.NaN(), 1, 1, 1}, {"Inf EA", 1, 1, 1, math.Inf(1)},
	} {
		_, err := cable.Frequencies(sp, units.Force(c.h), units.MassPerLength(c.m), units.Length(c.f), units.AxialStiffness(c.ea))
		wantInvalid(t, c.what, err)
	}
}
