package cable

import (
	"fmt"

	"github.com/sagspan/sagspan/units"
)

// ErectionRow is one line of an erection table: the midspan sag below the
// chord and the horizontal tension to set the bare ropes to at a
// temperature.
type ErectionRow struct {
	Temperature units.Temperature
	Sag         units.Length
	H           units.Force
}

// ErectionTable returns, for each temperature in temps, the sag and H of
// the bare ropes (own weight bare per horizontal metre) such that, once
// the walkway's dead load dead is added (on top of bare), the ropes hang
// at designSag at midspan at temperature ref.
//
// The finished state is the Loaded shape under bare + dead with
// H_d = M(L/2)/designSag; each row is ChangeOfState from it to the bare
// load at the row's temperature, and its sag is M_bare(L/2)/H. Both states
// share one unstretched rope, so setting the ropes to the row's sag fixes
// the length the bridge will hang from.
func ErectionTable(s Span, e Elastic, bare units.LoadPerLength, dead Load, designSag units.Length, ref units.Temperature, temps []units.Temperature) ([]ErectionRow, error) {
	if err := positive("bare rope weight", float64(bare)); err != nil {
		return nil, err
	}
	full := Load{Uniform: dead.Uniform + bare, Patches: dead.Patches}
	if err := dead.Validate(s); err != nil {
		// a dead load that is only the ropes' own weight is allowed (total zero)
		if float64(dead.Total(s)) != 0 || full.Validate(s) != nil {
			return nil, err
		}
	}
	if err := e.validate(); err != nil {
		return nil, err
	}
	if err := validTemperature("reference temperature", ref); err != nil {
		return nil, err
	}
	finished, err := LoadedWithSag(s, full, designSag)
	if err != nil {
		return nil, err
	}
	from := State{Load: full, H: finished.Horizontal(), Temperature: ref}
	bareLoad := Load{Uniform: bare}
	L := float64(s.Length)
	mid := float64(bare) * L * L / 8
	rows := make([]ErectionRow, 0, len(temps))
	for _, t := range temps {
		st, err := ChangeOfState(s, e, from, bareLoad, t)
		if err != nil {
			return nil, fmt.Errorf("cable: erection table at %v: %w", t, err)
		}
		rows = append(rows, ErectionRow{Temperature: t, Sag: units.Length(mid / float64(st.H)), H: st.H})
	}
	return rows, nil
}
