import "server-only";
import { UniqueConstraintError } from "sequelize";
import { authorize, type Actor } from "@/lib/server/auth/permissions";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";
import { isUuid } from "@/lib/shared/ids";
import { claimMailToRecipient } from "@/lib/server/auth/throttle";
import { headerSafe, sendMail } from "@/lib/server/mail/transport";
import { linkToken, subscriptionFields } from "@/lib/notices/pure/schemas";
import { Park, Subscription, Trail } from "@/models";
import { CONFIRM_LINK_DAYS, confirmToken, readConfirmToken, readUnsubscribeToken, subscriptionLinks } from "./link-tokens";
import { requestLogger } from "@/lib/server/logger";

/** A confirmation link is mailed at most this often per subscription (ASVS v5.0.0 2.4.1). */
export const CONFIRMATION_RESEND_MINUTES = 10;

export type SubscriptionStatus = "pending" | "active" | "unsubscribed";

export function subscriptionView(sub: Subscription, park: Pick<Park, "slug" | "name">) {
  const status: SubscriptionStatus = sub.unsubscribedAt ? "unsubscribed" : sub.confirmedAt ? "active" : "pending";
  return { id: sub.id, park: { slug: park.slug, name: park.name }, email: sub.email, trailIds: sub.trailIds, kinds: sub.kinds, status, confirmedAt: sub.confirmedAt };
}

export async function listSubscriptions(actor: Actor | null) {
  authorize(actor, "own:subscriptions", { ownerId: actor?.id });
  const subs = await Subscription.findAll({ where: { userId: actor.id }, include: [{ model: Park, as: "park", attributes: ["slug", "name"] }], order: [["createdAt", "ASC"]] });
  return subs.map((s) => subscriptionView(s, (s as Subscription & { park: Park }).park));
}

/**
 * Creates or changes the caller's subscription to one park. A new address (or one never
 * confirmed) must be confirmed by the e-mailed link before any notice is sent to it.
 * If the mail server is down the choice is still saved; the page offers to send the link again.
 */
/** What the subscription form offers: every park with its trails in use, by name. */
export async function subscriptionChoices() {
  const [parks, trails] = await Promise.all([
    Park.findAll({ attributes: ["id", "slug", "name"], order: [["name", "ASC"]] }),
    Trail.findAll({ where: { archivedAt: null }, attributes: ["id", "parkId", "name"], order: [["name", "ASC"]] }),
  ]);
  return parks.map((p) => ({ slug: p.slug, name: p.name, trails: trails.filter((t) => t.parkId === p.id).map((t) => ({ id: t.id, name: t.name })) }));
}

export async function saveSubscription(actor: Actor | null, input: unknown) {
  authorize(actor, "own:subscriptions", { ownerId: actor?.id });
  const fields = subscriptionFields.parse(input);
  const park = await Park.findOne({ where: { slug: fields.parkSlug } });
  if (!park) throw new AppError(422, "Choose a park from the list.", "parkSlug");
  if (fields.trailIds) {
    const found = await Trail.count({ where: { id: fields.trailIds, parkId: park.id, archivedAt: null } });
    if (found !== fields.trailIds.length) throw new AppError(422, "Choose trails of this park.", "trailIds");
  }
  const existing = await Subscription.findOne({ where: { userId: actor.id, parkId: park.id }, useMaster: true });
  const needsConfirmation = !existing?.confirmedAt || existing.email !== actor.email;
  const values = {
    email: actor.email,
    trailIds: fields.trailIds,
    kinds: fields.kinds,
    unsubscribedAt: null,
    ...(needsConfirmation ? { confirmedAt: null } : {}),
  };
  let sub: Subscription;
  try {
    sub = existing ? await existing.update(values) : await Subscription.create({ userId: actor.id, parkId: park.id, ...values });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw new AppError(409, "This subscription was just changed elsewhere. Reload and try again.");
    throw error;
  }
  const confirmationSent = needsConfirmation ? await mailConfirmationLink(sub, park) : false;
  return { subscription: subscriptionView(sub, park), created: !existing, confirmationSent };
}

