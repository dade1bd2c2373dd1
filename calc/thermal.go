package calc

import "math"

// Thermal model. The winding's resistance follows R(T) = R20 (1 + α20 (T −
// 20 °C)) at its volume-mean temperature T; it sheds heat from the surface
// A of Winding.SurfaceArea at the surface temperature T_s by convection
// (a given coefficient h, Newton's law of cooling, or still air by a
// natural-convection correlation, see convection.go), by grey-body
// radiation to surroundings at the ambient temperature Ta
// (Stefan–Boltzmann law) and, when a thermal resistance R_m to a mount at
// Ta is given, by conduction through it (Incropera & DeWitt, Fundamentals
// of Heat and Mass Transfer, ch. 1 and 3). The heat balance at steady state
// is
//
//	duty · P(T) = h A (T_s − Ta) + ε σ A (T_s⁴ − Ta⁴) + (T_s − Ta)/R_m
//
// with P(T) = I² R(T) under current drive and P(T) = V²/R(T) under voltage
// drive; in vacuum h = 0. Inside the winding the heat flows out by
// conduction, so the mean and the hottest point lie above the surface by
// RiseMean·P̄ and RiseMax·P̄ (see WindingRise: two-dimensional conduction
// to the outer cylinder and the end faces of a multilayer winding, radial
// conduction in a thin or single-layer one). The duty cycle enters as the
// average power P̄ = duty · P, valid when the on/off period is short against
// the thermal time constant (see PeriodicCycle for long periods).
//
// Under voltage drive the power falls as the winding heats, so a steady
// temperature always exists. Under current drive the power rises with T,
// and when it outruns the losses there is no steady state: thermal runaway.

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
	H          float64 // W/(m²·K), convective coefficient (0 in vacuum); ignored when Convection is set
	Emissivity float64 // 0..1
	Ambient    float64 // K

	// Convection, when set, gives h from a natural-convection correlation
	// at the surface temperature instead of the constant H.
	Convection *NaturalConvection
	// Mount is the thermal conductance, W/K, to a mount at Ambient (0: none).
	Mount float64
	// RiseMean and RiseMax are the rises, K/W, of the winding's mean and
	// hottest temperature above its surface per watt generated in it.
	RiseMean, RiseMax float64
	// InternalTau is the time constant, s, with which the internal rises
	// (mean above surface, hottest point above mean) follow the power in
	// the warm-up and the duty cycle (0: at once).
	InternalTau float64
	// Reactance is ωL, Ω, of an a.c. voltage drive (0: d.c.): the current is
	// then V/|Z(T)|, |Z| = √(R(T)² + X²), and the heat I² R(T).
	Reactance float64
	// ACFactor is R_ac/R_dc of an a.c. drive (HeatingACFactor; 0 or 1:
	// d.c.): the heat is I² R(T) ACFactor, and a voltage drive's current
	// V/|Z| with |Z| = √((ACFactor R(T))² + X²).
	ACFactor float64
}

// The cooling defaults, one home for the spec reader and calc alike.
const (
	// StillAirH is the natural-convection coefficient taken for still
	// room air before the correlation replaces it, W/(m²·K): inside the
	// 2–25 W/(m²·K) range given for free convection of gases by Incropera
	// & DeWitt (Table 1.1, recalled from memory).
	StillAirH = 10.0
	// DefaultEmissivity is the surface emissivity taken for enamelled
	// wire when none is stated: 0.85, a common-practice figure for enamel
	// and varnish coatings, not from a published table.
	DefaultEmissivity = 0.85
)

// StillAir returns the cooling assumed for a coil in still room air:
// StillAirH and DefaultEmissivity. Evaluate replaces the constant by the
// natural-convection correlation when h was not stated (HGiven false).
func StillAir() Cooling { return Cooling{H: StillAirH, Emissivity: DefaultEmissivity} }

// VacuumCooling returns radiation-only cooling with DefaultEmissivity.
func VacuumCooling() Cooling { return Cooling{Vacuum: true, Emissivity: DefaultEmissivity} }

