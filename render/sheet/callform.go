package sheet

import (
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// callout labels one component: a bold title, lines of specification,
// and the point on the drawing its leader reaches.
type callout struct {
	key     string          // the drawn component's role, e.g. "interval:fill[2]"
	iv      schema.Interval // the component's extent; Top == Bottom for a point
	anchorX func(d schema.Length) float64
	also    []func(d schema.Length) float64 // more points at the same depth, for a callout shared by strings
	title   string
	lines   []string
	minor   map[int]bool // lines dropped first when labels must shrink
	where   int          // the line naming the interval, kept on the label when the rest goes to the notes
	rank    int          // tie-break among equal depths: outer things first
	base    string       // the title without the string's name, for merging
	of      []string     // the strings a string part's callout names
}

// Label forms, fullest first; a crowded sheet shrinks its tallest labels
// one form at a time until they all fit. No form drops words: the last
// keeps one line at the depth and sends the rest to the notes.
const (
	formFull      = iota // bold title line, then one line per item
	formParagraph        // run-in bold title, items in one paragraph
	formShort            // paragraph, the minor items in the notes
	formNoted            // one line, the rest in the notes
	formCount
)

// noteMarkRoom is the width kept on a noted label for its reference
// mark, measured on a mark wider than any the sheet will print.
const noteMarkRoom = " (C000)"

// block sets the label in a form. A form that leaves words off carries
// the reference mark of the note holding them; with mark "" room is kept
// for the widest mark, so the label's height is known before the notes
// are numbered.
func (c callout) block(form int, width float64, mark string) textBlock {
	if mark == "" {
		mark = strings.TrimSpace(noteMarkRoom)
	} else {
		mark = "(" + mark + ")"
	}
	var b textBlock
	switch form {
	case formFull:
		b.add(c.title, draw.Bold, sizeSmall, width)
		for _, s := range c.lines {
			b.add(s, draw.Regular, sizeSmall, width)
		}
	case formParagraph, formShort:
		var keep []string
		for i, s := range c.lines {
			if form == formParagraph || !c.minor[i] {
				keep = append(keep, s)
			}
		}
		p := strings.Join(keep, "; ")
		if c.rest(form, width) != "" {
			p += " " + mark
		}
		b.addLead(c.title+":", p, sizeSmall, width)
	default:
		head, rest := c.split(width)
		s := " " + head
		if rest != "" {
			s += " " + mark
		}
		b.lines = []textLine{{lead: c.title + ":", s: s, font: draw.Regular, size: sizeSmall}}
	}
	return b
}

// rest is what a form leaves off the label, for the notes.
func (c callout) rest(form int, width float64) string {
	switch form {
	case formFull, formParagraph:
		return ""
	case formShort:
		var off []string
		for i, s := range c.lines {
			if c.minor[i] {
				off = append(off, s)
			}
		}
		return strings.Join(off, "; ")
	}
	_, rest := c.split(width)
	return rest
}

// split divides the label's words for the one-line form: the head that
// fits one line after the title (with room for a reference mark) and the
// rest, for the notes. The interval comes first, then the other items,
// then the minor ones; whole items are kept on the line when they fit.
func (c callout) split(width float64) (head, rest string) {
	var items []string
	if c.where >= 0 && c.where < len(c.lines) {
		items = append(items, c.lines[c.where])
	}
	for _, minor := range []bool{false, true} {
		for i, s := range c.lines {
			if i != c.where && c.minor[i] == minor {
				items = append(items, s)
			}
		}
	}
	room := width - draw.TextWidth(draw.Bold, sizeSmall, c.title+":") - draw.TextWidth(draw.Regular, sizeSmall, " "+noteMarkRoom)
	fits := func(s string) bool { return draw.TextWidth(draw.Regular, sizeSmall, s) <= room }
	k := 0
	for k < len(items) && fits(strings.Join(items[:k+1], "; ")) {
		k++
	}
	if k == 0 && len(items) > 0 {
		// Not even the first item fits whole: as many of its words as do.
		words := strings.Fields(items[0])
		n := 0
		for n < len(words) && fits(strings.Join(words[:n+1], " ")) {
			n++
		}
		head = strings.TrimRight(strings.Join(words[:n], " "), ",;")
		tail := strings.Join(words[n:], " ")
		return head, strings.Join(append([]string{tail}, items[1:]...), "; ")
	}
	return strings.Join(items[:k], "; "), strings.Join(items[k:], "; ")
}
