package sagspan

import (
	"bytes"
	"fmt"
	"html/template"
	"io"
	"math"
	"strings"

	"github.com/sagspan/sagspan/check"
)

// WriteHTML writes the full report as one self-contained HTML page (no
// file or network it needs besides itself): the verdict and the caution,
// the design basis, the failures first when any, the governing cases, a
// chart of the utilisation of every check, the drawings inline (the
// elevation and a section across the bridge at each tower), then the
// values, notes and bases, rope states, frequencies and erection tables:
// the sections of WriteText, in the same order, with the chart and the
// drawings after the governing cases. Pass and fail are told by text and
// by shape as well as by colour. The page prints on A4, each section
// starting a page. It is well-formed XML (XHTML), so that any XML reader
// can take it apart.
func (a *Analysis) WriteHTML(w io.Writer, opts *check.RenderOptions) error {
	var elev bytes.Buffer
	if err := a.WriteSVG(&elev); err != nil {
		return err
	}
	page := htmlPage{
		Title:   a.Report.Title,
		Caution: check.Caution,
		Summary: a.Report.Summary(),
		Failed:  a.Report.Status() == check.Fail,
		Chart:   a.utilisationChart(),
	}
	page.Drawings = append(page.Drawings, htmlDrawing{"Elevation", inlineSVG(elev.Bytes())})
	for side := Left; side <= Right; side++ {
		var buf bytes.Buffer
		if err := a.WriteSectionSVG(&buf, side); err != nil {
			return err
		}
		page.Drawings = append(page.Drawings, htmlDrawing{fmt.Sprintf("Section across the bridge at the %s tower", side), inlineSVG(buf.Bytes())})
	}
	for _, s := range a.Sections(opts) {
		hs := toHTMLSection(s)
		page.Sections = append(page.Sections, hs)
		if s.ID == "governing" {
			page.Sections = append(page.Sections, htmlSection{ID: "utilisation", Title: "Utilisation of every check", Chart: true},
				htmlSection{ID: "drawing", Title: "Drawings", Drawing: true})
		}
	}
	return htmlReport.Execute(w, page)
}

// inlineSVG returns an SVG document as markup to place in the page: its
// XML declaration and comments dropped, scaled to the page's width.
func inlineSVG(svg []byte) template.HTML {
	s := string(svg)
	if i := strings.Index(s, "<svg"); i >= 0 {
		s = s[i:]
	}
	s = strings.Replace(s, "<svg ", `<svg class="drawing" role="img" `, 1)
	return template.HTML(s) // produced here by package vgsvg, not from input
}

type htmlPage struct {
	Title, Caution, Summary string
	Failed                  bool
	Sections                []htmlSection
	Drawings                []htmlDrawing
	Chart                   template.HTML
}

type htmlDrawing struct {
	Title string
	SVG   template.HTML
}

type htmlSection struct {
	ID, Title      string
	Text           []string
	Head           []string
	Rows           []htmlRow
	Items          [][2]string
	Sub            []htmlSection
	Chart, Drawing bool
}

type htmlRow struct {
	Class string // "fail", "flag" or ""
	Cells []string
}

func toHTMLSection(s check.Section) htmlSection {
	h := htmlSection{ID: s.ID, Title: s.Title, Text: s.Text, Head: s.Head, Items: s.Items}
	for i, r := range s.Rows {
		row := htmlRow{Cells: r}
		if i < len(s.Status) {
			switch s.Status[i] {
			case check.Fail:
				row.Class = "fail"
			case check.Flag:
				row.Class = "flag"
			}
		}
		h.Rows = append(h.Rows, row)
	}
	for _, sub := range s.Sub {
		h.Sub = append(h.Sub, toHTMLSection(sub))
	}
	return h
}

