package sagspan

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
	"github.com/sagspan/sagspan/vibration"
)

// ComfortSpec sets the assessment of walkers' comfort: the damping of the
// modes, the traffic the walkway sees and whether the modal analysis takes
// in the backstays. Every zero field takes its default.
type ComfortSpec struct {
	// Damping is the ratio of critical damping of every mode; zero takes
	// the default of the deck: 0.4 % for steel, 1.0 % for timber (Sétra
	// 2006, from memory; the lower values, as for comfort, of common
	// practice).
	Damping float64 `json:"damping,omitempty"`
	// Deck is the walkway's material that sets the default damping:
	// "steel" or "timber"; empty means steel, the lower damping.
	Deck string `json:"deck,omitempty"`
	// Traffic is the walkers' traffic class: "sparse" (default, 0.5
	// walkers per m², normal use), "dense" (0.8) or "very dense" (1.0).
	Traffic string `json:"traffic,omitempty"`
	// Backstays is whether the modal analysis lets the ropes render over
	// fixed and sliding saddles into their backstays, and roller saddles
	// move with the backstays holding them; false holds the ropes at the
	// saddles, as the closed form does.
	Backstays bool `json:"backstays,omitempty"`
}

// Default damping ratios by deck (Sétra 2006, from memory).
const (
	defaultDampingSteel  = 0.004
	defaultDampingTimber = 0.010
	// maxDamping bounds the damping a description may give: beyond 20 % a
	// footbridge has dampers this analysis does not model.
	maxDamping = 0.2
	// crowdDensity is the crowd the walkway holds while people still walk,
	// for the lock-in number: 1 walker per m², the densest traffic class
	// of Sétra 2006 (from memory).
	crowdDensity = 1.0
)

var trafficNames = map[string]vibration.Traffic{
	"":           vibration.Sparse,
	"sparse":     vibration.Sparse,
	"dense":      vibration.Dense,
	"very dense": vibration.VeryDense,
}

func (b Bridge) validateComfort(v *validator) {
	c := b.Comfort
	if math.IsNaN(c.Damping) || c.Damping < 0 || c.Damping > maxDamping {
		v.fail(at("comfort.damping"), "must be zero (default) or a ratio of critical damping up to %v, got %v", maxDamping, c.Damping)
	}
	switch c.Deck {
	case "", "steel", "timber":
	default:
		v.fail(at("comfort.deck"), "unknown deck %q; want steel or timber", c.Deck)
	}
	if _, ok := trafficNames[c.Traffic]; !ok {
		v.fail(at("comfort.traffic"), "unknown traffic %q; want sparse, dense or very dense", c.Traffic)
	}
}

// damping returns the damping ratio of the description and how it was set.
func (c ComfortSpec) damping() (float64, string) {
	switch {
	case c.Damping > 0:
		return c.Damping, "given in the description"
	case c.Deck == "timber":
		return defaultDampingTimber, "the default for a timber deck, Sétra 2006, from memory"
	}
	return defaultDampingSteel, "the default for a steel deck or bare ropes, Sétra 2006, from memory"
}

// Comfort is the dynamics of the finished bridge under its permanent load:
// the discretised modes beside the closed form, and the walkers' response.
type Comfort struct {
	// Modal holds the discretised modes.
	Modal vibration.Modal
	// Closed is the closed form of Irvine & Caughey for the same state.
	Closed cable.Modes
	// Walkers is the traffic and damping assessed.
	Walkers vibration.Walkers
	// Responses are the accelerations of the modes in a critical range
	// or excited by the load model (ψ > 0), and LockIns the lock-in
	// numbers of the lateral ones.
	Responses []vibration.Response
	LockIns   []vibration.LockIn
	// Backstays reports whether the backstays took part, Strict whether
	// comfort was a limit state.
	Backstays, Strict bool
}

