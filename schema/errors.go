package schema

import (
	"cmp"
	"errors"
	"fmt"
	"slices"
	"strings"
)

// Error is one problem in an input file (well, project, profile, yields,
// page template), with its position. Line and Col are 1-based; Col is 0
// when only the line is known.
type Error struct {
	File string
	Line int
	Col  int
	Key  string // dotted key path, e.g. "fill[2].bottom"; "" if none
	Msg  string
	Hint string // how the key is written, e.g. the keys a table takes; "" if none
}

func (e *Error) Error() string {
	pos := e.File
	if e.Line > 0 {
		pos += fmt.Sprintf(":%d", e.Line)
		if e.Col > 0 {
			pos += fmt.Sprintf(":%d", e.Col)
		}
	}
	return pos + ": " + e.Msg
}

// ErrorList is every problem found in one file, in file and line order.
// Every loader returns one whenever a file is rejected, so a user fixes
// all at once.
type ErrorList []*Error

// Error is the list as every command prints it: one line per error,
// "file:line:col: message", each hint indented on the line below.
func (l ErrorList) Error() string {
	var b strings.Builder
	for i, e := range l {
		if i > 0 {
			b.WriteByte('\n')
		}
		b.WriteString(e.Error())
		if e.Hint != "" {
			b.WriteString("\n\t" + e.Hint)
		}
	}
	return b.String()
}

// Unwrap gives the errors of the list, so that errors.As finds the first
// *Error.
func (l ErrorList) Unwrap() []error {
	out := make([]error, len(l))
	for i, e := range l {
		out[i] = e
	}
	return out
}

// Sort orders the list by file, line and column, keeping the order of
// errors at one place.
func (l ErrorList) Sort() {
	slices.SortStableFunc(l, func(a, b *Error) int {
		return cmp.Or(cmp.Compare(a.File, b.File), cmp.Compare(a.Line, b.Line), cmp.Compare(a.Col, b.Col))
	})
}

// Errors flattens any loader error into a list: an ErrorList as it is, a
// single *Error as a list of one, anything else as one error of file
// without a position.
func Errors(file string, err error) ErrorList {
	if err == nil {
		return nil
	}
	var list ErrorList
	if errors.As(err, &list) && len(list) > 0 {
		return list
	}
	var one *Error
	if errors.As(err, &one) {
		return ErrorList{one}
	}
	return ErrorList{{File: file, Msg: err.Error()}}
}

// First is the first error, for callers that report one line.
func (l ErrorList) First() *Error {
	if len(l) == 0 {
		return nil
	}
	return l[0]
}

// ReadError is the error for a file that could not be read at all. what
// names the kind of file in the message ("profile", "yields"; "" for a
// well file); the cause is given without the path, which the position
// already names.
func ReadError(path, what string, err error) *Error {
	err = unwrapPathError(err)
	msg := "cannot read"
	if what != "" {
		msg += " " + what
	}
	return &Error{File: path, Msg: fmt.Sprintf("%s: %v", msg, err)}
}

// LineOf is the line of a key path in a map of key lines (from
// KeyPositions), or of its nearest enclosing table, or 1.
func LineOf(lines map[string]int, path string) int {
	for p := path; p != ""; p = parentPath(p) {
		if l, ok := lines[p]; ok {
			return l
		}
	}
	return 1
}
