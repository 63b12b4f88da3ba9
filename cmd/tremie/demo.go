package main

import (
	"errors"
	"fmt"
	"io"
	"path/filepath"
	"strings"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
)

func init() {
	register(&command{
		name:    "demo",
		summary: "write the invented demo project into -o DIR, then check and draw it",
		run:     runDemo,
		about:   "DIR must be new or empty, unless --force.",
	})
}

// demoSteps are the commands the demo runs on the project it writes, in
// order; each is a registered command given the project directory. A step
// whose command is not built in is skipped.
var demoSteps = []struct {
	name string
	args func(dir string) []string
}{
	{"check", func(dir string) []string { return []string{dir} }},
	{"quantities", func(dir string) []string { return []string{dir} }},
	{"features", func(dir string) []string { return []string{dir} }},
	{"render", func(dir string) []string { return []string{dir} }},
	{"section", func(dir string) []string { return []string{dir, "--force"} }},
	{"book", func(dir string) []string { return []string{dir, "-o", filepath.Join(dir, "out", "book.pdf")} }},
	{"table", func(dir string) []string {
		return []string{dir, "--format", "xlsx", "-o", filepath.Join(dir, "out", "summary.xlsx")}
	}},
}

func runDemo(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("demo", stdout, stderr)
	outDir := fset.dir("o", "tremie-demo", "`directory` to write the demo project into")
	force := fset.Bool("force", false, "write into DIR even if it is not empty, replacing the demo's files and outputs there")
	rest, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(rest) > 0 {
		return fset.usageError("unexpected argument %q (use -o DIR)", rest[0])
	}
	if err := demo.Write(*outDir, *force); err != nil {
		fmt.Fprintf(stderr, "tremie demo: %v\n", err)
		if errors.Is(err, demo.ErrNotEmpty) {
			return exitUsage
		}
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie demo: wrote the Coldwater Mill demo project (invented data) to %s\n", *outDir)
	worst := exitOK
	for _, step := range demoSteps {
		c, ok := commands[step.name]
		if !ok {
			continue
		}
		args := step.args(*outDir)
		if *force && step.name == "render" {
			args = append(args, "--force")
		}
		if quiet {
			args = append([]string{"--quiet"}, args...)
		}
		fmt.Fprintf(stdout, "\n$ tremie %s %s\n", step.name, strings.Join(args, " "))
		code := c.run(args, stdout, stderr)
		// The demo holds a flawed well on purpose, so a findings exit is
		// expected; an unreadable input or a failed write is not.
		if code > exitFindings && code > worst {
			worst = code
		}
	}
	return worst
}
