package analysis

import (
	"math"
	"testing"

	"coilmemo/calc"
)

func studyOf(t *testing.T, src string) *Study {
	t.Helper()
	st, ds := Run("t.md", []byte(src), Options{})
	if len(ds) > 0 {
		t.Fatal(ds.Error())
	}
	return st
}

const rodSpec = "```coil\nname = rod\nform = solenoid\nmean-diameter = 12 mm\nlength = 120 mm\nturns = 400\nwire = AWG 30\ncurrent = 0.1 A\n" +
	"core-length = 140 mm\ncore-diameter = 8 mm\ncore-density = 7800 kg/m3\n"

// A core of μr = 1 leaves every headline figure the air coil's exactly.
func TestCoreUnitPermeabilityIsAir(t *testing.T) {
	air := studyOf(t, "```coil\nname = rod\nform = solenoid\nmean-diameter = 12 mm\nlength = 120 mm\nturns = 400\nwire = AWG 30\ncurrent = 0.1 A\n```\n")
	one := studyOf(t, rodSpec+"core-permeability = 1\n```\n")
	a, b := air.Results.Coils[0], one.Results.Coils[0]
	if a.Moment != b.Moment || a.Inductance != b.Inductance || air.Results.TorqueMax != one.Results.TorqueMax {
		t.Errorf("μr = 1: moment %v / %v, L %g / %g", a.Moment, b.Moment, a.Inductance, b.Inductance)
	}
	// The mass gains only the core's ρ V = 7800 × π (4 mm)² × 140 mm.
	core := 7800 * math.Pi * 0.004 * 0.004 * 0.140
	if d := b.Mass - a.Mass; math.Abs(d-core) > 1e-12 {
		t.Errorf("core mass added %g, want %g", d, core)
	}
}

// With a core the headline moment and inductance are the cored ones, and
// the far field at a probe is the dipole field of that moment.
func TestCoredHeadline(t *testing.T) {
	src := rodSpec + "core-permeability = 1000\n```\n```probes\nfar = (0, 0, 3) m\n```\n"
	st := studyOf(t, src)
	k := st.Coils[0].Kinds.Core
	cr := st.Results.Coils[0]
	if k == nil || math.Abs(cr.Moment.Norm()-k.Moment) > 1e-12*k.Moment || !(k.Moment > 10*st.Coils[0].Kinds.AirMoment.Norm()) {
		t.Fatalf("cored moment %g, core result %+v", cr.Moment.Norm(), k)
	}
	if want := st.Coils[0].Kinds.AirInductance + k.InductanceAdded; cr.Inductance != want {
		t.Errorf("L %g, want air + core %g", cr.Inductance, want)
	}
	// Dipole field on the axis, B = μ0 m / (2π z³) (Jackson 3rd ed., eq. 5.56);
	// at 3 m, 21 rod lengths away, the rod's quadrupole-free pole pair and the
	// winding differ from it by less than 0.1 %.
	want := calc.Mu0 * cr.Moment.Norm() / (2 * math.Pi * 27)
	if got := st.Results.Probes[0].B.Norm(); math.Abs(got/want-1) > 1e-3 {
		t.Errorf("far field %g, dipole %g", got, want)
	}
	for _, c := range st.Checks {
		if !c.Pass {
			t.Errorf("check %q failed: %g vs %g", c.Name, c.Value, c.Expected)
		}
	}
}

// A pick-up coil: no drive findings, the noise floor √(4kTR)/S, and limits
// judged on its figures.
func TestReceiverStudy(t *testing.T) {
	src := "```coil\nname = pick\nform = solenoid\ninner-diameter = 20 mm\nouter-diameter = 40 mm\nlength = 50 mm\nturns = 2000\nwire = AWG 36\nfrequency = 100 Hz\nband = 10 Hz .. 1 kHz\n```\n" +
		"```limits\nsensitivity >= 1 V/T\nself-resonance >= 1 MHz\n```\n"
	st := studyOf(t, src)
	r := st.Coils[0].Kinds.Receiver
	if r == nil {
		t.Fatal("no receiver figures")
	}
	T := calc.CelsiusToKelvin(20)
	want := math.Sqrt(4*calc.Boltzmann*T*r.Resistance) / r.Sensitivity
	if math.Abs(r.NoiseField/want-1) > 1e-12 {
		t.Errorf("noise %g, want √(4kTR)/S = %g", r.NoiseField, want)
	}
	if l := st.Limits; len(l) != 2 || !l[0].Pass || l[0].Computed != r.Sensitivity || l[1].Pass != (r.SelfResonance >= 1e6) {
		t.Errorf("limits %+v (S %g, fsr %g)", l, r.Sensitivity, r.SelfResonance)
	}
}

