package tower

import (
	"github.com/sagspan/sagspan/units"
)

// DefaultUnitWeight is the unit weight used when a Column's or Footing's
// UnitWeight is zero: 24 kN/m³, normal-weight concrete (EN 1991-1-1
// Table A.1, from memory). That table adds 1 kN/m³ for ordinary
// reinforcement; the lower value is kept as the default because it is
// conservative for overturning and sliding. Set 25 kN/m³ explicitly for a
// reinforced column when base pressure governs.
const DefaultUnitWeight = 24 * units.KilonewtonPerCubicMetre

// Column is a rectangular tower column (concrete or masonry).
type Column struct {
	// Depth is the gross dimension along the bridge axis, the direction of
	// the horizontal rope forces.
	Depth units.Length
	// Width is the gross dimension across the bridge.
	Width units.Length
	// Height is the height from the base section to the top.
	Height units.Length
	// Facing is the thickness of non-structural formwork or masonry facing
	// on each face; it is excluded from the effective section on all four
	// faces (so along the bridge d_eff = Depth − 2·Facing) but its weight
	// is counted.
	Facing units.Length
	// UnitWeight of the column material; zero means DefaultUnitWeight.
	UnitWeight units.UnitWeight
	// Drag is the force coefficient c_f of the column for wind across the
	// bridge; zero means DefaultColumnDrag.
	Drag float64
	// Area is the area of the column's cross-section for its weight (a
	// steel tube's, say); zero means Depth × Width, a solid rectangle.
	Area units.Area
}

func (c Column) validate() error {
	if err := positive("Column.Depth", c.Depth); err != nil {
		return err
	}
	if err := positive("Column.Width", c.Width); err != nil {
		return err
	}
	if err := positive("Column.Height", c.Height); err != nil {
		return err
	}
	if err := nonNegative("Column.Facing", c.Facing); err != nil {
		return err
	}
	if 2*c.Facing >= min(c.Depth, c.Width) {
		return invalid("Column.Facing", c.Facing, "leaves no effective section (twice the facing reaches the smaller side)")
	}
	if err := nonNegative("Column.Drag", units.Ratio(c.Drag)); err != nil {
		return err
	}
	if err := nonNegative("Column.Area", c.Area); err != nil {
		return err
	}
	return nonNegative("Column.UnitWeight", c.UnitWeight)
}

func (c Column) unitWeight() units.UnitWeight {
	if c.UnitWeight == 0 {
		return DefaultUnitWeight
	}
	return c.UnitWeight
}

// EffectiveDepth returns the structural depth along the bridge axis,
//
//	d_eff = Depth − 2·Facing
func (c Column) EffectiveDepth() units.Length { return c.Depth - 2*c.Facing }

// EffectiveWidth returns the structural width across the bridge,
//
//	b_eff = Width − 2·Facing
func (c Column) EffectiveWidth() units.Length { return c.Width - 2*c.Facing }

// Weight returns the self-weight of the column from its gross section,
// facing included:
//
//	W = γ · A · Height,   A = Area, or Depth · Width when Area is zero
func (c Column) Weight() units.Force {
	a := float64(c.Area)
	if a == 0 {
		a = float64(c.Depth) * float64(c.Width)
	}
	return c.unitWeight().Weight(units.Volume(a * float64(c.Height)))
}

// DefaultColumnDrag is the force coefficient used for wind on a column
// face when Column.Drag is zero: 2.4, the largest value of c_f,0 for a
// rectangular section with sharp corners over every depth-to-breadth ratio
// (EN 1991-1-4:2005 7.6, Figure 7.23, from memory), with ψ_r = ψ_λ = 1 (no
// reduction for rounded corners or end effects). It is conservative for
// every rectangle.
const DefaultColumnDrag = 2.4

// Wind returns the force that wind of peak velocity pressure q puts on the
// column across the bridge, as a level force at mid-height of the column
// (uniform pressure over the height, EN 1991-1-4:2005 5.3):
//
//	F = q · c_f · Depth · Height,   at Height/2
//
// The wind blows across the bridge onto the face of breadth Depth (the
// gross dimension along the bridge, facing included); c_f is Drag, or
// DefaultColumnDrag. The whole column height above the base section is
// taken as exposed (conservative where the ground covers part of it).
// The force is positive downwind. Special cases: a negative or non-finite
// q gives ErrInvalid.
func (c Column) Wind(q units.Pressure) (LevelForce, error) {
	if err := c.validate(); err != nil {
		return LevelForce{}, err
	}
	if err := nonNegative("wind pressure", q); err != nil {
		return LevelForce{}, err
	}
	cf := c.Drag
	if cf == 0 {
		cf = DefaultColumnDrag
	}
	f := float64(q) * cf * float64(c.Depth) * float64(c.Height)
	return LevelForce{Height: c.Height / 2, Lateral: units.Force(f)}, nil
}
