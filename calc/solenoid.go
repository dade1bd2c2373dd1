package calc

import "math"

// SolenoidAxisField returns the axial field, T, on the axis of a
// single-layer solenoid modelled as a uniform current sheet of radius R,
// length L, N turns, current I, at axial position z from its centre
// (integral of the loop's on-axis field over the length; e.g. Jackson,
// Classical Electrodynamics, 3rd ed., §5.5 problem; Purcell, Electricity and
// Magnetism, §6.5):
//
//	Bz = μ0 n I / 2 · [(z + L/2)/√((z + L/2)² + R²) − (z − L/2)/√((z − L/2)² + R²)],  n = N/L
func SolenoidAxisField(R, L float64, N int, I, z float64) float64 {
	if !(L > 0) {
		return float64(N) * LoopFieldOnAxis(R, I, z)
	}
	n := float64(N) / L
	zp, zm := z+L/2, z-L/2
	return Mu0 * n * I / 2 * (zp/math.Hypot(zp, R) - zm/math.Hypot(zm, R))
}
