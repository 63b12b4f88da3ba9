package sheet

import (
	"fmt"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// Drawn minimum wall thicknesses: a 2-in Sch 40 wall at 1:10 would be a
// hairline, so walls are thickened inward (outside diameters, and so the
// annulus, stay to scale).
const (
	minWall       = 1.6
	minScreenWall = 3.2
)

// well paints the well column of one sheet, clipped to it, and the
// wall-feature column beside it: every part from the hole's ground to
// the water levels, in paint order (part.go).
func (p *painter) well() []draw.Item {
	items := p.paintLayers(layerHole, layerWater)
	y0, y1 := p.clipY()
	col := p.l.cols.well
	return append([]draw.Item{draw.Clip{Rect: draw.Rect{X: col.X, Y: y0, W: col.W, H: y1 - y0}, Items: items}}, p.paintLayers(layerFeatures, layerFeatures)...)
}

func pathOr(path, kind string, i int) string {
	if path != "" {
		return path
	}
	return fmt.Sprintf("%s[%d]", kind, i)
}

// holeAt is the borehole diameter at a depth, 0 if none.
func (l *layout) holeAt(z schema.Length) schema.Diameter { return l.secs.At(z).Hole }
