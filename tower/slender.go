package tower

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Restraint is how a tower column's top is held in one direction, which
// with the flexibility of its base sets its effective (buckling) length l0
// (see EffectiveLengthFactor).
type Restraint int

// The restraints.
const (
	// FreeTop: nothing holds the top against sway; the column is a
	// cantilever on its base, l0 = 2 l on a rigid base (EN 1992-1-1:2004
	// 5.8.3.2, Figure 5.7 b), 2.20 l on the default base flexibility. A
	// roller or sliding saddle gives no top restraint along the bridge, and
	// no saddle holds the top across it.
	FreeTop Restraint = iota
	// HeldTop: the top is held rigidly against sway but free to rotate,
	// l0 = 0.70 l on a rigid base (Figure 5.7 c), 0.76 l on the default
	// base flexibility: a top braced by a structure much stiffer than the
	// column.
	HeldTop
	// SpringTop: the top is held against sway by a spring of the stiffness
	// the column is given (RCColumn.AlongSpring, SteelColumn.AlongSpring),
	// free to rotate: a fixed saddle with the rope clamped, held by the
	// stretch of its backstays. l0 lies between the HeldTop and FreeTop
	// values.
	SpringTop
)

// Factor returns l0/l on a base of DefaultBaseFlexibility: 2.20 for
// FreeTop, 0.76 for HeldTop, and for SpringTop, whose spring it does not
// know, the FreeTop value.
func (r Restraint) Factor() float64 {
	s := 0.0
	if r == HeldTop {
		s = math.Inf(1)
	}
	f, _ := EffectiveLengthFactor(DefaultBaseFlexibility, s)
	return f
}

// String names the restraint.
func (r Restraint) String() string {
	switch r {
	case HeldTop:
		return "top held rigidly against sway"
	case SpringTop:
		return "top held against sway by the ropes' stretch (a spring)"
	}
	return "top free (cantilever)"
}

// valid reports whether r is one of the restraints.
func (r Restraint) valid() bool { return r == FreeTop || r == HeldTop || r == SpringTop }

// effectiveLength returns l0 for a column of length l and stiffness ei
// restrained at its top by r (with lateral stiffness spring, N/m, for
// SpringTop) on a base of flexibility k, and the relative top stiffness
// s = K l³/EI used.
func effectiveLength(r Restraint, l, k, spring, ei float64, known lengthFactor) (l0, s float64, err error) {
	s = topStiffness(r, l, spring, ei)
	f, err := known.factor(k, s)
	return f * l, s, err
}

// topStiffness returns the relative stiffness s = K l³/EI of the top's
// restraint r: 0 free, +Inf held.
func topStiffness(r Restraint, l, spring, ei float64) float64 {
	switch r {
	case HeldTop:
		return math.Inf(1)
	case SpringTop:
		return spring * l * l * l / ei
	}
	return 0
}

// lengthFactor is EffectiveLengthFactor(k, s) worked out beforehand
// (RCColumn.WithLengths), used when asked for the same k and s.
type lengthFactor struct {
	k, s, f float64
	ok      bool
}

func (lf lengthFactor) factor(k, s float64) (float64, error) {
	if lf.ok && lf.k == k && lf.s == s {
		return lf.f, nil
	}
	return EffectiveLengthFactor(k, s)
}

// lengthBasis describes the effective length in words for a result's basis.
func lengthBasis(r Restraint, k float64) string {
	b := fmt.Sprintf("%s, base flexibility k %.3g (EN 1992-1-1:2004 5.8.3.2(3)", r, k)
	if k == DefaultBaseFlexibility {
		b += ", the recommended minimum: a footing is never rigid"
	}
	b += "), l0 from the column on elastic end restraints (Timoshenko & Gere ch. 2)"
	if r == SpringTop {
		b += "; the ropes' spring counts the backstays' stretch only, with the column's largest nominal stiffness (conservative)"
	}
	return b
}