// EffectiveCooling returns the cooling actually used: the zero Cooling
// (nothing stated) means StillAir; in vacuum h is 0, and so it is for a
// covered coil without a stated h (Cooling.Covered: the heat then leaves
// by radiation and the mount only, which errs on the hot side).
func EffectiveCooling(c Cooling) Cooling {
	if c == (Cooling{}) {
		return StillAir()
	}
	if c.Vacuum || (c.Covered && !c.HGiven) {
		c.H = 0
	}
	return c
}

// ResistanceAt returns R(T) = R20 (1 + α20 (T − 20 °C)) (see
// ResistanceFactor).
func ResistanceAt(r20, alpha20, T float64) float64 { return r20 * ResistanceFactor(alpha20, T) }

// PowerOn returns the power while energised, W, at mean winding
// temperature T: I² R(T) under current drive (d.c., or the rms current of
// an a.c. drive), V²/R(T) under d.c. voltage drive, and
//
//	P = V² R(T) / (R(T)² + X²)
//
// under an a.c. voltage drive of rms V with reactance X = ωL: the current
// V/|Z| of the series R–L circuit heats only the resistance (any circuit
// text on a.c. power, P = I_rms² R).
func (tp ThermalProblem) PowerOn(T float64) float64 {
	R := ResistanceAt(tp.R20, tp.Alpha20, T) * tp.acFactor()
	if tp.Drive == VoltageDrive {
		if X := tp.Reactance; X != 0 {
			return tp.Voltage * tp.Voltage * R / (R*R + X*X)
		}
		return tp.Voltage * tp.Voltage / R
	}
	return tp.Current * tp.Current * R
}

// acFactor is ACFactor as used: 1 when not set.
func (tp ThermalProblem) acFactor() float64 {
	if tp.ACFactor > 0 && !math.IsInf(tp.ACFactor, 0) {
		return tp.ACFactor
	}
	return 1
}

// HeatIn returns the average heat input, W, at mean winding temperature T:
// duty × PowerOn(T).
func (tp ThermalProblem) HeatIn(T float64) float64 { return tp.Duty * tp.PowerOn(T) }

// HeatOut returns the heat shed, W, at surface temperature Ts:
// h A (Ts − Ta) + ε σ A (Ts⁴ − Ta⁴) + Mount (Ts − Ta).
func (tp ThermalProblem) HeatOut(Ts float64) float64 {
	conv, rad, mount := tp.HeatOutParts(Ts)
	return conv + rad + mount
}

// HeatOutParts returns the convected, radiated and conducted (mount) parts
// of HeatOut, W.
func (tp ThermalProblem) HeatOutParts(Ts float64) (conv, rad, mount float64) {
	ta := tp.Ambient
	conv = tp.ConvectionCoefficient(Ts) * tp.Area * (Ts - ta)
	rad = tp.Emissivity * StefanBoltzmann * tp.Area * (Ts*Ts*Ts*Ts - ta*ta*ta*ta)
	mount = tp.Mount * (Ts - ta)
	return
}

// ConvectionCoefficient returns h, W/(m²·K), at surface temperature Ts: the
// correlation's when Convection is set, else H.
func (tp ThermalProblem) ConvectionCoefficient(Ts float64) float64 {
	if tp.Convection != nil {
		return tp.Convection.At(Ts, tp.Ambient).H
	}
	return tp.H
}

// Surface returns the surface temperature, K, of a winding at mean
// temperature T generating P watts: T − RiseMean·P.
func (tp ThermalProblem) Surface(T, P float64) float64 { return T - tp.RiseMean*P }

// residual is HeatOut(surface) − HeatIn at mean temperature T.
func (tp ThermalProblem) residual(T float64) float64 {
	p := tp.HeatIn(T)
	return tp.HeatOut(tp.Surface(T, p)) - p
}

