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
	b      *Bridge // read only, shared by the copies of the model
	span   cable.Span
	groups []group
	ground [2]bankGround
	dead   units.LoadPerLength // walkway dead load per metre, without ropes
	wind   units.Pressure
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
	// terse leaves out of the results what only a reader needs (values
	// and text the numbers do not depend on): the loaded-length search's
	// sweep, which keeps only ratios.
	terse bool
	// states holds the group states solved so far, by their input (and the
	// variant's grooves): a group that carries no crowd hangs alike under
	// every crowd, and a case's service and design states often share
	// groups.
	states *stateCache
	// stretch is set while the states of a loaded-length search's stretch
	// are solved (see groupState).
	stretch bool
	// columns holds each bank's concrete column member as built for the
	// variant last analysed (see rcColumn).
	columns [2]builtColumn
	// saddleTexts holds the symbols and meanings of each group's saddle
	// values (see saddleValues).
	saddleTexts [][10][2]string
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
		b: &b, span: b.span(), groups: gs,
		dead: b.Walkway.dead(),
		wind: b.wind(),
	}
	m.saddleTexts = saddleTexts(gs)
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
		w0 := m.permanent(g)
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

// bank returns the description of one bank (not a copy: read only).
func (m *model) bank(s Side) *Bank {
	if s == Left {
		return &m.b.Banks.Left
	}
	return &m.b.Banks.Right
}

// load returns the in-plane load of group g under case lc and the swing of
// the rope plane:
//
//	vertical  γG (w_rope + s g_walkway λ) [+ γQ ψ s q(a) b λ on the crowd's stretch]
//	lateral   γW ψW q_p (Σ c_f d + s c_f,walkway h_walkway)
//	lift      γW ψW s c_f,z q_p b          (upward, when the case lifts the walkway)
//
// with s the group's share of the walkway, q(a) the crowd pressure of the
// loaded length a, b the walkway width, λ the walkway's length per
// horizontal metre over the stretch loaded (walkwayArc; the rope weight
// w_rope already holds its S/l). The rope plane swings to carry the
// vector sum of the uniform vertical load and the wind, so the uniform
// in-plane load is √(vertical² + lateral²). A crowd stretch that is not the
// whole span stays a vertical patch in the swung plane: it is taken there as
// 1/cos(swing) of itself, so that its vertical component is its whole
// weight (more than its in-plane component, conservative for tensions; its
// lateral component tan(swing) of it is fictitious, conservative across
// the bridge). In the construction stage the walkway's dead load lies only on
// the placed stretch.
func (m *model) load(g group, lc LoadCase) (cable.Load, units.Angle) {
	l := m.b.Site.Span
	gG := units.LoadPerLength(lc.GammaG)
	load := cable.Load{Uniform: gG * g.self}
	// The walkway's dead load is per metre of walkway, the crowd per
	// square metre of its surface: per horizontal metre both grow by the
	// walkway's length over the stretch they cover (walkwayArc).
	walkway := gG * units.LoadPerLength(g.share) * m.dead
	if lc.Situation == Construction {
		if deck := clip(lc.Deck, l); !deck.Empty() && walkway > 0 {
			load.Patches = append(load.Patches, cable.Patch{From: deck.From, To: deck.To, Load: walkway * units.LoadPerLength(m.walkwayArc(g, deck))})
		}
	} else {
		load.Uniform += walkway * units.LoadPerLength(m.walkwayArc(g, Stretch{0, l}))
	}
	if crowd := clip(lc.Crowd, l); lc.GammaQ*lc.CrowdFactor*g.share > 0 && !crowd.Empty() {
		q := lc.CrowdPressure
		if q == 0 {
			q = m.b.crowd(crowd.Length())
		}
		w := units.LoadPerLength(lc.GammaQ * lc.CrowdFactor * g.share * float64(q) * float64(m.b.Walkway.Width) * m.walkwayArc(g, crowd))
		if crowd.Length() >= l {
			load.Uniform += w
		} else {
			load.Patches = append(load.Patches, cable.Patch{From: crowd.From, To: crowd.To, Load: w})
		}
	}
	var swing units.Angle
	if f := lc.GammaW * lc.Wind; f > 0 && m.wind > 0 {
		depth := m.b.Walkway.WindDepth
		if depth == 0 {
			depth = m.b.Walkway.Depth
		}
		face := g.windWidth + units.Length(g.share*orDefault(m.b.Loads.WalkwayDrag, defaultWalkwayDrag))*depth
		lateral := f * float64(m.wind) * float64(face)
		vertical := float64(load.Uniform)
		if lc.Lift {
			vertical -= f * g.share * float64(m.b.lift())
		}
		swing = units.Angle(math.Atan2(lateral, vertical))
		load.Uniform = units.LoadPerLength(math.Hypot(vertical, lateral))
		// A crowd on part of the span, a vertical load, in the swung
		// plane: taken as 1/cos(swing) of itself there, so that its
		// vertical component on the saddles is its whole weight (its
		// lateral one, tan(swing) of it, is not there in truth:
		// conservative across the bridge).
		if c := math.Cos(float64(swing)); len(load.Patches) > 0 && c > 0 {
			for k := range load.Patches {
				load.Patches[k].Load /= units.LoadPerLength(c)
			}
		}
	}
	return load, swing
}

// clip returns the part of s within the span [0, l].
func clip(s Stretch, l units.Length) Stretch {
	return Stretch{From: max(s.From, 0), To: min(s.To, l)}
}

// column returns the tower column of one bank, from its base section up
// to its highest saddle. A concrete column is the tower's gross rectangle;
// a steel tube or frame is given by its legs: breadth to the wind the legs'
// sizes side by side, weight the steel's.
func (m *model) column(s Side) tower.Column {
	t := &m.bank(s).Tower
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

// section returns the effective reinforced-concrete section of a column,
// bending along the bridge (H along, B across), checked to EN 1992-1-1 on
// design actions.
func (m *model) section(s Side) tower.RCSection {
	t := &m.bank(s).Tower
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