// ColumnActions are the design actions on a tower column at its base
// section: axial force N (compression positive) and the first-order
// moments about the base from the forces along the bridge (Along, positive
// turning the column toward the span) and across it (Across, positive
// downwind). The quasi-permanent actions (the permanent load alone), when
// given, set the effective creep ratio; all zero means they are taken as
// equal to the design actions (conservative).
type ColumnActions struct {
	N             units.Force
	Along, Across units.Moment
	// Quasi-permanent actions for creep (EN 1992-1-1 5.8.4(2)).
	NQP               units.Force
	AlongQP, AcrossQP units.Moment
}

func (a ColumnActions) validate() error {
	for _, f := range []struct {
		n string
		v float64
	}{{"ColumnActions.N", float64(a.N)}, {"ColumnActions.Along", float64(a.Along)}, {"ColumnActions.Across", float64(a.Across)},
		{"ColumnActions.NQP", float64(a.NQP)}, {"ColumnActions.AlongQP", float64(a.AlongQP)}, {"ColumnActions.AcrossQP", float64(a.AcrossQP)}} {
		if !finite(f.v) {
			return invalid(f.n, f.v, "must be finite")
		}
	}
	return nil
}

// DefaultCreep is the creep coefficient φ(∞, t0) used when RCColumn.Creep
// is zero: 2.0, a column of a few hundred millimetres outdoors, loaded at
// about 28 days (EN 1992-1-1:2004 3.1.4, Figure 3.1, from memory; common
// practice). A larger value is conservative for slender columns.
const DefaultCreep = 2.0

// RCColumn is a reinforced or plain concrete tower column checked to
// EN 1992-1-1 for axial force and bending in both directions with
// second-order effects: slenderness (5.8.3), imperfection (5.2), minimum
// eccentricity (6.1(4)), the nominal-stiffness method (5.8.7) for
// second-order moments and the biaxial rule (5.8.9); plain columns by the
// simplified method of 12.6.5.2.
type RCColumn struct {
	// Section is the effective section with H along the bridge and B
	// across it; its Code must be EN1992.
	Section RCSection
	// Length is the column length l from the base section to its top.
	Length units.Length
	// Along and Across are the restraints of the top in each direction.
	Along, Across Restraint
	// AlongSpring and AcrossSpring are the lateral stiffnesses, in N/m, of
	// what holds the top in that direction when its restraint is SpringTop.
	AlongSpring, AcrossSpring float64
	// BaseFlexibility is the relative flexibility k = (θ/M)(EI/l) of the
	// base's rotational restraint (EN 1992-1-1:2004 5.8.3.2(3)); zero means
	// DefaultBaseFlexibility.
	BaseFlexibility float64
	// Creep is the creep coefficient φ(∞, t0); zero means DefaultCreep.
	// The effective creep ratio is φ_ef = φ(∞, t0) · M_0Eqp / M_0Ed (5.19).
	Creep float64
	// Ecm is the secant modulus of the concrete; zero means EN 1992-1-1
	// Table 3.1: Ecm = 22 (fcm/10)^0.3 GPa, fcm = fck + 8 MPa.
	Ecm units.Pressure

	// Terse leaves the basis, values and notes out of the results, for a
	// search that only scores them: their demands, capacities, ratios and
	// statuses are the same.
	Terse bool

	lengths [2]lengthFactor // along, across: see WithLengths
}

// WithLengths returns c with the effective-length factor of each direction
// (EffectiveLengthFactor), which depends on the section, length,
// restraints and base only, worked out once, so that many checks of one
// column under different actions (a search) do not solve for it each
// time; Check gives the same results, bit for bit. Changing a field of the
// column afterwards is safe: a factor is used only for the k and s it was
// worked out for.
func (c RCColumn) WithLengths() (RCColumn, error) {
	if err := c.validate(); err != nil {
		return c, err
	}
	for k := range c.lengths {
		d := c.direction(k)
		_, _, _, _, eiMax := d.stiffness(d.sec.model(false))
		s := topStiffness(d.restraint, d.length, d.spring, eiMax)
		f, err := EffectiveLengthFactor(d.k, s)
		if err != nil {
			return c, err
		}
		c.lengths[k] = lengthFactor{k: d.k, s: s, f: f, ok: true}
	}
	return c, nil
}

