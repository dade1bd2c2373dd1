package calc

import "math"

// An independent check of the steady hot spot: a finite-volume solution of
// radial conduction across the winding section under the lumped model's
// own assumptions, against which the closed forms of AnnulusRise and the
// heat balance's solution (MeanAtSurface) are checked. The section is the
// annulus of RiseGeometry (inner radius ri, outer ro, length ℓ,
// conductivity k), its bore and ends adiabatic, divided into n rings of
// equal thickness. The heat is generated uniformly, P = duty · PowerOn(T̄)
// at the volume-mean temperature T̄ of the profile (the lumped model's one
// resistance at the mean temperature), so each ring generates P in
// proportion to its volume. The heat generated inside radius r crosses it
// by conduction, −k 2π r ℓ dT/dr = Q(r) (Fourier's law; Incropera &
// DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., §3.5),
// integrated ring by ring inward from the surface, whose temperature T_s
// solves HeatOut(T_s) = P by bisection. The profile and the power are
// iterated to a fixed point. No mean or hot-spot formula is used: the
// profile itself is computed, and its mean fixes the power.
//
// Accuracy: the scheme is of second order in the ring thickness. Against
// the closed form the internal rise (hottest ring and volume mean above
// the surface) is within 6 × 10⁻⁶ of itself at 400 rings for a solid
// round bundle and within 2 × 10⁻⁶ for annuli of any thickness
// (TestAnnulusConductionConverges), so that the hot spot's rise above
// the ambient, of which the internal rise is a part, is within 10⁻⁵ of
// itself.

// ConductionResult is the finite-volume solution of the winding section.
type ConductionResult struct {
	Surface, Mean, HotSpot float64 // K: outer surface, volume mean, hottest ring
	Power                  float64 // W, duty-averaged, of the block
	Iterations             int
	Converged              bool // false also when the balance has no solution (runaway)
}

// WindingConduction solves the winding section of coil c (winding w, heat
// balance tp) on n rings (n < 2: 400). NaN figures when the data are
// missing or no steady state is found.
//
// A multilayer winding, whose end faces are cooled too (RiseEndsCooled),
// is solved over its two-dimensional section instead (SectionConduction,
// n across the smaller of its depth and half length): its rises per watt
// are fixed by the conduction alone, and the power at the profile's mean
// temperature and the surface temperature at that power are iterated to
// a fixed point as for the rings.
func WindingConduction(c Coil, w Winding, tp ThermalProblem, n int) ConductionResult {
	ri, ro, l := RiseGeometry(c, w)
	if RiseEndsCooled(c, w) {
		if n < 16 {
			n = 100
		}
		mean, max := SectionConduction(ri, ro, l, WindingConductivity(c), n)
		return sectionBalance(tp, mean, max, float64(SeriesCoils(c)))
	}
	return AnnulusConduction(tp, ri, ro, l, WindingConductivity(c), float64(SeriesCoils(c)), n)
}

// sectionBalance iterates the power P = HeatIn(T̄) at the mean
// temperature T̄ = T_s(P) + mean·P/coils, T_s the surface temperature at
// which HeatOut(T_s) = P, to a fixed point, the rises mean and max in K/W
// of one coil's power.
func sectionBalance(tp ThermalProblem, mean, max, coils float64) ConductionResult {
	nan := math.NaN()
	res := ConductionResult{Surface: nan, Mean: nan, HotSpot: nan, Power: nan}
	if math.IsNaN(mean) || math.IsNaN(max) || !(coils >= 1) {
		return res
	}
	T := tp.Ambient
	for it := 1; it <= 500; it++ {
		P := tp.HeatIn(T)
		Ts := tp.surfaceFor(P)
		if math.IsNaN(Ts) || math.IsNaN(P) {
			return res
		}
		next := Ts + mean*P/coils
		if math.IsNaN(next) || next > runawayCeiling {
			return res
		}
		diff := math.Abs(next - T)
		T = next
		res.Iterations = it
		if diff <= 1e-10*math.Max(1, T-tp.Ambient) {
			P = tp.HeatIn(T)
			Ts = tp.surfaceFor(P)
			res.Converged = true
			res.Surface, res.Power, res.Mean, res.HotSpot = Ts, P, Ts+mean*P/coils, Ts+max*P/coils
			return res
		}
	}
	return ConductionResult{Surface: nan, Mean: nan, HotSpot: nan, Power: nan, Iterations: res.Iterations}
}