// utilisationChart draws a bar of the governing utilisation of every check
// that has a limit, as inline SVG: the bar's length is the ratio, a line
// marks the limit 1; a passing bar is plain and ends in a circle, a
// failing one is hatched and ends in a cross, a flagged one is dotted and
// ends in a diamond; each says its ratio, status and governing case in
// words.
func (a *Analysis) utilisationChart() template.HTML {
	gov := a.Report.Governing()
	var rows []check.Result
	for _, r := range gov {
		if !r.NoLimit {
			rows = append(rows, r)
		}
	}
	const (
		labelW, barW, textW = 300.0, 330.0, 470.0
		rowH, top           = 17.0, 28.0
	)
	maxRatio := 1.25
	for _, r := range rows {
		if !math.IsInf(r.Ratio, 0) && r.Ratio > maxRatio {
			maxRatio = math.Min(r.Ratio*1.05, 3)
		}
	}
	scale := barW / maxRatio
	width, height := labelW+barW+textW, top+rowH*float64(len(rows))+20
	var b strings.Builder
	fmt.Fprintf(&b, `<svg class="chart" role="img" viewBox="0 0 %.0f %.0f" width="%.0f" height="%.0f" xmlns="http://www.w3.org/2000/svg">`, width, height, width, height)
	b.WriteString(`<title>Utilisation of every check in its governing case</title>`)
	b.WriteString(`<defs><pattern id="hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="#f4c7c3"/><line x1="0" y1="0" x2="0" y2="6" stroke="#c62828" stroke-width="3"/></pattern>`)
	b.WriteString(`<pattern id="dots" width="5" height="5" patternUnits="userSpaceOnUse"><rect width="5" height="5" fill="#ffe0b2"/><circle cx="2.5" cy="2.5" r="1.2" fill="#e65100"/></pattern></defs>`)
	fmt.Fprintf(&b, `<text x="%.1f" y="14" class="axis">ratio = demand / capacity; at most 1 passes</text>`, labelW)
	for _, t := range []float64{0, 0.5, 1, 1.5, 2, 2.5, 3} {
		if t > maxRatio {
			break
		}
		x := labelW + t*scale
		stroke := `stroke="#bbb"`
		if t == 1 {
			stroke = `stroke="#000" stroke-width="1.5"`
		}
		fmt.Fprintf(&b, `<line x1="%.1f" y1="%.1f" x2="%.1f" y2="%.1f" %s/>`, x, top-6, x, height-18, stroke)
		fmt.Fprintf(&b, `<text x="%.1f" y="%.1f" class="tick" text-anchor="middle">%s</text>`, x, height-6, trimFloat(t))
	}
	fmt.Fprintf(&b, `<text x="%.1f" y="%.1f" class="tick">limit 1</text>`, labelW+scale+3, top-8)
	for i, r := range rows {
		y := top + rowH*float64(i)
		mid := y + rowH/2
		fmt.Fprintf(&b, `<text x="%.1f" y="%.1f" class="label" text-anchor="end">%s</text>`, labelW-6, mid+4, template.HTMLEscapeString(r.ID+", "+r.Element))
		ratio := r.Ratio
		capped := math.IsInf(ratio, 1) || ratio > maxRatio
		if capped {
			ratio = maxRatio
		}
		w := math.Max(ratio*scale, 1)
		fill, marker, word := "#2e7d32", fmt.Sprintf(`<circle cx="%.1f" cy="%.1f" r="4" fill="#2e7d32"/>`, labelW+w, mid), "pass"
		switch r.Status {
		case check.Fail:
			fill, word = "url(#hatch)", "FAIL"
			marker = fmt.Sprintf(`<path d="M%.1f %.1fl8 8m0 -8l-8 8" stroke="#c62828" stroke-width="2.5"/>`, labelW+w-4, mid-4)
		case check.Flag:
			fill, word = "url(#dots)", "flag"
			marker = fmt.Sprintf(`<path d="M%.1f %.1fl5 5l-5 5l-5 -5z" fill="#e65100"/>`, labelW+w, mid-5)
		}
		text := fmt.Sprintf("%s %s, %s", ratioText(r.Ratio), word, r.Case)
		if idle(r) {
			text = "– nothing acts: " + firstNonEmpty(a.explain(r), "in any case")
			marker = ""
		}
		fmt.Fprintf(&b, `<g class="%s"><rect x="%.1f" y="%.1f" width="%.1f" height="%.1f" fill="%s" stroke="#333" stroke-width="0.5"/>%s`, strings.ToLower(word), labelW, y+3, w, rowH-6, fill, marker)
		if capped {
			fmt.Fprintf(&b, `<text x="%.1f" y="%.1f" class="tick">beyond the chart</text>`, labelW+w-70, y+2)
		}
		fmt.Fprintf(&b, `<text x="%.1f" y="%.1f" class="value">%s</text></g>`, labelW+barW+10, mid+4, template.HTMLEscapeString(text))
	}
	b.WriteString(`</svg>`)
	return template.HTML(b.String()) // built here from escaped text
}

func idle(r check.Result) bool { return !r.NoLimit && r.Demand == 0 && r.Status == check.Pass }

