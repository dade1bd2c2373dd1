package calc

import "testing"

func BenchmarkEvaluateCoreLinear(b *testing.B) {
	c := torqueRod(5000)
	w := LayOut(c)
	for b.Loop() {
		EvaluateCore(c, w, 0.05)
	}
}

func BenchmarkEvaluateCoreSaturated(b *testing.B) {
	c := torqueRod(5000)
	w := LayOut(c)
	for b.Loop() {
		EvaluateCore(c, w, 2)
	}
}
