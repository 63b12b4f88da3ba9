package rules

import "github.com/tremie-dev/tremie/schema"

// Shared by the FEATURE-* rules.

// featureKey is the key path whose line names a feature's depth: its
// depth key if written, else the picks, else the table.
func featureKey(w *schema.Well, f *schema.Feature) string {
	for _, k := range []string{"depth", "trace_high", "points"} {
		if w.HasKey(key(f.Path, k)) {
			return key(f.Path, k)
		}
	}
	return f.Path
}

// featureName is how messages name a feature: "water-bearing fracture at 97 ft".
func (p *Pass) featureName(f *schema.Feature) string {
	return f.Kind.Label() + " at " + p.D(f.Depth)
}
