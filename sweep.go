package sagspan

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// The loaded-length search. For a family of cases (LoadedLength) it finds,
// for every check, the stretch that gives the check its highest
// utilisation:
//
//  1. a sweep of sweepPoints lengths per placement (k/sweepPoints of the
//     span, the whole span shared by every placement), the case without
//     the stretch, and the lengths where the EN 1991-2 pressure meets its
//     bounds;
//  2. refinement around each check's local maxima, placement by placement:
//     a parabola through the best point and its neighbours where the
//     saddles stay as they are, two lines meeting in a kink where a saddle
//     starts to slide or slides the other way between them, a
//     golden-section step where neither fits; until the bracket is
//     narrower than refineTol of the span or the model promises less than
//     refineGain of the check's scale. Proposals of one round that lie
//     close together are tried as one point;
//  3. the anchor checks, which grow with the backstays' pull (its maximum
//     refined in step 2, no anchor size changes it), are evaluated at every
//     point; the footing checks, whose maximum moves with the footing's
//     size, get a refinement of their own on top of the points (the
//     footing pass), which a design search repeats for each footing size
//     it tries.
//
// Each point is a full pair of states (characteristic and design loads),
// each group's iteration started from the nearest point's.
const (
	sweepPoints = 6
	refineTol   = 1.0 / 400
	refineGain  = 2e-4
	// proxyGain is refineGain for the drivers of the anchor checks.
	proxyGain       = 5e-4
	maxRefineRounds = 16
	// trustWidth is the widest bracket, as a fraction of the span, on which
	// a parabola's verdict that the maximum is found is taken.
	trustWidth = 0.25
	// minRefined is the utilisation below which a check's maximum is not
	// refined: it is found on the points the other checks bring.
	minRefined = 0.01
)

// checkKey names a check as the report's governing summary does.
type checkKey struct{ id, element string }

// tally is the sink of the search: each check's ratio at one point.
type tally struct {
	index  map[checkKey]int
	keys   []checkKey
	ratios []float64 // at the point being evaluated, NaN where absent
	// ground marks the footing and anchor checks, proxy their drivers;
	// ref is a driver's scale, below which its changes are noise.
	ground, proxy []bool
	ref           []float64
	groundMode    bool
}

func (t *tally) slot(k checkKey) int {
	i, ok := t.index[k]
	if !ok {
		i = len(t.keys)
		t.index[k] = i
		t.keys = append(t.keys, k)
		t.ratios = append(t.ratios, math.NaN())
		t.ground = append(t.ground, t.groundMode)
		t.proxy = append(t.proxy, false)
		t.ref = append(t.ref, 0)
	}
	return i
}

func (t *tally) reset() {
	for i := range t.ratios {
		t.ratios[i] = math.NaN()
	}
}

func (t *tally) add(r check.Result) {
	if r.Status == check.Info || r.Status == check.Flag {
		return
	}
	i := t.slot(checkKey{r.ID, r.Element})
	if x := t.ratios[i]; math.IsNaN(x) || r.Ratio > x {
		t.ratios[i] = r.Ratio
	}
}

// put records a driver of the footing and anchor checks, of scale ref.
func (t *tally) put(id, element string, x, ref float64) {
	i := t.slot(checkKey{id, element})
	t.proxy[i], t.ref[i] = true, ref
	t.ratios[i] = x
}

// sweepPoint is one evaluated stretch.
type sweepPoint struct {
	place    Placement
	r        float64 // length as a fraction of the span
	svc, des CaseState
	ratios   []float64 // by the search tally's key index; NaN where absent
	// regime records which saddles have moved on their columns, in both
	// states: where it changes between two points, the checks may have a
	// kink (a maximum that no parabola finds).
	regime uint64
}

