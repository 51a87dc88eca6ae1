package tower_test

import (
	"errors"
	"math"
	"strings"
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

// TestCapstanBound checks the rope-friction (capstan) law of Euler and
// Eytelwein, T_high/T_low ≤ e^{μθ} (Meriam & Kraige, Engineering
// Mechanics: Statics, flexible belts), by integrating its differential
// form dT/dθ = μT with a fourth-order Runge–Kutta march: an independent
// route to the closed form. Check value [D]: μ 0.1 over θ 20° → 1.0355.
func TestCapstanBound(t *testing.T) {
	for _, tc := range []struct{ mu, deg float64 }{{0.1, 20}, {0.25, 35}, {0, 30}, {0.4, 179}} {
		got, err := tower.CapstanBound(tc.mu, deg(tc.deg))
		if err != nil {
			t.Fatal(err)
		}
		th := tc.deg * math.Pi / 180
		T, n := 1.0, 1000
		dh := th / float64(n)
		f := func(T float64) float64 { return tc.mu * T }
		for range n {
			k1 := f(T)
			k2 := f(T + dh/2*k1)
			k3 := f(T + dh/2*k2)
			k4 := f(T + dh*k3)
			T += dh / 6 * (k1 + 2*k2 + 2*k3 + k4)
		}
		if !near(got, T, 1e-12) {
			t.Errorf("μ %g θ %g°: bound %g, integrated %g", tc.mu, tc.deg, got, T)
		}
		if tc.mu == 0.1 && tc.deg == 20 && !near(got, 1.0355, 5e-5) {
			t.Errorf("check value 1.0355, got %g", got)
		}
	}
	for _, tc := range []struct {
		name  string
		mu    float64
		theta units.Angle
		field string
	}{
		{"negative μ", -0.1, deg(20), "groove friction μ"},
		{"NaN μ", math.NaN(), deg(20), "groove friction μ"},
		{"zero wrap", 0.1, 0, "wrap angle θ"},
		{"negative wrap", 0.1, deg(-5), "wrap angle θ"},
		{"wrap of a half turn", 0.1, deg(180), "wrap angle θ"},
	} {
		if _, err := tower.CapstanBound(tc.mu, tc.theta); !errors.Is(err, tower.ErrInvalid) || !strings.Contains(err.Error(), tc.field) {
			t.Errorf("%s: %v", tc.name, err)
		}
	}
}

// TestWrapAngle checks the wrap angle against the angle between the two
// rope tangents as 3-D vectors (dot product): in the vertical plane it is
// α_s + α_b; with the span's plane swung by ψ it is smaller.
func TestWrapAngle(t *testing.T) {
	for _, tc := range []struct{ a, b, psi float64 }{{12, 25, 0}, {12, 25, 30}, {-5, 30, 0}, {40, 40, 60}} {
		got, err := tower.WrapAngle(tower.RopePull{Tension: kN(1), Angle: deg(tc.a), Swing: deg(tc.psi)}, tower.RopePull{Tension: kN(1), Angle: deg(tc.b)})
		if err != nil {
			t.Fatal(err)
		}
		a, b, p := tc.a*math.Pi/180, tc.b*math.Pi/180, tc.psi*math.Pi/180
		// Rope arriving from the anchor (toward the span, upward) and leaving
		// toward the span (down, swung downwind); x along, y up, z across.
		in := [3]float64{math.Cos(b), math.Sin(b), 0}
		out := [3]float64{math.Cos(a), -math.Sin(a) * math.Cos(p), math.Sin(a) * math.Sin(p)}
		want := math.Acos(in[0]*out[0] + in[1]*out[1] + in[2]*out[2])
		if !near(float64(got), want, 1e-12) {
			t.Errorf("%+v: wrap %v, vectors %g rad", tc, got, want)
		}
		if tc.psi == 0 && !near(float64(got), a+b, 1e-12) {
			t.Errorf("%+v: wrap %v, want α + β", tc, got)
		}
	}
	if _, err := tower.WrapAngle(tower.RopePull{Tension: kN(1), Angle: deg(-20)}, tower.RopePull{Tension: kN(1), Angle: deg(10)}); !errors.Is(err, tower.ErrInvalid) ||
		!strings.Contains(err.Error(), "wrap angle") {
		t.Errorf("rope not bearing on the saddle: %v", err)
	}
}

// TestSaddleBalance checks the balance of the rope over each behaviour of
// saddle: the backstay tension stays where it is held while the saddle
// holds it, and otherwise goes to the nearer bound, which is the limit of
// the behaviour by statics or by the rope-friction law.
func TestSaddleBalance(t *testing.T) {
	span := tower.RopePull{Tension: kN(300), Angle: deg(11)}
	beta := deg(24)
	ts := 300e3
	th := (11.0 + 24) * math.Pi / 180
	for _, held := range []float64{150e3, 295e3, 300e3, 310e3, 600e3} {
		// μ = 0: equal tensions whatever was held.
		b, err := tower.Saddle{Groove: tower.FrictionGroove}.Balance(span, beta, units.Force(held))
		if err != nil || !near(float64(b.Backstay), ts, 1e-15) {
			t.Errorf("μ 0, held %g: %v %v", held, b.Backstay, err)
		}
		b, _ = tower.Saddle{}.Balance(span, beta, units.Force(held))
		if !near(float64(b.Backstay), ts, 1e-15) || (held != ts) != (b.Motion == tower.Rendered) {
			t.Errorf("free groove, held %g: %+v", held, b)
		}
		// Clamped: what is held.
		b, _ = tower.Saddle{Groove: tower.ClampedGroove}.Balance(span, beta, units.Force(held))
		if float64(b.Backstay) != held || b.Motion != tower.Held {
			t.Errorf("clamped, held %g: %+v", held, b)
		}
		// Friction: held within [T_s e^{−μθ}, T_s e^{μθ}], else at the bound.
		const mu = 0.1
		k := math.Exp(mu * th)
		want := math.Max(ts/k, math.Min(ts*k, held))
		b, err = tower.Saddle{Groove: tower.FrictionGroove, GrooveFriction: mu}.Balance(span, beta, units.Force(held))
		if err != nil || !near(float64(b.Backstay), want, 1e-12) {
			t.Errorf("friction, held %g: %v, want %g (%v)", held, b.Backstay, want, err)
		}
		if ratio := math.Max(float64(b.Backstay), ts) / math.Min(float64(b.Backstay), ts); ratio > k*(1+1e-12) {
			t.Errorf("friction, held %g: tension ratio %g above the bound %g", held, ratio, k)
		}
		// Sliding: at its bounds the plate friction is exactly used up,
		// |T_s cos α − T_b cos β| = μ (T_s sin α + T_b sin β).
		s := tower.Saddle{Kind: tower.Sliding, Friction: 0.05}
		b, _ = s.Balance(span, beta, units.Force(held))
		hu := ts*math.Cos(11*math.Pi/180) - float64(b.Backstay)*math.Cos(24*math.Pi/180)
		n := ts*math.Sin(11*math.Pi/180) + float64(b.Backstay)*math.Sin(24*math.Pi/180)
		switch b.Motion {
		case tower.Travelled:
			if !near(math.Abs(hu), 0.05*n, 1e-12) || b.Direction != math.Copysign(1, hu) {
				t.Errorf("sliding, held %g: unbalance %g, μN %g, direction %g", held, hu, 0.05*n, b.Direction)
			}
		case tower.Held:
			if math.Abs(hu) > 0.05*n || float64(b.Backstay) != held {
				t.Errorf("sliding held at %g with unbalance %g beyond μN %g", held, hu, 0.05*n)
			}
		}
		// Roller: the horizontals balance.
		b, _ = tower.Saddle{Kind: tower.Roller}.Balance(span, beta, units.Force(held))
		if !near(float64(b.Backstay)*math.Cos(24*math.Pi/180), ts*math.Cos(11*math.Pi/180), 1e-12) {
			t.Errorf("roller: %v", b.Backstay)
		}
	}
	// Bad input names the field.
	for _, tc := range []struct {
		name  string
		s     tower.Saddle
		span  tower.RopePull
		field string
	}{
		{"negative groove friction", tower.Saddle{Groove: tower.FrictionGroove, GrooveFriction: -0.2}, span, "Saddle.GrooveFriction"},
		{"rope not bearing", tower.Saddle{Groove: tower.FrictionGroove, GrooveFriction: 0.2}, tower.RopePull{Tension: kN(100), Angle: deg(-30)}, "wrap angle"},
		{"bad groove", tower.Saddle{Groove: 9}, span, "Saddle.Groove"},
		{"NaN swing", tower.Saddle{}, tower.RopePull{Tension: kN(100), Angle: deg(10), Swing: units.Angle(math.NaN())}, "Swing"},
	} {
		if _, err := tc.s.Balance(tc.span, beta, kN(100)); !errors.Is(err, tower.ErrInvalid) || !strings.Contains(err.Error(), tc.field) {
			t.Errorf("%s: %v", tc.name, err)
		}
	}
}

func FuzzSaddleBalance(f *testing.F) {
	f.Add(uint8(0), uint8(1), 0.1, 0.05, 300e3, 0.2, 0.0, 0.4, 290e3)
	f.Add(uint8(1), uint8(0), 0.0, 0.3, 100e3, -0.3, 0.2, 0.1, 50e3)
	f.Add(uint8(0), uint8(1), 0.2, 0.0, 300e3, -0.35, 0.0, 0.01, 290e3)
	f.Fuzz(func(t *testing.T, kind, groove uint8, mu, plate, ts, as, swing, ab, held float64) {
		s := tower.Saddle{Kind: tower.SaddleKind(kind % 4), Groove: tower.Groove(groove % 4), GrooveFriction: mu, Friction: plate}
		span := tower.RopePull{Tension: units.Force(ts), Angle: units.Angle(as), Swing: units.Angle(swing)}
		b, err := s.Balance(span, units.Angle(ab), units.Force(held))
		if err != nil {
			if !errors.Is(err, tower.ErrInvalid) && !errors.Is(err, tower.ErrLiftOff) {
				t.Fatalf("unexpected error %v", err)
			}
			return
		}
		if math.IsNaN(float64(b.Backstay)) || math.IsInf(float64(b.Backstay), 0) || b.Backstay < 0 && held >= 0 && s.Kind == tower.Fixed {
			t.Fatalf("backstay tension %v from %+v", b.Backstay, b)
		}
		if b.Lower > b.Upper {
			t.Fatalf("bounds %v > %v", b.Lower, b.Upper)
		}
	})
}
