package schema

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"
)

// TestReadInputRefusesWhatNeverEnds: a FIFO, a device and an oversize
// file are refused at once, without blocking or reading to the end.
func TestReadInputRefusesWhatNeverEnds(t *testing.T) {
	dir := t.TempDir()
	fifo := filepath.Join(dir, "w.toml")
	if err := syscall.Mkfifo(fifo, 0o644); err != nil {
		t.Skipf("no FIFOs here: %v", err)
	}
	done := make(chan error, 1)
	go func() { _, err := ReadInput(fifo, MaxTextFile); done <- err }()
	select {
	case err := <-done:
		if !errors.Is(err, ErrNotRegular) {
			t.Errorf("FIFO: err = %v, want ErrNotRegular", err)
		}
	case <-time.After(5 * time.Second):
		t.Fatal("reading a FIFO blocked")
	}
	if _, err := os.Stat("/dev/zero"); err == nil {
		link := filepath.Join(dir, "zero.toml")
		if err := os.Symlink("/dev/zero", link); err == nil {
			if _, err := ReadInput(link, MaxTextFile); !errors.Is(err, ErrNotRegular) || !strings.Contains(err.Error(), "device") {
				t.Errorf("/dev/zero: err = %v", err)
			}
		}
	}
	big := filepath.Join(dir, "big.toml")
	if err := os.WriteFile(big, make([]byte, 2048), 0o644); err != nil {
		t.Fatal(err)
	}
	if _, err := ReadInput(big, 1024); err == nil || !strings.Contains(err.Error(), "more than the 1024") {
		t.Errorf("oversize: err = %v", err)
	}
	if _, err := ReadInput(dir, MaxTextFile); !errors.Is(err, ErrNotRegular) {
		t.Errorf("directory: err = %v", err)
	}
	// LoadFile names the file and says why.
	_, err := LoadFile(fifo)
	if err == nil || !strings.Contains(err.Error(), fifo+": cannot read") || !strings.Contains(err.Error(), "named pipe") {
		t.Errorf("LoadFile(FIFO) = %v", err)
	}
}

// TestCheckNesting counts only real brackets: those in strings and
// comments, and the one-level table headers, do not count.
func TestCheckNesting(t *testing.T) {
	// The 65th brace stands after "x = " and 64 "{a=": column 4 + 192 + 1.
	deep := "x = " + strings.Repeat("{a=", 100) + "1" + strings.Repeat("}", 100)
	e := CheckNesting("w.toml", []byte("# header\n"+deep), 64)
	if e == nil || e.Line != 2 || e.Col != 4+64*3+1 {
		t.Fatalf("deep inline tables: %v", e)
	}
	ok := []string{
		"[well]\nid = \"[[[[[[[[\"\n",
		"a = '{{{{{{{{{{'\n# [[[[[[[[[[[[[[[[[[[\n",
		"s = \"\"\"\n[[[[[[[[[[[[[\n\"\"\"\nt = '''{{{{{{{{{{'''\n",
		"e = \"quote \\\" [[[[[[[[\"\n",
		"[[fill]]\n[[fill.tag]]\nx = [[1, 2], [3, 4]]\n",
	}
	for _, s := range ok {
		if e := CheckNesting("w.toml", []byte(s), 4); e != nil {
			t.Errorf("%q: %v", s, e)
		}
	}
	// Load stops a ten-thousand-deep file at once, with its position.
	start := time.Now()
	_, err := Load("deep.toml", []byte("x = "+strings.Repeat("[", 10000)+strings.Repeat("]", 10000)))
	if err == nil || !strings.Contains(err.Error(), "deep.toml:1:") || time.Since(start) > 5*time.Second {
		t.Errorf("deep arrays: %v after %v", err, time.Since(start))
	}
}

