package calc

import "math"

// RectangleInductance returns the low-frequency self-inductance, H, of a
// thin rectangular coil of N turns, sides w and h, whose winding is a round
// bundle of radius ρ ≪ w, h carrying a uniformly distributed current. It is
// the sum of the partial inductances of the four straight sides less the
// mutual inductances of the opposite pairs (perpendicular sides have none):
// a straight conductor of length ℓ has μ0 ℓ/(2π) (ln(2ℓ/ρ) − 1) + μ0 ℓ/(8π),
// two parallel ones ℓ long, d apart, μ0/(2π) (ℓ asinh(ℓ/d) − √(ℓ² + d²) + d)
// (Rosa, Bull. Bur. Standards 4 (1908); Grover, Inductance Calculations,
// 1946, ch. 5). Altogether
//
//	L = μ0 N²/π [w ln(2w/ρ) + h ln(2h/ρ) − 2(w + h) + 2√(w² + h²)
//	             − w asinh(w/h) − h asinh(h/w) + (w + h)/4]
//
// which for a square of side s is 2μ0 N² s/π (ln(s/ρ) − 0.524). NaN when
// the data are out of range or the result is not positive.
func RectangleInductance(w, h, rho float64, N int) float64 {
	if !(w > 0) || !(h > 0) || !(rho > 0) || rho >= math.Min(w, h)/2 {
		return math.NaN()
	}
	d := math.Hypot(w, h)
	n := float64(N)
	L := Mu0 * n * n / math.Pi * (w*math.Log(2*w/rho) + h*math.Log(2*h/rho) - 2*(w+h) + 2*d -
		w*math.Asinh(w/h) - h*math.Asinh(h/w) + (w+h)/4)
	if !(L > 0) {
		return math.NaN()
	}
	return L
}
