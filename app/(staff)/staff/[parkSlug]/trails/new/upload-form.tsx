"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ElevationProfile } from "@/components/elevation-profile";
import { FileDrop, UploadProgress } from "@/components/file-drop";
import { TrailFiguresList } from "@/components/trail-figures";
import { TrailMetadataFields, type MetadataValues } from "@/components/trail-metadata-fields";
import { uploadForm, type ApiError } from "@/lib/client/api-request";
import type { UploadPreview } from "@/lib/trails/preview";
import { TRAIL_LIMITS } from "@/lib/trails/pure/limits";
import { formatDistance, type DistanceSystem } from "@/lib/shared/units";

const ACCEPT = ".gpx,.geojson,.json,application/gpx+xml,application/geo+json";
const MB = 1024 * 1024;

type Stage =
  | { step: "empty" }
  | { step: "sending"; share: number; phase: "sending" | "processing"; purpose: "preview" | "save" }
  | { step: "previewed" }
  | { step: "refused"; error: ApiError };

const sizeOf = (bytes: number) => (bytes < 1024 ? `${bytes} bytes` : bytes < MB ? `${(bytes / 1024).toFixed(0)} KB` : `${(bytes / MB).toFixed(1)} MB`);
const baseName = (filename: string) => filename.replace(/\.[^.]+$/, "").replace(/[-_]+/g, " ").trim().slice(0, 80);

/** Choose a file → see what Loamcast measured → adjust the details → save. Nothing is stored before "Save trail". */
export function TrailUploadForm({ parkSlug, system }: { parkSlug: string; system: DistanceSystem }) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [stage, setStage] = useState<Stage>({ step: "empty" });
  const [preview, setPreview] = useState<UploadPreview | null>(null);
  const [values, setValues] = useState<MetadataValues>({ name: "", difficulty: "intermediate", kind: "flow", direction: "downhill" });
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const busy = stage.step === "sending";

  const send = <T,>(url: string, form: FormData, purpose: "preview" | "save") => {
    setStage({ step: "sending", share: 0, phase: "sending", purpose });
    return uploadForm<T>(url, form, (share) => setStage({ step: "sending", share, phase: share >= 1 ? "processing" : "sending", purpose }));
  };

  async function choose(chosen: File) {
    setFile(chosen);
    setPreview(null);
    setFieldErrors({});
    if (chosen.size > TRAIL_LIMITS.maxFileBytes) {
      setStage({ step: "refused", error: { message: `The file is ${(chosen.size / MB).toFixed(1)} MB; the limit is ${TRAIL_LIMITS.maxFileBytes / MB} MB. Thin the recording and upload it again.`, field: "file" } });
      return;
    }
    const form = new FormData();
    form.set("file", chosen);
    const result = await send<{ preview: UploadPreview }>(`/api/parks/${parkSlug}/trails/preview`, form, "preview");
    if (!result.ok) return setStage({ step: "refused", error: result.error });
    const p = result.data.preview;
    setPreview(p);
    setValues((v) => ({ ...v, name: p.name ?? baseName(chosen.name), difficulty: p.suggestedDifficulty ?? v.difficulty }));
    setStage({ step: "previewed" });
  }

  async function save(event: React.FormEvent) {
    event.preventDefault();
    if (!file) return;
    const form = new FormData();
    form.set("file", file);
    for (const [key, value] of Object.entries(values)) form.set(key, value);
    setFieldErrors({});
    const result = await send<{ trail: { id: string } }>(`/api/parks/${parkSlug}/trails`, form, "save");
    if (result.ok) return router.push(`/trails/${result.data.trail.id}`);
    if (result.error.field && result.error.field !== "file") {
      setFieldErrors({ [result.error.field]: result.error.message });
      return setStage({ step: "previewed" });
    }
    setStage({ step: "refused", error: result.error });
  }

  return (
    <div className="space-y-4">
      <FileDrop
        label="Drop a GPX or GeoJSON file here, or choose one"
        hint={`Up to ${TRAIL_LIMITS.maxFileBytes / MB} MB and ${TRAIL_LIMITS.maxPoints.toLocaleString("en-US")} points. Nothing is saved until you press “Save trail”.`}
        accept={ACCEPT}
        onFile={choose}
        disabled={busy}
        testId="trail-file"
      />
      {file && <p className="text-sm">Chosen: <span className="font-semibold">{file.name}</span> ({sizeOf(file.size)})</p>}
      {stage.step === "sending" && <UploadProgress share={stage.share} phase={stage.phase} />}
      {stage.step === "refused" && (
        <div role="alert" className="rounded-lg bg-brick-100 p-3 text-brick-600" data-testid="upload-refused">
          <p className="font-semibold">{stage.error.message}</p>
          {stage.error.field === "file" && <p className="text-sm">Nothing was saved. Fix the file, or choose another, and it will be checked again.</p>}
        </div>
      )}

      {preview && (
        <section className="card space-y-3" aria-labelledby="preview-heading" data-testid="upload-preview">
          <h2 id="preview-heading" className="text-lg font-bold">What Loamcast measured</h2>
          <p className="text-sm text-loam-600">
            {preview.sourceFormat.toUpperCase()} · {preview.pointCount.toLocaleString("en-US")} points
            {preview.segments > 1 && ` in ${preview.segments} segments (gaps not counted)`} · {preview.features.length} feature waypoint(s)
          </p>
          <TrailFiguresList figures={preview} system={system} />
          <ElevationProfile profile={preview.profile} system={system} id="preview-profile" />
          {preview.features.length > 0 && (
            <ul className="text-sm">
              {preview.features.map((f, i) => (
                <li key={i}>{f.kind.replace("-", " ")}{f.name && ` (${f.name})`} at {formatDistance(f.distanceAlongM, system)}</li>
              ))}
            </ul>
          )}
          {preview.warnings.length > 0 && (
            <ul className="list-disc rounded-lg bg-flare-100 p-3 pl-6 text-sm">
              {preview.warnings.map((w) => <li key={w}>{w}</li>)}
            </ul>
          )}
          {preview.suggestedDifficulty && <p className="text-sm text-loam-600">The suggested rating comes from the grades alone (IMBA guide); set the rating you sign on the trail.</p>}

          <form onSubmit={save} className="space-y-3 border-t border-loam-100 pt-3">
            <TrailMetadataFields values={values} onChange={setValues} errors={fieldErrors} idPrefix="new-trail" />
            <button type="submit" className="btn-primary w-full sm:w-auto" disabled={busy}>
              {busy && stage.purpose === "save" ? "Saving…" : "Save trail"}
            </button>
          </form>
        </section>
      )}
    </div>
  );
}
