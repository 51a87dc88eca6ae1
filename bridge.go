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
	// Eccentricity sets the allowed eccentricity of the resultant at the
	// column base; zero value means the kern of the effective section.
	Eccentricity EccentricitySpec `json:"eccentricity,omitempty"`
}

// SaddleSpec says how the ropes sit on the tower. The rope renders over
// the saddle's groove with its tension continuous in every kind; the kind
// says how the saddle itself is held on the column:
//
//	fixed:   bolted to the column, which takes the whole unbalanced horizontal force
//	sliding: on a bearing plate; it slides once the unbalance exceeds Friction × the vertical force
//	roller:  on rollers; the column takes no horizontal force
type SaddleSpec struct {
	// Kind is "fixed", "sliding" or "roller".
	Kind string `json:"kind"`
	// Friction is the friction coefficient of a sliding saddle's plate.
	Friction float64 `json:"friction,omitempty"`
}

// SectionSpec is the reinforced-concrete column section. Bars are placed
// symmetrically, half on each face normal to the bridge axis.
type SectionSpec struct {
	Concrete    units.Pressure `json:"concrete"` // characteristic cylinder strength
	Steel       units.Pressure `json:"steel,omitempty"`
	Bars        int            `json:"bars,omitempty"`
	BarDiameter units.Length   `json:"bar_diameter,omitempty"`
	Cover       units.Length   `json:"cover,omitempty"` // to the bar centres
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

// EccentricitySpec sets the allowed eccentricity of the rope-force
// resultant at the column base.
type EccentricitySpec struct {
	// Rule is "kern" (default: no tension, d/6 of the effective depth) or
	// "fraction" (Fraction × d/2 + Offset).
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
	// Depth of the base (block) or of the bottom of the beam's face
	// (deadman) below the ground at the anchor.
	Depth      units.Length     `json:"depth,omitempty"`
	UnitWeight units.UnitWeight `json:"unit_weight,omitempty"`
	// Passive is the fraction of the passive earth resistance in front of a
	// block counted on; zero counts none.
	Passive float64 `json:"passive,omitempty"`
	// AttachX and AttachZ place the backstay attachment in a block, from its
	// base edge farthest from the tower, x towards the tower, z up; zero
	// means the middle of the length and a third of the height (common
	// practice: the rope loops round a beam cast low in the block). For a
	// deadman AttachZ is the attachment's height above the bottom of its
	// face; zero means the middle of the face. The attachment lies Drop
	// below the saddle (banks.*.backstay.drop), which fixes the anchor's
	// elevation against groundwater and flood levels.
	AttachX units.Length `json:"attach_x,omitempty"`
	AttachZ units.Length `json:"attach_z,omitempty"`
	// Attachment is how the ropes are fixed to the anchor; when it is left
	// out the rope forces at the anchor are reported for its design, not
	// checked.
	Attachment *AttachmentSpec `json:"attachment,omitempty"`
	// Beam is a deadman's steel section, checked in bending and shear as a
	// beam on the soil reaction; when it is left out (a concrete or timber
	// deadman) its design moment and shear are reported.
	Beam *BeamSpec `json:"beam,omitempty"`

	// Rock anchor bars, in a row across the pull.
	Bars        int            `json:"bars,omitempty"`
	BarDiameter units.Length   `json:"bar_diameter,omitempty"`
	BarStrength units.Pressure `json:"bar_strength,omitempty"` // yield strength f_y
	// BarUltimate is the bars' ultimate strength f_u, for the thread; zero
	// takes f_y (cautious).
	BarUltimate units.Pressure `json:"bar_ultimate,omitempty"`
	// BarSpacing is the distance between neighbouring bars; zero takes
	// their rock cones as one (cautious).
	BarSpacing   units.Length `json:"bar_spacing,omitempty"`
	HoleDiameter units.Length `json:"hole_diameter,omitempty"`
	BondLength   units.Length `json:"bond_length,omitempty"`
	FreeLength   units.Length `json:"free_length,omitempty"`
	// GroutBond is the ultimate grout–rock bond stress, from anchor tests
	// (BS 8081, EN 1537); left out, the rock preset's typical value.
	GroutBond *units.Pressure `json:"grout_bond,omitempty"`
	// Plate is the square head plate under each bar's nut; when it is left
	// out the plate is not checked.
	Plate *PlateSpec `json:"plate,omitempty"`
}

// AttachmentSpec is how the backstay ropes are fixed to their anchor.
type AttachmentSpec struct {
	// Kind is "rod": each rope's eye is fixed (by shackle or turnbuckle) to
	// steel rods cast into a block or deadman; or "loop": each rope passes
	// round a pin or pipe cast into the block and is clamped back on
	// itself. For a rock anchor the ropes' eyes are fixed to the bars'
	// heads: give "rod" with no rods.
	Kind string `json:"kind"`
	// Termination is the rope's end: "grips" (wire rope grips, k_e 0.80),
	// "ferrule" (ferrule-secured eye, 0.90) or "socket" (poured or swaged,
	// 1.0); or give Efficiency instead.
	Termination string  `json:"termination,omitempty"`
	Efficiency  float64 `json:"efficiency,omitempty"`
	// Rods cast into the block or deadman, sharing the pull of all the
	// backstays ("rod"): their number, gross diameter, yield and ultimate
	// strength, and the tensile stress area of their thread (zero: 0.78 of
	// the gross area).
	Rods          int            `json:"rods,omitempty"`
	RodDiameter   units.Length   `json:"rod_diameter,omitempty"`
	RodSteel      units.Pressure `json:"rod_steel,omitempty"`
	RodUltimate   units.Pressure `json:"rod_ultimate,omitempty"`
	RodThreadArea units.Area     `json:"rod_thread_area,omitempty"`
	// PinDiameter is the diameter of the pin or pipe the ropes loop round
	// ("loop").
	PinDiameter units.Length `json:"pin_diameter,omitempty"`
}

// BeamSpec is a deadman's steel section.
type BeamSpec struct {
	Steel          units.Pressure `json:"steel"`           // yield strength f_y
	PlasticModulus units.Volume   `json:"plastic_modulus"` // W_pl about the axis the pull bends
	ShearArea      units.Area     `json:"shear_area"`      // A_v in the direction of the pull
}

// PlateSpec is a rock anchor's square head plate.
type PlateSpec struct {
	Side      units.Length   `json:"side"`
	Thickness units.Length   `json:"thickness"`
	Steel     units.Pressure `json:"steel"` // yield strength f_y
}

// SoilSpec describes the ground of one bank: a preset, the site
// investigation's own parameters, or a preset with some of them
// overridden. Presence decides, not value: a field given counts even when
// zero ("cohesion": "0 kPa" removes a preset's c'; "undrained_strength":
// "0 kPa" checks a clay drained only), a field left out keeps the preset's
// value. Without a preset, unit_weight and friction (or rock) are needed.
//
// A fine soil with an undrained_strength is checked in the short-term
// (undrained) and the long-term (drained) condition at every footing and
// anchor; the report names the one that governs.
type SoilSpec struct {
	// Preset names a typical soil or rock (foundation.Presets).
	Preset string `json:"preset,omitempty"`
	// Rock says the ground is rock: its bearing comes from
	// allowable_bearing or rock_strength, never from soil theory, and rock
	// anchors may be grouted in it.
	Rock *bool `json:"rock,omitempty"`
	// UnitWeight is the bulk unit weight γ above the water table; give
	// either SubmergedUnitWeight (γ') or SaturatedUnitWeight (γsat) for the
	// soil below it (neither: γ − γw).
	UnitWeight          *units.UnitWeight `json:"unit_weight,omitempty"`
	SubmergedUnitWeight *units.UnitWeight `json:"submerged_unit_weight,omitempty"`
	SaturatedUnitWeight *units.UnitWeight `json:"saturated_unit_weight,omitempty"`
	// Friction and Cohesion are the drained strength φ', c'.
	Friction *units.Angle    `json:"friction,omitempty"`
	Cohesion *units.Pressure `json:"cohesion,omitempty"`
	// UndrainedStrength is the undrained shear strength c_u of a clay or
	// silt.
	UndrainedStrength *units.Pressure `json:"undrained_strength,omitempty"`
	// Interface is δ/φ' of concrete on this ground; left out, 2/3.
	Interface *float64 `json:"interface,omitempty"`
	// Allowable is an allowable bearing pressure from the site
	// investigation: on rock the bearing limit; on soil it replaces the
	// bearing-capacity equation on the allowable basis.
	Allowable *units.Pressure `json:"allowable_bearing,omitempty"`
	// RockStrength, JointSpacing and JointAperture (uniaxial compressive
	// strength of rock cores, spacing and opening of the joints) give rock
	// its allowable bearing pressure by the K_sp method when no
	// allowable_bearing is given.
	RockStrength  *units.Pressure `json:"rock_strength,omitempty"`
	JointSpacing  *units.Length   `json:"joint_spacing,omitempty"`
	JointAperture *units.Length   `json:"joint_aperture,omitempty"`
	// BearingMethod is the bearing-capacity method of this bank's footing
	// and anchor block: "EN 1997-1 Annex D" (default) or "Vesic".
	BearingMethod string `json:"bearing_method,omitempty"`
	// Groundwater is the elevation of the groundwater table at this bank
	// (the datum of the site's elevations); left out, no groundwater within
	// reach. The design flood (site.flood_elevation) raises it at every
	// footing and anchor it reaches, in the flood case.
	Groundwater *units.Length `json:"groundwater_elevation,omitempty"`
}

// Given returns a pointer to x, for the optional fields of a description
// built in Go, such as SoilSpec{Preset: "soft clay",
// Cohesion: sagspan.Given(0 * units.Kilopascal)}.
func Given[T any](x T) *T { return &x }

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
