package out

import (
	"encoding/binary"
	"testing"

	"golang.org/x/image/font/sfnt"

	"github.com/tremie-dev/tremie/render/draw"
)

// checkSums verifies a font's checksums the way the OpenType spec defines
// them ("head" table, checkSumAdjustment): every table's directory
// checksum matches its data (head counted with the adjustment zeroed), and
// the whole file sums to 0xB1B0AFBA.
func checkSums(t *testing.T, name string, ttf []byte) {
	t.Helper()
	n := int(binary.BigEndian.Uint16(ttf[4:]))
	for i := 0; i < n; i++ {
		rec := ttf[12+16*i:]
		tag := string(rec[:4])
		off, length := binary.BigEndian.Uint32(rec[8:]), binary.BigEndian.Uint32(rec[12:])
		table := append([]byte(nil), ttf[off:off+length]...)
		if tag == "head" {
			binary.BigEndian.PutUint32(table[8:], 0)
		}
		if got, want := sfntChecksum(table), binary.BigEndian.Uint32(rec[4:]); got != want {
			t.Errorf("%s %s checksum %08x, directory says %08x", name, tag, got, want)
		}
	}
	if sum := sfntChecksum(ttf); sum != 0xB1B0AFBA {
		t.Errorf("%s whole-font sum %08x, want B1B0AFBA", name, sum)
	}
}

func TestPinFontDate(t *testing.T) {
	for _, f := range draw.FontStyles {
		orig := draw.FontData(f)
		// The Go fonts were built by other tools; they must pass the same
		// check, which validates the checksum code itself.
		checkSums(t, draw.FontName(f)+" (original)", orig)

		stamped := append([]byte(nil), orig...)
		headAt := -1
		n := int(binary.BigEndian.Uint16(stamped[4:]))
		for i := 0; i < n; i++ {
			if rec := stamped[12+16*i:]; string(rec[:4]) == "head" {
				headAt = int(binary.BigEndian.Uint32(rec[8:]))
			}
		}
		binary.BigEndian.PutUint64(stamped[headAt+28:], 0x1234) // a "clock" date
		pinned, err := pinFontDate(stamped)
		if err != nil {
			t.Fatal(err)
		}
		created := binary.BigEndian.Uint64(pinned[headAt+20:])
		if got := binary.BigEndian.Uint64(pinned[headAt+28:]); got != created {
			t.Errorf("%s modified %d, want created %d", draw.FontName(f), got, created)
		}
		checkSums(t, draw.FontName(f)+" (pinned)", pinned)
		if _, err := sfnt.Parse(pinned); err != nil {
			t.Errorf("%s pinned does not parse: %v", draw.FontName(f), err)
		}
	}
	for _, bad := range [][]byte{nil, make([]byte, 11), {0, 1, 0, 0, 0, 9, 0, 0, 0, 0, 0, 0}} {
		if _, err := pinFontDate(bad); err == nil {
			t.Errorf("pinFontDate(% x) gave no error", bad)
		}
	}
}
