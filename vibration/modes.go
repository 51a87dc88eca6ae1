package vibration

import (
	"fmt"
	"math"
	"slices"

	"gonum.org/v1/gonum/mat"

	"github.com/sagspan/sagspan/units"
)

// Kind says what a mode mostly moves.
type Kind int

// The kinds of mode, by where most of the mode's kinetic energy lies: in
// the mean vertical, lateral or longitudinal motion of the cross-sections,
// in their roll (and the ropes' motion relative to one another), or, on a
// model with a walkway, in untied ropes while the walkway stays nearly
// still (more than half the energy outside the walkway).
const (
	Vertical Kind = iota
	Lateral
	Torsional
	Longitudinal
	Local
)

var kindNames = [...]string{Vertical: "vertical", Lateral: "lateral", Torsional: "torsional", Longitudinal: "longitudinal", Local: "local rope"}

func (k Kind) String() string {
	if k < 0 || int(k) >= len(kindNames) {
		return fmt.Sprintf("Kind(%d)", int(k))
	}
	return kindNames[k]
}

// Section is the motion of the walkway's cross-section at a station: U
// along the bridge, V across, W up, at its centre of mass, and its roll
// about the bridge axis.
type Section struct {
	U, V, W units.Length
	Roll    units.Angle
}

// Displacement is the motion of a rope node: U along the bridge, V across,
// W up.
type Displacement struct {
	U, V, W units.Length
}

// Mode is one natural mode of vibration.
type Mode struct {
	Frequency units.Frequency
	Kind      Kind
	// Symmetric reports whether the mode's main motion is symmetric about
	// midspan (a mirror image of itself); false means antisymmetric.
	Symmetric bool
	// HalfWaves counts the half-waves of the main motion along the span.
	HalfWaves int
	// ModalMass is M* = φᵀMφ with the mode shape φ scaled (and signed, the
	// largest value of its main motion positive) so that the
	// largest displacement of the walking surface in the mode's direction
	// is 1 (vertical at the walkway's edge for vertical and torsional
	// modes, lateral for lateral modes; without a walkway, the largest
	// displacement of any rope node in that direction).
	ModalMass units.Mass
	// Effective are the effective modal masses along x, y and z,
	// (φᵀMr)²/(φᵀMφ) with r a unit translation: over all modes of the
	// model they add up to its moving mass.
	Effective [3]units.Mass
	// Error is the estimated relative discretisation error of Frequency,
	// which the lumped chain reads low: 1 − sin θ/θ with θ from the main
	// motion c along the stations, sin²θ = Σ(Δc)²/(4Σc²); for a taut
	// string's mode of k half-waves on n elements θ = πk/(2n) and the
	// estimate is exact.
	Error float64
	// Walkway is the walkway's cross-section motion at each station, in
	// the scaling of ModalMass; nil when the model has no walkway.
	Walkway []Section
	// Ropes holds each rope's node displacements at each station.
	Ropes [][]Displacement
}

// Label names the mode's kind and symmetry, such as "vertical,
// antisymmetric".
func (m Mode) Label() string {
	if m.Symmetric {
		return m.Kind.String() + ", symmetric"
	}
	return m.Kind.String() + ", antisymmetric"
}

// Modal is the result of a modal analysis.
type Modal struct {
	// Modes are the modes within the cut-off frequencies, lowest first.
	Modes []Mode
	// Stations are the abscissae x_k = k·L/n of the mesh, 0..n.
	Stations []units.Length
	// Elements is the number of elements along the span.
	Elements int
	// Mass is the moving mass: everything lumped at the interior stations.
	Mass units.Mass
	// Span and Width are the model's span and walkway width (zero without
	// a walkway).
	Span, Width units.Length
}

