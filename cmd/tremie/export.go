package main

import (
	"flag"
	"fmt"
	"io"
	"path/filepath"

	"github.com/tremie-dev/tremie/render/gis"
	"github.com/tremie-dev/tremie/schema/crs"
)

func init() {
	register(&command{
		name:    "export",
		summary: "export a project's wells for GIS: one point per monitoring point (--format geojson|csv)",
		run:     runExport,
	})
}

func runExport(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("export", flag.ContinueOnError)
	fset.SetOutput(stderr)
	format := fset.String("format", "geojson", "geojson (RFC 7946, WGS 84) or csv")
	outFile := fset.String("o", "", "output file (default: stdout)")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie export PROJECT_DIR [--format geojson|csv] [-o FILE]")
		fset.PrintDefaults()
	}
	rest, err := parseInterleaved(fset, args)
	if err != nil {
		return exitUsage
	}
	if len(rest) != 1 {
		fmt.Fprintln(stderr, "tremie export: name one project directory")
		fset.Usage()
		return exitUsage
	}
	if *format != "geojson" && *format != "csv" {
		fmt.Fprintf(stderr, "tremie export: --format must be geojson or csv, not %q\n", *format)
		return exitUsage
	}
	pw, code := loadProjectWells(rest[0], stderr)
	if pw == nil {
		return code
	}
	var projected *crs.CRS
	if pw.proj.CRS != "" {
		if projected, err = crs.Parse(pw.proj.CRS); err != nil || projected.Geographic() {
			projected = nil // a geographic project system leaves the projected columns to the wells
		}
	}
	dir := "."
	if *outFile != "" {
		dir = filepath.Dir(*outFile)
	}
	files := make([]string, len(pw.entries))
	ids := make([]string, len(pw.entries))
	for i, e := range pw.entries {
		files[i] = e.File
		if e.Well != nil {
			ids[i] = e.Well.ID
		}
	}
	names := assignNames(files, ids)
	in := make([]gis.Input, len(pw.entries))
	for i, e := range pw.entries {
		in[i] = gis.Input{Entry: e, Sheets: gis.SheetFiles(pw.proj.Output, names[e.File])}
	}
	x := gis.Build(in, pw.proj.Units, projected, dir)
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
	if *outFile == "" {
		if _, err := stdout.Write(data); err != nil {
			return exitOutput
		}
		return code
	}
	if err := writeOutput(*outFile, data); err != nil {
		fmt.Fprintf(stderr, "tremie export: %v\n", err)
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie export: %d monitoring points written to %s (%d wells left out)\n", len(x.Points), *outFile, len(x.Skipped))
	return code
}

func or(s, alt string) string {
	if s == "" {
		return alt
	}
	return s
}
