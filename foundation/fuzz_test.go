package foundation_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// FuzzAnchorBlockCheck: any input gives either an error wrapping a
// sentinel, or results with no NaN; never a panic.
func FuzzAnchorBlockCheck(f *testing.F) {
	f.Add(3.0, 2.5, 1.5, 1.5, 0.5, 80e3, 25.0, 2.5, 1.2, 36.0, 0.0, 0.0, 19e3, false, 1.0, false)
	f.Add(1.0, 1.0, 3.0, 0.0, 0.0, 60e3, 0.0, 1.0, 3.0, 30.0, 5e3, 20e3, 18e3, true, 0.0, true)
	f.Add(0.1, 50.0, 0.2, 10.0, 1.0, 1e9, 89.0, 0.05, 0.1, 0.0, 0.0, 50e3, 17e3, true, -2.0, true)
	f.Fuzz(func(t *testing.T, l, w, h, d, mu, force, angle, x, z, phi, c, cu, gamma float64, water bool, dw float64, partial bool) {
		blk := foundation.AnchorBlock{Length: units.Length(l), Width: units.Length(w), Height: units.Length(h),
			Depth: units.Length(d), PassiveMobilisation: mu}
		if water {
			blk.Water = foundation.WaterAt(units.Length(dw))
		}
		s := foundation.Soil{UnitWeight: units.UnitWeight(gamma), Friction: deg(phi), Cohesion: units.Pressure(c), Undrained: units.Pressure(cu)}
		pulls := []foundation.AnchorPull{{Force: units.Force(force), Angle: deg(angle), X: units.Length(x), Z: units.Length(z)},
			{Force: units.Force(force / 3), Angle: deg(angle), X: units.Length(x), Z: units.Length(z), Variable: true}}
		rs, err := blk.Check(pulls, s, foundation.EC7, &foundation.Basis{PartialFactors: partial})
		if err != nil {
			if !errors.Is(err, foundation.ErrInvalid) && !errors.Is(err, foundation.ErrOutsideBase) {
				t.Fatalf("error wraps no sentinel: %v", err)
			}
			return
		}
		if len(rs) != 4 {
			t.Fatalf("%d results", len(rs))
		}
		for _, r := range rs {
			for _, v := range []float64{r.Demand, r.Capacity, r.Ratio, r.Provided} {
				if math.IsNaN(v) {
					t.Fatalf("%s: NaN in %+v", r.ID, r)
				}
			}
			for _, v := range r.Values {
				if math.IsNaN(v.Value) {
					t.Fatalf("%s: NaN value %s", r.ID, v.Symbol)
				}
			}
		}
	})
}

// FuzzBearingCapacity: any input gives an error or a finite, non-negative qult.
func FuzzBearingCapacity(f *testing.F) {
	f.Add(2.0, 2.0, 1.0, 600e3, 50e3, 0.15, 0.0, 30.0, 0.0, 0.0, 18e3, false, 0.0, 4, false)
	f.Add(1.0, 10.0, 0.0, 100e3, 200e3, 0.0, 0.3, 0.0, 0.0, 50e3, 17e3, true, 0.5, 2, true)
	f.Add(3.0, 2.0, 1.5, 300e3, 20e3, 0.2, 0.1, 25.0, 5e3, 40e3, 18e3, true, -1.0, 3, true)
	f.Fuzz(func(t *testing.T, b, l, d, v, h, eb, el, phi, c, cu, gamma float64, water bool, dw float64, m int, undrained bool) {
		in := foundation.BearingInput{AlongLoad: units.Length(b), AcrossLoad: units.Length(l), Depth: units.Length(d), Vertical: units.Force(v),
			Horizontal: units.Force(h), EccAlong: units.Length(eb), EccAcross: units.Length(el)}
		if water {
			in.Water = foundation.WaterAt(units.Length(dw))
		}
		s := foundation.Soil{UnitWeight: units.UnitWeight(gamma), Friction: deg(phi), Cohesion: units.Pressure(c), Undrained: units.Pressure(cu)}
		cond := foundation.Drained
		if undrained {
			cond = foundation.Undrained
		}
		r, err := foundation.BearingCapacity(in, s, foundation.Method(m), cond)
		if err != nil {
			if !errors.Is(err, foundation.ErrInvalid) && !errors.Is(err, foundation.ErrOutsideBase) {
				t.Fatalf("error wraps no sentinel: %v", err)
			}
			return
		}
		for _, v := range r.Values() {
			if x := v.Value; math.IsNaN(x) || math.IsInf(x, 0) || x < 0 {
				t.Fatalf("bad number %v in %+v (input %+v, soil %+v)", x, r, in, s)
			}
		}
	})
}

// FuzzRockAnchorCheck: any rock anchor and pull give an error wrapping
// ErrInvalid or results with no NaN and a non-negative cone weight.
func FuzzRockAnchorCheck(f *testing.F) {
	f.Add(4, 0.8, 0.032, 0.09, 4.0, 2.0, 30.0, 300e3, 25.0, 1.0, false, 0.3, true)
	f.Add(1, 0.0, 0.025, 0.075, 3.0, 1.0, 0.0, 1e3, 89.0, -2.0, true, 0.0, false)
	f.Add(12, 3.0, 0.05, 0.15, 10.0, 0.0, 60.0, 5e6, 5.0, 0.5, true, 0.2, true)
	f.Fuzz(func(t *testing.T, n int, s, d, dh, lb, lf, psi, pull, angle, dw float64, water bool, side float64, partial bool) {
		ra := foundation.RockAnchor{Count: n, Spacing: units.Length(s), BarDiameter: units.Length(d), YieldStrength: 500e6,
			HoleDiameter: units.Length(dh), BondLength: units.Length(lb), FreeLength: units.Length(lf), ConeAngle: deg(psi)}
		if water {
			ra.Water = foundation.WaterAt(units.Length(dw))
		}
		if side > 0 {
			ra.Plate = foundation.HeadPlate{Side: units.Length(side), Thickness: 0.02, Yield: 275e6}
		}
		rock := foundation.Soil{UnitWeight: 25e3, Friction: deg(40), IsRock: true, GroutBond: 1e6, Allowable: 2e6}
		rs, err := ra.Check(units.Force(pull), deg(angle), rock, &foundation.Basis{PartialFactors: partial})
		if err != nil {
			if !errors.Is(err, foundation.ErrInvalid) {
				t.Fatalf("error wraps no sentinel: %v", err)
			}
			return
		}
		for _, r := range rs {
			for _, v := range []float64{r.Demand, r.Capacity, r.Ratio, r.Provided} {
				if math.IsNaN(v) {
					t.Fatalf("%s: NaN in %+v", r.ID, r)
				}
			}
			for _, v := range r.Values {
				if math.IsNaN(v.Value) || (v.Symbol == "W_c" && v.Value < 0) {
					t.Fatalf("%s: value %s = %v", r.ID, v.Symbol, v.Value)
				}
			}
		}
	})
}
