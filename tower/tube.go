package tower

import (
	"fmt"
	"math"
	"strconv"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// TubeShape is the shape of a hollow steel tube.
type TubeShape int

// The tube shapes.
const (
	// Circular hollow section; Size is the outside diameter.
	Circular TubeShape = iota
	// Square hollow section; Size is the outside width. Corners are taken
	// square (the corner radius is ignored in the section properties).
	Square
)

// SteelCode names the steel design code of a Tube.
type SteelCode int

// The steel codes.
const (
	// AISC360 is ANSI/AISC 360-16 (LRFD): E3 flexural buckling, F7/F8
	// flexure of HSS, H1-1 interaction.
	AISC360 SteelCode = iota
	// EN1993 is EN 1993-1-1:2005: 6.3.1 flexural buckling, 6.3.3 (6.61)
	// interaction with Annex B factors.
	EN1993
)

// String returns "AISC 360-16" or "EN 1993-1-1".
func (c SteelCode) String() string {
	switch c {
	case AISC360:
		return "AISC 360-16"
	case EN1993:
		return "EN 1993-1-1"
	}
	return "SteelCode(" + strconv.Itoa(int(c)) + ")"
}

// Tube is a hollow steel tower column, circular or square.
type Tube struct {
	Shape TubeShape
	// Size is the outside diameter (Circular) or outside width (Square).
	Size units.Length
	// Wall is the design wall thickness (for AISC 360 electric-resistance-
	// welded HSS that is 0.93 × nominal, B4.2, from memory: pass that value).
	Wall units.Length
	// Fy is the yield strength.
	Fy units.Pressure
	// E is the modulus; zero means 200 GPa (AISC 360 uses 29 000 ksi =
	// 199.9 GPa, EN 1993-1-1 3.2.6 uses 210 GPa: set it for the code).
	E units.Pressure
	// Code is the design code; the zero value is AISC360.
	Code SteelCode
	// ColdFormed selects EN 1993-1-1 buckling curve c (cold-formed hollow
	// sections) instead of curve a (hot-finished); Table 6.2 (from memory).
	ColdFormed bool
	// GammaM0 and GammaM1 are the EN 1993-1-1 partial factors; zero means
	// 1.0 (recommended values, 6.1 NOTE 2B). Ignored by AISC360.
	GammaM0, GammaM1 float64
}

func (t Tube) validate() error {
	if t.Shape != Circular && t.Shape != Square {
		return invalid("Tube.Shape", int(t.Shape), "is not Circular or Square")
	}
	if t.Code != AISC360 && t.Code != EN1993 {
		return invalid("Tube.Code", int(t.Code), "is not AISC360 or EN1993")
	}
	if err := positive("Tube.Size", t.Size); err != nil {
		return err
	}
	if err := positive("Tube.Wall", t.Wall); err != nil {
		return err
	}
	if 2*t.Wall >= t.Size {
		return invalid("Tube.Wall", t.Wall, "must be less than half the size")
	}
	if err := positive("Tube.Fy", t.Fy); err != nil {
		return err
	}
	for _, f := range []struct {
		n string
		v float64
	}{{"Tube.E", float64(t.E)}, {"Tube.GammaM0", t.GammaM0}, {"Tube.GammaM1", t.GammaM1}} {
		if err := nonNegative(f.n, units.Ratio(f.v)); err != nil {
			return err
		}
	}
	return nil
}

func (t Tube) e() float64 {
	if t.E == 0 {
		return 200e9
	}
	return float64(t.E)
}

func (t Tube) gammas() (float64, float64) {
	g0, g1 := t.GammaM0, t.GammaM1
	if g0 == 0 {
		g0 = 1
	}
	if g1 == 0 {
		g1 = 1
	}
	return g0, g1
}

// Area returns the cross-section area:
//
//	Circular: A = π (D² − d²)/4,  Square: A = B² − b²,  inner d, b = size − 2t
func (t Tube) Area() units.Area {
	o, i := float64(t.Size), float64(t.Size-2*t.Wall)
	if t.Shape == Circular {
		return units.Area(math.Pi * (o*o - i*i) / 4)
	}
	return units.Area(o*o - i*i)
}

// SecondMoment returns the second moment of area in m⁴:
//
//	Circular: I = π (D⁴ − d⁴)/64,  Square: I = (B⁴ − b⁴)/12
func (t Tube) SecondMoment() float64 {
	o, i := float64(t.Size), float64(t.Size-2*t.Wall)
	if t.Shape == Circular {
		return math.Pi * (math.Pow(o, 4) - math.Pow(i, 4)) / 64
	}
	return (math.Pow(o, 4) - math.Pow(i, 4)) / 12
}

// Radius returns the radius of gyration r = √(I/A).
func (t Tube) Radius() units.Length {
	return units.Length(math.Sqrt(t.SecondMoment() / float64(t.Area())))
}

// ElasticModulus returns the elastic section modulus S = I/(size/2), in m³.
func (t Tube) ElasticModulus() float64 { return t.SecondMoment() / (float64(t.Size) / 2) }

// PlasticModulus returns the plastic section modulus in m³:
//
//	Circular: Z = (D³ − d³)/6,  Square: Z = (B³ − b³)/4
func (t Tube) PlasticModulus() float64 {
	o, i := float64(t.Size), float64(t.Size-2*t.Wall)
	if t.Shape == Circular {
		return (o*o*o - i*i*i) / 6
	}
	return (o*o*o - i*i*i) / 4
}

// slenderness returns the wall slenderness used by the codes: D/t for a
// circular tube, the flat width b/t = (B − 3t)/t for a square one (AISC 360
// B4.1b(d) and the EN 1993-1-1 Table 5.2 convention c = B − 3t, from memory).
func (t Tube) slenderness() float64 {
	if t.Shape == Circular {
		return float64(t.Size / t.Wall)
	}
	return float64((t.Size - 3*t.Wall) / t.Wall)
}

// capacities returns the design compressive (buckling) resistance, the
// design tensile/cross-section axial resistance and the design moment
// resistance, with a note on the section class or compactness.
type tubeCaps struct {
	pc, pt, mc float64 // design buckling, design squash/tension, design moment
	mcb        float64 // EN 1993: moment resistance with γM1, for eq. 6.61
	chi, lam   float64 // EN: χ and λ̄; AISC: Fcr/Fy and Lc/r
	class      int     // EN section class; AISC 1 compact, 2 noncompact
}

func (t Tube) caps(lc float64) (tubeCaps, error) {
	e, fy := t.e(), float64(t.Fy)
	a, s, z := float64(t.Area()), t.ElasticModulus(), t.PlasticModulus()
	r := float64(t.Radius())
	w := t.slenderness()
	var c tubeCaps
	if t.Code == AISC360 {
		// Table B4.1a/b (from memory): compression nonslender limit, flexure compact/noncompact limits.
		var lr, lp, lrf float64
		if t.Shape == Circular {
			lr, lp, lrf = 0.11*e/fy, 0.07*e/fy, 0.31*e/fy
		} else {
			lr, lp, lrf = 1.40*math.Sqrt(e/fy), 1.12*math.Sqrt(e/fy), 1.40*math.Sqrt(e/fy)
		}
		if w > lr || w > lrf {
			return c, fmt.Errorf("tower: tube wall slenderness %.1f exceeds the AISC 360 Table B4.1 limit %.1f "+
				"(slender elements, E7/F7/F8 reduced strength, not covered): %w", w, math.Min(lr, lrf), ErrUnsupported)
		}
		// E3: Fe = π²E/(Lc/r)²; Fcr = 0.658^(Fy/Fe) Fy when Lc/r ≤ 4.71√(E/Fy), else 0.877 Fe.
		kl := lc / r
		fe := math.Pi * math.Pi * e / (kl * kl)
		fcr := 0.877 * fe
		if kl <= 4.71*math.Sqrt(e/fy) {
			fcr = math.Pow(0.658, fy/fe) * fy
		}
		c.pc = 0.90 * fcr * a
		c.pt = 0.90 * fy * a
		c.chi, c.lam = fcr/fy, kl
		mp := fy * z
		mn := mp
		c.class = 1
		if w > lp {
			c.class = 2
			if t.Shape == Circular {
				mn = (0.021*e/w + fy) * s // F8-2
			} else {
				mn = mp - (mp-fy*s)*(3.57*w*math.Sqrt(fy/e)-4.0) // F7-2
			}
			mn = math.Min(mn, mp)
		}
		c.mc = 0.90 * mn
		c.mcb = c.mc
		return c, nil
	}
	// EN 1993-1-1 Table 5.2 (from memory): ε = √(235/fy).
	g0, g1 := t.gammas()
	eps := math.Sqrt(235e6 / fy)
	var lim [3]float64
	if t.Shape == Circular {
		lim = [3]float64{50 * eps * eps, 70 * eps * eps, 90 * eps * eps}
	} else {
		lim = [3]float64{33 * eps, 38 * eps, 42 * eps}
	}
	c.class = 4
	for i, l := range lim {
		if w <= l {
			c.class = i + 1
			break
		}
	}
	if c.class == 4 {
		return c, fmt.Errorf("tower: tube wall slenderness %.1f exceeds the EN 1993-1-1 Table 5.2 class 3 limit %.1f "+
			"(class 4, effective section not covered): %w", w, lim[2], ErrUnsupported)
	}
	wmod := z
	if c.class == 3 {
		wmod = s
	}
	alpha := 0.21 // curve a, hot-finished
	if t.ColdFormed {
		alpha = 0.49 // curve c, cold-formed
	}
	ncr := math.Pi * math.Pi * e * t.SecondMoment() / (lc * lc)
	lam := math.Sqrt(a * fy / ncr)
	c.chi, c.lam = ChiEN1993(lam, alpha), lam
	c.pc = c.chi * a * fy / g1
	c.pt = a * fy / g0
	c.mc = wmod * fy / g0  // cross-section resistance, 6.2 (γM0)
	c.mcb = wmod * fy / g1 // member resistance in 6.3.3 eq. 6.61 (γM1)
	return c, nil
}

// ChiEN1993 returns the flexural buckling reduction factor of EN 1993-1-1
// 6.3.1.2 for non-dimensional slenderness λ̄ and imperfection factor α
// (curves a0, a, b, c, d: 0.13, 0.21, 0.34, 0.49, 0.76, Table 6.1):
//
//	Φ = 0.5 [1 + α(λ̄ − 0.2) + λ̄²]
//	χ = 1 / (Φ + √(Φ² − λ̄²)),  χ ≤ 1
//
// Special cases: λ̄ ≤ 0.2 gives 1 (6.3.1.2(4)); NaN in gives NaN out.
func ChiEN1993(lambda, alpha float64) float64 {
	if lambda <= 0.2 {
		return 1
	}
	phi := 0.5 * (1 + alpha*(lambda-0.2) + lambda*lambda)
	return math.Min(1, 1/(phi+math.Sqrt(phi*phi-lambda*lambda)))
}

// CompressionCapacity returns the design flexural buckling resistance of
// the tube over effective length lc:
//
//	AISC 360 E3: φc Fcr A, φc = 0.90
//	EN 1993-1-1 6.3.1: χ A fy / γM1
func (t Tube) CompressionCapacity(lc units.Length) (units.Force, error) {
	if err := t.validate(); err != nil {
		return 0, err
	}
	if err := positive("effective length", lc); err != nil {
		return 0, err
	}
	c, err := t.caps(float64(lc))
	return units.Force(c.pc), err
}

// Check checks the tube under design axial force n (compression positive)
// and design bending moment m over effective length effLength. The tube is
// doubly symmetric and closed, so the axis of bending does not matter and
// lateral–torsional buckling does not occur. The utilisation is
//
//	AISC 360 H1-1 (from memory), Pc = φc Pn (E3) in compression, φt Fy A in tension,
//	Mc = φb Mn (F7 square, F8 circular), φ = 0.90:
//	  Pr/Pc ≥ 0.2:  Pr/Pc + 8/9 · Mr/Mc
//	  Pr/Pc < 0.2:  Pr/(2Pc) + Mr/Mc
//	EN 1993-1-1 6.3.3 (6.61) with Annex B (from memory), compression:
//	  N/(χ N_Rk/γM1) + k_yy M/(M_Rk/γM1),
//	  k_yy = Cmy [1 + (λ̄ − 0.2) n] ≤ Cmy (1 + 0.8 n) (class 1, 2),
//	  k_yy = Cmy [1 + 0.6 λ̄ n] ≤ Cmy (1 + 0.6 n) (class 3),
//	  n = N/(χ N_Rk/γM1), Cmy = 1 (uniform moment, conservative for a
//	  cantilever column); and never less than the linear cross-section
//	  check N/N_Rd + M/M_Rd (6.2.1(7)), which alone applies in tension.
//
// The result has ID "tower.column_section", kind ratio, demand the
// utilisation and capacity 1. Special cases: walls too slender for the
// clauses implemented (AISC slender elements, EN class 4) give
// ErrUnsupported; effLength must be positive.
func (t Tube) Check(n units.Force, m units.Moment, effLength units.Length) (check.Result, error) {
	if err := t.validate(); err != nil {
		return check.Result{}, err
	}
	if err := positive("effective length", effLength); err != nil {
		return check.Result{}, err
	}
	if err := isFinite("axial force", n); err != nil {
		return check.Result{}, err
	}
	if err := isFinite("moment", m); err != nil {
		return check.Result{}, err
	}
	c, err := t.caps(float64(effLength))
	if err != nil {
		return check.Result{}, err
	}
	if !finite(c.pc) || !finite(c.pt) || !finite(c.mc) || c.pc <= 0 || c.mc <= 0 {
		return check.Result{}, invalid("Tube", t.Size, "gives resistances that are not finite and positive")
	}
	nn, mm := float64(n), math.Abs(float64(m))
	var u, k float64
	var basis, note string
	var vals []check.Value
	if t.Code == AISC360 {
		pc := c.pc
		if nn < 0 {
			pc = c.pt
		}
		pr := math.Abs(nn) / pc
		if pr >= 0.2 {
			u = pr + 8.0/9.0*mm/c.mc
		} else {
			u = pr/2 + mm/c.mc
		}
		basis = "AISC 360-16 E3 flexural buckling, F7/F8 HSS flexure, H1-1 interaction, LRFD φ 0.90 (from memory)"
		cls := "compact"
		if c.class == 2 {
			cls = "noncompact"
		}
		note = "section " + cls
		vals = []check.Value{
			check.Of("Lc/r", "slenderness", units.Ratio(c.lam)),
			check.Of("Fcr/Fy", "critical stress over yield (E3)", units.Ratio(c.chi)),
			check.Of("φcPn", "design compressive strength", units.Force(c.pc)),
			check.Of("φtPn", "design tensile strength", units.Force(c.pt)),
			check.Of("φbMn", "design flexural strength", units.Moment(c.mc)),
			check.Of("compact", "1 compact, 2 noncompact (Table B4.1)", units.Ratio(c.class)),
		}
	} else {
		lin := math.Abs(nn)/c.pt + mm/c.mc
		u = lin
		if nn > 0 {
			nr := nn / c.pc
			if c.class <= 2 {
				k = math.Min(1+(c.lam-0.2)*nr, 1+0.8*nr)
			} else {
				k = math.Min(1+0.6*c.lam*nr, 1+0.6*nr)
			}
			u = math.Max(lin, nr+k*mm/c.mcb)
		}
		curve := "a (hot-finished)"
		if t.ColdFormed {
			curve = "c (cold-formed)"
		}
		basis = "EN 1993-1-1 6.3.1.2 buckling curve " + curve + ", 6.3.3 eq. 6.61 with Annex B k_yy, Cmy 1 (from memory)"
		note = fmt.Sprintf("section class %d", c.class)
		vals = []check.Value{
			check.Of("λ̄", "non-dimensional slenderness", units.Ratio(c.lam)),
			check.Of("χ", "buckling reduction factor (6.3.1.2)", units.Ratio(c.chi)),
			check.Of("N_b,Rd", "buckling resistance χ A f_y/γM1", units.Force(c.pc)),
			check.Of("N_Rd", "cross-section axial resistance A f_y/γM0", units.Force(c.pt)),
			check.Of("M_Rd", "cross-section moment resistance W f_y/γM0", units.Moment(c.mc)),
			check.Of("k_yy", "interaction factor (Annex B)", units.Ratio(k)),
			check.Of("class", "section class (Table 5.2)", units.Ratio(c.class)),
		}
	}
	return check.Compare("tower.column_section", "Column section, axial force and bending", units.KindRatio, u, 1).
		WithBasis(basis).WithValues(append([]check.Value{check.Of("N_Ed", "design axial force (compression +)", n),
		check.Of("M_Ed", "design moment", m)}, vals...)...).WithNote(note), nil
}
