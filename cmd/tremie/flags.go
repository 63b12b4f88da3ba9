package main

import (
	"errors"
	"flag"
	"fmt"
	"io"
	"regexp"
	"strings"

	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/schema"
)

// cmdFlags is a command's flag set with the usage layout every command
// shares: "usage: tremie NAME [flags] ARGS", the summary, then each flag
// with two dashes (one for a single letter) and its default.
type cmdFlags struct {
	*flag.FlagSet
	cmd    *command
	stdout io.Writer
	stderr io.Writer
	dirs   map[string]*string // flags naming a directory (see dir)
}

// newFlags starts a command's flags; --quiet is among them.
func newFlags(name string, stdout, stderr io.Writer) *cmdFlags {
	c := commands[name]
	if c == nil {
		c = &command{name: name}
	}
	fs := flag.NewFlagSet(name, flag.ContinueOnError)
	fs.SetOutput(io.Discard) // parse prints the error and the usage, on the right stream
	fs.Usage = func() {}
	fs.BoolVar(&quiet, "quiet", quiet, "print no progress and no line for a well that went well")
	return &cmdFlags{FlagSet: fs, cmd: c, stdout: stdout, stderr: stderr}
}

// choiceValue is a string flag whose values are few and known: the
// command still checks the value (with its own message); shell completion
// offers the values (commandSpecs reads Choices).
type choiceValue struct {
	s       *string
	choices []string
}

func (c choiceValue) String() string {
	if c.s == nil {
		return ""
	}
	return *c.s
}
func (c choiceValue) Set(v string) error { *c.s = v; return nil }
func (c choiceValue) Choices() []string  { return c.choices }

// choice declares a string flag taking one of choices (def by default).
func (f *cmdFlags) choice(name, def string, choices []string, usage string) *string {
	s := new(string)
	*s = def
	f.Var(choiceValue{s, choices}, name, usage)
	return s
}

// stdoutName is the output file name that means standard output
// ("-o -"), as in most command-line tools.
const stdoutName = "-"

// dir declares a string flag naming a directory of outputs, which "-"
// (standard output: one stream) cannot be; parse refuses it.
func (f *cmdFlags) dir(name, def, usage string) *string {
	s := f.String(name, def, usage)
	if f.dirs == nil {
		f.dirs = map[string]*string{}
	}
	f.dirs[name] = s
	return s
}

// toStdout writes a command's one document to standard output, the
// stream of "-o -"; a binary one (PDF, workbook) is refused on a
// terminal, where it would only scramble the screen. It returns the exit
// code.
func toStdout(cmd string, stdout, stderr io.Writer, data []byte, binary bool) int {
	if _, terminal := stdout.(textGuard); terminal && binary {
		fmt.Fprintf(stderr, "tremie %s: standard output is a terminal, where a binary file would only scramble the screen; redirect it to a file or a program (> FILE, | PROGRAM), or name a file in place of -\n", cmd)
		return exitOutput
	}
	if _, err := stdout.Write(data); err != nil {
		fmt.Fprintf(stderr, "tremie %s: writing to standard output: %v\n", cmd, err)
		return exitOutput
	}
	return exitOK
}

// twoDashes finds a long flag written with one dash in the flag
// package's messages ("-format"), to show it as it is documented.
var twoDashes = regexp.MustCompile(`(^|\s)-([a-z][a-z0-9-]+)`)

// describing, when set, receives a command's flag set instead of the
// command running: shell completion learns every command's flags so.
var describing func(fs *flag.FlagSet)

// parse parses flags given before, between or after the operands ("--"
// ends them). When it returns ok false the command returns code at once:
// exitOK after --help (usage on stdout), exitUsage after a bad flag
// (message and usage on stderr).
func (f *cmdFlags) parse(args []string) (operands []string, code int, ok bool) {
	if describing != nil {
		describing(f.FlagSet)
		return nil, exitOK, false
	}
	for {
		if err := f.Parse(args); err != nil {
			if errors.Is(err, flag.ErrHelp) {
				f.writeUsage(f.stdout)
				return nil, exitOK, false
			}
			fmt.Fprintf(f.stderr, "tremie %s: %s\n\n", f.cmd.name, twoDashes.ReplaceAllString(err.Error(), "$1--$2"))
			f.writeUsage(f.stderr)
			return nil, exitUsage, false
		}
		args = f.Args()
		if len(args) == 0 || args[0] == "--" {
			if len(args) > 0 {
				operands = append(operands, args[1:]...)
			}
			for name, v := range f.dirs {
				if *v == stdoutName {
					return nil, f.usageError("-%s names a directory for the files %s writes; - (standard output) cannot hold them (write ./- for a directory named -)", name, f.cmd.name), false
				}
			}
			return operands, exitOK, true
		}
		operands = append(operands, args[0])
		args = args[1:]
	}
}

