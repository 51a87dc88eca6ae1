package sagspan

import (
	"bytes"
	"context"
	"encoding/xml"
	"errors"
	"image"
	"image/png"
	"io"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"
)

// htmlOutline parses an HTML report as XML, strictly, and returns the ids
// of its sections, the number of inline SVG drawings and its text.
func htmlOutline(t *testing.T, page []byte) (ids []string, svgs int, text string) {
	t.Helper()
	d := xml.NewDecoder(bytes.NewReader(page))
	d.Strict = true
	var words strings.Builder
	for {
		tok, err := d.Token()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			line, col := d.InputPos()
			t.Fatalf("the HTML report is not well-formed at line %d, column %d: %v", line, col, err)
		}
		switch el := tok.(type) {
		case xml.StartElement:
			switch el.Name.Local {
			case "section":
				for _, a := range el.Attr {
					if a.Name.Local == "id" {
						ids = append(ids, a.Value)
					}
				}
			case "svg":
				svgs++
			}
		case xml.CharData:
			words.Write(el)
			words.WriteByte(' ')
		}
	}
	return ids, svgs, words.String()
}

func TestHTMLReport(t *testing.T) {
	failing := Demo()
	failing.Ropes = append([]RopeGroup(nil), failing.Ropes...)
	failing.Ropes[0].Count = 2
	for _, tt := range []struct {
		name string
		b    Bridge
		must []string // section ids the page must have, in this order
	}{
		{"demo", Demo(), []string{"design-basis", "governing", "utilisation", "drawing", "values", "basis", "rope-states", "erection"}},
		{"failing", failing, []string{"design-basis", "failures", "governing", "utilisation", "drawing", "values", "basis", "rope-states", "erection"}},
	} {
		t.Run(tt.name, func(t *testing.T) {
			a, err := Check(tt.b, nil)
			if err != nil {
				t.Fatal(err)
			}
			// Every section of the text report, with the chart and the
			// drawings after the governing cases.
			var want []string
			for _, s := range a.Sections(nil) {
				want = append(want, s.ID)
				if s.ID == "governing" {
					want = append(want, "utilisation", "drawing")
				}
			}
			if !isSubsequence(tt.must, want) {
				t.Fatalf("the report's sections %v lack some of %v", want, tt.must)
			}
			var buf bytes.Buffer
			if err := a.WriteHTML(&buf, nil); err != nil {
				t.Fatal(err)
			}
			ids, svgs, text := htmlOutline(t, buf.Bytes())
			if strings.Join(ids, " ") != strings.Join(want, " ") {
				t.Errorf("sections %v, want %v", ids, want)
			}
			// The chart, the elevation and a section at each tower.
			if svgs != 4 {
				t.Errorf("%d inline SVG images, want 4", svgs)
			}
			for _, want := range []string{"never replace", "Local codes", a.Report.Summary(), "Design basis", "SHA-256 " + tt.b.Digest(),
				"span 72.00 m", "vertical scale exaggerated"} {
				if !strings.Contains(strings.ToLower(text), strings.ToLower(want)) {
					t.Errorf("the HTML report lacks %q", want)
				}
			}
			if strings.Count(text, "never replace") < 2 {
				t.Error("the caution is not at both ends of the page")
			}
			fails := strings.Count(buf.String(), `<tr class="fail">`)
			if tt.name == "failing" {
				if fails == 0 || !strings.Contains(text, "FAIL") || !strings.Contains(buf.String(), `url(#hatch)`) {
					t.Error("a failing check is not marked in the tables, the chart's text and its bars' shape")
				}
			} else if fails != 0 {
				t.Errorf("%d rows marked failing in a passing report", fails)
			}
		})
	}
}

// isSubsequence reports whether the elements of a appear in b in order.
func isSubsequence(a, b []string) bool {
	i := 0
	for _, x := range b {
		if i < len(a) && a[i] == x {
			i++
		}
	}
	return i == len(a)
}