// The limits of cored and pick-up coils go through LimitValue, so the
// worst case over the tolerance corners sees them: a linear core's peak
// flux density is proportional to the current, so at supply +10 % it is
// 1.1 times the nominal; a pick-up coil's sensitivity S = 2π f A is
// proportional to its frequency, so at frequency −5 % it is 0.95 times the
// nominal. Both worst values are finite, at the right corner, and agree
// with the verdicts; the cored inductance's time constant is judged at the
// corners too (L with the core over R, not the air coil's).
func TestCoredLimitsWorstCase(t *testing.T) {
	src := rodSpec + "core-permeability = 1000\n```\n" +
		"```limits\ncore-flux-density <= 0.5 T\ntime-constant >= 1 us\n```\n```tolerances\nsupply = ±10 %\n```\n"
	_, st := worstOf(t, src)
	nom := st.Limits[0].Computed
	if !(nom > 0) || math.IsInf(nom, 0) {
		t.Fatalf("nominal core flux density %g", nom)
	}
	wl := st.WorstCase.Limits[0]
	if math.IsNaN(wl.Worst) || math.Abs(wl.Worst/nom-1.1) > 1e-9 || wl.Corner < 0 || wl.Corner&supplyHigh == 0 {
		t.Errorf("worst core flux density %g at corner %d, want 1.1 × %g at supply +10 %%", wl.Worst, wl.Corner, nom)
	}
	if wl.Pass != (wl.Worst <= 0.5) || st.Limits[0].Pass != wl.Pass {
		t.Errorf("verdict %v / %v for worst %g T ≤ 0.5 T", wl.Pass, st.Limits[0].Pass, wl.Worst)
	}
	cr := st.Results.Coils[0]
	if tau := st.Limits[1].Computed; math.Abs(tau-cr.Inductance/cr.RHot) > 1e-12*tau || !(cr.Inductance > 2*st.Coils[0].Kinds.AirInductance) {
		t.Errorf("time constant %g, want cored L/R %g (air L %g)", tau, cr.Inductance/cr.RHot, st.Coils[0].Kinds.AirInductance)
	}
	// Current drive: L does not move with the supply and R only by the
	// winding's warming (well under 1 % here), so the corners' τ stays
	// within 1 % of the nominal cored one, far from the air coil's.
	if w := st.WorstCase.Limits[1].Worst; math.Abs(w/st.Limits[1].Computed-1) > 0.01 {
		t.Errorf("corner time constant %g, nominal %g (air %g)", w, st.Limits[1].Computed, st.Coils[0].Kinds.AirInductance/cr.RHot)
	}

	rec := "```coil\nname = pick\nform = solenoid\ninner-diameter = 20 mm\nouter-diameter = 40 mm\nlength = 50 mm\nturns = 2000\nwire = AWG 36\nfrequency = 100 Hz\n" +
		"core-permeability = 500\ncore-length = 80 mm\ncore-diameter = 10 mm\n```\n" +
		"```limits\nsensitivity >= 1 V/T\n```\n```tolerances\nfrequency = ±5 %\n```\n"
	_, sr := worstOf(t, rec)
	s := sr.Limits[0].Computed
	w := sr.WorstCase.Limits[0]
	if math.IsNaN(w.Worst) || math.Abs(w.Worst/s-0.95) > 1e-9 || w.Corner != 0 {
		t.Errorf("worst sensitivity %g at corner %d, want 0.95 × %g at frequency −5 %%", w.Worst, w.Corner, s)
	}
	if !w.Pass || !sr.Limits[0].Pass {
		t.Errorf("sensitivity %g ≥ 1 V/T judged failed", w.Worst)
	}
}

