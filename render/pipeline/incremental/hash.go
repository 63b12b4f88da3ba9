// Package incremental remembers, in a project's output directory, a
// content hash of everything each well's outputs were drawn from, so that
// a re-run draws only what changed. It compares bytes, not times: saving
// a file without changing it redraws nothing, and a changed setting,
// profile, template, logo or tool version redraws every well.
package incremental

import (
	"crypto/sha256"
	"encoding/binary"
	"encoding/hex"
	"hash"
)

// Base is the digest of every input a run's wells share. Build it once
// per run with NewBase, then hash each well with Well.
type Base struct{ sum [sha256.Size]byte }

// Shared lists what every well of a run depends on besides its own file.
type Shared struct {
	Version  string   // the tool version
	Settings []byte   // project.Project.Settings()
	Profile  []byte   // the rule profile's bytes, nil for the defaults
	Template []byte   // the page template's bytes or name
	Logo     []byte   // the logo's bytes, nil for none
	Options  []string // command options that change outputs (formats, dpi, ...)
}

// NewBase digests the shared inputs.
func NewBase(s Shared) Base {
	h := sha256.New()
	field(h, "version", []byte(s.Version))
	field(h, "settings", s.Settings)
	field(h, "profile", s.Profile)
	field(h, "template", s.Template)
	field(h, "logo", s.Logo)
	for _, o := range s.Options {
		field(h, "option", []byte(o))
	}
	var b Base
	h.Sum(b.sum[:0])
	return b
}

// Well is the hash of one well: its file's bytes under the shared inputs.
func (b Base) Well(file []byte) string {
	h := sha256.New()
	h.Write(b.sum[:])
	field(h, "well", file)
	return hex.EncodeToString(h.Sum(nil))
}

// field writes a labelled, length-prefixed value, so that no two
// different sets of inputs run together into the same bytes.
func field(h hash.Hash, label string, v []byte) {
	var n [8]byte
	binary.BigEndian.PutUint64(n[:], uint64(len(label)))
	h.Write(n[:])
	h.Write([]byte(label))
	binary.BigEndian.PutUint64(n[:], uint64(len(v)))
	h.Write(n[:])
	h.Write(v)
}
