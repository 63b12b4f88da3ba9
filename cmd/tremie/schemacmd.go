package main

import (
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
		args:    "[" + strings.Join(jsonschema.Kinds, "|") + "]",
		about:   "The kind defaults to well.",
	})
}

func runSchema(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("schema", stdout, stderr)
	rest, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(rest) > 1 {
		return fset.usageError("name at most one kind of file")
	}
	kind := operandOr(rest, "well")
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
