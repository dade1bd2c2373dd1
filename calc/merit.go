package calc

// MomentMerit returns the figure of merit of an air-core winding, m²/(P·M),
// A²·m⁴/(W·kg): the square of its moment over the power it dissipates and
// its conductor mass. With N turns of conductor section a carrying I,
//
//	m = I ΣA,   P = I² ρ Σℓ / a,   M = ρm a Σℓ
//
// (ΣA the areas the turns enclose, Σℓ their length, ρ the resistivity at
// the winding's temperature, ρm the conductor's density), so
//
//	m²/(P·M) = (ΣA/Σℓ)² / (ρ ρm)
//
// depends on the geometry of the turns alone: neither the current, nor the
// turn count, nor the wire section appears. For N equal circular turns of
// radius r, ΣA/Σℓ = r/2 and m²/(P·M) = r²/(4 ρ ρm). Turns and gauge only
// trade current against voltage at the same merit; the merit grows with
// the size of the turns and a better conductor (low ρ ρm: aluminium beats
// copper by mass).
//
// Reference: m = I·A for a plane current loop (Jackson, Classical
// Electrodynamics, 3rd ed., §5.6) and R = ρℓ/a (Ohm's law for a uniform
// conductor); the ratio is an algebraic consequence of the two.
func MomentMerit(areaSum, wireLength, resistivity, density float64) float64 {
	k := areaSum / wireLength
	return k * k / (resistivity * density)
}
