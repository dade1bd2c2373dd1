package analysis

import (
	"math"

	"coilmemo/calc"
	"coilmemo/spec"
)

// Handling is the environment in which the hot-surface hazard is judged:
// where people handle and touch the coil, which need not be where it
// works (a torquer in orbit is touched on the ground).
//
//   - handling-ambient stated: the coil is judged at that ambient, the
//     nominal design and every corner of the other tolerances (an ambient
//     tolerance describes the working environment and is not applied);
//   - not stated, and the coil works in vacuum, where no one touches it:
//     at spec.HandlingRoomC (a room), likewise; the design's cooling is
//     kept, radiation alone, which in air, with convection besides, the
//     surface only undercuts;
//   - otherwise people touch the coil where it works: the nominal design
//     and every corner as computed (Service set).
type Handling struct {
	Ambient float64 // K
	Stated  bool    // handling-ambient given
	Service bool    // the working environment's results are used as they are
	// AmbientHeld says an ambient tolerance exists and is not applied (the
	// corners are taken at Ambient; Surface's corners have its bit clear).
	AmbientHeld bool
	// Nominal is each coil block's hottest surface of the nominal design
	// at Ambient, K (NaN when its heat balance has no solution), and
	// NominalCycle says its on/off cycle gives it.
	Nominal      []float64
	NominalCycle []bool
	// Surface is each coil block's hottest surface at Ambient over the
	// nominal design and the corners: Corner indexes WorstCase.Corners
	// (its ambient, when AmbientHeld, replaced by Ambient), −1 the
	// nominal design. Nil without tolerances.
	Surface []WorstSurface
}

// ambientTolerance is the index of the ambient line of the tolerances, or −1.
func ambientTolerance(t *spec.Tolerances) int {
	if t == nil {
		return -1
	}
	for i, tol := range t.Items {
		if tol.Key == "ambient" {
			return i
		}
	}
	return -1
}

// handlingFor judges the hottest surfaces of design d where people handle
// it (see Handling): nominal is the nominal design's hottest surface per
// coil block as computed (Study.Coils[i].Heat.SurfaceMax) and wc the worst
// case (nil without tolerances).
func handlingFor(d calc.Design, nominal []float64, nominalCycle []bool, wc *WorstCase) Handling {
	cond := d.Conditions
	h := Handling{Ambient: cond.HandlingAmbient, Stated: cond.HandlingAmbient > 0}
	switch {
	case h.Stated:
	case cond.Cooling.Vacuum:
		h.Ambient = calc.CelsiusToKelvin(spec.HandlingRoomC)
	default:
		h.Ambient, h.Service = cond.Ambient, true
		h.Nominal, h.NominalCycle = nominal, nominalCycle
		if wc != nil {
			h.Surface = wc.Surface
		}
		return h
	}
	at := func(x calc.Design) calc.Design {
		x.Conditions.Ambient = h.Ambient
		return x
	}
	nom := evaluateFor(at(d), nil, false, nil)
	h.Nominal, h.NominalCycle = nom.surface, nom.surfaceCycle
	if wc == nil {
		return h
	}
	amb := ambientTolerance(wc.Tolerances)
	h.AmbientHeld = amb >= 0
	var idx []int
	var designs []calc.Design
	for k, c := range wc.Corners {
		if amb >= 0 && c.High&(1<<amb) != 0 {
			continue // the same corner as the one with the ambient bit clear
		}
		idx = append(idx, k)
		designs = append(designs, at(c.Design))
	}
	evs := parallel(designs, nil, false, nil) // as the worst case's corners, at the handling ambient
	for k := range d.Coils {
		ws := WorstSurface{Max: h.Nominal[k], Corner: -1, Cycle: h.NominalCycle[k]}
		for i, ev := range evs {
			if v := ev.surface[k]; v > ws.Max || (math.IsNaN(ws.Max) && !math.IsNaN(v)) {
				ws = WorstSurface{Max: v, Corner: idx[i], Cycle: ev.surfaceCycle[k]}
			}
		}
		h.Surface = append(h.Surface, ws)
	}
	return h
}
