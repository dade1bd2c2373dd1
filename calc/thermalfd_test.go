package calc

import (
	"math"
	"testing"
)

func TestAnnulusConductionAgainstClosedForm(t *testing.T) {
	// Constant resistance and Newton cooling: the surface is
	// Ta + P/(hA) and the profile is the closed-form solution of radial
	// conduction with uniform generation and an adiabatic bore (Incropera &
	// DeWitt, 6th ed., §3.5; AnnulusRise): hot spot and mean above the
	// surface by max·P and mean·P. Solid cylinder, thick and thin annulus,
	// and a pair (two coils sharing the power).
	for _, c := range [][4]float64{{0, 0.004, 0.03, 1}, {0.01, 0.016, 0.03, 1}, {0.02, 0.021, 0.01, 1}, {0.01, 0.014, 0.02, 2}} {
		ri, ro, l, coils := c[0], c[1], c[2], c[3]
		const k = 0.3
		tp := baseThermal() // 12 W, hA = 0.1 W/K
		r := AnnulusConduction(tp, ri, ro, l, k, coils, 800)
		if !r.Converged {
			t.Fatalf("%v: not converged", c)
		}
		mean, hot := AnnulusRise(ri, ro, l, k)
		P := 12.0
		Ts := T20 + P/(tp.H*tp.Area)
		checkRel(t, "surface", r.Surface-T20, Ts-T20, 1e-9)
		checkRel(t, "hot-spot rise above the surface", r.HotSpot-r.Surface, hot*P/coils, 1e-4)
		checkRel(t, "mean rise above the surface", r.Mean-r.Surface, mean*P/coils, 1e-4)
	}
}

func TestWindingConductionChecksHeatBalance(t *testing.T) {
	// The valve coil (examples/valve-actuator.md) continuously energised,
	// and a current-driven multilayer coil: the finite-volume profile with
	// each ring's resistance at its own temperature agrees with the lumped
	// balance's hot spot and mean to a small fraction of the rise.
	c, cond := valveCoil()
	c.Duty, c.OnTime = 1, 0
	w := LayOut(c)
	op := OperatingPoint(c, w, cond)
	fd := WindingConduction(c, w, op.Thermal, 400)
	if !fd.Converged {
		t.Fatal("not converged")
	}
	rise := op.State.HotSpot - op.Thermal.Ambient
	if e := math.Abs(fd.HotSpot-op.State.HotSpot) / rise; e > 0.01 {
		t.Errorf("hot spot: finite volume %.3f °C, lumped %.3f °C", KelvinToCelsius(fd.HotSpot), KelvinToCelsius(op.State.HotSpot))
	}
	if e := math.Abs(fd.Mean-op.State.Mean) / rise; e > 0.01 {
		t.Errorf("mean: finite volume %.3f °C, lumped %.3f °C", KelvinToCelsius(fd.Mean), KelvinToCelsius(op.State.Mean))
	}
	checkRel(t, "power", fd.Power, op.Power, 0.01)
	// A runaway has no solution; degenerate data give NaN, no panic.
	tc, tcond := torqueCoilAt(10)
	tw := LayOut(tc)
	if r := WindingConduction(tc, tw, OperatingPoint(tc, tw, tcond).Thermal, 100); r.Converged || !math.IsNaN(r.HotSpot) {
		t.Errorf("10 A torque coil: %+v", r)
	}
	if r := AnnulusConduction(baseThermal(), 0.01, 0.005, 0.01, 0.3, 1, 10); !math.IsNaN(r.HotSpot) {
		t.Errorf("inverted annulus: %+v", r)
	}
}
