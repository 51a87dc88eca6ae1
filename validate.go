package sagspan

import (
	"errors"
	"fmt"
	"math"

	"github.com/sagspan/sagspan/units"
)

// Bounds of a footbridge description, beyond which the methods here are
// not meant to be used (common practice for the trade sagspan serves).
const (
	maxSpan = 1000 * units.Metre // footbridge spans are 20–250 m; well beyond stays out
	// Rope temperatures lie within these in any climate a footbridge meets.
	minTemperature = units.Temperature(273.15 - 100)
	maxTemperature = units.Temperature(273.15 + 100)
)

// Material bounds of column sections.
const (
	maxConcrete   = 90 * units.Megapascal  // fck of C90/105, EN 1992-1-1 Table 3.1
	maxSteel      = 600 * units.Megapascal // fyk, EN 1992-1-1 3.2.2(3)
	maxSteelRatio = 0.08                   // As/Ac at laps, EN 1992-1-1 9.5.2(3) (from memory)
)

// maxSagRatio is the largest dead-load sag ratio accepted: beyond a quarter
// of the span a rope is no longer a walkway a person can use, and the
// parabolic rope statics used for load cases lose accuracy (common practice:
// footbridge sag ratios lie between about 1/25 and 1/8).
const maxSagRatio = 0.25

// validator gathers the first error found, naming its field.
type validator struct{ err error }

// path is a field's JSON path in two parts, joined only when an error needs
// it: validation runs in the design search's inner loop.
type path struct{ prefix, name string }

func at(name string) path { return path{name: name} }

func (p path) String() string { return p.prefix + p.name }

func (v *validator) fail(field path, format string, args ...any) {
	if v.err == nil {
		v.err = fieldErr(field.String(), format, args...)
	}
}

// positive requires a finite value greater than zero.
func (v *validator) positive(field path, x float64, k units.Kind) {
	switch {
	case math.IsNaN(x) || math.IsInf(x, 0):
		v.fail(field, "must be a finite number")
	case x == 0:
		v.fail(field, "is missing or zero; give a positive %s", k)
	case x < 0:
		v.fail(field, "must be positive, got %s", units.Format(x, k))
	}
}

// nonNegative requires a finite value of at least zero.
func (v *validator) nonNegative(field path, x float64, k units.Kind) {
	switch {
	case math.IsNaN(x) || math.IsInf(x, 0):
		v.fail(field, "must be a finite number")
	case x < 0:
		v.fail(field, "must not be negative, got %s", units.Format(x, k))
	}
}

// finite requires a finite value of any sign.
func (v *validator) finite(field path, x float64) {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		v.fail(field, "must be a finite number")
	}
}