// Modes returns the natural modes of m within the cut-off frequencies of
// s, by a lumped-mass discretisation about the static equilibrium:
//
//	K φ = ω² M φ,   f = ω/2π
//
// K the tangent stiffness of the tensioned rope elements (axial and
// geometric; see the elements' doc) with the walkway's rigid cross-section
// tying the tied ropes, M the lumped masses with longitudinal, lateral and
// vertical degrees of freedom (and the walkway's roll inertia). M is block
// diagonal by station, M = LLᵀ, and the symmetric problem L⁻¹KL⁻ᵀ y = ω² y
// is solved one uncoupled group of degrees of freedom at a time (a model
// symmetric about the bridge axis splits into its in-plane and its
// lateral-torsional motion): its eigenvalues by gonum's mat.EigenSym, the
// vectors of those wanted by inverse iteration on the band (see
// lowestEigen).
//
// It returns an error wrapping ErrInvalid for a model that does not
// validate, a mesh coarser than MinElements or too coarse for the highest
// mode kept (estimated error over 5 %), or a model with a mode of no
// stiffness.
func (m Model) Modes(s *Settings) (Modal, error) {
	if err := m.Validate(); err != nil {
		return Modal{}, err
	}
	vmax, lmax, err := s.bounds()
	if err != nil {
		return Modal{}, err
	}
	n, err := m.elements(s, max(vmax, lmax))
	if err != nil {
		return Modal{}, err
	}
	sys, err := newSystem(m, n)
	if err != nil {
		return Modal{}, err
	}
	modes, err := sys.solve(vmax, lmax)
	if err != nil {
		return Modal{}, err
	}
	for i, md := range modes {
		if md.Error > maxModeError {
			// the error grows as 1/n²
			need := int(math.Ceil(float64(n) * math.Sqrt(md.Error/maxModeError)))
			return Modal{}, invalidf("mesh too coarse: mode %d (%s, %s) would read about %.0f %% low with %d elements; use at least %d or lower the cut-off frequency",
				i+1, md.Frequency, md.Label(), 100*md.Error, n, need)
		}
	}
	out := Modal{Modes: modes, Elements: n, Mass: units.Mass(sys.totalMass()), Span: m.Span, Width: m.Walkway.Width}
	out.Stations = make([]units.Length, n+1)
	for k, x := range sys.x {
		out.Stations[k] = units.Length(x)
	}
	return out, nil
}

// solve returns the modes within the cut-offs, lowest first.
func (s *system) solve(vmax, lmax float64) ([]Mode, error) {
	N, p := s.dofs(), s.p
	// Station by station M_k = L_k L_kᵀ and L_k⁻¹.
	linv := make([]float64, (s.n-1)*p*p)
	for k := 1; k < s.n; k++ {
		if !invCholesky(s.mass[(k-1)*p*p:k*p*p], linv[(k-1)*p*p:k*p*p], p) {
			return nil, invalidf("the lumped mass at x = %.2f m is not positive definite: the walkway's roll has no inertia (give it a mass or tie ropes on both sides of the axis)", s.x[k])
		}
	}
	// A = L⁻¹ K L⁻ᵀ, block tridiagonal by station as K.
	a := newBlockTri(s.n-1, p)
	tmp := make([]float64, p*p)
	form := func(kb, lk, lj, out []float64) {
		// tmp = L_k⁻¹ K_kj, out = tmp L_j⁻ᵀ
		for r := range p {
			for c := range p {
				var sum float64
				for q := 0; q <= r; q++ {
					sum += lk[r*p+q] * kb[q*p+c]
				}
				tmp[r*p+c] = sum
			}
		}
		for r := range p {
			for c := range p {
				var sum float64
				for q := 0; q <= c; q++ {
					sum += tmp[r*p+q] * lj[c*p+q]
				}
				out[r*p+c] = sum
			}
		}
	}
	for k := range s.n - 1 {
		lk := linv[k*p*p : (k+1)*p*p]
		form(s.k.diag(k), lk, lk, a.diag(k))
		if k+1 < s.n-1 {
			form(s.k.off(k), lk, linv[(k+1)*p*p:(k+2)*p*p], a.off(k))
		}
	}
	fmax := max(vmax, lmax)
	var modes []Mode
	y := make([]float64, N)
	x := make([]float64, N)
	for _, comp := range components(a) {
		c := len(comp)
		sym := mat.NewSymDense(c, nil)
		for i, gi := range comp {
			// within a station and the next: the block-tridiagonal band
			end := (gi/p + 2) * p
			for j := i; j < c && comp[j] < end; j++ {
				sym.SetSym(i, j, a.at(gi, comp[j]))
			}
		}
		// Indices of a component keep the station order: its band is at
		// most the system's, 2p − 1.
		lamMax := math.Pow(2*math.Pi*fmax, 2) * (1 + 1e-9)
		vals, vecs, ok := lowestEigen(sym, min(2*p-1, c-1), lamMax)
		if !ok {
			return nil, fmt.Errorf("vibration: the eigensolver did not converge on %d degrees of freedom", c)
		}
		if !(vals[0] > 0) || !finite(vals[0]) {
			return nil, invalidf("the model has a mode of no stiffness (ω² = %g): a rope without tension, or a walkway free to roll", vals[0])
		}
		for col, lam := range vals {
			f := math.Sqrt(lam) / (2 * math.Pi)
			if f > fmax {
				break // the values ascend
			}
			clear(y)
			for i, gi := range comp {
				y[gi] = vecs.At(i, col)
			}
			// x = L⁻ᵀ y, station by station: M-normalised, xᵀMx = 1.
			for k := 1; k < s.n; k++ {
				lk := linv[(k-1)*p*p : k*p*p]
				base := (k - 1) * p
				for r := range p {
					var sum float64
					for q := r; q < p; q++ {
						sum += lk[q*p+r] * y[base+q]
					}
					x[base+r] = sum
				}
			}
			md := s.mode(f, x)
			if (md.Kind == Lateral && f <= lmax) || (md.Kind != Lateral && f <= vmax) {
				modes = append(modes, md)
			}
		}
	}
	slices.SortStableFunc(modes, func(a, b Mode) int {
		switch {
		case a.Frequency < b.Frequency:
			return -1
		case a.Frequency > b.Frequency:
			return 1
		}
		return 0
	})
	return modes, nil
}

