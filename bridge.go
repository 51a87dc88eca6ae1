package sagspan

import (
	"github.com/sagspan/sagspan/units"
)

// Bridge describes one cable-supported footbridge: the site, the walkway,
// the rope groups, both banks, the loads and the verification basis. It is
// plain data with JSON tags; load one from a file with Load, check it with
// Check. In JSON a quantity may be a bare SI number or a string with its
// unit ("48 m", "3.2 kN/m"), except where a bare number is ambiguous:
// temperatures, angles and the fields tagged `unit:"mm"` (diameters,
// cover, facing) must carry their unit. A field whose JSON tag lacks
// omitempty is required.
type Bridge struct {
	// Name names the bridge in reports.
	Name string `json:"name"`
	// Site is the crossing: span, levels, flood and ground.
	Site Site `json:"site"`
	// Climate is the rope temperatures and the wind.
	Climate Climate `json:"climate"`
	// Walkway is the deck the walkers use and its weight.
	Walkway Walkway `json:"walkway"`
	// Ropes lists the rope groups, walkway ropes and handrail ropes.
	Ropes []RopeGroup `json:"ropes"`
	// Banks is what stands on each bank.
	Banks Banks `json:"banks"`
	// Loads sets the imposed loads; every one left out takes its default.
	Loads Loads `json:"loads,omitempty"`
	// Basis chooses how the checks are verified and their factors.
	Basis Basis `json:"basis,omitempty"`
	// Comfort sets the modal analysis and the walkers' response; every
	// field left out takes its default.
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
	// Flood is the elevation of the design flood, or "none" where no
	// flood reaches the bridge.
	Flood Level `json:"flood_elevation"`
	// Freeboard is the clearance required between the design flood and the
	// underside of the walkway at its lowest point.
	Freeboard units.Length `json:"freeboard"`
	// Ground optionally traces the ground along the bridge axis, left to
	// right: x from the left saddle (negative behind it), elevation z. The
	// drawing shows it, and the footing and anchor checks read from it the
	// ground's fall near each base (bearing, and the passive resistance of
	// blocks and deadmen); without it they take the ground level and say
	// so.
	Ground []Point `json:"ground,omitempty"`
}

// Point is a point in the elevation: x horizontal from the left saddle
// towards the right, z elevation.
type Point struct {
	// X is the horizontal distance from the left saddle, negative behind it.
	X units.Length `json:"x"`
	// Z is the elevation of the ground there.
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
	// Exposure · ½ρv² (EN 1991-1-4 cl. 4.5).
	WindSpeed units.Velocity `json:"wind_speed,omitempty"`
	// WindPressure, when set, is the peak velocity pressure q_p itself and
	// is used instead of the one from WindSpeed.
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
	// GradientLimit is the steepest gradient (rise over run) the walkway
	// may take anywhere along the span under the persistent cases; absent
	// means 1:2.5 (this library's judgement, see walkway.gradient). Give the
	// limit the users need: 1:12 for wheelchairs, for instance.
	GradientLimit *float64 `json:"gradient_limit,omitempty"`
}

// Part is one component of the walkway dead load.
type Part struct {
	// Name says what the part is, such as "timber deck planks".
	Name string `json:"name"`
	// Load is the part's weight per metre of walkway.
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
	// Name names the group in reports, such as "walkway ropes".
	Name string `json:"name"`
	// Role is "walkway" (the ropes the walkway rests on or hangs from) or
	// "handrail" (the ropes along the top of the side fencing).
	Role Role `json:"role"`
	// Count is the number of identical ropes in the group.
	Count int `json:"count"`
	// Rope is the rope every rope of the group is made of.
	Rope RopeSpec `json:"rope"`
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
	// Sharing is the factor by which the most loaded rope of the group
	// carries more than an equal share, at least 1; absent means 1.1 for a
	// group of two ropes or more (common practice, see cable.TensionCheck).
	Sharing *float64 `json:"sharing,omitempty"`
	// ConstructionalStretch is the permanent strain new rope takes as its
	// strands bed in under the first loads; absent means 0.25 % (common
	// practice for six-strand rope, see the erection table); give 0 for
	// pre-stretched rope.
	ConstructionalStretch *float64 `json:"constructional_stretch,omitempty"`
}

