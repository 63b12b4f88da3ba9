package main

import (
	"errors"
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
		args:    "DIR",
	})
}

func runInit(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("init", stdout, stderr)
	units := fset.String("units", "ft", "depth `unit` of the project: ft or m")
	name := fset.String("name", "", "project `name` (default: the folder's name)")
	noProfile := fset.Bool("no-profile", false, "write no rule profile")
	pos, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(pos) != 1 {
		return fset.usageError("name one directory")
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
