package vibration_test

import (
	"fmt"

	"github.com/sagspan/sagspan/units"
	"github.com/sagspan/sagspan/vibration"
)

// sagging is a rope's static shape under a load uniform per horizontal
// metre: a parabola z = −4f x(L−x)/L² on a level span.
type sagging struct{ l, sag units.Length }

func (s sagging) Z(x units.Length) units.Length { return -4 * s.sag * x * (s.l - x) / (s.l * s.l) }

// The modes of one bare rope, 100 m span, 5 m sag, 100 kg/m, EA 1 GN (an
// invented rope): lateral modes at n·f₀, in-plane modes near 2f₀, 2.84f₀,
// 4f₀ …
func ExampleModel_Modes() {
	const l, sag, mass = 100.0, 5.0, 100.0
	h := mass * units.StandardGravity * l * l / (8 * sag) // H = mgL²/(8f)
	m := vibration.Model{Span: l, Ropes: []vibration.Rope{{
		Name: "rope", Shape: sagging{l, sag}, H: units.Force(h), Mass: mass, EA: 1e9,
	}}}
	modal, err := m.Modes(&vibration.Settings{MaxVertical: 1, MaxLateral: 1})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%d elements\n", modal.Elements)
	for i, md := range modal.Modes {
		fmt.Printf("%d  %-24s %.4f Hz  M* %.0f kg\n", i+1, md.Label(), float64(md.Frequency), float64(md.ModalMass))
	}
	// Output:
	// 60 elements
	// 1  lateral, symmetric       0.2475 Hz  M* 5000 kg
	// 2  vertical, antisymmetric  0.4901 Hz  M* 5177 kg
	// 3  lateral, antisymmetric   0.4949 Hz  M* 5000 kg
	// 4  vertical, symmetric      0.7021 Hz  M* 3121 kg
	// 5  lateral, symmetric       0.7420 Hz  M* 5000 kg
	// 6  vertical, antisymmetric  0.9861 Hz  M* 5034 kg
	// 7  lateral, antisymmetric   0.9885 Hz  M* 5055 kg
}

// The response of the first lateral mode of a walkway to sparse traffic.
func ExampleModal_Response() {
	const l, sag = 40.0, 0.479
	const rope, deck = 8.0, 60.0 // kg/m: each rope plane and the walkway
	h := (rope + deck/2) * units.StandardGravity * l * l / (8 * sag)
	m := vibration.Model{Span: l, Walkway: vibration.Walkway{Mass: deck, Width: 1.2}}
	for _, y := range []units.Length{0.6, -0.6} {
		m.Ropes = append(m.Ropes, vibration.Rope{Y: y, Shape: sagging{l, sag}, H: units.Force(h), Mass: rope, EA: 2e8, Tied: true})
	}
	modal, err := m.Modes(nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	r, err := modal.Response(0, vibration.Walkers{Traffic: vibration.Sparse, Damping: 0.01})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("mode 1 %s at %.3f Hz: n' %.2f, ψ %.2f, a %.3f m/s² against %.1f\n", r.Label, float64(r.Frequency), r.Equivalent, r.Psi, float64(r.Acceleration), float64(r.Limit))
	// Output:
	// mode 1 lateral, symmetric at 0.800 Hz: n' 5.29, ψ 1.00, a 3.877 m/s² against 0.2
}
