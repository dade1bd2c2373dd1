package calc

import (
	"math"
	"math/rand/v2"
	"testing"
)

// Every coil form against a numerical Biot–Savart line integral, and the
// published closed forms the engine must reproduce.

// biotSavartWinding integrates Biot–Savart numerically round every turn of
// coil block c (biotSavartCircle per turn, both coils of a pair; a
// Rectangle along its four sides): independent of LoopField and the
// quadrature over the cross-section.
func biotSavartWinding(c Coil, w Winding, I float64, p Vec) Vec {
	fr := CoilFrame(c.Axis)
	if c.Form == Rectangle {
		return biotSavartPolygon(rectCorners(fr, c.Centre, c.Width, c.Height), I*float64(w.TurnCount()), p)
	}
	type placed struct {
		ctr Vec
		I   float64
	}
	coils := []placed{{c.Centre, I}}
	if c.Form == Pair {
		I2 := I
		if c.Opposing {
			I2 = -I
		}
		s := fr.U.Scale(c.Spacing / 2)
		coils = []placed{{c.Centre.Sub(s), I}, {c.Centre.Add(s), I2}}
	}
	var B Vec
	for _, cp := range coils {
		for _, l := range w.Layers {
			// Coincident turns of a thin coil are one filament × count.
			count := map[float64]int{}
			var order []float64
			for _, z := range l.Z {
				if count[z] == 0 {
					order = append(order, z)
				}
				count[z]++
			}
			for _, z := range order {
				ctr := cp.ctr.Add(fr.U.Scale(z))
				B = B.Add(biotSavartCircle(ctr, fr.E1, fr.E2, l.Radius, cp.I*float64(count[z]), p, 40))
			}
		}
	}
	return B
}

// nearestFilament returns the distance from p to the nearest turn of c.
func nearestFilament(c Coil, w Winding, p Vec) float64 {
	fr := CoilFrame(c.Axis)
	r := p.Sub(c.Centre)
	z := r.Dot(fr.U)
	rho := r.Sub(fr.U.Scale(z)).Norm()
	offs := []float64{0}
	if c.Form == Pair {
		offs = []float64{-c.Spacing / 2, c.Spacing / 2}
	}
	d := math.Inf(1)
	for _, o := range offs {
		for _, l := range w.Layers {
			for _, zt := range l.Z {
				d = math.Min(d, math.Hypot(rho-l.Radius, z-o-zt))
			}
		}
	}
	return d
}

func fieldTestForms() []Coil {
	cu := Copper()
	wire := Wire{Bare: 0.7e-3, Outer: 0.8e-3, Material: cu}
	return []Coil{
		{Name: "thin loop", Form: Loop, MeanDiameter: 0.05, Turns: 12, Wire: wire,
			Axis: Vec{0.2, -0.4, 1}, Centre: Vec{0.003, -0.002, 0.01}},
		{Name: "thick loop", Form: Loop, MeanDiameter: 0.05, Length: 4e-3, RadialBuild: 3.2e-3, Turns: 20, Wire: wire},
		{Name: "single-layer solenoid", Form: Solenoid, MeanDiameter: 0.03, Length: 0.03, Turns: 30, Wire: wire,
			Axis: Vec{1, 0, 0}, Centre: Vec{0, 0.01, 0}},
		{Name: "multilayer solenoid", Form: Solenoid, MeanDiameter: 0.04, Length: 8e-3, RadialBuild: 4e-3, Turns: 47, Wire: wire,
			Axis: Vec{0, 1, 1}},
		{Name: "aiding pair", Form: Pair, MeanDiameter: 0.06, Spacing: 0.03, Turns: 8, Wire: wire},
		{Name: "opposing thick pair", Form: Pair, MeanDiameter: 0.06, Length: 3.2e-3, RadialBuild: 2.4e-3, Spacing: 0.05,
			Opposing: true, Turns: 12, Wire: wire, Axis: Vec{0, 0, -1}},
		{Name: "rectangle", Form: Rectangle, Width: 0.08, Height: 0.05, Turns: 15, Wire: wire,
			Axis: Vec{1, 1, 0}, Centre: Vec{0.01, 0, -0.02}},
	}
}

