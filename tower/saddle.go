package tower

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// RopePull is the pull of one rope on a saddle: the rope tension where it
// leaves the saddle and the rope's angle there, measured below horizontal
// in the rope's own plane (negative when the rope rises as it leaves the
// saddle). Wind may turn the plane of a span's ropes about the bridge axis
// by Swing: the pull then has a lateral component T sin α sin ψ across the
// bridge, and a vertical one T sin α cos ψ.
type RopePull struct {
	Tension units.Force
	Angle   units.Angle
	// Swing is the angle by which wind turns the rope's plane from the
	// vertical, positive downwind; zero for a rope in the vertical plane of
	// the bridge (every backstay).
	Swing units.Angle
}

func (p RopePull) validate(name string) error {
	if t := float64(p.Tension); !finite(t) || t < 0 {
		return nonNegative(name+".Tension", p.Tension)
	}
	a := float64(p.Angle)
	if !finite(a) || math.Abs(a) >= math.Pi/2 {
		return invalid(name+".Angle", p.Angle, "must lie strictly between -90 and 90 deg")
	}
	if s := float64(p.Swing); !finite(s) || math.Abs(s) >= math.Pi/2 {
		return invalid(name+".Swing", p.Swing, "must lie strictly between -90 and 90 deg")
	}
	return nil
}

// components returns the pull's horizontal component along the bridge,
// its vertical component (down) and its lateral component (downwind).
func (p RopePull) components() (h, v, lat float64) {
	s, c := math.Sincos(float64(p.Angle))
	t := float64(p.Tension)
	ss, cs := math.Sincos(float64(p.Swing))
	return t * c, t * s * cs, t * s * ss
}

// SaddleKind is the way a saddle is held on the column: what passes the
// unbalanced horizontal rope force to the column.
type SaddleKind int

