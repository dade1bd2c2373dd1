package analysis

import (
	"fmt"
	"math"
	"strings"

	"gonum.org/v1/gonum/integrate/quad"

	"coilmemo/calc"
	"coilmemo/calc/biotsavart"
	"coilmemo/format"
)

// Check is one verification of a headline result of this very design
// against an independent method or a published table.
type Check struct {
	Coil      string  // coil block name, "" for the whole design
	Name      string  // what is checked
	Method    string  // the design's method
	Reference string  // the independent method or published source
	Value     float64 // the design's figure, SI
	Expected  float64 // the independent figure, SI
	Unit      string
	RelDiff   float64 // |Value − Expected| / |Expected|
	Tolerance float64 // relative
	Pass      bool
	// Core is set for a check of a core's model (kindChecks); the others
	// check the windings, a cored coil's in air.
	Core bool
	// Bracket is set for a check that an independent figure (Expected)
	// lies strictly between two of the design's (Low < Expected < High),
	// not within a tolerance of one: Pass says whether the ordering holds.
	// Value, RelDiff and Tolerance keep their meaning for calc --json
	// (Value is High; Tolerance the bracket's width from it).
	Bracket   bool
	Low, High float64
	// Point is where a check at a point is taken, in the coil's own frame
	// from its centre (components along CoilFrame's E1, E2 and the
	// axis U), m; nil for a check that is not at a point off the axis.
	Point *calc.Vec
}

// newCheck compares v with e. A tolerance is rounded up to two
// significant figures before it is applied (format.CeilSig), so that the
// figure the memo prints (format.Tolerance) is the one the verdict used.
func newCheck(coil, name, method, ref string, v, e float64, unit string, tol float64) Check {
	tol = format.CeilSig(tol, 2)
	rd := math.Abs(v-e) / math.Abs(e)
	if e == 0 && v == 0 {
		rd = 0
	}
	return Check{Coil: coil, Name: name, Method: method, Reference: ref, Value: v, Expected: e,
		Unit: unit, RelDiff: rd, Tolerance: tol, Pass: rd <= tol}
}

// Verify recomputes headline results of every coil by independent means
// (coilChecks, in order): the moment against the mean turn area, the
// centre field by a current sheet closed form, the field at an off-axis
// point by numerical integration of the Biot–Savart law, the far field by
// the dipole formula, the inductance, the heat balance, a Helmholtz pair's
// closed form, an opposing pair's centre gradient by a central difference
// of the numerical Biot–Savart field, and the wire's resistance per length against the published
// copper table. Rectangles have checks of their own (rectangleChecks).
func Verify(d calc.Design, r calc.Results) []Check {
	var out []Check
	for i, c := range d.Coils {
		if i >= len(r.Coils) {
			break
		}
		cr := r.Coils[i]
		I := cr.Current
		if c.Form == calc.Rectangle || !(I != 0) || math.IsNaN(I) {
			out = append(out, rectangleChecks(c, cr)...)
			out = append(out, wireCheck(c)...)
			continue
		}
		for _, check := range coilChecks {
			rows := check(c, cr)
			if c.Core.Present() {
				// a cored coil's field rows check its winding in air: named
				// so, beside the memo's figures with the core
				for k := range rows {
					if fieldRow(rows[k].Name) {
						rows[k].Name += " (winding alone, in air)"
					}
				}
			}
			out = append(out, rows...)
		}
	}
	return out
}

// fieldRow reports whether a check of that name is of the winding's field
// or moment (which a core changes).
func fieldRow(name string) bool {
	for _, p := range []string{"magnetic moment", "field at", "|B|", "on-axis field"} {
		if strings.HasPrefix(name, p) {
			return true
		}
	}
	return false
}

// coilChecks are the checks of a circular coil block, in the order the
// verification table lists them.
var coilChecks = []func(calc.Coil, calc.CoilResult) []Check{
	momentCheck, centreFieldCheck, offAxisCheck, farFieldCheck,
	inductanceChecks, roundWireCheck, heatBalanceCheck, helmholtzCheck, gradientCheck,
	func(c calc.Coil, _ calc.CoilResult) []Check { return wireCheck(c) },
}

