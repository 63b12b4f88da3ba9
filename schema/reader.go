package schema

import (
	"fmt"
	"math"
	"slices"
	"sort"
	"strconv"
	"strings"
	"time"
)

// reader walks the generic TOML tree, converting values to model types
// and collecting every error with its position.
type reader struct {
	file  string
	src   string
	heads map[string]int    // table header path -> line
	lines map[string]int    // key path -> line, for every key; scanned when needed
	pos   map[string]keyPos // with columns; scanned on the first error
	errs  ErrorList
	// entries counts the tables of each array kind read so far in the
	// well ("fill.tag" over every fill), for entryLimit.
	entries map[string]int
	text    int // bytes of text values read, for MaxFileText

	onRead func(path, key string) // tests: called for every key the loader reads
}

// errAt records an error at the value of a key path (or its nearest
// enclosing table).
func (r *reader) errAt(path string, format string, args ...any) {
	r.record(path, false, format, args...)
}

// errAtKey records an error at the key itself, for unknown keys, with a
// hint on how the table is written.
func (r *reader) errAtKey(path, hint string, format string, args ...any) {
	r.record(path, true, format, args...)
	r.errs[len(r.errs)-1].Hint = hint
}

func (r *reader) record(path string, atKey bool, format string, args ...any) {
	if r.pos == nil {
		r.pos = scanKeyPositions(r.src)
	}
	p, ok := r.pos[path]
	if !ok {
		p, ok = r.pos[path+"[0]"] // an array of tables: its first header
	}
	for q := path; !ok && q != ""; q = parentPath(q) {
		p, ok = r.pos[q]
	}
	col := p.col
	if atKey {
		col = p.keyCol
	}
	if p.line == 0 {
		p.line = 1 // a problem of the whole file
	}
	r.errs = append(r.errs, &Error{File: r.file, Line: p.line, Col: col, Key: path, Msg: fmt.Sprintf(format, args...)})
}

// table is one TOML table being read; it remembers which keys were used so
// that the rest can be reported as unknown.
type table struct {
	r    *reader
	path string
	m    map[string]any
	spec *TableSpec // the keys the table may hold (see WellFile)
	used []string   // keys asked for; a table has few, so a slice beats a map
	buf  [8]string  // used's first backing array, saving an allocation per table
}

func (r *reader) root(m map[string]any) *table {
	return &table{r: r, m: m, spec: WellFile}
}

// use marks a key as read.
func (t *table) use(k string) {
	if t.used == nil {
		t.used = t.buf[:0]
	}
	t.used = append(t.used, k)
}

// isUsed reports whether a key was read.
func (t *table) isUsed(k string) bool {
	for _, u := range t.used {
		if u == k {
			return true
		}
	}
	return false
}

func (t *table) keyPath(k string) string {
	if t.path == "" {
		return k
	}
	return t.path + "." + k
}

// get reads key k as type want. Reading a key the key table does not
// declare, or as another type, is a fault of the loader, reported as an
// error on every file so that no test can miss it.
func (t *table) get(k string, want ValueType) (any, bool) {
	t.use(k)
	if t.r.onRead != nil {
		t.r.onRead(t.path, k)
	}
	if ks := t.spec.spec(k); t.spec != nil && (ks == nil || !ks.takes(want)) {
		t.r.errAt(t.path, "internal: the loader reads %q in [%s] as %v, which schema/wellkeys.go does not declare", k, stripIndex(t.path), want)
	}
	v, ok := t.m[k]
	return v, ok
}

// childSpec is the key table of sub-table k.
func (t *table) childSpec(k string) *TableSpec {
	if ks := t.spec.spec(k); ks != nil {
		return ks.Table
	}
	return nil
}

// bounded checks that the key table gives key k the bound the loader
// enforces.
func (t *table) bounded(k string, b Bound) {
	ks := t.spec.spec(k)
	if ks != nil && ks.Type == TypeTable && ks.Alt != nil {
		ks = ks.Alt // a number given in place of the table
	}
	if ks != nil && ks.Bound != b {
		t.r.errAt(t.path, "internal: the loader bounds %q in [%s] other than schema/wellkeys.go declares", k, stripIndex(t.path))
	}
}

