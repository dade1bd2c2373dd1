package spec

import (
	"math"
	"strings"
	"testing"
)

// The core and pick-up keys of the coil block (spec/core.go).

const rodBody = "form = solenoid\nmean-diameter = 20 mm\nlength = 100 mm\nturns = 200\nwire = AWG 28\ncurrent = 0.1 A\n"

// recvBody has no drive: with a frequency it is a pick-up coil.
const recvBody = "form = solenoid\nmean-diameter = 20 mm\nlength = 50 mm\nturns = 200\nwire = AWG 36\n"

func TestCoreKeysBroken(t *testing.T) {
	core := "core-permeability = 1000\ncore-length = 150 mm\ncore-diameter = 10 mm\n"
	cases := []struct {
		name string
		src  string
		line int
		msg  string
	}{
		{"permeability below 1", fenced("coil", rodBody+"core-permeability = 0.5\ncore-length = 150 mm\ncore-diameter = 10 mm\n"), 8,
			`core-permeability: 0.5 must be at least 1`},
		{"permeability with unit", fenced("coil", rodBody+"core-permeability = 1000 H/m\ncore-length = 150 mm\ncore-diameter = 10 mm\n"), 8,
			`core-permeability: want a plain number`},
		{"core without diameter", fenced("coil", rodBody+"core-permeability = 1000\ncore-length = 150 mm\n"), 8,
			`coil "coil 1": a core needs core-permeability, core-length and core-diameter; core-diameter is missing`},
		{"core wider than the coil", fenced("coil", rodBody+"core-permeability = 1000\ncore-length = 150 mm\ncore-diameter = 25 mm\n"), 10,
			`core-diameter 25 mm does not fit inside mean-diameter 20 mm`},
		{"core in a pair", fenced("coil", "form = pair\nmean-diameter = 100 mm\nspacing = 50 mm\nturns = 20\nwire = AWG 24\ncurrent = 1 A\n"+core), 8,
			`a core is modelled only in a loop or solenoid, not a pair`},
		{"saturation as field strength", fenced("coil", rodBody+core+"core-saturation = 1000 A/m\n"), 11,
			`core-saturation: 1000 A/m is a field strength; want a flux density (T)`},
		{"saturation above 5 T", fenced("coil", rodBody+core+"core-saturation = 8 T\n"), 11,
			`core-saturation: 8 T is above 5 T`},
		{"remanence above saturation", fenced("coil", rodBody+core+"core-saturation = 0.8 T\ncore-remanence = 0.9 T\n"), 12,
			`core-remanence 0.9 T is not below core-saturation 0.8 T`},
		{"density as mass", fenced("coil", rodBody+core+"core-density = 8 kg\n"), 11,
			`core-density: 8 kg is a mass`},
		{"B-H falling", fenced("coil", rodBody+core+"core-bh = 10 A/m 0.5 T, 100 A/m 0.4 T\n"), 11,
			`core-bh: point 2: H must rise and B must not fall`},
		{"B-H one point", fenced("coil", rodBody+core+"core-bh = 10 A/m 0.5 T\n"), 11,
			`core-bh: want at least two points`},
		{"B-H without H", fenced("coil", rodBody+core+"core-bh = 0.5 T, 1 T\n"), 11,
			`core-bh: point 1 "0.5 T": want a field strength and a flux density`},
		{"misspelt core key", fenced("coil", rodBody+"core-permeabilty = 1000\n"), 8,
			`unknown key "core-permeabilty" in coil block; did you mean "core-permeability"?`},
		{"band on a driven coil", fenced("coil", rodBody+"frequency = 1 kHz\nband = 1 Hz .. 1 kHz\n"), 9,
			`band belongs to a pick-up coil`},
		{"band reversed", fenced("coil", recvBody+"frequency = 1 kHz\nband = 1 kHz .. 10 Hz\n"), 8,
			`band: 1 kHz .. 10 Hz: want 0 < low < high`},
		{"band without range", fenced("coil", recvBody+"band = 1 kHz\n"), 7,
			`band: want a range such as 1 Hz .. 10 kHz`},
		{"load capacitance unit", fenced("coil", recvBody+"frequency = 1 kHz\nload-capacitance = 100 pH\n"), 8,
			`load-capacitance: want a capacitance in pF, nF, uF or F`},
		{"receiver with duty", fenced("coil", recvBody+"frequency = 1 kHz\nduty = 50 %\n"), 8,
			`duty has no meaning for a pick-up coil`},
		{"no drive and no frequency", fenced("coil", recvBody), 1,
			`no drive: give current or voltage (or, for a pick-up coil, a frequency)`},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, ds := Parse("t.md", []byte(c.src))
			for _, d := range ds {
				if d.Line == c.line && strings.Contains(d.Msg, c.msg) {
					return
				}
			}
			t.Errorf("want line %d: %q; got\n%s", c.line, c.msg, ds.Error())
		})
	}
}

func TestCoreKeysGood(t *testing.T) {
	src := fenced("coil", rodBody+"core-permeability = 2500\ncore-length = 6 in\ncore-diameter = 10 mm\ncore-saturation = 1.2 T\n"+
		"core-density = 7.8 g/cm3\ncore-specific-heat = 0.46 J/(g K)\ncore-remanence = 0.5 T\ncore-coercivity = 80 A/m\ncore-bh = 50 A/m 0.4 T; 200 A/m 1 T, 2 kA/m 1.3 T\n") +
		fenced("coil", recvBody+"name = pickup\ncentre = (0, 0, 300) mm\nfrequency = 1 kHz\nband = 10 .. 100 Hz\nload-capacitance = 220 pF\n")
	s, ds := Parse("g.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	k := s.Design.Coils[0].Core
	// 6 in = 152.4 mm exactly (the inch is 25.4 mm, 1959); 7.8 g/cm³ = 7800 kg/m³.
	if k.Permeability != 2500 || k.Length != 0.1524 || k.Diameter != 0.01 || k.Saturation != 1.2 ||
		k.Density != 7800 || math.Abs(k.SpecificHeat-460) > 1e-12 || k.Remanence != 0.5 || k.Coercivity != 80 || !k.Present() {
		t.Errorf("core %+v", k)
	}
	if len(k.Curve) != 3 || k.Curve[2].H != 2000 || k.Curve[2].B != 1.3 || k.Curve[0].H != 50 {
		t.Errorf("B–H curve %+v", k.Curve)
	}
	r := s.Design.Coils[1]
	if r.Current != 0 || r.Voltage != 0 || r.Frequency != 1000 || r.BandLow != 10 || r.BandHigh != 100 ||
		r.LoadCapacitance < 219.9999e-12 || r.LoadCapacitance > 220.0001e-12 {
		t.Errorf("receiver %+v", r)
	}
}

// A core's specific heat without its density gives no heat capacity: the
// spec is read, with a warning at the specific heat's line.
func TestCoreSpecificHeatWithoutDensityWarns(t *testing.T) {
	src := fenced("coil", rodBody+"core-permeability = 2500\ncore-length = 6 in\ncore-diameter = 10 mm\ncore-specific-heat = 447 J/(kg K)\n")
	s, ds := Parse("w.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	if len(s.Warnings) != 1 || !strings.Contains(s.Warnings[0].Msg, "core-specific-heat without core-density") {
		t.Errorf("warnings %v", s.Warnings)
	}
}
