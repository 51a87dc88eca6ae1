package cable

import (
	"math"

	"gonum.org/v1/gonum/integrate/quad"

	"github.com/sagspan/sagspan/units"
)

// Elastic gives a rope group's axial stiffness and thermal coefficient for
// a change of state.
type Elastic struct {
	EA    units.AxialStiffness
	Alpha units.ThermalExpansion
}

// State is a load on the ropes, the horizontal tension it hangs with and
// the rope temperature. Unstretched is the rope's unstretched length at
// that temperature when the state was found by ChangeOfState or
// StateForLength (zero in a state built by hand).
type State struct {
	Load        Load
	H           units.Force
	Temperature units.Temperature
	Unstretched units.Length
}

func (e Elastic) validate() error {
	if err := positive("EA", float64(e.EA)); err != nil {
		return err
	}
	if !finite(float64(e.Alpha)) {
		return invalidf("thermal coefficient must be finite, got %g", float64(e.Alpha))
	}
	return nil
}

func validTemperature(name string, t units.Temperature) error {
	if x := float64(t); !finite(x) || x <= 0 {
		return invalidf("%s must be a finite absolute temperature above 0 K, got %g K", name, x)
	}
	return nil
}

// thermalFactor returns the ratio of unstretched lengths after a
// temperature change dθ from the state one starts from: 1 + α dθ, the
// linear thermal strain of the package's constitutive law (see the package
// doc). Chaining changes of state through intermediate temperatures
// differs from one direct change by about (α dθ)², 1.4e-7 for 12e-6/K over
// 30 K: start every change from the same reference state.
func thermalFactor(alpha, dt float64) float64 { return 1 + alpha*dt }

// The Gauss–Legendre rule on [−1, 1] used for the elastic part of the
// unstretched length, 8 points (exact for polynomials of degree 15):
// nodes and weights from gonum's quad.Legendre.
var glNodes, glWeights = legendre(8)

func legendre(n int) (x, w []float64) {
	x, w = make([]float64, n), make([]float64, n)
	quad.Legendre{}.FixedLocations(x, w, -1, 1)
	return x, w
}

// maxSlopeStep is the widest range of slope p over which one application
// of the Gauss–Legendre rule integrates the elastic part of the unstretched
// length: k a²/(1 + k a), a = √(1+p²), is analytic but for branch points at
// p = ±i, so on a slope range of width 1 the 8-point rule errs by about
// (2+√5)^−16 ≈ 1e-10 of a term that is itself the strain (about 1e-3) of
// the length.
const maxSlopeStep = 1.0

// unstretched returns the unstretched length L₀ of the Loaded rope of load
// sections xs, qs and horizontal tension h, and dL₀/dH, by Hooke's law on
// the unstretched length (ds = (1 + T/EA) dp, p the unstretched
// coordinate):
//
//	L₀ = ∫ ds/(1 + T/EA) = S − C,   C = ∫ k a²/(1 + k a) dx
//	T = H a,  a = √(1 + z'²),  k = H/EA
//
// S (the arc length) and dS/dH are exact (arcLengthDH); C, the elastic
// shortening (about the strain times S), by Gauss–Legendre on each piece
// of uniform load, split so that no application spans a slope range wider
// than maxSlopeStep, with
//
//	dC/dH = ∫ [a²/EA + k (2 + k a) z' (c₀ − z')/H] / (1 + k a)² dx.
func unstretched(xs, qs []float64, c0, h, ea float64) (l0, dl0 float64) {
	S, dS := arcLengthDH(xs, qs, c0, h)
	k := h / ea
	var c, dc float64
	for i := 1; i < len(xs); i++ {
		dx := xs[i] - xs[i-1]
		if dx <= 0 {
			continue
		}
		p0, p1 := c0-qs[i-1]/h, c0-qs[i]/h
		slopePieces(p0, p1, func(a0, b0 float64) {
			mid, half := (a0+b0)/2, (b0-a0)/2
			var sc, sd float64
			for m, t := range glNodes {
				p := mid + half*t
				a := sqrt1p(p)
				den := 1 + k*a
				sc += glWeights[m] * a * a / den
				sd += glWeights[m] * (a*a/ea + k*(2+k*a)*p*(c0-p)/h) / (den * den)
			}
			// the slope is linear in x on the piece, so the sub-range
			// covers its share of dx: ∫ f dx = dx_j·mean
			dxj := dx
			if p1 != p0 {
				dxj = dx * (b0 - a0) / math.Abs(p1-p0)
			}
			c += k * sc / 2 * dxj
			dc += sd / 2 * dxj
		})
	}
	return S - c, dS - dc
}