// done reports every key of the table that its key table does not
// declare (or, for a table without one or a key of a form the user names,
// such as a profile's groups, that no reader asked for), naming the known
// key it is closest to and, as a hint, every key the table takes.
func (t *table) done() {
	if t == nil {
		return
	}
	var unknown []string
	for k := range t.m {
		var known bool
		switch {
		case t.spec == nil:
			known = t.isUsed(k) // a table without a key table: what the loader asked for
		case t.spec.Key(k) != nil:
			known = true
		case t.spec.Other != nil:
			known = t.isUsed(k) // a key the user names (a profile's group), once read
		}
		if !known {
			unknown = append(unknown, k)
		}
	}
	if len(unknown) == 0 {
		return
	}
	sort.Strings(unknown)
	var known []string
	if t.spec != nil {
		known = t.spec.Names()
	}
	if t.spec == nil || t.spec.Other != nil {
		known = append(known, t.used...)
	}
	sort.Strings(known)
	known = slices.Compact(known)
	where, hint := "at top level", "the file takes: "+strings.Join(known, ", ")
	if t.path != "" {
		where = "in [" + stripIndex(t.path) + "]"
		hint = "[" + stripIndex(t.path) + "] takes: " + strings.Join(known, ", ")
	}
	noun := "key"
	if t.spec != nil {
		if t.spec.Hint != "" {
			hint = t.spec.Hint
		}
		if t.spec.Noun != "" {
			noun = t.spec.Noun
		}
	}
	if len(known) == 0 && (t.spec == nil || t.spec.Hint == "") {
		hint = ""
	}
	for _, k := range unknown {
		t.r.errAtKey(t.keyPath(k), hint, "unknown %s %q %s%s", noun, k, where, DidYouMean(k, known))
	}
}

func stripIndex(p string) string {
	var b strings.Builder
	depth := 0
	for _, c := range p {
		switch {
		case c == '[':
			depth++
		case c == ']':
			depth--
		case depth == 0:
			b.WriteRune(c)
		}
	}
	return b.String()
}

func typeName(v any) string {
	switch v.(type) {
	case string:
		return "a string"
	case int64:
		return "an integer"
	case float64:
		return "a float"
	case bool:
		return "a boolean"
	case time.Time:
		return "a date"
	case []any, []map[string]any:
		return "an array"
	case map[string]any:
		return "a table"
	}
	return fmt.Sprintf("%T", v)
}

func (t *table) str(k string) string {
	v, ok := t.get(k, TypeString)
	if !ok {
		return ""
	}
	s, ok := v.(string)
	if !ok {
		t.r.errAt(t.keyPath(k), "%s must be a string, not %s", k, typeName(v))
	}
	if len(s) > MaxText {
		t.r.errAt(t.keyPath(k), "%s is %d bytes long; text in a well file is limited to %d", k, len(s), MaxText)
		return s[:MaxText] // not empty: one message, not a second "must not be empty"
	}
	t.r.countText(t.keyPath(k), len(s))
	return s
}

// countText adds a text value's length to the file's, and reports, once,
// the value that takes the file past MaxFileText.
func (r *reader) countText(path string, n int) {
	if r.text <= MaxFileText && r.text+n > MaxFileText {
		r.errAt(path, "the text values of the file pass %d bytes here; no well needs that much, and laying it out would take minutes", MaxFileText)
	}
	r.text += n
}

// overflows reports, once for the key, an array of more than max values.
func (t *table) overflows(k string, n, max int) bool {
	if n <= max {
		return false
	}
	t.r.errAt(t.keyPath(k), "%s holds %d values; at most %d are allowed, far more than any well needs", k, n, max)
	return true
}

func (t *table) reqStr(k string) string {
	if _, ok := t.m[k]; !ok {
		t.r.errAt(t.path, "missing required key %q in [%s]", k, stripIndex(t.path))
		t.use(k)
		return ""
	}
	s := t.str(k)
	if strings.TrimSpace(s) == "" {
		t.r.errAt(t.keyPath(k), "%s must not be empty", k)
	}
	return s
}

