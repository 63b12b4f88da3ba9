package main

import (
	"flag"
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/out"
)

func init() {
	register(&command{
		name:    "demo",
		summary: "write the invented demo project into -o DIR, then check and draw it",
		run:     runDemo,
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
	fset := flag.NewFlagSet("demo", flag.ContinueOnError)
	fset.SetOutput(stderr)
	outDir := fset.String("o", "tremie-demo", "directory to write the demo project into")
	if err := fset.Parse(args); err != nil {
		return exitUsage
	}
	if fset.NArg() > 0 {
		fmt.Fprintf(stderr, "tremie demo: unexpected argument %q (use -o DIR)\n", fset.Arg(0))
		return exitUsage
	}
	if err := writeDemo(*outDir); err != nil {
		fmt.Fprintf(stderr, "tremie demo: %v\n", err)
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie demo: wrote the Coldwater Mill demo project (invented data) to %s\n", *outDir)
	worst := exitOK
	for _, step := range demoSteps {
		c, ok := commands[step.name]
		if !ok {
			continue
		}
		fmt.Fprintf(stdout, "\n$ tremie %s %s\n", step.name, joinArgs(step.args(*outDir)))
		code := c.run(step.args(*outDir), stdout, stderr)
		// The demo holds a flawed well on purpose, so a findings exit is
		// expected; an unreadable input or a failed write is not.
		if code > exitFindings && code > worst {
			worst = code
		}
	}
	return worst
}

func joinArgs(a []string) string {
	s := ""
	for i, x := range a {
		if i > 0 {
			s += " "
		}
		s += x
	}
	return s
}

// writeDemo copies the embedded project into dir, each file atomically.
func writeDemo(dir string) error {
	return fs.WalkDir(demo.FS, ".", func(path string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		target := filepath.Join(dir, filepath.FromSlash(path))
		if d.IsDir() {
			return os.MkdirAll(target, 0o755)
		}
		if ext := filepath.Ext(path); ext != ".toml" && ext != ".png" {
			return nil
		}
		data, err := demo.FS.ReadFile(path)
		if err != nil {
			return fmt.Errorf("reading embedded %s: %w", path, err)
		}
		if err := os.MkdirAll(filepath.Dir(target), 0o755); err != nil {
			return fmt.Errorf("creating %s: %w", filepath.Dir(target), err)
		}
		return out.WriteFileAtomic(target, data)
	})
}
