package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Defaults of RockAnchor.
const (
	// DefaultGroutBarBond is the ultimate bond stress between cement grout
	// and a deformed steel bar, 2.0 MPa (from memory: a cautious value for
	// grout of about 30 MPa; BS 8081:2015 and EN 1537:2013 ask for tests).
	DefaultGroutBarBond = 2.0 * units.Megapascal
	// DefaultConeAngle is the half-angle of the rock cone lifted by an
	// anchor, 30° from the anchor's axis (from memory; 45° is also used
	// in sound rock).
	DefaultConeAngle = 30 * units.Degree
	// defaultNutRatio is the diameter of the nut's or washer's bearing
	// face on the head plate over the bar's diameter, 1.5 (ISO 4032 hexagon
	// nuts are about 1.5 d across the flats; common practice).
	defaultNutRatio = 1.5
)

// HeadPlate is the square steel plate under a rock anchor's nut, bearing
// on the rock (or a grout pad on it).
type HeadPlate struct {
	// Side and Thickness of the square plate; Yield its f_y.
	Side, Thickness units.Length
	Yield           units.Pressure
	// NutDiameter is the diameter of the nut's or washer's bearing face;
	// zero → 1.5 × the bar's diameter.
	NutDiameter units.Length
}

// RockAnchor is one or more grouted steel bars drilled into rock along the
// backstay's line, in a row across the pull, sharing its pull equally.
type RockAnchor struct {
	// Count is the number of bars; zero → 1.
	Count int
	// Spacing is the distance between neighbouring bars across the pull;
	// zero takes all the bars' cones as one (cautious).
	Spacing units.Length
	// BarDiameter, YieldStrength and UltimateStrength of each bar; zero
	// UltimateStrength → YieldStrength (cautious when unknown).
	BarDiameter                     units.Length
	YieldStrength, UltimateStrength units.Pressure
	// ThreadArea is the tensile stress area of the bar's thread at the
	// nut; zero → DefaultThreadRatio × the gross area.
	ThreadArea units.Area
	// HoleDiameter is the drilled (grouted) hole's diameter.
	HoleDiameter units.Length
	// BondLength is the grouted length in rock; FreeLength is the length
	// from the rock surface to the start of the bond length.
	BondLength, FreeLength units.Length
	// GroutBarBond is the ultimate grout-to-bar bond; zero → DefaultGroutBarBond.
	GroutBarBond units.Pressure
	// ConeAngle is the half-angle of the uplift cone; zero → DefaultConeAngle.
	ConeAngle units.Angle
	// Plate is the head plate; the zero value means none described (its
	// checks are then not made).
	Plate HeadPlate
	// Water is the water level at the anchor's head: the rock below it
	// weighs its submerged unit weight in the cone.
	Water Water
	// VariableShare is the fraction of the pull due to variable actions
	// (0 to 1), used only by the partial-factor basis.
	VariableShare float64
}

func (r RockAnchor) validate() error {
	if r.Count < 0 {
		return invalid("RockAnchor.Count", "must not be negative")
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"RockAnchor.BarDiameter", float64(r.BarDiameter)}, {"RockAnchor.YieldStrength", float64(r.YieldStrength)},
		{"RockAnchor.HoleDiameter", float64(r.HoleDiameter)}, {"RockAnchor.BondLength", float64(r.BondLength)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if r.HoleDiameter <= r.BarDiameter {
		return invalid("RockAnchor.HoleDiameter", "must exceed the bar diameter")
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"RockAnchor.FreeLength", float64(r.FreeLength)}, {"RockAnchor.GroutBarBond", float64(r.GroutBarBond)},
		{"RockAnchor.Spacing", float64(r.Spacing)}, {"RockAnchor.UltimateStrength", float64(r.UltimateStrength)},
		{"RockAnchor.ThreadArea", float64(r.ThreadArea)}} {
		if err := nonNegative(f.name, f.v); err != nil {
			return err
		}
	}
	if r.UltimateStrength > 0 && r.UltimateStrength < r.YieldStrength {
		return invalid("RockAnchor.UltimateStrength", "must not be less than YieldStrength")
	}
	if float64(r.ThreadArea) > math.Pi/4*float64(r.BarDiameter)*float64(r.BarDiameter) {
		return invalid("RockAnchor.ThreadArea", "must not exceed the gross area of the bar")
	}
	if !(r.ConeAngle >= 0 && r.ConeAngle < 80*units.Degree) {
		return invalid("RockAnchor.ConeAngle", "must be between 0 and 80 deg (zero for the default)")
	}
	if r.Plate != (HeadPlate{}) {
		p := r.Plate
		for _, f := range []struct {
			name string
			v    float64
		}{{"RockAnchor.Plate.Side", float64(p.Side)}, {"RockAnchor.Plate.Thickness", float64(p.Thickness)}, {"RockAnchor.Plate.Yield", float64(p.Yield)}} {
			if err := positive(f.name, f.v); err != nil {
				return err
			}
		}
		if err := nonNegative("RockAnchor.Plate.NutDiameter", float64(p.NutDiameter)); err != nil {
			return err
		}
		if nut := r.nutDiameter(); !(float64(p.Side) > nut) {
			return invalid("RockAnchor.Plate.Side", "must exceed the nut's bearing diameter")
		}
		if !(p.Side > r.HoleDiameter) {
			return invalid("RockAnchor.Plate.Side", "must exceed the hole's diameter")
		}
	}
	if err := r.Water.validate("RockAnchor.Water"); err != nil {
		return err
	}
	return fraction("RockAnchor.VariableShare", r.VariableShare)
}

