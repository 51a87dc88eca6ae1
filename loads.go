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
	// 120/(l + 30) meets 3.0 (the upper bound) at l = 10 m and 0.5 (the
	// lower bound) at l = 210 m: crowdUpperLength and crowdLowerLength.
	q := 2.0 + 120/(float64(l)+30)
	q = math.Max(2.5, math.Min(5.0, q))
	return units.Pressure(q) * units.Kilopascal
}

// The loaded lengths where the EN 1991-2 crowd pressure meets its bounds.
const (
	crowdUpperLength = 10 * units.Metre
	crowdLowerLength = 210 * units.Metre
)

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
	// 0.6, ψ0 for wind in EN 1990 Table A1.1 (buildings, from memory), kept
	// on the safe side of the 0.3 of the footbridge table A2.2 (read in the
	// final PT draft of prAnnex A2, 2003).
	defaultWindWithCrowd = 0.6
	// defaultCrowdWithWind is ψ0 on the crowd accompanying the wind: 0.40
	// for the pedestrian group gr1, EN 1990 Annex A2 Table A2.2 (read in
	// the final PT draft of prAnnex A2, 2003; the published table from
	// memory).
	defaultCrowdWithWind = 0.4
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

// Defaults of the cases the chain adds, each with its source.
const (
	// defaultCrowdInAccident is ψ1 on the crowd in the accidental
	// combination: 0.4 for pedestrian loads (group gr1) in EN 1990
	// Table A2.2 (footbridges), with eq. (6.11b) (from memory).
	defaultCrowdInAccident = 0.4
	// defaultLift is the force coefficient c_f,z of the upward wind force
	// on a deck: ±0.9, EN 1991-1-4 8.3.3(1) (from memory), on the
	// walkway's width.
	defaultLift = 0.9
	// defaultSunDifference is how much cooler the backstays are than the
	// sunlit span: 10 K, the difference EN 1991-1-5 6.1.6 recommends
	// between cables of a light colour and the rest of the structure
	// (20 K for dark ones; from memory).
	defaultSunDifference = 10.0
	// defaultConstructionLoad is the crew and hand tools on the placed
	// walkway while it is built: 1.0 kN/m², Q_ca of EN 1991-1-6 Table 4.1
	// (from memory).
	defaultConstructionLoad = 1.0 * units.Kilopascal
	// defaultBreakDynamic multiplies the change of tension in the ropes
	// left when one breaks: 2, the peak of an undamped elastic system under
	// a suddenly applied load (standard structural dynamics); damping only
	// lowers it.
	defaultBreakDynamic = 2.0
)

// thermalInAccident is ψ2 on the thermal action accompanying an accident:
// 0.5 for footbridges, EN 1990 Annex A2 Table A2.2 (read in the final PT
// draft of prAnnex A2, 2003), with eq. (6.11b).
const thermalInAccident = 0.5

// accidentTemperature returns the rope temperature of the accidental
// cases: the quasi-permanent thermal action ψ2 T taken toward the coldest
// rope temperature, which tightens the ropes (cautious for the rope checks
// the case is for).
func (b Bridge) accidentTemperature() units.Temperature {
	c := b.Climate
	return c.Reference + units.Temperature(thermalInAccident*float64(c.Coldest-c.Reference))
}

func (b Bridge) crowdInAccident() float64 {
	return orDefault(b.Loads.CrowdInAccident, defaultCrowdInAccident)
}

func (b Bridge) sunDifference() float64 {
	return orDefault(b.Loads.SunDifference, defaultSunDifference)
}

func (b Bridge) constructionLoad() units.Pressure {
	return units.Pressure(orDefault(float64(b.Loads.ConstructionLoad), float64(defaultConstructionLoad)))
}

func (b Bridge) breakDynamic() float64 { return orDefault(b.Loads.BreakDynamic, defaultBreakDynamic) }

// lift returns the upward wind force per metre on the whole walkway at
// wind factor 1: c_f,z q_p b, with b the walkway width (EN 1991-1-4
// 8.3.3, from memory).
func (b Bridge) lift() units.LoadPerLength {
	return units.LoadPerLength(orDefault(b.Loads.WalkwayLift, defaultLift) * float64(b.wind()) * float64(b.Walkway.Width))
}

// designArc returns the mean of ds/dx, the length of walkway per
// horizontal metre, over [a, b] of the design parabola of a span of length
// l, rise h and midspan sag f below the chord:
//
//	z'(x) = h/l − 4f(l − 2x)/l²,  ∫ √(1 + z'²) dx = [F(z')]/(8f/l²),
//	F(p) = (p √(1 + p²) + asinh p)/2
//
// (the arc length of a parabola, standard calculus; over the whole span it
// is the parabola's length S/l, Hicks, Civil Engineering Formulas, ch. 10).
// A stretch shorter than 1e-6 l takes the slope at its middle.
func designArc(l, h, f, a, b float64) float64 {
	k := 8 * f / (l * l)
	slope := func(x float64) float64 { return h/l - 4*f/l + k*x }
	if b-a < 1e-6*l || !(k > 0) {
		return math.Hypot(1, slope((a+b)/2))
	}
	F := func(p float64) float64 { return (p*math.Hypot(1, p) + math.Asinh(p)) / 2 }
	return (F(slope(b)) - F(slope(a))) / (k * (b - a))
}

// walkwayArc returns the length of walkway per horizontal metre over the
// stretch s, on the design parabola of group g: the walkway's dead load is
// given per metre of walkway and the crowd per square metre of its
// surface, and a walkway that follows the sagging ropes is longer than its
// plan by this factor (the ropes' own weight takes the whole span's S/l,
// see groups).
func (m *model) walkwayArc(g group, s Stretch) float64 {
	l := m.b.Site.Span
	s = clip(s, l)
	return designArc(float64(l), float64(m.b.Site.Rise), float64(g.Sag), float64(s.From), float64(s.To))
}

// permanent returns group g's permanent load per horizontal metre at its
// design sag: its ropes' weight and its share of the walkway's, each per
// horizontal metre.
func (m *model) permanent(g group) units.LoadPerLength {
	return g.self + units.LoadPerLength(g.share*m.walkwayArc(g, Stretch{0, m.b.Site.Span}))*m.dead
}

// walkwayMass returns the walkway's mass per horizontal metre at the
// design sag: its dead load per metre of walkway times the walkway groups'
// S/l, weighted by their shares.
func (m *model) walkwayMass() units.MassPerLength {
	arc, shares := 0.0, 0.0
	for _, g := range m.groups {
		arc += g.share * m.walkwayArc(g, Stretch{0, m.b.Site.Span})
		shares += g.share
	}
	if shares > 0 {
		arc /= shares
	} else {
		arc = 1
	}
	return units.MassPerLength(arc * float64(m.dead) / units.StandardGravity)
}