// oneOf reads a string that must be one of the values the key table
// allows ("" when absent).
func (t *table) oneOf(k string) string {
	s := t.str(k)
	if s == "" {
		return ""
	}
	var allowed []string
	if ks := t.spec.spec(k); ks != nil {
		allowed = ks.Enum
	}
	for _, a := range allowed {
		if s == a {
			return s
		}
	}
	t.r.errAt(t.keyPath(k), "%s = %q is not one of: %s%s", k, s, strings.Join(allowed, ", "), DidYouMean(s, allowed))
	return ""
}

// num reads a finite number (integer or float).
func (t *table) num(k string) (float64, bool) {
	v, ok := t.get(k, TypeNumber)
	if !ok {
		return 0, false
	}
	var f float64
	switch x := v.(type) {
	case int64:
		f = float64(x)
	case float64:
		f = x
	default:
		t.r.errAt(t.keyPath(k), "%s must be a number, not %s", k, typeName(v))
		return 0, false
	}
	if math.IsNaN(f) || math.IsInf(f, 0) {
		t.r.errAt(t.keyPath(k), "%s must be a finite number, not %v", k, f)
		return 0, false
	}
	return f, true
}

func (t *table) reqNum(k string) float64 {
	if _, ok := t.m[k]; !ok {
		t.r.errAt(t.path, "missing required key %q in [%s]", k, stripIndex(t.path))
		t.use(k)
		return 0
	}
	f, _ := t.num(k)
	return f
}

// positive reads a number that must be > 0 when present.
func (t *table) positive(k string) (float64, bool) {
	t.bounded(k, Positive)
	f, ok := t.num(k)
	if ok && f <= 0 {
		t.r.errAt(t.keyPath(k), "%s must be positive, not %v", k, f)
		return 0, false
	}
	return f, ok
}

func (t *table) nonNegative(k string) (float64, bool) {
	t.bounded(k, NonNegative)
	f, ok := t.num(k)
	if ok && f < 0 {
		t.r.errAt(t.keyPath(k), "%s must not be negative, not %v", k, f)
		return 0, false
	}
	return f, ok
}

func (t *table) integer(k string) int {
	v, ok := t.get(k, TypeInteger)
	if !ok {
		return 0
	}
	n, ok := v.(int64)
	if !ok {
		t.r.errAt(t.keyPath(k), "%s must be an integer, not %s", k, typeName(v))
		return 0
	}
	if n < 0 || n > 1_000_000 {
		t.r.errAt(t.keyPath(k), "%s = %d is out of range", k, n)
		return 0
	}
	return int(n)
}

func (t *table) date(k string) Date {
	v, ok := t.get(k, TypeDate)
	if !ok {
		return Date{}
	}
	tm, ok := v.(time.Time)
	if !ok {
		t.r.errAt(t.keyPath(k), "%s must be a date such as 2026-03-14, not %s", k, typeName(v))
		return Date{}
	}
	return Date{Year: tm.Year(), Month: tm.Month(), Day: tm.Day()}
}

// instant reads a date or date-time; hasTime is false for a bare date.
func (t *table) instant(k string) (time.Time, bool) {
	v, ok := t.get(k, TypeDateTime)
	if !ok {
		return time.Time{}, false
	}
	tm, ok := v.(time.Time)
	if !ok {
		t.r.errAt(t.keyPath(k), "%s must be a date or date-time, not %s", k, typeName(v))
		return time.Time{}, false
	}
	hasTime := tm.Hour() != 0 || tm.Minute() != 0 || tm.Second() != 0
	return time.Date(tm.Year(), tm.Month(), tm.Day(), tm.Hour(), tm.Minute(), tm.Second(), 0, time.UTC), hasTime
}

