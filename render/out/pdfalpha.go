package out

import (
	"image"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/pdf"
)

// pdfRenderer works around how canvas's PDF writer tracks opacity: fill
// and stroke share one opacity state, a colour equal to the last one is
// not re-sent, and an image resets the tracked opacity inside a q/Q pair
// that the viewer undoes. After anything translucent the writer may
// believe the opacity is what it is not, and later opaque drawing comes
// out faded. So after each translucent call the state is put back to
// opaque black fill and stroke, by degenerate paths that paint nothing
// (ISO 32000-1, 8.5.3.2: a zero-length subpath with butt caps is not
// painted), which the writer and the viewer then agree on.
type pdfRenderer struct {
	*pdf.PDF
	paths *pdfPaths // path data written for canvas (nil: canvas writes it)
	jpegs *pdfJPEGs // JPEGs passed through (nil: canvas encodes them)
}

var offPage = func() *canvas.Path {
	p := &canvas.Path{}
	p.MoveTo(-10, -10)
	p.LineTo(-10, -10)
	return p
}()

func (r pdfRenderer) reset() {
	fill := canvas.DefaultStyle
	r.PDF.RenderPath(offPage, fill, canvas.Identity)
	stroke := canvas.DefaultStyle
	stroke.Fill = canvas.Paint{}
	stroke.Stroke = canvas.Paint{Color: canvas.Black}
	stroke.StrokeWidth = 0.1
	r.PDF.RenderPath(offPage, stroke, canvas.Identity)
}

func translucent(p canvas.Paint) bool { return p.IsColor() && p.Color.A < 255 && p.Color.A > 0 }

func (r pdfRenderer) RenderPath(path *canvas.Path, style canvas.Style, m canvas.Matrix) {
	if r.paths != nil && m == canvas.Identity && plainStyle(style) && !path.Empty() {
		r.PDF.RenderPath(r.paths.standIn(path), style, m)
	} else {
		r.PDF.RenderPath(path, style, m)
	}
	if (style.HasFill() && translucent(style.Fill)) || (style.HasStroke() && translucent(style.Stroke)) {
		r.reset()
	}
}

func (r pdfRenderer) RenderText(text *canvas.Text, m canvas.Matrix) {
	r.PDF.RenderText(text, m)
	seeThrough := false
	text.WalkSpans(func(_, _ float64, span canvas.TextSpan) {
		if span.Face != nil && translucent(span.Face.Fill) {
			seeThrough = true
		}
	})
	if seeThrough {
		r.reset()
	}
}

func (r pdfRenderer) RenderImage(img image.Image, m canvas.Matrix) { r.PDF.RenderImage(img, m) }
