package sagspan

import (
	"fmt"
	"sync"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
	"github.com/sagspan/sagspan/vibration"
)

// Options tune a whole-bridge check. A nil *Options means the defaults.
type Options struct {
	// ErectionStep is the temperature step of the erection table; zero
	// means 5 K.
	ErectionStep float64
	// StrictComfort fails, rather than flags, what the comfort assessment
	// finds: accelerations under walkers beyond their limits and crowds
	// beyond the lock-in number (with SkipComfort, frequencies in the
	// ranges walkers excite). Default false: flags.
	StrictComfort bool
	// SkipComfort leaves out the modal analysis and the walkers' response,
	// keeping the closed-form frequencies: for a fast check. Default false.
	SkipComfort bool
	// Modal tunes the modal analysis; nil means its defaults.
	Modal *vibration.Settings
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
	LowX, LowZ           units.Length // lowest point within the span, z from the left saddle
	MaxTension           units.Force  // the largest of span and backstay tensions
	// SaddleMoved reports whether the saddle moved on the column top: a
	// sliding saddle that slid, or a roller; Travel is how far it moved
	// from its place in the reference state, toward the span positive.
	SaddleMoved [2]bool
	Travel      [2]units.Length
	// Held is the backstay tension had neither the rope nor the saddle
	// moved from the reference state (the backstay's own unstretched length
	// over its chord); Unbalance the horizontal force the ropes would then
	// put on the saddle, toward the span: for a sliding saddle, its
	// unbalance before friction.
	Held      [2]units.Force
	Unbalance [2]units.Force
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
	// Lateral is the force across the bridge that wind-swung ropes and wind
	// on the column face put on each tower, and LateralMoment its moment
	// about the column base; ColumnWind is the part from wind on the
	// column face.
	Lateral       [2]units.Force
	LateralMoment [2]units.Moment
	ColumnWind    [2]units.Force
}

// ErectionTable is the erection-sag table of one rope group: the sag and
// horizontal tension of the bare ropes at each rope temperature of the
// site's range, from the chain's own rope model.
type ErectionTable struct {
	Group string
	Rows  []cable.ErectionRow
	// Hold says what the crew holds fixed while setting the sag.
	Hold string
	// ConstructionalStretch is the strain the new rope is expected to take
	// under the walkway, allowed for in the sags.
	ConstructionalStretch float64
}

