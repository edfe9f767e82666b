"use client";
import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";

/** How long Undo stays offered after Mark resolved, before the list drops the hazard. */
const UNDO_MS = 8_000;

type Step = { kind: "idle" } | { kind: "resolved"; lockVersion: number } | { kind: "error"; message: string };

async function patchHazard(hazardId: string, lockVersion: number, resolved: boolean): Promise<{ lockVersion: number }> {
  const response = await fetch(`/api/hazards/${hazardId}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ lockVersion, resolved }) });
  const body = (await response.json().catch(() => ({}))) as { hazard?: { lockVersion: number }; error?: { message?: string } };
  if (!response.ok || !body.hazard) throw new Error(body.error?.message ?? "Not saved.");
  return body.hazard;
}

/**
 * Marks a hazard resolved from the version this page showed (409 if someone changed it meanwhile),
 * then offers Undo for a few seconds: a slip of the thumb costs one more tap, not a new pin.
 */
export function ResolveHazardButton({ hazardId, lockVersion }: { hazardId: string; lockVersion: number }) {
  const router = useRouter();
  const [step, setStep] = useState<Step>({ kind: "idle" });
  const [pending, setPending] = useState(false);

  useEffect(() => {
    if (step.kind !== "resolved") return;
    const timer = setTimeout(() => router.refresh(), UNDO_MS);
    return () => clearTimeout(timer);
  }, [step, router]);

  async function send(resolved: boolean, from: number) {
    setPending(true);
    try {
      const hazard = await patchHazard(hazardId, from, resolved);
      setStep(resolved ? { kind: "resolved", lockVersion: hazard.lockVersion } : { kind: "idle" });
      if (!resolved) router.refresh();
    } catch (error) {
      setStep({ kind: "error", message: error instanceof TypeError ? "No connection: not saved." : (error as Error).message });
    } finally {
      setPending(false);
    }
  }

  if (step.kind === "resolved") {
    return (
      <p role="status" className="flex flex-wrap items-center gap-3 rounded-lg bg-moss-100 p-2 font-semibold text-moss-700">
        Resolved: riders no longer see it.
        <button type="button" className="btn-quiet" onClick={() => send(false, step.lockVersion)} disabled={pending}>
          Undo
        </button>
      </p>
    );
  }
  return (
    <div>
      <button type="button" className="btn-quiet" onClick={() => send(true, lockVersion)} disabled={pending}>
        Mark resolved
      </button>
      {step.kind === "error" && (
        <p role="alert" className="field-error">
          {step.message}
        </p>
      )}
    </div>
  );
}
