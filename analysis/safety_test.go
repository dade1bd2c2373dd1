package analysis

import (
	"fmt"
	"math"
	"os"
	"strings"
	"testing"

	"coilmemo/calc"
	"coilmemo/calc/biotsavart"
)

// The 0.5 mT reach of a cored coil is searched in the field of winding and
// core together (the rod's pole model): it lies well beyond the same
// winding's in air, and at the reported distance the cored model — the
// winding summed turn by turn (calc.CoilField, not the quadrature the
// search uses) plus calc.CorePoleField — gives 0.5 mT to within 10⁻⁶,
// falling below it 0.1 % further out.
func TestCoredImplantReach(t *testing.T) {
	air := studyOf(t, "```coil\nname = rod\nform = solenoid\nmean-diameter = 12 mm\nlength = 120 mm\nturns = 400\nwire = AWG 30\ncurrent = 0.3 A\n```\n")
	st := studyOf(t, strings.Replace(rodSpec, "0.1 A", "0.3 A", 1)+"core-permeability = 1000\n```\n")
	c := st.Spec.Design.Coils[0]
	cr := st.Results.Coils[0]
	k := st.Coils[0].Kinds.Core
	if k == nil {
		t.Fatal("no core figures")
	}
	// As computed: on the axis 61 mm in air, 92 mm with the core; from the
	// winding's surface 0.8 mm and 31 mm.
	ai, ci := air.Safety.Implant, st.Safety.Implant
	if !(ai.Axial > 0) || !(ci.Axial > 1.4*ai.Axial) || !(ci.Windings[0].Distance > ai.Windings[0].Distance) {
		t.Errorf("cored reach %g m (from the surface %g m) not beyond the air coil's %g m (%g m)", ci.Axial, ci.Windings[0].Distance, ai.Axial, ai.Windings[0].Distance)
	}
	model := func(z float64) float64 {
		p := calc.Vec{0, 0, z}
		return calc.CoilField(c, cr.Winding, cr.Current, p).Add(calc.CorePoleField(c, *k, p)).Norm()
	}
	if b := model(ci.Axial); math.Abs(b/ImplantField-1) > 1e-6 {
		t.Errorf("cored |B| at the reported reach %g m: %g T, want %g T", ci.Axial, b, ImplantField)
	}
	if b := model(1.001 * ci.Axial); !(b < ImplantField) {
		t.Errorf("cored |B| 0.1 %% beyond the reach: %g T, not below %g T", b, ImplantField)
	}
	// The rod (140 mm) is longer than the winding (120 mm): the search
	// from the rod's end face along the axis reaches at least as far as
	// the axial search from the origin.
	if end := c.Core.Length / 2; !(ci.Windings[0].Distance >= ci.Axial-end-1e-9) {
		t.Errorf("reach from the surface %g m, short of the axial reach %g m less the rod's half-length %g m", ci.Windings[0].Distance, ci.Axial, end)
	}
}

