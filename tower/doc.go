// Package tower checks the short tower column (or steel frame) on each bank
// of a cable-supported footbridge: the forces the ropes put on the column
// through their saddles, the eccentricity of the resultant at the column
// base, the stability of the tower on its footing, and the capacity of the
// column section (reinforced or plain concrete, or a hollow steel tube).
//
// The package takes forces and geometry, never ropes: the caller passes the
// span-side and backstay rope tensions and their angles at each saddle.
//
// # Sign convention
//
// The project convention holds (x horizontal from the left support towards
// the right, z up; rope angles on a saddle measured below horizontal). On
// one tower this package uses a local horizontal axis positive TOWARD THE
// SPAN, so the same code serves the left and the right tower:
//
//   - a RopePull's Angle is measured below horizontal (negative when the rope
//     rises away from the saddle);
//   - the span-side rope pulls the saddle toward the span and down,
//     the backstay pulls it away from the span and down;
//   - a LevelForce's Vertical is positive downward and its Horizontal is
//     positive toward the span; heights are measured up from the column
//     base section, offsets horizontally from the column axis, toward the
//     span positive;
//   - moments are positive when they turn the tower toward the span;
//   - a Resultant's Angle is measured from the vertical, toward the span
//     positive, and its BaseOffset (the eccentricity e) is positive on the
//     span side of the column axis;
//   - axial forces on column sections are positive in compression.
//
// # Units
//
// All quantities are typed SI values from package units (N, m, Pa, rad).
//
// # Example
//
// Walkway ropes at 3.2 m pulling 180 kN at 12° toward the span and 185 kN
// at 35° down the backstay, over a fixed saddle:
//
//	lf, _ := tower.Saddle{Kind: tower.Fixed, Height: 3.2 * units.Metre}.Force(
//		tower.RopePull{Tension: 180 * units.Kilonewton, Angle: units.FromDegrees(12)},
//		tower.RopePull{Tension: 185 * units.Kilonewton, Angle: units.FromDegrees(35)})
//	col := tower.Column{Depth: 0.8 * units.Metre, Width: 1.2 * units.Metre, Height: 3.4 * units.Metre}
//	r, _ := tower.Combine([]tower.LevelForce{lf}, col.Weight())
//	res, _ := tower.EccentricityCheck(r, col, nil) // kern limit d/6
//
// Every check returns check.Result values whose Basis names the method and
// its published source; values recalled rather than read are marked
// "from memory", trade facts without a source "common practice".
package tower
