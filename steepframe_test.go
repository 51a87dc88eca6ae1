package sagspan

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
)

// TestSteepFrameByHand checks the governing numbers of
// testdata/steep_frame.json (steel frame towers, a deadman in stiff clay
// on a falling bank with the Vesić method, rock anchors on the other bank)
// by routes of their own: the parabolic cable with roller saddles solved by
// bisection and gonum quadrature, statics at the saddle, EN 1993-1-1 6.3.1
// written out, Teng's deadman in Rankine pressures, the rock cone's volume
// counted on a grid, Vesić's undrained bearing equation. Each value names
// its source; [D] marks a value derived here by a route other than the
// library's.
func TestSteepFrameByHand(t *testing.T) {
	h := checkByHand(t, "steep_frame.json")
	a, state, governing, value, near := h.a, h.state, h.governing, h.value, h.near

	// 1. Walkway ropes under the full crowd at the reference temperature
	// ("flood with crowd": the characteristic rope state is that of the
	// crowd over the whole span). Parabolic cable (Irvine, Cable
	// Structures, 1981, ch. 2, load per horizontal metre) on the inclined
	// chord, roller saddles carrying the rope clamped and moving until the
	// backstay's horizontal pull equals the span's; unstretched lengths of
	// span and backstays kept from the reference state (dead load, 5.0 m
	// sag at 12 °C). The parabola against the elastic catenary: within
	// about (f/L)² ≈ 0.25 %; tolerance 1 %.
	{
		const (
			g      = 9.80665 // m/s², standard gravity
			n      = 7.0
			mass   = 6.544  // kg/m, catalogue 6x36-IWRC 40 mm (the report's design basis)
			area   = 736e-6 // m², catalogue
			modE   = 100e9  // Pa, catalogue
			span   = 100.0
			rise   = 2.5
			sag0   = 5.0
			dead   = 1500.0 // N/m, walkway parts 0.40 + 0.75 + 0.35 kN/m
			crowdQ = 2.0e3 + 120e3/(100+30)
			width  = 1.4
		)
		ea := n * modE * area
		crowd := crowdQ * width                   // EN 1991-2:2003 5.3.2.1(2) [R], 4.092 kN/m
		bs := [2][2]float64{{20, 6.6}, {10, 6.0}} // backstay horizontal, drop
		// slope of the parabola at x on chord lc with load w, horizontal tension h
		slope := func(x, lc, w, h float64) float64 { return rise/lc - w/(2*h)*(lc-2*x) }
		arc := func(lc, w, h float64) float64 {
			return quad.Fixed(func(x float64) float64 { s := slope(x, lc, w, h); return math.Sqrt(1 + s*s) }, 0, lc, 40, quad.Legendre{}, 0)
		}
		unstretched := func(lc, w, h float64) float64 {
			return quad.Fixed(func(x float64) float64 {
				s := math.Sqrt(1 + slope(x, lc, w, h)*slope(x, lc, w, h))
				return s / (1 + h*s/ea)
			}, 0, lc, 40, quad.Legendre{}, 0)
		}
		ropeW := n * mass * g
		// Reference: w0 with the ropes and the walkway (its loads per
		// metre of walkway, which follows the ropes) spread by S/L,
		// H0 = w0 L²/8f.
		w0, h0 := dead+ropeW, 0.0
		for range 20 {
			h0 = w0 * span * span / (8 * sag0)
			w0 = (dead + ropeW) * arc(span, w0, h0) / span
		}
		l0s := unstretched(span, w0, h0)
		var l0b [2]float64
		for i, s := range bs {
			c := math.Hypot(s[0], s[1])
			l0b[i] = c / (1 + h0*c/s[0]/ea)
		}
		// travel of a roller saddle toward the span that brings the
		// backstay's horizontal pull to h
		travel := func(i int, h float64) float64 {
			return bisect(func(d float64) float64 {
				x := bs[i][0] + d
				c := math.Hypot(x, bs[i][1])
				return modE*area*n*(c/l0b[i]-1)*x/c - h
			}, -1, 1)
		}
		w1 := dead + crowd + ropeW
		var lc float64
		h1 := bisect(func(h float64) float64 {
			lc = span - travel(0, h) - travel(1, h)
			for range 5 {
				w1 = (dead + crowd + ropeW) * arc(lc, w1, h) / lc
			}
			return unstretched(lc, w1, h) - l0s
		}, h0, 5*h0)
		tmax := 0.0
		for i := range bs {
			x := bs[i][0] + travel(i, h1)
			tmax = math.Max(tmax, h1*math.Hypot(x, bs[i][1])/x)
		}
		for _, x := range []float64{0, lc} {
			s := slope(x, lc, w1, h1)
			tmax = math.Max(tmax, h1*math.Sqrt(1+s*s))
		}
		gs := state(a.Service, "flood with crowd").Groups[0]
		near("walkway ropes H, full crowd [D]", float64(gs.H), h1, 0.01)
		near("walkway ropes max tension, full crowd [D]", float64(gs.MaxTension), tmax, 0.01)
		// The reference state itself: H0 = w L²/8f (Irvine eq. 2.5) [R].
		near("walkway ropes H, permanent [R]", float64(state(a.Service, "permanent").Groups[0].H), h0, 0.01)
		// The most loaded rope: k_s T/n against MBF k_e/3 (common practice).
		r := governing("cable.tension", "walkway ropes")
		near("most loaded rope", r.Demand, 1.1*value(r, "T")/n, 1e-9)
		near("rope resistance", r.Capacity, 1008e3*0.8/3, 0.001)
	}

	// 2. The saddle resultant along the bridge on the left tower in the
	// governing case: statics of the rope forces at the saddles. With roller
	// saddles the span and backstay pulls balance horizontally (tan δ = 0),
	// so e = h tan δ is nil and the line of action is the vertical through
	// the saddles as they moved: e = Σ V_i Δ_i / Σ V_i.
	{
		r := governing("tower.eccentricity", "left tower")
		cs := state(a.Service, r.Case)
		var sv, sh, sm float64
		for _, gs := range cs.Groups {
			v := float64(gs.Tension[Left])*math.Sin(float64(gs.Angle[Left])) + float64(gs.Backstay[Left])*math.Sin(float64(gs.BackstayAngle[Left]))
			h := float64(gs.Tension[Left])*math.Cos(float64(gs.Angle[Left])) - float64(gs.Backstay[Left])*math.Cos(float64(gs.BackstayAngle[Left]))
			sv += v
			sh += h
			sm += v * float64(gs.Travel[Left])
		}
		near("left saddle ΣV [D]", value(r, "ΣV"), sv, 0.001)
		if math.Abs(sh) > 1e-3*sv || value(r, "ΣH") != 0 {
			t.Errorf("left saddle ΣH: library %.4g, by hand %.4g: a roller saddle balances the pulls", value(r, "ΣH"), sh)
		}
		near("left saddle e, rope line (h tan δ = 0, plus the saddles' travel) [D]", r.Demand, sm/sv, 0.002)
	}

	// 3. The frame legs (EN 1993-1-1:2005 6.3.1, 6.4), left and right
	// towers in the governing case: the leg force N/2 + M_across,Ed/s with
	// eq. 6.69, and the buckling resistance along the bridge of a leg as a
	// cantilever on the default base flexibility k = 0.1 (EN 1992-1-1
	// 5.8.3.2(3)): u tan u = 1/k (Timoshenko & Gere, Theory of Elastic
	// Stability, §2.2, the cantilever on an elastic base), l0 = π l/u,
	// λ̄ = l0/(i λ1), curve a (α = 0.21, Table 6.1/6.2), χ by eq. 6.49.
	for _, tw := range []struct {
		side       Side
		el         string
		d, wall, l float64 // tube outside diameter and wall; column length to the handrail saddles
	}{
		{Left, "left tower", 0.2445, 0.0125, 4.0 + 1.2},
		{Right, "right tower", 0.2445, 0.0142, 3.5 + 1.2},
	} {
		const fy, e, spacing = 355e6, 210e9, 1.6
		r := governing("tower.column_section", tw.el)
		cs := state(a.Design, r.Case)
		ar := math.Pi * (tw.d - tw.wall) * tw.wall
		in := math.Pi / 64 * (math.Pow(tw.d, 4) - math.Pow(tw.d-2*tw.wall, 4))
		// N from the rope forces at the saddles and the column, statics;
		// the span-side pull lies in the plane the wind swings the ropes to.
		var n float64
		for _, gs := range cs.Groups {
			n += float64(gs.Tension[tw.side])*math.Sin(float64(gs.Angle[tw.side]))*math.Cos(float64(gs.Swing)) +
				float64(gs.Backstay[tw.side])*math.Sin(float64(gs.BackstayAngle[tw.side]))
		}
		n += float64(cs.Tower[tw.side].SelfWeight)
		near(tw.el+" N on the column [D]", float64(cs.Tower[tw.side].Vertical), n, 0.001)
		// across: the frame as a built-up member, l0 from the same
		// cantilever (I_eff = 2A(s/2)², 6.4.1), bracing S_v = 2π²EI/a² (6.4.3.1)
		u := 0.0
		{
			lo, hi := 1e-6, math.Pi/2-1e-9
			for range 200 {
				mid := (lo + hi) / 2
				if mid*math.Tan(mid) < 1/0.1 {
					lo = mid
				} else {
					hi = mid
				}
			}
			u = (lo + hi) / 2
		}
		l0 := math.Pi * tw.l / u
		ieff := 2 * ar * spacing * spacing / 4
		ncr := math.Pi * math.Pi * e * ieff / (l0 * l0)
		sv := 2 * math.Pi * math.Pi * e * in / (1.0 * 1.0)
		mz := math.Abs(float64(cs.LateralMoment[tw.side]))
		med := (mz + n*tw.l/500) / (1 - n/ncr - n/sv)
		nleg := n/2 + med/spacing
		near(tw.el+" N_leg (6.4, eq. 6.69) [D]", value(r, "N_leg"), nleg, 0.002)
		near(tw.el+" l0_y, cantilever on k = 0.1 [D]", value(r, "l0_y"), l0, 0.001)
		lam1 := math.Pi * math.Sqrt(e/fy) // 93.9 ε, 6.3.1.3
		lam := l0 / math.Sqrt(in/ar) / lam1
		phi := 0.5 * (1 + 0.21*(lam-0.2) + lam*lam)
		chi := 1 / (phi + math.Sqrt(phi*phi-lam*lam))
		near(tw.el+" χ_y (eq. 6.49, curve a) [R]", value(r, "χ_y"), chi, 0.001)
		near(tw.el+" N_b,Rd,y = χ A f_y/γM1 (γM1 1.0) [R]", value(r, "N_b,Rd,y"), chi*ar*fy, 0.001)
		if nleg > chi*ar*fy {
			t.Errorf("%s: the leg buckles by hand, N_leg %.4g > N_b,Rd %.4g", tw.el, nleg, chi*ar*fy)
		}
		if r.Ratio < nleg/(chi*ar*fy) {
			t.Errorf("%s: utilisation %.4g below the axial part alone %.4g", tw.el, r.Ratio, nleg/(chi*ar*fy))
		}
	}

	// 4. The deadman (left bank): Teng's continuous anchor near the surface
	// (Height 2.4 m ≥ Depth/2 = 2.35 m), Rankine's pressures with Bell's
	// cohesion and the tension crack on the active side (Das, in package
	// foundation's References), water below (141.5 m, the deadman's bottom at
	// 142.2 m), level ground (the line is level from x = −45 m to 1.5 m).
	{
		const gam, c, l, h = 19e3, 5e3, 5.5, 4.7
		phi := 24 * math.Pi / 180
		kp := math.Pow(math.Tan(math.Pi/4+phi/2), 2)
		ka := math.Pow(math.Tan(math.Pi/4-phi/2), 2)
		pp := 0.5*kp*gam*h*h + 2*c*math.Sqrt(kp)*h
		z0 := 2 * c / (gam * math.Sqrt(ka))
		pa := 0.5 * ka * gam * (h - z0) * (h - z0)
		drained := l * (pp - pa)
		// Undrained (φ = 0, K = 1): P_p − P_a = ½γH² + 2c_u H, the active
		// side all in tension (2c_u/γ = 6.3 m > H) [D].
		const cu = 60e3
		undrained := l * (0.5*gam*h*h + 2*cu*h)
		r := governing("anchor.deadman.pullout", "left anchor")
		near("deadman T_u drained, Teng [D]", r.Capacity, math.Min(drained, undrained), 0.002)
		near("deadman undrained utilisation [D]", value(r, "U_un"), 2*r.Demand/undrained, 0.002)
		near("deadman drained utilisation [D]", value(r, "U_dr"), 2*r.Demand/drained, 0.002)
	}

	// 5. The rock anchor's cone (right bank): 7 bars at 1.0 m in a row
	// across the pull, apex at free + bond/2 = 9 m along each bar inclined
	// with the backstay, half-angle 30°, the union of the cones below the
	// rock surface and behind the plane of the heads, counted on a 50 mm
	// grid (midpoint rule; the error on the cones' surface is well below
	// 1 %), γ 25 kN/m³ (site investigation), no water.
	{
		r := governing("anchor.rock.cone", "right anchor")
		alpha := value(r, "α")
		const lAx, psi, nb, s, step = 9.0, 30 * math.Pi / 180, 7, 1.0, 0.05
		ax, az := math.Cos(alpha), -math.Sin(alpha) // axis from head to apex
		tp := math.Tan(psi)
		var count int
		reach := lAx * tp
		x0, x1 := -reach, lAx*ax+reach
		y0, y1 := -(float64(nb-1)*s/2 + reach), float64(nb-1)*s/2+reach
		z0 := -(lAx*math.Sin(alpha) + reach)
		for x := x0 + step/2; x < x1; x += step {
			for y := y0 + step/2; y < y1; y += step {
				for z := z0 + step/2; z < 0; z += step {
					for i := range nb {
						yi := y - (float64(i)-float64(nb-1)/2)*s
						// from the apex
						vx, vy, vz := x-lAx*ax, yi, z-lAx*az
						tt := -(vx*ax + vz*az) // distance from the apex toward the head
						if tt < 0 || tt > lAx {
							continue
						}
						px, pz := vx+tt*ax, vz+tt*az
						if px*px+vy*vy+pz*pz <= tt*tt*tp*tp {
							count++
							break
						}
					}
				}
			}
		}
		vol := float64(count) * step * step * step
		near("rock cone volume [D]", value(r, "Vol"), vol, 0.01)
		near("rock cone along the bars, W sin α [D]", r.Capacity, 25e3*vol*math.Sin(alpha), 0.01)
		if fs := 25e3 * vol * math.Sin(alpha) / r.Demand; fs < 2 {
			t.Errorf("rock cone: factor of safety by hand %.3f below 2", fs)
		}
	}

	// 6. The left footing in stiff clay, undrained, Vesić (1975) as
	// collected in Bowles, Foundation Analysis and Design, 5th ed., Table
	// 4-5: q_ult = c_u N_c s_c d_c i_c g_c + q + ½γB'N_γ, N_c = π + 2,
	// s_c = 1 + 0.2B'/L' (EN 1997-1 D.3), d_c = 1 + 0.4D/B (B the footing's
	// width, Bowles), i_c = 1 − mH/(A'c_u N_c), g_c = 1 − 2β/(π + 2) and
	// N_γ = −2 sin β on ground falling at β; global factor 3.
	{
		r := governing("footing.bearing", "left footing")
		const cu, gam, d, width = 60e3, 19e3, 1.5, 3.0
		bp, lp := value(r, "B'"), value(r, "L'")
		hh := math.Hypot(value(r, "H"), value(r, "H_y"))
		m := (2 + bp/lp) / (1 + bp/lp) // the load along B'
		if th := value(r, "θ"); math.Abs(th-math.Pi/2) > 1e-9 {
			t.Fatalf("θ %v: the hand check takes the load along B'", th)
		}
		beta := value(r, "β_g")
		nc := math.Pi + 2
		sc := 1 + 0.2*bp/lp
		dc := 1 + 0.4*d/width
		ic := 1 - m*hh/(bp*lp*cu*nc)
		gc := 1 - 2*beta/nc
		qult := cu*nc*sc*dc*ic*gc + gam*d + 0.5*gam*bp*(-2*math.Sin(beta))
		demand := value(r, "N") / (bp * lp)
		near("left footing g_c undrained (Vesić) [R]", gc, 1-2*15.44*math.Pi/180/nc, 0.001)
		near("left footing undrained utilisation [D]", value(r, "U_un"), demand/(qult/3), 0.003)
		if r.Ratio < demand/(qult/3) {
			t.Errorf("left footing: ratio %.4g below the undrained utilisation by hand %.4g", r.Ratio, demand/(qult/3))
		}
	}
}
