package spec

import "coilmemo/calc"

// Work bounds: what one spec may ask for, so that every accepted spec
// builds in seconds. Each is a positioned error stating the bound.
const (
	// MaxCoils is the most coil blocks a spec may hold.
	MaxCoils = 30
	// MaxProbes is the most probes a spec may hold.
	MaxProbes = 200
)

// checkWorkBounds refuses more coils, probes or turns than the bounds,
// and reports whether the spec keeps to them: the checks whose work grows
// with the coils (checkBuildable's pairs) run only on a spec that does.
func (p *parser) checkWorkBounds(coils []*coilIn) bool {
	n := len(p.diags)
	if len(coils) > MaxCoils {
		p.errf(coils[MaxCoils].fence, "more than %d coil blocks (this is block %d); a spec holds at most %d", MaxCoils, MaxCoils+1, MaxCoils)
	}
	for _, ci := range coils {
		if ci.c.Turns > calc.MaxTurns {
			p.errf(ci.lines["turns"], "coil %q: %d turns is more than %d, the most this tool lays out", ci.c.Name, ci.c.Turns, calc.MaxTurns)
		}
	}
	if n := len(p.spec.Design.Probes); n > MaxProbes {
		p.errf(1, "%d probes: a spec holds at most %d", n, MaxProbes)
	}
	return len(p.diags) == n
}
