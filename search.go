package sagspan

import (
	"context"
	"fmt"
	"math"
	"runtime"
	"sort"
	"sync"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// BlockSize is the size of a gravity anchor block tried by a search.
type BlockSize struct {
	Length, Width, Height, Depth units.Length
}

// FootingSize is the plan and thickness of a tower footing tried by a
// search; its depth below ground stays the bridge's.
type FootingSize struct {
	Length, Width, Thickness units.Length
}

// SearchSpace lists the choices a design search may make, holding the site
// fixed. An empty list keeps the bridge's own value. Rope choices apply to
// the first walkway rope group; the sag ratio to every group; anchor and
// footing sizes to both banks alike (one standard size per bridge).
type SearchSpace struct {
	SagRatios []float64
	Diameters []units.Length
	Counts    []int
	Anchors   []BlockSize
	Footings  []FootingSize
}

// size returns the number of candidates in the space.
func (s SearchSpace) size() (ropes, anchors, footings int) {
	n := func(k int) int { return max(k, 1) }
	return n(len(s.SagRatios)) * n(len(s.Diameters)) * n(len(s.Counts)), n(len(s.Anchors)), n(len(s.Footings))
}

// Prices are unit prices of the material quantities, in one currency of
// the user's choice.
type Prices struct {
	RopePerKilogram         float64
	ConcretePerCubicMetre   float64
	ExcavationPerCubicMetre float64
}

// DemoPrices is an invented price list for demonstrations: its numbers are
// made up and stand for no market, place or time.
var DemoPrices = Prices{RopePerKilogram: 6, ConcretePerCubicMetre: 180, ExcavationPerCubicMetre: 25}

// SearchSettings tune a design search. A nil *SearchSettings means the
// defaults.
type SearchSettings struct {
	// Workers is the number of goroutines; zero means GOMAXPROCS.
	Workers int
	// Prices price the quantities; nil means DemoPrices.
	Prices *Prices
	// Progress, when set, is called from the goroutine that called Search
	// after each group of candidates, with the candidates done and the total.
	Progress func(done, total int)
	// NearMisses is how many of the closest infeasible candidates to
	// explain; zero means 5.
	NearMisses int
	// KeepAll keeps every candidate in SearchResult.All. Default false.
	KeepAll bool
}

// Design is one candidate of a search: its choices, cost and verdict. A
// zero choice (sag ratio, diameter, count, size) keeps the bridge's own.
type Design struct {
	SagRatio float64
	Diameter units.Length
	Count    int
	Anchor   BlockSize
	Footing  FootingSize
	// Cost is the priced quantity of ropes, concrete and excavation.
	Cost float64
	// Utilisation is the highest ratio of any check (comfort flags aside).
	Utilisation float64
	// Feasible is true when every check passes.
	Feasible bool
	// Governing is the worst result: the failure that rules the candidate
	// out, or the most utilised check of a feasible one.
	Governing check.Result
	index     int
}

// SearchResult is what a design search found.
type SearchResult struct {
	// Best is the cheapest feasible design, nil when none is feasible;
	// Analysis is its full whole-bridge check.
	Best     *Design
	Analysis *Analysis
	// Front is the trade-off of cost against utilisation: the feasible
	// designs that no cheaper design matches or beats in utilisation,
	// from cheapest up.
	Front []Design
	// NearMisses are the infeasible designs closest to feasible (lowest
	// utilisation), with the check and case that rule each out.
	NearMisses []Design
	// Evaluated and Feasible count the candidates.
	Evaluated, Feasible int
	// All holds every candidate in the order of the space, with
	// SearchSettings.KeepAll.
	All []Design
}

// scorer is the sink of the search's fast path: it keeps the verdict and
// the worst result, not the results themselves.
type scorer struct {
	failed bool
	worst  check.Result
	max    float64
	has    bool
}

func (s *scorer) add(r check.Result) {
	if r.Status == check.Info || r.Status == check.Flag {
		return
	}
	if !s.has || check.Worse(r, s.worst) {
		s.worst, s.has = r, true
	}
	s.max = math.Max(s.max, r.Ratio)
	s.failed = s.failed || r.Status == check.Fail
}

func (s *scorer) merge(t scorer) {
	if t.has && (!s.has || check.Worse(t.worst, s.worst)) {
		s.worst, s.has = t.worst, true
	}
	s.max = math.Max(s.max, t.max)
	s.failed = s.failed || t.failed
}

// ropeChoice is one rope configuration of the space.
type ropeChoice struct {
	sag      float64
	diameter units.Length
	count    int
}

// ropeChoices lists the rope configurations of the space; an empty list
// gives the zero choice, which keeps the bridge's own.
func (s SearchSpace) ropeChoices() []ropeChoice {
	sags := s.SagRatios
	if len(sags) == 0 {
		sags = []float64{0}
	}
	ds := s.Diameters
	if len(ds) == 0 {
		ds = []units.Length{0}
	}
	ns := s.Counts
	if len(ns) == 0 {
		ns = []int{0}
	}
	var out []ropeChoice
	for _, sag := range sags {
		for _, d := range ds {
			for _, n := range ns {
				out = append(out, ropeChoice{sag, d, n})
			}
		}
	}
	return out
}

// Apply returns the bridge b with the design's choices made.
func (d Design) Apply(b Bridge) Bridge {
	walkway := firstWalkway(b)
	b.Ropes = append([]RopeGroup(nil), b.Ropes...)
	if d.SagRatio != 0 {
		for i := range b.Ropes {
			b.Ropes[i].Sag = units.Length(d.SagRatio) * b.Site.Span
		}
	}
	if d.Diameter != 0 {
		b.Ropes[walkway].Rope.Diameter = d.Diameter
	}
	if d.Count != 0 {
		b.Ropes[walkway].Count = d.Count
	}
	return b.withSizes(d.Anchor, d.Footing)
}

// withSizes returns b with anchor and footing sizes a and f at both banks.
func (b Bridge) withSizes(a BlockSize, f FootingSize) Bridge {
	for _, bank := range []*Bank{&b.Banks.Left, &b.Banks.Right} {
		bank.Anchor = a.apply(bank.Anchor)
		bank.Tower.Footing = f.apply(bank.Tower.Footing)
	}
	return b
}

// apply returns a with this size; the zero size keeps a as it is.
func (s BlockSize) apply(a AnchorSpec) AnchorSpec {
	if s != (BlockSize{}) {
		a.Length, a.Width, a.Height, a.Depth = s.Length, s.Width, s.Height, s.Depth
	}
	return a
}

// apply returns f with this size; the zero size keeps f as it is.
func (s FootingSize) apply(f FootingSpec) FootingSpec {
	if s != (FootingSize{}) {
		f.Length, f.Width, f.Thickness = s.Length, s.Width, s.Thickness
	}
	return f
}

func firstWalkway(b Bridge) int {
	for i, g := range b.Ropes {
		if g.Role == RoleWalkway {
			return i
		}
	}
	return 0
}

// cost prices the quantities of bridge b: every rope over the span and both
// backstays, concrete of anchors, footings and columns, excavation for
// anchors and footings.
func cost(b Bridge, p Prices) (float64, error) {
	rope, err := ropeCost(b, p)
	if err != nil {
		return 0, err
	}
	return rope + columnCost(b, p) + anchorCost(b, p) + footingCost(b, p), nil
}

// ropeCost prices every rope over the span (its design-sag length) and
// both backstays.
func ropeCost(b Bridge, p Prices) (float64, error) {
	var mass float64
	for _, g := range b.Ropes {
		r, err := g.Rope.rope()
		if err != nil {
			return 0, err
		}
		shape, err := cable.NewParabola(b.span(), 1, g.Sag)
		if err != nil {
			return 0, err
		}
		length := float64(shape.Length())
		for _, bank := range []Bank{b.Banks.Left, b.Banks.Right} {
			length += math.Hypot(float64(bank.Backstay.Horizontal), float64(bank.Backstay.Drop+g.Offset))
		}
		mass += float64(g.Count) * float64(r.Mass) * length
	}
	return mass * p.RopePerKilogram, nil
}

func columnCost(b Bridge, p Prices) float64 {
	var v float64
	for _, bank := range []Bank{b.Banks.Left, b.Banks.Right} {
		t := bank.Tower
		v += float64(t.Depth * t.Width * t.Height)
	}
	return v * p.ConcretePerCubicMetre
}

func anchorCost(b Bridge, p Prices) float64 {
	var c float64
	for _, bank := range []Bank{b.Banks.Left, b.Banks.Right} {
		if a := bank.Anchor; a.Type != "rock" {
			c += float64(a.Length*a.Width*a.Height)*p.ConcretePerCubicMetre + float64(a.Length*a.Width*a.Depth)*p.ExcavationPerCubicMetre
		}
	}
	return c
}

func footingCost(b Bridge, p Prices) float64 {
	var c float64
	for _, bank := range []Bank{b.Banks.Left, b.Banks.Right} {
		f := bank.Tower.Footing
		c += float64(f.Length*f.Width*f.Thickness)*p.ConcretePerCubicMetre + float64(f.Length*f.Width*f.Depth)*p.ExcavationPerCubicMetre
	}
	return c
}

// Search looks for the cheapest design of bridge b, over the choices of
// space, that passes every check. Every candidate is checked on the full
// chain; the work is shared so that what a choice cannot change is worked
// out once: the rope statics, towers, column sections and clearance once
// per rope configuration, each anchor and footing size once per rope
// configuration, and a candidate's verdict is then the worst of its parts.
// Comfort flags do not rule a design out. The answer does not depend on
// the number of workers: ties in cost go to the candidate listed first.
//
// Search returns an error for a bridge that does not validate, a space
// that asks for anchor sizes on a bank without a block anchor, a nil ctx
// (pass context.Background() to search without a deadline), or when ctx
// is cancelled.
func Search(ctx context.Context, b Bridge, space SearchSpace, settings *SearchSettings) (*SearchResult, error) {
	if ctx == nil {
		return nil, fmt.Errorf("sagspan: search: nil context; pass context.Background() to search without a deadline")
	}
	if settings == nil {
		settings = &SearchSettings{}
	}
	if err := b.Validate(); err != nil {
		return nil, err
	}
	prices := DemoPrices
	if settings.Prices != nil {
		prices = *settings.Prices
	}
	if len(space.Anchors) > 0 && (b.Banks.Left.Anchor.Type != "block" || b.Banks.Right.Anchor.Type != "block") {
		return nil, fmt.Errorf("sagspan: search: anchor sizes apply to block anchors; both banks need type \"block\"")
	}
	for _, r := range space.SagRatios {
		if !(r > 0 && r <= maxSagRatio) {
			return nil, fmt.Errorf("sagspan: search: sag ratio %v outside (0, %v]", r, maxSagRatio)
		}
	}
	ropes := space.ropeChoices()
	_, nA, nF := space.size()
	anchors := space.Anchors
	if len(anchors) == 0 {
		anchors = []BlockSize{{}} // keep each bank's own
	}
	footings := space.Footings
	if len(footings) == 0 {
		footings = []FootingSize{{}}
	}
	total := len(ropes) * nA * nF
	designs := make([]Design, total)

	workers := settings.Workers
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	jobs := make(chan int)
	done := make(chan int)
	ctx, cancel := context.WithCancel(ctx)
	defer cancel()
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range jobs {
				evaluate(b, prices, ropes[i], anchors, footings, designs[i*nA*nF:(i+1)*nA*nF], i*nA*nF)
				select {
				case done <- nA * nF:
				case <-ctx.Done():
					return
				}
			}
		}()
	}
	go func() {
		defer close(jobs)
		for i := range ropes {
			select {
			case jobs <- i:
			case <-ctx.Done():
				return
			}
		}
	}()
	go func() { wg.Wait(); close(done) }()
	finished := 0
	for n := range done {
		finished += n
		if settings.Progress != nil {
			settings.Progress(finished, total)
		}
	}
	if err := ctx.Err(); err != nil {
		return nil, fmt.Errorf("sagspan: search: %w", err)
	}
	return summarise(b, designs, settings)
}

