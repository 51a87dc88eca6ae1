package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Footing is a rectangular concrete pad under a tower column, with its
// base at Depth below the ground surface. Frame: x along the side Along
// (along the bridge for a tower footing), z up, origin at the centre of
// the base.
type Footing struct {
	// Along is the side along x, the direction of the horizontal load and
	// of the moment; Across is the side across it. Either may be the
	// shorter (the bearing factors take the shorter effective side as B').
	Along, Across units.Length
	// Thickness of the pad; Depth of its base below ground. Soil over the
	// pad (Depth − Thickness, over the plan area less Footprint) is counted
	// as weight.
	Thickness, Depth units.Length
	// Footprint is the plan area of the column standing on the pad, where
	// there is no soil cover (its weight comes with the load); zero means
	// none.
	Footprint units.Area
	// UnitWeight of the pad; zero → ConcreteUnitWeight (24 kN/m³).
	UnitWeight units.UnitWeight
	// Water is the water level at the footing: the pad and its soil cover
	// are buoyed, and bearing uses effective stresses.
	Water Water
	// GroundSlope is the inclination of the ground falling away from the
	// footing within reach of its failure zone; zero for level ground. It
	// enters the bearing equation's ground-inclination factors.
	GroundSlope units.Angle
}

// FootingLoad is the load from the tower, brought to the underside of the
// footing, about the centre of its base, excluding the pad's own weight
// and the soil on it (Check adds them).
type FootingLoad struct {
	// Vertical is positive downward; Horizontal positive toward +x.
	Vertical, Horizontal units.Force
	// Moment turns toward +x (presses the +x edge); it includes the
	// horizontal load's lever arm down to the underside.
	Moment units.Moment
	// HorizontalAcross and MomentAcross are the load's components across
	// (along the side Across, y): the horizontal force and the moment that
	// presses the +y edge, with its lever arm down to the underside. Zero
	// for a load along x only. Bearing and sliding take both directions at
	// once (both eccentricities, the resultant horizontal force);
	// overturning is checked about the edges across x (check the footing
	// turned for the edges across y).
	HorizontalAcross units.Force
	MomentAcross     units.Moment
	// VariableShare is the fraction of each component due to variable
	// actions (0 to 1), used only by the partial-factor basis.
	VariableShare float64
	// Split, when true, takes the variable part of each component from
	// VariableVertical, VariableHorizontal and VariableMoment (signed, in
	// the same convention) instead of VariableShare, the rest of each
	// component being permanent. Each part is then factored by the side it
	// acts on, so a permanent part opposing the variable one counts as
	// favourable (EN 1990 6.4.3.2, from memory). Partial-factor basis only.
	Split                    bool
	VariableVertical         units.Force
	VariableHorizontal       units.Force
	VariableMoment           units.Moment
	VariableHorizontalAcross units.Force
	VariableMomentAcross     units.Moment
}

// variable returns the variable parts of the vertical, horizontal and
// moment components, along x and across.
func (ld FootingLoad) variable() (v, h, m, hy, my float64) {
	if ld.Split {
		return float64(ld.VariableVertical), float64(ld.VariableHorizontal), float64(ld.VariableMoment),
			float64(ld.VariableHorizontalAcross), float64(ld.VariableMomentAcross)
	}
	k := ld.VariableShare
	return k * float64(ld.Vertical), k * float64(ld.Horizontal), k * float64(ld.Moment), k * float64(ld.HorizontalAcross), k * float64(ld.MomentAcross)
}

// design returns the design effect, in direction d (+1 or −1), of a
// component x of which q is variable: the permanent part x − q and the
// variable part q are each factored as unfavourable when they act in
// direction d and as favourable otherwise (a favourable variable part
// counts zero), and the sum is projected on d. This treats the favourable
// and unfavourable parts of the load as individual actions, as EN 1990
// Table A2.4(A) asks for static equilibrium (EQU; from memory).
func (s actionSet) design(x, q, d float64) float64 {
	p := x - q
	return d * (s.factor(p*d > 0, false)*p + s.factor(q*d > 0, true)*q)
}

