/**
 * The trade's difficulty scale as a symbol plus words, so it reads without colour:
 * white circle, green circle, blue square, black diamond, double black diamond.
 */
import { DIFFICULTY_LABELS } from "@/lib/conditions/pure/labels";

const STROKE = "#221c16";

function Symbol({ difficulty }: { difficulty: string }) {
  switch (difficulty) {
    case "easiest":
      return <circle cx="10" cy="10" r="7.5" fill="#ffffff" stroke={STROKE} strokeWidth="1.5" />;
    case "easy":
      return <circle cx="10" cy="10" r="8" fill="#2e8b3d" />;
    case "intermediate":
      return <rect x="3" y="3" width="14" height="14" fill="#1f5fbf" />;
    case "difficult":
      return <path d="M10 1.5 L18.5 10 L10 18.5 L1.5 10 Z" fill="#111111" />;
    case "extreme":
      return (
        <>
          <path d="M6.5 3 L12 10 L6.5 17 L1 10 Z" fill="#111111" />
          <path d="M17.5 3 L23 10 L17.5 17 L12 10 Z" fill="#111111" />
        </>
      );
    default:
      return <circle cx="10" cy="10" r="7.5" fill="none" stroke={STROKE} strokeDasharray="2 2" />;
  }
}

export function DifficultyMark({ difficulty, showLabel = true }: { difficulty: string; showLabel?: boolean }) {
  const label = DIFFICULTY_LABELS[difficulty] ?? difficulty;
  const width = difficulty === "extreme" ? 24 : 20;
  return (
    <span className="inline-flex items-center gap-1.5" data-difficulty={difficulty}>
      <svg width={width} height="20" viewBox={`0 0 ${width} 20`} aria-hidden="true" focusable="false" className="shrink-0">
        <Symbol difficulty={difficulty} />
      </svg>
      <span className={showLabel ? "text-sm text-loam-700" : "sr-only"}>{label}</span>
    </span>
  );
}
