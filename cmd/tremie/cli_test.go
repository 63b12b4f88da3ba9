package main

import (
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"runtime/debug"
	"strings"
	"testing"
)

// Every registered command prints its own usage on stdout and exits 0
// for tremie help CMD, tremie CMD -h and tremie CMD --help, in the one
// layout, with flags shown with two dashes (one for a single letter).
func TestHelpForEveryCommand(t *testing.T) {
	oneDashLong := regexp.MustCompile(`(?m)^\s+-[a-z][a-z-]+\b`)
	for _, name := range commandNames() {
		for _, args := range [][]string{{"help", name}, {name, "-h"}, {name, "--help"}} {
			code, out, errb := runTremie(args...)
			if code != exitOK || errb != "" {
				t.Errorf("%v: exit %d, stderr %q", args, code, errb)
			}
			if !strings.HasPrefix(out, "usage: tremie "+name) {
				t.Errorf("%v: stdout does not start with the usage line:\n%s", args, out)
			}
			if !strings.Contains(out, commands[name].summary) {
				t.Errorf("%v: usage lacks the summary", args)
			}
			if !strings.Contains(out, "\nflags:\n") || !strings.Contains(out, "  --quiet") {
				t.Errorf("%v: usage lacks the flags section:\n%s", args, out)
			}
			if m := oneDashLong.FindString(out); m != "" {
				t.Errorf("%v: a long flag shown with one dash: %q", args, m)
			}
		}
	}
	code, out, _ := runTremie("help", "render")
	if code != exitOK || !strings.Contains(out, "  --format FORMATS") || !strings.Contains(out, "  -o DIRECTORY") || !strings.Contains(out, `(default svg,pdf,png)`) {
		t.Errorf("render usage:\n%s", out)
	}
	if code, _, errb := runTremie("help", "nosuch"); code != exitUsage || !strings.Contains(errb, "nosuch") {
		t.Errorf("help nosuch: exit %d, %q", code, errb)
	}
	// A bad flag: the message and the usage go to stderr, exit 3.
	code, out, errb := runTremie("render", "--nosuch", "x.toml")
	if code != exitUsage || out != "" || !strings.Contains(errb, "tremie render: flag provided but not defined: --nosuch") || !strings.Contains(errb, "usage: tremie render") {
		t.Errorf("bad flag: exit %d, stdout %q, stderr %q", code, out, errb)
	}
	if code, out, _ := runTremie("--help"); code != exitOK || !strings.Contains(out, "commands:") {
		t.Errorf("--help: exit %d\n%s", code, out)
	}
}

// --version names the version and the commit, or says why it cannot.
func TestVersion(t *testing.T) {
	code, out, _ := runTremie("--version")
	if code != exitOK || !strings.HasPrefix(out, "tremie "+Version+" (commit ") {
		t.Errorf("--version: exit %d, %q", code, out)
	}
}

// The version line reads the commit from what the Go toolchain records
// in the binary (runtime/debug.BuildInfo's vcs.* settings).
func TestVersionOfBuildInfo(t *testing.T) {
	info := &debug.BuildInfo{Settings: []debug.BuildSetting{
		{Key: "vcs", Value: "git"},
		{Key: "vcs.revision", Value: "0123456789abcdef0123456789abcdef01234567"},
		{Key: "vcs.time", Value: "2026-12-02T14:00:00Z"},
		{Key: "vcs.modified", Value: "true"},
	}}
	want := "tremie " + Version + " (commit 0123456789abcdef0123456789abcdef01234567 of 2026-12-02T14:00:00Z, with uncommitted changes)"
	if got := versionOf(info); got != want {
		t.Errorf("got  %q\nwant %q", got, want)
	}
	if got := versionOf(nil); !strings.Contains(got, "commit unknown") {
		t.Errorf("no build info: %q", got)
	}
}