// RopeSpec chooses a rope from the catalogue of a construction, or gives
// its properties directly when MBF is set.
type RopeSpec struct {
	// Construction names the catalogue construction, such as "6x36-IWRC".
	Construction string `json:"construction,omitempty"`
	// Diameter is the nominal rope diameter.
	Diameter units.Length `json:"diameter" unit:"mm"`
	// Grade is the rope grade (nominal wire tensile strength), such as "1770 MPa".
	Grade units.Pressure `json:"grade,omitempty"`

	// A rope given directly, not from the catalogue, when MBF is set.
	MBF     units.Force            `json:"mbf,omitempty"`     // minimum breaking force of one rope; set it to give the rope directly
	Area    units.Area             `json:"area,omitempty"`    // metallic cross-section of one rope
	Modulus units.Pressure         `json:"modulus,omitempty"` // effective modulus on the metallic area
	Mass    units.MassPerLength    `json:"mass,omitempty"`    // mass per metre of one rope
	Alpha   units.ThermalExpansion `json:"alpha,omitempty"`   // coefficient of thermal expansion
}

// Banks holds the left and right bank.
type Banks struct {
	// Left is the bank at x = 0.
	Left Bank `json:"left"`
	// Right is the bank at x = span.
	Right Bank `json:"right"`
}

// Bank is what stands on one bank: tower, backstay, anchor and soil.
type Bank struct {
	// Tower is the tower column with its saddle, section and footing.
	Tower TowerSpec `json:"tower"`
	// Backstay is the run of rope from the saddle down to the anchor.
	Backstay Backstay `json:"backstay"`
	// Anchor is the anchorage the backstays run into.
	Anchor AnchorSpec `json:"anchor"`
	// Soil is the ground the footing and anchor stand in.
	Soil SoilSpec `json:"soil"`
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
	Facing units.Length `json:"facing,omitempty" unit:"mm"`
	// UnitWeight of the column and footing; zero means 24 kN/m³.
	UnitWeight units.UnitWeight `json:"unit_weight,omitempty"`
	// Saddle says how the ropes sit on the column.
	Saddle SaddleSpec `json:"saddle"`
	// Section is the column's section: reinforced concrete, a steel tube
	// or a steel frame.
	Section SectionSpec `json:"section"`
	// Footing is the spread footing under the column.
	Footing FootingSpec `json:"footing"`
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
	// GrooveDiameter is the diameter of the saddle's groove along the rope
	// (twice its radius of curvature, measured to the rope's axis), checked
	// against the rope diameter (cable.saddle_ratio); zero when not known.
	GrooveDiameter units.Length `json:"groove_diameter,omitempty"`
}

// SectionSpec is the column section. Type "concrete" (the default) is a
// reinforced-concrete rectangle of the tower's effective size, its bars
// placed symmetrically, half on each face normal to the bridge axis; a
// concrete column with no bars is plain. Type "tube" is one hollow steel
// tube, "frame" two tube legs side by side across the bridge, joined by
// bracing, Spacing apart.
type SectionSpec struct {
	// Type is "concrete" (default), "tube" or "frame".
	Type string `json:"type,omitempty"`
	// Concrete is the characteristic cylinder strength fck.
	Concrete units.Pressure `json:"concrete,omitempty"`
	// Steel is the characteristic yield strength fyk of the bars, or fy of
	// a tube or frame's legs.
	Steel units.Pressure `json:"steel,omitempty"`
	// Bars is the number of longitudinal bars, an even number; zero means
	// plain concrete.
	Bars int `json:"bars,omitempty"`
	// BarDiameter is the diameter of each bar.
	BarDiameter units.Length `json:"bar_diameter,omitempty" unit:"mm"`
	// Cover is the distance from a face to the centres of the bars.
	Cover units.Length `json:"cover,omitempty" unit:"mm"`
	// Creep is the creep coefficient φ(∞, t0) of the concrete; zero means
	// 2.0 (see tower.DefaultCreep).
	Creep float64 `json:"creep,omitempty"`

	// Shape of a steel tube or of a frame's legs: "circular" (default) or
	// "square".
	Shape string `json:"shape,omitempty"`
	// Size is the tube's outside diameter or width.
	Size units.Length `json:"size,omitempty" unit:"mm"`
	// Wall is the tube's wall thickness.
	Wall units.Length `json:"wall,omitempty" unit:"mm"`
	// ColdFormed marks a cold-formed tube (buckling curve c of EN 1993-1-1
	// Table 6.2 instead of a).
	ColdFormed bool `json:"cold_formed,omitempty"`
	// Spacing of a frame's legs across the bridge, centre to centre.
	Spacing units.Length `json:"spacing,omitempty"`
	// Panel is the distance between a frame's bracing nodes; zero means
	// the column height.
	Panel units.Length `json:"panel,omitempty"`
}

