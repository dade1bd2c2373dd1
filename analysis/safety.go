package analysis

import (
	"math"
	"slices"
	"sort"

	"coilmemo/calc"
)

// ImplantField is the flux density above which active implanted medical
// devices may be affected: 0.5 mT, ICNIRP Guidelines on limits of exposure
// to static magnetic fields, Health Physics 96(4):504–514 (2009).
const ImplantField = 0.5e-3

// HotSurface is the surface temperature above which brief contact can burn,
// 60 °C: common practice for touchable surfaces of equipment.
var HotSurface = calc.CelsiusToKelvin(60)

// ELV is the usual bound of extra-low d.c. voltage, 60 V (IEC 61140 /
// IEC 60364-4-41, ripple-free d.c.).
const ELV = 60.0

// AssumedSwitchOff is the switch-off time taken when none is stated: a
// fast semiconductor switch, 1 µs.
const AssumedSwitchOff = 1e-6

// Severity ranks a finding.
type Severity int

// Severities, least severe first.
const (
	Note Severity = iota
	Caution
	Warning
)

// FindingKind names the hazard a finding is about.
type FindingKind int

// The hazards the analysis looks for.
const (
	Runaway          FindingKind = iota // no steady state within the insulation's reach
	ClassExceeded                       // the hottest point settles above the insulation class
	ClassIfLeftOn                       // within the class on the duty cycle, not if left energised
	HotSurfaceFound                     // surface hotter than HotSurface
	HighDensity                         // current density above common practice while running warm
	HazardousVoltage                    // supply voltage above ELV
	SwitchOffVoltage                    // unsuppressed switch-off spike above ELV or the driver rating
	HotInService                        // surface hotter than HotSurface where the coil works, not where it is handled
)

// Finding is one hazard of one coil block, with the numbers the memo
// words it with.
type Finding struct {
	Kind     FindingKind
	Severity Severity
	Coil     int // index into the design's coils
	// Value is the finding's figure in SI: the temperature (K) for the
	// thermal kinds, the current density (A/m²), the voltage (V) for
	// HazardousVoltage and SwitchOffVoltage.
	Value float64
	// SwitchOff is the switch-off time the spike is computed at, s, and
	// Assumed says it was not stated (AssumedSwitchOff).
	SwitchOff float64
	Assumed   bool
	// For HotSurfaceFound: Value is the hottest surface over the nominal
	// design and the tolerances' corners; AtCorner says a corner gives it,
	// Corner (an index into WorstCase.Corners), and Nominal is the
	// nominal design's hottest surface, K. Cycle says the value is the
	// hottest over the periodic state of the on/off cycle (rather than the
	// steady surface). All are at the handling ambient (Safety.Handling);
	// Service is the hottest surface where the coil works, over the
	// nominal design and the corners (HottestSurface), K, at corner
	// ServiceCorner (−1: nominal), which the insulation meets.
	AtCorner      bool
	Corner        int
	Nominal       float64
	Cycle         bool
	Service       float64
	ServiceCorner int
}

// Safety holds the findings, most severe first within each coil, and the
// reach of the implant-field level.
type Safety struct {
	Findings []Finding
	Implant  ImplantReach
	// Exposure is the time-varying field of each a.c.-driven block
	// against the ICNIRP (2010) reference levels (exposure.go).
	Exposure []ACExposure
	// Handling is where the hot surface is judged: the ambient in which
	// people touch the coil and the hottest surfaces there.
	Handling Handling
}

// ImplantReach is where the field of all coils together reaches
// ImplantField. Two figures describe the region: Distance, the largest
// distance from the outer surface of a winding (or rod) at which |B| still
// reaches the level — beyond it from every winding the field stays below
// it — and Axial, how far from the origin along the axis the level
// reaches. The others are the searches these come from: at the origin,
// along the axis and in the plane across it from the origin, along the
// directions of Farthest, at probes, and outward from every winding
// (Windings, one per coil block).
type ImplantReach struct {
	Searched      bool    // false for a design without extent, or whose coils carry no current (pick-up coils)
	Origin        float64 // T, |B| at the origin
	Axial, Radial float64 // m, from the origin
	// AxialUp and AxialDown are the axial reach on each side of the
	// origin, along Axis and against it (Axial is the larger); 0 where the
	// level is not reached on that side.
	AxialUp, AxialDown float64
	// Axis is the direction Axial is measured along and Radial across:
	// the z axis, unless every coil's axis lies on one line through the
	// origin, which is then the axis (reachAxis).
	Axis calc.Vec
	// AxialClear is the distance of the axial reach's far end from the
	// outer surface of the nearest winding or rod, of coil block
	// AxialCoil (0 when it lies within that outline: in its bore when
	// AxialBore); AxialCoil is −1 when Axial is 0.
	AxialClear float64
	AxialCoil  int
	AxialBore  bool
	// Sphere is set when the search lines from each winding's centre also
	// ran along sphereDirections (a small set of coils, or a rectangle, whose
	// corners they leave too).
	Sphere bool
	// AxialEnd is set when that far end lies beyond an end face of the
	// outline, within its outer radius of its axis, and the search line
	// runs along that axis: AxialClear is then its distance beyond that
	// face. A line across a winding's axis (the design's z axis through an
	// x-axis pair) never sets it.
	AxialEnd bool
	// OriginInside is set when the origin lies inside a winding or rod
	// (not in a bore): |B| at the origin is then the field in the solid,
	// where no one can be.
	OriginInside bool
	// Farthest is the largest distance from the origin, beyond the sphere
	// that holds every winding, at which |B| still reaches the level along
	// any direction searched (±x, ±y, ±z, ± the
	// design's net moment, ± each coil's axis and ± the direction of each
	// coil's centre), Toward that direction; 0 when it is not reached.
	Farthest float64  // m
	Toward   calc.Vec // unit vector
	Probes   []int    // indices of probes at or above the level
	// ProbeField is |B| at each of Probes, T (the peak where Peak is set).
	ProbeField []float64
	// Peak is set when a coil block is driven at a frequency: the search
	// and every |B| here are then at the instant its current peaks, √2
	// times the r.m.s. (acPeakResults), the fields of several such blocks
	// taken in phase.
	Peak     bool
	Windings []WindingReach
	// Distance is the largest of the Windings' distances, from the
	// winding of coil block Nearest (−1 when the level is reached at no
	// winding's surface nor beyond one).
	Distance float64 // m
	Nearest  int
}

// WindingReach is the field of all coils next to one coil block's winding:
// Surface the largest |B| found at its outer surface (where a hand can
// reach it), and Distance the largest distance from that outer surface —
// of the outline the winding fills with its bore (outline), the rod's
// included for a cored coil — of a point at which |B| still reaches
// ImplantField and which lies nearer this block's outline than any
// other's (0 when there is none). For a cored coil the field includes the
// core's.
type WindingReach struct {
	Surface  float64 // T
	Distance float64 // m
}

// Any reports whether the level is reached anywhere searched.
func (ir ImplantReach) Any() bool {
	if ir.Origin >= ImplantField || ir.Axial > 0 || ir.Radial > 0 || ir.Farthest > 0 || len(ir.Probes) > 0 {
		return true
	}
	for _, w := range ir.Windings {
		if w.Surface >= ImplantField || w.Distance > 0 {
			return true
		}
	}
	return false
}

