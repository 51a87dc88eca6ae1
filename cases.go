package sagspan

import (
	"fmt"
	"strings"

	"github.com/sagspan/sagspan/units"
)

// Stretch is a part of the span between two abscissae measured from the
// left saddle. The zero Stretch is empty.
type Stretch struct {
	// From is where the stretch begins, from the left saddle.
	From units.Length `json:"from"`
	// To is where it ends, from the left saddle; beyond From.
	To units.Length `json:"to"`
}

// Length returns the length of the stretch, zero when it is empty.
func (s Stretch) Length() units.Length { return max(s.To-s.From, 0) }

// Empty reports whether the stretch covers nothing.
func (s Stretch) Empty() bool { return !(s.To > s.From) }

// Situation is the EN 1990 design situation of a load case.
type Situation int

// The design situations (EN 1990:2002 3.2).
const (
	// Persistent: the bridge in use (fundamental combination, EN 1990
	// 6.4.3.2).
	Persistent Situation = iota
	// Accidental: one walkway rope broken (accidental combination, EN 1990
	// 6.4.3.3, all partial factors 1).
	Accidental
	// Construction: the transient situation while the walkway is placed
	// on the bare ropes (EN 1990 6.4.3.2 with the construction loads of
	// EN 1991-1-6).
	Construction
)

func (s Situation) String() string {
	switch s {
	case Accidental:
		return "accidental"
	case Construction:
		return "construction"
	}
	return "persistent"
}

// LoadCase is one load case or combination: which actions are present,
// where, at what rope temperatures, and with which load factors (all 1 on
// characteristic loads).
type LoadCase struct {
	Name      string
	Situation Situation
	// Crowd is the stretch of walkway the crowd stands on; empty for no
	// crowd. Its pressure is CrowdPressure when set, else EN 1991-2
	// cl. 5.3.2.1 for the stretch's own length (or the bridge's own crowd
	// value). In the construction stage it is the crew on the placed
	// walkway.
	Crowd         Stretch
	CrowdPressure units.Pressure
	// CrowdFactor is the combination factor on the crowd: 1 when it leads,
	// ψ1 in the accidental combination.
	CrowdFactor float64
	// Wind is the combination factor on the wind: 0 for none, 1 when it
	// leads, ψ0 when it accompanies the crowd.
	Wind float64
	// Lift adds the upward wind force on the walkway (EN 1991-1-4 8.3.3)
	// to the wind; the permanent load then acts favourably.
	Lift bool
	// Temperature is the rope temperature of the span; BackstayTemperature,
	// when not zero, that of the backstays (sun on the span, shade on the
	// backstays).
	Temperature         units.Temperature
	BackstayTemperature units.Temperature
	// Broken is the number of ropes broken in the group named BrokenGroup
	// (an accidental case).
	Broken      int
	BrokenGroup string
	// Deck, in the construction stage, is the stretch on which the walkway
	// has been placed; elsewhere the ropes are bare. Outside the
	// construction stage the whole walkway is in place.
	Deck Stretch
	// GammaG, GammaQ and GammaW are the partial factors on the permanent
	// load, the crowd and the wind: all 1 on characteristic loads.
	GammaG, GammaQ, GammaW float64
	// Flood puts the water at the design flood (site.flood_elevation) at
	// every footing and anchor it reaches: buoyancy, submerged soil and
	// effective stresses in the ground checks.
	Flood bool
}

// crowded reports whether people stand on the walkway in this case.
func (lc LoadCase) crowded() bool { return !lc.Crowd.Empty() && lc.CrowdFactor > 0 }

// windy reports whether the wind acts in this case.
func (lc LoadCase) windy() bool { return lc.Wind > 0 }

