package sagspan

import (
	"math"
	"path/filepath"
	"testing"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// TestErectionClosesOnDesignSag sets each group of every testdata bridge to
// the sag of each row of its erection table and hangs the walkway through
// the chain's own rope model, as the crew and the bridge would:
//
//  1. the rope whose bare sag at the row's temperature is the row's sag is
//     found by bisection on its length (every unstretched length scaled
//     alike), an inverse the table itself never runs;
//  2. that rope takes its constructional stretch and carries the permanent
//     load at the reference temperature;
//
// and the midspan sag must then be the design sag within 5 mm.
func TestErectionClosesOnDesignSag(t *testing.T) {
	files, err := filepath.Glob("testdata/*.json")
	if err != nil {
		t.Fatal(err)
	}
	checked := 0
	for _, file := range files {
		b, err := LoadFile(file)
		if err != nil {
			continue // not a bridge description
		}
		a, err := Check(b, nil)
		if err != nil {
			t.Fatalf("%s: %v", file, err)
		}
		m, err := newModel(b)
		if err != nil {
			t.Fatal(err)
		}
		for i, g := range m.groups {
			et := a.Erection[i]
			if et.Group != g.Name || len(et.Rows) == 0 {
				t.Fatalf("%s: erection table %d is %q with %d rows", file, i, et.Group, len(et.Rows))
			}
			for _, row := range et.Rows {
				bare := m.bareInput(i, row.Temperature)
				sagAt := func(scale float64) float64 {
					in := bare
					in.scale = scale
					gs, err := m.solveGroup(i, in)
					if err != nil {
						t.Fatal(err)
					}
					return float64(gs.Sag)
				}
				lo, hi := 0.98, 1.02
				for range 60 {
					mid := (lo + hi) / 2
					if sagAt(mid) < float64(row.Sag) {
						lo = mid
					} else {
						hi = mid
					}
				}
				scale := (lo + hi) / 2 * (1 + g.constructionalStretch())
				hung := solveInput{load: cable.Load{Uniform: g.self + units.LoadPerLength(g.share)*m.dead}, intact: 1, scale: scale}
				gs, err := m.solveGroup(i, hung)
				if err != nil {
					t.Fatal(err)
				}
				if d := math.Abs(float64(gs.Sag - g.Sag)); d > 0.005 {
					t.Errorf("%s, %s set to %s at %s: hangs at %s, design sag %s (%.1f mm off)",
						file, g.Name, row.Sag, row.Temperature, gs.Sag, g.Sag, 1000*d)
				}
				checked++
			}
		}
	}
	if checked == 0 {
		t.Fatal("no erection row checked")
	}
}

// TestConstructionalStretchByHand checks the constructional stretch
// allowance on testdata/level.json by hand: new rope is shorter by the
// factor 1/(1 + ε) in every unstretched length between the anchors, so at
// the reference temperature the bare ropes hang with the H that solves
//
//	levelLength(H, w, EA) = levelLength(H₀, w, EA)/(1 + ε)
//
// (the rope of span and backstays over fixed saddles, formulas beside
// levelLength) by bisection, H₀ that of the rope without the allowance,
// w the ropes' weight, and sag w l²/(8H) (general cable theorem).
func TestConstructionalStretchByHand(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	stretch := func(e float64) float64 {
		b := b
		b.Ropes = append([]RopeGroup(nil), b.Ropes...)
		b.Ropes[0].ConstructionalStretch = &e
		a, err := Check(b, nil)
		if err != nil {
			t.Fatal(err)
		}
		row := a.Erection[0].Rows[0]
		if row.Temperature != b.Climate.Reference {
			t.Fatalf("row at %s", row.Temperature)
		}
		return float64(row.Sag)
	}
	const eps, l, f = 0.0025, 50.0, 2.5
	// The ropes' weight per horizontal metre at the design sag (as in
	// TestLevelSpanByHand), which the bare rope keeps.
	n := f / l
	w := 4 * 0.409 * 26 * 26 / 100 * 9.80665 * (1 + 8*n*n/3 - 32*math.Pow(n, 4)/5 + 256*math.Pow(n, 6)/7)
	h0 := w * l * l / (8 * stretch(0))
	target := levelLengthEA(h0, w, levelEA) / (1 + eps)
	lo, hi := h0/10, 100*h0
	for range 200 {
		mid := (lo + hi) / 2
		if levelLengthEA(mid, w, levelEA) > target {
			lo = mid
		} else {
			hi = mid
		}
	}
	near(t, "sag of the new bare rope for 0.25 % stretch", stretch(eps), w*l*l/(8*(lo+hi)/2), 1e-6)
}
