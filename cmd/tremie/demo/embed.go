// Package demo holds tremie's invented demo project: the Coldwater Mill
// site of the fictional Brennick Valley Water Authority. Every name, place,
// person and licence number in it is made up.
package demo

import "embed"

// FS holds project.toml and wells/*.toml.
//
//go:embed project.toml wells/*.toml
var FS embed.FS