// TestCountAndTextLimits: valid but absurd input (ten thousand water
// levels, an ID of ten thousand characters) is refused with a position
// instead of taking minutes to draw.
func TestCountAndTextLimits(t *testing.T) {
	head := "[units]\ndepth = \"ft\"\ndiameter = \"in\"\n[well]\nid = \"A\"\npurpose = \"monitoring\"\ntotal_depth = 10.0\n[[borehole]]\ntop = 0.0\nbottom = 10.0\ndiameter = 8.0\n"
	var b strings.Builder
	b.WriteString(head)
	for i := 0; i < 10000; i++ {
		b.WriteString("[[water_level]]\ndepth = 5.0\n")
	}
	_, err := Load("many.toml", []byte(b.String()))
	// The 201st [[water_level]] opens line 12 + 2 x 200.
	if err == nil || !strings.Contains(err.Error(), "many.toml:412:") || !strings.Contains(err.Error(), "more than 200 [[water_level]]") {
		t.Errorf("10,000 water levels: %v", err)
	}
	long := strings.Replace(head, "id = \"A\"", "id = \""+strings.Repeat("W", 10000)+"\"", 1)
	_, err = Load("long.toml", []byte(long))
	if err == nil || !strings.Contains(err.Error(), "long.toml:5") || !strings.Contains(err.Error(), "limited to 4000") {
		t.Errorf("10,000-character ID: %v", err)
	}
	if strings.Contains(err.Error(), "must not be empty") {
		t.Errorf("a too-long ID is also called empty: %v", err)
	}
	// The bound is per well: 4 fills of 80 tags are 320 tags, and the
	// 201st (the 41st of the third fill) is refused where it stands,
	// once.
	// Unbounded, 100 fills of 2,000 tags took minutes to check.
	b.Reset()
	b.WriteString(head)
	for f := 0; f < 4; f++ {
		fmt.Fprintf(&b, "[[fill]]\ntop = %d.0\nbottom = %d.0\nmaterial = \"filter-pack\"\n", f, f+1)
		for i := 0; i < 80; i++ {
			b.WriteString("[[fill.tag]]\nafter_bags = 1\ndepth = 1.0\n")
		}
	}
	start := time.Now()
	_, err = Load("tags.toml", []byte(b.String()))
	// Line 12 + 2 x (4 + 240) + 4 opens the third fill's tags; its 41st
	// tag is 40 x 3 lines further.
	wantLine := fmt.Sprintf("tags.toml:%d:", 12+2*(4+240)+4+40*3)
	if err == nil || !strings.Contains(err.Error(), wantLine) || !strings.Contains(err.Error(), "more than 200 [[fill.tag]] tables in the well") || time.Since(start) > 5*time.Second {
		t.Errorf("320 tags over 4 fills (want %s): %v after %v", wantLine, err, time.Since(start))
	} else if n := strings.Count(err.Error(), "more than 200 "); n != 1 {
		t.Errorf("the limit is reported %d times, want once: %v", n, err)
	}
}

// TestValueAndFileTextLimits: an array of a hundred thousand centralizers
// (which took minutes and 800 MB to draw), 51 notes, and a file whose
// text values together pass MaxFileText are each refused with a
// position, at once.
func TestValueAndFileTextLimits(t *testing.T) {
	head := "[units]\ndepth = \"ft\"\ndiameter = \"in\"\n[well]\nid = \"A\"\npurpose = \"monitoring\"\ntotal_depth = 10.0\n%s\n[[borehole]]\ntop = 0.0\nbottom = 10.0\ndiameter = 8.0\n"
	many := func(n int, v string) string { return strings.TrimSuffix(strings.Repeat(v+", ", n), ", ") }
	for _, c := range []struct{ name, well, want string }{
		{"100,000 centralizers", fmt.Sprintf(head, "") + "[[casing]]\ntop = 0.0\nbottom = 10.0\nsize = \"2\"\nmaterial = \"PVC\"\ncentralizers = [" + many(100000, "5.0") + "]\n",
			"w.toml:18:16: centralizers holds 100000 values; at most 1000"},
		{"51 notes", fmt.Sprintf(head, "notes = ["+many(51, `"n"`)+"]"), "w.toml:8:9: notes holds 51 values; at most 50"},
		// 40 lithology descriptions of 3,900 bytes pass 128 KiB at the 34th.
		{"text past MaxFileText", fmt.Sprintf(head, "") + strings.Repeat("[[lithology]]\ntop = 0.0\nbottom = 10.0\nuscs = \"SM\"\ndescription = \""+strings.Repeat("d", 3900)+"\"\n", 40),
			fmt.Sprintf("w.toml:%d:15: the text values of the file pass 131072 bytes here", 13+33*5+4)},
	} {
		start := time.Now()
		_, err := Load("w.toml", []byte(c.well))
		if err == nil || !strings.Contains(err.Error(), c.want) || time.Since(start) > 2*time.Second {
			t.Errorf("%s: %v after %v\nwant %s", c.name, err, time.Since(start), c.want)
		}
	}
}
