package project

import "github.com/tremie-dev/tremie/schema"

// keyLines maps every table header and key of a project file to its line,
// for messages about keys the decoder accepted but we reject. It is the
// well loader's scanner (schema.KeyPositions), so every TOML file tremie
// reads names lines the same way.
func keyLines(data []byte) map[string]int {
	pos := schema.KeyPositions(string(data))
	out := make(map[string]int, len(pos))
	for k, p := range pos {
		out[k] = p.Line
	}
	return out
}
