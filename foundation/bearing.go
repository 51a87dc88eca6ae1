package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Method selects the bearing-capacity factors of a published method.
type Method int

// The bearing-capacity methods. The zero value is Terzaghi.
const (
	// Terzaghi (1943): strip, square and (interpolated) rectangular
	// footings, no depth factors.
	Terzaghi Method = iota
	// Meyerhof (1963): shape, depth and inclination factors.
	Meyerhof
	// Hansen (1970): shape, depth and inclination factors.
	Hansen
	// Vesic (1973, 1975): Vesić's Nγ with De Beer's shape factors and
	// Hansen's depth factors.
	Vesic
	// EC7 is EN 1997-1:2004 Annex D (informative): no depth factors.
	EC7
)

var methodNames = [...]string{
	Terzaghi: "Terzaghi (1943)",
	Meyerhof: "Meyerhof (1963)",
	Hansen:   "Hansen (1970)",
	Vesic:    "Vesić (1973/1975)",
	EC7:      "EN 1997-1 Annex D",
}

// String returns the name and year of the method.
func (m Method) String() string {
	if m < 0 || int(m) >= len(methodNames) {
		return fmt.Sprintf("Method(%d)", int(m))
	}
	return methodNames[m]
}

func (m Method) valid() bool { return m >= 0 && int(m) < len(methodNames) }

// BearingInput is a rectangular base and its load for BearingCapacity.
type BearingInput struct {
	// AlongLoad is the side of the base along which the horizontal load
	// and EccAlong act (along the bridge for a tower footing, along the
	// pull for an anchor block); AcrossLoad is the other side. Either may
	// be the shorter: the factors take the shorter effective side as B'
	// and the inclination exponent m from the direction of the load
	// relative to it.
	AlongLoad, AcrossLoad units.Length
	// Depth is the depth of the base below the lower adjacent ground.
	Depth units.Length
	// Vertical is the effective vertical load on the base (including the
	// footing's own weight, less the water's uplift); it must be
	// positive. Horizontal acts along AlongLoad and HorizontalAcross along
	// AcrossLoad; their signs do not matter, their resultant H enters the
	// inclination factors.
	Vertical, Horizontal, HorizontalAcross units.Force
	// EccAlong and EccAcross are the eccentricities of the vertical load
	// from the base centre along AlongLoad and AcrossLoad.
	EccAlong, EccAcross units.Length
	// Water is the water level at the site of the base.
	Water Water
	// GroundSlope is the inclination β of the ground falling away from
	// the base within reach of its failure zone; zero for level ground.
	// It enters the ground-inclination factors g (see BearingCapacity);
	// at or beyond φ' (drained) or 45° (undrained) no bearing resistance
	// is counted.
	GroundSlope units.Angle
}

// Bearing is the result of BearingCapacity: the ultimate bearing pressure
// on the effective base, its three terms and every factor used.
type Bearing struct {
	Method    Method
	Condition Condition
	// Qult is the ultimate bearing pressure on the effective area
	// BEff × LEff, net of the pore pressure at the base (so that it
	// compares with the effective vertical load per effective area).
	Qult units.Pressure
	// TermC, TermQ and TermGamma are the cohesion, overburden and
	// self-weight terms of the bearing equation; they add up to Qult.
	TermC, TermQ, TermGamma units.Pressure
	// Nc, Nq, Ngamma are the bearing-capacity factors.
	Nc, Nq, Ngamma float64
	// Shape, depth and load-inclination factors of the c, q and γ terms.
	Sc, Sq, Sgamma float64
	Dc, Dq, Dgamma float64
	Ic, Iq, Igamma float64
	// Ground-inclination factors of the c, q and γ terms (1 on level
	// ground), and the slope β they were taken for.
	Gc, Gq, Ggamma float64
	GroundSlope    units.Angle
	// M is the exponent of the inclination factors (Vesić and EN 1997-1
	// Annex D); zero for the methods that have none.
	M float64
	// Theta is the angle θ between the horizontal load and the longer
	// effective side L' (90° when it acts along B'), which sets M.
	Theta units.Angle
	// BEff ≤ LEff are the effective sides B' and L' (Meyerhof's effective
	// area); LoadAlongShort is true when the horizontal load acts along B'.
	BEff, LEff     units.Length
	LoadAlongShort bool
	// Overburden is the effective vertical stress q at base level.
	Overburden units.Pressure
	// GammaEff is the unit weight used in the Nγ term.
	GammaEff units.UnitWeight
	// Friction and Cohesion are the strength used: φ' and c' drained,
	// zero and c_u undrained.
	Friction units.Angle
	Cohesion units.Pressure
	// Notes record assumptions and limits met.
	Notes []string
}

