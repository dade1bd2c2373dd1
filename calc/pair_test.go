package calc

import (
	"math"
	"testing"
)

func TestGradientPair(t *testing.T) {
	// Two thin coils of radius R at ±s/2 with opposed currents. On the
	// axis each contributes the derivative of the loop's on-axis field,
	// ∂Bz/∂z = −3 μ0 N I R² ζ / (2 (R² + ζ²)^{5/2}) (Jackson, Classical
	// Electrodynamics, 3rd ed., §5.5), so the centre gradient and the local
	// gradient along the axis follow in closed form. The extent of the
	// ±1 % region is checked against a bisection on that closed form.
	const R, N, I = 0.05, 50, 2.0
	onAxis := func(s, z float64) float64 {
		d := func(zeta float64) float64 {
			return -3 * Mu0 * N * I * R * R * zeta / (2 * math.Pow(R*R+zeta*zeta, 2.5))
		}
		return d(z+s/2) - d(z-s/2)
	}
	for _, s := range []float64{R, math.Sqrt(3) * R, 1.74 * R, 2 * R} {
		c := Coil{Form: Pair, MeanDiameter: 2 * R, Spacing: s, Turns: N, Opposing: true, Wire: WireFromGauge(22, Copper())}
		w := LayOut(c)
		p := AnalysePair(c, w, I)
		G := onAxis(s, 0)
		checkRel(t, "centre gradient", p.Gradient, G, 1e-13)
		lo, hi := 0.0, R
		if math.Abs(onAxis(s, hi)/G-1) <= 0.01 {
			t.Fatalf("s = %g R: gradient within 1 %% out to R", s/R)
		}
		for range 60 {
			mid := (lo + hi) / 2
			if math.Abs(onAxis(s, mid)/G-1) <= 0.01 {
				lo = mid
			} else {
				hi = mid
			}
		}
		// The stepped search finds the first crossing; the bisection here
		// the same one as long as the deviation grows monotonically, which
		// it does for these spacings.
		checkRel(t, "linear region along the axis", p.LinearAxial, lo, 1e-9)
		if p.Maxwell != (s == math.Sqrt(3)*R || s == 1.74*R) {
			t.Errorf("s = %g R: Maxwell spacing flag %v", s/R, p.Maxwell)
		}
		if !(p.LinearRadial > 0) || p.Helmholtz || !math.IsNaN(p.Axial1) {
			t.Errorf("s = %g R: %+v", s/R, p)
		}
		// Inside the region the field is G·z on the axis to about 1 %.
		z := 0.5 * p.LinearAxial
		B := CoilField(c, w, I, Vec{0, 0, z})[2]
		if math.Abs(B/(G*z)-1) > 0.01 {
			t.Errorf("s = %g R: B(z)/(Gz) = %g", s/R, B/(G*z))
		}
	}
	// At Maxwell's spacing √3 R the cubic term of the axial field vanishes
	// (the third derivative of two opposed on-axis loop fields cancels at
	// s = √3 R), so the ±1 % region is much larger than at s = R.
	lin := func(s float64) float64 {
		c := Coil{Form: Pair, MeanDiameter: 2 * R, Spacing: s, Turns: N, Opposing: true, Wire: WireFromGauge(22, Copper())}
		return AnalysePair(c, LayOut(c), I).LinearAxial
	}
	if !(lin(math.Sqrt(3)*R) > 1.5*lin(R)) {
		t.Errorf("linear region at √3 R (%g) not much larger than at R (%g)", lin(math.Sqrt(3)*R), lin(R))
	}
}

func TestPairRegionNotAPair(t *testing.T) {
	c := Coil{Form: Loop, MeanDiameter: 0.1, Turns: 10, Wire: WireFromGauge(22, Copper())}
	p := AnalysePair(c, LayOut(c), 1)
	if !math.IsNaN(p.SpacingRatio) || !math.IsNaN(p.Gradient) || !math.IsNaN(p.Axial1) || p.Helmholtz {
		t.Errorf("%+v", p)
	}
}

// Two thin coaxial loops of radius R at spacing s: on the axis the second
// derivative of their field at the centre is proportional to s² − R²
// (the Helmholtz condition s = R cancels it; Maxwell, A Treatise on
// Electricity and Magnetism, 3rd ed., 1891, §715 — recalled from memory).
// Wider than R the field dips at the centre, narrower it peaks; the
// spacing ratio is judged against the turns' mean radius as laid.
func TestPairDipFollowsTheSpacing(t *testing.T) {
	for _, tc := range []struct {
		ratio float64
		dip   bool
	}{{1.2, true}, {1.05, true}, {0.95, false}, {0.8, false}} {
		c := Coil{Form: Pair, MeanDiameter: 0.2, Turns: 1, Wire: WireFromGauge(30, Copper()), Drive: CurrentDrive, Current: 1, Spacing: tc.ratio * 0.1, Axis: Vec{0, 0, 1}}
		w := LayOut(c)
		p := AnalysePair(c, w, 1)
		if p.Dip != tc.dip {
			t.Errorf("s/R = %g: dip %v, want %v", tc.ratio, p.Dip, tc.dip)
		}
		if math.Abs(p.SpacingRatio/tc.ratio-1) > 1e-9 || math.Abs(p.Radius-0.1) > 1e-12 {
			t.Errorf("s/R = %g: ratio %g against radius %g", tc.ratio, p.SpacingRatio, p.Radius)
		}
	}
	// 50 turns of AWG 22 (about 0.700 mm over the enamel) in a 10 mm long
	// section from a 195 mm bore: 14 turns a layer, layers at 97.85,
	// 98.55, 99.25 and 99.95 mm (8 turns), mean 98.77 mm by hand, short of
	// the stated 100 mm mean radius of a 5 mm build.
	c := Coil{Form: Pair, MeanDiameter: 0.2, RadialBuild: 0.005, Length: 0.01, Turns: 50, Wire: WireFromGauge(22, Copper()), Drive: CurrentDrive, Current: 1, Spacing: 0.1, Axis: Vec{0, 0, 1}}
	p := AnalysePair(c, LayOut(c), 1)
	if math.Abs(p.Radius/0.098774-1) > 1e-3 || math.Abs(p.SpacingRatio-0.1/p.Radius) > 1e-12 {
		t.Errorf("underfilled pair: radius %g m, ratio %g; want 98.77 mm and 1.0124", p.Radius, p.SpacingRatio)
	}
}
