package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// ContactPressure returns the linear soil pressure under a rigid
// rectangular base of sides b (along the eccentricity) and l, carrying a
// vertical force n at eccentricity e from the centre along b:
//
//	|e| ≤ b/6 (inside the kern):  q = n/(b l) · (1 ± 6|e|/b),  contact = b
//	|e| > b/6 (outside the kern): qmax = 2n / (3 l (b/2 − |e|)),  qmin = 0,
//	                              contact = 3 (b/2 − |e|)
//
// (the classical trapezoid and triangle of a no-tension base; e.g. Das,
// Principles of Foundation Engineering, §3.11, from memory). qmax lies on
// the side of e. contact is the length along b in compression.
//
// Special cases: n = 0 gives zero pressures and full contact; n < 0
// (tension), b or l not positive, or non-finite input give an error wrapping
// ErrInvalid; |e| ≥ b/2 gives an error wrapping ErrOutsideBase.
func ContactPressure(n units.Force, e units.Length, b, l units.Length) (qmax, qmin units.Pressure, contact units.Length, err error) {
	if err := nonNegative("ContactPressure n", float64(n)); err != nil {
		return 0, 0, 0, err
	}
	if err := finite("ContactPressure e", float64(e)); err != nil {
		return 0, 0, 0, err
	}
	if err := positive("ContactPressure b", float64(b)); err != nil {
		return 0, 0, 0, err
	}
	if err := positive("ContactPressure l", float64(l)); err != nil {
		return 0, 0, 0, err
	}
	ae, bb, ll := math.Abs(float64(e)), float64(b), float64(l)
	if ae >= bb/2 {
		return 0, 0, 0, fmt.Errorf("%w: eccentricity %v reaches half of the base %v", ErrOutsideBase, e, b)
	}
	nn := float64(n)
	if ae <= bb/6 {
		mean := nn / (bb * ll)
		return units.Pressure(mean * (1 + 6*ae/bb)), units.Pressure(math.Max(mean*(1-6*ae/bb), 0)), b, nil
	}
	a := bb/2 - ae
	return units.Pressure(2 * nn / (3 * ll * a)), 0, units.Length(3 * a), nil
}

// BiaxialContact is the linear pressure under a rigid rectangular base
// that carries no tension, under a load eccentric about both axes.
type BiaxialContact struct {
	// Max and Min are the largest and least pressures, at corners of the
	// base; Min is zero when part of the base lifts off.
	Max, Min units.Pressure
	// Area is the part of the base in compression.
	Area units.Area
}

