package calc

import "math"

// Epsilon0 is the vacuum permittivity ε0 = 1/(μ0 c²), F/m, with c =
// 299 792 458 m/s exact (2019 SI) and Mu0 the CODATA 2018 value.
const Epsilon0 = 1 / (Mu0 * 299792458 * 299792458)

// EnamelPermittivity is the relative permittivity taken for magnet-wire
// enamel, 3.5 (a typical figure for polyurethane and polyester-imide
// films; common practice, not a standard's value).
const EnamelPermittivity = 3.5

// MedhurstCapacitance returns the self-capacitance, F, of a single-layer
// solenoid of diameter D and length ℓ, m, in air, by the empirical fit
//
//	C = D · (0.1126 ℓ/D + 0.08 + 0.27 √(D/ℓ))   pF, D in cm
//
// to the shape factor H = C/D that Medhurst measured ("H.F. resistance and
// self-capacitance of single-layer solenoids", Wireless Engineer 24 (1947)
// 35–43 and 80–92, Table of H against ℓ/D for 0.1 ≤ ℓ/D ≤ 50), as given by
// Knight ("The self-resonance and self-capacitance of solenoid coils",
// 2016; attribution recalled). It does not depend on the number of turns. NaN for D or ℓ ≤ 0.
func MedhurstCapacitance(D, l float64) float64 {
	if !(D > 0) || !(l > 0) {
		return math.NaN()
	}
	x := l / D
	return D * 100 * (0.1126*x + 0.08 + 0.27/math.Sqrt(x)) * 1e-12
}

// TurnToTurnCapacitance returns the capacitance, F, between two adjacent
// touching turns of enamelled round wire of bare radius r and radius over
// the enamel ro, each of length lt, m, through the enamel of relative
// permittivity er and the air wedge beside the contact (Massarini &
// Kazimierczuk, "Self-capacitance of inductors", IEEE Trans. Power
// Electron. 12 (1997) 671, the elementary cell; formula recalled, not
// re-read against the printed paper):
//
//	C_tt = ε0 lt [ er θ*/ln(ro/r) + cot(θ*/2) − cot(π/12) ]
//	θ* = arccos(1 − ln(ro/r)/er)
//
// NaN unless 0 < r < ro and er ≥ 1.
func TurnToTurnCapacitance(r, ro, lt, er float64) float64 {
	if !(r > 0) || !(ro > r) || !(lt > 0) || !(er >= 1) {
		return math.NaN()
	}
	g := math.Log(ro / r)
	th := math.Acos(1 - g/er)
	return Epsilon0 * lt * (er*th/g + 1/math.Tan(th/2) - 1/math.Tan(math.Pi/12))
}

// LayeredCapacitance returns the self-capacitance, F, of a winding of p
// layers wound back and forth (each layer returning over the last) with
// capacitance Cl between adjacent layers, by the energy method: the voltage
// across each gap rises linearly from 0 to 2 V_l along it, storing
// (2/3) C_l V_l², and the winding's p V_l across its terminals stores the
// sum, so (Dalessandro, Cavalcante & Kolar, "Self-capacitance of
// high-voltage transformers", IEEE Trans. Power Electron. 22 (2007) 2081,
// the standard winding; citation recalled)
//
//	C = (4/3) C_l (p − 1)/p²
//
// NaN for p < 2.
func LayeredCapacitance(cl float64, p int) float64 {
	if p < 2 || !(cl >= 0) {
		return math.NaN()
	}
	return 4.0 / 3 * cl * float64(p-1) / float64(p*p)
}

// SelfCapacitance returns the self-capacitance, F, of coil c's winding w:
// a single-layer solenoid by MedhurstCapacitance (D the mean diameter, ℓ the
// winding length); a multilayer winding (and a thin coil's bundle, counted
// as ⌈d_bundle/d_outer⌉ layers of ⌈N/layers⌉ turns) by LayeredCapacitance
// with C_l, the capacitance between adjacent layers, the sum of the
// turn-to-turn capacitances (TurnToTurnCapacitance, EnamelPermittivity) of
// the turns of a layer facing the next one, each of the length of a turn at
// the radius between the two layers. NaN when the wire's overall diameter
// is not above its bare diameter (no enamel to compute through) for a
// layered winding, or for a Rectangle or Pair (not modelled). Its parts are
// SelfCapacitanceParts.
func SelfCapacitance(c Coil, w Winding) float64 {
	return SelfCapacitanceParts(c, w).Capacitance
}

