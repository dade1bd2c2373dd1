package analysis

import (
	"fmt"
	"math"
	"testing"

	"coilmemo/calc"
)

// cyclicSet is three like thin loops (70 mm, 150 turns at 60 mA) on the
// x, y and z axes, centred 40 mm out along their own axes: the cyclic
// swap x → y → z → x carries each coil, with its current, onto the next
// and leaves the set as it was, so every figure of one coil's field next
// to its winding must be every other's.
const cyclicSet = "```coil\nname = loop X\nform = loop\nmean-diameter = 70 mm\nturns = 150\nwire = AWG 32\ncurrent = 60 mA\naxis = x\ncentre = (40, 0, 0) mm\n```\n" +
	"```coil\nname = loop Y\nform = loop\nmean-diameter = 70 mm\nturns = 150\nwire = AWG 32\ncurrent = 60 mA\naxis = y\ncentre = (0, 40, 0) mm\n```\n" +
	"```coil\nname = loop Z\nform = loop\nmean-diameter = 70 mm\nturns = 150\nwire = AWG 32\ncurrent = 60 mA\naxis = z\ncentre = (0, 0, 40) mm\n```\n" +
	"```conditions\nambient = 20 degC\ncooling = vacuum\nmount-resistance = 80 K/W\n```\n"

// The same set with solid windings (a 4 mm × 4 mm section, the walk of
// surfacePeak over end faces and outer side).
var cyclicSolidSet = func() string {
	s := ""
	for _, c := range [][2]string{{"x", "(40, 0, 0)"}, {"y", "(0, 40, 0)"}, {"z", "(0, 0, 40)"}} {
		s += "```coil\nname = coil " + c[0] + "\nform = loop\nmean-diameter = 70 mm\nlength = 4 mm\nradial-build = 4 mm\nturns = 40\nwire = AWG 26\ncurrent = 0.5 A\naxis = " + c[0] + "\ncentre = " + c[1] + " mm\n```\n"
	}
	return s + "```conditions\nambient = 20 degC\ncooling = vacuum\nmount-resistance = 80 K/W\n```\n"
}()

// The surface |B| does not hang on which axis a coil lies along (the
// walk of each coil's surface runs in its own frame and is climbed to
// convergence): like coils of a cyclic set have the same to 10⁻³.
func TestCyclicSetAlikePerCoil(t *testing.T) {
	for name, src := range map[string]string{"round bundles": cyclicSet, "solid windings": cyclicSolidSet} {
		st := studyOf(t, src)
		ws := st.Safety.Implant.Windings
		if len(ws) != 3 || !(ws[0].Surface > ImplantField) || !(ws[0].Distance > 0) {
			t.Fatalf("%s: windings %+v, want three reaching past 0.5 mT", name, ws)
		}
		for i, w := range ws {
			t.Logf("%s: coil %d: %.6g mT at the surface, 0.5 mT %.6g mm from it", name, i, w.Surface*1e3, w.Distance*1e3)
			if math.Abs(w.Surface/ws[0].Surface-1) > 1e-3 {
				t.Errorf("%s: coil %d: %.6g mT, %.6g mm; coil 0: %.6g mT, %.6g mm", name, i, w.Surface*1e3, w.Distance*1e3, ws[0].Surface*1e3, ws[0].Distance*1e3)
			}
		}
	}
}

// The surface |B| and the reach the caution quotes are not below an
// independent scan with the study's field: every outline's outer surface
// sampled on a grid of 72 azimuths by 40 points across its section (2880
// points, those within another coil's winding left out), and lines from
// the origin and from every winding's centre along 2000 directions of a
// Fibonacci lattice in the global frame, each searched for its farthest
// point at the level (reach) beyond where it leaves the outlines.
func TestSurfaceAndReachNotBelowScan(t *testing.T) {
	for name, src := range map[string]string{"round bundles": cyclicSet, "solid windings": cyclicSolidSet, "diagonal set": diagonalSet} {
		st := studyOf(t, src)
		d := st.Spec.Design
		fm := implantField(d, st.Results, st.Coils)
		os := outlines(d, st.Coils)
		surface := make([]float64, len(d.Coils))
		for _, o := range os {
			for j := range 72 {
				phi := float64(j) * 2 * math.Pi / 72
				radial := o.fr.E1.Scale(math.Cos(phi)).Add(o.fr.E2.Scale(math.Sin(phi)))
				for i := range 40 {
					// local (rho, z) on the outline's outer surface
					var rho, z float64
					f := (float64(i) + 0.5) / 40
					if o.round {
						rc, zc := (o.r0+o.r1)/2, (o.z0+o.z1)/2
						switch {
						case f < 0.25: // the face across the bore, one side
							rho, z = rc*f/0.25, zc-o.r
						case f < 0.75: // the rounded rim
							a := (f - 0.5) / 0.5 * math.Pi
							rho, z = rc+o.r*math.Cos(a), zc+o.r*math.Sin(a)
						default:
							rho, z = rc*(1-f)/0.25, zc+o.r
						}
					} else {
						switch {
						case f < 0.25:
							rho, z = o.r1*f/0.25, o.z0
						case f < 0.75:
							rho, z = o.r1, o.z0+(o.z1-o.z0)*(f-0.25)/0.5
						default:
							rho, z = o.r1*(1-f)/0.25, o.z1
						}
					}
					p := o.centre.Add(radial.Scale(rho)).Add(o.fr.U.Scale(z))
					if insideOther(os, o.coil, p) {
						continue
					}
					surface[o.coil] = math.Max(surface[o.coil], fm(p).Norm())
				}
			}
		}
		starts := []calc.Vec{{}}
		for _, co := range d.Coils {
			starts = append(starts, co.Centre)
		}
		ext := reachExtent(d)
		dirs := fibonacciSphere(2000)
		far := make([][]float64, len(dirs))
		eachIndex(len(dirs), func(k int) {
			far[k] = make([]float64, len(d.Coils))
			for _, c := range starts {
				u := dirs[k]
				// the last point of the line within an outline, by steps of
				// 1/400 of its sphere's radius where the line crosses it
				exit := 0.0
				for _, o := range os {
					a := o.centre.Sub(c).Dot(u)
					h2 := o.reach*o.reach - (o.centre.Sub(c).Dot(o.centre.Sub(c)) - a*a)
					if h2 <= 0 {
						continue
					}
					for s := math.Max(a-math.Sqrt(h2), 0); s <= a+math.Sqrt(h2); s += o.reach / 400 {
						if dd, _ := o.distance(c.Add(u.Scale(s))); dd == 0 {
							exit = math.Max(exit, s)
						}
					}
				}
				r := reach(fm, c, u, ImplantField, exit+ext/1000, 20*ext)
				if r == 0 {
					continue
				}
				if dd, i, _ := nearestOutline(os, c.Add(u.Scale(r))); i >= 0 {
					far[k][i] = math.Max(far[k][i], dd)
				}
			}
		})
		for i, w := range st.Safety.Implant.Windings {
			scan := 0.0
			for k := range dirs {
				scan = math.Max(scan, far[k][i])
			}
			msg := fmt.Sprintf("%s: coil %d: surface %.6g mT (scan %.6g), reach %.6g mm (scan %.6g)", name, i, w.Surface*1e3, surface[i]*1e3, w.Distance*1e3, scan*1e3)
			t.Log(msg)
			if surface[i] > 0 && w.Surface < surface[i]*(1-1e-3) {
				t.Error(msg + ": surface below the scan")
			}
			if w.Distance < scan*(1-1e-3) {
				t.Error(msg + ": reach below the scan")
			}
		}
	}
}
