package tower

import (
	"fmt"
	"math"
	"strconv"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// ConcreteCode names the concrete design code of an RCSection.
type ConcreteCode int

// The concrete codes.
const (
	// ACI318 is ACI 318-19: stress block 0.85 f'c over β₁c, εcu 0.003,
	// strength reduction φ by the net tensile strain.
	ACI318 ConcreteCode = iota
	// EN1992 is EN 1992-1-1:2004: stress block η·fcd over λx, εcu3,
	// partial factors γc, γs in the design strengths.
	EN1992
)

// String returns "ACI 318-19" or "EN 1992-1-1".
func (c ConcreteCode) String() string {
	switch c {
	case ACI318:
		return "ACI 318-19"
	case EN1992:
		return "EN 1992-1-1"
	}
	return "ConcreteCode(" + strconv.Itoa(int(c)) + ")"
}

// Bar is one reinforcing bar (or a group of bars at one point) in an
// RCSection. X and Y are measured from the centre of the section: X across
// B, Y along H, positive toward the face that a positive bending moment
// compresses.
type Bar struct {
	Area units.Area
	X, Y units.Length
}

// RectangularBars returns equal bars of the given area placed around a
// B × H rectangle with their centres inset from every face: alongB bars on
// each of the two faces across H (the two extreme layers in Y, corners
// included, alongB ≥ 2), and alongH further bars on each of the two side
// faces between the corners. It returns nil for alongB < 2 or alongH < 0.
func RectangularBars(b, h, inset units.Length, alongB, alongH int, area units.Area) []Bar {
	if alongB < 2 || alongH < 0 {
		return nil
	}
	xo, yo := b/2-inset, h/2-inset
	var bars []Bar
	for _, y := range []units.Length{yo, -yo} {
		for i := range alongB {
			x := -xo + 2*xo*units.Length(i)/units.Length(alongB-1)
			bars = append(bars, Bar{Area: area, X: x, Y: y})
		}
	}
	for _, x := range []units.Length{-xo, xo} {
		for i := 1; i <= alongH; i++ {
			y := -yo + 2*yo*units.Length(i)/units.Length(alongH+1)
			bars = append(bars, Bar{Area: area, X: x, Y: y})
		}
	}
	return bars
}

// RCSection is a rectangular concrete column section, reinforced or plain
// (no Bars: concrete carries no tension).
type RCSection struct {
	// B is the width (parallel to the bending axis), H the depth (in the
	// direction of bending). Turned gives the section for the other axis.
	B, H units.Length
	// Fc is the concrete strength: f'c for ACI318, fck for EN1992.
	Fc units.Pressure
	// Fy is the bar yield strength: fy for ACI318, fyk for EN1992.
	// Unused (may be zero) without Bars.
	Fy units.Pressure
	// Es is the bar modulus; zero means 200 GPa (both codes).
	Es units.Pressure
	// Bars are the reinforcing bars; none for plain concrete.
	Bars []Bar
	// Code is the design code; the zero value is ACI318.
	Code ConcreteCode
	// AlphaCC is the EN 1992-1-1 coefficient αcc on fck; zero means 1.0
	// (recommended value, cl. 3.1.6(1)) with bars, and 0.8 (αcc,pl,
	// cl. 12.3.1, from memory) for plain concrete. Ignored by ACI318.
	AlphaCC float64
	// GammaC and GammaS are the EN 1992-1-1 partial factors; zero means
	// 1.5 and 1.15 (Table 2.1N, persistent and transient). Ignored by ACI318.
	GammaC, GammaS float64
}

// Turned returns the section turned through 90°, so that Check and the
// other methods of the result bend it about its other axis.
func (s RCSection) Turned() RCSection {
	t := s
	t.B, t.H = s.H, s.B
	t.Bars = make([]Bar, len(s.Bars))
	for i, b := range s.Bars {
		t.Bars[i] = Bar{Area: b.Area, X: -b.Y, Y: b.X}
	}
	return t
}

func (s RCSection) validate() error {
	if err := positive("RCSection.B", s.B); err != nil {
		return err
	}
	if err := positive("RCSection.H", s.H); err != nil {
		return err
	}
	if err := positive("RCSection.Fc", s.Fc); err != nil {
		return err
	}
	if s.Code != ACI318 && s.Code != EN1992 {
		return invalid("RCSection.Code", int(s.Code), "is not ACI318 or EN1992")
	}
	if len(s.Bars) > 0 {
		if err := positive("RCSection.Fy", s.Fy); err != nil {
			return err
		}
	}
	if err := nonNegative("RCSection.Es", s.Es); err != nil {
		return err
	}
	for _, f := range []struct {
		n string
		v float64
	}{{"RCSection.AlphaCC", s.AlphaCC}, {"RCSection.GammaC", s.GammaC}, {"RCSection.GammaS", s.GammaS}} {
		if err := nonNegative(f.n, units.Ratio(f.v)); err != nil {
			return err
		}
	}
	if s.AlphaCC > 1 {
		return invalid("RCSection.AlphaCC", s.AlphaCC, "must not exceed 1")
	}
	var as float64
	for i, b := range s.Bars {
		if a := float64(b.Area); !finite(a) || a <= 0 {
			return positive("RCSection.Bars["+strconv.Itoa(i)+"].Area", b.Area)
		}
		if !finite(float64(b.X)) || !finite(float64(b.Y)) ||
			math.Abs(float64(b.X)) >= float64(s.B)/2 || math.Abs(float64(b.Y)) >= float64(s.H)/2 {
			return invalid("RCSection.Bars["+strconv.Itoa(i)+"]", fmt.Sprintf("(%v, %v)", b.X, b.Y), "lies outside the section")
		}
		as += float64(b.Area)
	}
	if as >= float64(s.B)*float64(s.H) {
		return invalid("RCSection.Bars", units.Area(as), "have more area than the section")
	}
	return nil
}

// rcModel is the section reduced to numbers in SI for one sense of bending.
// It refers to the section's bars without copying them, so that building
// one does not allocate.
type rcModel struct {
	b, h       float64
	sigma      float64 // block stress: 0.85 f'c or η fcd
	lambda     float64 // block depth factor: β₁ or λ
	ecu        float64 // extreme-fibre strain at the ultimate state
	ec3        float64 // EN: strain at the pivot when the whole section is compressed; 0 for ACI
	yp         float64 // EN: depth of that pivot, (1 − εc3/εcu3) h
	fy, es     float64 // design (EN) or nominal (ACI) bar yield strength; modulus
	dt         float64 // depth of the extreme tension bar
	as         float64 // total bar area
	aci, plain bool
	// The bars gathered into layers of equal depth from the compressed
	// face: store holds up to len(store) of them without allocating, extra
	// any more.
	nl    int
	store [16]layer
	extra []layer
}

// layer is the bar area at one depth from the compressed face.
type layer struct{ area, depth float64 }

// layers returns the bar layers.
func (m *rcModel) layers() []layer {
	if m.extra != nil {
		return m.extra
	}
	return m.store[:m.nl]
}

func (s RCSection) model(mirror bool) rcModel {
	m := rcModel{b: float64(s.B), h: float64(s.H), es: float64(s.Es), aci: s.Code == ACI318,
		plain: len(s.Bars) == 0}
	if m.es == 0 {
		m.es = 200e9
	}
	fc := float64(s.Fc) / 1e6 // MPa
	if m.aci {
		m.sigma = 0.85 * float64(s.Fc)
		m.lambda = math.Min(0.85, math.Max(0.65, 0.85-0.05*(fc-28)/7))
		m.ecu = 0.003
		m.fy = float64(s.Fy)
	} else {
		acc, gc, gs := s.AlphaCC, s.GammaC, s.GammaS
		if acc == 0 {
			acc = 1.0
			if m.plain {
				acc = 0.8
			}
		}
		if gc == 0 {
			gc = 1.5
		}
		if gs == 0 {
			gs = 1.15
		}
		fcd := acc * float64(s.Fc) / gc
		eta, lam := 1.0, 0.8
		m.ecu, m.ec3 = 3.5e-3, 1.75e-3
		if fc > 50 {
			eta = 1 - (fc-50)/200
			lam = 0.8 - (fc-50)/400
			m.ecu = (2.6 + 35*math.Pow((90-fc)/100, 4)) * 1e-3
			m.ec3 = (1.75 + 0.55*(fc-50)/40) * 1e-3
		}
		m.sigma = eta * fcd
		m.lambda = lam
		m.fy = float64(s.Fy) / gs
		m.yp = m.h * (1 - m.ec3/m.ecu) // EN 1992-1-1 6.1(5): pivot at the strain εc3
	}
	for _, b := range s.Bars {
		d := m.h/2 - float64(b.Y)
		if mirror {
			d = m.h/2 + float64(b.Y)
		}
		m.as += float64(b.Area)
		m.dt = math.Max(m.dt, d)
		m.addLayer(float64(b.Area), d)
	}
	return m
}

// addLayer adds bar area a at depth d, to the layer at that depth when
// there is one.
func (m *rcModel) addLayer(a, d float64) {
	ls := m.layers()
	for i := range ls {
		if ls[i].depth == d {
			ls[i].area += a
			return
		}
	}
	switch {
	case m.extra != nil:
		m.extra = append(m.extra, layer{a, d})
	case m.nl < len(m.store):
		m.store[m.nl] = layer{a, d}
		m.nl++
	default:
		m.extra = append(append(make([]layer, 0, 2*m.nl), m.store[:m.nl]...), layer{a, d})
	}
}

// pivot reports whether neutral-axis depth c lies in the EN 1992-1-1
// region where the whole section is compressed and the strain pivots about
// εc3 at depth yp.
func (m *rcModel) pivot(c float64) bool { return !m.aci && c > m.h }

// strain returns the strain (compression positive) at depth y from the
// compressed face for neutral-axis depth c (c = +Inf: uniform compression).
func (m *rcModel) strain(c, y float64) float64 {
	if m.pivot(c) {
		if math.IsInf(c, 1) {
			return m.ec3
		}
		return m.ec3 * (c - y) / (c - m.yp)
	}
	if math.IsInf(c, 1) {
		return m.ecu
	}
	return m.ecu * (c - y) / c
}

// at returns the nominal axial force (compression +) and moment about the
// mid-depth for neutral-axis depth c, and the strength reduction φ.
func (m *rcModel) at(c float64) (n, mom, phi float64) { return m.atSide(c, c) }

// atSide is at with the bars inside the block decided at depth cm rather
// than c: where a bar enters the block (c = d/λ) the concrete it displaces
// makes P jump, and atSide(c, c ± δ) gives the two sides of the jump.
func (m *rcModel) atSide(c, cm float64) (n, mom, phi float64) {
	a := math.Min(m.lambda*c, m.h)
	am := math.Min(m.lambda*cm, m.h)
	cc := m.sigma * m.b * a
	n = cc
	mom = cc * (m.h/2 - a/2)
	for _, l := range m.layers() {
		ar, d := l.area, l.depth
		sg := math.Max(-m.fy, math.Min(m.fy, m.es*m.strain(c, d)))
		if d < am {
			sg -= m.sigma // concrete displaced by the bar
		}
		n += ar * sg
		mom += ar * sg * (m.h/2 - d)
	}
	return n, mom, m.phi(c)
}

// atZero returns the limit c → 0 of at: every bar yields in tension and
// the concrete carries nothing.
func (m *rcModel) atZero() (n, mom, phi float64) {
	for _, l := range m.layers() {
		ar, d := l.area, l.depth
		n -= ar * m.fy
		mom -= ar * m.fy * (m.h/2 - d)
	}
	return n, mom, m.phi(0)
}

// phi is ACI 318-19 Table 21.2.2 (from memory): 0.65 for tied sections
// when εt ≤ εty, 0.90 when εt ≥ εty + 0.003, linear between; 0.60 for plain
// concrete (21.2.1). EN 1992 carries its factors in fcd and fyd: φ = 1.
func (m *rcModel) phi(c float64) float64 {
	if !m.aci {
		return 1
	}
	if m.plain {
		return 0.60
	}
	if math.IsInf(c, 1) {
		return 0.65
	}
	if c <= 0 {
		return 0.90
	}
	et := m.ecu * (m.dt - c) / c
	ety := m.fy / m.es
	return math.Max(0.65, math.Min(0.90, 0.65+0.25*(et-ety)/0.003))
}

// limits returns the design axial capacity in compression (positive) and
// in tension (negative or zero).
func (m *rcModel) limits() (comp, tens float64) {
	if m.aci {
		// ACI 318-19 22.4.2 (from memory): Pn,max = 0.80 Po for tied columns,
		// Po = 0.85 f'c (Ag − Ast) + fy Ast.
		po := m.sigma*(m.b*m.h-m.as) + m.fy*m.as
		comp = m.phi(math.Inf(1)) * 0.80 * po
		tens = -0.90 * m.fy * m.as
		if m.plain {
			tens = 0
		}
		return comp, tens
	}
	comp, _, _ = m.at(math.Inf(1))
	return comp, -m.fy * m.as
}

// breaks appends to bp the neutral-axis depths at which the form of φP(c)
// changes: the block reaching a bar or the far face, a bar yielding, the
// EN pivot region starting, the ACI φ changing. Between two of them every
// bar stays elastic or yielded, inside the block or outside it, so φP is a
// low-order rational function of c (see coefficients).
func (m *rcModel) breaks(bp []float64) []float64 {
	add := func(c float64) {
		if c > 0 && !math.IsInf(c, 0) && !math.IsNaN(c) {
			bp = append(bp, c)
		}
	}
	add(m.h / m.lambda)
	if !m.aci {
		add(m.h)
	}
	ey := m.fy / m.es
	for _, l := range m.layers() {
		d := l.depth
		add(d / m.lambda)
		// ε(d) = εcu (c − d)/c = ±εy (the ε_cu region; for EN only c ≤ h).
		if c := m.ecu * d / (m.ecu + ey); m.aci || c <= m.h { // tension yield
			add(c)
		}
		if m.ecu > ey { // compression yield
			if c := m.ecu * d / (m.ecu - ey); m.aci || c <= m.h {
				add(c)
			}
		}
		// EN pivot region: εc3 (c − d)/(c − yp) = εy.
		if !m.aci && m.ec3 != ey {
			if c := (m.ec3*d - ey*m.yp) / (m.ec3 - ey); c > m.h {
				add(c)
			}
		}
	}
	if m.aci && !m.plain {
		ety := m.fy / m.es
		add(m.ecu * m.dt / (m.ecu + ety))
		add(m.ecu * m.dt / (m.ecu + ety + 0.003))
	}
	return bp
}

// coefficients returns the polynomial whose roots x in the interval that
// contains the neutral-axis depth cm give φP = n there, and the shift
// c = x + shift. Within an interval of breaks,
//
//	P(x) = p1 x + p0 + pm1/x,   φ(x) = k0 + k1/x
//
// with x = c in the εcu region and x = c − yp in the EN pivot region
// (elastic bars give the 1/x terms, the block the x term). Multiplying
// φP − n = 0 by x (k1 = 0) or x² (ACI transition zone) gives a quadratic or
// a cubic; poly holds its coefficients from the highest power down.
func (m *rcModel) coefficients(cm, n float64) (poly [4]float64, shift float64) {
	var p1, p0, pm1 float64
	piv := m.pivot(cm)
	if piv {
		shift = m.yp
	}
	a := m.lambda * cm
	if a < m.h {
		p1 += m.sigma * m.b * m.lambda
		p0 += m.sigma * m.b * m.lambda * shift
	} else {
		p0 += m.sigma * m.b * m.h
	}
	for _, l := range m.layers() {
		ar, d := l.area, l.depth
		if d < a {
			p0 -= m.sigma * ar
		}
		e := m.strain(cm, d)
		switch {
		case m.es*e >= m.fy:
			p0 += m.fy * ar
		case m.es*e <= -m.fy:
			p0 -= m.fy * ar
		case piv: // Es εc3 (x + yp − d)/x
			p0 += ar * m.es * m.ec3
			pm1 += ar * m.es * m.ec3 * (m.yp - d)
		default: // Es εcu (x − d)/x
			p0 += ar * m.es * m.ecu
			pm1 -= ar * m.es * m.ecu * d
		}
	}
	k0, k1 := m.phi(cm), 0.0
	if m.aci && !m.plain {
		ety := m.fy / m.es
		if et := m.ecu * (m.dt - cm) / cm; et > ety && et < ety+0.003 {
			// φ = 0.65 + 0.25 (εcu (dt − c)/c − εty)/0.003
			k0 = 0.65 - 0.25*(m.ecu+ety)/0.003
			k1 = 0.25 * m.ecu * m.dt / 0.003
		}
	}
	if k1 == 0 {
		return [4]float64{0, k0 * p1, k0*p0 - n, k0 * pm1}, shift
	}
	return [4]float64{k0 * p1, k0*p0 + k1*p1 - n, k0*pm1 + k1*p0, k1 * pm1}, shift
}

// maxStackBreaks is the number of breaks held without allocating: four per
// bar layer for up to 15 layers.
const maxStackBreaks = 64

// momentAt returns the least design moment capacity φMn over the points of
// the design interaction curve with φPn = n, and false when n lies outside
// the curve. The neutral-axis depth is solved in closed form: the breaks
// split c into intervals on each of which φP(c) = n is a quadratic (a cubic
// in the ACI φ transition zone) whose roots in the interval are found
// directly. The moment is then evaluated at each root.
//
// Where a bar enters the stress block the concrete it displaces makes φP
// jump down by φσA; when n falls inside such a jump the lesser of the
// moments on its two sides is taken (the jump is an artefact of the
// block's sharp edge; either side is a state of the section, and the
// lesser moment is the conservative one).
func (m *rcModel) momentAt(n float64) (float64, bool) {
	mo, _, ok := m.solve(n)
	return mo, ok
}

// solve is momentAt that also returns the neutral-axis depth of the point
// it chose (0 and +Inf for the limits of the curve).
func (m *rcModel) solve(n float64) (moment, depth float64, found bool) {
	var buf [maxStackBreaks]float64
	bp := buf[:0]
	if n := 4*len(m.layers()) + 4; n > maxStackBreaks {
		bp = make([]float64, 0, n)
	}
	bp = m.breaks(bp)
	// Insertion sort: a handful of values, no allocation.
	for i := 1; i < len(bp); i++ {
		for j := i; j > 0 && bp[j] < bp[j-1]; j-- {
			bp[j], bp[j-1] = bp[j-1], bp[j]
		}
	}
	best := math.Inf(1)
	keep := func(mo, c float64) {
		if mo < best {
			best, depth = mo, c
		}
		found = true
	}
	take := func(c float64) {
		var p, mo, phi float64
		if c <= 0 {
			p, mo, phi = m.atZero()
		} else {
			p, mo, phi = m.at(c)
		}
		// A root from the polynomial may sit a rounding error off φP = n;
		// accept it when it agrees to a relative 1e-9.
		if math.Abs(phi*p-n) <= 1e-9*math.Max(math.Abs(n), math.Abs(phi*p))+1e-12*m.scale() {
			keep(phi*mo, c)
		}
	}
	// The limits of the curve: c → 0 (every bar yields in tension) and
	// c → ∞ (uniform compression).
	if p0, _, phi := m.atZero(); phi*p0 == n {
		take(0)
	}
	if pinf, _, phi := m.at(math.Inf(1)); phi*pinf == n {
		take(math.Inf(1))
	}
	lo, prevMid := 0.0, 0.0
	var prev [4]float64 // the previous interval's polynomial and shift
	prevShift := 0.0
	eval := func(p [4]float64, x float64) float64 { return ((p[0]*x+p[1])*x+p[2])*x + p[3] }
	var roots [3]float64
	for i := 0; i <= len(bp); i++ {
		hi := math.Inf(1)
		if i < len(bp) {
			hi = bp[i]
			if hi <= lo {
				continue
			}
		}
		cm := 0.5 * (lo + hi)
		if math.IsInf(hi, 1) {
			cm = 2*lo + m.h
		}
		poly, shift := m.coefficients(cm, n)
		// A jump at lo: φP − n on its left side and on its right side
		// (the polynomials times a positive power of x) of opposite signs.
		if gl, gr := eval(prev, lo-prevShift), eval(poly, lo-shift); lo > 0 && ((gl < 0 && gr > 0) || (gl > 0 && gr < 0)) {
			pl, ml, phl := m.atSide(lo, prevMid)
			pr, mr, phr := m.atSide(lo, cm)
			if gl, gr := phl*pl-n, phr*pr-n; (gl < 0 && gr > 0) || (gl > 0 && gr < 0) {
				keep(math.Min(phl*ml, phr*mr), lo)
			}
		}
		k := rootsIn(poly, lo-shift, hi-shift, &roots)
		for _, x := range roots[:k] {
			take(x + shift)
		}
		lo, prevMid, prev, prevShift = hi, cm, poly, shift
	}
	return math.Max(best, 0), depth, found
}

// scale is a force of the size of the section's resistance, for tolerances.
func (m *rcModel) scale() float64 { return m.sigma*m.b*m.h + m.fy*m.as }

// rootsIn stores in out the real roots x of p[0]x³ + p[1]x² + p[2]x + p[3]
// with lo ≤ x ≤ hi (hi may be +Inf only when p[0] is zero) and returns how
// many it stored. Quadratics are solved in closed form (the rounding-stable
// form of the formula); a cubic is split at the roots of its derivative
// into monotone pieces and each bracketed root refined by bisection.
func rootsIn(p [4]float64, lo, hi float64, out *[3]float64) int {
	k := 0
	keep := func(x float64) {
		if x >= lo && x <= hi && k < 3 {
			out[k] = x
			k++
		}
	}
	if p[0] == 0 {
		a, b, c := p[1], p[2], p[3]
		switch {
		case a == 0 && b == 0:
		case a == 0:
			keep(-c / b)
		default:
			disc := b*b - 4*a*c
			if disc < 0 {
				// A tangent root lost to rounding: keep the vertex when it is
				// one within a relative 1e-12.
				if -disc <= 1e-12*b*b {
					keep(-b / (2 * a))
				}
				break
			}
			q := -0.5 * (b + math.Copysign(math.Sqrt(disc), b))
			if q != 0 {
				keep(q / a)
				keep(c / q)
			} else {
				keep(0)
			}
		}
		return k
	}
	f := func(x float64) float64 { return ((p[0]*x+p[1])*x+p[2])*x + p[3] }
	// Monotone pieces between the roots of 3p0 x² + 2p1 x + p2.
	edges := [4]float64{lo, 0, 0, hi}
	ne := 1
	var d [3]float64
	for _, x := range d[:rootsIn([4]float64{0, 3 * p[0], 2 * p[1], p[2]}, lo, hi, &d)] {
		edges[ne] = x
		ne++
	}
	edges[ne] = hi
	ne++
	if ne == 4 && edges[1] > edges[2] {
		edges[1], edges[2] = edges[2], edges[1]
	}
	for i := 0; i+1 < ne; i++ {
		a, b := edges[i], edges[i+1]
		fa, fb := f(a), f(b)
		switch {
		case fa == 0:
			keep(a)
			continue
		case fb == 0:
			if i+2 == ne {
				keep(b)
			}
			continue
		case (fa < 0) == (fb < 0):
			continue
		}
		for range 200 {
			mid := 0.5 * (a + b)
			if mid <= a || mid >= b {
				break
			}
			if fm := f(mid); (fm < 0) == (fa < 0) {
				a, fa = mid, fm
			} else {
				b = mid
			}
		}
		keep(0.5 * (a + b))
	}
	return k
}

// InteractionPoint is one point of a section's axial force–moment
// interaction curve.
type InteractionPoint struct {
	// NeutralAxis is the depth of the neutral axis from the compressed face.
	NeutralAxis units.Length
	// Axial and Moment are the nominal resistance (ACI 318: Pn, Mn; EN 1992:
	// the design values NRd, MRd, built from fcd and fyd).
	Axial  units.Force
	Moment units.Moment
	// Phi is the ACI strength reduction factor (1 for EN 1992).
	Phi float64
}

// Point returns the point of the interaction curve for positive bending
// with the neutral axis at depth c from the compressed face, by strain
// compatibility with the code's rectangular stress block:
//
//	ACI 318-19 22.2: block 0.85 f'c over a = β₁c, εcu = 0.003,
//	  β₁ = 0.85 − 0.05 (f'c − 28)/7 (MPa), 0.65 ≤ β₁ ≤ 0.85
//	EN 1992-1-1 3.1.7(3): block η fcd over λx, εcu3; when the whole
//	  section is compressed (x > h) the strain is εc3 at (1 − εc3/εcu3)h
//	  from the compressed face (6.1(5))
//	bars elastic–perfectly plastic, σ = Es ε within ±fy (±fyd);
//	concrete displaced by bars inside the block deducted
//	P = Cc + Σ As σs,   M = Cc (h/2 − a/2) + Σ As σs (h/2 − d)
//
// c = +Inf gives uniform compression.
func (s RCSection) Point(c units.Length) (InteractionPoint, error) {
	if err := s.validate(); err != nil {
		return InteractionPoint{}, err
	}
	if math.IsNaN(float64(c)) || c <= 0 {
		return InteractionPoint{}, invalid("neutral-axis depth", c, "must be positive")
	}
	md := s.model(false)
	n, m, phi := md.at(float64(c))
	return InteractionPoint{NeutralAxis: c, Axial: units.Force(n), Moment: units.Moment(m), Phi: phi}, nil
}

// AxialCapacity returns the design axial resistance in compression
// (positive) and in tension (zero or negative):
//
//	ACI 318-19: φ·0.80·Po, Po = 0.85 f'c (Ag − Ast) + fy Ast (tied), φ 0.65;
//	            tension −0.90 fy Ast
//	EN 1992-1-1: the uniform-strain point (εc3 everywhere); tension −fyd As
//
// Plain concrete has no tension resistance.
func (s RCSection) AxialCapacity() (compression, tension units.Force, err error) {
	if err := s.validate(); err != nil {
		return 0, 0, err
	}
	md := s.model(false)
	c, t := md.limits()
	return units.Force(c), units.Force(t), nil
}

// MomentCapacity returns the design moment resistance (φMn for ACI 318,
// MRd for EN 1992) of the section at design axial force n, compression
// positive, for positive bending (compressing the +Y face) and for negative
// bending; the two differ when the bars are not symmetric. Each is found on
// the design interaction curve (see Point) by bracketing and bisection on
// the neutral-axis depth; where more than one point has φPn = n the least
// moment is returned. Special cases: n beyond AxialCapacity gives an error
// wrapping ErrUnsupported.
func (s RCSection) MomentCapacity(n units.Force) (positive, negative units.Moment, err error) {
	if err := s.validate(); err != nil {
		return 0, 0, err
	}
	if err := isFinite("axial force", n); err != nil {
		return 0, 0, err
	}
	var out [2]units.Moment
	for i, mirror := range []bool{false, true} {
		md := s.model(mirror)
		comp, tens := md.limits()
		if float64(n) > comp || float64(n) < tens {
			return 0, 0, fmt.Errorf("tower: axial force %v lies outside the section's axial capacity %v to %v: %w",
				n, units.Force(tens), units.Force(comp), ErrUnsupported)
		}
		mc, ok := md.momentAt(float64(n))
		if !ok {
			return 0, 0, fmt.Errorf("tower: axial force %v not reached on the interaction curve: %w", n, ErrUnsupported)
		}
		out[i] = units.Moment(mc)
	}
	return out[0], out[1], nil
}

// Check checks the section under design axial force n (compression
// positive) and design bending moment m about the section's axis (see
// Turned for the other axis). The utilisation reported is the larger of
//
//	axial:   n / N_max  (compression)  or  −n / N_t  (tension)
//	bending: |m| / M_R(n)  (MomentCapacity at the same axial force)
//
// with the axial capacities of AxialCapacity; the result's kind is force or
// moment accordingly. Axial force beyond either capacity fails on the axial
// ratio. Plain concrete (no Bars) is treated with the same stress block and
// no tension: with EN 1992 this reproduces cl. 12.6.1,
// N_Rd = η fcd,pl b h (1 − 2e/h); with ACI 318 the stress block and
// φ = 0.60 are applied to a cracked plain section, which is not the elastic
// method of ACI 318-19 Chapter 14 (say so in a design report).
//
// The result has ID "tower.column_section".
func (s RCSection) Check(n units.Force, m units.Moment) (check.Result, error) {
	if err := s.validate(); err != nil {
		return check.Result{}, err
	}
	if err := isFinite("axial force", n); err != nil {
		return check.Result{}, err
	}
	if err := isFinite("moment", m); err != nil {
		return check.Result{}, err
	}
	md := s.model(m < 0)
	comp, tens := md.limits()
	if !finite(comp) || !finite(tens) {
		return check.Result{}, invalid("RCSection", fmt.Sprintf("%v × %v", s.B, s.H), "gives resistances that are not finite")
	}
	const id, title = "tower.column_section", "Column section, axial force and bending"
	basis := s.basis()
	var axial check.Result
	if n >= 0 {
		axial = check.Compare(id, title, units.KindForce, float64(n), comp)
	} else {
		axial = check.Compare(id, title, units.KindForce, -float64(n), -tens)
	}
	vals := [5]check.Value{
		check.Of("N_Ed", "design axial force (compression +)", n),
		check.Of("M_Ed", "design moment", m),
		check.Of("N_Rd", "axial resistance in compression", units.Force(comp)),
		check.Of("N_Rd,t", "axial resistance in tension (negative)", units.Force(tens)),
	}
	axial = axial.WithBasis(basis)
	if axial.Ratio > 1 || m == 0 {
		return axial.WithValues(vals[:4]...).WithNote("the axial force governs"), nil
	}
	mc, ok := md.momentAt(float64(n))
	if !ok {
		return check.Result{}, fmt.Errorf("tower: axial force %v not reached on the interaction curve: %w", n, ErrUnsupported)
	}
	vals[4] = check.Of("M_Rd", "moment resistance at N_Ed", units.Moment(mc))
	bend := check.Compare(id, title, units.KindMoment, math.Abs(float64(m)), mc).WithBasis(basis)
	if axial.Ratio > bend.Ratio {
		return axial.WithValues(vals[:]...).WithNote("the axial force governs"), nil
	}
	return bend.WithValues(vals[:]...), nil
}

func (s RCSection) basis() string {
	kind := "reinforced"
	if len(s.Bars) == 0 {
		kind = "plain (no tension)"
	}
	if s.Code == ACI318 {
		return "ACI 318-19 22.2 rectangular stress block, strain compatibility, " + kind +
			"; φ per Table 21.2.2 and Pn,max 0.80 Po per 22.4.2 (from memory)"
	}
	return "EN 1992-1-1 3.1.7(3) rectangular stress block, 6.1 strain limits, " + kind +
		"; γc 1.5, γs 1.15 unless set (Table 2.1N)"
}
