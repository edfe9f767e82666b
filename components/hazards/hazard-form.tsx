"use client";
/**
 * Pin a hazard: where (coordinates typed or from the phone's location, or a trail and a
 * distance along it), what, a note and up to four photos. Sent as multipart to the API;
 * the server checks and re-encodes every photo, and saves all or nothing.
 */
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { PickPointMap } from "@/components/map/pick-point-map";
import { HAZARD_KIND_LABELS } from "@/lib/conditions/pure/labels";
import type { Bounds } from "@/lib/map/pure/bounds";

type Trail = { id: string; name: string; lengthM: number };
type Where = "coordinates" | "along";
const KINDS = Object.entries(HAZARD_KIND_LABELS);

/** A typed coordinate pair, or null while either is blank or not a number. */
const typedPoint = (lon: string, lat: string) => (lon.trim() && lat.trim() && Number.isFinite(Number(lon)) && Number.isFinite(Number(lat)) ? { lon: Number(lon), lat: Number(lat) } : null);

export function HazardForm({ parkSlug, trails, mapBounds }: { parkSlug: string; trails: Trail[]; mapBounds: Bounds }) {
  const router = useRouter();
  const form = useRef<HTMLFormElement>(null);
  const [where, setWhere] = useState<Where>("coordinates");
  const [lon, setLon] = useState("");
  const [lat, setLat] = useState("");
  const [locating, setLocating] = useState<string | null>(null);
  const [result, setResult] = useState<{ ok: boolean; message: string; field?: string } | null>(null);
  const [pending, setPending] = useState(false);

  function useMyLocation() {
    if (!navigator.geolocation) return setLocating("This browser cannot share its location; type the coordinates.");
    setLocating("Finding your location…");
    navigator.geolocation.getCurrentPosition(
      (position) => {
        setLon(position.coords.longitude.toFixed(6));
        setLat(position.coords.latitude.toFixed(6));
        setLocating(`Location found (within about ${Math.round(position.coords.accuracy)} m).`);
      },
      (error) => setLocating(error.code === error.PERMISSION_DENIED ? "Location permission was refused; type the coordinates." : "Your location could not be found; type the coordinates."),
      { enableHighAccuracy: true, timeout: 15_000 },
    );
  }

  async function submit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    for (const key of [...data.keys()]) if (data.get(key) === "") data.delete(key);
    if (where === "along") {
      data.delete("lon");
      data.delete("lat");
    } else {
      data.delete("distanceAlongM");
    }
    data.delete("where");
    for (const photo of data.getAll("photos")) if (photo instanceof File && photo.size === 0) data.delete("photos");
    setPending(true);
    setResult(null);
    try {
      const response = await fetch(`/api/parks/${encodeURIComponent(parkSlug)}/hazards`, { method: "POST", body: data });
      const body = await response.json().catch(() => ({}));
      if (!response.ok) {
        setResult({ ok: false, message: body.error?.message ?? "Nothing was saved.", field: body.error?.field });
        return;
      }
      setResult({ ok: true, message: "Hazard pinned. It is on the public board now." });
      form.current?.reset();
      setLon("");
      setLat("");
      router.refresh();
    } catch {
      setResult({ ok: false, message: "No connection: nothing was saved. Try again when you have signal." });
    } finally {
      setPending(false);
    }
  }

  const fieldError = (name: string) => (result && !result.ok && result.field === name ? result.message : "");
  return (
    <form ref={form} onSubmit={submit} className="card space-y-4" encType="multipart/form-data" aria-labelledby="pin-hazard">
      <h2 id="pin-hazard" className="text-lg font-bold">
        Pin a hazard
      </h2>
      {result && (
        <p role={result.ok ? "status" : "alert"} className={`rounded-lg p-3 font-semibold ${result.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`} data-testid="hazard-result">
          {result.message}
        </p>
      )}
      <fieldset>
        <legend className="label">What</legend>
        <div className="grid grid-cols-2 gap-2">
          {KINDS.map(([value, label]) => (
            <label key={value} className="btn-quiet has-[:checked]:border-loam-900 has-[:checked]:bg-loam-800 has-[:checked]:text-white">
              <input type="radio" name="kind" value={value} required className="h-5 w-5 shrink-0" defaultChecked={value === "fallen-tree"} />
              {label}
            </label>
          ))}
        </div>
      </fieldset>
      <fieldset className="space-y-3">
        <legend className="label">Where</legend>
        <div className="grid grid-cols-2 gap-2">
          {(["coordinates", "along"] as const).map((w) => (
            <label key={w} className="btn-quiet has-[:checked]:border-loam-900 has-[:checked]:bg-loam-800 has-[:checked]:text-white">
              <input type="radio" name="where" value={w} checked={where === w} onChange={() => setWhere(w)} className="h-5 w-5 shrink-0" />
              {w === "coordinates" ? "A point" : "Along a trail"}
            </label>
          ))}
        </div>
        <div>
          <label htmlFor="hazard-trail" className="label">
            Trail {where === "coordinates" ? "(optional)" : ""}
          </label>
          <select id="hazard-trail" name="trailId" className="field" required={where === "along"} defaultValue="">
            <option value="">{where === "coordinates" ? "Not on a trail" : "Choose a trail"}</option>
            {trails.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name} ({t.lengthM} m)
              </option>
            ))}
          </select>
          <p className="field-error" aria-live="polite">{fieldError("trailId")}</p>
        </div>
        {where === "coordinates" ? (
          <div className="space-y-2">
            <PickPointMap
              parkSlug={parkSlug}
              bounds={mapBounds}
              value={typedPoint(lon, lat)}
              label="Tap the map where the hazard is; drag the pin or use the arrow keys to adjust"
              onChange={(pickedLon, pickedLat) => {
                setLon(pickedLon.toFixed(6));
                setLat(pickedLat.toFixed(6));
                setLocating(null);
              }}
            />
            <button type="button" className="btn-quiet w-full" onClick={useMyLocation}>
              Use my location
            </button>
            {locating && <p className="text-sm" aria-live="polite">{locating}</p>}
            <div className="grid grid-cols-2 gap-2">
              <div>
                <label htmlFor="hazard-lat" className="label">Latitude</label>
                <input id="hazard-lat" name="lat" inputMode="decimal" className="field" value={lat} onChange={(e) => setLat(e.target.value)} placeholder="47.3012" />
              </div>
              <div>
                <label htmlFor="hazard-lon" className="label">Longitude</label>
                <input id="hazard-lon" name="lon" inputMode="decimal" className="field" value={lon} onChange={(e) => setLon(e.target.value)} placeholder="-121.9398" />
              </div>
            </div>
            <p className="field-error" aria-live="polite">{fieldError("lon") || fieldError("lat")}</p>
          </div>
        ) : (
          <div>
            <label htmlFor="hazard-distance" className="label">Distance from the trail&apos;s start (m)</label>
            <input id="hazard-distance" name="distanceAlongM" type="number" min={0} step={1} inputMode="numeric" className="field" required />
            <p className="field-error" aria-live="polite">{fieldError("distanceAlongM")}</p>
          </div>
        )}
      </fieldset>
      <div>
        <label htmlFor="hazard-note" className="label">Note</label>
        <textarea id="hazard-note" name="note" className="field min-h-24 py-2" maxLength={1000} placeholder="What riders should do, e.g. walk the bridge" />
      </div>
      <div>
        <label htmlFor="hazard-photos" className="label">Photos (up to 4; JPEG, PNG or WebP, 8 MB each)</label>
        <input id="hazard-photos" name="photos" type="file" multiple accept="image/jpeg,image/png,image/webp" className="field py-2" />
        <p className="field-error" aria-live="polite">{fieldError("photos")}</p>
      </div>
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Sending…" : "Pin the hazard"}
      </button>
    </form>
  );
}
