package spec

import (
	"math"
	"strings"
	"testing"

	"coilmemo/calc"
)

func TestTolerancesBroken(t *testing.T) {
	base := fenced("coil", coilBody) // lines 1..6; a tolerances fence opens on line 7
	cases := []struct {
		name, body string
		line       int
		msg        string
	}{
		{"reversed range", "ambient = 60 degC .. -20 degC\n", 8, "reversed or empty"},
		{"percentage without sign", "supply = 5 %\n", 8, `has no sign: write a tolerance as ±5 %`},
		{"key the design lacks", "length = ±1 mm\n", 8, "tolerance on length, but no coil block gives length"},
		{"unknown key", "suply = ±5 %\n", 8, `did you mean "supply"?`},
		{"drive key", "current = ±5 %\n", 8, "supply = ±x %"},
		{"nominal outside range", "ambient = 30 degC .. 60 degC\n", 8, "does not hold the nominal ambient"},
		{"no background field", "background-field = 20 uT .. 50 uT\n", 8, "gives no background-field"},
		{"fractional turns", "turns = ±1.5\n", 8, "whole number of turns"},
		{"samples not a number", "supply = ±5 %\nsamples = many\n", 9, "not a whole number"},
		{"repeated key", "supply = ±5 %\nsupply = ±3 %\n", 9, `duplicate key "supply"`},
		{"empty block", "samples = 10\n", 7, "no tolerance line"},
		{"zero tolerance", "resistivity = ±0 %\n", 8, "greater than zero"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, ds := Parse("t.md", []byte(base+fenced("tolerances", c.body)))
			for _, d := range ds {
				if d.Line == c.line && strings.Contains(d.Msg, c.msg) {
					return
				}
			}
			t.Errorf("want line %d: %q; got\n%s", c.line, c.msg, ds.Error())
		})
	}
}

func TestTolerancesGood(t *testing.T) {
	src := fenced("coil", coilBody) + fenced("conditions", "ambient = 20 degC\nbackground-field = 45 uT\n") +
		fenced("tolerances", "supply = ±5 %\nambient = -20 degC .. 60 degC\nwire-diameter = standard\nresistivity = +-1 %\nturns = ±2\nmean-diameter = ±0.3 mm\nbackground-field = 20 uT .. 50 uT\nsamples = 500\n")
	s, ds := Parse("t.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds)
	}
	tl := s.Tolerances
	if tl == nil || len(tl.Items) != 7 || tl.Samples != 500 {
		t.Fatalf("tolerances %+v", tl)
	}
	want := []struct {
		key    string
		mode   ToleranceMode
		lo, hi float64
	}{
		{"supply", Relative, -0.05, 0.05},
		{"ambient", Range, 253.15, 333.15},
		{"wire-diameter", Standard, 0, 0},
		{"resistivity", Relative, -0.01, 0.01},
		{"turns", Offset, -2, 2},
		{"mean-diameter", Offset, -0.3e-3, 0.3e-3},
		{"background-field", Range, 20e-6, 50e-6},
	}
	for i, w := range want {
		g := tl.Items[i]
		if g.Key != w.key || g.Mode != w.mode || math.Abs(g.Lo-w.lo) > 1e-12*math.Max(1, math.Abs(w.lo)) || math.Abs(g.Hi-w.hi) > 1e-12*math.Max(1, math.Abs(w.hi)) {
			t.Errorf("item %d: got %+v, want %+v", i, g, w)
		}
	}
}

// Entries of the bare-diameter table against the printed table
// (WireToleranceSource: bare copper diameter min / max, inches), and
// against ASTM B258's nominal AWG diameter, which every row must bracket.
func TestWireTolerances(t *testing.T) {
	const inch = 0.0254
	printed := []struct {
		awg      int
		min, max float64 // inches, as printed
	}{
		{6, 0.1604, 0.1633}, {10, 0.1009, 0.1027}, {20, 0.0317, 0.0323},
		{28, 0.0125, 0.0127}, {32, 0.0079, 0.0081}, {36, 0.0049, 0.0051},
	}
	for _, p := range printed {
		lo, hi, ok := WireTolerance(p.awg)
		if !ok || math.Abs(lo-p.min*inch) > 1e-12 || math.Abs(hi-p.max*inch) > 1e-12 {
			t.Errorf("AWG %d: %g .. %g m, printed %g .. %g in", p.awg, lo, hi, p.min, p.max)
		}
	}
	for n := 6; n <= 36; n++ {
		lo, hi, ok := WireTolerance(n)
		d := calc.AWGDiameter(n)
		if !ok || !(lo < d && d < hi) {
			t.Errorf("AWG %d: nominal %.5g mm outside %.5g .. %.5g mm", n, d*1e3, lo*1e3, hi*1e3)
		}
		// the spread is about ±1 % of the nominal diameter (within ±2.5 %)
		if r := (hi - lo) / 2 / d; r < 0.004 || r > 0.025 {
			t.Errorf("AWG %d: half-spread %.2f %% of nominal", n, r*100)
		}
	}
	if _, _, ok := WireTolerance(40); ok {
		t.Error("AWG 40 is outside the table")
	}
}

// Any tolerances block gives positioned diagnostics or a usable block,
// never a panic.
func FuzzTolerances(f *testing.F) {
	for _, s := range []string{"supply = ±5 %\n", "ambient = -20 degC .. 60 degC\nsamples = 20\n", "wire-diameter = standard\n",
		"turns = +-2\nmean-diameter = ±0.3 mm\n", "background-field = 20 .. 50 uT\n", "duty = ±5 %\n", "supply = ±\n", "ambient = ..\n"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, body string) {
		src := fenced("coil", coilBody) + fenced("conditions", "background-field = 45 uT\n") + fenced("tolerances", body)
		s, ds := Parse("f.md", []byte(src))
		for _, d := range ds {
			if d.Line < 1 || d.Msg == "" {
				t.Errorf("bad diagnostic %+v", d)
			}
		}
		if len(ds) == 0 && s.Tolerances != nil {
			for _, it := range s.Tolerances.Items {
				if it.Mode != Standard && !(it.Hi > it.Lo) {
					t.Errorf("empty tolerance %+v", it)
				}
			}
		}
	})
}
