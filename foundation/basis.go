package foundation

import (
	"fmt"
	"math"
)

// Approach is an EN 1997-1 design approach for GEO checks (sliding,
// bearing, deadman pull-out).
type Approach int

const (
	// DesignApproach2 is A1 + M1 + R2 (the default).
	DesignApproach2 Approach = iota
	// DesignApproach1 checks combination 1 (A1 + M1 + R1) and combination 2
	// (A2 + M2 + R1) and reports the worse.
	DesignApproach1
)

// Basis is the verification basis shared by the anchor and footing checks.
// A nil *Basis means the allowable basis with every default. Zero fields
// take the defaults stated beside them.
type Basis struct {
	// PartialFactors selects EN 1997-1 partial factors; false selects
	// allowable stresses with global factors of safety.
	PartialFactors bool

	// Global factors of safety (allowable basis), common practice:
	Sliding     float64 // 0 → 1.5
	Overturning float64 // 0 → 2.0 for footings, 1.5 for anchor blocks (common for anchors)
	Uplift      float64 // 0 → 1.5
	Bearing     float64 // 0 → 3.0 on the ultimate bearing pressure
	Pullout     float64 // 0 → 2.0 on a deadman's ultimate horizontal resistance
	Tendon      float64 // 0 → 2.0 on a rock-anchor bar's yield force (from memory, BS 8081 permanent anchors)
	Bond        float64 // 0 → 3.0 on ultimate grout bond (from memory, BS 8081 permanent anchors)
	Cone        float64 // 0 → 2.0 on the weight of a rock-anchor's uplift cone
	Steel       float64 // 0 → 1.67 on the yield resistance of steel in the ground (AISC 360-16 D2(a) ASD Ω_t for yielding)
	Rupture     float64 // 0 → 2.00 on the ultimate (rupture) resistance of a thread in the ground (AISC 360-16 D2(b) and J3.6 ASD Ω)
	Rope        float64 // 0 → 3.0 on a rope's breaking force at its termination or loop (common practice)

	// Partial factors (EN 1997-1:2004 Annex A; zero → recommended value):
	Approach  Approach
	GammaGdst float64 // EQU destabilising permanent, 1.1 (Table A.1)
	GammaGstb float64 // EQU stabilising permanent, 0.9 (Table A.1)
	GammaQdst float64 // EQU destabilising variable, 1.5 (Table A.1)
	GammaG    float64 // GEO set A1 unfavourable permanent, 1.35 (Table A.3)
	GammaQ    float64 // GEO set A1 unfavourable variable, 1.5 (Table A.3)
	GammaGA2  float64 // GEO set A2 unfavourable permanent, 1.0 (Table A.3)
	GammaQA2  float64 // GEO set A2 unfavourable variable, 1.3 (Table A.3)
	GammaPhi  float64 // set M2 on tan φ', 1.25 (Tables A.2, A.4); EQU and DA1 combination 2
	GammaC    float64 // set M2 on c', 1.25 (Tables A.2, A.4)
	GammaCu   float64 // set M2 on cu (soil with zero friction angle), 1.4 (Tables A.2, A.4)
	GammaRh   float64 // sliding resistance: R2 1.1 (DA2), R1 1.0 (DA1) (Table A.5)
	GammaRv   float64 // bearing resistance: R2 1.4 (DA2), R1 1.0 (DA1) (Table A.5)
	GammaRe   float64 // earth resistance: R2 1.4 (DA2), R1 1.0 (DA1) (Table A.13, from memory)
	GammaA    float64 // anchorage (grout bond) resistance, 1.1 (Table A.12, from memory)
	GammaS    float64 // steel bar yield, 1.15 (EN 1992-1-1 Table 2.1N, from memory)
	GammaM0   float64 // steel sections and rods, 1.0 (EN 1993-1-1 6.1, recommended)
	GammaM2   float64 // threads and plates in tension, 1.25 (EN 1993-1-8 Table 2.1, recommended)
	GammaRope float64 // rope resistance γR, 0.90 (EN 1993-1-11 6.2, from memory)

	// Terse leaves out the basis and note text and the named values of the
	// anchor-block and footing results, for callers that only score designs
	// (a design search); every demand, capacity and ratio is the same.
	// Default false.
	Terse bool
}

// def returns x, or d when x is zero.
func def(x, d float64) float64 {
	if x == 0 {
		return d
	}
	return x
}

// resolve returns the basis with nil replaced and checks every factor.
func resolveBasis(b *Basis) (Basis, error) {
	var r Basis
	if b != nil {
		r = *b
	}
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"Sliding", r.Sliding}, {"Overturning", r.Overturning}, {"Uplift", r.Uplift}, {"Bearing", r.Bearing},
		{"Pullout", r.Pullout}, {"Tendon", r.Tendon}, {"Bond", r.Bond}, {"Cone", r.Cone}, {"Steel", r.Steel}, {"Rupture", r.Rupture},
		{"Rope", r.Rope},
	} {
		if !(f.v == 0 || f.v >= 1) || math.IsInf(f.v, 0) {
			return Basis{}, invalid("Basis."+f.name, "must be zero (default) or a finite factor of at least 1")
		}
	}
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"GammaGdst", r.GammaGdst}, {"GammaGstb", r.GammaGstb}, {"GammaQdst", r.GammaQdst},
		{"GammaG", r.GammaG}, {"GammaQ", r.GammaQ}, {"GammaGA2", r.GammaGA2}, {"GammaQA2", r.GammaQA2},
		{"GammaPhi", r.GammaPhi}, {"GammaC", r.GammaC}, {"GammaCu", r.GammaCu}, {"GammaRh", r.GammaRh}, {"GammaRv", r.GammaRv},
		{"GammaRe", r.GammaRe}, {"GammaA", r.GammaA}, {"GammaS", r.GammaS}, {"GammaM0", r.GammaM0}, {"GammaM2", r.GammaM2}, {"GammaRope", r.GammaRope},
	} {
		if !(f.v >= 0) || math.IsInf(f.v, 0) { // the field's name is built only on error
			return Basis{}, nonNegative("Basis."+f.name, f.v)
		}
	}
	if r.Approach != DesignApproach1 && r.Approach != DesignApproach2 {
		return Basis{}, invalid("Basis.Approach", fmt.Sprintf("%d is not a known design approach", int(r.Approach)))
	}
	return r, nil
}

