import type { DeliveryCounts } from "@/lib/notices/notice-queries";

/** Small shared pieces of the notice pages. Status is always written out, never colour alone. */
const KIND_STYLE: Record<string, string> = {
  closure: "bg-brick-100 text-brick-600",
  reopening: "bg-moss-100 text-moss-700",
  advisory: "bg-flare-100 text-loam-800",
};
const KIND_TEXT: Record<string, string> = { closure: "Closure", reopening: "Reopening", advisory: "Advisory" };

export function KindLabel({ kind }: { kind: string }) {
  return <span className={`rounded px-2 py-0.5 text-xs font-bold uppercase tracking-wide ${KIND_STYLE[kind] ?? ""}`}>{KIND_TEXT[kind] ?? kind}</span>;
}

export const STATE_TEXT: Record<string, string> = { queued: "queued", sending: "sending", retrying: "retrying", sent: "sent", failed: "failed" };

export function DeliverySummary({ recipients, counts }: { recipients: number; counts: DeliveryCounts }) {
  if (recipients === 0) return <p className="text-sm text-loam-700">No subscribed riders matched; nothing was e-mailed.</p>;
  const waiting = counts.queued + counts.sending + counts.retrying;
  return (
    <p className="text-sm text-loam-700">
      {recipients} {recipients === 1 ? "rider" : "riders"}: <strong>{counts.sent} sent</strong>
      {waiting > 0 && <>, {waiting} on the way</>}
      {counts.failed > 0 && <>, <strong className="text-brick-600">{counts.failed} failed</strong></>}
    </p>
  );
}
