package foundation_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

func testRockAnchor() foundation.RockAnchor {
	return foundation.RockAnchor{Count: 2, BarDiameter: 25 * units.Millimetre, YieldStrength: 500 * units.Megapascal,
		HoleDiameter: 75 * units.Millimetre, BondLength: 3, FreeLength: 1}
}

func TestRockAnchorHand(t *testing.T) {
	rock, err := foundation.LookupSoil("weathered rock")
	if err != nil {
		t.Fatal(err)
	}
	// Hand calculation, kN: 200 kN at 30° on two bars, T = 100 per bar.
	// Steel 500·π·25²/4 = 245.44; grout-bar π·0.025·3·2000 = 471.24;
	// grout-rock π·0.075·3·350 = 247.40; cone h = (1 + 1.5) sin30 = 1.25 m,
	// W = 22·π/3·1.25³·tan²30 = 14.998 against V = 50.
	rs, err := testRockAnchor().Check(200*units.Kilonewton, deg(30), rock, nil)
	if err != nil {
		t.Fatal(err)
	}
	noNaN(t, rs)
	steel := 500e3 * math.Pi * 0.025 * 0.025 / 4
	near(t, "steel", byID(t, rs, "anchor.rock.steel").Provided, steel/100, 1e-9)
	near(t, "grout-bar", byID(t, rs, "anchor.rock.groutbar").Provided, math.Pi*0.025*3*2000/100, 1e-9)
	near(t, "grout-rock", byID(t, rs, "anchor.rock.groutrock").Provided, math.Pi*0.075*3*350/100, 1e-9)
	cone := 22 * math.Pi / 3 * math.Pow(1.25, 3) / 3
	near(t, "cone", byID(t, rs, "anchor.rock.cone").Provided, cone/50, 1e-9)
	want := map[string]check.Status{"anchor.rock.steel": check.Pass, "anchor.rock.groutbar": check.Pass,
		"anchor.rock.groutrock": check.Fail, "anchor.rock.cone": check.Fail}
	for id, st := range want {
		if got := byID(t, rs, id).Status; got != st {
			t.Errorf("%s: %v, want %v", id, got, st)
		}
	}
	// Partial: set A1 γG 1.35 (all permanent), γS 1.15, γa 1.1, EQU cone.
	rs, err = testRockAnchor().Check(200*units.Kilonewton, deg(30), rock, &foundation.Basis{PartialFactors: true})
	if err != nil {
		t.Fatal(err)
	}
	near(t, "partial steel", byID(t, rs, "anchor.rock.steel").Provided, steel/1.15/135, 1e-9)
	near(t, "partial grout-rock", byID(t, rs, "anchor.rock.groutrock").Provided, math.Pi*0.075*3*350/1.1/135, 1e-9)
	near(t, "EQU cone", byID(t, rs, "anchor.rock.cone").Provided, 0.9*cone/(1.1*50), 1e-9)
}

func TestRockAnchorConsistency(t *testing.T) {
	rock, _ := foundation.LookupSoil("sound rock")
	rs, err := testRockAnchor().Check(0, deg(30), rock, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range rs {
		if !math.IsInf(r.Provided, 1) {
			t.Errorf("%s: %v with no pull", r.ID, r.Provided)
		}
	}
	// More bars or a longer bond never do worse.
	base, _ := testRockAnchor().Check(300e3, deg(40), rock, nil)
	more := testRockAnchor()
	more.Count, more.BondLength = 3, 4
	rs, _ = more.Check(300e3, deg(40), rock, nil)
	for i := range rs {
		if rs[i].Provided < base[i].Provided {
			t.Errorf("%s: %v < %v", rs[i].ID, rs[i].Provided, base[i].Provided)
		}
	}
}

func TestRockAnchorRejects(t *testing.T) {
	rock, _ := foundation.LookupSoil("sound rock")
	sand, _ := foundation.LookupSoil("dense sand")
	ra := testRockAnchor()
	if _, err := ra.Check(100e3, deg(30), sand, nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("no grout bond: %v", err)
	}
	if _, err := ra.Check(100e3, deg(-10), rock, nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("negative angle: %v", err)
	}
	if _, err := ra.Check(units.Force(math.NaN()), deg(30), rock, nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("NaN pull: %v", err)
	}
	bad := ra
	bad.HoleDiameter = 20 * units.Millimetre
	if _, err := bad.Check(100e3, deg(30), rock, nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("hole smaller than bar: %v", err)
	}
	bad = ra
	bad.Count = -1
	if _, err := bad.Check(100e3, deg(30), rock, nil); !errors.Is(err, foundation.ErrInvalid) {
		t.Errorf("negative count: %v", err)
	}
}