// assessSafety finds the hazards of the design from its results: the
// nominal design's, and for the hot surface the worst over the tolerances'
// corners too (wc; nil without a tolerances block).
func assessSafety(d calc.Design, r calc.Results, coils []CoilStudy, wc *WorstCase) Safety {
	var s Safety
	nominal := make([]float64, len(coils))
	nominalCycle := make([]bool, len(coils))
	for i := range coils {
		nominal[i] = coils[i].Heat.SurfaceMax
		if i < len(r.Coils) {
			_, nominalCycle[i] = surfaceMaxOf(r.Coils[i].Heat)
		}
	}
	s.Handling = handlingFor(d, nominal, nominalCycle, wc)
	for i, co := range d.Coils {
		cr := r.Coils[i]
		add := func(k FindingKind, sev Severity, v float64) {
			s.Findings = append(s.Findings, Finding{Kind: k, Severity: sev, Coil: i, Value: v})
		}
		if cr.Verdict.NoSolution || (cr.Runaway && !cr.Verdict.SettledAboveLimit) {
			add(Runaway, Warning, cr.Temperature)
			s.Findings = append(s.Findings, electricalFindings(i, cr, coils[i].SwitchOff)...)
			continue
		}
		if cr.Temperature > co.InsulationClass {
			add(ClassExceeded, Warning, cr.Temperature)
		}
		h := cr.Heat
		// Within the class on its duty cycle but not energised continuously
		// (a stuck driver): the time to the class is finite only where the
		// continuous steady state settles at or above the class, or not at
		// all (calc.ThermalProblem.TimeToReach), and a winding held past its
		// class is damaged and a fire risk — a warning, as ClassExceeded.
		if !(cr.Runaway || calc.Duty(co) >= 1 || math.IsNaN(h.TimeToLimit) || !(cr.Temperature <= co.InsulationClass)) {
			add(ClassIfLeftOn, Warning, coils[i].Heat.Continuous.HotSpot)
		}
		if f, ok := handlingSurface(i, s.Handling); ok {
			f.Service, f.ServiceCorner = hottestSurface(i, h, coils[i].Heat.SurfaceMax, wc)
			s.Findings = append(s.Findings, f)
		} else if ts, at := hottestSurface(i, h, coils[i].Heat.SurfaceMax, wc); ts > HotSurface {
			// hot only where the coil works, not where people touch it
			hs := Finding{Kind: HotInService, Severity: Note, Coil: i, Value: f.Value, Nominal: f.Nominal, AtCorner: f.AtCorner, Corner: f.Corner, Cycle: f.Cycle,
				Service: ts, ServiceCorner: at}
			s.Findings = append(s.Findings, hs)
		}
		// The density rule of thumb only where the coil also runs warm: a
		// small coil sheds its heat easily and the rule is conservative
		// for it. It is a still-air rule for continuous duty: not in
		// vacuum, nor on a duty cycle.
		if J := math.Abs(cr.Density); J > calc.PracticeDensity && calc.Duty(co) >= 1 && !d.Conditions.Cooling.Vacuum && co.InsulationClass-cr.Temperature < 50 {
			add(HighDensity, Note, J)
		}
		if math.Abs(cr.Voltage) > ELV {
			add(HazardousVoltage, Warning, cr.Voltage)
		}
		s.Findings = append(s.Findings, electricalFindings(i, cr, coils[i].SwitchOff)...)
	}
	s.Implant = implantReach(d, r, coils)
	s.Exposure = acExposures(d, r, coils)
	return s
}

// handlingSurface is coil block i's hot-surface finding, when its hottest
// surface where people handle it (Handling) passes HotSurface: the nominal
// design's there, or a hotter one at a corner of the tolerances.
func handlingSurface(i int, hd Handling) (Finding, bool) {
	f := Finding{Kind: HotSurfaceFound, Severity: Caution, Coil: i, Value: math.NaN(), Nominal: math.NaN(), Corner: -1, ServiceCorner: -1}
	if i >= len(hd.Nominal) {
		return f, false
	}
	f.Value, f.Nominal, f.Cycle = hd.Nominal[i], hd.Nominal[i], hd.NominalCycle[i]
	if i < len(hd.Surface) {
		if ws := hd.Surface[i]; ws.Corner >= 0 && (ws.Max > f.Nominal || math.IsNaN(f.Nominal)) {
			f.Value, f.AtCorner, f.Corner, f.Cycle = ws.Max, true, ws.Corner, ws.Cycle
		}
	}
	return f, f.Value > HotSurface
}

// hottestSurface is coil block i's hottest surface where it works, K: the
// nominal design's hottest surface nominal (steady, or over its on/off
// cycle: surfaceMax of heat h), or a hotter one at corner `at` of the
// tolerances (WorstCase.Surface; −1: the nominal design).
func hottestSurface(i int, h calc.HeatResult, nominal float64, wc *WorstCase) (ts float64, at int) {
	ts, at = nominal, -1
	if wc != nil && i < len(wc.Surface) {
		if ws := wc.Surface[i]; ws.Corner >= 0 && (ws.Max > nominal || math.IsNaN(nominal)) {
			ts, at = ws.Max, ws.Corner
		}
	}
	return ts, at
}

// HottestSurface is coil block i's hottest surface where it works, K
// (hottestSurface): the nominal design's steady or cycle surface, or a
// hotter one at corner `at` of the tolerances (−1: the nominal design);
// NaN when the heat balance has no solution. The hot-surface caution
// judges the surface where people handle the coil instead
// (Safety.Handling).
func (st *Study) HottestSurface(i int) (ts float64, at int) {
	if i >= len(st.Coils) || i >= len(st.Results.Coils) || st.Results.Coils[i].Verdict.NoSolution {
		return math.NaN(), -1
	}
	return hottestSurface(i, st.Results.Coils[i].Heat, st.Coils[i].Heat.SurfaceMax, st.WorstCase)
}

// electricalFindings are the switch-off spike, at the stated switch-off
// time or AssumedSwitchOff and held to the winding's capacitance-limited
// peak where that is lower (SwitchOffParts.Peak), when it passes ELV or the
// driver's rating (an a.c. drive beyond the d.c. model is a validity flag,
// not a hazard).
func electricalFindings(i int, cr calc.CoilResult, p SwitchOffParts) []Finding {
	var out []Finding
	s := cr.Switch
	tOff, assumed := p.SwitchOff, p.Assumed
	spike := p.Peak
	bound := ELV
	if s.ClampFromRating {
		bound = math.Min(bound, s.Clamp)
	}
	if e := s.Energy; !math.IsNaN(e) && e > 0 && spike > bound {
		out = append(out, Finding{Kind: SwitchOffVoltage, Severity: Caution, Coil: i, Value: spike, SwitchOff: tOff, Assumed: assumed})
	}
	return out
}

// reach returns the largest distance from origin along the unit direction
// u at which |B| ≥ level, searching inward from rmax in steps of 25 % and
// refining the bracket (refineReach) to 10⁻⁷ of the distance (the memo
// quotes it to three figures); 0 when the level is not
// reached at or beyond rmin, which must lie outside every winding. Valid
// because the field outside the windings falls monotonically with
// distance. field is the field of all coils (implantField).
func reach(field func(calc.Vec) calc.Vec, origin, u calc.Vec, level, rmin, rmax float64) float64 {
	return reachFrom(field, origin, u, level, rmin, rmax, 0)
}

// reachFrom is reach with a first guess of the distance (guess in
// (rmin, rmax); otherwise as reach): after rmax, the search steps by
// 25 % from the guess, outward while the level is reached and inward
// while it is not, and refines the first bracket found. Where |B| falls
// monotonically along the line between rmin and rmax it finds the same
// crossing as reach in fewer steps.
func reachFrom(field func(calc.Vec) calc.Vec, origin, u calc.Vec, level, rmin, rmax, guess float64) float64 {
	at := func(r float64) float64 { return field(origin.Add(u.Scale(r))).Norm() }
	bmax := at(rmax)
	if bmax >= level {
		return rmax
	}
	// inward from hi (where the level is not reached) by 25 % steps
	inward := func(hi, bhi float64) float64 {
		for {
			lo := math.Max(hi/1.25, rmin)
			blo := at(lo)
			if blo >= level {
				return refineReach(at, level, lo, hi, blo, bhi)
			}
			if lo == rmin {
				return 0
			}
			hi, bhi = lo, blo
		}
	}
	if !(guess > rmin && guess < rmax) {
		return inward(rmax, bmax)
	}
	b := at(guess)
	if b < level {
		return inward(guess, b)
	}
	// outward from the guess while the level is reached
	lo, blo := guess, b
	for {
		hi := math.Min(lo*1.25, rmax)
		bhi := bmax
		if hi < rmax {
			bhi = at(hi)
		}
		if bhi < level {
			return refineReach(at, level, lo, hi, blo, bhi)
		}
		lo, blo = hi, bhi
	}
}

