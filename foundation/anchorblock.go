package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// ConcreteUnitWeight is the default unit weight of plain concrete,
// 24 kN/m³ (EN 1991-1-1 Table A.1, from memory; 25 kN/m³ when reinforced).
const ConcreteUnitWeight = 24 * units.KilonewtonPerCubicMetre

// AnchorBlock is a rectangular concrete gravity block, optionally stepped
// (Steps), cast in the ground with its base at Depth below the ground
// surface, holding one or more backstays.
//
// Frame: origin at the back bottom edge of the block (the base edge
// farthest from the tower), x horizontal toward the tower (the direction
// the backstays pull), z up. The base spans 0 ≤ x ≤ Length; the front
// toe, about which the block overturns, is the base edge at x = Length;
// the front face (x = Length) bears on the soil in passive resistance.
type AnchorBlock struct {
	// Length is along the pull (x), Width across it, Height vertical.
	Length, Width, Height units.Length
	// Depth is the depth of the base below the ground surface. When Depth
	// exceeds Height the block is buried under Depth − Height of soil,
	// whose weight over the block's plan area is counted as resisting.
	Depth units.Length
	// UnitWeight of the block; zero → ConcreteUnitWeight (24 kN/m³).
	UnitWeight units.UnitWeight
	// PassiveMobilisation is the fraction of the Rankine passive resistance
	// of the soil against the front face counted in the sliding check;
	// zero → none (the cautious default). Values near 0.5 are common
	// practice where the block is cast against undisturbed soil. When it
	// is positive the active thrust on the back face is added to the
	// driving force (common practice).
	PassiveMobilisation float64
	// Water is the water level at the block: the block is buoyed over its
	// submerged height, soil below the water weighs its submerged unit
	// weight, and bearing and passive resistance use effective stresses.
	Water Water
	// GroundSlope is the inclination of the ground falling away from the
	// block within reach of its failure zones; zero for level ground. It
	// enters the bearing equation's ground-inclination factors and the
	// passive resistance on the front face (see Check).
	GroundSlope units.Angle
	// BackSlope is the inclination of the ground rising behind the block
	// (away from the pull); zero for level ground. Drained, the active
	// thrust on the back face, counted with the passive resistance, takes
	// Coulomb's Ka for that backslope (δ = 0), at most the slope of φ'.
	BackSlope units.Angle
	// Steps are concrete parts standing on the block (a stepped block);
	// none for a plain rectangular block.
	Steps []Step
}

func (a AnchorBlock) validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"AnchorBlock.Length", float64(a.Length)}, {"AnchorBlock.Width", float64(a.Width)}, {"AnchorBlock.Height", float64(a.Height)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if err := nonNegative("AnchorBlock.Depth", float64(a.Depth)); err != nil {
		return err
	}
	if err := nonNegative("AnchorBlock.UnitWeight", float64(a.UnitWeight)); err != nil {
		return err
	}
	if err := fraction("AnchorBlock.PassiveMobilisation", a.PassiveMobilisation); err != nil {
		return err
	}
	if err := a.Water.validate("AnchorBlock.Water"); err != nil {
		return err
	}
	if !(a.GroundSlope >= 0 && a.GroundSlope < 90*units.Degree) {
		return invalid("AnchorBlock.GroundSlope", "must be at least 0 and less than 90 deg")
	}
	if !(a.BackSlope >= 0 && a.BackSlope < 90*units.Degree) {
		return invalid("AnchorBlock.BackSlope", "must be at least 0 and less than 90 deg")
	}
	for i, st := range a.Steps {
		name := fmt.Sprintf("AnchorBlock.Steps[%d]", i)
		for _, v := range []float64{float64(st.X0), float64(st.X1), float64(st.Z0), float64(st.Z1), float64(st.Width)} {
			if err := finite(name, v); err != nil {
				return err
			}
		}
		if !(0 <= st.X0 && st.X0 < st.X1 && st.X1 <= a.Length) {
			return invalid(name, "must satisfy 0 ≤ X0 < X1 ≤ Length")
		}
		if !(a.Height <= st.Z0 && st.Z0 < st.Z1) {
			return invalid(name, "must satisfy Height ≤ Z0 < Z1: a step stands on the block")
		}
		if !(st.Width > 0 && st.Width <= a.Width) {
			return invalid(name+".Width", "must be positive and at most the block's width")
		}
	}
	return nil
}

