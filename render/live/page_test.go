package live

import (
	"os"
	"path/filepath"
	"regexp"
	"slices"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/render/table"
)

// TestPageHoldsEachSheetsPlace: every sheet's img keeps the page's
// proportions while it loads (a style html/template would blank to
// "ZgotmplZ" if it took the value for unsafe) and is named with its ID
// and its place counted from one.
func TestPageHoldsEachSheetsPlace(t *testing.T) {
	s, err := New(demoProject(t))
	if err != nil {
		t.Fatal(err)
	}
	_, body := get(t, s.Handler(), "/")
	if strings.Contains(body, "ZgotmplZ") {
		t.Error("a value of the page was blanked by html/template")
	}
	// The demo draws on Letter, 8.5 × 11 in (ANSI/ASME Y14.1), 612 × 792
	// PostScript points of 1/72 in.
	imgs := regexp.MustCompile(`<img [^>]*>`).FindAllString(body, -1)
	if len(imgs) != 7 {
		t.Fatalf("%d sheets on the page, want the demo's 7", len(imgs))
	}
	for _, img := range imgs {
		if !strings.Contains(img, `style="aspect-ratio: 612 / 792"`) {
			t.Errorf("sheet without Letter proportions: %s", img)
		}
	}
	if !strings.Contains(body, `alt="MW-1, sheet 1 of 1"`) {
		t.Error(`no sheet named "MW-1, sheet 1 of 1"`)
	}
	// The caution stands above the first well, where the page opens, and
	// the index tallies each well's findings by kind: MW-3 has four
	// errors and two warnings, MW-2 one waived finding.
	caution := strings.Index(body, "never replace, the review of a licensed professional")
	if caution < 0 || caution > strings.Index(body, `<section class="well"`) {
		t.Error("no caution above the first well")
	}
	for _, want := range []string{"<td>4 errors, 2 warnings</td>", "<td>1 waived</td>", "<td>none</td>"} {
		if !strings.Contains(body, want) {
			t.Errorf("the index has no %s", want)
		}
	}
	// MW-2 placed one bag of chips (its file: bags = 1).
	if !strings.Contains(body, "<td>1 bag, 0.694 ft³") || strings.Contains(body, ">1 bags") {
		t.Error(`one bag placed is not written "1 bag"`)
	}
}

// TestDuplicateIDsAreInputErrors: a copy of a well file left beside it
// while the page is open makes both input errors naming each other, as
// every other command does; removing it brings the well back without
// drawing it again.
func TestDuplicateIDsAreInputErrors(t *testing.T) {
	dir := demoProject(t)
	s, redrawn := countingServer(t, dir)
	src, err := os.ReadFile(filepath.Join(dir, "wells", "MW-2.toml"))
	if err != nil {
		t.Fatal(err)
	}
	copyOf := filepath.Join(dir, "wells", "MW-2 copy.toml")
	if err := os.WriteFile(copyOf, src, 0o644); err != nil {
		t.Fatal(err)
	}
	s.Refresh()
	dups := 0
	for _, w := range s.wells {
		if w.Key != "wells/MW-2.toml" && w.Key != "wells/MW-2 copy.toml" {
			continue
		}
		dups++
		if w.Status != table.Unreadable || len(w.Problems) != 1 || len(w.Sheets) != 0 ||
			!strings.Contains(w.Problems[0].Error(), `well ID "MW-2" is also the ID of wells/MW-2`) {
			t.Errorf("%s: %s %v, want an input error naming the other file", w.Key, w.Status, w.Problems)
		}
	}
	if dups != 2 {
		t.Fatalf("%d wells for MW-2 and its copy", dups)
	}
	if n := len(s.Problems()); n != 2 {
		t.Errorf("%d problems for the terminal, want 2", n)
	}
	if _, body := get(t, s.Handler(), "/"); !strings.Contains(body, "is also the ID of") {
		t.Error("the page does not show the duplicate")
	}
	if err := os.Remove(copyOf); err != nil {
		t.Fatal(err)
	}
	s.Refresh()
	for _, w := range s.wells {
		if w.Key == "wells/MW-2.toml" && (w.Problems != nil || len(w.Sheets) != 1) {
			t.Errorf("MW-2 after the copy went: %v", w.Problems)
		}
	}
	if !slices.Equal(*redrawn, []int{1, 0}) {
		t.Errorf("wells drawn per refresh %v, want [1 0]: only the copy, then none", *redrawn)
	}
}

// TestFolderWithoutProjectNamesFilesInIt: a folder of wells without a
// project file shows each well file relative to the folder, as a project
// does, not by its full path.
func TestFolderWithoutProjectNamesFilesInIt(t *testing.T) {
	dir := t.TempDir()
	src, err := os.ReadFile(filepath.Join("..", "..", "testdata", "gallery", "BR-3.toml"))
	if err != nil {
		t.Fatal(err)
	}
	os.MkdirAll(filepath.Join(dir, "north"), 0o755)
	if err := os.WriteFile(filepath.Join(dir, "north", "BR-3.toml"), src, 0o644); err != nil {
		t.Fatal(err)
	}
	s, err := New(dir)
	if err != nil {
		t.Fatal(err)
	}
	if len(s.wells) != 1 || s.wells[0].Key != "north/BR-3.toml" {
		t.Fatalf("wells %v, want one named north/BR-3.toml", s.wells)
	}
	if _, body := get(t, s.Handler(), "/"); strings.Contains(body, filepath.Join(dir, "north")) {
		t.Error("the page names a well by its full path")
	}
}

// TestStatusesAgreeWithTheBook: the page calls each demo well what the
// summary table and the book call it; MW-2, whose one finding is
// waived, is "waived" (the page once said "clean"), MW-4 "planned",
// MW-3 "errors".
func TestStatusesAgreeWithTheBook(t *testing.T) {
	dir := demoProject(t)
	s, _ := countingServer(t, dir)
	want := map[string]table.Status{"MW-1": table.Clean, "MW-2": table.Waived, "MW-3": table.Errors, "MW-4": table.Planned}
	for _, w := range s.wells {
		if st, ok := want[w.ID]; ok && w.Status != st {
			t.Errorf("%s: %s, want %s", w.ID, w.Status, st)
		}
		delete(want, w.ID)
	}
	if len(want) > 0 {
		t.Errorf("wells not on the page: %v", want)
	}
	if _, body := get(t, s.Handler(), "/"); !strings.Contains(body, `<span class="st waived">waived</span>`) {
		t.Error("the page shows no waived status")
	}
}
