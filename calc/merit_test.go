package calc

import (
	"math"
	"testing"
)

// The merit m²/(P·M) of a thin loop of radius r is r²/(4 ρ ρm) whatever
// its turns, wire and drive: the moment, power and mass come from the
// whole evaluation (layout, heat balance, operating point), the value
// from the closed form with IEC 60028 copper (ρ20 = 1/58 Ω·mm²/m, α20 =
// 0.00393 /K, 8890 kg/m³) at the winding's mean temperature.
func TestMomentMeritIndependentOfTurnsAndGauge(t *testing.T) {
	const r = 0.04
	cu := Copper()
	for _, g := range []int{24, 30, 36} {
		for _, n := range []int{20, 150, 600} {
			for _, drive := range []Drive{CurrentDrive, VoltageDrive} {
				c := Coil{Name: "m", Form: Loop, MeanDiameter: 2 * r, Turns: n, Wire: WireFromGauge(g, cu), Duty: 1, InsulationClass: 500}
				c.Wire.Outer = HeavyBuildOuter(c.Wire.Bare)
				if drive == VoltageDrive {
					c.Drive, c.Voltage = VoltageDrive, 2
				} else {
					c.Current = 0.05
				}
				d := Design{Coils: []Coil{c}, Conditions: Conditions{Ambient: T20, Cooling: Cooling{H: 10, HGiven: true}}}
				res := Evaluate(d)
				cr := res.Coils[0]
				if cr.Runaway {
					continue
				}
				m := cr.Moment.Norm()
				got := m * m / (cr.PowerOn * cr.Mass)
				op := OperatingPoint(c, cr.Winding, d.Conditions)
				rho := cu.Rho20 * ResistanceFactor(cu.Alpha20, op.State.Mean)
				want := r * r / (4 * rho * cu.Density)
				checkRel(t, "m²/(P·M) from the evaluation", got, want, 1e-12)
				checkRel(t, "MomentMerit", MomentMerit(cr.Winding.AreaSum, cr.Winding.WireLength, rho, cu.Density), want, 1e-12)
			}
		}
	}
}

// For a multilayer winding the merit is (ΣA/Σℓ)²/(ρ ρm): for turns at
// radii r_k it lies between the innermost and outermost r²/(4ρρm), and
// grows with the bore.
func TestMomentMeritMultilayer(t *testing.T) {
	cu := Copper()
	c := Coil{Name: "m", Form: Solenoid, MeanDiameter: 0.05, Length: 0.01, RadialBuild: 0.006, Turns: 400, Wire: WireFromGauge(30, cu)}
	c.Wire.Outer = HeavyBuildOuter(c.Wire.Bare)
	w := LayOut(c)
	got := MomentMerit(w.AreaSum, w.WireLength, cu.Rho20, cu.Density)
	in, out := w.Layers[0].Radius, w.Layers[len(w.Layers)-1].Radius
	lo, hi := in*in/(4*cu.Rho20*cu.Density), out*out/(4*cu.Rho20*cu.Density)
	if !(got > lo && got < hi) || math.IsNaN(got) {
		t.Errorf("merit %g outside the innermost and outermost turns' %g … %g", got, lo, hi)
	}
}
