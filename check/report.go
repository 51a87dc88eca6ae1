package check

import (
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
	"text/tabwriter"
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
func Worse(a, b Result) bool {
	if a.Status != b.Status {
		return a.Status.Worse(b.Status)
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

var columns = []string{"Check", "Element", "Case", "Demand", "Capacity", "Ratio", "FoS prov/req", "Status"}

func row(res Result) []string {
	ratio := ratioString(res.Ratio)
	if res.NoLimit {
		ratio = ""
	}
	return []string{res.ID, res.Element, res.Case, res.DemandString(), res.CapacityString(),
		ratio, factorString(res), res.Status.String()}
}

// bases lists each distinct (ID, basis) pair once, in order of appearance.
func bases(results []Result) [][2]string {
	seen := make(map[[2]string]bool)
	var out [][2]string
	for _, res := range results {
		k := [2]string{res.ID, res.Basis}
		if res.Basis == "" || seen[k] {
			continue
		}
		seen[k] = true
		out = append(out, k)
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

// WriteTable writes a titled table in format f: columns aligned with
// spaces in Text, a pipe table in Markdown (pipes in cells escaped).
func WriteTable(w io.Writer, f Format, heading string, head []string, rows [][]string) error {
	var b strings.Builder
	if f == Markdown {
		fmt.Fprintf(&b, "## %s\n\n| %s |\n|%s\n", heading, strings.Join(head, " | "), strings.Repeat("---|", len(head)))
		for _, r := range rows {
			cells := make([]string, len(r))
			for i, c := range r {
				cells[i] = strings.ReplaceAll(c, "|", `\|`)
			}
			fmt.Fprintf(&b, "| %s |\n", strings.Join(cells, " | "))
		}
	} else {
		fmt.Fprintf(&b, "%s\n\n", heading)
		tw := tabwriter.NewWriter(&b, 0, 0, 2, ' ', 0)
		fmt.Fprintln(tw, strings.Join(head, "\t"))
		for _, r := range rows {
			fmt.Fprintln(tw, strings.Join(r, "\t"))
		}
		tw.Flush()
	}
	b.WriteString("\n")
	_, err := io.WriteString(w, b.String())
	return err
}

// writeList writes a titled bullet list in format f; nothing when empty.
// Each item is a code (a check ID) and its text.
func writeList(w io.Writer, f Format, heading string, items [][2]string) error {
	if len(items) == 0 {
		return nil
	}
	var b strings.Builder
	if f == Markdown {
		fmt.Fprintf(&b, "## %s\n\n", heading)
	} else {
		fmt.Fprintf(&b, "%s\n\n", heading)
	}
	for _, it := range items {
		code := it[0]
		if f == Markdown {
			code = "`" + code + "`"
		}
		fmt.Fprintf(&b, "- %s: %s\n", code, it[1])
	}
	b.WriteString("\n")
	_, err := io.WriteString(w, b.String())
	return err
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

func rows(results []Result) [][]string {
	out := make([][]string, len(results))
	for i, res := range results {
		out[i] = row(res)
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

// write renders the report: title, caution, overall status, the governing
// results, their notes and bases, and every result with opts.All.
func (r Report) write(w io.Writer, f Format, opts *RenderOptions) error {
	if opts == nil {
		opts = &RenderOptions{}
	}
	title := r.Title
	if title == "" {
		title = "Check report"
	}
	var head string
	if f == Markdown {
		head = fmt.Sprintf("# %s\n\n> %s\n\n**Overall: %s** (%d results)\n\n", title, Caution, r.Status(), len(r.Results))
	} else {
		head = fmt.Sprintf("%s\n%s\n\n%s\n\nOverall: %s (%d results)\n\n",
			title, strings.Repeat("=", len([]rune(title))), Caution, r.Status(), len(r.Results))
	}
	if _, err := io.WriteString(w, head); err != nil {
		return err
	}
	gov := r.Governing()
	if err := WriteTable(w, f, "Governing cases", columns, rows(gov)); err != nil {
		return err
	}
	if err := writeList(w, f, "Values and notes", details(gov)); err != nil {
		return err
	}
	if err := writeList(w, f, "Basis", bases(gov)); err != nil {
		return err
	}
	if opts.All {
		return WriteTable(w, f, "All results", columns, rows(r.Results))
	}
	return nil
}

// reportJSON is the stable JSON form of a Report.
type reportJSON struct {
	Title     string   `json:"title"`
	Caution   string   `json:"caution"`
	Status    Status   `json:"status"`
	Governing []Result `json:"governing"`
	Results   []Result `json:"results"`
}

// MarshalJSON writes the report with its caution, overall status, the
// governing results and every result, values in SI.
func (r Report) MarshalJSON() ([]byte, error) {
	gov := r.Governing()
	if gov == nil {
		gov = []Result{}
	}
	all := r.Results
	if all == nil {
		all = []Result{}
	}
	return json.Marshal(reportJSON{Title: r.Title, Caution: Caution, Status: r.Status(), Governing: gov, Results: all})
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
