"use client";
/**
 * Create or edit a setup. The shared schema checks it here (live once the rider has tried to
 * save) and again in the route handler; whatever was typed stays put on any error, and focus
 * moves to the first field in error. "Setup saved" is shown where the rider is: beside the save
 * button after a save, at the top of the page just after a new setup opens.
 */
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import type { MassUnit, PressureUnit } from "@/lib/shared/units";
import { draftErrors, draftFromSetup, emptySetupDraft, parseSetupDraft, type DraftErrors, type SetupDraft } from "@/lib/setups/pure/setup-form";
import type { SetupInput } from "@/lib/setups/pure/setup-schema";
import { TextInput } from "./inputs";
import { SetupFields } from "./setup-fields";
import { SuspensionFields } from "./suspension-fields";

type Props = { setup?: SetupInput & { id: string; lockVersion: number }; units: { pressure: PressureUnit; mass: MassUnit }; justSaved?: boolean };
type Status = { kind: "ok" | "error"; text: string; reload?: boolean } | null;

export function SetupEditor({ setup, units, justSaved }: Props) {
  const router = useRouter();
  const [draft, setDraft] = useState<SetupDraft>(() => (setup ? draftFromSetup(setup, units) : emptySetupDraft(units)));
  const [errors, setErrors] = useState<DraftErrors>({});
  const [tried, setTried] = useState(false);
  const [status, setStatus] = useState<Status>(justSaved ? { kind: "ok", text: "Setup saved." } : null);
  const [lockVersion, setLockVersion] = useState(setup?.lockVersion ?? 0);
  const [busy, setBusy] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [statusAtTop, setStatusAtTop] = useState(Boolean(justSaved));
  const formRef = useRef<HTMLFormElement>(null);

  /** Bumped on each refused save: focus moves then, never while live re-checks run as the rider types. */
  const [refusals, setRefusals] = useState(0);
  useEffect(() => {
    if (refusals > 0) formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [refusals]);

  function change(next: SetupDraft) {
    setDraft(next);
    if (tried) {
      const result = parseSetupDraft(next);
      setErrors(result.ok ? {} : result.errors);
    }
  }

  async function send(method: string, url: string, body?: unknown) {
    setBusy(true);
    try {
      const response = await fetch(url, { method, headers: { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
      const data = response.status === 204 ? {} : await response.json();
      return { response, data };
    } finally {
      setBusy(false);
    }
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setTried(true);
    setStatusAtTop(false);
    const result = parseSetupDraft(draft);
    if (!result.ok) {
      setErrors(result.errors);
      setStatus({ kind: "error", text: "Check the highlighted fields. Nothing was saved yet." });
      setRefusals((n) => n + 1);
      return;
    }
    setErrors({});
    try {
      const { response, data } = setup
        ? await send("PATCH", `/api/me/setups/${setup.id}`, { ...result.value, lockVersion })
        : await send("POST", "/api/me/setups", result.value);
      if (response.ok) {
        if (!setup) return router.push(`/me/setups/${data.setup.id}?saved=1`);
        setLockVersion(data.setup.lockVersion);
        setStatus({ kind: "ok", text: "Setup saved." });
        router.refresh();
        return;
      }
      const field = data?.error?.field as string | undefined;
      if (field && field !== "lockVersion") {
        setErrors(draftErrors([{ path: field.split("."), message: data.error.message }], draft));
        setRefusals((n) => n + 1);
      }
      setStatus({ kind: "error", text: data?.error?.message ?? "Not saved. Try again.", reload: response.status === 409 });
    } catch {
      setStatus({ kind: "error", text: "No connection: not saved. What you typed is still here." });
    }
  }

  async function onDelete() {
    if (!setup) return;
    try {
      const { response, data } = await send("DELETE", `/api/me/setups/${setup.id}`);
      if (response.ok) return router.push("/me/setups?deleted=1");
      setStatus({ kind: "error", text: data?.error?.message ?? "Not deleted." });
    } catch {
      setStatus({ kind: "error", text: "No connection: not deleted." });
    }
  }

  const statusBox = (
    <div role={status?.kind === "error" ? "alert" : "status"} aria-live="polite" className={status ? `rounded-lg p-3 font-semibold ${status.kind === "ok" ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}` : "sr-only"}>
      {status?.text ?? ""}
      {status?.reload && (
        <button type="button" className="btn-quiet ml-2" onClick={() => window.location.reload()}>
          Reload the saved version
        </button>
      )}
    </div>
  );

  return (
    <form ref={formRef} onSubmit={onSubmit} noValidate className="space-y-4" aria-label={setup ? `Edit ${setup.name}` : "New setup"}>
      {statusAtTop && statusBox}
      <div className="card">
        <TextInput id="setup-name" label="Name" value={draft.name} onChange={(name) => change({ ...draft, name })} error={errors.name} inputMode="text" hint="For example “Trail bike, winter tyres”." />
      </div>
      <SetupFields idPrefix="setup" draft={draft} errors={errors} onChange={change} />
      <SuspensionFields draft={draft} errors={errors} onChange={change} />
      {!statusAtTop && statusBox}
      <button type="submit" className="btn-primary w-full text-lg" disabled={busy}>
        {busy ? "Saving…" : setup ? "Save changes" : "Save setup"}
      </button>
      {setup && (
        <div className="card space-y-2">
          {confirmDelete ? (
            <>
              <p className="font-semibold">Delete “{setup.name}”? Its ride logs are kept.</p>
              <div className="flex flex-wrap gap-2">
                <button type="button" className="btn bg-brick-600 text-white hover:bg-brick-500" onClick={onDelete} disabled={busy}>
                  Yes, delete it
                </button>
                <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(false)}>
                  Keep it
                </button>
              </div>
            </>
          ) : (
            <button type="button" className="btn-quiet" onClick={() => setConfirmDelete(true)}>
              Delete this setup
            </button>
          )}
        </div>
      )}
    </form>
  );
}
