package analysis

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/format"
	"coilmemo/spec"
)

// Sizing is a size block's search and its choice (SizeDesign).
//
// The search visits every (turns, wire) choice of the block. For each it
// lays the winding out and solves its steady heat balance (the cheap
// figures: power, current, voltage, resistance, mass, wire length, current
// density, moment of an air-core coil, and the field on the axis of every
// coil). These decide the physical constraints and the limits on those
// quantities exactly, and a temperature limit by a lower bound (the peak
// of an on/off cycle is never below the duty-averaged steady state), so a
// choice they exclude is excluded for certain. A free radial build is the
// depth the turns need, layers × wire diameter, within its range (more
// depth than the turns fill adds nothing the winding has). Other free
// numeric keys are searched per choice: nine points across the range,
// then golden-section search between the neighbours of the best feasible
// point to 1/10 000 of the range, which finds the optimum when the
// objective is unimodal over the feasible part of the range. The choices
// that pass are then ranked by the objective and evaluated in full, best
// first, until one meets every requirement; that is the choice. The best
// full-passing choice of each other wire are the runners-up.
type Sizing struct {
	Size      *spec.Size
	Objective spec.Objective
	Chosen    Candidate
	RunnersUp []Candidate // the best choice of other wires that meets every requirement, best first
	Discrete  int         // (turns, wire) choices
	Evaluated int         // designs whose cheap figures were computed, continuous steps included
	Feasible  int         // choices that meet every constraint the cheap figures decide
	Full      int         // choices evaluated in full
	// Constraints are what the choice must meet: the physical ones, then
	// each limit of the spec in order.
	Constraints []Constraint
	// Binding indexes the constraint that excludes the most of the
	// choices better than the chosen one (−1: none is better); Next the
	// one with the least margin at the choice besides it (−1: none).
	Binding, Next int
	// Better counts the choices whose objective beats the chosen one's
	// (each fails some requirement); BindingCount those of them failing
	// the binding constraint.
	Better, BindingCount int
	// Curves are the cheap figures over the turns, one per wire, for the
	// feasible-region figure (at most maxCurvePoints a wire).
	Curves []SizeCurve
	// Front is the Pareto front of the objective against the binding
	// constraint's quantity: the best objective reachable at each value of
	// it, among choices that meet every other cheap constraint.
	Front []FrontPoint
	// Merit is m²/(P·M) of the chosen winding (calc.MomentMerit), A²·m⁴/(W·kg),
	// NaN unless one coil block is sized (cored coils are not: spec); MeritResistivity the
	// resistivity it takes, at the winding's mean temperature, Ω·m.
	Merit, MeritResistivity float64
	// Stated are the coil blocks' own values of the free keys that the
	// choice replaces (for a warning when they differ).
	Stated []StatedValue
}

// Constraint is one thing a choice must meet.
type Constraint struct {
	Name  string // "fits", "buildable", "thermal", or the limit as written
	Limit int    // index into the spec's limits, −1 for a physical constraint
	// Cheap says the cheap figures decide it (exactly, or by a bound).
	Cheap bool
	// Excluded counts the choices that fail it (cheap figures, or the full
	// evaluation for the others).
	Excluded int
	// FullExcluded counts the choices the cheap figures passed and the
	// full evaluation found failing it.
	FullExcluded int
	// Closest is, for a cheap limit, the value nearest to meeting it over
	// the choices that fail it, SI (NaN when none fails).
	Closest float64
}

// Candidate is one choice: its values and its figures.
type Candidate struct {
	WireIndex int
	Wire      spec.WireChoice
	Turns     int
	Values    []float64 // SI, one per Size.Ranges
	Objective float64   // SI: W, kg, A·m² or A·m²/W
	// The design's figures: duty-averaged power, power while on, conductor
	// mass and |moment|, from the cheap figures (after a full evaluation,
	// from it).
	Power, PowerOn, Mass, Moment float64
	Temperature                  float64 // K, hottest winding (the steady one for a cheap figure)
	// Quantity holds, per constraint, the value it is judged on (SI; NaN
	// when undecided); Fails lists the constraints failed.
	Quantity []float64
	Fails    []int
	// Limits are the limits judged in full (nil before a full evaluation).
	Limits []LimitResult
	// Margins are the relative margins of the limits in full, (computed −
	// required)/required with the sign that makes a met limit positive.
	Margins []float64
}

// SizeCurve is one wire's cheap figures over the turns.
type SizeCurve struct {
	Wire                spec.WireChoice
	Turns               []int
	Power, Mass, Moment []float64
	Objective           []float64
	Feasible            []bool
}

// FrontPoint is a point of the Pareto front.
type FrontPoint struct {
	Quantity, Objective float64
	Turns               int
	Wire                spec.WireChoice
}

// StatedValue is a coil block's own value of a free key.
type StatedValue struct {
	Coil, Key, Raw string
	Line           int
}

const (
	maxFullEvaluations = 300
	maxCurvePoints     = 120
	runnersUp          = 4
	gridPoints         = 9
	goldenTolerance    = 1e-4 // of the range
	// MaxSizeEvaluations bounds the cheap evaluations of a search: each
	// free numeric key multiplies the (turns, wire) choices by its search
	// steps.
	MaxSizeEvaluations = 3_000_000
)

