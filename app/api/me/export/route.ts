// GET /api/me/export: the caller's account, setups, ride logs and subscriptions as a JSON attachment.
import { exportMyData } from "@/lib/accounts/my-account";
import { handler } from "@/lib/server/api/handler";

export const GET = handler(async ({ actor }) => {
  const data = await exportMyData(actor);
  return new Response(JSON.stringify(data, null, 2), {
    headers: {
      "content-type": "application/json; charset=utf-8",
      "content-disposition": `attachment; filename="loamcast-my-data-${data.exportedAt.slice(0, 10)}.json"`,
      "cache-control": "no-store",
    },
  });
});
