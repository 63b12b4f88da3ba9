package sheet

import (
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
)

// Type sizes, in points. Nothing on a sheet is set below 6 pt.
const (
	sizeTiny    = 6.0 // field labels, axis titles
	sizeSmall   = 6.5 // callouts, descriptions, table cells
	sizeBody    = 7.5 // title-block values
	sizeHeading = 8.0 // area headings
	sizeTitle   = 15.0
)

// Ink colours: near-black for line work and text, a grey for secondary
// labels and a vermilion for what must stop the reader (the "not final"
// stamp and error findings), from the Okabe and Ito colour-blind-safe set.
var (
	ink       = draw.RGB(25, 25, 25)
	grey      = draw.RGB(105, 105, 105)
	lightGrey = draw.RGB(200, 200, 200)
	alarm     = draw.RGB(213, 94, 0)
	waterBlue = draw.RGB(0, 114, 178)
)

// lineGap is the baseline-to-baseline distance for a size: a little
// tighter than the font's own recommendation, as drafting text is set.
func lineGap(size float64) float64 { return size * 1.2 }

// textBlock is wrapped text ready to stand at a position: each line with
// its font, and the block's height.
type textBlock struct {
	lines []textLine
	width float64 // widest line
}

type textLine struct {
	lead string // set in bold before s, for a label's run-in title
	s    string
	font draw.FontStyle
	size float64
}

// addLead wraps a paragraph that opens with a bold run-in lead: the
// first line holds the lead and as many words as fit after it.
func (b *textBlock) addLead(lead, s string, size, width float64) {
	lw := draw.TextWidth(draw.Bold, size, lead)
	words := strings.Fields(s)
	first := ""
	k := 0
	for k < len(words) {
		try := strings.TrimSpace(first + " " + words[k])
		if lw+draw.TextWidth(draw.Regular, size, " "+try) > width && first != "" {
			break
		}
		if lw+draw.TextWidth(draw.Regular, size, " "+try) > width {
			break
		}
		first = try
		k++
	}
	if first != "" {
		first = " " + first
	}
	b.lines = append(b.lines, textLine{lead: lead, s: first, font: draw.Regular, size: size})
	b.width = max(b.width, lw+draw.TextWidth(draw.Regular, size, first))
	if k < len(words) {
		b.add(strings.Join(words[k:], " "), draw.Regular, size, width)
	}
}

// add wraps s into the block at width.
func (b *textBlock) add(s string, font draw.FontStyle, size, width float64) {
	for _, l := range draw.Wrap(font, size, s, width) {
		b.lines = append(b.lines, textLine{s: l, font: font, size: size})
		if w := draw.TextWidth(font, size, l); w > b.width {
			b.width = w
		}
	}
}

// rewrapped is the block wrapped again at width: a block of one
// paragraph in one font and size (its lead, if any, kept in front);
// another block is returned as it is.
func (b textBlock) rewrapped(width float64) textBlock {
	if len(b.lines) == 0 {
		return b
	}
	first := b.lines[0]
	words := make([]string, 0, len(b.lines))
	for i, ln := range b.lines {
		if ln.font != first.font || ln.size != first.size || (i > 0 && ln.lead != "") {
			return b
		}
		words = append(words, strings.TrimSpace(ln.s))
	}
	var out textBlock
	s := strings.TrimSpace(strings.Join(words, " "))
	if first.lead != "" {
		out.addLead(first.lead, s, first.size, width)
	} else {
		out.add(s, first.font, first.size, width)
	}
	return out
}

// height is the block's height from the top of its first line to below
// its last.
func (b *textBlock) height() float64 {
	h := 0.0
	for _, l := range b.lines {
		h += lineGap(l.size)
	}
	return h
}

// items sets the block with its top-left corner at (x, y).
func (b *textBlock) items(x, y float64, color draw.Color, role string) []draw.Item {
	var out []draw.Item
	for _, l := range b.lines {
		base := y + draw.Ascent(l.font, l.size)
		y += lineGap(l.size)
		lx := x
		if l.lead != "" {
			out = append(out, draw.Text{At: draw.Point{X: x, Y: base}, S: l.lead, Size: l.size, Font: draw.Bold, Color: color, Role: role})
			lx += draw.TextWidth(draw.Bold, l.size, l.lead)
		}
		if l.s != "" {
			out = append(out, draw.Text{At: draw.Point{X: lx, Y: base}, S: l.s, Size: l.size, Font: l.font, Color: color, Role: role})
		}
	}
	return out
}

// text is one line at a baseline point.
func text(x, y float64, s string, font draw.FontStyle, size float64, anchor draw.Anchor, color draw.Color, role string) draw.Text {
	return draw.Text{At: draw.Point{X: x, Y: y}, S: s, Size: size, Font: font, Anchor: anchor, Color: color, Role: role}
}

// fit shortens s with an ellipsis until it fits width.
func fit(s string, font draw.FontStyle, size, width float64) string {
	if draw.TextWidth(font, size, s) <= width {
		return s
	}
	r := []rune(s)
	for len(r) > 0 {
		r = r[:len(r)-1]
		if t := string(r) + "…"; draw.TextWidth(font, size, t) <= width {
			return t
		}
	}
	return ""
}

func line(x0, y0, x1, y1, width float64, color draw.Color, role string) draw.Shape {
	return draw.Shape{Style: draw.Style{Stroke: color, StrokeWidth: width}, Points: []draw.Point{{X: x0, Y: y0}, {X: x1, Y: y1}}, Role: role}
}

func box(r draw.Rect, stroke draw.Color, width float64, fill draw.Color, role string) draw.Box {
	return draw.Box{Style: draw.Style{Stroke: stroke, StrokeWidth: width, Fill: fill}, Rect: r, Role: role}
}
