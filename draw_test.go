package sagspan

import (
	"bytes"
	"regexp"
	"strings"
	"testing"
)

// svgTexts returns the text of every <text> element of an SVG document.
func svgTexts(svg []byte) string {
	var b strings.Builder
	for _, m := range regexp.MustCompile(`(?s)<text[^>]*>(.*?)</text>`).FindAllSubmatch(svg, -1) {
		b.Write(m[1])
		b.WriteByte('\n')
	}
	return b.String()
}

// TestDrawing checks that the elevation carries its dimensions, labels,
// the stated exaggeration and the caution, and that a failing element is
// told by line style and text as well as by colour.
func TestDrawing(t *testing.T) {
	a, err := Check(Demo(), nil)
	if err != nil {
		t.Fatal(err)
	}
	var svg bytes.Buffer
	if err := a.WriteSVG(&svg); err != nil {
		t.Fatal(err)
	}
	text := svgTexts(svg.Bytes())
	for _, want := range []string{
		"span 72.00 m", "sag 3.600 m (1/20)", "rise 800.0 mm", "2.400 m", // dimensions
		"left backstay 16.36 m long at 12.00 deg", // √(16² + 3.4²), atan(3.4/16)
		"walkway ropes: 6 × 6x36-IWRC 32mm 1770", "handrail ropes: 2 × 6x36-IWRC 20mm 1770",
		"left tower 0.80 × 2.20 m, sliding saddle", "anchor block", "footing",
		"Vertical scale exaggerated", "never replaces", "local codes, standards and licensed practice govern",
		"design flood 103.5 m", "FAIL: red, dashed, labelled",
	} {
		if !strings.Contains(text, want) {
			t.Errorf("the elevation lacks %q", want)
		}
	}
	// Only the legend's sample of the failure style is red.
	if strings.Contains(text, "; FAIL") || strings.Count(svg.String(), "stroke:#C81414") != 1 {
		t.Error("a passing bridge has an element marked as failing")
	}

	failing := Demo()
	failing.Ropes = append([]RopeGroup(nil), failing.Ropes...)
	failing.Ropes[0].Count = 2
	a, err = Check(failing, nil)
	if err != nil {
		t.Fatal(err)
	}
	svg.Reset()
	if err := a.WriteSVG(&svg); err != nil {
		t.Fatal(err)
	}
	text = svgTexts(svg.Bytes())
	if !strings.Contains(text, "walkway ropes: 2 × 6x36-IWRC 32mm 1770; FAIL: cable.tension") {
		t.Error("the failing walkway ropes are not labelled FAIL with their check")
	}
	red := regexp.MustCompile(`style="[^"]*stroke:#C81414[^"]*stroke-dasharray:6,3`)
	if !red.Match(svg.Bytes()) {
		t.Error("no failing element is drawn red and dashed")
	}

	for side := Left; side <= Right; side++ {
		svg.Reset()
		if err := a.WriteSectionSVG(&svg, side); err != nil {
			t.Fatal(err)
		}
		text = svgTexts(svg.Bytes())
		for _, want := range []string{"section across the bridge at the " + side.String() + " tower", "True scale", "across, wind", "swung", "never replaces"} {
			if !strings.Contains(text, want) {
				t.Errorf("the section at the %s tower lacks %q", side, want)
			}
		}
	}
}

func TestLevelTicks(t *testing.T) {
	for _, r := range [][2]float64{{93.2, 124.7}, {108.1, 114.9}, {-30.5, 100.3}, {0, 3}} {
		ticks := levelTicks{}.Ticks(r[0], r[1])
		labelled := 0
		for _, tk := range ticks {
			if tk.Label != "" {
				labelled++
			}
			if tk.Value < r[0] || tk.Value > r[1] {
				t.Errorf("%v: tick %v outside the range", r, tk.Value)
			}
		}
		if len(ticks) < 12 || len(ticks) > 26 || labelled < 6 {
			t.Errorf("%v: %d ticks, %d labelled; want 12 to 26, at least 6 labelled", r, len(ticks), labelled)
		}
	}
	for _, tt := range [][2]float64{{0.7, 1}, {1, 1}, {2.7, 2.5}, {3.2, 3}, {9.9, 8}, {17, 15}} {
		if got := niceBelow(tt[0]); got != tt[1] {
			t.Errorf("niceBelow(%v) = %v, want %v", tt[0], got, tt[1])
		}
	}
}
