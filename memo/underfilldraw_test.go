package memo

import (
	"image/color"
	"math"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/recorder"

	"coilmemo/doc"
	"coilmemo/figures"
)

// A winding whose turns do not fill its stated radial build is drawn as
// its turns lie: the cross-section's mean diameter is that of the turns,
// the one the assumptions' radial-build note gives ("the turns' mean
// radius is 11.54 mm against the stated 12.50 mm"), and the field map
// fills only the section the turns occupy, the rest of the stated one in
// dashed outline, in the proportion of the laid to the stated build.
func TestUnderfilledDrawnAsLaid(t *testing.T) {
	meanText := regexp.MustCompile(`the turns' mean radius is ([0-9.]+) mm against the stated`)
	meanLabel := regexp.MustCompile(`^Ø ([0-9.]+) mm turns' mean$`)
	seen := 0
	for _, f := range designFiles(t) {
		j, text := memoOf(t, f, false)
		if j == nil {
			continue
		}
		under := -1
		for i := range j.Coils {
			if j.Coils[i].Underfilled {
				under = i
			}
		}
		if under < 0 || len(j.Coils) != 1 {
			continue
		}
		cs := &j.Coils[under]
		m := meanText.FindStringSubmatch(text)
		if m == nil {
			t.Errorf("%s: no mean radius of the turns in the memo's text", filepath.Base(f))
			continue
		}
		r, _ := strconv.ParseFloat(m[1], 64)
		seen++
		for _, b := range Compose(j).Blocks {
			fig, ok := b.(doc.Figure)
			if !ok {
				continue
			}
			actions := drawFigure(fig)
			switch {
			case strings.HasPrefix(fig.Caption, "Cross-section of coil"):
				found := false
				for _, s := range drawnTexts(actions) {
					if strings.HasSuffix(s, " mean") && !meanLabel.MatchString(s) {
						t.Errorf("%s: cross-section labelled %q, the stated mean", filepath.Base(f), s)
					}
					if l := meanLabel.FindStringSubmatch(s); l != nil {
						found = true
						d, _ := strconv.ParseFloat(l[1], 64)
						// the sketch's rule (TestSketchLabelsOneRule): three
						// significant figures below 100 mm, 0.1 mm from there
						res := math.Pow(10, math.Floor(math.Log10(2*r))-2)
						if 2*r >= 100 {
							res = 0.1
						}
						if math.Abs(d-2*r) > res/2+0.01 {
							t.Errorf("%s: cross-section Ø %g mm, the text's turns' mean radius %g mm (Ø %g mm)", filepath.Base(f), d, r, 2*r)
						}
					}
				}
				if !found {
					t.Errorf("%s: no mean diameter of the turns on the cross-section", filepath.Base(f))
				}
			case strings.HasPrefix(fig.Caption, "|B| of coil"):
				filled, outlined := sectionHeights(actions)
				if len(filled) == 0 || len(outlined) == 0 {
					t.Errorf("%s: map draws %d filled and %d outlined winding sections, want both", filepath.Base(f), len(filled), len(outlined))
					continue
				}
				want := (cs.Laid.R1 - cs.Laid.R0) / (cs.Envelope.R1 - cs.Envelope.R0)
				for k := range min(len(filled), len(outlined)) {
					if got := float64(filled[k] / outlined[k]); math.Abs(got-want) > 0.02 {
						t.Errorf("%s: map's winding filled over %.3f of its stated section, the turns fill %.3f", filepath.Base(f), got, want)
					}
				}
			}
		}
	}
	if seen == 0 {
		t.Error("no design whose turns do not fill the build")
	}
}

// sectionHeights are the heights of the copper-filled paths and of the
// dashed copper-edged outlines drawn, in order.
func sectionHeights(actions []recorder.Action) (filled, outlined []vg.Length) {
	var col color.Color
	dashed := false
	height := func(p vg.Path) vg.Length {
		lo, hi := vg.Length(math.Inf(1)), vg.Length(math.Inf(-1))
		for _, c := range p {
			if c.Type == vg.MoveComp || c.Type == vg.LineComp {
				lo, hi = min(lo, c.Pos.Y), max(hi, c.Pos.Y)
			}
		}
		return hi - lo
	}
	for _, a := range actions {
		switch a := a.(type) {
		case *recorder.SetColor:
			col = a.Color
		case *recorder.SetLineDash:
			dashed = len(a.Dashes) > 0
		case *recorder.Fill:
			if col == figures.Copper {
				filled = append(filled, height(a.Path))
			}
		case *recorder.Stroke:
			if dashed && col == figures.CopperEdge {
				outlined = append(outlined, height(a.Path))
			}
		}
	}
	return filled, outlined
}
