package figures

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg/recorder"
)

func TestWarmUpFigure(t *testing.T) {
	var ts, ys, tc, yc []float64
	for i := 0; i <= 100; i++ {
		s := float64(i) * 60
		ts = append(ts, s)
		ys = append(ys, 20+120*(1-math.Exp(-s/1200)))
		tc = append(tc, s)
		yc = append(yc, 20+40*(1-math.Exp(-s/1200)))
	}
	var c recorder.Canvas
	WarmUp([]Curve{{"energised continuously", ts, ys}, {"on/off cycle", tc, yc}},
		Level{Y: 155, Label: "insulation class 155 °C"}, Level{Y: 140, Label: "steady 140 °C"})(&c, 400, 220)
	var all []string
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok {
			all = append(all, fs.String)
		}
	}
	s := strings.Join(all, "|")
	for _, want := range []string{"Time (min)", "Temperature (°C)", "energised continuously", "on/off cycle", "insulation class 155 °C", "steady 140 °C", "|100|"} {
		if !strings.Contains(s, want) {
			t.Errorf("warm-up figure lacks %q: %s", want, s)
		}
	}
	for _, c := range []struct {
		span float64
		unit string
	}{{60, "s"}, {600, "min"}, {20000, "h"}} {
		if u, _ := timeUnit(c.span); u != c.unit {
			t.Errorf("span %g s: unit %s, want %s", c.span, u, c.unit)
		}
	}
}
