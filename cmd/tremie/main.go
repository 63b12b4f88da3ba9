// Command tremie checks, quantifies and draws groundwater-well
// construction logs from TOML as-built descriptions.
package main

import (
	"fmt"
	"io"
	"os"
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
// itself from init.
type command struct {
	name    string
	summary string
	run     func(args []string, stdout, stderr io.Writer) int
}

var commands = map[string]*command{}

func register(c *command) { commands[c.name] = c }

func main() { os.Exit(run(os.Args[1:], os.Stdout, os.Stderr)) }

func run(args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 || args[0] == "-h" || args[0] == "--help" || args[0] == "help" {
		usage(stdout)
		if len(args) == 0 {
			return exitUsage
		}
		return exitOK
	}
	if args[0] == "--version" || args[0] == "version" {
		fmt.Fprintln(stdout, "tremie", Version)
		return exitOK
	}
	c, ok := commands[args[0]]
	if !ok {
		fmt.Fprintf(stderr, "tremie: unknown command %q (try tremie help)\n", args[0])
		return exitUsage
	}
	return c.run(args[1:], stdout, stderr)
}

// Version is the tool version; it enters every output's content hash.
const Version = "0.1.0"

func usage(w io.Writer) {
	fmt.Fprintln(w, "tremie: groundwater-well construction logs, checks and quantities")
	fmt.Fprintln(w, "\nusage: tremie COMMAND [options] FILE|DIR...")
	fmt.Fprintln(w, "\ncommands:")
	names := make([]string, 0, len(commands))
	for n := range commands {
		names = append(names, n)
	}
	sort.Strings(names)
	for _, n := range names {
		fmt.Fprintf(w, "  %-11s %s\n", n, commands[n].summary)
	}
	fmt.Fprintln(w, "\nexit codes: 0 clean, 1 error findings, 2 unreadable input, 3 usage, 4 output not written")
}
