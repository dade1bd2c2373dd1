package memo

import (
	"bytes"
	"coilmemo/analysis"
	"fmt"
	"math"
	"strings"
	"testing"

	"coilmemo/calc"
	"coilmemo/doc"
)

// The plane sections of coils on the three axes sit where their windings
// cross the xz-plane; an oblique coil is not drawn.
func TestPlaneSections(t *testing.T) {
	wire := calc.Wire{Bare: 0.5e-3, Outer: 0.55e-3, Material: calc.Copper()}
	base := calc.Coil{Form: calc.Solenoid, MeanDiameter: 0.04, Length: 0.02, RadialBuild: 4e-3, Turns: 100, Wire: wire}

	z := base
	z.Axis = calc.Vec{0, 0, 1}
	s, ok := planeSections(z, studyOf(z))
	if !ok || len(s) != 2 {
		t.Fatalf("z-axis coil: %d sections, ok %v; want 2", len(s), ok)
	}
	for _, sec := range s {
		// Axial extent along the map's horizontal (z), radial along x.
		if math.Abs(sec.X1-sec.X0-0.02) > 1e-9 || math.Abs(math.Abs(sec.Y0+sec.Y1)/2-0.02) > 1e-9 {
			t.Errorf("z-axis section %+v: want 20 mm long at |x| = 20 mm", sec)
		}
	}

	x := base
	x.Axis = calc.Vec{1, 0, 0}
	s, _ = planeSections(x, studyOf(x))
	for _, sec := range s {
		if math.Abs(sec.Y1-sec.Y0-0.02) > 1e-9 || math.Abs(math.Abs(sec.X0+sec.X1)/2-0.02) > 1e-9 {
			t.Errorf("x-axis section %+v: want 20 mm long in x at |z| = 20 mm", sec)
		}
	}

	y := base
	y.Axis = calc.Vec{0, 1, 0}
	s, ok = planeSections(y, studyOf(y))
	if !ok || len(s) < 90 {
		t.Fatalf("y-axis coil: %d ring sections, ok %v", len(s), ok)
	}
	for _, sec := range s {
		r := math.Hypot((sec.X0+sec.X1)/2, (sec.Y0+sec.Y1)/2)
		if math.Abs(r-0.02) > 1e-9 {
			t.Fatalf("ring section at radius %g, want the mean radius 0.02", r)
		}
	}
	y.Centre = calc.Vec{0, 0.05, 0} // 50 mm off the plane: not cut
	if s, _ := planeSections(y, studyOf(y)); len(s) != 0 {
		t.Errorf("a y-axis coil 50 mm off the plane gave %d sections", len(s))
	}

	o := base
	o.Axis = calc.Vec{1, 0, 1}
	if _, ok := planeSections(o, studyOf(o)); ok {
		t.Error("an oblique coil reported drawable")
	}
}

// studyOf analyses one coil alone at 1 A.
func studyOf(co calc.Coil) *analysis.CoilStudy {
	co.Drive, co.Current = calc.CurrentDrive, 1
	d := calc.Design{Coils: []calc.Coil{co}}
	r := calc.Evaluate(d)
	cs := analysis.StudyCoil(co, r.Coils[0], d.Conditions)
	return &cs
}