// Area returns the effective area A' = B'·L'.
func (b Bearing) Area() units.Area { return units.Area(float64(b.BEff) * float64(b.LEff)) }

// Resistance returns the ultimate bearing resistance R = qult·A'.
func (b Bearing) Resistance() units.Force { return units.Force(float64(b.Qult) * float64(b.Area())) }

// Values returns every number of the bearing equation as named check
// values, in the order of the equation.
func (b Bearing) Values() []check.Value {
	return b.appendValues(make([]check.Value, 0, 24))
}

func (b Bearing) appendValues(dst []check.Value) []check.Value {
	dst = append(dst,
		check.Of("φ", "friction angle in the bearing equation, zero undrained", b.Friction),
		check.Of("c", "cohesion in the bearing equation: c' drained, c_u undrained", b.Cohesion),
		check.Of("q", "effective overburden at base level", b.Overburden),
		check.Of("γ_b", "unit weight in the N_γ term", b.GammaEff),
		check.Of("B'", "effective width, the shorter effective side", b.BEff),
		check.Of("L'", "effective length, the longer effective side", b.LEff),
		check.Of("N_c", "bearing-capacity factor, cohesion term", units.Ratio(b.Nc)),
		check.Of("N_q", "bearing-capacity factor, overburden term", units.Ratio(b.Nq)),
		check.Of("N_γ", "bearing-capacity factor, self-weight term", units.Ratio(b.Ngamma)),
		check.Of("s_c", "shape factor, cohesion term", units.Ratio(b.Sc)),
		check.Of("s_q", "shape factor, overburden term", units.Ratio(b.Sq)),
		check.Of("s_γ", "shape factor, self-weight term", units.Ratio(b.Sgamma)),
		check.Of("d_c", "depth factor, cohesion term", units.Ratio(b.Dc)),
		check.Of("d_q", "depth factor, overburden term", units.Ratio(b.Dq)),
		check.Of("d_γ", "depth factor, self-weight term", units.Ratio(b.Dgamma)),
		check.Of("i_c", "load-inclination factor, cohesion term", units.Ratio(b.Ic)),
		check.Of("i_q", "load-inclination factor, overburden term", units.Ratio(b.Iq)),
		check.Of("i_γ", "load-inclination factor, self-weight term", units.Ratio(b.Igamma)),
		check.Of("θ", "angle between the horizontal load and the longer effective side L'", b.Theta),
	)
	if b.GroundSlope > 0 {
		dst = append(dst,
			check.Of("β_g", "slope of the ground falling away from the base", b.GroundSlope),
			check.Of("g_c", "ground-inclination factor, cohesion term", units.Ratio(b.Gc)),
			check.Of("g_q", "ground-inclination factor, overburden term", units.Ratio(b.Gq)),
			check.Of("g_γ", "ground-inclination factor, self-weight term", units.Ratio(b.Ggamma)),
		)
	}
	return append(dst,
		check.Of("m", "exponent of the inclination factors; zero when the method has none", units.Ratio(b.M)),
		check.Of("q_c", "cohesion term of the bearing equation", b.TermC),
		check.Of("q_q", "overburden term of the bearing equation", b.TermQ),
		check.Of("q_γ", "self-weight term of the bearing equation", b.TermGamma),
		check.Of("q_ult", "ultimate bearing pressure on the effective base", b.Qult),
	)
}

