package foundation_test

import (
	"fmt"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

func printResults(rs []check.Result) {
	for _, r := range rs {
		if r.NoLimit {
			fmt.Printf("%-22s %s (no limit)\n", r.ID, r.DemandString())
		} else if r.Required != 0 {
			fmt.Printf("%-22s provided %5.2f required %.2f ratio %.3f %s\n", r.ID, r.Provided, r.Required, r.Ratio, r.Status)
		} else {
			fmt.Printf("%-22s %s of %s ratio %.3f %s\n", r.ID, r.DemandString(), r.CapacityString(), r.Ratio, r.Status)
		}
	}
}

func ExampleBearingCapacity() {
	// A 2 × 2 m pad 1 m deep in sand (γ 18 kN/m³, φ' 30°), the load 0.15 m
	// off centre along B.
	sand := foundation.Soil{UnitWeight: 18 * units.KilonewtonPerCubicMetre, Friction: units.FromDegrees(30)}
	in := foundation.BearingInput{AlongLoad: 2 * units.Metre, AcrossLoad: 2 * units.Metre, Depth: 1 * units.Metre,
		Vertical: 600 * units.Kilonewton, Horizontal: 50 * units.Kilonewton, EccAlong: 0.15 * units.Metre}
	b, err := foundation.BearingCapacity(in, sand, foundation.EC7, foundation.Drained)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%v: Nc %.2f Nq %.2f Nγ %.2f\n", b.Method, b.Nc, b.Nq, b.Ngamma)
	fmt.Printf("B' %v L' %v, sq %.3f sγ %.3f, iq %.3f iγ %.3f\n", b.BEff, b.LEff, b.Sq, b.Sgamma, b.Iq, b.Igamma)
	fmt.Printf("qult %v, resistance %v\n", b.Qult, b.Resistance())
	// Output:
	// EN 1997-1 Annex D: Nc 30.14 Nq 18.40 Nγ 20.09
	// B' 1.700 m L' 2.000 m, sq 1.425 sγ 0.745, iq 0.875 iγ 0.802
	// qult 596.4 kPa, resistance 2028 kN
}

func ExampleContactPressure() {
	// 300 kN on a 2 m × 1 m base, 0.5 m off centre: outside the kern.
	qmax, qmin, contact, err := foundation.ContactPressure(300*units.Kilonewton, 0.5*units.Metre, 2*units.Metre, 1*units.Metre)
	fmt.Println(qmax, qmin, contact, err)
	// Output:
	// 400.0 kPa 0 Pa 1.500 m <nil>
}

func ExampleAnchorBlock_Check() {
	// An invented site: a 3.5 × 3 × 1.8 m block cast 1.8 m deep in dense
	// sand, two backstays at 25° attached 3 m from its back edge, 1.5 m up;
	// each carries 70 kN permanent and 25 kN from crowd load.
	blk := foundation.AnchorBlock{Length: 3.5, Width: 3, Height: 1.8, Depth: 1.8, PassiveMobilisation: 0.5}
	sand, _ := foundation.LookupSoil("dense sand")
	var pulls []foundation.AnchorPull
	for _, f := range []struct {
		kN       float64
		variable bool
	}{{70, false}, {25, true}, {70, false}, {25, true}} {
		pulls = append(pulls, foundation.AnchorPull{Force: units.Force(f.kN) * units.Kilonewton, Angle: units.FromDegrees(25),
			X: 3, Z: 1.5, Variable: f.variable})
	}
	rs, err := blk.Check(pulls, sand, foundation.EC7, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("allowable:")
	printResults(rs)
	rs, _ = blk.Check(pulls, sand, foundation.EC7, &foundation.Basis{PartialFactors: true})
	fmt.Println("EN 1997-1:")
	printResults(rs)
	// Output:
	// allowable:
	// anchor.sliding         provided  1.75 required 1.50 ratio 0.855 pass
	// anchor.overturning     provided  2.66 required 1.50 ratio 0.564 pass
	// anchor.uplift          provided  5.65 required 1.50 ratio 0.266 pass
	// anchor.bearing         46.89 kPa of 322.7 kPa ratio 0.145 pass
	// EN 1997-1:
	// anchor.sliding         provided  0.98 required 1.00 ratio 1.023 FAIL
	// anchor.overturning     provided  1.99 required 1.00 ratio 0.503 pass
	// anchor.uplift          provided  4.22 required 1.00 ratio 0.237 pass
	// anchor.bearing         51.43 kPa of 227.3 kPa ratio 0.226 pass
}

func ExampleDeadman_Check() {
	// A 4 m long, 1.2 m high concrete beam buried 1.8 m deep in medium
	// sand, pulled by 90 kN at 15°. The beam is concrete, not described as
	// a steel section: its design moment and shear are reported.
	d := foundation.Deadman{Length: 4, Height: 1.2, Thickness: 0.4, Depth: 1.8}
	sand, _ := foundation.LookupSoil("medium sand")
	rs, err := d.Check([]foundation.AnchorPull{{Force: 90 * units.Kilonewton, Angle: units.FromDegrees(15)}}, sand, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	printResults(rs)
	// Output:
	// anchor.deadman.pullout provided  3.95 required 2.00 ratio 0.506 pass
	// anchor.deadman.uplift  provided  2.72 required 1.50 ratio 0.551 pass
	// anchor.deadman.bending 45.00 kN·m (no limit)
	// anchor.deadman.shear   45.00 kN (no limit)
}

func ExampleRockAnchor_Check() {
	// Three 32 mm bars (fy 500 MPa) 0.8 m apart in 90 mm holes, 4 m bonded
	// below 3 m free length in sound rock (allowable pressure 2 MPa from
	// the site report), 250 × 250 × 25 mm head plates, holding a 300 kN
	// backstay at 35°.
	ra := foundation.RockAnchor{Count: 3, Spacing: 0.8, BarDiameter: 32 * units.Millimetre, YieldStrength: 500 * units.Megapascal,
		HoleDiameter: 90 * units.Millimetre, BondLength: 4, FreeLength: 3,
		Plate: foundation.HeadPlate{Side: 0.25, Thickness: 0.025, Yield: 275 * units.Megapascal}}
	rock, _ := foundation.LookupSoil("sound rock")
	rock.Allowable = 2 * units.Megapascal
	rs, err := ra.Check(300*units.Kilonewton, units.FromDegrees(35), rock, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	printResults(rs)
	cone := rs[4]
	vol, _ := cone.Value("Vol")
	w, _ := cone.Value("W_c")
	fmt.Println(vol)
	fmt.Println(w)
	// Output:
	// anchor.rock.steel      provided  4.02 required 2.00 ratio 0.497 pass
	// anchor.rock.thread     provided  2.82 required 2.00 ratio 0.708 pass
	// anchor.rock.groutbar   provided  8.04 required 3.00 ratio 0.373 pass
	// anchor.rock.groutrock  provided 11.31 required 3.00 ratio 0.265 pass
	// anchor.rock.cone       provided  2.37 required 2.00 ratio 0.844 pass
	// anchor.rock.plate      58.15 MPa of 164.7 MPa ratio 0.353 pass
	// anchor.rock.platebearing 1.781 MPa of 2.000 MPa ratio 0.891 pass
	// Vol = 49.56 m³ (volume of the bars' combined cone)
	// W_c = 1239 kN (effective weight of the combined cone)
}

func ExampleFooting_Check() {
	// A 2.4 × 2.4 × 0.6 m tower footing 1.2 m deep in stiff clay, carrying
	// 420 kN down, 35 kN along the bridge and 60 kN·m at its underside.
	f := foundation.Footing{Along: 2.4, Across: 2.4, Thickness: 0.6, Depth: 1.2}
	clay, _ := foundation.LookupSoil("stiff clay")
	load := foundation.FootingLoad{Vertical: 420 * units.Kilonewton, Horizontal: 35 * units.Kilonewton,
		Moment: 60 * units.KilonewtonMetre}
	rs, err := f.Check(load, clay, foundation.Vesic, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	printResults(rs)
	fmt.Println(rs[0].Basis)
	// Output:
	// footing.bearing        108.2 kPa of 217.6 kPa ratio 0.497 pass
	// footing.sliding        provided  4.86 required 1.50 ratio 0.308 pass
	// footing.overturning    provided 11.37 required 2.00 ratio 0.176 pass
	// drained (long-term) condition governs; also checked: undrained (short-term) utilisation 0.440; Vesić (1973/1975); allowable basis: global factor of safety 3.00 on the ultimate bearing pressure (common practice)
}

// Reading the named values of a result: the numbers behind an anchor
// block's bearing check, by symbol, in SI.
func ExampleAnchorBlock_Check_values() {
	blk := foundation.AnchorBlock{Length: 3.5, Width: 3, Height: 1.8, Depth: 1.8}
	sand, _ := foundation.LookupSoil("dense sand")
	pulls := []foundation.AnchorPull{{Force: 190 * units.Kilonewton, Angle: units.FromDegrees(25), X: 3, Z: 1.5}}
	rs, err := blk.Check(pulls, sand, foundation.EC7, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	bearing := rs[3]
	for _, sym := range []string{"N", "e", "x_R", "q_max", "q_min", "l_c", "N_q", "i_q", "m", "q_ult"} {
		v, _ := bearing.Value(sym)
		fmt.Println(v)
	}
	// Output:
	// N = 373.3 kN (effective normal force on the base)
	// e = 423.1 mm (eccentricity of the resultant from the base centre)
	// x_R = 2.173 m (position of the base resultant from the back edge)
	// q_max = 61.34 kPa (peak contact pressure of a rigid base)
	// q_min = 9.769 kPa (least contact pressure of a rigid base)
	// l_c = 3.500 m (contact length along the load)
	// N_q = 37.75 (bearing-capacity factor, overburden term)
	// i_q = 0.3880 (load-inclination factor, overburden term)
	// m = 1.531 (exponent of the inclination factors; zero when the method has none)
	// q_ult = 968.2 kPa (ultimate bearing pressure on the effective base)
}
