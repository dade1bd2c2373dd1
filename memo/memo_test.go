package memo

import (
	"bytes"
	"os"
	"testing"
)

func readExample(t *testing.T, name string) []byte {
	t.Helper()
	b, err := os.ReadFile("../examples/" + name)
	if err != nil {
		t.Fatal(err)
	}
	return b
}

// The same spec and tool version give byte-identical PDFs.
func TestPDFReproducible(t *testing.T) {
	src := readExample(t, "torque-coil.md")
	var out [2][]byte
	for i := range out {
		j, diags := evaluate("torque-coil.md", src)
		if len(diags) > 0 {
			t.Fatal(diags)
		}
		b, err := PDF(j)
		if err != nil {
			t.Fatal(err)
		}
		out[i] = b
	}
	if !bytes.Equal(out[0], out[1]) {
		t.Fatal("two builds of the same spec differ")
	}
	if !bytes.HasPrefix(out[0], []byte("%PDF-")) {
		t.Fatal("not a PDF")
	}
}

func TestPercent(t *testing.T) {
	for v, want := range map[float64]string{0: "0 %", 0.0031: "0.31 %", 0.01: "1.0 %", 1.6e-8: "< 0.001 %", 1e-9: "< 0.001 %", 2e-5: "0.0020 %"} {
		if got := Percent(v); got != want {
			t.Errorf("Percent(%g) = %q, want %q", v, got, want)
		}
	}
}

func TestSciAndDuration(t *testing.T) {
	for _, c := range []struct{ got, want string }{
		{Sci(2.9e6, 2), "2.9×10⁶"}, {Sci(170, 2), "170"}, {Sci(3, 2), "3.0"}, {Sci(-4.2e-9, 2), "−4.2×10⁻⁹"},
		{Duration(0.00158, 3), "1.58 ms"}, {Duration(45, 2), "45 s"}, {Duration(1100, 2), "18 min"}, {Duration(9000, 2), "2.5 h"},
	} {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
}

func TestEngineeringFormat(t *testing.T) {
	cases := []struct {
		v    float64
		unit string
		sig  int
		want string
	}{
		{0.00123, "T", 3, "1.23 mT"},
		{483e-6, "T", 3, "483 µT"},
		{999.96, "V", 3, "1.00 kV"},
		{0.15, "A·m²", 3, "150 mA·m²"},
		{-2.5e-3, "A", 2, "−2.5 mA"},
		{0.0143, "kg", 3, "14.3 g"},
		{3.2e-8, "m²", 2, "0.032 mm²"},
		{4.8e6, "A/m²", 2, "4.8 A/mm²"},
		{71.5, "°C", 3, "71.5 °C"},
		{0, "T", 3, "0 T"},
		{1.7241e-8, "", 5, "1.7241×10⁻⁸"},
	}
	for _, c := range cases {
		if got := Eng(c.v, c.unit, c.sig); got != c.want {
			t.Errorf("Eng(%g, %q, %d) = %q, want %q", c.v, c.unit, c.sig, got, c.want)
		}
	}
}