// validate checks in and returns an error naming the bad field.
func (in BearingInput) validate() error {
	if !(in.AlongLoad > 0 && in.AcrossLoad > 0 && in.Vertical > 0 && in.Depth >= 0) ||
		math.IsInf(float64(in.AlongLoad)+float64(in.AcrossLoad)+float64(in.Vertical)+float64(in.Depth), 0) {
		for _, f := range []struct {
			name string
			v    float64
		}{{"BearingInput.AlongLoad", float64(in.AlongLoad)}, {"BearingInput.AcrossLoad", float64(in.AcrossLoad)}, {"BearingInput.Vertical", float64(in.Vertical)}} {
			if err := positive(f.name, f.v); err != nil {
				return err
			}
		}
		if err := nonNegative("BearingInput.Depth", float64(in.Depth)); err != nil {
			return err
		}
	}
	if !(in.GroundSlope >= 0 && in.GroundSlope < 90*units.Degree) {
		return invalid("BearingInput.GroundSlope", "must be at least 0 and less than 90 deg")
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"BearingInput.Horizontal", float64(in.Horizontal)}, {"BearingInput.HorizontalAcross", float64(in.HorizontalAcross)},
		{"BearingInput.EccAlong", float64(in.EccAlong)}, {"BearingInput.EccAcross", float64(in.EccAcross)}} {
		if err := finite(f.name, f.v); err != nil {
			return err
		}
	}
	if err := in.Water.validate("BearingInput.Water"); err != nil {
		return err
	}
	if math.Abs(float64(in.EccAlong)) >= float64(in.AlongLoad)/2 {
		return fmt.Errorf("%w: EccAlong %v reaches half of AlongLoad %v", ErrOutsideBase, in.EccAlong, in.AlongLoad)
	}
	if math.Abs(float64(in.EccAcross)) >= float64(in.AcrossLoad)/2 {
		return fmt.Errorf("%w: EccAcross %v reaches half of AcrossLoad %v", ErrOutsideBase, in.EccAcross, in.AcrossLoad)
	}
	return nil
}

// tinyFriction is the friction angle below which a soil is treated as
// frictionless (φ = 0) by BearingFactors, and the smallest φ' the drained
// condition accepts, in radians (0.06°).
const tinyFriction = 1e-3

// BearingFactors returns Nc, Nq and Nγ of method m for friction angle phi.
//
// For Meyerhof, Hansen, Vesić and EN 1997-1 Annex D (Prandtl, Reissner):
//
//	Nq = e^(π tanφ) tan²(45° + φ/2)
//	Nc = (Nq − 1) cot φ              (π + 2 at φ = 0)
//	Nγ = (Nq − 1) tan(1.4φ)          Meyerhof
//	Nγ = 1.5 (Nq − 1) tan φ          Hansen
//	Nγ = 2 (Nq + 1) tan φ            Vesić
//	Nγ = 2 (Nq − 1) tan φ            EN 1997-1 Annex D
//
// (formulas as in Look, Handbook of Geotechnical Investigation and Design
// Tables, Table 21.5, and EN 1997-1:2004 D.4.) For Terzaghi:
//
//	Nq = e^(2(3π/4 − φ/2) tan φ) / (2 cos²(45° + φ/2))
//	Nc = (Nq − 1) cot φ              (1.5π + 1 at φ = 0)
//	Nγ ≈ 2 (Nq + 1) tan φ / (1 + 0.4 sin 4φ)
//
// where Nγ is Coduto's fit to Terzaghi's values (Coduto, Foundation
// Design, from memory). Below 0.06° φ counts as zero. An angle outside
// 0–50° or an unknown method gives an error wrapping ErrInvalid.
func BearingFactors(phi units.Angle, m Method) (nc, nq, ngamma float64, err error) {
	if !m.valid() {
		return 0, 0, 0, invalid("Method", fmt.Sprintf("%d is not a known method", int(m)))
	}
	if !(phi >= 0 && phi <= maxFriction) {
		return 0, 0, 0, invalid("friction angle", "must be between 0 and 50 deg")
	}
	f := float64(phi)
	if f < tinyFriction {
		if m == Terzaghi {
			return 1.5*math.Pi + 1, 1, 0, nil
		}
		return math.Pi + 2, 1, 0, nil
	}
	t := math.Tan(f)
	if m == Terzaghi {
		c := math.Cos(math.Pi/4 + f/2)
		nq = math.Exp(2*(3*math.Pi/4-f/2)*t) / (2 * c * c)
		nc = (nq - 1) / t
		ngamma = 2 * (nq + 1) * t / (1 + 0.4*math.Sin(4*f))
		return nc, nq, ngamma, nil
	}
	k := math.Tan(math.Pi/4 + f/2)
	nq = math.Exp(math.Pi*t) * k * k
	nc = (nq - 1) / t
	switch m {
	case Meyerhof:
		ngamma = (nq - 1) * math.Tan(1.4*f)
	case Hansen:
		ngamma = 1.5 * (nq - 1) * t
	case Vesic:
		ngamma = 2 * (nq + 1) * t
	default: // EC7
		ngamma = 2 * (nq - 1) * t
	}
	return nc, nq, ngamma, nil
}

