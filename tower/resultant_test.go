package tower_test

import (
	"errors"
	"math"
	"testing"

	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

func TestCombineOneLevel(t *testing.T) {
	// One level on the axis: e = y·tan θ (the definition), θ from
	// the total vertical force.
	for _, y := range []float64{0, 1.5, 3.2, 6} {
		lf := tower.LevelForce{Height: units.Length(y), Vertical: kN(120), Horizontal: kN(-14)}
		r, err := tower.Combine([]tower.LevelForce{lf}, kN(30))
		if err != nil {
			t.Fatal(err)
		}
		want := y * math.Tan(float64(r.Angle))
		if !near(float64(r.BaseOffset), want, 1e-12) {
			t.Errorf("y %g: e %v, want y·tanθ %g", y, r.BaseOffset, want)
		}
		// The line of action passes through the point of application.
		if math.Abs(float64(r.OffsetAt(units.Length(y)))) > 1e-12 {
			t.Errorf("y %g: line of action misses the saddle by %v", y, r.OffsetAt(units.Length(y)))
		}
		if !near(float64(r.Vertical), 150e3, 1e-12) || !near(r.Angle.Degrees(), math.Atan(-14.0/150)*180/math.Pi, 1e-12) {
			t.Errorf("y %g: V %v angle %v", y, r.Vertical, r.Angle)
		}
		if !near(float64(r.RopeAngle), math.Atan(-14.0/120), 1e-12) {
			t.Errorf("rope angle %v", r.RopeAngle)
		}
	}
}

func TestCombineLevels(t *testing.T) {
	// Walkway ropes at 3.0 m and handrail ropes at 4.1 m with a 0.1 m saddle
	// offset, hand-summed moments about the base (statics):
	//   V = 180 + 40 + 60 = 280 kN, H = 12 − 5 = 7 kN,
	//   M = 12·3.0 − 5·4.1 + 40·0.1 = 36 − 20.5 + 4 = 19.5 kN·m, e = 19.5/280 m.
	levels := []tower.LevelForce{
		{Height: 3.0, Vertical: kN(180), Horizontal: kN(12)},
		{Height: 4.1, Offset: 0.1, Vertical: kN(40), Horizontal: kN(-5)},
	}
	r, err := tower.Combine(levels, kN(60))
	if err != nil {
		t.Fatal(err)
	}
	if !near(float64(r.BaseMoment), 19.5e3, 1e-12) || !near(float64(r.BaseOffset), 19.5/280, 1e-12) ||
		!near(float64(r.Horizontal), 7e3, 1e-12) || !near(float64(r.Vertical), 280e3, 1e-12) {
		t.Errorf("got %+v", r)
	}
	// Consistency: the resultant applied anywhere on its line of action has
	// the same moment about the base point: at height y it sits at x(y), and
	// H·y + V·x(y) = M.
	for _, y := range []units.Length{0, 1, 2.5, 7} {
		m := float64(r.Horizontal)*float64(y) + float64(r.Vertical)*float64(r.OffsetAt(y))
		if !near(m, float64(r.BaseMoment), 1e-12) {
			t.Errorf("moment along the line of action at %v: %g", y, m)
		}
	}
	// Not "summed" as Σ y_i tan θ_i: that rule would give a different e.
	wrong := 0.0
	for _, l := range levels {
		wrong += float64(l.Height) * float64(l.Horizontal) / float64(l.Vertical)
	}
	if near(wrong, float64(r.BaseOffset), 1e-3) {
		t.Error("test case does not distinguish the moment sum from a sum of tangents")
	}
	// Order of levels does not matter.
	r2, _ := tower.Combine([]tower.LevelForce{levels[1], levels[0]}, kN(60))
	if !near(float64(r2.BaseOffset), float64(r.BaseOffset), 1e-12) {
		t.Error("level order changes the result")
	}
}

func TestCombineSymmetryAndZero(t *testing.T) {
	// Mirror symmetry: reversing every horizontal force and offset reverses
	// e and θ; zero unbalanced force and no offsets give e = 0.
	levels := []tower.LevelForce{{Height: 3, Vertical: kN(100), Horizontal: kN(9)}, {Height: 4, Offset: 0.05, Vertical: kN(30), Horizontal: kN(2)}}
	mirror := make([]tower.LevelForce, len(levels))
	for i, l := range levels {
		mirror[i] = tower.LevelForce{Height: l.Height, Offset: -l.Offset, Vertical: l.Vertical, Horizontal: -l.Horizontal}
	}
	a, _ := tower.Combine(levels, kN(20))
	b, _ := tower.Combine(mirror, kN(20))
	if !near(float64(a.BaseOffset), -float64(b.BaseOffset), 1e-12) || !near(float64(a.Angle), -float64(b.Angle), 1e-12) {
		t.Errorf("mirror: %v vs %v", a, b)
	}
	z, err := tower.Combine([]tower.LevelForce{{Height: 3, Vertical: kN(100)}}, 0)
	if err != nil || z.BaseOffset != 0 || z.Angle != 0 {
		t.Errorf("zero unbalanced: %+v %v", z, err)
	}
	w, err := tower.Combine(nil, kN(10))
	if err != nil || w.BaseOffset != 0 || w.Vertical != kN(10) {
		t.Errorf("self-weight only: %+v %v", w, err)
	}
}

func TestCombineErrors(t *testing.T) {
	nan := units.Force(math.NaN())
	tests := []struct {
		name     string
		levels   []tower.LevelForce
		w        units.Force
		sentinel error
	}{
		{"nothing", nil, 0, tower.ErrLiftOff},
		{"uplift", []tower.LevelForce{{Height: 3, Vertical: kN(-50)}}, kN(10), tower.ErrLiftOff},
		{"NaN force", []tower.LevelForce{{Height: 3, Vertical: nan}}, kN(10), tower.ErrInvalid},
		{"negative height", []tower.LevelForce{{Height: -3, Vertical: kN(1)}}, kN(10), tower.ErrInvalid},
		{"negative weight", []tower.LevelForce{{Height: 3, Vertical: kN(1)}}, kN(-10), tower.ErrInvalid},
		{"overflow", []tower.LevelForce{{Height: 3, Vertical: 1e308}, {Height: 3, Vertical: 1e308}}, 0, tower.ErrInvalid},
	}
	for _, tc := range tests {
		if _, err := tower.Combine(tc.levels, tc.w); !errors.Is(err, tc.sentinel) {
			t.Errorf("%s: got %v, want %v", tc.name, err, tc.sentinel)
		}
	}
}
