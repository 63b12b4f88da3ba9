package out

import (
	"bytes"
	"math"
	"strconv"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/minify/v2"
)

// Path data as canvas's SVG and PDF writers format it, byte for byte,
// but with strconv appends into the caller's buffer: canvas formats every
// number through fmt and a new string, which was about a tenth of a
// sheet's SVG and PDF time.

// appendCanvasG appends v as canvas writes an SVG path number: %g to
// canvas.Precision significant digits, minified (".5", "1e3").
func appendCanvasG(b []byte, v float64) []byte {
	var tmp [40]byte
	s := strconv.AppendFloat(tmp[:0], v, 'g', canvas.Precision, 64)
	if v > math.MaxInt32 || v < math.MinInt32 {
		if !containsAny(s, ".eE") {
			s = append(s, ".0"...)
		}
	}
	return append(b, minify.Number(s, canvas.Precision)...)
}

// appendCanvasDec appends v as canvas writes a PDF path number or an SVG
// stroke width: canvas.Precision decimals, minified.
func appendCanvasDec(b []byte, v float64) []byte {
	var tmp [40]byte
	s := minify.Decimal(strconv.AppendFloat(tmp[:0], v, 'f', canvas.Precision, 64), canvas.Precision)
	if v > math.MaxInt32 || v < math.MinInt32 {
		if !containsAny(s, ".") {
			s = append(s, ".0"...)
		}
	}
	return append(b, s...)
}

func containsAny(s []byte, chars string) bool {
	for _, c := range s {
		for i := 0; i < len(chars); i++ {
			if c == chars[i] {
				return true
			}
		}
	}
	return false
}

// appendSVGPathData appends p (placed) as canvas's Path.ToSVG writes it.
func appendSVGPathData(b []byte, p *canvas.Path) []byte {
	var x, y float64
	for s := p.Scanner(); s.Scan(); {
		end := s.End()
		switch s.Cmd() {
		case canvas.MoveToCmd:
			x, y = end.X, end.Y
			b = append(b, 'M')
			b = appendCanvasG(b, x)
			b = append(b, ' ')
			b = appendCanvasG(b, y)
		case canvas.LineToCmd:
			x0, y0 := x, y
			x, y = end.X, end.Y
			switch {
			case canvas.Equal(x, x0) && canvas.Equal(y, y0):
			case canvas.Equal(x, x0):
				b = append(b, 'V')
				b = appendCanvasG(b, y)
			case canvas.Equal(y, y0):
				b = append(b, 'H')
				b = appendCanvasG(b, x)
			default:
				b = append(b, 'L')
				b = appendCanvasG(b, x)
				b = append(b, ' ')
				b = appendCanvasG(b, y)
			}
		case canvas.QuadToCmd:
			x, y = end.X, end.Y
			c := s.CP1()
			b = append(b, 'Q')
			b = appendCanvasG(b, c.X)
			b = append(b, ' ')
			b = appendCanvasG(b, c.Y)
			b = append(b, ' ')
			b = appendCanvasG(b, x)
			b = append(b, ' ')
			b = appendCanvasG(b, y)
		case canvas.CubeToCmd:
			x, y = end.X, end.Y
			c1, c2 := s.CP1(), s.CP2()
			b = append(b, 'C')
			for _, v := range [...]float64{c1.X, c1.Y, c2.X, c2.Y} {
				b = appendCanvasG(b, v)
				b = append(b, ' ')
			}
			b = appendCanvasG(b, x)
			b = append(b, ' ')
			b = appendCanvasG(b, y)
		case canvas.ArcToCmd:
			rx, ry, rot, large, sweep := s.Arc()
			x, y = end.X, end.Y
			if 90.0 <= rot {
				rx, ry = ry, rx
				rot -= 90.0
			}
			b = append(b, 'A')
			b = appendCanvasG(b, rx)
			b = append(b, ' ')
			b = appendCanvasG(b, ry)
			b = append(b, ' ')
			b = appendCanvasG(b, rot)
			b = append(b, ' ', flag(large), flag(sweep))
			b = appendCanvasG(b, x)
			b = append(b, ' ')
			b = appendCanvasG(b, y)
		case canvas.CloseCmd:
			x, y = end.X, end.Y
			b = append(b, 'z')
		}
	}
	return b
}

