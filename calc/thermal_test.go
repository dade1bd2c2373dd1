package calc

import (
	"math"
	"testing"
)

func baseThermal() ThermalProblem {
	return ThermalProblem{
		Drive: CurrentDrive, Current: 2, R20: 3, Alpha20: 0, Duty: 1,
		Area: 0.01, H: 10, Emissivity: 0, Ambient: T20,
	}
}

func TestThermalConvectionOnlyExact(t *testing.T) {
	// α = 0, convection only: ΔT = P/(hA) exactly (Newton's law of cooling).
	tp := baseThermal()
	T, run := SteadyTemperature(tp)
	P := 2 * 2 * 3.0
	if run || math.Abs((T-tp.Ambient)-P/(tp.H*tp.Area)) > 1e-9 {
		t.Errorf("ΔT = %.12g, want %.12g (runaway %v)", T-tp.Ambient, P/(tp.H*tp.Area), run)
	}
	// With α ≠ 0 the balance is still linear: I²R20(1 + α(T − T20)) =
	// hA(T − Ta) gives, for Ta = T20, ΔT = I²R20/(hA − I²R20 α).
	tp.Alpha20 = 0.00393
	T, _ = SteadyTemperature(tp)
	want := P / (tp.H*tp.Area - P*tp.Alpha20)
	if math.Abs((T-tp.Ambient)-want) > 1e-9 {
		t.Errorf("ΔT with α = %.12g, want %.12g", T-tp.Ambient, want)
	}
	// Duty halves the average power.
	tp.Alpha20, tp.Duty = 0, 0.5
	T, _ = SteadyTemperature(tp)
	if math.Abs((T-tp.Ambient)-P/2/(tp.H*tp.Area)) > 1e-9 {
		t.Errorf("duty 0.5: ΔT = %g", T-tp.Ambient)
	}
}

func TestThermalRadiationOnlyExact(t *testing.T) {
	// Vacuum, α = 0: εσA(T⁴ − Ta⁴) = P (Stefan–Boltzmann law).
	tp := baseThermal()
	tp.H, tp.Emissivity, tp.Ambient = 0, 0.8, 250
	T, run := SteadyTemperature(tp)
	want := math.Pow(math.Pow(250, 4)+12/(0.8*StefanBoltzmann*0.01), 0.25)
	if run || math.Abs(T-want) > 1e-9 {
		t.Errorf("radiation only: T = %.12g, want %.12g", T, want)
	}
}

func TestThermalVoltageDriveSettles(t *testing.T) {
	// Voltage drive: the power falls as R rises; a steady state exists even
	// when the same cold power would run away under current drive.
	tp := baseThermal()
	tp.Drive, tp.Voltage, tp.Alpha20, tp.H = VoltageDrive, 6, 0.00393, 3
	cur := tp
	cur.Drive, cur.Current = CurrentDrive, 6/tp.R20
	if _, run := SteadyTemperature(cur); !run {
		t.Fatal("the same cold power under current drive should run away")
	}
	T, run := SteadyTemperature(tp)
	if run || math.IsNaN(T) {
		t.Fatalf("voltage drive did not settle: %g %v", T, run)
	}
	if r := math.Abs(tp.HeatIn(T) - tp.HeatOut(T)); r > 1e-9*tp.HeatIn(T) {
		t.Errorf("heat balance residual %g W at T = %g", r, T)
	}
	// Hotter than ambient, cooler than the cold-resistance estimate.
	cold := tp.Ambient + 6*6/3.0/(tp.H*tp.Area)
	if !(T > tp.Ambient && T < cold) {
		t.Errorf("T = %g not in (%g, %g)", T, tp.Ambient, cold)
	}
}

func TestThermalRunaway(t *testing.T) {
	// Current drive, convection only, no radiation: the heating grows as
	// I²R20 α per kelvin; when that exceeds hA no steady state exists.
	tp := baseThermal()
	tp.Alpha20 = 0.00393
	tp.Current = math.Sqrt(1.01 * tp.H * tp.Area / (tp.R20 * tp.Alpha20))
	T, run := SteadyTemperature(tp)
	if !run || !math.IsNaN(T) {
		t.Errorf("hard-driven coil: T = %g runaway = %v, want runaway", T, run)
	}
	// Just below the threshold it settles (hot, but below the bound).
	tp.Current = math.Sqrt(0.5 * tp.H * tp.Area / (tp.R20 * tp.Alpha20))
	if T, run := SteadyTemperature(tp); run || !(T > tp.Ambient) {
		t.Errorf("half the critical current: T = %g runaway %v", T, run)
	}
	// No heat: ambient.
	tp.Current = 0
	if T, run := SteadyTemperature(tp); run || T != tp.Ambient {
		t.Errorf("no current: T = %g", T)
	}
}

func TestWarmUpExponential(t *testing.T) {
	// α = 0, convection only: T(t) = Ta + ΔT (1 − e^{−t/τ}), τ = C/(hA)
	// (lumped capacitance, Incropera & DeWitt ch. 5).
	tp := baseThermal()
	C := 50.0
	tau := C / (tp.H * tp.Area)
	dT := 12 / (tp.H * tp.Area)
	ts, Ts := tp.WarmUp(C, 5*tau, 500)
	for i := range ts {
		want := tp.Ambient + dT*(1-math.Exp(-ts[i]/tau))
		if math.Abs(Ts[i]-want) > 1e-8 {
			t.Fatalf("t = %g: T = %.12g, want %.12g", ts[i], Ts[i], want)
		}
	}
	Tss, _ := SteadyTemperature(tp)
	checkRel(t, "thermal time constant", tp.ThermalTimeConstant(C, Tss), tau, 1e-9)
}

func TestCoolingDefaults(t *testing.T) {
	if EffectiveCooling(Cooling{}) != StillAir() {
		t.Error("no cooling stated should mean still air")
	}
	v := EffectiveCooling(Cooling{Vacuum: true, H: 10, Emissivity: 0.8})
	if v.H != 0 || v.Emissivity != 0.8 {
		t.Errorf("vacuum: %+v", v)
	}
	if c := EffectiveCooling(Cooling{H: 0, HGiven: true}); c.H != 0 || c.Emissivity != 0 {
		t.Errorf("stated h = 0 must be kept: %+v", c)
	}
}

// A coil that warms by millikelvin still closes its heat balance to 1e-9:
// the solver bisects relative to the rise, not the absolute temperature.
// (Below about 0.1 mK the resolution of a float64 kelvin temperature,
// 5.7e-14 K at 300 K, is itself more than 1e-9 of the rise.)
func TestSteadyBalanceSmallRise(t *testing.T) {
	for _, I := range []float64{1e-2, 0.1, 1} {
		tp := ThermalProblem{Drive: CurrentDrive, Current: I, R20: 5, Alpha20: Copper().Alpha20, Duty: 1,
			Area: 0.01, H: 10, Emissivity: 0.85, Ambient: T20, RiseMean: 0.5}
		T, runaway := SteadyTemperature(tp)
		if runaway {
			t.Fatalf("I = %g A: runaway", I)
		}
		in := tp.HeatIn(T)
		out := tp.HeatOut(tp.Surface(T, in))
		if rel := math.Abs(in-out) / in; rel > 1e-9 {
			t.Errorf("I = %g A (rise %.3g K): heat balance closes to %.2g, want ≤ 1e-9", I, T-T20, rel)
		}
	}
}
