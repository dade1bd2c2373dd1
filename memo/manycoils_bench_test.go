package memo

import (
	"fmt"
	"strings"
	"testing"
)

// manyCoilsSpec is an invented test fixture of n coil blocks: multilayer
// solenoids of 200 turns on a 5 × 6 lattice 120 mm apart in the xz-plane,
// every third one's axis along x, the others along z.
func manyCoilsSpec(n int) []byte {
	var b strings.Builder
	b.WriteString("# Coil array test fixture\n\n")
	for i := range n {
		axis := "z"
		if i%3 == 2 {
			axis = "x"
		}
		x, z := 120*(i%5-2), 120*(i/5)
		fmt.Fprintf(&b, "```coil\nname = c%d\nform = solenoid\ninner-diameter = 30 mm\nouter-diameter = 40 mm\nlength = 20 mm\nturns = 200\nwire = AWG 26\ncurrent = 0.5 A\naxis = %s\ncentre = (%d, 0, %d) mm\n```\n\n", i+1, axis, x, z)
	}
	return []byte(b.String())
}

// BenchmarkManyCoils: the whole run (spec → PDF) and the analysis alone
// for 1, 10 and 30 coils; issue 16 asks 30 coils to cost at most 10× one.
//
//	go test -run '^$' -bench ManyCoils -benchtime 3x ./memo
func BenchmarkManyCoils(b *testing.B) {
	for _, n := range []int{1, 10, 30} {
		src := manyCoilsSpec(n)
		b.Run(fmt.Sprintf("analysis/%d", n), func(b *testing.B) {
			for range b.N {
				benchStudy(b, "many", src)
			}
		})
		b.Run(fmt.Sprintf("whole/%d", n), func(b *testing.B) {
			for range b.N {
				if _, err := PDF(benchStudy(b, "many", src)); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}
