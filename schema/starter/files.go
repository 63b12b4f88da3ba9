package starter

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
)

// ErrExists is returned (wrapped) when a file to write is already there:
// the starter commands never overwrite anything.
var ErrExists = errors.New("already exists; tremie writes starter files only where there is none")

// createNew writes a file that must not exist yet, atomically: the bytes
// go to a temporary file that is then linked to the name, which fails if
// the name is taken, even by a file made a moment before.
func createNew(path string, data []byte) error {
	if _, err := os.Lstat(path); err == nil {
		return fmt.Errorf("%s %w", path, ErrExists)
	}
	tmp, err := os.CreateTemp(filepath.Dir(path), ".tremie-new-*")
	if err != nil {
		return err
	}
	name := tmp.Name()
	defer os.Remove(name)
	if _, err := tmp.Write(data); err != nil {
		tmp.Close()
		return err
	}
	// CreateTemp makes the file 0600; a project's files are shared
	// documents, readable as any the user makes.
	if err := tmp.Chmod(0o644); err != nil {
		tmp.Close()
		return err
	}
	if err := tmp.Close(); err != nil {
		return err
	}
	if err := os.Link(name, path); err != nil {
		if errors.Is(err, fs.ErrExist) {
			return fmt.Errorf("%s %w", path, ErrExists)
		}
		return err
	}
	return nil
}

// WellFileName is the file a starter well is written to in dir.
func WellFileName(dir, id string) string {
	return filepath.Join(dir, safeName(id)+".toml")
}

// safeName keeps an ID usable as a file name.
func safeName(id string) string {
	return strings.Map(func(r rune) rune {
		if r == '/' || r == '\\' || r == 0 || r == ':' {
			return '_'
		}
		return r
	}, strings.TrimSpace(id))
}

// WriteWell writes a starter well file into dir (made if missing) and
// returns the paths written. The #:schema line points at the project's
// schemas/well.schema.json when dir lies in a project that has one (see
// Init); otherwise the schema is written beside the well as
// well.schema.json, unless a file of that name is there already.
func WriteWell(dir string, o Options) ([]string, error) {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return nil, err
	}
	path := WellFileName(dir, o.ID)
	if _, err := os.Lstat(path); err == nil {
		return nil, fmt.Errorf("%s %w", path, ErrExists)
	}
	var wrote []string
	schemaFile := projectSchema(dir, "well")
	if schemaFile == "" {
		schemaFile = filepath.Join(dir, "well.schema.json")
		if _, err := os.Lstat(schemaFile); err != nil {
			data, err := schemaJSON("well")
			if err != nil {
				return nil, err
			}
			if err := createNew(schemaFile, data); err != nil {
				return nil, err
			}
			wrote = append(wrote, schemaFile)
		}
	}
	absDir, err := filepath.Abs(dir)
	if err != nil {
		return nil, err
	}
	absSchema, err := filepath.Abs(schemaFile)
	if err != nil {
		return nil, err
	}
	rel, err := filepath.Rel(absDir, absSchema)
	if err != nil {
		rel = absSchema
	}
	o.Schema = filepath.ToSlash(rel)
	data, err := Well(o)
	if err != nil {
		return nil, err
	}
	if err := createNew(path, data); err != nil {
		return wrote, err
	}
	return append(wrote, path), nil
}

// projectSchema finds schemas/KIND.schema.json of the project dir lies
// in: the nearest directory above with a project.toml.
func projectSchema(dir, kind string) string {
	d, err := filepath.Abs(dir)
	if err != nil {
		return ""
	}
	for i := 0; i < 8; i++ {
		if _, err := os.Stat(filepath.Join(d, "project.toml")); err == nil {
			p := filepath.Join(d, SchemaDir, kind+".schema.json")
			if _, err := os.Stat(p); err == nil {
				return p
			}
			return ""
		}
		up := filepath.Dir(d)
		if up == d {
			break
		}
		d = up
	}
	return ""
}
