package calc

import (
	"math"
	"testing"
)

// torqueCoilAt is the shipped torque-coil example (examples/torque-coil.md:
// thin loop of 200 turns of AWG 32 on 80 mm, class 155 °C, 50 % duty with
// 5 min on, a 12 g PEEK former, in vacuum on a 60 K/W mount) driven by a
// current instead of its 5 V.
func torqueCoilAt(I float64) (Coil, Conditions) {
	c := Coil{Name: "torque coil Z", Form: Loop, MeanDiameter: 0.08, Turns: 200, Wire: WireFromGauge(32, Copper()),
		Drive: CurrentDrive, Current: I, Duty: 0.5, OnTime: 300, InsulationClass: CelsiusToKelvin(155),
		Former: Former{Material: "peek", Mass: 0.012, SpecificHeat: 1340}, Axis: Vec{0, 0, 1}}
	cond := Conditions{Ambient: T20, Cooling: Cooling{Vacuum: true, Emissivity: 0.85}, MountResistance: 60}
	return c, cond
}

// stillAir085 is still air at ambient Ta as the spec reader sets it
// (natural convection, emissivity 0.85).
func stillAir085(Ta float64) Conditions {
	return Conditions{Ambient: Ta, Cooling: Cooling{H: 10, Emissivity: 0.85}}
}

func TestOverdrivenCoilAlwaysRunsAway(t *testing.T) {
	// Issue regression: 10 A on AWG 32 got no runaway warning while 1 A and
	// 3 A did (the balance returned NaN). Every one of them runs away now:
	// at 1 A it settles, but above the class; at 3 A and 10 A the heat
	// balance has no solution.
	for _, tc := range []struct {
		I       float64
		settles bool
	}{{1, true}, {3, false}, {10, false}} {
		c, cond := torqueCoilAt(tc.I)
		for _, cycled := range []bool{false, true} {
			cc := c
			if !cycled {
				cc.OnTime = 0
			}
			cr := Evaluate(Design{Coils: []Coil{cc}, Conditions: cond}).Coils[0]
			v := cr.Verdict
			if !cr.Runaway || !v.Runaway {
				t.Errorf("%g A (cycled %v): no runaway (T = %.1f °C)", tc.I, cycled, KelvinToCelsius(cr.Temperature))
			}
			if tc.settles && (!v.SettledAboveLimit || v.NoSolution || !(cr.Temperature > cc.InsulationClass)) {
				t.Errorf("%g A (cycled %v): want settled above the class, got %+v at %.1f °C", tc.I, cycled, v, KelvinToCelsius(cr.Temperature))
			}
			if !tc.settles && (!v.NoSolution || v.SettledAboveLimit || !math.IsNaN(cr.Temperature)) {
				t.Errorf("%g A (cycled %v): want no solution, got %+v at %g K", tc.I, cycled, v, cr.Temperature)
			}
			if v.Limit != cc.InsulationClass {
				t.Errorf("limit %g K, want the class %g K", v.Limit, cc.InsulationClass)
			}
		}
	}
	// At 50 mA the same coil settles well inside its class: no runaway.
	c, cond := torqueCoilAt(0.05)
	if cr := Evaluate(Design{Coils: []Coil{c}, Conditions: cond}).Coils[0]; cr.Runaway || cr.Verdict != (ThermalVerdict{Limit: c.InsulationClass, Melting: CopperFreezingPoint}) {
		t.Errorf("50 mA: %+v at %.2f °C", cr.Verdict, KelvinToCelsius(cr.Temperature))
	}
}

func TestInternalRunawayThreshold(t *testing.T) {
	// Current drive with an internal rise r (K/W) between surface and mean:
	// the mean lies above the surface by r·I²R20(1 + α(T − 20 °C)), which
	// has a solution only while r I² R20 α < 1, however well the surface is
	// cooled. With Newton cooling hA and α, Ta = 20 °C, the closed form of
	// the whole balance: ΔT_s = P20 / (hA (1 − r P20 α) − P20 α),
	// ΔT = ΔT_s + r P20 (1 + α ΔT) — P20 = I² R20.
	tp := baseThermal()
	tp.Alpha20, tp.RiseMean, tp.H = 0.00393, 2, 1000 // hA = 10 W/K
	crit := math.Sqrt(1 / (tp.RiseMean * tp.R20 * tp.Alpha20))
	tp.Current = 0.6 * crit
	P20 := tp.Current * tp.Current * tp.R20
	hA := tp.H * tp.Area
	dTs := P20 / (hA*(1-tp.RiseMean*P20*tp.Alpha20) - P20*tp.Alpha20)
	st := tp.Steady()
	checkRel(t, "surface rise", st.Surface-T20, dTs, 1e-9)
	checkRel(t, "mean rise", st.Mean-T20, dTs+tp.RiseMean*P20*(1+tp.Alpha20*(st.Mean-T20)), 1e-9)
	tp.Current = 1.001 * crit
	if st := tp.Steady(); st.Settled || !st.NoSolution {
		t.Errorf("above the internal threshold: %+v, want no solution", st)
	}
	if T, run := SteadyTemperature(tp); !run || !math.IsNaN(T) {
		t.Errorf("above the internal threshold: T = %g, runaway %v", T, run)
	}
}

