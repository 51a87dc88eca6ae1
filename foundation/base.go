package foundation

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// undrainedSlidingCap is the cap on the undrained sliding resistance of a
// base that water or air can reach, as a fraction of the normal force:
// R ≤ 0.4 V, EN 1997-1:2004 6.5.3(12) (from memory).
const undrainedSlidingCap = 0.4

// baseShear is the sliding resistance of a rectangular base and the
// numbers behind it.
type baseShear struct {
	r      float64 // resistance, before any partial factor on it
	area   float64 // effective area A' (undrained)
	capped bool    // the 0.4 V cap governed (undrained)
}

// shearResistance returns the shear resistance of a base of sides along
// (the load's direction) × across under effective normal force n at
// eccentricities e along and ey across, in strength st:
//
//	drained:   R = N tan δ
//	undrained: R = A' c_u,  A' = (along − 2|e|)·(across − 2|ey|),  R ≤ 0.4 N where
//	           water or air can reach the interface: water at or above the
//	           base, or a gap under the base (outside the kern,
//	           |e|/along + |ey|/across > 1/6)
//
// (EN 1997-1:2004 6.5.3(8), (11) and (12), from memory). No contact (N ≤ 0)
// gives no resistance.
func shearResistance(n, e, ey, along, across float64, st strength, waterAtBase bool) baseShear {
	if n <= 0 {
		return baseShear{}
	}
	if st.cond == Drained {
		return baseShear{r: n * st.tanD}
	}
	eff, effY := along-2*math.Abs(e), across-2*math.Abs(ey)
	if eff <= 0 || effY <= 0 {
		return baseShear{}
	}
	out := baseShear{area: eff * effY}
	out.r = out.area * st.c
	if (waterAtBase || math.Abs(e)/along+math.Abs(ey)/across > 1.0/6) && out.r > undrainedSlidingCap*n {
		out.r, out.capped = undrainedSlidingCap*n, true
	}
	return out
}

// shearValues returns the values and note of a sliding result.
func shearValues(st strength, n float64, bs baseShear) ([]check.Value, string) {
	if st.cond == Drained {
		return []check.Value{
				check.Of("N", "effective normal force on the base", units.Force(n)),
				check.Of("δ", "base friction angle after partial factors", units.Angle(st.delta)),
				check.Of("R_b", "base shear resistance N tan δ", units.Force(bs.r)),
			}, fmt.Sprintf("drained: base friction δ = %v on the effective normal force %v",
				units.Angle(st.delta), units.Force(n))
	}
	note := fmt.Sprintf("undrained: c_u %v over the effective base A' = %v", units.Pressure(st.c), units.Area(bs.area))
	if bs.capped {
		note += "; capped at 0.4 N because water or air can reach the base (EN 1997-1 6.5.3(12)): for an anchor block always, " +
			"the pull opening a gap behind it; for a footing where water stands at or above its base or the resultant leaves the kern"
	}
	return []check.Value{
		check.Of("N", "effective normal force on the base", units.Force(n)),
		check.Of("c_u", "undrained shear strength after partial factors", units.Pressure(st.c)),
		check.Of("A'", "effective base area in compression", units.Area(bs.area)),
		check.Of("R_b", "base shear resistance A'c_u, at most 0.4 N where water or air reach the base", units.Force(bs.r)),
	}, note
}

// conditioned is one result of a condition-dependent check.
type conditioned struct {
	cond Condition
	r    check.Result
}

// governing returns the worst of the results, one per condition checked,
// with the condition that governs stated in its basis and the utilisation
// in each condition among its values ("U_dr", "U_un"). A terse set gets the
// worst result only.
func governing(set actionSet, rs []conditioned) check.Result {
	worst := worstCondition(rs)
	g := rs[worst].r
	if set.terse {
		return g
	}
	if len(rs) == 1 {
		prefix := fmt.Sprintf("%v condition", rs[0].cond)
		if rs[0].cond == Drained {
			prefix += " only (no undrained strength given)"
		}
		if g.Basis != "" {
			prefix += "; " + g.Basis
		}
		return g.WithBasis(prefix)
	}
	var vs []check.Value
	var other []string
	for _, c := range rs {
		sym, mean := "U_dr", "utilisation in the drained (long-term) condition"
		if c.cond == Undrained {
			sym, mean = "U_un", "utilisation in the undrained (short-term) condition"
		}
		vs = append(vs, check.Of(sym, mean, units.Ratio(c.r.Ratio)))
		if c.cond != rs[worst].cond {
			other = append(other, fmt.Sprintf("%v utilisation %.3f", c.cond, c.r.Ratio))
		}
	}
	prefix := fmt.Sprintf("%v condition governs; also checked: %s", rs[worst].cond, strings.Join(other, ", "))
	if g.Basis != "" {
		prefix += "; " + g.Basis
	}
	return g.WithBasis(prefix).WithValues(vs...)
}

