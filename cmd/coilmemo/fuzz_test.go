package main

import (
	"bytes"
	"crypto/sha256"
	"flag"
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
	"testing"
	"time"

	"coilmemo/analysis"
	"coilmemo/analysis/report"
	"coilmemo/doc"
	"coilmemo/memo"
)

// pipelineSeeds are small specs, one for each form, kind and block, so
// that a mutant is quick to evaluate: a loop, a solenoid, a rectangle,
// a pair (aiding, opposing), a cored rod, a pick-up coil, a.c., duty and
// on-time, limits with subjects, probes, a sweep, tolerances.
var pipelineSeeds = []string{
	small,
	"# S\n\n```memo\ntitle = S\nrevision = B\nhistory = A | 2026-01-02 | A. Writer | first\nhistory = B | 2026-02-03 | A. Writer | turns\n```\n\n" +
		"```coil\nname = sol\nform = solenoid\nmean-diameter = 30 mm\nlength = 40 mm\nradial-build = 3 mm\nturns = 200\nwire = AWG 28\n" +
		"voltage = 5 V\nduty = 25 %\non-time = 30 s\nswitch-off = 10 us\ndriver-rating = 30 V\n```\n\n" +
		"```conditions\nambient = 30 degC\ncooling = vacuum\nmount-resistance = 20 K/W\n```\n\n" +
		"```limits\ntemperature(sol) <= 120 degC\npower <= 2 W\nuniform-radius(sol, 1 %) >= 1 mm\n```\n",
	"# R\n\n```coil\nform = rectangle\nwidth = 100 mm\nheight = 60 mm\nturns = 20\nwire = 0.5 mm\ncurrent = 1 A\naxis = x\ncentre = (0, 10, 0) mm\n```\n\n" +
		"```probes\np = (0, 0, 20) mm\n```\n\n```limits\nfield(p) >= 1 uT\n```\n",
	"# P\n\n```coil\nname = Z pair\nform = pair\nmean-diameter = 100 mm\nspacing = 50 mm\nturns = 30\nwire = AWG 24\ncurrent = 1 A\nsense = opposing\n```\n\n" +
		"```limits\ngradient(Z pair) >= 1 mT/m\n```\n\n```sweep\ncurrent = 0.5 .. 1.5 A step 0.5 A\n```\n",
	"# H\n\n```coil\nname = H\nform = pair\nmean-diameter = 100 mm\nspacing = 50 mm\nturns = 30\nwire = AWG 24\ncurrent = 1 A\nfrequency = 1 kHz\n```\n\n" +
		"```conditions\nbackground-field = (20, 0, 40) uT\nfield-gradient = 1 mT/m\n```\n\n" +
		"```tolerances\nsupply = ±5 %\nturns = ±1\nambient = 10 degC .. 30 degC\n```\n",
	"# Rod\n\n```coil\nform = solenoid\nmean-diameter = 12 mm\nlength = 60 mm\nturns = 200\nwire = AWG 32\ncurrent = 100 mA\n" +
		"core-permeability = 2000\ncore-saturation = 0.7 T\ncore-remanence = 0.2 T\ncore-coercivity = 2 A/m\ncore-length = 70 mm\ncore-diameter = 6 mm\ncore-density = 8700 kg/m3\n```\n\n" +
		"```limits\ncore-flux-density <= 0.6 T\n```\n",
	"# Pick-up\n\n```coil\nform = solenoid\ninner-diameter = 12 mm\nouter-diameter = 14 mm\nlength = 20 mm\nturns = 100\nwire = AWG 38\n" +
		"frequency = 1 kHz\nband = 10 Hz .. 10 kHz\nload-capacitance = 100 pF\ncore-permeability = 100\ncore-length = 40 mm\ncore-diameter = 10 mm\n```\n\n" +
		"```limits\nsensitivity >= 1 V/T\n```\n",
	"\ufeff# Prose *with* `code`, <b>HTML</b>\n\n- a\n  - b\n\n| a | b |\n|---|---|\n| 1 | 2 |\n\n<div>\n```limits\npower <= 1 W\n```\n\n" +
		"```coil\nform = loop\nmean-diameter = 1 m\nturns = 1\nwire = AWG 10\ncurrent = 10 A\n```\n",
}

// fuzzing reports whether the test binary runs with -test.fuzz (a
// coverage-guided run, not the seed corpus).
func fuzzing() bool {
	f := flag.Lookup("test.fuzz")
	return f != nil && f.Value.String() != ""
}