// slopePieces calls f on sub-ranges [a, b], a < b (or a single a = b),
// that cover the slopes between p0 and p1, none wider than maxSlopeStep
// times the larger of 1 and its distance from slope 0: the integrand's
// branch points at p = ±i lie as far, relative to the sub-range's width, as
// on a unit range at the origin, so each keeps that accuracy, and a rope
// hanging nearly vertically (slopes of thousands, a huge sag or a tiny H)
// takes a few dozen sub-ranges rather than one per unit of slope. A range
// no wider than maxSlopeStep is one sub-range; a wider one is cut into
// equal parts while they are few (as near the origin), else at 0 and
// outward in growing steps.
func slopePieces(p0, p1 float64, f func(a, b float64)) {
	lo, hi := math.Min(p0, p1), math.Max(p0, p1)
	w := hi - lo
	if !(w > maxSlopeStep) {
		f(lo, hi)
		return
	}
	if n := math.Ceil(w / maxSlopeStep); n <= 64 && math.Max(-lo, hi) <= 64*maxSlopeStep {
		for j := 0.0; j < n; j++ {
			f(lo+w*j/n, lo+w*(j+1)/n)
		}
		return
	}
	// outward from u ≥ 0 to v, in steps of maxSlopeStep·max(1, distance)
	out := func(u, v float64, f func(a, b float64)) {
		for u < v {
			next := math.Min(v, u+maxSlopeStep*math.Max(1, u))
			f(u, next)
			u = next
		}
	}
	switch {
	case lo >= 0:
		out(lo, hi, f)
	case hi <= 0:
		out(-hi, -lo, func(a, b float64) { f(-b, -a) })
	default:
		out(0, -lo, func(a, b float64) { f(-b, -a) })
		out(0, hi, f)
	}
}

// UnstretchedLength returns the unstretched length of the rope of axial
// stiffness ea that hangs over s in the Loaded shape of load l under
// horizontal tension h, by Hooke's law on the unstretched length:
//
//	L₀ = ∫ ds/(1 + T/EA)
//
// the same law as the elastic catenary's and a straight backstay's
// c/(1 + T/EA). Special cases: invalid span, load or stiffness, or H not
// positive, give ErrInvalid.
func UnstretchedLength(s Span, ea units.AxialStiffness, l Load, h units.Force) (units.Length, error) {
	if err := l.Validate(s); err != nil {
		return 0, err
	}
	if err := positive("EA", float64(ea)); err != nil {
		return 0, err
	}
	if err := positive("horizontal tension", float64(h)); err != nil {
		return 0, err
	}
	var xbuf, qbuf [16]float64
	xs, qs := newBeam(s, l).sections(xbuf[:], qbuf[:])
	l0, _ := unstretched(xs, qs, float64(s.Rise)/float64(s.Length), float64(h), float64(ea))
	if !finite(l0) || l0 <= 0 {
		return 0, errOutOfRange
	}
	return units.Length(l0), nil
}

// validateChange checks the inputs of a change of state.
func validateChange(s Span, e Elastic, from State, to Load, temp units.Temperature) error {
	if err := from.Load.Validate(s); err != nil {
		return err
	}
	if err := to.Validate(s); err != nil {
		return err
	}
	if err := e.validate(); err != nil {
		return err
	}
	if err := positive("horizontal tension", float64(from.H)); err != nil {
		return err
	}
	if err := validTemperature("start temperature", from.Temperature); err != nil {
		return err
	}
	return validTemperature("temperature", temp)
}

