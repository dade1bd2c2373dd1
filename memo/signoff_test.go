package memo

import (
	"math"
	"strings"
	"testing"

	"coilmemo/calc"
)

// A thick solenoid on a long on/off cycle under current drive: at the
// cycle's peak the winding is hotter, its resistance higher, than at the
// duty-averaged state, and the current source must deliver I·R there.
// Page 1 gives that voltage and says its hottest point is the cycle's
// peak; the switch-off figures take it as the source's compliance.
func TestCycledCurrentDriveAtItsPeak(t *testing.T) {
	src := "```coil\nname = test solenoid\nform = solenoid\ninner-diameter = 50 mm\nradial-build = 8 mm\nlength = 60 mm\nturns = 1480\nwire = AWG 24\ninsulation-class = F\ncurrent = 0.92 A\nduty = 60 %\non-time = 20 min\n```\n" +
		"```conditions\nambient = 25 degC\nemissivity = 0.9\n```\n"
	j, diags := evaluate("n.md", []byte(src))
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	cr := j.Results.Coils[0]
	cy := cr.Heat.Cycle
	want := 0.92 * calc.ResistanceAt(cr.R20, calc.Copper().Alpha20, cy.PeakMean)
	if !(cy.PeakMean > cr.Heat.Steady.Mean) || math.Abs(cr.VoltagePeak/want-1) > 1e-12 || !(cr.VoltagePeak > cr.Voltage*1.05) {
		t.Fatalf("peak voltage %g V, want I·R(T_peak) = %g V above the steady %g V", cr.VoltagePeak, want, cr.Voltage)
	}
	if cr.Switch.Supply != cr.VoltagePeak {
		t.Errorf("switch-off supply %g V, want the compliance at the peak %g V", cr.Switch.Supply, cr.VoltagePeak)
	}
	text := memoText(t, j)
	page1 := text[:strings.Index(text, "Purpose")]
	for _, s := range []string{Eng(cr.VoltagePeak, "V", 3) + " at the cycle's peak", "(cycle peak; " + Eng(Celsius(cr.SteadyHotSpot), "°C", 3) + " duty-averaged)"} {
		if !strings.Contains(page1, s) {
			t.Errorf("page 1 does not say %q", s)
		}
	}
}

// The valve actuator is calculated without its plunger: page 1 and the
// filament assumption say so, not only the cautions; its hot-surface
// caution, judged at the cycle's peak, gives the surface a stuck driver
// would leave it at.
func TestPlungerCaveatAndStuckSurface(t *testing.T) {
	j, text := memoOf(t, "../examples/valve-actuator.md", true)
	page1 := text[:strings.Index(text, "Purpose")]
	if !strings.Contains(page1, "calculated without its plunger") {
		t.Error("page 1 does not say the coil is calculated without its plunger")
	}
	if !strings.Contains(text, "except the plunger of coil") {
		t.Error("the filament assumption claims non-magnetic surroundings without the plunger's exception")
	}
	st := j.Coils[0].Heat.Continuous
	if want := "energised continuously (a stuck driver) it would settle at " + Eng(Celsius(st.Surface), "°C", 3); !st.Settled || !strings.Contains(text, want) {
		t.Errorf("the hot-surface caution does not give the stuck-on surface %q", want)
	}
}

// The search coil meets its stated requirements but does not cover its
// stated band: page 1's bold verdict says both, so it does not read as a
// clean pass.
func TestVerdictOfAReceiverShortOfItsBand(t *testing.T) {
	j, text := memoOf(t, "../examples/search-coil.md", true)
	failed, _ := j.Failed()
	page1 := text[:strings.Index(text, "Purpose")]
	if failed != 0 || !strings.Contains(page1, "requirements are met, but coil \"search coil\" does not cover its stated band") {
		t.Errorf("%d requirements failed; page 1 verdict: %q", failed, page1[:min(len(page1), 600)])
	}
}