// refineReach narrows a bracket lo < hi of the level's crossing, with
// f(lo) = blo ≥ level > f(hi) = bhi, until it is no wider than 10⁻⁷ of
// hi, and returns its inner end (where f ≥ level). It is the ITP method
// (interpolate, truncate, project) on ln(level/f), which rises through 0:
// never more evaluations than bisection takes, and superlinear on a
// smooth function — the field falls nearly as a power of the distance, so
// a handful of evaluations do the work of the thirty a bisection takes.
//
// Reference: I. F. D. Oliveira and R. H. C. Takahashi, "An Enhancement of
// the Bisection Method Average Performance Preserving Minmax Optimality",
// ACM Trans. Math. Softw. 47(1), art. 5, 2020 (κ1 = 0.2/(b − a), κ2 = 2,
// n0 = 1).
func refineReach(f func(float64) float64, level, lo, hi, blo, bhi float64) float64 {
	a, b := lo, hi
	ya, yb := math.Log(level/blo), math.Log(level/bhi)
	eps := 0.5e-7 * hi
	if !(ya <= 0 && yb > 0) || math.IsInf(ya, 0) || math.IsInf(yb, 0) {
		ya, yb = -1, 1 // not a finite bracket: bisect
	}
	k1 := 0.2 / (b - a)
	nmax := math.Ceil(math.Log2((b-a)/(2*eps))) + 1
	for j := 0.0; b-a > 2*eps; j++ {
		half := 0.5 * (a + b)
		r := eps*math.Exp2(nmax-j) - 0.5*(b-a)
		delta := k1 * (b - a) * (b - a)
		xf := (yb*a - ya*b) / (yb - ya)
		sigma := math.Copysign(1, half-xf)
		xt := half
		if delta <= math.Abs(half-xf) {
			xt = xf + sigma*delta
		}
		x := xt
		if math.Abs(xt-half) > r {
			x = half - sigma*r
		}
		if !(x > a && x < b) {
			x = half
		}
		y := math.Log(level / f(x))
		switch {
		case math.IsNaN(y):
			return a
		case y > 0:
			b, yb = x, y
		case y < 0:
			a, ya = x, y
		default:
			return x
		}
	}
	return a
}

// implantField is the field, T, of all coils at the currents r gives
// them that the implant level is searched in: the windings'
// (calc.FieldModelAt) and, for every cored coil block with current, its
// core's by the rod's pole model (calc.CorePoleField), which dominates
// near the rod.
func implantField(d calc.Design, r calc.Results, coils []CoilStudy) func(calc.Vec) calc.Vec {
	fm := calc.FieldModelAt(d, resultCurrents(d, r))
	type cored struct {
		c calc.Coil
		k calc.CoreResult
	}
	var cores []cored
	for i, co := range d.Coils {
		if i < len(coils) && fm.Currents[i] != 0 {
			if k := coils[i].Kinds.Core; k != nil && len(k.Charge) > 0 {
				cores = append(cores, cored{co, *k})
			}
		}
	}
	return func(p calc.Vec) calc.Vec {
		// far blocks from their series, to 10⁻¹² of their own field
		b := fm.SeriesAt(p, 1e-12)
		for _, c := range cores {
			b = b.Add(calc.CorePoleField(c.c, c.k, p))
		}
		return b
	}
}

// conductorBounds are K_i, T·m², one per coil block, such that the field
// of block i is at most K_i/d² at any point whose distance from every one
// of its conductors is at least d: by the Biot–Savart law
// |B| ≤ μ0/(4π) Σ |I| ∫|dl|/d², so K_i = μ0/(4π)·|I_i|·(wire length of
// block i). nil (no bound) when a core with current adds its poles'
// field, which the sum leaves out.
//
// Reference: the Biot–Savart law, e.g. J. D. Jackson, Classical
// Electrodynamics, 3rd ed., Wiley 1999, eq. 5.4, with |dl × r̂| ≤ |dl|.
func conductorBounds(d calc.Design, r calc.Results, coils []CoilStudy) []float64 {
	ks := make([]float64, len(d.Coils))
	for i := range d.Coils {
		if i >= len(r.Coils) {
			return nil
		}
		cr := r.Coils[i]
		if cr.Current == 0 {
			continue
		}
		if i < len(coils) && coils[i].Kinds.Core != nil {
			return nil
		}
		if !(cr.Length > 0) || math.IsInf(cr.Length, 0) || math.IsNaN(cr.Current) {
			return nil
		}
		ks[i] = calc.Mu0 / (4 * math.Pi) * math.Abs(cr.Current) * cr.Length
	}
	return ks
}

// fieldBound holds, for every coil block, its conductor bound K_i
// (conductorBounds) and the sphere about its centre, radius R_i, that
// holds it. Two bounds on a block's field follow, both from the
// Biot–Savart law B = μ0 I/(4π) ∮ dl × g(r'), g(r') = (p − r')/|p − r'|³:
//
//	|B_i(p)| ≤ K_i/d_i²                          (|dl × r̂| ≤ |dl|; d_i the
//	                                              distance from p to the
//	                                              block's conductors)
//	|B_i(p) − B_dip,i(p)| ≤ 3 K_i R_i²/(D_i − R_i)⁴ (D_i = |p − c_i| > R_i)
//
// The second expands g about the centre c_i: the constant term vanishes
// on a closed turn, the linear one is the field of the block's moment at
// c_i, and the rest is at most ½·|∇²g|·R² with |∇²g| ≤ 6/|x|⁴ (the third
// derivative of 1/|x| along any direction is at most 3!/|x|⁴) on the
// segment from c_i to r', which stays in the sphere.
type fieldBound struct {
	ks, rs  []float64
	centres []calc.Vec
}

func newFieldBound(d calc.Design, ks []float64, os []outline) *fieldBound {
	if ks == nil {
		return nil
	}
	fb := &fieldBound{ks: ks, rs: make([]float64, len(ks))}
	for _, co := range d.Coils {
		fb.centres = append(fb.centres, co.Centre)
	}
	for _, o := range os {
		var r float64
		if o.rect {
			r = calc.Vec{o.w + o.r, o.h + o.r, o.r}.Norm()
		} else {
			rc, zc := (o.r0+o.r1)/2, (o.z0+o.z1)/2
			r = math.Hypot(math.Max(o.r1, rc+o.r), math.Max(math.Max(math.Abs(o.z0), math.Abs(o.z1)), math.Abs(zc)+o.r))
		}
		fb.rs[o.coil] = math.Max(fb.rs[o.coil], o.centre.Sub(fb.centres[o.coil]).Norm()+r)
	}
	return fb
}

// dipoleRemainder is the second bound of fb for block i at distance D
// from its centre, T (D > R_i).
func (fb *fieldBound) dipoleRemainder(i int, D float64) float64 {
	R := fb.rs[i]
	return 3 * fb.ks[i] * R * R / math.Pow(D-R, 4)
}

