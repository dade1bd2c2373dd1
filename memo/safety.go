package memo

import (
	"fmt"
	"math"
	"strings"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/templates"
)

// ImplantField is the flux density above which active implanted medical
// devices may be affected: 0.5 mT, ICNIRP Guidelines on limits of exposure
// to static magnetic fields, Health Physics 96(4):504–514 (2009).
const ImplantField = 0.5e-3

// HotSurface is the surface temperature above which brief contact can burn,
// 60 °C: common practice for touchable surfaces of equipment.
const HotSurface = 60 + 273.15

// ELV is the usual bound of extra-low d.c. voltage, 60 V (IEC 61140 /
// IEC 60364-4-41, ripple-free d.c.).
const ELV = 60.0

// reach returns the largest distance from origin along the unit direction
// u at which |B| ≥ level, searching inward from rmax in steps of 25 % and
// refining by bisection; 0 when the level is not reached at or beyond rmin,
// which must lie outside every winding. Valid because the field outside
// the windings falls monotonically with distance.
func reach(fm *calc.FieldModel, origin, u calc.Vec, level, rmin, rmax float64) float64 {
	at := func(r float64) float64 { return fm.At(origin.Add(u.Scale(r))).Norm() }
	if at(rmax) >= level {
		return rmax
	}
	hi := rmax
	for {
		lo := math.Max(hi/1.25, rmin)
		if at(lo) >= level {
			for range 50 {
				mid := 0.5 * (lo + hi)
				if at(mid) >= level {
					lo = mid
				} else {
					hi = mid
				}
			}
			return lo
		}
		if lo == rmin {
			return 0
		}
		hi = lo
	}
}

// Cautions lists the safety cautions raised by the results, in order of
// severity, always closing with the general caution.
func Cautions(j *Job) []doc.Callout {
	d := j.Spec.Design
	r := j.Results
	var out []doc.Callout
	fm := calc.NewFieldModel(d)
	for i, co := range d.Coils {
		cr := r.Coils[i]
		name := fmt.Sprintf("coil %q", co.Name)
		if cr.Runaway {
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Thermal runaway, " + name,
				Spans: []doc.Span{{Text: runawayText(co, cr)}}})
			out = append(out, electricalCautions(co, cr, name)...)
			continue
		}
		if cr.Temperature > co.InsulationClass {
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Insulation class exceeded, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-class", map[string]string{
					"Temperature": Eng(Celsius(cr.Temperature), "°C", 3), "Class": Eng(Celsius(co.InsulationClass), "°C", 3),
					"Time": classTimeText(cr)})}}})
		}
		if n := leftOnText(co, cr); n != "" {
			out = append(out, doc.Callout{Severity: doc.Caution, Title: "Insulation class if left energised, " + name,
				Spans: []doc.Span{{Text: n}}})
		}
		if ts := surfaceTemperature(cr); ts > HotSurface {
			out = append(out, doc.Callout{Severity: doc.Caution, Title: "Hot surface, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-hot", map[string]string{"Temperature": Eng(Celsius(ts), "°C", 3)})}}})
		}
		if n := densityNote(co, cr, j.Spec.Design.Conditions); n != "" {
			out = append(out, doc.Callout{Severity: doc.Note, Title: "Current density above common practice, " + name,
				Spans: []doc.Span{{Text: n}}})
		}
		if math.Abs(cr.Voltage) > ELV {
			out = append(out, doc.Callout{Severity: doc.Warning, Title: "Hazardous voltage, " + name,
				Spans: []doc.Span{{Text: templates.Text("caution-voltage", map[string]string{"Voltage": Eng(cr.Voltage, "V", 3)})}}})
		}
		out = append(out, electricalCautions(co, cr, name)...)
	}
	// Implant field: at the origin, along the z axis and in the xy plane.
	ext := designExtent(d)
	if ext > 0 {
		b0 := r.FieldCentre.Norm()
		// Along the axis the search may come close to the origin (a bore
		// holds no conductor); in the plane it stops outside the windings.
		axial := reach(fm, calc.Vec{}, calc.Vec{0, 0, 1}, ImplantField, ext*0.01, ext*1e3)
		axial = math.Max(axial, reach(fm, calc.Vec{}, calc.Vec{0, 0, -1}, ImplantField, ext*0.01, ext*1e3))
		radial := reach(fm, calc.Vec{}, calc.Vec{1, 0, 0}, ImplantField, ext, ext*1e3)
		radial = math.Max(radial, reach(fm, calc.Vec{}, calc.Vec{0, 1, 0}, ImplantField, ext, ext*1e3))
		var where []string
		if b0 >= ImplantField {
			where = append(where, "at the origin, where |B| = "+Eng(b0, "T", 3))
		}
		if axial > 0 {
			where = append(where, "up to "+Eng(axial, "m", 2)+" from the origin along the z axis")
		}
		if radial > 0 {
			where = append(where, "up to "+Eng(radial, "m", 2)+" from the origin in the xy plane")
		}
		for _, p := range r.Probes {
			if p.B.Norm() >= ImplantField {
				where = append(where, fmt.Sprintf("at probe %q (%s)", p.Name, Eng(p.B.Norm(), "T", 3)))
			}
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

// designExtent is the largest distance of any conductor from the origin:
// the winding's outer radius (a thin coil's round bundle included) and
// half its axial extent.
func designExtent(d calc.Design) float64 {
	e := 0.0
	for _, co := range d.Coils {
		depth := co.RadialBuild
		if depth == 0 {
			depth = co.Wire.Outer
			if co.Length == 0 {
				depth = calc.BundleDiameter(co.Wire.Outer, co.Turns)
			}
		}
		r := co.MeanDiameter/2 + depth/2
		if co.Form == calc.Rectangle {
			r = math.Hypot(co.Width, co.Height)/2 + depth/2
		}
		half := math.Max(co.Length, depth) / 2
		if co.Form == calc.Pair {
			half += co.Spacing / 2
		}
		e = math.Max(e, co.Centre.Norm()+math.Hypot(r, half))
	}
	return e
}

func (c *composer) safety() {
	c.heading(1, "Safety")
	c.para(templates.Text("safety", nil))
	for _, co := range c.cautions {
		c.add(co)
	}
}
