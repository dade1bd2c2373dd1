package analysis

import (
	"math"

	"coilmemo/calc"
)

// axisPoints is the number of points of the on-axis profile.
const axisPoints = 241

// MapGrid is the number of nodes along the longer side of a coil's map.
const MapGrid = 200

// mapNodes are the node counts across (x) and along (z) a coil's map of
// half-sizes xHalf × zHalf: grid along the longer side (MapGrid when grid
// is 0), the other in proportion but at least 61/200 of it (61 of
// MapGrid), both odd so that nodes fall on the axis and the mid-plane.
func mapNodes(xHalf, zHalf float64, grid int) (nx, nz int) {
	if grid <= 0 {
		grid = MapGrid
	}
	least := max(3, (61*grid+MapGrid/2)/MapGrid)
	g := float64(grid)
	nz, nx = grid, grid
	if zHalf > xHalf {
		nx = max(least, int(math.Round(g*xHalf/zHalf)))
	} else {
		nz = max(least, int(math.Round(g*zHalf/xHalf)))
	}
	return nx | 1, nz | 1
}

// AllMapGrid is the node count along each side of the map of all coils.
const AllMapGrid = 121

// AxisProfile samples the exact field of a coil block along its own axis
// and the dipole field of its moment at the same points (NaN inside the
// winding's extent, where the comparison means nothing).
type AxisProfile struct {
	Z, Exact, Dipole []float64
	Dipole1pc        float64 // m, NaN when not found
	Peak             float64 // T, largest |B| of the profile
	// DipoleNear is how the point dipole compares with the exact field
	// on the profile's points nearer the centre than Dipole1pc where the
	// dipole is drawn: +1 above it at every such point, −1 below it at
	// every one, 0 when it crosses it or there are none.
	DipoleNear int
	// Bore is the near profile of an air-core coil block (nil for a
	// cored coil, whose profile is the core's).
	Bore *BoreProfile
}

// BoreProfile is the signed axial flux density Bz of an air-core coil
// block along its own axis over the region a reader works in: a
// solenoid's bore and mouths out to 1.5 lengths from the centre (at
// least one outer radius beyond its ends), a pair's space between the
// coils and one radius beyond them, a loop's or rectangle's out to three
// times its size (AxialSize). For an opposing pair Gz is the
// axial gradient ∂Bz/∂z at the same points (central difference over
// ±10⁻⁴ R). Ends are the positions of the winding's ends along the axis,
// ascending (four for a pair).
//
// Centre is Bz at the centre; Flat the distance from the centre along the
// axis within which Bz stays within ±1 % of it (bisection on the exact
// field; NaN for an opposing pair, whose centre field is zero, or when
// the profile never leaves the band); EndRatio Bz at the outermost end of
// the winding relative to Centre (NaN for an opposing pair); PeakZ ≥ 0
// and Peak the position and value of the largest |Bz| of the profile.
type BoreProfile struct {
	Z, Bz []float64 // m, T
	Gz    []float64 // T/m; nil unless an opposing pair
	Ends  []float64 // m

	Centre, Flat, EndRatio float64 // T, m, 1
	Peak, PeakZ            float64 // T, m
	// Half is the distance from the centre along the axis at which Bz
	// has fallen to half its centre value (NaN for an opposing pair, or
	// when it does not within the profile).
	Half float64 // m
}

// boreTolerance is the band of a bore profile's flat region: 1 %.
const boreTolerance = 0.01

// borePoints is the number of points of a bore profile.
const borePoints = 241

