package pdf

import (
	"bytes"
	"image"
	"image/color"
	"image/png"
	"math/rand/v2"
	"testing"
)

// TestEncodePNGRoundTrip: what encodePNG writes decodes with the standard
// library's PNG decoder (an independent reader of ISO/IEC 15948) to the
// pixels it was given, for opaque images (the fast path, odd sizes and a
// sub-image included) and for images with transparency (image/png).
func TestEncodePNGRoundTrip(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	mk := func(w, h int, alpha bool) *image.NRGBA {
		m := image.NewNRGBA(image.Rect(0, 0, w, h))
		for i := range m.Pix {
			m.Pix[i] = byte(rng.IntN(256))
			if i%4 == 3 && !alpha {
				m.Pix[i] = 0xff
			}
		}
		return m
	}
	big := mk(37, 23, false)
	cases := map[string]image.Image{
		"1×1":          mk(1, 1, false),
		"401×401":      mk(401, 401, false),
		"37×23":        big,
		"sub-image":    big.SubImage(image.Rect(5, 3, 30, 20)),
		"transparent":  mk(9, 7, true),
		"grey (other)": image.NewGray(image.Rect(0, 0, 4, 4)),
	}
	for name, img := range cases {
		b, err := encodePNG(img)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		got, err := png.Decode(bytes.NewReader(b))
		if err != nil {
			t.Fatalf("%s: decoding: %v", name, err)
		}
		if got.Bounds().Size() != img.Bounds().Size() {
			t.Fatalf("%s: size %v, want %v", name, got.Bounds().Size(), img.Bounds().Size())
		}
		o, g := img.Bounds().Min, got.Bounds().Min
		for y := range img.Bounds().Dy() {
			for x := range img.Bounds().Dx() {
				want := color.NRGBAModel.Convert(img.At(o.X+x, o.Y+y))
				if have := color.NRGBAModel.Convert(got.At(g.X+x, g.Y+y)); have != want {
					t.Fatalf("%s: pixel (%d, %d) is %v, want %v", name, x, y, have, want)
				}
			}
		}
	}
}