func TestVoltageDriveRunawayAboveClass(t *testing.T) {
	// Voltage drive always has a steady state, but one above the class is
	// no steady state at or below it: runaway, worded as settled above the
	// class (the temperature is kept).
	c, cond := torqueCoilAt(0)
	c.Drive, c.Voltage, c.OnTime, c.Duty = VoltageDrive, 30, 0, 1
	cr := Evaluate(Design{Coils: []Coil{c}, Conditions: cond}).Coils[0]
	if !cr.Runaway || !cr.Verdict.SettledAboveLimit || cr.Verdict.NoSolution || !(cr.Temperature > c.InsulationClass) {
		t.Errorf("30 V: %+v at %.1f °C", cr.Verdict, KelvinToCelsius(cr.Temperature))
	}
	c.Voltage = 5 // the example's own drive: continuous, it settles inside the class
	if cr := Evaluate(Design{Coils: []Coil{c}, Conditions: cond}).Coils[0]; cr.Runaway || !(cr.Temperature < c.InsulationClass) {
		t.Errorf("5 V: %+v at %.1f °C", cr.Verdict, KelvinToCelsius(cr.Temperature))
	}
	// Without a class the conductor's limit is judged: ITS-90 freezing
	// point of copper, 1357.77 K (Preston-Thomas 1990, Table 1).
	c.InsulationClass = 0
	if got := ThermalLimit(c); got != 1357.77 {
		t.Errorf("copper limit %g K", got)
	}
	if got := ConductorLimit(Aluminium()); got != 933.473 {
		t.Errorf("aluminium limit %g K (ITS-90: 933.473 K)", got)
	}
}

// pulseLoop is the loop of testdata/golden/thin-loop.txtar (50 mm, 40 turns
// of AWG 28 copper, still air at 20 °C) at 1.665 A, energised for 10 s at
// the given duty: an invented design whose cycle peak is about 44.5 °C.
func pulseLoop(duty float64) (Coil, Conditions) {
	return Coil{Name: "loop A", Form: Loop, MeanDiameter: 0.05, Turns: 40, Wire: WireFromGauge(28, Copper()),
		Drive: CurrentDrive, Current: 1.665, Duty: duty, OnTime: 10, Axis: Vec{0, 0, 1}}, stillAir085(T20)
}

func TestDutyCycleSettlesForAnyDuty(t *testing.T) {
	// Issue regression: 0.1 % duty with 10 s on reported runaway with no
	// temperature while 1 % and 0.05 % settled at 44.5 °C (the search gave
	// up when the off period cools the winding to ambient). Every duty
	// settles, and with the off period 100 to 2000 times the on-time the
	// winding starts each pulse at ambient, so the peaks agree.
	var peaks []float64
	for _, d := range []float64{0.01, 0.001, 0.0005} {
		c, cond := pulseLoop(d)
		cr := Evaluate(Design{Coils: []Coil{c}, Conditions: cond}).Coils[0]
		if !cr.Heat.Cycle.Settled || cr.Runaway || math.IsNaN(cr.Temperature) {
			t.Fatalf("duty %g: cycle %+v, runaway %v", d, cr.Heat.Cycle, cr.Runaway)
		}
		peaks = append(peaks, cr.Temperature)
	}
	for i, p := range peaks {
		if math.Abs(KelvinToCelsius(p)-44.5) > 0.1 {
			t.Errorf("duty case %d: peak %.3f °C, want about 44.5 °C", i, KelvinToCelsius(p))
		}
	}
	if math.Abs(peaks[1]-peaks[2]) > 1e-3 || math.Abs(peaks[0]-peaks[1]) > 0.05 {
		t.Errorf("peaks %v K should agree", peaks)
	}
	// Independent check: at 0.05 % the trough is the ambient, so the peak
	// is that of one 10 s pulse from cold. Integrate the same lumped
	// equations with a plain fixed-step Heun method (10⁵ steps).
	c, cond := pulseLoop(0.0005)
	w := LayOut(c)
	tp := OperatingPoint(c, w, cond).Thermal
	C := HeatCapacity(c, w)
	f := tp.rate(C, true)
	y := state{T20, 0, 0}
	const n = 100000
	h := 10.0 / n
	for range n {
		k1 := f(y)
		k2 := f(y.add(k1, h))
		for i := range y {
			y[i] += h / 2 * (k1[i] + k2[i])
		}
	}
	cy := tp.PeriodicCycle(C, 10)
	checkRel(t, "peak mean vs one pulse from cold", cy.PeakMean-T20, y[0]-T20, 1e-5)
	checkRel(t, "peak hot spot vs one pulse from cold", cy.PeakHot-T20, tp.hotSpot(y, true)-T20, 1e-5)
	if math.Abs(cy.Trough-T20) > 1e-6 {
		t.Errorf("trough %g K above ambient", cy.Trough-T20)
	}
}

