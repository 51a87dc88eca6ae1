package sagspan

import (
	"fmt"
	"image/color"
	"io"
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"

	"github.com/sagspan/sagspan/units"
)

// Colours of the drawing: plain ones, chosen for contrast on white.
var (
	colourGround   = color.RGBA{R: 140, G: 100, B: 60, A: 255}
	colourConcrete = color.RGBA{R: 90, G: 90, B: 90, A: 255}
	colourRope     = color.RGBA{A: 255}
	colourLoaded   = color.RGBA{R: 200, G: 30, B: 30, A: 255}
	colourWater    = color.RGBA{R: 30, G: 90, B: 200, A: 255}
)

// lowestCase returns the index of the service case with the lowest walkway.
func (a *Analysis) lowestCase(m *model) int {
	best, low := 0, units.Length(math.Inf(1))
	for i, cs := range a.Service {
		if z, _ := m.walkwayLow(cs); z < low {
			best, low = i, z
		}
	}
	return best
}

// WriteSVG draws the elevation of the bridge as SVG: ground, towers and
// footings, backstays, anchors, the design flood and freeboard, the ropes
// under permanent load and under the case that brings the walkway lowest,
// and the lowest point. The vertical scale is exaggerated to fit.
func (a *Analysis) WriteSVG(w io.Writer) error {
	p, err := a.elevation()
	if err != nil {
		return err
	}
	wt, err := p.WriterTo(28*vg.Centimeter, 12*vg.Centimeter, "svg")
	if err != nil {
		return fmt.Errorf("sagspan: drawing: %w", err)
	}
	_, err = wt.WriteTo(w)
	return err
}

