package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// ContactPressure returns the linear soil pressure under a rigid
// rectangular base of sides b (along the eccentricity) and l, carrying a
// vertical force n at eccentricity e from the centre along b:
//
//	|e| ≤ b/6 (inside the kern):  q = n/(b l) · (1 ± 6|e|/b),  contact = b
//	|e| > b/6 (outside the kern): qmax = 2n / (3 l (b/2 − |e|)),  qmin = 0,
//	                              contact = 3 (b/2 − |e|)
//
// (the classical trapezoid and triangle of a no-tension base; e.g. Das,
// Principles of Foundation Engineering, §3.11, from memory). qmax lies on
// the side of e. contact is the length along b in compression.
//
// Special cases: n = 0 gives zero pressures and full contact; n < 0
// (tension), b or l not positive, or non-finite input give an error wrapping
// ErrInvalid; |e| ≥ b/2 gives an error wrapping ErrOutsideBase.
func ContactPressure(n units.Force, e units.Length, b, l units.Length) (qmax, qmin units.Pressure, contact units.Length, err error) {
	if err := nonNegative("ContactPressure n", float64(n)); err != nil {
		return 0, 0, 0, err
	}
	if err := finite("ContactPressure e", float64(e)); err != nil {
		return 0, 0, 0, err
	}
	if err := positive("ContactPressure b", float64(b)); err != nil {
		return 0, 0, 0, err
	}
	if err := positive("ContactPressure l", float64(l)); err != nil {
		return 0, 0, 0, err
	}
	ae, bb, ll := math.Abs(float64(e)), float64(b), float64(l)
	if ae >= bb/2 {
		return 0, 0, 0, fmt.Errorf("%w: eccentricity %v reaches half of the base %v", ErrOutsideBase, e, b)
	}
	nn := float64(n)
	if ae <= bb/6 {
		mean := nn / (bb * ll)
		return units.Pressure(mean * (1 + 6*ae/bb)), units.Pressure(mean * (1 - 6*ae/bb)), b, nil
	}
	a := bb/2 - ae
	return units.Pressure(2 * nn / (3 * ll * a)), 0, units.Length(3 * a), nil
}
