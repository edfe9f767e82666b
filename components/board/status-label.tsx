/**
 * A trail's status as our own sign: a waymark board with a pointed end, carrying a mark, a word
 * and a pattern, never colour alone: open ✓ on a solid board, caution ! with a broken (dashed)
 * edge, closed ✕ on a hatched board. Used by the board, the morning check and the history.
 */
import type { CSSProperties } from "react";
import { STATUS_LABELS, STATUS_SIGNS } from "@/lib/conditions/pure/labels";
import type { ReportStatus } from "@/lib/conditions/pure/schemas";

const BOARD = "polygon(0 0, calc(100% - 0.7em) 0, 100% 50%, calc(100% - 0.7em) 100%, 0 100%)";

/** Edge (the outer board) and face (the inner board, 2 px in) for each status. */
const LOOKS: Record<ReportStatus | "none", { edge: string; face: string; text: string }> = {
  open: { edge: "#2f6a2c", face: "#e3f0df", text: "text-moss-700" },
  caution: { edge: "repeating-linear-gradient(90deg, #8a5a00 0 7px, transparent 7px 11px)", face: "#fdf1d2", text: "text-loam-900" },
  closed: { edge: "#98301f", face: "repeating-linear-gradient(135deg, #f8e1dc 0 6px, #ffffff 6px 11px)", text: "text-brick-600" },
  none: { edge: "repeating-linear-gradient(90deg, #8c7b63 0 3px, transparent 3px 6px)", face: "#ffffff", text: "text-loam-600" },
};

export function StatusLabel({ status, size = "md" }: { status: ReportStatus | null; size?: "md" | "sm" }) {
  const look = LOOKS[status ?? "none"];
  const pad = size === "sm" ? "py-0.5 pl-2 pr-4 text-xs" : "py-1 pl-2.5 pr-5 text-sm";
  const shape: CSSProperties = { clipPath: BOARD };
  return (
    <span className={`relative inline-flex shrink-0 items-center gap-1 font-bold uppercase tracking-wide ${look.text} ${pad}`} style={{ ...shape, background: look.edge }} data-status={status ?? "none"}>
      <span aria-hidden="true" className="absolute inset-[2px]" style={{ ...shape, background: look.face }} />
      <span aria-hidden="true" className="relative">
        {status ? STATUS_SIGNS[status] : "?"}
      </span>
      <span className="relative">{status ? STATUS_LABELS[status] : "Not inspected"}</span>
    </span>
  );
}
