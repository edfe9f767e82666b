// GET /api/dev/mail: messages captured by the local fake SMTP server (admins only).
import { handler } from "@/lib/server/api/handler";
import { authorize } from "@/lib/server/auth/permissions";
import { capturedMail } from "@/lib/server/mail/captured";

export const dynamic = "force-dynamic";

export const GET = handler(async ({ actor }) => {
  authorize(actor, "dev:mail");
  return Response.json({ messages: await capturedMail() });
});
