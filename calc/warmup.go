package calc

import (
	"math"
	"strings"
)

// Warm-up, time to the insulation limit and the periodic state of an
// on/off duty cycle. The winding (and its former, when given) is one
// lumped thermal mass of heat capacity C at its mean temperature T. Its
// surface lies below the mean by u and its hottest point above the mean by
// x; both internal rises follow the power with the winding's internal time
// constant τ_i (ThermalProblem.InternalTau), as the gradient of a conducting
// body builds up and relaxes by diffusion, not at once:
//
//	C dT/dt = s(t) · P(T) − HeatOut(T − u),  s = 1 on, 0 off
//	τ_i du/dt = RiseMean · s(t) P(T) − u
//	τ_i dx/dt = (RiseMax − RiseMean) · s(t) P(T) − x
//
// (with τ_i = 0, u and x take their quasi-steady values at once). The
// surface is never taken below the ambient while the winding is warmer than
// it: heat generated inside cannot make the surface colder than its
// surroundings (maximum principle), which matters only in a runaway, where
// the lumped relation would otherwise put the surface below ambient.
//
// The lag of u matters for duty cycles: a winding cycled faster than τ_i
// keeps the gradient of the average power, and its surface does not swing
// by RiseMean × P with every switching (which, the losses being convex in the
// surface temperature, would shed more heat than the average-power state
// and put the cycle's temperatures below it).
//
// Integrated with the classical fourth-order Runge–Kutta method under
// step-doubling error control (each step is taken once whole and once as two
// halves; their difference estimates the error, the step is rejected or
// resized to keep it within integrationTol, and the two results are
// combined by Richardson extrapolation: Press, Teukolsky, Vetterling &
// Flannery, Numerical Recipes, 3rd ed., 2007, §17.2). gonum offers no
// general ODE solver, so this one is ours.

// integrationTol is the largest local error, K, accepted per step.
const integrationTol = 1e-6

// Former is the coil former (bobbin) whose heat capacity is lumped with the
// winding's; per coil (each coil of a pair has its own).
type Former struct {
	Material     string  // material name as given ("" when not given)
	Mass         float64 // kg (0: not given)
	SpecificHeat float64 // J/(kg·K), from FormerMaterials
	HeatCapacity float64 // J/K, when given directly (then Mass is 0)
}

// Capacity returns the former's heat capacity, J/K: HeatCapacity when
// given, else Mass × SpecificHeat (0 when nothing is given).
func (f Former) Capacity() float64 {
	if f.HeatCapacity > 0 {
		return f.HeatCapacity
	}
	if f.Mass > 0 && f.SpecificHeat > 0 {
		return f.Mass * f.SpecificHeat
	}
	return 0
}

// incroperaA1 is the table the metal formers' specific heats come from.
const incroperaA1 = "Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1"

// FormerMaterial is a former material's specific heat near room
// temperature with its source.
type FormerMaterial struct {
	Name         string
	SpecificHeat float64 // J/(kg·K)
	Source       string
}

// FormerMaterials are the former materials the spec names. Metals from
// Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed.,
// Table A.1, c_p at 300 K (pure aluminium 903, pure copper 385 and
// cartridge brass 380 J/(kg·K) read from a reproduction of the table;
// AISI 304's 477 recalled from memory); plastics are typical data-sheet
// values (common practice; grades differ by ±10 %).
var FormerMaterials = []FormerMaterial{
	{"aluminium", 903, incroperaA1 + ", pure aluminium at 300 K"},
	{"brass", 380, incroperaA1 + ", cartridge brass (70 % Cu, 30 % Zn) at 300 K"},
	{"copper", 385, incroperaA1 + ", pure copper at 300 K"},
	{"stainless-steel", 477, incroperaA1 + ", AISI 304 at 300 K"},
	{"peek", 1340, "typical data-sheet value (common practice)"},
	{"nylon", 1670, "typical data-sheet value for PA 66 (common practice)"},
	{"acrylic", 1470, "typical data-sheet value for PMMA (common practice)"},
	{"ptfe", 1000, "typical data-sheet value (common practice)"},
	{"fr4", 1100, "typical data-sheet value for glass–epoxy laminate (common practice)"},
}

