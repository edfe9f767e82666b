"use server";
import { revalidatePath } from "next/cache";
import { getActor } from "@/lib/server/auth/actor";
import { updateUnits } from "@/lib/accounts/units";
import { formError } from "@/lib/server/form-error";
import type { FormState } from "@/lib/shared/form-state";

/** Server actions are reachable by a direct POST: updateUnits checks the caller itself. */
export async function updateUnitsAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    await updateUnits(await getActor(), { pressure: form.get("pressure"), mass: form.get("mass"), distance: form.get("distance") });
  } catch (error) {
    return formError(error, form);
  }
  revalidatePath("/", "layout");
  return { ok: true, message: "Units saved." };
}
