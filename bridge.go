package sagspan

import (
	"github.com/sagspan/sagspan/units"
)

// Bridge describes one cable-supported footbridge: the site, the walkway,
// the rope groups, both banks, the loads and the verification basis. It is
// plain data with JSON tags; load one from a file with Load, check it with
// Check. In JSON a quantity may be a bare SI number or a string with its
// unit ("48 m", "3.2 kN/m").
type Bridge struct {
	Name    string      `json:"name"`
	Site    Site        `json:"site"`
	Climate Climate     `json:"climate"`
	Walkway Walkway     `json:"walkway"`
	Ropes   []RopeGroup `json:"ropes"`
	Banks   Banks       `json:"banks"`
	Loads   Loads       `json:"loads"`
	Basis   Basis       `json:"basis"`
	Comfort ComfortSpec `json:"comfort,omitempty"`
}

// Site is the crossing: the span between the walkway saddles and the
// levels that decide clearance. Elevations share one datum.
type Site struct {
	// Span is the horizontal distance between the walkway-rope saddles.
	Span units.Length `json:"span"`
	// Rise is the height of the right saddle above the left one; negative
	// when the right saddle is lower.
	Rise units.Length `json:"rise"`
	// LeftSaddle is the elevation of the left walkway-rope saddle.
	LeftSaddle units.Length `json:"left_saddle_elevation"`
	// Flood is the elevation of the design flood.
	Flood units.Length `json:"flood_elevation"`
	// Freeboard is the clearance required between the design flood and the
	// underside of the walkway at its lowest point.
	Freeboard units.Length `json:"freeboard"`
	// Ground optionally traces the ground along the bridge axis for the
	// drawing: x from the left saddle (negative behind it), elevation z.
	Ground []Point `json:"ground,omitempty"`
}

// Point is a point in the elevation: x horizontal from the left saddle
// towards the right, z elevation.
type Point struct {
	X units.Length `json:"x"`
	Z units.Length `json:"z"`
}

// Climate holds the temperatures and wind the bridge must stand.
type Climate struct {
	// Reference is the temperature at which the ropes hang at their design
	// dead-load sag.
	Reference units.Temperature `json:"reference"`
	// Coldest and Hottest bound the rope temperature.
	Coldest units.Temperature `json:"coldest"`
	Hottest units.Temperature `json:"hottest"`
	// WindSpeed is the basic wind speed; the peak velocity pressure is then
	// Exposure · ½ρv² (EN 1991-1-4 cl. 4.5). WindPressure, when set, is the
	// peak velocity pressure itself and is used instead.
	WindSpeed    units.Velocity `json:"wind_speed,omitempty"`
	WindPressure units.Pressure `json:"wind_pressure,omitempty"`
	// Exposure is the exposure factor ce(z) of EN 1991-1-4 cl. 4.5; zero
	// means 2.5 (open country at 10–15 m, from memory).
	Exposure float64 `json:"exposure,omitempty"`
}

// Walkway is the deck the walkers use and the weight it hangs on the ropes.
type Walkway struct {
	// Width is the clear walking width that carries the crowd load.
	Width units.Length `json:"width"`
	// Depth is the distance from the walkway ropes down to the underside of
	// the walkway, used for flood clearance.
	Depth units.Length `json:"depth"`
	// DeadLoad is the weight per metre of cross-beams, deck and fencing,
	// without the ropes. Leave zero and list Parts to build it up.
	DeadLoad units.LoadPerLength `json:"dead_load,omitempty"`
	// Parts, when given, add up to the dead load.
	Parts []Part `json:"parts,omitempty"`
	// WindDepth is the height of the walkway face exposed to wind; zero
	// means Depth.
	WindDepth units.Length `json:"wind_depth,omitempty"`
}

// Part is one component of the walkway dead load.
type Part struct {
	Name string              `json:"name"`
	Load units.LoadPerLength `json:"load"`
}

// Role says what a rope group does.
type Role string

// The rope roles.
const (
	RoleWalkway  Role = "walkway"  // ropes the walkway rests on or hangs from
	RoleHandrail Role = "handrail" // ropes along the top of the side fencing
)

