package sagspan

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

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
	r := check.Record(id, title, units.KindFrequency, float64(f)).For("span", "permanent").WithBasis(comfortBasis)
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

// maxErectionRows bounds the erection table.
const maxErectionRows = 1000

// defaultConstructionalStretch is the permanent strain new six-strand rope
// takes as its strands bed in under the first loads: 0.25 %, the lower end
// of the 0.25–0.5 % usual for six-strand rope (common practice, from
// memory); pre-stretched rope takes almost none (give 0). It is the default
// of groups that carry the walkway; a group that carries only its own
// weight is too lightly loaded to bed in and defaults to none.
const defaultConstructionalStretch = 0.0025

// constructionalStretch returns the group's constructional stretch.
func (g group) constructionalStretch() float64 {
	if g.ConstructionalStretch != nil {
		return *g.ConstructionalStretch
	}
	if g.share > 0 {
		return defaultConstructionalStretch
	}
	return 0
}

// erection builds each group's erection-sag table from the chain's own rope
// model: the bare rope (its own weight) over the saddles as the chain
// models them, span and backstays one rope fastened at the anchors, new
// rope shorter by its constructional stretch, at every temperature of the
// site's range. Hanging the walkway on a rope set to a row's sag at the
// row's temperature, the rope stretched by its constructional stretch,
// brings it to the design sag at the reference temperature.
func (m *model) erection(a *Analysis, opts *Options) error {
	step := orDefault(opts.ErectionStep, 5)
	c := m.b.Climate
	if rows := float64(c.Hottest-c.Coldest) / step; rows > maxErectionRows || math.IsNaN(step) {
		return fmt.Errorf("sagspan: erection step %v K gives %.0f rows; give a step of at least %.2f K", step, rows, float64(c.Hottest-c.Coldest)/maxErectionRows)
	}
	var temps []units.Temperature
	for t := float64(c.Coldest); t <= float64(c.Hottest)+1e-9; t += step {
		temps = append(temps, units.Temperature(t))
	}
	for i, g := range m.groups {
		table := ErectionTable{Group: g.Name, ConstructionalStretch: g.constructionalStretch(), Hold: m.erectionHold(g)}
		feed := 0.0
		for _, t := range temps {
			in := m.bareInput(i, t)
			in.feed = feed
			gs, err := m.groupState(i, in)
			if err != nil {
				return fmt.Errorf("sagspan: erection table of %s at %s: %w", g.Name, t, err)
			}
			feed = gs.feed
			table.Rows = append(table.Rows, cable.ErectionRow{Temperature: t, Sag: gs.Sag, H: gs.H})
		}
		a.Erection = append(a.Erection, table)
	}
	return nil
}

// bareInput returns the solve input of group i's new rope, bare, at rope
// temperature t: its own weight only, every unstretched length shorter by
// the constructional stretch still to come.
func (m *model) bareInput(i int, t units.Temperature) solveInput {
	g := m.groups[i]
	dt := float64(t - m.b.Climate.Reference)
	return solveInput{load: cable.Load{Uniform: g.self}, dt: dt, dtBackstay: dt, intact: 1,
		scale: 1 / (1 + g.constructionalStretch())}
}

// erectionHold says what the crew holds fixed while setting a group to its
// erection sag.
func (m *model) erectionHold(g group) string {
	var saddles []string
	for side := Left; side <= Right; side++ {
		switch saddleKind(m.bank(side).Tower.Saddle) {
		case tower.Sliding:
			saddles = append(saddles, "the "+side.String()+" saddle free on its plate (it stays or slides as in service)")
		case tower.Roller:
			saddles = append(saddles, "the "+side.String()+" saddle free on its rollers")
		default:
			saddles = append(saddles, "the "+side.String()+" saddle bolted down")
		}
	}
	s := fmt.Sprintf("Measure the sag at midspan below the chord between the saddle grooves, the ropes bare and free to render over both saddles, "+
		"fastened at both anchors at their design positions, %s and %s; the sag then fixes the length of rope between the anchors.",
		saddles[0], saddles[1])
	if e := g.constructionalStretch(); e > 0 {
		s += fmt.Sprintf(" The sags are for new rope that will stretch %.2f %% more as its strands bed in under the walkway: it hangs higher now and settles to the design sag; for pre-stretched rope give a constructional stretch of 0.", 100*e)
	}
	return s
}
