import sharp from "sharp";

/** A 3000 × 2000 photo-like JPEG (noise over a gradient) of about 1 MB. */
export async function onePhoto(): Promise<Buffer> {
  const width = 3000;
  const height = 2000;
  const noise = Buffer.alloc(width * height * 3);
  let seed = 7;
  for (let i = 0; i < noise.length; i++) {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    noise[i] = ((i / 3) % width) / 12 + (seed % 40);
  }
  for (let quality = 95; quality > 10; quality -= 5) {
    const jpeg = await sharp(noise, { raw: { width, height, channels: 3 } }).blur(1.2).jpeg({ quality }).toBuffer();
    if (jpeg.length <= 1.1 * 2 ** 20) return jpeg;
  }
  throw new Error("could not make a 1 MB photo");
}

/** The bare baseline: the same resize and thumbnail as the app, with sharp and nothing else. */
export async function bareReencode(photo: Buffer) {
  const full = await sharp(photo, { autoOrient: true }).resize({ width: 2048, height: 2048, fit: "inside", withoutEnlargement: true }).jpeg({ quality: 82 }).toBuffer();
  await sharp(full).resize({ width: 320, height: 320, fit: "inside" }).jpeg({ quality: 75 }).toBuffer();
}
