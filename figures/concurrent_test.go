package figures

import (
	"math"
	"strings"
	"sync"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

// A figure may be drawn on two goroutines at once (the memo's figures
// drawn ahead while the same figure is set on the spot): every call must
// give the drawing a call alone gives, whatever runs beside it.
func TestDrawerConcurrentCalls(t *testing.T) {
	var z, exact, dipole []float64
	for i := range 201 {
		v := -0.2 + 0.4*float64(i)/200
		z = append(z, v)
		b := 1e-3 / math.Pow(1+(v/0.03)*(v/0.03), 1.5)
		exact = append(exact, b)
		dipole = append(dipole, 1e-3*0.03*0.03*0.03/(2*math.Max(math.Abs(v), 0.01)*v*v))
	}
	draw := OnAxis("z", z, exact, dipole)
	record := func() string {
		var c recorder.Canvas
		draw(&c, vg.Points(400), vg.Points(250))
		var b strings.Builder
		for _, a := range c.Actions {
			b.WriteString(a.Call())
			b.WriteByte('\n')
		}
		return b.String()
	}
	want := record()
	var wg sync.WaitGroup
	got := make([]string, 16)
	for i := range got {
		wg.Add(1)
		go func() {
			defer wg.Done()
			got[i] = record()
		}()
	}
	wg.Wait()
	for i, g := range got {
		if g != want {
			t.Fatalf("call %d beside 15 others drew differently from a call alone", i)
		}
	}
}
