"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { clientAddress } from "@/lib/server/auth/client-address";
import { signUpRider } from "@/lib/accounts/sign-up";
import { getActor } from "@/lib/server/auth/actor";
import { getParkBySlug } from "@/lib/parks/queries";
import { acceptInvitation, inviteStaff } from "@/lib/staff/invitations";
import { formError } from "@/lib/server/form-error";
import type { FormState } from "@/lib/shared/form-state";

/** Server actions are reachable by a direct POST: each one checks its caller itself. */
export async function signUpAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    await signUpRider({ name: form.get("name"), email: form.get("email"), password: form.get("password") }, clientAddress(await headers()));
  } catch (error) {
    return formError(error, form);
  }
  redirect(`/sign-in?created=1&email=${encodeURIComponent(String(form.get("email") ?? "").trim().toLowerCase())}`);
}

export async function acceptInvitationAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    await acceptInvitation({ token: form.get("token"), name: form.get("name"), password: form.get("password") ?? "" }, await getActor());
  } catch (error) {
    return formError(error, form);
  }
  redirect("/sign-in?joined=1");
}

export async function inviteStaffAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    const park = await getParkBySlug(String(form.get("parkSlug") ?? ""));
    const invitation = await inviteStaff(await getActor(), park.id, { email: form.get("email"), role: form.get("role") });
    return { ok: true, message: `Invitation sent to ${invitation.email}.` };
  } catch (error) {
    return formError(error, form);
  }
}
