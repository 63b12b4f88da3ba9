package main

import (
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

// A binary built from a git checkout names its commit. The Go toolchain
// stamps it only from a checkout whose .git is a directory (not from a
// git worktree, whose .git is a file) and unless GOFLAGS turns it off.
func TestVersionNamesTheCommit(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the command")
	}
	top, err := exec.Command("git", "rev-parse", "--show-toplevel").Output()
	if err != nil {
		t.Skip("not a git checkout:", err)
	}
	if st, err := os.Stat(filepath.Join(strings.TrimSpace(string(top)), ".git")); err != nil || !st.IsDir() {
		t.Skip("a git worktree: the Go toolchain records no commit for it")
	}
	head, err := exec.Command("git", "rev-parse", "HEAD").Output()
	if err != nil {
		t.Skip(err)
	}
	bin := filepath.Join(t.TempDir(), "tremie")
	build := exec.Command("go", "build", "-o", bin, ".")
	build.Env = append(os.Environ(), "GOFLAGS=-buildvcs=true")
	if out, err := build.CombinedOutput(); err != nil {
		t.Skipf("go build: %v\n%s", err, out)
	}
	out, err := exec.Command(bin, "--version").Output()
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(out), strings.TrimSpace(string(head))) {
		t.Errorf("--version %q does not name HEAD %s", out, head)
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

// tremie completion bash prints a script bash accepts (bash -n) and that
// completes commands and a command's flags from the registry.
func TestCompletion(t *testing.T) {
	for _, sh := range []string{"bash", "zsh", "fish"} {
		code, out, errb := runTremie("completion", sh)
		if code != exitOK || errb != "" || !strings.Contains(out, "render") || !strings.Contains(out, "strict") {
			t.Errorf("completion %s: exit %d, stderr %q", sh, code, errb)
		}
		if path, err := exec.LookPath(sh); err == nil {
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
	if code, _, _ := runTremie("completion", "tcsh"); code != exitUsage {
		t.Errorf("completion tcsh: exit %d", code)
	}
}