// describe says in words what acts in the case: the crowd and where, the
// wind, the rope temperatures, ropes broken, the situation.
func (lc LoadCase) describe(b Bridge) string {
	var parts []string
	if lc.Situation == Construction {
		parts = append(parts, "new bare ropes as the erection table sets them (free to render over fixed saddles, before their constructional stretch: cautious), walkway placed "+lc.Deck.describe(b.Site.Span))
	}
	switch {
	case lc.crowded() && lc.CrowdPressure > 0:
		parts = append(parts, fmt.Sprintf("%s on %s", lc.CrowdPressure, lc.Crowd.describe(b.Site.Span)))
	case lc.crowded():
		q := b.crowd(lc.Crowd.Length())
		parts = append(parts, fmt.Sprintf("crowd %s on %s", q, lc.Crowd.describe(b.Site.Span)))
		if lc.CrowdFactor != 1 {
			parts[len(parts)-1] += fmt.Sprintf(" × ψ %.2g", lc.CrowdFactor)
		}
	default:
		parts = append(parts, "no crowd")
	}
	if lc.windy() {
		w := fmt.Sprintf("wind × %.2g", lc.Wind)
		if lc.Lift {
			w += " with its upward force on the walkway"
		}
		parts = append(parts, w)
	}
	t := "ropes at " + lc.Temperature.String()
	if lc.BackstayTemperature != 0 && lc.BackstayTemperature != lc.Temperature {
		t = "span ropes at " + lc.Temperature.String() + ", backstays at " + lc.BackstayTemperature.String()
	}
	parts = append(parts, t)
	if lc.Flood {
		parts = append(parts, "water at the design flood at the footings and anchors it reaches")
	}
	if lc.Broken > 0 {
		parts = append(parts, fmt.Sprintf("%d rope of %s broken", lc.Broken, lc.BrokenGroup))
	}
	if lc.Situation != Persistent {
		parts = append(parts, lc.Situation.String()+" situation")
	}
	return strings.Join(parts, ", ")
}

// describe says where the stretch lies on a span of length l.
func (s Stretch) describe(l units.Length) string {
	switch {
	case s.From <= 0 && s.To >= l:
		return "the whole span"
	case s.From <= 0:
		return fmt.Sprintf("%s from the left saddle", s.To)
	case s.To >= l:
		return fmt.Sprintf("%s to the right saddle", l-s.From)
	}
	return fmt.Sprintf("%s to %s from the left saddle", s.From, s.To)
}

// describe says what the family searches.
func (f LoadedLength) describe(b Bridge) string {
	var where []string
	for _, p := range f.Placements {
		where = append(where, p.String())
	}
	what := "crowd (EN 1991-2 5.3.2.1 pressure of each loaded length, or the description's own)"
	if f.deck() {
		what = fmt.Sprintf("walkway placed on the new bare ropes as the erection table sets them (free to render over fixed saddles, before their constructional stretch: cautious) with %s of crew and tools on it", f.Base.CrowdPressure)
	}
	return fmt.Sprintf("%s on every loaded length %s; ropes at %s; each check reports its worst stretch (%d lengths swept per placement, refined to %.2g of the span)",
		what, strings.Join(where, ", "), f.Base.Temperature, sweepPoints, refineTol)
}

// Placement says where a searched stretch lies on the span.
type Placement int

// The placements a loaded-length search tries (EN 1991-2 5.3.2.1: the
// load on the unfavourable parts of the influence surface).
const (
	FromLeft  Placement = iota // a stretch starting at the left saddle
	FromRight                  // a stretch ending at the right saddle
	Central                    // a stretch centred on midspan
)

// stretch returns the stretch of length a on a span of length l.
func (p Placement) stretch(a, l units.Length) Stretch {
	switch p {
	case FromRight:
		return Stretch{From: l - a, To: l}
	case Central:
		return Stretch{From: (l - a) / 2, To: (l + a) / 2}
	}
	return Stretch{From: 0, To: a}
}

func (p Placement) String() string {
	switch p {
	case FromRight:
		return "from the right"
	case Central:
		return "at midspan"
	}
	return "from the left"
}

// LoadedLength is a family of load cases searched over the loaded length:
// the crowd (or, in the construction stage, the placed walkway) on a
// stretch from either end or centred on midspan, of any length up to the
// span, each length with its own EN 1991-2 pressure. For every check the
// whole-bridge check reports the stretch that gives it the highest
// utilisation.
type LoadedLength struct {
	// Name heads the case names of the family: "crowd" or "deck placed".
	Name string
	// Base is the load case the stretch is applied to: temperatures,
	// wind, situation and factors. Its Crowd (Deck in the construction
	// stage) is replaced by each searched stretch.
	Base LoadCase
	// Placements lists where the stretches lie.
	Placements []Placement
	// Label follows the stretch in the case names: "coldest rope".
	Label string
}

// deck reports whether the family searches the placed walkway of the
// construction stage rather than the crowd.
func (f LoadedLength) deck() bool { return f.Base.Situation == Construction }

// at returns the family's case with the stretch of length a at p on a span
// of length l, named after it.
func (f LoadedLength) at(p Placement, a, l units.Length) LoadCase {
	lc := f.Base
	s := p.stretch(a, l)
	if f.deck() {
		lc.Deck = s
		lc.Crowd = s // the crew stands on the placed walkway
	} else {
		lc.Crowd = s
	}
	lc.Name = f.caseName(p, float64(a/l))
	return lc
}

