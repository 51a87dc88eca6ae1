package cable_test

import (
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

func TestErectionTable(t *testing.T) {
	sp := cable.Span{Length: 70, Rise: 4}
	ea := 4 * 100e9 * 184e-6 // four 20 mm ropes (modulus from memory)
	e := cable.Elastic{EA: units.AxialStiffness(ea), Alpha: 12e-6}
	bare := units.LoadPerLength(4 * 1.636 * units.StandardGravity) // four 20 mm 6x36 ropes
	dead := cable.Load{Uniform: 1800}
	ref := units.FromCelsius(20)
	design := units.Length(70.0 / 22)
	temps := []units.Temperature{units.FromCelsius(-10), units.FromCelsius(5), ref, units.FromCelsius(35), units.FromCelsius(50)}
	rows, err := cable.ErectionTable(sp, e, bare, dead, design, ref, temps)
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) != len(temps) {
		t.Fatalf("%d rows for %d temperatures", len(rows), len(temps))
	}
	full := cable.Load{Uniform: dead.Uniform + bare}
	hd := float64(full.Uniform) * 70 * 70 / (8 * float64(design)) // H = M(L/2)/f for the finished bridge
	lFinished := unstretchedByQuadrature(t, sp, full, units.Force(hd), ea)
	for i, r := range rows {
		if r.Temperature != temps[i] {
			t.Errorf("row %d temperature %v", i, r.Temperature)
		}
		// the bare rope at the row's temperature has the unstretched length
		// of the finished bridge at ref, shifted by the thermal strain
		lBare := unstretchedByQuadrature(t, sp, cable.Load{Uniform: bare}, r.H, ea)
		approx(t, "unstretched length", lBare, lFinished*(1+float64(e.Alpha)*float64(r.Temperature-ref)), 1e-12)
		approx(t, "sag from H", float64(r.Sag), float64(bare)*70*70/(8*float64(r.H)), 1e-12)
		if i > 0 && !(r.Sag > rows[i-1].Sag) {
			t.Errorf("sag should grow with temperature: %v then %v", rows[i-1].Sag, r.Sag)
		}
		// adding the dead load back at ref gives the design sag
		if r.Temperature == ref {
			back, err := cable.ChangeOfState(sp, e, cable.State{Load: cable.Load{Uniform: bare}, H: r.H, Temperature: ref}, full, ref)
			if err != nil {
				t.Fatal(err)
			}
			approx(t, "design sag regained", float64(full.Uniform)*70*70/(8*float64(back.H)), float64(design), 1e-11)
		}
	}
	// the bare ropes are set higher than the finished sag: they lengthen
	// elastically under the dead load
	if !(rows[2].Sag < design) {
		t.Errorf("bare sag at ref %v should be less than the design sag %v", rows[2].Sag, design)
	}
	_, err = cable.ErectionTable(sp, e, 0, dead, design, ref, temps)
	wantInvalid(t, "zero bare weight", err)
	_, err = cable.ErectionTable(sp, e, bare, dead, -1, ref, temps)
	wantInvalid(t, "negative design sag", err)
}
