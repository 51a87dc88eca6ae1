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
type rcModel struct {
	b, h       float64
	sigma      float64 // block stress: 0.85 f'c or η fcd
	lambda     float64 // block depth factor: β₁ or λ
	ecu        float64 // extreme-fibre strain at the ultimate state
	ec3        float64 // EN: strain at the pivot when the whole section is compressed; 0 for ACI
	fy, es     float64 // design (EN) or nominal (ACI) bar yield strength; modulus
	area, dep  []float64
	dt         float64 // depth of the extreme tension bar
	as         float64 // total bar area
	aci, plain bool
}

func (s RCSection) model(mirror bool) rcModel {
	m := rcModel{b: float64(s.B), h: float64(s.H), es: float64(s.Es), aci: s.Code == ACI318, plain: len(s.Bars) == 0}
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
	}
	for _, b := range s.Bars {
		y := float64(b.Y)
		if mirror {
			y = -y
		}
		d := m.h/2 - y
		m.area = append(m.area, float64(b.Area))
		m.dep = append(m.dep, d)
		m.as += float64(b.Area)
		m.dt = math.Max(m.dt, d)
	}
	return m
}

// strain returns the strain (compression positive) at depth y from the
// compressed face for neutral-axis depth c (c = +Inf: uniform compression).
func (m rcModel) strain(c, y float64) float64 {
	if !m.aci && c > m.h {
		yp := m.h * (1 - m.ec3/m.ecu) // EN 1992-1-1 6.1(5): pivot at the strain εc3
		if math.IsInf(c, 1) {
			return m.ec3
		}
		return m.ec3 * (c - y) / (c - yp)
	}
	if math.IsInf(c, 1) {
		return m.ecu
	}
	return m.ecu * (c - y) / c
}

// at returns the nominal axial force (compression +) and moment about the
// mid-depth for neutral-axis depth c, and the strength reduction φ.
func (m rcModel) at(c float64) (n, mom, phi float64) {
	a := math.Min(m.lambda*c, m.h)
	cc := m.sigma * m.b * a
	n = cc
	mom = cc * (m.h/2 - a/2)
	for i, ar := range m.area {
		d := m.dep[i]
		sg := math.Max(-m.fy, math.Min(m.fy, m.es*m.strain(c, d)))
		if d < a {
			sg -= m.sigma // concrete displaced by the bar
		}
		n += ar * sg
		mom += ar * sg * (m.h/2 - d)
	}
	return n, mom, m.phi(c)
}

// phi is ACI 318-19 Table 21.2.2 (from memory): 0.65 for tied sections
// when εt ≤ εty, 0.90 when εt ≥ εty + 0.003, linear between; 0.60 for plain
// concrete (21.2.1). EN 1992 carries its factors in fcd and fyd: φ = 1.
func (m rcModel) phi(c float64) float64 {
	if !m.aci {
		return 1
	}
	if m.plain {
		return 0.60
	}
	if math.IsInf(c, 1) {
		return 0.65
	}
	et := m.ecu * (m.dt - c) / c
	ety := m.fy / m.es
	return math.Max(0.65, math.Min(0.90, 0.65+0.25*(et-ety)/0.003))
}

// limits returns the design axial capacity in compression (positive) and
// in tension (negative or zero).
func (m rcModel) limits() (comp, tens float64) {
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

// samples of the neutral-axis parameter s = c/(c+h) in (0, 1).
const rcSamples = 256

func (m rcModel) cOf(s float64) float64 {
	if s >= 1 {
		return math.Inf(1)
	}
	return m.h * s / (1 - s)
}

// momentAt returns the least design moment capacity φMn over the points of
// the design interaction curve with φPn = n, and false when n lies outside
// the curve.
func (m rcModel) momentAt(n float64) (float64, bool) {
	g := func(s float64) (float64, float64) {
		p, mo, phi := m.at(m.cOf(s))
		return phi*p - n, phi * mo
	}
	best, found := math.Inf(1), false
	// The limit c → 0: every bar yields in tension, the concrete carries nothing.
	s0, g0 := 0.0, -n
	if g0 == 0 || !m.plain {
		var p0, m0 float64
		for i, ar := range m.area {
			p0 -= ar * m.fy
			m0 -= ar * m.fy * (m.h/2 - m.dep[i])
		}
		g0 = m.phi(0)*p0 - n
		if g0 == 0 {
			best, found = m.phi(0)*m0, true
		}
	}
	for k := 1; k <= rcSamples; k++ {
		s1 := float64(k) / rcSamples
		g1, m1 := g(s1)
		if g1 == 0 {
			best, found = math.Min(best, m1), true
		} else if (g0 < 0) != (g1 < 0) && g0 != 0 {
			lo, hi := s0, s1
			glo := g0
			for range 100 {
				mid := 0.5 * (lo + hi)
				gm, _ := g(mid)
				if (gm < 0) == (glo < 0) {
					lo, glo = mid, gm
				} else {
					hi = mid
				}
				if hi-lo < 1e-15 {
					break
				}
			}
			_, mm := g(0.5 * (lo + hi))
			best, found = math.Min(best, mm), true
		}
		s0, g0 = s1, g1
	}
	return math.Max(best, 0), found
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
	n, m, phi := s.model(false).at(float64(c))
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
	c, t := s.model(false).limits()
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
	axial = axial.WithBasis(basis)
	if axial.Ratio > 1 || m == 0 {
		return axial.WithNote(fmt.Sprintf("axial %v against capacity %v (compression) / %v (tension)",
			n, units.Force(comp), units.Force(tens))), nil
	}
	mc, ok := md.momentAt(float64(n))
	if !ok {
		return check.Result{}, fmt.Errorf("tower: axial force %v not reached on the interaction curve: %w", n, ErrUnsupported)
	}
	bend := check.Compare(id, title, units.KindMoment, math.Abs(float64(m)), mc).WithBasis(basis).
		WithNote(fmt.Sprintf("moment capacity %v at axial force %v; axial ratio %.3f", units.Moment(mc), n, axial.Ratio))
	if axial.Ratio > bend.Ratio {
		return axial.WithNote(fmt.Sprintf("bending ratio %.3f (capacity %v)", bend.Ratio, units.Moment(mc))), nil
	}
	return bend, nil
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