// RopeGroup is a set of identical ropes that hang together at one sag.
type RopeGroup struct {
	Name  string   `json:"name"`
	Role  Role     `json:"role"`
	Count int      `json:"count"`
	Rope  RopeSpec `json:"rope"`
	// Sag is the design dead-load sag at midspan below the chord, at the
	// reference temperature.
	Sag units.Length `json:"sag"`
	// Share is the fraction of the walkway dead load and crowd load this
	// group carries; the shares of all groups add up to 1. Zero for every
	// group means: walkway groups share in proportion to their rope count,
	// handrail groups carry their own weight and wind only.
	Share float64 `json:"share,omitempty"`
	// Offset is the height of this group's saddles above the walkway-rope
	// saddles, the same on both towers (zero for walkway ropes).
	Offset units.Length `json:"offset,omitempty"`
}

// RopeSpec chooses a rope from the catalogue of a construction, or gives
// its properties directly when MBF is set.
type RopeSpec struct {
	// Construction names the catalogue construction, such as "6x36-IWRC".
	Construction string `json:"construction,omitempty"`
	// Diameter is the nominal rope diameter.
	Diameter units.Length `json:"diameter"`
	// Grade is the rope grade (nominal wire tensile strength), such as "1770 MPa".
	Grade units.Pressure `json:"grade,omitempty"`

	// A rope given directly, not from the catalogue.
	MBF     units.Force            `json:"mbf,omitempty"`
	Area    units.Area             `json:"area,omitempty"`
	Modulus units.Pressure         `json:"modulus,omitempty"`
	Mass    units.MassPerLength    `json:"mass,omitempty"`
	Alpha   units.ThermalExpansion `json:"alpha,omitempty"`
}

// Banks holds the left and right bank.
type Banks struct {
	Left  Bank `json:"left"`
	Right Bank `json:"right"`
}

// Bank is what stands on one bank: tower, backstay, anchor and soil.
type Bank struct {
	Tower    TowerSpec  `json:"tower"`
	Backstay Backstay   `json:"backstay"`
	Anchor   AnchorSpec `json:"anchor"`
	Soil     SoilSpec   `json:"soil"`
}

// TowerSpec is the tower column, its saddle, section and footing.
type TowerSpec struct {
	// Height is the height of the walkway-rope saddle above the column
	// base section (the top of the footing).
	Height units.Length `json:"height"`
	// Depth and Width are the gross column dimensions along and across the
	// bridge.
	Depth units.Length `json:"depth"`
	Width units.Length `json:"width"`
	// Facing is the thickness of non-structural facing (masonry, formwork)
	// on each face, left out of the effective section.
	Facing units.Length `json:"facing,omitempty"`
	// UnitWeight of the column and footing; zero means 24 kN/m³.
	UnitWeight units.UnitWeight `json:"unit_weight,omitempty"`
	Saddle     SaddleSpec       `json:"saddle"`
	Section    SectionSpec      `json:"section"`
	Footing    FootingSpec      `json:"footing"`
	// Eccentricity sets how the resultant of the rope forces is checked;
	// the zero value: the rope-line form at the column base against the
	// kern of the effective section.
	Eccentricity EccentricitySpec `json:"eccentricity,omitempty"`
	// Drag is the force coefficient of the column for wind across the
	// bridge; zero means tower.DefaultColumnDrag (2.4) for a concrete
	// column and 1.2 for a circular tube (from memory, EN 1991-1-4 7.9,
	// subcritical flow).
	Drag float64 `json:"drag,omitempty"`
}

// SaddleSpec says how the ropes sit on the tower: how the saddle is held
// on the column (Kind) and, for a fixed saddle, how the rope is held in its
// groove (Groove):
//
//	fixed:   bolted to the column, which takes the whole unbalanced horizontal force
//	sliding: on a bearing plate, the rope clamped on it; it slides once the unbalance exceeds Friction × the vertical force
//	roller:  on rollers, the rope clamped on it; the column takes no horizontal force along the bridge
//
//	groove "free":     the rope renders freely, its tension the same on both sides
//	groove "friction": the rope grips the groove with GrooveFriction μ over the wrap angle the
//	                   geometry gives, and renders once the tensions differ by more than e^{μθ}
//	groove "clamped":  the rope is clamped on the saddle; span and backstay tensions are independent
//	groove "" (not known): both bounding behaviours, free and clamped, are checked and each
//	                   check reports the one that governs it
type SaddleSpec struct {
	// Kind is "fixed", "sliding" or "roller".
	Kind string `json:"kind"`
	// Friction is the friction coefficient of a sliding saddle's plate.
	Friction float64 `json:"friction,omitempty"`
	// Groove is "free", "friction", "clamped", or empty when not known
	// (fixed saddles only).
	Groove string `json:"groove,omitempty"`
	// GrooveFriction is the coefficient of friction between rope and
	// groove, for groove "friction".
	GrooveFriction float64 `json:"groove_friction,omitempty"`
}

