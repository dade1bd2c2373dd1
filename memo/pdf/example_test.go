package pdf

import (
	"fmt"
	"math"
	"os"
	"testing"
	"time"

	"coilmemo/doc"
	"coilmemo/figures"
)

// sampleField returns z, exact and dipole on-axis flux density for a
// fictional solenoid (radius R, length L, N turns, current I).
func sampleField() (z, exact, dipole []float64) {
	const (
		mu0 = 4e-7 * math.Pi
		R   = 0.025
		L   = 0.06
		N   = 400
		I   = 1.5
	)
	n := N / L
	m := N * I * math.Pi * R * R
	for i := 0; i <= 240; i++ {
		zz := -0.3 + 0.6*float64(i)/240
		a := (zz + L/2) / math.Hypot(zz+L/2, R)
		b := (zz - L/2) / math.Hypot(zz-L/2, R)
		z = append(z, zz)
		exact = append(exact, mu0*n*I/2*(a-b))
		d := math.NaN()
		if math.Abs(zz) > 0.05 {
			d = mu0 * m / (2 * math.Pi * math.Pow(math.Abs(zz), 3))
		}
		dipole = append(dipole, d)
	}
	return
}

func sampleMoments() figures.BarGroups {
	return figures.BarGroups{Groups: []string{"X coil", "Y coil", "Z coil"}, Series: []string{"mx", "my", "mz"},
		Values: [][]float64{{0.21, 0.004, 0}, {-0.003, 0.2, 0.01}, {0, 0, 0.19}}, YName: "Moment component", Unit: "A·m²"}
}

