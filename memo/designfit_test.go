package memo

import (
	"path/filepath"
	"strings"
	"testing"
)

// A cored coil's headline |B| at its centre lies in its core: page 1 names
// it the flux density in the core; an air coil's keeps "field at own
// centre".
func TestCentreLabelInCore(t *testing.T) {
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		c := &composer{j: j}
		idx := c.drivenCoils()
		if len(idx) == 0 {
			continue
		}
		cored := false
		for _, i := range idx {
			cored = cored || j.Coils[i].Kinds.Core != nil
		}
		inCore := strings.Contains(text, "flux density in its core") || strings.Contains(text, "Flux density in the core, at its centre")
		if cored != inCore {
			t.Errorf("%s: cored %v, headline names the core's flux density %v", filepath.Base(f), cored, inCore)
		}
		if !cored && strings.Contains(text, "Magnetic moment |m|") && !strings.Contains(text, "Field at own centre |B|") {
			t.Errorf("%s: an air coil's headline lost \"Field at own centre\"", filepath.Base(f))
		}
	}
}

// The rod's near field is stated from the model that gives it: the
// memo's figure one diameter beyond the end is the spread poles' (with the
// winding's), the two point poles' figure there is given as theirs, and
// the pole strength times the centroid spacing is the core's moment as
// quoted.
func TestRodNearFieldNamesItsModel(t *testing.T) {
	j, text := memoOf(t, "../examples/torque-rod.md", true)
	k := j.Coils[0].Kinds
	r := k.Core
	para := ""
	for _, p := range strings.Split(text, "\n\n") {
		if strings.Contains(p, "pole strength") {
			para = strings.Join(strings.Fields(p), " ")
		}
	}
	for _, want := range []string{
		"the flux density is " + Eng(k.EndField, "T", 3) + ", " + Eng(k.EndFieldCore, "T", 3) + " of it the core's and " + Eng(k.EndFieldWinding, "T", 3) + " the winding's",
		"pole strength of " + Eng(r.PoleStrength, "A·m", 4), Eng(r.PoleSeparation, "m", 4) + " apart",
		"the core's moment, " + Eng(r.CoreMoment, "A·m²", 3),
		"the pair would give " + Eng(k.EndFieldTwoPole, "T", 3),
		"spread along the rod",
	} {
		if !strings.Contains(para, want) {
			t.Errorf("the core's field paragraph lacks %q:\n%s", want, para)
		}
	}
	if strings.Contains(para, "field is that of its poles") {
		t.Errorf("the paragraph still gives the near field to the point poles:\n%s", para)
	}
	if Eng(k.EndFieldTwoPole, "T", 3) == Eng(k.EndFieldCore, "T", 3) {
		t.Errorf("the two models agree at the rod's end (%s): the test no longer tells them apart", Eng(k.EndFieldCore, "T", 3))
	}
}

// One caution per hazard: the field at a rod's end is the implant
// hazard, so it is worded in that caution, and no other caution repeats
// the 0.5 mT level.
func TestRodEndInImplantCaution(t *testing.T) {
	for _, f := range designFiles(t) {
		j, _ := memoOf(t, f, false)
		if j == nil {
			continue
		}
		cs := Cautions(j)
		var at []string
		for _, c := range cs {
			if strings.Contains(spanText(c.Spans), "0.5 mT") {
				at = append(at, c.Title)
			}
		}
		if len(at) > 1 {
			t.Errorf("%s: %d cautions state the 0.5 mT level: %q", filepath.Base(f), len(at), at)
		}
	}
	j, _ := memoOf(t, "../examples/torque-rod.md", true)
	cs := Cautions(j)
	for _, c := range cs {
		if strings.HasPrefix(c.Title, "Strong field at the rod") {
			t.Errorf("separate rod-end caution: %q", c.Title)
		}
		if strings.HasPrefix(c.Title, "Field above 0.5 mT") {
			want := "where |B| = " + Eng(j.Coils[0].Kinds.EndField, "T", 3)
			if !strings.Contains(spanText(c.Spans), want) {
				t.Errorf("the implant caution lacks the rod-end figure %q:\n%s", want, spanText(c.Spans))
			}
		}
	}
}

// Wording that fits the design: no bench where the design states none,
// "with the core" only where a coil has one, and the still-air rule of
// thumb only for a coil open to still air.
func TestWordingFitsDesign(t *testing.T) {
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		name := filepath.Base(f)
		flat := strings.Join(strings.Fields(text), " ")
		if strings.Contains(flat, "on the bench or in the test area") {
			t.Errorf("%s: the implant caution claims a bench", name)
		}
		if j.Cooling.Vacuum && strings.Contains(flat, "Field above 0.5 mT") && !strings.Contains(flat, "The coil works in vacuum, away from people") && !strings.Contains(flat, "The coils work in vacuum, away from people") {
			t.Errorf("%s: in vacuum, the implant caution does not say where people meet the field", name)
		}
		cored := false
		for _, k := range j.Coils {
			cored = cored || k.Kinds.Core != nil
		}
		if strings.Contains(flat, "where there is one") && strings.Contains(flat, "core where") {
			t.Errorf("%s: \"with the core where there is one\"", name)
		}
		if !cored && strings.Contains(flat, "with the core") {
			t.Errorf("%s: no coil has a core, yet the memo says \"with the core\"", name)
		}
		if (j.Cooling.Vacuum || j.Cooling.Covered) && strings.Contains(flat, "common practice, still air") {
			t.Errorf("%s: vacuum %v, covered %v, yet the still-air rule of thumb labels the current density", name, j.Cooling.Vacuum, j.Cooling.Covered)
		}
	}
}

