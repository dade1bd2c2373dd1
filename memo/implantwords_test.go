package memo

import (
	"strings"
	"testing"
	"unicode/utf8"
)

// implantDesigns are designs whose 0.5 mT caution words a case the
// examples do not: an a.c. coil, a rectangle alone and beside a solenoid,
// a set of coils on three axes.
var implantDesigns = map[string]string{
	"a.c. solenoid": "```coil\nname = soak\nform = solenoid\nmean-diameter = 40 mm\nlength = 20 mm\nradial-build = 8 mm\nturns = 400\nwire = AWG 24\ncurrent = 2 A\nfrequency = 50 Hz\n```\n",
	"rectangle":     "```coil\nname = panel\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 60\nwire = AWG 20\ncurrent = 3 A\n```\n",
	"rectangle and solenoid": "```coil\nname = panel\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 60\nwire = AWG 20\ncurrent = 3 A\n```\n\n" +
		"```coil\nname = s\nform = solenoid\nmean-diameter = 40 mm\nlength = 20 mm\nradial-build = 8 mm\nturns = 400\nwire = AWG 24\ncurrent = 1 A\ncentre = (0 mm, 0 mm, 200 mm)\n```\n",
	"three axes": "```coil\nname = x\nform = solenoid\nmean-diameter = 60 mm\nlength = 10 mm\nradial-build = 3 mm\nturns = 100\nwire = AWG 26\ncurrent = 0.5 A\naxis = x\n```\n\n" +
		"```coil\nname = y\nform = solenoid\nmean-diameter = 80 mm\nlength = 10 mm\nradial-build = 3 mm\nturns = 100\nwire = AWG 26\ncurrent = 0.5 A\naxis = y\n```\n\n" +
		"```coil\nname = z\nform = solenoid\nmean-diameter = 100 mm\nlength = 10 mm\nradial-build = 3 mm\nturns = 100\nwire = AWG 26\ncurrent = 0.5 A\n```\n",
}

// The 0.5 mT caution is read by people deciding where to stand: each of
// its sentences stays short, at most 50 words (common practice for
// plain-language safety instructions, not a standard's figure), over every
// example, every golden design and the designs above; a rectangle's
// search is worded with the five planes it runs in, an a.c. coil's region
// as that of its current's peak.
func TestImplantCautionSentences(t *testing.T) {
	specs := specsForTests(t)
	for name, src := range implantDesigns {
		specs[name] = []byte(src)
	}
	checked := 0
	texts := map[string]string{}
	peak := map[string]bool{}
	for name, src := range specs {
		j, diags := evaluate(name, src)
		if len(diags) > 0 {
			if _, own := implantDesigns[name]; own {
				t.Fatalf("%s: %v", name, diags)
			}
			continue // a revision that needs its previous file
		}
		for _, c := range Cautions(j) {
			if !strings.HasPrefix(c.Title, "Field above 0.5 mT") {
				continue
			}
			text := strings.Join(strings.Fields(spanText(c.Spans)), " ")
			if !utf8.ValidString(text) {
				t.Fatalf("%s: invalid UTF-8", name)
			}
			texts[name], peak[name] = text, j.Safety.Implant.Peak
			checked++
			for _, s := range sentences(text) {
				if n := len(strings.Fields(s)); n > 50 {
					t.Errorf("%s: a sentence of %d words in the 0.5 mT caution: %q", name, n, s)
				}
			}
		}
	}
	if checked < len(implantDesigns)+3 {
		t.Fatalf("only %d 0.5 mT cautions found", checked)
	}
	for name, want := range map[string]string{
		"rectangle":              "in five planes: two through its axis along its sides, two through its axis and its diagonals, and its own plane",
		"rectangle and solenoid": "in two planes through its axis (five for a rectangle: also through its diagonals, and its own plane)",
		"three axes":             "in two planes through its axis, and along 162 directions spread over the sphere. Where the coils' fields add, the lines were also turned off those planes.",
		"a.c. solenoid":          "are at the peak of the current, √2 times the r.m.s., against the static-field 0.5 mT",
	} {
		if !strings.Contains(texts[name], want) {
			t.Errorf("%s: the 0.5 mT caution lacks %q:\n%s", name, want, texts[name])
		}
	}
	for name, text := range texts {
		if peak[name] != strings.Contains(text, "at the peak of the current, √2 times the r.m.s.") {
			t.Errorf("%s: the region searched at the a.c. peak %v, but the caution says: %s", name, peak[name], text)
		}
	}
}
