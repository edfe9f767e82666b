import "server-only";
import { ECDH } from "node:crypto";
import { UniqueConstraintError } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { pushSubscriptionFields } from "@/lib/notices/pure/schemas";
import { Park, PushSubscription, Trail } from "@/models";

/**
 * A rider's browsers subscribed to push alerts, one row per browser and park. Signing in is the
 * consent (the browser also asked its own permission), so there is no e-mailed confirmation.
 */
export function pushSubscriptionView(sub: PushSubscription, park: Pick<Park, "slug" | "name">) {
  return { id: sub.id, park: { slug: park.slug, name: park.name }, trailIds: sub.trailIds, kinds: sub.kinds, endpointOrigin: new URL(sub.endpoint).origin, createdAt: sub.createdAt };
}

export async function listPushSubscriptions(actor: Actor | null) {
  authorize(actor, "own:subscriptions", { ownerId: actor?.id });
  const subs = await PushSubscription.findAll({ where: { userId: actor.id }, include: [{ model: Park, as: "park", attributes: ["slug", "name"] }], order: [["createdAt", "ASC"]] });
  return subs.map((s) => pushSubscriptionView(s, (s as PushSubscription & { park: Park }).park));
}

const LOOPBACK_OR_IP = /^(localhost|\[[0-9a-f:.]+\]|\d{1,3}(\.\d{1,3}){3})$/i;

/**
 * The worker will POST to this address, so it must look like a push service: https on a host name
 * (not an IP literal or localhost, which would point the worker at our own network), no
 * credentials. Plain http is accepted only for the local fake push service.
 */
function checkEndpoint(endpoint: string) {
  const url = new URL(endpoint);
  const fake = env().FAKE_PUSH_URL;
  if (fake && url.origin === new URL(fake).origin) return;
  if (url.protocol !== "https:" || url.username || url.password || LOOPBACK_OR_IP.test(url.hostname)) {
    throw new AppError(422, "This browser's push address is not one Loamcast can send to.", "subscription.endpoint");
  }
}

/** The browser's key must be a point of P-256, or no push could ever be encrypted to it (RFC 8291 §3.1). */
function checkBrowserKey(p256dh: string) {
  try {
    ECDH.convertKey(Buffer.from(p256dh, "base64url"), "prime256v1");
  } catch {
    throw new AppError(422, "This browser's push key is not usable. Turn alerts off and on again in the browser.", "subscription.keys.p256dh");
  }
}

/** Creates or changes one browser's alerts for a park. The same browser again updates its row. */
export async function savePushSubscription(actor: Actor | null, input: unknown) {
  authorize(actor, "own:subscriptions", { ownerId: actor?.id });
  const fields = pushSubscriptionFields.parse(input);
  checkEndpoint(fields.subscription.endpoint);
  checkBrowserKey(fields.subscription.keys.p256dh);
  const park = await Park.findOne({ where: { slug: fields.parkSlug } });
  if (!park) throw new AppError(422, "Choose a park from the list.", "parkSlug");
  if (fields.trailIds) {
    const found = await Trail.count({ where: { id: fields.trailIds, parkId: park.id, archivedAt: null } });
    if (found !== fields.trailIds.length) throw new AppError(422, "Choose trails of this park.", "trailIds");
  }
  const { endpoint, keys } = fields.subscription;
  // A browser's endpoint is its own: whoever signs in on it now owns its alerts.
  const values = { userId: actor.id, p256dh: keys.p256dh, auth: keys.auth, trailIds: fields.trailIds, kinds: fields.kinds };
  const existing = await PushSubscription.findOne({ where: { parkId: park.id, endpoint }, useMaster: true });
  try {
    const sub = existing ? await existing.update(values) : await PushSubscription.create({ parkId: park.id, endpoint, ...values });
    return { subscription: pushSubscriptionView(sub, park), created: !existing };
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw new AppError(409, "This browser's alerts were just changed elsewhere. Reload and try again.");
    throw error;
  }
}

/** Someone else's browser reads exactly like a missing one (404). */
export async function removePushSubscription(actor: Actor | null, id: string) {
  authorize(actor, "own:subscriptions", { ownerId: actor?.id });
  const sub = isUuid(id) ? await PushSubscription.findOne({ where: { id, userId: actor.id } }) : null;
  if (!sub) throw new AppError(404, "Browser alerts not found.");
  await sub.destroy();
}
