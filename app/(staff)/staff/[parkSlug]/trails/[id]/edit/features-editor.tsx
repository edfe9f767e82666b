"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/client/api-request";
import type { TrailFeatureView } from "@/lib/trails/queries";
import { ftToM, lengthUnitOf, mToFt, type DistanceSystem } from "@/lib/shared/units";
import { featureKindValues, featureSizeValues } from "@/lib/trails/pure/schemas";

type Draft = { kind: string; size: string; name: string; distance: string };

const label = (kind: string) => kind.replace("-", " ");

/** One feature's inputs; used for each recorded feature and for the "add" row. */
function FeatureInputs({ draft, onChange, idPrefix, unit }: { draft: Draft; onChange: (d: Draft) => void; idPrefix: string; unit: string }) {
  const set = (key: keyof Draft) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => onChange({ ...draft, [key]: e.target.value });
  return (
    <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
      <div>
        <label htmlFor={`${idPrefix}-kind`} className="label">Feature</label>
        <select id={`${idPrefix}-kind`} value={draft.kind} onChange={set("kind")} className="field">
          {featureKindValues.map((k) => <option key={k} value={k}>{label(k)}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor={`${idPrefix}-size`} className="label">Size</label>
        <select id={`${idPrefix}-size`} value={draft.size} onChange={set("size")} className="field">
          <option value="">not set</option>
          {featureSizeValues.map((s) => <option key={s} value={s}>{s}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor={`${idPrefix}-distance`} className="label">From start ({unit})</label>
        <input id={`${idPrefix}-distance`} value={draft.distance} onChange={set("distance")} inputMode="decimal" className="field" required />
      </div>
      <div>
        <label htmlFor={`${idPrefix}-name`} className="label">Name (optional)</label>
        <input id={`${idPrefix}-name`} value={draft.name} onChange={set("name")} maxLength={80} className="field" />
      </div>
    </div>
  );
}

/** Features along the trail: retype, resize, move (by distance from the start), delete, add. */
export function FeaturesEditor({ trailId, features, system }: { trailId: string; features: TrailFeatureView[]; system: DistanceSystem }) {
  const router = useRouter();
  const unit = lengthUnitOf(system);
  const toDisplay = (m: number) => String(Math.round(system === "imperial" ? mToFt(m) : m));
  const toMetres = (text: string) => {
    const value = Number(text.replace(",", "."));
    return text.trim() === "" || !Number.isFinite(value) ? NaN : system === "imperial" ? ftToM(value) : value;
  };
  const draftOf = (f: TrailFeatureView): Draft => ({ kind: f.kind, size: f.size ?? "", name: f.name ?? "", distance: toDisplay(f.distanceAlongM) });
  const [drafts, setDrafts] = useState<Record<string, Draft>>(() => Object.fromEntries(features.map((f) => [f.id, draftOf(f)])));
  const [adding, setAdding] = useState<Draft>({ kind: "berm", size: "", name: "", distance: "" });
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  const body = (d: Draft) => ({ kind: d.kind, size: d.size || null, name: d.name.trim() || null, distanceAlongM: toMetres(d.distance) });
  async function run(action: Promise<{ ok: boolean; error?: { message: string } }>, done: string) {
    const result = await action;
    setMessage(result.ok ? { ok: true, text: done } : { ok: false, text: result.error!.message });
    if (result.ok) router.refresh();
    return result.ok;
  }
  function invalid(d: Draft): boolean {
    if (!Number.isNaN(toMetres(d.distance))) return false;
    setMessage({ ok: false, text: `Enter the distance from the trail's start in ${unit}.` });
    return true;
  }

  return (
    <section className="card space-y-3" aria-labelledby="features-heading">
      <h2 id="features-heading" className="text-lg font-bold">Features</h2>
      {message && <p role={message.ok ? "status" : "alert"} className={`rounded-lg p-3 font-semibold ${message.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`}>{message.text}</p>}
      {features.length === 0 && <p className="text-sm text-loam-600">No features yet.</p>}
      <ul className="space-y-3">
        {features.map((f) => (
          <li key={f.id} className="rounded-lg border border-loam-200 p-3">
            <form
              className="space-y-2"
              onSubmit={(e) => {
                e.preventDefault();
                if (!invalid(drafts[f.id])) void run(sendJson("PATCH", `/api/trail-features/${f.id}`, body(drafts[f.id])), "Feature saved.");
              }}
            >
              <FeatureInputs draft={drafts[f.id] ?? draftOf(f)} onChange={(d) => setDrafts({ ...drafts, [f.id]: d })} idPrefix={`feature-${f.id}`} unit={unit} />
              <div className="flex gap-2">
                <button type="submit" className="btn-quiet">Save</button>
                <button type="button" className="btn-quiet text-brick-600" onClick={() => void run(sendJson("DELETE", `/api/trail-features/${f.id}`), "Feature deleted.")}>
                  Delete
                </button>
              </div>
            </form>
          </li>
        ))}
      </ul>
      <form
        className="space-y-2 border-t border-loam-100 pt-3"
        onSubmit={async (e) => {
          e.preventDefault();
          if (invalid(adding)) return;
          if (await run(sendJson("POST", `/api/trails/${trailId}/features`, body(adding)), "Feature added.")) setAdding({ ...adding, name: "", distance: "" });
        }}
      >
        <h3 className="font-semibold">Add a feature</h3>
        <FeatureInputs draft={adding} onChange={setAdding} idPrefix="feature-new" unit={unit} />
        <button type="submit" className="btn-primary">Add feature</button>
      </form>
    </section>
  );
}
