package sheet

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
)

// Lithology descriptions: each stands beside its layer in the description
// column, placed like the labels. When a sheet's descriptions are taller
// than the column, the tallest give way one at a time to a one-line form
// whose other words go, under a mark Dn, to the notes (as component notes
// do); a description never runs past the log body. Should even the
// one-line forms not fit (a scale the user chose), the descriptions of
// the thinnest layers go to the notes whole, each note naming its depths.

// descEntry is one description on one sheet.
type descEntry struct {
	layer  int
	label  string    // the full text
	block  textBlock // as printed
	form   int       // descFull, descLine or descNoted
	mark   string    // Dn when words went to the notes
	rest   string    // the words in the note
	y0, y1 float64   // the layer's visible extent on the page
	top    float64   // the text's top
}

const (
	descFull  = iota // every word beside the layer
	descLine         // one line and a mark; the rest in the notes
	descNoted        // nothing beside the layer; all in the notes
)

// descMarkRoom is kept on a one-line description for its mark.
const descMarkRoom = " (D000)"

// descText is the x of the descriptions' text and its width.
func (l *layout) descText() (x, width float64) {
	dc := l.cols.desc
	return dc.X + 9, dc.W - 12
}

// descBounds is the y range descriptions may use on a sheet.
func (p *painter) descBounds() (lo, hi float64) {
	y0, y1 := p.clipY()
	return y0 + 1, y1 - 1
}

// descEntries lists the sheet's visible layers with their full texts.
func (p *painter) descEntries() []descEntry {
	l := p.l
	_, width := l.descText()
	var out []descEntry
	for i, ly := range l.w.Lithology {
		y0, y1, ok := p.vis(ly.Top, ly.Bottom)
		if !ok {
			continue
		}
		label := describe(ly)
		if sym, _, shown := l.columnSymbol(ly, y1-y0); !shown && sym != "" {
			label = sym + ": " + label // the group or rock label the column had no room for
		}
		var b textBlock
		b.add(label, draw.Regular, sizeSmall, width)
		out = append(out, descEntry{layer: i, label: label, block: b, y0: y0, y1: y1})
	}
	return out
}

// oneLine splits a description into the words that fit one line beside
// a mark and the rest.
func oneLine(label string, width float64) (head, rest string) {
	room := width - draw.TextWidth(draw.Regular, sizeSmall, descMarkRoom)
	words := strings.Fields(label)
	n := 0
	for n < len(words) && draw.TextWidth(draw.Regular, sizeSmall, strings.Join(words[:n+1], " ")) <= room {
		n++
	}
	// A line does not end on a word that leads into the next ("GRAVEL
	// with (D81)"): that word goes to the note with what it leads to.
	for n > 1 && leadWords[strings.ToLower(words[n-1])] {
		n--
	}
	// A cut description keeps whole clauses when it can: descriptions
	// run name first, then comma-separated descriptors (ASTM D2488's
	// order), so "SANDSTONE, coarse (D9)" with "grained, ..." in the note
	// would split a descriptor in two where "SANDSTONE (D9)" does not.
	// A clause ending on a lead word ("cobbles to 4 in,") would read as
	// unfinished once its comma goes: the cut takes the clause before.
	if n < len(words) {
		for j := n; j >= 1; j-- {
			w := words[j-1]
			if (strings.HasSuffix(w, ",") || strings.HasSuffix(w, ";")) && !leadWords[strings.ToLower(strings.TrimRight(w, ",;"))] {
				n = j
				break
			}
		}
	}
	return strings.TrimRight(strings.Join(words[:n], " "), ",;:"), strings.Join(words[n:], " ")
}

// leadWords are the words that lead into the next: a line cut after one
// reads as unfinished.
var leadWords = map[string]bool{"with": true, "and": true, "or": true, "of": true, "to": true, "in": true, "at": true, "on": true, "the": true, "a": true, "an": true, "from": true, "into": true, "some": true, "trace": true}

// setForm sets an entry's block in a form; mark "" keeps room for the
// widest mark.
func (e *descEntry) setForm(form int, width float64, mark string) {
	e.form = form
	e.block = textBlock{}
	switch form {
	case descFull:
		e.rest = ""
		e.block.add(e.label, draw.Regular, sizeSmall, width)
	case descLine:
		head, rest := oneLine(e.label, width)
		e.rest = rest
		if mark == "" {
			mark = strings.TrimSpace(descMarkRoom)
		} else {
			mark = "(" + mark + ")"
		}
		s := head
		if rest != "" {
			s = strings.TrimSpace(head + " " + mark)
		}
		e.block.add(s, draw.Regular, sizeSmall, width+1)
	default:
		e.rest = e.label
	}
}

