package schema

import (
	"sort"
	"strings"
)

// RockKind groups the rock names of the lithology table.
type RockKind string

const (
	Igneous     RockKind = "igneous"
	Metamorphic RockKind = "metamorphic"
	Clastic     RockKind = "sedimentary (clastic)"
	Carbonate   RockKind = "sedimentary (carbonate or evaporite)"
	Residual    RockKind = "residual (weathered in place)"
	MadeGround  RockKind = "made ground"
	Unspecified RockKind = "rock, type not given"
)

// RockNames is the finite list of rock names a lithology layer's `rock`
// key takes (documented in FORMAT.md). Residual materials and made ground
// count as unconsolidated.
var RockNames = map[string]RockKind{
	"granite": Igneous, "granodiorite": Igneous, "diorite": Igneous, "gabbro": Igneous, "syenite": Igneous,
	"pegmatite": Igneous, "basalt": Igneous, "andesite": Igneous, "rhyolite": Igneous, "dacite": Igneous,
	"diabase": Igneous, "dolerite": Igneous, "tuff": Igneous, "volcanic breccia": Igneous,
	"gneiss": Metamorphic, "schist": Metamorphic, "quartzite": Metamorphic, "marble": Metamorphic, "slate": Metamorphic,
	"phyllite": Metamorphic, "amphibolite": Metamorphic, "migmatite": Metamorphic, "greenstone": Metamorphic,
	"hornfels": Metamorphic, "serpentinite": Metamorphic, "argillite": Metamorphic,
	"sandstone": Clastic, "siltstone": Clastic, "mudstone": Clastic, "claystone": Clastic, "shale": Clastic,
	"conglomerate": Clastic, "breccia": Clastic, "greywacke": Clastic, "graywacke": Clastic, "arkose": Clastic,
	"limestone": Carbonate, "dolomite": Carbonate, "dolostone": Carbonate, "chalk": Carbonate, "travertine": Carbonate,
	"coquina": Carbonate, "gypsum": Carbonate, "anhydrite": Carbonate, "halite": Carbonate, "coal": Carbonate,
	"saprolite": Residual, "residual soil": Residual, "residuum": Residual, "grus": Residual,
	"fill": MadeGround, "made ground": MadeGround,
	"bedrock": Unspecified,
}

// Weathering is a weathering grade of rock mass, after ISRM (1981),
// Suggested Methods for the Description of Discontinuities in Rock Masses,
// and BS 5930:1999 §44.4.4 (the same six grades, I to VI).
type Weathering string

const (
	Fresh                Weathering = "fresh"                // I: no visible sign of weathering
	SlightlyWeathered    Weathering = "slightly-weathered"   // II: discoloration on discontinuities
	ModeratelyWeathered  Weathering = "moderately-weathered" // III: less than half decomposed to soil
	HighlyWeathered      Weathering = "highly-weathered"     // IV: more than half decomposed to soil
	CompletelyWeathered  Weathering = "completely-weathered" // V: all decomposed to soil, mass structure intact
	ResidualSoil         Weathering = "residual-soil"        // VI: all converted to soil, structure destroyed
	WeatheredUngraded    Weathering = "weathered"            // "weathered" written without a grade
	weatheringGradeCount            = 6
)

// WeatheringGrades lists the grades in order, I to VI, as the file writes
// them; the Roman numerals are accepted too.
var WeatheringGrades = []Weathering{Fresh, SlightlyWeathered, ModeratelyWeathered, HighlyWeathered, CompletelyWeathered, ResidualSoil}

var romanGrades = map[string]Weathering{"I": Fresh, "II": SlightlyWeathered, "III": ModeratelyWeathered, "IV": HighlyWeathered, "V": CompletelyWeathered, "VI": ResidualSoil}

