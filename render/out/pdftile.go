package out

import (
	"bytes"
	"errors"
	"fmt"
	"math"
	"regexp"
	"strconv"

	"github.com/tdewolff/canvas"

	"github.com/tremie-dev/tremie/render/draw"
)

// pdfPatterns writes pattern fills into a PDF as tiling patterns
// (ISO 32000-1, 8.7.3: PatternType 1, PaintType 1, coloured), each tile
// once per document and page height, and each fill as one path painted
// with it. canvas writes no tiling patterns, so a fill goes through it
// as a path painted with a stand-in gradient that numbers the tile (the
// gradient's start); canvas names it in the page's /Pattern resources
// and selects it with /Pattern cs /Pn scn, and fixPDF then replaces each
// stand-in by a reference to the tile's pattern object.
type pdfPatterns struct {
	tiles []*draw.Tile
	marks []tileMarks
	index map[*draw.Tile]int
}

func newPDFPatterns() *pdfPatterns { return &pdfPatterns{index: map[*draw.Tile]int{}} }

func (pp *pdfPatterns) fill(p *painter, t *draw.Tile, area draw.Rect, path string) {
	k, ok := pp.index[t]
	if !ok {
		m, err := marksOf(t)
		if err != nil {
			p.fail(path, "%v", err)
			return
		}
		k = len(pp.tiles)
		pp.index[t] = k
		pp.tiles = append(pp.tiles, t)
		pp.marks = append(pp.marks, m)
	}
	st := canvas.DefaultStyle
	st.Fill = canvas.Paint{Gradient: standIn(k)}
	p.r.RenderPath(rectPath(p.rect(area)), st, canvas.Identity)
}

// standIn is the gradient that stands for tile k: its start's x, in
// millimetres, is k + 1.
func standIn(k int) canvas.Gradient {
	x := float64(k + 1)
	return &canvas.LinearGradient{Start: canvas.Point{X: x}, End: canvas.Point{X: x, Y: 1}}
}

var (
	pageTypeRE   = regexp.MustCompile(`/Type\s*/Page\b`)
	mediaBoxRE   = regexp.MustCompile(`/MediaBox\s*\[\s*([-\d.]+)\s+([-\d.]+)\s+([-\d.]+)\s+([-\d.]+)\s*\]`)
	standInRE    = regexp.MustCompile(`/(P\d+)\s*<<`)
	standInXRE   = regexp.MustCompile(`/Coords\s*\[\s*([-\d.]+)`)
	ptPerMillime = 72 / 25.4
)

// setPatterns replaces the stand-in gradients in every page's /Pattern
// resources by references to tiling pattern objects, which it appends to
// spans (one per tile and page height, as a pattern's matrix places its
// grid at the page's top-left corner).
func setPatterns(spans [][]byte, pp *pdfPatterns) ([][]byte, error) {
	if pp == nil || len(pp.tiles) == 0 {
		return spans, nil
	}
	made := map[[2]float64]int{} // tile, page height → object
	for n := 3; n < len(spans); n++ {
		span := spans[n]
		if at := bytes.Index(span, []byte("stream\n")); at >= 0 {
			span = span[:at]
		}
		if !pageTypeRE.Match(span) {
			continue
		}
		at := bytes.Index(span, []byte("/Pattern<<"))
		if at < 0 {
			continue
		}
		start := at + len("/Pattern")
		end, err := dictEnd(span, start)
		if err != nil {
			return nil, fmt.Errorf("page object %d: %w", n, err)
		}
		mb := mediaBoxRE.FindSubmatch(span)
		if mb == nil {
			return nil, fmt.Errorf("page object %d has no media box", n)
		}
		y0, _ := strconv.ParseFloat(string(mb[2]), 64)
		y1, _ := strconv.ParseFloat(string(mb[4]), 64)
		height := math.Round(math.Abs(y1-y0)*1e4) / 1e4
		var dict bytes.Buffer
		dict.WriteString("<<")
		body := span[start+2 : end-2]
		for len(bytes.TrimSpace(body)) > 0 {
			m := standInRE.FindSubmatchIndex(body)
			if m == nil || len(bytes.TrimSpace(body[:m[0]])) > 0 {
				return nil, fmt.Errorf("page object %d: unexpected pattern resource %q", n, body)
			}
			name := body[m[2]:m[3]]
			e, err := dictEnd(body, m[1]-2)
			if err != nil {
				return nil, fmt.Errorf("page object %d: %w", n, err)
			}
			x := standInXRE.FindSubmatch(body[m[1]:e])
			if x == nil {
				return nil, fmt.Errorf("page object %d: pattern %s is not a stand-in", n, name)
			}
			mm, _ := strconv.ParseFloat(string(x[1]), 64)
			k := int(math.Round(mm/ptPerMillime)) - 1
			if k < 0 || k >= len(pp.tiles) {
				return nil, fmt.Errorf("page object %d: pattern %s stands for no tile", n, name)
			}
			key := [2]float64{float64(k), height}
			obj, ok := made[key]
			if !ok {
				obj = len(spans)
				spans = append(spans, tilingPattern(obj, pp.tiles[k], pp.marks[k], height))
				made[key] = obj
			}
			fmt.Fprintf(&dict, "/%s %d 0 R", name, obj)
			body = body[e:]
		}
		dict.WriteString(">>")
		var page bytes.Buffer
		page.Write(spans[n][:start])
		page.Write(dict.Bytes())
		page.Write(spans[n][end:])
		spans[n] = page.Bytes()
	}
	return spans, nil
}

