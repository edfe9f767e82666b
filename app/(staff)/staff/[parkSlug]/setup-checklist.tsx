import Link from "next/link";
import type { SetupItem } from "@/lib/parks/pure/setup-checklist";

/** A new park's first steps, each ticked from the park's data; shown until every one is done. */
export function SetupChecklist({ items }: { items: SetupItem[] }) {
  const done = items.filter((i) => i.done).length;
  return (
    <section className="card space-y-2" aria-labelledby="setup-heading" data-testid="setup-checklist">
      <h2 id="setup-heading" className="text-lg font-bold">Getting the park ready ({done} of {items.length} done)</h2>
      <ol className="space-y-2">
        {items.map((item) => (
          <li key={item.key} className="flex items-start gap-3" data-done={item.done}>
            <span aria-hidden className={`mt-0.5 inline-flex h-6 w-6 shrink-0 items-center justify-center rounded-full border-2 text-sm font-bold ${item.done ? "border-moss-600 bg-moss-600 text-white" : "border-loam-300"}`}>
              {item.done ? "✓" : ""}
            </span>
            <span className="min-w-0">
              {item.done ? <span className="font-semibold text-loam-600 line-through">{item.label}</span> : <Link href={item.href} className="font-semibold underline">{item.label}</Link>}
              <span className="sr-only">{item.done ? " (done)" : " (to do)"}</span>
              <span className="block text-sm text-loam-600">{item.hint}</span>
            </span>
          </li>
        ))}
      </ol>
    </section>
  );
}
