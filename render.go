package sagspan

import (
	"encoding/json"
	"fmt"
	"io"
	"strings"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// The full report is a list of sections (check.Section) that every
// format lays out: the design basis, then the check report's sections
// (failures first, when any; the governing cases; their values, notes and
// bases), then the parts below. To add a part to the text, Markdown and
// HTML reports, add its builder to reportParts.
var reportParts = []func(*Analysis) check.Section{
	(*Analysis).ropeStatesSection,
	(*Analysis).comfortSection,
	(*Analysis).erectionSection,
}

// Sections returns the sections of the full report, in order.
func (a *Analysis) Sections(opts *check.RenderOptions) []check.Section {
	out := []check.Section{a.notCheckedSection(), a.designBasisSection()}
	out = append(out, a.Report.Sections(a.renderOptions(opts))...)
	for _, part := range reportParts {
		out = append(out, part(a))
	}
	return out
}

// renderOptions returns opts with Explain set, when the caller has not,
// to say why a row has nothing to check.
func (a *Analysis) renderOptions(opts *check.RenderOptions) *check.RenderOptions {
	o := check.RenderOptions{}
	if opts != nil {
		o = *opts
	}
	if o.Explain == nil {
		o.Explain = a.explain
	}
	return &o
}

// explain says why nothing acts on a result, where the description tells.
func (a *Analysis) explain(r check.Result) string {
	for side := Left; side <= Right; side++ {
		bank := a.Bridge.Banks.Left
		if side == Right {
			bank = a.Bridge.Banks.Right
		}
		if !strings.HasPrefix(r.Element, side.String()+" ") || strings.Contains(r.Element, "across") {
			continue
		}
		if bank.Tower.Saddle.Kind == "roller" && (strings.Contains(r.Element, "tower") || strings.Contains(r.Element, "footing")) {
			return "roller saddle: the ropes put no horizontal force on the column"
		}
	}
	return ""
}

// WriteText writes the full report as aligned plain text: the caution and
// the verdict, the design basis, the failures (when any), the governing
// result of every check (every result with opts.All), their values, notes
// and bases, the rope states per load case, the natural frequencies and
// the erection tables.
func (a *Analysis) WriteText(w io.Writer, opts *check.RenderOptions) error {
	return a.write(w, check.Text, opts)
}

// WriteMarkdown writes the full report as Markdown, with the same content
// as WriteText.
func (a *Analysis) WriteMarkdown(w io.Writer, opts *check.RenderOptions) error {
	return a.write(w, check.Markdown, opts)
}

func (a *Analysis) write(w io.Writer, f check.Format, opts *check.RenderOptions) error {
	if err := a.Report.Head(w, f); err != nil {
		return err
	}
	for _, s := range a.Sections(opts) {
		if err := check.WriteSection(w, f, s, 2); err != nil {
			return err
		}
	}
	return nil
}

func (a *Analysis) ropeStatesSection() check.Section {
	s := check.Section{ID: "rope-states", Title: "Rope states, characteristic loads",
		Head: []string{"Case", "Group", "H", "Max tension", "Angle left", "Angle right", "Midspan sag", "Lowest rope point"}}
	for _, cs := range a.Service {
		for _, g := range cs.Groups {
			s.Rows = append(s.Rows, []string{
				cs.Case.Name, g.Group, g.H.String(), g.MaxTension.String(),
				g.Angle[Left].String(), g.Angle[Right].String(), g.Sag.String(),
				fmt.Sprintf("%s at x = %s", units.Format(float64(a.Bridge.Site.LeftSaddle+g.LowZ), units.KindLength), g.LowX),
			})
		}
	}
	return s
}

func (a *Analysis) erectionSection() check.Section {
	s := check.Section{ID: "erection", Title: "Erection tables",
		Text: []string{"The midspan sag below the chord to set the bare ropes to, by rope temperature, so that the finished bridge hangs at its design sag: the chain's own rope model, the bare ropes over the saddles with the backstays, new rope shorter by its constructional stretch."}}
	for _, et := range a.Erection {
		sub := check.Section{Title: et.Group, Head: []string{"Rope temperature", "Sag to set", "H of the group"}, Text: []string{et.Hold}}
		for _, r := range et.Rows {
			sub.Rows = append(sub.Rows, []string{r.Temperature.String(), r.Sag.String(), r.H.String()})
		}
		s.Sub = append(s.Sub, sub)
	}
	return s
}

// analysisJSON is the stable JSON form of an Analysis.
type analysisJSON struct {
	Bridge      string         `json:"bridge"`
	Caution     string         `json:"caution"`
	NotChecked  []string       `json:"not_checked"`
	DesignBasis DesignBasis    `json:"design_basis"`
	Report      check.Report   `json:"report"`
	Cases       []caseJSON     `json:"cases"`
	Modes       modesJSON      `json:"modes"`
	Comfort     *comfortJSON   `json:"comfort,omitempty"`
	Erection    []erectionJSON `json:"erection"`
}

type caseJSON struct {
	Name   string      `json:"name"`
	Groups []groupJSON `json:"groups"`
}

type groupJSON struct {
	Group      string     `json:"group"`
	H          float64    `json:"h_n"`
	MaxTension float64    `json:"max_tension_n"`
	Tension    [2]float64 `json:"saddle_tension_n"`
	Angle      [2]float64 `json:"saddle_angle_rad"`
	Backstay   [2]float64 `json:"backstay_tension_n"`
	Sag        float64    `json:"midspan_sag_m"`
	LowX       float64    `json:"low_point_x_m"`
	LowZ       float64    `json:"low_point_z_m"`
}

type modesJSON struct {
	Swing         float64 `json:"swing_hz"`
	Antisymmetric float64 `json:"antisymmetric_hz"`
	Symmetric     float64 `json:"symmetric_hz"`
	LambdaSq      float64 `json:"lambda_sq"`
}

type erectionJSON struct {
	Group   string       `json:"group"`
	Rows    [][3]float64 `json:"rows_k_m_n"` // temperature K, sag m, H N
	Hold    string       `json:"hold"`
	Stretch float64      `json:"constructional_stretch"`
}

// MarshalJSON writes the analysis with SI values: the design basis, the
// report (failures first), the rope states of every characteristic case,
// the frequencies and the erection tables.
func (a *Analysis) MarshalJSON() ([]byte, error) {
	out := analysisJSON{Bridge: a.Bridge.Name, Caution: check.Caution, NotChecked: a.NotChecked(), DesignBasis: a.DesignBasis(), Report: a.Report}
	for _, cs := range a.Service {
		c := caseJSON{Name: cs.Case.Name}
		for _, g := range cs.Groups {
			c.Groups = append(c.Groups, groupJSON{
				Group: g.Group, H: float64(g.H), MaxTension: float64(g.MaxTension),
				Tension:  [2]float64{float64(g.Tension[0]), float64(g.Tension[1])},
				Angle:    [2]float64{float64(g.Angle[0]), float64(g.Angle[1])},
				Backstay: [2]float64{float64(g.Backstay[0]), float64(g.Backstay[1])},
				Sag:      float64(g.Sag), LowX: float64(g.LowX), LowZ: float64(g.LowZ),
			})
		}
		out.Cases = append(out.Cases, c)
	}
	out.Modes = modesJSON{float64(a.Modes.Swing), float64(a.Modes.Antisymmetric), float64(a.Modes.Symmetric), a.Modes.LambdaSq}
	out.Comfort = a.comfortJSON()
	for _, et := range a.Erection {
		e := erectionJSON{Group: et.Group, Hold: et.Hold, Stretch: et.ConstructionalStretch}
		for _, r := range et.Rows {
			e.Rows = append(e.Rows, [3]float64{float64(r.Temperature), float64(r.Sag), float64(r.H)})
		}
		out.Erection = append(out.Erection, e)
	}
	return json.Marshal(out)
}

// WriteJSON writes the analysis as indented JSON.
func (a *Analysis) WriteJSON(w io.Writer) error {
	b, err := json.MarshalIndent(a, "", "  ")
	if err != nil {
		return err
	}
	_, err = w.Write(append(b, '\n'))
	return err
}