// direction returns direction k of the column (0 along the bridge, 1
// across it), without its actions.
func (c RCColumn) direction(k int) direction {
	ecm := float64(c.Ecm)
	if ecm == 0 {
		ecm = float64(ModulusEN1992(c.Section.Fc))
	}
	d := direction{name: "along the bridge", sec: c.Section, restraint: c.Along, spring: c.AlongSpring}
	if k == 1 {
		d = direction{name: "across the bridge", sec: c.Section.Turned(), restraint: c.Across, spring: c.AcrossSpring}
	}
	d.ecm, d.length, d.k, d.lengths, d.terse = ecm, float64(c.Length), baseFlexibility(c.BaseFlexibility), c.lengths[k], c.Terse
	return d
}

// more returns vals with v appended, or nil on a terse column.
func (d *direction) more(vals []check.Value, v ...check.Value) []check.Value {
	if d.terse {
		return nil
	}
	if vals == nil {
		vals = make([]check.Value, 0, 32) // room for every value of a direction
	}
	return append(vals, v...)
}

// dress returns r with its basis, values and note (if any), or r alone on
// a terse column.
func (d *direction) dress(r check.Result, basis string, vals []check.Value, note func() string) check.Result {
	if d.terse {
		return r
	}
	r = r.WithBasis(basis).WithValues(vals...)
	if note != nil {
		r = r.WithNote(note())
	}
	return r
}

func (c RCColumn) validate() error {
	if err := c.Section.validate(); err != nil {
		return err
	}
	if c.Section.Code != EN1992 {
		return invalid("RCColumn.Section.Code", c.Section.Code, "must be EN1992: the slenderness checks are those of EN 1992-1-1")
	}
	if err := positive("RCColumn.Length", c.Length); err != nil {
		return err
	}
	if err := validRestraints("RCColumn", c.Along, c.Across, c.AlongSpring, c.AcrossSpring, c.BaseFlexibility); err != nil {
		return err
	}
	if err := nonNegative("RCColumn.Creep", units.Ratio(c.Creep)); err != nil {
		return err
	}
	if c.Creep > 10 {
		return invalid("RCColumn.Creep", c.Creep, "is beyond any creep coefficient of EN 1992-1-1 Figure 3.1")
	}
	return nonNegative("RCColumn.Ecm", c.Ecm)
}

// validRestraints checks the restraints, springs and base flexibility of a
// column.
func validRestraints(name string, along, across Restraint, alongSpring, acrossSpring, k float64) error {
	// The names are built only for an error: this runs for every check.
	for i, r := range [2]struct {
		r Restraint
		k float64
	}{{along, alongSpring}, {across, acrossSpring}} {
		if r.r.valid() && r.k >= 0 && !math.IsInf(r.k, 0) {
			continue
		}
		n := name + [2]string{".Along", ".Across"}[i]
		if !r.r.valid() {
			return invalid(n, int(r.r), "is not FreeTop, HeldTop or SpringTop")
		}
		if err := nonNegative(n+"Spring", units.Ratio(r.k)); err != nil {
			return err
		}
	}
	if !(k >= 0 && !math.IsInf(k, 0)) {
		if err := nonNegative(name+".BaseFlexibility", units.Ratio(k)); err != nil {
			return err
		}
	}
	if k > 100 {
		return invalid(name+".BaseFlexibility", k, "is beyond any base that holds a column (at most 100)")
	}
	return nil
}

// baseFlexibility returns k, or DefaultBaseFlexibility when it is zero.
func baseFlexibility(k float64) float64 {
	if k == 0 {
		return DefaultBaseFlexibility
	}
	return k
}

// ModulusEN1992 returns the secant modulus of elasticity of concrete of
// characteristic strength fck (EN 1992-1-1:2004 Table 3.1):
//
//	Ecm = 22 (fcm/10)^0.3 GPa,   fcm = fck + 8 MPa
func ModulusEN1992(fck units.Pressure) units.Pressure {
	fcm := float64(fck)/1e6 + 8
	return units.Pressure(22e9 * math.Pow(fcm/10, 0.3))
}

