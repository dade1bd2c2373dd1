package pdf

import (
	"bytes"
	"compress/zlib"
	"encoding/binary"
	"hash/crc32"
	"image"
)

// EncodePNG is the encoding of the images the memo embeds (for the
// benchmarks of package memo).
func EncodePNG(img image.Image) ([]byte, error) { return encodePNG(img) }

// encodePNG encodes an image for the PDF. An opaque NRGBA image (the |B|
// maps' rasters) is written directly as 8-bit RGB with the Up filter on
// every row (PNG, ISO/IEC 15948:2004, §9.2: each byte less the byte above
// it) and zlib's fastest level. The maps' rasters, interpolated from a
// smooth field, compress under Up to the size image/png reaches with its
// per-row choice among the five filters (528 kB against 528 kB for the
// examples' nine rasters, BenchmarkMapImagePNG in package memo, where Sub
// gives 614 kB and Average 592 kB) in 56 % of its time. Any other image
// goes through image/png at BestSpeed.
func encodePNG(img image.Image) ([]byte, error) {
	if m, ok := img.(*image.NRGBA); ok && opaque(m) {
		return encodeOpaqueNRGBA(m)
	}
	var buf bytes.Buffer
	err := imageEncoder.Encode(&buf, img)
	return buf.Bytes(), err
}

// opaque reports whether every pixel of m has alpha 255.
func opaque(m *image.NRGBA) bool {
	b := m.Bounds()
	for y := b.Min.Y; y < b.Max.Y; y++ {
		row := m.Pix[m.PixOffset(b.Min.X, y):m.PixOffset(b.Max.X, y)]
		for i := 3; i < len(row); i += 4 {
			if row[i] != 0xff {
				return false
			}
		}
	}
	return true
}

// encodeOpaqueNRGBA writes m as an RGB PNG, Up-filtered.
func encodeOpaqueNRGBA(m *image.NRGBA) ([]byte, error) {
	b := m.Bounds()
	w, h := b.Dx(), b.Dy()
	var out bytes.Buffer
	out.WriteString("\x89PNG\r\n\x1a\n")
	var ihdr [13]byte
	binary.BigEndian.PutUint32(ihdr[0:], uint32(w))
	binary.BigEndian.PutUint32(ihdr[4:], uint32(h))
	ihdr[8], ihdr[9] = 8, 2 // 8 bits a sample, truecolour; deflate, adaptive filtering, no interlace
	writeChunk(&out, "IHDR", ihdr[:])

	var idat bytes.Buffer
	zw, err := zlib.NewWriterLevel(&idat, zlib.BestSpeed)
	if err != nil {
		return nil, err
	}
	line := make([]byte, 1+3*w) // filter byte, then the row's differences
	line[0] = 2                 // Up
	prev := make([]byte, 3*w)   // the row above, RGB (zero above the first)
	for y := b.Min.Y; y < b.Max.Y; y++ {
		px := m.Pix[m.PixOffset(b.Min.X, y):]
		for x := range w {
			for c := range 3 {
				v := px[4*x+c]
				line[1+3*x+c] = v - prev[3*x+c]
				prev[3*x+c] = v
			}
		}
		if _, err := zw.Write(line); err != nil {
			return nil, err
		}
	}
	if err := zw.Close(); err != nil {
		return nil, err
	}
	writeChunk(&out, "IDAT", idat.Bytes())
	writeChunk(&out, "IEND", nil)
	return out.Bytes(), nil
}

// writeChunk appends a PNG chunk: length, type, data and the CRC-32 of
// type and data.
func writeChunk(out *bytes.Buffer, typ string, data []byte) {
	var n [4]byte
	binary.BigEndian.PutUint32(n[:], uint32(len(data)))
	out.Write(n[:])
	crc := crc32.NewIEEE()
	crc.Write([]byte(typ))
	crc.Write(data)
	out.WriteString(typ)
	out.Write(data)
	binary.BigEndian.PutUint32(n[:], crc.Sum32())
	out.Write(n[:])
}
