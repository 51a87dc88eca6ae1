package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// LengthCurve is the unstretched length of a rope of one axial stiffness
// that hangs one load over one span in its Loaded shape, as a function of
// the horizontal tension H, by the package's constitutive law:
//
//	L₀(H) = ∫ ds/(1 + T/EA)
//
// with its derivative dL₀/dH and the support tensions and angles at that H.
// It is for a solver that tries many H on one load, such as a rope that
// renders over saddles into its backstays: the load's sections are worked
// out once. L₀(H) decreases with H. At any H its values are those of
// UnstretchedLength and of the Loaded shape of the same span, load and H,
// bit for bit.
type LengthCurve struct {
	span   Span
	ea     float64
	c0     float64 // chord slope h/L
	xs, qs []float64
}

// NewLengthCurve returns the curve of the rope of axial stiffness ea under
// load l over s. Special cases: an invalid span, load or stiffness gives
// ErrInvalid.
func NewLengthCurve(s Span, ea units.AxialStiffness, l Load) (LengthCurve, error) {
	if err := l.Validate(s); err != nil {
		return LengthCurve{}, err
	}
	if err := positive("EA", float64(ea)); err != nil {
		return LengthCurve{}, err
	}
	l.Patches = append([]Patch(nil), l.Patches...)
	b := newBeam(s, l)
	n := 2 + 2*len(l.Patches)
	xs, qs := b.sections(make([]float64, 0, n), make([]float64, 0, n))
	return LengthCurve{span: s, ea: float64(ea), c0: float64(s.Rise) / float64(s.Length), xs: xs, qs: qs}, nil
}

// At returns L₀(H) and dL₀/dH (metres per newton, negative) for H > 0.
func (c LengthCurve) At(h units.Force) (units.Length, float64) {
	l0, dl0 := unstretched(c.xs, c.qs, c.c0, float64(h), c.ea)
	return units.Length(l0), dl0
}

// Supports returns the tensions and the angles below horizontal at A and
// B of the rope hanging with horizontal tension h (those of the Loaded
// shape with that H).
func (c LengthCurve) Supports(h units.Force) (ta, tb units.Force, aa, ab units.Angle) {
	hh := float64(h)
	hv := hh * c.c0
	va, vb := c.qs[0]-hv, hv-c.qs[len(c.qs)-1]
	return units.Force(math.Hypot(hh, va)), units.Force(math.Hypot(hh, vb)),
		units.Angle(math.Atan2(va, hh)), units.Angle(math.Atan2(vb, hh))
}

// CheckStrain returns an error wrapping ErrInvalid when the horizontal
// tension h strains the rope beyond the small-strain model of this package
// (H/EA above 5 %), as StateForLength does, or is not positive and finite.
func (c LengthCurve) CheckStrain(h units.Force) error {
	if x := float64(h); x/c.ea > maxStrain {
		return invalidf("the new state strains the rope by %.1f %%, beyond the small-strain model (%.0f %%)", 100*x/c.ea, 100*maxStrain)
	} else if !finite(x) || x <= 0 {
		return errOutOfRange
	}
	return nil
}
