package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// Span is the geometry of the supports: support A at the origin and
// support B at horizontal distance Length and height Rise above A.
type Span struct {
	Length units.Length // horizontal distance between supports, > 0
	Rise   units.Length // height of support B (right) above support A (left); negative when B is lower
}

// Chord returns the straight-line distance between the supports:
//
//	c = √(L² + h²)
func (s Span) Chord() units.Length {
	return units.Length(math.Hypot(float64(s.Length), float64(s.Rise)))
}

// Mirror returns the span seen from the other side: B becomes A, so the
// rise changes sign.
func (s Span) Mirror() Span { return Span{Length: s.Length, Rise: -s.Rise} }

// Validate returns an error wrapping ErrInvalid unless the length is
// positive and finite and the rise finite.
func (s Span) Validate() error {
	if err := positive("span length", float64(s.Length)); err != nil {
		return err
	}
	if !finite(float64(s.Rise)) {
		return invalidf("span rise must be finite, got %g", float64(s.Rise))
	}
	return nil
}

// chordSag returns the vertical distance of z below the chord at x.
func (s Span) chordSag(x, z float64) float64 {
	return float64(s.Rise)*x/float64(s.Length) - z
}
