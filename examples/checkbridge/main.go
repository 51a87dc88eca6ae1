// Command checkbridge runs the whole-bridge check of sagspan on a bridge
// description and prints the report: the governing case of every check,
// the rope states, the natural modes and walkers' comfort, and the erection
// tables; -modes-svg draws the first mode shapes.
//
// With no argument it checks the built-in demo bridge (an invented bridge at
// an invented site). Usage:
//
//	go run ./examples/checkbridge [flags] [bridge.json]
//
// It exits with status 0 when every check passes (flags allowed), 2 when a
// check fails and 1 when the description cannot be read or analysed.
//
// The results support, and never replace, the design of a qualified
// engineer; local codes and licensed practice govern.
package main

import (
	"bufio"
	"flag"
	"fmt"
	"io"
	"os"

	"github.com/sagspan/sagspan"
	"github.com/sagspan/sagspan/check"
)

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}

func run(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("checkbridge", flag.ContinueOnError)
	fs.SetOutput(stderr)
	format := fs.String("format", "text", "report format: text, markdown or json")
	all := fs.Bool("all", false, "list every result of every load case, not only the governing ones")
	svg := fs.String("svg", "", "write the elevation drawing to this SVG file")
	demo := fs.Bool("demo-json", false, "print the demo bridge description (a template for your own) and exit")
	modes := fs.String("modes-svg", "", "write the drawing of the first mode shapes to this SVG file")
	strict := fs.Bool("strict-comfort", false, "fail, rather than flag, accelerations under walkers beyond their limits and crowds beyond the lock-in number")
	fast := fs.Bool("no-comfort", false, "skip the modal analysis and walkers' response (closed-form frequencies only)")
	fs.Usage = func() {
		fmt.Fprintf(stderr, "usage: checkbridge [flags] [bridge.json]\n\nChecks a cable-supported footbridge; with no file, the built-in demo bridge.\n\n")
		fs.PrintDefaults()
	}
	if err := fs.Parse(args); err != nil {
		return 1
	}
	if *demo {
		stdout.Write(sagspan.DemoJSON())
		return 0
	}
	var b sagspan.Bridge
	switch fs.NArg() {
	case 0:
		b = sagspan.Demo()
	case 1:
		var err error
		if b, err = sagspan.LoadFile(fs.Arg(0)); err != nil {
			fmt.Fprintln(stderr, err)
			return 1
		}
	default:
		fs.Usage()
		return 1
	}
	a, err := sagspan.Check(b, &sagspan.Options{StrictComfort: *strict, SkipComfort: *fast})
	if err != nil {
		fmt.Fprintln(stderr, err)
		return 1
	}
	out := bufio.NewWriter(stdout)
	opts := &check.RenderOptions{All: *all}
	switch *format {
	case "text":
		err = a.WriteText(out, opts)
	case "markdown", "md":
		err = a.WriteMarkdown(out, opts)
	case "json":
		err = a.WriteJSON(out)
	default:
		fmt.Fprintf(stderr, "checkbridge: unknown format %q; want text, markdown or json\n", *format)
		return 1
	}
	if err == nil {
		err = out.Flush()
	}
	if err != nil {
		fmt.Fprintln(stderr, "checkbridge:", err)
		return 1
	}
	if *svg != "" {
		if err := writeSVG(a, *svg); err != nil {
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

func writeSVG(a *sagspan.Analysis, name string) error { return writeFile(name, a.WriteSVG) }

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