// momentCheck compares the moment m = I Σ π rᵢ² summed over the turns
// with the moment the coil's own far field implies: on its axis the exact
// field tends to the dipole field μ0 m/(2π z³), so
//
//	m(z) = 2π z³ B_z(z)/μ0 = m (1 + c₂ (a/z)² + O((a/z)⁴)),
//
// and Richardson's extrapolation of m(z) and m(2z), (4 m(2z) − m(z))/3,
// removes the (a/z)² term. At z = 40 coil sizes the remainder is below
// 10⁻⁶ of m (for a thin loop, 0.47 (a/z)⁴ ≈ 2 × 10⁻⁷). The field is the
// elliptic-integral sum over the turns, a method that shares nothing with
// the area sum but the layout.
func momentCheck(c calc.Coil, cr calc.CoilResult) []Check {
	w := cr.Winding
	m := cr.Moment.Norm()
	if (c.Form == calc.Pair && c.Opposing) || w.TurnCount() == 0 || !(m > 0) {
		return nil
	}
	fr := calc.CoilFrame(c.Axis)
	size := AxialSize(c)
	fit := func(z float64) float64 {
		B := calc.CoilField(c, w, cr.Current, c.Centre.Add(fr.U.Scale(z))).Dot(fr.U)
		return 2 * math.Pi * z * z * z * math.Abs(B) / calc.Mu0
	}
	z := 40 * size
	far := (4*fit(2*z) - fit(z)) / 3
	return []Check{newCheck(c.Name, "magnetic moment",
		"m = I·Σ π rᵢ² over every turn", "far field on the axis: 2π z³ B/μ0, extrapolated to infinite distance",
		m, far, "A·m²", 1e-5)}
}

// centreFieldCheck compares the centre field with the current-sheet
// closed form per layer: a sheet smears N discrete turns, and the
// difference at the centre is of order (pitch/length)², well under 1 % for
// real windings. A winding whose turns lie in one plane — a thin coil, or
// a flat one (a build without length) — has no such row: the sum of its
// turns' exact fields at the centre is Σ μ0 I/(2rᵢ) itself, the closed
// form, and on the axis the Biot–Savart integrand is the same at every
// point of a turn, so a quadrature would only sum that closed form again.
// Its field is checked where the integrand varies (offAxisCheck). Pairs
// are checked by helmholtzCheck and gradientCheck.
func centreFieldCheck(c calc.Coil, cr calc.CoilResult) []Check {
	w, I := cr.Winding, cr.Current
	if c.Form == calc.Pair || w.Thin || !(c.Length > 0) {
		return nil
	}
	fr := calc.CoilFrame(c.Axis)
	exact := calc.CoilField(c, w, I, c.Centre).Dot(fr.U)
	var sheet float64
	for _, l := range w.Layers {
		sheet += calc.SolenoidAxisField(l.Radius, layerExtent(c, w, l), len(l.Z), I, 0)
	}
	return []Check{newCheck(c.Name, "field at coil centre",
		"Σ exact loop fields (elliptic integrals)", "current sheet on axis, per layer", exact, sheet, "T", 0.01)}
}

// layerExtent is the length of the current sheet that stands for layer l
// of winding w: n turns at the layer's pitch, the single layer's
// Length/N, or the span of its turns' centres plus one pitch (turns that
// touch, over a part of the length when they do not fill it).
func layerExtent(c calc.Coil, w calc.Winding, l calc.Layer) float64 {
	n := len(l.Z)
	if w.LayerCount <= 1 && c.RadialBuild <= 0 || n < 2 {
		return c.Length * float64(n) / float64(max(w.TurnsPerLayer, 1))
	}
	span := l.Z[n-1] - l.Z[0]
	return span * float64(n) / float64(n-1)
}

// offAxisCheck compares the field at an off-axis point outside the
// winding with a direct numerical Biot–Savart integration round every
// turn (package biotsavart).
func offAxisCheck(c calc.Coil, cr calc.CoilResult) []Check {
	fr := calc.CoilFrame(c.Axis)
	R := c.MeanDiameter / 2
	p := c.Centre.Add(fr.E1.Scale(0.37 * R)).Add(fr.U.Scale(0.29*R + c.Length/2 + c.RadialBuild))
	if c.Form == calc.Pair {
		p = p.Add(fr.U.Scale(c.Spacing/2 + R))
	}
	w, what := verifiedLayers(cr.Winding)
	exact := calc.CoilField(c, w, cr.Current, p)
	num := numericCoilField(c, w, cr.Current, p)
	k := newCheck(c.Name, "|B| at an off-axis test point"+what,
		"Σ exact loop fields (elliptic integrals)", "numerical Biot–Savart line integral (gonum quad)",
		exact.Norm(), num.Norm(), "T", 1e-8)
	k.Point = localPoint(fr, c.Centre, p)
	return []Check{k}
}

