package foundation

import (
	"fmt"
	"math"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

// Condition is the ground condition a check is made in.
type Condition int

const (
	// Drained is the long-term condition: effective stresses, strength φ'
	// and c', pore pressures from the water table.
	Drained Condition = iota
	// Undrained is the short-term condition of a fine soil loaded faster
	// than it drains: total stresses, strength c_u with φ = 0 (EN 1997-1:2004
	// D.3 for bearing, 6.5.3(12) for sliding).
	Undrained
)

// String returns "drained (long-term)" or "undrained (short-term)".
func (c Condition) String() string {
	switch c {
	case Drained:
		return "drained (long-term)"
	case Undrained:
		return "undrained (short-term)"
	}
	return fmt.Sprintf("Condition(%d)", int(c))
}

func (c Condition) valid() bool { return c == Drained || c == Undrained }

// Water is the level of free water at a foundation: the groundwater table,
// or the design flood where it reaches the foundation. The zero value is
// dry ground (no water within reach).
type Water struct {
	// Present is true when there is water within reach of the foundation.
	Present bool
	// Depth is the depth of the water surface below the ground surface;
	// negative when water stands above the ground (a flooded bank).
	Depth units.Length
}

// WaterAt returns water standing at depth d below the ground surface
// (negative d: above it).
func WaterAt(d units.Length) Water { return Water{Present: true, Depth: d} }

func (w Water) validate(field string) error {
	if d := float64(w.Depth); w.Present && (math.IsNaN(d) || math.IsInf(d, 0)) {
		return finite(field+".Depth", d) // the name is built only on error
	}
	return nil
}

// depth returns the water's depth below ground, +Inf when there is none.
func (w Water) depth() float64 {
	if !w.Present {
		return math.Inf(1)
	}
	return float64(w.Depth)
}

// values returns the water's depth below the ground as a check value,
// none when there is no water.
func (w Water) values() []check.Value {
	if !w.Present {
		return nil
	}
	return []check.Value{check.Of("d_w", "depth of the water level below the ground at the foundation; negative above it", w.Depth)}
}

// String describes the water for a basis text.
func (w Water) String() string {
	switch {
	case !w.Present:
		return "no water within reach"
	case w.Depth < 0:
		return fmt.Sprintf("water %v above the ground", -w.Depth)
	default:
		return fmt.Sprintf("water %v below the ground", w.Depth)
	}
}

// stress returns the effective vertical stress σ'v and the pore pressure u
// at depth z below the ground surface in soil of unit weight g above the
// water and effective unit weight gs below it, water at depth dw (+Inf:
// none; negative: above the ground):
//
//	σ'v = γ·min(z, dw⁺) + γ'·max(0, z − dw⁺),  dw⁺ = max(dw, 0)
//	u   = γw·max(0, z − dw)
func stress(z, g, gs, dw float64) (sv, u float64) {
	dwp := math.Max(dw, 0)
	sv = g*math.Min(z, dwp) + gs*math.Max(0, z-dwp)
	u = float64(WaterUnitWeight) * math.Max(0, z-dw)
	return sv, u
}
