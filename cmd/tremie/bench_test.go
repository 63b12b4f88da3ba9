package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"sync"
	"sync/atomic"
	"testing"
	"time"

	"github.com/BurntSushi/toml"

	"github.com/tremie-dev/tremie/cmd/tremie/demo"
	"github.com/tremie-dev/tremie/render/draw"
	"github.com/tremie-dev/tremie/render/out"
	"github.com/tremie-dev/tremie/render/pipeline"
	"github.com/tremie-dev/tremie/render/pipeline/batch"
	"github.com/tremie-dev/tremie/render/sheet"
	"github.com/tremie-dev/tremie/schema"
	"github.com/tremie-dev/tremie/schema/quantity"
	"github.com/tremie-dev/tremie/schema/rules"
	"github.com/tremie-dev/tremie/schema/synth"
	"github.com/tremie-dev/tremie/templates"
)

// wellsPerSecond reports the benchmark's throughput in wells.
func wellsPerSecond(b *testing.B, wellsPerOp int) {
	b.ReportMetric(float64(wellsPerOp*b.N)/b.Elapsed().Seconds(), "wells/s")
}

// BenchmarkLoadAndCheckOneWell: parse a typical synthetic well and run
// every rule on it.
func BenchmarkLoadAndCheckOneWell(b *testing.B) {
	text := synth.Well(1)
	for b.Loop() {
		w, err := schema.Load("w.toml", text)
		if err != nil {
			b.Fatal(err)
		}
		rules.Check(w, nil)
	}
	wellsPerSecond(b, 1)
}

// BenchmarkCheckParallel: the same across every CPU, as check runs a
// project.
func BenchmarkCheckParallel(b *testing.B) {
	texts := make([][]byte, 64)
	for i := range texts {
		texts[i] = synth.Well(i)
	}
	var n atomic.Int64
	b.RunParallel(func(pb *testing.PB) {
		for pb.Next() {
			i := n.Add(1)
			w, err := schema.Load("w.toml", texts[i%64])
			if err != nil {
				b.Fatal(err)
			}
			rules.Check(w, nil)
		}
	})
	wellsPerSecond(b, 1)
}

func typicalDoc(b *testing.B) *sheetDoc {
	b.Helper()
	w, err := schema.Load("w.toml", synth.Well(1))
	if err != nil {
		b.Fatal(err)
	}
	fs := rules.Check(w, nil)
	tpl, err := templates.Load("letter", false)
	if err != nil {
		b.Fatal(err)
	}
	page := sheet.FromTemplate(tpl)
	in := sheet.Inputs{Findings: fs, Quantities: quantity.Compute(w, nil)}
	doc, err := sheet.Layout(w, in, sheet.Options{Page: page, Date: "2026-01-01T00:00:00Z"})
	if err != nil {
		b.Fatal(err)
	}
	return &sheetDoc{w: w, in: in, page: page, doc: doc}
}

type sheetDoc struct {
	w    *schema.Well
	in   sheet.Inputs
	page sheet.Page
	doc  *draw.Document
}

func BenchmarkLayoutOneWell(b *testing.B) {
	d := typicalDoc(b)
	for b.Loop() {
		if _, err := sheet.Layout(d.w, d.in, sheet.Options{Page: d.page}); err != nil {
			b.Fatal(err)
		}
	}
	wellsPerSecond(b, 1)
}

func BenchmarkSVGOneWell(b *testing.B) {
	d := typicalDoc(b)
	for b.Loop() {
		if _, err := out.SVG(d.doc, 0); err != nil {
			b.Fatal(err)
		}
	}
	wellsPerSecond(b, 1)
}

func BenchmarkPDFOneWell(b *testing.B) {
	d := typicalDoc(b)
	for b.Loop() {
		if _, err := out.PDF(d.doc); err != nil {
			b.Fatal(err)
		}
	}
	wellsPerSecond(b, 1)
}

func BenchmarkPNGOneWell(b *testing.B) {
	d := typicalDoc(b)
	for b.Loop() {
		if _, err := out.PNG(d.doc, 0, 150); err != nil {
			b.Fatal(err)
		}
	}
	wellsPerSecond(b, 1)
}

