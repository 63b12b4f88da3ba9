package main

import (
	"encoding/json"
	"fmt"
	"io"
	"strings"

	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/rules"
)

func init() {
	register(&command{
		name:    "check",
		summary: "check well files against the rules of practice",
		run:     runCheck,
		args:    "FILE|DIR...",
		about:   "A well file inside a project directory is judged with that project's profile and yields,\nwhether it is named as a file, as the wells folder or as the project.",
	})
}

// fileResult is the outcome of checking one file: its findings, or the
// errors that kept it from being read.
type fileResult struct {
	Path     string          `json:"file"`
	WellID   string          `json:"well,omitempty"`
	Profile  string          `json:"profile"` // the profile in force: "default thresholds" or "profile NAME"
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

// checkOptions are the parsed command line of tremie check.
type checkOptions struct {
	format  string
	profile string
	paths   []string
}

func parseCheckArgs(args []string, stdout, stderr io.Writer) (checkOptions, int, bool) {
	var o checkOptions
	fset := newFlags("check", stdout, stderr)
	format := fset.choice("format", "text", []string{"text", "json"}, "output `format`: text or json")
	fset.StringVar(&o.profile, "profile", "", "rule profile TOML `file` setting thresholds and severities (default: the project's)")
	paths, code, ok := fset.parse(args)
	if !ok {
		return o, code, false
	}
	o.format = *format
	if o.format != "text" && o.format != "json" {
		return o, fset.usageError("--format must be text or json, not %q", o.format), false
	}
	if len(paths) == 0 {
		return o, fset.usageError("name at least one well file or directory"), false
	}
	o.paths = paths
	return o, exitOK, true
}

func runCheck(args []string, stdout, stderr io.Writer) int {
	opts, code, ok := parseCheckArgs(args, stdout, stderr)
	if !ok {
		return code
	}
	run, code, ok := resolve("check", opts.paths, pipeline.Options{Profile: opts.profile}, stderr)
	if !ok {
		if opts.format == "json" && run != nil {
			if err := writeCheckJSON(stdout, unreadableInputs(run.Problems)); err != nil {
				fmt.Fprintf(stderr, "tremie check: writing the report: %v\n", err)
			}
		}
		return code
	}
	wells := run.PrepareAll(pipeline.AllRules, "checking")
	results := make([]fileResult, len(wells))
	for i, w := range wells {
		results[i] = fileResult{Path: w.Path, WellID: w.ID, Findings: w.Findings, Profile: w.Setting.ProfileLabel()}
		if w.Err != nil {
			results[i].Errors = schema.Errors(w.Path, w.Err)
			results[i].Findings = []rules.Finding{}
			fmt.Fprintln(stderr, schema.ErrorList(results[i].Errors))
		}
	}
	var err error
	if opts.format == "json" {
		err = writeCheckJSON(stdout, append(results, unreadableInputs(run.Problems)...))
	} else {
		err = writeCheckText(stdout, results, run.ProfileLabels(), checkCautions(run))
	}
	if err != nil {
		fmt.Fprintf(stderr, "tremie check: writing the report: %v\n", err)
		return exitOutput
	}
	return checkExit(results, len(run.Problems) > 0)
}

// unreadableInputs are the project, profile and yields files among a
// run's problems, each with its errors, for the JSON report.
func unreadableInputs(problems []error) []fileResult {
	var out []fileResult
	for _, e := range problems {
		if list := schema.Errors("", e); list[0].File != "" {
			out = append(out, fileResult{Path: list[0].File, Findings: []rules.Finding{}, Errors: list})
		}
	}
	return out
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

// writeCheckText writes the findings, the tally and, for each profile in
// force, its caution.
func writeCheckText(w io.Writer, results []fileResult, profiles, cautions []string) error {
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
	fmt.Fprintf(&b, "checked %s (%s): %s, %s, %s waived; %d without errors",
		checkCount(len(results), "file"), strings.Join(profiles, "; "), checkCount(errs, "error"), checkCount(warns, "warning"), fmt.Sprint(waived), clean)
	if bad > 0 {
		fmt.Fprintf(&b, "; %s could not be read", checkCount(bad, "file"))
	}
	for _, c := range cautions {
		b.WriteString("\n" + c)
	}
	b.WriteString("\n")
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

// checkCautions are the closing cautions of a check, the words every
// sheet, book and report closes with: one for each profile in force,
// naming it, or the defaults'.
func checkCautions(run *pipeline.Run) []string {
	var out []string
	seen := map[string]bool{}
	for _, s := range run.Settings {
		if c := rules.Caution(s.Profile); !seen[c] {
			seen[c] = true
			out = append(out, c)
		}
	}
	if len(out) == 0 {
		out = append(out, rules.Caution(nil))
	}
	return out
}
