package cable

import (
	"math"
	"strconv"
	"strings"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// TensionBasis is a verification basis for rope tension: GlobalFactor or
// PartialFactor. It is sealed: only this package implements it.
type TensionBasis interface {
	// resistance returns the design resistance of one rope, the basis
	// text, notes, and the efficiency and factor it applied.
	resistance(r Rope) (resistance, error)
}

// resistance is one rope's design resistance and how it was found.
type resistance struct {
	r      float64 // design resistance of one rope, N
	ke     float64 // termination efficiency applied
	factor float64 // the global factor, or γ_R
	basis  string
	notes  []string
	values []check.Value // the basis's own terms
}

// DefaultGlobalFactor is the factor of safety on the minimum breaking force
// (reduced by the termination efficiency) that GlobalFactor uses when its
// Factor is zero: 3.0, the upper end of the 2.2–3 used in allowable-stress
// practice for structural ropes (common practice, from memory). Footbridge
// main ropes are rarely inspected, hence the upper end.
const DefaultGlobalFactor = 3.0

// Defaults of PartialFactor, EN 1993-1-11:2006 cl. 6.2 (from memory,
// not confirmed), and of the termination efficiency on both bases.
const (
	// DefaultGammaR is the recommended partial factor γ_R on rope resistance.
	DefaultGammaR = 0.90
	// DefaultKe is the termination efficiency k_e assumed when none is
	// given: 0.80, that of wire rope grips (clips), the least efficient of
	// the terminations TerminationEfficiency knows and a common one on
	// rural footbridges (from memory): the cautious choice when the
	// termination is not known. Set Ke for the termination actually used
	// (a ferrule-secured eye 0.90, a socket 1.0).
	DefaultKe = 0.80
)

// TerminationEfficiency returns the efficiency k_e of a rope termination
// by name, and false for a name it does not know (from memory, the
// EN 13411 family and rope makers' data; common practice):
//
//	"clips"    wire rope grips (U-bolt clips)           0.80  ("grips" too)
//	"ferrule"  ferrule-secured (swaged) eye             0.90
//	"socket"   swaged socket or poured (resin, spelter)  1.00
func TerminationEfficiency(name string) (float64, bool) {
	switch strings.ToLower(strings.TrimSpace(name)) {
	case "clips", "grips":
		return 0.80, true
	case "ferrule":
		return 0.90, true
	case "socket":
		return 1.00, true
	}
	return 0, false
}

// Terminations lists the names TerminationEfficiency knows.
func Terminations() []string { return []string{"clips", "grips", "ferrule", "socket"} }

// efficiency returns k_e, or DefaultKe with a note when it is zero.
func efficiency(ke float64) (float64, []string, error) {
	var notes []string
	if ke == 0 {
		ke = DefaultKe
		notes = append(notes, "default termination efficiency k_e "+strconv.FormatFloat(ke, 'f', 2, 64)+", that of wire rope grips, the least of the usual terminations (cautious): set it for the termination used")
	}
	if !finite(ke) || ke <= 0 || ke > 1 {
		return 0, nil, invalidf("termination efficiency k_e must be in (0, 1], got %g", ke)
	}
	return ke, notes, nil
}

// GlobalFactor is the allowable-stress basis: each rope may carry
// k_e MBF/Factor, with k_e the efficiency of its terminations. Factor zero
// means DefaultGlobalFactor, Ke zero DefaultKe. The tension checked is the
// unfactored (service) tension.
type GlobalFactor struct{ Factor, Ke float64 }

func (g GlobalFactor) resistance(r Rope) (resistance, error) {
	f := g.Factor
	ke, notes, err := efficiency(g.Ke)
	if err != nil {
		return resistance{}, err
	}
	if f == 0 {
		f = DefaultGlobalFactor
		notes = append(notes, "default factor of safety "+strconv.FormatFloat(f, 'g', 2, 64)+" on MBF (common practice)")
	}
	if !finite(f) || f < 1 {
		return resistance{}, invalidf("global factor of safety must be finite and at least 1, got %g", f)
	}
	return resistance{r: ke * float64(r.MBF) / f, ke: ke, factor: f, notes: notes,
		basis: "global factor of safety " + strconv.FormatFloat(f, 'g', 3, 64) +
			" on the minimum breaking force reduced by the termination efficiency, R = k_e MBF/γ (common practice)"}, nil
}

// PartialFactor is the limit-state basis of EN 1993-1-11:2006 cl. 6.2
// (from memory):
//
//	F_Rd = min(F_uk/(1.5 γ_R), F_k/γ_R),  F_uk = k_e F_min
//
// with F_k the characteristic 0.2 % proof force of the rope. F_k is rarely
// published for stranded ropes; where it is not given (Proof zero) the
// second criterion is not applied, which is unconservative only for a rope
// whose proof force lies below 2/3 of k_e F_min: the result says so. The
// tension checked must be the design value F_Ed (factored loads). Zero
// GammaR and Ke take DefaultGammaR and DefaultKe.
type PartialFactor struct {
	GammaR, Ke float64
	// Proof is the rope's 0.2 % proof force F_k as a fraction of its
	// minimum breaking force; zero means not known (not applied).
	Proof float64
}

func (p PartialFactor) resistance(r Rope) (resistance, error) {
	g := p.GammaR
	ke, notes, err := efficiency(p.Ke)
	if err != nil {
		return resistance{}, err
	}
	if g == 0 {
		g = DefaultGammaR
		notes = append(notes, "default γ_R "+strconv.FormatFloat(g, 'f', 2, 64)+" (EN 1993-1-11 recommended value, from memory)")
	}
	if !finite(g) || g <= 0 {
		return resistance{}, invalidf("partial factor γ_R must be positive and finite, got %g", g)
	}
	if !finite(p.Proof) || p.Proof < 0 || p.Proof > 1 {
		return resistance{}, invalidf("proof force F_k must be a fraction of the minimum breaking force in [0, 1], got %g", p.Proof)
	}
	fuk := ke * float64(r.MBF)
	res := resistance{r: fuk / (1.5 * g), ke: ke, factor: g, notes: notes,
		values: []check.Value{check.Of("F_uk", "characteristic breaking force with the termination, k_e MBF", units.Force(fuk))}}
	if p.Proof > 0 {
		fk := p.Proof * float64(r.MBF)
		res.r = math.Min(res.r, fk/g)
		res.values = append(res.values, check.Of("F_k", "characteristic 0.2 % proof force", units.Force(fk)))
		res.basis = "EN 1993-1-11:2006 cl. 6.2, F_Rd = min(k_e F_min/(1.5 γ_R), F_k/γ_R) (from memory)"
	} else {
		res.basis = "EN 1993-1-11:2006 cl. 6.2, F_Rd = k_e F_min/(1.5 γ_R) (from memory); the proof-force criterion F_k/γ_R is not applied, F_k not being given " +
			"(it governs only for a rope whose 0.2 % proof force lies below 2/3 of k_e F_min)"
	}
	return res, nil
}

// DefaultSharing is the factor by which the most loaded of two or more
// parallel ropes carries more than an equal share when none is given:
// 1.1. Ropes set to one sag at erection still differ in length, stiffness
// and seating by a few per cent, and the stiffer ropes take more (common
// practice; there is no published value).
const DefaultSharing = 1.1

// Group is Count identical ropes side by side that carry one tension
// between them; the most loaded carries Sharing times an equal share.
// Sharing zero means DefaultSharing for two ropes or more and 1 for one
// rope; a Sharing below 1 is invalid.
type Group struct {
	Rope    Rope
	Count   int
	Sharing float64
	// Terse leaves the values, basis and notes out of TensionCheck's
	// result, for a caller that reads its ratio and status only (a
	// search); the numbers are the same.
	Terse bool
}

// TensionCheck checks the group carrying tension t on the given basis
// (nil means GlobalFactor{}):
//
//	demand   = k_s t / n          (the most loaded rope)
//	capacity = R                  (one rope: k_e MBF/γ, or k_e MBF/(1.5 γ_R))
//
// Result ID "cable.tension"; values T, n, k_s, T_1 (the demand), MBF, k_e,
// the factor (γ or γ_R) and the factor on MBF the most loaded rope has.
func (g Group) TensionCheck(t units.Force, basis TensionBasis) (check.Result, error) {
	if !finite(float64(t)) || t < 0 {
		return check.Result{}, invalidf("rope tension must be finite and not negative, got %g", float64(t))
	}
	if g.Count < 1 {
		return check.Result{}, invalidf("number of ropes must be at least 1, got %d", g.Count)
	}
	ks := g.Sharing
	var sharingNote string
	if ks == 0 {
		ks = 1
		if g.Count > 1 {
			ks = DefaultSharing
			sharingNote = "default sharing factor " + strconv.FormatFloat(ks, 'f', 2, 64) + " between parallel ropes (common practice)"
		}
	}
	if !finite(ks) || ks < 1 || ks > float64(g.Count) {
		return check.Result{}, invalidf("sharing factor must lie between 1 and the number of ropes %d, got %g", g.Count, ks)
	}
	if err := g.Rope.Validate(); err != nil {
		return check.Result{}, err
	}
	if basis == nil {
		basis = GlobalFactor{}
	}
	res, err := basis.resistance(g.Rope)
	if err != nil {
		return check.Result{}, err
	}
	if !finite(res.r) {
		return check.Result{}, errOutOfRange
	}
	one := ks * float64(t) / float64(g.Count)
	fos := math.Inf(1)
	if one > 0 {
		fos = float64(g.Rope.MBF) / one
	}
	if g.Terse {
		return check.Compare("cable.tension", "Rope tension, most loaded rope", units.KindForce, one, res.r), nil
	}
	// The values in one slice on the stack, copied once into the result.
	var buf [16]check.Value
	vals := append(buf[:0],
		check.Of("T", "tension of the group", t),
		check.Of("n", "ropes in the group", units.Ratio(g.Count)),
		check.Of("k_s", "sharing factor of the most loaded rope", units.Ratio(ks)),
		check.Of("T_1", "tension of the most loaded rope, k_s T/n", units.Force(one)),
		check.Of("MBF", "minimum breaking force of one rope", g.Rope.MBF),
		check.Of("k_e", "termination efficiency", units.Ratio(res.ke)),
		check.Of("γ", "factor of the basis (global factor, or γ_R)", units.Ratio(res.factor)),
		check.Of("R", "design resistance of one rope", units.Force(res.r)),
		check.Of("F_MBF", "factor on MBF the most loaded rope has, MBF/T_1", units.Ratio(fos)))
	out := check.Compare("cable.tension", "Rope tension, most loaded rope", units.KindForce, one, res.r).
		WithBasis(res.basis).
		WithValues(append(vals, res.values...)...)
	for _, note := range res.notes {
		out = out.WithNote(note)
	}
	if sharingNote != "" {
		out = out.WithNote(sharingNote)
	}
	return out, nil
}

// TensionCheck compares the tension t carried by n ropes of type r sharing
// it equally with one rope's resistance: Group{r, n, 1}.TensionCheck. A
// nil basis means GlobalFactor{}. Result ID "cable.tension".
func TensionCheck(t units.Force, r Rope, n int, basis TensionBasis) (check.Result, error) {
	return Group{Rope: r, Count: n, Sharing: 1}.TensionCheck(t, basis)
}

// DefaultMinGrooveRatio is the least ratio of saddle groove diameter to
// rope diameter, D/d, used when none is given: 25, the upper end of the
// 20–25 recommended for six-strand ropes of the 6×36 class bent over a
// fixed saddle (common practice, from memory). A smaller groove bends the
// outer wires hard and lowers the rope's strength where it sits.
const DefaultMinGrooveRatio = 25.0

// SaddleRatioCheck checks the groove of a saddle against the rope it
// carries:
//
//	demand   = (D/d)_min · d     (the groove diameter required)
//	capacity = D                 (the groove diameter given)
//
// so the ratio is (D/d)_min/(D/d). min zero means DefaultMinGrooveRatio.
// Result ID "cable.saddle_ratio"; values D/d and the minimum.
func SaddleRatioCheck(groove units.Length, r Rope, min float64) (check.Result, error) {
	if err := positive("saddle groove diameter", float64(groove)); err != nil {
		return check.Result{}, err
	}
	if err := positive("rope diameter", float64(r.Diameter)); err != nil {
		return check.Result{}, err
	}
	note := ""
	if min == 0 {
		min = DefaultMinGrooveRatio
		note = "default least D/d " + strconv.FormatFloat(min, 'g', 3, 64) + " (common practice for six-strand ropes, from memory)"
	}
	if !finite(min) || min < 1 {
		return check.Result{}, invalidf("least groove ratio D/d must be finite and at least 1, got %g", min)
	}
	out := check.Compare("cable.saddle_ratio", "Saddle groove diameter to rope diameter, D/d", units.KindLength,
		min*float64(r.Diameter), float64(groove)).
		WithBasis("groove diameter against the least D/d for the rope's construction (common practice)").
		WithValues(
			check.Of("D", "groove diameter", groove),
			check.Of("d", "rope diameter", r.Diameter),
			check.Of("D/d", "groove to rope diameter ratio provided", units.Ratio(float64(groove)/float64(r.Diameter))),
			check.Of("(D/d)_min", "least ratio", units.Ratio(min)),
		)
	if note != "" {
		out = out.WithNote(note)
	}
	return out, nil
}
