package schema

import "strings"

// uscsGroups are the group symbols of ASTM D2487 (Unified Soil
// Classification System).
var uscsGroups = map[string]bool{
	"GW": true, "GP": true, "GM": true, "GC": true,
	"SW": true, "SP": true, "SM": true, "SC": true,
	"ML": true, "CL": true, "OL": true, "MH": true, "CH": true, "OH": true, "PT": true,
}

// ValidUSCS accepts a group symbol or a dual symbol of two (SP-SM, CL-ML,
// GW-GC) as ASTM D2487 allows.
func ValidUSCS(s string) bool {
	parts := strings.Split(s, "-")
	if len(parts) > 2 {
		return false
	}
	for _, p := range parts {
		if !uscsGroups[p] {
			return false
		}
	}
	return len(parts) == 1 || parts[0] != parts[1]
}

// FineGrained reports whether a layer is a silt, clay or organic soil
// (ASTM D2487: 50 % or more passes the No. 200 sieve), judged on the
// primary symbol.
func (l Layer) FineGrained() bool {
	if l.USCS == "" {
		return false
	}
	p := strings.Split(l.USCS, "-")[0]
	switch p {
	case "ML", "CL", "OL", "MH", "CH", "OH", "PT":
		return true
	}
	return false
}

// Unconsolidated reports whether the layer is soil rather than rock.
func (l Layer) Unconsolidated() bool { return l.USCS != "" }
