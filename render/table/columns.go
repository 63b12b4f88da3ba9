package table

import (
	"strconv"

	"github.com/tremie-dev/tremie/schema"
)

// Cell is one value: a number (with the decimals it is shown with) or
// text. A nil number with empty text is a blank cell.
type Cell struct {
	Num    *float64
	Digits int  // decimals shown; -1 = as few as represent the value exactly
	Fixed  bool // keep trailing zeros (a slot of 0.010 in)
	Text   string
}

// String is the cell as text.
func (c Cell) String() string {
	if c.Num == nil {
		return c.Text
	}
	if c.Digits < 0 {
		return strconv.FormatFloat(*c.Num, 'f', -1, 64)
	}
	if c.Fixed {
		return strconv.FormatFloat(*c.Num, 'f', c.Digits, 64)
	}
	return schema.TrimFloat(*c.Num, c.Digits)
}

// Column is one column of the summary.
type Column struct {
	Header string
	Unit   string // "" for none; the table unit for lengths
	Value  func(Row) Cell
}

// Title is the header with its unit, e.g. "Ground elev. (ft)".
func (c Column) Title() string {
	if c.Unit == "" {
		return c.Header
	}
	return c.Header + " (" + c.Unit + ")"
}

func text(f func(Row) string) func(Row) Cell { return func(r Row) Cell { return Cell{Text: f(r)} } }

func number(digits int, f func(Row) *float64) func(Row) Cell {
	return func(r Row) Cell { return Cell{Num: f(r), Digits: digits} }
}

// Columns are the summary's columns, in order, for this table's unit.
func (t *Table) Columns() []Column {
	u := string(t.Units)
	slotUnit := string(t.DiameterUnit())
	return []Column{
		{"Well", "", text(func(r Row) string { return r.ID })},
		{"String", "", text(func(r Row) string { return r.String })},
		{"Purpose", "", text(func(r Row) string { return r.Purpose })},
		{"Easting", "", number(-1, func(r Row) *float64 { return r.Easting })},
		{"Northing", "", number(-1, func(r Row) *float64 { return r.Northing })},
		{"Latitude", "", number(-1, func(r Row) *float64 { return r.Latitude })},
		{"Longitude", "", number(-1, func(r Row) *float64 { return r.Longitude })},
		{"Coordinate system", "", text(func(r Row) string { return r.System })},
		{"Ground elev.", u, number(2, func(r Row) *float64 { return r.Ground })},
		{"MP elev.", u, number(2, func(r Row) *float64 { return r.MeasuringPoint })},
		{"Datum", "", text(func(r Row) string { return r.Datum })},
		{"Total depth", u, number(2, func(r Row) *float64 { return r.TotalDepth })},
		{"Casing size", "", text(func(r Row) string { return r.CasingSize })},
		{"Casing material", "", text(func(r Row) string { return r.CasingMaterial })},
		{"Screen top", u, number(2, func(r Row) *float64 { return r.ScreenTop })},
		{"Screen bottom", u, number(2, func(r Row) *float64 { return r.ScreenBottom })},
		{"Screen top elev.", u, number(2, func(r Row) *float64 { return r.ScreenTopElev })},
		{"Screen bottom elev.", u, number(2, func(r Row) *float64 { return r.ScreenBottomElev })},
		{"Slot", slotUnit, func(r Row) Cell {
			if r.Slot == nil {
				return Cell{Text: r.SlotText}
			}
			d := 3 // 0.040 in
			if t.DiameterUnit() == schema.Millimetres {
				d = 2 // 0.50 mm
			}
			return Cell{Num: r.Slot, Digits: d, Fixed: true}
		}},
		{"Filter pack", u, text(func(r Row) string { return r.Pack })},
		{"Seal", u, text(func(r Row) string { return r.Seal })},
		{"Grout", u, text(func(r Row) string { return r.Grout })},
		{"Water level", u, number(2, func(r Row) *float64 { return r.WaterDepth })},
		{"Water level date", "", text(func(r Row) string { return r.WaterDate })},
		{"Water level elev.", u, number(2, func(r Row) *float64 { return r.WaterElev })},
		{"Check status", "", text(func(r Row) string {
			if r.Problem != "" {
				return string(r.Status) + ": " + r.Problem
			}
			return string(r.Status)
		})},
	}
}

// Header is the title row.
func (t *Table) Header() []string {
	cols := t.Columns()
	out := make([]string, len(cols))
	for i, c := range cols {
		out[i] = c.Title()
	}
	return out
}

// Cells is one row's cells.
func (t *Table) Cells(r Row) []Cell {
	cols := t.Columns()
	out := make([]Cell, len(cols))
	for i, c := range cols {
		out[i] = c.Value(r)
	}
	return out
}