func flag(f bool) byte {
	if f {
		return '1'
	}
	return '0'
}

// appendPDFPathData appends p (placed, without arcs) as canvas's
// Path.ToPDF writes it, without its leading space.
func appendPDFPathData(b []byte, p *canvas.Path) []byte {
	start := len(b)
	var x, y float64
	pt := func(b []byte, q canvas.Point) []byte {
		b = append(b, ' ')
		b = appendCanvasDec(b, q.X)
		b = append(b, ' ')
		return appendCanvasDec(b, q.Y)
	}
	for s := p.Scanner(); s.Scan(); {
		end := s.End()
		switch s.Cmd() {
		case canvas.MoveToCmd:
			x, y = end.X, end.Y
			b = append(pt(b, end), " m"...)
		case canvas.LineToCmd:
			x, y = end.X, end.Y
			b = append(pt(b, end), " l"...)
		case canvas.QuadToCmd, canvas.CubeToCmd:
			from := canvas.Point{X: x, Y: y}
			x, y = end.X, end.Y
			var c1, c2 canvas.Point
			if s.Cmd() == canvas.QuadToCmd {
				// canvas's quadraticToCubicBezier, the same arithmetic.
				c := s.CP1()
				c1, c2 = from.Interpolate(c, 2.0/3.0), end.Interpolate(c, 2.0/3.0)
			} else {
				c1, c2 = s.CP1(), s.CP2()
			}
			b = append(pt(pt(pt(b, c1), c2), end), " c"...)
		case canvas.CloseCmd:
			x, y = end.X, end.Y
			b = append(b, " h"...)
		}
	}
	if len(b) > start {
		b = append(b[:start], b[start+1:]...)
	}
	return b
}

// svgMicrons is how finely our SVG path data places a point: a
// micrometre (1/350 pt), far below what any printer or screen resolves.
const svgMicrons = 1000 // per millimetre

// maxCompactMM bounds the coordinates written in micrometre integers;
// beyond it (no page comes near) canvas's absolute form is written.
const maxCompactMM = 1e9

// appendSVGPathCompact appends p (placed, millimetres) as SVG path data
// in its short form: every point rounded to the micrometre, each
// subpath after the first and every segment written relative to the
// pen in micrometre steps, so that no rounding accumulates and the
// points are those of canvas's absolute form to the micrometre; a
// lineto letter is not repeated, and numbers are written without
// leading zeros or separators a reader does not need (SVG 1.1, 8.3.9,
// the path data grammar). A sheet's path data is about a third shorter.
func appendSVGPathCompact(b []byte, p *canvas.Path) []byte {
	for s := p.Scanner(); s.Scan(); {
		e := s.End()
		if !(math.Abs(e.X) < maxCompactMM && math.Abs(e.Y) < maxCompactMM) {
			return appendSVGPathData(b, p)
		}
	}
	w := svgPathWriter{b: b}
	var startX, startY int64
	for s := p.Scanner(); s.Scan(); {
		x, y := microns(s.End().X), microns(s.End().Y)
		switch s.Cmd() {
		case canvas.MoveToCmd:
			if w.started {
				w.command('m')
				w.num(x - w.x)
				w.num(y - w.y)
			} else {
				w.command('M')
				w.num(x)
				w.num(y)
			}
			w.started = true
			startX, startY = x, y
		case canvas.LineToCmd:
			switch dx, dy := x-w.x, y-w.y; {
			case dx == 0 && dy == 0:
				// canvas writes nothing for a segment of no length
			case dx == 0:
				w.command('v')
				w.num(dy)
			case dy == 0:
				w.command('h')
				w.num(dx)
			default:
				if w.last != 'l' && w.last != 'm' {
					w.command('l')
				}
				w.last = 'l'
				w.num(dx)
				w.num(dy)
			}
		case canvas.QuadToCmd:
			c := s.CP1()
			w.command('q')
			w.num(microns(c.X) - w.x)
			w.num(microns(c.Y) - w.y)
			w.num(x - w.x)
			w.num(y - w.y)
		case canvas.CubeToCmd:
			c1, c2 := s.CP1(), s.CP2()
			w.command('c')
			w.num(microns(c1.X) - w.x)
			w.num(microns(c1.Y) - w.y)
			w.num(microns(c2.X) - w.x)
			w.num(microns(c2.Y) - w.y)
			w.num(x - w.x)
			w.num(y - w.y)
		case canvas.ArcToCmd:
			rx, ry, rot, large, sweep := s.Arc()
			if 90.0 <= rot {
				rx, ry = ry, rx
				rot -= 90.0
			}
			w.command('a')
			from := s.Start()
			chord := math.Hypot(s.End().X-from.X, s.End().Y-from.Y)
			if rx == ry && math.Abs(chord-2*rx) <= 1e-9*(1+rx) {
				// Half a circle (as canvas draws circles): its ends, each
				// rounded, may lie a little more or less than a diameter
				// apart, which would turn the arc about a centre well off
				// the circle's. A radius no more than half the rounded
				// chord is scaled up to exactly that by every reader (SVG
				// 1.1, F.6.6), so the arc is half a circle again.
				r := int64(math.Hypot(float64(x-w.x), float64(y-w.y))) / 2
				w.num(r)
				w.num(r)
				w.num(0)
			} else {
				// Radii and angle as canvas writes them.
				w.canvasNum(rx)
				w.canvasNum(ry)
				w.canvasNum(rot)
			}
			w.flags(large, sweep)
			w.num(x - w.x)
			w.num(y - w.y)
		case canvas.CloseCmd:
			w.command('z')
			x, y = startX, startY
		}
		w.x, w.y = x, y
	}
	return w.b
}

