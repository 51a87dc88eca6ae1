package sagspan

import (
	"fmt"
	"math"
	"sort"
	"strconv"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// The loaded-length search. For a family of cases (LoadedLength) it finds,
// for every check, the stretch that gives the check its highest
// utilisation:
//
//  1. a sweep of sweepPoints lengths per placement (k/sweepPoints of the
//     span, the whole span shared by every placement);
//  2. refinement around each check's maximum, placement by placement: a
//     parabola through the best point and its neighbours, or a
//     golden-section step where the parabola does not fit, until the
//     bracket is narrower than refineTol of the span or the parabola
//     promises less than refineGain of the check's scale;
//  3. the footing and anchor checks, whose maximum moves with the sizes a
//     design search tries, are evaluated at every point found; what drives
//     the refinement for them is their actions (each tower's base forces and
//     eccentricities, each anchor's pull), which no size changes, so that a
//     design search and the whole-bridge check see the same points.
//
// Each point is a full pair of states (characteristic and design loads),
// each group's iteration started from the nearest point's.
const (
	sweepPoints = 6
	refineTol   = 1.0 / 400
	refineGain  = 2e-4
	// proxyGain is refineGain for the drivers of the footing and anchor
	// checks, which are evaluated on every point found.
	proxyGain = 5e-4
	// trustWidth is the widest bracket, as a fraction of the span, on which
	// a parabola's verdict that the maximum is found is taken.
	trustWidth      = 1.0
	maxRefineRounds = 16
	// minRefined is the utilisation below which a check's maximum is not
	// refined: it is found on the points the other checks bring.
	minRefined = 0.01
)

var debugSweep = false

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
	ratios   []float64 // by the tally's key index; NaN where absent
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
func (s *searcher) pressureRegime(lc LoadCase) uint64 {
	if lc.CrowdPressure > 0 || s.m.b.Loads.Crowd > 0 || lc.Crowd.Empty() {
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

// searcher runs one family's search.
type searcher struct {
	m      *model
	fam    LoadedLength
	perm   CaseState
	span   units.Length
	t      tally
	points []*sweepPoint
}

// evaluate adds the point of placement p and length fraction r, started
// from warm.
func (s *searcher) evaluate(p Placement, r float64, warm *sweepPoint) (*sweepPoint, error) {
	lc := s.fam.at(p, units.Length(r)*s.span, s.span)
	var w *[2]CaseState
	if warm != nil {
		w = &[2]CaseState{warm.svc, warm.des}
	}
	svc, des, err := s.m.pair(lc, w)
	if err != nil {
		return nil, err
	}
	pt := &sweepPoint{place: p, r: r, svc: svc, des: des, regime: regime(svc, des) | s.pressureRegime(lc)}
	s.t.reset()
	if err := s.m.ropeChecks(&s.t, svc, des, false); err != nil {
		return nil, err
	}
	if err := s.m.structureChecks(&s.t, s.perm, svc, des); err != nil {
		return nil, err
	}
	s.drivers(svc)
	pt.ratios = append([]float64(nil), s.t.ratios...)
	s.points = append(s.points, pt)
	return pt, nil
}

// drivers records the actions that the footing and anchor checks grow
// with and that no foundation size changes: each tower's base forces and
// their ratios (the footing's sliding, overturning and bearing follow
// them), each anchor's pull.
func (s *searcher) drivers(svc CaseState) {
	for side := Left; side <= Right; side++ {
		e := towerElement[side]
		r := svc.Tower[side]
		v, h, m := float64(r.Vertical), float64(r.Horizontal), float64(r.BaseMoment)
		vp := math.Abs(float64(s.perm.Tower[side].Vertical))
		y := float64(s.m.bank(side).Tower.Height)
		s.t.put("~V", e, v, vp)
		s.t.put("~H", e, h, vp)
		s.t.put("~-H", e, -h, vp)
		s.t.put("~M", e, m, vp*y)
		s.t.put("~-M", e, -m, vp*y)
		// The footing's own weight W adds to V: its checks follow H/(V + W)
		// and M/(V + W), which move from the maxima of H/V to those of H as
		// W grows; three weights in between.
		// The moment at the footing's underside adds H times its thickness
		// t: M + H t for a thin and a thick footing.
		for _, c := range [...]struct {
			id string
			w  float64
		}{{"", 0}, {"+Vp", 1}, {"+3Vp", 3}} {
			if d := v + c.w*vp; d > 0 {
				s.t.put("~H/V"+c.id, e, h/d, 1)
				s.t.put("~-H/V"+c.id, e, -h/d, 1)
				for _, t := range [...]float64{0, 1} {
					mt := m + h*t
					id := c.id + "+" + strconv.FormatFloat(t, 'g', -1, 64) + "H"
					s.t.put("~M/V"+id, e, mt/d, y)
					s.t.put("~-M/V"+id, e, -mt/d, y)
				}
			}
		}
		var pull, pullp float64
		for i := range svc.Groups {
			pull += float64(svc.Groups[i].Backstay[side])
			pullp += float64(s.perm.Groups[i].Backstay[side])
		}
		s.t.put("~pull", anchorElement[side], pull, pullp)
	}
}

// placed returns the points of placement p, the whole span included,
// sorted by length.
func (s *searcher) placed(p Placement) []*sweepPoint {
	var out []*sweepPoint
	for _, pt := range s.points {
		if pt.place == p || pt.r >= 1 || pt.r <= 0 {
			out = append(out, pt)
		}
	}
	sort.Slice(out, func(i, j int) bool { return out[i].r < out[j].r })
	return out
}

// proposal is a stretch to evaluate next, for a check or for a driver.
type proposal struct {
	place Placement
	r     float64
	check bool
}

// localMaxima returns the indices of the points of pts where key k is at
// a local maximum (the first of a plateau).
func localMaxima(pts []*sweepPoint, k int) []int {
	var out []int
	for i, pt := range pts {
		v := pt.ratio(k)
		if math.IsNaN(v) {
			continue
		}
		if i > 0 && !(v >= pts[i-1].ratio(k)) && !math.IsNaN(pts[i-1].ratio(k)) {
			continue
		}
		if i+1 < len(pts) && !(v > pts[i+1].ratio(k)) && !math.IsNaN(pts[i+1].ratio(k)) {
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
func propose(pts []*sweepPoint, k, bi int, scale, global, gain float64) (r, peak float64, ok bool) {
	last := len(pts) - 1
	best := pts[bi].ratio(k)
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
	at := func(i int) (float64, float64) { return pts[i].r, pts[i].ratio(k) }
	// A kink: the saddles change between the best point and a neighbour.
	// Take the side with the higher neighbour.
	side := 0
	if bi > 0 && pts[bi-1].regime != pts[bi].regime {
		side = -1
	}
	if bi < last && pts[bi+1].regime != pts[bi].regime {
		if side == 0 || pts[bi+1].ratio(k) > pts[bi-1].ratio(k) {
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
		if (math.Abs(v-x) < refineTol || enough(peak)) && hi-lo <= trustWidth {
			return 0, 0, false // the maximum is at x, or near enough in value
		}
		if v > lo+refineTol/2 && v < hi-refineTol/2 {
			return v, peak, true
		}
	case bi == 0 || bi == last:
		// Best at an end with no peak in reach: the curve still rises
		// there, and that end is the maximum (the whole span, or the case
		// without the stretch).
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

// searchLength runs the loaded-length search of one family: every check
// of every stretch tried, the governing result of each check added to out
// under its stretch's case name. It returns the states of the governing
// stretches (characteristic and design) and the characteristic states of
// every stretch tried. With ground false the footing and anchor checks are
// left to the caller, who checks them on every stretch tried (a design
// search, for each size it tries).
func (m *model) searchLength(out sink, perm CaseState, fam LoadedLength, ground bool) (governing [][2]CaseState, tried []CaseState, err error) {
	s := &searcher{m: m, fam: fam, perm: perm, span: m.b.Site.Span, t: tally{index: map[checkKey]int{}}}
	full, err := s.evaluate(fam.Placements[0], 1, nil)
	if err != nil {
		return nil, nil, err
	}
	for _, p := range fam.Placements {
		warm := full
		for j := sweepPoints - 1; j >= 1; j-- {
			if warm, err = s.evaluate(p, float64(j)/sweepPoints, warm); err != nil {
				return nil, nil, err
			}
		}
	}
	// The family's case without the stretch closes the curves at zero.
	if _, err := s.evaluate(fam.Placements[0], 0, nil); err != nil {
		return nil, nil, err
	}
	// Where the EN 1991-2 pressure leaves its bounds (10 m and 210 m of
	// loaded length) the checks may turn a corner: a point there on each
	// placement.
	if !fam.deck() && fam.Base.CrowdPressure == 0 && m.b.Loads.Crowd == 0 {
		for _, l := range []units.Length{crowdUpperLength, crowdLowerLength} {
			if r := float64(l / s.span); r > refineTol && r < 1-refineTol {
				for _, p := range fam.Placements {
					if _, err := s.evaluate(p, r, s.nearest(proposal{place: p, r: r})); err != nil {
						return nil, nil, err
					}
				}
			}
		}
	}
	if err := s.refine(); err != nil {
		return nil, nil, err
	}
	if governing, err = s.emit(out, ground); err != nil {
		return nil, nil, err
	}
	for _, pt := range s.points {
		tried = append(tried, pt.svc)
	}
	return governing, tried, nil
}

// refine adds points around each check's maximum until none moves.
func (s *searcher) refine() error {
	for round := range maxRefineRounds {
		var props []proposal
		for k := range s.t.keys {
			if s.t.ground[k] {
				continue
			}
			scale, best, worst := 0.0, math.Inf(-1), math.Inf(1)
			for _, pt := range s.points {
				if v := pt.ratio(k); !math.IsNaN(v) && !math.IsInf(v, 0) {
					scale, best, worst = math.Max(scale, math.Abs(v)), math.Max(best, v), math.Min(worst, v)
				}
			}
			// Nothing to find in a check used below a per cent, a driver
			// that does not move off its noise, or a flat curve.
			if s.t.proxy[k] && scale < 1e-3*s.t.ref[k] || !s.t.proxy[k] && best < minRefined ||
				best-worst <= refineGain*scale {
				continue
			}
			gain := refineGain
			if s.t.proxy[k] {
				gain = proxyGain
			}
			// Around each local maximum of each placement, the next point; a
			// maximum whose curve promises no more than the best found
			// needs no closer look.
			for _, p := range s.fam.Placements {
				pts := s.placed(p)
				for _, bi := range localMaxima(pts, k) {
					if r, _, ok := propose(pts, k, bi, scale, best, gain); ok {
						props = append(props, proposal{place: p, r: r, check: !s.t.proxy[k]})
						if debugSweep {
							fmt.Printf("  %v %v %.4f\n", s.t.keys[k], p, r)
						}
					}
				}
			}
		}
		if len(props) == 0 {
			return nil
		}
		if debugSweep {
			fmt.Println("round", round, len(props), "proposals")
		}
		added := 0
		for _, pr := range cluster(props, clusterTol(round)) {
			near := s.nearest(pr)
			if math.Abs(near.r-pr.r) < refineTol/2 {
				continue
			}
			if _, err := s.evaluate(pr.place, pr.r, near); err != nil {
				return err
			}
			added++
		}
		if added == 0 {
			return nil
		}
	}
	return nil
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

// nearest returns the evaluated point of the proposal's placement nearest
// to it.
func (s *searcher) nearest(pr proposal) *sweepPoint {
	var best *sweepPoint
	for _, pt := range s.points {
		if pt.place != pr.place && pt.r < 1 && pt.r > 0 {
			continue
		}
		if best == nil || math.Abs(pt.r-pr.r) < math.Abs(best.r-pr.r) {
			best = pt
		}
	}
	return best
}

// emit evaluates the footing and anchor checks at every point (with
// ground), picks each check's governing point and adds its full result
// there.
func (s *searcher) emit(out sink, ground bool) ([][2]CaseState, error) {
	m := s.m
	terse := m.fbasis.Terse
	m.fbasis.Terse = true
	s.t.groundMode = true
	for _, pt := range s.points {
		if !ground {
			break
		}
		s.t.reset()
		if err := m.groundChecks(&s.t, s.perm, pt.svc); err != nil {
			m.fbasis.Terse = terse
			return nil, err
		}
		for len(pt.ratios) < len(s.t.ratios) {
			pt.ratios = append(pt.ratios, math.NaN())
		}
		for k, g := range s.t.ground {
			if g {
				pt.ratios[k] = s.t.ratios[k]
			}
		}
	}
	m.fbasis.Terse = terse
	s.t.groundMode = false

	// Each check's governing point; ties go to the point found first.
	governs := make(map[*sweepPoint]map[checkKey]bool)
	var order []*sweepPoint
	for k, key := range s.t.keys {
		if s.t.proxy[k] {
			continue
		}
		var best *sweepPoint
		for _, pt := range s.points {
			if v := pt.ratio(k); !math.IsNaN(v) && (best == nil || v > best.ratio(k)) {
				best = pt
			}
		}
		if best == nil {
			continue
		}
		if governs[best] == nil {
			governs[best] = map[checkKey]bool{}
			order = append(order, best)
		}
		governs[best][key] = true
	}
	// Points in the order they were found, so the report is stable.
	sort.SliceStable(order, func(i, j int) bool { return s.index(order[i]) < s.index(order[j]) })
	names := map[string]bool{}
	var found [][2]CaseState
	for _, pt := range order {
		svc, des := pt.svc, pt.des
		name := s.uniqueName(pt, names)
		svc.Case.Name, des.Case.Name = name, name
		f := &only{keys: governs[pt], out: out}
		if err := m.ropeChecks(f, svc, des, true); err != nil {
			return nil, err
		}
		if err := m.structureChecks(f, s.perm, svc, des); err != nil {
			return nil, err
		}
		if ground {
			if err := m.groundChecks(f, s.perm, svc); err != nil {
				return nil, err
			}
		}
		found = append(found, [2]CaseState{svc, des})
	}
	return found, nil
}

func (s *searcher) index(pt *sweepPoint) int {
	for i, p := range s.points {
		if p == pt {
			return i
		}
	}
	return -1
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

// only passes on the results of the checks it names.
type only struct {
	keys map[checkKey]bool
	out  sink
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
