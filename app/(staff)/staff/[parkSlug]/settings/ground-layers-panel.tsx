"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormNote } from "@/components/parks/park-fields";
import { sendJson, uploadForm } from "@/lib/client/api-request";
import { GROUND_LAYERS, GROUND_LAYER_INFO, GROUND_LIMITS, type GroundLayer } from "@/lib/parks/pure/ground-layers";

type LayerState = Record<GroundLayer, number>;

/** One row per ground layer: how many shapes it holds, an upload that replaces it, and a clear button. */
export function GroundLayersPanel({ parkSlug, counts }: { parkSlug: string; counts: LayerState }) {
  return (
    <section className="card space-y-3" aria-labelledby="ground-heading">
      <h2 id="ground-heading" className="text-lg font-bold">The park&apos;s ground on the map</h2>
      <p className="text-sm text-loam-700">
        Upload each layer as GeoJSON (RFC 7946, longitude and latitude in degrees), at most {GROUND_LIMITS.maxFileBytes / 1024 / 1024} MB and within {GROUND_LIMITS.maxDistanceFromParkM / 1000} km of the park&apos;s location. An upload replaces that layer at once; what it held before is kept.
      </p>
      <ul className="divide-y divide-loam-100">
        {GROUND_LAYERS.map((layer) => <LayerRow key={layer} parkSlug={parkSlug} layer={layer} count={counts[layer]} />)}
      </ul>
    </section>
  );
}

function LayerRow({ parkSlug, layer, count }: { parkSlug: string; layer: GroundLayer; count: number }) {
  const router = useRouter();
  const [note, setNote] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);
  const info = GROUND_LAYER_INFO[layer];
  const inputId = `layer-file-${layer}`;
  const url = `/api/parks/${parkSlug}/layers/${layer}`;

  async function upload(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const file = form.get("file");
    if (!(file instanceof File) || file.size === 0) return setNote({ ok: false, text: "Choose a GeoJSON file first." });
    if (file.size > GROUND_LIMITS.maxFileBytes) return setNote({ ok: false, text: `The file is larger than ${GROUND_LIMITS.maxFileBytes / 1024 / 1024} MB. Simplify it first.` });
    setPending(true);
    const result = await uploadForm<{ features: number }>(url, form, () => {}, "PUT");
    setPending(false);
    if (!result.ok) return setNote({ ok: false, text: result.error.message });
    setNote({ ok: true, text: `${info.label}: ${result.data.features} shape${result.data.features === 1 ? "" : "s"} saved and on the map.` });
    event.currentTarget?.reset();
    router.refresh();
  }

  async function clear() {
    if (!window.confirm(`Clear the ${layer} layer? What it holds is kept as a previous version.`)) return;
    setPending(true);
    const result = await sendJson("DELETE", url);
    setPending(false);
    setNote(result.ok ? { ok: true, text: `${info.label} cleared.` } : { ok: false, text: result.error.message });
    router.refresh();
  }

  return (
    <li className="space-y-2 py-3" data-testid={`layer-${layer}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-bold">{info.label}</h3>
        <span className={count ? "text-sm font-semibold text-moss-700" : "text-sm text-loam-600"}>{count ? `${count} shape${count === 1 ? "" : "s"}` : "not uploaded"}</span>
      </div>
      <p className="text-sm text-loam-700">Takes {info.takes}.</p>
      <FormNote note={note} />
      <form onSubmit={upload} className="flex flex-wrap items-center gap-2">
        <label htmlFor={inputId} className="sr-only">{info.label} file</label>
        <input id={inputId} name="file" type="file" accept=".geojson,.json,application/geo+json,application/json" className="min-w-0 flex-1 text-sm" />
        <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : count ? "Replace" : "Upload"}</button>
        {count > 0 && <button type="button" className="btn-quiet" onClick={clear} disabled={pending}>Clear</button>}
      </form>
    </li>
  );
}
