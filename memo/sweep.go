package memo

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/figures"
	"coilmemo/memo/doc"
	"coilmemo/memo/spec"
)

// SweepStep is the whole design evaluated with the swept parameter at one
// value. A step whose winding does not fit is kept, marked infeasible.
type SweepStep struct {
	Value    float64 // SI
	Feasible bool
	Problem  string
	Results  calc.Results
}

// setParam sets a sweepable coil key on c, keeping the dimensions that
// were given and re-deriving the mean diameter where it follows from them.
func setParam(c *calc.Coil, key string, v float64) {
	switch key {
	case "mean-diameter":
		c.MeanDiameter = v
	case "inner-diameter":
		c.InnerDiameter = v
		c.MeanDiameter = v + c.RadialBuild
		if c.OuterDiameter > 0 {
			c.OuterDiameter = v + 2*c.RadialBuild
		}
	case "outer-diameter":
		c.OuterDiameter = v
		c.MeanDiameter = v - c.RadialBuild
		if c.InnerDiameter > 0 {
			c.InnerDiameter = v - 2*c.RadialBuild
		}
	case "radial-build":
		// The bore stays where it was; the winding grows outward.
		inner := c.MeanDiameter - c.RadialBuild
		c.RadialBuild = v
		c.MeanDiameter = inner + v
		if c.InnerDiameter > 0 {
			c.InnerDiameter = inner
		}
		if c.OuterDiameter > 0 {
			c.OuterDiameter = inner + 2*v
		}
	case "length":
		c.Length = v
	case "width":
		c.Width = v
	case "height":
		c.Height = v
	case "spacing":
		c.Spacing = v
	case "wire-outer-diameter":
		c.Wire.Outer = v
		c.Wire.OuterEstimated = false
	case "turns":
		c.Turns = int(math.Round(v))
	case "current":
		c.Current = v
	case "voltage":
		c.Voltage = v
	case "duty":
		c.Duty = v
	case "on-time":
		c.OnTime = v
	case "switch-off":
		c.SwitchOff = v
	case "frequency":
		c.Frequency = v
	}
}

// RunSweep evaluates the design at every value of the spec's sweep.
func RunSweep(s *spec.Spec) []SweepStep {
	if s.Sweep == nil {
		return nil
	}
	var steps []SweepStep
	for _, v := range s.Sweep.Values() {
		d := s.Design
		d.Coils = append([]calc.Coil(nil), s.Design.Coils...)
		st := SweepStep{Value: v, Feasible: true}
		for i := range d.Coils {
			if s.Sweep.Coil != "" && d.Coils[i].Name != s.Sweep.Coil {
				continue
			}
			setParam(&d.Coils[i], s.Sweep.Param, v)
			if err := calc.CheckWinding(d.Coils[i]); err != nil {
				st.Feasible, st.Problem = false, err.Error()
			}
		}
		if st.Feasible {
			st.Results = calc.Evaluate(d)
		}
		steps = append(steps, st)
	}
	return steps
}

// sweepUnit is the unit the swept values are shown in.
func sweepUnit(sw *spec.Sweep) (unit string, scale float64) {
	switch {
	case sw.Param == "turns":
		return "", 1
	case sw.Param == "duty":
		return "%", 100
	case sw.Dim == units.Length:
		return "mm", 1e3
	case sw.Dim == units.Current:
		return "A", 1
	case sw.Dim == units.Voltage:
		return "V", 1
	case sw.Dim == units.Time:
		return "s", 1
	case sw.Dim == units.Frequency:
		return "Hz", 1
	}
	return "", 1
}

