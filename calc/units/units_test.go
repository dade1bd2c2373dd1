package units

import (
	"math"
	"strings"
	"testing"
	"unicode/utf8"
)

func near(a, b float64) bool {
	if a == b {
		return true
	}
	return math.Abs(a-b) <= 1e-12*math.Max(math.Abs(a), math.Abs(b))
}

// Known conversions. The trade-unit factors are exact by definition
// (NIST SP 811, appendix B): 1 in = 0.0254 m, 1 mil = 2.54e-5 m,
// 1 ft = 0.3048 m, 1 G = 1e-4 T, T/K = t/°C + 273.15,
// T/K = (t/°F + 459.67)/1.8.
func TestParseKnown(t *testing.T) {
	cases := []struct {
		in   string
		want float64
		dim  Dim
	}{
		{"12.5 mm", 0.0125, Length},
		{"1 in", 0.0254, Length},
		{"1.5 in", 0.0381, Length},
		{"1 inch", 0.0254, Length},
		{"20 mil", 20 * 25.4e-6, Length},
		{"1 mil", 25.4e-6, Length},
		{"1 ft", 0.3048, Length},
		{"3 cm", 0.03, Length},
		{"2 km", 2000, Length},
		{"0.5 G", 0.5e-4, FluxDensity},
		{"1 gauss", 1e-4, FluxDensity},
		{"2 mG", 2e-7, FluxDensity},
		{"45 µT", 45e-6, FluxDensity},
		{"45 μT", 45e-6, FluxDensity},
		{"3 uT", 3e-6, FluxDensity},
		{"50 nT", 50e-9, FluxDensity},
		{"0 degC", 273.15, Temperature},
		{"25 degC", 298.15, Temperature},
		{"25 °C", 298.15, Temperature},
		{"25°C", 298.15, Temperature},
		{"25 ℃", 298.15, Temperature},
		{"300 K", 300, Temperature},
		{"32 degF", 273.15, Temperature},
		{"-40 °F", 233.15, Temperature},
		{"212 degF", 373.15, Temperature},
		{"0.2 A m2", 0.2, Moment},
		{"1e-3 A·m²", 1e-3, Moment},
		{"2 A*m^2", 2, Moment},
		{"2 A⋅m^2", 2, Moment},
		{"10 W/m2K", 10, HeatTransfer},
		{"10 W/(m2 K)", 10, HeatTransfer},
		{"10 W/m^2/K", 10, HeatTransfer},
		{"10 W/(m²·K)", 10, HeatTransfer},
		{"10 W m-2 K-1", 10, HeatTransfer},
		{"10 W·m⁻²·K⁻¹", 10, HeatTransfer},
		{"10 W/(m2 degC)", 10, HeatTransfer},
		{"50 %", 0.5, Dimensionless},
		{"12", 12, Dimensionless},
		{"1.2 kW", 1200, Power},
		{"3 mA", 3e-3, Current},
		{"24 V", 24, Voltage},
		{"4.7 kΩ", 4700, Resistance},
		{"4.7 kohm", 4700, Resistance},
		{"12 \u2126", 12, Resistance},
		{"2.2 mH", 2.2e-3, Inductance},
		{"5 mN m", 5e-3, Torque},
		{"5 N.m", 5, Torque},
		{"3 J", 3, Energy},
		{"4 A/mm2", 4e6, CurrentDensity},
		{"90 deg", math.Pi / 2, Angle},
		{"90°", math.Pi / 2, Angle},
		{"0.5 rad", 0.5, Angle},
		{"10 mrad", 0.01, Angle},
		{"2 min", 120, Time},
		{"250 ms", 0.25, Time},
		{"8890 kg/m3", 8890, Density},
		{"385 J/(kg K)", 385, SpecificHeat},
		{"0.00393 1/K", 0.00393, PerKelvin},
		{"1.7241e-8 ohm m", 1.7241e-8, Resistivity},
		{"−5 mm", -0.005, Length},
		{"+5 mm", 0.005, Length},
		{".5 mm", 0.0005, Length},
		{"50 Hz", 50, Frequency},
		{"1 mm/m", 1e-3, Dimensionless},
	}
	for _, c := range cases {
		q, err := Parse(c.in)
		if err != nil {
			t.Errorf("Parse(%q): %v", c.in, err)
			continue
		}
		if !near(q.Value, c.want) || !q.Is(c.dim) {
			t.Errorf("Parse(%q) = %v %v, want %v %v", c.in, q.Value, q.Dim, c.want, c.dim)
		}
	}
}