func microns(v float64) int64 { return int64(math.Round(v * svgMicrons)) }

// svgPathWriter appends path data, keeping what the next separator
// depends on.
type svgPathWriter struct {
	b       []byte
	x, y    int64 // the pen, micrometres
	started bool
	last    byte // the last command letter
	sep     bool // the last byte ends a number
	dot     bool // that number has a decimal point
}

func (w *svgPathWriter) command(c byte) {
	w.b = append(w.b, c)
	w.last, w.sep = c, false
}

// flags writes an arc's two flags, which need no separator after them.
func (w *svgPathWriter) flags(large, sweep bool) {
	if w.sep {
		w.b = append(w.b, ' ')
	}
	w.b = append(w.b, flag(large), flag(sweep))
	w.sep = false
}

// canvasNum writes v as canvas does (appendCanvasG).
func (w *svgPathWriter) canvasNum(v float64) {
	var tmp [40]byte
	d := appendCanvasG(tmp[:0], v)
	w.put(d[0] == '-', d, bytes.IndexByte(d, '.') >= 0)
}

// num writes n micrometres as millimetres: "1.5", ".25", "-.004", "12".
func (w *svgPathWriter) num(n int64) {
	var digits [24]byte
	neg := n < 0
	if neg {
		n = -n
	}
	whole, frac := n/svgMicrons, n%svgMicrons
	d := digits[:0]
	if whole > 0 || frac == 0 {
		d = strconv.AppendInt(d, whole, 10)
	}
	dot := frac != 0
	if dot {
		f := strconv.AppendInt(make([]byte, 0, 4), frac+svgMicrons, 10)[1:] // zero-padded to 3
		for len(f) > 0 && f[len(f)-1] == '0' {
			f = f[:len(f)-1]
		}
		d = append(d, '.')
		d = append(d, f...)
	}
	if neg {
		d = append([]byte{'-'}, d...)
	}
	w.put(neg, d, dot)
}

// put writes one number's text d. A separator goes only where the number
// could run into the last one: a sign starts a new number, and so does a
// point after a number that has its point already.
func (w *svgPathWriter) put(neg bool, d []byte, dot bool) {
	if w.sep && !neg && !(d[0] == '.' && w.dot) {
		w.b = append(w.b, ' ')
	}
	w.b = append(w.b, d...)
	w.sep, w.dot = true, dot
}
