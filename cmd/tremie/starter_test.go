package main

import (
	"bytes"
	"encoding/json"
	"path/filepath"
	"strings"
	"testing"
)

// TestInitNewCheck is the new user's path: init a project, add a starter
// well, check it: only the values marked # FILL are reported.
func TestInitNewCheck(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "p")
	var out, errb bytes.Buffer
	if code := run([]string{"init", dir}, &out, &errb); code != exitOK {
		t.Fatalf("init: %d %s", code, errb.String())
	}
	if code := run([]string{"new", "MW-9", "--units", "m", "--kind", "monitoring", "-o", filepath.Join(dir, "wells")}, &out, &errb); code != exitOK {
		t.Fatalf("new: %d %s", code, errb.String())
	}
	if code := run([]string{"new", "MW-9", "-o", filepath.Join(dir, "wells")}, &out, &errb); code != exitOutput {
		t.Errorf("new over an existing file: exit %d", code)
	}
	out.Reset()
	if code := run([]string{"check", dir}, &out, &errb); code != exitFindings {
		t.Errorf("check: exit %d\n%s%s", code, out.String(), errb.String())
	}
	n := 0
	for _, l := range strings.Split(out.String(), "\n") {
		if strings.Contains(l, ": error ") || strings.Contains(l, ": warning ") {
			n++
			if !strings.Contains(l, " FILL-IN: ") {
				t.Errorf("not a placeholder: %s", l)
			}
		}
	}
	if n < 20 {
		t.Errorf("only %d placeholders named:\n%s", n, out.String())
	}
}

func TestSchemaCommand(t *testing.T) {
	for _, kind := range []string{"", "well", "project", "profile", "yields"} {
		var out, errb bytes.Buffer
		args := []string{"schema"}
		if kind != "" {
			args = append(args, kind)
		}
		if code := run(args, &out, &errb); code != exitOK {
			t.Fatalf("schema %s: exit %d %s", kind, code, errb.String())
		}
		var doc map[string]any
		if err := json.Unmarshal(out.Bytes(), &doc); err != nil || doc["properties"] == nil {
			t.Errorf("schema %s: not a schema: %v", kind, err)
		}
	}
	var out, errb bytes.Buffer
	if code := run([]string{"schema", "pump"}, &out, &errb); code != exitUsage {
		t.Errorf("schema pump: exit %d", code)
	}
}
