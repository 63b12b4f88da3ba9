package main

import (
	"fmt"
	"io"
	"path/filepath"
	"strings"
	"time"

	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline"
)

func init() {
	register(&command{
		name:    "section",
		summary: "draw a cross-section of several wells hung on elevation",
		run:     runSection,
		args:    "PROJECT_DIR [NAME]",
	})
}

func runSection(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("section", stdout, stderr)
	outDir := fset.dir("o", "", "output `directory` (default the project's output directory)")
	wellList := fset.String("wells", "", "draw a line through these `wells`, in order: A,B,C")
	formats := fset.String("format", "svg,pdf,png", "output `formats`: "+strings.Join(out.FormatNames(), ", "))
	pageName := fset.String("page", "tabloid", "page `template` (landscape)")
	force := fset.Bool("force", false, "replace output files tremie did not write")
	rest, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(rest) < 1 || len(rest) > 2 {
		return fset.usageError("name one project directory and, optionally, one section")
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
	if len(ids) == 1 {
		return fset.usageError("--wells names the wells a section joins: at least two, as A,B")
	}
	fmts, err := out.ParseFormats(*formats)
	if err != nil {
		return fset.usageError("--format: %v", err)
	}
	if _, err := pipeline.PageFor(*pageName, true); err != nil {
		return fset.usageError("--page: %v", err)
	}
	run, p, wells, code := prepareProject("section", rest[0], stderr)
	if p == nil {
		return code
	}
	code = exitOK // a flawed well still stands in a section
	docs, inputs, err := pipeline.Sections(p, wells, name, ids, *pageName, run.ProjectDate(p, wells).Format(time.RFC3339))
	if err != nil {
		where := p.File // the project file whose sections are wrong
		if where == "" {
			where = "tremie section: " + rest[0]
		}
		fmt.Fprintf(stderr, "%s: %v\n", where, err)
		code = exitInput
	}
	dir := *outDir
	if dir == "" {
		dir = p.Output
	}
	for i, doc := range docs {
		if doc == nil {
			continue
		}
		for _, f := range fmts {
			files, err := f.Encode(doc, out.EncodeOptions{DPI: 150})
			if err != nil {
				fmt.Fprintf(stderr, "tremie section: %v\n", err)
				return exitOutput
			}
			file := "section-" + pipeline.SafeName(inputs[i].Section.Name) + f.Ext
			if err := pipeline.WriteOwned(dir, file, files[0], *force); err != nil {
				fmt.Fprintf(stderr, "tremie section: %v\n", err)
				code = exitOutput
				continue
			}
			if !quiet {
				fmt.Fprintf(stdout, "%s: drew %s\n", inputs[i].Section.Name, filepath.Join(dir, file))
			}
		}
	}
	return code
}
