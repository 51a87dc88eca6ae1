package vibration

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// swingBridge returns a level 40 m walkway on two rope planes at ±0.6 m,
// everything at one level, sagging 0.479 m: its first lateral mode is a
// pure sway of the walkway near 0.8 Hz, a discrete taut string in v (the
// ropes' lateral stiffness H/Δx per element, their masses and the
// walkway's lumped at the stations).
func swingBridge() Model {
	const l, sag, rope, deck = 40.0, 0.479, 8.0, 60.0
	m := Model{Span: l, Walkway: Walkway{Mass: deck, Width: 1.2}}
	h := horizontal(rope+deck/2, l, sag)
	for _, y := range []float64{0.6, -0.6} {
		m.Ropes = append(m.Ropes, Rope{Name: "walkway rope", Y: units.Length(y), Shape: parabola{l, 0, sag},
			H: units.Force(h), Mass: rope, EA: 2e8, Tied: true})
	}
	return m
}

// TestResponseByHand works the lateral response of the first mode of
// swingBridge out by hand and compares Response with it.
//
// The mode is the discrete sine v_k = sin(πk/n) on n = 60 elements (its
// largest value 1 at midspan), so
//
//	ω² = 4 ΣH/(m Δx²) · sin²(π/2n)       m = 2·8 + 60 kg/m
//	M* = m Δx Σ sin²(πk/n) = m Δx n/2
//	∫|φ| dA = b Δx Σ sin(πk/n) = b Δx cot(π/2n)
//
// Sparse traffic, 0.5 walkers/m² on S = 40 × 1.2 m², ξ = 1 %: n = 24,
// n' = 10.8√(ξn), ψ = 1 at 0.8 Hz (Sétra 2006 lateral, plateau 0.5–1.1 Hz,
// from memory), p = n'·35 N·ψ/S, F* = p ∫|φ| dA. The single mode at
// resonance, M*q̈ + 2ξωM*q̇ + ω²M*q = F* cos ωt, has the steady amplitude
// |q| = F*/|K* − M*ω² + i 2ξωM*ω| = F*/(2ξK*), K* = ω²M* (Clough &
// Penzien, Dynamics of Structures, §3-2) [R], and acceleration ω²|q|.
// The amplitude is confirmed below by integrating the modal equation in
// time to its steady state.
func TestResponseByHand(t *testing.T) {
	model := swingBridge()
	const n = 60
	md, err := model.Modes(&Settings{Elements: n, MaxVertical: 3, MaxLateral: 1})
	if err != nil {
		t.Fatal(err)
	}
	i := -1
	for j, m := range md.Modes {
		if m.Kind == Lateral {
			i = j
			break
		}
	}
	if i < 0 {
		t.Fatal("no lateral mode")
	}
	mode := md.Modes[i]

	const l, b, xi = 40.0, 1.2, 0.01
	dx := l / n
	mass := 2*8 + 60.0
	hTotal := 2 * float64(model.Ropes[0].H)
	omega2 := 4 * hTotal / (mass * dx * dx) * math.Pow(math.Sin(math.Pi/(2*n)), 2)
	mStar := mass * dx * n / 2
	integral := b * dx / math.Tan(math.Pi/(2*n))
	walkers := 0.5 * l * b
	equivalent := 10.8 * math.Sqrt(xi*walkers)
	p := equivalent * 35 * 1 / (l * b)
	fStar := p * integral
	kStar := omega2 * mStar
	q := fStar / (2 * xi * kStar)
	accel := omega2 * q

	near(t, "frequency", float64(mode.Frequency), math.Sqrt(omega2)/(2*math.Pi), 1e-9)
	near(t, "modal mass", float64(mode.ModalMass), mStar, 1e-9)
	r, err := md.Response(i, Walkers{Traffic: Sparse, Damping: xi})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "ψ", r.Psi, 1, 1e-12)
	near(t, "n'", r.Equivalent, equivalent, 1e-12)
	near(t, "F*", float64(r.ModalForce), fStar, 1e-9)
	near(t, "acceleration", float64(r.Acceleration), accel, 1e-9)
	if r.Limit != 0.2 {
		t.Errorf("lateral limit for sparse traffic %v, want 0.2 m/s² (EN 1990 A2.4.3.2, from memory)", r.Limit)
	}
	// The larger lateral limit is for exceptional crowd conditions only
	// (EN 1990 A2.4.3.2, from memory): very dense traffic; dense traffic is
	// busy normal use and keeps 0.2 m/s² (the cautious reading).
	for traffic, want := range map[Traffic]units.Acceleration{Sparse: 0.2, Dense: 0.2, VeryDense: 0.4} {
		r, err := md.Response(i, Walkers{Traffic: traffic, Damping: xi})
		if err != nil {
			t.Fatal(err)
		}
		if r.Limit != want {
			t.Errorf("lateral limit for %s traffic %v, want %v", traffic, r.Limit, want)
		}
	}

	// The steady amplitude of q̈ + 2ξωq̇ + ω²q = (F*/M*) cos ωt by fourth-
	// order Runge–Kutta over 400 periods (ξωt ≈ 25: the transient gone).
	w := math.Sqrt(omega2)
	force := fStar / mStar
	f := func(t, x, v float64) float64 { return force*math.Cos(w*t) - 2*xi*w*v - omega2*x }
	dt := 2 * math.Pi / w / 200
	x, v, tt, peak := 0.0, 0.0, 0.0, 0.0
	for step := range 400 * 200 {
		k1x, k1v := v, f(tt, x, v)
		k2x, k2v := v+dt/2*k1v, f(tt+dt/2, x+dt/2*k1x, v+dt/2*k1v)
		k3x, k3v := v+dt/2*k2v, f(tt+dt/2, x+dt/2*k2x, v+dt/2*k2v)
		k4x, k4v := v+dt*k3v, f(tt+dt, x+dt*k3x, v+dt*k3v)
		x += dt / 6 * (k1x + 2*k2x + 2*k3x + k4x)
		v += dt / 6 * (k1v + 2*k2v + 2*k3v + k4v)
		tt += dt
		if step >= 399*200 {
			peak = math.Max(peak, math.Abs(x))
		}
	}
	near(t, "time-integrated resonant amplitude", peak, q, 2e-3)

	// Lock-in: N_L = 8πξfM*/k with k = 300 N·s/m (Dallard et al. 2001,
	// from memory).
	li, err := md.LockIn(i, xi, 48)
	if err != nil {
		t.Fatal(err)
	}
	nl := 8 * math.Pi * xi * math.Sqrt(omega2) / (2 * math.Pi) * mStar / 300
	near(t, "N_L", li.Critical, nl, 1e-12)
	if got := li.Check(); got.Status != check.Flag {
		t.Errorf("a crowd of 48 over N_L %.3g: %s, want flag", nl, got.Status)
	}
	if li, _ := md.LockIn(i, xi, nl/2); li.Check().Status != check.Pass {
		t.Errorf("a crowd under N_L: %s, want pass", li.Check().Status)
	}
}

