package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"github.com/tremie-dev/tremie/cmd/internal/batch"
	"github.com/tremie-dev/tremie/schema/quantity"
	"io"
	"strings"

	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

func init() {
	register(&command{
		name:    "check",
		summary: "check well files against the rules of practice",
		run:     runCheck,
	})
}

// checkCaution closes every text report: the check supports, and never
// replaces, a professional's review under the local well code.
const checkCaution = "These checks support, and never replace, review by a licensed professional under the governing local well code; thresholds are defaults to set to the local rules."

// fileResult is the outcome of checking one file: its findings, or the
// errors that kept it from being read.
type fileResult struct {
	Path     string          `json:"file"`
	WellID   string          `json:"well,omitempty"`
	Findings []rules.Finding `json:"findings"`
	Errors   []*schema.Error `json:"-"`
}

// jsonResult is a fileResult as --format json writes it.
type jsonResult struct {
	fileResult
	Readable bool        `json:"readable"`
	Problems []jsonError `json:"errors,omitempty"`
}

// jsonError is one reason a file could not be read.
type jsonError struct {
	Line    int    `json:"line,omitempty"`
	Col     int    `json:"col,omitempty"`
	Key     string `json:"key,omitempty"`
	Message string `json:"message"`
	Hint    string `json:"hint,omitempty"`
}

// Unreadable reports whether the file could not be read or parsed.
func (r fileResult) Unreadable() bool { return len(r.Errors) > 0 }

// checkFile loads and checks one well file. It touches nothing shared, so
// files may be checked in parallel.
func checkFile(path string, prof *rules.Profile) fileResult {
	res := fileResult{Path: path, Findings: []rules.Finding{}}
	w, err := schema.LoadFile(path)
	if err != nil {
		res.Errors = schema.Errors(path, err)
		return res
	}
	res.WellID = w.ID
	res.Findings = rules.Check(w, prof)
	if res.Findings == nil {
		res.Findings = []rules.Finding{}
	}
	return res
}

// checkOptions are the parsed command line of tremie check.
type checkOptions struct {
	format  string
	profile string
	paths   []string
}

// parseInterleaved parses flags that may come before, between or after
// the file arguments.
func parseInterleaved(fset *flag.FlagSet, args []string) ([]string, error) {
	var rest []string
	for {
		if err := fset.Parse(args); err != nil {
			return nil, err
		}
		args = fset.Args()
		if len(args) == 0 {
			return rest, nil
		}
		if args[0] == "--" {
			return append(rest, args[1:]...), nil
		}
		rest = append(rest, args[0])
		args = args[1:]
	}
}

func parseCheckArgs(args []string, stderr io.Writer) (checkOptions, bool) {
	var o checkOptions
	fset := flag.NewFlagSet("check", flag.ContinueOnError)
	fset.SetOutput(stderr)
	fset.StringVar(&o.format, "format", "text", "output format: text or json")
	fset.StringVar(&o.profile, "profile", "", "rule profile TOML setting thresholds and severities")
	fset.Usage = func() {
		fmt.Fprintln(stderr, "usage: tremie check [--format text|json] [--profile FILE] FILE|DIR...")
		fset.PrintDefaults()
	}
	paths, err := parseInterleaved(fset, args)
	if err != nil {
		return o, false
	}
	if o.format != "text" && o.format != "json" {
		fmt.Fprintf(stderr, "tremie check: --format must be text or json, not %q\n", o.format)
		return o, false
	}
	if len(paths) == 0 {
		fmt.Fprintln(stderr, "tremie check: name at least one well file or directory")
		fset.Usage()
		return o, false
	}
	o.paths = paths
	return o, true
}

