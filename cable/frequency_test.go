package cable_test

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// lambdaSq returns Irvine's λ² = (m g l/H)² l EA/(H L_e) for a level span,
// with L_e = ∫(1 + z'²)^{3/2} dx over the parabola of sag d = m g l²/(8H)
// integrated by gonum's Gauss–Legendre quadrature: the independent route
// to the closed form in cable.Frequencies.
func lambdaSq(l, h, m, ea float64) float64 {
	w := m * units.StandardGravity
	d := w * l * l / (8 * h)
	le := integrate(func(x float64) float64 {
		p := 4 * d / l * (1 - 2*x/l) // slope of z = 4d x(l−x)/l²
		return math.Pow(1+p*p, 1.5)
	}, 0, l)
	return (w * l / h) * (w * l / h) * l * ea / (h * le)
}

func TestFrequenciesReference(t *testing.T) {
	// Level span l 100 m, m 100 kg/m, EA 1e9 N, H = m g l²/(8·5 m) so that
	// the rope hangs at 5 m sag. f₀ = √(H/m)/(2l) (taut-string fundamental,
	// any vibration text); λ² by quadrature of L_e (lambdaSq); the
	// symmetric root against the frequency equation by bisection
	// (Irvine & Caughey 1974, see the package References).
	l, mass, ea := 100.0, 100.0, 1e9
	h := mass * units.StandardGravity * l * l / (8 * 5)
	m, err := cable.Frequencies(cable.Span{Length: 100}, units.Force(h), units.MassPerLength(mass), units.AxialStiffness(ea))
	if err != nil {
		t.Fatal(err)
	}
	f0 := math.Sqrt(h/mass) / (2 * l)
	approx(t, "sag", float64(m.Sag), 5, 1e-14)
	approx(t, "swing", float64(m.Swing), f0, 1e-14)
	approx(t, "antisymmetric", float64(m.Antisymmetric), 2*f0, 1e-14)
	l2 := lambdaSq(l, h, mass, ea)
	approx(t, "λ²", m.LambdaSq, l2, 1e-12)
	// The shallow-sag form L_e ≈ l(1 + 8r²) would give λ² higher by
	// L_e/(l(1+8r²)) − 1 ≈ 19.2 r⁴/(1 + 8r²) = 1.18e-4 here.
	approx(t, "λ² against the shallow-sag L_e", 64*0.05*0.05*ea/(h*1.02)/l2-1, 19.2*math.Pow(0.05, 4)/1.02, 0.02)
	wbar := bisectSymmetric(t, l2)
	approx(t, "symmetric", float64(m.Symmetric), wbar/math.Pi*f0, 1e-12)
}

// bisectSymmetric returns the root ω̄ ∈ (π, 3π) of the symmetric-mode
// equation tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³ by plain bisection on the
// pole-free form λ² sin x − x cos x (λ² − 4x²), x = ω̄/2.
func bisectSymmetric(t *testing.T, l2 float64) float64 {
	t.Helper()
	g := func(x float64) float64 { return l2*math.Sin(x) - x*math.Cos(x)*(l2-4*x*x) }
	lo, hi := math.Pi/2, 3*math.Pi/2
	if g(lo) <= 0 || g(hi) >= 0 {
		t.Fatalf("symmetric-mode equation not bracketed for λ² %g", l2)
	}
	for range 200 {
		mid := (lo + hi) / 2
		if g(mid) > 0 {
			lo = mid
		} else {
			hi = mid
		}
	}
	return lo + hi
}

func TestSymmetricModeCurve(t *testing.T) {
	// ω̄/π against λ² (values computed by bisection of the frequency
	// equation, Irvine & Caughey 1974); each root is also checked against
	// the frequency equation tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³ directly, and
	// the limits against published facts: taut string ω̄ = π; inextensible
	// ω̄/2 = 4.4934, the first positive root of tan x = x (standard
	// tables); crossover ω̄ = 2π at λ² = 4π² (Irvine, Cable Structures,
	// ch. 4, [M]).
	l, h, mass := 100.0, 100e3, 80.0
	for _, c := range []struct{ l2, ratio float64 }{
		{0.01, 1.000411}, {1, 1.040200}, {10, 1.345125}, {4 * math.Pi * math.Pi, 2.000000},
		{100, 2.597185}, {1000, 2.848264}, {1e12, 2.860593},
	} {
		// choose EA so that λ² = c.l2: λ² is proportional to EA
		ea := c.l2 / lambdaSq(l, h, mass, 1)
		m, err := cable.Frequencies(cable.Span{Length: units.Length(l)}, units.Force(h), units.MassPerLength(mass), units.AxialStiffness(ea))
		if err != nil {
			t.Fatal(err)
		}
		f0 := math.Sqrt(h/mass) / (2 * l)
		ratio := float64(m.Symmetric) / f0
		approx(t, "ω̄/π", ratio, c.ratio, 1e-6)
		approx(t, "ω̄/π by bisection", ratio, bisectSymmetric(t, c.l2)/math.Pi, 1e-12)
		approx(t, "λ²", m.LambdaSq, c.l2, 1e-11)
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
		what string
		h, m float64
		ea   float64
	}{
		{"zero H", 0, 1, 1}, {"zero mass", 1, 0, 1}, {"zero EA", 1, 1, 0},
		{"NaN H", math.NaN(), 1, 1}, {"Inf EA", 1, 1, math.Inf(1)}, {"negative mass", 1, -1, 1},
	} {
		_, err := cable.Frequencies(sp, units.Force(c.h), units.MassPerLength(c.m), units.AxialStiffness(c.ea))
		wantInvalid(t, c.what, err)
	}
}
