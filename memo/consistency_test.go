package memo

import (
	"math"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilmemo/calc"
	"coilmemo/doc"
)

// printed is a number with a unit as the memo prints it, read back in SI.
type printed struct {
	text  string  // as printed, "121 K", "±32.5 mm"
	value float64 // SI
	half  float64 // half a unit of its last printed digit, SI
}

var printedNumber = regexp.MustCompile(`(?:^|[\s(=/±])(−?\d+(?:\.\d+)?) ([fpnµmkMG]?)(K|m|°C)(?:$|[\s),;.:])`)

// printedIn finds every number printed in unit (with an engineering
// prefix) in text.
func printedIn(text, unit string) []printed {
	scale := map[string]float64{"f": 1e-15, "p": 1e-12, "n": 1e-9, "µ": 1e-6, "m": 1e-3, "": 1, "k": 1e3, "M": 1e6, "G": 1e9}
	var out []printed
	for _, m := range printedNumber.FindAllStringSubmatch(text, -1) {
		if m[3] != unit {
			continue
		}
		num := strings.Replace(m[1], "−", "-", 1)
		v, err := strconv.ParseFloat(num, 64)
		if err != nil {
			continue
		}
		dec := 0
		if i := strings.IndexByte(num, '.'); i >= 0 {
			dec = len(num) - i - 1
		}
		f := scale[m[2]]
		out = append(out, printed{text: m[1] + " " + m[2] + m[3], value: v * f, half: 0.5 * math.Pow(10, -float64(dec)) * f})
	}
	return out
}

// A quantity is printed with one value throughout a memo: every number
// within 3 % of it in its unit is a rounding of it (or of a sibling
// quantity the memo names apart, the steady margin beside the cycle
// peak's), and it is printed to three figures at least — not 121 K in
// the derivation and 117 K in the table, nor 13 K in the assumptions and
// 13.4 K in the derivation. Checked over every
// example and figure-test design for the quantities printed in several
// sections: the rise to the hottest point, the margins to the insulation
// class and a pair's region of 1 % homogeneity.
func TestOneValuePerQuantity(t *testing.T) {
	checked := 0
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		text = strings.ReplaceAll(text, "\n", " ")
		for i, cr := range j.Results.Coils {
			co := j.Spec.Design.Coils[i]
			type quantity struct {
				name  string
				v     float64
				unit  string
				kin   []float64 // sibling values the memo names apart
				plain bool      // printed as a magnitude, ± allowed
			}
			st := cr.Heat.Steady
			// other quantities of the coil that may lie close to those
			// checked: the verification checks' figures (a rise above
			// ambient, by two methods)
			var others []float64
			for _, ch := range j.Checks {
				if ch.Coil == co.Name {
					others = append(others, ch.Value, ch.Expected)
					if p := ch.Point; p != nil { // a check's test point, its coordinates printed
						others = append(others, p[0], p[1], p[2])
					}
				}
			}
			var qs []quantity
			if st.Settled {
				qs = append(qs, quantity{name: "rise to the hottest point", v: st.HotSpot - st.Surface, unit: "K"})
			}
			if co.InsulationClass > 0 && !math.IsNaN(cr.InsulationMargin) {
				steady := co.InsulationClass - st.HotSpot
				qs = append(qs, quantity{name: "margin to the class", v: cr.InsulationMargin, unit: "K", kin: []float64{steady}})
				if steady != cr.InsulationMargin {
					qs = append(qs, quantity{name: "steady margin to the class", v: steady, unit: "K", kin: []float64{cr.InsulationMargin}})
				}
			}
			if co.Form == calc.Pair && !math.IsNaN(cr.Pair.Axial1) {
				qs = append(qs, quantity{name: "1 % region along the axis", v: cr.Pair.Axial1, unit: "m", kin: []float64{cr.Pair.Radial1}},
					quantity{name: "1 % region radially", v: cr.Pair.Radial1, unit: "m", kin: []float64{cr.Pair.Axial1}})
			}
			for _, q := range qs {
				if !(math.Abs(q.v) > 0) {
					continue
				}
				rounds := func(p printed, v float64) bool { return math.Abs(p.value-v) <= p.half*(1+1e-9) }
				forms := map[string]bool{}
				for _, p := range printedIn(text, q.unit) {
					if math.Abs(p.value-q.v) > 0.03*math.Abs(q.v) {
						continue // another quantity
					}
					if rounds(p, q.v) {
						if p.half > 0.01*math.Abs(q.v) {
							// fewer than three figures where the value is
							// printed with more elsewhere: "13 K" beside "13.4 K"
							forms[p.text] = true
						}
						continue
					}
					kin := false
					for _, k := range append(q.kin, others...) {
						kin = kin || rounds(p, k)
					}
					if !kin {
						t.Errorf("%s, coil %q: %s is %s, yet %q is printed", filepath.Base(f), co.Name, q.name, Eng(q.v, q.unit, 4), p.text)
					}
				}
				if len(forms) > 0 {
					t.Errorf("%s, coil %q: %s (%s) printed to fewer than three figures: %v", filepath.Base(f), co.Name, q.name, Eng(q.v, q.unit, 4), keys(forms))
				}
				checked++
			}
		}
	}
	if checked < 20 {
		t.Fatalf("only %d quantities checked", checked)
	}
}

