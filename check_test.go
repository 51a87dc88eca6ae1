package sagspan

import (
	"math"
	"sort"
	"strings"
	"testing"

	"gonum.org/v1/gonum/floats/scalar"
	"gonum.org/v1/gonum/integrate/quad"
	"gonum.org/v1/gonum/mat"

	"github.com/sagspan/sagspan/check"
	"github.com/sagspan/sagspan/units"
)

func loadTestBridge(t testing.TB, name string) Bridge {
	t.Helper()
	b, err := LoadFile("testdata/" + name)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

func near(t *testing.T, what string, got, want, rel float64) {
	t.Helper()
	if !scalar.EqualWithinAbsOrRel(got, want, 0, rel) {
		t.Errorf("%s = %.6g, want %.6g (rel. tol. %g, off by %.2g)", what, got, want, rel, math.Abs(got-want)/math.Abs(want))
	}
}

func find(t *testing.T, rep check.Report, id, element, lc string) check.Result {
	t.Helper()
	for _, r := range rep.Results {
		if r.ID == id && r.Element == element && r.Case == lc {
			return r
		}
	}
	t.Fatalf("no result %s / %s / %s", id, element, lc)
	return check.Result{}
}

// cubicRoot returns the positive real root of H³ + a H² − c = 0 from the
// eigenvalues of its companion matrix (gonum's eigen solver, an independent
// route from package cable's own solver).
func cubicRoot(t *testing.T, a, c float64) float64 {
	t.Helper()
	comp := mat.NewDense(3, 3, []float64{
		-a, 0, c,
		1, 0, 0,
		0, 1, 0,
	})
	var eig mat.Eigen
	if !eig.Factorize(comp, mat.EigenNone) {
		t.Fatal("eigen factorisation failed")
	}
	var roots []float64
	for _, v := range eig.Values(nil) {
		if math.Abs(imag(v)) < 1e-9*math.Abs(real(v)) && real(v) > 0 {
			roots = append(roots, real(v))
		}
	}
	if len(roots) != 1 {
		t.Fatalf("want one positive real root, got %v", eig.Values(nil))
	}
	return roots[0]
}

// TestLevelSpanByHand checks the chain on testdata/level.json against a
// hand calculation with published formulas:
//
// Rope (rope makers' formulas in the form of EN 12385-4; package cable's
// References):
// 6x36-IWRC 26 mm 1770: MBF = 0.356·26²·1770/1000 = 425.97 kN,
// mass = 0.409·26²/100 = 2.76484 kg/m, metallic area 0.460·26² = 310.96 mm².
// Four ropes weigh 4·2.76484·9.80665 = 108.455 N per metre of rope.
//
// Length ratio of a level parabola, n = f/l = 2.5/50 = 0.05 (Hicks, Civil
// Engineering Formulas, ch. 10): S/l = 1 + 8n²/3 − 32n⁴/5 + 256n⁶/7.
//
// Permanent load w0 = (1000 + 108.455)·S/l N/m (the walkway's 1 kN per
// metre of walkway and the ropes' weight per metre of rope, both per
// horizontal metre); general cable theorem:
// H = w0 l²/(8f); support tension √(H² + (w0 l/2)²); slope atan(4f/l).
//
// Crowd, EN 1991-2 cl. 5.3.2.1: q = 2 + 120/(50+30) = 3.5 kPa on 1.0 m of
// walkway surface, 3.5·S/l kN per horizontal metre.
// Crowd over the full span, same temperature: the classical change-of-state
// cubic H₂²[H₂ − H₁ + EA W₁²/(24H₁²)] = EA W₂²/24, W = w l (Irvine, Cable
// Structures, ch. 3, [M]),
// solved here through gonum's eigen solver.
//
// Fixed saddle, free groove (one rope over it, tension continuous):
// V = T(sin α + sin β), H = T(cos α − cos β), β = atan(3/10) the backstay
// slope. Rope-line form of the resultant (the form practice uses): e =
// y·tan δ = H·y/V at the base section, the column weight not counted;
// statics form e_s = H·y/(V + W), W = 24·0.6·0.6·2.0 kN the column weight;
// kern 0.6/6 (middle third).
//
// Anchor block 3×3×2 m, 24 kN/m³ (EN 1991-1-1 Table A.1, from memory), on
// dense sand φ' 36° (preset, from memory), δ = 2φ'/3 (common practice):
// sliding factor = (W − T sin β) tan δ / (T cos β).
//
// Swing frequency f = (1/2l)√(H/m) (Irvine & Caughey 1974, from memory).
func TestLevelSpanByHand(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	const (
		g    = 9.80665
		l    = 50.0
		f    = 2.5
		dead = 1000.0
	)
	mbf := 0.356 * 26 * 26 * 1770 // N
	ropeWeight := 4 * 0.409 * 26 * 26 / 100 * g
	n := f / l
	ratio := 1 + 8*n*n/3 - 32*math.Pow(n, 4)/5 + 256*math.Pow(n, 6)/7
	w0 := (dead + ropeWeight) * ratio
	h0 := w0 * l * l / (8 * f)
	t0 := math.Hypot(h0, w0*l/2)
	alpha := math.Atan(4 * f / l)

	perm := a.Service[0]
	if perm.Case.Name != "permanent" {
		t.Fatalf("first case %q, want permanent", perm.Case.Name)
	}
	ws := perm.Groups[0]
	// Published-table tolerance: ~0.5 % is the rounding of the rope formulas'
	// factors; these are exact formula evaluations, so a tight tolerance.
	near(t, "permanent H", float64(ws.H), h0, 1e-6)
	near(t, "permanent support tension", float64(ws.Tension[Left]), t0, 1e-6)
	near(t, "permanent support angle", float64(ws.Angle[Left]), alpha, 1e-6)
	near(t, "permanent sag", float64(ws.Sag), f, 1e-9)

	// Rope: the most loaded of four ropes carries k_s/4 of the group's
	// tension, k_s 1.1 (default); each may carry k_e MBF/3, k_e 0.8
	// (default termination efficiency).
	rope := find(t, a.Report, "cable.tension", "walkway ropes", "permanent")
	near(t, "rope capacity (k_e MBF/3)", rope.Capacity, 0.8*mbf/3, 1e-9)
	near(t, "most loaded rope (1.1 T/4)", rope.Demand, 1.1*float64(ws.MaxTension)/4, 1e-12)

	// Full crowd. The rope renders over the fixed saddles (tension equal on
	// both sides), so the span and both backstays keep their unstretched
	// length together:
	//   L(H) = S(H) − (H l + w² l³/(12 H))/EA + 2 c/(1 + T_b/EA),
	//   S = (l/2)√(1+16n²) + l asinh(4n)/(8n), n = w l/(8H), the closed form
	//   of the level parabola's length (standard texts; Hicks, ch. 10, gives
	//   its series), T_b = √(H² + (w l/2)²),
	//   c = √(10² + 3²) m the backstay chord,
	// solved for L(H₂; w₀+q) = L(H₁; w₀) by bisection.
	crowd := 3.5e3 * 1.0 * ratio
	near(t, "EN 1991-2 crowd pressure", float64(CrowdPressure(50)), 3.5e3, 1e-12)
	ea := levelEA
	h2 := levelSolve(h0, w0, w0+crowd)
	m, err := newModel(b)
	if err != nil {
		t.Fatal(err)
	}
	full, _, err := m.pair(LoadCase{Name: "crowd over the whole span", Crowd: Stretch{0, b.Site.Span}, CrowdFactor: 1, Temperature: b.Climate.Reference}, nil)
	if err != nil {
		t.Fatal(err)
	}
	// Both routes are exact within the small-strain rule; what is left is
	// the iteration tolerance (1e-10 of the span in rope length).
	near(t, "full-crowd H (rope conserved over span and backstays)", float64(full.Groups[0].H), h2, 1e-7)
	// Without the backstays the classical cubic (Irvine, ch. 3) gives a larger
	// H; the rope the backstays give up lowers it.
	cubic := cubicRoot(t, -h0+ea*w0*l*w0*l/(24*h0*h0), ea*(w0+crowd)*l*(w0+crowd)*l/24)
	if !(float64(full.Groups[0].H) < cubic) {
		t.Errorf("H %v is not below the span-only cubic's %v", float64(full.Groups[0].H), cubic)
	}

	// Tower, permanent case, fixed saddle.
	beta := math.Atan(3.0 / 10)
	v := t0 * (math.Sin(alpha) + math.Sin(beta))
	hu := t0 * (math.Cos(alpha) - math.Cos(beta))
	wcol := 24e3 * 0.6 * 0.6 * 2.0
	ecc := find(t, a.Report, "tower.eccentricity", "left tower", "permanent")
	near(t, "permanent eccentricity, rope-line form", ecc.Demand, hu*2.0/v, 1e-6)
	es, _ := ecc.Value("e_s")
	near(t, "permanent eccentricity, statics form", es.Value, hu*2.0/(v+wcol), 1e-6)
	near(t, "kern", ecc.Capacity, 0.6/6, 1e-9)

	// Anchor sliding, permanent case.
	wblk := 24e3 * 3 * 3 * 2
	delta := 2.0 / 3 * 36 * math.Pi / 180
	fos := (wblk - t0*math.Sin(beta)) * math.Tan(delta) / (t0 * math.Cos(beta))
	sl := find(t, a.Report, "anchor.sliding", "left anchor", "permanent")
	near(t, "anchor sliding factor", sl.Provided, fos, 1e-6)

	// Clearance, permanent: soffit = 100 − 2.5 − 0.3; flood 92.
	cl := find(t, a.Report, "bridge.clearance", "walkway", "permanent")
	near(t, "clearance", cl.Capacity, 100-2.5-0.3-92, 1e-9)

	// Swing frequency.
	near(t, "swing frequency", float64(a.Modes.Swing), math.Sqrt(h0/(w0/g))/(2*l), 1e-6)
}

// levelEA is the axial stiffness of testdata/level.json's four 26 mm
// 6x36-IWRC ropes: E 100 GPa (from memory, as in package cable) on the
// metallic area 0.460 d² (rope makers' factor in the form of EN 12385-4;
// see package cable's References).
const levelEA = 4 * 100e9 * 0.460 * 26 * 26 * 1e-6

// levelLength returns the total unstretched rope length of
// testdata/level.json (span 50 m and two 10 m × 3 m backstays over fixed
// saddles, tension continuous) hanging with H under w per metre, by Hooke's
// law on the unstretched length (ds = (1 + T/EA) dp):
//
//	L(H) = ∫₀ˡ √(1+z'²)/(1 + H√(1+z'²)/EA) dx + 2 c/(1 + T_b/EA)
//
// on the level parabola z' = (w/H)(l/2 − x) (general cable theorem), by
// gonum's Gauss–Legendre quadrature, T_b = √(H² + (w l/2)²) the support
// tension, c = √(10² + 3²) the backstay chord.
func levelLength(h, w float64) float64 { return levelLengthEA(h, w, levelEA) }

// levelLengthEA is levelLength with the group's stiffness ea.
func levelLengthEA(h, w, ea float64) float64 {
	const l = 50.0
	span := quad.Fixed(func(x float64) float64 {
		a := math.Hypot(1, w/h*(l/2-x))
		return a / (1 + h*a/ea)
	}, 0, l, 60, quad.Legendre{}, 0)
	tb := math.Hypot(h, w*l/2)
	return span + 2*math.Hypot(10, 3)/(1+tb/ea)
}

// levelSolve returns H under load w2 of the level bridge's rope that hangs
// with H1 under w1, by bisection on levelLength (same temperature).
func levelSolve(h1, w1, w2 float64) float64 {
	target := levelLength(h1, w1)
	lo, hi := h1/10, 100*h1
	for range 200 {
		mid := (lo + hi) / 2
		if levelLength(mid, w2) > target { // too long: more tension
			lo = mid
		} else {
			hi = mid
		}
	}
	return (lo + hi) / 2
}

// TestPartialBasisByHand checks the partial-factor basis on
// testdata/level.json. The ropes are analysed under factored loads (the
// rope is non-linear: factor the loads, then solve), γG = 1.35 (EN 1990
// Table A2.4(B), from memory); the resistance is EN 1993-1-11 cl. 6.2
// (from memory): F_Rd = k_e F_min/(1.5 γ_R), k_e 0.8 and
// γ_R 0.90 by default, for each of the four ropes.
func TestPartialBasisByHand(t *testing.T) {
	b := loadTestBridge(t, "level.json")
	b.Basis.Method = "partial"
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	const g, l, f = 9.80665, 50.0, 2.5
	ropeWeight := 4 * 0.409 * 26 * 26 / 100 * g
	n := f / l
	w0 := (1000 + ropeWeight) * (1 + 8*n*n/3 - 32*math.Pow(n, 4)/5 + 256*math.Pow(n, 6)/7)
	h0 := w0 * l * l / (8 * f)
	h := levelSolve(h0, w0, 1.35*w0)
	want := math.Hypot(h, 1.35*w0*l/2)
	rope := find(t, a.Report, "cable.tension", "walkway ropes", "permanent")
	// The most loaded of the four ropes carries 1.1/4 of the group's
	// tension (default sharing factor, common practice).
	near(t, "design rope tension, permanent", rope.Demand, 1.1*want/4, 1e-6)
	near(t, "F_Rd of one rope", rope.Capacity, 0.8*0.356*26*26*1770/(1.5*0.9), 1e-9)
	for _, r := range a.Report.Results {
		if r.ID == "anchor.sliding" && !strings.Contains(r.Basis, "EN 1997-1 Annex A") {
			t.Fatalf("anchor sliding on the partial basis cites %q", r.Basis)
		}
	}
}

// TestMirroredBridge checks that a bridge mirrored end for end (banks
// swapped, rise negated, the walkway placed from the other bank) gives the
// same checks with left and right swapped: every result of the fixed cases
// exactly, and every governing result within the loaded-length search's
// 0.5 % (the search tries its stretches in another order on the mirrored
// bridge and may settle a little elsewhere).
func TestMirroredBridge(t *testing.T) {
	b := Demo()
	mb := b
	mb.Banks.Left, mb.Banks.Right = b.Banks.Right, b.Banks.Left
	mb.Site.Rise = -b.Site.Rise
	mb.Site.LeftSaddle = b.Site.LeftSaddle + b.Site.Rise
	// The ground line mirrored about midspan: x → span − x, in order.
	mb.Site.Ground = nil
	for i := len(b.Site.Ground) - 1; i >= 0; i-- {
		p := b.Site.Ground[i]
		mb.Site.Ground = append(mb.Site.Ground, Point{X: b.Site.Span - p.X, Z: p.Z})
	}
	mb.Loads.DeckFrom = "right"
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	ma, err := Check(mb, nil)
	if err != nil {
		t.Fatal(err)
	}
	mirror := func(s string) string {
		for k, v := range map[string]string{"left": "right", "right": "left"} {
			if strings.HasPrefix(s, k+" ") || s == k {
				return v + s[len(k):]
			}
		}
		return s
	}
	fixed := map[string]bool{}
	for _, lc := range b.Cases() {
		fixed[lc.Name] = true
	}
	for _, r := range a.Report.Results {
		if !fixed[r.Case] {
			continue
		}
		m := find(t, ma.Report, r.ID, mirror(r.Element), r.Case)
		if !scalar.EqualWithinAbsOrRel(r.Demand, m.Demand, 1e-9, 1e-7) || !scalar.EqualWithinAbsOrRel(r.Capacity, m.Capacity, 1e-9, 1e-7) {
			t.Errorf("%s %s %s: %v/%v, mirrored %v/%v", r.ID, r.Element, r.Case, r.Demand, r.Capacity, m.Demand, m.Capacity)
		}
	}
	mg := map[checkKey]check.Result{}
	for _, r := range ma.Report.Governing() {
		mg[checkKey{r.ID, r.Element}] = r
	}
	for _, r := range a.Report.Governing() {
		m, ok := mg[checkKey{r.ID, mirror(r.Element)}]
		if !ok {
			t.Errorf("%s %s has no mirrored result", r.ID, r.Element)
			continue
		}
		if !scalar.EqualWithinAbsOrRel(r.Ratio, m.Ratio, 1e-6, 0.005) {
			t.Errorf("governing %s %s: %.5f under %q, mirrored %.5f under %q", r.ID, r.Element, r.Ratio, r.Case, m.Ratio, m.Case)
		}
	}
}

// TestLoadScaling checks a consistency that holds whatever the numbers:
// more crowd never lowers the governing rope tension, and every case of the
// demo bridge is in the report with each check.
func TestLoadScaling(t *testing.T) {
	b := Demo()
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	b.Loads.Crowd = 5 * units.Kilopascal // EN 1991-2 upper bound for dense crowds
	heavy, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	rope := func(a *Analysis) float64 {
		for _, g := range a.Report.Governing() {
			if g.ID == "cable.tension" && g.Element == "walkway ropes" {
				return g.Demand
			}
		}
		t.Fatal("no rope tension")
		return 0
	}
	if rope(heavy) <= rope(a) {
		t.Errorf("5 kPa crowd gives rope tension %v, not above %v", rope(heavy), rope(a))
	}
	cases := map[string]bool{}
	for _, r := range a.Report.Results {
		cases[r.Case] = true
	}
	var names []string
	for _, lc := range b.Cases() {
		names = append(names, lc.Name)
		if !cases[lc.Name] {
			t.Errorf("case %q has no results", lc.Name)
		}
	}
	// permanent at three temperatures, wind at three, wind with crowd,
	// wind leading with the crowd accompanying, wind lift, sun on the
	// span, the flood, a walkway rope broken
	if len(names) != 12 {
		t.Errorf("demo bridge has %d cases %q, want 12 (wind given, and the flood)", len(names), names)
	}
}

// unstretchedByQuadrature returns the unstretched length of a rope state's
// span, L₀ = ∫ ds/(1 + T/EA) (Hooke on the unstretched length), by gonum's
// Gauss–Legendre quadrature on each piece between midspan and the edges of
// the load's patches (the loaded shape is smooth on each), with the slope
// from a central difference of Z: a route independent of package cable's
// closed forms.
func unstretchedByQuadrature(gs GroupState, span units.Length, ea float64) float64 {
	const h = 1e-5
	integrand := func(x float64) float64 {
		dz := (float64(gs.shape.Z(units.Length(x+h))) - float64(gs.shape.Z(units.Length(x-h)))) / (2 * h)
		ds := math.Sqrt(1 + dz*dz)
		return ds / (1 + float64(gs.shape.Tension(units.Length(x)))/ea)
	}
	l := float64(span)
	cuts := []float64{0, l / 2, l}
	for _, p := range gs.Load.Patches {
		cuts = append(cuts, float64(p.From), float64(p.To))
	}
	sort.Float64s(cuts)
	total := 0.0
	for i := 1; i < len(cuts); i++ {
		// The nodes of the rule stay clear of the ends by far more than h,
		// so no difference straddles a patch edge.
		if a, b := cuts[i-1], cuts[i]; b > a {
			total += quad.Fixed(integrand, a, b, 40, quad.Legendre{}, 0)
		}
	}
	return total
}

// TestRopeRenderedOverSaddles checks the rope that renders over the
// saddles: whatever the numbers, the rope is conserved. The span and both
// backstays together keep their unstretched length (each part scaled by
// the linear thermal strain 1 + α Δθ at its own temperature; with a rope
// broken, the ropes left keep theirs and stretch under the group's tension
// over fewer ropes); a roller balances the horizontal components,
// T_b cos β = H; a sliding saddle that slides passes μN to the column
// (statics).
func TestRopeRenderedOverSaddles(t *testing.T) {
	b := Demo()                                  // left saddle sliding, right saddle on rollers
	b.Banks.Left.Backstay.Drop = 8 * units.Metre // steep enough for the left saddle to slide
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	m, err := newModel(b)
	if err != nil {
		t.Fatal(err)
	}
	g := m.groups[0]
	ea, alpha := float64(g.elastic.EA), float64(g.elastic.Alpha)
	ref := unstretchedByQuadrature(a.Service[0].Groups[0], b.Site.Span, ea)
	slid, broken, sun := 0, 0, 0
	mu := b.Banks.Left.Tower.Saddle.Friction
	for _, cs := range a.Service {
		gs := cs.Groups[0]
		lc := cs.Case
		thermal := 1 + alpha*float64(lc.Temperature-b.Climate.Reference)
		thermalBackstay := thermal
		if lc.BackstayTemperature != 0 {
			thermalBackstay = 1 + alpha*float64(lc.BackstayTemperature-b.Climate.Reference)
			sun++
		}
		eaNow := ea
		if lc.Broken > 0 && lc.BrokenGroup == g.Name {
			eaNow = ea * float64(g.Count-lc.Broken) / float64(g.Count)
			broken++
		}
		// New rope in the construction stage, shorter by its
		// constructional stretch (TestConstructionStartsFromErection).
		scale := 1.0
		if lc.Situation == Construction {
			scale = 1 / (1 + g.constructionalStretch())
		}
		thermal *= scale
		thermalBackstay *= scale
		got := unstretchedByQuadrature(gs, b.Site.Span, eaNow)
		want := ref * thermal
		for side := Left; side <= Right; side++ {
			bs := m.backstays[0][side]
			got += float64(bs.chord) / (1 + float64(gs.Backstay[side])/eaNow)
			want += bs.unstretched * thermalBackstay
		}
		near(t, lc.Name+": rope conserved", got, want, 1e-11)
		h, _, _ := elevationPull(gs.Tension[Right], gs.Angle[Right], gs.Swing)
		near(t, lc.Name+": roller balance", float64(gs.Backstay[Right])*math.Cos(float64(gs.BackstayAngle[Right])), h, 1e-12)
		if lf := gs.Saddle[Left]; gs.SaddleMoved[Left] {
			slid++
			near(t, lc.Name+": sliding saddle passes μN", math.Abs(float64(lf.Horizontal)), mu*float64(lf.Vertical), 1e-9)
		}
	}
	if slid == 0 || broken == 0 || sun == 0 {
		t.Errorf("the test does not reach every case: sliding %d, broken rope %d, sun on the span %d", slid, broken, sun)
	}
}

// TestAnchorTypes runs the chain with a deadman on one bank and grouted
// rock anchors on the other, and checks that each anchor's own checks are
// reported for every case.
func TestAnchorTypes(t *testing.T) {
	b := Demo()
	m := units.Metre
	b.Banks.Left.Anchor = AnchorSpec{Type: "deadman", Length: 1.2 * m, Width: 6 * m, Height: 1.5 * m, Depth: 3 * m}
	b.Banks.Right.Anchor = AnchorSpec{Type: "rock", Bars: 4, BarDiameter: 32 * units.Millimetre,
		BarStrength: 500 * units.Megapascal, HoleDiameter: 90 * units.Millimetre, BondLength: 4 * m, FreeLength: 2 * m}
	b.Banks.Right.Soil = SoilSpec{Preset: "sound rock", Allowable: Given(2 * units.Megapascal)} // rock bears by an allowable pressure
	if err := b.Validate(); err != nil {
		t.Fatal(err)
	}
	a, err := Check(b, nil)
	if err != nil {
		t.Fatal(err)
	}
	count := map[string]int{}
	for _, r := range a.Report.Results {
		count[r.ID]++
		if r.Demand != r.Demand || r.Capacity != r.Capacity {
			t.Errorf("NaN in %s %s", r.ID, r.Case)
		}
	}
	// Once per fixed case, and once in each loaded-length family where
	// some stretch governs it.
	n := len(b.Cases())
	for _, id := range []string{"anchor.deadman.pullout", "anchor.deadman.uplift", "anchor.rock.steel", "anchor.rock.groutbar", "anchor.rock.groutrock", "anchor.rock.cone"} {
		if count[id] < n || count[id] > n+len(b.LoadedLengths()) {
			t.Errorf("%s reported %d times, want once per case (%d) and at most once per searched family", id, count[id], n)
		}
	}
	// The bars carry the resultant of the backstay pulls: with the
	// walkway and handrail backstays at different slopes, the steel check's
	// demand per bar in the permanent case is |Σ T_i (cos β_i, sin β_i)|/4.
	perm := a.Service[0]
	var fx, fz float64
	for _, g := range perm.Groups {
		fx += float64(g.Backstay[Right]) * math.Cos(float64(g.BackstayAngle[Right]))
		fz += float64(g.Backstay[Right]) * math.Sin(float64(g.BackstayAngle[Right]))
	}
	steel := find(t, a.Report, "anchor.rock.steel", "right anchor", "permanent")
	near(t, "rock anchor bar pull", steel.Demand, math.Hypot(fx, fz)/4, 1e-9)
	near(t, "rock anchor bar utilisation", steel.Ratio, 2.0*steel.Demand/steel.Capacity, 1e-9) // allowable: factor 2.0 required
}
