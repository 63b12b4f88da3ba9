package main

import (
	"flag"
	"fmt"
	"io"
	"path/filepath"

	"github.com/tremie-dev/tremie/cmd/internal/batch"
	"github.com/tremie-dev/tremie/render/book"
	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

func init() {
	register(&command{
		name:    "book",
		summary: "bind a project into one PDF: cover, contents, summary, findings and every well's sheets",
		run:     runBook,
	})
}

func runBook(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("book", flag.ContinueOnError)
	fset.SetOutput(stderr)
	outFile := fset.String("o", "", "output PDF (default OUTPUT/book.pdf)")
	issue := fset.Bool("issue", false, "bind the issued set: no rule IDs or file lines; refused while any well has unwaived error findings")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie book PROJECT_DIR [-o FILE.pdf] [--issue]")
		fset.PrintDefaults()
	}
	rest, err := parseInterleaved(fset, args)
	if err != nil {
		return exitUsage
	}
	if len(rest) != 1 {
		fmt.Fprintln(stderr, "tremie book: name one project directory")
		fset.Usage()
		return exitUsage
	}
	pw, code := loadProjectWells(rest[0], stderr)
	if pw == nil {
		return code
	}
	p := pw.proj
	page, err := pageFor(p.Page, p.Landscape)
	if err != nil {
		fmt.Fprintf(stderr, "%s: page %q: %v\n", p.File, p.Page, err)
		return exitInput
	}
	date := pw.date()
	issued := *issue || p.Issue
	if issued {
		refused := 0
		for _, e := range pw.entries {
			if e.Well != nil && rules.Blocking(e.Findings) {
				fmt.Fprintf(stderr, "tremie book: %s (%s): not issued: unwaived error findings; resolve or waive them (run tremie check %s)\n", e.File, e.Well.ID, e.File)
				refused++
			}
		}
		if refused > 0 {
			fmt.Fprintf(stderr, "tremie book: no issued set while %d %s unwaived errors; tremie book without --issue binds the draft\n", refused, plural(refused, "well has", "wells have"))
			return exitFindings
		}
	}
	var logo []byte
	if p.Logo != nil {
		logo = p.Logo.Data
	}
	res, _ := batch.Run(pw.entries, batch.Options{Progress: batch.Terminal(), Label: "drawing"}, func(i int, e table.Entry) (book.Well, batch.Outcome, error) {
		bw := book.Well{File: p.Key(e.File), Findings: e.Findings}
		if e.Well == nil {
			bw.Problem = "could not be read"
			return bw, batch.Skipped, nil
		}
		bw.ID = e.Well.ID
		in := sheet.Inputs{Findings: e.Findings, Quantities: quantity.Compute(e.Well, pw.yields), TitleBlock: p.TitleBlock, Logo: logo, Profile: pw.prof}
		doc, err := sheet.Layout(e.Well, in, sheet.Options{Page: page, Date: date.Format("2006-01-02T15:04:05Z07:00"), Issue: issued})
		if err != nil {
			bw.Problem = err.Error()
			return bw, batch.Done, err
		}
		// The well's feature summary follows its sheets.
		pgW, pgH := portrait(page)
		if fs := features.WellSummary(p.Key(e.File), e.Well, pgW, pgH, doc.Date); fs != nil {
			doc.Pages = append(doc.Pages, fs.Pages...)
		}
		if bw.Sheets, err = out.PDF(doc); err != nil {
			bw.Problem = err.Error()
			return bw, batch.Done, err
		}
		return bw, batch.Done, nil
	})
	wells := make([]book.Well, len(res))
	for i, r := range res {
		wells[i] = r.Value
		if r.Err != nil {
			fmt.Fprintf(stderr, "%s: not drawn: %v\n", pw.entries[i].File, r.Err)
			if wells[i].File == "" { // a panic leaves no value
				wells[i] = book.Well{File: p.Key(pw.entries[i].File), Problem: r.Err.Error()}
			}
			code = worse(code, exitInput)
		}
	}
	w, h := portrait(page)
	if bw, err := projectFeatures(pw, w, h, date.Format("2006-01-02T15:04:05Z07:00")); err != nil {
		fmt.Fprintf(stderr, "tremie book: project feature summary: %v\n", err)
		code = worse(code, exitOutput)
	} else if bw != nil {
		wells = append(wells, *bw)
	}
	secs, err := bookSections(pw, date.Format("2006-01-02T15:04:05Z07:00"))
	if err != nil {
		fmt.Fprintf(stderr, "%s: %v\n", p.File, err)
		code = worse(code, exitInput)
	}
	pdf, err := book.Build(book.Input{
		Project: p, Date: date, Table: table.Build(pw.entries, p.Units), Wells: wells, Sections: secs,
		PageWidth: w, PageHeight: h, Caution: rules.Caution(pw.prof), Issue: issued,
	})
	if err != nil {
		fmt.Fprintf(stderr, "tremie book: %v\n", err)
		return exitOutput
	}
	if *outFile == "" {
		*outFile = filepath.Join(p.Output, "book.pdf")
	}
	if err := writeOutput(*outFile, pdf); err != nil {
		fmt.Fprintf(stderr, "tremie book: %v\n", err)
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie book: %d wells bound into %s\n", len(wells), *outFile)
	return code
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
func projectFeatures(pw *projectWells, w, h float64, date string) (*book.Well, error) {
	var rows []features.Row
	for _, e := range pw.entries {
		if e.Well != nil {
			rows = append(rows, features.Rows(pw.proj.Key(e.File), e.Well)...)
		}
	}
	doc := features.ProjectSummary(pw.proj.Name, pw.proj.Site, rows, w, h, date)
	if doc == nil {
		return nil, nil
	}
	pdf, err := out.PDF(doc)
	if err != nil {
		return nil, err
	}
	return &book.Well{ID: "Wall features, all wells", File: "project", Sheets: pdf}, nil
}
