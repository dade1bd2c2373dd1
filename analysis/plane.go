package analysis

import (
	"math"

	"coilmemo/calc"
)

// PlaneMap is the normal flux density Bn (the component along the coil's
// axis) of one rectangular coil block alone over a plane parallel to its
// own, the plane of interest of a panel coil: the test plane the spec
// names, else the plane in which every probe lies, or else the plane
// through the first probe (PlaneOfInterest).
// The map covers 1.5 times the coil's sides, widened to hold the probes in
// the plane that lie within planeReach of the axis.
//
// U and V are the node positions (m) along the coil frame's E1 (the
// rectangle's width) and E2 (its height), measured from the foot of the
// coil's axis on the plane; Bn[iv·len(U)+iu] is Bn at (U[iu], V[iv]), T,
// NaN at nodes nearer a conductor than one bundle diameter (only when
// the plane is that near the winding). Centre is Bn at the axis.
//
// Within holds, for each of PlaneTolerances, the half-sides of the largest
// rectangle centred on the axis, in the proportions of the coil's sides,
// over whose perimeter Bn stays within ±tol of Centre: bisection on the
// exact field, checked at 160 points round the perimeter; a rectangle as
// large as the map (MapHalf) when the field never leaves the band there.
type PlaneMap struct {
	Coil     int
	Dist     float64  // m, from the coil's centre along its axis
	AllInIt  bool     // every probe lies in the plane
	E1, E2   calc.Vec // the directions of U and V (the coil frame's)
	U, V     []float64
	UHalf    float64 // m, the map's half-sides
	VHalf    float64
	Bn       []float64
	Centre   float64      // T
	Probes   []PlanePoint // the probes in the plane within the map's reach
	InPlane  int          // the number of probes in the plane, all told
	Within   []PlaneRegion
	Min, Max float64 // T, extremes of Bn over the map's nodes
}

// PlanePoint is a probe in the plane of a PlaneMap: its name, its position
// in the plane (m) and Bn of the coil alone there (T).
type PlanePoint struct {
	Name  string
	U, V  float64
	Bn    float64
	Index int // the probe's index in the design
}

// PlaneRegion is a centred rectangle of half-sides U × V (m) within which
// Bn stays within ±Tol of the centre value (Full: the band holds over the
// whole map, the rectangle is the map's).
type PlaneRegion struct {
	Tol  float64
	U, V float64
	Full bool
}

// PlaneTolerances are the bands of a plane map's uniform regions: ±1 %
// and ±5 % of the centre value.
var PlaneTolerances = []float64{0.01, 0.05}

// planeNodes is the node count along the longer side of a plane map.
const planeNodes = 61

// planeReach bounds a plane map: probes further from the axis than this
// many times the coil's width (or height) are not mapped, so that the map
// stays at the coil's scale.
const planeReach = 2.0

// planeSame is how near a probe must lie to a plane to be in it, m.
const planeSame = 1e-6

// PlaneOfInterest finds the plane of interest of coil block co: the
// spec's test plane (Coil.TestPlane) when it names one, else the plane
// among the probes. It returns the plane's distance from the coil's
// centre along the axis, whether every probe lies in it (else, without a
// test plane, it is the plane through the first probe), and ok false for
// a coil that is not a rectangle or has neither test plane nor probes.
func PlaneOfInterest(co calc.Coil, probes []calc.Probe) (dist float64, all, ok bool) {
	if co.Form != calc.Rectangle || (len(probes) == 0 && !co.HasTestPlane) {
		return 0, false, false
	}
	fr := calc.CoilFrame(co.Axis)
	if co.HasTestPlane {
		dist = co.TestPlane
	} else {
		dist = fr.ToLocal(probes[0].At.Sub(co.Centre))[2]
	}
	all = true
	for _, p := range probes {
		if math.Abs(fr.ToLocal(p.At.Sub(co.Centre))[2]-dist) > planeSame {
			all = false
		}
	}
	return dist, all, true
}