// localPoint is point p in frame fr with its origin at centre.
func localPoint(fr calc.Frame, centre, p calc.Vec) *calc.Vec {
	d := p.Sub(centre)
	return &calc.Vec{d.Dot(fr.E1), d.Dot(fr.E2), d.Dot(fr.U)}
}

// verifyTurns bounds the turns the off-axis check integrates one by one.
const verifyTurns = 20_000

// verifiedLayers returns the winding the off-axis check integrates: all of
// w, or for a winding of more than verifyTurns turns every k-th layer
// (from the first), so that the check's cost stays bounded while it still
// compares the two methods over the design's own turns; what says which
// part was checked ("" for all of it).
func verifiedLayers(w calc.Winding) (calc.Winding, string) {
	n := w.TurnCount()
	if n <= verifyTurns || len(w.Layers) < 2 {
		return w, ""
	}
	k := (n + verifyTurns - 1) / verifyTurns
	sub := w
	sub.Layers = nil
	turns := 0
	for i := 0; i < len(w.Layers); i += k {
		sub.Layers = append(sub.Layers, w.Layers[i])
		turns += len(w.Layers[i].Z)
	}
	return sub, fmt.Sprintf(" (the field of every %s layer: %s of the %s turns)", ordinal(k), format.Digits(turns), format.Digits(n))
}

// ordinal writes k as "2nd", "3rd", "11th", ….
func ordinal(k int) string {
	suffix := "th"
	switch {
	case k%100 >= 11 && k%100 <= 13:
	case k%10 == 1:
		suffix = "st"
	case k%10 == 2:
		suffix = "nd"
	case k%10 == 3:
		suffix = "rd"
	}
	return fmt.Sprintf("%d%s", k, suffix)
}

// farFieldCheck compares the on-axis field at 20 times the coil's size
// with the point-dipole formula.
func farFieldCheck(c calc.Coil, cr calc.CoilResult) []Check {
	if c.Form == calc.Pair && c.Opposing {
		return nil
	}
	fr := calc.CoilFrame(c.Axis)
	R := c.MeanDiameter / 2
	size := math.Max(R+c.RadialBuild/2, c.Length/2)
	if c.Form == calc.Pair {
		size = math.Max(size, c.Spacing/2+c.Length/2)
	}
	z := 20 * size
	pf := c.Centre.Add(fr.U.Scale(z))
	ex := calc.CoilField(c, cr.Winding, cr.Current, pf).Norm()
	dip := calc.DipoleField(cr.Moment, fr.U.Scale(z)).Norm()
	return []Check{newCheck(c.Name, fmt.Sprintf("on-axis field at %s", format.Eng(z, "m", 3)),
		"Σ exact loop fields", "point dipole μ0·m/(2π z³)", ex, dip, "T", 0.01)}
}

// inductanceChecks verify a single-layer coil's inductance: Nagaoka's
// coefficient against Grover's table (interpolated at the design's ℓ/D,
// when the embedded part of the table covers it) and against a numerical
// integration over the current sheet, and the current-sheet inductance
// against Wheeler's formula.
func inductanceChecks(c calc.Coil, cr calc.CoilResult) []Check {
	if c.Form != calc.Solenoid || c.RadialBuild > 0 || !(c.Length > 0) || !(c.MeanDiameter > 0) || math.IsNaN(cr.Inductance) {
		return nil
	}
	a, l := c.MeanDiameter/2, c.Length
	x := l / (2 * a)
	kN := calc.NagaokaCoefficient(a, l)
	method := "Lorenz's formula in Nagaoka's form (elliptic integrals)"
	var out []Check
	name := fmt.Sprintf("Nagaoka coefficient at ℓ/D = %s", format.Sig(x, 3))
	if tab, errEst, ok := groverInterpolate(x); ok {
		out = append(out, newCheck(c.Name, name+", handbook table", method,
			groverSource+", interpolated (embedded, ℓ/D ≤ 1)", kN, tab, "", (groverPrecision+errEst)/tab+1e-9))
	}
	out = append(out, newCheck(c.Name, name+", numerical integral", method,
		"Maxwell's mutual inductance of the sheet's rings, integrated numerically (gonum quad)", kN, sheetNagaoka(a, l), "", 1e-6))
	// Wheeler states 1 % for ℓ > 0.8 a.
	if l > 0.8*a {
		sheet := calc.SolenoidInductance(a, l, c.Turns)
		out = append(out, newCheck(c.Name, "current-sheet inductance", "μ0·π·a²·N²·k/ℓ (Lorenz–Nagaoka; k Nagaoka's coefficient)",
			"Wheeler (1928): μ0·π·a²·N²/(ℓ + 0.9·a)", sheet, calc.WheelerInductance(a, l, c.Turns), "H", 0.01))
	}
	return out
}

