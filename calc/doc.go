// Package calc holds the physics of coilmemo: units-free SI functions for
// wire, winding, resistance, magnetic moment, field, torque, inductance and
// heating, and Evaluate, which runs them all over a Design. It does no I/O.
// Every formula's doc comment gives the equation and its published source.
package calc