// TestPsi checks the corners of the reduction ψ(f) of the load model
// (Sétra 2006, from memory) [M].
func TestPsi(t *testing.T) {
	for _, c := range []struct {
		h    Harmonic
		f    units.Frequency
		want float64
	}{
		{VerticalFirst, 1.0, 0}, {VerticalFirst, 1.25, 0}, {VerticalFirst, 1.475, 0.5}, {VerticalFirst, 1.7, 1},
		{VerticalFirst, 2.1, 1}, {VerticalFirst, 2.2, 0.5}, {VerticalFirst, 2.3, 0}, {VerticalFirst, 3, 0},
		{VerticalSecond, 2.5, 0}, {VerticalSecond, 2.95, 0.5}, {VerticalSecond, 3.8, 1}, {VerticalSecond, 4.4, 0.5}, {VerticalSecond, 4.6, 0},
		{LateralFirst, 0.3, 0}, {LateralFirst, 0.4, 0.5}, {LateralFirst, 0.8, 1}, {LateralFirst, 1.2, 0.5}, {LateralFirst, 1.3, 0},
	} {
		if got := c.h.Psi(c.f); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("%s: ψ(%v) = %v, want %v", c.h.Name, c.f, got, c.want)
		}
	}
	// Very dense traffic: n' = 1.85√n whatever the damping.
	if got := EquivalentNumber(VeryDense, 0.3, 100); math.Abs(got-18.5) > 1e-12 {
		t.Errorf("n' very dense = %v, want 18.5", got)
	}
}

