package analysis

import (
	"math"

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
}

// Safety holds the findings, most severe first within each coil, and the
// reach of the implant-field level.
type Safety struct {
	Findings []Finding
	Implant  ImplantReach
}

// ImplantReach is where the field of all coils together reaches
// ImplantField: at the origin, along the z axis and in the xy plane
// (largest distance from the origin, 0 when not reached), at probes, and
// from every winding's surface outward (Windings, one per coil block).
type ImplantReach struct {
	Searched      bool    // false for a design without extent
	Origin        float64 // T, |B| at the origin
	Axial, Radial float64 // m
	// Axis is the direction Axial is measured along and Radial across:
	// the z axis, unless every coil's axis lies on one line through the
	// origin, which is then the axis (reachAxis).
	Axis calc.Vec
	// Farthest is the largest distance from the origin, beyond the sphere
	// that holds every winding, at which |B| still reaches the level along
	// any direction searched (±x, ±y, ±z, ± the
	// design's net moment, ± each coil's axis and ± the direction of each
	// coil's centre), Toward that direction; 0 when it is not reached.
	Farthest float64  // m
	Toward   calc.Vec // unit vector
	Probes   []int    // indices of probes at or above the level
	Windings []WindingReach
}

// WindingReach is the field of all coils next to one coil block's winding:
// Surface the largest |B| found at its outer surface (where a hand can
// reach it), and Distance the largest distance from that surface, along
// the coil's axis beyond its end faces and outward in its plane, at which
// |B| still reaches ImplantField (0 when it does not). For a cored coil
// the surface includes the rod's end faces, and the field the core's.
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

func assessSafety(d calc.Design, r calc.Results, coils []CoilStudy) Safety {
	var s Safety
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
		if ts := coils[i].Heat.SurfaceMax; ts > HotSurface {
			add(HotSurfaceFound, Caution, ts)
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
	return s
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
// refining by bisection to 10⁻⁹ of the distance; 0 when the level is not
// reached at or beyond rmin, which must lie outside every winding. Valid
// because the field outside the windings falls monotonically with
// distance. field is the field of all coils (implantField).
func reach(field func(calc.Vec) calc.Vec, origin, u calc.Vec, level, rmin, rmax float64) float64 {
	at := func(r float64) float64 { return field(origin.Add(u.Scale(r))).Norm() }
	if at(rmax) >= level {
		return rmax
	}
	hi := rmax
	for {
		lo := math.Max(hi/1.25, rmin)
		if at(lo) >= level {
			for hi-lo > 1e-9*hi {
				mid := 0.5 * (lo + hi)
				if at(mid) >= level {
					lo = mid
				} else {
					hi = mid
				}
			}
			return lo
		}
		if lo == rmin {
			return 0
		}
		hi = lo
	}
}

// implantField is the field, T, of all coils at their operating currents
// that the implant level is searched in: the windings' (calc.FieldModel)
// and, for every cored coil block with current, its core's by the rod's
// pole model (calc.CorePoleField), which dominates near the rod.
func implantField(d calc.Design, coils []CoilStudy) func(calc.Vec) calc.Vec {
	fm := calc.NewFieldModel(d)
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
		b := fm.At(p)
		for _, c := range cores {
			b = b.Add(calc.CorePoleField(c.c, c.k, p))
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
	ir := ImplantReach{Origin: r.FieldCentre.Norm()}
	if !(ext > 0) {
		return ir
	}
	ir.Searched = true
	fm := implantField(d, coils)
	// Along the axis the search may come close to the origin (a bore holds
	// no conductor); in the plane it stops outside the windings.
	f := calc.CoilFrame(reachAxis(d))
	ir.Axis = f.U
	ir.Axial = math.Max(reach(fm, calc.Vec{}, f.U, ImplantField, ext*0.01, ext*1e3),
		reach(fm, calc.Vec{}, f.U.Scale(-1), ImplantField, ext*0.01, ext*1e3))
	ir.Radial = math.Max(reach(fm, calc.Vec{}, f.E1, ImplantField, ext, ext*1e3),
		reach(fm, calc.Vec{}, f.E2, ImplantField, ext, ext*1e3))
	ir.Farthest, ir.Toward = farthestReach(fm, d, r, ext)
	for i, p := range r.Probes {
		if p.B.Norm() >= ImplantField {
			ir.Probes = append(ir.Probes, i)
		}
	}
	// Each coil's search is independent: on every core, each into its own
	// slot.
	ir.Windings = make([]WindingReach, len(d.Coils))
	eachIndex(len(d.Coils), func(i int) { ir.Windings[i] = windingReach(fm, d.Coils[i], coils[i], ext) })
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
			dup := false
			for _, w := range dirs {
				if u.Sub(w).Norm() < 1e-9 {
					dup = true
					break
				}
			}
			if !dup {
				dirs = append(dirs, u)
			}
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

// windingReach searches the field of all coils outward from the surface
// of one coil block's winding: from the middle of each end face along the
// axis, and from the outer surface in the coil's plane (for a rectangle,
// from the middle of each side across it), in both senses; for a cored
// coil also from the middle of each end face of the rod along the axis.
func windingReach(fm func(calc.Vec) calc.Vec, co calc.Coil, cs CoilStudy, ext float64) WindingReach {
	fr := calc.CoilFrame(co.Axis)
	e := cs.Envelope
	type start struct {
		at, dir calc.Vec
	}
	var starts []start
	// A hair outside the surface, so the search starts clear of the
	// conductors whatever the rounding.
	gap := 1e-6 * math.Max(ext, 1e-3)
	if co.Form == calc.Rectangle {
		b := cs.Bundle
		for _, s := range []float64{1, -1} {
			starts = append(starts,
				start{co.Centre.Add(fr.E1.Scale(s * (co.Width/2 + b/2 + gap))), fr.E1.Scale(s)},
				start{co.Centre.Add(fr.E2.Scale(s * (co.Height/2 + b/2 + gap))), fr.E2.Scale(s)},
				start{co.Centre.Add(fr.E1.Scale(co.Width / 2)).Add(fr.U.Scale(s * (b/2 + gap))), fr.U.Scale(s)})
		}
	} else {
		rm := (e.R0 + e.R1) / 2
		for _, z := range cs.Placements {
			for _, s := range []float64{1, -1} {
				c := co.Centre.Add(fr.U.Scale(z))
				starts = append(starts,
					start{c.Add(fr.E1.Scale(s * (e.R1 + gap))), fr.E1.Scale(s)},
					start{c.Add(fr.E2.Scale(s * (e.R1 + gap))), fr.E2.Scale(s)},
					start{c.Add(fr.E1.Scale(rm)).Add(fr.U.Scale(s * (e.Z1 + gap))), fr.U.Scale(s)})
			}
		}
		if cs.Kinds.Core != nil && co.Core.Length > 0 {
			for _, s := range []float64{1, -1} {
				starts = append(starts, start{co.Centre.Add(fr.U.Scale(s * (co.Core.Length/2 + gap))), fr.U.Scale(s)})
			}
		}
	}
	var wr WindingReach
	for _, st := range starts {
		b := fm(st.at).Norm()
		if math.IsNaN(b) {
			continue
		}
		wr.Surface = math.Max(wr.Surface, b)
		if b >= ImplantField {
			wr.Distance = math.Max(wr.Distance, reach(fm, st.at, st.dir, ImplantField, gap, math.Max(ext, 1e-3)*1e3))
		}
	}
	return wr
}