// valveCoil is examples/valve-actuator.md: a 2400-turn AWG 30 solenoid
// (13 / 29.5 mm, 25 mm long, 0.29 mm over enamel) on 24 V, class F, 25 %
// duty with 2 s on, switch-off in 10 µs on a 60 V MOSFET, an 8 g nylon
// bobbin, still air at 40 °C, axis horizontal.
func valveCoil() (Coil, Conditions) {
	w := WireFromGauge(30, Copper())
	w.Outer = 0.29e-3
	c := Coil{Name: "actuator coil", Form: Solenoid, InnerDiameter: 13e-3, OuterDiameter: 29.5e-3, MeanDiameter: 21.25e-3,
		Length: 25e-3, RadialBuild: 8.25e-3, Turns: 2400, Wire: w, Drive: VoltageDrive, Voltage: 24, Duty: 0.25, OnTime: 2,
		InsulationClass: CelsiusToKelvin(155), SwitchOff: 10e-6, DriverRating: 60,
		Former: Former{Material: "nylon", Mass: 0.008, SpecificHeat: 1670}}
	c.Axis = Vec{0, 0, 1}
	return c, stillAir085(CelsiusToKelvin(40))
}

func TestCyclePeakNotBelowSteady(t *testing.T) {
	// The cycle swings about the duty-averaged steady state (the limit of
	// short periods) and stays below the continuously energised one (the
	// limit of long on-times): for the valve coil and the pulsed loop over
	// on-times from 0.1 s to an hour, both cycle figures lie between the
	// two steady hot spots.
	for _, mk := range []func() (Coil, Conditions){valveCoil, func() (Coil, Conditions) { return pulseLoop(0.2) }} {
		c, cond := mk()
		w := LayOut(c)
		tp := OperatingPoint(c, w, cond).Thermal
		C := HeatCapacity(c, w)
		avg := tp.Steady().HotSpot
		cont := tp
		cont.Duty = 1
		full := cont.Steady().HotSpot
		for _, on := range []float64{0.1, 2, 30, 300, 3600} {
			cy := tp.PeriodicCycle(C, on)
			if !cy.Settled {
				t.Fatalf("%s, %g s on: not settled", c.Name, on)
			}
			if !(cy.PeakHot >= avg-1e-6) || !(cy.PeakHot <= full+1e-6) {
				t.Errorf("%s, %g s on: cycle peak %.4f °C outside [%.4f, %.4f] °C", c.Name, on,
					KelvinToCelsius(cy.PeakHot), KelvinToCelsius(avg), KelvinToCelsius(full))
			}
			cc := c
			cc.OnTime = on
			cr := Evaluate(Design{Coils: []Coil{cc}, Conditions: cond}).Coils[0]
			if !(cr.Temperature >= cr.SteadyHotSpot) {
				t.Errorf("%s, %g s on: reported %.4f below the steady hot spot %.4f", c.Name, on, cr.Temperature, cr.SteadyHotSpot)
			}
		}
		// A short period approaches the average-power state.
		cy := tp.PeriodicCycle(C, 1e-3)
		if math.Abs(cy.PeakHot-avg) > 0.02 {
			t.Errorf("%s, 1 ms on: peak %.4f °C, average-power hot spot %.4f °C", c.Name, KelvinToCelsius(cy.PeakHot), KelvinToCelsius(avg))
		}
	}
}