// ChangeOfState returns the state under load to at temperature temp of the
// same rope that carries from: its unstretched length, L₀ at from's
// temperature, becomes L₀(1 + α(θ₂ − θ₁)) (linear thermal strain), and the
// new H hangs that length in the Loaded shape of the new load by Hooke's
// law on the unstretched length (see StateForLength):
//
//	∫ ds₂/(1 + T₂/EA) = (1 + α(θ₂ − θ₁)) ∫ ds₁/(1 + T₁/EA)
//
// It is exact for inextensible-geometry funicular shapes (Loaded) of any
// load pattern and inclination, and agrees with the elastic catenary and a
// straight backstay hung on the same unstretched length (one constitutive
// law; see the package doc). The State returned carries the unstretched
// length. Special cases: a rope too slack or too stiff for float64 gives
// ErrInvalid; so does a state whose strain H/EA would exceed maxStrain;
// failure to bracket or converge otherwise gives ErrNoConvergence.
func ChangeOfState(s Span, e Elastic, from State, to Load, temp units.Temperature) (State, error) {
	if err := validateChange(s, e, from, to, temp); err != nil {
		return State{}, err
	}
	ea := float64(e.EA)
	c0 := float64(s.Rise) / float64(s.Length)
	var xbuf, qbuf [16]float64
	xs, qs := newBeam(s, from.Load).sections(xbuf[:], qbuf[:])
	l1, _ := unstretched(xs, qs, c0, float64(from.H), ea)
	l0 := l1 * thermalFactor(float64(e.Alpha), float64(temp-from.Temperature))
	if !finite(l0) || l0 <= 0 {
		return State{}, errOutOfRange
	}
	return stateForLength(s, ea, to, l0, temp)
}

// StateForLength returns the state under load l at temperature temp of the
// rope of axial stiffness ea whose unstretched length, at that
// temperature, is l0: the H at which the Loaded shape of l has
//
//	∫ ds/(1 + T/EA) = l0.
//
// Method: the left side decreases with H; Newton's method in H with the
// analytic derivative, started from the classical change-of-state cubic's
// estimate and safeguarded by bisection inside the bracket that the
// iterates build; typically 3–5 evaluations, to rounding (relative 1e-13 in
// H for ordinary sag ratios). Special cases as ChangeOfState.
func StateForLength(s Span, ea units.AxialStiffness, l Load, l0 units.Length, temp units.Temperature) (State, error) {
	if err := l.Validate(s); err != nil {
		return State{}, err
	}
	if err := positive("EA", float64(ea)); err != nil {
		return State{}, err
	}
	if err := positive("unstretched length", float64(l0)); err != nil {
		return State{}, err
	}
	if err := validTemperature("temperature", temp); err != nil {
		return State{}, err
	}
	return stateForLength(s, float64(ea), l, float64(l0), temp)
}

func stateForLength(s Span, ea float64, to Load, l0 float64, temp units.Temperature) (State, error) {
	L, c := float64(s.Length), float64(s.Chord())
	c0 := float64(s.Rise) / L
	b := newBeam(s, to)
	var xbuf, qbuf [16]float64
	xs, qs := b.sections(xbuf[:], qbuf[:])
	// g(H) = L₀ − L₀(H), increasing in H.
	g := func(h float64) (float64, float64) {
		v, dv := unstretched(xs, qs, c0, h, ea)
		return l0 - v, -dv
	}
	// Start: the cubic H³ + bH² = κD, with the length excess over the chord
	// taken as cos³β D/(2LH²)·… and the stretch as H L/(EA cos²β), so that
	// b = EA cos²β (L₀ − c)/L (see ChangeOfStateCubic).
	cb := L / c
	kappa := ea * cb * cb * cb * cb * cb / (2 * L)
	h0 := cubicRoot(ea*cb*cb*(l0-c)/L, kappa*b.shearSquared())
	if !(h0 > 0) || !finite(h0) {
		h0 = ea * 1e-3
	}
	h2, ok := newtonPositive(g, h0, 1e-14, 100)
	if !ok {
		if h0/ea > maxStrain {
			return State{}, invalidf("the new state strains the rope by about %.0f %%, beyond the small-strain model (%.0f %%)", 100*h0/ea, 100*maxStrain)
		}
		return State{}, errNoConv("change of state")
	}
	if h2/ea > maxStrain {
		return State{}, invalidf("the new state strains the rope by %.1f %%, beyond the small-strain model (%.0f %%)", 100*h2/ea, 100*maxStrain)
	}
	if !finite(h2) || h2 <= 0 {
		return State{}, errOutOfRange
	}
	return State{Load: to, H: units.Force(h2), Temperature: temp, Unstretched: units.Length(l0)}, nil
}