// Decimal prefixes give the correctly rounded SI value, not one off by an
// ulp from multiplying by an inexact 1e-6.
func TestParseExactDecimal(t *testing.T) {
	cases := map[string]float64{
		"20 uT": 2e-5, "120 mm": 0.12, "45 µT": 45e-6, "0.321 mm": 0.321e-3,
		"1.5 in": 0.0381, "20 mil": 0.000508, "0.5 G": 5e-5, "3 mA": 0.003,
		"4 A/mm2": 4e6, "50 %": 0.5,
	}
	for in, want := range cases {
		q, err := Parse(in)
		if err != nil || q.Value != want {
			t.Errorf("Parse(%q) = %v, %v; want exactly %v", in, q.Value, err, want)
		}
	}
}

func TestParseErrors(t *testing.T) {
	cases := []struct{ in, msg string }{
		{"", "empty value"},
		{"mm", `missing number before unit "mm"`},
		{"abc", `not a number: "abc"`},
		{"12 mmm", `unknown unit "mmm"`},
		{"12 MM", `did you mean "mm"?`},
		{"25 C", "degC"},
		{"12 m^", "exponent missing"},
		{"12 m^99", "exponent too large"},
		{"12 W/(m2 K", `missing ")"`},
		{"12 W/m2)", `unbalanced ")"`},
		{"12 A*", "nothing after"},
		{"1e999 m", "out of range"},
		{"-300 degC", "below absolute zero"},
		{"-1 K", "below absolute zero"},
		{"12 mm mm?", "unexpected"},
		{"AWG 24", "not a number"},
		{"24 AWG", "wire gauge"},
	}
	for _, c := range cases {
		_, err := Parse(c.in)
		if err == nil {
			t.Errorf("Parse(%q): no error, want %q", c.in, c.msg)
			continue
		}
		if !strings.Contains(err.Error(), c.msg) {
			t.Errorf("Parse(%q) error %q, want it to contain %q", c.in, err, c.msg)
		}
	}
}

func TestParseAs(t *testing.T) {
	cases := []struct {
		in   string
		want Dim
		msg  string
	}{
		{"120 mm", Current, "120 mm is a length; want a current (A)"},
		{"12", Length, "no unit given: 12 (expected a length such as mm)"},
		{"90", Angle, "no unit given: 90 (expected an angle such as deg)"},
		{"5 mm", Angle, "5 mm is a length; want an angle (rad)"},
		{"3 m/s", Length, "3 m/s has dimension m·s⁻¹; want a length (m)"},
		{"45 uT", FluxDensity, ""},
		{"50 %", Dimensionless, ""},
	}
	for _, c := range cases {
		_, err := ParseAs(c.in, c.want)
		got := ""
		if err != nil {
			got = err.Error()
		}
		if got != c.msg {
			t.Errorf("ParseAs(%q, %v) error %q, want %q", c.in, c.want, got, c.msg)
		}
	}
}

func TestDimOfLimitUnits(t *testing.T) {
	cases := map[string]Dim{
		"A m2":  Moment,
		"T":     FluxDensity,
		"W":     Power,
		"degC":  Temperature,
		"A":     Current,
		"V":     Voltage,
		"ohm":   Resistance,
		"kg":    Mass,
		"m":     Length,
		"A/mm2": CurrentDensity,
		"H":     Inductance,
		"N m":   Torque,
		"deg":   Angle,
	}
	for u, want := range cases {
		d, err := DimOf(u)
		if err != nil || d != want {
			t.Errorf("DimOf(%q) = %v, %v; want %v", u, d, err, want)
		}
	}
	if _, err := DimOf(""); err == nil {
		t.Error("DimOf(\"\") gave no error")
	}
	if _, err := DimOf("furlong"); err == nil {
		t.Error("DimOf(furlong) gave no error")
	}
}

func TestIn(t *testing.T) {
	cases := []struct {
		si   float64
		unit string
		want float64
	}{
		{0.12, "mm", 120},
		{293.15, "degC", 20},
		{273.15, "degF", 32},
		{4e6, "A/mm2", 4},
		{1e-4, "G", 1},
		{0.0254, "in", 1},
		{math.Pi, "deg", 180},
	}
	for _, c := range cases {
		got, err := In(c.si, c.unit)
		if err != nil || !near(got, c.want) {
			t.Errorf("In(%v, %q) = %v, %v; want %v", c.si, c.unit, got, err, c.want)
		}
	}
}

