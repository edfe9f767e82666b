"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ACCOUNT_FORM_SCHEMAS, type AccountFormSchema } from "@/lib/accounts/pure/account-forms";
import { sendJson } from "@/lib/client/api-request";

export type JsonField = { name: string; label: string; type?: string; autoComplete?: string; hint?: string; defaultValue?: string };

/**
 * An account form that sends JSON to one of our routes: checked with the route's own zod schema
 * first, errors shown beside the field the server names, typed values kept on refusal.
 */
export function JsonForm(props: {
  url: string;
  method?: "POST" | "DELETE";
  schema: AccountFormSchema;
  fields: JsonField[];
  hidden?: Record<string, string>;
  submitLabel: string;
  busyLabel: string;
  /** Where to go once it worked; without it the server's message is shown. */
  doneHref?: string;
  danger?: boolean;
  testId?: string;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const values = { ...props.hidden, ...Object.fromEntries(props.fields.map((f) => [f.name, String(new FormData(event.currentTarget).get(f.name) ?? "")])) };
    const parsed = ACCOUNT_FORM_SCHEMAS[props.schema].safeParse(values);
    if (!parsed.success) {
      const errors: Record<string, string> = {};
      for (const issue of parsed.error.issues) errors[String(issue.path[0] ?? "form")] ??= issue.message;
      setFieldErrors(errors);
      setMessage({ ok: false, text: "Check the highlighted fields." });
      return;
    }
    setBusy(true);
    const result = await sendJson<{ message?: string } | null>(props.method ?? "POST", props.url, parsed.data);
    setBusy(false);
    if (!result.ok) {
      setFieldErrors(result.error.field ? { [result.error.field]: result.error.message } : {});
      setMessage({ ok: false, text: result.error.message });
      return;
    }
    setFieldErrors({});
    if (props.doneHref) {
      router.push(props.doneHref);
      router.refresh();
      return;
    }
    setMessage({ ok: true, text: result.data?.message ?? "Done." });
  }

  return (
    <form onSubmit={onSubmit} className="card space-y-3" noValidate data-testid={props.testId}>
      {message && (
        <p role={message.ok ? "status" : "alert"} className={`rounded-lg p-3 font-semibold ${message.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`}>
          {message.text}
        </p>
      )}
      {props.fields.map((field) => {
        const id = `${props.testId ?? props.schema}-${field.name}`;
        const error = fieldErrors[field.name];
        return (
          <div key={field.name}>
            <label htmlFor={id} className="label">{field.label}</label>
            <input id={id} name={field.name} type={field.type ?? "text"} autoComplete={field.autoComplete} defaultValue={field.defaultValue} aria-invalid={Boolean(error)} aria-describedby={`${id}-note`} className="field" />
            <p id={`${id}-note`} className={error ? "field-error" : "mt-1 text-sm text-loam-600"} aria-live="polite">{error ?? field.hint ?? ""}</p>
          </div>
        );
      })}
      <button type="submit" className={props.danger ? "btn-danger w-full" : "btn-primary w-full"} disabled={busy}>
        {busy ? props.busyLabel : props.submitLabel}
      </button>
    </form>
  );
}