// TestEveryFormVsBiotSavart compares the closed-form field of every coil
// form (exact loop fields summed over turns; straight-segment closed form
// for the rectangle) and the quadrature path (CoilSource) with a numerical
// Biot–Savart line integral at 100 seeded random points around each, at
// least a tenth of the mean radius from every turn.
func TestEveryFormVsBiotSavart(t *testing.T) {
	const I = 0.75
	for k, c := range fieldTestForms() {
		t.Run(c.Name, func(t *testing.T) {
			t.Parallel()
			formVsBiotSavart(t, c, I, rand.New(rand.NewPCG(31, uint64(k))))
		})
	}
}

func formVsBiotSavart(t *testing.T, c Coil, I float64, rng *rand.Rand) {
	{
		w := LayOut(c)
		if w.Overfull {
			t.Fatalf("%s: %s", c.Name, w.Problem)
		}
		src := NewCoilSource(c, w, I)
		R := c.MeanDiameter / 2
		if c.Form == Rectangle {
			R = math.Min(c.Width, c.Height) / 2
		}
		size := coilExtent(c, w)
		fr := CoilFrame(c.Axis)
		worst, worstQ := 0.0, 0.0
		for i := 0; i < 100; {
			l := Vec{rng.Float64()*2 - 1, rng.Float64()*2 - 1, rng.Float64()*2 - 1}.Scale(2.5 * size)
			p := c.Centre.Add(fr.ToGlobal(l))
			if c.Form == Rectangle {
				// Distance to the rectangle's sides.
				lx, ly, lz := math.Abs(l[0]), math.Abs(l[1]), l[2]
				dx := math.Hypot(math.Max(0, ly-c.Height/2), lz)
				if lx-c.Width/2 < 0.1*R && lx-c.Width/2 > -0.1*R && dx < 0.1*R {
					continue
				}
				dy := math.Hypot(math.Max(0, lx-c.Width/2), lz)
				if ly-c.Height/2 < 0.1*R && ly-c.Height/2 > -0.1*R && dy < 0.1*R {
					continue
				}
			} else if nearestFilament(c, w, p) < 0.1*R {
				continue
			}
			i++
			want := biotSavartWinding(c, w, I, p)
			e := vecRelErr(CoilField(c, w, I, p), want)
			eq := vecRelErr(src.At(p), want)
			worst, worstQ = math.Max(worst, e), math.Max(worstQ, eq)
			if e > 1e-8 || eq > 1e-8 {
				t.Errorf("%s at %v: closed form rel %.3g, quadrature rel %.3g", c.Name, p, e, eq)
			}
		}
		t.Logf("%s: worst relative difference from Biot–Savart quadrature: closed form %.2g, cross-section quadrature %.2g", c.Name, worst, worstQ)
	}
}

func TestHelmholtzTextbookExamples(t *testing.T) {
	// B(0) = (4/5)^{3/2} μ0 N I / R for two thin coils of radius R at
	// spacing R (from the on-axis loop field at z = ±R/2).
	cases := []struct {
		source  string
		R, I    float64
		N       int
		quoted  float64 // T, as quoted
		quoteTo float64 // half a unit in the quoted last place, T
	}{
		// Giancoli, Physics for Scientists and Engineers, 4th ed., ch. 28,
		// problem on Helmholtz coils (Fig. 28–61), part (c): R = 10.0 cm,
		// N = 85, I = 3.0 A (data as the publisher's study pages state the
		// problem). The answer to the data's two significant figures is
		// 2.3 × 10⁻³ T; the book's printed answer was not checked.
		{"Giancoli 4th ed. ch. 28", 0.100, 3.0, 85, 2.3e-3, 0.05e-3},
		// An introductory-physics homework set (186 turns, R = 15.9 cm,
		// I = 2.2 A), whose accepted answer 0.0023 T is quoted in a public
		// homework-help thread.
		{"homework set, 186 turns", 0.159, 2.2, 186, 2.3e-3, 0.05e-3},
	}
	for _, tc := range cases {
		c := Coil{Form: Pair, MeanDiameter: 2 * tc.R, Spacing: tc.R, Turns: tc.N, Wire: WireFromGauge(20, Copper())}
		w := LayOut(c)
		B := CoilField(c, w, tc.I, Vec{})[2]
		checkRel(t, tc.source+": closed form", B, math.Pow(0.8, 1.5)*Mu0*float64(tc.N)*tc.I/tc.R, 1e-14)
		if math.Abs(B-tc.quoted) > tc.quoteTo {
			t.Errorf("%s: B(0) = %.5g T, quoted %.2g T", tc.source, B, tc.quoted)
		}
		r := AnalysePair(c, w, tc.I)
		if !r.Helmholtz || math.Abs(r.SpacingRatio-1) > 1e-15 {
			t.Errorf("%s: Helmholtz condition not recognised: %+v", tc.source, r)
		}
	}
}

