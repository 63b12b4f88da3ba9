package schema

import (
	"errors"
	"strings"
	"testing"

	"github.com/BurntSushi/toml"
)

// loadReading loads a well file and returns every key path the loader
// asked for, indices stripped ("fill.tag.depth").
func loadReading(t *testing.T, src string) (map[string]bool, ErrorList) {
	t.Helper()
	var tree map[string]any
	if _, err := toml.Decode(src, &tree); err != nil {
		t.Fatalf("example does not parse: %v\n%s", err, src)
	}
	read := map[string]bool{}
	r := &reader{file: "example.toml", src: src, heads: scanHeaderLines(src), onRead: func(path, key string) {
		p := key
		if path != "" {
			p = stripIndex(path) + "." + key
		}
		read[p] = true
	}}
	r.well(r.root(tree))
	return read, r.errs
}

func declared(t *TableSpec, prefix string, out map[string]*KeySpec) {
	for i := range t.Keys {
		k := &t.Keys[i]
		p := k.Name
		if prefix != "" {
			p = prefix + "." + k.Name
		}
		out[p] = k
		if k.Table != nil {
			declared(k.Table, p, out)
		}
	}
}

// TestKeyTableMatchesLoader: every key of WellFile is read by the loader
// and every key the loader reads is in WellFile (else get reports an
// internal error), given a file that holds every key.
func TestKeyTableMatchesLoader(t *testing.T) {
	src := WellFile.ExampleTOML()
	read, errs := loadReading(t, src)
	for _, e := range errs {
		if strings.Contains(e.Msg, "internal:") || strings.Contains(e.Msg, "unknown key") {
			t.Errorf("%v", e)
		}
	}
	keys := map[string]*KeySpec{}
	declared(WellFile, "", keys)
	// The catalogue gives both of each pair of alternatives; a reader may
	// skip one of a pair it rejects, so also read it without each key.
	variants := []string{}
	for p, k := range keys {
		variants = append(variants, withoutKey(src, p, k))
	}
	picks := src // a feature's points are read when no trace ends are given
	for _, p := range []string{"feature.trace_high", "feature.trace_low", "feature.low_azimuth"} {
		picks = withoutKey(picks, p, keys[p])
	}
	for _, v := range append(variants, picks) {
		more, _ := loadReading(t, v)
		for q := range more {
			read[q] = true
		}
	}
	for p := range keys {
		if !read[p] {
			t.Errorf("key table declares %s, which the loader never reads", p)
		}
	}
	for p := range read {
		if keys[p] == nil {
			t.Errorf("the loader reads %s, which the key table does not declare", p)
		}
	}
}

// TestRequiredKeysMatchLoader: leaving out a key the table marks required
// is an error of the loader, and leaving out any other is not a "missing"
// error.
func TestRequiredKeysMatchLoader(t *testing.T) {
	keys := map[string]*KeySpec{}
	declared(WellFile, "", keys)
	messages := func(src string) map[string]bool {
		_, err := Load("x.toml", []byte(src))
		var el ErrorList
		errors.As(err, &el)
		out := map[string]bool{}
		for _, e := range el {
			out[e.Msg] = true
		}
		return out
	}
	base := messages(WellFile.ExampleTOML()) // the catalogue gives both of each pair of alternatives
	for p, k := range keys {
		if k.Type == TypeTables && !k.Required {
			continue
		}
		var added []string
		for m := range messages(withoutKey(WellFile.ExampleTOML(), p, k)) {
			if !base[m] {
				added = append(added, m)
			}
		}
		if k.Required && len(added) == 0 {
			t.Errorf("%s is required in the key table, but the loader accepts a file without it", p)
		}
		if !k.Required && k.RequiredIf == "" {
			for _, m := range added {
				if strings.Contains(m, "missing required") {
					t.Errorf("%s is optional in the key table, but the loader says: %s", p, m)
				}
			}
		}
	}
}

// withoutKey drops one key (or the table it heads) from an example file.
func withoutKey(src, path string, k *KeySpec) string {
	parent, name := "", path
	if i := strings.LastIndex(path, "."); i >= 0 {
		parent, name = path[:i], path[i+1:]
	}
	var out []string
	current, skipping := "", false
	for _, line := range strings.Split(src, "\n") {
		trim := strings.TrimSpace(line)
		if strings.HasPrefix(trim, "[") {
			current = strings.Trim(trim, "[]")
			skipping = current == path || strings.HasPrefix(current, path+".")
		}
		if skipping {
			continue
		}
		if k.Table == nil && current == parent && strings.HasPrefix(trim, name+" = ") {
			continue
		}
		out = append(out, line)
	}
	return strings.Join(out, "\n")
}
