package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// AnchorPull is one backstay force on an anchor. The anchor frame has x
// horizontal, positive in the direction the backstays pull (toward the
// tower and span), z up; the angle is measured ABOVE horizontal at the
// anchor (the backstay rises toward its saddle), unlike the tower package's
// rope angles, which are measured below horizontal at the saddle.
type AnchorPull struct {
	// Force is the rope tension at the anchor; zero or more.
	Force units.Force
	// Angle is the backstay's inclination above horizontal at the anchor
	// (the backstay rises from the anchor toward the saddle); between −90°
	// and 90°.
	Angle units.Angle
	// X, Z locate the attachment point in the anchor's frame (for an
	// AnchorBlock: from the back bottom edge of the block; not used by a
	// Deadman).
	X, Z units.Length
	// Variable marks a pull from variable actions (live load, wind,
	// temperature); false marks permanent actions. Split a backstay force
	// into a permanent and a variable AnchorPull at the same point for the
	// partial-factor basis; the allowable basis adds them alike.
	Variable bool
}

// components returns the horizontal and vertical components of p:
//
//	Fx = F cos α,  Fz = F sin α
func (p AnchorPull) components() (fx, fz float64) {
	f, a := float64(p.Force), float64(p.Angle)
	return f * math.Cos(a), f * math.Sin(a)
}

func validatePulls(pulls []AnchorPull, needPoint bool) error {
	for i, p := range pulls {
		ok := float64(p.Force) >= 0 && !math.IsInf(float64(p.Force), 0) && math.Abs(float64(p.Angle)) <= math.Pi/2 &&
			(!needPoint || !math.IsNaN(float64(p.X)+float64(p.Z)) && !math.IsInf(float64(p.X)+float64(p.Z), 0))
		if ok {
			continue // the field names below are built only on error
		}
		name := fmt.Sprintf("pulls[%d]", i)
		if err := nonNegative(name+".Force", float64(p.Force)); err != nil {
			return err
		}
		if !(math.Abs(float64(p.Angle)) <= math.Pi/2) {
			return invalid(name+".Angle", "must be between -90 and 90 deg")
		}
		if needPoint {
			if err := finite(name+".X", float64(p.X)); err != nil {
				return err
			}
			if err := finite(name+".Z", float64(p.Z)); err != nil {
				return err
			}
		}
	}
	return nil
}
