package calc

import (
	"math"
	"testing"
)

func TestAWGDiameter(t *testing.T) {
	// ASTM B258 defines the gauge by its two anchors: AWG 36 = 0.0050 in
	// and AWG 4/0 (n = −3) = 0.4600 in exactly.
	checkRel(t, "AWG 36", AWGDiameter(36)/Inch, 0.005, 1e-14)
	checkRel(t, "AWG 4/0", AWGDiameter(-3)/Inch, 0.46, 1e-14)
	// NBS Handbook 100, Copper Wire Tables (1966), diameters in inches
	// rounded to four decimals: agreement within half the last digit.
	for _, c := range []struct {
		n  int
		in float64
	}{{24, 0.0201}, {30, 0.0100}, {10, 0.1019}} {
		if d := AWGDiameter(c.n) / Inch; math.Abs(d-c.in) > 0.00005 {
			t.Errorf("AWG %d = %.5f in, NBS Handbook 100 gives %.4f in", c.n, d, c.in)
		}
	}
	if !AWGValid(-3) || !AWGValid(56) || AWGValid(-4) || AWGValid(57) {
		t.Error("AWGValid range is −3..56")
	}
}

func TestWireResistanceNBS(t *testing.T) {
	// IEC 60028: annealed copper ρ20 = 1/58 Ω·mm²/m.
	checkRel(t, "copper ρ20 (IEC 60028)", Copper().Rho20*1e6, 1.0/58, 1e-15)
	// NBS Handbook 100 (1966), Ω per 1000 ft at 20 °C, tabulated to four
	// significant figures: agreement to 0.1 %.
	for _, c := range []struct {
		n   int
		ohm float64
	}{{24, 25.67}, {30, 103.2}} {
		got := ResistancePerLength(AWGDiameter(c.n), Copper(), T20) * 1000 * Foot
		checkRel(t, "R per 1000 ft, NBS Handbook 100", got, c.ohm, 1e-3)
	}
	// R(T) = R20 (1 + α20 (T − 20 °C)), IEC 60028: at 75 °C, 1 + 0.00393·55.
	r20 := ResistancePerLength(1e-3, Copper(), T20)
	r75 := ResistancePerLength(1e-3, Copper(), CelsiusToKelvin(75))
	checkRel(t, "R75/R20", r75/r20, 1+0.00393*55, 1e-14)
	if !math.IsNaN(ResistancePerLength(0, Copper(), T20)) {
		t.Error("zero diameter must give NaN")
	}
}

func TestHeavyBuildOuter(t *testing.T) {
	// By construction of the (recalled) fit: 0.0813 mm build at 1.628 mm bare.
	checkRel(t, "heavy build at AWG 14", HeavyBuildOuter(1.628e-3), 1.628e-3+0.0813e-3, 1e-14)
	// The build shrinks with the bare diameter but stays positive.
	b30 := HeavyBuildOuter(AWGDiameter(30)) - AWGDiameter(30)
	b14 := HeavyBuildOuter(AWGDiameter(14)) - AWGDiameter(14)
	if !(b30 > 0 && b30 < b14) {
		t.Errorf("builds AWG30 %.4g, AWG14 %.4g", b30, b14)
	}
	w := WireFromGauge(30, Aluminium())
	if w.Gauge != 30 || w.Bare != AWGDiameter(30) || w.Outer <= w.Bare || w.Material.Name != "aluminium" {
		t.Errorf("WireFromGauge: %+v", w)
	}
	if m, ok := MaterialByName(" Aluminum "); !ok || m.Rho20 != Aluminium().Rho20 {
		t.Error("MaterialByName aluminum")
	}
	if _, ok := MaterialByName("silver"); ok {
		t.Error("MaterialByName silver")
	}
}
