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
	// defaultWindWithCrowd is the factor on wind accompanying the crowd:
	// 0.6, ψ0 for wind in EN 1990 Table A1.1 (buildings), kept on the safe
	// side of the 0.3 of the footbridge table A2.2 (both from memory).
	defaultWindWithCrowd = 0.6
	// defaultRopeDrag is the force coefficient of a stranded rope, circular
	// section in subcritical flow (from memory; EN 1991-1-4 cl. 7.9 gives
	// cylinder values of this order).
	defaultRopeDrag = 1.2
	// defaultWalkwayDrag is the force coefficient of a walkway with open
	// side fencing (common practice, from memory).
	defaultWalkwayDrag = 1.8
)

// crowd returns the crowd pressure on a loaded length l: the bridge's own
// value when given, else EN 1991-2 cl. 5.3.2.1 for that length (a crowd on
// half the span has the higher pressure of the shorter loaded length).
func (b Bridge) crowd(l units.Length) units.Pressure {
	if b.Loads.Crowd > 0 {
		return b.Loads.Crowd
	}
	return CrowdPressure(l)
}

// defaultExposure is the exposure factor ce(z) applied to the basic
// velocity pressure when only a wind speed is given: about 2.5 for open
// country (terrain category II) at 10–15 m above ground, EN 1991-1-4
// Figure 4.2 (from memory). A gorge can be more exposed: give the peak
// velocity pressure or the exposure factor of the site.
const defaultExposure = 2.5

// wind returns the peak wind pressure on the bridge, zero when none is
// given: the pressure given, or ce · ½ρv² from the wind speed.
func (b Bridge) wind() units.Pressure {
	if b.Climate.WindPressure > 0 {
		return b.Climate.WindPressure
	}
	return units.Pressure(orDefault(b.Climate.Exposure, defaultExposure)) * WindPressure(b.Climate.WindSpeed)
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
