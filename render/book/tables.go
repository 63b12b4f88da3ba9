package book

import (
	"bytes"
	"fmt"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/render/table"
)

// summaryColumns are the summary table's columns the book prints (the
// coordinates stay in the CSV and XLSX: they do not fit a page), with
// their relative widths.
var summaryColumns = []struct {
	header string
	width  float64
}{
	{"Well", 1.1}, {"String", 0.9}, {"Purpose", 1.3}, {"Ground elev.", 1.1}, {"MP elev.", 1}, {"Total depth", 0.9},
	{"Casing size", 1.3}, {"Casing material", 1.1}, {"Screen top", 0.9}, {"Screen bottom", 1},
	{"Screen top elev.", 1}, {"Screen bottom elev.", 1}, {"Slot", 1}, {"Filter pack", 2},
	{"Seal", 1.8}, {"Grout", 2}, {"Water level", 0.9}, {"Water level date", 1.45},
	{"Water level elev.", 1}, {"Check status", 1.3},
}

// typesetTables sets the summary and the findings on landscape pages
// numbered from first, and returns the PDF, its page count and the page
// (1-based, within it) where the findings begin.
func typesetTables(in Input, first int) ([]byte, int, int, error) {
	f := newDoc(in, true)
	footer(f, in, first)

	cols := in.Table.Columns()
	byHeader := map[string]table.Column{}
	for _, c := range cols {
		byHeader[c.Header] = c
	}
	var gc []gridCol
	var picked []table.Column
	for _, sc := range summaryColumns {
		c, ok := byHeader[sc.header]
		if !ok {
			continue
		}
		numeric := false
		var whole []string
		for _, r := range in.Table.Rows {
			v := c.Value(r)
			numeric = numeric || v.Num != nil
			// Short words (a purpose, a status, a number) stay whole;
			// long free text may still wrap inside a word.
			for _, w := range strings.Fields(v.String()) {
				if len([]rune(w)) <= 20 {
					whole = append(whole, w)
				}
			}
		}
		gc = append(gc, gridCol{title: c.Title(), width: sc.width, right: numeric, whole: whole})
		picked = append(picked, c)
	}
	g := newGrid(f, fmt.Sprintf("Construction summary (depths below ground and elevations in %s)", in.Table.Units), gc, 6)
	g.page(false)
	for _, r := range in.Table.Rows {
		cells := make([]string, len(picked))
		for i, c := range picked {
			cells[i] = c.Value(r).String()
		}
		if r.ID == "" {
			cells[0] = r.File
		}
		g.row(cells)
	}

	findingsAt := f.PageNo() + 1
	fcols := []gridCol{
		{title: "Well", width: 1.2}, {title: "Rule", width: 2.4}, {title: "Status", width: 0.9},
		{title: "Line", width: 0.6, right: true}, {title: "Finding", width: 7}, {title: "Waiver", width: 3.2},
	}
	if in.Issue {
		fcols = []gridCol{{title: "Well", width: 1.2}, {title: "Status", width: 1.6}, {title: "Finding", width: 8.3}, {title: "Accepted because", width: 4.2}}
	}
	fg := newGrid(f, "Findings and waivers", fcols, 7)
	fg.intro = tally(in)
	if !anyFindingRows(in) {
		// A table head over no rows reads as if rows went missing.
		fg.intro = countWells(in) + " No well has a finding, and none is waived."
		fg.bare = true
	}
	fg.page(false)
	for _, w := range in.Wells {
		if w.Problem != "" && w.Sheets == nil {
			if in.Issue {
				fg.row([]string{w.Name(), "not drawn", w.Problem, ""})
			} else {
				fg.row([]string{w.Name(), "—", "not drawn", "", w.Problem, ""})
			}
		}
		for _, fd := range w.Findings {
			waiver := ""
			if fd.Waiver != nil {
				waiver = strings.TrimSuffix(fd.Waiver.Reason+" — "+fd.Waiver.ApprovedBy+", "+fd.Waiver.Date, ", ")
			}
			if in.Issue {
				status := map[bool]string{true: "accepted departure", false: "review remark"}[fd.Waived]
				fg.row([]string{w.Name(), status, fd.Message, waiver})
				continue
			}
			fg.row([]string{w.Name(), fd.Rule, fd.Label(), strconv.Itoa(fd.Line), fd.Message, waiver})
		}
	}
	if f.GetY()+20 > fg.bottom {
		fg.page(true)
	}
	f.Ln(3)
	f.SetFont(family, "I", 8)
	f.MultiCell(0, 4, in.Caution, "", "L", false)

	var buf bytes.Buffer
	if err := f.Output(&buf); err != nil {
		return nil, 0, 0, fmt.Errorf("book: tables: %w", err)
	}
	return buf.Bytes(), f.PageNo(), findingsAt, nil
}

// statusWords is a status as the count of wells reads it: "1 with errors",
// not "1 errors".
var statusWords = map[table.Status]string{table.Clean: "clean", table.Warnings: "with warnings", table.Errors: "with errors",
	table.Waived: "waived", table.Planned: "planned", table.Unreadable: "unreadable"}

// tally counts the wells by check status and says what the findings
// table lists.
func tally(in Input) string {
	return countWells(in) + " Wells without findings are not listed. A waived finding is listed with its waiver and no longer fails the check."
}

// countWells counts the wells by check status: "8 wells: 4 clean, 1 with
// errors, ...".
func countWells(in Input) string {
	counts := map[table.Status]int{}
	for i, r := range in.Table.Rows {
		if in.Table.FirstOfWell(i) {
			counts[r.Status]++ // a well once, whatever its strings
		}
	}
	var parts []string
	for _, s := range []table.Status{table.Clean, table.Warnings, table.Errors, table.Waived, table.Planned, table.Unreadable} {
		if counts[s] > 0 {
			parts = append(parts, fmt.Sprintf("%d %s", counts[s], statusWords[s]))
		}
	}
	wells := "wells"
	if in.Table.Wells() == 1 {
		wells = "well"
	}
	return fmt.Sprintf("%d %s: %s.", in.Table.Wells(), wells, strings.Join(parts, ", "))
}

// anyFindingRows reports whether the findings table has a row: a
// finding, or a well that could not be drawn.
func anyFindingRows(in Input) bool {
	for _, w := range in.Wells {
		if len(w.Findings) > 0 || (w.Problem != "" && w.Sheets == nil) {
			return true
		}
	}
	return false
}

// footer numbers pages from first and names the project.
func footer(f *doc, in Input, first int) {
	f.SetFooterFunc(func() {
		_, h := f.GetPageSize()
		f.SetXY(14, h-10)
		f.SetFont(family, "", 7)
		f.SetTextColor(90, 90, 90)
		left := in.Project.Name
		if r := in.Project.TitleBlock.ReportNumber; r != "" {
			left += " · " + r
		}
		f.CellFormat(0, 4, left, "", 0, "L", false, 0, "")
		f.SetX(14)
		f.CellFormat(0, 4, fmt.Sprintf("page %d", first+f.PageNo()-1), "", 0, "R", false, 0, "")
		f.SetTextColor(0, 0, 0)
	})
}
