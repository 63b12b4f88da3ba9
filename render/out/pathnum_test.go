package out

import (
	"bytes"
	"math"
	"regexp"
	"strconv"
	"testing"

	"github.com/tdewolff/canvas"
	"github.com/tdewolff/canvas/renderers/pdf"
	"github.com/tdewolff/canvas/renderers/svg"

	"github.com/tremie-dev/tremie/render/draw"
)

// testPaths holds every kind of segment, numbers small, negative, zero
// (and -0), large and long, and repeated points that canvas shortens.
func testPaths() []*canvas.Path {
	var ps []*canvas.Path
	p := &canvas.Path{}
	p.MoveTo(0, 0)
	p.LineTo(10.123456789, 0)
	p.LineTo(10.123456789, -0.000012345)
	p.LineTo(10.123456789, -0.000012345)
	p.QuadTo(3.3333333, 7.77777777, -5.5, 0.5)
	p.CubeTo(1e-7, 123456.789, -98765.4321, 0.1, 2, 3)
	p.Close()
	p.MoveTo(math.Copysign(0, -1), 1.5)
	p.ArcTo(2, 1, 30, false, true, 4, 4)
	p.ArcTo(3, 3, 120, true, false, 8, 1)
	p.LineTo(8, 9)
	ps = append(ps, p)
	ps = append(ps, canvas.Circle(0.458611111).Translate(34.854444444, 197.908333333))
	ps = append(ps, canvas.Rectangle(205.74-10.16, 44.45).Translate(10.16, 224.79))
	return ps
}

// The path data written here is canvas's own, byte for byte: canvas's
// Path.ToSVG and Path.ToPDF are the reference.
func TestPathDataIsCanvas(t *testing.T) {
	for i, p := range testPaths() {
		if got, want := string(appendSVGPathData(nil, p)), p.ToSVG(); got != want {
			t.Errorf("path %d SVG:\n got %s\nwant %s", i, got, want)
		}
		q := p.Copy().ReplaceArcs()
		if got, want := string(appendPDFPathData(nil, q)), q.ToPDF(); got != want {
			t.Errorf("path %d PDF:\n got %s\nwant %s", i, got, want)
		}
	}
}

// styles are the paints the painter gives, and a few it could.
func testStyles() []canvas.Style {
	fill := canvas.DefaultStyle
	fill.Fill = canvas.Paint{Color: rgba(draw.RGB(230, 220, 180))}
	black := canvas.DefaultStyle
	none := canvas.DefaultStyle
	none.Fill = canvas.Paint{}
	stroke := none
	stroke.Stroke = canvas.Paint{Color: rgba(draw.RGB(25, 25, 25))}
	stroke.StrokeWidth = 0.211667
	both := stroke
	both.Fill = fill.Fill
	blackStroke := stroke
	blackStroke.Stroke = canvas.Paint{Color: canvas.Black}
	blackStroke.StrokeWidth = 1
	dashed := stroke
	dashed.Dashes = []float64{4 / dashed.StrokeWidth, 2 / dashed.StrokeWidth}
	dashed.DashOffset = 0.5
	seeThrough := fill
	seeThrough.Fill = canvas.Paint{Color: rgba(draw.Color{R: 200, G: 30, B: 30, A: 128})}
	return []canvas.Style{fill, black, none, stroke, both, blackStroke, dashed, seeThrough}
}

// The SVG path elements written here are the ones canvas's SVG writer
// writes for every style and path, but for their shorter path data
// (checked against canvas's in TestCompactPathKeepsPoints): the same
// document, byte for byte, with every d attribute emptied.
func TestSVGPathsAreCanvas(t *testing.T) {
	draw := func(own bool) []byte {
		var buf bytes.Buffer
		var r canvas.Renderer
		if own {
			r = newSVGRenderer(&buf, 216, 279, nil)
		} else {
			r = svg.New(&buf, 216, 279, nil)
		}
		for _, st := range testStyles() {
			for _, p := range testPaths() {
				r.RenderPath(p, st, canvas.Identity)
			}
		}
		r.(interface{ Close() error }).Close()
		return buf.Bytes()
	}
	noData := regexp.MustCompile(` d="[^"]*"`)
	want, got := noData.ReplaceAll(draw(false), nil), noData.ReplaceAll(draw(true), nil)
	if !bytes.Equal(got, want) {
		t.Errorf("SVG differs from canvas's:\n got %s\nwant %s", got, want)
	}
}

// The same for PDF: path data through stand-ins, put in place when the
// file is finished, gives canvas's own document.
func TestPDFPathsAreCanvas(t *testing.T) {
	draw := func(own bool) []byte {
		var buf bytes.Buffer
		w := pdf.New(&buf, 216, 279, &pdf.Options{SubsetFonts: true})
		r := pdfRenderer{PDF: w}
		if own {
			r.paths = &pdfPaths{}
		}
		for _, st := range testStyles() {
			for _, p := range testPaths() {
				r.RenderPath(p, st, canvas.Identity)
			}
		}
		if err := w.Close(); err != nil {
			t.Fatal(err)
		}
		out, err := fixPDF(buf.Bytes(), []byte("2 0 obj\n<<>>\nendobj\n"), nil, r.paths, nil)
		if err != nil {
			t.Fatal(err)
		}
		return out
	}
	if want, got := draw(false), draw(true); !bytes.Equal(got, want) {
		t.Errorf("PDF differs from canvas's (%d bytes against %d)", len(got), len(want))
	}
}