// sheetNagaoka returns Nagaoka's coefficient of a current sheet of radius
// a and length ℓ by direct numerical integration: the sheet's inductance
// is the mutual inductance of its rings summed over every pair,
//
//	L = n² ∫₀^ℓ ∫₀^ℓ M(a, a, |z₁ − z₂|) dz₁ dz₂ = n² ∫₀^ℓ 2 (ℓ − u) M(a, a, u) du,
//
// (n turns per metre, M Maxwell's formula, see ringMutual), and k_N =
// L / (μ0 π a² n² ℓ). M has a logarithmic singularity at u = 0, so the
// range is cut into panels halving towards 0, each integrated by 24-point
// Gauss–Legendre; the last sliver below ℓ·2⁻⁴⁸ contributes less than
// 10⁻¹².
func sheetNagaoka(a, l float64) float64 {
	f := func(u float64) float64 { return 2 * (l - u) * ringMutual(a, u) }
	sum := 0.0
	hi := l
	for range 48 {
		lo := hi / 2
		sum += quad.Fixed(f, lo, hi, 24, quad.Legendre{}, 0)
		hi = lo
	}
	return sum / (calc.Mu0 * math.Pi * a * a * l)
}

// helmholtzCheck compares the centre field of an aiding pair at Helmholtz
// spacing (spacing = radius, within 1 %) with the Helmholtz closed form
// B = (4/5)^(3/2) μ0 N I / R. The tolerance allows for a spacing off R by
// δ (the centre field changes by 0.6 δ/R to first order) and for a
// winding of length ℓ and build b (of order ((ℓ/R)² + (b/R)²)/40 by the
// exact field).
func helmholtzCheck(c calc.Coil, cr calc.CoilResult) []Check {
	R := c.MeanDiameter / 2
	// Only a pair the study calls a Helmholtz pair (cr.Pair.Helmholtz: the
	// spacing within 1 % of the turns' mean radius as laid out) is held to
	// the Helmholtz closed form.
	if c.Form != calc.Pair || c.Opposing || !(R > 0) || !cr.Pair.Helmholtz || cr.Winding.Thin {
		return nil // a thin pair's loop sum at the centre is this closed form at spacing R
	}
	// R is the turns' mean radius as laid out: a winding that does not
	// fill its stated radial build sits nearer the axis than its stated
	// mean diameter says.
	if r := cr.Winding.MeanTurnRadius(); r > 0 {
		R = r
	}
	fr := calc.CoilFrame(c.Axis)
	B := calc.CoilField(c, cr.Winding, cr.Current, c.Centre).Dot(fr.U)
	want := math.Pow(0.8, 1.5) * calc.Mu0 * float64(c.Turns) * cr.Current / R
	tol := 1e-9 + 0.6*math.Abs(c.Spacing/R-1) + ((c.Length/R)*(c.Length/R)+(c.RadialBuild/R)*(c.RadialBuild/R))/40
	return []Check{newCheck(c.Name, "field at the centre of the Helmholtz pair",
		"Σ exact loop fields (elliptic integrals)", "Helmholtz pair: (4/5)^(3/2)·μ0·N·I/R", B, want, "T", tol)}
}

