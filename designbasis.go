package sagspan

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"fmt"
	"math"
	"reflect"
	"runtime/debug"
	"strings"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

// modulePath is this library's module path.
const modulePath = "github.com/sagspan/sagspan"

// Version returns the module path and version of the sagspan that is
// running, as the build records it: a release version when sagspan is a
// dependency, "(devel)" with the source revision when it is built from its
// own repository.
func Version() string {
	info, ok := debug.ReadBuildInfo()
	if !ok {
		return modulePath + " (version unknown)"
	}
	version := ""
	if info.Main.Path == modulePath {
		version = info.Main.Version
		var rev, modified string
		for _, s := range info.Settings {
			switch s.Key {
			case "vcs.revision":
				rev = s.Value
			case "vcs.modified":
				if s.Value == "true" {
					modified = ", modified"
				}
			}
		}
		if len(rev) > 12 {
			rev = rev[:12]
		}
		if rev != "" {
			version += " (revision " + rev + modified + ")"
		}
	}
	for _, d := range info.Deps {
		if d.Path == modulePath {
			version = d.Version
		}
	}
	if version == "" {
		version = "(version unknown)"
	}
	return modulePath + " " + version
}

// Digest returns the SHA-256 of the description written canonically
// (MarshalJSON), in hexadecimal: two descriptions with the same digest
// describe the same bridge, however their files were laid out.
func (b Bridge) Digest() string {
	data, err := json.Marshal(b)
	if err != nil {
		return "(no digest: " + err.Error() + ")"
	}
	sum := sha256.Sum256(data)
	return hex.EncodeToString(sum[:])
}

// BasisEntry is one line of the design basis: an input as given, a value
// resolved from a catalogue, preset or default, or a load derived from
// them, with where it came from.
type BasisEntry struct {
	// Name is the field's path ("site.span") or what the value is
	// ("crowd pressure on the full span").
	Name string `json:"name"`
	// Value is the value in SI, when it is a number; Unit its SI unit.
	Value *float64 `json:"value,omitempty"`
	Unit  string   `json:"unit,omitempty"`
	// Text is the value as the report shows it.
	Text string `json:"text"`
	// Formula gives how a derived value is found, with the numbers.
	Formula string `json:"formula,omitempty"`
	// Source says where the value comes from: "given", "not given: the
	// default applies", a catalogue, a preset, a clause.
	Source string `json:"source,omitempty"`
}

// BasisGroup is a titled group of entries.
type BasisGroup struct {
	Title   string       `json:"title"`
	Entries []BasisEntry `json:"entries"`
}

// DesignBasis is what a checker needs before the results: what produced
// the report and from which description, the description as given, the
// ropes and soils as resolved with where each value came from, the loads
// derived from them with their formulas and sources, the load cases, and
// the basis of verification with its factors.
type DesignBasis struct {
	Bridge  string `json:"bridge"`
	Library string `json:"library"`
	// Digest is Bridge.Digest of the description checked.
	Digest string `json:"digest"`
	// Source names the description's file, when known (Analysis.Source).
	Source string `json:"source,omitempty"`
	// Inputs are the description's fields as given, by path.
	Inputs []BasisEntry `json:"inputs"`
	// Resolved holds the ropes, soils, derived loads, load cases and
	// factors, one group each.
	Resolved []BasisGroup `json:"resolved"`
}

func si(x float64, k units.Kind) (*float64, string) {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return nil, k.SI()
	}
	return &x, k.SI()
}

// entry returns a numeric entry of kind k.
func entry(name string, x float64, k units.Kind, formula, source string) BasisEntry {
	v, u := si(x, k)
	if k == units.KindRatio {
		u = ""
	}
	return BasisEntry{Name: name, Value: v, Unit: u, Text: units.Format(x, k), Formula: formula, Source: source}
}

// givenOr returns "given (path)" when x is set, else "default: " + def.
func givenOr(x float64, path, def string) string {
	if x != 0 {
		return "given (" + path + ")"
	}
	return "default: " + def
}

