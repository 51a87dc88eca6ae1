package vibration

import "testing"

var sinkModal Modal

// BenchmarkModesDemoLike measures the modal analysis of the demo-like
// bridge: every mode up to 5 Hz vertical and 2.5 Hz lateral on the
// default mesh.
func BenchmarkModesDemoLike(b *testing.B) {
	m := demoLike()
	b.ReportAllocs()
	for b.Loop() {
		md, err := m.Modes(nil)
		if err != nil {
			b.Fatal(err)
		}
		sinkModal = md
	}
}