// levelField is the field of all coils of d for a search that only asks
// whether |B| reaches level, as model gives it: a circular block whose
// exterior series (calc.Multipole) meets 10⁻⁹ of the level at p is taken
// from it (30 such blocks err by at most 3×10⁻⁸ of the level, below the
// 2×10⁻⁷ of the maps' quadrature that model uses for the others); a
// rectangle farther from p than three times the radius R of its sphere is
// taken as the point dipole of its moment m at its centre, whose error
// the closed turns bound,
//
//	|B_i − B_dip,i| ≤ 3 K_i R_i²/(D_i − R_i)⁴
//
// (fieldBound.dipoleRemainder); the other blocks are evaluated in full.
// Where the dipoles' bounds leave the decision open, those rectangles are
// evaluated in full too. So the search decides as model would at every
// point not within 3×10⁻⁸ of the level, while a design of many coils
// evaluates in full only the few blocks near the point. fm itself when no
// bound applies (fb nil).
func levelField(fm func(calc.Vec) calc.Vec, model *calc.FieldModel, fb *fieldBound, moments []calc.Vec, level float64) func(calc.Vec) calc.Vec {
	if fb == nil || model == nil || len(model.Coils) != len(fb.ks) || len(moments) != len(fb.ks) {
		return fm
	}
	mps := make([][]calc.Multipole, len(fb.ks))
	for i, k := range fb.ks {
		if k != 0 {
			mps[i] = model.Multipoles(i)
		}
	}
	tol := 1e-9 * level
	dipole := func(i int, p calc.Vec) (calc.Vec, float64) {
		if len(mps[i]) > 0 {
			return calc.Vec{}, -1
		}
		r := p.Sub(fb.centres[i])
		if D := r.Norm(); D > 3*fb.rs[i] {
			return r, D
		}
		return calc.Vec{}, -1
	}
	return func(p calc.Vec) calc.Vec {
		var b, dip calc.Vec
		errSum := 0.0
		for i, k := range fb.ks {
			if k == 0 {
				continue
			}
			if v, ok := calc.SeriesSum(mps[i], p, tol); ok {
				b = b.Add(v)
				continue
			}
			if r, D := dipole(i, p); D > 0 {
				dip = dip.Add(calc.DipoleField(moments[i], r))
				errSum += fb.dipoleRemainder(i, D)
				continue
			}
			b = b.Add(model.CoilAt(i, p))
		}
		if errSum == 0 {
			return b
		}
		if n := b.Add(dip).Norm(); n-errSum >= level || n+errSum < level {
			return b.Add(dip)
		}
		for i, k := range fb.ks {
			if _, D := dipole(i, p); k != 0 && D > 0 {
				b = b.Add(model.CoilAt(i, p))
			}
		}
		return b
	}
}

// reachExtent is DesignExtent widened to take in every core: the radius
// about the origin of a sphere that holds every winding and rod.
func reachExtent(d calc.Design) float64 {
	ext := DesignExtent(d)
	for _, co := range d.Coils {
		if co.Core.Present() && co.Core.Length > 0 && co.Core.Diameter > 0 {
			ext = math.Max(ext, co.Centre.Norm()+math.Hypot(co.Core.Diameter/2, co.Core.Length/2))
		}
	}
	return ext
}

func implantReach(d calc.Design, r calc.Results, coils []CoilStudy) ImplantReach {
	ext := reachExtent(d)
	ir := ImplantReach{Origin: r.FieldCentre.Norm(), Nearest: -1, AxialCoil: -1}
	if !(ext > 0) || !slices.ContainsFunc(r.Coils, func(cr calc.CoilResult) bool { return cr.Current != 0 && !math.IsNaN(cr.Current) }) {
		return ir // nothing to search, or no current to make a field
	}
	ir.Searched = true
	r, coils, ir.Peak = acPeakResults(d, r, coils)
	fm := implantField(d, r, coils)
	if ir.Peak {
		ir.Origin = fm(calc.Vec{}).Norm()
	}
	// Along the axis the search may come close to the origin (a bore holds
	// no conductor); in the plane it stops outside the windings.
	f := calc.CoilFrame(reachAxis(d))
	ir.Axis = f.U
	up, down := reach(fm, calc.Vec{}, f.U, ImplantField, ext*0.01, ext*1e3),
		reach(fm, calc.Vec{}, f.U.Scale(-1), ImplantField, ext*0.01, ext*1e3)
	ir.Axial, ir.AxialUp, ir.AxialDown = math.Max(up, down), up, down
	e1, e2 := reach(fm, calc.Vec{}, f.E1, ImplantField, ext, ext*1e3), reach(fm, calc.Vec{}, f.E2, ImplantField, ext, ext*1e3)
	ir.Radial = math.Max(e1, e2)
	ir.Farthest, ir.Toward = farthestReach(fm, d, r, ext)
	for i, p := range r.Probes {
		b := p.B.Norm()
		if ir.Peak {
			b = fm(p.At).Norm()
		}
		if b >= ImplantField {
			ir.Probes = append(ir.Probes, i)
			ir.ProbeField = append(ir.ProbeField, b)
		}
	}
	os := outlines(d, coils)
	for _, o := range os {
		if dd, bore := o.distance(calc.Vec{}); dd == 0 && !bore {
			ir.OriginInside = true
		}
	}
	var extra []calc.Vec
	if ir.Axial > 0 {
		far := f.U.Scale(up)
		if down > up {
			far = f.U.Scale(-down)
		}
		ir.AxialClear, ir.AxialCoil, ir.AxialBore = nearestOutline(os, far)
		if ir.AxialClear > 0 {
			for _, o := range os {
				// "beyond the end, along its axis" only where the search
				// line is that winding's own axis direction
				if v, _ := o.distance(far); o.coil == ir.AxialCoil && v == ir.AxialClear && !o.rect && math.Abs(o.fr.U.Dot(f.U)) > 1-1e-9 {
					l := o.fr.ToLocal(far.Sub(o.centre))
					ir.AxialEnd = math.Hypot(l[0], l[1]) <= o.r1
				}
			}
		}
		extra = append(extra, f.U.Scale(up), f.U.Scale(-down))
	}
	extra = append(extra, f.E1.Scale(e1), f.E2.Scale(e2), ir.Toward.Scale(ir.Farthest))
	var points []calc.Vec
	for _, p := range extra {
		if p.Norm() > 0 {
			points = append(points, p)
		}
	}
	ir.Windings = windingReaches(fm, d, r, coils, ext, points, conductorBounds(d, r, coils), ImplantField)
	ir.Sphere = sphereSearched(d)
	for i, w := range ir.Windings {
		if w.Distance > ir.Distance || (ir.Nearest < 0 && w.Surface >= ImplantField) {
			ir.Distance, ir.Nearest = w.Distance, i
		}
	}
	return ir
}

// reachAxis is the line through the origin the implant reach is
// measured along: the coils' common axis where every coil's axis lies on
// one line through the origin (a single coil at the origin on any axis, a
// coaxial stack), else the z axis.
func reachAxis(d calc.Design) calc.Vec {
	z := calc.Vec{0, 0, 1}
	if len(d.Coils) == 0 {
		return z
	}
	u := calc.CoilFrame(d.Coils[0].Axis).U
	for _, co := range d.Coils {
		v := calc.CoilFrame(co.Axis).U
		off := co.Centre.Sub(u.Scale(co.Centre.Dot(u))).Norm()
		if math.Abs(math.Abs(v.Dot(u))-1) > 1e-12 || off > 1e-9 {
			return z
		}
	}
	if u.Dot(z) < 0 {
		u = u.Scale(-1)
	}
	return u
}

