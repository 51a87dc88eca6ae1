package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// TengK0 is the earth-pressure coefficient at rest in Teng's end-effect
// term for short deadmen, 0.4 (Teng, Foundation Design, 1962, from memory).
const TengK0 = 0.4

// Deadman is a buried horizontal beam or plate, its long side across the
// pull, resisting the backstays by the passive resistance of the soil in
// front of it. Frame as for AnchorBlock: x toward the tower, z up.
type Deadman struct {
	// Length is across the pull; Height is the vertical face pulled
	// against the soil; Thickness is along the pull.
	Length, Height, Thickness units.Length
	// Depth is the depth of the bottom of the face below ground; the top
	// of the face is at Depth − Height, which must not be negative.
	Depth units.Length
	// UnitWeight of the deadman; zero → ConcreteUnitWeight (24 kN/m³).
	UnitWeight units.UnitWeight
	// EndEffects adds Teng's term for the soil wedges at the ends of a
	// short deadman (only near the surface, Height ≥ Depth/2).
	EndEffects bool
	// Water is the water level at the deadman: effective stresses in the
	// passive and active pressures, submerged weights in uplift.
	Water Water
	// GroundSlope is the inclination of the ground falling away from the
	// deadman within reach of its passive wedge; zero for level ground.
	// Drained, the passive coefficient is then Coulomb's for ground
	// falling in front (δ = 0), none at or beyond φ'; undrained, the
	// thrust of a plane wedge in total stress (see AnchorBlock.earth).
	GroundSlope units.Angle
	// BackSlope is the inclination of the ground rising behind the deadman
	// (away from the pull); the active pressure takes it as AnchorBlock's.
	BackSlope units.Angle
	// Section is the deadman's steel section, checked in bending and shear
	// as a beam on the soil reaction; the zero value means the section is
	// not a steel one described here (a concrete or timber beam), and its
	// design moment and shear are reported for its own design.
	Section SteelSection
}

func (d Deadman) validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"Deadman.Length", float64(d.Length)}, {"Deadman.Height", float64(d.Height)}, {"Deadman.Thickness", float64(d.Thickness)}, {"Deadman.Depth", float64(d.Depth)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if d.Height > d.Depth {
		return invalid("Deadman.Height", "must not exceed Depth: a deadman is buried")
	}
	if err := d.Water.validate("Deadman.Water"); err != nil {
		return err
	}
	if !(d.GroundSlope >= 0 && d.GroundSlope < 90*units.Degree) {
		return invalid("Deadman.GroundSlope", "must be at least 0 and less than 90 deg")
	}
	if !(d.BackSlope >= 0 && d.BackSlope < 90*units.Degree) {
		return invalid("Deadman.BackSlope", "must be at least 0 and less than 90 deg")
	}
	if err := d.Section.validate("Deadman.Section", true); err != nil {
		return err
	}
	return nonNegative("Deadman.UnitWeight", float64(d.UnitWeight))
}

// Resistance returns the ultimate horizontal resistance of the deadman in
// soil s in condition cond (Teng, Foundation Design, 1962, from memory;
// also in Das, Principles of Foundation Engineering, ch. on anchor plates):
//
//	near the surface (Height ≥ Depth/2): T = Length (Pp − Pa) over 0 … Depth
//	   + with EndEffects: ⅓ K0 γ (√Kp + √Ka) Depth³ tan φ  (γ' when water is within Depth;
//	     none where no passive resistance is counted, Kp = 0)
//	deeper: the larger of Length (Pp − Pa) over the face only and the
//	   near-surface value at Depth = 2·Height
//
// with Rankine coefficients for level ground (Kp as AnchorBlock's on
// ground falling in front, GroundSlope) and Bell's cohesion terms
// (drained), or K = 1 and c_u (undrained, where the end-effect term
// vanishes with φ), effective stresses with the deadman's water level, the
// active side's tension cut off. The deeper form is this package's
// cautious choice (a deeper deadman is never taken as weaker than a
// shallower one); deep anchors have larger capacities by other methods.
// The second return value tells which form was used.
func (d Deadman) Resistance(s Soil, cond Condition) (units.Force, string, error) {
	if err := d.validate(); err != nil {
		return 0, "", err
	}
	if err := s.Validate(); err != nil {
		return 0, "", err
	}
	if !cond.valid() {
		return 0, "", invalid("Condition", fmt.Sprintf("%d is not a known condition", int(cond)))
	}
	if cond == Undrained && !(s.Undrained > 0) {
		return 0, "", invalid("Soil.Undrained", "must be positive for the undrained condition")
	}
	if cond == Drained && !(s.Friction > 0) {
		return 0, "", invalid("Soil.Friction", "must be positive for the drained condition")
	}
	st := s.strengthIn(cond, Basis{}.allowableSet())
	r := d.resistance(s, st)
	return units.Force(r.t), r.how, nil
}

