package vibration

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Traffic is a pedestrian traffic class of the load model of Sétra 2006
// (from memory): the density of walkers on the walkway.
type Traffic int

// The traffic classes.
const (
	// Sparse: normal use, 0.5 pedestrians per m² (class III).
	Sparse Traffic = iota
	// Dense: busy use, 0.8 pedestrians per m² (class II).
	Dense
	// VeryDense: a crowd, 1.0 pedestrian per m² (class I).
	VeryDense
)

var traffics = [...]struct {
	name    string
	density float64
}{
	Sparse:    {"sparse", 0.5},
	Dense:     {"dense", 0.8},
	VeryDense: {"very dense", 1.0},
}

func (t Traffic) valid() bool { return t >= 0 && int(t) < len(traffics) }

func (t Traffic) String() string {
	if !t.valid() {
		return fmt.Sprintf("Traffic(%d)", int(t))
	}
	return traffics[t].name
}

// Density returns the walkers per square metre of walkway of the class.
func (t Traffic) Density() float64 {
	if !t.valid() {
		return math.NaN()
	}
	return traffics[t].density
}

// Crowd reports whether the class is the exceptional crowd condition
// (very dense, class I), for which EN 1990 A2.4.3.2 allows the larger
// lateral limit. Dense traffic (class II) is busy normal use and keeps the
// normal-use limit: the cautious reading of "exceptional crowd".
func (t Traffic) Crowd() bool { return t == VeryDense }

// Walkers is the pedestrian action on the walkway.
type Walkers struct {
	Traffic Traffic
	// Damping is the ratio of critical damping of every mode.
	Damping float64
}

// Direction is the direction in which walkers excite a mode.
type Direction int

// The directions of excitation.
const (
	Up     Direction = iota // vertical (and torsional) modes
	Across                  // lateral modes
)

func (d Direction) String() string {
	if d == Across {
		return "lateral"
	}
	return "vertical"
}

// Comfort limits of EN 1990 A2.4.3.2 (from memory): the largest
// acceleration of any part of the deck.
const (
	LimitVertical     units.Acceleration = 0.7
	LimitLateral      units.Acceleration = 0.2 // normal use
	LimitLateralCrowd units.Acceleration = 0.4 // crowd conditions
)

// Critical ranges of footbridge frequencies (from memory; widely cited,
// e.g. Živanović, Pavić & Reynolds 2005): walkers' vertical force at its
// first harmonic 1.25–2.3 Hz and its second 2.5–4.6 Hz; their lateral
// force 0.5–1.2 Hz. The lateral ψ of the load model reaches wider,
// 0.3–1.3 Hz (see LateralFirst): an assessment selects modes by ψ > 0 as
// well as by these ranges.
var (
	VerticalRanges = [][2]units.Frequency{{1.25, 2.3}, {2.5, 4.6}}
	LateralRanges  = [][2]units.Frequency{{0.5, 1.2}}
)

// InRange reports whether f lies in one of the ranges, and which.
func InRange(f units.Frequency, ranges [][2]units.Frequency) (int, bool) {
	for i, r := range ranges {
		if f >= r[0] && f <= r[1] {
			return i, true
		}
	}
	return 0, false
}

// Harmonic is one harmonic of the walkers' force in the load model: the
// force amplitude per walker and the reduction ψ(f) for a mode's distance
// from the likely walking frequencies, a trapezoid
//
//	ψ = 0 below f₁, rising linearly to 1 at f₂, 1 up to f₃, falling to 0 at f₄
//
// (Sétra 2006, from memory).
type Harmonic struct {
	Name           string
	Direction      Direction
	Force          units.Force
	F1, F2, F3, F4 units.Frequency
}

// Psi returns ψ(f).
func (h Harmonic) Psi(f units.Frequency) float64 {
	switch {
	case f <= h.F1 || f >= h.F4:
		return 0
	case f < h.F2:
		return float64((f - h.F1) / (h.F2 - h.F1))
	case f <= h.F3:
		return 1
	}
	return float64((h.F4 - f) / (h.F4 - h.F3))
}

// PsiMax returns the largest ψ(f) over the band lo ≤ f ≤ hi: the
// trapezoid rises, holds and falls, so its largest value over a band is 1
// where the band meets the plateau and otherwise that of the nearer end.
func (h Harmonic) PsiMax(lo, hi units.Frequency) float64 {
	if hi < lo {
		lo, hi = hi, lo
	}
	if hi >= h.F2 && lo <= h.F3 {
		return 1
	}
	return math.Max(h.Psi(lo), h.Psi(hi))
}