// FootingSpec is the spread footing under a tower column.
type FootingSpec struct {
	// Length is the footing's size along the bridge.
	Length units.Length `json:"length"`
	// Width is the footing's size across the bridge.
	Width units.Length `json:"width"`
	// Thickness is the depth of the footing slab.
	Thickness units.Length `json:"thickness"`
	// Depth is that of the footing's underside below ground.
	Depth units.Length `json:"depth"`
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

	// Length is a block's size along the backstay's pull, or a deadman
	// beam's thickness in the direction of the pull.
	Length units.Length `json:"length,omitempty"`
	// Width is a block's size across the pull, or a deadman beam's length.
	Width units.Length `json:"width,omitempty"`
	// Height is the height of a block or of a deadman beam's face.
	Height units.Length `json:"height,omitempty"`
	// Depth is that of a block's base, or of the bottom of a deadman
	// beam's face, below the ground at the anchor.
	Depth units.Length `json:"depth,omitempty"`
	// UnitWeight is that of a block's or beam's concrete; zero means
	// 24 kN/m³.
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

	// Bars is the number of a rock anchor's bars, in a row across the pull.
	Bars int `json:"bars,omitempty"`
	// BarDiameter is the diameter of each rock-anchor bar.
	BarDiameter units.Length `json:"bar_diameter,omitempty" unit:"mm"`
	// BarStrength is the yield strength f_y of a rock-anchor bar.
	BarStrength units.Pressure `json:"bar_strength,omitempty"`
	// BarUltimate is the bars' ultimate strength f_u, for the thread; zero
	// takes f_y (cautious).
	BarUltimate units.Pressure `json:"bar_ultimate,omitempty"`
	// BarSpacing is the distance between neighbouring bars; zero takes
	// their rock cones as one (cautious).
	BarSpacing units.Length `json:"bar_spacing,omitempty"`
	// HoleDiameter is the diameter of the grouted drill hole.
	HoleDiameter units.Length `json:"hole_diameter,omitempty" unit:"mm"`
	// BondLength is the length of bar grouted into the rock.
	BondLength units.Length `json:"bond_length,omitempty"`
	// FreeLength is the length of bar free to stretch above the bond.
	FreeLength units.Length `json:"free_length,omitempty"`
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
	// steel rods cast into a block or deadman, or to a rock anchor's bars'
	// heads (then with no rods); or "loop": each rope passes round a pin or
	// pipe cast into the block and is clamped back on itself.
	Kind string `json:"kind"`
	// Termination is the rope's end: "grips" (wire rope grips, k_e 0.80),
	// "ferrule" (ferrule-secured eye, 0.90) or "socket" (poured or swaged,
	// 1.0); or give efficiency instead.
	Termination string `json:"termination,omitempty"`
	// Efficiency is the termination efficiency k_e of the rope's end, in
	// place of termination.
	Efficiency float64 `json:"efficiency,omitempty"`
	// Rods is the number of rods cast into the block or deadman ("rod"),
	// sharing the pull of all the backstays.
	Rods int `json:"rods,omitempty"`
	// RodDiameter is the rods' gross diameter.
	RodDiameter units.Length `json:"rod_diameter,omitempty" unit:"mm"`
	// RodSteel is the rods' yield strength f_y.
	RodSteel units.Pressure `json:"rod_steel,omitempty"`
	// RodUltimate is the rods' ultimate strength f_u; zero takes f_y
	// (cautious).
	RodUltimate units.Pressure `json:"rod_ultimate,omitempty"`
	// RodThreadArea is the tensile stress area of a rod's thread; zero
	// takes 0.78 of its gross area (an M20 thread's ratio, cautious).
	RodThreadArea units.Area `json:"rod_thread_area,omitempty"`
	// PinDiameter is the diameter of the pin or pipe the ropes loop round
	// ("loop").
	PinDiameter units.Length `json:"pin_diameter,omitempty" unit:"mm"`
}

// BeamSpec is a deadman's steel section.
type BeamSpec struct {
	// Steel is the section's yield strength f_y.
	Steel units.Pressure `json:"steel"`
	// PlasticModulus is the plastic section modulus W_pl about the axis the
	// pull bends the beam about.
	PlasticModulus units.Volume `json:"plastic_modulus"`
	// ShearArea is the shear area A_v in the direction of the pull.
	ShearArea units.Area `json:"shear_area"`
}