func (r RockAnchor) nutDiameter() float64 {
	if r.Plate.NutDiameter > 0 {
		return float64(r.Plate.NutDiameter)
	}
	return defaultNutRatio * float64(r.BarDiameter)
}

// cone returns the geometry of the rock mass the anchor's bars lift.
func (r RockAnchor) cone(angle units.Angle) coneGeometry {
	psi := r.ConeAngle
	if psi == 0 {
		psi = DefaultConeAngle
	}
	return coneGeometry{length: float64(r.FreeLength) + float64(r.BondLength)/2, alpha: float64(angle), psi: float64(psi),
		count: max(r.Count, 1), spacing: float64(r.Spacing)}
}

// ConeWeight returns the effective weight of the rock mass the anchor's
// bars lift when pulled at angle above horizontal, in rock s, and its
// volume: the union of the bars' cones along their axes (coneGeometry),
// below the water at its submerged unit weight.
func (r RockAnchor) ConeWeight(angle units.Angle, s Soil) (units.Force, units.Volume, error) {
	if err := r.validate(); err != nil {
		return 0, 0, err
	}
	if err := s.Validate(); err != nil {
		return 0, 0, err
	}
	if !(angle > 0 && angle <= math.Pi/2) {
		return 0, 0, invalid("angle", "must be more than 0 and at most 90 deg for a rock anchor")
	}
	w, v := r.coneWeight(angle, s)
	return units.Force(w), units.Volume(v), nil
}

func (r RockAnchor) coneWeight(angle units.Angle, s Soil) (w, v float64) {
	g := r.cone(angle)
	v = g.volume(0)
	dw := r.Water.depth()
	sub := 0.0
	if !math.IsInf(dw, 1) {
		sub = g.volume(math.Max(dw, 0))
	}
	return float64(s.UnitWeight)*(v-sub) + float64(s.SubmergedWeight())*sub, v
}

