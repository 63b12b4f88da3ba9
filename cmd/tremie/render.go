package main

import (
	"errors"
	"flag"
	"fmt"
	"github.com/tremie-dev/tremie/cmd/internal/batch"
	"io"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"time"

	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/templates"
)

func init() {
	register(&command{
		name:    "render",
		summary: "draw well files as scaled construction-log sheets (SVG, PDF, PNG)",
		run:     runRender,
	})
}

// renderOptions are what every well of one run is drawn with.
type renderOptions struct {
	outDir  string
	formats []string // svg, pdf, png
	// pageName and landscape are the page template (--page, --landscape);
	// pageSet is true when either was given, and then wins over a
	// project's page.
	pageName  string
	landscape bool
	pageSet   bool
	scale     *sheet.Scale
	strict    bool
	issue     bool // --issue: the issued set (a project may ask for it too)
	profile   *rules.Profile
	yields    *quantity.Yields
	dpi       float64
	date      string // from SOURCE_DATE_EPOCH, "" for the well's own date
	// names maps a well file to its output base name, made safe and unique
	// by assignNames; a file missing from it gets its sanitised ID.
	names map[string]string
	// projects maps a well file to the project it was found in, for the
	// project's names, page, logo and title block.
	projects map[string]*project.Project
}

// renderResult is what became of one well.
type renderResult struct {
	Path     string
	WellID   string
	Sheets   int
	Outputs  []string
	Findings []rules.Finding
	Blocking bool // unwaived error findings: drawn, marked not final
	Refused  bool // --strict and Blocking: nothing written
	Issue    bool // drawn (or refused) as the issued set
}

// renderError carries the exit code a failure maps to.
type renderError struct {
	code int
	err  error
}

func (e *renderError) Error() string { return e.err.Error() }
func (e *renderError) Unwrap() error { return e.err }

func inputErr(err error) error  { return &renderError{code: exitInput, err: err} }
func outputErr(err error) error { return &renderError{code: exitOutput, err: err} }

// renderWell loads, checks, quantifies, lays out and writes one well. It
// shares nothing mutable, so wells may be rendered in parallel.
func renderWell(path string, opts renderOptions) (renderResult, error) {
	w, err := schema.LoadFile(path)
	if err != nil {
		return renderResult{Path: path}, inputErr(err)
	}
	return renderLoaded(path, w, opts)
}

// renderLoaded is renderWell for a well already loaded from path.
func renderLoaded(path string, w *schema.Well, opts renderOptions) (renderResult, error) {
	res := renderResult{Path: path}
	prj := opts.projects[path]
	project.Apply(prj, w)
	res.WellID = w.ID
	res.Findings = rules.Check(w, opts.profile)
	res.Blocking = rules.Blocking(res.Findings)
	res.Issue = opts.issue || prj != nil && prj.Issue
	if res.Blocking && (opts.strict || res.Issue) {
		res.Refused = true
		return res, nil
	}
	in := sheet.Inputs{Findings: res.Findings, Quantities: quantity.Compute(w, opts.yields), Profile: opts.profile}
	name, landscape := opts.pageName, opts.landscape
	if prj != nil {
		in.TitleBlock = prj.TitleBlock
		if prj.Logo != nil {
			in.Logo = prj.Logo.Data
		}
		if !opts.pageSet {
			name, landscape = prj.Page, prj.Landscape
		}
	}
	page, err := pageFor(name, landscape)
	if err != nil {
		return res, inputErr(fmt.Errorf("%s: %w", path, err))
	}
	doc, err := sheet.Layout(w, in, sheet.Options{Page: page, Scale: opts.scale, Date: opts.date, Issue: res.Issue})
	if err != nil {
		return res, inputErr(fmt.Errorf("%s: %w", path, err))
	}
	res.Sheets = len(doc.Pages)
	base := opts.names[path]
	if base == "" {
		base = safeName(w.ID)
	}
	for _, f := range opts.formats {
		files, err := encode(doc, f, opts.dpi)
		if err != nil {
			return res, outputErr(fmt.Errorf("%s: %w", path, err))
		}
		for i, data := range files {
			name := base + "." + f
			if len(files) > 1 {
				name = fmt.Sprintf("%s-sheet%d.%s", base, i+1, f)
			}
			dst := filepath.Join(opts.outDir, name)
			if err := out.WriteFileAtomic(dst, data); err != nil {
				return res, outputErr(err)
			}
			res.Outputs = append(res.Outputs, dst)
		}
		if f != "pdf" {
			removeStaleSheets(opts.outDir, base, f, len(files))
		}
	}
	outs, err := writeFeatureSummary(path, w, page, opts, base)
	res.Outputs = append(res.Outputs, outs...)
	return res, err
}