// SteadyTemperature solves the heat balance HeatIn(T) = HeatOut(T_s) for
// the winding's mean temperature T, K. It is solved for the surface
// temperature T_s, which cannot lie below the ambient while heat is
// generated inside (maximum principle of the conduction equation): for each
// T_s the mean temperature is the smallest T ≥ T_s with
// T − T_s = RiseMean · duty · P(T) (MeanAtSurface); the search steps T_s up
// from Ta in steps of 1 K (then 2 % of the rise) to the first sign change of
// HeatOut(T_s) − HeatIn(T) — the stable steady state, where the losses
// overtake the input — and bisects that step to 10⁻¹³ of the rise above
// ambient. It returns Ta when no heat is input, and runaway = true with
// T = NaN when the heat balance has no solution: the losses are still below
// the input at max(TempSearchMax, Ta + 1), or the winding's interior has no
// steady state at any surface temperature (its internal conduction cannot
// carry the heat, which rises faster with T than the interior's gradient;
// current drive with RiseMean·duty·I²·R20·α20 ≥ 1). NaN without runaway when
// the data are not numbers.
func SteadyTemperature(tp ThermalProblem) (T float64, runaway bool) {
	Ts, runaway := tp.steadySurface()
	if runaway || math.IsNaN(Ts) {
		return math.NaN(), runaway
	}
	T, ok := tp.MeanAtSurface(Ts)
	if !ok {
		return math.NaN(), true
	}
	return T, false
}

// balance returns HeatOut(Ts) − HeatIn(T) with T = MeanAtSurface(Ts), and
// false when the interior has no steady state at that surface temperature.
func (tp ThermalProblem) balance(Ts float64) (float64, bool) {
	T, ok := tp.MeanAtSurface(Ts)
	if !ok {
		return math.Inf(-1), false
	}
	return tp.HeatOut(Ts) - tp.HeatIn(T), true
}

// steadySurface returns the steady surface temperature, K (see
// SteadyTemperature).
func (tp ThermalProblem) steadySurface() (Ts float64, runaway bool) {
	lo := tp.Ambient
	g0, ok := tp.balance(lo)
	if math.IsNaN(g0) || !(lo > 0) || math.IsInf(lo, 0) {
		return math.NaN(), false
	}
	if !ok && tp.internalRunaway() {
		return math.NaN(), true
	}
	if g0 >= 0 {
		return lo, false
	}
	top := math.Max(TempSearchMax, lo+1)
	hi := lo
	for {
		step := math.Max(1, 0.02*(hi-tp.Ambient))
		hi = math.Min(lo+step, top)
		g, _ := tp.balance(hi)
		if math.IsNaN(g) {
			return math.NaN(), false
		}
		if g > 0 {
			break
		}
		if hi >= top {
			return math.NaN(), true
		}
		lo = hi
	}
	// Bisect to 10⁻¹³ of the temperature rise (not of the absolute
	// temperature), so that a coil that warms by millikelvin still closes
	// its heat balance to better than 10⁻⁹; stop early at the resolution
	// of float64.
	for range 200 {
		mid := lo + (hi-lo)/2
		if mid <= lo || mid >= hi {
			break
		}
		if g, _ := tp.balance(mid); g > 0 {
			hi = mid
		} else {
			lo = mid
		}
		if hi-lo <= 1e-13*(hi-tp.Ambient) {
			break
		}
	}
	return lo + (hi-lo)/2, false
}

// internalRunaway reports the current-drive case in which the winding's
// interior has no steady state at any surface temperature:
// RiseMean · duty · I² R20 α20 ≥ 1 (the generation's rise with the mean
// temperature outruns the conduction that carries it to the surface).
func (tp ThermalProblem) internalRunaway() bool {
	return tp.Drive == CurrentDrive && tp.RiseMean*tp.Duty*tp.Current*tp.Current*tp.R20*tp.Alpha20 >= 1
}