// Check verifies the rock anchor under a backstay pull at angle above
// horizontal on rock s, with result IDs:
//
//	anchor.rock.steel      T = pull/n  against  fy π d²/4                       (bar in the free length)
//	anchor.rock.thread     T  against  min(A_s fy, k2 fu A_s)                  (EN 1993-1-8:2005 Table 3.4, k2 0.9)
//	anchor.rock.groutbar   T  against  π d  Lb τ_grout-bar
//	anchor.rock.groutrock  T  against  π D  Lb τ_grout-rock                     (τ = Soil.GroutBond)
//	anchor.rock.cone       pull  against  W sin α, W of the bars' cones (ConeWeight) resolved along their axis,
//	                       rock shear ignored
//	anchor.rock.plate      p c²/2  against  fy t²/4 (per unit width), p = T/(a² − π D²/4), c = (a − d_n)/2
//	anchor.rock.platebearing  p  against the rock's allowable pressure (RockPressure), when known
//
// (bond and cone forms as in Littlejohn & Bruce, Rock anchors — state of
// the art, 1977, BS 8081:2015 and EN 1537:2013, from memory; the cone's
// apex at the middle of the bond length, its axis along the bar, the cones
// of a row of bars taken together as their union (common practice: the
// group's combined cone), rock beyond the plane of the heads ignored.
// With the rock's shear strength ignored, a cone pulled out along its axis
// is held only by the component of its weight along that axis, W sin α,
// so the whole pull is checked against it; for a vertical bar this is the
// usual pull against weight. Checking only the pull's vertical component
// against the whole weight would pass a flat bar whatever its pull: the
// cautious form is taken, and said in the result's basis. The
// head plate is a cantilever from the nut's edge under a uniform bearing
// pressure (common practice), its plastic resistance per unit width
// EN 1993-1-1:2005 6.2.5.)
//
// Allowable basis: factors Tendon (2.0) on the bar and its thread, Bond
// (3.0), Cone (2.0) and Steel (1.67) on the plate. Partial basis: the pull
// factored by set A1 (γG, γQ by VariableShare); the bar divided by GammaS,
// the thread and plate by γM2 and γM0, bond resistances by GammaA; the
// cone in EQU. EN 1997-1 expects anchorage resistance from tests: presumed
// bond values deserve caution.
//
// Special cases: a zero pull gives infinite provided factors; a soil that
// is not rock or has no GroutBond, or invalid input, gives an error
// wrapping ErrInvalid.
func (r RockAnchor) Check(pull units.Force, angle units.Angle, s Soil, b *Basis) ([]check.Result, error) {
	if err := r.validate(); err != nil {
		return nil, err
	}
	if err := nonNegative("pull", float64(pull)); err != nil {
		return nil, err
	}
	if !(angle > 0 && angle <= math.Pi/2) {
		return nil, invalid("angle", "must be more than 0 and at most 90 deg for a rock anchor")
	}
	if err := s.Validate(); err != nil {
		return nil, err
	}
	if !s.IsRock {
		return nil, invalid("Soil.IsRock", "is false: a rock anchor needs rock")
	}
	if !(s.GroutBond > 0) {
		return nil, invalid("Soil.GroutBond", "must be given (positive) for a rock anchor")
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	n := float64(max(r.Count, 1))
	t := float64(pull) / n
	d, dh, lb := float64(r.BarDiameter), float64(r.HoleDiameter), float64(r.BondLength)
	gross := math.Pi * d * d / 4
	steel := float64(r.YieldStrength) * gross
	as := float64(r.ThreadArea)
	if as == 0 {
		as = DefaultThreadRatio * gross
	}
	fu := float64(r.UltimateStrength)
	if fu == 0 {
		fu = float64(r.YieldStrength)
	}
	tauBar := float64(r.GroutBarBond)
	if tauBar == 0 {
		tauBar = float64(DefaultGroutBarBond)
	}
	gBar := math.Pi * d * lb * tauBar
	gRock := math.Pi * dh * lb * float64(s.GroutBond)
	sinA := math.Sin(float64(angle))
	cone, vol := r.coneWeight(angle, s)
	geo := r.cone(angle)
	v := float64(pull) * sinA
	along := cone * sinA // the cone's weight resolved along the bars' axis
	coneVals := []check.Value{
		check.Of("P", "whole pull along the bars", pull),
		check.Of("α", "inclination of the bars below horizontal", angle),
		check.Of("V", "upward component of the whole pull", units.Force(v)),
		check.Of("Vol", "volume of the bars' combined cone", units.Volume(vol)),
		check.Of("W_c", "effective weight of the combined cone", units.Force(cone)),
		check.Of("W_a", "the cone's weight resolved along the bars' axis, W_c sin α", units.Force(along)),
		check.Of("h", "depth of the cones' apex", units.Length(geo.length*sinA)),
		check.Of("ψ", "cone half-angle", units.Angle(geo.psi)),
		check.Of("n", "number of bars", units.Ratio(n)),
		check.Of("s", "spacing of the bars across the pull; zero takes their cones as one", r.Spacing),
	}
	coneVals = append(coneVals, r.Water.values()...)
	coneBasis := "the whole pull against the cone's weight resolved along the bars' axis, W sin α (cautious: with the rock's shear ignored, " +
		"the pull's vertical component against the whole weight would pass a flat bar whatever its pull)"
	coneNote := fmt.Sprintf("%d bar(s) at spacing %v sharing %v; cones along the bars' axis, apex %v deep at the middle of the bond length, "+
		"their union counted, rock shear strength and rock beyond the heads' plane ignored; %v", int(n), r.Spacing, pull, units.Length(geo.length*sinA), r.Water)
	barVals := []check.Value{check.Of("T", "force per bar", units.Force(t)), check.Of("A", "gross area of a bar", units.Area(gross)),
		check.Of("f_y", "yield strength of the bars", r.YieldStrength)}
	threadVals := []check.Value{check.Of("T", "force per bar", units.Force(t)), check.Of("A_s", "tensile stress area of the thread", units.Area(as)),
		check.Of("f_y", "yield strength of the bars", r.YieldStrength),
		check.Of("f_u", "ultimate strength used; f_y when none is given", units.Pressure(fu))}
	barBondVals := []check.Value{check.Of("τ_b", "ultimate grout-to-bar bond stress", units.Pressure(tauBar)),
		check.Of("d", "bar diameter", r.BarDiameter), check.Of("L_b", "bond length", r.BondLength)}
	rockBondVals := []check.Value{check.Of("τ_r", "ultimate grout-to-rock bond stress", s.GroutBond),
		check.Of("D", "hole diameter", r.HoleDiameter), check.Of("L_b", "bond length", r.BondLength)}

	// The head plate: bearing pressure p under it, cantilever moment per
	// unit width from the nut's edge, and its plastic moment.
	var plate plateForces
	if r.Plate != (HeadPlate{}) {
		plate = r.plateForces(t)
	}
	var rockQa RockBearing
	if plate.ok {
		if rb, err := RockPressure(s, r.Plate.Side); err == nil {
			rockQa = rb
		}
	}

	if !bs.PartialFactors {
		tendon, bond, cf, sf := def(bs.Tendon, 2), def(bs.Bond, 3), def(bs.Cone, 2), def(bs.Steel, defaultSteelFactor)
		out := []check.Result{
			check.Stability("anchor.rock.steel", "Rock anchor bar tension", units.KindForce, t, steel, tendon).
				WithBasis(fsBasis("the bar's yield force (BS 8081 permanent anchors, from memory)", tendon)).WithValues(barVals...),
			check.Stability("anchor.rock.thread", "Rock anchor bar thread", units.KindForce, t, math.Min(as*float64(r.YieldStrength), threadK2*fu*as), tendon).
				WithBasis(fsBasis("the thread's resistance min(A_s f_y, 0.9 f_u A_s) (EN 1993-1-8:2005 Table 3.4 with γM2 = 1)", tendon)).WithValues(threadVals...),
			check.Stability("anchor.rock.groutbar", "Rock anchor grout-to-bar bond", units.KindForce, t, gBar, bond).
				WithBasis(fsBasis("ultimate grout-to-bar bond (BS 8081, from memory)", bond)).
				WithValues(barBondVals...),
			check.Stability("anchor.rock.groutrock", "Rock anchor grout-to-rock bond", units.KindForce, t, gRock, bond).
				WithBasis(fsBasis("ultimate grout-to-rock bond (BS 8081, from memory)", bond)).
				WithValues(rockBondVals...),
			check.Stability("anchor.rock.cone", "Rock cone pull-out along the bars", units.KindForce, float64(pull), along, cf).
				WithBasis(fsBasis(coneBasis, cf)).WithValues(coneVals...).WithNote(coneNote),
		}
		return append(out, r.plateResults(plate, plate, 1, sf, rockQa, fsBasis("the plate's plastic resistance (EN 1993-1-1:2005 6.2.5)", sf))...), nil
	}
	sh := r.VariableShare
	a1 := bs.geoSets()[0] // DA2, or DA1 combination 1: set A1
	gAct := a1.factorOf(true, sh)
	equ := bs.equSet()
	gS, gA := def(bs.GammaS, 1.15), def(bs.GammaA, 1.1)
	gM0, gM2 := def(bs.GammaM0, 1.0), def(bs.GammaM2, 1.25)
	td := gAct * t
	label := fmt.Sprintf("EN 1997-1 Annex A set A1 on actions (factor %.3f); ", gAct)
	bondNote := "EN 1997-1 expects anchorage resistance from tests; presumed bond values deserve caution"
	for i := range barVals {
		if barVals[i].Symbol == "T" {
			barVals[i].Value, threadVals[i].Value = td, td
		}
	}
	out := []check.Result{
		check.Stability("anchor.rock.steel", "Rock anchor bar tension", units.KindForce, td, steel/gS, 1).
			WithBasis(label + fmt.Sprintf("steel γS %.2f (EN 1992-1-1, from memory)", gS)).WithValues(barVals...),
		check.Stability("anchor.rock.thread", "Rock anchor bar thread", units.KindForce, td,
			math.Min(as*float64(r.YieldStrength)/gM0, threadK2*fu*as/gM2), 1).
			WithBasis(label + fmt.Sprintf("EN 1993-1-8:2005 Table 3.4, k2 0.9, γM2 %.2f; yield of A_s with γM0 %.2f", gM2, gM0)).WithValues(threadVals...),
		check.Stability("anchor.rock.groutbar", "Rock anchor grout-to-bar bond", units.KindForce, td, gBar/gA, 1).
			WithBasis(label + fmt.Sprintf("anchorage γa %.2f (EN 1997-1 Table A.12, from memory)", gA)).
			WithValues(barBondVals...).WithNote(bondNote),
		check.Stability("anchor.rock.groutrock", "Rock anchor grout-to-rock bond", units.KindForce, td, gRock/gA, 1).
			WithBasis(label + fmt.Sprintf("anchorage γa %.2f (EN 1997-1 Table A.12, from memory)", gA)).
			WithValues(rockBondVals...).WithNote(bondNote),
		check.Stability("anchor.rock.cone", "Rock cone pull-out along the bars", units.KindForce, equ.factorOf(true, sh)*float64(pull), equ.gGfav*along, 1).
			WithBasis(equ.label + "; " + coneBasis).WithValues(coneVals...).WithNote(coneNote),
	}
	design := plate
	if plate.ok {
		design = r.plateForces(td)
	}
	return append(out, r.plateResults(design, plate, gM0, 1, rockQa,
		label+fmt.Sprintf("plate's plastic resistance, EN 1993-1-1:2005 6.2.5, γM0 %.2f", gM0))...), nil
}

// plateForces are the head plate's bearing pressure and cantilever moment
// per unit width under one bar's force.
type plateForces struct {
	ok     bool
	p      float64 // bearing pressure under the plate
	c      float64 // cantilever length from the nut's edge
	m, mRd float64 // moment and plastic moment per unit width (before factors)
}

func (r RockAnchor) plateForces(t float64) plateForces {
	a, tp := float64(r.Plate.Side), float64(r.Plate.Thickness)
	dh := float64(r.HoleDiameter)
	p := t / (a*a - math.Pi*dh*dh/4)
	c := (a - r.nutDiameter()) / 2
	return plateForces{ok: true, p: p, c: c, m: p * c * c / 2, mRd: float64(r.Plate.Yield) * tp * tp / 4}
}

// plateResults returns the head plate's bending result under design
// forces pd (the plastic bending stress 4m/t² against f_y/(γM0·fs), so that
// the ratio is m/m_Rd) and its bearing result under characteristic forces
// pk against the rock's allowable pressure rb (zero Allowable: not known,
// the pressure is recorded only), with the numbers behind it.
func (r RockAnchor) plateResults(pd, pk plateForces, gM0, fs float64, rb RockBearing, basis string) []check.Result {
	if !pd.ok {
		return nil
	}
	tp := float64(r.Plate.Thickness)
	vals := []check.Value{
		check.Of("p", "bearing pressure under the plate", units.Pressure(pd.p)),
		check.Of("c", "cantilever from the nut's edge", units.Length(pd.c)),
		check.Of("m", "moment per unit width at the nut's edge, p c²/2", units.Force(pd.m)),
		check.Of("t_p", "plate thickness", r.Plate.Thickness),
		check.Of("d_n", "diameter of the nut's bearing face", units.Length(r.nutDiameter())),
		check.Of("f_y", "yield strength of the plate", r.Plate.Yield),
	}
	out := []check.Result{
		check.Compare("anchor.rock.plate", "Rock anchor head plate bending", units.KindPressure, 4*pd.m/(tp*tp), float64(r.Plate.Yield)/gM0/fs).
			WithBasis(basis).WithValues(vals...).
			WithNote("plastic bending stress 4m/t² of a cantilever strip from the nut's edge under uniform bearing (common practice)"),
	}
	pv := check.Of("p", "bearing pressure under the plate, characteristic", units.Pressure(pk.p))
	if qa := float64(rb.Allowable); qa > 0 {
		return append(out, check.Compare("anchor.rock.platebearing", "Rock anchor head plate bearing on rock", units.KindPressure, pk.p, qa).
			WithBasis("the plate's bearing pressure under characteristic actions against the rock's allowable pressure (RockPressure): "+rb.Method).
			WithValues(append([]check.Value{pv}, rb.Values()...)...))
	}
	return append(out, check.Record("anchor.rock.platebearing", "Rock anchor head plate bearing pressure", units.KindPressure, pk.p).
		WithValues(pv).WithNote("no allowable pressure of the rock is known: compare with the rock's or the grout pad's strength"))
}

// factorOf returns the factor on a load of which share is variable.
func (s actionSet) factorOf(unfavourable bool, share float64) float64 {
	return (1-share)*s.factor(unfavourable, false) + share*s.factor(unfavourable, true)
}
