package sagspan

import (
	"strconv"
	"strings"

	"github.com/sagspan/sagspan/check"
)

// NotChecked returns, in words, what a bridge built to the description
// needs and the whole-bridge check does not verify. The report prints it
// beside the verdict, so that a pass is read for what it covers: a pass
// of every check here leaves these to the engineer (common practice for
// the scope of a design check; the list follows the description, adding
// what its own choices leave open).
func (a *Analysis) NotChecked() []string {
	b := a.Bridge
	out := []string{
		"The walkway's own members and their connections: cross-beams, deck, fencing, hangers and their clamps on the ropes " +
			"(only their weight and wind area enter the checks).",
		"The structural design of the footings and anchor blocks (reinforcement, punching, the column's connection to its footing): " +
			"their size, stability and bearing are checked, not their concrete and steel details.",
		"The rope terminations' hardware (number and tightening of grips, sockets, thimbles, turnbuckles) beyond the efficiency " +
			"taken on the rope's strength, and the saddles' own structure beyond the groove's radius.",
		"Fatigue, corrosion and durability of ropes, clamps and steelwork; inspection and maintenance.",
		"Walkers' force along the bridge (modes that move the walkway lengthwise), runners and deliberate swaying: " +
			"the comfort stage assesses vertical and lateral walking only, each mode in its main direction.",
		"Actions the description does not carry: earthquake, debris and impact in the flood, vehicles and pack animals, " +
			"snow or ice unless given as a walkway part.",
	}
	if b.wind() <= 0 {
		out = append(out, "Wind: the description gives no wind speed or pressure (climate.wind_speed, climate.wind_pressure), "+
			"so no wind case is checked.")
	}
	if len(b.Loads.Omit) > 0 {
		// Each name quoted: a case's name may hold a comma ("wind, hottest
		// rope"), which unquoted reads as two things left out.
		names := make([]string, len(b.Loads.Omit))
		for i, n := range b.Loads.Omit {
			names[i] = strconv.Quote(n)
		}
		out = append(out, "The cases and searched loadings the description leaves out (loads.omit): "+strings.Join(names, "; ")+".")
	}
	var lifted []string
	for _, r := range a.Report.Results {
		if r.ID == "walkway.uplift" && strings.Contains(strings.Join(r.Notes, " "), "lifts the walkway in this case") {
			lifted = append(lifted, strconv.Quote(r.Case))
		}
	}
	if len(lifted) > 0 {
		out = append(out, "The rope, tower and foundation checks of the cases in which the wind lifts the walkway ("+
			strings.Join(lifted, "; ")+"): no rope state exists there, and walkway.uplift fails.")
	}
	bank := "The overall stability of each bank (a deep slip through it, scour and erosion around the bases)"
	if len(b.Site.Ground) < 2 {
		bank += "; without a ground line (site.ground) the ground around every base is taken level, which overestimates " +
			"bearing and passive resistance on a bank that falls away."
	} else {
		bank += ": bearing and passive resistance take the ground line's fall near each base, not a slip through the bank."
	}
	out = append(out, bank)
	for side := Left; side <= Right; side++ {
		k := b.bankOf(side)
		switch k.Tower.Section.Type {
		case "frame":
			out = append(out, "The "+side.String()+" tower's frame bracing members and their connections, and its base plates "+
				"and holding-down bolts (the frame's legs are checked, with the bracing's shear stiffness taken cautiously).")
		case "tube":
			out = append(out, "The "+side.String()+" tower's base plate and holding-down bolts (the tube is checked).")
		}
		if k.Anchor.Type != "rock" && k.Anchor.Attachment == nil {
			out = append(out, "The ropes' attachment at the "+side.String()+" anchor (none described): its forces are "+
				"reported for its design.")
		}
		soil, err := k.Soil.soil()
		if err == nil && soil.IsRock || k.Soil.IsRock != nil && *k.Soil.IsRock || k.Anchor.Type == "rock" {
			out = append(out, "The rock mass's own stability at the "+side.String()+" bank (joints dipping out of the slope, "+
				"loose blocks), which the rock's bearing pressure and anchor cones assume sound.")
		}
	}
	return out
}

// notCheckedSection renders NotChecked as a report section.
func (a *Analysis) notCheckedSection() check.Section {
	s := check.Section{ID: "not-checked", Title: "Not checked by this report",
		Text: []string{"A pass below covers the checks listed in the report, and only those. These remain with the engineer:"}}
	for _, item := range a.NotChecked() {
		s.Items = append(s.Items, [2]string{"", item})
	}
	return s
}
