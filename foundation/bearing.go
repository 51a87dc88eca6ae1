package foundation

import (
	"fmt"
	"math"

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

// BearingInput is the footing and its load for BearingCapacity.
type BearingInput struct {
	// B and L are the base's sides; B is the side the horizontal load and
	// EccB act along (along the bridge for a tower footing). Either may be
	// the shorter: the factors use the shorter effective side as B'.
	B, L units.Length
	// Depth is the depth of the base below the lower adjacent ground.
	Depth units.Length
	// Vertical is the vertical load on the base (including the footing's
	// own weight); it must be positive. Horizontal acts along B; its sign
	// does not matter.
	Vertical, Horizontal units.Force
	// EccB and EccL are the eccentricities of the vertical load from the
	// base centre along B and L.
	EccB, EccL units.Length
	// Groundwater is true when the water table is within reach; it then
	// lies WaterDepth below the ground surface (zero: at the surface).
	Groundwater bool
	WaterDepth  units.Length
}

// Bearing is the result of BearingCapacity: the ultimate bearing pressure
// on the effective base and every factor used.
type Bearing struct {
	Method Method
	// Qult is the ultimate (gross) bearing pressure on the effective area
	// BEff × LEff.
	Qult units.Pressure
	// Nc, Nq, Ngamma are the bearing-capacity factors.
	Nc, Nq, Ngamma float64
	// Shape, depth and load-inclination factors of the c, q and γ terms.
	Sc, Sq, Sgamma float64
	Dc, Dq, Dgamma float64
	Ic, Iq, Igamma float64
	// BEff ≤ LEff are the effective sides B' and L'.
	BEff, LEff units.Length
	// Overburden is the effective vertical stress q at base level.
	Overburden units.Pressure
	// GammaEff is the unit weight used in the Nγ term.
	GammaEff units.UnitWeight
	// Notes record assumptions and limits met.
	Notes []string
}

// Area returns the effective area A' = B'·L'.
func (b Bearing) Area() units.Area { return units.Area(float64(b.BEff) * float64(b.LEff)) }

// Resistance returns the ultimate bearing resistance R = qult·A'.
func (b Bearing) Resistance() units.Force { return units.Force(float64(b.Qult) * float64(b.Area())) }

// validate checks in and returns an error naming the bad field.
func (in BearingInput) validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"BearingInput.B", float64(in.B)}, {"BearingInput.L", float64(in.L)}, {"BearingInput.Vertical", float64(in.Vertical)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if err := nonNegative("BearingInput.Depth", float64(in.Depth)); err != nil {
		return err
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"BearingInput.Horizontal", float64(in.Horizontal)}, {"BearingInput.EccB", float64(in.EccB)}, {"BearingInput.EccL", float64(in.EccL)}} {
		if err := finite(f.name, f.v); err != nil {
			return err
		}
	}
	if in.Groundwater {
		if err := nonNegative("BearingInput.WaterDepth", float64(in.WaterDepth)); err != nil {
			return err
		}
	}
	if math.Abs(float64(in.EccB)) >= float64(in.B)/2 {
		return fmt.Errorf("%w: EccB %v reaches half of B %v", ErrOutsideBase, in.EccB, in.B)
	}
	if math.Abs(float64(in.EccL)) >= float64(in.L)/2 {
		return fmt.Errorf("%w: EccL %v reaches half of L %v", ErrOutsideBase, in.EccL, in.L)
	}
	return nil
}