// physical constraints, in order
const (
	consFits = iota
	consBuild
	consApart
	consThermal
	// ConsPhysical is the index of the first limit among the constraints:
	// those before it are the physical ones (fits, buildable, apart,
	// thermal).
	ConsPhysical
)

const (
	consPhysical = ConsPhysical
)

// cheapQuantities are the limit quantities the cheap figures give exactly
// (or, for the temperatures, bound from below, which decides an upper
// limit).
var cheapQuantities = map[string]bool{
	"power": true, "power-on": true, "current": true, "voltage": true, "resistance": true,
	"mass": true, "wire-length": true, "current-density": true, "moment": true,
	"field-center": true, "field": true, "gradient": true,
}

// lowerBoundOnly are cheap quantities whose cheap figure is a lower bound.
var lowerBoundOnly = map[string]bool{"temperature": true, "surface-temperature": true}

type sizer struct {
	s     *spec.Spec
	sz    *spec.Size
	base  calc.Design
	cons  []Constraint
	cored bool   // a sized coil has a core: its moment comes from the core model
	axial []bool // per limit: its field point lies on every coil's axis
	// apartFrom is, per wire, the fewest turns at which a sized winding
	// meets another coil's (TurnsHi+1 when none does), found by
	// bisection: with no free numeric key besides the radial build, a
	// winding of more turns of one wire is no smaller anywhere (a thin
	// coil's bundle, a multilayer coil's layers only grow), so once two
	// windings meet they meet at every larger count. Nil when the test is
	// made for each choice instead.
	apartFrom []int
}

// SizeDesign runs the size block's search over spec s and returns the
// sizing and a copy of s with the choice written in (the coil values and
// the inputs' entries). Diagnostics, at the size block, say why no choice
// meets every requirement.
func SizeDesign(s *spec.Spec) (*Sizing, *spec.Spec, spec.Diagnostics) {
	sz := s.Size
	z := &sizer{s: s, sz: sz, base: s.Design}
	z.cons = []Constraint{
		{Name: "fits", Limit: -1, Cheap: true},
		{Name: "buildable", Limit: -1, Cheap: true},
		{Name: "apart", Limit: -1, Cheap: true},
		{Name: "thermal", Limit: -1, Cheap: true},
	}
	for i, l := range s.Design.Limits {
		cheap := cheapQuantities[l.Quantity] || (lowerBoundOnly[l.Quantity] && l.Relation == calc.AtMost)
		axial := true
		if l.Quantity == "field" || l.Quantity == "field-center" {
			axial = z.fieldOnAxes(l)
			cheap = cheap && axial
		}
		z.axial = append(z.axial, axial)
		z.cons = append(z.cons, Constraint{Name: limitText(l), Limit: i, Cheap: cheap, Closest: math.NaN()})
	}
	out := &Sizing{Size: sz, Objective: sz.Objective, Binding: -1, Next: -1, Merit: math.NaN(), Discrete: sz.Discrete()}
	steps := 1
	for _, r := range sz.Ranges {
		if r.Key != "radial-build" {
			steps *= gridPoints + golden(goldenTolerance*float64(gridPoints-1)/2)
		}
	}
	if n := out.Discrete * steps; n > MaxSizeEvaluations {
		return nil, nil, spec.Diagnostics{{File: s.File, Line: sz.Line, Msg: fmt.Sprintf(
			"size: %d choices × %d search steps = %d evaluations, more than the %d a search may make; narrow the ranges or fix a free numeric key",
			out.Discrete, steps, n, MaxSizeEvaluations)}}
	}

	if secs := z.acCost(steps); secs > maxACSeconds {
		return nil, nil, spec.Diagnostics{{File: s.File, Line: sz.Line, Msg: fmt.Sprintf(
			"size: the coil is driven by an a.c. voltage, so its current depends on the inductance of every choice, which the search would compute %s times (about %s s of work, more than the %s s a search may take); narrow the turns or the wires, or size it under its d.c. or current drive first",
			format.Digits(out.Discrete*steps), format.Sig(secs, 2), format.Sig(maxACSeconds, 2))}}
	}
	cands := z.enumerate()
	z.findApart()
	z.searchAll(cands, &out.Evaluated)
	for i := range cands {
		if len(cands[i].Fails) == 0 {
			out.Feasible++
		}
		for _, f := range cands[i].Fails {
			z.cons[f].Excluded++
		}
	}
	z.closest(cands)
	out.Curves = z.curves(cands)

	// Rank the cheap-feasible choices and evaluate them in full, best first.
	order := make([]int, 0, out.Feasible)
	for i := range cands {
		if len(cands[i].Fails) == 0 {
			order = append(order, i)
		}
	}
	sort.SliceStable(order, func(a, b int) bool { return z.better(&cands[order[a]], &cands[order[b]]) })
	chosen, found := -1, false
	doneWire := map[int]bool{}
	for _, i := range order {
		c := &cands[i]
		if doneWire[c.WireIndex] && found {
			continue
		}
		if out.Full >= maxFullEvaluations {
			break
		}
		out.Full++
		if !z.full(c) {
			for _, f := range c.Fails {
				z.cons[f].Excluded++
				z.cons[f].FullExcluded++
			}
			continue
		}
		doneWire[c.WireIndex] = true
		if !found {
			chosen, found = i, true
			out.Chosen = *c
			continue
		}
		out.RunnersUp = append(out.RunnersUp, *c)
		if len(out.RunnersUp) == runnersUp || len(doneWire) == len(z.wires()) {
			break
		}
	}
	out.Constraints = z.cons
	if !found {
		return nil, nil, spec.Diagnostics{{File: s.File, Line: sz.Line, Msg: z.noChoice(out)}}
	}
	out.Binding, out.Better, out.BindingCount = z.binding(cands, chosen)
	out.Next = z.nextToBind(&out.Chosen, out.Binding)
	out.Front = z.front(cands, out.Binding)
	out.Merit, out.MeritResistivity = z.merit(&out.Chosen)
	sized := z.sizedSpec(&out.Chosen)
	out.Stated = z.stated(&out.Chosen)
	return out, sized, nil
}

