/**
 * A trail's status as a sign, a word and a border pattern, never colour alone:
 * open ✓ with a solid border, caution ! with a dashed border, closed ✕ on a hatched ground.
 */
import { STATUS_LABELS, STATUS_SIGNS } from "@/lib/conditions/pure/labels";
import type { ReportStatus } from "@/lib/conditions/pure/schemas";

const HATCH = "repeating-linear-gradient(135deg, #f8e1dc 0 6px, #ffffff 6px 11px)";

const STYLES: Record<ReportStatus, string> = {
  open: "border-2 border-solid border-moss-600 bg-moss-100 text-moss-700",
  caution: "border-2 border-dashed border-flare-500 bg-flare-100 text-loam-900",
  closed: "border-2 border-solid border-brick-600 text-brick-600",
};

export function StatusLabel({ status, size = "md" }: { status: ReportStatus | null; size?: "md" | "sm" }) {
  const pad = size === "sm" ? "px-2 py-0.5 text-xs" : "px-2.5 py-1 text-sm";
  if (!status) {
    return (
      <span className={`inline-flex items-center gap-1 rounded-md border-2 border-dotted border-loam-400 bg-white font-semibold text-loam-600 ${pad}`} data-status="none">
        <span aria-hidden="true">?</span> Not inspected
      </span>
    );
  }
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-md font-bold uppercase tracking-wide ${STYLES[status]} ${pad}`}
      style={status === "closed" ? { backgroundImage: HATCH } : undefined}
      data-status={status}
    >
      <span aria-hidden="true">{STATUS_SIGNS[status]}</span> {STATUS_LABELS[status]}
    </span>
  );
}
