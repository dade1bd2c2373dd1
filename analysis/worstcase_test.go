package analysis

import (
	"fmt"
	"math"
	"os"
	"reflect"
	"runtime"
	"strings"
	"testing"

	"coilmemo/calc"
	"coilmemo/spec"
)

func BenchmarkWorstCaseTorqueCoil(b *testing.B) {
	src, err := os.ReadFile("../examples/torque-coil.md")
	if err != nil {
		b.Fatal(err)
	}
	s, diags := spec.Parse("torque-coil.md", src)
	if len(diags) > 0 {
		b.Fatal(diags)
	}
	st := Analyse(s, Options{})
	b.ResetTimer()
	for range b.N {
		AnalyseWorstCase(s, st.Results, st.Limits)
	}
}

// voltageSpec is a voltage-driven coil that switches off in a stated
// time, with the supply (tolerance 0) and ambient (tolerance 1) spread.
const voltageSpec = "```coil\nmean-diameter = 80 mm\nturns = 200\nwire = AWG 32\nvoltage = 5 V\nswitch-off = 2 us\n```\n" +
	"```conditions\nambient = 20 degC\nbackground-field = 45 uT\ncooling = still-air\n```\n" +
	"```tolerances\nsupply = ±5 %\nambient = -20 degC .. 60 degC\n```\n"

func worstOf(t *testing.T, src string) (*spec.Spec, *Study) {
	t.Helper()
	s, diags := spec.Parse("t.md", []byte(src))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	st := Analyse(s, Options{})
	if st.WorstCase == nil {
		t.Fatal("no worst case")
	}
	return s, st
}

func resultOf(t *testing.T, wc *WorstCase, q string) WorstResult {
	t.Helper()
	for _, r := range wc.Results {
		if r.Quantity == q {
			return r
		}
	}
	t.Fatalf("no %s among the worst-case results", q)
	return WorstResult{}
}

const (
	supplyHigh  = 1 << 0
	ambientHigh = 1 << 1
)

// Under voltage drive a hot winding has more resistance, so less current
// and moment; a low supply lowers both again. The minimum is at the hot,
// low-supply corner and equals a direct, full evaluation of that corner.
func TestWorstMomentHotLowSupply(t *testing.T) {
	s, st := worstOf(t, voltageSpec)
	wc := st.WorstCase
	if len(wc.Corners) != 4 {
		t.Fatalf("%d corners, want 2² = 4", len(wc.Corners))
	}
	m := resultOf(t, wc, "moment")
	if m.CornerMin < 0 || wc.Corners[m.CornerMin].High != ambientHigh {
		t.Fatalf("minimum moment at corner %d (%s), want hot and low supply", m.CornerMin, wc.CornerName(m.CornerMin))
	}
	if got := wc.CornerName(m.CornerMin); got != "supply −5 %, ambient 60 °C" {
		t.Errorf("corner name %q", got)
	}
	direct := calc.Evaluate(CornerDesign(s.Design, s.Tolerances, ambientHigh)).Moment.Norm()
	if math.Abs(m.Min-direct) > 1e-12*direct {
		t.Errorf("minimum moment %.15g, direct evaluation at the corner %.15g", m.Min, direct)
	}
	if !(m.Min < m.Nominal && m.Nominal < m.Max) {
		t.Errorf("min %g nominal %g max %g", m.Min, m.Nominal, m.Max)
	}
	// the maximum is at the opposite corner: cold, high supply
	if m.CornerMax < 0 || wc.Corners[m.CornerMax].High != supplyHigh {
		t.Errorf("maximum moment at %s", wc.CornerName(m.CornerMax))
	}
}

// The switch-off spike L·I/t grows with the current: largest when the
// winding is cold (least resistance) and the supply high; it is judged at
// the largest current the switch may open, the cold switch-on current.
func TestWorstSpikeColdHighSupply(t *testing.T) {
	s, st := worstOf(t, voltageSpec)
	wc := st.WorstCase
	v := resultOf(t, wc, "switch-off-voltage")
	if v.CornerMax < 0 || wc.Corners[v.CornerMax].High != supplyHigh {
		t.Fatalf("largest spike at %s, want cold and high supply", wc.CornerName(v.CornerMax))
	}
	r := calc.Evaluate(CornerDesign(s.Design, s.Tolerances, supplyHigh))
	if direct := r.Coils[0].Switch.SpikeWorst; math.Abs(v.Max-direct) > 1e-12*direct {
		t.Errorf("largest spike %.15g V, direct evaluation %.15g V", v.Max, direct)
	}
}

