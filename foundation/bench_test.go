package foundation_test

import (
	"testing"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/foundation"
	"github.com/sagspan/sagspan/units"
)

var (
	sinkBearing foundation.Bearing
	sinkResults []check.Result
)

// BenchmarkBearingCapacity is on the design-search hot path.
func BenchmarkBearingCapacity(b *testing.B) {
	in := foundation.BearingInput{AlongLoad: 2, AcrossLoad: 3, Depth: 1, Vertical: 800 * units.Kilonewton, Horizontal: 60 * units.Kilonewton, EccAlong: 0.2}
	s := sand30()
	b.ReportAllocs()
	for b.Loop() {
		r, err := foundation.BearingCapacity(in, s, foundation.EC7, foundation.Drained)
		if err != nil {
			b.Fatal(err)
		}
		sinkBearing = r
	}
}

// BenchmarkAnchorBlockCheck: one anchor-block verification, as a design
// search sweeping block sizes runs it.
func BenchmarkAnchorBlockCheck(b *testing.B) {
	blk := testBlock()
	blk.PassiveMobilisation = 0.5
	pulls := []foundation.AnchorPull{testPull()}
	for _, bs := range []struct {
		name  string
		basis *foundation.Basis
	}{{"allowable", nil}, {"partial", &foundation.Basis{PartialFactors: true}}} {
		b.Run(bs.name, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				rs, err := blk.Check(pulls, testSand(), foundation.EC7, bs.basis)
				if err != nil {
					b.Fatal(err)
				}
				sinkResults = rs
			}
		})
	}
}
