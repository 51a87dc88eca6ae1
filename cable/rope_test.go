package cable_test

import (
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

func TestRopeFormula(t *testing.T) {
	// [R] rope makers' technical data in the form of EN 12385-4 (References):
	// a 6x7-FC rope with K 0.332 reproduces the makers' rope table: 20 mm 235/260 kN, 40 mm 940/1040 kN (grades 1770/1960).
	// Published tables round to ~3 figures: 0.5 % tolerance.
	c := cable.Construction{Name: "6x7-FC", K: 0.332, C: 0.369, W: 0.345, Modulus: 90 * units.Gigapascal} // C, W, modulus: placeholders, not checked
	for _, r := range []struct {
		d     units.Length
		grade units.Pressure
		mbf   units.Force
	}{
		{20 * units.Millimetre, 1770 * units.Megapascal, 235 * units.Kilonewton},
		{20 * units.Millimetre, 1960 * units.Megapascal, 260 * units.Kilonewton},
		{40 * units.Millimetre, 1770 * units.Megapascal, 940 * units.Kilonewton},
		{40 * units.Millimetre, 1960 * units.Megapascal, 1040 * units.Kilonewton},
	} {
		rope, err := c.Rope(r.d, r.grade)
		if err != nil {
			t.Fatal(err)
		}
		approx(t, "6x7-FC MBF "+rope.Name, float64(rope.MBF), float64(r.mbf), 5e-3)
	}
}

func TestStrand6x36IWRC(t *testing.T) {
	// [D] from the same formula F = K d² R_r (EN 12385-4 form) by hand; this
	// is a regression on the implementation of that formula and its units.
	for _, r := range []struct {
		d     units.Length
		grade units.Pressure
		mbf   units.Force
	}{
		{20 * units.Millimetre, 1770 * units.Megapascal, 252.0 * units.Kilonewton},
		{20 * units.Millimetre, 1960 * units.Megapascal, 279.1 * units.Kilonewton},
		{28 * units.Millimetre, 1770 * units.Megapascal, 494.0 * units.Kilonewton},
		{28 * units.Millimetre, 1960 * units.Megapascal, 547.0 * units.Kilonewton},
		{40 * units.Millimetre, 1770 * units.Megapascal, 1008.2 * units.Kilonewton},
		{40 * units.Millimetre, 1960 * units.Megapascal, 1116.4 * units.Kilonewton},
	} {
		rope, err := cable.Strand6x36IWRC.Rope(r.d, r.grade)
		if err != nil {
			t.Fatal(err)
		}
		approx(t, rope.Name, float64(rope.MBF), float64(r.mbf), 3e-4) // table values to 4 figures
	}
	r20, _ := cable.Strand6x36IWRC.Rope(20*units.Millimetre, 1770*units.Megapascal)
	approx(t, "area 20 mm", float64(r20.Area), 184e-6, 1e-12)     // C d² = 0.460 × 400 mm² [D]
	approx(t, "mass 20 mm", float64(r20.Mass), 1.636, 1e-12)      // W d²/100 = 0.409 × 4 kg/m [D]
	approx(t, "EA 20 mm", float64(r20.EA()), 100e9*184e-6, 1e-12) // E A
	approx(t, "weight 20 mm", float64(r20.Weight()), 1.636*units.StandardGravity, 1e-12)
	if r20.Name != "6x36-IWRC 20mm 1770" {
		t.Errorf("name %q", r20.Name)
	}
}

func TestCatalogueAndParse(t *testing.T) {
	ropes, err := cable.Catalogue(cable.Strand6x36IWRC, 1770*units.Megapascal, 16*units.Millimetre, 20*units.Millimetre, 26*units.Millimetre)
	if err != nil {
		t.Fatal(err)
	}
	if len(ropes) != 3 {
		t.Fatalf("%d ropes", len(ropes))
	}
	for i := 1; i < len(ropes); i++ {
		if !(ropes[i].MBF > ropes[i-1].MBF) {
			t.Error("catalogue MBF should grow with diameter")
		}
	}
	for _, name := range []string{"6x36-IWRC 20mm 1770", "6x36-iwrc 20 mm 1770", "6X36-IWRC 20 1770"} {
		r, err := cable.ParseRope(name)
		if err != nil {
			t.Fatalf("%q: %v", name, err)
		}
		if r != ropes[1] {
			t.Errorf("%q parsed to %+v, want %+v", name, r, ropes[1])
		}
	}
	for _, bad := range []string{"", "6x36-IWRC 20mm", "8x19 20mm 1770", "6x36-IWRC -20mm 1770", "6x36-IWRC 20mm NaN", "6x36-IWRC 20mm Inf"} {
		_, err := cable.ParseRope(bad)
		wantInvalid(t, "parse "+bad, err)
	}
	_, err = cable.Strand6x36IWRC.Rope(0, 1770*units.Megapascal)
	wantInvalid(t, "zero diameter", err)
	_, err = cable.Catalogue(cable.Strand6x36IWRC, 0, 20*units.Millimetre)
	wantInvalid(t, "zero grade", err)
}
