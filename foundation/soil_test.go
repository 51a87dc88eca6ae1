package foundation_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

func TestPresets(t *testing.T) {
	ps := foundation.Presets()
	if len(ps) < 6 {
		t.Fatalf("%d presets", len(ps))
	}
	for _, p := range ps {
		if err := p.Validate(); err != nil {
			t.Errorf("%s: %v", p.Name, err)
		}
		if !strings.Contains(p.Source, "from memory") {
			t.Errorf("%s: source %q does not say it is from memory", p.Name, p.Source)
		}
		if p.IsRock != (p.GroutBond > 0) {
			t.Errorf("%s: rock %v with grout bond %v", p.Name, p.IsRock, p.GroutBond)
		}
	}
	for _, name := range []string{"dense sand", "Stiff Clay", " gravel ", "weathered rock"} {
		s, err := foundation.LookupSoil(name)
		if err != nil || s.Name != strings.ToLower(strings.TrimSpace(name)) {
			t.Errorf("%q: %v %q", name, err, s.Name)
		}
	}
	_, err := foundation.LookupSoil("peat")
	if !errors.Is(err, foundation.ErrUnknownSoil) || !strings.Contains(err.Error(), "dense sand") || strings.Contains(err.Error(), "did you mean") {
		t.Errorf("peat: %v", err)
	}
	// A typo gets the nearest name.
	_, err = foundation.LookupSoil("sofft clay")
	if !errors.Is(err, foundation.ErrUnknownSoil) || !strings.Contains(err.Error(), `did you mean "soft clay"`) {
		t.Errorf("typo: %v", err)
	}
	// Fine soils carry an undrained strength, coarse soils and rock none.
	for _, p := range ps {
		fine := strings.Contains(p.Name, "clay")
		if fine != (p.Undrained > 0) {
			t.Errorf("%s: undrained strength %v", p.Name, p.Undrained)
		}
	}
}

func TestSoilDerived(t *testing.T) {
	s := foundation.Soil{UnitWeight: 19 * kNm3, Friction: deg(36)}
	// Default submerged weight γ − γw with γw 9.81 kN/m³ (common practice).
	near(t, "γ'", float64(s.SubmergedWeight()), 19e3-9.81e3, 1e-12)
	s.Submerged = 10 * kNm3
	near(t, "γ' given", float64(s.SubmergedWeight()), 10e3, 1e-12)
	// Default δ = ⅔φ'.
	near(t, "δ default", s.InterfaceFriction().Degrees(), 24, 1e-12)
	s.Interface = 1
	near(t, "δ cast in situ", s.InterfaceFriction().Degrees(), 36, 1e-12)
}

func TestSoilValidate(t *testing.T) {
	good := foundation.Soil{UnitWeight: 18 * kNm3, Friction: deg(30)}
	bad := []func(*foundation.Soil){
		func(s *foundation.Soil) { s.UnitWeight = 0 },
		func(s *foundation.Soil) { s.UnitWeight = units.UnitWeight(math.NaN()) },
		func(s *foundation.Soil) { s.Friction = deg(-1) },
		func(s *foundation.Soil) { s.Friction = deg(55) },
		func(s *foundation.Soil) { s.Cohesion = -1 },
		func(s *foundation.Soil) { s.Interface = 1.5 },
		func(s *foundation.Soil) { s.Submerged = 20 * kNm3 },
		func(s *foundation.Soil) { s.UnitWeight = 9 * kNm3 }, // lighter than water, no submerged value
		func(s *foundation.Soil) { s.Allowable = units.Pressure(math.Inf(1)) },
		func(s *foundation.Soil) { s.GroutBond = -1 },
		func(s *foundation.Soil) { s.Undrained = -20e3 },
		func(s *foundation.Soil) { s.Submerged = 19 * kNm3 },                  // γ' > γ
		func(s *foundation.Soil) { s.IsRock, s.Undrained = true, 50e3 },       // rock has no c_u
		func(s *foundation.Soil) { s.RockStrength = 30e6 },                    // rock data on soil
		func(s *foundation.Soil) { s.Friction = 0 },                           // no strength at all
		func(s *foundation.Soil) { s.Undrained = units.Pressure(math.NaN()) }, // not a number
	}
	for i, f := range bad {
		s := good
		f(&s)
		err := s.Validate()
		var ie *foundation.InputError
		if !errors.Is(err, foundation.ErrInvalid) || !errors.As(err, &ie) || !strings.HasPrefix(ie.Field, "Soil.") {
			t.Errorf("case %d: %v", i, err)
		}
	}
}
