package sagspan

import (
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// footingChecks checks the footing spec of one bank's tower under every
// service case.
func (m *model) footingChecks(out sink, side Side, spec FootingSpec, service []CaseState) error {
	element := footingElement[side]
	for _, svc := range service {
		results, err := m.footing(side, spec, service[0].Tower[side], svc.Tower[side])
		if err != nil {
			return m.bankErr(side, "tower.footing", svc.Case.Name, err)
		}
		for _, r := range results {
			out.add(r.For(element, svc.Case.Name))
		}
		if svc.Lateral[side] == 0 {
			continue
		}
		results, err = m.footingAcross(side, spec, service[0].Tower[side], svc)
		if err != nil {
			return m.bankErr(side, "tower.footing", svc.Case.Name+", across the bridge", err)
		}
		for _, r := range results {
			out.add(r.For(footingAcrossElement[side], svc.Case.Name))
		}
	}
	return nil
}

// footingAcross checks a tower footing across the bridge under the wind
// pushing the swung ropes sideways: the footing turned, its width along the
// lateral force. The whole lateral action is variable.
func (m *model) footingAcross(s Side, spec FootingSpec, perm tower.Resultant, svc CaseState) ([]check.Result, error) {
	f := m.padOf(s, spec)
	f.Along, f.Across = spec.Width, spec.Length // turned: along the lateral force
	lateral := svc.Lateral[s]
	moment := svc.LateralMoment[s] + units.MomentOf(lateral, spec.Thickness)
	load := foundation.FootingLoad{
		Vertical:           svc.Tower[s].Vertical,
		Horizontal:         lateral,
		Moment:             moment,
		Split:              true,
		VariableVertical:   svc.Tower[s].Vertical - perm.Vertical,
		VariableHorizontal: lateral,
		VariableMoment:     moment,
	}
	var err error
	m.scratch, err = f.AppendCheck(m.scratch[:0], load, m.soils[s], foundation.Vesic, m.foundationBasis())
	return m.scratch, err
}

// anchorChecks checks the anchor spec of one bank under every service case.
func (m *model) anchorChecks(out sink, side Side, spec AnchorSpec, service []CaseState) error {
	element := anchorElement[side]
	for _, svc := range service {
		results, err := m.anchor(side, spec, service[0], svc)
		if err != nil {
			return m.bankErr(side, "anchor", svc.Case.Name, err)
		}
		for _, r := range results {
			out.add(r.For(element, svc.Case.Name))
		}
	}
	return nil
}

// share returns the fraction of x that exceeds the permanent value p (for
// a rock anchor's pull, which keeps its direction).
func share(x, p float64) float64 {
	if math.Abs(x) == 0 {
		return 0
	}
	return math.Max(0, math.Min(1, (math.Abs(x)-math.Abs(p))/math.Abs(x)))
}

// footing checks a tower footing under the column-base resultant r, brought
// down to the underside of the footing; perm is the permanent case's
// resultant, for the variable share of the partial basis.
func (m *model) footing(s Side, spec FootingSpec, perm, r tower.Resultant) ([]check.Result, error) {
	f := m.padOf(s, spec)
	moment := func(r tower.Resultant) units.Moment {
		return r.BaseMoment + units.MomentOf(r.Horizontal, spec.Thickness) + units.MomentOf(r.Vertical, spec.ColumnOffset)
	}
	// Variable parts: what the case adds to the permanent case, component
	// by component and signed, so that a permanent part the variable one
	// opposes is factored as favourable on the partial basis.
	load := foundation.FootingLoad{
		Vertical:           r.Vertical,
		Horizontal:         r.Horizontal,
		Moment:             moment(r),
		Split:              true,
		VariableVertical:   r.Vertical - perm.Vertical,
		VariableHorizontal: r.Horizontal - perm.Horizontal,
		VariableMoment:     moment(r) - moment(perm),
	}
	var err error
	m.scratch, err = f.AppendCheck(m.scratch[:0], load, m.soils[s], foundation.Vesic, m.foundationBasis())
	return m.scratch, err
}

// foundationBasis returns the verification basis of the anchor and
// footing checks, held in the model so that the many checks of a design
// search share it.
func (m *model) foundationBasis() *foundation.Basis { return &m.fbasis }

// anchor checks the anchor of one bank under the backstay pulls of every
// group, split into the permanent case's pull and the rest.
func (m *model) anchor(s Side, spec AnchorSpec, perm, svc CaseState) ([]check.Result, error) {
	basis := m.foundationBasis()
	x, z := spec.AttachX, spec.AttachZ
	if x == 0 {
		x = spec.Length / 2
	}
	if z == 0 {
		z = spec.Height / 3
	}
	pulls := m.pulls[:0]
	defer func() { m.pulls = pulls[:0] }()
	for i, g := range svc.Groups {
		t, p := g.Backstay[s], perm.Groups[i].Backstay[s]
		angle := g.BackstayAngle[s]
		pulls = append(pulls, foundation.AnchorPull{Force: min(t, p), Angle: angle, X: x, Z: z})
		if t > p {
			pulls = append(pulls, foundation.AnchorPull{Force: t - p, Angle: angle, X: x, Z: z, Variable: true})
		}
	}
	soil := m.soils[s]
	switch spec.Type {
	case "deadman":
		d := foundation.Deadman{Length: spec.Width, Height: spec.Height, Thickness: spec.Length, Depth: spec.Depth, UnitWeight: spec.UnitWeight}
		return d.Check(pulls, soil, basis)
	case "rock":
		// The bars lie along the resultant of the backstays' pulls.
		var fx, fz, fxp, fzp float64
		for i, g := range svc.Groups {
			c, sn := math.Cos(float64(g.BackstayAngle[s])), math.Sin(float64(g.BackstayAngle[s]))
			fx, fz = fx+float64(g.Backstay[s])*c, fz+float64(g.Backstay[s])*sn
			p := perm.Groups[i].Backstay[s]
			fxp, fzp = fxp+float64(p)*c, fzp+float64(p)*sn
		}
		pull, permanent := math.Hypot(fx, fz), math.Hypot(fxp, fzp)
		ra := foundation.RockAnchor{
			Count: spec.Bars, BarDiameter: spec.BarDiameter, YieldStrength: spec.BarStrength,
			HoleDiameter: spec.HoleDiameter, BondLength: spec.BondLength, FreeLength: spec.FreeLength,
			VariableShare: share(pull, permanent),
		}
		return ra.Check(units.Force(pull), units.Angle(math.Atan2(fz, fx)), soil, basis)
	}
	blk := foundation.AnchorBlock{
		Length: spec.Length, Width: spec.Width, Height: spec.Height, Depth: spec.Depth,
		UnitWeight: spec.UnitWeight, PassiveMobilisation: spec.Passive,
	}
	var err error
	m.scratch, err = blk.AppendCheck(m.scratch[:0], pulls, soil, foundation.EC7, basis)
	return m.scratch, err
}

// padOf returns the footing of one bank's tower for package foundation:
// B along the bridge, the column's footprint free of soil cover.
func (m *model) padOf(s Side, spec FootingSpec) foundation.Footing {
	t := m.bank(s).Tower
	return foundation.Footing{Along: spec.Length, Across: spec.Width, Thickness: spec.Thickness, Depth: spec.Depth,
		UnitWeight: t.UnitWeight, Footprint: units.Area(float64(t.Depth) * float64(t.Width))}
}
