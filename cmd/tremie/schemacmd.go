package main

import (
	"flag"
	"fmt"
	"io"
	"strings"

	"github.com/tremie-dev/tremie/schema/jsonschema"
)

func init() {
	register(&command{
		name:    "schema",
		summary: "print the JSON Schema of a well, project, profile or yields file, for TOML editors",
		run:     runSchema,
	})
}

func runSchema(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("schema", flag.ContinueOnError)
	fset.SetOutput(stderr)
	fset.Usage = func() {
		fmt.Fprintf(stderr, "usage: tremie schema [%s]   (default well)\n", strings.Join(jsonschema.Kinds, "|"))
	}
	if err := fset.Parse(args); err != nil {
		return exitUsage
	}
	if fset.NArg() > 1 {
		fset.Usage()
		return exitUsage
	}
	kind := "well"
	if fset.NArg() == 1 {
		kind = fset.Arg(0)
	}
	b, err := jsonschema.Generate(kind)
	if err != nil {
		fmt.Fprintf(stderr, "tremie schema: %v\n", err)
		return exitUsage
	}
	if _, err := stdout.Write(b); err != nil {
		fmt.Fprintf(stderr, "tremie schema: %v\n", err)
		return exitOutput
	}
	return exitOK
}
