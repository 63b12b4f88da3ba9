package main

import (
	"fmt"
	"github.com/tremie-dev/tremie/render/table"
	"io"
	"path/filepath"

	"github.com/tremie-dev/tremie/render/gis"
	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/schema/crs"
)

func init() {
	register(&command{
		name:    "export",
		summary: "export a project's wells for GIS: one point per monitoring point (--format geojson|csv)",
		run:     runExport,
		args:    "PROJECT_DIR",
	})
}

func runExport(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("export", stdout, stderr)
	format := fset.choice("format", "geojson", []string{"geojson", "csv"}, "`format`: geojson (RFC 7946, WGS 84) or csv")
	outFile := fset.String("o", "", "output `file`, - for standard output (default: standard output)")
	rest, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(rest) != 1 {
		return fset.usageError("name one project directory")
	}
	if *format != "geojson" && *format != "csv" {
		return fset.usageError("--format must be geojson or csv, not %q", *format)
	}
	run, p, wells, code := prepareProject("export", rest[0], stderr)
	if p == nil {
		return code
	}
	var projected *crs.CRS
	var err error
	if p.CRS != "" {
		if projected, err = crs.Parse(p.CRS); err != nil || projected.Geographic() {
			projected = nil // a geographic project system leaves the projected columns to the wells
		}
	}
	dir := "."
	if *outFile != "" && *outFile != stdoutName {
		dir = filepath.Dir(*outFile)
	}
	names := pipeline.AssignNames(wells)
	entries := pipeline.Entries(wells)
	in := make([]gis.Input, len(wells))
	for i, w := range wells {
		in[i] = gis.Input{Entry: entries[i], Sheets: gis.SheetFiles(p.Output, names[w])}
	}
	x := gis.Build(in, p.Units, projected, dir)
	x.Caution = table.CautionFor(pipeline.ProfileOf(wells)) // names the profile in force
	for _, s := range x.Skipped {
		fmt.Fprintf(stderr, "%s: %s left out of the export: %s\n", s.File, or(s.ID, "well"), s.Reason)
	}
	var data []byte
	if *format == "csv" {
		if data, err = x.CSV(); err != nil {
			fmt.Fprintf(stderr, "tremie export: %v\n", err)
			return exitOutput
		}
	} else {
		data = x.GeoJSON()
	}
	if *outFile == "" || *outFile == stdoutName {
		return worse(code, toStdout("export", stdout, stderr, data, false))
	}
	if err := run.WriteNamed(*outFile, data); err != nil {
		fmt.Fprintf(stderr, "tremie export: %v\n", err)
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie export: %s written to %s (%s left out)\n", counted(len(x.Points), "monitoring point", "monitoring points"), *outFile, counted(len(x.Skipped), "well", "wells"))
	return code
}

func or(s, alt string) string {
	if s == "" {
		return alt
	}
	return s
}
