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
