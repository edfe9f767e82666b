import { describe, expect, it } from "vitest";
import { spreadOffsets } from "@/lib/map/pure/spread-pins";

// Checked by plane geometry: a regular n-gon whose side is s has circumradius s / (2 sin(π/n)),
// so two pins end one side (44 px, WCAG 2.2 2.5.5) apart, three on a triangle with 44 px sides.
const shown = (pins: { key: string; x: number; y: number }[], offsets: Record<string, [number, number]>) =>
  Object.fromEntries(pins.map((p) => [p.key, [p.x + offsets[p.key][0], p.y + offsets[p.key][1]]]));
const apart = (a: number[], b: number[]) => Math.hypot(a[0] - b[0], a[1] - b[1]);

describe("spreading overlapping pins (common practice, no published source)", () => {
  it("leaves pins that do not overlap where they are", () => {
    const pins = [{ key: "a", x: 0, y: 0 }, { key: "b", x: 100, y: 0 }];
    expect(spreadOffsets(pins)).toEqual({ a: [0, 0], b: [0, 0] });
  });

  it("moves two pins on one spot one target apart", () => {
    const pins = [{ key: "a", x: 50, y: 50 }, { key: "b", x: 52, y: 50 }];
    const at = shown(pins, spreadOffsets(pins));
    expect(apart(at.a, at.b)).toBeGreaterThanOrEqual(43);
    expect(apart(at.a, at.b)).toBeLessThanOrEqual(45);
  });

  it("spreads a chain of three on a ring with 44 px between neighbours", () => {
    const pins = [{ key: "a", x: 0, y: 0 }, { key: "b", x: 30, y: 0 }, { key: "c", x: 60, y: 0 }];
    const at = shown(pins, spreadOffsets(pins));
    for (const [p, q] of [["a", "b"], ["b", "c"], ["a", "c"]]) expect(apart(at[p], at[q])).toBeGreaterThanOrEqual(43);
  });
});