// contains reports whether the point (x, z) lies within the block or one
// of its steps.
func (a AnchorBlock) contains(x, z units.Length) bool {
	if x >= 0 && x <= a.Length && z >= 0 && z <= a.Height {
		return true
	}
	for _, st := range a.Steps {
		if x >= st.X0 && x <= st.X1 && z >= st.Z0 && z <= st.Z1 {
			return true
		}
	}
	return false
}

// rankineLevel returns Rankine's coefficient for level ground and a
// vertical smooth face: tan²(45° ∓ φ/2), 1 at φ = 0.
func rankineLevel(phi units.Angle, passive bool) float64 {
	t := math.Tan(math.Pi/4 - float64(phi)/2)
	if passive {
		t = math.Tan(math.Pi/4 + float64(phi)/2)
	}
	return t * t
}

// activeK returns the active coefficient on a vertical smooth face in
// strength st with the ground rising behind it at b: Rankine's on level
// ground; Coulomb's for the backslope (δ = 0; Murthy eq. 11.51 form), the
// slope taken at most φ (a steeper bank stands by its cohesion, which the
// thrust's cohesion term already counts); 1 undrained (total stress).
func activeK(st strength, b units.Angle) float64 {
	if st.cond != Drained {
		return 1
	}
	phi := units.Angle(st.phi)
	if b == 0 {
		return rankineLevel(phi, false)
	}
	k, err := CoulombActive(phi, 0, 0, min(b, phi))
	if err != nil {
		return rankineLevel(phi, false)
	}
	return k
}

// passiveK returns the passive coefficient on a vertical smooth face in
// strength st with the ground falling away in front at b (see
// AnchorBlock.earth): zero where no passive resistance is counted.
func passiveK(st strength, b units.Angle) float64 {
	if st.cond != Drained {
		return 1 // on falling ground the thrust is reduced by undrainedWedge
	}
	phi := units.Angle(st.phi)
	if b == 0 {
		return rankineLevel(phi, true)
	}
	if b >= phi {
		return 0
	}
	k, err := CoulombPassive(phi, 0, 0, -b)
	if err != nil {
		return 0
	}
	return k
}

// undrainedWedge returns, undrained on ground falling at b in front of a
// smooth vertical face reaching depth h, the passive thrust over that on
// level ground; 1 drained or on level ground. A plane wedge in total
// stress (Coulomb's method; the statics derived here): a failure plane at
// t = tan θ from the face's foot meets the ground falling at tan b after
// x = h/(t + tan b), the wedge weighs ½γhx and the plane carries c_u over
// its length, so the thrust is
//
//	P(t) = (½γh² t + c_u h (1 + t²)) / (t + tan b)
//
// least at t = √(tan²b + 1 − ½γh tan b/c_u) − tan b (at t = 0 where that
// is not positive); on level ground t = 1 and P = ½γh² + 2c_u h, Rankine's
// undrained passive thrust. The ratio scales the layered thrust of the
// face (the wedge taken from the surface, at the soil's total unit weight:
// its weight drives the wedge down the slope, cautious).
func undrainedWedge(st strength, gamma, h float64, b units.Angle) float64 {
	if st.cond == Drained || b <= 0 || !(h > 0) || !(st.c > 0) {
		return 1
	}
	a, c, tb := 0.5*gamma*h*h, st.c*h, math.Tan(float64(b))
	p := func(t float64) float64 { return (a*t + c*(1+t*t)) / (t + tb) }
	t := 0.0
	if disc := tb*tb + 1 - a*tb/c; disc > 0 {
		t = math.Max(math.Sqrt(disc)-tb, 0)
	}
	return math.Min(p(t)/(a+2*c), 1)
}

// Step is a rectangular concrete part standing on an anchor block, making
// a stepped block, in the block's frame: it spans X0…X1 along the pull,
// Z0…Z1 in height, and Width across (centred on the block). Steps sit on
// the block (Z0 ≥ Height) or on one another, and must not overlap; the
// base stays the block's.
type Step struct {
	X0, X1, Z0, Z1 units.Length
	Width          units.Length
}

