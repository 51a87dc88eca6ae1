package vibration

import (
	"math"

	"gonum.org/v1/gonum/mat"
)

// lowestEigen returns the eigenvalues of the symmetric band matrix a
// (half-bandwidth band) in ascending order, and unit eigenvectors, one per
// column of vecs, of those not above lamMax.
//
// The eigenvalues come from gonum's mat.EigenSym without vectors; each
// wanted vector from inverse iteration on the band, (A − λI)x_{k+1} = x_k
// by Gaussian elimination with partial pivoting (the band LU of LAPACK's
// dgbtrf, Golub & Van Loan, Matrix Computations, §4.3 and §8.2.2, from
// memory), orthogonalised against the vectors already found. Each vector's
// residual ‖Ax − λx‖ is checked; should one fail, the vectors come from
// mat.EigenSym after all. Asking EigenSym for every vector costs four to
// five times as much when only the lowest few are wanted.
func lowestEigen(a *mat.SymDense, band int, lamMax float64) (vals []float64, vecs *mat.Dense, ok bool) {
	var es mat.EigenSym
	if !es.Factorize(a, false) {
		return nil, nil, false
	}
	vals = es.Values(nil)
	n := len(vals)
	want := 0
	for want < n && vals[want] <= lamMax {
		want++
	}
	if want == 0 {
		return vals, mat.NewDense(n, 1, nil), true
	}
	norm := math.Max(math.Abs(vals[0]), math.Abs(vals[n-1]))
	vecs = mat.NewDense(n, want, nil)
	if inverseIteration(a, band, vals[:want], norm, vecs) {
		return vals, vecs, true
	}
	// The fallback: every vector from EigenSym.
	if !es.Factorize(a, true) {
		return nil, nil, false
	}
	var all mat.Dense
	es.VectorsTo(&all)
	vecs.Copy(all.Slice(0, n, 0, want))
	return vals, vecs, true
}

// inverseIteration fills the columns of vecs with unit eigenvectors of a
// for the eigenvalues lams, and reports whether every one meets its
// residual bound ‖Ax − λx‖ ≤ 1e-9‖A‖.
func inverseIteration(a *mat.SymDense, band int, lams []float64, norm float64, vecs *mat.Dense) bool {
	n := a.SymmetricDim()
	w := make([]float64, n*(3*band+1)) // the band factors, see bandLU
	piv := make([]int, n)
	x := make([]float64, n)
	xv, ax := mat.NewVecDense(n, x), mat.NewVecDense(n, nil)
	col := make([]float64, n)
	tiny := 1e-14 * norm
	if tiny == 0 {
		tiny = 1e-300
	}
	for k, lam := range lams {
		bandLU(a, band, lam, tiny, w, piv)
		// A start with a component along every eigenvector.
		for i := range x {
			x[i] = 1 + 0.5*math.Sin(1.7*float64(i)+0.3)
		}
		for range 3 {
			bandSolve(w, piv, n, band, x)
			for j := range k {
				orthogonalise(x, vecs, j, col)
			}
			for j := range k {
				orthogonalise(x, vecs, j, col)
			}
			if !normalise(x) {
				return false
			}
		}
		// residual ‖Ax − λx‖ over the whole matrix, band or not
		ax.MulVec(a, xv)
		ax.AddScaledVec(ax, -lam, xv)
		if !(mat.Norm(ax, 2) <= 1e-9*norm) {
			return false
		}
		vecs.SetCol(k, x)
	}
	return true
}

// orthogonalise removes from x its component along column j of vecs.
func orthogonalise(x []float64, vecs *mat.Dense, j int, col []float64) {
	mat.Col(col, j, vecs)
	var d float64
	for i, v := range col {
		d += v * x[i]
	}
	for i, v := range col {
		x[i] -= d * v
	}
}

// normalise scales x to unit length and reports whether it could.
func normalise(x []float64) bool {
	var s float64
	for _, v := range x {
		s += v * v
	}
	s = math.Sqrt(s)
	if !(s > 0) || math.IsInf(s, 0) {
		return false
	}
	for i := range x {
		x[i] /= s
	}
	return true
}

// bandLU factors A − σI, A symmetric with half-bandwidth b, by Gaussian
// elimination with partial pivoting into w and the pivots piv. Row i of w
// holds columns i−b … i+2b (w[i(3b+1) + j−i+b]): the multipliers to its
// left, U reaching 2b above the diagonal after the interchanges. As in LAPACK's
// dgbtf2, an interchange at step j moves columns j … j+2b only, so that the
// multipliers of earlier steps stay where the solve replays them. A pivot
// below tiny is set to tiny: inverse iteration wants the near-singular
// factor.
func bandLU(a *mat.SymDense, b int, sigma, tiny float64, w []float64, piv []int) {
	n := a.SymmetricDim()
	width := 3*b + 1
	at := func(i, j int) int { return i*width + j - i + b }
	raw := a.RawSymmetric() // the upper triangle holds the matrix
	for i := range n {
		for j := i - b; j <= i+2*b; j++ {
			v := 0.0
			switch {
			case j < 0 || j >= n:
			case j < i:
				v = raw.Data[j*raw.Stride+i]
			case j <= i+b:
				v = raw.Data[i*raw.Stride+j]
			}
			if i == j {
				v -= sigma
			}
			w[at(i, j)] = v
		}
	}
	for j := range n {
		last := min(n-1, j+b)
		p := j
		for i := j + 1; i <= last; i++ {
			if math.Abs(w[at(i, j)]) > math.Abs(w[at(p, j)]) {
				p = i
			}
		}
		piv[j] = p
		end := min(n-1, j+2*b)
		if p != j {
			for c := j; c <= end; c++ {
				w[at(j, c)], w[at(p, c)] = w[at(p, c)], w[at(j, c)]
			}
		}
		d := w[at(j, j)]
		if math.Abs(d) < tiny {
			d = math.Copysign(tiny, d)
			w[at(j, j)] = d
		}
		for i := j + 1; i <= last; i++ {
			m := w[at(i, j)] / d
			w[at(i, j)] = m
			if m == 0 {
				continue
			}
			for c := j + 1; c <= end; c++ {
				w[at(i, c)] -= m * w[at(j, c)]
			}
		}
	}
}

// bandSolve solves (A − σI) y = x in place with the factors of bandLU.
func bandSolve(w []float64, piv []int, n, b int, x []float64) {
	width := 3*b + 1
	at := func(i, j int) int { return i*width + j - i + b }
	for j := range n {
		if p := piv[j]; p != j {
			x[j], x[p] = x[p], x[j]
		}
		for i := j + 1; i <= min(n-1, j+b); i++ {
			x[i] -= w[at(i, j)] * x[j]
		}
	}
	for i := n - 1; i >= 0; i-- {
		s := x[i]
		for c := i + 1; c <= min(n-1, i+2*b); c++ {
			s -= w[at(i, c)] * x[c]
		}
		x[i] = s / w[at(i, i)]
	}
}
