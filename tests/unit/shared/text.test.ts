import { describe, expect, it } from "vitest";
import { nameSchema } from "@/lib/accounts/pure/schemas";
import { nameProblem } from "@/lib/shared/text";
import { trailNameSchema } from "@/lib/trails/pure/schemas";

describe("what a name may hold", () => {
  it("accepts letters of any script, accents, emoji and emoji sequences joined by U+200D", () => {
    for (const name of ["Crête du Lièvre", "Gnarly 🐗 29er", "家族 👨‍👩‍👧 ride", "O'Brien-Smith", "Loop\u200Bline"]) expect(nameProblem(name), name).toBeNull();
  });

  it("refuses control characters, line breaks and NUL (PostgreSQL text cannot hold U+0000)", () => {
    for (const name of ["a\u0000b", "a\nb", "a\r\nBcc: x@evil.example", "a\tb", "a\u0085b", "a\u2028b", "a\u007Fb"]) expect(nameProblem(name), JSON.stringify(name)).toMatch(/control|line break/);
  });

  it("refuses the explicit directional formatting characters of Unicode UAX #9 §2 (LRE…RLO, LRI…PDI)", () => {
    for (const code of [0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069]) {
      expect(nameProblem(`abc${String.fromCodePoint(code)}def`)).toMatch(/text-direction/);
    }
  });

  it("refuses a name with nothing visible in it", () => {
    expect(nameProblem("\u200B\u200C\u200D")).toMatch(/visible/);
  });

  it("the account and trail name schemas use the check and name the field in the message", () => {
    expect(nameSchema.safeParse("Ada \u202Enimda").error?.issues[0].message).toBe("Your name contains a text-direction control character.");
    expect(trailNameSchema.safeParse("Lower\r\nLoop").error?.issues[0].message).toBe("The name contains a line break or a control character.");
    expect(trailNameSchema.parse("  Lower Loop  ")).toBe("Lower Loop");
  });
});
