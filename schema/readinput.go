package schema

import (
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"syscall"
)

// Size limits of what tremie reads, far above any real file: a well file
// of 150 lithology intervals is about 30 KB, and a logo is at most 1 MiB.
const (
	MaxTextFile  = 8 << 20  // a well, project, profile or yields file
	MaxImageFile = 64 << 20 // a wall image or logo, before its own checks
	MaxNesting   = 64       // arrays and inline tables inside each other
)

// Count and text limits of one well, each far above any real well and
// low enough that the worst well they admit is checked and drawn
// (SVG, PDF and PNG) in a few seconds: tags, water levels and notes each
// become a row on the sheet's notes (and warnings of their own), and
// notes past the drawings' room fill notes sheets, each as costly to
// draw as a log sheet. The figures measured are in schema/FORMAT.md,
// Limits.
const (
	// MaxEntries bounds each list of intervals ([[lithology]], [[fill]],
	// [[borehole]], [[string.section]], [[sample]]...): a 1,000-ft hole
	// logged foot by foot; the 1,200-ft gallery well has 150 layers.
	MaxEntries = 1000
	// MaxTags bounds [[fill.tag]] over every fill of a well: a weighted
	// tape tag every few bags gives tens of tags in a deep well.
	MaxTags = 200
	// MaxWaterLevels bounds [[water_level]]: a construction log records
	// levels while drilling, developing and first gauging, some tens; a
	// monitoring history belongs in a monitoring database.
	MaxWaterLevels = 200
	// MaxFeatures bounds [[feature]]: an acoustic or optical televiewer log
	// picks some hundreds of fractures and contacts in a rock well's open
	// hole.
	MaxFeatures = 1000
	// MaxValues bounds the values of one array (centralizers, a list of
	// wells): a centralizer every 20 ft of a 3,000-ft string is 150.
	MaxValues = 1000
	// MaxNotes bounds the notes of a well (notes = [...]).
	MaxNotes = 50
	// MaxText bounds one text value (an ID, a description, a note).
	MaxText = 4000
	// MaxFileText bounds the text values of one file together: the
	// 1,200-ft gallery well holds 20 KB of text; laying text out costs
	// about 10 ms a kilobyte.
	MaxFileText = 128 << 10
)

// entryLimit is the most tables of one kind ("fill.tag", "water_level")
// a file may hold.
func entryLimit(kind string) int {
	switch kind {
	case "fill.tag":
		return MaxTags
	case "water_level":
		return MaxWaterLevels
	case "feature":
		return MaxFeatures
	}
	return MaxEntries
}

// ErrNotRegular is wrapped by ReadInput's error for a FIFO, device,
// socket or directory named as an input.
var ErrNotRegular = errors.New("not a regular file")

// ReadInput reads a file tremie takes as input: only a regular file
// (a FIFO would block every command, a device such as /dev/zero would
// never end), and at most limit bytes. The file is opened without
// blocking and checked on the open descriptor, so a FIFO put in its
// place after a look cannot hang the run.
func ReadInput(path string, limit int64) ([]byte, error) {
	f, err := os.OpenFile(path, os.O_RDONLY|syscall.O_NONBLOCK, 0)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	st, err := f.Stat()
	if err != nil {
		return nil, err
	}
	if !st.Mode().IsRegular() {
		return nil, &fs.PathError{Op: "read", Path: path, Err: fmt.Errorf("%w (%s)", ErrNotRegular, kindOf(st.Mode()))}
	}
	if st.Size() > limit {
		return nil, &fs.PathError{Op: "read", Path: path, Err: fmt.Errorf("%d bytes, more than the %d a file of this kind may have", st.Size(), limit)}
	}
	// Room for the size the file has now and a byte more, to see it grow
	// past the limit while read: one read and no copying for a file that
	// does not change.
	data := make([]byte, 0, st.Size()+1)
	r := io.LimitReader(f, limit+1)
	for {
		if len(data) == cap(data) {
			data = append(data, 0)[:len(data)]
		}
		n, err := r.Read(data[len(data):cap(data)])
		data = data[:len(data)+n]
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, err
		}
	}
	if int64(len(data)) > limit {
		return nil, &fs.PathError{Op: "read", Path: path, Err: fmt.Errorf("more than the %d bytes a file of this kind may have", limit)}
	}
	return data, nil
}

func kindOf(m fs.FileMode) string {
	switch {
	case m.IsDir():
		return "a directory"
	case m&fs.ModeNamedPipe != 0:
		return "a named pipe"
	case m&fs.ModeDevice != 0, m&fs.ModeCharDevice != 0:
		return "a device"
	case m&fs.ModeSocket != 0:
		return "a socket"
	}
	return "not a plain file"
}

// CheckNesting reports, before the TOML parser sees the text, the first
// place where arrays and inline tables nest deeper than max: the parser
// recurses once per level, and a small file of ten thousand nested
// braces would take it minutes and gigabytes. Strings and comments are
// skipped, so brackets inside them do not count.
func CheckNesting(name string, data []byte, max int) *Error {
	depth, line, col := 0, 1, 0
	for i := 0; i < len(data); i++ {
		c := data[i]
		col++
		switch c {
		case '\n':
			line, col = line+1, 0
		case '#':
			for i+1 < len(data) && data[i+1] != '\n' {
				i++
			}
		case '"', '\'':
			n := skipString(data, i)
			for _, b := range data[i:n] {
				if b == '\n' {
					line, col = line+1, 0
				} else {
					col++
				}
			}
			i = n - 1
		case '[', '{':
			depth++
			if depth > max {
				return &Error{File: name, Line: line, Col: col, Msg: fmt.Sprintf("arrays and inline tables nest more than %d deep here; no tremie input file needs that", max)}
			}
		case ']', '}':
			if depth > 0 {
				depth--
			}
		}
	}
	return nil
}

// skipString returns the index just past the string (basic or literal,
// one- or multi-line) that opens at data[i]; an unclosed string runs to
// the end of its line (one-line) or of the data (multi-line), which the
// parser then reports.
func skipString(data []byte, i int) int {
	q := data[i]
	if i+2 < len(data) && data[i+1] == q && data[i+2] == q {
		delim := []byte{q, q, q}
		for j := i + 3; j+2 < len(data)+0; j++ {
			if q == '"' && data[j] == '\\' {
				j++
				continue
			}
			if data[j] == q && data[j+1] == delim[1] && data[j+2] == delim[2] {
				// A closing run may carry up to two more quotes.
				k := j + 3
				for n := 0; n < 2 && k < len(data) && data[k] == q; n++ {
					k++
				}
				return k
			}
		}
		return len(data)
	}
	for j := i + 1; j < len(data); j++ {
		switch {
		case q == '"' && data[j] == '\\':
			j++
		case data[j] == q:
			return j + 1
		case data[j] == '\n':
			return j
		}
	}
	return len(data)
}
