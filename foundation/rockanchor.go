package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Defaults of RockAnchor.
const (
	// DefaultGroutBarBond is the ultimate bond stress between cement grout
	// and a deformed steel bar, 2.0 MPa (from memory: a cautious value for
	// grout of about 30 MPa).
	DefaultGroutBarBond = 2.0 * units.Megapascal
	// DefaultConeAngle is the half-angle of the rock cone lifted by an
	// anchor, 30° from the anchor's axis (from memory; 45° is also used
	// in sound rock).
	DefaultConeAngle = 30 * units.Degree
)

// RockAnchor is one or more grouted steel bars drilled into rock along the
// backstay's line, sharing its pull equally.
type RockAnchor struct {
	// Count is the number of bars; zero → 1.
	Count int
	// BarDiameter and YieldStrength of each bar.
	BarDiameter   units.Length
	YieldStrength units.Pressure
	// HoleDiameter is the drilled (grouted) hole's diameter.
	HoleDiameter units.Length
	// BondLength is the grouted length in rock; FreeLength is the length
	// from the rock surface to the start of the bond length.
	BondLength, FreeLength units.Length
	// GroutBarBond is the ultimate grout-to-bar bond; zero → DefaultGroutBarBond.
	GroutBarBond units.Pressure
	// ConeAngle is the half-angle of the uplift cone; zero → DefaultConeAngle.
	ConeAngle units.Angle
	// VariableShare is the fraction of the pull due to variable actions
	// (0 to 1), used only by the partial-factor basis.
	VariableShare float64
}

func (r RockAnchor) validate() error {
	if r.Count < 0 {
		return invalid("RockAnchor.Count", "must not be negative")
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"RockAnchor.BarDiameter", float64(r.BarDiameter)}, {"RockAnchor.YieldStrength", float64(r.YieldStrength)},
		{"RockAnchor.HoleDiameter", float64(r.HoleDiameter)}, {"RockAnchor.BondLength", float64(r.BondLength)}} {
		if err := positive(f.name, f.v); err != nil {
			return err
		}
	}
	if r.HoleDiameter <= r.BarDiameter {
		return invalid("RockAnchor.HoleDiameter", "must exceed the bar diameter")
	}
	if err := nonNegative("RockAnchor.FreeLength", float64(r.FreeLength)); err != nil {
		return err
	}
	if err := nonNegative("RockAnchor.GroutBarBond", float64(r.GroutBarBond)); err != nil {
		return err
	}
	if !(r.ConeAngle >= 0 && r.ConeAngle < 80*units.Degree) {
		return invalid("RockAnchor.ConeAngle", "must be between 0 and 80 deg (zero for the default)")
	}
	return fraction("RockAnchor.VariableShare", r.VariableShare)
}

