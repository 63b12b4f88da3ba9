package out

import (
	"image"
	"image/color"
	"math"

	"github.com/srwiley/scanx"
	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/text"
	"github.com/tdewolff/font"
)

// Text on a raster is drawn from glyph coverage masks: each glyph of a
// face and size is outlined, flattened and scanned once per position
// within a pixel, by canvas's own scanner, and every later copy of it
// (the same letters fill every label of a sheet, and the same labels
// every sheet of a well) is laid from its mask. Outlining and scanning
// each glyph of each label anew took about a third of a deep well's PNG
// time.
//
// A glyph's pen position is kept to 1/glyphPhases of a pixel across the
// line (text on a raster sits on whole pixel rows, canvas's vertical
// hinting, so only x has phases): at most 1/(2·glyphPhases) of a pixel
// from where the outline would have put it, a shift below what the eye
// sees and far below the scanner's own anti-aliasing; the masks of one
// label are summed before they are laid, as the scanner sums the cells
// of one path, so where two letters share a pixel the coverage is the
// same as one path's.
const glyphPhases = 16

// maxGlyphPixels bounds the glyphs drawn from masks: a glyph whose em is
// larger than this many pixels (a title at a high resolution) is drawn
// as an outline, as it is rare and its mask would be large.
const maxGlyphPixels = 160

// maxMaskBytes bounds the masks a font set keeps; past it the set starts
// afresh. A deep well's eight sheets at 150 dpi make about 2,200 masks in
// 0.6 MB, so a batch of wells keeps its masks from well to well.
const maxMaskBytes = 8 << 20

// glyphKey names a mask: one glyph of one font at one size, resolution
// and phase.
type glyphKey struct {
	font    *canvas.Font
	mmPerEm float64
	dpmm    float64
	id      uint16
	phase   uint8 // x, in 1/glyphPhases of a pixel
}

// glyphMask is a glyph's coverage as the scanner computes it, 12 bits a
// pixel (0x0fff: fully covered), w × h pixels whose top-left pixel is
// (x0, y0) from the pixel that holds the glyph's origin.
type glyphMask struct {
	x0, y0, w, h int
	a            []uint16
}

// glyphMasks is a font set's masks.
type glyphMasks struct {
	masks map[glyphKey]*glyphMask
	bytes int
}

// mask returns the glyph's mask, scanning it the first time.
func (gm *glyphMasks) mask(face *canvas.FontFace, id uint16, phase uint8, res canvas.Resolution) (*glyphMask, error) {
	dpmm := res.DPMM()
	key := glyphKey{face.Font, face.MmPerEm, dpmm, id, phase}
	if m, ok := gm.masks[key]; ok {
		return m, nil
	}
	outline := &canvas.Path{}
	if err := face.Font.GlyphPath(outline, id, face.PPEM(res), 0, 0, face.MmPerEm, font.NoHinting); err != nil {
		return nil, err
	}
	m := &glyphMask{}
	if !outline.Empty() {
		// The outline's box in pixels from the origin (y down), with a
		// pixel to spare for the phase and the scanner's rounding.
		b := outline.FastBounds()
		dx := float64(phase) / glyphPhases
		m.x0 = int(math.Floor(b.X0*dpmm+dx)) - 1
		m.y0 = int(math.Floor(-b.Y1*dpmm)) - 1
		m.w = int(math.Ceil(b.X1*dpmm+dx)) + 1 - m.x0
		m.h = int(math.Ceil(-b.Y0*dpmm)) + 1 - m.y0
		m.a = make([]uint16, m.w*m.h)
		// Scanned where the origin lies at (-x0 + dx, -y0) in the mask.
		s := scanx.NewScanner(&maskSpanner{m}, m.w, m.h)
		outline = outline.Translate((float64(-m.x0)+dx)/dpmm, 0)
		outline.ToScanxScanner(s, float64(-m.y0), res)
		s.Draw()
	}
	if gm.masks == nil || gm.bytes+2*len(m.a) > maxMaskBytes {
		gm.masks, gm.bytes = make(map[glyphKey]*glyphMask), 0
	}
	gm.masks[key] = m
	gm.bytes += 2*len(m.a) + 64
	return m, nil
}

// maskSpanner records the scanner's coverage into a mask.
type maskSpanner struct{ m *glyphMask }

func (s *maskSpanner) SetColor(any) {}

func (s *maskSpanner) GetSpanFunc() scanx.SpanFunc {
	return func(yi, xi0, xi1 int, alpha uint32) {
		row := s.m.a[yi*s.m.w : (yi+1)*s.m.w]
		a := uint16(alpha >> 4) // the scanner's 12 bits, widened as a<<4 | a>>8
		for x := xi0; x < xi1; x++ {
			row[x] = a
		}
	}
}

// placedGlyph is a mask laid at a pixel.
type placedGlyph struct {
	m    *glyphMask
	x, y int // the pixel holding the glyph's origin
}