// PlateSpec is a rock anchor's square head plate.
type PlateSpec struct {
	// Side is the side of the square plate.
	Side units.Length `json:"side"`
	// Thickness is the plate's thickness.
	Thickness units.Length `json:"thickness" unit:"mm"`
	// Steel is the plate's yield strength f_y.
	Steel units.Pressure `json:"steel"`
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
	// Preset names a typical soil or rock whose values are taken, such as
	// "dense sand" (foundation.Presets); the fields below override them.
	Preset string `json:"preset,omitempty"`
	// IsRock says whether the ground is rock: its bearing then comes from
	// allowable_bearing or rock_strength, never from soil theory, and rock
	// anchors may be grouted in it.
	IsRock *bool `json:"rock,omitempty"`
	// UnitWeight is the bulk unit weight γ above the water table.
	UnitWeight *units.UnitWeight `json:"unit_weight,omitempty"`
	// Submerged is the effective unit weight γ' below the water table; left
	// out (and no saturated_unit_weight), γ − 9.81 kN/m³.
	Submerged *units.UnitWeight `json:"submerged_unit_weight,omitempty"`
	// Saturated is the saturated unit weight γsat, from which
	// γ' = γsat − 9.81 kN/m³; give it or submerged_unit_weight, not both.
	Saturated *units.UnitWeight `json:"saturated_unit_weight,omitempty"`
	// Friction is the drained (effective) angle of shearing resistance φ'.
	Friction *units.Angle `json:"friction,omitempty"`
	// Cohesion is the drained (effective) cohesion c'.
	Cohesion *units.Pressure `json:"cohesion,omitempty"`
	// Undrained is the undrained shear strength c_u of a clay or silt: the
	// short-term condition is checked besides the drained one; "0 kPa"
	// checks a preset clay drained only.
	Undrained *units.Pressure `json:"undrained_strength,omitempty"`
	// Interface is the ratio δ/φ' of base friction between concrete and
	// this ground; left out, 2/3.
	Interface *float64 `json:"interface,omitempty"`
	// Allowable is an allowable bearing pressure from the site
	// investigation: on rock the bearing limit; on soil, on the allowable
	// basis, the peak contact pressure is checked against it beside the
	// bearing-capacity equation (which carries the load's inclination) and
	// the worse governs.
	Allowable *units.Pressure `json:"allowable_bearing,omitempty"`
	// RockStrength is the uniaxial compressive strength of intact rock
	// cores, for the K_sp method when no allowable_bearing is given.
	RockStrength *units.Pressure `json:"rock_strength,omitempty"`
	// JointSpacing is the spacing of the rock's discontinuities, for the
	// K_sp method.
	JointSpacing *units.Length `json:"joint_spacing,omitempty"`
	// JointAperture is the opening of the rock's discontinuities, for the
	// K_sp method.
	JointAperture *units.Length `json:"joint_aperture,omitempty"`
	// BearingMethod is the bearing-capacity method of this bank's footing
	// and anchor block: "EN 1997-1 Annex D" (default), "Vesic" or
	// "Hansen". No one method is the lowest everywhere: under a strongly
	// inclined pull Hansen's inclination factors give the least.
	BearingMethod string `json:"bearing_method,omitempty"`
	// Groundwater is the elevation of the groundwater table at this bank,
	// on the datum of the site's levels; left out, no groundwater within
	// reach. In the flood case the design flood raises it where higher.
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
	// WalkwayLift is the force coefficient of the upward wind force on the
	// walkway, on its width; zero means 0.9 (EN 1991-1-4 8.3.3, from memory).
	WalkwayLift float64 `json:"walkway_lift,omitempty"`
	// CrowdInAccident is ψ1 on the crowd with a rope broken; zero means 0.4
	// (EN 1990 Table A2.2, from memory).
	CrowdInAccident float64 `json:"crowd_in_accident,omitempty"`
	// BreakDynamic multiplies the change of tension in the ropes left when
	// one breaks; zero means 2 (a suddenly applied load on an undamped
	// elastic system).
	BreakDynamic float64 `json:"break_dynamic,omitempty"`
	// SunDifference is how many kelvin cooler the shaded backstays are than
	// the sunlit span; zero means 10 K (EN 1991-1-5 6.1.6, from memory).
	SunDifference float64 `json:"sun_difference,omitempty"`
	// ConstructionLoad is the crew and tools on the placed walkway during
	// construction; zero means 1.0 kN/m² (EN 1991-1-6 Table 4.1, from
	// memory).
	ConstructionLoad units.Pressure `json:"construction_load,omitempty"`
	// DeckFrom is the bank the walkway is placed from during construction:
	// "left" (default) or "right".
	DeckFrom string `json:"deck_from,omitempty"`
	// Cases are load cases of the description's own, checked beside the
	// defaults.
	Cases []CaseSpec `json:"cases,omitempty"`
	// Omit names default cases or searched families to leave out, as
	// Bridge.Cases and Bridge.LoadedLengths name them ("wind, coldest
	// rope", "deck placed").
	Omit []string `json:"omit,omitempty"`
}

