package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// Modes are the lowest natural frequencies of a sagging cable: the first
// out-of-plane (swing) mode, the first in-plane antisymmetric and the first
// in-plane symmetric mode, Irvine's parameter λ², and the midspan sag the
// cable hangs at under its own weight and H.
type Modes struct {
	Swing, Antisymmetric, Symmetric units.Frequency
	LambdaSq                        float64
	Sag                             units.Length
}

// Frequencies returns the first modes of a cable of span s, horizontal
// tension h, mass m per metre of span (ropes and walkway) and axial
// stiffness ea, by the linear theory of Irvine & Caughey (1974; Irvine,
// Cable Structures, 1981, ch. 4; see References):
//
//	f₀ = (1/(2l)) √(H/m)
//	swing (1st out-of-plane)   f = f₀
//	1st in-plane antisymmetric f = 2 f₀
//	1st in-plane symmetric     f = (ω̄/π) f₀,  tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³,  ω̄ ∈ (π, 3π)
//	λ² = (m g l/H)² · l/(H L_e/EA),  L_e = ∫₀ˡ (ds/dx)³ dx
//
// The cable hangs as the parabola of its own weight, m g per metre of span,
// under H, so its sag d = m g l²/(8H) follows from H and is not an input;
// then (m g l/H)² = 64 r², r = d/l, and L_e is integrated exactly over the
// parabola (for shallow sag L_e ≈ l(1 + 8r²), the form often quoted).
//
// The symmetric root moves from π (λ² → 0, taut string) to 2.86π (λ² → ∞,
// inextensible); it crosses the antisymmetric frequency at λ² = 4π²
// (mode crossover), above which the first in-plane mode is antisymmetric.
// For an inclined span the chord c replaces l, the chord tension H/cos β
// replaces H and the sag normal to the chord, d·cos β, replaces the sag
// (a common approximation for moderate inclinations, common practice).
func Frequencies(s Span, h units.Force, m units.MassPerLength, ea units.AxialStiffness) (Modes, error) {
	if err := s.Validate(); err != nil {
		return Modes{}, err
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"horizontal tension", float64(h)}, {"mass per metre", float64(m)}, {"EA", float64(ea)}} {
		if err := positive(f.name, f.v); err != nil {
			return Modes{}, err
		}
	}
	L := float64(s.Length)
	c := float64(s.Chord())
	cb := L / c
	hc := float64(h) / cb
	sag := float64(m) * units.StandardGravity * L * L / (8 * float64(h))
	r := sag * cb / c
	f0 := math.Sqrt(hc/float64(m)) / (2 * c)
	l2 := 64 * r * r * float64(ea) / (hc * effectiveLengthRatio(r))
	if !finite(f0) || !finite(l2) || f0 == 0 || !(l2 > 0) {
		return Modes{}, errOutOfRange
	}
	wbar, ok := symmetricRoot(l2)
	if !ok {
		return Modes{}, errNoConv("symmetric in-plane frequency")
	}
	return Modes{
		Swing:         units.Frequency(f0),
		Antisymmetric: units.Frequency(2 * f0),
		Symmetric:     units.Frequency(wbar / math.Pi * f0),
		LambdaSq:      l2,
		Sag:           units.Length(sag),
	}, nil
}

// effectiveLengthRatio returns L_e/l = (1/l) ∫₀ˡ (1 + z'²)^{3/2} dx for the
// parabola of sag ratio r, whose slope p = z' runs linearly from 4r to −4r:
//
//	L_e/l = (1/(8r)) ∫ (1+p²)^{3/2} dp over [−4r, 4r]
//	∫ (1+p²)^{3/2} dp = p(1+p²)^{3/2}/4 + (3/8)(p√(1+p²) + asinh p)
//
// (the reduction formula ∫aᵐ = (p aᵐ + m∫aᵐ⁻²)/(m+1), a = √(1+p²)); below
// r = 1e-3 its series 1 + 8r² + 19.2r⁴ avoids the cancellation.
func effectiveLengthRatio(r float64) float64 {
	if r < 1e-3 {
		return 1 + 8*r*r + 19.2*r*r*r*r
	}
	p := 4 * r
	a := math.Sqrt(1 + p*p)
	half := p*a*a*a/4 + 3.0/8*(p*a+math.Asinh(p))
	return 2 * half / (8 * r)
}

// symmetricRoot returns the first root ω̄ ∈ (π, 3π) of
// tan(ω̄/2) = ω̄/2 − (4/λ²)(ω̄/2)³, solved in x = ω̄/2 ∈ (π/2, 3π/2) as the
// pole-free G(x) = λ² sin x − x cos x (λ² − 4x²) = 0 scaled by 1/(λ² + 4x²),
// which is positive at π/2 and negative at 3π/2.
func symmetricRoot(l2 float64) (float64, bool) {
	g := func(x float64) (float64, float64) {
		sn, cs := math.Sincos(x)
		den := l2 + 4*x*x
		a := l2 - 4*x*x
		G := (l2*sn - x*cs*a) / den
		// dG/dx of the numerator: λ² cos x − cos x·a + x sin x·a + 8x² cos x
		dN := l2*cs - cs*a + x*sn*a + 8*x*x*cs
		dG := (dN - G*8*x) / den
		// the bracketed solver wants an increasing function
		return -G, -dG
	}
	lo, hi := math.Pi/2, 3*math.Pi/2
	// start: interpolate between the limits in λ²
	x0 := math.Pi/2 + (4.493409457909064-math.Pi/2)*l2/(l2+20)
	x, ok := newtonBracket(g, lo, hi, x0, 1e-15, 200)
	return 2 * x, ok
}
