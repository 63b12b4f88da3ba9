package main

import (
	"errors"
	"flag"
	"fmt"
	"io"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/starter"
)

func init() {
	register(&command{
		name:    "init",
		summary: "start a project: project.toml with every key explained, a wells folder, a rule profile, editor schemas",
		run:     runInit,
	})
}

func runInit(args []string, stdout, stderr io.Writer) int {
	fset := flag.NewFlagSet("init", flag.ContinueOnError)
	fset.SetOutput(stderr)
	units := fset.String("units", "ft", "depth unit of the project: ft or m")
	name := fset.String("name", "", "project name (default: the folder's name)")
	noProfile := fset.Bool("no-profile", false, "write no rule profile")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie init [--units ft|m] [--name NAME] [--no-profile] DIR")
		fset.PrintDefaults()
	}
	pos, err := parseInterspersed(fset, args)
	if err != nil {
		return exitUsage
	}
	if len(pos) != 1 {
		fset.Usage()
		return exitUsage
	}
	dir := pos[0]
	wrote, err := starter.Init(dir, starter.InitOptions{Name: *name, Units: schema.DepthUnit(*units), NoProfile: *noProfile})
	if err != nil {
		fmt.Fprintf(stderr, "tremie init: %v\n", err)
		if errors.Is(err, starter.ErrExists) {
			return exitOutput
		}
		return exitUsage
	}
	for _, p := range wrote {
		fmt.Fprintln(stdout, "wrote", p)
	}
	fmt.Fprintf(stdout, "next: tremie new MW-1 -o %s/wells, fill in the values marked # FILL, then tremie check %s\n", dir, dir)
	return exitOK
}
