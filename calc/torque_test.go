package calc

import (
	"math"
	"testing"
)

// Unstated, the design angle of a vector field is the angle as designed:
// |m||B| sin θ equals |m × B| (Jackson, 3rd ed., eq. 5.71), here for
// m ∥ (1, 1, 1) and B = (20, −10, 40) µT, cos θ = 50/(√3 · √2100); a
// stated angle, or a field given as a magnitude, keeps its angle.
func TestDesignAngleAsDesigned(t *testing.T) {
	m := Vec{1, 1, 1}.Scale(0.1 / math.Sqrt(3))
	B := Vec{20e-6, -10e-6, 40e-6}
	cond := Conditions{BackgroundField: B, DesignAngle: math.Pi / 2}
	th := DesignAngle(m, cond)
	if want := math.Acos(50 / (math.Sqrt(3) * math.Sqrt(2100))); math.Abs(th-want) > 1e-12 {
		t.Errorf("θ = %.12f rad, want %.12f", th, want)
	}
	if got, want := TorqueAtAngle(m.Norm(), B.Norm(), th), m.Cross(B).Norm(); math.Abs(got/want-1) > 1e-12 {
		t.Errorf("|m||B| sin θ = %g, |m × B| = %g", got, want)
	}
	cond.DesignAngleStated, cond.DesignAngle = true, math.Pi/3
	if th := DesignAngle(m, cond); th != math.Pi/3 {
		t.Errorf("stated 60°: θ = %g", th)
	}
	cond.DesignAngleStated, cond.DesignAngle, cond.BackgroundMagnitudeOnly = false, math.Pi/2, true
	if th := DesignAngle(m, cond); th != math.Pi/2 {
		t.Errorf("magnitude only: θ = %g", th)
	}
}
