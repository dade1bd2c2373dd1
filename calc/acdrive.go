package calc

// How the figures of an a.c.-driven coil relate to the true ones. A coil of
// resistance R and inductance L driven at angular frequency ω has the
// impedance |Z| = √(R² + ω²L²) ≥ R, and its a.c. resistance R_ac (skin and
// proximity effect, not modelled here) is at least the d.c. one: R_ac ≥ R
// (Terman, Radio Engineers' Handbook, 1943, §2 on high-frequency
// resistance; any text on the skin effect). Hence:
//
//   - voltage drive (rms V): I = V/|Z| ≤ V/R, so the d.c. current, and the
//     moment and field that follow it, are upper bounds; so is the d.c. heat
//     V²/R ≥ V² R_ac/(R_ac² + X²). The a.c. current computed with R is an
//     upper bound too; the a.c. heat V² R/(R² + X²) computed with R is an
//     upper bound only while X ≤ R, since d/dR [R/(R² + X²)] =
//     (X² − R²)/(R² + X²)² changes sign at R = X.
//   - current drive (rms I): the current is the same; the d.c. voltage
//     I·R ≤ I·|Z| and the heat I²R ≤ I² R_ac are lower bounds, and so are
//     the computed a.c. heat and temperature.

// Bound says how one figure compares with the true value it stands for.
type Bound int

const (
	BoundEqual Bound = iota // the same value
	BoundUpper              // at least the true value
	BoundLower              // at most the true value
	BoundNone               // may lie on either side
)

// ACBounds describes one coil block's figures under an a.c. drive.
type ACBounds struct {
	// AC is set when a drive frequency is given; the other fields hold
	// only then (all BoundEqual otherwise).
	AC bool
	// HeatAtImpedance is set when the heat balance was solved at the a.c.
	// current V/|Z(T)| (a.c. voltage drive).
	HeatAtImpedance bool
	// DCCurrent, DCVoltage and DCHeat compare the d.c. figures (ω = 0) with
	// the a.c. ones.
	DCCurrent, DCVoltage, DCHeat Bound
	// Current, Voltage and Heat compare the a.c. figures computed with the
	// d.c. resistance with the true ones (R_ac ≥ R). Heat covers the
	// power and the winding temperature.
	Current, Voltage, Heat Bound
}

// ACBoundsFor returns the bounds of a block under drive d at frequency f
// (Hz; ≤ 0 or NaN: d.c.), with resistance R and reactance X (Ω) at the
// operating point.
func ACBoundsFor(d Drive, f, R, X float64) ACBounds {
	if !(f > 0) {
		return ACBounds{}
	}
	b := ACBounds{AC: true}
	if d == VoltageDrive {
		b.HeatAtImpedance = true
		b.DCCurrent, b.DCVoltage, b.DCHeat = BoundUpper, BoundEqual, BoundUpper
		b.Current, b.Voltage, b.Heat = BoundUpper, BoundEqual, BoundUpper
		if !(X <= R) {
			b.Heat = BoundNone
		}
		return b
	}
	b.DCCurrent, b.DCVoltage, b.DCHeat = BoundEqual, BoundLower, BoundLower
	b.Current, b.Voltage, b.Heat = BoundEqual, BoundLower, BoundLower
	return b
}
