package units

// Kind names a physical quantity that this package parses and formats.
type Kind int

// The kinds of quantity, one per type in this package.
const (
	KindLength Kind = iota
	KindForce
	KindPressure
	KindAngle
	KindMass
	KindTemperature
	KindArea
	KindVolume
	KindLoadPerLength
	KindUnitWeight
	KindMoment
	KindAxialStiffness
	KindThermalExpansion
	KindMassPerLength
	KindVelocity
	KindFrequency
	KindRatio
	KindAcceleration
)

// dim is a dimension vector: powers of length, mass, time, temperature and
// plane angle. Angle is kept as a dimension of its own so that "30" with no
// unit is never confused between a ratio and an angle in degrees.
type dim [5]int8

var (
	dimNone        = dim{}
	dimLength      = dim{1, 0, 0, 0, 0}
	dimForce       = dim{1, 1, -2, 0, 0}
	dimPressure    = dim{-1, 1, -2, 0, 0}
	dimAngle       = dim{0, 0, 0, 0, 1}
	dimMass        = dim{0, 1, 0, 0, 0}
	dimTemperature = dim{0, 0, 0, 1, 0}
	dimArea        = dim{2, 0, 0, 0, 0}
	dimVolume      = dim{3, 0, 0, 0, 0}
	dimLineLoad    = dim{0, 1, -2, 0, 0}
	dimUnitWeight  = dim{-2, 1, -2, 0, 0}
	dimMoment      = dim{2, 1, -2, 0, 0}
	dimInvTemp     = dim{0, 0, 0, -1, 0}
	dimMassPerLen  = dim{-1, 1, 0, 0, 0}
	dimVelocity    = dim{1, 0, -1, 0, 0}
	dimFrequency   = dim{0, 0, -1, 0, 0}
	dimAccel       = dim{1, 0, -2, 0, 0}
)

// display is one unit a kind may be shown in: values whose magnitude is at
// least min (in SI) are shown divided by scale with the given symbol.
type display struct {
	min    float64
	scale  float64
	symbol string
}

// kindInfo is everything this package knows about a kind.
type kindInfo struct {
	name string
	si   string // the coherent SI unit, as written in JSON output
	dim  dim
	// shows lists display units from the largest threshold down; the last
	// entry is the fallback for small magnitudes and for zero.
	shows []display
	// needsUnit marks a kind whose bare number is ambiguous: it must be
	// written with its unit.
	needsUnit bool
}

var kinds = [...]kindInfo{
	KindLength:           {"length", "m", dimLength, []display{{1, 1, "m"}, {0, 1e-3, "mm"}}, false},
	KindForce:            {"force", "N", dimForce, []display{{1e3, 1e3, "kN"}, {0, 1, "N"}}, false},
	KindPressure:         {"pressure", "Pa", dimPressure, []display{{1e9, 1e9, "GPa"}, {1e6, 1e6, "MPa"}, {1e3, 1e3, "kPa"}, {0, 1, "Pa"}}, false},
	KindAngle:            {"angle", "rad", dimAngle, []display{{0, float64(Degree), "deg"}}, true},
	KindMass:             {"mass", "kg", dimMass, []display{{1e3, 1e3, "t"}, {0, 1, "kg"}}, false},
	KindTemperature:      {"temperature", "K", dimTemperature, nil, true}, // shown in °C, see format
	KindArea:             {"area", "m2", dimArea, []display{{1e-2, 1, "m²"}, {0, 1e-6, "mm²"}}, false},
	KindVolume:           {"volume", "m3", dimVolume, []display{{0, 1, "m³"}}, false},
	KindLoadPerLength:    {"load per length", "N/m", dimLineLoad, []display{{1e3, 1e3, "kN/m"}, {0, 1, "N/m"}}, false},
	KindUnitWeight:       {"unit weight", "N/m3", dimUnitWeight, []display{{0, 1e3, "kN/m³"}}, false},
	KindMoment:           {"moment", "N m", dimMoment, []display{{1e3, 1e3, "kN·m"}, {0, 1, "N·m"}}, false},
	KindAxialStiffness:   {"axial stiffness", "N", dimForce, []display{{1e6, 1e6, "MN"}, {0, 1e3, "kN"}}, false},
	KindThermalExpansion: {"thermal expansion", "1/K", dimInvTemp, []display{{0, 1e-6, "µ/K"}}, false},
	KindMassPerLength:    {"mass per length", "kg/m", dimMassPerLen, []display{{0, 1, "kg/m"}}, false},
	KindVelocity:         {"velocity", "m/s", dimVelocity, []display{{0, 1, "m/s"}}, false},
	KindFrequency:        {"frequency", "Hz", dimFrequency, []display{{0, 1, "Hz"}}, false},
	KindRatio:            {"ratio", "1", dimNone, []display{{0, 1, ""}}, false},
	KindAcceleration:     {"acceleration", "m/s2", dimAccel, []display{{0, 1, "m/s²"}}, false},
}

// String returns the name of the kind, such as "load per length".
func (k Kind) String() string {
	if k < 0 || int(k) >= len(kinds) {
		return "unknown kind"
	}
	return kinds[k].name
}

// NeedsUnit reports whether a bare number of kind k is ambiguous and must
// be written with its unit: temperatures (°C or K) and angles (degrees or
// radians).
func (k Kind) NeedsUnit() bool {
	return k >= 0 && int(k) < len(kinds) && kinds[k].needsUnit
}

// SI returns the symbol of the coherent SI unit of the kind, such as "N/m",
// in which values of the kind are stored and written to JSON.
func (k Kind) SI() string {
	if k < 0 || int(k) >= len(kinds) {
		return ""
	}
	return kinds[k].si
}

// Quantity is the set of typed quantities in this package.
type Quantity interface {
	~float64
	Kind() Kind
}

// Kind reports KindLength.
func (Length) Kind() Kind { return KindLength }

// Kind reports KindForce.
func (Force) Kind() Kind { return KindForce }

// Kind reports KindPressure.
func (Pressure) Kind() Kind { return KindPressure }

// Kind reports KindAngle.
func (Angle) Kind() Kind { return KindAngle }

// Kind reports KindMass.
func (Mass) Kind() Kind { return KindMass }

// Kind reports KindTemperature.
func (Temperature) Kind() Kind { return KindTemperature }

// Kind reports KindArea.
func (Area) Kind() Kind { return KindArea }

// Kind reports KindVolume.
func (Volume) Kind() Kind { return KindVolume }

// Kind reports KindLoadPerLength.
func (LoadPerLength) Kind() Kind { return KindLoadPerLength }

// Kind reports KindUnitWeight.
func (UnitWeight) Kind() Kind { return KindUnitWeight }

// Kind reports KindMoment.
func (Moment) Kind() Kind { return KindMoment }

// Kind reports KindAxialStiffness.
func (AxialStiffness) Kind() Kind { return KindAxialStiffness }

// Kind reports KindThermalExpansion.
func (ThermalExpansion) Kind() Kind { return KindThermalExpansion }

// Kind reports KindMassPerLength.
func (MassPerLength) Kind() Kind { return KindMassPerLength }

// Kind reports KindVelocity.
func (Velocity) Kind() Kind { return KindVelocity }

// Kind reports KindFrequency.
func (Frequency) Kind() Kind { return KindFrequency }

// Kind reports KindRatio.
func (Ratio) Kind() Kind { return KindRatio }

// Kind reports KindAcceleration.
func (Acceleration) Kind() Kind { return KindAcceleration }
