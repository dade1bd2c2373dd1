package memo

import (
	"strings"
	"testing"
)

// A voltage-driven winding's cold current is taken at 20 °C; the memo
// says why when the ambient is warmer (the switch-on state the switch must
// open) and, in a colder ambient, derives the larger switch-on current at
// the ambient's resistance, R(T_a) = R20 [1 + α20 (T_a − 20 °C)] with the
// copper coefficient 0.00393 /K (IEC 60028, 1925, the annealed copper
// standard).
func TestColdCurrentAgainstTheAmbient(t *testing.T) {
	spec := func(ambient string) string {
		return "```coil\nname = s\nform = solenoid\nmean-diameter = 30 mm\nlength = 30 mm\nturns = 80\nwire = AWG 28\nvoltage = 12 V\n```\n" +
			"```conditions\nambient = " + ambient + "\n```\n"
	}
	warm := memoText(t, mustEvaluate(t, spec("40 degC")))
	if !strings.Contains(warm, "so this bounds the switch-on current in the 40.0 °C ambient") {
		t.Error("a 40 °C ambient: the cold current does not say why it is taken at 20 °C")
	}
	j := mustEvaluate(t, spec("-20 degC"))
	cr := j.Results.Coils[0]
	cold := memoText(t, j)
	if !strings.Contains(cold, "Current at switch-on in the −20.0 °C ambient") {
		t.Fatal("a −20 °C ambient: no switch-on current at the ambient's resistance")
	}
	// The resistance there by the linear law, from the 20 °C resistance.
	want := cr.R20 * (1 + 0.00393*(-40))
	if got := cr.Switch.ColdResistance; got < want*(1-1e-3) || got > want*(1+1e-3) {
		t.Errorf("R(−20 °C) = %g Ω, want %g Ω", got, want)
	}
	if !(cr.SwitchOnCurrent > cr.ColdCurrent) {
		t.Errorf("switch-on current %g A not above the 20 °C current %g A", cr.SwitchOnCurrent, cr.ColdCurrent)
	}
	if strings.Contains(cold, "Current when cold: switch-on with the winding at 20 °C") {
		t.Error("a −20 °C ambient: the 20 °C current is still called the switch-on current")
	}
}
