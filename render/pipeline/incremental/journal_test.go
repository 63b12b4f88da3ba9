package incremental

import (
	"os"
	"path/filepath"
	"testing"
)

// TestJournalSurvivesAnInterruptedRun: wells recorded by a run that never
// saved its cache (killed) are known to the next run; a truncated output
// is not.
func TestJournalSurvivesAnInterruptedRun(t *testing.T) {
	const svgSum = "d4dc56669143034f31aa309635d4113d9ad76a02b1739da22c965ed2049be9e6" // SHA-256 of "<svg/>"
	dir := t.TempDir()
	c, _ := Load(dir)
	for _, k := range []string{"a", "b"} {
		os.WriteFile(filepath.Join(dir, k+".svg"), []byte("<svg/>"), 0o644)
		c.RecordOutputs(k, k+".toml", "h-"+k, []Output{{Rel: k + ".svg", Size: 6, Sum: svgSum}})
	}
	// No Save: the run was killed. A torn line follows.
	f, _ := os.OpenFile(filepath.Join(dir, JournalName), os.O_APPEND|os.O_WRONLY, 0)
	f.WriteString(`{"key":"c","entry":{"ha`)
	f.Close()
	c2, err := Load(dir)
	if err != nil {
		t.Fatal(err)
	}
	if _, ok := c2.Recorded("a", "h-a"); !ok {
		t.Error("well a, finished before the kill, is not known")
	}
	if !c2.Owns("b.svg") {
		t.Error("b.svg is not known as tremie's")
	}
	os.WriteFile(filepath.Join(dir, "b.svg"), nil, 0o644) // truncated since
	if _, ok := c2.Recorded("b", "h-b"); ok {
		t.Error("a truncated output counts as unchanged")
	}
	if err := c2.Save(); err != nil {
		t.Fatal(err)
	}
	if _, err := os.Stat(filepath.Join(dir, JournalName)); err == nil {
		t.Error("the journal outlived a saved cache")
	}
	c3, _ := Load(dir)
	if _, ok := c3.Recorded("a", "h-a"); !ok {
		t.Error("well a lost after the save")
	}
}
