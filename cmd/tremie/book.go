package main

import (
	"flag"
	"fmt"
	"io"
	"path/filepath"

	"github.com/tremie-dev/tremie/cmd/internal/batch"
	"github.com/tremie-dev/tremie/render/book"
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
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie book PROJECT_DIR [-o FILE.pdf]")
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
		doc, err := sheet.Layout(e.Well, in, sheet.Options{Page: page, Date: date.Format("2006-01-02T15:04:05Z07:00")})
		if err != nil {
			bw.Problem = err.Error()
			return bw, batch.Done, err
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
	w, h := page.Width, page.Height
	if w > h {
		w, h = h, w
	}
	pdf, err := book.Build(book.Input{
		Project: p, Date: date, Table: table.Build(pw.entries, p.Units), Wells: wells,
		PageWidth: w, PageHeight: h, Caution: rules.Caution(pw.prof),
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
