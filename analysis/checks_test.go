package analysis

import (
	"math"
	"os"
	"strconv"
	"strings"
	"testing"

	"coilmemo/calc"
)

// 236 turns of AWG 30 with a 6 mm radial build and an 872 mm length fill
// one layer over 69 mm of it, laid from the inner diameter: the centre
// field's current-sheet check takes that layer's own extent (236 wire
// pitches), not the stated length, and so agrees with the loop sum; long
// solenoid, B ≈ μ0 N I / ℓ (Ampère's law) within the ends' few per cent.
func TestCentreFieldCheckOfAPartLayer(t *testing.T) {
	j := evaluateSpec(t, "```coil\nname = c1\nform = solenoid\nmean-diameter = 6.86 mm\nlength = 872 mm\nradial-build = 6 mm\nturns = 236\nwire = AWG 30\ncurrent = 1 A\n```\n")
	w := j.Results.Coils[0].Winding
	if w.LayerCount != 1 {
		t.Fatalf("%d layers", w.LayerCount)
	}
	l := w.Layers[0]
	ext := (l.Z[len(l.Z)-1] - l.Z[0]) * 236 / 235
	ampere := 4e-7 * math.Pi * 236 / ext
	for _, c := range j.Checks {
		if !strings.Contains(c.Name, "field at coil centre") {
			continue
		}
		if !c.Pass || math.Abs(c.Value/ampere-1) > 0.01 {
			t.Errorf("%s: loops %.6g T, sheet %.6g T, Ampère %.6g T, pass %v", c.Name, c.Value, c.Expected, ampere, c.Pass)
		}
		return
	}
	t.Fatal("no centre-field check")
}

// An opposing pair's centre gradient is verified by a central difference
// of the numerical Biot–Savart field. For a thin Maxwell pair (spacing
// √3 a) the gradient of two opposed loops, 3 μ0 N I a² d/(a² + d²)^(5/2)
// at d = √3 a/2, is (48√3/(49√7)) μ0 N I/a² = 0.6413 μ0 N I/a² (the
// Maxwell gradient coil's textbook figure, recalled from memory): both
// the design's figure and the check's agree with it.
func TestGradientCheck(t *testing.T) {
	st := studyOf(t, "```coil\nname = m\nform = pair\nmean-diameter = 200 mm\nturns = 10\nwire = AWG 30\nspacing = 173.2051 mm\nsense = opposing\ncurrent = 1 A\n```\n")
	c := checkNamed(st.Checks, "axial gradient at the centre of the pair")
	if c == nil {
		t.Fatal("no gradient check")
	}
	a := st.Results.Coils[0].Winding.MeanTurnRadius()
	maxwell := 48 * math.Sqrt(3) / (49 * math.Sqrt(7)) * calc.Mu0 * 10 * 1 / (a * a)
	if !c.Pass || math.Abs(math.Abs(c.Expected)/maxwell-1) > 1e-5 || math.Abs(math.Abs(c.Value)/maxwell-1) > 1e-5 {
		t.Errorf("gradient %g, check %g, Maxwell pair %g T/m (pass %v)", c.Value, c.Expected, maxwell, c.Pass)
	}
	// The gradient pair of the figure tests is checked too, and an aiding
	// pair has no gradient to check.
	st = studyOf(t, readFigure(t, "gradient-pair.md"))
	if c := checkNamed(st.Checks, "axial gradient at the centre of the pair"); c == nil || !c.Pass || c.Value != st.Results.Coils[0].Pair.Gradient {
		t.Errorf("gradient pair: %+v", c)
	}
	if c := checkNamed(studyOf(t, readFigure(t, "aiding-pair.md")).Checks, "axial gradient"); c != nil {
		t.Errorf("aiding pair: %+v", c)
	}
}

