package foundation

import (
	"errors"
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
	// Groundwater is true when the water table lies WaterDepth below the
	// ground surface: the block is then buoyed over its submerged height
	// and soil below the water table weighs its submerged unit weight.
	Groundwater bool
	WaterDepth  units.Length
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
	if a.Groundwater {
		if err := nonNegative("AnchorBlock.WaterDepth", float64(a.WaterDepth)); err != nil {
			return err
		}
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
	zw := math.Inf(-1)
	if a.Groundwater {
		zw = d - float64(a.WaterDepth)
	}
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

// earth returns the total (over the width) passive resistance on the front
// face and active thrust on the back face, with their heights above the
// base, for design soil s.
func (a AnchorBlock) earth(s Soil) (pp, pa EarthForce, err error) {
	d := a.Depth
	top := units.Length(math.Max(float64(a.Depth-a.Height), 0))
	g := s.UnitWeight
	if a.Groundwater && a.WaterDepth < a.Depth {
		g = s.SubmergedWeight() // whole face at the submerged weight: cautious
	}
	if d <= top || g <= 0 {
		return EarthForce{}, EarthForce{}, nil
	}
	pp, err = EarthPressureForce(rankineLevel(s.Friction, true), g, s.Cohesion, top, d, 1)
	if err != nil {
		return pp, pa, err
	}
	pa, err = EarthPressureForce(rankineLevel(s.Friction, false), g, s.Cohesion, top, d, -1)
	pp.Force *= units.Force(a.Width)
	pa.Force *= units.Force(a.Width)
	return pp, pa, err
}

// Check verifies the block against the pulls on soil s: sliding,
// overturning about the front toe, uplift and bearing, with result IDs
// "anchor.sliding", "anchor.overturning", "anchor.uplift" and
// "anchor.bearing". Element and Case are left empty for the caller.
//
// With Fx = Σ F cos α, Fz = Σ F sin α, W the weight of the block and its
// steps, Ws the soil cover's (less the soil the steps displace), xW their
// centroid, U the buoyancy at xU and N = W + Ws − U − Fz:
//
//	sliding:     driving Fx (+ Pa, active on the back face, when passive is counted)
//	             resisting N tan δ + μ Pp            (δ = Soil.InterfaceFriction; cohesion ignored)
//	overturning: about the front toe (x = Length, z = 0)
//	             driving Σ (Fx·Z + Fz·(Length − X)) + U·(Length − xU)
//	             resisting (W + Ws)·(Length − xW)    (earth pressures ignored)
//	uplift:      driving Fz, resisting W + Ws − U   (side friction ignored)
//	bearing:     N on the base with eccentricity e = M/N from the base centre,
//	             M = Σ (Fx·Z + Fz·(Length/2 − X)) + (W + Ws)(xW − Length/2) − U(xU − Length/2);
//	             earth pressures ignored;
//	             N/A' against qult (EN 1997-1 Annex D) on the effective base B' = Length − 2|e|,
//	             or, on the allowable basis, the peak contact pressure against
//	             Soil.Allowable when one is given.
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
// bearing with a note. Invalid input, or an attachment point outside the
// block, returns an error wrapping ErrInvalid.
func (a AnchorBlock) Check(pulls []Pull, s Soil, b *Basis) ([]check.Result, error) {
	return a.AppendCheck(nil, pulls, s, b)
}

// AppendCheck is Check appending its results to dst, for callers that
// check many blocks and reuse one slice (strconv.AppendFloat's pattern).
func (a AnchorBlock) AppendCheck(dst []check.Result, pulls []Pull, s Soil, b *Basis) ([]check.Result, error) {
	if err := a.validate(); err != nil {
		return nil, err
	}
	if err := s.Validate(); err != nil {
		return nil, err
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
	ld := a.loads(s)
	var slide, over, lift, bear check.Result
	if !bs.PartialFactors {
		set := bs.allowableSet()
		if slide, err = a.sliding(pulls, s, ld, set, def(bs.Sliding, 1.5)); err != nil {
			return nil, err
		}
		if over, err = a.overturning(pulls, ld, set, def(bs.Overturning, 1.5)); err != nil {
			return nil, err
		}
		lift = a.uplift(pulls, ld, set, def(bs.Uplift, 1.5))
		if bear, err = a.bearing(pulls, s, ld, set, false, false, def(bs.Bearing, 3)); err != nil {
			return nil, err
		}
		return append(dst, slide, over, lift, bear), nil
	}
	equ := bs.equSet()
	if over, err = a.overturning(pulls, ld, equ, 1); err != nil {
		return nil, err
	}
	lift = a.uplift(pulls, ld, equ, 1)
	first := true
	for _, set := range bs.geoSets() {
		r, err := a.sliding(pulls, s, ld, set, 1)
		if err != nil {
			return nil, err
		}
		if first || r.Ratio > slide.Ratio {
			slide = r
		}
		// Pulls unfavourable or favourable, with the block's weight
		// unfavourable (γG) or favourable (γG,inf): the light block under
		// full pulls gives the largest inclination and eccentricity.
		for _, c := range [][2]bool{{false, false}, {true, false}, {false, true}} {
			r, err := a.bearing(pulls, s, ld, set, c[0], c[1], 1)
			if err != nil {
				return nil, err
			}
			if first || r.Ratio > bear.Ratio {
				bear = r
			}
			first = false
		}
	}
	return append(dst, slide, over, lift, bear), nil
}

// baseShear returns the shear resistance of a base of area area under
// normal force n: n tan δ on a soil with friction, or, on an undrained soil
// (no friction angle), A cu on the base, EN 1997-1 6.5.3(12) (from memory;
// the effective area is taken as the whole base).
func baseShear(n, tanD float64, s Soil, area float64) float64 {
	if s.Friction == 0 {
		if n <= 0 {
			return 0
		}
		return area * float64(s.Cohesion)
	}
	return math.Max(n, 0) * tanD
}

// shearNote describes the base shear resistance baseShear used.
func shearNote(s Soil, n float64, ignored string) string {
	if s.Friction == 0 {
		return fmt.Sprintf("undrained: cu %v over the whole base", s.Cohesion)
	}
	return fmt.Sprintf("base friction angle δ = %v on normal force %v; %s", s.InterfaceFriction(), units.Force(n), ignored)
}

// note returns r with the note appended, or r as it is on a terse basis.
func (set actionSet) note(r check.Result, note string) check.Result {
	if set.terse {
		return r
	}
	return r.WithNote(note)
}

// basisOf returns the basis text of a result.
func basisOf(set actionSet, what string, fs float64) string {
	if set.terse {
		return ""
	}
	if set.allowable {
		return fsBasis(what, fs)
	}
	return set.label
}

func (a AnchorBlock) sliding(pulls []Pull, s Soil, ld blockLoads, set actionSet, fs float64) (check.Result, error) {
	sd := s.factored(set)
	var fx, fz float64
	for _, p := range pulls {
		x, z := p.components()
		g := set.factor(x > 0, p.Variable)
		fx += g * x
		fz += g * z
	}
	n := set.gGfav*ld.weight - set.gG*ld.buoyancy - fz
	tanD := math.Tan(float64(sd.InterfaceFriction()))
	res := baseShear(n, tanD, sd, float64(a.Length)*float64(a.Width)) / set.gRh
	drive := fx
	mu := a.PassiveMobilisation
	var notes []string
	if mu > 0 {
		pp, pa, err := a.earth(sd)
		if err != nil {
			return check.Result{}, err
		}
		res += mu * float64(pp.Force) / set.gRe
		drive += set.gG * float64(pa.Force)
		if !set.terse {
			notes = append(notes, fmt.Sprintf("passive resistance %v mobilised at %.2f; active thrust on the back face %v",
				pp.Force, mu, pa.Force))
		}
	}
	r := check.Stability("anchor.sliding", "Anchor block sliding", units.KindForce, drive, res, fs).
		WithBasis(basisOf(set, "base friction and mobilised passive resistance", fs))
	if set.terse {
		return r, nil
	}
	r = r.WithNote(shearNote(sd, n, "cohesion ignored"))
	for _, n := range notes {
		r = r.WithNote(n)
	}
	return r, nil
}

func (a AnchorBlock) overturning(pulls []Pull, ld blockLoads, set actionSet, fs float64) (check.Result, error) {
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
	return set.note(r, "earth pressures on the front and back faces ignored in overturning"), nil
}

func (a AnchorBlock) uplift(pulls []Pull, ld blockLoads, set actionSet, fs float64) check.Result {
	var dst, stb float64
	for _, p := range pulls {
		_, z := p.components()
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
	return set.note(r, "side friction on the block ignored")
}

func (a AnchorBlock) bearing(pulls []Pull, s Soil, ld blockLoads, set actionSet, favourable, lightBlock bool, fs float64) (check.Result, error) {
	const id, title = "anchor.bearing", "Anchor block bearing pressure"
	l := float64(a.Length)
	gw := set.gG
	if lightBlock {
		gw = set.gGfav
	}
	n := gw * (ld.weight - ld.buoyancy)
	h, m := 0.0, gw*(ld.weight*(ld.xw-l/2)-ld.buoyancy*(ld.xu-l/2))
	for _, p := range pulls {
		x, z := p.components()
		g := set.factor(!favourable, p.Variable)
		n -= g * z
		h += g * x
		m += g * (x*float64(p.Z) + z*(l/2-float64(p.X)))
	}
	basis := bearingBasis(set, s, fs)
	if n <= 0 {
		return set.note(check.Compare(id, title, units.KindPressure, 0, 0).WithBasis(basis),
			"the pulls lift the block off its base: uplift governs"), nil
	}
	e := m / n
	return baseBearing(id, title, basis, a.Length, a.Width, a.Depth, a.Groundwater, a.WaterDepth,
		units.Force(n), units.Force(h), units.Length(e), s, EC7, set, fs)
}

// bearingBasis returns the basis text of a bearing result.
func bearingBasis(set actionSet, s Soil, fs float64) string {
	if set.terse {
		return ""
	}
	if set.allowable && s.Allowable > 0 {
		return "allowable basis: peak contact pressure against the allowable bearing pressure given by the site report"
	}
	return basisOf(set, "the ultimate bearing pressure", fs)
}

// baseBearing checks a rectangular base of side b along the load
// eccentricity e and l across it, carrying vertical force n and horizontal
// force h along b.
func baseBearing(id, title, basis string, b, l, depth units.Length, water bool, waterDepth units.Length,
	n, h units.Force, e units.Length, s Soil, m Method, set actionSet, fs float64) (check.Result, error) {
	area := float64(b) * float64(l)
	if math.Abs(float64(e)) >= float64(b)/2 {
		r := check.Compare(id, title, units.KindPressure, float64(n)/area, 0).WithBasis(basis)
		if set.terse {
			return r, nil
		}
		return r.WithNote(fmt.Sprintf("resultant outside the base: eccentricity %v, half base %v", e, b/2)), nil
	}
	if set.allowable && s.Allowable > 0 {
		qmax, _, contact, err := ContactPressure(n, e, b, l)
		if err != nil {
			return check.Result{}, err
		}
		r := check.Compare(id, title, units.KindPressure, float64(qmax), float64(s.Allowable)).WithBasis(basis)
		if set.terse {
			return r, nil
		}
		return r.WithNote(fmt.Sprintf("peak contact pressure; eccentricity %v, contact length %v", e, contact)), nil
	}
	sd := s.factored(set)
	br, err := BearingCapacity(BearingInput{B: b, L: l, Depth: depth, Vertical: n, Horizontal: h, EccB: e,
		Groundwater: water, WaterDepth: waterDepth}, sd, m)
	if errors.Is(err, ErrOutsideBase) {
		return set.note(check.Compare(id, title, units.KindPressure, float64(n)/area, 0).WithBasis(basis),
			"resultant outside the base"), nil
	}
	if err != nil {
		return check.Result{}, err
	}
	capacity := float64(br.Qult) / fs
	if !set.allowable {
		capacity = float64(br.Qult) / set.gRv
	}
	r := check.Compare(id, title, units.KindPressure, float64(n)/float64(br.Area()), capacity).WithBasis(basis)
	if set.terse {
		return r, nil
	}
	r = r.WithNote(fmt.Sprintf("%v: qult %v on effective base %v × %v (eccentricity %v); Nc %.2f, Nq %.2f, Nγ %.2f",
		br.Method, br.Qult, br.BEff, br.LEff, e, br.Nc, br.Nq, br.Ngamma))
	for _, note := range br.Notes {
		r = r.WithNote(note)
	}
	return r, nil
}