// A requirement met at nominal and missed at exactly one corner fails,
// naming that corner.
func TestWorstLimitFailsAtOneCorner(t *testing.T) {
	_, st := worstOf(t, voltageSpec)
	wc := st.WorstCase
	var vals []float64
	for _, c := range wc.Corners {
		vals = append(vals, c.Values[0]) // moment is the first headline result
	}
	if wc.Results[0].Quantity != "moment" {
		t.Fatal("moment is not the first headline result")
	}
	lo, second := math.Inf(1), math.Inf(1)
	for _, v := range vals {
		if v < lo {
			lo, second = v, lo
		} else if v < second {
			second = v
		}
	}
	req := (lo + second) / 2
	src := voltageSpec + fmt.Sprintf("```limits\nmoment >= %.9g A m2\n```\n", req)
	_, st = worstOf(t, src)
	wc = st.WorstCase
	if !st.WorstCase.Limits[0].NominalPass || st.Limits[0].Pass {
		t.Fatal("the limit should be met at nominal and FAIL overall")
	}
	wl := wc.Limits[0]
	if wl.Pass || wl.Failing != 1 || wl.Corner < 0 || wc.Corners[wl.Corner].High != ambientHigh {
		t.Errorf("worst limit %+v at %s; want FAIL at the hot, low-supply corner only", wl, wc.CornerName(wl.Corner))
	}
}

// The quick evaluation the corners use gives what calc.Evaluate gives for
// every headline result and limit, here on the torque coil with its on/off
// cycle, at every corner.
func TestQuickEvaluateMatchesEvaluate(t *testing.T) {
	src, err := os.ReadFile("../examples/torque-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	s, st := worstOf(t, string(src))
	for h := range st.WorstCase.Corners {
		d := CornerDesign(s.Design, s.Tolerances, uint32(h))
		full, quick := calc.Evaluate(d), QuickEvaluate(d)
		for _, q := range HeadlineQuantities {
			a, b := LimitValue(calc.Limit{Quantity: q}, d, full), LimitValue(calc.Limit{Quantity: q}, d, quick)
			if !(math.Abs(a-b) <= 1e-12*math.Abs(a)) && !(math.IsNaN(a) && math.IsNaN(b)) {
				t.Errorf("corner %d %s: full %.15g quick %.15g", h, q, a, b)
			}
		}
	}
}

// The Monte Carlo is seeded: the same spec gives the same samples whatever
// the number of goroutines.
func TestMonteCarloReproducible(t *testing.T) {
	src, err := os.ReadFile("../examples/torque-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	_, a := worstOf(t, string(src))
	prev := runtime.GOMAXPROCS(1)
	_, b := worstOf(t, string(src))
	runtime.GOMAXPROCS(prev)
	if a.WorstCase.MC == nil || a.WorstCase.MC.Samples != 2000 {
		t.Fatal("no Monte Carlo")
	}
	if !reflect.DeepEqual(a.WorstCase.MC, b.WorstCase.MC) || !reflect.DeepEqual(a.WorstCase.Results, b.WorstCase.Results) {
		t.Error("worst case depends on scheduling")
	}
	// every sampled moment lies within the corners' range
	m := a.WorstCase.Results[0]
	v := a.WorstCase.MC.Values[0]
	if v[0] < m.Min*(1-1e-9) || v[len(v)-1] > m.Max*(1+1e-9) {
		t.Errorf("samples %g .. %g outside corners %g .. %g", v[0], v[len(v)-1], m.Min, m.Max)
	}
}

func TestPercentile(t *testing.T) {
	x := []float64{1, 2, 3, 4, 5, 6, 7, 8, 9, 10}
	// nearest rank: P = ⌈p/100·n⌉-th value
	for _, c := range []struct{ p, want float64 }{{5, 1}, {50, 5}, {95, 10}, {100, 10}} {
		if g := Percentile(x, c.p); g != c.want {
			t.Errorf("P%g = %g, want %g", c.p, g, c.want)
		}
	}
}

// The corner the memo derives in full carries its switching against the
// nominal design's limit: without a driver rating that is twice the
// nominal supply at every corner (the driver does not change with the
// supply's tolerance), so the corner's largest resistor is
// (2 V_nom − V_s)/I_c with the corner's own V_s and I_c, and the switch
// voltage with the fitted resistor V_s + I_c R_s — held in the study, for
// the memo only to write.
func TestDerivedCornerSwitchingAgainstNominalLimit(t *testing.T) {
	src, err := os.ReadFile("../examples/torque-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	st := studyOf(t, strings.Replace(string(src), "driver-rating    = 16 V\n", "", 1))
	wk := st.WorstCase.Derived
	p := st.WorstCase.Suppression[0]
	if wk == nil || p == nil {
		t.Fatal("no derived corner or no resistor sized")
	}
	own := calc.Evaluate(wk.Design).Coils[0].Switch // the corner alone, its own limit
	limit := 2 * st.Spec.Design.Coils[0].Voltage
	if own.Clamp == limit {
		t.Fatalf("the derived corner's supply is the nominal one (%g V): no test", own.Supply)
	}
	s := wk.Results.Coils[0].Switch
	rmax := (limit - own.Supply) / own.WorstCurrent
	if s.Clamp != limit || s.ClampFromRating || math.Abs(s.ResistorMax-rmax) > 1e-12*rmax {
		t.Errorf("corner's limit %g V, largest resistor %g Ω; want %g V, %g Ω", s.Clamp, s.ResistorMax, limit, rmax)
	}
	if v := own.Supply + own.WorstCurrent*p.Resistor; s.Resistor != p.Resistor || math.Abs(s.SwitchVoltage-v) > 1e-12*v {
		t.Errorf("corner's switch voltage with %g Ω: %g V, want %g V", s.Resistor, s.SwitchVoltage, v)
	}
}