// BiaxialContactPressure returns the pressure under a rigid rectangular
// base of sides b and l carrying a vertical force n at eccentricities ex
// along b and ey along l from its centre, the soil taking no tension.
// Inside the kern (|ex|/b + |ey|/l ≤ 1/6) the whole base is in
// compression and
//
//	q = n/(b l) · (1 ± 6|ex|/b ± 6|ey|/l)
//
// (the classical formula of a rigid base, e.g. Das, Principles of
// Foundation Engineering, §3.11, from memory). Outside it the pressure
// p(x, y) = max(0, a + c_x x + c_y y) is found whose resultant is n at
// (ex, ey): the minimum of the convex function
//
//	Φ(a, c_x, c_y) = ½ ∫ p² dA − n (a + c_x ex + c_y ey)
//
// whose gradient is the misfit of the resultant and whose Hessian the
// second moments of the compressed area, by Newton's method with a
// backtracking line search, the integrals exact over the compressed
// polygon. When ex ≥ b/4 and ey ≥ l/4 the compressed area is the corner
// triangle of legs 4(b/2 − |ex|) and 4(l/2 − |ey|), under qmax = 6n/(legs'
// product), the closed form the tests check against.
//
// Special cases: as ContactPressure; ey = 0 gives ContactPressure's
// values, with Area = contact · l.
func BiaxialContactPressure(n units.Force, ex, ey, b, l units.Length) (BiaxialContact, error) {
	if err := nonNegative("BiaxialContactPressure n", float64(n)); err != nil {
		return BiaxialContact{}, err
	}
	if err := finite("BiaxialContactPressure ex", float64(ex)); err != nil {
		return BiaxialContact{}, err
	}
	if err := finite("BiaxialContactPressure ey", float64(ey)); err != nil {
		return BiaxialContact{}, err
	}
	if err := positive("BiaxialContactPressure b", float64(b)); err != nil {
		return BiaxialContact{}, err
	}
	if err := positive("BiaxialContactPressure l", float64(l)); err != nil {
		return BiaxialContact{}, err
	}
	bb, ll := float64(b), float64(l)
	x0, y0 := math.Abs(float64(ex)), math.Abs(float64(ey))
	if x0 >= bb/2 || y0 >= ll/2 {
		return BiaxialContact{}, fmt.Errorf("%w: eccentricities %v, %v reach the edge of the base %v × %v", ErrOutsideBase, ex, ey, b, l)
	}
	nn := float64(n)
	if y0 == 0 || x0 == 0 { // one axis: the closed form
		side, other, e := b, l, units.Length(x0)
		if x0 == 0 {
			side, other, e = l, b, units.Length(y0)
		}
		qmax, qmin, c, err := ContactPressure(n, e, side, other)
		return BiaxialContact{Max: qmax, Min: qmin, Area: units.Area(float64(c) * float64(other))}, err
	}
	area := bb * ll
	if x0/bb+y0/ll <= 1.0/6 {
		mean := nn / area
		return BiaxialContact{Max: units.Pressure(mean * (1 + 6*x0/bb + 6*y0/ll)),
			Min: units.Pressure(math.Max(mean*(1-6*x0/bb-6*y0/ll), 0)), Area: units.Area(area)}, nil
	}
	p, err := noTensionPlane(nn, x0, y0, bb, ll)
	if err != nil {
		return BiaxialContact{}, err
	}
	at := func(x, y float64) float64 { return math.Max(p[0]+p[1]*x+p[2]*y, 0) }
	mo := planeMoments(p, bb, ll)
	return BiaxialContact{Max: units.Pressure(at(bb/2, ll/2)), Min: units.Pressure(at(-bb/2, -ll/2)), Area: units.Area(mo[0])}, nil
}

// noTensionPlane returns the coefficients (a, c_x, c_y) of the pressure
// max(0, a + c_x x + c_y y) on the base [−b/2, b/2] × [−l/2, l/2] whose
// resultant is n at (ex, ey): Newton's method on the convex Φ of
// BiaxialContactPressure (the gradient of Φ is the resultant's misfit,
// its Hessian the second moments of the compressed area). The step is
// halved until the misfit, scaled by n, n b and n l, shrinks: Φ itself is
// too large against its last changes for a test in floating point.
func noTensionPlane(n, ex, ey, b, l float64) ([3]float64, error) {
	// Coordinates from the resultant's point (ex, ey), where the moments
	// of even a sliver of contact near an edge stay well conditioned: the
	// pressure a' + c_x x' + c_y y' must carry n with no moment about it.
	x0, x1, y0, y1 := -b/2-ex, b/2-ex, -l/2-ey, l/2-ey
	f := [3]float64{n, 0, 0}
	scale := [3]float64{n, n * b, n * l}
	// Full-contact start: the linear solution, about the new origin.
	cx, cy := 12*n*ex/(b*b*b*l), 12*n*ey/(b*l*l*l)
	p := [3]float64{n/(b*l) + cx*ex + cy*ey, cx, cy}
	misfit := func(p [3]float64) ([3]float64, [6]float64, float64) {
		m := rectMoments(p, x0, x1, y0, y1)
		// Moments: m = ∫1, ∫x, ∫y, ∫x², ∫xy, ∫y² over the compressed part.
		g := [3]float64{
			p[0]*m[0] + p[1]*m[1] + p[2]*m[2] - f[0],
			p[0]*m[1] + p[1]*m[3] + p[2]*m[4] - f[1],
			p[0]*m[2] + p[1]*m[4] + p[2]*m[5] - f[2],
		}
		r := 0.0
		for i := range g {
			r = math.Max(r, math.Abs(g[i])/scale[i])
		}
		return g, m, r
	}
	g, m, r := misfit(p)
	for iter := 0; iter < 200 && r > 1e-13; iter++ {
		d, ok := solve3([3][3]float64{{m[0], m[1], m[2]}, {m[1], m[3], m[4]}, {m[2], m[4], m[5]}}, [3]float64{-g[0], -g[1], -g[2]})
		if !ok {
			break
		}
		t := 1.0
		for ; t > 1e-12; t /= 2 {
			q := [3]float64{p[0] + t*d[0], p[1] + t*d[1], p[2] + t*d[2]}
			gq, mq, rq := misfit(q)
			if rq < r*(1-1e-4*t) {
				p, g, m, r = q, gq, mq, rq
				break
			}
		}
		if t <= 1e-12 {
			break
		}
	}
	if r <= 1e-9 {
		// Back to the base's centre: a + c_x x + c_y y = a' + c_x (x − ex) + c_y (y − ey).
		return [3]float64{p[0] - p[1]*ex - p[2]*ey, p[1], p[2]}, nil
	}
	return p, invalid("BiaxialContactPressure", fmt.Sprintf("found no pressure for eccentricities %g, %g on %g × %g (resultant too near the edge)", ex, ey, b, l))
}

