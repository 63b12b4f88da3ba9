package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"time"

	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/schema/exchange"
)

func init() {
	register(&command{
		name:    "import",
		summary: "make well files from a workbook or CSV files in tremie's import layout (--template FILE.xlsx writes the layout)",
		run:     runImport,
		args:    "TABLE.xlsx|WELLS.csv [INTERVALS.csv]",
		about:   "Every bad cell is named as file:Sheet!B12 and then nothing is written; an existing well file is\nkept unless --force. The layout is described in docs/import.md.",
	})
}

func runImport(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("import", stdout, stderr)
	outDir := fset.dir("o", "", "`directory` for the well files (required)")
	template := fset.String("template", "", "write the import layout as a workbook, with example well EX-1, to this `file` (- for standard output)")
	force := fset.Bool("force", false, "overwrite well files (or the --template file) that already exist")
	rest, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if *template != "" {
		if len(rest) != 0 || *outDir != "" {
			return fset.usageError("--template takes only the file to write")
		}
		if _, err := os.Stat(*template); err == nil && !*force && *template != stdoutName {
			fmt.Fprintf(stderr, "tremie import: %s exists; --force overwrites it\n", *template)
			return exitOutput
		}
		data, err := exchange.Template(templateDate())
		if err == nil && *template == stdoutName {
			return toStdout("import", stdout, stderr, data, true)
		}
		if err == nil {
			err = pipeline.WriteFile(*template, data)
		}
		if err != nil {
			fmt.Fprintf(stderr, "tremie import: %v\n", err)
			return exitOutput
		}
		fmt.Fprintf(stdout, "tremie import: the layout, with example well EX-1, written to %s\n", *template)
		return exitOK
	}
	if len(rest) == 0 || *outDir == "" {
		return fset.usageError("name the workbook (or CSV files) and -o WELLS_DIR")
	}
	files, errs := exchange.Import(rest...)
	for _, e := range errs {
		fmt.Fprintln(stderr, e)
	}
	if len(errs) > 0 {
		fmt.Fprintf(stderr, "tremie import: %d %s; nothing written\n", len(errs), plural(len(errs), "problem", "problems"))
		return exitInput
	}
	paths, existing := exchange.Destinations(*outDir, files)
	if taken := exchange.Taken(*outDir, files, paths); len(taken) > 0 {
		for _, e := range taken {
			fmt.Fprintln(stderr, e)
		}
		fmt.Fprintf(stderr, "tremie import: %s; nothing written\n", counted(len(taken), "well ID already taken", "well IDs already taken"))
		return exitInput
	}
	if len(existing) > 0 && !*force {
		for _, p := range existing {
			fmt.Fprintf(stderr, "%s: exists; --force overwrites it\n", p)
		}
		fmt.Fprintf(stderr, "tremie import: %d %s; nothing written\n", len(existing), plural(len(existing), "well file exists", "well files exist"))
		return exitOutput
	}
	if err := os.MkdirAll(*outDir, 0o755); err != nil {
		fmt.Fprintf(stderr, "tremie import: %v\n", err)
		return exitOutput
	}
	for i, f := range files {
		if err := out.WriteFileAtomic(paths[i], f.Data); err != nil {
			fmt.Fprintf(stderr, "tremie import: %v\n", err)
			return exitOutput
		}
	}
	fmt.Fprintf(stdout, "tremie import: %d %s written to %s\n", len(files), plural(len(files), "well file", "well files"), filepath.Clean(*outDir))
	return exitOK
}

// templateDate is the template's document date: SOURCE_DATE_EPOCH when
// set, else a fixed day, so the template's bytes never change by
// themselves.
func templateDate() time.Time {
	if s, err := pipeline.SourceDate(); err == nil && s != "" {
		if t, err := time.Parse(time.RFC3339, s); err == nil {
			return t
		}
	}
	return time.Date(2026, 1, 1, 0, 0, 0, 0, time.UTC)
}