// worstCondition returns the index of the result of rs that governing
// reports: the first of the highest ratio.
func worstCondition(rs []conditioned) int {
	worst := 0
	for i := range rs {
		if rs[i].r.Ratio > rs[worst].r.Ratio {
			worst = i
		}
	}
	return worst
}

// note returns r with the note appended, or r as it is on a terse basis.
func (set actionSet) note(r check.Result, note string) check.Result {
	if set.terse {
		return r
	}
	return r.WithNote(note)
}

// values returns r with the values appended, or r as it is on a terse
// basis.
func (set actionSet) values(r check.Result, vs ...check.Value) check.Result {
	if set.terse {
		return r
	}
	return r.WithValues(vs...)
}

// basisOf returns the basis text of a result.
func basisOf(set actionSet, what string, fs float64) string {
	if set.terse {
		return ""
	}
	if set.allowable {
		return fsBasis(what, fs)
	}
	return set.label
}

// bearingBasis returns the basis text of a bearing result on soil.
func bearingBasis(set actionSet, s Soil, m Method, fs float64) string {
	if set.terse {
		return ""
	}
	return fmt.Sprintf("%v; %s", m, basisOf(set, "the ultimate bearing pressure", fs))
}

// baseLoad is the resultant on a rectangular base: effective normal force
// n, horizontal force h along the side along and hy along the side
// across, eccentricities e along and ey across from the centre. biaxial
// marks a base whose load may have both components (a footing): its values
// then give both, and the contact pressure of both eccentricities.
type baseLoad struct {
	n, h, e, hy, ey float64
	biaxial         bool
}

// outside reports whether the resultant reaches the edge of a base of
// sides a (along) and w (across).
func (ld baseLoad) outside(a, w float64) bool {
	return math.Abs(ld.e) >= a/2 || math.Abs(ld.ey) >= w/2
}

// outsideNote says, with its numbers, why a base whose resultant reaches
// its edge has a bearing capacity of zero: no contact pressure under a
// rigid base can balance it, whatever the ground's strength, so the result
// fails with an unbounded ratio; the demand shown is the mean pressure
// N/(a·w), for reference only.
func (ld baseLoad) outsideNote(a, w float64) string {
	where := fmt.Sprintf("e = %v from the base centre against half its side, %v", units.Length(math.Abs(ld.e)), units.Length(a/2))
	if ld.biaxial {
		where += fmt.Sprintf("; e_y = %v against %v square to it", units.Length(math.Abs(ld.ey)), units.Length(w/2))
	}
	return "resultant outside the base (" + where + "): no contact pressure can balance it, the base tips whatever " +
		"the ground's strength; its bearing capacity is taken as 0, so the ratio is unbounded (inf): a failure, not a " +
		"missing number; the demand shown is the mean pressure N/A on the whole base area, for reference only"
}

// contact returns the peak contact pressure of a rigid base of sides
// along and across under ld.
func (ld baseLoad) contact(along, across units.Length) (units.Pressure, error) {
	if !ld.biaxial {
		qmax, _, _, err := ContactPressure(units.Force(ld.n), units.Length(ld.e), along, across)
		return qmax, err
	}
	c, err := BiaxialContactPressure(units.Force(ld.n), units.Length(ld.e), units.Length(ld.ey), along, across)
	return c.Max, err
}

