package main

import (
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
	"text/tabwriter"

	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
)

func init() {
	register(&command{
		name:    "quantities",
		summary: "annular volumes, bags needed and placed, ratios, project totals",
		run:     runQuantities,
	})
}

// quantitiesCautionBase goes with every quantities report, followed by
// which rule thresholds were in force (quantitiesCaution).
const quantitiesCautionBase = "Figures and checks support, and never replace, the review of a licensed professional and " +
	"the governing local well code. Yields marked common practice or from memory are defaults: set them from the " +
	"product sheets (--yields FILE); "

// quantitiesCaution is the report's caution, true to the thresholds in
// force: "rule thresholds are defaults ..." only where no profile is, else
// each profile named once, in order of first use.
func quantitiesCaution(run *pipeline.Run) string {
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
	return quantitiesCautionBase + strings.Join(notes, "; ") + "."
}

// wellQuantities is one readable well's report and its reconciliation
// findings.
type wellQuantities struct {
	File     string
	Report   *quantity.Report
	Findings []rules.Finding
	Volumes  []quantity.WellVolume // water standing in each string, for purging
	// Collapse are the grout columns' loads on PVC casing, with the
	// project's yields (rule COLLAPSE-LOAD judges them).
	Collapse []quantity.CollapseLoad
}

