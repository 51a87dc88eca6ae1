package tower_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"

	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// feBuckling returns the critical load of a column of length l and
// stiffness EI on a base rotational spring EI/(k l) (k = 0: rigid) with a
// lateral spring K at its top (math.Inf: held), by cubic beam finite
// elements with the consistent geometric stiffness matrix, reduced to a
// symmetric eigenproblem through the Cholesky factor of the elastic
// stiffness and solved by gonum: a route independent of the closed-form
// characteristic equation of EffectiveLengthFactor.
func feBuckling(t *testing.T, ei, l, k, spring float64) float64 {
	t.Helper()
	const ne = 40
	h := l / ne
	n := 2 * (ne + 1) // (y, θ) per node
	kk := mat.NewSymDense(n, nil)
	kg := mat.NewSymDense(n, nil)
	ke := [4][4]float64{{12, 6 * h, -12, 6 * h}, {6 * h, 4 * h * h, -6 * h, 2 * h * h}, {-12, -6 * h, 12, -6 * h}, {6 * h, 2 * h * h, -6 * h, 4 * h * h}}
	gk := [4][4]float64{{36, 3 * h, -36, 3 * h}, {3 * h, 4 * h * h, -3 * h, -h * h}, {-36, -3 * h, 36, -3 * h}, {3 * h, -h * h, -3 * h, 4 * h * h}}
	for e := range ne {
		for i := range 4 {
			for j := i; j < 4; j++ {
				a, b := 2*e+i, 2*e+j
				kk.SetSym(a, b, kk.At(a, b)+ei/(h*h*h)*ke[i][j])
				kg.SetSym(a, b, kg.At(a, b)+gk[i][j]/(30*h))
			}
		}
	}
	// Boundary conditions: y0 = 0 always; θ0 = 0 for a rigid base, else a
	// spring; the top lateral spring, or y_n = 0 when held.
	keep := []int{}
	for i := 1; i < n; i++ {
		if i == 1 && k == 0 {
			continue
		}
		if i == n-2 && math.IsInf(spring, 1) {
			continue
		}
		keep = append(keep, i)
	}
	if k > 0 {
		kk.SetSym(1, 1, kk.At(1, 1)+ei/(k*l))
	}
	if !math.IsInf(spring, 1) {
		kk.SetSym(n-2, n-2, kk.At(n-2, n-2)+spring)
	}
	m := len(keep)
	kr, gr := mat.NewSymDense(m, nil), mat.NewSymDense(m, nil)
	for i, a := range keep {
		for j, b := range keep {
			if j >= i {
				kr.SetSym(i, j, kk.At(a, b))
				gr.SetSym(i, j, kg.At(a, b))
			}
		}
	}
	var ch mat.Cholesky
	if !ch.Factorize(kr) {
		t.Fatal("elastic stiffness not positive definite")
	}
	var lt mat.TriDense
	ch.LTo(&lt)
	// C = L⁻¹ K_g L⁻ᵀ; its largest eigenvalue is 1/N_cr.
	var x mat.Dense
	if err := x.Solve(&lt, gr); err != nil {
		t.Fatal(err)
	}
	var c mat.Dense
	if err := c.Solve(&lt, x.T()); err != nil {
		t.Fatal(err)
	}
	cs := mat.NewSymDense(m, nil)
	for i := range m {
		for j := i; j < m; j++ {
			cs.SetSym(i, j, (c.At(i, j)+c.At(j, i))/2)
		}
	}
	var eig mat.EigenSym
	if !eig.Factorize(cs, false) {
		t.Fatal("eigen factorisation failed")
	}
	v := eig.Values(nil)
	return 1 / v[len(v)-1]
}