// farthestReach is the largest distance from the origin at which fm
// reaches ImplantField along the directions ImplantReach.Farthest names,
// each searched inward from 1000 design extents to the sphere of one
// extent that holds every winding (reach), on every core.
// Far from the coils the field is a dipole's, strongest along the moment;
// nearer, along the coils' axes and toward their centres.
func farthestReach(fm func(calc.Vec) calc.Vec, d calc.Design, r calc.Results, ext float64) (float64, calc.Vec) {
	var dirs []calc.Vec
	add := func(v calc.Vec) {
		n := v.Norm()
		if !(n > 0) || math.IsInf(n, 0) {
			return
		}
		for _, u := range []calc.Vec{v.Scale(1 / n), v.Scale(-1 / n)} {
			dirs = appendDirection(dirs, u)
		}
	}
	add(calc.Vec{0, 0, 1})
	add(calc.Vec{1, 0, 0})
	add(calc.Vec{0, 1, 0})
	add(r.Moment)
	for _, co := range d.Coils {
		add(calc.CoilFrame(co.Axis).U)
		add(co.Centre)
	}
	dist := make([]float64, len(dirs))
	eachIndex(len(dirs), func(i int) { dist[i] = reach(fm, calc.Vec{}, dirs[i], ImplantField, ext, ext*1e3) })
	best, toward := 0.0, calc.Vec{}
	for i, v := range dist {
		if v > best {
			best, toward = v, dirs[i]
		}
	}
	return best, toward
}

// outline is the solid a winding (one coil of a block) or a rod fills
// with everything inside it, bore included, in the coil's frame about
// centre: for a circular winding the cylinder of radius R1 from Z0 to Z1
// (its rim rounded to the bundle's radius for a round bundle), for a
// rectangle the filled rectangle W × H thickened by the bundle's radius,
// for a rod the cylinder of its diameter and length. Its outer surface is
// what the implant reach is measured from.
type outline struct {
	coil   int
	centre calc.Vec
	fr     calc.Frame
	rect   bool
	round  bool    // rim rounded: r is the bundle's radius about (rc, zc)
	w, h   float64 // rectangle: half-width, half-height of the bundle's centre line
	r0, r1 float64 // bore and outer radius
	z0, z1 float64 // axial extent about centre
	r      float64 // bundle radius (round rim, rectangle)
	reach  float64 // radius of a sphere about centre that holds the outline
	core   bool    // a rod's core, not a winding
}

// distance is the distance, m, from p to the outline (0 inside it), and
// whether p lies in the bore (inside the outline, within the inner radius,
// for a circular winding).
func (o outline) distance(p calc.Vec) (d float64, bore bool) {
	l := o.fr.ToLocal(p.Sub(o.centre))
	if o.rect {
		q := calc.Vec{math.Max(math.Abs(l[0])-o.w, 0), math.Max(math.Abs(l[1])-o.h, 0), l[2]}
		d = math.Max(q.Norm()-o.r, 0)
		return d, d == 0 && math.Abs(l[0]) < o.w-o.r && math.Abs(l[1]) < o.h-o.r
	}
	// lengths of a winding's size: no overflow for Hypot to guard against
	rho := math.Sqrt(l[0]*l[0] + l[1]*l[1])
	if o.round {
		rc, zc := (o.r0+o.r1)/2, (o.z0+o.z1)/2
		a, b := math.Max(rho-rc, 0), l[2]-zc
		d = math.Max(math.Sqrt(a*a+b*b)-o.r, 0)
	} else {
		a, b := math.Max(rho-o.r1, 0), math.Max(math.Max(l[2]-o.z1, o.z0-l[2]), 0)
		d = math.Sqrt(a*a + b*b)
	}
	return d, d == 0 && rho < o.r0
}

// outlines are the outlines of every winding of every coil block (each
// coil of a pair) and of every rod.
func outlines(d calc.Design, coils []CoilStudy) []outline {
	var out []outline
	for i, co := range d.Coils {
		out = append(out, coilOutlines(i, co, coils[i])...)
	}
	return out
}

// coilOutlines are the outlines of coil block i, co.
func coilOutlines(i int, co calc.Coil, cs CoilStudy) []outline {
	var out []outline
	{
		fr := calc.CoilFrame(co.Axis)
		if co.Form == calc.Rectangle {
			b := cs.Bundle / 2
			out = append(out, outline{coil: i, centre: co.Centre, fr: fr, rect: true, w: co.Width / 2, h: co.Height / 2, r: b})
		} else {
			e := cs.Envelope
			for _, z := range cs.Placements {
				out = append(out, outline{coil: i, centre: co.Centre.Add(fr.U.Scale(z)), fr: fr, round: e.Round,
					r0: e.R0, r1: e.R1, z0: e.Z0, z1: e.Z1, r: (e.Z1 - e.Z0) / 2})
			}
		}
		if cs.Kinds.Core != nil && co.Core.Length > 0 && co.Core.Diameter > 0 {
			out = append(out, outline{coil: i, centre: co.Centre, fr: fr, r1: co.Core.Diameter / 2,
				z0: -co.Core.Length / 2, z1: co.Core.Length / 2, core: true})
		}
	}
	for k := range out {
		o := &out[k]
		if o.rect {
			o.reach = calc.Vec{o.w + o.r, o.h + o.r, o.r}.Norm()
		} else {
			o.reach = math.Hypot(o.r1+o.r, math.Max(math.Abs(o.z0), math.Abs(o.z1))+o.r)
		}
	}
	return out
}

// nearestOutline is the distance from p to the nearest outline, the coil
// block it belongs to and whether p lies in that winding's bore.
func nearestOutline(os []outline, p calc.Vec) (d float64, coil int, bore bool) {
	return nearestOutlineFrom(os, p, 0)
}

// nearestOutlineFrom is nearestOutline trying os[first] before the
// others, which are skipped where the sphere that holds them lies
// farther than the nearest found so far (o.reach; the result is the
// same).
func nearestOutlineFrom(os []outline, p calc.Vec, first int) (d float64, coil int, bore bool) {
	d, coil = math.Inf(1), -1
	best := -1
	try := func(k int) {
		o := &os[k]
		if r := p.Sub(o.centre); best >= 0 && o.reach > 0 && r.Dot(r) > (d+o.reach)*(d+o.reach)*(1+1e-9) {
			return
		}
		if v, b := o.distance(p); v < d || (v == d && k < best) {
			d, coil, bore, best = v, o.coil, b, k
		}
	}
	if first > 0 && first < len(os) {
		try(first)
	}
	for k := range os {
		if k != first || first == 0 {
			try(k)
		}
	}
	return d, coil, bore
}

// appendDirection appends the unit direction u to dirs unless dirs holds
// it already (to 10⁻⁹).
func appendDirection(dirs []calc.Vec, u calc.Vec) []calc.Vec {
	for _, v := range dirs {
		if u.Sub(v).Norm() < 1e-9 {
			return dirs
		}
	}
	return append(dirs, u)
}

// reachDirections are the directions the implant level is searched along
// from a winding's centre, in the coil's frame: every 10° in the planes
// through the axis along E1 and along E2, and for a rectangle also in its
// own plane and in the planes through the axis and each diagonal.
func reachDirections(co calc.Coil, fr calc.Frame) []calc.Vec {
	planes := [][2]calc.Vec{{fr.U, fr.E1}, {fr.U, fr.E2}}
	if co.Form == calc.Rectangle {
		d1 := fr.E1.Scale(co.Width).Add(fr.E2.Scale(co.Height)).Unit()
		d2 := fr.E1.Scale(co.Width).Sub(fr.E2.Scale(co.Height)).Unit()
		planes = append(planes, [2]calc.Vec{fr.E1, fr.E2}, [2]calc.Vec{fr.U, d1}, [2]calc.Vec{fr.U, d2})
	}
	var dirs []calc.Vec
	for _, pl := range planes {
		for k := range 36 {
			a := float64(k) * math.Pi / 18
			dirs = appendDirection(dirs, pl[0].Scale(math.Cos(a)).Add(pl[1].Scale(math.Sin(a))))
		}
	}
	return dirs
}

