package calc

import (
	"math"
	"testing"
)

func TestChurchillChuWorkedExample(t *testing.T) {
	// Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed.,
	// Example 9.3 (figures recalled from memory): a horizontal steam pipe of
	// 0.1 m diameter at 165 °C in room air at 23 °C, emissivity 0.85. Film
	// 367 K: Ra_D = 5.07×10⁶, Nu_D = 23.3, h = 7.29 W/(m²·K), so 325 W per
	// metre of pipe by convection.
	nc := NaturalConvection{Shape: HorizontalCylinder, Length: 0.1}
	Ts, Ta := CelsiusToKelvin(165), CelsiusToKelvin(23)
	s := nc.At(Ts, Ta)
	checkRel(t, "Ra_D", s.Ra, 5.07e6, 0.01)
	checkRel(t, "Nu_D", s.Nu, 23.3, 0.01)
	checkRel(t, "h", s.H, 7.29, 0.01)
	tp := ThermalProblem{Area: math.Pi * 0.1, Emissivity: 0.85, Ambient: Ta, Convection: &nc}
	conv, rad, _ := tp.HeatOutParts(Ts)
	checkRel(t, "convected W/m", conv, 325, 0.01)
	checkRel(t, "radiated W/m", rad, 0.85*StefanBoltzmann*math.Pi*0.1*(math.Pow(Ts, 4)-math.Pow(Ta, 4)), 1e-14)
	if !s.InRange {
		t.Error("the example lies inside the correlation's range")
	}
	// Limits of the correlations at Ra → 0: Nu → 0.60² and 0.825².
	checkRel(t, "cylinder Ra → 0", ChurchillChuCylinder(0, 0.7), 0.36, 1e-12)
	checkRel(t, "plate Ra → 0", ChurchillChuPlate(0, 0.7), 0.825*0.825, 1e-12)
	// The table at a tabulated point, and out of range flagged.
	if nu, k, pr, ok := AirProperties(300); !ok || nu != 15.89e-6 || k != 26.3e-3 || pr != 0.707 {
		t.Errorf("air at 300 K: %g %g %g %v", nu, k, pr, ok)
	}
	if _, _, _, ok := AirProperties(900); ok {
		t.Error("900 K is outside the table")
	}
}

// copperCoil is a thin coil of AWG 30 copper for the thermal tests.
func copperCoil(I float64) (Coil, Winding) {
	c := Coil{Name: "t", Form: Loop, MeanDiameter: 0.05, Turns: 100, Wire: WireFromGauge(30, Copper()),
		Drive: CurrentDrive, Current: I, Duty: 1, InsulationClass: CelsiusToKelvin(155)}
	return c, LayOut(c)
}

func TestAdiabaticHeatingRate(t *testing.T) {
	// With no heat shed and a constant resistance, C dT/dt = P exactly, so
	// the temperature climbs at P/(m c) — copper's c = 385 J/(kg·K), CRC
	// Handbook of Chemistry and Physics (recalled from memory; Copper()).
	c, w := copperCoil(0.5)
	tp := ThermalFor(c, w, Conditions{Ambient: T20, Cooling: Cooling{HGiven: true, H: 0}})
	tp.Alpha20, tp.Emissivity, tp.RiseMean, tp.RiseMax = 0, 0, 0, 0
	C := HeatCapacity(c, w)
	checkRel(t, "heat capacity", C, w.Mass*385, 1e-15)
	P := 0.25 * tp.R20
	checkRel(t, "initial rate", tp.rate(C, true)(state{T20, 0})[0], P/(w.Mass*385), 1e-14)
	// Integrated: the time to a limit 100 K up is C·100/P.
	checkRel(t, "adiabatic time to +100 K", tp.TimeToReach(C, T20+100, 1e6), C*100/P, 1e-9)
	// A former adds its heat capacity: 10 g of aluminium at 903 J/(kg·K).
	c.Former = Former{Material: "aluminium", Mass: 0.01, SpecificHeat: 903}
	checkRel(t, "with former", HeatCapacity(c, w), w.Mass*385+9.03, 1e-15)
}

