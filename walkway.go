package sagspan

import (
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// defaultGradientLimit is the steepest walkway gradient accepted when the
// description gives none: 1:2.5 (21.8°), under the characteristic crowd on
// its worst loaded length. It is this library's judgement of the steepest a
// walkway with cleated planks that follows the ropes is walked safely by a
// dense crowd, not a published rule: give the limit the bridge's users
// need (1:12 is the usual ramp limit for wheelchairs, common practice).
const defaultGradientLimit = 0.4

// gradientLimit returns the walkway's gradient limit.
func (b Bridge) gradientLimit() float64 {
	if b.Walkway.GradientLimit != nil {
		return *b.Walkway.GradientLimit
	}
	return defaultGradientLimit
}

const gradientBasis = "steepest slope of the walkway ropes, at a saddle, under characteristic loads " +
	"(a rope under downward load is steepest at its ends); in wind the slope in the swung plane is taken as vertical, " +
	"which is conservative; limit from the description, else 1:2.5 (this library's judgement, not a published rule)"

// checkGradient adds the walkway gradient check of a persistent case: the
// steepest slope of any walkway-rope group, which for a rope under a load
// that nowhere pulls up is at one of its ends:
//
//	z'(x) = h/L − Q(x)/H, monotone in x, so max |z'| = max(tan α_A, tan α_B)
//
// with α the support angles below horizontal (the general cable theorem).
func (m *model) checkGradient(out sink, cs CaseState) {
	worst, at := -1.0, Left
	for i, g := range m.groups {
		if g.Role != RoleWalkway {
			continue
		}
		for side := Left; side <= Right; side++ {
			if s := math.Abs(math.Tan(float64(cs.Groups[i].Angle[side]))); s > worst {
				worst, at = s, side
			}
		}
	}
	if worst < 0 {
		return
	}
	limit := m.b.gradientLimit()
	r := check.Compare("walkway.gradient", "Walkway gradient", units.KindRatio, worst, limit).
		For("walkway", cs.Case.Name).
		WithBasis(gradientBasis).
		WithValues(
			check.Of("i", "steepest gradient, rise over run", units.Ratio(worst)),
			check.Of("α", "its angle", units.Angle(math.Atan(worst))),
			check.Of("x", "where, from the left saddle", units.Length(float64(at)*float64(m.b.Site.Span))),
			check.Of("i_lim", "gradient limit", units.Ratio(limit)),
		)
	out.add(r)
}

// Equilibrium factors of the uplift check, EN 1990 Table A2.4(A) for
// bridges (from memory): γG,inf 0.95 on the permanent load that holds the
// walkway down, γQ 1.5 on the wind that lifts it.
const (
	upliftGammaGInf = 0.95
	upliftGammaQ    = 1.5
)

const upliftBasis = "static equilibrium of the walkway under the wind's upward force c_f,z q_p b (EN 1991-1-4 8.3.3, from memory): " +
	"the permanent weight of the walkway and its ropes (the walkway's per metre of walkway, its slope not counted: cautious) must hold it down with the EQU factors of EN 1990 Table A2.4(A) for bridges, " +
	"γG,inf 0.95 and γQ 1.5 (from memory); where it does not, the check fails; where the net load itself points up, the walkway lifts and " +
	"the case's rope, tower and foundation checks are not made at all (a note says so): " +
	"hold the walkway down (storm ropes, a heavier deck) or give a smaller lift coefficient for an open deck (loads.walkway_lift)"

// upliftCheck returns the check that the permanent weight of the walkway
// groups holds them down against the wind's upward force in case lc, and
// whether the walkway lifts (some group's net vertical load, characteristic
// or design, is upward or nil, so that no rope state exists).
func (m *model) upliftCheck(lc LoadCase) (check.Result, bool) {
	var g0, lift float64
	lifted := false
	for _, g := range m.groups {
		if g.share == 0 {
			continue
		}
		gk := float64(g.self + units.LoadPerLength(g.share)*m.dead)
		lk := lc.Wind * g.share * float64(m.b.lift())
		if g.Role == RoleWalkway {
			g0, lift = g0+gk, lift+lk
		}
		for _, f := range []LoadCase{m.characteristic(lc), m.designCase(lc)} {
			if f.GammaG*gk-f.GammaW*lk <= 0 {
				lifted = true
			}
		}
	}
	r := check.Stability("walkway.uplift", "Walkway held down against wind lift", units.KindLoadPerLength,
		lift, g0, upliftGammaQ/upliftGammaGInf).
		For("walkway", lc.Name).
		WithBasis(upliftBasis).
		WithValues(
			check.Of("G_k", "permanent weight per metre of the walkway and its ropes", units.LoadPerLength(g0)),
			check.Of("L_k", "upward wind force per metre on the walkway, ψ c_f,z q_p b", units.LoadPerLength(lift)),
			check.Of("γ_G,inf", "factor on the permanent weight", units.Ratio(upliftGammaGInf)),
			check.Of("γ_Q", "factor on the wind", units.Ratio(upliftGammaQ)),
		)
	if lifted {
		r = r.WithNote("the wind lifts the walkway in this case (its net load points up, characteristic or factored): its rope states are not analysed, " +
			"so the case's rope, tower and foundation checks are missing from this report")
		if r.Status != check.Fail {
			r.Status, r.Ratio = check.Fail, math.Max(r.Ratio, 1+1e-9)
		}
	}
	return r, lifted
}