// windingReaches searches the field of all coils outward from every
// winding (and rod): along reachDirections from the centre of each of a
// block's windings, each search starting where the line leaves the block's
// own outlines and running inward from 1000 design extents; and, as
// before, from the middle of each end face along the axis and from the
// outer surface in the coil's plane. Surface is the largest |B| found
// where a search leaves a block's outline; a point found at the level
// counts, by its distance from the nearest outline, toward that
// outline's block. extra are further points at the level (the searches
// from the origin), counted the same way.
// ownStretch is how far, up to lim, the line from at along u stays
// nearer to block coil's outlines than to any other block's: the search
// from a block looks for the level in the block's own region, and the
// regions of the others are searched from them. Where the line leaves
// the region within lim, the first crossing found by stepping every
// 1/64 of lim and bisecting is taken.
func ownStretch(os []outline, coil int, at, u calc.Vec, lo, lim float64) float64 {
	first := slices.IndexFunc(os, func(o outline) bool { return o.coil == coil })
	own := func(t float64) bool {
		_, c, _ := nearestOutlineFrom(os, at.Add(u.Scale(t)), max(first, 0))
		return c == coil
	}
	step := (lim - lo) / 64
	for t := lo + step; t <= lim; t += step {
		if own(t) {
			continue
		}
		a, b := t-step, t
		for b-a > 1e-9*b {
			m := 0.5 * (a + b)
			if own(m) {
				a = m
			} else {
				b = m
			}
		}
		return b
	}
	return lim
}

// surfacePeak is the largest |B| of fm found just outside (gap) the
// outer surface of coil block i when its outlines are circular windings
// (one, or a pair's two; solid, or a round bundle's ring with its bore
// filled in; no rod or rectangle; else 0), by outlinePeak. fm is the
// search's field (levelField), good to far more than the three figures
// quoted.
func surfacePeak(fm func(calc.Vec) calc.Vec, co calc.Coil, cs CoilStudy, os []outline, i int, gap float64, alone bool) float64 {
	var own []outline
	for _, o := range os {
		if o.coil == i {
			own = append(own, o)
		}
	}
	if len(own) == 0 || cs.Kinds.Core != nil {
		return 0
	}
	for _, o := range own {
		if o.rect || o.core || !(o.r1 > 0) || !(o.z1 > o.z0) {
			return 0
		}
	}
	best := 0.0
	for _, o := range own {
		best = math.Max(best, outlinePeak(fm, o, gap, alone, func(p calc.Vec) bool { return insideOther(os, i, p) }))
	}
	return best
}

// insideOther reports whether p lies within the winding or rod of a
// block other than i (not in its bore): a winding's surface, taken across
// its bore, may pass through another coil's conductors, where the field
// of the filament model has no bound and no one can be.
func insideOther(os []outline, i int, p calc.Vec) bool {
	for _, o := range os {
		if o.coil != i {
			if d, bore := o.distance(p); d == 0 && !bore {
				return true
			}
		}
	}
	return false
}

// Surface walks of outlinePeak: peakSteps points along the
// half-perimeter of a winding's section, in peakPlanes half-planes about
// its axis (a multiple of four, so that the half-planes along ±E1 and ±E2
// are among them and a coil turned by a quarter turn about its axis is
// walked in the same places), and at most peakStarts of the walk's local
// maxima climbed from.
const (
	peakSteps  = 48
	peakPlanes = 24
	peakStarts = 8
)

// outlinePeak is surfacePeak's largest |B| on one circular outline o,
// gap outside it, leaving out the points skip reports (within other
// coils' windings). The outer surface is walked in its meridian
// half-planes along the half-perimeter of its section — for a solid
// winding the end face, the outer side and the other end face; for a
// round bundle the bore's face, the rounded rim and the other face —
// at peakSteps+1 points in each of peakPlanes half-planes about the axis
// (one when the block is alone in the design, alone: a lone circular
// coil's field is the same in every half-plane). From each of the
// walk's largest local maxima (peakStarts) a compass search in arc length
// and azimuth — eight moves, the walk's steps halved to 10⁻⁸ of the
// half-perimeter — climbs to the peak of |B| over the surface, wherever
// it lies between the half-planes, so the result does not hang on where
// the walk's points happen to fall.
func outlinePeak(fm func(calc.Vec) calc.Vec, o outline, gap float64, alone bool, skip func(calc.Vec) bool) float64 {
	var edge [3]float64
	// section is the point (rho, z) of the half-perimeter at arc length t
	var section func(t float64) (rho, z float64)
	if o.round {
		rc, zc, r := (o.r0+o.r1)/2, (o.z0+o.z1)/2, o.r+gap
		edge = [3]float64{rc, math.Pi * r, rc}
		section = func(t float64) (float64, float64) {
			switch {
			case t <= edge[0]:
				return t, zc - r
			case t <= edge[0]+edge[1]:
				s, c := math.Sincos((t-edge[0])/r - math.Pi/2)
				return rc + r*c, zc + r*s
			default:
				return rc - (t - edge[0] - edge[1]), zc + r
			}
		}
	} else {
		r1, z0, z1 := o.r1+gap, o.z0-gap, o.z1+gap
		edge = [3]float64{r1, z1 - z0, r1}
		section = func(t float64) (float64, float64) {
			switch {
			case t <= edge[0]:
				return t, z0
			case t <= edge[0]+edge[1]:
				return r1, z0 + (t - edge[0])
			default:
				return r1 - (t - edge[0] - edge[1]), z1
			}
		}
	}
	total := edge[0] + edge[1] + edge[2]
	value := func(phi, t float64) float64 {
		t = math.Min(math.Max(t, 0), total)
		rho, z := section(t)
		s, c := math.Sincos(phi)
		p := o.centre.Add(o.fr.E1.Scale(rho * c)).Add(o.fr.E2.Scale(rho * s)).Add(o.fr.U.Scale(z))
		if skip(p) {
			return 0
		}
		if b := fm(p).Norm(); b > 0 { // NaN never
			return b
		}
		return 0
	}
	planes := peakPlanes
	if alone {
		planes = 1
	}
	dt, dphi := total/peakSteps, 2*math.Pi/float64(planes)
	grid := make([]float64, planes*(peakSteps+1))
	eachIndex(len(grid), func(k int) {
		j, i := k/(peakSteps+1), k%(peakSteps+1)
		grid[k] = value(float64(j)*dphi, float64(i)*dt)
	})
	at := func(j, i int) float64 { return grid[((j+planes)%planes)*(peakSteps+1)+i] }
	type start struct {
		j, i int
		b    float64
	}
	var starts []start
	for j := range planes {
		for i := range peakSteps + 1 {
			b := at(j, i)
			if !(b > 0) {
				continue
			}
			top := true
			for _, m := range [][2]int{{0, 1}, {0, -1}, {1, 0}, {-1, 0}, {1, 1}, {1, -1}, {-1, 1}, {-1, -1}} {
				if ii := i + m[1]; ii >= 0 && ii <= peakSteps && (planes > 1 || m[0] == 0) && at(j+m[0], ii) > b {
					top = false
				}
			}
			if top {
				starts = append(starts, start{j, i, b})
			}
		}
	}
	sort.SliceStable(starts, func(a, b int) bool { return starts[a].b > starts[b].b })
	starts = starts[:min(peakStarts, len(starts))]
	peaks := make([]float64, len(starts))
	eachIndex(len(starts), func(k int) {
		phi, t, b := float64(starts[k].j)*dphi, float64(starts[k].i)*dt, starts[k].b
		ht, hp := dt, dphi
		if alone {
			hp = 0
		}
		for ht > 1e-8*total {
			moved := false
			for _, m := range [][2]float64{{1, 0}, {-1, 0}, {0, 1}, {0, -1}, {1, 1}, {1, -1}, {-1, 1}, {-1, -1}} {
				if hp == 0 && m[1] != 0 {
					continue
				}
				tt, pp := math.Min(math.Max(t+m[0]*ht, 0), total), phi+m[1]*hp
				if v := value(pp, tt); v > b {
					phi, t, b, moved = pp, tt, v, true
					break
				}
			}
			if !moved {
				ht, hp = ht/2, hp/2
			}
		}
		peaks[k] = b
	})
	best := 0.0
	for _, b := range peaks {
		best = math.Max(best, b)
	}
	return best
}