// TestCoreHeatCapacity: a cored coil warms its rod with it. A pure iron
// rod, 6 mm × 70 mm, of 7870 kg/m³ and 447 J/(kg·K) (Incropera & DeWitt,
// 6th ed., Table A.1, iron at 300 K, recalled from memory), holds
// 7870 · π (3 mm)² · 70 mm · 447 = 6.96 J/K, which the lumped heat capacity
// adds to the copper's; adiabatically the winding then climbs 100 K in
// C·100/P of the integrated heat balance (the first law). A ferrite rod of
// stated 750 J/(kg·K) uses its own figure, and a rod without a density
// adds nothing (its mass is unknown).
func TestCoreHeatCapacity(t *testing.T) {
	c, w := copperCoil(0.5)
	c.Core = Core{Permeability: 1000, Length: 0.07, Diameter: 0.006, Density: 7870}
	rod := 7870 * math.Pi * 0.003 * 0.003 * 0.07 * 447
	if math.Abs(rod-6.96) > 0.005 {
		t.Fatalf("rod %g J/K", rod)
	}
	C := HeatCapacity(c, w)
	checkRel(t, "cored heat capacity", C, w.Mass*385+rod, 1e-12)
	tp := ThermalFor(c, w, Conditions{Ambient: T20, Cooling: Cooling{HGiven: true, H: 0}})
	tp.Alpha20, tp.Emissivity, tp.RiseMean, tp.RiseMax = 0, 0, 0, 0
	P := 0.25 * tp.R20
	checkRel(t, "adiabatic time to +100 K with the core", tp.TimeToReach(C, T20+100, 1e6), (w.Mass*385+rod)*100/P, 1e-9)
	c.Core.SpecificHeat = 750
	checkRel(t, "ferrite rod", HeatCapacity(c, w), w.Mass*385+rod*750/447, 1e-12)
	c.Core.Density = 0
	checkRel(t, "rod without density", HeatCapacity(c, w), w.Mass*385, 1e-15)
}

func TestTransientTendsToSteady(t *testing.T) {
	// Natural convection, radiation, R(T) and an internal rise: after ten
	// time constants the warm-up has reached the steady state.
	c, _ := copperCoil(0.3)
	c.Form, c.Length, c.RadialBuild, c.Turns = Solenoid, 0.01, 0.004, 150
	w := LayOut(c)
	tp := ThermalFor(c, w, Conditions{Ambient: T20, Cooling: Cooling{Emissivity: 0.85}})
	if tp.Convection == nil || tp.RiseMax <= tp.RiseMean || tp.RiseMean <= 0 {
		t.Fatalf("model: %+v", tp)
	}
	s := tp.Steady()
	C := HeatCapacity(c, w)
	tau := tp.ThermalTimeConstant(C, s.Mean)
	ts, mean, hot := tp.WarmUpCurve(C, 10*tau, 0)
	last := len(ts) - 1
	checkRel(t, "end time", ts[last], 10*tau, 1e-12)
	if math.Abs(mean[last]-s.Mean) > 1e-3*(s.Mean-T20) || math.Abs(hot[last]-s.HotSpot) > 1e-3*(s.HotSpot-T20) {
		t.Errorf("after 10 τ: mean %.6g hot %.6g, steady %.6g %.6g", mean[last], hot[last], s.Mean, s.HotSpot)
	}
	for i := 1; i < len(mean); i++ {
		if mean[i] < mean[i-1]-1e-9 {
			t.Fatalf("warm-up not monotonic at %g s", ts[i])
		}
	}
	// The fixed-step integrator of the average-power balance agrees.
	_, T := tp.WarmUp(C, 10*tau, 2000)
	checkRel(t, "fixed-step RK4", T[len(T)-1], mean[last], 1e-6)
}

func TestEnergyBalanceAtSolution(t *testing.T) {
	// At the steady state the heat generated equals the heat shed by
	// convection (correlation), radiation and the mount, to 10⁻⁹.
	for _, drive := range []Drive{CurrentDrive, VoltageDrive} {
		c, w := copperCoil(0.4)
		c.Drive, c.Voltage, c.Duty = drive, 12, 0.6
		tp := ThermalFor(c, w, Conditions{Ambient: CelsiusToKelvin(35), MountResistance: 40, Cooling: Cooling{Emissivity: 0.85}})
		s := tp.Steady()
		if !s.Settled {
			t.Fatalf("drive %d did not settle", drive)
		}
		out := s.Convected + s.Radiated + s.Mounted
		if r := math.Abs(s.Power-out) / s.Power; r > 1e-9 {
			t.Errorf("drive %d: heat in %.15g W, out %.15g W (relative %.2g)", drive, s.Power, out, r)
		}
		checkRel(t, "mount share", s.Mounted, (s.Surface-tp.Ambient)/40, 1e-12)
		if !(s.HotSpot > s.Mean && s.Mean > s.Surface && s.Surface > tp.Ambient) {
			t.Errorf("ordering: hot %g mean %g surface %g", s.HotSpot, s.Mean, s.Surface)
		}
	}
}

