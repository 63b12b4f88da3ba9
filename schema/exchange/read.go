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
	r := csv.NewReader(bytes.NewReader(bytes.TrimPrefix(data, []byte("\xef\xbb\xbf"))))
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
	return tableOf(filepath.Base(path), name, rows)
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
