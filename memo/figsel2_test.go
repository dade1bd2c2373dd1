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

// TestAxisSetRule: a three-axis set gets the moments figure and the
// coupling table; a design of parallel coils does not.
func TestAxisSetRule(t *testing.T) {
	j, d := figureDesign(t, "three-axis-set")
	if !axisSetShown(j) {
		t.Fatal("three-axis set: no moments figure")
	}
	caps, texts := captions(d)
	if !containsPrefix(caps, "Moment vector of each coil of the set") {
		t.Errorf("no moments figure among %q", caps)
	}
	for _, s := range []string{"X coil", "Y coil", "Z coil", "mx", "my", "mz"} {
		if !strings.Contains("|"+texts+"|", "|"+s+"|") {
			t.Errorf("the moments figure lacks %q", s)
		}
	}
	p := prose(d)
	for _, want := range []string{"with nothing along the others", "the moments are 90.0° apart", "The largest cross-coupling is |k| = 0.0641"} {
		if !strings.Contains(p, want) {
			t.Errorf("prose lacks %q", want)
		}
	}
	var table bool
	for _, b := range d.Blocks {
		if tb, ok := b.(doc.Table); ok && strings.HasPrefix(tb.Caption, "Coupling coefficients k between the coils of the set") {
			table = len(tb.Rows) == 3 && tb.Rows[0][1].Text == "1" && tb.Rows[2][1].Text == "0.0641"
		}
	}
	if !table {
		t.Error("no coupling table")
	}
	for _, name := range []string{"aiding-pair", "thin-loop", "x-axis-coil"} {
		j, d := figureDesign(t, name)
		caps, _ := captions(d)
		if axisSetShown(j) || containsPrefix(caps, "Moment vector of each coil") {
			t.Errorf("%s: a moments figure for a design without skew coils", name)
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
// directions (components over each coil's |m|), so the small one shows.
func TestAxisSetDirections(t *testing.T) {
	src := "```coil\nname = big\nmean-diameter = 200 mm\nturns = 200\nwire = AWG 22\ncurrent = 1 A\n```\n" +
		"```coil\nname = small\nmean-diameter = 30 mm\nturns = 10\nwire = AWG 30\naxis = x\ncentre = (300, 0, 0) mm\ncurrent = 0.1 A\n```\n"
	j, diags := evaluate("t.md", []byte(src))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	d := Compose(j)
	caps, texts := captions(d)
	if !containsPrefix(caps, "Direction of each coil's moment") {
		t.Fatalf("moments 10⁴ apart drawn on one scale: %q", caps)
	}
	if !strings.Contains(texts, "Moment component over |m|") {
		t.Errorf("the ordinate is not the normalised component: %q", texts)
	}
	if p := prose(d); !strings.Contains(p, `"big" 6.28 A·m² along z; "small" 707 µA·m² along x`) || !strings.Contains(p, "The largest cross-coupling is |k| < 0.0001,") {
		t.Errorf("the magnitudes are not in the text: %q", p)
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
