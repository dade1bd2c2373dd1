package calc

import (
	"math"
	"testing"
)

func TestSwitching(t *testing.T) {
	// L = 20 mH, R = 8 Ω, 1.5 A from 12 V, opened in 10 µs, a 40 V driver.
	s := Switching(20e-3, 8, 1.5, 12, 10e-6, 40, true)
	checkRel(t, "τ", s.TimeConstant, 2.5e-3, 1e-15)
	// i(t₉₀)/I = 1 − e^(−ln 10) = 0.9 exactly.
	checkRel(t, "90 % at t₉₀", 1-math.Exp(-s.RiseTime/s.TimeConstant), 0.9, 1e-15)
	checkRel(t, "energy", s.Energy, 0.5*20e-3*1.5*1.5, 1e-15)
	checkRel(t, "unsuppressed spike", s.Spike, 20e-3*1.5/10e-6+12, 1e-15)
	// The largest resistor holds the switch at the rating: supply +
	// I R_max = 40 V; the E12 resistor fitted at or below it, 18 Ω of
	// 18.7 Ω (IEC 60063:2015, Table 1, E12 column; recalled from memory),
	// holds it at 12 V + 1.5 A · 18 Ω = 39 V, 1 V within the rating.
	checkRel(t, "clamped switch voltage at R_max", s.Supply+1.5*s.ResistorMax, 40, 1e-15)
	checkRel(t, "E12 resistor", s.Resistor, 18, 0)
	checkRel(t, "switch voltage with the E12 resistor", s.SwitchVoltage, 39, 1e-15)
	checkRel(t, "margin to the rating", s.RatingMargin, 1, 1e-13)
	if !s.ClampFromRating {
		t.Error("the rating was given")
	}
	checkRel(t, "R–D decay", s.ResistorDecay, 20e-3/(8+s.Resistor), 1e-15)
	if !(s.ResistorTime10 < s.DiodeTime10) {
		t.Error("a resistor in the freewheel path must speed the decay")
	}
	// The decay i = I e^(−t/τ) reaches 10 % at τ ln 10.
	checkRel(t, "10 % after t₁₀", math.Exp(-s.ResistorTime10/s.ResistorDecay), 0.1, 1e-14)
	// Energy shares: resistor + coil = ½ L I².
	checkRel(t, "energy in R_s", s.ResistorEnergy+s.Energy*8/(8+s.Resistor), s.Energy, 1e-15)
	// No rating: twice the supply; no switch-off time: no spike.
	s = Switching(20e-3, 8, 1.5, 12, 0, 0, true)
	checkRel(t, "default clamp", s.Clamp, 24, 0)
	if !math.IsNaN(s.Spike) || s.ClampFromRating {
		t.Errorf("spike %g without a switch-off time", s.Spike)
	}
	// A rating below the supply leaves no room for a resistor.
	if s = Switching(20e-3, 8, 1.5, 12, 0, 10, true); !math.IsNaN(s.Resistor) {
		t.Errorf("rating under the supply: R_s = %g", s.Resistor)
	}
	// A current source of unstated compliance and no rating: no clamp.
	if s = Switching(20e-3, 8, 1.5, 12, 0, 0, false); !math.IsNaN(s.Clamp) || !math.IsNaN(s.Resistor) {
		t.Errorf("current drive, no rating: clamp %g, R_s %g", s.Clamp, s.Resistor)
	}
}

func TestSkinDepth(t *testing.T) {
	// Copper at 20 °C (ρ = 1/58 µΩ·m, IEC 60028) at 60 Hz: δ ≈ 8.5 mm, and
	// δ ∝ 1/√f (66 µm at 1 MHz; both widely tabulated, recalled).
	rho := Copper().Rho20
	checkRel(t, "60 Hz", SkinDepth(rho, 60), 8.5e-3, 5e-3)
	checkRel(t, "1 MHz", SkinDepth(rho, 1e6), 66e-6, 1e-2)
	checkRel(t, "scaling", SkinDepth(rho, 400)/SkinDepth(rho, 100), 0.5, 1e-15)
	if !math.IsNaN(SkinDepth(rho, 0)) {
		t.Error("no frequency: NaN")
	}
	// A.c. figures of a coil at 1 kHz.
	c := Coil{Drive: VoltageDrive, Voltage: 10, Wire: WireFromGauge(20, Copper())}
	a := AC(c, 10e-3, 5, T20, 1000)
	checkRel(t, "X", a.Reactance, 2*math.Pi*1000*10e-3, 1e-15)
	checkRel(t, "|Z|", a.Impedance, math.Hypot(5, a.Reactance), 1e-15)
	checkRel(t, "I = V/|Z|", a.Current, 10/a.Impedance, 1e-15)
	if !a.Reactive || a.SkinLimited {
		t.Errorf("1 kHz on AWG 20: reactive %v, skin-limited %v (δ = %g m, r = %g m)", a.Reactive, a.SkinLimited, a.SkinDepth, a.WireRadius)
	}
	if a = AC(c, 10e-3, 5, T20, 100e3); !a.SkinLimited {
		t.Errorf("100 kHz on AWG 20: δ = %g m, r = %g m", a.SkinDepth, a.WireRadius)
	}
}

