package table

import (
	"bytes"
	"fmt"
	"time"

	"github.com/xuri/excelize/v2"
)

// XLSX writes the table as a workbook: the sheet "Summary" holds only the
// header and one row per monitoring point (numbers as numeric cells, full
// precision, shown with the table's decimals; a bold frozen header row),
// and the sheet "Notes" the caution. date is written
// as the document's created and modified date, so the same input gives
// the same bytes.
// NotesSheet is the workbook's sheet holding the caution.
const NotesSheet = "Notes"

func (t *Table) XLSX(title string, date time.Time) ([]byte, error) {
	f := excelize.NewFile()
	defer f.Close()
	const sheet = "Summary"
	if err := f.SetSheetName("Sheet1", sheet); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	stamp := date.UTC().Format("2006-01-02T15:04:05Z")
	if err := f.SetDocProps(&excelize.DocProperties{
		Title: title, Subject: "Construction summary", Creator: "tremie", Created: stamp, Modified: stamp,
		Description: t.caution(),
	}); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	bold, err := f.NewStyle(&excelize.Style{Font: &excelize.Font{Bold: true}, Alignment: &excelize.Alignment{WrapText: true, Vertical: "top"}})
	if err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	formats := map[int]int{}
	numStyle := func(digits int) (int, error) {
		if s, ok := formats[digits]; ok {
			return s, nil
		}
		code := "General"
		if digits > 0 {
			code = "0." + string(bytes.Repeat([]byte("0"), digits))
		}
		s, err := f.NewStyle(&excelize.Style{CustomNumFmt: &code})
		formats[digits] = s
		return s, err
	}
	header := t.Header()
	for i, h := range header {
		cell, _ := excelize.CoordinatesToCellName(i+1, 1)
		if err := f.SetCellStr(sheet, cell, h); err != nil {
			return nil, fmt.Errorf("xlsx: %w", err)
		}
	}
	last, _ := excelize.CoordinatesToCellName(len(header), 1)
	if err := f.SetCellStyle(sheet, "A1", last, bold); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	for ri, r := range t.Rows {
		for ci, c := range t.Cells(r) {
			cell, _ := excelize.CoordinatesToCellName(ci+1, ri+2)
			if c.Num == nil {
				if c.Text != "" {
					if err := f.SetCellStr(sheet, cell, c.Text); err != nil {
						return nil, fmt.Errorf("xlsx: %w", err)
					}
				}
				continue
			}
			if err := f.SetCellFloat(sheet, cell, *c.Num, -1, 64); err != nil {
				return nil, fmt.Errorf("xlsx: %w", err)
			}
			st, err := numStyle(c.Digits)
			if err != nil {
				return nil, fmt.Errorf("xlsx: %w", err)
			}
			if err := f.SetCellStyle(sheet, cell, cell, st); err != nil {
				return nil, fmt.Errorf("xlsx: %w", err)
			}
		}
	}
	if _, err := f.NewSheet(NotesSheet); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	if err := f.SetCellStr(NotesSheet, "A1", t.caution()); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	// widths in characters: the notes read as one wide column; 14 holds a
	// date, an elevation or a two-word title without a resize
	if err := f.SetColWidth(NotesSheet, "A", "A", 120); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	if err := f.SetPanes(sheet, &excelize.Panes{Freeze: true, XSplit: 1, YSplit: 1, TopLeftCell: "B2", ActivePane: "bottomRight"}); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	lastCol, _ := excelize.ColumnNumberToName(len(header))
	if err := f.SetColWidth(sheet, "A", lastCol, 14); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	var buf bytes.Buffer
	if err := f.Write(&buf); err != nil {
		return nil, fmt.Errorf("xlsx: %w", err)
	}
	return buf.Bytes(), nil
}
