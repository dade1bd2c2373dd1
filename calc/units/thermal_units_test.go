package units

import "testing"

func TestGradientAndThermalUnits(t *testing.T) {
	for _, c := range []struct {
		s    string
		v    float64
		d    Dim
		name string
	}{
		{"2 mT/m", 2e-3, FieldGradient, "field gradient"},
		{"1 G/cm", 1e-2, FieldGradient, "field gradient"},
		{"5 K/W", 5, ThermalResistance, "thermal resistance"},
		{"12 J/K", 12, HeatCapacity, "heat capacity"},
		{"0.3 W/(m K)", 0.3, Conductivity, "thermal conductivity"},
	} {
		q, err := ParseAs(c.s, c.d)
		if err != nil || q.Value < c.v*(1-1e-12) || q.Value > c.v*(1+1e-12) {
			t.Errorf("%s: %v %v", c.s, q, err)
		}
		if c.d.Name() != c.name {
			t.Errorf("%s: name %q", c.s, c.d.Name())
		}
	}
	if _, err := ParseAs("5 K", ThermalResistance); err == nil || err.Error() != "5 K is a temperature; want a thermal resistance (K/W)" {
		t.Errorf("message: %v", err)
	}
}