func keys(m map[string]bool) []string {
	var out []string
	for k := range m {
		out = append(out, k)
	}
	return out
}

// Where the duty cycle's peak, not the steady state, is judged against the
// insulation class, the memo names the two margins apart: the derivation's
// is the steady state's, the table's the peak's.
func TestTwoMarginsNamedApart(t *testing.T) {
	seen := 0
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		for i, cr := range j.Results.Coils {
			co := j.Spec.Design.Coils[i]
			if co.InsulationClass <= 0 || !(cr.Temperature > cr.Heat.Steady.HotSpot) || math.IsNaN(cr.InsulationMargin) {
				continue
			}
			seen++
			flat := strings.Join(strings.Fields(text), " ")
			if peak := Eng(cr.InsulationMargin, "K", 3) + " at the cycle peak"; !strings.Contains(flat, peak) {
				t.Errorf("%s: no %q", filepath.Base(f), peak)
			}
			if !strings.Contains(flat, "Margin of the duty-averaged steady state to the insulation") {
				t.Errorf("%s: the steady margin is not named as the steady state's", filepath.Base(f))
			}
		}
	}
	if seen == 0 {
		t.Fatal("no design whose duty-cycle peak is judged")
	}
}

// TestNumberFormsEverywhere: numbers keep their forms over every example and figure-test design: no
// bare "0.0 %" margin, no percentage in the thousands, no power of ten on
// a short number ("1.0×10¹"), no Celsius temperature to four decimals, a
// range with its unit once (not "0 m .. 12 mm"), no unit in base units
// (m²·s⁻¹ for V/T), and the insulation class named one way.
func TestNumberFormsEverywhere(t *testing.T) {
	forms := []struct {
		what string
		re   *regexp.Regexp
	}{
		{"a bare zero margin", regexp.MustCompile(`(^|\s)[+−]?0\.0 %`)},
		{"a percentage in the thousands", regexp.MustCompile(`(^|[^\d.])\d{4,}(\.\d+)? %`)},
		{"a power of ten on a short number", regexp.MustCompile(`\d×10(⁰|¹|²|³|⁻¹)(\D|$)`)},
		{"a Celsius temperature to four decimals", regexp.MustCompile(`\d\.\d{4,} °C`)},
		{"a range with a zero in its own unit", regexp.MustCompile(`(^|\s)0 [a-zA-Zµ]+ (\.\.|…) `)},
		{"a range of one unit written twice", regexp.MustCompile(`\d ([a-zA-Zµ]*[a-zA-ZΩ]) (…) [\d.]+ ([a-zA-Zµ]*[a-zA-ZΩ])\b`)},
		{"a unit in base units", regexp.MustCompile(`m²·s⁻¹`)},
		{"an insulation class in another form", regexp.MustCompile(`class [A-Z], |class of \d|class, \d|insulation class \d+ °C`)},
	}
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		for _, line := range strings.Split(text, "\n") {
			for _, fm := range forms {
				if m := fm.re.FindStringSubmatch(line); m != nil {
					if fm.what == "a range of one unit written twice" && m[1] != m[3] {
						continue // "10 Hz … 10 kHz": two prefixes
					}
					t.Errorf("%s: %s: %q in %q", filepath.Base(f), fm.what, m[0], line)
				}
			}
		}
	}
}

// The approval block and page 1 show an approval record's gaps as they
// are: an issued memo with no approver says so ("not named") and a
// checked date after the memo's date is marked; nothing is filled in.
func TestApprovalGapsShown(t *testing.T) {
	coil := "```coil\nname = s\nform = solenoid\nmean-diameter = 50 mm\nlength = 20 mm\nturns = 30\nwire = AWG 24\ncurrent = 1 A\n```\n"
	text := func(memo string) string {
		j := mustEvaluate(t, "```memo\n"+memo+"```\n"+coil)
		var buf strings.Builder
		if err := doc.WriteText(&buf, Document(j)); err != nil {
			t.Fatal(err)
		}
		return buf.String()
	}
	s := text("date = 2026-11-30\nstatus = issued\nchecker = C. Checker\nchecked-date = 2026-12-02\n")
	if n := strings.Count(s, "not named"); n < 2 {
		t.Errorf("the missing approver is shown %d times, want on page 1 and in the approval block", n)
	}
	if !strings.Contains(s, "2026-12-02 (after the memo's date)") {
		t.Error("the late checked date is not marked")
	}
	s = text("date = 2026-11-30\nstatus = draft\napprover = P. Approver\nchecked-date = 2026-11-29\n")
	if strings.Contains(s, "not named") || strings.Contains(s, "after the memo's date") {
		t.Error("a consistent draft is marked")
	}
}
