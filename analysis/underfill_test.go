package analysis

import (
	"math"
	"testing"

	"coilmemo/calc"
)

// A multilayer winding whose turns fill only part of its stated radial
// build: the laid section spans the layers as laid, the fill is taken
// over it, and Wheeler's multilayer formula (Wheeler, Proc. IRE 16, 1928,
// p. 1398: L = 0.8 a²N²/(6a + 9b + 10c) µH in inches, within about 1 %
// where its three terms are comparable) on the turns as laid agrees with
// the turn-by-turn inductance, which the stated dimensions do not.
func TestUnderfilledWinding(t *testing.T) {
	wire := calc.Wire{Bare: 0.5e-3, Outer: 0.55e-3, Material: calc.Copper()}
	// 20 mm long, stated 16 mm build on a 40 mm bore; 360 turns fill 10 layers of 36 = 5.5 mm.
	co := calc.Coil{Name: "u", Form: calc.Solenoid, InnerDiameter: 0.04, MeanDiameter: 0.056, Length: 0.02, RadialBuild: 0.016,
		Turns: 360, Wire: wire, Drive: calc.CurrentDrive, Current: 0.1, Duty: 1, InsulationClass: 403.15, Axis: calc.Vec{0, 0, 1}}
	d := calc.Design{Coils: []calc.Coil{co}, Conditions: calc.Conditions{Ambient: 293.15, Cooling: calc.Cooling{Emissivity: 0.85}}}
	r := calc.Evaluate(d)
	cr := r.Coils[0]
	cs := StudyCoil(co, cr, d.Conditions)
	w := cr.Winding
	last := w.Layers[len(w.Layers)-1].Radius
	if !cs.Underfilled || math.Abs(cs.Laid.R0-0.02) > 1e-12 || math.Abs(cs.Laid.R1-(last+0.55e-3/2)) > 1e-12 || math.Abs(cs.Envelope.R1-0.036) > 1e-12 {
		t.Fatalf("laid %+v, stated %+v, underfilled %v (outermost layer at %g m)", cs.Laid, cs.Envelope, cs.Underfilled, last)
	}
	area := math.Pi * 0.5e-3 * 0.5e-3 / 4
	if want := 360 * area / ((cs.Laid.R1 - cs.Laid.R0) * 0.02); math.Abs(cs.LaidFill-want) > 1e-12*want || !(cs.LaidFill > 2*w.FillFactor) {
		t.Errorf("fill as laid %g, want %g (stated section %g)", cs.LaidFill, want, w.FillFactor)
	}
	L1 := cs.Inductance.L1
	if e := cs.Inductance.WheelerMultilayer/L1 - 1; math.Abs(e) > 0.02 {
		t.Errorf("Wheeler on the laid winding differs from the turn sum by %.2g %%", 100*e)
	}
	t.Logf("turn sum %.4g H, Wheeler as laid %.4g H", L1, cs.Inductance.WheelerMultilayer)
	// The stated section (mean radius 28 mm, build 16 mm) misses by far more.
	if stated := calc.WheelerMultilayerInductance(0.028, 0.02, 0.016, 360); math.Abs(stated/L1-1) < 0.1 {
		t.Errorf("Wheeler on the stated section differs by only %.2g %%", 100*(stated/L1-1))
	}
}