// mode builds the mode of frequency f from its M-normalised vector x:
// the rope and walkway motions, kind, symmetry, half-waves, scaling and
// masses.
func (s *system) mode(f float64, x []float64) Mode {
	n, p := s.n, s.p
	md := Mode{Frequency: units.Frequency(f)}
	md.Ropes = make([][]Displacement, len(s.m.Ropes))
	for r := range s.m.Ropes {
		md.Ropes[r] = make([]Displacement, n+1)
		for k := 1; k < n; k++ {
			g := s.node(r, k)
			var d [3]float64
			for e := 0; e < g.n; e++ {
				d[g.e[e].row] += g.e[e].c * x[(k-1)*p+g.e[e].col]
			}
			md.Ropes[r][k] = Displacement{units.Length(d[0]), units.Length(d[1]), units.Length(d[2])}
		}
	}
	for _, rl := range s.rollers {
		var us float64
		for i, c := range rl.c {
			us -= c * x[(rl.b-1)*p+i]
		}
		md.Ropes[rl.rope][rl.station].U = units.Length(us / rl.kss)
	}
	if s.deck {
		md.Walkway = make([]Section, n+1)
		for k := 1; k < n; k++ {
			b := (k - 1) * p
			md.Walkway[k] = Section{units.Length(x[b]), units.Length(x[b+1]), units.Length(x[b+2]), units.Angle(x[b+3])}
		}
	}

	// Energies of the mean motion of each cross-section, of its roll and
	// of the walkway, and the effective masses.
	var eu, ev, ew, etot, ewalk float64
	var gamma [3]float64
	mean := make([][4]float64, n+1) // Ū, V̄, W̄, roll per station
	for k := 1; k < n; k++ {
		var mt, cy, ch, su, sv, sw float64
		add := func(m, y, h float64, d [3]float64) {
			mt += m
			cy += m * y
			ch += m * h
			su += m * d[0]
			sv += m * d[1]
			sw += m * d[2]
		}
		var deckD [3]float64
		var theta float64
		if s.deck {
			b := (k - 1) * p
			deckD = [3]float64{x[b], x[b+1], x[b+2]}
			theta = x[b+3]
			add(s.deckMass, 0, 0, deckD)
		}
		for r, rope := range s.m.Ropes {
			d := md.Ropes[r][k]
			add(float64(rope.Mass)*s.dx, float64(rope.Y), s.z[r][k]-s.zd[k], [3]float64{float64(d.U), float64(d.V), float64(d.W)})
		}
		cy, ch = cy/mt, ch/mt
		ub, vb, wb := su/mt, sv/mt, sw/mt
		gamma[0] += su
		gamma[1] += sv
		gamma[2] += sw
		num, den := s.deckRoll*theta, s.deckRoll
		e := s.deckMass*(deckD[0]*deckD[0]+deckD[1]*deckD[1]+deckD[2]*deckD[2]) + s.deckRoll*theta*theta
		walk := e
		for r, rope := range s.m.Ropes {
			m := float64(rope.Mass) * s.dx
			d := md.Ropes[r][k]
			y, h := float64(rope.Y)-cy, s.z[r][k]-s.zd[k]-ch
			num += m * (y*(float64(d.W)-wb) - h*(float64(d.V)-vb))
			den += m * (y*y + h*h)
			er := m * (float64(d.U)*float64(d.U) + float64(d.V)*float64(d.V) + float64(d.W)*float64(d.W))
			e += er
			if rope.Tied {
				walk += er
			}
		}
		roll := 0.0
		if den > 0 {
			roll = num / den
		}
		mean[k] = [4]float64{ub, vb, wb, roll}
		eu += mt * ub * ub
		ev += mt * vb * vb
		ew += mt * wb * wb
		etot += e
		ewalk += walk
	}
	erot := math.Max(0, etot-eu-ev-ew)
	// Effective masses at the level of rounding (a symmetric model's lateral
	// modes have none along z, say) are zero.
	total := s.totalMass()
	for i := range gamma {
		if e := gamma[i] * gamma[i]; e > 1e-12*total {
			md.Effective[i] = units.Mass(e)
		}
	}

	// Kind: where most of the energy lies.
	comp := 2 // the series of the main motion: 0 Ū, 1 V̄, 2 W̄, 3 roll
	md.Kind = Vertical
	best := ew
	for _, c := range []struct {
		e    float64
		kind Kind
		comp int
	}{{ev, Lateral, 1}, {erot, Torsional, 3}, {eu, Longitudinal, 0}} {
		if c.e > best {
			best, md.Kind, comp = c.e, c.kind, c.comp
		}
	}
	series := make([]float64, n+1)
	for k := range series {
		series[k] = mean[k][comp]
	}
	if s.deck && ewalk < 0.5*etot {
		md.Kind = Local
		// the main motion of the rope with the most energy
		series = s.localSeries(md)
	}
	if md.Kind == Longitudinal {
		// along the bridge a mirror image reverses the displacement
		for k := range series {
			series[k] = -series[k]
		}
		md.Symmetric = mirror(series) < 0
	} else {
		md.Symmetric = mirror(series) > 0
	}
	md.HalfWaves = halfWaves(series)
	md.Error = waveError(series)

	// Scale: the largest displacement of the walking surface in the
	// mode's direction is 1.
	// The sign of an eigenvector is arbitrary: take the one that makes the
	// largest value of the main motion positive.
	scale := s.scale(md)
	var peak float64
	for _, v := range series {
		if math.Abs(v) > math.Abs(peak) {
			peak = v
		}
	}
	if md.Kind == Longitudinal {
		peak = -peak // the series was mirrored above
	}
	if scale > 0 {
		inv := 1 / scale
		if peak < 0 {
			inv = -inv
		}
		for r := range md.Ropes {
			for k := range md.Ropes[r] {
				d := &md.Ropes[r][k]
				d.U, d.V, d.W = d.U*units.Length(inv), d.V*units.Length(inv), d.W*units.Length(inv)
			}
		}
		for k := range md.Walkway {
			w := &md.Walkway[k]
			w.U, w.V, w.W, w.Roll = w.U*units.Length(inv), w.V*units.Length(inv), w.W*units.Length(inv), w.Roll*units.Angle(inv)
		}
		md.ModalMass = units.Mass(inv * inv)
	}
	return md
}

