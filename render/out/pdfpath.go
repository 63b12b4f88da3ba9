package out

import (
	"bytes"
	"errors"
	"regexp"
	"strconv"

	"github.com/tdewolff/canvas"
)

// pdfPaths writes path data for canvas's PDF writer: canvas writes a
// painted path's graphics state (colours, width, dashes) and its paint
// operator, but its path data would be formatted through fmt, number by
// number. So each path goes to canvas as a stand-in, a line from
// (k, markerY) to (-1, markerY) for path k (a lone moveto, or a line of
// no length, is empty to canvas), and fixPDF puts the data written here (the
// same bytes canvas writes, see pathnum.go) in its place.
type pdfPaths struct {
	data   [][]byte // path k's data, as canvas's Path.ToPDF, without a closing " h"
	closed []bool   // path k ended with a closepath
	marker canvas.Path
}

// markerY is the stand-in's y, in millimetres: far past any drawable page
// (maxPoints), so that no real path writes it.
const markerY = -999983

// markerTail ends every stand-in in a content stream.
var markerTail = []byte(" -999983 m -1 -999983 l")

// standIn records path and returns the path to give canvas in its place.
func (pp *pdfPaths) standIn(path *canvas.Path) *canvas.Path {
	// canvas's own steps: place (by the identity, which turns -0 to 0),
	// then arcs to Béziers.
	placed := path.Copy().Transform(canvas.Identity)
	if hasArcs(placed) {
		placed = placed.ReplaceArcs()
	}
	data := appendPDFPathData(nil, placed)
	closed := false
	if n := len(data); n > 1 && data[n-1] == 'h' {
		data, closed = data[:n-2], true
	}
	k := len(pp.data)
	pp.data = append(pp.data, data)
	pp.closed = append(pp.closed, closed)
	pp.marker = canvas.Path{}
	pp.marker.MoveTo(float64(k), markerY)
	pp.marker.LineTo(-1, markerY)
	return &pp.marker
}

func hasArcs(p *canvas.Path) bool {
	for s := p.Scanner(); s.Scan(); {
		if s.Cmd() == canvas.ArcToCmd {
			return true
		}
	}
	return false
}

// contentsRE finds a page's content stream.
var contentsRE = regexp.MustCompile(`/Contents (\d+) 0 R`)

// fill puts the recorded path data in place of every stand-in of a
// content stream: "k -999983 m -1 -999983 l" becomes the data, and a stroke operator
// after it ("S", "B") becomes its closing form ("s", "b") for a closed
// path, as canvas writes them.
func (pp *pdfPaths) fill(content []byte) ([]byte, error) {
	if pp == nil || len(pp.data) == 0 || !bytes.Contains(content, markerTail) {
		return content, nil
	}
	out := make([]byte, 0, len(content)+len(content)/2)
	rest := content
	for {
		at := bytes.Index(rest, markerTail)
		if at < 0 {
			break
		}
		start := at
		for start > 0 && rest[start-1] >= '0' && rest[start-1] <= '9' {
			start--
		}
		k, err := strconv.Atoi(string(rest[start:at]))
		if err != nil || k >= len(pp.data) || (start > 0 && rest[start-1] != ' ') {
			return nil, errors.New("content stream: a path stand-in names no path")
		}
		out = append(out, rest[:start]...)
		out = append(out, pp.data[k]...)
		rest = rest[at+len(markerTail):]
		if pp.closed[k] && len(rest) >= 2 && rest[0] == ' ' && (rest[1] == 'S' || rest[1] == 'B') {
			out = append(out, ' ', rest[1]+('a'-'A'))
			rest = rest[2:]
		}
	}
	return append(out, rest...), nil
}
