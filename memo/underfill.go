package memo

import (
	"fmt"

	"coilmemo/analysis"
	"coilmemo/calc"
)

// buildText is the one form of a winding's radial build and of the depth
// its turns fill, in every sentence, on the cross-section's label (three
// figures, as every length on a sketch) and for a sized build in the
// Design selection: "949 µm", "2.00 mm", "2.90 mm".
func buildText(v float64) string { return Eng(v, "m", 3) }

// laidWords qualifies a formula's dimensions as those of the turns as
// laid, for a winding that does not fill its stated radial build; "" for
// one that does.
func laidWords(cs *analysis.CoilStudy) string {
	if !cs.Underfilled {
		return ""
	}
	return fmt.Sprintf(" of the turns as laid (they fill the inner %s of the stated %s radial build)",
		buildText(cs.Laid.R1-cs.Laid.R0), buildText(cs.Envelope.R1-cs.Envelope.R0))
}

// underfillText is page 1's sentence on a coil whose turns fill less of
// its stated radial build than it says, with the copper fill factor of
// the section the turns occupy and of the stated section (statedFill), or
// "".
func underfillText(co calc.Coil, cs *analysis.CoilStudy, statedFill float64) string {
	if !cs.Underfilled {
		return ""
	}
	laid, stated := cs.Laid.R1-cs.Laid.R0, cs.Envelope.R1-cs.Envelope.R0
	return fmt.Sprintf("The turns of coil %q fill only the inner %s (%s %%) of its %s radial build: copper fill factor %s of the section they occupy, %s of the stated section.",
		co.Name, buildText(laid), Sig(100*laid/stated, 2), buildText(stated), Sig(cs.LaidFill, 2), Sig(statedFill, 2))
}
