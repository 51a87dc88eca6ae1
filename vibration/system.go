package vibration

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// system is a model discretised about its static equilibrium: n elements
// of equal horizontal length per rope, stations x_k = k·L/n shared by every
// rope and the walkway. The interior stations carry the degrees of
// freedom, p per station: first the walkway cross-section's u, v, w (at
// its centre of mass) and roll θ when there is a walkway, then u, v, w of
// each untied rope's node. A tied rope's node follows the cross-section:
//
//	u_r = u,   v_r = v − θ h_r,   w_r = w + θ y_r
//
// with (y_r, h_r) its position from the walkway's centre of mass.
type system struct {
	m    Model
	n    int
	dx   float64
	p    int   // degrees of freedom per interior station
	deck bool  // the first four of a station are the walkway's
	off  []int // per rope: offset of its own u in a station, -1 when tied
	x    []float64
	// z holds each rope's elevation at each station above the model's
	// support A; zd the walkway's centre of mass.
	z  [][]float64
	zd []float64
	// k is the stiffness on the N = p(n−1) degrees of freedom; mass holds
	// the n−1 station blocks of the lumped mass, p×p each.
	k    blockTri
	mass []float64
	// rollers holds the static condensation of each rolling saddle's
	// massless movement along the bridge.
	rollers []roller
	// deckMass and deckRoll are the walkway's lumped mass and roll inertia
	// per station.
	deckMass, deckRoll float64
}

// roller is a rolling saddle's movement u_s, condensed out:
// u_s = −c·x_b / kss, x_b the degrees of freedom of station b.
type roller struct {
	rope, station, b int
	c                []float64
	kss              float64
}

// gmap maps a station's degrees of freedom to one rope node's (u, v, w):
// node[row] = Σ coef · dof[col].
type gmap struct {
	n int
	e [5]struct {
		row, col int
		c        float64
	}
}

func (g *gmap) add(row, col int, c float64) {
	g.e[g.n].row, g.e[g.n].col, g.e[g.n].c = row, col, c
	g.n++
}

// node returns the map of rope r at interior station k.
func (s *system) node(r, k int) gmap {
	var g gmap
	if o := s.off[r]; o >= 0 {
		g.add(0, o, 1)
		g.add(1, o+1, 1)
		g.add(2, o+2, 1)
		return g
	}
	y, h := float64(s.m.Ropes[r].Y), s.z[r][k]-s.zd[k]
	g.add(0, 0, 1)
	g.add(1, 1, 1)
	g.add(1, 3, -h)
	g.add(2, 2, 1)
	g.add(2, 3, y)
	return g
}

// newSystem discretises m with n elements. It checks that every rope's
// static state ends at the supports and carries the weight of its masses.
func newSystem(m Model, n int) (*system, error) {
	s := &system{m: m, n: n, dx: float64(m.Span) / float64(n), deck: m.hasWalkway()}
	s.x = make([]float64, n+1)
	for k := range s.x {
		s.x[k] = float64(k) * s.dx
	}
	s.x[n] = float64(m.Span)
	if s.deck {
		s.p = 4
	}
	s.off = make([]int, len(m.Ropes))
	for r, rope := range m.Ropes {
		s.off[r] = -1
		if !rope.Tied {
			s.off[r] = s.p
			s.p += 3
		}
	}
	s.z = make([][]float64, len(m.Ropes))
	tol := 1e-6*float64(m.Span) + 1e-9
	for r, rope := range m.Ropes {
		z := make([]float64, n+1)
		for k, x := range s.x {
			z[k] = float64(rope.Z) + float64(rope.Shape.Z(units.Length(x)))
			if !finite(z[k]) {
				return nil, invalidf("ropes[%d] (%s): shape gives elevation %g at x = %g m", r, rope.Name, z[k], x)
			}
		}
		if math.Abs(z[0]-float64(rope.Z)) > tol || math.Abs(z[n]-float64(rope.Z+m.Rise)) > tol {
			return nil, invalidf("ropes[%d] (%s): shape runs from %g m to %g m above its support A; it must end at 0 and at the rise %g m", r, rope.Name, z[0]-float64(rope.Z), z[n]-float64(rope.Z), float64(m.Rise))
		}
		s.z[r] = z
	}
	s.zd = make([]float64, n+1)
	if first := m.firstTied(); first >= 0 {
		copy(s.zd, s.z[first])
	}
	if err := s.checkEquilibrium(); err != nil {
		return nil, err
	}
	s.deckMass = float64(m.Walkway.Mass) * s.dx
	w := float64(m.Walkway.Width)
	s.deckRoll = s.deckMass * w * w / 12
	s.assemble()
	return s, nil
}