// A stand-in that names no recorded path is an error, not a guess.
func TestPDFStandInMustNamePath(t *testing.T) {
	pp := &pdfPaths{}
	pp.standIn(canvas.Rectangle(1, 1))
	if _, err := pp.fill([]byte(" 0 -999983 m -1 -999983 l f 7 -999983 m -1 -999983 l f")); err == nil {
		t.Error("stand-in 7 of 1 path accepted")
	}
	got, err := pp.fill([]byte("q 0 -999983 m -1 -999983 l S Q"))
	if err != nil {
		t.Fatal(err)
	}
	if want := "q 0 0 m 1 0 l 1 1 l 0 1 l s Q"; string(got) != want {
		t.Errorf("got %q, want %q (a closed path's stroke closes: s)", got, want)
	}
}

// The short SVG path data keeps every point canvas's absolute form
// writes, to half a micrometre: read back by the SVG path grammar (SVG
// 1.1, 8.3: relative commands move from the pen, a repeated lineto may
// drop its letter, numbers may run together where a sign or a second
// point starts the next), its commands and points are canvas's.
func TestCompactPathKeepsPoints(t *testing.T) {
	for i, p := range testPaths() {
		p = p.Transform(canvas.Identity.ReflectYAbout(140))
		data := string(appendSVGPathCompact(nil, p))
		got := readSVGPath(t, data)
		var want []pathPoint
		var pen canvas.Point
		for s := p.Scanner(); s.Scan(); {
			e := s.End()
			switch s.Cmd() {
			case canvas.LineToCmd:
				if microns(e.X) == microns(pen.X) && microns(e.Y) == microns(pen.Y) {
					pen = e // shorter than a micrometre: not written
					continue
				}
				want = append(want, pathPoint{'L', e})
			case canvas.MoveToCmd:
				want = append(want, pathPoint{'M', e})
			case canvas.QuadToCmd:
				want = append(want, pathPoint{'Q', s.CP1()}, pathPoint{'Q', e})
			case canvas.CubeToCmd:
				want = append(want, pathPoint{'C', s.CP1()}, pathPoint{'C', s.CP2()}, pathPoint{'C', e})
			case canvas.ArcToCmd:
				want = append(want, pathPoint{'A', e})
			case canvas.CloseCmd:
				want = append(want, pathPoint{'Z', e})
			}
			pen = e
		}
		if len(got) != len(want) {
			t.Fatalf("path %d: %d points read back from %q, want %d", i, len(got), data, len(want))
		}
		for j := range want {
			g, w := got[j], want[j]
			if g.cmd != w.cmd || math.Abs(g.at.X-w.at.X) > 0.0005+1e-9 || math.Abs(g.at.Y-w.at.Y) > 0.0005+1e-9 {
				t.Errorf("path %d point %d: %c %v, want %c %v (data %q)", i, j, g.cmd, g.at, w.cmd, w.at, data)
			}
		}
	}
}

type pathPoint struct {
	cmd byte
	at  canvas.Point
}

// readSVGPath reads SVG path data into absolute points (arcs give their
// end only).
func readSVGPath(t *testing.T, d string) []pathPoint {
	t.Helper()
	var out []pathPoint
	var pen, start canvas.Point
	i := 0
	number := func() float64 {
		for i < len(d) && d[i] == ' ' {
			i++
		}
		j := i
		if j < len(d) && d[j] == '-' {
			j++
		}
		dot := false
		for j < len(d) && (d[j] >= '0' && d[j] <= '9' || d[j] == '.' && !dot || d[j] == 'e') {
			if d[j] == '.' {
				dot = true
			}
			if d[j] == 'e' && j+1 < len(d) && d[j+1] == '-' {
				j++
			}
			j++
		}
		v, err := strconv.ParseFloat(d[i:j], 64)
		if err != nil {
			t.Fatalf("bad number at %d in %q", i, d)
		}
		i = j
		return v
	}
	var cmd byte
	for i < len(d) {
		if c := d[i]; c >= 'A' && c <= 'z' && c != 'e' {
			cmd = c
			i++
		} else if cmd == 'M' {
			cmd = 'L'
		} else if cmd == 'm' {
			cmd = 'l'
		}
		rel := cmd >= 'a'
		at := func(x, y float64) canvas.Point {
			if rel {
				return canvas.Point{X: pen.X + x, Y: pen.Y + y}
			}
			return canvas.Point{X: x, Y: y}
		}
		switch cmd | 0x20 {
		case 'm':
			pen = at(number(), number())
			start = pen
			out = append(out, pathPoint{'M', pen})
		case 'l':
			pen = at(number(), number())
			out = append(out, pathPoint{'L', pen})
		case 'h':
			x := number()
			if rel {
				x += pen.X
			}
			pen.X = x
			out = append(out, pathPoint{'L', pen})
		case 'v':
			y := number()
			if rel {
				y += pen.Y
			}
			pen.Y = y
			out = append(out, pathPoint{'L', pen})
		case 'q':
			c := at(number(), number())
			pen = at(number(), number())
			out = append(out, pathPoint{'Q', c}, pathPoint{'Q', pen})
		case 'c':
			c1 := at(number(), number())
			c2 := at(number(), number())
			pen = at(number(), number())
			out = append(out, pathPoint{'C', c1}, pathPoint{'C', c2}, pathPoint{'C', pen})
		case 'a':
			number()
			number()
			number()
			for i < len(d) && d[i] == ' ' {
				i++
			}
			i += 2 // the two one-character flags
			pen = at(number(), number())
			out = append(out, pathPoint{'A', pen})
		case 'z':
			pen = start
			out = append(out, pathPoint{'Z', pen})
			continue
		default:
			t.Fatalf("unknown command %q in %q", cmd, d)
		}
	}
	return out
}
