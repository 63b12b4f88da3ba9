package out

import (
	"encoding/binary"
	"errors"
)

// pinFontDate undoes the one clock reading in canvas's output: when it
// writes a (subset) font program, tdewolff/font stamps the head table's
// modified date with the current time. The copy here sets modified to the
// font's own created date and recomputes the checksums (OpenType head
// table: created at offset 20, modified at 28, checkSumAdjustment at 8,
// which is 0xB1B0AFBA minus the whole-font sum).
func pinFontDate(ttf []byte) ([]byte, error) {
	if len(ttf) < 12 {
		return nil, errors.New("font program too short")
	}
	out := append([]byte(nil), ttf...)
	n := int(binary.BigEndian.Uint16(out[4:]))
	if len(out) < 12+16*n {
		return nil, errors.New("font table directory truncated")
	}
	for i := 0; i < n; i++ {
		rec := out[12+16*i : 12+16*i+16]
		if string(rec[:4]) != "head" {
			continue
		}
		off, length := int(binary.BigEndian.Uint32(rec[8:])), int(binary.BigEndian.Uint32(rec[12:]))
		if length < 36 || off < 0 || off+length > len(out) {
			return nil, errors.New("font head table out of bounds")
		}
		head := out[off : off+length]
		copy(head[28:36], head[20:28])
		binary.BigEndian.PutUint32(head[8:], 0)
		binary.BigEndian.PutUint32(rec[4:], sfntChecksum(head))
		binary.BigEndian.PutUint32(head[8:], 0xB1B0AFBA-sfntChecksum(out))
		return out, nil
	}
	return nil, errors.New("font has no head table")
}

// sfntChecksum is the OpenType table checksum: the sum of big-endian
// uint32 words, the last one zero-padded.
func sfntChecksum(b []byte) uint32 {
	var sum uint32
	for i := 0; i < len(b); i += 4 {
		var w [4]byte
		copy(w[:], b[i:])
		sum += binary.BigEndian.Uint32(w[:])
	}
	return sum
}