// regime returns the bits of the saddles that moved in a pair of states,
// and of the way each moved (toward the span or away): a saddle that
// starts to slide, or slides the other way, turns the checks' curves.
func regime(svc, des CaseState) uint64 {
	var bits uint64
	n := 0
	for _, cs := range [2]*CaseState{&svc, &des} {
		for i := range cs.Groups {
			for side := Left; side <= Right; side++ {
				g := &cs.Groups[i]
				if n+1 < 62 {
					if g.SaddleMoved[side] {
						bits |= 1 << n
					}
					if g.Travel[side] > 0 {
						bits |= 1 << (n + 1)
					}
				}
				n += 2
			}
		}
	}
	return bits
}

// pressureRegime returns bits 62 and 63 where the EN 1991-2 crowd pressure
// of the case's stretch sits on its upper or lower bound (loaded lengths
// up to 10 m, or from 210 m): the pressure's slope changes there, and so
// may the checks'.
func (m *model) pressureRegime(lc LoadCase) uint64 {
	if lc.CrowdPressure > 0 || m.b.Loads.Crowd > 0 || lc.Crowd.Empty() {
		return 0
	}
	switch q := CrowdPressure(lc.Crowd.Length()); {
	case q >= 5*units.Kilopascal:
		return 1 << 63
	case q <= 2.5*units.Kilopascal:
		return 1 << 62
	}
	return 0
}

// pointSet is the points of a search with, for each placement, its points
// sorted by length (the whole span and the case without the stretch in
// every placement).
type pointSet struct {
	points []*sweepPoint
	sorted [3]sortedPoints
}

// sortedPoints is a placement's points sorted, when the set had n points.
type sortedPoints struct {
	n   int
	pts []*sweepPoint
}

func (ps *pointSet) add(pt *sweepPoint) { ps.points = append(ps.points, pt) }

// placed returns the points of placement p sorted by length.
func (ps *pointSet) placed(p Placement) []*sweepPoint {
	if c := ps.sorted[p]; c.pts != nil && c.n == len(ps.points) {
		return c.pts
	}
	var out []*sweepPoint
	for _, pt := range ps.points {
		if pt.place == p || pt.r >= 1 || pt.r <= 0 {
			out = append(out, pt)
		}
	}
	sort.Slice(out, func(i, j int) bool { return out[i].r < out[j].r })
	ps.sorted[p] = sortedPoints{n: len(ps.points), pts: out}
	return out
}

// nearest returns the point of placement p nearest to length r.
func (ps *pointSet) nearest(p Placement, r float64) *sweepPoint {
	var best *sweepPoint
	for _, pt := range ps.points {
		if pt.place != p && pt.r < 1 && pt.r > 0 {
			continue
		}
		if best == nil || math.Abs(pt.r-r) < math.Abs(best.r-r) {
			best = pt
		}
	}
	return best
}

// refinement says what a refinement works on: which keys, their values at
// a point, whether a key is a driver (refined to proxyGain, and worth
// refining above ref) or a check (above minRefined), and how to evaluate a
// new point.
type refinement struct {
	placements []Placement
	keys       func() int
	skip       func(k int) bool
	val        func(pt *sweepPoint, k int) float64
	driver     func(k int) (bool, float64)
	eval       func(p Placement, r float64, warm *sweepPoint) (*sweepPoint, error)
}

