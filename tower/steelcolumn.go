package tower

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// SteelColumn is a steel tower column checked to EN 1993-1-1: one hollow
// tube, or a frame of two tube legs side by side across the bridge, joined
// by bracing.
type SteelColumn struct {
	// Tube is the column, or each leg of a frame; its Code must be EN1993.
	Tube Tube
	// Legs is 1 (a single tube; zero means 1) or 2 (a frame).
	Legs int
	// Spacing is the centre-to-centre distance of a frame's legs across
	// the bridge.
	Spacing units.Length
	// Panel is the buckling length of a frame's leg across the bridge
	// between bracing nodes; zero means Length (no intermediate node:
	// conservative).
	Panel units.Length
	// Length is the column length l from the base section to its top.
	Length units.Length
	// Along and Across are the restraints of the top in each direction.
	Along, Across Restraint
	// AlongSpring and AcrossSpring are the lateral stiffnesses, in N/m, of
	// what holds the top (of the whole column: both legs of a frame) in
	// that direction when its restraint is SpringTop.
	AlongSpring, AcrossSpring float64
	// BaseFlexibility is the relative flexibility k = (θ/M)(EI/l) of the
	// base's rotational restraint; zero means DefaultBaseFlexibility (the
	// minimum EN 1992-1-1:2004 5.8.3.2(3) recommends, taken for a steel
	// column on its footing too: conservative against a base called rigid).
	BaseFlexibility float64
}

func (c SteelColumn) validate() error {
	if err := c.Tube.validate(); err != nil {
		return err
	}
	if c.Tube.Code != EN1993 {
		return invalid("SteelColumn.Tube.Code", c.Tube.Code, "must be EN1993: the member checks are those of EN 1993-1-1")
	}
	if err := positive("SteelColumn.Length", c.Length); err != nil {
		return err
	}
	switch c.Legs {
	case 0, 1:
	case 2:
		if err := positive("SteelColumn.Spacing", c.Spacing); err != nil {
			return err
		}
		if c.Spacing <= c.Tube.Size {
			return invalid("SteelColumn.Spacing", c.Spacing, "must exceed the leg size: the legs overlap")
		}
		if err := nonNegative("SteelColumn.Panel", c.Panel); err != nil {
			return err
		}
		if c.Panel > c.Length {
			return invalid("SteelColumn.Panel", c.Panel, "is longer than the column")
		}
	default:
		return invalid("SteelColumn.Legs", c.Legs, "must be 1 (a tube) or 2 (a frame)")
	}
	return validRestraints("SteelColumn", c.Along, c.Across, c.AlongSpring, c.AcrossSpring, c.BaseFlexibility)
}

