package out

import (
	"bytes"
	"fmt"
	"image"
	"image/color"
	stddraw "image/draw"
	_ "image/jpeg" // Image items may hold JPEG bytes
	_ "image/png"
	"math"
	"strconv"
	"strings"
	"unicode"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

const (
	mmPerPt   = 25.4 / 72
	hairline  = 0.25 // points, for a stroke colour with no width (see draw.Style)
	maxPoints = 1e6  // a page coordinate beyond this (≈ 350 m) is a layout bug
)

// painter translates one page's items into calls on a canvas renderer.
type painter struct {
	r         canvas.Renderer
	height    float64 // page height, points
	pageWidth float64
	fonts     *fontSet
	textAs    TextMode
	patterns  patternPainter
	err       error
}

// paintPage draws every item of p on r, text as text says and pattern
// fills through pp; it reports the first item that cannot be drawn (a
// non-finite number, undecodable image bytes) and draws the rest.
func paintPage(r canvas.Renderer, p *draw.Page, fonts *fontSet, text TextMode, pp patternPainter) error {
	pt := &painter{r: r, height: p.Height, pageWidth: p.Width, fonts: fonts, textAs: text, patterns: pp}
	pt.items(p.Items, nil, "")
	return pt.err
}

// rasterLine fills a plain stroked segment (butt caps, no dashes, no
// fill) on a raster as the rectangle its stroke covers. That is exactly
// the outline canvas would stroke, without its general stroker's settling
// pass (about a seventh of a deep well's PNG time, most sheets' lines
// being single segments). It reports whether it drew the line.
func (p *painter) rasterLine(s draw.Shape) bool {
	if _, ok := p.r.(*pngRenderer); !ok {
		return false
	}
	st, fill, stroke := p.style(s.Style)
	if fill || !stroke || len(st.Dashes) > 0 {
		return false
	}
	a, b := p.pos(s.Points[0].X, s.Points[0].Y), p.pos(s.Points[1].X, s.Points[1].Y)
	q := segmentOutline(a, b, st.StrokeWidth/2) // empty for a zero-length segment, as with a butt cap
	if q.Empty() {
		return true
	}
	fs := canvas.DefaultStyle
	fs.Fill = st.Stroke
	fs.Stroke = canvas.Paint{}
	p.r.RenderPath(q, fs, canvas.Identity)
	return true
}

func (p *painter) fail(path string, format string, args ...any) {
	if p.err == nil {
		p.err = fmt.Errorf("item %s: %s", path, fmt.Sprintf(format, args...))
	}
}

// items draws a list under an optional clip rectangle (in points).
func (p *painter) items(items []draw.Item, clip *draw.Rect, prefix string) {
	for i, it := range items {
		path := strconv.Itoa(i)
		if prefix != "" {
			path = prefix + "." + path
		}
		switch it := it.(type) {
		case draw.Box:
			if !finite(it.X, it.Y, it.W, it.H) {
				p.fail(path, "box %q has a non-finite coordinate", it.Role)
				continue
			}
			r := normRect(it.Rect)
			p.path(rectPath(p.rect(r)), it.Style, clip, true)
		case draw.Shape:
			if len(it.Points) < 2 {
				continue
			}
			cp := &canvas.Path{}
			for j, pt := range it.Points {
				if !finite(pt.X, pt.Y) {
					p.fail(path, "shape %q point %d is not finite", it.Role, j)
					cp = nil
					break
				}
				q := p.pos(pt.X, pt.Y)
				if j == 0 {
					cp.MoveTo(q.X, q.Y)
				} else {
					cp.LineTo(q.X, q.Y)
				}
			}
			if cp == nil {
				continue
			}
			if it.Closed {
				cp.Close()
			}
			if len(it.Points) == 2 && !it.Closed && clip == nil && p.rasterLine(it) {
				continue
			}
			p.path(cp, it.Style, clip, it.Closed || len(it.Points) > 2)
		case draw.Circle:
			if !finite(it.Center.X, it.Center.Y, it.R) {
				p.fail(path, "circle %q is not finite", it.Role)
				continue
			}
			if it.R <= 0 {
				continue
			}
			c := p.pos(it.Center.X, it.Center.Y)
			p.path(canvas.Circle(it.R*mmPerPt).Translate(c.X, c.Y), it.Style, clip, false)
		case draw.Path:
			p.compound(it, clip, path)
		case draw.Pattern:
			if !finite(it.X, it.Y, it.W, it.H) {
				p.fail(path, "pattern %q has a non-finite coordinate", it.Role)
				continue
			}
			r := normRect(it.Rect)
			if clip != nil {
				r = intersect(r, *clip)
			}
			// Only the part on the page can show, and no more than that
			// is ever drawn, however large the region.
			r = intersect(r, draw.Rect{W: p.pageWidth, H: p.height})
			if r.W <= 0 || r.H <= 0 {
				continue
			}
			p.patterns.fill(p, it.Tile, r, path)
		case draw.Text:
			if !finite(it.At.X, it.At.Y, it.Size, it.Rotate) {
				p.fail(path, "text %q is not finite", it.Role)
				continue
			}
			p.text(it, clip, path)
		case draw.Image:
			if !finite(it.X, it.Y, it.W, it.H) {
				p.fail(path, "image %q has a non-finite coordinate", it.Role)
				continue
			}
			p.image(it, clip, path)
		case draw.Clip:
			if !finite(it.X, it.Y, it.W, it.H) {
				p.fail(path, "clip has a non-finite coordinate")
				continue
			}
			r := normRect(it.Rect)
			if clip != nil {
				r = intersect(r, *clip)
			}
			if r.W <= 0 || r.H <= 0 {
				continue
			}
			p.items(it.Items, &r, path)
		case nil:
		default:
			p.fail(path, "unknown item type %T", it)
		}
	}
}

// pos converts a page point to canvas millimetres.
func (p *painter) pos(x, y float64) canvas.Point {
	return canvas.Point{X: x * mmPerPt, Y: (p.height - y) * mmPerPt}
}

// rect converts a page rectangle to canvas millimetres.
func (p *painter) rect(r draw.Rect) canvas.Rect {
	return canvas.Rect{
		X0: r.X * mmPerPt, Y0: (p.height - r.Bottom()) * mmPerPt,
		X1: r.Right() * mmPerPt, Y1: (p.height - r.Y) * mmPerPt,
	}
}

func rectPath(r canvas.Rect) *canvas.Path {
	return canvas.Rectangle(r.W(), r.H()).Translate(r.X0, r.Y0)
}

// path draws a filled and/or stroked outline. An open shape with a fill is
// filled as if closed, as SVG and PDF both do. joins says the outline has
// corners, where a miter reaches further than half the stroke width.
func (p *painter) path(cp *canvas.Path, s draw.Style, clip *draw.Rect, joins bool) {
	st, fill, stroke := p.style(s)
	if !fill && !stroke {
		return
	}
	if clip == nil {
		p.r.RenderPath(cp, st, canvas.Identity)
		return
	}
	p.clipped(cp, st, fill, stroke, clip, joins)
}

// style converts a draw style to canvas's, saying whether it fills and
// whether it strokes.
func (p *painter) style(s draw.Style) (st canvas.Style, fill, stroke bool) {
	fill = !s.Fill.None()
	stroke = !s.Stroke.None()
	st = canvas.DefaultStyle
	st.Fill = canvas.Paint{}
	if fill {
		st.Fill = canvas.Paint{Color: rgba(s.Fill)}
	}
	width := strokeWidth(s)
	if stroke {
		st.Stroke = canvas.Paint{Color: rgba(s.Stroke)}
		st.StrokeWidth = width * mmPerPt
		// canvas's renderers read a style's dashes in stroke widths
		// (each scales them by the width: canvas.ScaleDash).
		st.Dashes = dashes(s.Dash)
		for i := range st.Dashes {
			st.Dashes[i] /= st.StrokeWidth
		}
	}
	return st, fill, stroke
}

// strokeWidth is the width s strokes at, in points: a hairline where s
// gives none.
func strokeWidth(s draw.Style) float64 {
	if s.StrokeWidth <= 0 {
		return hairline
	}
	return s.StrokeWidth
}

// strokeOutline is the area st's stroke of cp paints: undashed (dashes
// only take parts of it), or cut into st's dashes when dashed says so.
func strokeOutline(cp *canvas.Path, st canvas.Style, dashed bool) *canvas.Path {
	if dashed && len(st.Dashes) > 0 {
		cp = cp.Dash(0, dashLengths(st)...)
	}
	return cp.Stroke(st.StrokeWidth, st.StrokeCapper, st.StrokeJoiner, canvas.Tolerance)
}

// fitsIn says whether outline lies within cr: then the clip cuts nothing.
func fitsIn(outline *canvas.Path, cr canvas.Rect) bool {
	return cr.Expand(edgeSlack).Contains(outline.FastBounds())
}

// clipped draws a path cut exactly to the clip rectangle.
func (p *painter) clipped(cp *canvas.Path, st canvas.Style, fill, stroke bool, clip *draw.Rect, joins bool) {
	cr := p.rect(*clip)
	// A stroke reaches half its width past the outline, and a miter up to
	// its limit (4) times that past a corner.
	reach := 0.0
	if stroke {
		reach = st.StrokeWidth / 2
		if joins {
			reach = 2 * st.StrokeWidth
		}
	}
	b := cp.FastBounds().Expand(reach)
	switch {
	case cr.Contains(b):
		p.r.RenderPath(cp, st, canvas.Identity)
		return
	case !cr.Overlaps(b):
		return
	}
	var outline *canvas.Path // the stroke's area, computed once
	if stroke {
		outline = strokeOutline(cp, st, false)
		if fitsIn(outline, cr) {
			// The reach above is a bound; the stroke itself stays inside,
			// so the path is drawn as a stroke, not as its cut outline.
			p.r.RenderPath(cp, st, canvas.Identity)
			return
		}
		if len(st.Dashes) > 0 {
			outline = strokeOutline(cp, st, true)
		}
	}
	if fill {
		fs := canvas.DefaultStyle
		fs.Fill = st.Fill
		area := cp
		if !cp.Closed() {
			area = cp.Copy()
			area.Close()
		}
		if part := clipToRect(area, cr); !part.Empty() {
			p.r.RenderPath(part, fs, canvas.Identity)
		}
	}
	if stroke {
		ss := canvas.DefaultStyle
		ss.Fill = st.Stroke
		if part := clipToRect(outline, cr); !part.Empty() {
			p.r.RenderPath(part, ss, canvas.Identity)
		}
	}
}

// dashLengths are st's dashes in canvas millimetres, for cutting a path
// into its dashes here.
func dashLengths(st canvas.Style) []float64 {
	_, d := canvas.ScaleDash(st.StrokeWidth, 0, st.Dashes)
	return d
}

// dashes converts a dash pattern to millimetres, dropping one that would
// draw nothing or never end (no positive length).
func dashes(d []float64) []float64 {
	d = validDash(d)
	if d == nil {
		return nil
	}
	out := make([]float64, len(d))
	for i, v := range d {
		out[i] = v * mmPerPt
	}
	return out
}

func (p *painter) text(t draw.Text, clip *draw.Rect, path string) {
	s := cleanText(t.S)
	if strings.TrimSpace(s) == "" || t.Size <= 0 {
		return
	}
	col := t.Color
	if col.None() {
		col = draw.Black
	}
	// The anchor shift uses the same measure layout used, so a centred or
	// right-aligned label lands where layout put it.
	w := draw.TextWidth(t.Font, t.Size, s)
	shift := 0.0
	switch t.Anchor {
	case draw.Middle:
		shift = -w / 2
	case draw.End:
		shift = -w
	}
	// Spaces at the ends go: SVG viewers drop them (xml:space default), so
	// a run that starts with one is moved by its width instead.
	if trimmed := strings.TrimLeft(s, " "); len(trimmed) < len(s) {
		lead := w - draw.TextWidth(t.Font, t.Size, trimmed)
		shift += lead
		w -= lead
		s = trimmed
	}
	if trimmed := strings.TrimRight(s, " "); len(trimmed) < len(s) {
		w = draw.TextWidth(t.Font, t.Size, trimmed)
		s = trimmed
	}
	at := p.pos(t.At.X, t.At.Y)
	m := canvas.Identity.Translate(at.X, at.Y).Rotate(t.Rotate).Translate(shift*mmPerPt, 0)

	var cut *canvas.Rect // the clip, where it cuts the text
	if clip != nil {
		asc, desc := draw.Ascent(t.Font, t.Size), draw.Descent(t.Font, t.Size)
		box := canvas.Rect{X0: 0, Y0: -desc * mmPerPt, X1: w * mmPerPt, Y1: asc * mmPerPt}.Transform(m)
		cr := p.rect(*clip)
		switch {
		case cr.Contains(box):
		case !cr.Overlaps(box):
			return
		default:
			// Cut glyph outlines: the visible part stays exact, at the cost
			// of this one label not being searchable text.
			cut = &cr
		}
	}
	if cut == nil && !p.textAs.outlines() {
		line, err := p.fonts.line(t.Font, t.Size, rgba(col), s)
		if err != nil {
			p.fail(path, "%v", err)
			return
		}
		p.r.RenderText(line, m)
		return
	}
	cf, err := p.fonts.font(t.Font)
	if err != nil {
		p.fail(path, "%v", err)
		return
	}
	outline, _, err := cf.Face(t.Size, rgba(col)).ToPath(s)
	if err != nil {
		p.fail(path, "text %q: %v", t.Role, err)
		return
	}
	outline = outline.Transform(m)
	if cut != nil {
		outline = clipToRect(outline, *cut)
	}
	if outline.Empty() {
		return
	}
	st := canvas.DefaultStyle
	st.Fill = canvas.Paint{Color: rgba(col)}
	p.r.RenderPath(outline, st, canvas.Identity)
}

// cleanText makes a one-line string: line and paragraph breaks and other
// control characters become spaces, since a Text is a single line.
func cleanText(s string) string {
	if !strings.ContainsFunc(s, isBreakOrControl) {
		return s
	}
	return strings.Map(func(r rune) rune {
		if isBreakOrControl(r) {
			return ' '
		}
		return r
	}, s)
}

func isBreakOrControl(r rune) bool {
	return unicode.IsControl(r) || r == '\u2028' || r == '\u2029'
}

func (p *painter) image(im draw.Image, clip *draw.Rect, path string) {
	r := normRect(im.Rect)
	if r.W <= 0 || r.H <= 0 {
		return
	}
	img, format, err := image.Decode(bytes.NewReader(im.Data))
	if err != nil {
		p.fail(path, "image %q: %v", im.Role, err)
		return
	}
	cut := false
	if clip != nil {
		v := intersect(r, *clip)
		if v.W <= 0 || v.H <= 0 {
			return
		}
		// An image that fills its clip exactly comes out of intersect a
		// rounding error smaller; cut, it would be enlarged for nothing.
		if !nearlySame(v, r) {
			img, r = cropImage(img, r, v)
			if img == nil {
				return
			}
			cut = true
		}
	}
	b := img.Bounds()
	if b.Empty() {
		return
	}
	bl := p.pos(r.X, r.Bottom())
	m := canvas.Identity.Translate(bl.X, bl.Y).Scale(r.W*mmPerPt/float64(b.Dx()), r.H*mmPerPt/float64(b.Dy()))
	if _, ok := p.r.(*svgRenderer); ok && !cut && (format == "png" || format == "jpeg") {
		// SVG embeds the image's own bytes: canvas would encode the
		// decoded pixels again as PNG, at length, to the same picture.
		img = canvas.Image{Image: img, Bytes: im.Data, Mimetype: "image/" + format}
	}
	if pr, ok := p.r.(pdfRenderer); ok && format == "jpeg" && !cut && pr.jpegs != nil {
		// The JPEG's own bytes, when a PDF reader decodes them as they
		// are: one component (gray) or three (YCbCr, as RGB).
		switch img.(type) {
		case *image.Gray, *image.YCbCr:
			_, gray := img.(*image.Gray)
			stand := pr.jpegs.standIn(im.Data, b.Dx(), b.Dy(), gray)
			p.r.RenderImage(stand, placeStandIn(m, b.Dx(), b.Dy()))
			return
		}
	}
	if pr, ok := p.r.(pdfRenderer); ok && format == "jpeg" {
		// A JPEG cut by its clip (or not gray or YCbCr) stays JPEG in
		// the PDF (DCTDecode) too: canvas encodes it again at its own
		// quality (75, finer than the layout's strips,
		// wallimage.StripJPEGQuality), rather than as Flate pixels
		// several times the size.
		if g, ok := img.(*image.Gray); ok {
			// canvas writes every image as DeviceRGB: three components.
			rgb := image.NewRGBA(g.Bounds())
			stddraw.Draw(rgb, rgb.Bounds(), g, g.Bounds().Min, stddraw.Src)
			img = rgb
		}
		pr.SetImageEncoding(canvas.Lossy)
		defer pr.SetImageEncoding(canvas.Lossless)
	}
	p.r.RenderImage(img, m)
}

// rgba converts to canvas's premultiplied colour.
func rgba(c draw.Color) color.RGBA {
	a := uint32(c.A)
	return color.RGBA{
		R: uint8(uint32(c.R) * a / 255),
		G: uint8(uint32(c.G) * a / 255),
		B: uint8(uint32(c.B) * a / 255),
		A: c.A,
	}
}

func finite(vs ...float64) bool {
	for _, v := range vs {
		if math.IsNaN(v) || math.IsInf(v, 0) || math.Abs(v) > maxPoints {
			return false
		}
	}
	return true
}

// normRect turns a rectangle with a negative width or height around.
func normRect(r draw.Rect) draw.Rect {
	if r.W < 0 {
		r.X, r.W = r.X+r.W, -r.W
	}
	if r.H < 0 {
		r.Y, r.H = r.Y+r.H, -r.H
	}
	return r
}

func intersect(a, b draw.Rect) draw.Rect {
	x0, y0 := math.Max(a.X, b.X), math.Max(a.Y, b.Y)
	x1, y1 := math.Min(a.Right(), b.Right()), math.Min(a.Bottom(), b.Bottom())
	if x1 < x0 {
		x1 = x0
	}
	if y1 < y0 {
		y1 = y0
	}
	return draw.Rect{X: x0, Y: y0, W: x1 - x0, H: y1 - y0}
}

// nearlySame reports whether two rectangles differ by no more than
// rounding: every edge within 1e-6 pt.
func nearlySame(a, b draw.Rect) bool {
	const tol = 1e-6
	return math.Abs(a.X-b.X) <= tol && math.Abs(a.Y-b.Y) <= tol &&
		math.Abs(a.Right()-b.Right()) <= tol && math.Abs(a.Bottom()-b.Bottom()) <= tol
}

// cropImage cuts the part of img (placed at r) that lies in v. Pixels are
// cut whole; a coarse image is first enlarged, nearest neighbour, so that
// the cut lands within about 0.1 pt of v, up to 4 megapixels.
func cropImage(img image.Image, r, v draw.Rect) (image.Image, draw.Rect) {
	const finePt, maxPx = 0.1, 4_000_000
	b := img.Bounds()
	sx, sy := float64(b.Dx())/r.W, float64(b.Dy())/r.H // pixels per point
	kx := math.Max(1, math.Ceil(1/(sx*finePt)))
	ky := math.Max(1, math.Ceil(1/(sy*finePt)))
	fx, fy := sx*kx, sy*ky // fine pixels per point
	crop := image.Rect(
		int(math.Floor((v.X-r.X)*fx)), int(math.Floor((v.Y-r.Y)*fy)),
		int(math.Ceil((v.Right()-r.X)*fx)), int(math.Ceil((v.Bottom()-r.Y)*fy)),
	).Intersect(image.Rect(0, 0, int(float64(b.Dx())*kx), int(float64(b.Dy())*ky)))
	if crop.Empty() {
		return nil, r
	}
	if float64(crop.Dx())*float64(crop.Dy()) > maxPx && (kx > 1 || ky > 1) {
		// Too large: fall back to whole source pixels.
		kx, ky = 1, 1
		fx, fy = sx, sy
		crop = image.Rect(
			int(math.Floor((v.X-r.X)*fx)), int(math.Floor((v.Y-r.Y)*fy)),
			int(math.Ceil((v.Right()-r.X)*fx)), int(math.Ceil((v.Bottom()-r.Y)*fy)),
		).Intersect(image.Rect(0, 0, b.Dx(), b.Dy()))
	}
	// A fresh image at the origin: renderers assume bounds start at 0.
	dst := image.NewRGBA(image.Rect(0, 0, crop.Dx(), crop.Dy()))
	src, direct := img.(*image.RGBA) // a wall-image strip: copy bytes, not colours one by one
	for y := 0; y < crop.Dy(); y++ {
		srcY := b.Min.Y + int(float64(crop.Min.Y+y)/ky)
		if direct {
			row := dst.Pix[y*dst.Stride : y*dst.Stride+4*crop.Dx()]
			for x := 0; x < crop.Dx(); x++ {
				srcX := b.Min.X + int(float64(crop.Min.X+x)/kx)
				at := src.PixOffset(srcX, srcY)
				copy(row[4*x:4*x+4], src.Pix[at:at+4])
			}
			continue
		}
		for x := 0; x < crop.Dx(); x++ {
			srcX := b.Min.X + int(float64(crop.Min.X+x)/kx)
			dst.Set(x, y, img.At(srcX, srcY))
		}
	}
	placed := draw.Rect{
		X: r.X + float64(crop.Min.X)/fx, Y: r.Y + float64(crop.Min.Y)/fy,
		W: float64(crop.Dx()) / fx, H: float64(crop.Dy()) / fy,
	}
	return dst, placed
}
