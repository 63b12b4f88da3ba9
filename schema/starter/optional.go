package starter

import (
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// Optional tables a kind of well may record, written commented out at the
// end of its starter: formation sieve analyses where a pack is designed,
// a pumping test for a supply well, the wall's features and the azimuth
// reference for a well with an open hole in rock. Every line of the
// section begins with "#": a line of TOML with "# ", its explanation with
// "##", so that deleting the first "#" of each line of a block turns it
// into TOML with its explanation still a comment (TestOptionalTables).

// OptionalMark begins the optional section of a starter: its first line
// is "## " and the mark.
const OptionalMark = "Optional tables"

// optionalKinds gives each kind's optional tables.
var optionalKinds = map[string]func(Options) []part{
	"monitoring": func(Options) []part { return []part{samplePart(30, 9.1)} },
	"planned":    func(Options) []part { return []part{samplePart(30, 9.1)} },
	"nested":     func(Options) []part { return []part{samplePart(35, 10.7), samplePart(75, 22.9)} },
	"supply": func(Options) []part {
		return []part{samplePart(95, 28.5), pumpingTestPart(45, 13.7, 62, 18.9, 60, 3.8)}
	},
	"rock": func(Options) []part {
		return []part{
			{path: "orientation", note: "The azimuth reference of the feature picks below.", vals: []value{
				same("north", "magnetic", keep), same("declination", 13.5, keep)}},
			{path: "feature", array: true, note: "A feature of the open-hole wall, here given by its dip and dip direction; it may be given by picks on a [[wall_image]] instead (schema/FORMAT.md).", vals: []value{
				same("kind", "water-bearing-fracture", keep), per("depth", 97.0, 29.6, keep), same("dip", 35.0, keep), same("dip_direction", 128.0, keep),
				per("inflow", 4.5, 17.0, keep), same("confidence", "medium", keep)}},
			pumpingTestPart(40, 12.2, 95, 29.0, 8, 0.5),
		}
	},
}

func samplePart(ft, m float64) part {
	return part{path: "sample", array: true, note: "A sieve analysis of the formation in the screened zone (ASTM D6913), for designing the filter pack: with the pack's d30 on its [[fill]], rule PACK-FORMATION-RATIO compares them.", vals: []value{
		per("depth", ft, m, keep), same("d10", 0.12, keep), same("d30", 0.2, keep), same("d60", 0.3, keep), same("note", "laboratory report no.", keep)}}
}

func pumpingTestPart(staticFt, staticM, pumpingFt, pumpingM, rateGPM, rateLS float64) part {
	return part{path: "pumping_test", note: "The pumping test; with open_area on every screen, tremie quantities works out the entrance velocity and rule ENTRANCE-VELOCITY checks it.", vals: []value{
		per("rate", rateGPM, rateLS, keep), same("duration", 24.0, keep),
		per("static_level", staticFt, staticM, keep), per("pumping_level", pumpingFt, pumpingM, keep)}}
}

// writeOptional writes a kind's optional tables, commented out.
func writeOptional(b *strings.Builder, parts []part, u schema.DepthUnit) {
	if len(parts) == 0 {
		return
	}
	b.WriteString("\n")
	wrapWith(b, "##", OptionalMark+" this kind of well may record. To use one, delete the first \"#\" of each of its lines and write the recorded values; the reference is schema/FORMAT.md.")
	for _, p := range parts {
		writeTable(b, p, u, true)
	}
}

// optionalNames lists a kind's optional tables: "[[sample]], [pumping_test]".
func optionalNames(o Options) string {
	var names []string
	seen := map[string]bool{}
	for _, p := range optionalKinds[o.Kind](o) {
		n := "[" + p.path + "]"
		if p.array {
			n = "[[" + p.path + "]]"
		}
		if !seen[n] {
			seen[n] = true
			names = append(names, n)
		}
	}
	return strings.Join(names, ", ")
}