// FormerMaterialByName returns the former material of that name
// (case-insensitive; also aluminum, stainless, pmma, pa66, g10).
func FormerMaterialByName(name string) (FormerMaterial, bool) {
	n := strings.ToLower(strings.TrimSpace(name))
	switch n {
	case "aluminum":
		n = "aluminium"
	case "stainless", "stainless steel":
		n = "stainless-steel"
	case "pmma":
		n = "acrylic"
	case "pa66", "pa 66", "polyamide":
		n = "nylon"
	case "g10", "g-10", "fr-4":
		n = "fr4"
	}
	for _, m := range FormerMaterials {
		if m.Name == n {
			return m, true
		}
	}
	return FormerMaterial{}, false
}

// HeatCapacity returns the heat capacity, J/K, of coil block c with winding
// w: conductor mass × the conductor's specific heat plus the former, per
// coil, × SeriesCoils, plus the core's (CoreHeatCapacity). Insulation and
// impregnation are left out (they add a few per cent and make the warm-up
// a little slower than computed).
func HeatCapacity(c Coil, w Winding) float64 {
	return float64(SeriesCoils(c))*(w.Mass*c.Wire.Material.SpecificHeat+c.Former.Capacity()) + CoreHeatCapacity(c)
}

// DefaultCoreSpecificHeat is the specific heat taken for a core when none
// is stated, J/(kg·K): pure iron at 300 K, 447 J/(kg·K) (Incropera &
// DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1,
// recalled from memory; pure nickel 444 J/(kg·K) in the same table, and
// the nickel–iron and silicon–iron alloys of soft-magnetic cores lie close
// to these). Ferrites have more, about 700–800 J/(kg·K) (typical
// data-sheet values): for them the default understates the heat capacity,
// and the warm-up computed runs faster than the coil's, on the hot side.
const DefaultCoreSpecificHeat = 447

// CoreSpecificHeatSource names where DefaultCoreSpecificHeat comes from,
// as the memo cites it (the value was recalled from memory, see above;
// the citation is the table it is recalled from).
const CoreSpecificHeatSource = "pure iron at 300 K, Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1"

// Mass returns the rod's mass, kg: density × π d²/4 × length; 0 without a
// density or without a core.
func (k Core) Mass() float64 {
	if !k.Present() || !(k.Density > 0) {
		return 0
	}
	return k.Density * math.Pi * k.Diameter * k.Diameter / 4 * k.Length
}

// SpecificHeatUsed returns the core's specific heat as used, J/(kg·K):
// the stated one, else DefaultCoreSpecificHeat.
func (k Core) SpecificHeatUsed() float64 {
	if k.SpecificHeat > 0 {
		return k.SpecificHeat
	}
	return DefaultCoreSpecificHeat
}

// CoreHeatCapacity returns the heat capacity, J/K, of coil c's core that
// is lumped with the winding's: the rod's mass × its specific heat, the rod
// taken to be in thermal contact with the winding's bore so that it warms
// with the winding as one mass (the contact is not modelled; a rod held
// apart from the winding warms later, and the winding then faster). 0
// without a core, or without a core density (its mass is then unknown).
func CoreHeatCapacity(c Coil) float64 {
	return c.Core.Mass() * c.Core.SpecificHeatUsed()
}

// state is the lumped thermal state: the winding's mean temperature (K),
// the rise of its hottest point above the mean (K) and the drop of its
// surface below the mean (K), the two rises lagging the power with the
// winding's internal time constant (see InternalTau).
type state [3]float64

func (y state) add(k state, h float64) state {
	return state{y[0] + h*k[0], y[1] + h*k[1], y[2] + h*k[2]}
}

// rk4Step advances dy/dt = f(y) by one classical Runge–Kutta step of h.
func rk4Step(f func(state) state, y state, h float64) state {
	k1 := f(y)
	k2 := f(y.add(k1, h/2))
	k3 := f(y.add(k2, h/2))
	k4 := f(y.add(k3, h))
	var out state
	for i := range out {
		out[i] = y[i] + h/6*(k1[i]+2*k2[i]+2*k3[i]+k4[i])
	}
	return out
}

