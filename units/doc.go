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
// In JSON a quantity marshals as a bare SI number and unmarshals from
// either a bare SI number or a string with its unit, parsed as by Parse and
// checked for the right dimension. Temperatures and angles are the
// exception: a bare number is ambiguous (°C or K, degrees or radians), so
// they marshal as a string with the SI unit ("288.15 K", "0.5 rad") and a
// bare number is refused with ErrNoUnit and an example of how to write it.
//
// Parse refuses the slips a person makes writing a quantity by hand: a
// unit in two pieces that is not a product ("0.35 m m" is not 0.35 mm), a
// decimal comma ("72,5 m") and a space inside a number ("1 200 m").
//
// Temperatures are absolute (kelvin); FromCelsius and Celsius convert.
// Temperature differences and thermal strains are plain float64 kelvin.
//
// # References
//
//   - Bureau International des Poids et Mesures (2019). The International
//     System of Units (SI), 9th edition (the SI Brochure): the coherent SI
//     units, the prefixes, the writing of quantities (a space between
//     number and unit, the decimal marker) and the degree Celsius,
//     T/K = t/°C + 273.15.
//   - ISO 80000-3:2019, Quantities and units — Part 3: Space and time:
//     the standard acceleration of free fall, g_n = 9.806 65 m/s²
//     (StandardGravity).
package units