// placeDescs places the entries that are printed; ok is false when they
// do not fit between lo and hi.
func placeDescs(es []descEntry, lo, hi float64) bool {
	var targets, heights []float64
	var idx []int
	for i, e := range es {
		if e.form == descNoted {
			continue
		}
		h := e.block.height()
		t := (e.y0+e.y1)/2 - h/2
		if e.y1-e.y0 >= h+2 {
			t = e.y0 + 1
		}
		targets, heights, idx = append(targets, t), append(heights, h), append(idx, i)
	}
	tops, ok := place(targets, heights, 1.5, lo, hi)
	for k, i := range idx {
		es[i].top = tops[k]
	}
	return ok
}

// fitDescs shrinks a sheet's descriptions until they fit: the tallest
// full one takes the one-line form, then the thinnest layers' go to the
// notes whole. It reports whether the one-line forms sufficed.
func fitDescs(es []descEntry, width, lo, hi float64) bool {
	enough := true
	for !placeDescs(es, lo, hi) {
		best := -1
		for i, e := range es {
			if e.form == descFull && len(e.block.lines) > 1 && (best < 0 || e.block.height() > es[best].block.height()) {
				best = i
			}
		}
		if best >= 0 {
			es[best].setForm(descLine, width, "")
			continue
		}
		thin := -1
		for i, e := range es {
			if e.form != descNoted && (thin < 0 || e.y1-e.y0 < es[thin].y1-es[thin].y0) {
				thin = i
			}
		}
		if thin < 0 {
			return false
		}
		es[thin].setForm(descNoted, width, "")
		enough = false
	}
	return enough
}

// textFits reports whether, at the current scale and sheets, every
// sheet's descriptions fit in their full or one-line forms and its labels
// stay within the drawing: what the automatic scale weighs besides depth.
func (l *layout) textFits() bool {
	_, width := l.descText()
	all := l.callouts()
	for i, sp := range l.sheets {
		p := l.painter(sp, i == 0, i == len(l.sheets)-1)
		lo, hi := p.descBounds()
		if !fitDescs(p.descEntries(), width, lo, hi) {
			return false
		}
		for _, pc := range p.calloutsFor(all) {
			if pc.box.Y < l.plot.Y-0.01 || pc.box.Bottom() > l.plot.Bottom()+0.01 {
				return false
			}
		}
	}
	return true
}

// planDescriptions fits each sheet's descriptions, numbers the marks of
// those that left words off, D1, D2, ... in depth order, and returns each
// sheet's notes for them.
func (l *layout) planDescriptions(noteW float64) [][]noteBlock {
	_, width := l.descText()
	next := 1
	l.sheetDescs = make([][]descEntry, len(l.sheets))
	notes := make([][]noteBlock, len(l.sheets))
	// A layer across a match line shows on both sheets: when the words
	// left off are the same, the second keeps the first's mark and note.
	type noted struct{ mark, rest string }
	prev := map[int]noted{}
	for i, sp := range l.sheets {
		p := l.painter(sp, i == 0, i == len(l.sheets)-1)
		lo, hi := p.descBounds()
		es := p.descEntries()
		fitDescs(es, width, lo, hi)
		cur := map[int]noted{}
		for k := range es {
			e := &es[k]
			if e.rest == "" {
				continue
			}
			if n, ok := prev[e.layer]; ok && n.rest == e.rest {
				e.mark = n.mark
				if e.form != descNoted {
					e.setForm(e.form, width, e.mark)
				}
				cur[e.layer] = n
				continue
			}
			e.mark = fmt.Sprintf("D%d", next)
			next++
			cur[e.layer] = noted{e.mark, e.rest}
			ly := l.w.Lithology[e.layer]
			var b textBlock
			if e.form == descNoted {
				b.addLead(e.mark+".", l.interval(ly.Interval)+": "+e.rest, sizeSmall, noteW)
			} else {
				e.setForm(e.form, width, e.mark)
				b.addLead(e.mark+".", l.interval(ly.Interval)+", continued: "+e.rest, sizeSmall, noteW)
			}
			notes[i] = append(notes[i], noteBlock{block: b, color: ink, role: "description-note"})
		}
		placeDescs(es, lo, hi)
		l.sheetDescs[i] = es
		prev = cur
	}
	return notes
}