// The harmonics of the load model (Sétra 2006, from memory): 280 N
// vertical at the first harmonic of walking, 70 N at the second, 35 N
// lateral at the first.
var (
	VerticalFirst  = Harmonic{"vertical, first harmonic", Up, 280, 1.25, 1.7, 2.1, 2.3}
	VerticalSecond = Harmonic{"vertical, second harmonic", Up, 70, 2.5, 3.4, 4.2, 4.6}
	LateralFirst   = Harmonic{"lateral, first harmonic", Across, 35, 0.3, 0.5, 1.1, 1.3}
)

// EquivalentNumber returns the number n' of walkers in phase with the mode
// that gives the same response as n walkers at random (Sétra 2006, from
// memory):
//
//	n' = 10.8 √(ξ n)   sparse and dense traffic
//	n' = 1.85 √n       very dense traffic
func EquivalentNumber(t Traffic, damping, n float64) float64 {
	if t == VeryDense {
		return 1.85 * math.Sqrt(n)
	}
	return 10.8 * math.Sqrt(damping*n)
}

// Response is the steady resonant response of one mode to the walkers.
type Response struct {
	Mode      int // index in Modal.Modes
	Label     string
	Frequency units.Frequency
	Direction Direction
	// Corrected is the frequency corrected for the mesh's estimated error,
	// f/(1 − ε_h) (see Mode.Error): the lumped chain reads low, so the
	// true frequency lies between Frequency and about Corrected.
	Corrected units.Frequency
	Harmonic  Harmonic
	Traffic   Traffic
	Damping   float64
	// ModalMass is the mode's M* (see Mode.ModalMass).
	ModalMass units.Mass
	// Area is the walkway's area S; Walkers the number n = d·S on it;
	// Equivalent the number n' in phase with the mode.
	Area                units.Area
	Walkers, Equivalent float64
	Psi                 float64
	// Load is the amplitude of the distributed force, p = n'·F·ψ/S, and
	// ModalForce the modal force F* = p ∫|φ| dA, the load taken in the
	// direction of the mode shape everywhere.
	Load       units.Pressure
	ModalForce units.Force
	// Acceleration is the largest acceleration of the walking surface,
	// a = F*/(2ξM*), against Limit.
	Acceleration, Limit units.Acceleration
}

// Response returns the resonant response of mode i of md to walkers w
// with the harmonic of the load model that the mode's frequency and
// direction call for (the one with the larger ψ·F), ψ the largest over the
// band from the mode's frequency to that frequency corrected for the
// mesh's estimated error, f/(1 − ε_h): the lumped chain reads low, and on
// the rising side of ψ(f) the mesh's own frequency would read ψ low. The
// mode is taken at
// resonance, the single-mode steady state
//
//	M* q̈ + 2ξωM* q̇ + ω²M* q = F* cos ωt,   q = F*/(2ξ ω²M*),   a = ω² q = F*/(2ξM*)
//
// (any structural dynamics text, e.g. Clough & Penzien, Dynamics of
// Structures, §3-2), with the largest displacement of the walking surface
// 1 in the mode's scaling. Vertical and torsional modes are excited
// vertically, lateral modes laterally; longitudinal and local rope modes
// are not assessed. It returns an error for a model without a walkway,
// damping not in (0, 1), or an index out of range.
func (md Modal) Response(i int, w Walkers) (Response, error) {
	if i < 0 || i >= len(md.Modes) {
		return Response{}, invalidf("mode %d out of range: the analysis has %d modes", i, len(md.Modes))
	}
	if !(w.Damping > 0 && w.Damping < 1) {
		return Response{}, invalidf("damping ratio must lie between 0 and 1, got %g: with no damping the resonant response is unbounded", w.Damping)
	}
	if !w.Traffic.valid() {
		return Response{}, invalidf("unknown traffic class %d", int(w.Traffic))
	}
	if md.Width <= 0 {
		return Response{}, invalidf("the model has no walkway to walk on")
	}
	mode := md.Modes[i]
	var harmonics []Harmonic
	var dir Direction
	switch mode.Kind {
	case Vertical, Torsional:
		harmonics, dir = []Harmonic{VerticalFirst, VerticalSecond}, Up
	case Lateral:
		harmonics, dir = []Harmonic{LateralFirst}, Across
	default:
		return Response{}, invalidf("mode %d is %s: walkers do not excite it in this load model", i+1, mode.Kind)
	}
	// The lumped chain reads low: the true frequency lies between the
	// mesh's and the corrected one, and ψ is taken at its largest there.
	lo, hi := mode.Frequency, mode.Frequency/units.Frequency(1-mode.Error)
	h := harmonics[0]
	for _, c := range harmonics[1:] {
		if c.PsiMax(lo, hi)*float64(c.Force) > h.PsiMax(lo, hi)*float64(h.Force) {
			h = c
		}
	}
	area := float64(md.Span) * float64(md.Width)
	n := w.Traffic.Density() * area
	r := Response{
		Mode: i, Label: mode.Label(), Frequency: mode.Frequency, Corrected: hi, Direction: dir, Harmonic: h,
		Traffic: w.Traffic, Damping: w.Damping, ModalMass: mode.ModalMass,
		Area: units.Area(area), Walkers: n, Equivalent: EquivalentNumber(w.Traffic, w.Damping, n),
		Psi: h.PsiMax(lo, hi),
	}
	r.Load = units.Pressure(r.Equivalent * float64(h.Force) * r.Psi / area)
	r.ModalForce = units.Force(float64(r.Load) * md.absIntegral(i, dir))
	r.Acceleration = units.Acceleration(float64(r.ModalForce) / (2 * w.Damping * float64(mode.ModalMass)))
	r.Limit = LimitVertical
	if dir == Across {
		r.Limit = LimitLateral
		if w.Traffic.Crowd() {
			r.Limit = LimitLateralCrowd
		}
	}
	if !finite(float64(r.Acceleration)) {
		return Response{}, invalidf("mode %d: the response is not finite", i+1)
	}
	return r, nil
}

