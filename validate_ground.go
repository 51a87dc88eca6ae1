package sagspan

import (
	"errors"
	"fmt"
	"math"

	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// validateAnchor checks an anchor's own geometry and steel: what a design
// search changes when it tries another anchor size.
func (b Bridge) validateAnchor(v *validator, f string, a AnchorSpec) {
	switch a.Type {
	case "block", "deadman":
		v.positive(path{f, ".anchor.length"}, float64(a.Length), units.KindLength)
		v.positive(path{f, ".anchor.width"}, float64(a.Width), units.KindLength)
		v.positive(path{f, ".anchor.height"}, float64(a.Height), units.KindLength)
		v.positive(path{f, ".anchor.depth"}, float64(a.Depth), units.KindLength)
		v.nonNegative(path{f, ".anchor.unit_weight"}, float64(a.UnitWeight), units.KindUnitWeight)
		if a.Passive < 0 || a.Passive > 1 || math.IsNaN(a.Passive) {
			v.fail(path{f, ".anchor.passive"}, "must lie between 0 and 1, got %v", a.Passive)
		}
		v.nonNegative(path{f, ".anchor.attach_x"}, float64(a.AttachX), units.KindLength)
		v.nonNegative(path{f, ".anchor.attach_z"}, float64(a.AttachZ), units.KindLength)
		if v.err == nil && a.AttachZ > a.Height {
			v.fail(path{f, ".anchor.attach_z"}, "%s is above the top of the %s high %s", a.AttachZ, a.Height, a.Type)
		}
		if a.Type == "block" {
			if v.err == nil && a.AttachX > a.Length {
				v.fail(path{f, ".anchor.attach_x"}, "%s is beyond the front of the %s long block", a.AttachX, a.Length)
			}
		} else {
			if v.err == nil && a.Height > a.Depth {
				v.fail(path{f, ".anchor.height"}, "the deadman's face (%s high) reaches above the ground: its depth %s to the bottom of the face must be at least its height", a.Height, a.Depth)
			}
		}
		if a.Type != "deadman" && a.Beam != nil {
			v.fail(path{f, ".anchor.beam"}, "applies to a deadman only")
		}
		if a.Beam != nil {
			v.positive(path{f, ".anchor.beam.steel"}, float64(a.Beam.Steel), units.KindPressure)
			v.positive(path{f, ".anchor.beam.plastic_modulus"}, float64(a.Beam.PlasticModulus), units.KindVolume)
			v.positive(path{f, ".anchor.beam.shear_area"}, float64(a.Beam.ShearArea), units.KindArea)
			if v.err == nil && a.Beam.Steel > maxSteel {
				v.fail(path{f, ".anchor.beam.steel"}, "%s is above the %s of structural steel this library accepts", a.Beam.Steel, maxSteel)
			}
		}
		if a.Plate != nil || a.Bars != 0 || a.GroutBond != nil {
			v.fail(path{f, ".anchor.type"}, "bars, plate and grout_bond belong to a rock anchor, not a %s", a.Type)
		}
	case "rock":
		if a.Bars <= 0 {
			v.fail(path{f, ".anchor.bars"}, "a rock anchor needs at least one bar, got %d", a.Bars)
		}
		v.positive(path{f, ".anchor.bar_diameter"}, float64(a.BarDiameter), units.KindLength)
		v.positive(path{f, ".anchor.bar_strength"}, float64(a.BarStrength), units.KindPressure)
		v.nonNegative(path{f, ".anchor.bar_ultimate"}, float64(a.BarUltimate), units.KindPressure)
		if v.err == nil && a.BarUltimate > 0 && a.BarUltimate < a.BarStrength {
			v.fail(path{f, ".anchor.bar_ultimate"}, "%s is less than the yield strength %s", a.BarUltimate, a.BarStrength)
		}
		v.nonNegative(path{f, ".anchor.bar_spacing"}, float64(a.BarSpacing), units.KindLength)
		v.positive(path{f, ".anchor.hole_diameter"}, float64(a.HoleDiameter), units.KindLength)
		if v.err == nil && a.HoleDiameter <= a.BarDiameter {
			v.fail(path{f, ".anchor.hole_diameter"}, "%s does not exceed the bar diameter %s", a.HoleDiameter, a.BarDiameter)
		}
		v.positive(path{f, ".anchor.bond_length"}, float64(a.BondLength), units.KindLength)
		v.nonNegative(path{f, ".anchor.free_length"}, float64(a.FreeLength), units.KindLength)
		if a.GroutBond != nil {
			v.positive(path{f, ".anchor.grout_bond"}, float64(*a.GroutBond), units.KindPressure)
		}
		if p := a.Plate; p != nil {
			v.positive(path{f, ".anchor.plate.side"}, float64(p.Side), units.KindLength)
			v.positive(path{f, ".anchor.plate.thickness"}, float64(p.Thickness), units.KindLength)
			v.positive(path{f, ".anchor.plate.steel"}, float64(p.Steel), units.KindPressure)
			if v.err == nil && (float64(p.Side) <= 1.5*float64(a.BarDiameter) || p.Side <= a.HoleDiameter) {
				v.fail(path{f, ".anchor.plate.side"}, "%s leaves no plate round the nut (1.5 × the bar) and the hole", p.Side)
			}
		}
		if a.Beam != nil {
			v.fail(path{f, ".anchor.beam"}, "applies to a deadman only")
		}
		if a.Passive != 0 || a.Length != 0 || a.Width != 0 || a.Height != 0 || a.Depth != 0 {
			v.fail(path{f, ".anchor.type"}, "length, width, height, depth and passive belong to a block or deadman, not a rock anchor")
		}
	default:
		v.fail(path{f, ".anchor.type"}, "unknown anchor type %q; want block, deadman or rock", a.Type)
	}
	if a.Attachment != nil && v.err == nil {
		b.validateAttachment(v, f, a)
	}
}

// validateAttachment checks how the ropes are fixed to the anchor.
func (b Bridge) validateAttachment(v *validator, f string, a AnchorSpec) {
	att := a.Attachment
	p := f + ".anchor.attachment"
	if _, err := att.efficiency(); err != nil {
		var fe *FieldError
		if errors.As(err, &fe) {
			v.fail(at(p+"."+fe.Field), "%v", fe.Err)
		}
		return
	}
	switch att.Kind {
	case "rod":
		if a.Type == "rock" {
			if att.Rods != 0 {
				v.fail(at(p+".rods"), "the ropes of a rock anchor are fixed to its bars' heads: give no rods")
			}
			return
		}
		if att.Rods <= 0 {
			v.fail(at(p+".rods"), "is missing: give the number of rods cast into the %s", a.Type)
		}
		v.positive(at(p+".rod_diameter"), float64(att.RodDiameter), units.KindLength)
		v.positive(at(p+".rod_steel"), float64(att.RodSteel), units.KindPressure)
		v.nonNegative(at(p+".rod_ultimate"), float64(att.RodUltimate), units.KindPressure)
		v.nonNegative(at(p+".rod_thread_area"), float64(att.RodThreadArea), units.KindArea)
		if v.err == nil && att.RodUltimate > 0 && att.RodUltimate < att.RodSteel {
			v.fail(at(p+".rod_ultimate"), "%s is less than the yield strength %s", att.RodUltimate, att.RodSteel)
		}
		if v.err == nil && float64(att.RodThreadArea) > math.Pi/4*float64(att.RodDiameter)*float64(att.RodDiameter) {
			v.fail(at(p+".rod_thread_area"), "%s exceeds the rod's gross area", att.RodThreadArea)
		}
		if v.err == nil && att.PinDiameter != 0 {
			v.fail(at(p+".pin_diameter"), "belongs to a loop, not rods")
		}
	case "loop":
		if a.Type == "rock" {
			v.fail(at(p+".kind"), "a rock anchor has no pin to loop round: use rod")
			return
		}
		v.positive(at(p+".pin_diameter"), float64(att.PinDiameter), units.KindLength)
		for i, g := range b.Ropes {
			if v.err == nil && att.PinDiameter < g.Rope.Diameter {
				v.fail(at(p+".pin_diameter"), "%s is thinner than the %s rope of ropes[%d]", att.PinDiameter, g.Rope.Diameter, i)
			}
		}
		if v.err == nil && att.Rods != 0 {
			v.fail(at(p+".rods"), "belong to rod attachments, not a loop")
		}
	default:
		v.fail(at(p+".kind"), "unknown attachment %q; want rod or loop", att.Kind)
	}
}

// validateGround checks a bank's soil and groundwater, and the
// combinations of soil and anchor the analysis cannot take: a rock anchor
// outside rock or without a grout bond, a deadman in rock, rock with no
// bearing data. It ends by running the bank's foundation checks once with
// no load, so that any input the foundation package would refuse is
// refused here, with the field named.
func (b Bridge) validateGround(v *validator, side Side) {
	if v.err != nil {
		return
	}
	f, k := "banks."+side.String(), b.bankOf(side)
	soil, err := k.Soil.soil()
	if err != nil {
		v.err = soilField(f, err)
		return
	}
	if gw := k.Soil.Groundwater; gw != nil {
		// A bank's groundwater may stand above the river's design flood
		// (water draining from the hillside to the river): it is accepted,
		// and in the flood case the higher of the two is used. Refusing it
		// would invite a lower, unconservative groundwater level.
		v.finite(at(f+".soil.groundwater_elevation"), float64(*gw))
	}
	a := k.Anchor
	switch {
	case a.Type == "rock" && !soil.IsRock:
		v.fail(at(f+".anchor.type"), "a rock anchor needs rock, but %s.soil is not rock (%s)", f, soil.Name)
	case a.Type == "rock" && !(a.groutBond(soil) > 0):
		v.fail(at(f+".anchor.grout_bond"), "is missing: a rock anchor needs the ultimate grout–rock bond from anchor tests (BS 8081, EN 1537); %s gives none", soil.Name)
	case a.Type == "deadman" && soil.IsRock:
		v.fail(at(f+".anchor.type"), "a deadman is buried in soil, but %s.soil is rock: use a rock anchor or a block", f)
	}
	if v.err != nil {
		return
	}
	bank := b.groundOf(side, soil)
	if gw := k.Soil.Groundwater; gw != nil {
		b.validateGroundwater(v, f, bank, *gw)
	}
	// The foundation package's own refusals, by a dry run with no load.
	if _, err := bank.pad(bank.bank.Tower.Footing).Check(foundation.FootingLoad{}, soil, bank.method, dryRun()); err != nil {
		v.fail(at(f+".tower.footing"), "%v", err)
		return
	}
	if _, err := bank.anchorDryRun(); err != nil {
		v.fail(at(f+".anchor"), "%v", err)
	}
}

// validateFlood refuses a design flood that the ground line, where it runs
// across the whole span, puts at or below the ground everywhere under the
// span: a flood given as a height above the river bed, or on another datum,
// would otherwise pass the clearance check by the height of the site.
func (b Bridge) validateFlood(v *validator) {
	s := b.Site
	g := s.Ground
	if v.err != nil || s.Flood.None || len(g) < 2 || g[0].X > 0 || g[len(g)-1].X < s.Span {
		return
	}
	// The lowest ground under the span lies at a point of the line or at
	// an end of the span.
	low, at, point := units.Length(math.Inf(1)), units.Length(0), -1
	consider := func(x, z units.Length, i int) {
		if z < low {
			low, at, point = z, x, i
		}
	}
	for i, p := range g {
		if p.X >= 0 && p.X <= s.Span {
			consider(p.X, p.Z, i)
		}
	}
	for _, x := range []units.Length{0, s.Span} {
		z, _ := lineAt(g, float64(x)) // the line runs across the span
		consider(x, z, -1)
	}
	if s.Flood.Z > low {
		return
	}
	where := fmt.Sprintf("x = %s", at)
	if point >= 0 {
		where += fmt.Sprintf(", site.ground[%d]", point)
	}
	v.fail(path{name: "site.flood_elevation"}, "the design flood at %s lies at or below the ground line everywhere under the span (lowest %s at %s): no flood can stand there; give its elevation on the datum of the saddles and the ground line (site.left_saddle_elevation %s), or \"none\" where no flood reaches the bridge",
		s.Flood.Z, low, where, s.LeftSaddle)
}

// validateBuried refuses a footing whose depth below ground, under a
// column of the tower's height on a slab of its thickness, puts the ground
// at the footing at or above the saddle: a depth and a height given from
// different references, or the footing's depth for the column's height.
func (b Bridge) validateBuried(v *validator, side Side) {
	if v.err != nil {
		return
	}
	k := b.bankOf(side)
	t, ft := k.Tower, k.Tower.Footing
	saddle := b.saddleElevation(side)
	ground := saddle - t.Height - ft.Thickness + ft.Depth
	if ground < saddle {
		return
	}
	v.fail(path{"banks." + side.String(), ".tower.footing.depth"}, "%s below ground puts the ground at the footing at %s, at or above the saddle at %s (a %s column on a %s footing): the saddle would be buried; the depth is that of the footing's underside below the ground, and the tower's height that of the saddle above the footing's top",
		ft.Depth, ground, saddle, t.Height, ft.Thickness)
}

// maxWaterBelowBase is how far below a bank's lowest base a groundwater
// level is taken for a slip: no check here reaches water that deep (the
// bearing of a base feels water within about its width below it, common
// practice, and a footing is at most 20 m wide here), so a
// level that low changes nothing but is likely a depth below ground, or a
// level on another datum, written where the elevation goes.
const maxWaterBelowBase = 30 * units.Metre

// validateGroundwater refuses a groundwater level far below every base of
// the bank: leaving it out gives the same checks.
func (b Bridge) validateGroundwater(v *validator, f string, g bankGround, gw units.Length) {
	a := g.bank.Anchor
	lowest, what := g.footingTop-g.bank.Tower.Footing.Thickness, "the footing's"
	anchor := g.anchorGround(a) - a.Depth
	if a.Type == "rock" {
		anchor = g.anchorGround(a) - a.FreeLength - a.BondLength
	}
	if anchor < lowest {
		lowest, what = anchor, "the anchor's"
	}
	if lowest-gw <= maxWaterBelowBase {
		return
	}
	v.fail(at(f+".soil.groundwater_elevation"), "%s lies %s below the lowest base of this bank (%s at %s), out of reach of every check: it is an elevation on the datum of the saddles (site.left_saddle_elevation %s), not a depth below ground; leave it out where the groundwater lies out of reach",
		gw, lowest-gw, what, lowest, b.Site.LeftSaddle)
}
