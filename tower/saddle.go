package tower

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// RopePull is the pull of one rope on a saddle: the rope tension where it
// leaves the saddle and the rope's angle there, measured below horizontal
// (negative when the rope rises as it leaves the saddle).
type RopePull struct {
	Tension units.Force
	Angle   units.Angle
}

func (p RopePull) validate(name string) error {
	if t := float64(p.Tension); !finite(t) || t < 0 {
		return nonNegative(name+".Tension", p.Tension)
	}
	a := float64(p.Angle)
	if !finite(a) || math.Abs(a) >= math.Pi/2 {
		return invalid(name+".Angle", p.Angle, "must lie strictly between -90 and 90 deg")
	}
	return nil
}

// SaddleKind is the way a saddle passes the unbalanced horizontal rope
// force to the column.
type SaddleKind int

// The saddle kinds.
const (
	// Fixed: the saddle is fixed to the column; the column takes the full
	// unbalanced horizontal force of the two rope pulls.
	Fixed SaddleKind = iota
	// Sliding: the saddle sits on a bearing plate and slides on it once
	// the unbalanced horizontal force exceeds friction; the column takes
	// at most μ·N.
	Sliding
	// Roller: the saddle rolls freely; the column takes no horizontal force.
	Roller
)

var saddleKinds = [...]string{Fixed: "fixed", Sliding: "sliding", Roller: "roller"}

// String returns "fixed", "sliding" or "roller".
func (k SaddleKind) String() string {
	if k < 0 || int(k) >= len(saddleKinds) {
		return fmt.Sprintf("SaddleKind(%d)", int(k))
	}
	return saddleKinds[k]
}

// DefaultSaddleFriction is the friction coefficient used for a sliding
// saddle whose Friction is zero. It is an assumed value for a steel wire
// rope on an unlubricated steel or cast-iron saddle (common practice, not
// from a published source); a higher value is conservative for the column
// and unconservative for the rope. Set Friction for the saddle in hand.
const DefaultSaddleFriction = 0.3

// Saddle is one rope seat on the column: one rope group (the walkway ropes,
// or the handrail ropes) passes over it.
type Saddle struct {
	// Kind is Fixed, Sliding or Roller.
	Kind SaddleKind
	// Friction is the coefficient of friction between rope and saddle,
	// used by sliding saddles; zero means DefaultSaddleFriction.
	Friction float64
	// Height is the height of the saddle seat above the column base section.
	Height units.Length
	// Offset is the horizontal offset of the saddle from the column axis,
	// toward the span positive (usually zero).
	Offset units.Length
}

func (s Saddle) validate() error {
	if s.Kind < Fixed || s.Kind > Roller {
		return invalid("Saddle.Kind", int(s.Kind), "is not Fixed, Sliding or Roller")
	}
	if err := nonNegative("Saddle.Friction", units.Ratio(s.Friction)); err != nil {
		return err
	}
	if err := nonNegative("Saddle.Height", s.Height); err != nil {
		return err
	}
	return isFinite("Saddle.Offset", s.Offset)
}

func (s Saddle) friction() float64 {
	if s.Friction == 0 {
		return DefaultSaddleFriction
	}
	return s.Friction
}

// LevelForce is the force a saddle puts on the column at one level.
type LevelForce struct {
	// Height above the column base section and horizontal Offset from the
	// column axis (toward the span positive) of the point of application.
	Height, Offset units.Length
	// Vertical is positive downward; Horizontal positive toward the span.
	Vertical, Horizontal units.Force
}

// Force returns the force that the two rope pulls put on the column through
// this saddle. With the span-side pull (T_s, α_s) and the backstay pull
// (T_b, α_b), angles below horizontal, equilibrium of the rope on the
// saddle gives
//
//	V   = T_s sin α_s + T_b sin α_b      (down)
//	H_u = T_s cos α_s − T_b cos α_b      (toward the span; the unbalanced force)
//
// and the horizontal force reaching the column is
//
//	Fixed:    H = H_u
//	Sliding:  H = H_u                 when |H_u| ≤ μ·N
//	          H = sign(H_u) · μ·N      otherwise
//	Roller:   H = 0
//
// with N = V. Taking the normal force as the vertical component is the
// usual simplification for a saddle seat that is horizontal at its crest
// (common practice). When |H_u| > μN a sliding saddle slides on its plate
// until the rope tensions re-balance; the forces returned are those on the
// column for the tensions given, so the caller should pass the tensions of
// the slid state (this package does not re-solve the ropes). On a
// roller the horizontal force is the rolling resistance, taken as
// negligible.
//
// Special cases: a rope that leaves the saddle upward on both sides, so
// that V < 0, lifts off a sliding or roller saddle and gives ErrLiftOff; a
// fixed (clamped) saddle passes the upward force to the column. Tensions
// must be finite and ≥ 0, angles strictly between −90° and 90°.
func (s Saddle) Force(span, backstay RopePull) (LevelForce, error) {
	if err := s.validate(); err != nil {
		return LevelForce{}, err
	}
	if err := span.validate("span RopePull"); err != nil {
		return LevelForce{}, err
	}
	if err := backstay.validate("backstay RopePull"); err != nil {
		return LevelForce{}, err
	}
	ss, cs := math.Sincos(float64(span.Angle))
	sb, cb := math.Sincos(float64(backstay.Angle))
	ts, tb := float64(span.Tension), float64(backstay.Tension)
	v := ts*ss + tb*sb
	hu := ts*cs - tb*cb
	h := hu
	switch s.Kind {
	case Sliding, Roller:
		if v < 0 {
			return LevelForce{}, fmt.Errorf("tower: the ropes pull the %s saddle upward by %v and lift off it: %w",
				s.Kind, units.Force(-v), ErrLiftOff)
		}
		if s.Kind == Roller {
			h = 0
		} else if lim := s.friction() * v; math.Abs(hu) > lim {
			h = math.Copysign(lim, hu)
		}
	}
	return LevelForce{Height: s.Height, Offset: s.Offset, Vertical: units.Force(v), Horizontal: units.Force(h)}, nil
}

// Slips reports whether this saddle moves on the column under the given
// pulls: true for a sliding saddle when the unbalanced horizontal force
// exceeds μ·N, and always true for a roller carrying any unbalanced force.
// It reports false for invalid input (which Force rejects).
func (s Saddle) Slips(span, backstay RopePull) bool {
	if s.validate() != nil || span.validate("") != nil || backstay.validate("") != nil {
		return false
	}
	ss, cs := math.Sincos(float64(span.Angle))
	sb, cb := math.Sincos(float64(backstay.Angle))
	v := float64(span.Tension)*ss + float64(backstay.Tension)*sb
	hu := float64(span.Tension)*cs - float64(backstay.Tension)*cb
	switch s.Kind {
	case Sliding:
		return math.Abs(hu) > s.friction()*v
	case Roller:
		return hu != 0
	}
	return false
}
