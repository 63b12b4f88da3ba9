package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"github.com/tremie-dev/tremie/render/book"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/section"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/templates"
)

func init() {
	register(&command{
		name:    "section",
		summary: "draw a cross-section of several wells hung on elevation",
		run:     runSection,
	})
}

func runSection(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("section", flag.ContinueOnError)
	fset.SetOutput(stderr)
	outDir := fset.String("o", "", "output directory (default the project's output directory)")
	wellList := fset.String("wells", "", "draw a line through these wells, in order: A,B,C")
	formats := fset.String("format", "svg,pdf,png", "output formats: svg, pdf, png")
	pageName := fset.String("page", "tabloid", "page template (landscape)")
	force := fset.Bool("force", false, "replace existing output files")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie section PROJECT_DIR [NAME] [--wells A,B,C] [-o OUTDIR] [--format svg,pdf,png] [--page NAME] [--force]")
		fset.PrintDefaults()
	}
	rest, err := parseInterleaved(fset, args)
	if err != nil {
		return exitUsage
	}
	if len(rest) < 1 || len(rest) > 2 {
		fset.Usage()
		return exitUsage
	}
	name := ""
	if len(rest) == 2 {
		name = rest[1]
	}
	var ids []string
	for _, id := range strings.Split(*wellList, ",") {
		if id = strings.TrimSpace(id); id != "" {
			ids = append(ids, id)
		}
	}
	tpl, err := templates.Load(*pageName, true)
	if err != nil {
		fmt.Fprintf(stderr, "tremie section: %v\n", err)
		return exitUsage
	}
	pw, code := loadProjectWells(rest[0], stderr)
	if pw == nil {
		return code
	}
	var wells []*schema.Well
	for _, e := range pw.entries {
		wells = append(wells, e.Well)
	}
	inputs, err := section.Select(pw.proj, wells, name, ids)
	if err != nil {
		fmt.Fprintf(stderr, "tremie section: %v\n", err)
		return exitInput
	}
	dir := *outDir
	if dir == "" {
		dir = pw.proj.Output
	}
	date := pw.date().Format("2006-01-02T15:04:05Z07:00")
	status := exitOK
	for _, in := range inputs {
		in.Page, in.Date = tpl, date
		doc, err := section.Layout(in)
		if err != nil {
			fmt.Fprintf(stderr, "%s: %v\n", pw.proj.File, err)
			status = exitInput
			continue
		}
		for _, f := range strings.Split(*formats, ",") {
			f = strings.TrimSpace(f)
			files, err := encode(doc, f, 150)
			if err != nil {
				fmt.Fprintf(stderr, "tremie section: %v\n", err)
				return exitOutput
			}
			path := filepath.Join(dir, "section-"+safeName(in.Section.Name)+"."+f)
			if _, err := os.Stat(path); err == nil && !*force {
				fmt.Fprintf(stderr, "%s exists; --force replaces it\n", path)
				status = exitOutput
				continue
			}
			if err := os.MkdirAll(dir, 0o755); err != nil {
				fmt.Fprintf(stderr, "tremie section: %v\n", err)
				return exitOutput
			}
			if err := out.WriteFileAtomic(path, files[0]); err != nil {
				fmt.Fprintf(stderr, "tremie section: %v\n", err)
				return exitOutput
			}
			fmt.Fprintf(stdout, "%s: drew %s\n", in.Section.Name, path)
		}
	}
	return status
}

// bookSections draws every section the project defines, as PDFs for the
// book; a section that cannot be drawn is left out and its error
// returned.
func bookSections(pw *projectWells, date string) ([]book.Section, error) {
	if len(pw.proj.Sections) == 0 {
		return nil, nil
	}
	var wells []*schema.Well
	for _, e := range pw.entries {
		wells = append(wells, e.Well)
	}
	inputs, err := section.Select(pw.proj, wells, "", nil)
	if err != nil {
		return nil, err
	}
	tpl, err := templates.Load("tabloid", true)
	if err != nil {
		return nil, err
	}
	var secs []book.Section
	var errs []error
	for _, in := range inputs {
		in.Page, in.Date = tpl, date
		doc, err := section.Layout(in)
		if err == nil {
			var pdf []byte
			if pdf, err = out.PDF(doc); err == nil {
				secs = append(secs, book.Section{Name: in.Section.Name, Sheet: pdf})
				continue
			}
		}
		errs = append(errs, err)
	}
	return secs, errors.Join(errs...)
}
