package foundation

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/units"
)

// TestFactoredStrength checks set M2 of EN 1997-1:2004 Annex A, Table A.4
// [R]: γφ' 1.25 on tan φ', γc' 1.25 on c', γcu 1.4 on the undrained
// strength.
func TestFactoredStrength(t *testing.T) {
	m2 := Basis{}.equSet()
	s := Soil{Friction: units.FromDegrees(30), Cohesion: 10e3, Undrained: 50e3}
	drained := s.strengthIn(Drained, m2)
	if got, want := math.Tan(drained.phi), math.Tan(math.Pi/6)/1.25; math.Abs(got-want) > 1e-12 {
		t.Errorf("tan φ'd = %v, want %v", got, want)
	}
	if got := drained.c; math.Abs(got-8e3) > 1e-9 {
		t.Errorf("c'd = %v, want 8 kPa", got)
	}
	// δ = ⅔ φ'd by default.
	if got, want := drained.tanD, math.Tan(2.0/3*math.Atan(math.Tan(math.Pi/6)/1.25)); math.Abs(got-want) > 1e-12 {
		t.Errorf("tan δd = %v, want %v", got, want)
	}
	if got := s.strengthIn(Undrained, m2).c; math.Abs(got-50e3/1.4) > 1e-9 {
		t.Errorf("cu,d = %v, want %v", got, 50e3/1.4)
	}
	// Sets M1 and the allowable basis leave strengths as they are.
	for _, set := range []actionSet{Basis{}.geoSets()[0], Basis{}.allowableSet()} {
		if got := s.strengthIn(Undrained, set).c; got != 50e3 {
			t.Errorf("unfactored set changes cu to %v", got)
		}
		if got := s.strengthIn(Drained, set).phi; math.Abs(got-math.Pi/6) > 1e-15 {
			t.Errorf("unfactored set changes φ' to %v", got)
		}
	}
}
