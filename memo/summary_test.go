package memo

import (
	"bytes"
	"fmt"
	"math"
	"os"
	"strings"
	"testing"

	"coilmemo/analysis"
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
	j := mustEvaluate(t, "```coil\nname = c1\nform = solenoid\nmean-diameter = 20 mm\nlength = 20 mm\nradial-build = 4 mm\nturns = 400\nwire = AWG 30\ninsulation-class = B\nvoltage = 2 V\n```\n\n```sweep\nvoltage = 2 V .. 72 V step 35 V\n```\n")
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

// A gradient pair's moment and centre field cancel by design: page 1 gives
// them no rows of their own and gives instead the gradient at the centre,
// its ±1 % linear region and the field at that region's edge, from the
// study. Beside another coil the rows stay, the pair's cells saying why
// they are zero.
func TestGradientPairHeadline(t *testing.T) {
	cells := func(tb doc.Table) map[string][]string {
		m := map[string][]string{}
		for _, r := range tb.Rows {
			var v []string
			for _, c := range r[1:] {
				v = append(v, c.Text)
			}
			m[r[0].Text] = v
		}
		return m
	}
	src, err := os.ReadFile("../testdata/figures/gradient-pair.md")
	if err != nil {
		t.Fatal(err)
	}
	j, diags := evaluate("gradient-pair.md", src)
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	rows := cells((&composer{j: j}).summaryTable())
	for label := range rows {
		if strings.HasPrefix(label, "Magnetic moment") || strings.HasPrefix(label, "Field at own centre") {
			t.Errorf("gradient pair alone: row %q %q", label, rows[label])
		}
	}
	cr, pc := j.Results.Coils[0], j.Coils[0].Pair
	if pc == nil || !(pc.EdgeField > 0) {
		t.Fatalf("no field at the edge of the linear region: %+v", pc)
	}
	for label, want := range map[string]string{
		"Axial gradient at centre ∂Bz/∂z":                  Eng(cr.Pair.Gradient, "T/m", judged),
		"Gradient within ±1 %: along the axis / radially":  "±" + Eng(cr.Pair.LinearAxial, "m", 3) + " / ±" + Eng(cr.Pair.LinearRadial, "m", 3),
		"Field |B| on the axis at the edge of that region": Eng(pc.EdgeField, "T", 3),
	} {
		if got := rows[label]; len(got) != 1 || got[0] != want {
			t.Errorf("row %q = %q, want %q", label, got, want)
		}
	}
	// Inside the linear region B ≈ G z on the axis: the edge field is the
	// gradient times the distance to within the region's 1 %.
	if lin := math.Abs(cr.Pair.Gradient) * cr.Pair.LinearAxial; math.Abs(pc.EdgeField-lin) > 0.01*lin {
		t.Errorf("edge field %g T, G·z = %g T", pc.EdgeField, lin)
	}

	mixed := mustEvaluate(t, "```coil\nname = g\nform = pair\nsense = opposing\nmean-diameter = 50 mm\nspacing = 40 mm\nturns = 60\nwire = AWG 24\ncurrent = 1 A\n```\n"+
		"```coil\nname = m\nform = loop\nmean-diameter = 80 mm\nturns = 20\nwire = AWG 24\ncurrent = 1 A\ncentre = (0.3, 0, 0) m\n```\n")
	rows = cells((&composer{j: mixed}).summaryTable())
	if got := rows["Magnetic moment |m|"]; len(got) != 2 || got[0] != "0 (by design)" || got[1] != Eng(mixed.Results.Coils[1].Moment.Norm(), "A·m²", 3) {
		t.Errorf("beside a loop: moment row %q", got)
	}
	if got := rows["Axial gradient at centre ∂Bz/∂z"]; len(got) != 2 || got[1] != "—" {
		t.Errorf("beside a loop: gradient row %q", got)
	}
}

// Page 1 says what the verification checks cover: for a cored coil the
// winding in air and the core's model, with their counts from the study,
// not a bare "all checks agree" that would vouch for the figures with the
// core too; an air coil's sentence is unchanged.
func TestChecksVerdictSaysWhatIsChecked(t *testing.T) {
	verdict := func(file string) (string, []analysis.Check) {
		src, err := os.ReadFile(file)
		if err != nil {
			t.Fatal(err)
		}
		j, diags := evaluate(file, src)
		if len(diags) > 0 {
			t.Fatal(diags)
		}
		var b strings.Builder
		for _, s := range (&composer{j: j}).verdict().Spans {
			b.WriteString(s.Text)
		}
		return b.String(), j.Checks
	}
	text, ks := verdict("../examples/torque-rod.md")
	core := 0
	for _, k := range ks {
		if strings.HasPrefix(k.Name, "core ") {
			core++
		}
	}
	if core == 0 || core == len(ks) {
		t.Fatalf("torque rod: %d core checks of %d", core, len(ks))
	}
	want := fmt.Sprintf("All %d verification checks agree within tolerance: %d of the winding in air and %d of the core's model (demagnetising factor). The figures with the core rest on that model; no check recomputes them by an independent method.",
		len(ks), len(ks)-core, core)
	if !strings.Contains(text, want) {
		t.Errorf("torque rod: page 1 says\n%s\nwant\n%s", text, want)
	}
	text, ks = verdict("../examples/panel-coil.md")
	if want := fmt.Sprintf("All %d verification checks agree within tolerance. ", len(ks)); !strings.Contains(text, want) || strings.Contains(text, "core") {
		t.Errorf("air coil: page 1 says %q", text)
	}
}
