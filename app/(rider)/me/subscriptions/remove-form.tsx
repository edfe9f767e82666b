"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/form-bits";
import { initialFormState } from "@/lib/shared/form-state";
import { removeSubscriptionAction } from "@/lib/notices/subscription-actions";

export function RemoveSubscriptionForm({ subscriptionId, parkName }: { subscriptionId: string; parkName: string }) {
  const [state, action, pending] = useActionState(removeSubscriptionAction, initialFormState);
  return (
    <form action={action}>
      <input type="hidden" name="subscriptionId" value={subscriptionId} />
      <FormMessage state={state.ok ? initialFormState : state} />
      <button type="submit" className="btn-quiet" disabled={pending} aria-label={`Remove notices from ${parkName}`}>
        {pending ? "Removing…" : "Remove"}
      </button>
    </form>
  );
}