// A coil off the origin with its axis along the diagonal of the xy plane:
// the axial and in-plane searches from the origin along x, y and z miss
// its axis, and the farthest reach lies along (1, 1, 0)/√2. At the reported
// distance the winding summed turn by turn (calc.CoilField, not the
// quadrature the search uses) gives 0.5 mT to within 10⁻⁶, and 0.1 %
// further out less.
func TestFarthestImplantReachOffTheAxes(t *testing.T) {
	st := studyOf(t, "```coil\nname = diag\nform = solenoid\nmean-diameter = 150 mm\nlength = 60 mm\nradial-build = 10 mm\nturns = 800\nwire = AWG 22\ncurrent = 2 A\ncentre = (200, 200, 0) mm\naxis = (1, 1, 0)\n```\n")
	ir := st.Safety.Implant
	u := calc.Vec{1, 1, 0}.Scale(1 / math.Sqrt2)
	if ir.Toward.Sub(u).Norm() > 1e-9 {
		t.Fatalf("farthest reach %g m toward %v, want toward %v", ir.Farthest, ir.Toward, u)
	}
	// The coil's axis passes through the origin: the reach is measured
	// along it, and the farthest search finds the same.
	if ir.Axis.Sub(u).Norm() > 1e-12 || math.Abs(ir.Axial/ir.Farthest-1) > 1e-9 || !(ir.Farthest > 0.2*math.Sqrt2+0.03) {
		t.Errorf("farthest %g m against %g m along %v", ir.Farthest, ir.Axial, ir.Axis)
	}
	c, cr := st.Spec.Design.Coils[0], st.Results.Coils[0]
	model := func(r float64) float64 { return calc.CoilField(c, cr.Winding, cr.Current, u.Scale(r)).Norm() }
	if b := model(ir.Farthest); math.Abs(b/ImplantField-1) > 1e-6 {
		t.Errorf("|B| at the reported reach %g m: %g T, want %g T", ir.Farthest, b, ImplantField)
	}
	if b := model(1.001 * ir.Farthest); !(b < ImplantField) {
		t.Errorf("|B| 0.1 %% beyond the reach: %g T, not below %g T", b, ImplantField)
	}
	// Lifted 40 mm off that line, the reach is measured along z and in
	// the xy plane, which miss the coil: the farthest search does not.
	st = studyOf(t, "```coil\nname = diag\nform = solenoid\nmean-diameter = 150 mm\nlength = 60 mm\nradial-build = 10 mm\nturns = 800\nwire = AWG 22\ncurrent = 2 A\ncentre = (200, 200, 40) mm\naxis = (1, 1, 0)\n```\n")
	ir = st.Safety.Implant
	if ir.Axis != (calc.Vec{0, 0, 1}) || !(ir.Farthest > 1.2*math.Max(ir.Axial, ir.Radial)) || !(ir.Farthest > 0.2*math.Sqrt2+0.03) {
		t.Errorf("lifted: farthest %g m toward %v against axial %g m and radial %g m along %v", ir.Farthest, ir.Toward, ir.Axial, ir.Radial, ir.Axis)
	}
	c, cr = st.Spec.Design.Coils[0], st.Results.Coils[0]
	if b := calc.CoilField(c, cr.Winding, cr.Current, ir.Toward.Scale(ir.Farthest)).Norm(); math.Abs(b/ImplantField-1) > 1e-6 {
		t.Errorf("lifted: |B| at the reported reach %g m: %g T, want %g T", ir.Farthest, b, ImplantField)
	}
}

// A single loop at the origin on an oblique axis: the implant reach is
// measured along its own axis and in its own plane. On the axis of a
// filament loop of radius a carrying NI, B = μ0 N I a² / (2 (a² + z²)^{3/2})
// (the Biot–Savart law for a circular loop, e.g. Jackson, Classical
// Electrodynamics, 3rd ed., §5.5 — recalled from memory), so the level
// B_L is reached out to z = a √((B0/B_L)^{2/3} − 1) with B0 = μ0 N I/(2a).
// One turn makes the winding a filament at the wire's centre.
func TestImplantReachAlongTheCoilsOwnAxis(t *testing.T) {
	st := studyOf(t, "```coil\nname = tilted\nform = loop\nmean-diameter = 60 mm\nturns = 1\nwire = AWG 10\ncurrent = 40 A\naxis = (1, 1, 0)\n```\n")
	ir := st.Safety.Implant
	u := calc.Vec{1, 1, 0}.Scale(1 / math.Sqrt2)
	if ir.Axis.Sub(u).Norm() > 1e-12 {
		t.Fatalf("reach measured along %v, want the coil's axis %v", ir.Axis, u)
	}
	a := 0.030
	b0 := calc.Mu0 * 40 / (2 * a)
	want := a * math.Sqrt(math.Pow(b0/ImplantField, 2.0/3)-1)
	if math.Abs(ir.Axial/want-1) > 1e-6 {
		t.Errorf("reach along the axis %g m, want %g m", ir.Axial, want)
	}
	// Off the origin the coil's axis no longer passes through it: z.
	off := studyOf(t, "```coil\nname = tilted\nform = loop\nmean-diameter = 60 mm\nturns = 1\nwire = AWG 10\ncurrent = 40 A\naxis = (1, 1, 0)\ncentre = (0, 0, 50) mm\n```\n")
	if z := off.Safety.Implant.Axis; z != (calc.Vec{0, 0, 1}) {
		t.Errorf("off-origin coil: reach measured along %v, want z", z)
	}
}