// elevation builds the plot WriteSVG renders.
func (a *Analysis) elevation() (*plot.Plot, error) {
	m, err := newModel(a.Bridge)
	if err != nil {
		return nil, err
	}
	b := a.Bridge
	p := plot.New()
	p.Title.Text = b.Name + " (elevation; supports, never replaces, an engineer's design)"
	p.X.Label.Text = "x from the left saddle (m)"
	p.Y.Label.Text = "elevation (m)"
	p.Legend.Left = true

	z0 := float64(b.Site.LeftSaddle)
	addLine := func(pts plotter.XYs, c color.Color, width vg.Length, dashed bool, label string) error {
		l, err := plotter.NewLine(pts)
		if err != nil {
			return err
		}
		l.Color, l.Width = c, width
		if dashed {
			l.Dashes = []vg.Length{vg.Points(6), vg.Points(3)}
		}
		p.Add(l)
		if label != "" {
			p.Legend.Add(label, l)
		}
		return nil
	}

	if len(b.Site.Ground) > 1 {
		var pts plotter.XYs
		for _, g := range b.Site.Ground {
			pts = append(pts, plotter.XY{X: float64(g.X), Y: float64(g.Z)})
		}
		if err := addLine(pts, colourGround, vg.Points(1.5), false, "ground"); err != nil {
			return nil, err
		}
	}

	xmin, xmax := 0.0, float64(b.Site.Span)
	for side := Left; side <= Right; side++ {
		bank := m.bank(side)
		dir, xs, zs := 1.0, 0.0, z0
		if side == Right {
			dir, xs, zs = -1, float64(b.Site.Span), z0+float64(b.Site.Rise)
		}
		t := bank.Tower
		top := 0.0
		for _, g := range m.groups {
			top = math.Max(top, float64(g.Offset))
		}
		base := zs - float64(t.Height)
		half := float64(t.Depth) / 2
		col := plotter.XYs{{X: xs - half, Y: base}, {X: xs - half, Y: zs + top}, {X: xs + half, Y: zs + top}, {X: xs + half, Y: base}}
		ft := t.Footing
		fc := xs + dir*float64(ft.ColumnOffset)
		fl := float64(ft.Length) / 2
		foot := plotter.XYs{{X: fc - fl, Y: base}, {X: fc + fl, Y: base}, {X: fc + fl, Y: base - float64(ft.Thickness)}, {X: fc - fl, Y: base - float64(ft.Thickness)}, {X: fc - fl, Y: base}}
		label := ""
		if side == Left {
			label = "towers, footings, anchors"
		}
		if err := addLine(col, colourConcrete, vg.Points(1.5), false, label); err != nil {
			return nil, err
		}
		if err := addLine(foot, colourConcrete, vg.Points(1.5), false, ""); err != nil {
			return nil, err
		}
		ax := xs - dir*float64(bank.Backstay.Horizontal)
		az := zs - float64(bank.Backstay.Drop)
		for _, g := range m.groups {
			stay := plotter.XYs{{X: xs, Y: zs + float64(g.Offset)}, {X: ax, Y: az}}
			if err := addLine(stay, colourRope, vg.Points(1), false, ""); err != nil {
				return nil, err
			}
		}
		if an := bank.Anchor; an.Type != "rock" {
			attachX, attachZ := an.AttachX, an.AttachZ
			if attachX == 0 {
				attachX = an.Length / 2
			}
			if attachZ == 0 {
				attachZ = an.Height / 3
			}
			back := ax - dir*float64(attachX)
			front := back + dir*float64(an.Length)
			bz := az - float64(attachZ)
			blk := plotter.XYs{{X: back, Y: bz}, {X: front, Y: bz}, {X: front, Y: bz + float64(an.Height)}, {X: back, Y: bz + float64(an.Height)}, {X: back, Y: bz}}
			if err := addLine(blk, colourConcrete, vg.Points(1.5), false, ""); err != nil {
				return nil, err
			}
			xmin, xmax = math.Min(xmin, math.Min(back, front)), math.Max(xmax, math.Max(back, front))
		}
		xmin, xmax = math.Min(xmin, ax), math.Max(xmax, ax)
	}

	flood := float64(b.Site.Flood.Z)
	if b.Site.Flood.None {
		// no flood to draw
	} else if err := addLine(plotter.XYs{{X: xmin, Y: flood}, {X: xmax, Y: flood}}, colourWater, vg.Points(1.2), false, "design flood"); err != nil {
		return nil, err
	}
	if b.Site.Freeboard > 0 && !b.Site.Flood.None {
		fb := flood + float64(b.Site.Freeboard)
		if err := addLine(plotter.XYs{{X: 0, Y: fb}, {X: float64(b.Site.Span), Y: fb}}, colourWater, vg.Points(0.8), true, "flood + freeboard"); err != nil {
			return nil, err
		}
	}

	low := a.lowestCase(m)
	rope := func(cs CaseState, c color.Color, dashed bool, label string) error {
		for i, g := range m.groups {
			gs := cs.Groups[i]
			var pts plotter.XYs
			const n = 60
			for k := 0; k <= n; k++ {
				x := float64(b.Site.Span) * float64(k) / n
				pts = append(pts, plotter.XY{X: x, Y: z0 + float64(g.Offset) + float64(gs.shape.Z(units.Length(x)))})
			}
			l := ""
			if i == 0 {
				l = label
			}
			width := vg.Points(1.5)
			if g.Role != RoleWalkway {
				width = vg.Points(0.8)
			}
			if err := addLine(pts, c, width, dashed, l); err != nil {
				return err
			}
		}
		return nil
	}
	if err := rope(a.Service[0], colourRope, false, "ropes, permanent"); err != nil {
		return nil, err
	}
	if low != 0 {
		if err := rope(a.Service[low], colourLoaded, true, "ropes, "+a.Service[low].Case.Name); err != nil {
			return nil, err
		}
	}
	soffit, x := m.walkwayLow(a.Service[low])
	sc, err := plotter.NewScatter(plotter.XYs{{X: float64(x), Y: float64(soffit)}})
	if err != nil {
		return nil, err
	}
	sc.GlyphStyle.Color = colourLoaded
	sc.GlyphStyle.Shape = draw.TriangleGlyph{}
	sc.GlyphStyle.Radius = vg.Points(4)
	p.Add(sc)
	p.Legend.Add(fmt.Sprintf("lowest walkway underside %.2f m", float64(soffit)), sc)
	p.Add(plotter.NewGrid())
	return p, nil
}
