/**
 * What a file really is, from its first bytes (its "magic number"), whatever its name says.
 * JPEG: FF D8 FF (ISO/IEC 10918-1 SOI marker, then a marker); PNG: the 8-byte signature of
 * RFC 2083 §3.1; WebP: a RIFF container whose form type is "WEBP" (RFC 9649 §2).
 */
export type PhotoFormat = "jpeg" | "png" | "webp";

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

export function sniffPhotoFormat(bytes: Uint8Array): PhotoFormat | null {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return "jpeg";
  if (bytes.length >= 8 && PNG_SIGNATURE.every((b, i) => bytes[i] === b)) return "png";
  const ascii = (from: number, to: number) => String.fromCharCode(...bytes.subarray(from, to));
  if (bytes.length >= 12 && ascii(0, 4) === "RIFF" && ascii(8, 12) === "WEBP") return "webp";
  return null;
}