// BearingCapacity returns the ultimate bearing pressure of a rectangular
// base on soil s by method m in ground condition cond:
//
//	qult = c Nc sc dc ic + q Nq sq dq iq + ½ γ B' Nγ sγ dγ iγ
//	B' ≤ L' from AlongLoad − 2|EccAlong| and AcrossLoad − 2|EccAcross|  (Meyerhof's effective area)
//
// Drained: c = c', φ = φ', q the effective overburden at base level and γ
// the effective unit weight below it. Undrained (φ = 0, c = c_u): Nc = π + 2
// (1.5π + 1 Terzaghi), Nq = 1, Nγ = 0; in total stresses EN 1997-1:2004
// D.3 reads R/A' = (π + 2) c_u b_c s_c i_c + q with q the total overburden,
// compared with the total vertical load; the pore pressure u at the base
// adds to both, so Qult here is net of u (q effective) and compares with
// the effective load, which is the same verification.
//
// Each method's factors live in their own function below (terzaghiFactors,
// meyerhofFactors, hansenFactors, vesicFactors, annexDFactors); formulas
// from EN 1997-1:2004 Annex D and, for the others, as collected in Das,
// Principles of Foundation Engineering, ch. 3, and Look, Handbook of
// Geotechnical Investigation and Design Tables, ch. 21 (from memory):
//
//	Terzaghi:  sc = 1 + 0.3B'/L', sq = 1, sγ = 1 − 0.2B'/L' (strip 1/1/1, square 1.3/1/0.8,
//	           rectangles interpolated, common practice); d = 1; i as Meyerhof; the same undrained
//	Meyerhof:  Kp = tan²(45+φ/2); sc = 1 + 0.2Kp B'/L'; sq = sγ = 1 + 0.1Kp B'/L' (φ > 10°, else 1)
//	           dc = 1 + 0.2√Kp D/B; dq = dγ = 1 + 0.1√Kp D/B (φ > 10°, else 1)
//	           ic = iq = (1 − θ/90°)²; iγ = (1 − θ/φ)², θ = atan(H/V); the same undrained (Kp = 1)
//	Hansen:    sc = 1 + (Nq/Nc)B'/L'; sq = 1 + (B'/L') sin φ; sγ = 1 − 0.4B'/L' ≥ 0.6
//	           k = D/B (D ≤ B) or atan(D/B); dc = 1 + 0.4k; dq = 1 + 2tanφ(1 − sinφ)² k; dγ = 1
//	           iq = (1 − 0.5H/(V + A'c cotφ))⁵; iγ = (1 − 0.7H/(V + A'c cotφ))⁵; ic = iq − (1 − iq)/(Nq − 1)
//	           undrained, Hansen's additive form: c_u Nc (1 + s'c + d'c − i'c) + q with s'c = 0.2B'/L',
//	           d'c = 0.4k, i'c = ½ − ½√(1 − H/(A'c_u)); reported as sc = 1 + s'c, dc = 1 + d'c, ic = 1 − i'c
//	Vesić:     sc = 1 + (B'/L')(Nq/Nc); sq = 1 + (B'/L') tanφ; sγ = 1 − 0.4B'/L'; dq as Hansen,
//	           dc = dq − (1 − dq)/(Nc tanφ), dγ = 1
//	           iq = (1 − H/(V + A'c cotφ))^m; iγ = (…)^(m+1); ic = iq − (1 − iq)/(Nc tanφ)
//	           undrained: sc = 1 + 0.2B'/L' (the EN 1997-1 D.3 form, not Vesić's own 1 + (B'/L')(Nq/Nc),
//	           which gives 1 + 0.195B'/L' at φ = 0: a deliberate, slightly cautious choice);
//	           dc = 1 + 0.4k; ic = 1 − mH/(A'c_u Nc) (Vesić's)
//	Annex D:   sq = 1 + (B'/L') sinφ; sγ = 1 − 0.3B'/L'; sc = (sq Nq − 1)/(Nq − 1); d = 1
//	           iq, iγ, ic as Vesić (D.4)
//	           undrained (D.3): sc = 1 + 0.2B'/L'; ic = ½(1 + √(1 − H/(A'c_u)))
//	m = m_B = (2 + B'/L')/(1 + B'/L') for H along B', m_L = (2 + L'/B')/(1 + L'/B') along L',
//	    m_θ = m_L cos²θ + m_B sin²θ for H at θ to L' (D.4; Vesić 1975 the same), outside the bracket
//	H = √(Horizontal² + HorizontalAcross²), A' = B'L' with both eccentricities
//
// Groundwater (Das, Principles of Foundation Engineering, §3.6, from
// memory): with the water Dw below ground (Dw ≤ 0: at or above it),
// q = γDw + γ'(D − Dw) when 0 ≤ Dw < D, γ'D when Dw ≤ 0; the Nγ term uses γ'
// when Dw ≤ D, γ' + (Dw − D)(γ − γ')/B when D < Dw < D + B (B the base's
// shorter side), γ beyond.
//
// Special cases: a horizontal load that exhausts an inclination bracket
// (or, undrained, reaches A'c_u) sets that factor to zero, with a note (the
// base slides before it bears); rock gives an error (bearing on rock is
// never computed from soil theory: see RockPressure); the drained
// condition needs φ' ≥ 0.06° and the undrained one c_u > 0; invalid input
// returns an error wrapping ErrInvalid, and an eccentricity of half a side
// or more one wrapping ErrOutsideBase.
func BearingCapacity(in BearingInput, s Soil, m Method, cond Condition) (Bearing, error) {
	if err := in.validate(); err != nil {
		return Bearing{}, err
	}
	if err := s.Validate(); err != nil {
		return Bearing{}, err
	}
	if !m.valid() {
		return Bearing{}, invalid("Method", fmt.Sprintf("%d is not a known method", int(m)))
	}
	if s.IsRock {
		return Bearing{}, invalid("Soil.IsRock", "rock: bearing on rock comes from an allowable pressure or RockPressure, never from soil bearing-capacity theory")
	}
	st := bearingState{drained: cond == Drained}
	switch cond {
	case Drained:
		if !(float64(s.Friction) >= tinyFriction) {
			return Bearing{}, invalid("Soil.Friction", "must be at least 0.06 deg for the drained condition; give Undrained for a φ = 0 analysis")
		}
		st.phi, st.c = float64(s.Friction), float64(s.Cohesion)
	case Undrained:
		if !(s.Undrained > 0) {
			return Bearing{}, invalid("Soil.Undrained", "must be positive for the undrained condition")
		}
		st.c = float64(s.Undrained)
	default:
		return Bearing{}, invalid("Condition", fmt.Sprintf("%d is not a known condition", int(cond)))
	}
	nc, nq, ng, err := BearingFactors(units.Angle(st.phi), m)
	if err != nil {
		return Bearing{}, err
	}
	r := Bearing{Method: m, Condition: cond, Nc: nc, Nq: nq, Ngamma: ng,
		Friction: units.Angle(st.phi), Cohesion: units.Pressure(st.c)}

	along := float64(in.AlongLoad) - 2*math.Abs(float64(in.EccAlong))
	across := float64(in.AcrossLoad) - 2*math.Abs(float64(in.EccAcross))
	bEff, lEff := along, across
	r.LoadAlongShort = true
	if bEff > lEff {
		bEff, lEff = lEff, bEff
		r.LoadAlongShort = false
	}
	r.BEff, r.LEff = units.Length(bEff), units.Length(lEff)
	depth := float64(in.Depth)
	width := math.Min(float64(in.AlongLoad), float64(in.AcrossLoad))

	// Overburden and effective unit weight with groundwater.
	g, gs := float64(s.UnitWeight), float64(s.SubmergedWeight())
	dw := in.Water.depth()
	q, _ := stress(depth, g, gs, dw)
	ge := g
	switch {
	case dw <= depth:
		ge = gs
	case dw < depth+width:
		ge = gs + (dw-depth)/width*(g-gs)
	}
	r.Overburden, r.GammaEff = units.Pressure(q), units.UnitWeight(ge)

	st.tanPhi, st.sinPhi = math.Tan(st.phi), math.Sin(st.phi)
	st.nc, st.nq = nc, nq
	st.ratio = bEff / lEff
	st.dOverB = depth / width
	st.k = st.dOverB
	if st.k > 1 {
		st.k = math.Atan(st.k)
	}
	st.v, st.h, st.area = float64(in.Vertical), math.Hypot(float64(in.Horizontal), float64(in.HorizontalAcross)), bEff*lEff
	// The load's components along B' and L', and the angle θ to L'.
	hB, hL := math.Abs(float64(in.Horizontal)), math.Abs(float64(in.HorizontalAcross))
	if !r.LoadAlongShort {
		hB, hL = hL, hB
	}
	theta := math.Atan2(hB, hL)
	if st.h == 0 { // no load: the direction of AlongLoad, as a reader expects
		theta = math.Pi / 2
		if !r.LoadAlongShort {
			theta = 0
		}
	}
	mB, mL := (2+st.ratio)/(1+st.ratio), (2+1/st.ratio)/(1+1/st.ratio)
	c2 := math.Cos(theta) * math.Cos(theta)
	st.m = mL*c2 + mB*(1-c2)
	r.Theta = units.Angle(theta)

	f := methodFactors[m](st)
	r.Sc, r.Sq, r.Sgamma = f.sc, f.sq, f.sg
	r.Dc, r.Dq, r.Dgamma = f.dc, f.dq, f.dg
	r.Ic, r.Iq, r.Igamma = math.Max(f.ic, 0), math.Max(f.iq, 0), math.Max(f.ig, 0)
	if f.usesM {
		r.M = st.m
	}
	r.Notes = f.notes

	beta := float64(in.GroundSlope)
	gf := groundFactors(st, m, beta)
	r.Gc, r.Gq, r.Ggamma, r.GroundSlope = gf.c, gf.q, gf.g, in.GroundSlope
	if gf.none {
		r.Notes = append(r.Notes, gf.note)
		r.Gc, r.Gq, r.Ggamma = 0, 0, 0
		return r, nil // no bearing resistance counted
	}

	termC := st.c * nc * r.Sc * r.Dc * r.Ic * r.Gc
	if f.additiveC {
		// Hansen's additive form: the ground factor enters as g'c = 1 − gc.
		termC = st.c * nc * math.Max(r.Sc+r.Dc+r.Ic-2-(1-r.Gc), 0)
		if f.cExhausted {
			termC = 0
		}
	}
	r.TermC = units.Pressure(termC)
	r.TermQ = units.Pressure(q * nq * r.Sq * r.Dq * r.Iq * r.Gq)
	r.TermGamma = units.Pressure(0.5 * ge * bEff * ng * r.Sgamma * r.Dgamma * r.Igamma * r.Ggamma)
	if !st.drained && beta > 0 {
		// Vesić's Nγ = −2 sin β for φ = 0 on sloping ground: the soil's
		// weight drives the failure down the slope.
		r.Ngamma = -2 * math.Sin(beta)
		r.TermGamma = units.Pressure(-ge * bEff * math.Sin(beta))
	}
	r.Qult = max(r.TermC+r.TermQ+r.TermGamma, 0)
	return r, nil
}

