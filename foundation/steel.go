package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Defaults of the checks of steel in the ground.
const (
	// defaultSteelFactor is the factor of safety on the yield resistance of
	// steel on the allowable basis, 1.67 (the Ω of allowable strength design
	// for yielding, AISC 360-16 D2(a) and F1).
	defaultSteelFactor = 1.67
	// defaultRuptureFactor is the factor of safety on the ultimate
	// (rupture) resistance of a thread on the allowable basis, 2.00 (the Ω
	// of allowable strength design for tensile rupture and for threaded
	// parts in tension, AISC 360-16 D2(b) and J3.6): fracture gives no
	// warning, so it takes a larger factor than yielding.
	defaultRuptureFactor = 2.0
	// defaultRopeFactor is the factor of safety on a rope's breaking force
	// on the allowable basis, 3.0, as the rope checks use (common practice).
	defaultRopeFactor = 3.0
	// DefaultThreadRatio is the ratio of a thread's tensile stress area to
	// the gross area of the bar, used when none is given: 0.78, that of a
	// M20 ISO metric coarse thread (245/314 mm², ISO 898-1, from memory),
	// the lowest of the common sizes (M36: 817/1018 = 0.80), so cautious.
	DefaultThreadRatio = 0.78
	// threadK2 is k2 of EN 1993-1-8:2005 Table 3.4 for a threaded part in
	// tension (not countersunk), 0.9 (from memory).
	threadK2 = 0.9
)

// SteelSection is a steel member's section for the checks of steel in the
// ground.
type SteelSection struct {
	// Yield is the yield strength f_y.
	Yield units.Pressure
	// PlasticModulus is W_pl about the axis of bending; ShearArea is A_v in
	// the direction of the load.
	PlasticModulus units.Volume
	ShearArea      units.Area
}

// validate checks the section; optional allows the zero value (none).
func (s SteelSection) validate(field string, optional bool) error {
	if optional && s == (SteelSection{}) {
		return nil
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{".Yield", float64(s.Yield)}, {".PlasticModulus", float64(s.PlasticModulus)}, {".ShearArea", float64(s.ShearArea)}} {
		if err := positive(field+f.name, f.v); err != nil {
			return err
		}
	}
	return nil
}

// steelAction returns the factor on a force of which share is variable,
// for the checks of steel: 1 on the allowable basis (characteristic
// force), set A1 (EN 1997-1 Annex A, DA2 or DA1 combination 1) on the
// partial basis.
func (b Basis) steelAction(share float64) float64 {
	if !b.PartialFactors {
		return 1
	}
	return b.geoSets()[0].factorOf(true, share)
}

// AnchorRod is one or more equal round steel rods (or bars) cast into an
// anchor block, sharing the backstays' pull, threaded where the rope's eye,
// shackle or turnbuckle is fixed to them.
type AnchorRod struct {
	// Count is the number of rods; zero → 1.
	Count int
	// Diameter is the rod's gross (shank) diameter.
	Diameter units.Length
	// Yield and Ultimate are the steel's f_y and f_u; Ultimate zero → Yield
	// (cautious when unknown).
	Yield, Ultimate units.Pressure
	// ThreadArea is the tensile stress area A_s of the thread; zero →
	// DefaultThreadRatio × the gross area.
	ThreadArea units.Area
	// VariableShare is the fraction of the pull due to variable actions
	// (0 to 1), used only by the partial-factor basis.
	VariableShare float64
}

func (r AnchorRod) validate() error {
	if r.Count < 0 {
		return invalid("AnchorRod.Count", "must not be negative")
	}
	if err := positive("AnchorRod.Diameter", float64(r.Diameter)); err != nil {
		return err
	}
	if err := positive("AnchorRod.Yield", float64(r.Yield)); err != nil {
		return err
	}
	if err := nonNegative("AnchorRod.Ultimate", float64(r.Ultimate)); err != nil {
		return err
	}
	if r.Ultimate > 0 && r.Ultimate < r.Yield {
		return invalid("AnchorRod.Ultimate", "must not be less than Yield")
	}
	if err := nonNegative("AnchorRod.ThreadArea", float64(r.ThreadArea)); err != nil {
		return err
	}
	if gross := math.Pi / 4 * float64(r.Diameter) * float64(r.Diameter); float64(r.ThreadArea) > gross {
		return invalid("AnchorRod.ThreadArea", "must not exceed the gross area of the rod")
	}
	return fraction("AnchorRod.VariableShare", r.VariableShare)
}