// integrate advances dy/dt = f(y) from y0 over the time span with step
// control (see the file comment; the error is the largest of the
// components'), calling visit(t, y) after each accepted step (t from 0).
// It stops early, returning the time and value, when stop(y) turns true,
// the crossing located by bisection on the last step's length; else it
// returns (span, y(span)). hmax bounds the step.
func integrate(f func(state) state, y0 state, span, hmax float64, stop func(state) bool, visit func(t float64, y state)) (float64, state) {
	return integrateN(f, y0, span, hmax, stop, visit, 200000)
}

// integrateN is integrate with at most steps attempted steps; it returns
// where it got to when they run out.
func integrateN(f func(state) state, y0 state, span, hmax float64, stop func(state) bool, visit func(t float64, y state), steps int) (float64, state) {
	t, y := 0.0, y0
	h := math.Min(hmax, span/64)
	if !(h > 0) {
		return 0, y0
	}
	nan := state{math.NaN(), math.NaN(), math.NaN()}
	for n := 0; t < span && n < steps; n++ {
		h = math.Min(h, span-t)
		one := rk4Step(f, y, h)
		half := rk4Step(f, y, h/2)
		two := rk4Step(f, half, h/2)
		err := 0.0
		for i := range two {
			err = math.Max(err, math.Abs(two[i]-one[i]))
			if math.IsNaN(two[i]) {
				err = math.NaN()
			}
		}
		if math.IsNaN(err) || math.IsInf(two[0], 0) {
			// A step too long for the stiff internal lags (or one that
			// overshoots out of the data's range): retry shorter.
			if h > span*1e-12 {
				h *= 0.2
				continue
			}
			return t, nan
		}
		if err > integrationTol && h > span*1e-12 {
			h *= math.Max(0.2, 0.9*math.Pow(integrationTol/err, 0.2))
			continue
		}
		var next state
		for i := range next {
			next[i] = two[i] + (two[i]-one[i])/15
		}
		if stop != nil && stop(next) {
			lo, hi := 0.0, h
			for range 60 {
				mid := (lo + hi) / 2
				if stop(rk4Step(f, y, mid)) {
					hi = mid
				} else {
					lo = mid
				}
			}
			yv := rk4Step(f, y, hi)
			if visit != nil {
				visit(t+hi, yv)
			}
			return t + hi, yv
		}
		t, y = t+h, next
		if visit != nil {
			visit(t, y)
		}
		grow := 5.0
		if err > 0 {
			grow = math.Min(5, 0.9*math.Pow(integrationTol/err, 0.2))
		}
		h = math.Min(h*grow, hmax)
	}
	return t, y
}

// extraRise is the steady rise of the hottest point above the mean per
// watt, K/W.
func (tp ThermalProblem) extraRise() float64 { return tp.RiseMax - tp.RiseMean }

// surfaceOf returns the surface temperature, K, of state y with the power
// on (p W) or off: T − u when the internal rise lags, else T − RiseMean·p
// (T when off); never below the ambient unless the mean itself is.
func (tp ThermalProblem) surfaceOf(y state, p float64) float64 {
	T := y[0]
	drop := tp.RiseMean * p
	if tp.InternalTau > 0 {
		drop = y[2]
	}
	return math.Max(T-drop, math.Min(T, tp.Ambient))
}

// rate returns the derivative of the lumped state with the power on (on)
// or off, for heat capacity C (see the file comment).
func (tp ThermalProblem) rate(C float64, on bool) func(state) state {
	return func(y state) state {
		p := 0.0
		if on {
			p = tp.PowerOn(y[0])
		}
		var dx, du float64
		if tp.InternalTau > 0 {
			dx = (tp.extraRise()*p - y[1]) / tp.InternalTau
			du = (tp.RiseMean*p - y[2]) / tp.InternalTau
		}
		return state{(p - tp.HeatOut(tp.surfaceOf(y, p))) / C, dx, du}
	}
}