// TestEffectiveLengthFactor: l0/l of a column on a flexible base with a
// spring at its top agrees with beam finite elements (gonum eigensolver) to
// 1e-5, reproduces the classical limits (Timoshenko & Gere, Theory of
// Elastic Stability, ch. 2: the cantilever 2, fixed base and held pinned top
// 0.699, from the root 4.4934 of tan u = u) and lies within 2 % of
// EN 1992-1-1:2004 eq. 5.16 (unbraced, l0 = l·max{√(1 + 10 k1k2/(k1 + k2));
// (1 + k1/(1 + k1))(1 + k2/(1 + k2))}) and eq. 5.15 (braced,
// l0 = 0.5 l √((1 + k1/(0.45 + k1))(1 + k2/(0.45 + k2)))) with k2 = ∞ for a
// top free to rotate [R, the clause's formulas as quoted in two published
// implementations of it; the clause itself calls them approximations].
func TestEffectiveLengthFactor(t *testing.T) {
	const ei, l = 2e7, 5.0
	for _, tc := range []struct{ k, s float64 }{
		{0, 0}, {0, math.Inf(1)}, {0.1, 0}, {0.1, math.Inf(1)}, {0, 14.4}, {0.1, 14.4}, {0.1, 3}, {0.5, 40}, {2, 1}, {0.1, 1000},
	} {
		got, err := tower.EffectiveLengthFactor(tc.k, tc.s)
		if err != nil {
			t.Fatal(err)
		}
		ncr := feBuckling(t, ei, l, tc.k, tc.s*ei/(l*l*l))
		want := math.Pi * math.Sqrt(ei/ncr) / l
		if !near(got, want, 1e-5) {
			t.Errorf("k %g s %g: l0/l %.6f, finite elements %.6f", tc.k, tc.s, got, want)
		}
	}
	for _, tc := range []struct{ k, s, want, tol float64 }{
		{0, 0, 2, 1e-9},                                           // the cantilever
		{0, math.Inf(1), math.Pi / 4.4934, 2e-5},                  // fixed base, held pinned top
		{0.1, 0, (1 + 0.1/1.1) * 2, 0.02},                         // EN 1992-1-1 eq. 5.16, k2 = ∞: 2.182
		{0.1, math.Inf(1), 0.5 * math.Sqrt((1+0.1/0.55)*2), 0.02}, // eq. 5.15, k2 = ∞: 0.769
	} {
		got, err := tower.EffectiveLengthFactor(tc.k, tc.s)
		if err != nil || !near(got, tc.want, tc.tol) {
			t.Errorf("k %g s %g: %g, want %g ± %g (%v)", tc.k, tc.s, got, tc.want, tc.tol, err)
		}
	}
	// On a flexible base eq. 5.16 errs short (k1 = 1: max(√11, 3) = 3.317
	// against 3.652): the exact root, used here, is the longer.
	if got, _ := tower.EffectiveLengthFactor(1, 0); !(got > math.Sqrt(11)) {
		t.Errorf("k 1: %g, not above eq. 5.16's %g", got, math.Sqrt(11))
	}
	for _, bad := range [][2]float64{{-0.1, 0}, {math.NaN(), 0}, {0.1, -1}, {0.1, math.NaN()}, {math.Inf(1), 0}} {
		if _, err := tower.EffectiveLengthFactor(bad[0], bad[1]); !errors.Is(err, tower.ErrInvalid) {
			t.Errorf("k %g s %g: %v", bad[0], bad[1], err)
		}
	}
}

// TestColumnsOnDefaultBase: a column whose base flexibility is not given
// stands on k = 0.1, the least flexibility EN 1992-1-1:2004 5.8.3.2(3)
// recommends ("rigid fixity is rare in practice"), not on the rigid base
// of the textbook cantilever: a free top gives l0 = π l/u with u tan u = 10
// (the cantilever on a rotational spring EI/(0.1 l), solved here by
// bisection), 2.199 l; a held top 0.760 l (beam finite elements). The
// rigid-base value 2 l, used before, is 9 % short: unconservative.
func TestColumnsOnDefaultBase(t *testing.T) {
	lo, hi := 1.0, math.Pi/2-1e-12
	for range 200 {
		if mid := (lo + hi) / 2; mid*math.Tan(mid) < 10 {
			lo = mid
		} else {
			hi = mid
		}
	}
	free := math.Pi / lo
	held := math.Pi * math.Sqrt(1/feBuckling(t, 1, 1, 0.1, math.Inf(1)))
	if !near(free, 2.1987, 1e-4) || !near(held, 0.7602, 1e-3) {
		t.Fatalf("hand values: free %g, held %g", free, held)
	}
	bar := units.Area(math.Pi * 0.008 * 0.008)
	rc := tower.RCColumn{
		Section: tower.RCSection{B: 0.35, H: 0.35, Fc: 25 * mpa, Fy: 500 * mpa, Code: tower.EN1992,
			Bars: tower.RectangularBars(0.35, 0.35, 0.05, 2, 0, bar)},
		Length: 7, Along: tower.HeldTop, Across: tower.FreeTop,
	}
	res, err := rc.Check(tower.ColumnActions{N: kN(300), Along: kNm(10)})
	if err != nil {
		t.Fatal(err)
	}
	if got := value(t, res.Across, "l0"); !near(got, 7*free, 1e-6) {
		t.Errorf("RC column, free top: l0 %g, want %g", got, 7*free)
	}
	if got := value(t, res.Along, "l0"); !near(got, 7*held, 1e-5) {
		t.Errorf("RC column, held top: l0 %g, want %g", got, 7*held)
	}
	if !strings.Contains(res.Across.Basis, "base flexibility k 0.1") || value(t, res.Across, "k_base") != 0.1 {
		t.Errorf("basis %q does not name the base flexibility", res.Across.Basis)
	}
	sc := tower.SteelColumn{Tube: tower.Tube{Shape: tower.Circular, Size: 0.273, Wall: 0.010, Fy: 355 * mpa,
		E: 210 * units.Gigapascal, Code: tower.EN1993}, Length: 4}
	sr, err := sc.Check(tower.ColumnActions{N: kN(300), Along: kNm(10)})
	if err != nil {
		t.Fatal(err)
	}
	if got := value(t, sr.Along, "l0_y"); !near(got, 4*free, 1e-6) {
		t.Errorf("steel column, free top: l0 %g, want %g", got, 4*free)
	}
}
