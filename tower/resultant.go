package tower

import (
	"fmt"
	"math"
	"strconv"

	"github.com/sagspan/sagspan/units"
)

// Resultant is the resultant of the forces on a tower column, reduced to
// the column base section at the column axis.
type Resultant struct {
	// Vertical is the total downward force at the base section, including
	// SelfWeight; Horizontal the total horizontal force, toward the span
	// positive.
	Vertical, Horizontal units.Force
	// Angle is the angle of the resultant from the vertical, toward the
	// span positive: atan(Horizontal/Vertical).
	Angle units.Angle
	// BaseMoment is the moment about the column axis at the base section,
	// positive turning the column toward the span.
	BaseMoment units.Moment
	// BaseOffset is the eccentricity e = BaseMoment/Vertical: where the
	// line of action of the resultant crosses the base section, measured
	// from the column axis, toward the span positive.
	BaseOffset units.Length
	// SelfWeight is the column self-weight included in Vertical (acting on
	// the column axis).
	SelfWeight units.Force
	// RopeAngle is the angle from the vertical of the rope forces alone
	// (without SelfWeight), toward the span positive.
	RopeAngle units.Angle
	// Lateral is the total force across the bridge (downwind positive) and
	// LateralMoment its moment about the base section.
	Lateral       units.Force
	LateralMoment units.Moment
	// Lowest is the height of the lowest level with a vertical or
	// along-bridge force (a saddle; wind on the column is not one): the
	// checked section of an eccentricity check must lie below it.
	Lowest units.Length
}

// RopeVertical returns the vertical force of the levels alone, without the
// self-weight: V − W.
func (r Resultant) RopeVertical() units.Force { return r.Vertical - r.SelfWeight }

// Combine returns the resultant at the column base section of the saddle
// forces at several levels and the column self-weight W (acting on the
// column axis). With level i at height y_i and offset o_i carrying V_i
// (down) and H_i (toward the span),
//
//	V = Σ V_i + W
//	H = Σ H_i
//	M = Σ (H_i y_i + V_i o_i)
//	e = M / V
//	θ = atan(H / V)
//	L = Σ L_i,  M_L = Σ L_i y_i      (across the bridge)
//
// by statics (moments about the base-section point on the column axis). For
// a single level on the axis e = y·tan θ. The line of action crosses height
// y at e − y·tan θ (see OffsetAt).
//
// selfWeight is normally Column.Weight; the checks that take a Column
// (EccentricityCheck, Stability, Footing.Actions) always use that column's
// own weight in place of the SelfWeight recorded here, so the two can never
// be counted twice.
//
// Special cases: no levels is allowed (the self-weight alone); a net
// vertical force V ≤ 0 gives ErrLiftOff, since the resultant then never
// presses on the base; non-finite values and negative heights or
// self-weight give ErrInvalid.
func Combine(levels []LevelForce, selfWeight units.Force) (Resultant, error) {
	if err := nonNegative("selfWeight", selfWeight); err != nil {
		return Resultant{}, err
	}
	var v, h, m, lat, ml float64
	lowest := math.Inf(1)
	for i, l := range levels {
		if y := float64(l.Height); finite(y) && y >= 0 && finite(float64(l.Offset)) &&
			finite(float64(l.Vertical)) && finite(float64(l.Horizontal)) && finite(float64(l.Lateral)) {
			v += float64(l.Vertical)
			h += float64(l.Horizontal)
			m += float64(l.Horizontal)*float64(l.Height) + float64(l.Vertical)*float64(l.Offset)
			lat += float64(l.Lateral)
			ml += float64(l.Lateral) * float64(l.Height)
			if l.Vertical != 0 || l.Horizontal != 0 { // a saddle, not wind on the column
				lowest = math.Min(lowest, y)
			}
			continue
		}
		name := "levels[" + strconv.Itoa(i) + "]"
		if err := nonNegative(name+".Height", l.Height); err != nil {
			return Resultant{}, err
		}
		if err := isFinite(name+".Offset", l.Offset); err != nil {
			return Resultant{}, err
		}
		if err := isFinite(name+".Vertical", l.Vertical); err != nil {
			return Resultant{}, err
		}
		if err := isFinite(name+".Horizontal", l.Horizontal); err != nil {
			return Resultant{}, err
		}
		if err := isFinite(name+".Lateral", l.Lateral); err != nil {
			return Resultant{}, err
		}
	}
	if math.IsInf(lowest, 1) {
		lowest = 0
	}
	if !finite(v) || !finite(h) || !finite(m) || !finite(lat) || !finite(ml) {
		return Resultant{}, invalid("levels", len(levels), "sum to a force or moment that is not finite")
	}
	r := Resultant{
		Vertical:   units.Force(v),
		Horizontal: units.Force(h),
		BaseMoment: units.Moment(m),
		RopeAngle:  units.Angle(math.Atan2(h, v)),
		Lateral:    units.Force(lat), LateralMoment: units.Moment(ml),
		Lowest: units.Length(lowest),
	}
	return r.withSelfWeight(selfWeight)
}

// withSelfWeight returns r with its self-weight replaced by w and the
// derived fields recomputed.
func (r Resultant) withSelfWeight(w units.Force) (Resultant, error) {
	v := float64(r.Vertical) - float64(r.SelfWeight) + float64(w)
	if !finite(v) || !finite(float64(w)) {
		return Resultant{}, invalid("self-weight", w, "gives a vertical force that is not finite")
	}
	if !(v > 0) {
		return Resultant{}, fmt.Errorf("tower: net vertical force on the column base is %v (not downward): "+
			"the resultant never reaches the base: %w", units.Force(v), ErrLiftOff)
	}
	r.Vertical = units.Force(v)
	r.SelfWeight = w
	r.Angle = units.Angle(math.Atan(float64(r.Horizontal) / v))
	r.BaseOffset = units.Length(float64(r.BaseMoment) / v)
	return r, nil
}

// validate checks a Resultant built by hand rather than by Combine.
func (r Resultant) validate() error {
	for _, f := range []struct {
		name string
		v    float64
	}{{"Resultant.Vertical", float64(r.Vertical)}, {"Resultant.Horizontal", float64(r.Horizontal)},
		{"Resultant.BaseMoment", float64(r.BaseMoment)}, {"Resultant.SelfWeight", float64(r.SelfWeight)},
		{"Resultant.Lateral", float64(r.Lateral)}, {"Resultant.LateralMoment", float64(r.LateralMoment)},
		{"Resultant.Lowest", float64(r.Lowest)}} {
		if err := isFinite(f.name, units.Ratio(f.v)); err != nil {
			return err
		}
	}
	return nonNegative("Resultant.SelfWeight", r.SelfWeight)
}

// OffsetAt returns the horizontal position, from the column axis toward the
// span positive, at which the line of action of the resultant crosses
// height y above the base section:
//
//	x(y) = e − y · tan θ
//
// OffsetAt(0) is BaseOffset. Heights below the base section (y < 0) extend
// the line downward.
func (r Resultant) OffsetAt(y units.Length) units.Length {
	return r.BaseOffset - units.Length(float64(y)*math.Tan(float64(r.Angle)))
}
