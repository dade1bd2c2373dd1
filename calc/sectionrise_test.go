package calc

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
)

// TestSectionRiseLongLimit: a section many depths long is cooled through
// its outer cylinder alone except near its ends, so SectionRise tends to
// the radial closed form AnnulusRise (Incropera & DeWitt, 6th ed., §3.5):
// the hot spot, in the mid-plane, as soon as the ends are a few depths
// away (to 10⁻¹⁰ at 40 depths), the mean (to 10⁻⁴ at 10⁵ depths) as the ends' share 2E/ℓ dies away. The series summed
// directly at 40 depths and the long-winding form beyond
// SectionLongRatio depths give the same end deficit E.
func TestSectionRiseLongLimit(t *testing.T) {
	const k = 0.3
	for _, c := range [][2]float64{{0.01, 0.016}, {0, 0.004}, {0.02, 0.0287}, {0.02, 0.0202}} {
		ri, ro := c[0], c[1]
		d := ro - ri
		_, hot := SectionRise(ri, ro, 40*d, k)
		_, ahot := AnnulusRise(ri, ro, 40*d, k)
		checkRel(t, "hot spot, 40 depths long", hot, ahot, 1e-10)
		for _, n := range []float64{1e5, 1e6} {
			mean, hot := SectionRise(ri, ro, n*d, k)
			amean, ahot := AnnulusRise(ri, ro, n*d, k)
			checkRel(t, "hot spot, long", hot, ahot, 1e-4)
			checkRel(t, "mean, long", mean, amean, 1e-4)
		}
		// The end deficit per unit length: (mean_annulus − mean)·ℓ, in
		// k/q units (the rise per watt times k π (ro² − ri²) ℓ).
		deficit := func(n float64) float64 {
			l := n * d
			m, _ := SectionRise(ri, ro, l, k)
			a, _ := AnnulusRise(ri, ro, l, k)
			return (a - m) * k * math.Pi * (ro*ro - ri*ri) * l * l
		}
		checkRel(t, "end deficit, 40 and 1000 depths", deficit(1000), deficit(40), 1e-8)
		if e := deficit(40); !(e > 0) {
			t.Errorf("%v: end faces should lower the mean: deficit %g", c, e)
		}
	}
}

// TestSectionRiseAgainstFiniteVolumes: the series against two independent
// numerical solutions of the same problem — calc's finite volumes
// (SectionConduction, no Bessel function) and a vertex-centred finite
// difference scheme solved by successive over-relaxation here — over
// sections from a twentieth to twenty depths long, among them a gradient
// pair's 10 mm long, 8.7 mm deep coil.
func TestSectionRiseAgainstFiniteVolumes(t *testing.T) {
	const k = 0.3
	for _, c := range [][3]float64{{0.0413, 0.05, 0.010}, {0.005, 0.0137, 0.010}, {0.01, 0.016, 0.0003}, {0.01, 0.016, 0.002}, {0.01, 0.016, 0.018}, {0.01, 0.016, 0.12}, {0, 0.004, 0.008}} {
		ri, ro, l := c[0], c[1], c[2]
		mean, hot := SectionRise(ri, ro, l, k)
		fm, fh := SectionConduction(ri, ro, l, k, 100)
		checkRel(t, "mean against finite volumes", mean, fm, 1e-6)
		checkRel(t, "hot spot against finite volumes", hot, fh, 1e-6)
		if ratio := (ro - ri) / l; ratio < 10 && ratio > 0.1 {
			sm, sh := sorSection(ri, ro, l, 24)
			sm2, sh2 := sorSection(ri, ro, l, 48)
			q := 1 / (math.Pi * (ro*ro - ri*ri) * l * k)
			checkRel(t, "mean against finite differences", mean, q*(4*sm2-sm)/3, 1e-4)
			checkRel(t, "hot spot against finite differences", hot, q*(4*sh2-sh)/3, 1e-4)
		}
		am, ah := AnnulusRise(ri, ro, l, k)
		if !(mean < am && hot <= ah*(1+1e-12)) {
			t.Errorf("%v: cooled ends should not raise the rise: mean %g (radial %g), hot %g (radial %g)", c, mean, am, hot, ah)
		}
	}
}

