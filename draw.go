package sagspan

import (
	"fmt"
	"image/color"
	"io"
	"math"
	"sort"
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgsvg"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// The drawings are built from layers (ground and water, structure, ropes,
// dimensions, annotations), each a function that adds to a view. Every
// view draws the same layers: the elevation along the bridge and the
// section across it at a tower. A failing element is told three ways: red,
// dashed, and labelled "FAIL" with its check.

// Colours of the drawing: plain ones, chosen for contrast on white.
var (
	colourGround   = color.RGBA{R: 140, G: 100, B: 60, A: 255}
	colourConcrete = color.RGBA{R: 90, G: 90, B: 90, A: 255}
	colourRope     = color.RGBA{A: 255}
	colourLoaded   = color.RGBA{R: 30, G: 110, B: 60, A: 255}
	colourFail     = color.RGBA{R: 200, G: 20, B: 20, A: 255}
	colourWater    = color.RGBA{R: 30, G: 90, B: 200, A: 255}
	colourDim      = color.RGBA{R: 70, G: 70, B: 140, A: 255}
)

// Sheet sizes of the views.
const (
	sheetWidth  = 28 * vg.Centimeter
	sheetHeight = 15 * vg.Centimeter
	legendWidth = 6.2 * vg.Centimeter
	footHeight  = 1.3 * vg.Centimeter
)

// drawingCaution is printed under every view.
const drawingCaution = "This drawing supports, and never replaces, the design of a qualified engineer; " +
	"local codes, standards and licensed practice govern. Check every input and every result before anything is built."

// view is one drawing of the bridge under construction.
type view struct {
	a      *Analysis
	m      *model
	p      *plot.Plot
	legend plot.Legend
	// across is set for the section across the bridge at tower side.
	across bool
	side   Side
	// fails holds the failing governing results by element.
	fails map[string][]check.Result
	// low is the service case that brings the walkway lowest.
	low int
	// notes are lines printed under the drawing.
	notes []string
	// callouts are labels stacked in the drawing's upper corners, left
	// bank on the left, right bank on the right, each with a leader line
	// to what it names.
	callouts [2]*callouts
}

// layer adds one kind of thing to a view.
type layer func(v *view) error

// layers are drawn in this order in every view.
var layers = []layer{groundLayer, structureLayer, ropeLayer, dimensionLayer, annotationLayer}

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

func (a *Analysis) newView(across bool, side Side) (*view, error) {
	m, err := newModel(a.Bridge)
	if err != nil {
		return nil, err
	}
	if len(a.Service) == 0 {
		return nil, fmt.Errorf("sagspan: drawing: the analysis has no load cases")
	}
	v := &view{a: a, m: m, p: plot.New(), legend: plot.NewLegend(), across: across, side: side, fails: map[string][]check.Result{}}
	for _, r := range a.Report.Failures() {
		v.fails[r.Element] = append(v.fails[r.Element], r)
	}
	v.low = a.lowestCase(m)
	v.useDrawingFont()
	for side := range v.callouts {
		v.callouts[side] = &callouts{right: side == int(Right), style: v.textStyle(7.5, color.Black)}
	}
	v.legend.TextStyle.Font.Size = vg.Points(8.5)
	v.legend.Top, v.legend.Left = true, true
	for _, l := range layers {
		if err := l(v); err != nil {
			return nil, fmt.Errorf("sagspan: drawing: %w", err)
		}
	}
	return v, nil
}

// WriteSVG draws the elevation of the bridge as SVG: ground and design
// flood with its freeboard; towers, footings and anchors; the ropes under
// permanent load and under the case that brings the walkway lowest, each
// group labelled with its ropes; dimensions (span, rise, sag, tower
// heights, backstay lengths and angles); failing elements in red, dashed
// and labelled; the vertical exaggeration and the caution beneath.
func (a *Analysis) WriteSVG(w io.Writer) error {
	v, err := a.newView(false, Left)
	if err != nil {
		return err
	}
	return v.write(w)
}

// WriteSectionSVG draws the section across the bridge at the tower on the
// given side, at true scale: the column, its footing and the ground, the
// ropes on the saddle, the rope plane swung by wind and the force across
// the bridge it puts on the column, with dimensions.
func (a *Analysis) WriteSectionSVG(w io.Writer, side Side) error {
	v, err := a.newView(true, side)
	if err != nil {
		return err
	}
	return v.write(w)
}

// write fits the scale, then draws the plot, the legend beside it and the
// notes beneath, as SVG.
func (v *view) write(w io.Writer) error {
	c := vgsvg.New(sheetWidth, sheetHeight)
	dc := draw.New(c)
	plotArea := draw.Crop(dc, 0, -legendWidth, footHeight, 0)
	ex := v.fit(plotArea)
	if v.across {
		v.notes = append([]string{"True scale: lengths across and up are drawn alike."}, v.notes...)
	} else {
		v.notes = append([]string{fmt.Sprintf("Vertical scale exaggerated %s× so the sag can be read; lengths and angles are labelled with their true values.", trimFloat(ex))}, v.notes...)
	}
	v.p.Draw(plotArea)
	legendArea := draw.Crop(dc, sheetWidth-legendWidth+vg.Points(8), 0, footHeight, -vg.Points(24))
	v.legend.Draw(legendArea)
	sty := v.textStyle(7.5, color.Black)
	sty.XAlign = draw.XLeft
	for i, n := range append(v.notes, drawingCaution) {
		dc.FillText(sty, vg.Point{X: vg.Points(6), Y: footHeight - vg.Points(10) - vg.Length(i)*vg.Points(9.5)}, n)
	}
	_, err := c.WriteTo(w)
	return err
}

func trimFloat(x float64) string {
	return strings.TrimSuffix(strings.TrimRight(fmt.Sprintf("%.1f", x), "0"), ".")
}

// fit sets the axis ranges so that the drawing fills the plot area with a
// round vertical exaggeration (1 across the bridge), and returns it.
func (v *view) fit(area draw.Canvas) float64 {
	x0, x1, z0, z1 := v.p.X.Min, v.p.X.Max, v.p.Y.Min, v.p.Y.Max
	padX, padZ := 0.04*(x1-x0), 0.08*(z1-z0)+0.5
	x0, x1, z0, z1 = x0-padX, x1+padX, z0-padZ, z1+padZ
	ex := 1.0
	for range 3 { // the axes' widths depend on the ranges; settle them
		v.p.X.Min, v.p.X.Max, v.p.Y.Min, v.p.Y.Max = x0, x1, z0, z1
		dc := v.p.DataCanvas(area)
		w, h := float64(dc.Max.X-dc.Min.X), float64(dc.Max.Y-dc.Min.Y)
		fitEx := (h / (z1 - z0)) / (w / (x1 - x0)) // the exaggeration that just fits
		ex = 1
		if !v.across {
			ex = niceBelow(fitEx)
		}
		if ex > fitEx || v.across {
			// Keep the exaggeration and widen the range that has room.
			if need := h * (x1 - x0) / (w * ex); need > z1-z0 {
				mid := (z0 + z1) / 2
				z0, z1 = mid-need/2, mid+need/2
			} else {
				needX := w * (z1 - z0) * ex / h
				mid := (x0 + x1) / 2
				x0, x1 = mid-needX/2, mid+needX/2
			}
		} else {
			need := h * (x1 - x0) / (w * ex)
			mid := (z0 + z1) / 2
			z0, z1 = mid-need/2, mid+need/2
		}
	}
	v.p.X.Min, v.p.X.Max, v.p.Y.Min, v.p.Y.Max = x0, x1, z0, z1
	v.p.X.Tick.Marker = levelTicks{}
	v.p.Y.Tick.Marker = levelTicks{}
	return ex
}

// niceBelow returns the largest of 1, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10, 12,
// 15, 20 … not above x, and 1 for x below 1.
func niceBelow(x float64) float64 {
	if !(x > 1) {
		return 1
	}
	best := 1.0
	for dec := 1.0; dec <= 1e3; dec *= 10 {
		for _, m := range []float64{1, 1.5, 2, 2.5, 3, 4, 5, 6, 8} {
			if m*dec <= x {
				best = m * dec
			}
		}
	}
	return best
}

// drawingFont is the typeface of the drawings: a sans serif, plainer on a
// drawing than the plot's default.
var drawingFont = font.Font{Typeface: "Liberation", Variant: "Sans"}

// textStyle returns a text style of the given size in points.
func (v *view) textStyle(size float64, c color.Color) text.Style {
	return text.Style{Color: c, Font: font.From(drawingFont, vg.Points(size)), Handler: plot.DefaultTextHandler,
		XAlign: draw.XCenter, YAlign: draw.YCenter}
}

// useDrawingFont sets the drawing's typeface on the plot's own texts.
func (v *view) useDrawingFont() {
	for _, f := range []*font.Font{&v.p.Title.TextStyle.Font, &v.p.X.Label.TextStyle.Font, &v.p.Y.Label.TextStyle.Font,
		&v.p.X.Tick.Label.Font, &v.p.Y.Tick.Label.Font, &v.legend.TextStyle.Font} {
		size := f.Size
		*f = drawingFont
		f.Size = size
	}
}

// extend grows the axis ranges to hold the points.
func (v *view) extend(pts ...plotter.XY) {
	for _, p := range pts {
		if math.IsNaN(p.X) || math.IsNaN(p.Y) {
			continue
		}
		v.p.X.Min, v.p.X.Max = math.Min(v.p.X.Min, p.X), math.Max(v.p.X.Max, p.X)
		v.p.Y.Min, v.p.Y.Max = math.Min(v.p.Y.Min, p.Y), math.Max(v.p.Y.Max, p.Y)
	}
}

// line adds a polyline; a failing element is red and dashed.
func (v *view) line(pts plotter.XYs, c color.Color, width float64, dashed bool, legend string) error {
	l, err := plotter.NewLine(pts)
	if err != nil {
		return err
	}
	l.Color, l.Width = c, vg.Points(width)
	if dashed {
		l.Dashes = []vg.Length{vg.Points(6), vg.Points(3)}
	}
	v.p.Add(l)
	v.extend(pts...)
	if legend != "" {
		v.legend.Add(legend, l)
	}
	return nil
}

// legendLine adds a legend entry for a line style; a label too long for
// the legend's width goes on as many lines as it needs, the style drawn
// beside the first.
func (v *view) legendLine(label string, c color.Color, width float64, dashed bool) {
	l := &plotter.Line{LineStyle: draw.LineStyle{Color: c, Width: vg.Points(width)}}
	if dashed {
		l.Dashes = []vg.Length{vg.Points(6), vg.Points(3)}
	}
	for i, part := range wrapWords(label, legendChars) {
		if i == 0 {
			v.legend.Add(part, l)
		} else {
			v.legend.Add("  "+part, noThumbnail{})
		}
	}
}

// legendChars is about as many characters of legend text as fit its width.
const legendChars = 34

// noThumbnail is a legend entry's empty thumbnail, for a continued label.
type noThumbnail struct{}

func (noThumbnail) Thumbnail(*draw.Canvas) {}

// wrapWords splits s at spaces into lines of at most n characters (a word
// longer than n stands on its own line).
func wrapWords(s string, n int) []string {
	var out []string
	line := ""
	for _, w := range strings.Fields(s) {
		switch {
		case line == "":
			line = w
		case len([]rune(line))+1+len([]rune(w)) <= n:
			line += " " + w
		default:
			out = append(out, line)
			line = w
		}
	}
	return append(out, line)
}

// label adds text at a point, offset in points.
func (v *view) label(x, y float64, s string, c color.Color, size float64, dx, dy float64, xalign draw.XAlignment) {
	v.p.Add(&note{x: x, y: y, text: s, style: func() text.Style {
		st := v.textStyle(size, c)
		st.XAlign = xalign
		return st
	}(), dx: vg.Points(dx), dy: vg.Points(dy)})
}

// failing returns the failing results of an element and a short label.
func (v *view) failing(element string) ([]check.Result, string) {
	rs := v.fails[element]
	if len(rs) == 0 {
		return nil, ""
	}
	var parts []string
	for _, r := range rs {
		parts = append(parts, fmt.Sprintf("%s %.2f", r.ID, r.Ratio))
	}
	return rs, "FAIL: " + strings.Join(parts, ", ")
}

// style returns the colour and dash of an element: red and dashed when it
// fails.
func (v *view) style(element string, normal color.Color) (color.Color, bool) {
	if rs, _ := v.failing(element); rs != nil {
		return colourFail, true
	}
	return normal, false
}

// bankGeometry is where a bank's parts lie in the elevation.
type bankGeometry struct {
	dir, xs, zs float64 // towards the span; saddle position
	base        float64 // column base (top of the footing)
	ax, az      float64 // backstay attachment at the anchor
	ground      float64 // ground level at the footing
}

func (v *view) bank(side Side) bankGeometry {
	b := v.a.Bridge
	bank := v.m.bank(side)
	g := bankGeometry{dir: 1, xs: 0, zs: float64(b.Site.LeftSaddle)}
	if side == Right {
		g.dir, g.xs, g.zs = -1, float64(b.Site.Span), float64(b.Site.LeftSaddle+b.Site.Rise)
	}
	g.base = g.zs - float64(bank.Tower.Height)
	g.ax = g.xs - g.dir*float64(bank.Backstay.Horizontal)
	g.az = g.zs - float64(bank.Backstay.Drop)
	ft := bank.Tower.Footing
	g.ground = g.base - float64(ft.Thickness) + float64(ft.Depth)
	return g
}

// groundLayer draws the ground and, along the bridge, the design flood
// and the level the freeboard asks the walkway to clear.
func groundLayer(v *view) error {
	b := v.a.Bridge
	if v.across {
		g := v.bank(v.side)
		half := math.Max(float64(v.m.bank(v.side).Tower.Footing.Width)/2+1.5, float64(b.Walkway.Width))
		return v.line(plotter.XYs{{X: -half, Y: g.ground}, {X: half, Y: g.ground}}, colourGround, 1.5, false, "ground")
	}
	if len(b.Site.Ground) > 1 {
		var pts plotter.XYs
		for _, p := range b.Site.Ground {
			pts = append(pts, plotter.XY{X: float64(p.X), Y: float64(p.Z)})
		}
		if err := v.line(pts, colourGround, 1.5, false, "ground"); err != nil {
			return err
		}
	} else {
		for side := Left; side <= Right; side++ {
			g := v.bank(side)
			label := ""
			if side == Left {
				label = "ground at the towers"
			}
			if err := v.line(plotter.XYs{{X: g.xs - 3, Y: g.ground}, {X: g.xs + 3, Y: g.ground}}, colourGround, 1.5, false, label); err != nil {
				return err
			}
		}
	}
	if b.Site.Flood.None {
		v.notes = append(v.notes, "No design flood: the description declares none.")
		return nil
	}
	flood := float64(b.Site.Flood.Z)
	x0, x1 := -0.1*float64(b.Site.Span), 1.1*float64(b.Site.Span)
	if err := v.line(plotter.XYs{{X: x0, Y: flood}, {X: x1, Y: flood}}, colourWater, 1.2, false, "design flood "+units.Length(flood).String()); err != nil {
		return err
	}
	if b.Site.Freeboard > 0 {
		fb := flood + float64(b.Site.Freeboard)
		if err := v.line(plotter.XYs{{X: 0, Y: fb}, {X: float64(b.Site.Span), Y: fb}}, colourWater, 0.8, true, "flood + freeboard "+b.Site.Freeboard.String()); err != nil {
			return err
		}
	}
	return nil
}

// structureLayer draws the tower columns, footings and anchors, each
// labelled with its size; a failing one red, dashed and labelled FAIL.
func structureLayer(v *view) error {
	top := 0.0
	for _, g := range v.m.groups {
		top = math.Max(top, float64(g.Offset))
	}
	if v.across {
		return v.structureAcross(top)
	}
	legendDone := false
	for side := Left; side <= Right; side++ {
		bank := v.m.bank(side)
		g := v.bank(side)
		t := bank.Tower
		half := float64(t.Depth) / 2
		towerName, footName, anchorName := towerElement[side], footingElement[side], anchorElement[side]
		c, dashed := v.style(towerName, colourConcrete)
		col := plotter.XYs{{X: g.xs - half, Y: g.base}, {X: g.xs - half, Y: g.zs + top}, {X: g.xs + half, Y: g.zs + top}, {X: g.xs + half, Y: g.base}}
		legend := ""
		if !legendDone {
			legend, legendDone = "towers, footings, anchors", true
		}
		if err := v.line(col, c, 1.5, dashed, legend); err != nil {
			return err
		}
		text := towerName + " " + sizes(t.Depth, t.Width) + ", " + bank.Tower.Saddle.Kind + " saddle"
		if _, fail := v.failing(towerName); fail != "" {
			text += "; " + fail
		}
		v.callouts[side].add(g.xs, g.zs+top, text, c)
		ft := t.Footing
		fc := g.xs + g.dir*float64(ft.ColumnOffset)
		fl := float64(ft.Length) / 2
		c, dashed = v.style(footName, colourConcrete)
		foot := plotter.XYs{{X: fc - fl, Y: g.base}, {X: fc + fl, Y: g.base}, {X: fc + fl, Y: g.base - float64(ft.Thickness)}, {X: fc - fl, Y: g.base - float64(ft.Thickness)}, {X: fc - fl, Y: g.base}}
		if err := v.line(foot, c, 1.5, dashed, ""); err != nil {
			return err
		}
		text = fmt.Sprintf("%s footing %s, %s deep", side, sizes(ft.Length, ft.Width, ft.Thickness), ft.Depth)
		if _, fail := v.failing(footName); fail != "" {
			text += "; " + fail
		}
		v.callouts[side].add(fc+g.dir*fl, g.base-float64(ft.Thickness)/2, text, c)
		c, dashed = v.style(anchorName, colourConcrete)
		an := bank.Anchor
		var atext string
		switch an.Type {
		case "rock":
			// The bars run on along the backstay into the rock.
			dx, dz := g.ax-g.xs, g.az-g.zs
			n := math.Hypot(dx, dz)
			l := float64(an.FreeLength + an.BondLength)
			end := plotter.XY{X: g.ax + dx/n*l, Y: g.az + dz/n*l}
			if err := v.line(plotter.XYs{{X: g.ax, Y: g.az}, end}, c, 2, dashed, ""); err != nil {
				return err
			}
			atext = fmt.Sprintf("rock anchor %d × %s bars, bond %s", an.Bars, an.BarDiameter, an.BondLength)
		default:
			attachX, attachZ := an.AttachX, an.AttachZ
			if attachX == 0 {
				attachX = an.Length / 2
			}
			if attachZ == 0 {
				attachZ = an.Height / 3
			}
			back := g.ax - g.dir*float64(attachX)
			front := back + g.dir*float64(an.Length)
			bz := g.az - float64(attachZ)
			blk := plotter.XYs{{X: back, Y: bz}, {X: front, Y: bz}, {X: front, Y: bz + float64(an.Height)}, {X: back, Y: bz + float64(an.Height)}, {X: back, Y: bz}}
			if err := v.line(blk, c, 1.5, dashed, ""); err != nil {
				return err
			}
			atext = map[string]string{"block": "anchor block ", "deadman": "deadman "}[an.Type] + sizes(an.Length, an.Width, an.Height)
		}
		if _, fail := v.failing(anchorName); fail != "" {
			atext += "; " + fail
		}
		v.callouts[side].add(g.ax, g.az, side.String()+" "+atext, c)
	}
	return nil
}

// structureAcross draws the column and footing of one tower seen along the
// bridge.
func (v *view) structureAcross(top float64) error {
	bank := v.m.bank(v.side)
	g := v.bank(v.side)
	t := bank.Tower
	half := float64(t.Width) / 2
	name := towerAcrossElement[v.side]
	c, dashed := v.style(name, colourConcrete)
	if rs, _ := v.failing(towerElement[v.side]); rs != nil {
		c, dashed = colourFail, true
	}
	col := plotter.XYs{{X: -half, Y: g.base}, {X: -half, Y: g.zs + top}, {X: half, Y: g.zs + top}, {X: half, Y: g.base}}
	if err := v.line(col, c, 1.5, dashed, towerElement[v.side]+" and footing"); err != nil {
		return err
	}
	text := fmt.Sprintf("%s, %s wide", towerElement[v.side], t.Width)
	if _, fail := v.failing(name); fail != "" {
		text += "; " + fail
	}
	v.label(0, g.zs+top, text, c, 7.5, 0, 12, draw.XCenter)
	ft := t.Footing
	fw := float64(ft.Width) / 2
	c, dashed = v.style(footingAcrossElement[v.side], colourConcrete)
	foot := plotter.XYs{{X: -fw, Y: g.base}, {X: fw, Y: g.base}, {X: fw, Y: g.base - float64(ft.Thickness)}, {X: -fw, Y: g.base - float64(ft.Thickness)}, {X: -fw, Y: g.base}}
	if err := v.line(foot, c, 1.5, dashed, ""); err != nil {
		return err
	}
	text = fmt.Sprintf("footing %s wide, %s thick", ft.Width, ft.Thickness)
	if _, fail := v.failing(footingAcrossElement[v.side]); fail != "" {
		text += "; " + fail
	}
	v.label(0, g.base-float64(ft.Thickness), text, c, 7, 0, -8, draw.XCenter)
	return nil
}

// ropeName describes a group's ropes: "6 × 32 mm 6x36-IWRC 1770 walkway ropes".
func ropeName(g group) string {
	return fmt.Sprintf("%s: %d × %s", g.Name, g.Count, g.rope.Name)
}

// ropeLayer draws each rope group under permanent load, and under the case
// that brings the walkway lowest, with its backstays, each group labelled
// with its ropes; across the bridge, the ropes on the saddle and the rope
// plane swung by wind.
func ropeLayer(v *view) error {
	b := v.a.Bridge
	if v.across {
		return v.ropesAcross()
	}
	z0 := float64(b.Site.LeftSaddle)
	perm, low := v.a.Service[0], v.a.Service[v.low]
	drawCase := func(cs CaseState, c color.Color, dashed bool, label string, labels bool) error {
		for i, g := range v.m.groups {
			gs := cs.Groups[i]
			col, dash := c, dashed
			if rs, _ := v.failing(g.Name); rs != nil && labels {
				col, dash = colourFail, true
			}
			var pts plotter.XYs
			const n = 80
			for k := 0; k <= n; k++ {
				x := float64(b.Site.Span) * float64(k) / n
				pts = append(pts, plotter.XY{X: x, Y: z0 + float64(g.Offset) + float64(gs.shape.Z(units.Length(x)))})
			}
			width := 1.6
			if g.Role != RoleWalkway {
				width = 0.9
			}
			if err := v.line(pts, col, width, dash, ""); err != nil {
				return err
			}
			if i == 0 {
				v.legendLine(label, c, width, dashed)
			}
			if !labels {
				continue
			}
			for side := Left; side <= Right; side++ {
				bg := v.bank(side)
				if err := v.line(plotter.XYs{{X: bg.xs, Y: bg.zs + float64(g.Offset)}, {X: bg.ax, Y: bg.az}}, col, 1, dash, ""); err != nil {
					return err
				}
			}
			text := ropeName(g)
			if _, fail := v.failing(g.Name); fail != "" {
				text += "; " + fail
			}
			// Walkway ropes are labelled below the rope, others above it, at
			// a third and two thirds of the span.
			x := float64(b.Site.Span) * (0.25 + 0.45*float64(i%2))
			dy := 8.0
			if g.Role == RoleWalkway {
				dy = -9
			}
			v.label(x, z0+float64(g.Offset)+float64(gs.shape.Z(units.Length(x))), text, col, 7.5, 0, dy, draw.XCenter)
		}
		return nil
	}
	if err := drawCase(perm, colourRope, false, "ropes, "+perm.Case.Name, true); err != nil {
		return err
	}
	if v.low != 0 {
		if err := drawCase(low, colourLoaded, true, "ropes, "+low.Case.Name+" (walkway lowest)", false); err != nil {
			return err
		}
	}
	soffit, x := v.m.walkwayLow(low)
	c := colourLoaded
	fail := ""
	if rs, f := v.failing("walkway"); rs != nil {
		c, fail = colourFail, "; "+f
	}
	sc, err := plotter.NewScatter(plotter.XYs{{X: float64(x), Y: float64(soffit)}})
	if err != nil {
		return err
	}
	sc.GlyphStyle.Color, sc.GlyphStyle.Shape, sc.GlyphStyle.Radius = c, draw.TriangleGlyph{}, vg.Points(4)
	v.p.Add(sc)
	v.legend.Add("lowest walkway underside", sc)
	v.label(float64(x), float64(soffit), fmt.Sprintf("walkway underside %s (%s)%s", soffit, low.Case.Name, fail), c, 7, 0, -9, draw.XCenter)
	return nil
}

// ropesAcross draws the ropes on the saddle of one tower and the rope
// plane swung by wind, with the force across the bridge.
func (v *view) ropesAcross() error {
	g := v.bank(v.side)
	t := v.m.bank(v.side).Tower
	half := float64(t.Width) / 2
	for i, grp := range v.m.groups {
		z := g.zs + float64(grp.Offset)
		var pts plotter.XYs
		for k := range grp.Count {
			y := -half + float64(t.Width)*(float64(k)+0.5)/float64(grp.Count)
			pts = append(pts, plotter.XY{X: y, Y: z})
		}
		sc, err := plotter.NewScatter(pts)
		if err != nil {
			return err
		}
		c, failing := v.style(grp.Name, colourRope)
		sc.GlyphStyle.Color, sc.GlyphStyle.Shape = c, draw.CircleGlyph{}
		if failing {
			sc.GlyphStyle.Shape = draw.CrossGlyph{} // told by shape, not only colour
		}
		sc.GlyphStyle.Radius = vg.Points(math.Max(1.5, math.Min(4, float64(grp.rope.Diameter)*100)))
		v.p.Add(sc)
		v.extend(pts...)
		if i == 0 {
			thumb := &plotter.Scatter{GlyphStyle: draw.GlyphStyle{Color: colourRope, Shape: draw.CircleGlyph{}, Radius: vg.Points(3)}}
			v.legend.Add("ropes on the saddle", thumb)
		}
		text := ropeName(grp)
		if _, fail := v.failing(grp.Name); fail != "" {
			text += "; " + fail
		}
		v.label(half, z, text, c, 7, 8, 0, draw.XLeft)
	}
	// The case with the largest force across the bridge on this tower.
	best := -1
	for i, cs := range v.a.Service {
		if cs.Lateral[v.side] > 0 && (best < 0 || cs.Lateral[v.side] > v.a.Service[best].Lateral[v.side]) {
			best = i
		}
	}
	if best < 0 {
		v.notes = append(v.notes, "No wind: the ropes hang in the vertical plane.")
		return nil
	}
	cs := v.a.Service[best]
	swing := float64(cs.Groups[0].Swing)
	drop := 0.6 * float64(t.Height)
	plane := plotter.XYs{{X: 0, Y: g.zs}, {X: drop * math.Tan(swing), Y: g.zs - drop}}
	if err := v.line(plane, colourLoaded, 1, true, "walkway rope plane, "+cs.Case.Name); err != nil {
		return err
	}
	v.label(plane[1].X, plane[1].Y, fmt.Sprintf("swung %s by wind", cs.Groups[0].Swing), colourLoaded, 7, 6, -6, draw.XLeft)
	arrowLen := 1.2 * half
	arrow := plotter.XYs{{X: -half - arrowLen, Y: g.zs}, {X: -half, Y: g.zs}}
	if err := v.line(arrow, colourDim, 1.2, false, ""); err != nil {
		return err
	}
	v.p.Add(&arrowHead{at: arrow[1], from: arrow[0], c: colourDim})
	v.label(-half-arrowLen/2, g.zs, fmt.Sprintf("%s across, %s", cs.Lateral[v.side], cs.Case.Name), colourDim, 7, 0, 8, draw.XCenter)
	return nil
}

// dimensionLayer draws the dimensions: span, rise, sag, tower heights,
// backstay lengths and angles; across the bridge, the column's height and
// width and the footing's width.
func dimensionLayer(v *view) error {
	b := v.a.Bridge
	if v.across {
		g := v.bank(v.side)
		t := v.m.bank(v.side).Tower
		half := float64(t.Width) / 2
		v.dim(-half-0.3, g.base, -half-0.3, g.zs, "height "+t.Height.String(), false)
		fw := float64(t.Footing.Width) / 2
		v.dim(-fw, g.base-float64(t.Footing.Thickness)-0.5, fw, g.base-float64(t.Footing.Thickness)-0.5, "footing "+t.Footing.Width.String(), true)
		return nil
	}
	z0 := float64(b.Site.LeftSaddle)
	span := float64(b.Site.Span)
	top := z0 + math.Max(0, float64(b.Site.Rise))
	for _, g := range v.m.groups {
		top = math.Max(top, z0+math.Max(0, float64(b.Site.Rise))+float64(g.Offset))
	}
	v.dim(0, top+1.2, span, top+1.2, "span "+b.Site.Span.String(), true)
	if b.Site.Rise != 0 {
		v.p.Add(&dashedSegment{a: plotter.XY{X: 0, Y: z0}, b: plotter.XY{X: span, Y: z0}, c: colourDim})
		v.callouts[Right].add(span, z0+float64(b.Site.Rise)/2, fmt.Sprintf("rise %s: right saddle above the left", b.Site.Rise), colourDim)
	}
	// The sag of the first walkway group under permanent load, at midspan.
	for i, g := range v.m.groups {
		if g.Role != RoleWalkway {
			continue
		}
		gs := v.a.Service[0].Groups[i]
		chord := z0 + float64(b.Site.Rise)/2
		v.p.Add(&dashedSegment{a: plotter.XY{X: 0, Y: z0}, b: plotter.XY{X: span, Y: z0 + float64(b.Site.Rise)}, c: colourDim})
		v.dim(span/2, chord, span/2, chord-float64(gs.Sag), fmt.Sprintf("sag %s (1/%.0f)", gs.Sag, span/float64(gs.Sag)), false)
		break
	}
	for side := Left; side <= Right; side++ {
		g := v.bank(side)
		t := v.m.bank(side).Tower
		x := g.xs + g.dir*(float64(t.Depth)/2+0.6)
		v.dim(x, g.base, x, g.zs, t.Height.String(), false)
		// The backstay of the first walkway group: its chord and angle.
		for _, grp := range v.m.groups {
			if grp.Role != RoleWalkway {
				continue
			}
			bs := v.m.bank(side).Backstay
			l := units.Length(math.Hypot(float64(bs.Horizontal), float64(bs.Drop+grp.Offset)))
			angle := backstayAngle(bs, grp.Offset)
			v.callouts[side].add((g.xs+g.ax)/2, (g.zs+g.az)/2, fmt.Sprintf("%s backstay %s long at %s", side, l, angle), colourDim)
			break
		}
	}
	return nil
}

// sizes writes lengths as "2.40 × 3.00 × 0.70 m".
func sizes(ls ...units.Length) string {
	parts := make([]string, len(ls))
	for i, l := range ls {
		parts[i] = fmt.Sprintf("%.2f", float64(l))
	}
	return strings.Join(parts, " × ") + " m"
}

// dim adds a dimension line from (x0, y0) to (x1, y1) with its text.
func (v *view) dim(x0, y0, x1, y1 float64, s string, horizontal bool) {
	d := &dimension{a: plotter.XY{X: x0, Y: y0}, b: plotter.XY{X: x1, Y: y1}, text: s, style: v.textStyle(7.5, colourDim), horizontal: horizontal}
	v.p.Add(d)
	v.extend(d.a, d.b)
}

// annotationLayer adds the title, the axes' labels, the legend entry that
// explains how a failure is marked, and a note of every failing element.
func annotationLayer(v *view) error {
	b := v.a.Bridge
	if v.across {
		v.p.Title.Text = fmt.Sprintf("%s: section across the bridge at the %s tower", b.Name, v.side)
		v.p.X.Label.Text = "y across the bridge from the column axis (m)"
	} else {
		v.p.Title.Text = b.Name + ": elevation"
		v.p.X.Label.Text = "x from the left saddle (m)"
	}
	v.p.Title.TextStyle.Font.Size = vg.Points(11)
	for _, c := range v.callouts {
		if len(c.entries) > 0 {
			v.p.Add(c)
		}
	}
	if !v.across {
		// Headroom above the bridge for the callouts.
		v.extend(plotter.XY{X: v.p.X.Min, Y: v.p.Y.Max + 0.35*(v.p.Y.Max-v.p.Y.Min)})
	}
	v.p.Y.Label.Text = "elevation (m)"
	v.p.Add(plotter.NewGrid())
	v.legendLine("FAIL: red, dashed, labelled", colourFail, 1.5, true)
	var els []string
	for e := range v.fails {
		els = append(els, e)
	}
	sort.Strings(els)
	if len(els) == 0 {
		v.notes = append(v.notes, "Every check passes: no element is marked as failing.")
	} else {
		v.notes = append(v.notes, "Failing (red, dashed, labelled FAIL): "+strings.Join(els, "; ")+".")
	}
	return nil
}
