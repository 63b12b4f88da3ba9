package table

import (
	"bytes"
	"strings"
	"testing"

	"github.com/tremie-dev/tremie/schema/rules"
)

// The table's caution names the profile in force, and says defaults only
// under the defaults.
func TestCautionNamesProfile(t *testing.T) {
	var b bytes.Buffer
	tb := &Table{Units: "ft"}
	if err := tb.Markdown(&b); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(b.String(), "thresholds are defaults") {
		t.Errorf("defaults table: %q", b.String())
	}
	prof, err := rules.ParseProfile("county.profile.toml", []byte("[profile]\nname = \"County code\"\n[rule.PACK-ABOVE-MAX]\nseverity = \"off\"\n"))
	if err != nil {
		t.Fatal(err)
	}
	tb.Profile = prof
	b.Reset()
	if err := tb.Markdown(&b); err != nil {
		t.Fatal(err)
	}
	if s := b.String(); !strings.Contains(s, `profile "County code"`) || strings.Contains(s, "thresholds are defaults") {
		t.Errorf("table under a profile: %q", s)
	}
}
