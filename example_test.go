package sagspan_test

import (
	"context"
	"fmt"
	"log"
	"os"

	"github.com/sagspan/sagspan"
	"github.com/sagspan/sagspan/units"
)

func ExampleCheck() {
	a, err := sagspan.Check(sagspan.Demo(), nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("overall:", a.Report.Status())
	for _, g := range a.Report.Governing() {
		if g.ID == "cable.tension" || g.ID == "bridge.clearance" {
			fmt.Printf("%s (%s): %s of %s under %q\n", g.ID, g.Element, g.DemandString(), g.CapacityString(), g.Case)
		}
	}
	// Output:
	// overall: flag
	// cable.tension (walkway ropes): 148.4 kN of 172.1 kN under "crowd 0.91 L at midspan, coldest rope"
	// cable.tension (handrail ropes): 5.223 kN of 67.21 kN under "wind, coldest rope"
	// bridge.clearance (walkway): 1.500 m of 4.042 m under "crowd 0.46 L at midspan, hottest rope"
}

func ExampleCrowdPressure() {
	// EN 1991-2 cl. 5.3.2.1: 2.0 + 120/(L + 30) kN/m², within 2.5..5.0.
	for _, l := range []units.Length{20, 50, 100, 300} {
		fmt.Printf("%v: %v\n", l, sagspan.CrowdPressure(l))
	}
	// Output:
	// 20.00 m: 4.400 kPa
	// 50.00 m: 3.500 kPa
	// 100.0 m: 2.923 kPa
	// 300.0 m: 2.500 kPa
}

func ExampleParse() {
	// A decimal comma is a slip, not 72 m.
	_, err := sagspan.Parse([]byte(`{"site": {"span": "72,5 m"}}`))
	fmt.Println(err)
	// Output: sagspan: bridge description: site.span: units: "72,5 m": "72,5 m" has a comma in the number; write it with a decimal point and no thousands separator, such as "72.5 m" (line 1, column 19)
}

func ExampleSearch() {
	m := units.Metre
	space := sagspan.SearchSpace{
		SagRatios: []float64{1.0 / 20, 1.0 / 18},
		Counts:    []int{4, 6},
		Anchors: []sagspan.BlockSize{
			{Length: 4.5 * m, Width: 5.4 * m, Height: 2.6 * m, Depth: 3 * m},
			{Length: 5.5 * m, Width: 6 * m, Height: 2.8 * m, Depth: 3.2 * m},
		},
	}
	res, err := sagspan.Search(context.Background(), sagspan.Demo(), space, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%d candidates, %d feasible\n", res.Evaluated, res.Feasible)
	if res.Best != nil {
		d := res.Best
		fmt.Printf("best: sag 1/%.0f, %d ropes, anchor %v long, cost %.0f, utilisation %.3f\n",
			1/d.SagRatio, d.Count, d.Anchor.Length, d.Cost, d.Utilisation)
	}
	// Output:
	// 8 candidates, 2 feasible
	// best: sag 1/20, 6 ropes, anchor 4.500 m long, cost 47912, utilisation 0.970
}

// ExampleAnalysis_WriteText is the README's "Using it from Go": read a
// description, check it, print the whole report. The README quotes its
// body (TestREADMEUsingItFromGo), so the snippet there always compiles.
func ExampleAnalysis_WriteText() {
	b, err := sagspan.LoadFile("testdata/demo.json") // your own description
	if err != nil {
		log.Fatal(err) // names the field and its line, such as banks.left.anchor.length
	}
	a, err := sagspan.Check(b, nil)
	if err != nil {
		log.Fatal(err) // traced to the field that caused it, with advice
	}
	a.Source = "testdata/demo.json" // named in the report's design basis
	// The design basis, every failure, the governing case of every check,
	// their values, notes and sources, rope states, comfort, erection table.
	if err := a.WriteText(os.Stdout, nil); err != nil {
		log.Fatal(err)
	}
	// a.WriteMarkdown, a.WriteJSON and a.WriteHTML write the same report in
	// other forms; a.WriteSVG the elevation drawing.
}
