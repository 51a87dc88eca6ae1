package sagspan

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// ropeEfficiency returns the termination efficiency the description gives:
// basis.rope_efficiency, else that of basis.termination, else zero (the
// cable package's default).
func (b Bridge) ropeEfficiency() float64 {
	if b.Basis.RopeEfficiency > 0 {
		return b.Basis.RopeEfficiency
	}
	ke, _ := cable.TerminationEfficiency(b.Basis.Termination)
	return ke
}

// ropeBasis returns the verification basis of rope tension.
func (m *model) ropeBasis() cable.TensionBasis {
	if m.b.partial() {
		return cable.PartialFactor{GammaR: m.b.Basis.GammaR, Ke: m.b.ropeEfficiency()}
	}
	return cable.GlobalFactor{Factor: m.b.Basis.RopeFactor, Ke: m.b.ropeEfficiency()}
}

// sharing returns the group's sharing factor, zero for the default.
func (g group) sharing() float64 {
	if g.Sharing == nil {
		return 0
	}
	return *g.Sharing
}

// ropeChecks adds the tension check of every rope group under one case:
// the service state on the allowable basis, the design state on the
// partial one. In a case with a rope broken, the ropes left in that group
// carry the static tension of the broken state plus the dynamic overshoot
// of the sudden break, loads.break_dynamic times the change per rope
// (ropesInSearch false: the loaded-length search skips groups that carry
// neither crowd nor walkway, whose state no stretch changes).
func (m *model) ropeChecks(out sink, svc, des CaseState, all bool) error {
	st := svc
	if m.b.partial() {
		st = des
	}
	lc := st.Case
	basis := m.ropeBasis()
	for i, g := range m.groups {
		if !all && g.share == 0 {
			continue
		}
		t := st.Groups[i].MaxTension
		n := g.Count
		ks := g.sharing()
		var note string
		var values []check.Value
		if lc.Broken > 0 && lc.BrokenGroup == g.Name && n > lc.Broken {
			in := m.solveInput(g, lc)
			in.intact = 1
			intact, err := m.groupState(i, in)
			if err != nil {
				return fmt.Errorf("sagspan: %s intact, case %q: %w", g.Name, lc.Name, err)
			}
			left := n - lc.Broken
			before := float64(intact.MaxTension) / float64(n)
			after := float64(t) / float64(left)
			k := m.b.breakDynamic()
			per := before + k*(after-before)
			values = append(values,
				check.Of("T_0", "tension of the intact group, same loads", intact.MaxTension),
				check.Of("T_b", "static tension of the ropes left", t),
				check.Of("φ_b", "dynamic factor on the change per rope", units.Ratio(k)))
			t = units.Force(math.Max(per, after) * float64(left))
			n = left
			note = fmt.Sprintf("%d of %d ropes left; each carries its intact share plus %.3g times the static change the break causes (a suddenly applied load on an undamped elastic system); the broken rope's weight stays on the walkway", left, g.Count, k)
			// The sharing factor given for the whole group applies to the
			// ropes left, but no rope can carry more than all of them: a
			// single rope left carries the group alone (k_s = 1).
			if ks > float64(left) {
				ks = float64(left)
				note += fmt.Sprintf("; the sharing factor given, %.3g, exceeds the %d ropes left and is taken as %d", g.sharing(), left, left)
			}
		}
		r, err := cable.Group{Rope: g.rope, Count: n, Sharing: ks, Terse: m.scoring()}.TensionCheck(t, basis)
		if err != nil {
			return fmt.Errorf("sagspan: %s, case %q: %w", g.Name, lc.Name, err)
		}
		if len(values) > 0 {
			r = r.WithValues(values...).WithNote(note)
		}
		out.add(r.For(g.Name, lc.Name))
	}
	return nil
}

// ropeGrades are the usual grades of steel wire rope, the nominal
// tensile strength of its wires (EN 12385-4, from memory).
var ropeGrades = []units.Pressure{1570 * units.Megapascal, 1770 * units.Megapascal, 1960 * units.Megapascal, 2160 * units.Megapascal}

// gradeChecks flags a catalogue rope whose grade is none of the usual
// ones: the catalogue works its strength out from any grade, so a grade
// mistyped (1970 for 1770) would otherwise pass with 11 % more strength.
func (m *model) gradeChecks(out sink) {
	for _, g := range m.groups {
		spec := g.Rope
		if spec.MBF > 0 {
			continue // a rope given directly
		}
		usual := false
		for _, q := range ropeGrades {
			usual = usual || math.Abs(float64(spec.Grade-q)) < 0.5*float64(units.Megapascal)
		}
		if usual {
			continue
		}
		r := check.Record("cable.grade", "Rope grade against the usual grades", units.KindPressure, float64(spec.Grade)).
			For(g.Name, grooveCase).
			WithBasis("the catalogue's breaking force follows from the grade given; the usual grades are 1570, 1770, 1960 and 2160 MPa " +
				"(EN 12385-4, from memory)").
			WithValues(check.Of("R_r", "rope grade given", spec.Grade)).
			WithNote("grade " + spec.Grade.String() + " is none of the usual grades: check it against the maker's certificate " +
				"(a mistyped grade changes the rope's strength in proportion)")
		r.Status = check.Flag
		out.add(r)
	}
}

// grooveCase names the "case" of a check that no load case changes.
const grooveCase = "any load case"

// grooveChecks adds the D/d check of every rope group on each tower's
// saddle; a saddle without a groove diameter gets a flag asking for it.
func (m *model) grooveChecks(out sink) error {
	for side := Left; side <= Right; side++ {
		groove := m.bank(side).Tower.Saddle.GrooveDiameter
		for _, g := range m.groups {
			element := side.String() + " saddle, " + g.Name
			if groove == 0 {
				least := orDefault(m.b.Basis.MinGrooveRatio, cable.DefaultMinGrooveRatio)
				need := least * float64(g.rope.Diameter)
				r := check.Record("cable.saddle_ratio", "Saddle groove diameter to rope diameter, D/d", units.KindLength, need).
					For(element, grooveCase).
					WithBasis("groove diameter against the least D/d for the rope's construction (common practice)").
					WithValues(
						check.Of("d", "rope diameter", g.rope.Diameter),
						check.Of("(D/d)_min", "least ratio", units.Ratio(least)),
						check.Of("D_min", "least groove diameter the rope needs, (D/d)_min d", units.Length(need)),
					).
					WithNote("the groove diameter is not given (banks." + side.String() + ".tower.saddle.groove_diameter): the demand shown is the least groove the rope needs")
				r.Status = check.Flag
				out.add(r)
				continue
			}
			r, err := cable.SaddleRatioCheck(groove, g.rope, m.b.Basis.MinGrooveRatio)
			if err != nil {
				return fmt.Errorf("sagspan: %s: %w", element, err)
			}
			out.add(r.For(element, grooveCase))
		}
	}
	return nil
}