func boreProfile(co calc.Coil, cr calc.CoilResult, src *calc.CoilSource, fr calc.Frame) *BoreProfile {
	bp := &BoreProfile{}
	var half, outer float64
	switch co.Form {
	case calc.Loop, calc.Rectangle:
		// A flat coil: its plane at the centre, no ends; out to three
		// times its size.
		half = 3 * AxialSize(co)
		if !(half > 0) || math.IsInf(half, 0) {
			return nil
		}
	default:
		e := calc.WindingEnvelope(co, cr.Winding)
		R := co.MeanDiameter / 2
		if !(R > 0) || !(e.Z1 > e.Z0) || math.IsInf(e.R1, 0) {
			return nil
		}
		for _, z := range calc.Placements(co) {
			bp.Ends = append(bp.Ends, z+e.Z0, z+e.Z1)
		}
		outer = bp.Ends[len(bp.Ends)-1]
		half = math.Max(1.5*(e.Z1-e.Z0), outer+e.R1)
		if co.Form == calc.Pair {
			half = outer + R
		}
	}
	R := math.Max(co.MeanDiameter/2, math.Max(co.Width, co.Height)/2)
	bz := func(z float64) float64 { return src.At(co.Centre.Add(fr.U.Scale(z))).Dot(fr.U) }
	h := 1e-4 * R
	bp.Z = SymmetricSpace(half, borePoints)
	for _, z := range bp.Z {
		b := bz(z)
		bp.Bz = append(bp.Bz, b)
		if co.Form == calc.Pair && co.Opposing {
			bp.Gz = append(bp.Gz, (bz(z+h)-bz(z-h))/(2*h))
		}
		if z >= 0 && math.Abs(b) > math.Abs(bp.Peak) {
			bp.Peak, bp.PeakZ = b, z
		}
	}
	bp.Centre = bz(0)
	bp.Flat, bp.EndRatio, bp.Half = math.NaN(), math.NaN(), math.NaN()
	if co.Opposing || bp.Centre == 0 {
		return bp
	}
	if len(bp.Ends) > 0 {
		bp.EndRatio = bz(outer) / bp.Centre
	}
	// first finds the first distance from the centre at which out holds,
	// by bisection between the profile's points; NaN when none does.
	first := func(out func(z float64) bool) float64 {
		for i := borePoints / 2; i+1 < len(bp.Z); i++ {
			if !out(bp.Z[i+1]) {
				continue
			}
			a, b := bp.Z[i], bp.Z[i+1]
			for range 40 {
				if m := (a + b) / 2; out(m) {
					b = m
				} else {
					a = m
				}
			}
			return (a + b) / 2
		}
		return math.NaN()
	}
	bp.Flat = first(func(z float64) bool { return math.Abs(bz(z)/bp.Centre-1) > boreTolerance })
	bp.Half = first(func(z float64) bool { return bz(z)/bp.Centre < 0.5 })
	return bp
}

func profileOnAxis(co calc.Coil, cr calc.CoilResult, n int) AxisProfile {
	src := calc.NewCoilSource(co, cr.Winding, cr.Current)
	p := sampleAxis(co, cr, AxialSize(co), n, src.At)
	p.Bore = boreProfile(co, cr, src, calc.CoilFrame(co.Axis))
	return p
}

// sampleAxis is the on-axis profile of coil block co (results cr) with
// field B, the block's own field at a point, n points over ±profileReach
// (size the block's axial size): |B|, and the dipole field of cr's moment
// at the points farther from the centre than size. The probes' field is
// the same B at the same points (TestProbeAtProfilePoint).
func sampleAxis(co calc.Coil, cr calc.CoilResult, size float64, n int, B func(calc.Vec) calc.Vec) AxisProfile {
	fr := calc.CoilFrame(co.Axis)
	p := AxisProfile{Dipole1pc: cr.Dipole.Axis1, Peak: math.Inf(-1)}
	zmax := profileReach(size, p.Dipole1pc)
	for i := 0; i < n; i++ {
		z := -zmax + 2*zmax*float64(i)/float64(n-1)
		p.Z = append(p.Z, z)
		b := B(co.Centre.Add(fr.U.Scale(z))).Norm()
		p.Exact = append(p.Exact, b)
		p.Peak = math.Max(p.Peak, b)
		dip := math.NaN()
		if math.Abs(z) > size && cr.Moment.Norm() > 0 {
			dip = calc.DipoleField(cr.Moment, fr.U.Scale(z)).Norm()
		}
		p.Dipole = append(p.Dipole, dip)
	}
	p.DipoleNear = dipoleNear(p)
	return p
}

// profileReach is how far the on-axis profile reaches either side of the
// centre: six times the block's axial size, or 1.5 times the distance
// beyond which the point dipole is within 1 % if that is farther, rounded
// up to two significant figures, so that the memo, giving it to three,
// names the very point whose field it quotes (a probe placed there reads
// the profile's end value).
func profileReach(size, dipole1pc float64) float64 {
	z := 6 * size
	if !math.IsNaN(dipole1pc) {
		z = math.Max(z, 1.5*dipole1pc)
	}
	if !(z > 0) || math.IsInf(z, 0) {
		return z
	}
	unit := math.Pow(10, math.Floor(math.Log10(z))-1)
	return math.Ceil(z/unit*(1-1e-12)) * unit
}

