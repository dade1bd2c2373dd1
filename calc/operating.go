package calc

import "math"

// Operating is a coil block's electrical and thermal steady state.
type Operating struct {
	R20         float64 // Ω at 20 °C, whole block (a pair's two coils in series)
	RHot        float64 // Ω at the mean winding temperature
	Current     float64 // A while energised
	ColdCurrent float64 // A at the 20 °C resistance
	Voltage     float64 // V across the block while energised
	PowerOn     float64 // W while energised, I² R(T)
	Power       float64 // W averaged over the duty cycle
	Temperature float64 // K, steady hot-spot winding temperature (State.HotSpot)
	// Runaway is set when no steady state exists at or below the block's
	// thermal limit (the insulation class, else the conductor's limit), or
	// the heat balance has no solution — under either drive (see
	// runaway.go). Verdict tells the two apart.
	Runaway bool
	Verdict ThermalVerdict
	// SwitchOnCurrent is the largest current, A, the block carries: the
	// imposed one under current drive, V/|Z| of the winding at its coldest
	// (ColdTemperature) under voltage drive, just after switch-on.
	SwitchOnCurrent float64
	// Reactance is ωL, Ω, of an a.c. voltage drive (0 otherwise); the
	// current is then V/|Z(T)|.
	Reactance float64
	Thermal   ThermalProblem
	State     ThermalState
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
// of one coil × SeriesCoils, cooling from EffectiveCooling — in still air
// without a stated h the natural-convection correlation of ConvectionFor,
// and no convection under a cover (Cooling.Covered) —,
// a mount conductance SeriesCoils / MountResistance when one is given, and
// the internal rises of WindingRise with the coil's winding conductivity
// (DefaultWindingConductivity when not given).
func ThermalFor(c Coil, w Winding, cond Conditions) ThermalProblem {
	n := float64(SeriesCoils(c))
	cool := EffectiveCooling(cond.Cooling)
	tp := ThermalProblem{
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
	if !cool.Vacuum && !cool.HGiven && !cool.Covered {
		tp.Convection = ConvectionFor(c, w, cond)
	}
	if cond.MountResistance > 0 && !math.IsInf(cond.MountResistance, 1) {
		tp.Mount = n / cond.MountResistance
	}
	tp.RiseMean, tp.RiseMax = WindingRise(c, w, WindingConductivity(c))
	// The internal gradient builds up with the winding's own time constant,
	// estimated as its conductor's heat capacity times its mean internal
	// thermal resistance (for a slab heated throughout and cooled on one
	// face this lumped estimate, L²/(3α), lies within 20 % of the slowest
	// conduction mode's 4L²/(π²α); Carslaw & Jaeger, Conduction of Heat in
	// Solids, 2nd ed., 1959, ch. III). Insulation, impregnation and former are
	// left out, which makes it short: the hot spot then follows the power
	// more closely than it does, on the safe side.
	tp.InternalTau = n * w.Mass * c.Wire.Material.SpecificHeat * tp.RiseMean
	if !(tp.InternalTau > 0) || math.IsInf(tp.InternalTau, 0) {
		tp.InternalTau = 0
	}
	return tp
}

// WindingConductivity returns the coil's effective conductivity across
// its turns as used, W/(m·K): the given one, else
// DefaultWindingConductivity.
func WindingConductivity(c Coil) float64 {
	if c.WindingConductivity > 0 {
		return c.WindingConductivity
	}
	return DefaultWindingConductivity
}

// ConvectionFor returns the natural-convection model of the outer shape of
// coil c with winding w: a thin coil (and a rectangle) is the tube of its
// round bundle, a horizontal cylinder of the bundle diameter whatever the
// axis; a ring — a winding whose section (length and radial build) is small
// against its mean diameter, under a quarter of it — likewise a tube, of
// the diameter 2(ℓ + b)/π whose perimeter equals the section's; any other
// single- or multilayer coil is a horizontal cylinder of its outer
// diameter when its axis is horizontal, and a vertical surface as high as
// its winding length when the axis is vertical (AxisIsVertical).
// The one correlation is applied to the coil's whole heat-shedding
// surface. Nil when the data are missing.
func ConvectionFor(c Coil, w Winding, cond Conditions) *NaturalConvection {
	outer := c.Wire.Outer
	if !(outer > 0) {
		outer = c.Wire.Bare
	}
	n := w.TurnCount()
	if n == 0 || !(outer > 0) {
		return nil
	}
	if w.Thin {
		return &NaturalConvection{Shape: HorizontalCylinder, Length: BundleDiameter(outer, n)}
	}
	// The winding's outline as stated, whose surface sheds the heat
	// (Winding.SurfaceArea), not the part its turns occupy.
	e := WindingEnvelope(c, w)
	ri, ro, l := math.Max(e.R0, 0), e.R1, e.Z1-e.Z0
	if b := ro - ri; math.Max(l, b) < c.MeanDiameter/4 {
		return &NaturalConvection{Shape: HorizontalCylinder, Length: 2 * (l + b) / math.Pi, Ring: true}
	}
	if AxisIsVertical(c, cond) {
		return &NaturalConvection{Shape: VerticalSurface, Length: l}
	}
	if !(ro > 0) {
		return nil
	}
	return &NaturalConvection{Shape: HorizontalCylinder, Length: 2 * ro}
}

// VerticalWithin is the largest angle between a coil's axis and the
// vertical, rad, at which the axis counts as vertical for natural
// convection (45°: the axis is nearer the vertical than the horizontal).
const VerticalWithin = math.Pi / 4

// AxisIsVertical says whether coil c's axis counts as vertical for natural
// convection: with Conditions.Up given, when the angle between the axis
// (either sense) and the upward direction is at most VerticalWithin, so
// that |a·u| ≥ cos 45°; without it, the design-wide
// Conditions.AxisVertical.
func AxisIsVertical(c Coil, cond Conditions) bool {
	u := cond.Up
	nu := math.Sqrt(u[0]*u[0] + u[1]*u[1] + u[2]*u[2])
	if !(nu > 0) {
		return cond.AxisVertical
	}
	a := c.Axis
	na := math.Sqrt(a[0]*a[0] + a[1]*a[1] + a[2]*a[2])
	if !(na > 0) {
		a, na = Vec{0, 0, 1}, 1
	}
	cosine := math.Abs(a[0]*u[0]+a[1]*u[1]+a[2]*u[2]) / (na * nu)
	return cosine >= math.Cos(VerticalWithin)-1e-12
}

// ColdTemperature returns the winding temperature, K, at switch-on: the
// ambient, but not above 20 °C — the resistance is taken at no more than
// its reference temperature, so that the switch-on current is not
// understated by a warm enclosure the coil may not have reached yet.
func ColdTemperature(cond Conditions) float64 { return math.Min(T20, Ambient(cond)) }

// OperatingPoint returns the steady state of coil block c: the thermal
// state from ThermalProblem.Steady (mean, surface and hot-spot
// temperatures), then R at the mean temperature, the current (imposed, or
// V/|Z(T)| under voltage drive, |Z| = R(T) for d.c. and √(R(T)² + (ωL)²)
// for an a.c. drive of frequency f = ω/2π, L = CoilInductance; the Voltage
// is across the whole block), the voltage I·R(T) (d.c.) and the power
// I² R(T), on and averaged, and the runaway verdict (Judge). An a.c.
// drive heats at R_ac = F·R(T), F the Dowell factor of HeatingACFactor at
// the steady mean temperature (solved for together with it), and a
// voltage drive's current is V/√((F R)² + (ωL)²). Unknown values
// are NaN: all the temperature-dependent ones when there is no steady
// state, except an imposed current.
func OperatingPoint(c Coil, w Winding, cond Conditions) Operating {
	tp := ThermalFor(c, w, cond)
	if c.Drive == VoltageDrive && c.Frequency > 0 && !math.IsInf(c.Frequency, 0) {
		if L := CoilInductance(c, w); L > 0 && !math.IsInf(L, 0) {
			tp.Reactance = 2 * math.Pi * c.Frequency * L
		}
	}
	op := Operating{R20: tp.R20, Thermal: tp, Reactance: tp.Reactance}
	impedance := func(R float64) float64 { return math.Hypot(R, tp.Reactance) }
	if c.Drive == VoltageDrive {
		op.ColdCurrent = c.Voltage / impedance(tp.R20)
		op.SwitchOnCurrent = c.Voltage / impedance(ResistanceAt(tp.R20, tp.Alpha20, ColdTemperature(cond)))
	} else {
		op.ColdCurrent = c.Current
		op.SwitchOnCurrent = c.Current
	}
	op.Verdict = ThermalVerdict{Limit: ThermalLimit(c)}
	if !(tp.R20 > 0) || math.IsInf(tp.R20, 0) {
		// No wire, or no conductor: nothing can be said beyond an imposed current.
		op.RHot, op.Voltage, op.PowerOn, op.Power, op.Temperature = math.NaN(), math.NaN(), math.NaN(), math.NaN(), math.NaN()
		op.ColdCurrent = math.NaN()
		op.Current = math.NaN()
		op.SwitchOnCurrent = math.NaN()
		n := math.NaN()
		op.State = ThermalState{Mean: n, Surface: n, HotSpot: n, PowerOn: n, Power: n, Convected: n, Radiated: n, Mounted: n,
			Convection: ConvectionState{H: n, Ra: n, Nu: n, Film: n}}
		if c.Drive == CurrentDrive {
			op.Current, op.ColdCurrent, op.SwitchOnCurrent = c.Current, c.Current, c.Current
		}
		if w.WireLength == 0 && c.Drive == CurrentDrive {
			op.R20, op.RHot, op.Voltage, op.PowerOn, op.Power = 0, 0, 0, 0, 0
			op.Temperature = Ambient(cond)
			a := op.Temperature
			op.State = ThermalState{Mean: a, Surface: a, HotSpot: a, Convection: ConvectionState{H: n, Ra: n, Nu: n, Film: a}, Settled: true}
		}
		return op
	}
	st := tp.Steady()
	if c.Frequency > 0 && (c.Current != 0 || c.Voltage != 0) {
		// An a.c. winding heats at R_ac, whose factor depends on the
		// temperature (the skin depth grows with the resistivity):
		// solve again at the factor of the last solution's mean
		// temperature until the factor settles.
		for range 30 {
			if !st.Settled || math.IsNaN(st.Mean) {
				break
			}
			f := HeatingACFactor(c, w, st.Mean)
			if math.Abs(f-tp.acFactor()) <= 1e-12*f {
				break
			}
			tp.ACFactor = f
			st = tp.Steady()
		}
		op.Thermal = tp
	}
	op.State = st
	op.Temperature = st.HotSpot
	op.Verdict = Judge(ThermalLimit(c), st.HotSpot, st.Settled, st.NoSolution).WithMelting(c.Wire.Material, st.HotSpot)
	op.Runaway = op.Verdict.Runaway
	op.RHot = ResistanceAt(tp.R20, tp.Alpha20, st.Mean)
	rac := op.RHot * tp.acFactor()
	if c.Drive == VoltageDrive {
		op.Current = c.Voltage / impedance(rac)
		op.Voltage = c.Voltage
	} else {
		op.Current = c.Current
		op.Voltage = c.Current * op.RHot
	}
	op.PowerOn = op.Current * op.Current * rac
	op.Power = tp.Duty * op.PowerOn
	return op
}
