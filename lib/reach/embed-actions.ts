"use server";
import { setEmbedOrigins } from "@/lib/reach/embed";
import { getActor } from "@/lib/server/auth/actor";
import { formError } from "@/lib/server/form-error";
import type { FormState } from "@/lib/shared/form-state";

/** Server actions are reachable by a direct POST: setEmbedOrigins checks the caller itself. */
export async function saveEmbedOriginsAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    const origins = await setEmbedOrigins(await getActor(), String(form.get("parkSlug") ?? ""), form.get("origins"));
    return { ok: true, message: origins.length ? `Saved: ${origins.join(", ")} may show the card.` : "Saved: no other website may show the card.", values: { origins: origins.join("\n") } };
  } catch (error) {
    return formError(error, form);
  }
}
