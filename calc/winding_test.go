package calc

import (
	"errors"
	"math"
	"testing"
)

func TestLayOutThin(t *testing.T) {
	c := Coil{Form: Loop, MeanDiameter: 0.08, Turns: 200, Wire: WireFromGauge(30, Copper())}
	w := LayOut(c)
	if !w.Thin || len(w.Layers) != 1 || len(w.Layers[0].Z) != 200 || w.TurnCount() != 200 {
		t.Fatalf("thin layout %+v", w)
	}
	for _, z := range w.Layers[0].Z {
		if z != 0 {
			t.Fatal("thin turns must all lie at z = 0")
		}
	}
	R := 0.04
	checkRel(t, "wire length", w.WireLength, 200*2*math.Pi*R, 1e-15)
	checkRel(t, "area sum", w.AreaSum, 200*math.Pi*R*R, 1e-15)
	checkRel(t, "mass", w.Mass, 8890*ConductorArea(AWGDiameter(30))*w.WireLength, 1e-15)
	db := c.Wire.Outer * math.Sqrt(200/(math.Pi/(2*math.Sqrt(3))))
	checkRel(t, "torus surface", w.SurfaceArea, math.Pi*db*2*math.Pi*R, 1e-15)
	if !math.IsNaN(w.FillFactor) || w.Overfull {
		t.Errorf("thin fill factor %g overfull %v", w.FillFactor, w.Overfull)
	}
}

func TestLayOutSingleLayer(t *testing.T) {
	c := Coil{Form: Solenoid, MeanDiameter: 0.02, Length: 0.05, Turns: 100, Wire: WireFromGauge(26, Copper())}
	w := LayOut(c)
	z := w.Layers[0].Z
	if len(z) != 100 || w.Thin || w.LayerCount != 1 {
		t.Fatalf("single layer %+v", w)
	}
	checkRel(t, "first turn", z[0], -0.025+0.00025, 1e-12)
	checkRel(t, "symmetry", z[99], -z[0], 1e-12)
	if w.Overfull || CheckWinding(c) != nil {
		t.Errorf("fits: %s", w.Problem)
	}
	checkRel(t, "fill factor", w.FillFactor, 100*ConductorArea(c.Wire.Bare)/(0.05*c.Wire.Outer), 1e-14)
	checkRel(t, "outer cylinder", w.SurfaceArea, math.Pi*(0.02+c.Wire.Outer)*0.05, 1e-14)
	c.Turns = 200 // 0.25 mm pitch < AWG 26 heavy build (≈ 0.46 mm)
	w = LayOut(c)
	if !w.Overfull || w.Problem == "" {
		t.Error("overfull single layer not reported")
	}
	if err := CheckWinding(c); !errors.Is(err, ErrOverfull) {
		t.Errorf("CheckWinding: %v", err)
	}
}

func TestLayOutMultilayer(t *testing.T) {
	d := 1e-3
	c := Coil{Form: Solenoid, MeanDiameter: 0.04, Length: 0.0105, RadialBuild: 0.005, Turns: 47,
		Wire: Wire{Bare: 0.9e-3, Outer: d, Material: Copper()}}
	w := LayOut(c)
	// 10 per layer, 5 layers, the last with 7 turns.
	if w.TurnsPerLayer != 10 || w.LayerCount != 5 || len(w.Layers[4].Z) != 7 || w.TurnCount() != 47 {
		t.Fatalf("tpl %d layers %d", w.TurnsPerLayer, w.LayerCount)
	}
	rin := 0.02 - 0.0025
	var wl, as float64
	for k, l := range w.Layers {
		checkRel(t, "layer radius", l.Radius, rin+d/2+float64(k)*d, 1e-14)
		for range l.Z {
			wl += 2 * math.Pi * l.Radius
			as += math.Pi * l.Radius * l.Radius
		}
		checkRel(t, "layer centred", l.Z[0], -l.Z[len(l.Z)-1], 1e-12)
	}
	checkRel(t, "wire length", w.WireLength, wl, 1e-14)
	checkRel(t, "area sum", w.AreaSum, as, 1e-14)
	checkRel(t, "mean turn", w.MeanTurn, wl/47, 1e-14)
	if w.Overfull {
		t.Error(w.Problem)
	}
	rout := rin + 0.005
	checkRel(t, "surface", w.SurfaceArea, 2*math.Pi*rout*0.0105+2*math.Pi*(rout*rout-rin*rin), 1e-14)
	c.Turns = 51 // six layers in a 5 mm build
	if w := LayOut(c); !w.Overfull {
		t.Error("overfull radial build not reported")
	}
	c.InnerDiameter = 0.03
	if w := LayOut(c); math.Abs(w.Layers[0].Radius-(0.015+d/2)) > 1e-15 {
		t.Error("inner diameter not used")
	}
}

func TestMomentAndTorque(t *testing.T) {
	// Thin loop: m = N I π R² (Jackson eq. 5.57 per turn).
	c := Coil{Form: Loop, MeanDiameter: 0.1, Turns: 150, Wire: WireFromGauge(28, Copper()), Axis: Vec{1, 0, 0}}
	w := LayOut(c)
	m := MagneticMoment(c, w, 0.2)
	want := 150 * 0.2 * math.Pi * 0.05 * 0.05
	checkRel(t, "thin moment", m[0], want, 1e-15)
	checkRel(t, "mean-area cross-check", MomentMeanArea(c, 0.2), want, 1e-15)
	// A full multilayer winding (5 layers of 10, filling its build exactly):
	// Σπrᵢ² = N π (R̄² + var r), var r = d²(5² − 1)/12 for 5 equally spaced
	// layers d apart.
	ml := Coil{Form: Solenoid, MeanDiameter: 0.03, Length: 0.01, RadialBuild: 0.005, Turns: 50,
		Wire: Wire{Bare: 0.9e-3, Outer: 1e-3, Material: Copper()}}
	wm := LayOut(ml)
	checkRel(t, "multilayer ΣA", MagneticMoment(ml, wm, 1)[2], 50*math.Pi*(0.015*0.015+1e-6*24/12), 1e-14)
	// Pair: aiding doubles, opposing cancels.
	c.Form, c.Spacing = Pair, 0.05
	checkRel(t, "pair aiding", MagneticMoment(c, w, 0.2)[0], 2*want, 1e-15)
	c.Opposing = true
	if MagneticMoment(c, w, 0.2).Norm() != 0 {
		t.Error("opposing pair moment must vanish")
	}
	// τ = m × B: x̂ × ŷ = ẑ.
	tau := Torque(Vec{2, 0, 0}, Vec{0, 3e-5, 0})
	if tau != (Vec{0, 0, 6e-5}) {
		t.Errorf("torque %v", tau)
	}
	checkRel(t, "torque max", TorqueMax(Vec{2, 0, 0}, Vec{3e-5, 4e-5, 0}), 2*5e-5, 1e-15)
	checkRel(t, "torque at 30°", TorqueAtAngle(2, 5e-5, math.Pi/6), 5e-5, 1e-15)
}
