package out

import (
	"image"
	"slices"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/rasterizer"
)

// pngRenderer is canvas's rasterizer fed right to left. The scanner
// under it keeps each pixel row's cells in a list sorted by x and walks
// that list from its left end for every cell a path adds, so a path whose
// parts lie side by side on a row (a line of text, a pattern's marks
// across a column) costs the square of its length: most of a deep well's
// PNG time. Handed its subpaths rightmost first, each new cell lands at
// the list's head. The scanner's cells sum integers, so the order changes
// no pixel; strokes are outlined here as canvas would, to be ordered too.
type pngRenderer struct {
	*rasterizer.Rasterizer
	res   canvas.Resolution
	order []subpathAt // reused between paths
	rings map[[2]float64]*canvas.Path

	img    *image.RGBA
	masks  *glyphMasks   // the font set's, for text (rasterglyph.go); nil: outlines
	placed []placedGlyph // reused between texts
	sum    []uint16      // reused between texts
}

type subpathAt struct {
	x0 float64
	p  *canvas.Path
}

func newPNGRenderer(img *image.RGBA, res canvas.Resolution) *pngRenderer {
	return &pngRenderer{Rasterizer: rasterizer.FromImage(img, res, canvas.DefaultColorSpace), res: res, img: img}
}

// RenderPath draws path's fill, then its stroke, as canvas's rasterizer
// does, each as one filled path in right-to-left order.
func (r *pngRenderer) RenderPath(path *canvas.Path, style canvas.Style, m canvas.Matrix) {
	r.renderPath(path, style, m, nil, nil)
}

// renderPath is RenderPath with more area: moreFill (placed) is filled
// with path, and moreStroke (placed, the outline of more strokes in the
// same colour, see rasterStrokeArea) joins path's stroke outline, so
// that each paint covers its pixels once.
func (r *pngRenderer) renderPath(path *canvas.Path, style canvas.Style, m canvas.Matrix, moreFill, moreStroke *canvas.Path) {
	if style.HasFill() {
		if !style.Fill.IsColor() {
			r.Rasterizer.RenderPath(path, fillOnly(style), m)
		} else if fill := path.Copy().Transform(m).Append(moreFill); !fill.Empty() {
			r.fill(fill, style.Fill)
		}
	}
	if style.HasStroke() {
		if !style.Stroke.IsColor() {
			s := style
			s.Fill = canvas.Paint{}
			r.Rasterizer.RenderPath(path, s, m)
			return
		}
		// The same outline canvas's rasterizer strokes: dashed, then
		// stroked to a tenth of a pixel.
		stroke := path
		if len(style.Dashes) > 0 {
			offset, d := canvas.ScaleDash(style.StrokeWidth, style.DashOffset, style.Dashes)
			stroke = stroke.Dash(offset, d...)
		}
		stroke = stroke.Stroke(style.StrokeWidth, style.StrokeCapper, style.StrokeJoiner, canvas.PixelTolerance/r.res.DPMM())
		if stroke = stroke.Transform(m).Append(moreStroke); !stroke.Empty() {
			r.fill(stroke, style.Stroke)
		}
	}
}

// RenderText draws text from glyph masks (rasterglyph.go) or, where it
// cannot, as glyph outlines through RenderPath above.
func (r *pngRenderer) RenderText(text *canvas.Text, m canvas.Matrix) {
	if !r.maskedText(text, m) {
		text.RenderAsPath(r, m, r.res)
	}
}

// fill hands p (already placed) to the scanner, rightmost subpath first.
func (r *pngRenderer) fill(p *canvas.Path, paint canvas.Paint) {
	st := canvas.DefaultStyle
	st.Fill = paint
	subs := p.Split()
	if len(subs) > 1 {
		order := r.order[:0]
		for _, s := range subs {
			order = append(order, subpathAt{x0: s.FastBounds().X0, p: s})
		}
		// Stable, so that equal starts keep their order and output repeats.
		slices.SortStableFunc(order, func(a, b subpathAt) int {
			switch {
			case a.x0 > b.x0:
				return -1
			case a.x0 < b.x0:
				return 1
			}
			return 0
		})
		sorted := &canvas.Path{}
		for _, s := range order {
			sorted = sorted.Append(s.p)
		}
		clear(order)
		r.order = order[:0]
		p = sorted
	}
	r.Rasterizer.RenderPath(p, st, canvas.Identity)
}

func fillOnly(s canvas.Style) canvas.Style {
	s.Stroke = canvas.Paint{}
	return s
}
