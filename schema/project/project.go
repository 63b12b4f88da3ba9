// Package project reads a project's project.toml: the settings shared by
// every well of one site (names, units, page template, rule profile,
// title-block fields, logo, where the wells are and where outputs go).
// It knows nothing of rules, layout or files other than its own and the
// logo it names.
package project

import (
	"os"
	"path/filepath"

	"github.com/tremie-dev/tremie/schema"
)

// FileName is the project file at a project's root.
const FileName = "project.toml"

// Defaults for keys the project file leaves out.
const (
	DefaultWells  = "wells"
	DefaultOutput = "out"
)

// Project is one project file, resolved: paths are joined to Dir.
type Project struct {
	Dir  string // the project's root directory
	File string // path of project.toml

	Name   string
	Client string
	Site   string

	// Units is the depth unit of project-wide tables (the construction
	// summary and the book). "" means: the unit every well shares, or
	// metres when they differ.
	Units schema.DepthUnit

	// Datum, CoordinateSystem and CRS fill a well's elevation datum,
	// location system and EPSG code when the well leaves them blank.
	Datum            string
	CoordinateSystem string
	CRS              string // an EPSG code, "EPSG:2227"; checked by package crs

	// Orientation is the azimuth reference of wall features for wells
	// whose file gives no [orientation]; North is "" when not set.
	Orientation schema.Orientation

	Page      string // page template name, "" for the default
	Landscape bool

	Profile string // path of the rule profile, "" for the defaults
	Yields  string // path of a [yields] table file, "" for the default yields

	TitleBlock TitleBlock
	// Issue asks for the issued set rather than the draft (issue = true).
	Issue bool

	LogoPath string // "" when none
	Logo     *Logo  // nil when none

	// Sections are the cross-sections the file defines, in file order.
	Sections []Section

	Wells  string // glob or directory of well files, as written
	Output string // output directory, resolved

	// Keys maps each key path written in the file (e.g. "project.name")
	// to its line, for messages that name a setting.
	Keys map[string]int
}

// TitleBlock holds the title-block fields printed on every sheet.
type TitleBlock struct {
	Consultant   string
	PreparedBy   string
	CheckedBy    string // also the default of a well's checked_by
	ApprovedBy   string
	ReportNumber string
	JobNumber    string
	Revision     string
	Issued       schema.Date // issue date of the set of sheets
	// Revisions is the revision history an issued set prints, oldest
	// first ([[revision]] in the project file).
	Revisions []Revision
}

// Revision is one row of an issued set's revision block.
type Revision struct {
	Rev         string
	Date        schema.Date
	Description string
	By          string
}

// Logo is a checked logo image.
type Logo struct {
	Data          []byte
	Format        string // "png" or "jpeg"
	Width, Height int    // pixels
}

// Path joins a project-relative path to the project directory; absolute
// paths are kept.
func (p *Project) Path(rel string) string {
	if rel == "" || filepath.IsAbs(rel) {
		return rel
	}
	return filepath.Join(p.Dir, rel)
}

// ProfilePath is the rule profile's path, or "" for the defaults.
func (p *Project) ProfilePath() string { return p.Path(p.Profile) }

// YieldsPath is the yields file's path, or "" for the default yields.
func (p *Project) YieldsPath() string { return p.Path(p.Yields) }

// Default returns the project a directory without project.toml gets:
// every default in force, the wells in its wells/ folder or, when it has
// none, in the directory itself.
func Default(dir string) *Project {
	wells := DefaultWells
	if st, err := os.Stat(filepath.Join(dir, DefaultWells)); err != nil || !st.IsDir() {
		wells = "."
	}
	return &Project{Dir: dir, Wells: wells, Output: filepath.Join(dir, DefaultOutput), Keys: map[string]int{}}
}
