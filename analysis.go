package sagspan

import (
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

// ErectionTable is the erection-sag table of one rope group.
type ErectionTable struct {
	Group string
	Rows  []cable.ErectionRow
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
	// a fixed saddle's groove open) is analysed and checked in full; the
	// report keeps each check's worst variant. The states kept are the
	// first variant's (free grooves where not given).
	var all merged
	for k, v := range m.variants() {
		m.grooves = v.grooves
		service, design, err := m.states()
		if err != nil {
			return err
		}
		if k == 0 {
			a.Service, a.Design = service, design
		}
		out := labelSink{&all, v.label}
		if err := m.superstructure(out, service, design); err != nil {
			return err
		}
		for side := Left; side <= Right; side++ {
			bank := m.bank(side)
			if err := m.footingChecks(out, side, bank.Tower.Footing, service); err != nil {
				return err
			}
			if err := m.anchorChecks(out, side, bank.Anchor, service); err != nil {
				return err
			}
		}
		m.checkClearance(out, service)
	}
	m.grooves = m.variants()[0].grooves
	a.Report.Add(all.results...)
	if err := m.comfort(a, a.Service[0], opts); err != nil {
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
				basis = cable.PartialFactor{GammaR: m.b.Basis.GammaR, Ke: m.b.Basis.RopeEfficiency}
				t = des.Groups[i].MaxTension
			}
			r, err := cable.TensionCheck(t, g.rope, g.Count, basis)
			if err != nil {
				return fieldErr("basis", "%s, case %q: %w; check the rope factors of the basis", g.Name, name, err)
			}
			out.add(r.For(g.Name, name))
		}
		for side := Left; side <= Right; side++ {
			if err := m.towerChecks(out, side, svc, des, service[0]); err != nil {
				return err
			}
		}
	}
	return nil
}
