package spec

import (
	"strings"
	"testing"
)

const goodCoil = "```coil\nmean-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 0.5 A\n```\n"

// Invalid UTF-8 and control characters are positioned errors; a byte-order
// mark does not hide the first heading; a parameter block right under a
// line of HTML is still read.
func TestSourceText(t *testing.T) {
	cases := []struct {
		name, src string
		line      int
		msg       string
	}{
		{"invalid byte in prose", "# T\n\nSome \xff prose\n\n" + goodCoil, 3, "column 6: byte 0xFF is not UTF-8"},
		{"truncated sequence in a title", "```memo\ntitle = A\xe2\n```\n" + goodCoil, 2, "byte 0xE2 is not UTF-8"},
		{"escape character", "# T\x1b[31m\n\n" + goodCoil, 1, "column 4: control character U+001B"},
		{"NUL in a value", "```coil\nname = a\x00b\nmean-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 0.5 A\n```\n", 2, "control character U+0000"},
		{"C1 control", "# T \u0085x\n\n" + goodCoil, 1, "control character U+0085"},
		{"fence in an unclosed comment", "# T\n\n" + goodCoil + "<!-- note\n```limits\nmoment >= 1 A m2\n```\n", 10, "inside an HTML comment that opens on line 9"},
		{"fence inside <pre>", "# T\n\n" + goodCoil + "<pre>\n```limits\nmoment >= 1 A m2\n```\n</pre>\n", 10, "inside the HTML block that opens on line 9"},
	}
	for _, c := range cases {
		_, diags := Parse("s.md", []byte(c.src))
		found := false
		for _, d := range diags {
			found = found || d.Line == c.line && strings.Contains(d.Msg, c.msg)
		}
		if !found {
			t.Errorf("%s: want line %d %q, got %v", c.name, c.line, c.msg, diags)
		}
	}

	s, diags := Parse("s.md", []byte("\uFEFF# Heading after a BOM\n\n"+goodCoil))
	if len(diags) > 0 || s.Memo.Title != "Heading after a BOM" {
		t.Errorf("BOM: title %q, %v", s.Memo.Title, diags)
	}
	s, diags = Parse("s.md", []byte("# T\n<div class=\"req\">\n```limits\nmoment >= 0.01 A m2\n```\n\n"+goodCoil))
	if len(diags) > 0 || len(s.Design.Limits) != 1 || s.Design.Limits[0].Line != 4 {
		t.Errorf("limits under a line of HTML: %d limits, %v", len(s.Design.Limits), diags)
	}
	// a commented-out block stays out
	s, diags = Parse("s.md", []byte("# T\n<!--\n```limits\nmoment >= 0.01 A m2\n```\n-->\n\n"+goodCoil))
	if len(diags) > 0 || len(s.Design.Limits) != 0 {
		t.Errorf("commented-out limits: %d limits, %v", len(s.Design.Limits), diags)
	}
}

// A binary file gives a bounded number of diagnostics; an oversized spec is
// refused at once with the bound.
func TestSourceBounds(t *testing.T) {
	bin := make([]byte, 50_000)
	for i := range bin {
		bin[i] = byte(i*7 + 0x80)
	}
	_, diags := Parse("b.md", bin)
	if len(diags) > maxTextDiags+3 || len(diags) < maxTextDiags {
		t.Errorf("binary file: %d diagnostics", len(diags))
	}
	big := []byte(strings.Repeat("word ", MaxSpecBytes/5+1))
	_, diags = Parse("big.md", big)
	if len(diags) != 1 || diags[0].Line != 1 || !strings.Contains(diags[0].Msg, "256000 bytes") {
		t.Errorf("oversized spec: %v", diags)
	}
}

// Values beyond physical bounds are refused with the bound stated, so that
// no search over them runs away (a mean diameter of 1e306 m hung the build).
func TestUpperBounds(t *testing.T) {
	for _, c := range []struct{ line, msg string }{
		{"mean-diameter = 1e306 m", "mean-diameter: 1e306 m is more than 100 m"},
		{"centre = (0, 0, 1e306) m", "component 3 is more than 1000 m"},
		{"switch-off = 1e300 s", "switch-off: 1e300 s is more than"},
		{"frequency = 1e30 Hz", "frequency: 1e30 Hz is more than"},
	} {
		src := "```coil\n" + c.line + "\nmean-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 0.5 A\n```\n"
		if strings.HasPrefix(c.line, "mean-diameter") {
			src = "```coil\n" + c.line + "\nturns = 100\nwire = AWG 28\ncurrent = 0.5 A\n```\n"
		}
		_, diags := Parse("s.md", []byte(src))
		found := false
		for _, d := range diags {
			found = found || d.Line == 2 && strings.Contains(d.Msg, c.msg)
		}
		if !found {
			t.Errorf("%s: want line 2 %q, got %v", c.line, c.msg, diags)
		}
	}
	_, diags := Parse("s.md", []byte("```coil\nmean-diameter = 40 mm\nturns = 100\nwire = AWG 28\ncurrent = 0.5 A\n```\n```probes\nfar = (1e306, 0, 0) m\n```\n"))
	if len(diags) != 1 || diags[0].Line != 8 {
		t.Errorf("far probe: %v", diags)
	}
}