// BenchmarkSVGAndPDFOneWell is the target's unit: lay out one typical
// well and write it as SVG and PDF, one well at a time.
func BenchmarkSVGAndPDFOneWell(b *testing.B) {
	d := typicalDoc(b)
	for b.Loop() {
		doc, err := sheet.Layout(d.w, d.in, sheet.Options{Page: d.page, Date: "2026-01-01T00:00:00Z"})
		if err != nil {
			b.Fatal(err)
		}
		if _, err := out.SVG(doc, 0); err != nil {
			b.Fatal(err)
		}
		if _, err := out.PDF(doc); err != nil {
			b.Fatal(err)
		}
	}
	wellsPerSecond(b, 1)
}

// renderIncremental is tremie render PROJECT_DIR --format svg,pdf
// through the pipeline, as the command runs it but without printing.
func renderIncremental(b *testing.B, dir string, force bool) batch.Summary {
	run, err := pipeline.Resolve([]string{dir}, pipeline.Options{Quiet: true})
	if err != nil || len(run.Problems) > 0 {
		b.Fatal(err, run.Problems)
	}
	formats, err := out.ParseFormats("svg,pdf")
	if err != nil {
		b.Fatal(err)
	}
	rep, err := run.Render(pipeline.RenderOptions{Formats: formats, DPI: 150, Force: force, Version: Version})
	if err != nil {
		b.Fatal(err)
	}
	if rep.SaveErr != nil {
		b.Fatal(rep.SaveErr)
	}
	if rep.Summary.Failed > 0 {
		b.Fatalf("%d wells failed", rep.Summary.Failed)
	}
	return rep.Summary
}

// peakHeap samples the heap while fn runs and reports its peak, in MB:
// runtime.MemStats.HeapInuse, the live heap the process holds.
func peakHeap(b *testing.B, fn func()) {
	var peak atomic.Uint64
	stop := make(chan struct{})
	var wg sync.WaitGroup
	wg.Add(1)
	go func() {
		defer wg.Done()
		var ms runtime.MemStats
		for {
			runtime.ReadMemStats(&ms)
			if ms.HeapInuse > peak.Load() {
				peak.Store(ms.HeapInuse)
			}
			select {
			case <-stop:
				return
			case <-time.After(20 * time.Millisecond):
			}
		}
	}()
	fn()
	close(stop)
	wg.Wait()
	b.ReportMetric(float64(peak.Load())/1e6, "peak-heap-MB")
}

func benchProject(b *testing.B, n int, warm bool) {
	dir := b.TempDir()
	if err := synth.Project(dir, n); err != nil {
		b.Fatal(err)
	}
	if warm {
		renderIncremental(b, dir, false)
	}
	b.ResetTimer()
	peakHeap(b, func() {
		for i := 0; i < b.N; i++ {
			sum := renderIncremental(b, dir, !warm)
			if warm && sum.Skipped != n || !warm && sum.Done != n {
				b.Fatalf("summary %+v", sum)
			}
		}
	})
	wellsPerSecond(b, n)
}

func BenchmarkProject100Cold(b *testing.B)  { benchProject(b, 100, false) }
func BenchmarkProject100Warm(b *testing.B)  { benchProject(b, 100, true) }
func BenchmarkProject1000Cold(b *testing.B) { benchProject(b, 1000, false) }
func BenchmarkProject1000Warm(b *testing.B) { benchProject(b, 1000, true) }

// TestWriteSynthProject writes a synthetic project for measuring the
// real binary (see BENCHMARKS.md): TREMIE_SYNTH_DIR=DIR TREMIE_SYNTH_N=1000.
// It does nothing unless the variable is set.
func TestWriteSynthProject(t *testing.T) {
	dir := os.Getenv("TREMIE_SYNTH_DIR")
	if dir == "" {
		t.Skip("TREMIE_SYNTH_DIR not set")
	}
	n := 1000
	if s := os.Getenv("TREMIE_SYNTH_N"); s != "" {
		if _, err := fmt.Sscan(s, &n); err != nil {
			t.Fatal(err)
		}
	}
	if err := synth.Project(dir, n); err != nil {
		t.Fatal(err)
	}
}

// BenchmarkDecodeOneWell: the TOML parser alone on a typical well, the
// floor under BenchmarkLoadAndCheckOneWell.
func BenchmarkDecodeOneWell(b *testing.B) {
	text := string(synth.Well(1))
	for b.Loop() {
		var raw any
		if _, err := toml.Decode(text, &raw); err != nil {
			b.Fatal(err)
		}
	}
	wellsPerSecond(b, 1)
}

