package analysis

import (
	"math"
	"math/rand/v2"
	"runtime"
	"sort"
	"strings"
	"sync"

	"coilmemo/calc"
	"coilmemo/calc/units"
	"coilmemo/spec"
)

// WorstCase is the design evaluated over its tolerances block: every
// corner (each combination of every line's two extremes), the range of
// each headline result and limit over them, the swing each tolerance
// alone causes, and the Monte Carlo samples when the block asks for them.
//
// The corners are the extremes of a result only where it moves
// monotonically with each tolerance over the stated range; the Monte
// Carlo samples the interior.
type WorstCase struct {
	Tolerances *spec.Tolerances
	Corners    []Corner
	Results    []WorstResult // one per headline result, in HeadlineQuantities order
	Limits     []WorstLimit  // parallel to Study.Limits
	// Swing[r][t] is result r with tolerance t at its high extreme minus
	// result r with it at its low extreme, the others nominal, SI.
	Swing [][]float64
	MC    *MonteCarlo // nil without samples
	// Derived is the corner the memo derives in full (Derivation).
	Derived *WorstCorner
	// Exact is set when every evaluation ran calc.Evaluate in full
	// (a limit needed a result the quick evaluation leaves out).
	Exact bool
	// Suppression is each coil block's series resistor sized over the
	// corners (nil for a block that sizes none), in spec order.
	Suppression []*Suppression
	// Surface is each coil block's hottest surface over the nominal
	// design and the corners, in spec order.
	Surface []WorstSurface
}

// WorstSurface is one coil block's hottest surface temperature (surfaceMax:
// steady, or the hottest over its on/off cycle) over the nominal design and
// every corner: Max, K, at Corner (an index into Corners, −1: the nominal
// design), Cycle set when the on/off cycle gives it there. A corner whose
// heat balance has no solution is left out (it is a runaway, found as such).
type WorstSurface struct {
	Max    float64
	Corner int
	Cycle  bool
}

// Corner is one combination of extremes: bit t of High set takes
// tolerance t at its high end, clear at its low end.
type Corner struct {
	High   uint32
	Design calc.Design
	Values []float64 // per headline result, SI
	Limit  []float64 // per limit, the computed value, SI
	// SwitchOff is what each coil block's switch opens there.
	SwitchOff []SwitchOffAt
	// Surface is each coil block's hottest surface there, K (NaN when its
	// heat balance has no solution), and SurfaceCycle says its on/off
	// cycle gives it.
	Surface      []float64
	SurfaceCycle []bool
}

// WorstResult is one headline result over the corners. CornerMin and
// CornerMax index Corners, or are −1 when the nominal design is the
// extreme.
type WorstResult struct {
	Quantity             string // a limit quantity (spec.LimitQuantities)
	Nominal, Min, Max    float64
	CornerMin, CornerMax int
}

// WorstLimit is one requirement judged at every corner: Worst is the
// computed value at the corner that comes closest to failing (or fails
// most), Corner its index (−1: nominal), Pass set only when the
// requirement is met at nominal and at every corner; Failing counts the
// corners at which it is missed.
type WorstLimit struct {
	NominalPass bool // met by the nominal design
	Worst       float64
	Corner      int
	Pass        bool
	Failing     int
}

// MonteCarlo is the sampled distribution: each tolerance drawn uniformly
// over its range (turns uniformly over the whole numbers of its range),
// independently, from a PCG generator with a fixed seed.
type MonteCarlo struct {
	Samples int
	Seed    [2]uint64
	// Values[r] are headline result r's sampled values, sorted; NaN
	// samples (a runaway, say) are left out and counted in Unknown[r].
	Values  [][]float64
	Unknown []int
	// Yield is the fraction of samples that meet every limit.
	Yield float64
}

// MonteCarloSeed is the fixed seed of the Monte Carlo generator.
var MonteCarloSeed = [2]uint64{0x636f696c, 0x6d656d6f}

// HeadlineQuantities are the results the worst case ranges, as limit
// quantities of the design as a whole (LimitValue with no subject).
var HeadlineQuantities = []string{"moment", "torque", "field-center", "current", "voltage", "power", "temperature", "resistance", "switch-off-voltage"}

// Percentile is the p-th percentile (0..100) of sorted values, by the
// nearest-rank method; NaN for none.
func Percentile(sorted []float64, p float64) float64 {
	if len(sorted) == 0 {
		return math.NaN()
	}
	k := int(math.Ceil(p/100*float64(len(sorted)))) - 1
	k = max(0, min(k, len(sorted)-1))
	return sorted[k]
}

