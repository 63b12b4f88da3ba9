package main

import (
	"fmt"
	"io"
	"strings"

	"github.com/tremie-dev/tremie/render/pipeline"
)

func init() {
	register(&command{
		name:    "book",
		summary: "bind a project into one PDF: cover, contents, summary, findings and every well's sheets",
		run:     runBook,
		args:    "PROJECT_DIR",
	})
}

func runBook(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("book", stdout, stderr)
	outFile := fset.String("o", "", "output PDF `file`, - for standard output (default OUTPUT/book.pdf, which replaces only a book tremie wrote)")
	force := fset.Bool("force", false, "replace OUTPUT/book.pdf even if tremie did not write it")
	issue := fset.Bool("issue", false, "bind the issued set: no rule IDs or file lines; refused while any well has unwaived error findings")
	rest, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(rest) != 1 {
		return fset.usageError("name one project directory")
	}
	run, p, wells, code := prepareProject("book", rest[0], stderr)
	if p == nil {
		return code
	}
	if *issue || p.Issue {
		if refused := pipeline.NotIssuable(wells); len(refused) > 0 {
			for _, w := range refused {
				fmt.Fprintf(stderr, "tremie book: %s (%s): not issued: unwaived error findings; resolve or waive them (run tremie check %s)\n", w.Path, w.ID, w.Path)
			}
			fmt.Fprintf(stderr, "tremie book: no issued set while %d %s unwaived errors; tremie book without --issue binds the draft\n", len(refused), plural(len(refused), "well has", "wells have"))
			return exitFindings
		}
	}
	pdf, problems, err := run.Book(p, wells, *issue)
	for _, e := range problems {
		fmt.Fprintln(stderr, e)
		code = worse(code, map[bool]int{true: exitOutput, false: exitInput}[pipeline.IsOutputError(e)])
	}
	if err != nil {
		fmt.Fprintf(stderr, "tremie book: %v\n", err)
		return exitOutput
	}
	if *outFile == stdoutName {
		fmt.Fprintf(stderr, "tremie book: %s bound (%s)\n", counted(len(wells), "well", "wells"), strings.Join(run.ProfileLabels(), "; "))
		return worse(code, toStdout("book", stdout, stderr, pdf, true))
	}
	dst, err := writeProjectOutput(run, *outFile, "book.pdf", pdf, *force)
	if err != nil {
		fmt.Fprintf(stderr, "tremie book: %v\n", err)
		return exitOutput
	}
	fmt.Fprintf(stdout, "tremie book: %s bound into %s (%s)\n", counted(len(wells), "well", "wells"), dst, strings.Join(run.ProfileLabels(), "; "))
	return code
}