// closedForm returns the Irvine–Caughey frequencies of the whole rope
// system in the permanent state: total H, mass and EA; the bridge hangs at
// the sag its total weight and tension give, w l²/(8H) (the weighted
// harmonic mean of the groups' sags).
func (m *model) closedForm(perm CaseState) (cable.Modes, error) {
	var h units.Force
	var w units.LoadPerLength
	var ea units.AxialStiffness
	for i, g := range m.groups {
		h += perm.Groups[i].H
		w += m.ref[i].Load.Uniform
		ea += g.elastic.EA
	}
	mass := units.MassPerLength(float64(w) / units.StandardGravity)
	modes, err := cable.Frequencies(m.span, h, mass, ea)
	if err != nil {
		return cable.Modes{}, fmt.Errorf("sagspan: natural frequencies: %w", err)
	}
	return modes, nil
}

// vibrationModel returns the bridge in its permanent state as a model for
// modal analysis. Each rope group is split equally between two rope planes
// at the edges of the walkway, y = ±width/2, every rope tied to the
// walkway's cross-section (cross-beams, posts and fencing taken as rigid);
// the walkway's mass spread across its width at the walkway ropes' level.
func (m *model) vibrationModel(perm CaseState, backstays bool) vibration.Model {
	b := m.b
	half := b.Walkway.Width / 2
	vm := vibration.Model{
		Span: b.Site.Span, Rise: b.Site.Rise,
		Walkway: vibration.Walkway{Mass: m.walkwayMass(), Width: b.Walkway.Width},
	}
	for i, g := range m.groups {
		gs := perm.Groups[i]
		var ends [2]vibration.End
		if backstays {
			for side := Left; side <= Right; side++ {
				bs := m.backstays[i][side]
				kind := vibration.Renders
				if saddleKind(m.bank(side).Tower.Saddle) == tower.Roller {
					kind = vibration.Rolls
				}
				ends[side] = vibration.End{Kind: kind, Backstay: vibration.Backstay{Length: bs.chord, Angle: bs.angle, Tension: gs.Backstay[side] / 2}}
			}
		}
		for _, y := range [2]units.Length{half, -half} {
			side := "left"
			if y < 0 {
				side = "right"
			}
			vm.Ropes = append(vm.Ropes, vibration.Rope{
				Name: g.Name + ", " + side + " plane", Y: y, Z: g.Offset,
				Shape: gs.shape, H: gs.H / 2,
				Mass: units.MassPerLength(float64(g.self)/units.StandardGravity) / 2,
				EA:   g.elastic.EA / 2, Tied: true, Ends: ends,
			})
		}
	}
	return vm
}

// modalMethod says how the modes were found, and modalBasis that with
// the closed form beside them.
const (
	modalMethod = "lumped-mass modal analysis about the permanent state at the reference temperature " +
		"(tensioned rope elements, axial and geometric stiffness; longitudinal, lateral and vertical degrees of freedom; gonum EigenSym); " +
		"each rope group split equally between two planes at the walkway's edges, every rope tied to the walkway's rigid cross-section"
	modalBasis = modalMethod + "; beside the closed form of Irvine & Caughey (1974, from memory)"
)

