package calc

import (
	"math"
	"math/cmplx"
	"testing"
)

// dowellByDiffusion is an independent computation of Dowell's factor: the
// one-dimensional diffusion equation d²H/dx² = (2j/δ²) H solved by finite
// differences across each of p foil layers of unit thickness, the field at
// the layer faces stepping by one ampere-turn per unit width per layer from
// zero at the innermost face (Ampère's law), and the loss ∫|dH/dx|² dx summed
// over the layers against its d.c. value p.
func dowellByDiffusion(delta float64, p, n int) float64 {
	dx := 1 / float64(n)
	k2 := complex(0, 2*delta*delta) // (2j/δ²) with δ = 1/Δ
	var loss float64
	for m := 1; m <= p; m++ {
		lo, hi := complex(float64(m-1), 0), complex(float64(m), 0)
		// Interior unknowns H_1 … H_{n−1}: H_{i−1} − (2 + k² dx²) H_i + H_{i+1} = 0.
		diag := -(2 + k2*complex(dx*dx, 0))
		nn := n - 1
		c := make([]complex128, nn)
		d := make([]complex128, nn)
		for i := range d {
			d[i] = 0
		}
		d[0] -= lo
		d[nn-1] -= hi
		// Thomas algorithm, off-diagonals 1.
		cp := make([]complex128, nn)
		dp := make([]complex128, nn)
		cp[0] = 1 / diag
		dp[0] = d[0] / diag
		for i := 1; i < nn; i++ {
			den := diag - cp[i-1]
			cp[i] = 1 / den
			dp[i] = (d[i] - dp[i-1]) / den
		}
		c[nn-1] = dp[nn-1]
		for i := nn - 2; i >= 0; i-- {
			c[i] = dp[i] - cp[i]*c[i+1]
		}
		h := append(append([]complex128{lo}, c...), hi)
		for i := 0; i < n; i++ {
			g := cmplx.Abs(h[i+1]-h[i]) / dx
			loss += g * g * dx
		}
	}
	return loss / float64(p)
}

func TestDowellAgainstDiffusion(t *testing.T) {
	for _, c := range []struct {
		delta float64
		p     int
	}{{0.5, 1}, {1, 1}, {1, 2}, {2, 5}, {1.32, 18}, {4, 3}} {
		want := dowellByDiffusion(c.delta, c.p, 4000)
		checkRel(t, "Dowell vs finite differences", DowellFactor(c.delta, float64(c.p)), want, 1e-5)
	}
}

func TestDowellLimits(t *testing.T) {
	if f := DowellFactor(0, 10); f != 1 {
		t.Errorf("d.c.: %g", f)
	}
	// The series and the closed form agree where they meet.
	for _, p := range []float64{1, 4, 18} {
		d := 0.0101
		checkRel(t, "series at the switch", DowellFactor(d, p), 1+(5*p*p-1)*math.Pow(d, 4)/45, 1e-9)
	}
	// Large Δ: ς1, ς2 → 1, F → Δ (1 + (2/3)(p² − 1)), no overflow.
	checkRel(t, "large Δ", DowellFactor(400, 3), 400*(1+2.0/3*8), 1e-12)
	if !math.IsNaN(DowellFactor(-1, 1)) || !math.IsNaN(DowellFactor(1, 0)) {
		t.Error("bad input must give NaN")
	}
}

func TestDowellEighteenLayers(t *testing.T) {
	// The regression case: 18 layers of AWG 24 (heavy build) at 50 kHz with
	// d/δ = 1.66 is R_ac/R_dc ≈ 98 (an independent scipy evaluation of
	// the same formula gave 98.40).
	cu := Copper()
	c := Coil{Form: Solenoid, MeanDiameter: 40e-3, Length: 30e-3, Wire: WireFromGauge(24, cu)}
	c.RadialBuild = 18 * c.Wire.Outer
	tpl := int(math.Floor(c.Length / c.Wire.Outer))
	c.Turns = 18 * tpl
	w := LayOut(c)
	if w.LayerCount != 18 || w.Overfull {
		t.Fatalf("%d layers, overfull %v: %s", w.LayerCount, w.Overfull, w.Problem)
	}
	// The temperature at which δ = d/1.66 at 50 kHz.
	f := 50e3
	delta := c.Wire.Bare / 1.66
	rho := math.Pi * f * Mu0 * delta * delta
	T := T20 + (rho/cu.Rho20-1)/cu.Alpha20
	a := ACResistance(c, w, 1, T, f)
	checkRel(t, "d/δ", c.Wire.Bare/a.SkinDepth, 1.66, 1e-9)
	checkRel(t, "R_ac/R_dc, 18 layers", a.Factor, 98.40, 2e-3)
	checkRel(t, "R_ac at R_dc = 1 Ω", a.Rac, a.Factor, 0)
	if d := ACResistance(c, w, 2, T, 0); d.Factor != 1 || d.Rac != 2 {
		t.Errorf("f = 0: %+v", d)
	}
}

func TestSelfResonanceFlags(t *testing.T) {
	if !AboveSelfResonance(1e9, 2e6) || AboveSelfResonance(1e5, 2e6) || AboveSelfResonance(1e9, math.NaN()) {
		t.Error("AboveSelfResonance")
	}
	if !NearSelfResonance(1e6, 2e6) || NearSelfResonance(5e5, 2e6) {
		t.Error("NearSelfResonance")
	}
}