// maxACSeconds bounds the estimated work of a search whose choices each
// need their inductance (an a.c. voltage drive).
const maxACSeconds = 4.0

// acCost estimates the seconds of work the inductances of an a.c.
// voltage-driven sized coil take over the search: about 2 ns × N² + 0.1 ms
// a choice of N turns for a winding with length or radial build (measured
// on the 2-core machine: 0.15 ms at 200 turns, 3.8 ms at 1500); 0 when no
// sized coil needs it.
func (z *sizer) acCost(steps int) float64 {
	need := false
	for _, i := range z.sz.Targets {
		c := z.base.Coils[i]
		need = need || (c.Drive == calc.VoltageDrive && c.Frequency > 0 && (c.Length > 0 || c.RadialBuild > 0 || z.sz.Free("radial-build") || z.sz.Free("length")))
	}
	if !need {
		return 0
	}
	lo, hi := z.sz.TurnsLo, z.sz.TurnsHi
	if z.sz.TurnsLine == 0 {
		lo = z.base.Coils[z.sz.Targets[0]].Turns
		hi = lo
	}
	t := 0.0
	for n := lo; n <= hi; n++ {
		t += 2e-9*float64(n)*float64(n) + 1e-4
	}
	return t * float64(len(z.wires())*steps*len(z.sz.Targets))
}

// golden is the number of golden-section steps that shrink a bracket to
// the fraction tol of its width: ⌈ln(tol)/ln(0.618)⌉.
func golden(tol float64) int {
	return int(math.Ceil(math.Log(tol) / math.Log(0.6180339887498949)))
}

func (z *sizer) wires() []spec.WireChoice {
	if z.sz.WireLine > 0 {
		return z.sz.Wires
	}
	c := z.base.Coils[z.sz.Targets[0]]
	return []spec.WireChoice{{Gauge: c.Wire.Gauge, Bare: c.Wire.Bare}}
}

// enumerate lists every (turns, wire) choice, wires in the block's order
// (thickest first), turns rising.
func (z *sizer) enumerate() []Candidate {
	lo, hi := z.sz.TurnsLo, z.sz.TurnsHi
	if z.sz.TurnsLine == 0 {
		n := z.base.Coils[z.sz.Targets[0]].Turns
		lo, hi = n, n
	}
	ws := z.wires()
	out := make([]Candidate, 0, len(ws)*(hi-lo+1))
	for wi, w := range ws {
		for n := lo; n <= hi; n++ {
			out = append(out, Candidate{WireIndex: wi, Wire: w, Turns: n})
		}
	}
	return out
}

// searchAll computes the cheap figures of every choice on every core
// (eachIndex); each choice's result depends on it alone, so the outcome
// does not depend on the split.
func (z *sizer) searchAll(cands []Candidate, evaluated *int) {
	counts := make([]int, len(cands))
	eachIndex(len(cands), func(i int) {
		d := z.base
		d.Coils = append([]calc.Coil(nil), z.base.Coils...)
		counts[i] = z.search(&d, &cands[i])
	})
	for _, n := range counts {
		*evaluated += n
	}
}

// search finds the best values of the free numeric keys for one choice
// (see Sizing) and leaves the choice's cheap figures at them; it returns
// the cheap evaluations made.
func (z *sizer) search(d *calc.Design, c *Candidate) int {
	var free []int // indexes into Ranges, radial build excluded
	for i, r := range z.sz.Ranges {
		if r.Key != "radial-build" {
			free = append(free, i)
		}
	}
	c.Values = make([]float64, len(z.sz.Ranges))
	for i, r := range z.sz.Ranges {
		c.Values[i] = r.Hi
	}
	n := 0
	if len(free) == 0 {
		z.cheap(d, c)
		return 1
	}
	// one key, or two nested: the inner search runs at every step of the outer
	var opt func(k int) float64
	opt = func(k int) float64 {
		if k == len(free) {
			n++
			z.cheap(d, c)
			if len(c.Fails) > 0 {
				return math.Inf(1)
			}
			return z.score(c)
		}
		r := z.sz.Ranges[free[k]]
		best, bestX := math.Inf(1), math.NaN()
		eval := func(x float64) float64 {
			c.Values[free[k]] = x
			v := opt(k + 1)
			if v < best || (v == best && math.IsNaN(bestX)) {
				best, bestX = v, x
			}
			return v
		}
		gridGoldenMin(eval, r.Lo, r.Hi, gridPoints, func(a, b float64, _ int) bool { return b-a > goldenTolerance*(r.Hi-r.Lo) })
		if math.IsNaN(bestX) {
			bestX = r.Hi
		}
		c.Values[free[k]] = bestX
		return best
	}
	opt(0)
	// A value as a spec would write it: the best values to four
	// significant figures, kept when that choice is as feasible and as good.
	exact := append([]float64(nil), c.Values...)
	z.cheap(d, c)
	best := z.score(c)
	for _, k := range free {
		c.Values[k] = roundSig(c.Values[k], 4)
	}
	n += 2
	z.cheap(d, c)
	if len(c.Fails) > 0 || z.score(c) > best+1e-4*math.Abs(best) {
		copy(c.Values, exact)
		z.cheap(d, c) // leave the figures at the best values
	}
	return n
}

