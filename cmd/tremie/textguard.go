package main

import (
	"fmt"
	"io"
	"os"
	"unicode/utf8"

	"golang.org/x/term"
)

// textGuard shows control characters in what it writes as visible
// escapes (ESC as \x1b), keeping only newline and tab: a well ID or file
// name holding terminal escape sequences must not retitle, recolour or
// clear the user's terminal when tremie prints it.
type textGuard struct{ w io.Writer }

func (g textGuard) Write(p []byte) (int, error) {
	clean := true
	for _, b := range p {
		if b < 0x20 && b != '\n' && b != '\t' || b == 0x7f || b == 0xc2 {
			clean = false
			break
		}
	}
	if clean {
		return g.w.Write(p)
	}
	out := make([]byte, 0, len(p)+16)
	for i := 0; i < len(p); {
		r, n := utf8.DecodeRune(p[i:])
		switch {
		case r == '\n' || r == '\t':
			out = append(out, byte(r))
		case r < 0x20 || r == 0x7f || (r >= 0x80 && r <= 0x9f):
			out = fmt.Appendf(out, `\x%02x`, r)
		default:
			out = append(out, p[i:i+n]...)
		}
		i += n
	}
	if _, err := g.w.Write(out); err != nil {
		return 0, err
	}
	return len(p), nil
}

// terminalSafe guards stderr always (it carries only messages) and
// stdout when it is a terminal; stdout redirected to a file or a pipe
// carries data (CSV, JSON, a workbook) and is passed through untouched.
func terminalSafe() (stdout, stderr io.Writer) {
	stdout = os.Stdout
	if term.IsTerminal(int(os.Stdout.Fd())) {
		stdout = textGuard{os.Stdout}
	}
	return stdout, textGuard{os.Stderr}
}