// CornerDesign returns design d with every tolerance at an extreme: High
// bit t set for the high end of tolerance t.
func CornerDesign(d calc.Design, t *spec.Tolerances, high uint32) calc.Design {
	u := make([]float64, len(t.Items))
	for i := range u {
		u[i] = -1
		if high&(1<<i) != 0 {
			u[i] = 1
		}
	}
	return Perturb(d, t, u)
}

// Perturb returns design d with tolerance i moved to position u[i] in
// −1 (low end) .. +1 (high end), linearly. d is not modified.
func Perturb(d calc.Design, t *spec.Tolerances, u []float64) calc.Design {
	out := d
	out.Coils = append([]calc.Coil(nil), d.Coils...)
	for i, tol := range t.Items {
		f := (u[i] + 1) / 2 // 0 at the low end, 1 at the high end
		at := func(nominal float64) float64 {
			switch tol.Mode {
			case spec.Relative:
				return nominal * (1 + tol.Lo + f*(tol.Hi-tol.Lo))
			case spec.Offset:
				return nominal + tol.Lo + f*(tol.Hi-tol.Lo)
			}
			return tol.Lo + f*(tol.Hi-tol.Lo)
		}
		switch tol.Key {
		case "ambient":
			out.Conditions.Ambient = at(d.Conditions.Ambient)
		case "background-field":
			b := d.Conditions.BackgroundField
			if n := b.Norm(); n > 0 {
				out.Conditions.BackgroundField = b.Scale(at(n) / n)
			}
		}
		for k := range out.Coils {
			c := &out.Coils[k]
			switch tol.Key {
			case "supply":
				if c.Drive == calc.VoltageDrive {
					c.Voltage = at(c.Voltage)
				} else {
					c.Current = at(c.Current)
				}
			case "resistivity":
				c.Wire.Material.Rho20 = at(c.Wire.Material.Rho20)
			case "wire-diameter":
				if tol.Mode == spec.Standard {
					if lo, hi, ok := spec.WireTolerance(c.Wire.Gauge); ok {
						c.Wire.Bare = lo + f*(hi-lo)
					}
				} else {
					c.Wire.Bare = at(c.Wire.Bare)
				}
			case "turns":
				c.Turns = max(1, int(math.Round(at(float64(c.Turns)))))
			case "ambient", "background-field":
			default:
				if v, ok := spec.CoilValue(*c, tol.Key); ok && v != 0 {
					spec.SetCoilValue(c, tol.Key, at(v))
					if (tol.Key == "inner-diameter" || tol.Key == "outer-diameter") && c.InnerDiameter > 0 && c.OuterDiameter > 0 {
						c.MeanDiameter = (c.InnerDiameter + c.OuterDiameter) / 2
					}
				}
			}
		}
	}
	return out
}

// quickQuantities are the limit quantities QuickEvaluate fills in.
var quickQuantities = map[string]bool{
	"moment": true, "field-center": true, "field": true, "torque": true, "power": true, "power-on": true,
	"temperature": true, "current": true, "voltage": true, "resistance": true, "mass": true,
	"wire-length": true, "current-density": true, "inductance": true, "time-constant": true,
	"switch-off-voltage": true,
}

// QuickEvaluate computes, as calc.Evaluate does, the part of design d's
// results that the headline results and the limits of quickQuantities
// read: per coil the winding, operating point, density, mass, length,
// inductance, moment, field at its centre, time constant, the peak of an
// on/off cycle, the heat result's problem, steady state and cycle (for the
// hottest surface), and the switching; then the total moment, field at the
// origin and at the probes and the torque. Everything else is left zero.
func QuickEvaluate(d calc.Design) calc.Results { return quickEvaluate(d, nil) }