// ColumnResults are the results of a column member check: one for each
// direction and one for both at once.
type ColumnResults struct {
	Along, Across, Both check.Result
}

// direction is one direction of an RCColumn check.
type direction struct {
	name        string // "along the bridge"
	sec         RCSection
	restraint   Restraint
	spring, k   float64 // top spring (N/m) for SpringTop; base flexibility
	m, mqp      float64 // first-order design and quasi-permanent moments
	nEd, nQP    float64
	phiInf      float64
	ecm, length float64
	lengths     lengthFactor // worked out beforehand, if at all
	terse       bool         // no basis, values or notes
}

// columnDirection is the outcome of one direction.
type columnDirection struct {
	result   check.Result
	mEd      float64 // design moment with second-order effects (magnitude)
	mRd      float64 // moment resistance at N_Ed
	unstable bool
}

// Check checks the column under design actions a and returns three results:
//
//	Along   tower.column_section  along the bridge (bending in the plane of the ropes)
//	Across  tower.column_section  across the bridge
//	Both    tower.column_biaxial  both at once (5.8.9(4))
//
// In each direction, with h the section's dimension in that direction,
// b the other, l0 from the top's Restraint and the base flexibility k
// (EffectiveLengthFactor; for SpringTop the spring's share is taken against
// the largest nominal stiffness, k2 = 0.20 and φ_ef = 0, which gives the
// longest l0), i = h/√12:
//
//	λ = l0 / i,   n = N_Ed/(A_c f_cd),   ω = A_s f_yd/(A_c f_cd)
//	λ_lim = 20 A B C / √n,   A = 1/(1 + 0.2 φ_ef),  B = √(1 + 2ω),  C = 0.7     (5.8.3.1)
//	e_i = θ_i l0/2,  θ_i = θ0 α_h α_m,  θ0 = 1/200,  α_h = 2/√l ∈ [2/3, 1],  α_m = 1   (5.2(5), (7))
//	M_0Ed = max(|M_0| + N_Ed e_i,  N_Ed e_0),  e_0 = max(h/30, 20 mm)       (6.1(4))
//
// and when λ > λ_lim the nominal-stiffness method (5.8.7):
//
//	EI = K_c E_cd I_c + K_s E_s I_s,  E_cd = E_cm/1.2,  K_s = 1,
//	K_c = k1 k2/(1 + φ_ef),  k1 = √(f_ck/20),  k2 = n λ/170 ≤ 0.20         (5.21–5.24)
//	N_B = π² EI / l0²
//	M_Ed = M_0Ed [1 + β/(N_B/N_Ed − 1)],  β = π²/c0,  c0 = 8                (5.28)
//
// c0 = 8 is the value for a constant first-order moment, the largest β the
// clause gives (conservative for the triangular moment of a force at the
// top). N_Ed ≥ N_B fails: the column buckles. φ_ef = φ(∞,t0)·M_0Eqp/M_0Ed
// (5.19) with the quasi-permanent moment built as M_0Ed from the
// quasi-permanent actions, and no cap: φ_ef exceeds φ(∞,t0) where the
// permanent actions bend the column more than the design case does. The imperfection is applied in both directions
// (5.8.9(2) allows the more unfavourable one only: conservative). The
// section resistance M_Rd(N_Ed) is RCSection.MomentCapacity's, and N_Ed
// beyond the section's axial resistance fails on force.
//
// Biaxial bending (5.8.9(4), eq. 5.39):
//
//	(M_Ed,along/M_Rd,along)^a + (M_Ed,across/M_Rd,across)^a ≤ 1
//
// a = 1 for N_Ed/N_Rd ≤ 0.1, 1.5 at 0.7, 2 at 1.0, linear between,
// N_Rd = A_c f_cd + A_s f_yd; the clause's exemption for eccentricities
// mostly in one direction (5.38) is not used (conservative).
//
// A plain section (ρ = A_s/A_c < 0.002, where 5.8.7.2 does not apply) is
// checked by 12.6.5.2 instead: N_Rd = b h f_cd,pl Φ,
// Φ = 1.14 (1 − 2e_tot/h) − 0.02 l0/h ≤ 1 − 2e_tot/h, e_tot = e_0 + e_i with
// e_0 = M_0/N_Ed, and l0/h ≤ 25 (12.6.5.1, from memory).
//
// Special cases: a section not to EN 1992, a non-positive length, or
// non-finite actions give ErrInvalid; N_Ed ≤ 0 (tension) checks the
// section alone (no second-order effects).
func (c RCColumn) Check(a ColumnActions) (ColumnResults, error) {
	if err := c.validate(); err != nil {
		return ColumnResults{}, err
	}
	if err := a.validate(); err != nil {
		return ColumnResults{}, err
	}
	phiInf := c.Creep
	if phiInf == 0 {
		phiInf = DefaultCreep
	}
	nqp := a.NQP
	alongQP, acrossQP := a.AlongQP, a.AcrossQP
	if nqp == 0 && alongQP == 0 && acrossQP == 0 {
		nqp, alongQP, acrossQP = a.N, a.Along, a.Across
	}
	dirs := [2]direction{c.direction(0), c.direction(1)}
	dirs[0].m, dirs[0].mqp = float64(a.Along), float64(alongQP)
	dirs[1].m, dirs[1].mqp = float64(a.Across), float64(acrossQP)
	var out [2]columnDirection
	for k := range dirs {
		d := &dirs[k]
		d.nEd, d.nQP, d.phiInf = float64(a.N), float64(nqp), phiInf
		r, err := d.check()
		if err != nil {
			return ColumnResults{}, err
		}
		out[k] = r
	}
	// Biaxial bending.
	md := c.Section.model(false)
	nrd := md.sigma*md.b*md.h + md.fy*md.as
	ratio := float64(a.N) / nrd
	ex := 1.0
	switch {
	case ratio >= 1:
		ex = 2
	case ratio > 0.7:
		ex = 1.5 + (ratio-0.7)/0.3*0.5
	case ratio > 0.1:
		ex = 1 + (ratio-0.1)/0.6*0.5
	}
	evaluated := !out[0].unstable && !out[1].unstable && out[0].mRd > 0 && out[1].mRd > 0 &&
		out[0].result.Kind == units.KindMoment && out[1].result.Kind == units.KindMoment
	var bi check.Result
	if evaluated {
		u := math.Pow(out[0].mEd/out[0].mRd, ex) + math.Pow(out[1].mEd/out[1].mRd, ex)
		bi = check.Compare("tower.column_biaxial", "Column section, biaxial bending", units.KindRatio, u, 1)
	} else {
		// A direction fails on its own terms (or is plain concrete): the
		// biaxial row repeats the worse direction's demand and capacity.
		gov := out[0].result
		if check.Worse(out[1].result, gov) {
			gov = out[1].result
		}
		bi = gov
		bi.ID, bi.Title, bi.Values, bi.Notes = "tower.column_biaxial", "Column section, biaxial bending", nil, nil
	}
	if c.Terse {
		return ColumnResults{Along: out[0].result, Across: out[1].result, Both: bi}, nil
	}
	bi = bi.WithBasis("EN 1992-1-1:2004 5.8.9(4) eq. 5.39, exponent a by N_Ed/N_Rd; design moments with imperfection, minimum eccentricity and second-order effects in each direction").
		WithValues(
			check.Of("N_Ed", "design axial force", a.N),
			check.Of("N_Rd", "axial resistance A_c f_cd + A_s f_yd", units.Force(nrd)),
			check.Of("a", "exponent of the biaxial rule", units.Ratio(ex)),
			check.Of("M_Ed,along", "design moment along the bridge", units.Moment(out[0].mEd)),
			check.Of("M_Rd,along", "moment resistance along the bridge at N_Ed", units.Moment(out[0].mRd)),
			check.Of("M_Ed,across", "design moment across the bridge", units.Moment(out[1].mEd)),
			check.Of("M_Rd,across", "moment resistance across the bridge at N_Ed", units.Moment(out[1].mRd)),
		)
	if !evaluated {
		bi = bi.WithNote("the biaxial rule is not evaluated: a direction is governed by axial force, buckling or the plain-concrete rule, and its demand and capacity are shown")
	}
	return ColumnResults{Along: out[0].result, Across: out[1].result, Both: bi}, nil
}

