package memo

import "fmt"

// nestedTexts are the sentences on windings that lie in another's bore
// (analysis.Nesting): their heat balances, each taken alone, understate
// both temperatures. Only where one of the two carries power.
func (c *composer) nestedTexts() []string {
	var out []string
	r := c.j.Results.Coils
	d := c.j.Spec.Design.Coils
	for _, n := range c.j.Design.Nested {
		if n.Inner >= len(r) || n.Outer >= len(r) || !(r[n.Inner].Power > 0 || r[n.Outer].Power > 0) {
			continue
		}
		in, outer := d[n.Inner].Name, d[n.Outer].Name
		where := "lies in the bore of"
		if !n.Whole {
			where = "passes through the bore of"
		}
		out = append(out, fmt.Sprintf("Coil %q %s coil %q: each heat balance in this memo is that of a winding alone in the stated cooling, but the outer surface of %q faces the bore of %q across enclosed air, so the temperatures of both, those of %q most, are understated. Take them as lower bounds and confirm them by measurement.",
			in, where, outer, in, outer, in))
	}
	return out
}
