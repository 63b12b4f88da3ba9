package sheet

import (
	"sort"

	"github.com/tremie-dev/tremie/render/draw"
)

// Callout geometry.
const (
	calloutGap  = 2.0
	leaderLane  = 14.0 // between the well column and the label text
	calloutPadX = 2.0
)

// placedCallout is a label with its final box.
type placedCallout struct {
	c       callout
	block   textBlock
	anchorY float64
	anchorX float64
	dotsX   []float64 // every point the label names, anchorX the leftmost
	box     draw.Rect
	form    int
	rest    string // the words the form leaves to the notes
	mark    string // the note's reference mark, set once notes are numbered
}

// calloutsFor places the callouts visible on a sheet. It returns them in
// depth order with their boxes, compacting labels (down to one line at
// the depth, the rest of the words for the notes) when the full ones do
// not fit the column.
func (p *painter) calloutsFor(all []callout) []placedCallout {
	l := p.l
	var vis []placedCallout
	for _, c := range all {
		t, b := max(c.iv.Top, p.dlo), min(c.iv.Bottom, p.dhi)
		if c.iv.Top == c.iv.Bottom {
			if !p.visible(c.iv.Top) {
				continue
			}
			t, b = c.iv.Top, c.iv.Top
		} else if !(b > t) {
			continue
		}
		d := (t + b) / 2
		pc := placedCallout{c: c, anchorY: p.y(d), anchorX: c.anchorX(d)}
		pc.dotsX = []float64{pc.anchorX}
		for _, f := range c.also {
			x := f(d)
			pc.dotsX = append(pc.dotsX, x)
			pc.anchorX = min(pc.anchorX, x)
		}
		vis = append(vis, pc)
	}
	sort.SliceStable(vis, func(i, j int) bool {
		if vis[i].anchorY != vis[j].anchorY {
			return vis[i].anchorY < vis[j].anchorY
		}
		return vis[i].c.rank < vis[j].c.rank
	})
	// Leaders that would start at one height from different points are
	// told apart by moving the later anchor down a little (the anchor,
	// not the label: labels are placed below).
	for i := 1; i < len(vis); i++ {
		if vis[i].anchorY-vis[i-1].anchorY < 2.5 {
			if ny := vis[i-1].anchorY + 2.5; p.anchorFits(vis[i].c, ny) {
				vis[i].anchorY = ny
			}
		}
	}
	col := l.cols.call
	textX := col.X + leaderLane
	width := col.Right() - textX - calloutPadX
	y0, y1 := p.clipY()
	lo, hi := y0+1, y1-1
	forms := make([]int, len(vis))
	targets := make([]float64, len(vis))
	heights := make([]float64, len(vis))
	for i := range vis {
		vis[i].block = vis[i].c.block(formFull, width, "")
		heights[i] = vis[i].block.height() + 1
		targets[i] = vis[i].anchorY - lineGap(sizeSmall)/2
	}
	for {
		tops, ok := place(targets, heights, calloutGap, lo, hi)
		for i := range vis {
			vis[i].box = draw.Rect{X: textX - 1, Y: tops[i], W: width + 2, H: heights[i]}
		}
		if ok {
			relax(vis, forms, targets, heights, width, lo, hi)
			return finishForms(vis, width)
		}
		// Shrink one label: every label goes to the next form before any
		// goes further, tallest first, so the sheet reads evenly.
		k := -1
		for i := range vis {
			if forms[i] >= formCount-1 {
				continue
			}
			if k < 0 || forms[i] < forms[k] || forms[i] == forms[k] && heights[i] > heights[k] {
				k = i
			}
		}
		if k < 0 {
			return finishForms(vis, width) // one line each and still too many: they run on past the column
		}
		forms[k]++
		vis[k].form = forms[k]
		vis[k].block = vis[k].c.block(forms[k], width, "")
		heights[k] = vis[k].block.height() + 1
	}
}

// relax gives back words: the even shrinking above can leave room. It
// first restores whole labels to the paragraph form (no note), the
// cheapest in height first, while every label still fits; then lets
// labels still noted keep their major items (a shorter note).
func relax(vis []placedCallout, forms []int, targets, heights []float64, width, lo, hi float64) {
	try := func(i, f int) bool {
		b := vis[i].c.block(f, width, "")
		h := heights[i]
		heights[i] = b.height() + 1
		tops, ok := place(targets, heights, calloutGap, lo, hi)
		if !ok {
			heights[i] = h
			return false
		}
		forms[i], vis[i].form, vis[i].block = f, f, b
		for k := range vis {
			vis[k].box.Y, vis[k].box.H = tops[k], heights[k]
		}
		return true
	}
	failed := make([]bool, len(vis))
	for {
		k, cost := -1, 0.0
		for i := range vis {
			if failed[i] || vis[i].c.rest(forms[i], width) == "" {
				continue
			}
			pb := vis[i].c.block(formParagraph, width, "")
			c := pb.height() + 1 - heights[i]
			if k < 0 || c < cost {
				k, cost = i, c
			}
		}
		if k < 0 {
			break
		}
		if !try(k, formParagraph) {
			failed[k] = true
		}
	}
	for i := range vis {
		if forms[i] == formNoted && vis[i].c.rest(formShort, width) != vis[i].c.rest(formNoted, width) {
			try(i, formShort)
		}
	}
}

// finishForms records what each label's form leaves to the notes.
func finishForms(vis []placedCallout, width float64) []placedCallout {
	for i := range vis {
		vis[i].rest = vis[i].c.rest(vis[i].form, width)
	}
	return vis
}

// anchorFits reports whether page y lies on the visible part of a
// component, so an anchor moved there still points at it.
func (p *painter) anchorFits(c callout, y float64) bool {
	if c.iv.Top == c.iv.Bottom {
		return false
	}
	y0, y1, ok := p.vis(c.iv.Top, c.iv.Bottom)
	return ok && y > y0+0.5 && y < y1-0.5
}
