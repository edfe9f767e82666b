"use client";
import { useActionState, useState } from "react";
import { FormMessage } from "@/components/form-bits";
import { noticeFormAction, type NoticeFormState } from "@/lib/notices/notice-actions";
import type { NoticeKind } from "@/lib/notices/pure/schemas";

type Trail = { id: string; name: string; difficulty: string };
export type NoticeDraft = { kind: NoticeKind; scope: "park" | "trails"; trailIds: string[]; message: string; closedUntil: string };

const KIND_LABELS: Record<NoticeKind, string> = { closure: "Closure", reopening: "Reopening", advisory: "Advisory" };

/** Write → preview (subject, body, how many riders) → send. Changing anything asks for a new preview. */
export function NoticeForm({ parkSlug, timeZone, trails, draft }: { parkSlug: string; timeZone: string; trails: Trail[]; draft: NoticeDraft }) {
  const [state, action, pending] = useActionState(noticeFormAction, { ok: false } as NoticeFormState);
  const [fields, setFields] = useState(draft);
  const [previewedKey, setPreviewedKey] = useState<string | null>(null);
  const key = JSON.stringify(fields);
  const preview = state.preview && previewedKey === key ? state.preview : null;
  const set = (patch: Partial<NoticeDraft>) => setFields((f) => ({ ...f, ...patch }));
  const toggleTrail = (id: string) => set({ trailIds: fields.trailIds.includes(id) ? fields.trailIds.filter((t) => t !== id) : [...fields.trailIds, id] });
  const error = (name: string) => state.fieldErrors?.[name] ?? Object.entries(state.fieldErrors ?? {}).find(([k]) => k.startsWith(`${name}.`))?.[1] ?? "";

  return (
    <form action={action} className="space-y-4" onSubmit={(e) => {
      const intent = ((e.nativeEvent as SubmitEvent).submitter as HTMLButtonElement | null)?.value;
      if (intent === "preview") setPreviewedKey(key);
    }}>
      <input type="hidden" name="parkSlug" value={parkSlug} />
      <FormMessage state={state} />

      <fieldset className="card space-y-2">
        <legend className="label">What kind of notice</legend>
        <div className="flex flex-wrap gap-2">
          {(Object.keys(KIND_LABELS) as NoticeKind[]).map((kind) => (
            <label key={kind} className="btn-quiet has-[:checked]:border-moss-600 has-[:checked]:bg-moss-100">
              <input type="radio" name="kind" value={kind} checked={fields.kind === kind} onChange={() => set({ kind, closedUntil: kind === "closure" ? fields.closedUntil : "" })} className="h-5 w-5" />
              {KIND_LABELS[kind]}
            </label>
          ))}
        </div>
        <p className="field-error" aria-live="polite">{error("kind")}</p>
      </fieldset>

      <fieldset className="card space-y-2">
        <legend className="label">Which trails</legend>
        <label className="flex min-h-tap items-center gap-2">
          <input type="radio" name="scope" value="park" checked={fields.scope === "park"} onChange={() => set({ scope: "park" })} className="h-5 w-5" />
          The whole park
        </label>
        <label className="flex min-h-tap items-center gap-2">
          <input type="radio" name="scope" value="trails" checked={fields.scope === "trails"} onChange={() => set({ scope: "trails" })} disabled={trails.length === 0} className="h-5 w-5" />
          Chosen trails {trails.length === 0 && <span className="text-sm text-loam-600">(this park has no trails yet)</span>}
        </label>
        {fields.scope === "trails" && (
          <ul className="grid gap-1 pl-7 sm:grid-cols-2">
            {trails.map((trail) => (
              <li key={trail.id}>
                <label className="flex min-h-tap items-center gap-2">
                  <input type="checkbox" name="trailIds" value={trail.id} checked={fields.trailIds.includes(trail.id)} onChange={() => toggleTrail(trail.id)} className="h-5 w-5" />
                  {trail.name}
                </label>
              </li>
            ))}
          </ul>
        )}
        <p className="field-error" aria-live="polite">{error("trailIds")}</p>
      </fieldset>

      <div className="card space-y-3">
        <div>
          <label htmlFor="notice-message" className="label">Message to riders</label>
          <textarea id="notice-message" name="message" rows={5} maxLength={2000} required value={fields.message} onChange={(e) => set({ message: e.target.value })}
            aria-invalid={Boolean(error("message"))} aria-describedby="notice-message-error" className="field py-2" />
          <p id="notice-message-error" className="field-error" aria-live="polite">{error("message")}</p>
        </div>
        {fields.kind === "closure" && (
          <div>
            <label htmlFor="notice-until" className="label">Closed until (optional, park time: {timeZone})</label>
            <input id="notice-until" name="closedUntil" type="datetime-local" value={fields.closedUntil} onChange={(e) => set({ closedUntil: e.target.value })}
              aria-invalid={Boolean(error("closedUntil"))} aria-describedby="notice-until-error" className="field" />
            <p id="notice-until-error" className="field-error" aria-live="polite">{error("closedUntil")}</p>
          </div>
        )}
        <button type="submit" name="intent" value="preview" className="btn-quiet" disabled={pending}>
          {pending ? "Working…" : preview ? "Preview again" : "Preview the e-mail"}
        </button>
      </div>

      <section aria-live="polite" aria-label="Preview">
        {preview && (
          <div className="card space-y-3" data-testid="notice-preview">
            <p className="text-lg font-bold" data-testid="recipient-count">
              {preview.recipientCount === 0
                ? "No rider has a confirmed subscription that matches: the notice will be recorded, but no e-mail sent."
                : `This goes to ${preview.recipientCount} ${preview.recipientCount === 1 ? "rider" : "riders"}.`}
            </p>
            <p><span className="label inline">Subject:</span> {preview.subject}</p>
            <iframe title="E-mail preview" sandbox="" srcDoc={preview.html} className="h-72 w-full rounded border border-loam-200 bg-white" />
            <details>
              <summary className="cursor-pointer font-semibold">Plain-text version</summary>
              <pre className="mt-2 whitespace-pre-wrap rounded bg-loam-50 p-2 text-sm">{preview.text}</pre>
            </details>
            <button type="submit" name="intent" value="send" className="btn-primary w-full" disabled={pending}>
              {pending ? "Sending…" : preview.recipientCount === 0 ? "Record the notice" : `Send to ${preview.recipientCount} ${preview.recipientCount === 1 ? "rider" : "riders"}`}
            </button>
          </div>
        )}
      </section>
    </form>
  );
}