// appendBaseValues appends to vs the resultant's values: N, H, e, and the
// contact pressures of a rigid base; for a biaxial base also H_y and e_y,
// and the area in compression A_c in place of the contact length.
func appendBaseValues(vs []check.Value, ld baseLoad, along, across float64) []check.Value {
	if ld.biaxial {
		vs = append(vs,
			check.Of("N", "effective normal force on the base", units.Force(ld.n)),
			check.Of("H", "horizontal force on the base in the check's direction", units.Force(ld.h)),
			check.Of("H_y", "horizontal force on the base square to the check's direction", units.Force(ld.hy)),
			check.Of("e", "eccentricity of the resultant from the base centre in the check's direction", units.Length(ld.e)),
			check.Of("e_y", "eccentricity of the resultant from the base centre square to the check's direction", units.Length(ld.ey)),
		)
		if c, err := BiaxialContactPressure(units.Force(ld.n), units.Length(ld.e), units.Length(ld.ey), units.Length(along), units.Length(across)); err == nil {
			vs = append(vs,
				check.Of("q_max", "peak contact pressure of a rigid base", c.Max),
				check.Of("q_min", "least contact pressure of a rigid base", c.Min),
				check.Of("A_c", "area of the base in compression", c.Area))
		}
		return vs
	}
	vs = append(vs,
		check.Of("N", "effective normal force on the base", units.Force(ld.n)),
		check.Of("H", "horizontal force on the base", units.Force(ld.h)),
		check.Of("e", "eccentricity of the resultant from the base centre", units.Length(ld.e)),
	)
	if qmax, qmin, contact, err := ContactPressure(units.Force(ld.n), units.Length(ld.e), units.Length(along), units.Length(across)); err == nil {
		vs = append(vs,
			check.Of("q_max", "peak contact pressure of a rigid base", qmax),
			check.Of("q_min", "least contact pressure of a rigid base", qmin),
			check.Of("l_c", "contact length along the load", contact))
	}
	return vs
}

// soilBearing checks a rectangular base of side along (the direction of
// the load and eccentricity) and across on soil s in condition cond by
// method m, under effective normal force ld.n: N/A' against qult/fs
// (allowable) or qult/γR,v (partial), the strength divided by the set's
// partial factors. Allowable basis with Soil.Allowable: besides, the peak
// contact pressure against it, and the worse of the two governs. A site's
// allowable pressure presumes a vertical load on a base of ordinary size;
// the bearing equation carries the load's inclination and eccentricity,
// which for an anchor block's base can take most of the capacity: used
// alone, the allowable pressure could pass what fails by the equation.
func soilBearing(id, title string, along, across, depth units.Length, water Water, slope units.Angle, ld baseLoad,
	s Soil, m Method, cond Condition, set actionSet, fs float64) (check.Result, error) {
	if set.allowable && s.Allowable > 0 {
		byTheory := s
		byTheory.Allowable = 0
		rq, err := soilBearing(id, title, along, across, depth, water, slope, ld, byTheory, m, cond, set, fs)
		if err != nil {
			return check.Result{}, err
		}
		ra, err := allowableBearing(id, title, along, across, ld, s, set)
		if err != nil {
			return check.Result{}, err
		}
		worse, other := ra, rq
		if rq.Ratio > ra.Ratio {
			worse, other = rq, ra
		}
		if set.terse {
			return worse, nil
		}
		which := "the peak contact pressure against the allowable pressure given by the site report governs; " +
			"also checked: the bearing equation (" + m.String() + ")"
		if rq.Ratio > ra.Ratio {
			which = "the bearing equation (" + m.String() + ") governs; also checked: the peak contact pressure against the allowable " +
				"pressure given by the site report, which presumes a vertical load"
		}
		return worse.WithBasis(which+fmt.Sprintf(", utilisation %.3f; ", other.Ratio)+worse.Basis).WithValues(
			check.Of("U_qa", "utilisation of the site's allowable pressure by the peak contact pressure", units.Ratio(ra.Ratio)),
			check.Of("U_qult", "utilisation by the bearing equation", units.Ratio(rq.Ratio))), nil
	}
	basis := bearingBasis(set, s, m, fs)
	a, w := float64(along), float64(across)
	area := a * w
	outside := func() check.Result {
		r := check.Compare(id, title, units.KindPressure, ld.n/area, 0).WithBasis(basis)
		if set.terse {
			return r
		}
		var buf [valueRoom]check.Value
		return r.WithValues(appendBaseValues(buf[:0], ld, a, w)...).WithNote(ld.outsideNote(a, w))
	}
	if ld.outside(a, w) {
		return outside(), nil
	}
	sd := s.withStrength(s.strengthIn(cond, set))
	br, err := BearingCapacity(BearingInput{AlongLoad: along, AcrossLoad: across, Depth: depth, Vertical: units.Force(ld.n),
		Horizontal: units.Force(ld.h), HorizontalAcross: units.Force(ld.hy), EccAlong: units.Length(ld.e), EccAcross: units.Length(ld.ey),
		Water: water, GroundSlope: slope}, sd, m, cond)
	if errors.Is(err, ErrOutsideBase) {
		return outside(), nil
	}
	if err != nil {
		return check.Result{}, err
	}
	capacity := float64(br.Qult) / fs
	if !set.allowable {
		capacity = float64(br.Qult) / set.gRv
	}
	r := check.Compare(id, title, units.KindPressure, ld.n/float64(br.Area()), capacity).WithBasis(basis)
	if set.terse {
		return r, nil
	}
	var buf [valueRoom]check.Value // the values on the stack, copied once into the result
	vs := appendBaseValues(buf[:0], ld, a, w)
	vs = append(vs, check.Of("A'", "effective base area", br.Area()))
	r = r.WithValues(br.appendValues(vs)...)
	r = r.WithNote(fmt.Sprintf("%v, %v: qult %v on the effective base %v × %v", br.Method, cond, br.Qult, br.BEff, br.LEff))
	if water.Present {
		r = r.WithNote(water.String() + ": effective stresses")
	}
	for _, note := range br.Notes {
		r = r.WithNote(note)
	}
	return r, nil
}

