package table

import (
	"bytes"
	"encoding/csv"
	"os"
	"path/filepath"
	"testing"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

// FuzzTable: any well the loader accepts makes a table whose CSV reads
// back with one record per row and the header's width, and whose
// Markdown form is written without a panic (the XLSX writer, fifty
// times slower, is left to its own tests).
func FuzzTable(f *testing.F) {
	paths, _ := filepath.Glob("../../cmd/tremie/demo/wells/*.toml")
	for _, p := range paths {
		if b, err := os.ReadFile(p); err == nil {
			f.Add(b)
		}
	}
	// Issue 15: cells a spreadsheet would run (=, +, -, @), terminal
	// escapes and astral-plane text in the ID.
	for _, id := range []string{"=HYPERLINK(1)", "+SUM(1)", "-2+3", "@cmd", `\u001b]0;x\u0007`, "MW-\U0001F6B0"} {
		f.Add([]byte("[units]\ndepth = \"ft\"\n[well]\nid = \"" + id + "\"\npurpose = \"monitoring\"\ntotal_depth = 10.0\n[[borehole]]\ntop = 0.0\nbottom = 10.0\ndiameter = 8.0\n"))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		w, err := schema.Load("fuzz.toml", data)
		if err != nil {
			return
		}
		tb := Build([]Entry{{File: "fuzz.toml", Well: w, Findings: rules.Check(w, nil)}}, "")
		var b bytes.Buffer
		if err := tb.CSV(&b); err != nil {
			t.Fatal(err)
		}
		recs, err := csv.NewReader(&b).ReadAll()
		if err != nil {
			t.Fatalf("the CSV does not read back: %v", err)
		}
		if len(recs) != 1+len(tb.Rows) {
			t.Fatalf("%d records for %d rows", len(recs), len(tb.Rows))
		}
		for _, rec := range recs[1:] {
			for _, field := range rec {
				if InertField(field) != field {
					t.Fatalf("a cell a spreadsheet would run: %q", field)
				}
			}
		}
		if err := tb.Markdown(&bytes.Buffer{}); err != nil {
			t.Fatal(err)
		}
	})
}