// DesignBasis returns the design basis of the analysis.
func (a *Analysis) DesignBasis() DesignBasis {
	b := a.Bridge
	db := DesignBasis{Bridge: b.Name, Library: Version(), Digest: b.Digest(), Source: a.Source}
	walkValues(reflect.ValueOf(b), "", func(fi fieldInfo, v reflect.Value) {
		e := BasisEntry{Name: fi.Path, Text: formatLeaf(v), Source: "given"}
		if v.Kind() == reflect.String {
			e.Text = v.String() // as given, without the quotes the tables show
		}
		if q, ok := v.Interface().(kinded); ok {
			e.Value, e.Unit = si(v.Float(), q.Kind())
		} else if l, ok := v.Interface().(Level); ok && !l.None {
			e.Value, e.Unit = si(float64(l.Z), units.KindLength)
		}
		if fi.Optional && v.IsZero() {
			e.Text, e.Value, e.Unit, e.Source = "", nil, "", "not given: the default applies"
		}
		db.Inputs = append(db.Inputs, e)
	})
	db.Resolved = append(db.Resolved, a.ropesUsed(), a.soilsUsed(), a.derivedLoads(), a.loadCases(), a.factors())
	return db
}

// ropesUsed lists each rope group's rope as the analysis uses it.
func (a *Analysis) ropesUsed() BasisGroup {
	g := BasisGroup{Title: "Ropes as used"}
	gs, err := a.Bridge.groups()
	if err != nil {
		return g
	}
	for i, grp := range gs {
		r := grp.rope
		src := "catalogue " + strings.TrimSpace(grp.Rope.Construction)
		first := src + ": F_min = K d² R_r, A = C d², m = W d²/100 (rope makers' data in the form of EN 12385-4)"
		if grp.Rope.MBF > 0 {
			src = fmt.Sprintf("given (ropes[%d].rope)", i)
			first = src
		}
		n := grp.Name + ": "
		g.Entries = append(g.Entries,
			BasisEntry{Name: n + "rope", Text: fmt.Sprintf("%d × %s", grp.Count, r.Name), Source: first},
			entry(n+"minimum breaking force of one rope", float64(r.MBF), units.KindForce, "", src),
			entry(n+"metallic area of one rope", float64(r.Area), units.KindArea, "", src),
			entry(n+"modulus", float64(r.Modulus), units.KindPressure, "", src),
			entry(n+"axial stiffness EA of the group", float64(grp.elastic.EA), units.KindAxialStiffness,
				fmt.Sprintf("n E A = %d × %s × %s", grp.Count, r.Modulus, r.Area), "derived"),
			entry(n+"mass of one rope", float64(r.Mass), units.KindMassPerLength, "", src),
			entry(n+"thermal expansion", float64(r.Alpha), units.KindThermalExpansion, "", src),
			entry(n+"share of the walkway's dead load and crowd", grp.share, units.KindRatio, "",
				givenOr(grp.Share, fmt.Sprintf("ropes[%d].share", i), "walkway groups in proportion to their rope count, handrail groups none")),
		)
	}
	return g
}

