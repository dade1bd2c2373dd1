package figures

import (
	"math"
	"slices"
	"strings"
	"testing"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/vg/recorder"

	"coilmemo/fonts"
)

func TestEngPrefix(t *testing.T) {
	for _, c := range []struct {
		v    []float64
		want string
	}{
		{[]float64{0.0123}, "m"},
		{[]float64{0.5e-3, -2e-6}, "µ"},
		{[]float64{12.5}, ""},
		{[]float64{998}, ""},
		{[]float64{999.9}, "k"}, // reads 1.00 k rather than 999.9
		{[]float64{1000}, "k"},
		{[]float64{3e-9, math.NaN(), math.Inf(1)}, "n"},
		{[]float64{0}, ""},
		{nil, ""},
	} {
		if got := EngPrefix(c.v...).Symbol; got != c.want {
			t.Errorf("EngPrefix(%v) = %q, want %q", c.v, got, c.want)
		}
	}
}

func TestNiceTicks(t *testing.T) {
	ticks := niceTicks{}.Ticks(-300, 300)
	var labels []string
	for _, tk := range ticks {
		if tk.Label != "" {
			labels = append(labels, tk.Label)
		}
	}
	if got := strings.Join(labels, " "); got != "-300 -200 -100 0 100 200 300" {
		t.Errorf("labels %q", got)
	}
	ticks = niceTicks{}.Ticks(0, 12.9)
	labels = labels[:0]
	for _, tk := range ticks {
		if tk.Label != "" {
			labels = append(labels, tk.Label)
		}
	}
	if got := strings.Join(labels, " "); got != "0 2 4 6 8 10 12" {
		t.Errorf("labels %q", got)
	}
}

func TestSegments(t *testing.T) {
	nan := math.NaN()
	s := segments([]float64{1, 2, 3, 4, 5, 6}, []float64{1, nan, 3, 4, -1, 6}, 1, 1, true)
	if len(s) != 3 || len(s[0]) != 1 || len(s[1]) != 2 || len(s[2]) != 1 {
		t.Errorf("segments = %v", s)
	}
}

func sampleAxis(n int, decay float64) (z, ex, di []float64) {
	for i := 0; i <= n; i++ {
		zz := -0.2 + 0.4*float64(i)/float64(n)
		z = append(z, zz)
		ex = append(ex, 0.01/math.Pow(1+(zz/0.03)*(zz/0.03), decay))
		d := math.NaN()
		if math.Abs(zz) > 0.05 {
			d = 0.01 * math.Pow(0.03/math.Abs(zz), 2*decay)
		}
		di = append(di, d)
	}
	return
}

// Every string a figure sets uses the embedded family, with units chosen
// from the data.
func TestOnAxisText(t *testing.T) {
	z, ex, di := sampleAxis(200, 1.5)
	var c recorder.Canvas
	OnAxis("z", z, ex, di, Mark{X: 0.03, Label: "end"})(&c, 400, 240)
	var texts []string
	for _, a := range c.Actions {
		if fs, ok := a.(*recorder.FillString); ok {
			if fs.Font.Typeface != fonts.Typeface {
				t.Errorf("text %q set in %v", fs.String, fs.Font)
			}
			texts = append(texts, fs.String)
		}
	}
	all := strings.Join(texts, "|")
	// A log axis (this profile spans three decades): the ticks carry the
	// unit, the axis label none.
	for _, want := range []string{"Axial position z (mm)", "Flux density |B||Axial", "Exact (finite winding)", "Dipole approximation", "end", "|100 µT|", "|1 mT|"} {
		if !strings.Contains(all, want) {
			t.Errorf("figure text lacks %q: %s", want, all)
		}
	}
}

func TestOnAxisScale(t *testing.T) {
	// Steep decay over the range: log axis. Gentle: linear from zero.
	for _, c := range []struct {
		decay float64
		log   bool
	}{{1.5, true}, {0.2, false}} {
		z, ex, di := sampleAxis(50, c.decay)
		p, _, _ := onAxisPlot("z", z, ex, di, nil)
		_, isLog := p.Y.Scale.(plot.LogScale)
		if isLog != c.log {
			t.Errorf("decay %g: log scale %v, want %v", c.decay, isLog, c.log)
		}
	}
}

// The legend goes to a corner the curve leaves free.
func TestLegendCorner(t *testing.T) {
	// A curve rising to the right leaves the top left free.
	var x, y []float64
	for i := 0; i <= 50; i++ {
		x = append(x, float64(i))
		y = append(y, float64(i*i))
	}
	p := NewPlot("x", "y")
	segs := segments(x, y, 1, 1, false)
	l := addCurve(p, segs, lineStyle(Accent, LineWidth, nil))
	p.Legend.Add("rising", l)
	var c recorder.Canvas
	Drawer(p, segs...)(&c, 300, 200)
	if !p.Legend.Top || !p.Legend.Left {
		t.Errorf("legend top=%v left=%v, want top left", p.Legend.Top, p.Legend.Left)
	}
}

// The abscissa along a coil's axis names the axis unless it is z, in the
// coil frame's letter w.
func TestAxialLabel(t *testing.T) {
	for axis, want := range map[string]string{
		"z": "Axial position z", "": "Axial position z",
		"x":               "Axial position w along the coil's axis x",
		"−y":              "Axial position w along the coil's axis −y",
		"(0.71, 0.71, 0)": "Axial position w along the coil's axis",
	} {
		if got := AxialLabel(axis); got != want {
			t.Errorf("AxialLabel(%q) = %q, want %q", axis, got, want)
		}
	}
}

// Log-axis ticks carry engineering units; linear ones plain numbers.
func TestEngLabel(t *testing.T) {
	for _, c := range []struct {
		v    float64
		want string
	}{{1e-6, "1 µT"}, {9.999999999999999e-06, "10 µT"}, {1e-4, "100 µT"}, {1e-3, "1 mT"}, {2e-9, "2 nT"}, {1e-15, "1 fT"}} {
		if got := EngLabel(c.v, "T"); got != c.want {
			t.Errorf("EngLabel(%g) = %q, want %q", c.v, got, c.want)
		}
	}
}

// The histogram's axis takes the prefix the text gives its samples: a
// moment of 0.14–0.22 A·m² is read in mA·m², its ticks in the hundreds
// and the requirement line at 150 on that scale.
func TestHistogramPrefix(t *testing.T) {
	samples := []float64{0.1445, 0.16, 0.175, 0.19, 0.2203}
	var c recorder.Canvas
	Histogram("Magnetic moment |m|", "A·m²", samples, []float64{0.15})(&c, 400, 260)
	var texts []string
	for _, a := range c.Actions {
		if a, ok := a.(*recorder.FillString); ok {
			texts = append(texts, a.String)
		}
	}
	all := strings.Join(texts, " | ")
	if !strings.Contains(all, "Magnetic moment |m| (mA·m²)") {
		t.Errorf("axis label not in mA·m²: %s", all)
	}
	if !slices.Contains(texts, "200") {
		t.Errorf("no tick at 200 mA·m²: %s", all)
	}
}
