package sagspan

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// Options tune a whole-bridge check. A nil *Options means the defaults.
type Options struct {
	// ErectionStep is the temperature step of the erection table; zero
	// means 5 K.
	ErectionStep float64
	// StrictComfort fails, rather than flags, natural frequencies in the
	// ranges walkers excite. Default false: flags.
	StrictComfort bool
}

// Side names a bank.
type Side int

// The banks.
const (
	Left Side = iota
	Right
)

func (s Side) String() string {
	if s == Left {
		return "left"
	}
	return "right"
}

// The elements of each bank as reports name them.
var (
	towerElement         = [2]string{"left tower", "right tower"}
	towerAcrossElement   = [2]string{"left tower, across", "right tower, across"}
	footingElement       = [2]string{"left footing", "right footing"}
	footingAcrossElement = [2]string{"left footing, across", "right footing, across"}
	anchorElement        = [2]string{"left anchor", "right anchor"}
)

// GroupState is the state of one rope group under one load case.
type GroupState struct {
	Group string
	// Load is the load per horizontal metre in the plane of the ropes (the
	// vector sum of vertical load and wind when the ropes swing).
	Load cable.Load
	// Swing is the angle by which wind turns the plane of the ropes from
	// the vertical.
	Swing units.Angle
	// H is the horizontal tension of the group (all its ropes).
	H units.Force
	// Tension and Angle are the span-side tension and angle below
	// horizontal at each saddle; Backstay and BackstayAngle the backstay's.
	Tension, Backstay    [2]units.Force
	Angle, BackstayAngle [2]units.Angle
	Sag                  units.Length // at midspan below the chord
	LowX, LowZ           units.Length // lowest point, z from the left saddle
	LowWithin            bool         // false when the lowest point is a saddle
	MaxTension           units.Force  // the largest of span and backstay tensions
	// SaddleMoved reports whether the saddle moved on the column top: a
	// sliding saddle that slid, or a roller.
	SaddleMoved [2]bool
	// Saddle is the force on each tower column from this group's saddle.
	Saddle [2]tower.LevelForce
	shape  cable.Loaded
}

// CaseState is the state of the whole bridge under one load case.
type CaseState struct {
	Case   LoadCase
	Groups []GroupState
	// Tower is the resultant of the saddle forces and column weight at each
	// column base.
	Tower [2]tower.Resultant
	// Lateral is the force across the bridge that wind-swung ropes put on
	// each tower, and LateralMoment its moment about the column base.
	Lateral       [2]units.Force
	LateralMoment [2]units.Moment
}

// ErectionTable is the erection-sag table of one rope group.
type ErectionTable struct {
	Group string
	Rows  []cable.ErectionRow
}

// Analysis is everything the whole-bridge check found.
type Analysis struct {
	Bridge Bridge
	// Report holds every check result of every case.
	Report check.Report
	// Service holds the states under characteristic loads (all factors 1):
	// clearance, eccentricity, drawing, anchors and footings are checked on
	// them. Design holds the states under the factored loads of the partial
	// basis: rope tension (on that basis) and column sections.
	Service, Design []CaseState
	Modes           cable.Modes
	Erection        []ErectionTable
}

