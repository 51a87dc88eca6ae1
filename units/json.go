package units

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"strconv"
)

// unmarshal reads a JSON bare number (SI) or a string with a unit into x;
// a kind that needs its unit (Kind.NeedsUnit) refuses a bare number.
func unmarshal(b []byte, k Kind, x *float64) error {
	b = bytes.TrimSpace(b)
	if len(b) > 0 && b[0] == '"' {
		var s string
		if err := json.Unmarshal(b, &s); err != nil {
			return fmt.Errorf("units: %s: %w", k, err)
		}
		v, err := parseKind(s, k)
		if err != nil {
			return err
		}
		*x = v
		return nil
	}
	var v float64
	if err := json.Unmarshal(b, &v); err != nil {
		return fmt.Errorf("units: want a number in SI or a string such as %q for a %s, got %s",
			Format(1, k), k, b)
	}
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return &ParseError{Input: string(b), Part: string(b), Want: k, Err: ErrRange}
	}
	if k.NeedsUnit() {
		return &ParseError{Input: string(b), Part: string(b), Want: k, Err: ErrNoUnit, Hint: Example(v, k)}
	}
	*x = v
	return nil
}

// marshalWithUnit writes x of kind k as a JSON string in its coherent SI
// unit, exactly: "288.15 K", "0.5235987755982988 rad".
func marshalWithUnit(x float64, k Kind) ([]byte, error) {
	if math.IsInf(x, 0) || math.IsNaN(x) {
		return nil, fmt.Errorf("units: cannot write %v %s as JSON", x, k)
	}
	return json.Marshal(strconv.FormatFloat(x, 'g', -1, 64) + " " + k.SI())
}

// MarshalJSON writes the temperature with its unit, "288.15 K": a bare
// number would be ambiguous, and UnmarshalJSON refuses one.
func (t Temperature) MarshalJSON() ([]byte, error) {
	return marshalWithUnit(float64(t), KindTemperature)
}

// MarshalJSON writes the angle with its unit, "0.5 rad": a bare number
// would be ambiguous, and UnmarshalJSON refuses one.
func (a Angle) MarshalJSON() ([]byte, error) { return marshalWithUnit(float64(a), KindAngle) }

func (l *Length) UnmarshalJSON(b []byte) error { return unmarshal(b, KindLength, (*float64)(l)) }
func (f *Force) UnmarshalJSON(b []byte) error  { return unmarshal(b, KindForce, (*float64)(f)) }
func (p *Pressure) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindPressure, (*float64)(p))
}
func (a *Angle) UnmarshalJSON(b []byte) error { return unmarshal(b, KindAngle, (*float64)(a)) }
func (m *Mass) UnmarshalJSON(b []byte) error  { return unmarshal(b, KindMass, (*float64)(m)) }
func (t *Temperature) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindTemperature, (*float64)(t))
}
func (a *Area) UnmarshalJSON(b []byte) error   { return unmarshal(b, KindArea, (*float64)(a)) }
func (v *Volume) UnmarshalJSON(b []byte) error { return unmarshal(b, KindVolume, (*float64)(v)) }
func (w *LoadPerLength) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindLoadPerLength, (*float64)(w))
}
func (g *UnitWeight) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindUnitWeight, (*float64)(g))
}
func (m *Moment) UnmarshalJSON(b []byte) error { return unmarshal(b, KindMoment, (*float64)(m)) }
func (ea *AxialStiffness) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindAxialStiffness, (*float64)(ea))
}
func (a *ThermalExpansion) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindThermalExpansion, (*float64)(a))
}
func (m *MassPerLength) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindMassPerLength, (*float64)(m))
}
func (v *Velocity) UnmarshalJSON(b []byte) error { return unmarshal(b, KindVelocity, (*float64)(v)) }
func (f *Frequency) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindFrequency, (*float64)(f))
}
func (r *Ratio) UnmarshalJSON(b []byte) error { return unmarshal(b, KindRatio, (*float64)(r)) }
func (a *Acceleration) UnmarshalJSON(b []byte) error {
	return unmarshal(b, KindAcceleration, (*float64)(a))
}
