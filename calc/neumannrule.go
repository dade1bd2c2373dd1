package calc

import (
	"math"
	"sync"
)

// Neumann's integral between separated windings by quadrature.
//
// When the turns of two coils lie in spherical shells about their centres
// that do not meet (coils side by side, or one inside the other's hollow),
// the mutual inductance M = Σᵢⱼ M(fᵢ, gⱼ) over all pairs of turn filaments
// is a sum of a function analytic in each filament's position (r, z) in its
// coil's meridian plane: it is singular only where a filament of one coil
// would touch one of the other, at least the shells' gap g away. Each
// coil's turn lattice (lattices, quadrature.go) is then summed with the
// discrete Gauss rule of its turn positions (discreteGauss), whose error
// falls as ϱ^(−2n) with ϱ = a + √(a² − 1) of the Bernstein ellipse through
// the nearest singularity (Trefethen, SIAM Review 50 (2008) 67,
// Theorem 4.5); for a panel of half-width h the singularity is taken at
// half the gap beyond its end, a = 1 + g/(2h), which is on the safe side
// of every direction the singularity can lie in. Panels needing more than
// quadMaxOrder nodes are split, down to the turns themselves.
//
// The remaining integral round each filament of the second coil is the
// trapezoidal rule on P points, geometrically convergent for a periodic
// integrand analytic in the strip |Im θ| < σ: the error is of the order of
// e^(−σP) (Trefethen & Weideman, SIAM Review 56 (2014) 385, Theorem 3.2).
// A circle of radius ρ continued to θ + iσ moves by ρ sinh σ off the real
// space and grows by ρ (cosh σ − 1), so it reaches a singularity no sooner
// than ρ (e^σ − 1) = g: σ = ln(1 + g/ρ). P is chosen for e^(−0.8σP) below
// the target (at most neumannPoints).
//
// Accuracy: the target is ruleEps per direction; against the turn-by-turn
// Neumann sum (every pair of turns, 256 points each) the relative error of
// M and of the force is below 10⁻⁸ on every separated arrangement tested
// (TestRuleCouplingMatchesTurnSum: side by side, inclined, nested, near and
// far). The cost falls with the distance, from the turn sum for touching
// shells to a few filaments of a few points for far coils, which for far
// pairs is the dipole–dipole coupling's cost with its error of
// (size/distance)² removed.

// ruleEps is the target error per direction of the quadrature rules.
const ruleEps = 1e-9

// roundingFloor is the fraction of Σ|terms| below which a sum of terms
// of both signs is rounding, not a result (a hundred times float64's
// epsilon, for sums of up to about 10⁶ terms).
const roundingFloor = 1e-13

// ruleBudget bounds the filament–point evaluations of one pair of
// sub-coils by the rules; above it the cell filaments are used.
const ruleBudget = 4_000_000

// shell returns the radii about the coil centre of the sphere shell that
// holds every filament of the lattices ls (positions relative to the
// centre).
func shell(ls []*lattice) (lo, hi float64) {
	lo, hi = math.Inf(1), 0
	for _, l := range ls {
		p := l.root
		zn := 0.0
		if p.zlo > 0 {
			zn = p.zlo
		} else if p.zhi < 0 {
			zn = -p.zhi
		}
		zf := math.Max(math.Abs(p.zlo), math.Abs(p.zhi))
		lo = math.Min(lo, math.Hypot(p.rlo, zn))
		hi = math.Max(hi, math.Hypot(p.rhi, zf))
	}
	return lo, hi
}

// shellGap returns the least distance between the shells [loA, hiA] about
// ca and [loB, hiB] about cb, or a value ≤ 0 when they meet.
func shellGap(ca Vec, loA, hiA float64, cb Vec, loB, hiB float64) float64 {
	D := cb.Sub(ca).Norm()
	return math.Max(D-hiA-hiB, math.Max(loA-D-hiB, loB-D-hiA))
}

// ruleOrder returns the nodes per direction for a panel of half-width h
// with a singularity gap g away, for error eps (math.MaxInt when none do).
func ruleOrder(h, g, eps float64) int {
	if h == 0 {
		return 1
	}
	a := 1 + g/(2*h)
	rho := a + math.Sqrt(a*a-1)
	n := math.Ceil(math.Log(1/eps) / (2 * math.Log(rho)))
	if !(n < 1e6) {
		return math.MaxInt
	}
	return max(1, int(n))
}

// ruleNodes appends the quadrature filaments (radius, axial position,
// weight in turns) of panel p for a singularity g away.
func ruleNodes(p *panel, g float64, out []cell) []cell {
	hr, hz := (p.rhi-p.rlo)/2, (p.zhi-p.zlo)/2
	// As for the field (panel.field), the integrand grows with the turn's
	// area towards the far side of the ellipse.
	rc := (p.rlo + p.rhi) / 2
	grow := rc / (rc + g)
	qr := min(ruleOrder(hr, g, ruleEps*grow*grow), p.nr)
	qz := min(ruleOrder(hz, g, ruleEps), p.nz)
	if (qr > len(p.rr) || qz > len(p.rz)) && p.kids[0] != nil {
		out = ruleNodes(p.kids[0], g, out)
		return ruleNodes(p.kids[1], g, out)
	}
	qr, qz = min(qr, len(p.rr)), min(qz, len(p.rz))
	rr, rz := p.rr[qr-1], p.rz[qz-1]
	for a, xr := range rr.x {
		for b, xz := range rz.x {
			out = append(out, cell{r: p.ar.at(xr), z: p.az.at(xz), n: (rr.w[a] * p.ar.wmul) * (rz.w[b] * p.az.wmul)})
		}
	}
	return out
}

