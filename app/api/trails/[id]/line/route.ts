// POST /api/trails/{id}/line: staff upload a new line for a trail (multipart "file"); earlier versions are kept.
import { handler } from "@/lib/server/api/handler";
import { getTrailDetail, liveTrailParkId } from "@/lib/trails/queries";
import { receiveTrailUpload } from "@/lib/trails/receive-upload";
import { replaceTrailLine } from "@/lib/trails/save-upload";

export const POST = handler<{ id: string }>(async ({ request, params, actor }) => {
  const parkId = await liveTrailParkId(params.id);
  const { file } = await receiveTrailUpload(request, actor, parkId, "replace-line");
  const { trail, result, notes } = await replaceTrailLine(actor, params.id, file);
  return Response.json({ trail: await getTrailDetail(trail.id, actor), upload: { warnings: [...result.parsed.warnings, ...notes] } });
});
