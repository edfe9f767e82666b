// POST /api/parks/{parkSlug}/notices: staff queue a notice for the park's subscribers (202).
// GET  /api/parks/{parkSlug}/notices: the park's recent notices with delivery counts.
import { readJson } from "@/lib/server/api/body";
import { handler } from "@/lib/server/api/handler";
import { listParkNotices } from "@/lib/notices/notice-queries";
import { getParkBySlug } from "@/lib/parks/queries";
import { sendNotice } from "@/lib/notices/send-notice";

export const dynamic = "force-dynamic";

export const POST = handler<{ parkSlug: string }>(async ({ request, params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  const notice = await sendNotice(actor, park.id, await readJson(request, 20_000));
  return Response.json(notice, { status: 202 });
});

export const GET = handler<{ parkSlug: string }>(async ({ params, actor }) => {
  const park = await getParkBySlug(params.parkSlug);
  return Response.json({ notices: await listParkNotices(actor, park.id) });
});
