package sagspan

import (
	"fmt"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/vibration"
)

// comfortSection is the comfort part of the report: the modes of the
// modal analysis beside the closed form with the walkers' response of each
// mode in a critical range, and the lateral lock-in crowd, each table with
// its basis once, in words; the closed form alone when the modal analysis
// is switched off.
func (a *Analysis) comfortSection() check.Section {
	cm := a.Modes
	c := a.Comfort
	if c == nil {
		return check.Section{ID: "comfort", Title: "Natural frequencies (permanent load, closed form; modal analysis switched off)",
			Head: []string{"Mode", "Frequency"}, Rows: [][]string{
				{"first out-of-plane (swing)", cm.Swing.String()},
				{"first in-plane antisymmetric", cm.Antisymmetric.String()},
				{"first in-plane symmetric", cm.Symmetric.String()},
				{"Irvine's λ²", fmt.Sprintf("%.1f", cm.LambdaSq)},
			}}
	}
	over := check.Flag
	if c.Strict {
		over = check.Fail
	}
	closedOf := c.closedOf()
	resp := map[int]vibration.Response{}
	for _, r := range c.Responses {
		resp[r.Mode] = r
	}
	ends := "the ropes held at the saddles"
	if c.Backstays {
		ends = "the ropes rendering over fixed and sliding saddles into the backstays, roller saddles moving with them"
	}
	damping, how := a.Bridge.Comfort.damping()
	modes := check.Section{ID: "modes", Title: "Natural modes (permanent load)",
		Text: []string{
			fmt.Sprintf("Modes: %s, %d elements along the span, %s; mesh error is the estimated discretisation error (the lumped chain reads low). "+
				"Closed form: Irvine & Caughey (1974, from memory), ropes held at the saddles, λ² = %.1f, beside the first mode of each kind it gives.",
				modalMethod, c.Modal.Elements, ends, cm.LambdaSq),
			fmt.Sprintf("Walkers: %s traffic, %.1f per m²; the harmonic load model of Sétra 2006 (from memory) on each mode in a critical range "+
				"(Živanović, Pavić & Reynolds 2005, from memory), a single mode at resonance, a = F*/(2ξM*), with the modal mass at unit largest "+
				"displacement of the walking surface; damping ξ = %.2f %% (%s); limits EN 1990 A2.4.3.2 (from memory).",
				c.Walkers.Traffic, c.Walkers.Traffic.Density(), 100*damping, how),
		},
		Head: []string{"Mode", "Kind", "Frequency", "Mesh error", "Closed form", "Difference", "Modal mass", "Critical range", "Acceleration", "Limit", "Status"}}
	for i, md := range c.Modal.Modes {
		row := []string{fmt.Sprint(i + 1), md.Label(), md.Frequency.String(), fmt.Sprintf("%.2f %%", -100*md.Error), "", "", md.ModalMass.String(), "", "", "", ""}
		status := check.Info
		if fc, ok := closedOf[i]; ok {
			row[4] = fc.String()
			row[5] = fmt.Sprintf("%+.1f %%", 100*(float64(md.Frequency/fc)-1))
		}
		if r, ok := resp[i]; ok {
			row[7] = rangeOf(r)
			row[8] = r.Acceleration.String()
			row[9] = r.Limit.String()
			status = check.Pass
			if r.Acceleration > r.Limit {
				status = over
			}
			row[10] = status.String()
		}
		modes.Rows = append(modes.Rows, row)
		modes.Status = append(modes.Status, status)
	}
	sec := check.Section{ID: "comfort", Title: "Comfort", Sub: []check.Section{modes}}
	if len(c.LockIns) == 0 {
		return sec
	}
	lock := check.Section{ID: "lock-in", Title: "Lateral lock-in",
		Text: []string{fmt.Sprintf("N_L = 8πξfM*/k, k = %.0f N·s/m (Dallard et al. 2001, from memory), against the crowd the walkway holds at %.0f walker per m² (the densest traffic of Sétra 2006, from memory).",
			vibration.LateralWalkingCoefficient, crowdDensity)},
		Head: []string{"Mode", "Frequency", "Modal mass", "N_L", "Crowd", "Status"}}
	for _, l := range c.LockIns {
		status := check.Pass
		if l.Crowd >= l.Critical {
			status = over
		}
		lock.Rows = append(lock.Rows, []string{fmt.Sprint(l.Mode + 1), l.Frequency.String(), l.ModalMass.String(), fmt.Sprintf("%.1f", l.Critical), fmt.Sprintf("%.0f", l.Crowd), status.String()})
		lock.Status = append(lock.Status, status)
	}
	sec.Sub = append(sec.Sub, lock)
	return sec
}

// rangeOf names the range a response's mode lies in: the critical range,
// else the band where the load model's harmonic excites it.
func rangeOf(r vibration.Response) string {
	lo, hi, _ := walkersExcite(r.Frequency, r.Corrected, r.Direction)
	return fmt.Sprintf("%.2f–%.2f Hz", float64(lo), float64(hi))
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
