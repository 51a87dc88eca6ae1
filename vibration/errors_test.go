package vibration

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/sagspan/sagspan/units"
)

// wantInvalid checks err wraps ErrInvalid, starts with the package name
// and says what is wrong.
func wantInvalid(t *testing.T, what string, err error, words string) {
	t.Helper()
	switch {
	case err == nil:
		t.Errorf("%s: no error", what)
	case !errors.Is(err, ErrInvalid):
		t.Errorf("%s: %v does not wrap ErrInvalid", what, err)
	case !strings.HasPrefix(err.Error(), "vibration: "):
		t.Errorf("%s: %q does not start with the package name", what, err)
	case !strings.Contains(err.Error(), words):
		t.Errorf("%s: %q does not say %q", what, err, words)
	}
}

func TestBadModels(t *testing.T) {
	for _, c := range []struct {
		what  string
		edit  func(*Model, *Settings)
		words string
	}{
		{"negative mass", func(m *Model, _ *Settings) { m.Ropes[0].Mass = -1 }, "mass must be positive"},
		{"negative walkway mass", func(m *Model, _ *Settings) { m.Walkway.Mass = -50 }, "walkway mass"},
		{"NaN tension", func(m *Model, _ *Settings) { m.Ropes[1].H = units.Force(math.NaN()) }, "H must be positive"},
		{"zero EA", func(m *Model, _ *Settings) { m.Ropes[2].EA = 0 }, "EA must be positive"},
		{"no shape", func(m *Model, _ *Settings) { m.Ropes[0].Shape = nil }, "shape is missing"},
		{"no ropes", func(m *Model, _ *Settings) { m.Ropes = nil }, "no ropes"},
		{"zero span", func(m *Model, _ *Settings) { m.Span = 0 }, "span"},
		{"rise beyond span", func(m *Model, _ *Settings) { m.Rise = 100 }, "rise"},
		{"tied without width", func(m *Model, _ *Settings) { m.Walkway.Width = 0 }, "no width"},
		{"walkway mass on nothing", func(m *Model, _ *Settings) {
			for i := range m.Ropes {
				m.Ropes[i].Tied = false
			}
		}, "no rope is tied"},
		{"shape off the supports", func(m *Model, _ *Settings) { m.Ropes[0].Shape = parabola{72, 0, 3.6} }, "must end at 0 and at the rise"},
		{"tension not carrying the weight", func(m *Model, _ *Settings) { m.Ropes[0].H *= 1.5 }, "carry"},
		{"untied rope too light for its tension", func(m *Model, _ *Settings) { m.Ropes[2].Tied, m.Ropes[3].Tied = false, false; m.Ropes[2].Mass *= 2 }, "its mass weighs"},
		{"backstay missing", func(m *Model, _ *Settings) { m.Ropes[0].Ends[0].Kind = Renders }, "backstay length"},
		{"backstay angle", func(m *Model, _ *Settings) {
			m.Ropes[0].Ends[1] = End{Kind: Rolls, Backstay: Backstay{Length: 10, Tension: 1e5, Angle: 2}}
		}, "backstay angle"},
		{"unknown end", func(m *Model, _ *Settings) { m.Ropes[0].Ends[1].Kind = 7 }, "unknown end kind"},
		{"mesh too coarse", func(_ *Model, s *Settings) { s.Elements = 30 }, "mesh too coarse"},
		{"mesh too fine", func(_ *Model, s *Settings) { s.Elements = 5000 }, "exceeds"},
		{"mesh too coarse for the modes", func(_ *Model, s *Settings) { s.Elements = 60; s.MaxVertical = 12 }, "mesh too coarse: mode"},
		{"negative cut-off", func(_ *Model, s *Settings) { s.MaxLateral = -1 }, "MaxLateral"},
	} {
		m, s := demoLike(), &Settings{}
		c.edit(&m, s)
		_, err := m.Modes(s)
		wantInvalid(t, c.what, err, c.words)
	}
}

