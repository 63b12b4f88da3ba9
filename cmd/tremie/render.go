package main

import (
	"fmt"
	"github.com/tremie-dev/tremie/templates"
	"io"
	"path/filepath"
	"strings"

	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
	"github.com/tremie-dev/tremie/render/sheet"
)

func init() {
	register(&command{
		name:    "render",
		summary: "draw well files as scaled construction-log sheets (SVG, PDF, PNG)",
		run:     runRender,
		args:    "FILE|DIR...",
		about: "Outputs go to -o OUTDIR, else the project's output folder. A file there that tremie did not\n" +
			"write is never replaced unless --force.",
	})
}

func runRender(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("render", stdout, stderr)
	outDir := fset.dir("o", "", "output `directory` (default: the project's output directory)")
	formats := fset.String("format", "svg,pdf,png", "comma-separated output `formats`: "+strings.Join(out.FormatNames(), ", "))
	pageName := fset.choice("page", "", templates.Names(), "page `size`: letter, tabloid, a4 or a3 (default letter, or the project's)")
	landscape := fset.Bool("landscape", false, "turn the page to landscape")
	scaleText := fset.String("scale", "", "vertical `scale`, such as 1in=5ft or 1:50, or fit for one sheet (default: automatic)")
	strict := fset.Bool("strict", false, "refuse to draw a well with unwaived error findings")
	issue := fset.Bool("issue", false, "draw the issued set: no rule IDs or file lines, a revision block and a seal space; wells with unwaived error findings are refused")
	profilePath := fset.String("profile", "", "rule profile TOML `file` (default: the project's, else the defaults)")
	yieldsPath := fset.String("yields", "", "TOML `file` with a [yields] table overriding the yields (default: the project's)")
	textMode := fset.choice("text", "text", []string{"text", "outlines"}, "how SVG and PDF write words (`mode`): text, searchable, or outlines, for viewers that ignore embedded fonts")
	dpi := fset.Float64("dpi", 150, "PNG resolution in `dots` per inch")
	force := fset.Bool("force", false, "redraw every well, even those unchanged, and replace files tremie did not write")
	paths, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(paths) == 0 {
		return fset.usageError("name at least one well file or directory")
	}
	if !(*dpi >= 10 && *dpi <= 1200) {
		return fset.usageError("--dpi %g is outside 10–1200", *dpi)
	}
	opt := pipeline.RenderOptions{DPI: *dpi, Strict: *strict, Issue: *issue, Force: *force, Version: Version}
	var err error
	if opt.Text, err = out.ParseTextMode(*textMode); err != nil {
		return fset.usageError("--text: %v", err)
	}
	if opt.Formats, err = out.ParseFormats(*formats); err != nil {
		return fset.usageError("--format: %v", err)
	}
	if _, err := pipeline.PageFor(*pageName, *landscape); err != nil {
		return fset.usageError("--page: %v", err)
	}
	if *scaleText != "" {
		s, err := sheet.ParseScale(*scaleText)
		if err != nil {
			return fset.usageError("--scale: %v", err)
		}
		opt.Scale = &s
	}
	run, code, ok := resolve("render", paths, pipeline.Options{Profile: *profilePath, Yields: *yieldsPath, OutDir: *outDir,
		Page: *pageName, Landscape: *landscape, PageSet: *pageName != "" || *landscape}, stderr)
	if !ok {
		return code
	}
	if run.OutDir == "" {
		if len(run.Problems) > 0 {
			return exitInput // the project file that names it could not be read: printed above
		}
		return fset.usageError("name the output directory with -o OUTDIR")
	}
	rep, err := run.Render(opt)
	if err != nil {
		fmt.Fprintf(stderr, "tremie render: %v\n", err)
		return exitOutput
	}
	for _, e := range rep.Warnings {
		fmt.Fprintf(stderr, "tremie render: %v\n", e)
	}
	for _, r := range rep.Wells {
		code = worse(code, printRendered(stdout, stderr, r))
	}
	for _, o := range rep.Stale {
		fmt.Fprintf(stderr, "tremie render: stale output %s: no well file produces it any more (not deleted)\n", filepath.Join(run.OutDir, o))
	}
	if rep.SaveErr != nil {
		fmt.Fprintf(stderr, "tremie render: %v\n", rep.SaveErr)
		code = worse(code, exitOutput)
	}
	refused := ""
	if rep.Refused > 0 {
		refused = fmt.Sprintf("%d refused, ", rep.Refused)
	}
	fmt.Fprintf(stdout, "%d rendered, %s%d unchanged, %d failed (%s)\n", rep.Summary.Done, refused, rep.Summary.Skipped, rep.Summary.Failed, strings.Join(run.ProfileLabels(), "; "))
	fmt.Fprintln(stdout, "Sheets support, and never replace, the review of a licensed professional and the governing local well code.")
	return code
}

// printRendered prints what became of one well and returns the exit code
// it calls for.
func printRendered(stdout, stderr io.Writer, r pipeline.Rendered) int {
	f := r.Path
	if r.Err != nil {
		printErr(stderr, "render", r.Err)
		if pipeline.IsOutputError(r.Err) {
			return exitOutput
		}
		return exitInput
	}
	code, mark := exitOK, ""
	if r.Blocking() {
		mark = " — NOT FINAL: error findings drawn on the sheet"
		code = exitFindings
	}
	switch {
	case r.Refused && r.Issue:
		fmt.Fprintf(stderr, "tremie render: %s (%s): not issued: unwaived error findings; resolve or waive them (run tremie check %s)\n", f, r.ID, f)
	case r.Refused:
		fmt.Fprintf(stderr, "tremie render: %s (%s): refused under --strict: unwaived error findings (run tremie check %s)\n", f, r.ID, f)
	case quiet && mark == "":
	case r.Outcome == batch.Skipped:
		fmt.Fprintf(stdout, "%s: %s, unchanged since the last run (--force redraws)%s\n", f, r.ID, mark)
	default:
		fmt.Fprintf(stdout, "%s: %s, %d %s → %s%s\n", f, r.ID, r.Sheets, plural(r.Sheets, "sheet", "sheets"), strings.Join(r.Outputs, ", "), mark)
	}
	if r.FitNotes != nil {
		fmt.Fprintf(stderr, "tremie render: %s\n", r.FitNotes)
	}
	return code
}

// worse keeps the more serious exit code: input and output failures over
// findings over clean.
func worse(a, b int) int {
	rank := map[int]int{exitOK: 0, exitFindings: 1, exitInput: 2, exitOutput: 3}
	if rank[b] > rank[a] {
		return b
	}
	return a
}

// counted is n with its noun: "1 well", "2 wells".
func counted(n int, one, many string) string { return fmt.Sprintf("%d %s", n, plural(n, one, many)) }

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