// The implant reach from the windings is the largest distance from a
// winding's outer surface (the solid it fills with its bore) at which
// |B| ≥ 0.5 mT. Checked for a one-turn loop and a pair of one-turn loops
// against an independent computation: |B| by the numerical Biot–Savart
// line integral of each filament (calc/biotsavart) on a 0.25 mm grid of
// the meridian plane, and the distance of every node at the level from
// the bundle's surface (the loop's wire, a torus of the bundle's radius
// about the filament; the filled disc inside it is the bore). The search
// along rays must agree with the grid's largest distance to within the
// grid's diagonal. On the loop's axis the level is reached, by the
// filament's closed form B = μ0 I a² / (2 (a² + z²)^{3/2}) (Jackson,
// Classical Electrodynamics, 3rd ed., §5.5 — recalled from memory), out
// to z* = a √((B0/B_L)^{2/3} − 1), so the axial reach's far end lies
// z* − r from the bundle's face, r the bundle's radius.
func TestImplantReachFromTheWindingsSurface(t *testing.T) {
	for _, c := range []struct {
		name, src string
		a         float64
		centres   []float64
	}{
		{"loop", "```coil\nname = loop\nform = loop\nmean-diameter = 60 mm\nturns = 1\nwire = AWG 10\ncurrent = 40 A\n```\n", 0.030, []float64{0}},
		{"pair", "```coil\nname = pair\nform = pair\nmean-diameter = 60 mm\nspacing = 50 mm\nturns = 1\nwire = AWG 10\ncurrent = 30 A\n```\n", 0.030, []float64{-0.025, 0.025}},
	} {
		st := studyOf(t, c.src)
		ir := st.Safety.Implant
		cs := st.Coils[0]
		r := (cs.Envelope.Z1 - cs.Envelope.Z0) / 2
		I := st.Results.Coils[0].Current
		B := func(rho, z float64) float64 {
			var br, bz float64
			for _, zc := range c.centres {
				x, y := biotsavart.CircleLocal(c.a, I, rho, z-zc, 16, 16)
				br, bz = br+x, bz+y
			}
			return math.Hypot(br, bz)
		}
		dist := func(rho, z float64) float64 {
			d := math.Inf(1)
			for _, zc := range c.centres {
				d = math.Min(d, math.Hypot(math.Max(rho-c.a, 0), z-zc)-r)
			}
			return d
		}
		const h = 0.25e-3
		grid := 0.0
		for i := 0; i <= 600; i++ {
			for k := 0; k <= 600; k++ {
				rho, z := float64(i)*h, float64(k)*h
				if d := dist(rho, z); d > 0 && d > grid && B(rho, z) >= ImplantField {
					grid = d
				}
			}
		}
		if !(grid > 0.005) || math.Abs(ir.Distance-grid) > h*math.Sqrt2 {
			t.Errorf("%s: reach from the windings' surface %g m, the grid's %g m", c.name, ir.Distance, grid)
		}
		if ir.Nearest != 0 || ir.Windings[0].Distance != ir.Distance {
			t.Errorf("%s: nearest %d, windings %+v", c.name, ir.Nearest, ir.Windings)
		}
		if c.name == "loop" {
			b0 := calc.Mu0 * I / (2 * c.a)
			zs := c.a * math.Sqrt(math.Pow(b0/ImplantField, 2.0/3)-1)
			if math.Abs(ir.AxialClear-(zs-r)) > 1e-6*zs || ir.AxialBore || ir.AxialCoil != 0 {
				t.Errorf("loop: axial reach %g m lies %g m from the bundle (bore %v), want %g m", ir.Axial, ir.AxialClear, ir.AxialBore, zs-r)
			}
		}
		if !(ir.AxialClear <= ir.Distance) {
			t.Errorf("%s: axial reach's far end %g m from the winding, beyond the reach %g m", c.name, ir.AxialClear, ir.Distance)
		}
	}
}

