package memo

import (
	"bytes"
	"fmt"
	"math"
	"os"
	"slices"
	"strings"
	"testing"

	"coilmemo/analysis"
	"coilmemo/doc"
)

const worstSpec = "```coil\nmean-diameter = 80 mm\nturns = 200\nwire = AWG 32\nvoltage = 5 V\nswitch-off = 2 us\n```\n" +
	"```conditions\nambient = 20 degC\ncooling = still-air\n```\n" +
	"```tolerances\nsupply = ±5 %\nambient = -20 degC .. 60 degC\n```\n"

func verdictText(j *analysis.Study) string {
	var b strings.Builder
	for _, s := range (&composer{j: j}).verdict().Spans {
		b.WriteString(s.Text)
	}
	return b.String()
}

// Page 1 says a requirement met at every corner is, and names the corner
// at which one met at nominal fails.
func TestWorstVerdictOnPageOne(t *testing.T) {
	j := mustEvaluate(t, worstSpec+"```limits\nmoment >= 1 mA m2\n```\n")
	if v := verdictText(j); !strings.Contains(v, "met at every corner of the tolerances (4 corners)") {
		t.Errorf("verdict: %s", v)
	}
	nominal := j.Results.Moment.Norm()
	// 1 % below nominal: met at nominal, missed where hot and low supply
	j = mustEvaluate(t, worstSpec+"```limits\nmoment >= "+Sig(nominal*0.99*1e3, 6)+" mA m2\n```\n")
	v := verdictText(j)
	if !strings.Contains(v, "moment fails at corner −+ (supply −5 %, ambient 60 °C)") {
		t.Errorf("verdict: %s", v)
	}
	tab := (&composer{j: j}).limitsTable()
	if len(tab.Header) != 7 || tab.Header[3] != "Worst" || tab.Rows[0][6].Status != doc.Fail || tab.Rows[0][4].Text != "−+" {
		t.Errorf("compliance table %v %+v", tab.Header, tab.Rows)
	}
}

// Without a tolerances block the compliance table and the memo have no
// worst-case columns or section.
func TestNoWorstCaseWithoutTolerances(t *testing.T) {
	src := strings.Replace(worstSpec, "```tolerances\nsupply = ±5 %\nambient = -20 degC .. 60 degC\n```\n", "", 1) + "```limits\nmoment >= 1 mA m2\n```\n"
	j := mustEvaluate(t, src)
	if j.WorstCase != nil {
		t.Fatal("worst case without tolerances")
	}
	if h := (&composer{j: j}).limitsTable().Header; len(h) != 5 {
		t.Errorf("header %v", h)
	}
	var b bytes.Buffer
	if err := doc.WriteText(&b, Compose(j)); err != nil {
		t.Fatal(err)
	}
	if strings.Contains(b.String(), "Worst case") {
		t.Error("a Worst case section without tolerances")
	}
}

// The torque-coil memo with 2⁵ corners and 2000 samples, spec to PDF.
func BenchmarkTorqueCoilMemo(b *testing.B) {
	src, err := readExampleB("torque-coil.md")
	if err != nil {
		b.Fatal(err)
	}
	for range b.N {
		j, diags := evaluate("torque-coil.md", src)
		if len(diags) > 0 {
			b.Fatal(diags)
		}
		if _, err := PDF(j); err != nil {
			b.Fatal(err)
		}
	}
}

func readExampleB(name string) ([]byte, error) { return os.ReadFile("../examples/" + name) }

// A swing of the sensitivity table has a sign unless it is none, and a
// tiny one reads "< 0.001", never a power of ten.
func TestSignedSwing(t *testing.T) {
	for _, c := range []struct {
		v    float64
		unit string
		want string
	}{{0, "%", "0 %"}, {9.02, "%", "+9.02 %"}, {-26.8, "%", "−26.8 %"}, {4e-9, "%", "< 0.001 %"}, {-0.328, "K", "−0.328 K"}} {
		if got := signed(c.v, c.unit); got != c.want {
			t.Errorf("signed(%g, %q) = %q, want %q", c.v, c.unit, got, c.want)
		}
	}
}

// Where tolerances are stated, the memo fits the series resistor sized
// over the corners and says so: the switching section and the caution
// give the switch voltage at the worst corner, and the worst case
// tabulates it against the limit.
func TestSuppressionOverCornersWording(t *testing.T) {
	j, text := memoOf(t, "../examples/torque-coil.md", true)
	p := j.WorstCase.Suppression[0]
	if p == nil || !(p.Resistor < p.Nominal) {
		t.Fatalf("suppression %+v", p)
	}
	code := cornerCode(j.WorstCase, p.Corner)
	for _, want := range []string{
		"Switch voltage with the suggested suppression at every corner",
		fmt.Sprintf("the E12 value %s is chosen", Eng(p.Resistor, "Ω", 2)),
		fmt.Sprintf("(%s at corner %s)", Eng(p.SwitchVoltage, "V", 3), code),
		fmt.Sprintf("the %s the nominal design alone would take puts the switch at %s at corner", Eng(p.Nominal, "Ω", 2), Eng(p.NominalWorst, "V", 3)),
	} {
		if !strings.Contains(text, want) {
			t.Errorf("memo lacks %q", want)
		}
	}
	if strings.Contains(text, fmt.Sprintf("the E12 value %s is chosen", Eng(p.Nominal, "Ω", 2))) {
		t.Errorf("memo still fits the nominal %s", Eng(p.Nominal, "Ω", 2))
	}
}