// allowableBearing checks the peak contact pressure of a rigid base on
// soil against the site's allowable pressure (allowable basis).
func allowableBearing(id, title string, along, across units.Length, ld baseLoad, s Soil, set actionSet) (check.Result, error) {
	basis := ""
	if !set.terse {
		basis = "allowable basis: peak contact pressure against the allowable bearing pressure given by the site report"
	}
	return peakAgainst(id, title, along, across, ld, s.Allowable, basis, set,
		check.Of("q_a", "allowable bearing pressure given by the site report", s.Allowable))
}

// rockBaseBearing checks a rectangular base on rock: the peak contact
// pressure of a rigid base under characteristic actions against the
// allowable pressure of RockPressure (presumed bearing values are used with
// characteristic actions, EN 1997-1:2004 2.5 and Annex G approach, from
// memory).
func rockBaseBearing(id, title string, along, across units.Length, ld baseLoad, s Soil, set actionSet) (check.Result, error) {
	rb, err := RockPressure(s, min(along, across))
	if err != nil {
		return check.Result{}, err
	}
	basis := ""
	if !set.terse {
		basis = "rock: peak contact pressure under characteristic actions against the allowable pressure, " + rb.Method +
			"; soil bearing-capacity factors are not used on rock"
	}
	return peakAgainst(id, title, along, across, ld, rb.Allowable, basis, set, rb.Values()...)
}

// peakAgainst checks the peak contact pressure of a rigid base of sides
// along × across under ld against an allowable pressure; a resultant
// outside the base fails against a capacity of zero. The base's values and
// extra follow unless set is terse.
func peakAgainst(id, title string, along, across units.Length, ld baseLoad, allowable units.Pressure, basis string, set actionSet, extra ...check.Value) (check.Result, error) {
	a, w := float64(along), float64(across)
	if ld.outside(a, w) {
		r := check.Compare(id, title, units.KindPressure, ld.n/(a*w), 0).WithBasis(basis)
		if set.terse {
			return r, nil
		}
		var buf [valueRoom]check.Value
		return r.WithValues(appendBaseValues(buf[:0], ld, a, w)...).WithNote(ld.outsideNote(a, w)), nil
	}
	qmax, err := ld.contact(along, across)
	if err != nil {
		return check.Result{}, err
	}
	r := check.Compare(id, title, units.KindPressure, float64(qmax), float64(allowable)).WithBasis(basis)
	if set.terse {
		return r, nil
	}
	var buf [valueRoom]check.Value
	return r.WithValues(append(appendBaseValues(buf[:0], ld, a, w), extra...)...), nil
}

// valueRoom is the room on the stack for the values of one result built
// before they are copied into it.
const valueRoom = 48