// checkEquilibrium compares, at every interior station, the vertical load
// the static polygon carries, H(s_k − s_{k−1})/Δx per metre, with s the
// element slopes,
// with the weight of the masses lumped there: each untied rope its own,
// the tied ropes together with the walkway.
func (s *system) checkEquilibrium() error {
	g := units.StandardGravity
	m := s.m
	var tiedMass float64
	for _, r := range m.Ropes {
		if r.Tied {
			tiedMass += float64(r.Mass)
		}
	}
	tiedMass += float64(m.Walkway.Mass)
	for k := 1; k < s.n; k++ {
		var tiedLoad float64
		for r, rope := range m.Ropes {
			z := s.z[r]
			load := float64(rope.H) * ((z[k+1]-z[k])/s.dx - (z[k]-z[k-1])/s.dx) / s.dx
			if rope.Tied {
				tiedLoad += load
				continue
			}
			if want := g * float64(rope.Mass); math.Abs(load-want) > equilibriumTolerance*want {
				return invalidf("ropes[%d] (%s): at x = %.2f m its static state carries %s but its mass weighs %s: give the shape and tension of the state under the masses' own weight",
					r, rope.Name, s.x[k], units.LoadPerLength(load), units.LoadPerLength(want))
			}
		}
		if want := g * tiedMass; tiedMass > 0 && math.Abs(tiedLoad-want) > equilibriumTolerance*want {
			return invalidf("at x = %.2f m the static states of the tied ropes carry %s but they and the walkway weigh %s: give the shapes and tensions of the state under the masses' own weight",
				s.x[k], units.LoadPerLength(tiedLoad), units.LoadPerLength(want))
		}
	}
	return nil
}

// dofs returns the number of degrees of freedom.
func (s *system) dofs() int { return s.p * (s.n - 1) }

// assemble builds the lumped mass blocks and the stiffness.
//
// Each rope element between stations k and k+1 has length l, direction n
// and tension T = H l/Δx (its horizontal component is H); its tangent
// stiffness between its end nodes is ±K_e with
//
//	K_e = (EA + T)/l · n nᵀ + T/l · (I − n nᵀ)
//
// the axial term the derivative of T = EA(l − l₀)/l₀ in l, EA/l₀ =
// (EA + T)/l, and the geometric term the turning of the tension with the
// element (standard for a tensioned bar; Bathe, Finite Element Procedures,
// §6.3, from memory). An end element over a rendering saddle has the
// backstay's unstretched length l₀,b in series: EA/(l₀ + l₀,b).
func (s *system) assemble() {
	p := s.p
	s.k = newBlockTri(s.n-1, p)
	s.mass = make([]float64, (s.n-1)*p*p)
	m := s.m
	for k := 1; k < s.n; k++ {
		blk := s.mass[(k-1)*p*p : k*p*p]
		if s.deck {
			blk[0] = s.deckMass
			blk[p+1] = s.deckMass
			blk[2*p+2] = s.deckMass
			blk[3*p+3] = s.deckRoll
		}
		for r, rope := range m.Ropes {
			mr := float64(rope.Mass) * s.dx
			g := s.node(r, k)
			for a := 0; a < g.n; a++ {
				for b := 0; b < g.n; b++ {
					if g.e[a].row == g.e[b].row {
						blk[g.e[a].col*p+g.e[b].col] += mr * g.e[a].c * g.e[b].c
					}
				}
			}
		}
	}
	var ke [3][3]float64
	for r, rope := range m.Ropes {
		ea, h := float64(rope.EA), float64(rope.H)
		for e := 0; e < s.n; e++ {
			d := [3]float64{s.x[e+1] - s.x[e], 0, s.z[r][e+1] - s.z[r][e]}
			l := math.Hypot(d[0], d[2])
			t := h * l / d[0]
			kax := (ea + t) / l
			for side, end := range rope.Ends {
				atEnd := (side == 0 && e == 0) || (side == 1 && e == s.n-1)
				if atEnd && end.Kind == Renders {
					b := end.Backstay
					l0 := l / (1 + t/ea)
					l0b := float64(b.Length) / (1 + float64(b.Tension)/ea)
					kax = ea / (l0 + l0b)
				}
			}
			kg := t / l
			for i := range 3 {
				for j := range 3 {
					nn := d[i] * d[j] / (l * l)
					ke[i][j] = kax * nn
					if i == j {
						ke[i][j] += kg * (1 - nn)
					} else {
						ke[i][j] -= kg * nn
					}
				}
			}
			s.addElement(r, e, e+1, &ke)
		}
		for side, end := range rope.Ends {
			if end.Kind == Rolls {
				s.addRoller(r, side, ea)
			}
		}
	}
}

