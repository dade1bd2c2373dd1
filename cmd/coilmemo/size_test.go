package main

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const sizingSpec = "# T\n\n```coil\nname = t\nform = solenoid\nouter-diameter = 60 mm\nlength = 8 mm\nvoltage = 5 V   # bus\n```\n\n" +
	"```size\nturns = 100 .. 400\nwire = AWG 27 .. AWG 32\nradial-build = 0 .. 10 mm\nobjective = minimum power\n```\n\n" +
	"```conditions\ncooling = vacuum\nmount-resistance = 40 K/W\n```\n\n```limits\nmoment >= 0.15 A m2\nmass <= 20 g\n```\n"

// size writes the spec back with the choice; the written spec sizes to
// the same text again (the comment line is replaced, not added), and
// builds.
func TestSizeCommand(t *testing.T) {
	dir := t.TempDir()
	in := filepath.Join(dir, "t.md")
	os.WriteFile(in, []byte(sizingSpec), 0o644)
	var o, e bytes.Buffer
	if err := run([]string{"size", in}, &o, &e); err != nil {
		t.Fatalf("size: %v\n%s", err, e.String())
	}
	out := o.String()
	for _, want := range []string{"turns = ", "wire = AWG ", "radial-build = ", "# chosen: minimum power = ", "voltage = 5 V   # bus"} {
		if !strings.Contains(out, want) {
			t.Errorf("written spec lacks %q:\n%s", want, out)
		}
	}
	if !strings.Contains(e.String(), "minimum power = ") {
		t.Errorf("no summary on stderr: %q", e.String())
	}
	// -o the spec itself updates it in place; a second run changes nothing
	if err := run([]string{"size", in, "-o", in}, &o, &e); err != nil {
		t.Fatal(err)
	}
	first, _ := os.ReadFile(in)
	if string(first) != out {
		t.Errorf("in-place update differs from the standard output")
	}
	if err := run([]string{"size", in, "-o", in}, &o, &e); err != nil {
		t.Fatal(err)
	}
	second, _ := os.ReadFile(in)
	if !bytes.Equal(first, second) || strings.Count(string(second), "# chosen:") != 1 {
		t.Errorf("resizing the sized spec changed it:\n%s", second)
	}
	// the sized spec builds without a warning about replaced values
	e.Reset()
	if err := run([]string{"calc", in}, &o, &e); err != nil || strings.Contains(e.String(), "warning") {
		t.Errorf("calc of the sized spec: %v %q", err, e.String())
	}
}

// A spec without a size block, and one with no feasible choice, are
// usage errors at a line; nothing is written.
func TestSizeCommandErrors(t *testing.T) {
	dir := t.TempDir()
	plain := filepath.Join(dir, "p.md")
	os.WriteFile(plain, []byte("# P\n\n```coil\nmean-diameter = 50 mm\nturns = 10\nwire = AWG 30\ncurrent = 1 A\n```\n"), 0o644)
	infeasible := filepath.Join(dir, "i.md")
	os.WriteFile(infeasible, []byte(strings.Replace(sizingSpec, "moment >= 0.15", "moment >= 50", 1)), 0o644)
	for _, in := range []string{plain, infeasible} {
		out := filepath.Join(dir, "out.md")
		var o, e bytes.Buffer
		err := run([]string{"size", in, "-o", out}, &o, &e)
		if code(err) != 2 {
			t.Errorf("%s: exit %d, want 2", in, code(err))
		}
		msg := e.String() + err.Error()
		if !strings.Contains(msg, filepath.Base(in)+":") {
			t.Errorf("%s: no positioned message: %q", in, msg)
		}
		if _, err := os.Stat(out); err == nil {
			t.Errorf("%s: wrote %s", in, out)
		}
	}
}