/**
 * Mails the confirmation link unless one went out recently for this row, or the address has had
 * its hourly share already (counted per recipient, so deleting and subscribing again resets
 * nothing; ASVS v5.0.0 2.4.1); false when not sent.
 */
async function mailConfirmationLink(sub: Subscription, park: Park): Promise<boolean> {
  const recent = sub.confirmationSentAt && Date.now() - sub.confirmationSentAt.getTime() < CONFIRMATION_RESEND_MINUTES * 60_000;
  if (recent || !(await claimMailToRecipient(sub.email, "subscription-confirm"))) return false;
  const link = subscriptionLinks().confirm(confirmToken(sub.id, sub.email));
  try {
    await sendMail({
      to: sub.email,
      subject: `Confirm notices from ${headerSafe(park.name)}`,
      text: `You asked Loamcast to e-mail you closures and other notices from ${park.name}.\n\nConfirm within ${CONFIRM_LINK_DAYS} days: ${link}\n\nIf this was not you, ignore this e-mail: nothing will be sent to you.`,
    });
  } catch (error) {
    (await requestLogger()).error({ err: error, subscriptionId: sub.id }, "confirmation mail not sent");
    return false;
  }
  await sub.update({ confirmationSentAt: new Date() });
  return true;
}

/** Someone else's subscription reads exactly like a missing one (404), as setups and ride logs do. */
export async function removeSubscription(actor: Actor | null, id: string) {
  authorize(actor, "own:subscriptions", { ownerId: actor?.id });
  const sub = isUuid(id) ? await Subscription.findOne({ where: { id, userId: actor.id } }) : null;
  if (!sub) throw new AppError(404, "Subscription not found.");
  await sub.destroy();
}

const invalidLink = (what: string) => new AppError(400, `This ${what} link is not valid or has expired.`, "token");

/** Any malformed token gets the same answer as a forged one. */
function tokenText(token: unknown, what: string): string {
  const parsed = linkToken.safeParse(token);
  if (!parsed.success) throw invalidLink(what);
  return parsed.data;
}

/** The double opt-in: only this sets confirmedAt. Idempotent, so a second click is harmless. */
export async function confirmSubscription(token: unknown) {
  const payload = readConfirmToken(tokenText(token, "confirmation"));
  if (!payload) throw invalidLink("confirmation");
  const sub = await Subscription.findByPk(payload.subscriptionId, { include: [{ model: Park, as: "park", attributes: ["slug", "name"] }], useMaster: true });
  // The link confirms the address it was sent to, and only while the rider still wants the mail.
  if (!sub || sub.email !== payload.email || sub.unsubscribedAt) throw invalidLink("confirmation");
  if (!sub.confirmedAt) await sub.update({ confirmedAt: new Date() });
  return subscriptionView(sub, (sub as Subscription & { park: Park }).park);
}

async function subscriptionForUnsubscribe(token: unknown) {
  const payload = readUnsubscribeToken(tokenText(token, "unsubscribe"));
  if (!payload) throw invalidLink("unsubscribe");
  const park = await Park.findByPk(payload.parkId, { attributes: ["id", "slug", "name"] });
  if (!park) throw invalidLink("unsubscribe");
  const sub = await Subscription.findOne({ where: { userId: payload.userId, parkId: park.id }, useMaster: true });
  return { park, sub };
}

/** What the unsubscribe page shows before the rider presses the button. */
export async function describeUnsubscribe(token: unknown) {
  const { park, sub } = await subscriptionForUnsubscribe(token);
  return { park: { slug: park.slug, name: park.name }, subscribed: Boolean(sub && !sub.unsubscribedAt) };
}

/** RFC 8058 one-click: the signed token is the authority, no session needed. Idempotent. */
export async function unsubscribeByToken(token: unknown) {
  const { park, sub } = await subscriptionForUnsubscribe(token);
  const wasSubscribed = Boolean(sub && !sub.unsubscribedAt);
  if (sub && wasSubscribed) await sub.update({ unsubscribedAt: new Date() });
  return { park: { slug: park.slug, name: park.name }, unsubscribed: true, wasSubscribed };
}
