package calc

import "math"

// SkinDepth returns the skin depth, m, of a non-magnetic conductor of
// resistivity ρ (Ω·m) at frequency f (Hz): δ = √(ρ / (π f μ0)), the depth
// at which the current density of a plane wave has fallen to 1/e (Jackson,
// Classical Electrodynamics, 3rd ed., §8.1, δ = √(2/(μ0 σ ω)) with σ = 1/ρ,
// ω = 2πf). Copper at 20 °C: about 66 mm/√(f/Hz). NaN for f ≤ 0 or ρ ≤ 0.
func SkinDepth(rho, f float64) float64 {
	if !(rho > 0) || !(f > 0) {
		return math.NaN()
	}
	return math.Sqrt(rho / (math.Pi * f * Mu0))
}

// ReactanceRatio is the X/R above which the memo says the reactance is no
// longer negligible against the resistance (one tenth: the current then
// differs from V/R by half a per cent or more, and the phase by 6°). A
// reporting threshold of ours, not a published one.
const ReactanceRatio = 0.1

// ACResult is a coil block driven at a frequency: the series R–L model with
// the d.c. resistance at the winding's mean temperature.
type ACResult struct {
	Frequency float64 // Hz (0: not given; then everything else is NaN)
	Reactance float64 // Ω, X = 2π f L
	Impedance float64 // Ω, |Z| = √(R² + X²), R the Resistance
	// Resistance is the R the impedance takes, Ω: the a.c. resistance
	// R_ac = F_R·R(T) where Dowell's factor applies (HeatingACFactor),
	// else R(T).
	Resistance float64
	Phase      float64 // rad, arctan(X/R)
	Current    float64 // A rms: V/|Z| under voltage drive, the stated current under current drive
	Voltage    float64 // V rms: the stated voltage, or I·|Z| under current drive
	SkinDepth  float64 // m, in the conductor at the mean winding temperature
	WireRadius float64 // m, bare
	// SkinLimited is set when δ is less than the wire radius: the a.c.
	// resistance rises above the d.c. value (skin effect; the proximity
	// effect of neighbouring turns adds to it).
	SkinLimited bool
	// Reactive is set when X/R ≥ ReactanceRatio.
	Reactive bool
}

// AC returns the a.c. figures of a coil block of inductance L (H) and
// resistance R (Ω, at the mean winding temperature T, K) at frequency f
// (Hz), with the drive of coil c (an rms voltage or current) and the
// conductor of its wire. The series R–L model ignores the winding's
// capacitance, so it holds well below the self-resonant frequency.
func AC(c Coil, L, R, T, f float64) ACResult {
	n := math.NaN()
	a := ACResult{Reactance: n, Impedance: n, Resistance: n, Phase: n, Current: n, Voltage: n, SkinDepth: n, WireRadius: c.Wire.Bare / 2}
	if !(f > 0) {
		return a
	}
	a.Frequency = f
	a.Resistance = R
	a.Reactance = 2 * math.Pi * f * L
	a.Impedance = math.Hypot(R, a.Reactance)
	a.Phase = math.Atan2(a.Reactance, R)
	if c.Drive == VoltageDrive {
		a.Voltage = c.Voltage
		a.Current = c.Voltage / a.Impedance
	} else {
		a.Current = c.Current
		a.Voltage = c.Current * a.Impedance
	}
	rho := c.Wire.Material.Rho20 * ResistanceFactor(c.Wire.Material.Alpha20, T)
	a.SkinDepth = SkinDepth(rho, f)
	a.SkinLimited = a.SkinDepth < a.WireRadius
	a.Reactive = a.Reactance >= ReactanceRatio*R
	return a
}
