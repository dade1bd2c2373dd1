package calc

import "math"

// Vector arithmetic on Vec, the Cartesian triple used throughout.

// Add returns v + w.
func (v Vec) Add(w Vec) Vec { return Vec{v[0] + w[0], v[1] + w[1], v[2] + w[2]} }

// Sub returns v − w.
func (v Vec) Sub(w Vec) Vec { return Vec{v[0] - w[0], v[1] - w[1], v[2] - w[2]} }

// Scale returns s·v.
func (v Vec) Scale(s float64) Vec { return Vec{s * v[0], s * v[1], s * v[2]} }

// Dot returns v·w.
func (v Vec) Dot(w Vec) float64 { return v[0]*w[0] + v[1]*w[1] + v[2]*w[2] }

// Cross returns v × w.
func (v Vec) Cross(w Vec) Vec {
	return Vec{
		v[1]*w[2] - v[2]*w[1],
		v[2]*w[0] - v[0]*w[2],
		v[0]*w[1] - v[1]*w[0],
	}
}

// Norm returns |v|, without overflow for large components.
func (v Vec) Norm() float64 { return math.Hypot(math.Hypot(v[0], v[1]), v[2]) }

// Unit returns v/|v|, or the zero vector when v is zero.
func (v Vec) Unit() Vec {
	n := v.Norm()
	if n == 0 || math.IsNaN(n) {
		return Vec{}
	}
	return v.Scale(1 / n)
}

// IsNaN reports whether any component is NaN.
func (v Vec) IsNaN() bool {
	return math.IsNaN(v[0]) || math.IsNaN(v[1]) || math.IsNaN(v[2])
}

// nanVec is the vector of unknown components.
func nanVec() Vec { return Vec{math.NaN(), math.NaN(), math.NaN()} }
