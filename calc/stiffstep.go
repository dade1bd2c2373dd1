package calc

import "math"

// Stiff steps for the winding's mean temperature alone.
//
// Once the internal lags are held at their driven values (phaseLags), or
// when there are none, the lumped state reduces to one equation,
//
//	dT/dt = f(T) = (s·P(T) − HeatOut(T_s(T))) / C,
//
// whose local time constant 1/|f′(T)| can be microseconds (a few turns of
// fine wire overdriven) against a period of minutes: the explicit
// Runge–Kutta steps of integrate are then held to a few time constants by
// stability alone, whatever their accuracy. Such a phase is finished with
// the implicit (backward) Euler method,
//
//	T₁ = T₀ + h f(T₁)   (solved by Newton's method, f′ by central difference),
//
// taken once over h and twice over h/2 and extrapolated, T = 2 T_{h/2} −
// T_h: second order, and L-stable (its amplification factor
// 2/(1 − z/2)² − 1/(1 − z) tends to 0 as z = h f′ → −∞), so the step grows
// with the solution's own rate of change rather than with its stiffness.
// The difference of the two results estimates the local error, kept within
// integrationTol as for the explicit steps.
//
// Reference: E. Hairer & G. Wanner, Solving Ordinary Differential Equations
// II: Stiff and Differential-Algebraic Problems, 2nd ed., Springer 1996,
// §IV.9 (extrapolation of the linearly implicit and implicit Euler methods)
// and §IV.3 (L-stability).

// explicitBudget is the number of explicit steps a scalar phase is given
// before the rest of it is taken by stiff steps (integrateScalar); a phase
// that is not stiff is over well within it and its result is unchanged.
const explicitBudget = 600

// backwardEuler returns T₁ = T₀ + h f(T₁) by Newton's method (NaN when it
// does not converge: the caller shortens the step).
func backwardEuler(f func(float64) float64, T0, h float64) float64 {
	df := func(T float64) float64 {
		d := 1e-7 * math.Max(1, math.Abs(T))
		return (f(T+d) - f(T-d)) / (2 * d)
	}
	T := T0
	for range 50 {
		g := T - T0 - h*f(T)
		dg := 1 - h*df(T)
		if !(dg != 0) || math.IsNaN(g) {
			return math.NaN()
		}
		dT := g / dg
		T -= dT
		if math.Abs(dT) <= 1e-12*math.Max(1, math.Abs(T)) {
			return T
		}
	}
	return math.NaN()
}

// stiffStep is one extrapolated backward-Euler step of h from T0 and its
// error estimate.
func stiffStep(f func(float64) float64, T0, h float64) (T, err float64) {
	one := backwardEuler(f, T0, h)
	half := backwardEuler(f, T0, h/2)
	two := backwardEuler(f, half, h/2)
	return 2*two - one, math.Abs(two - one)
}

// integrateScalar advances dT/dt = f(T) from T0 over span by stiff steps
// (see the file comment), as integrate does: visit after each accepted
// step, an early stop where stop turns true (located by bisection on the
// last step's length), hmax bounding the step.
func integrateScalar(f func(float64) float64, T0, span, hmax float64, stop func(float64) bool, visit func(t, T float64)) (float64, float64) {
	t, T := 0.0, T0
	h := math.Min(hmax, span/64)
	if !(h > 0) {
		return 0, T0
	}
	for n := 0; t < span && n < 200000; n++ {
		h = math.Min(h, span-t)
		next, err := stiffStep(f, T, h)
		if math.IsNaN(next) || math.IsInf(next, 0) {
			if h > span*1e-12 {
				h *= 0.2
				continue
			}
			return t, math.NaN()
		}
		if err > integrationTol && h > span*1e-12 {
			h *= math.Max(0.2, 0.9*math.Sqrt(integrationTol/err))
			continue
		}
		if stop != nil && stop(next) {
			lo, hi := 0.0, h
			for range 60 {
				mid := (lo + hi) / 2
				if v, _ := stiffStep(f, T, mid); stop(v) {
					hi = mid
				} else {
					lo = mid
				}
			}
			v, _ := stiffStep(f, T, hi)
			if visit != nil {
				visit(t+hi, v)
			}
			return t + hi, v
		}
		t, T = t+h, next
		if visit != nil {
			visit(t, T)
		}
		grow := 5.0
		if err > 0 {
			grow = math.Min(5, 0.9*math.Sqrt(integrationTol/err))
		}
		h = math.Min(h*grow, hmax)
	}
	return t, T
}

// integrateMean advances a state whose lags do not move (f's lag
// derivatives are zero: held at their driven values, or no lag) as
// integrate does, by explicit steps for the first explicitBudget of them
// and by stiff steps for what is left of the span (see the file comment).
// lift returns the full state of a mean temperature.
func integrateMean(f func(state) state, lift func(float64) state, y0 state, span, hmax float64, stop func(state) bool, visit func(float64, state)) (float64, state) {
	t1, y1 := integrateN(f, y0, span, hmax, stop, visit, explicitBudget)
	if t1 >= span || math.IsNaN(y1[0]) || (stop != nil && stop(y1)) {
		return t1, y1
	}
	g := func(T float64) float64 { return f(lift(T))[0] }
	var st func(float64) bool
	if stop != nil {
		st = func(T float64) bool { return stop(lift(T)) }
	}
	var vis func(float64, float64)
	if visit != nil {
		vis = func(s, T float64) { visit(t1+s, lift(T)) }
	}
	t2, T := integrateScalar(g, y1[0], span-t1, hmax, st, vis)
	return t1 + t2, lift(T)
}