// `go install ./cmd/tremie` in a git checkout gives a binary whose
// --version names the checkout's commit. The Go toolchain stamps the
// commit only where .git is a directory (not in a git worktree, whose .git
// is a file) and unless GOFLAGS says -buildvcs=false (as this machine's
// go env does), so the test copies the tracked files into a fresh
// repository, commits them and installs from there with the toolchain's
// default -buildvcs=auto, as a user's checkout would be built.
func TestVersionNamesTheCommit(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the command in a copy of the repository")
	}
	git, err := exec.LookPath("git")
	if err != nil {
		t.Skip("SKIP: git is not installed, so no commit can be stamped:", err)
	}
	files, err := exec.Command(git, "-C", "../..", "ls-files", "-z").Output()
	if err != nil {
		t.Skip("SKIP: not in a git checkout:", err)
	}
	repo := t.TempDir()
	for _, f := range strings.Split(strings.TrimRight(string(files), "\x00"), "\x00") {
		data, err := os.ReadFile(filepath.Join("../..", f))
		if err != nil {
			continue // deleted in the working tree
		}
		dst := filepath.Join(repo, filepath.FromSlash(f))
		if err := os.MkdirAll(filepath.Dir(dst), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(dst, data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	gitIn := func(args ...string) string {
		cmd := exec.Command(git, append([]string{"-C", repo, "-c", "user.name=Test", "-c", "user.email=test@example.invalid", "-c", "commit.gpgsign=false"}, args...)...)
		out, err := cmd.CombinedOutput()
		if err != nil {
			t.Fatalf("git %v: %v\n%s", args, err, out)
		}
		return strings.TrimSpace(string(out))
	}
	gitIn("init", "-q")
	gitIn("add", "-A")
	gitIn("commit", "-q", "-m", "copy of the working tree")
	head := gitIn("rev-parse", "HEAD")
	bin := t.TempDir()
	install := exec.Command("go", "install", "./cmd/tremie")
	install.Dir = repo
	// -buildvcs=auto is the toolchain's default, which this machine's go
	// env file turns off
	install.Env = append(os.Environ(), "GOFLAGS=-buildvcs=auto", "GOBIN="+bin)
	if out, err := install.CombinedOutput(); err != nil {
		t.Fatalf("go install ./cmd/tremie: %v\n%s", err, out)
	}
	out, err := exec.Command(filepath.Join(bin, "tremie"), "--version").Output()
	if err != nil {
		t.Fatal(err)
	}
	want := "tremie " + Version + " (commit " + head + " of "
	if !strings.HasPrefix(string(out), want) || strings.Contains(string(out), "uncommitted") {
		t.Errorf("--version = %q, want it to start %q and name no uncommitted changes", out, want)
	}
}

// --quiet, before or after the command, leaves out the lines for wells
// that went well, and keeps the summary and the caution.
func TestQuiet(t *testing.T) {
	profiledProject(t)
	for _, args := range [][]string{{"--quiet", "render", ".", "--format", "svg"}, {"render", ".", "--format", "svg", "--force", "--quiet"}} {
		_, out, _ := runTremie(args...)
		if strings.Contains(out, "BAD-1.toml") || !strings.Contains(out, "OK-1.toml") || !strings.Contains(out, "NOT FINAL") {
			t.Errorf("%v: want only the NOT FINAL well:\n%s", args, out)
		}
		if !strings.Contains(out, "never replace") {
			t.Errorf("%v: the caution is gone:\n%s", args, out)
		}
	}
	_, out, _ := runTremie("render", ".", "--format", "svg", "--force")
	if !strings.Contains(out, "BAD-1.toml") {
		t.Errorf("without --quiet every well has its line:\n%s", out)
	}
}

// tremie completion SHELL prints a script its shell accepts (bash -n,
// zsh -n, fish --no-execute) and that completes commands and a command's
// flags from the registry. A shell that is not installed is skipped with
// a printed message (.ci/run installs zsh and fish).
func TestCompletion(t *testing.T) {
	for _, sh := range []string{"bash", "zsh", "fish"} {
		code, out, errb := runTremie("completion", sh)
		if code != exitOK || errb != "" || !strings.Contains(out, "render") || !strings.Contains(out, "strict") {
			t.Errorf("completion %s: exit %d, stderr %q", sh, code, errb)
		}
		path, err := exec.LookPath(sh)
		if err != nil {
			t.Logf("SKIP: %s is not installed; its completion script is not syntax-checked", sh)
			continue
		}
		f := filepath.Join(t.TempDir(), "c")
		os.WriteFile(f, []byte(out), 0o644)
		flag := "-n"
		if sh == "fish" {
			flag = "--no-execute"
		}
		if b, err := exec.Command(path, flag, f).CombinedOutput(); err != nil {
			t.Errorf("%s %s rejects the script: %v\n%s", sh, flag, err, b)
		}
	}
	bash, err := exec.LookPath("bash")
	if err != nil {
		t.Skip("no bash")
	}
	_, script, _ := runTremie("completion", "bash")
	f := filepath.Join(t.TempDir(), "tremie.bash")
	os.WriteFile(f, []byte(script), 0o644)
	try := func(words string, cword int) string {
		out, err := exec.Command(bash, "-c", `source "$1"; COMP_WORDS=($2); COMP_CWORD=$3; _tremie; echo "${COMPREPLY[*]}"`,
			"x", f, words, string(rune('0'+cword))).CombinedOutput()
		if err != nil {
			t.Fatalf("%s: %v\n%s", words, err, out)
		}
		return strings.TrimSpace(string(out))
	}
	if got := try("tremie ren", 1); got != "render" {
		t.Errorf("tremie ren<TAB> = %q", got)
	}
	if got := try("tremie render --st", 2); got != "--strict" {
		t.Errorf("tremie render --st<TAB> = %q", got)
	}
	if got := try("tremie completion z", 2); got != "zsh" {
		t.Errorf("tremie completion z<TAB> = %q", got)
	}
	if got := try("tremie check --format j", 3); got != "json" {
		t.Errorf("tremie check --format j<TAB> = %q", got)
	}
	if got := try("tremie render x.toml --page tab", 4); got != "tabloid" {
		t.Errorf("tremie render x.toml --page tab<TAB> = %q", got)
	}
	if code, _, _ := runTremie("completion", "tcsh"); code != exitUsage {
		t.Errorf("completion tcsh: exit %d", code)
	}
}

// The zsh and fish scripts complete as the bash one does, tried in the
// shells themselves: fish's complete -C lists what a command line
// completes to; zsh runs the script from its fpath under compinit in a
// pseudo-terminal (zsh/zpty), types the words and a TAB, and a key bound
// to a widget writes the edited line to a file.
func TestCompletionInShells(t *testing.T) {
	cases := []struct{ typed, zshLine, fishWant string }{
		{"tremie ren", "tremie render ", "render\tdraw well files"},
		{"tremie render --st", "tremie render --strict ", "--strict\trefuse to draw"},
		{"tremie completion z", "tremie completion zsh ", "zsh"},
		{"tremie help bo", "tremie help book ", "book"},
		{"tremie check --form", "tremie check --format ", "--format\toutput format"},
		{"tremie check --format j", "tremie check --format json ", "json"},
		{"tremie render x.toml --page tab", "tremie render x.toml --page tabloid ", "tabloid"},
	}
	t.Run("fish", func(t *testing.T) {
		fish, err := exec.LookPath("fish")
		if err != nil {
			t.Skip("SKIP: fish is not installed")
		}
		_, script, _ := runTremie("completion", "fish")
		f := filepath.Join(t.TempDir(), "tremie.fish")
		os.WriteFile(f, []byte(script), 0o644)
		for _, c := range cases {
			out, err := exec.Command(fish, "--no-config", "-c", "source $argv[1]; complete -C $argv[2]", f, c.typed).CombinedOutput()
			if err != nil {
				t.Fatalf("%s: %v\n%s", c.typed, err, out)
			}
			lines := strings.Split(strings.TrimSpace(string(out)), "\n")
			if len(lines) != 1 || !strings.HasPrefix(lines[0], c.fishWant) {
				t.Errorf("fish: %s<TAB> = %q, want one completion starting %q", c.typed, out, c.fishWant)
			}
		}
	})
	t.Run("zsh", func(t *testing.T) {
		zsh, err := exec.LookPath("zsh")
		if err != nil {
			t.Skip("SKIP: zsh is not installed")
		}
		if err := exec.Command(zsh, "-f", "-c", "zmodload zsh/zpty").Run(); err != nil {
			t.Skip("SKIP: zsh has no zsh/zpty module:", err)
		}
		dir := t.TempDir()
		_, script, _ := runTremie("completion", "zsh")
		os.WriteFile(filepath.Join(dir, "_tremie"), []byte(script), 0o644)
		driver := filepath.Join(dir, "drive.zsh")
		os.WriteFile(driver, []byte(zshDriver), 0o644)
		for i, c := range cases {
			out := filepath.Join(dir, fmt.Sprintf("line%d", i))
			b, err := exec.Command(zsh, "-f", driver, dir, out, c.typed).CombinedOutput()
			if err != nil {
				t.Fatalf("%s: %v\n%s", c.typed, err, b)
			}
			if got := strings.TrimSuffix(string(b), "\n"); got != c.zshLine {
				t.Errorf("zsh: %s<TAB> = %q, want %q", c.typed, got, c.zshLine)
			}
		}
	})
}

// zshDriver types $3 and a TAB into an interactive zsh whose fpath holds
// $1/_tremie, then Ctrl-X, bound to write the edited line to $2, and
// prints that line (waiting at most 10 s).
const zshDriver = `zmodload zsh/zpty || exit 3
zpty z 'zsh -f -i'
zpty -w z "PS1=''; fpath=($1 \$fpath); autoload -Uz compinit; compinit -u -D"
zpty -w z "dump() { print -r -- \"\$BUFFER\" > $2; }; zle -N dump; bindkey '^X' dump"
zpty -w -n z "$3"$'\t\C-x'
for i in {1..100}; do
  [[ -s $2 ]] && break
  sleep 0.1
done
zpty -d z
cat $2
`
