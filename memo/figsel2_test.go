package memo

import (
	"math"
	"os"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilmemo/doc"
)

// TestPlaneFigureRule: a rectangle with probes gets its plane map, with a
// lead-in saying where the field is uniform; one without probes does not.
func TestPlaneFigureRule(t *testing.T) {
	j, d := figureDesign(t, "test-panel")
	if planeShown(j, 0) == nil {
		t.Fatal("test panel: no plane map")
	}
	caps, texts := captions(d)
	found := false
	for _, c := range caps {
		if strings.HasPrefix(c, `Bz of coil "panel" over the plane 50.0 mm`) {
			found = true
		}
	}
	if !found {
		t.Errorf("no plane figure among %q", caps)
	}
	for _, name := range []string{"centre", "east", "north", "corner", "far east"} {
		if !strings.Contains("|"+texts+"|", "|"+name+"|") {
			t.Errorf("probe %q not marked on the map", name)
		}
	}
	p := prose(d)
	for _, want := range []string{"in which the 5 probes lie", "it stays within ±1 % over", "and within ±5 % over",
		"Over the probes it runs from 0 % to +", "Figure 3 maps Bz of coil \"panel\" alone over that plane"} {
		if !strings.Contains(p, want) {
			t.Errorf("prose lacks %q", want)
		}
	}
	// The ±5 % rectangle the text gives is the analysis' region.
	r := j.Design.Planes[0].Within[1]
	if want := "±5 % over " + sizeText(2*r.U, 2*r.V); !strings.Contains(p, want) {
		t.Errorf("prose lacks %q", want)
	}
	j2, d2 := figureDesign(t, "rectangle")
	if planeShown(j2, 0) != nil {
		t.Error("rectangle without probes got a plane map")
	}
	caps2, _ := captions(d2)
	for _, c := range caps2 {
		if strings.Contains(c, "linear; white contours") {
			t.Errorf("rectangle without probes: %q", c)
		}
	}
}

// TestAxisSetRule: a three-axis set gets the moments and the coupling
// table. Its coils are alike and square to one another, so the chart of
// the moments would be three equal bars: a sentence says so instead. With
// one coil driven at two thirds of the current the chart is drawn. The X–Z
// and Y–Z pairs are placed alike about the Z coil, so their |k| tie and
// the text names both. A design of parallel coils gets none of this.
func TestAxisSetRule(t *testing.T) {
	j, d := figureDesign(t, "three-axis-set")
	if !axisSetShown(j) {
		t.Fatal("three-axis set: no moments section")
	}
	caps, _ := captions(d)
	if containsPrefix(caps, "Moment vector of each coil of the set") {
		t.Errorf("three equal moments along x, y and z drawn as a chart: %q", caps)
	}
	p := prose(d)
	for _, want := range []string{"with nothing along the others", "the moments are 90.0° apart",
		"the moments are all of one size, so a chart of their components would be one bar of the same height per coil; it is not drawn",
		`The largest cross-coupling, |k| = 0.0641, is shared by 2 pairs, "X coil" with "Z coil" and "Y coil" with "Z coil"`} {
		if !strings.Contains(p, want) {
			t.Errorf("prose lacks %q", want)
		}
	}
	var table bool
	for _, b := range d.Blocks {
		if tb, ok := b.(doc.Table); ok && strings.HasPrefix(tb.Caption, "Coupling coefficients k between the coils of the set") {
			r := tb.Rows
			table = len(r) == 3 && r[0][1].Text == "1" && r[2][1].Text == "0.0641" &&
				r[0][3].Strong && r[2][1].Strong && r[1][3].Strong && r[2][2].Strong && !r[0][2].Strong
		}
	}
	if !table {
		t.Error("no coupling table with both tied pairs in bold")
	}

	src, err := os.ReadFile(filepath.Join("..", "testdata", "figures", "three-axis-set.md"))
	if err != nil {
		t.Fatal(err)
	}
	y := strings.Index(string(src), "name          = Y coil")
	cur := strings.Index(string(src)[y:], "current       = 60 mA") + y
	unequal := string(src)[:cur] + "current       = 40 mA" + string(src)[cur+len("current       = 60 mA"):]
	d = Compose(mustEvaluate(t, unequal))
	caps, texts := captions(d)
	if !containsPrefix(caps, "Moment vector of each coil of the set") {
		t.Errorf("moments of 34.6, 23.1 and 34.6 mA·m²: no chart among %q", caps)
	}
	for _, s := range []string{"X coil", "Y coil", "Z coil", "mx", "my", "mz"} {
		if !strings.Contains("|"+texts+"|", "|"+s+"|") {
			t.Errorf("the moments figure lacks %q", s)
		}
	}
	if p := prose(d); strings.Contains(p, "it is not drawn") || !strings.Contains(p, "The largest cross-coupling") {
		t.Errorf("unequal moments: %q", p)
	}

	for _, name := range []string{"aiding-pair", "thin-loop", "x-axis-coil"} {
		j, d := figureDesign(t, name)
		caps, _ := captions(d)
		if axisSetShown(j) || containsPrefix(caps, "Moment vector of each coil") {
			t.Errorf("%s: a moments figure for a design without skew coils", name)
		}
	}
}

