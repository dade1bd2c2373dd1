package memo

import (
	"bytes"
	"fmt"
	"math"
	"strconv"
	"strings"
	"testing"

	"coilmemo/doc"
)

// Every form and sense builds a complete PDF, the field section refers to
// each figure before it and numbers them in order.
func TestFieldSectionForms(t *testing.T) {
	coils := map[string]string{
		"thin loop":     "form = loop\nmean-diameter = 60 mm\nturns = 30\nwire = AWG 26\ncurrent = 0.2 A",
		"multilayer":    "form = solenoid\nmean-diameter = 40 mm\nlength = 10 mm\nradial-build = 4 mm\nturns = 120\nwire = AWG 26\nwire-outer-diameter = 0.45 mm\ncurrent = 0.2 A",
		"single layer":  "form = solenoid\nmean-diameter = 20 mm\nlength = 60 mm\nturns = 100\nwire = AWG 26\ncurrent = 0.2 A",
		"rectangle":     "form = rectangle\nwidth = 80 mm\nheight = 50 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.2 A",
		"aiding pair":   "form = pair\nmean-diameter = 100 mm\nspacing = 50 mm\nturns = 20\nwire = AWG 26\ncurrent = 0.2 A",
		"opposing pair": "form = pair\nmean-diameter = 100 mm\nspacing = 87 mm\nsense = opposing\nturns = 20\nwire = AWG 26\ncurrent = 0.2 A",
	}
	for name, body := range coils {
		t.Run(name, func(t *testing.T) {
			t.Parallel()
			src := "# T\n\n```memo\ndate = 2026-01-02\n```\n\n```coil\nname = c\n" + body + "\n```\n"
			j, diags := evaluate("spec.md", []byte(src))
			if len(diags) > 0 {
				t.Fatalf("spec problems: %v", diags)
			}
			d := Document(j)
			// Each figure of the field section is announced in a paragraph
			// before it, and figures are numbered 1, 2, … in order.
			seen := map[int]bool{}
			last := 0
			for _, b := range d.Blocks {
				switch b := b.(type) {
				case doc.Paragraph:
					for _, s := range b.Spans {
						for n := last + 1; n < last+4; n++ {
							if strings.Contains(s.Text, "Figure "+strconv.Itoa(n)) || strings.Contains(s.Text, "Figures "+strconv.Itoa(n)) {
								seen[n] = true
							}
						}
					}
				case doc.Figure:
					if b.Number != last+1 {
						t.Errorf("figure %d follows %d", b.Number, last)
					}
					last = b.Number
					if !seen[b.Number] {
						t.Errorf("figure %d (%s) not referred to before it", b.Number, b.Caption)
					}
				}
			}
			pdf, err := PDF(j)
			if err != nil || !bytes.HasPrefix(pdf, []byte("%PDF-")) {
				t.Fatalf("PDF: %v", err)
			}
		})
	}
}

// The axis figure's text says which way the point dipole departs from the
// exact field nearer than its 1 % distance as the profile computed it
// (analysis AxisProfile.DipoleNear), over every design.
func TestDipoleNearWordedAsComputed(t *testing.T) {
	for _, f := range designFiles(t) {
		st, text := memoOf(t, f, false)
		if st == nil {
			continue
		}
		for i, co := range st.Spec.Design.Coils {
			p := st.Coils[i].Axis
			k := strings.Index(text, fmt.Sprintf("shows the flux density along the axis of coil %q, with the field of a point dipole", co.Name))
			if k < 0 || math.IsNaN(p.Dipole1pc) {
				continue
			}
			s := text[k:]
			s = s[:strings.Index(s, ".\n")+1]
			if e := strings.Index(s, "exact field; "); e >= 0 {
				s = s[e:]
			}
			want := map[int]string{1: "overstates", -1: "understates", 0: "differ by more than 1 %"}[p.DipoleNear]
			for _, w := range []string{"overstates", "understates", "differ by more than 1 %"} {
				if strings.Contains(s, w) != (w == want) {
					t.Errorf("%s, coil %q: dipole near the winding %d, but the text: %s", f, co.Name, p.DipoleNear, s)
				}
			}
		}
	}
}

// A coil's map is not said to be strongest next to the winding unless the
// analysis found its strongest node there; the text gives that node's
// value (analysis MapData.Peak). Over every design.
func TestMapPeakWordedAsComputed(t *testing.T) {
	for _, f := range designFiles(t) {
		st, text := memoOf(t, f, false)
		if st == nil {
			continue
		}
		flat := strings.Join(strings.Fields(text), " ")
		if strings.Contains(flat, "The field is strongest next to the winding;") {
			t.Errorf("%s: the map's strongest point asserted, not computed", f)
		}
		for i, co := range st.Spec.Design.Coils {
			m := st.Coils[i].Map
			k := strings.Index(flat, fmt.Sprintf("maps the magnitude of the flux density of coil %q alone", co.Name))
			if m == nil || k < 0 {
				continue
			}
			s := flat[k:]
			s = s[:strings.Index(s, "on the map's edge.")]
			want := Eng(m.Peak, "T", 3)
			if !strings.Contains(s, "strongest") || !strings.Contains(s, want) {
				t.Errorf("%s, coil %q: the map's peak %s not given: %s", f, co.Name, want, s)
			}
			if strings.Contains(s, "strongest next to the winding") && !(m.PeakNear && !m.PeakBore && !m.PeakCore) {
				t.Errorf("%s, coil %q: 'next to the winding', but the peak node (bore %v, near %v, core %v): %s", f, co.Name, m.PeakBore, m.PeakNear, m.PeakCore, s)
			}
		}
	}
}

// A thin or rectangular winding is modelled as filaments, whose field has
// no bound among the conductors: the map's peak is taken outside them, so
// for a thin bundle it stays below μ0 N I/(2π r_b), the field at the surface of
// a straight bundle of radius r_b carrying N I (Ampère's law, e.g.
// Jackson, Classical Electrodynamics, 3rd ed., §5.3), times 1.5 for the
// bundle's curvature and the rest of the loop.
func TestMapPeakOutsideTheConductors(t *testing.T) {
	for _, src := range []string{
		"```coil\nname = panel\nform = rectangle\nwidth = 400 mm\nheight = 250 mm\nturns = 40\nwire = AWG 20\ncurrent = 2 A\n```\n",
		"```coil\nname = loop\nform = loop\nmean-diameter = 150 mm\nturns = 30\nwire = AWG 22\ncurrent = 2 A\n```\n",
	} {
		j := mustEvaluate(t, src)
		m := j.Coils[0].Map
		cr := j.Results.Coils[0]
		if m == nil || !cr.Winding.Thin {
			t.Fatalf("%s: no map or not a thin winding", src[:30])
		}
		rb := j.Coils[0].Heat.BundleDiameter / 2
		ampere := 4e-7 * math.Pi * float64(cr.Winding.TurnCount()) * cr.Current / (2 * math.Pi * rb)
		if !(m.Peak > 0) || m.Peak > 1.5*ampere {
			t.Errorf("%s: map peak %g T against the bundle-surface field %g T", src[:30], m.Peak, ampere)
		}
	}
}
