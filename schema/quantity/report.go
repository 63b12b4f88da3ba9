package quantity

import (
	"fmt"
	"math"
	"strconv"

	"github.com/tremie-dev/tremie/schema"
)

// Report is the quantities of one well: a row per fill interval and the
// volume per length inside each pipe.
type Report struct {
	Well  *schema.Well
	Rows  []Row
	Pipes []PipeVolume
	// Pad is the surface pad's concrete beyond the annular fills, as a
	// row (Index -1, Fill.Path PadPath); nil when the well has no pad.
	Pad *Row
}

// Row is one fill interval's arithmetic. Volumes are in cubic metres like
// every model volume; format them with FormatVolume.
type Row struct {
	Index int         // index of the fill in Well.Fills
	Fill  schema.Fill // the fill itself
	// Calculated is the annular volume of the interval; Err says why it
	// could not be computed (then every figure below that needs it is 0).
	Calculated schema.Volume
	Err        error
	// Yield is the volume of one bag in force (HasYield false when the
	// material has none, e.g. native backfill).
	Yield    Yield
	HasYield bool
	// BagsNeeded is Calculated / Yield, rounded up; BagsExact unrounded.
	BagsNeeded int
	BagsExact  float64
	// BagsPlaced is the recorded bag count (0 if none or given as a volume).
	BagsPlaced float64
	// Placed is the volume placed: the recorded volume, or bags x yield;
	// Recorded is false when the file gives no amount (a planned well).
	Placed   schema.Volume
	Recorded bool
	// Ratio is Placed / Calculated; 0 when either is unknown.
	Ratio float64
	Tags  []TagCheck
}

// TagCheck compares one tag with the top the bags should have reached.
type TagCheck struct {
	Tag schema.Tag
	// Expected is the depth the top should stand at after Tag.AfterBags
	// bags, filling upward from the interval's bottom. Reached is false
	// when that much material would overflow the region (Expected is then
	// the region's top); Err when the geometry fails.
	Expected schema.Length
	Reached  bool
	Err      error
}

// Off is the tag's depth less the expected one: positive when the tag is
// deeper than the bags should have left the top (material lost or a wider
// hole), negative when shallower (a bridge, or a narrower hole).
func (t TagCheck) Off() schema.Length { return t.Tag.Depth - t.Expected }

// PipeVolume is the volume per length inside one casing or string section.
type PipeVolume struct {
	Name     string // casing name, or string name
	Kind     string // casing kind, or section kind (riser, screen, sump)
	Path     string
	Interval schema.Interval
	Pipe     schema.Pipe
	Inside   VolumePerLength
}

// Compute works out every fill's quantities with the given yields (nil
// for DefaultYields). It never fails as a whole: a fill whose geometry is
// inconsistent carries its error in Row.Err.
func Compute(w *schema.Well, y *Yields) *Report {
	if y == nil {
		y = DefaultYields()
	}
	r := &Report{Well: w, Rows: make([]Row, 0, len(w.Fills))}
	secs := w.CrossSections()
	for i, f := range w.Fills {
		r.Rows = append(r.Rows, row(w, secs, y, i, f))
	}
	r.Pad = padRow(w, secs, y)
	for _, p := range w.HolePipes() {
		pv := PipeVolume{Path: p.Path, Interval: p.Interval}
		if p.Casing != nil {
			pv.Name, pv.Kind, pv.Pipe = p.Casing.Label(), string(p.Casing.Kind), p.Casing.Pipe
		} else {
			pv.Name, pv.Kind, pv.Pipe = p.String.Label(), string(p.Section.Kind), p.Section.Pipe
		}
		pv.Inside = InsideVolumePerLength(pv.Pipe)
		r.Pipes = append(r.Pipes, pv)
	}
	return r
}

func row(w *schema.Well, secs *schema.Sections, y *Yields, i int, f schema.Fill) Row {
	r := Row{Index: i, Fill: f, BagsPlaced: f.Bags, Recorded: f.Recorded()}
	r.Calculated, r.Err = annularVolume(w, secs, f)
	if r.Err != nil {
		r.Err = fmt.Errorf("%s: %w", fillPath(f, i), r.Err)
		r.Calculated = 0
	}
	r.Yield, r.HasYield = y.ForWell(f, w.Units)
	if r.HasYield && r.Yield.Volume > 0 && r.Err == nil {
		r.BagsExact = float64(r.Calculated / r.Yield.Volume)
		r.BagsNeeded = bagsUp(r.BagsExact)
	}
	switch {
	case f.Placed > 0:
		r.Placed = f.Placed
	case f.Bags > 0 && r.HasYield:
		r.Placed = schema.Volume(f.Bags) * r.Yield.Volume
	}
	if r.Placed > 0 && r.Calculated > 0 {
		r.Ratio = float64(r.Placed / r.Calculated)
	}
	if r.HasYield && r.Yield.Volume > 0 {
		for _, t := range f.Tags {
			tc := TagCheck{Tag: t}
			tc.Expected, tc.Reached, tc.Err = riseTop(w, secs, f, schema.Volume(t.AfterBags)*r.Yield.Volume)
			r.Tags = append(r.Tags, tc)
		}
	}
	return r
}

// bagsUp rounds a bag count up, forgiving the last part in a million that
// float arithmetic leaves on an exact count (10.0000000001 is 10 bags).
func bagsUp(n float64) int {
	if n <= 0 || math.IsNaN(n) || math.IsInf(n, 0) {
		return 0
	}
	return int(math.Ceil(n - 1e-6))
}

// AllRows is the fill rows followed by the pad's, if any: everything the
// well takes in bags.
func (r *Report) AllRows() []Row {
	if r.Pad == nil {
		return r.Rows
	}
	out := make([]Row, 0, len(r.Rows)+1)
	return append(append(out, r.Rows...), *r.Pad)
}

// IsPad reports whether the row is the surface pad's.
func (row Row) IsPad() bool { return row.Index < 0 }

// Label is the row's name in a report: "3" for the third fill, "pad".
func (row Row) Label() string {
	if row.IsPad() {
		return "pad"
	}
	return strconv.Itoa(row.Index + 1)
}

// fillPath is a fill's key path, made up for a well built in code.
func fillPath(f schema.Fill, i int) string {
	if f.Path != "" {
		return f.Path
	}
	return fmt.Sprintf("fill[%d]", i)
}
