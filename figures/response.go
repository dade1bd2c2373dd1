package figures

import (
	"math"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg"
)

// Response plots a pick-up coil's terminal sensitivity, V/T, against
// frequency, Hz, both on logarithmic axes, with marks (e.g. the design
// frequency and the self-resonance) as labelled vertical lines in Hz.
func Response(f, sens []float64, marks ...Mark) DrawFunc {
	// Both axes are logarithmic, their ticks in engineering units.
	p := NewPlot("Frequency f", "Sensitivity |V/B|")
	p.X.Scale, p.Y.Scale = plot.LogScale{}, plot.LogScale{}
	p.X.Tick.Marker, p.Y.Tick.Marker = engDecadeTicks{unit: "Hz", factor: 1}, engDecadeTicks{unit: "V/T", factor: 1}
	segs := segments(f, sens, 1, 1, true)
	if lo, hi, ok := positiveRange(sens, nil); ok {
		p.Y.Min = math.Pow(10, math.Floor(math.Log10(lo)))
		p.Y.Max = math.Pow(10, math.Ceil(math.Log10(hi)))
	}
	if lo, hi, ok := positiveRange(f, nil); ok {
		p.X.Min, p.X.Max = lo, hi
	}
	if l := addCurve(p, segs, lineStyle(Accent, LineWidth, nil)); l != nil {
		p.Legend.Add("Terminal sensitivity", l)
	}
	top := vg.Length(0)
	if len(marks) > 0 {
		m := &markLines{marks: marks, scale: 1}
		p.Add(m)
		top = m.height()
	}
	return drawer(p, top, segs)
}
