// POST /api/parks/{parkSlug}/notices/preview: the e-mail a notice would send and its recipient count; nothing is written.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { getParkBySlug } from "@/lib/parks/queries";
import { previewNotice } from "@/lib/notices/send-notice";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const { subject, text, html, recipientCount } = await previewNotice(actor, park.id, await readJson(request, 20_000));
  return Response.json({ subject, text, html, recipientCount });
});
