package calc

import (
	"math"
	"testing"
)

// MeanAtSurface's closed forms solve T − Ts = RiseMean·duty·P(T), P the
// power at the resistance the heat is taken at — for an a.c. drive
// R_ac = F·R(T). The residual of that defining equation, with PowerOn as
// the power, vanishes at the returned mean for d.c. and a.c. factors, for
// current and d.c. voltage drive. (An a.c. mean that took the d.c. power
// sat at F_R⁻¹ of its internal rise: 38.81 °C where 39.13 °C holds, for a
// 50 kHz three-layer winding of F_R = 1.91.)
func TestMeanAtSurfaceTakesTheACFactor(t *testing.T) {
	for _, drive := range []Drive{CurrentDrive, VoltageDrive} {
		for _, f := range []float64{0, 1, 1.913, 98} {
			tp := ThermalProblem{Drive: drive, Current: 0.5, Voltage: 3, R20: 1.6, Alpha20: 0.00393, Duty: 0.8, RiseMean: 1.2, ACFactor: f}
			Ts := CelsiusToKelvin(38.47)
			T, ok := tp.MeanAtSurface(Ts)
			if !ok {
				t.Fatalf("drive %v, F %g: no mean", drive, f)
			}
			res := T - Ts - tp.RiseMean*tp.Duty*tp.PowerOn(T)
			if math.Abs(res) > 1e-12*(T-Ts) || !(T > Ts) {
				t.Errorf("drive %v, F %g: mean %.6f K, residual %.3g K of a rise %.4g K", drive, f, T, res, T-Ts)
			}
		}
	}
}