// FuzzPipeline runs what a build runs — the reader, every calculation,
// the composition of the memo, its text backend, the summary and the
// JSON — on mutated specs, the maps on the coarse grid fuzzMapNodes:
// whatever the reader accepts must compose without a panic, and whatever it refuses is refused with positioned
// messages. The PDF (layout, figures, fonts: 0.1–0.2 s a memo) is
// rendered for every seed, and while fuzzing for one input in 64, chosen
// by the input's hash so that a crasher reproduces; the rest of the
// pipeline takes a few milliseconds for a small spec, so the fuzzer
// explores hundreds of inputs a second.
func FuzzPipeline(f *testing.F) {
	for _, s := range pipelineSeeds {
		f.Add([]byte(s))
	}
	f.Add([]byte(starter))
	f.Add([]byte(broken))
	every := !fuzzing()
	f.Fuzz(func(t *testing.T, src []byte) {
		// Invalid UTF-8 is the reader's first refusal (FuzzParse covers
		// it); mended, more mutants get past the reader to the rest.
		src = bytes.ToValidUTF8(src, []byte("\uFFFD"))
		start := time.Now()
		st, diags := analysis.Run("fuzz.md", src, analysis.Options{Name: "fuzz.md", MapNodes: fuzzMapNodes})
		if len(diags) > 0 {
			for _, d := range diags {
				if d.File != "fuzz.md" || d.Line < 1 || d.Msg == "" {
					t.Fatalf("badly positioned diagnostic %+v", d)
				}
			}
			return
		}
		var buf bytes.Buffer
		warnPlaceholders("fuzz.md", src, &buf)
		d := memo.Document(st)
		if err := doc.WriteText(io.Discard, d); err != nil {
			t.Fatal(err)
		}
		if err := memo.WriteSummary(io.Discard, st); err != nil {
			t.Fatal(err)
		}
		if _, err := report.JSON(st); err != nil {
			t.Fatal(err)
		}
		if h := sha256.Sum256(src); every || h[0]%64 == 0 {
			b, err := memo.PDF(st)
			if err != nil {
				t.Fatal(err)
			}
			if !bytes.HasPrefix(b, []byte("%PDF-")) {
				t.Fatal("not a PDF")
			}
		}
		// Every input under the spec size bound builds in a few
		// seconds (issue 14's work bounds); a generous line for slow
		// machines.
		if el := time.Since(start); el > 20*time.Second {
			t.Errorf("%v for a %d-byte spec: %q", el, len(src), strings.SplitN(string(src), "\n", 2)[0])
		}
	})
}

// The pipeline seeds are sound specs (a seed the reader refuses explores
// nothing past it).
func TestPipelineSeedsSound(t *testing.T) {
	for i, s := range pipelineSeeds {
		if _, diags := analysis.Run("seed.md", []byte(s), analysis.Options{}); len(diags) > 0 {
			t.Errorf("seed %d: %s", i, diags.Error())
		}
	}
}

// fuzzMapNodes is the fuzz targets' map grid (analysis.Options.MapNodes):
// every map, figure and layout path of a build, at about a hundredth of
// the nodes of the memo's maps.
const fuzzMapNodes = 21

// designArgs are FuzzDesign's arguments.
type designArgs struct {
	form    uint8
	turns   uint16
	a, b, c float64
	drive   float64
	opts    uint16
	text    string
}

// designSeeds are FuzzDesign's seeds, one for each form and the blocks.
var designSeeds = []designArgs{
	{0, 10, 80, 0, 0, 0.2, 0, "Small loop"},
	{1, 200, 30, 40, 3, 0.5, 0x1f, "Solenoid *with* sweep"},
	{2, 20, 100, 60, 0, 1, 0x2a, "Rectangle"},
	{3, 30, 100, 50, 0, 1, 0x1c5, "Pair, opposing"},
	{1, 300, 12, 60, 1, 0.1, 0x300, "Cored rod"},
}

// FuzzDesign fuzzes the numbers and choices of a design rather than its
// text: a spec assembled from them (form, turns, dimensions, drive, and
// which blocks it has) gets past the reader far more often than a mutated
// text does, so the calculations, the composition and the layout see
// extreme but accepted designs. The text goes into the title and prose.
// The maps are computed on a coarse grid (fuzzMapNodes), and while
// fuzzing the PDF is rendered for one design in 64.
func FuzzDesign(f *testing.F) {
	for _, d := range designSeeds {
		f.Add(d.form, d.turns, d.a, d.b, d.c, d.drive, d.opts, d.text)
	}
	every := !fuzzing()
	f.Fuzz(func(t *testing.T, form uint8, turns uint16, a, b, c, drive float64, opts uint16, text string) {
		runDesign(t, designSpec(form, turns, a, b, c, drive, opts, text), every)
	})
}