// dipoleNear is AxisProfile.DipoleNear of p.
func dipoleNear(p AxisProfile) int {
	above, below := 0, 0
	for i, z := range p.Z {
		if d := p.Dipole[i]; !math.IsNaN(d) && math.Abs(z) < p.Dipole1pc {
			if d > p.Exact[i] {
				above++
			} else if d < p.Exact[i] {
				below++
			}
		}
	}
	switch {
	case above > 0 && below == 0:
		return 1
	case below > 0 && above == 0:
		return -1
	}
	return 0
}

// AxialSize is the larger of a coil block's outer radius and its axial
// half-extent.
func AxialSize(co calc.Coil) float64 {
	R := co.MeanDiameter/2 + co.RadialBuild/2
	if co.Form == calc.Rectangle {
		R = math.Max(co.Width, co.Height) / 2
	}
	size := math.Max(R, co.Length/2)
	if co.Form == calc.Pair {
		size = math.Max(size, math.Abs(co.Spacing)/2+co.Length/2)
	}
	return size
}

// MapData is |B| of one coil block over a plane through its axis, in its
// own frame: B[ix*len(Z)+iz] at radial (or across-the-width) position
// X[ix] and axial position Z[iz], T.
type MapData struct {
	X, Z         []float64
	B            []float64
	XHalf, ZHalf float64
	// Peak is the largest |B| of the map's nodes outside the conductors
	// (in a coil block's own map; a rod's nodes count), at the node (PeakX,
	// PeakZ) — of two mirror images, the one at PeakX ≥ 0 and PeakZ ≥ 0,
	// and PeakMirrored when the node at −PeakZ holds the same value to
	// 10⁻⁹. For a coil block's own map, PeakNear reports that the node
	// lies within two node spacings of the outline of its winding or rod
	// (outline), and PeakBore that it lies in a winding's bore.
	Peak, PeakX, PeakZ float64
	PeakMirrored       bool
	PeakNear, PeakBore bool
	// PeakCore reports that the node lies in a cored coil's rod (PeakBore
	// is then false).
	PeakCore bool
}

// setPeak finds m's Peak and its node; near and bore, when given, say
// where a node of the coil block's own frame lies (coilOutlines), and
// nodes inside a winding (not in its bore, not in a rod) are passed over.
func (m *MapData) setPeak(near func(x, z float64) (dist float64, bore bool), inCore func(x, z float64) bool) {
	nz := len(m.Z)
	m.Peak = math.Inf(-1)
	best := -1
	for k, v := range m.B {
		ix, iz := k/nz, k%nz
		if near != nil && (inCore == nil || !inCore(m.X[ix], m.Z[iz])) {
			// a node among the conductors, where no one can be and a thin
			// winding's filaments give no bound, is not the map's peak
			if d, bore := near(m.X[ix], m.Z[iz]); d == 0 && !bore {
				continue
			}
		}
		if v > m.Peak || (v == m.Peak && best >= 0 && m.X[ix] >= 0 && m.Z[iz] >= 0 && (m.X[best/nz] < 0 || m.Z[best%nz] < 0)) {
			m.Peak, best = v, k
		}
	}
	if best < 0 {
		m.Peak = math.NaN()
		return
	}
	ix, iz := best/nz, best%nz
	// Of mirror images in x (a body of revolution) and z, the one at
	// x ≥ 0, z ≥ 0.
	if jx := len(m.X) - 1 - ix; m.X[ix] < 0 && m.B[jx*nz+iz] == m.Peak {
		ix = jx
	}
	if jz := nz - 1 - iz; m.Z[iz] < 0 && math.Abs(m.B[ix*nz+jz]/m.Peak-1) <= 1e-9 {
		iz = jz
	}
	m.PeakX, m.PeakZ = m.X[ix], m.Z[iz]
	jz := nz - 1 - iz
	m.PeakMirrored = m.PeakZ != 0 && math.Abs(m.B[ix*nz+jz]/m.Peak-1) <= 1e-9
	if near != nil {
		step := math.Max(2*m.XHalf/float64(max(len(m.X)-1, 1)), 2*m.ZHalf/float64(max(nz-1, 1)))
		d, bore := near(m.PeakX, m.PeakZ)
		m.PeakNear, m.PeakBore = d <= 2*step, bore
	}
	if inCore != nil && inCore(m.PeakX, m.PeakZ) {
		m.PeakCore, m.PeakBore = true, false
	}
}