func TestVacuumRunsHotterThanAir(t *testing.T) {
	c, w := copperCoil(0.15)
	air := OperatingPoint(c, w, Conditions{Ambient: T20, Cooling: Cooling{Emissivity: 0.85}})
	vac := OperatingPoint(c, w, Conditions{Ambient: T20, Cooling: Cooling{Vacuum: true, Emissivity: 0.85}})
	if !(vac.Temperature > air.Temperature+5) {
		t.Errorf("vacuum %.1f K, still air %.1f K", vac.Temperature, air.Temperature)
	}
	// A mount conducts heat away in vacuum.
	mounted := OperatingPoint(c, w, Conditions{Ambient: T20, MountResistance: 20, Cooling: Cooling{Vacuum: true, Emissivity: 0.85}})
	if !(mounted.Temperature < vac.Temperature) {
		t.Errorf("mounted %.1f K, free %.1f K", mounted.Temperature, vac.Temperature)
	}
}

func TestRunawayAndSelfLimiting(t *testing.T) {
	// The same coil, in vacuum, pushed hard: under current drive no steady
	// temperature exists at or below the 155 °C class (runaway); driven
	// from the voltage that gives the same cold current, it settles,
	// drawing less current and giving less moment hot than cold.
	c, w := copperCoil(0.6)
	cond := Conditions{Ambient: T20, Cooling: Cooling{Vacuum: true, Emissivity: 0.85}}
	cur := OperatingPoint(c, w, cond)
	if !cur.Runaway {
		t.Errorf("current drive at %.3g A: hot spot %.1f °C, want runaway", c.Current, KelvinToCelsius(cur.Temperature))
	}
	v := c
	v.Drive, v.Voltage = VoltageDrive, cur.R20*c.Current
	vol := OperatingPoint(v, w, cond)
	if vol.Runaway || math.IsNaN(vol.Temperature) || !vol.State.Settled {
		t.Fatalf("voltage drive should settle: %+v", vol.State)
	}
	if !(vol.Current < vol.ColdCurrent) {
		t.Errorf("hot current %g not below cold %g", vol.Current, vol.ColdCurrent)
	}
	r := Evaluate(Design{Coils: []Coil{v}, Conditions: cond})
	cr := r.Coils[0]
	if !(cr.Heat.ColdMoment > cr.Moment.Norm()) {
		t.Errorf("cold moment %g not above hot %g", cr.Heat.ColdMoment, cr.Moment.Norm())
	}
	checkRel(t, "moment ratio = current ratio", cr.Moment.Norm()/cr.Heat.ColdMoment, cr.Current/cr.ColdCurrent, 1e-12)
	// The runaway coil reaches its class in a finite time.
	rc := Evaluate(Design{Coils: []Coil{c}, Conditions: cond}).Coils[0]
	if !rc.Runaway || !(rc.Heat.TimeToLimit > 0) {
		t.Errorf("runaway %v, time to limit %g s", rc.Runaway, rc.Heat.TimeToLimit)
	}
	// Without a class, runaway means no steady state at all.
	c.InsulationClass = 0
	if op := OperatingPoint(c, w, cond); op.Runaway {
		t.Errorf("no class: a steady state at %.0f K exists, not runaway", op.Temperature)
	}
}

