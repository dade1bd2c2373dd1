package memo

import (
	"fmt"
	"math"

	"coilmemo/calc"
	"coilmemo/figures"
	"coilmemo/memo/doc"
	"coilmemo/templates"

	"gonum.org/v1/plot/vg"
)

// axisProfile samples the exact field of a coil block along its own axis
// and the dipole field of its moment at the same points.
type axisProfile struct {
	Z, Exact, Dipole []float64
	Dipole1pc        float64 // m, NaN when not found
}

func profileOnAxis(co calc.Coil, cr calc.CoilResult, n int) axisProfile {
	w := cr.Winding
	fr := calc.CoilFrame(co.Axis)
	R := co.MeanDiameter / 2
	if co.Form == calc.Rectangle {
		R = math.Max(co.Width, co.Height) / 2
	}
	size := math.Max(R+co.RadialBuild/2, co.Length/2)
	if co.Form == calc.Pair {
		size = math.Max(size, co.Spacing/2+co.Length/2)
	}
	p := axisProfile{Dipole1pc: math.NaN()}
	if !(co.Form == calc.Pair && co.Opposing) && co.Form != calc.Rectangle {
		p.Dipole1pc = calc.DipoleRange(co, w, cr.Current, 0.01)
	}
	zmax := 6 * size
	if !math.IsNaN(p.Dipole1pc) {
		zmax = math.Max(zmax, 1.5*p.Dipole1pc)
	}
	for i := 0; i < n; i++ {
		z := -zmax + 2*zmax*float64(i)/float64(n-1)
		pt := co.Centre.Add(fr.U.Scale(z))
		p.Z = append(p.Z, z)
		p.Exact = append(p.Exact, calc.CoilField(co, w, cr.Current, pt).Norm())
		dip := math.NaN()
		// The dipole curve is drawn only outside the winding, where the
		// comparison means something.
		if math.Abs(z) > size {
			dip = calc.DipoleField(cr.Moment, fr.U.Scale(z)).Norm()
		}
		p.Dipole = append(p.Dipole, dip)
	}
	return p
}

// field reports the field: probes, the on-axis profile of each coil.
func (c *composer) field() {
	c.heading(1, "Magnetic field")
	d := c.j.Spec.Design
	r := c.j.Results
	B0 := r.FieldCentre
	c.para(fmt.Sprintf("With every coil at its steady operating current, the flux density at the origin is |B| = %s (Bx = %s, By = %s, Bz = %s). The background field is not included in these figures.",
		Eng(B0.Norm(), "T", 4), Eng(B0[0], "T", 3), Eng(B0[1], "T", 3), Eng(B0[2], "T", 3)))
	if len(r.Probes) > 0 {
		var rows [][]doc.Cell
		for _, p := range r.Probes {
			rows = append(rows, []doc.Cell{{Text: p.Name},
				{Text: fmt.Sprintf("(%s, %s, %s) mm", Sig(p.At[0]*1e3, 4), Sig(p.At[1]*1e3, 4), Sig(p.At[2]*1e3, 4))},
				{Text: Eng(p.B[0], "T", 3)}, {Text: Eng(p.B[1], "T", 3)}, {Text: Eng(p.B[2], "T", 3)},
				{Text: Eng(p.B.Norm(), "T", 4), Strong: true}})
		}
		c.add(doc.Table{Caption: "Flux density at the probe points (all coils)",
			Header: []string{"Probe", "Position", "Bx", "By", "Bz", "|B|"}, Rows: rows,
			Widths: []float64{1.3, 2, 1, 1, 1, 1.1},
			Align:  []doc.Align{doc.Left, doc.Left, doc.Right, doc.Right, doc.Right, doc.Right}})
	}
	for i, co := range d.Coils {
		cr := r.Coils[i]
		if co.Form == calc.Rectangle {
			continue
		}
		p := profileOnAxis(co, cr, 241)
		caption := fmt.Sprintf("Flux density on the axis of coil %q: exact field (solid) and point-dipole approximation (dashed)", co.Name)
		summary := fmt.Sprintf("|B| on axis from %s to %s; peak %s.", Eng(p.Z[0], "m", 3), Eng(p.Z[len(p.Z)-1], "m", 3), Eng(maxOf(p.Exact), "T", 3))
		var marks []figures.Mark
		if !math.IsNaN(p.Dipole1pc) {
			marks = []figures.Mark{{X: -p.Dipole1pc, Label: "1 %"}, {X: p.Dipole1pc, Label: "1 %"}}
			caption += "; dotted lines: distance beyond which the dipole is within 1 %"
			summary += fmt.Sprintf(" Dipole within 1 %% beyond ±%s.", Eng(p.Dipole1pc, "m", 3))
		}
		n := c.figure + 1
		c.para(fmt.Sprintf("Figure %d shows the flux density along the axis of coil %q.", n, co.Name))
		c.fig(doc.Figure{Caption: caption, Width: figWidth, Height: figHeight,
			Draw: figures.OnAxis(p.Z, p.Exact, p.Dipole, marks...), Summary: summary})
	}
}

// Figure size in the memo: the text width of an A4 page with our margins.
const (
	figWidth  = 165 * vg.Millimeter
	figHeight = 85 * vg.Millimeter
)

func maxOf(v []float64) float64 {
	m := math.Inf(-1)
	for _, x := range v {
		if x > m {
			m = x
		}
	}
	return m
}

// torque reports τ = m × B in the background field.
func (c *composer) torque() {
	d := c.j.Spec.Design
	r := c.j.Results
	Bb := d.Conditions.BackgroundField
	if Bb.Norm() == 0 {
		return
	}
	c.heading(1, "Torque in the background field")
	c.para(templates.Text("torque", map[string]string{
		"B":      Eng(Bb.Norm(), "T", 3),
		"M":      Eng(r.Moment.Norm(), "A·m²", 4),
		"Max":    Eng(r.TorqueMax, "N·m", 4),
		"Angle":  Sig(d.Conditions.DesignAngle*180/math.Pi, 3),
		"Design": Eng(r.TorqueDesign, "N·m", 4),
		"Tx":     Eng(r.Torque[0], "N·m", 3), "Ty": Eng(r.Torque[1], "N·m", 3), "Tz": Eng(r.Torque[2], "N·m", 3),
	}))
	var ang, tq []float64
	for i := 0; i <= 180; i += 2 {
		a := float64(i)
		ang = append(ang, a)
		tq = append(tq, calc.TorqueAtAngle(r.Moment.Norm(), Bb.Norm(), a*math.Pi/180))
	}
	n := c.figure + 1
	c.para(fmt.Sprintf("Figure %d shows the torque magnitude against the angle between moment and field.", n))
	c.fig(doc.Figure{Caption: "Torque magnitude |τ| = m B sin θ against the angle θ between moment and background field",
		Width: figWidth, Height: figHeight * 0.8, Draw: figures.TorqueAngle(ang, tq),
		Summary: fmt.Sprintf("Peak %s at 90°.", Eng(r.TorqueMax, "N·m", 3))})
}