// writeFeatureSummary writes the well's feature summary beside its
// sheets as BASE-features.EXT (one PNG or SVG per page, -pageN), when it
// has features.
func writeFeatureSummary(path string, w *schema.Well, page sheet.Page, opts renderOptions, base string) ([]string, error) {
	pw, ph := portrait(page)
	doc := features.WellSummary(path, w, pw, ph, opts.date)
	if doc == nil {
		return nil, nil
	}
	var outs []string
	for _, f := range opts.formats {
		files, err := encode(doc, f, opts.dpi)
		if err != nil {
			return outs, outputErr(fmt.Errorf("%s: feature summary: %w", path, err))
		}
		for i, data := range files {
			name := base + "-features." + f
			if len(files) > 1 {
				name = fmt.Sprintf("%s-features-page%d.%s", base, i+1, f)
			}
			dst := filepath.Join(opts.outDir, name)
			if err := out.WriteFileAtomic(dst, data); err != nil {
				return outs, outputErr(err)
			}
			outs = append(outs, dst)
		}
	}
	return outs, nil
}

// removeStaleSheets deletes this well's sheet files left by an earlier
// run that drew it on a different number of sheets, so the directory
// never holds a mix: base.ext when there are now several sheets, and
// base-sheetN.ext beyond the count (all of them when there is one).
func removeStaleSheets(dir, base, ext string, n int) {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return
	}
	prefix, suffix := base+"-sheet", "."+ext
	for _, e := range entries {
		name := e.Name()
		if e.IsDir() {
			continue
		}
		if name == base+suffix && n > 1 {
			os.Remove(filepath.Join(dir, name))
			continue
		}
		if !strings.HasPrefix(name, prefix) || !strings.HasSuffix(name, suffix) {
			continue
		}
		k, err := strconv.Atoi(name[len(prefix) : len(name)-len(suffix)])
		if err != nil || k < 1 || strconv.Itoa(k) != name[len(prefix):len(name)-len(suffix)] {
			continue
		}
		if n == 1 || k > n {
			os.Remove(filepath.Join(dir, name))
		}
	}
}

// encode writes a document in one format: one PDF for all sheets, one
// SVG or PNG per sheet.
func encode(doc *draw.Document, format string, dpi float64) ([][]byte, error) {
	if format == "pdf" {
		b, err := out.PDF(doc)
		if err != nil {
			return nil, fmt.Errorf("pdf: %w", err)
		}
		return [][]byte{b}, nil
	}
	var files [][]byte
	for i := range doc.Pages {
		var b []byte
		var err error
		if format == "svg" {
			b, err = out.SVG(doc, i)
		} else {
			b, err = out.PNG(doc, i, dpi)
		}
		if err != nil {
			return nil, fmt.Errorf("%s sheet %d: %w", format, i+1, err)
		}
		files = append(files, b)
	}
	return files, nil
}

// safeName is the output base name of a well ID (schema.SafeFileName).
func safeName(id string) string { return schema.SafeFileName(id) }

// assignNames gives each file a unique output base name in input order:
// the first well to claim a name keeps it, later ones get -2, -3, ...
// Names are compared without case, for case-insensitive file systems.
func assignNames(files, ids []string) map[string]string {
	taken := map[string]bool{}
	out := make(map[string]string, len(files))
	for i, f := range files {
		base := safeName(ids[i])
		name := base
		for n := 2; taken[strings.ToLower(name)]; n++ {
			name = fmt.Sprintf("%s-%d", base, n)
		}
		taken[strings.ToLower(name)] = true
		out[f] = name
	}
	return out
}

