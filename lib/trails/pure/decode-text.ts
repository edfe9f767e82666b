import { AppError } from "@/lib/shared/errors";

/**
 * Bytes to text. UTF-8 (with or without a byte-order mark) is the norm for GPX and required for
 * GeoJSON (RFC 8259); UTF-16 is accepted when a byte-order mark announces it. Invalid bytes are
 * refused rather than replaced, so nothing is silently changed.
 */
export function decodeText(bytes: Uint8Array): string {
  let encoding = "utf-8";
  if (bytes[0] === 0xff && bytes[1] === 0xfe) encoding = "utf-16le";
  else if (bytes[0] === 0xfe && bytes[1] === 0xff) encoding = "utf-16be";
  try {
    // TextDecoder drops the byte-order mark itself (ignoreBOM defaults to false).
    return new TextDecoder(encoding, { fatal: true }).decode(bytes);
  } catch {
    throw new AppError(422, "The file is not valid UTF-8 text. Save or export it again as UTF-8.", "file");
  }
}