// invalid returns a failing result that rules a candidate out because it
// cannot be analysed.
func invalid(err error) scorer {
	r := check.Record("search.invalid", "Candidate cannot be analysed", units.KindRatio, 0).WithNote(err.Error())
	r.Status, r.Ratio = check.Fail, math.Inf(1)
	return scorer{failed: true, worst: r, max: math.Inf(1), has: true}
}

// evaluate scores every candidate of one rope configuration into out,
// whose first element is candidate number first. An error in one part (the
// rope configuration, an anchor size, a footing size) rules out only the
// candidates that have that part.
func evaluate(b Bridge, prices Prices, rc ropeChoice, anchors []BlockSize, footings []FootingSize, out []Design, first int) {
	base := Design{SagRatio: rc.sag, Diameter: rc.diameter, Count: rc.count}
	bb := base.Apply(b)
	var superstructure scorer
	fixed := math.Inf(1)
	m, stages, err := ropeStage(bb, &superstructure)
	if err != nil {
		superstructure = invalid(err)
	} else if fixed, err = ropeCost(bb, prices); err == nil {
		fixed += columnCost(bb, prices)
	} else {
		superstructure = invalid(err)
	}

	anchorScores := make([]scorer, len(anchors))
	anchorPrices := make([]float64, len(anchors))
	for j, size := range anchors {
		sized := bb.withSizes(size, FootingSize{})
		anchorPrices[j] = anchorCost(sized, prices)
		if err := sized.validateBanks(); err != nil {
			anchorScores[j] = invalid(err)
			continue
		}
		for _, st := range stages {
			if err := st.anchorChecks(m, &anchorScores[j], size); err != nil {
				anchorScores[j] = invalid(err)
				break
			}
		}
	}
	footingScores := make([]scorer, len(footings))
	footingPrices := make([]float64, len(footings))
	for k, size := range footings {
		sized := bb.withSizes(BlockSize{}, size)
		footingPrices[k] = footingCost(sized, prices)
		if err := sized.validateBanks(); err != nil {
			footingScores[k] = invalid(err)
			continue
		}
		for _, st := range stages {
			if err := st.footingChecks(m, &footingScores[k], size, superstructure.max); err != nil {
				footingScores[k] = invalid(err)
				break
			}
		}
	}
	for j := range anchors {
		for k := range footings {
			d := base
			d.Anchor, d.Footing = anchors[j], footings[k]
			d.index = first + j*len(footings) + k
			s := superstructure
			s.merge(anchorScores[j])
			s.merge(footingScores[k])
			d.Feasible, d.Utilisation, d.Governing = !s.failed, s.max, s.worst
			d.Cost = fixed + anchorPrices[j] + footingPrices[k]
			out[j*len(footings)+k] = d
		}
	}
}

