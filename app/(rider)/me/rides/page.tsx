import Link from "next/link";
import { ApplySuggestionButton } from "@/components/pressure/apply-suggestion-button";
import { getActor } from "@/lib/server/auth/actor";
import { listRideLogs } from "@/lib/setups/ride-log-queries";
import { canApply } from "@/lib/setups/pure/suggestion";
import { unitsFor } from "@/lib/accounts/units";
import { formatPressure } from "@/lib/shared/units";

export const metadata = { title: "My rides" };
export const dynamic = "force-dynamic";

const label = (symptoms: string[]) => (symptoms.length ? symptoms.map((s) => (s === "fine" ? "felt fine" : s.replace(/-/g, " "))).join(", ") : "—");

export default async function RidesPage() {
  const actor = await getActor();
  const [logs, units] = await Promise.all([listRideLogs(actor), unitsFor(actor)]);
  const p = (kPa: number) => formatPressure(kPa, units.pressure);
  return (
    <section className="space-y-4">
      <p><Link href="/me" className="font-semibold underline">My bike</Link> › Rides</p>
      <h1 className="text-3xl font-extrabold">My rides</h1>
      <Link href="/me/rides/new" className="btn-primary">Log a ride</Link>
      {logs.length === 0 ? (
        <p className="card">No rides logged yet.</p>
      ) : (
        <ul className="space-y-3" data-testid="ride-history">
          {logs.map((log) => (
            <li key={log.id} className="card space-y-1">
              <p className="text-lg font-bold">
                {log.riddenOn} · {log.setup?.name ?? "(deleted setup)"}
                {log.park && ` · ${log.park.name}`}
              </p>
              {log.trails.length > 0 && <p className="text-loam-800">{log.trails.map((t) => t.name).join(", ")}</p>}
              <p>Ran {p(log.frontKpa)} front, {p(log.rearKpa)} rear. Front: {label(log.symptoms.front)}. Rear: {label(log.symptoms.rear)}.</p>
              {log.suggestion && (
                <p className="font-semibold">
                  {log.suggestion.reason} {log.appliedAt && <span className="rounded bg-moss-100 px-2 text-sm text-moss-700">applied</span>}
                </p>
              )}
              {log.note && <p className="italic text-loam-800">“{log.note}”</p>}
              {log.setup && canApply(log, log.setup.hasBaseline) && (
                <ApplySuggestionButton rideLogId={log.id} label={log.setup.hasBaseline ? `Apply to the baseline of ${log.setup.name}` : `Make this ${log.setup.name}'s baseline`} />
              )}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