// absIntegral returns ∫|φ| dA over the walking surface, φ the mode's
// displacement in direction dir: vertical W + θy across the width, lateral
// V; by the trapezoid rule along the span, exactly across it.
func (md Modal) absIntegral(i int, dir Direction) float64 {
	mode := md.Modes[i]
	b := float64(md.Width)
	c := b / 2
	var sum float64
	for k := 1; k+1 < len(md.Stations); k++ {
		dx := float64(md.Stations[k+1]-md.Stations[k-1]) / 2
		s := mode.Walkway[k]
		if dir == Across {
			sum += dx * b * math.Abs(float64(s.V))
			continue
		}
		a, t := float64(s.W), float64(s.Roll)
		if math.Abs(a) >= math.Abs(t)*c {
			sum += dx * b * math.Abs(a)
		} else {
			// |a + t y| changes sign across the width: two triangles
			sum += dx * ((a+t*c)*(a+t*c) + (a-t*c)*(a-t*c)) / (2 * math.Abs(t))
		}
	}
	return sum
}

// Check returns the response as a comfort check: the acceleration against
// its limit, flagged (never failed) when over it; IDs
// vibration.acceleration.vertical and vibration.acceleration.lateral.
func (r Response) Check() check.Result {
	id := "vibration.acceleration.vertical"
	title := "Vertical acceleration under walkers"
	if r.Direction == Across {
		id, title = "vibration.acceleration.lateral", "Lateral acceleration under walkers"
	}
	res := check.Advisory(id, title, units.KindAcceleration, float64(r.Acceleration), float64(r.Limit)).
		WithBasis(fmt.Sprintf("single mode at resonance a = F*/(2ξM*) under the walkers' harmonic force of Sétra 2006 (%s: %s per walker × ψ(f) × n' in phase, n' = %s; from memory), ψ the largest between f and f_c = f/(1−ε_h), the frequency the mesh's estimated error corrects to (the lumped chain reads low), load in the direction of the mode shape everywhere; limit EN 1990 A2.4.3.2 (from memory)",
			r.Harmonic.Name, r.Harmonic.Force, equivalentRule(r.Traffic))).
		WithValues(
			check.Of("f", "natural frequency", r.Frequency),
			check.Of("f_c", "natural frequency corrected for the mesh's estimated error, f/(1−ε_h)", r.Corrected),
			check.Of("M*", "modal mass, largest displacement of the walking surface 1", r.ModalMass),
			check.Of("ξ", "ratio of critical damping", units.Ratio(r.Damping)),
			check.Of("S", "walkway area", r.Area),
			check.Of("n", "walkers on the walkway", units.Ratio(r.Walkers)),
			check.Of("n'", "equivalent walkers in phase", units.Ratio(r.Equivalent)),
			check.Of("ψ", "reduction for the frequency", units.Ratio(r.Psi)),
			check.Of("F", "force amplitude per walker", r.Harmonic.Force),
			check.Of("p", "distributed force amplitude n'Fψ/S", r.Load),
			check.Of("F*", "modal force p∫|φ|dA", r.ModalForce),
			check.Of("a", "largest acceleration of the walking surface", r.Acceleration),
			check.Of("a_lim", "comfort limit", r.Limit),
		)
	if r.Acceleration > units.Acceleration(units.StandardGravity) {
		res = res.WithNote("the acceleration exceeds g: walkers would lose their footing long before; the linear model only says the walkway is far too lively for this traffic")
	}
	return res
}

func equivalentRule(t Traffic) string {
	if t == VeryDense {
		return "1.85√n, very dense traffic"
	}
	return "10.8√(ξn), " + t.String() + " traffic"
}
