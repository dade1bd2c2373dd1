package calc

import "math"

// DowellFactor returns the ratio R_ac/R_dc of a winding of p layers of foil
// (or of round wire by its equivalent foil, see RoundWireDelta) carrying a
// sinusoidal current, with Δ the equivalent conductor thickness over the
// skin depth (Dowell, "Effects of eddy currents in transformer windings",
// Proc. IEE 113 (1966) 1387, eq. 21 summed over the layers of a winding
// whose field falls to zero at one face):
//
//	F_R = Δ [ ς1(Δ) + (2/3)(p² − 1) ς2(Δ) ]
//	ς1 = (sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ)     (skin effect)
//	ς2 = (sinh Δ − sin Δ)/(cosh Δ + cos Δ)          (proximity effect)
//
// evaluated as ratios of tanh and of the trigonometric terms over cosh so
// that large Δ does not overflow, and for Δ < 0.01 by the low-frequency
// series F_R = 1 + (5p² − 1) Δ⁴/45 (the leading terms of the same
// expansion, e.g. Snelling, Soft Ferrites, 2nd ed., 1988, §11.2), where the
// closed form loses digits. F_R → 1 as Δ → 0. NaN for Δ < 0 or p < 1.
func DowellFactor(delta float64, p float64) float64 {
	if !(delta >= 0) || !(p >= 1) || math.IsInf(delta, 1) {
		return math.NaN()
	}
	if delta < 0.01 {
		return 1 + (5*p*p-1)*math.Pow(delta, 4)/45
	}
	d2 := 2 * delta
	c2 := math.Cosh(d2)
	s1 := (math.Tanh(d2) + math.Sin(d2)/c2) / (1 - math.Cos(d2)/c2)
	c1 := math.Cosh(delta)
	s2 := (math.Tanh(delta) - math.Sin(delta)/c1) / (1 + math.Cos(delta)/c1)
	return delta * (s1 + 2.0/3*(p*p-1)*s2)
}

// RoundWireDelta returns Dowell's Δ for a layer of round wires of bare
// diameter d at a pitch (centre distance along the layer) s, with skin
// depth δ (Dowell 1966, §4): the wire becomes a square conductor of equal
// area, side h = (√π/2) d, and the layer a foil of thickness h whose
// conductivity is scaled by the porosity factor η = h/s, the fraction of the
// layer's width that is conductor:
//
//	Δ = (h/δ) √η,   h = (√π/2) d,   η = h/s
//
// η is capped at 1 (touching squares). NaN for non-positive inputs.
func RoundWireDelta(d, s, skin float64) (delta, eta float64) {
	if !(d > 0) || !(s > 0) || !(skin > 0) {
		return math.NaN(), math.NaN()
	}
	h := math.Sqrt(math.Pi) / 2 * d
	eta = math.Min(h/s, 1)
	return h / skin * math.Sqrt(eta), eta
}

// ACResistance returns the a.c. resistance of coil c's winding w at
// frequency f, Hz, from its d.c. resistance rdc, Ω, at the mean winding
// temperature T, K, by Dowell's method (DowellFactor with RoundWireDelta):
// the skin depth in the conductor at T (SkinDepth), the layers of the
// winding as laid out (a thin coil's round bundle counted as
// ⌈d_bundle/d_outer⌉ layers at touching pitch), the pitch along a layer the
// single layer's Length/N or the overall wire diameter of a multilayer
// winding. The factor is the whole winding's, all layers in series carrying
// the same current. f ≤ 0 gives the d.c. figures (Factor 1).
func ACResistance(c Coil, w Winding, rdc, T, f float64) ACLoss {
	a := ACLoss{Frequency: f, SkinDepth: math.NaN(), Porosity: math.NaN(), Delta: 0, Factor: 1, Rac: rdc, Layers: w.LayerCount}
	if !(f > 0) {
		return a
	}
	outer := c.Wire.Outer
	if !(outer > 0) {
		outer = c.Wire.Bare
	}
	rho := c.Wire.Material.Rho20 * ResistanceFactor(c.Wire.Material.Alpha20, T)
	a.SkinDepth = SkinDepth(rho, f)
	pitch := outer
	switch {
	case w.Thin:
		a.Layers = int(math.Ceil(BundleDiameter(outer, w.TurnCount())/outer - 1e-9))
	case w.LayerCount == 1 && w.TurnsPerLayer > 0 && c.Length > 0:
		pitch = c.Length / float64(w.TurnsPerLayer)
	}
	if a.Layers < 1 {
		a.Layers = 1
	}
	a.Delta, a.Porosity = RoundWireDelta(c.Wire.Bare, pitch, a.SkinDepth)
	a.Factor = DowellFactor(a.Delta, float64(a.Layers))
	a.Rac = a.Factor * rdc
	return a
}

// AboveSelfResonance says whether frequency f, Hz, is at or above the
// self-resonant frequency fsr, Hz, where a coil is no longer an inductance:
// its impedance there is set by the distributed capacitance and losses the
// series R–L model leaves out, so no impedance is to be quoted. False when
// fsr is unknown (NaN or ≤ 0).
func AboveSelfResonance(f, fsr float64) bool {
	return fsr > 0 && f >= fsr
}

// NearSelfResonance says whether f is above a third of fsr, where the
// apparent inductance of the lumped L–C model, L/(1 − (f/fsr)²), already
// exceeds L by 12.5 % (a reporting threshold of ours, not a published one).
func NearSelfResonance(f, fsr float64) bool {
	return fsr > 0 && f > fsr/3
}

// HeatingACFactor returns R_ac/R_dc, the factor on the d.c. resistance
// that the heat balance of driven coil c takes at its frequency: Dowell's
// factor of ACResistance at mean winding temperature T, for a coil with a
// layered winding model (not a pair or a rectangle); 1 for d.c. or where
// the factor is unknown.
func HeatingACFactor(c Coil, w Winding, T float64) float64 {
	if !(c.Frequency > 0) || math.IsInf(c.Frequency, 0) || c.Form == Rectangle || c.Form == Pair {
		return 1
	}
	f := ACResistance(c, w, 1, T, c.Frequency).Factor
	if !(f >= 1) || math.IsInf(f, 0) {
		return 1
	}
	return f
}