// Validate reports the first thing wrong with the description as a
// *FieldError naming the field, or nil. It checks what can be checked
// without analysis: presence, signs, orders of temperatures, known names,
// and geometry that cannot be built (an anchor above its saddle, a sag
// beyond maxSagRatio of the span).
func (b Bridge) Validate() error {
	v := &validator{}
	s := b.Site
	v.positive(at("site.span"), float64(s.Span), units.KindLength)
	if v.err == nil && s.Span > maxSpan {
		v.fail(at("site.span"), "%s is beyond the %s this library is made for", s.Span, maxSpan)
	}
	v.finite(at("site.rise"), float64(s.Rise))
	if v.err == nil && math.Abs(float64(s.Rise)) >= float64(s.Span) {
		v.fail(at("site.rise"), "height difference %s is not less than the span %s", s.Rise, s.Span)
	}
	v.finite(at("site.left_saddle_elevation"), float64(s.LeftSaddle))
	v.finite(at("site.flood_elevation"), float64(s.Flood))
	v.nonNegative(at("site.freeboard"), float64(s.Freeboard), units.KindLength)
	for i, p := range s.Ground {
		v.finite(at(fmt.Sprintf("site.ground[%d].x", i)), float64(p.X))
		v.finite(at(fmt.Sprintf("site.ground[%d].z", i)), float64(p.Z))
	}

	c := b.Climate
	v.positive(at("climate.reference"), float64(c.Reference), units.KindTemperature)
	v.positive(at("climate.coldest"), float64(c.Coldest), units.KindTemperature)
	v.positive(at("climate.hottest"), float64(c.Hottest), units.KindTemperature)
	for _, t := range []struct {
		f string
		t units.Temperature
	}{{"climate.reference", c.Reference}, {"climate.coldest", c.Coldest}, {"climate.hottest", c.Hottest}} {
		if v.err == nil && (t.t < minTemperature || t.t > maxTemperature) {
			v.fail(at(t.f), "%s is outside %s to %s", t.t, minTemperature, maxTemperature)
		}
	}
	if v.err == nil && !(c.Coldest <= c.Reference && c.Reference <= c.Hottest) {
		v.fail(at("climate"), "temperatures must satisfy coldest <= reference <= hottest, got %s, %s, %s",
			c.Coldest, c.Reference, c.Hottest)
	}
	v.nonNegative(at("climate.wind_speed"), float64(c.WindSpeed), units.KindVelocity)
	v.nonNegative(at("climate.wind_pressure"), float64(c.WindPressure), units.KindPressure)
	if math.IsNaN(c.Exposure) || c.Exposure < 0 || c.Exposure > 10 {
		v.fail(at("climate.exposure"), "must be zero (default) or an exposure factor up to 10, got %v", c.Exposure)
	}

	w := b.Walkway
	v.positive(at("walkway.width"), float64(w.Width), units.KindLength)
	v.nonNegative(at("walkway.depth"), float64(w.Depth), units.KindLength)
	v.nonNegative(at("walkway.dead_load"), float64(w.DeadLoad), units.KindLoadPerLength)
	v.nonNegative(at("walkway.wind_depth"), float64(w.WindDepth), units.KindLength)
	for i, p := range w.Parts {
		v.positive(at(fmt.Sprintf("walkway.parts[%d].load", i)), float64(p.Load), units.KindLoadPerLength)
	}
	if v.err == nil && w.DeadLoad == 0 && len(w.Parts) == 0 {
		v.fail(at("walkway.dead_load"), "is missing: give the walkway dead load per metre or list its parts")
	}
	if v.err == nil && w.DeadLoad != 0 && len(w.Parts) != 0 {
		v.fail(at("walkway.parts"), "give either dead_load or parts, not both")
	}

	b.validateRopes(v)
	b.validateBank(v, "banks.left", b.Banks.Left)
	b.validateBank(v, "banks.right", b.Banks.Right)
	b.validateGround(v, Left)
	b.validateGround(v, Right)
	b.validateLoads(v)
	return v.err
}

// validateBanks checks the geometry of both banks only: what a design
// search changes when it tries another anchor or footing size.
func (b Bridge) validateBanks() error {
	v := &validator{}
	b.validateBank(v, "banks.left", b.Banks.Left)
	b.validateBank(v, "banks.right", b.Banks.Right)
	return v.err
}

func (b Bridge) validateRopes(v *validator) {
	if len(b.Ropes) == 0 {
		v.fail(at("ropes"), "is missing: list at least one rope group")
		return
	}
	walkway, shares := 0, 0.0
	for i, g := range b.Ropes {
		f := fmt.Sprintf("ropes[%d]", i)
		switch g.Role {
		case RoleWalkway:
			walkway++
		case RoleHandrail:
		default:
			v.fail(path{f, ".role"}, "unknown role %q; want %q or %q", g.Role, RoleWalkway, RoleHandrail)
		}
		if g.Count <= 0 {
			v.fail(path{f, ".count"}, "must be at least 1, got %d", g.Count)
		}
		v.positive(path{f, ".sag"}, float64(g.Sag), units.KindLength)
		if v.err == nil && float64(g.Sag) > maxSagRatio*float64(b.Site.Span) {
			v.fail(path{f, ".sag"}, "sag %s is more than %.2f of the span %s: not a physical footbridge",
				g.Sag, maxSagRatio, b.Site.Span)
		}
		v.nonNegative(path{f, ".offset"}, float64(g.Offset), units.KindLength)
		if math.IsNaN(g.Share) || g.Share < 0 || g.Share > 1 {
			v.fail(path{f, ".share"}, "must lie between 0 and 1, got %v", g.Share)
		}
		shares += g.Share
		if _, err := g.Rope.rope(); err != nil {
			var fe *FieldError
			if errors.As(err, &fe) {
				v.fail(at(f+".rope."+fe.Field), "%v", fe.Err)
			} else {
				v.fail(path{f, ".rope"}, "%v", err)
			}
		}
	}
	if walkway == 0 {
		v.fail(at("ropes"), "no rope group has role %q: nothing carries the walkway", RoleWalkway)
	}
	if shares != 0 && math.Abs(shares-1) > 1e-9 {
		v.fail(at("ropes"), "the load shares of the rope groups add up to %v, not 1", shares)
	}
}