// ground holds the ground-inclination factors of a bearing equation, or
// none when the slope is beyond their range.
type ground struct {
	c, q, g float64
	none    bool
	note    string
}

// groundFactors returns the ground-inclination factors for ground falling
// away from the base at beta (radians) (Bowles, Foundation Analysis and
// Design, 5th ed., Table 4-5, from Hansen 1970 and Vesić 1975):
//
//	Hansen:  gq = gγ = (1 − 0.5 tan β)⁵;  gc = 1 − β°/147°
//	Vesić:   gq = gγ = (1 − tan β)²;      gc = gq − (1 − gq)/(Nc tan φ)
//	undrained (φ = 0): gc = 1 − 2β/(π + 2) (Vesić; Hansen's 1 − β°/147° in his
//	         additive form), gq = 1, and Nγ = −2 sin β (Vesić)
//
// Terzaghi, Meyerhof and EN 1997-1 Annex D have no ground factors: they
// take the smaller of Hansen's and Vesić's, factor by factor (cautious).
// Beyond the factors' range (drained β ≥ φ, where even a cohesionless
// slope stands no steeper; undrained β ≥ 45°) no bearing resistance is
// counted.
func groundFactors(st bearingState, m Method, beta float64) ground {
	if beta <= 0 {
		return ground{c: 1, q: 1, g: 1}
	}
	deg := beta * 180 / math.Pi
	if !st.drained {
		if beta >= math.Pi/4 {
			return ground{none: true, note: fmt.Sprintf("the ground falls at %.1f° from the base, beyond the 45° of the "+
				"undrained ground-inclination factors: no bearing resistance counted (the bank's own stability governs: check it by hand)", deg)}
		}
		hc, vc := 1-deg/147, 1-2*beta/(math.Pi+2)
		switch m {
		case Hansen:
			return ground{c: hc, q: 1, g: 1}
		case Vesic:
			return ground{c: vc, q: 1, g: 1}
		}
		// The smaller, as drained: Hansen's, by at most 0.1 %.
		return ground{c: math.Min(hc, vc), q: 1, g: 1}
	}
	if beta >= st.phi {
		return ground{none: true, note: fmt.Sprintf("the ground falls at %.1f° from the base, at or beyond φ = %.1f°: "+
			"no bearing resistance counted (the bank's own stability governs: check it by hand)", deg, st.phi*180/math.Pi)}
	}
	t := math.Tan(beta)
	hq := math.Pow(1-0.5*t, 5)
	hc := 1 - deg/147
	vq := 0.0
	if t < 1 {
		vq = (1 - t) * (1 - t)
	}
	vc := math.Max(vq-(1-vq)/(st.nc*st.tanPhi), 0)
	switch m {
	case Hansen:
		return ground{c: hc, q: hq, g: hq}
	case Vesic:
		return ground{c: vc, q: vq, g: vq}
	}
	return ground{c: math.Min(hc, vc), q: math.Min(hq, vq), g: math.Min(hq, vq)}
}