// ParseWeathering reads a grade ("highly-weathered", "highly weathered",
// "IV"), or false.
func ParseWeathering(s string) (Weathering, bool) {
	t := strings.TrimSpace(s)
	if g, ok := romanGrades[strings.ToUpper(t)]; ok {
		return g, true
	}
	t = strings.ReplaceAll(strings.ToLower(t), " ", "-")
	for _, g := range WeatheringGrades {
		if string(g) == t {
			return g, true
		}
	}
	return "", false
}

// Soil reports whether a grade leaves the rock mostly soil: IV to VI, where
// more than half of the rock material is decomposed or disintegrated to a
// soil (ISRM 1981; BS 5930), and "weathered" without a grade, taken at its
// worst.
func (g Weathering) Soil() bool {
	switch g {
	case HighlyWeathered, CompletelyWeathered, ResidualSoil, WeatheredUngraded:
		return true
	}
	return false
}

// weatheringWords are written qualifiers of a rock name, longest first.
var weatheringWords = []struct {
	word  string
	grade Weathering
}{
	{"completely weathered ", CompletelyWeathered}, {"highly weathered ", HighlyWeathered},
	{"moderately weathered ", ModeratelyWeathered}, {"slightly weathered ", SlightlyWeathered},
	{"decomposed ", CompletelyWeathered}, {"weathered ", WeatheredUngraded}, {"fresh ", Fresh},
}

// ParseRock splits a `rock` value into its weathering qualifier and rock
// name ("highly weathered granite" -> granite, highly-weathered), and
// reports whether the name is one of RockNames.
func ParseRock(s string) (name string, grade Weathering, known bool) {
	t := strings.Join(strings.Fields(strings.ToLower(s)), " ")
	for _, w := range weatheringWords {
		if rest, ok := strings.CutPrefix(t, w.word); ok {
			t, grade = rest, w.grade
			break
		}
	}
	_, known = RockNames[t]
	return t, grade, known
}

// SuggestRock proposes the listed name nearest to an unknown one: a listed
// name the text contains ("Biotite GNEISS, fractured" -> gneiss), else the
// one fewest edits away, if close.
func SuggestRock(s string) string {
	t := strings.ToLower(s)
	best, bestLen := "", 0
	for _, n := range sortedRockNames() {
		if strings.Contains(t, n) && len(n) > bestLen {
			best, bestLen = n, len(n)
		}
	}
	if best != "" {
		return best
	}
	name, _, _ := ParseRock(s)
	bestD := len(name)/3 + 1
	for _, n := range sortedRockNames() {
		if d := slipDistance(name, n); d < bestD {
			best, bestD = n, d
		}
	}
	return best
}

// sortedRockNames is RockNames' keys in order, for repeatable answers.
func sortedRockNames() []string {
	out := make([]string, 0, len(RockNames))
	for n := range RockNames {
		out = append(out, n)
	}
	sort.Strings(out)
	return out
}

// RockGrade is the layer's weathering grade: its weathering key, else the
// qualifier written in its rock name, else "" (not given).
func (l Layer) RockGrade() Weathering {
	if l.Weathering != "" {
		return l.Weathering
	}
	_, g, _ := ParseRock(l.Rock)
	return g
}

// Unconsolidated reports whether the layer behaves as soil: a USCS soil,
// made ground, a residual material (saprolite, residual soil), or rock
// weathered to grade IV or worse (ISRM 1981; BS 5930), or written as
// "weathered" with no grade.
func (l Layer) Unconsolidated() bool {
	if l.USCS != "" {
		return true
	}
	name, _, _ := ParseRock(l.Rock)
	switch RockNames[name] {
	case Residual, MadeGround:
		return true
	}
	return l.RockGrade().Soil()
}

// Material names what the layer is, for messages: "SP-SM",
// "granite (highly-weathered)", "saprolite".
func (l Layer) Material() string {
	if l.USCS != "" {
		return l.USCS
	}
	name, _, _ := ParseRock(l.Rock)
	if g := l.RockGrade(); g != "" {
		return name + " (" + string(g) + ")"
	}
	return name
}
