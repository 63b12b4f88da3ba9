package main

import (
	"bytes"
	"fmt"
	"io"
	"path/filepath"
	"strings"

	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema/exchange"
	"github.com/tremie-dev/tremie/schema/project"
)

func init() {
	register(&command{
		name:    "table",
		summary: "write a project's construction summary table (--format csv|xlsx|md), or its wells in the import layout (import-xlsx)",
		run:     runTable,
		args:    "PROJECT_DIR",
	})
}

func runTable(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("table", stdout, stderr)
	format := fset.choice("format", "csv", []string{"csv", "xlsx", "md", "import-xlsx"}, "table `format`: csv, xlsx, md, or import-xlsx (the wells in tremie import's layout)")
	outFile := fset.String("o", "", "output `file`, - for standard output (default: standard output for csv and md, OUTPUT/summary.xlsx for xlsx, OUTPUT/import.xlsx for import-xlsx)")
	force := fset.Bool("force", false, "replace the default output file even if tremie did not write it")
	rest, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(rest) != 1 {
		return fset.usageError("name one project directory")
	}
	if *format != "csv" && *format != "xlsx" && *format != "md" && *format != "import-xlsx" {
		return fset.usageError("--format must be csv, xlsx, md or import-xlsx, not %q", *format)
	}
	run, p, wells, code := prepareProject("table", rest[0], stderr)
	if p == nil {
		return code
	}
	tb := pipeline.Table(p, wells)
	var buf bytes.Buffer
	var err error
	defaultName := ""
	what := counted(len(tb.Rows), "monitoring point", "monitoring points") + " of " + counted(tb.Wells(), "well", "wells")
	switch *format {
	case "csv":
		err = tb.CSV(&buf)
	case "md":
		err = tb.Markdown(&buf)
	case "import-xlsx":
		var files []string
		for _, w := range wells {
			if w.Well != nil {
				files = append(files, w.Path)
			}
		}
		wb, lerr := exchange.Layout(files)
		if lerr != nil {
			fmt.Fprintf(stderr, "tremie table: %v\n", lerr)
			return exitInput
		}
		var data []byte
		data, err = wb.XLSX(run.ProjectDate(p, wells))
		buf.Write(data)
		defaultName = "import.xlsx"
		what = counted(len(files), "well", "wells") + " in the import layout"
	case "xlsx":
		var data []byte
		data, err = tb.XLSX(p.Name, run.ProjectDate(p, wells))
		buf.Write(data)
		defaultName = "summary.xlsx"
	}
	if err != nil {
		fmt.Fprintf(stderr, "tremie table: %v\n", err)
		return exitOutput
	}
	if *format == "csv" {
		// the CSV holds data only; its caution goes to the terminal
		fmt.Fprintln(stderr, table.Caution)
	}
	checked := strings.Join(run.ProfileLabels(), "; ") // the check status column's thresholds
	if *outFile == "" && defaultName == "" || *outFile == stdoutName {
		fmt.Fprintf(stderr, "tremie table: wells checked with %s\n", checked)
		return worse(code, toStdout("table", stdout, stderr, buf.Bytes(), defaultName != ""))
	}
	dst, err := writeProjectOutput(run, *outFile, defaultName, buf.Bytes(), *force)
	if err != nil {
		fmt.Fprintf(stderr, "tremie table: %v\n", err)
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie table: %s written to %s (checked with %s)\n", what, dst, checked)
	return code
}

// prepareProject resolves one project directory and prepares its wells,
// printing every problem; p is nil when nothing can be done, and code is
// the exit code the wells call for.
func prepareProject(cmd, dir string, stderr io.Writer) (run *pipeline.Run, p *project.Project, wells []*pipeline.Well, code int) {
	run, p, err := pipeline.ResolveProject(dir, pipeline.Options{Quiet: quiet})
	if err != nil {
		printErr(stderr, cmd, err)
		return nil, nil, nil, exitInput
	}
	for _, e := range run.Problems {
		printErr(stderr, cmd, e)
	}
	if p == nil || len(run.Inputs) == 0 {
		return nil, nil, nil, exitInput
	}
	wells = run.PrepareAll(pipeline.AllRules, "checking")
	for _, w := range wells {
		if w.Err != nil {
			printErr(stderr, cmd, w.Err)
		}
	}
	return run, p, wells, exitFor(wells, len(run.Problems) > 0)
}

// writeProjectOutput writes a project document to the file the user named
// (they asked for it; never one the run reads), else to name in the
// output directory, where it replaces only a file tremie wrote unless
// force. It returns the path.
func writeProjectOutput(run *pipeline.Run, named, name string, data []byte, force bool) (string, error) {
	if named != "" {
		return named, run.WriteNamed(named, data)
	}
	return filepath.Join(run.OutDir, name), pipeline.WriteOwned(run.OutDir, name, data, force)
}