// maskedText draws text (a line shaped by fontSet.line) at m from glyph
// masks and reports true, or reports false having drawn nothing where it
// needs the outlines: m turns or scales, or a span is not plain
// horizontal text in a flat colour, or a glyph is too large.
func (r *pngRenderer) maskedText(t *canvas.Text, m canvas.Matrix) bool {
	if r.masks == nil || m[0][0] != 1 || m[1][1] != 1 || m[0][1] != 0 || m[1][0] != 0 || t.WritingMode != canvas.HorizontalTB {
		return false
	}
	dpmm := r.res.DPMM()
	ok := true
	t.WalkLines(func(_ float64, spans []canvas.TextSpan) {
		for _, s := range spans {
			f := s.Face
			if !s.IsText() || len(f.Deco) > 0 || f.FauxBold != 0 || f.FauxItalic != 0 || f.Hinting == font.NoHinting ||
				s.Rotation != text.NoRotation || !f.Fill.IsColor() || f.MmPerEm*float64(f.Font.Head.UnitsPerEm)*dpmm > maxGlyphPixels {
				ok = false
			}
		}
	})
	if !ok {
		return false
	}
	height := float64(r.img.Bounds().Dy())
	placed := r.placed[:0]
	var err error
	var col color.RGBA
	first := true
	t.WalkLines(func(ly float64, spans []canvas.TextSpan) {
		for _, s := range spans {
			f := s.Face
			if first {
				col, first = f.Fill.Color, false
			} else if f.Fill.Color != col {
				ok = false
			}
			// The baseline on a whole pixel row, as canvas's RenderAsPath
			// hints it.
			x, y := s.X, ly
			_, dy := m.Pos()
			dy += y
			y += float64(int(dy*dpmm+0.5))/dpmm - dy
			ox, oy := m.Dot(canvas.Point{X: x, Y: y}).X, m.Dot(canvas.Point{X: x, Y: y}).Y
			py := int(math.Round(height - oy*dpmm))
			penX, penY := f.XOffset, f.YOffset
			for _, g := range s.Glyphs {
				gx := (ox + f.MmPerEm*float64(penX+g.XOffset)) * dpmm
				gy := py - int(math.Round(f.MmPerEm*float64(penY+g.YOffset)*dpmm))
				q := math.Round(gx * glyphPhases)
				px := int(math.Floor(q / glyphPhases))
				phase := uint8(int(q) - px*glyphPhases)
				var gm *glyphMask
				if gm, err = r.masks.mask(f, g.ID, phase, r.res); err != nil {
					return
				}
				if gm.w > 0 {
					placed = append(placed, placedGlyph{gm, px, gy})
				}
				penX += g.XAdvance
				penY += g.YAdvance
			}
		}
	})
	r.placed = placed[:0]
	if err != nil || !ok {
		return false
	}
	r.layMasks(placed, col)
	return true
}

// layMasks sums the masks of one text and lays the sum in colour col as
// the scanner's span function does (scanx's ImgSpanner.SpanFgColor, the
// Porter-Duff "over" in 16 bits a channel).
func (r *pngRenderer) layMasks(placed []placedGlyph, col color.RGBA) {
	if len(placed) == 0 {
		return
	}
	box := image.Rectangle{}
	for _, p := range placed {
		box = box.Union(image.Rect(p.x+p.m.x0, p.y+p.m.y0, p.x+p.m.x0+p.m.w, p.y+p.m.y0+p.m.h))
	}
	box = box.Intersect(r.img.Bounds())
	if box.Empty() {
		return
	}
	w, h := box.Dx(), box.Dy()
	if cap(r.sum) < w*h {
		r.sum = make([]uint16, w*h)
	}
	sum := r.sum[:w*h]
	clear(sum)
	for _, p := range placed {
		gm := p.m
		for j := 0; j < gm.h; j++ {
			y := p.y + gm.y0 + j - box.Min.Y
			if y < 0 || y >= h {
				continue
			}
			src := gm.a[j*gm.w : (j+1)*gm.w]
			dst := sum[y*w : (y+1)*w]
			for i, a := range src {
				x := p.x + gm.x0 + i - box.Min.X
				if a == 0 || x < 0 || x >= w {
					continue
				}
				if a += dst[x]; a > 0x0fff {
					a = 0x0fff // the scanner's non-zero rule
				}
				dst[x] = a
			}
		}
	}
	const m, mp, pa = 1<<16 - 1, 0x100 * (1<<16 - 1), 0x101
	cr, cg, cb, ca := col.RGBA()
	pix, stride := r.img.Pix, r.img.Stride
	for y := 0; y < h; y++ {
		row := pix[(box.Min.Y+y)*stride+box.Min.X*4:]
		for x, a := range sum[y*w : (y+1)*w] {
			if a == 0 {
				continue
			}
			ma := uint32(a)<<4 | uint32(a)>>8
			px := row[x*4 : x*4+4]
			ama := ca * ma
			if ama == 0xffff*0xffff {
				px[0], px[1], px[2], px[3] = uint8(cr*ma/mp), uint8(cg*ma/mp), uint8(cb*ma/mp), uint8(ama/mp)
				continue
			}
			k := (m - ama/m) * pa
			px[0] = uint8((uint32(px[0])*k + cr*ma) / mp)
			px[1] = uint8((uint32(px[1])*k + cg*ma) / mp)
			px[2] = uint8((uint32(px[2])*k + cb*ma) / mp)
			px[3] = uint8((uint32(px[3])*k + ama) / mp)
		}
	}
}