// CapacitanceParts is how SelfCapacitance found a winding's
// self-capacitance: by MedhurstCapacitance of Diameter and Length, or
// (Layered) by LayeredCapacitance of LayerCapacitance C_l, the mean gap's,
// over Layers layers. Capacitance is the result, F (NaN where not modelled).
type CapacitanceParts struct {
	Layered          bool
	Diameter, Length float64 // m, Medhurst's D and ℓ
	Layers           int
	LayerCapacitance float64 // F
	// A layered winding's C_l is PerLength × Facing: the turn-to-turn
	// capacitance per metre of two touching turns, F/m, and the length of
	// the turns of a layer facing the next, m, the mean over the gaps.
	PerLength, Facing float64
	Capacitance       float64 // F
}

// SelfCapacitanceParts is SelfCapacitance with the figures it went through.
func SelfCapacitanceParts(c Coil, w Winding) CapacitanceParts {
	n := math.NaN()
	out := CapacitanceParts{Diameter: n, Length: n, LayerCapacitance: n, PerLength: n, Facing: n, Capacitance: n}
	if c.Form == Rectangle || c.Form == Pair || w.TurnCount() == 0 {
		return out
	}
	medhurst := func(D, l float64) CapacitanceParts {
		out.Diameter, out.Length, out.Layers = D, l, 1
		out.Capacitance = MedhurstCapacitance(D, l)
		return out
	}
	if !w.Thin && w.LayerCount == 1 {
		return medhurst(c.MeanDiameter, c.Length)
	}
	r, ro := c.Wire.Bare/2, c.Wire.Outer/2
	layers, perLayer := w.LayerCount, w.TurnsPerLayer
	radius := func(k int) float64 { return (w.Layers[k].Radius + w.Layers[k+1].Radius) / 2 }
	if w.Thin {
		layers = int(math.Ceil(BundleDiameter(c.Wire.Outer, w.TurnCount())/c.Wire.Outer - 1e-9))
		perLayer = (w.TurnCount() + layers - 1) / max(layers, 1)
		radius = func(int) float64 { return c.MeanDiameter / 2 }
	}
	if layers < 2 {
		return medhurst(c.MeanDiameter, math.Max(c.Length, c.Wire.Outer))
	}
	var cl, facing float64
	for k := 0; k < layers-1; k++ {
		n := perLayer
		if !w.Thin {
			n = min(len(w.Layers[k].Z), len(w.Layers[k+1].Z))
		}
		cl += float64(n) * TurnToTurnCapacitance(r, ro, 2*math.Pi*radius(k), EnamelPermittivity)
		facing += float64(n) * 2 * math.Pi * radius(k)
	}
	cl /= float64(layers - 1) // the mean gap's capacitance
	facing /= float64(layers - 1)
	out.Layered, out.Layers, out.LayerCapacitance = true, layers, cl
	// TurnToTurnCapacitance is proportional to the turns' length, so C_l
	// is its value per metre times the facing turns' length.
	perLength := TurnToTurnCapacitance(r, ro, 1, EnamelPermittivity)
	out.PerLength, out.Facing = perLength, facing
	out.Capacitance = LayeredCapacitance(cl, layers)
	return out
}

// SelfResonance returns the self-resonant frequency, Hz, of inductance L,
// H, with capacitance C, F, across it: f = 1/(2π √(L C)) (Terman, Radio
// Engineers' Handbook, 1943, §3, the parallel resonance of a coil and its
// distributed capacitance). NaN for L or C ≤ 0.
func SelfResonance(L, C float64) float64 {
	if !(L > 0) || !(C > 0) {
		return math.NaN()
	}
	return 1 / (2 * math.Pi * math.Sqrt(L*C))
}
