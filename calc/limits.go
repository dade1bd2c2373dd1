package calc

import "math"

// LimitValue returns the computed value, SI, of a quantity named in
// LimitQuantities, over all coils of r: moment |Σ m| (A·m²), field-center
// |B(0)| (T), power Σ average power (W), temperature the hottest steady
// winding (K, absolute — a requirement in °C is compared after conversion
// to K by the reader), current, voltage, resistance (hot), wire-length and
// current-density (A/m²) the largest over the coil blocks, mass the total
// (kg), inductance the largest (H), torque TorqueMax (N·m). A quantity that
// is unknown for any coil (NaN, e.g. a runaway temperature) makes the value
// NaN; an unknown name gives NaN.
func LimitValue(q string, r Results) float64 {
	maxOf := func(f func(CoilResult) float64) float64 {
		v := math.Inf(-1)
		if len(r.Coils) == 0 {
			return 0
		}
		for _, c := range r.Coils {
			x := f(c)
			if math.IsNaN(x) {
				return math.NaN()
			}
			v = math.Max(v, x)
		}
		return v
	}
	sumOf := func(f func(CoilResult) float64) float64 {
		s := 0.0
		for _, c := range r.Coils {
			s += f(c)
		}
		return s
	}
	switch q {
	case "moment":
		return r.Moment.Norm()
	case "field-center":
		return r.FieldCentre.Norm()
	case "power":
		return sumOf(func(c CoilResult) float64 { return c.Power })
	case "temperature":
		return maxOf(func(c CoilResult) float64 { return c.Temperature })
	case "current":
		return maxOf(func(c CoilResult) float64 { return math.Abs(c.Current) })
	case "voltage":
		return maxOf(func(c CoilResult) float64 { return math.Abs(c.Voltage) })
	case "resistance":
		return maxOf(func(c CoilResult) float64 { return c.RHot })
	case "mass":
		return sumOf(func(c CoilResult) float64 { return c.Mass })
	case "wire-length":
		return maxOf(func(c CoilResult) float64 { return c.Length })
	case "current-density":
		return maxOf(func(c CoilResult) float64 { return math.Abs(c.Density) })
	case "inductance":
		return maxOf(func(c CoilResult) float64 { return c.Inductance })
	case "torque":
		return r.TorqueMax
	}
	return math.NaN()
}

// CheckLimits compares every requirement with its computed value
// (LimitValue): AtLeast passes when computed ≥ required, AtMost when
// computed ≤ required. An unknown (NaN) computed value never passes.
func CheckLimits(ls []Limit, r Results) []LimitResult {
	var out []LimitResult
	for _, l := range ls {
		v := LimitValue(l.Quantity, r)
		pass := false
		switch l.Relation {
		case AtLeast:
			pass = v >= l.Required
		case AtMost:
			pass = v <= l.Required
		}
		out = append(out, LimitResult{Limit: l, Computed: v, Pass: pass})
	}
	return out
}