// soilsUsed lists every parameter of each bank's soil as the analysis
// uses it and where it came from: the description or the preset.
func (a *Analysis) soilsUsed() BasisGroup {
	g := BasisGroup{Title: "Soils as used"}
	for side := Left; side <= Right; side++ {
		spec := a.Bridge.Banks.Left.Soil
		if side == Right {
			spec = a.Bridge.Banks.Right.Soil
		}
		soil, err := spec.soil()
		if err != nil {
			continue
		}
		prefix := "banks." + side.String() + ".soil"
		sv, specV := reflect.ValueOf(soil), reflect.ValueOf(spec)
		told := false // the preset's source, said once per bank
		st := sv.Type()
		for i := range st.NumField() {
			f := st.Field(i)
			if f.Name == "Name" || f.Name == "Source" || !f.IsExported() {
				continue
			}
			name := side.String() + " bank, " + soil.Name + ": " + words(f.Name)
			source := fmt.Sprintf("preset %q", spec.Preset)
			switch {
			case spec.Preset == "":
				source = "derived from the soil given (" + prefix + ")"
			case !told:
				source, told = source+" ("+soil.Source+")", true
			}
			if sf, ok := specV.Type().FieldByName(f.Name); ok && !specV.FieldByIndex(sf.Index).IsZero() {
				jn, _ := jsonName(sf)
				source = "given (" + prefix + "." + jn + ")"
			}
			e := BasisEntry{Name: name, Text: formatLeaf(sv.Field(i)), Source: source}
			if q, ok := sv.Field(i).Interface().(kinded); ok {
				e.Value, e.Unit = si(sv.Field(i).Float(), q.Kind())
			}
			if sv.Field(i).IsZero() {
				switch f.Name {
				case "Submerged":
					w := soil.SubmergedWeight()
					e.Text, e.Source = w.String(), fmt.Sprintf("default: unit weight less that of water, %s (foundation.WaterUnitWeight)", foundation.WaterUnitWeight)
					e.Value, e.Unit = si(float64(w), units.KindUnitWeight)
				case "Interface":
					e.Text, e.Source = fmt.Sprintf("%.3g", foundation.DefaultInterface), "default: δ = 2/3 φ' (foundation.DefaultInterface)"
				default:
					if spec.Preset == "" {
						e.Source = "not given: none"
					} else {
						e.Source += ", which gives none"
					}
				}
			}
			g.Entries = append(g.Entries, e)
		}
	}
	return g
}

