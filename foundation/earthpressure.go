package foundation

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// maxEarthFriction bounds φ' in the earth-pressure coefficients.
const maxEarthFriction = 60 * units.Degree

func checkPhi(phi units.Angle) error {
	if !(phi > 0 && phi <= maxEarthFriction) {
		return invalid("friction angle", "must be more than 0 and at most 60 deg")
	}
	return nil
}

// RankineActive returns Rankine's active earth-pressure coefficient for a
// vertical smooth wall retaining backfill that rises at angle slope:
//
//	Ka = cos β · (cos β − √(cos²β − cos²φ)) / (cos β + √(cos²β − cos²φ))
//	   = (1 − sin φ)/(1 + sin φ)   for β = 0
//
// The pressure Ka·γ·z acts parallel to the backfill surface (Das,
// Principles of Foundation Engineering, §7.5, from memory; Rankine 1857).
//
// Special cases: φ outside (0, 60°], or |β| > φ (no limiting equilibrium
// of the slope) give an error wrapping ErrInvalid.
func RankineActive(phi, slope units.Angle) (float64, error) {
	cb, root, err := rankineParts(phi, slope)
	if err != nil {
		return 0, err
	}
	return cb * (cb - root) / (cb + root), nil
}

// RankinePassive returns Rankine's passive earth-pressure coefficient for a
// vertical smooth wall and ground sloping at angle slope:
//
//	Kp = cos β · (cos β + √(cos²β − cos²φ)) / (cos β − √(cos²β − cos²φ))
//	   = (1 + sin φ)/(1 − sin φ)   for β = 0
//
// Source and special cases as RankineActive.
func RankinePassive(phi, slope units.Angle) (float64, error) {
	cb, root, err := rankineParts(phi, slope)
	if err != nil {
		return 0, err
	}
	return cb * (cb + root) / (cb - root), nil
}

func rankineParts(phi, slope units.Angle) (cb, root float64, err error) {
	if err := checkPhi(phi); err != nil {
		return 0, 0, err
	}
	if !(math.Abs(float64(slope)) <= float64(phi)) {
		return 0, 0, invalid("slope", "must not exceed the friction angle in magnitude")
	}
	cb = math.Cos(float64(slope))
	cp := math.Cos(float64(phi))
	return cb, math.Sqrt(math.Max(cb*cb-cp*cp, 0)), nil
}

// CoulombActive returns Coulomb's active earth-pressure coefficient with
// wall friction delta, the back of the wall at angle wallBack from the
// vertical (positive when the back leans away from the retained soil: its
// top is farther from the soil than its heel, and the soil rests on it)
// and backfill rising at angle slope:
//
//	Ka = cos²(φ − θ) / { cos²θ cos(δ + θ) [1 + √( sin(φ + δ) sin(φ − β) / (cos(δ + θ) cos(θ − β)) )]² }
//
// with θ = wallBack, β = slope. The resultant ½Ka γ H² (H the vertical
// height) acts at δ to the normal of the wall back (Murthy, Geotechnical
// Engineering, eq. 11.51 form; Das, Principles of Foundation Engineering,
// §7.9, from memory). The sign of θ is confirmed by the trial-wedge test
// beside this file.
//
// Special cases: φ outside (0, 60°], δ outside [0, φ], |θ| ≥ 90°, or
// β > φ give an error wrapping ErrInvalid.
func CoulombActive(phi, delta, wallBack, slope units.Angle) (float64, error) {
	if err := coulombCheck(phi, delta, wallBack, slope); err != nil {
		return 0, err
	}
	if slope > phi {
		return 0, invalid("slope", "must not exceed the friction angle")
	}
	f, d, t, b := float64(phi), float64(delta), float64(wallBack), float64(slope)
	den := math.Cos(d+t) * math.Cos(t-b)
	if !(den > 0) {
		return 0, invalid("wallBack", "and delta give a wall the soil cannot act on")
	}
	root := math.Sqrt(math.Max(math.Sin(f+d)*math.Sin(f-b)/den, 0))
	c := math.Cos(f - t)
	ct := math.Cos(t)
	return c * c / (ct * ct * math.Cos(d+t) * (1 + root) * (1 + root)), nil
}

// CoulombPassive returns Coulomb's passive earth-pressure coefficient, with
// the same arguments as CoulombActive and the ground in front rising at
// angle slope:
//
//	Kp = cos²(φ + θ) / { cos²θ cos(δ − θ) [1 − √( sin(φ + δ) sin(φ + β) / (cos(δ − θ) cos(β − θ)) )]² }
//
// (Murthy, Geotechnical Engineering, eq. 11.51 form, from memory). Plane
// failure surfaces overestimate Kp when δ is large (above about φ/2);
// a log-spiral value is lower.
//
// Special cases as CoulombActive; a geometry for which the root reaches 1
// (no passive limit with plane surfaces) gives an error wrapping ErrInvalid.
func CoulombPassive(phi, delta, wallBack, slope units.Angle) (float64, error) {
	if err := coulombCheck(phi, delta, wallBack, slope); err != nil {
		return 0, err
	}
	if slope < -phi {
		return 0, invalid("slope", "must not fall steeper than the friction angle")
	}
	f, d, t, b := float64(phi), float64(delta), float64(wallBack), float64(slope)
	den := math.Cos(d-t) * math.Cos(b-t)
	if !(den > 0) {
		return 0, invalid("wallBack", "and delta give a wall the soil cannot act on")
	}
	root := math.Sqrt(math.Max(math.Sin(f+d)*math.Sin(f+b)/den, 0))
	if root >= 1 {
		return 0, invalid("slope", "and wall geometry give no passive limit with plane surfaces")
	}
	c := math.Cos(f + t)
	ct := math.Cos(t)
	return c * c / (ct * ct * math.Cos(d-t) * (1 - root) * (1 - root)), nil
}

