package sagspan

import (
	"fmt"
	"io"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/vibration"
)

// writeComfort writes the comfort section: the modes, discretised beside
// the closed form, with the accelerations of those in a critical range,
// and the lateral lock-in numbers, each table followed once by its basis;
// with the modal analysis switched off, the closed form alone.
func (a *Analysis) writeComfort(w io.Writer, f check.Format) error {
	cm := a.Modes
	c := a.Comfort
	if c == nil {
		return check.WriteTable(w, f, "Natural frequencies (permanent load, closed form; modal analysis switched off)", []string{"Mode", "Frequency"}, [][]string{
			{"first out-of-plane (swing)", cm.Swing.String()},
			{"first in-plane antisymmetric", cm.Antisymmetric.String()},
			{"first in-plane symmetric", cm.Symmetric.String()},
			{"Irvine's λ²", fmt.Sprintf("%.1f", cm.LambdaSq)},
		})
	}
	over := "flag"
	if c.Strict {
		over = "FAIL"
	}
	closedOf := c.closedOf()
	resp := map[int]vibration.Response{}
	for _, r := range c.Responses {
		resp[r.Mode] = r
	}
	var rows [][]string
	for i, md := range c.Modal.Modes {
		row := []string{fmt.Sprint(i + 1), md.Label(), md.Frequency.String(), fmt.Sprintf("%.2f %%", -100*md.Error), "", "", md.ModalMass.String(), "", "", "", ""}
		if fc, ok := closedOf[i]; ok {
			row[4] = fc.String()
			row[5] = fmt.Sprintf("%+.1f %%", 100*(float64(md.Frequency/fc)-1))
		}
		if r, ok := resp[i]; ok {
			row[7] = rangeOf(r)
			row[8] = r.Acceleration.String()
			row[9] = r.Limit.String()
			row[10] = "pass"
			if r.Acceleration > r.Limit {
				row[10] = over
			}
		}
		rows = append(rows, row)
	}
	if err := check.WriteTable(w, f, "Natural modes and walkers' comfort (permanent load)",
		[]string{"Mode", "Kind", "Frequency", "Mesh error", "Closed form", "Difference", "Modal mass", "Critical range", "Acceleration", "Limit", "Status"}, rows); err != nil {
		return err
	}
	ends := "the ropes held at the saddles"
	if c.Backstays {
		ends = "the ropes rendering over fixed and sliding saddles into the backstays, roller saddles moving with them"
	}
	damping, how := a.Bridge.Comfort.damping()
	basis := fmt.Sprintf("Modes: %s; %d elements along the span, %s; mesh error the estimated discretisation error (the lumped chain reads low). "+
		"Closed form: Irvine & Caughey (1974, from memory), λ² = %.1f, for the first mode of each kind it gives. "+
		"Walkers: %s traffic, %.1f per m²; Sétra 2006 harmonic load model (from memory), a single mode at resonance, a = F*/(2ξM*), "+
		"modal mass at unit largest displacement of the walking surface; damping ξ = %.2f %% (%s); "+
		"limits EN 1990 A2.4.3.2 (from memory); critical ranges Živanović, Pavić & Reynolds 2005 (from memory).",
		modalBasis, c.Modal.Elements, ends, cm.LambdaSq, c.Walkers.Traffic, c.Walkers.Traffic.Density(), 100*damping, how)
	if _, err := io.WriteString(w, basis+"\n\n"); err != nil {
		return err
	}
	if len(c.LockIns) == 0 {
		return nil
	}
	rows = rows[:0]
	for _, l := range c.LockIns {
		status := "pass"
		if l.Crowd >= l.Critical {
			status = over
		}
		rows = append(rows, []string{fmt.Sprint(l.Mode + 1), l.Frequency.String(), l.ModalMass.String(), fmt.Sprintf("%.1f", l.Critical), fmt.Sprintf("%.0f", l.Crowd), status})
	}
	if err := check.WriteTable(w, f, "Lateral lock-in", []string{"Mode", "Frequency", "Modal mass", "N_L", "Crowd", "Status"}, rows); err != nil {
		return err
	}
	_, err := io.WriteString(w, fmt.Sprintf("Lock-in: N_L = 8πξfM*/k, k = %.0f N·s/m (Dallard et al. 2001, from memory), against the crowd the walkway holds at %.0f walker per m² (the densest traffic of Sétra 2006).\n\n",
		vibration.LateralWalkingCoefficient, crowdDensity))
	return err
}

// rangeOf names the critical range a response's mode lies in.
func rangeOf(r vibration.Response) string {
	ranges := vibration.VerticalRanges
	if r.Direction == vibration.Across {
		ranges = vibration.LateralRanges
	}
	k, _ := vibration.InRange(r.Frequency, ranges)
	return fmt.Sprintf("%.2f–%.2f Hz", float64(ranges[k][0]), float64(ranges[k][1]))
}

// comfortJSON is the JSON form of the comfort stage: the modes in SI, with
// the closed form beside the first of each kind; the accelerations and
// lock-in numbers are results in the report, with their values.
type comfortJSON struct {
	Elements  int        `json:"elements"`
	Backstays bool       `json:"backstays"`
	Damping   float64    `json:"damping"`
	Traffic   string     `json:"traffic"`
	Mass      float64    `json:"moving_mass_kg"`
	Modes     []modeJSON `json:"modes"`
}

type modeJSON struct {
	Frequency  float64    `json:"frequency_hz"`
	Kind       string     `json:"kind"`
	Symmetric  bool       `json:"symmetric"`
	HalfWaves  int        `json:"half_waves"`
	ModalMass  float64    `json:"modal_mass_kg"`
	Effective  [3]float64 `json:"effective_mass_xyz_kg"`
	Error      float64    `json:"discretisation_error"`
	ClosedForm *float64   `json:"closed_form_hz,omitempty"`
}

func (a *Analysis) comfortJSON() *comfortJSON {
	c := a.Comfort
	if c == nil {
		return nil
	}
	out := &comfortJSON{Elements: c.Modal.Elements, Backstays: c.Backstays, Damping: c.Walkers.Damping,
		Traffic: c.Walkers.Traffic.String(), Mass: float64(c.Modal.Mass)}
	closed := c.closedOf()
	for i, md := range c.Modal.Modes {
		j := modeJSON{Frequency: float64(md.Frequency), Kind: md.Kind.String(), Symmetric: md.Symmetric, HalfWaves: md.HalfWaves,
			ModalMass: float64(md.ModalMass), Error: md.Error,
			Effective: [3]float64{float64(md.Effective[0]), float64(md.Effective[1]), float64(md.Effective[2])}}
		if f, ok := closed[i]; ok {
			v := float64(f)
			j.ClosedForm = &v
		}
		out.Modes = append(out.Modes, j)
	}
	return out
}