// usageError reports a bad command line with the usage; it returns
// exitUsage.
// operandOr is a command's one optional operand, or def when none is
// given (the caller has refused more than one).
func operandOr(operands []string, def string) string {
	if len(operands) > 0 {
		return operands[0]
	}
	return def
}

func (f *cmdFlags) usageError(format string, args ...any) int {
	fmt.Fprintf(f.stderr, "tremie %s: %s\n\n", f.cmd.name, fmt.Sprintf(format, args...))
	f.writeUsage(f.stderr)
	return exitUsage
}

func (f *cmdFlags) writeUsage(w io.Writer) {
	c := f.cmd
	line := "usage: tremie " + c.name
	hasFlags := false
	f.VisitAll(func(*flag.Flag) { hasFlags = true })
	if hasFlags {
		line += " [flags]"
	}
	if c.args != "" {
		line += " " + c.args
	}
	var b strings.Builder
	b.WriteString(line + "\n")
	if c.summary != "" {
		b.WriteString("\n" + c.summary + "\n")
	}
	if c.about != "" {
		b.WriteString("\n" + c.about + "\n")
	}
	if hasFlags {
		b.WriteString("\nflags:\n")
		type row struct{ name, doc string }
		var rows []row
		width := 0
		f.VisitAll(func(fl *flag.Flag) {
			arg, doc := flag.UnquoteUsage(fl)
			name := "--" + fl.Name
			if len(fl.Name) == 1 {
				name = "-" + fl.Name
			}
			if arg != "" {
				name += " " + strings.ToUpper(arg)
			}
			if d := fl.DefValue; d != "" && d != "false" && d != "0" {
				doc += fmt.Sprintf(" (default %s)", d)
			}
			width = max(width, len(name))
			rows = append(rows, row{name, doc})
		})
		for _, r := range rows {
			fmt.Fprintf(&b, "  %-*s  %s\n", width, r.name, r.doc)
		}
	}
	io.WriteString(w, b.String())
}

// printErr prints an error once: a positioned error (or list of them) as
// file:line:col lines, anything else after "tremie CMD: ".
func printErr(w io.Writer, cmd string, err error) {
	var list schema.ErrorList
	var one *schema.Error
	switch {
	case errors.As(err, &list) && len(list) > 0:
		fmt.Fprintln(w, list) // with each error's hint
	case errors.As(err, &one):
		fmt.Fprintln(w, schema.ErrorList{one})
	default:
		fmt.Fprintf(w, "tremie %s: %v\n", cmd, err)
	}
}

// exitFor is the exit code a run's wells call for: 2 when a well or a
// path could not be read, else 1 when an unwaived error finding remains,
// else 0.
func exitFor(wells []*pipeline.Well, problems bool) int {
	code := exitOK
	if problems {
		code = exitInput
	}
	for _, w := range wells {
		switch {
		case w.Err != nil:
			code = exitInput
		case code == exitOK && w.Blocking():
			code = exitFindings
		}
	}
	return code
}

// resolve runs pipeline.Resolve for a command and prints what it found
// wrong. ok is false when there is nothing to do (code is then the exit
// code); otherwise code is exitInput when some path or project could not
// be read, else exitOK.
func resolve(cmd string, paths []string, opt pipeline.Options, stderr io.Writer) (run *pipeline.Run, code int, ok bool) {
	opt.Quiet = quiet
	run, err := pipeline.Resolve(paths, opt)
	if err != nil {
		printErr(stderr, cmd, err)
		return &pipeline.Run{Problems: []error{err}}, exitInput, false // the problem, for a JSON report
	}
	for _, e := range run.Problems {
		printErr(stderr, cmd, e)
	}
	if len(run.Inputs) == 0 {
		if len(run.Problems) == 0 {
			fmt.Fprintf(stderr, "tremie %s: no well files found in %s\n", cmd, strings.Join(paths, ", "))
		}
		return run, exitInput, false
	}
	if len(run.Problems) > 0 {
		return run, exitInput, true
	}
	return run, exitOK, true
}
