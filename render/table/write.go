package table

import (
	"bytes"
	"fmt"
	"io"
	"strings"
)

// CSV writes the table as RFC 4180 CSV, UTF-8: the header and one record
// per monitoring point, nothing else, so that a database or GIS loads it
// as it is. The caution goes with the other forms (Markdown, XLSX, book)
// and the command prints it.
func (t *Table) CSV(w io.Writer) error {
	cw := NewCSV(w)
	header := t.Header()
	if err := cw.Write(header); err != nil {
		return fmt.Errorf("csv: %w", err)
	}
	for _, r := range t.Rows {
		cells := t.Cells(r)
		rec := make([]string, len(cells))
		for i, c := range cells {
			rec[i] = c.CSVText()
		}
		if err := cw.Write(rec); err != nil {
			return fmt.Errorf("csv: %w", err)
		}
	}
	cw.Flush()
	if err := cw.Error(); err != nil {
		return fmt.Errorf("csv: %w", err)
	}
	return nil
}

// Markdown writes the table as a GitHub-style pipe table followed by the
// caution.
func (t *Table) Markdown(w io.Writer) error {
	var b bytes.Buffer
	header := t.Header()
	b.WriteString("| " + strings.Join(escapeAll(header), " | ") + " |\n|")
	for i := range header {
		if t.numeric(i) {
			b.WriteString("---:|") // numbers align right
		} else {
			b.WriteString("---|")
		}
	}
	b.WriteString("\n")
	for _, r := range t.Rows {
		cells := t.Cells(r)
		s := make([]string, len(cells))
		for i, c := range cells {
			s[i] = c.String()
		}
		b.WriteString("| " + strings.Join(escapeAll(s), " | ") + " |\n")
	}
	b.WriteString("\n" + t.caution() + "\n")
	_, err := w.Write(b.Bytes())
	if err != nil {
		return fmt.Errorf("markdown: %w", err)
	}
	return nil
}

func escapeAll(v []string) []string {
	out := make([]string, len(v))
	for i, s := range v {
		s = strings.ReplaceAll(s, "|", `\|`)
		out[i] = strings.ReplaceAll(s, "\n", " ")
	}
	return out
}

// numeric reports whether column i holds a number in some row.
func (t *Table) numeric(i int) bool {
	col := t.Columns()[i]
	for _, r := range t.Rows {
		if col.Value(r).Num != nil {
			return true
		}
	}
	return false
}