// ownNear is the distance of the node (x, z) of coil block co's own map
// from its outlines, and whether it lies in its bore.
func ownNear(co calc.Coil, cs CoilStudy) func(x, z float64) (float64, bool) {
	os := coilOutlines(0, co, cs)
	fr := calc.CoilFrame(co.Axis)
	return func(x, z float64) (float64, bool) {
		d, _, bore := nearestOutline(os, co.Centre.Add(fr.E1.Scale(x)).Add(fr.U.Scale(z)))
		return d, bore
	}
}

func coilMap(co calc.Coil, cr calc.CoilResult, cs CoilStudy, grid int) *MapData {
	var zHalf, xHalf float64
	if co.Form == calc.Rectangle {
		xHalf = 0.8 * co.Width
		zHalf = math.Max(0.8*co.Width, 0.5*co.Height)
	} else {
		e := cs.Envelope
		half := e.Z1
		if co.Form == calc.Pair {
			half += math.Abs(co.Spacing) / 2
		}
		xHalf = 1.6 * e.R1
		zHalf = math.Max(half+0.9*e.R1, xHalf) // no narrower than tall: a short coil's map stays readable
		// A long solenoid's map reaches out far enough to show the field
		// returning round the winding, not a sliver along the bore.
		xHalf = math.Max(xHalf, 0.35*zHalf)
	}
	if !(xHalf > 0) || !(zHalf > 0) || math.IsInf(xHalf, 0) || math.IsInf(zHalf, 0) {
		return nil
	}
	nx, nz := mapNodes(xHalf, zHalf, grid)
	m := &MapData{Z: SymmetricSpace(zHalf, nz), X: SymmetricSpace(xHalf, nx), XHalf: xHalf, ZHalf: zHalf}
	var skip func(x, z float64) bool
	if co.Form != calc.Rectangle {
		skip = func(x, z float64) bool { return inWinding(cs, x, z) }
	}
	g := calc.NewCoilSource(co, cr.Winding, cr.Current).ForMaps().MapOutside(m.X, m.Z, skip)
	m.B = make([]float64, len(m.Z)*len(m.X))
	for ix := range m.X {
		for iz := range m.Z {
			m.B[ix*len(m.Z)+iz] = g.Magnitude(ix, iz)
		}
	}
	m.setPeak(ownNear(co, cs), nil)
	return m
}

// mapKey is what a coil's own map depends on: its winding (laid out from
// the form, dimensions, turns and wire) and current, in its own frame —
// not its name or place, nor, for a circular coil, the direction of its
// axis.
type mapKey struct {
	form                                    calc.Form
	mean, inner, outer, length, build, w, h float64
	turns                                   int
	gauge                                   int
	bare, wireOuter                         float64
	spacing                                 float64
	opposing                                bool
	axis                                    calc.Vec
	current                                 float64
	grid                                    int
}

// mapCache shares the maps of identical windings within one analysis (an
// array of like coils is mapped once). A nil cache computes every map.
type mapCache map[mapKey]*MapData

func (mc mapCache) coilMap(co calc.Coil, cr calc.CoilResult, cs CoilStudy, grid int) *MapData {
	if mc == nil {
		return coilMap(co, cr, cs, grid)
	}
	k := mapKey{form: co.Form, mean: co.MeanDiameter, inner: co.InnerDiameter, outer: co.OuterDiameter,
		length: co.Length, build: co.RadialBuild, w: co.Width, h: co.Height, turns: co.Turns,
		gauge: co.Wire.Gauge, bare: co.Wire.Bare, wireOuter: co.Wire.Outer,
		spacing: co.Spacing, opposing: co.Opposing, current: cr.Current, grid: grid}
	if co.Form == calc.Rectangle {
		k.axis = co.Axis // a rectangle's map is taken through its frame
	}
	if m, ok := mc[k]; ok {
		return m
	}
	m := coilMap(co, cr, cs, grid)
	mc[k] = m
	return m
}

