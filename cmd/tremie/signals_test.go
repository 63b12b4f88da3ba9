package main

import (
	"bytes"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"syscall"
	"testing"
	"time"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/pipeline/incremental"
)

// TestMain lets a test run this test binary as the tremie command (with
// its signal handling, exit status and all), by setting TREMIE_AS_MAIN.
func TestMain(m *testing.M) {
	if os.Getenv("TREMIE_AS_MAIN") == "1" {
		main()
		return
	}
	os.Exit(m.Run())
}

// tremieProcess starts the command as a process of its own.
func tremieProcess(t *testing.T, args ...string) (*exec.Cmd, *bytes.Buffer, *bytes.Buffer) {
	t.Helper()
	cmd := exec.Command(os.Args[0], args...)
	cmd.Env = append(os.Environ(), "TREMIE_AS_MAIN=1")
	var stdout, stderr bytes.Buffer
	cmd.Stdout, cmd.Stderr = &stdout, &stderr
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	return cmd, &stdout, &stderr
}

// signalProject is the demo project with 16 more wells (copies of MW-1
// under their own IDs), so that a render is still under way when it is
// stopped; it returns the directory and the number of wells.
func signalProject(t *testing.T) (string, int) {
	t.Helper()
	dir := filepath.Join(t.TempDir(), "site")
	if err := demo.Write(dir, false); err != nil {
		t.Fatal(err)
	}
	mw1, err := os.ReadFile(filepath.Join(dir, "wells", "MW-1.toml"))
	if err != nil {
		t.Fatal(err)
	}
	wells, _ := filepath.Glob(filepath.Join(dir, "wells", "*.toml"))
	n := len(wells)
	for i := range 16 {
		id := fmt.Sprintf("MW-1-%02d", i)
		text := strings.Replace(string(mw1), `id = "MW-1"`, `id = "`+id+`"`, 1)
		if err := os.WriteFile(filepath.Join(dir, "wells", id+".toml"), []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
		n++
	}
	return dir, n
}

// tempFiles are the temporary files of tremie's atomic writes in dir.
func tempFiles(t *testing.T, dir string) []string {
	t.Helper()
	entries, _ := os.ReadDir(dir)
	var l []string
	for _, e := range entries {
		if strings.Contains(e.Name(), ".tmp-") {
			l = append(l, e.Name())
		}
	}
	return l
}

var renderedCount = regexp.MustCompile(`(\d+) rendered, (\d+) unchanged`)

// TestStopOnSignal: a render stopped by SIGINT exits 130 and by SIGTERM
// 143 (128 + the signal's number, the shells' convention: bash(1),
// "EXIT STATUS"), once after finishing the wells under way and once at
// once on a second signal; either way no temporary file is left in the
// output folder, and the next run draws only the wells the stopped one
// did not finish.
func TestStopOnSignal(t *testing.T) {
	if testing.Short() {
		t.Skip("renders a project several times")
	}
	for _, c := range []struct {
		sig    syscall.Signal
		twice  bool
		status int
	}{
		{syscall.SIGINT, false, 130},
		{syscall.SIGTERM, false, 143},
		{syscall.SIGTERM, true, 143},
	} {
		t.Run(fmt.Sprintf("%v twice=%v", c.sig, c.twice), func(t *testing.T) {
			dir, total := signalProject(t)
			outDir := filepath.Join(dir, "out")
			cmd, stdout, stderr := tremieProcess(t, "render", "--format", "svg,pdf", dir)
			// Stop it once it has finished a well: its journal line is written.
			journal := filepath.Join(outDir, incremental.JournalName)
			for deadline := time.Now().Add(60 * time.Second); ; time.Sleep(5 * time.Millisecond) {
				if st, err := os.Stat(journal); err == nil && st.Size() > 0 {
					break
				}
				if time.Now().After(deadline) {
					cmd.Process.Kill()
					t.Fatal("no well finished within a minute")
				}
			}
			cmd.Process.Signal(c.sig)
			if c.twice {
				cmd.Process.Signal(c.sig)
			}
			cmd.Wait()
			if got := cmd.ProcessState.ExitCode(); got != c.status {
				t.Fatalf("exit status %d, want %d\n%s", got, c.status, stderr)
			}
			if tmp := tempFiles(t, outDir); len(tmp) > 0 {
				t.Errorf("temporary files left: %v", tmp)
			}
			if !c.twice && !strings.Contains(stderr.String(), "stopping after the wells under way") {
				t.Errorf("no word of stopping:\n%s", stderr)
			}
			finished := strings.Count(stdout.String(), " → ")
			if finished >= total {
				t.Skipf("all %d wells finished before the signal arrived", total)
			}
			again, stdout2, stderr2 := tremieProcess(t, "render", "--format", "svg,pdf", dir)
			again.Wait()
			m := renderedCount.FindStringSubmatch(stdout2.String() + stderr2.String())
			if m == nil {
				t.Fatalf("re-run: no summary\n%s\n%s", stdout2, stderr2)
			}
			// Stopped once, the run reports every well it finished; stopped
			// at once, it may have finished a well (outputs and journal
			// line written) without saying so, never the reverse.
			var drawn, unchanged int
			fmt.Sscan(m[1], &drawn)
			fmt.Sscan(m[2], &unchanged)
			t.Logf("stopped run finished %d of %d wells; the re-run drew %d", finished, total, drawn)
			if drawn+unchanged != total || unchanged < max(finished, 1) || !c.twice && unchanged != finished {
				t.Errorf("re-run: %d drawn, %d unchanged of %d; the stopped run finished %d", drawn, unchanged, total, finished)
			}
		})
	}
}
