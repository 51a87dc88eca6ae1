package cable

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// Rope is a steel wire rope type.
type Rope struct {
	Name     string
	Diameter units.Length
	MBF      units.Force // minimum breaking force
	Area     units.Area  // metallic cross-section
	Modulus  units.Pressure
	Mass     units.MassPerLength
	Alpha    units.ThermalExpansion
}

// EA returns the axial stiffness Modulus × Area.
func (r Rope) EA() units.AxialStiffness {
	return units.AxialStiffness(float64(r.Modulus) * float64(r.Area))
}

// Weight returns the weight per metre under standard gravity.
func (r Rope) Weight() units.LoadPerLength { return r.Mass.Weight() }

// Validate returns an error wrapping ErrInvalid unless the diameter,
// breaking force, area, modulus and mass are positive and finite and the
// thermal coefficient finite.
func (r Rope) Validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"rope diameter", float64(r.Diameter)}, {"minimum breaking force", float64(r.MBF)},
		{"metallic area", float64(r.Area)}, {"rope modulus", float64(r.Modulus)}, {"rope mass", float64(r.Mass)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if !finite(float64(r.Alpha)) {
		return invalidf("rope thermal coefficient must be finite, got %g", float64(r.Alpha))
	}
	return nil
}

// Construction is a stranded rope construction described by the factors
// of the rope makers' published formulas (the same form as EN 12385-4):
//
//	F_min = K d² R_r          (N, with d in mm and R_r in N/mm²)
//	A     = C d²              (metallic area)
//	m     = W d² / 100        (kg/m, with d in mm)
//
// Modulus is the effective modulus on the metallic area, Alpha the
// coefficient of thermal expansion.
type Construction struct {
	Name    string
	K, C, W float64
	Modulus units.Pressure
	Alpha   units.ThermalExpansion
}

// Strand6x36IWRC is a six-strand rope of 36-wire strands on an independent
// wire rope core, the common construction for footbridge main ropes.
// K 0.356, C 0.460, W 0.409 are the published rope makers' factors (rope
// makers' technical data in the form of EN 12385-4; see References). The effective modulus 100 GPa on the metallic area (stranded IWRC,
// ≈ 100 ± 10 GPa) and α = 12e-6/K are from memory, not confirmed.
var Strand6x36IWRC = Construction{
	Name: "6x36-IWRC", K: 0.356, C: 0.460, W: 0.409,
	Modulus: 100 * units.Gigapascal, Alpha: 12e-6 * units.PerKelvin,
}

// Constructions lists the constructions that ParseRope knows.
func Constructions() []Construction { return []Construction{Strand6x36IWRC} }

// Rope returns the rope of nominal diameter d and rope grade (tensile
// strength of the wires) grade of construction c, named like
// "6x36-IWRC 20mm 1770".
func (c Construction) Rope(d units.Length, grade units.Pressure) (Rope, error) {
	if err := positive("rope diameter", float64(d)); err != nil {
		return Rope{}, err
	}
	if err := positive("rope grade", float64(grade)); err != nil {
		return Rope{}, err
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"breaking factor K", c.K}, {"area factor C", c.C}, {"mass factor W", c.W}, {"construction modulus", float64(c.Modulus)}} {
		if err := positive(f.name, f.v); err != nil {
			return Rope{}, err
		}
	}
	dmm := float64(d / units.Millimetre)
	rr := float64(grade / units.Megapascal)
	r := Rope{
		Name:     fmt.Sprintf("%s %smm %s", c.Name, strconv.FormatFloat(dmm, 'f', -1, 64), strconv.FormatFloat(rr, 'f', -1, 64)),
		Diameter: d,
		MBF:      units.Force(c.K * dmm * dmm * rr),
		Area:     units.Area(c.C * float64(d) * float64(d)),
		Modulus:  c.Modulus,
		Mass:     units.MassPerLength(c.W * dmm * dmm / 100),
		Alpha:    c.Alpha,
	}
	if err := r.Validate(); err != nil {
		return Rope{}, err
	}
	return r, nil
}

// Catalogue returns the ropes of construction c and grade at each diameter.
func Catalogue(c Construction, grade units.Pressure, diameters ...units.Length) ([]Rope, error) {
	out := make([]Rope, 0, len(diameters))
	for _, d := range diameters {
		r, err := c.Rope(d, grade)
		if err != nil {
			return nil, err
		}
		out = append(out, r)
	}
	return out, nil
}

// ParseRope returns the rope named like "6x36-IWRC 20mm 1770": a
// construction from Constructions (case-insensitive), the nominal diameter
// in mm (the "mm" may be omitted or separated by a space) and the rope grade
// in N/mm².
func ParseRope(name string) (Rope, error) {
	f := strings.Fields(name)
	if len(f) == 4 && strings.EqualFold(f[2], "mm") {
		f = []string{f[0], f[1] + "mm", f[3]}
	}
	if len(f) != 3 {
		return Rope{}, invalidf("rope %q: want \"CONSTRUCTION DIAMETERmm GRADE\", such as \"6x36-IWRC 20mm 1770\"", name)
	}
	var con *Construction
	for _, c := range Constructions() {
		if strings.EqualFold(c.Name, f[0]) {
			c := c
			con = &c
		}
	}
	if con == nil {
		return Rope{}, invalidf("rope %q: unknown construction %q", name, f[0])
	}
	d, err := strconv.ParseFloat(strings.TrimSuffix(strings.ToLower(f[1]), "mm"), 64)
	if err != nil || !(d > 0) || math.IsInf(d, 0) {
		return Rope{}, invalidf("rope %q: diameter %q is not a positive number of millimetres", name, f[1])
	}
	g, err := strconv.ParseFloat(f[2], 64)
	if err != nil || !(g > 0) || math.IsInf(g, 0) {
		return Rope{}, invalidf("rope %q: grade %q is not a positive number of N/mm²", name, f[2])
	}
	return con.Rope(units.Length(d)*units.Millimetre, units.Pressure(g)*units.Megapascal)
}