// TestReaderWords: the memo speaks of coils, windings and pairs, not of
// the program's "coil blocks".
func TestReaderWords(t *testing.T) {
	for _, f := range designFiles(t) {
		_, text := memoOf(t, f, false)
		if i := strings.Index(strings.ToLower(text), "coil block"); i >= 0 {
			t.Errorf("%s: %q", filepath.Base(f), text[max(0, i-60):min(len(text), i+40)])
		}
		if strings.Contains(text, "the block has") {
			t.Errorf("%s: \"the block has\" in the memo", filepath.Base(f))
		}
	}
}

// TestResponseLeadIn: the pick-up response figure's text names the
// working band's edge, the peak and where the model stops. The edge is
// checked against the lumped model's own closed form: with ωRC small,
// |V/B| / (2π f A) = 1/(1 − ω²LC) reaches 1.1 at f = f_sr/√11.
func TestResponseLeadIn(t *testing.T) {
	f := filepath.Join("..", "examples", "search-coil.md")
	src, err := os.ReadFile(f)
	if err != nil {
		t.Fatal(err)
	}
	j, diags := evaluate(f, src)
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	p := prose(Compose(j))
	m := regexp.MustCompile(`Up to about ([0-9.]+) kHz the terminal sensitivity rises in proportion to frequency`).FindStringSubmatch(p)
	if m == nil {
		t.Fatalf("no working band in %q", p)
	}
	edge, _ := strconv.ParseFloat(m[1], 64)
	var fsr float64
	for _, cs := range j.Coils {
		if cs.Kinds.Receiver != nil {
			fsr = cs.Kinds.Receiver.SelfResonance
		}
	}
	want := fsr / math.Sqrt(11) / 1e3
	// The text names the last of 121 log-spaced points inside the band
	// (steps of 7 %), to two figures.
	if !(edge <= want*1.01 && edge >= want*0.9) {
		t.Errorf("band edge %g kHz, the closed form gives %g kHz", edge, want)
	}
	for _, s := range []string{"The straight rise is the working band", "is the self-resonance (16.5 kHz, dotted)",
		"Above it the lumped R–L–C model no longer describes the winding"} {
		if !strings.Contains(p, s) {
			t.Errorf("prose lacks %q", s)
		}
	}
}

func containsPrefix(ss []string, p string) bool {
	for _, s := range ss {
		if strings.HasPrefix(s, p) {
			return true
		}
	}
	return false
}

// TestAxisSetDirections: moments of very different sizes are drawn as
// directions (components over each coil's |m|), so the small one shows;
// when each lies along x, y or z the directions chart is one bar of 1 per
// coil, and a sentence says so instead.
func TestAxisSetDirections(t *testing.T) {
	set := func(axis string) *doc.Document {
		src := "```coil\nname = big\nmean-diameter = 200 mm\nturns = 200\nwire = AWG 22\ncurrent = 1 A\n```\n" +
			"```coil\nname = small\nmean-diameter = 30 mm\nturns = 10\nwire = AWG 30\naxis = " + axis + "\ncentre = (300, 0, 0) mm\ncurrent = 0.1 A\n```\n"
		return Compose(mustEvaluate(t, src))
	}
	d := set("(1, 1, 0)")
	caps, texts := captions(d)
	if !containsPrefix(caps, "Direction of each coil's moment") {
		t.Fatalf("moments 10⁴ apart drawn on one scale: %q", caps)
	}
	if !strings.Contains(texts, "Moment component over |m|") {
		t.Errorf("the ordinate is not the normalised component: %q", texts)
	}
	if p := prose(d); !strings.Contains(p, `"big" 6.28 A·m² along z; "small" 707 µA·m² along (0.71, 0.71, 0)`) || !strings.Contains(p, "The largest cross-coupling is |k| < 0.0001,") {
		t.Errorf("the magnitudes are not in the text: %q", p)
	}
	d = set("x")
	if caps, _ := captions(d); containsPrefix(caps, "Direction of each coil's moment") {
		t.Errorf("moments along z and x: a chart of one bar of 1 per coil drawn")
	}
	if p := prose(d); !strings.Contains(p, `"big" 6.28 A·m² along z; "small" 707 µA·m² along x`) ||
		!strings.Contains(p, "a chart of the components over |m| would be one bar of 1 per coil; it is not drawn") {
		t.Errorf("moments along z and x: %q", p)
	}
}

// The point-dipole distances get their table where the far field serves
// the design (a torquer, a probe far out), and one sentence elsewhere (a
// calibration solenoid's bore, a pair's homogeneous region).
func TestDipoleTableWhereTheFarFieldServes(t *testing.T) {
	for _, tc := range []struct {
		file  string
		table bool
	}{{"../examples/bench-solenoid.md", false}, {"../examples/calibration-pair.md", false}, {"../examples/torque-coil.md", true}, {"../examples/torque-rod.md", true}, {"../testdata/figures/tilted-torquer.md", true}} {
		_, text := memoOf(t, tc.file, true)
		table := strings.Contains(text, "Table: Distance beyond which the point-dipole field")
		sentence := strings.Contains(text, "to within 1 % beyond")
		if table != tc.table || sentence == tc.table {
			t.Errorf("%s: dipole table %v, one sentence %v; want the table %v", tc.file, table, sentence, tc.table)
		}
	}
}