// sorSection solves the section's conduction (q/k = 1) on the nodes of an
// n × n grid over the half section, nodes on the bore, the held faces and
// the mid-plane, each node's balance over its own control volume (half
// and quarter volumes at the edges), by successive over-relaxation to
// 10⁻¹³ of the hottest node; it returns the volume-weighted mean and the
// value at the node on the bore in the mid-plane, m².
func sorSection(ri, ro, l float64, n int) (mean, hot float64) {
	dr, dz := (ro-ri)/float64(n), l/2/float64(n)
	T := make([][]float64, n+1) // T[i][j], i radial, j axial; i = n or j = n held at 0
	for i := range T {
		T[i] = make([]float64, n+1)
	}
	r := func(i float64) float64 { return ri + i*dr }
	omega := 2 / (1 + math.Sin(math.Pi/float64(n)))
	for sweep := 0; sweep < 100000; sweep++ {
		change := 0.0
		for i := 0; i < n; i++ {
			rin, rout := math.Max(r(float64(i)-0.5), ri), r(float64(i)+0.5)
			for j := 0; j < n; j++ {
				zl := math.Max(float64(j)-0.5, 0) * dz
				zh := (float64(j) + 0.5) * dz
				area := (rout*rout - rin*rin) / 2 // ∫ r dr over the control volume
				h := zh - zl
				a, b := 0.0, area*h // Σ coefficients, generation
				add := func(coef, tn float64) { a += coef; b += coef * tn }
				add(rout*h/dr, T[i+1][j])
				if i > 0 {
					add(rin*h/dr, T[i-1][j])
				}
				add(area/dz, T[i][j+1])
				if j > 0 {
					add(area/dz, T[i][j-1])
				}
				next := T[i][j] + omega*(b/a-T[i][j])
				change = math.Max(change, math.Abs(next-T[i][j]))
				T[i][j] = next
			}
		}
		if change <= 1e-13*T[0][0] {
			break
		}
	}
	vs, vol := 0.0, 0.0
	for i := 0; i <= n; i++ {
		rin, rout := math.Max(r(float64(i)-0.5), ri), math.Min(r(float64(i)+0.5), ro)
		for j := 0; j <= n; j++ {
			h := (math.Min(float64(j)+0.5, float64(n)) - math.Max(float64(j)-0.5, 0)) * dz
			v := (rout*rout - rin*rin) / 2 * h
			vs += v * T[i][j]
			vol += v
		}
	}
	return vs / vol, T[0][0]
}

