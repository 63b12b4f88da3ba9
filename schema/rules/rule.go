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
	Run      func(*Pass)
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

// Finding is one thing a rule found in a well.
type Finding struct {
	Rule     string          `json:"rule"`
	Severity Severity        `json:"-"`
	Level    string          `json:"severity"` // "error" or "warning", from Severity
	Waived   bool            `json:"waived"`
	Waiver   *Waiver         `json:"waiver,omitempty"`
	File     string          `json:"file"`
	Line     int             `json:"line"`
	WellID   string          `json:"well"`
	Message  string          `json:"message"`
	Top      *float64        `json:"top,omitempty"`    // depth named, in file units
	Bottom   *float64        `json:"bottom,omitempty"` // depth named, in file units
	Unit     string          `json:"unit,omitempty"`
	Depths   []schema.Length `json:"-"`
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
		Level:    sev.String(),
		File:     p.Well.Pos.File,
		Line:     p.Well.Line(path),
		WellID:   p.Well.ID,
		Message:  fmt.Sprintf(format, args...),
		Depths:   depths,
		Unit:     string(p.Well.Units.Depth),
	}
	if len(depths) > 0 {
		t := depths[0].In(p.Well.Units.Depth)
		f.Top = &t
		b := depths[len(depths)-1].In(p.Well.Units.Depth)
		f.Bottom = &b
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

// All returns every rule sorted by ID.
func All() []*Rule {
	out := append([]*Rule(nil), registry...)
	sort.Slice(out, func(i, j int) bool { return out[i].ID < out[j].ID })
	return out
}

// sorted is All(), kept for Check; rules register only from init.
var sorted struct {
	once  sync.Once
	rules []*Rule
}

// sortedRules returns every rule sorted by ID, sorted once.
func sortedRules() []*Rule {
	sorted.once.Do(func() { sorted.rules = All() })
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

// Check runs every rule on a well with a profile (nil for the defaults),
// applies the well's waivers and returns the findings sorted by line, then
// rule. A panic in one rule is turned into an error finding for it, so that
// no input stops the check.
func Check(w *schema.Well, prof *Profile) []Finding {
	if prof == nil {
		prof = DefaultProfile()
	}
	var out []Finding
	sh := &shared{yields: prof.Yields}
	for _, r := range sortedRules() {
		runOne(r, w, prof, sh, &out)
	}
	applyWaivers(w, out)
	sort.SliceStable(out, func(i, j int) bool {
		if out[i].File != out[j].File {
			return out[i].File < out[j].File
		}
		if out[i].Line != out[j].Line {
			return out[i].Line < out[j].Line
		}
		return out[i].Rule < out[j].Rule
	})
	return out
}

func runOne(r *Rule, w *schema.Well, prof *Profile, sh *shared, out *[]Finding) {
	defer func() {
		if e := recover(); e != nil {
			*out = append(*out, Finding{Rule: r.ID, Severity: Error, Level: "error", File: w.Pos.File, Line: 1, WellID: w.ID,
				Message: fmt.Sprintf("internal error in rule %s: %v (please report)", r.ID, e)})
		}
	}()
	if !prof.applies(r, w.Purpose) {
		return
	}
	r.Run(&Pass{Well: w, Rule: r, profile: prof, out: out, shared: sh})
}

func applyWaivers(w *schema.Well, fs []Finding) {
	for i := range fs {
		for _, wv := range w.Waivers {
			if wv.Rule == fs[i].Rule {
				fs[i].Waived = true
				fs[i].Waiver = &Waiver{Reason: wv.Reason, ApprovedBy: wv.ApprovedBy, Date: wv.Date.String()}
				break
			}
		}
	}
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