// bearingState is what every method's factors depend on.
type bearingState struct {
	drained        bool
	phi, c         float64 // φ (rad), c (Pa): φ', c' drained; 0, c_u undrained
	tanPhi, sinPhi float64
	nc, nq         float64
	ratio          float64 // B'/L'
	dOverB         float64 // D/B, B the shorter side of the base
	k              float64 // Hansen's depth parameter: D/B, or atan(D/B) beyond 1
	v, h, area     float64 // V, |H|, A' = B'L'
	m              float64 // inclination exponent for the load's direction
}

// bearingFactors are one method's shape, depth and inclination factors.
type bearingFactors struct {
	sc, sq, sg, dc, dq, dg, ic, iq, ig float64
	usesM                              bool // the method uses the exponent m
	additiveC                          bool // c-term = c Nc (sc + dc + ic − 2) (Hansen undrained)
	cExhausted                         bool // H ≥ A'c_u: no c-term (additive form)
	notes                              []string
}

func unitFactors() bearingFactors {
	return bearingFactors{sc: 1, sq: 1, sg: 1, dc: 1, dq: 1, dg: 1, ic: 1, iq: 1, ig: 1}
}

// methodFactors holds each method's factor function: one method in one place.
var methodFactors = [...]func(bearingState) bearingFactors{
	Terzaghi: terzaghiFactors,
	Meyerhof: meyerhofFactors,
	Hansen:   hansenFactors,
	Vesic:    vesicFactors,
	EC7:      annexDFactors,
}

