package main

import (
	"bytes"
	"path/filepath"
	"strings"
	"testing"
)

// TestEveryCSVEndsRecordsWithCRLF: every CSV tremie writes (the summary
// table, the GIS export, the quantities and the wall features) ends each
// record with CRLF, as RFC 4180 section 2 defines a record and as
// spreadsheet programs write them.
func TestEveryCSVEndsRecordsWithCRLF(t *testing.T) {
	for _, args := range [][]string{
		{"table", "demo", "--format", "csv", "-o", "-"},
		{"export", "demo", "--format", "csv", "-o", "-"},
		{"quantities", "--format", "csv", filepath.Join("demo", "wells", "MW-1.toml")},
		{"features", "--format", "csv", filepath.Join("demo", "wells", "BR-1.toml")},
	} {
		var out, errb bytes.Buffer
		if code := run(args, &out, &errb); code > exitFindings {
			t.Errorf("%v: exit %d: %s", args, code, errb.String())
			continue
		}
		s := out.String()
		if !strings.HasSuffix(s, "\r\n") || strings.Count(s, "\n") != strings.Count(s, "\r\n") || strings.Count(s, "\n") < 2 {
			t.Errorf("%v: records do not all end in CRLF: %q", args, s[:min(len(s), 200)])
		}
	}
}