// maxStrain is the largest strain H/EA the small-strain change of state
// accepts: steel wire ropes break near 1–2 %, so beyond 5 % a state is not a
// rope's (common practice).
const maxStrain = 0.05

// cubicEstimate solves the classical cubic with shear integrals D₁, D₂ and
// the inclination correction (see ChangeOfStateCubic).
func cubicEstimate(s Span, ea, alpha, d1, d2, h1, dt float64) float64 {
	L := float64(s.Length)
	cb := L / float64(s.Chord())
	kappa := ea * cb * cb * cb * cb * cb / (2 * L)
	b := -h1 + kappa*d1/(h1*h1) + ea*cb*alpha*dt
	return cubicRoot(b, kappa*d2)
}

// ChangeOfStateCubic returns the state under the uniform load to at
// temperature temp of the rope that carries from (whose load must be
// uniform: patches are rejected), by the classical change-of-state cubic
//
//	H₂²[H₂ − H₁ + EA W₁²/(24 H₁²) + EA α Δθ] = EA W₂²/24,  W = w L
//
// (standard cable texts, e.g. Irvine, Cable Structures, ch. 3; W the whole
// span's weight, not the weight per metre), which
// takes the length excess as D/(2H²) with D = ∫Q² dx = w²L³/12 and the
// stretch as H L/EA (the SSNL114 validation case, see References, checks it). For an inclined span it uses the same linearisation
// about the chord (angle β):
//
//	H₂²[H₂ − H₁ + κ D₁/H₁² + EA cos β α Δθ] = κ D₂,  κ = EA cos⁵β/(2L)
//
// which reduces to the classical cubic when β = 0. It departs from
// ChangeOfState by an amount that grows with the change of load and the
// strain more than with the sag ratio: 0.064 % on the SSNL114 case, about
// 0.6 % for a level span at n = 1/40 unloaded from 2000 to 100 N/m, about
// 1 % at n = 1/20 with 0.3 % strain (measured); use ChangeOfState where that
// matters.
func ChangeOfStateCubic(s Span, e Elastic, from State, to units.LoadPerLength, temp units.Temperature) (State, error) {
	if len(from.Load.Patches) > 0 {
		return State{}, invalidf("the cubic takes a uniform load only; use ChangeOfState for patches")
	}
	toLoad := Load{Uniform: to}
	if err := validateChange(s, e, from, toLoad, temp); err != nil {
		return State{}, err
	}
	L := float64(s.Length)
	w1, w2 := float64(from.Load.Uniform), float64(to)
	d1, d2 := w1*w1*L*L*L/12, w2*w2*L*L*L/12
	h2 := cubicEstimate(s, float64(e.EA), float64(e.Alpha), d1, d2, float64(from.H), float64(temp-from.Temperature))
	if !finite(h2) || h2 <= 0 {
		return State{}, errOutOfRange
	}
	return State{Load: toLoad, H: units.Force(h2), Temperature: temp}, nil
}

