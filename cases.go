package sagspan

import (
	"github.com/sagspan/sagspan/units"
)

// Crowd says where the crowd stands on the walkway.
type Crowd int

// Crowd patterns.
const (
	NoCrowd   Crowd = iota // no pedestrians
	FullSpan               // crowd over the whole span
	LeftHalf               // crowd over the left half of the span
	RightHalf              // crowd over the right half of the span
)

// LoadCase is one load case or combination: which actions are present, at
// what temperature, and with which load factors (all 1 on the allowable
// basis).
type LoadCase struct {
	Name        string
	Crowd       Crowd
	Wind        bool
	Temperature units.Temperature
	// GammaG, GammaQ and GammaW multiply the permanent load, the crowd and
	// the wind (GammaW already includes a combination factor where wind
	// accompanies the crowd).
	GammaG, GammaQ, GammaW float64
	// Flood puts the water at the design flood (site.flood_elevation) at
	// every footing and anchor it reaches: buoyancy, submerged soil and
	// effective stresses in the ground checks.
	Flood bool
}

// Default load factors of the partial-factor basis. The allowable basis
// takes its factors of safety from the checking packages' defaults
// (cable.DefaultGlobalFactor, foundation.Basis), each documented there.
const (
	// Partial-factor basis: EN 1990 Table A2.4(B) (from memory, as in
	// EN 1997-1 Annex A set A1): γG 1.35 unfavourable, γQ 1.5.
	defaultGammaG = 1.35
	defaultGammaQ = 1.5
)

func (b Bridge) partial() bool { return b.Basis.Method == "partial" }

// Cases returns the load cases the bridge is checked for, in report order:
//
//	permanent                     G                 reference temperature
//	crowd, full span              G + Q             reference
//	crowd, left half              G + Q on left     reference
//	crowd, right half             G + Q on right    reference
//	wind                          G + W             reference
//	wind with crowd               G + Q + ψ0 W      reference
//	cold with crowd               G + Q             coldest
//	hot with crowd                G + Q             hottest
//	cold, permanent               G                 coldest
//	hot, permanent                G                 hottest
//	flood with crowd              G + Q             reference, water at the design flood
//
// On the partial-factor basis G, Q and W carry γG, γQ and γQ (γQ ψ0 for
// wind accompanying the crowd). The wind cases are left out when no wind is
// given.
func (b Bridge) Cases() []LoadCase {
	gG, gQ := 1.0, 1.0
	if b.partial() {
		gG = orDefault(b.Basis.GammaG, defaultGammaG)
		gQ = orDefault(b.Basis.GammaQ, defaultGammaQ)
	}
	psi := orDefault(b.Loads.WindWithCrowd, defaultWindWithCrowd)
	c := b.Climate
	cases := []LoadCase{
		{Name: "permanent", Temperature: c.Reference},
		{Name: "crowd, full span", Crowd: FullSpan, Temperature: c.Reference},
		{Name: "crowd, left half", Crowd: LeftHalf, Temperature: c.Reference},
		{Name: "crowd, right half", Crowd: RightHalf, Temperature: c.Reference},
	}
	if b.wind() > 0 {
		cases = append(cases,
			LoadCase{Name: "wind", Wind: true, Temperature: c.Reference, GammaW: gQ},
			LoadCase{Name: "wind with crowd", Crowd: FullSpan, Wind: true, Temperature: c.Reference, GammaW: gQ * psi},
		)
	}
	cases = append(cases,
		LoadCase{Name: "cold with crowd", Crowd: FullSpan, Temperature: c.Coldest},
		LoadCase{Name: "hot with crowd", Crowd: FullSpan, Temperature: c.Hottest},
		LoadCase{Name: "cold, permanent", Temperature: c.Coldest},
		LoadCase{Name: "hot, permanent", Temperature: c.Hottest},
	)
	// The design flood at the foundations, with a crowd watching it from
	// the walkway (common practice: people gather on a bridge in a flood).
	cases = append(cases, LoadCase{Name: "flood with crowd", Crowd: FullSpan, Temperature: c.Reference, Flood: true})
	for i := range cases {
		cases[i].GammaG = gG
		if cases[i].Crowd != NoCrowd {
			cases[i].GammaQ = gQ
		}
	}
	return cases
}

// characteristic returns the case with every load factor set to 1 (0 for
// absent actions): the serviceability form used for clearance, drawing and
// the permanent/variable split of anchor pulls.
func (lc LoadCase) characteristic(psi float64) LoadCase {
	lc.GammaG = 1
	if lc.Crowd != NoCrowd {
		lc.GammaQ = 1
	}
	if lc.Wind {
		lc.GammaW = 1
		if lc.Crowd != NoCrowd {
			lc.GammaW = psi
		}
	}
	return lc
}
