package biotsavart

import (
	"math"
	"math/rand/v2"
	"testing"
)

// On the axis of a circular loop, B = μ0 I a²/(2 (a² + z²)^{3/2}) along the
// axis (J. D. Jackson, Classical Electrodynamics, 3rd ed., 1999, §5.5,
// eq. 5.40 at θ = 0, recalled from memory; the standard textbook result).
func TestCircleOnAxis(t *testing.T) {
	a, I := 0.03, 2.5
	for _, z := range []float64{0, 0.01, -0.02, 0.1} {
		want := mu0 * I * a * a / (2 * math.Pow(a*a+z*z, 1.5))
		b := Circle(Vec{0, 0, 0}, Vec{1, 0, 0}, Vec{0, 1, 0}, a, I, Vec{0, 0, z}, 1, 96)
		br, bz := CircleLocal(a, I, 0, z, 1, 96)
		if math.Abs(b[2]-want) > 1e-13*want || math.Abs(bz-want) > 1e-13*want {
			t.Errorf("z = %g: Circle %g, CircleLocal %g, want %g", z, b[2], bz, want)
		}
		if math.Abs(b[0])+math.Abs(b[1]) > 1e-12*want || math.Abs(br) > 1e-12*want {
			t.Errorf("z = %g: radial field on the axis %g, %g", z, math.Hypot(b[0], b[1]), br)
		}
	}
}

// CircleLocal is Circle in the loop's frame: at points off the axis, off
// the plane, near and far, in a tilted loop, the two agree to rounding.
func TestCircleLocalMatchesCircle(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	u := Vec{0.3, -0.5, 0.81}
	u = scale(u, 1/norm(u))
	e1 := cross(u, Vec{1, 0, 0})
	e1 = scale(e1, 1/norm(e1))
	e2 := cross(u, e1)
	c := Vec{0.01, -0.02, 0.005}
	a, I := 0.04, -1.7
	for range 200 {
		rho := 0.2 * rng.Float64()
		z := 0.2 * (rng.Float64() - 0.5)
		if math.Abs(rho-a) < 0.005 && math.Abs(z) < 0.005 {
			continue // near the wire the 96-point rule itself is poor
		}
		p := add(c, add(scale(e1, rho), scale(u, z)))
		b := Circle(c, e1, e2, a, I, p, 1, 96)
		br, bz := CircleLocal(a, I, rho, z, 1, 96)
		local := add(scale(e1, br), scale(u, bz))
		if d := norm(sub(b, local)); d > 1e-13*norm(b) {
			t.Fatalf("ρ = %g, z = %g: Circle %v, CircleLocal %v (difference %g)", rho, z, b, local, d/norm(b))
		}
	}
}
