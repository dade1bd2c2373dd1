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

// circleNodes holds, for one (panels, n) rule round a circle, the sine
// and cosine of every node's angle φ = (j + x_k)·2π/panels (panel j, node
// x_k on [0, 1]) and its weight, in the order Circle sums them.
type circleNodes struct {
	sin, cos, w []float64
	dphi        float64
}

var circleRules sync.Map // [2]int{panels, n} → *circleNodes

// circleRule returns the nodes of Circle's rule, computed once per rule
// (the same values Circle would compute per call, so the sums are the
// same to the bit).
func circleRule(panels, n int) *circleNodes {
	key := [2]int{panels, n}
	if v, ok := circleRules.Load(key); ok {
		return v.(*circleNodes)
	}
	r := legendre(n)
	cn := &circleNodes{dphi: 2 * math.Pi / float64(panels)}
	for j := range panels {
		for k, x := range r.x {
			s, co := math.Sincos((float64(j) + x) * cn.dphi)
			cn.sin = append(cn.sin, s)
			cn.cos = append(cn.cos, co)
			cn.w = append(cn.w, r.w[k])
		}
	}
	v, _ := circleRules.LoadOrStore(key, cn)
	return v.(*circleNodes)
}

// Circle is the field at p of current I in a circle of radius a centred
// on c in the plane of the orthonormal vectors e1, e2, flowing from e1
// towards e2, integrated over panels equal arcs, n nodes each.
func Circle(c, e1, e2 Vec, a, I float64, p Vec, panels, n int) Vec {
	r := circleRule(panels, n)
	var B Vec
	dphi := r.dphi
	for k, s := range r.sin {
		co := r.cos[k]
		l := add(add(c, scale(e1, a*co)), scale(e2, a*s))
		dl := add(scale(e1, -a*s), scale(e2, a*co))
		d := sub(p, l)
		n := norm(d)
		B = add(B, scale(cross(dl, d), r.w[k]*dphi/(n*n*n)))
	}
	return scale(B, mu0*I/(4*math.Pi))
}

// CircleLocal is Circle in the circle's own frame: the field of current I
// in the circle of radius a about the z axis in the plane z = 0, at the
// point a distance rho from the axis and z from the plane, as its radial
// and axial components. With the point on the x axis of that frame
// (φ = 0) the integrand reduces to
//
//	dl × (p − l) = a (z cos φ, z sin φ, a − ρ cos φ) dφ,
//	|p − l|² = ρ² + a² + z² − 2aρ cos φ,
//
// whose y component is odd in φ about π and integrates to zero; the x
// and z components are summed over the same nodes as Circle, so the two
// agree to rounding (a relative difference of order 10⁻¹⁶), at a fraction
// of the cost: no vectors are built per node and the same rule serves
// every turn.
func CircleLocal(a, I, rho, z float64, panels, n int) (brho, bz float64) {
	r := circleRule(panels, n)
	q := rho*rho + a*a + z*z
	for k, co := range r.cos {
		d2 := q - 2*a*rho*co
		f := r.w[k] / (d2 * math.Sqrt(d2))
		brho += z * co * f
		bz += (a - rho*co) * f
	}
	c := mu0 * I / (4 * math.Pi) * a * r.dphi
	return c * brho, c * bz
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
