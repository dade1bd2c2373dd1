package figures

import (
	"fmt"
	"math"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

// TestDrawAgainSame: a figure's DrawFunc draws the same however often it
// is called and at whatever size it was called before (the PDF writer may
// draw a figure ahead and again on the spot). A plot with a legend once
// gained a second legend backdrop per call.
func TestDrawAgainSame(t *testing.T) {
	z := make([]float64, 41)
	ex, di := make([]float64, 41), make([]float64, 41)
	for i := range z {
		z[i] = -0.2 + 0.01*float64(i)
		ex[i] = 1e-3 / math.Pow(1+(z[i]/0.05)*(z[i]/0.05), 1.5)
		di[i] = 1e-3 * math.Pow(0.05/math.Max(math.Abs(z[i]), 0.02), 3)
	}
	record := func(f DrawFunc, w, h vg.Length) string {
		var c recorder.Canvas
		f(&c, w, h)
		s := ""
		for _, a := range c.Actions {
			s += fmt.Sprintf("%T %v\n", a, a.Call())
		}
		return s
	}
	for name, f := range map[string]DrawFunc{
		"on-axis": OnAxis("z", z, ex, di),
		"map":     FieldMap(sampleMap()),
		"trade":   Trade(sizingTrade(17, 1.7)),
		"sensitivity": SensitivityFigure(SensitivityData{Tolerances: []string{"supply", "ambient"},
			Results: []string{"Current"}, Swing: [][]float64{{9, -26.8}},
			Kelvin: []string{"Hottest winding temperature"}, KelvinSwing: [][]float64{{3.3, 70.3}}}),
	} {
		first := record(f, 400, 260)
		record(f, 300, 200) // another size in between
		if again := record(f, 400, 260); again != first {
			t.Errorf("%s: the second drawing differs from the first (%d against %d bytes of calls)", name, len(again), len(first))
		}
	}
}
