import { DIFFICULTIES, isDifficulty, type Difficulty } from "@/lib/trails/pure/vocabulary";

const DIAMOND = "M10 1.5 18.5 10 10 18.5 1.5 10Z";

/**
 * The trade's sign for a difficulty grade, drawn in SVG: white circle, green circle, blue square,
 * black diamond, double black diamond (IMBA Trail Difficulty Rating System). Decorative on its own
 * (aria-hidden): always show it beside its words, as DifficultyBadge does. The one drawing of the
 * signs: board, map, trail list, trail page, morning check, history and legend all use it.
 */
export function DifficultySymbol({ difficulty, size = 18 }: { difficulty: Difficulty; size?: number }) {
  const d = DIFFICULTIES[difficulty];
  const stroke = d.outline ?? "none";
  const double = d.symbol === "double-diamond";
  return (
    <svg aria-hidden="true" focusable="false" viewBox={double ? "0 0 34 20" : "0 0 20 20"} height={size} width={double ? (size * 34) / 20 : size} className="shrink-0">
      {d.symbol === "circle" && <circle cx="10" cy="10" r="8" fill={d.colour} stroke={stroke} strokeWidth="1.5" />}
      {d.symbol === "square" && <rect x="2.5" y="2.5" width="15" height="15" fill={d.colour} />}
      {d.symbol === "diamond" && <path d={DIAMOND} fill={d.colour} />}
      {double && (
        <>
          <path d={DIAMOND} fill={d.colour} />
          <path d={DIAMOND} transform="translate(14 0)" fill={d.colour} />
        </>
      )}
    </svg>
  );
}

/**
 * A trail's difficulty as the sign plus its words, never the symbol or colour alone.
 * Usage: `<DifficultyBadge difficulty="intermediate" />`; `label="hidden"` keeps the words for
 * screen readers only (where they are printed beside it already), `wrap` lets a long label break
 * in narrow table cells. An unknown value shows as text only.
 */
export function DifficultyBadge({ difficulty, className = "", wrap = false, size = 18, label = "visible" }: { difficulty: Difficulty | string; className?: string; wrap?: boolean; size?: number; label?: "visible" | "hidden" }) {
  if (!isDifficulty(difficulty)) return <span className={className}>{difficulty}</span>;
  return (
    <span className={["inline-flex items-center gap-1.5", wrap ? "" : "whitespace-nowrap", className].filter(Boolean).join(" ")} data-difficulty={difficulty}>
      <DifficultySymbol difficulty={difficulty} size={size} />
      <span className={label === "hidden" ? "sr-only" : undefined}>{DIFFICULTIES[difficulty].label}</span>
    </span>
  );
}
