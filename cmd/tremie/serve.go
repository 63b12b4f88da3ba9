package main

import (
	"context"
	"fmt"
	"io"
	"os"
	"os/signal"
	"syscall"

	"github.com/tremie-dev/tremie/render/live"
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
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt, syscall.SIGTERM)
	defer stop()
	err = srv.Serve(ctx, *addr, func(a string) {
		fmt.Fprintf(stdout, "serving %s at http://%s/ (Ctrl-C stops)\n", dir, a)
	})
	if err != nil {
		fmt.Fprintf(stderr, "tremie serve: %v\n", err)
		return exitUsage
	}
	fmt.Fprintln(stdout, "stopped")
	return exitOK
}
