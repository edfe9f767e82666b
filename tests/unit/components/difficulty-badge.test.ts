import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { DifficultyBadge } from "@/components/difficulty-badge";
import { DIFFICULTIES, DIFFICULTY_COLOURS } from "@/lib/trails/pure/vocabulary";
import { difficultyValues } from "@/lib/trails/pure/schemas";

// The trade's signs (IMBA Trail Difficulty Rating System): white circle, green circle, blue square,
// black diamond, double black diamond — always with a text label, never symbol or colour alone.
const shape: Record<string, RegExp> = {
  easiest: /<circle[^>]*fill="#ffffff"[^>]*stroke="#1f2937"/,
  easy: /<circle[^>]*fill="#15803d"/,
  intermediate: /<rect[^>]*fill="#1d4ed8"/,
  difficult: /^(?:(?!<path).)*<path[^>]*fill="#111827"(?:(?!<path).)*$/,
  extreme: /<path[^>]*fill="#111827"[^>]*><\/path><path[^>]*translate\(14 0\)[^>]*fill="#111827"/,
};

describe("DifficultyBadge", () => {
  it.each(difficultyValues)("%s: the sign plus its label, the symbol hidden from screen readers", (difficulty) => {
    const html = renderToStaticMarkup(createElement(DifficultyBadge, { difficulty }));
    expect(html).toContain(`>${DIFFICULTIES[difficulty].label}</span>`);
    expect(html).toContain('aria-hidden="true"');
    expect(html).toMatch(shape[difficulty]);
    expect(DIFFICULTY_COLOURS[difficulty]).toBe(DIFFICULTIES[difficulty].colour);
  });

  it("shows an unknown value as plain text", () => {
    expect(renderToStaticMarkup(createElement(DifficultyBadge, { difficulty: "mystery" }))).toBe("<span class=\"\">mystery</span>");
  });
});