func runQuantities(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("quantities", stdout, stderr)
	format := fset.choice("format", "text", []string{"text", "json", "csv"}, "output `format`: text, json or csv")
	contingency := fset.Float64("contingency", quantity.DefaultContingency, "`percentage` added to each volume before it is rounded up to bags to order (default from "+quantity.DefaultContingencySource+")")
	yieldsFile := fset.String("yields", "", "TOML `file` with a [yields] table overriding the yields (default: the project's)")
	profileFile := fset.String("profile", "", "rule profile TOML `file` setting the reconciliation thresholds (default: the project's)")
	porosity := fset.Float64("pack-porosity", 0, "`porosity` (0 to 1) of the saturated filter pack, to add its pore water to the well volume; 0 leaves it out")
	paths, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	switch *format {
	case "text", "json", "csv":
	default:
		return fset.usageError("unknown format %q (text, json or csv)", *format)
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
	var wells []wellQuantities
	var reports []*quantity.Report
	var held []string
	for _, w := range run.PrepareAll(pipeline.ReconcileRules, "quantifying") {
		if w.Err != nil {
			printErr(stderr, "quantities", w.Err)
			code = exitInput
			continue
		}
		// the checks of placed amounts and tags, with the same yields
		wq := wellQuantities{File: w.Path, Report: w.Quantities, Findings: w.Findings, Volumes: quantity.WellVolumes(w.Well, *porosity),
			Collapse: quantity.CollapseLoads(w.Well, w.Setting.Profile.Yields)}
		for _, r := range wq.Report.Rows {
			if r.Err != nil {
				fmt.Fprintf(stderr, "%s:%d: %v\n", w.Path, w.Well.Line(r.Fill.Path), r.Err)
				if code == exitOK {
					code = exitFindings
				}
			}
		}
		wells = append(wells, wq)
		if slip := unitSlip(w.Findings); slip {
			held = append(held, w.Well.ID)
			continue // a likely unit slip orders hundreds of bags: left out of the totals
		}
		reports = append(reports, w.Quantities)
	}
	order := quantity.Totals(reports, *contingency)
	order.Held = held
	profiles, caution := run.ProfileLabels(), quantitiesCaution(run)
	var werr error
	switch *format {
	case "json":
		werr = writeQuantitiesJSON(stdout, wells, order, profiles, caution)
	case "csv":
		werr = writeQuantitiesCSV(stdout, wells, order, profiles, caution)
	default:
		werr = writeQuantitiesText(stdout, wells, order, profiles, caution)
	}
	if werr != nil {
		fmt.Fprintf(stderr, "tremie quantities: writing the report: %v\n", werr)
		return exitOutput
	}
	return code
}

// total is one material line of a project list.
type total = quantity.Line

// --- text ---

func writeQuantitiesText(w io.Writer, wells []wellQuantities, order *quantity.Order, profiles []string, caution string) error {
	ew := &errWriter{w: w}
	fmt.Fprintf(ew, "Reconciliation checked with %s.\n\n", strings.Join(profiles, "; "))
	for i, wq := range wells {
		if i > 0 {
			fmt.Fprintln(ew)
		}
		writeWellText(ew, wq)
	}
	if len(wells) > 0 {
		fmt.Fprintln(ew)
		writeOrderText(ew, order)
	}
	fmt.Fprintln(ew)
	fmt.Fprintln(ew, caution)
	return ew.err
}

func writeWellText(w io.Writer, wq wellQuantities) {
	r := wq.Report
	u := r.Well.Units
	p, s := quantity.VolumeUnits(u)
	fmt.Fprintf(w, "%s  %s\n", r.Well.ID, wq.File)
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintf(tw, "  #\tmaterial\tinterval %s\tcalculated %s\t%s\tyield %s per bag\tbags needed\tbags placed\tplaced %s\tratio\n", u.Depth, p.Symbol(), s.Symbol(), p.Symbol(), p.Symbol())
	for _, row := range r.AllRows() {
		f := row.Fill
		iv := schema.TrimFloat(f.Top.In(u.Depth), 2) + "–" + schema.TrimFloat(f.Bottom.In(u.Depth), 2)
		mat := string(f.Material)
		if row.IsPad() {
			mat += " pad"
		}
		if f.Within != "" {
			mat += " (in " + f.Within + ")"
		}
		if row.Err != nil {
			fmt.Fprintf(tw, "  %s\t%s\t%s\t(error)\t-\t-\t-\t-\t-\t-\n", row.Label(), mat, iv)
			continue
		}
		yield, needed := "-", "-"
		if row.HasYield {
			yield = quantity.Number(row.Yield.Volume.In(p)) + " / " + quantity.FormatBag(row.Yield.BagMass, u)
			needed = strconv.Itoa(row.BagsNeeded)
		}
		placedBags, placed, ratio := "-", "-", "-"
		if f.Bags > 0 {
			placedBags = schema.TrimFloat(f.Bags, 2)
		} else if f.Placed > 0 {
			placedBags = "(volume)"
		}
		if row.Placed > 0 {
			placed = quantity.Number(row.Placed.In(p))
		}
		if row.Ratio > 0 {
			ratio = fmt.Sprintf("%.2f", row.Ratio)
		}
		fmt.Fprintf(tw, "  %s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\n", row.Label(), mat, iv,
			quantity.Number(row.Calculated.In(p)), quantity.Number(row.Calculated.In(s)), yield, needed, placedBags, placed, ratio)
	}
	tw.Flush()
	for _, row := range r.AllRows() {
		if row.Err != nil {
			fmt.Fprintf(w, "  %s cannot be computed: %v\n", row.Fill.Path, row.Err)
		}
		for _, tc := range row.Tags {
			if tc.Err != nil {
				continue
			}
			note := ""
			if !tc.Reached {
				note = " (more than the annulus holds to there)"
			}
			fmt.Fprintf(w, "  tag, fill %d: after %s bags tagged %s, expected %s%s\n", row.Index+1,
				schema.TrimFloat(tc.Tag.AfterBags, 2), u.FormatDepth(tc.Tag.Depth), u.FormatDepth(tc.Expected), note)
		}
	}
	if len(r.Pipes) > 0 {
		var parts []string
		for _, pv := range r.Pipes {
			if pv.Pipe.ID <= 0 {
				continue
			}
			name := pv.Name
			if pv.Kind != pv.Name {
				name += " " + pv.Kind
			}
			parts = append(parts, name+" "+quantity.FormatPerLength(pv.Inside, u))
		}
		if len(parts) > 0 {
			fmt.Fprintf(w, "  volume inside: %s\n", strings.Join(parts, "; "))
		}
	}
	for _, note := range yieldNotes(r) {
		fmt.Fprintf(w, "  yield: %s\n", note)
	}
	for _, row := range r.Rows {
		if line := mixLine(row, u); line != "" {
			fmt.Fprintf(w, "  grout mix, fill %s: %s\n", row.Label(), line)
		}
	}
	for _, v := range wq.Volumes {
		fmt.Fprintf(w, "  well volume, %s: %s\n", v.String, wellVolumeLine(v, u))
	}
	for _, c := range wq.Collapse {
		fmt.Fprintf(w, "  collapse load, fill %d: %s; net %s, %s of the rating (ASTM F480; rule COLLAPSE-LOAD)\n",
			fillNumber(r.Well, c.Fills[len(c.Fills)-1]), c.Describe(u), quantity.FormatPressure(c.Differential(), u), schema.TrimFloat(c.Fraction(), 2))
	}
	if line := screenFlowLine(r.Well); line != "" {
		fmt.Fprintf(w, "  screens: %s\n", line)
	}
	for _, d := range quantity.PackDesigns(r.Well) {
		fmt.Fprintf(w, "  filter pack, fill %d: %s\n", d.Index+1, packDesignLine(d, u))
	}
	for _, fd := range wq.Findings {
		fmt.Fprintf(w, "  %s %s (line %d): %s\n", fd.Label(), fd.Rule, fd.Line, fd.Message)
	}
}

// mixLine is a grout row's water per bag and expected density, with the
// mud-balance reading when one is recorded: "5.2 gal water per 94-lb
// sack, expected 15.56 lb/gal; measured 15.2 lb/gal (-2.3 %)".
func mixLine(row quantity.Row, u schema.Units) string {
	d, ok := row.Yield.Density()
	if !ok || !row.HasYield || row.Fill.Yield > 0 {
		return ""
	}
	want, unit := schema.SlurryDensityIn(d, u)
	s := fmt.Sprintf("expected %.2f %s", want, unit)
	if row.Yield.Water > 0 {
		water, wunit := quantity.WaterPerBagIn(row.Yield, u)
		s = fmt.Sprintf("%s %s water per %s, %s", quantity.Number(water), wunit, quantity.FormatBag(row.Yield.BagMass, u), s)
	}
	if row.Yield.Stated > 0 {
		s += " (stated in the yields file)"
	}
	if row.Fill.Density > 0 {
		got, _ := schema.SlurryDensityIn(row.Fill.Density, u)
		s += fmt.Sprintf("; measured %s %s (%+.1f %%)", schema.TrimFloat(got, 2), unit, (row.Fill.Density/d-1)*100)
	}
	return s
}

// screenFlowLine is a supply well's screen arithmetic at its pumping
// rate and its specific capacity, or "".
func screenFlowLine(wl *schema.Well) string {
	u := wl.Units
	var parts []string
	if f, ok := quantity.Entrance(wl); ok {
		area, aunit := quantity.OpenAreaIn(f.OpenArea, u)
		vel, vunit := quantity.VelocityIn(f.Velocity, u)
		capacity, qunit := schema.FlowIn(f.Capacity, u)
		rate, _ := schema.FlowIn(f.Rate, u)
		which := "tested"
		if f.Design {
			which = "design"
		}
		lim, _ := quantity.VelocityIn(quantity.EntranceLimit(u), u)
		limit := schema.TrimFloat(lim, 2) + " " + vunit
		parts = append(parts, fmt.Sprintf("open area %s %s (half of it effective), transmitting %s %s at %s (Driscoll 1986); entrance velocity %s %s at the %s rate of %s %s",
			quantity.Number(area), aunit, quantity.Number(capacity), qunit, limit, quantity.Number(vel), vunit, which, schema.TrimFloat(rate, 1), qunit))
	}
	if pt := wl.PumpingTest; pt != nil && pt.SpecificCapacity > 0 {
		sc, qunit := schema.FlowIn(pt.SpecificCapacity*float64(schema.LengthFrom(1, u.Depth)), u)
		parts = append(parts, fmt.Sprintf("specific capacity %s %s per %s of drawdown", quantity.Number(sc), qunit, u.Depth))
	}
	return strings.Join(parts, "; ")
}

// packDesignLine is a filter pack's uniformity coefficient and its d30
// against the formation samples in its screens: "Cu = d60/d10 = 1.56
// (rule PACK-UNIFORMITY); d30 5.0 times that of the sample at 28 ft
// (rule PACK-FORMATION-RATIO)"; the thresholds are the rules'.
func packDesignLine(d quantity.PackDesign, u schema.Units) string {
	var parts []string
	if d.Cu > 0 {
		parts = append(parts, "Cu = d60/d10 = "+schema.TrimFloat(d.Cu, 2)+" (rule PACK-UNIFORMITY)")
	}
	for _, sr := range d.Ratios {
		parts = append(parts, fmt.Sprintf("d30 %s times that of the sample at %s", schema.TrimFloat(sr.Ratio, 2), u.FormatDepth(sr.Sample.Depth)))
	}
	if len(d.Ratios) > 0 {
		parts[len(parts)-1] += " (rule PACK-FORMATION-RATIO)"
	}
	return strings.Join(parts, "; ")
}

// wellVolumeLine is one string's well and purge volumes.
func wellVolumeLine(v quantity.WellVolume, u schema.Units) string {
	s := fmt.Sprintf("static level %s to the bottom at %s: %s of water in the well", u.FormatDepth(v.Level), u.FormatDepth(v.Bottom), quantity.FormatVolume(v.Casing, u))
	if v.Pack > 0 {
		s += fmt.Sprintf(" + %s in the saturated pack (porosity %s)", quantity.FormatVolume(v.Pack, u), schema.TrimFloat(v.Porosity, 2))
	}
	return s + fmt.Sprintf("; purge %d well volumes = %s (USGS National Field Manual A4)", quantity.PurgeWellVolumes, quantity.FormatVolume(v.Purge(), u))
}

// yieldNotes lists each yield used in a well once, with its basis.
func yieldNotes(r *quantity.Report) []string {
	u := r.Well.Units
	seen := map[string]bool{}
	var out []string
	for _, row := range r.AllRows() {
		if !row.HasYield || row.Err != nil {
			continue
		}
		s := fmt.Sprintf("%s %s", row.Fill.Material, quantity.FormatYield(row.Yield, u))
		if row.Yield.Note != "" {
			s += ": " + row.Yield.Note
		}
		if !seen[s] {
			seen[s] = true
			out = append(out, s)
		}
	}
	return out
}

func writeOrderText(w io.Writer, o *quantity.Order) {
	if len(o.For) == 0 && len(o.Held) > 0 {
		fmt.Fprintf(w, "No order: every well is left out (below)\n")
	} else {
		if o.Planned {
			fmt.Fprintf(w, "Order for the planned wells %s\n", strings.Join(o.For, ", "))
		} else {
			fmt.Fprintf(w, "Order (no well is planned: ordering for all %d wells)\n", len(o.For))
		}
		fmt.Fprintf(w, "  bags to order add %s %% to each volume before rounding up to whole bags\n", schema.TrimFloat(o.Contingency, 2))
		writeLinesText(w, o.Lines, true)
		if len(o.AsBuilt) > 0 {
			fmt.Fprintf(w, "\nAs built, to reconcile: %s\n", strings.Join(o.AsBuilt, ", "))
			writeLinesText(w, o.AsBuiltLines, false)
		}
	}
	if len(o.Held) > 0 {
		fmt.Fprintf(w, "\nLeft out of both lists: %s, whose sizes are likely a unit slip (rule SIZE-PLAUSIBLE); correct them first\n", strings.Join(o.Held, ", "))
	}
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

func writeLinesText(w io.Writer, lines []*total, order bool) {
	if len(lines) == 0 {
		fmt.Fprintln(w, "  no interval could be computed")
		return
	}
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	if order {
		fmt.Fprintln(tw, "  material\tyield\tintervals\tcalculated\tbags needed\tbags to order")
	} else {
		fmt.Fprintln(tw, "  material\tyield\tintervals\tcalculated\tbags needed\tbags placed\tplaced")
	}
	for _, t := range lines {
		bag, needed, ord := "-", "-", "-"
		if t.HasYield {
			bag = quantity.FormatYield(t.Yield, t.Units)
			needed, ord = strconv.Itoa(t.BagsNeeded), strconv.Itoa(t.BagsOrder)
		}
		if order {
			fmt.Fprintf(tw, "  %s\t%s\t%d\t%s\t%s\t%s\n", t.Material, bag, t.Intervals, quantity.FormatVolume(t.Calculated, t.Units), needed, ord)
			continue
		}
		placedBags, placed := "-", "-"
		if t.BagsPlaced > 0 {
			placedBags = schema.TrimFloat(t.BagsPlaced, 2)
		}
		if t.Placed > 0 {
			placed = quantity.FormatVolume(t.Placed, t.Units)
		}
		fmt.Fprintf(tw, "  %s\t%s\t%d\t%s\t%s\t%s\t%s\n", t.Material, bag, t.Intervals, quantity.FormatVolume(t.Calculated, t.Units), needed, placedBags, placed)
	}
	tw.Flush()
}

// errWriter keeps the first write error so a report is written without
// checking every line.
type errWriter struct {
	w   io.Writer
	err error
}

func (e *errWriter) Write(p []byte) (int, error) {
	if e.err != nil {
		return len(p), nil
	}
	n, err := e.w.Write(p)
	e.err = err
	return n, err
}

// --- json ---

type jsonQuantities struct {
	Caution     string      `json:"caution"`
	Profiles    []string    `json:"profiles"` // the profiles in force: "default thresholds" or "profile NAME"
	Contingency float64     `json:"contingency_pct"`
	Wells       []jsonWell  `json:"wells"`
	OrderingFor []string    `json:"ordering_for"`
	ForPlanned  bool        `json:"ordering_for_planned"`
	Totals      []jsonTotal `json:"totals"`
	AsBuiltFor  []string    `json:"as_built"`
	// Held are wells left out of both lists: a likely unit slip.
	Held     []string        `json:"held_back"`
	AsBuilt  []jsonTotal     `json:"as_built_totals"`
	Findings []rules.Finding `json:"findings"`
}

type jsonWell struct {
	File        string     `json:"file"`
	Well        string     `json:"well"`
	DepthUnit   string     `json:"depth_unit"`
	VolumeUnit  string     `json:"volume_unit"`
	VolumeUnit2 string     `json:"volume_unit_2"`
	MassUnit    string     `json:"mass_unit"`
	Fills       []jsonFill `json:"fills"`
	Pipes       []jsonPipe `json:"pipes"`
	// WellVolumes are in volume_unit, levels in depth_unit.
	WellVolumes []jsonWellVolume `json:"well_volumes"`
	// CollapseLoads are in pressure_unit (psi, or kPa in a well in metres).
	CollapseLoads []jsonCollapse `json:"collapse_loads"`
}

// jsonCollapse is a grout column's worst load on PVC casing.
type jsonCollapse struct {
	Fill         int     `json:"fill"` // the column's lowest fill, from 1
	Top          float64 `json:"top"`
	Bottom       float64 `json:"bottom"`
	At           float64 `json:"at"`
	Pipe         string  `json:"pipe"`
	Outside      float64 `json:"outside"`
	Inside       float64 `json:"inside"`
	WaterStated  bool    `json:"water_inside_stated"`
	Differential float64 `json:"differential"`
	Rating       float64 `json:"rating"`
	Fraction     float64 `json:"fraction_of_rating"`
	Unit         string  `json:"pressure_unit"`
}

type jsonWellVolume struct {
	String     string   `json:"string"`
	Level      float64  `json:"static_level"`
	Bottom     float64  `json:"bottom"`
	Casing     float64  `json:"casing_volume"`
	Pack       *float64 `json:"pack_pore_volume,omitempty"`
	Porosity   *float64 `json:"pack_porosity,omitempty"`
	WellVolume float64  `json:"well_volume"`
	Purge      float64  `json:"purge_volume"`
	PurgeTimes int      `json:"purge_well_volumes"`
}

// jsonMix is a grout's mix per bag: water in water_unit (gal, or L for a
// well in metres) and densities in density_unit (lb/gal or kg/L).
type jsonMix struct {
	Water       float64  `json:"water_per_bag"`
	WaterUnit   string   `json:"water_unit"`
	Expected    float64  `json:"expected_density"`
	Measured    *float64 `json:"measured_density,omitempty"`
	DensityUnit string   `json:"density_unit"`
	// Stated: the expected density is the yields file's, not worked from
	// the mix; water_per_bag is 0 where the file gives no water.
	Stated bool `json:"density_stated"`
}

type jsonFill struct {
	Index       int       `json:"index"` // 0-based, as in the key paths
	Path        string    `json:"path"`
	Material    string    `json:"material"`
	Within      string    `json:"within,omitempty"`
	Top         float64   `json:"top"`
	Bottom      float64   `json:"bottom"`
	Calculated  float64   `json:"calculated"`
	Calculated2 float64   `json:"calculated_2"`
	Yield       *float64  `json:"yield,omitempty"`
	BagMass     *float64  `json:"bag_mass,omitempty"`
	YieldBasis  string    `json:"yield_basis,omitempty"`
	BagsExact   *float64  `json:"bags_exact,omitempty"`
	BagsNeeded  *int      `json:"bags_needed,omitempty"`
	BagsPlaced  *float64  `json:"bags_placed,omitempty"`
	Placed      *float64  `json:"placed,omitempty"`
	Ratio       *float64  `json:"ratio,omitempty"`
	Tags        []jsonTag `json:"tags,omitempty"`
	Mix         *jsonMix  `json:"mix,omitempty"`
	Error       string    `json:"error,omitempty"`
	// A filter pack's grading figures (quantity.PackDesigns).
	Cu           *float64          `json:"uniformity_coefficient,omitempty"`
	SampleRatios []jsonSampleRatio `json:"formation_d30_ratios,omitempty"`
}

// jsonSampleRatio is a pack's d30 over a formation sample's, the sample's
// depth in depth_unit.
type jsonSampleRatio struct {
	Path  string  `json:"sample"`
	Depth float64 `json:"depth"`
	Ratio float64 `json:"ratio"`
}

type jsonTag struct {
	AfterBags float64 `json:"after_bags"`
	Depth     float64 `json:"depth"`
	Expected  float64 `json:"expected"`
	Reached   bool    `json:"reached"`
}

type jsonPipe struct {
	Name   string  `json:"name"`
	Kind   string  `json:"kind"`
	Path   string  `json:"path"`
	Top    float64 `json:"top"`
	Bottom float64 `json:"bottom"`
	// Inside is the volume per length: US gal/ft for a file in feet, L/m
	// for one in metres (see unit).
	Inside float64 `json:"inside"`
	Unit   string  `json:"unit"`
}

type jsonTotal struct {
	Material   string   `json:"material"`
	Yield      *float64 `json:"yield,omitempty"`
	BagMass    *float64 `json:"bag_mass,omitempty"`
	MassUnit   string   `json:"mass_unit"`
	YieldBasis string   `json:"yield_basis,omitempty"`
	VolumeUnit string   `json:"volume_unit"`
	Calculated float64  `json:"calculated"`
	Intervals  int      `json:"intervals"`
	BagsNeeded *int     `json:"bags_needed,omitempty"`
	BagsOrder  *int     `json:"bags_to_order,omitempty"`
	BagsPlaced float64  `json:"bags_placed"`
	Placed     *float64 `json:"placed,omitempty"`
}

// jsonTotals writes a list's lines.
func jsonTotals(lines []*total) []jsonTotal {
	out := []jsonTotal{}
	for _, t := range lines {
		p, _ := quantity.VolumeUnits(t.Units)
		mu := quantity.MassUnit(t.Units)
		jt := jsonTotal{Material: string(t.Material), MassUnit: string(mu), VolumeUnit: string(p), Calculated: r4(t.Calculated.In(p)),
			Intervals: t.Intervals, BagsPlaced: t.BagsPlaced}
		if t.HasYield {
			jt.Yield = ptr(r4(t.Yield.Volume.In(p)))
			if t.Yield.BagMass > 0 {
				jt.BagMass = ptr(r4(t.Yield.BagMass.In(mu)))
			}
			jt.YieldBasis = string(t.Yield.Basis)
			jt.BagsNeeded, jt.BagsOrder = ptr(t.BagsNeeded), ptr(t.BagsOrder)
		}
		if t.Placed > 0 {
			jt.Placed = ptr(r4(t.Placed.In(p)))
		}
		out = append(out, jt)
	}
	return out
}

// r4 rounds to 4 decimals: stable output with no false precision.
func r4(v float64) float64 { return math.Round(v*1e4) / 1e4 }

func ptr[T any](v T) *T { return &v }

func writeQuantitiesJSON(w io.Writer, wells []wellQuantities, order *quantity.Order, profiles []string, caution string) error {
	out := jsonQuantities{Caution: caution, Profiles: profiles, Contingency: order.Contingency, Wells: []jsonWell{}, Totals: jsonTotals(order.Lines),
		OrderingFor: append([]string{}, order.For...), ForPlanned: order.Planned, AsBuiltFor: append([]string{}, order.AsBuilt...), Held: append([]string{}, order.Held...),
		AsBuilt: jsonTotals(order.AsBuiltLines), Findings: []rules.Finding{}}
	for _, wq := range wells {
		r := wq.Report
		u := r.Well.Units
		p, s := quantity.VolumeUnits(u)
		mu := quantity.MassUnit(u)
		jw := jsonWell{File: wq.File, Well: r.Well.ID, DepthUnit: string(u.Depth), VolumeUnit: string(p), VolumeUnit2: string(s), MassUnit: string(mu),
			Fills: []jsonFill{}, Pipes: []jsonPipe{}, WellVolumes: []jsonWellVolume{}, CollapseLoads: []jsonCollapse{}}
		for _, c := range wq.Collapse {
			pressure := func(pa float64) float64 { v, _ := quantity.PressureIn(pa, u); return r4(v) }
			_, unit := quantity.PressureIn(0, u)
			jw.CollapseLoads = append(jw.CollapseLoads, jsonCollapse{Fill: fillNumber(r.Well, c.Fills[len(c.Fills)-1]),
				Top: r4(c.Top.In(u.Depth)), Bottom: r4(c.Bottom.In(u.Depth)), At: r4(c.At.In(u.Depth)), Pipe: c.Pipe.Label(),
				Outside: pressure(c.Outside), Inside: pressure(c.Inside), WaterStated: c.WaterStated, Differential: pressure(c.Differential()),
				Rating: pressure(c.Rating), Fraction: r4(c.Fraction()), Unit: unit})
		}
		designs := map[int]quantity.PackDesign{}
		for _, d := range quantity.PackDesigns(r.Well) {
			designs[d.Index] = d
		}
		for _, v := range wq.Volumes {
			jv := jsonWellVolume{String: v.String, Level: r4(v.Level.In(u.Depth)), Bottom: r4(v.Bottom.In(u.Depth)), Casing: r4(v.Casing.In(p)),
				WellVolume: r4(v.Well().In(p)), Purge: r4(v.Purge().In(p)), PurgeTimes: quantity.PurgeWellVolumes}
			if v.Porosity > 0 {
				jv.Pack, jv.Porosity = ptr(r4(v.Pack.In(p))), ptr(v.Porosity)
			}
			jw.WellVolumes = append(jw.WellVolumes, jv)
		}
		for _, row := range r.AllRows() {
			f := row.Fill
			jf := jsonFill{Index: row.Index, Path: f.Path, Material: string(f.Material), Within: f.Within,
				Top: r4(f.Top.In(u.Depth)), Bottom: r4(f.Bottom.In(u.Depth))}
			if row.Err != nil {
				jf.Error = row.Err.Error()
				jw.Fills = append(jw.Fills, jf)
				continue
			}
			jf.Calculated, jf.Calculated2 = r4(row.Calculated.In(p)), r4(row.Calculated.In(s))
			if row.HasYield {
				jf.Yield = ptr(r4(row.Yield.Volume.In(p)))
				if row.Yield.BagMass > 0 {
					jf.BagMass = ptr(r4(row.Yield.BagMass.In(mu)))
				}
				jf.YieldBasis = string(row.Yield.Basis)
				jf.BagsExact = ptr(r4(row.BagsExact))
				jf.BagsNeeded = ptr(row.BagsNeeded)
			}
			if f.Bags > 0 {
				jf.BagsPlaced = ptr(f.Bags)
			}
			if row.Placed > 0 {
				jf.Placed = ptr(r4(row.Placed.In(p)))
			}
			if row.Ratio > 0 {
				jf.Ratio = ptr(r4(row.Ratio))
			}
			if d, ok := designs[row.Index]; ok && !row.IsPad() {
				if d.Cu > 0 {
					jf.Cu = ptr(r4(d.Cu))
				}
				for _, sr := range d.Ratios {
					jf.SampleRatios = append(jf.SampleRatios, jsonSampleRatio{Path: sr.Sample.Path, Depth: r4(sr.Sample.Depth.In(u.Depth)), Ratio: r4(sr.Ratio)})
				}
			}
			if d, ok := row.Yield.Density(); ok && row.HasYield && f.Yield <= 0 {
				water, wunit := quantity.WaterPerBagIn(row.Yield, u)
				m := &jsonMix{Water: r4(water), WaterUnit: wunit, Stated: row.Yield.Stated > 0}
				var want float64
				want, m.DensityUnit = schema.SlurryDensityIn(d, u)
				m.Expected = r4(want)
				if f.Density > 0 {
					got, _ := schema.SlurryDensityIn(f.Density, u)
					m.Measured = ptr(r4(got))
				}
				jf.Mix = m
			}
			for _, tc := range row.Tags {
				if tc.Err == nil {
					jf.Tags = append(jf.Tags, jsonTag{AfterBags: tc.Tag.AfterBags, Depth: r4(tc.Tag.Depth.In(u.Depth)), Expected: r4(tc.Expected.In(u.Depth)), Reached: tc.Reached})
				}
			}
			jw.Fills = append(jw.Fills, jf)
		}
		for _, pv := range r.Pipes {
			jp := jsonPipe{Name: pv.Name, Kind: pv.Kind, Path: pv.Path, Top: r4(pv.Interval.Top.In(u.Depth)), Bottom: r4(pv.Interval.Bottom.In(u.Depth))}
			inside, unit := quantity.PerLengthIn(pv.Inside, u)
			jp.Inside, jp.Unit = r4(inside), unit
			jw.Pipes = append(jw.Pipes, jp)
		}
		out.Wells = append(out.Wells, jw)
		out.Findings = append(out.Findings, wq.Findings...)
	}
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	return enc.Encode(out)
}

// --- csv ---

var quantitiesCSVHeader = []string{"kind", "file", "well", "fill", "material", "within", "top", "bottom", "depth_unit",
	"calculated", "volume_unit", "yield", "yield_basis", "bag_mass", "mass_unit", "bags_needed", "bags_to_order", "bags_placed", "placed", "ratio", "note"}

func writeQuantitiesCSV(w io.Writer, wells []wellQuantities, order *quantity.Order, profiles []string, cautionText string) error {
	cw := csv.NewWriter(w)
	cw.Write(quantitiesCSVHeader)
	num := func(v float64) string { return strconv.FormatFloat(r4(v), 'f', -1, 64) }
	for _, wq := range wells {
		r := wq.Report
		u := r.Well.Units
		p, _ := quantity.VolumeUnits(u)
		mu := quantity.MassUnit(u)
		for _, row := range r.AllRows() {
			f := row.Fill
			rec := make([]string, len(quantitiesCSVHeader))
			rec[0], rec[1], rec[2], rec[3], rec[4], rec[5] = "interval", wq.File, r.Well.ID, row.Label(), string(f.Material), f.Within
			rec[6], rec[7], rec[8] = num(f.Top.In(u.Depth)), num(f.Bottom.In(u.Depth)), string(u.Depth)
			rec[10], rec[14] = string(p), string(mu)
			if row.Err != nil {
				rec[20] = row.Err.Error()
				cw.Write(table.InertRecord(rec))
				continue
			}
			rec[9] = num(row.Calculated.In(p))
			if row.HasYield {
				rec[11], rec[12] = num(row.Yield.Volume.In(p)), string(row.Yield.Basis)
				if row.Yield.BagMass > 0 {
					rec[13] = num(row.Yield.BagMass.In(mu))
				}
				rec[15] = strconv.Itoa(row.BagsNeeded)
			}
			if f.Bags > 0 {
				rec[17] = num(f.Bags)
			}
			if row.Placed > 0 {
				rec[18] = num(row.Placed.In(p))
			}
			if row.Ratio > 0 {
				rec[19] = num(row.Ratio)
			}
			cw.Write(table.InertRecord(rec))
		}
	}
	lines := func(kind string, ts []*total, wells []string) {
		for _, t := range ts {
			csvTotal(cw, kind, t, countOf(t.Intervals, "interval")+" of "+strings.Join(wells, " "))
		}
	}
	lines("order", order.Lines, order.For)
	lines("as-built", order.AsBuiltLines, order.AsBuilt)
	caution := make([]string, len(quantitiesCSVHeader))
	caution[0], caution[20] = "caution", cautionText
	prof := make([]string, len(quantitiesCSVHeader))
	prof[0], prof[20] = "profile", strings.Join(profiles, "; ")
	cw.Write(table.InertRecord(prof))
	cw.Write(caution)
	cw.Flush()
	return cw.Error()
}

// csvTotal writes one line of a project list.
func csvTotal(cw *csv.Writer, kind string, t *total, note string) {
	num := func(v float64) string { return strconv.FormatFloat(r4(v), 'f', -1, 64) }
	{
		p, _ := quantity.VolumeUnits(t.Units)
		mu := quantity.MassUnit(t.Units)
		rec := make([]string, len(quantitiesCSVHeader))
		rec[0], rec[4], rec[20] = kind, string(t.Material), note
		rec[9], rec[10], rec[14] = num(t.Calculated.In(p)), string(p), string(mu)
		if t.HasYield {
			rec[11], rec[12] = num(t.Yield.Volume.In(p)), string(t.Yield.Basis)
			if t.Yield.BagMass > 0 {
				rec[13] = num(t.Yield.BagMass.In(mu))
			}
			rec[15], rec[16] = strconv.Itoa(t.BagsNeeded), strconv.Itoa(t.BagsOrder)
		}
		if t.BagsPlaced > 0 {
			rec[17] = num(t.BagsPlaced)
		}
		if t.Placed > 0 {
			rec[18] = num(t.Placed.In(p))
		}
		cw.Write(table.InertRecord(rec))
	}
}

// countOf is "1 interval" or "3 intervals".
func countOf(n int, word string) string {
	if n == 1 {
		return "1 " + word
	}
	return strconv.Itoa(n) + " " + word + "s"
}

// fillNumber is a fill's number in its well, from 1, as the reports count.
func fillNumber(w *schema.Well, f *schema.Fill) int {
	for i := range w.Fills {
		if &w.Fills[i] == f {
			return i + 1
		}
	}
	return 0
}