// addElement adds an element of stiffness ke between rope r's nodes at
// stations a and b; nodes at the supports carry no degrees of freedom.
func (s *system) addElement(r, a, b int, ke *[3][3]float64) {
	p := s.p
	interior := func(k int) bool { return k > 0 && k < s.n }
	type end struct {
		k int
		g gmap
	}
	var ends []end
	var buf [2]end
	ends = buf[:0]
	for _, k := range [2]int{a, b} {
		if interior(k) {
			ends = append(ends, end{k: k, g: s.node(r, k)})
		}
	}
	for _, ei := range ends {
		for _, ej := range ends {
			// the diagonal blocks and the one above: the matrix is symmetric
			var blk []float64
			sign := 1.0
			switch ej.k - ei.k {
			case 0:
				blk = s.k.diag(ei.k - 1)
			case 1:
				blk, sign = s.k.off(ei.k-1), -1
			default:
				continue
			}
			for x := 0; x < ei.g.n; x++ {
				gi := ei.g.e[x]
				for y := 0; y < ej.g.n; y++ {
					gj := ej.g.e[y]
					blk[gi.col*p+gj.col] += sign * gi.c * gj.c * ke[gi.row][gj.row]
				}
			}
		}
	}
}

// addRoller condenses the movement along the bridge of the rolling saddle
// at side (0: A, 1: B) of rope r. The saddle has no mass; its equation
// k_ss u_s + c·x_b = 0, with k_ss the end element's and the backstay's
// stiffness along the bridge, leaves K_bb − c cᵀ/k_ss on the neighbouring
// station b.
func (s *system) addRoller(r, side int, ea float64) {
	rope := s.m.Ropes[r]
	bs := rope.Ends[side].Backstay
	e, st, b := 0, 0, 1
	if side == 1 {
		e, st, b = s.n-1, s.n, s.n-1
	}
	d := [3]float64{s.x[e+1] - s.x[e], 0, s.z[r][e+1] - s.z[r][e]}
	l := math.Hypot(d[0], d[2])
	t := float64(rope.H) * l / d[0]
	kax, kg := (ea+t)/l, t/l
	// The end element's stiffness row along x at the saddle node.
	var row [3]float64
	for j := range 3 {
		nn := d[0] * d[j] / (l * l)
		row[j] = kax * nn
		if j == 0 {
			row[j] += kg * (1 - nn)
		} else {
			row[j] -= kg * nn
		}
	}
	cb := math.Cos(float64(bs.Angle))
	tb, lb := float64(bs.Tension), float64(bs.Length)
	kss := row[0] + (ea+tb)/lb*cb*cb + tb/lb*(1-cb*cb)
	p := s.p
	c := make([]float64, p)
	g := s.node(r, b)
	for x := 0; x < g.n; x++ {
		c[g.e[x].col] -= row[g.e[x].row] * g.e[x].c
	}
	blk := s.k.diag(b - 1)
	for i := range p {
		for j := range p {
			blk[i*p+j] -= c[i] * c[j] / kss
		}
	}
	s.rollers = append(s.rollers, roller{rope: r, station: st, b: b, c: c, kss: kss})
}

// totalMass returns the moving mass: everything lumped at the interior
// stations.
func (s *system) totalMass() float64 {
	per := float64(s.m.Walkway.Mass)
	for _, r := range s.m.Ropes {
		per += float64(r.Mass)
	}
	return per * s.dx * float64(s.n-1)
}

// blockTri is a symmetric matrix, block tridiagonal by station: the
// diagonal blocks and the blocks coupling each station to the next, p×p
// each, row-major, for stations 0 … m−1 (the interior stations 1 … n−1).
type blockTri struct {
	m, p int
	d, o []float64
}

func newBlockTri(m, p int) blockTri {
	return blockTri{m: m, p: p, d: make([]float64, m*p*p), o: make([]float64, max(m-1, 0)*p*p)}
}

// diag returns the diagonal block of station k.
func (b blockTri) diag(k int) []float64 { return b.d[k*b.p*b.p : (k+1)*b.p*b.p] }

// off returns the block coupling station k (rows) to station k+1.
func (b blockTri) off(k int) []float64 { return b.o[k*b.p*b.p : (k+1)*b.p*b.p] }

// at returns entry (i, j) of the whole matrix.
func (b blockTri) at(i, j int) float64 {
	p := b.p
	ki, kj := i/p, j/p
	switch kj - ki {
	case 0:
		return b.diag(ki)[(i%p)*p+j%p]
	case 1:
		return b.off(ki)[(i%p)*p+j%p]
	case -1:
		return b.off(kj)[(j%p)*p+i%p]
	}
	return 0
}
