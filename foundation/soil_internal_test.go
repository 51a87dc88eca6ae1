package foundation

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/units"
)

// TestFactoredStrength checks set M2 of EN 1997-1 Annex A (SOURCES §4,
// read in the standard): γφ' 1.25 on tan φ', γc' 1.25 on c', γcu 1.4 on the
// undrained strength of a soil with no friction angle.
func TestFactoredStrength(t *testing.T) {
	m2 := Basis{}.equSet()
	drained := Soil{Friction: units.FromDegrees(30), Cohesion: 10e3}.factored(m2)
	if got, want := math.Tan(float64(drained.Friction)), math.Tan(math.Pi/6)/1.25; math.Abs(got-want) > 1e-12 {
		t.Errorf("tan φ'd = %v, want %v", got, want)
	}
	if got := float64(drained.Cohesion); math.Abs(got-8e3) > 1e-9 {
		t.Errorf("c'd = %v, want 8 kPa", got)
	}
	undrained := Soil{Cohesion: 50e3}.factored(m2)
	if got := float64(undrained.Cohesion); math.Abs(got-50e3/1.4) > 1e-9 {
		t.Errorf("cu,d = %v, want %v", got, 50e3/1.4)
	}
	// Sets M1 and the allowable basis leave strengths as they are.
	for _, set := range []actionSet{Basis{}.geoSets()[0], Basis{}.allowableSet()} {
		if got := (Soil{Cohesion: 50e3}).factored(set).Cohesion; got != 50e3 {
			t.Errorf("unfactored set changes cu to %v", got)
		}
	}
}