// lagSettle is how many internal time constants the lags are integrated
// for before phase holds them at their driven values (e^−40 of their
// start is left).
const lagSettle = 40

// phase integrates one on (on) or off period of span seconds from y, as
// integrate does with rate(C, on). When the internal lags' time constant is
// short against the period (span above 5·lagSettle·τ), the explicit step
// would stay bound to a few τ over the whole period (a stiff system, up to
// integrate's step limit): the lags are then integrated with the rest for
// lagSettle·τ, by when they follow the power they are driven by, and held
// at those driven values, x = (RiseMax − RiseMean)·P and u = RiseMean·P,
// for the rest of the period. What that leaves out is the lag itself,
// about τ times the power's rate of change, against thermal time constants
// that are longer by the same factor.
func (tp ThermalProblem) phase(C float64, on bool, y state, span, hmax float64, stop func(state) bool, visit func(float64, state)) (float64, state) {
	// A winding whose own heat balance settles in a small part of the
	// period (a few turns of fine wire on a large former: microseconds
	// against minutes) is a stiff system for the explicit steps as well:
	// it is integrated until settled, checked to have reached its balance
	// (the rate of change times the settling time below 10⁻⁹ K), and held
	// there to the period's end.
	if tth := tp.ThermalTimeConstant(C, y[0]); tth > 0 && span > 5*lagSettle*math.Max(tth, tp.InternalTau) {
		tq := lagSettle * math.Max(tth, tp.InternalTau)
		t1, y1 := tp.phaseLags(C, on, y, tq, math.Min(hmax, tq/8), stop, visit)
		if t1 < tq || math.IsNaN(y1[0]) || (stop != nil && stop(y1)) {
			return t1, y1
		}
		d := tp.rate(C, on)(y1)
		if math.Abs(d[0])*tq < 1e-9 && math.Abs(d[1])*tq < 1e-9 && math.Abs(d[2])*tq < 1e-9 {
			if visit != nil {
				visit(span, y1)
			}
			return span, y1
		}
		var vis func(float64, state)
		if visit != nil {
			vis = func(s float64, v state) { visit(tq+s, v) }
		}
		t2, y2 := tp.phaseLags(C, on, y1, span-tq, hmax, stop, vis)
		return tq + t2, y2
	}
	return tp.phaseLags(C, on, y, span, hmax, stop, visit)
}

// phaseLags is phase with the lags held once settled (see phase).
func (tp ThermalProblem) phaseLags(C float64, on bool, y state, span, hmax float64, stop func(state) bool, visit func(float64, state)) (float64, state) {
	tl := lagSettle * tp.InternalTau
	if !(tp.InternalTau > 0) {
		// No lag: the rises keep their values and the mean alone moves.
		lift := func(T float64) state { return state{T, y[1], y[2]} }
		return integrateMean(tp.rate(C, on), lift, y, span, hmax, stop, visit)
	}
	if !(span > 5*tl) {
		return integrate(tp.rate(C, on), y, span, hmax, stop, visit)
	}
	t1, y1 := integrate(tp.rate(C, on), y, tl, math.Min(hmax, tl/8), stop, visit)
	if t1 < tl || math.IsNaN(y1[0]) || (stop != nil && stop(y1)) {
		return t1, y1
	}
	power := func(T float64) float64 {
		if on {
			return tp.PowerOn(T)
		}
		return 0
	}
	slave := func(v state) state {
		p := power(v[0])
		return state{v[0], tp.extraRise() * p, tp.RiseMean * p}
	}
	f := func(v state) state {
		v = slave(v)
		p := power(v[0])
		return state{(p - tp.HeatOut(tp.surfaceOf(v, p))) / C, 0, 0}
	}
	var vis func(float64, state)
	if visit != nil {
		vis = func(s float64, v state) { visit(tl+s, slave(v)) }
	}
	st := stop
	if stop != nil {
		st = func(v state) bool { return stop(slave(v)) }
	}
	lift := func(T float64) state { return slave(state{T}) }
	t2, y2 := integrateMean(f, lift, slave(y1), span-tl, hmax, st, vis)
	return tl + t2, slave(y2)
}

