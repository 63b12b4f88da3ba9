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
	// Issue 15: a broken file (every command exits 2 on it), an empty one,
	// nesting 10,000 and 100,000 deep, terminal escapes, a 10,000-byte name.
	f.Add([]byte("[project]\nname = \"x\"\nunits = \"ft\"\nbogus = = 1\n"))
	f.Add([]byte{})
	for _, deep := range []int{10000, 100000} {
		f.Add([]byte("x = " + strings.Repeat("{a=", deep) + "1" + strings.Repeat("}", deep)))
		f.Add([]byte("x = " + strings.Repeat("[", deep) + strings.Repeat("]", deep)))
	}
	f.Add([]byte("[project]\nname = \"\\u001b]0;x\\u0007\"\nlogo = \"/dev/zero\"\n"))
	f.Add([]byte("[project]\nname = \"" + strings.Repeat("N", 10000) + "\"\n"))
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