// blockLoads are the characteristic forces of an anchor block or footing,
// other than the applied loads: the weight of concrete and soil cover with
// the x of its line of action, and the water's uplift with its x.
type blockLoads struct {
	weight, xw   float64
	buoyancy, xu float64
}

// overlap returns the length common to [a0, a1] and [b0, b1], or zero.
func overlap(a0, a1, b0, b1 float64) float64 {
	return math.Max(math.Min(a1, b1)-math.Max(a0, b0), 0)
}

func (a AnchorBlock) loads(s Soil) blockLoads {
	l, w, h, d := float64(a.Length), float64(a.Width), float64(a.Height), float64(a.Depth)
	gc := float64(a.UnitWeight)
	if gc == 0 {
		gc = float64(ConcreteUnitWeight)
	}
	gs, gsub, gw := float64(s.UnitWeight), float64(s.SubmergedWeight()), float64(WaterUnitWeight)
	// Heights in the block frame: ground at z = d, water table at zw.
	zw := d - a.Water.depth() // −Inf without water
	var wsum, wmom, usum, umom float64
	add := func(x0, x1, z0, z1, width float64) {
		plan := (x1 - x0) * width
		xc := (x0 + x1) / 2
		wc := gc * plan * (z1 - z0)
		u := gw * plan * overlap(z0, z1, math.Inf(-1), zw)
		wsum += wc
		wmom += wc * xc
		usum += u
		umom += u * xc
	}
	// soil adds (sign +1) or removes (−1) soil between z0 and z1 below ground.
	soil := func(sign, x0, x1, z0, z1, width float64) {
		plan := (x1 - x0) * width
		ws := sign * plan * (gs*overlap(z0, z1, math.Max(zw, h), d) + gsub*overlap(z0, z1, h, math.Min(zw, d)))
		wsum += ws
		wmom += ws * (x0 + x1) / 2
	}
	add(0, l, 0, h, w)
	soil(1, 0, l, h, d, w)
	for _, st := range a.Steps {
		x0, x1, z0, z1, sw := float64(st.X0), float64(st.X1), float64(st.Z0), float64(st.Z1), float64(st.Width)
		add(x0, x1, z0, z1, sw)
		soil(-1, x0, x1, z0, z1, sw)
	}
	r := blockLoads{weight: wsum, xw: l / 2, buoyancy: usum, xu: l / 2}
	if wsum > 0 {
		r.xw = wmom / wsum
	}
	if usum > 0 {
		r.xu = umom / usum
	}
	return r
}

// earth returns the passive resistance on the front face and the active
// thrust on the back face, each over the block's width, with their heights
// above the base, in strength st (drained: Rankine's Kp, Ka with Bell's
// cohesion terms; undrained: K = 1 and c_u), effective stresses with the
// block's water level (the water's own pressure acts alike on both faces).
//
// Ground falling away at GroundSlope β: drained, Kp is Coulomb's for a
// smooth vertical face and ground falling at β in front (δ = 0, plane
// wedge), and none at or beyond φ; undrained, the level-ground thrust
// scaled by undrainedWedge.
func (a AnchorBlock) earth(s Soil, st strength) (pp, pa EarthForce) {
	d := float64(a.Depth)
	top := math.Max(d-float64(a.Height), 0)
	kp, ka := passiveK(st, a.GroundSlope), activeK(st, a.BackSlope)
	g, gs, dw := float64(s.UnitWeight), float64(s.SubmergedWeight()), a.Water.depth()
	if kp > 0 {
		pp = layeredEarth(kp, st.c, 1, top, d, g, gs, dw)
		pp.Force *= units.Force(undrainedWedge(st, g, d, a.GroundSlope))
	}
	pa = layeredEarth(ka, st.c, -1, top, d, g, gs, dw)
	pp.Force *= units.Force(a.Width)
	pa.Force *= units.Force(a.Width)
	return pp, pa
}

