package pipeline

import (
	"os"
	"path/filepath"
	"testing"
)

func write(t *testing.T, path, text string) {
	t.Helper()
	if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
}

// A well file inside a project gets the project's setting whether it is
// named as a file, as its folder or as the project, and its key and the
// output folder are the same each way.
func TestResolveFindsTheEnclosingProject(t *testing.T) {
	dir := t.TempDir()
	write(t, filepath.Join(dir, "project.toml"), "[project]\nname = \"P\"\nprofile = \"c.profile.toml\"\npage = \"a4\"\n")
	write(t, filepath.Join(dir, "c.profile.toml"), "[profile]\nname = \"County\"\nunits = \"ft\"\n[rule.SEAL-THICKNESS]\nmin = 5\n")
	write(t, filepath.Join(dir, "wells", "deep", "X.toml"), "")
	for _, arg := range []string{filepath.Join(dir, "wells", "deep", "X.toml"), filepath.Join(dir, "wells"), dir} {
		r, err := Resolve([]string{arg}, Options{})
		if err != nil || len(r.Problems) > 0 {
			t.Fatalf("%s: %v %v", arg, err, r.Problems)
		}
		if len(r.Inputs) != 1 {
			t.Fatalf("%s: %d inputs", arg, len(r.Inputs))
		}
		in := r.Inputs[0]
		if in.Setting.Project == nil || in.Setting.Project.Name != "P" {
			t.Errorf("%s: no project", arg)
		}
		if got := in.Setting.ProfileLabel(); got != "profile County" {
			t.Errorf("%s: %s", arg, got)
		}
		if in.Setting.PageName != "a4" || in.Key != "wells/deep/X.toml" || r.OutDir != filepath.Join(dir, "out") {
			t.Errorf("%s: page %q key %q out %q", arg, in.Setting.PageName, in.Key, r.OutDir)
		}
	}
	// Named from inside the project, relative to the working directory:
	// "X.toml" in wells/deep, "deep/X.toml" in wells, "../deep/X.toml"
	// from a sibling folder.
	write(t, filepath.Join(dir, "wells", "other", ".keep"), "")
	for _, c := range []struct{ cwd, arg string }{
		{filepath.Join(dir, "wells", "deep"), "X.toml"},
		{filepath.Join(dir, "wells"), "deep/X.toml"},
		{filepath.Join(dir, "wells", "other"), "../deep/X.toml"},
		{filepath.Join(dir, "wells", "deep"), "."},
	} {
		t.Chdir(c.cwd)
		r, err := Resolve([]string{c.arg}, Options{})
		if err != nil || len(r.Problems) > 0 || len(r.Inputs) != 1 {
			t.Fatalf("%s in %s: %v %v", c.arg, c.cwd, err, r.Problems)
		}
		in := r.Inputs[0]
		if got := in.Setting.ProfileLabel(); got != "profile County" || in.Key != "wells/deep/X.toml" {
			t.Errorf("%s in %s: %s, key %q", c.arg, c.cwd, got, in.Key)
		}
	}
	// The command line's profile wins over the project's.
	write(t, filepath.Join(dir, "other.profile.toml"), "[profile]\nname = \"Other\"\n")
	r, err := Resolve([]string{dir}, Options{Profile: filepath.Join(dir, "other.profile.toml")})
	if err != nil || r.Inputs[0].Setting.ProfileLabel() != "profile Other" {
		t.Errorf("--profile: %v %v", err, r.Inputs[0].Setting.ProfileLabel())
	}
	// A project whose profile is broken: its wells are not judged, and the
	// reason is reported once.
	write(t, filepath.Join(dir, "c.profile.toml"), "[profile]\nname = \"County\"\nbogus = 1\n")
	r, err = Resolve([]string{dir}, Options{})
	if err != nil || len(r.Problems) == 0 {
		t.Fatalf("broken profile: %v %v", err, r.Problems)
	}
	if w := Load(r.Inputs[0]); w.Err == nil {
		t.Error("a well of a project whose profile cannot be read was judged")
	}
}
