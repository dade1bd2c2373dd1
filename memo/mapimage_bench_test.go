package memo

import (
	"bytes"
	"image"
	"image/png"
	"testing"

	"gonum.org/v1/plot/vg/recorder"

	"coilmemo/memo/pdf"
)

// BenchmarkMapImagePNG encodes the field-map images of the examples (the
// raster of each |B| map figure, captured from a recording canvas) at the
// PNG encoder's compression levels and with the memo's own encoder
// (pdf.EncodePNG: RGB, Up filter, fastest level), reporting the encoded
// size: the measurement behind memo/pdf's choice.
//
//	go test -run '^$' -bench MapImagePNG ./memo
func BenchmarkMapImagePNG(b *testing.B) {
	names, srcs := benchExamples(b)
	var imgs []image.Image
	var which []string
	for i, name := range names {
		d := Compose(benchStudy(b, name, srcs[i]))
		for _, f := range figuresOf(d.Blocks) {
			c := &recorder.Canvas{}
			f.Draw(c, f.Width, f.Height)
			for _, a := range c.Actions {
				if di, ok := a.(*recorder.DrawImage); ok && di.Image.Bounds().Dx() > 16 {
					imgs = append(imgs, di.Image)
					which = append(which, name)
				}
			}
		}
	}
	if len(imgs) == 0 {
		b.Fatal("no map images")
	}
	for _, lv := range []struct {
		name  string
		level png.CompressionLevel
	}{
		{"none", png.NoCompression},
		{"speed", png.BestSpeed},
		{"default", png.DefaultCompression},
		{"best", png.BestCompression},
	} {
		b.Run(lv.name, func(b *testing.B) {
			enc := png.Encoder{CompressionLevel: lv.level}
			var total int
			for range b.N {
				total = 0
				for _, img := range imgs {
					var buf bytes.Buffer
					if err := enc.Encode(&buf, img); err != nil {
						b.Fatal(err)
					}
					total += buf.Len()
				}
			}
			b.ReportMetric(float64(total)/1e3, "kB")
			b.ReportMetric(float64(len(imgs)), "images")
		})
	}
	b.Run("memo", func(b *testing.B) { // what the memo embeds (pdf.EncodePNG: RGB, Up filter)
		var total int
		for range b.N {
			total = 0
			for _, img := range imgs {
				out, err := pdf.EncodePNG(img)
				if err != nil {
					b.Fatal(err)
				}
				total += len(out)
			}
		}
		b.ReportMetric(float64(total)/1e3, "kB")
		b.ReportMetric(float64(len(imgs)), "images")
	})
	_ = which
}