func (c *composer) sweep() {
	sw := c.j.Spec.Sweep
	if sw == nil || len(c.j.Sweep) == 0 {
		return
	}
	unit, scale := sweepUnit(sw)
	label := sw.Param
	if unit != "" {
		label += " (" + unit + ")"
	}
	target := "every coil"
	if sw.Coil != "" {
		target = fmt.Sprintf("coil %q", sw.Coil)
	}
	c.heading(1, "Parameter sweep")
	num := func(v float64) string { return strings.Replace(strconv.FormatFloat(v, 'g', 6, 64), "-", "−", 1) }
	withUnit := func(v float64) string {
		if unit == "" {
			return num(v)
		}
		if unit == "%" {
			return num(v) + " %"
		}
		return num(v) + " " + unit
	}
	c.para(fmt.Sprintf("The design is re-evaluated with %s of %s from %s to %s in steps of %s, every other input as specified. Each row is a complete evaluation: winding, steady temperature, operating point and field.",
		sw.Param, target, withUnit(sw.From*scale), withUnit(sw.To*scale), withUnit(sw.Step*scale)))
	var rows [][]doc.Cell
	var x, moment, temp []float64
	for _, st := range c.j.Sweep {
		cells := []doc.Cell{{Text: num(st.Value * scale)}}
		if !st.Feasible {
			cells = append(cells, doc.Cell{Text: "winding does not fit"}, doc.Cell{}, doc.Cell{}, doc.Cell{}, doc.Cell{}, doc.Cell{Text: "—"})
			rows = append(rows, cells)
			continue
		}
		r := st.Results
		hot, pw, cur := math.Inf(-1), 0.0, 0.0
		for _, cr := range r.Coils {
			hot = math.Max(hot, cr.Temperature)
			pw += cr.Power
			cur = math.Max(cur, math.Abs(cr.Current))
		}
		met := 0
		for _, l := range r.Limits {
			if l.Pass {
				met++
			}
		}
		status := doc.Cell{Text: fmt.Sprintf("%d/%d", met, len(r.Limits))}
		if len(r.Limits) > 0 {
			status.Status = doc.Pass
			if met < len(r.Limits) {
				status.Status = doc.Fail
			}
		}
		tText := Eng(Celsius(hot), "°C", 3)
		if math.IsNaN(hot) {
			tText = "runaway"
		}
		cells = append(cells,
			doc.Cell{Text: Eng(r.Moment.Norm(), "A·m²", 3)},
			doc.Cell{Text: Eng(r.FieldCentre.Norm(), "T", 3)},
			doc.Cell{Text: Eng(cur, "A", 3)},
			doc.Cell{Text: Eng(pw, "W", 3)},
			doc.Cell{Text: tText},
			status)
		rows = append(rows, cells)
		x = append(x, st.Value*scale)
		moment = append(moment, r.Moment.Norm())
		temp = append(temp, Celsius(hot))
	}
	c.add(doc.Table{Caption: "Results at each step of the sweep",
		Header: []string{label, "|m|", "|B| at origin", "Current", "Power", "Hottest winding", "Limits met"},
		Rows:   rows,
		Align:  []doc.Align{doc.Right, doc.Right, doc.Right, doc.Right, doc.Right, doc.Right, doc.Center}})
	if len(x) < 2 {
		return
	}
	limit := func(q string) []float64 {
		var out []float64
		for _, l := range c.j.Spec.Design.Limits {
			if l.Quantity == q {
				v := l.Required
				if q == "temperature" {
					v = Celsius(v)
				}
				out = append(out, v)
			}
		}
		return out
	}
	n := c.figure + 1
	c.para(fmt.Sprintf("Figures %d and %d show the total moment and the hottest winding temperature across the sweep, with the stated requirements as dashed lines.", n, n+1))
	c.fig(doc.Figure{Caption: "Magnetic moment across the sweep", Width: figWidth, Height: figHeight * 0.7,
		Draw:    figures.Sweep(label, x, "Magnetic moment |m|", "A·m²", moment, limit("moment")),
		Summary: fmt.Sprintf("|m| from %s to %s.", Eng(moment[0], "A·m²", 3), Eng(moment[len(moment)-1], "A·m²", 3))})
	c.fig(doc.Figure{Caption: "Hottest winding temperature across the sweep", Width: figWidth, Height: figHeight * 0.7,
		Draw:    figures.Sweep(label, x, "Winding temperature", "°C", temp, limit("temperature")),
		Summary: fmt.Sprintf("Temperature from %s to %s.", Eng(temp[0], "°C", 3), Eng(temp[len(temp)-1], "°C", 3))})
}
