package units

import (
	"math"
	"strconv"
)

// Format returns x, a value of kind k in SI, in the engineering unit a
// designer reads for its magnitude, to four significant figures: "12.50 kN",
// "3.200 kN/m", "450.0 kPa", "21.80 deg"; temperatures in degrees Celsius
// to two decimals, "-10.00 °C". The output parses back with Parse.
func Format(x float64, k Kind) string {
	if k == KindTemperature {
		return strconv.FormatFloat(x-celsiusOffset, 'f', 2, 64) + " °C"
	}
	if k < 0 || int(k) >= len(kinds) {
		return strconv.FormatFloat(x, 'g', -1, 64)
	}
	shows := kinds[k].shows
	d := shows[len(shows)-1]
	for _, s := range shows {
		if math.Abs(x) >= s.min && x != 0 {
			d = s
			break
		}
	}
	v := fixed(x / d.scale)
	if d.symbol == "" {
		return v
	}
	return v + " " + d.symbol
}

// FormatPair formats a and b, two values of kind k, in one display unit:
// the one Format chooses for the larger magnitude, so that a row of a
// table never reads "0 N" beside "140.4 kN" or "900 mm" beside "1.200 m".
// Temperatures are both in °C, as Format writes them.
func FormatPair(a, b float64, k Kind) (string, string) {
	if k == KindTemperature || k < 0 || int(k) >= len(kinds) {
		return Format(a, k), Format(b, k)
	}
	big := math.Max(math.Abs(a), math.Abs(b))
	shows := kinds[k].shows
	d := shows[len(shows)-1]
	for _, s := range shows {
		if big >= s.min && big != 0 {
			d = s
			break
		}
	}
	in := func(x float64) string {
		v := fixed(x / d.scale)
		if d.symbol == "" {
			return v
		}
		return v + " " + d.symbol
	}
	return in(a), in(b)
}

// fixed formats x to four significant figures in fixed notation for the
// magnitudes met in this trade, and in exponent notation outside them.
func fixed(x float64) string {
	a := math.Abs(x)
	switch {
	case math.IsNaN(x) || math.IsInf(x, 0):
		return strconv.FormatFloat(x, 'g', -1, 64)
	case a == 0:
		return "0"
	case a >= 1e6 || a < 1e-3:
		return strconv.FormatFloat(x, 'e', 3, 64)
	}
	decimals := 3 - int(math.Floor(math.Log10(a)))
	if decimals < 0 {
		decimals = 0
	}
	return strconv.FormatFloat(x, 'f', decimals, 64)
}

func (l Length) String() string           { return Format(float64(l), KindLength) }
func (f Force) String() string            { return Format(float64(f), KindForce) }
func (p Pressure) String() string         { return Format(float64(p), KindPressure) }
func (a Angle) String() string            { return Format(float64(a), KindAngle) }
func (m Mass) String() string             { return Format(float64(m), KindMass) }
func (t Temperature) String() string      { return Format(float64(t), KindTemperature) }
func (a Area) String() string             { return Format(float64(a), KindArea) }
func (v Volume) String() string           { return Format(float64(v), KindVolume) }
func (w LoadPerLength) String() string    { return Format(float64(w), KindLoadPerLength) }
func (g UnitWeight) String() string       { return Format(float64(g), KindUnitWeight) }
func (m Moment) String() string           { return Format(float64(m), KindMoment) }
func (ea AxialStiffness) String() string  { return Format(float64(ea), KindAxialStiffness) }
func (a ThermalExpansion) String() string { return Format(float64(a), KindThermalExpansion) }
func (m MassPerLength) String() string    { return Format(float64(m), KindMassPerLength) }
func (v Velocity) String() string         { return Format(float64(v), KindVelocity) }
func (f Frequency) String() string        { return Format(float64(f), KindFrequency) }
func (r Ratio) String() string            { return Format(float64(r), KindRatio) }
func (a Acceleration) String() string     { return Format(float64(a), KindAcceleration) }