func runCheck(args []string, stdout, stderr io.Writer) int {
	opts, ok := parseCheckArgs(args, stderr)
	if !ok {
		return exitUsage
	}
	in, findErrs := collectInputs(opts.paths)
	files := in.files
	for _, e := range findErrs {
		fmt.Fprintf(stderr, "tremie check: %v\n", e)
	}
	profile := opts.profile
	if profile == "" {
		profile = in.profile
	}
	var prof *rules.Profile
	if profile != "" {
		p, err := rules.LoadProfile(profile)
		if err != nil {
			fmt.Fprintln(stderr, schema.Errors(profile, err))
			return exitInput
		}
		prof = p
	}
	if in.yields != "" {
		y, err := quantity.LoadYields(in.yields)
		if err != nil {
			fmt.Fprintln(stderr, err)
			return exitInput
		}
		prof = withYields(prof, y)
	}
	if len(files) == 0 && len(findErrs) == 0 {
		fmt.Fprintf(stderr, "tremie check: no well files found in %s\n", strings.Join(opts.paths, ", "))
		return exitInput
	}
	defer lessEagerGC()()
	// Every file on its own worker; results come back in input order, so
	// the report is the same on every run.
	res, _ := batch.Run(files, batch.Options{Progress: batch.Terminal(), Label: "checking"}, func(_ int, f string) (fileResult, batch.Outcome, error) {
		return checkFile(f, prof), batch.Done, nil
	})
	results := make([]fileResult, len(res))
	for i, r := range res {
		results[i] = r.Value
		if r.Err != nil { // a panic caught by the runner
			results[i] = fileResult{Path: files[i], Errors: []*schema.Error{{File: files[i], Msg: r.Err.Error()}}}
		}
	}
	for _, r := range results {
		if len(r.Errors) > 0 {
			fmt.Fprintln(stderr, schema.ErrorList(r.Errors))
		}
	}
	var err error
	if opts.format == "json" {
		err = writeCheckJSON(stdout, results)
	} else {
		err = writeCheckText(stdout, results, prof)
	}
	if err != nil {
		fmt.Fprintf(stderr, "tremie check: writing the report: %v\n", err)
		return exitOutput
	}
	return checkExit(results, len(findErrs) > 0)
}

// checkExit is 2 when any file could not be found, read or parsed, else 1
// when an unwaived error remains, else 0.
func checkExit(results []fileResult, missing bool) int {
	code := exitOK
	if missing {
		code = exitInput
	}
	for _, r := range results {
		switch {
		case r.Unreadable():
			code = exitInput
		case code == exitOK && rules.Blocking(r.Findings):
			code = exitFindings
		}
	}
	return code
}

func writeCheckText(w io.Writer, results []fileResult, prof *rules.Profile) error {
	var b strings.Builder
	var errs, warns, waived, bad, clean int
	for _, r := range results {
		if r.Unreadable() {
			bad++
			continue
		}
		if !rules.Blocking(r.Findings) {
			clean++
		}
		for _, f := range r.Findings {
			fmt.Fprintf(&b, "%s:%d: %s %s: %s\n", r.Path, f.Line, f.Label(), f.Rule, f.Message)
		}
		t := rules.Count(r.Findings)
		errs, warns, waived = errs+t.Errors, warns+t.Warnings, waived+t.Waived
	}
	profName := "default thresholds"
	if prof != nil {
		profName = "profile " + prof.Name
	}
	fmt.Fprintf(&b, "checked %s (%s): %s, %s, %s waived; %d without errors",
		checkCount(len(results), "file"), profName, checkCount(errs, "error"), checkCount(warns, "warning"), fmt.Sprint(waived), clean)
	if bad > 0 {
		fmt.Fprintf(&b, "; %s could not be read", checkCount(bad, "file"))
	}
	caution := checkCaution
	if !prof.IsDefault() {
		caution = rules.Caution(prof) // names the profile, not "defaults"
	}
	b.WriteString("\n" + caution + "\n")
	_, err := io.WriteString(w, b.String())
	return err
}

func writeCheckJSON(w io.Writer, results []fileResult) error {
	out := make([]jsonResult, len(results))
	for i, r := range results {
		out[i] = jsonResult{fileResult: r, Readable: !r.Unreadable()}
		for _, e := range r.Errors {
			out[i].Problems = append(out[i].Problems, jsonError{Line: e.Line, Col: e.Col, Key: e.Key, Message: e.Msg, Hint: e.Hint})
		}
	}
	data, err := json.MarshalIndent(out, "", "  ")
	if err != nil {
		return fmt.Errorf("encoding findings: %w", err)
	}
	_, err = w.Write(append(data, '\n'))
	return err
}

func checkCount(n int, word string) string {
	if n == 1 {
		return "1 " + word
	}
	return fmt.Sprintf("%d %ss", n, word)
}