// loadState is the tower load with its partial factors applied: one
// factor on every component of the permanent part (one source, EN 1990
// 6.4.3.1(4) note, from memory) and one on every component of the
// variable part (present or absent as a whole).
type loadState struct{ v, h, m, hy, my float64 }

// states returns the design load states to try: on the allowable basis the
// load as given; on a partial-factor set, the permanent part unfavourable
// or favourable with the variable part present or absent.
//
// The states are returned in a fixed array with their count, so that the
// design search's inner loop allocates nothing here.
func (s actionSet) states(ld FootingLoad) ([4]loadState, int) {
	var out [4]loadState
	if s.allowable {
		out[0] = loadState{float64(ld.Vertical), float64(ld.Horizontal), float64(ld.Moment), float64(ld.HorizontalAcross), float64(ld.MomentAcross)}
		return out, 1
	}
	qv, qh, qm, qhy, qmy := ld.variable()
	pv, ph, pm := float64(ld.Vertical)-qv, float64(ld.Horizontal)-qh, float64(ld.Moment)-qm
	phy, pmy := float64(ld.HorizontalAcross)-qhy, float64(ld.MomentAcross)-qmy
	n := 0
	for _, gp := range [2]float64{s.gG, s.gGfav} {
		for _, gq := range [2]float64{s.gQ, 0} {
			out[n] = loadState{gp*pv + gq*qv, gp*ph + gq*qh, gp*pm + gq*qm, gp*phy + gq*qhy, gp*pmy + gq*qmy}
			n++
		}
	}
	return out, n
}

func (f Footing) validate() error {
	for _, x := range []struct {
		name string
		v    float64
	}{{"Footing.Along", float64(f.Along)}, {"Footing.Across", float64(f.Across)}, {"Footing.Thickness", float64(f.Thickness)}} {
		if err := positive(x.name, x.v); err != nil {
			return err
		}
	}
	if err := nonNegative("Footing.Depth", float64(f.Depth)); err != nil {
		return err
	}
	if err := nonNegative("Footing.UnitWeight", float64(f.UnitWeight)); err != nil {
		return err
	}
	if !(f.GroundSlope >= 0 && f.GroundSlope < 90*units.Degree) {
		return invalid("Footing.GroundSlope", "must be at least 0 and less than 90 deg")
	}
	return f.Water.validate("Footing.Water")
}

func (ld FootingLoad) validate() error {
	if err := finite("FootingLoad.Vertical", float64(ld.Vertical)); err != nil {
		return err
	}
	if err := finite("FootingLoad.Horizontal", float64(ld.Horizontal)); err != nil {
		return err
	}
	if err := finite("FootingLoad.Moment", float64(ld.Moment)); err != nil {
		return err
	}
	for _, x := range []struct {
		name string
		v    float64
	}{{"FootingLoad.HorizontalAcross", float64(ld.HorizontalAcross)}, {"FootingLoad.MomentAcross", float64(ld.MomentAcross)},
		{"FootingLoad.VariableVertical", float64(ld.VariableVertical)}, {"FootingLoad.VariableHorizontal", float64(ld.VariableHorizontal)},
		{"FootingLoad.VariableMoment", float64(ld.VariableMoment)}, {"FootingLoad.VariableHorizontalAcross", float64(ld.VariableHorizontalAcross)},
		{"FootingLoad.VariableMomentAcross", float64(ld.VariableMomentAcross)}} {
		if math.IsNaN(x.v) || math.IsInf(x.v, 0) {
			return finite(x.name, x.v)
		}
	}
	return fraction("FootingLoad.VariableShare", ld.VariableShare)
}