func coulombCheck(phi, delta, wallBack, slope units.Angle) error {
	if err := checkPhi(phi); err != nil {
		return err
	}
	if !(delta >= 0 && delta <= phi) {
		return invalid("delta", "must be between 0 and the friction angle")
	}
	if !(math.Abs(float64(wallBack)) < math.Pi/2) {
		return invalid("wallBack", "must be less than 90 deg from the vertical")
	}
	if !(math.Abs(float64(slope)) < math.Pi/2) {
		return invalid("slope", "must be less than 90 deg")
	}
	return nil
}

// EarthForce is the resultant of earth pressure on a face, per metre
// width of the face.
type EarthForce struct {
	// Force is the resultant per metre width (N/m written as a force on a
	// one-metre strip).
	Force units.Force
	// Height is the height of the resultant above the bottom of the face.
	Height units.Length
}

// EarthPressureForce returns the resultant, per metre width, of the
// pressure
//
//	σ(z) = K γ z + sign · 2c √K        (sign +1 passive, −1 active)
//
// on a vertical face from depth top to depth bottom below the ground
// surface, with tension (σ < 0, active side) cut off at zero (Bell's
// extension of Rankine's theory; Das, Principles of Foundation
// Engineering, §7.4, from memory). Pass sign = +1 with Kp for a passive
// force and −1 with Ka for an active one.
//
// Special cases: K not positive, γ not positive, c negative, top < 0,
// bottom < top, or sign not ±1 give an error wrapping ErrInvalid; a face of
// zero height or a face wholly in the tension zone gives a zero force at
// Height zero.
func EarthPressureForce(k float64, gamma units.UnitWeight, c units.Pressure, top, bottom units.Length, sign int) (EarthForce, error) {
	if err := positive("K", k); err != nil {
		return EarthForce{}, err
	}
	if err := positive("unit weight", float64(gamma)); err != nil {
		return EarthForce{}, err
	}
	if err := nonNegative("cohesion", float64(c)); err != nil {
		return EarthForce{}, err
	}
	if err := nonNegative("top", float64(top)); err != nil {
		return EarthForce{}, err
	}
	if err := finite("bottom", float64(bottom)); err != nil {
		return EarthForce{}, err
	}
	if bottom < top {
		return EarthForce{}, invalid("bottom", "must not be above top")
	}
	if sign != 1 && sign != -1 {
		return EarthForce{}, invalid("sign", "must be +1 (passive) or -1 (active)")
	}
	g := float64(gamma)
	c0 := float64(sign) * 2 * float64(c) * math.Sqrt(k)
	z1, z2 := float64(top), float64(bottom)
	if sign < 0 { // tension crack: σ = 0 down to z0
		z0 := -c0 / (k * g)
		z1 = math.Max(z1, z0)
	}
	if z2 <= z1 {
		return EarthForce{}, nil
	}
	s1, s2 := k*g*z1+c0, k*g*z2+c0
	h := z2 - z1
	f := (s1 + s2) / 2 * h
	// Centroid of a trapezoid above its s2 edge.
	y := h * (2*s1 + s2) / (3 * (s1 + s2))
	return EarthForce{Force: units.Force(f), Height: units.Length(y)}, nil
}

// layeredEarth returns the resultant, per metre width, of the earth
// pressure
//
//	σ(z) = K σ'v(z) + sign · 2c √K        (sign +1 passive, −1 active)
//
// on a vertical face from depth top to depth bottom below the ground, with
// σ'v the effective vertical stress of stress() (unit weight g above the
// water at depth dw, gs below it) and the active side's tension cut off at
// zero: EarthPressureForce with the water table as a break in the stress
// profile. The water pressure itself acts alike on both faces of a buried
// block and is left out. Undrained, pass K = 1 and c = c_u.
func layeredEarth(k, c float64, sign int, top, bottom, g, gs, dw float64) EarthForce {
	if !(bottom > top) {
		return EarthForce{}
	}
	c0 := float64(sign) * 2 * c * math.Sqrt(k)
	sigma := func(z float64) float64 {
		sv, _ := stress(z, g, gs, dw)
		return k*sv + c0
	}
	var force, moment float64
	add := func(z1, z2 float64) {
		s1, s2 := sigma(z1), sigma(z2)
		if sign < 0 { // cut off tension
			switch {
			case s1 <= 0 && s2 <= 0:
				return
			case s1 < 0:
				z1 += (z2 - z1) * (-s1) / (s2 - s1)
				s1 = 0
			case s2 < 0:
				z2 = z1 + (z2-z1)*s1/(s1-s2)
				s2 = 0
			}
		}
		h := z2 - z1
		f := (s1 + s2) / 2 * h
		if f <= 0 {
			return
		}
		// Height of the trapezoid's centroid above its lower edge z2, plus
		// the depth from z2 down to the face's bottom.
		y := h*(2*s1+s2)/(3*(s1+s2)) + (bottom - z2)
		force += f
		moment += f * y
	}
	if w := math.Max(dw, 0); w > top && w < bottom {
		add(top, w)
		add(w, bottom)
	} else {
		add(top, bottom)
	}
	if force == 0 {
		return EarthForce{}
	}
	return EarthForce{Force: units.Force(force), Height: units.Length(moment / force)}
}