func TestBadResponse(t *testing.T) {
	md, err := demoLike().Modes(nil)
	if err != nil {
		t.Fatal(err)
	}
	i := 0 // the first mode is lateral
	for _, c := range []struct {
		what  string
		i     int
		w     Walkers
		words string
	}{
		{"zero damping", i, Walkers{Damping: 0}, "unbounded"},
		{"NaN damping", i, Walkers{Damping: math.NaN()}, "damping ratio"},
		{"damping over critical", i, Walkers{Damping: 1.5}, "damping ratio"},
		{"unknown traffic", i, Walkers{Damping: 0.01, Traffic: 9}, "traffic"},
		{"mode out of range", len(md.Modes), Walkers{Damping: 0.01}, "out of range"},
		{"negative mode", -1, Walkers{Damping: 0.01}, "out of range"},
	} {
		_, err := md.Response(c.i, c.w)
		wantInvalid(t, c.what, err, c.words)
	}
	if _, err := md.LockIn(0, 0, 10); err == nil {
		t.Error("lock-in with zero damping: no error")
	}
	if _, err := md.LockIn(0, 0.01, -3); err == nil {
		t.Error("lock-in with a negative crowd: no error")
	}
	if v := firstOf(t, md, Vertical, true); true {
		for j, m := range md.Modes {
			if m.Frequency == v.Frequency {
				_, err := md.LockIn(j, 0.01, 10)
				wantInvalid(t, "lock-in of a vertical mode", err, "lateral")
			}
		}
	}
	rope, err := singleRope(50, 0.05, 20, 1e8).Modes(nil)
	if err != nil {
		t.Fatal(err)
	}
	_, err = rope.Response(0, Walkers{Damping: 0.01})
	wantInvalid(t, "ropes with no walkway", err, "no walkway")
}

// FuzzModes feeds arbitrary spans, sags, masses, stiffnesses, offsets and
// mesh sizes to the modal analysis: it returns an error or modes whose
// every number is finite, never a panic or a NaN.
func FuzzModes(f *testing.F) {
	f.Add(72.0, 0.05, 30.0, 100.0, 1e8, 1.2, 1.1, 0)
	f.Add(20.0, 0.2, 1.0, 0.0, 1e3, 0.5, 0.0, 61)
	f.Fuzz(func(t *testing.T, l, eps, rope, deck, ea, width, offset float64, n int) {
		if !(l > 0 && l < 500) || !(eps > 0 && eps < 0.3) {
			return
		}
		m := Model{Span: units.Length(l), Walkway: Walkway{Mass: units.MassPerLength(deck), Width: units.Length(width)}}
		h := horizontal(rope+deck/2, l, eps*l)
		for _, y := range []float64{width / 2, -width / 2} {
			m.Ropes = append(m.Ropes, Rope{Y: units.Length(y), Z: units.Length(offset), Shape: parabola{l, 0, eps * l},
				H: units.Force(h), Mass: units.MassPerLength(rope), EA: units.AxialStiffness(ea), Tied: true})
		}
		md, err := m.Modes(&Settings{Elements: n % 200})
		if err != nil {
			if !errors.Is(err, ErrInvalid) {
				t.Fatalf("error %v does not wrap ErrInvalid", err)
			}
			return
		}
		for i, mode := range md.Modes {
			vals := []float64{float64(mode.Frequency), float64(mode.ModalMass), mode.Error, float64(mode.Effective[0]), float64(mode.Effective[1]), float64(mode.Effective[2])}
			for _, v := range vals {
				if !finite(v) {
					t.Fatalf("mode %d: %v", i, vals)
				}
			}
			if r, err := md.Response(i, Walkers{Damping: 0.01}); err == nil && !finite(float64(r.Acceleration)) {
				t.Fatalf("mode %d: acceleration %v", i, r.Acceleration)
			}
		}
	})
}