// inWinding reports whether the point at radius x and axial position z of
// a circular coil's own frame lies inside one of its winding
// cross-sections by more than a hair (10⁻⁹ of the section's size): nodes
// that the map figure masks, left uncomputed (NaN) in the map. The
// figure's own test (figures.inSections, boundaries included) holds for
// every such node.
func inWinding(cs CoilStudy, x, z float64) bool {
	e := cs.Envelope
	x = math.Abs(x)
	for _, zp := range cs.Placements {
		z0, z1 := zp+e.Z0, zp+e.Z1
		if e.Round {
			r := (z1 - z0) / 2
			if math.Hypot(z-(z0+z1)/2, x-(e.R0+e.R1)/2) < r*(1-1e-9) {
				return true
			}
			continue
		}
		hz, hr := 1e-9*(z1-z0), 1e-9*(e.R1-e.R0)
		if z > z0+hz && z < z1-hz && x > e.R0+hr && x < e.R1-hr {
			return true
		}
	}
	return false
}

// Linspace returns n evenly spaced values from lo to hi.
func Linspace(lo, hi float64, n int) []float64 {
	v := make([]float64, n)
	for i := range v {
		v[i] = lo + (hi-lo)*float64(i)/float64(n-1)
	}
	return v
}

// SymmetricSpace returns n evenly spaced values from −half to half that
// are exact mirror images of each other (so the map's symmetries apply).
func SymmetricSpace(half float64, n int) []float64 {
	v := Linspace(-half, half, n)
	for i := range n / 2 {
		v[n-1-i] = -v[i]
	}
	if n%2 == 1 {
		v[n/2] = 0
	}
	return v
}

// PairCurves is a pair's profile from its centre: for an aiding pair the
// field's departure from the centre value, B/B0 − 1, along the axis and
// radially in the mid-plane; for an opposing pair the local gradient's
// departure from the centre gradient, G/G0 − 1.
type PairCurves struct {
	B0            float64 // T, axial field at the centre
	Pos           []float64
	Axial, Radial []float64
	// EdgeField is |B| on the axis at the edge of an opposing pair's
	// ±1 % gradient region (LinearAxial from the centre), T: the largest
	// field its linear region holds there (NaN otherwise).
	EdgeField float64
}

// pairPoints is the number of points of a pair's profile.
const pairPoints = 61

func pairCurves(co calc.Coil, cr calc.CoilResult) *PairCurves {
	if co.Form != calc.Pair {
		return nil
	}
	pr := cr.Pair
	R := co.MeanDiameter / 2
	src := calc.NewCoilSource(co, cr.Winding, cr.Current)
	fr := calc.CoilFrame(co.Axis)
	B0 := src.At(co.Centre).Dot(fr.U)
	if !(R > 0) || math.IsNaN(B0) || (!co.Opposing && B0 == 0) {
		return nil
	}
	pc := &PairCurves{B0: B0, EdgeField: math.NaN()}
	axial := func(p calc.Vec) float64 { return src.At(p).Dot(fr.U) }
	if !co.Opposing {
		ext := 1.6 * math.Max(pr.Axial1, pr.Radial1)
		if !(ext > 0) {
			ext = 0.6 * R
		}
		ext = math.Min(ext, 1.2*R)
		pc.Pos = Linspace(0, ext, pairPoints)
		for _, x := range pc.Pos {
			pc.Axial = append(pc.Axial, axial(co.Centre.Add(fr.U.Scale(x)))/B0-1)
			pc.Radial = append(pc.Radial, axial(co.Centre.Add(fr.E1.Scale(x)))/B0-1)
		}
		return pc
	}
	G := pr.Gradient
	if pr.LinearAxial > 0 {
		pc.EdgeField = src.At(co.Centre.Add(fr.U.Scale(pr.LinearAxial))).Norm()
	}
	ext := math.Min(1.6*math.Max(pr.LinearAxial, pr.LinearRadial), 1.2*R)
	if !(ext > 0) {
		ext = 0.6 * R
	}
	pc.Pos = Linspace(0, ext, pairPoints)
	h := 1e-4 * R
	for _, x := range pc.Pos {
		gz := (axial(co.Centre.Add(fr.U.Scale(x+h))) - axial(co.Centre.Add(fr.U.Scale(x-h)))) / (2 * h)
		p0 := co.Centre.Add(fr.E1.Scale(x))
		gr := (axial(p0.Add(fr.U.Scale(h))) - axial(p0.Sub(fr.U.Scale(h)))) / (2 * h)
		pc.Axial = append(pc.Axial, gz/G-1)
		pc.Radial = append(pc.Radial, gr/G-1)
	}
	return pc
}