// MeanAtSurface returns the winding's mean temperature, K, at surface
// temperature Ts: the smallest T ≥ Ts with T − Ts = RiseMean · duty · P(T),
// the internal rise of WindingRise at the duty-averaged power of mean
// temperature T. With u = T − Ts and f_s = 1 + α20 (Ts − 20 °C), in closed
// form:
//
//	current drive: u = c f_s / (1 − c α20),            c = RiseMean·duty·I²R20·F
//	d.c. voltage:  u = 2c / (f_s + √(f_s² + 4 α20 c)),  c = RiseMean·duty·V²/(R20·F)
//
// with F the a.c. factor the heat is taken at (ACFactor; 1 for d.c.)
// (the first from u = c (f_s + α20 u); the second the positive root of
// α20 u² + f_s u − c = 0, written so that it does not cancel),
// and by bracketing and bisection otherwise (a.c. voltage drive, or where
// the resistance factor reaches its floor). ok is false when no such T
// exists below max(TempSearchMax, Ts + 1) — current drive with
// c α20 ≥ 1.
func (tp ThermalProblem) MeanAtSurface(Ts float64) (T float64, ok bool) {
	r := tp.RiseMean * tp.Duty
	if !(r > 0) || math.IsInf(r, 0) {
		return Ts, !math.IsNaN(Ts)
	}
	a := tp.Alpha20
	fs := 1 + a*(Ts-T20)
	switch {
	case tp.Drive == CurrentDrive && fs >= 0.01:
		c := r * tp.Current * tp.Current * tp.R20 * tp.acFactor()
		d := 1 - c*a
		if !(d > 0) {
			return math.NaN(), false
		}
		return Ts + c*fs/d, true
	case tp.Drive == VoltageDrive && tp.Reactance == 0 && fs >= 0.01 && a >= 0:
		c := r * tp.Voltage * tp.Voltage / (tp.R20 * tp.acFactor())
		return Ts + 2*c/(fs+math.Sqrt(fs*fs+4*a*c)), true
	}
	g := func(T float64) float64 { return T - Ts - r*tp.PowerOn(T) }
	u0 := r * tp.PowerOn(Ts)
	if math.IsNaN(u0) {
		return math.NaN(), false
	}
	if !(u0 > 0) {
		return Ts, true
	}
	top := math.Max(TempSearchMax, Ts+1)
	lo, d := Ts, u0
	hi := math.Min(Ts+d, top)
	for n := 0; g(hi) < 0; n++ {
		if hi >= top || n > 2200 {
			return math.NaN(), false
		}
		lo, d = hi, 2*d
		hi = math.Min(Ts+d, top)
	}
	for range 200 {
		mid := lo + (hi-lo)/2
		if mid <= lo || mid >= hi {
			break
		}
		if g(mid) >= 0 {
			hi = mid
		} else {
			lo = mid
		}
	}
	return lo + (hi-lo)/2, true
}

// ThermalState is the steady thermal state of a coil block.
type ThermalState struct {
	Mean, Surface, HotSpot float64 // K
	PowerOn, Power         float64 // W, while energised and duty-averaged
	// Heat shed, W, by convection, radiation and the mount.
	Convected, Radiated, Mounted float64
	Convection                   ConvectionState // at the surface (H: the constant h when given)
	Settled                      bool            // a steady state exists below TempSearchMax
	// NoSolution is set when the heat balance has no solution (thermal
	// runaway), as against data that do not allow one to be sought.
	NoSolution bool
}

