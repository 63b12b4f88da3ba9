package table

import (
	"encoding/csv"
	"io"
)

// NewCSV is the CSV writer of every tremie CSV (the table, the export,
// the quantities and the features): RFC 4180 ends each record with CRLF,
// as spreadsheet programs write it; encoding/csv writes LF unless told.
func NewCSV(w io.Writer) *csv.Writer {
	cw := csv.NewWriter(w)
	cw.UseCRLF = true
	return cw
}
