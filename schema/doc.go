package schema

import (
	"errors"
	"sort"
	"strings"
	"unicode/utf8"

	"github.com/BurntSushi/toml"
)

// Doc is one TOML input file read strictly, the way the well loader reads
// a well file: the project, profile, yields and page-template loaders use
// it too. Each value is read through a Table, which records a type error
// at the value's line and column; Done reports every key no one asked
// for, with "did you mean" when a known key is close; Err returns every
// error of the file, sorted. So every input file fails the same way.
type Doc struct {
	r    *reader
	root *table
}

// Table is one table of a Doc. Its methods read a key (marking it known)
// and record any error; see Doc.
type Table = table

// DecodeTOML parses an input file's TOML bytes into its tree, or returns
// the error with its position as an ErrorList. Every reader of TOML
// bytes goes through it, so that the nesting depth is checked
// (CheckNesting) before the TOML library sees the text: the library
// recurses once per level, and a small file nested ten thousand deep
// would take it minutes and gigabytes.
func DecodeTOML(name string, data []byte) (map[string]any, error) {
	return decode(name, data, string(data))
}

// decode is DecodeTOML for a caller that keeps src, the text of data.
func decode(name string, data []byte, src string) (map[string]any, error) {
	if e := CheckNesting(name, data, MaxNesting); e != nil {
		return nil, ErrorList{e}
	}
	// Decoding into a bare interface hands over the parser's own tree;
	// a map[string]any target would be copied key by key.
	var tree any
	if _, err := toml.Decode(src, &tree); err != nil {
		var pe toml.ParseError
		if errors.As(err, &pe) {
			line := newlineLine(src, pe.Position.Line, pe.Position.Col, pe.Message)
			col := offsetCol(src, line, pe.Position.Start, pe.Position.Col)
			return nil, ErrorList{{File: name, Line: line, Col: col, Msg: "TOML syntax: " + pe.Message}}
		}
		return nil, ErrorList{{File: name, Msg: "TOML: " + err.Error()}}
	}
	raw, _ := tree.(map[string]any)
	if raw == nil {
		raw = map[string]any{}
	}
	return raw, nil
}

// newlineLine is the line of a syntax error that the parser met at a
// line's end ("got '\n' instead"): the parser counts some such errors,
// an unclosed table header among them ("[well"), on the next line, at the
// column just past the end of the line before. The line whose end the
// column stands at is the one to name; any other error keeps its line.
func newlineLine(src string, line, col int, msg string) int {
	if !strings.Contains(msg, `'\n'`) || line < 2 {
		return line
	}
	lines := strings.Split(src, "\n")
	width := func(n int) int { // characters of line n (1-based), without a CR
		if n < 1 || n > len(lines) {
			return -1
		}
		return utf8.RuneCountInString(strings.TrimSuffix(lines[n-1], "\r"))
	}
	if width(line) != col-1 && width(line-1) == col-1 {
		return line - 1
	}
	return line
}

// offsetCol is the column of a syntax error counted from its byte offset
// start, where that offset lies on the line named: the parser's own
// column for a duplicate key counts from the line before ("total_depth =
// 37.0" repeated on an 18-character line was named at column 28). Where
// the offset lies on another line (an error met at a line's end, see
// newlineLine) the parser's column stands.
func offsetCol(src string, line, start, col int) int {
	if start < 0 || start > len(src) {
		return col
	}
	before := src[:start]
	if strings.Count(before, "\n")+1 != line {
		return col
	}
	return utf8.RuneCountInString(before[strings.LastIndexByte(before, '\n')+1:]) + 1
}

// ParseDoc parses a file's bytes; name is used in positions, spec is the
// file's key table (nil for a file without one: then the keys its loader
// asks for are the known ones). A syntax error is returned as an
// ErrorList.
func ParseDoc(name string, data []byte, spec *TableSpec) (*Doc, error) {
	src := string(data)
	raw, err := decode(name, data, src)
	if err != nil {
		return nil, err
	}
	r := &reader{file: name, src: src}
	return &Doc{r: r, root: &table{r: r, m: raw, spec: spec}}, nil
}

// Root is the file's top-level table.
func (d *Doc) Root() *Table { return d.root }

// Errorf records an error at the value of a key path (or of its nearest
// enclosing table), e.g. "project.units".
func (d *Doc) Errorf(path, format string, args ...any) { d.r.errAt(path, format, args...) }

// Line is the line of a key path, or of its nearest enclosing table, or 1.
func (d *Doc) Line(path string) int {
	if d.r.lines == nil {
		d.r.lines = scanKeyLines(d.r.src)
	}
	return LineOf(d.r.lines, path)
}