// deadmanResistance is the ultimate resistance of a deadman and the
// numbers behind it, for the form that governs.
type deadmanResistance struct {
	t      float64 // ultimate horizontal resistance
	how    string
	kp, ka float64 // earth-pressure coefficients
	top    float64 // depth of the top of the loaded face (0 near the surface)
	bottom float64 // depth of its bottom
	pp, pa float64 // passive and active forces on that face over the deadman's length
	end    float64 // Teng's end-effect term (zero when not counted)
}

// values returns the numbers of the resistance as check values.
func (r deadmanResistance) values() []check.Value {
	return []check.Value{
		check.Of("T_u", "ultimate horizontal resistance of the soil", units.Force(r.t)),
		check.Of("K_p", "passive earth-pressure coefficient (Rankine on level ground, Coulomb with δ = 0 on ground falling in front; 1 undrained on level ground)", units.Ratio(r.kp)),
		check.Of("K_a", "active earth-pressure coefficient (Rankine; 1 undrained)", units.Ratio(r.ka)),
		check.Of("z_t", "depth of the top of the face the pressures act on", units.Length(r.top)),
		check.Of("z_b", "depth of the bottom of that face", units.Length(r.bottom)),
		check.Of("P_p", "passive force on that face over the deadman's length", units.Force(r.pp)),
		check.Of("P_a", "active force on that face over the deadman's length", units.Force(r.pa)),
		check.Of("T_e", "Teng's end-effect term; zero when not counted", units.Force(r.end)),
	}
}

// resistance is Resistance for strength st (after partial factors).
func (d Deadman) resistance(s Soil, st strength) deadmanResistance {
	if d.Height >= d.Depth/2 {
		r := d.teng(s, st, float64(d.Depth))
		r.how = "Teng's continuous anchor near the surface (from memory)"
		if r.end > 0 {
			r.how += ", with end effects"
		}
		return r
	}
	face := d.passiveLessActive(s, st, float64(d.Depth-d.Height), float64(d.Depth))
	shallow := d.teng(s, st, 2*float64(d.Height))
	if face.t >= shallow.t {
		face.how = "deep deadman: passive less active on the face only (cautious)"
		return face
	}
	shallow.how = "deep deadman: Teng's value at depth 2·Height (cautious)"
	return shallow
}

// coefficients returns Kp and Ka in strength st for ground falling at
// slope in front and rising at back behind (passiveK, activeK): Rankine's
// on level ground drained, 1 undrained.
func (st strength) coefficients(slope, back units.Angle) (kp, ka float64) {
	return passiveK(st, slope), activeK(st, back)
}

// passiveLessActive returns Length (Pp − Pa) between depths top and bottom.
func (d Deadman) passiveLessActive(s Soil, st strength, top, bottom float64) deadmanResistance {
	kp, ka := st.coefficients(d.GroundSlope, d.BackSlope)
	g, gs, dw := float64(s.UnitWeight), float64(s.SubmergedWeight()), d.Water.depth()
	pp := layeredEarth(kp, st.c, 1, top, bottom, g, gs, dw)
	pp.Force *= units.Force(undrainedWedge(st, g, bottom, d.GroundSlope))
	pa := layeredEarth(ka, st.c, -1, top, bottom, g, gs, dw)
	l := float64(d.Length)
	r := deadmanResistance{kp: kp, ka: ka, top: top, bottom: bottom, pp: l * float64(pp.Force), pa: l * float64(pa.Force)}
	r.t = r.pp - r.pa
	return r
}

