package book

import (
	"bytes"
	"fmt"

	"github.com/go-pdf/fpdf"
)

// contentsLines is how many entries one contents page holds.
const contentsLines = 40

// contentsPageCount is the number of contents pages: the two tables, a
// heading for the wells, and one line per well.
func contentsPageCount(in Input, wells int) int {
	n := 3 + wells
	if len(in.Sections) > 0 {
		n += 1 + len(in.Sections)
	}
	return (n + contentsLines - 1) / contentsLines
}

// typesetFront sets the cover and the contents.
func typesetFront(in Input, pl *plan) ([]byte, error) {
	f := newDoc(in, false)
	cover(f, in)
	footer(f, in, 1)
	contents(f, in, pl)
	if f.PageNo() != 1+pl.contentsPages {
		return nil, fmt.Errorf("book: contents took %d pages, planned %d", f.PageNo()-1, pl.contentsPages)
	}
	var buf bytes.Buffer
	if err := f.Output(&buf); err != nil {
		return nil, fmt.Errorf("book: cover and contents: %w", err)
	}
	return buf.Bytes(), nil
}

// cover lays out the first page. Positions are in mm from the page's top
// left: text starts 20 mm in, the logo fits 50 x 30 mm, the caution box
// sits 26 mm above the foot; a plain composition of our own.
func cover(f *doc, in Input) {
	p := in.Project
	tb := p.TitleBlock
	f.AddPage()
	pw, ph := f.GetPageSize()
	y := 30.0
	if p.Logo != nil {
		opt := fpdf.ImageOptions{ImageType: map[string]string{"png": "PNG", "jpeg": "JPG"}[p.Logo.Format]}
		f.RegisterImageOptionsReader("logo", opt, bytes.NewReader(p.Logo.Data))
		w := 50.0
		h := w * float64(p.Logo.Height) / float64(p.Logo.Width)
		if h > 30 {
			h, w = 30, 30*float64(p.Logo.Width)/float64(p.Logo.Height)
		}
		f.ImageOptions("logo", 20, 22, w, h, false, opt, 0, "")
		y = 22 + h + 12
	}
	f.SetXY(20, y+10)
	f.SetFont(family, "", 11)
	f.SetTextColor(80, 90, 100)
	f.CellFormat(0, 6, "Well construction logs", "", 1, "L", false, 0, "")
	f.SetX(20)
	f.SetFont(family, "B", 22)
	f.SetTextColor(0, 0, 0)
	f.MultiCell(pw-40, 10, p.Name, "", "L", false)
	f.SetFont(family, "", 12)
	for _, s := range []string{p.Site, p.Client} {
		if s != "" {
			f.SetX(20)
			f.MultiCell(pw-40, 6, s, "", "L", false)
		}
	}
	f.Ln(10)
	issued := in.Date.Format("2006-01-02")
	if !tb.Issued.IsZero() {
		issued = tb.Issued.String()
	}
	fields := [][2]string{
		{"Prepared for", p.Client}, {"Prepared by", joinNonEmpty(", ", tb.Consultant, tb.PreparedBy)},
		{"Checked by", tb.CheckedBy}, {"Approved by", tb.ApprovedBy},
		{"Report", tb.ReportNumber}, {"Job", tb.JobNumber}, {"Revision", tb.Revision},
		{"Issued", issued}, {"Wells", fmt.Sprint(len(in.Wells))},
	}
	f.SetFont(family, "", 10)
	for _, kv := range fields {
		if kv[1] == "" {
			continue
		}
		f.SetX(20)
		f.SetTextColor(80, 90, 100)
		f.CellFormat(35, 6, kv[0], "", 0, "L", false, 0, "")
		f.SetTextColor(0, 0, 0)
		f.MultiCell(pw-75, 6, kv[1], "", "L", false)
	}
	// The caution, boxed at the foot of the cover.
	f.SetFont(family, "B", 9)
	lines := f.SplitText(in.Caution, pw-48)
	h := float64(len(lines))*4.6 + 12
	top := ph - 26 - h
	f.SetDrawColor(150, 40, 30)
	f.SetLineWidth(0.5)
	f.Rect(20, top, pw-40, h, "D")
	f.SetXY(24, top+3)
	f.SetTextColor(150, 40, 30)
	f.CellFormat(0, 5, "Caution", "", 1, "L", false, 0, "")
	f.SetTextColor(0, 0, 0)
	f.SetFont(family, "", 9)
	f.SetX(24)
	f.MultiCell(pw-48, 4.6, in.Caution, "", "L", false)
}

func contents(f *doc, in Input, pl *plan) {
	type line struct {
		text, note string
		page       int
		bold       bool
	}
	lines := []line{
		{text: "Construction summary", page: pl.summaryPage(), bold: true},
		{text: "Findings and waivers", page: pl.findingsPage(), bold: true},
	}
	if len(in.Sections) > 0 {
		lines = append(lines, line{text: "Cross-sections", page: pl.sectionPage(0), bold: true})
		for i, s := range in.Sections {
			lines = append(lines, line{text: s.Name, page: pl.sectionPage(i)})
		}
	}
	lines = append(lines, line{text: "Well sheets", page: pl.wellPage(firstDrawn(pl)), bold: true})
	for i, w := range in.Wells {
		l := line{text: w.Name(), page: pl.wellPage(i)}
		switch {
		case w.Sheets == nil:
			l.note = "not drawn: " + w.Problem
		case pl.sheetCounts[i] > 1:
			l.note = fmt.Sprintf("%d sheets", pl.sheetCounts[i])
		}
		lines = append(lines, l)
	}
	pw, _ := f.GetPageSize()
	for i, l := range lines {
		if i%contentsLines == 0 {
			f.AddPage()
			f.SetFont(family, "B", 16)
			title := "Contents"
			if i > 0 {
				title += " (continued)"
			}
			f.CellFormat(0, 10, title, "", 1, "L", false, 0, "")
			f.Ln(3)
		}
		style := ""
		indent := 6.0
		if l.bold {
			style, indent = "B", 0
		}
		f.SetFont(family, style, 10)
		f.SetX(f.GetX() + indent)
		text := l.text
		if l.note != "" {
			text += "  (" + l.note + ")"
		}
		pageText := ""
		if l.page > 0 {
			pageText = fmt.Sprint(l.page)
		}
		w := pw - 28 - indent - 16
		for f.GetStringWidth(text) > w && len([]rune(text)) > 4 {
			r := []rune(text)
			text = string(r[:len(r)-2]) + "…"
		}
		f.CellFormat(w, 5.6, text, "", 0, "L", false, 0, "")
		f.CellFormat(16, 5.6, pageText, "", 1, "R", false, 0, "")
	}
}

// firstDrawn is the index of the first well with sheets, or 0.
func firstDrawn(pl *plan) int {
	for i, c := range pl.sheetCounts {
		if c > 0 {
			return i
		}
	}
	return 0
}

func joinNonEmpty(sep string, parts ...string) string {
	out := ""
	for _, p := range parts {
		if p == "" {
			continue
		}
		if out != "" {
			out += sep
		}
		out += p
	}
	return out
}