// Steady returns the steady state of the heat balance (SteadyTemperature)
// with the surface and hot-spot temperatures and the heat flows. When
// there is no steady state every temperature and power is NaN and Settled
// is false; NoSolution then says the balance has none (runaway) rather
// than the data being unusable.
func (tp ThermalProblem) Steady() ThermalState {
	Ts, runaway := tp.steadySurface()
	T := math.NaN()
	if !runaway && !math.IsNaN(Ts) {
		var ok bool
		if T, ok = tp.MeanAtSurface(Ts); !ok {
			runaway, T = true, math.NaN()
		}
	}
	if runaway || math.IsNaN(T) {
		n := math.NaN()
		return ThermalState{Mean: n, Surface: n, HotSpot: n, PowerOn: n, Power: n, Convected: n, Radiated: n, Mounted: n,
			Convection: ConvectionState{H: n, Ra: n, Nu: n, Film: n}, NoSolution: runaway}
	}
	s := ThermalState{Mean: T, PowerOn: tp.PowerOn(T), Settled: true}
	s.Power = tp.Duty * s.PowerOn
	s.Surface = Ts
	s.HotSpot = s.Surface + tp.RiseMax*s.Power
	s.Convected, s.Radiated, s.Mounted = tp.HeatOutParts(s.Surface)
	if tp.Convection != nil {
		s.Convection = tp.Convection.At(s.Surface, tp.Ambient)
	} else {
		s.Convection = ConvectionState{H: tp.H, Ra: math.NaN(), Nu: math.NaN(), Film: (s.Surface + tp.Ambient) / 2, InRange: true}
	}
	return s
}

// ThermalTimeConstant returns the time constant, s, of the winding's
// approach to its steady mean temperature Ts, for heat capacity C (J/K,
// mass × specific heat): τ = C / (d(HeatOut − HeatIn)/dT) at Ts, the
// linearised heat balance C dT/dt = HeatIn − HeatOut. NaN when there is no
// steady state.
func (tp ThermalProblem) ThermalTimeConstant(C, Ts float64) float64 {
	if math.IsNaN(Ts) {
		return math.NaN()
	}
	h := 1e-3 * math.Max(Ts, 1)
	slope := (tp.residual(Ts+h) - tp.residual(Ts-h)) / (2 * h)
	if !(slope > 0) {
		return math.NaN()
	}
	return C / slope
}