// Check verifies the footing under the tower load on soil s with the
// bearing-capacity method m, with result IDs "footing.bearing",
// "footing.sliding" and "footing.overturning".
//
// With W the pad's and soil cover's weight, U the water's uplift and
// N = V + W − U:
//
//	bearing:     e = M/N along Along and e_y = M_y/N across; N/A' on A' = (Along − 2|e|)(Across − 2|e_y|)
//	             against qult (method m) under the resultant horizontal force √(H² + H_y²),
//	             and, on the allowable basis with Soil.Allowable, the peak contact pressure of
//	             both eccentricities (BiaxialContactPressure) against it, the worse governing;
//	             on rock that peak under characteristic actions against RockPressure
//	sliding:     driving √(H² + H_y²), resisting N tan δ drained (cohesion and passive ignored),
//	             A'c_u undrained (≤ 0.4 N where water or air reach the base; EN 1997-1 6.5.3)
//	overturning: about the base edge the moment turns toward:
//	             driving |M| + U·Along/2 (+ |V|·Along/2 when V pulls up), resisting (W + V⁺)·Along/2
//
// A fine soil (Soil.Undrained given) is checked in the drained and the
// undrained condition for bearing and sliding; the worse is reported, its
// basis naming the condition that governs, its values holding the
// utilisation in each ("U_dr", "U_un") and every number behind it.
//
// Allowable basis: the load as given, factors of safety 3.0 (bearing),
// 1.5 (sliding), 2.0 (overturning) unless set in b. Partial basis:
// overturning in EQU, sliding and bearing in GEO by the chosen design
// approach, each under every load state (the permanent part of the tower
// load unfavourable or favourable, its variable part present or absent,
// and for bearing the pad's weight unfavourable or favourable); the worst
// is reported.
//
// Special cases: no horizontal load or moment gives a provided factor of
// +Inf; a resultant outside the base fails bearing with a note; N ≤ 0
// (net uplift) passes bearing with a note while overturning fails.
// Invalid input, or rock with no allowable pressure or rock strength,
// returns an error wrapping ErrInvalid.
func (f Footing) Check(load FootingLoad, s Soil, m Method, b *Basis) ([]check.Result, error) {
	return f.AppendCheck(nil, load, s, m, b)
}