// refine adds points to ps around each key's local maxima until none moves
// (see the search's outline at the top of this file).
func (rf refinement) refine(ps *pointSet) error {
	var maxima []int
	for round := range maxRefineRounds {
		var props []proposal
		for k := range rf.keys() {
			if rf.skip(k) {
				continue
			}
			scale, best, worst := 0.0, math.Inf(-1), math.Inf(1)
			for _, pt := range ps.points {
				if v := rf.val(pt, k); !math.IsNaN(v) && !math.IsInf(v, 0) {
					scale, best, worst = math.Max(scale, math.Abs(v)), math.Max(best, v), math.Min(worst, v)
				}
			}
			driver, ref := rf.driver(k)
			// Nothing to find in a check used below a per cent, a driver
			// that does not move off its noise, or a flat curve.
			if driver && scale < 1e-3*ref || !driver && best < minRefined || best-worst <= refineGain*scale {
				continue
			}
			gain := refineGain
			if driver {
				gain = proxyGain
			}
			// Around each local maximum of each placement, the next point;
			// a maximum whose curve promises no more than the best found
			// needs no closer look.
			for _, p := range rf.placements {
				pts := ps.placed(p)
				maxima = localMaxima(maxima[:0], pts, k, rf.val)
				for _, bi := range maxima {
					if r, _, ok := propose(pts, k, rf.val, bi, scale, best, gain); ok {
						props = append(props, proposal{place: p, r: r, check: !driver})
					}
				}
			}
		}
		if len(props) == 0 {
			return nil
		}
		added := 0
		for _, pr := range cluster(props, clusterTol(round)) {
			near := ps.nearest(pr.place, pr.r)
			if math.Abs(near.r-pr.r) < refineTol/2 {
				continue
			}
			pt, err := rf.eval(pr.place, pr.r, near)
			if err != nil {
				return err
			}
			ps.add(pt)
			added++
		}
		if added == 0 {
			return nil
		}
	}
	return nil
}

// searcher runs one family's search.
type searcher struct {
	m    *model
	fam  LoadedLength
	perm CaseState
	span units.Length
	t    tally
	pointSet
}

// state returns the pair of states of the stretch of placement p and
// length fraction r, started from warm.
func (s *searcher) state(m *model, p Placement, r float64, warm *sweepPoint) (*sweepPoint, error) {
	lc := s.fam.at(p, units.Length(r)*s.span, s.span)
	var w *[2]CaseState
	if warm != nil {
		w = &[2]CaseState{warm.svc, warm.des}
	}
	m.stretch = true
	svc, des, err := m.pair(lc, w)
	m.stretch = false
	if err != nil {
		return nil, err
	}
	return &sweepPoint{place: p, r: r, svc: svc, des: des, regime: regime(svc, des) | m.pressureRegime(lc)}, nil
}

// evaluate returns the point of placement p and length fraction r,
// started from warm, with the ratios of every check but the footings' and
// anchors' and the anchors' driver.
func (s *searcher) evaluate(p Placement, r float64, warm *sweepPoint) (*sweepPoint, error) {
	pt, err := s.state(s.m, p, r, warm)
	if err != nil {
		return nil, err
	}
	s.t.reset()
	terse := s.m.terse
	s.m.terse = true
	defer func() { s.m.terse = terse }()
	if err := s.m.ropeChecks(&s.t, pt.svc, pt.des, false); err != nil {
		return nil, err
	}
	if err := s.m.structureChecks(&s.t, s.perm, pt.svc, pt.des); err != nil {
		return nil, err
	}
	s.drivers(pt.svc)
	pt.ratios = append([]float64(nil), s.t.ratios...)
	return pt, nil
}

// drivers records each anchor's pull, the sum of the backstay tensions
// that reach it: every anchor check grows with it (the backstays keep their
// slopes), so the anchor checks' governing stretch is where it is
// greatest, whatever the anchor's size.
func (s *searcher) drivers(svc CaseState) {
	for side := Left; side <= Right; side++ {
		var pull, pullp float64
		for i := range svc.Groups {
			pull += float64(svc.Groups[i].Backstay[side])
			pullp += float64(s.perm.Groups[i].Backstay[side])
		}
		s.t.put("~pull", anchorElement[side], pull, pullp)
	}
}