// localSeries returns the main motion (vertical or lateral) of the rope
// that carries the most energy in md.
func (s *system) localSeries(md Mode) []float64 {
	bestR, bestE, lateral := 0, -1.0, false
	for r, rope := range s.m.Ropes {
		var ev, ew float64
		for _, d := range md.Ropes[r] {
			ev += float64(d.V * d.V)
			ew += float64(d.W * d.W)
		}
		if e := float64(rope.Mass) * (ev + ew); e > bestE {
			bestR, bestE, lateral = r, e, ev > ew
		}
	}
	out := make([]float64, s.n+1)
	for k, d := range md.Ropes[bestR] {
		out[k] = float64(d.W)
		if lateral {
			out[k] = float64(d.V)
		}
	}
	return out
}

// scale returns the largest displacement, in the mode's direction, of the
// walking surface (of any rope node without a walkway).
func (s *system) scale(md Mode) float64 {
	var big float64
	half := float64(s.m.Walkway.Width) / 2
	if md.Walkway != nil && md.Kind != Local {
		for _, w := range md.Walkway {
			switch md.Kind {
			case Vertical, Torsional:
				big = math.Max(big, math.Abs(float64(w.W))+math.Abs(float64(w.Roll))*half)
			case Lateral:
				big = math.Max(big, math.Abs(float64(w.V)))
			case Longitudinal:
				big = math.Max(big, math.Abs(float64(w.U)))
			}
		}
		if big > 0 {
			return big
		}
	}
	for _, rope := range md.Ropes {
		for _, d := range rope {
			switch {
			case md.Kind == Local || md.Walkway != nil:
				big = math.Max(big, math.Sqrt(float64(d.U*d.U+d.V*d.V+d.W*d.W)))
			case md.Kind == Vertical || md.Kind == Torsional:
				big = math.Max(big, math.Abs(float64(d.W)))
			case md.Kind == Lateral:
				big = math.Max(big, math.Abs(float64(d.V)))
			default:
				big = math.Max(big, math.Abs(float64(d.U)))
			}
		}
	}
	return big
}