// ropeStage analyses a rope configuration: every load case and every
// stretch of the loaded-length searches, then the checks a choice of anchor
// or footing cannot change (ropes, saddles, towers, column members,
// clearance, gradient), into out. For every variant of groove behaviour
// (see model.variants) it returns a stage: the permanent state, the
// characteristic states of the cases, and the searchers of the
// loaded-length families, on which the anchor and footing checks of each
// size are then run as the whole-bridge check runs them.
func ropeStage(b Bridge, out sink) (*model, []stage, error) {
	m, err := newModel(b)
	if err != nil {
		return nil, nil, err
	}
	m.fbasis.Terse = true // scoring only: no result text from the foundation checks
	var stages []stage
	for _, v := range m.variants() {
		m.grooves = v.grooves
		var st stage
		var families *familySearch
		for k, lc := range b.Cases() {
			svc, des, ok, err := m.caseStates(out, lc)
			if err != nil {
				return nil, nil, err
			}
			if !ok {
				continue
			}
			if k == 0 {
				// The families start from the permanent case alone, as
				// in the whole-bridge check (see familySearch).
				families = m.families(svc, false)
			}
			if err := m.ropeChecks(out, svc, des, true); err != nil {
				return nil, nil, err
			}
			st.service = append(st.service, svc)
			if err := m.structureChecks(out, st.service[0], svc, des); err != nil {
				return nil, nil, err
			}
		}
		st.perm = st.service[0]
		// One search worker per candidate already uses every core: the
		// families run one after the other, with the same numbers.
		if _, st.searchers, err = families.run().collect(out); err != nil {
			return nil, nil, err
		}
		stages = append(stages, st)
	}
	m.grooves = m.variants()[0].grooves
	if err := m.grooveChecks(out); err != nil {
		return nil, nil, err
	}
	return m, stages, nil
}

