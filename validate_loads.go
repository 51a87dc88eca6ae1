package sagspan

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// validateCaseSpecs checks the load cases, case options and rope checks
// the description adds: its own cases (loads.cases), the defaults it
// leaves out (loads.omit), the factors of the added cases, the walkway
// gradient limit, the ropes' sharing factors and constructional stretch,
// the terminations and the saddle grooves.
func (b Bridge) validateCaseSpecs(v *validator) {
	l := b.Loads
	for _, x := range []struct {
		f        string
		x        float64
		lo, hi   float64
		zeroDflt bool
	}{
		{"loads.walkway_lift", l.WalkwayLift, 0, 10, true},
		{"loads.crowd_in_accident", l.CrowdInAccident, 0, 1, true},
		{"loads.break_dynamic", l.BreakDynamic, 1, 3, true},
		{"loads.sun_difference", l.SunDifference, 0, 100, true},
		{"basis.min_groove_ratio", b.Basis.MinGrooveRatio, 1, 200, true},
	} {
		if math.IsNaN(x.x) || x.x < 0 || x.x > 0 && (x.x < x.lo || x.x > x.hi) {
			v.fail(at(x.f), "must be zero (default) or lie between %g and %g, got %v", x.lo, x.hi, x.x)
		}
	}
	v.nonNegative(at("loads.construction_load"), float64(l.ConstructionLoad), units.KindPressure)
	switch l.DeckFrom {
	case "", "left", "right":
	default:
		v.fail(at("loads.deck_from"), "unknown bank %q; want left or right", l.DeckFrom)
	}
	if g := b.Basis.GammaGInf; math.IsNaN(g) || g < 0 || g > 0 && (g < 0.5 || g > 20) {
		v.fail(at("basis.gamma_g_inf"), "must be zero (default) or a factor between 0.5 and 20, got %v", g)
	}
	if t := b.Basis.Termination; t != "" {
		if _, ok := cable.TerminationEfficiency(t); !ok {
			v.fail(at("basis.termination"), "unknown termination %q; want one of %s", t, strings.Join(cable.Terminations(), ", "))
		} else if b.Basis.RopeEfficiency > 0 {
			v.fail(at("basis.termination"), "give either termination or rope_efficiency, not both")
		}
	}
	if g := b.Walkway.GradientLimit; g != nil {
		if !(*g > 0) || math.IsInf(*g, 0) || *g > 10 {
			v.fail(at("walkway.gradient_limit"), "must be a positive gradient, rise over run (0.25 for 1:4), up to 10; got %v", *g)
		}
	}
	for i, g := range b.Ropes {
		f := fmt.Sprintf("ropes[%d]", i)
		if s := g.Sharing; s != nil {
			if !(*s >= 1) || math.IsInf(*s, 0) || *s > float64(max(g.Count, 1)) {
				v.fail(path{f, ".sharing"}, "the most loaded rope carries at least an equal share: want a factor from 1 to the rope count %d, got %v", g.Count, *s)
			}
		}
		if c := g.ConstructionalStretch; c != nil {
			if !(*c >= 0) || *c > maxConstructionalStretch {
				v.fail(path{f, ".constructional_stretch"}, "must be a strain from 0 (pre-stretched rope) to %g, got %v", maxConstructionalStretch, *c)
			}
		}
	}
	for _, bank := range []struct {
		f string
		s SaddleSpec
	}{{"banks.left.tower.saddle.groove_diameter", b.Banks.Left.Tower.Saddle}, {"banks.right.tower.saddle.groove_diameter", b.Banks.Right.Tower.Saddle}} {
		v.nonNegative(at(bank.f), float64(bank.s.GrooveDiameter), units.KindLength)
	}
	known := b.defaultNames()
	for i, o := range l.Omit {
		found := false
		for _, k := range known {
			if strings.EqualFold(strings.TrimSpace(o), k) {
				found = true
			}
		}
		if !found {
			v.fail(at(fmt.Sprintf("loads.omit[%d]", i)), "no default case or family is named %q; the names are %s", o, quoteAll(known))
		}
	}
	names := map[string]bool{}
	for _, k := range known {
		names[strings.ToLower(k)] = true
	}
	names[casePermanent] = true
	for i, c := range l.Cases {
		b.validateCaseSpec(v, fmt.Sprintf("loads.cases[%d]", i), c, names)
	}
}

// maxConstructionalStretch bounds the constructional stretch: new
// six-strand rope takes 0.25–0.5 % (from memory); beyond 2 % a rope is not
// a structural rope (common practice).
const maxConstructionalStretch = 0.02

// validateCaseSpec checks one of the description's own cases; names holds
// the case names taken so far, lower case.
func (b Bridge) validateCaseSpec(v *validator, f string, c CaseSpec, names map[string]bool) {
	name := strings.TrimSpace(c.Name)
	if name == "" {
		v.fail(path{f, ".name"}, "is missing: name the case as the report should")
	} else if names[strings.ToLower(name)] {
		v.fail(path{f, ".name"}, "%q is already the name of a case", name)
	}
	names[strings.ToLower(name)] = true
	keys := make([]string, 0, len(c.Actions))
	for k := range c.Actions {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	for _, k := range keys {
		x := c.Actions[k]
		known := false
		for _, a := range caseActions {
			known = known || k == a
		}
		switch {
		case !known:
			v.fail(path{f, ".actions." + k}, "unknown action %q; the actions are %s (the permanent load is always present)", k, quoteAll(caseActions))
		case math.IsNaN(x) || x < 0 || x > 10:
			v.fail(path{f, ".actions." + k}, "combination factor must lie between 0 and 10, got %v", x)
		}
	}
	_, wind := c.Actions["wind"]
	_, lift := c.Actions["lift"]
	if wind && lift {
		v.fail(path{f, ".actions"}, "give wind or lift, not both: lift is the wind with its upward force on the walkway")
	}
	if (wind || lift) && !(b.wind() > 0) {
		v.fail(path{f, ".actions"}, "the case has wind but the climate gives no wind_speed or wind_pressure")
	}
	if _, crowd := c.Actions["crowd"]; !crowd && !c.Crowd.Empty() {
		v.fail(path{f, ".crowd"}, "places a crowd the actions do not list; add \"crowd\" to actions")
	}
	if c.Crowd != (Stretch{}) {
		if !(c.Crowd.From >= 0 && c.Crowd.To > c.Crowd.From && c.Crowd.To <= b.Site.Span) {
			v.fail(path{f, ".crowd"}, "must be a stretch within the span, 0 <= from < to <= %s; got %s to %s", b.Site.Span, c.Crowd.From, c.Crowd.To)
		}
	}
	for _, t := range []struct {
		f string
		t units.Temperature
	}{{".temperature", c.Temperature}, {".backstay_temperature", c.BackstayTemperature}} {
		if t.t != 0 && !(t.t >= minTemperature && t.t <= maxTemperature) {
			v.fail(path{f, t.f}, "%s is outside %s to %s", t.t, minTemperature, maxTemperature)
		}
	}
	switch c.Situation {
	case "", "persistent", "accidental":
	default:
		v.fail(path{f, ".situation"}, "unknown situation %q; want persistent or accidental", c.Situation)
	}
}

func quoteAll(names []string) string {
	q := make([]string, len(names))
	for i, n := range names {
		q[i] = fmt.Sprintf("%q", n)
	}
	return strings.Join(q, ", ")
}