// pageFor is a page template by name ("" for letter), turned when
// landscape.
func pageFor(name string, landscape bool) (sheet.Page, error) {
	if name == "" {
		name = "letter"
	}
	t, err := templates.Load(name, landscape)
	if err != nil {
		return sheet.Page{}, err
	}
	return sheet.FromTemplate(t), nil
}

// sourceDate is SOURCE_DATE_EPOCH as RFC 3339, for repeatable builds.
func sourceDate() (string, error) {
	v := os.Getenv("SOURCE_DATE_EPOCH")
	if v == "" {
		return "", nil
	}
	n, err := strconv.ParseInt(v, 10, 64)
	if err != nil || n < 0 {
		return "", fmt.Errorf("SOURCE_DATE_EPOCH=%q is not a count of seconds", v)
	}
	return time.Unix(n, 0).UTC().Format(time.RFC3339), nil
}

func runRender(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("render", flag.ContinueOnError)
	fset.SetOutput(stderr)
	outDir := fset.String("o", "", "output directory (default: a project's output directory)")
	formats := fset.String("format", "svg,pdf,png", "comma-separated output formats: svg, pdf, png")
	pageName := fset.String("page", "", "page size: letter, tabloid, a4 or a3 (default letter, or the project's)")
	landscape := fset.Bool("landscape", false, "turn the page to landscape")
	scaleText := fset.String("scale", "", "vertical scale, such as 1in=5ft or 1:50, or fit for one sheet (default: automatic)")
	strict := fset.Bool("strict", false, "refuse to draw a well with unwaived error findings")
	issue := fset.Bool("issue", false, "draw the issued set: no rule IDs or file lines, a revision block and a seal space; wells with unwaived error findings are refused")
	profilePath := fset.String("profile", "", "rule profile TOML (default: the project's, else the defaults)")
	yieldsPath := fset.String("yields", "", "TOML file with a [yields] table overriding the default yields")
	dpi := fset.Float64("dpi", 150, "PNG resolution in dots per inch")
	force := fset.Bool("force", false, "redraw every well, even those unchanged since the last run")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie render FILE|DIR... -o OUTDIR [--format svg,pdf,png] [--page letter|tabloid|a4|a3] [--landscape] [--scale S|fit] [--strict] [--issue] [--force] [--profile FILE] [--yields FILE] [--dpi N]")
		fset.PrintDefaults()
	}
	paths, err := parseInterleaved(fset, args)
	if err != nil {
		return exitUsage
	}
	if len(paths) == 0 {
		fmt.Fprintln(stderr, "tremie render: name at least one well file or directory")
		fset.Usage()
		return exitUsage
	}
	opts := renderOptions{outDir: *outDir, strict: *strict, issue: *issue, dpi: *dpi, projects: map[string]*project.Project{}}
	if !(opts.dpi >= 10 && opts.dpi <= 1200) {
		fmt.Fprintf(stderr, "tremie render: --dpi %g is outside 10–1200\n", *dpi)
		return exitUsage
	}
	for _, f := range strings.Split(*formats, ",") {
		f = strings.ToLower(strings.TrimSpace(f))
		if f != "svg" && f != "pdf" && f != "png" {
			fmt.Fprintf(stderr, "tremie render: unknown format %q (svg, pdf, png)\n", f)
			return exitUsage
		}
		if !contains(opts.formats, f) {
			opts.formats = append(opts.formats, f)
		}
	}
	opts.pageName, opts.landscape = *pageName, *landscape
	opts.pageSet = *pageName != "" || *landscape
	if _, err := pageFor(*pageName, *landscape); err != nil {
		fmt.Fprintf(stderr, "tremie render: --page: %v\n", err)
		return exitUsage
	}
	if *scaleText != "" {
		s, err := sheet.ParseScale(*scaleText)
		if err != nil {
			fmt.Fprintf(stderr, "tremie render: --scale: %v\n", err)
			return exitUsage
		}
		opts.scale = &s
	}
	if opts.date, err = sourceDate(); err != nil {
		fmt.Fprintf(stderr, "tremie render: %v\n", err)
		return exitUsage
	}
	code := exitOK
	in, errs := collectInputs(paths)
	files, prjProfile := in.files, in.profile
	opts.projects = in.projects
	if opts.outDir == "" {
		opts.outDir = in.outDir
	}
	for _, e := range errs {
		fmt.Fprintf(stderr, "tremie render: %v\n", e)
		code = exitInput
	}
	if *yieldsPath == "" {
		*yieldsPath = in.yields
	}
	if *yieldsPath != "" {
		if opts.yields, err = quantity.LoadYields(*yieldsPath); err != nil {
			fmt.Fprintf(stderr, "tremie render: %v\n", err)
			return exitInput
		}
	}
	profile := *profilePath
	if profile == "" {
		profile = prjProfile
	}
	if profile != "" {
		if opts.profile, err = rules.LoadProfile(profile); err != nil {
			fmt.Fprintln(stderr, schema.Errors(profile, err))
			return exitInput
		}
	}
	opts.profile = withYields(opts.profile, opts.yields)
	if opts.outDir == "" {
		fmt.Fprintln(stderr, "tremie render: name the output directory with -o OUTDIR")
		return exitUsage
	}
	if len(files) == 0 {
		if code == exitOK {
			fmt.Fprintf(stderr, "tremie render: no well files found in %s\n", strings.Join(paths, ", "))
		}
		return exitInput
	}
	if err := os.MkdirAll(opts.outDir, 0o755); err != nil {
		fmt.Fprintf(stderr, "tremie render: %v\n", err)
		return exitOutput
	}

	// Names first, in input order, so collisions resolve the same way
	// however the wells are then drawn.
	loaded := loadAll(files)
	ids := make([]string, len(files))
	for i, l := range loaded {
		if l.well != nil {
			ids[i] = l.well.ID
		}
	}
	opts.names = assignNames(files, ids)

	var profileBytes, yieldsBytes []byte
	if profile != "" {
		profileBytes, _ = os.ReadFile(profile)
	}
	if *yieldsPath != "" {
		yieldsBytes, _ = os.ReadFile(*yieldsPath)
	}
	results, sum, cache, stale, cacheErr := renderRun(files, loaded, opts, *force, profileBytes, yieldsBytes)
	if cacheErr != nil {
		fmt.Fprintf(stderr, "tremie render: %v\n", cacheErr)
	}
	for i, r := range results {
		f, res := files[i], r.Value
		if r.Err != nil {
			var re *renderError
			c := exitInput
			if errors.As(r.Err, &re) {
				c = re.code
			}
			fmt.Fprintln(stderr, schema.Errors(f, r.Err))
			code = worse(code, c)
			continue
		}
		mark := ""
		if res.Blocking {
			mark = " — NOT FINAL: error findings drawn on the sheet"
			code = worse(code, exitFindings)
		}
		switch {
		case res.Refused && res.Issue:
			fmt.Fprintf(stderr, "tremie render: %s (%s): not issued: unwaived error findings; resolve or waive them (run tremie check %s)\n", f, res.WellID, f)
			code = worse(code, exitFindings)
		case res.Refused:
			fmt.Fprintf(stderr, "tremie render: %s (%s): refused under --strict: unwaived error findings (run tremie check %s)\n", f, res.WellID, f)
			code = worse(code, exitFindings)
		case r.Outcome == batch.Skipped:
			fmt.Fprintf(stdout, "%s: %s, unchanged since the last run (--force redraws)%s\n", f, res.WellID, mark)
		default:
			fmt.Fprintf(stdout, "%s: %s, %d %s → %s%s\n", f, res.WellID, res.Sheets, plural(res.Sheets, "sheet", "sheets"), strings.Join(res.Outputs, ", "), mark)
		}
	}
	for _, o := range stale {
		fmt.Fprintf(stderr, "tremie render: stale output %s: its well is no longer in the input (not deleted)\n", filepath.Join(opts.outDir, o))
	}
	if err := cache.Save(); err != nil {
		fmt.Fprintf(stderr, "tremie render: %v\n", err)
		code = worse(code, exitOutput)
	}
	fmt.Fprintf(stdout, "%d rendered, %d unchanged, %d failed\n", sum.Done, sum.Skipped, sum.Failed)
	fmt.Fprintln(stdout, "Sheets support, and never replace, the review of a licensed professional and the governing local well code.")
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

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}

func plural(n int, one, many string) string {
	if n == 1 {
		return one
	}
	return many
}
