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
package sagspan