// Check verifies the rock anchor under a backstay pull at angle above
// horizontal on rock s, with result IDs (per bar):
//
//	anchor.rock.steel      T = pull/n  against  fy π d²/4
//	anchor.rock.groutbar   T  against  π d  Lb τ_grout-bar
//	anchor.rock.groutrock  T  against  π D  Lb τ_grout-rock   (τ = Soil.GroutBond)
//	anchor.rock.cone       T sin α  against  γ (π/3) h³ tan²ψ,  h = (FreeLength + Lb/2) sin α
//
// (bond and cone forms as in Littlejohn & Bruce, Rock anchors — state of
// the art, 1977, and BS 8081:1989, from memory; the cone's apex at the
// middle of the bond length, its axis vertical, the rock's shear strength
// ignored, and cones of neighbouring bars assumed not to overlap: space
// bars at least 2h tanψ apart or check the group separately).
//
// Allowable basis: factors Tendon (2.0), Bond (3.0) and Cone (2.0).
// Partial basis: the pull factored by set A1 (γG, γQ by VariableShare);
// steel resistance divided by GammaS, bond resistances by GammaA; the cone
// in EQU. EN 1997-1 expects anchorage resistance from tests: presumed bond
// values deserve caution.
//
// Special cases: a zero pull gives infinite provided factors; a soil with
// no GroutBond, or invalid input, gives an error wrapping ErrInvalid.
func (r RockAnchor) Check(pull units.Force, angle units.Angle, s Soil, b *Basis) ([]check.Result, error) {
	if err := r.validate(); err != nil {
		return nil, err
	}
	if err := nonNegative("pull", float64(pull)); err != nil {
		return nil, err
	}
	if !(angle >= 0 && angle <= math.Pi/2) {
		return nil, invalid("angle", "must be between 0 and 90 deg for a rock anchor")
	}
	if err := s.Validate(); err != nil {
		return nil, err
	}
	if !(s.GroutBond > 0) {
		return nil, invalid("Soil.GroutBond", "must be given (positive) for a rock anchor")
	}
	bs, err := resolveBasis(b)
	if err != nil {
		return nil, err
	}
	n := float64(max(r.Count, 1))
	t := float64(pull) / n
	d, dh, lb := float64(r.BarDiameter), float64(r.HoleDiameter), float64(r.BondLength)
	steel := float64(r.YieldStrength) * math.Pi * d * d / 4
	tauBar := float64(r.GroutBarBond)
	if tauBar == 0 {
		tauBar = float64(DefaultGroutBarBond)
	}
	gBar := math.Pi * d * lb * tauBar
	gRock := math.Pi * dh * lb * float64(s.GroutBond)
	psi := r.ConeAngle
	if psi == 0 {
		psi = DefaultConeAngle
	}
	sinA := math.Sin(float64(angle))
	h := (float64(r.FreeLength) + lb/2) * sinA
	tp := math.Tan(float64(psi))
	cone := float64(s.UnitWeight) * math.Pi / 3 * h * h * h * tp * tp
	v := t * sinA
	notes := fmt.Sprintf("%d bar(s) sharing %v; cone apex depth %v, half-angle %v", int(n), pull, units.Length(h), psi)

	if !bs.PartialFactors {
		tendon, bond, cf := def(bs.Tendon, 2), def(bs.Bond, 3), def(bs.Cone, 2)
		return []check.Result{
			check.Stability("anchor.rock.steel", "Rock anchor bar tension", units.KindForce, t, steel, tendon).
				WithBasis(fsBasis("the bar's yield force (BS 8081 permanent anchors, from memory)", tendon)).WithNote(notes),
			check.Stability("anchor.rock.groutbar", "Rock anchor grout-to-bar bond", units.KindForce, t, gBar, bond).
				WithBasis(fsBasis("ultimate grout-to-bar bond (BS 8081, from memory)", bond)),
			check.Stability("anchor.rock.groutrock", "Rock anchor grout-to-rock bond", units.KindForce, t, gRock, bond).
				WithBasis(fsBasis("ultimate grout-to-rock bond (BS 8081, from memory)", bond)),
			check.Stability("anchor.rock.cone", "Rock cone uplift", units.KindForce, v, cone, cf).
				WithBasis(fsBasis("the weight of the rock cone", cf)).WithNote(notes),
		}, nil
	}
	sh := r.VariableShare
	a1 := bs.geoSets()[0] // DA2, or DA1 combination 1: set A1
	gAct := a1.factorOf(true, sh)
	equ := bs.equSet()
	gS, gA := def(bs.GammaS, 1.15), def(bs.GammaA, 1.1)
	td := gAct * t
	label := fmt.Sprintf("EN 1997-1 Annex A set A1 on actions (factor %.3f); ", gAct)
	return []check.Result{
		check.Stability("anchor.rock.steel", "Rock anchor bar tension", units.KindForce, td, steel/gS, 1).
			WithBasis(label + fmt.Sprintf("steel γS %.2f (EN 1992-1-1, from memory)", gS)).WithNote(notes),
		check.Stability("anchor.rock.groutbar", "Rock anchor grout-to-bar bond", units.KindForce, td, gBar/gA, 1).
			WithBasis(label + fmt.Sprintf("anchorage γa %.2f (EN 1997-1 Table A.12, from memory)", gA)).
			WithNote("EN 1997-1 expects anchorage resistance from tests; presumed bond values deserve caution"),
		check.Stability("anchor.rock.groutrock", "Rock anchor grout-to-rock bond", units.KindForce, td, gRock/gA, 1).
			WithBasis(label + fmt.Sprintf("anchorage γa %.2f (EN 1997-1 Table A.12, from memory)", gA)).
			WithNote("EN 1997-1 expects anchorage resistance from tests; presumed bond values deserve caution"),
		check.Stability("anchor.rock.cone", "Rock cone uplift", units.KindForce, equ.factorOf(true, sh)*v, equ.gGfav*cone, 1).
			WithBasis(equ.label).WithNote(notes),
	}, nil
}

// factorOf returns the factor on a load of which share is variable.
func (s actionSet) factorOf(unfavourable bool, share float64) float64 {
	return (1-share)*s.factor(unfavourable, false) + share*s.factor(unfavourable, true)
}