// tinyFriction is the friction angle below which a soil is treated as
// frictionless (φ = 0, total-stress analysis), in radians.
const tinyFriction = 1e-6

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
// (formulas as in B. Look, Handbook of Geotechnical Investigation and
// Design Tables, Table 21.5, and EN 1997-1 Annex D.) For Terzaghi:
//
//	Nq = e^(2(3π/4 − φ/2) tan φ) / (2 cos²(45° + φ/2))
//	Nc = (Nq − 1) cot φ              (1.5π + 1 at φ = 0)
//	Nγ ≈ 2 (Nq + 1) tan φ / (1 + 0.4 sin 4φ)
//
// where Nγ is Coduto's fit to Terzaghi's values (from memory).
// An angle outside 0–50° or an unknown method gives an error wrapping
// ErrInvalid.
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
// base on soil s by method m:
//
//	qult = c Nc sc dc ic + q Nq sq dq iq + ½ γ B' Nγ sγ dγ iγ
//	B' = B − 2|eB|, L' = L − 2|eL|  (Meyerhof's effective area; B' ≤ L')
//
// q is the effective overburden at base level and γ the effective unit
// weight below it. Factors by method (formulas from memory, except EN 1997-1
// Annex D; Look, Handbook of Geotechnical Investigation and Design Tables,
// ch. 21, and Das, Principles of Foundation Engineering, ch. 3, collect them):
//
//	Terzaghi:  sc = 1 + 0.3B'/L', sq = 1, sγ = 1 − 0.2B'/L' (strip 1/1/1, square 1.3/1/0.8,
//	           rectangles interpolated, common practice); d = 1; i as Meyerhof
//	Meyerhof:  Kp = tan²(45+φ/2); sc = 1 + 0.2Kp B'/L'; sq = sγ = 1 + 0.1Kp B'/L' (φ > 10°, else 1)
//	           dc = 1 + 0.2√Kp D/B; dq = dγ = 1 + 0.1√Kp D/B (φ > 10°, else 1)
//	           ic = iq = (1 − θ/90°)²; iγ = (1 − θ/φ)², θ = atan(H/V)
//	Hansen:    sc = 1 + (Nq/Nc)B'/L'; sq = 1 + (B'/L') sin φ; sγ = 1 − 0.4B'/L' ≥ 0.6
//	           k = D/B (D ≤ B) or atan(D/B); dc = 1 + 0.4k; dq = 1 + 2tanφ(1 − sinφ)² k; dγ = 1
//	           iq = (1 − 0.5H/(V + A'c cotφ))⁵; iγ = (1 − 0.7H/(V + A'c cotφ))⁵; ic = iq − (1 − iq)/(Nq − 1)
//	Vesić:     sc = 1 + (B'/L')(Nq/Nc); sq = 1 + (B'/L') tanφ; sγ = 1 − 0.4B'/L'; d as Hansen
//	           iq = (1 − H/(V + A'c cotφ))^m; iγ = (…)^(m+1); ic = iq − (1 − iq)/(Nc tanφ)
//	EN 1997-1 Annex D: sq = 1 + (B'/L') sinφ; sγ = 1 − 0.3B'/L'; sc = (sq Nq − 1)/(Nq − 1); d = 1
//	           iq, iγ, ic as Vesić
//	m = (2 + B'/L')/(1 + B'/L') for H along B', (2 + L'/B')/(1 + L'/B') along L'
//
// With φ' = 0 (undrained, c = cu): Nc = π + 2, Nq = 1, Nγ = 0; sc = 1 + 0.2B'/L'
// and ic = ½(1 + √(1 − H/(A'cu))) (EN 1997-1 D.3; Hansen and Meyerhof use
// their own forms above).
//
// Groundwater (Das, Principles of Foundation Engineering, §3.6, from
// memory): with the water table Dw below ground, q = γDw + γ'(D − Dw) when
// Dw < D, and the Nγ term uses γ' when Dw ≤ D, γ' + (Dw − D)(γ − γ')/B'
// when D < Dw < D + B', γ beyond.
//
// Special cases: a horizontal load that exhausts a bracket sets that
// inclination factor to zero, with a note (the base slides before it
// bears); invalid input returns an error wrapping ErrInvalid, and an
// eccentricity of half a side or more one wrapping ErrOutsideBase.
func BearingCapacity(in BearingInput, s Soil, m Method) (Bearing, error) {
	if err := in.validate(); err != nil {
		return Bearing{}, err
	}
	if err := s.Validate(); err != nil {
		return Bearing{}, err
	}
	nc, nq, ng, err := BearingFactors(s.Friction, m)
	if err != nil {
		return Bearing{}, err
	}
	r := Bearing{Method: m, Nc: nc, Nq: nq, Ngamma: ng}

	bEff := float64(in.B) - 2*math.Abs(float64(in.EccB))
	lEff := float64(in.L) - 2*math.Abs(float64(in.EccL))
	alongB := true // horizontal load parallel to B'
	if bEff > lEff {
		bEff, lEff = lEff, bEff
		alongB = false
	}
	r.BEff, r.LEff = units.Length(bEff), units.Length(lEff)
	ratio := bEff / lEff
	depth := float64(in.Depth)
	width := math.Min(float64(in.B), float64(in.L))

	// Overburden and effective unit weight with groundwater.
	g, gs := float64(s.UnitWeight), float64(s.SubmergedWeight())
	q, ge := g*depth, g
	if in.Groundwater {
		dw := float64(in.WaterDepth)
		switch {
		case dw <= depth:
			q = g*dw + gs*(depth-dw)
			ge = gs
		case dw < depth+bEff:
			ge = gs + (dw-depth)/bEff*(g-gs)
		}
	}
	r.Overburden, r.GammaEff = units.Pressure(q), units.UnitWeight(ge)

	phi := float64(s.Friction)
	c := float64(s.Cohesion)
	v, h := float64(in.Vertical), math.Abs(float64(in.Horizontal))
	area := bEff * lEff
	drained := phi >= tinyFriction
	tanPhi, sinPhi := math.Tan(phi), math.Sin(phi)

	// k: Hansen's depth ratio.
	k := depth / width
	if k > 1 {
		k = math.Atan(k)
	}
	hansenDq := 1 + 2*tanPhi*(1-sinPhi)*(1-sinPhi)*k

	// bracket returns max(0, 1 − a·H/(V + A'c cotφ)), noting exhaustion.
	bracket := func(a float64) float64 {
		den := v
		if drained {
			den += area * c / tanPhi
		}
		x := 1 - a*h/den
		if x <= 0 {
			r.Notes = append(r.Notes, "horizontal load exhausts the inclination factor: the base slides before it bears")
			return 0
		}
		return x
	}
	// undrainedIc returns ½(1 + √(1 − H/(A'c))), zero when H ≥ A'c.
	undrainedIc := func() float64 {
		if h == 0 {
			return 1
		}
		x := 1 - h/(area*c)
		if !(x > 0) {
			r.Notes = append(r.Notes, "horizontal load exceeds the undrained base adhesion A'cu")
			return 0
		}
		return 0.5 * (1 + math.Sqrt(x))
	}
	mExp := (2 + ratio) / (1 + ratio)
	if !alongB {
		mExp = (2 + 1/ratio) / (1 + 1/ratio)
	}

	r.Sc, r.Sq, r.Sgamma = 1, 1, 1
	r.Dc, r.Dq, r.Dgamma = 1, 1, 1
	r.Ic, r.Iq, r.Igamma = 1, 1, 1
	meyerhofInclination := func() {
		theta := math.Atan2(h, v)
		r.Ic = math.Pow(1-theta/(math.Pi/2), 2)
		r.Iq = r.Ic
		switch {
		case theta == 0:
			r.Igamma = 1
		case !drained || theta >= phi:
			r.Igamma = 0
		default:
			r.Igamma = math.Pow(1-theta/phi, 2)
		}
	}

	switch m {
	case Terzaghi:
		r.Sc = 1 + 0.3*ratio
		r.Sgamma = 1 - 0.2*ratio
		meyerhofInclination()
		if h > 0 {
			r.Notes = append(r.Notes, "Terzaghi's method has no inclination factors: Meyerhof's are used")
		}
	case Meyerhof:
		kp := math.Pow(math.Tan(math.Pi/4+phi/2), 2)
		r.Sc = 1 + 0.2*kp*ratio
		r.Dc = 1 + 0.2*math.Sqrt(kp)*depth/width
		if phi > float64(10*units.Degree) {
			r.Sq = 1 + 0.1*kp*ratio
			r.Sgamma = r.Sq
			r.Dq = 1 + 0.1*math.Sqrt(kp)*depth/width
			r.Dgamma = r.Dq
		}
		meyerhofInclination()
	case Hansen:
		if drained {
			r.Sc = 1 + nq/nc*ratio
			r.Sq = 1 + ratio*sinPhi
			r.Sgamma = math.Max(1-0.4*ratio, 0.6)
			r.Dq = hansenDq
			r.Iq = math.Pow(bracket(0.5), 5)
			r.Igamma = math.Pow(bracket(0.7), 5)
			r.Ic = r.Iq - (1-r.Iq)/(nq-1)
		} else {
			r.Sc = 1 + 0.2*ratio
			r.Ic = undrainedIc()
		}
		r.Dc = 1 + 0.4*k
	case Vesic:
		r.Dc = 1 + 0.4*k
		if drained {
			r.Sc = 1 + ratio*nq/nc
			r.Sq = 1 + ratio*tanPhi
			r.Sgamma = 1 - 0.4*ratio
			r.Dq = hansenDq
			r.Dc = r.Dq - (1-r.Dq)/(nc*tanPhi)
			b := bracket(1)
			r.Iq = math.Pow(b, mExp)
			r.Igamma = math.Pow(b, mExp+1)
			r.Ic = r.Iq - (1-r.Iq)/(nc*tanPhi)
		} else {
			r.Sc = 1 + 0.2*ratio
			switch {
			case h == 0:
				r.Ic = 1
			case c == 0:
				r.Ic = 0
			default:
				r.Ic = 1 - mExp*h/(area*c*nc)
			}
		}
	case EC7:
		if drained {
			r.Sq = 1 + ratio*sinPhi
			r.Sgamma = 1 - 0.3*ratio
			r.Sc = (r.Sq*nq - 1) / (nq - 1)
			b := bracket(1)
			r.Iq = math.Pow(b, mExp)
			r.Igamma = math.Pow(b, mExp+1)
			r.Ic = r.Iq - (1-r.Iq)/(nc*tanPhi)
		} else {
			r.Sc = 1 + 0.2*ratio
			r.Ic = undrainedIc()
		}
	}
	r.Ic = math.Max(r.Ic, 0)

	qult := c*nc*r.Sc*r.Dc*r.Ic + q*nq*r.Sq*r.Dq*r.Iq + 0.5*ge*bEff*ng*r.Sgamma*r.Dgamma*r.Igamma
	r.Qult = units.Pressure(qult)
	return r, nil
}
