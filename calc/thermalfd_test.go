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

// TestAnnulusConductionConverges holds the finite-volume scheme to the
// accuracy its doc comment states: second order in the ring thickness
// (halving the rings divides the error by about four), and at 400 rings
// the internal rise within 6 × 10⁻⁶ of the closed form (Incropera &
// DeWitt, 6th ed., §3.5, AnnulusRise) for a solid bundle and 2 × 10⁻⁶ for
// annuli from thick to a hundredth of the radius.
func TestAnnulusConductionConverges(t *testing.T) {
	for _, c := range [][3]float64{{0, 0.004, 0.03}, {0.002, 0.004, 0.03}, {0.01, 0.016, 0.03}, {0.02, 0.021, 0.01}, {0.02, 0.0202, 0.01}} {
		ri, ro, l := c[0], c[1], c[2]
		const k = 0.3
		tp := baseThermal() // 12 W, hA = 0.1 W/K
		mean, hot := AnnulusRise(ri, ro, l, k)
		errAt := func(n int) (float64, float64) {
			r := AnnulusConduction(tp, ri, ro, l, k, 1, n)
			if !r.Converged {
				t.Fatalf("%v, %d rings: not converged", c, n)
			}
			return math.Abs((r.HotSpot-r.Surface)/(12*hot) - 1), math.Abs((r.Mean-r.Surface)/(12*mean) - 1)
		}
		h2, m2 := errAt(200)
		h4, m4 := errAt(400)
		bound := 2e-6
		if ri == 0 {
			bound = 6e-6
		}
		if h4 > bound || m4 > bound {
			t.Errorf("%v: 400 rings off the closed form by %.2g (hot spot), %.2g (mean); stated bound %.0g", c, h4, m4, bound)
		}
		if h2/h4 < 3 || m2/m4 < 3 {
			t.Errorf("%v: halving the rings divides the error by %.2f (hot spot), %.2f (mean), want about 4", c, h2/h4, m2/m4)
		}
	}
}

func TestWindingConductionChecksHeatBalance(t *testing.T) {
	// The valve coil (examples/valve-actuator.md) continuously energised,
	// a current-driven multilayer coil and a coil driven far past its
	// class: the finite-volume profile, heated uniformly at the
	// resistance of its own mean, reaches the lumped balance's hot spot
	// and mean (the closed forms solved by MeanAtSurface) within the
	// scheme's accuracy.
	over := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.03, RadialBuild: 0.008, Turns: 1500,
		Wire: WireFromGauge(28, Copper()), Drive: VoltageDrive, Voltage: 48, Duty: 1,
		Axis: Vec{0, 0, 1}, InsulationClass: CelsiusToKelvin(130)}
	vc, vcond := valveCoil()
	vc.Duty, vc.OnTime = 1, 0
	for _, cc := range []struct {
		name string
		c    Coil
		cond Conditions
	}{{"valve coil", vc, vcond}, {"overdriven coil", over, vcond}} {
		c := cc.c
		w := LayOut(c)
		op := OperatingPoint(c, w, cc.cond)
		fd := WindingConduction(c, w, op.Thermal, 400)
		if !fd.Converged || !op.State.Settled {
			t.Fatalf("%s: not converged", cc.name)
		}
		rise := op.State.HotSpot - op.Thermal.Ambient
		if e := math.Abs(fd.HotSpot-op.State.HotSpot) / rise; e > 1e-5 {
			t.Errorf("%s: hot spot: finite volume %.6f °C, lumped %.6f °C (%.2g of the rise)", cc.name, KelvinToCelsius(fd.HotSpot), KelvinToCelsius(op.State.HotSpot), e)
		}
		if e := math.Abs(fd.Mean-op.State.Mean) / rise; e > 1e-5 {
			t.Errorf("%s: mean: finite volume %.6f °C, lumped %.6f °C", cc.name, KelvinToCelsius(fd.Mean), KelvinToCelsius(op.State.Mean))
		}
		checkRel(t, cc.name+" power", fd.Power, op.Power, 1e-5)
	}
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
