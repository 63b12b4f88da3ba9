package out

import (
	"bytes"
	"strconv"

	"github.com/tremie-dev/tremie/render/draw"
)

// svgPatterns writes pattern fills into an SVG beside canvas's renderer:
// each tile once, as a <pattern> in user space (so its grid is the
// page's), and each fill as one path referring to it. Fills are written
// into the renderer's own buffer between canvas's elements, so painting
// order is kept; the definitions go into <defs> at the top (insertDefs).
type svgPatterns struct {
	w     *bytes.Buffer
	ids   map[*draw.Tile]string
	taken map[string]bool
	defs  []byte
}

func newSVGPatterns(w *bytes.Buffer) *svgPatterns {
	return &svgPatterns{w: w, ids: map[*draw.Tile]string{}, taken: map[string]bool{}}
}

func (s *svgPatterns) fill(p *painter, t *draw.Tile, area draw.Rect, path string) {
	id, ok := s.ids[t]
	if !ok {
		m, err := marksOf(t)
		if err != nil {
			p.fail(path, "%v", err)
			return
		}
		id = s.name(t.ID)
		s.ids[t] = id
		s.defs = appendSVGPattern(s.defs, id, t, m)
	}
	// The page's user space is canvas's: millimetres, y down.
	b := append(s.w.AvailableBuffer(), `<path d="M`...)
	b = appendNum(b, area.X*mmPerPt, svgDecimals)
	b = append(b, ' ')
	b = appendNum(b, area.Y*mmPerPt, svgDecimals)
	b = append(b, 'H')
	b = appendNum(b, area.Right()*mmPerPt, svgDecimals)
	b = append(b, 'V')
	b = appendNum(b, area.Bottom()*mmPerPt, svgDecimals)
	b = append(b, 'H')
	b = appendNum(b, area.X*mmPerPt, svgDecimals)
	b = append(b, `z" fill="url(#`...)
	b = append(b, id...)
	b = append(b, `)"/>`...)
	s.w.Write(b)
}

// svgDecimals is the precision of fill regions, in millimetres (a
// micrometre).
const svgDecimals = 3

// name makes a pattern id from a tile's ID: letters, digits and hyphens,
// unique within the file, in order of first use, so output repeats.
func (s *svgPatterns) name(tileID string) string {
	b := []byte("tile-")
	for _, c := range []byte(tileID) {
		if c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c >= '0' && c <= '9' || c == '-' {
			b = append(b, c)
		} else {
			b = append(b, '-')
		}
	}
	id := string(b)
	for n := 2; s.taken[id]; n++ {
		id = string(b) + "-" + strconv.Itoa(n)
	}
	s.taken[id] = true
	return id
}

// insertDefs puts the pattern definitions right after the <svg> tag.
func (s *svgPatterns) insertDefs(doc []byte) []byte {
	if len(s.defs) == 0 {
		return doc
	}
	at := bytes.IndexByte(doc, '>')
	if at < 0 {
		return doc
	}
	out := make([]byte, 0, len(doc)+len(s.defs)+16)
	out = append(out, doc[:at+1]...)
	out = append(out, "<defs>"...)
	out = append(out, s.defs...)
	out = append(out, "</defs>"...)
	return append(out, doc[at+1:]...)
}

// appendSVGPattern writes one tile as a <pattern>: its cell in page
// millimetres, its marks in points through the viewBox, each mark that
// reaches past an edge drawn again on the other side.
func appendSVGPattern(b []byte, id string, t *draw.Tile, m tileMarks) []byte {
	b = append(b, `<pattern id="`...)
	b = append(b, id...)
	b = append(b, `" patternUnits="userSpaceOnUse" width="`...)
	b = strconv.AppendFloat(b, t.W*mmPerPt, 'g', -1, 64)
	b = append(b, `" height="`...)
	b = strconv.AppendFloat(b, t.H*mmPerPt, 'g', -1, 64)
	b = append(b, `" viewBox="0 0 `...)
	b = strconv.AppendFloat(b, t.W, 'g', -1, 64)
	b = append(b, ' ')
	b = strconv.AppendFloat(b, t.H, 'g', -1, 64)
	b = append(b, `">`...)
	for _, g := range m.paths {
		b = appendSVGMarks(b, t, g)
	}
	return append(b, `</pattern>`...)
}

// appendSVGMarks writes one style's marks as one path.
func appendSVGMarks(b []byte, t *draw.Tile, g draw.Path) []byte {
	fill, stroke := !g.Fill.None(), !g.Stroke.None()
	if !fill && !stroke {
		return b
	}
	start := len(b)
	b = append(b, `<path d="`...)
	body := len(b)
	pt := func(b []byte, q draw.Point, dx, dy float64) []byte {
		b = appendNum(b, q.X+dx, tileDecimals)
		b = append(b, ' ')
		return appendNum(b, q.Y+dy, tileDecimals)
	}
	eachCopy(t, g, func(pts []draw.Point, closed bool, dx, dy float64) {
		b = append(b, 'M')
		b = pt(b, pts[0], dx, dy)
		for _, q := range pts[1:] {
			b = append(b, 'L')
			b = pt(b, q, dx, dy)
		}
		if closed {
			b = append(b, 'z')
		}
	}, func(c draw.Disc, dx, dy float64) {
		// Two half-circle arcs, turning clockwise on the page like the
		// polygons.
		r := appendNum(nil, c.R, tileDecimals)
		arc := func(b []byte, x float64) []byte {
			b = append(b, 'A')
			b = append(b, r...)
			b = append(b, ' ')
			b = append(b, r...)
			b = append(b, " 0 1 1 "...)
			return pt(b, draw.Point{X: x, Y: c.Center.Y}, dx, dy)
		}
		b = append(b, 'M')
		b = pt(b, draw.Point{X: c.Center.X + c.R, Y: c.Center.Y}, dx, dy)
		b = arc(b, c.Center.X-c.R)
		b = arc(b, c.Center.X+c.R)
		b = append(b, 'z')
	})
	if len(b) == body {
		return b[:start] // nothing of it shows in the cell
	}
	b = append(b, `" fill="`...)
	if fill {
		b = appendSVGColor(b, g.Fill)
	} else {
		b = append(b, "none"...)
	}
	if stroke {
		w := strokeWidth(g.Style)
		b = append(b, `" stroke="`...)
		b = appendSVGColor(b, g.Stroke)
		b = append(b, `" stroke-width="`...)
		b = appendNum(b, w, tileDecimals)
		if d := validDash(g.Dash); d != nil {
			b = append(b, `" stroke-dasharray="`...)
			for i, v := range d {
				if i > 0 {
					b = append(b, ' ')
				}
				b = appendNum(b, v, tileDecimals)
			}
		}
	}
	return append(b, `"/>`...)
}

func appendSVGColor(b []byte, c draw.Color) []byte {
	const hex = "0123456789abcdef"
	return append(b, '#', hex[c.R>>4], hex[c.R&15], hex[c.G>>4], hex[c.G&15], hex[c.B>>4], hex[c.B&15])
}

// validDash is a dash pattern that draws something and ends, else nil.
func validDash(d []float64) []float64 {
	total := 0.0
	for _, v := range d {
		if !finite(v) || v < 0 {
			return nil
		}
		total += v
	}
	if total <= 0 {
		return nil
	}
	return d
}