// gradientCheck verifies the axial gradient at the centre of an opposing
// pair — the design's exact sum of every turn's on-axis derivative
// (calc.AnalysePair) — against a central difference of the axial field on
// the axis, each field by the numerical Biot–Savart integral round every
// turn (numericCoilField): (B_z(+h) − B_z(−h))/(2h) at h = a/1000, a the
// turns' mean radius. The difference's truncation error is h² B_z‴/6;
// the field of each coil changes over the scale a, |B_z‴| ≲ 10 |G|/a²,
// so the error is below 2 × 10⁻⁶ of G, and the quadrature's rounding,
// some 10⁻¹⁵ of each coil's field against the field difference 2Gh, adds
// under 10⁻⁹: 10⁻⁵ is allowed.
func gradientCheck(c calc.Coil, cr calc.CoilResult) []Check {
	G := cr.Pair.Gradient
	a := cr.Winding.MeanTurnRadius()
	if c.Form != calc.Pair || !c.Opposing || math.IsNaN(G) || G == 0 || !(a > 0) {
		return nil
	}
	fr := calc.CoilFrame(c.Axis)
	h := a / 1000
	bz := func(z float64) float64 {
		return numericCoilField(c, cr.Winding, cr.Current, c.Centre.Add(fr.U.Scale(z))).Dot(fr.U)
	}
	want := (bz(h) - bz(-h)) / (2 * h)
	return []Check{newCheck(c.Name, "axial gradient at the centre of the pair",
		"Σ of every turn's ∂B/∂z on the axis (closed form)", "central difference of the axial field, numerical Biot–Savart line integral (±a/1000)",
		G, want, "T/m", 1e-5)}
}

// wireCheck compares the copper wire's resistance per length with the
// published table when the gauge is listed there.
func wireCheck(c calc.Coil) []Check {
	want, ok := nbsCopper20C[c.Wire.Gauge]
	if !ok || c.Wire.Material.Name != calc.Copper().Name {
		return nil
	}
	got := calc.ResistancePerLength(c.Wire.Bare, c.Wire.Material, calc.T20)
	// The table gives four significant figures: allow half a unit in the
	// last place plus the diameter rule's rounding, 0.2 %.
	return []Check{newCheck(c.Name, fmt.Sprintf("AWG %d resistance per metre at 20 °C", c.Wire.Gauge),
		"ASTM B258 diameter, IEC 60028 resistivity", nbsSource,
		got, want*ohmsPer1000ftToSI, "Ω/m", 0.002)}
}

// numericCoilField integrates dB = μ0 I/(4π) dl × r/|r|³ round every turn
// of the winding with 96-point Gauss–Legendre quadrature: a method
// independent of the elliptic-integral closed form. Every turn of a block
// shares the axis, so p is taken into the block's cylindrical frame once
// and each turn is integrated in its own plane (biotsavart.CircleLocal,
// the same integral and nodes as biotsavart.Circle): the cost is one
// 96-node sum per distinct turn position.
func numericCoilField(c calc.Coil, w calc.Winding, I float64, p calc.Vec) calc.Vec {
	fr := calc.CoilFrame(c.Axis)
	// The circles' own axis: the current flows from E1 towards E2.
	ax := fr.E1.Cross(fr.E2)
	along := fr.U.Dot(ax) // ±1: the turns' centres lie on the axis
	var B calc.Vec
	centres := []calc.Vec{c.Centre}
	currents := []float64{I}
	if c.Form == calc.Pair {
		s := fr.U.Scale(c.Spacing / 2)
		centres = []calc.Vec{c.Centre.Sub(s), c.Centre.Add(s)}
		I2 := I
		if c.Opposing {
			I2 = -I
		}
		currents = []float64{I, I2}
	}
	for k, ctr := range centres {
		d := p.Sub(ctr)
		z0 := d.Dot(ax)
		perp := d.Sub(ax.Scale(z0))
		rho := perp.Norm()
		rhat := fr.E1
		if rho > 0 {
			rhat = perp.Scale(1 / rho)
		}
		var br, bz float64
		for _, l := range w.Layers {
			// Coincident turns (a thin coil) are integrated once and counted.
			for i := 0; i < len(l.Z); {
				j := i + 1
				for j < len(l.Z) && l.Z[j] == l.Z[i] {
					j++
				}
				r, z := biotsavart.CircleLocal(l.Radius, currents[k], rho, z0-along*l.Z[i], 1, 96)
				br += r * float64(j-i)
				bz += z * float64(j-i)
				i = j
			}
		}
		B = B.Add(rhat.Scale(br)).Add(ax.Scale(bz))
	}
	return B
}

