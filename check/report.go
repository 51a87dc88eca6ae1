package check

import (
	"encoding/json"
	"fmt"
	"io"
	"math"
	"slices"
	"sort"
	"strconv"
	"strings"
	"text/tabwriter"

	"github.com/sagspan/sagspan/units"
)

// Caution is printed at the head of every rendered report.
const Caution = "CAUTION: these results support, and never replace, the design of a " +
	"qualified engineer. Local codes, standards and licensed practice govern. Check " +
	"every input and every result before anything is built."

// Report gathers the results of many checks over many load cases.
// The zero value is an empty report ready to use.
type Report struct {
	// Title heads the rendered report.
	Title string
	// Results holds every result in the order added.
	Results []Result
}

// Add appends results to the report.
func (r *Report) Add(results ...Result) { r.Results = append(r.Results, results...) }

// Worse reports whether a is a worse outcome than b: a more severe status,
// or the same status with a higher ratio.
//
// Two results with no limit (NoLimit) and the same status compare by the
// magnitude of their demand: the governing case of a reported force is the
// one with the largest.
func Worse(a, b Result) bool {
	if a.Status != b.Status {
		return a.Status.Worse(b.Status)
	}
	if a.NoLimit && b.NoLimit {
		return math.Abs(a.Demand) > math.Abs(b.Demand)
	}
	return a.Ratio > b.Ratio
}

// Governing returns, for each distinct check and element (ID and Element),
// the worst result over all load cases: the governing case. Results come in
// the order each check first appears; ties go to the result added first.
func (r Report) Governing() []Result {
	type key struct{ id, element string }
	index := make(map[key]int)
	var out []Result
	for _, res := range r.Results {
		k := key{res.ID, res.Element}
		i, ok := index[k]
		if !ok {
			index[k] = len(out)
			out = append(out, res)
			continue
		}
		if Worse(res, out[i]) {
			out[i] = res
		}
	}
	return out
}

// Status returns the overall status: the most severe of all results, or
// Info for an empty report.
func (r Report) Status() Status {
	s := Info
	for _, res := range r.Results {
		if res.Status.Worse(s) {
			s = res.Status
		}
	}
	return s
}

// Filter returns a report holding only the results for which keep is true.
func (r Report) Filter(keep func(Result) bool) Report {
	out := Report{Title: r.Title}
	for _, res := range r.Results {
		if keep(res) {
			out.Results = append(out.Results, res)
		}
	}
	return out
}

// Failures returns the governing results that fail.
func (r Report) Failures() []Result {
	var out []Result
	for _, res := range r.Governing() {
		if res.Status == Fail {
			out = append(out, res)
		}
	}
	return out
}

// Worst returns the governing result with the highest ratio among those
// that carry a limit (not NoLimit), and false when there is none.
func (r Report) Worst() (Result, bool) {
	var worst Result
	found := false
	for _, res := range r.Results {
		if res.NoLimit {
			continue
		}
		if !found || Worse(res, worst) {
			worst, found = res, true
		}
	}
	return worst, found
}

// RenderOptions controls text and Markdown rendering. A nil *RenderOptions
// means the defaults.
type RenderOptions struct {
	// All lists every result of every case after the governing summary.
	// Default false: the governing summary only.
	All bool
	// Explain, when set, says in words why a result has nothing to check
	// (nothing acts on it in its case: a demand of zero), such as "roller
	// saddle: the rope puts no horizontal force on the column". Default:
	// "nothing acts in this case".
	Explain func(Result) string
}

func ratioString(x float64) string {
	switch {
	case math.IsInf(x, 1):
		return "inf"
	case math.IsNaN(x):
		return "NaN"
	}
	return strconv.FormatFloat(x, 'f', 3, 64)
}

func factorString(res Result) string {
	if res.Required == 0 {
		return ""
	}
	p := "inf"
	if !math.IsInf(res.Provided, 1) {
		p = strconv.FormatFloat(res.Provided, 'f', 2, 64)
	}
	return p + " / " + strconv.FormatFloat(res.Required, 'f', 2, 64)
}