// roundSig rounds v to sig significant figures.
func roundSig(v float64, sig int) float64 {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return v
	}
	e := math.Pow(10, float64(sig-1)-math.Floor(math.Log10(math.Abs(v))))
	return math.Round(v*e) / e
}

// score is the objective as a number to make small.
func (z *sizer) score(c *Candidate) float64 {
	if z.sz.Objective.Maximise() {
		return -c.Objective
	}
	return c.Objective
}

// better orders choices: the better objective first; ties by fewer turns,
// then the wire listed first.
func (z *sizer) better(a, b *Candidate) bool {
	sa, sb := z.score(a), z.score(b)
	if sa != sb {
		return sa < sb
	}
	if a.Turns != b.Turns {
		return a.Turns < b.Turns
	}
	return a.WireIndex < b.WireIndex
}

// apply writes choice c into the sized coils of d (copies of the spec's).
func (z *sizer) apply(d *calc.Design, c *Candidate) {
	for _, i := range z.sz.Targets {
		co := z.base.Coils[i]
		if z.sz.TurnsLine > 0 {
			co.Turns = c.Turns
		}
		if z.sz.WireLine > 0 {
			co.Wire.Gauge, co.Wire.Bare = c.Wire.Gauge, c.Wire.Bare
			co.Wire.Outer, co.Wire.OuterEstimated = calc.HeavyBuildOuter(c.Wire.Bare), true
		}
		for k, r := range z.sz.Ranges {
			v := c.Values[k]
			if r.Key == "radial-build" {
				_, layers := calc.LayersFor(co.Turns, co.Length, calc.WireOuter(co))
				// the depth the layers need, rounded up to a whole micrometre
				need := math.Ceil(float64(layers)*calc.WireOuter(co)*1e6-1e-6) / 1e6
				v = math.Max(r.Lo, need)
				c.Values[k] = v
			}
			spec.SetCoilKey(&co, r.Key, v)
		}
		d.Coils[i] = co
	}
}

// cheap computes the cheap figures of choice c (see Sizing) and the
// constraints they decide.
func (z *sizer) cheap(d *calc.Design, c *Candidate) {
	z.apply(d, c)
	c.Fails = c.Fails[:0]
	if c.Quantity == nil {
		c.Quantity = make([]float64, len(z.cons))
	}
	for i := range c.Quantity {
		c.Quantity[i] = math.NaN()
	}
	fail := func(k int) {
		for _, f := range c.Fails {
			if f == k {
				return
			}
		}
		c.Fails = append(c.Fails, k)
	}
	for k, r := range z.sz.Ranges {
		if r.Key == "radial-build" && c.Values[k] > r.Hi*(1+1e-9) {
			fail(consFits)
			c.Quantity[consFits] = c.Values[k] / r.Hi
		}
	}
	var res calc.Results
	res.Coils = make([]calc.CoilResult, len(d.Coils))
	var windings []calc.Winding
	var currents []float64
	c.Temperature = math.Inf(-1)
	for i, co := range d.Coils {
		w := calc.LayOut(co)
		if w.Overfull {
			fail(consFits)
		}
		if spec.BuildProblem(co) != "" {
			fail(consBuild)
		}
		op := calc.OperatingPoint(co, w, d.Conditions)
		if op.Runaway || math.IsNaN(op.Temperature) {
			fail(consThermal)
		}
		n := float64(calc.SeriesCoils(co))
		cr := calc.CoilResult{Name: co.Name, Winding: w, R20: op.R20, RHot: op.RHot, Current: op.Current, Voltage: op.Voltage,
			Power: op.Power, PowerOn: op.PowerOn, Mass: w.Mass * n, Length: w.WireLength * n, Temperature: op.Temperature,
			Runaway: op.Runaway, Verdict: op.Verdict, Duty: op.Thermal.Duty}
		cr.Heat.Problem, cr.Heat.Steady = op.Thermal, op.State
		cr.Density = op.Current / calc.ConductorArea(co.Wire.Bare)
		cr.Moment = calc.MagneticMoment(co, w, op.Current)
		res.Coils[i] = cr
		res.Moment = res.Moment.Add(cr.Moment)
		windings = append(windings, w)
		currents = append(currents, op.Current)
		c.Temperature = math.Max(c.Temperature, op.Temperature)
	}
	c.Power, c.PowerOn, c.Mass = 0, 0, 0
	for _, cr := range res.Coils {
		c.Power += cr.Power
		c.PowerOn += cr.PowerOn
		c.Mass += cr.Mass
	}
	c.Moment = res.Moment.Norm()
	c.Quantity[consThermal] = c.Temperature
	fm := &calc.FieldModel{Coils: d.Coils, Windings: windings, Currents: currents}
	for k := consPhysical; k < len(z.cons); k++ {
		con := z.cons[k]
		if !con.Cheap {
			continue
		}
		l := d.Limits[con.Limit]
		var v float64
		switch l.Quantity {
		case "field", "field-center":
			v = z.cheapField(l, d, res, fm)
		case "gradient":
			v = math.NaN()
			if on, ci, _ := subjectOf(l, *d); on == OnCoil {
				v = math.Abs(calc.PairGradient(d.Coils[ci], windings[ci], currents[ci]))
			}
		default:
			v = LimitValue(l, *d, res)
		}
		c.Quantity[k] = v
		pass := false
		switch l.Relation {
		case calc.AtLeast:
			pass = v >= l.Required
		case calc.AtMost:
			pass = v <= l.Required
		}
		if !pass {
			fail(k)
		}
	}
	// Windings of several coils must not share space (see apartFrom).
	if len(d.Coils) > 1 {
		if z.apartFrom != nil {
			if c.Turns >= z.apartFrom[c.WireIndex] {
				fail(consApart)
			}
		} else if len(c.Fails) == 0 && z.intersect(d) {
			fail(consApart)
		}
	}
	c.Objective = z.objective(c)
}

