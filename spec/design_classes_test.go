package spec

import (
	"testing"

	"coilmemo/format"
)

// The letters the reader accepts (IEC 60085:2007, Table 1) are the letters
// the memo names the classes by: the two tables agree.
func TestInsulationLettersAgree(t *testing.T) {
	for letter, c := range insulationClasses {
		if got, want := format.InsulationClass(c+zeroCelsius), "class "+letter+" ("; len(got) < len(want) || got[:len(want)] != want {
			t.Errorf("class %s (%g °C) is named %q", letter, c, got)
		}
	}
	for _, c := range thermalClasses {
		k, label, err := parseInsulation(format.Sig(c, 3) + " degC")
		if err != nil || k != c+zeroCelsius || label != "" {
			t.Errorf("%g degC: %v %q %v", c, k, label, err)
		}
	}
}

// A requirement's value is given in SI in the unit its quantity is known
// in: a sensitivity in V/T, never in the base units m²·s⁻¹ it reduces to.
// Checked for every quantity a limits block accepts.
func TestLimitInItsOwnUnit(t *testing.T) {
	coil := fenced("coil", "name = c\nform = loop\nmean-diameter = 50 mm\nturns = 10\nwire = AWG 24\ncurrent = 1 A\n")
	for name, lq := range LimitQuantities {
		value := "2 " + lq.Unit
		if lq.Unit == "degC" {
			value = "100 degC"
		}
		s, diags := Parse("t.md", []byte(coil+fenced("limits", name+" <= "+value+"\n")))
		if s == nil {
			t.Fatalf("%s: %v", name, diags)
		}
		for _, e := range s.Entries {
			if e.Block != "limits" {
				continue
			}
			want := "<= 2 " + format.Unit(lq.Unit)
			if lq.Unit == "degC" {
				want = "<= 373.15 K"
			}
			if e.SI != want && e.SI != "" {
				t.Errorf("%s: SI %q, want %q", name, e.SI, want)
			}
		}
	}
}