func TestTimeToReachLinear(t *testing.T) {
	// Constant R, Newton cooling: T = Ta + ΔT∞ (1 − e^(−t/τ)), τ = C/(hA),
	// so the time to a temperature T₁ is −τ ln(1 − (T₁ − Ta)/ΔT∞).
	tp := baseThermal() // 12 W, hA = 0.1 W/K: ΔT∞ = 120 K
	C := 50.0
	tau := C / (tp.H * tp.Area)
	want := -tau * math.Log(1-100.0/120)
	checkRel(t, "time to +100 K", tp.TimeToReach(C, T20+100, 50*tau), want, 1e-7)
	if !math.IsNaN(tp.TimeToReach(C, T20+130, 50*tau)) {
		t.Error("a limit above the steady state is never reached")
	}
}

func TestPeriodicCycleLinear(t *testing.T) {
	// Constant R, Newton cooling, on for t₁ and off for t₂: the periodic
	// state has peak T_p and trough T_t with (θ = T − Ta, θ∞ = P/(hA))
	// θ_p = θ∞ + (θ_t − θ∞) e^(−t₁/τ), θ_t = θ_p e^(−t₂/τ), so
	// θ_p = θ∞ (1 − a)/(1 − a b), a = e^(−t₁/τ), b = e^(−t₂/τ).
	tp := baseThermal()
	tp.Duty = 0.25
	C := 50.0
	tau := C / (tp.H * tp.Area)
	on := 0.3 * tau
	off := on * 3
	cy := tp.PeriodicCycle(C, on)
	a, b := math.Exp(-on/tau), math.Exp(-off/tau)
	thetaInf := 120.0
	peak := thetaInf * (1 - a) / (1 - a*b)
	checkRel(t, "off time", cy.Off, off, 1e-15)
	checkRel(t, "peak", cy.PeakMean-T20, peak, 1e-7)
	checkRel(t, "trough", cy.Trough-T20, peak*b, 1e-7)
	checkRel(t, "average power", cy.AveragePow, 12*0.25, 1e-6)
	// Short period: peak and trough close in on the average-power state,
	// a swing of about P t₁ (1 − duty)/C = 0.09 K either side.
	cy = tp.PeriodicCycle(C, 1e-3*tau)
	avg, _ := SteadyTemperature(tp)
	if !(cy.Trough < avg && avg < cy.PeakMean) || cy.PeakMean-cy.Trough > 0.1 || math.Abs((cy.PeakMean+cy.Trough)/2-avg) > 1e-3 {
		t.Errorf("short cycle: peak %g trough %g, average-power state %g", cy.PeakMean, cy.Trough, avg)
	}
}

func TestPeriodicCycleRunaway(t *testing.T) {
	// Current drive, convection only, α > 0, even a 50 % duty of a current
	// that runs away on average: no periodic state.
	tp := baseThermal()
	tp.Alpha20, tp.Duty = 0.00393, 0.5
	tp.Current = math.Sqrt(3 * tp.H * tp.Area / (tp.R20 * tp.Alpha20))
	if cy := tp.PeriodicCycle(50, 10); cy.Settled {
		t.Errorf("expected no periodic state: %+v", cy)
	}
}

func TestAnnulusRiseAgainstFiniteDifferences(t *testing.T) {
	// Radial conduction with uniform generation, adiabatic bore, outer
	// surface held: the closed forms against a finite-volume solution of
	// (1/r) d/dr (k r dT/dr) = −q on 4000 cells.
	for _, c := range [][2]float64{{0, 0.004}, {0.01, 0.016}, {0.02, 0.021}} {
		ri, ro := c[0], c[1]
		const l, k = 0.03, 0.3
		mean, hot := AnnulusRise(ri, ro, l, k)
		q := 1 / (math.Pi * (ro*ro - ri*ri) * l)
		const n = 4000
		dr := (ro - ri) / n
		// Heat flowing out through radius r: q π (r² − ri²) per unit length;
		// march inward from the surface.
		T := make([]float64, n+1) // at faces r_j = ri + j dr; T[n] = 0
		for j := n - 1; j >= 0; j-- {
			r := ri + (float64(j)+0.5)*dr
			flux := q * math.Pi * (r*r - ri*ri) / (2 * math.Pi * r * k) // −dT/dr
			T[j] = T[j+1] + flux*dr
		}
		avg, area := 0.0, 0.0
		for j := range n {
			r := ri + (float64(j)+0.5)*dr
			avg += (T[j] + T[j+1]) / 2 * r
			area += r
		}
		avg /= area
		checkRel(t, "hot spot", hot, T[0], 1e-5)
		checkRel(t, "mean", mean, avg, 1e-5)
	}
	if m, h := AnnulusRise(0, 0.002, 0.1, 0.5); math.Abs(h-2*m) > 1e-15*h {
		t.Errorf("solid cylinder: max %g should be twice the mean %g", h, m)
	}
}