// derivedLoads lists the loads the analysis derives from the description,
// each with its formula and source.
func (a *Analysis) derivedLoads() BasisGroup {
	b := a.Bridge
	g := BasisGroup{Title: "Derived loads"}
	dead := b.Walkway.dead()
	formula := "given (walkway.dead_load)"
	if len(b.Walkway.Parts) > 0 {
		var terms []string
		for _, p := range b.Walkway.Parts {
			terms = append(terms, p.Load.String())
		}
		formula = "Σ parts = " + strings.Join(terms, " + ")
	}
	g.Entries = append(g.Entries, entry("walkway dead load g_w, without the ropes", float64(dead), units.KindLoadPerLength, formula, "the description"))
	gs, err := b.groups()
	if err == nil {
		span := b.Site.Span
		for _, grp := range gs {
			ratio := float64(grp.self) / (float64(grp.Count) * float64(grp.rope.Weight()))
			g.Entries = append(g.Entries,
				entry(grp.Name+": own weight per horizontal metre", float64(grp.self), units.KindLoadPerLength,
					fmt.Sprintf("n m g S/l = %d × %s × %.5g m/s² × %.4f", grp.Count, grp.rope.Mass, units.StandardGravity, ratio),
					"rope mass as used; S/l of the design parabola (Hicks, Civil Engineering Formulas, ch. 10)"),
			)
			arc := designArc(float64(span), float64(b.Site.Rise), float64(grp.Sag), 0, float64(span))
			w0 := grp.self + units.LoadPerLength(grp.share*arc)*dead
			h0 := units.Force(float64(w0) * float64(span) * float64(span) / (8 * float64(grp.Sag)))
			g.Entries = append(g.Entries, entry(grp.Name+": horizontal tension under permanent load at the reference temperature", float64(h0), units.KindForce,
				fmt.Sprintf("H = w l²/(8 f) = (%s + %.3g × %s × %.4f) × (%s)²/(8 × %s)", grp.self, grp.share, dead, arc, span, grp.Sag),
				"parabolic rope statics (Hicks, Civil Engineering Formulas, ch. 10); the walkway's weight per metre of walkway times S/l of the design parabola"))
		}
	}
	for _, l := range []struct {
		name string
		len  units.Length
	}{{"full span", b.Site.Span}} {
		q := b.crowd(l.len)
		f := fmt.Sprintf("q = 2.0 + 120/(L + 30) kN/m², 2.5 ≤ q ≤ 5.0, L = %s", l.len)
		src := "EN 1991-2:2003 cl. 5.3.2.1(2), the loaded length L"
		if b.Loads.Crowd > 0 {
			f, src = "", "given (loads.crowd)"
		}
		g.Entries = append(g.Entries,
			entry("crowd pressure, crowd on the "+l.name, float64(q), units.KindPressure, f, src),
			entry("crowd load per metre, crowd on the "+l.name, float64(q)*float64(b.Walkway.Width), units.KindLoadPerLength,
				fmt.Sprintf("q × walkway width = %s × %s", q, b.Walkway.Width), "derived"))
	}
	if b.Loads.Crowd == 0 {
		g.Entries = append(g.Entries, BasisEntry{Name: "crowd pressure on a shorter loaded length",
			Text:   "each stretch the loaded-length search tries carries the pressure of its own length L by the same formula: 5.000 kPa up to 10 m, 2.500 kPa from 210 m",
			Source: "EN 1991-2:2003 cl. 5.3.2.1(2)"})
	}
	if l := b.lift(); l > 0 {
		g.Entries = append(g.Entries, entry("upward wind force on the walkway", float64(l), units.KindLoadPerLength,
			fmt.Sprintf("c_f,z q_p b = %.3g × %s × %s", orDefault(b.Loads.WalkwayLift, defaultLift), b.wind(), b.Walkway.Width),
			"EN 1991-1-4 8.3.3 (from memory); c_f,z "+givenOr(b.Loads.WalkwayLift, "loads.walkway_lift", "0.9")))
	}
	wind := b.wind()
	switch {
	case b.Climate.WindPressure > 0:
		g.Entries = append(g.Entries, entry("peak wind pressure q_p", float64(wind), units.KindPressure, "", "given (climate.wind_pressure)"))
	case wind > 0:
		ce := orDefault(b.Climate.Exposure, defaultExposure)
		g.Entries = append(g.Entries, entry("peak wind pressure q_p", float64(wind), units.KindPressure,
			fmt.Sprintf("c_e ½ρv² = %.3g × ½ × 1.25 kg/m³ × (%s)²", ce, b.Climate.WindSpeed),
			"EN 1991-1-4:2005 cl. 4.5, ρ = 1.25 kg/m³; c_e "+givenOr(b.Climate.Exposure, "climate.exposure", "2.5, open country at 10–15 m, EN 1991-1-4 Figure 4.2 (from memory)")))
	default:
		g.Entries = append(g.Entries, BasisEntry{Name: "peak wind pressure q_p", Text: "none", Source: "no wind given (climate.wind_speed, climate.wind_pressure): the wind cases are left out"})
	}
	if wind > 0 && err == nil {
		cd := orDefault(b.Loads.DragCoefficient, defaultRopeDrag)
		cw := orDefault(b.Loads.WalkwayDrag, defaultWalkwayDrag)
		depth := b.Walkway.WindDepth
		if depth == 0 {
			depth = b.Walkway.Depth
		}
		for _, grp := range gs {
			face := grp.windWidth + units.Length(grp.share*cw)*depth
			g.Entries = append(g.Entries, entry(grp.Name+": wind per metre", float64(wind)*float64(face), units.KindLoadPerLength,
				fmt.Sprintf("q_p (n c_f d + share c_f,w h_w) = %s × (%d × %.3g × %s + %.3g × %.3g × %s)", wind, grp.Count, cd, grp.rope.Diameter, grp.share, cw, depth),
				"force coefficients c_f "+givenOr(b.Loads.DragCoefficient, "loads.rope_drag", "1.2")+", c_f,w "+givenOr(b.Loads.WalkwayDrag, "loads.walkway_drag", "1.8")))
		}
	}
	for side := Left; side <= Right; side++ {
		bank := b.Banks.Left
		if side == Right {
			bank = b.Banks.Right
		}
		t := bank.Tower
		gamma := t.UnitWeight
		src := "given (banks." + side.String() + ".tower.unit_weight)"
		if gamma == 0 {
			gamma, src = foundation.ConcreteUnitWeight, "reinforced concrete 24 kN/m³, EN 1991-1-1 Table A.1"
		}
		g.Entries = append(g.Entries, entry(side.String()+" tower column's weight", float64(gamma)*float64(t.Depth)*float64(t.Width)*float64(t.Height), units.KindForce,
			fmt.Sprintf("γ d w h = %s × %s × %s × %s", gamma, t.Depth, t.Width, t.Height), src))
	}
	return g
}

