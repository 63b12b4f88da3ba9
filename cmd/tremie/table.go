package main

import (
	"bytes"
	"errors"
	"flag"
	"fmt"
	"github.com/tremie-dev/tremie/schema/quantity"
	"io"
	"os"
	"path/filepath"
	"strconv"
	"time"

	"github.com/tremie-dev/tremie/cmd/internal/batch"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/exchange"
	"github.com/tremie-dev/tremie/schema/project"
	"github.com/tremie-dev/tremie/schema/rules"
)

func init() {
	register(&command{
		name:    "table",
		summary: "write a project's construction summary table (--format csv|xlsx|md), or its wells in the import layout (import-xlsx)",
		run:     runTable,
	})
}

func runTable(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("table", flag.ContinueOnError)
	fset.SetOutput(stderr)
	format := fset.String("format", "csv", "csv, xlsx, md, or import-xlsx (the wells in tremie import's layout)")
	outFile := fset.String("o", "", "output file (default: stdout for csv and md, OUTPUT/summary.xlsx for xlsx)")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie table PROJECT_DIR [--format csv|xlsx|md|import-xlsx] [-o FILE]")
		fset.PrintDefaults()
	}
	rest, err := parseInterleaved(fset, args)
	if err != nil {
		return exitUsage
	}
	if len(rest) != 1 {
		fmt.Fprintln(stderr, "tremie table: name one project directory")
		fset.Usage()
		return exitUsage
	}
	if *format != "csv" && *format != "xlsx" && *format != "md" && *format != "import-xlsx" {
		fmt.Fprintf(stderr, "tremie table: --format must be csv, xlsx, md or import-xlsx, not %q\n", *format)
		return exitUsage
	}
	pw, code := loadProjectWells(rest[0], stderr)
	if pw == nil {
		return code
	}
	tb := table.Build(pw.entries, pw.proj.Units)
	var buf bytes.Buffer
	switch *format {
	case "csv":
		err = tb.CSV(&buf)
	case "md":
		err = tb.Markdown(&buf)
	case "import-xlsx":
		var files []string
		for _, e := range pw.entries {
			if e.Well != nil {
				files = append(files, e.File)
			}
		}
		var wb *exchange.Workbook
		if wb, err = exchange.Layout(files); err == nil {
			var data []byte
			data, err = wb.XLSX(pw.date())
			buf.Write(data)
		}
		if *outFile == "" {
			*outFile = filepath.Join(pw.proj.Output, "import.xlsx")
		}
	case "xlsx":
		var data []byte
		data, err = tb.XLSX(pw.proj.Name, pw.date())
		buf.Write(data)
		if *outFile == "" {
			*outFile = filepath.Join(pw.proj.Output, "summary.xlsx")
		}
	}
	if err != nil {
		fmt.Fprintf(stderr, "tremie table: %v\n", err)
		return exitOutput
	}
	if *format == "csv" {
		// the CSV holds data only; its caution goes to the terminal
		fmt.Fprintln(stderr, table.Caution)
	}
	if *outFile == "" {
		if _, err := stdout.Write(buf.Bytes()); err != nil {
			return exitOutput
		}
		return code
	}
	if err := writeOutput(*outFile, buf.Bytes()); err != nil {
		fmt.Fprintf(stderr, "tremie table: %v\n", err)
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie table: %d monitoring points of %d wells written to %s\n", len(tb.Rows), tb.Wells(), *outFile)
	return code
}

// writeOutput writes a file atomically, creating its directory.
func writeOutput(path string, data []byte) error {
	if dir := filepath.Dir(path); dir != "" {
		if err := os.MkdirAll(dir, 0o755); err != nil {
			return fmt.Errorf("creating %s: %w", dir, err)
		}
	}
	return out.WriteFileAtomic(path, data)
}

// projectWells is a project with every well loaded, completed from the
// project's defaults and checked, in file order.
type projectWells struct {
	proj    *project.Project
	prof    *rules.Profile
	yields  *quantity.Yields // the project's yields file, nil for the defaults
	entries []table.Entry
}

// loadProjectWells reads the project in dir (a directory without
// project.toml is taken with every default) and loads and checks its
// wells in parallel. Problems are printed to stderr. It returns nil when
// nothing can be done, else the exit code the wells call for: 2 if a
// file could not be read, 1 if an unwaived error finding remains, else 0.
func loadProjectWells(dir string, stderr io.Writer) (*projectWells, int) {
	p, err := project.Load(dir)
	if errors.Is(err, project.ErrNoProject) {
		p, err = project.Default(dir), nil
	}
	if err != nil {
		fmt.Fprintln(stderr, err)
		return nil, exitInput
	}
	pw := &projectWells{proj: p}
	if path := p.ProfilePath(); path != "" {
		prof, err := rules.LoadProfile(path)
		if err != nil {
			fmt.Fprintln(stderr, schema.Errors(path, err))
			return nil, exitInput
		}
		pw.prof = prof
	}
	if path := p.YieldsPath(); path != "" {
		y, err := quantity.LoadYields(path)
		if err != nil {
			fmt.Fprintln(stderr, err)
			return nil, exitInput
		}
		pw.yields = y
		pw.prof = withYields(pw.prof, y)
	}
	files, err := p.WellFiles()
	if err != nil {
		fmt.Fprintf(stderr, "%s: %v\n", p.File, err)
		return nil, exitInput
	}
	if len(files) == 0 {
		fmt.Fprintf(stderr, "%s: no well files in %s\n", dir, p.Path(p.Wells))
		return nil, exitInput
	}
	res, _ := batch.Run(files, batch.Options{Progress: batch.Terminal(), Label: "checking"}, func(i int, f string) (table.Entry, batch.Outcome, error) {
		w, err := schema.LoadFile(f)
		if err != nil {
			return table.Entry{File: f, Err: err}, batch.Done, err
		}
		project.Apply(p, w)
		return table.Entry{File: f, Well: w, Findings: rules.Check(w, pw.prof)}, batch.Done, nil
	})
	code := exitOK
	for i, r := range res {
		e := r.Value
		if r.Err != nil {
			e = table.Entry{File: files[i], Err: r.Err} // a panic leaves no value
			fmt.Fprintln(stderr, schema.Errors(files[i], r.Err))
			code = exitInput
		} else if code == exitOK && rules.Blocking(e.Findings) {
			code = exitFindings
		}
		pw.entries = append(pw.entries, e)
	}
	return pw, code
}

// date is the date written into the project's documents, never the
// clock: SOURCE_DATE_EPOCH when set, else the project's issue date, else
// the newest date in any well, else 1970-01-01.
func (pw *projectWells) date() time.Time {
	if s := os.Getenv("SOURCE_DATE_EPOCH"); s != "" {
		if n, err := strconv.ParseInt(s, 10, 64); err == nil {
			return time.Unix(n, 0).UTC()
		}
	}
	if d := pw.proj.TitleBlock.Issued; !d.IsZero() {
		return d.Time()
	}
	var newest time.Time
	later := func(t time.Time) {
		if t.After(newest) {
			newest = t
		}
	}
	for _, e := range pw.entries {
		if e.Well == nil {
			continue
		}
		w := e.Well
		for _, d := range []schema.Date{w.Drilled, w.Completed, w.Elevation.Surveyed} {
			if !d.IsZero() {
				later(d.Time())
			}
		}
		for _, l := range w.WaterLevels {
			later(l.Measured.UTC())
		}
	}
	if newest.IsZero() {
		return time.Unix(0, 0).UTC()
	}
	return newest
}
