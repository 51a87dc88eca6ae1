package sagspan

import (
	"math"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// model is a bridge resolved for analysis.
type model struct {
	b      Bridge
	span   cable.Span
	groups []group
	ground [2]bankGround
	dead   units.LoadPerLength // walkway dead load per metre, without ropes
	// crowd and crowdHalf are the crowd loads per metre of walkway on the
	// full span and on half of it.
	crowd, crowdHalf units.LoadPerLength
	wind             units.Pressure
	psi              float64
	// ref holds each group's reference state: permanent load at the
	// reference temperature, hanging at its design sag.
	ref []cable.State
	// fbasis is the basis of the anchor and footing checks; its Terse
	// leaves their text out for a design search.
	fbasis foundation.Basis
	// scratch and pulls are reused by each footing or anchor check.
	scratch []check.Result
	pulls   []foundation.AnchorPull
	// spanUnstretched is each group's unstretched span length in the
	// reference state; backstays are each group's backstays.
	spanUnstretched []float64
	backstays       [][2]backstay
	// grooves is the groove behaviour of each bank's saddle in the
	// variant being analysed (see variants).
	grooves [2]tower.Groove
}

func newModel(b Bridge) (*model, error) {
	if err := b.Validate(); err != nil {
		return nil, err
	}
	gs, err := b.groups()
	if err != nil {
		return nil, err
	}
	m := &model{
		b: b, span: b.span(), groups: gs,
		dead:      b.Walkway.dead(),
		crowd:     units.LoadPerLength(float64(b.crowd(b.Site.Span)) * float64(b.Walkway.Width)),
		crowdHalf: units.LoadPerLength(float64(b.crowd(b.Site.Span/2)) * float64(b.Walkway.Width)),
		wind:      b.wind(),
		psi:       orDefault(b.Loads.WindWithCrowd, defaultWindWithCrowd),
	}
	bs := b.Basis
	m.fbasis = foundation.Basis{
		PartialFactors: b.partial(),
		Sliding:        bs.SlidingFactor,
		Overturning:    bs.OverturningFactor,
		Uplift:         bs.UpliftFactor,
		Bearing:        bs.BearingFactor,
		GammaGdst:      bs.GammaGdst,
		GammaGstb:      bs.GammaGstb,
		GammaQdst:      bs.GammaQdst,
		GammaG:         bs.GammaG,
		GammaQ:         bs.GammaQ,
		GammaPhi:       bs.GammaPhi,
		GammaC:         bs.GammaC,
		GammaRh:        bs.GammaRh,
		GammaRv:        bs.GammaRv,
		GammaRe:        bs.GammaRe,
		Rope:           bs.RopeFactor,
		GammaRope:      bs.GammaR,
	}
	if bs.Approach == "DA1" {
		m.fbasis.Approach = foundation.DesignApproach1
	}
	for side := Left; side <= Right; side++ {
		soil, err := b.bankOf(side).Soil.soil()
		if err != nil {
			return nil, soilField("banks."+side.String(), err)
		}
		m.ground[side] = b.groundOf(side, soil)
	}
	l := float64(b.Site.Span)
	for i, g := range gs {
		w0 := g.self + units.LoadPerLength(g.share)*m.dead
		h0 := units.Force(float64(w0) * l * l / (8 * float64(g.Sag))) // H = w l²/(8 f)
		ref := cable.State{Load: cable.Load{Uniform: w0}, H: h0, Temperature: b.Climate.Reference}
		m.ref = append(m.ref, ref)
		if err := m.reference(g, ref); err != nil {
			return nil, m.groupErr(i, LoadCase{Name: "reference state", Temperature: b.Climate.Reference}, err)
		}
	}
	return m, nil
}

// reference sets a group's unstretched span length and backstays from its
// reference state, the backstay tension being what the saddle balances with
// the span-side pull.
func (m *model) reference(g group, ref cable.State) error {
	shape, err := cable.NewLoaded(m.span, ref.Load, ref.H)
	if err != nil {
		return err
	}
	// Unstretched length by Hooke's law on the unstretched length, the law
	// of every rope model here (see package cable).
	l0, err := cable.UnstretchedLength(m.span, g.elastic.EA, ref.Load, ref.H)
	if err != nil {
		return err
	}
	m.spanUnstretched = append(m.spanUnstretched, float64(l0))
	ta, tb := shape.SupportTensions()
	aa, ab := shape.SupportAngles()
	var bss [2]backstay
	for side, t := range [2]units.Force{ta, tb} {
		bank := m.bank(Side(side))
		a := [2]units.Angle{aa, ab}[side]
		bs := backstay{angle: backstayAngle(bank.Backstay, g.Offset)}
		bs.chord = units.Length(math.Hypot(float64(bank.Backstay.Horizontal), float64(bank.Backstay.Drop+g.Offset)))
		// The rope was set over the saddle with its tension continuous
		// (held = T_s), then clamped or left to grip: the backstay's
		// reference tension is what the saddle holds from there.
		bal, err := m.saddle(Side(side), g, 0).Balance(tower.RopePull{Tension: t, Angle: a}, bs.angle, t)
		if err != nil {
			return m.bankErr(Side(side), "tower.saddle", "reference state", err)
		}
		bs.unstretched = bs.unstretchedFor(g.elastic, float64(bal.Backstay))
		bss[side] = bs
	}
	m.backstays = append(m.backstays, bss)
	return nil
}

func (m *model) bank(s Side) Bank {
	if s == Left {
		return m.b.Banks.Left
	}
	return m.b.Banks.Right
}

// load returns the in-plane load of group g under case lc and the swing of
// the rope plane.
func (m *model) load(g group, lc LoadCase) (cable.Load, units.Angle) {
	vertical := units.LoadPerLength(lc.GammaG) * (g.self + units.LoadPerLength(g.share)*m.dead)
	crowd := units.LoadPerLength(lc.GammaQ*g.share) * m.crowd
	half := units.LoadPerLength(lc.GammaQ*g.share) * m.crowdHalf
	l := m.b.Site.Span
	load := cable.Load{Uniform: vertical}
	switch lc.Crowd {
	case FullSpan:
		load.Uniform += crowd
	case LeftHalf:
		load.Patches = []cable.Patch{{From: 0, To: l / 2, Load: half}}
	case RightHalf:
		load.Patches = []cable.Patch{{From: l / 2, To: l, Load: half}}
	}
	var swing units.Angle
	if lc.Wind && lc.GammaW > 0 && m.wind > 0 {
		depth := m.b.Walkway.WindDepth
		if depth == 0 {
			depth = m.b.Walkway.Depth
		}
		face := g.windWidth + units.Length(g.share*orDefault(m.b.Loads.WalkwayDrag, defaultWalkwayDrag))*depth
		lateral := lc.GammaW * float64(m.wind) * float64(face)
		swing = units.Angle(math.Atan2(lateral, float64(load.Uniform)))
		load.Uniform = units.LoadPerLength(math.Hypot(float64(load.Uniform), lateral))
	}
	return load, swing
}

// column returns the tower column of one bank, from its base section up
// to its highest saddle. A concrete column is the tower's gross rectangle;
// a steel tube or frame is given by its legs: breadth to the wind the legs'
// sizes side by side, weight the steel's.
func (m *model) column(s Side) tower.Column {
	t := m.bank(s).Tower
	c := tower.Column{Depth: t.Depth, Width: t.Width, Height: t.Height + m.topOffset(), Facing: t.Facing,
		UnitWeight: t.UnitWeight, Drag: t.Drag}
	if steel, legs := m.steel(s); legs > 0 {
		n := units.Length(legs)
		c = tower.Column{Depth: n * steel.Size, Width: steel.Size, Height: c.Height, UnitWeight: steelUnitWeight,
			Area: units.Area(legs) * steel.Area(), Drag: t.Drag}
		if c.Drag == 0 && steel.Shape == tower.Circular {
			c.Drag = circularDrag
		}
	}
	return c
}

// topOffset is the height of the highest saddle above the walkway-rope
// saddle: the column reaches up to it.
func (m *model) topOffset() units.Length {
	var top units.Length
	for _, g := range m.groups {
		top = max(top, g.Offset)
	}
	return top
}

// designCase returns the case with the factors of the partial-factor basis
// (EN 1990 set B), whatever the bridge's basis: the column sections are
// always checked on design actions.
func (m *model) designCase(lc LoadCase) LoadCase {
	if m.b.partial() {
		return lc
	}
	gG := orDefault(m.b.Basis.GammaG, defaultGammaG)
	gQ := orDefault(m.b.Basis.GammaQ, defaultGammaQ)
	lc.GammaG = gG
	if lc.Crowd != NoCrowd {
		lc.GammaQ = gQ
	}
	if lc.Wind {
		lc.GammaW = gQ
		if lc.Crowd != NoCrowd {
			lc.GammaW = gQ * m.psi
		}
	}
	return lc
}

// section returns the effective reinforced-concrete section of a column,
// bending along the bridge (H along, B across), checked to EN 1992-1-1 on
// design actions.
func (m *model) section(s Side) tower.RCSection {
	t := m.bank(s).Tower
	spec := t.Section
	sec := tower.RCSection{
		B: t.Width - 2*t.Facing, H: t.Depth - 2*t.Facing,
		Fc: spec.Concrete, Fy: spec.Steel, Code: tower.EN1992,
		GammaC: m.b.Basis.GammaConcrete, GammaS: m.b.Basis.GammaSteel, AlphaCC: m.b.Basis.AlphaCC,
	}
	if spec.Bars > 0 {
		area := units.Area(math.Pi / 4 * float64(spec.BarDiameter) * float64(spec.BarDiameter))
		sec.Bars = tower.RectangularBars(sec.B, sec.H, spec.Cover, spec.Bars/2, 0, area)
	}
	return sec
}
