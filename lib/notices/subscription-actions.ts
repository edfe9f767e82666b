"use server";
import { revalidatePath } from "next/cache";
import { getActor } from "@/lib/server/auth/actor";
import { removeSubscription, saveSubscription } from "@/lib/notices/subscriptions";
import { formError } from "@/lib/server/form-error";
import type { FormState } from "@/lib/shared/form-state";

/** Server actions are reachable by a direct POST: lib/notices/subscriptions checks the caller. */
export async function saveSubscriptionAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    const { subscription, confirmationSent } = await saveSubscription(await getActor(), {
      parkSlug: form.get("parkSlug"),
      trailIds: form.get("scope") === "trails" ? form.getAll("trailIds").map(String) : null,
      kinds: form.getAll("kinds").map(String),
    });
    revalidatePath("/me/subscriptions");
    if (subscription.status === "active") return { ok: true, message: `Saved. Notices from ${subscription.park.name} go to ${subscription.email}.` };
    if (confirmationSent) return { ok: true, message: `Almost done: open the link we just sent to ${subscription.email} to start the e-mails.` };
    return {
      ok: true,
      message: `Saved. The confirmation e-mail to ${subscription.email} could not be sent just now (or one went out in the last few minutes); check your inbox, or try again later.`,
    };
  } catch (error) {
    return formError(error);
  }
}

export async function removeSubscriptionAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    await removeSubscription(await getActor(), String(form.get("subscriptionId") ?? ""));
    revalidatePath("/me/subscriptions");
    return { ok: true, message: "Subscription removed." };
  } catch (error) {
    return formError(error);
  }
}
