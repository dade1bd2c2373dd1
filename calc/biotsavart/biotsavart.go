// Package biotsavart integrates the Biot–Savart law numerically along
// circles and polygons of wire,
//
//	B(p) = μ0 I/(4π) ∮ dl × (p − l)/|p − l|³,
//
// by Gauss–Legendre quadrature with gonum's nodes and weights (computed
// once per rule, not per call). It is the project's independent second
// method for the field: it shares no code with calc's closed forms
// (elliptic integrals, straight-segment formulas) or its cross-section
// quadrature, and it imports nothing of the project, so calc's own tests
// can use it as well as the analysis stage's verification rows.
//
// Reference: J. D. Jackson, Classical Electrodynamics, 3rd ed. (1999),
// eq. 5.4 (the law); gonum.org/v1/gonum/integrate/quad (Gauss–Legendre
// nodes).
package biotsavart

import (
	"math"
	"sync"

	"gonum.org/v1/gonum/integrate/quad"
)

// Vec is a point or vector in metres (or teslas): the same layout as
// calc.Vec, so callers convert with a plain conversion.
type Vec = [3]float64

// mu0 is the magnetic constant, N/A² (CODATA 2018, 1.25663706212e-6).
const mu0 = 1.25663706212e-6

type rule struct{ x, w []float64 }

var (
	rulesMu sync.Mutex
	rules   = map[int]rule{}
)

// legendre returns the n-point Gauss–Legendre nodes and weights on [0, 1].
func legendre(n int) rule {
	rulesMu.Lock()
	defer rulesMu.Unlock()
	if r, ok := rules[n]; ok {
		return r
	}
	r := rule{make([]float64, n), make([]float64, n)}
	quad.Legendre{}.FixedLocations(r.x, r.w, 0, 1)
	rules[n] = r
	return r
}

func add(a, b Vec) Vec           { return Vec{a[0] + b[0], a[1] + b[1], a[2] + b[2]} }
func sub(a, b Vec) Vec           { return Vec{a[0] - b[0], a[1] - b[1], a[2] - b[2]} }
func scale(a Vec, s float64) Vec { return Vec{a[0] * s, a[1] * s, a[2] * s} }
func cross(a, b Vec) Vec {
	return Vec{a[1]*b[2] - a[2]*b[1], a[2]*b[0] - a[0]*b[2], a[0]*b[1] - a[1]*b[0]}
}
func norm(a Vec) float64 { return math.Sqrt(a[0]*a[0] + a[1]*a[1] + a[2]*a[2]) }

// Circle is the field at p of current I in a circle of radius a centred
// on c in the plane of the orthonormal vectors e1, e2, flowing from e1
// towards e2, integrated over panels equal arcs, n nodes each.
func Circle(c, e1, e2 Vec, a, I float64, p Vec, panels, n int) Vec {
	r := legendre(n)
	var B Vec
	dphi := 2 * math.Pi / float64(panels)
	for j := range panels {
		for k, x := range r.x {
			phi := (float64(j) + x) * dphi
			s, co := math.Sincos(phi)
			l := add(add(c, scale(e1, a*co)), scale(e2, a*s))
			dl := add(scale(e1, -a*s), scale(e2, a*co))
			d := sub(p, l)
			n := norm(d)
			B = add(B, scale(cross(dl, d), r.w[k]*dphi/(n*n*n)))
		}
	}
	return scale(B, mu0*I/(4*math.Pi))
}

// Polygon is the field at p of current I round the closed polygon of
// vertices k (in order, the last joined to the first), each side
// integrated over panels equal parts, n nodes each.
func Polygon(k []Vec, I float64, p Vec, panels, n int) Vec {
	r := legendre(n)
	var B Vec
	for i := range k {
		a, b := k[i], k[(i+1)%len(k)]
		l := sub(b, a)
		for j := range panels {
			for q, x := range r.x {
				s := (float64(j) + x) / float64(panels)
				d := sub(p, add(a, scale(l, s)))
				n := norm(d)
				B = add(B, scale(cross(l, d), r.w[q]/float64(panels)/(n*n*n)))
			}
		}
	}
	return scale(B, mu0*I/(4*math.Pi))
}
