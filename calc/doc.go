// Package calc holds the physics of coilmemo: units-free SI functions for
// wire, winding, resistance, magnetic moment, field, torque, inductance and
// heating, and Evaluate, which runs them all over a Design. It does no I/O.
// Every formula's doc comment gives the equation and its published source.
//
// Files, one concept each:
//
//	constants.go      μ0, σ, reference temperatures
//	material.go       copper (IEC 60028) and EC aluminium (IEC 60111/60889)
//	wire.go           AWG rule (ASTM B258), heavy-build estimate, R(T)
//	vec.go, frame.go  vector arithmetic; a coil's local frame
//	elliptic.go       K(m), E(m) (parameter m = k²) and cancellation-free combinations
//	loopfield.go      exact field of a circular filament
//	segment.go        straight-segment Biot–Savart; rectangular filament
//	coilfield.go      field of a coil block by superposition; FieldModel, FieldAt
//	quadrature.go     the winding cut into quadrature panels; CoilSource
//	multipole.go      exterior zonal multipole series of a circular winding, with its bound
//	solenoid.go       current-sheet field on the axis
//	dipole.go         dipole field; distance where it is within 1 % of exact
//	winding.go        turn-by-turn layout, wire length, mass, fill, surface
//	moment.go         m = I ΣA and the mean-area cross-check
//	torque.go         τ = m × B
//	force.go          forces between coaxial windings; force on a dipole
//	homogeneity.go    homogeneous region of a pair
//	inductance.go     Nagaoka/Lorenz, Wheeler, ring, Maxwell's mutual
//	rectinductance.go rectangle of round wire
//	turnsum.go        turn-by-turn inductance sums; CoilInductance
//	cells.go          coarse-grained sums for very large windings
//	thermal.go        steady temperature, runaway, hot spot inside the winding
//	convection.go     natural convection (Churchill–Chu), air properties
//	warmup.go         warm-up, time to a limit, periodic on/off state, former
//	heating.go        a coil's thermal detail for Evaluate
//	switching.go      L/R, rise time, switch-off spike, suppression
//	skin.go           skin depth, a.c. figures
//	coupling.go       mutual inductance and forces between coil blocks
//	neumannrule.go    Neumann's integral between separated windings by quadrature rules
//	seriescoupling.go the same through the first block's exterior series
//	operating.go      a coil block's electrical operating point
//	evaluate.go       Evaluate
//	limits.go         requirement checks
package calc
