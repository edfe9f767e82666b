/**
 * After a morning check closes or reopens trails, staff are offered a notice with the text
 * already written. The notices page reads kind, trailIds (comma-separated) and message from the query.
 */
import type { ReportStatus } from "./vocabulary";

export type NoticeTrail = { id: string; name: string; reason: string | null };
export type StatusChange = NoticeTrail & { from: ReportStatus | null; to: ReportStatus };
export type OfferedNoticeKind = "closure" | "reopening";

/** Which notice a change calls for: a trail newly closed, or a closed trail no longer closed. Anything else (kept closed, open to caution) calls for none. */
export function noticeKindFor(change: Pick<StatusChange, "from" | "to">): OfferedNoticeKind | null {
  if (change.to === "closed" && change.from !== "closed") return "closure";
  if (change.from === "closed" && change.to !== "closed") return "reopening";
  return null;
}

export function noticeMessage(kind: OfferedNoticeKind, parkName: string, trails: NoticeTrail[]): string {
  const lines = trails.map((t) => (kind === "closure" ? `${t.name} is closed${t.reason ? `: ${t.reason}` : ""}.` : `${t.name} is open again.`));
  return `${parkName}: ${lines.join(" ")}`;
}

export function noticeHref(kind: OfferedNoticeKind, parkSlug: string, parkName: string, trails: NoticeTrail[]): string {
  // Trail ids are UUIDs (no characters to escape), so the commas stay readable.
  const ids = trails.map((t) => encodeURIComponent(t.id)).join(",");
  const message = encodeURIComponent(noticeMessage(kind, parkName, trails));
  return `/staff/${encodeURIComponent(parkSlug)}/notices/new?kind=${kind}&trailIds=${ids}&message=${message}`;
}

export const closureNoticeHref = (parkSlug: string, parkName: string, trails: NoticeTrail[]) => noticeHref("closure", parkSlug, parkName, trails);

/** The notices a saved check offers: one link per kind, or null when nothing called for it. */
export function offeredNotices(parkSlug: string, parkName: string, changes: StatusChange[]): Record<OfferedNoticeKind, string | null> {
  const of = (kind: OfferedNoticeKind) => changes.filter((c) => noticeKindFor(c) === kind);
  const link = (kind: OfferedNoticeKind) => (of(kind).length ? noticeHref(kind, parkSlug, parkName, of(kind)) : null);
  return { closure: link("closure"), reopening: link("reopening") };
}
