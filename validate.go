package sagspan

import (
	"errors"
	"fmt"
	"math"
	"reflect"
	"strconv"
	"sync"

	"github.com/sagspan/sagspan/units"
)

// Bounds of a footbridge description, beyond which the methods here are
// not meant to be used (common practice for the trade sagspan serves).
const (
	maxSpan = 1000 * units.Metre // footbridge spans are 20–250 m; well beyond stays out
	// Rope temperatures lie within these in any climate a footbridge meets:
	// the coldest air recorded is near −90 °C, a dark rope in the sun
	// reaches some 30 K above the air.
	minTemperature = units.Temperature(273.15 - 90)
	maxTemperature = units.Temperature(273.15 + 90)
)

// Material bounds of column sections.
const (
	maxConcrete   = 90 * units.Megapascal  // fck of C90/105, EN 1992-1-1 Table 3.1
	maxSteel      = 600 * units.Megapascal // fyk, EN 1992-1-1 3.2.2(3)
	maxSteelRatio = 0.08                   // As/Ac at laps, EN 1992-1-1 9.5.2(3) (from memory)
	// maxStructuralSteel is f_y of S700, the strongest steel EN 1993-1-12
	// covers (from memory).
	maxStructuralSteel = 700 * units.Megapascal
)

// maxSagRatio is the largest dead-load sag ratio accepted: beyond a quarter
// of the span a rope is no longer a walkway a person can use, and the
// parabolic rope statics used for load cases lose accuracy (common practice:
// footbridge sag ratios lie between about 1/25 and 1/8).
const maxSagRatio = 0.25

// minSagRatio is the smallest dead-load sag ratio accepted: the tension of
// a rope grows as 1/sag (H = w l²/8f), so a rope drawn tighter than a
// hundredth of its span carries many times its own weight in tension for
// nothing (common practice, as for maxSagRatio).
const minSagRatio = 0.01

// validator gathers the first error found, naming its field.
type validator struct {
	err error
	// names is the path of the struct rangesAt is in, names[:depth].
	names [16]string
	depth int
}

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
	v.finite(at("site.flood_elevation"), float64(s.Flood.Z))
	v.nonNegative(at("site.freeboard"), float64(s.Freeboard), units.KindLength)
	for i, p := range s.Ground {
		v.finite(at(fmt.Sprintf("site.ground[%d].x", i)), float64(p.X))
		v.finite(at(fmt.Sprintf("site.ground[%d].z", i)), float64(p.Z))
		if v.err == nil && i > 0 && !(p.X > s.Ground[i-1].X) {
			v.fail(at(fmt.Sprintf("site.ground[%d].x", i)), "%s does not lie beyond the point before it (%s): the ground line runs from left to right",
				p.X, s.Ground[i-1].X)
		}
	}

	b.validateFlood(v)

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
	v.rangesAt("", reflect.ValueOf(&b).Elem())
	b.validateBuried(v, Left)
	b.validateBuried(v, Right)
	b.validateGround(v, Left)
	b.validateGround(v, Right)
	b.validateLoads(v)
	b.validateCaseSpecs(v)
	b.validateComfort(v)
	return v.err
}