// ringMutual is Maxwell's mutual inductance of two coaxial circles of
// radius a whose planes are u apart (Maxwell, Treatise, 1873, §701),
//
//	M = μ0 a [(2/k − k) K − (2/k) E],  k² = 4a²/(4a² + u²),
//
// with the complete elliptic integrals K and E by the arithmetic–geometric
// mean (Abramowitz and Stegun, Handbook of Mathematical Functions, 17.6),
// started from the complementary modulus k' = u/√(4a² + u²) itself so that
// close circles (k → 1) keep their precision. Written here, apart from
// calc's elliptic integrals, so the check is independent of them.
func ringMutual(a, u float64) float64 { return ringMutualAB(a, a, u) }

// heatBalanceCheck verifies the steady hot spot by a different method: a
// finite-volume solve of the winding section's conduction
// (calc.WindingConduction: 400 rings of radial conduction, or for a
// multilayer winding cooled at its ends too the two-dimensional section,
// calc.SectionConduction, within 10⁻⁶ of the series) under the lumped model's own
// assumptions — heat generated uniformly at the resistance of the mean
// temperature, the same surface heat loss — against the lumped model's
// closed forms (the conduction rise of calc.AnnulusRise or the series of
// calc.SectionRise, and the mean
// temperature of calc.ThermalProblem.MeanAtSurface). The finite-volume
// scheme is of second order in the ring thickness and within 10⁻⁵ of the
// closed form at 400 rings (its doc comment and test); the tolerance,
// fixed before the comparison, is ten times that: 10⁻⁴ of the rise above
// ambient. The comparison checks the computation, not the model: both
// sides take one resistance for the whole winding, which a winding whose
// inner turns run much hotter than its outer ones departs from.
func heatBalanceCheck(c calc.Coil, cr calc.CoilResult) []Check {
	st := cr.Heat.Steady
	tp := cr.Heat.Problem
	if !st.Settled || !(st.Power > 0) || cr.Verdict.NoSolution {
		return nil
	}
	fd := calc.WindingConduction(c, cr.Winding, tp, 400)
	if !fd.Converged || math.IsNaN(fd.HotSpot) {
		return nil
	}
	ta := tp.Ambient
	state := "steady state"
	if tp.Duty < 1 {
		state = "duty-averaged steady state" // not the on/off cycle's peak
	}
	lumped, other := "lumped: surface balance, closed-form conduction rise", "finite-volume radial conduction, 400 rings (uniform heating at the mean temperature's resistance, same surface loss)"
	if calc.RiseEndsCooled(c, cr.Winding) {
		lumped = "lumped: surface balance, series solution of the section's conduction"
		other = "finite volumes over the winding's section, ends and outer cylinder held (uniform heating at the mean temperature's resistance, same surface loss)"
	}
	return []Check{newCheck(c.Name, "rise of the hottest point above ambient, "+state+" (checks the conduction inside the winding; the surface balance is shared)", lumped,
		other, st.HotSpot-ta, fd.HotSpot-ta, "K", heatCheckTolerance)}
}

// heatCheckTolerance is the hot-spot check's tolerance: ten times the
// finite-volume scheme's stated accuracy at 400 rings (calc.AnnulusConduction).
const heatCheckTolerance = 1e-4

// roundWireCheck verifies a single-layer coil's inductance — Lorenz's
// current sheet less Rosa's round-wire correction — against the
// independent sum over every pair of turn filaments (Maxwell's formula,
// each turn's own round-wire inductance). Rosa's correction neglects the
// curvature of the turns; on test coils with pitches up to a tenth of the
// radius the two agree to a few parts in 10⁴, so 0.5 % is allowed.
func roundWireCheck(c calc.Coil, cr calc.CoilResult) []Check {
	w := cr.Winding
	if c.Form != calc.Solenoid || c.RadialBuild > 0 || w.Thin || w.LayerCount != 1 || math.IsNaN(cr.Inductance) || !(c.Wire.Bare > 0) {
		return nil
	}
	L1 := calc.RoundWireSolenoidInductance(c.MeanDiameter/2, c.Length, c.Turns, c.Wire.Bare)
	return []Check{newCheck(c.Name, "single-layer inductance", "Lorenz–Nagaoka current sheet less Rosa's round-wire correction",
		"sum over every pair of turns (Maxwell's formula; turn self-inductance of round wire)", L1, calc.TurnSumInductance(w, c.Wire.Bare/2), "H", 0.005)}
}
