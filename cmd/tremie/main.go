// Command tremie checks, quantifies and draws groundwater-well
// construction logs from TOML as-built descriptions.
package main

import (
	"fmt"
	"io"
	"os"
	"runtime/debug"
	"sort"
)

// Exit codes, documented in README.
const (
	exitOK       = 0 // no error-level finding remains
	exitFindings = 1 // an unwaived error-level finding (or --strict refusal)
	exitInput    = 2 // a file could not be read or parsed
	exitUsage    = 3 // bad command line
	exitOutput   = 4 // an output could not be written
)

// command is one subcommand; each lives in its own file and registers
// itself from init. Only name, summary and run are required.
type command struct {
	name    string
	summary string
	run     func(args []string, stdout, stderr io.Writer) int
	// args is the operand part of the usage line ("FILE|DIR..."), and
	// about a longer description printed under it; both optional.
	args  string
	about string
}

var commands = map[string]*command{}

func register(c *command) { commands[c.name] = c }

// quiet is --quiet, given before or after the command: no progress bar
// and no line for a well that went well; findings, warnings, errors,
// summaries and the caution are still printed.
var quiet bool

func main() {
	stdout, stderr := terminalSafe()
	stopOnSignal(stderr)
	os.Exit(exitStatus(run(os.Args[1:], stdout, stderr)))
}

func run(args []string, stdout, stderr io.Writer) int {
	quiet = false
	for len(args) > 0 && (args[0] == "--quiet" || args[0] == "-q") {
		quiet = true
		args = args[1:]
	}
	if len(args) == 0 {
		usage(stderr)
		return exitUsage
	}
	switch args[0] {
	case "-h", "--help", "-help":
		usage(stdout)
		return exitOK
	case "help":
		return runHelp(args[1:], stdout, stderr)
	case "--version", "-version", "version":
		fmt.Fprintln(stdout, versionLine())
		return exitOK
	}
	c, ok := commands[args[0]]
	if !ok {
		fmt.Fprintf(stderr, "tremie: unknown command %q (tremie help lists them)\n", args[0])
		return exitUsage
	}
	return c.run(args[1:], stdout, stderr)
}

// runHelp is tremie help [COMMAND].
func runHelp(args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		usage(stdout)
		return exitOK
	}
	c, ok := commands[args[0]]
	if !ok {
		fmt.Fprintf(stderr, "tremie help: unknown command %q (tremie help lists them)\n", args[0])
		return exitUsage
	}
	return c.run([]string{"--help"}, stdout, stderr)
}

// Version is the tool version; it enters every output's content hash.
const Version = "0.1.0"

// versionLine is the version with the commit the binary was built from,
// as the Go toolchain recorded it (go build and go install record it from
// a git checkout; go run does not).
func versionLine() string {
	info, _ := debug.ReadBuildInfo()
	return versionOf(info)
}

// versionOf is versionLine for the build information given (nil for none).
func versionOf(info *debug.BuildInfo) string {
	commit, modified, when := "", false, ""
	if info != nil {
		for _, s := range info.Settings {
			switch s.Key {
			case "vcs.revision":
				commit = s.Value
			case "vcs.modified":
				modified = s.Value == "true"
			case "vcs.time":
				when = s.Value
			}
		}
	}
	if commit == "" {
		return fmt.Sprintf("tremie %s (commit unknown: built without version-control information, e.g. by go run)", Version)
	}
	s := fmt.Sprintf("tremie %s (commit %s", Version, commit)
	if when != "" {
		s += " of " + when
	}
	if modified {
		s += ", with uncommitted changes"
	}
	return s + ")"
}

func usage(w io.Writer) {
	fmt.Fprintln(w, "tremie: groundwater-well construction logs, checks and quantities")
	fmt.Fprintln(w, "\nusage: tremie [--quiet] COMMAND [flags] ARGS")
	fmt.Fprintln(w, "       tremie help COMMAND | tremie COMMAND --help")
	fmt.Fprintln(w, "       tremie --version")
	fmt.Fprintln(w, "\ncommands:")
	for _, n := range commandNames() {
		fmt.Fprintf(w, "  %-11s %s\n", n, commands[n].summary)
	}
	fmt.Fprintln(w, "\nexit codes: 0 clean, 1 error findings, 2 unreadable input, 3 usage, 4 output not written")
}

// commandNames lists the registered commands, sorted.
func commandNames() []string {
	names := make([]string, 0, len(commands))
	for n := range commands {
		names = append(names, n)
	}
	sort.Strings(names)
	return names
}
