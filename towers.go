package sagspan

import (
	"math"
	"strconv"
	"strings"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// Steel column defaults.
const (
	// steelUnitWeight is the unit weight of structural steel, 77 kN/m³
	// (EN 1991-1-1 Table A.4, from memory).
	steelUnitWeight = 77 * units.KilonewtonPerCubicMetre
	// steelModulus is E of structural steel, EN 1993-1-1 3.2.6.
	steelModulus = 210 * units.Gigapascal
	// circularDrag is the force coefficient of a circular tube in
	// subcritical flow (EN 1991-1-4 7.9, from memory), used for wind on a
	// circular steel column.
	circularDrag = 1.2
)

// steel returns the tube of a steel column (or of each leg of a frame) and
// the number of legs; zero legs for a concrete column.
func (m *model) steel(s Side) (tower.Tube, int) {
	spec := m.bank(s).Tower.Section
	legs := 0
	switch spec.Type {
	case "tube":
		legs = 1
	case "frame":
		legs = 2
	default:
		return tower.Tube{}, 0
	}
	shape := tower.Circular
	if spec.Shape == "square" {
		shape = tower.Square
	}
	return tower.Tube{Shape: shape, Size: spec.Size, Wall: spec.Wall, Fy: spec.Steel, E: steelModulus,
		Code: tower.EN1993, ColdFormed: spec.ColdFormed}, legs
}

// variant is one combination of groove behaviours of the two banks'
// saddles. Where the description does not say how a fixed saddle holds
// the rope, the chain analyses both bounds, a free groove and a clamped
// rope, and each check reports the bound that governs it.
type variant struct {
	grooves [2]tower.Groove
	// label names the behaviours when they are bounds, "" otherwise.
	label string
}

// variants returns the groove behaviours to analyse: one variant when the
// description says how each saddle holds the rope; otherwise every
// combination of the two bounds on the banks that do not say.
func (m *model) variants() []variant {
	var options [2][]tower.Groove
	bounded := false
	for side := Left; side <= Right; side++ {
		g, known := grooveOf(m.bank(side).Tower.Saddle)
		if known {
			options[side] = []tower.Groove{g}
			continue
		}
		options[side] = []tower.Groove{tower.FreeGroove, tower.ClampedGroove}
		bounded = true
	}
	var out []variant
	for _, l := range options[Left] {
		for _, r := range options[Right] {
			v := variant{grooves: [2]tower.Groove{l, r}}
			if bounded {
				var parts []string
				for side := Left; side <= Right; side++ {
					if len(options[side]) > 1 {
						parts = append(parts, side.String()+" saddle "+v.grooves[side].String())
					}
				}
				v.label = strings.Join(parts, ", ")
			}
			out = append(out, v)
		}
	}
	return out
}

// restraint returns how the column top of one bank is held along the
// bridge in the variant analysed, and the lateral stiffness (N/m) holding
// it: a fixed saddle with the rope clamped is held by the stretch of the
// backstays (a spring: see topSpring); a free groove, a groove with
// friction (once the rope renders it no longer braces the top:
// conservative), a sliding or a roller saddle leaves the top free
// (cantilever).
//
// Only a groove the description calls clamped braces the top: where the
// groove is not given, the rope may grip by friction, with moments between
// the free and clamped bounds and, once it renders, no bracing; the clamped
// bound is then checked with a free top too, so that the two bounds bound
// every groove (conservative).
func (m *model) restraint(s Side) (tower.Restraint, float64) {
	g, known := grooveOf(m.bank(s).Tower.Saddle)
	if saddleKind(m.bank(s).Tower.Saddle) == tower.Fixed && known && g == tower.ClampedGroove {
		return tower.SpringTop, m.topSpring(s)
	}
	return tower.FreeTop, 0
}

// topSpring returns the lateral stiffness along the bridge with which the
// clamped ropes hold the top of one bank's column: each group's backstay,
// of axial stiffness EA over its chord c at angle β, resists a sway δ of
// its saddle at height y with EA cos²β/c; referred to the column top
// (length l) by the fourth power of y/l, the square of a sway shape
// (y/l)² that lies below the column's own, so that a lower saddle counts
// for less than it does (conservative). The span side, which slackens as
// the top leans toward it, and the rope tension's own stiffness are not
// counted (conservative).
//
//	K = Σ EA cos²β / c · (y/l)⁴
func (m *model) topSpring(s Side) float64 {
	l := float64(m.column(s).Height)
	var k float64
	for i, g := range m.groups {
		bs := m.backstays[i][s]
		c := math.Cos(float64(bs.angle))
		y := float64(m.saddle(s, g, 0).Height) / l
		k += float64(g.elastic.EA) * c * c / float64(bs.chord) * y * y * y * y
	}
	return k
}

// eccentricity returns the eccentricity settings of one bank's tower in
// direction d.
func (m *model) eccentricity(s Side, d tower.Direction) *tower.Eccentricity {
	spec := m.bank(s).Tower.Eccentricity
	o := &tower.Eccentricity{Direction: d, Section: spec.Section}
	if spec.Form == "statics" {
		o.Form = tower.Statics
	}
	switch spec.Rule {
	case "section":
		o.Limit = &tower.EccentricityLimit{Fraction: 1, Offset: spec.Offset}
	case "fraction":
		o.Limit = &tower.EccentricityLimit{Fraction: spec.Fraction, Offset: spec.Offset}
	}
	return o
}

// saddleBasis names how the saddles of one bank hold the rope, for the
// basis of every tower result.
func (m *model) saddleBasis(s Side) string {
	return "; saddle: " + m.saddle(s, group{}, 0).Behaviour()
}

// towerChecks checks one bank's tower under one case: the resultant of the
// rope forces along and across the bridge (on the characteristic state
// svc), and the column member (on the design state des, with the
// permanent case perm for creep).
func (m *model) towerChecks(out sink, side Side, svc, des, perm CaseState) error {
	return m.towerParts(out, side, svc, des, perm, true, true)
}

// towerParts is towerChecks with the resultant's checks (along, across,
// both at once) only when resultant holds, and the column member's only
// when member does.
func (m *model) towerParts(out sink, side Side, svc, des, perm CaseState, resultant, member bool) error {
	name := svc.Case.Name
	col := m.column(side)
	terse := m.scoring()
	var basis string
	if !terse {
		basis = m.saddleBasis(side)
	}
	_, legs := m.steel(side)
	var ecc [2]check.Result // along, across
	for _, d := range []tower.Direction{tower.Along, tower.Across} {
		if !resultant {
			break
		}
		element := towerElement[side]
		if d == tower.Across {
			element = towerAcrossElement[side]
		}
		res := svc.Tower[side]
		opt := m.eccentricity(side, d)
		opt.Terse = terse
		w := svc.ColumnWind[side]
		var above units.Force
		if d == tower.Across && w != 0 {
			// The wind on the column face loads the column above the
			// checked section only, uniformly: the part above y_c at
			// (H + y_c)/2 takes the place of the whole at H/2.
			hc, yc := float64(col.Height), float64(opt.Section)
			above = units.Force(float64(w) * (hc - yc) / hc)
			res.Lateral += above - w
			res.LateralMoment += units.Moment(float64(above)*(hc+yc)/2 - float64(w)*hc/2)
		}
		r, err := tower.EccentricityCheck(res, col, opt)
		if err != nil {
			return m.bankErr(side, "tower.eccentricity", name, err)
		}
		if d == tower.Along && !terse {
			r = r.WithValues(m.saddleValues(side, svc)...)
		}
		if d == tower.Across && w != 0 {
			r = r.WithValues(check.Of("F_w", "wind on the column face, at mid-height", w),
				check.Of("F_w,c", "wind on the column face above the checked section, at its mid-height", above)).
				WithNote("wind on the column face above the checked section is added to the lateral rope forces (conservative: the rope-line form counts no column weight against it)")
		}
		if legs > 0 {
			// A steel column carries the bending in its members; the
			// resultant is reported, not limited.
			rec := check.Record(r.ID, r.Title, r.Kind, r.Demand)
			rec.Basis, rec.Values, rec.Notes = r.Basis, r.Values, r.Notes
			r = rec.WithNote("a steel column resists this eccentricity by bending (see tower.column_section): the resultant is reported, not limited")
		}
		ecc[d] = r
		if !terse {
			r = r.WithBasis(r.Basis + basis)
		}
		out.add(r.For(element, name))
	}
	if lim := m.eccentricity(side, tower.Along).Limit; resultant && legs == 0 && (lim == nil || lim.Fraction < 1) {
		// The kern is a rhombus: the two directions at once.
		r, err := tower.EccentricityBoth(units.Length(ecc[0].Demand), units.Length(ecc[0].Capacity),
			units.Length(ecc[1].Demand), units.Length(ecc[1].Capacity))
		if err != nil {
			return m.bankErr(side, "tower.eccentricity", name, err)
		}
		if !terse {
			r = r.WithBasis(r.Basis + "; " + strings.SplitN(ecc[0].Basis, ";", 2)[0] + basis)
		}
		out.add(r.For(towerElement[side], name))
	}
	if !member {
		return nil
	}
	res, err := m.member(side, des, perm)
	if err != nil {
		return m.bankErr(side, "tower.section", name, err)
	}
	for _, x := range [...]struct {
		r       check.Result
		element string
	}{{res.Along, towerElement[side]}, {res.Across, towerAcrossElement[side]}, {res.Both, towerElement[side]}} {
		if !terse {
			x.r = x.r.WithBasis(x.r.Basis + basis)
		}
		out.add(x.r.For(x.element, name))
	}
	return nil
}

// scoring reports whether the checks only score their results, reading
// nothing but ratios and statuses: in the loaded-length sweep (terse) and
// in a design search (its foundation basis terse), whose results carry no
// text then.
func (m *model) scoring() bool { return m.terse || m.fbasis.Terse }

// member checks one bank's column member under the design state des:
// axial force and first-order moments at the base from the ropes (and
// wind on the column), the permanent state perm as the quasi-permanent
// actions for creep.
func (m *model) member(side Side, des, perm CaseState) (tower.ColumnResults, error) {
	r, p := des.Tower[side], perm.Tower[side]
	a := tower.ColumnActions{N: r.Vertical, Along: r.BaseMoment, Across: des.LateralMoment[side],
		NQP: p.Vertical, AlongQP: p.BaseMoment, AcrossQP: perm.LateralMoment[side]}
	length := m.column(side).Height
	along, spring := m.restraint(side)
	if tube, legs := m.steel(side); legs > 0 {
		spec := m.bank(side).Tower.Section
		sc := tower.SteelColumn{Tube: tube, Legs: legs, Spacing: spec.Spacing, Panel: spec.Panel,
			Length: length, Along: along, AlongSpring: spring, Across: tower.FreeTop}
		return sc.Check(a)
	}
	rc := m.rcColumn(side, length, along, spring)
	rc.Terse = m.scoring()
	return rc.Check(a)
}

// rcColumn returns the concrete column member of one bank, its effective
// lengths worked out once per variant of groove behaviour (they depend on
// the column and its restraints only); where they cannot be, the column
// as it is, whose Check then says why.
func (m *model) rcColumn(side Side, length units.Length, along tower.Restraint, spring float64) tower.RCColumn {
	if c := &m.columns[side]; c.ok && c.grooves == m.grooves {
		return c.rc
	}
	rc := tower.RCColumn{Section: m.section(side), Length: length, Along: along, AlongSpring: spring, Across: tower.FreeTop,
		Creep: m.bank(side).Tower.Section.Creep}
	if pre, err := rc.WithLengths(); err == nil {
		rc = pre
	}
	m.columns[side] = builtColumn{grooves: m.grooves, rc: rc, ok: true}
	return rc
}

// buildColumns builds the concrete column members of both banks for the
// variant set (see rcColumn).
func (m *model) buildColumns() {
	for side := Left; side <= Right; side++ {
		if _, legs := m.steel(side); legs == 0 {
			along, spring := m.restraint(side)
			m.rcColumn(side, m.column(side).Height, along, spring)
		}
	}
}

// builtColumn is a bank's column member built for a variant of groove
// behaviour.
type builtColumn struct {
	grooves [2]tower.Groove
	rc      tower.RCColumn
	ok      bool
}

// saddleValues returns, for each rope group on one bank, the forces its
// saddle puts on the column and what decides them: the symbols carry the
// group's number (1 for the first group of the description).
func (m *model) saddleValues(side Side, cs CaseState) []check.Value {
	var vals []check.Value
	kind := saddleKind(m.bank(side).Tower.Saddle)
	for i, gs := range cs.Groups {
		t := m.saddleText(i)
		lf := gs.Saddle[side]
		if vals == nil {
			vals = make([]check.Value, 0, len(cs.Groups)*len(t))
		}
		vals = append(vals,
			check.Of(t[0][0], t[0][1], gs.Tension[side]),
			check.Of(t[1][0], t[1][1], gs.Backstay[side]),
			check.Of(t[2][0], t[2][1], lf.Wrap),
			check.Of(t[3][0], t[3][1], lf.Vertical),
			check.Of(t[4][0], t[4][1], gs.Unbalance[side]),
			check.Of(t[5][0], t[5][1], lf.Unbalance),
			check.Of(t[6][0], t[6][1], lf.Horizontal),
		)
		switch kind {
		case tower.Sliding:
			vals = append(vals, check.Of(t[7][0], t[7][1], lf.Limit))
			fallthrough
		case tower.Roller:
			vals = append(vals, check.Of(t[8][0], t[8][1], lf.Offset))
		}
		if s := m.saddle(side, m.groups[i], 0); s.Kind == tower.Fixed && s.Groove == tower.FrictionGroove && lf.Wrap > 0 {
			if k2, err := tower.CapstanBound(s.GrooveFriction, lf.Wrap); err == nil {
				vals = append(vals, check.Of(t[9][0], t[9][1], units.Ratio(k2)))
			}
		}
	}
	return vals
}

// saddleText returns the symbols and meanings of group i's saddle values
// (see saddleValues), built once per model.
func (m *model) saddleText(i int) *[10][2]string {
	return &m.saddleTexts[i]
}

// saddleTexts builds the symbols and meanings of every group's saddle
// values.
func saddleTexts(gs []group) [][10][2]string {
	out := make([][10][2]string, len(gs))
	for i, g := range gs {
		k := strconv.Itoa(i + 1)
		of := " at the " + g.Name + " saddle"
		out[i] = [10][2]string{
			{"T_s," + k, "span-side rope tension" + of},
			{"T_b," + k, "backstay tension" + of},
			{"θ_" + k, "wrap angle of the rope" + of},
			{"V_" + k, "vertical force on the column" + of},
			{"H_u0," + k, "unbalanced horizontal force of the ropes had nothing moved (before friction or rendering)" + of},
			{"H_u," + k, "unbalanced horizontal force of the ropes as they settle" + of},
			{"H_" + k, "horizontal force reaching the column" + of},
			{"μN_" + k, "friction limit of the sliding saddle" + of},
			{"Δ_" + k, "travel of the saddle from its reference place, toward the span" + of},
			{"e^μθ_" + k, "largest tension ratio the groove holds (rope-friction law)" + of},
		}
	}
	return out
}

// merged gathers the results of the variants of groove behaviour into one
// report: for every check (identifier, element, case, and its order among
// equals) the worst variant's result, with a note naming the behaviour
// that governs it.
type merged struct {
	results []check.Result
	index   map[string]int
	seen    map[string]int
}

func (g *merged) add(r check.Result, label string) {
	if g.index == nil {
		g.index, g.seen = map[string]int{}, map[string]int{}
	}
	base := r.ID + "\x00" + r.Element + "\x00" + r.Case
	key := base + "\x00" + strconv.Itoa(g.seen[base+"\x00"+label])
	g.seen[base+"\x00"+label]++
	if label != "" {
		r = r.WithNote("saddle behaviour not given: the bounds free groove and rope clamped were both checked; this is the one that governs: " + label)
	}
	i, ok := g.index[key]
	if !ok {
		g.index[key] = len(g.results)
		g.results = append(g.results, r)
		return
	}
	if worseOf(r, g.results[i]) {
		g.results[i] = r
	}
}

// worseOf reports whether a is worse than b: by status and ratio, and for
// results with no limit by the larger demand.
func worseOf(a, b check.Result) bool {
	if a.NoLimit && b.NoLimit && a.Status == b.Status {
		return a.Demand > b.Demand
	}
	return check.Worse(a, b)
}
