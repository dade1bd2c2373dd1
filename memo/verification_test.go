package memo

import (
	"math"
	"os"
	"path/filepath"
	"slices"
	"strconv"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/calc"
	"coilmemo/doc"
	"coilmemo/format"
)

// Like coils' checks are written once, naming every coil they cover; a
// coil whose figures differ keeps its own rows.
func TestLikeCoilsShareTheirCheckRows(t *testing.T) {
	src, err := os.ReadFile("../testdata/figures/three-axis-set.md")
	if err != nil {
		t.Fatal(err)
	}
	rowsFor := func(src string) (map[string]int, *analysis.Study) {
		j := mustEvaluate(t, src)
		c := &composer{j: j}
		c.verification()
		names := map[string]int{}
		for _, g := range checkGroups(j.Checks) {
			names[joinAnd(g.coils)] += len(g.rows)
		}
		return names, j
	}
	names, j := rowsFor(string(src))
	per := len(j.Checks) / 3
	if len(j.Checks) != 3*per || per == 0 {
		t.Fatalf("%d checks for three like coils", len(j.Checks))
	}
	if names["X coil, Y coil and Z coil"] != per || len(names) != 1 {
		t.Errorf("three like coils: rows by coil group %v, want %d rows for all three", names, per)
	}
	// Z at another current: its field and heating figures differ.
	other := strings.Replace(string(src), "centre        = (0 mm, 0 mm, -40 mm)\ncurrent       = 60 mA", "centre        = (0 mm, 0 mm, -40 mm)\ncurrent       = 80 mA", 1)
	if other == string(src) {
		t.Fatal("three-axis-set.md no longer has the Z coil's current line")
	}
	names, _ = rowsFor(other)
	if names["X coil and Y coil"] != per || names["Z coil"] != per || len(names) != 2 {
		t.Errorf("Z at 80 mA: rows by coil group %v, want %d for X and Y together and %d for Z", names, per, per)
	}
}

// Every row of every example and figure-test design prints its difference
// so that its verdict can be read from the figures: at a resolution at
// least ten times finer than the tolerance, or as "< x" with x at most a
// tenth of it; never "0 %", a signed zero or a power of ten; the
// tolerance as a percentage (parts per million below 0.001 %, the
// difference in the same unit) equal to the one the verdict applied; and the printed
// difference against the printed tolerance gives the row's status. A
// bracket row shows its three figures and passes when they are ordered.
func TestCheckRowsReadTheirVerdict(t *testing.T) {
	rows := 0
	for _, file := range designFiles(t) {
		src, err := os.ReadFile(file)
		if err != nil {
			t.Fatal(err)
		}
		j, diags := evaluate(filepath.Base(file), src)
		if len(diags) > 0 {
			continue // a revision that needs its previous file
		}
		// the rows as the table prints them, in the checks' order per coil
		var printed [][]doc.Cell
		for _, g := range checkGroups(j.Checks) {
			printed = append(printed, g.rows...)
		}
		for _, k := range j.Checks {
			i := slices.IndexFunc(printed, func(r []doc.Cell) bool { return r[0].Text == k.Name+checkPointWords(k.Point) })
			if i < 0 {
				t.Fatalf("%s: no printed row for %q", file, k.Name)
			}
			r := printed[i]
			rows++
			where := filepath.Base(file) + ": " + k.Coil + ": " + k.Name
			if k.Bracket {
				want := k.Low < k.Expected && k.Expected < k.High
				if k.Pass != want || !strings.Contains(r[1].Text, Eng(k.Low, k.Unit, 6)) || !strings.Contains(r[1].Text, Eng(k.High, k.Unit, 6)) ||
					!strings.Contains(r[2].Text, Eng(k.Expected, k.Unit, 6)) || strings.Contains(r[3].Text, "%") {
					t.Errorf("%s: bracket row %q | %q | %q | %q, pass %v", where, r[1].Text, r[2].Text, r[3].Text, r[4].Text, k.Pass)
				}
				continue
			}
			tol, _, ok := parsePercent(r[4].Text)
			if !ok || math.Abs(tol-100*k.Tolerance) > 1e-9*tol {
				t.Errorf("%s: tolerance printed %q, applied %g %%", where, r[4].Text, 100*k.Tolerance)
				continue
			}
			d := r[3].Text
			if strings.HasSuffix(d, " ppm") != strings.HasSuffix(r[4].Text, " ppm") {
				t.Errorf("%s: difference %q and tolerance %q in different units", where, d, r[4].Text)
			}
			if d == "0 %" || strings.Contains(d, "−") || strings.HasPrefix(d, "-") {
				t.Errorf("%s: difference printed %q", where, d)
			}
			below := strings.HasPrefix(d, "< ")
			v, res, ok := parsePercent(strings.TrimPrefix(d, "< "))
			switch {
			case !ok:
				t.Errorf("%s: difference %q is no percentage", where, d)
			case below && (v > tol/10*(1+1e-9) || !(100*k.RelDiff < v)):
				t.Errorf("%s: difference %q against %q (%g %%)", where, d, r[4].Text, 100*k.RelDiff)
			case !below && res > tol/10*(1+1e-9):
				t.Errorf("%s: difference %q printed to %g %%, coarser than a tenth of %q", where, d, res, r[4].Text)
			case !below && math.Abs(v-100*k.RelDiff) > res/2*(1+1e-9):
				t.Errorf("%s: difference %q for %g %%", where, d, 100*k.RelDiff)
			case !below && (v <= tol) != k.Pass && math.Abs(v-tol) > res:
				t.Errorf("%s: %q against %q reads the other verdict than %v", where, d, r[4].Text, k.Pass)
			case below && !k.Pass:
				t.Errorf("%s: %q against %q but failed", where, d, r[4].Text)
			}
		}
	}
	if rows < 50 {
		t.Errorf("only %d check rows over the designs", rows)
	}
}

