package tower

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// EccentricityLimit sets the allowed eccentricity of the resultant at the
// checked section. A nil *EccentricityLimit means the kern.
//
//	e_allowed = Fraction · d_eff/2 + Offset
//
// The kern of a rectangle (no tension anywhere on the section) is
// Fraction = 1/3, Offset = 0, i.e. d_eff/6. "Within the effective section"
// is Fraction = 1, with Offset the projection of a base beyond the column
// face. d_eff is the effective dimension in the direction checked (facing
// excluded); no factor of safety is applied.
type EccentricityLimit struct {
	// Fraction of the half effective depth d_eff/2; zero means 1/3 (the kern).
	Fraction float64
	// Offset added to the limit, for instance a base plinth projecting
	// beyond the column face; may be negative to tighten the limit.
	Offset units.Length
}

// allowed returns the allowed eccentricity and a description of the rule.
func (l *EccentricityLimit) allowed(deff units.Length, d string) (units.Length, string, error) {
	if l == nil {
		return deff / 6, "kern of the effective section, " + d + "/6 (no tension on the section)", nil
	}
	f := l.Fraction
	if f == 0 {
		f = 1.0 / 3
	}
	if !finite(f) || f < 0 || f > 1 {
		return 0, "", invalid("EccentricityLimit.Fraction", l.Fraction, "must lie between 0 and 1")
	}
	if err := isFinite("EccentricityLimit.Offset", l.Offset); err != nil {
		return 0, "", err
	}
	a := units.Length(f)*deff/2 + l.Offset
	if a <= 0 {
		return 0, "", invalid("EccentricityLimit", *l, "gives an allowed eccentricity of zero or less")
	}
	switch {
	case f == 1 && l.Offset == 0:
		return a, "within the effective section, " + d + "/2", nil
	case f == 1:
		return a, fmt.Sprintf("within the effective section, %s/2 + %v (projecting base)", d, l.Offset), nil
	case f == 1.0/3 && l.Offset == 0:
		return a, "kern of the effective section, " + d + "/6 (no tension on the section)", nil
	}
	return a, fmt.Sprintf("user limit %.3g × %s/2 + %v", f, d, l.Offset), nil
}

// EccentricityForm says how the eccentricity of the resultant is worked out.
type EccentricityForm int

// The forms.
const (
	// RopeLine is the form practice uses: the line of action of the rope
	// forces alone (the column's own weight does not pull it back), where
	// it crosses the checked section, e = h·tan δ.
	RopeLine EccentricityForm = iota
	// Statics is ΣM/ΣV at the checked section with the weight of the
	// column above it on the axis.
	Statics
)

// String returns "rope line" or "statics".
func (f EccentricityForm) String() string {
	switch f {
	case RopeLine:
		return "rope line"
	case Statics:
		return "statics"
	}
	return fmt.Sprintf("EccentricityForm(%d)", int(f))
}

// Direction is the direction an eccentricity check looks in.
type Direction int

// The directions.
const (
	// Along the bridge: the rope forces' horizontal components and the
	// saddles' offsets and travel, against the effective depth.
	Along Direction = iota
	// Across the bridge: the lateral forces (wind on the swung ropes and on
	// the column), against the effective width.
	Across
)

// Eccentricity sets how EccentricityCheck works. A nil *Eccentricity means
// the defaults: the rope-line form, along the bridge, at the column base
// section, against the kern.
type Eccentricity struct {
	// Form is RopeLine (default) or Statics; the other form's value is
	// always reported beside it.
	Form EccentricityForm
	// Direction is Along (default) or Across.
	Direction Direction
	// Section is the height of the checked section above the column base
	// section: where the column is first tied into its base (where its
	// continuous reinforcement starts, say). Zero means the base section.
	// It must lie below the lowest saddle.
	Section units.Length
	// Limit is the allowed eccentricity; nil means the kern.
	Limit *EccentricityLimit
	// Terse leaves the basis, values and notes out of the result, for a
	// search that only scores results: its demand, capacity, ratio and
	// status are the same.
	Terse bool
}