// ElasticChangeOfState returns the elastic catenary of the rope r (hung
// over s at temperature from, weight r.Weight per unstretched metre) after
// its temperature becomes to and its weight per metre of the original
// unstretched length becomes weight (the rope's own weight, or with ice or
// a walkway hung along it). It is exact within the elastic catenary's
// small-strain model:
//
//	L₀' = L₀ (1 + α (θ₂ − θ₁)),  w' = weight · L₀/L₀'   (total weight kept)
//
// and then NewElasticCatenary. Source: the elastic catenary of Irvine,
// Cable Structures, 1981, ch. 2 (from memory); checked against the code_aster
// validation case SSNL114.
func ElasticChangeOfState(s Span, r ElasticRope, alpha units.ThermalExpansion, from, to units.Temperature, weight units.LoadPerLength) (ElasticCatenary, error) {
	if err := r.Validate(); err != nil {
		return ElasticCatenary{}, err
	}
	if !finite(float64(alpha)) {
		return ElasticCatenary{}, invalidf("thermal coefficient must be finite, got %g", float64(alpha))
	}
	if err := validTemperature("start temperature", from); err != nil {
		return ElasticCatenary{}, err
	}
	if err := validTemperature("temperature", to); err != nil {
		return ElasticCatenary{}, err
	}
	if err := positive("weight", float64(weight)); err != nil {
		return ElasticCatenary{}, err
	}
	f := thermalFactor(float64(alpha), float64(to-from))
	r2 := ElasticRope{Unstretched: r.Unstretched * units.Length(f), EA: r.EA, Weight: weight / units.LoadPerLength(f)}
	return NewElasticCatenary(s, r2)
}

// ElasticRopeForSag returns the rope of stiffness ea and weight w per
// unstretched metre whose elastic catenary over s hangs with sag below the
// chord at midspan: it finds the unstretched length by a bracketed Newton
// iteration (sag grows with length), each step an elastic catenary solve.
func ElasticRopeForSag(s Span, ea units.AxialStiffness, w units.LoadPerLength, sag units.Length) (ElasticRope, error) {
	if err := s.Validate(); err != nil {
		return ElasticRope{}, err
	}
	if err := positive("sag", float64(sag)); err != nil {
		return ElasticRope{}, err
	}
	probe := ElasticRope{Unstretched: s.Chord(), EA: ea, Weight: w}
	if err := probe.Validate(); err != nil {
		return ElasticRope{}, err
	}
	// The inextensible catenary with this sag has the stretched length; the
	// unstretched length is a little less.
	cat, err := NewCatenary(s, w, sag)
	if err != nil {
		return ElasticRope{}, err
	}
	c := float64(s.Chord())
	f := float64(sag)
	var failed error
	g := func(l0 float64) (float64, float64) {
		r := ElasticRope{Unstretched: units.Length(l0), EA: ea, Weight: w}
		e, err := NewElasticCatenary(s, r)
		if err != nil {
			failed = err
			return math.NaN(), 1
		}
		v := float64(e.Sag(s.Length/2)) - f
		// d sag/d L₀ by a central difference
		dl := 1e-7 * l0
		e1, err1 := NewElasticCatenary(s, ElasticRope{Unstretched: units.Length(l0 + dl), EA: ea, Weight: w})
		e0, err0 := NewElasticCatenary(s, ElasticRope{Unstretched: units.Length(l0 - dl), EA: ea, Weight: w})
		if err1 != nil || err0 != nil {
			return v, math.NaN()
		}
		return v, float64(e1.Sag(s.Length/2)-e0.Sag(s.Length/2)) / (2 * dl)
	}
	hi := float64(cat.Length())
	lo := math.Min(c, hi) * 0.5
	l0, ok := newtonBracket(g, lo, hi, hi, 1e-13*hi, 200)
	if failed != nil {
		return ElasticRope{}, failed
	}
	r := ElasticRope{Unstretched: units.Length(l0), EA: ea, Weight: w}
	e, err := NewElasticCatenary(s, r)
	if err != nil {
		return ElasticRope{}, err
	}
	if !ok || math.Abs(float64(e.Sag(s.Length/2))-f) > 1e-9*f {
		return ElasticRope{}, errNoConv("unstretched length for a sag")
	}
	return r, nil
}