// stage is what a rope configuration's analysis leaves for the anchor and
// footing checks of one variant of groove behaviour.
type stage struct {
	perm      CaseState
	service   []CaseState // the fixed cases'
	searchers []*searcher
}

// anchorChecks checks the anchors of spec on both banks in the stage: every
// case, and every stretch the loaded-length searches tried.
func (st stage) anchorChecks(m *model, out sink, size BlockSize) error {
	states := st.service
	for _, s := range st.searchers {
		for _, pt := range s.anchorPoints() {
			states = append(states, pt.svc)
		}
	}
	for side := Left; side <= Right; side++ {
		if err := m.anchorChecks(out, side, size.apply(m.bank(side).Anchor), st.perm, states); err != nil {
			return err
		}
	}
	return nil
}

// footingChecks checks the footings of size on both banks in the stage:
// every case, and each loaded-length family's footing pass, which refines
// the footing checks' maxima beyond the search's points as the whole-bridge
// check does. other is the candidate's highest ratio of every check no
// footing size changes.
//
// The pass is left out only where the candidate already fails on those
// other checks (other > 1): its verdict is then the same with or without
// the pass (exact). Its utilisation is the same too unless the pass would
// raise a footing ratio above other, which the test below rules out where
// the highest footing ratio on the points lies below other by more than
// footingMargin (an empirical bound, not a proof: it can only misorder the
// near misses, never call a design feasible or change the best one). A
// candidate that passes every other check always gets the full pass, so
// its verdict and utilisation are the whole-bridge check's.
func (st stage) footingChecks(m *model, out sink, size FootingSize, other float64) error {
	specs := [2]FootingSpec{size.apply(m.bank(Left).Tower.Footing), size.apply(m.bank(Right).Tower.Footing)}
	for side := Left; side <= Right; side++ {
		if err := m.footingChecks(out, side, specs[side], st.perm, st.service); err != nil {
			return err
		}
	}
	for _, s := range st.searchers {
		var onPoints scorer
		for _, pt := range s.points {
			for side := Left; side <= Right; side++ {
				if err := m.footingChecks(fanout{&onPoints, out}, side, specs[side], st.perm, []CaseState{pt.svc}); err != nil {
					return err
				}
			}
		}
		if other > 1 && onPoints.max*(1+footingMargin) < other && !onPoints.failed {
			continue
		}
		if _, _, _, err := s.footingPass(out, specs); err != nil {
			return err
		}
	}
	return nil
}

