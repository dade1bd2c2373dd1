package analysis

import (
	"math"
	"os"
	"testing"

	"coilmemo/calc"
)

func runFigureDesign(t *testing.T, name string) *Study {
	t.Helper()
	f := "../testdata/figures/" + name + ".md"
	src, err := os.ReadFile(f)
	if err != nil {
		t.Fatal(err)
	}
	st, diags := Run(f, src, Options{})
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	return st
}

// A long single-layer solenoid's bore profile follows the on-axis field
// of a finite current sheet, B(z) = (μ0 n I / 2) [(z + L/2)/√((z + L/2)² +
// R²) − (z − L/2)/√((z − L/2)² + R²)] (Griffiths, Introduction to
// Electrodynamics, 4th ed., Problem 5.11), to the sheet's discreteness;
// its flat region ends where that field departs by 1 % from the centre
// value, and the end ratio is the sheet's (about ½ for a long coil).
func TestBoreProfileSolenoid(t *testing.T) {
	st := runFigureDesign(t, "long-solenoid")
	co, cr := st.Spec.Design.Coils[0], st.Results.Coils[0]
	bp := st.Coils[0].Axis.Bore
	if bp == nil {
		t.Fatal("no bore profile for an air-core solenoid")
	}
	L := bp.Ends[1] - bp.Ends[0]
	R := co.MeanDiameter / 2
	n := float64(co.Turns) / L
	sheet := func(z float64) float64 {
		a, b := z+L/2, z-L/2
		return calc.Mu0 * n * cr.Current / 2 * (a/math.Hypot(a, R) - b/math.Hypot(b, R))
	}
	for i, z := range bp.Z {
		if e := math.Abs(bp.Bz[i]/sheet(z) - 1); e > 2e-3 {
			t.Fatalf("Bz(%g m) = %g T, sheet %g T (%.2g off)", z, bp.Bz[i], sheet(z), e)
		}
	}
	if e := math.Abs(bp.Centre/sheet(0) - 1); e > 1e-3 {
		t.Errorf("centre %g T, sheet %g T", bp.Centre, sheet(0))
	}
	if d := math.Abs(sheet(bp.Flat)/sheet(0) - 1); d < 0.009 || d > 0.011 {
		t.Errorf("flat to ±%g m, where the sheet departs by %.4f (want 0.01)", bp.Flat, d)
	}
	if e := math.Abs(bp.EndRatio - sheet(L/2)/sheet(0)); e > 2e-3 {
		t.Errorf("end ratio %g, sheet %g", bp.EndRatio, sheet(L/2)/sheet(0))
	}
	if lo, hi := bp.Z[0], bp.Z[len(bp.Z)-1]; math.Abs(hi-1.5*L) > 1e-12 || lo != -hi {
		t.Errorf("profile over %g … %g m, want ±1.5 L = ±%g m", lo, hi, 1.5*L)
	}
}

// An opposing pair's gradient profile: at the centre it is the pair's
// gradient, and everywhere it is the slope of its own Bz profile (a
// central difference over the profile's steps, a step size 10⁴ times
// the one the gradient was taken with).
func TestBoreProfileGradientPair(t *testing.T) {
	st := runFigureDesign(t, "gradient-pair")
	bp := st.Coils[0].Axis.Bore
	if bp == nil || len(bp.Gz) != len(bp.Z) || len(bp.Ends) != 4 {
		t.Fatal("no gradient profile for an opposing pair")
	}
	G := st.Results.Coils[0].Pair.Gradient
	mid := len(bp.Z) / 2
	if bp.Z[mid] != 0 || math.Abs(bp.Gz[mid]/G-1) > 1e-6 {
		t.Errorf("gradient at the centre %g T/m, pair's %g T/m", bp.Gz[mid], G)
	}
	for i := 1; i+1 < len(bp.Z); i++ {
		slope := (bp.Bz[i+1] - bp.Bz[i-1]) / (bp.Z[i+1] - bp.Z[i-1])
		if math.Abs(slope-bp.Gz[i]) > 2e-3*math.Abs(G) {
			t.Fatalf("at %g m: Gz %g T/m, slope of Bz %g T/m", bp.Z[i], bp.Gz[i], slope)
		}
	}
	if !math.IsNaN(bp.Flat) || !math.IsNaN(bp.EndRatio) || math.Abs(bp.Centre) > 1e-12 {
		t.Errorf("opposing pair: centre %g T, flat %g, end ratio %g; want 0, NaN, NaN", bp.Centre, bp.Flat, bp.EndRatio)
	}
	if st.Coils[0].Axis.Bore.PeakZ <= 0 {
		t.Error("no peak found")
	}
}

// A thin loop's near profile falls to half its centre value where
// (R² + z²)^{3/2} = 2 R³ (B(z) = μ0 N I R² / (2 (R² + z²)^{3/2}), Jackson,
// Classical Electrodynamics, 3rd ed., §5.5): at z = R √(2^{2/3} − 1) ≈
// 0.766 R, to the bundle's finite size; a loop has no ends.
func TestBoreProfileLoop(t *testing.T) {
	st := runFigureDesign(t, "thin-loop")
	co := st.Spec.Design.Coils[0]
	bp := st.Coils[0].Axis.Bore
	if bp == nil || len(bp.Ends) != 0 || !math.IsNaN(bp.EndRatio) {
		t.Fatalf("loop profile %+v", bp)
	}
	R := co.MeanDiameter / 2
	want := R * math.Sqrt(math.Pow(2, 2.0/3)-1)
	if math.Abs(bp.Half/want-1) > 1e-3 {
		t.Errorf("half-field distance %g m, thin loop %g m", bp.Half, want)
	}
	if centre := calc.Mu0 * float64(co.Turns) * st.Results.Coils[0].Current / (2 * R); math.Abs(bp.Centre/centre-1) > 1e-3 {
		t.Errorf("centre %g T, μ0 N I / 2R = %g T", bp.Centre, centre)
	}
	if hi := bp.Z[len(bp.Z)-1]; math.Abs(hi-3*AxialSize(co)) > 1e-12 {
		t.Errorf("profile to %g m, want 3 sizes %g m", hi, 3*AxialSize(co))
	}
}
