// Package tower checks the short tower column (or steel frame) on each bank
// of a cable-supported footbridge: the forces the ropes put on the column
// through their saddles, where the resultant of the rope forces crosses
// the column, the stability of the tower on its footing, and the column
// member itself (reinforced or plain concrete with slenderness, or a steel
// tube or two-leg frame).
//
// The package takes forces and geometry, never ropes: the caller passes the
// span-side and backstay rope tensions and their angles at each saddle.
//
// # Saddles
//
// A saddle is held on the column in one of three ways (SaddleKind): fixed,
// sliding on a bearing plate, or rolling. On a fixed saddle the rope sits
// in a groove (Groove) that lets it render freely (tension continuous),
// grips it by friction (the rope-friction law T_high/T_low ≤ e^{μθ} over
// the wrap angle θ), or clamps it (span and backstay independent). Sliding
// and roller saddles carry the rope clamped: the saddle moves, not the
// rope. Saddle.Balance gives the backstay tension each behaviour holds;
// Saddle.Force the force on the column. The free groove and the clamped
// rope bound every groove with friction.
//
// # The resultant
//
// EccentricityCheck checks where the rope forces' resultant crosses a
// checked section, by default in the form practice uses: the line of
// action of the rope forces alone, e = h·tan δ, against the kern of the
// effective section (facing excluded), with no factor of safety; the
// statics form, ΣM/ΣV with the column's own weight, is reported beside it
// (and may be chosen). Both directions are checked: along the bridge with
// the saddles' offsets and travel, across it with wind on the swung ropes
// and on the column; EccentricityBoth checks the two at once against the
// kern of the rectangle, a rhombus.
//
// # Columns
//
// RCColumn checks a concrete column to EN 1992-1-1 with slenderness,
// imperfection, minimum eccentricity, second-order moments by the
// nominal-stiffness method and biaxial bending; SteelColumn a tube or a
// two-leg frame to EN 1993-1-1 (flexural buckling and the 6.3.3
// interaction). The top restraint (Restraint) and the flexibility of the
// base set the effective length (EffectiveLengthFactor): a roller or
// sliding saddle leaves the top free (a cantilever, l0 = 2.20 l on the
// default base flexibility 0.1, 2 l on a rigid one); a clamped rope holds
// it by a spring.
// RCSection and Tube are the section checks beneath them.
//
// # Sign convention
//
// The project convention holds (x horizontal from the left support towards
// the right, z up; rope angles on a saddle measured below horizontal). On
// one tower this package uses a local horizontal axis positive TOWARD THE
// SPAN, so the same code serves the left and the right tower:
//
//   - a RopePull's Angle is measured below horizontal (negative when the
//     rope rises away from the saddle), its Swing from the vertical, downwind
//     positive;
//   - the span-side rope pulls the saddle toward the span and down,
//     the backstay pulls it away from the span and down;
//   - a LevelForce's Vertical is positive downward, its Horizontal positive
//     toward the span and its Lateral positive downwind; heights are
//     measured up from the column base section, offsets horizontally from
//     the column axis, toward the span positive;
//   - moments are positive when they turn the tower toward the span (or
//     downwind);
//   - a Resultant's Angle is measured from the vertical, toward the span
//     positive, and an eccentricity is positive on the span side of the
//     column axis (downwind across the bridge);
//   - axial forces on column sections are positive in compression.
//
// # Units
//
// All quantities are typed SI values from package units (N, m, Pa, rad).
//
// # Example
//
// Walkway ropes at 3.2 m pulling 180 kN at 12° toward the span and 185 kN
// at 35° down the backstay, over a fixed saddle, checked 0.5 m above the
// column base where the column is tied into it:
//
//	lf, _ := tower.Saddle{Kind: tower.Fixed, Height: 3.2 * units.Metre}.Force(
//		tower.RopePull{Tension: 180 * units.Kilonewton, Angle: units.FromDegrees(12)},
//		tower.RopePull{Tension: 185 * units.Kilonewton, Angle: units.FromDegrees(35)})
//	col := tower.Column{Depth: 0.8 * units.Metre, Width: 1.2 * units.Metre, Height: 3.4 * units.Metre}
//	r, _ := tower.Combine([]tower.LevelForce{lf}, col.Weight())
//	res, _ := tower.EccentricityCheck(r, col, &tower.Eccentricity{Section: 0.5 * units.Metre})
//	e, _ := res.Value("e")    // rope-line form, checked
//	es, _ := res.Value("e_s") // statics form, beside it
//
// Every check returns check.Result values whose Basis names the method and
// its published source and whose Values carry every number it worked out;
// values recalled rather than read are marked "from memory", trade facts
// without a source "common practice".
//
// # References
//
// Short names used in the code and tests, and the sources they stand for:
//
//   - EN 1992-1-1:2004 — CEN, EN 1992-1-1:2004 Eurocode 2: Design of
//     concrete structures — Part 1-1: General rules and rules for buildings.
//     Table 2.1N (γC, γS), 3.1.6 (f_cd, α_cc), Table 3.1 (E_cm), 3.1.7(3)
//     (rectangular stress block), 5.2 (geometric imperfections), 5.8.3
//     (slenderness criterion, effective length, Figure 5.7, eq. 5.15 and
//     5.16 and the recommended minimum flexibility 0.1 of an end
//     restraint, 5.8.3.2(3)), 5.8.4 (creep),
//     5.8.6(3) (E_cd), 5.8.7 (nominal stiffness), 5.8.9 (biaxial bending),
//     6.1 (strain limits, minimum eccentricity 6.1(4)), 12.3.1 and 12.6
//     (plain concrete).
//   - EN 1993-1-1:2005 — CEN, EN 1993-1-1:2005 Eurocode 3: Design of steel
//     structures — Part 1-1: General rules and rules for buildings. 3.2.6
//     (E), Table 5.2 (section classes), 6.1 (γM0, γM1), 6.2.1(7)
//     (cross-section interaction), 6.3.1 (flexural buckling, Tables 6.1 and
//     6.2, Figure 6.4), 6.3.3 (members in bending and compression), 6.4
//     (built-up members), Annex B (interaction factors).
//   - EN 1991-1-4:2005 — CEN, EN 1991-1-4:2005 Eurocode 1: Actions on
//     structures — Part 1-4: General actions — Wind actions. 5.3 (wind
//     forces), 7.6 (rectangular sections, Figure 7.23), 7.9 (circular
//     cylinders).
//   - EN 1991-1-1:2002 — CEN, EN 1991-1-1:2002 Eurocode 1: Actions on
//     structures — Part 1-1: Densities, self-weight, imposed loads for
//     buildings. Tables A.1 (concrete) and A.4 (steel).
//   - ACI 318-19 — American Concrete Institute, ACI 318-19 Building Code
//     Requirements for Structural Concrete, 2019. 21.2 (strength reduction
//     factors), 22.2 (flexure and axial strength), 22.4 (axial strength).
//   - AISC 360-16 — American Institute of Steel Construction, ANSI/AISC
//     360-16 Specification for Structural Steel Buildings, 2016. B4
//     (slenderness of elements), E3 (flexural buckling), F7 and F8 (HSS
//     flexure), H1 (combined forces).
//   - Meriam & Kraige — J. L. Meriam and L. G. Kraige, Engineering Mechanics:
//     Statics, Wiley, the section on flexible belts (the rope-friction law
//     of Euler and Eytelwein, T2 = T1 e^{μβ}).
//   - Timoshenko & Gere — S. P. Timoshenko and J. M. Gere, Theory of
//     Elastic Stability, 2nd ed., McGraw-Hill, 1961, ch. 2 (Euler load;
//     the cantilever's effective length 2 l; columns on elastic supports,
//     the fixed-base, pinned-top root tan u = u, u = 4.4934).
//   - Das — B. M. Das, Principles of Foundation Engineering, Cengage, the
//     chapter on eccentrically loaded shallow foundations (middle-third
//     rule, triangular contact pressure).
//   - Steel Buildings in Europe — Multi-storey steel buildings, Part 4:
//     Detailed design, Appendix A, worked example A.5 (pinned column using
//     non-slender H sections), a design guide of the European research
//     project Steel Buildings in Europe; used in the tests for a published
//     χ value.
package tower
