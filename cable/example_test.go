package cable_test

import (
	"fmt"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// A 100 m span with the right bank 10 m higher, sagging 8 m under
// 2 kN per horizontal metre (an invented crossing).
func ExampleNewParabola() {
	p, err := cable.NewParabola(cable.Span{Length: 100 * units.Metre, Rise: 10 * units.Metre}, 2*units.KilonewtonPerMetre, 8*units.Metre)
	if err != nil {
		fmt.Println(err)
		return
	}
	va, vb := p.Reactions()
	ta, tb := p.SupportTensions()
	a, b := p.SupportAngles()
	x, z, within := p.Vertex()
	fmt.Printf("H %.1f kN\n", kN(p.Horizontal()))
	fmt.Printf("V_A %.2f kN, V_B %.2f kN\n", kN(va), kN(vb))
	fmt.Printf("T_A %.2f kN, T_B %.2f kN\n", kN(ta), kN(tb))
	fmt.Printf("angles %.2f° at A, %.2f° at B\n", a.Degrees(), b.Degrees())
	fmt.Printf("low point %.3f m from A, %.3f m below A, within %v\n", float64(x), -float64(z), within)
	fmt.Printf("length %.4f m\n", float64(p.Length()))
	// Output:
	// H 312.5 kN
	// V_A 68.75 kN, V_B 131.25 kN
	// T_A 319.97 kN, T_B 338.94 kN
	// angles 12.41° at A, 22.78° at B
	// low point 34.375 m from A, 3.781 m below A, within true
	// length 102.1566 m
}

// A bare rope of 1 kN/m hanging over a level 100 m span with H 100 kN.
func ExampleCatenaryWithTension() {
	c, err := cable.CatenaryWithTension(cable.Span{Length: 100}, units.KilonewtonPerMetre, 100*units.Kilonewton)
	if err != nil {
		fmt.Println(err)
		return
	}
	_, tb := c.SupportTensions()
	fmt.Printf("sag %.5f m, length %.5f m, T_max %.4f kN\n", float64(c.Sag(50)), float64(c.Length()), kN(tb))
	// Output: sag 12.76260 m, length 104.21906 m, T_max 112.7626 kN
}

// The same rope found from its sag, and from its length.
func ExampleNewCatenary() {
	sp := cable.Span{Length: 100, Rise: 10}
	bySag, _ := cable.NewCatenary(sp, units.KilonewtonPerMetre, 12.82121*units.Metre)
	byLength, _ := cable.CatenaryWithLength(sp, units.KilonewtonPerMetre, 104.69772*units.Metre)
	fmt.Printf("H from sag %.2f kN, from length %.2f kN\n", kN(bySag.Horizontal()), kN(byLength.Horizontal()))
	// Output: H from sag 100.00 kN, from length 100.00 kN
}

// An aluminium-steel conductor over a level 325 m span, cut to the span's
// length and hung: it sags only by stretching.
func ExampleNewElasticCatenary() {
	const area = 2.2783e-4
	rope := cable.ElasticRope{
		Unstretched: 325,
		EA:          units.AxialStiffness(5.70e10 * area),
		Weight:      units.LoadPerLength(2844.23 * 9.81 * area),
	}
	e, err := cable.NewElasticCatenary(cable.Span{Length: 325}, rope)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("H %.3f kN, sag %.3f m, strain %.3e\n", kN(e.Horizontal()), float64(e.Sag(162.5)), e.Strain())
	hot, _ := cable.ElasticChangeOfState(cable.Span{Length: 325}, rope, 2.3e-5, units.FromCelsius(0), units.FromCelsius(39.26), rope.Weight)
	fmt.Printf("at 39.26 °C: H %.3f kN, sag %.3f m\n", kN(hot.Horizontal()), float64(hot.Sag(162.5)))
	// Output:
	// H 13.206 kN, sag 6.352 m, strain 1.018e-03
	// at 39.26 °C: H 10.234 kN, sag 8.194 m
}

// A 60 m walkway under its dead load with a crowd on the left half.
func ExampleNewLoaded() {
	sp := cable.Span{Length: 60}
	crowd := cable.Load{Uniform: 2 * units.KilonewtonPerMetre, Patches: []cable.Patch{{From: 0, To: 30, Load: 4 * units.KilonewtonPerMetre}}}
	l, err := cable.NewLoaded(sp, crowd, 300*units.Kilonewton)
	if err != nil {
		fmt.Println(err)
		return
	}
	x, _, _ := l.Vertex()
	ta, tb := l.SupportTensions()
	fmt.Printf("sag at quarter spans %.3f m and %.3f m\n", float64(l.Sag(15)), float64(l.Sag(45)))
	fmt.Printf("low point %.2f m from A; T_A %.2f kN, T_B %.2f kN\n", float64(x), kN(ta), kN(tb))
	// Output:
	// sag at quarter spans 5.250 m and 3.750 m
	// low point 25.00 m from A; T_A 335.41 kN, T_B 313.21 kN
}

// The same two ropes under a crowd on half the span on a cold day.
func ExampleChangeOfState() {
	sp := cable.Span{Length: 80}
	e := cable.Elastic{EA: units.AxialStiffness(2 * 100e9 * 184e-6), Alpha: 12e-6}
	dead := cable.State{Load: cable.Load{Uniform: 1.2 * units.KilonewtonPerMetre}, H: 150 * units.Kilonewton, Temperature: units.FromCelsius(20)}
	crowd := cable.Load{Uniform: 1.2 * units.KilonewtonPerMetre, Patches: []cable.Patch{{From: 0, To: 40, Load: 4 * units.KilonewtonPerMetre}}}
	s, err := cable.ChangeOfState(sp, e, dead, crowd, units.FromCelsius(-10))
	if err != nil {
		fmt.Println(err)
		return
	}
	l, _ := cable.NewLoaded(sp, crowd, s.H)
	fmt.Printf("H %.2f kN, sag at 20 m %.3f m, at 60 m %.3f m\n", kN(s.H), float64(l.Sag(20)), float64(l.Sag(60)))
	c, _ := cable.ChangeOfStateCubic(sp, e, dead, 1.2*units.KilonewtonPerMetre, units.FromCelsius(-10))
	fmt.Printf("dead load only at -10 °C (cubic): H %.2f kN\n", kN(c.H))
	// Output:
	// H 361.48 kN, sag at 20 m 6.418 m, at 60 m 4.205 m
	// dead load only at -10 °C (cubic): H 151.43 kN
}

// The sag to set four bare ropes to, by temperature, so that the finished
// walkway hangs at 1/22 of its 70 m span at 20 °C.
func ExampleErectionTable() {
	sp := cable.Span{Length: 70}
	r, _ := cable.ParseRope("6x36-IWRC 20mm 1770")
	e := cable.Elastic{EA: 4 * r.EA(), Alpha: r.Alpha}
	temps := []units.Temperature{units.FromCelsius(0), units.FromCelsius(20), units.FromCelsius(40)}
	rows, err := cable.ErectionTable(sp, e, 4*r.Weight(), cable.Load{Uniform: 1.8 * units.KilonewtonPerMetre}, 70.0/22*units.Metre, units.FromCelsius(20), temps)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, row := range rows {
		fmt.Printf("%.0f °C: sag %.3f m, H %.2f kN\n", row.Temperature.Celsius(), float64(row.Sag), kN(row.H))
	}
	// Output:
	// 0 °C: sag 1.200 m, H 32.76 kN
	// 20 °C: sag 1.340 m, H 29.33 kN
	// 40 °C: sag 1.474 m, H 26.67 kN
}

// Four 20 mm ropes carrying 300 kN between them (service), 405 kN factored,
// the most loaded carrying 1.1 of an equal share; socketed ends (k_e 1).
func ExampleGroup_TensionCheck() {
	r, _ := cable.ParseRope("6x36-IWRC 20mm 1770")
	ropes := cable.Group{Rope: r, Count: 4, Sharing: 1.1}
	g, _ := ropes.TensionCheck(300*units.Kilonewton, cable.GlobalFactor{Ke: 1})
	p, _ := ropes.TensionCheck(1.35*300*units.Kilonewton, cable.PartialFactor{Ke: 1})
	fmt.Printf("%s global: %s of %s, ratio %.3f, %s\n", g.ID, g.DemandString(), g.CapacityString(), g.Ratio, g.Status)
	fmt.Printf("%s partial: %s of %s, ratio %.3f, %s\n", p.ID, p.DemandString(), p.CapacityString(), p.Ratio, p.Status)
	// Output:
	// cable.tension global: 82.50 kN of 84.02 kN, ratio 0.982, pass
	// cable.tension partial: 111.4 kN of 186.7 kN, ratio 0.597, pass
}

func ExampleFrequencies() {
	// 100 kg/m over a 100 m level span under H 245.2 kN hangs at 5 m sag.
	m, err := cable.Frequencies(cable.Span{Length: 100}, 245.166*units.Kilonewton, 100*units.KilogramPerMetre, 1e9)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("sag %.3f m, swing %.4f Hz, antisymmetric %.4f Hz, symmetric %.4f Hz, λ² %.1f\n", float64(m.Sag), float64(m.Swing), float64(m.Antisymmetric), float64(m.Symmetric), m.LambdaSq)
	// Output: sag 5.000 m, swing 0.2476 Hz, antisymmetric 0.4951 Hz, symmetric 0.7032 Hz, λ² 639.7
}

// kN returns f in kilonewtons, for printing.
func kN(f units.Force) float64 { return float64(f / units.Kilonewton) }
