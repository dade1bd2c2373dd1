package calc

import "math"

// Frame is a coil's local right-handed orthonormal frame: U is the coil
// axis, E1 and E2 span the coil's plane with E1 × E2 = U.
type Frame struct {
	U, E1, E2 Vec
}

// CoilFrame returns the frame of a coil whose axis is `axis` (any length;
// the zero vector or NaN means +z). E1 is the first of x̂, ŷ, ẑ that is not
// nearly parallel to U (|·U| < 0.9), made orthogonal to U; E2 = U × E1. For
// the axes of the spec: axis z gives (E1, E2) = (x̂, ŷ); axis x gives (ŷ, ẑ);
// axis y gives (x̂, −ẑ). A Rectangle's Width lies along E1 and its Height
// along E2.
func CoilFrame(axis Vec) Frame {
	u := axis.Unit()
	if u == (Vec{}) {
		u = Vec{0, 0, 1}
	}
	var e1 Vec
	for _, c := range []Vec{{1, 0, 0}, {0, 1, 0}, {0, 0, 1}} {
		if math.Abs(c.Dot(u)) < 0.9 {
			e1 = c.Sub(u.Scale(c.Dot(u))).Unit()
			break
		}
	}
	return Frame{U: u, E1: e1, E2: u.Cross(e1)}
}

// ToLocal returns the coordinates (x1, x2, z) of the global vector v in f.
func (f Frame) ToLocal(v Vec) Vec { return Vec{v.Dot(f.E1), v.Dot(f.E2), v.Dot(f.U)} }

// ToGlobal returns the global vector of local coordinates l in f.
func (f Frame) ToGlobal(l Vec) Vec {
	return f.E1.Scale(l[0]).Add(f.E2.Scale(l[1])).Add(f.U.Scale(l[2]))
}
