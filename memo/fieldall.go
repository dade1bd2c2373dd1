package memo

import (
	"coilmemo/analysis"
	"fmt"
	"math"
	"strings"

	"gonum.org/v1/plot/vg"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
)

// planeSections returns the cross-sections, in the xz-plane through the
// origin (horizontal z, vertical x), of a coil whose axis lies along x or
// z (axis-aligned rectangles) or along y (the winding itself, where the
// plane cuts it, as a ring of round sections). A rectangle or an oblique
// axis is not drawn, and ok is false.
func planeSections(co calc.Coil, cs *analysis.CoilStudy) (s []figures.Section, ok bool) {
	u := co.Axis.Unit()
	alongZ := math.Abs(u[2]) > 1-1e-12
	alongY := math.Abs(u[1]) > 1-1e-12
	if !analysis.DrawnInXZ(co) {
		return nil, false
	}
	e := cs.Envelope
	if alongY {
		// The winding lies in the plane when the plane cuts it across
		// its length: draw it as a ring of overlapping round sections.
		for _, p := range cs.Placements {
			if y := co.Centre[1] + p*u[1]; y+e.Z1 < 0 || y+e.Z0 > 0 {
				continue
			}
			rm, t := (e.R0+e.R1)/2, e.R1-e.R0
			n := min(720, max(90, int(math.Ceil(4*math.Pi*rm/t))))
			for k := range n {
				phi := 2 * math.Pi * float64(k) / float64(n)
				zc, xc := co.Centre[2]+rm*math.Cos(phi), co.Centre[0]+rm*math.Sin(phi)
				s = append(s, figures.Section{X0: zc - t/2, X1: zc + t/2, Y0: xc - t/2, Y1: xc + t/2, Round: true})
			}
		}
		return s, true
	}
	for _, p := range cs.Placements {
		for _, side := range []float64{1, -1} {
			// In the coil's frame: axial [p+z0, p+z1], radial ±[r0, r1].
			a0, a1 := p+e.Z0, p+e.Z1
			r0, r1 := side*e.R0, side*e.R1
			if u[0]+u[2] < 0 { // the axis points along −x or −z
				a0, a1 = -a1, -a0
			}
			if alongZ {
				s = append(s, figures.Section{X0: co.Centre[2] + a0, X1: co.Centre[2] + a1,
					Y0: co.Centre[0] + math.Min(r0, r1), Y1: co.Centre[0] + math.Max(r0, r1), Round: e.Round})
			} else {
				s = append(s, figures.Section{X0: co.Centre[2] + math.Min(r0, r1), X1: co.Centre[2] + math.Max(r0, r1),
					Y0: co.Centre[0] + a0, Y1: co.Centre[0] + a1, Round: e.Round})
			}
		}
	}
	return s, true
}

// allCoilsMap adds, for a design of several coil blocks, a map of |B| of
// all of them together over the xz-plane through the origin.
func (c *composer) allCoilsMap() {
	d := c.j.Spec.Design
	if len(d.Coils) < 2 {
		return
	}
	m := c.j.Design.All
	if m == nil {
		return
	}
	half := m.XHalf
	var sections []figures.Section
	var undrawn []string
	// The undrawn windings by how they meet the plane.
	kinds := map[string][]string{}
	blank, rect := false, false
	for i, co := range d.Coils {
		s, ok := planeSections(co, &c.j.Coils[i])
		if !ok {
			undrawn = append(undrawn, fmt.Sprintf("%q", co.Name))
			a := math.NaN()
			if i < len(c.j.Design.Crossing) {
				a = c.j.Design.Crossing[i]
			}
			k := "cross this plane obliquely"
			switch {
			case math.IsNaN(a):
				k = "do not meet this plane"
			case a == 0:
				k = "lie in this plane"
			case a > 89.5*math.Pi/180:
				k = "cross this plane at right angles"
			}
			kinds[k] = append(kinds[k], fmt.Sprintf("%q", co.Name))
			blank = blank || (co.Form != calc.Rectangle && !math.IsNaN(a))
			rect = rect || co.Form == calc.Rectangle
		}
		sections = append(sections, s...)
	}
	draw := figures.FieldMap(figures.MapData{X: m.Z, Y: m.X, B: m.B, Sections: sections,
		XLabel: "Position z", YLabel: "Position x"})
	c.heading(2, "Field of all coils together")
	n := c.figure + 1
	all := fmt.Sprintf("all %d coils", len(d.Coils))
	if len(d.Coils) == 2 {
		all = "both coils"
	}
	text := fmt.Sprintf("Figure %d maps |B| of %s energised together over the xz-plane through the origin, on a logarithmic colour scale with contour lines as in the maps above.", n, all)
	if c.anyReceiver() {
		text = fmt.Sprintf("Figure %d maps |B| over the xz-plane through the origin with the driven coils energised together and the pick-up coils' windings drawn in, on a logarithmic colour scale with contour lines as in the maps above.", n)
	}
	caption := "|B| of all coils together over the xz-plane through the origin (viridis, logarithmic; contours at the values marked on the colour bar)"
	if len(undrawn) > 0 {
		var parts []string
		for _, k := range []string{"cross this plane obliquely", "cross this plane at right angles", "lie in this plane", "do not meet this plane"} {
			if names := kinds[k]; len(names) > 0 {
				parts = append(parts, "the windings of "+joinAnd(names)+" "+k)
			}
		}
		s := strings.Join(parts, "; ")
		text += " " + strings.ToUpper(s[:1]) + s[1:] + "; they are not drawn"
		switch {
		case blank && rect:
			text += " (the map is left blank where the circular ones pass)"
		case blank:
			text += " (the map is left blank where they pass)"
		}
		text += ", and their field is included."
		caption += "; windings drawn where their axis lies along x, y or z"
	}
	if centre, edge, ok := mapLevels(m); ok {
		text += fmt.Sprintf(" The fields of the coils add: |B| is %s at the origin and at most %s on the map's edge.", Eng(centre, "T", 3), Eng(edge, "T", 3))
	}
	c.para(text)
	c.fig(doc.Figure{Caption: caption, Width: figWidth, Height: 125 * vg.Millimeter, Draw: draw,
		Summary: fmt.Sprintf("|B| of all coils over ±%s in x and z; |B| at the origin %s.", Eng(half, "m", 3), Eng(c.j.Results.FieldCentre.Norm(), "T", 3))})
}

// joinAnd joins names as "a", "a and b", "a, b and c".
func joinAnd(s []string) string {
	switch len(s) {
	case 0:
		return ""
	case 1:
		return s[0]
	}
	out := s[0]
	for _, x := range s[1 : len(s)-1] {
		out += ", " + x
	}
	return out + " and " + s[len(s)-1]
}