// stiffness returns the terms of the largest nominal stiffness the column
// can have (k2 = 0.20, no creep, 5.8.7.2), against which the top spring
// counts (the longest l0): E_cd, I_c, I_s, k1 and EI_max.
func (d *direction) stiffness(md rcModel) (ecd, ic, is, k1, eiMax float64) {
	h, b := md.h, md.b
	ecd = d.ecm / 1.2
	ic = b * h * h * h / 12
	for _, l := range md.layers() {
		is += l.area * (l.depth - h/2) * (l.depth - h/2)
	}
	k1 = math.Sqrt(float64(d.sec.Fc) / 1e6 / 20)
	eiMax = k1*0.20*ecd*ic + md.es*is
	return ecd, ic, is, k1, eiMax
}

// check checks one direction.
func (d *direction) check() (columnDirection, error) {
	const id, title = "tower.column_section", "Column section, axial force and bending"
	sec := d.sec
	md := sec.model(d.m < 0)
	h, b, l := md.h, md.b, d.length
	ecd, ic, is, k1, eiMax := d.stiffness(md)
	l0, sTop, err := effectiveLength(d.restraint, l, d.k, d.spring, eiMax, d.lengths)
	if err != nil {
		return columnDirection{}, err
	}
	i := h / math.Sqrt(12)
	lam := l0 / i
	fcd := md.sigma // η fcd (η = 1 up to C50/60)
	ac := b * h
	n := d.nEd / (ac * fcd)
	omega := md.fy * md.as / (ac * fcd)
	alphaH := math.Max(2.0/3, math.Min(1, 2/math.Sqrt(l)))
	thetaI := alphaH / 200
	ei := thetaI * l0 / 2
	e0 := math.Max(h/30, 0.020)
	m0 := func(nn, mm float64) float64 {
		if nn <= 0 {
			return math.Abs(mm)
		}
		return math.Max(math.Abs(mm)+nn*ei, nn*e0)
	}
	m0Ed, m0qp := m0(d.nEd, d.m), m0(d.nQP, d.mqp)
	phiEf := d.phiInf
	if m0Ed > 0 && d.nEd > 0 {
		// Eq. 5.19, no cap: a permanent moment larger than the design one
		// locks in more creep than φ(∞,t0) times the design moment.
		phiEf = math.Min(d.phiInf*m0qp/m0Ed, math.MaxFloat64)
	}
	aa := 1 / (1 + 0.2*phiEf)
	bb := math.Sqrt(1 + 2*omega)
	const cc = 0.7
	lamLim := math.Inf(1)
	if n > 0 {
		lamLim = 20 * aa * bb * cc / math.Sqrt(n)
	}
	comp, tens := md.limits()
	vals := d.more(nil,
		check.Of("N_Ed", "design axial force (compression +)", units.Force(d.nEd)),
		check.Of("M_0", "first-order design moment from the applied forces", units.Moment(d.m)),
		check.Of("l0", "effective length, "+d.restraint.String(), units.Length(l0)),
		check.Of("k_base", "relative flexibility of the base restraint (5.8.3.2(3))", units.Ratio(d.k)),
		check.Of("λ", "slenderness l0/i", units.Ratio(lam)),
		check.Of("n", "relative axial force N_Ed/(A_c f_cd)", units.Ratio(n)),
		check.Of("ω", "mechanical reinforcement ratio A_s f_yd/(A_c f_cd)", units.Ratio(omega)),
		check.Of("M_0Eqp", "first-order quasi-permanent moment with imperfection, for creep", units.Moment(m0qp)),
		check.Of("φ_ef", "effective creep ratio φ(∞,t0) M_0Eqp/M_0Ed (5.19)", units.Ratio(phiEf)),
		check.Of("A_λ", "factor 1/(1 + 0.2 φ_ef) of the slenderness limit", units.Ratio(aa)),
		check.Of("B_λ", "factor √(1 + 2ω) of the slenderness limit", units.Ratio(bb)),
		check.Of("C_λ", "factor of the slenderness limit, 0.7 (unbraced, or moments from transverse load)", units.Ratio(cc)),
		check.Of("θ_i", "inclination of the geometric imperfection θ0 α_h (5.2(5)), θ0 1/200", units.Ratio(thetaI)),
		check.Of("e_i", "eccentricity of the geometric imperfection θ_i l0/2 (5.2)", units.Length(ei)),
		check.Of("e_0", "minimum eccentricity max(h/30, 20 mm) (6.1(4))", units.Length(e0)),
		check.Of("M_0Ed", "first-order design moment with imperfection, at least N_Ed e_0", units.Moment(m0Ed)),
		check.Of("N_Rd", "axial resistance of the section in compression", units.Force(comp)),
	)
	if d.restraint == SpringTop {
		vals = d.more(vals,
			check.Of("K_top", "lateral stiffness holding the top (a force per metre of sway)", units.LoadPerLength(d.spring)),
			check.Of("EI_max/l³", "the column's stiffness scale from its largest nominal stiffness EI_max (k2 0.20, no creep, 5.8.7.2)", units.LoadPerLength(eiMax/(l*l*l))),
			check.Of("s_top", "relative stiffness of the top spring K l³/EI_max", units.Ratio(sTop)))
	}
	if n > 0 { // in tension there is no slenderness limit
		vals = d.more(vals, check.Of("λ_lim", "slenderness limit 20·A·B·C/√n (5.8.3.1)", units.Ratio(lamLim)))
	}
	var basis string
	if !d.terse {
		basis = "EN 1992-1-1:2004, " + d.name + ": slenderness 5.8.3.1 (C 0.7), imperfection 5.2, minimum eccentricity 6.1(4), " +
			"second-order moments by the nominal-stiffness method 5.8.7 (c0 8), section 3.1.7(3)/6.1 stress block; " + lengthBasis(d.restraint, d.k)
	}
	var out columnDirection
	if d.nEd > comp || d.nEd < tens {
		r := d.dress(check.Compare(id, title, units.KindForce, math.Abs(d.nEd), math.Abs(pick(d.nEd > 0, comp, tens))),
			basis, vals, func() string { return "the axial force alone exceeds the section's axial resistance" })
		// No moment is left to the section: unbounded, as M_Rd → 0 gives
		// just short of this force.
		r.Ratio, r.Status = math.Inf(1), check.Fail
		out.result = r
		return out, nil
	}
	plain := md.as < 0.002*ac
	mEd := m0Ed
	second := d.nEd > 0 && lam > lamLim
	switch {
	case plain && d.nEd > 0:
		return d.plainCheck(md, l0, ei, e0, vals)
	case second:
		k2 := math.Min(0.20, n*lam/170)
		kc := k1 * k2 / (1 + phiEf)
		ei2 := kc*ecd*ic + md.es*is
		nb := math.Pi * math.Pi * ei2 / (l0 * l0)
		beta := math.Pi * math.Pi / 8
		vals = d.more(vals,
			check.Of("k1", "factor √(f_ck/20) (5.23)", units.Ratio(k1)),
			check.Of("k2", "factor n λ/170 ≤ 0.20 (5.24)", units.Ratio(k2)),
			check.Of("K_c", "factor for cracking and creep k1 k2/(1 + φ_ef) (5.22)", units.Ratio(kc)),
			check.Of("E_cd", "design modulus of the concrete E_cm/1.2 (5.8.6(3))", units.Pressure(ecd)),
			check.Of("N_B", "buckling load π² EI / l0², EI = K_c E_cd I_c + E_s I_s (5.21)", units.Force(nb)),
		)
		if d.nEd >= nb {
			// The second-order moment grows without bound as N_Ed nears N_B,
			// so the utilisation is unbounded at and beyond it: the ratio is
			// +Inf, never a finite N_Ed/N_B that would read as less used than
			// a column just short of buckling.
			r := d.dress(check.Compare(id, title, units.KindForce, d.nEd, nb), basis, vals, func() string {
				return fmt.Sprintf("the column buckles %s: N_Ed %v reaches the buckling load N_B %v of the nominal-stiffness method",
					d.name, units.Force(d.nEd), units.Force(nb))
			})
			r.Ratio, r.Status = math.Inf(1), check.Fail
			out.result = r
			out.unstable = true
			return out, nil
		}
		mEd = m0Ed * (1 + beta/(nb/d.nEd-1))
		vals = d.more(vals, check.Of("M_2", "second-order moment M_Ed − M_0Ed", units.Moment(mEd-m0Ed)))
	}
	mRd, found := md.momentAt(d.nEd)
	if !found {
		return out, fmt.Errorf("tower: axial force %v not reached on the interaction curve: %w", units.Force(d.nEd), ErrUnsupported)
	}
	vals = d.more(vals,
		check.Of("M_Ed", "design moment with second-order effects", units.Moment(mEd)),
		check.Of("M_Rd", "moment resistance at N_Ed", units.Moment(mRd)))
	r := d.dress(check.Compare(id, title, units.KindMoment, mEd, mRd), basis, vals, func() string {
		switch {
		case d.nEd <= 0:
			return "no compression: the section alone is checked, with no second-order effects"
		case second:
			return fmt.Sprintf("slender %s (λ %.0f > λ_lim %.0f): second-order moment added", d.name, lam, lamLim)
		}
		return fmt.Sprintf("not slender %s (λ %.0f ≤ λ_lim %.0f): second-order effects may be ignored (5.8.2(6))", d.name, lam, lamLim)
	})
	out.result, out.mEd, out.mRd = r, mEd, mRd
	return out, nil
}