// quickEvaluate is QuickEvaluate; with excess non-nil the on/off cycle is
// not integrated and coil k's temperature is its steady duty-averaged
// one plus excess[k].
func quickEvaluate(d calc.Design, excess []float64) calc.Results {
	var res calc.Results
	fm := &calc.FieldModel{}
	for _, c := range d.Coils {
		w := calc.LayOut(c)
		op := calc.OperatingPoint(c, w, d.Conditions)
		n := float64(calc.SeriesCoils(c))
		cr := calc.CoilResult{Name: c.Name, Winding: w, R20: op.R20, RHot: op.RHot, Current: op.Current,
			Voltage: op.Voltage, Power: op.Power, PowerOn: op.PowerOn, Duty: op.Thermal.Duty,
			Mass: w.Mass * n, Length: w.WireLength * n, Temperature: op.Temperature, Runaway: op.Runaway,
			ColdCurrent: op.ColdCurrent}
		cr.Density = math.NaN()
		if a := calc.ConductorArea(c.Wire.Bare); a > 0 {
			cr.Density = op.Current / a
		}
		cr.Inductance = calc.CoilInductance(c, w)
		cr.Moment = calc.MagneticMoment(c, w, op.Current)
		cr.FieldCentre = calc.CoilField(c, w, op.Current, c.Centre)
		cr.TimeConstant = math.NaN()
		if op.RHot != 0 {
			cr.TimeConstant = cr.Inductance / op.RHot
		}
		tp := op.Thermal
		nan := math.NaN()
		cr.Heat = calc.HeatResult{Problem: tp, Steady: op.State,
			Cycle: calc.Cycle{PeakMean: nan, PeakHot: nan, PeakSurface: nan, Trough: nan, Periods: nan, AveragePow: nan}}
		if excess != nil {
			cr.Temperature += excess[len(res.Coils)]
		} else if c.OnTime > 0 && tp.Duty > 0 && tp.Duty < 1 && op.State.Settled && tp.R20 > 0 && !math.IsInf(tp.R20, 0) {
			if hc := calc.HeatCapacity(c, w); hc > 0 {
				// as calc.Evaluate: the cycle's peak when an on-time is stated
				if cy := tp.PeriodicCycle(hc, c.OnTime); cy.On > 0 {
					cr.Heat.Cycle = cy
					cr.Temperature = math.Max(cy.PeakHot, op.Temperature)
					if !cy.Settled {
						cr.Temperature, cr.Runaway = math.NaN(), true
					} else if c.Drive == calc.CurrentDrive && c.InsulationClass > 0 && cy.PeakHot > c.InsulationClass {
						cr.Runaway = true
					}
				}
			}
		}
		cr.Switch = calc.SwitchingFor(c, d.Conditions, cr.Inductance, op)
		res.Coils = append(res.Coils, cr)
		fm.Coils = append(fm.Coils, c)
		fm.Windings = append(fm.Windings, w)
		fm.Currents = append(fm.Currents, op.Current)
		res.Moment = res.Moment.Add(cr.Moment)
	}
	res.FieldCentre = fm.At(calc.Vec{})
	bg := d.Conditions.BackgroundField
	res.Torque = calc.Torque(res.Moment, bg)
	res.TorqueMax = calc.TorqueMax(res.Moment, bg)
	for _, p := range d.Probes {
		res.Probes = append(res.Probes, calc.ProbeResult{Name: p.Name, At: p.At, B: fm.At(p.At)})
	}
	return res
}

// evaluation is one evaluated design: headline values and limit values.
type evaluation struct {
	values, limits []float64
	pass           bool
	switchOff      []SwitchOffAt
	surface        []float64 // per coil, surfaceMax (NaN: no solution)
	surfaceCycle   []bool
	// excess is each coil's cycle peak above its steady duty-averaged
	// temperature, K (0 without an on/off cycle).
	excess []float64
}

func evaluateFor(d calc.Design, quantities []string, exact bool, excess []float64) evaluation {
	var r calc.Results
	switch {
	case exact:
		r = calc.Evaluate(d)
	default:
		r = quickEvaluate(d, excess)
	}
	r = WithCores(d, r) // cored coils judged as at nominal
	ev := evaluation{pass: true}
	if excess == nil {
		for k, c := range d.Coils {
			op := calc.OperatingPoint(c, r.Coils[k].Winding, d.Conditions)
			ev.excess = append(ev.excess, r.Coils[k].Temperature-op.Temperature)
		}
	}
	for _, q := range quantities {
		ev.values = append(ev.values, LimitValue(calc.Limit{Quantity: q}, d, r))
	}
	for _, cr := range r.Coils {
		ev.switchOff = append(ev.switchOff, SwitchOffAt{Supply: cr.Switch.Supply, Current: cr.Switch.WorstCurrent})
		ts, cycle := math.NaN(), false
		if cr.Heat.Steady.Settled && !cr.Verdict.NoSolution && !(cr.Heat.Cycle.On > 0 && !cr.Heat.Cycle.Settled) {
			ts, cycle = surfaceMaxOf(cr.Heat)
		}
		ev.surface, ev.surfaceCycle = append(ev.surface, ts), append(ev.surfaceCycle, cycle)
	}
	for _, l := range JudgeLimits(d, r) {
		ev.limits = append(ev.limits, l.Computed)
		ev.pass = ev.pass && l.Pass
	}
	return ev
}

