// Package rules checks a schema.Well against rules of practice. Each rule
// is a small named unit (ID, doc, default severity, the source of its
// threshold, a run function), modelled on golang.org/x/tools/go/analysis;
// a finding is data, not a printed string.
package rules

import (
	"fmt"
	"sort"
	"sync"

	"github.com/tremie-dev/tremie/schema"
)

// Severity ranks a finding.
type Severity int

const (
	Warning Severity = iota + 1
	Error
)

func (s Severity) String() string {
	switch s {
	case Error:
		return "error"
	case Warning:
		return "warning"
	}
	return "unknown"
}

// Rule is one check of practice.
type Rule struct {
	ID       string   // ours, upper-case with hyphens, e.g. "SEAL-ABOVE-PACK"
	Title    string   // a short phrase for tables
	Doc      string   // one paragraph: what it checks and why
	Severity Severity // default severity
	Source   string   // where its threshold or requirement comes from
	Params   []Param  // thresholds a profile may set
	// Reconcile marks a rule that compares what was placed (amounts,
	// tags) with the calculated quantities, or whose finding makes those
	// quantities wrong (a unit slip): the quantities report runs these
	// rules alone, with the project's yields.
	Reconcile bool
	Run       func(*Pass)
	// Purposes are the well purposes the rule applies to by default; nil
	// for every well. A well whose purpose is not given is always checked.
	Purposes []schema.Purpose
}

// ParamKind says how a parameter is written in a profile.
type ParamKind int

const (
	LengthParam   ParamKind = iota // a depth or thickness, profile depth units
	DiameterParam                  // a diameter, profile diameter units
	RatioParam                     // a plain number (ratio, fraction, count)
	VelocityParam                  // a velocity: ft/s in a ft profile, m/s in a m profile; model m/s
)

// Param is one threshold of a rule. Default is in model units (metres for
// a length, millimetres for a diameter); DefaultFt, when set, is the default
// used for wells written in feet, so that "2 ft / 0.6 m" stays round in both.
type Param struct {
	Name      string
	Kind      ParamKind
	Default   float64
	DefaultFt float64 // imperial default in feet or inches; 0 = convert Default
	Doc       string
	Source    string
	ByPurpose []PurposeDefault // defaults for some purposes, each with its source
	Fraction  bool             // a RatioParam from 0 to 1
	Fallback  string           // with Default 0: where no value applies, that of this other parameter
}

// Pass is what a rule's Run receives: the well, the thresholds in force and
// a way to report.
type Pass struct {
	Well    *schema.Well
	Rule    *Rule
	profile *Profile
	out     *[]Finding
	shared  *shared // derived data shared by the rules of one Check
}

// Param returns the value of the rule's named parameter in model units,
// from the profile or the default.
func (p *Pass) Param(name string) float64 {
	return p.profile.valueFor(p.Rule, name, p.Well.Units, p.Well.Purpose)
}

// Length returns a length parameter.
func (p *Pass) Length(name string) schema.Length { return schema.Length(p.Param(name)) }

// Profile returns the rule profile in force.
func (p *Pass) Profile() *Profile { return p.profile }

// Reportf records a finding at a key path of the well (e.g. "fill[2].top")
// naming the depths it concerns.
func (p *Pass) Reportf(path string, depths []schema.Length, format string, args ...any) {
	p.ReportSeverity(p.profile.severityFor(p.Rule, p.Well.Purpose), path, depths, format, args...)
}

// ReportSeverity is Reportf with an explicit severity, for rules that warn
// in one case and err in another.
func (p *Pass) ReportSeverity(sev Severity, path string, depths []schema.Length, format string, args ...any) {
	if p.profile.disabled(p.Rule) {
		return
	}
	f := Finding{
		Rule:     p.Rule.ID,
		Severity: sev,
		File:     p.Well.Pos.File,
		Line:     p.Well.Line(path),
		Path:     path,
		WellID:   p.Well.ID,
		Message:  fmt.Sprintf(format, args...),
		Depths:   depths,
		Units:    p.Well.Units.Depth,
	}
	*p.out = append(*p.out, f)
}

// D formats a depth in the well's units, for messages.
func (p *Pass) D(l schema.Length) string { return p.Well.Units.FormatDepth(l) }

// Iv formats an interval in the well's units, for messages.
func (p *Pass) Iv(top, bottom schema.Length) string { return p.Well.Units.FormatInterval(top, bottom) }

// registry holds every rule, in registration order.
var registry []*Rule

// register adds a rule; each rule file calls it from init.
func register(r *Rule) *Rule {
	registry = append(registry, r)
	return r
}

// All returns every rule sorted by ID, in a slice of the caller's own.
func All() []*Rule {
	return append([]*Rule(nil), sortedRules()...)
}

// sorted is every rule sorted by ID, kept for Check; rules register only
// from init.
var sorted struct {
	once  sync.Once
	rules []*Rule
}

// sortedRules returns every rule sorted by ID, sorted once.
func sortedRules() []*Rule {
	sorted.once.Do(func() {
		sorted.rules = append([]*Rule(nil), registry...)
		sort.Slice(sorted.rules, func(i, j int) bool { return sorted.rules[i].ID < sorted.rules[j].ID })
	})
	return sorted.rules
}

// Lookup finds a rule by ID.
func Lookup(id string) (*Rule, bool) {
	for _, r := range registry {
		if r.ID == id {
			return r, true
		}
	}
	return nil, false
}