// Basis chooses how the checks are verified.
type Basis struct {
	// Method is "allowable" (default: unfactored loads, global factors of
	// safety) or "partial" (factored loads and resistances).
	Method string `json:"method,omitempty"`

	// Allowable basis: global factors of safety; zero takes the default.
	RopeFactor        float64 `json:"rope_factor,omitempty"`        // on the ropes' minimum breaking force; default 3 (cable.DefaultGlobalFactor)
	SlidingFactor     float64 `json:"sliding_factor,omitempty"`     // against sliding of footings and anchors; default 1.5
	OverturningFactor float64 `json:"overturning_factor,omitempty"` // against overturning; default 2.0 for footings, 1.5 for anchor blocks
	UpliftFactor      float64 `json:"uplift_factor,omitempty"`      // against uplift of anchor blocks; default 1.5
	BearingFactor     float64 `json:"bearing_factor,omitempty"`     // on the ultimate bearing pressure; default 3.0

	// Partial-factor basis, EN 1990 Annex A2; zero takes the default.
	GammaG    float64 `json:"gamma_g,omitempty"`     // γG on unfavourable permanent loads; default 1.35
	GammaGInf float64 `json:"gamma_g_inf,omitempty"` // γG on favourable permanent loads (wind lifting the walkway); default 1.0
	GammaQ    float64 `json:"gamma_q,omitempty"`     // γQ on the crowd, the wind and construction loads; default 1.5
	// GammaR is the rope resistance factor of EN 1993-1-11; zero → default.
	GammaR float64 `json:"gamma_r,omitempty"`
	// RopeEfficiency is the termination efficiency k_e of the ropes, on
	// both bases; zero → that of Termination, else cable.DefaultKe.
	RopeEfficiency float64 `json:"rope_efficiency,omitempty"`
	// Termination names the rope terminations, for their efficiency:
	// "clips" (or "grips", as the anchor attachments name them), "ferrule" or
	// "socket" (see cable.TerminationEfficiency); absent means grips (0.80).
	Termination string `json:"termination,omitempty"`
	// MinGrooveRatio is the least saddle groove diameter to rope diameter
	// ratio D/d; zero → cable.DefaultMinGrooveRatio.
	MinGrooveRatio float64 `json:"min_groove_ratio,omitempty"`

	// Ground checks on the partial basis, EN 1997-1 Annex A; zero takes
	// the recommended value documented in foundation.Basis.
	Approach  string  `json:"approach,omitempty"`    // design approach, "DA2" (default) or "DA1"
	GammaGdst float64 `json:"gamma_g_dst,omitempty"` // EQU, destabilising permanent actions; default 1.1
	GammaGstb float64 `json:"gamma_g_stb,omitempty"` // EQU, stabilising permanent actions; default 0.9
	GammaQdst float64 `json:"gamma_q_dst,omitempty"` // EQU, destabilising variable actions; default 1.5
	GammaPhi  float64 `json:"gamma_phi,omitempty"`   // on tan φ' (set M2); default 1.25
	GammaC    float64 `json:"gamma_c,omitempty"`     // on c' (set M2); default 1.25
	GammaRh   float64 `json:"gamma_rh,omitempty"`    // on sliding resistance; default 1.1 (DA2), 1.0 (DA1)
	GammaRv   float64 `json:"gamma_rv,omitempty"`    // on bearing resistance; default 1.4 (DA2), 1.0 (DA1)
	GammaRe   float64 `json:"gamma_re,omitempty"`    // on earth resistance; default 1.4 (DA2), 1.0 (DA1)

	// Column sections, EN 1992-1-1; zero takes the default of tower.RCSection.
	GammaConcrete float64 `json:"gamma_concrete,omitempty"` // γc on concrete; default 1.5
	GammaSteel    float64 `json:"gamma_steel,omitempty"`    // γs on reinforcement; default 1.15
	AlphaCC       float64 `json:"alpha_cc,omitempty"`       // αcc, long-term effects on concrete strength; default 1.0
}
