package main

import (
	"bytes"
	"flag"
	"fmt"
	"io"
	"slices"

	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/project"
)

func init() {
	register(&command{
		name:    "features",
		summary: "list open-hole wall features with dip, dip direction, strike and pole (--format text|csv|json)",
		run:     runFeatures,
	})
}

func runFeatures(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("features", flag.ContinueOnError)
	fset.SetOutput(stderr)
	format := fset.String("format", "text", "output format: text, csv or json")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie features [--format text|csv|json] FILE|DIR...")
		fset.PrintDefaults()
	}
	paths, err := parseInterspersed(fset, args)
	if err != nil {
		return exitUsage
	}
	if !slices.Contains(features.Formats, *format) {
		fmt.Fprintf(stderr, "tremie features: unknown format %q (text, csv or json)\n", *format)
		return exitUsage
	}
	if len(paths) == 0 {
		fset.Usage()
		return exitUsage
	}
	in, errs := collectInputs(paths)
	code := exitOK
	for _, e := range errs {
		fmt.Fprintf(stderr, "tremie features: %v\n", e)
		code = exitInput
	}
	if len(in.files) == 0 && len(errs) == 0 {
		fmt.Fprintln(stderr, "tremie features: no well files found")
		return exitInput
	}
	var rows []features.Row
	for _, f := range in.files {
		w, err := schema.LoadFile(f)
		if err != nil {
			fmt.Fprintln(stderr, err)
			code = exitInput
			continue
		}
		project.Apply(in.projects[f], w)
		rows = append(rows, features.Rows(f, w)...)
	}
	var buf bytes.Buffer
	if err := features.Write(&buf, rows, *format); err != nil {
		fmt.Fprintf(stderr, "tremie features: %v\n", err)
		return exitOutput
	}
	if _, err := stdout.Write(buf.Bytes()); err != nil {
		return exitOutput
	}
	return code
}
