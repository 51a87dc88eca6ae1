package cable_test

import (
	"errors"
	"testing"

	"gonum.org/v1/gonum/diff/fd"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// TestLengthCurve checks the curve against the package's one-off forms and
// an independent derivative: at every H its length is UnstretchedLength's
// and its support tensions and angles the Loaded shape's, bit for bit (one
// computation, shared); its slope dL₀/dH agrees with gonum's central
// difference of the length; it falls with H; StateForLength inverts it.
func TestLengthCurve(t *testing.T) {
	ea := units.AxialStiffness(4 * 100e9 * 530e-6) // four 32 mm ropes, 100 GPa on 530 mm² (from memory)
	for _, c := range []struct {
		name string
		span cable.Span
		load cable.Load
	}{
		{"level, uniform", cable.Span{Length: 72}, cable.Load{Uniform: 2e3}},
		{"inclined, crowd from the left", cable.Span{Length: 72, Rise: 0.8},
			cable.Load{Uniform: 2e3, Patches: []cable.Patch{{From: 0, To: 30, Load: 5e3}}}},
		{"steep, central crowd and a deck patch", cable.Span{Length: 120, Rise: -14},
			cable.Load{Uniform: 400, Patches: []cable.Patch{{From: 40, To: 80, Load: 6e3}, {From: 0, To: 90, Load: 1.2e3}}}},
	} {
		t.Run(c.name, func(t *testing.T) {
			curve, err := cable.NewLengthCurve(c.span, ea, c.load)
			if err != nil {
				t.Fatal(err)
			}
			prev := units.Length(0)
			for k, h := range []units.Force{40e3, 150e3, 400e3, 1.5e6} {
				l0, slope := curve.At(h)
				want, err := cable.UnstretchedLength(c.span, ea, c.load, h)
				if err != nil {
					t.Fatal(err)
				}
				if l0 != want {
					t.Errorf("H %v: L₀ %v, UnstretchedLength %v", h, float64(l0), float64(want))
				}
				// Independent: gonum's central difference of the length.
				num := fd.Derivative(func(x float64) float64 {
					l, _ := curve.At(units.Force(x))
					return float64(l)
				}, float64(h), &fd.Settings{Formula: fd.Central, Step: 1e-4 * float64(h)})
				approx(t, "dL₀/dH", slope, num, 1e-6)
				if k > 0 && !(l0 < prev) {
					t.Errorf("L₀ does not fall with H: %v at %v after %v", float64(l0), h, float64(prev))
				}
				prev = l0
				shape, err := cable.NewLoaded(c.span, c.load, h)
				if err != nil {
					t.Fatal(err)
				}
				ta, tb, aa, ab := curve.Supports(h)
				wta, wtb := shape.SupportTensions()
				waa, wab := shape.SupportAngles()
				if ta != wta || tb != wtb || aa != waa || ab != wab {
					t.Errorf("H %v: supports %v %v %v %v, Loaded %v %v %v %v", h, ta, tb, aa, ab, wta, wtb, waa, wab)
				}
			}
			// StateForLength inverts the curve.
			l0, _ := curve.At(150e3)
			st, err := cable.StateForLength(c.span, ea, c.load, l0, units.FromCelsius(20))
			if err != nil {
				t.Fatal(err)
			}
			approx(t, "StateForLength's H", float64(st.H), 150e3, 1e-12)
		})
	}
}

// TestLengthCurveErrors checks bad input and the strain limit.
func TestLengthCurveErrors(t *testing.T) {
	sp := cable.Span{Length: 50}
	if _, err := cable.NewLengthCurve(sp, 0, cable.Load{Uniform: 1e3}); !errors.Is(err, cable.ErrInvalid) {
		t.Errorf("EA 0: %v", err)
	}
	if _, err := cable.NewLengthCurve(sp, 1e8, cable.Load{}); !errors.Is(err, cable.ErrInvalid) {
		t.Errorf("no load: %v", err)
	}
	curve, err := cable.NewLengthCurve(sp, 1e8, cable.Load{Uniform: 1e3})
	if err != nil {
		t.Fatal(err)
	}
	if err := curve.CheckStrain(4e6); err != nil {
		t.Errorf("strain 4 %%: %v", err)
	}
	err = curve.CheckStrain(6e6)
	if !errors.Is(err, cable.ErrInvalid) || err.Error() != "cable: the new state strains the rope by 6.0 %, beyond the small-strain model (5 %): invalid input" {
		t.Errorf("strain 6 %%: %v", err)
	}
	if err := curve.CheckStrain(0); !errors.Is(err, cable.ErrInvalid) {
		t.Errorf("H 0: %v", err)
	}
}
