package sagspan

import (
	"testing"
	"time"
)

func TestZZTimeline(t *testing.T) {
	b := Demo()
	for range 20 {
		Check(b, &Options{SkipComfort: true})
	}
	t0 := time.Now()
	m, _ := newModel(b)
	t1 := time.Now()
	m.grooves = m.variants()[0].grooves
	var c collected
	perm, _, _, _ := m.caseStates(&c, m.b.Cases()[0])
	t2 := time.Now()
	f := m.families(perm, true)
	var durs [3]time.Duration
	for i, fam := range f.fams {
		s := time.Now()
		f.models[i].searchLength(&c, perm, fam, true)
		durs[i] = time.Since(s)
	}
	t3 := time.Now()
	for _, lc := range m.b.Cases()[1:] {
		svc, des, ok, _ := m.caseStates(&c, lc)
		if ok {
			m.ropeChecks(&c, svc, des, true)
			m.structureChecks(&c, perm, svc, des)
			m.groundChecks(&c, perm, svc)
		}
	}
	t4 := time.Now()
	a := &Analysis{}
	m.erection(a, &Options{})
	t5 := time.Now()
	t.Logf("newModel %v perm %v families %v fixed %v erection %v", t1.Sub(t0), t2.Sub(t1), durs, t4.Sub(t3), t5.Sub(t4))
	s := time.Now()
	Check(b, &Options{SkipComfort: true})
	t.Logf("Check %v", time.Since(s))
}
