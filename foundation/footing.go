package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Footing is a rectangular concrete pad under a tower column, with its
// base at Depth below the ground surface. Frame: x along the bridge (side
// B), z up, origin at the centre of the base.
type Footing struct {
	// B is the side along the bridge (x), L the side across it.
	B, L units.Length
	// Thickness of the pad; Depth of its base below ground. Soil over the
	// pad (Depth − Thickness, over the whole plan area, the column's
	// footprint neglected) is counted as weight.
	Thickness, Depth units.Length
	// UnitWeight of the pad; zero → ConcreteUnitWeight (24 kN/m³).
	UnitWeight units.UnitWeight
	// Groundwater is true when the water table lies WaterDepth below
	// ground: the pad is buoyed and the bearing capacity reduced.
	Groundwater bool
	WaterDepth  units.Length
}

// FootingLoad is the load from the tower, brought to the underside of the
// footing, about the centre of its base, excluding the pad's own weight
// and the soil on it (Check adds them).
type FootingLoad struct {
	// Vertical is positive downward; Horizontal positive toward +x.
	Vertical, Horizontal units.Force
	// Moment turns toward +x (presses the +x edge); it includes the
	// horizontal load's lever arm down to the underside.
	Moment units.Moment
	// VariableShare is the fraction of each component due to variable
	// actions (0 to 1), used only by the partial-factor basis.
	VariableShare float64
	// Split, when true, takes the variable part of each component from
	// VariableVertical, VariableHorizontal and VariableMoment (signed, in
	// the same convention) instead of VariableShare, the rest of each
	// component being permanent. Each part is then factored by the side it
	// acts on, so a permanent part opposing the variable one counts as
	// favourable (EN 1990 6.4.3.2, from memory). Partial-factor basis only.
	Split              bool
	VariableVertical   units.Force
	VariableHorizontal units.Force
	VariableMoment     units.Moment
}

// variable returns the variable parts of the vertical, horizontal and
// moment components.
func (ld FootingLoad) variable() (v, h, m float64) {
	if ld.Split {
		return float64(ld.VariableVertical), float64(ld.VariableHorizontal), float64(ld.VariableMoment)
	}
	return ld.VariableShare * float64(ld.Vertical), ld.VariableShare * float64(ld.Horizontal), ld.VariableShare * float64(ld.Moment)
}

// design returns the design effect, in direction d (+1 or −1), of a
// component x of which q is variable: the permanent part x − q and the
// variable part q are each factored as unfavourable when they act in
// direction d and as favourable otherwise (a favourable variable part
// counts zero), and the sum is projected on d.
func (s actionSet) design(x, q, d float64) float64 {
	p := x - q
	return d * (s.factor(p*d > 0, false)*p + s.factor(q*d > 0, true)*q)
}

// worst returns the larger design effect of a component over both
// directions, and that direction.
func (s actionSet) worst(x, q float64) (effect, dir float64) {
	plus, minus := s.design(x, q, 1), s.design(x, q, -1)
	if minus > plus {
		return minus, -1
	}
	return plus, 1
}

func (f Footing) validate() error {
	for _, x := range []struct {
		name string
		v    float64
	}{{"Footing.B", float64(f.B)}, {"Footing.L", float64(f.L)}, {"Footing.Thickness", float64(f.Thickness)}} {
		if err := positive(x.name, x.v); err != nil {
			return err
		}
	}
	if err := nonNegative("Footing.Depth", float64(f.Depth)); err != nil {
		return err
	}
	if err := nonNegative("Footing.UnitWeight", float64(f.UnitWeight)); err != nil {
		return err
	}
	if f.Groundwater {
		return nonNegative("Footing.WaterDepth", float64(f.WaterDepth))
	}
	return nil
}

func (ld FootingLoad) validate() error {
	if err := finite("FootingLoad.Vertical", float64(ld.Vertical)); err != nil {
		return err
	}
	if err := finite("FootingLoad.Horizontal", float64(ld.Horizontal)); err != nil {
		return err
	}
	if err := finite("FootingLoad.Moment", float64(ld.Moment)); err != nil {
		return err
	}
	for _, x := range []struct {
		name string
		v    float64
	}{{"FootingLoad.VariableVertical", float64(ld.VariableVertical)}, {"FootingLoad.VariableHorizontal", float64(ld.VariableHorizontal)}, {"FootingLoad.VariableMoment", float64(ld.VariableMoment)}} {
		if math.IsNaN(x.v) || math.IsInf(x.v, 0) {
			return finite(x.name, x.v)
		}
	}
	return fraction("FootingLoad.VariableShare", ld.VariableShare)
}

// factorOf returns the factor on a load of which share is variable.
func (s actionSet) factorOf(unfavourable bool, share float64) float64 {
	return (1-share)*s.factor(unfavourable, false) + share*s.factor(unfavourable, true)
}

