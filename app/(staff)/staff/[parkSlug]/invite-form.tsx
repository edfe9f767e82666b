"use client";
import { useActionState } from "react";
import { Field, FormMessage } from "@/components/form-bits";
import { inviteStaffAction } from "@/lib/accounts/actions";
import { initialFormState } from "@/lib/shared/form-state";

export function InviteStaffForm({ parkSlug }: { parkSlug: string }) {
  const [state, action, pending] = useActionState(inviteStaffAction, initialFormState);
  return (
    <form action={action} className="card space-y-3">
      <h2 className="text-lg font-bold">Invite staff</h2>
      <FormMessage state={state} />
      <input type="hidden" name="parkSlug" value={parkSlug} />
      <Field name="email" label="Their e-mail" type="email" required state={state} />
      <fieldset>
        <legend className="label">Role</legend>
        <div className="flex gap-2">
          {(["ranger", "manager"] as const).map((role) => (
            <label key={role} className="btn-quiet has-[:checked]:border-moss-600 has-[:checked]:bg-moss-100">
              <input type="radio" name="role" value={role} defaultChecked={role === "ranger"} className="h-5 w-5" />
              {role === "ranger" ? "Ranger" : "Manager"}
            </label>
          ))}
        </div>
        <p className="field-error" aria-live="polite">{state.fieldErrors?.role ?? ""}</p>
      </fieldset>
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? "Sending…" : "Send invitation"}
      </button>
    </form>
  );
}
