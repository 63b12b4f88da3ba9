// Package book binds a project into one PDF: a cover, a contents page,
// the construction summary table, the table of findings and waivers, then
// every well's sheets, with an outline entry (bookmark) per well. The
// tabular pages are typeset with go-pdf/fpdf; pdfcpu merges them with the
// well sheets (PDFs from render/out) and writes the outline. The same
// input gives the same bytes: every date is the input's, never the clock.
package book

import (
	"fmt"
	"time"

	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Caution is printed on the cover and under the findings.
const Caution = "Figures and checks support, and never replace, the review of a licensed professional and the governing local well code; rule thresholds are defaults to be set to the local rules."

// Input is everything a book shows.
type Input struct {
	Project *project.Project
	Date    time.Time    // printed and written as the PDF's dates
	Table   *table.Table // the construction summary
	Wells   []Well       // in book order
	// Sections are the project's cross-sections, bound after the tables
	// and before the well sheets.
	Sections []Section
	// PageWidth and PageHeight are the portrait page size in points for
	// the cover and contents; 0 means US Letter. Tables use it turned.
	PageWidth, PageHeight float64
	Caution               string // "" for Caution
	// Issue binds the issued set: its findings table states waivers and
	// remarks in plain words, with no rule IDs or file lines.
	Issue bool
}

// Well is one well's part of the book.
type Well struct {
	ID       string // "" when the file could not be read
	File     string
	Findings []rules.Finding
	Sheets   []byte // the well's sheets as one PDF; nil when none were drawn
	Problem  string // why there are no sheets
}

// Section is one cross-section's part of the book.
type Section struct {
	Name  string
	Sheet []byte // the section as a PDF
}

// Name is the well's ID, or its file when it has none.
func (w Well) Name() string {
	if w.ID != "" {
		return w.ID
	}
	return w.File
}

// Build writes the book.
func Build(in Input) ([]byte, error) {
	if in.Project == nil || in.Table == nil {
		return nil, fmt.Errorf("book: no project or table")
	}
	if in.PageWidth == 0 {
		in.PageWidth, in.PageHeight = 612, 792
	}
	if in.Caution == "" {
		in.Caution = Caution
	}
	counts, err := sheetPages(in.Wells)
	if err != nil {
		return nil, err
	}
	secCounts, err := sectionPages(in.Sections)
	if err != nil {
		return nil, err
	}
	pl := plan{in: in, sheetCounts: counts, sectionCounts: secCounts}
	pl.contentsPages = contentsPageCount(in, len(in.Wells))
	tables, tablePages, findingsAt, err := typesetTables(in, pl.firstTablePage())
	if err != nil {
		return nil, err
	}
	pl.tablePages, pl.findingsAt = tablePages, findingsAt
	front, err := typesetFront(in, &pl)
	if err != nil {
		return nil, err
	}
	return bind(front, tables, in, &pl)
}

// plan is where everything falls, in 1-based book pages.
type plan struct {
	in            Input
	sheetCounts   []int // pages of each well's sheets (0 if none)
	sectionCounts []int // pages of each cross-section
	contentsPages int
	tablePages    int
	findingsAt    int // first page of the findings table, within the tables
}

func (p *plan) firstTablePage() int { return 1 + p.contentsPages + 1 }

func (p *plan) summaryPage() int  { return p.firstTablePage() }
func (p *plan) findingsPage() int { return p.firstTablePage() + p.findingsAt - 1 }

// wellPage is the first page of well i's sheets, or 0 if it has none.
func (p *plan) wellPage(i int) int {
	if p.sheetCounts[i] == 0 {
		return 0
	}
	n := p.sectionPage(len(p.sectionCounts))
	for j := 0; j < i; j++ {
		n += p.sheetCounts[j]
	}
	return n
}

// sectionPage is the first page of cross-section i (for i equal to the
// number of sections: the page after the last one).
func (p *plan) sectionPage(i int) int {
	n := 1 + p.contentsPages + p.tablePages + 1
	for j := 0; j < i; j++ {
		n += p.sectionCounts[j]
	}
	return n
}

// total is the book's page count.
func (p *plan) total() int {
	n := p.sectionPage(len(p.sectionCounts)) - 1
	for _, c := range p.sheetCounts {
		n += c
	}
	return n
}
