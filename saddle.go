package sagspan

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// saddleKind maps the description's saddle kind.
func saddleKind(s SaddleSpec) tower.SaddleKind {
	switch s.Kind {
	case "sliding":
		return tower.Sliding
	case "roller":
		return tower.Roller
	}
	return tower.Fixed
}

// backstay is one rope group's backstay at one bank: a straight rope from
// the saddle down to the anchor (its own sag neglected, common practice for
// short, steep backstays).
type backstay struct {
	chord units.Length // saddle to anchor
	angle units.Angle  // below horizontal at the saddle, above it at the anchor
	// unstretched is the backstay's unstretched length at the reference
	// temperature, set by its tension in the reference state.
	unstretched float64
}

// unstretchedFor returns the unstretched length, at the rope's present
// temperature, of the backstay when it carries tension t: c/(1 + T/EA).
func (bs backstay) unstretchedFor(e cable.Elastic, t float64) float64 {
	return float64(bs.chord) / (1 + t/float64(e.EA))
}

// saddleBalance returns the backstay tension over a saddle of the given
// kind. The rope renders over the saddle's groove, friction there
// neglected (common practice), so its tension is continuous, T_b = T_s,
// unless the saddle itself moves on the column top. The span-side pull is
// given by its tension ts and, in the elevation plane, its horizontal and
// vertical components h and v:
//
//	fixed:   T_b = T_s                               (the column takes H = h − T_b cos β)
//	roller:  T_b = h / cos β                         (the saddle rolls until the horizontals balance)
//	sliding: T_b = T_s    while |h − T_s cos β| <= μ (v + T_s sin β)
//	         T_b = (h − sμv)/(cos β + sμ sin β)      once the saddle slides, s the sign of the unbalance
//
// with the normal force taken as the vertical component, as package tower
// does (common practice). slide, when not zero, holds a sliding saddle
// sliding in that direction (+1: toward the span); the result's moved is
// the direction the saddle moved, zero when it stayed (a roller gives +1).
func saddleBalance(kind tower.SaddleKind, mu, ts, h, v float64, beta units.Angle, slide float64) (t, moved float64) {
	cb, sb := math.Cos(float64(beta)), math.Sin(float64(beta))
	switch kind {
	case tower.Roller:
		return h / cb, 1
	case tower.Sliding:
		if slide == 0 {
			unbalance := h - ts*cb
			if math.Abs(unbalance) <= mu*(v+ts*sb) {
				return ts, 0
			}
			slide = math.Copysign(1, unbalance)
		}
		return (h - slide*mu*v) / (cb + slide*mu*sb), slide
	}
	return ts, 0
}

// elevationPull returns the components, in the elevation plane, of the
// span-side rope pull on a saddle: h along the bridge and v down, from the
// tension t at angle a below horizontal in the rope's plane, which wind has
// swung by swing from the vertical; lateral is the component across the
// bridge.
func elevationPull(t units.Force, a, swing units.Angle) (h, v, lateral float64) {
	h = float64(t) * math.Cos(float64(a))
	inPlane := float64(t) * math.Sin(float64(a))
	return h, inPlane * math.Cos(float64(swing)), inPlane * math.Sin(float64(swing))
}

// maxFeedIterations bounds the iteration on the rope rendered over the
// saddles; the secant steps settle it in a few.
const maxFeedIterations = 60

// analyse returns the state of the bridge under case lc.
//
// Each rope group's span hangs its unstretched length, that of the
// reference state at the case's temperature (cable.StateForLength). The
// rope runs on from the span over the saddles into the backstays, so rope
// renders between them: the span's unstretched length grows by what the
// backstays give up, Σ [l0_b,θ − c_b/(1 + T_b/EA)],
// and the span and backstay tensions are solved together (the anchors and,
// but for sliding and roller saddles, the saddles fixed).
func (m *model) analyse(lc LoadCase) (CaseState, error) {
	cs := CaseState{Case: lc, Groups: make([]GroupState, len(m.groups))}
	var levels [2][]tower.LevelForce
	dt := float64(lc.Temperature - m.b.Climate.Reference)
	for i, g := range m.groups {
		load, swing := m.load(g, lc)
		gs, err := m.solveGroup(i, load, swing, dt)
		if err != nil {
			return CaseState{}, m.groupErr(i, lc, err)
		}
		for side := Left; side <= Right; side++ {
			bank := m.bank(side)
			h, v, lateral := elevationPull(gs.Tension[side], gs.Angle[side], swing)
			spanPull := tower.Pull{Tension: units.Force(math.Hypot(h, v)), Angle: units.Angle(math.Atan2(v, h))}
			saddle := tower.Saddle{Kind: saddleKind(bank.Tower.Saddle), Friction: bank.Tower.Saddle.Friction, Height: bank.Tower.Height + g.Offset}
			lf, err := saddle.Force(spanPull, tower.Pull{Tension: gs.Backstay[side], Angle: gs.BackstayAngle[side]})
			if err != nil {
				return CaseState{}, m.bankErr(side, "tower.saddle", lc.Name, fmt.Errorf("%s: %w", g.Name, err))
			}
			gs.Saddle[side] = lf
			levels[side] = append(levels[side], lf)
			cs.Lateral[side] += units.Force(lateral)
			cs.LateralMoment[side] += units.MomentOf(units.Force(lateral), saddle.Height)
		}
		cs.Groups[i] = gs
	}
	for side := Left; side <= Right; side++ {
		// The column's own weight carries the permanent load factor of the
		// case (1 on characteristic loads).
		r, err := tower.Combine(levels[side], units.Force(lc.GammaG)*m.column(side).Weight())
		if err != nil {
			return CaseState{}, m.bankErr(side, "tower", lc.Name, err)
		}
		cs.Tower[side] = r
	}
	return cs, nil
}

