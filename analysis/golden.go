package analysis

import "math"

// gridGoldenMin looks for the least value of f on [lo, hi]: f at n evenly
// spaced points from lo to hi, then golden-section search on the bracket
// of the least sample's neighbours (ties keep the first, and the left
// point) for as long as more(a, b, i) holds for the bracket [a, b] at
// step i. It returns the least grid sample and the two inner points'
// values when the search stops; ok is false, and no search is made, when
// no sample is below +∞ (every one infinite or NaN). f sees every point
// evaluated.
//
// Reference: J. Kiefer, "Sequential minimax search for a maximum", Proc.
// AMS 4 (1953) 502 (the golden-section search).
func gridGoldenMin(f func(float64) float64, lo, hi float64, n int, more func(a, b float64, i int) bool) (grid, f1, f2 float64, ok bool) {
	step := (hi - lo) / float64(n-1)
	gi, gv := -1, math.Inf(1)
	for i := range n {
		if v := f(lo + float64(i)*step); v < gv {
			gi, gv = i, v
		}
	}
	if gi < 0 {
		return gv, 0, 0, false
	}
	a, b := lo+float64(max(gi-1, 0))*step, lo+float64(min(gi+1, n-1))*step
	const g = 0.6180339887498949
	x1, x2 := b-g*(b-a), a+g*(b-a)
	f1, f2 = f(x1), f(x2)
	for i := 0; more(a, b, i); i++ {
		if f1 <= f2 {
			b, x2, f2 = x2, x1, f1
			x1 = b - g*(b-a)
			f1 = f(x1)
		} else {
			a, x1, f1 = x1, x2, f2
			x2 = a + g*(b-a)
			f2 = f(x2)
		}
	}
	return gv, f1, f2, true
}
