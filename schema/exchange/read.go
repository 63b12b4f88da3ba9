package exchange

import (
	"bytes"
	"encoding/csv"
	"fmt"
	"io"
	"path/filepath"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/xuri/excelize/v2"
)

// Bounds on what is read, so that no input exhausts memory.
const (
	maxFileBytes = 64 << 20
	maxRows      = 100000
	maxCols      = 200
	maxCellBytes = 32 << 10
)

// sheet is one table as read: its header and rows of raw cell text
// (numbers unformatted, dates as typed or as spreadsheet serial numbers).
type sheet struct {
	file, name string
	header     []string
	rows       [][]string // rows[i] is spreadsheet row i+2
	csv        bool       // read from a CSV file: a field beyond the header is a split cell
}

// strayCells names every CSV field under no column name: a cell that held
// the separator unquoted ("Sand, fine, grey") split into several, and
// what followed the first would be lost. A spreadsheet's unnamed columns
// are the user's margin and are left alone.
func (im *importer) strayCells(s *sheet) {
	if !s.csv {
		return
	}
	for ri, row := range s.rows {
		for ci, text := range row {
			if strings.TrimSpace(text) != "" && (ci >= len(s.header) || strings.TrimSpace(s.header[ci]) == "") {
				im.errAt(Cell{s.file, s.name, ri + 2, ci + 1}, "%q stands under no column name: a cell holding the separator needs quotes (\"Sand, fine, grey\")", text)
			}
		}
	}
}

// Cell names a cell for messages: file:Sheet!B12.
type Cell struct {
	File, Sheet string
	Row, Col    int // 1-based; Col 0 = the whole row
}

func (c Cell) String() string {
	col := "A"
	if c.Col > 0 {
		col, _ = excelize.ColumnNumberToName(c.Col)
	}
	return fmt.Sprintf("%s:%s!%s%d", c.File, c.Sheet, col, c.Row)
}

// CellError is one problem with one cell.
type CellError struct {
	Cell Cell
	Msg  string
}

func (e *CellError) Error() string { return e.Cell.String() + ": " + e.Msg }

// readFile reads a workbook's Wells and Intervals sheets, or one CSV file
// (which of the two it is, its header tells: an Intervals CSV has a kind
// column).
func readFile(path string) ([]*sheet, error) {
	// Only a regular file within the limit: a FIFO or /dev/zero named as
	// the workbook would block or never end.
	data, err := schema.ReadInput(path, maxFileBytes)
	if err != nil {
		return nil, err
	}
	switch strings.ToLower(filepath.Ext(path)) {
	case ".xlsx", ".xlsm":
		return readWorkbook(path, data)
	case ".csv":
		s, err := readCSV(path, data)
		if err != nil {
			return nil, err
		}
		return []*sheet{s}, nil
	}
	return nil, fmt.Errorf("%s: not a .xlsx workbook or a .csv file", path)
}

func readWorkbook(path string, data []byte) ([]*sheet, error) {
	f, err := excelize.OpenReader(bytes.NewReader(data))
	if err != nil {
		return nil, fmt.Errorf("%s: not a readable workbook: %v", path, err)
	}
	defer f.Close()
	var out []*sheet
	for _, want := range []string{WellsSheet, IntervalsSheet} {
		name := ""
		for _, n := range f.GetSheetList() {
			if strings.EqualFold(strings.TrimSpace(n), want) {
				name = n
			}
		}
		if name == "" {
			if want == WellsSheet {
				return nil, fmt.Errorf("%s: no %q sheet (see docs/import.md, or start from tremie import --template)", path, want)
			}
			continue // a workbook of wells alone is allowed
		}
		rows, err := f.GetRows(name, excelize.Options{RawCellValue: true})
		if err != nil {
			return nil, fmt.Errorf("%s: sheet %s: %v", path, name, err)
		}
		s, err := tableOf(filepath.Base(path), want, rows)
		if err != nil {
			return nil, err
		}
		out = append(out, s)
	}
	return out, nil
}

func readCSV(path string, data []byte) (*sheet, error) {
	data = bytes.TrimPrefix(data, []byte("\xef\xbb\xbf"))
	r := csv.NewReader(bytes.NewReader(data))
	r.Comma = separator(data)
	r.FieldsPerRecord = -1
	var rows [][]string
	for {
		rec, err := r.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, fmt.Errorf("%s: %v", path, err)
		}
		if len(rows) > maxRows {
			return nil, fmt.Errorf("%s: more than %d rows", path, maxRows)
		}
		rows = append(rows, rec)
	}
	name := WellsSheet
	if len(rows) > 0 {
		for _, h := range rows[0] {
			if normal(h) == "kind" {
				name = IntervalsSheet
			}
		}
	}
	s, err := tableOf(filepath.Base(path), name, rows)
	if s != nil {
		s.csv = true
	}
	return s, err
}

// separator is the CSV file's field separator: a comma, or a semicolon
// when the header row has semicolons and no comma, as spreadsheet
// programs write CSV where the comma is the decimal mark.
func separator(data []byte) rune {
	header, _, _ := bytes.Cut(data, []byte("\n"))
	if bytes.IndexByte(header, ';') >= 0 && bytes.IndexByte(header, ',') < 0 {
		return ';'
	}
	return ','
}

func tableOf(file, name string, rows [][]string) (*sheet, error) {
	if len(rows) == 0 {
		return nil, fmt.Errorf("%s: sheet %s is empty: its first row must hold the column names", file, name)
	}
	if len(rows) > maxRows+1 {
		return nil, fmt.Errorf("%s: sheet %s has more than %d rows", file, name, maxRows)
	}
	s := &sheet{file: file, name: name, header: rows[0]}
	if len(s.header) > maxCols {
		return nil, fmt.Errorf("%s: sheet %s has more than %d columns", file, name, maxCols)
	}
	for _, r := range rows[1:] {
		for _, c := range r {
			if len(c) > maxCellBytes {
				return nil, fmt.Errorf("%s: sheet %s: a cell longer than %d KiB", file, name, maxCellBytes>>10)
			}
		}
		s.rows = append(s.rows, r)
	}
	return s, nil
}

// normal is a header as compared: trimmed, lower case, spaces as _.
func normal(h string) string {
	return strings.ReplaceAll(strings.ToLower(strings.TrimSpace(h)), " ", "_")
}