// dictEnd gives the index just past the dictionary that opens at b[at]
// ("<<"), counting nested ones; the dictionaries here hold names,
// numbers, arrays and dictionaries only.
func dictEnd(b []byte, at int) (int, error) {
	if !bytes.HasPrefix(b[at:], []byte("<<")) {
		return 0, errors.New("no dictionary where expected")
	}
	depth := 0
	for i := at; i+1 < len(b); i++ {
		switch {
		case b[i] == '<' && b[i+1] == '<':
			depth++
			i++
		case b[i] == '>' && b[i+1] == '>':
			depth--
			i++
			if depth == 0 {
				return i + 1, nil
			}
		}
	}
	return 0, errors.New("unterminated dictionary")
}

// tilingPattern writes tile t as pattern object n: its cell in points,
// mapped by the matrix to the page's top-left corner with y down, as the
// drawing model has it; marks reaching past an edge are drawn again on
// the other side, since each copy is cut to its cell. The stream is left
// uncompressed for fixPDF.
func tilingPattern(n int, t *draw.Tile, m tileMarks, pageHeight float64) []byte {
	var c []byte
	c = append(c, "4 M"...) // the miter limit SVG and canvas use
	for _, g := range m.paths {
		c = appendPDFMarks(c, t, g)
	}
	var b []byte
	b = fmt.Appendf(b, "%d 0 obj\n<</Type/Pattern/PatternType 1/PaintType 1/TilingType 1/BBox[0 0 ", n)
	b = strconv.AppendFloat(b, t.W, 'g', -1, 64)
	b = append(b, ' ')
	b = strconv.AppendFloat(b, t.H, 'g', -1, 64)
	b = append(b, "]/XStep "...)
	b = strconv.AppendFloat(b, t.W, 'g', -1, 64)
	b = append(b, "/YStep "...)
	b = strconv.AppendFloat(b, t.H, 'g', -1, 64)
	b = append(b, "/Matrix[1 0 0 -1 0 "...)
	b = strconv.AppendFloat(b, pageHeight, 'g', -1, 64)
	b = fmt.Appendf(b, "]/Resources<<>>/Length %d>>stream\n", len(c))
	b = append(b, c...)
	return append(b, "\nendstream\nendobj\n"...)
}

// appendPDFMarks writes one style's marks as one painted path.
func appendPDFMarks(c []byte, t *draw.Tile, g draw.Path) []byte {
	fill, stroke := !g.Fill.None(), !g.Stroke.None()
	if !fill && !stroke {
		return c
	}
	start := len(c)
	if fill {
		c = append(c, ' ')
		c = appendPDFColor(c, g.Fill)
		c = append(c, " rg"...)
	}
	if stroke {
		w := strokeWidth(g.Style)
		c = append(c, ' ')
		c = appendPDFColor(c, g.Stroke)
		c = append(c, " RG "...)
		c = appendNum(c, w, tileDecimals)
		c = append(c, " w ["...)
		for i, v := range validDash(g.Dash) {
			if i > 0 {
				c = append(c, ' ')
			}
			c = appendNum(c, v, tileDecimals)
		}
		c = append(c, "] 0 d"...)
	}
	body := len(c)
	pt := func(c []byte, x, y float64) []byte {
		c = append(c, ' ')
		c = appendNum(c, x, tileDecimals)
		c = append(c, ' ')
		return appendNum(c, y, tileDecimals)
	}
	eachCopy(t, g, func(pts []draw.Point, closed bool, dx, dy float64) {
		c = pt(c, pts[0].X+dx, pts[0].Y+dy)
		c = append(c, " m"...)
		for _, q := range pts[1:] {
			c = pt(c, q.X+dx, q.Y+dy)
			c = append(c, " l"...)
		}
		if closed {
			c = append(c, " h"...)
		}
	}, func(d draw.Disc, dx, dy float64) {
		// Four Béziers (control points at 0.5523 of the radius),
		// clockwise on the page like the polygons.
		x, y, r := d.Center.X+dx, d.Center.Y+dy, d.R
		k := r * 4 * (math.Sqrt2 - 1) / 3
		c = pt(c, x+r, y)
		c = append(c, " m"...)
		for _, q := range [4][6]float64{
			{x + r, y + k, x + k, y + r, x, y + r},
			{x - k, y + r, x - r, y + k, x - r, y},
			{x - r, y - k, x - k, y - r, x, y - r},
			{x + k, y - r, x + r, y - k, x + r, y},
		} {
			c = pt(c, q[0], q[1])
			c = pt(c, q[2], q[3])
			c = pt(c, q[4], q[5])
			c = append(c, " c"...)
		}
		c = append(c, " h"...)
	})
	if len(c) == body {
		return c[:start] // nothing of it shows in the cell
	}
	switch {
	case fill && stroke:
		return append(c, " B"...)
	case fill:
		return append(c, " f"...)
	}
	return append(c, " S"...)
}

func appendPDFColor(c []byte, col draw.Color) []byte {
	for i, v := range [3]uint8{col.R, col.G, col.B} {
		if i > 0 {
			c = append(c, ' ')
		}
		c = appendNum(c, float64(v)/255, 4)
	}
	return c
}
