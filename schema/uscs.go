package schema

import (
	"fmt"
	"strings"
)

// uscsGroups are the group symbols of ASTM D2487 (Unified Soil
// Classification System).
var uscsGroups = map[string]bool{
	"GW": true, "GP": true, "GM": true, "GC": true,
	"SW": true, "SP": true, "SM": true, "SC": true,
	"ML": true, "CL": true, "OL": true, "MH": true, "CH": true, "OH": true, "PT": true,
}

// uscsDual are the dual symbols ASTM D2487 assigns (Note 1 and the
// classification charts): coarse soils with 5 to 12 % fines (GW-GM,
// GW-GC, GP-GM, GP-GC, SW-SM, SW-SC, SP-SM, SP-SC), coarse soils whose
// fines plot in the hatched CL-ML band (GC-GM, SC-SM), and fine soils in
// that band (CL-ML). No other pair is a dual symbol; ML-CL, PT-GW, CH-SP
// are not.
var uscsDual = map[string]bool{
	"GW-GM": true, "GW-GC": true, "GP-GM": true, "GP-GC": true,
	"SW-SM": true, "SW-SC": true, "SP-SM": true, "SP-SC": true,
	"GC-GM": true, "SC-SM": true, "CL-ML": true,
}

// ValidUSCS accepts what ASTM D2487 writes: a group symbol (SP), one of
// its dual symbols (SP-SM, CL-ML), or a borderline symbol, two
// classifications separated by a slash with the one the standard gives
// first (CL/CH, GM/SM, SC/CL; D2487 Note 1).
func ValidUSCS(s string) bool { return USCSProblem(s) == "" }

// USCSProblem says why s is not an ASTM D2487 symbol, with a suggestion,
// or returns "".
func USCSProblem(s string) string {
	if s == "" {
		return "is empty"
	}
	if a, b, ok := strings.Cut(s, "/"); ok {
		if strings.Contains(b, "/") {
			return "is not an ASTM D2487 symbol: a borderline symbol joins two classifications with one slash, e.g. CL/CH"
		}
		for _, part := range []string{a, b} {
			if msg := uscsSingle(part); msg != "" {
				return fmt.Sprintf("is not an ASTM D2487 borderline symbol: %s %s", part, msg)
			}
			if part == "PT" {
				return "is not an ASTM D2487 borderline symbol: peat (PT) is identified by sight and smell, never as a borderline case"
			}
		}
		if a == b {
			return "is not an ASTM D2487 borderline symbol: its two sides must differ"
		}
		return ""
	}
	return uscsSingle(s)
}

// uscsSingle checks a group or dual symbol.
func uscsSingle(s string) string {
	if uscsGroups[s] || uscsDual[s] {
		return ""
	}
	a, b, ok := strings.Cut(s, "-")
	switch {
	case !ok && len(s) == 2:
		return "is not an ASTM D2487 group symbol (GW, GP, GM, GC, SW, SP, SM, SC, ML, CL, OL, MH, CH, OH, PT)"
	case !ok:
		return "is not an ASTM D2487 group symbol (e.g. SP, CL, SP-SM, CL/CH)"
	case !uscsGroups[a] || !uscsGroups[b] || strings.Contains(b, "-"):
		return "is not an ASTM D2487 dual symbol: a dual symbol joins two group symbols, e.g. SP-SM"
	case uscsDual[b+"-"+a]:
		return fmt.Sprintf("is not an ASTM D2487 dual symbol: did you mean %s-%s? (or, for a borderline case, %s/%s)", b, a, a, b)
	}
	return fmt.Sprintf("is not an ASTM D2487 dual symbol (GW-GM, GW-GC, GP-GM, GP-GC, SW-SM, SW-SC, SP-SM, SP-SC, GC-GM, SC-SM, CL-ML); for a soil near two groups write a borderline symbol with a slash, %s/%s", a, b)
}

// uscsPrimary is the first group of a symbol: SP of SP-SM, CL of CL/CH.
func uscsPrimary(s string) string {
	if i := strings.IndexAny(s, "-/"); i >= 0 {
		return s[:i]
	}
	return s
}

// FineGrained reports whether a layer is a silt, clay or organic soil
// (ASTM D2487: 50 % or more passes the No. 200 sieve), judged on the
// primary symbol.
func (l Layer) FineGrained() bool {
	if l.USCS == "" {
		return false
	}
	switch uscsPrimary(l.USCS) {
	case "ML", "CL", "OL", "MH", "CH", "OH", "PT":
		return true
	}
	return false
}
