package calc

import "math"

// Thermal model (first steady state). The whole winding is taken at one
// uniform temperature T; its resistance follows R(T) = R20 (1 + α20 (T −
// 20 °C)); it sheds heat from the surface A of Winding.SurfaceArea by
// convection with a constant coefficient h (Newton's law of cooling) and by
// grey-body radiation to surroundings at the ambient temperature Ta
// (Stefan–Boltzmann law); see e.g. Incropera & DeWitt, Fundamentals of Heat
// and Mass Transfer, ch. 1. The heat balance at steady state is
//
//	duty · P(T) = h A (T − Ta) + ε σ A (T⁴ − Ta⁴)
//
// with P(T) = I² R(T) under current drive and P(T) = V²/R(T) under voltage
// drive; in vacuum h = 0 (radiation only). The duty cycle enters as the
// average power, valid when the on/off period is short against the thermal
// time constant. Limits: no temperature gradient through the winding (the
// hot spot of a thick winding is hotter than this mean), h independent of
// temperature, no conduction to mounts, the radiative sink at ambient.
//
// Under voltage drive the power falls as the winding heats, so a steady
// temperature always exists. Under current drive the power rises with T and
// when it outruns the losses there is no steady state: thermal runaway.

// TempSearchMax is the upper bound, K, of the steady-temperature search.
const TempSearchMax = 1500.0

// ThermalProblem is the data of the heat balance of one coil block.
type ThermalProblem struct {
	Drive      Drive
	Current    float64 // A, CurrentDrive
	Voltage    float64 // V, VoltageDrive
	R20        float64 // Ω at 20 °C
	Alpha20    float64 // 1/K
	Duty       float64 // 0..1
	Area       float64 // m², heat-shedding surface
	H          float64 // W/(m²·K), convective coefficient (0 in vacuum)
	Emissivity float64 // 0..1
	Ambient    float64 // K
}

// StillAir returns the cooling assumed for a coil in still room air: a
// natural-convection coefficient h = 10 W/(m²·K), inside the 2–25 W/(m²·K)
// range given for free convection of gases by Incropera & DeWitt (Table 1.1,
// recalled from memory), and the emissivity 0.9 typical of enamel and
// varnish coatings (recalled from memory, not from a table).
func StillAir() Cooling { return Cooling{H: 10, Emissivity: 0.9} }

// VacuumCooling returns radiation-only cooling with emissivity 0.9.
func VacuumCooling() Cooling { return Cooling{Vacuum: true, Emissivity: 0.9} }

// EffectiveCooling returns the cooling actually used: the zero Cooling
// (nothing stated) means StillAir; in vacuum h is 0.
func EffectiveCooling(c Cooling) Cooling {
	if c == (Cooling{}) {
		return StillAir()
	}
	if c.Vacuum {
		c.H = 0
	}
	return c
}

// ResistanceAt returns R(T) = R20 (1 + α20 (T − 20 °C)) (see
// ResistanceFactor).
func ResistanceAt(r20, alpha20, T float64) float64 { return r20 * ResistanceFactor(alpha20, T) }

// HeatIn returns the average heat input, W, at winding temperature T:
// duty × I² R(T) or duty × V²/R(T).
func (tp ThermalProblem) HeatIn(T float64) float64 {
	R := ResistanceAt(tp.R20, tp.Alpha20, T)
	if tp.Drive == VoltageDrive {
		return tp.Duty * tp.Voltage * tp.Voltage / R
	}
	return tp.Duty * tp.Current * tp.Current * R
}

// HeatOut returns the heat shed, W, at winding temperature T:
// h A (T − Ta) + ε σ A (T⁴ − Ta⁴).
func (tp ThermalProblem) HeatOut(T float64) float64 {
	ta := tp.Ambient
	return tp.H*tp.Area*(T-ta) + tp.Emissivity*StefanBoltzmann*tp.Area*(T*T*T*T-ta*ta*ta*ta)
}

// SteadyTemperature solves the heat balance HeatIn(T) = HeatOut(T) for the
// winding temperature T, K, by bisection on [Ta, max(TempSearchMax, Ta+1)]
// (the bracket is valid because HeatOut − HeatIn ≤ 0 at Ta; bisection to
// 10⁻¹² relative). It returns Ta when no heat is input, and runaway = true
// with T = NaN when the losses are still below the input at the upper bound
// (or the data are not numbers).
func SteadyTemperature(tp ThermalProblem) (T float64, runaway bool) {
	lo := tp.Ambient
	g := func(T float64) float64 { return tp.HeatOut(T) - tp.HeatIn(T) }
	g0 := g(lo)
	if math.IsNaN(g0) {
		return math.NaN(), false
	}
	if g0 >= 0 {
		return lo, false
	}
	hi := math.Max(TempSearchMax, lo+1)
	if !(g(hi) > 0) {
		return math.NaN(), true
	}
	for range 200 {
		mid := lo + (hi-lo)/2
		if g(mid) > 0 {
			hi = mid
		} else {
			lo = mid
		}
		if hi-lo <= 1e-12*hi {
			break
		}
	}
	return lo + (hi-lo)/2, false
}

// ThermalTimeConstant returns the time constant, s, of the winding's
// approach to its steady temperature Ts, for heat capacity C (J/K, mass ×
// specific heat): τ = C / (d(HeatOut − HeatIn)/dT) at Ts, the linearised
// heat balance C dT/dt = HeatIn − HeatOut. NaN when there is no steady
// state.
func (tp ThermalProblem) ThermalTimeConstant(C, Ts float64) float64 {
	if math.IsNaN(Ts) {
		return math.NaN()
	}
	h := 1e-3 * math.Max(Ts, 1)
	g := func(T float64) float64 { return tp.HeatOut(T) - tp.HeatIn(T) }
	slope := (g(Ts+h) - g(Ts-h)) / (2 * h)
	if !(slope > 0) {
		return math.NaN()
	}
	return C / slope
}

// WarmUp integrates the lumped heat balance C dT/dt = HeatIn(T) − HeatOut(T)
// from T = Ta at t = 0 to tEnd (s) in `steps` equal steps of the classical
// fourth-order Runge–Kutta method, C the winding's heat capacity, J/K. It
// returns steps+1 times and temperatures. The duty cycle enters as the
// average power. A runaway coil's temperature is returned as it climbs.
func (tp ThermalProblem) WarmUp(C, tEnd float64, steps int) (t, T []float64) {
	if steps < 1 || !(C > 0) || !(tEnd > 0) {
		return []float64{0}, []float64{tp.Ambient}
	}
	f := func(T float64) float64 { return (tp.HeatIn(T) - tp.HeatOut(T)) / C }
	dt := tEnd / float64(steps)
	t = make([]float64, steps+1)
	T = make([]float64, steps+1)
	T[0] = tp.Ambient
	for i := range steps {
		y := T[i]
		k1 := f(y)
		k2 := f(y + dt/2*k1)
		k3 := f(y + dt/2*k2)
		k4 := f(y + dt*k3)
		T[i+1] = y + dt/6*(k1+2*k2+2*k3+k4)
		t[i+1] = dt * float64(i+1)
	}
	return t, T
}