func TestInternalRiseLags(t *testing.T) {
	// The hot spot's rise above the mean is a first-order lag of the power:
	// in the periodic state of a square wave its peak is X (1 − a)/(1 − a b)
	// — X for a fast winding, X × duty for a slow one.
	tp := baseThermal()
	tp.RiseMean, tp.RiseMax = 0.5, 1.5 // K/W
	X := 1.0 * tp.PowerOn(T20)
	tp.InternalTau = 0
	checkRel(t, "no lag", tp.cycleRise(T20, 2, 6), X, 1e-15)
	tp.InternalTau = 1e-6
	checkRel(t, "fast winding", tp.cycleRise(T20, 2, 6), X, 1e-12)
	tp.InternalTau = 1e7
	checkRel(t, "slow winding", tp.cycleRise(T20, 2, 6), X*0.25, 1e-6)
	// From cold, the lagged rise approaches its steady value as
	// 1 − e^(−t/τ_i) while the mean barely moves (large C).
	tp.InternalTau = 10
	ts, mean, hot := tp.WarmUpCurve(1e9, 30, 0)
	for i, s := range ts {
		if i == 0 || s < 1 {
			continue
		}
		want := X * (1 - math.Exp(-s/10))
		if math.Abs((hot[i]-mean[i])-want) > 1e-6*X {
			t.Fatalf("t = %g s: rise %g K, want %g K", s, hot[i]-mean[i], want)
		}
	}
}

func TestConvectionShapes(t *testing.T) {
	w30 := Wire{Bare: 0.45e-3, Outer: 0.5e-3, Material: Copper()}
	// Thin coil: the round bundle.
	thin := Coil{Form: Loop, MeanDiameter: 0.08, Turns: 100, Wire: w30}
	if nc := ConvectionFor(thin, LayOut(thin), Conditions{}); nc.Shape != HorizontalCylinder || nc.Length != BundleDiameter(0.5e-3, 100) {
		t.Errorf("thin: %+v", nc)
	}
	// A ring: 10 × 5 mm section on 300 mm, a tube of the same perimeter.
	ring := Coil{Form: Solenoid, MeanDiameter: 0.3, Length: 0.01, RadialBuild: 0.005, Turns: 200, Wire: w30}
	nc := ConvectionFor(ring, LayOut(ring), Conditions{})
	if !nc.Ring || math.Abs(nc.Length-2*(0.01+0.005)/math.Pi) > 1e-12 {
		t.Errorf("ring: %+v", nc)
	}
	// A compact solenoid: its outer diameter as stated, 30 + 5 mm (its 400
	// turns fill 5 layers, 2.5 mm of the 5 mm build, but the stated
	// outline is the surface that sheds the heat), or its length with the
	// axis vertical.
	sol := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.04, RadialBuild: 0.005, Turns: 400, Wire: w30}
	ws := LayOut(sol)
	if nc := ConvectionFor(sol, ws, Conditions{}); nc.Ring || nc.Shape != HorizontalCylinder || math.Abs(nc.Length-0.035) > 1e-15 {
		t.Errorf("solenoid: %+v", nc)
	}
	if nc := ConvectionFor(sol, ws, Conditions{AxisVertical: true}); nc.Shape != VerticalSurface || nc.Length != 0.04 {
		t.Errorf("vertical solenoid: %+v", nc)
	}
}

