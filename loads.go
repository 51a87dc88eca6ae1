package sagspan

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// CrowdPressure returns the characteristic pedestrian load per square metre
// of walkway for a loaded length l, from EN 1991-2:2003 cl. 5.3.2.1(2):
//
//	q = 2.0 + 120/(l + 30)   kN/m², l in m, with 2.5 <= q <= 5.0
//
// The clause allows a lower value for long spans where dense crowds cannot
// occur only by national choice; this function gives the recommended one.
func CrowdPressure(l units.Length) units.Pressure {
	q := 2.0 + 120/(float64(l)+30)
	q = math.Max(2.5, math.Min(5.0, q))
	return units.Pressure(q) * units.Kilopascal
}

// WindPressure returns the basic velocity pressure of wind speed v, from
// EN 1991-1-4:2005 cl. 4.5(1), eq. (4.10), with the recommended air density
// of 1.25 kg/m³:
//
//	q = ½ ρ v²
func WindPressure(v units.Velocity) units.Pressure {
	const airDensity = 1.25 // kg/m³, EN 1991-1-4 cl. 4.5(1) note 2
	return units.Pressure(0.5 * airDensity * float64(v) * float64(v))
}

// Defaults of the loads, each with its source.
const (
	// defaultWindWithCrowd is ψ0 for wind on buildings, EN 1990 Table A1.1
	// (from memory); used for wind accompanying the crowd.
	defaultWindWithCrowd = 0.6
	// defaultRopeDrag is the force coefficient of a stranded rope, circular
	// section in subcritical flow (from memory; EN 1991-1-4 cl. 7.9 gives
	// cylinder values of this order).
	defaultRopeDrag = 1.2
	// defaultWalkwayDrag is the force coefficient of a walkway with open
	// side fencing (common practice, from memory).
	defaultWalkwayDrag = 1.8
)

// crowd returns the crowd pressure the bridge is loaded with.
func (b Bridge) crowd() units.Pressure {
	if b.Loads.Crowd > 0 {
		return b.Loads.Crowd
	}
	return CrowdPressure(b.Site.Span)
}

// wind returns the wind pressure on the bridge, zero when none is given.
func (b Bridge) wind() units.Pressure {
	if b.Climate.WindPressure > 0 {
		return b.Climate.WindPressure
	}
	return WindPressure(b.Climate.WindSpeed)
}

func orDefault(x, def float64) float64 {
	if x > 0 {
		return x
	}
	return def
}

// walkwayDead returns the walkway dead load per metre, without the ropes.
func (w Walkway) dead() units.LoadPerLength {
	if len(w.Parts) == 0 {
		return w.DeadLoad
	}
	var sum units.LoadPerLength
	for _, p := range w.Parts {
		sum += p.Load
	}
	return sum
}
