package calc

import "math"

// Operating is a coil block's electrical and thermal steady state.
type Operating struct {
	R20         float64 // Ω at 20 °C, whole block (a pair's two coils in series)
	RHot        float64 // Ω at Temperature
	Current     float64 // A while energised
	ColdCurrent float64 // A at the 20 °C resistance
	Voltage     float64 // V across the block while energised
	PowerOn     float64 // W while energised, I² R(T)
	Power       float64 // W averaged over the duty cycle
	Temperature float64 // K, steady uniform winding temperature
	Runaway     bool    // no steady temperature below TempSearchMax
	Thermal     ThermalProblem
}

// SeriesCoils returns the number of coils in series in a block: 2 for a
// Pair, else 1.
func SeriesCoils(c Coil) int {
	if c.Form == Pair {
		return 2
	}
	return 1
}

// Duty returns the coil's duty cycle as used: a value ≤ 0 or NaN means not
// given and reads as 1 (continuous); above 1 is clamped to 1.
func Duty(c Coil) float64 {
	d := c.Duty
	if !(d > 0) || d > 1 {
		return 1
	}
	return d
}

// Ambient returns the ambient temperature as used: a value ≤ 0 K or NaN
// means not given and reads as 20 °C.
func Ambient(cond Conditions) float64 {
	if !(cond.Ambient > 0) {
		return T20
	}
	return cond.Ambient
}

// ThermalFor returns the heat-balance data of coil c with winding w in the
// given conditions: R20 = R'20 × wire length of the block, area = surface
// of one coil × SeriesCoils, cooling from EffectiveCooling.
func ThermalFor(c Coil, w Winding, cond Conditions) ThermalProblem {
	n := float64(SeriesCoils(c))
	cool := EffectiveCooling(cond.Cooling)
	return ThermalProblem{
		Drive:      c.Drive,
		Current:    c.Current,
		Voltage:    c.Voltage,
		R20:        ResistancePerLength(c.Wire.Bare, c.Wire.Material, T20) * w.WireLength * n,
		Alpha20:    c.Wire.Material.Alpha20,
		Duty:       Duty(c),
		Area:       w.SurfaceArea * n,
		H:          cool.H,
		Emissivity: cool.Emissivity,
		Ambient:    Ambient(cond),
	}
}

// OperatingPoint returns the steady state of coil block c: the winding
// temperature from SteadyTemperature, then R(T), the current (imposed, or
// V/R(T) under voltage drive — the Voltage is across the whole block), the
// voltage I·R(T) and the power I² R(T), on and averaged. Unknown values are
// NaN: all the temperature-dependent ones on runaway, except an imposed
// current.
func OperatingPoint(c Coil, w Winding, cond Conditions) Operating {
	tp := ThermalFor(c, w, cond)
	op := Operating{R20: tp.R20, Thermal: tp}
	if c.Drive == VoltageDrive {
		op.ColdCurrent = c.Voltage / tp.R20
	} else {
		op.ColdCurrent = c.Current
	}
	if !(tp.R20 > 0) || math.IsInf(tp.R20, 0) {
		// No wire, or no conductor: nothing can be said beyond an imposed current.
		op.RHot, op.Voltage, op.PowerOn, op.Power, op.Temperature = math.NaN(), math.NaN(), math.NaN(), math.NaN(), math.NaN()
		op.ColdCurrent = math.NaN()
		op.Current = math.NaN()
		if c.Drive == CurrentDrive {
			op.Current, op.ColdCurrent = c.Current, c.Current
		}
		if w.WireLength == 0 && c.Drive == CurrentDrive {
			op.R20, op.RHot, op.Voltage, op.PowerOn, op.Power = 0, 0, 0, 0, 0
			op.Temperature = Ambient(cond)
		}
		return op
	}
	T, runaway := SteadyTemperature(tp)
	op.Temperature, op.Runaway = T, runaway
	op.RHot = ResistanceAt(tp.R20, tp.Alpha20, T)
	if c.Drive == VoltageDrive {
		op.Current = c.Voltage / op.RHot
		op.Voltage = c.Voltage
	} else {
		op.Current = c.Current
		op.Voltage = c.Current * op.RHot
	}
	op.PowerOn = op.Current * op.Current * op.RHot
	op.Power = tp.Duty * op.PowerOn
	return op
}
