"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";

/** Marks a hazard resolved, from the version this page showed (409 if someone changed it meanwhile). */
export function ResolveHazardButton({ hazardId, lockVersion }: { hazardId: string; lockVersion: number }) {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  async function resolve() {
    setPending(true);
    setMessage(null);
    try {
      const response = await fetch(`/api/hazards/${hazardId}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ lockVersion, resolved: true }) });
      if (!response.ok) setMessage(((await response.json().catch(() => ({}))) as { error?: { message?: string } }).error?.message ?? "Not saved.");
      router.refresh();
    } catch {
      setMessage("No connection: not saved.");
    } finally {
      setPending(false);
    }
  }
  return (
    <div>
      <button type="button" className="btn-quiet" onClick={resolve} disabled={pending}>
        Mark resolved
      </button>
      {message && <p role="alert" className="field-error">{message}</p>}
    </div>
  );
}