// teng returns Teng's near-surface resistance for a face reaching depth h.
func (d Deadman) teng(s Soil, st strength, h float64) deadmanResistance {
	r := d.passiveLessActive(s, st, 0, h)
	// No passive wedge on ground falling at or beyond φ' (Kp = 0): no
	// friction on its sides either.
	if !d.EndEffects || st.cond == Undrained || r.kp == 0 {
		return r
	}
	g := float64(s.UnitWeight)
	if d.Water.depth() < h {
		g = float64(s.SubmergedWeight()) // cautious: the whole wedge at its submerged weight
	}
	r.end = TengK0 * g * (math.Sqrt(r.kp) + math.Sqrt(r.ka)) * h * h * h * math.Tan(st.phi) / 3
	r.t += r.end
	return r
}

// weight returns the effective weight resisting uplift: the deadman
// (buoyed below the water) and the vertical soil prism above it (at its
// effective weight below the water).
func (d Deadman) weight(s Soil) float64 {
	gd := float64(d.UnitWeight)
	if gd == 0 {
		gd = float64(ConcreteUnitWeight)
	}
	plan := float64(d.Length) * float64(d.Thickness)
	top, bottom, dw := float64(d.Depth-d.Height), float64(d.Depth), d.Water.depth()
	sub := overlap(top, bottom, dw, math.Inf(1)) // height of the beam below the water
	prism, _ := stress(top, float64(s.UnitWeight), float64(s.SubmergedWeight()), dw)
	return plan * (gd*(bottom-top) - float64(WaterUnitWeight)*sub + prism)
}

