package calc

import (
	"math"
	"strings"
)

// Thermal runaway, one definition for every drive: a coil block runs away
// when its heat balance has no steady solution, or when the steady state
// that exists lies above the temperature its winding may reach — the
// insulation class when one is given, else the conductor's own limit
// (ConductorLimit). A block that settles, but above that limit, is flagged
// besides (SettledAboveLimit), so that "no steady state" and "a steady
// state too hot for the insulation" can be told apart. The same holds for
// the periodic state of an on/off cycle, whose peak is then judged.

// Freezing points of the conductors on the International Temperature Scale
// of 1990 (Preston-Thomas, "The International Temperature Scale of 1990
// (ITS-90)", Metrologia 27 (1990) 3–10, Table 1, defining fixed points):
// aluminium 933.473 K (660.323 °C), copper 1357.77 K (1084.62 °C).
const (
	AluminiumFreezingPoint = 933.473
	CopperFreezingPoint    = 1357.77
)

// ConductorLimit returns the highest temperature, K, a winding of the given
// conductor can have at all: its freezing (melting) point on ITS-90 for
// copper and aluminium, NaN for a conductor of another name. Long before
// it, the linear resistance law and every insulation have failed; it is
// the limit only of a coil that states no insulation class.
func ConductorLimit(m Material) float64 {
	switch strings.ToLower(m.Name) {
	case "copper":
		return CopperFreezingPoint
	case "aluminium", "aluminum":
		return AluminiumFreezingPoint
	}
	return math.NaN()
}

// ThermalLimit returns the temperature, K, against which coil c's steady
// or cyclic hot spot is judged for runaway: its insulation class when
// given, else ConductorLimit of its conductor (NaN when neither is known).
func ThermalLimit(c Coil) float64 {
	if c.InsulationClass > 0 && !math.IsInf(c.InsulationClass, 0) {
		return c.InsulationClass
	}
	return ConductorLimit(c.Wire.Material)
}

// ThermalVerdict is the runaway judgement of one coil block.
type ThermalVerdict struct {
	// Limit is the temperature judged against, K (ThermalLimit).
	Limit float64
	// Runaway: no steady (or periodic) state at or below Limit, or the
	// heat balance has no solution at all.
	Runaway bool
	// NoSolution: the heat balance (or the periodic cycle) has no steady
	// solution below the search bound — the winding heats without end.
	NoSolution bool
	// SettledAboveLimit: a steady (or periodic) state exists, but its hot
	// spot lies above Limit. Runaway is then set too.
	SettledAboveLimit bool
	// AboveMelting: that state's hot spot lies above the conductor's
	// melting point (ConductorLimit), where the heat balance is an
	// extrapolation past the winding's end; Melting is that point, K (NaN
	// for a conductor of another name).
	AboveMelting bool
	Melting      float64
}

// WithMelting returns v with the melting point of conductor m and whether
// the hot spot (K) of a settled state lies above it.
func (v ThermalVerdict) WithMelting(m Material, hot float64) ThermalVerdict {
	v.Melting = ConductorLimit(m)
	v.AboveMelting = v.SettledAboveLimit && hot > v.Melting
	return v
}

// Judge returns the verdict for a block whose heat balance settled (hot
// spot, K) or not (settled false; noSolution says the balance has none, as
// against unusable data) with the given limit.
func Judge(limit, hot float64, settled, noSolution bool) ThermalVerdict {
	v := ThermalVerdict{Limit: limit, NoSolution: noSolution && !settled}
	if v.NoSolution {
		v.Runaway = true
		return v
	}
	if settled && hot > limit {
		v.Runaway, v.SettledAboveLimit = true, true
	}
	return v
}
