"use client";
import { useActionState } from "react";
import { Field, FormMessage } from "@/components/form-bits";
import { acceptInvitationAction } from "@/lib/accounts/actions";
import { initialFormState } from "@/lib/shared/form-state";

export function AcceptInvitationForm({ token, needsPassword }: { token: string; needsPassword: boolean }) {
  const [state, action, pending] = useActionState(acceptInvitationAction, initialFormState);
  return (
    <form action={action} className="card space-y-3">
      <FormMessage state={state} />
      <input type="hidden" name="token" value={token} />
      <Field name="name" label="Your name" autoComplete="name" required state={state} />
      {needsPassword && (
        <Field name="password" label="Choose a password" type="password" autoComplete="new-password" required state={state} hint="At least 8 characters; common passwords are refused." />
      )}
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Joining…" : "Join the team"}
      </button>
    </form>
  );
}