func TestFormat(t *testing.T) {
	cases := []struct {
		q    Quantity
		want string
	}{
		{Quantity{0.12, Length}, "0.12 m"},
		{Quantity{1.7241e-8, Resistivity}, "1.7241e-8 Ω·m"},
		{Quantity{4.5e-5, FluxDensity}, "4.5e-5 T"},
		{Quantity{0.2, Moment}, "0.2 A·m²"},
		{Quantity{10, HeatTransfer}, "10 W/(m²·K)"},
		{Quantity{0.5, Dimensionless}, "0.5"},
		{Quantity{1e6, CurrentDensity}, "1e6 A/m²"},
		{Quantity{3, Dim{M: 1, S: -1}}, "3 m·s⁻¹"},
		{Quantity{293.15, Temperature}, "293.15 K"},
	}
	for _, c := range cases {
		if got := c.q.String(); got != c.want {
			t.Errorf("%#v.String() = %q, want %q", c.q, got, c.want)
		}
	}
}

// Every SI string the package prints reads back as the same quantity.
func TestRoundTrip(t *testing.T) {
	dims := []Dim{Length, Area, Mass, Time, Current, Temperature, Frequency,
		Force, Torque, Power, Voltage, Resistance, Inductance, FluxDensity,
		MagneticFlux, FieldStrength, Moment, CurrentDensity, HeatTransfer,
		Pressure, Resistivity, Density, SpecificHeat, Conductivity,
		PerKelvin, Angle, Dimensionless, {M: 1, S: -1}, {Kg: 1, A: -3}}
	values := []float64{1, 0.12, 1.7241e-8, 4.5e-5, 293.15, 12345.6, 2.5e9}
	for _, d := range dims {
		for _, v := range values {
			s := Format(v, d)
			q, err := Parse(s)
			if err != nil {
				t.Errorf("Parse(Format(%v, %v) = %q): %v", v, d, s, err)
				continue
			}
			if q.Dim != d || math.Abs(q.Value-v) > 1e-5*math.Abs(v) {
				t.Errorf("round trip %q: got %v %v, want %v %v", s, q.Value, q.Dim, v, d)
			}
		}
	}
	// Parse then In recovers the number as written.
	for _, s := range []string{"12.5 mm", "45 uT", "25 degC", "-40 degF", "20 mil", "0.2 A m2", "3 W/m2K", "1.5 in"} {
		num, unit, _ := Split(s)
		q, err := Parse(s)
		if err != nil {
			t.Fatal(err)
		}
		back, err := In(q.Value, unit)
		want, _ := parseNumber(num)
		if err != nil || !near(back, want) {
			t.Errorf("In(Parse(%q)) = %v, %v; want %v", s, back, err, want)
		}
	}
}

func TestNames(t *testing.T) {
	if Describe(Inductance) != "an inductance (H)" {
		t.Errorf("Describe(Inductance) = %q", Describe(Inductance))
	}
	if Length.Name() != "length" || Moment.Symbol() != "A·m²" {
		t.Errorf("names: %q %q", Length.Name(), Moment.Symbol())
	}
}

