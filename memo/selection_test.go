package memo

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/txtar"

	"coilmemo/analysis"
	"coilmemo/doc"
	"coilmemo/memo/pdf"
	"coilmemo/spec"
)

// A choice at the end of a free range is pointed out; one inside is not.
func TestEdgeText(t *testing.T) {
	s := &spec.Size{TurnsLo: 20, TurnsHi: 400, TurnsLine: 3, WireLine: 4,
		Wires:  []spec.WireChoice{{Gauge: 20}, {Gauge: 25}, {Gauge: 30}},
		Ranges: []spec.FreeRange{{Key: "radial-build", Lo: 0, Hi: 0.01}}}
	sz := &analysis.Sizing{Size: s, Chosen: analysis.Candidate{Turns: 400, WireIndex: 1, Values: []float64{0.004}}}
	if got := edgeText(sz); !strings.Contains(got, "the most turns allowed (400)") || strings.Contains(got, "wire") {
		t.Errorf("at the top of the turns: %q", got)
	}
	sz.Chosen = analysis.Candidate{Turns: 200, WireIndex: 2, Wire: spec.WireChoice{Gauge: 30}, Values: []float64{0.01}}
	if got := edgeText(sz); !strings.Contains(got, "the thinnest wire listed (AWG 30)") || !strings.Contains(got, "top of the radial build range") {
		t.Errorf("thinnest wire, full depth: %q", got)
	}
	sz.Chosen = analysis.Candidate{Turns: 200, WireIndex: 1, Values: []float64{0.004}}
	if got := edgeText(sz); got != "" {
		t.Errorf("inside every range: %q", got)
	}
}

// The sizing memo's choice table sets every value on one line (the units
// stand in the headers), and its requirements table says which
// requirement binds the choice, and the value the choice reaches on it,
// rather than one word for every row.
func TestSizingTables(t *testing.T) {
	for _, f := range []string{"../examples/torque-coil-sizing.md", "../testdata/golden/sized-torquer.txtar"} {
		t.Run(filepath.Base(f), func(t *testing.T) {
			j := sizedStudy(t, f)
			sz := j.Sizing
			if sz == nil || sz.Binding < 0 {
				t.Fatal("no sizing, or nothing binds")
			}
			d := Compose(j)
			l, err := pdf.Measure(d)
			if err != nil {
				t.Fatal(err)
			}
			choice, reqs := -1, -1
			for i, b := range d.Blocks {
				if tb, ok := b.(doc.Table); ok {
					switch {
					case strings.HasPrefix(tb.Caption, "The choice and the best choice"):
						choice = i
					case strings.HasPrefix(tb.Caption, "Requirements the choice must meet"):
						reqs = i
					}
				}
			}
			if choice < 0 || reqs < 0 {
				t.Fatal("choice or requirements table missing")
			}
			// A one-line row: the least row height of any table.
			one := math.Inf(1)
			for _, b := range l.Boxes {
				if b.Kind == "table" {
					one = math.Min(one, b.Bottom-b.Top)
				}
			}
			n := 0
			for _, b := range l.Boxes {
				if b.Block == choice && b.Kind == "table" {
					n++
					if h := b.Bottom - b.Top; h > one*1.01 {
						t.Errorf("choice table row %.1f high, a one-line row %.1f: a value wraps", h, one)
					}
				}
			}
			tb := d.Blocks[choice].(doc.Table)
			if n < len(tb.Rows)-1 { // the first row may sit in the "table start" box
				t.Errorf("%d row boxes for %d rows", n, len(tb.Rows))
			}
			for _, row := range tb.Rows {
				for _, c := range row[2:] {
					if strings.HasSuffix(c.Text, " mm") || strings.HasSuffix(c.Text, " %") {
						t.Errorf("unit %q left in a cell: it belongs in the header", c.Text)
					}
				}
			}
			rt := d.Blocks[reqs].(doc.Table)
			roles := map[string]int{}
			var bind []doc.Cell
			for _, row := range rt.Rows {
				roles[row[2].Text]++
				if row[2].Text == "binding" {
					bind = row
				}
			}
			if roles["binding"] != 1 || bind == nil {
				t.Fatalf("not one binding requirement: %v", roles)
			}
			l0 := j.Spec.Design.Limits[sz.Constraints[sz.Binding].Limit]
			want := worstValue(l0.Quantity, sz.Chosen.Quantity[sz.Binding], 4)
			if !strings.Contains(bind[0].Text, worstValue(l0.Quantity, l0.Required, 3)) || !strings.HasPrefix(bind[3].Text, want) {
				t.Errorf("binding row %q / %q, want the limit on %s and the value %s at the choice", bind[0].Text, bind[3].Text, l0.Quantity, want)
			}
			if len(roles) < 2 {
				t.Errorf("every row has the same role: %v", roles)
			}
		})
	}
}

// sizedStudy evaluates a design file, or the spec of a golden txtar.
func sizedStudy(t *testing.T, f string) *analysis.Study {
	t.Helper()
	src, err := os.ReadFile(f)
	if err != nil {
		t.Fatal(err)
	}
	if strings.HasSuffix(f, ".txtar") {
		ar := txtar.Parse(src)
		src = nil
		for _, fl := range ar.Files {
			if strings.HasSuffix(fl.Name, ".md") {
				src = fl.Data
			}
		}
	}
	j, diags := evaluate(filepath.Base(f), src)
	if len(diags) > 0 {
		t.Fatal(diags)
	}
	return j
}