// BenchmarkCheckOneWell: the rules alone on a loaded typical well.
func BenchmarkCheckOneWell(b *testing.B) {
	w, err := schema.Load("w.toml", synth.Well(1))
	if err != nil {
		b.Fatal(err)
	}
	for b.Loop() {
		rules.Check(w, nil)
	}
	wellsPerSecond(b, 1)
}

// BenchmarkCheckCommand1000: tremie check on a 1,000-well project, as the
// command runs it (find the files, read, load and check them on every
// core, write the report), without starting a process.
func BenchmarkCheckCommand1000(b *testing.B) {
	dir := b.TempDir()
	if err := synth.Project(dir, 1000); err != nil {
		b.Fatal(err)
	}
	for b.Loop() {
		if code := runCheck([]string{dir}, io.Discard, io.Discard); code != exitOK {
			b.Fatalf("exit %d", code)
		}
	}
	wellsPerSecond(b, 1000)
}

// benchRenderCommand runs `tremie render WELLS -o OUT --format FORMATS
// --force --quiet` in the process, as compare.sh times the binary (less
// the process start-up), and reports wells per second.
func benchRenderCommand(b *testing.B, wells string, n int, formats string) {
	outDir := b.TempDir()
	for b.Loop() {
		code := run([]string{"render", wells, "-o", outDir, "--format", formats, "--force", "--quiet"}, io.Discard, io.Discard)
		if code != exitOK && code != exitFindings {
			b.Fatalf("exit %d", code)
		}
	}
	wellsPerSecond(b, n)
}

// BenchmarkRenderDemo: the seven demo wells as SVG and PDF, the first
// pair compare.sh times against the matplotlib reference.
func BenchmarkRenderDemo(b *testing.B) {
	dir := b.TempDir()
	if err := demo.Write(dir, true); err != nil {
		b.Fatal(err)
	}
	benchRenderCommand(b, dir+"/wells", 7, "svg,pdf")
}

// BenchmarkRender100: 100 synthetic wells as SVG and PDF, the second
// pair compare.sh times.
func BenchmarkRender100(b *testing.B) {
	dir := b.TempDir()
	if err := synth.Project(dir, 100); err != nil {
		b.Fatal(err)
	}
	benchRenderCommand(b, dir+"/wells", 100, "svg,pdf")
}

// BenchmarkRenderDeepWell: the 1,200-ft, 150-layer gallery well as SVG,
// PDF and PNG (target: under 1 s).
func BenchmarkRenderDeepWell(b *testing.B) {
	benchRenderCommand(b, "../../testdata/gallery/DS-1200.toml", 1, "svg,pdf,png")
}

// BenchmarkCheckVsDecode1000 sets `tremie check` on a 1,000-well project
// beside BurntSushi/toml alone decoding the same files, both as the
// command works (every file read from disk, on every core), in the same
// iteration, so that machine load touches both alike. The target:
// check-per-decode at most 1.3.
func BenchmarkCheckVsDecode1000(b *testing.B) {
	dir := b.TempDir()
	if err := synth.Project(dir, 1000); err != nil {
		b.Fatal(err)
	}
	files, err := filepath.Glob(filepath.Join(dir, "wells", "*.toml"))
	if err != nil || len(files) != 1000 {
		b.Fatalf("%d files, %v", len(files), err)
	}
	var decode, check time.Duration
	for b.Loop() {
		t0 := time.Now()
		_, sum := batch.Run(files, batch.Options{}, func(_ int, f string) (struct{}, batch.Outcome, error) {
			data, err := os.ReadFile(f)
			if err != nil {
				return struct{}{}, batch.Failed, err
			}
			var raw any
			_, err = toml.Decode(string(data), &raw)
			return struct{}{}, batch.Done, err
		})
		if sum.Failed > 0 {
			b.Fatalf("%d files failed to decode", sum.Failed)
		}
		t1 := time.Now()
		if code := runCheck([]string{dir}, io.Discard, io.Discard); code != exitOK {
			b.Fatalf("check: exit %d", code)
		}
		decode += t1.Sub(t0)
		check += time.Since(t1)
	}
	b.ReportMetric(float64(decode.Milliseconds())/float64(b.N), "decode-ms")
	b.ReportMetric(float64(check.Milliseconds())/float64(b.N), "check-ms")
	b.ReportMetric(check.Seconds()/decode.Seconds(), "check/decode")
}
