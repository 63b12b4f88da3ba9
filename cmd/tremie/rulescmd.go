package main

import (
	"fmt"
	"io"
	"slices"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

func init() {
	register(&command{
		name:    "rules",
		summary: "list the rules tremie check applies, with sources and default thresholds",
		run:     runRules,
		args:    "[RULE-ID...]",
	})
}

func runRules(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("rules", stdout, stderr)
	purpose := fset.String("purpose", "", "show the thresholds in force for wells of this `purpose` (monitoring, public-supply, ...)")
	ids, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	pu := schema.Purpose(*purpose)
	if pu != "" && !slices.Contains(schema.Purposes, pu) {
		return fset.usageError("unknown purpose %q (one of: %s)", *purpose, rules.PurposeList(schema.Purposes))
	}
	list := rules.All()
	if len(ids) > 0 {
		list = nil
		for _, id := range ids {
			r, ok := rules.Lookup(strings.ToUpper(id))
			if !ok {
				fmt.Fprintf(stderr, "tremie rules: no rule %q (tremie rules lists them)\n", id)
				return exitUsage
			}
			list = append(list, r)
		}
	}
	var b strings.Builder
	wrap(&b, "Rules of practice applied by tremie check. Thresholds are defaults, each with its source: "+
		"set them to the governing local well code in a profile (tremie check --profile FILE; see schema/rules/PROFILE.md).", "")
	wrap(&b, rules.Caution(nil), "")
	if pu != "" {
		wrap(&b, fmt.Sprintf("Thresholds for %s wells, each with its source.", pu), "")
	}
	for _, r := range list {
		if pu != "" {
			writeRuleFor(&b, r, pu)
			continue
		}
		writeRule(&b, r)
	}
	if _, err := io.WriteString(stdout, b.String()); err != nil {
		fmt.Fprintf(stderr, "tremie rules: %v\n", err)
		return exitOutput
	}
	return exitOK
}

func writeRule(b *strings.Builder, r *rules.Rule) {
	fmt.Fprintf(b, "\n%s  %s  %s\n", r.ID, r.Severity, r.Title)
	wrap(b, r.Doc, "    ")
	wrap(b, "source: "+r.Source, "    ")
	if len(r.Purposes) > 0 {
		wrap(b, "applies by default to "+rules.PurposeList(r.Purposes)+" wells, and to wells whose purpose is not given; "+
			"a profile may switch it on for other purposes", "    ")
	} else {
		wrap(b, "applies to wells of every purpose", "    ")
	}
	for _, p := range r.Params {
		def := paramDefault(p.Kind, p.Default, p.DefaultFt)
		if p.Default == 0 && p.Fallback != "" {
			def = "as " + p.Fallback
		} else if p.Default == 0 {
			def = "none"
		}
		wrap(b, fmt.Sprintf("%s = %s", p.Name, def), "    param ")
		wrap(b, p.Doc+"; source: "+p.Source, "          ")
		for _, d := range p.ByPurpose {
			wrap(b, fmt.Sprintf("%s: %s; source: %s", rules.PurposeList(d.Purposes), paramDefault(p.Kind, d.Default, d.DefaultFt), d.Source), "          for ")
		}
	}
}

// writeRuleFor writes a rule as it applies to wells of one purpose.
func writeRuleFor(b *strings.Builder, r *rules.Rule, pu schema.Purpose) {
	fmt.Fprintf(b, "\n%s  %s  %s\n", r.ID, r.Severity, r.Title)
	if !r.AppliesTo(pu) {
		wrap(b, "does not apply to "+string(pu)+" wells by default (it applies to "+rules.PurposeList(r.Purposes)+"); a profile may switch it on", "    ")
		return
	}
	wrap(b, "source: "+r.Source, "    ")
	for _, p := range r.Params {
		def, defFt, src := r.DefaultFor(p, pu)
		wrap(b, fmt.Sprintf("%s = %s; source: %s", p.Name, paramDefault(p.Kind, def, defFt), src), "    param ")
	}
}

// paramDefault writes a default as the two unit systems see it:
// "2 ft (wells in ft), 0.6 m (wells in m)".
func paramDefault(kind rules.ParamKind, def, defFt float64) string {
	switch kind {
	case rules.LengthParam:
		ft := defFt
		if ft == 0 {
			ft = schema.Length(def).Feet()
		}
		return fmt.Sprintf("%s ft (wells in ft), %s m (wells in m)", schema.TrimFloat(ft, 3), schema.TrimFloat(def, 3))
	case rules.DiameterParam:
		in := defFt
		if in == 0 {
			in = schema.Diameter(def).Inches()
		}
		return fmt.Sprintf("%s in (wells in ft), %s mm (wells in m)", schema.TrimFloat(in, 3), schema.TrimFloat(def, 1))
	case rules.VelocityParam:
		fts := defFt
		if fts == 0 {
			fts = def / schema.MetresPerFoot
		}
		return fmt.Sprintf("%s ft/s (wells in ft), %s m/s (wells in m)", schema.TrimFloat(fts, 3), schema.TrimFloat(def, 3))
	}
	return schema.TrimFloat(def, 3)
}

// wrap writes text in lines of at most 78 columns (an 80-column terminal
// with room to spare), the first prefixed with lead and the rest indented
// to match.
func wrap(b *strings.Builder, text, lead string) {
	indent := strings.Repeat(" ", len(lead))
	line := lead
	empty := true
	for _, word := range strings.Fields(text) {
		if !empty && len(line)+1+len(word) > 78 {
			b.WriteString(line + "\n")
			line, empty = indent, true
		}
		if !empty {
			line += " "
		}
		line += word
		empty = false
	}
	b.WriteString(line + "\n")
}