// loadCases lists the load cases with the actions in each and their
// factors, and the families searched over the loaded length.
func (a *Analysis) loadCases() BasisGroup {
	g := BasisGroup{Title: "Load cases"}
	b := a.Bridge
	for _, lc := range b.Cases() {
		d := b.factored(lc, true)
		text := lc.describe(b) + fmt.Sprintf("; factored: γG %.3g, γQ %.3g, γW %.3g", d.GammaG, d.GammaQ, d.GammaW)
		g.Entries = append(g.Entries, BasisEntry{Name: lc.Name, Text: text})
	}
	for _, f := range b.LoadedLengths() {
		// the factors of the family's stretches (each carries a stretch; the
		// base case, without one, would show no crowd factor)
		d := b.factored(f.at(FromLeft, b.Site.Span, b.Site.Span), true)
		name := f.Name + " on every loaded length"
		if f.Label != "" {
			name += ", " + f.Label
		}
		text := f.describe(b) + fmt.Sprintf("; factored: γG %.3g, γQ %.3g", d.GammaG, d.GammaQ)
		g.Entries = append(g.Entries, BasisEntry{Name: name, Text: text})
	}
	return g
}

// factors lists the basis of verification and the factors the checks
// apply, given or default.
func (a *Analysis) factors() BasisGroup {
	b := a.Bridge
	bs := b.Basis
	g := BasisGroup{Title: "Basis and factors"}
	method := "allowable: characteristic loads, global factors of safety on resistance"
	if b.partial() {
		method = "partial: EN 1990 factored loads, EN 1997-1 and EN 1993-1-11 partial factors"
	}
	g.Entries = append(g.Entries, BasisEntry{Name: "verification basis", Text: method, Source: givenOr(float64(len(bs.Method)), "basis.method", "allowable")})
	if b.partial() {
		g.Entries = append(g.Entries,
			entry("γ_R on rope resistance", orDefault(bs.GammaR, cable.DefaultGammaR), units.KindRatio, "", givenOr(bs.GammaR, "basis.gamma_r", "EN 1993-1-11 (from memory)")),
			entry("termination efficiency k_e", orDefault(bs.RopeEfficiency, cable.DefaultKe), units.KindRatio, "", givenOr(bs.RopeEfficiency, "basis.rope_efficiency", "cable.DefaultKe")))
	} else {
		g.Entries = append(g.Entries, entry("factor of safety on the ropes' minimum breaking force", orDefault(bs.RopeFactor, cable.DefaultGlobalFactor), units.KindRatio, "",
			givenOr(bs.RopeFactor, "basis.rope_factor", "cable.DefaultGlobalFactor (common practice)")))
	}
	// The factors of safety the stability checks applied, as they report them.
	seen := map[string]bool{}
	for _, r := range a.Report.Results {
		if r.Required == 0 {
			continue
		}
		key := fmt.Sprintf("%s %g", r.ID, r.Required)
		if seen[key] {
			continue
		}
		seen[key] = true
		g.Entries = append(g.Entries, entry("factor of safety required by "+r.ID, r.Required, units.KindRatio, "", "as the check applied it; see its basis"))
	}
	g.Entries = append(g.Entries,
		entry("γG on permanent loads for the column sections", orDefault(bs.GammaG, defaultGammaG), units.KindRatio, "", givenOr(bs.GammaG, "basis.gamma_g", "EN 1990 Table A2.4(B) (from memory)")),
		entry("γQ on crowd and wind for the column sections", orDefault(bs.GammaQ, defaultGammaQ), units.KindRatio, "", givenOr(bs.GammaQ, "basis.gamma_q", "EN 1990 Table A2.4(B) (from memory)")),
		entry("ψ0 on wind with the crowd", orDefault(b.Loads.WindWithCrowd, defaultWindWithCrowd), units.KindRatio, "", givenOr(b.Loads.WindWithCrowd, "loads.wind_with_crowd", "EN 1990 Table A1.1 (from memory)")),
		entry("γc on concrete", orDefault(bs.GammaConcrete, 1.5), units.KindRatio, "", givenOr(bs.GammaConcrete, "basis.gamma_concrete", "EN 1992-1-1 Table 2.1N")),
		entry("γs on reinforcement", orDefault(bs.GammaSteel, 1.15), units.KindRatio, "", givenOr(bs.GammaSteel, "basis.gamma_steel", "EN 1992-1-1 Table 2.1N")),
		entry("αcc on concrete strength", orDefault(bs.AlphaCC, 1.0), units.KindRatio, "", givenOr(bs.AlphaCC, "basis.alpha_cc", "EN 1992-1-1 3.1.6(1)")),
	)
	return g
}