// Columns are the columns of a results table, as Row fills them.
var Columns = []string{"Check", "Element", "Case", "Demand", "Capacity", "Ratio", "FoS prov/req", "Status"}

// idle reports whether nothing acts on the result: a limit with a demand
// of zero.
func idle(res Result) bool { return !res.NoLimit && res.Demand == 0 && res.Status == Pass }

// Row returns the cells of a results table for res: demand and capacity in
// one unit, the ratio, the factors of safety of a stability check and the
// status; a result on which nothing acts says so, and why, in its status.
func Row(res Result, opts *RenderOptions) []string {
	ratio := ratioString(res.Ratio)
	demand, capacity := units.FormatPair(res.Demand, res.Capacity, res.Kind)
	status := res.Status.String()
	switch {
	case res.NoLimit:
		ratio, demand, capacity = "", units.Format(res.Demand, res.Kind), ""
	case idle(res):
		ratio = "–"
		why := "nothing acts in this case"
		if opts != nil && opts.Explain != nil {
			if w := opts.Explain(res); w != "" {
				why = w
			}
		}
		status = "pass: " + why
	}
	return []string{res.ID, res.Element, res.Case, demand, capacity, ratio, factorString(res), status}
}

// bases lists each distinct basis once, in order of appearance, with the
// IDs of every check that states it.
func bases(results []Result) [][2]string {
	index := make(map[string]int)
	var ids [][]string
	var texts []string
	for _, res := range results {
		if res.Basis == "" {
			continue
		}
		i, ok := index[res.Basis]
		if !ok {
			i = len(texts)
			index[res.Basis] = i
			texts = append(texts, res.Basis)
			ids = append(ids, nil)
		}
		if !slices.Contains(ids[i], res.ID) {
			ids[i] = append(ids[i], res.ID)
		}
	}
	out := make([][2]string, len(texts))
	for i, t := range texts {
		out[i] = [2]string{strings.Join(ids[i], ", "), t}
	}
	return out
}

// Format is a plain-text layout a report can be rendered in.
type Format int

// The formats.
const (
	Text     Format = iota // aligned plain text
	Markdown               // GitHub-flavoured Markdown
)

// Section is one titled part of a rendered report: paragraphs, then a
// table or a list, then subsections. Renderers in every format (text,
// Markdown, the root package's HTML) lay out the same sections, so a
// section added once appears in all of them.
type Section struct {
	// ID names the section for programs and anchors, such as "failures".
	ID    string
	Title string
	// Text holds paragraphs.
	Text []string
	// Head and Rows make a table; Status, when set, gives each row's
	// status, for a renderer that marks failing rows.
	Head   []string
	Rows   [][]string
	Status []Status
	// Items make a list of (code, text) entries, such as a check ID and a
	// note.
	Items [][2]string
	// Sub holds subsections.
	Sub []Section
}

// WriteTable writes a titled table in format f: columns aligned with
// spaces in Text, a pipe table in Markdown (pipes in cells escaped).
func WriteTable(w io.Writer, f Format, heading string, head []string, rows [][]string) error {
	return WriteSection(w, f, Section{Title: heading, Head: head, Rows: rows}, 2)
}

// WriteSection writes section s in format f at heading level (1 for a
// report's title, 2 for its sections, 3 for their subsections): in Text a
// level-2 title is underlined, a level-3 one is not; in Markdown the
// levels are #, ## and ###.
//
// A section with nothing in it (no text, table, list or subsection) is not
// written.
func WriteSection(w io.Writer, f Format, s Section, level int) error {
	if len(s.Text) == 0 && len(s.Head) == 0 && len(s.Items) == 0 && len(s.Sub) == 0 {
		return nil
	}
	var b strings.Builder
	if s.Title != "" {
		if f == Markdown {
			fmt.Fprintf(&b, "%s %s\n\n", strings.Repeat("#", level), s.Title)
		} else if level <= 2 {
			fmt.Fprintf(&b, "%s\n%s\n\n", s.Title, strings.Repeat("-", len([]rune(s.Title))))
		} else {
			fmt.Fprintf(&b, "%s\n\n", s.Title)
		}
	}
	for _, p := range s.Text {
		b.WriteString(p)
		b.WriteString("\n\n")
	}
	if len(s.Head) > 0 {
		writeTable(&b, f, s.Head, s.Rows)
		b.WriteString("\n")
	}
	if len(s.Items) > 0 {
		for _, it := range s.Items {
			code := it[0]
			if f == Markdown && code != "" {
				code = "`" + code + "`"
			}
			if code != "" {
				code += ": "
			}
			fmt.Fprintf(&b, "- %s%s\n", code, it[1])
		}
		b.WriteString("\n")
	}
	if _, err := io.WriteString(w, b.String()); err != nil {
		return err
	}
	for _, sub := range s.Sub {
		if err := WriteSection(w, f, sub, level+1); err != nil {
			return err
		}
	}
	return nil
}

