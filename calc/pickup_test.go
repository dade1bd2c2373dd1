package calc

import (
	"math"
	"testing"
)

func TestMedhurstTable(t *testing.T) {
	// Medhurst, Wireless Engineer 24 (1947), table of H = C/D in pF per cm
	// of diameter against ℓ/D (values recalled from memory, not checked
	// against the printed table; our recollection of the rows at ℓ/D = 0.5
	// and 5 is less sure and they are left out). The fit is quoted as
	// within a few per cent of the table.
	for _, c := range []struct{ lD, h float64 }{{0.1, 0.96}, {1, 0.46}, {2, 0.50}, {10, 1.32}, {20, 2.36}} {
		D := 0.05 // 5 cm
		got := MedhurstCapacitance(D, c.lD*D) / (5 * 1e-12)
		checkRel(t, "Medhurst H", got, c.h, 0.025)
	}
	if !math.IsNaN(MedhurstCapacitance(0, 1)) {
		t.Error("zero diameter must give NaN")
	}
}

func TestLayeredCapacitance(t *testing.T) {
	// Two layers: C_l/3, the classic two-layer result of the energy method.
	checkRel(t, "two layers", LayeredCapacitance(3e-9, 2), 1e-9, 1e-15)
	// Many layers: falls as 4/(3p).
	checkRel(t, "many layers", LayeredCapacitance(1e-9, 1000)*1000, 4.0/3*0.999e-9, 1e-12)
	if !math.IsNaN(LayeredCapacitance(1e-9, 1)) {
		t.Error("one layer is not a layered winding")
	}
}

func TestTurnToTurnCapacitance(t *testing.T) {
	r := 0.2553e-3
	base := TurnToTurnCapacitance(r, r+25e-6, 1, EnamelPermittivity)
	// Tens of pF per metre for magnet wire (common practice range).
	if !(base > 20e-12 && base < 300e-12) {
		t.Errorf("C_tt = %g F/m", base)
	}
	if thicker := TurnToTurnCapacitance(r, r+50e-6, 1, EnamelPermittivity); !(thicker < base) {
		t.Errorf("thicker enamel: %g ≥ %g", thicker, base)
	}
	if higher := TurnToTurnCapacitance(r, r+25e-6, 1, 5); !(higher > base) {
		t.Errorf("higher permittivity: %g ≤ %g", higher, base)
	}
	checkRel(t, "linear in turn length", TurnToTurnCapacitance(r, r+25e-6, 3, EnamelPermittivity), 3*base, 1e-14)
}

func TestThermalNoise(t *testing.T) {
	// 1 kΩ at 300 K: 4.07 nV/√Hz (the textbook "about 4 nV/√Hz per kΩ",
	// e.g. Horowitz & Hill, The Art of Electronics, 3rd ed., §8.1.1;
	// recalled).
	checkRel(t, "e_n(1 kΩ, 300 K)", ThermalNoise(1e3, 300), 4.07e-9, 2e-3)
}

// searchCoil is an air-cored pick-up coil for a test bench: 2000 turns of
// AWG 36 on a 30 mm former, 20 mm long.
func searchCoil() (Coil, Winding) {
	c := Coil{Form: Solenoid, MeanDiameter: 34e-3, InnerDiameter: 30e-3, Length: 20e-3, RadialBuild: 4e-3,
		Turns: 2000, Wire: WireFromGauge(36, Copper()), Frequency: 1e3, BandLow: 10, BandHigh: 1e3}
	return c, LayOut(c)
}

