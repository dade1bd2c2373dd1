package main

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// hostileCoil is a sound coil block, for the hostile specs below.
const hostileCoil = "```coil\nname = c1\nform = loop\nmean-diameter = 100 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.5 A\n```\n"

// Hostile specs found by a sweep of broken and oversized inputs: each is
// refused at once with its positioned message, exit status 2, and the memo
// already in the output folder is left as it was.
func TestCLIHostileSpecsRefused(t *testing.T) {
	var many strings.Builder
	many.WriteString("# Many\n\n")
	for i := range 300 {
		fmt.Fprintf(&many, "```coil\nname = c%d\nform = loop\nmean-diameter = 100 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.5 A\ncentre = (0, 0, %d) mm\n```\n\n", i, 10*i)
	}
	for _, c := range []struct{ name, src, msg string }{
		// a lone CR is a line break to the Markdown reader, not to the
		// line count (FuzzParse's crasher)
		{"lone-cr", "```coil\r0\r0=\n", "spec.md:1: column 8: carriage return without a line feed; save the spec with LF or CRLF line endings"},
		// 300 coils took minutes in the pairwise intersection check
		// before the coil bound was reported
		{"coils-300", many.String(), "spec.md:303: more than 30 coil blocks (this is block 31); a spec holds at most 30"},
		// sweep steps are bounded as the keys are
		{"sweep-huge", "# T\n\n" + hostileCoil + "\n```sweep\nmean-diameter = 1 mm .. 1e306 m step 1e305 m\n```\n",
			"spec.md:13: sweep mean-diameter: the step 1e305 m is more than 100 m, the most a spec accepts (coil \"c1\")"},
		{"sweep-turns", "# T\n\n" + hostileCoil + "\n```sweep\nturns = 100 .. 2000000 step 500000\n```\n",
			"spec.md:13: sweep turns: the step 1.0001e6 is more than 1000000 turns, the most this tool lays out (coil \"c1\")"},
		// an ambient of 1e306 °C was accepted and evaluated
		{"ambient-huge", "# T\n\n```conditions\nambient = 1e306 degC\n```\n\n" + hostileCoil,
			"spec.md:4: ambient: 1e306 degC is more than 500 degC, the most a spec accepts"},
		{"tolerance-ambient", "# T\n\n" + hostileCoil + "\n```tolerances\nambient = 10 degC .. 1e306 degC\n```\n",
			"spec.md:13: ambient: the range 10 degC .. 1e306 degC goes above 500 degC, the most a spec accepts"},
	} {
		t.Run(c.name, func(t *testing.T) {
			dir := t.TempDir()
			write(t, filepath.Join(dir, "spec.md"), c.src)
			old := filepath.Join(dir, "out", "spec.pdf")
			write(t, old, "the previous memo")
			start := time.Now()
			for _, cmd := range [][]string{{"build", "spec.md", "-o", "out"}, {"calc", "spec.md"}} {
				cli(t, dir, cmd...).expect(t, 2, c.msg)
			}
			if el := time.Since(start); el > 10*time.Second {
				t.Errorf("refused after %v", el)
			}
			if b, err := os.ReadFile(old); err != nil || string(b) != "the previous memo" {
				t.Errorf("the previous memo was overwritten or removed")
			}
			if n := files(t, filepath.Join(dir, "out")); len(n) != 1 {
				t.Errorf("out holds %v", n)
			}
			noTemps(t, dir)
		})
	}
}
