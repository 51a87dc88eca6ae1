// Package foundation provides the ground checks of a cable-supported
// footbridge: soil descriptions and presets, bearing capacity (Terzaghi,
// Meyerhof, Hansen, Vesić and EN 1997-1 Annex D) in the drained and the
// undrained condition, bearing on rock, contact pressure under eccentric
// load, Rankine and Coulomb earth pressure, groundwater and flood water,
// and the checks of gravity anchor blocks (plain or stepped), deadmen,
// grouted rock anchors and tower footings, with the steel in the ground:
// anchor rods, rope terminations and loops, deadman beams, rock-anchor
// threads and head plates. It takes forces and geometry and knows nothing
// of ropes or towers.
//
// # Ground conditions
//
// A Soil carries its drained strength (φ', c') and, for a fine soil, its
// undrained strength c_u. The anchor and footing checks verify every
// condition the soil has a strength for — long-term drained (effective
// stresses) and short-term undrained (φ = 0, total stresses: bearing by
// EN 1997-1 D.3, sliding by A'c_u, 6.5.3(12)) — and report the one that
// governs, named in the result's Basis, with the utilisation in each
// condition among its Values ("U_dr", "U_un"). Rock (Soil.IsRock) bears
// by an allowable pressure or the K_sp rock-mass method (RockPressure),
// never by soil N-factors. A Water level (groundwater, or a flood over the
// ground) buoys blocks and footings, submerges soil and rock to their
// effective weights, and enters bearing and earth pressures as effective
// stresses.
//
// # Sign convention
//
// x is horizontal, z is up. For an anchor (AnchorBlock, Deadman) x points
// in the direction the backstays pull, toward the tower and span; an
// AnchorPull's Angle is the backstay's inclination above horizontal at the
// anchor, so a backstay rising toward its saddle has a positive angle and
// an upward component (the tower package measures rope angles below
// horizontal at the saddle). An AnchorBlock's frame has its origin at the
// back bottom edge (farthest from the tower); its front toe is at
// x = Length. For a Footing x runs along the side Along (along the bridge
// for a tower footing), the origin at the base centre, the moment positive
// when it presses the +x edge. Depths are positive downward from the
// ground surface; a water depth is negative when water stands above it.
//
// # Units
//
// Typed SI quantities from package units throughout (m, N, Pa, rad, N/m³);
// factors and coefficients are plain float64. Earth-pressure forces are
// per metre width.
//
// # Verification basis
//
// A nil *Basis means allowable stresses with conventional global factors
// of safety (common practice): sliding 1.5, overturning 2.0 (1.5 for anchor
// blocks), uplift 1.5, bearing 3.0, steel 1.67 on yield, ropes 3.0 on their
// breaking force. Basis{PartialFactors: true} uses EN 1997-1 Annex A: EQU
// for overturning and uplift, GEO by design approach 2 (or 1) for sliding
// and bearing; steel by EN 1993-1-1 and EN 1993-1-8. Every factor can be
// overridden. Stability results carry the driving action as demand, the
// resisting action as capacity, the required and provided factors of
// safety, and ratio = required/provided, as check.Stability does.
//
// # Example
//
// A 3 × 2.5 × 1.5 m concrete block set 1.5 m deep in dense sand, pulled by
// 150 kN at 25° above horizontal, attached 2.5 m from its back edge and
// 1.2 m above its base:
//
//	blk := foundation.AnchorBlock{Length: 3 * units.Metre, Width: 2.5 * units.Metre,
//		Height: 1.5 * units.Metre, Depth: 1.5 * units.Metre}
//	sand, _ := foundation.LookupSoil("dense sand")
//	res, err := blk.Check([]foundation.AnchorPull{{Force: 150 * units.Kilonewton,
//		Angle: units.FromDegrees(25), X: 2.5 * units.Metre, Z: 1.2 * units.Metre}}, sand, foundation.EC7, nil)
//
// res holds anchor.sliding, anchor.overturning, anchor.uplift and
// anchor.bearing, each with its provided factor and named values.
//
// # References
//
// Short names used in the code and tests, and the sources they stand for:
//
//   - EN 1997-1:2004 — CEN, EN 1997-1:2004 Eurocode 7: Geotechnical design —
//     Part 1: General rules. Annex A (partial factors, Tables A.1–A.5,
//     A.12–A.13), Annex D (bearing resistance: D.3 undrained, D.4 drained),
//     Annex G (presumed bearing resistance on rock), 2.4.6.2 (design
//     strength), 2.5 (prescriptive measures), 6.5.3 (sliding).
//   - EN 1990:2002 — CEN, EN 1990:2002 Eurocode: Basis of structural design,
//     6.4.3 and Annex A2 (combinations, favourable and unfavourable parts).
//   - EN 1991-1-1:2002 — CEN, Eurocode 1: Actions on structures — Part 1-1,
//     Table A.1 (unit weights of concrete).
//   - EN 1992-1-1:2004 — CEN, Eurocode 2: Design of concrete structures —
//     Part 1-1, Table 2.1N (γS).
//   - EN 1993-1-1:2005 — CEN, Eurocode 3: Design of steel structures —
//     Part 1-1: General rules, 6.1 (γM0), 6.2.3 (tension), 6.2.5 (bending),
//     6.2.6 (shear).
//   - EN 1993-1-8:2005 — CEN, Eurocode 3 — Part 1-8: Design of joints,
//     Table 2.1 (γM2), Table 3.4 (tension resistance of threads, k2 = 0.9).
//   - EN 1993-1-11:2006 — CEN, Eurocode 3 — Part 1-11: Design of structures
//     with tension components, 6.2 (rope resistance, γR).
//   - EN 1537:2013 — CEN, Execution of special geotechnical works — Ground
//     anchors.
//   - BS 8081:2015 — BSI, Code of practice for grouted anchors (and its 1989
//     edition, Table 4, minimum factors of safety for permanent anchors).
//   - Littlejohn & Bruce 1977 — G. S. Littlejohn and D. A. Bruce, Rock
//     anchors — state of the art, Foundation Publications, Brentwood, 1977.
//   - CFEM 2006 — Canadian Geotechnical Society, Canadian Foundation
//     Engineering Manual, 4th ed., 2006, §9.2 (K_sp method for rock).
//   - Wyllie 1999 — D. C. Wyllie, Foundations on Rock, 2nd ed., E & FN Spon,
//     1999 (bearing on rock; the K_sp method).
//   - Look — B. G. Look, Handbook of Geotechnical Investigation and Design
//     Tables, Taylor & Francis, 2007, ch. 21 (Table 21.5: bearing-capacity
//     factors of Vesić, Meyerhof, Hansen and EN 1997-1).
//   - Terzaghi 1943 — K. Terzaghi, Theoretical Soil Mechanics, Wiley, 1943.
//   - Meyerhof 1963 — G. G. Meyerhof, Some recent research on the bearing
//     capacity of foundations, Canadian Geotechnical Journal 1(1), 1963.
//   - Hansen 1970 — J. Brinch Hansen, A revised and extended formula for
//     bearing capacity, Danish Geotechnical Institute Bulletin 28, 1970.
//   - Vesić 1973 — A. S. Vesić, Analysis of ultimate loads of shallow
//     foundations, ASCE J. Soil Mech. Found. Div. 99(SM1), 1973; and
//     Vesić 1975, Bearing capacity of shallow foundations, in Foundation
//     Engineering Handbook, Van Nostrand Reinhold.
//   - Prandtl 1921 — L. Prandtl, Über die Eindringungsfestigkeit plastischer
//     Baustoffe, Z. angew. Math. Mech. 1, 1921 (N_c = π + 2).
//   - Bowles — J. E. Bowles, Foundation Analysis and Design, 5th ed.,
//     McGraw-Hill, 1996, Table 4-5 (ground-inclination factors of Hansen
//     and Vesić; Nγ = −2 sin β for φ = 0) and §4-9 (footings near slopes:
//     no reduction once the footing stands about 2B back from the crest).
//   - Das — B. M. Das, Principles of Foundation Engineering, 7th ed.,
//     Cengage, 2011: §3.6 (groundwater), §3.11 (eccentric load), ch. 7
//     (Rankine, Coulomb, Bell), and its chapter on anchor plates (Teng).
//   - Murthy — V. N. S. Murthy, Geotechnical Engineering, Marcel Dekker,
//     2003, eq. 11.51 (Coulomb's coefficients).
//   - Coduto — D. P. Coduto, Foundation Design: Principles and Practices,
//     2nd ed., Prentice Hall, 2001 (fit to Terzaghi's Nγ).
//   - Teng 1962 — W. C. Teng, Foundation Design, Prentice Hall, 1962
//     (deadmen near the surface, end effects).
//   - Wire Rope Users Manual — Wire Rope Technical Board, Wire Rope Users
//     Manual, 4th ed., 2005 (strength efficiency of ropes bent round pins).
//   - EN 13411 — CEN, EN 13411 series, Terminations for steel wire ropes
//     (termination efficiencies).
//   - ISO 898-1 — ISO 898-1:2013, Mechanical properties of fasteners
//     (tensile stress areas of metric threads); ISO 4032 (hexagon nuts).
//   - AISC 360-16 — AISC, Specification for Structural Steel Buildings,
//     2016, ASD safety factor Ω = 1.67 for yielding (allowable basis for
//     steel).
//   - BS 5930 and EN ISO 14688-2 — BSI, BS 5930:2015 Code of practice for
//     ground investigations; CEN, EN ISO 14688-2:2018, consistency classes
//     of undrained shear strength.
//   - Strukts — "Foundation on clay", a worked example of a square pad on
//     clay by EN 1997-1 D.3 (R/A = 5.14 s_c c_u + q), strukts.com/foundation-on-clay.
//   - Abramowitz & Stegun — M. Abramowitz and I. A. Stegun, Handbook of
//     Mathematical Functions, 1964, Table 25.4 (Gauss–Legendre nodes).
//
// Source tags in the tests: [R] read in the source named, [M] from memory
// (recalled, not confirmed), [D] derived here from the formula and checked
// by another route; "common practice" for a trade fact with no single
// source (DEVELOPERS.md).
package foundation
