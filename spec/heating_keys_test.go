package spec

import (
	"strings"
	"testing"

	"coilmemo/calc"
)

// The switching, a.c. and heating keys of the coil and conditions blocks.

func TestHeatingKeysBroken(t *testing.T) {
	cases := []struct {
		name string
		src  string
		line int
		msg  string
	}{
		{"switch-off as voltage", fenced("coil", coilBody+"switch-off = 10 V\n"), 6,
			`switch-off: 10 V is a voltage; want a time (s)`},
		{"switch-off negative", fenced("coil", coilBody+"switch-off = -10 us\n"), 6,
			`switch-off: -10 us must be greater than zero`},
		{"driver-rating without unit", fenced("coil", coilBody+"driver-rating = 40\n"), 6,
			`driver-rating: no unit given: 40 (expected a voltage such as V)`},
		{"driver-rating under supply", fenced("coil", "mean-diameter = 40 mm\nturns = 100\nwire = AWG 28\nvoltage = 24 V\ndriver-rating = 12 V\n"), 6,
			`coil "coil 1": driver-rating 12 V is not above the supply voltage 24 V`},
		{"frequency as time", fenced("coil", coilBody+"frequency = 1 ms\n"), 6,
			`frequency: 1 ms is a time; want a frequency (Hz)`},
		{"on-time without duty", fenced("coil", coilBody+"on-time = 30 s\n"), 6,
			`coil "coil 1": on-time needs a duty below 100 %`},
		{"on-time with full duty", fenced("coil", coilBody+"duty = 100 %\non-time = 30 s\n"), 7,
			`on-time needs a duty below 100 %`},
		{"on-time as length", fenced("coil", coilBody+"duty = 20 %\non-time = 30 m\n"), 7,
			`on-time: 30 m is a length; want a time (s)`},
		{"former mass alone", fenced("coil", coilBody+"former-mass = 12 g\n"), 6,
			`coil "coil 1": former-mass needs former-material (or give former-heat-capacity instead)`},
		{"former material alone", fenced("coil", coilBody+"former-material = peek\n"), 6,
			`former-material needs former-mass`},
		{"former both ways", fenced("coil", coilBody+"former-mass = 12 g\nformer-material = peek\nformer-heat-capacity = 15 J/K\n"), 8,
			`give former-heat-capacity or former-mass + former-material, not both`},
		{"former unknown material", fenced("coil", coilBody+"former-mass = 12 g\nformer-material = unobtainium\n"), 7,
			`former-material = unobtainium: want one of aluminium, brass, copper, stainless-steel, peek, nylon, acrylic, ptfe, fr4, or give former-heat-capacity`},
		{"heat capacity unit", fenced("coil", coilBody+"former-heat-capacity = 15 J\n"), 6,
			`former-heat-capacity: 15 J is a torque or energy; want a heat capacity (J/K)`},
		{"winding conductivity unit", fenced("coil", coilBody+"winding-conductivity = 0.3 W/m2K\n"), 6,
			`winding-conductivity: 0.3 W/m2K is a heat-transfer coefficient; want a thermal conductivity (W/(m·K))`},
		{"misspelt switch-off", fenced("coil", coilBody+"switchoff = 10 us\n"), 6,
			`unknown key "switchoff" in coil block; did you mean "switch-off"?`},
		{"gradient as field", fenced("coil", coilBody) + fenced("conditions", "field-gradient = 2 mT\n"), 8,
			`field-gradient: 2 mT is a flux density; want a field gradient (T/m)`},
		{"mount resistance as temperature", fenced("coil", coilBody) + fenced("conditions", "mount-resistance = 5 K\n"), 8,
			`mount-resistance: 5 K is a temperature; want a thermal resistance (K/W)`},
		{"mount resistance zero", fenced("coil", coilBody) + fenced("conditions", "mount-resistance = 0 K/W\n"), 8,
			`mount-resistance: 0 K/W must be greater than zero`},
		{"orientation", fenced("coil", coilBody) + fenced("conditions", "orientation = sideways\n"), 8,
			`orientation = sideways: want horizontal or vertical`},
		{"up as a word", fenced("coil", coilBody) + fenced("conditions", "up = skyward\n"), 8,
			`up: "skyward": want x, y, z (optionally signed, e.g. -z) or a direction (x, y, z)`},
		{"up of zeros", fenced("coil", coilBody) + fenced("conditions", "ambient = 20 degC\nup = (0, 0, 0)\n"), 9,
			`up: (0, 0, 0) has no direction`},
		{"orientation against up", fenced("coil", coilBody) + fenced("conditions", "orientation = horizontal\nup = z\n"), 8,
			`orientation = horizontal, but with up on line 9 the axis of coil "coil 1" is vertical`},
		{"orientation against up, second coil", fenced("coil", coilBody+"axis = x\n") + fenced("coil", coilBody+"name = z coil\ncentre = (0, 0, 50) mm\n") +
			fenced("conditions", "up = (0, 0.2, 1)\norientation = horizontal\n"), 18,
			`orientation = horizontal, but with up on line 17 the axis of coil "z coil" is vertical`},
		{"gradient in coil block", fenced("coil", coilBody+"field-gradient = 2 mT/m\n"), 6,
			`key "field-gradient" belongs in the conditions block, not the coil block`},
		{"on-time in conditions", fenced("coil", coilBody) + fenced("conditions", "on-time = 2 s\n"), 8,
			`key "on-time" belongs in the coil block, not the conditions block`},
		{"enclosure", fenced("coil", coilBody) + fenced("conditions", "enclosure = boxed\n"), 8,
			`enclosure = boxed: want open or covered`},
		{"misspelt enclosure", fenced("coil", coilBody) + fenced("conditions", "enclosur = covered\n"), 8,
			`unknown key "enclosur" in conditions block; did you mean "enclosure"?`},
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

func TestHeatingKeysGood(t *testing.T) {
	src := fenced("coil", coilBody+"switch-off = 10 us\ndriver-rating = 40 V\nfrequency = 1 kHz\nduty = 25 %\non-time = 2 min\n"+
		"former-mass = 12 g\nformer-material = PEEK\nwinding-conductivity = 0.8 W/(m K)\n") +
		fenced("coil", coilBody+"name = second\ncentre = (0, 0, 50) mm\nformer-heat-capacity = 15 J/K\n") +
		fenced("conditions", "field-gradient = 2 mT/m\nmount-resistance = 5 K/W\norientation = vertical\ncooling = vacuum\n")
	s, ds := Parse("g.md", []byte(src))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	c := s.Design.Coils[0]
	if c.SwitchOff != 10e-6 || c.DriverRating != 40 || c.Frequency != 1000 || c.Duty != 0.25 || c.OnTime != 120 ||
		c.Former.Mass != 0.012 || c.Former.Material != "peek" || c.Former.SpecificHeat != 1340 || c.WindingConductivity != 0.8 {
		t.Errorf("coil 1: %+v", c)
	}
	if got := s.Design.Coils[1].Former.Capacity(); got != 15 {
		t.Errorf("coil 2 former heat capacity %g", got)
	}
	cond := s.Design.Conditions
	if cond.FieldGradient != 2e-3 || cond.MountResistance != 5 || !cond.AxisVertical || !cond.Cooling.Vacuum {
		t.Errorf("conditions %+v", cond)
	}
	want := map[string]string{"switch-off": "1e-5 s", "on-time": "120 s", "former-material": "peek (c = 1340 J/(kg·K))",
		"field-gradient": "0.002 T/m", "mount-resistance": "5 K/W", "orientation": "coil axes vertical"}
	for _, e := range s.Entries {
		if w, ok := want[e.Key]; ok && e.SI != w {
			t.Errorf("%s: SI %q, want %q", e.Key, e.SI, w)
		}
	}
	// enclosure: covered under a surface people touch, or open (the default)
	for _, tc := range []struct {
		cond    string
		covered bool
	}{{"enclosure = covered\n", true}, {"enclosure = Open\n", false}, {"ambient = 25 degC\n", false}} {
		s, ds := Parse("e.md", []byte(fenced("coil", coilBody)+fenced("conditions", tc.cond)))
		if len(ds) > 0 {
			t.Fatal(ds.Error())
		}
		if s.Design.Conditions.Cooling.Covered != tc.covered {
			t.Errorf("%q: covered %v", tc.cond, s.Design.Conditions.Cooling.Covered)
		}
	}
	// up with a design-wide orientation that agrees with every axis
	s, ds = Parse("u.md", []byte(fenced("coil", coilBody+"axis = x\n")+fenced("conditions", "orientation = horizontal\nup = -y\n")))
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	if s.Design.Conditions.Up != (calc.Vec{0, -1, 0}) || calc.AxisIsVertical(s.Design.Coils[0], s.Design.Conditions) {
		t.Errorf("up = -y: %+v", s.Design.Conditions)
	}
	if m, ok := calc.FormerMaterialByName("Aluminum"); !ok || m.Name != "aluminium" {
		t.Error("aluminum spelling")
	}
}
