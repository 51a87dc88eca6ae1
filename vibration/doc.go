// Package vibration computes the natural modes of the sagging ropes of a
// cable-supported footbridge, with its walkway, and their response to
// walkers: the modes by a lumped-mass discretisation about the static
// equilibrium, solved with gonum's symmetric eigensolver; the accelerations
// under the walkers' harmonic load model of the French footbridge guide
// (Sétra 2006) against the comfort limits of EN 1990 Annex A2; and the
// crowd at which walkers lock in to a lateral mode (Dallard et al. 2001).
// It knows nothing of towers or soil, nor of how the static state was
// found: it takes each rope's shape and tension.
//
// # The model
//
// Every rope hangs in a vertical plane between supports A and B, shared by
// all ropes in plan. The span is cut into n elements of equal horizontal
// length; each rope's mass (and the walkway's) is lumped at the interior
// stations, each node free to move along the bridge, across it and up.
// Each element carries its static tension and has the tangent stiffness of
// a tensioned bar, axial plus geometric. A walkway, when there is one, is a
// rigid cross-section at each station (cross-beams, posts and fencing)
// that moves along, across and up and rolls about the bridge axis; the
// ropes tied to it follow it. A rope may be held at its saddles or, as an
// option, render over them into its backstays, or ride a rolling saddle.
//
// The closed form of Irvine & Caughey is the limit of this model as the
// sag vanishes (the tests show it through the mode crossover λ² = 4π²); at
// larger sag the discretised chain is the one to trust: the flat-sag theory
// drops the longitudinal inertia and reads the first antisymmetric in-plane
// mode high by about (40/π²)(f/L)², 3.6 % at a sag of a tenth of the span.
//
// # Sign convention
//
// x is horizontal along the span from support A towards B, z is up, y
// across the bridge completing a right-handed set (to the left looking
// from A to B). Rope elevations are measured from support A; sag is
// positive downward from the chord. Roll is positive turning y towards z.
//
// # Units
//
// All quantities are the typed SI values of package units; masses are per
// horizontal metre. Frequencies in hertz, accelerations in m/s².
//
// # Worked example
//
// A single rope of 100 m span sagging 5 m under its own 100 kg/m has
// H = mgL²/(8f) = 245.2 kN and f₀ = (1/2L)√(H/m) = 0.2476 Hz: its first
// lateral mode is f₀, its first vertical antisymmetric mode 1 % below the
// flat-sag 2f₀ (sag 1/20), its first vertical symmetric mode near 2.84 f₀.
//
//	m := vibration.Model{Span: 100, Ropes: []vibration.Rope{{
//		Shape: shape, H: 245.2e3, Mass: 100, EA: 1e9}}}
//	modal, err := m.Modes(nil)
//	// modal.Modes[0]: lateral, symmetric, 0.2476 Hz
//
// # References
//
//   - Bathe, K.-J. (1996). Finite Element Procedures. Prentice Hall, §6.3
//     (tangent stiffness of a tensioned bar; from memory).
//   - Clough, R. W. & Penzien, J. (1993). Dynamics of Structures, 2nd ed.
//     McGraw-Hill: §3-2 (resonant response of a damped single degree of
//     freedom, F/(2ξk)), §12-5 (orthogonality of modes), §26-3 (effective
//     modal masses; from memory).
//   - Dallard, P., Fitzpatrick, A. J., Flint, A., Le Bourva, S., Low, A.,
//     Ridsdill Smith, R. M. & Willford, M. (2001). The London Millennium
//     Footbridge. The Structural Engineer 79(22), 17–33 (lateral lock-in,
//     N_L = 8πξfM/k, k ≈ 300 N·s/m; from memory).
//   - EN 1990:2002/A1:2005. Eurocode — Basis of structural design, Annex A2,
//     A2.4.3.2: comfort criteria for pedestrians (0.7 m/s² vertical, 0.2 m/s²
//     lateral in normal use, 0.4 m/s² in crowd conditions; a check below
//     5 Hz vertical and 2.5 Hz lateral and torsional; from memory).
//   - Irvine, H. M. & Caughey, T. K. (1974). The linear theory of free
//     vibrations of a suspended cable. Proceedings of the Royal Society of
//     London A 341, 299–315 (from memory).
//   - Irvine, H. M. (1981). Cable Structures. MIT Press, ch. 4 (λ², the
//     crossover at λ² = 4π²; from memory).
//   - Lord Rayleigh (1894). The Theory of Sound, vol. 1, 2nd ed. Macmillan,
//     §123 (the taut string, f_n = (n/2L)√(T/m)).
//   - Sétra (2006). Footbridges: Assessment of vibrational behaviour of
//     footbridges under pedestrian loading. Technical guide, Service
//     d'études techniques des routes et autoroutes, Paris (traffic classes,
//     n' = 10.8√(ξn) and 1.85√n, 280/70/35 N per walker, ψ(f), damping of
//     steel 0.4 % and timber 1 %; from memory).
//   - Živanović, S., Pavić, A. & Reynolds, P. (2005). Vibration
//     serviceability of footbridges under human-induced excitation: a
//     literature review. Journal of Sound and Vibration 279, 1–74 (critical
//     ranges 1.25–2.3 and 2.5–4.6 Hz vertical, 0.5–1.2 Hz lateral; from
//     memory).
package vibration