// anchorPoints returns the points the anchor checks are run on: where
// each anchor's pull is greatest, when one rope group's load varies in the
// family (every anchor check grows with the pull of the backstays, which
// keep their slopes; the others' tensions stay put); every point
// otherwise.
func (s *searcher) anchorPoints() []*sweepPoint {
	varying := 0
	for _, g := range s.m.groups {
		if g.share > 0 {
			varying++
		}
	}
	if varying > 1 {
		return s.points
	}
	var out []*sweepPoint
	for side := Left; side <= Right; side++ {
		k, ok := s.t.index[checkKey{"~pull", anchorElement[side]}]
		if !ok {
			return s.points
		}
		var best *sweepPoint
		for _, pt := range s.points {
			if best == nil || pt.ratio(k) > best.ratio(k) {
				best = pt
			}
		}
		if len(out) == 0 || out[0] != best {
			out = append(out, best)
		}
	}
	return out
}

// structure returns the refinement of the search's own keys.
func (s *searcher) structure() refinement {
	return refinement{
		placements: s.fam.Placements,
		keys:       func() int { return len(s.t.keys) },
		skip:       func(int) bool { return false },
		val:        func(pt *sweepPoint, k int) float64 { return pt.ratio(k) },
		driver:     func(k int) (bool, float64) { return s.t.proxy[k], s.t.ref[k] },
		eval:       s.evaluate,
	}
}

// searchLength runs the loaded-length search of one family. It adds the
// governing result of every check to out under its stretch's case name,
// the footing and anchor checks with ground (for the bridge's own sizes),
// and returns the searcher (whose points a design search checks its sizes
// on, see footingPass) and the states of the governing stretches,
// characteristic and design.
func (m *model) searchLength(out sink, perm CaseState, fam LoadedLength, ground bool) (*searcher, [][2]CaseState, error) {
	s := &searcher{m: m, fam: fam, perm: perm, span: m.b.Site.Span, t: tally{index: map[checkKey]int{}}}
	add := func(p Placement, r float64, warm *sweepPoint) (*sweepPoint, error) {
		pt, err := s.evaluate(p, r, warm)
		if err == nil {
			s.add(pt)
		}
		return pt, err
	}
	full, err := add(fam.Placements[0], 1, nil)
	if err != nil {
		return nil, nil, err
	}
	for _, p := range fam.Placements {
		warm := full
		for j := sweepPoints - 1; j >= 1; j-- {
			if warm, err = add(p, float64(j)/sweepPoints, warm); err != nil {
				return nil, nil, err
			}
		}
	}
	// The family's case without the stretch closes the curves at zero.
	if _, err := add(fam.Placements[0], 0, nil); err != nil {
		return nil, nil, err
	}
	// Where the EN 1991-2 pressure leaves its bounds (10 m and 210 m of
	// loaded length) the checks may turn a corner: a point there on each
	// placement.
	if !fam.deck() && fam.Base.CrowdPressure == 0 && m.b.Loads.Crowd == 0 {
		for _, l := range []units.Length{crowdUpperLength, crowdLowerLength} {
			if r := float64(l / s.span); r > refineTol && r < 1-refineTol {
				for _, p := range fam.Placements {
					if _, err := add(p, r, s.nearest(p, r)); err != nil {
						return nil, nil, err
					}
				}
			}
		}
	}
	if err := s.structure().refine(&s.pointSet); err != nil {
		return nil, nil, err
	}
	governing, err := s.emit(out, ground)
	if err != nil {
		return nil, nil, err
	}
	return s, governing, nil
}

