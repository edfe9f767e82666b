import "server-only";
/** The embeddable status card and the park's list of websites allowed to frame it. */
import { embedCardHtml, embedOriginsSchema, frameAncestors } from "@/lib/reach/pure/embed";
import { statusFeedFor } from "@/lib/reach/status";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { embedContentSecurityPolicy } from "@/lib/server/security-headers";
import { getParkBySlug } from "@/lib/parks/queries";
import { AppError } from "@/lib/shared/errors";
import { sequelize } from "@/models";
import { recordAudit } from "@/lib/audit/record";

/** GET /embed/parks/{slug}: the card, framable only by the park's listed origins. */
export async function embedCardResponse(slug: string, now = new Date()): Promise<Response> {
  const park = await getParkBySlug(slug);
  const feed = await statusFeedFor(slug);
  return new Response(embedCardHtml(feed, now), {
    headers: {
      "Content-Type": "text/html; charset=utf-8",
      "Content-Security-Policy": embedContentSecurityPolicy(frameAncestors(park.embedOrigins)),
      // The same for everyone: a shared cache may hold it a minute; browsers ask each time, so a
      // change to the listed websites shows at once.
      "Cache-Control": "public, max-age=0, s-maxage=60",
    },
  });
}

/** Managers list the websites (origins) that may frame the card; the list replaces the last one. */
export async function setEmbedOrigins(actor: Actor | null, slug: string, text: unknown): Promise<string[]> {
  const park = await getParkBySlug(slug);
  authorize(actor, "park:update", { parkId: park.id });
  const parsed = embedOriginsSchema.safeParse(typeof text === "string" ? text : "");
  if (!parsed.success) throw new AppError(400, parsed.error.issues[0].message, "origins");
  const origins = parsed.data;
  await sequelize.transaction(async (transaction) => {
    await park.update({ embedOrigins: origins }, { transaction });
    await recordAudit({ parkId: park.id, actorId: actor.id, action: "park.embed-origins", subjectType: "park", subjectId: park.id, data: { origins } }, transaction);
  });
  return origins;
}