// solveGroup returns the state of rope group i under load, swung by swing,
// dt kelvin from the reference temperature.
//
// The rope rendered into the span, feed, solves r(feed) = g(feed) − feed = 0
// where g is the rope the backstays give up once the span hangs with that
// feed; secant steps from feed = 0, safeguarded by plain iteration.
func (m *model) solveGroup(i int, load cable.Load, swing units.Angle, dt float64) (GroupState, error) {
	g := m.groups[i]
	e := g.elastic
	// Linear thermal strain from the reference temperature, on the span and
	// the backstays alike (package cable's constitutive law).
	thermal := 1 + float64(e.Alpha)*dt
	l0 := m.spanUnstretched[i] * thermal
	temp := m.ref[i].Temperature + units.Temperature(dt)
	// slide records the direction a sliding saddle has slid: once it
	// slides it stays sliding while the iteration settles, so that the
	// feed cannot flip between held and sliding.
	var slide [2]float64
	var gs GroupState
	step := func(feed float64) (float64, error) {
		st, err := cable.StateForLength(m.span, e.EA, load, units.Length(l0+feed), temp)
		if err != nil {
			return 0, err
		}
		shape, err := cable.NewLoaded(m.span, load, st.H)
		if err != nil {
			return 0, err
		}
		gs = GroupState{Group: g.Name, Load: load, Swing: swing, H: st.H, shape: shape}
		ta, tb := shape.SupportTensions()
		aa, ab := shape.SupportAngles()
		gs.Tension = [2]units.Force{ta, tb}
		gs.Angle = [2]units.Angle{aa, ab}
		gs.Sag = shape.Sag(m.b.Site.Span / 2)
		gs.LowX, gs.LowZ = shape.LowPoint()
		gs.MaxTension = shape.MaxTension()
		given := 0.0
		for side := Left; side <= Right; side++ {
			bank := m.bank(side)
			bs := m.backstays[i][side]
			h, v, _ := elevationPull(gs.Tension[side], gs.Angle[side], swing)
			tback, dir := saddleBalance(saddleKind(bank.Tower.Saddle), bank.Tower.Saddle.Friction, float64(gs.Tension[side]), h, v, bs.angle, slide[side])
			slide[side] = dir
			gs.Backstay[side], gs.BackstayAngle[side], gs.SaddleMoved[side] = units.Force(tback), bs.angle, dir != 0
			gs.MaxTension = max(gs.MaxTension, units.Force(tback))
			given += bs.unstretched*thermal - bs.unstretchedFor(e, tback)
		}
		return given, nil
	}
	tol := 1e-10 * float64(m.span.Length)
	x0, x1 := 0.0, 0.0
	g0, err := step(x0)
	if err != nil {
		return GroupState{}, err
	}
	r0 := g0 - x0
	x1 = g0
	for range maxFeedIterations {
		g1, err := step(x1)
		if err != nil {
			return GroupState{}, err
		}
		r1 := g1 - x1
		if math.Abs(r1) <= tol {
			return gs, nil
		}
		next := g1 // plain iteration
		if d := r1 - r0; d != 0 {
			if sec := x1 - r1*(x1-x0)/d; !math.IsNaN(sec) && !math.IsInf(sec, 0) {
				next = sec
			}
		}
		x0, r0, x1 = x1, r1, next
	}
	return GroupState{}, fmt.Errorf("rope rendered over the saddles does not settle after %d iterations", maxFeedIterations)
}
