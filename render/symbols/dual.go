package symbols

import (
	"math"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
)

// dualBand is the height of each band of a dual soil symbol, in points.
const dualBand = 5.0

// dual is the symbol of an ASTM D2487 dual group such as SP-SM: bands of
// the first group's pattern alternate with the second's, first on top, on
// a band grid fixed to the page. It is told apart from both of its
// groups, and each band reads as the group it shows.
func dual(a, b Symbol) Symbol {
	s := Symbol{
		ID:   "soil:" + a.Code + "-" + b.Code,
		Code: a.Code + "-" + b.Code,
		Name: a.Name + " / " + strings.ToLower(b.Name[:1]) + b.Name[1:],
		Kind: Lithology,
		Fill: a.Fill,
	}
	s.paint = func(r draw.Rect) []draw.Item {
		var items []draw.Item
		for k := int(math.Floor(r.Y / dualBand)); float64(k)*dualBand < r.Bottom(); k++ {
			band := draw.Rect{X: r.X, Y: float64(k) * dualBand, W: r.W, H: dualBand}
			part := intersect(r, band)
			if part.H <= 0 {
				continue
			}
			src := a
			if k&1 != 0 {
				src = b
			}
			items = append(items, src.Paint(part)...)
		}
		return items
	}
	return s
}

func intersect(a, b draw.Rect) draw.Rect {
	x0, y0 := math.Max(a.X, b.X), math.Max(a.Y, b.Y)
	x1, y1 := math.Min(a.Right(), b.Right()), math.Min(a.Bottom(), b.Bottom())
	return draw.Rect{X: x0, Y: y0, W: math.Max(0, x1-x0), H: math.Max(0, y1-y0)}
}