// TestAxisOrientationFromUp: with the upward direction given, each coil's
// own axis decides its shape — within 45° of the vertical a vertical
// surface, else a horizontal cylinder — whatever the design-wide
// orientation says.
func TestAxisOrientationFromUp(t *testing.T) {
	w30 := Wire{Bare: 0.45e-3, Outer: 0.5e-3, Material: Copper()}
	sol := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.04, RadialBuild: 0.005, Turns: 400, Wire: w30}
	up := Conditions{Up: Vec{0, 0, 1}}
	for _, tc := range []struct {
		deg      float64 // angle of the axis from +z, in the x–z plane
		vertical bool
	}{{0, true}, {30, true}, {44, true}, {46, false}, {90, false}, {134, false}, {140, true}, {180, true}} {
		a := tc.deg * math.Pi / 180
		c := sol
		c.Axis = Vec{math.Sin(a), 0, math.Cos(a)}
		if got := AxisIsVertical(c, up); got != tc.vertical {
			t.Errorf("axis %g° from up: vertical = %v, want %v", tc.deg, got, tc.vertical)
		}
		// Up decides even against a design-wide statement.
		if got := AxisIsVertical(c, Conditions{Up: up.Up, AxisVertical: !tc.vertical}); got != tc.vertical {
			t.Errorf("axis %g° from up, orientation stated otherwise: vertical = %v", tc.deg, got)
		}
		nc := ConvectionFor(c, LayOut(c), up)
		if want := map[bool]ConvectionShape{true: VerticalSurface, false: HorizontalCylinder}[tc.vertical]; nc.Shape != want {
			t.Errorf("axis %g° from up: shape %v, want %v", tc.deg, nc.Shape, want)
		}
	}
	// Without up, the design-wide statement holds for every axis.
	c := sol
	c.Axis = Vec{1, 0, 0}
	if !AxisIsVertical(c, Conditions{AxisVertical: true}) || AxisIsVertical(Coil{Axis: Vec{0, 0, 1}}, Conditions{}) {
		t.Error("without up, the design-wide orientation should decide")
	}
}

// TestOrientedCoolingAgainstLaminarCorrelations: a solenoid 100 mm long
// and about 40 mm across at 1 W in still air, its axis along up (z) and
// across it (x). The steady convection coefficient lies within 6 % of the
// laminar-range forms of Churchill and Chu (1975) — a vertical plate on
// the winding length, Nu = 0.68 + 0.670 Ra^¼/[1 + (0.492/Pr)^(9/16)]^(4/9)
// (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed.,
// Eq. 9.27), and a horizontal cylinder on its outer diameter,
// Nu = 0.36 + 0.518 Ra^¼/[1 + (0.559/Pr)^(9/16)]^(4/9) (Churchill & Chu,
// Int. J. Heat Mass Transfer 18, 1975, 1049, Eq. 13) — with Pr = 0.707 (air
// near 300 K, Incropera & DeWitt Table A.4), and nearer to the form of its
// own orientation than to the other's.
func TestOrientedCoolingAgainstLaminarCorrelations(t *testing.T) {
	w := Wire{Bare: 0.45e-3, Outer: 0.5e-3, Material: Copper()}
	base := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.1, RadialBuild: 0.005, Turns: 1000, Wire: w,
		Drive: CurrentDrive, Duty: 1, InsulationClass: 453}
	cond := Conditions{Ambient: 293.15, Up: Vec{0, 0, 1}, Cooling: Cooling{Emissivity: 0.85}}
	const pr = 0.707
	vertical := func(ra float64) float64 {
		return 0.68 + 0.670*math.Pow(ra, 0.25)/math.Pow(1+math.Pow(0.492/pr, 9.0/16), 4.0/9)
	}
	horizontal := func(ra float64) float64 {
		return 0.36 + 0.518*math.Pow(ra, 0.25)/math.Pow(1+math.Pow(0.559/pr, 9.0/16), 4.0/9)
	}
	for _, up := range []bool{true, false} {
		c := base
		c.Axis = Vec{1, 0, 0}
		if up {
			c.Axis = Vec{0, 0, 1}
		}
		wd := LayOut(c)
		r := ThermalFor(c, wd, cond).R20
		c.Current = math.Sqrt(1 / r)
		st := OperatingPoint(c, wd, cond).State
		cv := st.Convection
		_, ro, l := RiseGeometry(c, wd)
		L := ThermalFor(c, wd, cond).Convection.Length
		k := cv.H * L / cv.Nu // the air's conductivity at the film temperature
		// Ra scales as L³ at the same temperatures.
		hv := vertical(cv.Ra*math.Pow(l/L, 3)) * k / l
		hh := horizontal(cv.Ra*math.Pow(2*ro/L, 3)) * k / (2 * ro)
		own, other := hv, hh
		if !up {
			own, other = hh, hv
		}
		if math.Abs(cv.H/own-1) > 0.06 || math.Abs(cv.H-own) >= math.Abs(cv.H-other) {
			t.Errorf("axis vertical %v: h = %.4g W/m2K, own-orientation form %.4g, other %.4g (Ra %.3g)", up, cv.H, own, other, cv.Ra)
		}
	}
}

