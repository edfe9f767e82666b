"use server";
import { revalidatePath } from "next/cache";
import { getActor } from "@/lib/server/auth/actor";
import { parkLocalInstant } from "@/lib/shared/park-clock";
import { clearParkState, setParkState } from "@/lib/conditions/park-state";
import { parkToday } from "@/lib/conditions/park-today";
import { getParkBySlug } from "@/lib/parks/queries";
import { AppError } from "@/lib/shared/errors";
import { formError } from "@/lib/server/form-error";
import type { FormState } from "@/lib/shared/form-state";

/** Server actions are reachable by a direct POST: each one checks its caller itself (inside the lib call). */
export async function setParkStateAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    const park = await getParkBySlug(String(form.get("parkSlug") ?? ""));
    const until = String(form.get("until") ?? "").trim();
    if (until && !/^([01]\d|2[0-3]):[0-5]\d$/.test(until)) throw new AppError(400, "Give the end as a time like 10:00.", "until");
    const endsAt = until ? parkLocalInstant(parkToday(park), until, park.timeZone) : null;
    if (endsAt && endsAt <= new Date()) throw new AppError(400, "That time has already passed today.", "until");
    await setParkState(await getActor(), park, { state: form.get("state"), message: form.get("message"), endsAt: endsAt?.toISOString() });
    revalidatePath(`/parks/${park.slug}`);
    revalidatePath(`/staff/${park.slug}/morning-check`);
    return { ok: true, message: "Park-wide notice set. The board shows it now." };
  } catch (error) {
    return formError(error, form);
  }
}

export async function clearParkStateAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    const park = await getParkBySlug(String(form.get("parkSlug") ?? ""));
    const { cleared } = await clearParkState(await getActor(), park);
    revalidatePath(`/parks/${park.slug}`);
    revalidatePath(`/staff/${park.slug}/morning-check`);
    return { ok: true, message: cleared ? "Cleared. Trails show their own status again." : "There was nothing to clear." };
  } catch (error) {
    return formError(error, form);
  }
}
