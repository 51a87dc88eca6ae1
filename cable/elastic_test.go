package cable_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// ssnl114 is the cable of the code_aster validation case SSNL114
// ([R] code_aster validation manual, SSNL114; see References): level span 325 m, unstretched length = span,
// A 2.2783e-4 m², E 5.70e10 Pa, ρ 2844.23 kg/m³, g 9.81 m/s², α 2.3e-5/K.
func ssnl114() (cable.Span, cable.ElasticRope, units.ThermalExpansion) {
	const area = 2.2783e-4
	return cable.Span{Length: 325},
		cable.ElasticRope{
			Unstretched: 325,
			EA:          units.AxialStiffness(5.70e10 * area),
			Weight:      units.LoadPerLength(2844.23 * 9.81 * area),
		}, 2.3e-5
}

func TestElasticSSNL114(t *testing.T) {
	sp, rope, alpha := ssnl114()
	e, err := cable.NewElasticCatenary(sp, rope)
	if err != nil {
		t.Fatal(err)
	}
	// code_aster SSNL114 [R]: midspan sag 6.352 m at 0 °C, reference tolerance 1e-3.
	approx(t, "SSNL114 sag at 0 °C", float64(e.Sag(162.5)), 6.352, 1e-3)
	// after +39.26 K: 8.195 m, tolerance 1e-3 (this package keeps the total
	// weight when the rope lengthens: see ElasticChangeOfState).
	t0 := units.FromCelsius(0)
	hot, err := cable.ElasticChangeOfState(sp, rope, alpha, t0, t0+39.26, rope.Weight)
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "SSNL114 sag after +39.26 K", float64(hot.Sag(162.5)), 8.195, 1e-3)
	// [D] H 10 242 N, computed by hand from the elastic catenary with the weight per
	// unstretched metre kept as the rope lengthens. Check like for like: a
	// rope of unstretched length 325·(1 + αΔθ) at the old weight per metre.
	long := rope
	long.Unstretched = 325 * (1 + 2.3e-5*39.26)
	kept, err := cable.NewElasticCatenary(sp, long)
	if err != nil {
		t.Fatal(err)
	}
	approx(t, "SSNL114 H after +39.26 K, weight per metre kept", float64(kept.Horizontal()), 10242, 1e-4)
	// This package's own model keeps the total weight: 0.09 % less load, H
	// lower by about as much.
	approx(t, "SSNL114 H after +39.26 K, total weight kept", float64(hot.Horizontal()), 10242*(1-0.0009), 3e-4)
	// back to 0 °C: the linear thermal strain, measured from each start,
	// leaves the unstretched length (1 + αΔθ)(1 − αΔθ) of the start and
	// the total weight as it was
	back, err := cable.ElasticChangeOfState(sp, hot.Rope(), alpha, t0+39.26, t0, hot.Rope().Weight)
	if err != nil {
		t.Fatal(err)
	}
	adt := float64(alpha) * 39.26
	approx(t, "SSNL114 round trip length", float64(back.Rope().Unstretched), 325*(1+adt)*(1-adt), 1e-14)
	approx(t, "SSNL114 round trip weight", float64(back.Rope().Weight.Times(back.Rope().Unstretched)), float64(rope.Weight.Times(rope.Unstretched)), 1e-14)
}

func TestElasticIrvineCheck(t *testing.T) {
	// [D] Irvine's forward formulas (Cable Structures, ch. 2) by hand: H 100 kN,
	// V 80 kN, w 1 kN/m, L₀ 120 m, EA 1e5 kN give
	// l 112.39036, h 20.38319 m (forward formulas). Here the solver goes the
	// other way, from l and h to H and V.
	sp := cable.Span{Length: 112.39036, Rise: 20.38319}
	e, err := cable.NewElasticCatenary(sp, cable.ElasticRope{Unstretched: 120, EA: 1e8, Weight: 1000})
	if err != nil {
		t.Fatal(err)
	}
	_, vb := e.Reactions()
	approx(t, "H", float64(e.Horizontal()), 100e3, 1e-5)
	approx(t, "V_B", float64(vb), 80e3, 1e-5)
	// inextensible limit: l 112.27036, h 20.35919 m
	inext, err := cable.NewElasticCatenary(cable.Span{Length: 112.27036, Rise: 20.35919},
		cable.ElasticRope{Unstretched: 120, EA: 1e20, Weight: 1000})
	if err != nil {
		t.Fatal(err)
	}
	_, vb = inext.Reactions()
	approx(t, "H inextensible", float64(inext.Horizontal()), 100e3, 1e-5)
	approx(t, "V_B inextensible", float64(vb), 80e3, 1e-5)
}