// Check verifies the deadman against the pulls, with result IDs
// "anchor.deadman.pullout" (the horizontal components against the
// ultimate resistance, see Resistance), "anchor.deadman.uplift" (the
// vertical components against the effective weight of the deadman and of
// the vertical soil prism above it, shear on the prism's sides ignored,
// common practice), and "anchor.deadman.bending" and
// "anchor.deadman.shear": the beam under the resultant pull T at its
// middle, on a uniform soil reaction T/Length along it (cautious: the
// largest moment of any placement of the ropes),
//
//	M = T·Length/8,  V = T/2
//
// against M_Rd = W_pl f_y/γM0 and V_Rd = A_v (f_y/√3)/γM0 (EN 1993-1-1:2005
// 6.2.5 and 6.2.6) when Section is given, or reported as values with no
// limit (check.Record) for a beam not described as steel. The attachment
// points X, Z of the pulls are not used.
//
// A fine soil is checked drained and undrained for pull-out, the worse
// reported with the governing condition named.
//
// Allowable basis: factors Pullout (2.0), Uplift (1.5) and Steel (1.67 on
// the yield resistance). Partial basis: pull-out in GEO by the design
// approach, resistance divided by γR,e; uplift in EQU; the beam under set
// A1 actions with γM0. Special cases and errors as AnchorBlock.Check.
func (d Deadman) Check(pulls []AnchorPull, s Soil, b *Basis) ([]check.Result, error) {
	if err := d.validate(); err != nil {
		return nil, err
	}
	if err := s.Validate(); err != nil {
		return nil, err
	}
	if err := validatePulls(pulls, false); err != nil {
		return nil, err
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	weight := d.weight(s)
	conds := s.Conditions()

	pullout := func(set actionSet, cond Condition, fs float64) check.Result {
		st := s.strengthIn(cond, set)
		res := d.resistance(s, st)
		var fx float64
		for _, p := range pulls {
			x, _ := p.components()
			fx += set.factor(x > 0, p.Variable) * x
		}
		r := check.Stability("anchor.deadman.pullout", "Deadman pull-out through the soil", units.KindForce,
			fx, res.t/set.gRe, fs).WithBasis(basisOf(set, "the ultimate passive minus active resistance", fs))
		if set.terse {
			return r
		}
		return r.WithValues(append(res.values(), d.Water.values()...)...).WithNote(res.how + "; " + d.Water.String())
	}
	uplift := func(set actionSet, fs float64) check.Result {
		var dst, stb float64
		for _, p := range pulls {
			_, z := p.components()
			if z > 0 {
				dst += set.factor(true, p.Variable) * z
			} else {
				stb -= set.factor(false, p.Variable) * z
			}
		}
		stb += set.gGfav * weight
		r := check.Stability("anchor.deadman.uplift", "Deadman uplift", units.KindForce, dst, stb, fs).
			WithBasis(basisOf(set, "the effective weight of the deadman and the soil above it", fs))
		r = set.values(r, append([]check.Value{check.Of("W", "effective weight of the deadman and the soil prism above it", units.Force(weight))},
			d.Water.values()...)...)
		return set.note(r, "vertical soil prism above the deadman; shear on its sides ignored")
	}
	var per [2]conditioned
	var lift check.Result
	var sets []actionSet
	fsPull, fsSteel := 1.0, 1.0
	if !bs.PartialFactors {
		sets = []actionSet{bs.allowableSet()}
		fsPull, fsSteel = def(bs.Pullout, 2), def(bs.Steel, defaultSteelFactor)
		lift = uplift(sets[0], def(bs.Uplift, 1.5))
	} else {
		sets = bs.geoSets()
		lift = uplift(bs.equSet(), 1)
	}
	for i, cond := range conds {
		for j, set := range sets {
			r := pullout(set, cond, fsPull)
			if j == 0 || r.Ratio > per[i].r.Ratio {
				per[i] = conditioned{cond, r}
			}
		}
	}
	out := []check.Result{governing(sets[0], per[:len(conds)]), lift}
	return append(out, d.beam(pulls, bs, fsSteel)...), nil
}

// beam returns the bending and shear results of the deadman as a beam.
func (d Deadman) beam(pulls []AnchorPull, bs Basis, fs float64) []check.Result {
	set := bs.allowableSet()
	gM0 := 1.0
	label := ""
	if bs.PartialFactors {
		set = bs.geoSets()[0] // set A1
		gM0 = def(bs.GammaM0, 1.0)
		label = fmt.Sprintf("EN 1993-1-1:2005 6.2.5 and 6.2.6, γM0 %.2f, under set A1 actions (EN 1997-1 Annex A)", gM0)
	} else {
		label = fsBasis("the plastic resistance of the steel section (EN 1993-1-1:2005 6.2.5 and 6.2.6)", fs)
	}
	// W_pl f_y holds for class 1 and 2 sections only (EN 1993-1-1 6.2.5(2)).
	label += "; the section taken as class 1 or 2 (plastic): for a class 3 section give its elastic modulus as the plastic one; " +
		"the surrounding soil restrains it against lateral-torsional buckling"
	var fx, fz float64
	for _, p := range pulls {
		x, z := p.components()
		g := set.factor(true, p.Variable)
		fx, fz = fx+g*x, fz+g*z
	}
	t := math.Hypot(fx, fz)
	l := float64(d.Length)
	mEd, vEd := t*l/8, t/2
	beamNote := "beam on a uniform soil reaction T/Length with the resultant pull T at its middle (cautious: the largest moment of any placement of the ropes)"
	if d.Section.Yield == 0 {
		note := "the deadman is not described as a steel section: design the beam for this moment and shear (EN 1992-1-1 for concrete); " + beamNote
		return []check.Result{
			check.Record("anchor.deadman.bending", "Deadman beam bending moment", units.KindMoment, mEd).
				WithBasis("common practice: "+beamNote).WithValues(check.Of("T", "resultant pull on the beam", units.Force(t)),
				check.Of("L", "length of the beam across the pull", d.Length)).WithNote(note),
			check.Record("anchor.deadman.shear", "Deadman beam shear force", units.KindForce, vEd).
				WithBasis("common practice: " + beamNote).WithValues(check.Of("T", "resultant pull on the beam", units.Force(t))).WithNote(note),
		}
	}
	sec := d.Section
	mRd := float64(sec.PlasticModulus) * float64(sec.Yield) / gM0
	vRd := float64(sec.ShearArea) * float64(sec.Yield) / math.Sqrt(3) / gM0
	if !bs.PartialFactors {
		mRd, vRd = mRd/fs, vRd/fs
	}
	vals := []check.Value{check.Of("T", "resultant pull on the beam", units.Force(t)),
		check.Of("L", "length of the beam across the pull", d.Length),
		check.Of("f_y", "yield strength of the section", sec.Yield)}
	return []check.Result{
		check.Compare("anchor.deadman.bending", "Deadman beam bending", units.KindMoment, mEd, mRd).WithBasis(label).
			WithValues(append(vals, check.Of("W_pl", "plastic section modulus", sec.PlasticModulus))...).WithNote(beamNote),
		check.Compare("anchor.deadman.shear", "Deadman beam shear", units.KindForce, vEd, vRd).WithBasis(label).
			WithValues(append(vals, check.Of("A_v", "shear area", sec.ShearArea))...).WithNote(beamNote),
	}
}
