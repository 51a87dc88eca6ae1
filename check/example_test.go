package check_test

import (
	"fmt"
	"os"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

func ExampleCompare() {
	r := check.Compare("cable.tension", "Rope tension", units.KindForce, 84e3, 100.8e3).
		For("walkway ropes", "crowd full").
		WithBasis("global factor of safety on minimum breaking force (common practice)")
	fmt.Printf("%s %s: %s of %s, ratio %.3f, %s\n", r.ID, r.Case, r.DemandString(), r.CapacityString(), r.Ratio, r.Status)
	// Output: cable.tension crowd full: 84.00 kN of 100.8 kN, ratio 0.833, pass
}

func ExampleStability() {
	// Resisting moment 450 kN·m against an overturning moment of 180 kN·m,
	// with a required factor of safety of 2.
	r := check.Stability("anchor.overturning", "Anchor overturning", units.KindMoment, 180e3, 450e3, 2)
	fmt.Printf("provided %.2f, required %.2f, ratio %.3f, %s\n", r.Provided, r.Required, r.Ratio, r.Status)
	// Output: provided 2.50, required 2.00, ratio 0.800, pass
}

func ExampleReport_Governing() {
	var rep check.Report
	rep.Title = "Example"
	rep.Add(
		check.Compare("cable.tension", "Rope tension", units.KindForce, 60e3, 100e3).For("ropes", "permanent"),
		check.Compare("cable.tension", "Rope tension", units.KindForce, 90e3, 100e3).For("ropes", "crowd full"),
		check.Compare("cable.tension", "Rope tension", units.KindForce, 75e3, 100e3).For("ropes", "crowd half"),
	)
	for _, g := range rep.Governing() {
		fmt.Println(g.ID, g.Case, g.Status)
	}
	fmt.Println("overall:", rep.Status())
	_ = rep.WriteMarkdown(os.Stdout, nil) // renders the same as a table
	// Output:
	// cable.tension crowd full pass
	// overall: pass
	// # Example
	//
	// > CAUTION: these results support, and never replace, the design of a qualified engineer. Local codes, standards and licensed practice govern. Check every input and every result before anything is built.
	//
	// **Overall: pass (3 results)**
	//
	// ## Governing cases
	//
	// | Check | Element | Case | Demand | Capacity | Ratio | FoS prov/req | Status |
	// |---|---|---|---|---|---|---|---|
	// | cable.tension | ropes | crowd full | 90.00 kN | 100.0 kN | 0.900 |  | pass |
}

func ExampleResult_Value() {
	// A program reads a check's intermediate quantities by symbol, without
	// knowing the check or parsing its notes.
	r := check.Compare("anchor.bearing", "Anchor bearing", units.KindPressure, 80e3, 335e3).
		WithValues(
			check.Of("N", "normal force on the base", units.Force(1.408e6)),
			check.Of("e", "eccentricity of the base reaction", units.Length(0.4835)),
		)
	if e, ok := r.Value("e"); ok {
		fmt.Printf("%s: %.4f %s\n", e.Meaning, e.Value, e.Kind.SI())
	}
	for _, v := range r.Values {
		fmt.Println(v)
	}
	fmt.Println(r)
	// Output:
	// eccentricity of the base reaction: 0.4835 m
	// N = 1408 kN (normal force on the base)
	// e = 483.5 mm (eccentricity of the base reaction)
	// anchor.bearing: 80.00 kPa against 335.0 kPa, ratio 0.239, pass
}