// planeMap maps coil block i of d over its plane of interest; nil when it
// has none (PlaneOfInterest) or no field to map.
func planeMap(d calc.Design, r calc.Results, i int) *PlaneMap {
	co := d.Coils[i]
	if IsReceiver(co) || i >= len(r.Coils) {
		return nil
	}
	dist, all, ok := PlaneOfInterest(co, d.Probes)
	if !ok || !(co.Width > 0) || !(co.Height > 0) {
		return nil
	}
	cr := r.Coils[i]
	fr := calc.CoilFrame(co.Axis)
	src := calc.NewCoilSource(co, cr.Winding, cr.Current)
	foot := co.Centre.Add(fr.U.Scale(dist))
	bn := func(u, v float64) float64 {
		return src.At(foot.Add(fr.E1.Scale(u)).Add(fr.E2.Scale(v))).Dot(fr.U)
	}
	pm := &PlaneMap{Coil: i, Dist: dist, AllInIt: all, E1: fr.E1, E2: fr.E2, Centre: bn(0, 0)}
	if !(math.Abs(pm.Centre) > 0) || math.IsNaN(pm.Centre) || math.IsInf(pm.Centre, 0) {
		return nil
	}
	pm.UHalf, pm.VHalf = 0.75*co.Width, 0.75*co.Height
	for k, p := range d.Probes {
		l := fr.ToLocal(p.At.Sub(co.Centre))
		if math.Abs(l[2]-dist) > planeSame {
			continue
		}
		pm.InPlane++
		if math.Abs(l[0]) > planeReach*co.Width || math.Abs(l[1]) > planeReach*co.Height {
			continue // far off: the map stays at the coil's scale
		}
		pm.Probes = append(pm.Probes, PlanePoint{Name: p.Name, U: l[0], V: l[1], Bn: bn(l[0], l[1]), Index: k})
		pm.UHalf = math.Max(pm.UHalf, 1.15*math.Abs(l[0]))
		pm.VHalf = math.Max(pm.VHalf, 1.15*math.Abs(l[1]))
	}
	nu, nv := planeNodes, planeNodes
	if pm.UHalf > pm.VHalf {
		nv = max(31, int(math.Round(planeNodes*pm.VHalf/pm.UHalf))) | 1
	} else {
		nu = max(31, int(math.Round(planeNodes*pm.UHalf/pm.VHalf))) | 1
	}
	pm.U, pm.V = SymmetricSpace(pm.UHalf, nu), SymmetricSpace(pm.VHalf, nv)
	// Nodes by a conductor (a plane within a bundle of the winding) are
	// left blank: the field there is the wire's own.
	b := math.Max(CoilBundle(co), 1e-6)
	near := func(u, v float64) bool {
		if math.Abs(dist) > b {
			return false
		}
		du := math.Abs(math.Abs(u) - co.Width/2)
		dv := math.Abs(math.Abs(v) - co.Height/2)
		return (du < b && math.Abs(v) < co.Height/2+b) || (dv < b && math.Abs(u) < co.Width/2+b)
	}
	pm.Bn = make([]float64, nu*nv)
	pm.Min, pm.Max = math.Inf(1), math.Inf(-1)
	eachIndex(nv, func(iv int) {
		for iu, u := range pm.U {
			v := pm.V[iv]
			x := math.NaN()
			if !near(u, v) {
				x = bn(u, v)
			}
			pm.Bn[iv*nu+iu] = x
		}
	})
	for _, x := range pm.Bn {
		if !math.IsNaN(x) {
			pm.Min, pm.Max = math.Min(pm.Min, x), math.Max(pm.Max, x)
		}
	}
	// The uniform regions: s scales the coil's half-sides.
	sMax := math.Min(pm.UHalf/(co.Width/2), pm.VHalf/(co.Height/2))
	dev := func(s float64) float64 {
		w, h := s*co.Width/2, s*co.Height/2
		worst := 0.0
		for k := range 40 {
			t := -1 + 2*float64(k)/40
			for _, p := range [][2]float64{{t * w, -h}, {w, t * h}, {-t * w, h}, {-w, -t * h}} {
				x := bn(p[0], p[1])
				if math.IsNaN(x) {
					return math.Inf(1)
				}
				worst = math.Max(worst, math.Abs(x/pm.Centre-1))
			}
		}
		return worst
	}
	for _, tol := range PlaneTolerances {
		reg := PlaneRegion{Tol: tol}
		const steps = 200
		lo, hi := 0.0, math.NaN()
		for k := 1; k <= steps; k++ {
			s := sMax * float64(k) / steps
			if dev(s) > tol {
				hi = s
				break
			}
			lo = s
		}
		if math.IsNaN(hi) {
			reg.Full = true
		} else {
			for range 40 {
				m := (lo + hi) / 2
				if dev(m) > tol {
					hi = m
				} else {
					lo = m
				}
			}
		}
		reg.U, reg.V = lo*co.Width/2, lo*co.Height/2
		pm.Within = append(pm.Within, reg)
	}
	return pm
}

// CoilBundle is the diameter of a coil block's round bundle of turns
// (calc.BundleDiameter of its wire's overall diameter), m.
func CoilBundle(co calc.Coil) float64 {
	return calc.BundleDiameter(co.Wire.Outer, co.Turns)
}
