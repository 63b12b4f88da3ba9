package starter

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"sort"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/jsonschema"
	"github.com/tremie-dev/tremie/schema/project"
)

// SchemaDir is the folder of a project skeleton that holds the JSON
// Schemas its files point at.
const SchemaDir = "schemas"

// ProfileName is the rule profile a skeleton names.
const ProfileName = "site.profile.toml"

// InitOptions choose a project skeleton.
type InitOptions struct {
	Name      string           // project name; "" = the folder's name
	Units     schema.DepthUnit // "" = ft
	NoProfile bool             // leave the rule profile out
}

func schemaJSON(kind string) ([]byte, error) { return jsonschema.Generate(kind) }

// Init writes a project skeleton into dir: project.toml with every key
// explained, a wells folder, a rule profile, the JSON Schemas and a
// .taplo.toml that associates them. It writes nothing if any of those
// files is there already, and returns the paths written.
func Init(dir string, o InitOptions) ([]string, error) {
	if o.Units == "" {
		o.Units = schema.Feet
	}
	if o.Units != schema.Feet && o.Units != schema.Metres {
		return nil, fmt.Errorf("units must be ft or m, not %q", o.Units)
	}
	if o.Name == "" {
		abs, _ := filepath.Abs(dir)
		o.Name = filepath.Base(abs)
	}
	files := map[string][]byte{
		project.FileName: projectFile(o),
		".taplo.toml":    taploFile(!o.NoProfile),
	}
	if !o.NoProfile {
		files[ProfileName] = profileFile(o.Units)
	}
	for _, kind := range jsonschema.Kinds {
		data, err := schemaJSON(kind)
		if err != nil {
			return nil, err
		}
		files[filepath.Join(SchemaDir, kind+".schema.json")] = data
	}
	names := make([]string, 0, len(files))
	for name := range files {
		names = append(names, name)
	}
	sort.Strings(names)
	for _, name := range names { // refuse before writing anything
		if _, err := os.Lstat(filepath.Join(dir, name)); err == nil {
			return nil, fmt.Errorf("%s %w", filepath.Join(dir, name), ErrExists)
		} else if !errors.Is(err, fs.ErrNotExist) {
			return nil, err
		}
	}
	for _, sub := range []string{project.DefaultWells, SchemaDir} {
		if err := os.MkdirAll(filepath.Join(dir, sub), 0o755); err != nil {
			return nil, err
		}
	}
	var wrote []string
	for _, name := range names {
		p := filepath.Join(dir, name)
		if err := createNew(p, files[name]); err != nil {
			return wrote, err
		}
		wrote = append(wrote, p)
	}
	return wrote, nil
}

// projectFile is project.toml: the keys a new project sets, and every
// other key commented out with its example, each explained.
func projectFile(o InitOptions) []byte {
	var b strings.Builder
	fmt.Fprintf(&b, "#:schema %s/project.schema.json\n", SchemaDir)
	wrap(&b, "Project file (tremie init): the settings every well of the project shares. Keys commented out keep their default; remove the # to set one. The reference is schema/project/PROJECT.md.")
	pt := project.File.Key("project").Table
	set := map[string]any{
		"name":   o.Name,
		"units":  string(o.Units),
		"page":   map[schema.DepthUnit]string{schema.Feet: "letter", schema.Metres: "a4"}[o.Units],
		"wells":  project.DefaultWells,
		"output": project.DefaultOutput,
	}
	if !o.NoProfile {
		set["profile"] = ProfileName
	}
	b.WriteString("\n[project]\n")
	for i := range pt.Keys {
		k := &pt.Keys[i]
		c := k.Doc
		if k.Unit != "" {
			c += " [" + k.Unit + "]"
		}
		if len(k.Enum) > 0 {
			c += " One of: " + strings.Join(k.Enum, ", ") + "."
		}
		wrap(&b, c)
		if v, ok := set[k.Name]; ok {
			fmt.Fprintf(&b, "%s = %s\n", k.Name, schema.TOMLValue(k.Type, v))
		} else {
			fmt.Fprintf(&b, "# %s = %s\n", k.Name, schema.TOMLValue(k.Type, k.Example))
		}
	}
	if sec := project.File.Key("section"); sec != nil {
		b.WriteString("\n")
		wrap(&b, sec.Doc+" Remove the # of the lines below to define one; add a [[section]] per cross-section.")
		b.WriteString("# [[section]]\n")
		for _, k := range sec.Table.Keys {
			wrap(&b, k.Doc)
			fmt.Fprintf(&b, "# %s = %s\n", k.Name, schema.TOMLValue(k.Type, k.Example))
		}
	}
	return []byte(b.String())
}

// profileFile is a rule profile that changes nothing yet, with the forms
// of a setting shown in comments.
func profileFile(u schema.DepthUnit) []byte {
	var b strings.Builder
	fmt.Fprintf(&b, "#:schema %s/profile.schema.json\n", SchemaDir)
	wrap(&b, "Rule profile (tremie init): the thresholds and severities tremie check applies to this project. As written it changes no default; tremie rules lists every rule with its default and source. Set the values of the governing local well code: the defaults are not the law where you work. The reference is schema/rules/PROFILE.md.")
	b.WriteString("\n[profile]\n")
	wrap(&b, "Name shown in the check summary.")
	b.WriteString("name = \"site profile\"\n")
	wrap(&b, "Units of every number below: ft (lengths in feet, diameters in inches) or m (metres, millimetres).")
	fmt.Fprintf(&b, "units = %q\n", string(u))
	wrap(&b, "The code the values follow.")
	b.WriteString("# source = \"County well ordinance, chapter 9\"\n")
	b.WriteString("\n")
	wrap(&b, "Examples; remove the # to use one. A threshold for every well:")
	seal := map[schema.DepthUnit]string{schema.Feet: "3", schema.Metres: "0.9"}[u]
	depth := map[schema.DepthUnit]string{schema.Feet: "25", schema.Metres: "7.5"}[u]
	fmt.Fprintf(&b, "# [rule.SEAL-THICKNESS]\n# min = %s\n#\n", seal)
	wrap(&b, "A warning instead of an error, or off:")
	b.WriteString("# [rule.ANNULAR-SPACE]\n# severity = \"warning\"\n#\n")
	wrap(&b, "The minimum sanitary-seal depth by well purpose:")
	fmt.Fprintf(&b, "# [sanitary_seal]\n# domestic = %s\n", depth)
	return []byte(b.String())
}

// taploFile associates the schemas with the project's files for Taplo
// and the editors built on it.
func taploFile(profile bool) []byte {
	var b strings.Builder
	wrap(&b, "Taplo (and VS Code's Even Better TOML) read this file: it gives each of the project's TOML files its JSON Schema, for completion and checks as you type. tremie schema KIND prints a schema again after an upgrade.")
	rule := func(include, kind string) {
		fmt.Fprintf(&b, "\n[[rule]]\ninclude = [%q]\nschema = { path = \"%s/%s.schema.json\" }\n", include, SchemaDir, kind)
	}
	rule(project.DefaultWells+"/**/*.toml", "well")
	rule(project.FileName, "project")
	if profile {
		rule("*.profile.toml", "profile")
	}
	rule("*.yields.toml", "yields")
	return []byte(b.String())
}
