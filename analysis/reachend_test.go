package analysis

import (
	"testing"

	"coilmemo/calc"
)

// The axial 0.5 mT search runs along the design's z axis when the coils
// are not coaxial. Its far point then lies in the gap of an x-axis pair,
// 45 mm from each winding's inner face and inside their outer radius; it
// is not "beyond the end, along the axis" of that pair, whose axis is x.
// Along a coaxial pair's own axis it is.
func TestAxialEndOnlyAlongTheWindingsAxis(t *testing.T) {
	pair := "```coil\nname = X pair\nform = pair\nmean-diameter = 200 mm\nlength = 10 mm\nradial-build = 5 mm\nturns = 50\nspacing = 100 mm\nsense = aiding\nwire = AWG 22\ncurrent = 3 A\naxis = x\n```\n"
	trim := "```coil\nname = trim\nform = solenoid\nmean-diameter = 30 mm\nlength = 40 mm\nradial-build = 6 mm\nturns = 40\nwire = AWG 24\nvoltage = 24 V\ncentre = (0, 120, -30) mm\n```\n"
	mixed := studyOf(t, pair+trim).Safety.Implant
	if mixed.Axis != (calc.Vec{0, 0, 1}) || !(mixed.Axial > 0) || mixed.AxialCoil != 0 {
		t.Fatalf("mixed design: axis %v, reach %g m at coil %d; want a reach along z tied to the pair", mixed.Axis, mixed.Axial, mixed.AxialCoil)
	}
	if mixed.AxialEnd {
		t.Errorf("mixed design: the z-axis reach %.4g m is called beyond the end of the x-axis pair", mixed.Axial)
	}
	// the same pair alone: the search runs along x, its own axis, and its
	// far point is beyond an outer end face
	alone := studyOf(t, pair).Safety.Implant
	if alone.Axis != (calc.Vec{1, 0, 0}) || !(alone.AxialClear > 0) {
		t.Fatalf("pair alone: axis %v, clear %g m; want the x axis and a point clear of the windings", alone.Axis, alone.AxialClear)
	}
	if !alone.AxialEnd {
		t.Errorf("pair alone: the reach %.4g m along its own axis is not called beyond its end", alone.Axial)
	}
}
