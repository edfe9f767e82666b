import sharp from "sharp";

/** Test images made here with sharp: no downloaded pictures. */
export const solidJpeg = (width = 320, height = 200, colour = "#4a7a3a") =>
  sharp({ create: { width, height, channels: 3, background: colour } }).jpeg().toBuffer();

/** A JPEG carrying EXIF (copyright, artist, a GPS position) and an orientation tag of 6 (rotate 90°). */
export const jpegWithExif = () =>
  sharp({ create: { width: 300, height: 120, channels: 3, background: "#996633" } })
    .jpeg()
    .withMetadata({
      orientation: 6,
      exif: {
        IFD0: { Copyright: "x", Artist: "Test Person" },
        IFD3: { GPSLatitudeRef: "N", GPSLatitude: "47/1 18/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "121/1 56/1 24/1" },
      },
    })
    .toBuffer();

/** Random pixels barely compress: a PNG of ~9.2 MB, over the 8 MB limit. */
export const oversizePng = () => {
  const width = 1800;
  const height = 1700;
  const raw = Buffer.alloc(width * height * 3);
  let x = 12345;
  for (let i = 0; i < raw.length; i++) {
    x = (x * 1103515245 + 12345) & 0x7fffffff;
    raw[i] = x >> 16;
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).png({ compressionLevel: 0 }).toBuffer();
};

/** 20000 × 20000 = 400 megapixels in about 1.2 MB: a decompression bomb for the pixel limit. */
export const hugeCanvasPng = () =>
  sharp({ create: { width: 20000, height: 20000, channels: 3, background: "#808080" }, limitInputPixels: false })
    .greyscale()
    .png({ compressionLevel: 6 })
    .toBuffer();