// Inside a long solenoid the level is reached along the bore and not
// beyond its ends: the axial reach then ends in the bore, where the
// current sheet's closed form B(z) = μ0 n I/2 · [(z + L/2)/√((z + L/2)² +
// a²) − (z − L/2)/√((z − L/2)² + a²)] (the finite solenoid, integrated
// from the loop's axial field) falls to 0.5 mT.
func TestImplantReachInsideTheBore(t *testing.T) {
	st := studyOf(t, "```coil\nname = s\nform = solenoid\nmean-diameter = 60.5 mm\nlength = 300 mm\nturns = 500\nwire = 0.5 mm\nwire-outer-diameter = 0.56 mm\ncurrent = 250 mA\n```\n")
	ir := st.Safety.Implant
	a, L, n, I := 0.03025, 0.300, 500/0.300, 0.25
	Bz := func(z float64) float64 {
		return calc.Mu0 * n * I / 2 * ((z+L/2)/math.Hypot(z+L/2, a) - (z-L/2)/math.Hypot(z-L/2, a))
	}
	lo, hi := 0.0, L/2
	for range 60 {
		if mid := (lo + hi) / 2; Bz(mid) >= ImplantField {
			lo = mid
		} else {
			hi = mid
		}
	}
	if math.Abs(ir.Axial/lo-1) > 0.01 {
		t.Errorf("axial reach %g m, the current sheet's %g m", ir.Axial, lo)
	}
	if !ir.AxialBore || ir.AxialClear != 0 || ir.AxialCoil != 0 {
		t.Errorf("axial reach's far end: bore %v, %g m from the winding (coil %d); want in the bore", ir.AxialBore, ir.AxialClear, ir.AxialCoil)
	}
}

// A design of one solid winding gives the same reach from its surface
// whether or not its lines are sampled between their ends: a thick coil,
// a long solenoid and a tilted coil off the origin.
func TestOneConvexOutlineNeedsNoSamples(t *testing.T) {
	for _, src := range []string{
		"```coil\nname = thick\nform = solenoid\nmean-diameter = 60 mm\nlength = 18.5 mm\nradial-build = 18 mm\nturns = 1000\nwire = AWG 24\ncurrent = 1 A\n```\n",
		"```coil\nname = long\nform = solenoid\nmean-diameter = 40 mm\nlength = 200 mm\nturns = 250\nwire = AWG 22\ncurrent = 1.5 A\n```\n",
		"```coil\nname = tilted\nform = solenoid\nmean-diameter = 30 mm\nlength = 20 mm\nradial-build = 4 mm\nturns = 200\nwire = AWG 26\ncurrent = 2 A\naxis = (1, 1, 0)\ncentre = (40 mm, -10 mm, 25 mm)\n```\n",
	} {
		fast := studyOf(t, src).Safety.Implant
		sampleEveryLine = true
		slow := studyOf(t, src).Safety.Implant
		sampleEveryLine = false
		if !(fast.Distance > 0) || fast.Distance != slow.Distance || fast.Windings[0].Distance != slow.Windings[0].Distance {
			t.Errorf("%s: reach %g m without the samples, %g m with them", src[:30], fast.Distance, slow.Distance)
		}
	}
}

// refineReach finds the crossing of a field falling as a power of the
// distance (the dipole's cube, a line current's first power, and a
// rippled one) to 10⁻⁷ of the distance, from the bracket reach hands it,
// in fewer evaluations than the 21 a bisection of that bracket takes.
func TestRefineReachFindsThePowerLawsCrossing(t *testing.T) {
	const level = 5e-4
	for _, c := range []struct {
		p, ripple float64
	}{{1, 0}, {2, 0}, {3, 0}, {5, 0}, {3, 0.1}} {
		n := 0
		f := func(r float64) float64 {
			n++
			return 1e-3 * math.Pow(0.01/r, c.p) * (1 + c.ripple*math.Sin(r*50))
		}
		hi := 10.0
		lo := hi / 1.25
		for f(lo) < level {
			hi, lo = lo, lo/1.25
		}
		n = 0
		r := refineReach(f, level, lo, hi, f(lo), f(hi))
		calls := n - 2
		if c.ripple == 0 {
			exact := 0.01 * math.Pow(1e-3/level, 1/c.p)
			if math.Abs(r-exact) > 1e-7*hi || r > exact*(1+1e-15) {
				t.Errorf("B ∝ r^-%g: crossing %.15g m, exact %.15g m", c.p, r, exact)
			}
		}
		if f(r) < level*(1-1e-12) {
			t.Errorf("B ∝ r^-%g (ripple %g): returned %g m where the field is below the level", c.p, c.ripple, r)
		}
		if calls > 15 {
			t.Errorf("B ∝ r^-%g (ripple %g): %d field evaluations", c.p, c.ripple, calls)
		}
	}
}