// EccentricityCheck checks where the resultant crosses the checked section
// at height y_c above the column base, against an allowed limit, with no
// factor of safety.
//
// Rope-line form (default, the form practice uses): the rope forces alone,
// ΣV (down) and ΣH, with moment M about the base-section point on the
// column axis (see Combine), have a line of action inclined at
//
//	δ = atan(ΣH / ΣV)
//
// from the vertical; it crosses the column axis at height y_R = M/ΣH and
// the checked section at
//
//	e = h · tan δ = (M − ΣH·y_c) / ΣV,   h = y_R − y_c
//
// For one saddle on the axis, h is the height of the saddle above the
// checked section. A saddle off the axis (a sliding or roller saddle that
// has travelled) moves the line by its offset: with ΣH = 0 the line is
// vertical at e = Σ V_i o_i / ΣV.
//
// Statics form: the weight W of the column above the checked section (on
// its axis, from Column.Weight pro rata of height) joins the rope forces:
//
//	e_s = (M − ΣH·y_c) / (ΣV + W)
//
// It is smaller than the rope-line e whenever W > 0 (the weight pulls the
// line back toward the axis); both are reported, the form chosen is
// checked. With W = 0 the two agree.
//
// Across the bridge the lateral forces (wind on the swung ropes; wind on
// the column when the caller adds it as a level, which is conservative)
// take the place of ΣH, and the effective width that of the depth.
//
// Limit: the kern d_eff/6 by default (the middle-third rule of elementary
// bending theory, σ = N/A ± M/W with W = b d²/6 compressive for e ≤ d/6;
// common practice for masonry and plain-concrete piers), or "within the
// effective section" d_eff/2 plus the projection of a base (see
// EccentricityLimit). The effective dimension excludes the facing on both
// faces (d_eff = Depth − 2·Facing, b_eff = Width − 2·Facing).
//
// The result has ID "tower.eccentricity", kind length, demand |e| of the
// chosen form, capacity e_allowed, and values V, H, R, δ, y_c, h, e, W,
// e_s, θ_s, d_eff (b_eff across), e_lim. Special cases: a rope vertical
// force ≤ 0 gives ErrLiftOff; a checked section at or above the lowest
// saddle, or above the column, and an invalid column or limit give
// ErrInvalid naming the field.
func EccentricityCheck(r Resultant, c Column, opt *Eccentricity) (check.Result, error) {
	if err := r.validate(); err != nil {
		return check.Result{}, err
	}
	if err := c.validate(); err != nil {
		return check.Result{}, err
	}
	var o Eccentricity
	if opt != nil {
		o = *opt
	}
	if o.Form != RopeLine && o.Form != Statics {
		return check.Result{}, invalid("Eccentricity.Form", int(o.Form), "is not RopeLine or Statics")
	}
	if o.Direction != Along && o.Direction != Across {
		return check.Result{}, invalid("Eccentricity.Direction", int(o.Direction), "is not Along or Across")
	}
	yc := o.Section
	if err := nonNegative("Eccentricity.Section", yc); err != nil {
		return check.Result{}, err
	}
	// A Resultant built by hand carries no lowest saddle (zero): only the
	// column top bounds its checked section then.
	if yc > 0 && ((r.Lowest > 0 && yc >= r.Lowest) || yc >= c.Height) {
		return check.Result{}, invalid("Eccentricity.Section", yc,
			fmt.Sprintf("lies at or above the lowest saddle (%v) or the column top (%v): the checked section must lie below where the ropes act", r.Lowest, c.Height))
	}
	v := float64(r.RopeVertical())
	if !(v > 0) {
		return check.Result{}, fmt.Errorf("tower: the rope forces on the column do not press down (ΣV = %v): "+
			"their line of action never reaches the section: %w", units.Force(v), ErrLiftOff)
	}
	h, m := float64(r.Horizontal), float64(r.BaseMoment)
	deff, dname, hname := c.EffectiveDepth(), "d_eff", "ΣH"
	dmeaning, hmeaning, side := "effective depth along the bridge (facing excluded)", "horizontal force of the rope forces, toward the span", sideOf
	if o.Direction == Across {
		h, m = float64(r.Lateral), float64(r.LateralMoment)
		deff, dname, hname = c.EffectiveWidth(), "b_eff", "ΣL"
		dmeaning, hmeaning, side = "effective width across the bridge (facing excluded)", "lateral force on the column, downwind", downwind
	}
	allowed, rule, err := o.Limit.allowed(deff, dname)
	if err != nil {
		return check.Result{}, err
	}
	mc := m - h*float64(yc) // moment of the rope forces about the checked section
	ep := mc / v
	w := float64(c.Weight()) * float64(c.Height-yc) / float64(c.Height)
	es := mc / (v + w)
	if !finite(w) || !finite(mc) || !finite(es) || !finite(mc/v) {
		return check.Result{}, invalid("Column", fmt.Sprintf("%v × %v × %v", c.Depth, c.Width, c.Height),
			"with these forces gives a weight or moment that is not finite")
	}
	delta := math.Atan2(h, v)
	e, form := ep, "rope-line form (the form practice uses): the line of action of the rope forces alone, the column's weight not counted, e = h·tan δ; "+
		"the statics form, ΣM/ΣV with the weight of the column above the section (e_s, smaller: the weight pulls the line back toward the axis), is given beside it"
	if o.Form == Statics {
		e, form = es, "statics form: e = ΣM/ΣV at the checked section with the weight of the column above it; "+
			"the rope-line form practice checks, e = h·tan δ from the rope forces alone (larger), is given beside it"
	}
	title := "Resultant eccentricity at column base"
	if yc > 0 {
		title = "Resultant eccentricity at checked section"
	}
	res := check.Compare("tower.eccentricity", title, units.KindLength, math.Abs(e), float64(allowed))
	if o.Terse {
		return res, nil
	}
	where := "the column base section"
	if yc > 0 {
		where = fmt.Sprintf("the checked section %v above the column base", yc)
	}
	res = res.WithBasis(form + ", at " + where + "; limit: " + rule + "; no factor of safety (common practice)")
	// The values in one slice on the stack, copied once into the result.
	var buf [16]check.Value
	vals := append(buf[:0],
		check.Of("ΣV", "vertical force of the rope forces (down)", units.Force(v)),
		check.Of(hname, hmeaning, units.Force(h)),
		check.Of("R", "magnitude of the rope-force resultant", units.Force(math.Hypot(h, v))),
		check.Of("δ", "angle of the rope-force resultant from the vertical", units.Angle(delta)),
		check.Of("y_c", "height of the checked section above the column base section", yc),
	)
	if h != 0 {
		vals = append(vals, check.Of("h", "height above the checked section where the rope-force line crosses the column axis", units.Length(mc/h)))
	}
	vals = append(vals,
		check.Of("e", "eccentricity by the rope-line form, (M − ΣH·y_c)/ΣV", units.Length(ep)),
		check.Of("W", "weight of the column above the checked section", units.Force(w)),
		check.Of("e_s", "eccentricity by the statics form, with the column weight", units.Length(es)),
		check.Of("θ_s", "angle from the vertical of the resultant with the column weight", units.Angle(math.Atan2(h, v+w))),
		check.Of(dname, dmeaning, deff),
		check.Of("e_lim", "allowed eccentricity", allowed),
	)
	if c.Facing > 0 {
		vals = append(vals, check.Of("t_f", "facing left out of the effective section on each face", c.Facing))
	}
	res = res.WithValues(vals...)
	switch {
	case h == 0 && mc == 0:
		if o.Direction == Across {
			res = res.WithNote("nothing leans the resultant across the bridge in this case (no lateral force): e = 0")
		} else {
			res = res.WithNote("the rope forces have no horizontal component along the bridge and act on the column axis in this case: e = 0")
		}
	case h == 0:
		res = res.WithNote(fmt.Sprintf("the rope forces are vertical; they act off the column axis (saddle offset or travel), e = %v %s",
			units.Length(math.Abs(e)), side(e)))
	default:
		res = res.WithNote(fmt.Sprintf("e = %v %s", units.Length(math.Abs(e)), side(e)))
	}
	if c.Facing > 0 {
		res = res.WithNote(fmt.Sprintf("effective section %v × %v: %v of facing on each face left out", c.EffectiveDepth(), c.EffectiveWidth(), c.Facing))
	}
	return res, nil
}

