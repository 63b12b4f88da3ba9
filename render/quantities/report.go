// Package quantities builds the quantities report of a run of wells
// (annular volumes, bags needed and placed, ratios, well and purge
// volumes, grout mixes, collapse loads, screen and filter-pack figures,
// reconciliation findings, and the project's order and as-built lists)
// and writes it in a registered format: text, JSON or CSV.
// The arithmetic is schema/quantity's; this package gathers it per well
// and words it.
package quantities

import (
	"fmt"
	"strings"

	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

// Options are the report's settings.
type Options struct {
	// Contingency is the percentage added to each volume before it is
	// rounded up to bags to order.
	Contingency float64
	// PackPorosity (0 to 1) adds the saturated filter pack's pore water to
	// the well volume; 0 leaves it out.
	PackPorosity float64
}

// Report is the quantities of every readable well of a run and the
// project's lists.
type Report struct {
	Wells    []Well
	Order    *quantity.Order
	Profiles []string // the profiles in force: "default thresholds" or "profile NAME"
	Caution  string
}

// Blocking reports whether some well's reconciliation found an unwaived
// error (placed volume far short, a tag far off): the command exits 1 on
// it, as check and render do.
func (r *Report) Blocking() bool {
	for _, w := range r.Wells {
		if rules.Blocking(w.Findings) {
			return true
		}
	}
	return false
}

// Well is one readable well's quantities and reconciliation findings.
type Well struct {
	File       string
	Quantities *quantity.Report
	Findings   []rules.Finding
	Volumes    []quantity.WellVolume // water standing in each string, for purging
	// Collapse are the grout columns' loads on PVC casing, with the
	// project's yields (rule COLLAPSE-LOAD judges them).
	Collapse []quantity.CollapseLoad
}

// Problem is a part of the report that is missing: a well file that could
// not be read (Unreadable; Err is its load error, a schema.ErrorList), or
// an interval whose geometry fails (Line is its [[fill]]'s line).
type Problem struct {
	File       string
	Line       int
	Err        error
	Unreadable bool
}

// Error is "file:line: error" for an interval, the load error for an
// unreadable file.
func (p Problem) Error() string {
	if p.Unreadable {
		return p.Err.Error()
	}
	return fmt.Sprintf("%s:%d: %v", p.File, p.Line, p.Err)
}

func (p Problem) Unwrap() error { return p.Err }

// Build prepares every well of the run with the reconciliation rules and
// gathers the report, in input order. A well whose sizes are likely a
// unit slip is reported but left out of both lists (Order.Held), since it
// would order hundreds of bags. The problems come in input order.
func Build(run *pipeline.Run, opt Options) (*Report, []Problem) {
	var wells []Well
	var reports []*quantity.Report
	var held []string
	var problems []Problem
	for _, w := range run.PrepareAll(pipeline.ReconcileRules, "quantifying") {
		if w.Err != nil {
			problems = append(problems, Problem{File: w.Path, Err: w.Err, Unreadable: true})
			continue
		}
		// the checks of placed amounts and tags, with the same yields
		wq := Well{File: w.Path, Quantities: w.Quantities, Findings: w.Findings, Volumes: quantity.WellVolumes(w.Well, opt.PackPorosity),
			Collapse: quantity.CollapseLoads(w.Well, w.Setting.Profile.Yields)}
		for _, r := range wq.Quantities.Rows {
			if r.Err != nil {
				problems = append(problems, Problem{File: w.Path, Line: w.Well.Line(r.Fill.Path), Err: r.Err})
			}
		}
		wells = append(wells, wq)
		if unitSlip(w.Findings) {
			held = append(held, w.Well.ID)
			continue
		}
		reports = append(reports, w.Quantities)
	}
	order := quantity.Totals(reports, opt.Contingency)
	order.Held = held
	return &Report{Wells: wells, Order: order, Profiles: run.ProfileLabels(), Caution: caution(run)}, problems
}

// unitSlip reports whether a well's findings say its sizes are likely a
// unit slip (rule SIZE-PLAUSIBLE, unwaived).
func unitSlip(fs []rules.Finding) bool {
	for _, f := range fs {
		if f.Rule == "SIZE-PLAUSIBLE" && !f.Waived {
			return true
		}
	}
	return false
}

// cautionBase goes with every quantities report, followed by which rule
// thresholds were in force (caution).
const cautionBase = "Figures and checks support, and never replace, the review of a licensed professional and " +
	"the governing local well code. Yields marked common practice or from memory are defaults: set them from the " +
	"product sheets (--yields FILE); "

// caution is the report's caution, true to the thresholds in force: "rule
// thresholds are defaults ..." only where no profile is, else each
// profile named once, in order of first use.
func caution(run *pipeline.Run) string {
	var notes []string
	seen := map[string]bool{}
	for _, s := range run.Settings {
		if n := s.Profile.ThresholdNote(); !seen[n] {
			seen[n] = true
			notes = append(notes, n)
		}
	}
	if len(notes) == 0 {
		notes = append(notes, (*rules.Profile)(nil).ThresholdNote())
	}
	return cautionBase + strings.Join(notes, "; ") + "."
}
