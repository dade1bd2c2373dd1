package main

import (
	"testing"

	"coilmemo/analysis"
)

// BenchmarkDesignSeeds runs FuzzDesign's body over its seeds as the
// fuzzer does (the PDF for one spec in 64): the cost of an execution on
// designs near the seeds; with -cpuprofile, where it goes.
func BenchmarkDesignSeeds(b *testing.B) {
	for b.Loop() {
		for _, d := range designSeeds {
			runDesign(b, designSpec(d.form, d.turns, d.a, d.b, d.c, d.drive, d.opts, d.text), false)
		}
	}
	b.ReportMetric(float64(b.N*len(designSeeds))/b.Elapsed().Seconds(), "specs/s")
}

// The fuzz targets' coarse grid reaches every map: each coil's (the
// cored one widened over its rod) and the all-coils map, fuzzMapNodes
// along the longer side; without it the memo's grids are kept.
func TestFuzzMapGrid(t *testing.T) {
	src := "# Two\n\n```coil\nname = a\nform = solenoid\nmean-diameter = 12 mm\nlength = 60 mm\nturns = 200\nwire = AWG 32\ncurrent = 100 mA\n" +
		"core-permeability = 200\ncore-length = 70 mm\ncore-diameter = 6 mm\n```\n\n" +
		"```coil\nname = b\nform = loop\nmean-diameter = 100 mm\nturns = 10\nwire = AWG 24\ncurrent = 1 A\ncentre = (0, 0, 50) mm\n```\n"
	for _, c := range []struct{ nodes, coil, all int }{{fuzzMapNodes, fuzzMapNodes, fuzzMapNodes}, {0, analysis.MapGrid | 1, analysis.AllMapGrid}} {
		st, diags := analysis.Run("two.md", []byte(src), analysis.Options{MapNodes: c.nodes})
		if len(diags) > 0 {
			t.Fatal(diags.Error())
		}
		for i, cs := range st.Coils {
			if cs.Map == nil || max(len(cs.Map.X), len(cs.Map.Z)) != c.coil {
				t.Errorf("MapNodes %d: coil %d's map is not %d nodes along its longer side", c.nodes, i, c.coil)
			}
		}
		if m := st.Design.All; m == nil || len(m.X) != c.all || len(m.Z) != c.all {
			t.Errorf("MapNodes %d: the all-coils map is not %d × %d", c.nodes, c.all, c.all)
		}
	}
}