// The torque coil's requirement is on the power "while on": it is judged
// on the power while energised, V·I at the hot winding (not the
// duty-averaged figure, half that on its 50 % duty), and the memo names
// it so; the worst case's power row, the duty-averaged one, says it is
// averaged.
func TestTorqueCoilPowerWhileOn(t *testing.T) {
	j, text := memoOf(t, "../examples/torque-coil.md", true)
	cr := j.Results.Coils[0]
	found := false
	for _, l := range j.Limits {
		if strings.HasPrefix(l.Limit.Quantity, "power") {
			found = true
			on := math.Abs(cr.Voltage * cr.Current)
			if l.Limit.Quantity != "power-on" || math.Abs(l.Computed-on) > 1e-12*on || !(cr.Duty < 1) {
				t.Errorf("power requirement %s judged on %g W, on-power V·I = %g W (duty %g)", l.Limit.Quantity, l.Computed, on, cr.Duty)
			}
		}
	}
	if !found {
		t.Fatal("no power requirement")
	}
	row := ""
	for _, r := range j.WorstCase.Results {
		if r.Quantity == "power" {
			row = "| Power (averaged over the duty cycle) | " + worstValue("power", r.Min, 4) + " |"
		}
	}
	for _, want := range []string{"power-on: total electrical power while energised", row} {
		if !strings.Contains(text, want) {
			t.Errorf("memo lacks %q", want)
		}
	}
}

// Bars of one length, at the three figures the sensitivity table shows,
// are named together, not one of them as "the longest"; a bar longer
// than the rest is named alone.
func TestLongestBarsTie(t *testing.T) {
	names := []string{"supply", "ambient", "turns"}
	results := []string{"Magnetic moment |m|", "Current", "Hot resistance"}
	tie := [][]float64{{9, -26.81, 0.1}, {9, -26.84, -1.9}, {1, 26.5, 1.9}}
	what, hold := longestBars(results, names, tie, "%")
	for _, want := range []string{"bars tie at 26.8 %", "magnetic moment |m| and current over the ambient tolerance"} {
		if !strings.Contains(what, want) {
			t.Errorf("tie: %q lacks %q", what, want)
		}
	}
	if strings.Contains(what, "hot resistance") || strings.Contains(what, "The longest bar is") {
		t.Errorf("tie: %q names a shorter bar or one bar alone", what)
	}
	if !strings.Contains(hold, "ambient range") {
		t.Errorf("tie: hold %q", hold)
	}
	// Ties over two tolerances name both, and the one to hold.
	two := [][]float64{{12, -12, 0.1}}
	what, hold = longestBars(results[:1], names, two, "%")
	if !strings.Contains(what, "over the supply tolerance and of the magnetic moment |m| over the ambient tolerance") || !strings.Contains(hold, "supply tolerance is the one to hold tightest") {
		t.Errorf("two tolerances: %q / %q", what, hold)
	}
	one := [][]float64{{9, -26.8, 0.1}, {9, -20, -1.9}}
	if what, _ := longestBars(results[:2], names, one, "%"); !strings.HasPrefix(what, "The longest bar is the swing of the magnetic moment |m| over the ambient tolerance, 26.8 %") {
		t.Errorf("one longest: %q", what)
	}
}

// The hottest winding temperature, a headline result, has its bars in the
// sensitivity figure (in kelvin, the Study's swings) and its longest
// swing named in the text.
func TestSensitivityFigureHasTemperature(t *testing.T) {
	j, text := memoOf(t, "../examples/torque-coil.md", true)
	wc := j.WorstCase
	r := slices.Index(analysis.HeadlineQuantities, "temperature")
	if wc == nil || r < 0 || r >= len(wc.Swing) {
		t.Fatal("no worst case with a temperature")
	}
	big, at := 0.0, -1
	for i, v := range wc.Swing[r] {
		if math.Abs(v) > big {
			big, at = math.Abs(v), i
		}
	}
	want := fmt.Sprintf("the swing of the hottest winding temperature over the %s tolerance, %s K", wc.Tolerances.Items[at].Key, Sig(big, 3))
	if !strings.Contains(strings.Join(strings.Fields(text), " "), want) {
		t.Errorf("memo lacks %q", want)
	}
	found := false
	for _, b := range Document(j).Blocks {
		if f, ok := b.(doc.Figure); ok && strings.HasPrefix(f.Caption, "Sensitivity of each result") {
			found = true
			if !strings.Contains(f.Caption, "temperature below, in K") || !strings.Contains(f.Caption, "one colour per tolerance") {
				t.Errorf("caption %q does not say what the panels and colours are", f.Caption)
			}
		}
	}
	if !found {
		t.Error("no sensitivity figure")
	}
}
