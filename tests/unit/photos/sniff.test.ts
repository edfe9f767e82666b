import { describe, expect, it } from "vitest";
import { sniffPhotoFormat } from "@/lib/photos/pure/sniff";

// Signatures: JPEG SOI marker FF D8 then a marker FF (ISO/IEC 10918-1 Annex B); PNG's 8-byte
// signature (RFC 2083 §3.1; W3C PNG 3rd ed. §5.2); WebP = RIFF container with form type
// "WEBP" (RFC 9649 §2).
const bytes = (...values: (number | string)[]) =>
  Uint8Array.from(values.flatMap((v) => (typeof v === "string" ? [...v].map((c) => c.charCodeAt(0)) : [v])));

describe("photo type from content", () => {
  it("recognises JPEG, PNG and WebP signatures", () => {
    expect(sniffPhotoFormat(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0x10))).toBe("jpeg");
    expect(sniffPhotoFormat(bytes(0x89, "PNG", 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13))).toBe("png");
    expect(sniffPhotoFormat(bytes("RIFF", 0x24, 0, 0, 0, "WEBPVP8 "))).toBe("webp");
  });
  it("refuses text, GIF, a RIFF that is not WebP and truncated headers", () => {
    expect(sniffPhotoFormat(new TextEncoder().encode("just some text, named photo.jpg"))).toBeNull();
    expect(sniffPhotoFormat(bytes("GIF89a"))).toBeNull();
    expect(sniffPhotoFormat(bytes("RIFF", 0x24, 0, 0, 0, "WAVEfmt "))).toBeNull();
    expect(sniffPhotoFormat(bytes(0xff, 0xd8))).toBeNull();
    expect(sniffPhotoFormat(bytes(0x89, "PNG"))).toBeNull();
    expect(sniffPhotoFormat(new Uint8Array())).toBeNull();
  });
});