// waveError returns the estimated discretisation error of a mode whose
// main motion along the stations is c: 1 − sin θ/θ, sin²θ = Σ(Δc)²/(4Σc²),
// which for c_j = sin(πkj/n) gives θ = πk/(2n), the lumped chain's exact
// error for a taut string.
func waveError(c []float64) float64 {
	var num, den float64
	for j := 1; j < len(c); j++ {
		d := c[j] - c[j-1]
		num += d * d
	}
	for _, v := range c {
		den += v * v
	}
	if den == 0 {
		return 0
	}
	s := math.Sqrt(num/den) / 2
	if s >= 1 {
		return 1 - 2/math.Pi // θ = π/2, the shortest wave the mesh holds
	}
	th := math.Asin(s)
	if th == 0 {
		return 0
	}
	return 1 - s/th
}

// mirror returns Σ c_k c_{n−k} / Σ c_k²: +1 for a series symmetric about
// midspan, −1 for an antisymmetric one.
func mirror(c []float64) float64 {
	var num, den float64
	n := len(c) - 1
	for k, v := range c {
		num += v * c[n-k]
		den += v * v
	}
	if den == 0 {
		return 0
	}
	return num / den
}

// halfWaves counts the half-waves of a series: one more than its sign
// changes, values below 1e-3 of the largest ignored.
func halfWaves(c []float64) int {
	var big float64
	for _, v := range c {
		big = math.Max(big, math.Abs(v))
	}
	waves, sign := 1, 0.0
	for _, v := range c {
		if math.Abs(v) <= 1e-3*big {
			continue
		}
		sg := math.Copysign(1, v)
		if sign != 0 && sg != sign {
			waves++
		}
		sign = sg
	}
	return waves
}

// components returns the groups of degrees of freedom that A couples, each
// sorted: i and j are coupled when |A_ij| > 1e-12 √(A_ii A_jj), couplings
// at the level of rounding being none.
func components(a blockTri) [][]int {
	p, N := a.p, a.m*a.p
	parent := make([]int, N)
	for i := range parent {
		parent[i] = i
	}
	find := func(i int) int {
		for parent[i] != i {
			parent[i] = parent[parent[i]]
			i = parent[i]
		}
		return i
	}
	diag := func(i int) float64 { return a.diag(i / p)[(i%p)*p+i%p] }
	link := func(i, j int, v float64) {
		if v != 0 && math.Abs(v) > 1e-12*math.Sqrt(math.Abs(diag(i)*diag(j))) {
			if ri, rj := find(i), find(j); ri != rj {
				parent[ri] = rj
			}
		}
	}
	for k := range a.m {
		d := a.diag(k)
		for r := range p {
			for c := r + 1; c < p; c++ {
				link(k*p+r, k*p+c, d[r*p+c])
			}
		}
		if k+1 < a.m {
			o := a.off(k)
			for r := range p {
				for c := range p {
					link(k*p+r, (k+1)*p+c, o[r*p+c])
				}
			}
		}
	}
	index := make(map[int]int)
	var out [][]int
	for i := range N {
		r := find(i)
		g, ok := index[r]
		if !ok {
			g = len(out)
			index[r] = g
			out = append(out, nil)
		}
		out[g] = append(out[g], i)
	}
	return out
}

// invCholesky writes into inv the inverse of the lower Cholesky factor of
// the symmetric p×p matrix a (row-major), and reports whether a is
// positive definite.
func invCholesky(a, inv []float64, p int) bool {
	l := make([]float64, p*p)
	for j := range p {
		d := a[j*p+j]
		for q := range j {
			d -= l[j*p+q] * l[j*p+q]
		}
		if !(d > 0) {
			return false
		}
		l[j*p+j] = math.Sqrt(d)
		for i := j + 1; i < p; i++ {
			v := a[i*p+j]
			for q := range j {
				v -= l[i*p+q] * l[j*p+q]
			}
			l[i*p+j] = v / l[j*p+j]
		}
	}
	clear(inv)
	for c := range p {
		// solve L z = e_c by forward substitution: column c of L⁻¹
		for i := c; i < p; i++ {
			v := 0.0
			if i == c {
				v = 1
			}
			for q := c; q < i; q++ {
				v -= l[i*p+q] * inv[q*p+c]
			}
			inv[i*p+c] = v / l[i*p+i]
		}
	}
	return true
}
