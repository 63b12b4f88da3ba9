package quantities

import (
	"fmt"
	"io"
	"strings"
)

// Format is one way of writing a report, looked up by name so that no
// caller holds a switch over formats.
type Format struct {
	Name  string // as --format spells it
	Write func(w io.Writer, r *Report) error
}

// formats are the registered formats, the default first, in the order a
// command offers them.
var formats = []Format{
	{Name: "text", Write: writeText},
	{Name: "json", Write: writeJSON},
	{Name: "csv", Write: writeCSV},
}

// Formats lists the names of the formats, the default first.
func Formats() []string {
	names := make([]string, len(formats))
	for i, f := range formats {
		names[i] = f.Name
	}
	return names
}

// Lookup returns the format registered under name.
func Lookup(name string) (Format, bool) {
	for _, f := range formats {
		if f.Name == name {
			return f, true
		}
	}
	return Format{}, false
}

// Write writes the report in the named format.
func Write(w io.Writer, format string, r *Report) error {
	f, ok := Lookup(format)
	if !ok {
		return fmt.Errorf("unknown format %q (%s)", format, strings.Join(Formats(), ", "))
	}
	return f.Write(w, r)
}
