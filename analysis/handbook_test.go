package analysis

import (
	"math"
	"strings"
	"testing"

	"coilmemo/calc"
)

// Every embedded entry of Grover's Table 36 agrees with Lorenz's formula
// (calc.NagaokaCoefficient) to the table's printed precision.
func TestGroverTableAgreesWithNagaoka(t *testing.T) {
	worst := 0.0
	for i, k := range groverNagaoka {
		x := float64(i) * groverStep
		want := 0.0
		if i > 0 {
			want = calc.NagaokaCoefficient(0.5, x) // D = 1
		}
		d := math.Abs(k - want)
		worst = math.Max(worst, d)
		if d > groverPrecision {
			t.Errorf("ℓ/D = %.2f: table %.6f, Lorenz's formula %.7f (differ by %.1e)", x, k, want, d)
		}
	}
	t.Logf("largest difference %.1e", worst)
	// Interpolated between the entries, within the error the check
	// allows itself.
	for x := 0.02; x <= 1; x += 0.0037 {
		k, e, ok := groverInterpolate(x)
		if !ok {
			t.Fatalf("ℓ/D = %g not covered", x)
		}
		want := calc.NagaokaCoefficient(0.5, x)
		if d := math.Abs(k - want); d > groverPrecision+e {
			t.Errorf("ℓ/D = %.4f: interpolated %.7f, formula %.7f, allowed %.1e", x, k, want, groverPrecision+e)
		}
	}
	for _, x := range []float64{0, 0.019, 1.0001, math.NaN()} {
		if _, _, ok := groverInterpolate(x); ok {
			t.Errorf("ℓ/D = %g should be outside the embedded table", x)
		}
	}
}

// The numerical current-sheet integral reproduces Lorenz's formula from
// very short to very long coils.
func TestSheetNagaoka(t *testing.T) {
	for _, x := range []float64{0.05, 0.3, 1, 4.69, 20} {
		got := sheetNagaoka(0.5, x)
		want := calc.NagaokaCoefficient(0.5, x)
		if math.Abs(got/want-1) > 1e-7 {
			t.Errorf("ℓ/D = %g: integral %.9f, formula %.9f", x, got, want)
		}
	}
}

func checkNamed(cs []Check, name string) *Check {
	for i := range cs {
		if cs[i].Name == name {
			return &cs[i]
		}
	}
	return nil
}

func evaluateSpec(t *testing.T, src string) *Study {
	t.Helper()
	j, diags := Run("test.md", []byte(src), Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	return j
}

const shortSolenoid = "```coil\nname = s\nform = solenoid\nmean-diameter = 50 mm\nlength = 20 mm\nturns = 30\nwire = AWG 24\ncurrent = 1 A\n```\n"

func TestVerifyHandbookRows(t *testing.T) {
	// A short single-layer coil: Grover's table applies.
	j := evaluateSpec(t, shortSolenoid)
	grover := checkNamed(j.Checks, "Nagaoka coefficient at ℓ/D = 0.400, handbook table")
	sheet := checkNamed(j.Checks, "Nagaoka coefficient at ℓ/D = 0.400, numerical integral")
	if grover == nil || sheet == nil {
		t.Fatalf("no Grover or current-sheet row: %+v", j.Checks)
	}
	if !grover.Pass || !sheet.Pass || math.Abs(grover.Expected-0.471865) > 1e-9 || !strings.HasPrefix(grover.Reference, groverSource) {
		t.Errorf("Grover row %+v", *grover)
	}
	// ℓ = 20 mm < 0.8 a: Wheeler's formula makes no claim there.
	if checkNamed(j.Checks, "current-sheet inductance") != nil {
		t.Error("Wheeler row outside Wheeler's range")
	}

	// A thin pair at the Helmholtz spacing: its loop sum at the centre is
	// the (4/5)^(3/2) closed form term by term, so no row repeats it; its
	// field is checked off the axis against the numerical integral.
	pair := func(spacing string) *Study {
		return evaluateSpec(t, "```coil\nname = p\nform = pair\nmean-diameter = 200 mm\nturns = 50\nwire = AWG 22\ncurrent = 0.5 A\nspacing = "+spacing+"\nsense = aiding\n```\n")
	}
	thin := pair("100 mm")
	for _, name := range []string{"field at the centre of the Helmholtz pair", "field at coil centre"} {
		if h := checkNamed(thin.Checks, name); h != nil {
			t.Errorf("thin pair checked against the closed form its own sum is: %+v", *h)
		}
	}
	if h := checkNamed(thin.Checks, "|B| at an off-axis test point"); h == nil || !h.Pass {
		t.Errorf("thin pair's off-axis row: %+v", h)
	}
	if checkNamed(pair("150 mm").Checks, "field at the centre of the Helmholtz pair") != nil {
		t.Error("Helmholtz row for a pair not at Helmholtz spacing")
	}
}