// The saddle kinds.
const (
	// Fixed: the saddle is fixed to the column; the column takes the full
	// unbalanced horizontal force of the two rope pulls. How the rope sits
	// in its groove is the saddle's Groove.
	Fixed SaddleKind = iota
	// Sliding: the saddle sits on a bearing plate, the rope clamped on it,
	// and slides along the bridge once the unbalanced horizontal force
	// exceeds friction; the column takes at most μ·N.
	Sliding
	// Roller: the saddle rolls along the bridge, the rope clamped on it;
	// the column takes no horizontal force along the bridge.
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

// Groove is the way the rope sits in the groove of a fixed saddle.
type Groove int

// The groove behaviours. They bound one another: a free groove lets the
// most rope pass the saddle, a clamped one none, a groove with friction
// lies between.
const (
	// FreeGroove: the rope renders over the saddle without friction, its
	// tension the same on both sides (T_b = T_s).
	FreeGroove Groove = iota
	// FrictionGroove: the rope grips the groove with friction μ over the
	// wrap angle θ and renders only when the tensions differ by more than
	// the rope-friction (capstan) law allows: T_high/T_low ≤ e^{μθ}.
	FrictionGroove
	// ClampedGroove: the rope is clamped on the saddle; span and backstay
	// carry independent tensions, each with its own unstretched length.
	ClampedGroove
)

var grooves = [...]string{FreeGroove: "free groove", FrictionGroove: "groove with friction", ClampedGroove: "rope clamped"}

// String returns "free groove", "groove with friction" or "rope clamped".
func (g Groove) String() string {
	if g < 0 || int(g) >= len(grooves) {
		return fmt.Sprintf("Groove(%d)", int(g))
	}
	return grooves[g]
}

// DefaultSaddleFriction is the friction coefficient used for a sliding
// saddle whose Friction is zero. It is an assumed value for a steel
// saddle on an unlubricated steel bearing plate (common practice, not from
// a published source); a higher value is conservative for the column and
// unconservative for the rope. Set Friction for the saddle in hand.
const DefaultSaddleFriction = 0.3

// Saddle is one rope seat on the column: one rope group (the walkway ropes,
// or the handrail ropes) passes over it.
type Saddle struct {
	// Kind is Fixed, Sliding or Roller.
	Kind SaddleKind
	// Friction is the coefficient of friction between a sliding saddle and
	// its bearing plate; zero means DefaultSaddleFriction.
	Friction float64
	// Groove is how the rope sits in a fixed saddle's groove; the zero
	// value is FreeGroove. Sliding and roller saddles carry the rope
	// clamped (the saddle moves, not the rope), whatever Groove says.
	Groove Groove
	// GrooveFriction is the coefficient of friction μ between rope and
	// groove of a FrictionGroove; zero makes it a free groove.
	GrooveFriction float64
	// Height is the height of the saddle seat above the column base section.
	Height units.Length
	// Offset is the horizontal offset of the saddle seat from the column
	// axis, toward the span positive: its setting-out offset plus any
	// travel of a sliding or roller saddle.
	Offset units.Length
}

func (s Saddle) validate() error {
	if s.Kind < Fixed || s.Kind > Roller {
		return invalid("Saddle.Kind", int(s.Kind), "is not Fixed, Sliding or Roller")
	}
	if s.Groove < FreeGroove || s.Groove > ClampedGroove {
		return invalid("Saddle.Groove", int(s.Groove), "is not FreeGroove, FrictionGroove or ClampedGroove")
	}
	if err := nonNegative("Saddle.Friction", units.Ratio(s.Friction)); err != nil {
		return err
	}
	if err := nonNegative("Saddle.GrooveFriction", units.Ratio(s.GrooveFriction)); err != nil {
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

// groove returns the groove behaviour that applies: clamped on a sliding
// or roller saddle, free for a friction groove with μ = 0.
func (s Saddle) groove() Groove {
	switch {
	case s.Kind != Fixed:
		return ClampedGroove
	case s.Groove == FrictionGroove && s.GrooveFriction == 0:
		return FreeGroove
	}
	return s.Groove
}

// Behaviour describes in words how the rope and the saddle are held, for
// the basis of a result: "fixed saddle, free groove", "sliding saddle
// (μ 0.05 on its plate), rope clamped".
func (s Saddle) Behaviour() string {
	switch s.Kind {
	case Sliding:
		return fmt.Sprintf("sliding saddle (μ %.3g on its plate), rope clamped on it", s.friction())
	case Roller:
		return "roller saddle, rope clamped on it"
	}
	if s.groove() == FrictionGroove {
		return fmt.Sprintf("fixed saddle, groove with friction μ %.3g (rope-friction law e^{μθ})", s.GrooveFriction)
	}
	return "fixed saddle, " + s.groove().String()
}

// WrapAngle returns the angle θ through which the rope turns over the
// saddle, the angle between the span-side and the backstay tangents:
//
//	cos θ = cos α_s cos α_b − sin α_s sin α_b cos ψ
//
// with ψ the span-side pull's swing; θ = α_s + α_b in the vertical plane.
// Special cases: θ ≤ 0 (a rope that does not bear on the saddle) and θ ≥ π
// are impossible for a rope over a saddle and give ErrInvalid.
func WrapAngle(span, backstay RopePull) (units.Angle, error) {
	if err := span.validate("span RopePull"); err != nil {
		return 0, err
	}
	if err := backstay.validate("backstay RopePull"); err != nil {
		return 0, err
	}
	return wrap(span, backstay)
}

func wrap(span, backstay RopePull) (units.Angle, error) {
	sa, ca := math.Sincos(float64(span.Angle))
	sb, cb := math.Sincos(float64(backstay.Angle))
	cos := ca*cb - sa*sb*math.Cos(float64(span.Swing))
	th := math.Acos(math.Max(-1, math.Min(1, cos)))
	if float64(span.Angle)+float64(backstay.Angle) <= 0 || !(th > 0) {
		return 0, invalid("wrap angle", units.Angle(th), fmt.Sprintf("is impossible: the rope (span side %v, backstay %v below horizontal) does not bear on the saddle",
			span.Angle, backstay.Angle))
	}
	return units.Angle(th), nil
}

// CapstanBound returns the largest ratio of the higher to the lower rope
// tension that a groove with friction coefficient μ holds over wrap angle
// θ without the rope rendering (the rope-friction law of Euler and
// Eytelwein; Meriam & Kraige, Engineering Mechanics: Statics, flexible
// belts):
//
//	T_high / T_low ≤ e^{μθ}
//
// Special cases: μ < 0, μ not finite, θ ≤ 0 or θ ≥ π (no rope over a
// saddle turns through that) give ErrInvalid naming the field.
func CapstanBound(mu float64, theta units.Angle) (float64, error) {
	if !finite(mu) || mu < 0 {
		return 0, invalid("groove friction μ", mu, "must be zero or a positive finite number")
	}
	if th := float64(theta); !finite(th) || th <= 0 || th >= math.Pi {
		return 0, invalid("wrap angle θ", theta, "is impossible for a rope over a saddle: it must lie strictly between 0 and 180 deg")
	}
	return math.Exp(mu * float64(theta)), nil
}

// Motion says what moved over a saddle.
type Motion int

// The motions.
const (
	// Held: neither the rope nor the saddle moved.
	Held Motion = iota
	// Rendered: the rope slid through the groove of a fixed saddle.
	Rendered
	// Travelled: a sliding or roller saddle moved on the column top,
	// carrying the rope with it.
	Travelled
)

// Balance is the rope's balance over a saddle: the backstay tension and
// what moved to reach it.
type Balance struct {
	// Backstay is the backstay tension.
	Backstay units.Force
	// Motion says whether the rope rendered or the saddle travelled;
	// Direction is +1 when the rope (or saddle) moved toward the span,
	// −1 toward the backstay, 0 when held.
	Motion    Motion
	Direction float64
	// Lower and Upper bound the backstay tensions the saddle holds without
	// anything moving: the groove's capstan bound or the plate's friction
	// (equal for a roller, ±Inf where nothing bounds it).
	Lower, Upper units.Force
}

// Balance returns the backstay tension over the saddle, given the
// span-side pull, the backstay's angle and held, the tension the backstay
// would carry were nothing to move (its own unstretched length over its
// chord). Each behaviour holds the backstay tension within an interval;
// nothing moves while held lies in it, and otherwise the rope renders or
// the saddle travels until the tension reaches the nearer end:
//
//	T_b = clamp(held, lower, upper)
//
//	fixed, free groove:       lower = upper = T_s
//	fixed, clamped:           −∞, +∞                       (T_b = held)
//	fixed, groove friction:   T_s e^{−μθ}, T_s e^{μθ}       (rope-friction law, θ = WrapAngle)
//	sliding (rope clamped):   (h − μv)/(cos β + μ sin β), (h + μv)/(cos β − μ sin β)
//	roller (rope clamped):    lower = upper = h / cos β
//
// where h and v are the span-side pull's horizontal and vertical
// components, β the backstay angle and μ the plate friction: a sliding
// saddle holds while |h − T_b cos β| ≤ μ(v + T_b sin β), its normal force
// taken as the vertical component (common practice for a seat horizontal
// at its crest; the lateral force of a swung rope is taken by the saddle's
// guides, not by the plate). With held = T_s this is the state in which the
// rope was set over the saddle.
//
// Special cases: a wrap angle that is impossible for a groove with friction,
// a sliding or roller saddle that the ropes lift off (before it moves, or
// in the place it moves to; ErrLiftOff), and invalid input give errors.
func (s Saddle) Balance(span RopePull, backstay units.Angle, held units.Force) (Balance, error) {
	if err := s.validate(); err != nil {
		return Balance{}, err
	}
	if err := span.validate("span RopePull"); err != nil {
		return Balance{}, err
	}
	bp := RopePull{Tension: held, Angle: backstay}
	if err := bp.validate("backstay RopePull"); err != nil {
		return Balance{}, err
	}
	h, v, _ := span.components()
	ts := float64(span.Tension)
	cb, sb := math.Cos(float64(backstay)), math.Sin(float64(backstay))
	lo, hi := math.Inf(-1), math.Inf(1)
	motion := Rendered
	switch s.Kind {
	case Roller:
		lo, hi, motion = h/cb, h/cb, Travelled
	case Sliding:
		mu := s.friction()
		if v+float64(held)*sb <= 0 {
			return Balance{}, fmt.Errorf("tower: the ropes pull the sliding saddle upward and lift off it: %w", ErrLiftOff)
		}
		lo = (h - mu*v) / (cb + mu*sb)
		if d := cb - mu*sb; d > 0 {
			hi = (h + mu*v) / d
		}
		motion = Travelled
	default:
		switch s.groove() {
		case FreeGroove:
			lo, hi = ts, ts
		case FrictionGroove:
			th, err := wrap(span, bp)
			if err != nil {
				return Balance{}, err
			}
			k, err := CapstanBound(s.GrooveFriction, th)
			if err != nil {
				return Balance{}, err
			}
			lo, hi = ts/k, ts*k
		}
	}
	if lo > hi {
		// A sliding saddle whose span rope pulls upward: no backstay
		// tension both holds it on its plate and keeps it pressed down.
		return Balance{}, fmt.Errorf("tower: no backstay tension holds the sliding saddle (bounds %v > %v): the ropes lift it off its plate: %w",
			units.Force(lo), units.Force(hi), ErrLiftOff)
	}
	b := Balance{Backstay: held, Lower: units.Force(lo), Upper: units.Force(hi)}
	switch t := float64(held); {
	case t < lo:
		// The span side pulls harder than the saddle holds: rope (or
		// saddle) moves toward the span until the backstay tightens.
		b.Backstay, b.Motion, b.Direction = units.Force(lo), motion, 1
	case t > hi:
		b.Backstay, b.Motion, b.Direction = units.Force(hi), motion, -1
	}
	if s.Kind != Fixed && !(v+float64(b.Backstay)*sb > 0) {
		return Balance{}, fmt.Errorf("tower: once the %s saddle has moved the ropes pull it upward (backstay %v): they lift it off: %w",
			s.Kind, b.Backstay, ErrLiftOff)
	}
	return b, nil
}

// LevelForce is the force a saddle (or wind on the column) puts on the
// column at one level.
type LevelForce struct {
	// Height above the column base section and horizontal Offset from the
	// column axis (toward the span positive) of the point of application.
	Height, Offset units.Length
	// Vertical is positive downward; Horizontal positive toward the span;
	// Lateral across the bridge, positive downwind.
	Vertical, Horizontal, Lateral units.Force
	// Unbalance is the unbalanced horizontal force of the two rope pulls,
	// T_s cos α_s − T_b cos α_b, before a sliding or roller saddle
	// releases it; Limit is the friction limit μN of a sliding saddle
	// (zero for other kinds).
	Unbalance, Limit units.Force
	// Wrap is the angle through which the rope turns over the saddle
	// (zero when it does not bear on it).
	Wrap units.Angle
}

// Force returns the force that the two rope pulls put on the column through
// this saddle. With the span-side pull (T_s, α_s, swung by ψ) and the
// backstay pull (T_b, α_b), angles below horizontal, equilibrium of the
// rope on the saddle gives
//
//	V   = T_s sin α_s cos ψ + T_b sin α_b     (down)
//	H_u = T_s cos α_s − T_b cos α_b           (toward the span; the unbalanced force)
//	L   = T_s sin α_s sin ψ                   (across, downwind)
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
// the slid state (see Balance). On a roller the horizontal force is the
// rolling resistance, taken as negligible. The lateral force of a swung
// rope reaches the column whatever the kind.
//
// Special cases: a rope that leaves the saddle upward on both sides, so
// that V < 0, lifts off a sliding or roller saddle and gives ErrLiftOff; a
// fixed saddle passes the upward force to the column. Tensions must be
// finite and ≥ 0, angles strictly between −90° and 90°.
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
	hs, vs, lat := span.components()
	hb, vb, _ := backstay.components()
	v := vs + vb
	hu := hs - hb
	h := hu
	var limit float64
	switch s.Kind {
	case Sliding, Roller:
		if v < 0 {
			return LevelForce{}, fmt.Errorf("tower: the ropes pull the %s saddle upward by %v and lift off it: %w",
				s.Kind, units.Force(-v), ErrLiftOff)
		}
		if s.Kind == Roller {
			h = 0
		} else if limit = s.friction() * v; math.Abs(hu) > limit {
			h = math.Copysign(limit, hu)
		}
	}
	var th units.Angle
	if span.Tension > 0 && backstay.Tension > 0 {
		th, _ = wrap(span, backstay) // zero when the rope does not bear on the saddle
	}
	return LevelForce{Height: s.Height, Offset: s.Offset, Vertical: units.Force(v), Horizontal: units.Force(h),
		Lateral: units.Force(lat), Unbalance: units.Force(hu), Limit: units.Force(limit), Wrap: th}, nil
}

// Slips reports whether this saddle moves on the column under the given
// pulls: true for a sliding saddle when the unbalanced horizontal force
// exceeds μ·N, and always true for a roller carrying any unbalanced force.
// It reports false for invalid input (which Force rejects).
func (s Saddle) Slips(span, backstay RopePull) bool {
	lf, err := s.Force(span, backstay)
	if err != nil {
		return false
	}
	switch s.Kind {
	case Sliding:
		return math.Abs(float64(lf.Unbalance)) > float64(lf.Limit)
	case Roller:
		return lf.Unbalance != 0
	}
	return false
}
