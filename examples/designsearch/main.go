// Command designsearch searches a bridge's design space for the cheapest
// design that passes every check: dead-load sag ratio, walkway rope
// diameter and count, anchor block size and footing size, priced with an
// invented demo price list. It prints the best design, the trade-off of
// cost against utilisation, and why the nearest infeasible designs fail,
// with a progress bar when standard error is a terminal.
//
// It searches around the bridge the description file describes, or the
// built-in demo (an invented bridge at an invented site) when none is
// given; flags may come before or after the file:
//
//	go run ./examples/designsearch [bridge.json] [-workers N] [-report]
//
// The prices are invented. The results support, and never replace, the
// design of a qualified engineer; local codes and licensed practice govern.
package main

import (
	"context"
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"os"
	"os/signal"
	"strings"
	"text/tabwriter"
	"time"

	"github.com/sagspan/sagspan"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/examples/internal/cli"
	"github.com/sagspan/sagspan/units"
)

func main() {
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	code := run(ctx, os.Args[1:], os.Stdout, os.Stderr)
	stop()
	os.Exit(code)
}

const usage = `usage: designsearch [flags] [bridge.json] [flags]

Searches sag, walkway ropes, anchor blocks and footings around the bridge
(the built-in demo when no file is given) for the cheapest design that
passes every check.

`

func run(ctx context.Context, args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("designsearch", flag.ContinueOnError)
	workers := fs.Int("workers", 0, "worker goroutines (0: one per core)")
	report := fs.Bool("report", false, "print the full report of the best design")
	files, err := cli.Parse(fs, args, usage, stdout, stderr)
	if errors.Is(err, flag.ErrHelp) {
		return 0
	}
	if err != nil {
		return 1
	}
	b, source, err := cli.Load(files)
	if err != nil {
		fmt.Fprintln(stderr, "designsearch:", err)
		return 1
	}
	if err := search(ctx, stdout, stderr, b, source, *workers, *report); err != nil {
		fmt.Fprintln(stderr, "designsearch:", err)
		return 1
	}
	return 0
}

// space is the grid searched around bridge b: 5 sag ratios, 4 diameters
// and 3 counts of the first walkway group's ropes, 18 anchor block sizes
// and 12 footing sizes scaled from the left bank's.
func space(b sagspan.Bridge) sagspan.SearchSpace {
	var rope sagspan.RopeGroup
	for _, g := range b.Ropes {
		if g.Role == sagspan.RoleWalkway {
			rope = g
			break
		}
	}
	mm := func(x float64) units.Length { return units.Length(math.Round(x*1000)) * units.Millimetre }
	dm := func(x float64) units.Length { return units.Length(math.Round(x*10)) / 10 * units.Metre }
	d := float64(rope.Rope.Diameter)
	s := sagspan.SearchSpace{
		SagRatios: []float64{1.0 / 24, 1.0 / 22, 1.0 / 20, 1.0 / 18, 1.0 / 16},
		Diameters: []units.Length{mm(0.8 * d), mm(0.9 * d), mm(d), mm(1.12 * d)},
		Counts:    []int{max(1, rope.Count-2), rope.Count, rope.Count + 2},
	}
	an, ft := b.Banks.Left.Anchor, b.Banks.Left.Tower.Footing
	if an.Type == "block" {
		for _, l := range []float64{0.8, 1, 1.2} {
			for _, w := range []float64{0.8, 1, 1.2} {
				for _, h := range []float64{0.85, 1.08} {
					height := dm(h * float64(an.Height))
					s.Anchors = append(s.Anchors, sagspan.BlockSize{Length: dm(l * float64(an.Length)), Width: dm(w * float64(an.Width)),
						Height: height, Depth: height + an.Depth - an.Height})
				}
			}
		}
	}
	for _, l := range []float64{0.75, 0.9, 1.08} {
		for _, w := range []float64{0.87, 1} {
			for _, t := range []float64{0.86, 1.14} {
				s.Footings = append(s.Footings, sagspan.FootingSize{Length: dm(l * float64(ft.Length)), Width: dm(w * float64(ft.Width)), Thickness: dm(t * float64(ft.Thickness))})
			}
		}
	}
	return s
}

func isTerminal(f *os.File) bool {
	st, err := f.Stat()
	return err == nil && st.Mode()&os.ModeCharDevice != 0
}

func search(ctx context.Context, stdout, stderr io.Writer, b sagspan.Bridge, source string, workers int, report bool) error {
	settings := &sagspan.SearchSettings{Workers: workers}
	if f, ok := stderr.(*os.File); ok && isTerminal(f) {
		settings.Progress = func(done, total int) {
			const width = 40
			n := width * done / total
			fmt.Fprintf(stderr, "\r[%s%s] %d/%d", strings.Repeat("#", n), strings.Repeat(".", width-n), done, total)
			if done == total {
				fmt.Fprintln(stderr)
			}
		}
	}
	start := time.Now()
	res, err := sagspan.Search(ctx, b, space(b), settings)
	if err != nil {
		return err
	}
	elapsed := time.Since(start)
	fmt.Fprintf(stdout, "Design search on %q (%s; invented prices)\n%s\n\n", b.Name, source, check.Caution)
	fmt.Fprintf(stdout, "%d candidates, %d feasible, in %.2f s.\n\n", res.Evaluated, res.Feasible, elapsed.Seconds())
	tw := tabwriter.NewWriter(stdout, 0, 0, 2, ' ', 0)
	row := func(d sagspan.Design) {
		fmt.Fprintf(tw, "%.0f\t1/%.0f\t%d × %s\t%s × %s × %s\t%s × %s × %s\t%.3f\t%s (%s, %s)\n",
			d.Cost, 1/d.SagRatio, d.Count, d.Diameter,
			d.Anchor.Length, d.Anchor.Width, d.Anchor.Height,
			d.Footing.Length, d.Footing.Width, d.Footing.Thickness,
			d.Utilisation, d.Governing.ID, d.Governing.Element, d.Governing.Case)
	}
	head := "Cost\tSag\tWalkway ropes\tAnchor blocks\tFootings\tUtilisation\tGoverning check\n"
	if res.Best == nil {
		fmt.Fprintln(stdout, "No design in the space passes every check.")
	} else {
		fmt.Fprintln(stdout, "Cheapest design that passes every check:")
		fmt.Fprint(tw, head)
		row(*res.Best)
		tw.Flush()
		fmt.Fprintln(stdout, "\nTrade-off: paying more buys lower utilisation")
		fmt.Fprint(tw, head)
		for _, d := range res.Front {
			row(d)
		}
		tw.Flush()
	}
	fmt.Fprintln(stdout, "\nNearest designs that fail, and why:")
	fmt.Fprint(tw, head)
	for _, d := range res.NearMisses {
		row(d)
	}
	tw.Flush()
	if report && res.Analysis != nil {
		fmt.Fprintln(stdout)
		return res.Analysis.WriteText(stdout, nil)
	}
	return nil
}