// parallel evaluates every design on GOMAXPROCS goroutines; the result
// at index i is always that of designs[i].
func parallel(designs []calc.Design, quantities []string, exact bool, excess [][]float64) []evaluation {
	out := make([]evaluation, len(designs))
	workers := min(runtime.GOMAXPROCS(0), len(designs))
	var wg sync.WaitGroup
	next := make(chan int)
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range next {
				var ex []float64
				if excess != nil {
					ex = excess[i]
				}
				out[i] = evaluateFor(designs[i], quantities, exact, ex)
			}
		}()
	}
	for i := range designs {
		next <- i
	}
	close(next)
	wg.Wait()
	return out
}

// AnalyseWorstCase evaluates a design over its tolerances; nil without a
// tolerances block. nominal are the results of the nominal design, and
// limits its judged limits.
func AnalyseWorstCase(s *spec.Spec, nominal calc.Results, limits []LimitResult) *WorstCase {
	t := s.Tolerances
	if t == nil || len(t.Items) == 0 {
		return nil
	}
	d := s.Design
	wc := &WorstCase{Tolerances: t}
	for _, l := range d.Limits {
		if !quickQuantities[l.Quantity] {
			wc.Exact = true
		}
	}
	var quantities []string
	for _, q := range HeadlineQuantities {
		v := LimitValue(calc.Limit{Quantity: q}, d, nominal)
		if q == "torque" && d.Conditions.BackgroundField.Norm() == 0 {
			continue
		}
		if !math.IsNaN(v) && v != 0 {
			quantities = append(quantities, q)
		}
	}
	nt := len(t.Items)
	nc := 1 << nt
	designs := make([]calc.Design, 0, nc+2*nt+t.Samples)
	for h := range nc {
		designs = append(designs, CornerDesign(d, t, uint32(h)))
	}
	for i := range nt { // one tolerance at a time, low then high
		for _, e := range []float64{-1, 1} {
			u := make([]float64, nt)
			for k, tol := range t.Items {
				u[k] = nominalPosition(d, tol)
			}
			u[i] = e
			designs = append(designs, Perturb(d, t, u))
		}
	}
	evs := parallel(designs, quantities, wc.Exact, nil)
	var samples []calc.Design
	var excess [][]float64
	if t.Samples > 0 {
		rng := rand.New(rand.NewPCG(MonteCarloSeed[0], MonteCarloSeed[1]))
		for range t.Samples {
			u := make([]float64, nt)
			for k, tol := range t.Items {
				u[k] = 2*rng.Float64() - 1
				if tol.Key == "turns" { // whole turns, each equally likely
					n := int(tol.Hi)
					u[k] = float64(rng.IntN(2*n+1)-n) / float64(n)
				}
			}
			samples = append(samples, Perturb(d, t, u))
			if !wc.Exact {
				excess = append(excess, interpolateExcess(evs[:nc], u))
			}
		}
		evs = append(evs, parallel(samples, quantities, wc.Exact, excess)...)
	}

	nomEv := evaluateFor(d, quantities, wc.Exact, nil)
	for h := range nc {
		wc.Corners = append(wc.Corners, Corner{High: uint32(h), Design: designs[h], Values: evs[h].values, Limit: evs[h].limits, SwitchOff: evs[h].switchOff,
			Surface: evs[h].surface, SurfaceCycle: evs[h].surfaceCycle})
	}
	for k := range d.Coils {
		ws := WorstSurface{Max: nomEv.surface[k], Corner: -1, Cycle: nomEv.surfaceCycle[k]}
		for h, c := range wc.Corners {
			if v := c.Surface[k]; v > ws.Max || (math.IsNaN(ws.Max) && !math.IsNaN(v)) {
				ws = WorstSurface{Max: v, Corner: h, Cycle: c.SurfaceCycle[k]}
			}
		}
		wc.Surface = append(wc.Surface, ws)
	}
	for r, q := range quantities {
		wr := WorstResult{Quantity: q, Nominal: nomEv.values[r], Min: nomEv.values[r], Max: nomEv.values[r], CornerMin: -1, CornerMax: -1}
		for h, c := range wc.Corners {
			v := c.Values[r]
			if math.IsNaN(v) {
				continue
			}
			if v < wr.Min {
				wr.Min, wr.CornerMin = v, h
			}
			if v > wr.Max {
				wr.Max, wr.CornerMax = v, h
			}
		}
		wc.Results = append(wc.Results, wr)
		sw := make([]float64, nt)
		for i := range nt {
			sw[i] = evs[nc+2*i+1].values[r] - evs[nc+2*i].values[r]
		}
		wc.Swing = append(wc.Swing, sw)
	}
	for li, l := range limits {
		wl := WorstLimit{Worst: l.Computed, Corner: -1, Pass: l.Pass}
		worse := func(a, b float64) bool { // a is worse than b
			if math.IsNaN(a) {
				return !math.IsNaN(b)
			}
			if l.Limit.Relation == calc.AtLeast {
				return a < b
			}
			return a > b
		}
		for h, c := range wc.Corners {
			v := c.Limit[li]
			met := (l.Limit.Relation == calc.AtLeast && v >= l.Limit.Required) || (l.Limit.Relation == calc.AtMost && v <= l.Limit.Required)
			if !met {
				wl.Failing++
				wl.Pass = false
			}
			if worse(v, wl.Worst) {
				wl.Worst, wl.Corner = v, h
			}
		}
		wc.Limits = append(wc.Limits, wl)
	}
	if t.Samples > 0 {
		mc := &MonteCarlo{Samples: t.Samples, Seed: MonteCarloSeed, Values: make([][]float64, len(quantities)), Unknown: make([]int, len(quantities))}
		met := 0
		for _, ev := range evs[nc+2*nt:] {
			if ev.pass {
				met++
			}
			for r, v := range ev.values {
				if math.IsNaN(v) {
					mc.Unknown[r]++
					continue
				}
				mc.Values[r] = append(mc.Values[r], v)
			}
		}
		for _, v := range mc.Values {
			sort.Float64s(v)
		}
		mc.Yield = float64(met) / float64(t.Samples)
		wc.MC = mc
	}
	return wc
}