// designBasisSection renders the design basis as a report section: what
// produced the report, the description as given (one table per part of
// it, banks and rope groups side by side), then the resolved groups.
func (a *Analysis) designBasisSection() check.Section {
	db := a.DesignBasis()
	source := "built in Go"
	if db.Source != "" {
		source = db.Source
	}
	s := check.Section{ID: "design-basis", Title: "Design basis"}
	s.Text = []string{
		fmt.Sprintf("Bridge %q, description %s, SHA-256 %s; checked by %s.", db.Bridge, source, db.Digest, db.Library),
		"Every input as given, every value the checks take from a catalogue, preset or default, and every load derived from them, with its source. A dash marks a field not given, whose default applies.",
	}
	v := reflect.ValueOf(a.Bridge)
	t := v.Type()
	for i := range t.NumField() {
		f := t.Field(i)
		name, _ := jsonName(f)
		if name == "" || isLeaf(f.Type) {
			continue
		}
		s.Sub = append(s.Sub, inputTable(name, f, v.Field(i)))
	}
	for _, g := range db.Resolved {
		sub := check.Section{Title: g.Title, Head: []string{"Quantity", "Value", "Formula", "Source"}}
		for _, e := range g.Entries {
			sub.Rows = append(sub.Rows, []string{e.Name, e.Text, e.Formula, e.Source})
		}
		s.Sub = append(s.Sub, dropEmptyColumns(sub))
	}
	return s
}

// dropEmptyColumns returns the table without the columns no row fills.
func dropEmptyColumns(s check.Section) check.Section {
	var keep []int
	for c := range s.Head {
		for _, r := range s.Rows {
			if c < len(r) && r[c] != "" {
				keep = append(keep, c)
				break
			}
		}
	}
	pick := func(cells []string) []string {
		out := make([]string, len(keep))
		for i, c := range keep {
			if c < len(cells) {
				out[i] = cells[c]
			}
		}
		return out
	}
	s.Head = pick(s.Head)
	for i, r := range s.Rows {
		s.Rows[i] = pick(r)
	}
	return s
}