func (t *table) strings(k string) []string {
	v, ok := t.get(k, TypeStrings)
	if !ok {
		return nil
	}
	arr, ok := v.([]any)
	if !ok {
		if s, isStr := v.(string); isStr {
			return []string{s}
		}
		t.r.errAt(t.keyPath(k), "%s must be an array of strings, not %s", k, typeName(v))
		return nil
	}
	max := MaxValues
	if k == "notes" {
		max = MaxNotes
	}
	if t.overflows(k, len(arr), max) {
		return nil
	}
	out := make([]string, 0, len(arr))
	for i, e := range arr {
		s, ok := e.(string)
		if !ok {
			t.r.errAt(t.keyPath(k), "%s must hold only strings, found %s", k, typeName(e))
			return nil
		}
		if len(s) > MaxText {
			t.r.errAt(t.keyPath(k), "%s[%d] is %d bytes long; text in a well file is limited to %d", k, i, len(s), MaxText)
			return nil
		}
		t.r.countText(t.keyPath(k), len(s))
		out = append(out, s)
	}
	return out
}

func (t *table) numbers(k string) []float64 {
	v, ok := t.get(k, TypeNumbers)
	if !ok {
		return nil
	}
	arr, ok := v.([]any)
	if !ok {
		t.r.errAt(t.keyPath(k), "%s must be an array of numbers, not %s", k, typeName(v))
		return nil
	}
	if t.overflows(k, len(arr), MaxValues) {
		return nil
	}
	out := make([]float64, 0, len(arr))
	for _, e := range arr {
		f, ok := Number(e)
		if !ok {
			t.r.errAt(t.keyPath(k), "%s must hold only numbers, found %s", k, typeName(e))
			return nil
		}
		if math.IsNaN(f) || math.IsInf(f, 0) {
			t.r.errAt(t.keyPath(k), "%s must hold finite numbers, found %v", k, f)
			return nil
		}
		out = append(out, f)
	}
	return out
}

// sub returns a sub-table, or nil when absent.
func (t *table) sub(k string) *table {
	v, ok := t.get(k, TypeTable)
	if !ok {
		return nil
	}
	m, ok := v.(map[string]any)
	if !ok {
		t.r.errAt(t.keyPath(k), "%s must be a table ([%s]), not %s", k, stripIndex(t.keyPath(k)), typeName(v))
		return nil
	}
	return &table{r: t.r, path: t.keyPath(k), m: m, spec: t.childSpec(k)}
}

// list returns the entries of an array of tables ([[k]]).
func (t *table) list(k string) []*table {
	v, ok := t.get(k, TypeTables)
	if !ok {
		return nil
	}
	var maps []map[string]any
	switch x := v.(type) {
	case []map[string]any:
		maps = x
	case []any:
		for _, e := range x {
			m, ok := e.(map[string]any)
			if !ok {
				t.r.errAt(t.keyPath(k), "%s must be an array of tables ([[%s]]), found %s", k, stripIndex(t.keyPath(k)), typeName(e))
				return nil
			}
			maps = append(maps, m)
		}
	case map[string]any:
		t.r.errAt(t.keyPath(k), "%s must be written [[%s]] (an array of tables), not [%s]", k, stripIndex(t.keyPath(k)), stripIndex(t.keyPath(k)))
		return nil
	default:
		t.r.errAt(t.keyPath(k), "%s must be an array of tables ([[%s]]), not %s", k, stripIndex(t.keyPath(k)), typeName(v))
		return nil
	}
	// The bound is per well and kind: [[fill.tag]] counts the tags of
	// every fill together, so that 100 fills of 2,000 tags each cannot
	// run past it (that file is 7 MB and took minutes to check).
	kind := stripIndex(t.keyPath(k))
	if t.r.entries == nil {
		t.r.entries = map[string]int{}
	}
	limit := entryLimit(kind)
	switch left := limit - t.r.entries[kind]; {
	case left < 0: // reported once already
		maps = nil
	case len(maps) > left:
		t.r.errAt(fmt.Sprintf("%s[%d]", t.keyPath(k), left), "more than %d [[%s]] tables in the well; no well has that many, and drawing them would take minutes", limit, kind)
		maps = maps[:left]
		t.r.entries[kind] = limit + 1
	default:
		t.r.entries[kind] += len(maps)
	}
	out := make([]*table, len(maps))
	tables := make([]table, len(maps))
	base := t.keyPath(k)
	spec := t.childSpec(k)
	for i, m := range maps {
		tables[i] = table{r: t.r, path: base + "[" + strconv.Itoa(i) + "]", m: m, spec: spec}
		out[i] = &tables[i]
	}
	return out
}
