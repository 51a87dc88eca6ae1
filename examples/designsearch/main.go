// Command designsearch searches the demo bridge's design space for the
// cheapest design that passes every check: dead-load sag ratio, walkway
// rope diameter and count, anchor block size and footing size, priced with
// an invented demo price list. It prints the best design, the trade-off of
// cost against utilisation, and why the nearest infeasible designs fail,
// with a progress bar when standard error is a terminal.
//
//	go run ./examples/designsearch [-workers N] [-report]
//
// The bridge, the site and the prices are invented. The results support,
// and never replace, the design of a qualified engineer; local codes and
// licensed practice govern.
package main

import (
	"context"
	"flag"
	"fmt"
	"io"
	"os"
	"os/signal"
	"strings"
	"text/tabwriter"
	"time"

	"github.com/sagspan/sagspan"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

func main() {
	workers := flag.Int("workers", 0, "worker goroutines (0: one per core)")
	report := flag.Bool("report", false, "print the full report of the best design")
	flag.Parse()
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	defer stop()
	if err := run(ctx, os.Stdout, os.Stderr, *workers, *report); err != nil {
		fmt.Fprintln(os.Stderr, "designsearch:", err)
		os.Exit(1)
	}
}

// space is the grid searched: 5 sag ratios × 4 diameters × 3 counts,
// 18 anchor block sizes and 12 footing sizes.
func space() sagspan.SearchSpace {
	m := units.Metre
	s := sagspan.SearchSpace{
		SagRatios: []float64{1.0 / 24, 1.0 / 22, 1.0 / 20, 1.0 / 18, 1.0 / 16},
		Diameters: []units.Length{26 * units.Millimetre, 28 * units.Millimetre, 32 * units.Millimetre, 36 * units.Millimetre},
		Counts:    []int{4, 6, 8},
	}
	for _, l := range []units.Length{3.5, 4.5, 5.5} {
		for _, w := range []units.Length{4, 5, 6} {
			for _, h := range []units.Length{2.2, 2.8} {
				s.Anchors = append(s.Anchors, sagspan.BlockSize{Length: l * m, Width: w * m, Height: h * m, Depth: (h + 0.4) * m})
			}
		}
	}
	for _, l := range []units.Length{1.8, 2.2, 2.6} {
		for _, w := range []units.Length{2.6, 3.0} {
			for _, t := range []units.Length{0.6, 0.8} {
				s.Footings = append(s.Footings, sagspan.FootingSize{Length: l * m, Width: w * m, Thickness: t * m})
			}
		}
	}
	return s
}

func isTerminal(f *os.File) bool {
	st, err := f.Stat()
	return err == nil && st.Mode()&os.ModeCharDevice != 0
}

func run(ctx context.Context, stdout, stderr io.Writer, workers int, report bool) error {
	b := sagspan.Demo()
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
	res, err := sagspan.Search(ctx, b, space(), settings)
	if err != nil {
		return err
	}
	elapsed := time.Since(start)
	fmt.Fprintf(stdout, "Design search on %q (invented site, invented prices)\n%s\n\n", b.Name, check.Caution)
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