// hotSpot returns the hottest winding temperature, K, of state y with the
// power on or off: T + x when the internal rise lags (InternalTau > 0),
// else T + (RiseMax − RiseMean) P(T) with the power on and T with it off.
func (tp ThermalProblem) hotSpot(y state, on bool) float64 {
	switch {
	case tp.InternalTau > 0:
		return y[0] + y[1]
	case on:
		return tp.HotSpotOn(y[0])
	}
	return y[0]
}

// HotSpotOn returns the hottest winding temperature, K, at mean
// temperature T with the power on, the internal rise settled:
// T + (RiseMax − RiseMean) · P(T).
func (tp ThermalProblem) HotSpotOn(T float64) float64 {
	return T + tp.extraRise()*tp.PowerOn(T)
}

// runawayCeiling is the temperature, K, at which an integration gives up:
// far beyond any insulation.
const runawayCeiling = 2 * TempSearchMax

// TimeToReach returns the time, s, in which the hot spot of a winding
// energised continuously from ambient (no duty cycle) reaches the
// temperature limit (K), for heat capacity C (J/K); NaN when it never does
// (its steady hot spot stays below the limit) or within tMax.
func (tp ThermalProblem) TimeToReach(C, limit, tMax float64) float64 {
	if !(C > 0) || !(limit > tp.Ambient) || !(tMax > 0) {
		return math.NaN()
	}
	on := tp
	on.Duty = 1
	if s := on.Steady(); s.Settled && s.HotSpot < limit {
		return math.NaN()
	}
	stop := func(y state) bool { return on.hotSpot(y, true) >= limit }
	t, y := integrate(on.rate(C, true), state{tp.Ambient, 0, 0}, tMax, tMax/50, stop, nil)
	if math.IsNaN(y[0]) || !stop(y) {
		return math.NaN()
	}
	return t
}

// WarmUpCurve returns the warm-up from ambient over tEnd (s) for heat
// capacity C: sample times, mean and hot-spot temperatures. With onTime > 0
// and 0 < duty < 1 the power is switched on for onTime and off for
// onTime·(1/duty − 1), repeatedly; otherwise it stays on. Samples are the
// accepted integration steps, at most tEnd/200 apart.
func (tp ThermalProblem) WarmUpCurve(C, tEnd, onTime float64) (t, mean, hot []float64) {
	t, mean, hot = []float64{0}, []float64{tp.Ambient}, []float64{tp.Ambient}
	if !(C > 0) || !(tEnd > 0) {
		return
	}
	cycling := onTime > 0 && tp.Duty > 0 && tp.Duty < 1
	offTime := 0.0
	if cycling {
		offTime = onTime * (1/tp.Duty - 1)
	}
	hmax := tEnd / 200
	y := state{tp.Ambient, 0, 0}
	t0 := 0.0
	ceiling := func(y state) bool { return y[0] >= runawayCeiling }
	for t0 < tEnd && !ceiling(y) {
		type phase struct {
			on   bool
			span float64
		}
		phases := []phase{{true, tEnd - t0}}
		if cycling {
			phases = []phase{{true, math.Min(onTime, tEnd-t0)}, {false, math.Min(offTime, tEnd-t0-onTime)}}
		}
		for _, ph := range phases {
			if !(ph.span > 0) {
				continue
			}
			on := ph.on
			// Without a lag the hot spot jumps when the power switches.
			t, mean, hot = append(t, t0), append(mean, y[0]), append(hot, tp.hotSpot(y, on))
			start := t0
			_, y = tp.phase(C, on, y, ph.span, math.Min(hmax, ph.span/8), ceiling, func(s float64, v state) {
				t, mean, hot = append(t, start+s), append(mean, v[0]), append(hot, tp.hotSpot(v, on))
			})
			t0 += ph.span
			if math.IsNaN(y[0]) || ceiling(y) {
				return
			}
		}
	}
	return
}