// chromium returns the path of a headless browser, or skips the test when
// there is none; with SAGSPAN_REQUIRE_CHROMIUM set (as .ci/run sets it) a
// missing browser fails the test instead.
func chromium(t *testing.T) string {
	t.Helper()
	for _, name := range []string{"chromium", "chromium-browser", "google-chrome"} {
		if p, err := exec.LookPath(name); err == nil {
			return p
		}
	}
	if os.Getenv("SAGSPAN_REQUIRE_CHROMIUM") != "" {
		t.Fatal("no Chromium found, and SAGSPAN_REQUIRE_CHROMIUM is set (install Debian's chromium package)")
	}
	t.Skip("no Chromium found: install Debian's chromium package to render the HTML report")
	return ""
}

// runChromium runs headless Chromium on file with the given output flags,
// with the flags that work on a machine without a network.
func runChromium(t *testing.T, browser, file string, out ...string) {
	t.Helper()
	ctx, cancel := context.WithTimeout(context.Background(), 2*time.Minute)
	defer cancel()
	args := append([]string{"--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
		"--disable-background-networking", "--disable-component-update", "--disable-sync", "--hide-scrollbars",
		"--user-data-dir=" + t.TempDir()}, out...)
	cmd := exec.CommandContext(ctx, browser, append(args, "file://"+file)...)
	if msg, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("chromium: %v\n%s", err, msg)
	}
}

// TestHTMLInBrowser renders the demo's HTML report in headless Chromium:
// the screenshot must not be blank (enough ink, several colours), and the
// page printed to A4 must start each section on a page of its own.
func TestHTMLInBrowser(t *testing.T) {
	browser := chromium(t)
	a, err := Check(Demo(), nil)
	if err != nil {
		t.Fatal(err)
	}
	dir := t.TempDir()
	page := filepath.Join(dir, "report.html")
	var buf bytes.Buffer
	if err := a.WriteHTML(&buf, nil); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(page, buf.Bytes(), 0o644); err != nil {
		t.Fatal(err)
	}
	shot := filepath.Join(dir, "report.png")
	runChromium(t, browser, page, "--window-size=1240,1754", "--screenshot="+shot)
	f, err := os.Open(shot)
	if err != nil {
		t.Fatalf("no screenshot: %v", err)
	}
	defer f.Close()
	img, err := png.Decode(f)
	if err != nil {
		t.Fatal(err)
	}
	ink, colours := inkAndColours(img)
	t.Logf("screenshot %v: %.1f %% ink, %d colours", img.Bounds().Size(), 100*ink, colours)
	if ink < 0.02 || colours < 8 {
		t.Errorf("the screenshot looks blank: %.2f %% of pixels not white, %d colours", 100*ink, colours)
	}

	pdf := filepath.Join(dir, "report.pdf")
	runChromium(t, browser, page, "--print-to-pdf="+pdf, "--no-pdf-header-footer")
	data, err := os.ReadFile(pdf)
	if err != nil {
		t.Fatalf("no PDF: %v", err)
	}
	pages := len(regexp.MustCompile(`/Type\s*/Page\b`).FindAll(data, -1))
	ids, _, _ := htmlOutline(t, buf.Bytes())
	t.Logf("printed to %d A4 pages", pages)
	if pages < len(ids) {
		t.Errorf("printed to %d pages; each of the %d sections should start a page", pages, len(ids))
	}
}

// inkAndColours returns the share of pixels that are not near white and
// the number of distinct colours (quantised) in img.
func inkAndColours(img image.Image) (float64, int) {
	b := img.Bounds()
	ink, total := 0, 0
	seen := map[uint32]bool{}
	for y := b.Min.Y; y < b.Max.Y; y += 2 {
		for x := b.Min.X; x < b.Max.X; x += 2 {
			r, g, bl, _ := img.At(x, y).RGBA()
			total++
			if r < 0xe000 || g < 0xe000 || bl < 0xe000 {
				ink++
			}
			seen[(r>>12)<<8|(g>>12)<<4|bl>>12] = true
		}
	}
	return float64(ink) / float64(total), len(seen)
}