// Check checks the column under design actions a (the quasi-permanent
// actions are not used) and returns
//
//	Along   tower.column_section  N with the moment along the bridge alone
//	Across  tower.column_section  N with the moment across the bridge alone
//	Both    tower.column_biaxial  both moments at once
//
// each by eq. 6.61 and 6.62 (both buckling modes)
//
// by EN 1993-1-1:2005 6.3.1 flexural buckling (χ by curve a for a
// hot-finished tube, c for a cold-formed one, Table 6.2) and the 6.3.3
// interaction with the Annex B factors for members not susceptible to
// torsional deformation (a closed section: no lateral–torsional buckling),
// with y along the bridge and z across it:
//
//	N/(χ_y N_Rk/γM1) + k_yy M_y/(M_Rk/γM1) + k_yz M_z/(M_Rk/γM1) ≤ 1      (6.61)
//	N/(χ_z N_Rk/γM1) + k_zy M_y/(M_Rk/γM1) + k_zz M_z/(M_Rk/γM1) ≤ 1      (6.62)
//	class 1, 2:  k_yy = C_m [1 + (λ̄_y − 0.2) n_y] ≤ C_m (1 + 0.8 n_y),  k_zz likewise,
//	             k_yz = 0.6 k_zz,  k_zy = 0.6 k_yy
//	class 3:     k_yy = C_m [1 + 0.6 λ̄_y n_y] ≤ C_m (1 + 0.6 n_y),  k_zz likewise,
//	             k_yz = k_zz,  k_zy = 0.8 k_yy
//
// with n = N/(χ N_Rk/γM1), C_m = 1 (uniform moment: conservative for the
// moment of a force at the top of a cantilever, Table B.3 gives 0.9 for
// a sway mode), effective lengths from the restraints and the base
// flexibility (EffectiveLengthFactor; a spring on a frame is shared by its
// legs), and never
// less than the cross-section check N/N_Rd + M_y/M_Rd + M_z/M_Rd
// (6.2.1(7)), which alone applies in tension. Values are from memory
// except χ (6.3.1.2, checked against the standard's table in the tests).
//
// A frame of two legs at spacing s carries the moment across the bridge by
// push and pull in its legs: the frame is a built-up member (6.4) with
// I_eff = 2 A (s/2)², global bow e0 = l/500, critical load
// N_cr = π² E I_eff/l0² (l0 from the Across restraint) and the bracing's
// shear stiffness S_v = 2π² E I_ch/a², a the panel (the largest a battened
// member has, 6.4.3.1; a laced member's is larger, so this is conservative
// for lacing; the bracing is not described and is not checked), so that
//
//	M_across,Ed = (M_across + N e0) / (1 − N/N_cr − N/S_v)      (6.69)
//	N_leg = N/2 + M_across,Ed / s,   M_y,leg = M_along/2
//
// and each leg is checked as above with no moment across and buckling
// across over Panel.
//
// Special cases: a tube not to EN 1993, walls too slender for class 3
// (ErrUnsupported), non-finite actions (ErrInvalid).
func (c SteelColumn) Check(a ColumnActions) (ColumnResults, error) {
	if err := c.validate(); err != nil {
		return ColumnResults{}, err
	}
	if err := a.validate(); err != nil {
		return ColumnResults{}, err
	}
	t := c.Tube
	l := float64(c.Length)
	legs := float64(max(c.Legs, 1))
	kb := baseFlexibility(c.BaseFlexibility)
	ei := t.e() * t.SecondMoment() // each leg; a spring on the column is shared by its legs
	l0y, sy, err := effectiveLength(c.Along, l, kb, c.AlongSpring/legs, ei, lengthFactor{})
	if err != nil {
		return ColumnResults{}, err
	}
	var l0z, sz float64
	if c.Legs == 2 {
		// Across the bridge the frame bends as a whole: I_eff (6.4).
		s := float64(c.Spacing)
		l0z, sz, err = effectiveLength(c.Across, l, kb, c.AcrossSpring, t.e()*2*float64(t.Area())*(s/2)*(s/2), lengthFactor{})
	} else {
		l0z, sz, err = effectiveLength(c.Across, l, kb, c.AcrossSpring, ei, lengthFactor{})
	}
	if err != nil {
		return ColumnResults{}, err
	}
	n, my, mz := float64(a.N), math.Abs(float64(a.Along)), math.Abs(float64(a.Across))
	var frameVals []check.Value
	member := "tube"
	if c.Legs == 2 {
		member = "each leg of the two-leg frame"
		s := float64(c.Spacing)
		ieff := 2 * float64(t.Area()) * (s / 2) * (s / 2)
		ncr := math.Pi * math.Pi * t.e() * ieff / (l0z * l0z)
		// Shear stiffness of the bracing: the largest a battened member has,
		// 2π² E I_ch/a² (6.4.3.1); a laced frame's is larger, so taking
		// this is conservative for lacing (the bracing is not described).
		panel := l
		if c.Panel > 0 {
			panel = float64(c.Panel)
		}
		sv := 2 * math.Pi * math.Pi * t.e() * t.SecondMoment() / (panel * panel)
		neff := 1 / (1/ncr + 1/sv) // the load at which 1 − N/N_cr − N/S_v vanishes
		e0 := l / 500
		mzEd := mz
		if n > 0 {
			if n >= neff {
				r := check.Compare("tower.column_section", "Column section, axial force and bending", units.KindForce, n, neff).
					WithBasis("EN 1993-1-1:2005 6.4 built-up member, the two-leg frame across the bridge, bracing's shear stiffness 2π² E I_ch/a² (6.4.3.1, conservative for lacing)").
					WithValues(check.Of("N_Ed", "design axial force", a.N), check.Of("N_cr", "critical load of the frame across the bridge", units.Force(ncr)),
						check.Of("S_v", "shear stiffness of the bracing, 2π² E I_ch/a²", units.Force(sv)),
						check.Of("N_cr,v", "critical load with the bracing's shear flexibility, 1/(1/N_cr + 1/S_v)", units.Force(neff)),
						check.Of("l0_z", "effective length of the frame across the bridge", units.Length(l0z)),
						check.Of("k_base", "relative flexibility of the base restraint (EN 1992-1-1 5.8.3.2(3))", units.Ratio(kb)),
						check.Of("A", "area of each leg", t.Area()),
						check.Of("s", "spacing of the legs", c.Spacing)).
					WithNote("the frame buckles across the bridge as a whole")
				both := r
				both.ID, both.Title = "tower.column_biaxial", "Column section, biaxial bending"
				return ColumnResults{Along: r, Across: r, Both: both}, nil
			}
			mzEd = (mz + n*e0) / (1 - n/ncr - n/sv) // eq. 6.69
		}
		frameVals = []check.Value{
			check.Of("N_cr,frame", "critical load of the frame across the bridge, π² E I_eff/l0²", units.Force(ncr)),
			check.Of("S_v", "shear stiffness of the bracing, 2π² E I_ch/a² (6.4.3.1)", units.Force(sv)),
			check.Of("M_across,Ed", "moment across the bridge with the frame's bow and second-order effects", units.Moment(mzEd)),
			check.Of("N_leg", "axial force in the more loaded leg", units.Force(n/2+mzEd/s)),
		}
		n = n/2 + mzEd/s
		my /= 2
		mz = 0
		l0z = l
		if c.Panel > 0 {
			l0z = float64(c.Panel)
		}
	}
	cy, err := t.caps(l0y)
	if err != nil {
		return ColumnResults{}, err
	}
	cz, err := t.caps(l0z)
	if err != nil {
		return ColumnResults{}, err
	}
	if !finite(cy.pc) || !finite(cz.pc) || !finite(cy.mc) || cy.pc <= 0 || cz.pc <= 0 || cy.mc <= 0 {
		return ColumnResults{}, invalid("Tube", t.Size, "gives resistances that are not finite and positive")
	}
	// Interaction factors, Annex B Table B.1 (C_m = 1).
	k := func(lam, nr float64) float64 {
		if cy.class <= 2 {
			return math.Min(1+(lam-0.2)*nr, 1+0.8*nr)
		}
		return math.Min(1+0.6*lam*nr, 1+0.6*nr)
	}
	var ny, nz, kyy, kzz float64
	if n > 0 {
		ny, nz = n/cy.pc, n/cz.pc
		kyy, kzz = k(cy.lam, ny), k(cz.lam, nz)
	}
	kyz, kzy := 0.6*kzz, 0.6*kyy
	if cy.class == 3 {
		kyz, kzy = kzz, 0.8*kyy
	}
	cross := math.Abs(n)/cy.pt + my/cy.mc + mz/cy.mc
	interaction := func(myy, mzz float64) (u, e661, e662 float64) {
		lin := math.Abs(n)/cy.pt + myy/cy.mc + mzz/cy.mc
		if n <= 0 {
			return lin, 0, 0
		}
		e661 = ny + kyy*myy/cy.mcb + kyz*mzz/cy.mcb
		e662 = nz + kzy*myy/cy.mcb + kzz*mzz/cy.mcb
		return math.Max(lin, math.Max(e661, e662)), e661, e662
	}
	curve := "a (hot-finished)"
	if t.ColdFormed {
		curve = "c (cold-formed)"
	}
	basis := fmt.Sprintf("EN 1993-1-1:2005 6.3.1 flexural buckling, curve %s, 6.3.3 eq. 6.61/6.62 with Annex B factors (C_m 1), "+
		"6.2.1(7) cross-section; %s; along: %s; across: %s (from memory but χ)", curve, member, lengthBasis(c.Along, kb), lengthBasis(c.Across, kb))
	if c.Legs == 2 {
		basis += "; frame across the bridge as a built-up member (6.4), the bracing's shear stiffness the largest a battened member has, 2π² E I_ch/a² with a the panel (6.4.3.1; a laced frame's is larger: conservative for lacing, the lacing and battens themselves not checked)"
	}
	common := []check.Value{
		check.Of("N_Ed", "design axial force (compression +) in the member checked", units.Force(n)),
		check.Of("N_Rd", "cross-section axial resistance A f_y/γM0", units.Force(cy.pt)),
		check.Of("M_Rd", "cross-section moment resistance W f_y/γM0", units.Moment(cy.mc)),
	}
	common = append(common, check.Of("k_base", "relative flexibility of the base restraint (EN 1992-1-1 5.8.3.2(3))", units.Ratio(kb)))
	if c.Along == SpringTop {
		common = append(common, check.Of("K_top,y", "lateral stiffness holding the top along the bridge (N/m)", units.LoadPerLength(c.AlongSpring)),
			check.Of("s_top,y", "relative stiffness of the top spring along, K l³/EI per leg", units.Ratio(sy)))
	}
	if c.Across == SpringTop {
		common = append(common, check.Of("K_top,z", "lateral stiffness holding the top across the bridge (N/m)", units.LoadPerLength(c.AcrossSpring)),
			check.Of("s_top,z", "relative stiffness of the top spring across, K l³/EI", units.Ratio(sz)))
	}
	common = append(common, frameVals...)
	dir := func(name string, cc tubeCaps, l0, m, kk float64, sym string) check.Result {
		u, _, _ := interaction(pick(sym == "y", m, 0), pick(sym == "z", m, 0))
		return check.Compare("tower.column_section", "Column section, axial force and bending", units.KindRatio, u, 1).
			WithBasis(basis).WithValues(common...).WithValues(
			check.Of("l0_"+sym, "effective length "+name, units.Length(l0)),
			check.Of("λ̄_"+sym, "non-dimensional slenderness "+name, units.Ratio(cc.lam)),
			check.Of("χ_"+sym, "buckling reduction factor "+name+" (6.3.1.2)", units.Ratio(cc.chi)),
			check.Of("N_b,Rd,"+sym, "buckling resistance "+name+" χ A f_y/γM1", units.Force(cc.pc)),
			check.Of("M_"+sym+",Ed", "design moment "+name, units.Moment(m)),
			check.Of("k_"+sym+sym, "interaction factor (Annex B)", units.Ratio(kk)),
			check.Of("class", "section class (Table 5.2)", units.Ratio(cy.class)),
		).WithNote(fmt.Sprintf("section class %d", cy.class))
	}
	along := dir("along the bridge", cy, l0y, my, kyy, "y")
	across := dir("across the bridge", cz, l0z, mz, kzz, "z")
	u, e661, e662 := interaction(my, mz)
	both := check.Compare("tower.column_biaxial", "Column section, biaxial bending", units.KindRatio, u, 1).
		WithBasis(basis).WithValues(common...).WithValues(
		check.Of("χ_y", "buckling reduction factor along the bridge", units.Ratio(cy.chi)),
		check.Of("χ_z", "buckling reduction factor across the bridge", units.Ratio(cz.chi)),
		check.Of("k_yy", "interaction factor", units.Ratio(kyy)), check.Of("k_yz", "interaction factor", units.Ratio(kyz)),
		check.Of("k_zy", "interaction factor", units.Ratio(kzy)), check.Of("k_zz", "interaction factor", units.Ratio(kzz)),
		check.Of("u_6.61", "utilisation by eq. 6.61", units.Ratio(e661)),
		check.Of("u_6.62", "utilisation by eq. 6.62", units.Ratio(e662)),
		check.Of("u_cs", "cross-section utilisation 6.2.1(7)", units.Ratio(cross)),
		check.Of("class", "section class (Table 5.2)", units.Ratio(cy.class)),
	)
	return ColumnResults{Along: along, Across: across, Both: both}, nil
}