// The map of all coils says how each undrawn winding meets the xz-plane as
// the analysis found it (DesignStudy.Crossing): a stack of loops on an
// axis in that plane crosses it at right angles, not obliquely; on an
// axis out of it, obliquely. Also over every design.
func TestUndrawnWindingsCrossAsComputed(t *testing.T) {
	stack := func(axis string) string {
		var b strings.Builder
		for i, c := range []string{"(-20, 0, -20)", "(0, 0, 0)", "(20, 0, 20)"} {
			if axis == "(1, 1, 0)" {
				c = []string{"(-20, -20, 0)", "(0, 0, 0)", "(20, 20, 0)"}[i]
			}
			fmt.Fprintf(&b, "```coil\nname = %c\nform = loop\nmean-diameter = 80 mm\nturns = 20\nwire = AWG 22\ncurrent = 1 A\naxis = %s\ncentre = %s mm\n```\n\n", 'A'+i, axis, c)
		}
		return b.String()
	}
	check := func(name string, st *analysis.Study, text string) {
		flat := strings.Join(strings.Fields(text), " ")
		for i, co := range st.Spec.Design.Coils {
			a := st.Design.Crossing[i]
			q := fmt.Sprintf("%q", co.Name)
			for _, w := range []string{"cross this plane obliquely", "cross this plane at right angles"} {
				k := strings.Index(flat, w)
				if k < 0 {
					continue
				}
				start := strings.LastIndex(flat[:k], "The windings of ")
				if semi := strings.LastIndex(flat[:k], "; the windings of "); semi > start {
					start = semi
				}
				if !strings.Contains(flat[start:k], q) {
					continue
				}
				right := a > 89.5*math.Pi/180
				if (w == "cross this plane obliquely") == right || math.IsNaN(a) {
					t.Errorf("%s, coil %s: %q but it crosses at %.1f°", name, q, w, a*180/math.Pi)
				}
			}
		}
	}
	for _, axis := range []string{"(1, 0, 1)", "(1, 1, 0)"} {
		j := mustEvaluate(t, stack(axis))
		var buf bytes.Buffer
		if err := doc.WriteText(&buf, Document(j)); err != nil {
			t.Fatal(err)
		}
		text := buf.String()
		check("stack on "+axis, j, text)
		want := map[string]string{"(1, 0, 1)": "cross this plane at right angles", "(1, 1, 0)": "cross this plane obliquely"}[axis]
		if !strings.Contains(strings.Join(strings.Fields(text), " "), want) {
			t.Errorf("stack on %s: %q not said", axis, want)
		}
	}
	for _, f := range designFiles(t) {
		if st, text := memoOf(t, f, false); st != nil {
			check(f, st, text)
		}
	}
}

// A plane map's caption and text speak of probe dots only when probes are
// drawn on it (analysis PlaneMap.Probes). Over every design, and a panel
// with a test plane and no probes.
func TestPlaneMapDotsOnlyWhenDrawn(t *testing.T) {
	check := func(name string, st *analysis.Study, text string) int {
		flat := strings.Join(strings.Fields(text), " ")
		seen := 0
		for i, co := range st.Spec.Design.Coils {
			if i >= len(st.Design.Planes) || st.Design.Planes[i] == nil {
				continue
			}
			k := strings.Index(flat, fmt.Sprintf("of coil %q alone over that plane", co.Name))
			if k < 0 {
				continue
			}
			seen++
			s := flat[k:]
			e := strings.Index(s, "dashed: the coil's mean turn")
			if e < 0 {
				t.Errorf("%s, coil %q: no plane map caption", name, co.Name)
				continue
			}
			s = s[:e+len("dashed: the coil's mean turn")+20]
			drawn := len(st.Design.Planes[i].Probes) > 0
			said := strings.Contains(s, "probes are marked") || strings.Contains(s, "probe is marked")
			dots := strings.Contains(s, "dots: probes") || strings.Contains(s, "dot: the probe")
			if said != drawn || dots != drawn {
				t.Errorf("%s, coil %q: %d probes drawn, but the text: %s", name, co.Name, len(st.Design.Planes[i].Probes), s)
			}
		}
		return seen
	}
	for _, f := range designFiles(t) {
		if st, text := memoOf(t, f, false); st != nil {
			check(f, st, text)
		}
	}
	// A panel with a test plane and no probes: its plane map has no dots.
	st := mustEvaluate(t, "```coil\nname = panel\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 40\nwire = AWG 22\ncurrent = 1 A\ntest-plane = 50 mm\n```\n")
	var buf bytes.Buffer
	if err := doc.WriteText(&buf, Document(st)); err != nil {
		t.Fatal(err)
	}
	if check("panel without probes", st, buf.String()) == 0 {
		t.Error("panel with a test plane: no plane map")
	}
}