// TestUnderfilledRiseOverOccupiedSection: the heat is generated in the
// copper, so the conduction rise of a winding whose turns fill only the
// inner part of its stated radial build is that of the same turns with
// the build stated as the layers they fill: empty space outside the
// last layer generates no heat and carries none. 1500 turns of AWG 28
// (outer 0.36 mm estimated) fill 19 layers, 6.9 mm of an 8 mm build. The
// finite-volume solution over the occupied section (an independent
// method, SectionConduction) gives the same rise.
func TestUnderfilledRiseOverOccupiedSection(t *testing.T) {
	c := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.03, RadialBuild: 0.008, Turns: 1500,
		Wire: WireFromGauge(28, Copper()), Axis: Vec{0, 0, 1}}
	w := LayOut(c)
	laid := float64(w.LayerCount) * WireOuter(c)
	if w.Overfull || !(laid < 0.95*c.RadialBuild) {
		t.Fatalf("%d layers, %.3g mm of the 8 mm build: not underfilled", w.LayerCount, laid*1e3)
	}
	full := c
	full.InnerDiameter = c.MeanDiameter - c.RadialBuild // the same bore
	full.RadialBuild = laid * (1 + 1e-12)
	full.MeanDiameter = full.InnerDiameter + full.RadialBuild
	wf := LayOut(full)
	if wf.Overfull || wf.LayerCount != w.LayerCount || wf.Layers[0].Radius != w.Layers[0].Radius {
		t.Fatalf("filled coil: %d layers from %g m (%s)", wf.LayerCount, wf.Layers[0].Radius, wf.Problem)
	}
	mean, hot := WindingRise(c, w, 0.3)
	meanF, hotF := WindingRise(full, wf, 0.3)
	checkRel(t, "hot-spot rise per watt", hot, hotF, 1e-9)
	checkRel(t, "mean rise per watt", mean, meanF, 1e-9)
	ri, ro, l := RiseGeometry(c, w)
	_, fdHot := SectionConduction(ri, ro, l, 0.3, 100)
	checkRel(t, "finite-volume hot-spot rise", fdHot, hot, 1e-5)
}

// TestCoveredCoolingRadiatesOnly: a coil under or behind a surface people
// touch, without a stated h, sheds no heat by convection — the open-air
// correlations hold for a surface in an extensive quiescent fluid
// (Incropera & DeWitt, 6th ed., §9.1) — and its steady surface closes the
// grey-body balance P = ε σ A (Ts⁴ − Ta⁴) (Stefan–Boltzmann law); in open
// still air the same coil runs cooler. A stated h is the enclosure's and
// is used as given.
func TestCoveredCoolingRadiatesOnly(t *testing.T) {
	c, w := copperCoil(0.5)
	open := Conditions{Ambient: T20, Cooling: StillAir()}
	covered := open
	covered.Cooling.Covered = true
	tp := ThermalFor(c, w, covered)
	if tp.Convection != nil || tp.H != 0 {
		t.Fatalf("covered coil convects: h %g, correlation %v", tp.H, tp.Convection)
	}
	st := tp.Steady()
	ts, ta := st.Surface, tp.Ambient
	checkRel(t, "radiated power", st.Power, DefaultEmissivity*StefanBoltzmann*tp.Area*(ts*ts*ts*ts-ta*ta*ta*ta), 1e-9)
	if st.Convected != 0 {
		t.Errorf("convected %g W", st.Convected)
	}
	if air := ThermalFor(c, w, open).Steady(); !(air.Surface < st.Surface-1) {
		t.Errorf("open air %.2f °C, covered %.2f °C", KelvinToCelsius(air.Surface), KelvinToCelsius(st.Surface))
	}
	covered.Cooling.H, covered.Cooling.HGiven = 4, true
	if tp := ThermalFor(c, w, covered); tp.H != 4 || tp.Convection != nil {
		t.Errorf("covered with h = 4 W/(m²·K): h %g, correlation %v", tp.H, tp.Convection)
	}
}
