package calc

import (
	"math"
	"testing"
)

func TestCoaxialForceAgainstEnergy(t *testing.T) {
	// Two multilayer coils on the z axis. At constant currents the force on
	// B is the derivative of the co-energy W = ½L_A I_A² + ½L_B I_B² +
	// M(z) I_A I_B with B's position z: F = I_A I_B dM/dz. The exact sum of
	// ∂M/∂z over turn pairs against a central difference of M (Richardson
	// extrapolated, error O(h⁴)).
	a := Coil{Form: Solenoid, MeanDiameter: 0.04, Length: 0.01, RadialBuild: 0.004, Turns: 60,
		Wire: Wire{Bare: 0.45e-3, Outer: 0.5e-3, Material: Copper()}, Axis: Vec{0, 0, 1}}
	b := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.006, RadialBuild: 0.002, Turns: 40,
		Wire: Wire{Bare: 0.45e-3, Outer: 0.5e-3, Material: Copper()}, Axis: Vec{0, 0, -1}, Centre: Vec{0, 0, 0.025}}
	wa, wb := LayOut(a), LayOut(b)
	Ia, Ib := 1.2, 0.7
	F := CoaxialForceBetween(a, wa, Ia, b, wb, Ib)
	energy := func(z float64) float64 {
		bb := b
		bb.Centre = Vec{0, 0, z}
		M, _ := CoaxialMutual(a, wa, bb, wb)
		return Ia * Ib * M
	}
	z, h := 0.025, 1e-4
	d := func(h float64) float64 { return (energy(z+h) - energy(z-h)) / (2 * h) }
	fd := (4*d(h) - d(2*h)) / 3
	checkRel(t, "F_z vs dW/dz", F[2], fd, 1e-8)
	if F[0] != 0 || F[1] != 0 {
		t.Errorf("coaxial force off axis: %v", F)
	}
	// B's axis is reversed: the currents oppose, M < 0, and they repel.
	M, _ := CoaxialMutual(a, wa, b, wb)
	if !(M < 0 && F[2] > 0) {
		t.Errorf("opposed coils: M = %g, F = %g", M, F[2])
	}
	// Newton's third law through Couplings, both orders.
	cp := Couplings([]Coil{a, b}, []Winding{wa, wb}, []float64{Ia, Ib}, []float64{1e-3, 1e-3})
	back := CoaxialForceBetween(b, wb, Ib, a, wa, Ia)
	if !cp[0].Exact || vecRelErr(back, cp[0].Force.Scale(-1)) > 1e-12 {
		t.Errorf("action %v, reaction %v", cp[0].Force, back)
	}
}

