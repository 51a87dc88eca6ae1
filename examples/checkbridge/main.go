// Command checkbridge runs the whole-bridge check of sagspan on a bridge
// description and writes the report: the design basis, the failures first
// when any, the governing case of every check, the rope states, the
// natural modes and walkers' comfort, and the erection tables; -modes-svg
// draws the first mode shapes.
//
// With no file it checks the built-in demo bridge (an invented bridge at an
// invented site). Flags may come before or after the file:
//
//	go run ./examples/checkbridge [flags] [bridge.json] [flags]
//	go run ./examples/checkbridge mine.json -format html -o report.html
//
// It exits with status 0 when every check passes (flags allowed) and for
// -h, 2 when a check fails and 1 when the description cannot be read or
// analysed.
//
// The results support, and never replace, the design of a qualified
// engineer; local codes and licensed practice govern.
package main

import (
	"bufio"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"

	"github.com/sagspan/sagspan"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/examples/internal/cli"
)

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}

const usage = `usage: checkbridge [flags] [bridge.json] [flags]

Checks a cable-supported footbridge and writes its report; with no file,
the built-in demo bridge. Flags may come before or after the file.

`

func run(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("checkbridge", flag.ContinueOnError)
	format := fs.String("format", "text", "report format: text, markdown, json or html (one self-contained page with the drawings)")
	out := fs.String("o", "", "write the report to this file instead of standard output")
	all := fs.Bool("all", false, "list every result of every load case, not only the governing ones")
	svg := fs.String("svg", "", "write the elevation drawing to this SVG file")
	demo := fs.Bool("demo-json", false, "print the demo bridge description (a template for your own) and exit")
	modes := fs.String("modes-svg", "", "write the drawing of the first mode shapes to this SVG file")
	strict := fs.Bool("strict-comfort", false, "fail, rather than flag, accelerations under walkers beyond their limits and crowds beyond the lock-in number")
	fast := fs.Bool("no-comfort", false, "skip the modal analysis and walkers' response (closed-form frequencies only)")
	files, err := cli.Parse(fs, args, usage, stdout, stderr)
	if errors.Is(err, flag.ErrHelp) {
		return 0
	}
	if err != nil {
		return 1
	}
	if *demo {
		stdout.Write(sagspan.DemoJSON())
		return 0
	}
	b, source, err := cli.Load(files)
	if err != nil {
		fmt.Fprintln(stderr, err)
		return 1
	}
	write, ok := writers[*format]
	if !ok {
		fmt.Fprintf(stderr, "checkbridge: unknown format %q; want text, markdown, json or html\n", *format)
		return 1
	}
	a, err := sagspan.Check(b, &sagspan.Options{StrictComfort: *strict, SkipComfort: *fast})
	if err != nil {
		fmt.Fprintln(stderr, err)
		return 1
	}
	a.Source = source
	if err := writeReport(a, write, &check.RenderOptions{All: *all}, *out, stdout); err != nil {
		fmt.Fprintln(stderr, "checkbridge:", err)
		return 1
	}
	if *out != "" {
		fmt.Fprintf(stderr, "checkbridge: report written to %s\n", *out)
	}
	if *svg != "" {
		if err := writeFile(*svg, a.WriteSVG); err != nil {
			fmt.Fprintln(stderr, "checkbridge:", err)
			return 1
		}
		fmt.Fprintf(stderr, "checkbridge: drawing written to %s\n", *svg)
	}
	if *modes != "" {
		if err := writeFile(*modes, a.WriteModesSVG); err != nil {
			fmt.Fprintln(stderr, "checkbridge:", err)
			return 1
		}
		fmt.Fprintf(stderr, "checkbridge: mode shapes written to %s\n", *modes)
	}
	if a.Report.Status() == check.Fail {
		return 2
	}
	return 0
}

type writer func(a *sagspan.Analysis, w io.Writer, opts *check.RenderOptions) error

var writers = map[string]writer{
	"text":     (*sagspan.Analysis).WriteText,
	"markdown": (*sagspan.Analysis).WriteMarkdown,
	"md":       (*sagspan.Analysis).WriteMarkdown,
	"html":     (*sagspan.Analysis).WriteHTML,
	"json":     func(a *sagspan.Analysis, w io.Writer, _ *check.RenderOptions) error { return a.WriteJSON(w) },
}

// writeReport writes the report to the named file, or to stdout.
func writeReport(a *sagspan.Analysis, write writer, opts *check.RenderOptions, name string, stdout io.Writer) error {
	if name != "" {
		return writeFile(name, func(w io.Writer) error { return write(a, w, opts) })
	}
	buf := bufio.NewWriter(stdout)
	if err := write(a, buf, opts); err != nil {
		return err
	}
	return buf.Flush()
}

func writeFile(name string, write func(io.Writer) error) error {
	f, err := os.Create(name)
	if err != nil {
		return err
	}
	if err := write(f); err != nil {
		f.Close()
		return err
	}
	return f.Close()
}