// SectionSpec is the column section. Type "concrete" (the default) is a
// reinforced-concrete rectangle of the tower's effective size, its bars
// placed symmetrically, half on each face normal to the bridge axis; a
// concrete column with no bars is plain. Type "tube" is one hollow steel
// tube, "frame" two tube legs side by side across the bridge, joined by
// bracing, Spacing apart.
type SectionSpec struct {
	// Type is "concrete" (default), "tube" or "frame".
	Type        string         `json:"type,omitempty"`
	Concrete    units.Pressure `json:"concrete,omitempty"` // characteristic cylinder strength
	Steel       units.Pressure `json:"steel,omitempty"`    // yield strength of bars or tube
	Bars        int            `json:"bars,omitempty"`
	BarDiameter units.Length   `json:"bar_diameter,omitempty"`
	Cover       units.Length   `json:"cover,omitempty"` // to the bar centres
	// Creep is the creep coefficient φ(∞, t0) of the concrete; zero means
	// 2.0 (see tower.DefaultCreep).
	Creep float64 `json:"creep,omitempty"`

	// Steel tube or frame legs (EN 1993-1-1).
	Shape      string       `json:"shape,omitempty"` // "circular" (default) or "square"
	Size       units.Length `json:"size,omitempty"`  // outside diameter or width
	Wall       units.Length `json:"wall,omitempty"`
	ColdFormed bool         `json:"cold_formed,omitempty"`
	// Spacing of a frame's legs across the bridge, centre to centre; Panel
	// the distance between its bracing nodes (zero: the column height).
	Spacing units.Length `json:"spacing,omitempty"`
	Panel   units.Length `json:"panel,omitempty"`
}

// FootingSpec is the spread footing under a tower column.
type FootingSpec struct {
	Length    units.Length `json:"length"` // along the bridge
	Width     units.Length `json:"width"`
	Thickness units.Length `json:"thickness"`
	Depth     units.Length `json:"depth"` // of the underside below ground
	// ColumnOffset places the column axis from the footing centre, towards
	// the span positive (a footing often extends further on the backstay
	// side).
	ColumnOffset units.Length `json:"column_offset,omitempty"`
}

// EccentricitySpec sets how the resultant of the rope forces on a tower
// column is checked: where (Section), in which form, against which limit.
type EccentricitySpec struct {
	// Form is "rope" (default: the line of action of the rope forces
	// alone, e = h·tan δ, as practice checks it) or "statics" (ΣM/ΣV with
	// the column's weight). The other form's value is always reported.
	Form string `json:"form,omitempty"`
	// Section is the height of the checked section above the column base
	// section: where the column is first tied into its base. Zero means
	// the base section.
	Section units.Length `json:"section,omitempty"`
	// Rule is "kern" (default: no tension, d/6 of the effective section),
	// "section" (within the effective section: d/2 + Offset, Offset the
	// projection of a base beyond the column face) or "fraction"
	// (Fraction × d/2 + Offset).
	Rule     string       `json:"rule,omitempty"`
	Fraction float64      `json:"fraction,omitempty"`
	Offset   units.Length `json:"offset,omitempty"`
}

// Backstay is the straight run of rope from the saddle down to the anchor.
type Backstay struct {
	// Horizontal is the horizontal distance from the saddle back to the
	// anchor attachment point.
	Horizontal units.Length `json:"horizontal"`
	// Drop is how far the anchor attachment point lies below the walkway
	// saddle.
	Drop units.Length `json:"drop"`
}

// AnchorSpec is the anchorage the backstays run into.
type AnchorSpec struct {
	// Type is "block" (gravity anchor block), "deadman" or "rock".
	Type string `json:"type"`

	// Block and deadman dimensions.
	Length units.Length `json:"length,omitempty"` // along the pull
	Width  units.Length `json:"width,omitempty"`
	Height units.Length `json:"height,omitempty"`
	// Depth of the base (block) or of the beam's centre (deadman) below ground.
	Depth      units.Length     `json:"depth,omitempty"`
	UnitWeight units.UnitWeight `json:"unit_weight,omitempty"`
	// Passive is the fraction of the passive earth resistance in front of a
	// block counted on; zero counts none.
	Passive float64 `json:"passive,omitempty"`
	// AttachX and AttachZ place the backstay attachment in a block, from its
	// base edge farthest from the tower, x towards the tower, z up; zero
	// means the middle of the length and a third of the height (common
	// practice: the rope loops round a beam cast low in the block).
	AttachX units.Length `json:"attach_x,omitempty"`
	AttachZ units.Length `json:"attach_z,omitempty"`

	// Rock anchor bars.
	Bars         int            `json:"bars,omitempty"`
	BarDiameter  units.Length   `json:"bar_diameter,omitempty"`
	BarStrength  units.Pressure `json:"bar_strength,omitempty"`
	HoleDiameter units.Length   `json:"hole_diameter,omitempty"`
	BondLength   units.Length   `json:"bond_length,omitempty"`
	FreeLength   units.Length   `json:"free_length,omitempty"`
}

