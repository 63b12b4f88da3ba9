package out

import (
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