// footingMargin bounds how much a footing pass's refinement may raise a
// footing check's ratio above its highest on the search's points, for the
// order of candidates that fail anyway (see footingChecks): 25 %,
// about five times the largest rise seen on the test bridges (5.3 % in the
// demo's construction stage, whose search has the fewest points; under
// 0.6 % elsewhere).
const footingMargin = 0.25

// summarise picks the best design, the trade-off front and the near misses,
// and runs the full check of the best design.
func summarise(b Bridge, designs []Design, settings *SearchSettings) (*SearchResult, error) {
	res := &SearchResult{Evaluated: len(designs)}
	if settings.KeepAll {
		res.All = designs
	}
	// Sort indices, not designs: a search may hold many thousands.
	var feasible, infeasible []int32
	for i, d := range designs {
		if d.Feasible {
			feasible = append(feasible, int32(i))
		} else {
			infeasible = append(infeasible, int32(i))
		}
	}
	res.Feasible = len(feasible)
	sort.Slice(feasible, func(i, j int) bool {
		a, c := &designs[feasible[i]], &designs[feasible[j]]
		if a.Cost != c.Cost {
			return a.Cost < c.Cost
		}
		return a.index < c.index
	})
	lowest := math.Inf(1)
	for _, i := range feasible {
		if d := designs[i]; d.Utilisation < lowest {
			res.Front = append(res.Front, d)
			lowest = d.Utilisation
		}
	}
	sort.Slice(infeasible, func(i, j int) bool {
		a, c := &designs[infeasible[i]], &designs[infeasible[j]]
		if a.Utilisation != c.Utilisation {
			return a.Utilisation < c.Utilisation
		}
		if a.Cost != c.Cost {
			return a.Cost < c.Cost
		}
		return a.index < c.index
	})
	n := settings.NearMisses
	if n <= 0 {
		n = 5
	}
	for _, i := range infeasible[:min(n, len(infeasible))] {
		res.NearMisses = append(res.NearMisses, designs[i])
	}
	if len(feasible) == 0 {
		return res, nil
	}
	best := designs[feasible[0]]
	res.Best = &best
	a, err := Check(best.Apply(b), nil)
	if err != nil {
		return nil, fmt.Errorf("sagspan: search: full check of the best design: %w", err)
	}
	res.Analysis = a
	return res, nil
}