// A covered coil's density caution says the still-air rule is for open
// coils; an open coil's does not.
func TestDensityCautionCovered(t *testing.T) {
	for _, covered := range []bool{true, false} {
		spec := "```coil\nname = c\nmean-diameter = 40 mm\nlength = 10 mm\nradial-build = 5 mm\nturns = 200\nwire = AWG 30\ncurrent = 0.45 A\ninsulation-class = 130 degC\n```\n```conditions\nambient = 25 degC\n"
		if covered {
			spec += "enclosure = covered\n"
		}
		spec += "```\n"
		j := mustEvaluate(t, spec)
		var text string
		for _, c := range Cautions(j) {
			if strings.HasPrefix(c.Title, "Current density above") {
				text = spanText(c.Spans)
			}
		}
		if text == "" {
			t.Fatalf("covered %v: no density caution: %v", covered, titles(Cautions(j)))
		}
		if got := strings.Contains(text, "the air cannot rise past it"); got != covered {
			t.Errorf("covered %v: the caution's cover sentence %v:\n%s", covered, got, text)
		}
	}
}

// A part in the bore that the memo leaves out (unmodelled-core) makes
// the switch-off and field cautions say their figures are lower bounds
// for the assembly; without the key they say nothing of it.
func TestUnmodelledCoreCautions(t *testing.T) {
	j, _ := memoOf(t, "../examples/valve-actuator.md", true)
	if got := j.Spec.Design.Coils[0].UnmodelledCore; got != "plunger" {
		t.Fatalf("unmodelled-core read as %q", got)
	}
	seen := map[string]bool{}
	for _, c := range Cautions(j) {
		text := spanText(c.Spans)
		for _, title := range []string{"Switch-off voltage", "Field above 0.5 mT"} {
			if strings.HasPrefix(c.Title, title) {
				seen[title] = true
				if !strings.Contains(text, "plunger") || !strings.Contains(text, "lower bounds for the assembly") {
					t.Errorf("%s: no lower-bound word on the plunger:\n%s", c.Title, text)
				}
			}
		}
	}
	if len(seen) != 2 {
		t.Errorf("cautions found: %v; want the switch-off and field cautions", seen)
	}
	for _, f := range designFiles(t) {
		j, _ := memoOf(t, f, false)
		if j == nil {
			continue
		}
		any := false
		for _, co := range j.Spec.Design.Coils {
			any = any || co.UnmodelledCore != ""
		}
		for _, c := range Cautions(j) {
			if !any && strings.Contains(spanText(c.Spans), "unmodelled-core") {
				t.Errorf("%s: %s speaks of an unmodelled part the design does not name", filepath.Base(f), c.Title)
			}
		}
	}
}

// The burn hazard is judged where people handle the coil, and the
// caution says at which ambient; a torquer hot only at its orbit's worst
// corner gets a note with that figure, not a caution.
func TestHotSurfaceJudgedWhereHandled(t *testing.T) {
	for _, f := range designFiles(t) {
		j, _ := memoOf(t, f, false)
		if j == nil {
			continue
		}
		amb := Eng(Celsius(j.Safety.Handling.Ambient), "°C", 3)
		for _, c := range Cautions(j) {
			if strings.HasPrefix(c.Title, "Hot surface,") || strings.HasPrefix(c.Title, "Hot surface in service only") {
				text := spanText(c.Spans)
				if !strings.Contains(text, amb) {
					t.Errorf("%s: %s does not say the ambient %s it is judged at:\n%s", filepath.Base(f), c.Title, amb, text)
				}
			}
		}
	}
	j, _ := memoOf(t, "../examples/torque-coil.md", true)
	service, _ := j.HottestSurface(0)
	var note string
	for _, c := range Cautions(j) {
		if strings.HasPrefix(c.Title, "Hot surface,") {
			t.Errorf("torque coil: a hot-surface caution, though handled at %s: %s", Eng(Celsius(j.Safety.Handling.Ambient), "°C", 3), spanText(c.Spans))
		}
		if strings.HasPrefix(c.Title, "Hot surface in service only") {
			note = spanText(c.Spans)
		}
	}
	for _, want := range []string{Eng(Celsius(service), "°C", 3), "in a room at 25.0 °C", Eng(Celsius(j.Safety.Handling.Surface[0].Max), "°C", 3)} {
		if !strings.Contains(note, want) {
			t.Errorf("torque coil: the in-service note lacks %q:\n%s", want, note)
		}
	}
}