// WarmUp integrates the lumped heat balance C dT/dt = HeatIn(T) −
// HeatOut(T_s) from T = Ta at t = 0 to tEnd (s) in `steps` equal steps of
// the classical fourth-order Runge–Kutta method, C the winding's heat
// capacity, J/K. It returns steps+1 times and mean temperatures. The duty
// cycle enters as the average power. A runaway coil's temperature is
// returned as it climbs. (WarmUpCurve integrates with step control and an
// on/off schedule.)
func (tp ThermalProblem) WarmUp(C, tEnd float64, steps int) (t, T []float64) {
	if steps < 1 || !(C > 0) || !(tEnd > 0) {
		return []float64{0}, []float64{tp.Ambient}
	}
	f := func(T float64) float64 { return -tp.residual(T) / C }
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

// DefaultWindingConductivity is the effective thermal conductivity, W/(m·K),
// taken across the layers of a winding of round enamelled wire without
// impregnation when none is given: 0.3 W/(m·K), common practice (such
// windings are usually quoted between about 0.1 and 0.5 W/(m·K); varnish or
// resin impregnation raises it to about 0.5–1.5 W/(m·K)). It is not taken
// from a published table.
const DefaultWindingConductivity = 0.3

// AnnulusRise returns the rises, K/W, of the mean and of the hottest
// temperature above the outer surface of a cylindrical annulus (inner
// radius ri ≥ 0, outer ro, length ℓ, conductivity k) in which heat is
// generated uniformly and leaves by radial conduction through the outer
// surface only, the bore and ends adiabatic. With q = P/(π (ro² − ri²) ℓ)
// the solution of (1/r) d/dr (k r dT/dr) = −q with dT/dr = 0 at ri is
// (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, §3.5)
//
//	T(r) − T(ro) = q/(2k) [(ro² − r²)/2 − ri² ln(ro/r)]
//	max  (r = ri): q/(4k) [ro² − ri² − 2 ri² ln(ro/ri)]
//	mean (area-weighted): q/(2k) [(ro² − ri²)²/4 − ri² (ro² − ri²)/2 + ri⁴ ln(ro/ri)] / (ro² − ri²)
//
// which for ri = 0 (a solid round bundle) are q ro²/(4k) and q ro²/(8k).
// Routing all the heat out through the outer cylinder makes these upper
// bounds for a winding that also loses heat from its ends (SectionRise,
// of which they are the limit ℓ → ∞). NaN for bad data.
func AnnulusRise(ri, ro, l, k float64) (mean, max float64) {
	if !(ri >= 0) || !(ro > ri) || !(l > 0) || !(k > 0) {
		return math.NaN(), math.NaN()
	}
	a2 := ro*ro - ri*ri
	q := 1 / (math.Pi * a2 * l) // per watt
	lg := 0.0
	if ri > 0 {
		lg = math.Log(ro / ri)
	}
	max = q / (4 * k) * (a2 - 2*ri*ri*lg)
	mean = q / (2 * k) * (a2*a2/4 - ri*ri*a2/2 + ri*ri*ri*ri*lg) / a2
	return mean, max
}

// WindingRise returns the internal rises, K/W of the block's power, of the
// mean and the hottest winding temperature above the winding surface for
// coil c with winding w and effective conductivity k (W/(m·K)) across the
// turns, over the section of RiseGeometry: a multilayer coil, which sheds
// heat from its end faces too (Winding.SurfaceArea), by the
// two-dimensional conduction of SectionRise, its outer cylinder and both
// ends at the surface temperature and the bore adiabatic (RiseEndsCooled);
// a thin or single-layer coil, which sheds heat from the tube or the outer
// cylinder alone, by the radial conduction of AnnulusRise. A pair's two
// coils share the block's power. Zero rises when the data are missing.
func WindingRise(c Coil, w Winding, k float64) (mean, max float64) {
	ri, ro, l := RiseGeometry(c, w)
	if !(ro > 0) {
		return 0, 0
	}
	if RiseEndsCooled(c, w) {
		mean, max = SectionRise(ri, ro, l, k)
	} else {
		mean, max = AnnulusRise(ri, ro, l, k)
	}
	if math.IsNaN(mean) || math.IsNaN(max) {
		return 0, 0
	}
	s := float64(SeriesCoils(c))
	return mean / s, max / s
}

// RiseEndsCooled reports whether WindingRise takes coil c's winding w as
// cooled through its end faces as well as its outer cylinder
// (SectionRise): a multilayer coil (or one whose radial build is stated),
// whose end annuli are part of its heat-shedding surface. A thin coil (the
// round bundle) and a single-layer coil (one wire deep, its ends a wire's
// section) are not.
func RiseEndsCooled(c Coil, w Winding) bool {
	return w.TurnCount() > 0 && WireOuter(c) > 0 && !w.Thin && !(w.LayerCount <= 1 && c.RadialBuild <= 0)
}

// RiseGeometry returns the section (inner and outer radius, length, m) in
// which the heat of one coil of c is generated and across which it is
// conducted to the winding's surface (WindingRise): a
// thin coil is a solid round bundle of the hexagonal-packing diameter along
// its mean turn (ri = 0); a single-layer coil an annulus one overall wire
// diameter deep over its length; a multilayer coil the annulus its turns
// occupy as laid (LaidEnvelope), from the bore outward over its layers —
// LayerCount overall wire diameters, or the stated radial build when the
// layers fill it — over its length: the heat is generated in the copper,
// and a winding that does not fill its stated build has no turns in the
// part it leaves empty. Zeros when the data are missing.
func RiseGeometry(c Coil, w Winding) (ri, ro, length float64) {
	outer := WireOuter(c)
	n := w.TurnCount()
	switch {
	case n == 0 || !(outer > 0):
		return 0, 0, 0
	case w.Thin:
		return 0, BundleDiameter(outer, n) / 2, w.MeanTurn
	case w.LayerCount <= 1 && c.RadialBuild <= 0:
		rm := c.MeanDiameter / 2
		return math.Max(rm-outer/2, 0), rm + outer/2, c.Length
	}
	rin := math.Max(w.Layers[0].Radius-outer/2, 0)
	length = c.Length
	if !(length > 0) {
		length = outer
	}
	depth := c.RadialBuild
	if laid := float64(w.LayerCount) * outer; laid > 0 && !(laid >= depth) {
		depth = laid
	}
	return rin, rin + depth, length
}