// inputTable lays out one part of the description as a table: one column
// of values, or one per rope group or per bank, side by side.
func inputTable(name string, f reflect.StructField, v reflect.Value) check.Section {
	var columns []string
	var values []reflect.Value
	switch {
	case v.Kind() == reflect.Slice:
		for i := range v.Len() {
			label := fmt.Sprintf("%s[%d]", name, i)
			if n := v.Index(i).FieldByName("Name"); n.IsValid() && n.String() != "" {
				label += " " + n.String()
			}
			columns = append(columns, label)
			values = append(values, v.Index(i))
		}
	case sameTypeFields(v.Type()):
		for i := range v.NumField() {
			n, _ := jsonName(v.Type().Field(i))
			columns = append(columns, name+"."+n)
			values = append(values, v.Field(i))
		}
	default:
		columns, values = []string{"Value"}, []reflect.Value{v}
	}
	type row struct {
		cells   []string
		meaning string
	}
	rows := map[string]*row{}
	var order []string
	for c, cv := range values {
		walkCompact(cv, "", func(fi fieldInfo, text string) {
			r, ok := rows[fi.Path]
			if !ok {
				r = &row{cells: make([]string, len(values)), meaning: meaning(fi.Doc, fi.Key[strings.IndexByte(fi.Key, '.')+1:])}
				rows[fi.Path] = r
				order = append(order, fi.Path)
			}
			r.cells[c] = text
		})
	}
	title := strings.ToUpper(name[:1]) + name[1:]
	sec := check.Section{Title: title, Head: append(append([]string{"Field"}, columns...), "Meaning")}
	prefix := name + "."
	if len(columns) > 1 {
		prefix = ""
	}
	last := ""
	for _, p := range order {
		r := rows[p]
		for i, c := range r.cells {
			if c == "" {
				r.cells[i] = "—"
			}
		}
		m := r.meaning
		if m == last {
			m = "(as above)" // the meaning of a list's elements, or of fields documented together
		} else {
			last = m
		}
		sec.Rows = append(sec.Rows, append(append([]string{prefix + p}, r.cells...), m))
	}
	return sec
}

// sameTypeFields reports whether every field of struct type t has one
// struct type, as the two banks do.
func sameTypeFields(t reflect.Type) bool {
	if t.Kind() != reflect.Struct || t.NumField() < 2 {
		return false
	}
	for i := range t.NumField() {
		if t.Field(i).Type != t.Field(0).Type || isLeaf(t.Field(i).Type) {
			return false
		}
	}
	return true
}

// walkCompact calls leaf for every leaf of struct value v with its text,
// "" for an optional field not given; a list of objects inside is one
// entry per element, its fields on one line.
func walkCompact(v reflect.Value, p string, leaf func(fieldInfo, string)) {
	t := v.Type()
	for i := range t.NumField() {
		f := t.Field(i)
		name, _ := jsonName(f)
		if name == "" {
			continue
		}
		fp := join(p, name)
		fv := v.Field(i)
		fi := fieldOf(t, f, fp)
		if f.Type.Kind() == reflect.Pointer { // presence decides: a value given counts, zero too
			switch {
			case fv.IsNil() && isLeaf(f.Type):
				leaf(fi, "")
			case fv.IsNil():
			case isLeaf(f.Type):
				leaf(fi, formatLeaf(fv.Elem()))
			default:
				walkCompact(fv.Elem(), fp, leaf)
			}
			continue
		}
		switch {
		case isLeaf(f.Type):
			text := formatLeaf(fv)
			if fi.Optional && fv.IsZero() {
				text = ""
			}
			leaf(fi, text)
		case f.Type.Kind() == reflect.Slice:
			for j := range fv.Len() {
				var parts []string
				walkValues(fv.Index(j), "", func(e fieldInfo, ev reflect.Value) {
					if !(e.Optional && ev.IsZero()) {
						parts = append(parts, e.Path+" "+formatLeaf(ev))
					}
				})
				ei := fi
				ei.Path = fmt.Sprintf("%s[%d]", fp, j)
				leaf(ei, strings.Join(parts, ", "))
			}
		default:
			walkCompact(fv, fp, leaf)
		}
	}
}