// DesignStudy is what the memo shows of the design as a whole.
type DesignStudy struct {
	// Extent is the largest distance of any conductor from the origin, m.
	Extent float64
	// All is |B| of all coils together over the xz-plane through the
	// origin, X and Z the same symmetric grid, B[ix*len(Z)+iz]; NaN
	// near windings that cross the plane obliquely (they are not drawn).
	// Nil for a design of one coil block.
	All *MapData
	// Planes holds, by coil block, the map of a rectangle's field over
	// its plane of interest (plane.go), nil for the others.
	Planes []*PlaneMap
	// Axes is the set of driven coils with axes not all parallel, their
	// moments and couplings (axisset.go); nil for other designs.
	Axes *AxisSet
	// Crossing is, by coil block, the smallest angle, rad, at which the
	// centre line of its winding (each turn's mean path) crosses the
	// xz-plane through the origin, π/2 for a crossing at right angles;
	// NaN where it does not cross it, 0 where it lies in it.
	Crossing []float64
	// Nested are the windings that lie in another's bore (nested.go),
	// whose heat balances, each taken alone, understate their temperatures.
	Nested []Nesting
}

// planeCrossing is DesignStudy.Crossing of coil co: its mean turn (every
// placement) sampled at 7200 points, the angle to the plane taken from the
// path's tangent across each change of sign of y.
func planeCrossing(co calc.Coil) float64 {
	fr := calc.CoilFrame(co.Axis)
	const n = 7200
	var paths [][]calc.Vec
	if co.Form == calc.Rectangle {
		w, h := co.Width/2, co.Height/2
		corners := []calc.Vec{{w, h}, {-w, h}, {-w, -h}, {w, -h}}
		var path []calc.Vec
		for k := range 4 {
			a, b := corners[k], corners[(k+1)%4]
			for j := range n / 4 {
				l := a.Add(b.Sub(a).Scale(float64(j) / (n / 4)))
				path = append(path, co.Centre.Add(fr.ToGlobal(l)))
			}
		}
		paths = append(paths, path)
	} else {
		r := co.MeanDiameter / 2
		for _, z := range calc.Placements(co) {
			var path []calc.Vec
			for j := range n {
				phi := 2 * math.Pi * float64(j) / n
				path = append(path, co.Centre.Add(fr.ToGlobal(calc.Vec{r * math.Cos(phi), r * math.Sin(phi), z})))
			}
			paths = append(paths, path)
		}
	}
	angle := math.NaN()
	scale := math.Max(co.MeanDiameter, math.Max(co.Width, co.Height))
	for _, path := range paths {
		inPlane := true
		for k, p := range path {
			q := path[(k+1)%len(path)]
			if math.Abs(p[1]) > 1e-12*scale {
				inPlane = false
			}
			if (p[1] <= 0) != (q[1] <= 0) {
				t := q.Sub(p).Unit()
				a := math.Asin(math.Min(math.Abs(t[1]), 1))
				if math.IsNaN(angle) || a < angle {
					angle = a
				}
			}
		}
		if inPlane {
			return 0
		}
	}
	return angle
}

func analyseDesign(d calc.Design, r calc.Results, grid int) DesignStudy {
	ds := DesignStudy{Extent: DesignExtent(d)}
	ds.All = allCoilsMap(d, r, grid)
	for i := range d.Coils {
		ds.Planes = append(ds.Planes, planeMap(d, r, i))
	}
	ds.Axes = axisSet(d, r)
	for _, co := range d.Coils {
		ds.Crossing = append(ds.Crossing, planeCrossing(co))
	}
	return ds
}

