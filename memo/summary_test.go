package memo

import (
	"bytes"
	"os"
	"strings"
	"testing"

	"coilmemo/doc"

	"github.com/yuin/goldmark"
	"github.com/yuin/goldmark/extension"
)

// calc's text output is Markdown a code host renders: every table a
// table, every emphasis closed, with the probes and the sweep.
func TestSummaryMarkdown(t *testing.T) {
	for _, c := range []struct {
		file   string
		tables int
		want   []string
	}{
		{"../examples/torque-coil.md", 4, []string{"<th>Probe</th>", "<td>Magnetic moment |m|</td>", "<strong>WARNING</strong> Field above"}},
		{"../examples/bench-solenoid.md", 0, []string{"<h3>Parameter sweep</h3>", "Results at each step of the sweep"}},
	} {
		src, err := os.ReadFile(c.file)
		if err != nil {
			t.Fatal(err)
		}
		j, diags := evaluate(c.file, src)
		if len(diags) > 0 {
			t.Fatal(diags)
		}
		var md bytes.Buffer
		if err := WriteSummary(&md, j); err != nil {
			t.Fatal(err)
		}
		var html bytes.Buffer
		if err := goldmark.New(goldmark.WithExtensions(extension.Table)).Convert(md.Bytes(), &html); err != nil {
			t.Fatal(err)
		}
		h := html.String()
		if n, want := strings.Count(h, "<table>"), strings.Count(md.String(), "|\n| ---"); n != want || n == 0 {
			t.Errorf("%s: %d tables rendered, %d written", c.file, n, want)
		}
		if c.tables > 0 && strings.Count(h, "<table>") != c.tables {
			t.Errorf("%s: %d tables, want %d", c.file, strings.Count(h, "<table>"), c.tables)
		}
		for _, bad := range []string{"**", "\\|", "<p>|"} {
			if strings.Contains(h, bad) {
				t.Errorf("%s: unrendered markup %q in\n%s", c.file, bad, h)
			}
		}
		for _, l := range strings.Split(md.String(), "\n") {
			if strings.HasPrefix(l, "| current (A) |") && strings.Contains(l, "| Current |") {
				t.Errorf("%s: a current sweep shows the current twice: %s", c.file, l)
			}
		}
		for _, w := range c.want {
			if !strings.Contains(h, w) {
				t.Errorf("%s: rendered Markdown lacks %q", c.file, w)
			}
		}
	}
}

// A winding whose heat balance would settle only above copper's melting
// point (1084.62 °C, ITS-90) is not given that figure as a temperature on
// page 1: the verdict says it melts first and the headline table says so.
func TestAboveMeltingOnPageOne(t *testing.T) {
	j := mustEvaluate(t, "```coil\nname = c1\nform = solenoid\nmean-diameter = 6.86 mm\nlength = 872 mm\nradial-build = 6 mm\nturns = 236\nwire = AWG 30\nvoltage = 94.1 V\n```\n")
	cr := j.Results.Coils[0]
	if !cr.Verdict.AboveMelting || !(cr.Temperature > 1357.77) {
		t.Fatalf("verdict %+v at %.1f K", cr.Verdict, cr.Temperature)
	}
	c := &composer{j: j, cautions: Cautions(j)}
	v := spanText(c.verdict().Spans)
	if !strings.Contains(v, "no steady temperature below the melting point of its conductor (1085 °C)") || strings.Contains(v, Eng(Celsius(cr.Temperature), "°C", 3)) {
		t.Errorf("verdict: %s", v)
	}
	for _, co := range c.cautions {
		if strings.Contains(spanText(co.Spans), Eng(Celsius(cr.Temperature), "°C", 3)) {
			t.Errorf("caution %q quotes the extrapolated %s", co.Title, Eng(Celsius(cr.Temperature), "°C", 3))
		}
	}
}

// TestSweepMarksBeyondClass: a sweep row whose winding settles above its
// insulation class carries a mark and the table a note saying the value is
// extrapolated; one above the conductor's melting point quotes no number.
func TestSweepMarksBeyondClass(t *testing.T) {
	j := mustEvaluate(t, "```coil\nname = c1\nform = solenoid\nmean-diameter = 20 mm\nlength = 20 mm\nradial-build = 4 mm\nturns = 400\nwire = AWG 30\ninsulation-class = B\nvoltage = 2 V\n```\n\n```sweep\nvoltage = 2 V .. 62 V step 30 V\n```\n")
	c := &composer{j: j, cautions: Cautions(j)}
	c.sweep()
	var cells []string
	var note bool
	for _, b := range c.blocks {
		switch b := b.(type) {
		case doc.Table:
			for _, r := range b.Rows {
				cells = append(cells, r[len(r)-2].Text) // the hottest winding column
			}
		case doc.Paragraph:
			note = note || strings.HasPrefix(spanText(b.Spans), "† Above the insulation class")
		}
	}
	if len(cells) != 3 || strings.Contains(cells[0], "†") || !strings.HasSuffix(cells[1], "°C †") || cells[2] != "above melting" || !note {
		t.Errorf("hottest winding cells %q, note %v", cells, note)
	}
}
