import { describe, expect, it } from "vitest";
import { reportInputSchema } from "@/lib/conditions/pure/schemas";
import { hazardNoteSchema } from "@/lib/hazards/pure/schemas";
import { noticeFields } from "@/lib/notices/pure/schemas";

/**
 * Issue #12 finding 7: the explicit directional formatting characters (Unicode UAX #9 §2.1–2.2:
 * U+202A–U+202E, U+2066–U+2069) can make public text read as something else ("Trojan Source",
 * CVE-2021-42574). Names refused them already; reasons, notes, hazard notes and notice messages now do.
 */
const BIDI = ["\u202A", "\u202B", "\u202C", "\u202D", "\u202E", "\u2066", "\u2067", "\u2068", "\u2069"];

describe.each(BIDI.map((c) => [`U+${c.codePointAt(0)!.toString(16).toUpperCase()}`, c]))("%s in public text", (_name, control) => {
  it("is refused in a report's reason and note", () => {
    expect(reportInputSchema.safeParse({ status: "closed", reason: `Washout ${control}detats` }).success).toBe(false);
    expect(reportInputSchema.safeParse({ status: "open", note: `Tacky${control}` }).success).toBe(false);
  });
  it("is refused in a hazard note and a notice message", () => {
    expect(hazardNoteSchema.safeParse(`Tree down ${control}here`).success).toBe(false);
    expect(noticeFields.safeParse({ kind: "advisory", message: `Lift ${control}closed` }).success).toBe(false);
  });
});

describe("what stays allowed", () => {
  it("accents, emoji and line breaks", () => {
    expect(reportInputSchema.parse({ status: "closed", reason: "Éboulement 🌧️\nsee map" }).reason).toBe("Éboulement 🌧️\nsee map");
    expect(hazardNoteSchema.parse("Arbre tombé")).toBe("Arbre tombé");
  });
});