// Cycle is the periodic steady state of an on/off duty cycle.
type Cycle struct {
	On, Off  float64 // s
	PeakMean float64 // K, mean winding temperature at the end of the on period
	PeakHot  float64 // K, hot spot at the end of the on period
	// PeakSurface is the hottest surface temperature of the periodic
	// state over the whole period, K. The surface lies below the mean by
	// the internal drop, which lags the power with the winding's internal
	// time constant: it builds up after switch-on faster than the mean
	// rises, and relaxes after switch-off faster than the mean falls, so
	// the surface may peak at the start of an on period or in the off
	// period as well as at the end of the on period. The lumped model
	// places that swing only roughly (a conduction profile starts to
	// warm at switch-on and to cool at switch-off everywhere); its
	// periodic peak lies between the end of the on period's surface and
	// the peak mean temperature, which bounds the surface of a section
	// heated from within.
	PeakSurface float64
	Trough      float64 // K, winding temperature at the end of the off period
	Periods     float64 // periods from cold until within 1 K of the periodic state (estimate: 5 τ / period)
	Settled     bool    // a periodic state exists below TempSearchMax
	// NoSolution is set when the search found no periodic state (the coil
	// heats from period to period without end), as against data that do
	// not allow one to be sought.
	NoSolution bool
	AveragePow float64 // W, duty-averaged power in the periodic state
}

// PeriodicCycle returns the periodic steady state of the duty cycle: the
// power on for onTime, off for onTime·(1/duty − 1), repeated, for heat
// capacity C. The state at the start of an on period, T₀, is the fixed
// point of the one-period map Φ (integrate), the internal rises started at
// their own periodic values for the power at T₀ (cycleLag). It is found
// with the Illinois variant of regula falsi on g(T₀) = Φ(T₀) − T₀ over a
// bracket whose lower end is the ambient: g(Ta) ≥ 0 (a coil that starts a
// period at ambient cannot end it colder), and when g(Ta) is not positive —
// the off period cools the winding back to the ambient, to the integration's
// resolution — the periodic state starts at the ambient itself. The upper
// end is the first of Ta + 2ⁿ K at which the coil cools over a period.
// Settled is false when no such state exists below TempSearchMax
// (runaway). PeakHot is the hottest point at the end of the on period,
// where mean and internal rise peak together.
func (tp ThermalProblem) PeriodicCycle(C, onTime float64) Cycle {
	n := math.NaN()
	cy := Cycle{On: onTime, PeakMean: n, PeakHot: n, PeakSurface: n, Trough: n, Periods: n, AveragePow: n}
	if !(C > 0) || !(onTime > 0) || !(tp.Duty > 0 && tp.Duty < 1) || math.IsInf(onTime, 0) || math.IsInf(C, 0) {
		return cy
	}
	cy.Off = onTime * (1/tp.Duty - 1)
	ceiling := func(T float64) bool { return T >= runawayCeiling }
	ceil := func(y state) bool { return ceiling(y[0]) }
	start := func(T0 float64) state {
		lag := tp.cycleLag(onTime, cy.Off)
		p := tp.PowerOn(T0)
		return state{T0, lag * tp.extraRise() * p, lag * tp.RiseMean * p}
	}
	period := func(T0 float64) (peak, end state) {
		_, peak = tp.phase(C, true, start(T0), onTime, onTime/4, ceil, nil)
		if ceiling(peak[0]) || math.IsNaN(peak[0]) {
			return peak, state{math.Inf(1), 0, 0}
		}
		_, end = tp.phase(C, false, peak, cy.Off, cy.Off/4, ceil, nil)
		return peak, end
	}
	g := func(T0 float64) float64 { _, e := period(T0); return e[0] - T0 }
	a := tp.Ambient
	ga := g(a)
	T0 := a
	switch {
	case math.IsNaN(ga):
		return cy
	case ga > 0:
		b := math.NaN()
		for d := 1.0; a+d <= math.Max(TempSearchMax, a+1); d *= 2 {
			if g(a+d) < 0 {
				b = a + d
				break
			}
		}
		if math.IsNaN(b) {
			cy.NoSolution = true
			return cy
		}
		T0 = tp.fixedPoint(g, a, ga, b, g(b))
	}
	peak, end := period(T0)
	cy.PeakMean, cy.Trough = peak[0], end[0]
	cy.PeakHot = tp.hotSpot(peak, true)
	cy.Settled = !math.IsNaN(peak[0]) && !ceiling(peak[0])
	if !cy.Settled {
		cy.PeakMean, cy.PeakHot, cy.Trough, cy.NoSolution = n, n, n, true
		return cy
	}
	// Average power over the period: the energy of the on period by the
	// trapezoidal rule over the integration's steps (at most onTime/64);
	// and the hottest surface over those steps and the off period's (at
	// most Off/64 apart, finer where the internal drop relaxes).
	var e float64
	prevT, prevY := 0.0, T0
	y0 := start(T0)
	cy.PeakSurface = tp.surfaceOf(y0, tp.PowerOn(y0[0]))
	_, top := tp.phase(C, true, y0, onTime, onTime/64, nil, func(s float64, y state) {
		e += (s - prevT) * (tp.PowerOn(prevY) + tp.PowerOn(y[0])) / 2
		prevT, prevY = s, y[0]
		cy.PeakSurface = math.Max(cy.PeakSurface, tp.surfaceOf(y, tp.PowerOn(y[0])))
	})
	cy.AveragePow = e / (onTime + cy.Off)
	cy.PeakSurface = math.Max(cy.PeakSurface, tp.surfaceOf(top, 0))
	tp.phase(C, false, top, cy.Off, cy.Off/64, nil, func(_ float64, y state) {
		cy.PeakSurface = math.Max(cy.PeakSurface, tp.surfaceOf(y, 0))
	})
	if tau := tp.ThermalTimeConstant(C, T0); tau > 0 {
		cy.Periods = 5 * tau / (onTime + cy.Off)
	}
	return cy
}

