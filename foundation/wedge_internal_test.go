package foundation

import (
	"math"
	"testing"

	"github.com/sagspan/sagspan/units"
)

// TestUndrainedWedge checks the undrained passive thrust on falling
// ground: on level ground the plane wedge gives Rankine's ½γh² + 2c_u h
// (Das, Principles of Foundation Engineering, Rankine passive pressure with
// φ = 0 [M]), ratio 1; on falling ground its closed-form least thrust
// agrees with a scan of the failure plane's angle in steps of 0.001°
// (an independent route: the wedge's statics evaluated plane by plane);
// a slight fall takes off a little, not the whole thrust. γ 18 kN/m³,
// h 4.7 m, c_u 60 kPa: by the scan 749.571, 636.431 and 416.004 kN/m at
// 1°, 10° and 30° against 762.81 kN/m on level ground.
func TestUndrainedWedge(t *testing.T) {
	st := strength{cond: Undrained, c: 60e3}
	const g, h = 18e3, 4.7
	level := 0.5*g*h*h + 2*st.c*h
	for _, c := range []struct{ beta, thrust float64 }{{0, level / 1e3}, {1, 749.571}, {10, 636.431}, {30, 416.004}} {
		got := undrainedWedge(st, g, h, units.FromDegrees(c.beta)) * level / 1e3
		if math.Abs(got-c.thrust) > 1e-3 {
			t.Errorf("β %v°: thrust %.4f kN/m, want %.3f", c.beta, got, c.thrust)
		}
		// The scan, here too, at this slope.
		b := math.Tan(c.beta * math.Pi / 180)
		least := math.Inf(1)
		for k := 1; k < 90000; k++ {
			tt := math.Tan(float64(k) / 1000 * math.Pi / 180)
			x := h / (tt + b)
			least = math.Min(least, 0.5*g*h*x*tt+st.c*x*(1+tt*tt))
		}
		if math.Abs(got*1e3-least) > 1e-6*least {
			t.Errorf("β %v°: closed form %.6g N/m, scan %.6g", c.beta, got*1e3, least)
		}
	}
	if r := undrainedWedge(strength{cond: Drained, phi: 0.5}, g, h, units.FromDegrees(20)); r != 1 {
		t.Errorf("drained: %v, want 1 (Coulomb's Kp carries the slope)", r)
	}
}