// sampleEveryLine makes windingReaches sample the lines even where one
// convex outline makes it needless (tests).
var sampleEveryLine = false

func windingReaches(fm func(calc.Vec) calc.Vec, d calc.Design, r calc.Results, coils []CoilStudy, ext float64, extra []calc.Vec, ks []float64, lvl float64) []WindingReach {
	os := outlines(d, coils)
	bound := 0.0
	for _, k := range ks {
		bound += k
	}
	var moments []calc.Vec
	for i := range d.Coils {
		if i < len(r.Coils) {
			moments = append(moments, r.Coils[i].Moment)
		}
	}
	var model *calc.FieldModel
	if ks != nil {
		model = calc.FieldModelAt(d, resultCurrents(d, r)).ForMaps() // a level search needs no more than the maps' 10⁻⁹
	}
	fast := levelField(fm, model, newFieldBound(d, ks, os), moments, lvl)
	gap := 1e-6 * math.Max(ext, 1e-3)
	type ray struct {
		coil    int
		at, dir calc.Vec
		centre  calc.Vec // the winding centre a line from reachDirections leaves
		turn    bool     // such a line, whose direction the refinement may turn
	}
	exits := make([]func(c, u calc.Vec) float64, len(d.Coils))
	var rays []ray
	// convexAlone marks a block of one convex outline: a solid winding
	// with its bore filled in, not a thin bundle's ring, a rectangle's
	// frame, a pair's two coils or a winding beside its rod. The distance
	// from such a block grows along every line leaving it, so a line that
	// starts at it and ends at the level nearer to it than to any other
	// block has its farthest point from the windings at its end; the line
	// is taken to stay nearer to the block between (it would have to pass
	// nearer to another solid and come back), so its samples are not
	// needed, and the search along it need not go beyond the block's own
	// region (TestOneConvexOutlineNeedsNoSamples,
	// TestLatticeReachWithoutOwnLineSamples).
	convexAlone := make([]bool, len(d.Coils))
	for i, co := range d.Coils {
		fr := calc.CoilFrame(co.Axis)
		var own []outline
		for _, o := range os {
			if o.coil == i {
				own = append(own, o)
			}
		}
		convexAlone[i] = len(own) == 1 && !own[0].round && !own[0].rect
		outside := func(p calc.Vec) bool {
			for _, o := range own {
				if v, _ := o.distance(p); v == 0 {
					return false
				}
			}
			return true
		}
		// exit is where the line from c along u leaves the block's own
		// outlines for good (they are convex and hold c, or lie clear of
		// it on another placement, which the step outward skips).
		exit := func(c, u calc.Vec) float64 {
			hi := math.Max(ext, 1e-3)
			for !outside(c.Add(u.Scale(hi))) {
				hi *= 2
			}
			lo := 0.0
			for range 60 {
				mid := (lo + hi) / 2
				if outside(c.Add(u.Scale(mid))) {
					hi = mid
				} else {
					lo = mid
				}
			}
			return hi
		}
		centres := []calc.Vec{co.Centre}
		if co.Form != calc.Rectangle {
			centres = centres[:0]
			for _, z := range coils[i].Placements {
				centres = append(centres, co.Centre.Add(fr.U.Scale(z)))
			}
		}
		exits[i] = exit
		for _, c := range centres {
			dirs := reachDirections(co, fr)
			if sphereSearched(d) {
				dirs = append(dirs, sphereDirections...)
			}
			for _, u := range dirs {
				t := exit(c, u)
				rays = append(rays, ray{i, c.Add(u.Scale(t + gap)), u, c, true})
			}
		}
		// A rectangle's field is strongest at its corners, where two sides
		// add; over the inside of a corner the level reaches farther from
		// the frame than any line from the centre shows. Lines leave each
		// corner of the frame's centre line along sphereDirections too.
		if co.Form == calc.Rectangle && sphereSearched(d) {
			for _, sx := range []float64{1, -1} {
				for _, sy := range []float64{1, -1} {
					c := co.Centre.Add(fr.E1.Scale(sx * co.Width / 2)).Add(fr.E2.Scale(sy * co.Height / 2))
					for _, u := range sphereDirections {
						t := exit(c, u)
						rays = append(rays, ray{i, c.Add(u.Scale(t + gap)), u, c, true})
					}
				}
			}
		}
		// From the middle of each end face, at the mean radius, along the
		// axis: next to the conductors' ends, at eight places round the
		// rim (another coil nearby breaks the symmetry about the axis).
		if co.Form != calc.Rectangle {
			e := coils[i].Envelope
			rm := (e.R0 + e.R1) / 2
			for _, c := range centres {
				for k := range 8 {
					a := float64(k) * math.Pi / 4
					rim := fr.E1.Scale(rm * math.Cos(a)).Add(fr.E2.Scale(rm * math.Sin(a)))
					for _, s := range []float64{1, -1} {
						rays = append(rays, ray{coil: i, at: c.Add(rim).Add(fr.U.Scale(s * (e.Z1 + gap))), dir: fr.U.Scale(s)})
					}
				}
			}
		} else {
			b := coils[i].Bundle
			for _, s := range []float64{1, -1} {
				rays = append(rays, ray{coil: i, at: co.Centre.Add(fr.E1.Scale(co.Width / 2)).Add(fr.U.Scale(s * (b/2 + gap))), dir: fr.U.Scale(s)})
			}
		}
	}
	type found struct {
		surface float64
		point   calc.Vec
		ok      bool
	}
	res := make([]found, len(rays))
	far := math.Max(ext, 1e-3) * 1e3
	// reachLimit is how far along a line from at the level is looked
	// for: beyond the sphere of radius ext about the origin by more than
	// √(bound/level), no conductor is near enough to give the level.
	reachLimit := func(at calc.Vec) float64 {
		if bound > 0 {
			return math.Min(far, at.Norm()+ext+math.Sqrt(bound/lvl))
		}
		return far
	}
	// crossing is the farthest point at the level on the line from at
	// along u, up to lim, with |B| = b at its start; the first guess is
	// that field falling as a dipole's, as the cube of the distance from
	// from, the centre of the block it leaves.
	crossing := func(at, u, from calc.Vec, b, lim float64) (calc.Vec, bool) {
		guess := 0.0
		if d0 := at.Sub(from).Norm(); b > lvl && d0 > 0 {
			guess = d0 * (math.Cbrt(b/lvl) - 1)
		}
		if t := reachFrom(fast, at, u, lvl, gap, lim, guess); t > 0 {
			return at.Add(u.Scale(t)), true
		}
		return calc.Vec{}, false
	}
	eachIndex(len(rays), func(k int) {
		r := rays[k]
		b := fm(r.at).Norm()
		if math.IsNaN(b) {
			return
		}
		if !insideOther(os, r.coil, r.at) {
			res[k].surface = b
		}
		lim := reachLimit(r.at)
		if len(d.Coils) > 1 && convexAlone[r.coil] && !sampleEveryLine {
			lim = ownStretch(os, r.coil, r.at, r.dir, gap, lim)
		}
		res[k].point, res[k].ok = crossing(r.at, r.dir, d.Coils[r.coil].Centre, b, lim)
	})
	wr := make([]WindingReach, len(d.Coils))
	count := func(p calc.Vec) {
		if dd, k, _ := nearestOutline(os, p); k >= 0 && !math.IsInf(dd, 0) {
			wr[k].Distance = math.Max(wr[k].Distance, dd)
		}
	}
	for k, f := range res {
		wr[rays[k].coil].Surface = math.Max(wr[rays[k].coil].Surface, f.surface)
		if f.ok {
			count(f.point)
		}
	}
	for _, p := range extra {
		count(p)
	}
	if !axisymmetric(d) {
		lines := make([]turnLine, len(rays))
		for k, r := range rays {
			lines[k] = turnLine{coil: r.coil, dir: r.dir, point: res[k].point, ok: res[k].ok && r.turn}
		}
		along := func(k int, u calc.Vec) (calc.Vec, bool) {
			r := rays[k]
			at := r.centre.Add(u.Scale(exits[r.coil](r.centre, u) + gap))
			return crossing(at, u, r.centre, fast(at).Norm(), reachLimit(at))
		}
		dist := func(p calc.Vec) float64 { dd, _, _ := nearestOutline(os, p); return dd }
		for _, p := range turnedReaches(len(d.Coils), lines, along, dist) {
			count(p)
		}
	}
	// The lines sample the outer surface at a few places only; the field
	// there peaks near the rims, between them. A solid winding's surface
	// is also walked in its meridian planes (surfacePeak).
	eachIndex(len(d.Coils), func(i int) {
		wr[i].Surface = math.Max(wr[i].Surface, surfacePeak(fast, d.Coils[i], coils[i], os, i, gap, len(d.Coils) == 1))
	})
	// The farthest point at the level along a line need not be the one
	// farthest from every winding: between the coils of a pair the field
	// at the centre may reach the level far from both. Each line
	// (but those of a convexAlone block that end nearest to it) is
	// sampled from its start to its farthest point at the level, every
	// 1/400 of the design's extent, and the samples are tried farthest
	// from the windings first: for each block the first at the level (or
	// no farther than its distance found so far) ends its search.
	type sample struct {
		at   calc.Vec
		d    float64
		coil int
	}
	step := math.Max(ext, 1e-3) / 400
	perRay := make([][]sample, len(res))
	eachIndex(len(res), func(k int) {
		f := res[k]
		if !f.ok {
			return
		}
		r := rays[k]
		if _, c, _ := nearestOutline(os, f.point); convexAlone[r.coil] && c == r.coil && !sampleEveryLine {
			return
		}
		t := f.point.Sub(r.at).Norm()
		for j := 1; float64(j)*step < t && j <= 4000; j++ {
			p := r.at.Add(r.dir.Scale(float64(j) * step))
			if dd, c, _ := nearestOutline(os, p); c >= 0 && dd > wr[c].Distance {
				perRay[k] = append(perRay[k], sample{p, dd, c})
			}
		}
	})
	var samples []sample
	for _, ss := range perRay {
		samples = append(samples, ss...)
	}
	sort.Slice(samples, func(a, b int) bool { return samples[a].d > samples[b].d })
	// Tried in that order, farthest first, in batches whose fields are
	// evaluated on every core: a batch evaluates every sample the state at
	// its start leaves open (a superset of those the order reaches), then
	// the order is followed through it, so the outcome is the serial one.
	done := make([]bool, len(d.Coils))
	const batch = 128
	level := make([]bool, batch)
	for from := 0; from < len(samples); from += batch {
		part := samples[from:min(from+batch, len(samples))]
		eachIndex(len(part), func(i int) {
			s := part[i]
			level[i] = !done[s.coil] && s.d > wr[s.coil].Distance && fast(s.at).Norm() >= lvl
		})
		for i, s := range part {
			if done[s.coil] {
				continue
			}
			if s.d <= wr[s.coil].Distance {
				done[s.coil] = true
				continue
			}
			if level[i] {
				wr[s.coil].Distance = s.d
				done[s.coil] = true
			}
		}
	}
	return wr
}

