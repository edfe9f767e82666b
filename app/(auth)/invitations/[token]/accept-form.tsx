"use client";
import { useActionState } from "react";
import { Field, FormMessage } from "@/components/form-bits";
import { acceptInvitationAction } from "@/lib/accounts/actions";
import { initialFormState } from "@/lib/shared/form-state";

/** `ask`: a new password for a new (or never proven) account, the existing password, or nothing when signed in as it. */
export function AcceptInvitationForm({ token, ask }: { token: string; ask: "new-password" | "current-password" | "nothing" }) {
  const [state, action, pending] = useActionState(acceptInvitationAction, initialFormState);
  return (
    <form action={action} className="card space-y-3">
      <FormMessage state={state} />
      <input type="hidden" name="token" value={token} />
      <Field name="name" label="Your name" autoComplete="name" required state={state} />
      {ask === "new-password" && (
        <Field name="password" label="Choose a password" type="password" autoComplete="new-password" required state={state} hint="At least 8 characters; common passwords are refused." />
      )}
      {ask === "current-password" && <Field name="password" label="Your account's password" type="password" autoComplete="current-password" required state={state} />}
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Joining…" : "Join the team"}
      </button>
    </form>
  );
}
