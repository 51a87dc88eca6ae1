package vibration

import (
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// LateralWalkingCoefficient is k of Dallard et al. (2001; from memory):
// the lateral force a walker puts on a swaying deck per unit of its
// lateral velocity, about 300 N·s/m over the frequencies of walking.
const LateralWalkingCoefficient = 300.0

// LockIn is the crowd at which walkers lock in to a lateral mode.
type LockIn struct {
	Mode      int // index in Modal.Modes
	Label     string
	Frequency units.Frequency
	ModalMass units.Mass
	Damping   float64
	// K is the lateral walking coefficient, N·s/m.
	K float64
	// Critical is the number of walkers N_L at which lock-in starts, and
	// Crowd the walkers the walkway holds, to compare with it.
	Critical, Crowd float64
}

// LockIn returns the critical number of walkers for lateral lock-in of
// mode i of md (Dallard et al. 2001, from memory): the walkers' lateral
// force, k per unit deck velocity each, cancels the mode's damping when
//
//	N_L = 8π ξ f M* / k
//
// with M* the modal mass at unit largest lateral displacement. crowd is
// the number of walkers the walkway holds. It returns an error for a mode
// that is not lateral, damping not in (0, 1), a crowd not positive, or an
// index out of range.
func (md Modal) LockIn(i int, damping, crowd float64) (LockIn, error) {
	if i < 0 || i >= len(md.Modes) {
		return LockIn{}, invalidf("mode %d out of range: the analysis has %d modes", i, len(md.Modes))
	}
	if !(damping > 0 && damping < 1) {
		return LockIn{}, invalidf("damping ratio must lie between 0 and 1, got %g", damping)
	}
	if err := positive("crowd", crowd); err != nil {
		return LockIn{}, err
	}
	mode := md.Modes[i]
	if mode.Kind != Lateral {
		return LockIn{}, invalidf("mode %d is %s: lock-in concerns lateral modes", i+1, mode.Label())
	}
	k := LateralWalkingCoefficient
	return LockIn{
		Mode: i, Label: mode.Label(), Frequency: mode.Frequency, ModalMass: mode.ModalMass,
		Damping: damping, K: k, Crowd: crowd,
		Critical: 8 * math.Pi * damping * float64(mode.Frequency) * float64(mode.ModalMass) / k,
	}, nil
}

// Check returns the lock-in check: the crowd the walkway holds against the
// critical number N_L, flagged (never failed) when the crowd reaches it;
// ID vibration.lockin.
func (l LockIn) Check() check.Result {
	return check.Advisory("vibration.lockin", "Walkers against the lateral lock-in number", units.KindRatio, l.Crowd, l.Critical).
		WithBasis("critical number of walkers for lateral lock-in N_L = 8πξfM*/k, k = 300 N·s/m (Dallard et al. 2001, from memory), against the crowd the walkway holds").
		WithValues(
			check.Of("f", "natural frequency", l.Frequency),
			check.Of("M*", "modal mass, largest lateral displacement 1", l.ModalMass),
			check.Of("ξ", "ratio of critical damping", units.Ratio(l.Damping)),
			check.Of("k", "lateral walking coefficient, N·s/m", units.Ratio(l.K)),
			check.Of("N_L", "walkers at which lock-in starts", units.Ratio(l.Critical)),
			check.Of("N", "walkers the walkway holds", units.Ratio(l.Crowd)),
		)
}