// planeMoments returns the moments ∫1, ∫x, ∫y, ∫x², ∫xy, ∫y² over the part
// of the base [−b/2, b/2] × [−l/2, l/2] where a + c_x x + c_y y > 0.
func planeMoments(p [3]float64, b, l float64) [6]float64 {
	return rectMoments(p, -b/2, b/2, -l/2, l/2)
}

// rectMoments returns the moments ∫1, ∫x, ∫y, ∫x², ∫xy, ∫y² over the part
// of the rectangle [x0, x1] × [y0, y1] where a + c_x x + c_y y > 0: the
// rectangle clipped by that half-plane, fanned into triangles, each moment
// of degree two exact by the edge-midpoint rule.
func rectMoments(p [3]float64, x0, x1, y0, y1 float64) [6]float64 {
	rect := [4][2]float64{{x0, y0}, {x1, y0}, {x1, y1}, {x0, y1}}
	val := func(v [2]float64) float64 { return p[0] + p[1]*v[0] + p[2]*v[1] }
	var poly [5][2]float64 // a rectangle clipped by a line has at most 5 corners
	k := 0
	for i := range rect {
		u, w := rect[i], rect[(i+1)%4]
		fu, fw := val(u), val(w)
		if fu > 0 {
			poly[k] = u
			k++
		}
		if (fu > 0) != (fw > 0) {
			s := fu / (fu - fw)
			poly[k] = [2]float64{u[0] + s*(w[0]-u[0]), u[1] + s*(w[1]-u[1])}
			k++
		}
	}
	var m [6]float64
	for i := 1; i+1 < k; i++ {
		a, c, d := poly[0], poly[i], poly[i+1]
		area := ((c[0]-a[0])*(d[1]-a[1]) - (d[0]-a[0])*(c[1]-a[1])) / 2
		mid := [3][2]float64{{(a[0] + c[0]) / 2, (a[1] + c[1]) / 2}, {(c[0] + d[0]) / 2, (c[1] + d[1]) / 2}, {(d[0] + a[0]) / 2, (d[1] + a[1]) / 2}}
		for _, q := range mid {
			x, y := q[0], q[1]
			m[0] += area / 3
			m[1] += area / 3 * x
			m[2] += area / 3 * y
			m[3] += area / 3 * x * x
			m[4] += area / 3 * x * y
			m[5] += area / 3 * y * y
		}
	}
	return m
}

// solve3 solves the 3 × 3 system a·x = r by Cramer's rule; false when a is
// singular.
func solve3(a [3][3]float64, r [3]float64) ([3]float64, bool) {
	det := func(m [3][3]float64) float64 {
		return m[0][0]*(m[1][1]*m[2][2]-m[1][2]*m[2][1]) - m[0][1]*(m[1][0]*m[2][2]-m[1][2]*m[2][0]) + m[0][2]*(m[1][0]*m[2][1]-m[1][1]*m[2][0])
	}
	d := det(a)
	if d == 0 || math.IsNaN(d) || math.IsInf(d, 0) {
		return [3]float64{}, false
	}
	var x [3]float64
	for j := range 3 {
		m := a
		for i := range 3 {
			m[i][j] = r[i]
		}
		x[j] = det(m) / d
	}
	return x, true
}
