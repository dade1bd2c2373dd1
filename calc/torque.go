package calc

import "math"

// Torque returns the torque, N·m, on a magnetic moment m (A·m²) in a
// uniform field B (T): τ = m × B (Jackson, Classical Electrodynamics,
// 3rd ed., eq. 5.71).
func Torque(m, B Vec) Vec { return m.Cross(B) }

// TorqueMax returns the largest torque magnitude over all orientations,
// |m| |B|, reached with m perpendicular to B.
func TorqueMax(m, B Vec) float64 { return m.Norm() * B.Norm() }

// TorqueAtAngle returns |τ| = |m| |B| sin θ for moment and field magnitudes
// m, B at angle θ (rad) between them.
func TorqueAtAngle(m, B, theta float64) float64 { return m * B * math.Sin(theta) }

// DesignAngle returns the angle θ, rad, between moment m and the background
// field at which the torque is reported: the stated design angle; or, when
// none is stated and the field is a vector, the angle between m and B as
// designed, θ = atan2(|m × B|, m · B), so that |m||B| sin θ = |m × B|; or
// π/2 (the largest torque) for a field stated as a magnitude only or a zero
// moment or field, whose angle is not known.
func DesignAngle(m Vec, cond Conditions) float64 {
	B := cond.BackgroundField
	if cond.DesignAngleStated || cond.BackgroundMagnitudeOnly || m.Norm() == 0 || B.Norm() == 0 {
		return cond.DesignAngle
	}
	return math.Atan2(m.Cross(B).Norm(), m.Dot(B))
}
