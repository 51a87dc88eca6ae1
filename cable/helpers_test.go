package cable_test

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/integrate/quad"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// approx fails t unless got is within relative tolerance rel of want.
func approx(t *testing.T, what string, got, want, rel float64) {
	t.Helper()
	if !scalar.EqualWithinAbsOrRel(got, want, 0, rel) || math.IsNaN(got) {
		t.Errorf("%s = %.10g, want %.10g (rel tol %g, off by %.3g)", what, got, want, rel, (got-want)/want)
	}
}

// approxAbs fails t unless got is within abs of want (for values that
// should vanish, with abs chosen relative to the problem's scale).
func approxAbs(t *testing.T, what string, got, want, abs float64) {
	t.Helper()
	if !scalar.EqualWithinAbsOrRel(got, want, abs, 0) || math.IsNaN(got) {
		t.Errorf("%s = %.10g, want %.10g (abs tol %g)", what, got, want, abs)
	}
}

// integrate returns ∫ f over [a, b] by 400-point Gauss–Legendre (gonum),
// the independent quadrature used to check closed forms.
func integrate(f func(float64) float64, a, b float64) float64 {
	return quad.Fixed(f, a, b, 400, quad.Legendre{}, 0)
}

// slopeOf returns dz/dx of shape at x by a central difference.
func slopeOf(s cable.Shape, x float64) float64 {
	L := float64(s.Span().Length)
	h := 1e-5 * L
	x1, x2 := math.Max(0, x-h), math.Min(L, x+h)
	return float64(s.Z(units.Length(x2))-s.Z(units.Length(x1))) / (x2 - x1)
}

// checkShape runs the consistency tests every shape must pass: finite
// values, tension from H and V, angles from V/H, sag = chord − z, support
// elevations, vertical equilibrium against total, and moment equilibrium
// about A against the moment of the load moment.
func checkShape(t *testing.T, name string, s cable.Shape, total, loadMomentA float64) {
	t.Helper()
	sp := s.Span()
	L, h := float64(sp.Length), float64(sp.Rise)
	H := float64(s.Horizontal())
	va, vb := s.Reactions()
	ta, tb := s.SupportTensions()
	aa, ab := s.SupportAngles()
	for _, v := range []float64{H, float64(va), float64(vb), float64(ta), float64(tb), float64(aa), float64(ab), float64(s.Length())} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("%s: non-finite value %v", name, v)
		}
	}
	scale := math.Hypot(H, total)
	approx(t, name+" T_A", float64(ta), math.Hypot(H, float64(va)), 1e-12)
	approx(t, name+" T_B", float64(tb), math.Hypot(H, float64(vb)), 1e-12)
	approx(t, name+" Tension(0)", float64(s.Tension(0)), float64(ta), 1e-9)
	approx(t, name+" Tension(L)", float64(s.Tension(sp.Length)), float64(tb), 1e-9)
	approxAbs(t, name+" tan a", math.Tan(float64(aa)), float64(va)/H, 1e-12*(1+math.Abs(float64(va)/H)))
	approxAbs(t, name+" tan b", math.Tan(float64(ab)), float64(vb)/H, 1e-12*(1+math.Abs(float64(vb)/H)))
	approxAbs(t, name+" z(0)", float64(s.Z(0)), 0, 1e-9*L)
	approxAbs(t, name+" z(L)", float64(s.Z(sp.Length)), h, 1e-9*math.Hypot(L, h))
	// vertical equilibrium: ΣV = load
	approxAbs(t, name+" ΣV − load", float64(va+vb)-total, 0, 1e-9*scale)
	// moment about A: L V_B − h H = ∫ x dP
	approxAbs(t, name+" ΣM_A", L*float64(vb)-h*H-loadMomentA, 0, 1e-9*scale*L)
	// slope at the supports agrees with the angles
	approxAbs(t, name+" slope at A", -slopeOf(s, 0), float64(va)/H, 1e-3*(1+math.Abs(float64(va)/H)))
	for _, x := range []float64{0.1, 0.37, 0.5, 0.81} {
		xx := units.Length(x * L)
		approxAbs(t, name+" sag+z = chord", float64(s.Sag(xx)+s.Z(xx)), h*x, 1e-9*math.Hypot(L, h))
		// tension from the local slope: T = H √(1 + z'²)
		approx(t, name+" T(x) from slope", float64(s.Tension(xx)), H*math.Hypot(1, slopeOf(s, x*L)), 1e-6)
	}
	// arc length by quadrature of √(1 + z'²)
	pieces := 8
	var S float64
	for i := 0; i < pieces; i++ {
		S += integrate(func(x float64) float64 { return math.Hypot(1, slopeOf(s, x)) }, L*float64(i)/float64(pieces), L*float64(i+1)/float64(pieces))
	}
	approx(t, name+" length vs quadrature", float64(s.Length()), S, 1e-8)
	// low point: lowest where within; slope zero there
	x0, z0, within := s.Vertex()
	if within {
		for _, x := range []float64{0, 0.25, 0.5, 0.75, 1} {
			if z := float64(s.Z(units.Length(x * L))); z < float64(z0)-1e-9*L {
				t.Errorf("%s: z(%g L) = %g below the low point %g", name, x, z, float64(z0))
			}
		}
		approx(t, name+" z at low point", float64(s.Z(x0)), float64(z0), 1e-9)
	}
	// lowest point within the span: no sampled point lies below it, and it
	// is the vertex when that is within, else a support
	lx, lz := s.LowPoint()
	if lx < 0 || float64(lx) > L {
		t.Errorf("%s: lowest point x = %g outside the span", name, float64(lx))
	}
	for i := 0; i <= 100; i++ {
		x := units.Length(float64(i) / 100 * L)
		if z := s.Z(x); float64(z) < float64(lz)-1e-9*L {
			t.Errorf("%s: z(%g) = %g below the lowest point %g", name, float64(x), float64(z), float64(lz))
		}
	}
	approxAbs(t, name+" z at lowest point", float64(s.Z(lx)), float64(lz), 1e-9*L)
	// maximum tension: no sampled tension exceeds it, and it is reached
	tmax := float64(s.MaxTension())
	approx(t, name+" max tension", tmax, math.Max(float64(ta), float64(tb)), 0)
	for i := 0; i <= 100; i++ {
		if tx := float64(s.Tension(units.Length(float64(i) / 100 * L))); tx > tmax*(1+1e-12) {
			t.Errorf("%s: tension %g at %d %% of the span above the maximum %g", name, tx, i, tmax)
		}
	}
}

