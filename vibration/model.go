package vibration

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// Profile is a rope's static equilibrium in its vertical plane: the
// elevation of the rope above its own support A at horizontal distance x
// from A. The shapes of package cable satisfy it.
type Profile interface {
	Z(x units.Length) units.Length
}

// Rope is one rope of a Model, or several identical ropes that hang side
// by side and move together: their tension, mass and stiffness are then
// summed.
type Rope struct {
	Name string
	// Y is the lateral position of the rope's vertical plane from the
	// bridge axis (y completes x along the span and z up to a right-handed
	// set: positive to the left looking from A to B).
	Y units.Length
	// Z is the height of the rope's supports above the model's supports
	// (the same at A and B; zero for the walkway ropes).
	Z units.Length
	// Shape is the rope's static equilibrium under the weight of the
	// masses it carries, relative to its own support A; it must end at the
	// model's rise at B.
	Shape Profile
	// H is the horizontal component of the rope's tension in that state.
	H units.Force
	// Mass is the rope's own mass per horizontal metre.
	Mass units.MassPerLength
	// EA is the rope's axial stiffness.
	EA units.AxialStiffness
	// Tied ropes move with the walkway's cross-section at every station,
	// as the cross-beams, posts, hangers and fencing of a walkway hold
	// them (taken as rigid). Untied ropes move on their own.
	Tied bool
	// Ends say how the rope is held at A and at B.
	Ends [2]End
}

// EndKind says how a rope is held at a support.
type EndKind int

// The ways a rope is held at a support.
const (
	// Held: the rope is held at the saddle and the span vibrates alone
	// (the assumption of the closed-form theory).
	Held EndKind = iota
	// Renders: the rope renders over a saddle fixed on its column into the
	// backstay, so that the backstay's stretch adds to the span's; groove
	// friction neglected (common practice) and the backstay's own mass and
	// transverse motion neglected.
	Renders
	// Rolls: the saddle rolls along the bridge on its column top; the rope
	// moves with it and only the backstay holds it.
	Rolls
)

var endKindNames = [...]string{Held: "held", Renders: "renders", Rolls: "rolls"}

func (k EndKind) String() string {
	if k < 0 || int(k) >= len(endKindNames) {
		return fmt.Sprintf("EndKind(%d)", int(k))
	}
	return endKindNames[k]
}

// End is how a rope is held at one support.
type End struct {
	Kind EndKind
	// Backstay is the straight rope from the saddle down to the anchor;
	// Renders and Rolls need it.
	Backstay Backstay
}

// Backstay is a straight rope from a saddle down to its anchor, of the
// same rope (and axial stiffness) as the span.
type Backstay struct {
	Length  units.Length // saddle to anchor
	Angle   units.Angle  // below horizontal at the saddle
	Tension units.Force
}

// Walkway is the deck the walkers use. Its mass is spread uniformly across
// its width (roll inertia Mass·Width²/12 per metre, its depth neglected),
// its centre of mass on the bridge axis at the level of the first tied rope
// of the model; it hangs from the tied ropes.
type Walkway struct {
	// Mass per metre of the walkway (cross-beams, deck, fencing), without
	// the ropes.
	Mass units.MassPerLength
	// Width is the walking width.
	Width units.Length
}

// Model is a cable-supported walkway for modal analysis: ropes hanging in
// vertical planes about their static equilibrium, and optionally a
// walkway carried on cross-beams that tie the ropes marked Tied.
type Model struct {
	// Span is the horizontal distance between the supports A and B.
	Span units.Length
	// Rise is the height of B above A.
	Rise  units.Length
	Ropes []Rope
	// Walkway is the deck; zero when the model is ropes only.
	Walkway Walkway
}

// Settings tune the modal analysis. A nil *Settings means the defaults.
type Settings struct {
	// Elements is the number of elements along the span. Zero chooses at
	// least MinElements, and enough that the highest mode kept reads
	// within about 3 % (see Mode.Error).
	Elements int
	// MaxVertical bounds the frequencies kept of vertical, torsional and
	// longitudinal modes; zero means 5 Hz, below which EN 1990 A2.4.3.2
	// asks for a comfort check (from memory).
	MaxVertical units.Frequency
	// MaxLateral bounds the frequencies kept of lateral modes; zero means
	// 2.5 Hz (EN 1990 A2.4.3.2, from memory).
	MaxLateral units.Frequency
}

// Mesh limits. MinElements is what the first frequencies need to converge
// to 0.1 % (TestMeshConvergence); MaxElements bounds the work.
const (
	MinElements = 60
	MaxElements = 400
)

// maxModeError is the estimated discretisation error beyond which a mode
// kept would be too coarse to trust: the mesh is then refused.
const maxModeError = 0.05

// autoModeError is the error of the highest mode kept that the default
// mesh aims at.
const autoModeError = 0.03

// Default cut-off frequencies, EN 1990 A2.4.3.2 (from memory).
const (
	DefaultMaxVertical units.Frequency = 5
	DefaultMaxLateral  units.Frequency = 2.5
)