// validateBanks checks the geometry of both banks only: what a design
// search changes when it tries another anchor or footing size.
func (b Bridge) validateBanks() error {
	v := &validator{}
	b.validateBank(v, "banks.left", b.Banks.Left)
	b.validateBank(v, "banks.right", b.Banks.Right)
	v.rangesAt("banks", reflect.ValueOf(&b.Banks).Elem())
	b.validateBuried(v, Left)
	b.validateBuried(v, Right)
	// The soil, groundwater and dry run of each bank: the groundwater's
	// reach is judged from the lowest base, which a size moves, and the
	// foundation package's refusals depend on the size.
	b.validateGround(v, Left)
	b.validateGround(v, Right)
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
		if v.err == nil && float64(g.Sag) < minSagRatio*float64(b.Site.Span) {
			v.fail(path{f, ".sag"}, "sag %s is less than 1/%.0f of the span %s: a rope that tight carries many times its load in tension; footbridge sag ratios lie between about 1/25 and 1/8",
				g.Sag, 1/minSagRatio, b.Site.Span)
		}
		for j, h := range b.Ropes[:i] {
			if v.err == nil && g.Name == h.Name {
				v.fail(path{f, ".name"}, "%q also names ropes[%d]: a group listed twice counts its ropes twice; give each group once, with all its ropes in its count, and name each group apart", g.Name, j)
			}
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
	b.validateTower(v, f, t)
	b.validateFooting(v, f, t)
	b.validateAnchorage(v, f, k)
}

// validateTower checks the tower's saddle groove, eccentricity settings and
// column section.
func (b Bridge) validateTower(v *validator, f string, t TowerSpec) {
	gf := t.Saddle.GrooveFriction
	if math.IsNaN(gf) || gf < 0 || gf > 2 {
		v.fail(path{f, ".tower.saddle.groove_friction"}, "must be a friction coefficient between 0 and 2, got %v", gf)
	}
	switch t.Saddle.Groove {
	case "":
	case "free", "friction", "clamped":
		if t.Saddle.Kind != "fixed" && t.Saddle.Groove != "clamped" && v.err == nil {
			v.fail(path{f, ".tower.saddle.groove"}, "a %s saddle carries the rope clamped on it (the saddle moves, not the rope); groove %q applies to fixed saddles only",
				t.Saddle.Kind, t.Saddle.Groove)
		}
		if t.Saddle.Groove == "friction" && gf == 0 && v.err == nil {
			v.fail(path{f, ".tower.saddle.groove_friction"}, "is missing: a groove with friction needs the friction coefficient between rope and groove")
		}
	default:
		v.fail(path{f, ".tower.saddle.groove"}, "unknown groove %q; want free, friction or clamped (or leave it out to check both bounds)", t.Saddle.Groove)
	}
	if t.Saddle.Groove != "friction" && gf != 0 && v.err == nil {
		v.fail(path{f, ".tower.saddle.groove_friction"}, "is given but the groove is %q, not \"friction\"", t.Saddle.Groove)
	}
	if math.IsNaN(t.Drag) || t.Drag < 0 || t.Drag > 10 {
		v.fail(path{f, ".tower.drag"}, "must be zero (default) or a force coefficient up to 10, got %v", t.Drag)
	}
	e := t.Eccentricity
	switch e.Form {
	case "", "rope", "statics":
	default:
		v.fail(path{f, ".tower.eccentricity.form"}, "unknown form %q; want rope or statics", e.Form)
	}
	v.nonNegative(path{f, ".tower.eccentricity.section"}, float64(e.Section), units.KindLength)
	if v.err == nil && e.Section >= t.Height {
		v.fail(path{f, ".tower.eccentricity.section"}, "checked section at %s is at or above the saddle at %s: it must lie below where the ropes act", e.Section, t.Height)
	}
	// The limit Fraction × d/2 + Offset must stay positive along the bridge
	// (effective depth) and across it (effective width).
	limitLeft := func(fraction float64) {
		v.finite(path{f, ".tower.eccentricity.offset"}, float64(e.Offset))
		for _, dir := range []struct {
			name string
			d    units.Length
		}{{"along the bridge", t.Depth - 2*t.Facing}, {"across the bridge", t.Width - 2*t.Facing}} {
			if v.err == nil && fraction*float64(dir.d)/2+float64(e.Offset) <= 0 {
				v.fail(path{f, ".tower.eccentricity.offset"}, "%s leaves no allowed eccentricity %s (%.3g × %s/2 + offset ≤ 0)", e.Offset, dir.name, fraction, dir.d)
			}
		}
	}
	if e.Rule != "fraction" && e.Fraction != 0 && v.err == nil {
		v.fail(path{f, ".tower.eccentricity.fraction"}, "is given but the rule is %q, not \"fraction\"", e.Rule)
	}
	switch e.Rule {
	case "", "kern":
		if e.Offset != 0 && v.err == nil {
			v.fail(path{f, ".tower.eccentricity.offset"}, "is given but the rule is the kern, which takes no offset (rule \"section\" or \"fraction\" does)")
		}
	case "section":
		limitLeft(1)
	case "fraction":
		if !(e.Fraction > 0 && e.Fraction <= 1) {
			v.fail(path{f, ".tower.eccentricity.fraction"}, "must lie in (0, 1], got %v", e.Fraction)
		}
		limitLeft(e.Fraction)
	default:
		v.fail(path{f, ".tower.eccentricity.rule"}, "unknown rule %q; want kern, section or fraction", e.Rule)
	}
	sec := t.Section
	if math.IsNaN(sec.Creep) || sec.Creep < 0 || sec.Creep > 10 {
		v.fail(path{f, ".tower.section.creep"}, "must be zero (default) or a creep coefficient up to 10, got %v", sec.Creep)
	}
	switch sec.Type {
	case "", "concrete":
	case "tube", "frame":
		switch sec.Shape {
		case "", "circular", "square":
		default:
			v.fail(path{f, ".tower.section.shape"}, "unknown tube shape %q; want circular or square", sec.Shape)
		}
		v.positive(path{f, ".tower.section.size"}, float64(sec.Size), units.KindLength)
		v.positive(path{f, ".tower.section.wall"}, float64(sec.Wall), units.KindLength)
		if v.err == nil && 2*sec.Wall >= sec.Size {
			v.fail(path{f, ".tower.section.wall"}, "wall %s is half the tube size %s or more", sec.Wall, sec.Size)
		}
		v.positive(path{f, ".tower.section.steel"}, float64(sec.Steel), units.KindPressure)
		if v.err == nil && sec.Steel > maxStructuralSteel {
			v.fail(path{f, ".tower.section.steel"}, "%s is above the %s of the structural steels of EN 1993-1-1 and EN 1993-1-12", sec.Steel, maxStructuralSteel)
		}
		if sec.Type == "frame" {
			v.positive(path{f, ".tower.section.spacing"}, float64(sec.Spacing), units.KindLength)
			if v.err == nil && sec.Spacing <= sec.Size {
				v.fail(path{f, ".tower.section.spacing"}, "legs %s apart overlap: the spacing must exceed the leg size %s", sec.Spacing, sec.Size)
			}
			v.nonNegative(path{f, ".tower.section.panel"}, float64(sec.Panel), units.KindLength)
			if v.err == nil && sec.Panel > t.Height {
				v.fail(path{f, ".tower.section.panel"}, "bracing panel %s is longer than the column", sec.Panel)
			}
		}
		return
	default:
		v.fail(path{f, ".tower.section.type"}, "unknown column type %q; want concrete, tube or frame", sec.Type)
		return
	}
	v.positive(path{f, ".tower.section.concrete"}, float64(sec.Concrete), units.KindPressure)
	if v.err == nil && sec.Concrete > maxConcrete {
		v.fail(path{f, ".tower.section.concrete"}, "%s is above the %s of the strongest concrete class in EN 1992-1-1 Table 3.1", sec.Concrete, maxConcrete)
	}
	if sec.Bars < 0 || sec.Bars%2 != 0 {
		v.fail(path{f, ".tower.section.bars"}, "must be an even number (half on each face), got %d", sec.Bars)
	}
	if v.err == nil && sec.Bars > 0 && sec.Bars < 4 {
		v.fail(path{f, ".tower.section.bars"}, "must be zero (plain concrete) or at least 4, a bar in each corner (EN 1992-1-1 9.5.2(4)), got %d", sec.Bars)
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
}

func (b Bridge) validateFooting(v *validator, f string, t TowerSpec) {
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
}

func (b Bridge) validateAnchorage(v *validator, f string, k Bank) {
	bs := k.Backstay
	v.positive(path{f, ".backstay.horizontal"}, float64(bs.Horizontal), units.KindLength)
	v.finite(path{f, ".backstay.drop"}, float64(bs.Drop))
	if v.err == nil && bs.Drop <= 0 {
		v.fail(path{f, ".backstay.drop"}, "the anchor must lie below the saddle, got a drop of %s (anchor above the saddle)", bs.Drop)
	}

	b.validateAnchor(v, f, k.Anchor)
}

func (b Bridge) validateLoads(v *validator) {
	v.nonNegative(at("loads.crowd"), float64(b.Loads.Crowd), units.KindPressure)
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
}

// limit is the plausible range of one field of a description: a value
// outside it is refused, naming the field and the range. The bounds are in
// SI; kind formats them.
type limit struct {
	lo, hi float64
	kind   units.Kind
	plain  bool // a plain number (float64 or int field), formatted as such
}

// between returns the range lo..hi of a quantity.
func between[T units.Quantity](lo, hi T) limit {
	return limit{lo: float64(lo), hi: float64(hi), kind: lo.Kind()}
}

// plain returns the range lo..hi of a plain number: a count, a factor, a
// coefficient.
func plain(lo, hi float64) limit { return limit{lo: lo, hi: hi, kind: units.KindRatio, plain: true} }

func (l limit) format(x float64) string {
	if l.plain {
		return strconv.FormatFloat(x, 'g', -1, 64)
	}
	return units.Format(x, l.kind)
}

// String gives the range as the field reference and errors write it,
// both ends in one unit.
func (l limit) String() string {
	if l.plain {
		return l.format(l.lo) + " to " + l.format(l.hi)
	}
	lo, hi := units.FormatPair(l.lo, l.hi, l.kind)
	return lo + " to " + hi
}

// limits holds the plausible range of every number in a description, by Go
// type and field name ("RopeSpec.Diameter"). A field tagged omitempty whose
// value is zero is not given, takes its default and is not checked here.
// Every numeric field must have an entry (TestEveryFieldHasALimit): add one
// with every new field. Where a checking package has a bound of its own,
// the range here lies inside it (TestLimitsAgreeWithPackages). The ranges
// are what footbridges are built with (common practice) unless a source
// is named.
var limits = map[string]limit{
	"Site.Span":       between(5*units.Metre, maxSpan),
	"Site.Rise":       between(-300*units.Metre, 300*units.Metre),
	"Site.LeftSaddle": between(-500*units.Metre, 9000*units.Metre),
	"Site.Flood":      between(-500*units.Metre, 9000*units.Metre),
	"Site.Freeboard":  between(0*units.Metre, 30*units.Metre),
	"Point.X":         between(-3000*units.Metre, 4000*units.Metre),
	"Point.Z":         between(-500*units.Metre, 9000*units.Metre),

	"Climate.Reference": between(minTemperature, maxTemperature),
	"Climate.Coldest":   between(minTemperature, maxTemperature),
	"Climate.Hottest":   between(minTemperature, maxTemperature),
	// Basic wind speeds reach about 70 m/s in cyclone regions; the lowest
	// of design use lie near 20 m/s (common practice), so below 10 m/s a
	// value is a slip (km/h, a decimal point), as is a peak velocity
	// pressure below 50 Pa (½ρv² of 10 m/s is 62.5 Pa): a q_p copied in
	// kN/m² without its unit reads as a few pascals.
	"Climate.WindSpeed":    between(10*units.MetrePerSecond, 80*units.MetrePerSecond),
	"Climate.WindPressure": between(50*units.Pascal, 10*units.Kilopascal),
	"Climate.Exposure":     plain(0.5, 5), // ce(z) of EN 1991-1-4 Figure 4.2 lies within about 1 to 4.5

	"Walkway.Width":     between(0.3*units.Metre, 5*units.Metre),
	"Walkway.Depth":     between(0*units.Metre, 3*units.Metre),
	"Walkway.DeadLoad":  between(0.02*units.KilonewtonPerMetre, 30*units.KilonewtonPerMetre),
	"Walkway.WindDepth": between(0*units.Metre, 5*units.Metre),
	// A walkway gradient from 1:50 to 2:1, rise over run.
	"Walkway.GradientLimit": plain(0.02, 2),
	"Part.Load":             between(0*units.KilonewtonPerMetre, 30*units.KilonewtonPerMetre),

	"RopeGroup.Count":  plain(1, 50),
	"RopeGroup.Sag":    between(0.05*units.Metre, 250*units.Metre),
	"RopeGroup.Share":  plain(0, 1),
	"RopeGroup.Offset": between(0*units.Metre, 5*units.Metre),
	// The most loaded of the parallel ropes carries at least an equal share;
	// new rope beds in by 0.25–0.5 % (from memory), well under 2 %.
	"RopeGroup.Sharing":               plain(1, 50),
	"RopeGroup.ConstructionalStretch": plain(0, maxConstructionalStretch),
	"RopeSpec.Diameter":               between(4*units.Millimetre, 120*units.Millimetre),
	"RopeSpec.Grade":                  between(1000*units.Megapascal, 2500*units.Megapascal), // grades 1570 to 2160 of EN 12385-4
	"RopeSpec.MBF":                    between(1*units.Kilonewton, 30*units.Meganewton),
	"RopeSpec.Area":                   between(5*units.SquareMillimetre, 12000*units.SquareMillimetre),
	"RopeSpec.Modulus":                between(50*units.Gigapascal, 210*units.Gigapascal),
	"RopeSpec.Mass":                   between(0.05*units.KilogramPerMetre, 80*units.KilogramPerMetre),
	"RopeSpec.Alpha":                  between(5e-6*units.PerKelvin, 20e-6*units.PerKelvin),

	"TowerSpec.Height":          between(0.5*units.Metre, 60*units.Metre),
	"TowerSpec.Depth":           between(0.15*units.Metre, 5*units.Metre),
	"TowerSpec.Width":           between(0.15*units.Metre, 5*units.Metre),
	"TowerSpec.Facing":          between(0*units.Millimetre, 300*units.Millimetre),
	"TowerSpec.UnitWeight":      between(15*units.KilonewtonPerCubicMetre, 30*units.KilonewtonPerCubicMetre),
	"SaddleSpec.Friction":       plain(0, 0.6),
	"SaddleSpec.GrooveFriction": plain(0, 0.6),
	"SaddleSpec.GrooveDiameter": between(50*units.Millimetre, 5*units.Metre),
	"SectionSpec.Concrete":      between(12*units.Megapascal, maxConcrete), // C12/15 to C90/105, EN 1992-1-1 Table 3.1
	"SectionSpec.Steel":         between(250*units.Megapascal, maxSteel),
	"SectionSpec.Bars":          plain(0, 64),
	"SectionSpec.BarDiameter":   between(6*units.Millimetre, 50*units.Millimetre),
	"SectionSpec.Cover":         between(15*units.Millimetre, 300*units.Millimetre),
	"SectionSpec.Creep":         plain(0, 5), // φ(∞, t0) of EN 1992-1-1 Figure 3.1 stays below about 4
	"SectionSpec.Size":          between(50*units.Millimetre, 2000*units.Millimetre),
	"SectionSpec.Wall":          between(2*units.Millimetre, 100*units.Millimetre),
	"SectionSpec.Spacing":       between(0.1*units.Metre, 10*units.Metre),
	"SectionSpec.Panel":         between(0.1*units.Metre, 60*units.Metre),
	"TowerSpec.Drag":            plain(0.5, 3),
	"EccentricitySpec.Section":  between(0*units.Metre, 60*units.Metre),
	"FootingSpec.Length":        between(0.3*units.Metre, 20*units.Metre),
	"FootingSpec.Width":         between(0.3*units.Metre, 20*units.Metre),
	"FootingSpec.Thickness":     between(0.15*units.Metre, 5*units.Metre),
	"FootingSpec.Depth":         between(0*units.Metre, 10*units.Metre),
	"FootingSpec.ColumnOffset":  between(-10*units.Metre, 10*units.Metre),
	"EccentricitySpec.Fraction": plain(0, 1),
	"EccentricitySpec.Offset":   between(-2*units.Metre, 2*units.Metre),

	"Backstay.Horizontal": between(0.5*units.Metre, 300*units.Metre),
	"Backstay.Drop":       between(0.1*units.Metre, 200*units.Metre),

	"AnchorSpec.Length":       between(0.2*units.Metre, 20*units.Metre),
	"AnchorSpec.Width":        between(0.2*units.Metre, 20*units.Metre),
	"AnchorSpec.Height":       between(0.2*units.Metre, 20*units.Metre),
	"AnchorSpec.Depth":        between(0*units.Metre, 30*units.Metre),
	"AnchorSpec.UnitWeight":   between(15*units.KilonewtonPerCubicMetre, 30*units.KilonewtonPerCubicMetre),
	"AnchorSpec.Passive":      plain(0, 1),
	"AnchorSpec.AttachX":      between(0*units.Metre, 20*units.Metre),
	"AnchorSpec.AttachZ":      between(0*units.Metre, 20*units.Metre),
	"AnchorSpec.Bars":         plain(1, 50),
	"AnchorSpec.BarDiameter":  between(10*units.Millimetre, 75*units.Millimetre),
	"AnchorSpec.BarStrength":  between(200*units.Megapascal, 1200*units.Megapascal),
	"AnchorSpec.HoleDiameter": between(25*units.Millimetre, 400*units.Millimetre),
	"AnchorSpec.BondLength":   between(0.5*units.Metre, 20*units.Metre),
	"AnchorSpec.FreeLength":   between(0*units.Metre, 50*units.Metre),
	"AnchorSpec.BarUltimate":  between(200*units.Megapascal, 1500*units.Megapascal),
	"AnchorSpec.BarSpacing":   between(0*units.Metre, 5*units.Metre),
	// Grout–rock bond stresses of BS 8081 Table 25 run from about 0.1 MPa
	// (weak chalk) to 4 MPa (strong granite) (from memory).
	"AnchorSpec.GroutBond":         between(50*units.Kilopascal, 10*units.Megapascal),
	"AttachmentSpec.Efficiency":    plain(0.5, 1),
	"AttachmentSpec.Rods":          plain(1, 20),
	"AttachmentSpec.RodDiameter":   between(10*units.Millimetre, 150*units.Millimetre),
	"AttachmentSpec.RodSteel":      between(200*units.Megapascal, 1200*units.Megapascal),
	"AttachmentSpec.RodUltimate":   between(200*units.Megapascal, 1500*units.Megapascal),
	"AttachmentSpec.RodThreadArea": between(50*units.SquareMillimetre, 20000*units.SquareMillimetre),
	"AttachmentSpec.PinDiameter":   between(10*units.Millimetre, 2000*units.Millimetre),
	"BeamSpec.Steel":               between(200*units.Megapascal, maxSteel),
	"BeamSpec.PlasticModulus":      between(1e-6*units.CubicMetre, 0.1*units.CubicMetre),
	"BeamSpec.ShearArea":           between(100*units.SquareMillimetre, 0.5*units.SquareMetre),
	"PlateSpec.Side":               between(50*units.Millimetre, 1*units.Metre),
	"PlateSpec.Thickness":          between(5*units.Millimetre, 150*units.Millimetre),
	"PlateSpec.Steel":              between(200*units.Megapascal, maxSteel),

	// A soil lighter than about 12 kN/m³ would float (package foundation
	// needs it heavier than water); φ' up to the 50° its bearing and earth
	// pressure formulas are tabulated for.
	// A given zero counts (presence decides): c' and c_u may be zero, the
	// others not.
	"SoilSpec.UnitWeight":    between(12*units.KilonewtonPerCubicMetre, 30*units.KilonewtonPerCubicMetre),
	"SoilSpec.Submerged":     between(2*units.KilonewtonPerCubicMetre, 25*units.KilonewtonPerCubicMetre),
	"SoilSpec.Saturated":     between(12*units.KilonewtonPerCubicMetre, 32*units.KilonewtonPerCubicMetre),
	"SoilSpec.Friction":      between(0*units.Degree, 50*units.Degree),
	"SoilSpec.Cohesion":      between(0*units.Pascal, 2*units.Megapascal),
	"SoilSpec.Undrained":     between(0*units.Pascal, 2*units.Megapascal), // very soft clay ~10 kPa to hard clay and weak rock
	"SoilSpec.Interface":     plain(0.1, 1),
	"SoilSpec.Allowable":     between(10*units.Kilopascal, 20*units.Megapascal),
	"SoilSpec.RockStrength":  between(1*units.Megapascal, 300*units.Megapascal), // very weak to extremely strong rock
	"SoilSpec.JointSpacing":  between(0.02*units.Metre, 50*units.Metre),
	"SoilSpec.JointAperture": between(0*units.Millimetre, 100*units.Millimetre),
	"SoilSpec.Groundwater":   between(-500*units.Metre, 9000*units.Metre),

	"ComfortSpec.Damping": plain(0.001, maxDamping), // 0.1 % to 20 % of critical

	"Loads.Crowd":           between(1*units.Kilopascal, 10*units.Kilopascal),
	"Loads.WindWithCrowd":   plain(0, 1),
	"Loads.DragCoefficient": plain(0.5, 2.5),
	"Loads.WalkwayDrag":     plain(0.5, 3),
	// The cases the chain adds: c_f,z of EN 1991-1-4 8.3.3 is ±0.9 for a
	// closed deck (from memory), less for an open one; ψ1 of EN 1990 lies
	// within 0 to 1; a suddenly applied load gives at most twice its static
	// effect; shade and sun on a rope differ by up to about 20 K (EN 1991-1-5
	// 6.1.6, from memory); EN 1991-1-6 puts the crew's load near 1 kN/m²
	// (from memory).
	"Loads.WalkwayLift":            plain(0.05, 2),
	"Loads.CrowdInAccident":        plain(0, 1),
	"Loads.BreakDynamic":           plain(1, 3),
	"Loads.SunDifference":          plain(0, 50),
	"Loads.ConstructionLoad":       between(0.1*units.Kilopascal, 5*units.Kilopascal),
	"Stretch.From":                 between(0*units.Metre, maxSpan),
	"Stretch.To":                   between(0*units.Metre, maxSpan),
	"CaseSpec.Temperature":         between(minTemperature, maxTemperature),
	"CaseSpec.BackstayTemperature": between(minTemperature, maxTemperature),

	// Factors of safety are at least 1, as packages cable and foundation
	// require; partial factors within what EN 1990, EN 1997-1 and
	// EN 1992-1-1 and their national annexes use.
	"Basis.RopeFactor":        plain(1, 10),
	"Basis.SlidingFactor":     plain(1, 10),
	"Basis.OverturningFactor": plain(1, 10),
	"Basis.UpliftFactor":      plain(1, 10),
	"Basis.BearingFactor":     plain(1, 10),
	"Basis.GammaG":            plain(1, 2),
	"Basis.GammaGInf":         plain(0.5, 1.5),
	"Basis.MinGrooveRatio":    plain(5, 100),
	"Basis.GammaQ":            plain(1, 2.5),
	"Basis.GammaR":            plain(0.5, 2),
	"Basis.RopeEfficiency":    plain(0.5, 1),
	"Basis.GammaGdst":         plain(1, 2),
	"Basis.GammaGstb":         plain(0.5, 1),
	"Basis.GammaQdst":         plain(1, 2.5),
	"Basis.GammaPhi":          plain(1, 2),
	"Basis.GammaC":            plain(1, 2),
	"Basis.GammaRh":           plain(1, 3),
	"Basis.GammaRv":           plain(1, 3),
	"Basis.GammaRe":           plain(1, 3),
	"Basis.GammaConcrete":     plain(1, 2),
	"Basis.GammaSteel":        plain(1, 2),
	"Basis.AlphaCC":           plain(0.8, 1),
}

// rangeField is one field of a struct type as the range walk sees it.
type rangeField struct {
	index    int
	name     string // JSON name
	optional bool   // omitempty: zero means not given
	lim      *limit // nil: no range (not a number, or a struct or list to walk)
	walk     bool   // a struct, or a list of structs, to walk into
	level    bool   // a Level: its Z is checked unless None
	ptr      bool   // a pointer: nil is not given; a value given is checked, zero too
}

var rangeFields sync.Map // reflect.Type → []rangeField

// fieldsOf returns the range-walk view of struct type t, built once.
func fieldsOf(t reflect.Type) []rangeField {
	if fs, ok := rangeFields.Load(t); ok {
		return fs.([]rangeField)
	}
	var fs []rangeField
	for i := range t.NumField() {
		f := t.Field(i)
		name, optional := jsonName(f)
		if name == "" {
			continue
		}
		rf := rangeField{index: i, name: name, optional: optional}
		if l, ok := limits[t.Name()+"."+f.Name]; ok {
			rf.lim = &l
		}
		ft := f.Type
		if ft.Kind() == reflect.Pointer {
			ft, rf.ptr = ft.Elem(), true
		}
		if ft.Kind() == reflect.Slice {
			ft = ft.Elem()
		}
		rf.level = f.Type == reflect.TypeFor[Level]()
		rf.walk = ft.Kind() == reflect.Struct && !rf.level
		fs = append(fs, rf)
	}
	rangeFields.Store(t, fs)
	return fs
}

// rangesAt checks every number in struct value x, whose path is name
// below the struct rangesAt is in, against its limit; the first value
// outside fails. The path is joined only on failure.
func (v *validator) rangesAt(name string, x reflect.Value) {
	if v.err != nil || v.depth == len(v.names) {
		return
	}
	v.names[v.depth] = name
	v.depth++
	defer func() { v.depth-- }()
	for _, f := range fieldsOf(x.Type()) {
		fv := x.Field(f.index)
		optional := f.optional
		if f.ptr {
			if fv.IsNil() {
				continue
			}
			fv, optional = fv.Elem(), false // presence decides: a zero given is checked
		}
		switch {
		case f.walk && fv.Kind() == reflect.Slice:
			for i := range fv.Len() {
				v.rangesAt(f.name+"["+strconv.Itoa(i)+"]", fv.Index(i))
			}
		case f.walk:
			v.rangesAt(f.name, fv)
		case f.lim == nil:
		case f.level:
			if l := fv.Interface().(Level); !l.None {
				v.within(f.name, float64(l.Z), false, f.lim)
			}
		case fv.CanInt():
			v.within(f.name, float64(fv.Int()), optional, f.lim)
		case fv.CanFloat():
			v.within(f.name, fv.Float(), optional, f.lim)
		}
		if v.err != nil {
			return
		}
	}
}

// within requires x, the field name of the struct rangesAt is in, to lie
// in l; zero passes for an optional field (not given: its default applies).
func (v *validator) within(name string, x float64, optional bool, l *limit) {
	if optional && x == 0 {
		return
	}
	if math.IsNaN(x) || x < l.lo || x > l.hi {
		var prefix string
		for _, n := range v.names[:v.depth] {
			prefix = join(prefix, n)
		}
		v.fail(path{prefix + ".", name}, "%s is outside the plausible range %s", l.format(x), l)
	}
}