func (b Bridge) validateBank(v *validator, f string, k Bank) {
	t := k.Tower
	v.positive(path{f, ".tower.height"}, float64(t.Height), units.KindLength)
	v.positive(path{f, ".tower.depth"}, float64(t.Depth), units.KindLength)
	v.positive(path{f, ".tower.width"}, float64(t.Width), units.KindLength)
	v.nonNegative(path{f, ".tower.facing"}, float64(t.Facing), units.KindLength)
	if v.err == nil && 2*t.Facing >= min(t.Depth, t.Width) {
		v.fail(path{f, ".tower.facing"}, "facing %s on both faces leaves no effective section of the %s × %s column", t.Facing, t.Depth, t.Width)
	}
	v.nonNegative(path{f, ".tower.unit_weight"}, float64(t.UnitWeight), units.KindUnitWeight)
	switch t.Saddle.Kind {
	case "fixed", "roller":
	case "sliding":
		if !(t.Saddle.Friction > 0 && t.Saddle.Friction < 1) {
			v.fail(path{f, ".tower.saddle.friction"}, "a sliding saddle needs a friction coefficient between 0 and 1, got %v", t.Saddle.Friction)
		}
	default:
		v.fail(path{f, ".tower.saddle.kind"}, "unknown saddle kind %q; want fixed, sliding or roller", t.Saddle.Kind)
	}
	sec := t.Section
	v.positive(path{f, ".tower.section.concrete"}, float64(sec.Concrete), units.KindPressure)
	if v.err == nil && sec.Concrete > maxConcrete {
		v.fail(path{f, ".tower.section.concrete"}, "%s is above the %s of the strongest concrete class in EN 1992-1-1 Table 3.1", sec.Concrete, maxConcrete)
	}
	if sec.Bars < 0 || sec.Bars%2 != 0 {
		v.fail(path{f, ".tower.section.bars"}, "must be an even number (half on each face), got %d", sec.Bars)
	}
	if sec.Bars > 0 {
		v.positive(path{f, ".tower.section.steel"}, float64(sec.Steel), units.KindPressure)
		v.positive(path{f, ".tower.section.bar_diameter"}, float64(sec.BarDiameter), units.KindLength)
		v.positive(path{f, ".tower.section.cover"}, float64(sec.Cover), units.KindLength)
		if v.err == nil && 2*sec.Cover >= min(t.Depth, t.Width)-2*t.Facing {
			v.fail(path{f, ".tower.section.cover"}, "cover %s leaves no room in the effective section", sec.Cover)
		}
		if v.err == nil && sec.Steel > maxSteel {
			v.fail(path{f, ".tower.section.steel"}, "%s is above the %s of reinforcing steel (EN 1992-1-1 3.2.2(3): fyk 400 to 600 MPa)", sec.Steel, maxSteel)
		}
		bars := float64(sec.Bars) * math.Pi / 4 * float64(sec.BarDiameter) * float64(sec.BarDiameter)
		gross := float64(t.Depth-2*t.Facing) * float64(t.Width-2*t.Facing)
		if v.err == nil && bars > maxSteelRatio*gross {
			v.fail(path{f, ".tower.section.bar_diameter"}, "%d bars of %s are %.1f %% of the section, above the %.0f %% EN 1992-1-1 9.5.2(3) allows at laps (from memory)",
				sec.Bars, sec.BarDiameter, 100*bars/gross, 100*maxSteelRatio)
		}
	}
	ft := t.Footing
	v.positive(path{f, ".tower.footing.length"}, float64(ft.Length), units.KindLength)
	v.positive(path{f, ".tower.footing.width"}, float64(ft.Width), units.KindLength)
	v.positive(path{f, ".tower.footing.thickness"}, float64(ft.Thickness), units.KindLength)
	v.nonNegative(path{f, ".tower.footing.depth"}, float64(ft.Depth), units.KindLength)
	v.finite(path{f, ".tower.footing.column_offset"}, float64(ft.ColumnOffset))
	if v.err == nil && (ft.Length < t.Depth || ft.Width < t.Width) {
		v.fail(path{f, ".tower.footing"}, "footing %s × %s is smaller than the column %s × %s", ft.Length, ft.Width, t.Depth, t.Width)
	}
	if v.err == nil && math.Abs(float64(ft.ColumnOffset))+float64(t.Depth)/2 > float64(ft.Length)/2 {
		v.fail(path{f, ".tower.footing.column_offset"}, "puts the column beyond the edge of the footing")
	}
	e := t.Eccentricity
	switch e.Rule {
	case "", "kern":
	case "fraction":
		if !(e.Fraction > 0 && e.Fraction <= 1) {
			v.fail(path{f, ".tower.eccentricity.fraction"}, "must lie in (0, 1], got %v", e.Fraction)
		}
		v.finite(path{f, ".tower.eccentricity.offset"}, float64(e.Offset))
	default:
		v.fail(path{f, ".tower.eccentricity.rule"}, "unknown rule %q; want kern or fraction", e.Rule)
	}

	bs := k.Backstay
	v.positive(path{f, ".backstay.horizontal"}, float64(bs.Horizontal), units.KindLength)
	v.finite(path{f, ".backstay.drop"}, float64(bs.Drop))
	if v.err == nil && bs.Drop <= 0 {
		v.fail(path{f, ".backstay.drop"}, "the anchor must lie below the saddle, got a drop of %s (anchor above the saddle)", bs.Drop)
	}

	b.validateAnchor(v, f, k.Anchor)
}