// comfort runs the comfort stage: the closed form always; with it, unless
// switched off, the modal analysis, the accelerations of the modes in a
// critical range or excited by the load model and the lateral lock-in
// numbers.
func (m *model) comfort(a *Analysis, perm CaseState, opts *Options) error {
	closed, err := m.closedForm(perm)
	if err != nil {
		return err
	}
	a.Modes = closed
	if opts.SkipComfort {
		a.Report.Add(
			closedFrequency("bridge.frequency.vertical_antisymmetric", "First in-plane antisymmetric frequency", closed.Antisymmetric, vibration.Up, opts.StrictComfort),
			closedFrequency("bridge.frequency.vertical_symmetric", "First in-plane symmetric frequency", closed.Symmetric, vibration.Up, opts.StrictComfort),
			closedFrequency("bridge.frequency.lateral", "First out-of-plane (swing) frequency", closed.Swing, vibration.Across, opts.StrictComfort),
		)
		return nil
	}
	spec := m.b.Comfort
	vm := m.vibrationModel(perm, spec.Backstays)
	modal, err := vm.Modes(opts.Modal)
	if err != nil {
		return fmt.Errorf("sagspan: modal analysis: %w", err)
	}
	damping, _ := spec.damping()
	c := &Comfort{Modal: modal, Closed: closed, Backstays: spec.Backstays, Strict: opts.StrictComfort,
		Walkers: vibration.Walkers{Traffic: trafficNames[spec.Traffic], Damping: damping}}
	a.Comfort = c

	// The first mode of each kind, beside the closed form.
	for _, f := range []struct {
		id, title string
		kind      vibration.Kind
		symmetric bool
		closed    units.Frequency
	}{
		{"bridge.frequency.vertical_antisymmetric", "First vertical antisymmetric frequency", vibration.Vertical, false, closed.Antisymmetric},
		{"bridge.frequency.vertical_symmetric", "First vertical symmetric frequency", vibration.Vertical, true, closed.Symmetric},
		{"bridge.frequency.lateral", "First lateral frequency", vibration.Lateral, true, closed.Swing},
		{"bridge.frequency.torsional", "First torsional frequency", vibration.Torsional, true, 0},
	} {
		i := c.first(f.kind, f.symmetric)
		if i < 0 {
			continue
		}
		md := modal.Modes[i]
		r := check.Record(f.id, f.title, units.KindFrequency, float64(md.Frequency)).
			For("span", "permanent").
			WithBasis(modalBasis).
			WithValues(
				check.Of("f", "natural frequency, discretised", md.Frequency),
				check.Of("M*", "modal mass, largest displacement of the walking surface 1", md.ModalMass),
				check.Of("ε_h", "estimated discretisation error (reads low)", units.Ratio(md.Error)),
				check.Of("n_el", "elements along the span", units.Ratio(modal.Elements)),
			)
		if f.closed > 0 {
			r = r.WithValues(
				check.Of("f_IC", "closed form of Irvine & Caughey", f.closed),
				check.Of("Δ", "discretised over closed form, less 1", units.Ratio(float64(md.Frequency/f.closed)-1)),
			)
		}
		dir := vibration.Up
		if f.kind == vibration.Lateral {
			dir = vibration.Across
		}
		if lo, hi, in := walkersExcite(md.Frequency, md.Frequency/units.Frequency(1-md.Error), dir); in {
			r.Status = check.Flag
			r = r.WithNote(fmt.Sprintf("lies in the range %s–%s that walkers excite: see the acceleration under walkers", lo, hi))
		}
		a.Report.Add(r)
	}

	walkCase := fmt.Sprintf("walkers, %s traffic", c.Walkers.Traffic)
	area := float64(m.b.Site.Span) * float64(m.b.Walkway.Width)
	crowd := crowdDensity * area
	crowdCase := fmt.Sprintf("crowd of %.0f walkers", crowd)
	for i, md := range modal.Modes {
		element := fmt.Sprintf("mode %d (%s)", i+1, md.Label())
		dir := vibration.Up
		switch md.Kind {
		case vibration.Vertical, vibration.Torsional:
		case vibration.Lateral:
			dir = vibration.Across
		default:
			continue
		}
		// Every mode in a critical range and every mode the load model
		// excites (ψ > 0, which reaches past the critical ranges: laterally
		// 0.3–1.3 Hz against 0.5–1.2 Hz), its frequency read up to the one
		// the mesh's estimated error corrects to.
		if _, _, in := walkersExcite(md.Frequency, md.Frequency/units.Frequency(1-md.Error), dir); !in {
			continue
		}
		resp, err := modal.Response(i, c.Walkers)
		if err != nil {
			return fmt.Errorf("sagspan: comfort, %s: %w", element, err)
		}
		c.Responses = append(c.Responses, resp)
		a.Report.Add(strict(resp.Check().For(element, walkCase), opts.StrictComfort))
		if md.Kind == vibration.Lateral {
			li, err := modal.LockIn(i, damping, crowd)
			if err != nil {
				return fmt.Errorf("sagspan: lock-in, %s: %w", element, err)
			}
			c.LockIns = append(c.LockIns, li)
			a.Report.Add(strict(li.Check().For(element, crowdCase), opts.StrictComfort))
		}
	}
	return nil
}

