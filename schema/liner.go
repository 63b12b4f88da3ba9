package schema

import "strings"

// Liner says how a well string hangs inside an outer casing: the string's
// top lies within the casing named HungIn, and the overlap down to that
// casing's bottom is the lap.
type Liner struct {
	HungIn  string     // the name of the casing the liner hangs in
	Hanger  HangerKind // what holds it there
	Product string     // the hanger's or packer's make or description, as written
	// LapSeal is the material that seals the lap annulus between the
	// liner and the casing, "" when none is recorded (a packer seals it
	// by itself).
	LapSeal Material
}

// HangerKind is what holds a liner at its top.
type HangerKind string

const (
	// Packer seals the lap annulus as well as holding the liner.
	Packer HangerKind = "packer"
	// Hanger holds the liner without sealing the lap.
	Hanger HangerKind = "hanger"
)

// LapSealed reports whether the lap annulus is closed: by a packer or by a
// recorded lap seal.
func (l *Liner) LapSealed() bool { return l != nil && (l.Hanger == Packer || l.LapSeal != "") }

// Lap is the interval over which a liner overlaps the casing it hangs in,
// from the liner's top to the casing's bottom (or the liner's bottom, if
// higher); false for a string that is not a liner or whose casing is
// unknown.
func (w *Well) Lap(s String) (Interval, bool) {
	if s.Liner == nil || len(s.Sections) == 0 {
		return Interval{}, false
	}
	for _, c := range w.Casings {
		if c.Name == s.Liner.HungIn {
			iv := Interval{Top: s.Top(), Bottom: min(c.Bottom, s.Bottom())}
			return iv, iv.Bottom > iv.Top
		}
	}
	return Interval{}, false
}

// MeasuringPoint names the point water levels are measured from: the top
// of one pipe (Pipe, a casing or string name), or a height above ground
// (Height; negative below). With neither, StickUp infers it.
type MeasuringPoint struct {
	Pipe        string
	Height      *Length
	Description string // e.g. "top of pump base plate, north side"
	Pos         Pos
}

// Given reports whether the file named the measuring point.
func (m MeasuringPoint) Given() bool { return m.Pipe != "" || m.Height != nil }

// Pump is the pump's setting in a supply well.
type Pump struct {
	Intake      Length // depth of the pump intake below ground
	Description string // e.g. "7.5 hp submersible, 6-in bowls"
	Pos         Pos
}

// PipeTop returns the top of the casing or string named name.
func (w *Well) PipeTop(name string) (Length, bool) {
	for _, c := range w.Casings {
		if c.Name == name {
			return c.Top, true
		}
	}
	for _, s := range w.Strings {
		if s.Name == name && len(s.Sections) > 0 {
			return s.Top(), true
		}
	}
	return 0, false
}

// MeasuringPointLabel describes the measuring point in words for a sheet
// or a report: the file's description, else the pipe whose top it is.
func (w *Well) MeasuringPointLabel() string {
	m := w.MeasuringPoint
	switch {
	case m.Description != "":
		return m.Description
	case m.Pipe != "":
		for _, c := range w.Casings {
			if c.Name == m.Pipe {
				return "top of " + c.Called()
			}
		}
		return "top of " + m.Pipe + " string"
	case m.Height != nil:
		return "measuring point"
	}
	return "top of riser"
}

// Called names the casing in a sentence: "production casing", or its
// name alone when the name already says casing ("well casing").
func (c Casing) Called() string {
	if strings.Contains(strings.ToLower(c.Label()), "casing") {
		return c.Label()
	}
	return c.Label() + " casing"
}
