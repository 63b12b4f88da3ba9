package quantities

import (
	"fmt"
	"io"
	"strconv"
	"strings"
	"text/tabwriter"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// writeText writes the report for a person: each well's table of
// intervals and its notes, then the lists, then the caution.
func writeText(w io.Writer, rep *Report) error {
	ew := &errWriter{w: w}
	fmt.Fprintf(ew, "Reconciliation checked with %s.\n\n", strings.Join(rep.Profiles, "; "))
	for i, wq := range rep.Wells {
		if i > 0 {
			fmt.Fprintln(ew)
		}
		writeWellText(ew, wq)
	}
	if len(rep.Wells) > 0 {
		fmt.Fprintln(ew)
		writeOrderText(ew, rep.Order)
	}
	fmt.Fprintln(ew)
	fmt.Fprintln(ew, rep.Caution)
	return ew.err
}

// writeWellText writes one well: its intervals, then a line for each
// figure and finding.
func writeWellText(w io.Writer, wq Well) {
	r := wq.Quantities
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
// writeOrderText writes the order list, the as-built list and the wells
// held out of both.
func writeOrderText(w io.Writer, o *quantity.Order) {
	if len(o.For) == 0 && len(o.Held) > 0 {
		fmt.Fprintf(w, "No order: every well is left out (below)\n")
	} else {
		if o.Planned {
			fmt.Fprintf(w, "Order for the planned wells %s\n", strings.Join(o.For, ", "))
		} else {
			fmt.Fprintf(w, "Order for %s\n", unplannedWells(len(o.For)))
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

// writeLinesText writes a list's lines: to order, or as built.
func writeLinesText(w io.Writer, lines []*quantity.Line, order bool) {
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

// unplannedWells names the wells an order covers when none is planned,
// so that the order counts every well: "all 7 wells (none is planned)".
func unplannedWells(n int) string {
	switch n {
	case 1:
		return "the one well (not a planned well)"
	case 2:
		return "both wells (neither is planned)"
	}
	return "all " + strconv.Itoa(n) + " wells (none is planned)"
}