const (
	noteExhausted = "horizontal load exhausts the inclination factor: the base slides before it bears"
	noteAdhesion  = "horizontal load reaches the undrained base adhesion A'c_u: the base slides before it bears"
)

// bracket returns max(0, 1 − a·H/(V + A'c cotφ)) (drained inclination
// brackets of Hansen, Vesić and EN 1997-1 D.4) and whether it was
// exhausted.
func (st bearingState) bracket(a float64) (float64, bool) {
	den := st.v + st.area*st.c/st.tanPhi
	x := 1 - a*st.h/den
	if x <= 0 {
		return 0, true
	}
	return x, false
}

// adhesion returns 1 − H/(A'c_u) and whether the horizontal load reaches
// the undrained adhesion of the base.
func (st bearingState) adhesion() (float64, bool) {
	if st.h == 0 {
		return 1, false
	}
	x := 1 - st.h/(st.area*st.c)
	if !(x > 0) {
		return 0, true
	}
	return x, false
}

// meyerhofInclination sets Meyerhof's (1963) inclination factors,
// θ = atan(H/V): ic = iq = (1 − θ/90°)², iγ = (1 − θ/φ)² (zero once θ ≥ φ).
func (st bearingState) meyerhofInclination(f *bearingFactors) {
	theta := math.Atan2(st.h, st.v)
	f.ic = math.Pow(1-theta/(math.Pi/2), 2)
	f.iq = f.ic
	switch {
	case theta == 0:
		f.ig = 1
	case !st.drained || theta >= st.phi:
		f.ig = 0
	default:
		f.ig = math.Pow(1-theta/st.phi, 2)
	}
}

// terzaghiFactors: Terzaghi (1943) shape factors interpolated for
// rectangles, no depth factors, Meyerhof's inclination factors.
func terzaghiFactors(st bearingState) bearingFactors {
	f := unitFactors()
	f.sc = 1 + 0.3*st.ratio
	f.sg = 1 - 0.2*st.ratio
	st.meyerhofInclination(&f)
	if st.h > 0 {
		f.notes = append(f.notes, "Terzaghi's method has no inclination factors: Meyerhof's are used")
	}
	return f
}