// nominalPosition is where the nominal design sits in tolerance tol's
// −1..+1: the middle for a symmetric tolerance, the nominal value's place
// in a range, and for the standard wire the nominal diameter's place
// between the table's limits (taken from the first coil).
func nominalPosition(d calc.Design, tol spec.Tolerance) float64 {
	pos := func(v, lo, hi float64) float64 {
		if !(hi > lo) {
			return 0
		}
		return 2*(v-lo)/(hi-lo) - 1
	}
	switch {
	case tol.Mode == spec.Range && tol.Key == "ambient":
		return pos(d.Conditions.Ambient, tol.Lo, tol.Hi)
	case tol.Mode == spec.Range && tol.Key == "background-field":
		return pos(d.Conditions.BackgroundField.Norm(), tol.Lo, tol.Hi)
	case tol.Mode == spec.Standard && len(d.Coils) > 0:
		lo, hi, _ := spec.WireTolerance(d.Coils[0].Wire.Gauge)
		return pos(d.Coils[0].Wire.Bare, lo, hi)
	}
	return (-tol.Lo - tol.Hi) / (tol.Hi - tol.Lo) // 0 for ±x
}

// CornerName names corner h (−1: the nominal design) by the value
// each tolerance takes there, e.g. "supply −5 %, ambient 60 °C, wire
// max".
func (wc *WorstCase) CornerName(h int) string { return wc.CornerNameWithout(h, "") }