// AppendCheck is Check appending its results to dst, for callers that
// check many footings and reuse one slice.
func (f Footing) AppendCheck(dst []check.Result, load FootingLoad, s Soil, m Method, b *Basis) ([]check.Result, error) {
	if err := f.validate(); err != nil {
		return nil, err
	}
	if err := load.validate(); err != nil {
		return nil, err
	}
	if err := s.Validate(); err != nil {
		return nil, err
	}
	if !m.valid() {
		return nil, invalid("Method", fmt.Sprintf("%d is not a known method", int(m)))
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	if s.IsRock {
		if _, err := RockPressure(s, min(f.Along, f.Across)); err != nil {
			return nil, err
		}
	}
	ld := AnchorBlock{Length: f.Along, Width: f.Across, Height: f.Thickness, Depth: f.Depth, UnitWeight: f.UnitWeight,
		Water: f.Water}.loads(s)
	if f.Footprint > 0 {
		// No soil cover where the column stands: take its share off the
		// cover, which lies uniformly over the plan.
		gc := float64(f.UnitWeight)
		if gc == 0 {
			gc = float64(ConcreteUnitWeight)
		}
		plan := float64(f.Along) * float64(f.Across)
		cover := ld.weight - gc*plan*float64(f.Thickness)
		ld.weight -= cover * math.Min(float64(f.Footprint)/plan, 1)
	}
	conds := s.Conditions()
	var sets []actionSet
	fsBear, fsSlide, over := 1.0, 1.0, check.Result{}
	if !bs.PartialFactors {
		sets = []actionSet{bs.allowableSet()}
		fsBear, fsSlide = def(bs.Bearing, 3), def(bs.Sliding, 1.5)
		over = f.overturning(load, ld, sets[0], def(bs.Overturning, 2))
	} else {
		sets = bs.geoSets()
		over = f.overturning(load, ld, bs.equSet(), 1)
	}
	bearSets := sets
	if s.IsRock { // presumed bearing values go with characteristic actions
		bearSets = []actionSet{bs.allowableSet()}
	}
	// Bearing: each condition's worst set found on the ratios alone (the
	// terse set's numbers are the full set's), and only the result that
	// governs built in full (governing reads the others' ratios).
	var bearPer, slidePer [2]conditioned
	var bearSet [2]int
	nb := 0
	// Nothing to choose from: one condition and one set, built in full
	// at once.
	single := len(bearSets) == 1 && (len(conds) == 1 || s.IsRock)
	for i, cond := range conds {
		for j, set := range sets {
			r := f.sliding(load, s, cond, ld, set, fsSlide)
			if j == 0 || r.Ratio > slidePer[i].r.Ratio {
				slidePer[i] = conditioned{cond, r}
			}
		}
		if s.IsRock && i > 0 {
			continue
		}
		nb++
		for j, set := range bearSets {
			scoring := set
			scoring.terse = set.terse || !single
			r, err := f.bearing(load, s, m, cond, ld, scoring, fsBear)
			if err != nil {
				return nil, err
			}
			if j == 0 || r.Ratio > bearPer[i].r.Ratio {
				bearPer[i], bearSet[i] = conditioned{cond, r}, j
			}
		}
	}
	if !bs.Terse && !single {
		w := worstCondition(bearPer[:nb])
		r, err := f.bearing(load, s, m, bearPer[w].cond, ld, bearSets[bearSet[w]], fsBear)
		if err != nil {
			return nil, err
		}
		bearPer[w].r = r
	}
	bear := bearPer[0].r
	if !s.IsRock {
		bear = governing(sets[0], bearPer[:len(conds)])
	}
	slide := governing(sets[0], slidePer[:len(conds)])
	if !bs.Terse && f.Water.Present {
		bear, slide, over = bear.WithValues(f.Water.values()...), slide.WithValues(f.Water.values()...), over.WithValues(f.Water.values()...)
	}
	return append(dst, bear, slide, over), nil
}

// waterAtBase reports whether water stands at or above the footing's base.
func (f Footing) waterAtBase() bool { return f.Water.depth() <= float64(f.Depth) }

// bearing checks the base pressure under every design load state and
// weight factor (the pad and its cover unfavourable or favourable) and
// keeps the worst. The worst is found on the ratios alone (the terse
// set's numbers are the full set's), and only its result is built in
// full.
func (f Footing) bearing(load FootingLoad, s Soil, m Method, cond Condition, ld blockLoads, set actionSet, fs float64) (check.Result, error) {
	const id, title = "footing.bearing", "Footing bearing pressure"
	one := func(st loadState, gw float64, set actionSet) (check.Result, error) {
		n := gw*(ld.weight-ld.buoyancy) + st.v
		if n <= 0 {
			r := check.Compare(id, title, units.KindPressure, 0, 0).WithBasis(basisOf(set, "the bearing pressure", fs))
			r = set.values(r, check.Of("N", "effective normal force on the base", units.Force(n)))
			return set.note(r, "net uplift: the footing lifts off its base"), nil
		}
		bl := baseLoad{n: n, h: math.Abs(st.h), e: st.m / n, hy: math.Abs(st.hy), ey: st.my / n, biaxial: true}
		if s.IsRock {
			return rockBaseBearing(id, title, f.Along, f.Across, bl, s, set)
		}
		return soilBearing(id, title, f.Along, f.Across, f.Depth, f.Water, f.GroundSlope, bl, s, m, cond, set, fs)
	}
	weights := [2]float64{set.gG, set.gGfav}
	nw := 1
	if set.gGfav != set.gG {
		nw = 2
	}
	states, ns := set.states(load)
	if ns*nw == 1 {
		return one(states[0], weights[0], set) // nothing to choose from
	}
	scoring := set
	scoring.terse = true
	var worst check.Result
	var worstState loadState
	var worstWeight float64
	first := true
	for _, st := range states[:ns] {
		for _, gw := range weights[:nw] {
			r, err := one(st, gw, scoring)
			if err != nil {
				return check.Result{}, err
			}
			if first || r.Ratio > worst.Ratio {
				worst, worstState, worstWeight, first = r, st, gw, false
			}
		}
	}
	if set.terse || first {
		return worst, nil
	}
	return one(worstState, worstWeight, set)
}

// sliding checks base shear under every design load state, the pad's
// weight favourable and the water's uplift unfavourable, and keeps the
// worst.
func (f Footing) sliding(load FootingLoad, s Soil, cond Condition, ld blockLoads, set actionSet, fs float64) check.Result {
	str := s.strengthIn(cond, set)
	var worst check.Result
	var worstN, worstE, worstEy, worstH, worstHy float64
	var worstShear baseShear
	states, ns := set.states(load)
	for i, st := range states[:ns] {
		n := set.gGfav*ld.weight - set.gG*ld.buoyancy + st.v
		e, ey := 0.0, 0.0
		if n > 0 {
			e, ey = st.m/n, st.my/n
		}
		bsh := shearResistance(n, e, ey, float64(f.Along), float64(f.Across), str, f.waterAtBase())
		r := check.Stability("footing.sliding", "Footing sliding", units.KindForce, math.Hypot(st.h, st.hy), bsh.r/set.gRh, fs)
		if i == 0 || r.Ratio > worst.Ratio {
			worst, worstN, worstE, worstEy, worstShear = r, n, e, ey, bsh
			worstH, worstHy = math.Abs(st.h), math.Abs(st.hy)
		}
	}
	worst = worst.WithBasis(basisOf(set, "base shear", fs))
	if set.terse {
		return worst
	}
	vs, note := shearValues(str, worstN, worstShear)
	vs = append(vs,
		check.Of("H", "horizontal force on the base in the check's direction", units.Force(worstH)),
		check.Of("H_y", "horizontal force on the base square to the check's direction", units.Force(worstHy)),
		check.Of("e", "eccentricity of the base resultant in the check's direction", units.Length(worstE)),
		check.Of("e_y", "eccentricity of the base resultant square to the check's direction", units.Length(worstEy)))
	if str.cond == Drained {
		note += "; cohesion and passive resistance ignored"
	} else {
		note += "; passive resistance ignored"
	}
	worst = worst.WithValues(vs...).WithNote(note)
	if f.Water.Present {
		worst = worst.WithNote(f.Water.String())
	}
	return worst
}

// overturning checks the moment about the base edge the load turns the
// footing toward. On the allowable basis the load is taken as given; in
// EQU each part of each component is factored by the side it acts on
// (destabilising moment parts unfavourable, a downward load favourable),
// the favourable and unfavourable parts counting as individual actions.
func (f Footing) overturning(load FootingLoad, ld blockLoads, set actionSet, fs float64) check.Result {
	half := float64(f.Along) / 2
	qv, _, qm, _, _ := load.variable()
	v, mx := float64(load.Vertical), float64(load.Moment)
	mo := math.Max(set.design(mx, qm, 1), set.design(mx, qm, -1))
	down := -set.design(v, qv, -1) // downward parts favourable, upward unfavourable
	if set.allowable {
		mo, down = math.Abs(mx), v
	}
	dst := math.Max(mo, 0) + set.gG*ld.buoyancy*half
	stb := set.gGfav * ld.weight * half
	if down >= 0 {
		stb += down * half
	} else {
		dst -= down * half
	}
	r := check.Stability("footing.overturning", "Footing overturning about the base edge", units.KindMoment, dst, stb, fs).
		WithBasis(basisOf(set, "the restoring moment about the base edge", fs))
	if set.terse {
		return r
	}
	return r.WithValues(
		check.Of("V", "vertical load from the column, characteristic, downward positive", load.Vertical),
		check.Of("M", "moment of the column's load about the base centre, characteristic", load.Moment),
		check.Of("W", "weight of the pad and its soil cover", units.Force(ld.weight)),
		check.Of("U", "uplift of the water on the pad", units.Force(ld.buoyancy)))
}
