package sagspan

import (
	"encoding/json"
	"fmt"
	"io"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// WriteText writes the full report as aligned plain text: the caution, the
// governing result of every check (every result with opts.All), the rope
// states per load case, the natural frequencies and the erection tables.
func (a *Analysis) WriteText(w io.Writer, opts *check.RenderOptions) error {
	if err := a.Report.WriteText(w, opts); err != nil {
		return err
	}
	return a.writeExtras(w, check.Text)
}

// WriteMarkdown writes the full report as Markdown, with the same content
// as WriteText.
func (a *Analysis) WriteMarkdown(w io.Writer, opts *check.RenderOptions) error {
	if err := a.Report.WriteMarkdown(w, opts); err != nil {
		return err
	}
	return a.writeExtras(w, check.Markdown)
}

func (a *Analysis) writeExtras(w io.Writer, f check.Format) error {
	var rows [][]string
	for _, cs := range a.Service {
		for _, g := range cs.Groups {
			rows = append(rows, []string{
				cs.Case.Name, g.Group, g.H.String(), g.MaxTension.String(),
				g.Angle[Left].String(), g.Angle[Right].String(), g.Sag.String(),
				fmt.Sprintf("%s at x = %s", units.Format(float64(a.Bridge.Site.LeftSaddle+g.LowZ), units.KindLength), g.LowX),
			})
		}
	}
	if err := check.WriteTable(w, f, "Rope states, characteristic loads",
		[]string{"Case", "Group", "H", "Max tension", "Angle left", "Angle right", "Midspan sag", "Lowest rope point"}, rows); err != nil {
		return err
	}
	if err := a.writeComfort(w, f); err != nil {
		return err
	}
	for _, et := range a.Erection {
		var rows [][]string
		for _, r := range et.Rows {
			rows = append(rows, []string{r.Temperature.String(), r.Sag.String(), r.H.String()})
		}
		heading := "Erection table: " + et.Group + " (bare ropes, midspan sag below the chord)"
		if err := check.WriteTable(w, f, heading, []string{"Rope temperature", "Sag to set", "H of the group"}, rows); err != nil {
			return err
		}
	}
	return nil
}

// analysisJSON is the stable JSON form of an Analysis.
type analysisJSON struct {
	Bridge   string         `json:"bridge"`
	Caution  string         `json:"caution"`
	Report   check.Report   `json:"report"`
	Cases    []caseJSON     `json:"cases"`
	Modes    modesJSON      `json:"modes"`
	Comfort  *comfortJSON   `json:"comfort,omitempty"`
	Erection []erectionJSON `json:"erection"`
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
	Group string       `json:"group"`
	Rows  [][3]float64 `json:"rows_k_m_n"` // temperature K, sag m, H N
}

// MarshalJSON writes the analysis with SI values: the report, the rope
// states of every characteristic case, the frequencies and the erection
// tables.
func (a *Analysis) MarshalJSON() ([]byte, error) {
	out := analysisJSON{Bridge: a.Bridge.Name, Caution: check.Caution, Report: a.Report}
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
		e := erectionJSON{Group: et.Group}
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
