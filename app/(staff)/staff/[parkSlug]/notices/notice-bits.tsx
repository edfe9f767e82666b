import type { DeliveryCounts } from "@/lib/notices/notice-queries";
import { deliveryLine } from "@/lib/notices/pure/delivery-words";

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

export function DeliverySummary({ recipients, counts }: { recipients: number; counts: DeliveryCounts }) {
  if (recipients === 0) return <p className="text-sm text-loam-700">No subscribed riders matched; nothing was e-mailed.</p>;
  return (
    <p className="text-sm text-loam-700">
      {recipients} {recipients === 1 ? "rider" : "riders"}: <strong>{deliveryLine(counts)}</strong>
    </p>
  );
}