// caseName names the case of fraction r of the span at p:
// "crowd 0.32 L from the left, coldest rope", "crowd over the whole span, ...".
func (f LoadedLength) caseName(p Placement, r float64) string {
	var s string
	switch {
	case r >= 1-1e-12:
		s = f.Name + " over the whole span"
	case r <= 0 && f.deck():
		s = "bare ropes"
	case r <= 0:
		s = "no " + f.Name
	default:
		s = fmt.Sprintf("%s %.2f L %s", f.Name, r, p)
	}
	if f.Label != "" {
		s += ", " + f.Label
	}
	return s
}

// Default load factors of the partial-factor basis. The allowable basis
// takes its factors of safety from the checking packages' defaults
// (cable.DefaultGlobalFactor, foundation.Basis), each documented there.
const (
	// Partial-factor basis: EN 1990 Table A2.4(B) (from memory, as in
	// EN 1997-1 Annex A set A1): γG 1.35 unfavourable, 1.0 favourable,
	// γQ 1.5 on the crowd, the wind and the construction loads.
	defaultGammaG    = 1.35
	defaultGammaGInf = 1.0
	defaultGammaQ    = 1.5
)

func (b Bridge) partial() bool { return b.Basis.Method == "partial" }

// Names of the default cases and families a description may leave out
// with loads.omit.
const (
	casePermanent     = "permanent"
	casePermanentCold = "permanent, coldest rope"
	casePermanentHot  = "permanent, hottest rope"
	caseWind          = "wind"
	caseWindCold      = "wind, coldest rope"
	caseWindHot       = "wind, hottest rope"
	caseWindCrowd     = "wind with crowd"
	caseWindLeading   = "wind leading, crowd accompanying"
	caseLift          = "wind lifting the walkway"
	caseSun           = "sun on the span, shade on the backstays"
	caseFlood         = "flood with crowd"
	familyCrowd       = "crowd"
	familyDeck        = "deck placed"
)

// brokenCaseName names the accidental case of group g.
func brokenCaseName(group string) string { return "one rope broken: " + group }

// defaultCase is one default case, present when its condition holds.
type defaultCase struct {
	lc      LoadCase
	present bool
}

// Cases returns the fixed load cases the bridge is checked for, in report
// order: the defaults below that the description does not omit, then the
// description's own cases (loads.cases).
//
//	permanent                         G                     reference temperature
//	permanent, coldest/hottest rope   G                     coldest / hottest
//	wind; wind, coldest/hottest rope  G + W                 reference / coldest / hottest
//	wind with crowd                   G + Q + ψ0 W          reference, crowd on the whole span
//	wind leading, crowd accompanying  G + W + ψ0 Q          reference, crowd ψ0 0.4 on the whole span
//	wind lifting the walkway          G (favourable) + W    reference, with the upward force on the walkway
//	sun on the span, ...              G + Q                 span hottest, backstays cooler by loads.sun_difference
//	                                                        (not below the coldest)
//	one rope broken: GROUP            G + ψ1 Q + ψ2 T       ψ2 0.5 of the way from the reference to the coldest,
//	                                  (accidental)          crowd on the whole span
//	flood with crowd                  G + Q                 reference, crowd on the whole span, water at the design flood
//
// On the partial-factor basis G, Q and W carry γG (1.0 where favourable),
// γQ and γQ; the accidental case carries 1 throughout (EN 1990 6.4.3.3).
// The wind cases are left out when no wind is given, the broken-rope case
// for groups of one rope. The crowd on every loaded length and the
// construction stage are searched families (see LoadedLengths). The first
// case is always the permanent one at the reference temperature.
func (b Bridge) Cases() []LoadCase {
	c := b.Climate
	l := b.Site.Span
	whole := Stretch{0, l}
	psi := orDefault(b.Loads.WindWithCrowd, defaultWindWithCrowd)
	wind := b.wind() > 0
	// The shaded backstays are cooler than the sunlit span, but never
	// below the coldest rope temperature the site gives.
	shade := max(c.Hottest-units.Temperature(b.sunDifference()), c.Coldest)
	defaults := []defaultCase{
		{LoadCase{Name: casePermanent, Temperature: c.Reference}, true},
		{LoadCase{Name: casePermanentCold, Temperature: c.Coldest}, c.Coldest != c.Reference},
		{LoadCase{Name: casePermanentHot, Temperature: c.Hottest}, c.Hottest != c.Reference},
		{LoadCase{Name: caseWind, Wind: 1, Temperature: c.Reference}, wind},
		{LoadCase{Name: caseWindCold, Wind: 1, Temperature: c.Coldest}, wind && c.Coldest != c.Reference},
		{LoadCase{Name: caseWindHot, Wind: 1, Temperature: c.Hottest}, wind && c.Hottest != c.Reference},
		{LoadCase{Name: caseWindCrowd, Crowd: whole, CrowdFactor: 1, Wind: psi, Temperature: c.Reference}, wind},
		// EN 1990 6.4.3.2: each variable action leads in turn; with the
		// wind leading the crowd accompanies it at its ψ0.
		{LoadCase{Name: caseWindLeading, Crowd: whole, CrowdFactor: defaultCrowdWithWind, Wind: 1, Temperature: c.Reference}, wind},
		{LoadCase{Name: caseLift, Wind: 1, Lift: true, Temperature: c.Reference}, wind},
		{LoadCase{Name: caseSun, Crowd: whole, CrowdFactor: 1, Temperature: c.Hottest,
			BackstayTemperature: shade}, shade < c.Hottest},
		// The design flood at the foundations, with a crowd watching it
		// from the walkway (common practice: people gather on a bridge in
		// a flood).
		{LoadCase{Name: caseFlood, Crowd: whole, CrowdFactor: 1, Temperature: c.Reference, Flood: true}, true},
	}
	var cases []LoadCase
	for _, d := range defaults {
		if d.present && !b.omitted(d.lc.Name) {
			cases = append(cases, d.lc)
		}
	}
	for _, g := range b.Ropes {
		name := brokenCaseName(g.Name)
		if g.Role != RoleWalkway || g.Count < 2 || b.omitted(name) {
			continue
		}
		cases = append(cases, LoadCase{Name: name, Situation: Accidental, Crowd: whole,
			CrowdFactor: b.crowdInAccident(), Temperature: b.accidentTemperature(), Broken: 1, BrokenGroup: g.Name})
	}
	for _, spec := range b.Loads.Cases {
		cases = append(cases, spec.loadCase(b))
	}
	for i := range cases {
		cases[i] = b.factored(cases[i], b.partial())
	}
	return cases
}