// Lines maps every key path of the file to its line.
func (d *Doc) Lines() map[string]int {
	if d.r.lines == nil {
		d.r.lines = scanKeyLines(d.r.src)
	}
	return d.r.lines
}

// Err returns every error recorded, sorted, as an ErrorList; nil if none.
func (d *Doc) Err() error {
	if len(d.r.errs) == 0 {
		return nil
	}
	d.r.errs.Sort()
	return d.r.errs
}

// Exported readers of a Table, for the loaders outside this package.

// Str reads a string ("" when absent).
func (t *table) Str(k string) string { return t.str(k) }

// ReqStr reads a string that must be present and not blank.
func (t *table) ReqStr(k string) string { return t.reqStr(k) }

// OneOf reads a string that must be one of the values the key table
// allows ("" when absent or not allowed, the error recorded).
func (t *table) OneOf(k string) string { return t.oneOf(k) }

// Num reads a finite number, and whether it was given and valid.
func (t *table) Num(k string) (float64, bool) { return t.num(k) }

// Positive reads a number that must be > 0 when present.
func (t *table) Positive(k string) (float64, bool) { return t.positive(k) }

// NonNegative reads a number that must be >= 0 when present.
func (t *table) NonNegative(k string) (float64, bool) { return t.nonNegative(k) }

// Bool reads a boolean (false when absent).
func (t *table) Bool(k string) bool { return t.boolean(k) }

// Date reads a TOML local date.
func (t *table) Date(k string) Date { return t.date(k) }

// Sub reads a sub-table, or nil when absent.
func (t *table) Sub(k string) *Table { return t.sub(k) }

// Strings reads an array of strings (a lone string is one).
func (t *table) Strings(k string) []string { return t.strings(k) }

// List reads an array of tables ([[k]]).
func (t *table) List(k string) []*Table { return t.list(k) }

// Raw reads a key as the TOML parser gave it (string, int64, float64,
// bool, time.Time, []any, map[string]any), for a shape the other readers
// do not cover; the caller checks it and reports with Doc.Errorf.
func (t *table) Raw(k string) (any, bool) {
	t.use(k)
	v, ok := t.m[k]
	return v, ok
}

// Has reports whether the key is written, without reading it.
func (t *table) Has(k string) bool {
	_, ok := t.m[k]
	return ok
}

// Keys lists the table's keys, sorted, without reading them.
func (t *table) Keys() []string {
	out := make([]string, 0, len(t.m))
	for k := range t.m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}

// Path is the table's key path, "" for the root.
func (t *table) Path() string { return t.path }

// Done reports every key of the table that no reader asked for. Call it
// on every table once its known keys are read; nil is allowed.
func (t *table) Done() { t.done() }

// Suggest returns the known word closest to word, if it is close enough
// to be a slip of the keyboard (an edit distance of 1 for short words, 2
// from five letters on, 3 from nine, where two neighbouring letters
// swapped count as one slip; case is ignored), else "".
func Suggest(word string, known []string) string {
	w := strings.ToLower(word)
	limit := 1
	switch {
	case len(w) >= 9:
		limit = 3
	case len(w) >= 5:
		limit = 2
	}
	best, bestD := "", limit+1
	for _, k := range known {
		if k == word {
			continue
		}
		if d := slipDistance(w, strings.ToLower(k)); d < bestD {
			best, bestD = k, d
		}
	}
	return best
}

// DidYouMean is " (did you mean "x"?)" for the known word closest to
// word, or "".
func DidYouMean(word string, known []string) string {
	if s := Suggest(word, known); s != "" {
		return " (did you mean \"" + s + "\"?)"
	}
	return ""
}

// slipDistance is the optimal-string-alignment distance (Damerau): the
// fewest letters inserted, deleted, changed or swapped with a neighbour
// that turn a into b. "nmae" is one slip from "name", not two.
func slipDistance(a, b string) int {
	// rows i-2, i-1 and i of the table
	pp, prev, cur := make([]int, len(b)+1), make([]int, len(b)+1), make([]int, len(b)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		for j := 1; j <= len(b); j++ {
			cost := 1
			if a[i-1] == b[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
			if i > 1 && j > 1 && a[i-1] == b[j-2] && a[i-2] == b[j-1] {
				cur[j] = min(cur[j], pp[j-2]+1)
			}
		}
		pp, prev, cur = prev, cur, pp
	}
	return prev[len(b)]
}