// Analysis is everything the whole-bridge check found.
type Analysis struct {
	Bridge Bridge
	// Source names the description the bridge was read from, such as its
	// file name, for the report's design basis; the caller sets it.
	Source string
	// Report holds every check result of every case.
	Report check.Report
	// Service holds the states under characteristic loads (all factors 1):
	// clearance, eccentricity, drawing, anchors and footings are checked on
	// them. Design holds the states under the factored loads of the partial
	// basis: rope tension (on that basis) and column sections.
	Service, Design []CaseState
	// Modes are the closed-form frequencies of Irvine & Caughey; Comfort
	// the modal analysis and walkers' response (nil when switched off).
	Modes    cable.Modes
	Comfort  *Comfort
	Erection []ErectionTable
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

// sink receives check results: the variants' merged report (labelSink),
// or a scorer that keeps only what a design search needs.
type sink interface{ add(check.Result) }

func (m *model) run(a *Analysis, opts *Options) error {
	// Each variant of groove behaviour (one, unless the description leaves
	// a fixed saddle's groove open) is analysed and checked in full, each
	// on its own copy of the model and, where there are several, at once;
	// the report keeps each check's worst variant. The states kept are the
	// first variant's (free grooves where not given).
	vs := m.variants()
	type variantResult struct {
		results         collected
		service, design []CaseState
		err             error
	}
	res := make([]variantResult, len(vs))
	var wg sync.WaitGroup
	var first *model
	for k, v := range vs {
		c := m.clone()
		c.grooves = v.grooves
		if k == 0 {
			first = c
		}
		check := func() {
			r := &res[k]
			r.service, r.design, r.err = c.checkAll(&r.results, true)
		}
		if len(vs) == 1 {
			check()
		} else {
			wg.Go(check)
		}
	}
	wg.Wait()
	for _, r := range res {
		if r.err != nil {
			return r.err
		}
	}
	a.Service, a.Design = res[0].service, res[0].design
	// The model goes on with the first variant's states (its copy is done
	// with them), as the erection table may meet them again.
	m.grooves, m.states = vs[0].grooves, first.states
	if len(vs) == 1 {
		// One variant: every result is its own (see merged).
		a.Report.Add(res[0].results...)
	} else {
		var all merged
		for k, r := range res {
			for _, x := range r.results {
				all.add(x, vs[k].label)
			}
		}
		a.Report.Add(all.results...)
	}
	var grooves collected
	if err := m.grooveChecks(&grooves); err != nil {
		return err
	}
	a.Report.Add(grooves...)
	if err := m.comfort(a, a.Service[0], opts); err != nil {
		return err
	}
	return m.erection(a, opts)
}

// checkAll analyses every load case and every loaded-length family in the
// variant of groove behaviour set, and adds their checks to out (the
// footing and anchor checks with ground). It returns the states of the
// cases and of the governing stretches, characteristic and design; the
// first is the permanent case. The families' searches start once the
// permanent case is known and run beside the other cases (see
// searchFamilies); their results follow the cases' in out, family by
// family, whatever finishes first.
func (m *model) checkAll(out sink, ground bool) (service, design []CaseState, err error) {
	// The uplift checks of the cases with wind lifting the walkway follow
	// the permanent case's checks in the report.
	var uplift collected
	cases := m.b.Cases()
	perm, permDes, ok, err := m.caseStates(&uplift, cases[0])
	if err != nil {
		return nil, nil, err
	}
	if !ok {
		return nil, nil, fmt.Errorf("sagspan: the permanent case has no state")
	}
	families := m.startFamilies(perm, ground)
	defer families.wait()
	service, design = []CaseState{perm}, []CaseState{permDes}
	for _, lc := range cases[1:] {
		svc, des, ok, err := m.caseStates(&uplift, lc)
		if err != nil {
			return nil, nil, err
		}
		if ok {
			service = append(service, svc)
			design = append(design, des)
		}
	}
	for k := range service {
		if k == 1 || len(service) == 1 {
			for _, r := range uplift {
				out.add(r)
			}
		}
		if err := m.ropeChecks(out, service[k], design[k], true); err != nil {
			return nil, nil, err
		}
		if err := m.structureChecks(out, perm, service[k], design[k]); err != nil {
			return nil, nil, err
		}
		if ground {
			if err := m.groundChecks(out, perm, service[k]); err != nil {
				return nil, nil, err
			}
		}
	}
	found, _, err := families.collect(out)
	if err != nil {
		return nil, nil, err
	}
	for _, p := range found {
		service = append(service, p[0])
		design = append(design, p[1])
	}
	return service, design, nil
}

// searchFamilies runs the loaded-length search of every family (see
// searchLength), each on its own copy of the model so that they may run
// at once (parallel) and, either way, give the same numbers. The results
// reach out family by family, in order. It returns the states of the
// governing stretches and the searchers, whose points a design search
// checks its sizes on.
func (m *model) searchFamilies(out sink, perm CaseState, ground, parallel bool) (governing [][2]CaseState, searchers []*searcher, err error) {
	var f *familySearch
	if parallel {
		f = m.startFamilies(perm, ground)
	} else {
		f = m.runFamilies(perm, ground)
	}
	return f.collect(out)
}

// familySearch is the loaded-length searches of every family, each on its
// own copy of the model, running or done.
type familySearch struct {
	wg  sync.WaitGroup
	res []familyResult
}

type familyResult struct {
	results   collected
	searcher  *searcher
	governing [][2]CaseState
	err       error
}

// startFamilies starts the search of every family in a goroutine of its
// own; runFamilies runs them one after the other.
func (m *model) startFamilies(perm CaseState, ground bool) *familySearch {
	return m.families(perm, ground, true)
}

func (m *model) runFamilies(perm CaseState, ground bool) *familySearch {
	return m.families(perm, ground, false)
}

func (m *model) families(perm CaseState, ground, parallel bool) *familySearch {
	fams := m.b.LoadedLengths()
	f := &familySearch{res: make([]familyResult, len(fams))}
	for i, fam := range fams {
		c := m.clone()
		search := func() {
			r := &f.res[i]
			r.searcher, r.governing, r.err = c.searchLength(&r.results, perm, fam, ground)
		}
		if parallel {
			f.wg.Go(search)
		} else {
			search()
		}
	}
	return f
}

// wait waits for every family's search to end.
func (f *familySearch) wait() { f.wg.Wait() }

// collect waits for the searches and adds their results to out, family by
// family; it returns the states of the governing stretches and the
// searchers.
func (f *familySearch) collect(out sink) (governing [][2]CaseState, searchers []*searcher, err error) {
	f.wait()
	for _, r := range f.res {
		if r.err != nil {
			return nil, nil, r.err
		}
		for _, x := range r.results {
			out.add(x)
		}
		governing = append(governing, r.governing...)
		searchers = append(searchers, r.searcher)
	}
	return governing, searchers, nil
}

// collected keeps the results it is given, in order.
type collected []check.Result

func (c *collected) add(r check.Result) { *c = append(*c, r) }

// caseStates returns the states of case lc, characteristic and design,
// and false when the wind lifts the walkway so that it has none; a case
// with wind lifting the walkway adds its uplift check to out.
func (m *model) caseStates(out sink, lc LoadCase) (svc, des CaseState, ok bool, err error) {
	if lc.Lift {
		r, lifted := m.upliftCheck(lc)
		out.add(r)
		if lifted {
			return CaseState{}, CaseState{}, false, nil
		}
	}
	svc, des, err = m.pair(lc, nil)
	return svc, des, err == nil, err
}

// structureChecks adds the checks of one case that no foundation size
// changes, but for the ropes: towers and column members, and in the
// persistent situation the flood clearance and the walkway gradient. perm
// is the permanent case, for creep in the columns.
func (m *model) structureChecks(out sink, perm, svc, des CaseState) error {
	for side := Left; side <= Right; side++ {
		if err := m.towerChecks(out, side, svc, des, perm); err != nil {
			return err
		}
	}
	if svc.Case.Situation == Persistent {
		m.checkClearance(out, []CaseState{svc})
		m.checkGradient(out, svc)
	}
	return nil
}

// groundChecks adds the footing and anchor checks of one case at both
// banks; perm is the permanent case, whose actions they split off as
// permanent.
func (m *model) groundChecks(out sink, perm, svc CaseState) error {
	for side := Left; side <= Right; side++ {
		bank := m.bank(side)
		if err := m.footingChecks(out, side, bank.Tower.Footing, perm, []CaseState{svc}); err != nil {
			return err
		}
		if err := m.anchorChecks(out, side, bank.Anchor, perm, []CaseState{svc}); err != nil {
			return err
		}
	}
	return nil
}
