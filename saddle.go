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
// Each rope group's span is a change of state from its reference state
// (cable.ChangeOfState). The rope runs on from the span over the saddles
// into the backstays, so rope renders between them: the span's unstretched
// length grows by what the backstays give up, Σ [l0_b,θ − c_b/(1 + T_b/EA)],
// and the span and backstay tensions are solved together (the anchors and,
// but for sliding and roller saddles, the saddles fixed).
func (m *model) analyse(lc LoadCase) (CaseState, error) {
	return m.analyseFrom(lc, nil)
}

// analyseFrom is analyse with the rope fed over the saddles in a nearby
// state as the start of each group's iteration (warm, nil for none).
func (m *model) analyseFrom(lc LoadCase, warm *CaseState) (CaseState, error) {
	cs := CaseState{Case: lc, Groups: make([]GroupState, len(m.groups))}
	var levels [2][]tower.LevelForce
	for i, g := range m.groups {
		in := m.solveInput(g, lc)
		if warm != nil {
			in.feed = warm.Groups[i].feed
		}
		gs, err := m.groupState(i, in)
		if err != nil {
			return CaseState{}, fmt.Errorf("sagspan: %s, case %q: %w", g.Name, lc.Name, err)
		}
		swing := in.swing
		for side := Left; side <= Right; side++ {
			bank := m.bank(side)
			h, v, lateral := elevationPull(gs.Tension[side], gs.Angle[side], swing)
			spanPull := tower.Pull{Tension: units.Force(math.Hypot(h, v)), Angle: units.Angle(math.Atan2(v, h))}
			saddle := tower.Saddle{Kind: saddleKind(bank.Tower.Saddle), Friction: bank.Tower.Saddle.Friction, Height: bank.Tower.Height + g.Offset}
			lf, err := saddle.Force(spanPull, tower.Pull{Tension: gs.Backstay[side], Angle: gs.BackstayAngle[side]})
			if err != nil {
				return CaseState{}, fmt.Errorf("sagspan: %s saddle, %s, case %q: %w", side, g.Name, lc.Name, err)
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
			return CaseState{}, fmt.Errorf("sagspan: %s tower, case %q: %w", side, lc.Name, err)
		}
		cs.Tower[side] = r
	}
	return cs, nil
}

// solveInput is what a rope group's state is solved for.
type solveInput struct {
	load  cable.Load
	swing units.Angle
	// dt and dtBackstay are the rope temperatures of the span and of the
	// backstays, in kelvin from the reference.
	dt, dtBackstay float64
	// intact is the fraction of the group's ropes left (1 but with a rope
	// broken): the group's stiffness falls with it, the unstretched lengths
	// of the ropes left stay theirs.
	intact float64
	// scale multiplies every unstretched length of the group: 1 but for new
	// rope before its constructional stretch (the erection table).
	scale float64
	// feed starts the iteration on the rope rendered over the saddles.
	feed float64
}

// solveInput returns the input of group g's state under case lc.
func (m *model) solveInput(g group, lc LoadCase) solveInput {
	load, swing := m.load(g, lc)
	in := solveInput{load: load, swing: swing, intact: 1, scale: 1,
		dt: float64(lc.Temperature - m.b.Climate.Reference)}
	in.dtBackstay = in.dt
	if lc.BackstayTemperature != 0 {
		in.dtBackstay = float64(lc.BackstayTemperature - m.b.Climate.Reference)
	}
	if lc.Broken > 0 && lc.BrokenGroup == g.Name && g.Count > lc.Broken {
		in.intact = float64(g.Count-lc.Broken) / float64(g.Count)
	}
	return in
}

// solveGroup returns the state of rope group i under the input's load,
// swing, temperatures and ropes.
//
// The rope rendered into the span, feed, solves r(feed) = g(feed) − feed = 0
// where g is the rope the backstays give up once the span hangs with that
// feed; secant steps from the input's feed, safeguarded by plain iteration.
func (m *model) solveGroup(i int, in solveInput) (GroupState, error) {
	load, swing, dt := in.load, in.swing, in.dt
	g := m.groups[i]
	e := g.elastic
	// The rope fed into the span reaches the change of state as an
	// equivalent change of the span's unstretched length, through the
	// thermal term: exp(α' dθ') = exp(α dt)·(1 + feed/l0,θ).
	thermal := math.Exp(float64(e.Alpha)*dt) * in.scale
	thermalBackstay := math.Exp(float64(e.Alpha)*in.dtBackstay) * in.scale
	l0 := m.spanUnstretched[i] * thermal
	// With ropes broken the change of state, which measures the reference
	// state's unstretched length with the group's present stiffness, is
	// corrected to the unstretched length the ropes left really have.
	var correct float64
	if in.intact != 1 {
		e.EA *= units.AxialStiffness(in.intact)
		correct = math.Log(m.spanUnstretched[i] / (m.refLength[i] - m.refIntegral[i]/float64(e.EA)))
	}
	// slide records the direction a sliding saddle slides. Every sliding
	// saddle is first held (as a fixed one); it slides only if the settled
	// held state asks more of its plate than friction gives, and the state
	// is then solved again with it sliding that way. Deciding on settled
	// states, never during the iteration, makes the answer independent of
	// where the iteration starts.
	var slide [2]float64
	var gs GroupState
	step := func(feed float64) (float64, error) {
		grow := float64(e.Alpha)*dt + math.Log(in.scale) + correct + math.Log1p(feed/l0)
		// Any positive α' serves; this one keeps dθ' within ±100 K, so the
		// equivalent temperature stays an absolute temperature.
		alphaEq := math.Max(1e-5, math.Abs(grow)/100)
		eq := cable.Elastic{EA: e.EA, Alpha: units.ThermalExpansion(alphaEq)}
		st, err := cable.ChangeOfState(m.span, eq, m.ref[i], load, m.ref[i].Temperature+units.Temperature(grow/alphaEq))
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
		gs.LowX, gs.LowZ, gs.LowWithin = shape.LowPoint()
		gs.MaxTension = max(ta, tb)
		given := 0.0
		for side := Left; side <= Right; side++ {
			bank := m.bank(side)
			bs := m.backstays[i][side]
			h, v, _ := elevationPull(gs.Tension[side], gs.Angle[side], swing)
			kind := saddleKind(bank.Tower.Saddle)
			if kind == tower.Sliding && slide[side] == 0 {
				kind = tower.Fixed // held
			}
			tback, dir := saddleBalance(kind, bank.Tower.Saddle.Friction, float64(gs.Tension[side]), h, v, bs.angle, slide[side])
			gs.Backstay[side], gs.BackstayAngle[side], gs.SaddleMoved[side] = units.Force(tback), bs.angle, dir != 0
			gs.MaxTension = max(gs.MaxTension, units.Force(tback))
			given += bs.unstretched*thermalBackstay - bs.unstretchedFor(e, tback)
		}
		gs.feed = feed
		return given, nil
	}
	tol := 1e-10 * float64(m.span.Length)
	settle := func(x0 float64) error {
		g0, err := step(x0)
		if err != nil {
			return err
		}
		r0 := g0 - x0
		x1 := g0
		for range maxFeedIterations {
			g1, err := step(x1)
			if err != nil {
				return err
			}
			r1 := g1 - x1
			if math.Abs(r1) <= tol {
				return nil
			}
			next := g1 // plain iteration
			if d := r1 - r0; d != 0 {
				if sec := x1 - r1*(x1-x0)/d; !math.IsNaN(sec) && !math.IsInf(sec, 0) {
					next = sec
				}
			}
			x0, r0, x1 = x1, r1, next
		}
		return fmt.Errorf("rope rendered over the saddles does not settle after %d iterations", maxFeedIterations)
	}
	if err := settle(in.feed); err != nil {
		return GroupState{}, err
	}
	// A held sliding saddle whose plate needs more than friction slides;
	// with one sliding the other may then need to, hence the second round.
	for range 2 {
		again := false
		for side := Left; side <= Right; side++ {
			saddle := m.bank(side).Tower.Saddle
			if saddleKind(saddle) != tower.Sliding || slide[side] != 0 {
				continue
			}
			h, v, _ := elevationPull(gs.Tension[side], gs.Angle[side], swing)
			if _, dir := saddleBalance(tower.Sliding, saddle.Friction, float64(gs.Tension[side]), h, v, m.backstays[i][side].angle, 0); dir != 0 {
				slide[side], again = dir, true
			}
		}
		if !again {
			return gs, nil
		}
		if err := settle(gs.feed); err != nil {
			return GroupState{}, err
		}
	}
	return gs, nil
}
