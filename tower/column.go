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
//	W = γ · Depth · Width · Height
func (c Column) Weight() units.Force {
	return c.unitWeight().Weight(units.Volume(float64(c.Depth) * float64(c.Width) * float64(c.Height)))
}
