package foundation_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// FuzzAnchorBlockCheck: any input gives either an error wrapping a
// sentinel, or results with no NaN; never a panic.
func FuzzAnchorBlockCheck(f *testing.F) {
	f.Add(3.0, 2.5, 1.5, 1.5, 0.5, 80e3, 25.0, 2.5, 1.2, 36.0, 0.0, 0.0, 19e3, false, 1.0, false, 0.0)
	f.Add(1.0, 1.0, 3.0, 0.0, 0.0, 60e3, 0.0, 1.0, 3.0, 30.0, 5e3, 20e3, 18e3, true, 0.0, true, 12.0)
	f.Add(0.1, 50.0, 0.2, 10.0, 1.0, 1e9, 89.0, 0.05, 0.1, 0.0, 0.0, 50e3, 17e3, true, -2.0, true, 0.0)
	f.Add(3.0, 2.5, 1.5, 1.5, 0.5, 80e3, 25.0, 2.5, 1.2, 36.0, 0.0, 0.0, 19e3, false, 1.0, false, 36.0)
	f.Fuzz(func(t *testing.T, l, w, h, d, mu, force, angle, x, z, phi, c, cu, gamma float64, water bool, dw float64, partial bool, slope float64) {
		blk := foundation.AnchorBlock{Length: units.Length(l), Width: units.Length(w), Height: units.Length(h),
			Depth: units.Length(d), PassiveMobilisation: mu, GroundSlope: deg(slope)}
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

// FuzzBearingCapacity: any input (ground slope included) gives an error or a
// finite, non-negative qult.
func FuzzBearingCapacity(f *testing.F) {
	f.Add(2.0, 2.0, 1.0, 600e3, 50e3, 0.15, 0.0, 30.0, 0.0, 0.0, 18e3, false, 0.0, 4, false, 0.0)
	f.Add(1.0, 10.0, 0.0, 100e3, 200e3, 0.0, 0.3, 0.0, 0.0, 50e3, 17e3, true, 0.5, 2, true, 20.0)
	f.Add(3.0, 2.0, 1.5, 300e3, 20e3, 0.2, 0.1, 25.0, 5e3, 40e3, 18e3, true, -1.0, 3, true, 44.0)
	f.Add(2.0, 3.0, 1.0, 300e3, 0.0, 0.0, 0.0, 36.0, 2e3, 0.0, 19e3, false, 0.0, 2, false, 35.9)
	f.Fuzz(func(t *testing.T, b, l, d, v, h, eb, el, phi, c, cu, gamma float64, water bool, dw float64, m int, undrained bool, slope float64) {
		in := foundation.BearingInput{AlongLoad: units.Length(b), AcrossLoad: units.Length(l), Depth: units.Length(d), Vertical: units.Force(v),
			Horizontal: units.Force(h), EccAlong: units.Length(eb), EccAcross: units.Length(el), GroundSlope: deg(slope)}
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
			// Undrained on sloping ground Vesić's Nγ = −2 sin β: the γ term
			// is negative there, and only there.
			negative := undrained && in.GroundSlope > 0 && (v.Symbol == "N_γ" || v.Symbol == "q_γ")
			if x := v.Value; math.IsNaN(x) || math.IsInf(x, 0) || x < 0 && !negative {
				t.Fatalf("bad number %v in %+v (input %+v, soil %+v)", x, r, in, s)
			}
		}
		if r.Qult < 0 {
			t.Fatalf("negative qult %v", r.Qult)
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

// noNaNResults fails t if any number of rs is NaN.
func noNaNResults(t *testing.T, rs []check.Result) {
	t.Helper()
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
}

// sentinel fails t unless err wraps one of the package's sentinels.
func sentinel(t *testing.T, err error) {
	t.Helper()
	if !errors.Is(err, foundation.ErrInvalid) && !errors.Is(err, foundation.ErrOutsideBase) {
		t.Fatalf("error wraps no sentinel: %v", err)
	}
}

// FuzzFootingCheck: any footing, load in both directions and ground give
// an error wrapping a sentinel or three results with no NaN.
func FuzzFootingCheck(f *testing.F) {
	f.Add(2.4, 3.0, 0.7, 1.2, 500e3, 20e3, 60e3, 25e3, 80e3, 36.0, 0.0, 0.0, 19e3, false, 0.0, false, 0.0, false)
	f.Add(2.0, 2.0, 0.6, 1.0, 300e3, 40e3, 0.0, 0.0, 0.0, 26.0, 2e3, 20e3, 17e3, true, 0.0, true, 0.0, false)
	f.Add(2.0, 2.4, 0.6, 0.8, 500e3, 0.0, 1e3, 30e3, 270e3, 40.0, 0.0, 0.0, 25e3, true, -1.0, false, 1.2e6, true)
	f.Add(3.0, 2.0, 0.5, 0.5, 528e3, 30e3, 120e3, -40e3, 60e3, 30.0, 0.0, 30e3, 18e3, false, 0.0, true, 200e3, false)
	f.Fuzz(func(t *testing.T, along, across, thick, depth, v, h, m, hy, my, phi, c, cu, gamma float64, water bool, dw float64,
		partial bool, allowable float64, rock bool) {
		ft := foundation.Footing{Along: units.Length(along), Across: units.Length(across), Thickness: units.Length(thick), Depth: units.Length(depth)}
		if water {
			ft.Water = foundation.WaterAt(units.Length(dw))
		}
		s := foundation.Soil{UnitWeight: units.UnitWeight(gamma), Friction: deg(phi), Cohesion: units.Pressure(c), Undrained: units.Pressure(cu),
			Allowable: units.Pressure(allowable), IsRock: rock}
		if rock {
			s.Undrained = 0
		}
		ld := foundation.FootingLoad{Vertical: units.Force(v), Horizontal: units.Force(h), Moment: units.Moment(m),
			HorizontalAcross: units.Force(hy), MomentAcross: units.Moment(my), VariableShare: 0.3}
		rs, err := ft.Check(ld, s, foundation.EC7, &foundation.Basis{PartialFactors: partial})
		if err != nil {
			sentinel(t, err)
			return
		}
		if len(rs) != 3 {
			t.Fatalf("%d results", len(rs))
		}
		noNaNResults(t, rs)
	})
}

// FuzzDeadmanCheck: any deadman, pull and ground give an error wrapping
// ErrInvalid or four results with no NaN.
func FuzzDeadmanCheck(f *testing.F) {
	f.Add(5.0, 1.2, 0.6, 2.0, 300e3, 20.0, 30.0, 0.0, 0.0, 18e3, false, 0.0, true, false, 355e6)
	f.Add(3.0, 1.0, 0.3, 1.5, 60e3, 0.0, 25.0, 5e3, 100e3, 19e3, true, 1.0, false, true, 0.0)
	f.Add(6.0, 0.5, 0.8, 3.0, 1e6, 60.0, 0.0, 0.0, 40e3, 17e3, true, -0.5, true, false, 275e6)
	f.Fuzz(func(t *testing.T, l, h, thick, depth, force, angle, phi, c, cu, gamma float64, water bool, dw float64, ends, partial bool, fy float64) {
		d := foundation.Deadman{Length: units.Length(l), Height: units.Length(h), Thickness: units.Length(thick), Depth: units.Length(depth), EndEffects: ends}
		if water {
			d.Water = foundation.WaterAt(units.Length(dw))
		}
		if fy != 0 {
			d.Section = foundation.SteelSection{Yield: units.Pressure(fy), PlasticModulus: 2e-3, ShearArea: 5e-3}
		}
		s := foundation.Soil{UnitWeight: units.UnitWeight(gamma), Friction: deg(phi), Cohesion: units.Pressure(c), Undrained: units.Pressure(cu)}
		rs, err := d.Check([]foundation.AnchorPull{{Force: units.Force(force), Angle: deg(angle)}}, s, &foundation.Basis{PartialFactors: partial})
		if err != nil {
			sentinel(t, err)
			return
		}
		if len(rs) != 4 {
			t.Fatalf("%d results", len(rs))
		}
		noNaNResults(t, rs)
	})
}

// FuzzBiaxialContactPressure: any force, eccentricities and base give an
// error wrapping a sentinel, or finite pressures with Max ≥ Min ≥ 0 and an
// area in compression within the base.
func FuzzBiaxialContactPressure(f *testing.F) {
	f.Add(600e3, 0.2, 0.1, 3.0, 2.0)
	f.Add(600e3, 1.0, 0.6, 3.0, 2.0)
	f.Add(500e3, 0.01, 0.5433226619603501, 2.0, 2.4)
	f.Add(1.0, 1.4999, 0.9999, 3.0, 2.0)
	f.Fuzz(func(t *testing.T, n, ex, ey, b, l float64) {
		c, err := foundation.BiaxialContactPressure(units.Force(n), units.Length(ex), units.Length(ey), units.Length(b), units.Length(l))
		if err != nil {
			sentinel(t, err)
			return
		}
		mx, mn, a := float64(c.Max), float64(c.Min), float64(c.Area)
		if math.IsNaN(mx+mn+a) || math.IsInf(mx, 0) || !(mx >= mn && mn >= 0) || !(a >= 0 && a <= b*l*(1+1e-9)) {
			t.Fatalf("n %g e %g, %g on %g × %g: %+v", n, ex, ey, b, l, c)
		}
	})
}