// footingPass checks the footings of specs (left and right bank) on the
// search's points and refines their maxima with points of its own, each
// footing result reaching out; a design search runs one pass per footing
// size, the whole-bridge check one for the bridge's own footings, and both
// find the same governing stretches. The pass works on its own copy of the
// model, so that no pass sees another's states. It returns the points of
// the search and of the pass with the ratios of the footing checks (keys
// and values).
func (s *searcher) footingPass(out sink, specs [2]FootingSpec) (*pointSet, *tally, map[*sweepPoint][]float64, error) {
	m := s.m.clone()
	m.fbasis.Terse = true
	ft := &tally{index: map[checkKey]int{}}
	vals := map[*sweepPoint][]float64{}
	check := func(pt *sweepPoint) error {
		ft.reset()
		both := fanout{ft, out}
		for side := Left; side <= Right; side++ {
			if err := m.footingChecks(both, side, specs[side], s.perm, []CaseState{pt.svc}); err != nil {
				return err
			}
		}
		vals[pt] = append([]float64(nil), ft.ratios...)
		return nil
	}
	ps := &pointSet{points: append([]*sweepPoint(nil), s.points...)}
	for _, pt := range ps.points {
		if err := check(pt); err != nil {
			return nil, nil, nil, err
		}
	}
	rf := refinement{
		placements: s.fam.Placements,
		keys:       func() int { return len(ft.keys) },
		skip:       func(int) bool { return false },
		val: func(pt *sweepPoint, k int) float64 {
			if v := vals[pt]; k < len(v) {
				return v[k]
			}
			return math.NaN()
		},
		driver: func(int) (bool, float64) { return false, 0 },
		eval: func(p Placement, r float64, warm *sweepPoint) (*sweepPoint, error) {
			pt, err := s.state(m, p, r, warm)
			if err != nil {
				return nil, err
			}
			return pt, check(pt)
		},
	}
	if err := rf.refine(ps); err != nil {
		return nil, nil, nil, err
	}
	return ps, ft, vals, nil
}

// fanout passes results to two sinks.
type fanout [2]sink

func (f fanout) add(r check.Result) {
	for _, s := range f {
		if s != nil {
			s.add(r)
		}
	}
}

// emit picks each check's governing point and adds its full result there:
// the checks of the search's own keys and, with ground, the anchors'
// (evaluated on every point) and the footings' (from the footing pass for
// the bridge's own footings).
func (s *searcher) emit(out sink, ground bool) ([][2]CaseState, error) {
	m := s.m
	type governing struct {
		pt   *sweepPoint
		keys map[checkKey]bool
	}
	var order []*governing
	byPoint := map[*sweepPoint]*governing{}
	govern := func(pt *sweepPoint, key checkKey) {
		g := byPoint[pt]
		if g == nil {
			g = &governing{pt: pt, keys: map[checkKey]bool{}}
			byPoint[pt] = g
			order = append(order, g)
		}
		g.keys[key] = true
	}
	pick := func(points []*sweepPoint, keys []checkKey, val func(*sweepPoint, int) float64, skip func(int) bool) {
		for k, key := range keys {
			if skip(k) {
				continue
			}
			var best *sweepPoint
			bestV := math.Inf(-1)
			for _, pt := range points {
				if v := val(pt, k); !math.IsNaN(v) && (best == nil || v > bestV) {
					best, bestV = pt, v
				}
			}
			if best != nil {
				govern(best, key)
			}
		}
	}
	pick(s.points, s.t.keys, func(pt *sweepPoint, k int) float64 { return pt.ratio(k) }, func(k int) bool { return s.t.proxy[k] })
	var extra []*sweepPoint
	if ground {
		// Anchors on every point.
		terse := m.fbasis.Terse
		m.fbasis.Terse = true
		at := &tally{index: map[checkKey]int{}}
		avals := map[*sweepPoint][]float64{}
		for _, pt := range s.anchorPoints() {
			at.reset()
			for side := Left; side <= Right; side++ {
				if err := m.anchorChecks(at, side, m.bank(side).Anchor, s.perm, []CaseState{pt.svc}); err != nil {
					m.fbasis.Terse = terse
					return nil, err
				}
			}
			avals[pt] = append([]float64(nil), at.ratios...)
		}
		m.fbasis.Terse = terse
		val := func(vals map[*sweepPoint][]float64) func(*sweepPoint, int) float64 {
			return func(pt *sweepPoint, k int) float64 {
				if v := vals[pt]; k < len(v) {
					return v[k]
				}
				return math.NaN()
			}
		}
		pick(s.points, at.keys, val(avals), func(int) bool { return false })
		// Footings from their pass.
		ps, ft, fvals, err := s.footingPass(nil, [2]FootingSpec{m.bank(Left).Tower.Footing, m.bank(Right).Tower.Footing})
		if err != nil {
			return nil, err
		}
		pick(ps.points, ft.keys, val(fvals), func(int) bool { return false })
		extra = ps.points[len(s.points):]
	}
	// Points in the order they were found, so the report is stable.
	index := map[*sweepPoint]int{}
	for i, pt := range append(append([]*sweepPoint(nil), s.points...), extra...) {
		index[pt] = i
	}
	sort.SliceStable(order, func(i, j int) bool { return index[order[i].pt] < index[order[j].pt] })
	names := map[string]bool{}
	var found [][2]CaseState
	for _, g := range order {
		svc, des := g.pt.svc, g.pt.des
		name := s.uniqueName(g.pt, names)
		svc.Case.Name, des.Case.Name = name, name
		if err := m.governingChecks(&only{keys: g.keys, out: out}, s.perm, svc, des, ground); err != nil {
			return nil, err
		}
		found = append(found, [2]CaseState{svc, des})
	}
	return found, nil
}

