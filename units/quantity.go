package units

import (
	"math"

	"gonum.org/v1/gonum/unit"
)

// Length is a length in metres.
type Length float64

// Force is a force in newtons.
type Force float64

// Pressure is a pressure or stress in pascals.
type Pressure float64

// Angle is a plane angle in radians.
type Angle float64

// Mass is a mass in kilograms.
type Mass float64

// Temperature is an absolute temperature in kelvin.
type Temperature float64

// Area is an area in square metres.
type Area float64

// Volume is a volume in cubic metres.
type Volume float64

// LoadPerLength is a distributed line load in newtons per metre.
type LoadPerLength float64

// UnitWeight is a weight density in newtons per cubic metre.
type UnitWeight float64

// Moment is a moment of force in newton metres.
type Moment float64

// AxialStiffness is the product EA of a member's modulus and area, in newtons.
type AxialStiffness float64

// ThermalExpansion is a coefficient of linear thermal expansion in 1/K.
type ThermalExpansion float64

// MassPerLength is a mass per unit length in kilograms per metre.
type MassPerLength float64

// Velocity is a speed in metres per second.
type Velocity float64

// Frequency is a frequency in hertz.
type Frequency float64

// Ratio is a dimensionless ratio, such as a sag ratio or a slope.
type Ratio float64

// Acceleration is an acceleration in metres per second squared.
type Acceleration float64

// Constants giving meaning to literals, in coherent SI.
const (
	Kilo = 1e3
	Mega = 1e6
	Giga = 1e9

	Metre      Length = 1
	Millimetre Length = 1e-3
	Centimetre Length = 1e-2

	Newton     Force = 1
	Kilonewton Force = 1e3
	Meganewton Force = 1e6

	Pascal     Pressure = 1
	Kilopascal Pressure = 1e3
	Megapascal Pressure = 1e6
	Gigapascal Pressure = 1e9

	Radian Angle = 1
	Degree Angle = math.Pi / 180

	Kilogram Mass = 1
	Tonne    Mass = 1e3

	Kelvin Temperature = 1

	SquareMetre      Area = 1
	SquareMillimetre Area = 1e-6

	CubicMetre Volume = 1

	NewtonPerMetre     LoadPerLength = 1
	KilonewtonPerMetre LoadPerLength = 1e3

	NewtonPerCubicMetre     UnitWeight = 1
	KilonewtonPerCubicMetre UnitWeight = 1e3

	NewtonMetre     Moment = 1
	KilonewtonMetre Moment = 1e3

	PerKelvin ThermalExpansion = 1

	KilogramPerMetre MassPerLength = 1

	MetrePerSecond Velocity = 1

	Hertz Frequency = 1

	MetrePerSecondSquared Acceleration = 1
)

// StandardGravity is the standard acceleration of gravity, 9.80665 m/s²
// (the conventional value defined by the CGPM, 1901).
const StandardGravity = 9.80665

// celsiusOffset is the kelvin value of 0 °C.
const celsiusOffset = 273.15

// FromCelsius returns the absolute temperature of c degrees Celsius.
func FromCelsius(c float64) Temperature { return Temperature(c + celsiusOffset) }

// Celsius returns t in degrees Celsius.
func (t Temperature) Celsius() float64 { return float64(t) - celsiusOffset }

// Degrees returns a in degrees.
func (a Angle) Degrees() float64 { return float64(a) / float64(Degree) }

// FromDegrees returns the angle of d degrees.
func FromDegrees(d float64) Angle { return Angle(d) * Degree }

// MomentOf returns the moment of force f about a point at lever arm arm.
//
//	M = F·a
func MomentOf(f Force, arm Length) Moment { return Moment(float64(f) * float64(arm)) }

// Arm returns the lever arm at which force f produces moment m: a = M/F.
// It returns ±Inf or NaN when f is zero, as float division does.
func (m Moment) Arm(f Force) Length { return Length(float64(m) / float64(f)) }

// Times returns the force carried by a line load w over length l: F = w·l.
func (w LoadPerLength) Times(l Length) Force { return Force(float64(w) * float64(l)) }

// Weight returns the weight per metre of mass per metre m under standard
// gravity: w = m·g.
func (m MassPerLength) Weight() LoadPerLength { return LoadPerLength(float64(m) * StandardGravity) }

// Weight returns the weight of volume v of material of unit weight γ: W = γ·V.
func (g UnitWeight) Weight(v Volume) Force { return Force(float64(g) * float64(v)) }

// Over returns the mean pressure of force f over area a: p = F/A.
func (f Force) Over(a Area) Pressure { return Pressure(float64(f) / float64(a)) }

// Unit returns the gonum unit value of l.
func (l Length) Unit() *unit.Unit { return unit.Length(l).Unit() }

// Unit returns the gonum unit value of f.
func (f Force) Unit() *unit.Unit { return unit.Force(f).Unit() }

// Unit returns the gonum unit value of p.
func (p Pressure) Unit() *unit.Unit { return unit.Pressure(p).Unit() }

// Unit returns the gonum unit value of a.
func (a Angle) Unit() *unit.Unit { return unit.Angle(a).Unit() }

// Unit returns the gonum unit value of m.
func (m Mass) Unit() *unit.Unit { return unit.Mass(m).Unit() }

// Unit returns the gonum unit value of t.
func (t Temperature) Unit() *unit.Unit { return unit.Temperature(t).Unit() }

// Unit returns the gonum unit value of a.
func (a Area) Unit() *unit.Unit { return unit.Area(a).Unit() }

// Unit returns the gonum unit value of v.
func (v Volume) Unit() *unit.Unit { return unit.Volume(v).Unit() }

// Unit returns the gonum unit value of v.
func (v Velocity) Unit() *unit.Unit { return unit.Velocity(v).Unit() }

// Unit returns the gonum unit value of f.
func (f Frequency) Unit() *unit.Unit { return unit.Frequency(f).Unit() }

// Unit returns the gonum unit value of m: force times length.
func (m Moment) Unit() *unit.Unit { return unit.Torque(m).Unit() }

// Unit returns the gonum unit value of w: force per length.
func (w LoadPerLength) Unit() *unit.Unit {
	return unit.New(float64(w), unit.Dimensions{unit.MassDim: 1, unit.TimeDim: -2})
}

// Unit returns the gonum unit value of g: force per volume.
func (g UnitWeight) Unit() *unit.Unit {
	return unit.New(float64(g), unit.Dimensions{unit.LengthDim: -2, unit.MassDim: 1, unit.TimeDim: -2})
}

// Unit returns the gonum unit value of ea, dimensionally a force.
func (ea AxialStiffness) Unit() *unit.Unit { return unit.Force(ea).Unit() }

// Unit returns the gonum unit value of a: inverse temperature.
func (a ThermalExpansion) Unit() *unit.Unit {
	return unit.New(float64(a), unit.Dimensions{unit.TemperatureDim: -1})
}

// Unit returns the gonum unit value of m: mass per length.
func (m MassPerLength) Unit() *unit.Unit {
	return unit.New(float64(m), unit.Dimensions{unit.MassDim: 1, unit.LengthDim: -1})
}

// Unit returns the gonum unit value of a: length per time squared.
func (a Acceleration) Unit() *unit.Unit {
	return unit.New(float64(a), unit.Dimensions{unit.LengthDim: 1, unit.TimeDim: -2})
}

// Unit returns the gonum unit value of r, dimensionless.
func (r Ratio) Unit() *unit.Unit { return unit.Dimless(r).Unit() }