// runDesign runs a build of the design spec src but the file: the reader,
// the calculations at the coarse map grid, the memo's text and the JSON,
// and the PDF when pdf is set or for one spec in 64 (by its hash, so that
// a crasher reproduces).
func runDesign(t testing.TB, src string, pdf bool) {
	start := time.Now()
	st, diags := analysis.Run("fuzz.md", []byte(src), analysis.Options{Name: "fuzz.md", MapNodes: fuzzMapNodes})
	if len(diags) > 0 {
		for _, d := range diags {
			if d.File != "fuzz.md" || d.Line < 1 || d.Msg == "" {
				t.Fatalf("badly positioned diagnostic %+v", d)
			}
		}
		return
	}
	if err := doc.WriteText(io.Discard, memo.Document(st)); err != nil {
		t.Fatal(err)
	}
	if _, err := report.JSON(st); err != nil {
		t.Fatal(err)
	}
	if h := sha256.Sum256([]byte(src)); pdf || h[0]%64 == 0 {
		if _, err := memo.PDF(st); err != nil {
			t.Fatal(err)
		}
	}
	if el := time.Since(start); el > 20*time.Second {
		t.Errorf("%v for the design\n%s", el, src)
	}
}

// designSpec writes a spec from fuzzed numbers; opts' bits add blocks and
// keys: 1 limits, 2 probes, 4 sweep, 8 tolerances, 16 voltage drive, 32
// duty and on-time, 64 a.c., 128 vacuum, 256 a core, 512 background field.
//
// Turns are kept to 1…4096 so that a design evaluates in milliseconds; the
// large windings are the work bounds' business (spec/workbounds.go), not
// the fuzzer's.
func designSpec(form uint8, nturns uint16, a, b, c, drive float64, opts uint16, text string) string {
	turns := int(nturns)%4096 + 1
	var w strings.Builder
	title := strings.ReplaceAll(text, "\n", " ")
	fmt.Fprintf(&w, "# %s\n\n%s\n\n", title, text)
	g := func(v float64) string { return strconv.FormatFloat(v, 'g', -1, 64) }
	w.WriteString("```coil\nname = c1\n")
	switch form % 4 {
	case 0:
		fmt.Fprintf(&w, "form = loop\nmean-diameter = %s mm\n", g(a))
	case 1:
		fmt.Fprintf(&w, "form = solenoid\nmean-diameter = %s mm\nlength = %s mm\n", g(a), g(b))
		if c != 0 {
			fmt.Fprintf(&w, "radial-build = %s mm\n", g(c))
		}
	case 2:
		fmt.Fprintf(&w, "form = rectangle\nwidth = %s mm\nheight = %s mm\n", g(a), g(b))
	case 3:
		fmt.Fprintf(&w, "form = pair\nmean-diameter = %s mm\nspacing = %s mm\n", g(a), g(b))
		if opts&1 != 0 {
			w.WriteString("sense = opposing\n")
		}
	}
	fmt.Fprintf(&w, "turns = %d\nwire = AWG %d\n", turns, 30+int(form/4)%10)
	if opts&16 != 0 {
		fmt.Fprintf(&w, "voltage = %s V\n", g(drive))
	} else {
		fmt.Fprintf(&w, "current = %s A\n", g(drive))
	}
	if opts&32 != 0 {
		fmt.Fprintf(&w, "duty = %s %%\non-time = %s s\n", g(1+math.Mod(math.Abs(c), 99)), g(b))
	}
	if opts&64 != 0 {
		fmt.Fprintf(&w, "frequency = %s Hz\n", g(math.Abs(b)*10))
	}
	if opts&256 != 0 && form%4 < 2 {
		fmt.Fprintf(&w, "core-permeability = %s\ncore-length = %s mm\ncore-diameter = %s mm\n", g(1+math.Abs(c)*100), g(b*1.2), g(a/2))
	}
	w.WriteString("```\n\n```conditions\n")
	if opts&128 != 0 {
		w.WriteString("cooling = vacuum\n")
	}
	if opts&512 != 0 {
		fmt.Fprintf(&w, "background-field = (%s, 0, 40) uT\n", g(c))
	}
	w.WriteString("```\n")
	if opts&1 != 0 {
		fmt.Fprintf(&w, "\n```limits\nmoment >= %s A m2\ntemperature <= 150 degC\nfield(p) >= 1 nT\n```\n", g(c/10))
	}
	if opts&(1|2) != 0 {
		fmt.Fprintf(&w, "\n```probes\np = (0, 0, %s) mm\n```\n", g(c))
	}
	if opts&4 != 0 {
		fmt.Fprintf(&w, "\n```sweep\nturns = %d .. %d step %d\n```\n", max(1, turns/2), turns+1, max(1, turns/4))
	}
	if opts&8 != 0 {
		fmt.Fprintf(&w, "\n```tolerances\nsupply = ±%s %%\nturns = ±1\n```\n", g(0.5+math.Mod(math.Abs(c), 50)))
	}
	return w.String()
}
