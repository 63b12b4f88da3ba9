package symbols

import (
	"strings"

	"github.com/tremie-dev/tremie/schema"
)

// ForMaterial returns the symbol of an annular fill material; a material
// the table does not know gets a plain "not recognised" symbol.
func ForMaterial(m schema.Material) Symbol {
	if s, ok := byID["fill:"+string(m)]; ok && s.Kind == Material {
		return s
	}
	return unknownMaterial
}

// ForLayer returns the symbol of a lithology interval: its ASTM D2487
// group (a dual group such as SP-SM gets banded patterns of both; a
// borderline "CL/ML" is read the same way), else its rock type by the
// words in rockWords, else the unclassified symbol.
func ForLayer(l schema.Layer) Symbol {
	if l.USCS != "" {
		if s, ok := ForUSCS(l.USCS); ok {
			return s
		}
		return unclassifiedRow
	}
	if l.Weathering.Soil() {
		return byID["rock:weathered"] // graded IV to VI: drawn as weathered rock whatever its name
	}
	return ForRock(l.Rock)
}

// ForUSCS returns the symbol of an ASTM D2487 group or dual group symbol.
func ForUSCS(code string) (Symbol, bool) {
	code = strings.ToUpper(strings.TrimSpace(code))
	parts := strings.FieldsFunc(code, func(r rune) bool { return r == '-' || r == '/' })
	switch len(parts) {
	case 1:
		s, ok := byID["soil:"+parts[0]]
		return s, ok
	case 2:
		a, okA := byID["soil:"+parts[0]]
		b, okB := byID["soil:"+parts[1]]
		if !okA || !okB || a.ID == b.ID {
			return Symbol{}, false
		}
		return dual(a, b), true
	}
	return Symbol{}, false
}

// rockWords maps words in a rock description to a rock class, checked in
// order: "weathered shale" is weathered rock before it is shale.
var rockWords = []struct {
	id    string
	words []string
}{
	{"rock:weathered", []string{"weathered", "saprolite", "residuum", "decomposed", "grus"}},
	{"rock:fill", []string{"fill", "made ground", "rubble"}},
	{"rock:limestone", []string{"limestone", "dolomite", "dolostone", "chalk", "marble", "karst", "travertine", "coquina"}},
	{"rock:shale", []string{"shale", "mudstone", "siltstone", "claystone", "argillite", "slate"}},
	{"rock:sandstone", []string{"sandstone", "conglomerate", "breccia", "greywacke", "graywacke", "arkose"}},
	{"rock:crystalline", []string{"granite", "granodiorite", "diorite", "gabbro", "basalt", "andesite", "rhyolite", "dacite", "diabase", "dolerite",
		"gneiss", "schist", "quartzite", "amphibolite", "igneous", "metamorphic", "crystalline", "volcanic", "tuff", "greenstone", "pegmatite", "syenite", "migmatite"}},
}

// ForRock returns the symbol of a rock type written as free text.
func ForRock(rock string) Symbol {
	r := strings.ToLower(rock)
	for _, c := range rockWords {
		for _, w := range c.words {
			if strings.Contains(r, w) {
				return byID[c.id]
			}
		}
	}
	return unclassifiedRow
}

// Part returns the symbol of a well part by its ID (the "part:" entries of
// All); ok is false for an unknown ID.
func Part(id string) (Symbol, bool) {
	s, ok := byID[id]
	return s, ok && s.Kind == WellPart
}

// Well-part IDs, for callers that draw them.
const (
	Casing        = "part:casing"
	ScreenSlotted = "part:screen-slotted"
	ScreenWrap    = "part:screen-wrap"
	OpenHole      = "part:open-hole"
	WaterLevel    = "part:water-level"
	FirstWater    = "part:water-first"
	Centralizer   = "part:centralizer"
	Cap           = "part:cap"
	Packer        = "part:packer"
	Hanger        = "part:hanger"
	DriveShoe     = "part:drive-shoe"
	Pump          = "part:pump"
	Tag           = "part:tag"
)

// MustPart is Part for the IDs above, which always exist.
func MustPart(id string) Symbol {
	s, ok := Part(id)
	if !ok {
		panic("symbols: no part " + id)
	}
	return s
}

// All lists every symbol of the table in legend order: soils, rocks and
// the unclassified fallback, materials and their fallback, well parts.
// Dual soils are made on demand and not listed.
func All() []Symbol {
	var out []Symbol
	out = append(out, soilSymbols...)
	out = append(out, rockSymbols...)
	out = append(out, materialSymbols...)
	out = append(out, unknownMaterial)
	return append(out, partSymbols...)
}

// ByID returns a symbol by its ID, including dual soils ("soil:SP-SM").
func ByID(id string) (Symbol, bool) {
	if s, ok := byID[id]; ok {
		return s, true
	}
	if code, ok := strings.CutPrefix(id, "soil:"); ok {
		return ForUSCS(code)
	}
	return Symbol{}, false
}