func TestHelmholtzAxialUniformity(t *testing.T) {
	// On the axis of a thin Helmholtz pair, with x = z/R,
	//	B(z)/B(0) = 1 − (144/125) x⁴ + (19712/15625) x⁶ + O(x⁸),
	// the Taylor series of the sum of two on-axis loop fields
	// (1 + (x ∓ 1/2)²)^{−3/2} about x = 0; the x² term vanishes by the
	// Helmholtz spacing. The x⁶ coefficient and the exact ratios below were
	// computed here in 60-digit decimal arithmetic from that on-axis formula.
	const R, I = 0.25, 1.0
	c := Coil{Form: Pair, MeanDiameter: 2 * R, Spacing: R, Turns: 1, Wire: WireFromGauge(20, Copper())}
	w := LayOut(c)
	B0 := CoilField(c, w, I, Vec{})[2]
	exact := map[float64]float64{0.1: 0.9998860576755303, 0.2: 0.9982365015789348, 0.3: 0.9915602735400525}
	for _, x := range []float64{0.1, 0.2, 0.3} {
		got := CoilField(c, w, I, Vec{0, 0, x * R})[2] / B0
		checkRel(t, "B(z)/B(0) exact", got, exact[x], 1e-13)
		series := 1 - 144.0/125*math.Pow(x, 4)
		// The series agrees to within its next term, ≈ 1.26 x⁶.
		if d := math.Abs(got - series); d > 1.3*math.Pow(x, 6) {
			t.Errorf("z/R = %g: B/B0 = %.10f, series %.10f, difference %.3g > 1.3 x⁶", x, got, series, d)
		}
		// And off the series' leading error by less than 0.2 % of it at
		// x = 0.1, where the x⁶ term is 1 % of the x⁴ term.
		if x == 0.1 {
			lead := (got - 1) / (-144.0 / 125 * math.Pow(x, 4))
			if math.Abs(lead-1) > 0.012 {
				t.Errorf("leading deviation ratio %.5f", lead)
			}
		}
	}
	// The homogeneous regions found by AnalysePair. Along the axis against
	// the roots of 1 − B(z)/B(0) = 0.01 and 0.001 of the on-axis formula
	// above (computed here in 50-digit decimal arithmetic; the series to
	// x⁶ gives 0.3141 and 0.1731). Radially against a bisection on the
	// numerical Biot–Savart integral, and loosely against the leading
	// series term: the P₄ harmonic (35z⁴ − 30z²r² + 3r⁴)/8 is 3ρ⁴/8 at
	// z = 0, so B(ρ)/B(0) − 1 ≈ −(3/8)(144/125)(ρ/R)⁴ and the 1 % radius is
	// about (0.01 · 125/54)^{1/4} R = 0.390 R.
	r := AnalysePair(c, w, I)
	checkRel(t, "1 % axial extent", r.Axial1/R, 0.3137460251981657, 1e-7)
	checkRel(t, "0.1 % axial extent", r.Axial01/R, 0.1730705067298814, 1e-7)
	radial := func(tol float64) float64 {
		lo, hi := 0.0, R
		for range 40 {
			mid := (lo + hi) / 2
			B := biotSavartWinding(c, w, I, Vec{mid, 0, 0})
			if math.Abs(B[2]-B0) <= tol*B0 {
				lo = mid
			} else {
				hi = mid
			}
		}
		return lo
	}
	checkRel(t, "1 % radial extent", r.Radial1, radial(0.01), 1e-6)
	checkRel(t, "0.1 % radial extent", r.Radial01, radial(0.001), 1e-6)
	checkRel(t, "1 % radial extent vs leading series term", r.Radial1/R, math.Pow(0.01*125/54, 0.25), 0.05)
}

