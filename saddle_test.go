package sagspan

import (
	"fmt"
	"testing"

	"github.com/sagspan/sagspan/units"
)

// TestGroupStateStartIndependent checks that a group's state does not
// depend on where its iteration starts: from the span alone (no start),
// from half and from twice the tension, and from a nearby state, every
// saddle behaviour gives one H and one set of backstay tensions to 1e-12
// (the solve converges to rounding, so that warm starts and the state
// cache never change a number the report shows).
func TestGroupStateStartIndependent(t *testing.T) {
	for _, saddles := range []struct {
		name         string
		kind, groove string
	}{
		{"demo: sliding and roller", "", ""},
		{"fixed, free groove", "fixed", "free"},
		{"fixed, friction groove", "fixed", "friction"},
		{"fixed, clamped", "fixed", "clamped"},
	} {
		b := Demo()
		if saddles.kind != "" {
			for _, bank := range []*Bank{&b.Banks.Left, &b.Banks.Right} {
				bank.Tower.Saddle.Kind, bank.Tower.Saddle.Groove = saddles.kind, saddles.groove
				bank.Tower.Saddle.Friction = 0
				if saddles.groove == "friction" {
					bank.Tower.Saddle.GrooveFriction = 0.1
				}
			}
		}
		m, err := newModel(b)
		if err != nil {
			t.Fatalf("%s: %v", saddles.name, err)
		}
		m.grooves = m.variants()[0].grooves
		span := b.Site.Span
		fam := b.LoadedLengths()[1] // the crowd at the hottest rope
		for _, lc := range []LoadCase{m.characteristic(b.Cases()[0]), m.designCase(fam.at(FromLeft, 0.3*span, span)),
			m.characteristic(fam.at(Central, 0.6*span, span))} {
			for i, g := range m.groups {
				in := m.solveInput(g, lc)
				ref, err := m.solveGroup(i, in)
				if err != nil {
					t.Fatalf("%s, %s, %s: %v", saddles.name, lc.Name, g.Name, err)
				}
				for _, start := range []units.Force{ref.H / 2, 2 * ref.H, ref.H * 1.03} {
					in.start = start
					gs, err := m.solveGroup(i, in)
					if err != nil {
						t.Fatalf("%s, %s, %s from %v: %v", saddles.name, lc.Name, g.Name, start, err)
					}
					what := fmt.Sprintf("%s, %s, %s from %.0f N", saddles.name, lc.Name, g.Name, float64(start))
					near(t, what+": H", float64(gs.H), float64(ref.H), 1e-12)
					for side := Left; side <= Right; side++ {
						near(t, what+": backstay", float64(gs.Backstay[side]), float64(ref.Backstay[side]), 1e-12)
					}
				}
			}
		}
	}
}
