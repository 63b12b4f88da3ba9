// Package demo holds tremie's invented demo project: the Coldwater Mill
// site of the fictional Brennick Valley Water Authority. Every name, place,
// person and licence number in it is made up.
package demo

import "embed"

// FS holds project.toml, wells/*.toml and the wall images the wells
// name (wells/*.png, made by wallimage.DemoImages; a test keeps them so).
//
//go:embed project.toml wells/*.toml wells/*.png
var FS embed.FS
