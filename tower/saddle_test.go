package tower_test

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"

	"github.com/sagspan/sagspan/tower"
	"github.com/sagspan/sagspan/units"
)

func kN(x float64) units.Force  { return units.Force(x) * units.Kilonewton }
func deg(x float64) units.Angle { return units.FromDegrees(x) }

// near reports whether got is within relative tolerance rel of want
// (absolute 1e-9 of the magnitude for values near zero).
func near(got, want, rel float64) bool {
	return scalar.EqualWithinAbsOrRel(got, want, 1e-9*math.Max(1, math.Abs(want)), rel)
}

func TestSaddleForce(t *testing.T) {
	// Independent route: the sum-to-product identities
	//   cos a − cos b = −2 sin((a+b)/2) sin((a−b)/2)
	//   sin a + sin b =  2 sin((a+b)/2) cos((a−b)/2)
	// for equal tensions T on both sides (standard trigonometric identities).
	// Hand values (four-figure tables): T 100 kN at 10° and 30° →
	// H_u = 11.88 kN toward the span, V = 67.36 kN.
	T := 100.0
	a, b := 10*math.Pi/180, 30*math.Pi/180
	hu := -2 * T * math.Sin((a+b)/2) * math.Sin((a-b)/2) * 1e3
	v := 2 * T * math.Sin((a+b)/2) * math.Cos((a-b)/2) * 1e3
	if !near(hu, 11.88e3, 5e-4) || !near(v, 67.36e3, 5e-4) {
		t.Fatalf("hand values disagree with identities: %g %g", hu, v)
	}
	span, back := tower.RopePull{Tension: kN(T), Angle: deg(10)}, tower.RopePull{Tension: kN(T), Angle: deg(30)}
	tests := []struct {
		name  string
		s     tower.Saddle
		wantH float64
	}{
		{"fixed", tower.Saddle{Kind: tower.Fixed, Height: 3}, hu},
		{"sliding held", tower.Saddle{Kind: tower.Sliding, Friction: 0.3, Height: 3}, hu},       // μV = 20.2 kN > 11.88
		{"sliding slips", tower.Saddle{Kind: tower.Sliding, Friction: 0.1, Height: 3}, 0.1 * v}, // μV = 6.74 kN < 11.88
		{"sliding default μ", tower.Saddle{Kind: tower.Sliding, Height: 3}, math.Min(hu, tower.DefaultSaddleFriction*v)},
		{"roller", tower.Saddle{Kind: tower.Roller, Height: 3}, 0},
	}
	for _, tc := range tests {
		lf, err := tc.s.Force(span, back)
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		if !near(float64(lf.Vertical), v, 1e-12) || !near(float64(lf.Horizontal), tc.wantH, 1e-12) {
			t.Errorf("%s: got V %v H %v, want V %g H %g", tc.name, lf.Vertical, lf.Horizontal, v, tc.wantH)
		}
		if lf.Height != tc.s.Height {
			t.Errorf("%s: height %v", tc.name, lf.Height)
		}
		// Mirror symmetry: swapping span and backstay reverses H, keeps V.
		mf, err := tc.s.Force(back, span)
		if err != nil {
			t.Fatal(err)
		}
		if !near(float64(mf.Horizontal), -float64(lf.Horizontal), 1e-12) || !near(float64(mf.Vertical), float64(lf.Vertical), 1e-12) {
			t.Errorf("%s: mirror gives %v %v", tc.name, mf.Horizontal, mf.Vertical)
		}
	}
	slides := tower.Saddle{Kind: tower.Sliding, Friction: 0.1}
	if !slides.Slips(span, back) || (tower.Saddle{Kind: tower.Sliding, Friction: 0.3}).Slips(span, back) {
		t.Error("Slips disagrees with the friction limit")
	}
}

func TestSaddleBalanced(t *testing.T) {
	// Zero unbalanced force: T_b = T_s cos α_s / cos α_b.
	ts := 150.0
	tb := ts * math.Cos(8*math.Pi/180) / math.Cos(40*math.Pi/180)
	for _, k := range []tower.SaddleKind{tower.Fixed, tower.Sliding, tower.Roller} {
		lf, err := tower.Saddle{Kind: k, Height: 4}.Force(tower.RopePull{Tension: kN(ts), Angle: deg(8)}, tower.RopePull{Tension: kN(tb), Angle: deg(40)})
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(float64(lf.Horizontal)) > 1e-9*float64(lf.Vertical) {
			t.Errorf("%v: balanced pulls give H %v", k, lf.Horizontal)
		}
	}
}

func TestSaddleErrors(t *testing.T) {
	ok := tower.RopePull{Tension: kN(50), Angle: deg(20)}
	up := tower.RopePull{Tension: kN(50), Angle: deg(-20)}
	tests := []struct {
		name     string
		s        tower.Saddle
		span, bk tower.RopePull
		sentinel error
	}{
		{"negative tension", tower.Saddle{}, tower.RopePull{Tension: kN(-1)}, ok, tower.ErrInvalid},
		{"NaN tension", tower.Saddle{}, tower.RopePull{Tension: units.Force(math.NaN())}, ok, tower.ErrInvalid},
		{"vertical angle", tower.Saddle{}, ok, tower.RopePull{Tension: kN(1), Angle: deg(90)}, tower.ErrInvalid},
		{"bad kind", tower.Saddle{Kind: 7}, ok, ok, tower.ErrInvalid},
		{"negative friction", tower.Saddle{Kind: tower.Sliding, Friction: -0.1}, ok, ok, tower.ErrInvalid},
		{"negative height", tower.Saddle{Height: -1}, ok, ok, tower.ErrInvalid},
		{"Inf offset", tower.Saddle{Offset: units.Length(math.Inf(1))}, ok, ok, tower.ErrInvalid},
		{"lift-off sliding", tower.Saddle{Kind: tower.Sliding}, up, up, tower.ErrLiftOff},
		{"lift-off roller", tower.Saddle{Kind: tower.Roller}, up, up, tower.ErrLiftOff},
	}
	for _, tc := range tests {
		_, err := tc.s.Force(tc.span, tc.bk)
		if !errors.Is(err, tc.sentinel) {
			t.Errorf("%s: got %v, want %v", tc.name, err, tc.sentinel)
		}
		if err != nil && err.Error()[:6] != "tower:" {
			t.Errorf("%s: error %q lacks the package prefix", tc.name, err)
		}
	}
	// A clamped (fixed) saddle passes an upward pull to the column.
	lf, err := tower.Saddle{}.Force(up, up)
	if err != nil || lf.Vertical >= 0 {
		t.Errorf("fixed saddle under uplift: %v %v", lf, err)
	}
}

func BenchmarkSaddleCombine(b *testing.B) {
	s := tower.Saddle{Kind: tower.Sliding, Height: 3.2}
	span, back := tower.RopePull{Tension: kN(180), Angle: deg(12)}, tower.RopePull{Tension: kN(185), Angle: deg(35)}
	levels := make([]tower.LevelForce, 1)
	b.ReportAllocs()
	var sink tower.Resultant
	for b.Loop() {
		levels[0], _ = s.Force(span, back)
		sink, _ = tower.Combine(levels, kN(90))
	}
	_ = sink
}
