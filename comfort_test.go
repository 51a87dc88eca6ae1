package sagspan

import "testing"

var sinkComfort *Comfort

// BenchmarkModalDemo measures the modal analysis of the demo bridge, all
// modes up to 5 Hz vertical and 2.5 Hz lateral, and the walkers' response:
// the comfort stage alone, on the permanent state the chain computed.
func BenchmarkModalDemo(b *testing.B) {
	m, err := newModel(Demo())
	if err != nil {
		b.Fatal(err)
	}
	perm, err := m.analyse(m.b.Cases()[0].characteristic(m.psi))
	if err != nil {
		b.Fatal(err)
	}
	opts := &Options{}
	b.ReportAllocs()
	for b.Loop() {
		a := &Analysis{}
		if err := m.comfort(a, perm, opts); err != nil {
			b.Fatal(err)
		}
		sinkComfort = a.Comfort
	}
}

// BenchmarkCheckDemoNoComfort measures the whole-bridge check of the demo
// with the modal analysis switched off.
func BenchmarkCheckDemoNoComfort(b *testing.B) {
	br := Demo()
	opts := &Options{SkipComfort: true}
	b.ReportAllocs()
	for b.Loop() {
		a, err := Check(br, opts)
		if err != nil {
			b.Fatal(err)
		}
		sinkAnalysis = a
	}
}
