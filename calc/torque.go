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
