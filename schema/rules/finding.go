package rules

import (
	"encoding/json"

	"github.com/tremie-dev/tremie/schema"
)

// Finding is one thing a rule found in a well: plain data. It keeps the key
// path the rule named and the depths in model units; reports build their
// text from it, and MarshalJSON gives the form every JSON report shares.
type Finding struct {
	Rule     string
	Severity Severity
	Waived   bool
	Waiver   *Waiver // the waiver that covers it, when Waived
	File     string
	Line     int    // the line of Path in File (or of its nearest table), or 1
	Path     string // key path the rule named, e.g. "fill[2].top"; "" if none
	WellID   string
	Message  string
	Depths   []schema.Length  // depths the finding concerns, top first, in metres
	Units    schema.DepthUnit // the well's depth unit, for showing Depths
}

// Waiver is the waiver that covers a finding.
type Waiver struct {
	Reason     string `json:"reason"`
	ApprovedBy string `json:"approved_by"`
	Date       string `json:"date,omitempty"`
}

// Label is "error", "warning" or "waived", as the check prints it.
func (f Finding) Label() string {
	if f.Waived {
		return "waived"
	}
	return f.Severity.String()
}

// Blocking reports whether the finding is an error that no waiver covers.
func (f Finding) Blocking() bool { return f.Severity == Error && !f.Waived }

// Span is the first and last depth the finding names, in the well's
// depth unit, and false when it names none.
func (f Finding) Span() (top, bottom float64, ok bool) {
	if len(f.Depths) == 0 {
		return 0, 0, false
	}
	return f.Depths[0].In(f.Units), f.Depths[len(f.Depths)-1].In(f.Units), true
}

// findingJSON is a finding as every JSON report writes it.
type findingJSON struct {
	Rule     string   `json:"rule"`
	Severity string   `json:"severity"`
	Waived   bool     `json:"waived"`
	Waiver   *Waiver  `json:"waiver,omitempty"`
	File     string   `json:"file"`
	Line     int      `json:"line"`
	Key      string   `json:"key,omitempty"`
	WellID   string   `json:"well"`
	Message  string   `json:"message"`
	Top      *float64 `json:"top,omitempty"`    // depth named, in file units
	Bottom   *float64 `json:"bottom,omitempty"` // depth named, in file units
	Unit     string   `json:"unit,omitempty"`
}

// MarshalJSON writes the finding with its severity as a word and its
// depths in the well's unit.
func (f Finding) MarshalJSON() ([]byte, error) {
	j := findingJSON{Rule: f.Rule, Severity: f.Severity.String(), Waived: f.Waived, Waiver: f.Waiver, File: f.File,
		Line: f.Line, Key: f.Path, WellID: f.WellID, Message: f.Message}
	if top, bottom, ok := f.Span(); ok {
		j.Top, j.Bottom, j.Unit = &top, &bottom, string(f.Units)
	}
	return json.Marshal(j)
}

// Blocking reports whether any finding is an unwaived error.
func Blocking(fs []Finding) bool {
	for _, f := range fs {
		if f.Blocking() {
			return true
		}
	}
	return false
}

// Tally is how many findings of each kind a check reports.
type Tally struct {
	Errors   int // unwaived errors
	Warnings int // unwaived warnings
	Waived   int // findings a waiver covers, whatever their severity
}

// Count tallies findings the way every report prints them.
func Count(fs []Finding) Tally {
	var t Tally
	for _, f := range fs {
		switch {
		case f.Waived:
			t.Waived++
		case f.Severity == Error:
			t.Errors++
		default:
			t.Warnings++
		}
	}
	return t
}