// turnLine is one search line as turnedReaches takes it: its block, its
// direction and, when ok, its point at the level.
type turnLine struct {
	coil       int
	dir, point calc.Vec
	ok         bool
}

// axisymmetric reports whether d's field is symmetric about one winding's
// axis: a single circular block (a rectangle's is not, and reaches
// farthest over its corners, between its search planes).
func axisymmetric(d calc.Design) bool {
	return len(d.Coils) == 1 && d.Coils[0].Form != calc.Rectangle
}

// turnedReaches refines the search lines that leave the windings'
// centres. They lie in each winding's meridian planes, where one circular
// coil's field has all its extremes; where several coils' fields add, the
// level can lie farther from every winding between those planes (three
// coils on x, y and z reach farthest along a diagonal; a rectangle over
// its corners). From the line
// that ended farthest from the windings — each block's three farthest,
// the twelve farthest of those —, a compass search turns the line about its
// centre — steps of 5° in eight directions across it, halved to 0.2° — to
// where its point at the level lies farthest from the nearest outline
// (TestImplantBoundHoldsOffTheMeridianPlanes). The points it ends at are
// returned; along(k, u) is line k's point at the level in direction u,
// dist a point's distance from the nearest outline. (A single circular
// block is not turned: its own planes hold its extremes.)
func turnedReaches(blocks int, lines []turnLine, along func(k int, u calc.Vec) (calc.Vec, bool), dist func(calc.Vec) float64) []calc.Vec {
	// each block's three lines that ended farthest from the windings
	type seed struct {
		k int
		d float64
	}
	per := make([][]seed, blocks)
	for k, l := range lines {
		if l.ok {
			per[l.coil] = append(per[l.coil], seed{k, dist(l.point)})
		}
	}
	var all []seed
	for _, ss := range per {
		sort.Slice(ss, func(a, b int) bool { return ss[a].d > ss[b].d })
		all = append(all, ss[:min(3, len(ss))]...)
	}
	sort.SliceStable(all, func(a, b int) bool { return all[a].d > all[b].d })
	all = all[:min(12, len(all))]
	seeds := make([]int, len(all))
	for j, sd := range all {
		seeds[j] = sd.k
	}
	out := make([]calc.Vec, len(seeds))
	eachIndex(len(seeds), func(j int) {
		k := seeds[j]
		u, p := lines[k].dir, lines[k].point
		top := dist(p)
		for h := math.Tan(5 * math.Pi / 180); h > math.Tan(0.2*math.Pi/180); {
			e1, e2 := calc.CoilFrame(u).E1, calc.CoilFrame(u).E2
			moved := false
			for a := range 8 {
				// eight ways across the line: a ridge where the nearest
				// outline changes stalls a search along two
				s, c := math.Sincos(float64(a) * math.Pi / 4)
				v := u.Add(e1.Scale(h * c)).Add(e2.Scale(h * s)).Unit()
				if q, ok := along(k, v); ok {
					if dq := dist(q); dq > top {
						u, p, top, moved = v, q, dq, true
						break
					}
				}
			}
			if !moved {
				h /= 2
			}
		}
		out[j] = p
	})
	return out
}

// sphereBlocks is the most coil blocks whose search lines also leave each
// winding's centre along sphereDirections: in a small set of coils on
// several axes each block's reach may lie far from its own meridian
// planes (a three-axis set's reach per coil, not only the set's bound),
// where the turned search of a few lines may not climb; a large array's
// blocks are many and alike, and its turned search suffices.
const sphereBlocks = 4

// sphereSearched reports whether d's search lines also run along
// sphereDirections: a small set of coils, or a rectangle, whose field is
// not symmetric about one axis.
func sphereSearched(d calc.Design) bool { return !axisymmetric(d) && len(d.Coils) <= sphereBlocks }

// sphereDirections are 162 directions spread evenly over the sphere,
// about 16° apart.
var sphereDirections = fibonacciSphere(162)

// fibonacciSphere is n unit vectors spread evenly over the sphere: the
// Fibonacci lattice, z = 1 − (2k + 1)/n and azimuth k times the golden
// angle π(3 − √5).
func fibonacciSphere(n int) []calc.Vec {
	g := math.Pi * (3 - math.Sqrt(5))
	out := make([]calc.Vec, n)
	for k := range n {
		z := 1 - (2*float64(k)+1)/float64(n)
		s := math.Sqrt(1 - z*z)
		out[k] = calc.Vec{s * math.Cos(g*float64(k)), s * math.Sin(g*float64(k)), z}
	}
	return out
}
