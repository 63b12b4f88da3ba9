package rules

import (
	"fmt"
	"path/filepath"
)

// cautionBase is the part of the caution every report carries.
const cautionBase = "Figures and checks support, and never replace, the review of a licensed professional and the governing local well code"

// Caution is the caution for a sheet, book or table footer, true to the
// thresholds in force: the defaults (prof nil or the default profile), or
// the named profile with its file and the code it follows.
func Caution(prof *Profile) string {
	return cautionBase + "; " + prof.ThresholdNote() + "."
}

// PlainCaution is the caution without the thresholds note, for a page
// whose wells each name their own thresholds.
func PlainCaution() string { return cautionBase + "." }

// ThresholdNote says which thresholds were in force, for reports:
// "rule thresholds are defaults to be set to the local rules" or
// `rule thresholds from profile "County code" (county.profile.toml),
// following County Code ch. 9`.
func (p *Profile) ThresholdNote() string {
	if p.IsDefault() {
		return "rule thresholds are defaults to be set to the local rules"
	}
	s := fmt.Sprintf("rule thresholds from profile %q", p.Name)
	if p.File != "" {
		s += " (" + filepath.Base(p.File) + ")" // the base name: no machine's paths on a sheet
	}
	if p.Source != "" {
		s += ", following " + p.Source
	}
	return s
}

// IsDefault reports whether the profile is the built-in defaults (nil, or
// no file and nothing set).
func (p *Profile) IsDefault() bool {
	return p == nil || (p.File == "" && len(p.Values) == 0 && len(p.Severities) == 0 && len(p.Off) == 0 && len(p.ByPurpose) == 0)
}