func firstNonEmpty(s ...string) string {
	for _, x := range s {
		if x != "" {
			return x
		}
	}
	return ""
}

func ratioText(x float64) string {
	if math.IsInf(x, 1) {
		return "∞"
	}
	return fmt.Sprintf("%.3f", x)
}

var htmlReport = template.Must(template.New("report").Parse(`<!DOCTYPE html>
<html lang="en" xmlns="http://www.w3.org/1999/xhtml">
<head>
<meta charset="utf-8"/>
<meta name="viewport" content="width=device-width, initial-scale=1"/>
<title>{{.Title}}</title>
<style>
@page { size: A4; margin: 14mm 11mm; }
body { font-family: "Liberation Sans", "DejaVu Sans", Arial, sans-serif; font-size: 10pt; color: #111; margin: 1.5em auto; max-width: 60em; line-height: 1.35; }
h1 { font-size: 16pt; margin: 0 0 .4em; }
h2 { font-size: 13pt; border-bottom: 1.5pt solid #333; padding-bottom: 2pt; margin-top: 1.6em; }
h3 { font-size: 11pt; margin: 1.2em 0 .3em; }
.caution { border: 2pt solid #000; padding: .5em .8em; font-weight: bold; }
.verdict { font-size: 12pt; font-weight: bold; padding: .4em .8em; border: 1.5pt solid; display: inline-block; margin: .6em 0; }
.verdict.pass { border-color: #2e7d32; }
.verdict.fail { border: 3pt double #c62828; color: #b71c1c; }
table { border-collapse: collapse; width: 100%; font-size: 8.5pt; margin: .3em 0 1em; }
th, td { border: .5pt solid #999; padding: 2pt 4pt; text-align: left; vertical-align: top; }
td:first-child { white-space: nowrap; }
th { background: #eee; }
tr.fail td { background: #fde0dc; font-weight: bold; }
tr.fail td:last-child::before { content: "✗ "; }
tr.flag td:last-child::before { content: "! "; }
ul { padding-left: 1.2em; font-size: 9pt; }
code { font-size: 8.5pt; }
svg.drawing, svg.chart { width: 100%; height: auto; border: .5pt solid #ccc; margin: .3em 0 1em; }
svg.chart text { font-family: inherit; }
svg.chart .label, svg.chart .value { font-size: 10px; }
svg.chart .tick, svg.chart .axis { font-size: 9px; fill: #444; }
nav ol { columns: 2; font-size: 9pt; }
@media print {
  body { margin: 0; max-width: none; }
  section.part { break-before: page; }
  thead { display: table-header-group; }
  tr, li, svg, figure { break-inside: avoid; }
  h2, h3 { break-after: avoid; }
  nav { display: none; }
}
</style>
</head>
<body>
<header>
<h1>{{.Title}}</h1>
<p class="caution">{{.Caution}}</p>
<p class="verdict {{if .Failed}}fail{{else}}pass{{end}}">{{if .Failed}}✗ {{else}}✓ {{end}}{{.Summary}}</p>
<nav><ol>{{range .Sections}}<li><a href="#{{.ID}}">{{.Title}}</a></li>{{end}}</ol></nav>
</header>
<main>
{{range .Sections}}<section class="part" id="{{.ID}}">
<h2>{{.Title}}</h2>
{{if .Chart}}{{$.Chart}}{{end}}
{{if .Drawing}}{{range $.Drawings}}<figure><figcaption>{{.Title}}</figcaption>{{.SVG}}</figure>{{end}}{{end}}
{{template "body" .}}
</section>
{{end}}
</main>
<footer><p class="caution">{{.Caution}}</p></footer>
</body>
</html>
{{define "body"}}{{range .Text}}<p>{{.}}</p>
{{end}}{{if .Head}}<table>
<thead><tr>{{range .Head}}<th>{{.}}</th>{{end}}</tr></thead>
<tbody>{{range .Rows}}<tr{{if .Class}} class="{{.Class}}"{{end}}>{{range .Cells}}<td>{{.}}</td>{{end}}</tr>
{{end}}</tbody>
</table>
{{end}}{{if .Items}}<ul>{{range .Items}}<li>{{if index . 0}}<code>{{index . 0}}</code>: {{end}}{{index . 1}}</li>
{{end}}</ul>
{{end}}{{range .Sub}}<h3>{{.Title}}</h3>
{{template "body" .}}{{end}}{{end}}
`))
