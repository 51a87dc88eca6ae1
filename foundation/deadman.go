package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// TengK0 is the earth-pressure coefficient at rest in Teng's end-effect
// term for short deadmen, 0.4 (Teng, Foundation Design, 1962, from memory).
const TengK0 = 0.4

// Deadman is a buried horizontal beam or plate, its long side across the
// pull, resisting the backstays by the passive resistance of the soil in
// front of it. Frame as for AnchorBlock: x toward the tower, z up.
type Deadman struct {
	// Length is across the pull; Height is the vertical face pulled
	// against the soil; Thickness is along the pull.
	Length, Height, Thickness units.Length
	// Depth is the depth of the bottom of the face below ground; the top
	// of the face is at Depth − Height, which must not be negative.
	Depth units.Length
	// UnitWeight of the deadman; zero → ConcreteUnitWeight (24 kN/m³).
	UnitWeight units.UnitWeight
	// EndEffects adds Teng's term for the soil wedges at the ends of a
	// short deadman (only near the surface, Height ≥ Depth/2).
	EndEffects bool
}

func (d Deadman) validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"Deadman.Length", float64(d.Length)}, {"Deadman.Height", float64(d.Height)}, {"Deadman.Thickness", float64(d.Thickness)}, {"Deadman.Depth", float64(d.Depth)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if d.Height > d.Depth {
		return invalid("Deadman.Height", "must not exceed Depth: a deadman is buried")
	}
	return nonNegative("Deadman.UnitWeight", float64(d.UnitWeight))
}

// Resistance returns the ultimate horizontal resistance of the deadman in
// soil s (Teng, Foundation Design, 1962, from memory; also in Das,
// Principles of Foundation Engineering, ch. on anchor plates):
//
//	near the surface (Height ≥ Depth/2): T = Length (Pp − Pa) over 0 … Depth
//	   + with EndEffects: ⅓ K0 γ (√Kp + √Ka) Depth³ tan φ
//	deeper: the larger of Length (Pp − Pa) over the face only and the
//	   near-surface value at Depth = 2·Height
//
// with Rankine coefficients for level ground and Bell's cohesion terms, the
// active side's tension cut off. The deeper form is this package's cautious
// choice (a deeper deadman is never taken as weaker than a shallower one);
// deep anchors have larger capacities by other methods. The second return
// value tells which form was used.
func (d Deadman) Resistance(s Soil) (units.Force, string, error) {
	if err := d.validate(); err != nil {
		return 0, "", err
	}
	if err := s.Validate(); err != nil {
		return 0, "", err
	}
	if d.Height >= d.Depth/2 {
		t, err := d.teng(s, d.Depth)
		how := "Teng's continuous anchor near the surface (from memory)"
		if d.EndEffects {
			how += ", with end effects"
		}
		return t, how, err
	}
	face, err := d.passiveLessActive(s, d.Depth-d.Height, d.Depth)
	if err != nil {
		return 0, "", err
	}
	shallow, err := d.teng(s, 2*d.Height)
	if err != nil {
		return 0, "", err
	}
	if face >= shallow {
		return face, "deep deadman: passive less active on the face only (cautious)", nil
	}
	return shallow, "deep deadman: Teng's value at depth 2·Height (cautious)", nil
}

// passiveLessActive returns Length (Pp − Pa) between depths top and bottom.
func (d Deadman) passiveLessActive(s Soil, top, bottom units.Length) (units.Force, error) {
	kp, ka := rankineLevel(s.Friction, true), rankineLevel(s.Friction, false)
	pp, err := EarthPressureForce(kp, s.UnitWeight, s.Cohesion, top, bottom, 1)
	if err != nil {
		return 0, err
	}
	pa, err := EarthPressureForce(ka, s.UnitWeight, s.Cohesion, top, bottom, -1)
	if err != nil {
		return 0, err
	}
	return units.Force(float64(d.Length) * float64(pp.Force-pa.Force)), nil
}

// teng returns Teng's near-surface resistance for a face reaching depth h.
func (d Deadman) teng(s Soil, h units.Length) (units.Force, error) {
	t, err := d.passiveLessActive(s, 0, h)
	if err != nil || !d.EndEffects {
		return t, err
	}
	kp, ka := rankineLevel(s.Friction, true), rankineLevel(s.Friction, false)
	hh := float64(h)
	t += units.Force(TengK0 * float64(s.UnitWeight) * (math.Sqrt(kp) + math.Sqrt(ka)) * hh * hh * hh * math.Tan(float64(s.Friction)) / 3)
	return t, nil
}

// Check verifies the deadman against the pulls, with result IDs
// "anchor.deadman.pullout" (the horizontal components against the
// ultimate resistance, see Resistance) and "anchor.deadman.uplift" (the
// vertical components against the weight of the deadman and of the
// vertical soil prism above it, shear on the prism's sides ignored, common
// practice). The attachment points X, Z of the pulls are not used.
//
// Allowable basis: factors Pullout (2.0) and Uplift (1.5). Partial basis:
// pull-out in GEO by the design approach, resistance divided by γR,e;
// uplift in EQU. Special cases and errors as AnchorBlock.Check.
func (d Deadman) Check(pulls []Pull, s Soil, b *Basis) ([]check.Result, error) {
	if err := d.validate(); err != nil {
		return nil, err
	}
	if err := s.Validate(); err != nil {
		return nil, err
	}
	if err := validatePulls(pulls, false); err != nil {
		return nil, err
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	gd := float64(d.UnitWeight)
	if gd == 0 {
		gd = float64(ConcreteUnitWeight)
	}
	plan := float64(d.Length) * float64(d.Thickness)
	weight := gd*plan*float64(d.Height) + float64(s.UnitWeight)*plan*float64(d.Depth-d.Height)

	pullout := func(set actionSet, fs float64) (check.Result, error) {
		sd := s.factored(set)
		t, how, err := d.Resistance(sd)
		if err != nil {
			return check.Result{}, err
		}
		var fx float64
		for _, p := range pulls {
			x, _ := p.components()
			fx += set.factor(x > 0, p.Variable) * x
		}
		return check.Stability("anchor.deadman.pullout", "Deadman pull-out through the soil", units.KindForce,
			fx, float64(t)/set.gRe, fs).
			WithBasis(basisOf(set, "the ultimate passive minus active resistance", fs)).
			WithNote(fmt.Sprintf("ultimate resistance %v: %s", t, how)), nil
	}
	uplift := func(set actionSet, fs float64) check.Result {
		var dst, stb float64
		for _, p := range pulls {
			_, z := p.components()
			if z > 0 {
				dst += set.factor(true, p.Variable) * z
			} else {
				stb -= set.factor(false, p.Variable) * z
			}
		}
		stb += set.gGfav * weight
		return check.Stability("anchor.deadman.uplift", "Deadman uplift", units.KindForce, dst, stb, fs).
			WithBasis(basisOf(set, "the weight of the deadman and the soil above it", fs)).
			WithNote("vertical soil prism above the deadman; shear on its sides ignored")
	}

	if !bs.PartialFactors {
		set := bs.allowableSet()
		po, err := pullout(set, def(bs.Pullout, 2))
		if err != nil {
			return nil, err
		}
		return []check.Result{po, uplift(set, def(bs.Uplift, 1.5))}, nil
	}
	var po check.Result
	for i, set := range bs.geoSets() {
		r, err := pullout(set, 1)
		if err != nil {
			return nil, err
		}
		if i == 0 || r.Ratio > po.Ratio {
			po = r
		}
	}
	return []check.Result{po, uplift(bs.equSet(), 1)}, nil
}