func TestValveSwitchingAtColdCurrent(t *testing.T) {
	// Issue regression (examples/valve-actuator.md): the suppression
	// resistor was sized at the hot current (348 mA), so switching off the
	// cold switch-on current, 24 V / R20 = 446 mA, put 24 V + 0.446 A ×
	// 103 Ω = 70.1 V on the 60 V MOSFET. Sized at the cold current, the
	// switch sees its rating and no more.
	c, cond := valveCoil()
	cr := Evaluate(Design{Coils: []Coil{c}, Conditions: cond}).Coils[0]
	s := cr.Switch
	// R20 = ρ20 ℓ / A with IEC 60028's ρ20 = 1/58 Ω·mm²/m.
	r20 := (1.0 / 58 * 1e-6) * cr.Length / (math.Pi * c.Wire.Bare * c.Wire.Bare / 4)
	checkRel(t, "switch-on current = V/R20 (ambient 40 °C above 20 °C)", s.WorstCurrent, 24/r20, 1e-12)
	checkRel(t, "switch-on current, issue figure 446 mA", s.WorstCurrent, 0.446, 2e-3)
	if !(s.SwitchVoltage <= 60) || !s.WithinRating || !(s.RatingMargin >= 0) {
		t.Errorf("switch voltage %g V at %g A, rating 60 V (within %v)", s.SwitchVoltage, s.WorstCurrent, s.WithinRating)
	}
	checkRel(t, "R_max = (60 − 24) V / I_cold", s.ResistorMax, 36/s.WorstCurrent, 1e-12)
	// 80.8 Ω at most: the E12 value at or below it is 68 Ω (IEC 60063:2015,
	// Table 1, E12 column; recalled from memory), and the switch then sees
	// 24 V + 0.4457 A · 68 Ω = 54.3 V, 5.7 V within the rating.
	checkRel(t, "E12 resistor", s.Resistor, 68, 0)
	checkRel(t, "switch voltage with 68 Ω", s.SwitchVoltage, 24+s.WorstCurrent*68, 1e-15)
	checkRel(t, "switch voltage, 54.3 V", s.SwitchVoltage, 54.3, 1e-3)
	checkRel(t, "margin, 5.7 V", s.RatingMargin, 5.7, 1e-2)
	checkRel(t, "decay with 68 Ω", s.ResistorDecay, cr.Inductance/(cr.RHot+68), 1e-15)
	checkRel(t, "energy in 68 Ω", s.ResistorEnergy, s.Energy*68/(cr.RHot+68), 1e-15)
	// The old sizing, at the hot current, would have exceeded the rating.
	hotSized := 24 + s.WorstCurrent*36/cr.Current
	if !(hotSized > 60) {
		t.Errorf("hot-sized resistor at cold current: %g V, want above 60 V", hotSized)
	}
	// (The 70.1 V came from a hot current of 348 mA under the
	// earlier radial-only conduction rise; with the winding's end faces
	// cooled too the winding runs cooler, its hot current is a little
	// larger and the figure a little lower, still above the rating.)
	// Unsuppressed at the cold current: L I_cold / t_off + V.
	checkRel(t, "spike at the worst current", s.SpikeWorst, cr.Inductance*s.WorstCurrent/10e-6+24, 1e-12)
	// A lower rating than the clamp can give: the rating is reported broken.
	w := SwitchingWorst(0.05, 69, 53.8, 0.348, 0.446, 24, 10e-6, 20, true)
	if w.WithinRating || !math.IsNaN(w.Resistor) || w.SwitchVoltage != 24 || w.RatingMargin != -4 {
		t.Errorf("rating below the supply: %+v", w)
	}
	// Current drive: the imposed current is the worst.
	i := SwitchingWorst(0.01, 10, 10, 0.5, 0.5, 5, 1e-5, 30, false)
	checkRel(t, "current drive R_max", i.ResistorMax, 25/0.5, 1e-15)
	checkRel(t, "current drive E12 resistor, 47 Ω of 50 Ω", i.Resistor, 47, 0)
	checkRel(t, "current drive switch voltage", i.SwitchVoltage, 5+0.5*47, 1e-15)
}

// A resistor fitted below the one a switching sizes for itself (one sized
// for several operating points) changes the resistor's figures and the
// switch voltage, V_s + I_w R_s, and keeps the largest resistor; no
// resistor leaves a bare freewheeling diode, the switch at the supply.
func TestWithResistor(t *testing.T) {
	L, R, Rw := 0.05, 69.0, 53.8
	s := SwitchingWorst(L, R, Rw, 0.348, 0.446, 24, 10e-6, 60, true)
	if again := s.WithResistor(L, R, s.Resistor); again != s {
		t.Errorf("refitting the sized resistor: %+v, want %+v", again, s)
	}
	f := s.WithResistor(L, R, 47)
	checkRel(t, "R_max kept", f.ResistorMax, s.ResistorMax, 0)
	checkRel(t, "switch voltage with 47 Ω", f.SwitchVoltage, 24+0.446*47, 1e-15)
	checkRel(t, "margin with 47 Ω", f.RatingMargin, 60-24-0.446*47, 1e-14)
	checkRel(t, "decay with 47 Ω", f.ResistorDecay, L/(R+47), 1e-15)
	checkRel(t, "cold decay with 47 Ω", f.ResistorDecayCold, L/(Rw+47), 1e-15)
	checkRel(t, "worst energy in 47 Ω", f.ResistorEnergyWorst, L*0.446*0.446/2*47/(Rw+47), 1e-15)
	if !f.WithinRating {
		t.Errorf("47 Ω: %+v", f)
	}
	// Above the largest resistor: over the rating, and said so.
	if o := s.WithResistor(L, R, 100); o.WithinRating || o.SwitchVoltage != 24+0.446*100 {
		t.Errorf("100 Ω: %+v", o)
	}
	if d := s.WithResistor(L, R, math.NaN()); !math.IsNaN(d.Resistor) || d.SwitchVoltage != 24 || !math.IsNaN(d.ResistorDecay) {
		t.Errorf("no resistor: %+v", d)
	}
}
