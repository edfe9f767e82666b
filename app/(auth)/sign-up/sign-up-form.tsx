"use client";
import { useActionState } from "react";
import { Field, FormMessage } from "@/components/form-bits";
import { signUpAction } from "@/lib/accounts/actions";
import { initialFormState } from "@/lib/shared/form-state";

export function SignUpForm() {
  const [state, action, pending] = useActionState(signUpAction, initialFormState);
  return (
    <form action={action} className="card space-y-3">
      <FormMessage state={state} />
      <Field name="name" label="Your name" autoComplete="name" required state={state} />
      <Field name="email" label="E-mail" type="email" autoComplete="email" required state={state} />
      <Field name="password" label="Password" type="password" autoComplete="new-password" required state={state} hint="At least 8 characters; common passwords are refused." />
      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Creating…" : "Create account"}
      </button>
    </form>
  );
}
