// Package cable computes the statics, change of state, erection sag,
// capacity and natural frequencies of the sagging wire ropes of a
// cable-supported footbridge. It knows nothing of towers or soil: it takes
// a span, loads and rope properties, and returns shapes, forces and
// check.Results.
//
// # Sign convention
//
// x is horizontal, measured from the left support A towards the right
// support B; z is up, measured from A, so B sits at (Span.Length, Span.Rise).
// Sag is the vertical distance below the chord AB, positive downward.
// Vertical reactions are the vertical components of the pull of the
// supports on the rope, positive upward. Support angles are the inclination
// of the rope below horizontal, measured from the support into the span,
// positive when the rope descends into the span: the angle a rope makes on
// a saddle.
//
// # Units
//
// All quantities are the typed SI values of package units. Loads on a
// Parabola or Loaded shape are per horizontal metre; on a Catenary per
// metre of arc; on an ElasticCatenary per unstretched metre.
//
// # Constitutive law
//
// Every rope model here follows one law. A rope of unstretched length L₀
// at its reference temperature θ₀ has, at temperature θ, the unstretched
// length L₀(1 + α(θ − θ₀)) (linear thermal strain), and each unstretched
// element dp stretches by Hooke's law on the unstretched length:
//
//	ds = (1 + T/EA) dp,   so   L₀ = ∫ ds/(1 + T/EA)
//
// The elastic catenary integrates it along the rope (weight per
// unstretched metre); ChangeOfState, StateForLength, UnstretchedLength and
// LengthCurve apply it exactly to the Loaded shapes (load per horizontal
// metre); a straight backstay of chord c under tension T has L₀ = c/(1 + T/EA). On
// one rope the three agree to rounding (TestOneConstitutiveLaw). A change
// of state measures the thermal strain from the temperature of the state it
// starts from: start every change from one reference state.
//
// # Worked example
//
// A level 100 m span sagging 8 m under 2 kN per horizontal metre
// (a parabola, by the general cable theorem H = w L²/(8 f)):
//
//	p, err := cable.NewParabola(cable.Span{Length: 100 * units.Metre}, 2*units.KilonewtonPerMetre, 8*units.Metre)
//	// p.Horizontal() = 312.5 kN; p.Reactions() = 100 kN at each end;
//	// p.SupportTensions() = √(312.5² + 100²) = 328.1 kN at each end.
//
// # References
//
//   - Irvine, H. M. (1981). Cable Structures. MIT Press, Cambridge, Mass.
//     Ch. 1 (the catenary), ch. 2 (the elastic catenary), ch. 3 (the
//     change-of-state equation), ch. 4 (free vibrations).
//   - Irvine, H. M. & Caughey, T. K. (1974). The linear theory of free
//     vibrations of a suspended cable. Proceedings of the Royal Society of
//     London A 341, 299–315.
//   - Hicks, T. G. (ed.). Civil Engineering Formulas. McGraw-Hill. Ch. 10,
//     cables: H = wL²/(8d) and the length series of a level parabola.
//   - EN 12385-4:2002+A1:2008. Steel wire ropes — Safety — Part 4: Stranded
//     ropes for general lifting applications. The form F_min = d² R_r K/1000
//     of the minimum breaking force, in which rope makers publish K, C, W.
//   - EN 1993-1-11:2006. Eurocode 3: Design of steel structures — Part 1-11:
//     Design of structures with tension components. Cl. 6.2, the design
//     tension resistance of a rope.
//   - EN 13411 (parts 1–6). Terminations for steel wire ropes — Safety
//     (ferrules, sockets, wire rope grips): the efficiency of a termination
//     (from memory: grips 0.80, ferrule-secured eyes 0.90, sockets 1.0).
//     The least ratio of saddle groove to rope diameter D/d (20–25 for
//     six-strand ropes of the 6×36 class) and the sharing of a tension
//     between parallel ropes are common practice, not a published rule.
//   - Électricité de France. code_aster validation manual, test case SSNL114:
//     a suspended cable under its own weight and a temperature change
//     (published sag 6.352 m and, after +39.26 K, 8.195 m).
//
// Tags beside test values: [R] read in the named source, [M] from memory
// (not yet confirmed), [D] derived here by hand from the stated formula; see
// the repository's DEVELOPERS.md.
package cable