// AnnulusConduction is WindingConduction for an annulus ri..ro of length l
// and conductivity k, counted coils times (a pair's two coils share the
// power and the surface equally), on n rings (n < 2: 400).
func AnnulusConduction(tp ThermalProblem, ri, ro, l, k, coils float64, n int) ConductionResult {
	nan := math.NaN()
	res := ConductionResult{Surface: nan, Mean: nan, HotSpot: nan, Power: nan}
	if !(ri >= 0) || !(ro > ri) || !(l > 0) || !(k > 0) || !(coils >= 1) || math.IsInf(ro, 0) {
		return res
	}
	if n < 2 {
		n = 400
	}
	dr := (ro - ri) / float64(n)
	vol := make([]float64, n) // per coil, rings from the bore outward
	for j := range vol {
		a, b := ri+float64(j)*dr, ri+float64(j+1)*dr
		vol[j] = math.Pi * (b*b - a*a) * l
	}
	T := make([]float64, n)
	for j := range T {
		T[j] = tp.Ambient
	}
	vsum := sumOf(vol)
	inside := make([]float64, n+1) // share of the power generated inside face j
	for j, v := range vol {
		inside[j+1] = inside[j] + v/vsum
	}
	next := make([]float64, n)
	for it := 1; it <= 500; it++ {
		// Volume-mean temperature and the block's power at it.
		vs := 0.0
		for j, v := range vol {
			vs += v * T[j]
		}
		P := tp.HeatIn(vs / vsum)
		Ts := tp.surfaceFor(P)
		if math.IsNaN(Ts) || math.IsNaN(P) {
			return res
		}
		Q := func(j int) float64 { return P / coils * inside[j] } // W crossing face j, per coil
		// Outer half ring: from the surface (face n) to the centre of ring n−1.
		rc := func(j int) float64 { return ri + (float64(j)+0.5)*dr }
		face := func(j int) float64 { return ri + float64(j)*dr }
		// Within ring j the heat crossing radius r is Q(j) plus the
		// ring's share generated between its inner face and r, taken as
		// the mean of the two faces' values over each half ring.
		tc := Ts + (Q(n)+(Q(n-1)+Q(n))/2)/2*math.Log(face(n)/rc(n-1))/(2*math.Pi*k*l)
		next[n-1] = tc
		for j := n - 2; j >= 0; j-- {
			// From the centre of ring j+1 to that of ring j, across face j+1.
			tc += Q(j+1) * math.Log(rc(j+1)/rc(j)) / (2 * math.Pi * k * l)
			next[j] = tc
		}
		diff := 0.0
		for j := range T {
			diff = math.Max(diff, math.Abs(next[j]-T[j]))
			T[j] = next[j]
		}
		if math.IsNaN(diff) || T[0] > runawayCeiling {
			return res
		}
		res.Iterations = it
		if diff <= 1e-10*math.Max(1, T[0]-tp.Ambient) {
			res.Converged = true
			res.Surface, res.Power = Ts, P
			break
		}
	}
	if !res.Converged {
		return ConductionResult{Surface: nan, Mean: nan, HotSpot: nan, Power: nan, Iterations: res.Iterations}
	}
	vs := 0.0
	for j, v := range vol {
		vs += v * T[j]
	}
	res.Mean = vs / vsum
	res.HotSpot = T[0]
	for _, t := range T {
		res.HotSpot = math.Max(res.HotSpot, t)
	}
	return res
}

func sumOf(xs []float64) float64 {
	s := 0.0
	for _, x := range xs {
		s += x
	}
	return s
}

// surfaceFor returns the surface temperature, K, at which HeatOut equals
// P ≥ 0 (bisection; HeatOut rises with the surface temperature); NaN when
// none lies below max(TempSearchMax, Ta + 1) K.
func (tp ThermalProblem) surfaceFor(P float64) float64 {
	lo := tp.Ambient
	if !(P > 0) {
		return lo
	}
	top := math.Max(TempSearchMax, lo+1)
	hi := lo + 1
	for tp.HeatOut(hi) < P {
		if hi >= top {
			return math.NaN()
		}
		lo, hi = hi, math.Min(top, tp.Ambient+2*(hi-tp.Ambient))
	}
	for range 200 {
		mid := lo + (hi-lo)/2
		if mid <= lo || mid >= hi {
			break
		}
		if tp.HeatOut(mid) < P {
			lo = mid
		} else {
			hi = mid
		}
	}
	return lo + (hi-lo)/2
}

