package sagspan

import (
	"errors"
	"fmt"
	"image/color"
	"io"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgsvg"

	"github.com/sagspan/sagspan/vibration"
)

// drawnModes is how many of the first modes the drawing shows.
const drawnModes = 6

// Colours of the mode drawing: the displaced walkway, its second edge in
// a torsional mode, and the walkway at rest.
var (
	colourMode     = color.RGBA{R: 30, G: 90, B: 200, A: 255}
	colourModeEdge = color.RGBA{R: 200, G: 30, B: 30, A: 255}
	colourRest     = color.RGBA{R: 150, G: 150, B: 150, A: 255}
)

// WriteModesSVG draws the first six modes of the comfort analysis as SVG,
// one panel each: the walkway's displacement along the span in the mode's
// direction, in the scaling of its modal mass (largest displacement of the
// walking surface 1): up for vertical modes, across for lateral ones,
// along for longitudinal ones, up at both edges for torsional ones; a
// local rope mode shows the rope that moves most. It returns an error when
// the modal analysis was switched off.
func (a *Analysis) WriteModesSVG(w io.Writer) error {
	c := a.Comfort
	if c == nil || len(c.Modal.Modes) == 0 {
		return errors.New("sagspan: mode drawing: no modes; the modal analysis was switched off")
	}
	n := min(drawnModes, len(c.Modal.Modes))
	const cols = 2
	rows := (n + cols - 1) / cols
	plots := make([][]*plot.Plot, rows)
	for j := range plots {
		plots[j] = make([]*plot.Plot, cols)
	}
	for i := range n {
		p, err := c.modePlot(i)
		if err != nil {
			return fmt.Errorf("sagspan: mode drawing: %w", err)
		}
		plots[i/cols][i%cols] = p
	}
	img := vgsvg.New(28*vg.Centimeter, vg.Length(rows)*7*vg.Centimeter)
	drawTiles(plots, draw.New(img))
	_, err := img.WriteTo(w)
	return err
}

// drawTiles draws the panels on dc, aligned in their rows and columns.
func drawTiles(plots [][]*plot.Plot, dc draw.Canvas) {
	rows, cols := len(plots), len(plots[0])
	tiles := draw.Tiles{Rows: rows, Cols: cols, PadX: vg.Millimeter * 4, PadY: vg.Millimeter * 4,
		PadTop: vg.Millimeter * 2, PadBottom: vg.Millimeter * 2, PadLeft: vg.Millimeter * 2, PadRight: vg.Millimeter * 2}
	canvases := plot.Align(plots, tiles, dc)
	for j := range plots {
		for i, p := range plots[j] {
			if p != nil {
				p.Draw(canvases[j][i])
			}
		}
	}
}

// modePlot draws mode i.
func (c *Comfort) modePlot(i int) (*plot.Plot, error) {
	md := c.Modal.Modes[i]
	p := plot.New()
	p.Title.Text = fmt.Sprintf("Mode %d: %s, %s", i+1, md.Label(), md.Frequency)
	p.X.Label.Text = "x from the left saddle (m)"
	p.Legend.Top = true
	p.Legend.Left = true
	xs := c.Modal.Stations
	line := func(value func(k int) float64, col color.Color, dashed bool, label string) error {
		pts := make(plotter.XYs, len(xs))
		for k, x := range xs {
			pts[k] = plotter.XY{X: float64(x), Y: value(k)}
		}
		l, err := plotter.NewLine(pts)
		if err != nil {
			return err
		}
		l.Color, l.Width = col, vg.Points(1.5)
		if dashed {
			l.Dashes = []vg.Length{vg.Points(5), vg.Points(3)}
			l.Width = vg.Points(0.8)
		}
		p.Add(l)
		if label != "" {
			p.Legend.Add(label, l)
		}
		return nil
	}
	if err := line(func(int) float64 { return 0 }, colourRest, true, ""); err != nil {
		return nil, err
	}
	half := float64(c.Modal.Width) / 2
	walk := md.Walkway
	var err error
	switch {
	case md.Kind == vibration.Local || walk == nil:
		r := c.liveliestRope(i)
		p.Y.Label.Text = "rope displacement (scaled)"
		err = line(func(k int) float64 { return float64(md.Ropes[r][k].W) }, colourMode, false, "up")
		if err == nil {
			err = line(func(k int) float64 { return float64(md.Ropes[r][k].V) }, colourModeEdge, false, "across")
		}
	case md.Kind == vibration.Lateral:
		p.Y.Label.Text = "across (scaled)"
		err = line(func(k int) float64 { return float64(walk[k].V) }, colourMode, false, "walkway, across")
	case md.Kind == vibration.Longitudinal:
		p.Y.Label.Text = "along (scaled)"
		err = line(func(k int) float64 { return float64(walk[k].U) }, colourMode, false, "walkway, along")
	case md.Kind == vibration.Torsional:
		p.Y.Label.Text = "up (scaled)"
		err = line(func(k int) float64 { return float64(walk[k].W) + float64(walk[k].Roll)*half }, colourMode, false, "left edge")
		if err == nil {
			err = line(func(k int) float64 { return float64(walk[k].W) - float64(walk[k].Roll)*half }, colourModeEdge, false, "right edge")
		}
	default:
		p.Y.Label.Text = "up (scaled)"
		err = line(func(k int) float64 { return float64(walk[k].W) }, colourMode, false, "walkway, up")
		if err == nil {
			err = line(func(k int) float64 { return float64(walk[k].U) }, colourModeEdge, true, "walkway, along")
		}
	}
	if err != nil {
		return nil, err
	}
	p.Y.Min, p.Y.Max = -1.1, 1.6 // room for the legend above the shape
	p.Add(plotter.NewGrid())
	return p, nil
}

// liveliestRope returns the rope that moves most in mode i.
func (c *Comfort) liveliestRope(i int) int {
	best, big := 0, -1.0
	for r, rope := range c.Modal.Modes[i].Ropes {
		var e float64
		for _, d := range rope {
			e += float64(d.U*d.U + d.V*d.V + d.W*d.W)
		}
		if e > big {
			best, big = r, e
		}
	}
	return best
}
