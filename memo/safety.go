package memo

import (
	"fmt"
	"strings"

	"coilmemo/analysis"
	"coilmemo/doc"
	"coilmemo/templates"
)

// Cautions words the safety findings of the study, in the order the
// analysis found them (coil by coil, then the field), always closing with
// the general cautions.
func Cautions(j *analysis.Study) []doc.Callout {
	d := j.Spec.Design
	r := j.Results
	var out []doc.Callout
	for _, f := range j.Safety.Findings {
		co, cr := d.Coils[f.Coil], r.Coils[f.Coil]
		name := fmt.Sprintf("coil %q", co.Name)
		switch f.Kind {
		case analysis.Runaway:
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Thermal runaway, " + name,
				Spans: []doc.Span{{Text: runawayText(co, cr)}}})
		case analysis.ClassExceeded:
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Insulation class exceeded, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-class", map[string]string{
					"Temperature": Eng(Celsius(f.Value), "°C", 3), "Class": Eng(Celsius(co.InsulationClass), "°C", 3),
					"Time": classTimeText(cr)})}}})
		case analysis.ClassIfLeftOn:
			out = append(out, doc.Callout{Severity: doc.Caution, Title: "Insulation class if left energised, " + name,
				Spans: []doc.Span{{Text: leftOnText(co, cr, j.Coils[f.Coil].Heat.Continuous)}}})
		case analysis.HotSurfaceFound:
			out = append(out, doc.Callout{Severity: doc.Caution, Title: "Hot surface, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-hot", map[string]string{"Temperature": Eng(Celsius(f.Value), "°C", 3)})}}})
		case analysis.HighDensity:
			out = append(out, doc.Callout{Severity: doc.Note, Title: "Current density above common practice, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-density", map[string]string{"Density": Eng(f.Value, "A/m²", 3),
					"Temperature": Eng(Celsius(cr.Temperature), "°C", 3)})}}})
		case analysis.HazardousVoltage:
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Hazardous voltage, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-voltage", map[string]string{"Voltage": Eng(f.Value, "V", 3)})}}})
		case analysis.SwitchOffVoltage:
			out = append(out, switchOffCaution(f, cr, name))
		default:
			out = append(out, kindCautions(j, f)...) // memo/core.go
		}
	}
	out = mergeCautions(out)
	if ir := j.Safety.Implant; ir.Searched {
		var where []string
		if ir.Origin >= analysis.ImplantField {
			where = append(where, "at the origin, where |B| = "+Eng(ir.Origin, "T", 3))
		}
		if ir.Axial > 0 {
			where = append(where, "as far as "+Eng(ir.Axial, "m", 2)+" from the origin along the z axis")
		}
		if ir.Radial > 0 {
			where = append(where, "as far as "+Eng(ir.Radial, "m", 2)+" from the origin in the xy plane")
		}
		for i, w := range ir.Windings {
			if w.Surface >= analysis.ImplantField {
				what, its := "the winding", "its surface"
				if i < len(j.Coils) && j.Coils[i].Kinds.Core != nil {
					// The search starts from the rod's end faces too.
					what, its = "the winding and core", "their surfaces (the rod's end faces included)"
				}
				// The search runs out from the surface along the coil's axis
				// and plane with every coil's field, and reports the farthest
				// point above the level: beyond it the level is not reached.
				where = append(where, fmt.Sprintf("next to %s of coil %q, where |B| reaches %s at %s, and 0.5 mT is exceeded as far as %s from it along its axis or in its plane (the field of every winding counted)",
					what, d.Coils[i].Name, Eng(w.Surface, "T", 3), its, Eng(w.Distance, "m", 2)))
			}
		}
		for _, k := range ir.Probes {
			p := r.Probes[k]
			where = append(where, fmt.Sprintf("at probe %q (%s)", p.Name, Eng(p.B.Norm(), "T", 3)))
		}
		if len(where) > 0 {
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Field above 0.5 mT: implanted medical devices",
				Spans: []doc.Span{{Text: templates.Text("caution-implant", map[string]string{"Where": strings.Join(where, ", ")})}}})
		} else {
			out = append(out, doc.Callout{Severity: doc.Note, Title: "Field near the winding",
				Spans: []doc.Span{{Text: templates.Text("caution-implant-none", nil)}}})
		}
	}
	general := templates.Paragraphs("caution-general", nil)
	for i, p := range general {
		t := "Limits of this memo"
		if i > 0 {
			t = "Codes and licensed practice"
		}
		out = append(out, doc.Callout{Severity: doc.Note, Title: t, Spans: []doc.Span{{Text: p}}})
	}
	return out
}

// mergeCautions gives one caution per hazard: cautions of several coils
// whose words are the same (titles "…, coil "X"" with equal severity and
// text) become one whose title lists the coils.
func mergeCautions(in []doc.Callout) []doc.Callout {
	type group struct {
		c     doc.Callout
		base  string
		names []string
	}
	var groups []*group
	for _, c := range in {
		base, name, ok := strings.Cut(c.Title, ", coil ")
		if !ok {
			groups = append(groups, &group{c: c})
			continue
		}
		text := spanText(c.Spans)
		merged := false
		for _, g := range groups {
			if g.base == base && g.c.Severity == c.Severity && spanText(g.c.Spans) == text {
				g.names = append(g.names, name)
				merged = true
				break
			}
		}
		if !merged {
			groups = append(groups, &group{c: c, base: base, names: []string{name}})
		}
	}
	out := make([]doc.Callout, 0, len(groups))
	for _, g := range groups {
		if len(g.names) > 1 {
			g.c.Title = g.base + ", coils " + joinAnd(g.names)
		}
		out = append(out, g.c)
	}
	return out
}

func spanText(ss []doc.Span) string {
	var b strings.Builder
	for _, s := range ss {
		b.WriteString(s.Text)
	}
	return b.String()
}

func (c *composer) safety() {
	c.heading(1, "Safety")
	c.para(templates.Text("safety", nil))
	for _, co := range c.cautions {
		c.add(co)
	}
}
