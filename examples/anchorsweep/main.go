// Command anchorsweep shows what happens when the approach is shortened
// and the left anchor comes closer to its tower: the backstay steepens, the
// resultant of the rope forces on the tower tilts, and the check that
// governs the left bank changes.
//
// For each anchor position it runs the whole-bridge check and prints the
// backstay angle, the rope-force resultant's angle and eccentricity along
// the bridge at the column base under the worst case, and the governing
// check of the left bank. The left saddle is fixed to its column by
// default, where the effect is plainest; a sliding saddle caps the
// horizontal force at friction, a roller removes it. A fixed saddle's
// groove is free by default (the rope renders, its tension continuous);
// -groove clamped or -groove friction (with -groove-friction) grips it,
// and -groove "" checks both bounds.
//
// It sweeps the bridge the description file describes, or the built-in
// demo (an invented bridge at an invented site) when none is given; flags
// may come before or after the file:
//
//	go run ./examples/anchorsweep [bridge.json] [-from 18] [-to 5] [-step 1] [-drop 3.4] [-saddle fixed] [-groove free]
//
// The results support, and never replace, the design of a qualified
// engineer; local codes and licensed practice govern.
package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"math"
	"os"
	"strings"
	"text/tabwriter"

	"github.com/sagspan/sagspan"
	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/examples/internal/cli"
	"github.com/sagspan/sagspan/units"
)

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}

const usage = `usage: anchorsweep [flags] [bridge.json] [flags]

Moves the left anchor of the bridge (the built-in demo when no file is
given) towards its tower and shows how the left bank's checks change.

`

func run(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("anchorsweep", flag.ContinueOnError)
	from := fs.Float64("from", 0, "first horizontal distance from saddle to anchor, m (0: the description's + 2 m)")
	to := fs.Float64("to", 0, "last horizontal distance, m (0: 0.3 of the description's)")
	step := fs.Float64("step", 1, "step, m")
	drop := fs.Float64("drop", 0, "drop of the anchor below the saddle, m (0: the description's)")
	saddle := fs.String("saddle", "fixed", "left saddle kind: fixed, sliding or roller")
	friction := fs.Float64("friction", 0.05, "friction coefficient of a sliding saddle")
	groove := fs.String("groove", "free", `groove of a fixed saddle: free, friction, clamped, or "" for both bounds`)
	grooveFriction := fs.Float64("groove-friction", 0.1, "friction coefficient between rope and groove, for -groove friction")
	files, err := cli.Parse(fs, args, usage, stdout, stderr)
	if errors.Is(err, flag.ErrHelp) {
		return 0
	}
	if err != nil {
		return 1
	}
	b, source, err := cli.Load(files)
	if err != nil {
		fmt.Fprintln(stderr, "anchorsweep:", err)
		return 1
	}
	bs := b.Banks.Left.Backstay
	if *from == 0 {
		*from = float64(bs.Horizontal) + 2
	}
	if *to == 0 {
		*to = math.Max(1, math.Round(0.3*float64(bs.Horizontal)))
	}
	if *drop == 0 {
		*drop = float64(bs.Drop)
	}
	spec := sagspan.SaddleSpec{Kind: *saddle, Friction: *friction}
	if *saddle == "fixed" {
		spec.Groove = *groove
		if *groove == "friction" {
			spec.GrooveFriction = *grooveFriction
		}
	}
	if err := sweep(stdout, b, source, *from, *to, *step, *drop, spec); err != nil {
		fmt.Fprintln(stderr, "anchorsweep:", err)
		return 1
	}
	return 0
}

func sweep(w io.Writer, base sagspan.Bridge, source string, from, to, step, drop float64, saddle sagspan.SaddleSpec) error {
	if !(step > 0) || from < to || !(to > 0) || !(drop > 0) {
		return fmt.Errorf("want from >= to > 0, step > 0 and drop > 0; got from %v, to %v, step %v, drop %v", from, to, step, drop)
	}
	fmt.Fprintf(w, "Left anchor sweep on %q (%s), left saddle %s %s.\n", base.Name, source, saddle.Kind, saddle.Groove)
	fmt.Fprintln(w, check.Caution)
	fmt.Fprintln(w)
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintln(tw, "Anchor at\tBackstay\tResultant\tEccentricity\tGoverning left-bank check\tCase\tRatio\tStatus")
	for h := from; h >= to-1e-9; h -= step {
		b := base
		b.Banks.Left.Backstay.Horizontal = units.Length(h)
		b.Banks.Left.Backstay.Drop = units.Length(drop)
		b.Banks.Left.Tower.Saddle = saddle
		a, err := sagspan.Check(b, nil)
		if err != nil {
			return err
		}
		left := a.Report.Filter(func(r check.Result) bool { return strings.HasPrefix(r.Element, "left ") })
		worst, ok := left.Worst()
		if !ok {
			return fmt.Errorf("no left-bank results")
		}
		// The rope-force resultant along the bridge under the case that
		// governs its eccentricity: its angle δ from the vertical.
		ecc := left.Filter(func(r check.Result) bool { return r.ID == "tower.eccentricity" && r.Element == "left tower" })
		gov, _ := ecc.Worst()
		delta, _ := gov.Value("δ")
		tilt := units.Angle(delta.Value)
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s of %s\t%s (%s)\t%s\t%.3f\t%s\n",
			units.Length(h), units.Angle(math.Atan2(drop, h)), tilt,
			units.Length(gov.Demand), units.Length(gov.Capacity),
			worst.ID, worst.Element, worst.Case, worst.Ratio, worst.Status)
	}
	return tw.Flush()
}