// plainCheck is the simplified method of EN 1992-1-1 12.6.5.2 for a plain
// (or lightly reinforced, ρ < 0.002) column in compression.
func (d *direction) plainCheck(md rcModel, l0, ei, e0 float64, vals []check.Value) (columnDirection, error) {
	const id, title = "tower.column_section", "Column section, axial force and bending"
	h, b := md.h, md.b
	fcdpl := md.sigma // η αcc,pl fck/γc when the section has no bars
	if md.as > 0 {
		// A lightly reinforced section is checked as plain, with αcc,pl.
		fcdpl *= 0.8
	}
	eFirst := math.Max(math.Abs(d.m)/d.nEd, e0)
	etot := eFirst + ei
	phi := math.Min(1.14*(1-2*etot/h)-0.02*l0/h, 1-2*etot/h)
	nrd := math.Max(0, b*h*fcdpl*phi)
	vals = d.more(vals,
		check.Of("f_cd,pl", "design strength of plain concrete α_cc,pl f_ck/γ_c (12.3.1)", units.Pressure(fcdpl)),
		check.Of("e_tot", "total eccentricity e_0 + e_i (12.6.5.2)", units.Length(etot)),
		check.Of("Φ", "factor for eccentricity and slenderness (12.11)", units.Ratio(phi)),
		check.Of("N_Rd,pl", "resistance of the plain column (12.10)", units.Force(nrd)))
	var basis string
	if !d.terse {
		basis = "EN 1992-1-1:2004 12.6.5.2 simplified method for plain concrete columns, " + d.name +
			" (ρ < 0.002: the nominal-stiffness method of 5.8.7 does not apply), from memory; " + lengthBasis(d.restraint, d.k)
	}
	r := d.dress(check.Compare(id, title, units.KindForce, d.nEd, nrd), basis, vals, nil)
	var out columnDirection
	if l0/h > 25 {
		r = d.dress(check.Compare(id, title, units.KindRatio, l0/h, 25), basis, vals, func() string {
			return "a plain concrete column this slender (l0/h above 25, 12.6.5.1) is not allowed"
		})
		out.unstable = true
	}
	out.result = r
	// For the biaxial rule a plain column's moment terms are its eccentric
	// resistance: M_Ed = N_Ed e_tot against M_Rd = N_Rd e_tot.
	out.mEd, out.mRd = d.nEd*etot, nrd*etot
	return out, nil
}

// pick returns a when c holds, else b.
func pick(c bool, a, b float64) float64 {
	if c {
		return a
	}
	return b
}