// parsePercent reads a relative figure in plain decimals, "0.0014 %",
// "12.0 %" or "0.47 ppm": the value and the resolution it is printed to,
// both in percent, and its unit. A power of ten is no such figure.
func parsePercent(s string) (v, res float64, ok bool) {
	scale := 1.0
	s, found := strings.CutSuffix(s, " %")
	if !found {
		if s, found = strings.CutSuffix(s, " ppm"); !found {
			return 0, 0, false
		}
		scale = 1e-4 // 1 ppm = 10⁻⁴ %
	}
	if strings.ContainsAny(s, "×⁰¹²³⁴⁵⁶⁷⁸⁹e") {
		return 0, 0, false
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		return 0, 0, false
	}
	dec := 0
	if _, frac, f := strings.Cut(s, "."); f {
		dec = len(frac)
	}
	return v * scale, math.Pow(10, float64(-dec)) * scale, true
}

// Page 1 does not count a pick-up coil's rows of the figures computed
// with its core among the checks of the winding in air.
func TestVerdictCountsCoredPickupRows(t *testing.T) {
	j, _ := memoOf(t, "../examples/search-coil.md", true)
	with, air := 0, 0
	for _, k := range j.Checks {
		switch {
		case k.Core:
		case strings.Contains(k.Name, "with the core's"):
			with++
		default:
			air++
		}
	}
	if with == 0 {
		t.Fatal("search coil: no row with the core's figures")
	}
	v := checksVerdict(j.Checks)
	if !strings.Contains(v, strconv.Itoa(air)+" of the winding in air, "+strconv.Itoa(with)+" of the pick-up figures computed from the core's") {
		t.Errorf("search coil: %q", v)
	}
}

// A tolerance the text restates reads as the verification table writes
// tolerances (format.Tolerance): "within ±1 %", not "±1.0 %".
func TestRestatedTolerancesInOneForm(t *testing.T) {
	_, text := memoOf(t, "../examples/calibration-pair.md", true)
	want := "(spacing = radius, within ±" + format.Tolerance(calc.HelmholtzTolerance) + ")"
	if !strings.Contains(text, want) {
		t.Errorf("calibration pair: no %q", want)
	}
	_, text = memoOf(t, "../testdata/figures/gradient-pair.md", true)
	if want := "stays within ±" + format.Tolerance(calc.GradientTolerance) + " of the centre value"; !strings.Contains(text, want) {
		t.Errorf("gradient pair: no %q", want)
	}
}
