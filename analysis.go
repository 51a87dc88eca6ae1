package sagspan

import (
	"fmt"
	"runtime"
	"slices"
	"sync"
	"sync/atomic"

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
	// shear is ∫Q² dx of the load (cable.LengthCurve.ShearIntegral), for
	// the start of nearby states.
	shear float64
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
	// The comfort stage needs the first variant's permanent state only: it
	// runs beside that variant's cases and searches, on a copy of the
	// model of its own, into an analysis of its own whose findings follow
	// the groove checks in the report.
	var comfort Analysis
	var comfortErr error
	for k, v := range vs {
		c := m.clone()
		c.grooves = v.grooves
		var early func(*model, CaseState) func()
		if k == 0 {
			first = c
			early = func(cm *model, perm CaseState) func() {
				return func() { comfortErr = cm.comfort(&comfort, perm, opts) }
			}
		}
		check := func() {
			r := &res[k]
			r.service, r.design, r.err = c.checkAll(&r.results, true, early)
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
		// One variant: every result is its own (see merged), and the
		// report takes the variant's list as it is (grown with room for the
		// groove and comfort checks, see checkAll).
		if a.Report.Results == nil {
			a.Report.Results = res[0].results
		} else {
			a.Report.Add(res[0].results...)
		}
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
	m.levelChecks(&grooves)
	m.gradeChecks(&grooves)
	a.Report.Add(grooves...)
	if comfortErr != nil {
		return comfortErr
	}
	a.Modes, a.Comfort = comfort.Modes, comfort.Comfort
	a.Report.Add(comfort.Report.Results...)
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
//
// early, when not nil, gives a job that needs the permanent case only (the
// comfort stage), to run on the copy of the model it is given beside the
// searches and the cases.
func (m *model) checkAll(out sink, ground bool, early func(*model, CaseState) func()) (service, design []CaseState, err error) {
	cases := m.b.Cases()
	// One task a case: its states (the permanent case's first, which the
	// families start from), then its checks, each on a copy of the model
	// of its own.
	type caseTask struct {
		uplift             collected // the check of a case with wind lifting the walkway
		svc, des           CaseState
		ok                 bool // false where the wind lifts the walkway: no states
		stateErr, checkErr error
		results            collected
	}
	tasks := make([]caseTask, len(cases))
	t0 := &tasks[0]
	if t0.svc, t0.des, t0.ok, t0.stateErr = m.caseStates(&t0.uplift, cases[0]); t0.stateErr != nil {
		return nil, nil, t0.stateErr
	}
	if !t0.ok {
		return nil, nil, fmt.Errorf("sagspan: the permanent case has no state")
	}
	perm := t0.svc
	families := m.families(perm, ground)
	// The largest pieces first (the families' searches), then the cases:
	// the cores fill as they free.
	var jobs []func()
	if early != nil {
		jobs = append(jobs, early(m.clone(), perm))
	}
	jobs = append(jobs, families.jobs()...)
	for k := range cases {
		c, t := m.clone(), &tasks[k]
		jobs = append(jobs, func() {
			if k > 0 {
				if t.svc, t.des, t.ok, t.stateErr = c.caseStates(&t.uplift, cases[k]); t.stateErr != nil || !t.ok {
					return
				}
			}
			t.results = make(collected, 0, 40) // 28 to 36 results a case on the demo
			t.checkErr = c.caseChecks(&t.results, perm, t.svc, t.des, ground)
		})
	}
	runAll(jobs)
	// Errors and results in the order of a sequential check: the cases'
	// states, their checks, then the families.
	var uplift collected
	for k := range tasks {
		if tasks[k].stateErr != nil {
			return nil, nil, tasks[k].stateErr
		}
		uplift = append(uplift, tasks[k].uplift...)
	}
	var done []*caseTask
	for k := range tasks {
		if tasks[k].ok {
			done = append(done, &tasks[k])
			service = append(service, tasks[k].svc)
			design = append(design, tasks[k].des)
		}
	}
	if c, ok := out.(*collected); ok {
		// Room for everything at once: the cases', the families', and a
		// few more (the whole-bridge check adds the groove and comfort
		// checks to the list).
		n := len(uplift) + reportRoom
		for _, t := range done {
			n += len(t.results)
		}
		for _, r := range families.res {
			n += len(r.results)
		}
		*c = slices.Grow(*c, n)
	}
	// The uplift checks of the cases with wind lifting the walkway follow
	// the permanent case's checks in the report.
	for k, t := range done {
		if k == 1 || len(done) == 1 {
			for _, r := range uplift {
				out.add(r)
			}
		}
		if t.checkErr != nil {
			return nil, nil, t.checkErr
		}
		for _, r := range t.results {
			out.add(r)
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

// reportRoom is the room a variant's list of results keeps for the groove
// and comfort checks that follow it in the report.
const reportRoom = 32

// runAll runs the jobs on up to GOMAXPROCS goroutines, this one among
// them, each taking the next job in order, and returns when all are done.
func runAll(jobs []func()) {
	var next atomic.Int64
	work := func() {
		for {
			i := next.Add(1) - 1
			if i >= int64(len(jobs)) {
				return
			}
			jobs[i]()
		}
	}
	var wg sync.WaitGroup
	for range min(runtime.GOMAXPROCS(0), len(jobs)) - 1 {
		wg.Go(work)
	}
	work()
	wg.Wait()
}

// familySearch is the loaded-length searches of every family (see
// searchLength), each on its own copy of the model, taken when the
// permanent case is solved and before any other case, so that the whole-
// bridge check and a design search give the families the same states to
// start from and find the same numbers, whether the families run at once
// or one after the other.
type familySearch struct {
	perm   CaseState
	ground bool
	fams   []LoadedLength
	models []*model
	res    []familyResult
}

type familyResult struct {
	results   collected
	searcher  *searcher
	governing [][2]CaseState
	err       error
}

// families takes the copies of the model for the search of every family
// from the permanent case perm, with the footing and anchor checks when
// ground; run them (run, or runAll on jobs), then collect.
func (m *model) families(perm CaseState, ground bool) *familySearch {
	fams := m.b.LoadedLengths()
	f := &familySearch{perm: perm, ground: ground, fams: fams, res: make([]familyResult, len(fams))}
	m.buildColumns() // once, for every copy
	for range fams {
		f.models = append(f.models, m.clone())
	}
	return f
}

// jobs returns the searches, one job a family, for runAll; run runs them
// one after the other.
func (f *familySearch) jobs() []func() {
	var out []func()
	for i, fam := range f.fams {
		c := f.models[i]
		out = append(out, func() {
			r := &f.res[i]
			r.searcher, r.governing, r.err = c.searchLength(&r.results, f.perm, fam, f.ground)
		})
	}
	return out
}

func (f *familySearch) run() *familySearch {
	for _, job := range f.jobs() {
		job()
	}
	return f
}

// collect adds the results of the searches, run, to out, family by
// family; it returns the states of the governing stretches and the
// searchers.
func (f *familySearch) collect(out sink) (governing [][2]CaseState, searchers []*searcher, err error) {
	if c, ok := out.(*collected); ok {
		n := 0
		for _, r := range f.res {
			n += len(r.results)
		}
		*c = slices.Grow(*c, n)
	}
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

// caseChecks adds the checks of one case, characteristic state svc and
// design state des, to out: ropes, towers, clearance and gradient, and
// with ground the footings and anchors; perm is the permanent case.
func (m *model) caseChecks(out sink, perm, svc, des CaseState, ground bool) error {
	if err := m.ropeChecks(out, svc, des, true); err != nil {
		return err
	}
	if err := m.structureChecks(out, perm, svc, des); err != nil {
		return err
	}
	if ground {
		return m.groundChecks(out, perm, svc)
	}
	return nil
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