// rulePoints returns the trapezoidal points round a filament of radius rho
// whose integrand is singular g away (a multiple of 4, 8 … neumannPoints).
func rulePoints(rho, g float64) int {
	sigma := math.Log1p(g / rho)
	p := math.Ceil(math.Log(1/ruleEps) / (0.8 * sigma))
	if !(p < neumannPoints) {
		return neumannPoints
	}
	return max(8, 4*int(math.Ceil(p/4)))
}

var trigCache sync.Map // int → [][2]float64

// trigTable returns cos θᵢ, sin θᵢ at θᵢ = i·2π/n.
func trigTable(n int) [][2]float64 {
	if n == neumannPoints {
		return neumannTrig[:]
	}
	if t, ok := trigCache.Load(n); ok {
		return t.([][2]float64)
	}
	t := make([][2]float64, n)
	for i := range t {
		th := 2 * math.Pi * float64(i) / float64(n)
		t[i] = [2]float64{math.Cos(th), math.Sin(th)}
	}
	trigCache.Store(n, t)
	return t
}

// subRule is one sub-coil of a block as the rules see it.
type subRule struct {
	sc     subCoil
	lo, hi float64 // its shell
}

// rulePairs is the work of a block pair by the rules: per pair of
// sub-coils the filaments of each with their weights and the points per
// filament. ok is false when some pair of shells meet or the work exceeds
// ruleBudget.
type rulePair struct {
	fa, fb []Filament
	na, nb []float64
	points []int // per filament of fb
}

func rulePairs(a Coil, wa Winding, b Coil, wb Winding) ([]rulePair, bool) {
	la, lb := latticesOf(a, wa), latticesOf(b, wb)
	if len(la) == 0 || len(lb) == 0 {
		return nil, false
	}
	loA, hiA := shell(la)
	loB, hiB := shell(lb)
	ua, ub := CoilFrame(a.Axis).U, CoilFrame(b.Axis).U
	var out []rulePair
	for _, sa := range subCoils(a) {
		for _, sb := range subCoils(b) {
			g := shellGap(sa.centre, loA, hiA, sb.centre, loB, hiB)
			if !(g > 0) {
				return nil, false
			}
			var rp rulePair
			var ca, cb []cell
			for _, l := range la {
				ca = ruleNodes(l.root, g, ca)
			}
			for _, l := range lb {
				cb = ruleNodes(l.root, g, cb)
			}
			for _, c := range ca {
				rp.fa = append(rp.fa, Filament{Centre: sa.centre.Add(ua.Scale(c.z)), Axis: ua, Radius: c.r})
				rp.na = append(rp.na, sa.sign*c.n)
			}
			work := 0
			for _, c := range cb {
				rp.fb = append(rp.fb, Filament{Centre: sb.centre.Add(ub.Scale(c.z)), Axis: ub, Radius: c.r})
				rp.nb = append(rp.nb, sb.sign*c.n)
				p := rulePoints(c.r, g)
				rp.points = append(rp.points, p)
				work += p * len(ca)
			}
			if work > ruleBudget {
				return nil, false
			}
			out = append(out, rp)
		}
	}
	return out, true
}

// ruleMutual returns M, H, of blocks a and b by the rules, and false when
// they do not apply (see rulePairs).
func ruleMutual(a Coil, wa Winding, b Coil, wb Winding) (float64, bool) {
	rps, ok := rulePairs(a, wa, b, wb)
	if !ok {
		return 0, false
	}
	M, mag := 0.0, 0.0
	for _, rp := range rps {
		for j, g := range rp.fb {
			trig := trigTable(rp.points[j])
			for i, f := range rp.fa {
				m := rp.na[i] * rp.nb[j] * filamentMutual(f, g, trig)
				M += m
				mag += math.Abs(m)
			}
		}
	}
	// Terms that cancel (flux that one coil's symmetry sends out of the
	// other as much as into it) leave only rounding: below it, M is zero.
	if math.Abs(M) <= roundingFloor*mag {
		return 0, true
	}
	return M, true
}

// ruleForce returns the force, N, on block b (current Ib) from block a
// (current Ia) by the rules, and false when they do not apply.
func ruleForce(a Coil, wa Winding, Ia float64, b Coil, wb Winding, Ib float64) (Vec, bool) {
	rps, ok := rulePairs(a, wa, b, wb)
	if !ok {
		return Vec{}, false
	}
	var F, mag Vec
	for _, rp := range rps {
		for j, g := range rp.fb {
			trig := trigTable(rp.points[j])
			for i, f := range rp.fa {
				t := filamentForce(f, Ia*rp.na[i], g, Ib*rp.nb[j], trig)
				F = F.Add(t)
				mag = mag.Add(Vec{math.Abs(t[0]), math.Abs(t[1]), math.Abs(t[2])})
			}
		}
	}
	// Against the terms' sizes in every direction: a component is
	// rounding when it is below the rounding of the largest.
	floor := roundingFloor * math.Max(mag[0], math.Max(mag[1], mag[2]))
	for k := range F {
		if math.Abs(F[k]) <= floor {
			F[k] = 0 // rounding of terms that cancel, as for M
		}
	}
	return F, true
}
