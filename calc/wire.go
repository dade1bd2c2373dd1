package calc

import "math"

// AWGDiameter returns the bare diameter in metres of American Wire Gauge n,
// by the defining rule of ASTM B258: d = 0.127 mm × 92^((36 − n)/39), i.e.
// 0.005 in at AWG 36 and 0.4600 in at AWG 4/0, in geometric progression.
// Gauges 1/0, 2/0, 3/0 and 4/0 are n = 0, −1, −2, −3. The rule is defined
// for n = −3 … 56 (see AWGValid) but is evaluated for any n.
func AWGDiameter(n int) float64 {
	return 0.127e-3 * math.Pow(92, float64(36-n)/39)
}

// AWGValid reports whether n is a gauge in the ASTM B258 range, 4/0 (n = −3)
// to AWG 56.
func AWGValid(n int) bool { return n >= -3 && n <= 56 }

// HeavyBuildOuter returns a default overall diameter, m, of heavy-build
// (grade 2) enamelled round wire of the given bare diameter, m:
//
//	d_outer = d_bare + 0.0813 mm × (d_bare / 1.628 mm)^0.4
//
// This is an approximate fit to typical heavy-build magnet-wire tables (the
// enamel build, i.e. increase in diameter, of 0.0813 mm at AWG 14 shrinking
// gently with the gauge). Its constants are recalled from memory, not taken
// from a standard; it is accurate to a few micrometres at best. Users who
// know their wire should give the overall diameter instead.
func HeavyBuildOuter(bare float64) float64 {
	if !(bare > 0) {
		return bare
	}
	return bare + 0.0813e-3*math.Pow(bare/1.628e-3, 0.4)
}

// WireFromGauge returns a round wire of AWG n in the given material, with
// the heavy-build default overall diameter.
func WireFromGauge(n int, m Material) Wire {
	d := AWGDiameter(n)
	return Wire{Gauge: n, Bare: d, Outer: HeavyBuildOuter(d), Material: m}
}

// ConductorArea returns the cross-section of a round conductor, π d²/4.
func ConductorArea(bare float64) float64 { return math.Pi * bare * bare / 4 }

// ResistanceFactor returns R(T)/R20 = 1 + α20 (T − 20 °C), the linear law
// of IEC 60028 for copper (used likewise for aluminium with its α20). T is in
// kelvin. The law is good from about −50 °C to +200 °C; far below that it
// would reach zero, so the factor is floored at 0.01 to keep it positive.
func ResistanceFactor(alpha20, T float64) float64 {
	f := 1 + alpha20*(T-T20)
	if f < 0.01 {
		f = 0.01
	}
	return f
}

// ResistancePerLength returns the DC resistance per unit length, Ω/m, of a
// round conductor of bare diameter `bare` (m) at temperature T (K):
//
//	R'(T) = ρ20 / (π d²/4) × (1 + α20 (T − 20 °C))
//
// (IEC 60028; resistivity and α20 from the Material). It returns NaN for a
// non-positive diameter.
func ResistancePerLength(bare float64, m Material, T float64) float64 {
	if !(bare > 0) {
		return math.NaN()
	}
	return m.Rho20 / ConductorArea(bare) * ResistanceFactor(m.Alpha20, T)
}
