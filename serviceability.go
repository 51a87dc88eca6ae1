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
		if site.Flood.None {
			out.add(check.Record("bridge.clearance", "Walkway underside above design flood", units.KindLength, float64(soffit)).
				For("walkway", cs.Case.Name).
				WithBasis("elevation of the lowest walkway underside, characteristic loads (common practice)").
				WithNote(fmt.Sprintf("nothing to check: the description declares no design flood (site.flood_elevation \"none\"); lowest underside at x = %s", x)))
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
			return fieldErr("ropes", "erection table of %s: %w; check its sag, rope and the climate's temperatures", g.Name, err)
		}
		a.Erection = append(a.Erection, ErectionTable{Group: g.Name, Rows: rows})
	}
	return nil
}