// meyerhofFactors: Meyerhof (1963).
func meyerhofFactors(st bearingState) bearingFactors {
	f := unitFactors()
	kp := math.Pow(math.Tan(math.Pi/4+st.phi/2), 2)
	f.sc = 1 + 0.2*kp*st.ratio
	f.dc = 1 + 0.2*math.Sqrt(kp)*st.dOverB
	if st.phi > float64(10*units.Degree) {
		f.sq = 1 + 0.1*kp*st.ratio
		f.sg = f.sq
		f.dq = 1 + 0.1*math.Sqrt(kp)*st.dOverB
		f.dg = f.dq
	}
	st.meyerhofInclination(&f)
	return f
}

// hansenDq is Hansen's depth factor of the q term.
func (st bearingState) hansenDq() float64 {
	return 1 + 2*st.tanPhi*(1-st.sinPhi)*(1-st.sinPhi)*st.k
}

// hansenFactors: Hansen (1970); undrained in his additive form.
func hansenFactors(st bearingState) bearingFactors {
	f := unitFactors()
	if !st.drained {
		f.additiveC = true
		f.sc = 1 + 0.2*st.ratio
		f.dc = 1 + 0.4*st.k
		x, gone := st.adhesion()
		f.ic = 0.5 + 0.5*math.Sqrt(x) // 1 − i'c
		if gone {
			f.cExhausted = true
			f.notes = append(f.notes, noteAdhesion)
		}
		return f
	}
	f.sc = 1 + st.nq/st.nc*st.ratio
	f.sq = 1 + st.ratio*st.sinPhi
	f.sg = math.Max(1-0.4*st.ratio, 0.6)
	f.dc = 1 + 0.4*st.k
	f.dq = st.hansenDq()
	b5, gone1 := st.bracket(0.5)
	b7, gone2 := st.bracket(0.7)
	f.iq = math.Pow(b5, 5)
	f.ig = math.Pow(b7, 5)
	f.ic = f.iq - (1-f.iq)/(st.nq-1)
	if gone1 || gone2 {
		f.notes = append(f.notes, noteExhausted)
	}
	return f
}

// vesicFactors: Vesić (1973, 1975) with De Beer's shape and Hansen's depth
// factors; undrained shape factor in the EN 1997-1 D.3 form.
func vesicFactors(st bearingState) bearingFactors {
	f := unitFactors()
	f.usesM = true
	if !st.drained {
		f.sc = 1 + 0.2*st.ratio
		f.dc = 1 + 0.4*st.k
		if st.h > 0 {
			f.ic = 1 - st.m*st.h/(st.area*st.c*st.nc)
			if f.ic <= 0 {
				f.ic = 0
				f.notes = append(f.notes, noteAdhesion)
			}
		}
		return f
	}
	f.sc = 1 + st.ratio*st.nq/st.nc
	f.sq = 1 + st.ratio*st.tanPhi
	f.sg = 1 - 0.4*st.ratio
	f.dq = st.hansenDq()
	f.dc = f.dq - (1-f.dq)/(st.nc*st.tanPhi)
	b, gone := st.bracket(1)
	f.iq = math.Pow(b, st.m)
	f.ig = math.Pow(b, st.m+1)
	f.ic = f.iq - (1-f.iq)/(st.nc*st.tanPhi)
	if gone {
		f.notes = append(f.notes, noteExhausted)
	}
	return f
}

// annexDFactors: EN 1997-1:2004 Annex D, D.3 (undrained) and D.4 (drained),
// horizontal base (b = 1), no depth factors.
func annexDFactors(st bearingState) bearingFactors {
	f := unitFactors()
	if !st.drained {
		f.sc = 1 + 0.2*st.ratio
		x, gone := st.adhesion()
		f.ic = 0.5 * (1 + math.Sqrt(x))
		if gone {
			f.ic = 0
			f.notes = append(f.notes, noteAdhesion)
		}
		return f
	}
	f.usesM = true
	f.sq = 1 + st.ratio*st.sinPhi
	f.sg = 1 - 0.3*st.ratio
	f.sc = (f.sq*st.nq - 1) / (st.nq - 1)
	b, gone := st.bracket(1)
	f.iq = math.Pow(b, st.m)
	f.ig = math.Pow(b, st.m+1)
	f.ic = f.iq - (1-f.iq)/(st.nc*st.tanPhi)
	if gone {
		f.notes = append(f.notes, noteExhausted)
	}
	return f
}