// SoilSpec picks a soil preset and overrides any of its values.
type SoilSpec struct {
	Preset     string           `json:"preset,omitempty"`
	UnitWeight units.UnitWeight `json:"unit_weight,omitempty"`
	Friction   units.Angle      `json:"friction,omitempty"`
	Cohesion   units.Pressure   `json:"cohesion,omitempty"`
	Allowable  units.Pressure   `json:"allowable_bearing,omitempty"`
}

// Loads sets the imposed loads. Every zero field takes its default.
type Loads struct {
	// Crowd is the pedestrian load per square metre of walkway; zero means
	// EN 1991-2 cl. 5.3.2.1: 2.0 + 120/(L+30) kN/m², within 2.5..5.0.
	Crowd units.Pressure `json:"crowd,omitempty"`
	// WindWithCrowd is the fraction of the wind pressure acting together
	// with the crowd; zero means 0.6 (EN 1990 ψ0 for wind, from memory).
	WindWithCrowd float64 `json:"wind_with_crowd,omitempty"`
	// DragCoefficient of a rope; zero means 1.2 (circular section,
	// subcritical flow; from memory).
	DragCoefficient float64 `json:"rope_drag,omitempty"`
	// WalkwayDrag is the force coefficient of the walkway face; zero means
	// 1.8 (common practice for a bluff deck with open fencing, from memory).
	WalkwayDrag float64 `json:"walkway_drag,omitempty"`
}

// Basis chooses how the checks are verified.
type Basis struct {
	// Method is "allowable" (default: unfactored loads, global factors of
	// safety) or "partial" (factored loads and resistances).
	Method string `json:"method,omitempty"`

	// Allowable basis: global factors of safety, zero → default.
	RopeFactor        float64 `json:"rope_factor,omitempty"`
	SlidingFactor     float64 `json:"sliding_factor,omitempty"`
	OverturningFactor float64 `json:"overturning_factor,omitempty"`
	UpliftFactor      float64 `json:"uplift_factor,omitempty"`
	BearingFactor     float64 `json:"bearing_factor,omitempty"`

	// Partial-factor basis: load factors, zero → default.
	GammaG float64 `json:"gamma_g,omitempty"`
	GammaQ float64 `json:"gamma_q,omitempty"`
	// GammaR is the rope resistance factor of EN 1993-1-11; zero → default.
	GammaR float64 `json:"gamma_r,omitempty"`
	// RopeEfficiency is the termination efficiency k_e of EN 1993-1-11;
	// zero → cable.DefaultKe.
	RopeEfficiency float64 `json:"rope_efficiency,omitempty"`

	// Ground checks on the partial basis, EN 1997-1 Annex A; zero → the
	// recommended values documented in foundation.Basis.
	Approach  string  `json:"approach,omitempty"` // "DA2" (default) or "DA1"
	GammaGdst float64 `json:"gamma_g_dst,omitempty"`
	GammaGstb float64 `json:"gamma_g_stb,omitempty"`
	GammaQdst float64 `json:"gamma_q_dst,omitempty"`
	GammaPhi  float64 `json:"gamma_phi,omitempty"`
	GammaC    float64 `json:"gamma_c,omitempty"`
	GammaRh   float64 `json:"gamma_rh,omitempty"`
	GammaRv   float64 `json:"gamma_rv,omitempty"`
	GammaRe   float64 `json:"gamma_re,omitempty"`

	// Column sections, EN 1992-1-1; zero → the values documented in
	// tower.RCSection (γc 1.5, γs 1.15, αcc 1.0).
	GammaConcrete float64 `json:"gamma_concrete,omitempty"`
	GammaSteel    float64 `json:"gamma_steel,omitempty"`
	AlphaCC       float64 `json:"alpha_cc,omitempty"`
}