// TestTorsionalResponse: a torsional mode is excited with the walkers'
// vertical force taken in the direction of the mode on each side of the
// axis; ∫|W + θy| over the width is two triangles when the section turns
// about a point within it.
func TestTorsionalResponse(t *testing.T) {
	md, err := demoLike().Modes(nil)
	if err != nil {
		t.Fatal(err)
	}
	i := -1
	for j, m := range md.Modes {
		if m.Kind == Torsional {
			i = j
			break
		}
	}
	if i < 0 {
		t.Fatal("no torsional mode")
	}
	r, err := md.Response(i, Walkers{Traffic: Dense, Damping: 0.01})
	if err != nil {
		t.Fatal(err)
	}
	// By the midpoint rule over 200 strips across the width.
	mode := md.Modes[i]
	var sum float64
	for k := 1; k < md.Elements; k++ {
		dx := float64(md.Stations[k+1]-md.Stations[k-1]) / 2
		s := mode.Walkway[k]
		for j := range 200 {
			y := -0.6 + 1.2*(float64(j)+0.5)/200
			sum += dx * 1.2 / 200 * math.Abs(float64(s.W)+float64(s.Roll)*y)
		}
	}
	near(t, "∫|φ| dA", float64(r.ModalForce)/float64(r.Load), sum, 1e-4)
	if r.Direction != Up || r.Limit != LimitVertical {
		t.Errorf("torsional mode assessed %s against %v", r.Direction, r.Limit)
	}
}

// TestResponseAtTheTrueFrequency: the lumped chain reads a mode low (by
// its Error), and on the rising side of ψ(f) a low frequency reads ψ, and
// the acceleration with it, low. The reduction must be taken at the true
// frequency or above it on the safe side.
//
// A level walkway of span 200 m on two rope planes, everything at one
// level, sagging 13.6 m: its lateral modes are those of a taut string of
// the whole tension and mass, f_k = (k/2L)√(ΣH/m) [R: Rayleigh, The
// Theory of Sound, §123], with ΣH = mgL²/(8·sag), so f_1 = ½√(g/(8·sag))
// ≈ 0.150 Hz and the third lateral mode ≈ 0.45 Hz, on the rising side of
// the lateral ψ of Sétra 2006 (0 at 0.3 Hz, 1 from 0.5 Hz; from memory).
// On 60 elements the chain reads that mode low by 1 − sin θ/θ,
// θ = 3π/120 [D: the lumped taut string, whose Error is exact].
func TestResponseAtTheTrueFrequency(t *testing.T) {
	const l, sag, rope, deck, n = 200.0, 13.6, 8.0, 60.0, 60
	m := Model{Span: l, Walkway: Walkway{Mass: deck, Width: 1.2}}
	h := horizontal(rope+deck/2, l, sag)
	for _, y := range []float64{0.6, -0.6} {
		m.Ropes = append(m.Ropes, Rope{Name: "walkway rope", Y: units.Length(y), Shape: parabola{l, 0, sag},
			H: units.Force(h), Mass: rope, EA: 2e8, Tied: true})
	}
	md, err := m.Modes(&Settings{Elements: n, MaxVertical: 1, MaxLateral: 0.6})
	if err != nil {
		t.Fatal(err)
	}
	i := -1
	for j, mode := range md.Modes {
		if mode.Kind == Lateral && mode.HalfWaves == 3 {
			i = j
		}
	}
	if i < 0 {
		t.Fatal("no lateral mode of three half-waves")
	}
	exact := 3 / (2 * l) * math.Sqrt(2*h/(2*rope+deck))
	if exact < 0.3 || exact > 0.5 {
		t.Fatalf("test set-up: the third lateral mode at %.4f Hz is not on the rising side of ψ", exact)
	}
	resp, err := md.Response(i, Walkers{Traffic: Sparse, Damping: 0.01})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "corrected frequency", float64(resp.Corrected), exact, 1e-9)
	want := LateralFirst.Psi(units.Frequency(exact))
	if resp.Psi < want*(1-1e-9) {
		t.Errorf("ψ = %.6f at the mesh's %.5f Hz, below ψ = %.6f at the string's %.5f Hz: the acceleration reads low",
			resp.Psi, float64(resp.Frequency), want, exact)
	}
	if _, ok := resp.Check().Value("f_c"); !ok {
		t.Error("the check does not report the corrected frequency f_c")
	}
}

// TestPsiMax: the largest ψ over a band of frequencies, against ψ sampled
// finely over it [D: the trapezoid of Sétra 2006 sampled, from memory].
func TestPsiMax(t *testing.T) {
	for _, h := range []Harmonic{VerticalFirst, VerticalSecond, LateralFirst} {
		for lo := 0.0; lo < 5; lo += 0.037 {
			for _, w := range []float64{0, 0.01, 0.05, 0.3, 1} {
				var want float64
				for k := 0; k <= 2000; k++ {
					want = math.Max(want, h.Psi(units.Frequency(lo+w*float64(k)/2000)))
				}
				got := h.PsiMax(units.Frequency(lo), units.Frequency(lo+w))
				if got < want-1e-12 || got > want+w/2000*10 {
					t.Errorf("%s: ψ max over %.3f–%.3f Hz = %.6f, sampled %.6f", h.Name, lo, lo+w, got, want)
				}
			}
		}
	}
}
