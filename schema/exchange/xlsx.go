package exchange

import (
	"bytes"
	"fmt"
	"time"

	"github.com/xuri/excelize/v2"
)

// caution heads the workbook's notes: tremie's figures and checks support,
// never replace, review.
const caution = "Caution: the figures and checks tremie makes from these wells support, and never replace, the review of a licensed professional and the governing local well code."

// list is a validation list: the column it checks and its values, the
// key's allowed values in the well file's key table. Strict lists refuse
// other values; the others only offer theirs (the material column also
// takes pipe materials, the method column borehole methods).
type list struct {
	sheet, column string
	values        []string
	strict        bool
}

func lists() []list {
	enum := func(table, key string) []string {
		if k := keySpec(table, key); k != nil {
			return k.Enum
		}
		return nil
	}
	return []list{
		{WellsSheet, "purpose", enum("well", "purpose"), true},
		{WellsSheet, "depth_unit", enum("units", "depth"), true},
		{WellsSheet, "diameter_unit", enum("units", "diameter"), true},
		{WellsSheet, "mass_unit", enum("units", "mass"), true},
		{WellsSheet, "volume_unit", enum("units", "volume"), true},
		{WellsSheet, "surface", enum("surface", "kind"), true},
		{IntervalsSheet, "kind", kindNames(), true},
		{IntervalsSheet, "material", enum("fill", "material"), false},
		{IntervalsSheet, "casing_kind", enum("casing", "kind"), true},
		{IntervalsSheet, "type", enum("string.section", "type"), true},
		{IntervalsSheet, "method", enum("fill", "method"), false},
		{IntervalsSheet, "reference", enum("water_level", "reference"), true},
		{IntervalsSheet, "water_level_kind", enum("water_level", "kind"), true},
	}
}

// validatedRows is how far down the lists check a sheet.
const validatedRows = 2000

func notes(sheet string) map[string]string {
	out := map[string]string{}
	if sheet == WellsSheet {
		for _, c := range wellColumns {
			out[c.name] = c.note
		}
		return out
	}
	for _, c := range intervalColumns {
		out[c.name] = c.note
	}
	kinds := "What the row is:"
	for _, k := range intervalKinds {
		kinds += "\n" + k.kind + ": " + k.note
	}
	out["kind"] = kinds
	return out
}

// XLSX writes the workbook: Wells, Intervals (header notes, frozen header
// row, validation lists), Lists (the lists' values) and Read me. date is
// the document's date, so the same wells give the same bytes.
func (wb *Workbook) XLSX(date time.Time) ([]byte, error) {
	b := wb.b
	f := excelize.NewFile()
	defer f.Close()
	stamp := date.UTC().Format("2006-01-02T15:04:05Z")
	if err := f.SetDocProps(&excelize.DocProperties{Title: "tremie well import layout", Creator: "tremie", Created: stamp, Modified: stamp, Description: caution}); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	if err := f.SetSheetName("Sheet1", WellsSheet); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	for _, s := range []string{IntervalsSheet, ListsSheet, "Read me"} {
		if _, err := f.NewSheet(s); err != nil {
			return nil, fmt.Errorf("xlsx: %w", err)
		}
	}
	bold, err := f.NewStyle(&excelize.Style{Font: &excelize.Font{Bold: true}, Fill: excelize.Fill{Type: "pattern", Color: []string{"E8EEF4"}, Pattern: 1}})
	if err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	write := func(sheet string, cols []string, rows []map[string]value) error {
		nt := notes(sheet)
		for ci, c := range cols {
			cell, _ := excelize.CoordinatesToCellName(ci+1, 1)
			if err := f.SetCellStr(sheet, cell, c); err != nil {
				return err
			}
			if n := nt[c]; n != "" {
				if err := f.AddComment(sheet, excelize.Comment{Author: "tremie", Cell: cell, Text: n, Width: 300, Height: 120}); err != nil {
					return err
				}
			}
		}
		last, _ := excelize.CoordinatesToCellName(len(cols), 1)
		if err := f.SetCellStyle(sheet, "A1", last, bold); err != nil {
			return err
		}
		for ri, r := range rows {
			for ci, c := range cols {
				v, ok := r[c]
				if !ok {
					continue
				}
				cell, _ := excelize.CoordinatesToCellName(ci+1, ri+2)
				if v.isNum {
					err = f.SetCellFloat(sheet, cell, *v.num, -1, 64)
				} else if v.text != "" {
					err = f.SetCellStr(sheet, cell, v.text)
				}
				if err != nil {
					return err
				}
			}
		}
		lastCol, _ := excelize.ColumnNumberToName(len(cols))
		if err := f.SetColWidth(sheet, "A", lastCol, 16); err != nil {
			return err
		}
		return f.SetPanes(sheet, &excelize.Panes{Freeze: true, XSplit: 0, YSplit: 1, TopLeftCell: "A2", ActivePane: "bottomLeft"})
	}
	if err := write(WellsSheet, b.wellCols, b.wells); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	if err := write(IntervalsSheet, b.intervalCols, b.intervals); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	if err := writeLists(f, b); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	readMe := []string{
		"tremie well import layout (docs/import.md)",
		"Wells: one row per well. Intervals: one row per borehole section, casing, string part, fill, tag, open hole, lithology interval, water level, formation sample, waiver, wall image or wall feature, naming its well in well_id.",
		"Depths are below ground surface in the well's depth_unit; a height above ground is a negative depth. Dates as 2026-03-09.",
		"Every column's header carries a note; the kind, purpose, unit and material columns offer lists (the Lists sheet).",
		"Import with: tremie import FILE.xlsx -o WELLS_DIR",
		caution,
	}
	for i, line := range readMe {
		if err := f.SetCellStr("Read me", fmt.Sprintf("A%d", i+1), line); err != nil {
			return nil, fmt.Errorf("xlsx: %w", err)
		}
	}
	var buf bytes.Buffer
	if err := f.Write(&buf); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	return buf.Bytes(), nil
}

// writeLists puts each list's values in a column of the Lists sheet and
// checks its column against them.
func writeLists(f *excelize.File, b *book) error {
	for li, l := range lists() {
		colName, _ := excelize.ColumnNumberToName(li + 1)
		if err := f.SetCellStr(ListsSheet, colName+"1", l.sheet+"."+l.column); err != nil {
			return err
		}
		for vi, v := range l.values {
			if err := f.SetCellStr(ListsSheet, fmt.Sprintf("%s%d", colName, vi+2), v); err != nil {
				return err
			}
		}
		cols := b.wellCols
		if l.sheet == IntervalsSheet {
			cols = b.intervalCols
		}
		if len(l.values) == 0 {
			continue
		}
		ci := -1
		for i, c := range cols {
			if c == l.column {
				ci = i
			}
		}
		if ci < 0 {
			continue
		}
		target, _ := excelize.ColumnNumberToName(ci + 1)
		dv := excelize.NewDataValidation(true)
		dv.Sqref = fmt.Sprintf("%s2:%s%d", target, target, validatedRows)
		dv.SetSqrefDropList(fmt.Sprintf("%s!$%s$2:$%s$%d", ListsSheet, colName, colName, len(l.values)+1))
		if l.strict {
			dv.SetError(excelize.DataValidationErrorStyleStop, l.column, "Pick a value from the list.")
		} else {
			dv.SetError(excelize.DataValidationErrorStyleInformation, l.column, "Not in the list; kept as typed.")
		}
		if err := f.AddDataValidation(l.sheet, dv); err != nil {
			return err
		}
	}
	return nil
}
