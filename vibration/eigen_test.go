package vibration

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// bandMatrix returns a symmetric n×n matrix of half-bandwidth b with
// entries from a fixed sequence and a dominant diagonal of both signs.
func bandMatrix(n, b int) *mat.SymDense {
	a := mat.NewSymDense(n, nil)
	for i := range n {
		for j := i; j <= min(n-1, i+b); j++ {
			a.SetSym(i, j, math.Sin(float64(3*i+7*j)+0.4))
		}
		a.SetSym(i, i, float64(i%5)-2+0.1*float64(i))
	}
	return a
}

// TestBandSolve: the band LU with partial pivoting solves (A − σI)x = y as
// gonum's dense LU does (mat.LU, an independent solver).
func TestBandSolve(t *testing.T) {
	const n, b, sigma = 40, 3, 0.37
	a := bandMatrix(n, b)
	w, piv := make([]float64, n*(3*b+1)), make([]int, n)
	bandLU(a, b, sigma, 1e-300, w, piv)
	x := make([]float64, n)
	for i := range x {
		x[i] = math.Cos(float64(i))
	}
	want := mat.NewVecDense(n, append([]float64(nil), x...))
	bandSolve(w, piv, n, b, x)

	shifted := mat.NewDense(n, n, nil)
	shifted.Copy(a)
	for i := range n {
		shifted.Set(i, i, shifted.At(i, i)-sigma)
	}
	var lu mat.LU
	lu.Factorize(shifted)
	var ref mat.VecDense
	if err := lu.SolveVecTo(&ref, false, want); err != nil {
		t.Fatal(err)
	}
	for i := range n {
		if math.Abs(x[i]-ref.AtVec(i)) > 1e-10*(1+math.Abs(ref.AtVec(i))) {
			t.Errorf("x[%d] = %v, want %v", i, x[i], ref.AtVec(i))
		}
	}
}

// TestLowestEigen: the vectors by inverse iteration are those of
// mat.EigenSym with all its vectors, up to sign, for a band matrix with
// eigenvalues of both signs.
func TestLowestEigen(t *testing.T) {
	const n, b = 80, 5
	a := bandMatrix(n, b)
	var es mat.EigenSym
	if !es.Factorize(a, true) {
		t.Fatal("EigenSym failed")
	}
	ref := es.Values(nil)
	var refVecs mat.Dense
	es.VectorsTo(&refVecs)
	vals, vecs, ok := lowestEigen(a, b, ref[20])
	if !ok {
		t.Fatal("lowestEigen failed")
	}
	if _, c := vecs.Dims(); c != 21 {
		t.Fatalf("%d vectors, want 21", c)
	}
	for k := range 21 {
		if math.Abs(vals[k]-ref[k]) > 1e-12*math.Abs(ref[n-1]) {
			t.Errorf("λ%d = %v, want %v", k, vals[k], ref[k])
		}
		var dot float64
		for i := range n {
			dot += vecs.At(i, k) * refVecs.At(i, k)
		}
		if math.Abs(math.Abs(dot)-1) > 1e-9 {
			t.Errorf("vector %d: |x·x_ref| = %v, want 1", k, math.Abs(dot))
		}
	}
}

// TestLowestEigenFallback: given a band too narrow, inverse iteration
// misses its residual bound and the vectors come from EigenSym after all.
func TestLowestEigenFallback(t *testing.T) {
	const n, b = 30, 4
	a := bandMatrix(n, b)
	var es mat.EigenSym
	es.Factorize(a, true)
	ref := es.Values(nil)
	var refVecs mat.Dense
	es.VectorsTo(&refVecs)
	if inverseIteration(a, 0, ref[:3], math.Abs(ref[n-1]), mat.NewDense(n, 3, nil)) {
		t.Fatal("inverse iteration on the diagonal alone met its bound")
	}
	_, vecs, ok := lowestEigen(a, 0, ref[2])
	if !ok {
		t.Fatal("lowestEigen failed")
	}
	for k := range 3 {
		var dot float64
		for i := range n {
			dot += vecs.At(i, k) * refVecs.At(i, k)
		}
		if math.Abs(math.Abs(dot)-1) > 1e-9 {
			t.Errorf("vector %d: |x·x_ref| = %v, want 1", k, math.Abs(dot))
		}
	}
}
