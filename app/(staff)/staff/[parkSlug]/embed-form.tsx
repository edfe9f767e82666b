"use client";
import { useActionState, useState } from "react";
import { FormMessage } from "@/components/form-bits";
import { saveEmbedOriginsAction } from "@/lib/reach/embed-actions";
import { initialFormState } from "@/lib/shared/form-state";

/** The park's own website: the card's snippet, the feed's address, and which sites may frame the card. */
export function EmbedForm({ parkSlug, origins, snippet, feedUrl, canEdit }: { parkSlug: string; origins: string[]; snippet: string; feedUrl: string; canEdit: boolean }) {
  const [state, action, pending] = useActionState(saveEmbedOriginsAction, initialFormState);
  const error = state.fieldErrors?.origins;
  // Controlled, so the form reset React does after an action never replaces what the manager typed
  // meanwhile (an uncontrolled field reset to the refused text when it landed after the next keystrokes).
  const [text, setText] = useState(origins.join("\n"));
  return (
    <form action={action} className="card space-y-3">
      <h2 className="text-lg font-bold">On your own website</h2>
      <p className="text-sm text-loam-700">Paste this where the status card should show. It refreshes itself every five minutes.</p>
      <label htmlFor="embed-snippet" className="label">Status card snippet</label>
      <textarea id="embed-snippet" readOnly value={snippet} rows={3} className="input min-h-0 py-2 font-mono text-xs" />
      <p className="text-sm text-loam-700">
        Developers can read the same status as JSON: <code className="break-all">{feedUrl}</code>
      </p>
      {canEdit && (
        <>
          <FormMessage state={state} />
          <input type="hidden" name="parkSlug" value={parkSlug} />
          <label htmlFor="embed-origins" className="label">Websites allowed to show the card</label>
          <textarea
            id="embed-origins"
            name="origins"
            rows={3}
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder="https://www.example.org"
            aria-describedby="embed-origins-hint embed-origins-error"
            aria-invalid={Boolean(error)}
            className="input min-h-0 py-2"
          />
          <p id="embed-origins-hint" className="text-sm text-loam-600">One per line, like https://www.example.org. Other websites cannot frame the card.</p>
          <p id="embed-origins-error" className="field-error" aria-live="polite">{error ?? ""}</p>
          <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : "Save websites"}</button>
        </>
      )}
    </form>
  );
}
