package memo

import (
	"path/filepath"
	"regexp"
	"sort"
	"strings"
	"testing"

	"golang.org/x/tools/txtar"

	"coilmemo/doc"
)

// memoSources are the specs the number tests read: every example, every
// figure-test design and every golden case, by name.
func memoSources(t *testing.T) map[string][]byte {
	t.Helper()
	out := designsForTests(t)
	files, _ := filepath.Glob("../testdata/golden/*.txtar")
	if len(files) == 0 {
		t.Fatal("no golden cases")
	}
	for _, f := range files {
		ar, err := txtar.ParseFile(f)
		if err != nil {
			t.Fatal(err)
		}
		for _, a := range ar.Files {
			if a.Name == "spec.md" {
				out["golden/"+strings.TrimSuffix(filepath.Base(f), ".txtar")] = a.Data
			}
		}
	}
	return out
}

// allMemoTexts is the text rendering of the memo of every spec of
// memoSources, by name.
func allMemoTexts(t *testing.T) map[string]string {
	t.Helper()
	out := map[string]string{}
	srcs := memoSources(t)
	names := make([]string, 0, len(srcs))
	for n := range srcs {
		names = append(names, n)
	}
	sort.Strings(names)
	for _, f := range names {
		j, diags := evaluate(f, srcs[f])
		if len(diags) > 0 {
			t.Fatal(f, diags)
		}
		var text strings.Builder
		if err := doc.WriteText(&text, Compose(j)); err != nil {
			t.Fatal(err)
		}
		out[strings.ReplaceAll(f, "/", "-")] = text.String()
	}
	return out
}

// The memo's numbers and counts, over every example, figure-test design
// and golden case: no power of ten on a percentage ("< 10⁻⁷ %",
// "4.7×10⁻⁵ %"), no signed zero, no raw SI in
// exponent form or in ten-thousandths of a metre, no "All 2" or "All 1"
// counts, no plural after a count of one nor a hedged "(s)", and probe
// positions written alike.
func TestNumberForms(t *testing.T) {
	bad := map[string]*regexp.Regexp{
		"power of ten on a percentage": regexp.MustCompile(`10[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+ ?(%|ppm)`),
		"signed zero":                  regexp.MustCompile(`[−+-]0(\.0+)? (%|K|°C)`),
		"raw SI exponent":              regexp.MustCompile(`\b\d(\.\d+)?e-?\d+ [a-zA-Z]`),
		"raw SI small metres":          regexp.MustCompile(`\b0\.000\d+ m\b`),
		"count grammar":                regexp.MustCompile(`All [12] |(^|[^0-9.,×])1 (requirements|checks|turns|layers|coils|corners|samples|cautions|warnings|tolerances|gaps|probes|choices|wires)\b|[a-z]\(s\)`),
		"position with trailing zeros": regexp.MustCompile(`\(\S*\.\d*0, .*\) mm`),
	}
	for f, text := range allMemoTexts(t) {
		for _, line := range strings.Split(text, "\n") {
			if strings.HasPrefix(line, "    ") || strings.Contains(line, "\\") {
				continue // carried-over code, equation notation
			}
			for what, re := range bad {
				if m := re.FindString(line); m != "" {
					t.Errorf("%s: %s %q in %q", f, what, m, line)
				}
			}
		}
	}
}

// The inputs table's SI column writes every value in engineering units,
// as the rest of the memo: no position or length of zero in metres beside
// positions in mm, no fractions of a kilogram, no value below 1 or from
// 1000 up of a unit that takes a prefix, no exponent, no bare diameter in
// mm beside overall diameters in µm, and one range sign ("…").
func TestInputsInEngineeringUnits(t *testing.T) {
	units := `(m|A|V|T|Hz|s|W|Ω|H|F|kg|N|N·m|A·m²|T/m)`
	bad := map[string]*regexp.Regexp{
		"metres at the origin":     regexp.MustCompile(`\([0, ]+\) m\b|(^|[^.\d])0 m\b`),
		"fraction of a unit":       regexp.MustCompile(`(^|[^.\d])0\.\d+ ` + units + `(\s|$|\))`),
		"a thousand units or more": regexp.MustCompile(`(^|[^.\d])\d{4,}(\.\d+)? ` + units + `(\s|$|\))`),
		"exponent":                 regexp.MustCompile(`\de[-+]?\d`),
		"bare diameter in mm":      regexp.MustCompile(`bare 0\.\d+ mm`),
		"range sign":               regexp.MustCompile(` \.\. `),
	}
	rows := 0
	for f, text := range allMemoTexts(t) {
		in := false
		for _, line := range strings.Split(text, "\n") {
			switch {
			case strings.HasPrefix(line, "Table: Spec parameters as written and in SI units"):
				in = true
				continue
			case !strings.HasPrefix(line, "| "):
				in = false
			}
			cells := strings.Split(line, " | ")
			if !in || len(cells) < 5 || cells[0] == "| Block" {
				continue
			}
			rows++
			si := cells[3]
			for what, re := range bad {
				if m := re.FindString(si); m != "" {
					t.Errorf("%s: SI column: %s %q in %q", f, what, m, line)
				}
			}
		}
	}
	if rows < 200 {
		t.Errorf("only %d inputs rows read", rows)
	}
}