// SectionConduction returns the rises, K/W, of the volume mean and of the
// hottest point above the surface of SectionRise's section (bore
// adiabatic, outer cylinder and end faces at the surface temperature,
// uniform generation, isotropic conductivity k), by finite volumes: the
// half section 0 ≤ z ≤ ℓ/2 (the mid-plane a plane of symmetry) is cut into
// nr × nz cells, the flux between neighbours the difference of their
// centre temperatures over their distance (the radial faces weighted by
// their radius), half a cell to a held face. The discrete system is solved
// exactly: its axial part, a symmetric tridiagonal matrix, has the
// eigenvectors cos(μ_p z_j), μ_p = (2p+1)π/ℓ at the cell centres z_j, with
// eigenvalues (4/Δz²) sin²(μ_p Δz/2) (the discrete cosine transform of
// the fourth kind), which leaves one tridiagonal radial system per p
// (Thomas algorithm). No Bessel function or continuous series is used.
// The mean is the cells' volume-weighted mean, the hottest point the cell
// at the bore in the mid-plane; both are taken on nr × nz and 2nr × 2nz
// cells and extrapolated (Richardson: the scheme is of second order, and
// so is the half-cell offset of that cell from the bore's mid-point).
// The cells are about square, n across the smaller of the depth and the
// half length (n < 16: 100), and at most 600 along the other.
//
// Accuracy (TestSectionConductionConverges): against SectionRise within
// 10⁻⁶ of the rise for sections from a fiftieth to fifty depths long at
// n = 100, and within 10⁻⁴ up to a thousand depths, where the cap of 600
// cells stretches them. NaN for bad data.
func SectionConduction(ri, ro, l, k float64, n int) (mean, max float64) {
	if !(ri >= 0) || !(ro > ri) || !(l > 0) || !(k > 0) || math.IsInf(ro, 0) || math.IsInf(l, 0) {
		return math.NaN(), math.NaN()
	}
	if n < 16 {
		n = 100
	}
	d, half := ro-ri, l/2
	h := math.Min(d, half) / float64(n)
	cells := func(x float64) int { return int(math.Min(600, math.Max(16, math.Round(x/h)))) }
	nr, nz := cells(d), cells(half)
	m1, x1 := sectionFV(ri, ro, l, nr, nz)
	m2, x2 := sectionFV(ri, ro, l, 2*nr, 2*nz)
	q := 1 / (math.Pi * (ro*ro - ri*ri) * l) // per watt
	return q / k * (4*m2 - m1) / 3, q / k * (4*x2 - x1) / 3
}

// sectionFV solves SectionConduction's cells for q/k = 1 and returns the
// volume-mean rise and that of the cell at the bore in the mid-plane, m².
func sectionFV(ri, ro, l float64, nr, nz int) (mean, corner float64) {
	dr := (ro - ri) / float64(nr)
	dz := l / 2 / float64(nz)
	rc := make([]float64, nr) // cell centres
	w := make([]float64, nr)  // cell volumes per unit angle and dz: r dr
	for i := range rc {
		rc[i] = ri + (float64(i)+0.5)*dr
		w[i] = rc[i] * dr
	}
	vol := 0.0
	for _, v := range w {
		vol += v
	}
	// Radial operator per unit volume: lo[i] T[i−1] + di[i] T[i] + up[i] T[i+1].
	lo, di, up := make([]float64, nr), make([]float64, nr), make([]float64, nr)
	for i := range rc {
		if i > 0 {
			f := (ri + float64(i)*dr) / (rc[i] * dr * dr)
			lo[i], di[i] = -f, di[i]+f
		}
		if i < nr-1 {
			f := (ri + float64(i+1)*dr) / (rc[i] * dr * dr)
			up[i], di[i] = -f, di[i]+f
		} else {
			di[i] += 2 * ro / (rc[i] * dr * dr) // to the held outer face, half a cell away
		}
	}
	cp, dp := make([]float64, nr), make([]float64, nr)
	for p := range nz {
		mu := (2*float64(p) + 1) * math.Pi / l
		s := math.Sin(mu * dz / 2)
		eig := 4 * s * s / (dz * dz)
		// Σ_j cos(μ_p z_j) = sin(nz μ_p Δz)/(2 sin(μ_p Δz/2)) = (−1)^p/(2 s):
		// the uniform source's coefficient is 2/nz times it, and the
		// cells' mean of cos(μ_p z_j) 1/nz times it.
		cs := 1 / (2 * s)
		if p%2 == 1 {
			cs = -cs
		}
		src := 2 / float64(nz) * cs
		// Thomas algorithm on (radial + eig) T̂ = src.
		for i := range nr {
			b := di[i] + eig
			rhs := src
			if i > 0 {
				b -= lo[i] * cp[i-1]
				rhs -= lo[i] * dp[i-1]
			}
			cp[i] = up[i] / b
			dp[i] = rhs / b
		}
		t := dp[nr-1]
		vs := t * w[nr-1]
		for i := nr - 2; i >= 0; i-- {
			t = dp[i] - cp[i]*t
			vs += t * w[i]
		}
		// t is now T̂_p at the bore's cell.
		mean += vs / vol * cs / float64(nz)
		corner += t * math.Cos(mu*dz/2)
	}
	return mean, corner
}
