package figures

import (
	"image/color"
	"math"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"
)

// Every bar of the sensitivity figure ends clear of the data area's frame
// (read off the figure's own grid lines), and the legend stands beside
// the data area, not over the bars.
func TestSensitivityBarsFit(t *testing.T) {
	results := []string{"Magnetic moment |m|", "Current", "Power (averaged over the duty cycle)", "Hot resistance"}
	tols := []string{"supply", "ambient", "wire-diameter", "resistivity", "turns"}
	swing := [][]float64{
		{9, -26.8, 4.8, -1.9, math.NaN()},
		{9, -26.9, 4.8, -1.9, -1.9},
		{19, -26.8, 4.8, -1.9, -1.9},
		{1, 26.9, -4.6, 1.9, 1.9},
	}
	const w, h = 460, 220
	var c recorder.Canvas
	Sensitivity(results, tols, swing)(&c, w, h)
	var col color.Color
	type box struct{ x0, x1, y0, y1 vg.Length }
	var bars []box
	gx0, gx1 := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1)) // data area, from the grid
	gy0, gy1 := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))
	legendX := vg.Length(math.Inf(1))
	names := map[string]bool{}
	for _, n := range tols {
		names[n] = true
	}
	barColour := map[color.Color]bool{}
	for _, c := range ToleranceColours(len(tols)) {
		barColour[c] = true
	}
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.SetColor:
			col = a.Color
		case *recorder.Fill:
			if !barColour[col] {
				continue
			}
			b := box{vg.Length(math.Inf(1)), vg.Length(math.Inf(-1)), vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))}
			for _, cp := range a.Path {
				if cp.Type == vg.MoveComp || cp.Type == vg.LineComp {
					b.x0, b.x1 = min(b.x0, cp.Pos.X), max(b.x1, cp.Pos.X)
					b.y0, b.y1 = min(b.y0, cp.Pos.Y), max(b.y1, cp.Pos.Y)
				}
			}
			bars = append(bars, b)
		case *recorder.Stroke:
			if col == color.Color(GridColor) && len(a.Path) == 2 {
				p, q := a.Path[0].Pos, a.Path[1].Pos
				gx0, gx1 = min(gx0, p.X, q.X), max(gx1, p.X, q.X)
				gy0, gy1 = min(gy0, p.Y, q.Y), max(gy1, p.Y, q.Y)
			}
		case *recorder.FillString:
			if names[a.String] {
				legendX = min(legendX, a.Point.X)
			}
		}
	}
	if len(bars) < 15 {
		t.Fatalf("%d bars found", len(bars))
	}
	margin := 0.02 * (gx1 - gx0)
	for _, b := range bars {
		// The legend's own swatches lie right of the data area.
		if b.x0 > gx1 {
			continue
		}
		if b.x0 < gx0+margin || b.x1 > gx1-margin {
			t.Errorf("bar from %.1f to %.1f reaches the frame (%.1f to %.1f)", b.x0, b.x1, gx0, gx1)
		}
		if b.y0 < gy0 || b.y1 > gy1 {
			t.Errorf("bar from y %.1f to %.1f leaves the data area (%.1f to %.1f)", b.y0, b.y1, gy0, gy1)
		}
	}
	if !(legendX > gx1) || legendX > w {
		t.Errorf("legend at x %.1f, want right of the data area (%.1f) and inside the figure (%v)", legendX, gx1, w)
	}
	if lo, hi := SwingRange(-26.9, 26.9); !(lo < -26.9*1.05 && hi > 26.9*1.05) {
		t.Errorf("SwingRange(−26.9, 26.9) = %g, %g", lo, hi)
	}
}

// cieLab is the CIE 1976 L*a*b* of an sRGB colour (IEC 61966-2-1 transfer
// function and primaries, D65 white; CIE 15:2004, §8.2.1).
func cieLab(c color.NRGBA) (l, a, b float64) {
	lin := func(v uint8) float64 {
		x := float64(v) / 255
		if x <= 0.04045 {
			return x / 12.92
		}
		return math.Pow((x+0.055)/1.055, 2.4)
	}
	r, g, bl := lin(c.R), lin(c.G), lin(c.B)
	x := 0.4124*r + 0.3576*g + 0.1805*bl
	y := 0.2126*r + 0.7152*g + 0.0722*bl
	z := 0.0193*r + 0.1192*g + 0.9505*bl
	f := func(t float64) float64 {
		if t > 216.0/24389 {
			return math.Cbrt(t)
		}
		return (24389.0/27*t + 16) / 116
	}
	fx, fy, fz := f(x/0.9505), f(y), f(z/1.089)
	return 116*fy - 16, 500 * (fx - fy), 200 * (fy - fz)
}

// luma601 is the luma Y' of a colour with the weights of ITU-R BT.601
// (0.299, 0.587, 0.114 on the gamma-encoded values), 0 to 255: the grey
// a plain colour-to-grey conversion prints.
func luma601(c color.NRGBA) float64 {
	return 0.299*float64(c.R) + 0.587*float64(c.G) + 0.114*float64(c.B)
}