func TestACVoltageDriveHeatsAtImpedance(t *testing.T) {
	// An a.c. voltage drive: the current is V/|Z(T)|, |Z| = √(R(T)² + ω²L²),
	// and the heat balance closes at I²R(T) — cooler than at V/R(T).
	c, cond := valveCoil()
	c.OnTime, c.Duty, c.Voltage = 0, 1, 24
	w := LayOut(c)
	dc := OperatingPoint(c, w, cond)
	c.Frequency = 200 // X ≈ 2π·200·54 mH ≈ 68 Ω, of the order of R
	ac := OperatingPoint(c, w, cond)
	X := 2 * math.Pi * 200 * CoilInductance(c, w)
	checkRel(t, "reactance", ac.Reactance, X, 1e-12)
	// the winding heats at R_ac = F·R(T), F Dowell's factor at the mean
	// temperature it settles at
	tp := ac.Thermal
	st := ac.State
	F := tp.ACFactor
	checkRel(t, "Dowell factor at the settled mean temperature", F, HeatingACFactor(c, w, st.Mean), 1e-9)
	if !(F >= 1) {
		t.Fatalf("a.c. factor %g", F)
	}
	checkRel(t, "a.c. current V/|Z(T)|", ac.Current, 24/math.Hypot(F*ac.RHot, X), 1e-12)
	checkRel(t, "heat balance at I²R_ac", tp.HeatOut(st.Surface), ac.Current*ac.Current*F*ac.RHot, 1e-8)
	if !(ac.Temperature < dc.Temperature) || !(ac.Current < dc.Current) {
		t.Errorf("a.c. %.1f °C %.4f A, d.c. %.1f °C %.4f A", KelvinToCelsius(ac.Temperature), ac.Current, KelvinToCelsius(dc.Temperature), dc.Current)
	}
	b := ACBoundsFor(VoltageDrive, 200, ac.RHot, X)
	if !b.HeatAtImpedance || b.DCCurrent != BoundUpper || b.DCHeat != BoundUpper {
		t.Errorf("voltage drive bounds %+v", b)
	}
	if b := ACBoundsFor(CurrentDrive, 200, ac.RHot, X); b.DCVoltage != BoundLower || b.DCHeat != BoundLower || b.DCCurrent != BoundEqual {
		t.Errorf("current drive bounds %+v", b)
	}
	if b := ACBoundsFor(VoltageDrive, 0, 1, 0); b.AC {
		t.Error("d.c.: no a.c. bounds")
	}
}

// TestCyclePeakSurfaceLimits: the hottest surface of the periodic on/off
// state tends to the duty-averaged steady surface for on-times short
// against every time constant, and for on-times long against the thermal
// time constant (each on period then settles) to the continuously
// energised steady surface — exactly so for a winding with no former, whose
// internal drop relaxes after switch-off no faster than the mean falls,
// and between that surface and the continuous mean for one on a former.
// At every on-time it lies between the duty-averaged steady surface, about
// which the cycle swings, and the peak mean temperature, which bounds the
// surface of a section heated from within. The valve coil (on a nylon former), with and
// without its former, on-times from 10⁻⁴ to 30 thermal time constants.
func TestCyclePeakSurfaceLimits(t *testing.T) {
	for _, former := range []bool{true, false} {
		c, cond := valveCoil()
		if !former {
			c.Former = Former{}
		}
		w := LayOut(c)
		tp := OperatingPoint(c, w, cond).Thermal
		C := HeatCapacity(c, w)
		cont := tp
		cont.Duty = 1
		full := cont.Steady()
		tau := cont.ThermalTimeConstant(C, full.Mean)
		avg := tp.Steady()
		if fast := tp.PeriodicCycle(C, 1e-4*tau); math.Abs(fast.PeakSurface-avg.Surface) > 0.01 {
			t.Errorf("former %v, fast cycle: surface peak %.4f °C, duty-averaged steady surface %.4f °C", former, KelvinToCelsius(fast.PeakSurface), KelvinToCelsius(avg.Surface))
		}
		slow := tp.PeriodicCycle(C, 30*tau)
		if lo, hi := full.Surface-1e-6*(full.Surface-tp.Ambient), full.Mean; former && !(slow.PeakSurface >= lo && slow.PeakSurface <= hi) ||
			!former && math.Abs(slow.PeakSurface-full.Surface) > 1e-6*(full.Surface-tp.Ambient) {
			t.Errorf("former %v, slow cycle: surface peak %.6f °C, continuous steady surface %.6f °C, mean %.6f °C", former,
				KelvinToCelsius(slow.PeakSurface), KelvinToCelsius(full.Surface), KelvinToCelsius(full.Mean))
		}
		for _, k := range []float64{1e-3, 1e-2, 0.1, 0.5, 1, 3, 10} {
			cy := tp.PeriodicCycle(C, k*tau)
			if !cy.Settled || cy.PeakSurface < avg.Surface-0.01 || cy.PeakSurface > cy.PeakMean {
				t.Errorf("former %v, on %g τ: surface peak %.4f °C, duty-averaged steady surface %.4f °C, peak mean %.4f °C", former, k,
					KelvinToCelsius(cy.PeakSurface), KelvinToCelsius(avg.Surface), KelvinToCelsius(cy.PeakMean))
			}
		}
	}
}