// Check verifies the rods under the pull (shared equally), with result IDs
// "anchor.rod.tension" and "anchor.rod.thread", per rod:
//
//	tension: T = pull/n  against  N_pl = A f_y / γM0                  (EN 1993-1-1:2005 6.2.3(2)a)
//	thread:  T           against  F_t = min(A_s f_y / γM0, k2 f_u A_s / γM2),  k2 0.9
//	                                                                   (EN 1993-1-8:2005 Table 3.4)
//
// Allowable basis: characteristic pull; the yield resistances (γM0 = 1)
// divided by the Steel factor (1.67, AISC 360-16 D2(a)) and the thread's
// rupture resistance k2 f_u A_s (γM2 = 1) by the Rupture factor (2.00,
// AISC 360-16 D2(b) and J3.6). Partial basis: the pull factored by set A1
// (EN 1997-1 Annex A) by VariableShare, γM0 1.0 and γM2 1.25 (EN 1993-1-1
// 6.1 and EN 1993-1-8 Table 2.1 recommended values, from memory).
// Special cases: a zero pull passes; invalid input gives an error wrapping
// ErrInvalid.
func (r AnchorRod) Check(pull units.Force, b *Basis) ([]check.Result, error) {
	if err := r.validate(); err != nil {
		return nil, err
	}
	if err := nonNegative("pull", float64(pull)); err != nil {
		return nil, err
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	n := float64(max(r.Count, 1))
	t := bs.steelAction(r.VariableShare) * float64(pull) / n
	d := float64(r.Diameter)
	gross := math.Pi / 4 * d * d
	as := float64(r.ThreadArea)
	if as == 0 {
		as = DefaultThreadRatio * gross
	}
	fy, fu := float64(r.Yield), float64(r.Ultimate)
	if fu == 0 {
		fu = fy
	}
	gM0, gM2, fs, fr := 1.0, 1.0, def(bs.Steel, defaultSteelFactor), def(bs.Rupture, defaultRuptureFactor)
	basis := fsBasis("the steel's yield resistance (EN 1993-1-1:2005 6.2.3 with γM0 = 1; AISC 360-16 D2(a))", fs)
	threadBasis := fmt.Sprintf("allowable basis: global factors of safety %.2f on the thread's yield resistance A_s f_y and %.2f on its rupture "+
		"resistance k2 f_u A_s (EN 1993-1-8:2005 Table 3.4 with γM2 = 1; AISC 360-16 D2 and J3.6)", fs, fr)
	if bs.PartialFactors {
		gM0, gM2, fs, fr = def(bs.GammaM0, 1.0), def(bs.GammaM2, 1.25), 1, 1
		basis = fmt.Sprintf("EN 1993-1-1:2005 6.2.3 (γM0 %.2f) and EN 1993-1-8:2005 Table 3.4 (k2 0.9, γM2 %.2f), pull under set A1 (EN 1997-1 Annex A)", gM0, gM2)
		threadBasis = basis
	}
	npl := gross * fy / gM0 / fs
	ft := math.Min(as*fy/gM0/fs, threadK2*fu*as/gM2/fr)
	vals := []check.Value{
		check.Of("T", "force per rod", units.Force(t)),
		check.Of("n", "number of rods", units.Ratio(n)),
		check.Of("f_y", "yield strength of the rods", r.Yield),
	}
	return []check.Result{
		check.Compare("anchor.rod.tension", "Anchor rod tension", units.KindForce, t, npl).WithBasis(basis).
			WithValues(append(vals, check.Of("A", "gross area of a rod", units.Area(gross)))...),
		check.Compare("anchor.rod.thread", "Anchor rod thread tension", units.KindForce, t, ft).WithBasis(threadBasis).
			WithValues(append(vals, check.Of("A_s", "tensile stress area of the thread", units.Area(as)),
				check.Of("f_u", "ultimate strength used; f_y when none is given", units.Pressure(fu)))...),
	}, nil
}

// bendTable is the strength efficiency of a wire rope bent round a pin or
// sheave against D/d (its diameter over the rope's), static load: the
// table of the wire-rope industry (Wire Rope Technical Board, Wire Rope
// Users Manual, 4th ed., 2005, from memory; the same values read in a
// rigging supplier's published table of sheave size and rope strength).
var bendTable = [...]struct{ ratio, efficiency float64 }{
	{1, 0.50}, {2, 0.65}, {4, 0.75}, {6, 0.79}, {8, 0.83}, {10, 0.86},
	{15, 0.89}, {20, 0.91}, {30, 0.93}, {40, 0.95},
}

// BendEfficiency returns the strength efficiency of a wire rope bent round
// a pin of D/d = ratio (static load), interpolated linearly in bendTable;
// 0.95 beyond D/d 40. A ratio below 1 gives an error wrapping ErrInvalid:
// a rope is not bent tighter than its own diameter.
func BendEfficiency(ratio float64) (float64, error) {
	if !(ratio >= 1) || math.IsInf(ratio, 0) {
		return 0, invalid("D/d", "must be at least 1: a pin narrower than the rope")
	}
	for i := 1; i < len(bendTable); i++ {
		lo, hi := bendTable[i-1], bendTable[i]
		if ratio <= hi.ratio {
			return lo.efficiency + (ratio-lo.ratio)/(hi.ratio-lo.ratio)*(hi.efficiency-lo.efficiency), nil
		}
	}
	return bendTable[len(bendTable)-1].efficiency, nil
}

// RopeAnchorage is how one rope ends at an anchor: its termination (the
// eye with its grips, ferrule or socket) and, for a loop, the pin or pipe
// cast into the block the rope passes round.
type RopeAnchorage struct {
	// MBF and Diameter are the rope's minimum breaking force and diameter.
	MBF      units.Force
	Diameter units.Length
	// Efficiency is the termination efficiency k_e of the rope's end (wire
	// rope grips about 0.80, a ferrule-secured eye 0.90, a poured or swaged
	// socket 1.0; EN 13411 family, from memory).
	Efficiency float64
	// PinDiameter is the diameter of the pin or pipe the rope loops round
	// (a loop in the block); zero when the rope's eye is fixed to a rod.
	PinDiameter units.Length
	// VariableShare is the fraction of the tension due to variable actions
	// (0 to 1), used only by the partial-factor basis.
	VariableShare float64
}

func (a RopeAnchorage) validate() error {
	if err := positive("RopeAnchorage.MBF", float64(a.MBF)); err != nil {
		return err
	}
	if err := positive("RopeAnchorage.Diameter", float64(a.Diameter)); err != nil {
		return err
	}
	if !(a.Efficiency > 0 && a.Efficiency <= 1) {
		return invalid("RopeAnchorage.Efficiency", "must be in (0, 1]")
	}
	if err := nonNegative("RopeAnchorage.PinDiameter", float64(a.PinDiameter)); err != nil {
		return err
	}
	if a.PinDiameter > 0 && a.PinDiameter < a.Diameter {
		return invalid("RopeAnchorage.PinDiameter", "must be at least the rope's diameter")
	}
	return fraction("RopeAnchorage.VariableShare", a.VariableShare)
}

// Check verifies the end of one rope at the anchor under its tension t,
// with result IDs "anchor.attachment" (the termination) and, for a loop,
// "anchor.loop" (each of the loop's two legs bent round the pin):
//
//	attachment: t  against  k_e MBF / F
//	loop:       t/2  against  E(D/d) MBF / F,  E from BendEfficiency
//
// F is the Rope factor of safety (3.0) on the allowable basis; on the
// partial basis t is factored by set A1 and F = 1.5 γR with γR 0.90, the
// form of EN 1993-1-11:2006 6.2 (from memory).
func (a RopeAnchorage) Check(t units.Force, b *Basis) ([]check.Result, error) {
	if err := a.validate(); err != nil {
		return nil, err
	}
	if err := nonNegative("tension", float64(t)); err != nil {
		return nil, err
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	f := def(bs.Rope, defaultRopeFactor)
	basis := fsBasis("the rope's minimum breaking force times the termination efficiency", f)
	td := float64(t)
	if bs.PartialFactors {
		gr := def(bs.GammaRope, 0.90)
		f = 1.5 * gr
		td *= bs.steelAction(a.VariableShare)
		basis = fmt.Sprintf("EN 1993-1-11:2006 6.2 form, F_Rd = k MBF/(1.5 γR), γR %.2f (from memory); tension under set A1 (EN 1997-1 Annex A)", gr)
	}
	mbf := float64(a.MBF)
	out := []check.Result{
		check.Compare("anchor.attachment", "Rope termination at the anchor", units.KindForce, td, a.Efficiency*mbf/f).
			WithBasis(basis).WithValues(
			check.Of("k_e", "termination efficiency", units.Ratio(a.Efficiency)),
			check.Of("MBF", "minimum breaking force of the rope", a.MBF)),
	}
	if a.PinDiameter > 0 {
		ratio := float64(a.PinDiameter) / float64(a.Diameter)
		e, err := BendEfficiency(ratio)
		if err != nil {
			return nil, err
		}
		out = append(out, check.Compare("anchor.loop", "Rope loop round the anchor pin", units.KindForce, td/2, e*mbf/f).
			WithBasis(basis+"; bend efficiency of the wire-rope industry's table (Wire Rope Users Manual, from memory)").
			WithValues(
				check.Of("D/d", "pin diameter over rope diameter", units.Ratio(ratio)),
				check.Of("E", "bend efficiency of the rope round the pin", units.Ratio(e)),
				check.Of("MBF", "minimum breaking force of the rope", a.MBF)).
			WithNote("the loop's two legs share the tension"))
	}
	return out, nil
}
