package out

import (
	"bytes"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/svg"
)

// svgRenderer is canvas's SVG writer with the path elements written
// here, the same bytes canvas writes (see pathnum.go), into the same
// buffer between canvas's own elements. Paths it does not paint alike
// (gradients, transforms, joins SVG lacks) still go to canvas.
type svgRenderer struct {
	*svg.SVG
	w    *bytes.Buffer
	flip canvas.Matrix // canvas's placing: y down from the page's top
}

func newSVGRenderer(w *bytes.Buffer, width, height float64, opts *svg.Options) *svgRenderer {
	return &svgRenderer{SVG: svg.New(w, width, height, opts), w: w, flip: canvas.Identity.ReflectYAbout(height / 2.0)}
}

// plainStyle says whether s is painted the way our path writers write:
// colours or nothing, the non-zero rule, butt caps and mitred joins
// bevelled past their limit (the drawing model's only kind).
func plainStyle(s canvas.Style) bool {
	if (s.HasFill() && !s.Fill.IsColor()) || (s.HasStroke() && !s.Stroke.IsColor()) || s.FillRule != canvas.NonZero {
		return false
	}
	if !s.HasStroke() {
		return true
	}
	miter, ok := s.StrokeJoiner.(canvas.MiterJoiner)
	if !ok || miter.Limit != 4 {
		return false
	}
	if _, ok := miter.GapJoiner.(canvas.BevelJoiner); !ok {
		return false
	}
	_, butt := s.StrokeCapper.(canvas.ButtCapper)
	return butt
}

// RenderPath writes path as canvas's SVG writer does: the element, its
// fill, and its stroke as a style attribute.
func (r *svgRenderer) RenderPath(path *canvas.Path, style canvas.Style, m canvas.Matrix) {
	if m != canvas.Identity || !plainStyle(style) {
		r.SVG.RenderPath(path, style, m)
		return
	}
	placed := path.Copy().Transform(r.flip)
	b := append(r.w.AvailableBuffer(), `<path d="`...)
	b = appendSVGPathCompact(b, placed)
	if !style.HasStroke() {
		if !style.HasFill() {
			b = append(b, `" fill="none`...)
		} else if style.Fill.Color != canvas.Black {
			b = append(b, `" fill="`...)
			b = append(b, canvas.CSSColor(style.Fill.Color).String()...)
		}
		r.w.Write(append(b, `"/>`...))
		return
	}
	b = append(b, `" style="`...)
	if !style.HasFill() {
		b = append(b, "fill:none;"...)
	} else if style.Fill.Color != canvas.Black {
		b = append(b, "fill:"...)
		b = append(b, canvas.CSSColor(style.Fill.Color).String()...)
		b = append(b, ';')
	}
	b = append(b, "stroke:"...)
	b = append(b, canvas.CSSColor(style.Stroke.Color).String()...)
	if style.StrokeWidth != 1.0 {
		b = append(b, ";stroke-width:"...)
		b = appendCanvasDec(b, style.StrokeWidth)
	}
	if style.IsDashed() {
		offset, dashes := canvas.ScaleDash(style.StrokeWidth, style.DashOffset, style.Dashes)
		b = append(b, ";stroke-dasharray:"...)
		for i, d := range dashes {
			if i > 0 {
				b = append(b, ' ')
			}
			b = appendCanvasDec(b, d)
		}
		if offset != 0.0 {
			b = append(b, ";stroke-dashoffset:"...)
			b = appendCanvasDec(b, offset)
		}
	}
	r.w.Write(append(b, `"/>`...))
}
