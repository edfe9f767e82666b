/**
 * After a check closes trails, staff are offered a notice with the text already written.
 * The notices page reads kind, trailIds (comma-separated) and message from the query.
 */
export type ClosedTrail = { id: string; name: string; reason: string | null };

export function closureNoticeMessage(parkName: string, trails: ClosedTrail[]): string {
  const lines = trails.map((t) => `${t.name} is closed${t.reason ? `: ${t.reason}` : ""}.`);
  return `${parkName}: ${lines.join(" ")}`;
}

export function closureNoticeHref(parkSlug: string, parkName: string, trails: ClosedTrail[]): string {
  // Trail ids are UUIDs (no characters to escape), so the commas stay readable.
  const ids = trails.map((t) => encodeURIComponent(t.id)).join(",");
  const message = encodeURIComponent(closureNoticeMessage(parkName, trails));
  return `/staff/${encodeURIComponent(parkSlug)}/notices/new?kind=closure&trailIds=${ids}&message=${message}`;
}
