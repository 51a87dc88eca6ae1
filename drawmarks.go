package sagspan

import (
	"fmt"
	"image/color"
	"math"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// The marks the drawings' layers place on a plot besides lines and
// glyphs: level ticks, notes, dimension lines, dashed segments, arrow
// heads and callouts.

// levelTicks marks an axis every 1, 2 or 5 × 10ⁿ metres, some 12 to 25
// ticks, labelling every other one at least, so that levels can be read.
type levelTicks struct{}

// Ticks returns the ticks between min and max.
func (levelTicks) Ticks(min, max float64) []plot.Tick {
	span := max - min
	if !(span > 0) {
		return nil
	}
	step := math.Pow(10, math.Floor(math.Log10(span/15)))
	for _, m := range []float64{1, 2, 5, 10} {
		if span/(m*step) <= 25 {
			step *= m
			break
		}
	}
	label := 2 * step
	if span/step <= 18 {
		label = step
	}
	var ticks []plot.Tick
	for k := math.Ceil(min/step - 1e-9); k <= math.Floor(max/step+1e-9); k++ {
		x := math.Max(min, math.Min(max, k*step))
		t := plot.Tick{Value: x}
		if r := math.Mod(math.Abs(x)+1e-9*label, label); r < 1e-6*label {
			t.Label = strings.TrimSuffix(strings.TrimRight(fmt.Sprintf("%.2f", x), "0"), ".")
			if t.Label == "-0" {
				t.Label = "0"
			}
		}
		ticks = append(ticks, t)
	}
	return ticks
}

// note is a text placed at a data point.
type note struct {
	x, y   float64
	text   string
	style  text.Style
	dx, dy vg.Length
}

// Plot draws the note.
func (n *note) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	c.FillText(n.style, vg.Point{X: tx(n.x) + n.dx, Y: ty(n.y) + n.dy}, n.text)
}

// dimension is a dimension line with ticks at its ends and its text
// beside it.
type dimension struct {
	a, b       plotter.XY
	text       string
	style      text.Style
	horizontal bool
}

// Plot draws the dimension.
func (d *dimension) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	sty := draw.LineStyle{Color: d.style.Color, Width: vg.Points(0.7)}
	a := vg.Point{X: tx(d.a.X), Y: ty(d.a.Y)}
	b := vg.Point{X: tx(d.b.X), Y: ty(d.b.Y)}
	c.StrokeLine2(sty, a.X, a.Y, b.X, b.Y)
	t := vg.Points(3)
	for _, e := range []vg.Point{a, b} { // oblique ticks, the draughtsman's mark
		c.StrokeLine2(sty, e.X-t, e.Y-t, e.X+t, e.Y+t)
	}
	st := d.style
	mid := vg.Point{X: (a.X + b.X) / 2, Y: (a.Y + b.Y) / 2}
	if d.horizontal {
		mid.Y += vg.Points(7)
	} else {
		// Along a vertical dimension, its text reads upwards beside it.
		st.Rotation = math.Pi / 2
		mid.X -= vg.Points(6)
	}
	c.FillText(st, mid, d.text)
}

// dashedSegment is a thin dashed line, such as the chord.
type dashedSegment struct {
	a, b plotter.XY
	c    color.Color
}

// Plot draws the segment.
func (s *dashedSegment) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	sty := draw.LineStyle{Color: s.c, Width: vg.Points(0.6), Dashes: []vg.Length{vg.Points(2), vg.Points(2)}}
	c.StrokeLine2(sty, tx(s.a.X), ty(s.a.Y), tx(s.b.X), ty(s.b.Y))
}

// arrowHead draws the head of an arrow at at, coming from from.
type arrowHead struct {
	at, from plotter.XY
	c        color.Color
}

// Plot draws the arrow head.
func (h *arrowHead) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	a := vg.Point{X: tx(h.at.X), Y: ty(h.at.Y)}
	f := vg.Point{X: tx(h.from.X), Y: ty(h.from.Y)}
	dx, dy := float64(a.X-f.X), float64(a.Y-f.Y)
	n := math.Hypot(dx, dy)
	if n == 0 {
		return
	}
	dx, dy = dx/n, dy/n
	const l, w = 7.0, 3.0
	pts := []vg.Point{a,
		{X: a.X - vg.Length(l*dx-w*dy), Y: a.Y - vg.Length(l*dy+w*dx)},
		{X: a.X - vg.Length(l*dx+w*dy), Y: a.Y - vg.Length(l*dy-w*dx)}}
	c.FillPolygon(h.c, pts)
}

// callouts are labels stacked from a top corner of the drawing, each
// joined by a thin leader line to the point it names.
type callouts struct {
	right   bool
	style   text.Style
	entries []callout
}

type callout struct {
	x, y float64
	text string
	c    color.Color
}

func (cs *callouts) add(x, y float64, s string, c color.Color) {
	cs.entries = append(cs.entries, callout{x, y, s, c})
}

// Plot draws the labels and their leader lines.
func (cs *callouts) Plot(c draw.Canvas, p *plot.Plot) {
	tx, ty := p.Transforms(&c)
	sty := cs.style
	sty.XAlign = draw.XLeft
	line := draw.LineStyle{Color: color.Gray{Y: 120}, Width: vg.Points(0.4), Dashes: []vg.Length{vg.Points(1.5), vg.Points(1.5)}}
	for i, e := range cs.entries {
		sty.Color = e.c
		w := sty.Width(e.text)
		y := c.Max.Y - vg.Points(8) - vg.Length(i)*vg.Points(10)
		x := c.Min.X + vg.Points(6)
		end := x + w + vg.Points(2)
		if cs.right {
			sty.XAlign = draw.XRight
			x = c.Max.X - vg.Points(6)
			end = x - w - vg.Points(2)
		}
		c.FillText(sty, vg.Point{X: x, Y: y}, e.text)
		c.StrokeLine2(line, end, y, tx(e.x), ty(e.y))
	}
}