func writeTable(b *strings.Builder, f Format, head []string, rows [][]string) {
	if f == Markdown {
		fmt.Fprintf(b, "| %s |\n|%s\n", strings.Join(head, " | "), strings.Repeat("---|", len(head)))
		for _, r := range rows {
			cells := make([]string, len(r))
			for i, c := range r {
				cells[i] = strings.ReplaceAll(c, "|", `\|`)
			}
			fmt.Fprintf(b, "| %s |\n", strings.Join(cells, " | "))
		}
		return
	}
	tw := tabwriter.NewWriter(b, 0, 0, 2, ' ', 0)
	fmt.Fprintln(tw, strings.Join(head, "\t"))
	for _, r := range rows {
		fmt.Fprintln(tw, strings.Join(r, "\t"))
	}
	tw.Flush()
}

// details lists, for each result, its values on one line and then each
// note.
func details(results []Result) [][2]string {
	var out [][2]string
	for _, res := range results {
		where := "(" + res.Element + ") "
		if len(res.Values) > 0 {
			vs := make([]string, len(res.Values))
			for i, v := range res.Values {
				vs[i] = v.String()
			}
			out = append(out, [2]string{res.ID, where + strings.Join(vs, "; ")})
		}
		for _, n := range res.Notes {
			out = append(out, [2]string{res.ID, where + n})
		}
	}
	return out
}

func table(id, title string, results []Result, opts *RenderOptions) Section {
	s := Section{ID: id, Title: title, Head: Columns, Rows: make([][]string, len(results)), Status: make([]Status, len(results))}
	for i, res := range results {
		s.Rows[i] = Row(res, opts)
		s.Status[i] = res.Status
	}
	return s
}

// AllFailures returns every result that fails, of every case, the worst
// first (highest ratio; ties in the order added).
func (r Report) AllFailures() []Result {
	var out []Result
	for _, res := range r.Results {
		if res.Status == Fail {
			out = append(out, res)
		}
	}
	sort.SliceStable(out, func(i, j int) bool { return out[i].Ratio > out[j].Ratio })
	return out
}

// Summary returns the overall verdict in words, such as "Overall: FAIL: 3
// of 229 results fail, in 2 checks (listed first)" or "Overall: pass (229
// results)". Flagged results are counted beside it, so that a verdict of
// flag (or a failure) never hides how many results lie beyond an advisory
// limit: "Overall: flag: none fails; 4 of 229 results flagged, in 2
// checks (see the governing cases)".
func (r Report) Summary() string {
	st := r.Status()
	flagged, flaggedChecks := 0, 0
	for _, res := range r.Results {
		if res.Status == Flag {
			flagged++
		}
	}
	for _, res := range r.Governing() {
		if res.Status == Flag {
			flaggedChecks++
		}
	}
	flags := fmt.Sprintf("%d of %d results flagged, in %s (see the governing cases; a flag never fails, but each needs the engineer's judgement)",
		flagged, len(r.Results), plural(flaggedChecks, "check"))
	switch st {
	case Flag:
		return "Overall: flag: none fails; " + flags
	case Fail:
	default:
		return fmt.Sprintf("Overall: %s (%d results)", st, len(r.Results))
	}
	fails := r.AllFailures()
	verb := "fail"
	if len(fails) == 1 {
		verb = "fails"
	}
	out := fmt.Sprintf("Overall: FAIL: %d of %d results %s, in %s (listed first)", len(fails), len(r.Results), verb, plural(len(r.Failures()), "check"))
	if flagged > 0 {
		out += "; besides, " + flags
	}
	return out
}

