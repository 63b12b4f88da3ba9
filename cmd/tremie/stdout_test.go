package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema/synth"
)

// TestDashIsStandardOutput: "-o -" sends the one document of table,
// export, book and import --template to standard output (no file named
// "-" appears), a binary one is refused on a terminal, and a command
// whose -o names a directory of several files refuses "-" as a usage
// error.
func TestDashIsStandardOutput(t *testing.T) {
	dir := t.TempDir()
	if err := synth.Project(dir, 2); err != nil {
		t.Fatal(err)
	}
	t.Chdir(t.TempDir())
	for _, c := range []struct {
		args  []string
		start string // what standard output begins with
	}{
		{[]string{"table", "-o", "-", dir}, "Well,"},
		{[]string{"table", "--format", "md", "-o", "-", dir}, "|"},
		{[]string{"table", "--format", "xlsx", "-o", "-", dir}, "PK\x03\x04"}, // a ZIP file: ECMA-376 Part 2
		{[]string{"export", "-o", "-", dir}, "{"},
		{[]string{"book", "-o", "-", dir}, "%PDF-"}, // ISO 32000-1, 7.5.2
		{[]string{"import", "--template", "-"}, "PK\x03\x04"},
	} {
		var stdout, stderr bytes.Buffer
		code := run(c.args, &stdout, &stderr)
		if code != exitOK || !strings.HasPrefix(stdout.String(), c.start) {
			t.Errorf("%v: exit %d, standard output begins %.20q, want %q\n%s", c.args, code, stdout.String(), c.start, stderr.String())
		}
		if _, err := os.Lstat("-"); err == nil {
			t.Fatalf("%v wrote a file named -", c.args)
		}
		// On a terminal a binary document is refused, text is written.
		var screen bytes.Buffer
		stderr.Reset()
		code = run(c.args, textGuard{&screen}, &stderr)
		binary := strings.HasPrefix(c.start, "PK") || strings.HasPrefix(c.start, "%PDF")
		if binary && (code != exitOutput || screen.Len() > 0 || !strings.Contains(stderr.String(), "standard output is a terminal") || !strings.Contains(stderr.String(), "name a file in place of -")) {
			t.Errorf("%v on a terminal: exit %d, %d bytes written, %s", c.args, code, screen.Len(), stderr.String())
		}
		if !binary && code != exitOK {
			t.Errorf("%v on a terminal: exit %d", c.args, code)
		}
	}
	for _, args := range [][]string{
		{"render", "-o", "-", dir},
		{"section", "-o", "-", dir},
		{"demo", "-o", "-"},
		{"import", "-o", "-", "w.csv"},
		{"new", "-o", "-", "MW-9"},
	} {
		var stdout, stderr bytes.Buffer
		code := run(args, &stdout, &stderr)
		if code != exitUsage || !strings.Contains(stderr.String(), "- (standard output) cannot hold them") {
			t.Errorf("%v: exit %d, %s", args, code, stderr.String())
		}
		if entries, _ := os.ReadDir("."); len(entries) > 0 {
			t.Errorf("%v wrote %v", args, entries)
		}
	}
	if _, err := os.Stat(filepath.Join(dir, "out", "book.pdf")); err == nil {
		t.Error("book -o - also wrote OUTPUT/book.pdf")
	}
}