func TestReceiverAirCoil(t *testing.T) {
	c, w := searchCoil()
	if w.Overfull {
		t.Fatal(w.Problem)
	}
	rdc := ResistancePerLength(c.Wire.Bare, c.Wire.Material, T20) * w.WireLength
	L := CoilInductance(c, w)
	r := EvaluateReceiver(c, w, w.AreaSum, rdc, L, T20)
	checkRel(t, "sensitivity", r.Sensitivity, 2*math.Pi*1e3*w.AreaSum, 1e-15)
	checkRel(t, "noise floor = √(4kTR)/S", r.NoiseField, math.Sqrt(4*Boltzmann*T20*r.Resistance)/r.Sensitivity, 1e-12)
	// Dowell's factor is within 10⁻³ of 1 at 1 kHz in AWG 36 wire, even
	// over some 40 layers.
	checkRel(t, "R at 1 kHz", r.Resistance, rdc, 1e-3)
	// Band noise with a frequency-independent R: B_n = k/f, ∫ k²/f² df = k² (1/lo − 1/hi).
	k := math.Sqrt(4*Boltzmann*T20*rdc) / (2 * math.Pi * w.AreaSum)
	checkRel(t, "band noise", r.BandNoiseField, k*math.Sqrt(1/10.0-1/1e3), 1e-4)
	// The terminal response peaks at the self-resonance.
	if !(r.SelfResonance > 1e4 && r.SelfResonance < 1e8) {
		t.Fatalf("self-resonance %g Hz", r.SelfResonance)
	}
	peak, fpk := 0.0, 0.0
	for i := 0; i <= 2000; i++ {
		f := r.SelfResonance * math.Pow(10, -0.2+0.4*float64(i)/2000)
		if g := TerminalResponse(w.AreaSum, rdc, L, r.Capacitance, f) / InductionSensitivity(w.AreaSum, f); g > peak {
			peak, fpk = g, f
		}
	}
	checkRel(t, "response peak at f_sr", fpk, r.SelfResonance, 0.01)
	if r.AboveResonance {
		t.Error("1 kHz is far below the self-resonance")
	}
	c.Frequency = 10 * r.SelfResonance
	if !EvaluateReceiver(c, w, w.AreaSum, rdc, L, T20).AboveResonance {
		t.Error("ten times the self-resonance must be flagged")
	}
	if len(r.Response) != 121 {
		t.Errorf("%d response points", len(r.Response))
	}
	// A load capacitance lowers the resonance as 1/√C.
	c.Frequency, c.LoadCapacitance = 1e3, 3*r.SelfCapacitance
	checkRel(t, "with load", EvaluateReceiver(c, w, w.AreaSum, rdc, L, T20).SelfResonance, r.SelfResonance/2, 1e-12)
}

func TestReceiverCoredShortCoil(t *testing.T) {
	// A short coil at the middle of a long rod links the mid-plane flux:
	// A_eff ≈ N [A_core μapp,f + (A_coil − A_core)], μapp,f from the
	// fluxmetric factor (Tumanski 2007, eq. 6 with the fluxmetric N for a
	// coil short against the rod).
	c := Coil{Form: Solenoid, MeanDiameter: 6e-3, Length: 2e-3, Turns: 20, Wire: Wire{Bare: 0.09e-3, Outer: 0.1e-3, Material: Copper()},
		Core: Core{Permeability: 5000, Length: 0.15, Diameter: 5e-3}}
	w := LayOut(c)
	r := EvaluateCore(c, w, 1e-3)
	ac := math.Pi * 2.5e-3 * 2.5e-3
	want := 20 * (ac*r.ApparentPermeabilityMid + (math.Pi*3e-3*3e-3 - ac))
	checkRel(t, "short coil A_eff", r.EffectiveArea, want, 0.03)
}

// The working band of the lumped model ends where |1 − ω²LC| departs from
// 1 by the tolerance: for a lossless winding 1/(1 − ω²LC) = 1.1 at
// ω²LC = 1/11, f = f_sr/√11 (the divider of TerminalResponse, Tumanski
// 2007, eq. 20, with R = 0).
func TestWorkingBandTop(t *testing.T) {
	const a, L, C = 0.01, 0.2, 470e-12
	fsr := SelfResonance(L, C)
	ratio := func(f float64) float64 { return TerminalResponse(a, 0, L, C, f) / InductionSensitivity(a, f) }
	var pts []ResponsePoint
	for i := 0; i <= 120; i++ {
		pts = append(pts, ResponsePoint{Frequency: 10 * math.Pow(3*fsr/10, float64(i)/120)})
	}
	want := fsr / math.Sqrt(11)
	if got := workingBandTop(pts, ratio); math.Abs(got/want-1) > 1e-5 {
		t.Errorf("working band top %g Hz, want f_sr/√11 = %g Hz", got, want)
	}
	if got := workingBandTop(pts[:10], ratio); !math.IsInf(got, 1) {
		t.Errorf("a response within the band throughout: %g, want +Inf", got)
	}
	if got := workingBandTop(pts[100:], ratio); got != 0 {
		t.Errorf("a response already off at its lowest frequency: %g, want 0", got)
	}
}
