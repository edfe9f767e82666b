"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FileDrop, UploadProgress } from "@/components/file-drop";
import { uploadForm, type ApiError } from "@/lib/client/api-request";

/** Upload a new line for the trail; the earlier versions and their files are kept. */
export function ReplaceLineForm({ trailId, currentVersion }: { trailId: string; currentVersion: number }) {
  const router = useRouter();
  const [progress, setProgress] = useState<number | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [done, setDone] = useState<string[] | null>(null);

  async function replace(file: File) {
    setError(null);
    setDone(null);
    setProgress(0);
    const form = new FormData();
    form.set("file", file);
    const result = await uploadForm<{ upload: { warnings: string[] } }>(`/api/trails/${trailId}/line`, form, setProgress);
    setProgress(null);
    if (!result.ok) return setError(result.error);
    setDone(result.data.upload.warnings);
    router.refresh();
  }

  return (
    <section className="card space-y-3" aria-labelledby="line-heading">
      <h2 id="line-heading" className="text-lg font-bold">Replace the line</h2>
      <p className="text-sm text-loam-600">For a reroute or a better recording. It becomes version {currentVersion + 1}; every earlier version and its file stay available.</p>
      <FileDrop label="Drop the new GPX or GeoJSON here, or choose it" hint="Checked and measured like a new upload; features already recorded are kept." accept=".gpx,.geojson,.json" onFile={replace} disabled={progress !== null} testId="line-file" />
      {progress !== null && <UploadProgress share={progress} phase={progress >= 1 ? "processing" : "sending"} />}
      {error && <p role="alert" className="rounded-lg bg-brick-100 p-3 font-semibold text-brick-600">{error.message}</p>}
      {done && (
        <div role="status" className="rounded-lg bg-moss-100 p-3 text-moss-700">
          <p className="font-semibold">New line saved.</p>
          {done.length > 0 && <ul className="list-disc pl-5 text-sm">{done.map((w) => <li key={w}>{w}</li>)}</ul>}
        </div>
      )}
    </section>
  );
}
