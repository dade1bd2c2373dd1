package memo

import (
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"coilmemo/doc"
)

// TestSketchLabelsOneRule: every length written on a winding's sketch
// (cross-section or plan, all designs) has three significant figures
// below 100 mm and a resolution of 0.1 mm from 100 mm up (so that a 4.45 mm
// build shows between two 300 mm diameters), so "12 mm" never stands
// beside "2.000 mm".
func TestSketchLabelsOneRule(t *testing.T) {
	num := regexp.MustCompile(`([0-9][0-9.]*) mm`)
	for _, f := range designFiles(t) {
		j, _ := memoOf(t, f, false)
		if j == nil {
			continue
		}
		for _, b := range Compose(j).Blocks {
			fig, ok := b.(doc.Figure)
			if !ok || !(strings.HasPrefix(fig.Caption, "Cross-section of coil") || (strings.HasPrefix(fig.Caption, "Coil ") && strings.Contains(fig.Caption, " in plan,"))) {
				continue
			}
			n := 0
			for _, text := range drawnTexts(drawFigure(fig)) {
				for _, m := range num.FindAllStringSubmatch(text, -1) {
					n++
					want := 3
					if v, err := strconv.ParseFloat(m[1], 64); err == nil && v >= 100 {
						want = 4
					}
					if sig := sigDigits(m[1]); sig != want && !(sig < want && !strings.Contains(m[1], ".") && len(m[1]) >= want) {
						t.Errorf("%s: %q on the sketch has %d significant figures", filepath.Base(f), text, sig)
					}
				}
			}
			if n == 0 {
				t.Errorf("%s: no lengths on %q", filepath.Base(f), fig.Caption)
			}
		}
	}
}

// sigDigits counts the significant figures of a decimal as written:
// "0.950" 3, "25.0" 3, "300" 1 (trailing zeros of a whole number are not
// counted).
func sigDigits(s string) int {
	d := strings.TrimLeft(strings.Replace(s, ".", "", 1), "0")
	if !strings.Contains(s, ".") {
		d = strings.TrimRight(d, "0")
	}
	return len(d)
}