func TestSquareLoopCentre(t *testing.T) {
	// Centre of a square loop of side s: B = 2√2 μ0 I / (π s) (Griffiths,
	// Introduction to Electrodynamics, 4th ed., Problem 5.8, with the
	// distance to a side R = s/2 — problem number recalled).
	const s, I = 0.12, 3.5
	c := Coil{Form: Rectangle, Width: s, Height: s, Turns: 1, Wire: WireFromGauge(20, Copper()),
		Axis: Vec{0, -1, 0}, Centre: Vec{0.05, 0.02, -0.1}}
	w := LayOut(c)
	B := CoilField(c, w, I, c.Centre)
	checkRel(t, "square loop centre", B.Dot(CoilFrame(c.Axis).U), 2*math.Sqrt2*Mu0*I/(math.Pi*s), 1e-14)
	if B.Norm()-math.Abs(B.Dot(CoilFrame(c.Axis).U)) > 1e-15*B.Norm() {
		t.Errorf("centre field not along the axis: %v", B)
	}
}

func TestFiniteSolenoidOnAxis(t *testing.T) {
	// Finite single-layer solenoid on its axis (Purcell, Electricity and
	// Magnetism, §6.5; Griffiths 4th ed. Problem 5.11):
	//	B = μ0 n I/2 · (cos θ₂ − cos θ₁),
	// the current-sheet closed form SolenoidAxisField. A winding of
	// N turns summed turn by turn approaches it as O((pitch/R)²) near the
	// axis and (pitch/R)² = 10⁻⁴ at worst near the ends; 1000 turns over
	// 0.2 m on R = 0.02 m leave under 10⁻⁵.
	c := Coil{Form: Solenoid, MeanDiameter: 0.04, Length: 0.2, Turns: 1000, Wire: Wire{Bare: 0.15e-3, Outer: 0.18e-3, Material: Copper()}}
	w := LayOut(c)
	src := NewCoilSource(c, w, 1.3)
	for _, z := range []float64{0, 0.03, 0.09, 0.1, 0.11, 0.15, 0.3} {
		sheet := SolenoidAxisField(0.02, 0.2, 1000, 1.3, z)
		checkRel(t, "turn sum vs sheet", CoilField(c, w, 1.3, Vec{0, 0, z})[2], sheet, 1e-5)
		checkRel(t, "quadrature vs sheet", src.At(Vec{0, 0, z})[2], sheet, 1e-5)
	}
	// The sheet form against a hand value: at the centre of a solenoid
	// with L = 2R·√3 the angles are ±60°, so B = μ0 n I · cos 60° · … :
	// B = μ0 n I · (L/2)/√((L/2)² + R²) = μ0 n I · √3/2.
	const R, N, I = 0.05, 400, 2.0
	L := 2 * R * math.Sqrt(3)
	checkRel(t, "sheet at 60°", SolenoidAxisField(R, L, N, I, 0), Mu0*N/L*I*math.Sqrt(3)/2, 1e-15)
}

func TestThickSolenoidCentre(t *testing.T) {
	// Centre field of a thick solenoid of uniform overall current density
	// (inner radius a₁, outer a₂, half-length b), from integrating the
	// finite solenoid's on-axis field over the radial build:
	//	B(0) = μ0 N I / (2 (a₂ − a₁)) · ln[(a₂ + √(a₂² + b²)) / (a₁ + √(a₁² + b²))]
	// (the field factor tabulated in Montgomery, Solenoid Magnet Design,
	// 1969, ch. 1 — reference recalled). A full 30 × 30-turn winding whose
	// turns sit on the midpoints of that cross-section differs by the
	// midpoint rule's O((d/size)²) error, here below 10⁻⁴.
	const d = 0.5e-3
	c := Coil{Form: Solenoid, InnerDiameter: 0.03, MeanDiameter: 0.03 + 30*d, RadialBuild: 30 * d, Length: 30 * d,
		Turns: 900, Wire: Wire{Bare: 0.45e-3, Outer: d, Material: Copper()}}
	w := LayOut(c)
	if w.LayerCount != 30 || w.TurnsPerLayer != 30 || w.Overfull {
		t.Fatalf("layout %d × %d %s", w.LayerCount, w.TurnsPerLayer, w.Problem)
	}
	a1, a2, b := 0.015, 0.015+30*d, 15*d
	const I = 0.4
	want := Mu0 * 900 * I / (2 * (a2 - a1)) * math.Log((a2+math.Hypot(a2, b))/(a1+math.Hypot(a1, b)))
	checkRel(t, "thick solenoid centre, turn sum", CoilField(c, w, I, Vec{})[2], want, 1e-4)
	checkRel(t, "thick solenoid centre, quadrature", NewCoilSource(c, w, I).At(Vec{})[2], want, 1e-4)
}