// fixedPoint returns the root of g in [lo, hi] (g(lo) > 0 > g(hi)) by the
// Illinois variant of regula falsi, to 10⁻⁹ of hi.
func (tp ThermalProblem) fixedPoint(g func(float64) float64, lo, glo, hi, ghi float64) float64 {
	side := 0
	for range 100 {
		x := hi - ghi*(hi-lo)/(ghi-glo)
		if !(x > lo && x < hi) {
			x = (lo + hi) / 2
		}
		gx := g(x)
		if gx > 0 {
			lo, glo = x, gx
			if side == -1 {
				ghi /= 2
			}
			side = -1
		} else {
			hi, ghi = x, gx
			if side == 1 {
				glo /= 2
			}
			side = 1
		}
		if hi-lo <= 1e-9*hi || gx == 0 {
			break
		}
	}
	return lo + (hi-lo)/2
}

// cycleLag returns the fraction of its steady value that a first-order lag
// of time constant InternalTau, driven by the on/off square wave, holds at
// the start of an on period in the periodic state: (1 − a) b/(1 − a b),
// a = e^(−t_on/τ), b = e^(−t_off/τ) (0 without a lag).
func (tp ThermalProblem) cycleLag(on, off float64) float64 {
	if !(tp.InternalTau > 0) {
		return 0
	}
	a, b := math.Exp(-on/tp.InternalTau), math.Exp(-off/tp.InternalTau)
	if d := 1 - a*b; d > 0 {
		return (1 - a) * b / d
	}
	return 0
}

// cycleRise returns the rise of the hottest point above the mean at the end
// of an on period in the periodic state of the on/off cycle, with the
// power of the peak mean temperature T: the internal rise as a first-order
// lag with time constant InternalTau driven by a square wave of height
// X = (RiseMax − RiseMean) P(T), whose periodic peak is
// X (1 − a)/(1 − a b), a = e^(−t_on/τ), b = e^(−t_off/τ) — X itself for a
// fast winding (τ → 0), X × duty for a slow one.
func (tp ThermalProblem) cycleRise(T, on, off float64) float64 {
	X := tp.extraRise() * tp.PowerOn(T)
	if !(tp.InternalTau > 0) {
		return X
	}
	a, b := math.Exp(-on/tp.InternalTau), math.Exp(-off/tp.InternalTau)
	return X * (1 - a) / (1 - a*b)
}