// actionSet is one set of partial factors on actions, materials and
// resistances, as applied in one check.
type actionSet struct {
	label         string
	terse         bool    // no basis or note text (Basis.Terse)
	gG, gGfav, gQ float64 // unfavourable permanent, favourable permanent, unfavourable variable
	gPhi, gC, gCu float64
	gRh, gRv, gRe float64
	allowable     bool
}

// factor returns the partial factor of an action: unfavourable or
// favourable, permanent or variable (a favourable variable action is
// left out, factor 0).
func (s actionSet) factor(unfavourable, variable bool) float64 {
	switch {
	case s.allowable:
		return 1 // the allowable basis takes every action as it is
	case unfavourable && variable:
		return s.gQ
	case unfavourable:
		return s.gG
	case variable:
		return 0
	default:
		return s.gGfav
	}
}

// equSet returns the EQU set (overturning, uplift): M2 on soil strength.
func (b Basis) equSet() actionSet {
	set := actionSet{
		terse: b.Terse,
		gG:    def(b.GammaGdst, 1.1), gGfav: def(b.GammaGstb, 0.9), gQ: def(b.GammaQdst, 1.5),
		gPhi: def(b.GammaPhi, 1.25), gC: def(b.GammaC, 1.25), gCu: def(b.GammaCu, 1.4), gRh: 1, gRv: 1, gRe: 1,
	}
	if !b.Terse {
		set.label = fmt.Sprintf("EN 1997-1 Annex A, EQU (γG,dst %.2f, γG,stb %.2f, γQ,dst %.2f; M2 γφ' %.2f, γc' %.2f)",
			set.gG, set.gGfav, set.gQ, set.gPhi, set.gC)
	}
	return set
}

// geoSets returns the GEO sets of the chosen design approach.
func (b Basis) geoSets() []actionSet {
	sets := b.geoSetsLabelled()
	for i := range sets {
		sets[i].terse = b.Terse
	}
	return sets
}

func (b Basis) geoSetsLabelled() []actionSet {
	label := func(format string, args ...any) string {
		if b.Terse {
			return "" // the design search's inner loop: no text
		}
		return fmt.Sprintf(format, args...)
	}
	if b.Approach == DesignApproach1 {
		rh, rv, re := def(b.GammaRh, 1), def(b.GammaRv, 1), def(b.GammaRe, 1)
		g1, q1 := def(b.GammaG, 1.35), def(b.GammaQ, 1.5)
		g2, q2 := def(b.GammaGA2, 1.0), def(b.GammaQA2, 1.3)
		p, c := def(b.GammaPhi, 1.25), def(b.GammaC, 1.25)
		return []actionSet{
			{label: label("EN 1997-1 Annex A, DA1 combination 1 (A1 γG %.2f, γQ %.2f; M1; R1 γR,h %.2f, γR,v %.2f, γR,e %.2f)", g1, q1, rh, rv, re),
				gG: g1, gGfav: 1, gQ: q1, gPhi: 1, gC: 1, gCu: 1, gRh: rh, gRv: rv, gRe: re},
			{label: label("EN 1997-1 Annex A, DA1 combination 2 (A2 γG %.2f, γQ %.2f; M2 γφ' %.2f, γc' %.2f; R1)", g2, q2, p, c),
				gG: g2, gGfav: 1, gQ: q2, gPhi: p, gC: c, gCu: def(b.GammaCu, 1.4), gRh: rh, gRv: rv, gRe: re},
		}
	}
	g, q := def(b.GammaG, 1.35), def(b.GammaQ, 1.5)
	rh, rv, re := def(b.GammaRh, 1.1), def(b.GammaRv, 1.4), def(b.GammaRe, 1.4)
	return []actionSet{{
		label: label("EN 1997-1 Annex A, DA2 (A1 γG %.2f, γQ %.2f; M1; R2 γR,h %.2f, γR,v %.2f, γR,e %.2f)", g, q, rh, rv, re),
		gG:    g, gGfav: 1, gQ: q, gPhi: 1, gC: 1, gCu: 1, gRh: rh, gRv: rv, gRe: re,
	}}
}

// allowableSet returns unit factors for the allowable basis: actions and
// strengths characteristic.
func (b Basis) allowableSet() actionSet {
	return actionSet{gG: 1, gGfav: 1, gQ: 1, gPhi: 1, gC: 1, gCu: 1, gRh: 1, gRv: 1, gRe: 1, allowable: true, terse: b.Terse}
}

// fsBasis describes a global factor of safety.
func fsBasis(what string, fs float64) string {
	return fmt.Sprintf("allowable basis: global factor of safety %.2f on %s (common practice)", fs, what)
}
