package pipeline

import (
	"fmt"
	"time"

	"github.com/tremie-dev/tremie/render/book"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Table is the construction summary of prepared wells, lengths in the
// project's unit.
func Table(p *project.Project, wells []*Well) *table.Table {
	return table.Build(Entries(wells), p.Units)
}

// Entries are prepared wells as the summary table reads them.
func Entries(wells []*Well) []table.Entry {
	es := make([]table.Entry, len(wells))
	for i, w := range wells {
		es[i] = table.Entry{File: w.Path, Well: w.Well, Findings: w.Findings, Err: w.Err}
	}
	return es
}

// Book draws every prepared well of a project as PDF sheets, dated with
// the project's date, and binds them with the cover, contents, summary
// and findings into one PDF. A well that cannot be drawn is listed with
// its problem and returned in problems; the book is still made.
func (r *Run) Book(p *project.Project, wells []*Well) (pdf []byte, problems []error, err error) {
	date := r.ProjectDate(p, wells)
	res, _ := batch.Run(wells, batch.Options{Progress: r.progress(), Label: "drawing"}, func(_ int, w *Well) (book.Well, batch.Outcome, error) {
		bw := book.Well{File: p.Key(w.Path), Findings: w.Findings, ID: w.ID}
		if w.Well == nil {
			bw.Problem = "could not be read"
			return bw, batch.Skipped, nil
		}
		doc, err := w.Layout(LayoutOptions{Date: date.Format(time.RFC3339)})
		if err == nil {
			bw.Sheets, err = out.PDF(doc)
		}
		if err != nil {
			bw.Problem = err.Error()
			return bw, batch.Done, err
		}
		return bw, batch.Done, nil
	})
	bound := make([]book.Well, len(res))
	for i, x := range res {
		bound[i] = x.Value
		if x.Err != nil {
			problems = append(problems, fmt.Errorf("%s: not drawn: %w", wells[i].Path, x.Err))
			if bound[i].File == "" { // a panic leaves no value
				bound[i] = book.Well{File: p.Key(wells[i].Path), Problem: x.Err.Error()}
			}
		}
	}
	page, prof := sheet.Letter, (*rules.Profile)(nil)
	if len(r.Settings) > 0 {
		page, prof = r.Settings[0].Page, r.Settings[0].Profile
	}
	w, h := page.Width, page.Height
	if w > h {
		w, h = h, w
	}
	pdf, err = book.Build(book.Input{
		Project: p, Date: date, Table: Table(p, wells), Wells: bound,
		PageWidth: w, PageHeight: h, Caution: rules.Caution(prof),
	})
	return pdf, problems, err
}