// exampleDocument builds a memo using every block type. extra adds that
// many further sections of filler so the document grows by pages.
func exampleDocument(extra int) *doc.Document {
	z, ex, di := sampleField()
	d := &doc.Document{
		Meta: doc.Meta{
			Title:    "Calibration solenoid CS-40 — field and thermal check",
			Subject:  "Design verification of a bench calibration solenoid",
			Author:   "R. Okafor",
			Keywords: "solenoid, magnetic field, calibration",
			DocID:    "CM-2024-0117",
			Revision: "B",
			Created:  time.Date(2024, 5, 14, 9, 30, 0, 0, time.UTC),
		},
	}
	add := func(b ...doc.Block) { d.Blocks = append(d.Blocks, b...) }
	add(doc.TitleBlock{
		Title: "Calibration solenoid CS-40 — field and thermal check",
		Fields: [][2]string{
			{"Client", "Northmoor Sensor Works (fictional)"},
			{"Project", "Magnetometer calibration rig, bay 3"},
			{"Document", "CM-2024-0117"},
			{"Revision", "B"},
			{"Date", "2024-05-14"},
			{"Status", "Issued for review"},
			{"Prepared by", "R. Okafor"},
			{"Checked by", "L. Brandt"},
		},
	})
	add(doc.Heading{Level: 1, Text: "Summary of results"})
	add(doc.Paragraph{Spans: []doc.Span{
		{Text: "The solenoid produces "},
		{Text: "B₀ = 12.57 mT", Strong: true},
		{Text: " at its centre with I = 1.5 A, and the winding settles at "},
		{Text: "ϑ = 61 °C", Strong: true},
		{Text: " in still air at 25 °C. The field falls below 0.5 mT at |z| ≥ 92 mm on the axis. Coil constant k = B₀/I = 8.38 mT·A⁻¹; resistance R₂₀ = 4.71 Ω; µ₀ = 4π × 10⁻⁷ H/m. "},
		{Text: "All limits are met", Emph: true},
		{Text: " except the surface temperature, which needs a guard (see "},
		{Text: "limits.surface", Code: true},
		{Text: ")."},
	}})
	add(doc.Table{
		Caption: "Limits compliance",
		Header:  []string{"Quantity", "Computed", "Limit", "Status"},
		Align:   []doc.Align{doc.Left, doc.Right, doc.Right, doc.Center},
		Rows: [][]doc.Cell{
			{{Text: "Centre flux density B₀"}, {Text: "12.57 mT"}, {Text: "≥ 10 mT"}, {Status: doc.Pass}},
			{{Text: "Field homogeneity over ±10 mm"}, {Text: "0.84 %"}, {Text: "≤ 1 %"}, {Status: doc.Pass}},
			{{Text: "Winding temperature ϑ"}, {Text: "61 °C"}, {Text: "≤ 105 °C (class A)"}, {Status: doc.Pass}},
			{{Text: "Surface temperature"}, {Text: "58 °C"}, {Text: "≤ 50 °C touchable"}, {Status: doc.Fail}},
			{{Text: "Switch-off voltage (no snubber)"}, {Text: "41 V"}, {Text: "≤ 50 V"}, {Status: doc.Warn, Text: "CHECK"}},
		},
	})
	add(doc.Callout{Severity: doc.Warning, Title: "Hot surface",
		Spans: []doc.Span{{Text: "The outer layer reaches 58 °C after 40 min. Fit the perforated guard before energising, and label the enclosure. Local codes and licensed practice govern the final installation."}}})
	add(doc.Heading{Level: 1, Text: "Inputs"})
	add(doc.Heading{Level: 2, Text: "As given"})
	add(doc.Code{Text: "coil:\n  inner_radius: 25 mm\n  length: 60 mm\n  turns: 400\n  wire: 0.56 mm enamelled copper, grade 2\ndrive:\n  current: 1.5 A DC\n  supply: 12 V bench unit with a very long comment line that certainly does not fit inside the box width and must wrap"})
	add(doc.Heading{Level: 2, Text: "Normalised to SI"})
	add(doc.List{Ordered: true, Items: [][]doc.Block{
		{doc.Text("Inner radius a = 0.025 m; length ℓ = 0.060 m.")},
		{doc.Text("Turns N = 400 in 8 layers of 50; mean turn length 0.171 m."),
			doc.List{Items: [][]doc.Block{
				{doc.Text("Layer pitch 0.59 mm (grade 2 build).")},
				{doc.Text("Packing factor 0.78, checked against the measured outer diameter of the wound sample, which came out at 59.6 mm with a spread of ±0.2 mm over five readings.")},
			}}},
		{doc.Text("Current I = 1.5 A (DC), ambient ϑₐ = 25 °C.")},
	}})
	add(doc.Heading{Level: 1, Text: "Assumptions"})
	add(doc.List{Items: [][]doc.Block{
		{doc.Paragraph{Spans: []doc.Span{{Text: "Thin-wire model", Strong: true}, {Text: ": each turn is a circular filament at the wire centre."}}}},
		{doc.Paragraph{Spans: []doc.Span{{Text: "Dipole approximation", Strong: true}, {Text: " is used only for |z| > 2ℓ, where its error is below 3 %."}}}},
		{doc.Text("DC operation; no eddy currents in the former.")},
	}})
	add(doc.Callout{Severity: doc.Note, Title: "Validity",
		Spans: []doc.Span{{Text: "The thermal model holds for 20–40 °C ambient and natural convection; forced air needs a new estimate."}}})
	add(doc.Heading{Level: 1, Text: "Method"})
	add(doc.Paragraph{Spans: []doc.Span{{Text: "The winding resistance "}, {Text: `R_{20}`, Math: true},
		{Text: " follows from the wire length "}, {Text: `\ell_w`, Math: true}, {Text: " and the conductor area "},
		{Text: `A = \pi d^2/4`, Math: true}, {Text: "; the field of one turn of radius "}, {Text: `r_i`, Math: true},
		{Text: " on its axis is "}, {Text: `\frac{\mu_0 I r_i^2}{2 (r_i^2 + z^2)^{3/2}}`, Math: true}, {Text: "."}}})
	add(doc.Equation{Label: "4.1", Description: "Resistance at 20 °C", Result: true, Lines: []string{
		`R_{20} = \frac{\rho_{20}\,\ell_w}{A}`,
		`= \frac{1.7241×10⁻⁸\,\unit{Ω·m} \cdot 68.4\,\unit{m}}{0.2463\,\unit{mm^2}}`,
		`= 4.788\,\unit{Ω}`}})
	add(doc.Equation{Label: "4.2", Description: "Field at the centre, summed over every turn (elliptic integrals reduce to this on the axis)", Result: true, Lines: []string{
		`B_0 = \sum_{i=1}^{N} \frac{\mu_0 I r_i^2}{2 \left( r_i^2 + z_i^2 \right)^{3/2}}`,
		`= 12.57\,\unit{mT}`}})
	add(doc.Equation{Label: "4.3", Description: "Steady winding temperature: heat balance with convection and radiation", Lines: []string{
		`I^2 R(T) \cdot \delta = h A_s (T - T_a) + \varepsilon \sigma A_s \left( T^4 - T_a^4 \right)`,
		`R(T) = R_{20} \left[ 1 + \alpha_{20} (T - 20\,\unit{°C}) \right]`}})
	add(doc.Equation{Label: "4.4", Description: "Dipole far field", Lines: []string{
		`\vec{B} = \frac{\mu_0}{4\pi} \, \frac{3 (\vec{m} \cdot \hat{r}) \hat{r} - \vec{m}}{r^3}`,
		`\tau = |\vec{m} \times \vec{B}| = m B \sin\theta`}})
	add(doc.Equation{Label: "4.5", Description: "Roots, brackets and bars", Lines: []string{
		`k = \sqrt{\frac{4 a r}{(a + r)^2 + z^2}} \quad \bar{D} = \frac{D_i + D_o}{2} \quad \left[ \frac{a}{b} \right] \left\{ x \right\} \left| \frac{1}{x} \right| \sqrt[3]{x}`}})
	add(doc.Equation{Description: "Bad notation falls back to its source", Lines: []string{`x = \frac{1}{`}})
	add(doc.Heading{Level: 1, Text: "Field on the axis"})
	add(doc.Paragraph{Spans: []doc.Span{{Text: "Figure 1 compares the exact on-axis solution with the dipole far-field approximation. The two agree within 3 % beyond |z| = 120 mm."}}})
	add(doc.Figure{Number: 1, Caption: "Axial flux density |B| against position z; exact solution and dipole approximation.",
		Width: 440, Height: 250, Draw: figures.OnAxis("z", z, ex, di,
			figures.Mark{X: -0.03, Label: "winding end"}, figures.Mark{X: 0.03, Label: "winding end"}, figures.Mark{X: 0.092, Label: "0.5 mT"}),
		Summary: "on-axis field"})
	add(doc.Heading{Level: 2, Text: "Moments of a coil set"})
	add(doc.Figure{Number: 2, Caption: "Moment of each coil of a three-axis set by its components.", Width: 360, Height: 200,
		Draw: figures.GroupedBars(sampleMoments())})
	add(doc.Heading{Level: 1, Text: "Verification"})
	rows := [][]doc.Cell{}
	for i := 0; i < 48; i++ {
		st := doc.Pass
		if i%11 == 7 {
			st = doc.Warn
		}
		rows = append(rows, []doc.Cell{
			{Text: fmt.Sprintf("z = %d mm", i*5)},
			{Text: fmt.Sprintf("%.4g mT", 12.57*math.Exp(-float64(i)/9))},
			{Text: fmt.Sprintf("%.4g mT", 12.57*math.Exp(-float64(i)/9)*(1+0.0004*float64(i)))},
			{Text: fmt.Sprintf("%.2f %%", 0.04*float64(i))},
			{Status: st},
		})
	}
	add(doc.Table{
		Caption: "Closed form against numerical Biot–Savart integration along the axis",
		Header:  []string{"Position", "Closed form", "Numerical", "Difference", "Status"},
		Align:   []doc.Align{doc.Left, doc.Right, doc.Right, doc.Right, doc.Center},
		Rows:    rows,
	})
	add(doc.Heading{Level: 1, Text: "Safety cautions"})
	add(doc.Callout{Severity: doc.Caution, Title: "Implanted medical devices",
		Spans: []doc.Span{{Text: "Keep persons with implanted devices outside the 0.5 mT contour, 92 mm from the coil centre on the axis."}}})
	for i := 0; i < extra; i++ {
		add(doc.Heading{Level: 1, Text: fmt.Sprintf("Appendix section %d", i+1)})
		for k := 0; k < 6; k++ {
			add(doc.Text("Filler text for growing the document: the winding resistance at temperature follows R(ϑ) = R₂₀·(1 + α·(ϑ − 20 °C)) with α = 3.93 × 10⁻³ K⁻¹; the dissipated power P = I²·R rises with it, and the steady state balances P against h·A·Δϑ with h ≈ 9 W·m⁻²·K⁻¹ for natural convection from a horizontal cylinder."))
		}
	}
	add(doc.PageBreak{})
	add(doc.Heading{Level: 1, Text: "Record"})
	add(doc.Table{Header: []string{"Item", "Value"}, Widths: []float64{1, 3}, Rows: [][]doc.Cell{
		{{Text: "Spec file", Strong: true}, {Text: "cs40.md"}},
		{{Text: "SHA-256", Strong: true}, {Text: "9f2c4e0b7d51a3c8e6f09b1d2a7c4e5f8a0b3c6d9e2f5a8b1c4d7e0f3a6b9c2d"}},
		{{Text: "Tool", Strong: true}, {Text: "coilmemo (development build)"}},
	}})
	return d
}

// TestExample renders the example document; with COILMEMO_PDF_OUT set it
// also writes the file there for inspection.
func TestExample(t *testing.T) {
	b, err := Render(exampleDocument(0))
	if err != nil {
		t.Fatal(err)
	}
	if out := os.Getenv("COILMEMO_PDF_OUT"); out != "" {
		if err := os.WriteFile(out, b, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	t.Logf("example: %d bytes", len(b))
}
