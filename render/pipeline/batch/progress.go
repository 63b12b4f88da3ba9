package batch

import (
	"io"
	"os"
	"sync"
	"time"

	"github.com/schollz/progressbar/v3"
	"golang.org/x/term"
)

// Terminal returns os.Stderr when it is a terminal and the CI variable is
// unset, else nil: a progress bar is for a person watching, never for a
// log file or a CI log.
func Terminal() io.Writer {
	if os.Getenv("CI") != "" {
		return nil
	}
	if !term.IsTerminal(int(os.Stderr.Fd())) {
		return nil
	}
	return os.Stderr
}

// progress wraps a progress bar so that a nil writer costs nothing.
type progress struct {
	mu  sync.Mutex
	bar *progressbar.ProgressBar
}

func newProgress(w io.Writer, label string, n int) *progress {
	if w == nil || n == 0 {
		return &progress{}
	}
	return &progress{bar: progressbar.NewOptions(n,
		progressbar.OptionSetWriter(w),
		progressbar.OptionSetDescription(label),
		progressbar.OptionShowCount(),
		progressbar.OptionSetWidth(30),
		progressbar.OptionThrottle(100*time.Millisecond), // redraw at most ten times a second: smooth to the eye, cheap on a slow terminal (common practice)
		progressbar.OptionClearOnFinish(),
		progressbar.OptionSetPredictTime(false),
	)}
}

func (p *progress) add() {
	if p.bar == nil {
		return
	}
	p.mu.Lock()
	p.bar.Add(1)
	p.mu.Unlock()
}

func (p *progress) finish() {
	if p.bar == nil {
		return
	}
	p.mu.Lock()
	p.bar.Finish()
	p.mu.Unlock()
}