// objective is the objective's value of a choice, SI.
func (z *sizer) objective(c *Candidate) float64 {
	switch z.sz.Objective {
	case spec.MinimumPower:
		return c.Power
	case spec.MinimumMass:
		return c.Mass
	case spec.MaximumMoment:
		return c.Moment
	}
	if !(c.PowerOn > 0) {
		return math.NaN()
	}
	return c.Moment / c.PowerOn
}

// fieldOnAxes reports whether the point a field limit is judged at lies
// on the axis of every coil, where the field is the on-axis closed form
// and cheap.
func (z *sizer) fieldOnAxes(l calc.Limit) bool {
	on, ci, pi := subjectOf(l, z.base)
	var at calc.Vec
	coils := z.base.Coils
	switch on {
	case OnProbe:
		at = z.base.Probes[pi].At
	case OnCoil:
		at = coils[ci].Centre
		coils = coils[ci : ci+1]
	}
	for _, c := range coils {
		if c.Form == calc.Rectangle {
			continue // the rectangle's field is closed form everywhere
		}
		r := at.Sub(c.Centre)
		u := calc.CoilFrame(c.Axis).U
		radial := r.Sub(u.Scale(r.Dot(u))).Norm()
		if radial > 1e-9*math.Max(c.MeanDiameter, 1e-3) {
			return false
		}
	}
	return true
}

// cheapField is a field limit's value from the turns on the axes (see
// fieldOnAxes): the same sums the full evaluation makes.
func (z *sizer) cheapField(l calc.Limit, d *calc.Design, r calc.Results, fm *calc.FieldModel) float64 {
	on, ci, pi := subjectOf(l, *d)
	switch on {
	case OnProbe:
		return fm.At(d.Probes[pi].At).Norm()
	case OnCoil:
		c := d.Coils[ci]
		return calc.CoilField(c, fm.Windings[ci], fm.Currents[ci], c.Centre).Norm()
	}
	return fm.At(calc.Vec{}).Norm()
}

// full evaluates choice c as the memo does and judges every constraint;
// it reports whether all are met, and records the failures.
func (z *sizer) full(c *Candidate) bool {
	d := z.base
	d.Coils = append([]calc.Coil(nil), z.base.Coils...)
	z.apply(&d, c)
	r, ls := evaluateDesign(d)
	c.Fails = c.Fails[:0]
	c.Limits = ls
	c.Margins = make([]float64, len(ls))
	c.Power, c.PowerOn, c.Mass, c.Temperature = 0, 0, 0, math.Inf(-1)
	for _, cr := range r.Coils {
		c.Power += cr.Power
		c.PowerOn += cr.PowerOn
		c.Mass += cr.Mass
		c.Temperature = math.Max(c.Temperature, cr.Temperature)
		if (cr.Runaway || math.IsNaN(cr.Temperature)) && !contains(c.Fails, consThermal) {
			c.Fails = append(c.Fails, consThermal)
		}
	}
	c.Moment = r.Moment.Norm()
	c.Quantity[consThermal] = c.Temperature
	if z.intersect(&d) {
		c.Fails = append(c.Fails, consApart)
	}
	for k, l := range ls {
		c.Margins[k] = z.margin(l)
		c.Quantity[consPhysical+k] = l.Computed
		if !l.Pass {
			c.Fails = append(c.Fails, consPhysical+k)
		}
	}
	c.Objective = z.objective(c)
	return len(c.Fails) == 0
}

// findApart sets apartFrom (see sizer) for a design of several coils
// whose only free numeric key is the radial build.
func (z *sizer) findApart() {
	if len(z.base.Coils) < 2 || z.sz.TurnsLine == 0 {
		return
	}
	for _, r := range z.sz.Ranges {
		if r.Key != "radial-build" {
			return
		}
	}
	d := z.base
	d.Coils = append([]calc.Coil(nil), z.base.Coils...)
	meets := func(wi int, w spec.WireChoice, n int) bool {
		c := Candidate{WireIndex: wi, Wire: w, Turns: n, Values: make([]float64, len(z.sz.Ranges))}
		z.apply(&d, &c)
		return z.intersect(&d)
	}
	for wi, w := range z.wires() {
		lo, hi := z.sz.TurnsLo, z.sz.TurnsHi+1 // meets(hi) is taken as true
		if meets(wi, w, lo) {
			hi = lo
		}
		for hi-lo > 1 {
			mid := (lo + hi) / 2
			if meets(wi, w, mid) {
				hi = mid
			} else {
				lo = mid
			}
		}
		z.apartFrom = append(z.apartFrom, hi)
	}
}