// The field figures of a cored coil carry the core: the on-axis profile at
// a probe on the axis, the map at a probe in the meridian plane and the
// rod-end figure of the safety finding are the same numbers (winding plus
// the rod's pole-model field), the profile's dipole is the cored moment's,
// and beyond the 1 % distance the two agree within 1 %.
func TestCoredFiguresMatchNumbers(t *testing.T) {
	src := rodSpec + "core-permeability = 1000\n```\n```probes\nend = (0, 0, 78 mm)\nside = (20 mm, 0, 30 mm)\n```\n"
	st := studyOf(t, src)
	cs, cr := st.Coils[0], st.Results.Coils[0]
	k := cs.Kinds.Core
	at := func(zs []float64, vs []float64, z float64) float64 { // linear interpolation
		for i := 1; i < len(zs); i++ {
			if zs[i] >= z {
				f := (z - zs[i-1]) / (zs[i] - zs[i-1])
				return vs[i-1] + f*(vs[i]-vs[i-1])
			}
		}
		return math.NaN()
	}
	// The end probe is on the axis 8 mm beyond the rod's end (140 mm rod,
	// 8 mm diameter): one diameter, where the safety finding states it.
	end := st.Results.Probes[0].B.Norm()
	if math.Abs(end/cs.Kinds.EndField-1) > 1e-9 {
		t.Errorf("probe at the rod's end %g T, rod-end figure %g T", end, cs.Kinds.EndField)
	}
	co := st.Spec.Design.Coils[0]
	both := func(p calc.Vec) float64 {
		return calc.CoilField(co, cr.Winding, cr.Current, p).Add(calc.CorePoleField(co, *k, p)).Norm()
	}
	for i, z := range cs.Axis.Z { // the profile's nodes beyond the rod's end
		if z > 0.075 && z < 0.2 {
			if want := both(calc.Vec{0, 0, z}); math.Abs(cs.Axis.Exact[i]/want-1) > 1e-9 {
				t.Errorf("profile at %g m: %g T, winding + core %g T", z, cs.Axis.Exact[i], want)
			}
		}
	}
	if got := at(cs.Axis.Z, cs.Axis.Exact, 0.2); math.Abs(got/both(calc.Vec{0, 0, 0.2})-1) > 0.02 {
		t.Errorf("profile at 200 mm %g T, winding + core %g T", got, both(calc.Vec{0, 0, 0.2}))
	}
	if air := calc.CoilField(co, cr.Winding, cr.Current, calc.Vec{0, 0, 0.078}).Norm(); !(end > 3*air) {
		t.Errorf("rod end %g T not well above the winding's own %g T", end, air)
	}
	// The map node nearest the side probe.
	m := cs.Map
	if m.ZHalf < 0.07 {
		t.Errorf("map reaches z = %g m, short of the rod's end at 70 mm", m.ZHalf)
	}
	ix, iz := 0, 0
	for i, x := range m.X {
		if math.Abs(x-0.02) < math.Abs(m.X[ix]-0.02) {
			ix = i
		}
	}
	for i, z := range m.Z {
		if math.Abs(z-0.03) < math.Abs(m.Z[iz]-0.03) {
			iz = i
		}
	}
	p := calc.Vec{m.X[ix], 0, m.Z[iz]}
	want := both(p)
	if got := m.B[ix*len(m.Z)+iz]; math.Abs(got/want-1) > 1e-9 {
		t.Errorf("map at %v: %g T, winding + core %g T", p, got, want)
	}
	// Dipole: the cored moment's, within 1 % beyond the stated distance.
	d1 := cr.Dipole.Axis1
	if math.IsNaN(d1) || d1 < 0.07 {
		t.Fatalf("1 %% dipole distance on the axis %g m", d1)
	}
	for i, z := range cs.Axis.Z {
		if z > d1*1.001 {
			if e := math.Abs(cs.Axis.Dipole[i]/cs.Axis.Exact[i] - 1); e > 0.01 {
				t.Errorf("z = %g m beyond %g m: dipole and exact differ by %.3g", z, d1, e)
			}
		}
	}
	if dm := calc.Mu0 * cr.Moment.Norm() / (2 * math.Pi * math.Pow(cs.Axis.Z[len(cs.Axis.Z)-1], 3)); math.Abs(cs.Axis.Dipole[len(cs.Axis.Z)-1]/dm-1) > 1e-12 {
		t.Errorf("profile's dipole %g, cored moment's μ0 m/(2π z³) %g", cs.Axis.Dipole[len(cs.Axis.Z)-1], dm)
	}
}

