package sagspan

import (
	"errors"
	"fmt"
	"math"
	"strings"

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

// grooveOf maps the description's groove; known is false when the
// description does not say (the chain then checks the bounds).
func grooveOf(s SaddleSpec) (g tower.Groove, known bool) {
	switch s.Groove {
	case "free":
		return tower.FreeGroove, true
	case "friction":
		return tower.FrictionGroove, true
	case "clamped":
		return tower.ClampedGroove, true
	}
	return tower.FreeGroove, saddleKind(s) != tower.Fixed
}

// saddle returns the saddle of one bank for rope group g: its kind, the
// groove behaviour of the variant being analysed, its height, and travel
// as its offset.
func (m *model) saddle(side Side, g group, travel units.Length) tower.Saddle {
	spec := m.bank(side).Tower.Saddle
	return tower.Saddle{Kind: saddleKind(spec), Friction: spec.Friction, Groove: m.grooves[side],
		GrooveFriction: spec.GrooveFriction, Height: m.bank(side).Tower.Height + g.Offset, Offset: travel}
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

// heldTension returns the tension of the backstay when it keeps the
// unstretched length l0 (at the rope's present temperature) over its chord:
// the inverse of unstretchedFor, T = EA (c/l0 − 1), or zero when the rope
// is longer than its chord and hangs slack. It is what a clamped rope, or
// a saddle that has not moved, leaves in the backstay.
func (bs backstay) heldTension(e cable.Elastic, l0 float64) float64 {
	return max(0, float64(e.EA)*(float64(bs.chord)/l0-1))
}

// travel returns how far a sliding or roller saddle has moved along the
// bridge (toward the span positive) from where it sat in the reference
// state: the rope it carries clamped keeps the backstay's unstretched
// length l0, so the backstay, stretched to l0 (1 + T/EA), reaches a chord
// longer than c by the saddle's travel times cos β:
//
//	Δ = [l0 (1 + T/EA) − c] / cos β
func (bs backstay) travel(e cable.Elastic, l0, t float64) units.Length {
	return units.Length((l0*(1+t/float64(e.EA)) - float64(bs.chord)) / math.Cos(float64(bs.angle)))
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

// saddleErr is a saddle's refusal of the rope over it (a wrap angle no
// rope over a saddle has, a sliding saddle lifted off), traced to the bank.
type saddleErr struct {
	side Side
	err  error
}

func (e saddleErr) Error() string { return e.side.String() + " saddle: " + e.err.Error() }
func (e saddleErr) Unwrap() error { return e.err }

// advice says what in the description to change.
func (e saddleErr) advice() string {
	if strings.Contains(e.err.Error(), "wrap angle") {
		f := "banks." + e.side.String()
		return "; the span rope rises from the saddle more steeply than the backstay falls, so it does not bear on the saddle: " +
			"lower the anchor (" + f + ".backstay.drop) or change the saddle levels (site.rise)"
	}
	return ""
}

// maxFeedIterations bounds the iteration on the rope rendered over the
// saddles; Newton's steps settle it in a few.
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
	return m.analyseFrom(lc, nil)
}

// analyseFrom is analyse with the rope fed over the saddles in a nearby
// state as the start of each group's iteration (warm, nil for none).
func (m *model) analyseFrom(lc LoadCase, warm *CaseState) (CaseState, error) {
	if lc.Situation == Construction {
		// New rope free to render over fixed saddles, as it is erected.
		defer m.erecting()()
	}
	cs := CaseState{Case: lc, Groups: make([]GroupState, len(m.groups))}
	var buf [2][8]tower.LevelForce // room for the saddles of eight groups and the column's wind
	levels := [2][]tower.LevelForce{buf[0][:0], buf[1][:0]}
	for i, g := range m.groups {
		in := m.solveInput(g, lc)
		if warm != nil {
			in.start, in.startShear = warm.Groups[i].H, warm.Groups[i].shear
		}
		swing := in.swing
		gs, err := m.groupState(i, in)
		if err != nil {
			var se saddleErr
			if errors.As(err, &se) {
				return CaseState{}, m.bankErr(se.side, "tower.saddle", lc.Name, fmt.Errorf("%s: %w%s", g.Name, se.err, se.advice()))
			}
			return CaseState{}, m.groupErr(i, lc, err)
		}
		for side := Left; side <= Right; side++ {
			saddle := m.saddle(side, g, gs.Travel[side])
			spanPull := tower.RopePull{Tension: gs.Tension[side], Angle: gs.Angle[side], Swing: swing}
			lf, err := saddle.Force(spanPull, tower.RopePull{Tension: gs.Backstay[side], Angle: gs.BackstayAngle[side]})
			if err != nil {
				return CaseState{}, m.bankErr(side, "tower.saddle", lc.Name, fmt.Errorf("%s: %w", g.Name, err))
			}
			gs.Saddle[side] = lf
			levels[side] = append(levels[side], lf)
			cs.Lateral[side] += lf.Lateral
			cs.LateralMoment[side] += units.MomentOf(lf.Lateral, saddle.Height)
		}
		cs.Groups[i] = gs
	}
	for side := Left; side <= Right; side++ {
		// Wind on the column face, across the bridge.
		if f := lc.GammaW * lc.Wind; f > 0 && m.wind > 0 {
			cw, err := m.column(side).Wind(units.Pressure(f) * m.wind)
			if err != nil {
				return CaseState{}, fmt.Errorf("sagspan: %s tower, case %q: %w", side, lc.Name, err)
			}
			levels[side] = append(levels[side], cw)
			cs.ColumnWind[side] = cw.Lateral
			cs.Lateral[side] += cw.Lateral
			cs.LateralMoment[side] += units.MomentOf(cw.Lateral, cw.Height)
		}
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
	// start, when positive, is the group's horizontal tension in a nearby
	// state at the same temperature, whose load has the shear integral
	// startShear (cable.LengthCurve.ShearIntegral): the iteration starts
	// from the change-of-state cubic's estimate from there.
	start      units.Force
	startShear float64
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
	if lc.Situation == Construction {
		// The walkway is placed on new rope, set by the erection table: it
		// has not yet taken its constructional stretch (cautious: it takes
		// some as the walkway goes on).
		in.scale = 1 / (1 + g.constructionalStretch())
	}
	if lc.Broken > 0 && lc.BrokenGroup == g.Name && g.Count > lc.Broken {
		in.intact = float64(g.Count-lc.Broken) / float64(g.Count)
	}
	return in
}

// solveGroup returns the state of rope group i under the input's load,
// swing, temperatures and ropes.
//
// The rope is one from anchor to anchor: the span's unstretched length
// grows by the rope the backstays give up as their tensions change (over a
// free groove) or stay (clamped), so the group's horizontal tension H
// solves
//
//	F(H) = L₀(H) − l0 − Σ [l0_b − c_b/(1 + T_b(H)/EA)] = 0
//
// with L₀(H) the unstretched length of the span hanging with H
// (cable.LengthCurve), l0 the span's own, and T_b(H) the backstay tension
// each saddle balances with the span's pull at H (tower.Saddle.Balance).
// F falls as H grows (the span needs less rope, the backstays give up
// more), so Newton's method in H, with the span's derivative exact and the
// backstays' by a difference (taken again only where a saddle's regime
// changes), safeguarded by bisection inside the bracket its iterates
// build, finds the one root; it starts from the input's start
// (a nearby state's H) or from the span alone hanging l0
// (cable.StateForLength). With ropes broken, the ropes left keep their
// unstretched lengths and the group's stiffness is theirs.
func (m *model) solveGroup(i int, in solveInput) (GroupState, error) {
	load, swing, dt := in.load, in.swing, in.dt
	g := m.groups[i]
	e := g.elastic
	e.EA *= units.AxialStiffness(in.intact)
	// Linear thermal strain from the reference temperature, on the span and
	// on the backstays each at its own temperature (package cable's
	// constitutive law); new rope shorter by the scale.
	thermal := (1 + float64(e.Alpha)*dt) * in.scale
	thermalBackstay := (1 + float64(e.Alpha)*in.dtBackstay) * in.scale
	l0 := m.spanUnstretched[i] * thermal
	curve, err := cable.NewLengthCurve(m.span, e.EA, load)
	if err != nil {
		return GroupState{}, err
	}
	var saddles [2]tower.Saddle
	var l0b, held [2]float64
	for side := Left; side <= Right; side++ {
		saddles[side] = m.saddle(side, g, 0)
		l0b[side] = m.backstays[i][side].unstretched * thermalBackstay
		held[side] = m.backstays[i][side].heldTension(e, l0b[side])
	}
	// balance returns the backstay tensions at H.
	balance := func(h float64) (bal [2]tower.Balance, err error) {
		ta, tb, aa, ab := curve.Supports(units.Force(h))
		ts, as := [2]units.Force{ta, tb}, [2]units.Angle{aa, ab}
		for side := Left; side <= Right; side++ {
			bal[side], err = saddles[side].Balance(tower.RopePull{Tension: ts[side], Angle: as[side], Swing: swing},
				m.backstays[i][side].angle, units.Force(held[side]))
			if err != nil {
				return bal, saddleErr{side: side, err: err}
			}
		}
		return bal, nil
	}
	// given returns the rope the backstays give up at backstay tensions bal.
	given := func(bal [2]tower.Balance) float64 {
		var out float64
		for side := Left; side <= Right; side++ {
			out += l0b[side] - m.backstays[i][side].unstretchedFor(e, float64(bal[side].Backstay))
		}
		return out
	}
	h := float64(curve.Estimate(in.startShear, in.start))
	if !(in.start > 0) || !(in.startShear > 0) {
		st, err := cable.StateForLength(m.span, e.EA, load, units.Length(l0), m.ref[i].Temperature+units.Temperature(dt))
		if err != nil {
			return GroupState{}, err
		}
		h = float64(st.H)
	}
	lo, hi := 0.0, math.Inf(1)
	converged := false
	// The backstays' slope dgiven/dH, by a difference, and the saddles'
	// regime it was taken in: within a regime it changes little from one
	// iteration to the next and is kept; a saddle that starts to move, or
	// stops, takes it anew.
	var backSlope float64
	var backRegime [2]tower.Balance
	haveSlope := false
	for range maxFeedIterations {
		span, dspan := curve.At(units.Force(h))
		bal, err := balance(h)
		if err != nil {
			return GroupState{}, err
		}
		f := float64(span) - l0 - given(bal)
		if f == 0 {
			converged = true
			break
		}
		if math.IsNaN(f) {
			break
		}
		if f > 0 {
			lo = h
		} else {
			hi = h
		}
		// The backstays' part of the slope by a forward difference: the
		// balance is piecewise smooth in H.
		if regime := [2]tower.Balance{{Motion: bal[0].Motion, Direction: bal[0].Direction},
			{Motion: bal[1].Motion, Direction: bal[1].Direction}}; !haveSlope || regime != backRegime {
			dh := h * 1e-7
			bal2, err := balance(h + dh)
			if err != nil {
				return GroupState{}, err
			}
			backSlope, backRegime, haveSlope = (given(bal2)-given(bal))/dh, regime, true
		}
		next := h - f/(dspan-backSlope)
		if !(next > lo && next < hi) {
			switch {
			case math.IsInf(hi, 1):
				next = 2 * h
			case lo == 0:
				next = h / 2
			default:
				next = lo + (hi-lo)/2
			}
		}
		// Newton converges quadratically, the backstays' slope (a
		// difference, kept within a regime) adding a linear factor below
		// 1e-4: after a step below 1e-9 of H what is left is below 1e-13
		// of H.
		if math.Abs(next-h) <= 1e-9*next || hi-lo <= 1e-13*next {
			h, converged = next, true
			break
		}
		h = next
	}
	if !converged || !(h > 0) || math.IsInf(h, 0) {
		return GroupState{}, fmt.Errorf("rope rendered over the saddles does not settle after %d iterations", maxFeedIterations)
	}
	if err := curve.CheckStrain(units.Force(h)); err != nil {
		return GroupState{}, err
	}
	shape, err := cable.NewLoaded(m.span, load, units.Force(h))
	if err != nil {
		return GroupState{}, err
	}
	bal, err := balance(h)
	if err != nil {
		return GroupState{}, err
	}
	gs := GroupState{Group: g.Name, Load: load, Swing: swing, H: units.Force(h), shape: shape, shear: curve.ShearIntegral()}
	ta, tb := shape.SupportTensions()
	aa, ab := shape.SupportAngles()
	gs.Tension = [2]units.Force{ta, tb}
	gs.Angle = [2]units.Angle{aa, ab}
	gs.Sag = shape.Sag(m.b.Site.Span / 2)
	gs.LowX, gs.LowZ = shape.LowPoint()
	gs.MaxTension = shape.MaxTension()
	for side := Left; side <= Right; side++ {
		bs := m.backstays[i][side]
		tback := float64(bal[side].Backstay)
		hs, _, _ := elevationPull(gs.Tension[side], gs.Angle[side], swing)
		gs.Held[side] = units.Force(held[side])
		gs.Unbalance[side] = units.Force(hs - held[side]*math.Cos(float64(bs.angle)))
		gs.Backstay[side], gs.BackstayAngle[side] = bal[side].Backstay, bs.angle
		gs.SaddleMoved[side] = bal[side].Motion == tower.Travelled
		if gs.SaddleMoved[side] {
			gs.Travel[side] = bs.travel(e, l0b[side], tback)
		}
		gs.MaxTension = max(gs.MaxTension, units.Force(tback))
	}
	return gs, nil
}
