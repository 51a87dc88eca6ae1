// Package units provides the typed SI quantities used throughout sagspan,
// parsing of human-written quantities ("12.5 kN", "30 deg", "24 kN/m3",
// "-10 C", "1:12") and formatting in the engineering units a bridge designer
// reads (kN, kN/m, kPa, MPa, mm, m, deg).
//
// Every type holds its value in coherent SI: metres, newtons, pascals,
// radians, kilograms, kelvin. Units change only at the edges, through the
// Parse functions and the String methods. Constants give meaning to literals:
//
//	span := 48 * units.Metre
//	pull := 2.5 * units.Kilonewton
//	load := 3.2 * units.KilonewtonPerMetre
//
// Each type converts to a gonum.org/v1/gonum/unit value through its Unit
// method, so dimensions can be checked with that package's machinery.
//
// In JSON every quantity marshals as a bare SI number, and unmarshals from
// either a bare SI number or a string with its unit, parsed as by Parse and
// checked for the right dimension.
//
// Temperatures are absolute (kelvin); FromCelsius and Celsius convert.
// Temperature differences and thermal strains are plain float64 kelvin.
package units