func TestElasticConsistency(t *testing.T) {
	for _, c := range []struct {
		span cable.Span
		rope cable.ElasticRope
	}{
		{cable.Span{Length: 100, Rise: 10}, cable.ElasticRope{Unstretched: 104, EA: 50e6, Weight: 1000}},
		{cable.Span{Length: 100, Rise: -10}, cable.ElasticRope{Unstretched: 104, EA: 50e6, Weight: 1000}},
		{cable.Span{Length: 60}, cable.ElasticRope{Unstretched: 100, EA: 1e6, Weight: 200}},               // deep
		{cable.Span{Length: 325}, cable.ElasticRope{Unstretched: 320, EA: 13e6, Weight: 6.4}},             // shorter than the chord: taut
		{cable.Span{Length: 120, Rise: 60}, cable.ElasticRope{Unstretched: 134.3, EA: 20e6, Weight: 300}}, // vertex before A
		{cable.Span{Length: 80, Rise: 20}, cable.ElasticRope{Unstretched: 90, EA: 2e4, Weight: 100}},      // soft: strain ~ 10 %
	} {
		e, err := cable.NewElasticCatenary(c.span, c.rope)
		if err != nil {
			t.Fatalf("%+v: %v", c, err)
		}
		W := float64(c.rope.Weight) * float64(c.rope.Unstretched)
		// moment of the weight about A: ∫ x(s) w ds over the unstretched length
		moment := integrate(func(s float64) float64 {
			x, _ := e.At(units.Length(s))
			return float64(x) * float64(c.rope.Weight)
		}, 0, float64(c.rope.Unstretched))
		checkShape(t, "elastic", e, W, moment)
		// stretched length = L₀ + ∫ T/EA ds, by quadrature over s
		stretch := integrate(func(s float64) float64 {
			x, _ := e.At(units.Length(s))
			return float64(e.Tension(x))
		}, 0, float64(c.rope.Unstretched)) / float64(c.rope.EA)
		approx(t, "stretched length", float64(e.StretchedLength()), float64(c.rope.Unstretched)+stretch, 1e-8)
		approx(t, "strain", e.Strain(), stretch/float64(c.rope.Unstretched), 1e-8)
		m, err := cable.NewElasticCatenary(c.span.Mirror(), c.rope)
		if err != nil {
			t.Fatal(err)
		}
		checkMirror(t, "elastic", e, m)
		// the end of the rope is at B
		xb, zb := e.At(c.rope.Unstretched)
		approx(t, "x(L₀)", float64(xb), float64(c.span.Length), 1e-10)
		approxAbs(t, "z(L₀)", float64(zb), float64(c.span.Rise), 1e-10*float64(c.span.Length))
	}
}

// TestElasticTendsToInextensible: as EA → ∞ the elastic catenary tends to
// the catenary of the same length, with the difference in H shrinking in
// proportion to 1/EA.
func TestElasticTendsToInextensible(t *testing.T) {
	sp := cable.Span{Length: 100, Rise: -15}
	cat, err := cable.CatenaryWithLength(sp, 500, 106)
	if err != nil {
		t.Fatal(err)
	}
	// The differences vanish as 1/EA: d·EA tends to a constant (first-order
	// perturbation in the strain T/EA). Take the constants at the stiffest
	// rope and require the others to match them within a few per cent.
	diffs := func(ea float64) (dh, ds float64) {
		e, err := cable.NewElasticCatenary(sp, cable.ElasticRope{Unstretched: 106, EA: units.AxialStiffness(ea), Weight: 500})
		if err != nil {
			t.Fatal(err)
		}
		dh = math.Abs(float64(e.Horizontal()-cat.Horizontal())) / float64(cat.Horizontal())
		ds = math.Abs(float64(e.Sag(50) - cat.Sag(50)))
		return dh * ea, ds * ea
	}
	kh, ks := diffs(1e11)
	if kh == 0 || ks == 0 {
		t.Fatal("no difference at EA 1e11: the elastic catenary ignores EA")
	}
	for _, ea := range []float64{1e9, 1e10, 1e12} {
		dh, ds := diffs(ea)
		if math.Abs(dh/kh-1) > 0.03 || math.Abs(ds/ks-1) > 0.03 {
			t.Errorf("EA %g: H and sag differences × EA are %g and %g, not the %g and %g of EA 1e11", ea, dh, ds, kh, ks)
		}
	}
}

func TestElasticForSag(t *testing.T) {
	sp, rope, _ := ssnl114()
	r, err := cable.ElasticRopeForSag(sp, rope.EA, rope.Weight, 6.352)
	if err != nil {
		t.Fatal(err)
	}
	// SSNL114: this sag belongs to an unstretched length equal to the span
	// (to the 4 figures of the published sag).
	approx(t, "unstretched length for SSNL114 sag", float64(r.Unstretched), 325, 1e-5)
}

func TestElasticInvalid(t *testing.T) {
	sp := cable.Span{Length: 100}
	good := cable.ElasticRope{Unstretched: 101, EA: 1e7, Weight: 100}
	for _, c := range []struct {
		what string
		span cable.Span
		rope cable.ElasticRope
	}{
		{"zero EA", sp, cable.ElasticRope{Unstretched: 101, Weight: 100}},
		{"negative EA", sp, cable.ElasticRope{Unstretched: 101, EA: -1, Weight: 100}},
		{"zero weight", sp, cable.ElasticRope{Unstretched: 101, EA: 1e7}},
		{"zero length", sp, cable.ElasticRope{EA: 1e7, Weight: 100}},
		{"NaN length", sp, cable.ElasticRope{Unstretched: units.Length(math.NaN()), EA: 1e7, Weight: 100}},
		{"Inf EA", sp, cable.ElasticRope{Unstretched: 101, EA: units.AxialStiffness(math.Inf(1)), Weight: 100}},
		{"zero span", cable.Span{}, good},
	} {
		_, err := cable.NewElasticCatenary(c.span, c.rope)
		wantInvalid(t, c.what, err)
	}
	if errors.Is(cable.ErrInvalid, cable.ErrNoConvergence) {
		t.Error("sentinels must differ")
	}
}