// intersect reports whether the winding of a sized coil of d shares space
// with another coil's.
func (z *sizer) intersect(d *calc.Design) bool {
	for _, i := range z.sz.Targets {
		for j := range d.Coils {
			if j != i && (!contains(z.sz.Targets, j) || j > i) && spec.WindingsIntersect(d.Coils[i], d.Coils[j]) {
				return true
			}
		}
	}
	return false
}

func contains(xs []int, x int) bool {
	for _, y := range xs {
		if y == x {
			return true
		}
	}
	return false
}

// evaluateDesign computes a design's results and judges its limits as the
// study does: calc.Evaluate, then the cores, then the limits.
func evaluateDesign(d calc.Design) (calc.Results, []LimitResult) {
	r := WithCores(d, calc.Evaluate(d))
	return r, JudgeLimits(d, r)
}

// margin is a limit's relative margin, positive when it is met: (computed
// − required)/required with the sign that makes a met limit positive; for
// a temperature, the fraction of the allowed rise above the ambient left
// unused, (required − computed)/(required − ambient).
func (z *sizer) margin(l LimitResult) float64 {
	req := l.Limit.Required
	if q := l.Limit.Quantity; q == "temperature" || q == "surface-temperature" {
		rise := req - calc.Ambient(z.base.Conditions)
		m := (req - l.Computed) / rise
		if l.Limit.Relation == calc.AtLeast {
			m = -m
		}
		return m
	}
	if req == 0 {
		return math.NaN()
	}
	m := (l.Computed - req) / math.Abs(req)
	if l.Limit.Relation == calc.AtMost {
		m = -m
	}
	return m
}

// closest records, for each cheap limit, the value nearest to meeting it
// over the choices that fail it.
func (z *sizer) closest(cands []Candidate) {
	for k := consPhysical; k < len(z.cons); k++ {
		l := z.base.Limits[z.cons[k].Limit]
		best := math.NaN()
		for i := range cands {
			v := cands[i].Quantity[k]
			if math.IsNaN(v) || len(cands[i].Fails) == 0 {
				continue
			}
			failed := false
			for _, f := range cands[i].Fails {
				failed = failed || f == k
			}
			if !failed {
				continue
			}
			if math.IsNaN(best) || (l.Relation == calc.AtLeast && v > best) || (l.Relation == calc.AtMost && v < best) {
				best = v
			}
		}
		z.cons[k].Closest = best
	}
}

// noChoice says why no choice meets every requirement: the constraint
// that excludes the most and, for a limit, how near the best comes.
func (z *sizer) noChoice(out *Sizing) string {
	if out.Feasible > 0 {
		worst := -1
		for k, c := range z.cons {
			if c.FullExcluded > 0 && (worst < 0 || c.FullExcluded > z.cons[worst].FullExcluded) {
				worst = k
			}
		}
		msg := fmt.Sprintf("size: no choice meets every requirement: %s meet those the layout and heat balance decide, but the %s evaluated in full, best first, fail",
			format.Count(out.Feasible, "choice", "choices"), format.Count(out.Full, "choice", "choices"))
		if worst >= 0 {
			what := z.cons[worst].Name
			if worst == consApart {
				what = "apart (the windings of different coils must not meet)"
			}
			msg += fmt.Sprintf(": %s fails %d of them", what, z.cons[worst].FullExcluded)
		}
		if out.Full >= maxFullEvaluations {
			msg += fmt.Sprintf(" (the search stops after %d full evaluations)", maxFullEvaluations)
		}
		return msg
	}
	worst := -1
	for k, c := range z.cons {
		if c.Excluded > 0 && (worst < 0 || c.Excluded > z.cons[worst].Excluded) {
			worst = k
		}
	}
	n := out.Discrete
	if worst < 0 {
		return fmt.Sprintf("size: none of the %d choices meets every requirement within %d full evaluations", n, out.Full)
	}
	c := z.cons[worst]
	msg := fmt.Sprintf("size: no choice meets every requirement: %s excludes the most, %d of the %d choices", c.Name, c.Excluded, n)
	switch {
	case c.Limit >= 0 && !math.IsNaN(c.Closest):
		l := z.base.Limits[c.Limit]
		unit := spec.LimitQuantities[l.Quantity].Unit
		short := math.Abs(c.Closest-l.Required) / math.Abs(l.Required) * 100
		msg += fmt.Sprintf("; the nearest reaches %s against %s (%s %s)", limitValueText(c.Closest, unit), limitValueText(l.Required, unit),
			format.Sig(short, 3)+" %", map[bool]string{true: "short", false: "over"}[l.Relation == calc.AtLeast])
	case worst == consFits:
		msg += " (their turns do not fit the coil's length and radial build)"
	case worst == consBuild:
		msg += " (their winding cannot be wound or lies outside the models: e.g. a thin coil's bundle over a fifth of its diameter)"
	case worst == consApart:
		msg += " (their windings meet another coil's: space the coils further apart or make them differ more in size)"
	case worst == consThermal:
		msg += " (they run above their insulation class, or have no steady temperature)"
	}
	return msg
}

