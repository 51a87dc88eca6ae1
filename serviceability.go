package sagspan

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
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
		clear := soffit - site.Flood
		r := check.Compare("bridge.clearance", "Walkway underside above design flood", units.KindLength,
			float64(site.Freeboard), float64(clear)).
			For("walkway", cs.Case.Name).
			WithBasis("clearance of the lowest walkway underside above the design flood, characteristic loads; in wind the sag in the swung plane is taken as vertical, which is conservative (common practice)").
			WithValues(
				check.Of("z_w", "elevation of the lowest walkway underside", soffit),
				check.Of("x_w", "where it lies, from the left saddle", x),
				check.Of("z_f", "design flood elevation", site.Flood),
				check.Of("c", "clearance above the flood", clear),
			)
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
	// The bridge hangs at the sag its total weight and tension give,
	// w l²/(8H): the weighted harmonic mean of the groups' sags.
	mass := units.MassPerLength(float64(w) / units.StandardGravity)
	modes, err := cable.Frequencies(m.span, h, mass, ea)
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
	for _, g := range m.groups {
		dead := cable.Load{Uniform: units.LoadPerLength(g.share) * m.dead}
		rows, err := cable.ErectionTable(m.span, g.elastic, g.self, dead, g.Sag, c.Reference, temps)
		if err != nil {
			return fmt.Errorf("sagspan: erection table of %s: %w", g.Name, err)
		}
		a.Erection = append(a.Erection, ErectionTable{Group: g.Name, Rows: rows})
	}
	return nil
}