func (b Bridge) validateLoads(v *validator) {
	l := b.Loads
	v.nonNegative(at("loads.crowd"), float64(l.Crowd), units.KindPressure)
	for _, x := range []struct {
		f string
		x float64
	}{{"loads.wind_with_crowd", l.WindWithCrowd}, {"loads.rope_drag", l.DragCoefficient}, {"loads.walkway_drag", l.WalkwayDrag}} {
		if math.IsNaN(x.x) || x.x < 0 || x.x > 10 {
			v.fail(at(x.f), "must lie between 0 and 10, got %v", x.x)
		}
	}
	bs := b.Basis
	switch bs.Method {
	case "", "allowable", "partial":
	default:
		v.fail(at("basis.method"), "unknown method %q; want allowable or partial", bs.Method)
	}
	switch bs.Approach {
	case "", "DA1", "DA2":
	default:
		v.fail(at("basis.approach"), "unknown design approach %q; want DA1 or DA2", bs.Approach)
	}
	for _, x := range []struct {
		f string
		x float64
	}{{"basis.rope_efficiency", bs.RopeEfficiency}, {"basis.alpha_cc", bs.AlphaCC}} {
		if math.IsNaN(x.x) || x.x < 0 || x.x > 1 {
			v.fail(at(x.f), "must be zero (default) or a factor up to 1, got %v", x.x)
		}
	}
	for _, x := range []struct {
		f string
		x float64
	}{
		{"basis.rope_factor", bs.RopeFactor}, {"basis.sliding_factor", bs.SlidingFactor},
		{"basis.overturning_factor", bs.OverturningFactor}, {"basis.uplift_factor", bs.UpliftFactor},
		{"basis.bearing_factor", bs.BearingFactor}, {"basis.gamma_g", bs.GammaG},
		{"basis.gamma_q", bs.GammaQ}, {"basis.gamma_r", bs.GammaR},
		{"basis.gamma_g_dst", bs.GammaGdst}, {"basis.gamma_g_stb", bs.GammaGstb}, {"basis.gamma_q_dst", bs.GammaQdst},
		{"basis.gamma_phi", bs.GammaPhi}, {"basis.gamma_c", bs.GammaC}, {"basis.gamma_rh", bs.GammaRh},
		{"basis.gamma_rv", bs.GammaRv}, {"basis.gamma_re", bs.GammaRe},
		{"basis.gamma_concrete", bs.GammaConcrete}, {"basis.gamma_steel", bs.GammaSteel},
	} {
		if math.IsNaN(x.x) || x.x < 0 || (x.x > 0 && x.x < 0.5) || x.x > 20 {
			v.fail(at(x.f), "must be zero (default) or a factor between 0.5 and 20, got %v", x.x)
		}
	}
}
