package sheet

import (
		"math"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// symbol is what the sheet needs of a pattern: a key the legend
// deduplicates on, the legend's words, and a painter for a region.
type symbol struct {
	key    string
	label  string
	order  int // legend order: lithology, fills, construction
	paint  func(r draw.Rect) []draw.Item
	swatch func(r draw.Rect) []draw.Item
}

// Provisional patterns, until the shared symbol table is wired in: a
// hatch per class, told apart by angle and spacing.
func materialSymbol(m schema.Material) symbol {
	i := 0
	for k, x := range schema.Materials {
		if x == m {
			i = k
		}
	}
	angle := []float64{0, 0, 45, 135, 90, 30, 150, 60, 120, 15, 165}[i%11]
	space := []float64{3, 2, 4, 4, 3, 5, 5, 3.5, 3.5, 4.5, 4.5}[i%11]
	label := strings.ReplaceAll(string(m), "-", " ")
	label = strings.ToUpper(label[:1]) + label[1:]
	p := func(r draw.Rect) []draw.Item { return hatch(r, angle, space, draw.White) }
	return symbol{key: "fill:" + string(m), label: label, order: 100 + i, paint: p, swatch: p}
}

func layerSymbol(ly schema.Layer) symbol {
	name := ly.USCS
	if name == "" {
		name = strings.ToLower(ly.Rock)
	}
	if name == "" {
		name = "unclassified"
	}
	h := 0
	for _, c := range name {
		h = h*31 + int(c)
	}
	if h < 0 {
		h = -h
	}
	angle := float64(h%12) * 15
	space := 2.5 + float64(h%5)
	p := func(r draw.Rect) []draw.Item { return hatch(r, angle, space, draw.RGB(245, 240, 225)) }
	label := name
	if ly.USCS != "" {
		label = ly.USCS + " soil"
	}
	return symbol{key: "lith:" + name, label: label, order: 10, paint: p, swatch: p}
}

// hatch fills r with parallel lines at angle degrees, space points apart.
func hatch(r draw.Rect, angle, space float64, ground draw.Color) []draw.Item {
	items := []draw.Item{draw.Box{Style: draw.Style{Fill: ground}, Rect: r}}
	var lines []draw.Item
	a := angle * math.Pi / 180
	dx, dy := math.Cos(a), math.Sin(a)
	diag := math.Hypot(r.W, r.H)
	cx, cy := r.X+r.W/2, r.Y+r.H/2
	for o := -diag; o <= diag; o += space {
		px, py := cx-dy*o, cy+dx*o
		lines = append(lines, draw.Shape{Style: draw.Style{Stroke: grey, StrokeWidth: 0.4},
			Points: []draw.Point{{X: px - dx*diag, Y: py - dy*diag}, {X: px + dx*diag, Y: py + dy*diag}}})
	}
	return append(items, draw.Clip{Rect: r, Items: lines})
}