// The two field bounds (fieldBound) hold, checked on a spiral of points
// from just outside the windings to 2 m away round a thick coil, a pair,
// a rectangle and two coils apart: the conductors' Σ K/d² is never below
// |B|, and each block's field differs from its moment's dipole field by
// no more than 3KR²/(D − R)⁴ wherever D > 3R; and beyond 1.5 m that
// remainder bound, falling as D⁻⁴ against the field's D⁻³, is at most
// twice the field (1.7× for the 300 mm panel, 0.2× for the compact
// coils), not a loose 1/d² bound.
func TestConductorBoundHoldsTheField(t *testing.T) {
	for _, src := range []string{
		"```coil\nname = thick\nform = solenoid\nmean-diameter = 60 mm\nlength = 18.5 mm\nradial-build = 18 mm\nturns = 1000\nwire = AWG 24\ncurrent = 1 A\n```\n",
		"```coil\nname = pair\nform = pair\nmean-diameter = 60 mm\nspacing = 50 mm\nturns = 20\nwire = AWG 20\ncurrent = 3 A\n```\n",
		"```coil\nname = panel\nform = rectangle\nwidth = 300 mm\nheight = 200 mm\nturns = 30\nwire = AWG 22\ncurrent = 2 A\n```\n",
		"```coil\nname = a\nform = solenoid\nmean-diameter = 40 mm\nlength = 20 mm\nradial-build = 5 mm\nturns = 200\nwire = AWG 26\ncurrent = 1 A\ncentre = (-60 mm, 0 mm, 0 mm)\n```\n\n```coil\nname = b\nform = solenoid\nmean-diameter = 40 mm\nlength = 20 mm\nradial-build = 5 mm\nturns = 200\nwire = AWG 26\ncurrent = 1 A\naxis = x\ncentre = (60 mm, 0 mm, 0 mm)\n```\n",
	} {
		st := studyOf(t, src)
		d := st.Spec.Design
		os := outlines(d, st.Coils)
		fb := newFieldBound(d, conductorBounds(d, st.Results, st.Coils), os)
		if fb == nil {
			t.Fatalf("%s: no bound", src[:30])
		}
		fm := implantField(d, st.Results, st.Coils)
		model := calc.NewFieldModel(d)
		worst, worstRem, farRem := 0.0, 0.0, 0.0
		for i := range 400 {
			r := 1e-3 * math.Pow(2000, float64(i)/399)
			th, ph := float64(i)*2.39996, math.Acos(1-2*math.Mod(float64(i)*0.618034, 1))
			p := calc.Vec{r * math.Sin(ph) * math.Cos(th), r * math.Sin(ph) * math.Sin(th), r * math.Cos(ph)}
			dist, _, _ := nearestOutline(os, p)
			if !(dist > 0) {
				continue
			}
			// the outlines hold every conductor, so the conductors are at
			// least dist away
			total := 0.0
			for _, k := range fb.ks {
				total += k
			}
			b := fm(p).Norm()
			worst = math.Max(worst, b*dist*dist/total)
			for j := range fb.ks {
				rel := p.Sub(fb.centres[j])
				D := rel.Norm()
				if !(D > 3*fb.rs[j]) || fb.ks[j] == 0 {
					continue
				}
				bj := model.CoilAt(j, p)
				rem := fb.dipoleRemainder(j, D)
				worstRem = math.Max(worstRem, bj.Sub(calc.DipoleField(st.Results.Coils[j].Moment, rel)).Norm()/rem)
				if r > 1.5 {
					farRem = math.Max(farRem, rem/bj.Norm())
				}
			}
		}
		if !(worst > 0) || worst > 1 {
			t.Errorf("%s: |B| reaches %g of Σ K/d² (must stay ≤ 1)", src[:30], worst)
		}
		if !(worstRem > 0) || worstRem > 1 {
			t.Errorf("%s: a block's field differs from its dipole's by %g of the remainder bound (must stay ≤ 1)", src[:30], worstRem)
		}
		if !(farRem > 0) || farRem > 2 {
			t.Errorf("%s: beyond 1.5 m the remainder bound reaches %g× the field", src[:30], farRem)
		}
	}
}

