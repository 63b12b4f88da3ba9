package section

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/schema"
)

// collectNotes gathers what the reader must know about how the section
// was drawn: the method, wells off the line, columns moved apart,
// scales that did not fit.
func (l *layout) collectNotes() {
	l.notes = append(l.notes, "Distances: "+l.method+".")
	maxOff := float64(l.in.Section.MaxOffset)
	if maxOff == 0 {
		maxOff = l.line.length() / 10
	}
	for _, p := range l.wells {
		if p.offset > maxOff {
			l.notes = append(l.notes, fmt.Sprintf("%s lies %s %s off the line.", p.w.ID, schema.TrimFloat(schema.Length(p.offset).In(l.u), 0), l.u))
		}
	}
	var moved []string
	for _, p := range l.wells {
		if p.moved {
			moved = append(moved, p.w.ID)
		}
	}
	if len(moved) > 0 {
		l.notes = append(l.notes, "Columns of "+strings.Join(moved, ", ")+" drawn apart from their true distance so that they do not touch; the distance axis ticks the true distances.")
	}
	if back := chainageOrder(l.wells); len(back) > 0 {
		l.notes = append(l.notes, "Drawn in order of distance along the line, which differs from the order listed ("+strings.Join(back, ", ")+").")
	}
	if !l.vFits || !l.hFits {
		l.notes = append(l.notes, "The section is larger than the sheet at the coarsest round scale; parts run past the plot's edge. Use a larger page or a shorter line.")
	}
	l.notes = append(l.notes, "Well columns and pipe widths are schematic; depths and elevations are to the vertical scale. Holes taken as vertical.")
}

// titleItems draws the title block: project and site, the section's
// name and wells, the scales, the notes, the caution.
func (l *layout) titleItems() []draw.Item {
	r := l.titleBox
	items := []draw.Item{draw.Box{Rect: r, Style: draw.Style{Stroke: ink, StrokeWidth: 0.8}, Role: "section-title"}}
	c1 := r.W * 0.28
	c2 := r.W * 0.30
	cells := []draw.Rect{
		{X: r.X, Y: r.Y, W: c1, H: r.H},
		{X: r.X + c1, Y: r.Y, W: c2, H: r.H},
		{X: r.X + c1 + c2, Y: r.Y, W: r.W - c1 - c2, H: r.H},
	}
	for _, c := range cells[1:] {
		items = append(items, draw.Shape{Points: []draw.Point{{X: c.X, Y: c.Y}, {X: c.X, Y: c.Bottom()}}, Style: draw.Style{Stroke: ink, StrokeWidth: 0.5}})
	}
	var ids []string
	for _, p := range l.ordered {
		ids = append(ids, p.w.ID)
	}
	pr := l.in.Project
	var proj, site, firm, who string
	if pr != nil {
		proj, site = pr.Name, pr.Site
		tb := pr.TitleBlock
		firm = tb.Consultant
		who = joinNonEmpty(" · ", prefixed("Job ", tb.JobNumber), prefixed("Report ", tb.ReportNumber), prefixed("Rev. ", tb.Revision), prefixed("Prepared ", tb.PreparedBy), prefixed("Checked ", tb.CheckedBy), prefixed("Issued ", tb.Issued.String()))
	}
	items = append(items, l.cell(cells[0], []line{
		{"CROSS-SECTION " + l.in.Section.Name, draw.Bold, sizeTitle},
		{proj, draw.Bold, sizeLabel},
		{site, draw.Regular, sizeSmall},
		{firm, draw.Regular, sizeSmall},
		{who, draw.Regular, sizeSmall},
	}, "section-title-name")...)
	items = append(items, l.cell(cells[1], []line{
		{"Wells: " + strings.Join(ids, ", "), draw.Regular, sizeSmall},
		{"Vertical scale " + l.vs.String() + "; horizontal scale " + l.hs.String() + "; " + exaggeration(l.hs, l.vs), draw.Bold, sizeSmall},
		{strings.Join(l.notes, " "), draw.Regular, sizeSmall},
	}, "section-title-scales")...)
	items = append(items, l.cell(cells[2], []line{
		{"Caution", draw.Bold, sizeSmall},
		{Caution, draw.Regular, sizeSmall},
		{"Drawn by tremie from the wells' as-built files.", draw.Italic, sizeSmall},
	}, "section-caution")...)
	return items
}

// line is one paragraph of a title cell.
type line struct {
	s    string
	font draw.FontStyle
	size float64
}

// cell sets paragraphs in a cell, wrapped; a paragraph that would run
// past the cell shrinks before anything is left out.
func (l *layout) cell(r draw.Rect, ps []line, role string) []draw.Item {
	for _, shrink := range []float64{1, 0.9, 0.8, 0.7} {
		items, ok := setCell(r, ps, role, shrink)
		if ok {
			return items
		}
	}
	items, _ := setCell(r, ps, role, 0.65)
	return items
}

func setCell(r draw.Rect, ps []line, role string, shrink float64) ([]draw.Item, bool) {
	var items []draw.Item
	y := r.Y + 4
	for _, p := range ps {
		if p.s == "" {
			continue
		}
		size := p.size * shrink
		for _, ln := range draw.Wrap(p.font, size, p.s, r.W-8) {
			y += size * 1.18
			items = append(items, draw.Text{At: draw.Point{X: r.X + 4, Y: y}, S: ln, Size: size, Font: p.font, Color: ink, Role: role})
		}
		y += 1.5
	}
	return items, y <= r.Bottom()-2
}

func prefixed(p, s string) string {
	if s == "" {
		return ""
	}
	return p + s
}

func joinNonEmpty(sep string, parts ...string) string {
	var out []string
	for _, p := range parts {
		if p != "" {
			out = append(out, p)
		}
	}
	return strings.Join(out, sep)
}
