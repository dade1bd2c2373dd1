package format

import (
	"math"
	"strings"
	"testing"
)

func TestPercentAndMargin(t *testing.T) {
	for _, c := range []struct{ got, want string }{
		{Percent(0), "0 %"}, {Percent(0.0031), "0.31 %"}, {Percent(0.01), "1.0 %"},
		{Percent(1e-9), "< 0.001 %"}, {Percent(1.6e-8), "< 0.001 %"}, {Percent(-3e-12), "< 0.001 %"}, {Percent(2e-5), "0.0020 %"},
		{SignedPercent(0.063), "+6.3 %"}, {SignedPercent(-0.0052), "−0.52 %"}, {SignedPercent(-1e-9), "< 0.001 %"}, {SignedPercent(0), "0 %"},
		{Margin(-0.04, "%"), "0.0 %"}, {Margin(0.04, "%"), "0.0 %"}, {Margin(-3.14, "K"), "−3.1 K"}, {Margin(12.46, "%"), "+12.5 %"}, {Margin(9999.94, "%"), "+9999.9 %"}, {Margin(4.30198e10, "%"), "+4.30×10¹⁰ %"}, {Margin(-2.5e4, "K"), "−2.50×10⁴ K"},
		{Count(1, "check", "checks"), "1 check"}, {Count(2, "check", "checks"), "2 checks"}, {Count(0, "check", "checks"), "0 checks"},
	} {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
}

func TestChangeUnits(t *testing.T) {
	// 42.27 °C → 44.95 °C is a rise of 2.68 K, written in kelvin.
	from, to, d := Change(273.15+42.27, 273.15+44.95, "°C")
	if from != "42.27 °C" || to != "44.95 °C" || d != "+2.7 K" {
		t.Errorf("temperature: %q → %q (%q)", from, to, d)
	}
	from, to, d = Change(449.6e-6, 584.5e-6, "T")
	if from != "449.6 µT" || to != "584.5 µT" || d != "+30 %" {
		t.Errorf("field: %q → %q (%q)", from, to, d)
	}
	if _, _, d := Change(0, 2e-3, "A"); d != "+2.00 mA" {
		t.Errorf("from zero: %q", d)
	}
}

// Raw SI from the spec reader is written in engineering units without
// losing or inventing digits: no "(0, 0, 0) m" beside positions in mm, no
// "0.04 kg", no range step left in SI, no bare diameter in mm beside
// overall diameters in µm, one range sign.
func TestSIText(t *testing.T) {
	for in, want := range map[string]string{
		"0.000237217 m (heavy-build estimate)": "237.217 µm (heavy-build estimate)",
		"2e-06 s":                              "2 µs",
		"2e-6 s":                               "2 µs",
		"0.12 m":                               "120 mm",
		"0.003 m = (outer-diameter − inner-diameter)/2": "3 mm = (outer-diameter − inner-diameter)/2",
		"(0, 3e-05, 0) T":            "(0, 30, 0) µT",
		"(0.01, 0, 0.01) m":          "(10, 0, 10) mm",
		"(0, 0, 0) m":                "(0, 0, 0) mm", // a position in mm, as every other
		"0 m":                        "0 mm",
		"0.04 kg":                    "40 g",
		"0.008 kg":                   "8 g",
		"1.5 kg":                     "1.5 kg",
		"0.1 A .. 1 A step 0.1 A":    "100 mA … 1 A step 100 mA",
		"20 .. 60 step 20":           "20 … 60 step 20",
		"AWG 26 .. AWG 34 (9 wires)": "AWG 26 … AWG 34 (9 wires)",
		"10 Hz .. 10000 Hz":          "10 Hz … 10 kHz",
		"0 m .. 0.012 m":             "0 … 12 mm",
		"0.002 m .. 0.012 m":         "2 … 12 mm",
		"253.15 K .. 333.15 K":       "253.15 … 333.15 K",
		"1.5e-10 F":                  "150 pF",
		"1 A":                        "1 A",
		"293.15 K (20 °C)":           "293.15 K (20 °C)",
		"0.85":                       "0.85",
		"2026-12-01":                 "2026-12-01",
		"AWG 28 (bare 0.321 mm)":     "AWG 28 (bare 321 µm)",
		"1.5708 rad (90°)":           "1.5708 rad (90°)",
		"-0.02 m":                    "−20 mm",
	} {
		if got := SIText(in); got != want {
			t.Errorf("SIText(%q) = %q, want %q", in, got, want)
		}
	}
}

// A derived or default value is written to four significant figures;
// kelvin, counts and words are left alone.
func TestSITextSig(t *testing.T) {
	for in, want := range map[string]string{
		"0.00109122 m (heavy-build estimate)":           "1.091 mm (heavy-build estimate)",
		"0.000127425 m (heavy-build estimate)":          "127.4 µm (heavy-build estimate)",
		"0.087099 m = outer-diameter − radial-build":    "87.1 mm = outer-diameter − radial-build",
		"0.02125 m = (inner-diameter + radial-build)":   "21.25 mm = (inner-diameter + radial-build)",
		"1.5708 rad (90°)":                              "1.571 rad (90°)",
		"(0, 0, 0) T":                                   "(0, 0, 0) T",
		"(0.0123456, 0, 0) m":                           "(12.35, 0, 0) mm",
		"10 Hz .. 12345.6 Hz":                           "10 Hz … 12.35 kHz",
		">= 0.000123456 T":                              ">= 123.5 µT",
		"293.15 K (20 °C)":                              "293.15 K (20 °C)",
		"0.85":                                          "0.85",
		"still-air (natural convection, Churchill–Chu)": "still-air (natural convection, Churchill–Chu)",
	} {
		if got := SITextSig(in, 4); got != want {
			t.Errorf("SITextSig(%q, 4) = %q, want %q", in, got, want)
		}
	}
}

// A cubed unit takes no prefix (10⁻⁶ m³ is 1 cm³, not 1 µm³).
func TestVolume(t *testing.T) {
	for _, c := range []struct {
		v    float64
		want string
	}{{7.854e-6, "7.854 cm³"}, {2.5e-4, "250.0 cm³"}, {0.012, "0.01200 m³"}} {
		if got := Eng(c.v, "m³", 4); got != c.want {
			t.Errorf("Eng(%g, m³) = %q, want %q", c.v, got, c.want)
		}
	}
}

// A temperature on the Celsius scale has a resolution, not a count of
// figures: near 0 °C it keeps the decimals of a temperature of tens of
// degrees.
func TestCelsiusResolution(t *testing.T) {
	for _, c := range []struct {
		v    float64
		sig  int
		want string
	}{
		{0.5967, 4, "0.60 °C"}, {37.72, 4, "37.72 °C"}, {75.69, 4, "75.69 °C"}, {155, 4, "155.0 °C"}, {155, 3, "155 °C"},
		{34.49, 3, "34.5 °C"}, {0.5967, 3, "0.6 °C"}, {-20, 3, "−20.0 °C"}, {-0.001, 4, "0.00 °C"}, {9.996, 4, "10.00 °C"},
		{1234.5, 3, "1230 °C"}, {0, 4, "0.00 °C"},
	} {
		if got := Eng(c.v, "°C", c.sig); got != c.want {
			t.Errorf("Eng(%v, °C, %d) = %q, want %q", c.v, c.sig, got, c.want)
		}
	}
}

// A dimensionless number is written plainly where it is short, in powers
// of ten only where it is large or small.
func TestSciPlainWhereShort(t *testing.T) {
	for _, c := range []struct {
		v    float64
		want string
	}{
		{10.4, "10"}, {14.2, "14"}, {913, "910"}, {1820, "1800"}, {0.076, "0.076"}, {9995, "1.0×10⁴"},
		{2.7e4, "2.7×10⁴"}, {2.9e6, "2.9×10⁶"}, {0.0076, "7.6×10⁻³"}, {-14.2, "−14"},
	} {
		if got := Sci(c.v, 2); got != c.want {
			t.Errorf("Sci(%v, 2) = %q, want %q", c.v, got, c.want)
		}
	}
}

// Every margin of a requirement is written one way: a percent to one
// decimal, a margin of almost nothing without a bare zero, and a value
// many times an at-least requirement as the ratio.
func TestRelMargin(t *testing.T) {
	for _, c := range []struct {
		m    float64
		want string
	}{
		{0.125, "+12.5 %"}, {-0.031, "−3.10 %"}, {0.00164, "+0.164 %"}, {0.0004, "+0.0400 %"}, {-0.0004, "−0.0400 %"},
		// the old threshold of 0.05 %: a margin there is a margin of 0.05 %
		{0.0005, "+0.0500 %"}, {0.00049999, "+0.0500 %"}, {0.0005000001, "+0.0500 %"}, {-0.0005, "−0.0500 %"},
		// the floor, 0.001 %, on either side and at it
		{1e-5, "+0.00100 %"}, {-1e-5, "−0.00100 %"}, {0.99e-5, "< +0.001 %"}, {-0.99e-5, "> −0.001 %"},
		{1e-15, "< +0.001 %"}, {-1e-15, "> −0.001 %"}, {0, "0 %"},
		{1.71, "+171 %"}, {8.99, "+899 %"}, {71.736, "×73"}, {9, "×10"}, {4.3e8, "×4.3×10⁸"},
	} {
		if got := RelMargin(c.m); got != c.want {
			t.Errorf("RelMargin(%v) = %q, want %q", c.m, got, c.want)
		}
	}
}

// An insulation class is named one way: its IEC 60085 letter with its
// temperature.
func TestInsulationClass(t *testing.T) {
	for _, c := range []struct {
		k    float64
		want string
	}{
		{428.15, "class F (155 °C)"}, {403.15, "class B (130 °C)"}, {453.15, "class H (180 °C)"}, {523.15, "class 250 (250 °C)"}, {443.15, "class 170 °C"},
	} {
		if got := InsulationClass(c.k); got != c.want {
			t.Errorf("InsulationClass(%v) = %q, want %q", c.k, got, c.want)
		}
	}
}

func TestTolerance(t *testing.T) {
	for _, c := range []struct {
		v    float64
		want string
	}{
		{0.01, "1 %"}, {0.002, "0.2 %"}, {1e-5, "0.001 %"}, {0, "0 %"},
		// below 0.001 % in parts per million, never a power of ten
		{1e-8, "0.01 ppm"}, {1e-12, "0.000001 ppm"}, {3e-8, "0.03 ppm"}, {4.3e-6, "4.3 ppm"}, {9.94e-6, "9.9 ppm"},
		{0.00018, "0.018 %"}, {0.0001715, "0.017 %"}, {0.3, "30 %"}, {0.02, "2 %"},
	} {
		if got := Tolerance(c.v); got != c.want {
			t.Errorf("Tolerance(%g) = %q, want %q", c.v, got, c.want)
		}
	}
}

// A check's difference is printed in its tolerance's unit at a
// resolution at least ten times finer than the tolerance, or as "< x"
// with x a tenth of the tolerance or less; never "0 %" nor a power of
// ten.
func TestCheckDiff(t *testing.T) {
	for _, c := range []struct {
		d, tol float64
		want   string
	}{
		{0, 0.01, "< 0.001 %"}, {2.6e-7, 1e-5, "< 0.0001 %"}, {2.6e-16, 1e-8, "< 0.001 ppm"},
		{1.4e-5, 0.00018, "0.0014 %"}, {0.0048, 0.005, "0.48 %"}, {0.12, 0.01, "12.0 %"},
		{5.2e-5, 0.01, "0.0052 %"}, {3.2e-9, 1e-8, "0.0032 ppm"}, {1.06e-5, 0.01, "0.0011 %"},
		{4.7e-7, 4.3e-6, "0.47 ppm"}, {2e-5, 1e-8, "20.000 ppm"}, {1.2e-3, 2e-6, "1200.0 ppm"},
		{0.17, 0.3, "17 %"}, {-2e-4, 0.002, "0.020 %"},
	} {
		if got := CheckDiff(c.d, c.tol); got != c.want {
			t.Errorf("CheckDiff(%g, %g) = %q, want %q", c.d, c.tol, got, c.want)
		}
	}
}

// CeilSig rounds up to two figures and keeps a value that has them.
func TestCeilSig(t *testing.T) {
	for _, c := range []struct{ v, want float64 }{
		{0.0001715148888888889, 0.00018}, {0.01, 0.01}, {1e-5, 1e-5}, {0.002, 0.002}, {1.0000000001e-8, 1e-8}, {0.31, 0.31}, {0.3100001, 0.32},
	} {
		if got := CeilSig(c.v, 2); math.Abs(got-c.want) > 1e-15*c.want {
			t.Errorf("CeilSig(%g, 2) = %g, want %g", c.v, got, c.want)
		}
	}
}

// A column of values is written in one unit, zeros included: a table of
// probe fields does not put "0 T" or "92.53 nT" beside µT.
func TestEngColumn(t *testing.T) {
	for _, c := range []struct {
		vals []float64
		ref  float64
		want []string
	}{
		{[]float64{0, 92.53e-9, 433.0e-6}, 0, []string{"0 µT", "0.09253 µT", "433.0 µT"}},
		{[]float64{0, 0}, 433.0e-6, []string{"0 µT", "0 µT"}},
		{[]float64{0, 1e-20}, 0, []string{"0 T", "0 T"}},
		{[]float64{-106.5e-6, 177.7e-6}, 0, []string{"−106.5 µT", "177.7 µT"}},
		{[]float64{999.96e-6, 1e-6}, 0, []string{"1.000 mT", "0.001000 mT"}},
		{[]float64{369.9e-9, 0, 10.22e-3}, 10.22e-3, []string{"0.0003699 mT", "0 mT", "10.22 mT"}},
	} {
		got := EngColumn(c.vals, c.ref, "T", 4)
		if strings.Join(got, "|") != strings.Join(c.want, "|") {
			t.Errorf("EngColumn(%v) = %q, want %q", c.vals, got, c.want)
		}
	}
}
