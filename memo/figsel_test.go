package memo

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
)

// figureDesign analyses one of the figure-test designs in
// testdata/figures and composes its memo.
func figureDesign(t *testing.T, name string) (*analysis.Study, *doc.Document) {
	t.Helper()
	f := filepath.Join("..", "testdata", "figures", name+".md")
	src, err := os.ReadFile(f)
	if err != nil {
		t.Fatal(err)
	}
	j, diags := evaluate(f, src)
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	return j, Compose(j)
}

// captions lists the memo's figure captions, and texts every string its
// figures draw.
func captions(d *doc.Document) (caps []string, texts string) {
	var all []string
	for _, b := range d.Blocks {
		f, ok := b.(doc.Figure)
		if !ok {
			continue
		}
		caps = append(caps, f.Caption)
		all = append(all, drawnTexts(drawFigure(f))...)
	}
	return caps, strings.Join(all, "|")
}

func prose(d *doc.Document) string {
	var b strings.Builder
	for _, bl := range d.Blocks {
		if p, ok := bl.(doc.Paragraph); ok {
			for _, s := range p.Spans {
				b.WriteString(s.Text)
			}
			b.WriteString("\n")
		}
	}
	return b.String()
}

func countWith(caps []string, part string) int {
	n := 0
	for _, c := range caps {
		if strings.Contains(c, part) {
			n++
		}
	}
	return n
}

// Each design gets the figures of its purpose (the rules in figsel.go).
func TestFigureSelection(t *testing.T) {
	for _, c := range []struct {
		design      string
		want        coilFigures
		moment      bool
		has, hasNot []string // caption parts
		says        []string // lead-in parts
	}{
		{"aiding-pair", coilFigures{Sketch: true, Profile: pairProfile, Homogeneity: true}, false,
			[]string{"Homogeneity of pair", "required uniform radius", "Axial flux density Bz along the axis of pair"},
			[]string{"point-dipole approximation", "Linearity"},
			[]string{"the field stays within 1 % of its centre value out to", "so the requirement is met"}},
		{"gradient-pair", coilFigures{Sketch: true, Profile: pairProfile, Gradient: true}, false,
			[]string{"Axial gradient ∂Bz/∂z along the axis", "the required gradient", "Axial flux density Bz along the axis of pair"},
			[]string{"Homogeneity", "point-dipole approximation"},
			[]string{"passes through zero at the centre", "is met at the centre"}},
		{"long-solenoid", coilFigures{Sketch: true, Profile: boreProfile}, false,
			[]string{"along the bore of coil", "the required centre field"},
			[]string{"point-dipole approximation"},
			[]string{"The field stays within 1 % of its centre value", "at the ends"}},
		{"x-axis-coil", coilFigures{Sketch: true, Profile: boreProfile}, false,
			[]string{"Axial flux density Bx along the bore"}, []string{"Torque magnitude"},
			[]string{"At other angles θ between moment and field the torque is"}},
		{"thin-loop", coilFigures{Sketch: false, Profile: nearProfile}, false,
			[]string{"Axial flux density Bz along the axis of coil"}, []string{"Cross-section", "Torque magnitude", "Warm-up", "point-dipole approximation"},
			[]string{"too small against the coil to be worth a sketch", "so no warm-up curve is drawn", "half of that at ±"}},
		{"rectangle", coilFigures{Sketch: true, Profile: nearProfile}, false,
			[]string{"in plan", "dotted: the coil's plane"}, []string{"along the bore", "point-dipole approximation"}, nil},
		// A moment design too gets no torque figure: |τ| against the angle
		// is the same sine for every design; the text gives m B and the
		// torque at the design angle.
		{"tilted-torquer", coilFigures{Sketch: true, Profile: farProfile}, true,
			[]string{"point-dipole approximation"}, []string{"along the bore", "Torque magnitude"},
			[]string{"largest with the moment at right angles to the field, m B = ", "At other angles θ between moment and field the torque is", "the two curves merge beyond"}},
	} {
		t.Run(c.design, func(t *testing.T) {
			j, d := figureDesign(t, c.design)
			if got := figuresFor(j, 0); got != c.want {
				t.Errorf("figures %+v, want %+v", got, c.want)
			}
			if got := momentDesign(j); got != c.moment {
				t.Errorf("moment design %v, want %v", got, c.moment)
			}
			caps, _ := captions(d)
			for _, h := range c.has {
				if countWith(caps, h) == 0 {
					t.Errorf("no figure captioned %q in %q", h, caps)
				}
			}
			for _, h := range c.hasNot {
				if n := countWith(caps, h); n > 0 {
					t.Errorf("%d figures captioned %q, want none", n, h)
				}
			}
			text := prose(d)
			for _, s := range c.says {
				if !strings.Contains(text, s) {
					t.Errorf("the memo does not say %q", s)
				}
			}
		})
	}
}

// A figure along a coil's axis names that axis: z for a coil along z, the
// coil frame's w along the coil's own axis otherwise, never "Axial
// position z" for a coil along x or a tilted one.
func TestAxisLabels(t *testing.T) {
	for _, c := range []struct {
		design, want, wantNot string
	}{
		{"long-solenoid", "Axial position z (mm)", "coil's axis"},
		{"aiding-pair", "Axial position z (mm)", "coil's axis"},
		{"x-axis-coil", "Axial position w along the coil's axis x (mm)", "Axial position z"},
		// the direction in the caption, not in the label before its unit
		{"tilted-torquer", "Axial position w along the coil's axis (mm)", "Axial position z"},
	} {
		_, d := figureDesign(t, c.design)
		caps, texts := captions(d)
		if c.design == "tilted-torquer" && countWith(caps, "w: position along the coil's axis (0.71, 0.71, 0)") == 0 {
			t.Errorf("%s: no caption gives the axis's direction: %q", c.design, caps)
		}
		if !strings.Contains(texts, c.want) {
			t.Errorf("%s: figures lack %q: %s", c.design, c.want, texts)
		}
		if strings.Contains(texts, c.wantNot) {
			t.Errorf("%s: figures say %q", c.design, c.wantNot)
		}
	}
}

// The torque section draws no figure of the sine |τ| = m B sin θ and
// says instead, with the study's numbers, the peak m B at right angles
// and the torque at the design angle; over every example and figure-test
// design in a background field.
func TestTorqueInWords(t *testing.T) {
	n := 0
	for name, src := range designsForTests(t) {
		j, diags := evaluate(name, src)
		if len(diags) > 0 || j.Spec.Design.Conditions.BackgroundField.Norm() == 0 {
			continue
		}
		n++
		c := &composer{j: j}
		c.torque()
		var text strings.Builder
		for _, b := range c.blocks {
			switch b := b.(type) {
			case doc.Figure:
				t.Errorf("%s: a torque figure %q", name, b.Caption)
			case doc.Paragraph:
				for _, s := range b.Spans {
					text.WriteString(s.Text)
				}
				text.WriteString("\n")
			}
		}
		r := j.Results
		peak := fmt.Sprintf("m B = %s × %s = %s", Eng(r.Moment.Norm(), "A·m²", 4), Eng(j.Spec.Design.Conditions.BackgroundField.Norm(), "T", 3), Eng(r.TorqueMax, "N·m", 4))
		design := "it is " + Eng(r.TorqueDesign, "N·m", 4)
		for _, want := range []string{peak, design, "at right angles"} {
			if !strings.Contains(text.String(), want) {
				t.Errorf("%s: torque section lacks %q:\n%s", name, want, text.String())
			}
		}
	}
	if n == 0 {
		t.Fatal("no design in a background field")
	}
}
