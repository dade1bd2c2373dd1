package calc

import "math"

// DipoleField returns the field, T, at displacement r from a point magnetic
// dipole of moment m, A·m² (Jackson, Classical Electrodynamics, 3rd ed.,
// eq. 5.56, without the contact term):
//
//	B = μ0/(4π) · (3 (m·r̂) r̂ − m) / |r|³
//
// At r = 0 the field is undefined and NaN results.
func DipoleField(m, r Vec) Vec {
	d := r.Norm()
	if d == 0 {
		return nanVec()
	}
	u := r.Scale(1 / d)
	k := Mu0 / (4 * math.Pi) / (d * d * d)
	return u.Scale(3 * m.Dot(u)).Sub(m).Scale(k)
}

// DipoleRange returns the distance, m, from the centre of the coil block
// along its axis beyond which the dipole field of its moment agrees with
// the exact field within the relative tolerance tol (e.g. 0.01): the
// vector difference |B_dipole − B_exact| ≤ tol·|B_exact| at every distance
// beyond it (see dipoleBeyond). The on-axis error of a loop falls as
// (3/2)(a/z)², so for one thin loop the 1 % distance is about 12.2 a. NaN
// when no current flows, the coil has no extent or no moment (an opposing
// pair), or the tolerance is not positive.
func DipoleRange(c Coil, w Winding, I, tol float64) float64 {
	return dipoleRange(NewCoilSource(c, w, I), w, []Vec{CoilFrame(c.Axis).U}, tol)
}

// DipoleRangePlane is DipoleRange in the plane of the coil (for a pair, its
// mid-plane), through the centre at right angles to the axis. For a
// circular coil every direction in the plane is alike; for a Rectangle the
// largest distance over the directions 0°, 15°, … 90° from its width (by
// its two mirror symmetries these stand for the whole plane) is returned.
// For a thin loop the in-plane field is B = −μ0 m/(4π ρ³) · [1 + (9/8)(a/ρ)²
// + (75/64)(a/ρ)⁴ + …] (the Legendre expansion of the loop's scalar
// potential, Jackson, Classical Electrodynamics, 3rd ed., §5.5, taken at
// θ = π/2), so its 1 % distance is about 10.6 a.
func DipoleRangePlane(c Coil, w Winding, I, tol float64) float64 {
	return dipoleRange(NewCoilSource(c, w, I), w, planeDirections(c, CoilFrame(c.Axis)), tol)
}

// planeDirections are the directions in a coil's mid-plane along which the
// dipole distance is sought: one radius for a circular coil (axial
// symmetry), and for a Rectangle every 15° from the width direction to the
// height direction (its two mirror planes stand for the rest).
func planeDirections(c Coil, fr Frame) []Vec {
	if c.Form != Rectangle {
		return []Vec{fr.E1}
	}
	var dirs []Vec
	for k := 0; k <= 6; k++ {
		s, co := math.Sincos(float64(k) * math.Pi / 12)
		dirs = append(dirs, fr.E1.Scale(co).Add(fr.E2.Scale(s)))
	}
	return dirs
}

// DipoleReach holds the distances, m, from a coil block's centre beyond
// which its point-dipole field is within 1 % and 0.1 % of the exact field,
// on its axis, in its plane, and in any direction (NaN where there is no
// dipole moment).
type DipoleReach struct {
	Axis1, Axis01   float64 // on the axis, 1 % and 0.1 %
	Plane1, Plane01 float64 // in the coil's (mid-)plane, 1 % and 0.1 %
	// Any1, Any01 are the largest over directions from the axis to the
	// plane in 10° steps (for a Rectangle also round the axis in 15°
	// steps): beyond them the dipole field is within tolerance in every
	// direction sampled. The directions between the axis and the plane of
	// one side stand for all of them by the winding's axial symmetry and
	// its symmetry about its mid-plane (a Rectangle's two mirror planes).
	Any1, Any01 float64
}