func TestCoaxialMutualOfBlocks(t *testing.T) {
	// Two thin coils far apart: M → N_a N_b μ0 π a² b² / (2 d³) (two
	// coaxial dipoles; Maxwell's formula at large distance).
	a := Coil{Form: Loop, MeanDiameter: 0.04, Turns: 30, Wire: WireFromGauge(30, Copper()), Axis: Vec{0, 0, 1}}
	b := Coil{Form: Loop, MeanDiameter: 0.06, Turns: 20, Wire: WireFromGauge(30, Copper()), Axis: Vec{0, 0, 1}}
	for _, d := range []float64{2, 20} {
		b.Centre = Vec{0, 0, d}
		M, _ := CoaxialMutual(a, LayOut(a), b, LayOut(b))
		want := 30 * 20 * Mu0 * math.Pi * 0.02 * 0.02 * 0.03 * 0.03 / (2 * d * d * d)
		checkRel(t, "dipole limit", M, want, 2*(0.02*0.02+0.03*0.03)/(d*d)+1e-12)
	}
	// A pair block: the sum of its two coils with their senses.
	p := Coil{Form: Pair, MeanDiameter: 0.2, Turns: 10, Spacing: 0.1, Wire: WireFromGauge(24, Copper()), Axis: Vec{0, 0, 1}}
	b.Centre = Vec{0, 0, 0.3}
	wp, wb := LayOut(p), LayOut(b)
	M, _ := CoaxialMutual(p, wp, b, wb)
	want := 10 * 20 * (MutualInductance(0.1, 0.03, 0.35) + MutualInductance(0.1, 0.03, 0.25))
	checkRel(t, "pair block", M, want, 1e-12)
	p.Opposing = true
	M, _ = CoaxialMutual(p, wp, b, wb)
	want = 10 * 20 * (MutualInductance(0.1, 0.03, 0.35) - MutualInductance(0.1, 0.03, 0.25))
	checkRel(t, "opposing pair block", M, want, 1e-12)
	// Coincident windings overlap: no finite M.
	b.Centre, b.MeanDiameter = Vec{}, 0.04
	if M, ov := CoaxialMutual(a, LayOut(a), b, LayOut(b)); !ov || !math.IsNaN(M) {
		t.Errorf("coincident: M = %g overlap %v", M, ov)
	}
	// Not coaxial: no M, and the dipole force between side-by-side small
	// loops with parallel moments is the repulsion 3 μ0 m² / (4π d⁴), from
	// the energy of two dipoles U = μ0/(4π r³) [m₁·m₂ − 3 (m₁·r̂)(m₂·r̂)];
	// the finite loops and the difference step add about 10⁻⁵.
	b = Coil{Form: Loop, MeanDiameter: 0.002, Turns: 1, Wire: WireFromGauge(40, Copper()), Axis: Vec{0, 0, 1}, Centre: Vec{0.5, 0, 0}}
	a = b
	a.Centre = Vec{}
	if ok, _ := coaxial(a, b); ok {
		t.Fatal("side by side coils are not coaxial")
	}
	cp := Couplings([]Coil{a, b}, []Winding{LayOut(a), LayOut(b)}, []float64{2, 2}, []float64{1e-9, 1e-9})
	m := 2 * math.Pi * 0.001 * 0.001
	if !cp[0].Exact {
		t.Errorf("non-coaxial circular coils get Neumann's M and the Lorentz force: %+v", cp[0])
	}
	// Neumann's M tends to the dipole–dipole value −μ0 (πa²)² / (4π r³)
	// for parallel moments side by side.
	a1 := math.Pi * 0.001 * 0.001
	checkRel(t, "side-by-side M, dipole limit", cp[0].Mutual, -Mu0*a1*a1/(4*math.Pi*0.125), 1e-5)
	checkRel(t, "dipole–dipole repulsion (Lorentz)", cp[0].Force[0], 3*Mu0*m*m/(4*math.Pi*math.Pow(0.5, 4)), 5e-5)
	checkRel(t, "dipole–dipole repulsion (dipole cross-check)", cp[0].Dipole[0], 3*Mu0*m*m/(4*math.Pi*math.Pow(0.5, 4)), 5e-5)
}

func TestTorqueOfSeveralCoils(t *testing.T) {
	// Three torque coils on x, y and z: the torque is the total moment
	// crossed with the field, equal to the sum of the coils' own torques.
	d := Design{Conditions: Conditions{Ambient: T20, BackgroundField: Vec{20e-6, -5e-6, 40e-6}, DesignAngle: math.Pi / 2}}
	for i, ax := range []Vec{{1, 0, 0}, {0, 1, 0}, {0, 0, 1}} {
		d.Coils = append(d.Coils, Coil{Name: string(rune('x' + i)), Form: Loop, MeanDiameter: 0.06 + 0.01*float64(i), Turns: 150,
			Wire: WireFromGauge(32, Copper()), Drive: CurrentDrive, Current: 0.05 * float64(i+1), Duty: 1, Axis: ax})
	}
	r := Evaluate(d)
	var sum Vec
	for _, c := range r.Coils {
		sum = sum.Add(Torque(c.Moment, d.Conditions.BackgroundField))
	}
	if vecRelErr(r.Torque, sum) > 1e-14 {
		t.Errorf("torque %v, sum of coil torques %v", r.Torque, sum)
	}
	checkRel(t, "|m||B|", r.TorqueMax, r.Moment.Norm()*d.Conditions.BackgroundField.Norm(), 1e-15)
	if len(r.Couplings) != 3 || r.Couplings[0].Coaxial {
		t.Errorf("couplings %+v", r.Couplings)
	}
	// A stated gradient: F = |m| G.
	d.Conditions.FieldGradient = 2e-3
	r = Evaluate(d)
	checkRel(t, "gradient force", r.GradientForce, r.Moment.Norm()*2e-3, 1e-15)
}