// Next to a loop whose neighbour breaks its symmetry (the three-axis set's
// X coil, with the Z coil 40 mm below), the reach from the winding found
// by the search equals a brute-force search of a 0.5 mm × 1 mm × 1 mm grid
// round the loop's lower rim to within the grid's spacing.
func TestImplantReachRoundAnAsymmetricRim(t *testing.T) {
	src, err := os.ReadFile("../testdata/figures/three-axis-set.md")
	if err != nil {
		t.Fatal(err)
	}
	st, diags := Run("three-axis-set.md", src, Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	fm := implantField(st.Spec.Design, st.Results, st.Coils)
	outs := outlines(st.Spec.Design, st.Coils)
	grid := 0.0
	for i := 0; i <= 40; i++ {
		for j := 0; j <= 90; j++ {
			for k := 0; k <= 90; k++ {
				p := calc.Vec{0.035 + 0.0005*float64(i), -0.045 + 0.001*float64(j), -0.045 + 0.001*float64(k)}
				if dd, c, _ := nearestOutline(outs, p); c == 0 && dd > grid && fm(p).Norm() >= ImplantField {
					grid = dd
				}
			}
		}
	}
	got := st.Safety.Implant.Windings[0].Distance
	if !(grid > 0.002) || got < grid-0.5e-3 {
		t.Errorf("X coil: reach from its winding %g m, the grid's %g m", got, grid)
	}
}

// The search's field (levelField: circular blocks from their exterior
// series to 10⁻⁹ of the level, a far rectangle as a dipole within its
// bound) says "at or above 0.5 mT" where the full field does, over points
// among a lattice of coils (solenoids on both axes, a pair, a rectangle)
// from next to the windings to far away.
func TestLevelFieldDecidesAsTheFullField(t *testing.T) {
	var b strings.Builder
	for i := range 8 {
		fmt.Fprintf(&b, "```coil\nname = c%d\nform = solenoid\ninner-diameter = 30 mm\nouter-diameter = 40 mm\nlength = 20 mm\nturns = 200\nwire = AWG 26\ncurrent = 0.5 A\naxis = %s\ncentre = (%d, 0, %d) mm\n```\n\n", i, []string{"z", "x"}[i%2], 120*(i%4-2), 120*(i/4))
	}
	b.WriteString("```coil\nname = p\nform = pair\nmean-diameter = 60 mm\nspacing = 30 mm\nturns = 20\nwire = AWG 20\ncurrent = 3 A\ncentre = (0, 200 mm, 0)\n```\n\n")
	b.WriteString("```coil\nname = r\nform = rectangle\nwidth = 150 mm\nheight = 100 mm\nturns = 30\nwire = AWG 22\ncurrent = 2 A\ncentre = (0, -250 mm, 60 mm)\naxis = y\n```\n")
	st := studyOf(t, b.String())
	d := st.Spec.Design
	ks := conductorBounds(d, st.Results, st.Coils)
	os := outlines(d, st.Coils)
	var moments []calc.Vec
	for _, cr := range st.Results.Coils {
		moments = append(moments, cr.Moment)
	}
	fm := implantField(d, st.Results, st.Coils)
	lf := levelField(fm, calc.NewFieldModel(d), newFieldBound(d, ks, os), moments, ImplantField)
	above, shortcut := 0, 0
	for i := range 3000 {
		r := 15e-3 * math.Pow(100, float64(i%300)/299)
		th, ph := float64(i)*2.39996, math.Acos(1-2*math.Mod(float64(i)*0.618034, 1))
		p := calc.Vec{-0.12 + r*math.Sin(ph)*math.Cos(th), r * math.Sin(ph) * math.Sin(th), r * math.Cos(ph)}
		if dist, _, _ := nearestOutline(os, p); !(dist > 0) {
			continue
		}
		full, fast := fm(p).Norm(), lf(p).Norm()
		if (full >= ImplantField) != (fast >= ImplantField) {
			t.Errorf("at %v: full field %g T, the search's %g T: they decide differently", p, full, fast)
		}
		if full >= ImplantField {
			above++
		}
		if math.Abs(full-fast) > 1e-12*full {
			shortcut++
		}
	}
	if above < 30 || shortcut < 300 {
		t.Errorf("%d points at the level, %d taken by the series or dipoles: the test does not exercise both", above, shortcut)
	}
}

// A lattice of solid coils gives the same reach from each winding, within
// 1 % and never less, when each block's lines are searched only in its
// own region and not sampled as when every line is searched to its end
// and sampled.
func TestLatticeReachWithoutOwnLineSamples(t *testing.T) {
	var b strings.Builder
	for i := range 6 {
		fmt.Fprintf(&b, "```coil\nname = c%d\nform = solenoid\ninner-diameter = 30 mm\nouter-diameter = 40 mm\nlength = 20 mm\nturns = 200\nwire = AWG 26\ncurrent = %g A\naxis = %s\ncentre = (%d, 0, %d) mm\n```\n\n", i, 0.5+0.3*float64(i%2), []string{"z", "x", "z"}[i%3], 70*(i%3-1), 70*(i/3))
	}
	fast := studyOf(t, b.String()).Safety.Implant
	sampleEveryLine = true
	slow := studyOf(t, b.String()).Safety.Implant
	sampleEveryLine = false
	for i := range fast.Windings {
		if f, s := fast.Windings[i].Distance, slow.Windings[i].Distance; !(f > 0) || f < s*(1-1e-7) || f > s*1.01 {
			t.Errorf("coil %d: reach %g m without the own lines' samples, %g m with them", i, f, s)
		}
	}
}

// A design of pick-up coils alone carries no current: no field is searched
// for the implant level, and so no caution or note on it is raised.
func TestNoImplantSearchWithoutCurrent(t *testing.T) {
	src, err := os.ReadFile("../examples/search-coil.md")
	if err != nil {
		t.Fatal(err)
	}
	st, diags := Run("search-coil.md", src, Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	if st.Safety.Implant.Searched {
		t.Errorf("the implant level is searched for a pick-up coil: %+v", st.Safety.Implant)
	}
}

// The largest |B| at a solid winding's outer surface, as the implant
// caution quotes it, is the surface's maximum: against a dense scan of
// the section's outline (2000 points of the exact turn sum, calc.FieldAt)
// in a meridian plane, for a coil off the origin and a pair.
func TestSurfacePeakIsTheSurfaceMaximum(t *testing.T) {
	for _, spec := range []string{
		"```coil\nname = s\nform = solenoid\nmean-diameter = 60 mm\nradial-build = 8 mm\nlength = 8 mm\nturns = 180\nwire = AWG 24\ncurrent = 1 A\ncentre = (0, 0, -20 mm)\n```\n",
		"```coil\nname = p\nform = pair\nmean-diameter = 200 mm\nspacing = 100 mm\nradial-build = 8 mm\nlength = 8 mm\nturns = 60\nwire = AWG 20\ncurrent = 3 A\ncentre = (0, 0, 150 mm)\n```\n",
	} {
		st := studyOf(t, spec)
		d := st.Spec.Design
		os := outlines(d, st.Coils)
		scan := 0.0
		for _, o := range os {
			const n = 2000
			e := o.fr.E1
			r1, z0, z1 := o.r1+1e-6, o.z0-1e-6, o.z1+1e-6
			per := 2*r1 + (z1 - z0)
			for j := 0; j <= n; j++ {
				s := per * float64(j) / n
				rho, z := s, z0
				if s > r1 && s <= r1+(z1-z0) {
					rho, z = r1, z0+(s-r1)
				} else if s > r1+(z1-z0) {
					rho, z = r1-(s-r1-(z1-z0)), z1
				}
				scan = math.Max(scan, calc.FieldAt(d, o.centre.Add(e.Scale(rho)).Add(o.fr.U.Scale(z))).Norm())
			}
		}
		got := st.Safety.Implant.Windings[0].Surface
		if math.Abs(got-scan) > 2e-3*scan {
			t.Errorf("%s: surface peak %g T, the dense scan's %g T", d.Coils[0].Name, got, scan)
		}
	}
}
