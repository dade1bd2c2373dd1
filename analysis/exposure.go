package analysis

import (
	"math"

	"coilmemo/calc"
)

// ACExposure is the time-varying field of one a.c.-driven coil block
// against the ICNIRP (2010) reference levels for the frequency of its
// drive (calc.ExposureReference): r.m.s. levels, compared with the coil's
// own field at its r.m.s. current (the other coils' fields are static or
// at other frequencies and are not added).
type ACExposure struct {
	Coil      int
	Frequency float64 // Hz
	// Public and Occupational are the reference levels, T r.m.s.
	Public, Occupational float64
	// Surface is the largest |B| (r.m.s.) found at the winding's outer
	// surface, T.
	Surface float64
	// PublicDistance and OccupationalDistance are the largest distances,
	// m, from the winding's outer surface at which its field still
	// reaches each level (0: below it at the surface); beyond them, all
	// round the winding, the field is below the level.
	PublicDistance, OccupationalDistance float64
}

// acExposures are the ACExposure of every block driven at a frequency
// the guidelines cover (1 Hz–10 MHz) with a current, below its
// self-resonance (above it the series model gives no current to trust).
// Each level is searched as the 0.5 mT level is (windingReaches), in the
// block's field alone.
func acExposures(d calc.Design, r calc.Results, coils []CoilStudy) []ACExposure {
	var out []ACExposure
	for i, co := range d.Coils {
		if i >= len(r.Coils) || i >= len(coils) || IsReceiver(co) || coils[i].Kinds.AboveResonance {
			continue
		}
		pub := calc.ExposureReference(co.Frequency, false)
		cr := r.Coils[i]
		if math.IsNaN(pub) || cr.Current == 0 || math.IsNaN(cr.Current) {
			continue
		}
		e := ACExposure{Coil: i, Frequency: co.Frequency, Public: pub, Occupational: calc.ExposureReference(co.Frequency, true)}
		one := calc.Design{Coils: []calc.Coil{co}, Conditions: d.Conditions}
		res := calc.Results{Coils: []calc.CoilResult{cr}}
		cs := coils[i : i+1]
		ext := reachExtent(one)
		if !(ext > 0) {
			continue
		}
		fm := implantField(one, res, cs)
		ks := conductorBounds(one, res, cs)
		pw := windingReaches(fm, one, res, cs, ext, nil, ks, e.Public)
		e.Surface, e.PublicDistance = pw[0].Surface, pw[0].Distance
		if e.Surface >= e.Occupational {
			e.OccupationalDistance = windingReaches(fm, one, res, cs, ext, nil, ks, e.Occupational)[0].Distance
		}
		out = append(out, e)
	}
	return out
}
