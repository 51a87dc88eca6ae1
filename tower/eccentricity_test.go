package tower_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

func TestEccentricityCheck(t *testing.T) {
	// Column 0.9 m deep with 0.15 m masonry facing: d_eff = 0.6 m, kern
	// d_eff/6 = 0.100 m (middle-third rule). Weight 24 kN/m³ · 0.9·1.0·3.5 =
	// 75.6 kN.
	col := tower.Column{Depth: 0.9, Width: 1.0, Height: 3.5, Facing: 0.15}
	if !near(float64(col.Weight()), 75.6e3, 1e-12) || !near(float64(col.EffectiveDepth()), 0.6, 1e-12) {
		t.Fatalf("weight %v, d_eff %v", col.Weight(), col.EffectiveDepth())
	}
	level := tower.LevelForce{Height: 3.2, Vertical: kN(150), Horizontal: kN(4)}
	r, err := tower.Combine([]tower.LevelForce{level}, 0) // self-weight left out here on purpose
	if err != nil {
		t.Fatal(err)
	}
	e := 4 * 3.2 / (150 + 75.6) // statics, column weight included by the check
	tests := []struct {
		name  string
		limit *tower.EccentricityLimit
		allow float64
	}{
		{"kern", nil, 0.1},
		{"kern by zero fraction", &tower.EccentricityLimit{}, 0.1},
		{"half depth plus offset", &tower.EccentricityLimit{Fraction: 0.5, Offset: 0.1}, 0.5*0.3 + 0.1},
		{"full half depth", &tower.EccentricityLimit{Fraction: 1}, 0.3},
	}
	for _, tc := range tests {
		res, err := tower.EccentricityCheck(r, col, tc.limit)
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		if res.ID != "tower.eccentricity" || res.Kind != units.KindLength || res.Basis == "" {
			t.Errorf("%s: result header %+v", tc.name, res)
		}
		if !near(res.Demand, e, 1e-12) || !near(res.Capacity, tc.allow, 1e-12) || !near(res.Ratio, e/tc.allow, 1e-12) {
			t.Errorf("%s: demand %g capacity %g ratio %g; want %g %g", tc.name, res.Demand, res.Capacity, res.Ratio, e, tc.allow)
		}
		if !strings.Contains(strings.Join(res.Notes, " "), "toward the span") {
			t.Errorf("%s: notes %q lack the side", tc.name, res.Notes)
		}
	}
	// Passing the column weight to Combine gives the same check.
	r2, _ := tower.Combine([]tower.LevelForce{level}, col.Weight())
	a, _ := tower.EccentricityCheck(r, col, nil)
	b, _ := tower.EccentricityCheck(r2, col, nil)
	if !near(a.Demand, b.Demand, 1e-12) {
		t.Errorf("self-weight counted differently: %g vs %g", a.Demand, b.Demand)
	}
	// The kern is where the edge stress N/A − M/W reaches zero
	// (σ = N/(bd) · (1 − 6e/d), elementary bending theory).
	edge := 1 - 6*a.Capacity/float64(col.EffectiveDepth())
	if math.Abs(edge) > 1e-12 {
		t.Errorf("kern edge stress factor %g", edge)
	}
}

func TestEccentricityMirrorAndZero(t *testing.T) {
	col := tower.Column{Depth: 0.8, Width: 0.8, Height: 3}
	for _, h := range []float64{0, 6, -6, 40} {
		ra, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(h)}}, 0)
		rb, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(-h)}}, 0)
		a, err1 := tower.EccentricityCheck(ra, col, nil)
		b, err2 := tower.EccentricityCheck(rb, col, nil)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if !near(a.Ratio, b.Ratio, 1e-12) || a.Status != b.Status {
			t.Errorf("H %g: mirror ratios %g %g", h, a.Ratio, b.Ratio)
		}
		if h == 0 && (a.Demand != 0 || a.Status != check.Pass) {
			t.Errorf("zero unbalanced force gives e %g", a.Demand)
		}
		// Utilisation scales linearly with the horizontal force at fixed V.
		if h == 6 {
			r2, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(2 * h)}}, 0)
			c2, _ := tower.EccentricityCheck(r2, col, nil)
			if !near(c2.Ratio, 2*a.Ratio, 1e-12) {
				t.Errorf("not linear: %g vs %g", c2.Ratio, a.Ratio)
			}
		}
	}
}

func TestEccentricityErrors(t *testing.T) {
	r, _ := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(90), Horizontal: kN(5)}}, 0)
	good := tower.Column{Depth: 0.8, Width: 0.8, Height: 3}
	tests := []struct {
		name     string
		r        tower.Resultant
		c        tower.Column
		l        *tower.EccentricityLimit
		sentinel error
	}{
		{"zero depth", r, tower.Column{Width: 1, Height: 3}, nil, tower.ErrInvalid},
		{"facing eats section", r, tower.Column{Depth: 0.8, Width: 0.8, Height: 3, Facing: 0.4}, nil, tower.ErrInvalid},
		{"fraction above 1", r, good, &tower.EccentricityLimit{Fraction: 1.5}, tower.ErrInvalid},
		{"negative limit", r, good, &tower.EccentricityLimit{Fraction: 0.2, Offset: -1}, tower.ErrInvalid},
		{"NaN resultant", tower.Resultant{Vertical: units.Force(math.NaN())}, good, nil, tower.ErrInvalid},
		{"uplift", tower.Resultant{Vertical: kN(-500)}, good, nil, tower.ErrLiftOff},
	}
	for _, tc := range tests {
		if _, err := tower.EccentricityCheck(tc.r, tc.c, tc.l); !errors.Is(err, tc.sentinel) {
			t.Errorf("%s: got %v, want %v", tc.name, err, tc.sentinel)
		}
	}
}
