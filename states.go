package sagspan

import (
	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

// stateKey identifies a group state by everything it is solved for, so
// that a group whose load a case does not change (a handrail group under a
// crowd it does not carry, the same group in a case's service and design
// states) is solved once.
type stateKey struct {
	grooves                [2]tower.Groove // the variant's
	group                  int
	uniform                units.LoadPerLength
	patches                [3]cable.Patch
	swing                  units.Angle
	dt, dtb, intact, scale float64
}

// key returns the key of group i's input in the variant of groove
// behaviour grooves, false for a load with more patches than a key holds.
func (in solveInput) key(i int, grooves [2]tower.Groove) (stateKey, bool) {
	if len(in.load.Patches) > len(stateKey{}.patches) {
		return stateKey{}, false
	}
	k := stateKey{grooves: grooves, group: i, uniform: in.load.Uniform, swing: in.swing,
		dt: in.dt, dtb: in.dtBackstay, intact: in.intact, scale: in.scale}
	copy(k.patches[:], in.load.Patches)
	return k, true
}

// stateCache holds the group states solved so far: a layer of its own
// over the layers of the model it was cloned from, which nobody writes
// once cloned (see clone), so that copies of a model share them without
// copying or locking.
type stateCache struct {
	states map[stateKey]GroupState
	parent *stateCache
}

func (c *stateCache) get(k stateKey) (GroupState, bool) {
	for l := c; l != nil; l = l.parent {
		if gs, ok := l.states[k]; ok {
			return gs, true
		}
	}
	return GroupState{}, false
}

// groupState returns group i's state for the input, solved once per
// distinct input.
func (m *model) groupState(i int, in solveInput) (GroupState, error) {
	k, ok := in.key(i, m.grooves)
	// A stretch of a loaded-length search is solved once (the search
	// never tries a stretch twice): a group its crowd stands on is neither
	// looked for nor kept.
	ok = ok && !(m.stretch && len(in.load.Patches) > 0)
	if ok {
		if gs, hit := m.states.get(k); hit {
			return gs, nil
		}
	}
	gs, err := m.solveGroup(i, in)
	if err != nil {
		return GroupState{}, err
	}
	if ok {
		if m.states == nil {
			m.states = &stateCache{}
		}
		if m.states.states == nil {
			m.states.states = make(map[stateKey]GroupState)
		}
		m.states.states[k] = gs
	}
	return gs, nil
}

// pair returns the states of case lc under characteristic loads (service)
// and under the design loads of the partial-factor basis (design); the two
// are one state where the factors are all 1 (an accidental case). warm,
// when not nil, holds a nearby case's pair to start the iterations from.
func (m *model) pair(lc LoadCase, warm *[2]CaseState) (svc, des CaseState, err error) {
	var ws, wd *CaseState
	if warm != nil {
		ws, wd = &warm[0], &warm[1]
	}
	if svc, err = m.analyseFrom(m.characteristic(lc), ws); err != nil {
		return CaseState{}, CaseState{}, err
	}
	dc := m.designCase(lc)
	if dc == svc.Case {
		return svc, svc, nil
	}
	if wd == nil {
		wd = &svc
	}
	if des, err = m.analyseFrom(dc, wd); err != nil {
		return CaseState{}, CaseState{}, err
	}
	return svc, des, nil
}

// clone returns a copy of the model for another goroutine: the resolved
// bridge shared, read only; the scratch space its own; the states solved so
// far shared as a frozen layer under a layer of the copy's own, and the
// model itself goes on in a new layer of its own. Clone is not safe for
// concurrent use on one model.
func (m *model) clone() *model {
	c := *m
	c.scratch, c.pulls = nil, nil
	frozen := m.states
	if frozen != nil && len(frozen.states) == 0 {
		frozen = frozen.parent // an empty layer needs no freezing
	}
	if frozen != nil {
		m.states = &stateCache{parent: frozen}
	}
	c.states = &stateCache{parent: frozen}
	return &c
}
