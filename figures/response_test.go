package figures

import (
	"image/color"
	"math"
	"slices"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

// The response figure shades the stated band between the decades it is
// stated at (read off the figure's own decade grid lines), names it, and
// labels the marks.
func TestResponseMarksBand(t *testing.T) {
	var f, s []float64
	for k := 0; k <= 200; k++ {
		fk := math.Pow(10, 5*float64(k)/200) // 1 Hz to 100 kHz
		f = append(f, fk)
		u := fk / 2e4
		s = append(s, 70*fk/math.Hypot(1-u*u, 0.05*u)) // resonance at 20 kHz
	}
	var c recorder.Canvas
	Response(f, s, [2]float64{10, 1e4}, "stated band", Mark{X: 1e3, Label: "f 1 kHz"}, Mark{X: 2e4, Label: "self-resonance 20 kHz"})(&c, 460, 240)
	var texts []string
	var col color.Color
	var band []vg.Length
	var grid []vg.Length // vertical grid lines: the decades
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.FillString:
			texts = append(texts, a.String)
		case *recorder.SetColor:
			col = a.Color
		case *recorder.Fill:
			if col == color.Color(bandFill) {
				lo, hi := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))
				for _, cp := range a.Path {
					if cp.Type == vg.MoveComp || cp.Type == vg.LineComp {
						lo, hi = min(lo, cp.Pos.X), max(hi, cp.Pos.X)
					}
				}
				band = append(band, lo, hi)
			}
		case *recorder.Stroke:
			if col == color.Color(GridColor) && len(a.Path) == 2 && a.Path[0].Pos.X == a.Path[1].Pos.X {
				grid = append(grid, a.Path[0].Pos.X)
			}
		}
	}
	all := strings.Join(texts, "|")
	for _, want := range []string{"stated band", "f 1 kHz", "self-resonance 20 kHz"} {
		if !strings.Contains(all, want) {
			t.Errorf("figure lacks %q: %s", want, all)
		}
	}
	if len(band) != 2 {
		t.Fatalf("band shaded %d times, want once", len(band)/2)
	}
	slices.Sort(grid)
	grid = slices.Compact(grid)
	if len(grid) != 6 {
		t.Fatalf("%d decade grid lines %v, want 6 (1 Hz to 100 kHz)", len(grid), grid)
	}
	// 10 Hz is the second decade line, 10 kHz the fifth.
	if math.Abs(float64(band[0]-grid[1])) > 1e-6 || math.Abs(float64(band[1]-grid[4])) > 1e-6 {
		t.Errorf("band shaded from %v to %v, want %v to %v (the 10 Hz and 10 kHz lines)", band[0], band[1], grid[1], grid[4])
	}
	// No band stated: nothing shaded.
	var bare recorder.Canvas
	Response(f, s, [2]float64{}, "")(&bare, 460, 240)
	for _, a := range bare.Actions {
		if sc, ok := a.(*recorder.SetColor); ok && sc.Color == color.Color(bandFill) {
			t.Error("a band is shaded where none is stated")
		}
	}
}
