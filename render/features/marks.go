package features

import (
	"math"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// Marks of our own for each kind of feature, shared by the sheet's dip
// track, the net and their legends. A water-bearing feature (by kind or
// by a measured inflow) is drawn in water blue, filled.
var (
	markInk   = draw.RGB(0x22, 0x22, 0x22)
	waterBlue = draw.RGB(0x00, 0x72, 0xB2) // Okabe and Ito's blue, as the sheet's water marks
	veinGrey  = draw.RGB(0x99, 0x99, 0x99)
)

// Mark draws one feature's symbol centred at a point, s points across.
type Mark struct {
	Key   string // legend key: the kind, or "water-bearing"
	Label string
	Draw  func(at draw.Point, s float64) []draw.Item
}

// MarkFor is the mark of a feature.
func MarkFor(f *schema.Feature) Mark {
	if f.IsWaterBearing() {
		return Mark{Key: "water-bearing", Label: "Water-bearing feature (by kind or measured inflow)", Draw: func(at draw.Point, s float64) []draw.Item {
			return []draw.Item{draw.Circle{Style: draw.Style{Stroke: waterBlue, StrokeWidth: 0.8, Fill: waterBlue}, Center: at, R: s / 2}}
		}}
	}
	return kindMark(f.Kind)
}

func kindMark(k schema.FeatureKind) Mark {
	st := draw.Style{Stroke: markInk, StrokeWidth: 0.7, Fill: draw.White}
	poly := func(pts ...[2]float64) func(at draw.Point, s float64) []draw.Item {
		return func(at draw.Point, s float64) []draw.Item {
			p := make([]draw.Point, len(pts))
			for i, q := range pts {
				p[i] = draw.Point{X: at.X + q[0]*s/2, Y: at.Y + q[1]*s/2}
			}
			return []draw.Item{draw.Shape{Style: st, Points: p, Closed: true}}
		}
	}
	m := Mark{Key: string(k), Label: upperFirst(k.Label())}
	switch k {
	case schema.OpenFracture:
		m.Draw = func(at draw.Point, s float64) []draw.Item {
			return []draw.Item{draw.Circle{Style: st, Center: at, R: s / 2}, draw.Circle{Style: draw.Style{Fill: markInk}, Center: at, R: s / 6}}
		}
	case schema.Bedding:
		m.Draw = poly([2]float64{-0.85, -0.85}, [2]float64{0.85, -0.85}, [2]float64{0.85, 0.85}, [2]float64{-0.85, 0.85})
	case schema.Foliation:
		m.Draw = poly([2]float64{0, -1.1}, [2]float64{1.1, 0}, [2]float64{0, 1.1}, [2]float64{-1.1, 0})
	case schema.Vein:
		st.Fill = veinGrey
		m.Draw = poly([2]float64{0, -1}, [2]float64{1, 0.8}, [2]float64{-1, 0.8})
	case schema.Contact:
		m.Draw = poly([2]float64{-1, -0.8}, [2]float64{1, -0.8}, [2]float64{0, 1})
	case schema.Cavity:
		m.Draw = func(at draw.Point, s float64) []draw.Item {
			return []draw.Item{draw.Circle{Style: draw.Style{Stroke: markInk, StrokeWidth: 0.7, Fill: draw.RGB(0x55, 0x55, 0x55)}, Center: at, R: s / 2}}
		}
	case schema.BrokenZone:
		m.Draw = func(at draw.Point, s float64) []draw.Item {
			h := s / 2 * math.Sqrt2 / 1.2
			x := draw.Style{Stroke: markInk, StrokeWidth: 0.9}
			return []draw.Item{
				draw.Shape{Style: x, Points: []draw.Point{{X: at.X - h, Y: at.Y - h}, {X: at.X + h, Y: at.Y + h}}},
				draw.Shape{Style: x, Points: []draw.Point{{X: at.X - h, Y: at.Y + h}, {X: at.X + h, Y: at.Y - h}}},
			}
		}
	default: // fracture
		m.Draw = func(at draw.Point, s float64) []draw.Item {
			return []draw.Item{draw.Circle{Style: st, Center: at, R: s / 2}}
		}
	}
	return m
}

// LegendOrder sorts marks as the kinds are listed, water-bearing last.
func LegendOrder(key string) int {
	for i, k := range schema.FeatureKinds {
		if string(k) == key {
			return i
		}
	}
	return len(schema.FeatureKinds)
}

func upperFirst(s string) string {
	if s == "" {
		return s
	}
	return strings.ToUpper(s[:1]) + s[1:]
}
