package pipeline

import (
	"errors"
	"fmt"
	"time"

	"github.com/tremie-dev/tremie/render/book"
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
	"github.com/tremie-dev/tremie/render/section"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/templates"
)

// Table is the construction summary of prepared wells, lengths in the
// project's unit.
func Table(p *project.Project, wells []*Well) *table.Table {
	t := table.Build(Entries(wells), p.Units)
	t.Profile = ProfileOf(wells) // the caution names the profile in force
	return t
}

// ProfileOf is the rule profile a project's wells were checked with (that
// of the first well whose setting could be read), nil for none.
func ProfileOf(wells []*Well) *rules.Profile {
	for _, w := range wells {
		if w.Setting != nil && w.Setting.Err == nil {
			return w.Setting.Profile
		}
	}
	return nil
}

// Entries are prepared wells as the summary table reads them.
func Entries(wells []*Well) []table.Entry {
	es := make([]table.Entry, len(wells))
	for i, w := range wells {
		es[i] = table.Entry{File: w.Path, Well: w.Well, Findings: w.Findings, Err: w.Err}
	}
	return es
}

// Book draws every prepared well of a project as PDF sheets (each
// followed by its wall-feature summary), dated with the project's date,
// and binds them with the cover, contents, summary, findings, the
// project's cross-sections and a project feature summary into one PDF. A
// well or section that cannot be drawn is listed with its problem and
// returned in problems (outputErr when the PDF could not be written);
// the book is still made. An issued book (issue, or the project's issue
// setting) draws every sheet as issued and states its findings in plain
// words; the caller refuses it while NotIssuable names any well.
func (r *Run) Book(p *project.Project, wells []*Well, issue bool) (pdf []byte, problems []error, err error) {
	issue = issue || p.Issue
	date := r.ProjectDate(p, wells)
	stamp := date.Format(time.RFC3339)
	page, prof := sheet.Letter, (*rules.Profile)(nil)
	if len(r.Settings) > 0 {
		page, prof = r.Settings[0].Page, r.Settings[0].Profile
	}
	pw, ph := portrait(page)
	res, _ := batch.Run(wells, batch.Options{Progress: r.progress(), Label: "drawing"}, func(_ int, w *Well) (book.Well, batch.Outcome, error) {
		bw := book.Well{File: p.Key(w.Path), Findings: w.Findings, ID: w.ID}
		if w.Well == nil {
			bw.Problem = "could not be read"
			return bw, batch.Skipped, nil
		}
		doc, err := w.Layout(LayoutOptions{Date: stamp, Issue: issue})
		if err == nil {
			// The well's feature summary follows its sheets.
			if fs := features.WellSummary(p.Key(w.Path), w.Well, pw, ph, doc.Date); fs != nil {
				doc.Pages = append(doc.Pages, fs.Pages...)
			}
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
	if bw, err := projectFeatures(p, wells, pw, ph, stamp); err != nil {
		problems = append(problems, &OutputError{fmt.Errorf("project feature summary: %w", err)})
	} else if bw != nil {
		bound = append(bound, *bw)
	}
	secs, err := bookSections(p, wells, stamp)
	if err != nil {
		problems = append(problems, fmt.Errorf("%s: %w", p.File, err))
	}
	pdf, err = book.Build(book.Input{
		Project: p, Date: date, Table: Table(p, wells), Wells: bound, Sections: secs,
		PageWidth: pw, PageHeight: ph, Caution: rules.Caution(prof), Issue: issue,
	})
	return pdf, problems, err
}

// portrait is the page's portrait size, for pages that are not sheets.
func portrait(p sheet.Page) (w, h float64) {
	if p.Width > p.Height {
		return p.Height, p.Width
	}
	return p.Width, p.Height
}

// projectFeatures is the project's feature summary as a book entry after
// the wells, or nil when fewer than two wells have features.
func projectFeatures(p *project.Project, wells []*Well, w, h float64, date string) (*book.Well, error) {
	var rows []features.Row
	for _, x := range wells {
		if x.Well != nil {
			rows = append(rows, features.Rows(p.Key(x.Path), x.Well)...)
		}
	}
	doc := features.ProjectSummary(p.Name, p.Site, rows, w, h, date)
	if doc == nil {
		return nil, nil
	}
	pdf, err := out.PDF(doc)
	if err != nil {
		return nil, err
	}
	return &book.Well{ID: "Wall features, all wells", File: "project", Sheets: pdf}, nil
}

// Sections lays out the project's cross-sections (name "" for all it
// defines, or an ad hoc line through ids) on the landscape template
// pageName over the prepared wells.
func Sections(p *project.Project, wells []*Well, name string, ids []string, pageName, date string) ([]*draw.Document, []section.Input, error) {
	models := make([]*schema.Well, 0, len(wells))
	for _, w := range wells {
		models = append(models, w.Well)
	}
	inputs, err := section.Select(p, models, name, ids)
	if err != nil {
		return nil, nil, err
	}
	tpl, err := templates.Load(pageName, true)
	if err != nil {
		return nil, nil, err
	}
	docs := make([]*draw.Document, len(inputs))
	var errs []error
	for i := range inputs {
		inputs[i].Page, inputs[i].Date = tpl, date
		if docs[i], err = section.Layout(inputs[i]); err != nil {
			errs = append(errs, err)
		}
	}
	return docs, inputs, errors.Join(errs...)
}

// bookSections draws every section the project defines as PDFs for the
// book; a section that cannot be drawn is left out and its error
// returned.
func bookSections(p *project.Project, wells []*Well, date string) ([]book.Section, error) {
	if len(p.Sections) == 0 {
		return nil, nil
	}
	docs, inputs, err := Sections(p, wells, "", nil, "tabloid", date)
	if docs == nil {
		return nil, err
	}
	errs := []error{err}
	var secs []book.Section
	for i, doc := range docs {
		if doc == nil {
			continue
		}
		pdf, err := out.PDF(doc)
		if err != nil {
			errs = append(errs, err)
			continue
		}
		secs = append(secs, book.Section{Name: inputs[i].Section.Name, Sheet: pdf})
	}
	return secs, errors.Join(errs...)
}
