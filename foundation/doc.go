// Package foundation provides the ground checks of a cable-supported
// footbridge: soil descriptions and presets, bearing capacity (Terzaghi,
// Meyerhof, Hansen, Vesić and EN 1997-1 Annex D), contact pressure under
// eccentric load, Rankine and Coulomb earth pressure, and the checks of
// gravity anchor blocks (plain or stepped), deadmen, grouted rock anchors and tower footings.
// It takes forces and geometry and knows nothing of ropes or towers.
//
// # Sign convention
//
// x is horizontal, z is up. For an anchor (AnchorBlock, Deadman) x points
// in the direction the backstays pull, toward the tower and span; a Pull's
// Angle is the backstay's inclination above horizontal at the anchor, so a
// backstay rising toward its saddle has a positive angle and an upward
// component. An AnchorBlock's frame has its origin at the back bottom edge
// (farthest from the tower); its front toe is at x = Length. For a Footing
// x runs along the bridge (side B), the origin at the base centre, the
// moment positive when it presses the +x edge. Depths are positive
// downward from the ground surface.
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
// blocks), uplift 1.5, bearing 3.0. Basis{PartialFactors: true} uses
// EN 1997-1 Annex A: EQU for overturning and uplift, GEO by design approach
// 2 (or 1) for sliding and bearing. Every factor can be overridden.
// Stability results carry the required factor on the demand side and the
// provided factor (+Inf when nothing drives failure), as check.Stability
// does.
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
//	res, err := blk.Check([]foundation.Pull{{Force: 150 * units.Kilonewton,
//		Angle: units.FromDegrees(25), X: 2.5 * units.Metre, Z: 1.2 * units.Metre}}, sand, nil)
//
// res holds anchor.sliding, anchor.overturning, anchor.uplift and
// anchor.bearing, each with its provided factor.
package foundation
