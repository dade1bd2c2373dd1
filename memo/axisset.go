package memo

import (
	"fmt"
	"math"
	"strings"

	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/figures"
)

// axisSetFigure adds, for a set of coils whose axes are not all parallel,
// the figure of each coil's moment by its components and the table of
// the coupling coefficients between them (memo/figsel.go).
func (c *composer) axisSetFigure() {
	as := c.j.Design.Axes
	if !axisSetShown(c.j) {
		return
	}
	d := c.j.Spec.Design
	c.heading(2, "Moments and coupling of the coil set")
	var names []string
	var vals [][]float64
	var dirs []string
	for k, i := range as.Coils {
		co := d.Coils[i]
		m := as.Moments[k]
		names = append(names, co.Name)
		vals = append(vals, []float64{m[0], m[1], m[2]})
		if m.Norm() == 0 {
			dirs = append(dirs, fmt.Sprintf("%q no net moment, its two halves opposing", co.Name))
			continue
		}
		dirs = append(dirs, fmt.Sprintf("%q %s along %s", co.Name, Eng(m.Norm(), "A·m²", 3), axisName(co)))
	}
	lo, hi := math.Inf(1), math.Inf(-1)
	for a := range as.Coils {
		for b := a + 1; b < len(as.Coils); b++ {
			if s := as.Skew[a][b]; !math.IsNaN(s) {
				lo, hi = math.Min(lo, s), math.Max(hi, s)
			}
		}
	}
	n := c.figure + 1
	// How far any moment leans off its own coil's axis.
	off := 0.0
	for k, i := range as.Coils {
		m, u := as.Moments[k], d.Coils[i].Axis.Unit()
		if mn := m.Norm(); mn > 0 && u.Norm() > 0 {
			off = math.Max(off, m.Sub(u.Scale(m.Dot(u))).Norm()/mn)
		}
	}
	along := "with nothing along the others"
	if off >= 1e-3 {
		along = fmt.Sprintf("with up to %s of it across that axis", Percent(off))
	}
	text := fmt.Sprintf("The driven coils point in different directions, so each makes its own component of the total moment: each gives its moment along its own axis (%s), %s", strings.Join(dirs, "; "), along)
	if lo <= hi {
		if hi-lo < 0.05 {
			text += fmt.Sprintf("; the moments are %s° apart", Sig(lo, 3))
		} else {
			text += fmt.Sprintf("; the angles between the moments run from %s° to %s°", Sig(lo, 3), Sig(hi, 3))
		}
	}
	text += fmt.Sprintf(". The total moment is %s.", Eng(c.j.Results.Moment.Norm(), "A·m²", 3))
	c.para(text)
	// Moments of very different sizes are drawn as directions, each
	// coil's components over its own |m|, so that the small ones show.
	bars := figures.BarGroups{Groups: names, Series: []string{"mx", "my", "mz"}, Values: vals, YName: "Moment component", Unit: "A·m²"}
	caption := "Moment vector of each coil of the set by its components (coil alone at its operating current)"
	what := "moment vector"
	if mlo, mhi := momentSpread(as.Moments); mhi > 10*mlo {
		for k, m := range as.Moments {
			if mn := m.Norm(); mn > 0 {
				bars.Values[k] = []float64{m[0] / mn, m[1] / mn, m[2] / mn}
			}
		}
		bars.YName, bars.Unit = "Moment component over |m|", ""
		caption = "Direction of each coil's moment: its components over its own magnitude |m| (the magnitudes differ too much to share a scale; they are given in the text)"
		what = "moment direction (its components over its own |m|, since the magnitudes differ by more than ten times)"
	}
	// A chart of one bar per coil, all of one height, tells the reader
	// nothing the sentence above does not: it is said instead.
	if bars.Trivial(trivialBars) {
		if bars.Unit == "" {
			c.para("Each moment lies along one of x, y and z, so a chart of the components over |m| would be one bar of 1 per coil; it is not drawn.")
		} else {
			size := fmt.Sprintf("are of one size within %g %%", 100*trivialBars)
			if mlo, mhi := momentSpread(as.Moments); mhi-mlo <= 1e-3*mhi {
				size = "are all of one size"
			}
			c.para(fmt.Sprintf("Each moment lies along one of x, y and z and the moments %s, so a chart of their components would be one bar of the same height per coil; it is not drawn.", size))
		}
	} else {
		c.para(fmt.Sprintf("Figure %d shows each coil's %s along x, y and z, one group of bars per coil: in a set whose coils are square to one another each group has one bar, along that coil's axis.", n, what))
		c.fig(doc.Figure{Caption: caption,
			Width: figWidth, Height: figHeight * 0.8,
			Draw:    figures.GroupedBars(bars),
			Summary: "Moments: " + strings.Join(dirs, "; ") + "."})
	}
	// The coupling coefficients: the largest |k| off the diagonal, and
	// every pair whose |k| prints the same (a symmetric set ties).
	worst := math.NaN()
	for a := range as.Coils {
		for b := a + 1; b < len(as.Coils); b++ {
			if k := as.K[a][b]; !math.IsNaN(k) && !(math.Abs(k) <= worst) {
				worst = math.Abs(k)
			}
		}
	}
	top := map[[2]int]bool{}
	var pairs []string
	for a := range as.Coils {
		for b := a + 1; b < len(as.Coils); b++ {
			if k := as.K[a][b]; !math.IsNaN(k) && kText(math.Abs(k)) == kText(worst) {
				top[[2]int{a, b}], top[[2]int{b, a}] = true, true
				pairs = append(pairs, fmt.Sprintf("%q with %q", names[a], names[b]))
			}
		}
	}
	var rows [][]doc.Cell
	widths := []float64{1.6}
	align := []doc.Align{doc.Left}
	for a := range as.Coils {
		row := []doc.Cell{{Text: names[a], Strong: true}}
		for b := range as.Coils {
			k := as.K[a][b]
			switch {
			case a == b:
				row = append(row, doc.Cell{Text: "1"})
			case math.IsNaN(k):
				row = append(row, doc.Cell{Text: "—"})
			default:
				row = append(row, doc.Cell{Text: kText(k), Strong: top[[2]int{a, b}]})
			}
		}
		rows = append(rows, row)
		widths = append(widths, 1.1)
		align = append(align, doc.Right)
	}
	t := "The table gives the coupling coefficient k = M/√(L₁ L₂) of every two coils of the set, from their mutual inductance M (Maxwell's formula for coaxial coils, Neumann's double line integral over the turns for the others) and their self-inductances: the fraction of one coil's flux that links the other, and the share of a current step in one that appears as an induced voltage in the other."
	if !math.IsNaN(worst) {
		kt := "= " + kText(worst)
		if worst < 1e-4 {
			kt = "< 0.0001"
		}
		switch {
		case len(pairs) == 1:
			t += fmt.Sprintf(" The largest cross-coupling is |k| %s, between %s", kt, strings.Replace(pairs[0], " with ", " and ", 1))
		case worst < 1e-4:
			t += fmt.Sprintf(" Every computed cross-coupling is |k| %s", kt)
		default:
			t += fmt.Sprintf(" The largest cross-coupling, |k| %s, is shared by %d pairs, %s", kt, len(pairs), joinAnd(pairs))
		}
		if worst < 0.01 {
			t += ": under 1 %, so the axes can be driven independently."
		} else {
			t += fmt.Sprintf(": driving one induces %s %% of its self-induced voltage, scaled by √(L₂/L₁), in the other; allow for it in the drivers.", Sig(100*worst, 2))
		}
	} else {
		t += " No mutual inductance is computed for these coils (a rectangle, or windings that touch), so the table has no coefficients."
	}
	c.para(t)
	c.add(doc.Table{Caption: "Coupling coefficients k between the coils of the set (— where no mutual inductance is computed)",
		Header: append([]string{"k"}, names...), Rows: rows, Widths: widths, Align: align})
}

// trivialBars is the tolerance, as a fraction of the longest bar, within
// which the moments chart is one bar per coil of one height and is said in
// a sentence instead of drawn.
const trivialBars = 0.03

// momentSpread is the smallest and largest magnitude of the moments that
// are not zero (an opposing pair has none).
func momentSpread(ms []calc.Vec) (lo, hi float64) {
	lo, hi = math.Inf(1), 0
	for _, m := range ms {
		if n := m.Norm(); n > 0 {
			lo, hi = math.Min(lo, n), math.Max(hi, n)
		}
	}
	return lo, hi
}

// kText writes a coupling coefficient to three significant figures, or
// "< 0.0001" in size when it is smaller (symmetry makes many exactly zero
// up to rounding).
func kText(k float64) string {
	if math.Abs(k) < 1e-4 {
		return "< 0.0001"
	}
	return Sig(k, 3)
}
