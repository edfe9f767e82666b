import { DIFFICULTIES } from "@/lib/trails/pure/difficulty";
import type { Difficulty } from "@/lib/trails/pure/schemas";

/**
 * The trade's difficulty sign (circle, square, diamond, double diamond) for the map's card and
 * legend. The shape carries the rating as well as the colour; the label says it in words
 * (shown, for screen readers only, or none when the words are already beside it).
 */
export function DifficultySymbol({ difficulty, size = 18, label = "hidden" }: { difficulty: Difficulty; size?: number; label?: "visible" | "hidden" | "none" }) {
  const d = DIFFICULTIES[difficulty];
  const stroke = d.outline ?? d.colour;
  const common = { fill: d.colour, stroke, strokeWidth: 1.5 };
  const shape = {
    circle: <circle cx="10" cy="10" r="7.5" {...common} />,
    square: <rect x="3" y="3" width="14" height="14" {...common} />,
    diamond: <rect x="4.5" y="4.5" width="11" height="11" transform="rotate(45 10 10)" {...common} />,
    "double-diamond": (
      <>
        <rect x="2.2" y="6" width="8" height="8" transform="rotate(45 6.2 10)" {...common} />
        <rect x="9.8" y="6" width="8" height="8" transform="rotate(45 13.8 10)" {...common} />
      </>
    ),
  }[d.symbol];
  return (
    <span className="inline-flex items-center gap-1.5" data-difficulty={difficulty}>
      <svg width={size} height={size} viewBox="0 0 20 20" aria-hidden="true" focusable="false" className="shrink-0">
        {shape}
      </svg>
      {label === "visible" && <span>{d.label}</span>}
      {label === "hidden" && <span className="sr-only">{d.label}</span>}
    </span>
  );
}