// first returns the index of the lowest mode of the kind (and, for
// vertical modes, symmetry), or -1.
func (c *Comfort) first(kind vibration.Kind, symmetric bool) int {
	for i, md := range c.Modal.Modes {
		if md.Kind == kind && (kind != vibration.Vertical || md.Symmetric == symmetric) {
			return i
		}
	}
	return -1
}

// closedOf maps the index of the first mode of each kind the closed form
// gives to the closed form's frequency.
func (c *Comfort) closedOf() map[int]units.Frequency {
	out := map[int]units.Frequency{}
	for _, p := range []struct {
		kind      vibration.Kind
		symmetric bool
		f         units.Frequency
	}{{vibration.Vertical, false, c.Closed.Antisymmetric}, {vibration.Vertical, true, c.Closed.Symmetric}, {vibration.Lateral, true, c.Closed.Swing}} {
		if i := c.first(p.kind, p.symmetric); i >= 0 {
			out[i] = p.f
		}
	}
	return out
}

// strict fails a flagged result when comfort is a limit state.
func strict(r check.Result, on bool) check.Result {
	if on && r.Status == check.Flag {
		r.Status = check.Fail
	}
	return r
}

const closedBasis = "Irvine–Caughey linear theory of a sagging cable (from memory), the modal analysis switched off; " +
	"critical ranges vertical 1.25–2.3 and 2.5–4.6 Hz, lateral 0.5–1.2 Hz " +
	"(Živanović, Pavić & Reynolds 2005, from memory), and wherever the harmonics of Sétra 2006 excite the mode (ψ > 0: laterally 0.3–1.3 Hz; from memory); EN 1990 A2.4.3.2 asks for a " +
	"comfort check below 5 Hz vertical and 2.5 Hz lateral (from memory)"

// closedFrequency is a closed-form frequency, flagged (failed when strict)
// where walkers excite it, for when the modal analysis is switched off.
func closedFrequency(id, title string, f units.Frequency, dir vibration.Direction, strictOn bool) check.Result {
	r := check.Record(id, title, units.KindFrequency, float64(f)).For("span", "permanent").WithBasis(closedBasis).
		WithValues(check.Of("f_IC", "closed form of Irvine & Caughey", f))
	if lo, hi, in := walkersExcite(f, f, dir); in {
		r.Status = check.Flag
		if strictOn {
			r.Status, r.Ratio = check.Fail, math.Inf(1)
		}
		return r.WithNote(fmt.Sprintf("%s lies in the range %s–%s that walkers excite: assess the response or change the design", f, lo, hi))
	}
	return r
}

// walkersExcite reports whether a mode whose frequency lies between lo and
// hi (the mesh's and its corrected one; the same for a closed form) is
// one that walkers excite in direction dir, and names the range: a
// critical range (vertical 1.25–2.3 and 2.5–4.6 Hz, lateral 0.5–1.2 Hz),
// else the band of a harmonic of the load model where its ψ > 0 (the
// lateral one reaches 0.3–1.3 Hz).
func walkersExcite(lo, hi units.Frequency, dir vibration.Direction) (from, to units.Frequency, in bool) {
	ranges, harmonics := vibration.VerticalRanges, []vibration.Harmonic{vibration.VerticalFirst, vibration.VerticalSecond}
	if dir == vibration.Across {
		ranges, harmonics = vibration.LateralRanges, []vibration.Harmonic{vibration.LateralFirst}
	}
	for _, r := range ranges {
		if hi >= r[0] && lo <= r[1] {
			return r[0], r[1], true
		}
	}
	for _, h := range harmonics {
		if h.PsiMax(lo, hi) > 0 {
			return h.F1, h.F4, true
		}
	}
	return 0, 0, false
}
