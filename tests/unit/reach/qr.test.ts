import QRCode from "qrcode";
import { describe, expect, it } from "vitest";
import { QR_OPTIONS, qrSvgDataUri } from "@/lib/reach/pure/qr";

describe("trailhead QR codes", () => {
  // ISO/IEC 18004:2015 Table 7: byte-mode capacity at level M is 62 bytes for version 4 and
  // 84 for version 5; a version-V symbol is 17 + 4V modules wide (§5.3.1).
  const trailUrl = "https://loamcast.test/trails/3f1c2a9e-4b7d-4e8a-9c21-5d6f7a8b9c0d"; // 66 bytes
  it("chooses the smallest symbol that holds a trail address at level M", () => {
    const symbol = QRCode.create(trailUrl, QR_OPTIONS);
    expect(symbol.version).toBe(5);
    expect(symbol.modules.size).toBe(17 + 4 * 5);
    expect(symbol.errorCorrectionLevel.bit).toBe(0); // M is indicator 00 (§7.9.1, Table 12)
  });
  it("is an SVG data URI with the 4-module quiet zone", async () => {
    const uri = await qrSvgDataUri(trailUrl);
    expect(uri.startsWith("data:image/svg+xml;charset=utf-8,")).toBe(true);
    const svg = decodeURIComponent(uri.slice(uri.indexOf(",") + 1));
    expect(svg).toMatch(/^<svg[^>]+viewBox="0 0 45 45"/); // 37 modules + 2 × 4 quiet zone
  });
});
