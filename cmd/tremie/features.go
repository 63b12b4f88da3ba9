package main

import (
	"bytes"
	"fmt"
	"io"
	"slices"

	"github.com/tremie-dev/tremie/render/features"
	"github.com/tremie-dev/tremie/render/pipeline"
)

func init() {
	register(&command{
		name:    "features",
		summary: "list open-hole wall features with dip, dip direction, strike and pole (--format text|csv|json)",
		run:     runFeatures,
		args:    "FILE|DIR...",
	})
}

func runFeatures(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("features", stdout, stderr)
	format := fset.choice("format", "text", []string{"text", "csv", "json"}, "output `format`: text, csv or json")
	paths, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if !slices.Contains(features.Formats, *format) {
		return fset.usageError("unknown format %q (text, csv or json)", *format)
	}
	if len(paths) == 0 {
		return fset.usageError("name at least one well file or directory")
	}
	run, code, ok := resolve("features", paths, pipeline.Options{}, stderr)
	if !ok {
		return code
	}
	var rows []features.Row
	for _, w := range run.PrepareAll(pipeline.AllRules, "reading") {
		if w.Err != nil {
			printErr(stderr, "features", w.Err)
			code = exitInput
			continue
		}
		rows = append(rows, features.Rows(w.Path, w.Well)...)
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
