package calc

import "testing"

// Two 200-turn multilayer solenoids 60 mm apart with axes at 60°: the
// non-coaxial coupling (mutual inductance by Neumann's formula and the
// Lorentz force, both over the blocks' cell filaments).
//
//	go test -run '^$' -bench 'Neumann|Lorentz' ./calc
func inclinedPairForBench() (a Coil, wa Winding, b Coil, wb Winding) {
	mk := func(axis, centre Vec) Coil {
		return Coil{Name: "c", Form: Solenoid, MeanDiameter: 0.035, Length: 0.02, RadialBuild: 0.005,
			Turns: 200, Wire: WireFromGauge(26, Copper()), Axis: axis, Centre: centre}
	}
	a = mk(Vec{0, 0, 1}, Vec{})
	b = mk(Vec{0.866, 0, 0.5}, Vec{0.06, 0, 0.02})
	return a, LayOut(a), b, LayOut(b)
}

func BenchmarkNeumannMutual(b *testing.B) {
	ca, wa, cb, wb := inclinedPairForBench()
	for range b.N {
		NeumannMutual(ca, wa, cb, wb)
	}
}

func BenchmarkLorentzForceBetween(b *testing.B) {
	ca, wa, cb, wb := inclinedPairForBench()
	for range b.N {
		LorentzForceBetween(ca, wa, 0.5, cb, wb, 0.5)
	}
}