// model is a bridge resolved for analysis.
type model struct {
	b      Bridge
	span   cable.Span
	groups []group
	soils  [2]foundation.Soil
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
	pulls   []foundation.Pull
	// spanUnstretched is each group's unstretched span length in the
	// reference state; backstays are each group's backstays.
	spanUnstretched []float64
	backstays       [][2]backstay
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
	}
	for i, bank := range []Bank{b.Banks.Left, b.Banks.Right} {
		if m.soils[i], err = bank.Soil.soil(); err != nil {
			return nil, fieldErr("banks."+Side(i).String()+".soil", "%v", err)
		}
	}
	l := float64(b.Site.Span)
	for _, g := range gs {
		w0 := g.self + units.LoadPerLength(g.share)*m.dead
		h0 := units.Force(float64(w0) * l * l / (8 * float64(g.Sag))) // H = w l²/(8 f)
		ref := cable.State{Load: cable.Load{Uniform: w0}, H: h0, Temperature: b.Climate.Reference}
		m.ref = append(m.ref, ref)
		if err := m.reference(g, ref); err != nil {
			return nil, err
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
		return fmt.Errorf("sagspan: %s, reference state: %w", g.Name, err)
	}
	// Unstretched length: L₀ = S − (1/EA) ∫T ds with ∫T ds = H (l + h²/l) + D/H,
	// D = ∫Q² dx = w² l³/12 for the uniform reference load (the small-strain
	// rule; see cable.ChangeOfState).
	l, h := float64(m.span.Length), float64(m.span.Rise)
	w, hh := float64(ref.Load.Uniform), float64(ref.H)
	integral := hh*(l+h*h/l) + w*w*l*l*l/12/hh
	m.spanUnstretched = append(m.spanUnstretched, float64(shape.Length())-integral/float64(g.elastic.EA))
	ta, tb := shape.SupportTensions()
	aa, ab := shape.SupportAngles()
	var bss [2]backstay
	for side, t := range [2]units.Force{ta, tb} {
		bank := m.bank(Side(side))
		a := [2]units.Angle{aa, ab}[side]
		bs := backstay{angle: backstayAngle(bank.Backstay, g.Offset)}
		bs.chord = units.Length(math.Hypot(float64(bank.Backstay.Horizontal), float64(bank.Backstay.Drop+g.Offset)))
		hx, v, _ := elevationPull(t, a, 0)
		t0, _ := saddleBalance(saddleKind(bank.Tower.Saddle), bank.Tower.Saddle.Friction, float64(t), hx, v, bs.angle, 0)
		bs.unstretched = bs.unstretchedFor(g.elastic, t0)
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
	cs := CaseState{Case: lc, Groups: make([]GroupState, len(m.groups))}
	var levels [2][]tower.LevelForce
	dt := float64(lc.Temperature - m.b.Climate.Reference)
	for i, g := range m.groups {
		load, swing := m.load(g, lc)
		gs, err := m.solveGroup(i, load, swing, dt)
		if err != nil {
			return CaseState{}, fmt.Errorf("sagspan: %s, case %q: %w", g.Name, lc.Name, err)
		}
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

// solveGroup returns the state of rope group i under load, swung by swing,
// dt kelvin from the reference temperature.
//
// The rope rendered into the span, feed, solves r(feed) = g(feed) − feed = 0
// where g is the rope the backstays give up once the span hangs with that
// feed; secant steps from feed = 0, safeguarded by plain iteration.
func (m *model) solveGroup(i int, load cable.Load, swing units.Angle, dt float64) (GroupState, error) {
	g := m.groups[i]
	e := g.elastic
	// The rope fed into the span reaches the change of state as an
	// equivalent change of the span's unstretched length, through the
	// thermal term: exp(α' dθ') = exp(α dt)·(1 + feed/l0,θ).
	const alphaEq = 1e-5 // any positive coefficient; dθ' follows from it
	thermal := math.Exp(float64(e.Alpha) * dt)
	l0 := m.spanUnstretched[i] * thermal
	// slide records the direction a sliding saddle has slid: once it
	// slides it stays sliding while the iteration settles, so that the
	// feed cannot flip between held and sliding.
	var slide [2]float64
	var gs GroupState
	step := func(feed float64) (float64, error) {
		eq := cable.Elastic{EA: e.EA, Alpha: alphaEq}
		grow := float64(e.Alpha)*dt + math.Log1p(feed/l0)
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

func (m *model) column(s Side) tower.Column {
	t := m.bank(s).Tower
	return tower.Column{Depth: t.Depth, Width: t.Width, Height: t.Height, Facing: t.Facing, UnitWeight: t.UnitWeight}
}

// Check runs the whole-bridge check: every load case through rope statics,
// rope capacity, saddle forces, tower eccentricity and column section,
// footing and anchor checks, flood clearance, natural frequencies and the
// erection table. It returns an error only for a description that cannot
// be analysed; checks that fail are results in the report.
func Check(b Bridge, opts *Options) (*Analysis, error) {
	if opts == nil {
		opts = &Options{}
	}
	m, err := newModel(b)
	if err != nil {
		return nil, err
	}
	a := &Analysis{Bridge: b}
	a.Report.Title = "Whole-bridge check: " + b.Name
	if err := m.run(a, opts); err != nil {
		return nil, err
	}
	return a, nil
}

// sink receives check results: a check.Report, or a scorer that keeps
// only what a design search needs.
type sink interface{ add(check.Result) }

type reportSink struct{ rep *check.Report }

func (s reportSink) add(r check.Result) { s.rep.Add(r) }

func (m *model) run(a *Analysis, opts *Options) error {
	var err error
	if a.Service, a.Design, err = m.states(); err != nil {
		return err
	}
	out := reportSink{&a.Report}
	if err := m.superstructure(out, a.Service, a.Design); err != nil {
		return err
	}
	for side := Left; side <= Right; side++ {
		bank := m.bank(side)
		if err := m.footingChecks(out, side, bank.Tower.Footing, a.Service); err != nil {
			return err
		}
		if err := m.anchorChecks(out, side, bank.Anchor, a.Service); err != nil {
			return err
		}
	}
	m.checkClearance(out, a.Service)
	if err := m.checkFrequencies(a, a.Service[0], opts); err != nil {
		return err
	}
	return m.erection(a, opts)
}

// states analyses every load case under characteristic loads (service)
// and under the factored loads of the partial basis (design). The first
// case is the permanent one at the reference temperature.
func (m *model) states() (service, design []CaseState, err error) {
	for _, lc := range m.b.Cases() {
		svc, err := m.analyse(lc.characteristic(m.psi))
		if err != nil {
			return nil, nil, err
		}
		des := svc
		if dc := m.designCase(lc); dc != svc.Case {
			if des, err = m.analyse(dc); err != nil {
				return nil, nil, err
			}
		}
		service = append(service, svc)
		design = append(design, des)
	}
	return service, design, nil
}

// superstructure checks, for every case, what the ropes, towers and
// column sections carry: rope tension, resultant eccentricity, column
// section.
func (m *model) superstructure(out sink, service, design []CaseState) error {
	partial := m.b.partial()
	for k, svc := range service {
		des := design[k]
		name := svc.Case.Name
		for i, g := range m.groups {
			var basis cable.TensionBasis = cable.GlobalFactor{Factor: m.b.Basis.RopeFactor}
			t := svc.Groups[i].MaxTension
			if partial {
				basis = cable.PartialFactor{GammaR: m.b.Basis.GammaR}
				t = des.Groups[i].MaxTension
			}
			r, err := cable.TensionCheck(t, g.rope, g.Count, basis)
			if err != nil {
				return fmt.Errorf("sagspan: %s, case %q: %w", g.Name, name, err)
			}
			out.add(r.For(g.Name, name))
		}
		for side := Left; side <= Right; side++ {
			bank := m.bank(side)
			towerName := towerElement[side]
			var limit *tower.EccentricityLimit // nil: the kern
			if e := bank.Tower.Eccentricity; e.Rule == "fraction" {
				limit = &tower.EccentricityLimit{Fraction: e.Fraction, Offset: e.Offset}
			}
			r, err := tower.EccentricityCheck(svc.Tower[side], m.column(side), limit)
			if err != nil {
				return fmt.Errorf("sagspan: %s, case %q: %w", towerName, name, err)
			}
			out.add(r.For(towerName, name))
			dr := des.Tower[side]
			r, err = m.section(side).Check(dr.Vertical, dr.BaseMoment)
			if err != nil {
				return fmt.Errorf("sagspan: %s column section, case %q: %w", towerName, name, err)
			}
			out.add(r.For(towerName, name))
			if ml := des.LateralMoment[side]; ml != 0 {
				// Wind-swung ropes push the column across the bridge.
				r, err = m.section(side).Turned().Check(dr.Vertical, ml)
				if err != nil {
					return fmt.Errorf("sagspan: %s column section across, case %q: %w", towerName, name, err)
				}
				out.add(r.For(towerAcrossElement[side], name).WithNote("bending across the bridge from wind on the swung ropes"))
			}
		}
	}
	return nil
}

// footingChecks checks the footing spec of one bank's tower under every
// service case.
func (m *model) footingChecks(out sink, side Side, spec FootingSpec, service []CaseState) error {
	element := footingElement[side]
	for _, svc := range service {
		results, err := m.footing(side, spec, service[0].Tower[side], svc.Tower[side])
		if err != nil {
			return fmt.Errorf("sagspan: %s, case %q: %w", element, svc.Case.Name, err)
		}
		for _, r := range results {
			out.add(r.For(element, svc.Case.Name))
		}
		if svc.Lateral[side] == 0 {
			continue
		}
		results, err = m.footingAcross(side, spec, service[0].Tower[side], svc)
		if err != nil {
			return fmt.Errorf("sagspan: %s across, case %q: %w", element, svc.Case.Name, err)
		}
		for _, r := range results {
			out.add(r.For(footingAcrossElement[side], svc.Case.Name))
		}
	}
	return nil
}

// footingAcross checks a tower footing across the bridge under the wind
// pushing the swung ropes sideways: the footing turned, its width along the
// lateral force. The whole lateral action is variable.
func (m *model) footingAcross(s Side, spec FootingSpec, perm tower.Resultant, svc CaseState) ([]check.Result, error) {
	f := foundation.Footing{B: spec.Width, L: spec.Length, Thickness: spec.Thickness, Depth: spec.Depth, UnitWeight: m.bank(s).Tower.UnitWeight}
	lateral := svc.Lateral[s]
	moment := svc.LateralMoment[s] + units.MomentOf(lateral, spec.Thickness)
	load := foundation.FootingLoad{
		Vertical:           svc.Tower[s].Vertical,
		Horizontal:         lateral,
		Moment:             moment,
		Split:              true,
		VariableVertical:   svc.Tower[s].Vertical - perm.Vertical,
		VariableHorizontal: lateral,
		VariableMoment:     moment,
	}
	var err error
	m.scratch, err = f.AppendCheck(m.scratch[:0], load, m.soils[s], foundation.Vesic, m.foundationBasis())
	return m.scratch, err
}

// anchorChecks checks the anchor spec of one bank under every service case.
func (m *model) anchorChecks(out sink, side Side, spec AnchorSpec, service []CaseState) error {
	element := anchorElement[side]
	for _, svc := range service {
		results, err := m.anchor(side, spec, service[0], svc)
		if err != nil {
			return fmt.Errorf("sagspan: %s, case %q: %w", element, svc.Case.Name, err)
		}
		for _, r := range results {
			out.add(r.For(element, svc.Case.Name))
		}
	}
	return nil
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
// bending along the bridge, checked to EN 1992-1-1 on design actions.
func (m *model) section(s Side) tower.RCSection {
	t := m.bank(s).Tower
	spec := t.Section
	sec := tower.RCSection{
		B: t.Width - 2*t.Facing, H: t.Depth - 2*t.Facing,
		Fc: spec.Concrete, Fy: spec.Steel, Code: tower.EN1992,
	}
	if spec.Bars > 0 {
		area := units.Area(math.Pi / 4 * float64(spec.BarDiameter) * float64(spec.BarDiameter))
		sec.Bars = tower.RectangularBars(sec.B, sec.H, spec.Cover, spec.Bars/2, 0, area)
	}
	return sec
}

// share returns the fraction of x that exceeds the permanent value p (for
// a rock anchor's pull, which keeps its direction).
func share(x, p float64) float64 {
	if math.Abs(x) == 0 {
		return 0
	}
	return math.Max(0, math.Min(1, (math.Abs(x)-math.Abs(p))/math.Abs(x)))
}

// footing checks a tower footing under the column-base resultant r, brought
// down to the underside of the footing; perm is the permanent case's
// resultant, for the variable share of the partial basis.
func (m *model) footing(s Side, spec FootingSpec, perm, r tower.Resultant) ([]check.Result, error) {
	f := foundation.Footing{B: spec.Length, L: spec.Width, Thickness: spec.Thickness, Depth: spec.Depth, UnitWeight: m.bank(s).Tower.UnitWeight}
	moment := func(r tower.Resultant) units.Moment {
		return r.BaseMoment + units.MomentOf(r.Horizontal, spec.Thickness) + units.MomentOf(r.Vertical, spec.ColumnOffset)
	}
	// Variable parts: what the case adds to the permanent case, component
	// by component and signed, so that a permanent part the variable one
	// opposes is factored as favourable on the partial basis.
	load := foundation.FootingLoad{
		Vertical:           r.Vertical,
		Horizontal:         r.Horizontal,
		Moment:             moment(r),
		Split:              true,
		VariableVertical:   r.Vertical - perm.Vertical,
		VariableHorizontal: r.Horizontal - perm.Horizontal,
		VariableMoment:     moment(r) - moment(perm),
	}
	var err error
	m.scratch, err = f.AppendCheck(m.scratch[:0], load, m.soils[s], foundation.Vesic, m.foundationBasis())
	return m.scratch, err
}

// foundationBasis returns the verification basis of the anchor and
// footing checks, held in the model so that the many checks of a design
// search share it.
func (m *model) foundationBasis() *foundation.Basis { return &m.fbasis }

// anchor checks the anchor of one bank under the backstay pulls of every
// group, split into the permanent case's pull and the rest.
func (m *model) anchor(s Side, spec AnchorSpec, perm, svc CaseState) ([]check.Result, error) {
	basis := m.foundationBasis()
	x, z := spec.AttachX, spec.AttachZ
	if x == 0 {
		x = spec.Length / 2
	}
	if z == 0 {
		z = spec.Height / 3
	}
	pulls := m.pulls[:0]
	defer func() { m.pulls = pulls[:0] }()
	for i, g := range svc.Groups {
		t, p := g.Backstay[s], perm.Groups[i].Backstay[s]
		angle := g.BackstayAngle[s]
		pulls = append(pulls, foundation.Pull{Force: min(t, p), Angle: angle, X: x, Z: z})
		if t > p {
			pulls = append(pulls, foundation.Pull{Force: t - p, Angle: angle, X: x, Z: z, Variable: true})
		}
	}
	soil := m.soils[s]
	switch spec.Type {
	case "deadman":
		d := foundation.Deadman{Length: spec.Width, Height: spec.Height, Thickness: spec.Length, Depth: spec.Depth, UnitWeight: spec.UnitWeight}
		return d.Check(pulls, soil, basis)
	case "rock":
		// The bars lie along the resultant of the backstays' pulls.
		var fx, fz, fxp, fzp float64
		for i, g := range svc.Groups {
			c, sn := math.Cos(float64(g.BackstayAngle[s])), math.Sin(float64(g.BackstayAngle[s]))
			fx, fz = fx+float64(g.Backstay[s])*c, fz+float64(g.Backstay[s])*sn
			p := perm.Groups[i].Backstay[s]
			fxp, fzp = fxp+float64(p)*c, fzp+float64(p)*sn
		}
		pull, permanent := math.Hypot(fx, fz), math.Hypot(fxp, fzp)
		ra := foundation.RockAnchor{
			Count: spec.Bars, BarDiameter: spec.BarDiameter, YieldStrength: spec.BarStrength,
			HoleDiameter: spec.HoleDiameter, BondLength: spec.BondLength, FreeLength: spec.FreeLength,
			VariableShare: share(pull, permanent),
		}
		return ra.Check(units.Force(pull), units.Angle(math.Atan2(fz, fx)), soil, basis)
	}
	blk := foundation.AnchorBlock{
		Length: spec.Length, Width: spec.Width, Height: spec.Height, Depth: spec.Depth,
		UnitWeight: spec.UnitWeight, PassiveMobilisation: spec.Passive,
	}
	var err error
	m.scratch, err = blk.AppendCheck(m.scratch[:0], pulls, soil, basis)
	return m.scratch, err
}

// walkwayLow returns the lowest elevation of the walkway underside in a
// case: the lowest walkway-rope point less the walkway depth.
func (m *model) walkwayLow(cs CaseState) (units.Length, units.Length) {
	low, at := units.Length(math.Inf(1)), units.Length(0)
	for i, g := range m.groups {
		if g.Role != RoleWalkway {
			continue
		}
		gs := cs.Groups[i]
		x, z := gs.LowX, gs.LowZ
		if !gs.LowWithin { // the lowest point of the span is then a saddle
			x, z = 0, 0
			if m.b.Site.Rise < 0 {
				x, z = m.b.Site.Span, m.b.Site.Rise
			}
		}
		z += g.Offset
		if z < low {
			low, at = z, x
		}
	}
	return m.b.Site.LeftSaddle + low - m.b.Walkway.Depth, at
}

// checkClearance adds, for each case, the clearance of the walkway
// underside at its lowest point above the design flood, against the
// freeboard required.
func (m *model) checkClearance(out sink, service []CaseState) {
	site := m.b.Site
	for _, cs := range service {
		soffit, x := m.walkwayLow(cs)
		clear := soffit - site.Flood
		r := check.Compare("bridge.clearance", "Walkway underside above design flood", units.KindLength,
			float64(site.Freeboard), float64(clear)).
			For("walkway", cs.Case.Name).
			WithBasis("clearance of the lowest walkway underside above the design flood, characteristic loads; in wind the sag in the swung plane is taken as vertical, which is conservative (common practice)").
			WithNote(fmt.Sprintf("lowest underside %s at x = %s; flood %s", soffit, x, site.Flood))
		if clear <= 0 {
			r.Status, r.Ratio = check.Fail, math.Inf(1)
			r = r.WithNote("the walkway is at or below the design flood")
		}
		out.add(r)
	}
}

// Comfort ranges of footbridge frequencies (from memory; widely cited, e.g.
// Živanović, Pavić & Reynolds, J. Sound Vib. 279, 2005): vertical
// 1.25–2.3 Hz and its second harmonic 2.5–4.6 Hz, lateral 0.5–1.2 Hz.
var (
	verticalRanges = [][2]float64{{1.25, 2.3}, {2.5, 4.6}}
	lateralRanges  = [][2]float64{{0.5, 1.2}}
)

const comfortBasis = "Irvine–Caughey linear theory of a sagging cable (from memory); " +
	"critical ranges vertical 1.25–2.3 and 2.5–4.6 Hz, lateral 0.5–1.2 Hz " +
	"(Živanović, Pavić & Reynolds 2005, from memory); EN 1990 A2.4.3.2 asks for a " +
	"comfort check below 5 Hz vertical and 2.5 Hz lateral (from memory)"

func comfort(id, title string, f units.Frequency, ranges [][2]float64, strict bool) check.Result {
	r := check.Value(id, title, units.KindFrequency, float64(f)).For("span", "permanent").WithBasis(comfortBasis)
	for _, rg := range ranges {
		if float64(f) >= rg[0] && float64(f) <= rg[1] {
			r.Status = check.Flag
			if strict {
				r.Status, r.Ratio = check.Fail, math.Inf(1)
			}
			return r.WithNote(fmt.Sprintf("%s lies in the range %.2f–%.2f Hz that walkers excite: assess the response or change the design", f, rg[0], rg[1]))
		}
	}
	return r
}

func (m *model) checkFrequencies(a *Analysis, perm CaseState, opts *Options) error {
	var h units.Force
	var w units.LoadPerLength
	var ea units.AxialStiffness
	for i, g := range m.groups {
		h += perm.Groups[i].H
		w += m.ref[i].Load.Uniform
		ea += g.elastic.EA
	}
	// The sag that the total weight and tension hang at, w l²/(8H): the
	// weighted harmonic mean of the groups' sags.
	l := float64(m.b.Site.Span)
	sag := units.Length(float64(w) * l * l / (8 * float64(h)))
	mass := units.MassPerLength(float64(w) / units.StandardGravity)
	modes, err := cable.Frequencies(m.span, h, mass, sag, ea)
	if err != nil {
		return fmt.Errorf("sagspan: natural frequencies: %w", err)
	}
	a.Modes = modes
	a.Report.Add(
		comfort("bridge.frequency.vertical_antisymmetric", "First in-plane antisymmetric frequency", modes.Antisymmetric, verticalRanges, opts.StrictComfort),
		comfort("bridge.frequency.vertical_symmetric", "First in-plane symmetric frequency", modes.Symmetric, verticalRanges, opts.StrictComfort),
		comfort("bridge.frequency.lateral", "First out-of-plane (swing) frequency", modes.Swing, lateralRanges, opts.StrictComfort),
	)
	return nil
}

func (m *model) erection(a *Analysis, opts *Options) error {
	step := orDefault(opts.ErectionStep, 5)
	c := m.b.Climate
	var temps []units.Temperature
	for t := float64(c.Coldest); t <= float64(c.Hottest)+1e-9; t += step {
		temps = append(temps, units.Temperature(t))
	}
	for _, g := range m.groups {
		dead := cable.Load{Uniform: units.LoadPerLength(g.share) * m.dead}
		rows, err := cable.ErectionTable(m.span, g.elastic, g.self, dead, g.Sag, c.Reference, temps)
		if err != nil {
			return fmt.Errorf("sagspan: erection table of %s: %w", g.Name, err)
		}
		a.Erection = append(a.Erection, ErectionTable{Group: g.Name, Rows: rows})
	}
	return nil
}
