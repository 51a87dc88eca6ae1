package units_test

import (
	"fmt"

	"github.com/sagspan/sagspan/units"
)

func ExampleParse() {
	pull, err := units.Parse[units.Force]("12.5 kN")
	if err != nil {
		fmt.Println(err)
		return
	}
	slope, _ := units.Parse[units.Ratio]("1:12")
	cold, _ := units.Parse[units.Temperature]("-10 C")
	fmt.Println(pull, float64(pull))
	fmt.Printf("%.5f\n", float64(slope))
	fmt.Println(cold)

	_, err = units.Parse[units.Force]("12.5 m")
	fmt.Println(err)
	// Output:
	// 12.50 kN 12500
	// 0.08333
	// -10.00 °C
	// units: "12.5 m": unit "m" is not a unit of force
}

func ExampleMomentOf() {
	m := units.MomentOf(35*units.Kilonewton, 1.8*units.Metre)
	fmt.Println(m)
	// Output: 63.00 kN·m
}
