import { STATUS_LOOKS, type TrailStatusKey } from "@/lib/map/pure/status";

/**
 * A short sample of a status's line pattern, drawn with the same dash lengths (in line widths) as
 * the map, so the legend, card and list show exactly what the map shows.
 */
export function StatusSwatch({ status, width = 44, colour = "#342b21" }: { status: TrailStatusKey; width?: number; colour?: string }) {
  const look = STATUS_LOOKS[status];
  const strokeWidth = 4 * look.widthScale;
  const dash = look.dasharray?.map((x) => x * strokeWidth).join(" ");
  return (
    <svg width={width} height="12" viewBox={`0 0 ${width} 12`} aria-hidden="true" focusable="false" className="shrink-0" data-status-swatch={status}>
      <line x1={strokeWidth} y1="6" x2={width - strokeWidth} y2="6" stroke={colour} strokeWidth={strokeWidth} strokeLinecap={look.lineCap} strokeDasharray={dash} />
    </svg>
  );
}

/** Pattern and word together: how a status is always shown. */
export function StatusBadge({ status }: { status: TrailStatusKey }) {
  return (
    <span className="inline-flex items-center gap-2 font-semibold" data-status={status}>
      <StatusSwatch status={status} width={32} />
      {STATUS_LOOKS[status].label}
    </span>
  );
}
