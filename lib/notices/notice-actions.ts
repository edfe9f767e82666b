"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";
import { getParkBySlug } from "@/lib/parks/queries";
import { AppError } from "@/lib/shared/errors";
import { parkLocalToInstant } from "@/lib/shared/park-clock";
import { previewNotice, retryFailedDeliveries, sendNotice } from "@/lib/notices/send-notice";
import { formError } from "@/lib/server/form-error";
import type { FormState } from "@/lib/shared/form-state";

/** Server actions are reachable by a direct POST: each one checks its caller itself (in lib/notices). */
export type NoticePreview = { subject: string; text: string; html: string; recipientCount: number };
export type NoticeFormState = FormState & { preview?: NoticePreview };

/** Form fields → the API's input shape; "closed until" is read on the park's wall clock. */
function noticeInput(form: FormData, timeZone: string) {
  const scope = form.get("scope");
  const until = String(form.get("closedUntil") ?? "").trim();
  let closedUntil: string | null = null;
  if (until) {
    const instant = parkLocalToInstant(until, timeZone);
    if (!instant) throw new AppError(400, "Give 'closed until' as a date and time.", "closedUntil");
    closedUntil = instant.toISOString();
  }
  return {
    kind: form.get("kind"),
    trailIds: scope === "trails" ? form.getAll("trailIds").map(String) : null,
    message: form.get("message"),
    closedUntil,
  };
}

export async function noticeFormAction(_prev: NoticeFormState, form: FormData): Promise<NoticeFormState> {
  let sentId: string;
  let parkSlug: string;
  try {
    const park = await getParkBySlug(String(form.get("parkSlug") ?? ""));
    parkSlug = park.slug;
    const actor = await getActor();
    const input = noticeInput(form, park.timeZone);
    if (form.get("intent") !== "send") {
      const { subject, text, html, recipientCount } = await previewNotice(actor, park.id, input);
      return { ok: true, preview: { subject, text, html, recipientCount } };
    }
    sentId = (await sendNotice(actor, park.id, input)).id;
  } catch (error) {
    return formError(error);
  }
  revalidatePath(`/staff/${parkSlug}/notices`);
  redirect(`/staff/${parkSlug}/notices/${sentId}?sent=1`);
}

export async function retryFailedAction(_prev: FormState, form: FormData): Promise<FormState> {
  try {
    const { requeued } = await retryFailedDeliveries(await getActor(), String(form.get("noticeId") ?? ""));
    revalidatePath(`/staff/${String(form.get("parkSlug") ?? "")}/notices/${String(form.get("noticeId") ?? "")}`);
    return { ok: true, message: requeued === 0 ? "No failed deliveries to retry." : `${requeued} ${requeued === 1 ? "delivery" : "deliveries"} queued again.` };
  } catch (error) {
    return formError(error);
  }
}