// checkMirror compares a shape over s with the one over the mirrored span.
func checkMirror(t *testing.T, name string, a, b cable.Shape) {
	t.Helper()
	L := float64(a.Span().Length)
	h := float64(a.Span().Rise)
	vaA, vbA := a.Reactions()
	vaB, vbB := b.Reactions()
	approx(t, name+" mirror V_A", float64(vaB), float64(vbA), 1e-9)
	approx(t, name+" mirror V_B", float64(vbB), float64(vaA), 1e-9)
	aa, ab := a.SupportAngles()
	ba, bb := b.SupportAngles()
	approx(t, name+" mirror angle A", float64(ba), float64(ab), 1e-9)
	approx(t, name+" mirror angle B", float64(bb), float64(aa), 1e-9)
	approx(t, name+" mirror H", float64(b.Horizontal()), float64(a.Horizontal()), 1e-9)
	approx(t, name+" mirror length", float64(b.Length()), float64(a.Length()), 1e-12)
	for _, x := range []float64{0.2, 0.5, 0.7} {
		// z_b(x) = z_a(L − x) − h
		approxAbs(t, name+" mirror z", float64(b.Z(units.Length(x*L))), float64(a.Z(units.Length((1-x)*L)))-h, 1e-9*L)
		approx(t, name+" mirror T", float64(b.Tension(units.Length(x*L))), float64(a.Tension(units.Length((1-x)*L))), 1e-9)
	}
	xa, za, wa := a.Vertex()
	xb, zb, wb := b.Vertex()
	if wa != wb {
		t.Errorf("%s mirror: low point within %v vs %v", name, wa, wb)
	}
	approxAbs(t, name+" mirror low x", float64(xb), L-float64(xa), 1e-9*L)
	approxAbs(t, name+" mirror low z", float64(zb), float64(za)-h, 1e-9*L)
}

// wantInvalid fails t unless err wraps cable.ErrInvalid and starts with "cable: ".
func wantInvalid(t *testing.T, what string, err error) {
	t.Helper()
	if !errors.Is(err, cable.ErrInvalid) {
		t.Errorf("%s: err = %v, want ErrInvalid", what, err)
		return
	}
	if msg := err.Error(); len(msg) < 7 || msg[:7] != "cable: " {
		t.Errorf("%s: message %q does not start with the package name", what, msg)
	}
}

// allFinite reports whether every value is a finite number.
func allFinite(xs ...float64) bool {
	for _, x := range xs {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}

// shapeFinite reports whether every answer of s is finite.
func shapeFinite(s cable.Shape) bool {
	va, vb := s.Reactions()
	ta, tb := s.SupportTensions()
	aa, ab := s.SupportAngles()
	x0, z0, _ := s.Vertex()
	L := s.Span().Length
	return allFinite(float64(s.Horizontal()), float64(va), float64(vb), float64(ta), float64(tb), float64(aa), float64(ab),
		float64(s.Length()), float64(x0), float64(z0), float64(s.Z(L/3)), float64(s.Sag(L/2)), float64(s.Tension(L/2)))
}