// proposal is a stretch to evaluate next, for a check or for a driver.
type proposal struct {
	place Placement
	r     float64
	check bool
}

// localMaxima appends to out the indices of the points of pts where key k
// is at a local maximum (the first of a plateau).
func localMaxima(out []int, pts []*sweepPoint, k int, val func(*sweepPoint, int) float64) []int {
	for i, pt := range pts {
		v := val(pt, k)
		if math.IsNaN(v) {
			continue
		}
		if i > 0 && !(v >= val(pts[i-1], k)) && !math.IsNaN(val(pts[i-1], k)) {
			continue
		}
		if i+1 < len(pts) && !(v > val(pts[i+1], k)) && !math.IsNaN(val(pts[i+1], k)) {
			continue
		}
		out = append(out, i)
	}
	return out
}

// propose returns where to look next for key k's maximum near the local
// maximum bi of pts, and the value it hopes for there; false when the
// maximum is found closely enough: within refineTol of the span, or where
// the model of the curve promises less than refineGain of the check's
// scale above global, the best value found anywhere. The model is a
// parabola through bi and its neighbours where the saddles stay as they
// are, and two lines meeting in a kink where they change between bi and a
// neighbour; a golden-section step where neither fits, taken only for the
// best point found anywhere.
func propose(pts []*sweepPoint, k int, val func(*sweepPoint, int) float64, bi int, scale, global, gain float64) (r, peak float64, ok bool) {
	last := len(pts) - 1
	best := val(pts[bi], k)
	leading := best >= global-gain*scale
	enough := func(peak float64) bool { return peak-global <= gain*scale }
	x := pts[bi].r
	lo, hi := x, x
	if bi > 0 {
		lo = pts[bi-1].r
	}
	if bi < last {
		hi = pts[bi+1].r
	}
	if hi-lo <= 2*refineTol {
		return 0, 0, false
	}
	at := func(i int) (float64, float64) { return pts[i].r, val(pts[i], k) }
	// A kink: the saddles change between the best point and a neighbour.
	// Take the side with the higher neighbour.
	side := 0
	if bi > 0 && pts[bi-1].regime != pts[bi].regime {
		side = -1
	}
	if bi < last && pts[bi+1].regime != pts[bi].regime {
		if side == 0 || val(pts[bi+1], k) > val(pts[bi-1], k) {
			side = 1
		}
	}
	if side != 0 {
		// The kink lies between a (the best point) and b (its neighbour);
		// each branch is a line through its two nearest points of its own
		// regime.
		a, b := bi, bi+side
		a2, b2 := a-side, b+side
		if math.Abs(pts[b].r-pts[a].r) <= 2*refineTol {
			return 0, 0, false
		}
		if a2 >= 0 && a2 <= last && b2 >= 0 && b2 <= last &&
			pts[a2].regime == pts[a].regime && pts[b2].regime == pts[b].regime {
			x1, y1 := at(a2)
			x2, y2 := at(a)
			x3, y3 := at(b)
			x4, y4 := at(b2)
			s1, s2 := (y2-y1)/(x2-x1), (y4-y3)/(x4-x3)
			if s1 != s2 {
				xk := (y3 - y2 + s1*x2 - s2*x3) / (s1 - s2)
				lo, hi := math.Min(pts[a].r, pts[b].r), math.Max(pts[a].r, pts[b].r)
				if xk > lo+refineTol/2 && xk < hi-refineTol/2 {
					peak := y2 + s1*(xk-x2)
					if enough(peak) {
						return 0, 0, false
					}
					return xk, peak, true
				}
			}
		}
		if !leading {
			return 0, 0, false
		}
		return (pts[a].r + pts[b].r) / 2, math.Inf(1), true
	}
	// Three points around the best (the best at one end of them when it
	// is the first or last point).
	if last < 2 {
		return 0, 0, false
	}
	i0 := min(max(bi-1, 0), last-2)
	xa, ya := at(i0)
	xb, yb := at(i0 + 1)
	xc, yc := at(i0 + 2)
	v, peak, fits := vertex(xa, xb, xc, ya, yb, yc)
	switch {
	case fits && v > lo && v < hi:
		// A parabola through points far apart may hide a kink; its verdict
		// that nothing is left to find is trusted on a narrow bracket only.
		// A parabola through points far apart may hide a kink (an
		// absolute value through zero, a saddle turning): its verdict that
		// nothing is left to find is taken on a narrow bracket only.
		if (math.Abs(v-x) < refineTol || enough(peak)) && hi-lo <= trustWidth {
			return 0, 0, false // the maximum is at x, or near enough in value
		}
		if v > lo+refineTol/2 && v < hi-refineTol/2 {
			return v, peak, true
		}
	case bi == last:
		// Best at the whole span with no peak in reach: the curve still
		// rises there, and the whole span is the maximum.
		return 0, 0, false
	case bi == 0 && !leading:
		return 0, 0, false
	}
	if !leading {
		return 0, 0, false
	}
	// Golden-section step into the larger side of the bracket.
	const g = 0.381966
	if x-lo > hi-x {
		return x - g*(x-lo), math.Inf(1), true
	}
	return x + g*(hi-x), math.Inf(1), true
}

