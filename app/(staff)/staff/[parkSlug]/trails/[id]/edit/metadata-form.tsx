"use client";
import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { TrailMetadataFields, type MetadataValues } from "@/components/trail-metadata-fields";
import { sendJson } from "@/lib/client/api-request";

type Current = MetadataValues & { lockVersion: number };

/** Name, difficulty, kind and direction, saved with the lockVersion read; a clash shows the other person's values. */
export function TrailMetadataForm({ trailId, initial }: { trailId: string; initial: Current }) {
  const router = useRouter();
  const [values, setValues] = useState<MetadataValues>(initial);
  const [lockVersion, setLockVersion] = useState(initial.lockVersion);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [pending, setPending] = useState(false);

  // The page was refreshed after a save here (or a new line): take the server's values and version together.
  useEffect(() => {
    setValues({ name: initial.name, difficulty: initial.difficulty, kind: initial.kind, direction: initial.direction });
    setLockVersion(initial.lockVersion);
  }, [initial.lockVersion, initial.name, initial.difficulty, initial.kind, initial.direction]);

  async function save(event: React.FormEvent) {
    event.preventDefault();
    setPending(true);
    setErrors({});
    const result = await sendJson<{ trail: Current }>("PATCH", `/api/trails/${trailId}`, { ...values, lockVersion });
    setPending(false);
    if (result.ok) {
      setLockVersion(result.data.trail.lockVersion);
      setMessage({ ok: true, text: "Saved." });
      return router.refresh();
    }
    const current = (result.error.details as { current?: Current } | undefined)?.current;
    if (result.status === 409 && current) {
      setValues({ name: current.name, difficulty: current.difficulty, kind: current.kind, direction: current.direction });
      setLockVersion(current.lockVersion);
    }
    if (result.error.field) setErrors({ [result.error.field]: result.error.message });
    setMessage({ ok: false, text: result.error.message });
  }

  return (
    <form onSubmit={save} className="card space-y-3" aria-labelledby="details-heading">
      <h2 id="details-heading" className="text-lg font-bold">Details</h2>
      {message && (
        <p role={message.ok ? "status" : "alert"} className={`rounded-lg p-3 font-semibold ${message.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`}>
          {message.text}
        </p>
      )}
      <TrailMetadataFields values={values} onChange={setValues} errors={errors} idPrefix="edit-trail" />
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : "Save details"}</button>
    </form>
  );
}