func limitValueText(v float64, unit string) string {
	if unit == "degC" {
		return format.Sig(format.Celsius(v), 4) + " °C"
	}
	return format.Eng(v, format.Unit(unit), 3)
}

// limitText is a limit as a size table names it: "moment >= 0.2 A m2".
func limitText(l calc.Limit) string {
	rel := ">="
	if l.Relation == calc.AtMost {
		rel = "<="
	}
	name := l.Quantity
	if l.Subject != "" {
		name += "(" + l.Subject + ")"
	}
	return name + " " + rel + " " + limitValueText(l.Required, spec.LimitQuantities[l.Quantity].Unit)
}

// binding is the constraint that excludes the most of the choices whose
// objective beats the chosen one's; it returns it (−1 for none), the
// number of better choices, and how many of them fail it.
func (z *sizer) binding(cands []Candidate, chosen int) (int, int, int) {
	counts := make([]int, len(z.cons))
	ch := &cands[chosen]
	better := 0
	for i := range cands {
		c := &cands[i]
		if i == chosen || !(z.score(c) < z.score(ch)) {
			continue
		}
		better++
		for _, f := range c.Fails {
			counts[f]++
		}
	}
	best := -1
	for k, n := range counts {
		if n > 0 && (best < 0 || n > counts[best]) {
			best = k
		}
	}
	if best < 0 {
		return -1, better, 0
	}
	return best, better, counts[best]
}

// nextToBind is the limit (or the insulation class) with the least
// margin at the choice, besides the binding one.
func (z *sizer) nextToBind(c *Candidate, binding int) int {
	best, bm := -1, math.Inf(1)
	for k, m := range c.Margins {
		if consPhysical+k == binding || math.IsNaN(m) {
			continue
		}
		if m < bm {
			best, bm = consPhysical+k, m
		}
	}
	return best
}

// front is the Pareto front of the objective against the binding
// constraint's quantity, over the choices that meet every other cheap
// constraint: walking the quantity from its best end, the best objective
// so far.
func (z *sizer) front(cands []Candidate, binding int) []FrontPoint {
	if binding < consPhysical || !z.cons[binding].Cheap {
		return nil
	}
	l := z.base.Limits[z.cons[binding].Limit]
	var idx []int
	for i := range cands {
		c := &cands[i]
		ok := !math.IsNaN(c.Quantity[binding]) && !math.IsNaN(c.Objective)
		for _, f := range c.Fails {
			ok = ok && f == binding
		}
		if ok {
			idx = append(idx, i)
		}
	}
	// best end of the quantity first: the largest for a lower bound
	sort.SliceStable(idx, func(a, b int) bool {
		qa, qb := cands[idx[a]].Quantity[binding], cands[idx[b]].Quantity[binding]
		if l.Relation == calc.AtLeast {
			return qa > qb
		}
		return qa < qb
	})
	var out []FrontPoint
	best := math.Inf(1)
	for _, i := range idx {
		c := &cands[i]
		if s := z.score(c); s < best {
			best = s
			out = append(out, FrontPoint{Quantity: c.Quantity[binding], Objective: c.Objective, Turns: c.Turns, Wire: c.Wire})
		}
	}
	// from the worst end of the quantity to the best, for plotting
	for i, j := 0, len(out)-1; i < j; i, j = i+1, j-1 {
		out[i], out[j] = out[j], out[i]
	}
	if len(out) > 400 {
		thin := make([]FrontPoint, 0, 401)
		for i := 0; i < len(out); i += len(out) / 400 {
			thin = append(thin, out[i])
		}
		out = append(thin, out[len(out)-1])
	}
	return out
}

// curves are the cheap figures per wire, thinned to maxCurvePoints turns.
func (z *sizer) curves(cands []Candidate) []SizeCurve {
	var out []SizeCurve
	for i := 0; i < len(cands); {
		j := i
		for j < len(cands) && cands[j].WireIndex == cands[i].WireIndex {
			j++
		}
		sc := SizeCurve{Wire: cands[i].Wire}
		stride := max(1, (j-i+maxCurvePoints-1)/maxCurvePoints)
		for k := i; k < j; k += stride {
			c := &cands[k]
			sc.Turns = append(sc.Turns, c.Turns)
			sc.Power = append(sc.Power, c.Power)
			sc.Mass = append(sc.Mass, c.Mass)
			sc.Moment = append(sc.Moment, c.Moment)
			sc.Objective = append(sc.Objective, c.Objective)
			sc.Feasible = append(sc.Feasible, len(c.Fails) == 0)
		}
		out = append(out, sc)
		i = j
	}
	return out
}

