package report

import (
	"math"
	"testing"

	"coilmemo/analysis"
)

// One 600-turn valve coil, over-driven: from a fixed 24 V it settles near
// 320 °C, far above class B, its current falling as it heats; from an
// imposed current that gives the same heat at 20 °C no steady state at
// or below the class exists. The first is too hot but not in runaway; the
// second is in runaway.
func TestRunawayAgainstAboveClass(t *testing.T) {
	coil := "```coil\nname = valve coil\nform = solenoid\nmean-diameter = 40 mm\nlength = 15 mm\nradial-build = 10 mm\nturns = 600\nwire = AWG 28\ninsulation-class = B\n"
	cond := "```conditions\nambient = 25 degC\nh = 8 W/(m2 K)\nemissivity = 0.85\n```\n"
	for _, c := range []struct {
		drive            string
		runaway, tooHot  bool
		temperatureKnown bool
	}{
		{"voltage = 24 V", false, true, true},
		{"current = 1.6 A", true, true, false},
		{"voltage = 5 V", false, false, true},
	} {
		st, ds := analysis.Run("t.md", []byte(coil+c.drive+"\n```\n"+cond), analysis.Options{})
		if len(ds) > 0 {
			t.Fatal(ds.Error())
		}
		cr := Build(st).Coils[0]
		if cr.Runaway != c.runaway || cr.AboveClass != c.tooHot {
			t.Errorf("%s: runaway %v, above class %v; want %v, %v (winding %v °C)", c.drive, cr.Runaway, cr.AboveClass, c.runaway, c.tooHot, cr.WindingTemperature)
		}
		if known := !math.IsNaN(float64(cr.WindingTemperature)); c.temperatureKnown && !known {
			t.Errorf("%s: no winding temperature for a coil that settles", c.drive)
		}
	}
}
