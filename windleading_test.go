package sagspan

import (
	"testing"

	"github.com/sagspan/sagspan/check"
)

// windLeadingBridge is an invented two-rope span whose column is checked
// hardest across the bridge when the wind leads and the crowd accompanies
// it: a combination EN 1990 requires beside the one the crowd leads.
const windLeadingBridge = `{
 "name": "Two-rope span at an invented river (wind-leading test)",
 "site": {
  "span": "60 m",
  "rise": "0 m",
  "left_saddle_elevation": "200 m",
  "flood_elevation": "none",
  "freeboard": "1 m"
 },
 "climate": {
  "reference": "15 C",
  "coldest": "-15 C",
  "hottest": "45 C",
  "wind_speed": "25 m/s"
 },
 "walkway": {
  "width": "1.2 m",
  "depth": "0.3 m",
  "dead_load": "1.2 kN/m"
 },
 "ropes": [
  {
   "name": "walkway ropes",
   "role": "walkway",
   "count": 2,
   "rope": {
    "construction": "6x36-IWRC",
    "diameter": "52 mm",
    "grade": "1770 MPa"
   },
   "sag": "3 m"
  }
 ],
 "banks": {
  "left": {
   "tower": {
    "height": "2.4 m",
    "depth": "0.9 m",
    "width": "1.2 m",
    "saddle": {
     "kind": "fixed",
     "groove": "free"
    },
    "section": {
     "concrete": "30 MPa",
     "steel": "500 MPa",
     "bars": 8,
     "bar_diameter": "25 mm",
     "cover": "50 mm"
    },
    "footing": {
     "length": "3.0 m",
     "width": "3.0 m",
     "thickness": "0.8 m",
     "depth": "1.5 m"
    }
   },
   "backstay": {
    "horizontal": "12 m",
    "drop": "4 m"
   },
   "anchor": {
    "type": "block",
    "length": "5 m",
    "width": "5 m",
    "height": "3 m",
    "depth": "3.5 m"
   },
   "soil": {
    "preset": "dense sand"
   }
  },
  "right": {
   "tower": {
    "height": "2.4 m",
    "depth": "0.9 m",
    "width": "1.2 m",
    "saddle": {
     "kind": "fixed",
     "groove": "free"
    },
    "section": {
     "concrete": "30 MPa",
     "steel": "500 MPa",
     "bars": 8,
     "bar_diameter": "25 mm",
     "cover": "50 mm"
    },
    "footing": {
     "length": "3.0 m",
     "width": "3.0 m",
     "thickness": "0.8 m",
     "depth": "1.5 m"
    }
   },
   "backstay": {
    "horizontal": "12 m",
    "drop": "4 m"
   },
   "anchor": {
    "type": "block",
    "length": "5 m",
    "width": "5 m",
    "height": "3 m",
    "depth": "3.5 m"
   },
   "soil": {
    "preset": "dense sand"
   }
  }
 }
}`

// TestWindLeadingWithCrowd checks the EN 1990 fundamental combination
// with the wind leading and the crowd accompanying it (eq. 6.10):
//
//	G + Q_w + ψ0 Q_crowd,  ψ0 = 0.4 for the pedestrian group gr1
//
// (EN 1990 Annex A2 Table A2.2, read in the final PT draft of prAnnex A2,
// 2003, for footbridges: gr1 ψ0 0.40, wind ψ0 0.3), on the partial basis
// with γQ 1.5 on both. The case must be among the defaults with those
// factors, and on this bridge it must give the column's biaxial check a
// higher utilisation than any other case (it was missing: the crowd-led
// case has less wind, the wind-alone case less axial force).
func TestWindLeadingWithCrowd(t *testing.T) {
	b, err := Parse([]byte(windLeadingBridge))
	if err != nil {
		t.Fatal(err)
	}
	for _, method := range []string{"allowable", "partial"} {
		b.Basis.Method = method
		var lc *LoadCase
		for _, c := range b.Cases() {
			if c.Name == caseWindLeading {
				lc = &c
			}
		}
		if lc == nil {
			t.Fatalf("%s: no case %q among the defaults", method, caseWindLeading)
		}
		gq := 1.0
		if method == "partial" {
			gq = 1.5
		}
		if lc.Wind != 1 || lc.CrowdFactor != 0.4 || lc.Crowd.Length() != b.Site.Span || lc.GammaQ != gq || lc.GammaW != gq {
			t.Errorf("%s: case %+v, want wind 1, crowd ψ0 0.4 on the whole span, γQ = γW = %g", method, *lc, gq)
		}
		a, err := Check(b, &Options{SkipComfort: true})
		if err != nil {
			t.Fatal(err)
		}
		var worst check.Result
		for _, r := range a.Report.Results {
			if r.ID == "tower.column_biaxial" && r.Element == "left tower" && r.Ratio > worst.Ratio {
				worst = r
			}
		}
		if worst.Case != caseWindLeading {
			t.Errorf("%s: the left column's biaxial check governs under %q (%.4f), want %q", method, worst.Case, worst.Ratio, caseWindLeading)
		}
	}
}
