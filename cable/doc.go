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
// # Worked example
//
// A level 100 m span sagging 8 m under 2 kN per horizontal metre
// (a parabola, by the general cable theorem H = w L²/(8 f)):
//
//	p, err := cable.NewParabola(cable.Span{Length: 100 * units.Metre}, 2*units.KilonewtonPerMetre, 8*units.Metre)
//	// p.Horizontal() = 312.5 kN; p.Reactions() = 100 kN at each end;
//	// p.SupportTensions() = √(312.5² + 100²) = 328.1 kN at each end.
package cable
