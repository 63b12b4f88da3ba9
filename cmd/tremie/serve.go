package main

import (
	"context"
	"errors"
	"fmt"
	"io"
	"net"
	"os"
	"os/signal"
	"syscall"

	"github.com/tremie-dev/tremie/render/live"
	"github.com/tremie-dev/tremie/schema"
)

func init() {
	register(&command{
		name:    "serve",
		summary: "a local web page of the project's wells, sheets, findings and quantities that follows the files as you edit",
		args:    "[PROJECT_DIR]",
		run:     runServe,
	})
}

func runServe(args []string, stdout, stderr io.Writer) int {
	fset := newFlags("serve", stdout, stderr)
	addr := fset.String("addr", "127.0.0.1:0", "`address` to listen on (port 0: any free port)")
	pos, code, ok := fset.parse(args)
	if !ok {
		return code
	}
	if len(pos) > 1 {
		return fset.usageError("name one project directory")
	}
	dir := operandOr(pos, ".")
	if st, err := os.Stat(dir); err != nil || !st.IsDir() {
		fmt.Fprintf(stderr, "tremie serve: %s is not a directory\n", dir)
		return exitInput
	}
	srv, err := live.New(dir)
	if err != nil {
		fmt.Fprintf(stderr, "tremie serve: %v\n", err)
		return exitInput
	}
	// A broken file does not stop the server: the page lists its problems
	// and follows the files, so the user fixes them and watches the
	// sheets come back. The terminal says the same, at start and after
	// each change that alters them.
	reportProblems(stderr, srv.Problems(), false)
	srv.OnProblems = func(problems []error) { reportProblems(stderr, problems, true) }
	stopNote = "" // the server stops at once, and says "stopped"
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt, syscall.SIGTERM)
	defer stop()
	err = srv.Serve(ctx, *addr, func(a string) {
		url, open := pageURL(a)
		fmt.Fprintf(stdout, "serving %s at %s (Ctrl-C stops)\n", dir, url)
		if open {
			fmt.Fprintln(stdout, "the page listens on every network interface: anyone who reaches this machine at that port sees it")
		}
	})
	if err != nil {
		fmt.Fprintf(stderr, "tremie serve: %v\n", err)
		return exitUsage
	}
	fmt.Fprintln(stdout, "stopped")
	return exitOK
}

// pageURL is the address a browser on this machine opens for the
// listener at addr; open says it listens on every interface (0.0.0.0,
// ::), where the loopback address reaches it and so do other machines.
func pageURL(addr string) (url string, open bool) {
	host, port, err := net.SplitHostPort(addr)
	if ip := net.ParseIP(host); err == nil && ip != nil && ip.IsUnspecified() {
		return "http://" + net.JoinHostPort("127.0.0.1", port) + "/", true
	}
	return "http://" + addr + "/", false
}

// reportProblems prints the input problems of a served project, each with
// its file and line; changed says they follow a change of the files, when
// none left is news too.
func reportProblems(stderr io.Writer, problems []error, changed bool) {
	n := 0
	for _, e := range problems {
		printErr(stderr, "serve", e)
		var list schema.ErrorList
		if errors.As(e, &list) {
			n += len(list)
		} else {
			n++
		}
	}
	switch {
	case n > 0:
		fmt.Fprintf(stderr, "tremie serve: %d %s in the project's files; the page shows them too and follows the files as you fix them\n", n, plural(n, "problem", "problems"))
	case changed:
		fmt.Fprintln(stderr, "tremie serve: the project's files read without problems now")
	}
}
