package tower

import (
	"math"

	"github.com/sagspan/sagspan/units"
)

// Footing is the rectangular spread footing under a tower column. The
// column base section sits on the footing's top face.
type Footing struct {
	// Length along the bridge axis, Width across it, Thickness vertical.
	Length, Width, Thickness units.Length
	// Depth of the footing base below the ground surface. Soil above the
	// footing's top face (Depth − Thickness, when positive) is backfill.
	Depth units.Length
	// UnitWeight of the footing concrete; zero means DefaultUnitWeight.
	UnitWeight units.UnitWeight
	// SoilUnitWeight of the backfill on the footing; zero means the
	// backfill's weight is ignored (conservative for overturning and
	// sliding).
	SoilUnitWeight units.UnitWeight
	// ColumnOffset is the horizontal distance of the column axis from the
	// footing centre, toward the span positive.
	ColumnOffset units.Length
}

func (f Footing) validate(c Column) error {
	if err := positive("Footing.Length", f.Length); err != nil {
		return err
	}
	if err := positive("Footing.Width", f.Width); err != nil {
		return err
	}
	if err := positive("Footing.Thickness", f.Thickness); err != nil {
		return err
	}
	if err := nonNegative("Footing.Depth", f.Depth); err != nil {
		return err
	}
	if err := nonNegative("Footing.UnitWeight", f.UnitWeight); err != nil {
		return err
	}
	if err := nonNegative("Footing.SoilUnitWeight", f.SoilUnitWeight); err != nil {
		return err
	}
	if err := isFinite("Footing.ColumnOffset", f.ColumnOffset); err != nil {
		return err
	}
	if math.Abs(float64(f.ColumnOffset))+float64(c.Depth)/2 > float64(f.Length)/2*(1+1e-12) || c.Width > f.Width {
		return invalid("Footing", f.Length, "does not contain the column footprint")
	}
	return nil
}

func (f Footing) unitWeight() units.UnitWeight {
	if f.UnitWeight == 0 {
		return DefaultUnitWeight
	}
	return f.UnitWeight
}

// BaseActions are the actions at the underside of a footing, about the
// centre of its base: Vertical down positive, Horizontal toward the span
// positive, Moment positive turning toward the span.
type BaseActions struct {
	Vertical, Horizontal units.Force
	Moment               units.Moment
}

// Eccentricity returns e = Moment/Vertical, toward the span positive
// (±Inf or NaN when Vertical is zero, as float division gives).
func (a BaseActions) Eccentricity() units.Length { return a.Moment.Arm(a.Vertical) }

// loads is the breakdown of the forces on a footing used by Stability.
type loads struct {
	ropeV      float64 // rope vertical at the column axis (r.Vertical − r.SelfWeight)
	ropeM      float64 // rope moment about the column axis at the footing underside
	h          float64
	weights    [3]float64 // column, footing, backfill
	weightArms [3]float64 // their x from the footing centre, toward the span +
	xc         float64    // column axis x
}

func (f Footing) loads(r Resultant, c Column) loads {
	t := float64(f.Thickness)
	xc := float64(f.ColumnOffset)
	var l loads
	l.xc = xc
	l.h = float64(r.Horizontal)
	l.ropeV = float64(r.Vertical) - float64(r.SelfWeight)
	l.ropeM = float64(r.BaseMoment) + l.h*t
	l.weights[0], l.weightArms[0] = float64(c.Weight()), xc
	l.weights[1] = float64(f.unitWeight()) * float64(f.Length) * float64(f.Width) * t
	if hb := float64(f.Depth) - t; hb > 0 && f.SoilUnitWeight > 0 {
		af := float64(f.Length) * float64(f.Width)
		ac := float64(c.Depth) * float64(c.Width)
		l.weights[2] = float64(f.SoilUnitWeight) * hb * (af - ac)
		if af > ac {
			l.weightArms[2] = -ac * xc / (af - ac)
		}
	}
	return l
}

func (l loads) actions() BaseActions {
	v := l.ropeV
	m := l.ropeM + l.ropeV*l.xc
	for i, w := range l.weights {
		v += w
		m += w * l.weightArms[i]
	}
	return BaseActions{Vertical: units.Force(v), Horizontal: units.Force(l.h), Moment: units.Moment(m)}
}

// Actions returns the actions at the underside of the footing, about the
// centre of its base, for a bearing-capacity check:
//
//	V = (V_r − W_r) + W_column + W_footing + W_backfill
//	H = H_r
//	M = M_r + H_r·t + (V_r − W_r + W_column)·x_c + W_backfill·x_b
//
// where V_r, H_r, M_r are the resultant's forces and base moment, W_r the
// self-weight it carries (replaced by the column's own weight), t the
// footing thickness, x_c the column offset and x_b the centroid of the
// backfill (the footing plan less the column footprint). Actions does not
// validate its inputs; Stability does.
func (f Footing) Actions(r Resultant, c Column) BaseActions { return f.loads(r, c).actions() }