// The Helmholtz closed form checks only a pair the study calls a
// Helmholtz pair: the aiding pair of the figure tests, whose spacing is
// 1.012 times its turns' mean radius as laid out, gets none, and a pair
// spaced at that radius does.
func TestHelmholtzCheckWhereItApplies(t *testing.T) {
	src := readFigure(t, "aiding-pair.md")
	st := studyOf(t, src)
	if st.Results.Coils[0].Pair.Helmholtz {
		t.Fatal("aiding pair taken as a Helmholtz pair")
	}
	if c := checkNamed(st.Checks, "field at the centre of the Helmholtz pair"); c != nil {
		t.Errorf("aiding pair off the Helmholtz spacing checked against it: %+v", c)
	}
	a := st.Results.Coils[0].Pair.Radius
	st = studyOf(t, strings.Replace(src, "spacing       = 100 mm", "spacing       = "+strconv.FormatFloat(a*1e3, 'f', 4, 64)+" mm", 1))
	if c := checkNamed(st.Checks, "field at the centre of the Helmholtz pair"); !st.Results.Coils[0].Pair.Helmholtz || c == nil || !c.Pass {
		t.Errorf("pair at the Helmholtz spacing %g m: %+v", a, c)
	}
}

func readFigure(t *testing.T, name string) string {
	t.Helper()
	b, err := os.ReadFile("../testdata/figures/" + name)
	if err != nil {
		t.Fatal(err)
	}
	return string(b)
}

// A thin loop's centre field is the closed form N μ0 I/(2R) term by
// term: it has no centre row (its field is checked off the axis). A
// rectangle's centre field is checked against the numerical Biot–Savart
// integral along its sides, which reaches the textbook closed form
// 2 μ0 N I √(W² + H²)/(π W H) (Griffiths, Introduction to
// Electrodynamics, 4th ed., Example 5.5, each side a finite straight
// wire).
func TestCentreRowsOfThinCoils(t *testing.T) {
	st := studyOf(t, readFigure(t, "thin-loop.md"))
	if c := checkNamed(st.Checks, "field at coil centre"); c != nil {
		t.Errorf("thin loop: centre row %+v", *c)
	}
	if c := checkNamed(st.Checks, "|B| at an off-axis test point"); c == nil || !c.Pass {
		t.Errorf("thin loop: off-axis row %+v", c)
	}
	st = studyOf(t, readFigure(t, "rectangle.md"))
	c := checkNamed(st.Checks, "field at coil centre")
	if c == nil {
		t.Fatal("rectangle: no centre row")
	}
	if !strings.Contains(c.Reference, "numerical Biot–Savart") || !c.Pass || c.Tolerance > 1e-8 {
		t.Errorf("rectangle: centre row against %q (tolerance %g, pass %v)", c.Reference, c.Tolerance, c.Pass)
	}
	co := st.Spec.Design.Coils[0]
	W, H := co.Width, co.Height
	want := 2 * calc.Mu0 * float64(co.Turns) * st.Results.Coils[0].Current * math.Hypot(W, H) / (math.Pi * W * H)
	if math.Abs(c.Expected/want-1) > 1e-8 {
		t.Errorf("rectangle: numerical centre field %.12g T, closed form %.12g T", c.Expected, want)
	}
}

// The hot-spot row compares the lumped closed forms with the
// finite-volume profile under the same assumptions, to 10⁻⁴: it holds for
// a coil driven far past its class (365 °C mean), and it fails when the
// lumped hot spot is off by a tenth of a per cent of its rise, as a check
// must be able to.
func TestHeatBalanceCheckIsTight(t *testing.T) {
	st := studyOf(t, "```coil\nname = hot\nform = solenoid\nmean-diameter = 30 mm\nlength = 30 mm\nradial-build = 8 mm\nturns = 1500\nwire = AWG 28\ninsulation-class = B\nvoltage = 48 V\n```\n")
	c, cr := st.Spec.Design.Coils[0], st.Results.Coils[0]
	row := checkNamed(st.Checks, "rise of the hottest point above ambient, steady state (checks the conduction inside the winding; the surface balance is shared)")
	if row == nil || !row.Pass || row.Tolerance > 1e-4 || row.Value < 300 {
		t.Fatalf("overdriven coil's hot-spot row: %+v", row)
	}
	rise := cr.Heat.Steady.HotSpot - cr.Heat.Problem.Ambient
	cr.Heat.Steady.HotSpot += 1e-3 * rise
	if off := heatBalanceCheck(c, cr); len(off) != 1 || off[0].Pass {
		t.Errorf("a hot spot off by 0.1 %% of its rise passes: %+v", off)
	}
}
