package main

import (
	"fmt"
	"io"
	"math"
	"slices"
	"strings"

	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/render/quantities"
	"github.com/tremie-dev/tremie/schema/quantity"
)

func init() {
	register(&command{
		name:    "quantities",
		summary: "annular volumes, bags needed and placed, ratios, project totals",
		args:    "FILE|DIR...",
		run:     runQuantities,
	})
}

func runQuantities(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("quantities", stdout, stderr)
	formats := quantities.Formats()
	format := fset.choice("format", formats[0], formats, "output `format`: "+strings.Join(formats, ", "))
	contingency := fset.Float64("contingency", quantity.DefaultContingency, "`percentage` added to each volume before it is rounded up to bags to order; the default follows "+quantity.DefaultContingencySource)
	yieldsFile := fset.String("yields", "", "TOML `file` with a [yields] table overriding the yields (default: the project's)")
	profileFile := fset.String("profile", "", "rule profile TOML `file` setting the reconciliation thresholds (default: the project's)")
	porosity := fset.Float64("pack-porosity", 0, "`porosity` (0 to 1) of the saturated filter pack, to add its pore water to the well volume; 0 leaves it out")
	paths, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if !slices.Contains(formats, *format) {
		return fset.usageError("unknown format %q (%s)", *format, strings.Join(formats, ", "))
	}
	if *contingency < 0 || *contingency > 1000 || math.IsNaN(*contingency) {
		return fset.usageError("--contingency %v is not a percentage between 0 and 1000", *contingency)
	}
	if !(*porosity >= 0 && *porosity < 1) {
		return fset.usageError("--pack-porosity %v is not a fraction between 0 and 1", *porosity)
	}
	if len(paths) == 0 {
		return fset.usageError("name at least one well file or directory")
	}
	run, code, ok := resolve("quantities", paths, pipeline.Options{Profile: *profileFile, Yields: *yieldsFile}, stderr)
	if !ok {
		return code
	}
	rep, problems := quantities.Build(run, quantities.Options{Contingency: *contingency, PackPorosity: *porosity})
	for _, p := range problems {
		if p.Unreadable {
			printErr(stderr, "quantities", p.Err)
			code = exitInput
			continue
		}
		fmt.Fprintln(stderr, p) // an interval that cannot be computed: file:line: error
		if code == exitOK {
			code = exitFindings
		}
	}
	if err := quantities.Write(stdout, *format, rep); err != nil {
		fmt.Fprintf(stderr, "tremie quantities: writing the report: %v\n", err)
		return exitOutput
	}
	if code == exitOK && rep.Blocking() {
		code = exitFindings
	}
	return code
}
