"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { sendJson } from "@/lib/client/api-request";

/** Archive: the trail leaves lists and the map; its history is kept. Asks once before acting. */
export function ArchiveTrailButton({ trailId, trailName, parkSlug }: { trailId: string; trailName: string; parkSlug: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function archive() {
    if (!window.confirm(`Archive “${trailName}”? Riders will no longer see it; its versions and files are kept.`)) return;
    setPending(true);
    const result = await sendJson("DELETE", `/api/trails/${trailId}`);
    setPending(false);
    if (!result.ok) return setError(result.error.message);
    router.push(`/parks/${parkSlug}/trails`);
  }

  return (
    <section className="card space-y-2" aria-labelledby="archive-heading">
      <h2 id="archive-heading" className="text-lg font-bold">Archive</h2>
      <p className="text-sm text-loam-600">For a trail that is decommissioned. Riders no longer see it; its versions and files stay for staff.</p>
      {error && <p role="alert" className="field-error">{error}</p>}
      <button type="button" onClick={archive} disabled={pending} className="btn border border-brick-500 bg-white text-brick-600 hover:bg-brick-100">
        {pending ? "Archiving…" : "Archive this trail"}
      </button>
    </section>
  );
}