// TestSectionRiseEnergyBalance: the series field θ(r, z) (sectionRiseAt)
// is a solution of the problem — the heat conducted out through a closed
// surface (the bore, a cylinder and two end planes just inside the cooled
// faces, and a smaller box inside) equals the heat generated within it
// (Gauss's theorem on k∇²θ = −q; surface integrals by Gauss–Legendre
// quadrature, gonum, of −k∇θ taken by central differences); no flux
// crosses the bore, and θ vanishes on the cooled faces. Its volume mean by
// quadrature is SectionRise's mean and its value on the bore in the
// mid-plane SectionRise's hottest rise, above every point sampled.
func TestSectionRiseEnergyBalance(t *testing.T) {
	const k = 0.3
	for _, c := range [][3]float64{{0.0413, 0.05, 0.010}, {0.01, 0.016, 0.004}, {0, 0.004, 0.012}} {
		ri, ro, l := c[0], c[1], c[2]
		d := ro - ri
		V := math.Pi * (ro*ro - ri*ri) * l
		theta := func(r, z float64) float64 { return sectionRiseAt(ri, ro, l, k, r, z) }
		h := 1e-6 * math.Min(d, l)
		dTdr := func(r, z float64) float64 { return (theta(r+h, z) - theta(r-h, z)) / (2 * h) }
		dTdz := func(r, z float64) float64 { return (theta(r, z+h) - theta(r, z-h)) / (2 * h) }
		for _, f := range []float64{0.97, 0.6} {
			r1, z1 := ri+f*d, f*l/2
			gen := math.Pi * (r1*r1 - ri*ri) * 2 * z1 / V // W of the 1 W generated
			side := 2 * quad.Fixed(func(z float64) float64 { return -k * dTdr(r1, z) * 2 * math.Pi * r1 }, 0, z1, 40, quad.Legendre{}, 0)
			ends := 2 * quad.Fixed(func(r float64) float64 { return -k * dTdz(r, z1) * 2 * math.Pi * r }, ri, r1, 40, quad.Legendre{}, 0)
			checkRel(t, "heat out of the closed surface", side+ends, gen, 1e-6)
		}
		if ri > 0 {
			for _, z := range []float64{0, 0.2 * l, 0.45 * l} {
				g := math.Abs(theta(ri+h, z)-theta(ri, z)) / h // one-sided, at the bore
				if scale := theta(ri, 0) / d; !(g < 1e-4*scale) {
					t.Errorf("%v: gradient %g K/(W·m) at the bore, z = %g (scale %g)", c, g, z, scale)
				}
			}
		}
		hot := theta(ri, 0)
		for _, p := range [][2]float64{{ro, 0}, {ro, 0.3 * l}, {ri, l / 2}, {(ri + ro) / 2, l / 2}} {
			if v := theta(p[0], p[1]); !(math.Abs(v) < 1e-8*hot) {
				t.Errorf("%v: θ(%g, %g) = %g on a cooled face (hot spot %g)", c, p[0], p[1], v, hot)
			}
		}
		mean, max := SectionRise(ri, ro, l, k)
		qm := quad.Fixed(func(r float64) float64 {
			return 2 * math.Pi * r * 2 * quad.Fixed(func(z float64) float64 { return theta(r, z) }, 0, l/2, 30, quad.Legendre{}, 0)
		}, ri, ro, 30, quad.Legendre{}, 0) / V
		checkRel(t, "mean by quadrature of the field", qm, mean, 1e-7)
		checkRel(t, "hot spot: field on the bore in the mid-plane", hot, max, 1e-9)
		for i := 0; i <= 10; i++ {
			for j := 0; j <= 10; j++ {
				if v := theta(ri+d*float64(i)/10, l/2*float64(j)/10); v > hot {
					t.Errorf("%v: θ = %g at sample (%d, %d) above the hot spot %g", c, v, i, j, hot)
				}
			}
		}
	}
}

// TestSectionRisePlaneLimit: far from the axis the section is a plane
// rectangle ℓ × d with one face adiabatic — half of a 2d × ℓ rectangle
// cooled all round, whose mean is that of Prandtl's torsion function:
// θ̄ = (q/2k) J/(2A), J = k₁ a b³ the torsion constant of the a × b
// rectangle (a ≥ b), k₁ = 0.141 (a = b), 0.196 (a = 1.5 b), 0.229
// (a = 2b), 0.263 (a = 3b) (Timoshenko & Goodier, Theory of Elasticity,
// 3rd ed., 1970, §109, table of torsion coefficients; recalled from
// memory, three figures).
func TestSectionRisePlaneLimit(t *testing.T) {
	const k, d = 0.3, 0.01
	const ri = 1e4 * d
	for _, c := range []struct{ l, k1 float64 }{{2 * d, 0.141}, {3 * d, 0.196}, {4 * d, 0.229}, {d, 0.229}, {6 * d, 0.263}} {
		mean, _ := SectionRise(ri, ri+d, c.l, k)
		q := 1 / (math.Pi * ((ri+d)*(ri+d) - ri*ri) * c.l)
		a, b := math.Max(2*d, c.l), math.Min(2*d, c.l)
		want := q / (2 * k) * c.k1 * a * b * b * b / (2 * a * b)
		checkRel(t, "plane-limit mean against the torsion constant", mean, want, 0.004) // k₁ to three figures: ±0.36 % at 0.141
	}
}

func TestSectionRiseBadData(t *testing.T) {
	for _, c := range [][4]float64{{0.01, 0.005, 0.01, 0.3}, {-1, 0.01, 0.01, 0.3}, {0, 0.01, 0, 0.3}, {0, 0.01, 0.01, 0}, {math.NaN(), 0.01, 0.01, 0.3}, {0, math.Inf(1), 0.01, 0.3}} {
		if m, x := SectionRise(c[0], c[1], c[2], c[3]); !math.IsNaN(m) || !math.IsNaN(x) {
			t.Errorf("%v: %g %g, want NaN", c, m, x)
		}
		if m, x := SectionConduction(c[0], c[1], c[2], c[3], 20); !math.IsNaN(m) || !math.IsNaN(x) {
			t.Errorf("finite volumes %v: %g %g, want NaN", c, m, x)
		}
	}
}
