package quantities

import (
	"io"
	"strconv"
	"strings"

	"github.com/tremie-dev/tremie/render/table"
	"github.com/tremie-dev/tremie/schema/quantity"
)

// csvRecord is one record of the CSV form: an interval of a well
// ("interval"), a line of a list ("order", "as-built"), or the closing
// "profile" and "caution". Volumes are in volume_unit (the well's primary
// unit), masses in mass_unit, depths in depth_unit; nil is a blank field.
type csvRecord struct {
	Kind, File, Well, Fill, Material, Within string
	Top, Bottom                              *float64
	DepthUnit                                string
	Calculated                               *float64
	VolumeUnit                               string
	Yield                                    *float64
	YieldBasis                               string
	BagMass                                  *float64
	MassUnit                                 string
	BagsNeeded, BagsOrder                    *int
	BagsPlaced, Placed, Ratio                *float64
	Note                                     string
}

// csvColumn is one column: its header and how a record fills it.
type csvColumn struct {
	Header string
	Value  func(csvRecord) string
}

func csvNumber(f func(csvRecord) *float64) func(csvRecord) string {
	return func(r csvRecord) string {
		if v := f(r); v != nil {
			return strconv.FormatFloat(r4(*v), 'f', -1, 64)
		}
		return ""
	}
}

func csvCount(f func(csvRecord) *int) func(csvRecord) string {
	return func(r csvRecord) string {
		if v := f(r); v != nil {
			return strconv.Itoa(*v)
		}
		return ""
	}
}

// csvColumns are the columns of the CSV form, in order.
var csvColumns = []csvColumn{
	{"kind", func(r csvRecord) string { return r.Kind }},
	{"file", func(r csvRecord) string { return r.File }},
	{"well", func(r csvRecord) string { return r.Well }},
	{"fill", func(r csvRecord) string { return r.Fill }},
	{"material", func(r csvRecord) string { return r.Material }},
	{"within", func(r csvRecord) string { return r.Within }},
	{"top", csvNumber(func(r csvRecord) *float64 { return r.Top })},
	{"bottom", csvNumber(func(r csvRecord) *float64 { return r.Bottom })},
	{"depth_unit", func(r csvRecord) string { return r.DepthUnit }},
	{"calculated", csvNumber(func(r csvRecord) *float64 { return r.Calculated })},
	{"volume_unit", func(r csvRecord) string { return r.VolumeUnit }},
	{"yield", csvNumber(func(r csvRecord) *float64 { return r.Yield })},
	{"yield_basis", func(r csvRecord) string { return r.YieldBasis }},
	{"bag_mass", csvNumber(func(r csvRecord) *float64 { return r.BagMass })},
	{"mass_unit", func(r csvRecord) string { return r.MassUnit }},
	{"bags_needed", csvCount(func(r csvRecord) *int { return r.BagsNeeded })},
	{"bags_to_order", csvCount(func(r csvRecord) *int { return r.BagsOrder })},
	{"bags_placed", csvNumber(func(r csvRecord) *float64 { return r.BagsPlaced })},
	{"placed", csvNumber(func(r csvRecord) *float64 { return r.Placed })},
	{"ratio", csvNumber(func(r csvRecord) *float64 { return r.Ratio })},
	{"note", func(r csvRecord) string { return r.Note }},
}

// writeCSV writes the report as RFC 4180 CSV: the header, every interval
// of every well, the order and as-built lists, then the profiles in force
// and the caution. Fields are made inert against formula injection.
func writeCSV(w io.Writer, rep *Report) error {
	cw := table.NewCSV(w)
	header := make([]string, len(csvColumns))
	for i, c := range csvColumns {
		header[i] = c.Header
	}
	cw.Write(header)
	write := func(r csvRecord) {
		rec := make([]string, len(csvColumns))
		for i, c := range csvColumns {
			rec[i] = c.Value(r)
		}
		cw.Write(table.InertRecord(rec))
	}
	for _, wq := range rep.Wells {
		for _, row := range wq.Quantities.AllRows() {
			write(intervalRecord(wq, row))
		}
	}
	lines := func(kind string, ts []*quantity.Line, wells []string) {
		for _, t := range ts {
			write(lineRecord(kind, t, countOf(t.Intervals, "interval")+" of "+strings.Join(wells, " ")))
		}
	}
	lines("order", rep.Order.Lines, rep.Order.For)
	lines("as-built", rep.Order.AsBuiltLines, rep.Order.AsBuilt)
	write(csvRecord{Kind: "profile", Note: strings.Join(rep.Profiles, "; ")})
	write(csvRecord{Kind: "caution", Note: rep.Caution})
	cw.Flush()
	return cw.Error()
}

// intervalRecord is one interval of a well; one that cannot be computed
// carries its error as the note.
func intervalRecord(wq Well, row quantity.Row) csvRecord {
	r := wq.Quantities
	u := r.Well.Units
	p, _ := quantity.VolumeUnits(u)
	mu := quantity.MassUnit(u)
	f := row.Fill
	rec := csvRecord{Kind: "interval", File: wq.File, Well: r.Well.ID, Fill: row.Label(), Material: string(f.Material), Within: f.Within,
		Top: ptr(f.Top.In(u.Depth)), Bottom: ptr(f.Bottom.In(u.Depth)), DepthUnit: string(u.Depth), VolumeUnit: string(p), MassUnit: string(mu)}
	if row.Err != nil {
		rec.Note = row.Err.Error()
		return rec
	}
	rec.Calculated = ptr(row.Calculated.In(p))
	if row.HasYield {
		rec.Yield, rec.YieldBasis = ptr(row.Yield.Volume.In(p)), string(row.Yield.Basis)
		if row.Yield.BagMass > 0 {
			rec.BagMass = ptr(row.Yield.BagMass.In(mu))
		}
		rec.BagsNeeded = ptr(row.BagsNeeded)
	}
	if f.Bags > 0 {
		rec.BagsPlaced = ptr(f.Bags)
	}
	if row.Placed > 0 {
		rec.Placed = ptr(row.Placed.In(p))
	}
	if row.Ratio > 0 {
		rec.Ratio = ptr(row.Ratio)
	}
	return rec
}

// lineRecord is one line of a list, of kind "order" or "as-built".
func lineRecord(kind string, t *quantity.Line, note string) csvRecord {
	p, _ := quantity.VolumeUnits(t.Units)
	mu := quantity.MassUnit(t.Units)
	rec := csvRecord{Kind: kind, Material: string(t.Material), Note: note,
		Calculated: ptr(t.Calculated.In(p)), VolumeUnit: string(p), MassUnit: string(mu)}
	if t.HasYield {
		rec.Yield, rec.YieldBasis = ptr(t.Yield.Volume.In(p)), string(t.Yield.Basis)
		if t.Yield.BagMass > 0 {
			rec.BagMass = ptr(t.Yield.BagMass.In(mu))
		}
		rec.BagsNeeded, rec.BagsOrder = ptr(t.BagsNeeded), ptr(t.BagsOrder)
	}
	if t.BagsPlaced > 0 {
		rec.BagsPlaced = ptr(t.BagsPlaced)
	}
	if t.Placed > 0 {
		rec.Placed = ptr(t.Placed.In(p))
	}
	return rec
}

// countOf is "1 interval" or "3 intervals".
func countOf(n int, word string) string {
	if n == 1 {
		return "1 " + word
	}
	return strconv.Itoa(n) + " " + word + "s"
}
