package project

import (
	"os"
	"strings"
	"testing"
)

// FuzzParse: no project file makes the loader panic or hang, and a
// rejected one always says where. Seeds: the demo project and the
// reproducers of the hardening campaign (deep nesting, astral-plane
// text, an unknown table).
func FuzzParse(f *testing.F) {
	if b, err := os.ReadFile("../../cmd/tremie/demo/project.toml"); err == nil {
		f.Add(b)
	}
	f.Add([]byte("[project]\nname = \"Coldwater 💧 Mill\"\n[[section]]\nname = \"A-A'\"\nwells = [\"MW-1\", \"MW-2\"]\nbends = [[0.0, 0.0], [1.0, 1.0]]\n"))
	f.Add([]byte("x = " + strings.Repeat("{a=", 200) + "1" + strings.Repeat("}", 200)))
	f.Add([]byte("[project]\nname = \"x\"\nextra.thing = 1\n[nope]\n"))
	dir := f.TempDir()
	f.Fuzz(func(t *testing.T, data []byte) {
		p, err := Parse(dir, "project.toml", data)
		if err == nil && p == nil {
			t.Fatal("nil project without error")
		}
		if err != nil && !strings.HasPrefix(err.Error(), "project.toml") {
			t.Fatalf("error without the file's name: %v", err)
		}
	})
}