// plural returns "1 check", "2 checks".
func plural(n int, noun string) string {
	if n == 1 {
		return "1 " + noun
	}
	return strconv.Itoa(n) + " " + noun + "s"
}

// Sections returns the sections a report renders as: the failures, all of
// them, when any; the governing case of every check; their values and
// notes; their bases, each stated once; and with opts.All every result.
func (r Report) Sections(opts *RenderOptions) []Section {
	if opts == nil {
		opts = &RenderOptions{}
	}
	var out []Section
	if fails := r.AllFailures(); len(fails) > 0 {
		s := table("failures", "Failures", fails, opts)
		s.Text = []string{fmt.Sprintf("Every result that fails, the worst first (%s). Their values and notes follow the governing cases.", plural(len(fails), "result"))}
		out = append(out, s)
	}
	gov := r.Governing()
	out = append(out,
		table("governing", "Governing cases", gov, opts),
		Section{ID: "values", Title: "Values and notes", Items: details(gov)},
		Section{ID: "basis", Title: "Basis", Items: bases(gov)},
	)
	if opts.All {
		out = append(out, table("all", "All results", r.Results, opts))
	}
	return out
}

// WriteText renders the report as aligned plain text.
func (r Report) WriteText(w io.Writer, opts *RenderOptions) error {
	return r.write(w, Text, opts)
}

// WriteMarkdown renders the report as GitHub-flavoured Markdown.
func (r Report) WriteMarkdown(w io.Writer, opts *RenderOptions) error {
	return r.write(w, Markdown, opts)
}

// Head writes the head of a report in format f: the title, the caution
// and the overall verdict.
func (r Report) Head(w io.Writer, f Format) error {
	title := r.Title
	if title == "" {
		title = "Check report"
	}
	var head string
	if f == Markdown {
		head = fmt.Sprintf("# %s\n\n> %s\n\n**%s**\n\n", title, Caution, r.Summary())
	} else {
		head = fmt.Sprintf("%s\n%s\n\n%s\n\n%s\n\n",
			title, strings.Repeat("=", len([]rune(title))), Caution, r.Summary())
	}
	_, err := io.WriteString(w, head)
	return err
}

// write renders the report: its head and its sections.
func (r Report) write(w io.Writer, f Format, opts *RenderOptions) error {
	if err := r.Head(w, f); err != nil {
		return err
	}
	for _, s := range r.Sections(opts) {
		if err := WriteSection(w, f, s, 2); err != nil {
			return err
		}
	}
	return nil
}

// reportJSON is the stable JSON form of a Report.
type reportJSON struct {
	Title     string   `json:"title"`
	Caution   string   `json:"caution"`
	Status    Status   `json:"status"`
	Failures  []Result `json:"failures"`
	Governing []Result `json:"governing"`
	Results   []Result `json:"results"`
}

// MarshalJSON writes the report with its caution, overall status, every
// failing result (the worst first), the governing results and every
// result, values in SI.
func (r Report) MarshalJSON() ([]byte, error) {
	gov := r.Governing()
	if gov == nil {
		gov = []Result{}
	}
	all := r.Results
	if all == nil {
		all = []Result{}
	}
	fails := r.AllFailures()
	if fails == nil {
		fails = []Result{}
	}
	return json.Marshal(reportJSON{Title: r.Title, Caution: Caution, Status: r.Status(), Failures: fails, Governing: gov, Results: all})
}

// WriteJSON writes the report as indented JSON.
func (r Report) WriteJSON(w io.Writer) error {
	b, err := json.MarshalIndent(r, "", "  ")
	if err != nil {
		return err
	}
	_, err = w.Write(append(b, '\n'))
	return err
}
