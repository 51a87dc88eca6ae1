package cable

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// Elastic gives a rope group's axial stiffness and thermal coefficient for
// a change of state.
type Elastic struct {
	EA    units.AxialStiffness
	Alpha units.ThermalExpansion
}

// State is a load on the ropes, the horizontal tension it hangs with and
// the rope temperature.
type State struct {
	Load        Load
	H           units.Force
	Temperature units.Temperature
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
// temperature change dθ: exp(α dθ), the integral of a constant coefficient
// α = (1/L) dL/dθ. It differs from 1 + α dθ by (α dθ)²/2 (1.8e-7 for
// 12e-6/K over 50 K) and makes a change of state and its reverse cancel
// exactly.
func thermalFactor(alpha, dt float64) float64 { return math.Exp(alpha * dt) }

// unstretched returns the unstretched length of the Loaded rope of load b
// and horizontal tension h, by the small-strain rule
//
//	L₀ = S − (1/EA) ∫ T ds,  ∫ T ds = H ∫ (1 + z'²) dx = H (L + h²/L) + D/H
//
// with D = ∫ Q² dx (∫ Q dx = 0 over the span).
func unstretched(s Span, b beam, d, h, ea float64) float64 {
	L, rise := float64(s.Length), float64(s.Rise)
	c0 := rise / L
	return b.arcLength(c0, h) - (h*(L+rise*c0)+d/h)/ea
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
// same rope (same unstretched length) that carries from. It is exact for
// inextensible-geometry funicular shapes (Loaded) of any load pattern and
// inclination, with small-strain elastic stretch and thermal expansion:
//
//	S(H₂) − (1/EA)∫T₂ ds = [S(H₁) − (1/EA)∫T₁ ds] · exp(α (θ₂ − θ₁))
//
// where S is the exact arc length of the Loaded shape. Method: within the
// small-strain model (strains of a few per cent at most) the left side
// decreases with H₂; the root is found by Newton's method in H₂ with
// analytic derivative, started from the classical cubic's answer
// (ChangeOfStateCubic) and safeguarded by bisection inside the bracket that
// the iterates build; typically 3–4 evaluations. Accuracy: to rounding
// (relative 1e-13 in H for ordinary sag ratios). Special cases: a rope too
// slack or too stiff for float64 gives ErrInvalid; so does a state whose
// strain H/EA would exceed maxStrain, beyond the small-strain model; failure
// to bracket or converge otherwise gives ErrNoConvergence.
func ChangeOfState(s Span, e Elastic, from State, to Load, temp units.Temperature) (State, error) {
	if err := validateChange(s, e, from, to, temp); err != nil {
		return State{}, err
	}
	ea := float64(e.EA)
	b1, b2 := newBeam(s, from.Load), newBeam(s, to)
	d1, d2 := b1.shearSquared(), b2.shearSquared()
	h1 := float64(from.H)
	l0 := unstretched(s, b1, d1, h1, ea) * thermalFactor(float64(e.Alpha), float64(temp-from.Temperature))
	if !finite(l0) || l0 <= 0 {
		return State{}, errOutOfRange
	}
	L, rise := float64(s.Length), float64(s.Rise)
	c0 := rise / L
	var xbuf, qbuf [16]float64
	xs, qs := b2.sections(xbuf[:], qbuf[:])
	// g(H) = L₀ − [S − ∫T ds/EA], increasing in H.
	g := func(h float64) (float64, float64) {
		S, dS := arcLengthDH(xs, qs, c0, h)
		v := l0 - (S - (h*(L+rise*c0)+d2/h)/ea)
		dE := ((L + rise*c0) - d2/(h*h)) / ea
		return v, -(dS - dE)
	}
	h0 := cubicEstimate(s, ea, float64(e.Alpha), d1, d2, h1, float64(temp-from.Temperature))
	if !(h0 > 0) || !finite(h0) {
		h0 = h1
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
	return State{Load: to, H: units.Force(h2), Temperature: temp}, nil
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
// (standard cable texts; SOURCES §1, W the whole span's weight), which
// takes the length excess as D/(2H²) with D = ∫Q² dx = w²L³/12 and the
// stretch as H L/EA. For an inclined span it uses the same linearisation
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
//	L₀' = L₀ exp(α (θ₂ − θ₁)),  w' = weight · L₀/L₀'   (total weight kept)
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