// equilibriumTolerance is the relative mismatch allowed between the
// weight a rope's static state carries and the weight of its masses.
const equilibriumTolerance = 0.02

// hasWalkway reports whether the model has a walkway cross-section.
func (m Model) hasWalkway() bool { return m.Walkway.Width > 0 || m.Walkway.Mass > 0 }

// firstTied returns the index of the first tied rope, or -1.
func (m Model) firstTied() int {
	for i, r := range m.Ropes {
		if r.Tied {
			return i
		}
	}
	return -1
}

// Validate returns an error wrapping ErrInvalid, naming the field, unless
// the model can be analysed: positive span, tensions, masses and
// stiffnesses; backstays where an end needs one; a walkway with width where
// ropes are tied to it and ropes tied to it where it has mass; and every
// rope's static state ending at the supports and carrying the weight of
// the masses it holds (within 2 %).
func (m Model) Validate() error {
	if err := positive("span", float64(m.Span)); err != nil {
		return err
	}
	if !finite(float64(m.Rise)) || math.Abs(float64(m.Rise)) >= float64(m.Span) {
		return invalidf("rise must be finite and less than the span, got %g m", float64(m.Rise))
	}
	if len(m.Ropes) == 0 {
		return invalidf("the model has no ropes")
	}
	tied := 0
	for i, r := range m.Ropes {
		if err := r.validate(); err != nil {
			return fmt.Errorf("vibration: ropes[%d] (%s): %w", i, r.Name, err)
		}
		if r.Tied {
			tied++
		}
	}
	w := m.Walkway
	if err := nonNegative("walkway mass", float64(w.Mass)); err != nil {
		return err
	}
	if err := nonNegative("walkway width", float64(w.Width)); err != nil {
		return err
	}
	if tied > 0 && w.Width <= 0 {
		return invalidf("ropes are tied to the walkway, but it has no width")
	}
	if w.Mass > 0 && tied == 0 {
		return invalidf("the walkway has mass but no rope is tied to it to carry it")
	}
	return nil
}

func (r Rope) validate() error {
	if r.Shape == nil {
		return invalidf("shape is missing")
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"H", float64(r.H)}, {"mass", float64(r.Mass)}, {"EA", float64(r.EA)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if !finite(float64(r.Y)) || !finite(float64(r.Z)) {
		return invalidf("position y %g m, z %g m must be finite", float64(r.Y), float64(r.Z))
	}
	for side, e := range r.Ends {
		name := [2]string{"end A", "end B"}[side]
		switch e.Kind {
		case Held:
		case Renders, Rolls:
			b := e.Backstay
			if err := positive(name+" backstay length", float64(b.Length)); err != nil {
				return err
			}
			if err := positive(name+" backstay tension", float64(b.Tension)); err != nil {
				return err
			}
			if !(b.Angle > 0 && b.Angle < math.Pi/2) {
				return invalidf("%s backstay angle must lie between 0 and 90 deg, got %s", name, b.Angle)
			}
		default:
			return invalidf("%s: unknown end kind %d", name, int(e.Kind))
		}
	}
	return nil
}

// Frequency bounds of the settings with their defaults.
func (s *Settings) bounds() (vertical, lateral float64, err error) {
	vertical, lateral = float64(DefaultMaxVertical), float64(DefaultMaxLateral)
	if s == nil {
		return vertical, lateral, nil
	}
	if s.MaxVertical != 0 {
		if err := positive("settings: MaxVertical", float64(s.MaxVertical)); err != nil {
			return 0, 0, err
		}
		vertical = float64(s.MaxVertical)
	}
	if s.MaxLateral != 0 {
		if err := positive("settings: MaxLateral", float64(s.MaxLateral)); err != nil {
			return 0, 0, err
		}
		lateral = float64(s.MaxLateral)
	}
	return vertical, lateral, nil
}

// elements returns the number of elements: the settings' own, checked, or
// the default for the model and the frequency bound.
func (m Model) elements(s *Settings, maxFreq float64) (int, error) {
	if s != nil && s.Elements != 0 {
		n := s.Elements
		if n < MinElements {
			return 0, invalidf("mesh too coarse: %d elements along the span; the first frequencies converge to 0.1 %% only from %d", n, MinElements)
		}
		if n > MaxElements {
			return 0, invalidf("mesh of %d elements exceeds the %d this analysis allows", n, MaxElements)
		}
		return n, nil
	}
	// The fundamental of a taut string of the whole tension and mass,
	// f₀ = (1/2L)√(ΣH/Σm), sets how many half-waves the highest mode kept
	// has, k ≈ f/f₀; the lumped chain reads that mode low by about
	// (πk/2n)²/6.
	var h, mass float64
	for _, r := range m.Ropes {
		h += float64(r.H)
		mass += float64(r.Mass)
	}
	mass += float64(m.Walkway.Mass)
	f0 := math.Sqrt(h/mass) / (2 * float64(m.Span))
	k := maxFreq / f0
	n := int(math.Ceil(math.Pi * k / (2 * math.Sqrt(6*autoModeError))))
	return min(max(n, MinElements), MaxElements), nil
}