// Check verifies the footing under the tower load on soil s with the
// bearing-capacity method m, with result IDs "footing.bearing",
// "footing.sliding" and "footing.overturning".
//
// With W the pad's and soil cover's weight less buoyancy and N = V + W:
//
//	bearing:     e = M/N along B; N/A' on B' = B − 2|e| against qult (method m),
//	             or, on the allowable basis, the peak contact pressure against
//	             Soil.Allowable when given
//	sliding:     driving |H|, resisting N tan δ (cohesion and passive ignored)
//	overturning: about the base edge the moment turns toward:
//	             driving |M| (+ |V|·B/2 when V pulls up), resisting (W + V⁺)·B/2
//
// Allowable basis: factors of safety 3.0 (bearing), 1.5 (sliding), 2.0
// (overturning) unless set in b. Partial basis: overturning in EQU,
// sliding and bearing in GEO by the chosen design approach, the vertical
// load taken both unfavourable and favourable; the worse is reported.
//
// Special cases: no horizontal load or moment gives a provided factor of
// +Inf; a resultant outside the base fails bearing with a note; N ≤ 0
// (net uplift) passes bearing with a note while overturning fails.
// Invalid input returns an error wrapping ErrInvalid.
func (f Footing) Check(load FootingLoad, s Soil, m Method, b *Basis) ([]check.Result, error) {
	return f.AppendCheck(nil, load, s, m, b)
}

// AppendCheck is Check appending its results to dst, for callers that
// check many footings and reuse one slice.
func (f Footing) AppendCheck(dst []check.Result, load FootingLoad, s Soil, m Method, b *Basis) ([]check.Result, error) {
	if err := f.validate(); err != nil {
		return nil, err
	}
	if err := load.validate(); err != nil {
		return nil, err
	}
	if err := s.Validate(); err != nil {
		return nil, err
	}
	if !m.valid() {
		return nil, invalid("Method", fmt.Sprintf("%d is not a known method", int(m)))
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	ld := AnchorBlock{Length: f.B, Width: f.L, Height: f.Thickness, Depth: f.Depth, UnitWeight: f.UnitWeight,
		Groundwater: f.Groundwater, WaterDepth: f.WaterDepth}.loads(s)
	if !bs.PartialFactors {
		set := bs.allowableSet()
		bear, err := f.bearing(load, s, m, ld, set, false, def(bs.Bearing, 3))
		if err != nil {
			return nil, err
		}
		return append(dst, bear, f.sliding(load, s, ld, set, def(bs.Sliding, 1.5)),
			f.overturning(load, ld, set, def(bs.Overturning, 2))), nil
	}
	var bear, slide check.Result
	first := true
	for _, set := range bs.geoSets() {
		r := f.sliding(load, s, ld, set, 1)
		if first || r.Ratio > slide.Ratio {
			slide = r
		}
		for _, fav := range []bool{false, true} {
			r, err := f.bearing(load, s, m, ld, set, fav, 1)
			if err != nil {
				return nil, err
			}
			if first || r.Ratio > bear.Ratio {
				bear = r
			}
			first = false
		}
	}
	return append(dst, bear, slide, f.overturning(load, ld, bs.equSet(), 1)), nil
}

func (f Footing) bearing(load FootingLoad, s Soil, m Method, ld blockLoads, set actionSet, favourable bool, fs float64) (check.Result, error) {
	const id, title = "footing.bearing", "Footing bearing pressure"
	qv, qh, qm := load.variable()
	// Downward load presses on the base: unfavourable for bearing, or
	// favourable in the run that takes it so.
	down := set.design(float64(load.Vertical), qv, 1)
	if favourable {
		down = -set.design(float64(load.Vertical), qv, -1)
	}
	n := set.gG*(ld.weight-ld.buoyancy) + down
	h, _ := set.worst(float64(load.Horizontal), qh)
	mo, dir := set.worst(float64(load.Moment), qm)
	mo *= dir
	basis := bearingBasis(set, s, fs)
	if n <= 0 {
		return set.note(check.Compare(id, title, units.KindPressure, 0, 0).WithBasis(basis),
			"net uplift: the footing lifts off its base"), nil
	}
	return baseBearing(id, title, basis, f.B, f.L, f.Depth, f.Groundwater, f.WaterDepth,
		units.Force(n), units.Force(math.Max(h, 0)), units.Length(mo/n), s, m, set, fs)
}

func (f Footing) sliding(load FootingLoad, s Soil, ld blockLoads, set actionSet, fs float64) check.Result {
	qv, qh, _ := load.variable()
	sd := s.factored(set.gPhi, set.gC)
	// The downward load holds the footing: favourable.
	n := set.gGfav*ld.weight - set.gG*ld.buoyancy - set.design(float64(load.Vertical), qv, -1)
	tanD := math.Tan(float64(sd.InterfaceFriction()))
	drive, _ := set.worst(float64(load.Horizontal), qh)
	r := check.Stability("footing.sliding", "Footing sliding", units.KindForce, math.Max(drive, 0), math.Max(n, 0)*tanD/set.gRh, fs).
		WithBasis(basisOf(set, "base friction", fs))
	if set.terse {
		return r
	}
	return r.WithNote(fmt.Sprintf("base friction angle δ = %v on normal force %v; cohesion and passive resistance ignored",
		sd.InterfaceFriction(), units.Force(n)))
}

func (f Footing) overturning(load FootingLoad, ld blockLoads, set actionSet, fs float64) check.Result {
	qv, _, qm := load.variable()
	half := float64(f.B) / 2
	mo, _ := set.worst(float64(load.Moment), qm)
	dst := math.Max(mo, 0) + set.gG*ld.buoyancy*half
	stb := set.gGfav * ld.weight * half
	// The vertical load restores when it presses down and overturns when
	// it pulls up; each part is factored as favourable when it presses
	// down (the net factored value then decides the side).
	if down := -set.design(float64(load.Vertical), qv, -1); down >= 0 {
		stb += down * half
	} else {
		dst -= down * half
	}
	return check.Stability("footing.overturning", "Footing overturning about the base edge", units.KindMoment, dst, stb, fs).
		WithBasis(basisOf(set, "the restoring moment about the base edge", fs))
}