// LoadedLengths returns the families of load cases searched over the
// loaded length, unless omitted (loads.omit "crowd" or "deck placed"):
//
//	crowd, coldest rope    G + Q on a stretch    coldest, from either end or centred
//	crowd, hottest rope    G + Q on a stretch    hottest
//	deck placed            bare ropes + walkway and crew on a stretch from one bank (construction), coldest
//
// The construction stage is the new rope as the erection table sets it
// (free to render over fixed saddles, not yet stretched by its
// constructional stretch) at the coldest rope temperature: the walkway may
// be placed in any season, and a colder, shorter rope pulls harder on
// everything the stage loads (cautious: on the test bridges the cold raised
// every construction result and the heat lowered it).
//
// The crowd is combined with the extreme rope temperatures at full value:
// conservative against EN 1990's ψ0 = 0.6 on thermal actions (Table A2.2,
// from memory); a check whose worst temperature lies between the extremes
// is not searched there. When coldest and hottest coincide with the
// reference, one family covers them.
func (b Bridge) LoadedLengths() []LoadedLength {
	c := b.Climate
	var out []LoadedLength
	all := []Placement{FromLeft, FromRight, Central}
	if !b.omitted(familyCrowd) {
		temps := []struct {
			t     units.Temperature
			label string
		}{{c.Coldest, "coldest rope"}, {c.Hottest, "hottest rope"}}
		if c.Coldest == c.Hottest {
			temps = temps[:1]
			temps[0].label = ""
		}
		for _, t := range temps {
			out = append(out, LoadedLength{Name: familyCrowd, Label: t.label, Placements: all,
				Base: b.factored(LoadCase{CrowdFactor: 1, Temperature: t.t}, b.partial())})
		}
	}
	if !b.omitted(familyDeck) {
		p, bank := FromLeft, "left"
		if b.Loads.DeckFrom == "right" {
			p, bank = FromRight, "right"
		}
		label := "from the " + bank + " bank (construction)"
		if c.Coldest != c.Reference {
			label += ", coldest rope"
		}
		out = append(out, LoadedLength{Name: familyDeck, Label: label,
			Placements: []Placement{p},
			Base: b.factored(LoadCase{Situation: Construction, CrowdFactor: 1,
				CrowdPressure: b.constructionLoad(), Temperature: c.Coldest}, b.partial())})
	}
	return out
}

