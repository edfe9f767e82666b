"use client";
/** Applies a logged ride's suggestion to its setup's baseline (POST …/apply), then refreshes the list. */
import { useRouter } from "next/navigation";
import { useState } from "react";

export function ApplySuggestionButton({ rideLogId, label }: { rideLogId: string; label: string }) {
  const router = useRouter();
  const [state, setState] = useState<{ busy: boolean; error?: string }>({ busy: false });
  async function apply() {
    setState({ busy: true });
    try {
      const response = await fetch(`/api/me/ride-logs/${rideLogId}/apply`, { method: "POST" });
      if (!response.ok) return setState({ busy: false, error: (await response.json())?.error?.message ?? "Not applied." });
      setState({ busy: false });
      router.refresh();
    } catch {
      setState({ busy: false, error: "No connection: not applied." });
    }
  }
  return (
    <div>
      <button type="button" className="btn-quiet" onClick={apply} disabled={state.busy}>{state.busy ? "Applying…" : label}</button>
      <p role="alert" className="field-error">{state.error ?? ""}</p>
    </div>
  );
}