// The tolerances' bar colours tell apart in colour and, printed in grey,
// in lightness: for up to six tolerances every two differ by at least 13
// in CIE L* and 25 in CIE76 ΔE*ab (a just-noticeable difference is about
// 2.3; Sharma, Digital Color Imaging Handbook, 2003, ch. 1), and no two
// are of one hue family: their hue angles h_ab lie 25° apart or more.
// Printed through a plain luma conversion they differ by 25 of 255 too.
func TestToleranceColoursDistinct(t *testing.T) {
	for n := 2; n <= 6; n++ {
		cs := ToleranceColours(n)
		for i := range cs {
			for j := i + 1; j < n; j++ {
				l1, a1, b1 := cieLab(cs[i])
				l2, a2, b2 := cieLab(cs[j])
				if dl := math.Abs(l1 - l2); dl < 13 {
					t.Errorf("%d tolerances: colours %d and %d differ by %.1f in L*", n, i, j, dl)
				}
				if de := math.Sqrt((l1-l2)*(l1-l2) + (a1-a2)*(a1-a2) + (b1-b2)*(b1-b2)); de < 25 {
					t.Errorf("%d tolerances: colours %d and %d ΔE*ab %.1f", n, i, j, de)
				}
				if dy := math.Abs(luma601(cs[i]) - luma601(cs[j])); dy < 25 {
					t.Errorf("%d tolerances: colours %d and %d differ by %.0f of 255 in luma", n, i, j, dy)
				}
				dh := math.Abs(math.Atan2(b1, a1)-math.Atan2(b2, a2)) * 180 / math.Pi
				if dh > 180 {
					dh = 360 - dh
				}
				if dh < 25 {
					t.Errorf("%d tolerances: colours %d and %d hues %.0f° apart", n, i, j, dh)
				}
			}
		}
	}
	// Lightness even from 20 to 90, read back through the forward
	// transform.
	for i, c := range ToleranceColours(5) {
		if l, _, _ := cieLab(c); math.Abs(l-(20+17.5*float64(i))) > 1 {
			t.Errorf("colour %d of 5: L* %.1f, want %.1f", i, l, 20+17.5*float64(i))
		}
	}
	if l, _, _ := cieLab(color.NRGBA{R: 255, G: 255, B: 255, A: 255}); math.Abs(l-100) > 0.1 {
		t.Errorf("white L* = %g, want 100", l)
	}
}

// A temperature's swings, in kelvin, get a panel and an axis of their own
// below the per-cent results, every bar drawn, the data areas aligned.
func TestSensitivityKelvinPanel(t *testing.T) {
	tols := []string{"supply", "ambient", "turns"}
	d := SensitivityData{Tolerances: tols,
		Results: []string{"Current", "Power"}, Swing: [][]float64{{9, -26.8, -1.9}, {19, -26.8, -1.9}},
		Kelvin: []string{"Hottest winding temperature"}, KelvinSwing: [][]float64{{3.3, 70.3, -0.4}}}
	var c recorder.Canvas
	SensitivityFigure(d)(&c, 460, 240)
	texts := map[string]int{}
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok {
			texts[fs.String]++
		}
	}
	for _, want := range []string{"Hottest winding temperature", "Current", "Change from the tolerance's low to its high end (K)", "Change from the tolerance's low to its high end (% of nominal)"} {
		if texts[want] != 1 {
			t.Errorf("%q drawn %d times, want once", want, texts[want])
		}
	}
	for _, n := range tols {
		if texts[n] != 1 {
			t.Errorf("legend entry %q drawn %d times, want once (one legend for both panels)", n, texts[n])
		}
	}
	// The kelvin panel's 70.3 K bar is the longest of its own axis: it
	// reaches past 30 (it would not on the per-cent axis's ±30).
	if !(texts["60"] == 1 || texts["50"] == 1 || texts["80"] == 1) {
		t.Errorf("no kelvin axis reaching 70 K among the ticks: %v", texts)
	}
}

// The two panels' data areas (read off their grid lines) share both
// edges, and keep most of the figure's width.
func TestSensitivityPanelsAligned(t *testing.T) {
	tols := []string{"supply", "ambient", "wire-diameter", "resistivity", "turns"}
	d := SensitivityData{Tolerances: tols,
		Results: []string{"Power (averaged over the duty cycle)", "Current"}, Swing: [][]float64{{9, -26.8, -1.9, 1, 1}, {19, -26.8, -1.9, 1, 1}},
		Kelvin: []string{"Hottest winding temperature"}, KelvinSwing: [][]float64{{3.3, 70.3, -0.4, 1, 1}}}
	for _, w := range []vg.Length{460, 165 * vg.Millimeter} {
		sensitivityAligned(t, d, w)
	}
}

func sensitivityAligned(t *testing.T, d SensitivityData, w vg.Length) {
	t.Helper()
	var c recorder.Canvas
	SensitivityFigure(d)(&c, w, 240)
	var col color.Color
	type span struct{ x0, x1 vg.Length }
	var rows []span
	for _, a := range c.Actions {
		switch a := a.(type) {
		case *recorder.SetColor:
			col = a.Color
		case *recorder.Stroke:
			if col == color.Color(GridColor) && len(a.Path) == 2 && a.Path[0].Pos.Y == a.Path[1].Pos.Y {
				rows = append(rows, span{a.Path[0].Pos.X, a.Path[1].Pos.X})
			}
		}
	}
	if len(rows) != 3 {
		t.Fatalf("%d row grid lines, want 3", len(rows))
	}
	for _, r := range rows[1:] {
		if math.Abs(float64(r.x0-rows[0].x0)) > 0.5 || math.Abs(float64(r.x1-rows[0].x1)) > 0.5 {
			t.Errorf("width %.0f: grid lines %v and %v: the panels' data areas differ", w, rows[0], r)
		}
	}
	if dw := rows[0].x1 - rows[0].x0; dw < 0.35*w {
		t.Errorf("width %.0f: data area %.0f wide", w, dw)
	}
}
