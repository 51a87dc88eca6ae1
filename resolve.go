package sagspan

import (
	"fmt"
	"math"
	"strings"

	"github.com/sagspan/sagspan/cable"
	"github.com/sagspan/sagspan/units"
)

// rope returns the rope the spec names: from the catalogue of its
// construction, or as given when MBF is set. Errors are *FieldError values
// whose Field is relative to the spec.
func (r RopeSpec) rope() (cable.Rope, error) {
	if r.MBF > 0 {
		rope := cable.Rope{
			Name: "custom", Diameter: r.Diameter, MBF: r.MBF, Area: r.Area,
			Modulus: r.Modulus, Mass: r.Mass, Alpha: r.Alpha,
		}
		if err := rope.Validate(); err != nil {
			return cable.Rope{}, &FieldError{Field: "mbf", Err: fmt.Errorf("a rope given directly needs diameter, mbf, area, modulus and mass: %w", err)}
		}
		return rope, nil
	}
	if r.Construction == "" {
		return cable.Rope{}, &FieldError{Field: "construction", Err: fmt.Errorf("is missing; name one of %s, or give mbf, area, modulus and mass", constructionNames())}
	}
	var con cable.Construction
	found := false
	for _, c := range cable.Constructions() {
		if strings.EqualFold(c.Name, strings.TrimSpace(r.Construction)) {
			con, found = c, true
		}
	}
	if !found {
		return cable.Rope{}, &FieldError{Field: "construction", Err: fmt.Errorf("unknown rope type %q; known: %s", r.Construction, constructionNames())}
	}
	if !(r.Diameter > 0) {
		return cable.Rope{}, &FieldError{Field: "diameter", Err: fmt.Errorf("must be positive, got %s", r.Diameter)}
	}
	if !(r.Grade > 0) {
		return cable.Rope{}, &FieldError{Field: "grade", Err: fmt.Errorf("is missing; give the rope grade such as \"1770 MPa\"")}
	}
	rope, err := con.Rope(r.Diameter, r.Grade)
	if err != nil {
		return cable.Rope{}, &FieldError{Field: "diameter", Err: err}
	}
	return rope, nil
}

func constructionNames() string {
	var names []string
	for _, c := range cable.Constructions() {
		names = append(names, fmt.Sprintf("%q", c.Name))
	}
	return strings.Join(names, ", ")
}

// group is a rope group resolved for analysis.
type group struct {
	RopeGroup
	rope    cable.Rope
	elastic cable.Elastic
	share   float64
	// self is the group's own weight per horizontal metre at its design sag.
	self units.LoadPerLength
	// windWidth is the projected width per metre of span the group's ropes
	// show to wind, times their drag coefficient.
	windWidth units.Length
}

// groups resolves the rope groups: ropes, stiffness, shares, self-weight.
// It expects a validated bridge.
func (b Bridge) groups() ([]group, error) {
	span := b.span()
	walkwayRopes := 0
	explicit := false
	for _, g := range b.Ropes {
		if g.Role == RoleWalkway {
			walkwayRopes += g.Count
		}
		explicit = explicit || g.Share != 0
	}
	cd := orDefault(b.Loads.DragCoefficient, defaultRopeDrag)
	out := make([]group, len(b.Ropes))
	for i, g := range b.Ropes {
		rope, err := g.Rope.rope()
		if err != nil {
			return nil, err
		}
		n := float64(g.Count)
		share := g.Share
		if !explicit && g.Role == RoleWalkway {
			share = n / float64(walkwayRopes)
		}
		// Rope weight is per metre of rope; per horizontal metre it grows
		// by the length ratio S/l of the design parabola (Hicks, Civil
		// Engineering Formulas, ch. 10: S ≈ l(1 + 8n²/3) for a level span,
		// here taken exactly from the parabola).
		p, err := cable.NewParabola(span, 1, g.Sag)
		if err != nil {
			return nil, &FieldError{Field: fmt.Sprintf("ropes[%d].sag", i), Err: err}
		}
		ratio := float64(p.Length()) / float64(span.Length)
		out[i] = group{
			RopeGroup: g,
			rope:      rope,
			elastic:   cable.Elastic{EA: units.AxialStiffness(n) * rope.EA(), Alpha: rope.Alpha},
			share:     share,
			self:      units.LoadPerLength(n*ratio) * rope.Weight(),
			windWidth: units.Length(n * cd * float64(rope.Diameter)),
		}
	}
	return out, nil
}

// span is the geometry shared by every rope group: groups sit at the same
// offset above their walkway saddles on both towers.
func (b Bridge) span() cable.Span {
	return cable.Span{Length: b.Site.Span, Rise: b.Site.Rise}
}

// backstayAngle returns the inclination of a group's backstay below
// horizontal at the saddle, equal to its inclination above horizontal at
// the anchor (a straight backstay; its own sag is neglected, common practice
// for short, steep backstays).
func backstayAngle(bs Backstay, offset units.Length) units.Angle {
	return units.Angle(math.Atan2(float64(bs.Drop+offset), float64(bs.Horizontal)))
}
