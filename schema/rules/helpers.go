package rules

// Shared reporting helpers for the rules (any rule file may use them):
//
//   p.capped(sev)       the rule's severity in force, but no worse than sev
//   p.Dia(d)            a diameter in the well's diameter unit
//   p.span(iv)          an interval in the well's depth unit
//   depths(iv)          an interval as a finding's Depths
//   material(m)         "bentonite chips" for schema.BentoniteChips
//   annulusLabel(name)  "the borehole annulus" / `the annulus inside casing "surface"`
//   key(path, k)        path + "." + k
//   p.level(d)          "15 ft below ground" / "3 ft above ground"

import (
	"fmt"

	"github.com/tremie-dev/tremie/schema"
)

// capped returns the severity in force for the rule, lowered to sev when
// that is milder: a rule that errs in one case and only warns in another
// still honours a profile that turned it down to a warning.
func (p *Pass) capped(sev Severity) Severity {
	s := p.profile.severityFor(p.Rule, p.Well.Purpose)
	if sev < s {
		return sev
	}
	return s
}

// Dia formats a diameter in the well's diameter unit.
func (p *Pass) Dia(d schema.Diameter) string { return p.Well.Units.FormatDiameter(d) }

// span formats an interval in the well's depth unit.
func (p *Pass) span(iv schema.Interval) string { return p.Iv(iv.Top, iv.Bottom) }

// depths is an interval as a finding's Depths, top first.
func depths(iv schema.Interval) []schema.Length { return []schema.Length{iv.Top, iv.Bottom} }

// material names a fill class for messages.
func material(m schema.Material) string { return m.Words() }

// annulusLabel names an annulus for messages.
func annulusLabel(name string) string {
	if name == boreholeAnnulus {
		return "the borehole annulus"
	}
	return fmt.Sprintf("the annulus inside casing %q", name)
}

// key joins a table path and a key.
func key(path, k string) string { return path + "." + k }

// fillLabel is "bentonite grout at 2–10 ft".
func (p *Pass) fillLabel(f *schema.Fill) string {
	return material(f.Material) + " at " + p.span(f.Interval)
}

// pct formats a fraction as a whole percentage.
func pct(f float64) string { return fmt.Sprintf("%.0f %%", f*100) }

// level writes a depth as below or above ground, for heights that may be
// negative (riser tops, water levels).
func (p *Pass) level(d schema.Length) string {
	if d < 0 {
		return p.D(-d) + " above ground"
	}
	return p.D(d) + " below ground"
}