// DipoleDistances returns the DipoleReach of coil block c (DipoleRange and
// DipoleRangePlane at 1 % and 0.1 %, and the largest over directions).
func DipoleDistances(c Coil, w Winding, I float64) DipoleReach {
	s := NewCoilSource(c, w, I)
	fr := CoilFrame(c.Axis)
	plane := planeDirections(c, fr)
	axis := []Vec{fr.U}
	// Directions strictly between the axis and the plane.
	var between []Vec
	for _, e := range plane {
		for k := 1; k < 9; k++ {
			sn, co := math.Sincos(float64(k) * math.Pi / 18)
			between = append(between, fr.U.Scale(co).Add(e.Scale(sn)))
		}
	}
	r := DipoleReach{
		Axis1: dipoleRange(s, w, axis, 0.01), Axis01: dipoleRange(s, w, axis, 0.001),
		Plane1: dipoleRange(s, w, plane, 0.01), Plane01: dipoleRange(s, w, plane, 0.001),
	}
	r.Any1 = math.Max(math.Max(r.Axis1, r.Plane1), dipoleRange(s, w, between, 0.01))
	r.Any01 = math.Max(math.Max(r.Axis01, r.Plane01), dipoleRange(s, w, between, 0.001))
	return r
}

// dipoleRange returns the largest over dirs of the distance beyond which
// the dipole field of the source's moment is within tol of its exact
// field along that direction from the centre.
func dipoleRange(s *CoilSource, w Winding, dirs []Vec, tol float64) float64 {
	c := s.coil
	m := MagneticMoment(c, w, s.current)
	size := coilExtent(c, w)
	if !(size > 0) || m.Norm() == 0 || m.IsNaN() || !(tol > 0) {
		return math.NaN()
	}
	out := 0.0
	for _, u := range dirs {
		relErr := func(d float64) float64 {
			ex := s.At(c.Centre.Add(u.Scale(d)))
			return DipoleField(m, u.Scale(d)).Sub(ex).Norm() / ex.Norm()
		}
		r := dipoleBeyond(relErr, size, tol)
		if math.IsNaN(r) {
			return r
		}
		out = math.Max(out, r)
	}
	return out
}

// dipoleBeyond returns the distance beyond which relErr(d) ≤ tol for every
// d, searching between the winding's extent `size` and far out. The
// relative error of the dipole field falls as (size/d)² (the next
// multipole) or faster, so it is within tol beyond 10 size/√tol; from
// there the search steps inwards by 2 % until the error first exceeds
// tol, and refines that crossing by bisection to 10⁻⁹. An error that dips
// below tol nearer in (it may pass through zero where the next multipole
// changes sign) does not count. The winding's extent is returned when the
// error is within tol all the way in to it.
func dipoleBeyond(relErr func(float64) float64, size, tol float64) float64 {
	hi := 10 * size / math.Sqrt(tol)
	if !(relErr(hi) <= tol) {
		hi *= 100
		if !(relErr(hi) <= tol) {
			return math.NaN()
		}
	}
	lo := hi
	for {
		lo = hi / 1.02
		if lo <= size {
			if relErr(size) <= tol {
				return size
			}
			lo = size
			break
		}
		if !(relErr(lo) <= tol) {
			break
		}
		hi = lo
	}
	for range 100 {
		mid := math.Sqrt(lo * hi)
		if relErr(mid) <= tol {
			hi = mid
		} else {
			lo = mid
		}
		if hi-lo <= 1e-9*hi {
			break
		}
	}
	return hi
}

// coilExtent is the largest distance of a turn from the block's centre.
func coilExtent(c Coil, w Winding) float64 {
	if c.Form == Rectangle {
		return math.Hypot(c.Width, c.Height) / 2
	}
	e := 0.0
	off := 0.0
	if c.Form == Pair {
		off = math.Abs(c.Spacing) / 2
	}
	for _, l := range w.Layers {
		for _, z := range l.Z {
			e = math.Max(e, math.Hypot(l.Radius, math.Abs(z)+off))
		}
	}
	return e
}
