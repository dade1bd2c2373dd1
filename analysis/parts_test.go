package analysis

import (
	"math"
	"testing"

	"coilmemo/calc"
)

// The parts of the derivations add up to their results, and the field
// sum agrees with the textbook field at the centre of a circular loop,
// B = μ0 I/(2a) (Jackson, Classical Electrodynamics, 3rd ed., §5.5).
func TestDerivationParts(t *testing.T) {
	near := func(what string, got, want, tol float64) {
		t.Helper()
		if !(math.Abs(got-want) <= tol*math.Abs(want)) {
			t.Errorf("%s = %.10g, want %.10g", what, got, want)
		}
	}
	wire := calc.Wire{Bare: 0.5e-3, Outer: 0.55e-3, Material: calc.Copper()}
	cond := calc.Conditions{Ambient: 293.15}
	study := func(co calc.Coil) (calc.CoilResult, CoilStudy) {
		t.Helper()
		co.Drive, co.Current, co.Axis, co.Duty = calc.CurrentDrive, 0.5, calc.Vec{0, 0, 1}, 1
		d := calc.Design{Coils: []calc.Coil{co}, Conditions: cond}
		r := calc.Evaluate(d)
		return r.Coils[0], StudyCoil(co, r.Coils[0], cond)
	}

	// One turn: S = 1/(2a).
	_, cs := study(calc.Coil{Name: "loop", Form: calc.Loop, MeanDiameter: 0.1, Turns: 1, Wire: wire})
	near("loop field sum", cs.CentreSum, 1/(2*0.05), 1e-12)

	// A multilayer solenoid: μ0 I S is its field at the centre, the self
	// terms are N turn inductances of about the mean radius, the pairs
	// the rest.
	sol := calc.Coil{Name: "sol", Form: calc.Solenoid, MeanDiameter: 0.04, Length: 0.02, RadialBuild: 4e-3, Turns: 200, Wire: wire}
	cr, cs := study(sol)
	near("multilayer field", calc.Mu0*cr.Current*cs.CentreSum, cr.FieldCentre.Norm(), 1e-9)
	ip := cs.Inductance
	near("self terms", ip.SelfTerms, 200*calc.TurnSelfInductance(cs.MeanRadius, wire.Bare/2), 0.05)
	if !(ip.SelfTerms > 0 && ip.SelfTerms < ip.L1) {
		t.Errorf("self terms %g of L1 %g", ip.SelfTerms, ip.L1)
	}
	near("mean square radius", 200*math.Pi*cs.MeanSquareRadius, cr.Winding.AreaSum, 1e-12)
	near("loss slope", cr.Heat.HeatCapacity/cs.Heat.LossSlope, cr.ThermalTau, 1e-12)

	// A thin pair: every pair of turns has the mutual inductance of two
	// circles of the mean radius at the spacing, and the force is I² ∂M/∂s
	// (∂M/∂s checked by a central difference of Maxwell's formula).
	pair := calc.Coil{Name: "pair", Form: calc.Pair, MeanDiameter: 0.1, Turns: 20, Spacing: 0.05, Wire: wire}
	cr, cs = study(pair)
	ip = cs.Inductance
	near("mean mutual", ip.MeanMutual, calc.MutualInductance(0.05, 0.05, 0.05), 1e-9)
	h := 1e-5
	dM := 400 * (calc.MutualInductance(0.05, 0.05, 0.05+h) - calc.MutualInductance(0.05, 0.05, 0.05-h)) / (2 * h)
	near("∂M/∂s", ip.Slope, dM, 1e-4)
	near("field sum of the pair", calc.Mu0*cr.Current*cs.CentreSum, cr.FieldCentre.Norm(), 1e-9)

	// A rectangle: L = N² times the single turn's.
	rect := calc.Coil{Name: "rect", Form: calc.Rectangle, Width: 0.4, Height: 0.25, Turns: 40, Wire: wire}
	cr, cs = study(rect)
	near("rectangle", 40*40*cs.Inductance.Turn, cr.Inductance, 1e-12)
}

// The core's peak flux density is μ0 (H + M) of the slice it names.
func TestCorePeakParts(t *testing.T) {
	wire := calc.Wire{Bare: 0.3e-3, Outer: 0.34e-3, Material: calc.Copper()}
	co := calc.Coil{Form: calc.Solenoid, MeanDiameter: 0.012, Length: 0.06, Turns: 600, Wire: wire,
		Core: calc.Core{Permeability: 2000, Length: 0.07, Diameter: 0.006, Saturation: 0.75}}
	w := calc.LayOut(co)
	r := calc.EvaluateCore(co, w, 0.1)
	if r.Problem != "" {
		t.Fatal(r.Problem)
	}
	if got := calc.Mu0 * (r.PeakH + r.PeakM); math.Abs(got-r.FluxDensityPeak) > 1e-12*r.FluxDensityPeak || !(r.PeakM > 0) {
		t.Errorf("μ0 (H + M) = %g, peak %g (H %g, M %g)", got, r.FluxDensityPeak, r.PeakH, r.PeakM)
	}
	if v := math.Pi * 0.006 * 0.006 / 4 * 0.07; math.Abs(r.Volume-v) > 1e-15 {
		t.Errorf("volume %g, want %g", r.Volume, v)
	}
}