// merit is calc.MomentMerit of the chosen winding at its mean temperature,
// for one sized air-core coil block.
func (z *sizer) merit(c *Candidate) (merit, rho float64) {
	if len(z.sz.Targets) != 1 {
		return math.NaN(), math.NaN()
	}
	d := z.base
	d.Coils = append([]calc.Coil(nil), z.base.Coils...)
	z.apply(&d, c)
	co := d.Coils[z.sz.Targets[0]]
	if co.Form == calc.Pair && co.Opposing {
		return math.NaN(), math.NaN()
	}
	w := calc.LayOut(co)
	op := calc.OperatingPoint(co, w, d.Conditions)
	m := co.Wire.Material
	rho = m.Rho20 * calc.ResistanceFactor(m.Alpha20, op.State.Mean)
	return calc.MomentMerit(w.AreaSum, w.WireLength, rho, m.Density), rho
}

// sizedSpec is a copy of the spec with choice c written in: the sized
// coils' values, and their entries' SI text.
func (z *sizer) sizedSpec(c *Candidate) *spec.Spec {
	out := *z.s
	out.Design.Coils = append([]calc.Coil(nil), z.base.Coils...)
	z.apply(&out.Design, c)
	out.Entries = append([]spec.Entry(nil), z.s.Entries...)
	for i := range out.Entries {
		e := &out.Entries[i]
		if e.Block != "coil" {
			continue
		}
		ci := -1
		for _, t := range z.sz.Targets {
			if z.base.Coils[t].Name == e.Coil {
				ci = t
			}
		}
		if ci < 0 {
			continue
		}
		co := out.Design.Coils[ci]
		switch {
		case e.Sized:
			e.SI = ChoiceText(co, e.Key)
			e.Raw = "size: " + z.sizeRaw(e.Key)
		case e.Key == "wire-outer-diameter" && e.Default && z.sz.WireLine > 0:
			e.SI = units.Format(co.Wire.Outer, units.Length) + " (heavy-build estimate)"
		case e.Default && strings.Contains(e.SI, " = "):
			// a dimension derived from others: the same relation at the choice
			if v, ok := spec.CoilValue(co, e.Key); ok {
				_, rel, _ := strings.Cut(e.SI, " = ")
				e.SI = units.Format(v, units.Length) + " = " + rel
			}
		}
	}
	return &out
}

// ChoiceText is a sized coil key's value as the inputs table and the
// written spec give it.
func ChoiceText(co calc.Coil, key string) string {
	switch key {
	case "turns":
		return fmt.Sprint(co.Turns)
	case "wire":
		return spec.WireChoice{Gauge: co.Wire.Gauge, Bare: co.Wire.Bare}.Name()
	}
	v, _ := spec.CoilValue(co, key)
	return units.Format(v, sizeDim(key))
}

// SpecText is a sized coil key's value as the spec is written back:
// lengths in millimetres, the others in their base unit, every digit
// that the value holds.
func SpecText(co calc.Coil, key string) string {
	switch key {
	case "turns", "wire":
		return ChoiceText(co, key)
	}
	v, _ := spec.CoilValue(co, key)
	unit, f := map[units.Dim]string{units.Length: "mm", units.Current: "A", units.Voltage: "V", units.Time: "s", units.Frequency: "Hz"}[sizeDim(key)], 1.0
	if unit == "mm" {
		f = 1e3
	}
	return strconv.FormatFloat(v*f, 'g', -1, 64) + " " + unit
}

func sizeDim(key string) units.Dim {
	switch key {
	case "current":
		return units.Current
	case "voltage":
		return units.Voltage
	case "switch-off", "on-time":
		return units.Time
	case "frequency":
		return units.Frequency
	}
	return units.Length
}

// sizeRaw is a free key's range as the size block writes it.
func (z *sizer) sizeRaw(key string) string {
	for _, e := range z.s.Entries {
		if e.Block == "size" && e.Key == key {
			return e.Raw
		}
	}
	return z.rangeText(key)
}

func (z *sizer) rangeText(key string) string {
	sz := z.sz
	switch key {
	case "turns":
		return fmt.Sprintf("%d .. %d", sz.TurnsLo, sz.TurnsHi)
	case "wire":
		return sz.Wires[0].Name() + " .. " + sz.Wires[len(sz.Wires)-1].Name()
	}
	for _, r := range sz.Ranges {
		if r.Key == key {
			return units.Format(r.Lo, r.Dim) + " .. " + units.Format(r.Hi, r.Dim)
		}
	}
	return ""
}

// stated are the coil blocks' own values of free keys that differ from
// the choice.
func (z *sizer) stated(c *Candidate) []StatedValue {
	var out []StatedValue
	d := z.base
	d.Coils = append([]calc.Coil(nil), z.base.Coils...)
	z.apply(&d, c)
	for _, e := range z.s.Entries {
		if !e.Sized || e.Raw == "" || e.Default {
			continue
		}
		for _, t := range z.sz.Targets {
			co := d.Coils[t]
			if co.Name != e.Coil {
				continue
			}
			if strings.TrimSpace(e.SI) != ChoiceText(co, e.Key) && !sameValue(z.base.Coils[t], co, e.Key) {
				out = append(out, StatedValue{Coil: co.Name, Key: e.Key, Raw: e.Raw, Line: e.Line})
			}
		}
	}
	return out
}

func sameValue(a, b calc.Coil, key string) bool {
	switch key {
	case "turns":
		return a.Turns == b.Turns
	case "wire":
		return a.Wire.Bare == b.Wire.Bare
	}
	va, _ := spec.CoilValue(a, key)
	vb, _ := spec.CoilValue(b, key)
	return math.Abs(va-vb) <= 1e-9*math.Abs(vb)
}
