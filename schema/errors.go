package schema

import (
	"fmt"
	"strings"
)

// Error is one problem in a well file, with its position. Line and Col are
// 1-based; Col is 0 when only the line is known.
type Error struct {
	File string
	Line int
	Col  int
	Key  string // dotted key path, e.g. "fill[2].bottom"; "" if none
	Msg  string
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

// ErrorList is every problem found in one file, in line order. Load returns
// one whenever a file is rejected, so a user fixes all at once.
type ErrorList []*Error

func (l ErrorList) Error() string {
	parts := make([]string, len(l))
	for i, e := range l {
		parts[i] = e.Error()
	}
	return strings.Join(parts, "\n")
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
