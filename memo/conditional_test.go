package memo

import (
	"bytes"
	"os"
	"regexp"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
)

// proseOf is a spec's text outside its fenced parameter blocks.
func proseOf(t *testing.T, file string) string {
	t.Helper()
	src, err := os.ReadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	return regexp.MustCompile("(?s)```.*?```").ReplaceAllString(string(src), "")
}

// The cooling paragraph says which way each driven coil's axis points as
// the heat balance took it, and a design whose prose calls it vertical
// is cooled as vertical.
func TestCoolingOrientationAsComputed(t *testing.T) {
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		var vertical, horizontal int
		for i, co := range j.Spec.Design.Coils {
			if analysis.IsReceiver(co) || i >= len(j.Coils) {
				continue
			}
			if j.Coils[i].Heat.AxisVertical {
				vertical++
			} else {
				horizontal++
			}
		}
		if strings.Contains(proseOf(t, f), "vertical") && vertical == 0 {
			t.Errorf("%s: the design's text calls it vertical, but no coil is cooled with its axis vertical", f)
		}
		still := !j.Cooling.Vacuum && !j.Cooling.HGiven && !j.Cooling.Covered // covered: no convection computed
		saysVertical := strings.Contains(text, "axis vertical") || strings.Contains(text, "axes vertical")
		saysHorizontal := strings.Contains(text, "axis horizontal") || strings.Contains(text, "axes horizontal")
		switch {
		case !still && (saysVertical || saysHorizontal):
			t.Errorf("%s: the orientation of the axes is stated though no natural convection is computed", f)
		case still && saysVertical != (vertical > 0), still && saysHorizontal != (horizontal > 0):
			t.Errorf("%s: %d coils vertical, %d horizontal; the memo says vertical %v, horizontal %v", f, vertical, horizontal, saysVertical, saysHorizontal)
		}
	}
}

// With the upward direction given, a three-axis set in still air is
// cooled coil by coil: two axes horizontal, one vertical.
func TestCoolingOrientationPerCoil(t *testing.T) {
	src, err := os.ReadFile("../testdata/figures/three-axis-set.md")
	if err != nil {
		t.Fatal(err)
	}
	s := strings.Replace(string(src), "cooling = vacuum", "cooling = still-air\nup = z", 1)
	j := mustEvaluate(t, s)
	text := memoText(t, j)
	want := "The coils sit in still air at the ambient temperature: X coil and Y coil with their axes horizontal, Z coil with its axis vertical."
	if !strings.Contains(strings.Join(strings.Fields(text), " "), want) {
		t.Errorf("want %q in the heating section", want)
	}
	for i, v := range []bool{false, false, true} {
		if j.Coils[i].Heat.AxisVertical != v {
			t.Errorf("coil %d: vertical %v", i, j.Coils[i].Heat.AxisVertical)
		}
	}
}

// Boilerplate is said only where it applies: the still-air density rule
// not in vacuum nor for a coil on a duty cycle alone, no "no iron" for a
// cored coil, no "never saturating" where a saturation flux density is
// stated, no rows of a driven coil's defaults for a pick-up coil, and no
// remark on the design's missing description.
func TestBoilerplateOnlyWhereItApplies(t *testing.T) {
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		flat := strings.Join(strings.Fields(text), " ")
		continuous := false
		for i, co := range j.Spec.Design.Coils {
			if !analysis.IsReceiver(co) && i < len(j.Results.Coils) && j.Results.Coils[i].Duty >= 1 {
				continuous = true
			}
		}
		if rule := strings.Contains(flat, "2–4 A/mm²"); rule && (j.Cooling.Vacuum || !continuous) {
			t.Errorf("%s: the still-air continuous-duty density rule quoted (vacuum %v, any coil continuous %v)", f, j.Cooling.Vacuum, continuous)
		}
		cored, saturation := false, false
		for i, co := range j.Spec.Design.Coils {
			cored = cored || j.Coils[i].Kinds.Core != nil
			saturation = saturation || co.Core.Saturation > 0
		}
		if cored && strings.Contains(flat, "no iron") {
			t.Errorf("%s: a cored design said to have no iron", f)
		}
		if saturation && strings.Contains(flat, "never saturating") {
			t.Errorf("%s: the core said never to saturate although its saturation flux density is stated", f)
		}
		if strings.Contains(flat, "no further description") {
			t.Errorf("%s: remarks on the design's description", f)
		}
		for _, e := range j.Spec.Entries {
			if !e.Default {
				continue
			}
			for i, co := range j.Spec.Design.Coils {
				if co.Name == e.Coil && analysis.IsReceiver(co) && (e.Key == "insulation-class" || e.Key == "duty") {
					if regexp.MustCompile(`\| coil \| ` + e.Key + ` \| \(default\)`).MatchString(text) {
						t.Errorf("%s: pick-up coil %d given a default %s row", f, i, e.Key)
					}
				}
			}
		}
		if (&composer{j: j}).receiverOnly() && regexp.MustCompile(`\| conditions \| (cooling|emissivity|orientation) \| \(default\)`).MatchString(text) {
			t.Errorf("%s: a design of pick-up coils only given default cooling rows", f)
		}
	}
}

// memoText is the text of study j's memo.
func memoText(t *testing.T, j *analysis.Study) string {
	t.Helper()
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Document(j)); err != nil {
		t.Fatal(err)
	}
	return buf.String()
}

// Page 1 says when a winding's turns fill less of its stated radial
// build than it states, with the fill, for every such coil and no other.
func TestUnderfillOnPageOne(t *testing.T) {
	seen := 0
	for _, f := range designFiles(t) {
		j, _ := memoOf(t, f, false)
		if j == nil {
			continue
		}
		var b strings.Builder
		for _, s := range (&composer{j: j}).verdict().Spans {
			b.WriteString(s.Text)
		}
		page1 := b.String()
		for i, co := range j.Spec.Design.Coils {
			says := strings.Contains(page1, `The turns of coil "`+co.Name+`" fill only the inner`) && strings.Contains(page1, "fill factor")
			if says != j.Coils[i].Underfilled {
				t.Errorf("%s, coil %q: underfilled %v, page 1 says so %v", f, co.Name, j.Coils[i].Underfilled, says)
			}
			if j.Coils[i].Underfilled {
				seen++
			}
		}
	}
	if seen == 0 {
		t.Error("no design with an underfilled winding to check")
	}
}

// Page 1's underfill sentence gives the stated section's copper fill
// factor as the method's step (5.6) does.
func TestUnderfillFillFactorsAgree(t *testing.T) {
	j, text := memoOf(t, "../examples/search-coil.md", true)
	want := "of the section they occupy, " + Sig(j.Results.Coils[0].Winding.FillFactor, 2) + " of the stated section"
	if !strings.Contains(text, want) {
		t.Errorf("page 1 does not say %q", want)
	}
}