// allCoilsMap is the map of all coils, grid nodes a side (AllMapGrid when
// grid is 0).
func allCoilsMap(d calc.Design, r calc.Results, grid int) *MapData {
	if grid <= 0 {
		grid = AllMapGrid
	}
	if len(d.Coils) < 2 {
		return nil
	}
	half := 1.3 * DesignExtent(d)
	if !(half > 0) || math.IsInf(half, 0) {
		return nil
	}
	var hidden []int
	for i, co := range d.Coils {
		if !DrawnInXZ(co) {
			hidden = append(hidden, i)
		}
	}
	xs := SymmetricSpace(half, grid|1)
	step := 2 * half / float64(len(xs)-1)
	fm := calc.NewFieldModel(d).ForMaps()
	envs := make([]calc.Envelope, len(hidden)) // once per map, not per node
	for j, k := range hidden {
		envs[j] = calc.WindingEnvelope(d.Coils[k], r.Coils[k].Winding)
	}
	m := &MapData{X: xs, Z: xs, XHalf: half, ZHalf: half, B: make([]float64, len(xs)*len(xs))}
	// One column of nodes per task; every node is computed alone and
	// stored in its own place, so the map does not depend on scheduling.
	eachIndex(len(xs), func(ix int) {
		x := xs[ix]
		for iz, z := range xs {
			p := calc.Vec{x, 0, z}
			// far blocks from their series, to 10⁻⁹ of their own field
			// (calc.FieldModel.SeriesAt), below the map's 2×10⁻⁷
			v := fm.SeriesAt(p, 1e-9).Norm()
			for j, k := range hidden {
				if nearWinding(d.Coils[k], envs[j], p, step) {
					v = math.NaN()
				}
			}
			m.B[ix*len(xs)+iz] = v
		}
	})
	return m
}

// eachIndex calls f(i) for every i < n on up to runtime.GOMAXPROCS
// goroutines, handing out one index at a time (calc.ParallelBlocks), and
// returns when all are done; f must write only to places of its own index.
func eachIndex(n int, f func(i int)) { calc.ParallelBlocks(n, 1, f) }

// DrawnInXZ reports whether the winding of co can be drawn in the
// xz-plane through the origin: a circular coil whose axis lies along x or
// z with its centre in the plane, or along y (the plane then cuts the
// winding across its length, or misses it).
func DrawnInXZ(co calc.Coil) bool {
	if co.Form == calc.Rectangle {
		return false
	}
	u := co.Axis.Unit()
	alongZ := math.Abs(u[2]) > 1-1e-12
	alongX := math.Abs(u[0]) > 1-1e-12
	alongY := math.Abs(u[1]) > 1-1e-12
	return alongY || ((alongZ || alongX) && co.Centre[1] == 0)
}

// nearWinding reports whether p lies within margin of the winding
// envelope e of coil block co (in its own frame, every placement of a
// pair), where a map would show the field of the conductors themselves.
func nearWinding(co calc.Coil, e calc.Envelope, p calc.Vec, margin float64) bool {
	if co.Form == calc.Rectangle {
		return false
	}
	fr := calc.CoilFrame(co.Axis)
	l := fr.ToLocal(p.Sub(co.Centre))
	rho := math.Hypot(l[0], l[1])
	for _, z := range calc.Placements(co) {
		if rho > e.R0-margin && rho < e.R1+margin && l[2] > z+e.Z0-margin && l[2] < z+e.Z1+margin {
			return true
		}
	}
	return false
}

// DesignExtent is the largest distance of any conductor from the origin:
// the winding's outer radius (a thin coil's round bundle included) and
// half its axial extent.
func DesignExtent(d calc.Design) float64 {
	e := 0.0
	for _, co := range d.Coils {
		depth := co.RadialBuild
		if depth == 0 {
			depth = co.Wire.Outer
			if co.Length == 0 {
				depth = calc.BundleDiameter(co.Wire.Outer, co.Turns)
			}
		}
		r := co.MeanDiameter/2 + depth/2
		if co.Form == calc.Rectangle {
			r = math.Hypot(co.Width, co.Height)/2 + depth/2
		}
		half := math.Max(co.Length, depth) / 2
		if co.Form == calc.Pair {
			half += co.Spacing / 2
		}
		e = math.Max(e, co.Centre.Norm()+math.Hypot(r, half))
	}
	return e
}
