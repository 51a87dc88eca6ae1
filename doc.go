// Package sagspan checks cable-supported pedestrian bridges: ropes that sag
// across a crossing, pass over saddles on short tower columns on each bank
// and run down as backstays into anchors.
//
// It composes the packages cable (rope statics and capacity), tower (saddle
// forces, resultant eccentricity, tower stability, column sections) and
// foundation (soils, anchors, footings) into the whole job: a Bridge
// description in, every check for every load case out, gathered in a
// check.Report that names the governing case of each check.
//
// Sign convention: x horizontal from the left saddle towards the right,
// z up; sag positive downward from the chord; rope angles on a saddle
// measured below horizontal. Values are SI throughout (m, N, Pa, rad, K).
//
// A short session:
//
//	b := sagspan.Demo()                // or sagspan.LoadFile("bridge.json")
//	a, err := sagspan.Check(b, nil)
//	if err != nil { ... }
//	a.Report.WriteText(os.Stdout, nil)
//
// The results support, and never replace, the design of a qualified
// engineer; local codes and licensed practice govern.
//
// # References
//
// The root package composes the checks of packages cable, tower and
// foundation (each lists its own sources) and adds the loads and the
// serviceability checks, from:
//
//   - EN 1990:2002+A1:2005. Eurocode — Basis of structural design. 3.2 and
//     6.4.3.2–6.4.3.3 (design situations, the fundamental and the accidental
//     combination, eq. 6.11b); Annex A2 (application for bridges): Table
//     A2.2 (ψ factors for footbridges: ψ1 0.4 on pedestrians, ψ0 on wind
//     and thermal actions), Tables A2.4(A) (EQU: γG,inf 0.95, γQ 1.5) and
//     A2.4(B) (γG 1.35/1.0, γQ 1.5), Table A2.5 (accidental: factors 1);
//     A2.4.3.2, comfort criteria.
//   - EN 1991-1-1:2002. Eurocode 1 — Actions on structures — Part 1-1:
//     densities and self-weight. Table A.1 (concrete, 24 kN/m³).
//   - EN 1991-1-4:2005. Eurocode 1 — Part 1-4: Wind actions. Cl. 4.5, the
//     basic and peak velocity pressure, air density 1.25 kg/m³; Figure 4.2,
//     the exposure factor; cl. 7.9, force coefficients of cylinders;
//     8.3.3, the vertical force coefficient c_f,z = ±0.9 of a bridge deck.
//   - EN 1991-1-5:2003. Eurocode 1 — Part 1-5: Thermal actions. 6.1.6, the
//     temperature difference between cables and the rest of a bridge
//     (10 K for a light colour, 20 K for a dark one).
//   - EN 1991-1-6:2005. Eurocode 1 — Part 1-6: Actions during execution.
//     Table 4.1, the construction load of personnel and hand tools
//     (1.0 kN/m²).
//   - EN 1991-2:2003. Eurocode 1 — Part 2: Traffic loads on bridges.
//     Cl. 5.3.2.1, the uniform pedestrian load on footbridges,
//     q = 2.0 + 120/(L + 30) kN/m² within 2.5–5.0 kN/m², on the
//     unfavourable parts of the influence surface (the loaded-length search).
//   - EN 1992-1-1:2004. Eurocode 2 — Design of concrete structures — Part
//     1-1. Table 3.1 (concrete classes), 3.2.2 (reinforcing steel), 9.5.2
//     (column reinforcement).
//   - Hicks, T. G. (ed.). Civil Engineering Formulas. McGraw-Hill. Ch. 10,
//     the length of a parabolic cable.
//   - Živanović, S., Pavić, A. & Reynolds, P. (2005). Vibration
//     serviceability of footbridges under human-induced excitation: a
//     literature review. Journal of Sound and Vibration 279, 1–74. The
//     frequency ranges walkers excite.
//
// Common practice without a single published source: the constructional
// stretch of new six-strand rope (0.25–0.5 %), the sharing of a tension
// between parallel ropes, a suddenly applied load giving up to twice its
// static effect on an undamped elastic system (any structural dynamics
// text), the gradient a cleated walkway is walked at.
//
// Where a value is recalled rather than read in its source, the code says
// "from memory"; a fact of the trade with no single source is "common
// practice". The tags [R], [M] and [D] beside test values are defined in
// the repository's DEVELOPERS.md.
package sagspan
