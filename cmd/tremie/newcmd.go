package main

import (
	"errors"
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
		args:    "ID",
		about:   newKindsAbout(),
	})
}

func runNew(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("new", stdout, stderr)
	purpose := fset.String("purpose", "", "well `purpose` (default: the kind's usual one)")
	units := fset.String("units", "ft", "`units` of the file: ft (feet, inches) or m (metres, millimetres)")
	kind := fset.String("kind", "monitoring", "`kind` of well: "+strings.Join(starter.Kinds, ", "))
	dir := fset.dir("o", ".", "`folder` to write ID.toml in")
	pos, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(pos) != 1 {
		return fset.usageError("name one well ID")
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

// newKindsAbout lists the kinds of well tremie new writes, for its usage.
func newKindsAbout() string {
	var b strings.Builder
	b.WriteString("kinds:")
	for _, k := range starter.Kinds {
		fmt.Fprintf(&b, "\n  %-11s %s", k, starter.KindDoc(k))
	}
	b.WriteString("\nEach starter ends with the optional tables its kind may record, commented out: formation\n" +
		"sieve analyses ([[sample]]), a pumping test ([pumping_test]) for supply and rock wells, and the\n" +
		"wall's features ([orientation], [[feature]]) for a rock well.")
	return b.String()
}
