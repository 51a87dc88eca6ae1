package tower_test

import (
	"fmt"

	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// An invented footbridge bank: walkway ropes on a fixed saddle at 3.2 m and
// handrail ropes on a sliding saddle at 4.3 m.
func ExampleSaddle_Force() {
	walk := tower.Saddle{Kind: tower.Fixed, Height: 3.2 * units.Metre}
	lf, err := walk.Force(
		tower.RopePull{Tension: 180 * units.Kilonewton, Angle: units.FromDegrees(12)},
		tower.RopePull{Tension: 185 * units.Kilonewton, Angle: units.FromDegrees(35)})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("walkway: V %v down, H %v toward the span\n", lf.Vertical, lf.Horizontal)

	rail := tower.Saddle{Kind: tower.Sliding, Friction: 0.15, Height: 4.3 * units.Metre}
	span := tower.RopePull{Tension: 40 * units.Kilonewton, Angle: units.FromDegrees(10)}
	back := tower.RopePull{Tension: 40 * units.Kilonewton, Angle: units.FromDegrees(40)}
	lf, _ = rail.Force(span, back)
	fmt.Printf("handrail: V %v down, H %v toward the span, slips %v\n", lf.Vertical, lf.Horizontal, rail.Slips(span, back))
	// Output:
	// walkway: V 143.5 kN down, H 24.52 kN toward the span
	// handrail: V 32.66 kN down, H 4.899 kN toward the span, slips true
}

func ExampleEccentricityCheck() {
	col := tower.Column{Depth: 0.9 * units.Metre, Width: 1.2 * units.Metre, Height: 3.5 * units.Metre, Facing: 0.1 * units.Metre}
	levels := []tower.LevelForce{
		{Height: 3.2 * units.Metre, Vertical: 144 * units.Kilonewton, Horizontal: 24.5 * units.Kilonewton},
		{Height: 4.3 * units.Metre, Vertical: 32.7 * units.Kilonewton, Horizontal: 4.9 * units.Kilonewton},
	}
	r, err := tower.Combine(levels, col.Weight())
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("V %v, H %v, angle %.2f deg, e %v\n", r.Vertical, r.Horizontal, r.Angle.Degrees(), r.BaseOffset)
	res, err := tower.EccentricityCheck(r, col, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s: %s of %s, ratio %.3f, %s\n", res.ID, res.DemandString(), res.CapacityString(), res.Ratio, res.Status)
	e, _ := res.Value("e")
	es, _ := res.Value("e_s")
	fmt.Printf("rope line e %v, statics e_s %v\n", units.Length(e.Value), units.Length(es.Value))
	// Checked 0.6 m up, where the column is tied into its base, within the
	// effective section plus a 0.1 m projecting base:
	res, _ = tower.EccentricityCheck(r, col, &tower.Eccentricity{Section: 0.6 * units.Metre,
		Limit: &tower.EccentricityLimit{Fraction: 1, Offset: 0.1 * units.Metre}})
	fmt.Printf("checked section: %s of %s, ratio %.3f, %s\n", res.DemandString(), res.CapacityString(), res.Ratio, res.Status)
	// Output:
	// V 267.4 kN, H 29.40 kN, angle 6.27 deg, e 372.0 mm
	// tower.eccentricity: 562.9 mm of 116.7 mm, ratio 4.825, FAIL
	// rope line e 562.9 mm, statics e_s 372.0 mm
	// checked section: 463.1 mm of 450.0 mm, ratio 1.029, FAIL
}

func ExampleStability() {
	col := tower.Column{Depth: 0.9 * units.Metre, Width: 1.2 * units.Metre, Height: 3.5 * units.Metre}
	ft := tower.Footing{Length: 2.4 * units.Metre, Width: 2.0 * units.Metre, Thickness: 0.7 * units.Metre, Depth: 1.2 * units.Metre,
		SoilUnitWeight: 18 * units.KilonewtonPerCubicMetre}
	r, _ := tower.Combine([]tower.LevelForce{
		{Height: 3.2 * units.Metre, Vertical: 144 * units.Kilonewton, Horizontal: 24.5 * units.Kilonewton},
	}, col.Weight())
	results, err := tower.Stability(r, col, ft, &tower.StabilityFactors{AllowablePressure: 200 * units.Kilopascal})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, res := range results {
		fmt.Printf("%-20s %10s %10s  ratio %.3f  %s\n", res.ID, res.DemandString(), res.CapacityString(), res.Ratio, res.Status)
	}
	a := ft.Actions(r, col)
	fmt.Printf("base: V %v, H %v, M %v\n", a.Vertical, a.Horizontal, a.Moment)
	// Output:
	// tower.overturning    95.55 kN·m 418.6 kN·m  ratio 0.457  pass
	// tower.sliding          24.50 kN   174.4 kN  ratio 0.211  pass
	// tower.base_pressure   122.4 kPa  200.0 kPa  ratio 0.612  pass
	// tower.base_resultant   273.9 mm    1.200 m  ratio 0.228  pass
	// base: V 348.8 kN, H 24.50 kN, M 95.55 kN·m
}

func ExampleRCSection_Check() {
	bar := 491 * units.SquareMillimetre // Ø25
	s := tower.RCSection{B: 0.4 * units.Metre, H: 0.4 * units.Metre, Fc: 30 * units.Megapascal, Fy: 420 * units.Megapascal,
		Bars: tower.RectangularBars(0.4*units.Metre, 0.4*units.Metre, 60*units.Millimetre, 2, 0, bar)}
	res, err := s.Check(800*units.Kilonewton, 150*units.KilonewtonMetre)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s: %s of %s, ratio %.3f, %s\n", res.ID, res.DemandString(), res.CapacityString(), res.Ratio, res.Status)
	// Output:
	// tower.column_section: 150.0 kN·m of 224.8 kN·m, ratio 0.667, pass
}

func ExampleTube_Check() {
	t := tower.Tube{Shape: tower.Circular, Size: 219.1 * units.Millimetre, Wall: 8 * units.Millimetre,
		Fy: 355 * units.Megapascal, E: 210 * units.Gigapascal, Code: tower.EN1993}
	res, err := t.Check(400*units.Kilonewton, 40*units.KilonewtonMetre, 6*units.Metre)
	if err != nil {
		fmt.Println(err)
		return
	}
	chi, _ := res.Value("χ")
	nb, _ := res.Value("N_b,Rd")
	fmt.Printf("%s: utilisation %.3f, %s; χ %.3f, N_b,Rd %v\n", res.ID, res.Demand, res.Status, chi.Value, units.Force(nb.Value))
	// Output:
	// tower.column_section: utilisation 0.738, pass; χ 0.630, N_b,Rd 1186 kN
}

// The 7 m, 350 × 350 mm column under a roller saddle is a cantilever on a
// footing that turns a little (base flexibility 0.1, l0 = 2.2 l): it
// buckles under 568 kN. The numbers behind the verdict are
// read from the result by symbol.
func ExampleRCColumn_Check() {
	bar := units.Area(201e-6) // Ø16
	col := tower.RCColumn{
		Section: tower.RCSection{B: 0.35 * units.Metre, H: 0.35 * units.Metre, Fc: 25 * units.Megapascal,
			Fy: 500 * units.Megapascal, Code: tower.EN1992,
			Bars: tower.RectangularBars(0.35*units.Metre, 0.35*units.Metre, 50*units.Millimetre, 2, 0, bar)},
		Length: 7 * units.Metre, Along: tower.FreeTop, Across: tower.FreeTop,
	}
	res, err := col.Check(tower.ColumnActions{N: 568 * units.Kilonewton, Along: 12 * units.KilonewtonMetre})
	if err != nil {
		fmt.Println(err)
		return
	}
	r := res.Along
	fmt.Printf("%s: %s against %s, %s\n", r.ID, r.DemandString(), r.CapacityString(), r.Status)
	for _, sym := range []string{"l0", "λ", "λ_lim", "N_B"} {
		v, _ := r.Value(sym)
		fmt.Printf("%s = %s\n", v.Symbol, units.Format(v.Value, v.Kind))
	}
	// Output:
	// tower.column_section: 568.0 kN against 206.6 kN, FAIL
	// l0 = 15.39 m
	// λ = 152.3
	// λ_lim = 21.97
	// N_B = 206.6 kN
}

// A fixed saddle whose groove grips the rope with μ 0.1: the backstay
// keeps its own tension until the span pulls harder than the rope-friction
// law allows over the wrap angle.
func ExampleSaddle_Balance() {
	s := tower.Saddle{Kind: tower.Fixed, Groove: tower.FrictionGroove, GrooveFriction: 0.1}
	span := tower.RopePull{Tension: 300 * units.Kilonewton, Angle: units.FromDegrees(11)}
	for _, held := range []units.Force{295 * units.Kilonewton, 200 * units.Kilonewton} {
		b, err := s.Balance(span, units.FromDegrees(24), held)
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Printf("held %v: backstay %v, bounds %v to %v, rendered %v\n", held, b.Backstay, b.Lower, b.Upper, b.Motion == tower.Rendered)
	}
	// Output:
	// held 295.0 kN: backstay 295.0 kN, bounds 282.2 kN to 318.9 kN, rendered false
	// held 200.0 kN: backstay 282.2 kN, bounds 282.2 kN to 318.9 kN, rendered true
}