func FuzzParse(f *testing.F) {
	for _, s := range []string{"12.5 mm", "0.2 A m2", "45 µT", "25 °C", "10 W/(m2 K)",
		"1e-3 A·m²", "2 A*m^2", "50 %", "W/m2K", "((((m))))", "1 m⁻¹²", "−5 in", "3 s^-2"} {
		f.Add(s)
	}
	for _, s := range []string{"2 h", "5 v", "3 Ms", "1 mT/m", "4 w/m2K", "-273.15 degC", "1e308 km", "0x10 m",
		"1_000 m", "5 µΩ·m", "2 kg·m·s⁻³", "1e-320 m", "7 K/W", "1 (m)/(s)"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		q, err := Parse(s)
		if err != nil {
			if msg := err.Error(); !utf8.ValidString(msg) || msg == "" {
				t.Errorf("Parse(%q): message %q", s, msg)
			}
		}
		if err == nil && (math.IsNaN(q.Value) || math.IsInf(q.Value, 0)) {
			t.Errorf("Parse(%q) = %v without error", s, q.Value)
		}
		if err == nil {
			// What Format writes, Parse reads back: same dimension, the
			// value to Format's six significant digits.
			out := Format(q.Value, q.Dim)
			back, err := Parse(out)
			// (A temperature within a compound unit is an interval and may
			// be negative; Format writes it as kelvin, which reads back as
			// an absolute temperature.)
			interval := q.Dim == Temperature && q.Value < 0
			if !interval && (err != nil || back.Dim != q.Dim || math.Abs(back.Value-q.Value) > 5e-6*math.Abs(q.Value)) {
				t.Errorf("Parse(%q) = %v; Format writes %q, read back as %v, %v", s, q.Value, out, back, err)
			}
			// The dimension of the unit alone is the quantity's, and a
			// value converts back into the unit it was written in.
			num, unit, _ := Split(s)
			if unit != "" {
				if d, err := DimOf(unit); err != nil || d != q.Dim {
					t.Errorf("DimOf(%q) = %v, %v; Parse gave %v", unit, d, err, q.Dim)
				}
				v, _ := parseNumber(num)
				// An offset unit (°C) carries its offset's rounding: 7e-15 °C
				// is 273.15 K to the last bit and comes back as 0 °C.
				zero, _ := In(0, unit)
				scale := math.Max(math.Max(math.Abs(v), math.Abs(zero)), 1e-300)
				if got, err := In(q.Value, unit); err != nil || math.Abs(got-v) > 1e-9*scale && math.Abs(v) > 1e-290 && math.Abs(v) < 1e290 {
					t.Errorf("In(Parse(%q)) = %v, %v; want %v", s, got, err, v)
				}
			}
			// ParseAs agrees with Parse on the dimension it gave.
			if q2, err := ParseAs(s, q.Dim); err != nil || q2 != q {
				t.Errorf("ParseAs(%q, %v) = %v, %v; Parse gave %v", s, q.Dim, q2, err, q)
			}
		}
		_, _ = DimOf(s)
		_, _ = In(1, s)
		if _, err := ParseAs(s, Time); err != nil && !utf8.ValidString(err.Error()) {
			t.Errorf("ParseAs(%q, Time): message %q", s, err)
		}
	})
}

// A suggestion of the other letter case, or of the symbol of a spelled-out
// name, is made only when it gives the wanted dimension: a time written
// "2 v" is not told about the volt, nor an inductance "2 hrs" about the hour.
func TestSuggestionWithinDimension(t *testing.T) {
	for _, c := range []struct {
		s      string
		want   Dim
		has    string
		hasNot string
	}{
		{"2 v", Time, "want a time (s)", `"V"`},
		{"2 h", Inductance, "is a time", `"H"`}, // the hour
		{"2 hrs", Time, `did you mean "h"?`, ""},
		{"2 hrs", Inductance, "want an inductance", `"h"`},
		{"5 secs", Time, `did you mean "s"?`, ""},
		{"5 minutes", Time, `did you mean "min"?`, ""},
		{"3 Hz", Time, "is a frequency", ""}, // known unit, wrong dimension
		{"5 v", Voltage, `did you mean "V"?`, ""},
		{"5 v", Length, "want a length (m), e.g. mm", `"V"`},
		{"4 w/m2K", HeatTransfer, `did you mean "W"?`, ""},
		{"4 w/s", HeatTransfer, "want a heat-transfer coefficient", `"W"`},
	} {
		_, err := ParseAs(c.s, c.want)
		if err == nil {
			t.Errorf("ParseAs(%q, %v): no error", c.s, c.want)
			continue
		}
		if !strings.Contains(err.Error(), c.has) || c.hasNot != "" && strings.Contains(err.Error(), c.hasNot) {
			t.Errorf("ParseAs(%q, %v) = %q; want it to say %q and not %q", c.s, c.want, err, c.has, c.hasNot)
		}
	}
}

// Found by fuzzing: a unit with exponent 0 (which turned a lone degC into
// a compound interval and let -1 A0 degC through as −1 K), and exponents
// whose product goes past the bound of one factor (V10 printed as
// kg¹⁰·m²⁰·s⁻³⁰·A⁻¹⁰, which Parse could not read back).
func TestFuzzFoundExponents(t *testing.T) {
	for _, s := range []string{"-1 A0 degC", "1 m0", "0 V10", "1 (m3)5"} {
		if q, err := Parse(s); err == nil {
			t.Errorf("Parse(%q) = %v, want an error", s, q)
		}
	}
	if q, err := Parse("2 s^-2"); err != nil || q.Dim != (Dim{S: -2}) {
		t.Errorf("Parse(2 s^-2) = %v, %v", q, err)
	}
}