// vertex returns the abscissa and value of the maximum of the parabola
// through three points, false when it is not concave or not defined.
func vertex(xa, xb, xc, ya, yb, yc float64) (v, peak float64, ok bool) {
	if math.IsNaN(ya) || math.IsNaN(yb) || math.IsNaN(yc) {
		return 0, 0, false
	}
	// Divided differences: y = yb + d1 (x − xb) + d2 (x − xb)(x − xa)...
	d1 := (yb - ya) / (xb - xa)
	d2 := ((yc-yb)/(xc-xb) - d1) / (xc - xa)
	if !(d2 < 0) {
		return 0, 0, false
	}
	// p(x) = ya + d1 (x − xa) + d2 (x − xa)(x − xb); p'(x) = 0:
	v = (xa + xb - d1/d2) / 2
	peak = ya + d1*(v-xa) + d2*(v-xa)*(v-xb)
	return v, peak, true
}

// clusterTol returns how close, as a fraction of the span, the proposals
// of one round must be to be tried as one: wide at first, when the
// brackets are wide, then down to refineTol.
func clusterTol(round int) float64 {
	return math.Max(refineTol, 0.04/float64(int(1)<<round))
}

// cluster merges the proposals of each placement that lie within tol of
// the first of their group into one: the middle one of the checks'
// proposals in the group, else of the drivers'.
func cluster(props []proposal, tol float64) []proposal {
	sort.Slice(props, func(i, j int) bool {
		if props[i].place != props[j].place {
			return props[i].place < props[j].place
		}
		return props[i].r < props[j].r
	})
	var out []proposal
	for i := 0; i < len(props); {
		j := i + 1
		for j < len(props) && props[j].place == props[i].place && props[j].r-props[i].r <= tol {
			j++
		}
		group := props[i:j]
		var checks []proposal
		for _, p := range group {
			if p.check {
				checks = append(checks, p)
			}
		}
		if len(checks) > 0 {
			group = checks
		}
		out = append(out, group[len(group)/2])
		i = j
	}
	return out
}

