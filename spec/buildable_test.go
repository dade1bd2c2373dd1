package spec

import (
	"strings"
	"testing"
)

// Geometry that cannot be wound, or that the models do not describe, is an
// error at the line of the key that makes it; coils nested without
// touching stay legal.
func TestBuildable(t *testing.T) {
	loop := func(extra string) string {
		return fenced("coil", "name = L\nmean-diameter = 80 mm\nwire = 2 mm\nwire-outer-diameter = 2.1 mm\ncurrent = 1 A\n"+extra)
	}
	cases := []struct {
		name, src string
		line      int    // 0: no error
		msg       string // part of the message
	}{
		// 1700 turns of 2.1 mm wire: a hexagonally packed bundle
		// 2.1 mm · √(1700/0.9069) = 90.9 mm across, on an 80 mm loop.
		{"bundle larger than the loop", loop("turns = 1700\n"), 4, "no less than the mean diameter"},
		// 300 turns: a 37.8 mm bundle, more than a fifth of 80 mm.
		{"bundle too thick for a thin coil", loop("turns = 300\n"), 4, "more than a fifth of the mean diameter"},
		{"thin loop", loop("turns = 50\n"), 0, ""},
		{"pair halves overlap", fenced("coil", "name = P\nform = pair\nmean-diameter = 100 mm\nlength = 30 mm\nradial-build = 5 mm\nturns = 100\nwire = AWG 26\ncurrent = 1 A\nspacing = 20 mm\n"), 10, "the two coils of the pair overlap"},
		{"rectangle with a length", fenced("coil", "name = R\nform = rectangle\nwidth = 100 mm\nheight = 80 mm\nlength = 10 mm\nturns = 50\nwire = AWG 26\ncurrent = 1 A\n"), 6, "does not apply to form = rectangle"},
		{"coaxial coils overlapping", loop("turns = 50\nlength = 20 mm\nradial-build = 13 mm\n") +
			fenced("coil", "name = M\nmean-diameter = 90 mm\nlength = 20 mm\nradial-build = 10 mm\nturns = 50\nwire = AWG 26\ncurrent = 1 A\n"), 11, `coil "L" and coil "M" intersect`},
		{"coaxial coils nested, not touching", loop("turns = 50\nlength = 20 mm\nradial-build = 13 mm\n") +
			fenced("coil", "name = M\nmean-diameter = 140 mm\nlength = 20 mm\nradial-build = 10 mm\nturns = 50\nwire = AWG 26\ncurrent = 1 A\n"), 0, ""},
		{"crossed loops of one size", loop("turns = 20\n") +
			fenced("coil", "name = Y\naxis = y\nmean-diameter = 80 mm\nturns = 20\nwire = AWG 26\ncurrent = 1 A\n"), 9, "intersect"},
		{"crossed loops of different sizes", loop("turns = 20\n") +
			fenced("coil", "name = Y\naxis = y\nmean-diameter = 100 mm\nturns = 20\nwire = AWG 26\ncurrent = 1 A\n"), 0, ""},
	}
	for _, c := range cases {
		_, ds := Parse("b.md", []byte(c.src))
		if c.line == 0 {
			if len(ds) > 0 {
				t.Errorf("%s: unexpected %v", c.name, ds)
			}
			continue
		}
		found := false
		for _, d := range ds {
			if d.Line == c.line && strings.Contains(d.Msg, c.msg) {
				found = true
			}
		}
		if !found {
			t.Errorf("%s: got %v; want line %d %q", c.name, ds, c.line, c.msg)
		}
	}
}

// Sweep steps go through the checks of the key they step, and work bounds
// are positioned errors.
func TestSweepStepsAndWorkBounds(t *testing.T) {
	coil := "name = t\nmean-diameter = 80 mm\nturns = 20\nwire = AWG 32\ncurrent = 0.1 A\nfrequency = 1 kHz\nswitch-off = 1 us\nduty = 50 %\n"
	for _, c := range []struct{ sweep, msg string }{
		{"frequency = -10 .. 10 Hz step 5 Hz", "is not above zero"},
		{"switch-off = 0 .. 10 us step 5 us", "is not above zero"},
		{"spacing = 10 .. 20 mm step 5 mm", "applies only to form = pair"},
		{"wire-outer-diameter = 0.1 .. 0.3 mm step 0.1 mm", "not more than the bare diameter"},
	} {
		_, ds := Parse("s.md", []byte(fenced("coil", coil)+fenced("sweep", c.sweep+"\n")))
		if len(ds) != 1 || ds[0].Line != 12 || !strings.Contains(ds[0].Msg, c.msg) {
			t.Errorf("%s: %v; want line 12 %q", c.sweep, ds, c.msg)
		}
	}
	_, ds := Parse("s.md", []byte(fenced("coil", "name = t\nform = solenoid\nmean-diameter = 80 mm\nlength = 10 m\nradial-build = 50 mm\nturns = 2000000\nwire = AWG 32\ncurrent = 0.1 A\n")))
	found := false
	for _, d := range ds {
		found = found || (d.Line == 7 && strings.Contains(d.Msg, "the most this tool lays out"))
	}
	if !found {
		t.Errorf("2 000 000 turns: %v", ds)
	}
}