// A field of zero is written in the unit of the fields beside it: no "0 T"
// in a probe table of µT, nor "Bx = 0 T" beside "Bz = 433.0 µT"; and a
// probe table's fields are in one unit.
func TestZeroFieldInItsNeighboursUnit(t *testing.T) {
	zero := regexp.MustCompile(`(^|[^.\d])0 T\b`)
	cell := regexp.MustCompile(`^−?[\d.]+ (\S*T)$`)
	probeRows := 0
	for f, text := range allMemoTexts(t) {
		probes := false
		for _, line := range strings.Split(text, "\n") {
			if strings.HasPrefix(line, "    ") || strings.Contains(line, "\\") {
				continue
			}
			if zero.MatchString(line) && regexp.MustCompile(`[\d.]+ [µnmk]T\b`).MatchString(line) {
				t.Errorf("%s: a zero field in tesla beside prefixed ones: %q", f, line)
			}
			switch {
			case strings.HasPrefix(line, "Table: Flux density at the probe points"):
				probes = true
				continue
			case !strings.HasPrefix(line, "| "):
				probes = false
			}
			cells := strings.Split(strings.Trim(line, "| "), " | ")
			if !probes || len(cells) != 6 || cells[0] == "Probe" {
				continue
			}
			probeRows++
			units := map[string]bool{}
			for _, c := range cells[2:] {
				if m := cell.FindStringSubmatch(c); m != nil {
					units[m[1]] = true
				} else {
					t.Errorf("%s: probe field %q", f, c)
				}
			}
			if len(units) != 1 {
				t.Errorf("%s: probe row in %d units: %q", f, len(units), line)
			}
		}
	}
	if probeRows < 10 {
		t.Errorf("only %d probe rows", probeRows)
	}
}

// A sweep's table gives its swept values to one number of decimals
// ("1.0" below "0.9", not "1") and each result column in one unit (no
// "862 mA·m²" above "1.01 A·m²").
func TestSweepColumnsInOneForm(t *testing.T) {
	value := regexp.MustCompile(`^−?[\d.]+ (\S+)$`)
	tables := 0
	for f, text := range allMemoTexts(t) {
		var rows [][]string
		in := false
		for _, line := range strings.Split(text, "\n") {
			switch {
			case strings.HasPrefix(line, "Table: Results at each step of the sweep"):
				in, rows = true, nil
				continue
			case in && strings.HasPrefix(line, "| "):
				rows = append(rows, strings.Split(strings.Trim(line, "| "), " | "))
				continue
			case !in:
				continue
			}
			in = false
			tables++
			if len(rows) < 3 {
				t.Errorf("%s: sweep table of %d rows", f, len(rows))
				continue
			}
			decimals, units := map[int]bool{}, map[int]map[string]bool{}
			for _, r := range rows[1:] {
				_, frac, _ := strings.Cut(r[0], ".")
				decimals[len(frac)] = true
				for k, c := range r[1:] {
					if m := value.FindStringSubmatch(c); m != nil && m[1] != "°C" {
						if units[k] == nil {
							units[k] = map[string]bool{}
						}
						units[k][m[1]] = true
					}
				}
			}
			if len(decimals) != 1 {
				t.Errorf("%s: swept values with %d numbers of decimals: %v", f, len(decimals), rows)
			}
			for k, u := range units {
				if len(u) != 1 {
					t.Errorf("%s: sweep column %q in %d units", f, rows[0][k+1], len(u))
				}
			}
		}
	}
	if tables == 0 {
		t.Error("no sweep table")
	}
}

// A winding's radial build, the depth its turns fill and a pair's spacing
// are written one way in a memo of one coil — page 1, the Assumptions, the
// heat, the cross-section's text — so that no memo says "the inner
// 0.95 mm" beside "the inner 949 µm", or "60 mm apart" beside "60.00 mm
// apart".
func TestBuildWrittenOneWay(t *testing.T) {
	phrases := map[string]*regexp.Regexp{
		"filled depth": regexp.MustCompile(`(?:fill(?: only)? the inner|over the inner|layers) ([\d.]+ [µm]m)`),
		"radial build": regexp.MustCompile(`([\d.]+ [µm]m) radial build|radial build of ([\d.]+ [µm]m)`),
		"spacing":      regexp.MustCompile(`centres are ([\d.]+ [µm]m) apart`),
	}
	seen := 0
	for f, src := range memoSources(t) {
		j, diags := evaluate(f, src)
		if len(diags) > 0 {
			t.Fatal(f, diags)
		}
		if len(j.Spec.Design.Coils) != 1 {
			continue
		}
		var text strings.Builder
		if err := doc.WriteText(&text, Compose(j)); err != nil {
			t.Fatal(err)
		}
		for what, re := range phrases {
			forms := map[string]bool{}
			for _, m := range re.FindAllStringSubmatch(text.String(), -1) {
				for _, g := range m[1:] {
					if g != "" {
						forms[g] = true
					}
				}
			}
			seen += len(forms)
			if len(forms) > 1 {
				t.Errorf("%s: %s written %d ways: %v", f, what, len(forms), forms)
			}
		}
	}
	if seen < 10 {
		t.Errorf("only %d forms seen", seen)
	}
}