// uniqueName names a governing point, with more digits where two would
// share a name.
func (s *searcher) uniqueName(pt *sweepPoint, used map[string]bool) string {
	name := s.fam.caseName(pt.place, pt.r)
	for digits := 3; used[name] && digits <= 6; digits++ {
		name = fmt.Sprintf("%s %.*f L %s", s.fam.Name, digits, pt.r, pt.place)
		if s.fam.Label != "" {
			name += ", " + s.fam.Label
		}
	}
	used[name] = true
	return name
}

// governingChecks adds the results the sink o names of one governing
// stretch: the checks of checkAll in its order (ropes, towers, clearance,
// gradient, and with ground the footings and anchors), each part run only
// where o names one of its results.
func (m *model) governingChecks(o *only, perm, svc, des CaseState, ground bool) error {
	if o.wants(func(k checkKey) bool { return k.id == "cable.tension" }) {
		if err := m.ropeChecks(o, svc, des, true); err != nil {
			return err
		}
	}
	for side := Left; side <= Right; side++ {
		tower := func(k checkKey) bool { return k.element == towerElement[side] || k.element == towerAcrossElement[side] }
		resultant := o.wants(func(k checkKey) bool { return tower(k) && strings.HasPrefix(k.id, "tower.eccentricity") })
		member := o.wants(func(k checkKey) bool { return tower(k) && strings.HasPrefix(k.id, "tower.column_") })
		if o.wants(func(k checkKey) bool {
			return tower(k) && !strings.HasPrefix(k.id, "tower.eccentricity") && !strings.HasPrefix(k.id, "tower.column_")
		}) {
			resultant, member = true, true // a check of neither part: both, to be sure
		}
		if resultant || member {
			if err := m.towerParts(o, side, svc, des, perm, resultant, member); err != nil {
				return err
			}
		}
	}
	if svc.Case.Situation == Persistent {
		if o.wants(func(k checkKey) bool { return k.id == "bridge.clearance" }) {
			m.checkClearance(o, []CaseState{svc})
		}
		if o.wants(func(k checkKey) bool { return k.id == "walkway.gradient" }) {
			m.checkGradient(o, svc)
		}
	}
	if !ground {
		return nil
	}
	for side := Left; side <= Right; side++ {
		bank := m.bank(side)
		if o.wantsElement(footingElement[side], footingAcrossElement[side]) {
			if err := m.footingChecks(o, side, bank.Tower.Footing, perm, []CaseState{svc}); err != nil {
				return err
			}
		}
		if o.wantsElement(anchorElement[side], anchorElement[side]) {
			if err := m.anchorChecks(o, side, bank.Anchor, perm, []CaseState{svc}); err != nil {
				return err
			}
		}
	}
	return nil
}

// only passes on the results of the checks it names.
type only struct {
	keys map[checkKey]bool
	out  sink
}

// wants reports whether o names a check for which match holds.
func (o *only) wants(match func(checkKey) bool) bool {
	for k := range o.keys {
		if match(k) {
			return true
		}
	}
	return false
}

// wantsElement reports whether o names a check of either element.
func (o *only) wantsElement(a, b string) bool {
	return o.wants(func(k checkKey) bool { return k.element == a || k.element == b })
}

func (o *only) add(r check.Result) {
	if o.keys[checkKey{r.ID, r.Element}] {
		o.out.add(r)
	}
}

func (p *sweepPoint) ratio(k int) float64 {
	if k < len(p.ratios) {
		return p.ratios[k]
	}
	return math.NaN()
}