// Check verifies the block against the pulls on soil s, bearing by method
// m, with result IDs "anchor.sliding", "anchor.overturning",
// "anchor.uplift" and "anchor.bearing". Element and Case are left empty
// for the caller.
//
// With Fx = Σ F cos α, Fz = Σ F sin α, W the weight of the block and its
// steps, Ws the soil cover's (less the soil the steps displace; submerged
// below the water), xW their centroid, U the water's uplift (γw times the
// submerged concrete volume) at xU and N = W + Ws − U − Fz:
//
//	sliding:     driving Fx (+ Pa, active on the back face, when passive is counted)
//	             resisting R_b + μ Pp, R_b = N tan δ drained, A'c_u undrained, at most 0.4 N
//	             (EN 1997-1 6.5.3(12): the pull opens a gap behind the block, so water or air
//	             can always reach its base), cohesion ignored drained
//	overturning: about the front toe (x = Length, z = 0)
//	             driving Σ (Fx·Z + Fz·(Length − X)) + U·(Length − xU)
//	             resisting (W + Ws)·(Length − xW)    (earth pressures ignored)
//	uplift:      driving Fz, resisting W + Ws − U   (side friction ignored)
//	bearing:     N on the base with eccentricity e = M/N from the base centre,
//	             M = Σ (Fx·Z + Fz·(Length/2 − X)) + (W + Ws)(xW − Length/2) − U(xU − Length/2);
//	             earth pressures ignored; N/A' against qult of method m on the effective
//	             base B' = Length − 2|e| (soil; allowable basis with Soil.Allowable: besides,
//	             the peak contact pressure against it, the worse governing), or on rock the
//	             peak contact pressure under characteristic actions against RockPressure
//
// A fine soil (Soil.Undrained given) is checked in both the drained and
// the undrained condition for sliding and bearing; the result is the worse,
// its basis names the condition that governs and its values hold the
// utilisation in each ("U_dr", "U_un"). Every number behind a result is
// among its Values: the base's normal force N, horizontal force H,
// eccentricity e, resultant position x_R from the back edge, contact
// pressures q_max, q_min and contact length l_c, the passive and active
// forces P_p, P_a, and the whole bearing equation (Bearing.Values).
//
// Allowable basis: each factor of safety is required on the driving side
// (check.Stability) and reported as provided; bearing compares N/A' with
// qult/FS. Partial basis (EN 1997-1 Annex A): overturning and uplift in
// EQU with M2 soil strength; sliding and bearing in GEO by the chosen
// design approach, the worse combination reported (bearing with each pull
// taken both unfavourable and favourable). Required factor 1 then.
//
// Special cases: no pull, or pulls that do not drive a mode, give a
// provided factor of +Inf; a block that lifts off reports bearing as
// passing with a note (uplift fails); a resultant outside the base fails
// bearing with a note. Invalid input, an attachment point outside the
// block, or a block on rock with no allowable pressure or rock strength
// returns an error wrapping ErrInvalid.
func (a AnchorBlock) Check(pulls []AnchorPull, s Soil, m Method, b *Basis) ([]check.Result, error) {
	return a.AppendCheck(nil, pulls, s, m, b)
}

