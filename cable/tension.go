package cable

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// TensionBasis is a verification basis for rope tension: GlobalFactor or
// PartialFactor. It is sealed: only this package implements it.
type TensionBasis interface {
	// resistance returns the design resistance of one rope, the basis text
	// and notes.
	resistance(r Rope) (float64, string, []string, error)
}

// DefaultGlobalFactor is the factor of safety on the minimum breaking force
// that GlobalFactor uses when its Factor is zero: 3.0, the upper end of the
// 2.2–3 used in allowable-stress practice for structural ropes (common
// practice, from memory). Footbridge main ropes are usually terminated with
// clips or wedge sockets of less than full efficiency and are rarely
// inspected, hence the upper end.
const DefaultGlobalFactor = 3.0

// GlobalFactor is the allowable-stress basis: each rope may carry
// MBF/Factor. Factor zero means DefaultGlobalFactor. The tension checked is
// the unfactored (service) tension.
type GlobalFactor struct{ Factor float64 }

func (g GlobalFactor) resistance(r Rope) (float64, string, []string, error) {
	f := g.Factor
	var notes []string
	if f == 0 {
		f = DefaultGlobalFactor
		notes = append(notes, fmt.Sprintf("default factor of safety %.2g on MBF (common practice)", f))
	}
	if !finite(f) || f < 1 {
		return 0, "", nil, invalidf("global factor of safety must be finite and at least 1, got %g", f)
	}
	return float64(r.MBF) / f, fmt.Sprintf("global factor of safety %.3g on minimum breaking force (common practice)", f), notes, nil
}

// Defaults of PartialFactor, EN 1993-1-11:2006 cl. 6.2 (from memory,
// not confirmed).
const (
	// DefaultGammaR is the recommended partial factor γ_R on rope resistance.
	DefaultGammaR = 0.90
	// DefaultKe is the termination efficiency k_e assumed when none is
	// given: 0.9, that of a swaged ferrule or good wedge socket (from
	// memory; a poured socket reaches 1.0, wire rope clips less). Set Ke
	// for the termination actually used.
	DefaultKe = 0.90
)

// PartialFactor is the limit-state basis of EN 1993-1-11:2006 cl. 6.2
// (from memory):
//
//	F_Rd = F_uk/(1.5 γ_R),  F_uk = k_e F_min
//
// The second criterion, F_k/γ_R on the 0.2 % proof force F_k, is not
// applied: F_k is not published for stranded ropes and for them the
// F_uk criterion governs. The tension checked must be the design value
// F_Ed (factored loads). Zero fields take DefaultGammaR and DefaultKe.
type PartialFactor struct{ GammaR, Ke float64 }

func (p PartialFactor) resistance(r Rope) (float64, string, []string, error) {
	g, ke := p.GammaR, p.Ke
	var notes []string
	if g == 0 {
		g = DefaultGammaR
		notes = append(notes, fmt.Sprintf("default γ_R %.2f (EN 1993-1-11 recommended value, from memory)", g))
	}
	if ke == 0 {
		ke = DefaultKe
		notes = append(notes, fmt.Sprintf("default termination efficiency k_e %.2f: set it for the termination used", ke))
	}
	if !finite(g) || g <= 0 {
		return 0, "", nil, invalidf("partial factor γ_R must be positive and finite, got %g", g)
	}
	if !finite(ke) || ke <= 0 || ke > 1 {
		return 0, "", nil, invalidf("termination efficiency k_e must be in (0, 1], got %g", ke)
	}
	return ke * float64(r.MBF) / (1.5 * g), "EN 1993-1-11:2006 cl. 6.2, F_Rd = k_e F_min/(1.5 γ_R) (from memory)", notes, nil
}

// TensionCheck compares the tension t carried by a group of n ropes of
// type r, sharing it equally, with the group's resistance:
//
//	demand   = t
//	capacity = n · R,  R = MBF/γ (GlobalFactor) or k_e MBF/(1.5 γ_R) (PartialFactor)
//
// A nil basis means GlobalFactor{}. Result ID "cable.tension".
func TensionCheck(t units.Force, r Rope, n int, basis TensionBasis) (check.Result, error) {
	if !finite(float64(t)) || t < 0 {
		return check.Result{}, invalidf("rope tension must be finite and not negative, got %g", float64(t))
	}
	if n < 1 {
		return check.Result{}, invalidf("number of ropes must be at least 1, got %d", n)
	}
	if err := r.Validate(); err != nil {
		return check.Result{}, err
	}
	if basis == nil {
		basis = GlobalFactor{}
	}
	per, text, notes, err := basis.resistance(r)
	if err != nil {
		return check.Result{}, err
	}
	capacity := float64(n) * per
	if !finite(capacity) {
		return check.Result{}, errOutOfRange
	}
	res := check.Compare("cable.tension", "Rope tension", units.KindForce, float64(t), capacity).WithBasis(text)
	for _, note := range notes {
		res = res.WithNote(note)
	}
	fos := math.Inf(1)
	if t > 0 {
		fos = float64(n) * float64(r.MBF) / float64(t)
	}
	res = res.WithNote(fmt.Sprintf("%d × %s, MBF %v each; factor on MBF provided %.2f", n, r.Name, r.MBF, fos))
	return res, nil
}
