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
		x, z := gs.LowX, gs.LowZ+g.Offset
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
		if site.Flood.None {
			out.add(check.Record("bridge.clearance", "Walkway underside above design flood", units.KindLength, float64(soffit)).
				For("walkway", cs.Case.Name).
				WithBasis("elevation of the lowest walkway underside, characteristic loads (common practice)").
				WithValues(
					check.Of("z_w", "elevation of the lowest walkway underside", soffit),
					check.Of("x_w", "where it lies, from the left saddle", x),
				).
				WithNote("nothing to check: the description declares no design flood (site.flood_elevation \"none\")"))
			continue
		}
		clear := soffit - site.Flood.Z
		r := check.Compare("bridge.clearance", "Walkway underside above design flood", units.KindLength,
			float64(site.Freeboard), float64(clear)).
			For("walkway", cs.Case.Name).
			WithBasis("clearance of the lowest walkway underside above the design flood, characteristic loads; in wind the sag in the swung plane is taken as vertical, which is conservative (common practice)").
			WithValues(
				check.Of("z_w", "elevation of the lowest walkway underside", soffit),
				check.Of("x_w", "where it lies, from the left saddle", x),
				check.Of("z_f", "design flood elevation", site.Flood.Z),
				check.Of("c", "clearance above the flood", clear),
			)
		if clear <= 0 {
			r.Status, r.Ratio = check.Fail, math.Inf(1)
			r = r.WithNote("the walkway is at or below the design flood")
		}
		out.add(r)
	}
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
// model: the bare rope (its own weight) over the saddles as the chain's
// reference state has it (free to render over fixed saddles, whatever
// their groove does in service, since the reference state has the tension
// continuous there; clamped on sliding and roller saddles, which move),
// span and backstays one rope fastened at the anchors, new
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
	defer m.erecting()()
	for i, g := range m.groups {
		table := ErectionTable{Group: g.Name, ConstructionalStretch: g.constructionalStretch(), Hold: m.erectionHold(g)}
		var start units.Force
		var shear float64
		for _, t := range temps {
			in := m.bareInput(i, t)
			in.start, in.startShear = start, shear
			gs, err := m.groupState(i, in)
			if err != nil {
				return fieldErr("ropes", "erection table of %s at %s: %w; check its sag, rope and the climate's temperatures", g.Name, t, err)
			}
			start, shear = gs.H, gs.shear
			table.Rows = append(table.Rows, cable.ErectionRow{Temperature: t, Sag: gs.Sag, H: gs.H})
		}
		a.Erection = append(a.Erection, table)
	}
	return nil
}

// erecting sets the grooves of the erection and the construction stage and
// returns what restores the variant's. The chain's reference state has each
// rope's tension continuous over its saddle: on a fixed saddle the rope
// renders freely while it is set and while the walkway is hung, whatever
// holds it in service (clamped, gripping), and is clamped after. Sliding
// and roller saddles carry the rope clamped on them as in service.
func (m *model) erecting() (restore func()) {
	service := m.grooves
	for side := Left; side <= Right; side++ {
		if saddleKind(m.bank(side).Tower.Saddle) == tower.Fixed {
			m.grooves[side] = tower.FreeGroove
		}
	}
	return func() { m.grooves = service }
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
// erection sag, saddle by saddle, as the table's rope model has it.
func (m *model) erectionHold(g group) string {
	var saddles []string
	clampAfter := false
	for side := Left; side <= Right; side++ {
		spec := m.bank(side).Tower.Saddle
		switch saddleKind(spec) {
		case tower.Sliding:
			saddles = append(saddles, "clamped on the "+side.String()+" saddle at their mark (where it sits on them in the finished bridge), the saddle free on its plate (it stays or slides as in service)")
		case tower.Roller:
			saddles = append(saddles, "clamped on the "+side.String()+" saddle at their mark (where it sits on them in the finished bridge), the saddle free on its rollers")
		default:
			held := ""
			if grooveHolds(spec) {
				held = ", its groove's clamps or grip released"
				clampAfter = true
			}
			saddles = append(saddles, "free to render over the "+side.String()+" saddle"+held+", the saddle bolted down")
		}
	}
	s := fmt.Sprintf("Measure the sag at midspan below the chord between the saddle grooves, the ropes bare, fastened at both anchors at their design positions, "+
		"%s and %s; the sag then fixes the length of rope in the span.", saddles[0], saddles[1])
	if clampAfter {
		s += " Leave the ropes free to render over the fixed saddles while the walkway is hung, and clamp them only after the walkway is complete: the design sag is that of ropes whose tension is continuous over the saddles under the walkway's weight."
	}
	if e := g.constructionalStretch(); e > 0 {
		s += fmt.Sprintf(" The sags are for new rope that will stretch %.2f %% more as its strands bed in under the walkway: it hangs higher now and settles to the design sag; for pre-stretched rope give a constructional stretch of 0.", 100*e)
	}
	return s
}

// grooveHolds reports whether a fixed saddle's groove holds the rope in
// service (clamped or gripping), or may (not known).
func grooveHolds(s SaddleSpec) bool { return s.Groove != "free" }