// AppendCheck is Check appending its results to dst, for callers that
// check many blocks and reuse one slice (strconv.AppendFloat's pattern).
func (a AnchorBlock) AppendCheck(dst []check.Result, pulls []AnchorPull, s Soil, m Method, b *Basis) ([]check.Result, error) {
	if err := a.validate(); err != nil {
		return nil, err
	}
	if err := s.Validate(); err != nil {
		return nil, err
	}
	if !m.valid() {
		return nil, invalid("Method", fmt.Sprintf("%d is not a known method", int(m)))
	}
	if err := validatePulls(pulls, true); err != nil {
		return nil, err
	}
	for i, p := range pulls {
		if !a.contains(p.X, p.Z) {
			return nil, invalid(fmt.Sprintf("pulls[%d]", i), "attachment point must lie within the block or a step")
		}
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	if s.IsRock {
		if _, err := RockPressure(s, min(a.Length, a.Width)); err != nil {
			return nil, err
		}
	}
	ld := a.loads(s)
	conds := s.Conditions()
	var slide, over, lift, bear check.Result
	if !bs.PartialFactors {
		set := bs.allowableSet()
		if slide, err = a.slidingIn(conds, pulls, s, ld, []actionSet{set}, def(bs.Sliding, 1.5)); err != nil {
			return nil, err
		}
		over = a.overturning(pulls, ld, set, def(bs.Overturning, 1.5))
		lift = a.uplift(pulls, ld, set, def(bs.Uplift, 1.5))
		if bear, err = a.bearingIn(conds, pulls, s, m, ld, []actionSet{set}, def(bs.Bearing, 3)); err != nil {
			return nil, err
		}
		return append(dst, a.watered(bs, slide), a.watered(bs, over), a.watered(bs, lift), a.watered(bs, bear)), nil
	}
	equ := bs.equSet()
	over = a.overturning(pulls, ld, equ, 1)
	lift = a.uplift(pulls, ld, equ, 1)
	geo := bs.geoSets()
	if slide, err = a.slidingIn(conds, pulls, s, ld, geo, 1); err != nil {
		return nil, err
	}
	if s.IsRock { // presumed bearing values go with characteristic actions
		geo = []actionSet{bs.allowableSet()}
	}
	if bear, err = a.bearingIn(conds, pulls, s, m, ld, geo, 1); err != nil {
		return nil, err
	}
	return append(dst, a.watered(bs, slide), a.watered(bs, over), a.watered(bs, lift), a.watered(bs, bear)), nil
}

// watered returns r with the water's depth among its values, when there
// is water and the basis is not terse.
func (a AnchorBlock) watered(bs Basis, r check.Result) check.Result {
	if bs.Terse || !a.Water.Present {
		return r
	}
	return r.WithValues(a.Water.values()...)
}

// slidingIn returns the worst sliding result over the conditions and
// action sets, the governing condition stated.
func (a AnchorBlock) slidingIn(conds []Condition, pulls []AnchorPull, s Soil, ld blockLoads, sets []actionSet, fs float64) (check.Result, error) {
	var per [2]conditioned
	for i, cond := range conds {
		for j, set := range sets {
			r := a.sliding(pulls, s, cond, ld, set, fs)
			if j == 0 || r.Ratio > per[i].r.Ratio {
				per[i] = conditioned{cond, r}
			}
		}
	}
	return governing(sets[0], per[:len(conds)]), nil
}

// bearingIn returns the worst bearing result over the conditions, action
// sets and load arrangements (on a partial set: the pulls unfavourable or
// favourable, the block's weight unfavourable or favourable).
func (a AnchorBlock) bearingIn(conds []Condition, pulls []AnchorPull, s Soil, m Method, ld blockLoads, sets []actionSet, fs float64) (check.Result, error) {
	if s.IsRock {
		conds = drainedOnly[:1]
	}
	// Each condition's worst set and arrangement is found on the ratios
	// alone (the terse set's numbers are the full set's); only the result
	// that governs is built in full (governing reads the others' ratios).
	var per [2]conditioned
	type arrangement struct {
		set                    actionSet
		favourable, lightBlock bool
	}
	var worst [2]arrangement
	// Nothing to choose from (one condition, set and arrangement): built
	// in full at once.
	single := (len(conds) == 1 || s.IsRock) && len(sets) == 1 && sets[0].allowable
	for i, cond := range conds {
		first := true
		for _, set := range sets {
			arrangements := [][2]bool{{false, false}}
			if !set.allowable {
				// The light block under full pulls gives the largest
				// inclination and eccentricity.
				arrangements = [][2]bool{{false, false}, {true, false}, {false, true}}
			}
			scoring := set
			scoring.terse = set.terse || !single
			for _, c := range arrangements {
				r, err := a.bearing(pulls, s, m, cond, ld, scoring, c[0], c[1], fs)
				if err != nil {
					return check.Result{}, err
				}
				if first || r.Ratio > per[i].r.Ratio {
					per[i], worst[i], first = conditioned{cond, r}, arrangement{set, c[0], c[1]}, false
				}
			}
		}
	}
	n := len(conds)
	if s.IsRock {
		n = 1
	}
	if !sets[0].terse && !single {
		w := worstCondition(per[:n])
		r, err := a.bearing(pulls, s, m, per[w].cond, ld, worst[w].set, worst[w].favourable, worst[w].lightBlock, fs)
		if err != nil {
			return check.Result{}, err
		}
		per[w].r = r
	}
	if s.IsRock {
		return per[0].r, nil
	}
	return governing(sets[0], per[:n]), nil
}

// base returns the resultant on the base with the given factors on the
// pulls (unfavourable unless favourable) and on the block's weight (gw)
// and the water's uplift (gu), and the pulls' horizontal component.
func (a AnchorBlock) base(pulls []AnchorPull, ld blockLoads, set actionSet, favourable bool, gw, gu float64) baseLoad {
	l := float64(a.Length)
	n := gw*ld.weight - gu*ld.buoyancy
	h, m := 0.0, gw*ld.weight*(ld.xw-l/2)-gu*ld.buoyancy*(ld.xu-l/2)
	for _, p := range pulls {
		x, z := p.components()
		g := set.factor(!favourable, p.Variable)
		n -= g * z
		h += g * x
		m += g * (x*float64(p.Z) + z*(l/2-float64(p.X)))
	}
	e := 0.0
	if n > 0 {
		e = m / n
	}
	return baseLoad{n: n, h: h, e: e}
}

func (a AnchorBlock) sliding(pulls []AnchorPull, s Soil, cond Condition, ld blockLoads, set actionSet, fs float64) check.Result {
	st := s.strengthIn(cond, set)
	// Pulls unfavourable, the block's weight favourable, uplift unfavourable.
	bl := a.base(pulls, ld, set, false, set.gGfav, set.gG)
	// The pull draws the block away from the soil behind it: the gap at
	// the back face reaches the base, so water or air can always reach the
	// interface, and EN 1997-1 6.5.3(12) caps the undrained resistance at
	// 0.4 N whatever the water level (cautious).
	bsh := shearResistance(bl.n, bl.e, 0, float64(a.Length), float64(a.Width), st, true)
	res := bsh.r / set.gRh
	drive := 0.0
	for _, p := range pulls {
		x, _ := p.components()
		drive += set.factor(x > 0, p.Variable) * x
	}
	mu := a.PassiveMobilisation
	var pp, pa EarthForce
	if mu > 0 {
		pp, pa = a.earth(s, st)
		res += mu * float64(pp.Force) / set.gRe
		drive += set.gG * float64(pa.Force)
	}
	r := check.Stability("anchor.sliding", "Anchor block sliding", units.KindForce, drive, res, fs).
		WithBasis(basisOf(set, "base shear and mobilised passive resistance", fs))
	if set.terse {
		return r
	}
	if st.cond == Undrained {
		r = r.WithBasis(r.Basis + "; undrained base shear at most 0.4 N (EN 1997-1 6.5.3(12)), the pull opening a gap behind the block " +
			"through which water or air reach its base (cautious)")
	}
	vs, note := shearValues(st, bl.n, bsh)
	vs = append(vs, check.Of("e", "eccentricity of the base resultant", units.Length(bl.e)))
	if mu > 0 {
		vs = append(vs,
			check.Of("μ", "fraction of the passive resistance mobilised", units.Ratio(mu)),
			check.Of("P_p", "full passive resistance on the front face", pp.Force),
			check.Of("P_a", "active thrust on the back face", pa.Force))
		note += fmt.Sprintf("; passive resistance %v mobilised at %.2f, active thrust %v on the back face", pp.Force, mu, pa.Force)
		if b := a.BackSlope; b > 0 {
			vs = append(vs, check.Of("β_b", "slope of the ground rising behind the block", b),
				check.Of("K_a", "active coefficient on the back face", units.Ratio(activeK(st, b))))
		}
		if b := a.GroundSlope; b > 0 {
			kp := passiveK(st, b)
			vs = append(vs, check.Of("β_g", "slope of the ground falling away from the block", b),
				check.Of("K_p", "passive coefficient on the front face", units.Ratio(kp)))
			switch {
			case st.cond == Undrained:
				rho := undrainedWedge(st, float64(s.UnitWeight), float64(a.Depth), b)
				vs = append(vs, check.Of("ρ_p", "undrained passive thrust on the falling ground over that on level ground (plane wedge)", units.Ratio(rho)))
				note += fmt.Sprintf("; the ground falls at %.1f° from the block: the undrained passive thrust %.3f of level ground's, by a plane wedge in total stress", b.Degrees(), rho)
			case kp == 0:
				note += fmt.Sprintf("; the ground falls at %.1f° from the block: no passive resistance counted", b.Degrees())
			default:
				note += fmt.Sprintf("; the ground falls at %.1f° from the block: K_p by Coulomb for a smooth face and ground falling in front", b.Degrees())
			}
		}
	}
	if st.cond == Drained {
		note += "; cohesion ignored at the base"
	}
	r = r.WithValues(vs...).WithNote(note)
	if a.Water.Present {
		r = r.WithNote(a.Water.String())
	}
	return r
}

func (a AnchorBlock) overturning(pulls []AnchorPull, ld blockLoads, set actionSet, fs float64) check.Result {
	l := float64(a.Length)
	var dst, stb float64
	for _, p := range pulls {
		x, z := p.components()
		m := x*float64(p.Z) + z*(l-float64(p.X))
		if m > 0 {
			dst += set.factor(true, p.Variable) * m
		} else {
			stb -= set.factor(false, p.Variable) * m
		}
	}
	dst += set.gG * ld.buoyancy * (l - ld.xu)
	stb += set.gGfav * ld.weight * (l - ld.xw)
	r := check.Stability("anchor.overturning", "Anchor block overturning about the front toe", units.KindMoment, dst, stb, fs).
		WithBasis(basisOf(set, "the restoring moment about the front toe", fs))
	r = set.values(r,
		check.Of("W", "weight of the block, its steps and the soil cover", units.Force(ld.weight)),
		check.Of("x_W", "centroid of that weight from the back edge", units.Length(ld.xw)),
		check.Of("U", "uplift of the water on the block", units.Force(ld.buoyancy)),
		check.Of("x_U", "line of action of the uplift from the back edge", units.Length(ld.xu)))
	return set.note(r, "earth pressures on the front and back faces ignored in overturning")
}

func (a AnchorBlock) uplift(pulls []AnchorPull, ld blockLoads, set actionSet, fs float64) check.Result {
	var dst, stb, fz float64
	for _, p := range pulls {
		_, z := p.components()
		fz += z
		if z > 0 {
			dst += set.factor(true, p.Variable) * z
		} else {
			stb -= set.factor(false, p.Variable) * z
		}
	}
	if set.allowable {
		stb += ld.weight - ld.buoyancy
	} else {
		dst += set.gG * ld.buoyancy
		stb += set.gGfav * ld.weight
	}
	r := check.Stability("anchor.uplift", "Anchor block uplift", units.KindForce, dst, stb, fs).
		WithBasis(basisOf(set, "the block's effective weight", fs))
	r = set.values(r,
		check.Of("F_z", "upward component of the characteristic pulls", units.Force(fz)),
		check.Of("W", "weight of the block, its steps and the soil cover", units.Force(ld.weight)),
		check.Of("U", "uplift of the water on the block", units.Force(ld.buoyancy)))
	return set.note(r, "side friction on the block ignored")
}

func (a AnchorBlock) bearing(pulls []AnchorPull, s Soil, m Method, cond Condition, ld blockLoads, set actionSet, favourable, lightBlock bool, fs float64) (check.Result, error) {
	const id, title = "anchor.bearing", "Anchor block bearing pressure"
	gw := set.gG
	if lightBlock {
		gw = set.gGfav
	}
	bl := a.base(pulls, ld, set, favourable, gw, gw)
	if bl.n <= 0 {
		r := check.Compare(id, title, units.KindPressure, 0, 0).WithBasis(basisOf(set, "the bearing pressure", fs))
		r = set.values(r, check.Of("N", "effective normal force on the base", units.Force(bl.n)))
		return set.note(r, "the pulls lift the block off its base: uplift governs"), nil
	}
	var r check.Result
	var err error
	if s.IsRock {
		r, err = rockBaseBearing(id, title, a.Length, a.Width, bl, s, set)
	} else {
		r, err = soilBearing(id, title, a.Length, a.Width, a.Depth, a.Water, a.GroundSlope, bl, s, m, cond, set, fs)
	}
	if err != nil {
		return check.Result{}, err
	}
	return set.values(r, check.Of("x_R", "position of the base resultant from the back edge", units.Length(float64(a.Length)/2+bl.e))), nil
}
