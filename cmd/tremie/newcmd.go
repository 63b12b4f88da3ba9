package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/starter"
)

func init() {
	register(&command{
		name:    "new",
		summary: "write a starter well file: every key explained, example values marked # FILL",
		run:     runNew,
	})
}

func runNew(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("new", flag.ContinueOnError)
	fset.SetOutput(stderr)
	purpose := fset.String("purpose", "", "well purpose (default: the kind's usual one)")
	units := fset.String("units", "ft", "units of the file: ft (feet, inches) or m (metres, millimetres)")
	kind := fset.String("kind", "monitoring", "kind of well: "+strings.Join(starter.Kinds, ", "))
	dir := fset.String("o", ".", "folder to write ID.toml in")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie new ID [--purpose P] [--units ft|m] [--kind K] [-o DIR]")
		fset.PrintDefaults()
		for _, k := range starter.Kinds {
			fmt.Fprintf(stderr, "  %-11s %s\n", k, starter.KindDoc(k))
		}
	}
	pos, err := parseInterspersed(fset, args)
	if err != nil {
		return exitUsage
	}
	if len(pos) != 1 {
		fset.Usage()
		return exitUsage
	}
	wrote, err := starter.WriteWell(*dir, starter.Options{ID: pos[0], Kind: *kind, Purpose: schema.Purpose(*purpose), Units: schema.DepthUnit(*units)})
	for _, p := range wrote {
		fmt.Fprintln(stdout, "wrote", p)
	}
	if err != nil {
		fmt.Fprintf(stderr, "tremie new: %v\n", err)
		if errors.Is(err, starter.ErrExists) {
			return exitOutput
		}
		return exitUsage
	}
	return exitOK
}
