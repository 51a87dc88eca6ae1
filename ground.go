package sagspan

import (
	"fmt"
	"math"
	"strings"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// bankGround is one bank's ground resolved for analysis: its soil and
// bearing method, the elevations of its footing and anchor (on the datum
// of the site's levels), and its groundwater.
type bankGround struct {
	bank   Bank
	soil   foundation.Soil
	method foundation.Method
	// footingTop is the elevation of the column base (the footing's top),
	// attach that of the backstays' attachment at the anchor. Neither
	// depends on the size of the footing or anchor; the ground at each
	// does (footingGround, anchorGround), so a design search trying
	// another size reads it from the size it tries.
	footingTop, attach units.Length
	// groundwater is the groundwater elevation, when given.
	groundwater *units.Length
	flood       Level
	// line is the site's ground line (site.ground), xs the saddle's
	// position along it and dir the direction of the span from the bank
	// (+1 left, −1 right).
	line    []Point
	xs, dir float64
}

// saddleElevation returns the elevation of a bank's walkway-rope saddle.
func (b Bridge) saddleElevation(s Side) units.Length {
	if s == Left {
		return b.Site.LeftSaddle
	}
	return b.Site.LeftSaddle + b.Site.Rise
}

// bankOf returns one bank of the description.
func (b Bridge) bankOf(s Side) Bank {
	if s == Left {
		return b.Banks.Left
	}
	return b.Banks.Right
}

// attachHeight returns the attachment's height above the base of a block
// (default a third of its height) or above the bottom of a deadman's face
// (default its middle).
func (a AnchorSpec) attachHeight() units.Length {
	switch {
	case a.AttachZ != 0:
		return a.AttachZ
	case a.Type == "deadman":
		return a.Height / 2
	}
	return a.Height / 3
}

// groundOf resolves one bank's ground for a validated soil. The footing's
// top lies the tower's height below its saddle; the anchor's attachment
// lies the backstay's drop below it.
func (b Bridge) groundOf(s Side, soil foundation.Soil) bankGround {
	k := b.bankOf(s)
	m, _ := k.Soil.method() // validated
	z := b.saddleElevation(s)
	g := bankGround{bank: k, soil: soil, method: m, groundwater: k.Soil.Groundwater, flood: b.Site.Flood,
		line: b.Site.Ground, dir: 1}
	if s == Right {
		g.xs, g.dir = float64(b.Site.Span), -1
	}
	g.footingTop = z - k.Tower.Height
	g.attach = z - k.Backstay.Drop
	if a := k.Anchor; a.Type == "rock" {
		g.soil.GroutBond = a.groutBond(soil)
	}
	return g
}

// footingGround returns the elevation of the ground at a footing of size
// spec: its underside (the column base less the footing's thickness) plus
// its depth below ground. A thicker footing on the same depth lies under
// lower ground.
func (g *bankGround) footingGround(spec FootingSpec) units.Length {
	return g.footingTop - spec.Thickness + spec.Depth
}

// anchorGround returns the elevation of the ground at anchor a (the rock
// surface at a rock anchor's head): the attachment, less its height above
// the base of a block or the bottom of a deadman's face, plus the depth of
// that base below ground. It moves with the anchor's height (the
// attachment's default height is a share of it) and depth.
func (g *bankGround) anchorGround(a AnchorSpec) units.Length {
	if a.Type == "rock" {
		return g.attach
	}
	return g.attach - a.attachHeight() + a.Depth
}

// waterLevel returns the water level at a bank in case lc, whether there
// is one, and whether it is the design flood: the groundwater, or in the
// flood case the design flood where it is higher (the bank taken as
// saturated up to the flood's level, cautious).
func (g *bankGround) waterLevel(lc LoadCase) (level units.Length, ok, flood bool) {
	switch {
	case lc.Flood && !g.flood.None && (g.groundwater == nil || g.flood.Z > *g.groundwater):
		return g.flood.Z, true, true
	case g.groundwater != nil:
		return *g.groundwater, true, false
	}
	return 0, false, false
}

// flooded reports whether in case lc the design flood stands above the
// ground at elevation ground.
func (g *bankGround) flooded(lc LoadCase, ground units.Length) bool {
	level, ok, flood := g.waterLevel(lc)
	return ok && flood && level > ground
}

// scourText is the basis of a block's sliding when the design flood
// stands over its ground.
const scourText = "the design flood stands over the block's ground: the passive resistance in front of it is not counted, " +
	"the flow may scour that soil (EN 1997-1 6.5.3(7); cautious)"

// waterText says in words which water level case lc uses at the bank.
func (g *bankGround) waterText(lc LoadCase) string {
	level, ok, flood := g.waterLevel(lc)
	switch {
	case flood:
		return fmt.Sprintf("the design flood at %s (site.flood_elevation), the bank saturated up to it", level)
	case ok:
		return fmt.Sprintf("groundwater at %s", level)
	}
	return "no groundwater given"
}

// waterAt returns the water at a foundation whose ground lies at
// elevation ground, in case lc.
func (g *bankGround) waterAt(lc LoadCase, ground units.Length) foundation.Water {
	level, ok, _ := g.waterLevel(lc)
	if !ok {
		return foundation.Water{}
	}
	return foundation.WaterAt(ground - level)
}

// pad returns the tower footing spec of the bank for package foundation,
// dry: along the bridge, the column's footprint free of soil cover. The
// spec is the bank's own, or a size a design search tries.
func (g *bankGround) pad(spec FootingSpec) foundation.Footing {
	t := g.bank.Tower
	return foundation.Footing{Along: spec.Length, Across: spec.Width, Thickness: spec.Thickness, Depth: spec.Depth,
		UnitWeight: t.UnitWeight, Footprint: units.Area(float64(t.Depth) * float64(t.Width)),
		GroundSlope: g.footingSlope(spec).beta}
}

// block, deadman and rock return the bank's anchor for package foundation.
func (g *bankGround) block(a AnchorSpec) foundation.AnchorBlock {
	s := g.anchorSlope(a)
	return foundation.AnchorBlock{Length: a.Length, Width: a.Width, Height: a.Height, Depth: a.Depth,
		UnitWeight: a.UnitWeight, PassiveMobilisation: a.Passive, GroundSlope: s.beta, BackSlope: s.rise}
}

// baseSlope is the fall of the ground at a base, read from the ground
// line: the steepest fall away from the base within reach of its edges
// (twice its side along the bridge: Bowles, Foundation Analysis and
// Design, §4-9, finds no reduction of the bearing factors once a footing
// stands about that far back from a slope's crest) or under it.
type baseSlope struct {
	beta    units.Angle
	reach   units.Length
	line    bool // a ground line is given
	covered bool // it covers the base and its reach
	rock    bool // the base stands on rock
	// rise is the steepest rise of the ground behind an anchor, away from
	// the span, within its reach: the active thrust on its back face.
	rise units.Angle
}

// footingSlope returns the ground's fall at a tower footing of size spec,
// centred ColumnOffset behind the column.
func (g *bankGround) footingSlope(spec FootingSpec) baseSlope {
	c := g.xs - g.dir*float64(spec.ColumnOffset)
	h := float64(spec.Length) / 2
	s := fallAt(g.line, c-h, c+h, 2*float64(spec.Length))
	s.rock = g.soil.IsRock
	return s
}

// anchorSlope returns the ground's fall at an anchor block or deadman: its
// attachment lies the backstay's horizontal run behind the saddle,
// AttachX from the block's back edge.
func (g *bankGround) anchorSlope(a AnchorSpec) baseSlope {
	ax := a.AttachX
	if ax == 0 {
		ax = a.Length / 2
	}
	attach := g.xs - g.dir*float64(g.bank.Backstay.Horizontal)
	back := attach - g.dir*float64(ax)
	front := back + g.dir*float64(a.Length)
	// Reach: twice the length along the pull or the depth, and at least
	// the passive wedge in front, Depth·tan(45° + φ'/2) on level ground
	// (beyond 2·Depth for φ' > 36.9°).
	wedge := float64(a.Depth) * math.Tan(math.Pi/4+float64(g.soil.Friction)/2)
	reach := max(2*float64(a.Length), 2*float64(a.Depth), wedge)
	s := fallAt(g.line, min(back, front), max(back, front), reach)
	s.rock = g.soil.IsRock
	s.rise = riseBehind(g.line, back, g.dir, reach)
	return s
}

// maxSlope is the steepest slope read from a ground line: a segment of
// almost no run is taken as this, short of vertical.
const maxSlope = 89.9 * units.Degree

// riseBehind returns the steepest rise of the ground line away from the
// span (the span lies toward dir from the bank) within reach behind an
// anchor's back edge at back.
func riseBehind(line []Point, back, dir, reach float64) units.Angle {
	lo, hi := back-reach, back
	if dir < 0 {
		lo, hi = back, back+reach
	}
	worst := 0.0
	eachSegment(line, lo, hi, func(_, _, slope float64) { worst = math.Max(worst, -dir*slope) })
	return min(units.Angle(worst), maxSlope)
}

// eachSegment calls f with the ends and the slope (rising toward +x
// positive) of every segment of the ground line that overlaps lo…hi.
func eachSegment(line []Point, lo, hi float64, f func(xa, xb, slope float64)) {
	for i := 1; i < len(line); i++ {
		a, b := line[i-1], line[i]
		xa, xb := float64(a.X), float64(b.X)
		if xb <= lo || xa >= hi {
			continue
		}
		f(xa, xb, math.Atan2(float64(b.Z-a.Z), xb-xa))
	}
}

// fallAt returns the steepest fall of the ground line away from a base
// spanning x0…x1 along it: segments within reach beyond x1 that fall
// toward +x, within reach before x0 that fall toward −x, and under the
// base falling either way.
func fallAt(line []Point, x0, x1, reach float64) baseSlope {
	s := baseSlope{reach: units.Length(reach), line: len(line) > 1}
	if !s.line {
		return s
	}
	lo, hi := x0-reach, x1+reach
	s.covered = float64(line[0].X) <= lo && float64(line[len(line)-1].X) >= hi
	worst := 0.0
	eachSegment(line, lo, hi, func(xa, xb, slope float64) {
		if xb > x1 { // beyond the base: falling toward +x
			worst = math.Max(worst, -slope)
		}
		if xa < x0 { // before it: falling toward −x
			worst = math.Max(worst, slope)
		}
		if xa < x1 && xb > x0 { // under it: either way
			worst = math.Max(worst, math.Abs(slope))
		}
	})
	s.beta = min(units.Angle(worst), maxSlope)
	return s
}

// text returns the basis a bearing or sliding result of the base carries
// about the ground around it.
func (s baseSlope) text(id string) string {
	if !strings.HasSuffix(id, ".bearing") && !strings.HasSuffix(id, ".sliding") && id != "anchor.deadman.pullout" {
		return ""
	}
	if !s.line {
		return "; no ground line given (site.ground): the ground around the base is taken level — where the bank falls away from it, " +
			"bearing and passive resistance are less than computed: give the ground line"
	}
	out := fmt.Sprintf("; ground from the ground line (site.ground): steepest fall within %s of the base's edges %.1f°", s.reach, s.beta.Degrees())
	switch {
	case s.beta == 0:
	case strings.HasSuffix(id, ".bearing") && s.rock:
		out += " (on rock the bearing pressure is not reduced for it: the rock mass's stability toward the slope, " +
			"joints dipping out of it, must be checked by hand)"
	case strings.HasSuffix(id, ".bearing"):
		out += " (ground-inclination factors in the bearing equation, the crest's set-back not counted: cautious)"
	case id == "anchor.sliding" || id == "anchor.deadman.pullout":
		out += " (any passive resistance counted in front is taken for ground falling at that slope: Coulomb's K_p, " +
			"smooth face, drained, none at or beyond φ'; undrained, a plane wedge in total stress)"
	default:
		out += " (not used: the footing's sliding counts no passive resistance)"
	}
	if s.rise > 0 && (id == "anchor.sliding" || id == "anchor.deadman.pullout") {
		out += fmt.Sprintf("; ground rising behind at %.1f°: any active thrust on the back face is Coulomb's for that backslope "+
			"(smooth face, drained, the slope taken at most φ')", s.rise.Degrees())
	}
	if !s.covered {
		out += "; beyond the ground line the ground is taken level"
	}
	return out + "; the line runs along the bridge's axis, so a fall across the bridge is not seen; the bank's own stability is not checked"
}

func (g *bankGround) deadman(a AnchorSpec) foundation.Deadman {
	s := g.anchorSlope(a)
	d := foundation.Deadman{Length: a.Width, Height: a.Height, Thickness: a.Length, Depth: a.Depth, UnitWeight: a.UnitWeight,
		GroundSlope: s.beta, BackSlope: s.rise}
	if a.Beam != nil {
		d.Section = foundation.SteelSection{Yield: a.Beam.Steel, PlasticModulus: a.Beam.PlasticModulus, ShearArea: a.Beam.ShearArea}
	}
	return d
}

func (g *bankGround) rock(a AnchorSpec) foundation.RockAnchor {
	ra := foundation.RockAnchor{
		Count: a.Bars, Spacing: a.BarSpacing, BarDiameter: a.BarDiameter, YieldStrength: a.BarStrength, UltimateStrength: a.BarUltimate,
		HoleDiameter: a.HoleDiameter, BondLength: a.BondLength, FreeLength: a.FreeLength,
	}
	if p := a.Plate; p != nil {
		ra.Plate = foundation.HeadPlate{Side: p.Side, Thickness: p.Thickness, Yield: p.Steel}
	}
	return ra
}

// dryRun returns the basis of the validation's dry runs: terse, as only
// their errors count (a design search validates every size it tries).
func dryRun() *foundation.Basis { return &foundation.Basis{Terse: true} }

// anchorDryRun runs the bank's anchor checks with no load, for validation.
func (g *bankGround) anchorDryRun() ([]check.Result, error) {
	a := g.bank.Anchor
	switch a.Type {
	case "rock":
		return g.rock(a).Check(0, units.FromDegrees(30), g.soil, dryRun())
	case "deadman":
		return g.deadman(a).Check(nil, g.soil, dryRun())
	}
	blk := g.block(a)
	x, z := a.AttachX, a.AttachZ
	if x == 0 {
		x = a.Length / 2
	}
	if z == 0 {
		z = a.Height / 3
	}
	return blk.Check([]foundation.AnchorPull{{X: x, Z: z}}, g.soil, g.method, dryRun())
}

// footingChecks checks the footing spec of one bank's tower under every
// service case; perm is the permanent case.
func (m *model) footingChecks(out sink, side Side, spec FootingSpec, perm CaseState, service []CaseState) error {
	element := footingElement[side]
	for _, svc := range service {
		results, err := m.footing(side, spec, perm.Tower[side], svc)
		if err != nil {
			return m.bankErr(side, "tower.footing", svc.Case.Name, err)
		}
		for _, r := range results {
			out.add(r.For(element, svc.Case.Name))
		}
		if svc.Lateral[side] == 0 {
			continue
		}
		results, err = m.footingAcross(side, spec, perm.Tower[side], svc)
		if err != nil {
			return m.bankErr(side, "tower.footing", svc.Case.Name+", across the bridge", err)
		}
		for _, r := range results {
			out.add(r.For(footingAcrossElement[side], svc.Case.Name))
		}
	}
	return nil
}

// columnBuoyancy returns the uplift of the water on the submerged part of
// a bank's tower column in case lc (the gross section, γw 9.81 kN/m³).
func (m *model) columnBuoyancy(s Side, lc LoadCase) units.Force {
	g := &m.ground[s]
	level, ok, _ := g.waterLevel(lc)
	if !ok {
		return 0
	}
	t := g.bank.Tower
	h := math.Min(math.Max(float64(level-g.footingTop), 0), float64(t.Height))
	return units.Force(float64(foundation.WaterUnitWeight) * float64(t.Depth) * float64(t.Width) * h)
}

// footingAcross checks a tower footing turned, its width along the
// lateral force: overturning about the edges along the bridge, and bearing
// and sliding under the same load as footing (both directions at once).
func (m *model) footingAcross(s Side, spec FootingSpec, perm tower.Resultant, svc CaseState) ([]check.Result, error) {
	g := &m.ground[s]
	f := g.pad(spec)
	f.Along, f.Across = spec.Width, spec.Length // turned: along the lateral force
	f.Water = g.waterAt(svc.Case, g.footingGround(spec))
	ld := m.footingLoad(s, spec, perm, svc)
	ld.Horizontal, ld.HorizontalAcross = ld.HorizontalAcross, ld.Horizontal
	ld.Moment, ld.MomentAcross = ld.MomentAcross, ld.Moment
	ld.VariableHorizontal, ld.VariableHorizontalAcross = ld.VariableHorizontalAcross, ld.VariableHorizontal
	ld.VariableMoment, ld.VariableMomentAcross = ld.VariableMomentAcross, ld.VariableMoment
	var err error
	m.scratch, err = f.AppendCheck(m.scratch[:0], ld, g.soil, g.method, m.foundationBasis())
	m.waterBasis(m.scratch, s, svc.Case, f.Water, g.footingSlope(spec))
	return m.scratch, err
}

// anchorChecks checks the anchor spec of one bank under every service case.
func (m *model) anchorChecks(out sink, side Side, spec AnchorSpec, perm CaseState, service []CaseState) error {
	element := anchorElement[side]
	for _, svc := range service {
		results, err := m.anchor(side, spec, perm, svc)
		if err != nil {
			return m.bankErr(side, "anchor", svc.Case.Name, err)
		}
		for _, r := range results {
			out.add(r.For(element, svc.Case.Name))
		}
	}
	return nil
}

// share returns the fraction of x that exceeds the permanent value p (for
// a rock anchor's pull, which keeps its direction).
func share(x, p float64) float64 {
	if math.Abs(x) == 0 {
		return 0
	}
	return math.Max(0, math.Min(1, (math.Abs(x)-math.Abs(p))/math.Abs(x)))
}

// footingLoad returns the tower load of case svc on a bank's footing,
// brought down to its underside: along the bridge the column-base
// resultant (its moment with the horizontal force's lever arm through the
// footing and the vertical force's about the footing's centre), across it
// the lateral force of wind on the swung ropes and the column with its
// moment. In a case with water above the footing the column's submerged
// part is buoyed (a permanent reduction of the vertical load). The
// variable parts, for the partial basis, are what the case adds to the
// permanent case (perm), component by component and signed, so that a
// permanent part the variable one opposes is factored as favourable; the
// lateral action is wholly variable.
func (m *model) footingLoad(s Side, spec FootingSpec, perm tower.Resultant, svc CaseState) foundation.FootingLoad {
	r := svc.Tower[s]
	moment := func(r tower.Resultant) units.Moment {
		return r.BaseMoment + units.MomentOf(r.Horizontal, spec.Thickness) + units.MomentOf(r.Vertical, spec.ColumnOffset)
	}
	lift := m.columnBuoyancy(s, svc.Case)
	lateral := svc.Lateral[s]
	across := svc.LateralMoment[s] + units.MomentOf(lateral, spec.Thickness)
	return foundation.FootingLoad{
		Vertical:                 r.Vertical - lift,
		Horizontal:               r.Horizontal,
		Moment:                   moment(r) - units.MomentOf(lift, spec.ColumnOffset),
		HorizontalAcross:         lateral,
		MomentAcross:             across,
		Split:                    true,
		VariableVertical:         r.Vertical - perm.Vertical,
		VariableHorizontal:       r.Horizontal - perm.Horizontal,
		VariableMoment:           moment(r) - moment(perm),
		VariableHorizontalAcross: lateral,
		VariableMomentAcross:     across,
	}
}

// footing checks a tower footing under the load of case svc
// (footingLoad), along the bridge and, for bearing and sliding, across it
// at once; perm is the permanent case's resultant.
func (m *model) footing(s Side, spec FootingSpec, perm tower.Resultant, svc CaseState) ([]check.Result, error) {
	g := &m.ground[s]
	f := g.pad(spec)
	f.Water = g.waterAt(svc.Case, g.footingGround(spec))
	var err error
	m.scratch, err = f.AppendCheck(m.scratch[:0], m.footingLoad(s, spec, perm, svc), g.soil, g.method, m.foundationBasis())
	m.waterBasis(m.scratch, s, svc.Case, f.Water, g.footingSlope(spec))
	return m.scratch, err
}

// waterBasis states in each result's basis the water level used, and
// gives its elevation as the value "z_w" (not on a terse basis).
func (m *model) waterBasis(rs []check.Result, s Side, lc LoadCase, w foundation.Water, slope baseSlope) {
	if m.fbasis.Terse {
		return
	}
	level, ok, _ := m.ground[s].waterLevel(lc)
	text := m.ground[s].waterText(lc)
	for i := range rs {
		rs[i] = rs[i].WithBasis(rs[i].Basis + "; water level used: " + text + slope.text(rs[i].ID))
		if ok {
			rs[i] = rs[i].WithValues(check.Of("z_w", "elevation of the water level used", level))
		}
	}
}

// foundationBasis returns the verification basis of the anchor and
// footing checks, held in the model so that the many checks of a design
// search share it.
func (m *model) foundationBasis() *foundation.Basis { return &m.fbasis }

// anchor checks the anchor of one bank under the backstay pulls of every
// group, split into the permanent case's pull and the rest, with the
// ropes' attachment.
func (m *model) anchor(s Side, spec AnchorSpec, perm, svc CaseState) ([]check.Result, error) {
	basis := m.foundationBasis()
	g := &m.ground[s]
	ground := g.anchorGround(spec)
	water := g.waterAt(svc.Case, ground)
	x, z := spec.AttachX, spec.AttachZ
	if x == 0 {
		x = spec.Length / 2
	}
	if z == 0 {
		z = spec.Height / 3
	}
	pulls := m.pulls[:0]
	defer func() { m.pulls = pulls[:0] }()
	for i, gs := range svc.Groups {
		t, p := gs.Backstay[s], perm.Groups[i].Backstay[s]
		angle := gs.BackstayAngle[s]
		pulls = append(pulls, foundation.AnchorPull{Force: min(t, p), Angle: angle, X: x, Z: z})
		if t > p {
			pulls = append(pulls, foundation.AnchorPull{Force: t - p, Angle: angle, X: x, Z: z, Variable: true})
		}
	}
	// The resultant of the backstays' pulls, and its permanent part.
	var fx, fz, fxp, fzp float64
	for i, gs := range svc.Groups {
		c, sn := math.Cos(float64(gs.BackstayAngle[s])), math.Sin(float64(gs.BackstayAngle[s]))
		fx, fz = fx+float64(gs.Backstay[s])*c, fz+float64(gs.Backstay[s])*sn
		p := perm.Groups[i].Backstay[s]
		fxp, fzp = fxp+float64(p)*c, fzp+float64(p)*sn
	}
	pull, permanent := math.Hypot(fx, fz), math.Hypot(fxp, fzp)
	var err error
	switch spec.Type {
	case "deadman":
		d := g.deadman(spec)
		d.Water = water
		m.scratch, err = d.Check(pulls, g.soil, basis)
	case "rock":
		// The bars lie along the resultant of the backstays' pulls.
		ra := g.rock(spec)
		ra.Water, ra.VariableShare = water, share(pull, permanent)
		m.scratch, err = ra.Check(units.Force(pull), units.Angle(math.Atan2(fz, fx)), g.soil, basis)
	default:
		blk := g.block(spec)
		blk.Water = water
		scoured := blk.PassiveMobilisation > 0 && g.flooded(svc.Case, ground)
		if scoured {
			blk.PassiveMobilisation = 0
		}
		m.scratch, err = blk.AppendCheck(m.scratch[:0], pulls, g.soil, g.method, basis)
		if err == nil && scoured && !basis.Terse {
			for i := range m.scratch {
				if m.scratch[i].ID == "anchor.sliding" {
					m.scratch[i] = m.scratch[i].WithBasis(m.scratch[i].Basis + "; " + scourText)
				}
			}
		}
	}
	if err != nil {
		return nil, err
	}
	if spec.Type == "deadman" && g.flooded(svc.Case, ground) && !basis.Terse {
		for i := range m.scratch {
			if m.scratch[i].ID == "anchor.deadman.pullout" {
				m.scratch[i] = m.scratch[i].WithNote("the design flood stands over the deadman's ground: its resistance is the soil in front of it, " +
					"which scour must not remove (EN 1997-1 6.5.3(7)); protect the ground or place the deadman above the flood")
			}
		}
	}
	slope := baseSlope{}
	if spec.Type != "rock" {
		slope = g.anchorSlope(spec)
	}
	m.waterBasis(m.scratch, s, svc.Case, water, slope)
	m.scratch, err = m.attachment(m.scratch, s, spec, perm, svc, pull, permanent)
	return m.scratch, err
}

// attachment appends the checks of the ropes' attachment at the anchor:
// the rods cast into a block or deadman (under the resultant pull), and
// each rope group's termination and loop (the worst group reported). With
// no attachment described, the largest rope force at the anchor is
// reported for its design.
func (m *model) attachment(dst []check.Result, s Side, spec AnchorSpec, perm, svc CaseState, pull, permanent float64) ([]check.Result, error) {
	basis := m.foundationBasis()
	at := spec.Attachment
	if at == nil {
		var worst float64
		var name string
		for i, gs := range svc.Groups {
			if t := float64(gs.Backstay[s]) / float64(m.groups[i].Count); t >= worst {
				worst, name = t, m.groups[i].Name
			}
		}
		r := check.Record("anchor.attachment", "Rope force at the anchor, per rope", units.KindForce, worst)
		if !basis.Terse {
			r = r.WithBasis("the rope tension at the anchor, for the design of its termination (banks.*.anchor.attachment not given)").
				WithNote(fmt.Sprintf("largest in %s; describe the attachment (rod or loop, and the rope's termination) to check it", name))
		}
		return append(dst, r), nil
	}
	if at.Kind == "rod" && spec.Type != "rock" {
		rod := foundation.AnchorRod{Count: at.Rods, Diameter: at.RodDiameter, Yield: at.RodSteel, Ultimate: at.RodUltimate,
			ThreadArea: at.RodThreadArea, VariableShare: share(pull, permanent)}
		rs, err := rod.Check(units.Force(pull), basis)
		if err != nil {
			return nil, err
		}
		dst = append(dst, rs...)
	}
	k, err := at.efficiency()
	if err != nil {
		return nil, err
	}
	var worst [2]check.Result
	for i, gs := range svc.Groups {
		grp := m.groups[i]
		n := float64(grp.Count)
		t, p := float64(gs.Backstay[s])/n, float64(perm.Groups[i].Backstay[s])/n
		ra := foundation.RopeAnchorage{MBF: grp.rope.MBF, Diameter: grp.rope.Diameter, Efficiency: k, VariableShare: share(t, p)}
		if at.Kind == "loop" {
			ra.PinDiameter = at.PinDiameter
		}
		rs, err := ra.Check(units.Force(t), basis)
		if err != nil {
			return nil, err
		}
		for j, r := range rs {
			if i == 0 || r.Ratio > worst[j].Ratio {
				if !basis.Terse {
					r = r.WithValues(check.Of("n_r", "number of ropes in the worst group", units.Ratio(grp.Count)),
						check.Of("d_r", "diameter of those ropes", grp.rope.Diameter)).
						WithNote(fmt.Sprintf("%s: %d ropes of %v, the worst group", grp.Name, grp.Count, grp.rope.Diameter))
				}
				worst[j] = r
			}
		}
	}
	dst = append(dst, worst[0])
	if at.Kind == "loop" {
		dst = append(dst, worst[1])
	}
	return dst, nil
}

// levelTolerance is how far the ground line may lie from the ground a
// base's levels imply before the report flags it: a survey and a
// description of the same bank that differ by more at a base suggest a
// slip (a tower height transposed, a depth on the wrong base). Our
// judgement, said in the result.
const levelTolerance = 0.5 * units.Metre

// lineAt returns the ground line's elevation at x, and false where the
// line does not reach x.
func lineAt(line []Point, x float64) (units.Length, bool) {
	for i := 1; i < len(line); i++ {
		a, b := line[i-1], line[i]
		if x >= float64(a.X) && x <= float64(b.X) {
			t := (x - float64(a.X)) / float64(b.X-a.X)
			return a.Z + units.Length(t)*(b.Z-a.Z), true
		}
	}
	return 0, false
}

// levelChecks flags each footing and block anchor whose ground, as the
// tower's height, the footing's depth and the backstay's drop place it,
// lies more than levelTolerance from the ground line (site.ground) there.
func (m *model) levelChecks(out sink) {
	if len(m.b.Site.Ground) < 2 {
		return
	}
	for side := Left; side <= Right; side++ {
		g := &m.ground[side]
		bank := m.bank(side)
		type base struct {
			element, from string
			x             float64
			z             units.Length
		}
		bases := []base{{footingElement[side], "the saddle's elevation less the tower's height and the footing's thickness, plus its depth",
			g.xs - g.dir*float64(bank.Tower.Footing.ColumnOffset), g.footingGround(bank.Tower.Footing)}}
		if a := bank.Anchor; a.Type != "rock" {
			bases = append(bases, base{anchorElement[side], "the saddle's elevation less the backstay's drop, less the attachment's height, plus the anchor's depth",
				g.xs - g.dir*float64(bank.Backstay.Horizontal), g.anchorGround(a)})
		}
		for _, b := range bases {
			z, ok := lineAt(m.b.Site.Ground, b.x)
			if !ok {
				continue
			}
			d := units.Length(math.Abs(float64(z - b.z)))
			r := check.Advisory("site.ground_level", "Ground line against the levels of the base", units.KindLength, float64(d), float64(levelTolerance)).
				For(b.element, grooveCase).
				WithBasis("the ground at the base from "+b.from+", against the ground line (site.ground) there; more than "+
					levelTolerance.String()+" apart suggests a slip in a level (our judgement)").
				WithValues(
					check.Of("x", "position of the base along the ground line", units.Length(b.x)),
					check.Of("z_line", "ground line's elevation there", z),
					check.Of("z_base", "ground at the base from the description's levels", b.z),
					check.Of("Δz", "the two apart", d),
				)
			if r.Status == check.Pass {
				// Within the tolerance it is information, not a
				// utilisation of the design (a design search's score, the
				// governing summary).
				r.Status = check.Info
			}
			out.add(r)
		}
	}
}