// CornerNameWithout is CornerName leaving out the tolerance line of key
// (one held at another value, as the ambient where the coil is handled).
func (wc *WorstCase) CornerNameWithout(h int, key string) string {
	if h < 0 || h >= len(wc.Corners) {
		return "nominal"
	}
	var parts []string
	for i, tol := range wc.Tolerances.Items {
		if key != "" && tol.Key == key {
			continue
		}
		hi := wc.Corners[h].High&(1<<i) != 0
		v := tol.Lo
		if hi {
			v = tol.Hi
		}
		sign := func(x float64) string {
			if x > 0 {
				return "+"
			}
			return "−"
		}
		var s string
		switch tol.Mode {
		case spec.Relative:
			s = sign(v) + units.FormatNumber(math.Abs(v)*100) + " %"
		case spec.Offset:
			s = sign(v) + units.Format(math.Abs(v), tol.Dim)
			if tol.Key == "turns" {
				s = sign(v) + units.FormatNumber(math.Abs(v))
			}
		case spec.Range:
			s = units.Format(v, tol.Dim)
			if tol.Dim == units.Temperature {
				s = strings.Replace(units.FormatNumber(v-273.15), "-", "−", 1) + " °C"
			}
		case spec.Standard:
			s = "min"
			if hi {
				s = "max"
			}
		}
		parts = append(parts, tol.Key+" "+s)
	}
	return strings.Join(parts, ", ")
}

// interpolateExcess is the Monte Carlo's stand-in for integrating each
// sample's on/off cycle: the cycle peak's excess over the steady
// duty-averaged temperature, interpolated multilinearly in u between its
// values at the corners (computed in full there). The steady temperature
// itself is computed for every sample.
func interpolateExcess(corners []evaluation, u []float64) []float64 {
	out := make([]float64, len(corners[0].excess))
	for h, c := range corners {
		w := 1.0
		for i, x := range u {
			f := (x + 1) / 2
			if h&(1<<i) == 0 {
				f = 1 - f
			}
			w *= f
		}
		if w == 0 {
			continue
		}
		for k, e := range c.excess {
			out[k] += w * e
		}
	}
	return out
}

// judge sets each limit's verdict to the worst case's: met at nominal and
// at every corner. Nothing happens without a worst case.
func (wc *WorstCase) judge(limits []LimitResult) {
	if wc == nil {
		return
	}
	for i := range limits {
		if i < len(wc.Limits) {
			wc.Limits[i].NominalPass = limits[i].Pass
			limits[i].Pass = wc.Limits[i].Pass
		}
	}
	wc.Derived = wc.Derivation(limits)
}

// fittedAt puts the resistors sized over the corners into the switching
// of corner h's coils, judged against the nominal design's limit: the
// driver's limit does not move with the supply's tolerance, so the clamp
// is the nominal design's and the largest resistor the corner's own
// quotient against it (Suppression.CornerMax); the switch voltage and
// its margin follow with the fitted resistor.
func (wc *WorstCase) fittedAt(coils []calc.CoilResult, h int) {
	for k, p := range wc.Suppression {
		if p == nil || k >= len(coils) {
			continue
		}
		s := &coils[k].Switch
		s.Clamp, s.ClampFromRating = p.Clamp, p.ClampFromRating
		if h >= 0 && h < len(p.CornerMax) {
			s.ResistorMax = p.CornerMax[h]
		}
		*s = s.WithResistor(coils[k].Inductance, coils[k].RHot, p.Resistor)
	}
}

// WorstCorner is one corner evaluated in full for the memo's derivation:
// the corner at which the first limit fails, or else the one giving the
// least moment (the first headline result's minimum).
type WorstCorner struct {
	Corner  int    // index into Corners
	Reason  string // the limit quantity that fails there, or the result minimised
	Failing bool   // a limit fails there
	Design  calc.Design
	Results calc.Results
	Coils   []CoilStudy
}

// Derivation evaluates the corner the memo derives in full; nil when
// there is none.
func (wc *WorstCase) Derivation(limits []LimitResult) *WorstCorner {
	if wc == nil || len(wc.Corners) == 0 {
		return nil
	}
	wk := &WorstCorner{Corner: -1}
	for i, l := range wc.Limits {
		if !l.Pass && l.Corner >= 0 && i < len(limits) {
			wk.Corner, wk.Reason, wk.Failing = l.Corner, limits[i].Limit.Quantity, true
			break
		}
	}
	if wk.Corner < 0 && len(wc.Results) > 0 {
		wk.Corner, wk.Reason = wc.Results[0].CornerMin, wc.Results[0].Quantity
	}
	if wk.Corner < 0 {
		return nil
	}
	wk.Design = wc.Corners[wk.Corner].Design
	wk.Results = calc.Evaluate(wk.Design)
	wc.fittedAt(wk.Results.Coils, wk.Corner) // the resistor sized over every corner
	for i, c := range wk.Design.Coils {
		wk.Coils = append(wk.Coils, StudyCoil(c, wk.Results.Coils[i], wk.Design.Conditions))
	}
	return wk
}