// A cored coil's conductor mass is kept apart from the core's: the
// conductor's is ρ A ℓ of its wire (copper, 8890 kg/m³ by IEC 60028, at
// the wire length laid out), the core's ρ π D²/4 ℓ (7800 × π (4 mm)² ×
// 140 mm), and the results' mass is their sum.
func TestCoredMassesApart(t *testing.T) {
	st := studyOf(t, rodSpec+"core-permeability = 1000\n```\n")
	k := st.Coils[0].Kinds
	cr := st.Results.Coils[0]
	d := st.Spec.Design.Coils[0].Wire.Bare
	wire := 8890 * math.Pi * d * d / 4 * cr.Length
	if math.Abs(k.AirMass/wire-1) > 1e-9 {
		t.Errorf("conductor mass %g kg, want ρ A ℓ = %g kg", k.AirMass, wire)
	}
	core := 7800 * math.Pi * 0.004 * 0.004 * 0.140
	if math.Abs(k.Core.Mass/core-1) > 1e-12 {
		t.Errorf("core mass %g kg, want %g kg", k.Core.Mass, core)
	}
	if math.Abs(cr.Mass-(wire+core)) > 1e-9*cr.Mass {
		t.Errorf("total mass %g kg, want conductor + core %g kg", cr.Mass, wire+core)
	}
}

// The self-capacitance's parts, which the memo derives, are the ones the
// receiver's figure was computed from: a single-layer solenoid by
// Medhurst's fit on its mean diameter and length, a layered winding by the
// energy method over its layers.
func TestSelfCapacitanceParts(t *testing.T) {
	one := studyOf(t, "```coil\nname = R\nform = solenoid\nmean-diameter = 20 mm\nlength = 30 mm\nturns = 100\nwire = AWG 30\nfrequency = 2 kHz\n```\n")
	p := one.Coils[0].Kinds.Capacitance
	if p.Layered || p.Diameter != 0.020 || p.Length != 0.030 || p.Capacitance != calc.MedhurstCapacitance(0.020, 0.030) ||
		p.Capacitance != one.Coils[0].Kinds.Receiver.SelfCapacitance {
		t.Errorf("single layer: parts %+v, receiver C_s %g", p, one.Coils[0].Kinds.Receiver.SelfCapacitance)
	}
	many := studyOf(t, "```coil\nname = R\nform = solenoid\ninner-diameter = 12 mm\nouter-diameter = 18 mm\nlength = 20 mm\nturns = 400\nwire = AWG 38\nfrequency = 1 kHz\n```\n")
	q := many.Coils[0].Kinds.Capacitance
	w := many.Results.Coils[0].Winding
	if !q.Layered || q.Layers != w.LayerCount || q.Capacitance != calc.LayeredCapacitance(q.LayerCapacitance, q.Layers) ||
		q.Capacitance != many.Coils[0].Kinds.Receiver.SelfCapacitance {
		t.Errorf("layered: parts %+v (%d layers), receiver C_s %g", q, w.LayerCount, many.Coils[0].Kinds.Receiver.SelfCapacitance)
	}
	// C_l is the capacitance per metre of two touching turns times the
	// facing turns' length: each gap's facing turns at the radius between
	// its two layers.
	facing := 0.0
	for k := 0; k+1 < len(w.Layers); k++ {
		n := min(len(w.Layers[k].Z), len(w.Layers[k+1].Z))
		facing += float64(n) * math.Pi * (w.Layers[k].Radius + w.Layers[k+1].Radius)
	}
	facing /= float64(len(w.Layers) - 1)
	if math.Abs(q.Facing-facing) > 1e-12*facing || math.Abs(q.PerLength*q.Facing-q.LayerCapacitance) > 1e-12*q.LayerCapacitance {
		t.Errorf("layered: C_l %g F, per metre %g F/m × facing %g m (want %g m)", q.LayerCapacitance, q.PerLength, q.Facing, facing)
	}
}