// factored returns lc with the partial factors of the partial-factor basis
// when design is true (EN 1990 Table A2.4(B), from memory), and with all
// factors 1 otherwise (characteristic loads). Accidental cases carry 1
// throughout (EN 1990 Table A2.5, from memory); the permanent load is
// favourable where the wind lifts the walkway.
func (b Bridge) factored(lc LoadCase, design bool) LoadCase {
	lc.GammaG, lc.GammaQ, lc.GammaW = 1, 0, 0
	if lc.crowded() {
		lc.GammaQ = 1
	}
	if lc.windy() {
		lc.GammaW = 1
	}
	if !design || lc.Situation == Accidental {
		return lc
	}
	gQ := orDefault(b.Basis.GammaQ, defaultGammaQ)
	lc.GammaG = orDefault(b.Basis.GammaG, defaultGammaG)
	if lc.Lift {
		lc.GammaG = orDefault(b.Basis.GammaGInf, defaultGammaGInf)
	}
	if lc.crowded() {
		lc.GammaQ = gQ
	}
	if lc.windy() {
		lc.GammaW = gQ
	}
	return lc
}

// characteristic returns the case with every load factor 1 (0 for absent
// actions): the serviceability form used for clearance, drawing and the
// permanent/variable split of anchor pulls.
func (m *model) characteristic(lc LoadCase) LoadCase { return m.b.factored(lc, false) }

// designCase returns the case with the factors of the partial-factor basis
// (EN 1990 set B), whatever the bridge's basis: the column sections are
// always checked on design actions.
func (m *model) designCase(lc LoadCase) LoadCase { return m.b.factored(lc, true) }

// omitted reports whether the description leaves out the default case or
// family of that name.
func (b Bridge) omitted(name string) bool {
	for _, o := range b.Loads.Omit {
		if strings.EqualFold(strings.TrimSpace(o), name) {
			return true
		}
	}
	return false
}

// defaultNames lists the names loads.omit accepts.
func (b Bridge) defaultNames() []string {
	names := []string{casePermanentCold, casePermanentHot, caseWind, caseWindCold, caseWindHot,
		caseWindCrowd, caseWindLeading, caseLift, caseSun, caseFlood, familyCrowd, familyDeck}
	for _, g := range b.Ropes {
		if g.Role == RoleWalkway {
			names = append(names, brokenCaseName(g.Name))
		}
	}
	return names
}

// CaseSpec is a load case of the description's own (loads.cases). Actions
// maps each variable action present to its combination factor (1 when it
// leads, ψ when it accompanies):
//
//	"crowd"  pedestrians on Crowd (the whole span when Crowd is not given)
//	"wind"   wind on the ropes and the walkway
//	"lift"   wind with the upward force on the walkway (EN 1991-1-4 8.3.3);
//	         its factor applies to the whole wind, so "wind" is not given with it
//
// The permanent load is always present.
type CaseSpec struct {
	// Name names the case in the report; it must differ from every other
	// case's.
	Name string `json:"name"`
	// Actions maps each variable action present ("crowd", "wind", "lift")
	// to its combination factor: 1 when it leads, ψ when it accompanies.
	Actions map[string]float64 `json:"actions,omitempty"`
	// Crowd places the crowd; zero means the whole span.
	Crowd Stretch `json:"crowd,omitempty"`
	// Temperature is the span's rope temperature; zero means the reference.
	Temperature units.Temperature `json:"temperature,omitempty"`
	// BackstayTemperature, when given, is the backstays'.
	BackstayTemperature units.Temperature `json:"backstay_temperature,omitempty"`
	// Situation is "persistent" (default) or "accidental" (all partial
	// factors 1).
	Situation string `json:"situation,omitempty"`
}

// Actions a CaseSpec may name.
var caseActions = []string{"crowd", "wind", "lift"}

// loadCase returns the case the spec describes (unfactored), for a
// validated bridge.
func (s CaseSpec) loadCase(b Bridge) LoadCase {
	lc := LoadCase{Name: s.Name, Temperature: s.Temperature, BackstayTemperature: s.BackstayTemperature}
	if lc.Temperature == 0 {
		lc.Temperature = b.Climate.Reference
	}
	if s.Situation == "accidental" {
		lc.Situation = Accidental
	}
	if f, ok := s.Actions["crowd"]; ok && f > 0 {
		lc.CrowdFactor = f
		lc.Crowd = s.Crowd
		if lc.Crowd.Empty() {
			lc.Crowd = Stretch{0, b.Site.Span}
		}
	}
	if f := s.Actions["wind"]; f > 0 {
		lc.Wind = f
	}
	if f := s.Actions["lift"]; f > 0 { // validation refuses wind and lift together
		lc.Wind, lc.Lift = f, true
	}
	return lc
}