// sideOf names the side of the column axis a signed offset along the
// bridge lies on.
func sideOf(x float64) string {
	switch {
	case x > 0:
		return "toward the span"
	case x < 0:
		return "toward the backstay"
	}
	return "on the axis"
}

// downwind names the side of the column axis a signed offset across the
// bridge lies on.
func downwind(x float64) string {
	switch {
	case x > 0:
		return "downwind"
	case x < 0:
		return "upwind"
	}
	return "on the axis"
}

// EccentricityBoth checks where the resultant crosses the checked section
// when it is eccentric along and across the bridge at once (a case with
// crowd and wind, say), against the kern of the rectangle, which is a
// rhombus: by elementary bending theory the least stress on a b × d
// rectangle under N at (e_d, e_b) is
//
//	σ_min = N/(b d) · (1 − 6|e_d|/d − 6|e_b|/b)
//
// so no tension anywhere needs
//
//	u = |e_d|/(d/6) + |e_b|/(b/6) ≤ 1
//
// The two one-direction checks bound the rhombus' corners only; between
// them the resultant can leave the kern while each passes alone. eAlong
// and eAcross are the eccentricities of the two EccentricityCheck results
// of one case, limAlong and limAcross their limits; with a limit "within
// the effective section" (a rectangle, which the two checks already
// bound) the caller does not need this check. With a user fraction below 1
// the same linear rule is applied to its limits (conservative).
//
// The result has ID "tower.eccentricity_both", kind ratio, demand u and
// capacity 1, and values e_d, e_lim,d, e_b, e_lim,b. Special cases:
// limits must be positive and eccentricities finite (ErrInvalid).
func EccentricityBoth(eAlong, limAlong, eAcross, limAcross units.Length) (check.Result, error) {
	for _, f := range []struct {
		n string
		v units.Length
	}{{"eAlong", eAlong}, {"eAcross", eAcross}} {
		if err := isFinite(f.n, f.v); err != nil {
			return check.Result{}, err
		}
	}
	if err := positive("limAlong", limAlong); err != nil {
		return check.Result{}, err
	}
	if err := positive("limAcross", limAcross); err != nil {
		return check.Result{}, err
	}
	ua, uc := math.Abs(float64(eAlong/limAlong)), math.Abs(float64(eAcross/limAcross))
	return check.Compare("tower.eccentricity_both", "Resultant eccentricity, both directions at once", units.KindRatio, ua+uc, 1).
		WithBasis("kern of a rectangle, a rhombus: |e_d|/e_lim,d + |e_b|/e_lim,b ≤ 1 (elementary bending theory, σ = N/A ± M_d/W_d ± M_b/W_b; common practice); no factor of safety").
		WithValues(
			check.Of("e_d", "eccentricity along the bridge", units.Length(math.Abs(float64(eAlong)))),
			check.Of("e_lim,d", "allowed eccentricity along the bridge", limAlong),
			check.Of("e_b", "eccentricity across the bridge", units.Length(math.Abs(float64(eAcross)))),
			check.Of("e_lim,b", "allowed eccentricity across the bridge", limAcross),
			check.Of("u_d", "share along the bridge |e_d|/e_lim,d", units.Ratio(ua)),
			check.Of("u_b", "share across the bridge |e_b|/e_lim,b", units.Ratio(uc)),
		), nil
}
